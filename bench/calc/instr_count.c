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
#define N_CALLS 102400 /* 400 arrays of N_INPUTS rows */

static double in_re[N_INPUTS], in_pr[N_INPUTS], in_rr[N_INPUTS], in_mu[N_INPUTS];
static th_conditions in_cond[N_INPUTS];
static volatile double sink;

static void make_inputs(void) {
    for (int i = 0; i < N_INPUTS; ++i) {
        in_re[i] = 1.2e4 * pow(400.0, (double)i / N_INPUTS);
        in_pr[i] = 0.7 * pow(100.0, (double)((i * 37) % N_INPUTS) / N_INPUTS);
        in_rr[i] = i % 4 == 0 ? 0.0 : 1e-5 * pow(1000.0, (double)((i * 11) % N_INPUTS) / N_INPUTS);
        in_mu[i] = 0.5 * pow(6.0, (double)((i * 53) % N_INPUTS) / N_INPUTS);
        th_conditions_init(&in_cond[i]);
        in_cond[i].re = in_re[i];
        in_cond[i].pr = in_pr[i];
        in_cond[i].mu_ratio = in_mu[i];
    }
}

/* The inline formulas: identical to the baselines of bench/bench_core.cpp. */
static double petukhov_f(double re) {
    const double t = 0.790 * log(re) - 1.64;
    return 1.0 / (t * t);
}
static double db_inline(int i) { return 0.023 * pow(in_re[i], 0.8) * pow(in_pr[i], 0.4); }
static double st_inline(int i) {
    return 0.027 * pow(in_re[i], 0.8) * cbrt(in_pr[i]) * pow(in_mu[i], 0.14);
}
static double petukhov_inline(int i) {
    const double re = in_re[i], pr = in_pr[i];
    const double f8 = petukhov_f(re) / 8.0;
    return f8 * re * pr / (1.07 + 12.7 * sqrt(f8) * (pow(pr, 2.0 / 3.0) - 1.0));
}
static double gnielinski_inline(int i) {
    const double re = in_re[i], pr = in_pr[i];
    const double f8 = petukhov_f(re) / 8.0;
    return f8 * (re - 1000.0) * pr / (1.0 + 12.7 * sqrt(f8) * (pow(pr, 2.0 / 3.0) - 1.0));
}
static double churchill_inline(double re, double rr) {
    const double a = pow(-2.457 * log(pow(7.0 / re, 0.9) + 0.27 * rr), 16.0);
    const double b = pow(37530.0 / re, 16.0);
    return 8.0 * pow(pow(8.0 / re, 12.0) + 1.0 / pow(a + b, 1.5), 1.0 / 12.0);
}
static double haaland_inline(double re, double rr) {
    const double t = -1.8 * log10(pow(rr / 3.7, 1.11) + 6.9 / re);
    return 1.0 / (t * t);
}
static double swamee_jain_inline(double re, double rr) {
    const double t = log10(rr / 3.7 + 5.74 / pow(re, 0.9));
    return 0.25 / (t * t);
}

#define NU_INLINE_RUN(name, fn)                                     \
    __attribute__((noinline)) static void run_##name##_inline(void) { \
        double s = 0.0;                                             \
        for (int k = 0; k < N_CALLS; ++k) s += fn(k % N_INPUTS);    \
        sink = s;                                                   \
    }
#define F_INLINE_RUN(name, fn)                                      \
    __attribute__((noinline)) static void run_##name##_inline(void) { \
        double s = 0.0;                                             \
        for (int k = 0; k < N_CALLS; ++k) {                         \
            const int i = k % N_INPUTS;                             \
            s += fn(in_re[i], in_rr[i]);                            \
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
/* The array form: N_CALLS rows in calls of N_INPUTS rows; Sieder-Tate
 * takes the first row's mu_ratio for all (rows share it). */
#define NUSSELT_ARRAY_RUN(name, method)                                 \
    __attribute__((noinline)) static void run_##name##_array(void) {      \
        static double nu[N_INPUTS];                                     \
        static int status[N_INPUTS];                                    \
        double s = 0.0;                                                 \
        for (int k = 0; k < N_CALLS / N_INPUTS; ++k) {                  \
            th_nusselt_array(method, &in_cond[0], N_INPUTS, in_re, in_pr, NULL, nu, status); \
            s += nu[k % N_INPUTS];                                      \
        }                                                               \
        sink = s;                                                       \
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
#define FRICTION_ARRAY_RUN(name, method)                                \
    __attribute__((noinline)) static void run_##name##_array(void) {      \
        static double f[N_INPUTS];                                      \
        static int status[N_INPUTS];                                    \
        double s = 0.0;                                                 \
        for (int k = 0; k < N_CALLS / N_INPUTS; ++k) {                  \
            th_friction_factor_array(method, N_INPUTS, in_re, in_rr[k % N_INPUTS], f, status); \
            s += f[k % N_INPUTS];                                       \
        }                                                               \
        sink = s;                                                       \
    }
#define NU_PAIR(name, fn, method) NU_INLINE_RUN(name, fn) NUSSELT_RUN(name, method) NUSSELT_ARRAY_RUN(name, method)
#define F_PAIR(name, fn, method) F_INLINE_RUN(name, fn) FRICTION_RUN(name, method) FRICTION_ARRAY_RUN(name, method)

NU_PAIR(dittus_boelter, db_inline, TH_NU_DITTUS_BOELTER)
NU_PAIR(sieder_tate, st_inline, TH_NU_SIEDER_TATE)
NU_PAIR(petukhov, petukhov_inline, TH_NU_PETUKHOV)
NU_PAIR(gnielinski, gnielinski_inline, TH_NU_GNIELINSKI)
F_PAIR(haaland, haaland_inline, TH_F_HAALAND)
F_PAIR(swamee_jain, swamee_jain_inline, TH_F_SWAMEE_JAIN)
F_PAIR(churchill, churchill_inline, TH_F_CHURCHILL)

#define RUN3(name) run_##name##_inline(); run_##name##_api(); run_##name##_array();
int main(void) {
    make_inputs();
    RUN3(dittus_boelter)
    RUN3(sieder_tate)
    RUN3(petukhov)
    RUN3(gnielinski)
    RUN3(haaland)
    RUN3(swamee_jain)
    RUN3(churchill)
    printf("%d calls (rows) per run\n", N_CALLS);
    return 0;
}
