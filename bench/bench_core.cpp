// bench_core.cpp - the core correlations through the C API, each next to a
// baseline: the same formula written inline (baselines.hpp), fed the same
// inputs, so
// the API's overhead (validation, dispatch, range bookkeeping) shows as a
// ratio measured in the same run. Report ratios with bench/ratios.py.
#include "baselines.hpp"
#include "tubeheat.h"

#include <benchmark/benchmark.h>

#include <array>
#include <cstdint>

namespace {

using namespace th_bench;

// ---- the loops ---------------------------------------------------------------
// Every variant reports items (calls or rows) processed, so that
// bench/ratios.py compares time per call across single calls and arrays.
void run_inline_nu(benchmark::State &st, double (*f)(const th_conditions &), rows kind) {
    std::array<th_conditions, n_inputs> cs;
    for (std::size_t k = 0; k < n_inputs; ++k) cs[k] = conditions_for(kind, k);
    std::size_t i = 0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(f(cs[i]));
        i = (i + 1) % n_inputs;
    }
    st.SetItemsProcessed(st.iterations());
}

void run_nusselt(benchmark::State &st, int method, rows kind) {
    std::array<th_conditions, n_inputs> cs;
    for (std::size_t k = 0; k < n_inputs; ++k) cs[k] = conditions_for(kind, k);
    th_nusselt_result r;
    std::size_t i = 0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(th_nusselt(method, &cs[i], &r));
        benchmark::DoNotOptimize(r.nu);
        i = (i + 1) % n_inputs;
    }
    st.SetItemsProcessed(st.iterations());
}

// th_nusselt_array over the same 256 rows per iteration. The rows share
// every condition but Re, Pr and L/D, so Sieder-Tate (which reads mu_ratio
// per row in the single-call runs) uses the first row's mu_ratio here.
void run_nusselt_array(benchmark::State &st, int method, rows kind) {
    std::array<double, n_inputs> re{}, pr{}, ld{}, nu{};
    std::array<int, n_inputs> status{};
    const th_conditions shared = conditions_for(kind, 0);
    for (std::size_t k = 0; k < n_inputs; ++k) {
        const th_conditions c = conditions_for(kind, k);
        re[k] = c.re;
        pr[k] = c.pr;
        ld[k] = c.l_over_d;
    }
    for (auto _ : st) {
        benchmark::DoNotOptimize(th_nusselt_array(method, &shared, n_inputs, re.data(), pr.data(),
                                                  ld.data(), nu.data(), status.data()));
        benchmark::ClobberMemory();
    }
    st.SetItemsProcessed(st.iterations() * static_cast<std::int64_t>(n_inputs));
}

void run_inline_f(benchmark::State &st, double (*f)(double, double)) {
    std::size_t i = 0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(f(in.re[i], in.rr[i]));
        i = (i + 1) % n_inputs;
    }
    st.SetItemsProcessed(st.iterations());
}

void run_inline_f_laminar(benchmark::State &st, double (*f)(double, double)) {
    std::size_t i = 0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(f(in.re_lam[i], 0.0));
        i = (i + 1) % n_inputs;
    }
    st.SetItemsProcessed(st.iterations());
}

void run_friction(benchmark::State &st, int method) {
    const auto &re = re_for(method);
    double f = 0.0;
    std::size_t i = 0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(th_friction_factor(method, re[i], rr_for(method, i), &f));
        benchmark::DoNotOptimize(f);
        i = (i + 1) % n_inputs;
    }
    st.SetItemsProcessed(st.iterations());
}

// th_friction_factor_array: one pipe per call, so one roughness for all
// 256 rows (cycled through the same roughness values call by call).
void run_friction_array(benchmark::State &st, int method) {
    const std::array<double, n_inputs> re = re_for(method);  // a local copy, as run_nusselt_array has
    std::array<double, n_inputs> f{};
    std::array<int, n_inputs> status{};
    std::size_t i = 0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(th_friction_factor_array(method, n_inputs, re.data(), rr_for(method, i),
                                                          f.data(), status.data()));
        benchmark::ClobberMemory();
        i = (i + 1) % n_inputs;
    }
    st.SetItemsProcessed(st.iterations() * static_cast<std::int64_t>(n_inputs));
}

}  // namespace

// Naming: run_x/<pair>/<variant>; <pair>/inline is the baseline, api the
// single C call, api_array the array form per row.
#define TH_NU_BENCH(pair, inline_fn, method, kind)                               \
    BENCHMARK_CAPTURE(run_inline_nu, pair/inline, inline_fn, kind);              \
    BENCHMARK_CAPTURE(run_nusselt, pair/api, method, kind);                      \
    BENCHMARK_CAPTURE(run_nusselt_array, pair/api_array, method, kind)
TH_NU_BENCH(dittus_boelter, db_inline, TH_NU_DITTUS_BOELTER, rows::turbulent);
TH_NU_BENCH(sieder_tate, st_inline, TH_NU_SIEDER_TATE, rows::turbulent);
TH_NU_BENCH(petukhov, petukhov_inline, TH_NU_PETUKHOV, rows::turbulent);
TH_NU_BENCH(gnielinski, gnielinski_inline, TH_NU_GNIELINSKI, rows::turbulent);
TH_NU_BENCH(gnielinski_transition, gnielinski_transition_inline, TH_NU_GNIELINSKI_TRANSITION,
            rows::transition);
TH_NU_BENCH(liquid_metal_t, seban_shimazaki_inline, TH_NU_LIQUID_METAL, rows::liquid_metal);
TH_NU_BENCH(laminar_developed, laminar_developed_inline, TH_NU_LAMINAR_DEVELOPED, rows::laminar);
TH_NU_BENCH(hausen, hausen_inline, TH_NU_HAUSEN, rows::laminar);
TH_NU_BENCH(sieder_tate_laminar, sieder_tate_laminar_inline, TH_NU_SIEDER_TATE_LAMINAR, rows::laminar);
TH_NU_BENCH(shah, shah_inline, TH_NU_SHAH, rows::laminar);
TH_NU_BENCH(gnielinski_laminar, gnielinski_laminar_inline, TH_NU_GNIELINSKI_LAMINAR, rows::laminar);
BENCHMARK_CAPTURE(run_nusselt, nusselt_auto/api, TH_NU_AUTO, rows::turbulent);

#define TH_F_BENCH(pair, inline_runner, inline_fn, method)                       \
    BENCHMARK_CAPTURE(inline_runner, pair/inline, inline_fn);                   \
    BENCHMARK_CAPTURE(run_friction, pair/api, method);                          \
    BENCHMARK_CAPTURE(run_friction_array, pair/api_array, method)
TH_F_BENCH(haaland, run_inline_f, haaland_inline, TH_F_HAALAND);
TH_F_BENCH(swamee_jain, run_inline_f, swamee_jain_inline, TH_F_SWAMEE_JAIN);
TH_F_BENCH(churchill, run_inline_f, churchill_inline, TH_F_CHURCHILL);
BENCHMARK_CAPTURE(run_inline_f, churchill/inline_pow, churchill_pow_inline);
TH_F_BENCH(petukhov_f, run_inline_f, petukhov_friction_inline, TH_F_PETUKHOV);
TH_F_BENCH(laminar_f, run_inline_f_laminar, laminar_friction_inline, TH_F_LAMINAR);
// Colebrook: the exact solution inline (the baseline), and the iteration a
// spreadsheet would otherwise need.
BENCHMARK_CAPTURE(run_inline_f, colebrook/inline_lambert_w, colebrook_lambert_w_inline);
BENCHMARK_CAPTURE(run_inline_f, colebrook/inline_iteration, colebrook_iterative);
BENCHMARK_CAPTURE(run_friction, colebrook/api_lambert_w, TH_F_COLEBROOK);
BENCHMARK_CAPTURE(run_friction_array, colebrook/api_array, TH_F_COLEBROOK);
