// bench_entry.cpp - the laminar entry region through the C API, each next to
// a baseline written inline here (the Shah fits of the same thermal-entry
// solution, the VDI composite for the combined entry, Shah's apparent
// friction correlation), fed the same inputs, so the cost of the exact
// series and of the marched tables shows as a ratio measured in the same
// run. Report with bench/ratios.py.
//
// Pairs (run_x/<pair>/<variant>):
//   thermal_local, thermal_mean   exact series vs Shah (1975) fits
//   combined_cached               table lookup (Pr fixed, table in the LRU
//                                 cache) vs the VDI composite
//   combined_uncached             a full march per call (default resolution,
//                                 th_entry_march_study) vs the composite
//   friction_app                  (f_app Re) table vs Shah (1978)
#include "tubeheat.h"

#include <benchmark/benchmark.h>

#include <array>
#include <cmath>

namespace {

constexpr std::size_t n_inputs = 256;
struct inputs {
    std::array<double, n_inputs> x{}, xp{};
    inputs() {
        for (std::size_t i = 0; i < n_inputs; ++i) {
            // x* from 1e-5 to 1 (log-spread), shuffled
            x[i] = 1e-5 * std::pow(1e5, double((i * 37) % n_inputs) / n_inputs);
            xp[i] = 1e-5 * std::pow(1e6, double((i * 53) % n_inputs) / n_inputs);
        }
    }
};
const inputs in;

// ---- baselines -------------------------------------------------------------
double shah_local_t(double x) {
    return x <= 1e-3 ? 1.077 / std::cbrt(x) - 0.7
                     : 3.657 + 6.874 * std::pow(1e3 * x, -0.488) * std::exp(-57.2 * x);
}
double shah_mean_t(double x) {
    const double c = std::cbrt(x);
    return x <= 0.005 ? 1.615 / c - 0.7 : (x < 0.03 ? 1.615 / c - 0.2 : 3.657 + 0.0499 / x);
}
double vdi_mean_t(double x, double pr) {
    const double z = 1.0 / x;
    const double a = 1.615 * std::cbrt(z) - 0.7;
    const double b = std::pow(2.0 / (1.0 + 22.0 * pr), 1.0 / 6.0) * std::sqrt(z);
    return std::cbrt(3.66 * 3.66 * 3.66 + 0.343 + a * a * a + b * b * b);
}
double shah_fapp(double xp) {
    const double s = 3.44 / std::sqrt(xp);
    return 4.0 * (s + (1.25 / (4.0 * xp) + 16.0 - s) / (1.0 + 0.00021 / (xp * xp)));
}

void run_inline_x(benchmark::State &st, double (*f)(double)) {
    std::size_t i = 0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(f(in.x[i]));
        i = (i + 1) % n_inputs;
    }
}
void run_thermal(benchmark::State &st, int avg) {
    std::size_t i = 0;
    double nu = 0;
    for (auto _ : st) {
        th_thermal_entry_nusselt(in.x[i], TH_WALL_T, avg, &nu);
        benchmark::DoNotOptimize(nu);
        i = (i + 1) % n_inputs;
    }
}
void run_inline_combined(benchmark::State &st, double pr) {
    std::size_t i = 0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(vdi_mean_t(in.x[i], pr));
        i = (i + 1) % n_inputs;
    }
}
void run_combined(benchmark::State &st, double pr) {
    double nu = 0;
    th_combined_entry_nusselt(1e-3, pr, TH_WALL_T, TH_MEAN, &nu);  // fill the cache
    std::size_t i = 0;
    for (auto _ : st) {
        th_combined_entry_nusselt(in.x[i], pr, TH_WALL_T, TH_MEAN, &nu);
        benchmark::DoNotOptimize(nu);
        i = (i + 1) % n_inputs;
    }
}
void run_combined_uncached(benchmark::State &st, double pr) {
    double nu = 0;
    std::size_t i = 0;
    for (auto _ : st) {
        th_entry_march_study(TH_ENTRY_COMBINED, in.x[i], pr, TH_WALL_T, TH_MEAN, 200, 0.02, &nu);
        benchmark::DoNotOptimize(nu);
        i = (i + 1) % n_inputs;
    }
}
void run_inline_friction(benchmark::State &st, int) {
    std::size_t i = 0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(shah_fapp(in.xp[i]));
        i = (i + 1) % n_inputs;
    }
}
void run_friction(benchmark::State &st, int) {
    double f = 0;
    th_combined_entry_friction(1e-3, &f);  // build the table once
    std::size_t i = 0;
    for (auto _ : st) {
        th_combined_entry_friction(in.xp[i], &f);
        benchmark::DoNotOptimize(f);
        i = (i + 1) % n_inputs;
    }
}

}  // namespace

BENCHMARK_CAPTURE(run_inline_x, thermal_local/inline_shah, shah_local_t);
BENCHMARK_CAPTURE(run_thermal, thermal_local/api_series, TH_LOCAL);
BENCHMARK_CAPTURE(run_inline_x, thermal_mean/inline_shah, shah_mean_t);
BENCHMARK_CAPTURE(run_thermal, thermal_mean/api_series, TH_MEAN);
BENCHMARK_CAPTURE(run_inline_combined, combined_cached/inline_vdi, 0.7);
BENCHMARK_CAPTURE(run_combined, combined_cached/api_table, 0.7);
BENCHMARK_CAPTURE(run_inline_combined, combined_uncached/inline_vdi, 0.7);
// ns like the others, so bench/ratios.py compares like with like.
BENCHMARK_CAPTURE(run_combined_uncached, combined_uncached/api_march, 0.7)->Iterations(20);
BENCHMARK_CAPTURE(run_inline_friction, friction_app/inline_shah, 0);
BENCHMARK_CAPTURE(run_friction, friction_app/api_table, 0);
