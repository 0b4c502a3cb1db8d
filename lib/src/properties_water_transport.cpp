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

namespace th::water {
namespace {
// Conductivity and Prandtl number need the whole state (density for k,
// cp and mu for Pr) and share the range warnings of the full set: one
// evaluation, one field written.
int field_of_all(double t, double p, double *out, double th_fluid_props::*field) {
    return guard([&] {
        need_out(out);
        range_check rc;
        const th_fluid_props v = all(t, p, rc);
        *out = v.*field;
        return rc.status();
    });
}
}  // namespace
}  // namespace th::water

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
    return th::water::field_of_all(t, p, k, &th_fluid_props::k);
}

int th_water_prandtl(double t, double p, double *pr) {
    return th::water::field_of_all(t, p, pr, &th_fluid_props::pr);
}

}  // extern "C"
