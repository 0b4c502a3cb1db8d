// Friction factors and pressure drop against python3-fluids and analytic
// limits.
#include "th_test.hpp"

#include <cmath>
#include <limits>

using th_test::read_table;
using th_test::record;
using th_test::rel_err;

TEST_CASE("friction: methods against python3-fluids over Re x eps/D grid", "[friction][reference]") {
    // Source: tests/reference/friction_fluids.csv, python3-fluids (Debian),
    // Colebrook solved with mpmath (tol=0).
    const auto t = read_table("friction_fluids.csv");
    struct m { int id; const char *col; double tol; const char *check; };
    const m methods[] = {
        // fluids' Colebrook is off by up to 2.5e-11 at the rough, high-Re
        // corner (its residual there is 4.7e-11; ours 5e-16): see colebrook_mp.
        {TH_F_COLEBROOK, "colebrook", 5e-11, "Colebrook (Lambert W) vs python3-fluids Colebrook"},
        {TH_F_COLEBROOK, "colebrook_mp", 2e-15, "Colebrook (Lambert W) vs 40-digit mpmath root"},
        {TH_F_HAALAND, "haaland", 1e-12, "Haaland vs python3-fluids Haaland"},
        // fluids writes Swamee-Jain's 5.74 as 6.97^0.9 = 5.7397: 2e-6 apart.
        {TH_F_SWAMEE_JAIN, "swamee_jain", 5e-6, "Swamee-Jain vs python3-fluids Swamee_Jain_1976"},
        {TH_F_CHURCHILL, "churchill", 1e-12, "Churchill 1977 vs python3-fluids Churchill_1977"},
    };
    for (const auto &mm : methods) {
        double worst = 0.0;
        for (const auto &r : t.rows) {
            double f = 0.0;
            const int s = th_friction_factor(mm.id, r[t.col("re")], r[t.col("rel_roughness")], &f);
            REQUIRE(th_test::success(s));
            worst = std::max(worst, rel_err(f, r[t.col(mm.col)]));
        }
        INFO(mm.check << ": worst relative error " << worst);
        CHECK(worst < mm.tol);
        record(mm.check, "python3-fluids 1.0.22 / python3-mpmath (tests/reference/friction_fluids.csv, 56 points)", worst, mm.tol);
    }
}

TEST_CASE("friction: Churchill across all regimes against python3-fluids", "[friction][reference]") {
    // Source: tests/reference/churchill_fluids.csv (python3-fluids).
    const auto t = read_table("churchill_fluids.csv");
    double worst = 0.0;
    for (const auto &r : t.rows) {
        double f = 0.0;
        REQUIRE(th_test::success(th_friction_factor(TH_F_CHURCHILL, r[0], r[1], &f)));
        worst = std::max(worst, rel_err(f, r[2]));
    }
    CHECK(worst < 1e-12);
    record("Churchill 1977, Re 1..1e8", "python3-fluids 1.0.22 (tests/reference/churchill_fluids.csv)", worst, 1e-12);
}

TEST_CASE("friction: laminar is 64/Re", "[friction][analytic]") {
    // Source: Hagen-Poiseuille, analytic.
    for (double re : {1.0, 10.0, 500.0, 2299.0}) {
        double f = 0.0;
        REQUIRE(th_friction_factor(TH_F_LAMINAR, re, 0.0, &f) == TH_OK);
        CHECK(f == Approx(64.0 / re).epsilon(1e-15));
    }
    // Churchill tends to 64/Re in laminar flow (analytic limit of the form).
    double f = 0.0;
    REQUIRE(th_friction_factor(TH_F_CHURCHILL, 100.0, 0.0, &f) == TH_OK);
    CHECK(f == Approx(0.64).epsilon(1e-6));
}

TEST_CASE("friction: Colebrook satisfies its own equation where e^z overflows", "[friction][analytic]") {
    // Source: the Colebrook (1939) equation itself, residual check; the
    // range corner Re 1e8, eps/D 0.05 takes the log-space branch.
    for (double re : {2300.0, 4000.0, 1e6, 1e8}) {
        for (double rr : {0.0, 1e-3, 0.02, 0.05}) {
            double f = 0.0;
            REQUIRE(th_test::success(th_friction_factor(TH_F_COLEBROOK, re, rr, &f)));
            REQUIRE(std::isfinite(f));
            const double lhs = 1.0 / std::sqrt(f);
            const double rhs = -2.0 * std::log10(rr / 3.7 + 2.51 / (re * std::sqrt(f)));
            CHECK(std::fabs(lhs - rhs) / lhs < 1e-13);
        }
    }
}

TEST_CASE("friction: Colebrook is continuous across the log-space switch", "[friction][analytic]") {
    // Source: analytic (the solution of the Colebrook equation is smooth in
    // Re); z = a/(bc) - ln(bc) crosses 700 near Re 1.26e7 at eps/D = 0.05.
    double prev = 0.0;
    for (double re = 1.0e7; re < 1.6e7; re *= 1.001) {
        double f = 0.0;
        REQUIRE(th_test::success(th_friction_factor(TH_F_COLEBROOK, re, 0.05, &f)));
        if (prev > 0.0) CHECK(std::fabs(f - prev) / prev < 1e-6);
        prev = f;
    }
}

TEST_CASE("friction: range warnings and regime borders", "[friction][range]") {
    double f = 0.0;
    // Colebrook's published range starts at Re 4000 (common practice).
    CHECK(th_friction_factor(TH_F_COLEBROOK, 3000.0, 0.0, &f) == TH_WARN_RANGE);
    CHECK(f > 0.0);
    CHECK(th_friction_factor(TH_F_LAMINAR, 2300.0, 0.0, &f) == TH_WARN_RANGE);
    CHECK(th_friction_factor(TH_F_PETUKHOV, 1e5, 1e-3, &f) == TH_WARN_RANGE);
    CHECK(th_friction_factor(TH_F_SWAMEE_JAIN, 1e5, 0.02, &f) == TH_WARN_RANGE);
    // Auto: documented jump at Re 2300 from 64/Re to Colebrook (analytic
    // laminar value vs the turbulent law; the jump is physical, not a bug).
    double below = 0.0, above = 0.0;
    REQUIRE(th_friction_factor(TH_F_AUTO, 2299.999, 0.0, &below) == TH_OK);
    REQUIRE(th_friction_factor(TH_F_AUTO, 2300.0, 0.0, &above) == TH_WARN_RANGE);
    CHECK(below == Approx(64.0 / 2299.999));
    CHECK(above > below);
    REQUIRE(th_friction_factor(TH_F_AUTO, 4000.0, 0.0, &above) == TH_OK);
}

TEST_CASE("friction: Petukhov smooth-tube fit", "[friction][reference]") {
    // Source: Petukhov (1970) formula; vs Colebrook smooth within 2 % for
    // 1e4..5e6 (published comparison, from memory: "within 2 %").
    double worst = 0.0;
    for (double re = 1e4; re <= 5e6; re *= 2.0) {
        double fp = 0.0, fc = 0.0;
        REQUIRE(th_friction_factor(TH_F_PETUKHOV, re, 0.0, &fp) == TH_OK);
        REQUIRE(th_friction_factor(TH_F_COLEBROOK, re, 0.0, &fc) == TH_OK);
        worst = std::max(worst, rel_err(fp, fc));
    }
    CHECK(worst < 0.02);
    record("Petukhov smooth f vs Colebrook smooth, Re 1e4..5e6", "Petukhov (1970) stated agreement (from memory)", worst, 0.02);
}

TEST_CASE("friction: bad input never gives a value", "[friction][input]") {
    const double nan = std::numeric_limits<double>::quiet_NaN();
    const double inf = std::numeric_limits<double>::infinity();
    double f = -1.0;
    for (int m = 0; m < TH_F_METHOD_COUNT; ++m) {
        CHECK(th_friction_factor(m, 0.0, 0.0, &f) == TH_ERR_INPUT);
        CHECK(th_friction_factor(m, -1.0, 0.0, &f) == TH_ERR_INPUT);
        CHECK(th_friction_factor(m, nan, 0.0, &f) == TH_ERR_INPUT);
        CHECK(th_friction_factor(m, inf, 0.0, &f) == TH_ERR_INPUT);
        CHECK(th_friction_factor(m, 1e5, -1e-3, &f) == TH_ERR_INPUT);
        CHECK(th_friction_factor(m, 1e5, 1.0, &f) == TH_ERR_INPUT);
        CHECK(th_friction_factor(m, 1e5, 0.0, nullptr) == TH_ERR_INPUT);
    }
    CHECK(f == -1.0);  // untouched on error
    CHECK(th_friction_factor(99, 1e5, 0.0, &f) == TH_ERR_METHOD);
    CHECK(th_friction_factor(-1, 1e5, 0.0, &f) == TH_ERR_METHOD);
    double dp = 0.0;
    CHECK(th_pressure_drop(0.02, 1.0, 0.0, 1000.0, 1.0, &dp) == TH_ERR_INPUT);
    CHECK(th_pressure_drop(-0.02, 1.0, 0.01, 1000.0, 1.0, &dp) == TH_ERR_INPUT);
    CHECK(th_pressure_drop_mass_flow(TH_F_AUTO, 0.1, 0.02, 1.0, 0.0, 1000.0, 0.0, nullptr, &dp) == TH_ERR_INPUT);
}

TEST_CASE("friction: pressure drop is Darcy-Weisbach", "[friction][analytic]") {
    // Source: Darcy-Weisbach equation, analytic; mass-flow form checked
    // against the velocity form with u = 4 mdot/(rho pi D^2).
    double dp = 0.0;
    REQUIRE(th_pressure_drop(0.02, 10.0, 0.05, 1000.0, 2.0, &dp) == TH_OK);
    CHECK(dp == Approx(0.02 * 200.0 * 1000.0 * 4.0 / 2.0));
    const double mdot = 0.5, d = 0.025, rho = 998.0, mu = 1.0e-3, len = 12.0;
    const double u = 4.0 * mdot / (rho * M_PI * d * d);
    double f = 0.0, dp2 = 0.0;
    REQUIRE(th_pressure_drop_mass_flow(TH_F_COLEBROOK, mdot, d, len, 1e-4, rho, mu, &f, &dp2) == TH_OK);
    double re = 0.0, f_ref = 0.0;
    REQUIRE(th_reynolds(rho, u, d, mu, &re) == TH_OK);
    REQUIRE(th_friction_factor(TH_F_COLEBROOK, re, 1e-4, &f_ref) == TH_OK);
    CHECK(f == Approx(f_ref).epsilon(1e-14));
    CHECK(dp2 == Approx(f_ref * len / d * rho * u * u / 2.0).epsilon(1e-13));
}

TEST_CASE("friction: method names", "[friction][names]") {
    // Source: published method names (Colebrook 1939, Haaland 1983, ...).
    int m = -1;
    CHECK(th_friction_method_from_name("colebrook", &m) == TH_OK);
    CHECK(m == TH_F_COLEBROOK);
    CHECK(th_friction_method_from_name("SWAMEE_JAIN", &m) == TH_OK);
    CHECK(m == TH_F_SWAMEE_JAIN);
    CHECK(th_friction_method_from_name("Swamee Jain", &m) == TH_OK);
    CHECK(th_friction_method_from_name("moody", &m) == TH_ERR_METHOD);
    CHECK(th_friction_method_from_name(nullptr, &m) == TH_ERR_INPUT);
    for (int i = 0; i < TH_F_METHOD_COUNT; ++i) {
        const char *n = th_friction_method_name(i);
        REQUIRE(n != nullptr);
        int back = -1;
        CHECK(th_friction_method_from_name(n, &back) == TH_OK);
        CHECK(back == i);
    }
    CHECK(th_friction_method_name(TH_F_METHOD_COUNT) == nullptr);
}
