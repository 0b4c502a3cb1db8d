// properties_water_if97.cpp - C entry points for the thermodynamic
// properties of liquid water (IAPWS-IF97 region 1) and the saturation line
// (region 4). The arithmetic is in properties_water_if97.hpp.
#include "internal.hpp"
#include "properties_water_if97.hpp"
#include "properties_water_state.hpp"

using th::checked;
using th::fail;
using th::guard;
using th::need_out;
using th::need_positive;
using th::need_temperature;

extern "C" {

int th_water_density(double t, double p, double *rho) {
    return guard([&] {
        need_out(rho);
        const auto r = th::water::liquid_state(t, p);
        *rho = checked(1.0 / r.v);
        return TH_OK;
    });
}

int th_water_cp(double t, double p, double *cp) {
    return guard([&] {
        need_out(cp);
        const auto r = th::water::liquid_state(t, p);
        *cp = checked(r.cp);
        return TH_OK;
    });
}

int th_water_enthalpy(double t, double p, double *h) {
    return guard([&] {
        need_out(h);
        const auto r = th::water::liquid_state(t, p);
        *h = checked(r.h);
        return TH_OK;
    });
}

int th_water_saturation_pressure(double t, double *p) {
    return guard([&] {
        need_out(p);
        need_temperature(t);
        if (t < th::if97::T_MIN || t > th::if97::T_CRIT) fail(TH_ERR_STATE);
        *p = checked(th::if97::saturation_pressure(t));
        return TH_OK;
    });
}

int th_water_saturation_temperature(double p, double *t) {
    return guard([&] {
        need_out(t);
        need_positive(p);
        if (p < th::if97::P_SAT_MIN || p > th::if97::P_CRIT)
            fail(TH_ERR_STATE);
        *t = checked(th::if97::saturation_temperature(p));
        return TH_OK;
    });
}

}  // extern "C"
