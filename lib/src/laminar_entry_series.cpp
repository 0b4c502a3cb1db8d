// laminar_entry_series.cpp - the exact thermal entry solution of a circular
// tube with a fully developed (parabolic) velocity profile and heating that
// starts at x = 0: the Graetz series for a uniform wall temperature (T) and
// the Siegel, Sparrow & Hallman (1958) series for a uniform wall heat flux
// (H).
//
// Scaling (Shah & London 1978): eta = r/r0, x* = x/(D Re Pr). With the
// parabolic velocity u/u_m = 2(1 - eta^2) the energy equation is
//     (1 - eta^2)/2 dT/dx* = (1/eta) d/deta(eta dT/deta),
// and its separated solutions exp(-2 lambda^2 x*) R(eta) satisfy
//     (eta R')' + lambda^2 eta (1 - eta^2) R = 0,   R(0) = 1, R'(0) = 0,
// whose regular solution is Kummer's function:
//     R(eta; lambda) = exp(-lambda eta^2/2) M(1/2 - lambda/4, 1, lambda eta^2).
// Eigenvalues: R(1) = 0 (T) or R'(1) = 0 (H), found with toms748_solve on
// brackets around the large-n estimates 4n + 8/3 (T) and 4n + 16/3 (H).
//
// Coefficients. With N = int_0^1 eta (1 - eta^2) R^2 deta, differentiating
// the equation in lambda and integrating gives the norm identity
//     2 lambda N = R_lambda(1) R'(1) - R(1) R_lambda'(1),
// so no quadrature is needed:
//   T (R(1) = 0):  G_n = R'(1)^2 / (2 lambda^2 N) = R'(1) / (lambda dR(1)/dlambda)
//        Nu_x = sum G_n E_n / (2 sum (G_n / lambda_n^2) E_n),  E_n = e^{-2 lambda_n^2 x*}
//   H (R'(1) = 0): c_n = R(1)^2 / (2 beta^2 N) = -R(1) / (beta dR'(1)/dbeta)
//        Nu_x = 1 / (11/48 - sum c_n E_n)        (c_n = 1/(2 A_n beta_n^4))
// The lambda-derivatives are taken with Boost's sixth-order finite
// difference (finite_difference_derivative).
//
// Large n. The first n_exact pairs are computed as above. Beyond them the
// asymptotic forms of Sellars, Tribus & Klein (1956) are used, with the
// leading constants from the Leveque limit and the first correction fitted
// to the computed pairs n_exact/2 .. n_exact-1 (the correction exponents
// follow Newman's (1969) expansion for T and are observed in the computed
// pairs for H):
//   T: lambda_n = L + s1 L^{-4/3},                L = 4n + 8/3
//      G_n = C_T lambda^{-1/3} (1 + g1 lambda^{-4/3})
//   H: beta_n = L + s1 L^{-2/3} + s2 L^{-4/3},     L = 4n + 16/3 (n >= 0)
//      c_n = C_H beta^{-5/3} (1 + g1 beta^{-2/3} + g2 beta^{-4/3})
// C_T, C_H follow from matching the sum to the Leveque solution:
//   C_T = 2^{1/3} a_T / Gamma(1/3) * 2,    C_H = 8 / (3 2^{1/3} Gamma(2/3) a_H).
//
// Small x*. The series needs terms up to 2 lambda^2 x* ~ 40, i.e. about
// 1.8/sqrt(x*) terms; the table holds n_table pairs, enough down to
// x_switch = 1e-6. Below x_switch the extended Leveque expansion
//     Nu_x = a x*^{-1/3} + b0 + b1 x*^{1/3}
// is used, a_T = (8/9)^{1/3}/Gamma(4/3) = 1.0767 and
// a_H = 2 pi/(3 sqrt 3) a_T = 1.3019 (Leveque 1928; the flux case by
// Duhamel superposition of the wall-temperature one), b0 from the
// first-order perturbation of the Leveque layer (leveque_b0_t/_h below) and
// b1 fitted to the series between x_switch and 10 x_switch (the expansion
// and the series then differ by < 1e-5 relative below the switch). Between
// x_switch and 2 x_switch the two are blended (smoothstep in ln x*), so the
// local value is continuous; the mean is the integral of the local value,
// hence continuous too.
//
// Mean. TH_MEAN is the mean heat transfer coefficient over 0..x*:
//     Nu_m = (1/x*) int_0^x* Nu_x dx*,
// which for T equals ln(1/theta_bulk)/(4 x*) and for H is the definition of
// Shah & London (1978) (the one their 1.953 x*^{-1/3} fit follows). It is
// evaluated from a table of the running integral at 20 nodes per decade
// (built once with a 7-point Gauss-Legendre rule per interval), interpolated
// by a cubic Hermite in ln x* whose slopes x* Nu_x are exact at the nodes
// (interpolation error about 1e-6 relative, tests/unit/test_entry_thermal.cpp).
#include "entry_internal.hpp"
#include "internal.hpp"

#include <boost/math/constants/constants.hpp>
#include <boost/math/differentiation/finite_difference.hpp>
#include <boost/math/interpolators/cubic_hermite.hpp>
#include <boost/math/quadrature/gauss.hpp>
#include <boost/math/special_functions/gamma.hpp>
#include <boost/math/special_functions/hypergeometric_1F1.hpp>
#include <boost/math/tools/roots.hpp>

#include <algorithm>
#include <array>
#include <cmath>
#include <cstdint>
#include <limits>
#include <memory>
#include <vector>

namespace th {
namespace entry {
namespace {

constexpr int n_exact = 120;      // pairs computed from Kummer's function
constexpr int n_table = 1200;     // pairs held (exact + asymptotic)
constexpr double x_switch = 1e-6; // series above, extended Leveque below
constexpr double exp_cut = 40.0;  // terms with 2 lambda^2 x* > 40 dropped
constexpr double x_table_end = 4.0;   // fully developed to 1e-100 beyond
constexpr int nodes_per_decade = 20;

// e^{-z/2} M(a, b, z) through the logarithm of M, so that large z (up to
// the last exact eigenvalue, ~480) neither overflows nor loses range.
double kummer_scaled(double a, double b, double z) {
    int sign = 1;
    const double lg = boost::math::log_hypergeometric_1F1(a, b, z, &sign);
    return sign * std::exp(lg - 0.5 * z);
}

// R(1; lambda) and R'(1; lambda); dM/dz = a M(a+1, 2, z) for b = 1.
double wall_value(double l) { return kummer_scaled(0.5 - 0.25 * l, 1.0, l); }
double wall_slope(double l) {
    const double a = 0.5 - 0.25 * l;
    return l * (2.0 * a * kummer_scaled(a + 1.0, 2.0, l) - kummer_scaled(a, 1.0, l));
}

double find_root(double (*f)(double), double lo, double hi) {
    std::uintmax_t iters = 100;
    boost::math::tools::eps_tolerance<double> tol(std::numeric_limits<double>::digits - 4);
    const auto r = boost::math::tools::toms748_solve(f, lo, hi, tol, iters);
    if (iters >= 100) fail(TH_ERR_NO_CONVERGENCE);
    return 0.5 * (r.first + r.second);
}

// Leveque leading coefficients of the local Nusselt number, Nu_x = a x*^{-1/3}.
double leveque_a(int wall) {
    using boost::math::constants::pi;
    const double a_t = std::cbrt(8.0 / 9.0) / boost::math::tgamma(4.0 / 3.0);
    return wall == TH_WALL_T ? a_t : a_t * 2.0 * pi<double>() / (3.0 * std::sqrt(3.0));
}

// Second terms of the extended Leveque expansion, Nu_x = a x*^{-1/3} + b0:
// the first-order correction of the wall boundary layer for the wall
// curvature and the curvature of the velocity profile. Derived for this
// project by a regular perturbation of the Leveque similarity solution in
// powers of (9 x*)^{1/3}; the correction problems are linear ODEs in the
// similarity variable, solved with scipy in tests/reference/gen_graetz_scipy.py
// (function leveque_second_order). T: b0 = -6/5 exactly (the ODE solution's
// wall slope is -3/5 to 13 digits); H: b0 = -2 F1(0)/F0(0)^2 = -1.0599833.
// Shah & London's (1978) fits use -0.7 (T) and -1 (H): those are best fits
// over wider x* ranges, not the asymptotic constants.
constexpr double leveque_b0_t = -1.2;
constexpr double leveque_b0_h = -1.0599833;

// Least-squares fit of y = p1 t1 + p2 t2 (two basis values per point).
std::array<double, 2> fit2(const std::vector<std::array<double, 3>> &pts) {
    double a11 = 0, a12 = 0, a22 = 0, b1 = 0, b2 = 0;
    for (const auto &p : pts) {
        a11 += p[0] * p[0];
        a12 += p[0] * p[1];
        a22 += p[1] * p[1];
        b1 += p[0] * p[2];
        b2 += p[1] * p[2];
    }
    const double det = a11 * a22 - a12 * a12;
    return {(b1 * a22 - b2 * a12) / det, (a11 * b2 - a12 * b1) / det};
}

struct series_table {
    int wall = TH_WALL_T;
    double nu_fd = 0;               // fully developed Nu
    std::vector<double> lam, coef;  // eigenvalues and coefficients
    std::vector<double> k;          // 2 lambda_n^2
    std::vector<double> coef_over_l2;  // T only: G_n / lambda_n^2
    double lev_a = 0, lev_b0 = 0, lev_b1 = 0;  // extended Leveque
    double u0 = 0, du = 0;          // running-integral nodes in ln x*
    std::vector<double> running;    // int_0^{x_k} Nu_x dx*
    // Cubic Hermite interpolant of the running integral in u = ln x*; its
    // derivative x* Nu_x is known exactly at the nodes.
    std::shared_ptr<boost::math::interpolators::cubic_hermite<std::vector<double>>> running_i;
};

// The series itself (valid for x >= x_switch).
double series_local(const series_table &t, double x) {
    if (t.wall == TH_WALL_T) {
        // Scale every term by e^{+2 lambda_0^2 x} so nothing underflows at
        // large x*.
        const double k0 = t.k[0];
        double num = 0.0, den = 0.0;
        for (std::size_t n = 0; n < t.k.size(); ++n) {
            const double e = (t.k[n] - k0) * x;
            if (t.k[n] * x > exp_cut && e > exp_cut) break;
            const double w = std::exp(-e);
            num += t.coef[n] * w;
            den += t.coef_over_l2[n] * w;
        }
        return num / (2.0 * den);
    }
    double s = 0.0;
    for (std::size_t n = 0; n < t.k.size(); ++n) {
        const double e = t.k[n] * x;
        if (e > exp_cut) break;
        s += t.coef[n] * std::exp(-e);
    }
    return 1.0 / (1.0 / t.nu_fd - s);
}

double leveque_local(const series_table &t, double x) {
    const double c = std::cbrt(x);
    return t.lev_a / c + t.lev_b0 + t.lev_b1 * c;
}
// int_0^x of the extended Leveque local value.
double leveque_integral(const series_table &t, double x) {
    const double c = std::cbrt(x);
    return x * (1.5 * t.lev_a / c + t.lev_b0 + 0.75 * t.lev_b1 * c);
}

// The local value actually returned: Leveque below x_switch, the series
// above 2 x_switch, a smooth blend in between.
double local_nu(const series_table &t, double x) {
    if (x <= x_switch) return leveque_local(t, x);
    const double s = series_local(t, x);
    if (x >= 2.0 * x_switch) return s;
    const double w = std::log(x / x_switch) / std::log(2.0);
    const double h = w * w * (3.0 - 2.0 * w);
    return (1.0 - h) * leveque_local(t, x) + h * s;
}

// int_{xa}^{xb} Nu_x dx*, Gauss-Legendre in u = ln x*.
double integral_between(const series_table &t, double xa, double xb) {
    if (xb <= xa) return 0.0;
    auto f = [&t](double u) {
        const double x = std::exp(u);
        return local_nu(t, x) * x;
    };
    return boost::math::quadrature::gauss<double, 7>::integrate(f, std::log(xa),
                                                                 std::log(xb));
}

series_table build(int wall) {
    series_table t;
    t.wall = wall;
    const bool is_t = wall == TH_WALL_T;
    t.lam.resize(n_table);
    t.coef.resize(n_table);

    // Exact pairs.
    for (int n = 0; n < n_exact; ++n) {
        const double guess = is_t ? 4.0 * n + 8.0 / 3.0 : 4.0 * n + 16.0 / 3.0;
        const double lo = guess - 1.0, hi = guess + (is_t ? 1.0 : 0.5);
        double l, c;
        if (is_t) {
            l = find_root(wall_value, lo, hi);
            const double d = boost::math::differentiation::finite_difference_derivative(
                wall_value, l);
            c = wall_slope(l) / (l * d);
        } else {
            l = find_root(wall_slope, lo, hi);
            const double d = boost::math::differentiation::finite_difference_derivative(
                wall_slope, l);
            c = -wall_value(l) / (l * d);
        }
        t.lam[static_cast<std::size_t>(n)] = l;
        t.coef[static_cast<std::size_t>(n)] = c;
    }

    // Asymptotic pairs, corrections fitted to the upper half of the exact ones.
    const double a = leveque_a(wall);
    const double c_lead =
        is_t ? 2.0 * std::cbrt(2.0) * a / boost::math::tgamma(1.0 / 3.0)
             : 8.0 / (3.0 * std::cbrt(2.0) * boost::math::tgamma(2.0 / 3.0) * a);
    const double p_lead = is_t ? 1.0 / 3.0 : 5.0 / 3.0;
    std::vector<std::array<double, 3>> lam_pts, coef_pts;
    for (int n = n_exact / 2; n < n_exact; ++n) {
        const double l = t.lam[static_cast<std::size_t>(n)];
        const double big_l = is_t ? 4.0 * n + 8.0 / 3.0 : 4.0 * n + 16.0 / 3.0;
        const double ratio = t.coef[static_cast<std::size_t>(n)] / (c_lead * std::pow(l, -p_lead)) - 1.0;
        if (is_t) {
            lam_pts.push_back({std::pow(big_l, -4.0 / 3.0), 0.0, l - big_l});
            coef_pts.push_back({std::pow(l, -4.0 / 3.0), 0.0, ratio});
        } else {
            lam_pts.push_back({std::pow(big_l, -2.0 / 3.0), std::pow(big_l, -4.0 / 3.0), l - big_l});
            coef_pts.push_back({std::pow(l, -2.0 / 3.0), std::pow(l, -4.0 / 3.0), ratio});
        }
    }
    // One-term fits (T) are the two-term fit with a zero second basis: solve
    // them directly to keep the normal equations regular.
    std::array<double, 2> sl{}, sc{};
    if (is_t) {
        double n1 = 0, d1 = 0, n2 = 0, d2 = 0;
        for (std::size_t i = 0; i < lam_pts.size(); ++i) {
            n1 += lam_pts[i][0] * lam_pts[i][2];
            d1 += lam_pts[i][0] * lam_pts[i][0];
            n2 += coef_pts[i][0] * coef_pts[i][2];
            d2 += coef_pts[i][0] * coef_pts[i][0];
        }
        sl = {n1 / d1, 0.0};
        sc = {n2 / d2, 0.0};
    } else {
        sl = fit2(lam_pts);
        sc = fit2(coef_pts);
    }
    for (int n = n_exact; n < n_table; ++n) {
        const double big_l = is_t ? 4.0 * n + 8.0 / 3.0 : 4.0 * n + 16.0 / 3.0;
        double l, c;
        if (is_t) {
            l = big_l + sl[0] * std::pow(big_l, -4.0 / 3.0);
            c = c_lead * std::pow(l, -p_lead) * (1.0 + sc[0] * std::pow(l, -4.0 / 3.0));
        } else {
            l = big_l + sl[0] * std::pow(big_l, -2.0 / 3.0) + sl[1] * std::pow(big_l, -4.0 / 3.0);
            c = c_lead * std::pow(l, -p_lead) *
                (1.0 + sc[0] * std::pow(l, -2.0 / 3.0) + sc[1] * std::pow(l, -4.0 / 3.0));
        }
        t.lam[static_cast<std::size_t>(n)] = l;
        t.coef[static_cast<std::size_t>(n)] = c;
    }

    t.k.resize(n_table);
    t.coef_over_l2.resize(n_table);
    for (std::size_t n = 0; n < static_cast<std::size_t>(n_table); ++n) {
        t.k[n] = 2.0 * t.lam[n] * t.lam[n];
        t.coef_over_l2[n] = t.coef[n] / (t.lam[n] * t.lam[n]);
    }
    t.nu_fd = is_t ? 0.5 * t.lam[0] * t.lam[0] : 48.0 / 11.0;

    // Extended Leveque: a and b0 from theory, b1 fitted (least squares) to
    // the series on x_switch .. 10 x_switch.
    t.lev_a = a;
    t.lev_b0 = is_t ? leveque_b0_t : leveque_b0_h;
    double num = 0.0, den = 0.0;
    for (int i = 0; i <= 20; ++i) {
        const double x = x_switch * std::pow(10.0, i / 20.0);
        const double c3 = std::cbrt(x);
        num += c3 * (series_local(t, x) - a / c3 - t.lev_b0);
        den += c3 * c3;
    }
    t.lev_b1 = num / den;

    // Running integral of the local value at nodes from x_switch to past
    // x_table_end.
    t.du = std::log(10.0) / nodes_per_decade;
    t.u0 = std::log(x_switch);
    const int nodes =
        static_cast<int>(std::ceil((std::log(x_table_end) - t.u0) / t.du)) + 1;
    t.running.resize(static_cast<std::size_t>(nodes));
    t.running[0] = leveque_integral(t, x_switch);
    for (int i = 1; i < nodes; ++i) {
        const double xa = std::exp(t.u0 + (i - 1) * t.du), xb = std::exp(t.u0 + i * t.du);
        t.running[static_cast<std::size_t>(i)] =
            t.running[static_cast<std::size_t>(i - 1)] + integral_between(t, xa, xb);
    }
    std::vector<double> us(t.running.size()), is = t.running, ds(t.running.size());
    for (std::size_t i = 0; i < us.size(); ++i) {
        us[i] = t.u0 + static_cast<double>(i) * t.du;
        const double x = std::exp(us[i]);
        ds[i] = x * local_nu(t, x);
    }
    t.running_i = std::make_shared<boost::math::interpolators::cubic_hermite<std::vector<double>>>(
        std::move(us), std::move(is), std::move(ds));
    return t;
}

const series_table &table_for(int wall) {
    // Computed once per wall condition on first use (20-35 ms each);
    // C++11 guarantees thread-safe initialisation of function-local statics
    // and the tables are read-only afterwards.
    if (wall == TH_WALL_T) {
        static const series_table t_table = build(TH_WALL_T);
        return t_table;
    }
    static const series_table h_table = build(TH_WALL_H);
    return h_table;
}

double mean_nu(const series_table &t, double x) {
    if (x <= x_switch) return leveque_integral(t, x) / x;
    const double last_x = std::exp(t.u0 + static_cast<double>(t.running.size() - 1) * t.du);
    if (x >= last_x) {
        // Beyond the table the local value equals nu_fd to within 1e-100.
        return (t.running.back() + t.nu_fd * (x - last_x)) / x;
    }
    return (*t.running_i)(std::log(x)) / x;
}

void need_wall(int wall) { need(wall == TH_WALL_T || wall == TH_WALL_H); }

}  // namespace

double nu_fully_developed(int wall) {
    need_wall(wall);
    return table_for(wall).nu_fd;
}

void eigen_pair(int wall, int n, double *lambda, double *coef, bool *exact) {
    need_wall(wall);
    need(n >= 0 && n < n_table);
    const series_table &t = table_for(wall);
    if (lambda) *lambda = t.lam[static_cast<std::size_t>(n)];
    if (coef) *coef = t.coef[static_cast<std::size_t>(n)];
    if (exact) *exact = n < n_exact;
}

int eigen_exact_count() { return n_exact; }
int eigen_table_size() { return n_table; }
double leveque_switch_x_star() { return x_switch; }

}  // namespace entry

double thermal_entry_nu(double x_star, int wall, int averaging) {
    need(!std::isnan(x_star) && x_star > 0.0);
    entry::need_wall(wall);
    need(averaging == TH_MEAN || averaging == TH_LOCAL);
    const entry::series_table &t = entry::table_for(wall);
    if (std::isinf(x_star)) return t.nu_fd;
    return checked(averaging == TH_LOCAL ? entry::local_nu(t, x_star)
                                         : entry::mean_nu(t, x_star));
}

}  // namespace th
