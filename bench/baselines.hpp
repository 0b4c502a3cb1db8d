// baselines.hpp - what the library's speed is measured against: the inputs
// and the formulas written inline, one copy shared by the Google Benchmark
// program (bench_core.cpp, CPU time) and the callgrind harness
// (calc/instr_count.cpp, instructions), so that both compare the same
// things. Where the library keeps a formula as a function of its own,
// without checks (friction_formulas.hpp, Gnielinski's laminar composite and
// turbulent core), the baseline calls that function, inline: it cannot then
// drift from the library's algebra. The formulas that live only inside a
// checked correlation are written out here.
#ifndef TUBEHEAT_BENCH_BASELINES_HPP
#define TUBEHEAT_BENCH_BASELINES_HPP

#include "tubeheat.h"
#include "turbulent.hpp"  // lib/src: the formula functions, inline

#include <array>
#include <cmath>
#include <cstddef>

namespace th_bench {

// Inputs spread over the range so the branch predictor and the math library
// see realistic variety; the same arrays feed baseline and API. Turbulent
// rows (Re 1.2e4..4.8e6, Pr 0.7..70, mu_b/mu_w 0.5..3, eps/D 0 or
// 1e-5..1e-2) for the turbulent methods and the friction factors; laminar
// rows (Re 100..2000, L/D 5..2000) for the laminar ones; transitional
// (Re 2300..1e4, L/D 5..2000) and liquid-metal (Pr 0.004..0.03) rows for theirs.
constexpr std::size_t n_inputs = 256;
struct inputs {
    std::array<double, n_inputs> re{}, pr{}, rr{}, mu{}, re_lam{}, ld{}, re_tr{}, pr_lm{};
    inputs() {
        for (std::size_t i = 0; i < n_inputs; ++i) {
            const double u = double(i) / n_inputs;
            const auto shuffled = [i](std::size_t k) { return double((i * k) % n_inputs) / n_inputs; };
            re[i] = 1.2e4 * std::pow(400.0, u);
            pr[i] = 0.7 * std::pow(100.0, shuffled(37));
            rr[i] = i % 4 == 0 ? 0.0 : 1e-5 * std::pow(1000.0, shuffled(11));
            mu[i] = 0.5 * std::pow(6.0, shuffled(53));
            re_lam[i] = 100.0 * std::pow(20.0, shuffled(29));
            ld[i] = 5.0 * std::pow(400.0, shuffled(71));
            re_tr[i] = 2300.0 + 7700.0 * shuffled(17);
            pr_lm[i] = 0.004 * std::pow(7.5, shuffled(41));
        }
    }
};
inline const inputs in;

// The rows each method is measured on, as conditions for the API.
enum class rows { turbulent, laminar, transition, liquid_metal };
inline th_conditions conditions_for(rows kind, std::size_t i) {
    th_conditions c;
    th_conditions_init(&c);
    c.re = in.re[i];
    c.pr = in.pr[i];
    c.mu_ratio = in.mu[i];
    switch (kind) {
    case rows::turbulent: break;
    case rows::laminar:
        c.re = in.re_lam[i];
        c.l_over_d = in.ld[i];
        break;
    case rows::transition:
        c.re = in.re_tr[i];
        c.l_over_d = in.ld[i];
        break;
    case rows::liquid_metal: c.pr = in.pr_lm[i]; break;
    }
    return c;
}

// ---- baselines: the formulas inline --------------------------------------
using th::petukhov_f;
inline double db_inline(const th_conditions &c) { return 0.023 * std::pow(c.re, 0.8) * std::pow(c.pr, 0.4); }
inline double st_inline(const th_conditions &c) {
    return 0.027 * std::pow(c.re, 0.8) * std::cbrt(c.pr) * std::pow(c.mu_ratio, 0.14);
}
inline double petukhov_inline(const th_conditions &c) {
    const double f8 = petukhov_f(c.re) / 8.0;
    return f8 * c.re * c.pr / (1.07 + 12.7 * std::sqrt(f8) * (std::pow(c.pr, 2.0 / 3.0) - 1.0));
}
inline double gnielinski_inline(const th_conditions &c) {
    return th::turbulent_detail::gnielinski_core(petukhov_f(c.re), c.re, c.pr, std::pow(c.pr, 2.0 / 3.0));
}
// Fully developed, circular, uniform wall temperature: a constant.
inline double laminar_developed_inline(const th_conditions &) { return 3.6568; }
inline double hausen_inline(const th_conditions &c) {
    const double gz = c.re * c.pr / c.l_over_d;
    return 3.66 + 0.0668 * gz / (1.0 + 0.04 * std::pow(gz, 2.0 / 3.0));
}
inline double sieder_tate_laminar_inline(const th_conditions &c) {
    return 1.86 * std::cbrt(c.re * c.pr / c.l_over_d) * std::pow(c.mu_ratio, 0.14);
}
// Shah's mean T fit, combined-entry default conditions of the API aside
// (the API warns, computes the same fit).
inline double shah_inline(const th_conditions &c) {
    const double xs = c.l_over_d / (c.re * c.pr);
    const double cr = std::cbrt(xs);
    return xs <= 0.005 ? 1.615 / cr - 0.7 : (xs < 0.03 ? 1.615 / cr - 0.2 : 3.657 + 0.0499 / xs);
}
// Gnielinski's laminar mean composite (T, combined entry: the conditions'
// defaults).
inline double gnielinski_laminar_inline(const th_conditions &c) {
    const double z = c.re * c.pr / c.l_over_d;
    return th::laminar_detail::gnielinski_composite(c, z, std::cbrt(z), c.re / c.l_over_d);
}
// Gnielinski 2013: linear in Re between the laminar composite at 2300 and
// the turbulent value (with its length factor) at 1e4, the roots shared as
// the library shares them: cbrt(Pr) and cbrt(D/L) give the laminar end's
// cbrt(z) and the turbulent end's Pr^(2/3) and (D/L)^(2/3).
inline double gnielinski_transition_inline(const th_conditions &c) {
    const double g = (c.re - 2300.0) / 7700.0;
    const double cbrt_pr = std::cbrt(c.pr), cbrt_dl = 1.0 / std::cbrt(c.l_over_d);
    const double lam = th::laminar_detail::gnielinski_composite(c, 2300.0 * c.pr / c.l_over_d,
                                                                std::cbrt(2300.0) * cbrt_pr * cbrt_dl,
                                                                2300.0 / c.l_over_d);
    const double turb = th::turbulent_detail::gnielinski_core(petukhov_f(1e4), 1e4, c.pr, cbrt_pr * cbrt_pr) *
                        (1.0 + cbrt_dl * cbrt_dl);
    return (1.0 - g) * lam + g * turb;
}
inline double seban_shimazaki_inline(const th_conditions &c) { return 5.0 + 0.025 * std::pow(c.re * c.pr, 0.8); }

inline double haaland_inline(double re, double rr) {
    const double t = -1.8 * std::log10(std::pow(rr / 3.7, 1.11) + 6.9 / re);
    return 1.0 / (t * t);
}
inline double swamee_jain_inline(double re, double rr) {
    const double t = std::log10(rr / 3.7 + 5.74 / std::pow(re, 0.9));
    return 0.25 / (t * t);
}
// Churchill (1977) as the library evaluates it (repeated squaring): the
// baseline of the overhead ratio.
inline double churchill_inline(double re, double rr) { return th::churchill(re, rr); }
// Churchill as usually typed, the powers as written: what a spreadsheet
// formula costs (a second reference, not the ratio's baseline).
inline double churchill_pow_inline(double re, double rr) {
    const double a = std::pow(-2.457 * std::log(std::pow(7.0 / re, 0.9) + 0.27 * rr), 16.0);
    const double b = std::pow(37530.0 / re, 16.0);
    return 8.0 * std::pow(std::pow(8.0 / re, 12.0) + 1.0 / std::pow(a + b, 1.5), 1.0 / 12.0);
}
inline double petukhov_friction_inline(double re, double) { return petukhov_f(re); }
inline double laminar_friction_inline(double re, double) { return 64.0 / re; }
// Colebrook exactly, as the library solves it (Lambert W): the baseline of
// the overhead ratio.
inline double colebrook_lambert_w_inline(double re, double rr) { return th::colebrook(re, rr); }
// Colebrook, second reference: the classic fixed-point iteration (what a spreadsheet
// user would otherwise type), to 1e-12 relative.
inline double colebrook_iterative(double re, double rr) {
    double x = 8.0;
    for (int k = 0; k < 100; ++k) {
        const double nx = -2.0 * std::log10(rr / 3.7 + 2.51 * x / re);
        if (std::fabs(nx - x) < 1e-12 * nx) return 1.0 / (nx * nx);
        x = nx;
    }
    return 1.0 / (x * x);
}

// Laminar friction is measured on laminar Re, the others on turbulent Re.
inline const std::array<double, n_inputs> &re_for(int method) {
    return method == TH_F_LAMINAR ? in.re_lam : in.re;
}
inline bool smooth_only(int method) { return method == TH_F_LAMINAR || method == TH_F_PETUKHOV; }
// The relative roughness of input i for a friction method (0 for the
// smooth-tube ones).
inline double rr_for(int method, std::size_t i) { return smooth_only(method) ? 0.0 : in.rr[i]; }

}  // namespace th_bench

#endif
