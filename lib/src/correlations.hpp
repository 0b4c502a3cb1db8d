// correlations.hpp - the Nusselt correlations as plain C++ functions of the
// conditions, shared by the dispatcher in nusselt.cpp. Each records every
// validity limit it violates in the range_check. Not installed.
#ifndef TUBEHEAT_CORRELATIONS_HPP
#define TUBEHEAT_CORRELATIONS_HPP

#include "internal.hpp"

namespace th {

// Laminar (laminar.cpp)
double nu_laminar_developed(const th_conditions &c, range_check &rc);
double nu_hausen(const th_conditions &c, range_check &rc);
double nu_sieder_tate_laminar(const th_conditions &c, range_check &rc);
double nu_shah(const th_conditions &c, range_check &rc);
double nu_gnielinski_laminar(const th_conditions &c, range_check &rc);
// The composite evaluated at a given Re (used by the transition method).
double nu_gnielinski_laminar_at(const th_conditions &c, double re, range_check &rc);

}  // namespace th

// Turbulent and transitional: inline, in turbulent.hpp.
#include "turbulent.hpp"

#endif
