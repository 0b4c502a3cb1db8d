// Dimensionless groups, geometry, regime and entry lengths.
#include "th_test.hpp"

#include <cmath>
#include <limits>

namespace {
const double qnan = std::numeric_limits<double>::quiet_NaN();
const double inf = std::numeric_limits<double>::infinity();
}  // namespace

TEST_CASE("groups: definitions", "[groups][analytic]") {
    // Source: the definitions of the groups (analytic identities).
    double re = 0.0, re2 = 0.0;
    REQUIRE(th_reynolds(998.0, 1.5, 0.02, 1.0e-3, &re) == TH_OK);
    CHECK(re == Approx(998.0 * 1.5 * 0.02 / 1.0e-3).epsilon(1e-15));
    // Mass-flow form equals the velocity form for a circle.
    const double mdot = 998.0 * 1.5 * M_PI * 0.02 * 0.02 / 4.0;
    REQUIRE(th_reynolds_mass_flow(mdot, 0.02, 1.0e-3, &re2) == TH_OK);
    CHECK(re2 == Approx(re).epsilon(1e-14));
    REQUIRE(th_reynolds_mass_flow_duct(mdot, 0.02, M_PI * 0.02 * 0.02 / 4.0, 1.0e-3, &re2) == TH_OK);
    CHECK(re2 == Approx(re).epsilon(1e-14));
    double pr = 0.0, pe = 0.0;
    REQUIRE(th_prandtl(4180.0, 1.0e-3, 0.6, &pr) == TH_OK);
    CHECK(pr == Approx(4180.0e-3 / 0.6));
    REQUIRE(th_peclet(1000.0, 7.0, &pe) == TH_OK);
    CHECK(pe == 7000.0);
}

TEST_CASE("groups: Graetz conventions", "[groups][analytic]") {
    // Source: Gz = (D/x) Re Pr and the mass-flow form mdot cp/(k x) =
    // (pi/4)(D/x) Re Pr (definitions); x* = 1/Gz.
    double gz = 0.0, gzm = 0.0, xs = 0.0;
    REQUIRE(th_graetz(1000.0, 5.0, 0.01, 0.5, TH_GRAETZ_DIAMETER, &gz) == TH_OK);
    CHECK(gz == Approx(100.0));
    REQUIRE(th_graetz(1000.0, 5.0, 0.01, 0.5, TH_GRAETZ_MASS_FLOW, &gzm) == TH_OK);
    CHECK(gzm == Approx(25.0 * M_PI));
    REQUIRE(th_inverse_graetz(0.5, 0.01, 1000.0, 5.0, &xs) == TH_OK);
    CHECK(xs * gz == Approx(1.0));
    // mdot cp /(k x) from primitive quantities gives the mass-flow form.
    const double rho = 900.0, u = 0.3, d = 0.01, mu = 0.05, cp = 2000.0, k = 0.14, x = 0.7;
    const double mdot = rho * u * M_PI * d * d / 4.0;
    double re = 0.0, p = 0.0;
    REQUIRE(th_reynolds(rho, u, d, mu, &re) == TH_OK);
    REQUIRE(th_prandtl(cp, mu, k, &p) == TH_OK);
    REQUIRE(th_graetz(re, p, d, x, TH_GRAETZ_MASS_FLOW, &gzm) == TH_OK);
    CHECK(gzm == Approx(mdot * cp / (k * x)).epsilon(1e-13));
    CHECK(th_graetz(1000.0, 5.0, 0.01, 0.5, 5, &gz) == TH_ERR_INPUT);
}

TEST_CASE("groups: hydraulic diameters", "[groups][analytic]") {
    // Source: D_h = 4A/P (definition): circle -> D, square -> side,
    // annulus -> D_o - D_i, rectangle 2ab/(a+b).
    double dh = 0.0;
    REQUIRE(th_hydraulic_diameter(M_PI * 0.25 * 0.04 * 0.04, M_PI * 0.04, &dh) == TH_OK);
    CHECK(dh == Approx(0.04));
    REQUIRE(th_hydraulic_diameter_rectangle(0.03, 0.03, &dh) == TH_OK);
    CHECK(dh == Approx(0.03));
    REQUIRE(th_hydraulic_diameter_rectangle(0.01, 0.04, &dh) == TH_OK);
    CHECK(dh == Approx(0.016));
    REQUIRE(th_hydraulic_diameter_annulus(0.02, 0.05, &dh) == TH_OK);
    CHECK(dh == Approx(0.03));
    CHECK(th_hydraulic_diameter_annulus(0.05, 0.02, &dh) == TH_ERR_INPUT);
    // A perimeter too short for the area violates the isoperimetric bound.
    CHECK(th_hydraulic_diameter(1.0, 1.0, &dh) == TH_ERR_INPUT);
    double h = 0.0, nu = 0.0;
    REQUIRE(th_h_from_nusselt(100.0, 0.6, 0.02, &h) == TH_OK);
    CHECK(h == Approx(3000.0));
    REQUIRE(th_nusselt_from_h(h, 0.02, 0.6, &nu) == TH_OK);
    CHECK(nu == Approx(100.0));
}

TEST_CASE("groups: bad input for every function", "[groups][input]") {
    double v = -5.0;
    CHECK(th_reynolds(0.0, 1.0, 0.01, 1e-3, &v) == TH_ERR_INPUT);
    CHECK(th_reynolds(1000.0, -1.0, 0.01, 1e-3, &v) == TH_ERR_INPUT);
    CHECK(th_reynolds(1000.0, 1.0, qnan, 1e-3, &v) == TH_ERR_INPUT);
    CHECK(th_reynolds(1000.0, 1.0, 0.01, 0.0, &v) == TH_ERR_INPUT);
    CHECK(th_reynolds(1000.0, 1.0, 0.01, 1e-3, nullptr) == TH_ERR_INPUT);
    CHECK(th_reynolds_mass_flow(-1.0, 0.01, 1e-3, &v) == TH_ERR_INPUT);
    CHECK(th_reynolds_mass_flow(1.0, inf, 1e-3, &v) == TH_ERR_INPUT);
    CHECK(th_reynolds_mass_flow_duct(1.0, 1.0, 1e-4, 1e-3, &v) == TH_ERR_INPUT);
    CHECK(th_prandtl(0.0, 1e-3, 0.6, &v) == TH_ERR_INPUT);
    CHECK(th_prandtl(4180.0, 1e-3, -0.6, &v) == TH_ERR_INPUT);
    CHECK(th_peclet(1e3, 0.0, &v) == TH_ERR_INPUT);
    CHECK(th_graetz(1e3, 5.0, 0.01, 0.0, TH_GRAETZ_DIAMETER, &v) == TH_ERR_INPUT);
    CHECK(th_inverse_graetz(0.1, 0.01, 1e3, qnan, &v) == TH_ERR_INPUT);
    CHECK(th_hydraulic_diameter(0.0, 1.0, &v) == TH_ERR_INPUT);
    CHECK(th_hydraulic_diameter_rectangle(0.01, 0.0, &v) == TH_ERR_INPUT);
    CHECK(th_h_from_nusselt(0.0, 0.6, 0.01, &v) == TH_ERR_INPUT);
    CHECK(th_nusselt_from_h(100.0, 0.01, inf, &v) == TH_ERR_INPUT);
    CHECK(v == -5.0);
    // Overflow of a product is bad input, never written as infinity.
    CHECK(th_reynolds(1e300, 1e300, 1.0, 1e-3, &v) == TH_ERR_INPUT);
    CHECK(v == -5.0);
}

TEST_CASE("regime: thresholds of common practice", "[regime]") {
    // Source: laminar Re < 2300, turbulent Re >= 1e4 (common practice);
    // at a threshold the higher regime applies (documented).
    int r = -1;
    REQUIRE(th_regime_of(2299.9, &r) == TH_OK);
    CHECK(r == TH_LAMINAR);
    REQUIRE(th_regime_of(2300.0, &r) == TH_OK);
    CHECK(r == TH_TRANSITIONAL);
    REQUIRE(th_regime_of(9999.9, &r) == TH_OK);
    CHECK(r == TH_TRANSITIONAL);
    REQUIRE(th_regime_of(1e4, &r) == TH_OK);
    CHECK(r == TH_TURBULENT);
    CHECK(std::string(th_regime_name(TH_TURBULENT)) == "turbulent");
    CHECK(th_regime_name(7) == nullptr);
    CHECK(th_regime_of(-1.0, &r) == TH_ERR_INPUT);
    CHECK(th_regime_of(qnan, &r) == TH_ERR_INPUT);
}

TEST_CASE("entry lengths: published laminar values", "[entry]") {
    double l = 0.0;
    // Source: 0.05 Re and 0.05 Re Pr (common practice).
    REQUIRE(th_entry_length_hydro(TH_ENTRY_COMMON, 1000.0, &l) == TH_OK);
    CHECK(l == Approx(50.0));
    REQUIRE(th_entry_length_thermal(TH_ENTRY_COMMON, 1000.0, 7.0, TH_WALL_T, &l) == TH_OK);
    CHECK(l == Approx(350.0));
    // Source: Shah & London (1978) 0.0335 Re Pr (T), 0.0430 Re Pr (H)
    // (from memory).
    REQUIRE(th_entry_length_thermal(TH_ENTRY_SHAH_LONDON, 1000.0, 7.0, TH_WALL_H, &l) == TH_OK);
    CHECK(l == Approx(0.0430 * 7000.0));
    REQUIRE(th_entry_length_thermal(TH_ENTRY_AUTO, 1000.0, 7.0, TH_WALL_T, &l) == TH_OK);
    CHECK(l == Approx(0.0335 * 7000.0));
    // Source: Durst et al. (2005): tends to 0.619 D as Re -> 0 (creeping
    // flow still needs a short entry) and to 0.0567 Re at high Re.
    REQUIRE(th_entry_length_hydro(TH_ENTRY_DURST, 1e-6, &l) == TH_OK);
    CHECK(l == Approx(0.619).epsilon(1e-6));
    REQUIRE(th_entry_length_hydro(TH_ENTRY_DURST, 2000.0, &l) == TH_OK);
    CHECK(l == Approx(0.0567 * 2000.0).epsilon(1e-3));
    // Turbulent: 10 D (common practice).
    REQUIRE(th_entry_length_hydro(TH_ENTRY_AUTO, 5e4, &l) == TH_OK);
    CHECK(l == 10.0);
    // A laminar method at turbulent Re warns.
    CHECK(th_entry_length_hydro(TH_ENTRY_COMMON, 5e4, &l) == TH_WARN_RANGE);
    CHECK(th_entry_length_thermal(TH_ENTRY_DURST, 500.0, 5.0, TH_WALL_T, &l) == TH_ERR_METHOD);
    CHECK(th_entry_length_hydro(42, 500.0, &l) == TH_ERR_METHOD);
    CHECK(th_entry_length_thermal(TH_ENTRY_AUTO, 500.0, 5.0, 3, &l) == TH_ERR_INPUT);
}

TEST_CASE("entry state: developing and developed", "[entry]") {
    // Source: Shah & London (1978) entry lengths (from memory), as above.
    th_entry_info e{};
    REQUIRE(th_entry_state(TH_ENTRY_AUTO, 1000.0, 10.0, 100.0, TH_WALL_T, &e) == TH_OK);
    CHECK(e.regime == TH_LAMINAR);
    CHECK(e.hydro_developed == 1);     // 100 > 56.5
    CHECK(e.thermal_developed == 0);   // 100 < 335
    CHECK(e.x_star == Approx(0.01));
    REQUIRE(th_entry_state(TH_ENTRY_AUTO, 5e4, 5.0, 5.0, TH_WALL_H, &e) == TH_OK);
    CHECK(e.regime == TH_TURBULENT);
    CHECK(e.hydro_developed == 0);
    REQUIRE(th_entry_state(TH_ENTRY_AUTO, 5e4, 5.0, inf, TH_WALL_H, &e) == TH_OK);
    CHECK(e.thermal_developed == 1);
    CHECK(std::isfinite(e.x_star));
    CHECK(th_entry_state(TH_ENTRY_AUTO, 5e4, 5.0, -1.0, TH_WALL_H, &e) == TH_ERR_INPUT);
    CHECK(th_entry_state(TH_ENTRY_AUTO, 5e4, 5.0, 1.0, TH_WALL_H, nullptr) == TH_ERR_INPUT);
}

TEST_CASE("status: messages and version", "[status]") {
    // Source: the API contract in tubeheat.h.
    CHECK(th_version() == TH_VERSION_NUMBER);
    CHECK(std::string(th_version_string()) == TH_VERSION_STRING);
    for (int s : {TH_OK, TH_WARN_RANGE, TH_ERR_INPUT, TH_ERR_METHOD, TH_ERR_NO_CONVERGENCE,
                  TH_ERR_UNREACHABLE, TH_ERR_STATE, TH_ERR_INTERNAL}) {
        REQUIRE(th_status_message(s) != nullptr);
        CHECK(std::string(th_status_message(s)) != "unknown status code");
    }
    CHECK(std::string(th_status_message(12345)) == "unknown status code");
    CHECK_FALSE(TH_FAILED(TH_WARN_RANGE));
    CHECK(TH_FAILED(TH_ERR_INPUT));
}
