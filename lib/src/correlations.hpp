// correlations.hpp - the Nusselt correlations as plain C++ functions of the
// conditions, shared by the dispatcher in nusselt.cpp. Each records every
// validity limit it violates in its range bookkeeping. Not installed.
#ifndef TUBEHEAT_CORRELATIONS_HPP
#define TUBEHEAT_CORRELATIONS_HPP

// Laminar (laminar.hpp), turbulent and transitional (turbulent.hpp): inline
// templates on the range bookkeeping (range_check for th_nusselt, range_flag
// for th_nusselt_array).
#include "laminar.hpp"
#include "turbulent.hpp"

#endif
