// Tube energy balance: analytic relations, limits, inverse round trips.
#include "th_test.hpp"

#include <cmath>
#include <limits>

TEST_CASE("energy: heat rate and LMTD", "[energy][analytic]") {
    // Source: q = mdot cp dT and LMTD = (a-b)/ln(a/b) (definitions); the
    // equal-ends limit is the arithmetic mean (analytic).
    double q = 0.0;
    REQUIRE(th_heat_rate(0.2, 4180.0, 293.15, 313.15, &q) == TH_OK);
    CHECK(q == Approx(0.2 * 4180.0 * 20.0));
    double l = 0.0;
    REQUIRE(th_lmtd(40.0, 10.0, &l) == TH_OK);
    CHECK(l == Approx(30.0 / std::log(4.0)).epsilon(1e-15));
    REQUIRE(th_lmtd(-40.0, -10.0, &l) == TH_OK);
    CHECK(l == Approx(-30.0 / std::log(4.0)).epsilon(1e-15));
    REQUIRE(th_lmtd(20.0, 20.0, &l) == TH_OK);
    CHECK(l == 20.0);
    REQUIRE(th_lmtd(20.0, 20.0 * (1 + 1e-9), &l) == TH_OK);
    CHECK(l == Approx(20.0 * (1 + 0.5e-9)).epsilon(1e-15));
    CHECK(th_lmtd(20.0, -5.0, &l) == TH_ERR_INPUT);
    CHECK(th_lmtd(0.0, 5.0, &l) == TH_ERR_INPUT);
}

TEST_CASE("energy: uniform surrounding temperature, exponential relation", "[energy][analytic]") {
    // Source: (Ts - To)/(Ts - Ti) = exp(-UA/(mdot cp)), analytic solution of
    // the tube energy balance; limits UA -> 0 (no change) and UA -> inf
    // (outlet at Ts); energy closure q = UA * LMTD.
    const double ti = 293.15, ts = 353.15, mdot = 0.05, cp = 4180.0, ua = 150.0;
    double to = 0.0;
    REQUIRE(th_outlet_temperature_ua(ti, ts, ua, mdot, cp, &to) == TH_OK);
    CHECK((ts - to) / (ts - ti) == Approx(std::exp(-ua / (mdot * cp))).epsilon(1e-14));
    double q = 0.0, l = 0.0;
    REQUIRE(th_heat_rate(mdot, cp, ti, to, &q) == TH_OK);
    REQUIRE(th_lmtd(ts - ti, ts - to, &l) == TH_OK);
    CHECK(q == Approx(ua * l).epsilon(1e-12));
    REQUIRE(th_outlet_temperature_ua(ti, ts, 0.0, mdot, cp, &to) == TH_OK);
    CHECK(to == ti);
    REQUIRE(th_outlet_temperature_ua(ti, ts, 1e9, mdot, cp, &to) == TH_OK);
    CHECK(to == Approx(ts).epsilon(1e-15));
    // Cooling works the same way.
    REQUIRE(th_outlet_temperature_ua(ts, ti, ua, mdot, cp, &to) == TH_OK);
    CHECK(to < ts);
    CHECK(to > ti);
}

TEST_CASE("energy: length for a target outlet round-trips", "[energy][analytic]") {
    // Source: inverse of the exponential relation (analytic).
    const double ti = 283.15, ts = 363.15, mdot = 0.08, cp = 4190.0, hp = 95.0;
    double len = 0.0, to = 0.0;
    REQUIRE(th_length_for_outlet_ua(ti, 330.0, ts, hp, mdot, cp, &len) == TH_OK);
    REQUIRE(th_outlet_temperature_ua(ti, ts, hp * len, mdot, cp, &to) == TH_OK);
    CHECK(to == Approx(330.0).epsilon(1e-13));
    CHECK(th_length_for_outlet_ua(ti, ts, ts, hp, mdot, cp, &len) == TH_ERR_UNREACHABLE);
    CHECK(th_length_for_outlet_ua(ti, 370.0, ts, hp, mdot, cp, &len) == TH_ERR_UNREACHABLE);
    CHECK(th_length_for_outlet_ua(ti, 280.0, ts, hp, mdot, cp, &len) == TH_ERR_UNREACHABLE);
    REQUIRE(th_length_for_outlet_ua(ti, ti, ts, hp, mdot, cp, &len) == TH_OK);
    CHECK(len == 0.0);
}

TEST_CASE("energy: uniform flux, linear rise and outlet wall temperature", "[energy][analytic]") {
    // Source: T_m(x) = T_i + q'' P x/(mdot cp); T_s = T_m + q''/h (analytic).
    const double ti = 300.0, qf = 20000.0, p = M_PI * 0.02, len = 3.0, mdot = 0.05, cp = 4180.0;
    double to = 0.0, tw = 0.0;
    REQUIRE(th_outlet_temperature_flux(ti, qf, p, len, mdot, cp, 2500.0, &to, &tw) == TH_OK);
    CHECK(to == Approx(ti + qf * p * len / (mdot * cp)));
    CHECK(tw == Approx(to + 8.0));
    double l2 = 0.0;
    REQUIRE(th_length_for_outlet_flux(ti, to, qf, p, mdot, cp, &l2) == TH_OK);
    CHECK(l2 == Approx(len).epsilon(1e-14));
    CHECK(th_length_for_outlet_flux(ti, ti - 5.0, qf, p, mdot, cp, &l2) == TH_ERR_UNREACHABLE);
    CHECK(th_length_for_outlet_flux(ti, ti + 5.0, 0.0, p, mdot, cp, &l2) == TH_ERR_UNREACHABLE);
    // Cooling so strong the fluid would pass absolute zero: inconsistent.
    CHECK(th_outlet_temperature_flux(ti, -1e9, p, len, mdot, cp, 2500.0, &to, &tw) == TH_ERR_INPUT);
}

TEST_CASE("energy: overall UA of a tube", "[energy][analytic]") {
    // Source: series thermal resistances of a cylindrical wall (analytic).
    const double hi = 2000.0, di = 0.02, d_o = 0.025, kw = 16.0, ho = 50.0, l = 4.0;
    double ua = 0.0;
    REQUIRE(th_ua_tube(hi, di, d_o, kw, ho, 0.0, 0.0, l, &ua) == TH_OK);
    const double r = 1 / (hi * M_PI * di * l) + std::log(d_o / di) / (2 * M_PI * kw * l) + 1 / (ho * M_PI * d_o * l);
    CHECK(ua == Approx(1 / r).epsilon(1e-14));
    // Thin wall, outside held at T_inf: only the inside film remains.
    REQUIRE(th_ua_tube(hi, di, di, 0.0, std::numeric_limits<double>::infinity(), 0.0, 0.0, l, &ua) == TH_OK);
    CHECK(ua == Approx(hi * M_PI * di * l).epsilon(1e-14));
    double ua_f = 0.0;
    REQUIRE(th_ua_tube(hi, di, d_o, kw, ho, 2e-4, 1e-4, l, &ua_f) == TH_OK);
    CHECK(ua_f < 1 / r);
    CHECK(th_ua_tube(hi, d_o, di, kw, ho, 0.0, 0.0, l, &ua) == TH_ERR_INPUT);
    CHECK(th_ua_tube(hi, di, d_o, 0.0, ho, 0.0, 0.0, l, &ua) == TH_ERR_INPUT);
    CHECK(th_ua_tube(hi, di, d_o, kw, ho, -1e-4, 0.0, l, &ua) == TH_ERR_INPUT);
}
