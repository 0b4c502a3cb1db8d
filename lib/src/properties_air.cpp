// properties_air.cpp - C entry points for dry air near atmospheric pressure
// (ideal gas, dilute-gas transport). The arithmetic and its sources are in
// properties_air.hpp.
#include "internal.hpp"
#include "properties_air.hpp"

using th::checked;
using th::fail;
using th::guard;
using th::need_out;
using th::need_positive;
using th::need_temperature;
using th::range_check;

namespace {

// The limits below come from comparing this model with the full Lemmon et
// al. (2000) equation of state and the full Lemmon & Jacobsen (2004)
// transport equations (python3-iapws, iapws.humidAir.Air; table in
// docs/properties.md). Inside the "in range" box every property is within
// 1 % of them. The formulations themselves are stated for 60-2000 K.
constexpr double T_OK_MIN = 200.0;     // K
constexpr double T_OK_MAX = 2000.0;    // K, upper end of both formulations
constexpr double P_OK_MAX = 0.2e6;     // Pa
// Beyond these the model is not air any more (too dense for an ideal gas,
// close to condensation, or dissociating), and no value is given.
constexpr double T_HARD_MIN = 150.0;   // K
constexpr double T_HARD_MAX = 3000.0;  // K
constexpr double P_HARD_MAX = 1.0e6;   // Pa
// Below about 1 Pa the gas in any practical tube is rarefied (mean free
// path of millimetres): the continuum correlations and the dilute-gas
// transport model do not describe it, and no value is given.
constexpr double P_HARD_MIN = 1.0;     // Pa

void check_air_state(double t, double p, range_check &rc) {
    need_temperature(t);
    need_positive(p);
    if (t < T_HARD_MIN || t > T_HARD_MAX || p > P_HARD_MAX || p < P_HARD_MIN)
        fail(TH_ERR_STATE);
    rc.require(t >= T_OK_MIN,
               "air: t < 200 K, below the range where the ideal, dilute gas "
               "stays within 1 % of the full formulations");
    rc.require(t <= T_OK_MAX,
               "air: t > 2000 K, beyond the range of the Lemmon formulations "
               "(dissociation not included)");
    rc.require(p <= P_OK_MAX,
               "air: p > 0.2 MPa, above the range where the ideal, dilute "
               "gas stays within 1 % of the full formulations");
}

th_fluid_props air_all(double t, double p, range_check &rc) {
    check_air_state(t, p, rc);
    th_fluid_props v;
    v.rho = checked(th::air::density(t, p));
    v.cp = checked(th::air::cp(t));
    v.mu = checked(th::air::viscosity(t));
    v.k = checked(th::air::conductivity(t, v.mu));
    v.pr = checked(v.cp * v.mu / v.k);
    v.h = checked(th::air::enthalpy(t));
    v.range_note = rc.note();
    return v;
}

// One property: check the state, evaluate f, write it.
template <class F>
int air_single(double t, double p, double *out, F f) {
    return guard([&] {
        need_out(out);
        range_check rc;
        check_air_state(t, p, rc);
        *out = checked(f());
        return rc.status();
    });
}

}  // namespace

extern "C" {

int th_air_props(double t, double p, th_fluid_props *out) {
    return guard([&] {
        need_out(out);
        range_check rc;
        const th_fluid_props v = air_all(t, p, rc);
        *out = v;
        return rc.status();
    });
}

int th_air_density(double t, double p, double *rho) {
    return air_single(t, p, rho, [&] { return th::air::density(t, p); });
}

int th_air_cp(double t, double p, double *cp) {
    return air_single(t, p, cp, [&] { return th::air::cp(t); });
}

int th_air_enthalpy(double t, double p, double *h) {
    return air_single(t, p, h, [&] { return th::air::enthalpy(t); });
}

int th_air_viscosity(double t, double p, double *mu) {
    return air_single(t, p, mu, [&] { return th::air::viscosity(t); });
}

int th_air_conductivity(double t, double p, double *k) {
    return air_single(t, p, k, [&] { return th::air::conductivity(t); });
}

int th_air_prandtl(double t, double p, double *pr) {
    return air_single(t, p, pr, [&] {
        const double mu = th::air::viscosity(t);
        return th::air::cp(t) * mu / th::air::conductivity(t, mu);
    });
}

}  // extern "C"
