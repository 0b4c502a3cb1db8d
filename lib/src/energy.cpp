// energy.cpp - the tube energy balance: heat rate, LMTD, outlet temperature
// for a uniform surrounding temperature (wall or outside fluid through UA)
// and for uniform flux, overall UA of a tube wall, and the inverse problems
// (length for a target outlet temperature).
#include "internal.hpp"

#include <boost/math/constants/constants.hpp>

#include <cmath>

using th::checked;
using th::fail;
using th::guard;
using th::need;
using th::need_nonnegative;
using th::need_out;
using th::need_positive;
using th::need_temperature;

namespace {
constexpr double pi = boost::math::constants::pi<double>();
}

extern "C" {

int th_heat_rate(double mdot, double cp, double t_in, double t_out, double *q) {
    return guard([&] {
        need_out(q);
        need_nonnegative(mdot);
        need_positive(cp);
        need_temperature(t_in);
        need_temperature(t_out);
        *q = checked(mdot * cp * (t_out - t_in));
        return TH_OK;
    });
}

int th_lmtd(double dt_in, double dt_out, double *lmtd) {
    return guard([&] {
        need_out(lmtd);
        need(std::isfinite(dt_in) && std::isfinite(dt_out));
        need(dt_in != 0.0 && dt_out != 0.0);
        // Opposite signs mean a temperature cross: no log mean exists.
        need((dt_in > 0.0) == (dt_out > 0.0));
        const double r = dt_in / dt_out;
        // Near r = 1 the quotient (a-b)/ln(a/b) loses digits; log1p keeps
        // them and the limit r -> 1 is the arithmetic mean.
        const double lr = std::log1p(r - 1.0);
        double v;
        if (std::fabs(r - 1.0) < 1e-6)
            v = 0.5 * (dt_in + dt_out) * (1.0 - (r - 1.0) * (r - 1.0) / (12.0 * r));
        else
            v = (dt_in - dt_out) / lr;
        *lmtd = checked(v);
        return TH_OK;
    });
}

int th_outlet_temperature_ua(double t_in, double t_s, double ua, double mdot,
                             double cp, double *t_out) {
    return guard([&] {
        need_out(t_out);
        need_temperature(t_in);
        need_temperature(t_s);
        need_nonnegative(ua);
        need_positive(mdot);
        need_positive(cp);
        const double ntu = ua / (mdot * cp);
        *t_out = checked(t_s - (t_s - t_in) * std::exp(-ntu));
        return TH_OK;
    });
}

int th_outlet_temperature_flux(double t_in, double q_flux, double perimeter,
                               double length, double mdot, double cp,
                               double h_out, double *t_out, double *t_wall_out) {
    return guard([&] {
        need_out(t_out);
        need_temperature(t_in);
        need(std::isfinite(q_flux));
        need_positive(perimeter);
        need_nonnegative(length);
        need_positive(mdot);
        need_positive(cp);
        need_positive(h_out);
        const double to = checked(t_in + q_flux * perimeter * length / (mdot * cp));
        const double tw = checked(to + q_flux / h_out);
        // A cooled fluid cannot go below absolute zero: the data are
        // inconsistent (flux far too large for the flow).
        need(to > 0.0 && tw > 0.0);
        *t_out = to;
        if (t_wall_out) *t_wall_out = tw;
        return TH_OK;
    });
}

int th_ua_tube(double h_i, double d_i, double d_o, double k_wall, double h_o,
               double rf_i, double rf_o, double length, double *ua) {
    return guard([&] {
        need_out(ua);
        need_positive(h_i);
        need_positive(d_i);
        need_positive(d_o);
        need(d_o >= d_i);
        // A thin wall (d_o == d_i) has no conduction resistance whatever
        // k_wall is; otherwise k_wall must be a conductivity.
        if (d_o > d_i) need_positive(k_wall);
        need(!std::isnan(h_o) && h_o > 0.0);  // +inf allowed: surface held at T_s
        need_nonnegative(rf_i);
        need_nonnegative(rf_o);
        need_positive(length);
        const double a_i = pi * d_i * length;
        const double a_o = pi * d_o * length;
        double r = 1.0 / (h_i * a_i) + rf_i / a_i + rf_o / a_o;
        if (d_o > d_i) r += std::log(d_o / d_i) / (2.0 * pi * k_wall * length);
        if (std::isfinite(h_o)) r += 1.0 / (h_o * a_o);
        *ua = checked(1.0 / r);
        return TH_OK;
    });
}

int th_length_for_outlet_ua(double t_in, double t_target, double t_s,
                            double ua_per_length, double mdot, double cp,
                            double *length) {
    return guard([&] {
        need_out(length);
        need_temperature(t_in);
        need_temperature(t_target);
        need_temperature(t_s);
        need_positive(ua_per_length);
        need_positive(mdot);
        need_positive(cp);
        // The outlet approaches t_s from the inlet side and never reaches
        // it; the target must lie strictly between, or equal the inlet.
        const double in_gap = t_s - t_in;
        const double out_gap = t_s - t_target;
        if (in_gap == 0.0 || out_gap == 0.0 || (in_gap > 0.0) != (out_gap > 0.0) ||
            std::fabs(out_gap) > std::fabs(in_gap))
            fail(TH_ERR_UNREACHABLE);
        *length = checked(mdot * cp / ua_per_length * std::log(in_gap / out_gap));
        return TH_OK;
    });
}

int th_length_for_outlet_flux(double t_in, double t_target, double q_flux,
                              double perimeter, double mdot, double cp,
                              double *length) {
    return guard([&] {
        need_out(length);
        need_temperature(t_in);
        need_temperature(t_target);
        need(std::isfinite(q_flux));
        need_positive(perimeter);
        need_positive(mdot);
        need_positive(cp);
        const double rise = t_target - t_in;
        if (rise == 0.0) {
            *length = 0.0;
            return TH_OK;
        }
        if (q_flux == 0.0 || (rise > 0.0) != (q_flux > 0.0)) fail(TH_ERR_UNREACHABLE);
        *length = checked(mdot * cp * rise / (q_flux * perimeter));
        return TH_OK;
    });
}

}  // extern "C"
