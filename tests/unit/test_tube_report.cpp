// The cell-by-cell report (th_tube_report) and single values of a result
// (th_tube_result_value).
#include "test_tube_cases.hpp"

#include <cstring>
#include <limits>
#include <string>

using namespace tube_cases;

namespace {

const th_tube_report_row *find(const th_tube_report_row *rows, int n, const char *label) {
    for (int i = 0; i < n; ++i)
        if (std::strcmp(rows[i].label, label) == 0) return &rows[i];
    return nullptr;
}

}  // namespace

TEST_CASE("tube report: rows carry the result's values", "[tube][report]") {
    // Source: th_tube_report's definition (tubeheat.h): each row is a field
    // of the solved result, with its unit.
    th_tube_case c = water_wall();
    c.p_in = 1.2e5;
    c.wall.t_wall = 390.0;  // above saturation: one warning row
    th_tube_result r{};
    const int s = th_tube_solve(&c, &r);
    REQUIRE(s == TH_WARN_RANGE);
    th_tube_report_row rows[TH_TUBE_REPORT_ROWS];
    int n = 0;
    REQUIRE(th_tube_report(&r, s, rows, &n) == TH_OK);
    CHECK(n == 32 + r.note_count);
    auto num = [&](const char *label) {
        const th_tube_report_row *row = find(rows, n, label);
        REQUIRE(row != nullptr);
        CHECK(row->is_text == 0);
        CHECK(std::string(row->text).empty());
        return row->value;
    };
    auto txt = [&](const char *label) {
        const th_tube_report_row *row = find(rows, n, label);
        REQUIRE(row != nullptr);
        CHECK(row->is_text == 1);
        return std::string(row->text);
    };
    CHECK(num("Reynolds number Re") == r.re);
    CHECK(num("Prandtl number Pr") == r.pr);
    CHECK(txt("flow regime") == th_regime_name(r.regime));
    CHECK(num("Darcy friction factor f") == r.f);
    CHECK(num("mean Nusselt number Nu = h D_h/k") == r.nu_mean);
    CHECK(num("mean inside coefficient h") == r.h_mean);
    CHECK(num("overall conductance UA") == r.ua);
    CHECK(num("number of transfer units NTU = UA/(mdot cp)") == r.ntu);
    CHECK(num("outlet temperature") == r.t_out);
    CHECK(num("heat rate into the fluid q") == r.q);
    CHECK(num("wall temperature at the inlet") == r.t_wall_in);
    CHECK(num("wall temperature at the outlet") == r.t_wall_out);
    CHECK(num("pressure drop p_in - p_out") == r.dp);
    CHECK(num("iterations") == r.iterations);
    CHECK(num("status code") == TH_WARN_RANGE);
    CHECK(num("warnings") == r.note_count);
    CHECK(txt("Nusselt method") == r.method_name);
    CHECK(txt("why this method") == r.reason);
    CHECK(txt("status") == th_status_message(TH_WARN_RANGE));
    CHECK(!txt("entry state").empty());
    CHECK(std::string(rows[n - 1].text).find("boiling") != std::string::npos);
    CHECK(std::strcmp(find(rows, n, "mean inside coefficient h")->unit, "W/(m2 K)") == 0);
    for (int i = 0; i < n; ++i) {
        CHECK(rows[i].label != nullptr);
        CHECK(rows[i].unit != nullptr);
        CHECK(std::isfinite(rows[i].value));
    }
}

TEST_CASE("tube report: single values", "[tube][report]") {
    // Source: th_tube_result_value's definition (tubeheat.h).
    const th_tube_case c = water_wall();
    th_tube_result r{};
    REQUIRE(th_test::success(th_tube_solve(&c, &r)));
    const double want[TH_TUBE_OUT_COUNT] = {r.t_out, r.q, r.h_mean, r.nu_mean, r.re, r.pr,
                                            static_cast<double>(r.regime), r.f, r.dp, r.ua, r.ntu,
                                            r.t_wall_in, r.t_wall_out, static_cast<double>(r.method),
                                            static_cast<double>(r.iterations)};
    for (int i = 0; i < TH_TUBE_OUT_COUNT; ++i) {
        double v = 0.0;
        REQUIRE(th_tube_result_value(&r, i, &v) == TH_OK);
        CHECK(v == want[i]);
    }
    double v = -3.0;
    CHECK(th_tube_result_value(&r, TH_TUBE_OUT_COUNT, &v) == TH_ERR_INPUT);
    CHECK(th_tube_result_value(&r, -1, &v) == TH_ERR_INPUT);
    CHECK(th_tube_result_value(&r, 0, nullptr) == TH_ERR_INPUT);
    CHECK(v == -3.0);
}

TEST_CASE("tube report: bad input", "[tube][report][errors]") {
    // Source: the C API contract (tubeheat.h).
    const th_tube_case c = water_wall();
    th_tube_result r{};
    REQUIRE(th_test::success(th_tube_solve(&c, &r)));
    th_tube_report_row rows[TH_TUBE_REPORT_ROWS];
    int n = -1;
    CHECK(th_tube_report(nullptr, TH_OK, rows, &n) == TH_ERR_INPUT);
    CHECK(th_tube_report(&r, TH_OK, nullptr, &n) == TH_ERR_INPUT);
    CHECK(th_tube_report(&r, TH_OK, rows, nullptr) == TH_ERR_INPUT);
    CHECK(th_tube_report(&r, TH_ERR_STATE, rows, &n) == TH_ERR_INPUT);  // no result to report
    th_tube_result bad = r;
    bad.note_count = TH_TUBE_NOTES_MAX + 1;
    CHECK(th_tube_report(&bad, TH_OK, rows, &n) == TH_ERR_INPUT);
    bad = r;
    bad.regime = 17;
    CHECK(th_tube_report(&bad, TH_OK, rows, &n) == TH_ERR_INPUT);
    bad = r;
    bad.h_mean = std::numeric_limits<double>::quiet_NaN();
    CHECK(th_tube_report(&bad, TH_OK, rows, &n) == TH_ERR_INPUT);
    CHECK(n == -1);
}

TEST_CASE("tube flat setter: th_tube_case_set", "[tube][setter]") {
    // Source: th_tube_case_set's definition (tubeheat.h): which field each
    // flat value lands in; everything else is left alone.
    th_tube_case c;
    REQUIRE(th_tube_case_init(&c) == TH_OK);
    c.geometry.roughness = 3e-6;
    c.wall.h_outside = 250.0;
    REQUIRE(th_tube_case_set(&c, TH_FLUID_USER, TH_DUCT_RECTANGLE, 0.01, 0.03, TH_TUBE_WALL_OUTSIDE, 330.0) == TH_OK);
    CHECK(c.fluid.kind == TH_FLUID_USER);
    CHECK(c.fluid.n == 1);
    CHECK(c.geometry.shape == TH_DUCT_RECTANGLE);
    CHECK(c.geometry.a == 0.01);
    CHECK(c.geometry.b == 0.03);
    CHECK(c.geometry.roughness == 3e-6);
    CHECK(c.wall.kind == TH_TUBE_WALL_OUTSIDE);
    CHECK(c.wall.t_outside == 330.0);
    CHECK(c.wall.h_outside == 250.0);
    REQUIRE(th_tube_case_set(&c, TH_FLUID_WATER, TH_DUCT_ANNULUS, 0.05, 0.02, TH_TUBE_WALL_FLUX, -900.0) == TH_OK);
    CHECK(c.geometry.d == 0.05);
    CHECK(c.geometry.d_inner == 0.02);
    CHECK(c.wall.q_flux == -900.0);
    REQUIRE(th_tube_case_set(&c, TH_FLUID_AIR, TH_DUCT_CIRCLE, 0.025, 0.0, TH_TUBE_WALL_TEMPERATURE, 400.0) == TH_OK);
    CHECK(c.geometry.d == 0.025);
    CHECK(c.wall.t_wall == 400.0);
    // The same case built field by field solves to the same answer.
    c.t_in = 300.0;
    c.p_in = 1e5;
    c.mdot = 0.01;
    c.geometry.length = 2.0;
    th_tube_case f = water_wall();
    f.fluid.kind = TH_FLUID_AIR;
    f.t_in = 300.0;
    f.p_in = 1e5;
    f.mdot = 0.01;
    f.geometry.d = 0.025;
    f.geometry.length = 2.0;
    f.geometry.roughness = 3e-6;
    f.wall.t_wall = 400.0;
    th_tube_result a{}, b{};
    REQUIRE(th_test::success(th_tube_solve(&c, &a)));
    REQUIRE(th_test::success(th_tube_solve(&f, &b)));
    CHECK(a.t_out == b.t_out);
    // Bad kinds leave the case alone.
    const th_tube_case before = c;
    CHECK(th_tube_case_set(&c, TH_FLUID_UNSET, TH_DUCT_CIRCLE, 0.02, 0.0, TH_TUBE_WALL_FLUX, 1.0) == TH_ERR_INPUT);
    CHECK(th_tube_case_set(&c, TH_FLUID_WATER, 7, 0.02, 0.0, TH_TUBE_WALL_FLUX, 1.0) == TH_ERR_INPUT);
    CHECK(th_tube_case_set(&c, TH_FLUID_WATER, TH_DUCT_CIRCLE, 0.02, 0.0, TH_TUBE_WALL_UNSET, 1.0) == TH_ERR_INPUT);
    CHECK(th_tube_case_set(nullptr, TH_FLUID_WATER, TH_DUCT_CIRCLE, 0.02, 0.0, TH_TUBE_WALL_FLUX, 1.0) == TH_ERR_INPUT);
    CHECK(c.geometry.d == before.geometry.d);
    CHECK(c.wall.t_wall == before.wall.t_wall);
}
