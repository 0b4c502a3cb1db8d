// Liquid water over the whole range against python3-iapws (an independent
// implementation of IF97, R12-08 and R15-11), and the API's own
// consistency: single-property calls equal the property set, results are
// the same from several threads.
#include "th_test.hpp"

#include <algorithm>
#include <cmath>
#include <functional>
#include <string>
#include <thread>
#include <vector>

using th_test::read_table;
using th_test::record;
using th_test::rel_err;

namespace {
constexpr const char *kGridSource =
    "python3-iapws 1.5.2 IAPWS97 (tests/reference/water_iapws.csv, 128 "
    "states, 273.15-623.15 K, p_sat..100 MPa)";
}

TEST_CASE("water: property set against python3-iapws over region 1",
          "[properties][water][reference]") {
    // Source: tests/reference/water_iapws.csv from gen_water_iapws.py
    // (python3-iapws, Debian). Both sides evaluate the same published
    // equations in double precision, so they agree to rounding; 1e-9 leaves
    // room for a different order of summation and still catches any wrong
    // coefficient (the smallest IF97 term that matters changes results by
    // far more than 1e-9).
    const auto t = read_table("water_iapws.csv");
    REQUIRE(t.rows.size() >= 40);
    const double tol = 1e-9;
    struct col {
        const char *name;
        double th_fluid_props::*field;
        double worst;
    };
    col cols[] = {{"rho", &th_fluid_props::rho, 0.0},
                  {"cp", &th_fluid_props::cp, 0.0},
                  {"mu", &th_fluid_props::mu, 0.0},
                  {"k", &th_fluid_props::k, 0.0},
                  {"pr", &th_fluid_props::pr, 0.0}};
    double worst_h = 0.0;
    for (const auto &r : t.rows) {
        const double tk = r[t.col("t")], p = r[t.col("p")];
        th_fluid_props out;
        const int s = th_water_props(tk, p, &out);
        INFO("t = " << tk << " K, p = " << p << " Pa");
        REQUIRE(th_test::success(s));
        // Only the 0.01 K below the triple point warns.
        CHECK((s == TH_WARN_RANGE) == (tk < 273.16));
        for (auto &c : cols)
            c.worst = std::max(c.worst, rel_err(out.*(c.field), r[t.col(c.name)]));
        // h passes through zero near the triple point: compare it on the
        // scale of cp x 1 K so that a relative error there is meaningful.
        const double h_ref = r[t.col("h")];
        worst_h = std::max(worst_h, std::fabs(out.h - h_ref) /
                                        std::max(std::fabs(h_ref), 4000.0));
    }
    for (const auto &c : cols) {
        INFO(c.name << ": worst relative deviation " << c.worst);
        CHECK(c.worst < tol);
        record(std::string("water ") + c.name + "(t, p) over region 1",
               kGridSource, c.worst, tol);
    }
    INFO("h: worst deviation " << worst_h);
    CHECK(worst_h < tol);
    record("water h(t, p) over region 1 (relative to max(|h|, 4 kJ/kg))",
           kGridSource, worst_h, tol);
}

TEST_CASE("water: saturation line against python3-iapws",
          "[properties][water][reference]") {
    // Source: tests/reference/water_saturation_iapws.csv (python3-iapws
    // _PSat_T and _TSat_P, IF97 Eqs. 30 and 31), 273.15 K to 647 K.
    const auto t = read_table("water_saturation_iapws.csv");
    const double tol = 1e-12;  // closed-form equations, rounding only
    double worst_p = 0.0, worst_t = 0.0;
    for (const auto &r : t.rows) {
        double out = 0.0;
        if (r[0] == 0.0) {
            REQUIRE(th_water_saturation_pressure(r[1], &out) == TH_OK);
            worst_p = std::max(worst_p, rel_err(out, r[2]));
        } else {
            REQUIRE(th_water_saturation_temperature(r[1], &out) == TH_OK);
            worst_t = std::max(worst_t, rel_err(out, r[2]));
        }
    }
    CHECK(worst_p < tol);
    CHECK(worst_t < tol);
    record("water p_sat(T), 273.15-647 K",
           "python3-iapws 1.5.2 _PSat_T (tests/reference/water_saturation_iapws.csv)",
           worst_p, tol);
    record("water T_sat(p), 611.213 Pa-22 MPa",
           "python3-iapws 1.5.2 _TSat_P (tests/reference/water_saturation_iapws.csv)",
           worst_t, tol);
}

TEST_CASE("water: saturation functions invert each other",
          "[properties][water][analytic]") {
    // Source: IF97 Eq. 31 is the exact algebraic inverse of Eq. 30
    // (R7-97 Sect. 8.2), so a round trip returns the start to rounding.
    for (double tk : {273.16, 300.0, 373.15, 450.0, 550.0, 623.15, 647.0}) {
        double p = 0.0, back = 0.0;
        REQUIRE(th_water_saturation_pressure(tk, &p) == TH_OK);
        REQUIRE(th_water_saturation_temperature(p, &back) == TH_OK);
        CHECK(back == Approx(tk).epsilon(1e-12));
    }
    // The saturated liquid itself is a valid state: p = p_sat(t) exactly.
    for (double tk : {273.15, 300.0, 450.0, 623.15}) {
        double p = 0.0, rho = 0.0;
        REQUIRE(th_water_saturation_pressure(tk, &p) == TH_OK);
        CHECK(th_water_density(tk, p, &rho) == TH_OK);
        CHECK(th_water_density(tk, p * (1.0 - 1e-9), &rho) == TH_ERR_STATE);
    }
}

TEST_CASE("water: single-property functions equal the property set",
          "[properties][water]") {
    for (double tk : {273.15, 293.15, 350.0, 450.0, 600.0, 623.15}) {
        for (double p : {16.6e6, 30e6, 100e6}) {
            th_fluid_props all;
            const int s = th_water_props(tk, p, &all);
            REQUIRE(th_test::success(s));
            double v = 0.0;
            CHECK(th_water_density(tk, p, &v) == TH_OK);
            CHECK(v == all.rho);
            CHECK(th_water_cp(tk, p, &v) == TH_OK);
            CHECK(v == all.cp);
            CHECK(th_water_enthalpy(tk, p, &v) == TH_OK);
            CHECK(v == all.h);
            CHECK(th_water_viscosity(tk, p, &v) == s);
            CHECK(v == all.mu);
            CHECK(th_water_conductivity(tk, p, &v) == s);
            CHECK(v == all.k);
            CHECK(th_water_prandtl(tk, p, &v) == s);
            CHECK(v == all.pr);
            CHECK(all.pr == Approx(all.cp * all.mu / all.k).epsilon(1e-15));
            CHECK(std::string(all.range_note).empty() == (s == TH_OK));
        }
    }
}

TEST_CASE("water and air: same results from concurrent threads",
          "[properties][threads]") {
    // No mutable global state: four threads evaluating a sweep at once get
    // bit-identical results to a single-threaded pass.
    auto sweep = [](std::vector<double> &out) {
        out.clear();
        for (int i = 0; i <= 200; ++i) {
            const double tk = 280.0 + 1.7 * i;
            th_fluid_props w, a;
            if (th_water_props(tk, 20e6, &w) == TH_OK) {
                out.push_back(w.rho);
                out.push_back(w.k);
            }
            if (th_air_props(tk + 100.0, 101325.0, &a) == TH_OK) {
                out.push_back(a.cp);
                out.push_back(a.mu);
            }
        }
    };
    std::vector<double> serial;
    sweep(serial);
    REQUIRE(serial.size() > 400);
    std::vector<std::vector<double>> results(4);
    std::vector<std::thread> threads;
    for (auto &r : results) threads.emplace_back(sweep, std::ref(r));
    for (auto &th : threads) th.join();
    for (const auto &r : results) CHECK(r == serial);
}
