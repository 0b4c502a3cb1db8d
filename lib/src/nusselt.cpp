// nusselt.cpp - th_nusselt(): validation of the conditions, the dispatch to
// the method chosen by the caller, the automatic choice, and method names.
#include "correlations.hpp"
#include "method_names.hpp"
#include "entry_internal.hpp"

#include <cmath>
#include <limits>

namespace th {
namespace {

// First entry per id is the display name; later ones are accepted aliases.
constexpr method_name nusselt_names[] = {
    {TH_NU_AUTO, "auto"},
    {TH_NU_LAMINAR_DEVELOPED, "laminar developed"},
    {TH_NU_LAMINAR_DEVELOPED, "laminar"},
    {TH_NU_LAMINAR_DEVELOPED, "fully developed laminar"},
    {TH_NU_DITTUS_BOELTER, "Dittus-Boelter"},
    {TH_NU_SIEDER_TATE, "Sieder-Tate"},
    {TH_NU_PETUKHOV, "Petukhov"},
    {TH_NU_GNIELINSKI, "Gnielinski"},
    {TH_NU_GNIELINSKI, "Gnielinski 1976"},
    {TH_NU_GNIELINSKI_TRANSITION, "Gnielinski transition"},
    {TH_NU_GNIELINSKI_TRANSITION, "Gnielinski 2013"},
    {TH_NU_HAUSEN, "Hausen"},
    {TH_NU_SIEDER_TATE_LAMINAR, "Sieder-Tate laminar"},
    {TH_NU_SHAH, "Shah"},
    {TH_NU_SHAH, "Shah 1975"},
    {TH_NU_GNIELINSKI_LAMINAR, "Gnielinski laminar"},
    {TH_NU_LIQUID_METAL, "liquid metal"},
    {TH_NU_LIQUID_METAL, "Skupinski"},
    {TH_NU_LIQUID_METAL, "Seban-Shimazaki"},
    {TH_NU_GRAETZ_EXACT, "Graetz exact"},
    {TH_NU_GRAETZ_EXACT, "Graetz"},
    {TH_NU_GRAETZ_EXACT, "thermal entry exact"},
    {TH_NU_COMBINED_ENTRY_NUMERIC, "combined entry numeric"},
    {TH_NU_COMBINED_ENTRY_NUMERIC, "combined entry"},
};

// Every th_nusselt() call names its method, so display names are indexed.
constexpr auto display_name = index_names<TH_NU_METHOD_COUNT>(nusselt_names);

void validate(const th_conditions &c) {
    need_positive(c.re);
    need_positive(c.pr);
    need_positive_or_inf(c.l_over_d);
    need(c.averaging == TH_MEAN || c.averaging == TH_LOCAL);
    need(c.wall == TH_WALL_T || c.wall == TH_WALL_H);
    need(c.direction == TH_HEATING || c.direction == TH_COOLING);
    need(c.entry == TH_ENTRY_THERMAL || c.entry == TH_ENTRY_COMBINED);
    need_positive(c.mu_ratio);
    need(std::isfinite(c.rel_roughness) && c.rel_roughness >= 0.0 && c.rel_roughness < 1.0);
    need(c.correction == TH_CORR_NONE || c.correction == TH_CORR_LIQUID ||
         c.correction == TH_CORR_GAS);
    if (c.correction == TH_CORR_LIQUID) need_positive(c.pr_wall);
    if (c.correction == TH_CORR_GAS) need_positive(c.t_ratio);
    need(c.length_factor == 0 || c.length_factor == 1);
    need(c.duct >= TH_DUCT_CIRCLE && c.duct <= TH_DUCT_ANNULUS);
    if (c.duct == TH_DUCT_RECTANGLE || c.duct == TH_DUCT_ANNULUS)
        need(std::isfinite(c.duct_ratio) && c.duct_ratio > 0.0 && c.duct_ratio <= 1.0);
    if (c.duct == TH_DUCT_ANNULUS) need(c.duct_ratio < 1.0);
}

struct evaluation {
    double nu = 0.0;
    double f = 0.0;
    int method = TH_NU_AUTO;
    const char *reason = "chosen by caller";
};

bool is_laminar_method(int m) {
    return m == TH_NU_LAMINAR_DEVELOPED || m == TH_NU_HAUSEN || m == TH_NU_SIEDER_TATE_LAMINAR ||
           m == TH_NU_SHAH || m == TH_NU_GNIELINSKI_LAMINAR || m == TH_NU_GRAETZ_EXACT ||
           m == TH_NU_COMBINED_ENTRY_NUMERIC;
}

double laminar_developed(const th_conditions &c, range_check &rc) {
    if (c.duct == TH_DUCT_CIRCLE) return nu_laminar_developed(c, rc);
    double f_re = 0.0, nu_t = 0.0, nu_h = 0.0;
    duct_laminar_developed(c.duct, c.duct_ratio, &f_re, &nu_t, &nu_h);
    rc.require(c.re < TH_RE_LAMINAR_MAX, "Re >= 2300: laminar method applied outside laminar flow");
    rc.require(duct_laminar_in_range(c.duct, c.duct_ratio),
               "duct ratio beyond the source table (extrapolated)");
    return c.wall == TH_WALL_T ? nu_t : nu_h;
}

double evaluate(int method, const th_conditions &c, range_check &rc, double &f) {
    switch (method) {
    case TH_NU_LAMINAR_DEVELOPED:
        return laminar_developed(c, rc);
    case TH_NU_DITTUS_BOELTER:
        return nu_dittus_boelter(c, rc);
    case TH_NU_SIEDER_TATE:
        return nu_sieder_tate(c, rc);
    case TH_NU_PETUKHOV:
        return nu_petukhov(c, rc, f);
    case TH_NU_GNIELINSKI:
        return nu_gnielinski(c, rc, f);
    case TH_NU_GNIELINSKI_TRANSITION:
        return nu_gnielinski_transition(c, rc, f);
    case TH_NU_HAUSEN:
        return nu_hausen(c, rc);
    case TH_NU_SIEDER_TATE_LAMINAR:
        return nu_sieder_tate_laminar(c, rc);
    case TH_NU_SHAH:
        return nu_shah(c, rc);
    case TH_NU_GNIELINSKI_LAMINAR:
        return nu_gnielinski_laminar(c, rc);
    case TH_NU_LIQUID_METAL:
        return nu_liquid_metal(c, rc);
    case TH_NU_GRAETZ_EXACT: {
        rc.require(c.re < TH_RE_LAMINAR_MAX, "Re >= 2300: laminar method applied outside laminar flow");
        rc.require(c.entry == TH_ENTRY_THERMAL || c.pr > 1e4,
                   "exact series is for thermal entry (velocity developed); combined entry requested");
        const double xs = std::isinf(c.l_over_d) ? c.l_over_d : c.l_over_d / (c.re * c.pr);
        return thermal_entry_nu(xs, c.wall, c.averaging);
    }
    case TH_NU_COMBINED_ENTRY_NUMERIC: {
        rc.require(c.re < TH_RE_LAMINAR_MAX, "Re >= 2300: laminar method applied outside laminar flow");
        rc.require(c.entry == TH_ENTRY_COMBINED,
                   "combined-entry solution requested for a thermal-entry case");
        const double xs = std::isinf(c.l_over_d) ? c.l_over_d : c.l_over_d / (c.re * c.pr);
        rc.require(c.pr >= 0.5 && c.pr <= 1e4, "Pr outside the validated range 0.5..1e4 of the combined-entry solution");
        return combined_entry_nu(xs, c.pr, c.wall, c.averaging);
    }
    default:
        fail(TH_ERR_METHOD);
    }
}

// The automatic choice: regime first, then Pr (liquid metals, very viscous
// fluids), then the entry state and the wall condition. Each branch names
// its reason in a static text that a spreadsheet cell can show.
evaluation choose(const th_conditions &c) {
    evaluation e;
    const bool fully_developed = std::isinf(c.l_over_d);
    if (c.re < TH_RE_LAMINAR_MAX) {
        if (c.duct != TH_DUCT_CIRCLE) {
            e.method = TH_NU_LAMINAR_DEVELOPED;
            e.reason = "laminar, non-circular duct: fully developed duct value (entry effects not included)";
        } else if (fully_developed) {
            e.method = TH_NU_LAMINAR_DEVELOPED;
            e.reason = "laminar, fully developed";
        } else if (c.entry == TH_ENTRY_THERMAL) {
            e.method = TH_NU_GRAETZ_EXACT;
            e.reason = "laminar thermal entry (velocity developed): exact series";
        } else {
            if (c.pr > 1e4) {
                // The velocity develops Pr times faster than the temperature:
                // the thermal-entry solution is the combined one's limit.
                e.method = TH_NU_GRAETZ_EXACT;
                e.reason = "laminar combined entry at Pr > 1e4: thermal-entry exact series (its large-Pr limit)";
            } else if (c.pr >= 0.5) {
                e.method = TH_NU_COMBINED_ENTRY_NUMERIC;
                e.reason = "laminar combined entry: numerical boundary-layer solution";
            } else if (c.averaging == TH_MEAN) {
                e.method = TH_NU_GNIELINSKI_LAMINAR;
                e.reason = "laminar combined entry, mean: Gnielinski composite";
            } else {
                e.method = TH_NU_SHAH;
                e.reason = "laminar combined entry, local: thermal-entry fit (underestimates Nu near the inlet)";
            }
        }
    } else if (c.pr < 0.1) {
        e.method = TH_NU_LIQUID_METAL;
        e.reason = c.wall == TH_WALL_H ? "Pr < 0.1, uniform flux: liquid metal (Skupinski)"
                                       : "Pr < 0.1, uniform wall temperature: liquid metal (Seban-Shimazaki)";
    } else if (c.re < TH_RE_TURBULENT_MIN) {
        if (c.averaging == TH_MEAN) {
            e.method = TH_NU_GNIELINSKI_TRANSITION;
            e.reason = "transitional (2300 <= Re < 1e4), mean: Gnielinski 2013 interpolation";
        } else {
            e.method = TH_NU_GNIELINSKI;
            e.reason = "transitional, local: Gnielinski (uncertain below Re 3000)";
        }
    } else if (c.pr > 2000.0) {
        e.method = TH_NU_SIEDER_TATE;
        e.reason = "turbulent, Pr > 2000 (beyond Gnielinski): Sieder-Tate";
    } else {
        e.method = TH_NU_GNIELINSKI;
        e.reason = "turbulent: Gnielinski";
    }
    return e;
}

const char *used_name(int method, const th_conditions &c) {
    if (method == TH_NU_LIQUID_METAL)
        return c.wall == TH_WALL_H ? "liquid metal (Skupinski)" : "liquid metal (Seban-Shimazaki)";
    return display_name(method);
}

}  // namespace
}  // namespace th

extern "C" {

int th_conditions_init(th_conditions *c) {
    return th::guard([&] {
        th::need_out(c);
        th_conditions d{};
        d.re = 0.0;
        d.pr = 0.0;
        d.l_over_d = std::numeric_limits<double>::infinity();
        d.averaging = TH_MEAN;
        d.wall = TH_WALL_T;
        d.direction = TH_HEATING;
        d.entry = TH_ENTRY_COMBINED;
        d.mu_ratio = 1.0;
        d.rel_roughness = 0.0;
        d.correction = TH_CORR_NONE;
        d.pr_wall = 0.0;
        d.t_ratio = 1.0;
        d.length_factor = 1;
        d.duct = TH_DUCT_CIRCLE;
        d.duct_ratio = 1.0;
        *c = d;
        return TH_OK;
    });
}

int th_nusselt(int method, const th_conditions *c, th_nusselt_result *out) {
    return th::guard([&] {
        th::need_out(out);
        th::need(c != nullptr);
        if (method < 0 || method >= TH_NU_METHOD_COUNT) th::fail(TH_ERR_METHOD);
        th::validate(*c);
        th::evaluation e;
        if (method == TH_NU_AUTO)
            e = th::choose(*c);
        else
            e.method = method;
        th::range_check rc;
        if (c->duct != TH_DUCT_CIRCLE && th::is_laminar_method(e.method) &&
            e.method != TH_NU_LAMINAR_DEVELOPED)
            rc.require(false, "circular-tube laminar correlation applied to a non-circular duct");
        // No correlation or solution was fitted to, or validated on, a tube
        // shorter than its diameter; the entry terms then grow without
        // bound (Nu ~ (D/L)^(1/3) and faster).
        rc.require(c->l_over_d >= 1.0, "L/D (or x/D) below 1: shorter than one diameter, beyond every method's data");
        e.nu = th::checked(th::evaluate(e.method, *c, rc, e.f));
        th::need(e.nu > 0.0);
        th_nusselt_result r{};
        r.nu = e.nu;
        r.method = e.method;
        r.method_name = th::used_name(e.method, *c);
        r.reason = e.reason;
        r.range_note = rc.note();
        r.f = e.f;
        *out = r;
        return rc.status();
    });
}

int th_nusselt_method_from_name(const char *name, int *method) {
    return th::method_from_name(th::nusselt_names, name, method);
}

const char *th_nusselt_method_name(int method) { return th::display_name(method); }

}  // extern "C"
