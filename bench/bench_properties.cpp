// bench_properties.cpp - cost of the property calls: the full liquid-water
// set (rho, cp, mu, k, Pr from IF97 region 1, R12-08 and R15-11; h comes
// along) and the dry-air set, each next to one Dittus-Boelter evaluation
// written inline here (0.023 Re^0.8 Pr^0.4) and measured in the same run,
// so the ratio shows what a property call costs against the correlation it
// usually feeds. Names follow bench_core.cpp (<pair>/inline... is the
// baseline), so bench/ratios.py prints the table. Not a test.
#include "tubeheat.h"

#include <benchmark/benchmark.h>

#include <array>
#include <cmath>
#include <cstddef>

namespace {

constexpr std::size_t n_states = 256;

// States spread over the liquid range so branches and the math library see
// realistic variety: 274..622 K, pressures from just above saturation to
// 100 MPa; and Re, Pr for the baseline over the turbulent range.
struct water_states {
    std::array<double, n_states> t{}, p{}, re{}, pr{};
    water_states() {
        for (std::size_t i = 0; i < n_states; ++i) {
            t[i] = 274.0 + 348.0 * double((i * 37) % n_states) / n_states;
            double psat = 0.0;
            th_water_saturation_pressure(t[i], &psat);
            const double frac = double((i * 11) % n_states) / n_states;
            p[i] = std::fmax(1.01 * psat, 1e5) * std::pow(1e8 / std::fmax(1.01 * psat, 1e5), frac);
            re[i] = 1.2e4 * std::pow(400.0, double(i) / n_states);
            pr[i] = 0.7 * std::pow(100.0, double((i * 37) % n_states) / n_states);
        }
    }
};
const water_states states;

void run_inline_dittus_boelter(benchmark::State &st, const water_states &ws) {
    std::size_t i = 0;
    for (auto _ : st) {
        const double nu = 0.023 * std::pow(ws.re[i], 0.8) * std::pow(ws.pr[i], 0.4);
        benchmark::DoNotOptimize(nu);
        i = (i + 1) % n_states;
    }
    st.SetItemsProcessed(st.iterations());
}

void run_water_props(benchmark::State &st, const water_states &ws) {
    th_fluid_props out;
    std::size_t i = 0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(th_water_props(ws.t[i], ws.p[i], &out));
        benchmark::DoNotOptimize(out);
        i = (i + 1) % n_states;
    }
    st.SetItemsProcessed(st.iterations());
}

void run_water_density(benchmark::State &st, const water_states &ws) {
    double rho = 0.0;
    std::size_t i = 0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(th_water_density(ws.t[i], ws.p[i], &rho));
        benchmark::DoNotOptimize(rho);
        i = (i + 1) % n_states;
    }
    st.SetItemsProcessed(st.iterations());
}

void run_air_props(benchmark::State &st, const water_states &) {
    th_fluid_props out;
    std::size_t i = 0;
    for (auto _ : st) {
        // 250..1500 K at atmospheric pressure.
        const double t = 250.0 + 1250.0 * double(i) / n_states;
        benchmark::DoNotOptimize(th_air_props(t, 101325.0, &out));
        benchmark::DoNotOptimize(out);
        i = (i + 1) % n_states;
    }
    st.SetItemsProcessed(st.iterations());
}

}  // namespace

// <pair>/inline... is the baseline; <pair>/api... the library call.
BENCHMARK_CAPTURE(run_inline_dittus_boelter, water_props/inline_dittus_boelter, states);
BENCHMARK_CAPTURE(run_water_props, water_props/api_th_water_props, states);
BENCHMARK_CAPTURE(run_water_density, water_props/api_th_water_density, states);
BENCHMARK_CAPTURE(run_inline_dittus_boelter, air_props/inline_dittus_boelter, states);
BENCHMARK_CAPTURE(run_air_props, air_props/api_th_air_props, states);
