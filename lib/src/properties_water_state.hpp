// properties_water_state.hpp - the argument and state checks shared by the
// water property entry points, and the full property evaluation they all
// draw on.
#ifndef TUBEHEAT_PROPERTIES_WATER_STATE_HPP
#define TUBEHEAT_PROPERTIES_WATER_STATE_HPP

#include "internal.hpp"
#include "properties_water_if97.hpp"
#include "properties_water_transport.hpp"

namespace th {
namespace water {

// The transport releases (R12-08, R15-11) start at the triple point,
// 0.01 K above the lower end of IF97 region 1.
constexpr double T_TRANSPORT_MIN = 273.16;
constexpr const char *NOTE_BELOW_TRIPLE =
    "t < 273.16 K: the IAPWS viscosity and conductivity releases start at "
    "the triple point (extrapolated by at most 0.01 K)";

// Bad numbers are TH_ERR_INPUT; a state outside IF97 region 1 (too cold,
// too hot, too high a pressure, or vapour because p < p_sat(t)) is
// TH_ERR_STATE. Returns the region-1 properties of a valid state.
inline if97::region1_props liquid_state(double t, double p) {
    need_temperature(t);
    need_positive(p);
    if (t < if97::T_MIN || t > if97::T_MAX_REGION1) fail(TH_ERR_STATE);
    if (p > if97::P_MAX) fail(TH_ERR_STATE);
    // Equality is liquid: a pressure obtained from
    // th_water_saturation_pressure(t) gives the saturated liquid.
    if (p < if97::saturation_pressure(t)) fail(TH_ERR_STATE);
    return if97::region1(t, p);
}

// Warnings that apply to the transport properties at a valid state.
inline void transport_range(double t, range_check &rc) {
    rc.require(t >= T_TRANSPORT_MIN, NOTE_BELOW_TRIPLE);
}

// Every property at a valid (t, p); all values checked finite.
inline th_fluid_props all(double t, double p, range_check &rc) {
    const if97::region1_props r = liquid_state(t, p);
    transport_range(t, rc);
    const double rho = 1.0 / r.v;
    const double mu = iapws_transport::viscosity(t, rho);
    const double k =
        iapws_transport::conductivity_background(t, rho) +
        iapws_transport::conductivity_critical(t, rho, r.cp, r.cv, r.drho_dp,
                                               mu);
    th_fluid_props out;
    out.rho = checked(rho);
    out.cp = checked(r.cp);
    out.mu = checked(mu);
    out.k = checked(k);
    out.pr = checked(r.cp * mu / k);
    out.h = checked(r.h);
    out.range_note = rc.note();
    return out;
}

}  // namespace water
}  // namespace th

#endif
