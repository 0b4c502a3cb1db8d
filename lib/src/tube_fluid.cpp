// tube_fluid.cpp - the fluid of a tube case: water and air through the
// property functions of the library, or the caller's own table of
// (t, rho, cp, mu, k) interpolated linearly in t (viscosity log-linearly),
// and the specific enthalpy used for the energy balance. Also the C entry
// points th_fluid_constant() and th_fluid_props_at().
#include "tube_internal.hpp"

#include <cmath>
#include <cstring>
#include <limits>

namespace th {
namespace tube {

// ---- notes -----------------------------------------------------------------

void note_list::add(const char *s) {
    if (s == nullptr || *s == '\0') return;
    for (int i = 0; i < n_; ++i)
        if (std::strcmp(v_[static_cast<std::size_t>(i)], s) == 0) return;
    if (n_ < TH_TUBE_NOTES_MAX) v_[static_cast<std::size_t>(n_++)] = s;
}

void note_list::merge(const note_list &o) {
    for (int i = 0; i < o.n_; ++i) add(o.at(i));
}

namespace {

// Water region 1 of IF97 as the library states it: 273.15..623.15 K.
constexpr double water_t_min = 273.15;
constexpr double water_t_max = 623.15;
// The hard limits of th_air_props.
constexpr double air_t_min = 150.0;
constexpr double air_t_max = 3000.0;

constexpr const char *note_table_extrapolated =
    "user property table extrapolated beyond its temperature range";
constexpr const char *note_water_wall_boiling =
    "wall above the saturation temperature of water at the inlet pressure: "
    "subcooled boiling likely, single-phase results not valid (wall "
    "properties taken at saturation)";
constexpr const char *note_water_wall_freezing =
    "wall below 273.15 K: ice may form on the wall (wall properties taken at "
    "273.15 K)";
constexpr const char *note_air_wall_range =
    "wall temperature outside 150..3000 K: air wall properties taken at the "
    "nearest limit";
constexpr const char *note_user_wall_range =
    "wall temperature so far outside the user table that a property would "
    "not be positive: wall properties taken at the table end";

void raise_if_failed(int status) {
    if (TH_FAILED(status)) fail(status);
}

state from_props(const th_fluid_props &p) {
    state s;
    s.rho = p.rho;
    s.cp = p.cp;
    s.mu = p.mu;
    s.k = p.k;
    s.pr = p.pr;
    return s;
}

}  // namespace

void validate_fluid(const th_fluid &f) {
    switch (f.kind) {
    case TH_FLUID_WATER:
    case TH_FLUID_AIR:
        return;
    case TH_FLUID_USER:
        break;
    default:
        fail(TH_ERR_INPUT);  // TH_FLUID_UNSET or unknown
    }
    need(f.gas == 0 || f.gas == 1);
    need(f.n >= 1 && f.n <= TH_FLUID_TABLE_MAX);
    for (int i = 0; i < f.n; ++i) {
        const auto j = static_cast<std::size_t>(i);
        need_positive(f.rho[j]);
        need_positive(f.cp[j]);
        need_positive(f.mu[j]);
        need_positive(f.k[j]);
        if (f.n > 1) {
            need_temperature(f.t[j]);
            if (i > 0) need(f.t[j] > f.t[j - 1]);
        }
    }
}

fluid_model::fluid_model(const th_fluid &f, double p) : f_(f), p_(p) {
    validate_fluid(f);
    need_positive(p);
    kind_ = f.kind;
    n_ = f.kind == TH_FLUID_USER ? f.n : 0;
    switch (kind_) {
    case TH_FLUID_WATER: {
        gas_ = false;
        t_lo_ = water_t_min;
        double t_sat = water_t_max;
        const int s = th_water_saturation_temperature(p, &t_sat);
        if (s == TH_OK) {
            t_sat = std::fmin(t_sat, water_t_max);
        } else if (s == TH_ERR_STATE && p > 611.213) {
            t_sat = water_t_max;  // above the critical pressure: no boiling
        } else {
            fail(TH_ERR_STATE);  // too low a pressure for liquid water
        }
        // The highest temperature the liquid accepts at p: step down from
        // saturation until the property function agrees it is liquid (the
        // inverse saturation line round-trips to within a few ulp).
        double t = t_sat;
        th_fluid_props probe{};
        for (int i = 0; i < 8; ++i) {
            if (!TH_FAILED(th_water_props(t, p, &probe))) break;
            t = t_sat - 1e-9 * std::pow(10.0, i);
        }
        raise_if_failed(th_water_props(t, p, &probe));
        t_hi_ = t;
        break;
    }
    case TH_FLUID_AIR: {
        gas_ = true;
        t_lo_ = air_t_min;
        t_hi_ = air_t_max;
        th_fluid_props probe{};
        raise_if_failed(th_air_props(300.0, p, &probe));  // pressure range
        break;
    }
    default:
        gas_ = f.gas == 1;
        t_lo_ = 0.0;
        t_hi_ = std::numeric_limits<double>::infinity();
        // Enthalpy at the nodes: exact integral of the piecewise-linear cp.
        h_node_[0] = 0.0;
        for (int i = 1; i < n_; ++i) {
            const auto j = static_cast<std::size_t>(i);
            h_node_[j] = h_node_[j - 1] + 0.5 * (f_.cp[j - 1] + f_.cp[j]) * (f_.t[j] - f_.t[j - 1]);
        }
        break;
    }
}

// Linear interpolation (log-linear for mu) in the user table; the end
// segments extend beyond the table.
state fluid_model::table_at(double t, bool &extrapolated) const {
    extrapolated = false;
    state s;
    if (n_ == 1) {
        s.rho = f_.rho[0];
        s.cp = f_.cp[0];
        s.mu = f_.mu[0];
        s.k = f_.k[0];
    } else {
        std::size_t i = 0;  // segment t[i]..t[i+1]
        while (i + 2 < static_cast<std::size_t>(n_) && t > f_.t[i + 1]) ++i;
        extrapolated = t < f_.t[0] || t > f_.t[static_cast<std::size_t>(n_ - 1)];
        const double w = (t - f_.t[i]) / (f_.t[i + 1] - f_.t[i]);
        auto lin = [&](const double *v) { return v[i] + w * (v[i + 1] - v[i]); };
        s.rho = lin(f_.rho);
        s.cp = lin(f_.cp);
        s.k = lin(f_.k);
        s.mu = std::exp(std::log(f_.mu[i]) + w * (std::log(f_.mu[i + 1]) - std::log(f_.mu[i])));
    }
    if (!(s.rho > 0.0 && s.cp > 0.0 && s.k > 0.0 && s.mu > 0.0)) fail(TH_ERR_STATE);
    s.pr = s.cp * s.mu / s.k;
    return s;
}

state fluid_model::at(double t, note_list &notes) const {
    need_temperature(t);
    th_fluid_props p{};
    switch (kind_) {
    case TH_FLUID_WATER: {
        const int s = th_water_props(t, p_, &p);
        raise_if_failed(s);
        if (s == TH_WARN_RANGE) notes.add(p.range_note);
        return from_props(p);
    }
    case TH_FLUID_AIR: {
        const int s = th_air_props(t, p_, &p);
        raise_if_failed(s);
        if (s == TH_WARN_RANGE) notes.add(p.range_note);
        return from_props(p);
    }
    default: {
        bool ex = false;
        const state s = table_at(t, ex);
        if (ex) notes.add(note_table_extrapolated);
        return s;
    }
    }
}

state fluid_model::wall_at(double t, note_list &notes) const {
    need_temperature(t);
    if (kind_ == TH_FLUID_WATER) {
        if (t > t_hi_) {
            notes.add(note_water_wall_boiling);
            return at(t_hi_, notes);
        }
        if (t < t_lo_) {
            notes.add(note_water_wall_freezing);
            return at(t_lo_, notes);
        }
        return at(t, notes);
    }
    if (kind_ == TH_FLUID_AIR) {
        if (t > t_hi_ || t < t_lo_) {
            notes.add(note_air_wall_range);
            return at(std::fmin(std::fmax(t, t_lo_), t_hi_), notes);
        }
        return at(t, notes);
    }
    bool ex = false;
    try {
        const state s = table_at(t, ex);
        if (ex) notes.add(note_table_extrapolated);
        return s;
    } catch (const status_error &e) {
        if (e.status != TH_ERR_STATE || n_ < 2) throw;
        notes.add(note_user_wall_range);
        const double te = t < f_.t[0] ? f_.t[0] : f_.t[static_cast<std::size_t>(n_ - 1)];
        return table_at(te, ex);
    }
}

double fluid_model::enthalpy(double t) const {
    need_temperature(t);
    double h = 0.0;
    switch (kind_) {
    case TH_FLUID_WATER:
        raise_if_failed(th_water_enthalpy(t, p_, &h));
        return h;
    case TH_FLUID_AIR:
        raise_if_failed(th_air_enthalpy(t, p_, &h));
        return h;
    default:
        break;
    }
    if (n_ == 1) return f_.cp[0] * t;
    // Segment holding t (end segments extended), then the exact integral of
    // the linear cp from its first node.
    std::size_t i = 0;
    while (i + 2 < static_cast<std::size_t>(n_) && t > f_.t[i + 1]) ++i;
    const double dt = t - f_.t[i];
    const double slope = (f_.cp[i + 1] - f_.cp[i]) / (f_.t[i + 1] - f_.t[i]);
    const double cp_t = f_.cp[i] + slope * dt;
    if (!(cp_t > 0.0)) fail(TH_ERR_STATE);
    return h_node_[i] + f_.cp[i] * dt + 0.5 * slope * dt * dt;
}

double fluid_model::cp_between(double ta, double tb) const {
    if (std::fabs(tb - ta) < 1e-3) {
        note_list ignore;
        return at(0.5 * (ta + tb), ignore).cp;
    }
    return (enthalpy(tb) - enthalpy(ta)) / (tb - ta);
}

}  // namespace tube
}  // namespace th

extern "C" {

int th_fluid_constant(th_fluid *f, double rho, double cp, double mu, double k, int gas) {
    return th::guard([&] {
        th::need_out(f);
        th::need_positive(rho);
        th::need_positive(cp);
        th::need_positive(mu);
        th::need_positive(k);
        th::need(gas == 0 || gas == 1);
        th_fluid v{};
        v.kind = TH_FLUID_USER;
        v.gas = gas;
        v.n = 1;
        v.rho[0] = rho;
        v.cp[0] = cp;
        v.mu[0] = mu;
        v.k[0] = k;
        *f = v;
        return TH_OK;
    });
}

int th_fluid_props_at(const th_fluid *f, double t, double p, th_fluid_props *out) {
    return th::guard([&] {
        th::need_out(out);
        th::need(f != nullptr);
        const th::tube::fluid_model m(*f, p);
        th::tube::note_list notes;
        const th::tube::state s = m.at(t, notes);
        th_fluid_props v{};
        v.rho = th::checked(s.rho);
        v.cp = th::checked(s.cp);
        v.mu = th::checked(s.mu);
        v.k = th::checked(s.k);
        v.pr = th::checked(s.pr);
        v.h = th::checked(m.enthalpy(t));
        v.range_note = notes.empty() ? "" : notes.at(0);
        *out = v;
        return notes.empty() ? TH_OK : TH_WARN_RANGE;
    });
}

}  // extern "C"
