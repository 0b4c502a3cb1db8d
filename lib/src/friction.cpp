// friction.cpp - Darcy friction factors and pressure drop.
#include "friction_internal.hpp"
#include "internal.hpp"
#include "method_names.hpp"
#include "rows.hpp"

#include <boost/math/constants/constants.hpp>
#include <boost/math/special_functions/lambert_w.hpp>

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

double colebrook(double re, double rr) {
    // 1/sqrt(f) = -c ln(a + b/sqrt(f)), c = 2/ln 10, a = (eps/D)/3.7,
    // b = 2.51/Re. With y = a + b/sqrt(f) = b c w the equation becomes
    // w + ln w = z, z = a/(b c) - ln(b c), i.e. w = W0(e^z) (Lambert W).
    // Then 1/sqrt(f) = -c ln(b c w): taken in this form, not as c w - a/b,
    // because the latter cancels catastrophically when a/(b c) is large.
    const double c = 2.0 / std::log(10.0);
    const double a = rr / 3.7;
    const double b = 2.51 / re;
    const double z = a / (b * c) - std::log(b * c);
    double w;
    if (z < 700.0) {
        // e^z is representable: the closed form through Boost.Math.
        w = boost::math::lambert_w0(std::exp(z));
    } else {
        // e^z would overflow (very rough pipes at very high Re). Solve
        // w + ln w = z directly in log space: the de Bruijn asymptotic
        // expansion (error ~ (ln z / z)^5 < 1e-10 for z >= 700), then one
        // Newton step on g(w) = w + ln w - z, which squares that error.
        const double l1 = z;
        const double l2 = std::log(z);
        w = l1 - l2 + l2 / l1 + l2 * (l2 - 2.0) / (2.0 * l1 * l1) +
            l2 * (6.0 - 9.0 * l2 + 2.0 * l2 * l2) / (6.0 * l1 * l1 * l1);
        w -= (w + std::log(w) - z) / (1.0 + 1.0 / w);
    }
    const double inv_sqrt_f = -c * std::log(b * c * w);
    return 1.0 / (inv_sqrt_f * inv_sqrt_f);
}

namespace {

// Churchill (1977), all regimes:
//   f = 8 [(8/Re)^12 + (A + B)^-1.5]^(1/12),
//   A = [2.457 ln(1/((7/Re)^0.9 + 0.27 eps/D))]^16,  B = (37530/Re)^16.
// The integer powers are taken by repeated squaring and (A+B)^-1.5 as
// 1/(s sqrt s): two pow calls and one log in all, which is what makes
// Churchill as fast as the other closed forms. Evaluated so for
// Re >= 1e-8, where no intermediate can overflow: B <= 1.6e202, (8/Re)^12
// <= 7e106, s^1.5 <= 2e303, and A is at most 1e51 for any Re, eps/D. A is
// an even power, so the sign of the logarithm (negative below Re ~ 7) does
// not matter.
double churchill(double re, double rr) {
    if (re >= 1e-8) {
        // One division, off the critical path; ln(1/x) taken as -ln(x).
        const double inv_re = 1.0 / re;
        const double t = -2.457 * std::log(std::pow(7.0 * inv_re, 0.9) + 0.27 * rr);
        const double t2 = t * t, t4 = t2 * t2, t8 = t4 * t4;
        const double q = 37530.0 * inv_re;
        const double q2 = q * q, q4 = q2 * q2, q8 = q4 * q4;
        const double s = t8 * t8 + q8 * q8;
        const double r = 8.0 * inv_re;
        const double r2 = r * r, r4 = r2 * r2;
        const double r12 = r4 * r4 * r4;
        return 8.0 * std::pow(r12 + 1.0 / (s * std::sqrt(s)), 1.0 / 12.0);
    }
    // Creeping flow down to the smallest Re: B and (8/Re)^12 overflow, so
    // the powers are regrouped in logarithms (log-sum-exp for A + B).
    const double ln_a = 16.0 * std::log(std::fabs(
        2.457 * std::log(1.0 / (std::pow(7.0 / re, 0.9) + 0.27 * rr))));
    const double ln_b = 16.0 * std::log(37530.0 / re);
    const double m = std::max(ln_a, ln_b);
    const double ln_sum = m + std::log(std::exp(ln_a - m) + std::exp(ln_b - m));
    const double term2 = std::exp(-1.5 * ln_sum);
    return 8.0 * std::pow(std::pow(8.0 / re, 12.0) + term2, 1.0 / 12.0);
}

}  // namespace

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
        th::range_check rc;
        *f = th::friction_checked(method, re, rel_roughness, rc);
        return rc.status();
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
