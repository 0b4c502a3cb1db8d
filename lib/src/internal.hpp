// internal.hpp - shared plumbing behind the C API: the exception fence,
// argument checks and the validity-range bookkeeping. Not installed.
#ifndef TUBEHEAT_INTERNAL_HPP
#define TUBEHEAT_INTERNAL_HPP

#include "tubeheat.h"

#include <boost/math/policies/error_handling.hpp>

#include <cmath>
#include <cstdint>
#include <cstring>
#include <exception>
#include <limits>
#include <new>
#include <stdexcept>
#include <type_traits>
#include <utility>

namespace th {

// Thrown inside the library to leave with a given status; converted back to
// the status code by guard(). Never crosses the C ABI.
struct status_error {
    int status;
};

[[noreturn]] inline void fail(int status) { throw status_error{status}; }

// Every C entry point runs its body through guard(): whatever is thrown
// inside (our status_error, a Boost.Math policy error, bad_alloc) becomes a
// status code, so no exception crosses the ABI. Boost.Math is used with its
// default throw-on-error policy on purpose: an error cannot then be hidden as
// a plain number, and this fence turns it into an explicit code.
template <class Body>
int guard(Body &&body) noexcept {
    try {
        return body();
    } catch (const status_error &e) {
        return e.status;
    } catch (const boost::math::evaluation_error &) {
        return TH_ERR_NO_CONVERGENCE;
    } catch (const std::domain_error &) {
        return TH_ERR_INPUT;
    } catch (const std::overflow_error &) {
        return TH_ERR_INTERNAL;
    } catch (const std::bad_alloc &) {
        return TH_ERR_INTERNAL;
    } catch (...) {
        return TH_ERR_INTERNAL;
    }
}

// ---- argument checks (throw status_error{TH_ERR_INPUT}) -------------------
inline void need(bool ok) {
    if (!ok) fail(TH_ERR_INPUT);
}
template <class T>
inline void need_out(T *p) {
    if (p == nullptr) fail(TH_ERR_INPUT);
}
inline bool finite(double x) { return std::isfinite(x); }
// Finite and > 0, in one unsigned comparison of the bit pattern: the
// positive finite doubles are exactly the patterns 1 .. 0x7FEF...F (+0 wraps
// to the top, negatives, infinities and NaNs lie above). The hottest check
// in the library (Re and Pr of every call and row); written so, it is three
// instructions and one branch instead of two floating-point comparisons.
inline bool positive_finite(double x) {
    std::uint64_t bits;
    std::memcpy(&bits, &x, sizeof bits);
    return bits - 1u < 0x7FEFFFFFFFFFFFFFu;
}
inline void need_positive(double x) { need(positive_finite(x)); }
inline void need_nonnegative(double x) { need(finite(x) && x >= 0.0); }
inline void need_finite(double x) { need(finite(x)); }
// Positive, or +infinity (used for "fully developed" lengths).
inline void need_positive_or_inf(double x) { need(!std::isnan(x) && x > 0.0); }
inline void need_temperature(double t) { need(finite(t) && t > 0.0); }
// A relative roughness eps/D: 0 (smooth) up to, not including, 1.
inline void need_rel_roughness(double rr) { need(finite(rr) && rr >= 0.0 && rr < 1.0); }

// The same tests as plain expressions (nothing thrown), for the row
// checks of the *_array functions.
inline bool positive_or_inf(double x) { return x > 0.0; }  // false for NaN

// A result about to be written with a success code must be finite. Inputs
// that are each finite can still be so extreme that the result overflows
// (1e308 * 1e308): that is bad input, reported as such, never written.
inline double checked(double x) {
    if (!std::isfinite(x)) fail(TH_ERR_INPUT);
    return x;
}
// Finite and positive (a Nusselt number, a friction factor): checked() and
// need(x > 0) in one test.
inline double positive_result(double x) {
    if (!positive_finite(x)) fail(TH_ERR_INPUT);
    return x;
}

// Collects validity-range violations while a method is evaluated. The first
// violated limit is kept as a static text for the caller.
class range_check {
  public:
    // Record `note` when `within` is false.
    void require(bool within, const char *note) {
        if (!within && note_ == nullptr) note_ = note;
    }
    bool ok() const { return note_ == nullptr; }
    int status() const { return ok() ? TH_OK : TH_WARN_RANGE; }
    const char *note() const { return note_ ? note_ : ""; }

  private:
    const char *note_ = nullptr;
};

// The same interface for the *_array functions, which report per row only
// whether some limit was violated, not which: a flag, cheaper than keeping
// the first note (see rows.hpp).
class range_flag {
  public:
    // `&`, not `&&`: no branch per limit, only the flag.
    void require(bool within, const char * /*note*/) { ok_ = ok_ & within; }
    bool ok() const { return ok_; }
    int status() const { return ok_ ? TH_OK : TH_WARN_RANGE; }

  private:
    bool ok_ = true;
};

// Calls visit(std::integral_constant<int, I>{}) for the I in [First, Last)
// equal to the run-time id, and fails with TH_ERR_METHOD for any other id.
// Each method then compiles to its own straight-line code (its checks and
// formula known at compile time) while callers pass a method id.
template <int First, int Last, class Visit>
decltype(auto) with_id(int id, Visit &&visit) {
    if constexpr (First + 1 == Last) {
        if (id != First) fail(TH_ERR_METHOD);
        return visit(std::integral_constant<int, First>{});
    } else {
        if (id == First) return visit(std::integral_constant<int, First>{});
        return with_id<First + 1, Last>(id, std::forward<Visit>(visit));
    }
}

// Case-insensitive comparison that treats '-', '_', ' ' and '.' as equal
// and ignores them, so "Dittus-Boelter", "dittus_boelter" and
// "DittusBoelter" all match.
bool name_matches(const char *given, const char *canonical) noexcept;

}  // namespace th

#endif
