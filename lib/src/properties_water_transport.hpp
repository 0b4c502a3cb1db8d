// properties_water_transport.hpp - viscosity and thermal conductivity of
// water as functions of temperature and density, in the forms the IAPWS
// releases recommend for industrial use:
//   viscosity:    IAPWS R12-08 (2008 formulation), mu = mu0(T) mu1(T, rho)
//                 with the critical enhancement mu2 taken as 1, as R12-08
//                 allows for industrial use (mu2 differs from 1 by more than
//                 2 % only very near the critical point, outside the liquid
//                 range this library serves);
//   conductivity: IAPWS R15-11 (2011 formulation), lambda = lambda0 lambda1
//                 + lambda2, with the critical enhancement lambda2 evaluated
//                 as R15-11 prescribes for industrial use (IF97
//                 thermodynamics, and its Eq. 25 for the derivative at the
//                 reference temperature).
// Pure arithmetic in SI units so the unit tests can check it directly
// against the verification tables printed in both releases, which are given
// in (T, rho).
#ifndef TUBEHEAT_PROPERTIES_WATER_TRANSPORT_HPP
#define TUBEHEAT_PROPERTIES_WATER_TRANSPORT_HPP

#include <boost/math/constants/constants.hpp>

#include <cmath>

namespace th {
namespace iapws_transport {

// Reference constants shared by R12-08 and R15-11.
constexpr double T_STAR = 647.096;    // K
constexpr double RHO_STAR = 322.0;    // kg/m3
constexpr double P_STAR = 22.064e6;   // Pa
constexpr double MU_STAR = 1.0e-6;    // Pa s
constexpr double LAMBDA_STAR = 1e-3;  // W/(m K)
// R15-11 uses its own gas constant for the reduced heat capacity.
constexpr double R_LAMBDA = 461.51805;  // J/(kg K)

// Viscosity [Pa s] from T [K] and rho [kg/m3]: R12-08 Eqs. 10-12 with
// mu2 = 1. Coefficients: H_i from R12-08 Table 1, H_ij from Table 2.
inline double viscosity(double t, double rho) {
    const double tr = t / T_STAR;
    const double dr = rho / RHO_STAR;
    // Eq. 11: mu0 = 100 sqrt(T) / sum_i H_i / T^i.
    static constexpr double H0[4] = {1.67752, 2.20462, 0.6366564, -0.241605};
    const double rt = 1.0 / tr;
    const double s0 = H0[0] + rt * (H0[1] + rt * (H0[2] + rt * H0[3]));
    const double mu0 = 100.0 * std::sqrt(tr) / s0;
    // Eq. 12: mu1 = exp(rho sum_i (1/T - 1)^i sum_j H_ij (rho - 1)^j),
    // i = 0..5, j = 0..6; zeros where Table 2 lists no coefficient.
    static constexpr double H1[6][7] = {
        {0.520094, 0.222531, -0.281378, 0.161913, -0.0325372, 0.0, 0.0},
        {0.0850895, 0.999115, -0.906851, 0.257399, 0.0, 0.0, 0.0},
        {-1.08374, 1.88797, -0.772479, 0.0, 0.0, 0.0, 0.0},
        {-0.289555, 1.26613, -0.489837, 0.0, 0.0698452, 0.0, -0.00435673},
        {0.0, 0.0, -0.257040, 0.0, 0.0, 0.00872102, 0.0},
        {0.0, 0.120573, 0.0, 0.0, 0.0, 0.0, -0.000593264}};
    const double x = rt - 1.0;
    const double y = dr - 1.0;
    double outer = 0.0;
    for (int i = 5; i >= 0; --i) {
        double inner = 0.0;
        for (int j = 6; j >= 0; --j) inner = inner * y + H1[i][j];
        outer = outer * x + inner;
    }
    const double mu1 = std::exp(dr * outer);
    return mu0 * mu1 * MU_STAR;
}

// Background conductivity lambda0 lambda1 [W/(m K)] from T [K] and
// rho [kg/m3]: R15-11 Eqs. 10, 16 and 17, coefficients from its Tables 1
// and 2.
inline double conductivity_background(double t, double rho) {
    const double tr = t / T_STAR;
    const double dr = rho / RHO_STAR;
    // Eq. 16: lambda0 = sqrt(T) / sum_k L_k / T^k.
    static constexpr double L0[5] = {2.443221e-3, 1.323095e-2, 6.770357e-3,
                                     -3.454586e-3, 4.096266e-4};
    const double rt = 1.0 / tr;
    const double s0 =
        L0[0] + rt * (L0[1] + rt * (L0[2] + rt * (L0[3] + rt * L0[4])));
    const double lambda0 = std::sqrt(tr) / s0;
    // Eq. 17: lambda1 = exp(rho sum_i (1/T - 1)^i sum_j L_ij (rho - 1)^j),
    // i = 0..4, j = 0..5.
    static constexpr double L1[5][6] = {
        {1.60397357, -0.646013523, 0.111443906, 0.102997357, -0.0504123634,
         0.00609859258},
        {2.33771842, -2.78843778, 1.53616167, -0.463045512, 0.0832827019,
         -0.00719201245},
        {2.19650529, -4.54580785, 3.55777244, -1.40944978, 0.275418278,
         -0.0205938816},
        {-1.21051378, 1.60812989, -0.621178141, 0.0716373224, 0.0, 0.0},
        {-2.7203370, 4.57586331, -3.18369245, 1.1168348, -0.19268305,
         0.012913842}};
    const double x = rt - 1.0;
    const double y = dr - 1.0;
    double outer = 0.0;
    for (int i = 4; i >= 0; --i) {
        double inner = 0.0;
        for (int j = 5; j >= 0; --j) inner = inner * y + L1[i][j];
        outer = outer * x + inner;
    }
    return lambda0 * std::exp(dr * outer) * LAMBDA_STAR;
}

// Reduced derivative zeta = (d rho/d p)_T reduced by rho*/p*, at the
// reference temperature T_R = 1.5 T* and reduced density dr, from the
// R15-11 industrial polynomial (Eq. 25 and the coefficients printed with
// it, one set per density interval).
inline double zeta_reference_industrial(double dr) {
    static constexpr double A[5][6] = {
        {6.53786807199516, -5.61149954923348, 3.39624167361325,
         -2.27492629730878, 10.2631854662709, 1.97815050331519},
        {6.52717759281799, -6.30816983387575, 8.08379285492595,
         -9.82240510197603, 12.1358413791395, -5.54349664571295},
        {5.35500529896124, -3.96415689925446, 8.91990208918795,
         -12.0338729505790, 9.19494865194302, -2.16866274479712},
        {1.55225959906681, 0.464621290821181, 8.93237374861479,
         -11.0321960061126, 6.16780999933360, -0.965458722086812},
        {1.11999926419994, 0.595748562571649, 9.88952565078920,
         -10.3255051147040, 4.66861294457414, -0.503243546373828}};
    // Upper bounds of the density intervals (rho = 100, 250,
    // 400 and 600 kg/m3 reduced by 322 kg/m3).
    int row = 4;
    if (dr <= 0.310559006)
        row = 0;
    else if (dr <= 0.776397516)
        row = 1;
    else if (dr <= 1.242236025)
        row = 2;
    else if (dr <= 1.863354037)
        row = 3;
    const double *a = A[row];
    const double s =
        a[0] + dr * (a[1] + dr * (a[2] + dr * (a[3] + dr * (a[4] + dr * a[5]))));
    return 1.0 / s;
}

// Critical enhancement lambda2 [W/(m K)], R15-11 Eqs. 18-24 (industrial
// use): t [K], rho [kg/m3], cp and cv [J/(kg K)] and drho_dp = (d rho/d
// p)_T [kg/(m3 Pa)] from IF97, mu [Pa s] from viscosity() above.
inline double conductivity_critical(double t, double rho, double cp,
                                    double cv, double drho_dp, double mu) {
    const double tr = t / T_STAR;
    const double dr = rho / RHO_STAR;
    const double zeta = drho_dp * P_STAR / RHO_STAR;
    constexpr double TR_REF = 1.5;  // reference temperature T_R / T*
    // Eq. 21, with Delta chi set to 0 where it comes out negative.
    double dchi = dr * (zeta - zeta_reference_industrial(dr) * TR_REF / tr);
    if (!(dchi > 0.0)) return 0.0;
    // Eq. 22: correlation length xi [nm]; Eq. 20: y = q_D xi;
    // xi0 = 0.13 nm, Gamma0 = 0.06, nu = 0.630, gamma = 1.239,
    // 1/q_D = 0.40 nm.
    const double xi = 0.13 * std::pow(dchi / 0.06, 0.630 / 1.239);
    const double y = xi / 0.40;
    // Eq. 19 (Z = 0 below y = 1.2e-7, as the release states).
    if (y < 1.2e-7) return 0.0;
    const double kappa_inv = cv / cp;
    const double big = -std::expm1(-1.0 / (1.0 / y + y * y / (3.0 * dr * dr)));
    const double Z = 2.0 / (boost::math::constants::pi<double>() * y) *
                     ((1.0 - kappa_inv) * std::atan(y) + kappa_inv * y - big);
    // Eq. 18 with Lambda = 177.8514.
    const double cp_bar = cp / R_LAMBDA;
    const double mu_bar = mu / MU_STAR;
    return 177.8514 * dr * cp_bar * tr / mu_bar * Z * LAMBDA_STAR;
}

}  // namespace iapws_transport
}  // namespace th

#endif
