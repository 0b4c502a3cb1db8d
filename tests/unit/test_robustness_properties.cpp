// Regression tests for defects the fuzzer (tests/fuzz/) found in the
// property functions. Expected behaviour: the output contract of
// lib/include/tubeheat.h and the meaning of the result (a density is
// positive).
#include "th_test.hpp"

#include <cmath>
#include <limits>

// Found by the fuzzer, OPEN (properties_air.cpp): a subnormal pressure
// passes need_positive(p) and the ideal-gas density p/(R t) underflows to
// exactly 0, which th_air_props, th_air_density and th_fluid_props_at
// return with TH_OK. Expected: a positive density, or an error (e.g.
// TH_ERR_STATE: far below any pressure where the dilute-gas model is
// meant to be used).
// Source: tubeheat.h property section (rho [kg/m3] of an ideal gas is
// p/(R t) > 0 for p > 0).
TEST_CASE("robustness: air density at a subnormal pressure", "[robustness][properties]") {
    const double p = std::numeric_limits<double>::denorm_min();
    constexpr double kSentinel = -12345.678;
    double rho = kSentinel;
    int st = th_air_density(385.0, p, &rho);
    if (TH_FAILED(st))
        CHECK(rho == kSentinel);
    else
        CHECK(rho > 0.0);
    th_fluid_props props;
    props.rho = kSentinel;
    st = th_air_props(385.0, p, &props);
    if (TH_FAILED(st))
        CHECK(props.rho == kSentinel);
    else
        CHECK(props.rho > 0.0);
    th_fluid air{};
    air.kind = TH_FLUID_AIR;
    props.rho = kSentinel;
    st = th_fluid_props_at(&air, 385.0, p, &props);
    if (TH_FAILED(st))
        CHECK(props.rho == kSentinel);
    else
        CHECK(props.rho > 0.0);
}
