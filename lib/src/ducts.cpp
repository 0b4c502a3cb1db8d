// ducts.cpp - laminar, fully developed friction and heat transfer in
// non-circular ducts: rectangles (and their parallel-plate limit) from the
// Shah & London (1978) polynomial fits, concentric annuli from the handbook
// table of Lundberg, Reynolds & Kays (1963) as reproduced by Kays &
// Crawford, interpolated. All values are based on the hydraulic diameter
// D_h = 4 A / P, the friction factor is the Darcy one.
#include "entry_internal.hpp"
#include "internal.hpp"

#include <boost/math/interpolators/pchip.hpp>

#include <array>
#include <cmath>
#include <vector>

namespace th {
namespace {

// ---- circular tube --------------------------------------------------------
// f Re = 64 (Hagen-Poiseuille), Nu_H = 48/11 (analytic). Nu_T is half the
// square of the first Graetz eigenvalue (Nu_T = lambda_0^2 / 2 in the
// scaling of laminar_entry_series.cpp), so it is computed, not typed in:
// 3.65679...
constexpr double circle_fre = 64.0;
constexpr double circle_nu_h = 48.0 / 11.0;

// ---- parallel plates, both heated (D_h = twice the spacing) ---------------
// f Re = 96 and Nu_H = 140/17 are analytic; Nu_T = 7.5407 is the first
// eigenvalue result tabulated by Shah & London (1978).
constexpr double plates_fre = 96.0;
constexpr double plates_nu_t = 7.5407;
constexpr double plates_nu_h = 140.0 / 17.0;

// Horner evaluation of 1 + c1 a + ... + c5 a^5.
double poly5(const std::array<double, 5> &c, double a) {
    double s = c[4];
    for (int i = 3; i >= 0; --i) s = s * a + c[static_cast<std::size_t>(i)];
    return 1.0 + s * a;
}

// ---- rectangle: Shah & London (1978) fits in the aspect ratio a = short
// side / long side, 0 <= a <= 1. Measured against the exact values: f Re and
// Nu_H1 within 0.07 %, Nu_T within 0.3 % (the Nu_T polynomial has a shallow
// minimum near a = 0.94, 0.3 % below its a = 1 value, where the exact curve
// is monotone). Their a -> 0 leading factors are the
// parallel-plate values (96, 7.541, 8.235) and at a = 1 they give the square
// duct (56.91, 2.98, 3.61). Coefficients as collected in the project's field
// notes (from memory there; checked in tests/unit/test_ducts.cpp against the
// exact square-duct and parallel-plate values and against an independent
// series/finite-difference solution, tests/reference/ducts_scipy.csv).
constexpr std::array<double, 5> rect_fre_c = {-1.3553, 1.9467, -1.7012, 0.9564,
                                              -0.2537};
constexpr std::array<double, 5> rect_nut_c = {-2.610, 4.970, -5.119, 2.702,
                                              -0.548};
constexpr std::array<double, 5> rect_nuh_c = {-2.0421, 3.0853, -2.4765, 1.0578,
                                              -0.1861};

// ---- concentric annulus ---------------------------------------------------
// Table source: Lundberg, Reynolds & Kays (1963), NASA TN D-1972, as
// reproduced in Kays & Crawford, "Convective Heat and Mass Transfer", and in
// most handbooks. One wall heated, the other insulated; fully developed
// velocity and temperature; Nu on D_h = d_outer - d_inner.
// Values written from memory ("(from memory)"); every entry is checked in
// tests/unit/test_ducts.cpp against an independent numerical solution of the
// same fully developed problems (tests/reference/gen_graetz_scipy.py, which
// solves the annulus ODEs with scipy) and they agree to the digits shown.
// The r* = 1 column is the parallel-plate channel with one side insulated
// (Nu_T = 4.861, Nu_H = 5.385, Shah & London 1978); r* = 0 of the outer wall
// is the circular tube (3.657, 4.364).
//
// Uniform heat flux ("H", constant heat rate per unit length):
constexpr std::array<double, 8> ann_h_r = {0.0, 0.05, 0.10, 0.20,
                                           0.40, 0.60, 0.80, 1.00};
constexpr std::array<double, 8> ann_h_inner = {0.0 /* unbounded, unused */,
                                               17.81, 11.91, 8.499, 6.583,
                                               5.912, 5.58,  5.385};
constexpr std::array<double, 8> ann_h_outer = {4.364, 4.792, 4.834, 4.883,
                                               4.979, 5.099, 5.24,  5.385};
// Uniform wall temperature ("T"):
constexpr std::array<double, 6> ann_t_r = {0.0, 0.05, 0.10, 0.25, 0.50, 1.00};
constexpr std::array<double, 6> ann_t_inner = {0.0 /* unbounded, unused */,
                                               17.46, 11.56, 7.37, 5.74, 4.86};
constexpr std::array<double, 6> ann_t_outer = {3.657, 4.06, 4.11,
                                               4.23,  4.43, 4.86};

// Interpolation variable. The heated-wall Nusselt numbers vary like a power
// of r* near r* = 0.05, so the tables are interpolated in ln r* with a
// monotone cubic (PCHIP, Boost.Math); below the first tabulated ratio see
// annulus_value().
using pchip = boost::math::interpolators::pchip<std::vector<double>>;

template <std::size_t N>
pchip make_log_interp(const std::array<double, N> &r, const std::array<double, N> &v,
                      std::size_t first) {
    std::vector<double> x, y;
    for (std::size_t i = first; i < N; ++i) {
        x.push_back(std::log(r[i]));
        y.push_back(v[i]);
    }
    return pchip(std::move(x), std::move(y));
}

// The T table is sparser than the H one (five ratios against seven), so
// Nu_T is interpolated as Nu_H(r*) times the smooth ratio Nu_T/Nu_H, itself
// interpolated (PCHIP in ln r*) through the T table's ratios. Against the
// exact values this halves the worst interpolation error (0.8 % -> 0.2 %,
// tests/unit/test_ducts.cpp).
template <std::size_t N>
pchip make_ratio_interp(const pchip &h, const std::array<double, N> &r,
                        const std::array<double, N> &t) {
    std::vector<double> x, y;
    for (std::size_t i = 1; i < N; ++i) {
        x.push_back(std::log(r[i]));
        y.push_back(t[i] / h(std::log(r[i])));
    }
    return pchip(std::move(x), std::move(y));
}

struct annulus_tables {
    pchip h_inner, h_outer, t_ratio_inner, t_ratio_outer;
};

annulus_tables build_annulus() {
    pchip hi = make_log_interp(ann_h_r, ann_h_inner, 1);
    pchip ho = make_log_interp(ann_h_r, ann_h_outer, 1);
    pchip ri = make_ratio_interp(hi, ann_t_r, ann_t_inner);
    pchip ro = make_ratio_interp(ho, ann_t_r, ann_t_outer);
    return annulus_tables{hi, ho, ri, ro};
}

const annulus_tables &annulus() {
    // Built once (thread-safe function-local static), read-only afterwards.
    static const annulus_tables tables = build_annulus();
    return tables;
}

// One annulus Nusselt number. Inside the table (0.05 <= r* <= 1): PCHIP in
// ln r*. Below 0.05:
//  - outer wall heated: the value tends to the circular tube's as r* -> 0,
//    approached like 1/ln(1/r*) (the inner core's effect on the velocity
//    decays only logarithmically); linear in s = 1/ln(1/r*) between the tube
//    (s = 0) and r* = 0.05. Checked against the exact solution at r* = 0.02
//    (better than 1 %).
//  - inner wall heated: unbounded as r* -> 0 (a thin wire); the product
//    Nu r* ln(1/r*) is nearly constant, and is extrapolated linearly in r*
//    from the first two table points. An extrapolation (about 3 % high at
//    r* = 0.02); callers flag it as out of range.
template <std::size_t N>
double annulus_value(const pchip &p, const std::array<double, N> &r,
                     const std::array<double, N> &v, bool inner, double rs,
                     const pchip *ratio = nullptr, const pchip *h = nullptr) {
    if (rs >= r[1]) return ratio ? (*h)(std::log(rs)) * (*ratio)(std::log(rs)) : p(std::log(rs));
    if (!inner) {
        const double s = 1.0 / std::log(1.0 / rs), s1 = 1.0 / std::log(1.0 / r[1]);
        return v[0] + (v[1] - v[0]) * s / s1;
    }
    const double g1 = v[1] * r[1] * std::log(1.0 / r[1]);
    const double g2 = v[2] * r[2] * std::log(1.0 / r[2]);
    const double g = g1 + (g2 - g1) * (rs - r[1]) / (r[2] - r[1]);
    return g / (rs * std::log(1.0 / rs));
}

}  // namespace

// Darcy f Re of a concentric annulus on D_h = d_o - d_i: the exact laminar
// (Lamb) solution, 64 (1 - r)^2 / (1 + r^2 - (1 - r^2)/ln(1/r)). Tends to
// 64 as r -> 0 and to the parallel-plate 96 as r -> 1 (where the formula
// loses digits, so a short series in e = 1 - r takes over).
double annulus_fre(double rs) {
    const double e = 1.0 - rs;
    if (e < 1e-2) {
        // The denominator cancels to (2/3) e^2 (losing ~1e-9 relative at
        // e = 1e-3); its series instead (sympy): 64 e^2/den = 96 - 8/5 e^2
        // - 8/5 e^3 - 242/175 e^4 - 204/175 e^5 - 1723/1750 e^6 + O(e^7),
        // truncation error < 1e-14 relative for e < 1e-2.
        const double e2 = e * e;
        return 96.0 - e2 * (1.6 + e * (1.6 + e * (242.0 / 175.0 +
                                                  e * (204.0 / 175.0 + e * (1723.0 / 1750.0)))));
    }
    const double den = 1.0 + rs * rs - (1.0 - rs * rs) / -std::log1p(-e);
    return 64.0 * e * e / den;
}

void annulus_laminar(double rs, int heated_wall, double *f_re, double *nu_t,
                     double *nu_h) {
    need(finite(rs) && rs > 0.0 && rs <= 1.0);
    need(heated_wall == annulus_inner_heated || heated_wall == annulus_outer_heated);
    const annulus_tables &t = annulus();
    const bool inner = heated_wall == annulus_inner_heated;
    const double fre = annulus_fre(rs);
    const double nt = inner ? annulus_value(t.h_inner, ann_t_r, ann_t_inner, true, rs,
                                            &t.t_ratio_inner, &t.h_inner)
                            : annulus_value(t.h_outer, ann_t_r, ann_t_outer, false, rs,
                                            &t.t_ratio_outer, &t.h_outer);
    const double nh = inner ? annulus_value(t.h_inner, ann_h_r, ann_h_inner, true, rs)
                            : annulus_value(t.h_outer, ann_h_r, ann_h_outer, false, rs);
    if (f_re) *f_re = checked(fre);
    if (nu_t) *nu_t = checked(nt);
    if (nu_h) *nu_h = checked(nh);
}

bool duct_laminar_in_range(int shape, double ratio) {
    if (shape == TH_DUCT_ANNULUS) return ratio >= ann_h_r[1];
    return true;
}

void duct_laminar_developed(int shape, double ratio, double *f_re, double *nu_t,
                            double *nu_h) {
    double fre = 0.0, nt = 0.0, nh = 0.0;
    switch (shape) {
    case TH_DUCT_CIRCLE:
        fre = circle_fre;
        nt = entry::nu_fully_developed(TH_WALL_T);
        nh = circle_nu_h;
        break;
    case TH_DUCT_RECTANGLE:
        need(finite(ratio) && ratio > 0.0 && ratio <= 1.0);
        fre = plates_fre * poly5(rect_fre_c, ratio);
        nt = 7.541 * poly5(rect_nut_c, ratio);
        nh = 8.235 * poly5(rect_nuh_c, ratio);
        break;
    case TH_DUCT_PARALLEL_PLATES:
        fre = plates_fre;
        nt = plates_nu_t;
        nh = plates_nu_h;
        break;
    case TH_DUCT_ANNULUS:
        annulus_laminar(ratio, annulus_inner_heated, &fre, &nt, &nh);
        break;
    default:
        fail(TH_ERR_INPUT);
    }
    if (f_re) *f_re = checked(fre);
    if (nu_t) *nu_t = checked(nt);
    if (nu_h) *nu_h = checked(nh);
}

}  // namespace th
