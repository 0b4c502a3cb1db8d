// properties_water_transport.cpp - C entry points for the viscosity,
// thermal conductivity and Prandtl number of liquid water, and for the
// whole property set. The arithmetic is in properties_water_transport.hpp;
// densities and heat capacities come from IF97 region 1.
#include "internal.hpp"
#include "properties_water_state.hpp"

using th::checked;
using th::guard;
using th::need_out;
using th::range_check;

extern "C" {

int th_water_props(double t, double p, th_fluid_props *out) {
    return guard([&] {
        need_out(out);
        range_check rc;
        const th_fluid_props v = th::water::all(t, p, rc);
        *out = v;
        return rc.status();
    });
}

int th_water_viscosity(double t, double p, double *mu) {
    return guard([&] {
        need_out(mu);
        const auto r = th::water::liquid_state(t, p);
        range_check rc;
        th::water::transport_range(t, rc);
        *mu = checked(th::iapws_transport::viscosity(t, 1.0 / r.v));
        return rc.status();
    });
}

int th_water_conductivity(double t, double p, double *k) {
    return guard([&] {
        need_out(k);
        range_check rc;
        const th_fluid_props v = th::water::all(t, p, rc);
        *k = v.k;
        return rc.status();
    });
}

int th_water_prandtl(double t, double p, double *pr) {
    return guard([&] {
        need_out(pr);
        range_check rc;
        const th_fluid_props v = th::water::all(t, p, rc);
        *pr = v.pr;
        return rc.status();
    });
}

}  // extern "C"
