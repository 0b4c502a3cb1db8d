// laminar_entry_api.cpp - the C entry points of the laminar entry region
// (thermal entry series, combined entry march, hydrodynamic entry friction)
// and of the laminar duct values. The numerics live in
// laminar_entry_series.cpp, laminar_entry_march.cpp and ducts.cpp.
#include "entry_internal.hpp"
#include "internal.hpp"

#include <cmath>

namespace {

// Combined-entry validity: the Prandtl range, and the first marched station.
template <class Range>
void require_combined_entry_range(double pr, double x_star, Range &rc) {
    th::require_combined_entry_pr(pr, rc);
    rc.require(x_star >= th::entry::combined_entry_x_star_min(),
               "combined entry: x* below 1e-7 (extrapolated)");
}

}  // namespace

extern "C" {

int th_thermal_entry_nusselt(double x_star, int wall, int averaging, double *nu) {
    return th::guard([&] {
        th::need_out(nu);
        const double v = th::thermal_entry_nu(x_star, wall, averaging);
        *nu = th::checked(v);
        return TH_OK;
    });
}

int th_combined_entry_nusselt(double x_star, double pr, int wall, int averaging,
                              double *nu) {
    return th::guard([&] {
        th::need_out(nu);
        const double v = th::combined_entry_nu(x_star, pr, wall, averaging);
        th::range_check rc;
        require_combined_entry_range(pr, x_star, rc);
        *nu = th::checked(v);
        return rc.status();
    });
}

int th_entry_march_study(int entry, double x_star, double pr, int wall, int averaging,
                         int cells, double growth, double *nu) {
    return th::guard([&] {
        th::need_out(nu);
        th::need(entry == TH_ENTRY_THERMAL || entry == TH_ENTRY_COMBINED);
        const double v = th::entry::entry_march_uncached(entry == TH_ENTRY_THERMAL, x_star, pr,
                                                        wall, averaging, cells, growth);
        th::range_check rc;
        require_combined_entry_range(pr, x_star, rc);
        *nu = th::checked(v);
        return rc.status();
    });
}

int th_combined_entry_friction(double x_plus, double *f_re_app) {
    return th::guard([&] {
        th::need_out(f_re_app);
        const double v = th::combined_entry_fre_app(x_plus);
        th::range_check rc;
        rc.require(x_plus >= th::entry::combined_entry_x_plus_min(),
                   "hydrodynamic entry: x+ below 1e-8 (extrapolated)");
        *f_re_app = th::checked(v);
        return rc.status();
    });
}

int th_graetz_eigen(int wall, int n, double *lambda, double *coef) {
    return th::guard([&] {
        th::need_out(lambda);
        th::need_out(coef);
        double l = 0.0, c = 0.0;
        th::entry::eigen_pair(wall, n, &l, &c, nullptr);
        *lambda = th::checked(l);
        *coef = th::checked(c);
        return TH_OK;
    });
}

int th_duct_laminar(int shape, double ratio, double *f_re, double *nu_t, double *nu_h) {
    return th::guard([&] {
        th::need(f_re != nullptr || nu_t != nullptr || nu_h != nullptr);
        double a = 0.0, b = 0.0, c = 0.0;
        th::duct_laminar_developed(shape, ratio, &a, &b, &c);
        th::range_check rc;
        rc.require(th::duct_laminar_in_range(shape, ratio),
                   "annulus: d_inner/d_outer below 0.05 (table extrapolated)");
        if (f_re) *f_re = a;
        if (nu_t) *nu_t = b;
        if (nu_h) *nu_h = c;
        return rc.status();
    });
}

int th_annulus_laminar(double ratio, int heated_wall, double *f_re, double *nu_t,
                       double *nu_h) {
    return th::guard([&] {
        th::need(f_re != nullptr || nu_t != nullptr || nu_h != nullptr);
        double a = 0.0, b = 0.0, c = 0.0;
        th::annulus_laminar(ratio, heated_wall, &a, &b, &c);
        th::range_check rc;
        rc.require(heated_wall == TH_ANNULUS_OUTER_HEATED ||
                       th::duct_laminar_in_range(TH_DUCT_ANNULUS, ratio),
                   "annulus: d_inner/d_outer below 0.05 (table extrapolated)");
        if (f_re) *f_re = a;
        if (nu_t) *nu_t = b;
        if (nu_h) *nu_h = c;
        return rc.status();
    });
}

}  // extern "C"
