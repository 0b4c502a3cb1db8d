// rows.hpp - the row loop shared by the *_array functions: one status per
// row, NaN in a failed row's value, and the call's own status summing them
// up. Not installed.
#ifndef TUBEHEAT_ROWS_HPP
#define TUBEHEAT_ROWS_HPP

#include "internal.hpp"

#include <cstddef>
#include <limits>

namespace th {

// The return value of an *_array call: the first failed row's code, else
// TH_WARN_RANGE when any row warned, else TH_OK.
class row_statuses {
  public:
    void add(int status) {
        if (status == TH_OK) return;  // most rows: one well-predicted branch
        if (TH_FAILED(status)) {
            if (first_error_ == TH_OK) first_error_ = status;
        } else if (status == TH_WARN_RANGE) {
            warned_ = true;
        }
    }
    int result() const { return first_error_ != TH_OK ? first_error_ : warned_ ? TH_WARN_RANGE : TH_OK; }

  private:
    int first_error_ = TH_OK;
    bool warned_ = false;
};

// For i in [0, n): status[i] = row(i, value), out[i] = value on success and
// NaN on failure (a failed row cannot pass for a number). `row` reads its
// inputs before out[i] is written, so out may alias an input array.
template <class Row>
int for_each_row(std::size_t n, double *out, int *status, Row &&row) {
    row_statuses all;
    for (std::size_t i = 0; i < n; ++i) {
        double value = 0.0;
        const int s = row(i, value);
        out[i] = TH_FAILED(s) ? std::numeric_limits<double>::quiet_NaN() : value;
        status[i] = s;
        all.add(s);
    }
    return all.result();
}

}  // namespace th

#endif
