// Liquid water against the verification tables printed in the IAPWS
// releases themselves:
//   R7-97 (IAPWS-IF97, 2012 revision) Table 5 (region 1), Tables 35 and 36
//   (region 4); R12-08 Table 4 (viscosity correlating equation with
//   mu2 = 1); R15-11 the table for lambda2 = 0 and the table for its
//   industrial formulation (the two points that lie in region 1).
// The table values below were written from memory of the releases and are
// marked so; every one of them is reproduced to all printed digits by
// python3-iapws 1.5.2, an independent implementation (checked while
// writing this file), so a slip of memory would have shown up there.
// Tolerances are about half a unit in the last printed digit.
//
// Tables not used, and why:
//   R12-08 Table 5 and R15-11's table "including the critical enhancement"
//   check the scientific formulations at 647.35 K, near the critical point:
//   they need IAPWS-95 derivatives, are outside liquid region 1, and the
//   industrial forms used here omit (viscosity) or approximate
//   (conductivity) the enhancement there by design.
//   R15-11's industrial table also has points in IF97 regions 2 and 3
//   (steam, near-critical): outside the liquid range this library serves.
//
// The (T, rho) tables need the correlating equations directly, so this file
// includes the library's arithmetic headers; the (T, p) tables go through
// the public C API.
#include "th_test.hpp"

#include "../../lib/src/properties_water_if97.hpp"
#include "../../lib/src/properties_water_transport.hpp"

#include <algorithm>
#include <cmath>

using th_test::record;
using th_test::rel_err;

namespace {
constexpr const char *kIF97 = "IAPWS R7-97(2012) IF97";
constexpr const char *kR1208 = "IAPWS R12-08 (viscosity 2008)";
constexpr const char *kR1511 = "IAPWS R15-11 (thermal conductivity 2011)";
}  // namespace

TEST_CASE("water: IF97 region 1 verification table (R7-97 Table 5)",
          "[properties][water][iapws]") {
    // Source: IAPWS R7-97(2012), Table 5, "thermodynamic property values
    // calculated from Eq. (7) for selected temperatures and pressures"
    // (from memory; confirmed digit for digit by python3-iapws _Region1).
    // Units there: v m3/kg, h u kJ/kg, s cp kJ/(kg K), w m/s.
    struct row {
        double t, p_mpa, v, h, u, s, cp, w;
    };
    const row rows[] = {
        {300.0, 3.0, 0.100215168e-2, 0.115331273e3, 0.112324818e3,
         0.392294792, 0.417301218e1, 0.150773921e4},
        {300.0, 80.0, 0.971180894e-3, 0.184142828e3, 0.106448356e3,
         0.368563852, 0.401008987e1, 0.163469054e4},
        {500.0, 3.0, 0.120241800e-2, 0.975542239e3, 0.971934985e3,
         0.258041912e1, 0.465580682e1, 0.124071337e4},
    };
    // Nine significant digits printed: half a unit is <= 5e-9 relative.
    const double tol = 1e-8;
    double worst = 0.0;
    for (const auto &r : rows) {
        const auto g = th::if97::region1(r.t, r.p_mpa * 1e6);
        worst = std::max({worst, rel_err(g.v, r.v), rel_err(g.h / 1e3, r.h),
                          rel_err(g.u / 1e3, r.u), rel_err(g.s / 1e3, r.s),
                          rel_err(g.cp / 1e3, r.cp), rel_err(g.w, r.w)});
        // The same states through the public API (p in Pa, SI out).
        double rho = 0, cp = 0, h = 0;
        REQUIRE(th_water_density(r.t, r.p_mpa * 1e6, &rho) == TH_OK);
        REQUIRE(th_water_cp(r.t, r.p_mpa * 1e6, &cp) == TH_OK);
        REQUIRE(th_water_enthalpy(r.t, r.p_mpa * 1e6, &h) == TH_OK);
        worst = std::max({worst, rel_err(1.0 / rho, r.v),
                          rel_err(cp / 1e3, r.cp), rel_err(h / 1e3, r.h)});
    }
    INFO("worst relative deviation " << worst);
    CHECK(worst < tol);
    record("water IF97 region 1: v, h, u, s, cp, w at 3 states",
           std::string(kIF97) + " Table 5", worst, tol);
}

TEST_CASE("water: IF97 saturation pressure and temperature "
          "(R7-97 Tables 35 and 36)",
          "[properties][water][iapws]") {
    // Source: IAPWS R7-97(2012), Table 35 (p_s from Eq. 30) and Table 36
    // (T_s from Eq. 31) (from memory; confirmed digit for digit by
    // python3-iapws _PSat_T / _TSat_P).
    const double tol = 1e-8;  // nine significant digits printed
    double worst = 0.0;
    const double ps[][2] = {{300.0, 0.353658941e-2},
                            {500.0, 0.263889776e1},
                            {600.0, 0.123443146e2}};  // T [K], p_s [MPa]
    for (const auto &r : ps) {
        double p = 0.0;
        REQUIRE(th_water_saturation_pressure(r[0], &p) == TH_OK);
        worst = std::max(worst, rel_err(p / 1e6, r[1]));
    }
    const double ts[][2] = {{0.1, 0.372755919e3},
                            {1.0, 0.453035632e3},
                            {10.0, 0.584149488e3}};  // p [MPa], T_s [K]
    for (const auto &r : ts) {
        double t = 0.0;
        REQUIRE(th_water_saturation_temperature(r[0] * 1e6, &t) == TH_OK);
        worst = std::max(worst, rel_err(t, r[1]));
    }
    INFO("worst relative deviation " << worst);
    CHECK(worst < tol);
    record("water IF97 region 4: p_sat(T), T_sat(p) at 6 points",
           std::string(kIF97) + " Tables 35, 36", worst, tol);
}

TEST_CASE("water: viscosity correlating equation (R12-08 Table 4)",
          "[properties][water][iapws]") {
    // Source: IAPWS R12-08, Table 4, "sample points for computer-program
    // verification of the correlating equation, Eq. (10), with mu2 = 1"
    // (from memory; confirmed digit for digit by python3-iapws _Viscosity).
    // T [K], rho [kg/m3], mu [uPa s]. States outside the liquid range are
    // kept: they check the same equation.
    const double rows[][3] = {
        {298.15, 998.0, 889.735100},  {298.15, 1200.0, 1437.649467},
        {373.15, 1000.0, 307.883622}, {433.15, 1.0, 14.538324},
        {433.15, 1000.0, 217.685358}, {873.15, 1.0, 32.619287},
        {873.15, 100.0, 35.802262},   {873.15, 600.0, 77.430195},
        {1173.15, 1.0, 44.217245},    {1173.15, 100.0, 47.640433},
        {1173.15, 400.0, 64.154608}};
    // Six decimals printed; for 14.538324 half a unit is 3.4e-8 relative.
    const double tol = 5e-8;
    double worst = 0.0;
    for (const auto &r : rows) {
        const double mu = th::iapws_transport::viscosity(r[0], r[1]);
        worst = std::max(worst, rel_err(mu * 1e6, r[2]));
    }
    INFO("worst relative deviation " << worst);
    CHECK(worst < tol);
    record("water viscosity mu(T, rho), mu2 = 1, 11 points",
           std::string(kR1208) + " Table 4", worst, tol);
}

TEST_CASE("water: conductivity correlating equation, lambda2 = 0 (R15-11)",
          "[properties][water][iapws]") {
    // Source: IAPWS R15-11, table of "sample points for computer-program
    // verification of the correlating equation, Eq. (10), with
    // lambda2 = 0" (from memory; confirmed digit for digit by python3-iapws
    // _ThCond without phase data). T [K], rho [kg/m3], lambda [mW/(m K)].
    const double rows[][3] = {{298.15, 0.0, 18.4341883},
                              {298.15, 998.0, 607.712868},
                              {298.15, 1200.0, 799.038144},
                              {873.15, 0.0, 79.1034659}};
    const double tol = 1e-8;  // nine significant digits printed
    double worst = 0.0;
    for (const auto &r : rows) {
        const double k =
            th::iapws_transport::conductivity_background(r[0], r[1]);
        worst = std::max(worst, rel_err(k * 1e3, r[2]));
    }
    INFO("worst relative deviation " << worst);
    CHECK(worst < tol);
    record("water conductivity lambda0*lambda1 (T, rho), 4 points",
           std::string(kR1511) + ", table for lambda2 = 0", worst, tol);
}

TEST_CASE("water: conductivity, industrial formulation in region 1 (R15-11)",
          "[properties][water][iapws]") {
    // Source: IAPWS R15-11, table of sample points for the industrial
    // formulation (IF97 thermodynamics, Eq. 25 for the reference
    // derivative); its two IF97 region 1 points, given in (T, p)
    // (from memory; confirmed digit for digit by python3-iapws IAPWS97.k).
    // These are near saturation at 620 K, where lambda2 matters.
    const double rows[][3] = {{620.0, 20.0, 481.485195},
                              {620.0, 50.0, 545.038940}};
    const double tol = 1e-8;  // nine significant digits printed
    double worst = 0.0;
    for (const auto &r : rows) {
        double k = 0.0;
        REQUIRE(th_water_conductivity(r[0], r[1] * 1e6, &k) == TH_OK);
        worst = std::max(worst, rel_err(k * 1e3, r[2]));
    }
    INFO("worst relative deviation " << worst);
    CHECK(worst < tol);
    record("water conductivity, industrial form (T, p), 2 region-1 points",
           std::string(kR1511) + ", industrial-formulation table", worst,
           tol);
    // The critical enhancement is what these points exercise: without it
    // the value at 620 K, 20 MPa would be lower by more than 1 %.
    double rho = 0.0;
    REQUIRE(th_water_density(620.0, 20e6, &rho) == TH_OK);
    const double background =
        th::iapws_transport::conductivity_background(620.0, rho);
    CHECK(background * 1e3 < 481.485195 * 0.99);
}
