// turbulent.hpp - turbulent and transitional Nusselt correlations, and the
// liquid-metal ones. Defined inline here, not in a .cpp: they are the
// library's most called code, and only with their bodies visible can
// th_nusselt() keep the range bookkeeping in registers and fold the
// validation into straight-line code (docs/performance.md: API overhead).
// Included by correlations.hpp. Not installed.
#ifndef TUBEHEAT_TURBULENT_HPP
#define TUBEHEAT_TURBULENT_HPP

#include "friction_internal.hpp"
#include "internal.hpp"
#include "laminar.hpp"

#include <cmath>

namespace th {

namespace turbulent_detail {

template <class Range>
inline void length_at_least_10d(const th_conditions &c, Range &rc, const char *note) {
    rc.require(c.l_over_d >= 10.0, note);
}

// Darcy f for the Gnielinski/Petukhov forms: Petukhov's smooth-tube fit,
// Colebrook when the tube is rough.
inline double friction_for(const th_conditions &c, double re) {
    return c.rel_roughness > 0.0 ? colebrook(re, c.rel_roughness) : petukhov_f(re);
}

// Gnielinski's property-variation factor K (from memory: VDI Heat Atlas).
template <class Range>
inline double property_factor(const th_conditions &c, Range &rc) {
    switch (c.correction) {
    case TH_CORR_NONE:
        return 1.0;
    case TH_CORR_LIQUID: {
        const double r = c.pr / c.pr_wall;
        rc.require(r >= 0.05 && r <= 20.0, "Pr/Pr_w outside 0.05..20 for the liquid correction");
        return std::pow(r, 0.11);
    }
    case TH_CORR_GAS:
        // Heating a gas (T_b < T_w) lowers Nu; no correction when cooled.
        if (c.t_ratio >= 1.0) return 1.0;
        rc.require(c.t_ratio >= 0.5, "T_b/T_w below 0.5 for the gas correction");
        return std::pow(c.t_ratio, 0.45);
    default:
        fail(TH_ERR_INPUT);
    }
}

}  // namespace turbulent_detail

template <class Range>
inline double nu_dittus_boelter(const th_conditions &c, Range &rc) {
    // Dittus & Boelter (1930) as usually quoted: n = 0.4 heating, 0.3 cooling.
    rc.require(c.re >= 1e4, "Re below 1e4 (Dittus-Boelter range Re >= 1e4)");
    rc.require(c.pr >= 0.6 && c.pr <= 160.0, "Pr outside Dittus-Boelter range 0.6..160");
    turbulent_detail::length_at_least_10d(c, rc, "L/D below 10 (Dittus-Boelter needs developed flow)");
    const double n = c.direction == TH_HEATING ? 0.4 : 0.3;
    return 0.023 * std::pow(c.re, 0.8) * std::pow(c.pr, n);
}

template <class Range>
inline double nu_sieder_tate(const th_conditions &c, const shared_terms &terms, Range &rc) {
    // Sieder & Tate (1936), turbulent.
    rc.require(c.re >= 1e4, "Re below 1e4 (Sieder-Tate range Re >= 1e4)");
    rc.require(c.pr >= 0.7 && c.pr <= 16700.0, "Pr outside Sieder-Tate range 0.7..16700");
    turbulent_detail::length_at_least_10d(c, rc, "L/D below 10 (Sieder-Tate needs developed flow)");
    return 0.027 * std::pow(c.re, 0.8) * std::cbrt(c.pr) * terms.mu_factor;
}

template <class Range>
inline double nu_petukhov(const th_conditions &c, Range &rc, double &f) {
    // Petukhov (1970).
    rc.require(c.re >= 1e4, "Re below 1e4 (Petukhov range 1e4..5e6)");
    rc.require(c.re <= 5e6, "Re above 5e6 (Petukhov range 1e4..5e6)");
    rc.require(c.pr >= 0.5 && c.pr <= 2000.0, "Pr outside Petukhov range 0.5..2000");
    rc.require(c.rel_roughness == 0.0, "Petukhov is for smooth tubes (Colebrook f used for the roughness)");
    turbulent_detail::length_at_least_10d(c, rc, "L/D below 10 (Petukhov needs developed flow)");
    f = turbulent_detail::friction_for(c, c.re);
    const double f8 = f / 8.0;
    return f8 * c.re * c.pr / (1.07 + 12.7 * std::sqrt(f8) * (std::pow(c.pr, 2.0 / 3.0) - 1.0));
}

namespace turbulent_detail {

// Gnielinski's form from the Darcy f, Re and Pr^(2/3).
inline double gnielinski_core(double f, double re, double pr, double pr_2_3) {
    const double f8 = f / 8.0;
    return f8 * (re - 1000.0) * pr / (1.0 + 12.7 * std::sqrt(f8) * (pr_2_3 - 1.0));
}

// Entry-length factor (VDI Heat Atlas; from memory): mean over L
// 1 + (D/L)^(2/3); local at x 1 + (1/3)(D/x)^(2/3). `d_over_l_2_3` is
// called only when the factor applies (a finite length, not switched off).
template <class Root>
inline double length_factor(const th_conditions &c, Root d_over_l_2_3) {
    if (!c.length_factor || !std::isfinite(c.l_over_d)) return 1.0;
    const double g = d_over_l_2_3();
    return c.averaging == TH_MEAN ? 1.0 + g : 1.0 + g / 3.0;
}

}  // namespace turbulent_detail

template <class Range>
inline double nu_gnielinski(const th_conditions &c, Range &rc, double &f) {
    // Gnielinski (1976).
    rc.require(c.re >= 3000.0, "Re below 3000 (Gnielinski range 3e3..5e6)");
    rc.require(c.re <= 5e6, "Re above 5e6 (Gnielinski range 3e3..5e6)");
    rc.require(c.pr >= 0.5 && c.pr <= 2000.0, "Pr outside Gnielinski range 0.5..2000");
    f = turbulent_detail::friction_for(c, c.re);
    const double nu = turbulent_detail::gnielinski_core(f, c.re, c.pr, std::pow(c.pr, 2.0 / 3.0));
    const double k_l = turbulent_detail::length_factor(c, [&] { return std::pow(1.0 / c.l_over_d, 2.0 / 3.0); });
    return nu * k_l * turbulent_detail::property_factor(c, rc);
}

template <class Range>
inline double nu_gnielinski_transition(const th_conditions &c, Range &rc, double &f) {
    // Gnielinski (2013): linear in Re between the laminar mean composite at
    // Re = 2300 and the turbulent value at Re = 1e4 (mean values only).
    need(c.averaging == TH_MEAN);
    rc.require(c.re >= TH_RE_LAMINAR_MAX && c.re <= TH_RE_TURBULENT_MIN,
               "Re outside the transition range 2300..1e4");
    rc.require(c.pr >= 0.5 && c.pr <= 2000.0, "Pr outside Gnielinski range 0.5..2000");
    // The two ends need Pr^(1/3), (D/L)^(1/3) and their squares: two cube
    // roots serve both (the laminar end's (Re Pr D/L)^(1/3), the turbulent
    // end's Pr^(2/3) and (D/L)^(2/3)) instead of four pow/cbrt calls.
    const double cbrt_pr = std::cbrt(c.pr);
    const double cbrt_d_over_l = 1.0 / std::cbrt(c.l_over_d);  // 0 when developed
    const double re_lam = TH_RE_LAMINAR_MAX, re_turb = TH_RE_TURBULENT_MIN;
    const double z = re_lam * c.pr / c.l_over_d, red = re_lam / c.l_over_d;  // 0 when developed
    const double lam =
        laminar_detail::gnielinski_composite(c, z, std::cbrt(re_lam) * cbrt_pr * cbrt_d_over_l, red);
    const double turb = turbulent_detail::gnielinski_core(turbulent_detail::friction_for(c, re_turb), re_turb,
                                                          c.pr, cbrt_pr * cbrt_pr) *
                        turbulent_detail::length_factor(c, [&] { return cbrt_d_over_l * cbrt_d_over_l; }) *
                        turbulent_detail::property_factor(c, rc);
    // The f reported is the one Gnielinski's form would use at this Re. Nu
    // does not depend on it, so it is checked on its own: at an absurd Re
    // (a subnormal one, or Petukhov's pole near Re = 8) it is not finite,
    // and the call fails as any other result out of range would.
    f = positive_result(turbulent_detail::friction_for(c, c.re));
    const double g = (c.re - re_lam) / (re_turb - re_lam);
    return (1.0 - g) * lam + g * turb;
}

template <class Range>
inline double nu_liquid_metal(const th_conditions &c, Range &rc) {
    const double pe = c.re * c.pr;
    rc.require(c.pr < 0.1, "Pr >= 0.1: liquid-metal correlation applied to an ordinary fluid");
    turbulent_detail::length_at_least_10d(c, rc, "L/D below 10 (liquid-metal correlations need developed flow)");
    if (c.wall == TH_WALL_H) {
        // Skupinski, Tortel & Vautrey (1965), uniform flux (from memory).
        rc.require(c.re >= 3.6e3 && c.re <= 9.05e5, "Re outside Skupinski range 3.6e3..9.05e5");
        rc.require(pe >= 100.0 && pe <= 1e4, "Pe outside Skupinski range 1e2..1e4");
        return 4.82 + 0.0185 * std::pow(pe, 0.827);
    }
    // Seban & Shimazaki (1951), uniform wall temperature (from memory).
    rc.require(c.re >= TH_RE_LAMINAR_MAX, "laminar flow: liquid-metal turbulent correlation not applicable");
    rc.require(pe >= 100.0, "Pe below 100 (Seban-Shimazaki range Pe > 100)");
    return 5.0 + 0.025 * std::pow(pe, 0.8);
}

}  // namespace th

#endif
