// instr_count.cpp - deterministic cost of the C API against the same
// formula written inline, for valgrind --tool=callgrind: instruction counts
// do not depend on what else runs on the machine, unlike CPU time.
//
// For every pair of bench/baselines.hpp, run_<pair>_inline() evaluates the
// inline formula, run_<pair>_api() makes the single C call and
// run_<pair>_array() the array call, each n_rows times over the same 256
// inputs as bench/bench_core.cpp; callgrind's inclusive count of each,
// divided by n_rows, is the cost per call (per row). bench/calc/run.sh
// builds it against the Release library, runs it under
// valgrind --tool=callgrind and prints the table with
// bench/calc/instr_table.py.
#include "baselines.hpp"

#include <cstdio>

namespace {

using namespace th_bench;

constexpr int n_rows = 400 * static_cast<int>(n_inputs);  // 400 arrays of 256 rows
volatile double sink;

std::array<th_conditions, n_inputs> conditions_table(rows kind) {
    std::array<th_conditions, n_inputs> cs;
    for (std::size_t k = 0; k < n_inputs; ++k) cs[k] = conditions_for(kind, k);
    return cs;
}
const std::array<th_conditions, n_inputs> turbulent = conditions_table(rows::turbulent);
const std::array<th_conditions, n_inputs> laminar = conditions_table(rows::laminar);
const std::array<th_conditions, n_inputs> transition = conditions_table(rows::transition);
const std::array<th_conditions, n_inputs> liquid_metal = conditions_table(rows::liquid_metal);

// The columns of one row kind, for the array form.
struct columns {
    std::array<double, n_inputs> re{}, pr{}, ld{};
    explicit columns(const std::array<th_conditions, n_inputs> &cs) {
        for (std::size_t k = 0; k < n_inputs; ++k) {
            re[k] = cs[k].re;
            pr[k] = cs[k].pr;
            ld[k] = cs[k].l_over_d;
        }
    }
};

template <double (*F)(const th_conditions &)>
void nu_inline(const std::array<th_conditions, n_inputs> &cs) {
    double s = 0.0;
    for (int k = 0; k < n_rows; ++k) s += F(cs[k % n_inputs]);
    sink = s;
}
void nu_api(int method, const std::array<th_conditions, n_inputs> &cs) {
    double s = 0.0;
    th_nusselt_result r;
    for (int k = 0; k < n_rows; ++k) {
        th_nusselt(method, &cs[k % n_inputs], &r);
        s += r.nu;
    }
    sink = s;
}
void nu_array(int method, const std::array<th_conditions, n_inputs> &cs) {
    const columns cols(cs);  // 256 copies: noise against the 102,400 rows
    static double nu[n_inputs];
    static int status[n_inputs];
    double s = 0.0;
    for (int k = 0; k < n_rows / static_cast<int>(n_inputs); ++k) {
        th_nusselt_array(method, &cs[0], n_inputs, cols.re.data(), cols.pr.data(), cols.ld.data(), nu,
                         status);
        s += nu[k % n_inputs];
    }
    sink = s;
}

template <double (*F)(double, double)>
void f_inline(int method) {
    const auto &re = re_for(method);
    double s = 0.0;
    for (int k = 0; k < n_rows; ++k) s += F(re[k % n_inputs], rr_for(method, k % n_inputs));
    sink = s;
}
void f_api(int method) {
    const auto &re = re_for(method);
    double s = 0.0, f = 0.0;
    for (int k = 0; k < n_rows; ++k) {
        th_friction_factor(method, re[k % n_inputs], rr_for(method, k % n_inputs), &f);
        s += f;
    }
    sink = s;
}
void f_array(int method) {
    const auto &re = re_for(method);
    static double f[n_inputs];
    static int status[n_inputs];
    double s = 0.0;
    for (int k = 0; k < n_rows / static_cast<int>(n_inputs); ++k) {
        th_friction_factor_array(method, n_inputs, re.data(), rr_for(method, k % n_inputs), f, status);
        s += f[k % n_inputs];
    }
    sink = s;
}

}  // namespace

// Named functions, so that callgrind reports each variant by name.
#define NU_PAIR(name, fn, method, table)                                                  \
    __attribute__((noinline)) void run_##name##_inline() { nu_inline<fn>(table); }        \
    __attribute__((noinline)) void run_##name##_api() { nu_api(method, table); }          \
    __attribute__((noinline)) void run_##name##_array() { nu_array(method, table); }      \
    void run_##name() {                                                                   \
        run_##name##_inline();                                                            \
        run_##name##_api();                                                               \
        run_##name##_array();                                                             \
    }
#define F_PAIR(name, fn, method)                                                          \
    __attribute__((noinline)) void run_##name##_inline() { f_inline<fn>(method); }        \
    __attribute__((noinline)) void run_##name##_api() { f_api(method); }                  \
    __attribute__((noinline)) void run_##name##_array() { f_array(method); }              \
    void run_##name() {                                                                   \
        run_##name##_inline();                                                            \
        run_##name##_api();                                                               \
        run_##name##_array();                                                             \
    }

NU_PAIR(dittus_boelter, db_inline, TH_NU_DITTUS_BOELTER, turbulent)
NU_PAIR(sieder_tate, st_inline, TH_NU_SIEDER_TATE, turbulent)
NU_PAIR(petukhov, petukhov_inline, TH_NU_PETUKHOV, turbulent)
NU_PAIR(gnielinski, gnielinski_inline, TH_NU_GNIELINSKI, turbulent)
NU_PAIR(gnielinski_transition, gnielinski_transition_inline, TH_NU_GNIELINSKI_TRANSITION, transition)
NU_PAIR(liquid_metal_t, seban_shimazaki_inline, TH_NU_LIQUID_METAL, liquid_metal)
NU_PAIR(laminar_developed, laminar_developed_inline, TH_NU_LAMINAR_DEVELOPED, laminar)
NU_PAIR(hausen, hausen_inline, TH_NU_HAUSEN, laminar)
NU_PAIR(sieder_tate_laminar, sieder_tate_laminar_inline, TH_NU_SIEDER_TATE_LAMINAR, laminar)
NU_PAIR(shah, shah_inline, TH_NU_SHAH, laminar)
NU_PAIR(gnielinski_laminar, gnielinski_laminar_inline, TH_NU_GNIELINSKI_LAMINAR, laminar)
F_PAIR(haaland, haaland_inline, TH_F_HAALAND)
F_PAIR(swamee_jain, swamee_jain_inline, TH_F_SWAMEE_JAIN)
F_PAIR(churchill, churchill_inline, TH_F_CHURCHILL)
F_PAIR(colebrook, colebrook_lambert_w_inline, TH_F_COLEBROOK)
F_PAIR(petukhov_f, petukhov_friction_inline, TH_F_PETUKHOV)
F_PAIR(laminar_f, laminar_friction_inline, TH_F_LAMINAR)

int main() {
    run_dittus_boelter();
    run_sieder_tate();
    run_petukhov();
    run_gnielinski();
    run_gnielinski_transition();
    run_liquid_metal_t();
    run_laminar_developed();
    run_hausen();
    run_sieder_tate_laminar();
    run_shah();
    run_gnielinski_laminar();
    run_haaland();
    run_swamee_jain();
    run_churchill();
    run_colebrook();
    run_petukhov_f();
    run_laminar_f();
    std::printf("%d calls (rows) per variant\n", n_rows);
    return 0;
}
