// test_tube_cases.hpp - cases shared by the whole-tube tests
// (test_tube_*.cpp). The scenarios are invented test data, not taken from
// any published problem; the REQUIREs here only check that a case is set
// up (source: the API contract in tubeheat.h). The reference values the
// tests compare against are named in each test file.
#ifndef TEST_TUBE_CASES_HPP
#define TEST_TUBE_CASES_HPP

#include "th_test.hpp"

#include <cmath>

namespace tube_cases {

constexpr double pi = 3.14159265358979323846;

// Water heated in a smooth copper-like tube by a wall held at 70 degC.
inline th_tube_case water_wall() {
    th_tube_case c;
    REQUIRE(th_tube_case_init(&c) == TH_OK);
    c.fluid.kind = TH_FLUID_WATER;
    c.t_in = 288.15;
    c.p_in = 3e5;
    c.mdot = 0.30;
    c.geometry.shape = TH_DUCT_CIRCLE;
    c.geometry.d = 0.022;
    c.geometry.length = 3.0;
    c.wall.kind = TH_TUBE_WALL_TEMPERATURE;
    c.wall.t_wall = 343.15;
    return c;
}

// A user fluid with constant properties (an oil-like liquid).
inline th_tube_case constant_props(double rho, double cp, double mu, double k) {
    th_tube_case c;
    REQUIRE(th_tube_case_init(&c) == TH_OK);
    REQUIRE(th_fluid_constant(&c.fluid, rho, cp, mu, k, 0) == TH_OK);
    c.t_in = 300.0;
    c.p_in = 2e5;
    c.mdot = 0.02;
    c.geometry.d = 0.02;
    c.geometry.length = 5.0;
    c.wall.kind = TH_TUBE_WALL_TEMPERATURE;
    c.wall.t_wall = 360.0;
    return c;
}

// A liquid whose properties vary strongly with temperature (a table of
// three points; invented values of a light-oil-like shape).
inline th_fluid oil_table() {
    th_fluid f{};
    f.kind = TH_FLUID_USER;
    f.gas = 0;
    f.n = 3;
    const double t[] = {293.15, 333.15, 373.15};
    const double rho[] = {870.0, 845.0, 820.0};
    const double cp[] = {1880.0, 2030.0, 2180.0};
    const double mu[] = {0.060, 0.012, 0.0040};
    const double k[] = {0.135, 0.132, 0.129};
    for (int i = 0; i < 3; ++i) {
        f.t[i] = t[i];
        f.rho[i] = rho[i];
        f.cp[i] = cp[i];
        f.mu[i] = mu[i];
        f.k[i] = k[i];
    }
    return f;
}

inline double lmtd(double a, double b) {
    double l = 0.0;
    REQUIRE(th_lmtd(a, b, &l) == TH_OK);
    return l;
}

inline double water_h(double t, double p) {
    double h = 0.0;
    REQUIRE(th_water_enthalpy(t, p, &h) == TH_OK);
    return h;
}

}  // namespace tube_cases

#endif
