// groups.cpp - dimensionless groups, hydraulic diameters, Nu <-> h.
#include "internal.hpp"

#include <boost/math/constants/constants.hpp>

namespace {
constexpr double pi = boost::math::constants::pi<double>();
}

using th::checked;
using th::guard;
using th::need;
using th::need_nonnegative;
using th::need_out;
using th::need_positive;

extern "C" {

int th_reynolds(double rho, double u, double d, double mu, double *re) {
    return guard([&] {
        need_out(re);
        need_positive(rho);
        need_nonnegative(u);
        need_positive(d);
        need_positive(mu);
        *re = checked(rho * u * d / mu);
        return TH_OK;
    });
}

int th_reynolds_mass_flow(double mdot, double d, double mu, double *re) {
    return guard([&] {
        need_out(re);
        need_nonnegative(mdot);
        need_positive(d);
        need_positive(mu);
        *re = checked(4.0 * mdot / (pi * d * mu));
        return TH_OK;
    });
}

int th_reynolds_mass_flow_duct(double mdot, double d_h, double area, double mu,
                               double *re) {
    return guard([&] {
        need_out(re);
        need_nonnegative(mdot);
        need_positive(d_h);
        need_positive(area);
        need_positive(mu);
        // A hydraulic diameter larger than that of a circle of the same area
        // is geometrically impossible (the circle has the largest D_h).
        need(d_h <= 2.0 * std::sqrt(area / pi) * (1.0 + 1e-12));
        *re = checked(mdot * d_h / (area * mu));
        return TH_OK;
    });
}

int th_prandtl(double cp, double mu, double k, double *pr) {
    return guard([&] {
        need_out(pr);
        need_positive(cp);
        need_positive(mu);
        need_positive(k);
        *pr = checked(cp * mu / k);
        return TH_OK;
    });
}

int th_peclet(double re, double pr, double *pe) {
    return guard([&] {
        need_out(pe);
        need_nonnegative(re);
        need_positive(pr);
        *pe = checked(re * pr);
        return TH_OK;
    });
}

int th_graetz(double re, double pr, double d, double x, int convention,
              double *gz) {
    return guard([&] {
        need_out(gz);
        need_positive(re);
        need_positive(pr);
        need_positive(d);
        need_positive(x);
        double g = (d / x) * re * pr;
        if (convention == TH_GRAETZ_MASS_FLOW)
            g *= pi / 4.0;
        else
            need(convention == TH_GRAETZ_DIAMETER);
        *gz = checked(g);
        return TH_OK;
    });
}

int th_inverse_graetz(double x, double d, double re, double pr, double *x_star) {
    return guard([&] {
        need_out(x_star);
        need_positive(x);
        need_positive(d);
        need_positive(re);
        need_positive(pr);
        *x_star = checked(x / (d * re * pr));
        return TH_OK;
    });
}

int th_hydraulic_diameter(double area, double perimeter, double *d_h) {
    return guard([&] {
        need_out(d_h);
        need_positive(area);
        need_positive(perimeter);
        // Isoperimetric inequality: P^2 >= 4 pi A for any closed section.
        need(perimeter * perimeter >= 4.0 * pi * area * (1.0 - 1e-12));
        *d_h = checked(4.0 * area / perimeter);
        return TH_OK;
    });
}

int th_hydraulic_diameter_rectangle(double a, double b, double *d_h) {
    return guard([&] {
        need_out(d_h);
        need_positive(a);
        need_positive(b);
        *d_h = checked(2.0 * a * b / (a + b));
        return TH_OK;
    });
}

int th_hydraulic_diameter_annulus(double d_inner, double d_outer, double *d_h) {
    return guard([&] {
        need_out(d_h);
        need_positive(d_inner);
        need_positive(d_outer);
        need(d_inner < d_outer);
        *d_h = checked(d_outer - d_inner);
        return TH_OK;
    });
}

int th_h_from_nusselt(double nu, double k, double d, double *h) {
    return guard([&] {
        need_out(h);
        need_positive(nu);
        need_positive(k);
        need_positive(d);
        *h = checked(nu * k / d);
        return TH_OK;
    });
}

int th_nusselt_from_h(double h, double d, double k, double *nu) {
    return guard([&] {
        need_out(nu);
        need_positive(h);
        need_positive(d);
        need_positive(k);
        *nu = checked(h * d / k);
        return TH_OK;
    });
}

}  // extern "C"
