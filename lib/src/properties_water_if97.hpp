// properties_water_if97.hpp - IAPWS-IF97 (IAPWS R7-97, 2012 revision) for
// liquid water: region 1 (the Gibbs free energy g(p, T) of the compressed
// liquid) and region 4 (the saturation line). Pure arithmetic in SI units
// with no library plumbing, so the unit tests can check it directly against
// the verification tables of the release. The C entry points that validate
// the state are in properties_water_if97.cpp.
#ifndef TUBEHEAT_PROPERTIES_WATER_IF97_HPP
#define TUBEHEAT_PROPERTIES_WATER_IF97_HPP

#include <cmath>

namespace th {
namespace if97 {

// Specific gas constant of IF97 (R7-97 Eq. 1) [J/(kg K)].
constexpr double R = 461.526;
// Critical point used by IF97 and by the transport releases.
constexpr double T_CRIT = 647.096;    // K
constexpr double P_CRIT = 22.064e6;   // Pa
constexpr double RHO_CRIT = 322.0;    // kg/m3

// Region 1 boundaries (R7-97 Sect. 4, Fig. 1): 273.15 K <= T <= 623.15 K,
// p_sat(T) <= p <= 100 MPa.
constexpr double T_MIN = 273.15;
constexpr double T_MAX_REGION1 = 623.15;
constexpr double P_MAX = 100e6;
// Region 4 (saturation) spans 273.15 K .. T_CRIT, i.e. p_sat(273.15 K) =
// 611.213 Pa (R7-97 Sect. 8.1) .. P_CRIT.
constexpr double P_SAT_MIN = 611.213;

// Everything region 1 gives at one (T, p).
struct region1_props {
    double v;        // specific volume [m3/kg]
    double h;        // specific enthalpy [J/kg] (zero: liquid at the
                     // triple point has u = 0, s = 0)
    double u;        // specific internal energy [J/kg]
    double s;        // specific entropy [J/(kg K)]
    double cp;       // specific isobaric heat capacity [J/(kg K)]
    double cv;       // specific isochoric heat capacity [J/(kg K)]
    double w;        // speed of sound [m/s]
    double drho_dp;  // (d rho / d p) at constant T [kg/(m3 Pa)] = rho kappa_T
};

// Region 1 (R7-97 Eq. 7 with the coefficients of its Table 2 and the
// relations of its Table 3). Valid inside the bounds above; the caller
// checks them.
inline region1_props region1(double t, double p) {
    // Table 2: exponents I_i, J_i and coefficients n_i, i = 1..34.
    static constexpr int I[34] = {0, 0,  0,  0,  0,  0,  0,  0,  1,  1,  1, 1,
                                  1, 1,  2,  2,  2,  2,  2,  3,  3,  3,  4, 4,
                                  4, 5,  8,  8,  21, 23, 29, 30, 31, 32};
    static constexpr int J[34] = {-2, -1, 0,   1,   2,   3,   4,   5,  -9,
                                  -7, -1, 0,   1,   3,   -3,  0,   1,  3,
                                  17, -4, 0,   6,   -5,  -2,  10,  -8, -11,
                                  -6, -29, -31, -38, -39, -40, -41};
    static constexpr double n[34] = {
        0.14632971213167,     -0.84548187169114,    -0.37563603672040e1,
        0.33855169168385e1,   -0.95791963387872,    0.15772038513228,
        -0.16616417199501e-1, 0.81214629983568e-3,  0.28319080123804e-3,
        -0.60706301565874e-3, -0.18990068218419e-1, -0.32529748770505e-1,
        -0.21841717175414e-1, -0.52838357969930e-4, -0.47184321073267e-3,
        -0.30001780793026e-3, 0.47661393906987e-4,  -0.44141845330846e-5,
        -0.72694996297594e-15, -0.31679644845054e-4, -0.28270797985312e-5,
        -0.85205128120103e-9, -0.22425281908000e-5, -0.65171222895601e-6,
        -0.14341729937924e-12, -0.40516996860117e-6, -0.12734301741641e-8,
        -0.17424871230634e-9, -0.68762131295531e-18, 0.14478307828521e-19,
        0.26335781662795e-22, -0.11947622640071e-22, 0.18228094581404e-23,
        -0.93537087292458e-25};

    // Per-term weights of gamma and its derivatives, folded at compile
    // time: d/dpi of a^I is -I a^(I-1) with a = 7.1 - pi, d/dtau of b^J is
    // J b^(J-1) with b = tau - 1.222. The 1/a and 1/b factors are applied
    // once after the sums.
    struct weights {
        double g[34], gp[34], gpp[34], gt[34], gtt[34], gpt[34];
    };
    static constexpr weights W = [] {
        weights w{};
        for (int k = 0; k < 34; ++k) {
            const double fi = I[k], fj = J[k];
            w.g[k] = n[k];
            w.gp[k] = n[k] * fi;
            w.gpp[k] = n[k] * fi * (fi - 1.0);
            w.gt[k] = n[k] * fj;
            w.gtt[k] = n[k] * fj * (fj - 1.0);
            w.gpt[k] = n[k] * fi * fj;
        }
        return w;
    }();

    const double pi = p / 16.53e6;  // reducing pressure p* = 16.53 MPa
    const double tau = 1386.0 / t;  // reducing temperature T* = 1386 K
    // In region 1, a = 7.1 - pi lies in [1.05, 7.1] and b = tau - 1.222 in
    // [1.00, 3.86], so neither vanishes and no power over- or underflows.
    const double a = 7.1 - pi;
    const double b = tau - 1.222;
    const double ainv = 1.0 / a;
    const double binv = 1.0 / b;

    // Powers a^0..a^32 and b^-41..b^17 (stored at index j + 41), each the
    // product of two smaller ones so the dependency chains stay short
    // (std::pow per term would dominate the cost).
    double ap[33];
    ap[0] = 1.0;
    ap[1] = a;
    for (int i = 2; i < 33; ++i) ap[i] = ap[i / 2] * ap[i - i / 2];
    double bp[59];
    bp[41] = 1.0;
    bp[42] = b;
    bp[40] = binv;
    for (int j = 2; j <= 17; ++j) bp[41 + j] = bp[41 + j / 2] * bp[41 + j - j / 2];
    for (int j = 2; j <= 41; ++j) bp[41 - j] = bp[41 - j / 2] * bp[41 - (j - j / 2)];

    double g = 0, g_p = 0, g_pp = 0, g_t = 0, g_tt = 0, g_pt = 0;
    for (int k = 0; k < 34; ++k) {
        const double x = ap[I[k]] * bp[J[k] + 41];
        g += W.g[k] * x;
        g_p += W.gp[k] * x;
        g_pp += W.gpp[k] * x;
        g_t += W.gt[k] * x;
        g_tt += W.gtt[k] * x;
        g_pt += W.gpt[k] * x;
    }
    g_p *= -ainv;
    g_pp *= ainv * ainv;
    g_t *= binv;
    g_tt *= binv * binv;
    g_pt *= -ainv * binv;

    region1_props r;
    const double rt = R * t;
    r.v = pi * g_p * rt / p;
    r.h = tau * g_t * rt;
    r.u = rt * (tau * g_t - pi * g_p);
    r.s = R * (tau * g_t - g);
    r.cp = -R * tau * tau * g_tt;
    const double x = g_p - tau * g_pt;
    r.cv = R * (-tau * tau * g_tt + x * x / g_pp);
    r.w = std::sqrt(rt * g_p * g_p / (x * x / (tau * tau * g_tt) - g_pp));
    // kappa_T = -(1/v)(dv/dp)_T = -pi g_pp / (g_p p); (d rho/d p)_T = rho
    // kappa_T.
    r.drho_dp = -(pi * g_pp / (g_p * p)) / r.v;
    return r;
}

// Coefficients of the saturation-pressure equation, R7-97 Table 34.
namespace detail {
constexpr double n4[10] = {
    0.11670521452767e4,  -0.72421316703206e6, -0.17073846940092e2,
    0.12020824702470e5,  -0.32325550322333e7, 0.14915108613530e2,
    -0.48232657361591e4, 0.40511340542057e6,  -0.23855557567849,
    0.65017534844798e3};
}  // namespace detail

// Saturation pressure [Pa] at T [K], 273.15 K <= T <= 647.096 K
// (R7-97 Eq. 30).
inline double saturation_pressure(double t) {
    const double *n = detail::n4;
    const double th = t + n[8] / (t - n[9]);  // T* = 1 K
    const double A = th * th + n[0] * th + n[1];
    const double B = n[2] * th * th + n[3] * th + n[4];
    const double C = n[5] * th * th + n[6] * th + n[7];
    const double q = 2.0 * C / (-B + std::sqrt(B * B - 4.0 * A * C));
    return q * q * q * q * 1e6;  // p* = 1 MPa
}

// Saturation temperature [K] at p [Pa], 611.213 Pa <= p <= 22.064 MPa
// (R7-97 Eq. 31).
inline double saturation_temperature(double p) {
    const double *n = detail::n4;
    const double be = std::sqrt(std::sqrt(p / 1e6));
    const double E = be * be + n[2] * be + n[5];
    const double F = n[0] * be * be + n[3] * be + n[6];
    const double G = n[1] * be * be + n[4] * be + n[7];
    const double D = 2.0 * G / (-F - std::sqrt(F * F - 4.0 * E * G));
    const double s = n[9] + D;
    return 0.5 * (s - std::sqrt(s * s - 4.0 * (n[8] + n[9] * D)));
}

}  // namespace if97
}  // namespace th

#endif
