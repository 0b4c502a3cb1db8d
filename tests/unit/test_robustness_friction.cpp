// Regression tests for defects the fuzzer (tests/fuzz/) found in the
// friction functions. Expected behaviour: the output contract of
// lib/include/tubeheat.h and the meaning of the result (a Darcy friction
// factor is positive).
#include "th_test.hpp"

#include <cmath>
#include <limits>

namespace {
const double kDenormMin = std::numeric_limits<double>::denorm_min();
constexpr double kSentinel = -12345.678;
}  // namespace

// Found by the fuzzer: Haaland and Swamee-Jain returned f = 0 with
// TH_WARN_RANGE for a subnormal Re (6.9/Re overflows, 1/t^2 underflows to
// 0). Fixed in friction.cpp: a non-positive factor is TH_ERR_INPUT.
// Source: tubeheat.h (f is the Darcy friction factor; th_pressure_drop
// itself requires f > 0).
TEST_CASE("robustness: friction factor is positive or an error at subnormal Re",
          "[robustness][friction]") {
    for (int method = 0; method < TH_F_METHOD_COUNT; ++method) {
        for (double re : {kDenormMin, 1e-310, 1e-300}) {
            INFO("method " << method << ", Re " << re);
            double f = kSentinel;
            const int st = th_friction_factor(method, re, kDenormMin, &f);
            if (TH_FAILED(st))
                CHECK(f == kSentinel);
            else
                CHECK((std::isfinite(f) && f > 0.0));
            double f2 = kSentinel, dp = kSentinel;
            // mdot so small that Re is subnormal.
            const int st2 = th_pressure_drop_mass_flow(method, 1e-318, 0.02, 1.0, 0.0, 1000.0,
                                                       1e-3, &f2, &dp);
            if (TH_FAILED(st2)) {
                CHECK(f2 == kSentinel);
                CHECK(dp == kSentinel);
            } else {
                CHECK((std::isfinite(f2) && f2 > 0.0));
                CHECK(std::isfinite(dp));
            }
        }
    }
}
