// friction_internal.hpp - friction factors for use inside the library (the
// Nusselt correlations need f): the formulas (friction_formulas.hpp) and the
// checked dispatch by method id. Not installed.
#ifndef TUBEHEAT_FRICTION_INTERNAL_HPP
#define TUBEHEAT_FRICTION_INTERNAL_HPP

#include "friction_formulas.hpp"
#include "internal.hpp"

namespace th {

// Friction factor by th_friction_method id, recording range violations.
double friction(int method, double re, double rel_roughness, range_check &rc);
// The same, and TH_ERR_INPUT unless the result is finite and positive: what
// every C entry point returning f needs.
double friction_checked(int method, double re, double rel_roughness, range_check &rc);

}  // namespace th

#endif
