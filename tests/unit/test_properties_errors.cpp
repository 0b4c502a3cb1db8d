// Bad input and out-of-range states for every property function: the right
// code, and outputs left untouched on error; warnings write finite values.
// Source of the limits: the validity ranges stated in the releases (IAPWS
// R7-97 region 1 and 4, R12-08, R15-11) and in tubeheat.h's property
// section; the expected codes are the API contract of tubeheat.h.
#include "th_test.hpp"

#include <cmath>
#include <cstring>
#include <limits>
#include <string>

namespace {

const double kNaN = std::numeric_limits<double>::quiet_NaN();
const double kInf = std::numeric_limits<double>::infinity();
constexpr double kSentinel = -12345.678;

typedef int (*single_fn)(double, double, double *);
typedef int (*set_fn)(double, double, th_fluid_props *);

struct named_single {
    const char *name;
    single_fn fn;
};

const named_single kWaterSingles[] = {
    {"th_water_density", th_water_density},
    {"th_water_cp", th_water_cp},
    {"th_water_enthalpy", th_water_enthalpy},
    {"th_water_viscosity", th_water_viscosity},
    {"th_water_conductivity", th_water_conductivity},
    {"th_water_prandtl", th_water_prandtl}};

const named_single kAirSingles[] = {
    {"th_air_density", th_air_density},
    {"th_air_cp", th_air_cp},
    {"th_air_enthalpy", th_air_enthalpy},
    {"th_air_viscosity", th_air_viscosity},
    {"th_air_conductivity", th_air_conductivity},
    {"th_air_prandtl", th_air_prandtl}};

// Calls fn and checks the code, and that the output is untouched on error.
void expect_single(const named_single &f, double t, double p, int code) {
    double out = kSentinel;
    const int s = f.fn(t, p, &out);
    INFO(f.name << "(" << t << ", " << p << ")");
    CHECK(s == code);
    if (TH_FAILED(code)) {
        CHECK(out == kSentinel);
    } else {
        CHECK(std::isfinite(out));
    }
    if (TH_FAILED(code)) CHECK(f.fn(t, p, nullptr) == TH_ERR_INPUT);
}

void expect_set(const char *name, set_fn fn, double t, double p, int code) {
    th_fluid_props out;
    std::memset(&out, 0x5a, sizeof out);
    th_fluid_props before;
    std::memcpy(&before, &out, sizeof out);
    const int s = fn(t, p, &out);
    INFO(name << "(" << t << ", " << p << ")");
    CHECK(s == code);
    if (TH_FAILED(code)) {
        CHECK(std::memcmp(&out, &before, sizeof out) == 0);
    } else {
        CHECK(std::isfinite(out.rho));
        CHECK(std::isfinite(out.cp));
        CHECK(std::isfinite(out.mu));
        CHECK(std::isfinite(out.k));
        CHECK(std::isfinite(out.pr));
        CHECK(std::isfinite(out.h));
        REQUIRE(out.range_note != nullptr);
        CHECK(std::string(out.range_note).empty() == (code == TH_OK));
    }
}

// (t, p, expected code) for a fluid; every single-property function and
// the set function must agree.
struct state_case {
    double t, p;
    int code;
};

}  // namespace

TEST_CASE("properties: NULL output pointers", "[properties][errors]") {
    for (const auto &f : kWaterSingles) CHECK(f.fn(300.0, 1e5, nullptr) == TH_ERR_INPUT);
    for (const auto &f : kAirSingles) CHECK(f.fn(300.0, 1e5, nullptr) == TH_ERR_INPUT);
    CHECK(th_water_props(300.0, 1e5, nullptr) == TH_ERR_INPUT);
    CHECK(th_air_props(300.0, 1e5, nullptr) == TH_ERR_INPUT);
    CHECK(th_water_saturation_pressure(300.0, nullptr) == TH_ERR_INPUT);
    CHECK(th_water_saturation_temperature(1e5, nullptr) == TH_ERR_INPUT);
}

TEST_CASE("properties: water states and bad input", "[properties][errors][water]") {
    double psat_373 = 0.0;
    REQUIRE(th_water_saturation_pressure(373.15, &psat_373) == TH_OK);
    const state_case cases[] = {
        // bad numbers: TH_ERR_INPUT
        {kNaN, 1e5, TH_ERR_INPUT},
        {300.0, kNaN, TH_ERR_INPUT},
        {kInf, 1e5, TH_ERR_INPUT},
        {300.0, kInf, TH_ERR_INPUT},
        {-300.0, 1e5, TH_ERR_INPUT},
        {0.0, 1e5, TH_ERR_INPUT},
        {300.0, -1e5, TH_ERR_INPUT},
        {300.0, 0.0, TH_ERR_INPUT},
        // outside IF97 region 1: TH_ERR_STATE
        {273.14, 1e5, TH_ERR_STATE},     // below 273.15 K (ice side)
        {623.16, 50e6, TH_ERR_STATE},    // above 623.15 K (region 3)
        {700.0, 50e6, TH_ERR_STATE},
        {300.0, 100.0001e6, TH_ERR_STATE},  // above 100 MPa
        {373.15, 1e5, TH_ERR_STATE},     // vapour: p < p_sat(373.15) = 0.1014 MPa
        {300.0, 3000.0, TH_ERR_STATE},   // vapour: p_sat(300 K) = 3537 Pa
        {500.0, 2e6, TH_ERR_STATE},      // vapour: p_sat(500 K) = 2.64 MPa
        {373.15, psat_373 * 0.999999, TH_ERR_STATE},
        // valid
        {373.15, psat_373, TH_OK},       // saturated liquid
        {273.15, 1e5, TH_WARN_RANGE},    // below the triple point by < 0.01 K
        {273.16, 1e5, TH_OK},
        {623.15, 100e6, TH_OK},
        {300.0, 1e5, TH_OK},
    };
    for (const auto &c : cases) {
        for (const auto &f : kWaterSingles) {
            // density, cp and enthalpy come from IF97 alone and never warn.
            const bool thermo = f.fn == th_water_density ||
                                f.fn == th_water_cp ||
                                f.fn == th_water_enthalpy;
            const int code = (thermo && c.code == TH_WARN_RANGE) ? TH_OK : c.code;
            expect_single(f, c.t, c.p, code);
        }
        expect_set("th_water_props", th_water_props, c.t, c.p, c.code);
    }
}

TEST_CASE("properties: water saturation functions, range and bad input",
          "[properties][errors][water]") {
    struct one {
        double x;
        int code;
    };
    const one by_t[] = {{kNaN, TH_ERR_INPUT},   {kInf, TH_ERR_INPUT},
                        {-1.0, TH_ERR_INPUT},   {0.0, TH_ERR_INPUT},
                        {273.14, TH_ERR_STATE}, {647.1, TH_ERR_STATE},
                        {1000.0, TH_ERR_STATE}, {273.15, TH_OK},
                        {647.096, TH_OK}};
    // The same code checks for both saturation functions.
    auto check_all = [](const char *name, int (*fn)(double, double *), const auto &cases) {
        for (const auto &c : cases) {
            double out = kSentinel;
            INFO(name << "(" << c.x << ")");
            CHECK(fn(c.x, &out) == c.code);
            if (TH_FAILED(c.code)) CHECK(out == kSentinel);
            else CHECK(std::isfinite(out));
        }
    };
    check_all("th_water_saturation_pressure", th_water_saturation_pressure, by_t);
    const one by_p[] = {{kNaN, TH_ERR_INPUT},    {kInf, TH_ERR_INPUT},
                        {-1e5, TH_ERR_INPUT},    {0.0, TH_ERR_INPUT},
                        {611.0, TH_ERR_STATE},   {22.065e6, TH_ERR_STATE},
                        {1e9, TH_ERR_STATE},     {611.213, TH_OK},
                        {22.064e6, TH_OK}};
    check_all("th_water_saturation_temperature", th_water_saturation_temperature, by_p);
}

TEST_CASE("properties: air states and bad input", "[properties][errors][air]") {
    const state_case cases[] = {
        {kNaN, 1e5, TH_ERR_INPUT},
        {300.0, kNaN, TH_ERR_INPUT},
        {kInf, 1e5, TH_ERR_INPUT},
        {300.0, kInf, TH_ERR_INPUT},
        {-300.0, 1e5, TH_ERR_INPUT},
        {0.0, 1e5, TH_ERR_INPUT},
        {300.0, -1e5, TH_ERR_INPUT},
        {300.0, 0.0, TH_ERR_INPUT},
        {149.9, 1e5, TH_ERR_STATE},      // too cold for an ideal gas
        {80.0, 1e5, TH_ERR_STATE},       // liquid air
        {3000.1, 1e5, TH_ERR_STATE},     // dissociating
        {300.0, 1.0001e6, TH_ERR_STATE}, // too dense for an ideal gas
        {150.0, 1e5, TH_WARN_RANGE},
        {199.9, 1e5, TH_WARN_RANGE},
        {2000.1, 1e5, TH_WARN_RANGE},
        {3000.0, 1e5, TH_WARN_RANGE},
        {300.0, 0.2001e6, TH_WARN_RANGE},
        {300.0, 1e6, TH_WARN_RANGE},
        {200.0, 1e5, TH_OK},
        {2000.0, 0.2e6, TH_OK},
        {300.0, 1.0, TH_OK},
        {300.0, 101325.0, TH_OK},
    };
    for (const auto &c : cases) {
        for (const auto &f : kAirSingles) expect_single(f, c.t, c.p, c.code);
        expect_set("th_air_props", th_air_props, c.t, c.p, c.code);
    }
}
