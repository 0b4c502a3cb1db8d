// Regression tests for defects the fuzzer (tests/fuzz/) found in the entry
// functions. The expected behaviour is the output contract at the top of
// lib/include/tubeheat.h: never NaN or infinity with TH_OK/TH_WARN_RANGE,
// outputs untouched on error, TH_ERR_INTERNAL only for genuine internal
// failures. The ASan+UBSan stage of scripts/test runs these too, which is
// where undefined behaviour shows.
#include "th_test.hpp"

#include <cmath>
#include <limits>

namespace {
const double kDenormMin = std::numeric_limits<double>::denorm_min();
constexpr double kSentinel = -12345.678;
}  // namespace

// Found by the fuzzer: x* = x/(D Re Pr) overflowed to infinity for a
// subnormal Re (and 0/0 gave NaN) and was written with TH_WARN_RANGE.
// Fixed in regime_entry.cpp (x* now goes through th::checked()).
// Source: tubeheat.h output contract (no NaN/inf with a success code).
TEST_CASE("robustness: th_entry_state never writes a non-finite x*", "[robustness][entry]") {
    struct args {
        int method;
        double re, pr, x_over_d;
    };
    const args cases[] = {
        {TH_ENTRY_DURST, 1.78e-312, 7.0, 50.0},  // x/(Re Pr) overflows
        {TH_ENTRY_AUTO, kDenormMin, 1e-10, 0.0}, // Re Pr underflows: 0/0
        {TH_ENTRY_COMMON, 1e-300, 1e-300, 1e10},
    };
    for (const args &a : cases) {
        th_entry_info info;
        info.x_star = kSentinel;
        const int st = th_entry_state(a.method, a.re, a.pr, a.x_over_d, TH_WALL_T, &info);
        INFO("Re " << a.re << ", Pr " << a.pr << ", x/D " << a.x_over_d << ", status " << st);
        if (TH_FAILED(st)) {
            CHECK(info.x_star == kSentinel);
        } else {
            CHECK(std::isfinite(info.x_star));
            CHECK(std::isfinite(info.x_fd_hydro_over_d));
            CHECK(std::isfinite(info.x_fd_thermal_over_d));
        }
    }
}

// Found by the fuzzer, OPEN (laminar_entry_march.cpp, stations()): for a
// finite Pr below ~5e-313 or above ~9e307 the number of marching stations
// is computed from an infinite logarithm and converted to int (undefined
// behaviour; UBSan: "inf is outside the range of representable values of
// type 'int'"); a release build then returns TH_ERR_INTERNAL. Expected: a
// defined outcome that is not an internal failure (TH_ERR_INPUT for a
// Prandtl number the march cannot represent, or a finite warned value).
// Source: tubeheat.h output contract and the meaning of TH_ERR_INTERNAL.
TEST_CASE("robustness: combined entry at extreme Pr", "[robustness][entry]") {
    const double prs[] = {kDenormMin, 1e-320, 1e308};
    for (double pr : prs) {
        INFO("Pr " << pr);
        double nu = kSentinel;
        int st = th_combined_entry_nusselt(0.01, pr, TH_WALL_T, TH_MEAN, &nu);
        CHECK(st != TH_ERR_INTERNAL);
        if (!TH_FAILED(st)) CHECK((std::isfinite(nu) && nu > 0.0));
        nu = kSentinel;
        st = th_entry_march_study(TH_ENTRY_COMBINED, 0.01, pr, TH_WALL_T, TH_MEAN, 40, 0.02, &nu);
        CHECK(st != TH_ERR_INTERNAL);
        if (!TH_FAILED(st)) CHECK((std::isfinite(nu) && nu > 0.0));
    }
}

// Found by the fuzzer's status survey, OPEN (laminar_entry_march.cpp): the
// header accepts any Pr > 0 for the combined entry (TH_WARN_RANGE outside
// 0.5 .. 1e4), but for Pr = 1e-3 and below with a uniform wall temperature
// the march ends in a non-finite Nu and the call returns TH_ERR_INTERNAL
// (Pr = 1e-2 and 1e-3 with TH_WALL_H still give warned values). The
// thermal-entry march of th_entry_march_study (parabolic velocity, so Nu
// should not depend on Pr at all) fails the same way at Pr = 1e-3.
// Expected: a warned finite value, or TH_ERR_INPUT if the method does not
// apply.
// Source: tubeheat.h (combined entry section; meaning of TH_ERR_INTERNAL).
TEST_CASE("robustness: combined entry at small Pr", "[robustness][entry]") {
    for (double pr : {1e-3, 1e-4, 1e-6}) {
        for (int wall : {TH_WALL_T, TH_WALL_H}) {
            INFO("Pr " << pr << ", wall " << wall);
            double nu = kSentinel;
            const int st = th_combined_entry_nusselt(0.01, pr, wall, TH_MEAN, &nu);
            CHECK(st != TH_ERR_INTERNAL);
            if (!TH_FAILED(st)) CHECK((std::isfinite(nu) && nu > 0.0));
        }
    }
    double nu = kSentinel;
    const int st =
        th_entry_march_study(TH_ENTRY_THERMAL, 0.01, 1e-3, TH_WALL_T, TH_MEAN, 40, 0.02, &nu);
    CHECK(st != TH_ERR_INTERNAL);
    if (!TH_FAILED(st)) CHECK((std::isfinite(nu) && nu > 0.0));
}
