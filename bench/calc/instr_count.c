/* instr_count.c - deterministic cost of the C API against the same formula
 * written inline, for valgrind --tool=callgrind (instruction counts do not
 * depend on what else runs on the machine, unlike wall time).
 *
 * Each run_<pair>_<variant>() makes N calls over the same 256 inputs as
 * bench/bench_core.cpp; callgrind's inclusive instruction count of each,
 * divided by N, is the cost per call. bench/calc/run.sh builds and runs it:
 *
 *   cc -O2 -I lib/include bench/calc/instr_count.c -L<build>/lib -ltubeheat -lm
 *   valgrind --tool=callgrind --callgrind-out-file=cg.out ./instr_count
 *   callgrind_annotate --inclusive=yes cg.out | grep run_
 */
#include "tubeheat.h"

#include <math.h>
#include <stdio.h>

#define N_INPUTS 256
#define N_CALLS 100000

static double in_re[N_INPUTS], in_pr[N_INPUTS], in_rr[N_INPUTS];
static th_conditions in_cond[N_INPUTS];
static volatile double sink;

static void make_inputs(void) {
    for (int i = 0; i < N_INPUTS; ++i) {
        in_re[i] = 1.2e4 * pow(400.0, (double)i / N_INPUTS);
        in_pr[i] = 0.7 * pow(100.0, (double)((i * 37) % N_INPUTS) / N_INPUTS);
        in_rr[i] = i % 4 == 0 ? 0.0 : 1e-5 * pow(1000.0, (double)((i * 11) % N_INPUTS) / N_INPUTS);
        th_conditions_init(&in_cond[i]);
        in_cond[i].re = in_re[i];
        in_cond[i].pr = in_pr[i];
    }
}

/* The inline formulas: identical to the baselines of bench/bench_core.cpp. */
static double petukhov_f(double re) {
    const double t = 0.790 * log(re) - 1.64;
    return 1.0 / (t * t);
}
static double db_inline(double re, double pr) { return 0.023 * pow(re, 0.8) * pow(pr, 0.4); }
static double st_inline(double re, double pr) {
    const double mu_ratio = 1.0;
    return 0.027 * pow(re, 0.8) * cbrt(pr) * pow(mu_ratio, 0.14);
}
static double petukhov_inline(double re, double pr) {
    const double f8 = petukhov_f(re) / 8.0;
    return f8 * re * pr / (1.07 + 12.7 * sqrt(f8) * (pow(pr, 2.0 / 3.0) - 1.0));
}
static double gnielinski_inline(double re, double pr) {
    const double f8 = petukhov_f(re) / 8.0;
    return f8 * (re - 1000.0) * pr / (1.0 + 12.7 * sqrt(f8) * (pow(pr, 2.0 / 3.0) - 1.0));
}
static double haaland_inline(double re, double rr) {
    const double t = -1.8 * log10(pow(rr / 3.7, 1.11) + 6.9 / re);
    return 1.0 / (t * t);
}
static double swamee_jain_inline(double re, double rr) {
    const double t = log10(rr / 3.7 + 5.74 / pow(re, 0.9));
    return 0.25 / (t * t);
}

#define INLINE_RUN(name, fn, a, b)                                  \
    __attribute__((noinline)) static void run_##name##_inline(void) { \
        double s = 0.0;                                             \
        for (int k = 0; k < N_CALLS; ++k) {                         \
            const int i = k % N_INPUTS;                             \
            s += fn(a[i], b[i]);                                    \
        }                                                           \
        sink = s;                                                   \
    }
#define NUSSELT_RUN(name, method)                                   \
    __attribute__((noinline)) static void run_##name##_api(void) {    \
        double s = 0.0;                                             \
        th_nusselt_result r;                                        \
        for (int k = 0; k < N_CALLS; ++k) {                         \
            const int i = k % N_INPUTS;                             \
            th_nusselt(method, &in_cond[i], &r);                    \
            s += r.nu;                                              \
        }                                                           \
        sink = s;                                                   \
    }
#define FRICTION_RUN(name, method)                                  \
    __attribute__((noinline)) static void run_##name##_api(void) {    \
        double s = 0.0, f = 0.0;                                    \
        for (int k = 0; k < N_CALLS; ++k) {                         \
            const int i = k % N_INPUTS;                             \
            th_friction_factor(method, in_re[i], in_rr[i], &f);     \
            s += f;                                                 \
        }                                                           \
        sink = s;                                                   \
    }

INLINE_RUN(dittus_boelter, db_inline, in_re, in_pr)
NUSSELT_RUN(dittus_boelter, TH_NU_DITTUS_BOELTER)
INLINE_RUN(sieder_tate, st_inline, in_re, in_pr)
NUSSELT_RUN(sieder_tate, TH_NU_SIEDER_TATE)
INLINE_RUN(petukhov, petukhov_inline, in_re, in_pr)
NUSSELT_RUN(petukhov, TH_NU_PETUKHOV)
INLINE_RUN(gnielinski, gnielinski_inline, in_re, in_pr)
NUSSELT_RUN(gnielinski, TH_NU_GNIELINSKI)
INLINE_RUN(haaland, haaland_inline, in_re, in_rr)
FRICTION_RUN(haaland, TH_F_HAALAND)
INLINE_RUN(swamee_jain, swamee_jain_inline, in_re, in_rr)
FRICTION_RUN(swamee_jain, TH_F_SWAMEE_JAIN)

int main(void) {
    make_inputs();
    run_dittus_boelter_inline();
    run_dittus_boelter_api();
    run_sieder_tate_inline();
    run_sieder_tate_api();
    run_petukhov_inline();
    run_petukhov_api();
    run_gnielinski_inline();
    run_gnielinski_api();
    run_haaland_inline();
    run_haaland_api();
    run_swamee_jain_inline();
    run_swamee_jain_api();
    printf("%d calls per run\n", N_CALLS);
    return 0;
}
