// Inverse design (th_tube_length_for_outlet, th_tube_flow_for_outlet,
// th_tube_flow_for_duty): round trips, analytic answers, unreachable
// targets, bad input.
#include "test_tube_cases.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

using namespace tube_cases;
using th_test::record;
using th_test::rel_err;

namespace {

th_tube_result solve_ok(const th_tube_case &c) {
    th_tube_result r{};
    REQUIRE(th_test::success(th_tube_solve(&c, &r)));
    return r;
}

th_tube_case outside_case() {
    th_tube_case c = water_wall();
    c.wall.kind = TH_TUBE_WALL_OUTSIDE;
    c.wall.t_outside = 368.15;
    c.wall.h_outside = 4000.0;
    c.wall.k_wall = 16.0;
    c.wall.thickness = 0.0012;
    c.wall.rf_inside = 1e-4;
    return c;
}

}  // namespace

TEST_CASE("tube inverse: length for an outlet temperature round-trips", "[tube][inverse]") {
    // Source: definition of the inverse (forward solve at the answer gives
    // the target), for every wall condition, one-shot and marching.
    double worst = 0.0;
    for (int seg : {0, 20}) {
        th_tube_case c = water_wall();
        c.options.segments = seg;
        double len = 0.0;
        th_tube_result r{};
        REQUIRE(th_test::success(th_tube_length_for_outlet(&c, 330.0, &len, &r)));
        CHECK(r.t_out == Approx(330.0).margin(1e-7));
        th_tube_case k = c;
        k.geometry.length = len;
        const double back = solve_ok(k).t_out;
        worst = std::max(worst, std::fabs(back - 330.0));
        CHECK(std::fabs(back - 330.0) < 1e-7);
        // Cooling towards a cold wall.
        c.t_in = 350.0;
        c.wall.t_wall = 290.0;
        REQUIRE(th_test::success(th_tube_length_for_outlet(&c, 300.0, &len, &r)));
        k = c;
        k.geometry.length = len;
        worst = std::max(worst, std::fabs(solve_ok(k).t_out - 300.0));
        // Outside fluid.
        c = outside_case();
        c.options.segments = seg;
        REQUIRE(th_test::success(th_tube_length_for_outlet(&c, 340.0, &len, &r)));
        k = c;
        k.geometry.length = len;
        worst = std::max(worst, std::fabs(solve_ok(k).t_out - 340.0));
        // Uniform flux: straight from the enthalpy balance.
        c = water_wall();
        c.options.segments = seg;
        c.wall.kind = TH_TUBE_WALL_FLUX;
        c.wall.q_flux = 50000.0;
        REQUIRE(th_test::success(th_tube_length_for_outlet(&c, 320.0, &len, &r)));
        const double dh = water_h(320.0, c.p_in) - water_h(c.t_in, c.p_in);
        CHECK(len == Approx(c.mdot * dh / (50000.0 * pi * c.geometry.d)).epsilon(1e-13));
        k = c;
        k.geometry.length = len;
        worst = std::max(worst, std::fabs(solve_ok(k).t_out - 320.0));
    }
    CHECK(worst < 1e-7);
    record("tube inverse: length for outlet round trip [K]", "definition (forward solve)", worst, 1e-7, "absolute");
}

TEST_CASE("tube inverse: length with a length-independent coefficient is the log formula",
          "[tube][inverse][analytic]") {
    // Source: L = mdot cp/(h P) ln((Ts - Ti)/(Ts - To)) for constant h and
    // properties (th_length_for_outlet_ua, analytic).
    th_tube_case c = constant_props(995.0, 4180.0, 0.0008, 0.61);
    c.mdot = 0.3;
    c.options.method = TH_NU_DITTUS_BOELTER;
    const th_tube_result r0 = solve_ok(c);  // h does not depend on L here
    double len = 0.0, want = 0.0;
    REQUIRE(th_test::success(th_tube_length_for_outlet(&c, 340.0, &len, nullptr)));
    REQUIRE(th_length_for_outlet_ua(300.0, 340.0, 360.0, r0.h_mean * pi * 0.02, 0.3, 4180.0, &want) == TH_OK);
    CHECK(len == Approx(want).epsilon(1e-10));
    record("tube inverse: length vs log formula (constant h)", "analytic", rel_err(len, want), 1e-10);
}

TEST_CASE("tube inverse: mass flow for an outlet temperature or a duty round-trips",
          "[tube][inverse]") {
    // Source: definition of the inverse (forward solve at the answer).
    double worst_t = 0.0, worst_q = 0.0;
    for (int seg : {0, 10}) {
        th_tube_case c = water_wall();
        c.options.segments = seg;
        double m = 0.0;
        th_tube_result r{};
        REQUIRE(th_test::success(th_tube_flow_for_outlet(&c, 335.0, &m, &r)));
        th_tube_case k = c;
        k.mdot = m;
        worst_t = std::max(worst_t, std::fabs(solve_ok(k).t_out - 335.0));
        CHECK(r.t_out == Approx(335.0).margin(1e-7));
        REQUIRE(th_test::success(th_tube_flow_for_duty(&c, 45000.0, &m, &r)));
        k.mdot = m;
        worst_q = std::max(worst_q, rel_err(solve_ok(k).q, 45000.0));
        // Outside fluid, cooling.
        c = outside_case();
        c.options.segments = seg;
        c.t_in = 360.0;
        c.wall.t_outside = 285.0;
        REQUIRE(th_test::success(th_tube_flow_for_outlet(&c, 320.0, &m, &r)));
        k = c;
        k.mdot = m;
        worst_t = std::max(worst_t, std::fabs(solve_ok(k).t_out - 320.0));
        REQUIRE(th_test::success(th_tube_flow_for_duty(&c, -20000.0, &m, &r)));
        k.mdot = m;
        worst_q = std::max(worst_q, rel_err(solve_ok(k).q, -20000.0));
        // Flux: the flow from the enthalpy balance.
        c = water_wall();
        c.options.segments = seg;
        c.wall.kind = TH_TUBE_WALL_FLUX;
        c.wall.q_flux = 30000.0;
        REQUIRE(th_test::success(th_tube_flow_for_outlet(&c, 310.0, &m, &r)));
        k = c;
        k.mdot = m;
        worst_t = std::max(worst_t, std::fabs(solve_ok(k).t_out - 310.0));
    }
    CHECK(worst_t < 1e-7);
    CHECK(worst_q < 1e-7);
    record("tube inverse: flow for outlet round trip [K]", "definition (forward solve)", worst_t, 1e-7, "absolute");
    record("tube inverse: flow for duty round trip", "definition (forward solve)", worst_q, 1e-7);
}

TEST_CASE("tube inverse: the first guess may be far off", "[tube][inverse]") {
    // Source: bracket widening by a factor 4 per step (docs/tube-solve.md).
    th_tube_case c = water_wall();
    double a = 0.0, b = 0.0;
    REQUIRE(th_test::success(th_tube_length_for_outlet(&c, 330.0, &a, nullptr)));
    c.geometry.length = 1e-3;
    REQUIRE(th_test::success(th_tube_length_for_outlet(&c, 330.0, &b, nullptr)));
    CHECK(b == Approx(a).epsilon(1e-9));
    c.geometry.length = 5e4;  // the outlet would boil at this guess
    c.p_in = 1.5e5;
    c.wall.t_wall = 385.0;  // above t_sat(1.5 bar) = 384.5 K: a warning only
    REQUIRE(th_test::success(th_tube_length_for_outlet(&c, 330.0, &b, nullptr)));
    c.geometry.length = b;
    CHECK(solve_ok(c).t_out == Approx(330.0).margin(1e-7));
    c = water_wall();
    c.mdot = 1e-6;
    REQUIRE(th_test::success(th_tube_flow_for_outlet(&c, 330.0, &b, nullptr)));
    c.mdot = 100.0;
    double b2 = 0.0;
    REQUIRE(th_test::success(th_tube_flow_for_outlet(&c, 330.0, &b2, nullptr)));
    CHECK(b2 == Approx(b).epsilon(1e-9));
}

TEST_CASE("tube inverse: unreachable targets", "[tube][inverse][errors]") {
    // Source: the outlet approaches the wall / outside temperature and
    // never passes it (analytic); a flux fixes the duty; an outside fluid
    // caps the duty at P L dT_in / R_rest (analytic).
    th_tube_case c = water_wall();
    double v = -1.0;
    th_tube_result r{};
    r.t_out = -1.0;
    CHECK(th_tube_length_for_outlet(&c, c.wall.t_wall, &v, &r) == TH_ERR_UNREACHABLE);
    CHECK(th_tube_length_for_outlet(&c, 350.0, &v, &r) == TH_ERR_UNREACHABLE);
    CHECK(th_tube_length_for_outlet(&c, 280.0, &v, &r) == TH_ERR_UNREACHABLE);
    CHECK(th_tube_length_for_outlet(&c, c.t_in, &v, &r) == TH_ERR_UNREACHABLE);
    CHECK(th_tube_flow_for_outlet(&c, 350.0, &v, &r) == TH_ERR_UNREACHABLE);
    CHECK(th_tube_flow_for_duty(&c, -1000.0, &v, &r) == TH_ERR_UNREACHABLE);
    CHECK(th_tube_flow_for_duty(&c, 0.0, &v, &r) == TH_ERR_UNREACHABLE);
    // Water cannot be heated above saturation as a liquid.
    th_tube_case hot = c;
    hot.wall.t_wall = 450.0;
    CHECK(th_tube_length_for_outlet(&hot, 430.0, &v, &r) == TH_ERR_UNREACHABLE);
    // Flux: wrong side, and any duty.
    th_tube_case f = c;
    f.wall.kind = TH_TUBE_WALL_FLUX;
    f.wall.q_flux = 20000.0;
    CHECK(th_tube_length_for_outlet(&f, 280.0, &v, &r) == TH_ERR_UNREACHABLE);
    CHECK(th_tube_flow_for_outlet(&f, 280.0, &v, &r) == TH_ERR_UNREACHABLE);
    CHECK(th_tube_flow_for_duty(&f, 1000.0, &v, &r) == TH_ERR_UNREACHABLE);
    f.wall.q_flux = 0.0;
    CHECK(th_tube_length_for_outlet(&f, 300.0, &v, &r) == TH_ERR_UNREACHABLE);
    // Outside fluid: duty beyond the cap of the outer resistances.
    th_tube_case o = outside_case();
    const double r_rest = 1e-4 + 0.022 * std::log(0.0244 / 0.022) / (2.0 * 16.0) + (0.022 / 0.0244) / 4000.0;
    const double q_max = pi * 0.022 * 3.0 * (368.15 - 288.15) / r_rest;
    CHECK(th_tube_flow_for_duty(&o, 1.01 * q_max, &v, &r) == TH_ERR_UNREACHABLE);
    REQUIRE(th_test::success(th_tube_flow_for_duty(&o, 0.5 * q_max, &v, &r)));
    // Unreachable within the search range: a duty needing Re far above 1e8.
    th_tube_case big = water_wall();
    CHECK(th_tube_flow_for_duty(&big, 1e12, &v, &r) == TH_ERR_UNREACHABLE);
    CHECK(r.t_out != -1.0);  // written by the successful call above only
}

TEST_CASE("tube inverse: bad input", "[tube][inverse][errors]") {
    // Source: the C API contract (tubeheat.h).
    const double nan = std::numeric_limits<double>::quiet_NaN();
    th_tube_case c = water_wall();
    double v = -1.0;
    CHECK(th_tube_length_for_outlet(nullptr, 330.0, &v, nullptr) == TH_ERR_INPUT);
    CHECK(th_tube_length_for_outlet(&c, 330.0, nullptr, nullptr) == TH_ERR_INPUT);
    CHECK(th_tube_length_for_outlet(&c, nan, &v, nullptr) == TH_ERR_INPUT);
    CHECK(th_tube_length_for_outlet(&c, -5.0, &v, nullptr) == TH_ERR_INPUT);
    CHECK(th_tube_flow_for_outlet(nullptr, 330.0, &v, nullptr) == TH_ERR_INPUT);
    CHECK(th_tube_flow_for_outlet(&c, 330.0, nullptr, nullptr) == TH_ERR_INPUT);
    CHECK(th_tube_flow_for_outlet(&c, nan, &v, nullptr) == TH_ERR_INPUT);
    CHECK(th_tube_flow_for_duty(nullptr, 1000.0, &v, nullptr) == TH_ERR_INPUT);
    CHECK(th_tube_flow_for_duty(&c, 1000.0, nullptr, nullptr) == TH_ERR_INPUT);
    CHECK(th_tube_flow_for_duty(&c, nan, &v, nullptr) == TH_ERR_INPUT);
    // The first guess must be a valid value.
    c.geometry.length = 0.0;
    CHECK(th_tube_length_for_outlet(&c, 330.0, &v, nullptr) == TH_ERR_INPUT);
    c = water_wall();
    c.mdot = 0.0;
    CHECK(th_tube_flow_for_outlet(&c, 330.0, &v, nullptr) == TH_ERR_INPUT);
    CHECK(th_tube_flow_for_duty(&c, 1000.0, &v, nullptr) == TH_ERR_INPUT);
    c = water_wall();
    c.options.method = 99;
    CHECK(th_tube_length_for_outlet(&c, 330.0, &v, nullptr) == TH_ERR_METHOD);
    CHECK(v == -1.0);
}
