// properties_air.hpp - dry air as an ideal gas with dilute-gas transport
// properties, for pressures near atmospheric:
//   cp, h: ideal-gas part of Lemmon, Jacobsen, Penoncello & Friend (2000),
//          "Thermodynamic properties of air and mixtures of nitrogen, argon
//          and oxygen from 60 to 2000 K at pressures to 2000 MPa",
//          J. Phys. Chem. Ref. Data 29, 331 (the ideal-gas Helmholtz
//          energy alpha0 of air, molar mass 28.9586 g/mol,
//          R = 8.31451 J/(mol K));
//   rho:   ideal gas, rho = p M / (R T);
//   mu, k: dilute-gas terms of Lemmon & Jacobsen (2004), "Viscosity and
//          thermal conductivity equations for nitrogen, oxygen, argon and
//          air", Int. J. Thermophys. 25, 21 (their Eqs. 2, 3 and 5 with
//          the parameters for air, reducing temperature 132.6312 K).
// The density-dependent (residual) terms of both formulations are left
// out; near atmospheric pressure they change the properties by less than
// 0.5 % above 200 K (measured against the full formulations, see
// docs/properties.md). Pure arithmetic in SI units; the C entry points and
// range checks are in properties_air.cpp.
#ifndef TUBEHEAT_PROPERTIES_AIR_HPP
#define TUBEHEAT_PROPERTIES_AIR_HPP

#include <cmath>

namespace th {
namespace air {

constexpr double MOLAR_MASS = 28.9586e-3;  // kg/mol (Lemmon et al. 2000)
constexpr double R_MOLAR = 8.31451;        // J/(mol K) (Lemmon et al. 2000)
constexpr double R = R_MOLAR / MOLAR_MASS; // J/(kg K), 287.117
constexpr double T_REDUCING = 132.6312;    // K, both formulations
// Enthalpy reference of this library: h = 0 at 273.15 K (ideal gas).
constexpr double T_H_ZERO = 273.15;

inline double density(double t, double p) { return p / (R * t); }

namespace detail {
// Ideal-gas Helmholtz coefficients N1..N13 of Lemmon et al. (2000);
// N4 and N5 only fix the zero of h and s and are not needed here.
constexpr double N1 = 0.6057194e-7, N2 = -0.210274769e-4,
                 N3 = -0.158860716e-3, N6 = -0.19536342e-3,
                 N7 = 2.490888032, N8 = 0.791309509, N9 = 0.212236768,
                 N10 = -0.197938904, N11 = 25.36365, N12 = 16.90741,
                 N13 = 87.31279;

// Planck-Einstein term x^2 e^x / (e^x - 1)^2, written with e^-x so that
// large x cannot overflow.
inline double einstein_cv(double x) {
    const double em1 = std::expm1(-x);
    return x * x * std::exp(-x) / (em1 * em1);
}
// x / (e^x - 1), its enthalpy counterpart.
inline double einstein_h(double x) { return x / std::expm1(x); }

// h / (R T) without the constant N5 term (alpha0 = ... + N10 ln(2/3 +
// e^(N13 tau)): tau d/dtau of each term).
inline double h_over_rt_raw(double t) {
    const double tau = T_REDUCING / t;
    const double c = N13 * tau;
    const double q = (2.0 / 3.0) * std::exp(-c);  // (2/3) e^-c, small
    return 1.0 - 3.0 * N1 / (tau * tau * tau) - 2.0 * N2 / (tau * tau) -
           N3 / tau + 1.5 * N6 * tau * std::sqrt(tau) + N7 +
           N8 * einstein_h(N11 * tau) + N9 * einstein_h(N12 * tau) +
           N10 * c / (1.0 + q);
}
}  // namespace detail

// Ideal-gas isobaric heat capacity [J/(kg K)]: cp0 = R (1 + cv0/R) with
// cv0/R = -tau^2 d2(alpha0)/d tau2.
inline double cp(double t) {
    using namespace detail;
    const double tau = T_REDUCING / t;
    const double c = N13 * tau;
    const double q = (2.0 / 3.0) * std::exp(-c);
    const double cv_r = N7 - 12.0 * N1 / (tau * tau * tau) -
                        6.0 * N2 / (tau * tau) - 2.0 * N3 / tau -
                        0.75 * N6 * tau * std::sqrt(tau) +
                        N8 * einstein_cv(N11 * tau) +
                        N9 * einstein_cv(N12 * tau) -
                        N10 * c * c * q / ((1.0 + q) * (1.0 + q));
    return R * (1.0 + cv_r);
}

// Ideal-gas specific enthalpy [J/kg], zero at 273.15 K.
inline double enthalpy(double t) {
    // The reference value is a constant; computed once (thread-safe
    // initialisation of a function-local static).
    static const double h_ref = T_H_ZERO * detail::h_over_rt_raw(T_H_ZERO);
    return R * (t * detail::h_over_rt_raw(t) - h_ref);
}

// Dilute-gas viscosity [Pa s], Lemmon & Jacobsen (2004) Eq. 2 with the
// collision integral of their Eq. 3 (air: sigma = 0.360 nm,
// epsilon/k = 103.3 K, and their b_i).
inline double viscosity(double t) {
    static constexpr double b[5] = {0.431, -0.4623, 0.08406, 0.005341,
                                    -0.00331};
    const double x = std::log(t / 103.3);
    const double ln_omega = b[0] + x * (b[1] + x * (b[2] + x * (b[3] + x * b[4])));
    const double sigma = 0.360;  // nm
    const double mu_upas = 0.0266958 * std::sqrt(MOLAR_MASS * 1e3 * t) /
                           (sigma * sigma * std::exp(ln_omega));
    return mu_upas * 1e-6;
}

// Dilute-gas thermal conductivity [W/(m K)], Lemmon & Jacobsen (2004)
// Eq. 5: lambda0 = N1 eta0/(1 uPa s) + N2 tau^t2 + N3 tau^t3 in mW/(m K),
// air: N1 = 1.308, N2 = 1.405, N3 = -1.036, t2 = -1.1, t3 = -0.3.
// mu0 [Pa s] is viscosity(t), passed in when the caller already has it.
inline double conductivity(double t, double mu0) {
    const double tau = T_REDUCING / t;
    return (1.308 * mu0 * 1e6 + 1.405 * std::pow(tau, -1.1) -
            1.036 * std::pow(tau, -0.3)) *
           1e-3;
}
inline double conductivity(double t) { return conductivity(t, viscosity(t)); }

}  // namespace air
}  // namespace th

#endif
