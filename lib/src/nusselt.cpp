// nusselt.cpp - th_nusselt(): validation of the conditions, the dispatch to
// the method chosen by the caller, the automatic choice, and method names.
#include "correlations.hpp"
#include "method_names.hpp"
#include "rows.hpp"
#include "entry_internal.hpp"

#include <array>
#include <cmath>
#include <limits>
#include <utility>
#include <type_traits>

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

// Which th_conditions fields each method reads, beyond re, pr and
// l_over_d (read by every method, for the L/D warning at least). Only these
// are validated: the header promises that a method ignores the rest, so a
// mu_ratio left at 0 cannot fail a Dittus-Boelter call, and a call pays only for
// the checks it needs (docs/performance.md).
enum field_read : unsigned {
    reads_averaging = 1u << 0,
    reads_wall = 1u << 1,
    reads_direction = 1u << 2,
    reads_entry = 1u << 3,
    reads_mu_ratio = 1u << 4,
    reads_roughness = 1u << 5,
    reads_correction = 1u << 6,     // and pr_wall or t_ratio, as it selects
    reads_length_factor = 1u << 7,
    reads_duct = 1u << 8,           // the shape only: circle or not
    reads_duct_ratio = 1u << 9,     // duct_ratio too, for shapes that use it
};

// The laminar methods fitted to circular tubes warn in a non-circular duct,
// so they read the shape.
constexpr unsigned circle_laminar = reads_averaging | reads_wall | reads_entry | reads_duct;

constexpr unsigned fields_read(int method) {
    switch (method) {
    case TH_NU_AUTO:  // what the choice itself reads
        return reads_averaging | reads_wall | reads_entry | reads_duct;
    case TH_NU_LAMINAR_DEVELOPED:
        return reads_wall | reads_duct | reads_duct_ratio;
    case TH_NU_DITTUS_BOELTER:
        return reads_direction;
    case TH_NU_SIEDER_TATE:
        return reads_mu_ratio;
    case TH_NU_PETUKHOV:
        return reads_roughness;
    case TH_NU_GNIELINSKI:
        return reads_averaging | reads_roughness | reads_correction | reads_length_factor;
    case TH_NU_GNIELINSKI_TRANSITION:  // its laminar end reads wall and entry
        return reads_averaging | reads_wall | reads_entry | reads_roughness | reads_correction |
               reads_length_factor;
    case TH_NU_SIEDER_TATE_LAMINAR:
        return circle_laminar | reads_mu_ratio;
    case TH_NU_HAUSEN:
    case TH_NU_SHAH:
    case TH_NU_GNIELINSKI_LAMINAR:
    case TH_NU_GRAETZ_EXACT:
    case TH_NU_COMBINED_ENTRY_NUMERIC:
        return circle_laminar;
    case TH_NU_LIQUID_METAL:
        return reads_wall;
    default:
        return ~0u;
    }
}

// re, pr and l_over_d: read by every method.
void validate_common(const th_conditions &c) {
    need_positive(c.re);
    need_positive(c.pr);
    need_positive_or_inf(c.l_over_d);
}

// The fields in `Read`, known at compile time so that each method's checks
// are straight-line code.
template <unsigned Read>
void validate(const th_conditions &c) {
    if constexpr ((Read & reads_averaging) != 0) need(c.averaging == TH_MEAN || c.averaging == TH_LOCAL);
    if constexpr ((Read & reads_wall) != 0) need(c.wall == TH_WALL_T || c.wall == TH_WALL_H);
    if constexpr ((Read & reads_direction) != 0) need(c.direction == TH_HEATING || c.direction == TH_COOLING);
    if constexpr ((Read & reads_entry) != 0)
        need(c.entry == TH_ENTRY_THERMAL || c.entry == TH_ENTRY_COMBINED);
    if constexpr ((Read & reads_mu_ratio) != 0) need_positive(c.mu_ratio);
    if constexpr ((Read & reads_roughness) != 0)
        need_rel_roughness(c.rel_roughness);
    if constexpr ((Read & reads_correction) != 0) {
        need(c.correction == TH_CORR_NONE || c.correction == TH_CORR_LIQUID ||
             c.correction == TH_CORR_GAS);
        if (c.correction == TH_CORR_LIQUID) need_positive(c.pr_wall);
        if (c.correction == TH_CORR_GAS) need_positive(c.t_ratio);
    }
    if constexpr ((Read & reads_length_factor) != 0) need(c.length_factor == 0 || c.length_factor == 1);
    if constexpr ((Read & reads_duct) != 0) need(c.duct >= TH_DUCT_CIRCLE && c.duct <= TH_DUCT_ANNULUS);
    if constexpr ((Read & reads_duct_ratio) != 0) {
        if (c.duct == TH_DUCT_RECTANGLE || c.duct == TH_DUCT_ANNULUS)
            need(std::isfinite(c.duct_ratio) && c.duct_ratio > 0.0 && c.duct_ratio <= 1.0);
        if (c.duct == TH_DUCT_ANNULUS) need(c.duct_ratio < 1.0);
    }
}

struct evaluation {
    int method = TH_NU_AUTO;
    const char *reason = "chosen by caller";
};

template <class Range>
double laminar_developed(const th_conditions &c, Range &rc) {
    if (c.duct == TH_DUCT_CIRCLE) return nu_laminar_developed(c, rc);
    double f_re = 0.0, nu_t = 0.0, nu_h = 0.0;
    duct_laminar_developed(c.duct, c.duct_ratio, &f_re, &nu_t, &nu_h);
    rc.require(c.re < TH_RE_LAMINAR_MAX, "Re >= 2300: laminar method applied outside laminar flow");
    rc.require(duct_laminar_in_range(c.duct, c.duct_ratio),
               "duct ratio beyond the source table (extrapolated)");
    return c.wall == TH_WALL_T ? nu_t : nu_h;
}

template <class Range>
double graetz_exact(const th_conditions &c, Range &rc) {
    rc.require(c.re < TH_RE_LAMINAR_MAX, "Re >= 2300: laminar method applied outside laminar flow");
    rc.require(c.entry == TH_ENTRY_THERMAL || c.pr > combined_entry_pr_max,
               "exact series is for thermal entry (velocity developed); combined entry requested");
    const double xs = std::isinf(c.l_over_d) ? c.l_over_d : c.l_over_d / (c.re * c.pr);
    return thermal_entry_nu(xs, c.wall, c.averaging);
}

template <class Range>
double combined_entry(const th_conditions &c, Range &rc) {
    rc.require(c.re < TH_RE_LAMINAR_MAX, "Re >= 2300: laminar method applied outside laminar flow");
    rc.require(c.entry == TH_ENTRY_COMBINED, "combined-entry solution requested for a thermal-entry case");
    const double xs = std::isinf(c.l_over_d) ? c.l_over_d : c.l_over_d / (c.re * c.pr);
    require_combined_entry_pr(c.pr, rc);
    return combined_entry_nu(xs, c.pr, c.wall, c.averaging);
}

// Nu by method `M` from conditions already validated for it (validate<>
// of fields_read(M), and validate_common). Records the two warnings every
// method shares first, in this order: a circular-tube laminar fit used in a
// duct, then a length below one diameter. Range: range_check or range_flag.
template <int M, class Range>
double compute(const th_conditions &c, const shared_terms &terms, Range &rc, double &f) {
    if constexpr (M != TH_NU_LAMINAR_DEVELOPED && (fields_read(M) & reads_duct) != 0)
        rc.require(c.duct == TH_DUCT_CIRCLE, "circular-tube laminar correlation applied to a non-circular duct");
    // No correlation or solution was fitted to, or validated on, a tube
    // shorter than its diameter; the entry terms then grow without bound
    // (Nu ~ (D/L)^(1/3) and faster).
    rc.require(c.l_over_d >= 1.0, "L/D (or x/D) below 1: shorter than one diameter, beyond every method's data");
    if constexpr (M == TH_NU_LAMINAR_DEVELOPED) return laminar_developed(c, rc);
    if constexpr (M == TH_NU_DITTUS_BOELTER) return nu_dittus_boelter(c, rc);
    if constexpr (M == TH_NU_SIEDER_TATE) return nu_sieder_tate(c, terms, rc);
    if constexpr (M == TH_NU_PETUKHOV) return nu_petukhov(c, rc, f);
    if constexpr (M == TH_NU_GNIELINSKI) return nu_gnielinski(c, rc, f);
    if constexpr (M == TH_NU_GNIELINSKI_TRANSITION) return nu_gnielinski_transition(c, rc, f);
    if constexpr (M == TH_NU_HAUSEN) return nu_hausen(c, rc);
    if constexpr (M == TH_NU_SIEDER_TATE_LAMINAR) return nu_sieder_tate_laminar(c, terms, rc);
    if constexpr (M == TH_NU_SHAH) return nu_shah(c, rc);
    if constexpr (M == TH_NU_GNIELINSKI_LAMINAR) return nu_gnielinski_laminar(c, rc);
    if constexpr (M == TH_NU_LIQUID_METAL) return nu_liquid_metal(c, rc);
    if constexpr (M == TH_NU_GRAETZ_EXACT) return graetz_exact(c, rc);
    if constexpr (M == TH_NU_COMBINED_ENTRY_NUMERIC) return combined_entry(c, rc);
}

// The shared terms method M uses (shared_terms.hpp), from fields validated
// for it.
template <int M>
shared_terms terms_for(const th_conditions &c) {
    return shared_terms_of(c, (fields_read(M) & reads_mu_ratio) != 0);
}

// Dispatch on a method id other than TH_NU_AUTO (which the caller resolves
// first; TH_ERR_METHOD here).
template <class Visit>
decltype(auto) with_method(int method, Visit &&visit) {
    return with_id<TH_NU_AUTO + 1, TH_NU_METHOD_COUNT>(method, std::forward<Visit>(visit));
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
            if (c.pr > combined_entry_pr_max) {
                // The velocity develops Pr times faster than the temperature:
                // the thermal-entry solution is the combined one's limit.
                e.method = TH_NU_GRAETZ_EXACT;
                e.reason = "laminar combined entry at Pr > 1e4: thermal-entry exact series (its large-Pr limit)";
            } else if (c.pr >= combined_entry_pr_min) {
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

// ---- the single call -------------------------------------------------------
// th_nusselt() checks its pointers, the method id and re, pr, l_over_d, then
// calls the method's own function through a table indexed by the id: one
// indirect call instead of a chain of id comparisons, and each function
// carries only its method's checks and formula, compiled as straight-line code.
using nusselt_fn = int (*)(const th_conditions &, th_nusselt_result &, const char *reason);

const char *used_name(int method, const th_conditions &c) {
    if (method == TH_NU_LIQUID_METAL)
        return c.wall == TH_WALL_H ? "liquid metal (Skupinski)" : "liquid metal (Seban-Shimazaki)";
    return display_name(method);
}

// Method M (not TH_NU_AUTO): the fields it reads, then Nu. *out is written
// only once Nu has passed its check, so a failed call leaves it untouched.
template <int M>
int nusselt_method(const th_conditions &c, th_nusselt_result &out, const char *reason) {
    validate<fields_read(M)>(c);
    range_check rc;
    double f = 0.0;
    const double nu = positive_result(compute<M>(c, terms_for<M>(c), rc, f));
    out.nu = nu;
    out.method = M;
    out.method_name = used_name(M, c);
    out.reason = reason;
    out.range_note = rc.note();
    out.f = f;
    return rc.status();
}

int nusselt_auto(const th_conditions &c, th_nusselt_result &out, const char *reason);

template <std::size_t... I>
constexpr std::array<nusselt_fn, sizeof...(I) + 1> nusselt_table(std::index_sequence<I...>) {
    return {{nusselt_auto, &nusselt_method<static_cast<int>(I) + 1>...}};
}
constexpr auto nusselt_methods = nusselt_table(std::make_index_sequence<TH_NU_METHOD_COUNT - 1>{});

// TH_NU_AUTO: what the choice reads, the choice, then the chosen method.
int nusselt_auto(const th_conditions &c, th_nusselt_result &out, const char *) {
    validate<fields_read(TH_NU_AUTO)>(c);
    const evaluation e = choose(c);
    return nusselt_methods[static_cast<std::size_t>(e.method)](c, out, e.reason);
}

// ---- the array form -------------------------------------------------------
// The per-row columns of th_nusselt_array; l_over_d may be NULL (shared).
struct row_columns {
    const double *re, *pr, *l_over_d;
    void set(std::size_t i, th_conditions &c) const {
        c.re = re[i];
        c.pr = pr[i];
        if (l_over_d != nullptr) c.l_over_d = l_over_d[i];
    }
};

// TH_NU_AUTO may choose a different method for each row: th_nusselt's path.
int nusselt_rows_auto(const th_conditions &shared, std::size_t n, const row_columns &in, double *nu,
                      int *status) {
    th_conditions c = shared;
    return for_each_row(n, nu, status, [&](std::size_t i, double &value) {
        in.set(i, c);
        th_nusselt_result r{};
        const int s = th_nusselt(TH_NU_AUTO, &c, &r);
        value = r.nu;
        return s;
    });
}

// Method M for every row. What th_nusselt checks on every call is split:
// the shared fields once, and per row only its own Re, Pr (and L/D when
// that is a column), read before the row's result is written (in place).
template <int M>
int nusselt_rows(const th_conditions &shared, std::size_t n, const row_columns &in, double *nu,
                 int *status) {
    // When a shared field is bad every row fails, as th_nusselt fails each
    // (a row whose own input is bad too says TH_ERR_INPUT either way).
    const int shared_status = guard([&] {
        validate<fields_read(M)>(shared);
        if (in.l_over_d == nullptr) need_positive_or_inf(shared.l_over_d);
        return TH_OK;
    });
    if (shared_status != TH_OK)
        return for_each_row(n, nu, status, [&](std::size_t, double &) { return shared_status; });
    const shared_terms terms = terms_for<M>(shared);
    th_conditions c = shared;
    return for_each_row(n, nu, status, [&](std::size_t i, double &value) {
        in.set(i, c);
        // Combined with `&`, not `&&`: one branch for the row's checks.
        const bool re_ok = positive_finite(c.re), pr_ok = positive_finite(c.pr);
        const bool ld_ok = positive_or_inf(c.l_over_d);
        if (!(re_ok & pr_ok & ld_ok)) return int{TH_ERR_INPUT};
        return guard([&] {
            range_flag rc;
            double f = 0.0;
            value = positive_result(compute<M>(c, terms, rc, f));
            return rc.status();
        });
    });
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
        th::validate_common(*c);
        return th::nusselt_methods[static_cast<std::size_t>(method)](*c, *out, "chosen by caller");
    });
}

int th_nusselt_array(int method, const th_conditions *shared, std::size_t n, const double *re,
                     const double *pr, const double *l_over_d, double *nu, int *status) {
    return th::guard([&] {
        if (method < 0 || method >= TH_NU_METHOD_COUNT) th::fail(TH_ERR_METHOD);
        th::need(shared != nullptr);
        if (n == 0) return int{TH_OK};
        th::need(re != nullptr && pr != nullptr && nu != nullptr && status != nullptr);
        const th::row_columns in{re, pr, l_over_d};
        if (method == TH_NU_AUTO) return th::nusselt_rows_auto(*shared, n, in, nu, status);
        return th::with_method(method, [&](auto m) {
            return th::nusselt_rows<decltype(m)::value>(*shared, n, in, nu, status);
        });
    });
}

int th_nusselt_method_from_name(const char *name, int *method) {
    return th::method_from_name(th::nusselt_names, name, method);
}

const char *th_nusselt_method_name(int method) { return th::display_name(method); }

}  // extern "C"
