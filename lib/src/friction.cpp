// friction.cpp - Darcy friction factors and pressure drop.
#include "friction_internal.hpp"
#include "internal.hpp"
#include "method_names.hpp"
#include "rows.hpp"

#include <boost/math/constants/constants.hpp>

#include <algorithm>
#include <cmath>
#include <type_traits>

using th::checked;
using th::fail;
using th::guard;
using th::need;
using th::need_nonnegative;
using th::need_out;
using th::need_positive;

namespace th {

// What method M needs of the relative roughness alone, computed once per
// th_friction_factor_array call (the rows share one pipe) and once per
// single call: Haaland's (eps/D/3.7)^1.11 is a pow that a row would
// otherwise pay again. The same expression either way, so a row equals the
// single call bit for bit.
struct roughness {
    double rr = 0.0;
    double haaland_term = 0.0;
};
template <int M>
roughness roughness_of(double rr) {
    roughness r;
    r.rr = rr;
    if constexpr (M == TH_F_HAALAND) r.haaland_term = std::pow(rr / 3.7, 1.11);
    return r;
}

// Friction factor by method M; Range is range_check (the first violated
// limit kept, for a single call) or range_flag (only whether one was, for
// the array form).
template <int M, class Range>
double friction_of(double re, const roughness &rough, Range &rc) {
    const double rr = rough.rr;
    if constexpr (M == TH_F_AUTO) {
        if (re < TH_RE_LAMINAR_MAX) return 64.0 / re;  // as TH_F_LAMINAR
        rc.require(re >= 4000.0, "transitional flow (2300 <= Re < 4000): "
                                 "friction factor uncertain, Colebrook used");
        rc.require(rr <= 0.05, "relative roughness above 0.05 (Colebrook range)");
        return colebrook(re, rr);
    }
    if constexpr (M == TH_F_LAMINAR) {  // Hagen-Poiseuille, analytic
        rc.require(re < TH_RE_LAMINAR_MAX, "laminar 64/Re applied at Re >= 2300");
        return 64.0 / re;
    }
    if constexpr (M == TH_F_COLEBROOK) {
        rc.require(re >= 4000.0, "Re below 4000 (Colebrook range 4e3..1e8)");
        rc.require(re <= 1e8, "Re above 1e8 (Colebrook range 4e3..1e8)");
        rc.require(rr <= 0.05, "relative roughness above 0.05 (Colebrook range)");
        return colebrook(re, rr);
    }
    if constexpr (M == TH_F_HAALAND) {
        rc.require(re >= 4000.0, "Re below 4000 (Haaland range 4e3..1e8)");
        rc.require(re <= 1e8, "Re above 1e8 (Haaland range 4e3..1e8)");
        rc.require(rr == 0.0 || (rr >= 1e-6 && rr <= 0.05),
                   "relative roughness outside Haaland range 1e-6..0.05");
        const double t = -1.8 * std::log10(rough.haaland_term + 6.9 / re);
        return 1.0 / (t * t);
    }
    if constexpr (M == TH_F_SWAMEE_JAIN) {
        rc.require(re >= 5000.0, "Re below 5000 (Swamee-Jain range 5e3..1e8)");
        rc.require(re <= 1e8, "Re above 1e8 (Swamee-Jain range 5e3..1e8)");
        rc.require(rr == 0.0 || (rr >= 1e-6 && rr <= 0.01),
                   "relative roughness outside Swamee-Jain range 1e-6..1e-2");
        const double t = std::log10(rr / 3.7 + 5.74 / std::pow(re, 0.9));
        return 0.25 / (t * t);
    }
    if constexpr (M == TH_F_CHURCHILL) {
        rc.require(rr <= 0.05, "relative roughness above 0.05 (Churchill range)");
        return churchill(re, rr);
    }
    if constexpr (M == TH_F_PETUKHOV) {
        rc.require(re >= 3000.0, "Re below 3000 (Petukhov friction range 3e3..5e6)");
        rc.require(re <= 5e6, "Re above 5e6 (Petukhov friction range 3e3..5e6)");
        rc.require(rr == 0.0, "Petukhov friction is for smooth tubes; roughness ignored");
        return petukhov_f(re);
    }
}

template <class Visit>
decltype(auto) with_friction_method(int method, Visit &&visit) {
    return with_id<0, TH_F_METHOD_COUNT>(method, std::forward<Visit>(visit));
}

// The friction factor, and TH_ERR_INPUT unless it is finite and positive
// (1/t^2 underflows to 0 when 6.9/Re overflows at a subnormal Re).
template <int M, class Range>
double friction_checked_of(double re, const roughness &rough, Range &rc) {
    return positive_result(friction_of<M>(re, rough, rc));
}

// Method M for every row of th_friction_factor_array: the roughness was
// checked once (shared_status); per row only its Re, read before the row's
// result is written (in place).
template <int M>
int friction_rows(std::size_t n, const double *re, double rr, int shared_status, double *f, int *status) {
    if (shared_status != TH_OK)
        return for_each_row(n, f, status, [&](std::size_t, double &) { return shared_status; });
    const roughness rough = roughness_of<M>(rr);
    return for_each_row(n, f, status, [&](std::size_t i, double &value) {
        const double re_i = re[i];
        if (!positive_finite(re_i)) return int{TH_ERR_INPUT};
        return guard([&] {
            range_flag rc;
            value = friction_checked_of<M>(re_i, rough, rc);
            return rc.status();
        });
    });
}

double friction(int method, double re, double rr, range_check &rc) {
    return with_friction_method(method, [&](auto m) {
        constexpr int M = decltype(m)::value;
        return friction_of<M>(re, roughness_of<M>(rr), rc);
    });
}

double friction_checked(int method, double re, double rr, range_check &rc) {
    return with_friction_method(method,
                                [&](auto m) {
                                    constexpr int M = decltype(m)::value;
                                    return friction_checked_of<M>(re, roughness_of<M>(rr), rc);
                                });
}

}  // namespace th

namespace {
// First entry per id is the display name; later ones are aliases.
constexpr th::method_name friction_names[] = {
    {TH_F_AUTO, "auto"},
    {TH_F_LAMINAR, "laminar"},
    {TH_F_LAMINAR, "Hagen-Poiseuille"},
    {TH_F_COLEBROOK, "Colebrook"},
    {TH_F_COLEBROOK, "Colebrook-White"},
    {TH_F_HAALAND, "Haaland"},
    {TH_F_SWAMEE_JAIN, "Swamee-Jain"},
    {TH_F_CHURCHILL, "Churchill"},
    {TH_F_CHURCHILL, "Churchill 1977"},
    {TH_F_PETUKHOV, "Petukhov"},
};
constexpr auto friction_display = th::index_names<TH_F_METHOD_COUNT>(friction_names);
}  // namespace

extern "C" {

int th_friction_factor(int method, double re, double rel_roughness, double *f) {
    return guard([&] {
        need_out(f);
        if (method < 0 || method >= TH_F_METHOD_COUNT) fail(TH_ERR_METHOD);
        need_positive(re);
        th::need_rel_roughness(rel_roughness);
        // Dispatched here, not through friction_checked(): with the method
        // known inside this function the range bookkeeping stays in
        // registers (30 instructions a call less, measured).
        return th::with_friction_method(method, [&](auto m) {
            constexpr int M = decltype(m)::value;
            th::range_check rc;
            *f = th::friction_checked_of<M>(re, th::roughness_of<M>(rel_roughness), rc);
            return rc.status();
        });
    });
}

int th_friction_factor_array(int method, std::size_t n, const double *re, double rel_roughness,
                             double *f, int *status) {
    return guard([&] {
        if (method < 0 || method >= TH_F_METHOD_COUNT) fail(TH_ERR_METHOD);
        if (n == 0) return int{TH_OK};
        need(re != nullptr && f != nullptr && status != nullptr);
        // The roughness once; when it is bad every row fails, as
        // th_friction_factor fails each of them.
        const int shared_status = guard([&] {
            th::need_rel_roughness(rel_roughness);
            return TH_OK;
        });
        return th::with_friction_method(method, [&](auto m) {
            return th::friction_rows<decltype(m)::value>(n, re, rel_roughness, shared_status, f, status);
        });
    });
}

int th_pressure_drop(double f, double length, double d, double rho, double u,
                     double *dp) {
    return guard([&] {
        need_out(dp);
        need_positive(f);
        need_nonnegative(length);
        need_positive(d);
        need_positive(rho);
        need_nonnegative(u);
        *dp = checked(f * (length / d) * rho * u * u / 2.0);
        return TH_OK;
    });
}

int th_pressure_drop_mass_flow(int method, double mdot, double d, double length,
                               double rel_roughness, double rho, double mu,
                               double *f, double *dp) {
    return guard([&] {
        need_out(dp);
        if (method < 0 || method >= TH_F_METHOD_COUNT) fail(TH_ERR_METHOD);
        need_positive(mdot);
        need_positive(d);
        need_nonnegative(length);
        th::need_rel_roughness(rel_roughness);
        need_positive(rho);
        need_positive(mu);
        constexpr double pi = boost::math::constants::pi<double>();
        const double area = pi * d * d / 4.0;
        const double u = mdot / (rho * area);
        const double re = rho * u * d / mu;
        th::range_check rc;
        const double ff = th::friction_checked(method, re, rel_roughness, rc);
        const double p = checked(ff * (length / d) * rho * u * u / 2.0);
        if (f) *f = ff;
        *dp = p;
        return rc.status();
    });
}

int th_friction_method_from_name(const char *name, int *method) {
    return th::method_from_name(friction_names, name, method);
}

const char *th_friction_method_name(int method) { return friction_display(method); }

}  // extern "C"
