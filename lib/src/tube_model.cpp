// tube_model.cpp - the whole-tube solver: cross-section, wall condition,
// the coefficient of a stretch of tube (with the wall temperature iterated
// for the property corrections), one stretch solved for its outlet, and
// the one-shot and marching solutions. The iteration scheme, tolerances
// and limits are described in docs/tube-solve.md and in tubeheat.h.
#include "friction_internal.hpp"
#include "tube_internal.hpp"

#include <boost/math/constants/constants.hpp>
#include <boost/math/tools/toms748_solve.hpp>

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <limits>
#include <vector>

namespace th {
namespace tube {
namespace {

constexpr double pi = boost::math::constants::pi<double>();

constexpr const char *note_plates_narrow =
    "parallel plates narrower than 10 spacings: the side walls are ignored "
    "(a rectangle describes the duct better)";
constexpr const char *note_dp_large =
    "pressure drop above 10 % of the inlet pressure: properties at the inlet "
    "pressure and an incompressible pressure drop are rough (common practice "
    "limit)";
constexpr const char *note_method_changes =
    "the automatic method choice changes along the tube; the method reported "
    "is the one of the last segment";

}  // namespace

// ---- cross-section -----------------------------------------------------------

section make_section(const th_tube_geometry &g, note_list &notes) {
    section s;
    s.shape = g.shape;
    need_positive(g.length);
    need_nonnegative(g.roughness);
    switch (g.shape) {
    case TH_DUCT_CIRCLE:
        need_positive(g.d);
        s.d_h = g.d;
        s.area = 0.25 * pi * g.d * g.d;
        s.perimeter = pi * g.d;
        s.duct_ratio = 1.0;
        break;
    case TH_DUCT_RECTANGLE:
        need_positive(g.a);
        need_positive(g.b);
        s.d_h = 2.0 * g.a * g.b / (g.a + g.b);
        s.area = g.a * g.b;
        s.perimeter = 2.0 * (g.a + g.b);  // all four walls heated
        s.duct_ratio = std::min(g.a, g.b) / std::max(g.a, g.b);
        break;
    case TH_DUCT_PARALLEL_PLATES:
        need_positive(g.a);
        need_positive(g.b);
        need(g.b > g.a);
        s.d_h = 2.0 * g.a;           // the infinitely wide channel's D_h
        s.area = g.a * g.b;
        s.perimeter = 2.0 * g.b;     // both plates heated
        s.duct_ratio = 1.0;
        if (g.b < 10.0 * g.a) notes.add(note_plates_narrow);
        break;
    case TH_DUCT_ANNULUS:
        need_positive(g.d);
        need_positive(g.d_inner);
        need(g.d_inner < g.d);
        s.d_h = g.d - g.d_inner;
        s.area = 0.25 * pi * (g.d * g.d - g.d_inner * g.d_inner);
        s.perimeter = pi * g.d_inner;  // inner wall heated, outer insulated
        s.duct_ratio = g.d_inner / g.d;
        break;
    default:
        fail(TH_ERR_INPUT);
    }
    s.length = g.length;
    s.rel_roughness = g.roughness / s.d_h;
    need_rel_roughness(s.rel_roughness);
    return s;
}

// ---- wall condition ----------------------------------------------------------

double wall_model::surface(double t_b, double h) const {
    switch (kind) {
    case TH_TUBE_WALL_TEMPERATURE:
        return t_limit;
    case TH_TUBE_WALL_FLUX:
        return t_b + q_flux / h;
    default:
        // Series resistances per unit inner area: the inside film takes the
        // share (1/h) / (1/h + r_rest) of the whole difference.
        return t_b + (t_limit - t_b) / (1.0 + h * r_rest);
    }
}

wall_model make_wall(const th_tube_wall &w, const section &s) {
    wall_model m;
    m.kind = w.kind;
    switch (w.kind) {
    case TH_TUBE_WALL_TEMPERATURE:
        need_temperature(w.t_wall);
        m.t_limit = w.t_wall;
        break;
    case TH_TUBE_WALL_FLUX:
        need_finite(w.q_flux);
        m.q_flux = w.q_flux;
        break;
    case TH_TUBE_WALL_OUTSIDE: {
        need_temperature(w.t_outside);
        need(!std::isnan(w.h_outside) && w.h_outside > 0.0);  // +inf allowed
        need_nonnegative(w.thickness);
        if (w.thickness > 0.0) need_positive(w.k_wall);
        need_nonnegative(w.rf_inside);
        need_nonnegative(w.rf_outside);
        m.t_limit = w.t_outside;
        // Resistances referred to the heated inner area A_i = P L.
        double r_wall = 0.0, ai_over_ao = 1.0;
        if (s.shape == TH_DUCT_CIRCLE) {
            // Cylindrical wall from d to d + 2 t (the form of th_ua_tube).
            const double d = s.d_h, d_o = s.d_h + 2.0 * w.thickness;
            if (w.thickness > 0.0) r_wall = d * std::log(d_o / d) / (2.0 * w.k_wall);
            ai_over_ao = d / d_o;
        } else if (w.thickness > 0.0) {
            r_wall = w.thickness / w.k_wall;  // thin plane wall
        }
        const double r_out = std::isinf(w.h_outside) ? 0.0 : 1.0 / w.h_outside;
        m.r_rest = checked(w.rf_inside + r_wall + ai_over_ao * (w.rf_outside + r_out));
        break;
    }
    default:
        fail(TH_ERR_INPUT);
    }
    return m;
}

// ---- the case ----------------------------------------------------------------

namespace {
void validate_options(const th_tube_options &o) {
    if (o.method < 0 || o.method >= TH_NU_METHOD_COUNT) fail(TH_ERR_METHOD);
    if (o.friction < 0 || o.friction >= TH_F_METHOD_COUNT) fail(TH_ERR_METHOD);
    need(o.entry == TH_ENTRY_THERMAL || o.entry == TH_ENTRY_COMBINED);
    need(o.correction == TH_TUBE_AUTO || o.correction == TH_CORR_NONE ||
         o.correction == TH_CORR_LIQUID || o.correction == TH_CORR_GAS);
    need(o.nu_wall == TH_TUBE_AUTO || o.nu_wall == TH_WALL_T || o.nu_wall == TH_WALL_H);
    need(o.length_factor == 0 || o.length_factor == 1);
    need(o.segments >= 0 && o.segments <= TH_TUBE_SEGMENTS_MAX);
    need(std::isfinite(o.tolerance) && o.tolerance >= 1e-12 && o.tolerance <= 1.0);
    need(o.max_iterations >= 5 && o.max_iterations <= 1000);
}

const th_tube_case &validated(const th_tube_case &tc) {
    need_temperature(tc.t_in);
    need_positive(tc.p_in);
    need_positive(tc.mdot);
    validate_options(tc.options);
    return tc;
}
}  // namespace

model::model(const th_tube_case &tc)
    : c(validated(tc)), setup_notes(), fluid(tc.fluid, tc.p_in),
      sec(make_section(tc.geometry, setup_notes)),
      wall(make_wall(tc.wall, sec)) {
    const th_tube_options &o = tc.options;
    method = o.method;
    friction = o.friction;
    entry = o.entry;
    length_factor = o.length_factor;
    tol = o.tolerance;
    max_iter = o.max_iterations;
    if (wall.kind == TH_TUBE_WALL_FLUX)
        direction = wall.q_flux >= 0.0 ? TH_HEATING : TH_COOLING;
    else
        direction = wall.t_limit >= tc.t_in ? TH_HEATING : TH_COOLING;
    nu_wall = o.nu_wall != TH_TUBE_AUTO ? o.nu_wall
              : wall.kind == TH_TUBE_WALL_FLUX ? TH_WALL_H
                                               : TH_WALL_T;
    correction = o.correction != TH_TUBE_AUTO ? o.correction
                 : fluid.gas()                ? TH_CORR_GAS
                                              : TH_CORR_LIQUID;
}

// ---- coefficient ---------------------------------------------------------------

namespace {

th_conditions conditions(const model &m, const state &b, double re, double t_b, const state &w,
                         double t_w) {
    th_conditions c{};
    if (th_conditions_init(&c) != TH_OK) fail(TH_ERR_INTERNAL);
    c.re = re;
    c.pr = b.pr;
    c.averaging = TH_MEAN;
    c.wall = m.nu_wall;
    c.direction = m.direction;
    c.entry = m.entry;
    c.mu_ratio = b.mu / w.mu;
    c.rel_roughness = m.sec.rel_roughness;
    c.correction = m.correction;
    c.pr_wall = w.pr;
    c.t_ratio = t_b / t_w;
    c.length_factor = m.length_factor;
    c.duct = m.sec.shape;
    c.duct_ratio = m.sec.duct_ratio;
    return c;
}

// The numerical combined-entry method marches its equations once per new
// Prandtl number (~0.1-0.3 s, then cached for a few Prandtl numbers). The
// tube iteration moves Pr a little at every step, so for that method and a
// fluid whose properties vary, the solver evaluates it on a fixed grid of
// Prandtl numbers (ratio 1.1) and interpolates with a Catmull-Rom cubic in
// ln Pr (continuous in Pr, so the root searches see a continuous function;
// deviation from the direct value below 1e-6 relative, checked in
// tests/unit/test_tube_solve.cpp, far under the method's own 0.1-0.3 %).
// Every other method, and constant-property fluids, use the actual Pr.
constexpr double pr_grid_ratio = 1.1;

bool pr_grid_applies(const model &m, const th_conditions &c) {
    const double edge = pr_grid_ratio * pr_grid_ratio;  // four nodes inside 0.5..1e4
    return (m.method == TH_NU_AUTO || m.method == TH_NU_COMBINED_ENTRY_NUMERIC) &&
           !m.fluid.constant() && c.re < TH_RE_LAMINAR_MAX && c.duct == TH_DUCT_CIRCLE &&
           c.entry == TH_ENTRY_COMBINED && std::isfinite(c.l_over_d) && c.pr >= 0.5 * edge &&
           c.pr <= 1e4 / edge;
}

int nusselt_call(int method, const th_conditions &c, th_nusselt_result &r) {
    const int s = th_nusselt(method, &c, &r);
    if (TH_FAILED(s)) fail(s);
    return s;
}

// Mean Nusselt number over 0..x (x > 0).
double nu_mean(const model &m, th_conditions c, double x, th_nusselt_result *info = nullptr,
               note_list *notes = nullptr) {
    c.l_over_d = x / m.sec.d_h;
    th_nusselt_result r{};
    if (pr_grid_applies(m, c)) {
        const double step = std::log(pr_grid_ratio);
        const double u = std::log(c.pr) / step;
        const double j = std::floor(u);
        const double t = u - j;
        std::array<double, 4> p{};
        std::array<th_nusselt_result, 4> rs{};
        bool numeric = true;
        for (std::size_t i = 0; i < 4; ++i) {
            th_conditions g = c;
            g.pr = std::exp((j - 1.0 + static_cast<double>(i)) * step);
            const int s = nusselt_call(m.method, g, rs[i]);
            if (rs[i].method != TH_NU_COMBINED_ENTRY_NUMERIC) numeric = false;
            if (notes != nullptr && s == TH_WARN_RANGE && (i == 1 || i == 2)) notes->add(rs[i].range_note);
            p[i] = rs[i].nu;
        }
        if (numeric) {
            if (info != nullptr) *info = rs[1];
            return p[1] + 0.5 * t *
                              (p[2] - p[0] +
                               t * (2.0 * p[0] - 5.0 * p[1] + 4.0 * p[2] - p[3] +
                                    t * (3.0 * (p[1] - p[2]) + p[3] - p[0])));
        }
    }
    const int s = nusselt_call(m.method, c, r);
    if (notes != nullptr && s == TH_WARN_RANGE) notes->add(r.range_note);
    if (info != nullptr) *info = r;
    return r.nu;
}

// Segment average of the local Nusselt number over x_a..x_b from the mean
// values: (x_b Nu_m(x_b) - x_a Nu_m(x_a)) / (x_b - x_a). Telescopes, so
// a marched tube with constant properties has exactly the one-shot mean.
double nu_over(const model &m, const th_conditions &c, double x_a, double x_b) {
    const double nb = nu_mean(m, c, x_b);
    if (x_a <= 0.0) return nb;
    const double na = nu_mean(m, c, x_a);
    return (x_b * nb - x_a * na) / (x_b - x_a);
}

// Local Nusselt number d(x Nu_m)/dx at x > 0: five-point central
// difference with step 1e-3 x (truncation ~1e-12, rounding ~1e-13).
double nu_local(const model &m, const th_conditions &c, double x) {
    const double d = 1e-3 * x;
    auto g = [&](double xx) { return xx * nu_mean(m, c, xx); };
    return (-g(x + 2 * d) + 8 * g(x + d) - 8 * g(x - d) + g(x - 2 * d)) / (12 * d);
}

coefficient evaluate(const model &m, double t_b, double x_a, double x_b, bool local) {
    note_list bulk_notes;
    const state b = m.fluid.at(t_b, bulk_notes);
    const double re = m.c.mdot * m.sec.d_h / (m.sec.area * b.mu);
    const double length = m.sec.length;

    // The coefficient for a wall at t_w; its own surface temperature is
    // r.t_wall.
    auto at_wall = [&](double t_w) {
        coefficient r;
        r.notes = bulk_notes;
        const state w = m.fluid.wall_at(t_w, r.notes);
        const th_conditions cond = conditions(m, b, re, t_b, w, t_w);
        r.nu = local ? nu_local(m, cond, x_b) : nu_over(m, cond, x_a, x_b);
        if (!(std::isfinite(r.nu) && r.nu > 0.0)) fail(TH_ERR_INTERNAL);
        // Range notes, method and reason: the method applied at this local
        // state over the whole tube length (as the one-shot answer does).
        nu_mean(m, cond, length, &r.nu_info, &r.notes);
        r.bulk = b;
        r.re = re;
        r.pr = b.pr;
        r.mu_ratio = b.mu / w.mu;
        r.h = r.nu * b.k / m.sec.d_h;
        r.t_wall = m.wall.surface(t_b, r.h);
        if (!(std::isfinite(r.t_wall) && r.t_wall > 0.0)) fail(TH_ERR_INPUT);
        return r;
    };

    if (m.wall.kind == TH_TUBE_WALL_TEMPERATURE) return at_wall(m.wall.t_limit);

    // Flux or outside fluid: the wall temperature depends on h, which
    // depends (weakly, through mu_ratio, Pr_w or T_b/T_w) on the wall
    // temperature. Fixed point t_w = W(t_w) by Steffensen's method
    // (Aitken's extrapolation of two plain steps), kept on the physical side.
    const double tol = std::max(0.1 * m.tol, 1e-14 * t_b);
    auto physical = [&](double t) {
        if (!(std::isfinite(t) && t > 0.0)) return false;
        if (m.wall.kind == TH_TUBE_WALL_FLUX) return (t - t_b) * m.wall.q_flux >= 0.0;
        return (t - t_b) * (m.wall.t_limit - t) >= 0.0;
    };
    coefficient r = at_wall(t_b);
    int evaluations = 1;
    double x0 = r.t_wall;
    while (evaluations < m.max_iter) {
        coefficient r1 = at_wall(x0);
        const double x1 = r1.t_wall;
        if (std::fabs(x1 - x0) <= tol) {
            r1.wall_iterations = evaluations + 1;
            return r1;
        }
        coefficient r2 = at_wall(x1);
        const double x2 = r2.t_wall;
        evaluations += 2;
        if (std::fabs(x2 - x1) <= tol) {
            r2.wall_iterations = evaluations;
            return r2;
        }
        const double den = x2 - 2.0 * x1 + x0;
        double x3 = den != 0.0 ? x0 - (x1 - x0) * (x1 - x0) / den : x2;
        if (!physical(x3)) x3 = x2;
        x0 = x3;
    }
    fail(TH_ERR_NO_CONVERGENCE);
}

}  // namespace

coefficient coefficient_over(const model &m, double t_b, double x_a, double x_b) {
    return evaluate(m, t_b, x_a, x_b, false);
}

coefficient coefficient_local(const model &m, double t_b, double x) {
    return evaluate(m, t_b, 0.0, x, true);
}

// ---- one stretch ---------------------------------------------------------------

namespace {

// Widen [t0, t0 + step] away from t0 until f changes sign, without leaving
// [lo, hi]; returns the far end, or fails with TH_ERR_STATE when even the
// limit does not reach the sign change (the fluid would leave its range).
template <class F>
double widen(F &&f, double t0, double f0, double step, double lo, double hi, double &f_end) {
    double t = t0;
    for (int i = 0; i < 200; ++i) {
        step *= 2.0;
        t = std::min(hi, std::max(lo, t0 + step));
        f_end = f(t);
        if ((f_end > 0.0) != (f0 > 0.0) || f_end == 0.0) return t;
        if (t == lo || t == hi) break;
    }
    fail(TH_ERR_STATE);
}

// toms748 (Boost.Math) on a bracket whose end values are known, to an
// absolute width tol (never below 4 ulp). The callers count evaluations.
template <class F>
double bracketed_root(F &&f, double a, double b, double fa, double fb, double tol, int max_iter) {
    if (fa == 0.0) return a;
    if (fb == 0.0) return b;
    if ((fa > 0.0) == (fb > 0.0)) fail(TH_ERR_INTERNAL);
    if (a > b) {
        std::swap(a, b);
        std::swap(fa, fb);
    }
    std::uintmax_t it = static_cast<std::uintmax_t>(max_iter);
    const double abs_tol = std::max(tol, 4.0 * std::numeric_limits<double>::epsilon() * std::fabs(b));
    auto done = [abs_tol](double lo, double hi) { return std::fabs(hi - lo) <= abs_tol; };
    const auto r = boost::math::tools::toms748_solve(f, a, b, fa, fb, done, it);
    if (!done(r.first, r.second)) fail(TH_ERR_NO_CONVERGENCE);
    return 0.5 * (r.first + r.second);
}

}  // namespace

stretch solve_stretch(const model &m, double t_a, double x_a, double x_b) {
    const double dx = x_b - x_a;
    const double mdot = m.c.mdot;
    const double p = m.sec.perimeter;
    stretch s;

    if (m.wall.kind == TH_TUBE_WALL_FLUX) {
        // The outlet follows from the energy balance alone:
        // h(t_out) = h(t_a) + q'' P dx / mdot.
        const double dh = m.wall.q_flux * p * dx / mdot;
        double t_out = t_a;
        if (dh != 0.0) {
            if (m.fluid.constant()) {
                note_list ignore;
                t_out = t_a + dh / m.fluid.at(t_a, ignore).cp;
                if (!(t_out > 0.0)) fail(TH_ERR_STATE);
            } else {
                const double h_a = m.fluid.enthalpy(t_a);
                auto f = [&](double t) {
                    ++s.evaluations;
                    return m.fluid.enthalpy(t) - h_a - dh;
                };
                note_list ignore;
                const double step = dh / m.fluid.at(t_a, ignore).cp;
                const double lo = std::max(m.fluid.t_lowest(), 1e-3);
                double f_end = 0.0;
                const double t_end = widen(f, t_a, -dh, 0.5 * step, lo, m.fluid.t_highest(), f_end);
                t_out = bracketed_root(f, t_a, t_end, -dh, f_end, m.tol, m.max_iter);
                s.residual = std::fabs(f(t_out)) / m.fluid.cp_between(t_a, t_out);
                if (s.residual > 10.0 * std::max(m.tol, 1e-14 * t_out)) fail(TH_ERR_NO_CONVERGENCE);
            }
        }
        s.t_out = t_out;
        s.cp_mean = m.fluid.cp_between(t_a, t_out);
        s.coef = coefficient_over(m, 0.5 * (t_a + t_out), x_a, x_b);
        s.u = s.coef.h;
        return s;
    }

    // Wall or outside temperature: the outlet t is the root of G(t) - t,
    // G being the exponential relation evaluated with properties at the
    // mean of inlet and t and the mean heat capacity between them.
    const double t_lim = m.wall.t_limit;
    auto outlet = [&](double t, coefficient &coef, double &cp, double &u) {
        coef = coefficient_over(m, 0.5 * (t_a + t), x_a, x_b);
        cp = m.fluid.cp_between(t_a, t);
        u = m.wall.u_of(coef.h);
        const double ntu = u * p * dx / (mdot * cp);
        return t_lim - (t_lim - t_a) * std::exp(-ntu);
    };
    auto residual = [&](double t) {
        coefficient coef;
        double cp = 0.0, u = 0.0;
        ++s.evaluations;
        return outlet(t, coef, cp, u) - t;
    };
    double t_out = t_a;
    if (t_lim != t_a) {
        const bool heating = t_lim > t_a;
        // The bulk cannot pass the fluid's range (water: saturation).
        const double end = heating ? std::min(t_lim, m.fluid.t_highest())
                                   : std::max(t_lim, std::max(m.fluid.t_lowest(), 1e-3));
        const double f_a = residual(t_a);
        const double f_end = residual(end);
        if (heating ? f_end > 0.0 : f_end < 0.0) fail(TH_ERR_STATE);  // would boil / freeze
        t_out = bracketed_root(residual, t_a, end, f_a, f_end, m.tol, m.max_iter);
    }
    const double g = outlet(t_out, s.coef, s.cp_mean, s.u);
    s.residual = std::fabs(g - t_out);
    if (s.residual > 10.0 * std::max(m.tol, 1e-14 * t_out)) fail(TH_ERR_NO_CONVERGENCE);
    s.t_out = t_out;
    return s;
}

// ---- whole tube ----------------------------------------------------------------

namespace {

constexpr const char *note_annulus_friction =
    "annulus radius ratio below 0.05: laminar friction extrapolated";

// Mean Darcy friction factor over x_a..x_b at Re, on the hydraulic
// diameter. When the caller leaves the choice to the library (TH_F_AUTO):
// a laminar circular tube with a uniform inlet (combined entry) uses the
// apparent friction factor of the developing flow (th_combined_entry_friction,
// segment mean from the mean values like the Nusselt number); a laminar
// non-circular duct its own f Re (th_duct_laminar). Otherwise the method
// asked for.
double friction_over(const model &m, double re, double x_a, double x_b, note_list &notes) {
    const bool library_choice = m.friction == TH_F_AUTO;
    if (re < TH_RE_LAMINAR_MAX && m.sec.shape == TH_DUCT_CIRCLE && library_choice &&
        m.entry == TH_ENTRY_COMBINED) {
        auto x_f = [&](double x) {  // x f_app(x) Re
            double f_re = 0.0;
            const int s = th_combined_entry_friction(x / (m.sec.d_h * re), &f_re);
            if (TH_FAILED(s)) fail(s);
            return x * f_re;
        };
        const double fb = x_f(x_b);
        const double fa = x_a > 0.0 ? x_f(x_a) : 0.0;
        return (fb - fa) / (x_b - x_a) / re;
    }
    if (re < TH_RE_LAMINAR_MAX && m.sec.shape != TH_DUCT_CIRCLE &&
        (library_choice || m.friction == TH_F_LAMINAR)) {
        double f_re = 0.0;
        const int s = th_duct_laminar(m.sec.shape, m.sec.duct_ratio, &f_re, nullptr, nullptr);
        if (TH_FAILED(s)) fail(s);
        if (s == TH_WARN_RANGE) notes.add(note_annulus_friction);
        return f_re / re;
    }
    range_check rc;
    const double f = th::friction(m.friction, re, m.sec.rel_roughness, rc);
    notes.add(rc);
    return f;
}

}  // namespace

th_tube_result solve_tube(const model &m, int segments, const profile_out *prof, int &status) {
    note_list notes = m.setup_notes;
    const double length = m.sec.length;
    const double t_in = m.c.t_in;
    const double mdot = m.c.mdot;
    const double g_flux = mdot / m.sec.area;  // mass flux G [kg/(m2 s)]
    th_tube_result r{};

    double t_out = t_in, h_mean = 0.0, ua = 0.0, dp_f = 0.0, residual = 0.0, mu_ratio = 1.0;
    double t_wall_in = 0.0, t_wall_out = 0.0;
    int iterations = 0;
    th_nusselt_result info{};

    if (segments == 0) {
        const stretch s = solve_stretch(m, t_in, 0.0, length);
        notes.merge(s.coef.notes);
        t_out = s.t_out;
        h_mean = s.coef.h;
        ua = s.u * m.sec.perimeter * length;
        info = s.coef.nu_info;
        mu_ratio = s.coef.mu_ratio;
        iterations = s.evaluations;
        residual = s.residual;
        // The one-shot model has one coefficient along the whole tube.
        t_wall_in = m.wall.surface(t_in, h_mean);
        t_wall_out = m.wall.surface(t_out, h_mean);
        const double f = friction_over(m, s.coef.re, 0.0, length, notes);
        dp_f = f * (length / m.sec.d_h) * g_flux * g_flux / (2.0 * s.coef.bulk.rho);
        r.f = f;
    } else {
        const int n = segments;
        double t = t_in, h_dx = 0.0, f_dx = 0.0;
        int first_method = -1;
        bool changed = false;
        std::vector<double> t_bulk(static_cast<std::size_t>(n) + 1);
        t_bulk[0] = t_in;
        for (int i = 0; i < n; ++i) {
            const double x_a = length * i / n;
            const double x_b = i + 1 == n ? length : length * (i + 1) / n;
            const double dx = x_b - x_a;
            const stretch s = solve_stretch(m, t, x_a, x_b);
            notes.merge(s.coef.notes);
            h_dx += s.coef.h * dx;
            ua += s.u * m.sec.perimeter * dx;
            const double f = friction_over(m, s.coef.re, x_a, x_b, notes);
            f_dx += f * dx;
            dp_f += f * (dx / m.sec.d_h) * g_flux * g_flux / (2.0 * s.coef.bulk.rho);
            iterations += s.evaluations;
            residual = std::max(residual, s.residual);
            if (first_method < 0) first_method = s.coef.nu_info.method;
            if (s.coef.nu_info.method != first_method) changed = true;
            info = s.coef.nu_info;
            mu_ratio = s.coef.mu_ratio;
            t = s.t_out;
            t_bulk[static_cast<std::size_t>(i) + 1] = checked(t);
        }
        if (changed) notes.add(note_method_changes);
        if (prof != nullptr)
            for (int i = 0; i <= n; ++i) {
                if (prof->x != nullptr) prof->x[i] = i == n ? length : length * i / n;
                if (prof->t_bulk != nullptr) prof->t_bulk[i] = t_bulk[static_cast<std::size_t>(i)];
            }
        t_out = t;
        h_mean = h_dx / length;
        r.f = f_dx / length;

        // Local coefficient and wall temperature at the nodes: at x = 0,
        // where a developing flow's local value is unbounded, the mean over
        // the first segment.
        const bool all_nodes = prof != nullptr && (prof->t_wall != nullptr || prof->h != nullptr);
        auto node = [&](int i, double t_node) {
            const double x = i == n ? length : length * i / n;
            const coefficient c = i == 0 ? coefficient_over(m, t_node, 0.0, length / n)
                                         : coefficient_local(m, t_node, x);
            notes.merge(c.notes);
            if (all_nodes && prof->t_wall != nullptr) prof->t_wall[i] = checked(c.t_wall);
            if (all_nodes && prof->h != nullptr) prof->h[i] = checked(c.h);
            return c.t_wall;
        };
        if (all_nodes) {
            for (int i = 0; i <= n; ++i) {
                const double tw = node(i, t_bulk[static_cast<std::size_t>(i)]);
                if (i == 0) t_wall_in = tw;
                if (i == n) t_wall_out = tw;
            }
        } else {
            t_wall_in = node(0, t_in);
            t_wall_out = node(n, t_out);
        }
    }

    // Summary at the mean bulk temperature.
    const double t_mean = 0.5 * (t_in + t_out);
    const state bm = m.fluid.at(t_mean, notes);
    const state b_in = m.fluid.at(t_in, notes);
    const state b_out = m.fluid.at(t_out, notes);
    const double re = mdot * m.sec.d_h / (m.sec.area * bm.mu);
    const double cp_mean = m.fluid.cp_between(t_in, t_out);
    const double dp_momentum = g_flux * g_flux * (1.0 / b_out.rho - 1.0 / b_in.rho);
    const double dp = dp_f + dp_momentum;
    if (std::fabs(dp) > 0.1 * m.c.p_in) notes.add(note_dp_large);

    th_entry_info entry{};
    const int es = th_entry_state(TH_ENTRY_AUTO, re, bm.pr, length / m.sec.d_h, m.nu_wall, &entry);
    if (TH_FAILED(es)) fail(es);
    int regime = TH_LAMINAR;
    if (TH_FAILED(th_regime_of(re, &regime))) fail(TH_ERR_INTERNAL);

    r.t_out = checked(t_out);
    r.q = checked(mdot * cp_mean * (t_out - t_in));
    r.h_mean = checked(h_mean);
    r.nu_mean = checked(h_mean * m.sec.d_h / bm.k);
    r.ua = checked(ua);
    r.ntu = checked(ua / (mdot * cp_mean));
    r.t_wall_in = checked(t_wall_in);
    r.t_wall_out = checked(t_wall_out);
    r.dp = checked(dp);
    r.dp_friction = checked(dp_f);
    r.t_bulk_mean = checked(t_mean);
    r.re = checked(re);
    r.pr = checked(bm.pr);
    r.regime = regime;
    r.f = checked(r.f);
    r.velocity = checked(g_flux / bm.rho);
    r.cp_mean = checked(cp_mean);
    r.mu_ratio = checked(mu_ratio);
    r.l_over_d = checked(length / m.sec.d_h);
    r.hydro_developed = entry.hydro_developed;
    r.thermal_developed = entry.thermal_developed;
    r.x_fd_thermal_over_d = checked(entry.x_fd_thermal_over_d);
    r.d_h = m.sec.d_h;
    r.area = m.sec.area;
    r.perimeter = m.sec.perimeter;
    r.method = info.method;
    r.method_name = info.method_name != nullptr ? info.method_name : "";
    r.reason = info.reason != nullptr ? info.reason : "";
    r.iterations = iterations;
    r.residual = checked(residual);
    r.segments = segments;
    r.note_count = notes.count();
    for (int i = 0; i < TH_TUBE_NOTES_MAX; ++i)
        r.notes[i] = i < notes.count() ? notes.at(i) : "";
    status = notes.empty() ? TH_OK : TH_WARN_RANGE;
    return r;
}

}  // namespace tube
}  // namespace th
