// friction_formulas.hpp - the friction-factor formulas themselves, without
// checks or range notes: inline, so that the library's checked functions
// and the benchmark baselines (bench/baselines.hpp, which measure the API's
// overhead against them) compile the same code. Not installed.
#ifndef TUBEHEAT_FRICTION_FORMULAS_HPP
#define TUBEHEAT_FRICTION_FORMULAS_HPP

#include <boost/math/special_functions/lambert_w.hpp>

#include <algorithm>
#include <cmath>

namespace th {

// Petukhov (1970) smooth-tube friction (0.790 ln Re - 1.64)^-2.
inline double petukhov_f(double re) {
    const double t = 0.790 * std::log(re) - 1.64;
    return 1.0 / (t * t);
}

// Colebrook (1939) solved exactly (Lambert W); Re > 0, eps/D >= 0. Never
// inlined: it is large, and copied into every correlation that may need it
// (friction_for in turbulent.hpp) it costs the smooth-tube path registers
// and instructions (+60 per row of the 2013 transition, measured).
[[gnu::noinline]] inline double colebrook(double re, double rr) {
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
inline double churchill(double re, double rr) {
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

}  // namespace th

#endif
