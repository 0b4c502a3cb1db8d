// regime_entry.cpp - flow regime and entry lengths.
//
// Thresholds and entry lengths are rules of common practice or published
// fits; each is named beside its formula and in tubeheat.h.
#include "internal.hpp"

#include <cmath>

using th::checked;
using th::fail;
using th::guard;
using th::need;
using th::need_out;
using th::need_positive;

namespace {

int regime_of(double re) {
    if (re < TH_RE_LAMINAR_MAX) return TH_LAMINAR;
    if (re < TH_RE_TURBULENT_MIN) return TH_TRANSITIONAL;
    return TH_TURBULENT;
}

void need_wall(int wall) { need(wall == TH_WALL_T || wall == TH_WALL_H); }

// Resolves TH_ENTRY_AUTO for the regime: the Shah & London laminar values,
// ten diameters otherwise.
int resolve(int method, int regime) {
    if (method != TH_ENTRY_AUTO) return method;
    return regime == TH_LAMINAR ? TH_ENTRY_SHAH_LONDON : TH_ENTRY_TURBULENT_10D;
}

void need_known(int method) {
    if (method < TH_ENTRY_AUTO || method > TH_ENTRY_TURBULENT_60D) fail(TH_ERR_METHOD);
}

// x_fd,h / D and whether the method is within its regime.
double hydro_length(int method, double re, th::range_check &rc) {
    const bool laminar = re < TH_RE_LAMINAR_MAX;
    switch (method) {
    case TH_ENTRY_COMMON:  // 0.05 Re (common practice)
        rc.require(laminar, "laminar entry length applied at Re >= 2300");
        return 0.05 * re;
    case TH_ENTRY_SHAH_LONDON:  // 0.0565 Re, 99 % of the centreline velocity
        rc.require(laminar, "laminar entry length applied at Re >= 2300");
        return 0.0565 * re;
    case TH_ENTRY_DURST:  // Durst, Ray, Unsal & Bayoumi (2005)
        rc.require(laminar, "laminar entry length applied at Re >= 2300");
        return std::pow(std::pow(0.619, 1.6) + std::pow(0.0567 * re, 1.6), 1.0 / 1.6);
    case TH_ENTRY_TURBULENT_10D:  // (common practice)
        rc.require(!laminar, "turbulent entry length applied at Re < 2300");
        return 10.0;
    case TH_ENTRY_TURBULENT_60D:  // (common practice, conservative)
        rc.require(!laminar, "turbulent entry length applied at Re < 2300");
        return 60.0;
    default:
        fail(TH_ERR_METHOD);
    }
}

double thermal_length(int method, double re, double pr, int wall,
                      th::range_check &rc) {
    const bool laminar = re < TH_RE_LAMINAR_MAX;
    switch (method) {
    case TH_ENTRY_COMMON:  // 0.05 Re Pr (common practice)
        rc.require(laminar, "laminar entry length applied at Re >= 2300");
        return 0.05 * re * pr;
    case TH_ENTRY_SHAH_LONDON:  // Shah & London (1978): Nu_x within 5 % of
                                // the developed value
        rc.require(laminar, "laminar entry length applied at Re >= 2300");
        return (wall == TH_WALL_T ? 0.0335 : 0.0430) * re * pr;
    case TH_ENTRY_DURST:  // a hydrodynamic method only
        fail(TH_ERR_METHOD);
    case TH_ENTRY_TURBULENT_10D:
        rc.require(!laminar, "turbulent entry length applied at Re < 2300");
        return 10.0;
    case TH_ENTRY_TURBULENT_60D:
        rc.require(!laminar, "turbulent entry length applied at Re < 2300");
        return 60.0;
    default:
        fail(TH_ERR_METHOD);
    }
}

}  // namespace

extern "C" {

int th_regime_of(double re, int *regime) {
    return guard([&] {
        need_out(regime);
        need(std::isfinite(re) && re >= 0.0);
        *regime = regime_of(re);
        return TH_OK;
    });
}

const char *th_regime_name(int regime) {
    switch (regime) {
    case TH_LAMINAR:
        return "laminar";
    case TH_TRANSITIONAL:
        return "transitional";
    case TH_TURBULENT:
        return "turbulent";
    default:
        return nullptr;
    }
}

int th_entry_length_hydro(int method, double re, double *x_over_d) {
    return guard([&] {
        need_out(x_over_d);
        need_known(method);
        need_positive(re);
        th::range_check rc;
        const double l = hydro_length(resolve(method, regime_of(re)), re, rc);
        *x_over_d = checked(l);
        return rc.status();
    });
}

int th_entry_length_thermal(int method, double re, double pr, int wall,
                            double *x_over_d) {
    return guard([&] {
        need_out(x_over_d);
        need_known(method);
        need_positive(re);
        need_positive(pr);
        need_wall(wall);
        th::range_check rc;
        const double l = thermal_length(resolve(method, regime_of(re)), re, pr, wall, rc);
        *x_over_d = checked(l);
        return rc.status();
    });
}

int th_entry_state(int method, double re, double pr, double x_over_d, int wall,
                   th_entry_info *info) {
    return guard([&] {
        need_out(info);
        need_known(method);
        need_positive(re);
        need_positive(pr);
        need(!std::isnan(x_over_d) && x_over_d >= 0.0);
        need_wall(wall);
        const int regime = regime_of(re);
        // The Durst fit is hydrodynamic only: its thermal partner is the
        // Shah & London laminar value.
        const int m = resolve(method, regime);
        th::range_check rc;
        const double lh = hydro_length(m, re, rc);
        const double lt = thermal_length(m == TH_ENTRY_DURST ? TH_ENTRY_SHAH_LONDON : m,
                                         re, pr, wall, rc);
        th_entry_info r{};
        r.regime = regime;
        r.x_fd_hydro_over_d = checked(lh);
        r.x_fd_thermal_over_d = checked(lt);
        r.hydro_developed = x_over_d >= lh ? 1 : 0;
        r.thermal_developed = x_over_d >= lt ? 1 : 0;
        // x* is infinite for an infinite x/D; report the largest finite
        // double there rather than infinity (the contract forbids inf).
        r.x_star = std::isinf(x_over_d) ? 1.7976931348623157e308 : checked(x_over_d / (re * pr));
        *info = r;
        return rc.status();
    });
}

}  // extern "C"
