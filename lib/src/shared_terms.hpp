// shared_terms.hpp - the parts of a correlation that depend only on
// th_conditions fields every row of a th_nusselt_array call shares (not on
// Re, Pr or L/D): computed once per array call instead of once per row, and
// once per single call. The same expression either way, so a row equals the
// single call bit for bit. Not installed.
#ifndef TUBEHEAT_SHARED_TERMS_HPP
#define TUBEHEAT_SHARED_TERMS_HPP

#include "tubeheat.h"

#include <cmath>

namespace th {

struct shared_terms {
    double mu_factor = 1.0;  // (mu_b/mu_w)^0.14, both Sieder-Tate forms
};

// For a method that reads mu_ratio (already validated) or not.
inline shared_terms shared_terms_of(const th_conditions &c, bool reads_mu_ratio) {
    shared_terms t;
    if (reads_mu_ratio) t.mu_factor = std::pow(c.mu_ratio, 0.14);
    return t;
}

}  // namespace th

#endif
