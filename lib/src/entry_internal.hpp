// entry_internal.hpp - the laminar entry region and the laminar fully
// developed duct values, as C++ functions for the rest of the library
// (nusselt.cpp calls them for TH_NU_GRAETZ_EXACT,
// TH_NU_COMBINED_ENTRY_NUMERIC and the duct part of
// TH_NU_LAMINAR_DEVELOPED). The C entry points of the same features live in
// laminar_entry_api.cpp. Not installed.
//
// All functions throw th::status_error{TH_ERR_INPUT} on bad input (NaN,
// x_star <= 0, unknown wall/averaging/shape, ratio out of range) and may let
// Boost.Math errors through; call them inside th::guard().
#ifndef TUBEHEAT_ENTRY_INTERNAL_HPP
#define TUBEHEAT_ENTRY_INTERNAL_HPP

namespace th {

// Thermal entry, exact: fully developed parabolic velocity in a circular
// tube, heating from x = 0 (the "unheated starting length" case).
//   x_star    x / (D Re Pr) > 0; +infinity means fully developed
//   wall      th_wall_condition (TH_WALL_T, TH_WALL_H)
//   averaging th_averaging: TH_LOCAL, or TH_MEAN = (1/x*) * integral of
//             the local Nu over 0..x* (the mean heat transfer coefficient;
//             for TH_WALL_T this equals ln(1/theta_bulk)/(4 x*))
// Graetz series (T) / Siegel-Sparrow-Hallman series (H) with computed
// eigenvalues; extended Leveque expansion at very small x*.
double thermal_entry_nu(double x_star, int wall, int averaging);

// Combined entry, numerical: uniform velocity and temperature at the tube
// inlet, both developing, any Pr > 0 (validated 0.5 ... 1e4); marched
// boundary-layer solution, cached per (Pr, wall).
double combined_entry_nu(double x_star, double pr, int wall, int averaging);

// The Prandtl range over which the combined-entry solution is validated
// (tests/unit/test_entry_combined.cpp); outside it a warning. Above it the
// thermal-entry series is the solution's own limit (the automatic choice
// uses it there).
constexpr double combined_entry_pr_min = 0.5;
constexpr double combined_entry_pr_max = 1e4;
template <class Range>
void require_combined_entry_pr(double pr, Range &rc) {
    rc.require(pr >= combined_entry_pr_min && pr <= combined_entry_pr_max,
               "combined entry: Pr outside 0.5 .. 1e4 (validated range)");
}

// Apparent Darcy friction factor times Re, (f_app Re), for the
// hydrodynamic entry from a uniform inlet velocity: the pressure drop from
// the inlet to x is dp = f_app (x/D) rho u_m^2 / 2.  x_plus = x/(D Re) > 0,
// +infinity gives 64.
double combined_entry_fre_app(double x_plus);

// Laminar fully developed values of a duct (th_duct_shape):
//   TH_DUCT_CIRCLE           ratio ignored
//   TH_DUCT_RECTANGLE        ratio = short side / long side, 0 < ratio <= 1
//   TH_DUCT_PARALLEL_PLATES  ratio ignored; both plates heated
//   TH_DUCT_ANNULUS          ratio = d_inner/d_outer, 0 < ratio < 1; inner
//                            wall heated, outer insulated
// Outputs (any may be nullptr): Darcy f Re, Nu_T, Nu_H (Nu_H1 for the
// rectangle), all based on the hydraulic diameter.
void duct_laminar_developed(int shape, double ratio, double *f_re, double *nu_t,
                            double *nu_h);

// Concentric annulus with either wall heated (the other insulated):
// Darcy f Re, Nu_T, Nu_H on D_h = d_o - d_i; rs = d_inner/d_outer in
// (0, 1]. Tabulated handbook values, interpolated (ducts.cpp).
enum annulus_heating { annulus_inner_heated = 0, annulus_outer_heated = 1 };
void annulus_laminar(double rs, int heated_wall, double *f_re, double *nu_t,
                     double *nu_h);
// Exact laminar Darcy f Re of a concentric annulus (Lamb's solution).
double annulus_fre(double rs);
// False when a duct value is an extrapolation beyond its source table (the
// annulus below d_inner/d_outer = 0.05); callers report TH_WARN_RANGE.
bool duct_laminar_in_range(int shape, double ratio);

// ---- details shared by the laminar_entry_*.cpp files ----------------------
namespace entry {

// Fully developed Nusselt number of the circular tube: lambda_0^2/2 for T
// (computed from the first Graetz eigenvalue, 3.6568), 48/11 for H.
double nu_fully_developed(int wall);

// Eigenvalue n >= 0 and its series coefficient as used by
// thermal_entry_nu():
//   T: lambda_n of (eta R')' + lambda^2 eta (1 - eta^2) R = 0, R(1) = 0,
//      and G_n = -C_n R_n'(1)/2 (Shah & London 1978 notation), so that
//      Nu_x = sum G_n e^{-2 lambda_n^2 x*} / (2 sum (G_n/lambda_n^2) e^{...})
//   H: beta_n (n = 0 is the first non-zero root) of the same equation with
//      R'(1) = 0, and c_n = 1/(2 A_n beta_n^4) (Siegel, Sparrow & Hallman
//      notation) so that Nu_x = 1/(11/48 - sum c_n e^{-2 beta_n^2 x*}).
// `exact` is set to true when the pair was computed from Kummer's function
// (the first eigen_exact_count() pairs), false when it comes from the
// asymptotic large-n forms. Throws TH_ERR_INPUT for n outside
// 0 .. eigen_table_size()-1.
void eigen_pair(int wall, int n, double *lambda, double *coef, bool *exact);
int eigen_exact_count();
int eigen_table_size();

// Where the series hands over to the extended Leveque expansion.
double leveque_switch_x_star();

// The marching solver run afresh (no cache) with a given radial resolution
// (cells) and axial step growth (X_{n+1} = (1 + growth) X_n): for
// convergence studies and benchmarks. developed_flow = true marches the
// thermal entry problem (parabolic velocity from the start) instead of the
// combined entry. x_star = +infinity gives the marched fully developed value.
double entry_march_uncached(bool developed_flow, double x_star, double pr, int wall,
                            int averaging, int cells, double growth);
// First recorded stations of the marched tables; below them the values are
// power-law extrapolations (callers flag TH_WARN_RANGE).
double combined_entry_x_star_min();
double combined_entry_x_plus_min();

}  // namespace entry
}  // namespace th

#endif
