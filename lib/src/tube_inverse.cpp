// tube_inverse.cpp - inverse design: the length for a target outlet
// temperature, the mass flow for a target outlet temperature or duty.
//
// Each is a bracketed root search on the forward solution (the case's own
// options, one-shot or marching): the bracket starts at the case's own
// value (length or mass flow, a first guess), is widened by a factor 4 per
// step towards the sign change within the stated limits, and toms748
// (Boost.Math) then narrows it to 1e-12 relative. A uniform flux needs no
// search: its outlet follows from the energy balance alone.
#include "tube_internal.hpp"

#include <boost/math/tools/toms748_solve.hpp>

#include <algorithm>
#include <cmath>
#include <cstdint>

namespace th {
namespace tube {
namespace {

constexpr double widen_factor = 4.0;
constexpr double rel_width = 1e-12;
// Search limits: beyond every correlation's range; they only keep the
// search finite and decide when a target counts as unreachable.
constexpr double l_over_d_min = 1e-3, l_over_d_max = 1e8;
constexpr double re_min = 1e-6, re_max = 1e8;

enum class quantity { length, mdot };

th_tube_case with_value(const th_tube_case &c, quantity which, double v) {
    th_tube_case k = c;
    if (which == quantity::length)
        k.geometry.length = v;
    else
        k.mdot = v;
    return k;
}

// The forward solution at value v. An outlet that would leave the fluid's
// range (water boiling in the bulk; a fluid cooled below its range) fails
// with TH_ERR_STATE; the search treats it as an outlet at that limit, on
// the side the wall drives towards, so that the bracket can still close
// on a target inside the range. Other errors end the search.
struct probe {
    double t_out = 0.0;
    double q = 0.0;
};

probe run(const model &m0, quantity which, double v) {
    const th_tube_case k = with_value(m0.c, which, v);
    probe p;
    try {
        const model m(k);
        int status = TH_OK;
        const th_tube_result r = solve_tube(m, k.options.segments, nullptr, status);
        p.t_out = r.t_out;
        p.q = r.q;
    } catch (const status_error &e) {
        if (e.status != TH_ERR_STATE) throw;
        p.t_out = m0.direction == TH_HEATING ? m0.fluid.t_highest() : m0.fluid.t_lowest();
        p.q = k.mdot * (m0.fluid.enthalpy(p.t_out) - m0.fluid.enthalpy(k.t_in));
    }
    return p;
}

// Root of f on [v_min, v_max] starting from v0: widen by widen_factor per
// step towards the sign change (f increasing with v when `rising`), then
// toms748 to rel_width. False when the range ends before the sign change.
template <class F>
bool search(F &&f, double v0, double v_min, double v_max, bool rising, int max_iter,
            double &root) {
    v0 = std::min(v_max, std::max(v_min, v0));
    const double f0 = f(v0);
    if (f0 == 0.0) {
        root = v0;
        return true;
    }
    const bool go_up = (f0 < 0.0) == rising;
    double a = v0, fa = f0, b = v0, fb = f0;
    for (;;) {
        const double next = go_up ? std::min(v_max, b * widen_factor)
                                  : std::max(v_min, b / widen_factor);
        if (next == b) return false;  // at the limit, still no sign change
        a = b;
        fa = fb;
        b = next;
        fb = f(b);
        if (fb == 0.0) {
            root = b;
            return true;
        }
        if ((fb > 0.0) != (fa > 0.0)) break;
    }
    if (a > b) {
        std::swap(a, b);
        std::swap(fa, fb);
    }
    std::uintmax_t it = static_cast<std::uintmax_t>(max_iter);
    auto done = [](double lo, double hi) { return hi - lo <= rel_width * lo; };
    const auto r = boost::math::tools::toms748_solve(f, a, b, fa, fb, done, it);
    if (!done(r.first, r.second)) fail(TH_ERR_NO_CONVERGENCE);
    root = 0.5 * (r.first + r.second);
    return true;
}

// A target temperature the fluid can have at all; otherwise unreachable.
void need_in_fluid_range(const model &m, double t_target) {
    need_temperature(t_target);
    if (t_target > m.fluid.t_highest() || t_target < m.fluid.t_lowest()) fail(TH_ERR_UNREACHABLE);
}

// t_target strictly between the inlet and the wall / outside temperature.
void need_between(const model &m, double t_target) {
    const double t_in = m.c.t_in, t_lim = m.wall.t_limit;
    const bool ok = t_lim > t_in ? (t_target > t_in && t_target < t_lim)
                                 : (t_target < t_in && t_target > t_lim);
    if (!ok) fail(TH_ERR_UNREACHABLE);
}

// Enthalpy rise to t_target, with the sign the flux drives, or unreachable.
double flux_enthalpy_rise(const model &m, double t_target) {
    const double dh = m.fluid.enthalpy(t_target) - m.fluid.enthalpy(m.c.t_in);
    if (m.wall.q_flux == 0.0 || dh == 0.0 || (dh > 0.0) != (m.wall.q_flux > 0.0))
        fail(TH_ERR_UNREACHABLE);
    return dh;
}

// Solves the case at the answer, writes the result and checks the residual.
int finish(const model &m0, quantity which, double v, double residual_of_result_limit,
           double (*residual)(const th_tube_result &, double), double target, double *answer,
           th_tube_result *result) {
    const th_tube_case k = with_value(m0.c, which, v);
    const model m(k);
    int status = TH_OK;
    const th_tube_result r = solve_tube(m, k.options.segments, nullptr, status);
    if (!(residual(r, target) <= residual_of_result_limit)) fail(TH_ERR_NO_CONVERGENCE);
    *answer = checked(v);
    if (result != nullptr) *result = r;
    return status;
}

double outlet_residual(const th_tube_result &r, double target) { return std::fabs(r.t_out - target); }
double duty_residual(const th_tube_result &r, double target) { return std::fabs(r.q - target); }

// Mass flow at Re on D_h with the inlet viscosity.
double mdot_at_re(const model &m, double re) {
    note_list ignore;
    const state s = m.fluid.at(m.c.t_in, ignore);
    return re * m.sec.area * s.mu / m.sec.d_h;
}

}  // namespace
}  // namespace tube
}  // namespace th

using th::tube::model;
using th::tube::quantity;

extern "C" {

int th_tube_length_for_outlet(const th_tube_case *c, double t_target, double *length,
                              th_tube_result *result) {
    return th::guard([&] {
        th::need_out(length);
        th::need(c != nullptr);
        const model m0(*c);
        th::tube::need_in_fluid_range(m0, t_target);
        const double tol_t = 100.0 * m0.tol;
        double len = 0.0;
        if (m0.wall.kind == TH_TUBE_WALL_FLUX) {
            const double dh = th::tube::flux_enthalpy_rise(m0, t_target);
            len = c->mdot * dh / (m0.wall.q_flux * m0.sec.perimeter);
        } else {
            th::tube::need_between(m0, t_target);
            const bool heating = m0.wall.t_limit > c->t_in;
            auto f = [&](double l) { return th::tube::run(m0, quantity::length, l).t_out - t_target; };
            const double d_h = m0.sec.d_h;
            if (!th::tube::search(f, c->geometry.length, th::tube::l_over_d_min * d_h,
                                  th::tube::l_over_d_max * d_h, heating, m0.max_iter, len))
                th::fail(TH_ERR_UNREACHABLE);
        }
        return th::tube::finish(m0, quantity::length, len, tol_t, th::tube::outlet_residual,
                                t_target, length, result);
    });
}

int th_tube_flow_for_outlet(const th_tube_case *c, double t_target, double *mdot,
                            th_tube_result *result) {
    return th::guard([&] {
        th::need_out(mdot);
        th::need(c != nullptr);
        const model m0(*c);
        th::tube::need_in_fluid_range(m0, t_target);
        const double tol_t = 100.0 * m0.tol;
        double flow = 0.0;
        if (m0.wall.kind == TH_TUBE_WALL_FLUX) {
            const double dh = th::tube::flux_enthalpy_rise(m0, t_target);
            flow = m0.wall.q_flux * m0.sec.perimeter * m0.sec.length / dh;
        } else {
            th::tube::need_between(m0, t_target);
            const bool heating = m0.wall.t_limit > c->t_in;
            // More flow, less change: the outlet falls with the flow when
            // heating (rises when cooling).
            auto f = [&](double w) { return th::tube::run(m0, quantity::mdot, w).t_out - t_target; };
            if (!th::tube::search(f, c->mdot, th::tube::mdot_at_re(m0, th::tube::re_min),
                                  th::tube::mdot_at_re(m0, th::tube::re_max), !heating,
                                  m0.max_iter, flow))
                th::fail(TH_ERR_UNREACHABLE);
        }
        return th::tube::finish(m0, quantity::mdot, flow, tol_t, th::tube::outlet_residual,
                                t_target, mdot, result);
    });
}

int th_tube_flow_for_duty(const th_tube_case *c, double q_target, double *mdot,
                          th_tube_result *result) {
    return th::guard([&] {
        th::need_out(mdot);
        th::need(c != nullptr);
        th::need_finite(q_target);
        const model m0(*c);
        // A uniform flux fixes the duty whatever the flow.
        if (m0.wall.kind == TH_TUBE_WALL_FLUX) th::fail(TH_ERR_UNREACHABLE);
        const double drive = m0.wall.t_limit - c->t_in;
        if (q_target == 0.0 || drive == 0.0 || (q_target > 0.0) != (drive > 0.0))
            th::fail(TH_ERR_UNREACHABLE);
        // An outside fluid caps the duty: every resistance but the inside
        // film, over the whole length, with the inlet difference.
        if (m0.wall.kind == TH_TUBE_WALL_OUTSIDE && m0.wall.r_rest > 0.0) {
            const double q_max = m0.sec.perimeter * m0.sec.length * drive / m0.wall.r_rest;
            if (std::fabs(q_target) >= std::fabs(q_max)) th::fail(TH_ERR_UNREACHABLE);
        }
        auto f = [&](double w) {
            return std::fabs(th::tube::run(m0, quantity::mdot, w).q) - std::fabs(q_target);
        };
        double flow = 0.0;
        if (!th::tube::search(f, c->mdot, th::tube::mdot_at_re(m0, th::tube::re_min),
                              th::tube::mdot_at_re(m0, th::tube::re_max), true, m0.max_iter,
                              flow))
            th::fail(TH_ERR_UNREACHABLE);
        // Duty to 1e-7 relative: the flow is found to 1e-12 relative and the
        // forward solution carries its temperature tolerance.
        const double tol_q = 1e-7 * std::fabs(q_target);
        return th::tube::finish(m0, quantity::mdot, flow, tol_q, th::tube::duty_residual,
                                q_target, mdot, result);
    });
}

}  // extern "C"
