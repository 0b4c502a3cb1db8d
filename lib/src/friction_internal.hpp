// friction_internal.hpp - friction factors for use inside the library (the
// Nusselt correlations need f). Not installed.
#ifndef TUBEHEAT_FRICTION_INTERNAL_HPP
#define TUBEHEAT_FRICTION_INTERNAL_HPP

#include "internal.hpp"

#include <cmath>

namespace th {

// Colebrook (1939) solved exactly (Lambert W); Re > 0, eps/D >= 0.
double colebrook(double re, double rel_roughness);
// Petukhov (1970) smooth-tube friction (0.790 ln Re - 1.64)^-2. Inline:
// the turbulent Nusselt correlations call it on every evaluation.
inline double petukhov_f(double re) {
    const double t = 0.790 * std::log(re) - 1.64;
    return 1.0 / (t * t);
}
// Friction factor by th_friction_method id, recording range violations.
double friction(int method, double re, double rel_roughness, range_check &rc);
// The same, and TH_ERR_INPUT unless the result is finite and positive: what
// every C entry point returning f needs.
double friction_checked(int method, double re, double rel_roughness, range_check &rc);

}  // namespace th

#endif
