// api_calls.hpp - one table that calls every function of the public C API,
// shared by the libFuzzer harness (tests/fuzz/fuzz_api.cpp) and the
// ThreadSanitizer test (tests/tsan/tsan_api.cpp).
//
// Each entry draws its arguments from an abstract `source` (fuzz bytes, or a
// seeded generator), calls the function once and checks the contract stated
// at the top of lib/include/tubeheat.h:
//   - the status is one of the defined codes;
//   - on an error every output is untouched (outputs are pre-filled with a
//     sentinel byte pattern and compared byte for byte afterwards);
//   - with TH_OK / TH_WARN_RANGE every double written is finite, every
//     required output pointer was non-NULL, enum-like fields are in range
//     and static texts are readable;
//   - inputs passed by const pointer are left unchanged.
// A violation calls th_rob::violation(), which prints the function and the
// broken rule and aborts (libFuzzer then saves the input; the TSan test
// fails).
//
// The outputs of a successful call are recorded in an `outcome` so that the
// TSan test can compare results bit for bit across threads.
//
// Adding a C API function: add a call_xxx() below and its row in api_calls[].
// tests/fuzz/check_api_coverage.sh fails the fuzz and TSan stages while a
// function declared TH_API in the header is missing here.
#ifndef TH_ROBUSTNESS_API_CALLS_HPP
#define TH_ROBUSTNESS_API_CALLS_HPP

#include "tubeheat.h"

#include <cmath>
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <initializer_list>

namespace th_rob {

// The structs whose every field the checks below read or fill. A change of
// size means a field was added or removed: update record()/draw_*() for it,
// then these numbers (x86-64 sizes).
static_assert(sizeof(th_entry_info) == 40, "th_entry_info changed: update record()");
static_assert(sizeof(th_nusselt_result) == 48, "th_nusselt_result changed: update record()");
static_assert(sizeof(th_fluid_props) == 56, "th_fluid_props changed: update record()");
static_assert(sizeof(th_conditions) == 96, "th_conditions changed: update draw_conditions()");
static_assert(sizeof(th_fluid) == 656, "th_fluid changed: update draw_fluid()");
static_assert(sizeof(th_tube_case) == 856, "th_tube_case changed: update draw_tube_case()");
static_assert(sizeof(th_tube_result) == 288, "th_tube_result changed: update record()");
static_assert(sizeof(th_tube_report_row) == 40, "th_tube_report_row changed: update call_th_tube_report()");

// ---- what an argument means: used to draw a plausible value ---------------
// Plausible values are log-uniform between lo and hi (negated half of the
// time for signed kinds); `nominal` is used when a fuzz input has run out of
// bytes, so that a short input still reaches the computing code. The ranges
// only steer the inputs towards the interesting region; they assert nothing.
enum class kind {
    any,
    reynolds,
    prandtl,
    diameter,
    outer_diameter,
    length,
    area,
    perimeter,
    velocity,
    mass_flow,
    density,
    viscosity,
    conductivity,
    cp,
    nusselt,
    h_coef,
    ratio,          // (0, 1]
    prop_ratio,     // mu_b/mu_w, T_b/T_w
    roughness,      // eps/D
    x_over_d,
    x_star,
    temperature,    // generic, kelvin
    t_inlet,
    t_target,
    t_surround,
    t_water,
    t_air,
    pressure,
    delta_t,        // signed
    heat_flux,      // signed
    conductance,    // UA or UA per length
    fouling,
    friction,
    growth,         // axial step growth of the combined-entry march
    thickness,      // wall thickness
    table_step,     // temperature step between user-fluid table points
    tolerance,      // tube solver tolerance [K]
    count_
};

struct kind_info {
    double lo, hi, nominal;
    bool is_signed;
};

inline const kind_info &info(kind k) {
    static const kind_info table[] = {
        {1e-12, 1e12, 1.0, true},      // any
        {1.0, 1e8, 1000.0, false},     // reynolds
        {1e-3, 1e5, 7.0, false},       // prandtl
        {1e-5, 10.0, 0.02, false},     // diameter
        {1e-5, 10.0, 0.03, false},     // outer_diameter
        {1e-4, 1e4, 2.0, false},       // length
        {1e-10, 10.0, 3e-4, false},    // area
        {1e-5, 40.0, 0.07, false},     // perimeter
        {1e-6, 100.0, 1.0, false},     // velocity
        {1e-6, 1e3, 0.1, false},       // mass_flow
        {1e-2, 2e4, 1000.0, false},    // density
        {1e-6, 1e3, 1e-3, false},      // viscosity
        {1e-3, 500.0, 0.6, false},     // conductivity
        {100.0, 2e4, 4180.0, false},   // cp
        {1e-2, 1e5, 50.0, false},      // nusselt
        {0.1, 1e6, 1000.0, false},     // h_coef
        {1e-4, 1.0, 0.5, false},       // ratio
        {0.05, 20.0, 1.0, false},      // prop_ratio
        {1e-8, 0.1, 1e-4, false},      // roughness
        {1e-4, 1e7, 50.0, false},      // x_over_d
        {1e-8, 10.0, 0.01, false},     // x_star
        {1.0, 4000.0, 300.0, false},   // temperature
        {1.0, 4000.0, 300.0, false},   // t_inlet
        {1.0, 4000.0, 320.0, false},   // t_target
        {1.0, 4000.0, 350.0, false},   // t_surround
        {273.15, 650.0, 300.0, false}, // t_water
        {100.0, 3500.0, 300.0, false}, // t_air
        {100.0, 2e8, 1e5, false},      // pressure
        {1e-6, 1e3, 10.0, true},       // delta_t
        {1e-2, 1e7, 1e4, true},        // heat_flux
        {1e-4, 1e7, 100.0, false},     // conductance
        {1e-6, 0.1, 1e-4, false},      // fouling
        {1e-3, 1.0, 0.02, false},      // friction
        {1e-4, 1.0, 0.02, false},      // growth
        {1e-6, 0.1, 1e-3, false},      // thickness
        {1e-3, 500.0, 20.0, false},    // table_step
        {1e-14, 10.0, 1e-9, false},    // tolerance
    };
    static_assert(sizeof table / sizeof table[0] == static_cast<std::size_t>(kind::count_),
                  "one row per kind");
    return table[static_cast<std::size_t>(k)];
}

// Map u in [0, 1] to a plausible value of kind k (negative when `negative`
// and the kind is signed).
inline double plausible(kind k, double u, bool negative) {
    const kind_info &ki = info(k);
    double v = ki.lo * std::pow(ki.hi / ki.lo, u);
    if (u <= 0.0) v = ki.lo;
    if (u >= 1.0) v = ki.hi;
    return (negative && ki.is_signed) ? -v : v;
}

// Special values: IEEE corner cases and the thresholds the library tests
// against (regime limits, property-formulation limits), so that boundary
// comparisons are exercised exactly.
inline double special(unsigned i) {
    static const double table[] = {
        NAN, -NAN, INFINITY, -INFINITY,
        0.0, -0.0, 4.9406564584124654e-324, -4.9406564584124654e-324,  // denormal min
        2.2250738585072014e-308, -2.2250738585072014e-308,               // DBL_MIN
        1.7976931348623157e308, -1.7976931348623157e308,                 // DBL_MAX
        1.0, -1.0, 2.220446049250313e-16, 0.9999999999999999,
        1e-300, 1e300, 2300.0, 10000.0,
        273.15, 273.16, 623.15, 647.096,
        22.064e6, 611.213, 0.5, 4000.0,
        1e8, 0.05, 2000.0, 3000.0,
    };
    return table[i % (sizeof table / sizeof table[0])];
}

// ---- where arguments come from ---------------------------------------------
class source {
  public:
    virtual ~source() = default;
    // A double argument of the given kind.
    virtual double real(kind k) = 0;
    // An int argument that selects one of `count` values 0..count-1 (a
    // method id, a wall condition, a count); may also return out-of-range
    // values (-1, count, INT_MIN, ...). `nominal` is the value a fuzz input
    // that has run out of bytes gets.
    virtual int choice(int count, int nominal = 0) = 0;
    // A C string argument (a method name); may return NULL. The pointer
    // stays valid until the next call of text().
    virtual const char *text() = 0;
    // Whether the next output (or input) pointer should be passed as NULL.
    virtual bool null_pointer() = 0;
};

// ---- contract violations ----------------------------------------------------
[[noreturn]] inline void violation(const char *fn, const char *rule) {
    std::fprintf(stderr, "\n*** tubeheat contract violation in %s: %s\n", fn, rule);
    std::fflush(stderr);
    std::abort();
}

inline bool status_is_defined(int s) {
    return s == TH_OK || s == TH_WARN_RANGE || (s >= TH_ERR_INPUT && s <= TH_ERR_INTERNAL);
}

// A static text must be non-NULL, NUL-terminated within a sane length.
inline void check_text(const char *fn, const char *text, const char *what) {
    if (text == nullptr) violation(fn, what);
    if (strnlen(text, 4096) >= 4096) violation(fn, "static text not terminated within 4096 bytes");
}

// A byte copy of an input passed by const pointer, taken before the call;
// unchanged() after it proves the function left the input alone.
template <class T>
class snapshot {
  public:
    explicit snapshot(const T &v) : v_(&v) {
        std::memcpy(static_cast<void *>(&copy_), static_cast<const void *>(&v), sizeof(T));
    }
    bool unchanged() const { return std::memcmp(static_cast<const void *>(&copy_), v_, sizeof(T)) == 0; }
    void check_const(const char *fn) const {
        if (!unchanged()) violation(fn, "modified its const input");
    }

  private:
    T copy_;
    const T *v_;
};

// ---- known open issues ------------------------------------------------------
// Bugs found by the fuzzer in code owned by others, reported and not fixed
// yet. With skip_known_issues set (the fuzz harness sets it unless
// TH_FUZZ_REPORT_KNOWN is in the environment) inputs that reproduce them
// are skipped, so that the fuzzer keeps looking for new ones. Each has a
// regression test in tests/unit/test_robustness_*.cpp; delete the filter
// once that test passes under ASan+UBSan.
inline bool skip_known_issues = false;
constexpr int skipped_known_issue = -3;

// Combined-entry march (laminar_entry_march.cpp): for a finite Pr below
// ~5e-313 or above ~9e307 the station count in stations() is computed from
// an infinite logarithm and converted to int (undefined behaviour); for
// small Pr (1e-3 with TH_WALL_T, and below) the march ends in a non-finite
// Nu and the call returns TH_ERR_INTERNAL, some inputs near Pr ~ 1e-289
// take over 10 s under ASan. Inputs with Pr < 1e-30 or Pr > 1e290 are
// skipped. Regression test: test_robustness_entry.cpp "combined entry at
// extreme Pr" and "combined entry at small Pr".
inline bool known_issue_combined_entry_pr(double pr) {
    return skip_known_issues && std::isfinite(pr) && pr > 0.0 && (pr < 1e-30 || pr > 1e290);
}

// Air properties (properties_air.cpp): a subnormal pressure passes
// need_positive(p) and the ideal-gas density p/(R t) underflows to 0,
// returned with TH_OK (th_air_props, th_air_density, th_fluid_props_at).
// Regression test: test_robustness_properties.cpp "air density at a
// subnormal pressure".
inline bool known_issue_air_pressure(double p) {
    // Fixed: air below 1 Pa is TH_ERR_STATE (properties_air.cpp).
    (void)p;
    return false;
}

// Calls the harness declines because they would take seconds under a
// sanitizer (documented as slow); the bounds themselves stay reachable.
constexpr int skipped_expensive = -4;

// ---- the result of one call, kept for bit-for-bit comparison ---------------
struct outcome {
    int status = -1000;
    int n_real = 0;
    int n_int = 0;
    int n_ptr = 0;
    std::uint64_t real_bits[32] = {};
    long long ints[16] = {};
    const void *ptrs[16] = {};

    void add_real(double v) {
        if (n_real < 32) std::memcpy(&real_bits[n_real++], &v, sizeof v);
    }
    void add_int(long long v) {
        if (n_int < 16) ints[n_int++] = v;
    }
    void add_ptr(const void *p) {
        if (n_ptr < 16) ptrs[n_ptr++] = p;
    }
    bool same_as(const outcome &o) const {
        return status == o.status && n_real == o.n_real && n_int == o.n_int &&
               n_ptr == o.n_ptr && std::memcmp(real_bits, o.real_bits, sizeof real_bits) == 0 &&
               std::memcmp(ints, o.ints, sizeof ints) == 0 &&
               std::memcmp(ptrs, o.ptrs, sizeof ptrs) == 0;
    }
};

// ---- output slots: sentinel pre-fill, NULL on request -----------------------
constexpr unsigned char sentinel_byte = 0xA5;

template <class T>
class out_slot {
  public:
    // optional: the header allows NULL for this output.
    explicit out_slot(source &s, bool optional = false)
        : null_(s.null_pointer()), optional_(optional) {
        std::memset(static_cast<void *>(&value_), sentinel_byte, sizeof value_);
    }
    T *ptr() { return null_ ? nullptr : &value_; }
    bool is_null() const { return null_; }
    bool required_but_null() const { return null_ && !optional_; }
    bool untouched() const {
        unsigned char fresh[sizeof(T)];
        std::memset(fresh, sentinel_byte, sizeof fresh);
        return std::memcmp(static_cast<const void *>(&value_), fresh, sizeof fresh) == 0;
    }
    const T &value() const { return value_; }

  private:
    T value_;
    bool null_;
    bool optional_;
};

// Common post-call checks; returns true when the call succeeded (outputs are
// then to be checked and recorded by the caller).
template <class... Slots>
bool settle(const char *fn, int st, outcome &o, const Slots &...slots) {
    o.status = st;
    if (!status_is_defined(st)) violation(fn, "returned an undefined status code");
    if (TH_FAILED(st)) {
        const bool all_untouched = (true && ... && slots.untouched());
        if (!all_untouched) violation(fn, "an output was written although an error was returned");
        return false;
    }
    const bool null_required = (false || ... || slots.required_but_null());
    if (null_required) violation(fn, "success returned for a NULL required output pointer");
    return true;
}

inline void record_real(const char *fn, outcome &o, double v) {
    if (!std::isfinite(v)) violation(fn, "NaN or infinity written with TH_OK/TH_WARN_RANGE");
    o.add_real(v);
}

inline void record(const char *fn, outcome &o, const out_slot<double> &s) {
    if (!s.is_null()) record_real(fn, o, s.value());
}

inline void record(const char *fn, outcome &o, const out_slot<th_entry_info> &s) {
    if (s.is_null()) return;
    const th_entry_info &e = s.value();
    if (e.regime < TH_LAMINAR || e.regime > TH_TURBULENT) violation(fn, "entry_info.regime out of range");
    if (e.hydro_developed != 0 && e.hydro_developed != 1) violation(fn, "hydro_developed not 0/1");
    if (e.thermal_developed != 0 && e.thermal_developed != 1) violation(fn, "thermal_developed not 0/1");
    o.add_int(e.regime);
    o.add_int(e.hydro_developed);
    o.add_int(e.thermal_developed);
    record_real(fn, o, e.x_fd_hydro_over_d);
    record_real(fn, o, e.x_fd_thermal_over_d);
    record_real(fn, o, e.x_star);
}

// range_note must be "" exactly when the status is TH_OK.
inline void check_range_note(const char *fn, int st, const char *note) {
    check_text(fn, note, "range_note is NULL");
    if ((st == TH_OK) != (note[0] == '\0'))
        violation(fn, "range_note empty/non-empty does not match TH_OK/TH_WARN_RANGE");
}

inline void record(const char *fn, outcome &o, int st, const out_slot<th_fluid_props> &s) {
    if (s.is_null()) return;
    const th_fluid_props &p = s.value();
    for (double v : {p.rho, p.cp, p.mu, p.k, p.pr, p.h}) record_real(fn, o, v);
    if (!(p.rho > 0 && p.cp > 0 && p.mu > 0 && p.k > 0 && p.pr > 0))
        violation(fn, "non-positive rho, cp, mu, k or pr");
    check_range_note(fn, st, p.range_note);
    o.add_ptr(p.range_note);
}

inline void record(const char *fn, outcome &o, int st, int requested,
                   const out_slot<th_nusselt_result> &s) {
    if (s.is_null()) return;
    const th_nusselt_result &r = s.value();
    record_real(fn, o, r.nu);
    record_real(fn, o, r.f);
    if (!(r.nu > 0.0)) violation(fn, "Nusselt number not positive");
    if (!(r.f >= 0.0)) violation(fn, "friction factor negative");
    if (r.method <= TH_NU_AUTO || r.method >= TH_NU_METHOD_COUNT)
        violation(fn, "result.method is not a concrete method id");
    if (requested != TH_NU_AUTO && r.method != requested)
        violation(fn, "result.method differs from the method requested");
    check_text(fn, r.method_name, "method_name is NULL");
    check_text(fn, r.reason, "reason is NULL");
    check_range_note(fn, st, r.range_note);
    o.add_int(r.method);
    o.add_ptr(r.method_name);
    o.add_ptr(r.reason);
    o.add_ptr(r.range_note);
}

// Draw N double arguments in order (never inside a call's argument list:
// the evaluation order of arguments is unspecified).
template <std::size_t N>
struct reals {
    double v[N];
    reals(source &s, const kind (&kinds)[N]) {
        for (std::size_t i = 0; i < N; ++i) v[i] = s.real(kinds[i]);
    }
    double operator[](std::size_t i) const { return v[i]; }
};

// A single-output function of doubles: f(args..., double *out).
#define TH_ROB_SIMPLE(fn_, ...)                                                 \
    inline void call_##fn_(source &s, outcome &o) {                             \
        static const kind k[] = {__VA_ARGS__};                                  \
        const reals<sizeof k / sizeof k[0]> a(s, k);                            \
        out_slot<double> out(s);                                                \
        const int st = th_rob::invoke_##fn_(a, out.ptr());                      \
        if (settle(#fn_, st, o, out)) record(#fn_, o, out);                     \
    }

// The invoke_ helpers spell out the argument lists (the macro above cannot
// expand an array into arguments).
template <class A> int invoke_th_reynolds(const A &a, double *r) { return th_reynolds(a[0], a[1], a[2], a[3], r); }
template <class A> int invoke_th_reynolds_mass_flow(const A &a, double *r) { return th_reynolds_mass_flow(a[0], a[1], a[2], r); }
template <class A> int invoke_th_reynolds_mass_flow_duct(const A &a, double *r) { return th_reynolds_mass_flow_duct(a[0], a[1], a[2], a[3], r); }
template <class A> int invoke_th_prandtl(const A &a, double *r) { return th_prandtl(a[0], a[1], a[2], r); }
template <class A> int invoke_th_peclet(const A &a, double *r) { return th_peclet(a[0], a[1], r); }
template <class A> int invoke_th_inverse_graetz(const A &a, double *r) { return th_inverse_graetz(a[0], a[1], a[2], a[3], r); }
template <class A> int invoke_th_hydraulic_diameter(const A &a, double *r) { return th_hydraulic_diameter(a[0], a[1], r); }
template <class A> int invoke_th_hydraulic_diameter_rectangle(const A &a, double *r) { return th_hydraulic_diameter_rectangle(a[0], a[1], r); }
template <class A> int invoke_th_hydraulic_diameter_annulus(const A &a, double *r) { return th_hydraulic_diameter_annulus(a[0], a[1], r); }
template <class A> int invoke_th_h_from_nusselt(const A &a, double *r) { return th_h_from_nusselt(a[0], a[1], a[2], r); }
template <class A> int invoke_th_nusselt_from_h(const A &a, double *r) { return th_nusselt_from_h(a[0], a[1], a[2], r); }
template <class A> int invoke_th_pressure_drop(const A &a, double *r) { return th_pressure_drop(a[0], a[1], a[2], a[3], a[4], r); }
template <class A> int invoke_th_heat_rate(const A &a, double *r) { return th_heat_rate(a[0], a[1], a[2], a[3], r); }
template <class A> int invoke_th_lmtd(const A &a, double *r) { return th_lmtd(a[0], a[1], r); }
template <class A> int invoke_th_outlet_temperature_ua(const A &a, double *r) { return th_outlet_temperature_ua(a[0], a[1], a[2], a[3], a[4], r); }
template <class A> int invoke_th_ua_tube(const A &a, double *r) { return th_ua_tube(a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7], r); }
template <class A> int invoke_th_length_for_outlet_ua(const A &a, double *r) { return th_length_for_outlet_ua(a[0], a[1], a[2], a[3], a[4], a[5], r); }
template <class A> int invoke_th_length_for_outlet_flux(const A &a, double *r) { return th_length_for_outlet_flux(a[0], a[1], a[2], a[3], a[4], a[5], r); }
template <class A> int invoke_th_water_density(const A &a, double *r) { return th_water_density(a[0], a[1], r); }
template <class A> int invoke_th_water_cp(const A &a, double *r) { return th_water_cp(a[0], a[1], r); }
template <class A> int invoke_th_water_enthalpy(const A &a, double *r) { return th_water_enthalpy(a[0], a[1], r); }
template <class A> int invoke_th_water_viscosity(const A &a, double *r) { return th_water_viscosity(a[0], a[1], r); }
template <class A> int invoke_th_water_conductivity(const A &a, double *r) { return th_water_conductivity(a[0], a[1], r); }
template <class A> int invoke_th_water_prandtl(const A &a, double *r) { return th_water_prandtl(a[0], a[1], r); }
template <class A> int invoke_th_water_saturation_pressure(const A &a, double *r) { return th_water_saturation_pressure(a[0], r); }
template <class A> int invoke_th_water_saturation_temperature(const A &a, double *r) { return th_water_saturation_temperature(a[0], r); }
template <class A> int invoke_th_air_density(const A &a, double *r) { return th_air_density(a[0], a[1], r); }
template <class A> int invoke_th_air_cp(const A &a, double *r) { return th_air_cp(a[0], a[1], r); }
template <class A> int invoke_th_air_enthalpy(const A &a, double *r) { return th_air_enthalpy(a[0], a[1], r); }
template <class A> int invoke_th_air_viscosity(const A &a, double *r) { return th_air_viscosity(a[0], a[1], r); }
template <class A> int invoke_th_air_conductivity(const A &a, double *r) { return th_air_conductivity(a[0], a[1], r); }
template <class A> int invoke_th_air_prandtl(const A &a, double *r) { return th_air_prandtl(a[0], a[1], r); }

// ---- dimensionless groups and geometry --------------------------------------
TH_ROB_SIMPLE(th_reynolds, kind::density, kind::velocity, kind::diameter, kind::viscosity)
TH_ROB_SIMPLE(th_reynolds_mass_flow, kind::mass_flow, kind::diameter, kind::viscosity)
TH_ROB_SIMPLE(th_reynolds_mass_flow_duct, kind::mass_flow, kind::diameter, kind::area, kind::viscosity)
TH_ROB_SIMPLE(th_prandtl, kind::cp, kind::viscosity, kind::conductivity)
TH_ROB_SIMPLE(th_peclet, kind::reynolds, kind::prandtl)
TH_ROB_SIMPLE(th_inverse_graetz, kind::length, kind::diameter, kind::reynolds, kind::prandtl)
TH_ROB_SIMPLE(th_hydraulic_diameter, kind::area, kind::perimeter)
TH_ROB_SIMPLE(th_hydraulic_diameter_rectangle, kind::diameter, kind::diameter)
TH_ROB_SIMPLE(th_hydraulic_diameter_annulus, kind::diameter, kind::outer_diameter)
TH_ROB_SIMPLE(th_h_from_nusselt, kind::nusselt, kind::conductivity, kind::diameter)
TH_ROB_SIMPLE(th_nusselt_from_h, kind::h_coef, kind::diameter, kind::conductivity)

inline void call_th_graetz(source &s, outcome &o) {
    static const kind k[] = {kind::reynolds, kind::prandtl, kind::diameter, kind::length};
    const reals<4> a(s, k);
    const int conv = s.choice(2);
    out_slot<double> gz(s);
    const int st = th_graetz(a[0], a[1], a[2], a[3], conv, gz.ptr());
    if (settle("th_graetz", st, o, gz)) record("th_graetz", o, gz);
}

// ---- version and status texts ----------------------------------------------
inline void call_th_version(source &, outcome &o) {
    const int v = th_version();
    if (v != TH_VERSION_NUMBER) violation("th_version", "differs from TH_VERSION_NUMBER");
    o.status = TH_OK;
    o.add_int(v);
}

inline void call_th_version_string(source &, outcome &o) {
    const char *v = th_version_string();
    check_text("th_version_string", v, "returned NULL");
    if (std::strcmp(v, TH_VERSION_STRING) != 0)
        violation("th_version_string", "differs from TH_VERSION_STRING");
    o.status = TH_OK;
    o.add_ptr(v);
}

inline void call_th_status_message(source &s, outcome &o) {
    const int code = s.choice(TH_ERR_INTERNAL + 2);
    const char *m = th_status_message(code);
    check_text("th_status_message", m, "returned NULL");
    o.status = TH_OK;
    o.add_ptr(m);
}

// ---- regime and entry region ------------------------------------------------
inline void call_th_regime_of(source &s, outcome &o) {
    const double re = s.real(kind::reynolds);
    out_slot<int> regime(s);
    const int st = th_regime_of(re, regime.ptr());
    if (!settle("th_regime_of", st, o, regime) || regime.is_null()) return;
    const int r = regime.value();
    // Thresholds documented in the header: "at the thresholds the higher
    // regime applies".
    const int expect = re < TH_RE_LAMINAR_MAX ? TH_LAMINAR
                       : re < TH_RE_TURBULENT_MIN ? TH_TRANSITIONAL
                                                  : TH_TURBULENT;
    if (r != expect) violation("th_regime_of", "regime does not follow the documented thresholds");
    o.add_int(r);
}

inline void call_th_regime_name(source &s, outcome &o) {
    const int r = s.choice(3);
    const char *n = th_regime_name(r);
    const bool known = r >= TH_LAMINAR && r <= TH_TURBULENT;
    if (known) check_text("th_regime_name", n, "NULL for a known regime");
    if (!known && n != nullptr) violation("th_regime_name", "non-NULL for an unknown regime");
    o.status = TH_OK;
    o.add_ptr(n);
}

inline void call_th_entry_length_hydro(source &s, outcome &o) {
    const int method = s.choice(TH_ENTRY_TURBULENT_60D + 1);
    const double re = s.real(kind::reynolds);
    out_slot<double> x(s);
    const int st = th_entry_length_hydro(method, re, x.ptr());
    if (settle("th_entry_length_hydro", st, o, x)) record("th_entry_length_hydro", o, x);
}

inline void call_th_entry_length_thermal(source &s, outcome &o) {
    const int method = s.choice(TH_ENTRY_TURBULENT_60D + 1);
    const double re = s.real(kind::reynolds);
    const double pr = s.real(kind::prandtl);
    const int wall = s.choice(2);
    out_slot<double> x(s);
    const int st = th_entry_length_thermal(method, re, pr, wall, x.ptr());
    if (settle("th_entry_length_thermal", st, o, x)) record("th_entry_length_thermal", o, x);
}

inline void call_th_entry_state(source &s, outcome &o) {
    const int method = s.choice(TH_ENTRY_TURBULENT_60D + 1);
    const double re = s.real(kind::reynolds);
    const double pr = s.real(kind::prandtl);
    const double x_over_d = s.real(kind::x_over_d);
    const int wall = s.choice(2);
    out_slot<th_entry_info> info(s);
    const int st = th_entry_state(method, re, pr, x_over_d, wall, info.ptr());
    if (settle("th_entry_state", st, o, info)) record("th_entry_state", o, info);
}

// ---- friction -----------------------------------------------------------------
inline void call_th_friction_factor(source &s, outcome &o) {
    const int method = s.choice(TH_F_METHOD_COUNT);
    const double re = s.real(kind::reynolds);
    const double rr = s.real(kind::roughness);
    out_slot<double> f(s);
    const int st = th_friction_factor(method, re, rr, f.ptr());
    if (!settle("th_friction_factor", st, o, f)) return;
    record("th_friction_factor", o, f);
    if (!f.is_null() && !(f.value() > 0.0)) violation("th_friction_factor", "friction factor not positive");
}

TH_ROB_SIMPLE(th_pressure_drop, kind::friction, kind::length, kind::diameter, kind::density, kind::velocity)

inline void call_th_pressure_drop_mass_flow(source &s, outcome &o) {
    const int method = s.choice(TH_F_METHOD_COUNT);
    static const kind k[] = {kind::mass_flow, kind::diameter, kind::length, kind::roughness,
                             kind::density, kind::viscosity};
    const reals<6> a(s, k);
    out_slot<double> f(s, /*optional=*/true);
    out_slot<double> dp(s);
    const int st = th_pressure_drop_mass_flow(method, a[0], a[1], a[2], a[3], a[4], a[5], f.ptr(),
                                              dp.ptr());
    if (!settle("th_pressure_drop_mass_flow", st, o, f, dp)) return;
    record("th_pressure_drop_mass_flow", o, f);
    record("th_pressure_drop_mass_flow", o, dp);
}

// Method-name lookups: arbitrary text in, and the id <-> name round trip.
// The friction and Nusselt pairs share these two checks.
using from_name_fn = int (*)(const char *, int *);
using name_of_fn = const char *(*)(int);

inline void check_method_from_name(source &s, outcome &o, const char *fname, from_name_fn from_name,
                                   int count) {
    const char *name = s.text();
    out_slot<int> m(s);
    const int st = from_name(name, m.ptr());
    if (!settle(fname, st, o, m) || m.is_null()) return;
    if (m.value() < 0 || m.value() >= count) violation(fname, "returned an unknown method id");
    o.add_int(m.value());
}

inline void check_method_name(source &s, outcome &o, const char *fname, name_of_fn name_of,
                              from_name_fn from_name, int count) {
    const int id = s.choice(count);
    const char *n = name_of(id);
    const bool known = id >= 0 && id < count;
    o.status = TH_OK;
    o.add_ptr(n);
    if (!known) {
        if (n != nullptr) violation(fname, "non-NULL for an unknown id");
        return;
    }
    check_text(fname, n, "NULL for a known id");
    int back = -1;
    if (from_name(n, &back) != TH_OK || back != id)
        violation(fname, "display name does not look up to the same id");
}

inline void call_th_friction_method_from_name(source &s, outcome &o) {
    check_method_from_name(s, o, "th_friction_method_from_name", th_friction_method_from_name,
                           TH_F_METHOD_COUNT);
}

inline void call_th_friction_method_name(source &s, outcome &o) {
    check_method_name(s, o, "th_friction_method_name", th_friction_method_name,
                      th_friction_method_from_name, TH_F_METHOD_COUNT);
}

// ---- Nusselt number -------------------------------------------------------------
inline void call_th_conditions_init(source &s, outcome &o) {
    out_slot<th_conditions> c(s);
    const int st = th_conditions_init(c.ptr());
    if (!settle("th_conditions_init", st, o, c) || c.is_null()) return;
    const th_conditions &v = c.value();
    for (double x : {v.re, v.pr, v.mu_ratio, v.rel_roughness, v.pr_wall, v.t_ratio, v.duct_ratio})
        record_real("th_conditions_init", o, x);
    if (!std::isinf(v.l_over_d)) violation("th_conditions_init", "l_over_d default is not INFINITY");
    for (int x : {v.averaging, v.wall, v.direction, v.entry, v.correction, v.length_factor, v.duct})
        o.add_int(x);
}

// Conditions with every field drawn from the source (after the defaults of
// th_conditions_init, so that unset padding is deterministic).
inline void draw_conditions(source &s, th_conditions &c) {
    std::memset(static_cast<void *>(&c), 0, sizeof c);
    if (th_conditions_init(&c) != TH_OK) violation("th_conditions_init", "failed on a valid pointer");
    c.re = s.real(kind::reynolds);
    c.pr = s.real(kind::prandtl);
    c.l_over_d = s.real(kind::x_over_d);
    c.averaging = s.choice(2);
    c.wall = s.choice(2);
    c.direction = s.choice(2);
    c.entry = s.choice(2);
    c.mu_ratio = s.real(kind::prop_ratio);
    c.rel_roughness = s.real(kind::roughness);
    c.correction = s.choice(3);
    c.pr_wall = s.real(kind::prandtl);
    c.t_ratio = s.real(kind::prop_ratio);
    c.length_factor = s.choice(2);
    c.duct = s.choice(4);
    c.duct_ratio = s.real(kind::ratio);
}

inline void call_th_nusselt(source &s, outcome &o) {
    const int method = s.choice(TH_NU_METHOD_COUNT);
    th_conditions c;
    draw_conditions(s, c);
    const snapshot<th_conditions> before(c);
    const bool null_conditions = s.null_pointer();
    out_slot<th_nusselt_result> r(s);
    if (method == TH_NU_COMBINED_ENTRY_NUMERIC && known_issue_combined_entry_pr(c.pr)) {
        o.status = skipped_known_issue;
        return;
    }
    const int st = th_nusselt(method, null_conditions ? nullptr : &c, r.ptr());
    before.check_const("th_nusselt");
    if (!settle("th_nusselt", st, o, r)) return;
    if (null_conditions) violation("th_nusselt", "success with NULL conditions");
    record("th_nusselt", o, st, method, r);
}

inline void call_th_nusselt_method_from_name(source &s, outcome &o) {
    check_method_from_name(s, o, "th_nusselt_method_from_name", th_nusselt_method_from_name,
                           TH_NU_METHOD_COUNT);
}

inline void call_th_nusselt_method_name(source &s, outcome &o) {
    check_method_name(s, o, "th_nusselt_method_name", th_nusselt_method_name,
                      th_nusselt_method_from_name, TH_NU_METHOD_COUNT);
}

// ---- the *_array functions ----------------------------------------------------
// Up to this many rows per call: enough to mix good and bad rows, few
// enough that every row can be re-run through the single-row function.
constexpr int max_array_rows = 6;

// A row count 0..max_array_rows (the arrays passed are that long; a count
// beyond a caller's arrays is a caller's bug, not an input to try).
inline int draw_row_count(source &s) {
    const int n = s.choice(max_array_rows + 1, 3);
    return n < 0 ? 0 : n > max_array_rows ? max_array_rows : n;
}

// An input array of n values of kind k, or NULL when the source asks.
struct array_in {
    double v[max_array_rows] = {};
    bool null = false;
    array_in(source &s, int n, kind k) : null(s.null_pointer()) {
        for (int i = 0; i < n; ++i) v[i] = s.real(k);
    }
    const double *ptr() const { return null ? nullptr : v; }
};

// Checks an *_array call against its rows: a bad call (unknown method, a
// NULL array) writes nothing; otherwise every row holds what the
// single-row function `one(i, &value)` gives (bit for bit, NaN for a failed
// row) and the return value is the first failed row's code, else
// TH_WARN_RANGE when any warned, else TH_OK.
template <class One>
void check_rows(const char *fn, int st, int n, bool bad_call, const out_slot<double[max_array_rows]> &values,
                const out_slot<int[max_array_rows]> &statuses, outcome &o, One &&one) {
    o.status = st;
    if (!status_is_defined(st)) violation(fn, "returned an undefined status code");
    if (bad_call || n == 0) {
        if (!values.untouched() || !statuses.untouched()) violation(fn, "wrote rows on a bad or empty call");
        if (n == 0 && !bad_call && st != TH_OK) violation(fn, "an empty call did not return TH_OK");
        if (bad_call && !TH_FAILED(st)) violation(fn, "success on a bad call");
        return;
    }
    int expected = TH_OK;
    for (int i = 0; i < n; ++i) {
        const int row_status = statuses.value()[i];
        const double value = values.value()[i];
        double single = 0.0;
        const int single_status = one(i, &single);
        if (row_status != single_status) violation(fn, "a row's status differs from the single-row call");
        if (TH_FAILED(row_status)) {
            if (!std::isnan(value)) violation(fn, "a failed row's value is not NaN");
            if (expected == TH_OK || expected == TH_WARN_RANGE) expected = row_status;
        } else {
            if (std::memcmp(&value, &single, sizeof value) != 0)
                violation(fn, "a row's value differs from the single-row call");
            record_real(fn, o, value);
            if (row_status == TH_WARN_RANGE && expected == TH_OK) expected = TH_WARN_RANGE;
        }
        o.add_int(row_status);
    }
    if (st != expected) violation(fn, "return value is not the first failed row / warning / TH_OK");
}

inline void call_th_friction_factor_array(source &s, outcome &o) {
    const int method = s.choice(TH_F_METHOD_COUNT);
    const int n = draw_row_count(s);
    const array_in re(s, n, kind::reynolds);
    const double rr = s.real(kind::roughness);
    out_slot<double[max_array_rows]> f(s);
    out_slot<int[max_array_rows]> status(s);
    const int st = th_friction_factor_array(method, static_cast<std::size_t>(n), re.ptr(), rr,
                                            f.is_null() ? nullptr : *f.ptr(),
                                            status.is_null() ? nullptr : *status.ptr());
    const bool bad_call = method < 0 || method >= TH_F_METHOD_COUNT ||
                          (n > 0 && (re.null || f.is_null() || status.is_null()));
    check_rows("th_friction_factor_array", st, n, bad_call, f, status, o,
               [&](int i, double *one) { return th_friction_factor(method, re.v[i], rr, one); });
}

inline void call_th_nusselt_array(source &s, outcome &o) {
    const int method = s.choice(TH_NU_METHOD_COUNT);
    const int n = draw_row_count(s);
    th_conditions shared;
    draw_conditions(s, shared);
    const snapshot<th_conditions> before(shared);
    const bool null_shared = s.null_pointer();
    const array_in re(s, n, kind::reynolds);
    const array_in pr(s, n, kind::prandtl);
    const array_in ld(s, n, kind::x_over_d);  // NULL: shared.l_over_d for every row
    out_slot<double[max_array_rows]> nu(s);
    out_slot<int[max_array_rows]> status(s);
    for (int i = 0; i < n; ++i)
        if (method == TH_NU_COMBINED_ENTRY_NUMERIC && known_issue_combined_entry_pr(pr.v[i])) {
            o.status = skipped_known_issue;
            return;
        }
    const int st = th_nusselt_array(method, null_shared ? nullptr : &shared,
                                    static_cast<std::size_t>(n), re.ptr(), pr.ptr(), ld.ptr(),
                                    nu.is_null() ? nullptr : *nu.ptr(),
                                    status.is_null() ? nullptr : *status.ptr());
    before.check_const("th_nusselt_array");
    const bool bad_call = method < 0 || method >= TH_NU_METHOD_COUNT || null_shared ||
                          (n > 0 && (re.null || pr.null || nu.is_null() || status.is_null()));
    check_rows("th_nusselt_array", st, n, bad_call, nu, status, o, [&](int i, double *one) {
        th_conditions c = shared;
        c.re = re.v[i];
        c.pr = pr.v[i];
        if (!ld.null) c.l_over_d = ld.v[i];
        th_nusselt_result r{};
        const int single = th_nusselt(method, &c, &r);
        *one = r.nu;
        return single;
    });
}

// ---- energy balance -------------------------------------------------------------
TH_ROB_SIMPLE(th_heat_rate, kind::mass_flow, kind::cp, kind::t_inlet, kind::t_target)
TH_ROB_SIMPLE(th_lmtd, kind::delta_t, kind::delta_t)
TH_ROB_SIMPLE(th_outlet_temperature_ua, kind::t_inlet, kind::t_surround, kind::conductance,
              kind::mass_flow, kind::cp)
TH_ROB_SIMPLE(th_ua_tube, kind::h_coef, kind::diameter, kind::outer_diameter, kind::conductivity,
              kind::h_coef, kind::fouling, kind::fouling, kind::length)
TH_ROB_SIMPLE(th_length_for_outlet_ua, kind::t_inlet, kind::t_target, kind::t_surround,
              kind::conductance, kind::mass_flow, kind::cp)
TH_ROB_SIMPLE(th_length_for_outlet_flux, kind::t_inlet, kind::t_target, kind::heat_flux,
              kind::perimeter, kind::mass_flow, kind::cp)

inline void call_th_outlet_temperature_flux(source &s, outcome &o) {
    static const kind k[] = {kind::t_inlet, kind::heat_flux, kind::perimeter, kind::length,
                             kind::mass_flow, kind::cp, kind::h_coef};
    const reals<7> a(s, k);
    out_slot<double> t_out(s);
    out_slot<double> t_wall(s, /*optional=*/true);
    const int st = th_outlet_temperature_flux(a[0], a[1], a[2], a[3], a[4], a[5], a[6], t_out.ptr(),
                                              t_wall.ptr());
    if (!settle("th_outlet_temperature_flux", st, o, t_out, t_wall)) return;
    record("th_outlet_temperature_flux", o, t_out);
    record("th_outlet_temperature_flux", o, t_wall);
}

// ---- properties -------------------------------------------------------------------
inline void call_th_water_props(source &s, outcome &o) {
    const double t = s.real(kind::t_water);
    const double p = s.real(kind::pressure);
    out_slot<th_fluid_props> out(s);
    const int st = th_water_props(t, p, out.ptr());
    if (settle("th_water_props", st, o, out)) record("th_water_props", o, st, out);
}

inline void call_th_air_props(source &s, outcome &o) {
    const double t = s.real(kind::t_air);
    const double p = s.real(kind::pressure);
    out_slot<th_fluid_props> out(s);
    if (known_issue_air_pressure(p)) {
        o.status = skipped_known_issue;
        return;
    }
    const int st = th_air_props(t, p, out.ptr());
    if (settle("th_air_props", st, o, out)) record("th_air_props", o, st, out);
}

TH_ROB_SIMPLE(th_water_density, kind::t_water, kind::pressure)
TH_ROB_SIMPLE(th_water_cp, kind::t_water, kind::pressure)
TH_ROB_SIMPLE(th_water_enthalpy, kind::t_water, kind::pressure)
TH_ROB_SIMPLE(th_water_viscosity, kind::t_water, kind::pressure)
TH_ROB_SIMPLE(th_water_conductivity, kind::t_water, kind::pressure)
TH_ROB_SIMPLE(th_water_prandtl, kind::t_water, kind::pressure)
TH_ROB_SIMPLE(th_water_saturation_pressure, kind::t_water)
TH_ROB_SIMPLE(th_water_saturation_temperature, kind::pressure)
TH_ROB_SIMPLE(th_air_density, kind::t_air, kind::pressure)
TH_ROB_SIMPLE(th_air_cp, kind::t_air, kind::pressure)
TH_ROB_SIMPLE(th_air_enthalpy, kind::t_air, kind::pressure)
TH_ROB_SIMPLE(th_air_viscosity, kind::t_air, kind::pressure)
TH_ROB_SIMPLE(th_air_conductivity, kind::t_air, kind::pressure)
TH_ROB_SIMPLE(th_air_prandtl, kind::t_air, kind::pressure)

// ---- laminar entry region and ducts ----------------------------------------------
inline void call_th_thermal_entry_nusselt(source &s, outcome &o) {
    const double xs = s.real(kind::x_star);
    const int wall = s.choice(2);
    const int averaging = s.choice(2);
    out_slot<double> nu(s);
    const int st = th_thermal_entry_nusselt(xs, wall, averaging, nu.ptr());
    if (!settle("th_thermal_entry_nusselt", st, o, nu)) return;
    record("th_thermal_entry_nusselt", o, nu);
    if (!nu.is_null() && !(nu.value() > 0.0)) violation("th_thermal_entry_nusselt", "Nu not positive");
}

inline void call_th_combined_entry_nusselt(source &s, outcome &o) {
    const double xs = s.real(kind::x_star);
    const double pr = s.real(kind::prandtl);
    const int wall = s.choice(2);
    const int averaging = s.choice(2);
    out_slot<double> nu(s);
    if (known_issue_combined_entry_pr(pr)) {
        o.status = skipped_known_issue;
        return;
    }
    const int st = th_combined_entry_nusselt(xs, pr, wall, averaging, nu.ptr());
    if (!settle("th_combined_entry_nusselt", st, o, nu)) return;
    record("th_combined_entry_nusselt", o, nu);
    if (!nu.is_null() && !(nu.value() > 0.0)) violation("th_combined_entry_nusselt", "Nu not positive");
}

inline void call_th_entry_march_study(source &s, outcome &o) {
    const int entry = s.choice(2, TH_ENTRY_COMBINED);
    const double xs = s.real(kind::x_star);
    const double pr = s.real(kind::prandtl);
    const int wall = s.choice(2);
    const int averaging = s.choice(2);
    const int cells = s.choice(5001, 40);
    const double growth = s.real(kind::growth);
    out_slot<double> nu(s);
    if (known_issue_combined_entry_pr(pr)) {
        o.status = skipped_known_issue;
        return;
    }
    // Work grows as cells / growth; 5000 cells at growth 0.02 is already
    // ~15 s under ASan. Each bound stays reachable on its own.
    if (cells >= 20 && growth > 0.0 && static_cast<double>(cells) / growth > 1e5) {
        o.status = skipped_expensive;
        return;
    }
    const int st = th_entry_march_study(entry, xs, pr, wall, averaging, cells, growth, nu.ptr());
    if (!settle("th_entry_march_study", st, o, nu)) return;
    record("th_entry_march_study", o, nu);
    if (!nu.is_null() && !(nu.value() > 0.0)) violation("th_entry_march_study", "Nu not positive");
}

inline void call_th_combined_entry_friction(source &s, outcome &o) {
    const double xp = s.real(kind::x_star);
    out_slot<double> fre(s);
    const int st = th_combined_entry_friction(xp, fre.ptr());
    if (!settle("th_combined_entry_friction", st, o, fre)) return;
    record("th_combined_entry_friction", o, fre);
    if (!fre.is_null() && !(fre.value() > 0.0)) violation("th_combined_entry_friction", "f Re not positive");
}

inline void call_th_graetz_eigen(source &s, outcome &o) {
    const int wall = s.choice(2);
    const int n = s.choice(1200);
    out_slot<double> lambda(s);
    out_slot<double> coef(s);
    const int st = th_graetz_eigen(wall, n, lambda.ptr(), coef.ptr());
    if (!settle("th_graetz_eigen", st, o, lambda, coef)) return;
    record("th_graetz_eigen", o, lambda);
    record("th_graetz_eigen", o, coef);
}

// Three optional outputs of which at least one must be given.
inline void check_three_optional(const char *fn, int st, const out_slot<double> &a,
                                 const out_slot<double> &b, const out_slot<double> &c) {
    if (!TH_FAILED(st) && a.is_null() && b.is_null() && c.is_null())
        violation(fn, "success with every output pointer NULL");
}

inline void call_th_duct_laminar(source &s, outcome &o) {
    const int shape = s.choice(4);
    const double ratio = s.real(kind::ratio);
    out_slot<double> f_re(s, true), nu_t(s, true), nu_h(s, true);
    const int st = th_duct_laminar(shape, ratio, f_re.ptr(), nu_t.ptr(), nu_h.ptr());
    check_three_optional("th_duct_laminar", st, f_re, nu_t, nu_h);
    if (!settle("th_duct_laminar", st, o, f_re, nu_t, nu_h)) return;
    record("th_duct_laminar", o, f_re);
    record("th_duct_laminar", o, nu_t);
    record("th_duct_laminar", o, nu_h);
}

inline void call_th_annulus_laminar(source &s, outcome &o) {
    const double ratio = s.real(kind::ratio);
    const int wall = s.choice(2);
    out_slot<double> f_re(s, true), nu_t(s, true), nu_h(s, true);
    const int st = th_annulus_laminar(ratio, wall, f_re.ptr(), nu_t.ptr(), nu_h.ptr());
    check_three_optional("th_annulus_laminar", st, f_re, nu_t, nu_h);
    if (!settle("th_annulus_laminar", st, o, f_re, nu_t, nu_h)) return;
    record("th_annulus_laminar", o, f_re);
    record("th_annulus_laminar", o, nu_t);
    record("th_annulus_laminar", o, nu_h);
}

// ---- whole-tube solve ---------------------------------------------------------------

// Fill a th_fluid: water, air or a user table (structured, i.e. increasing
// temperatures, or arbitrary).
inline void draw_fluid(source &s, th_fluid &f) {
    std::memset(static_cast<void *>(&f), 0, sizeof f);
    f.kind = s.choice(3, TH_FLUID_WATER);
    f.gas = s.choice(2);
    f.n = s.choice(TH_FLUID_TABLE_MAX + 1, 3);
    if (f.kind != TH_FLUID_USER) return;
    const bool increasing = s.choice(2) == 0;
    const int n = f.n < 0 ? 0 : f.n > TH_FLUID_TABLE_MAX ? TH_FLUID_TABLE_MAX : f.n;
    for (int i = 0; i < n; ++i) {
        if (increasing)
            f.t[i] = i == 0 ? s.real(kind::t_water) : f.t[i - 1] + s.real(kind::table_step);
        else
            f.t[i] = s.real(kind::temperature);
        f.rho[i] = s.real(kind::density);
        f.cp[i] = s.real(kind::cp);
        f.mu[i] = s.real(kind::viscosity);
        f.k[i] = s.real(kind::conductivity);
    }
}

// A complete case drawn from the source, starting from th_tube_case_init.
// Returns false when the case reproduces a known open issue (skip it;
// none at present).
inline bool draw_tube_case(source &s, th_tube_case &c) {
    std::memset(static_cast<void *>(&c), 0, sizeof c);
    if (th_tube_case_init(&c) != TH_OK) violation("th_tube_case_init", "failed on a valid pointer");
    draw_fluid(s, c.fluid);
    c.t_in = s.real(kind::t_water);
    c.p_in = s.real(kind::pressure);
    c.mdot = s.real(kind::mass_flow);
    c.geometry.shape = s.choice(4);
    c.geometry.d = s.real(kind::diameter);
    c.geometry.d_inner = s.real(kind::diameter);
    c.geometry.a = s.real(kind::diameter);
    c.geometry.b = s.real(kind::outer_diameter);
    c.geometry.length = s.real(kind::length);
    c.geometry.roughness = s.real(kind::roughness);
    c.wall.kind = s.choice(3);
    c.wall.t_wall = s.real(kind::t_surround);
    c.wall.q_flux = s.real(kind::heat_flux);
    c.wall.t_outside = s.real(kind::t_surround);
    c.wall.h_outside = s.real(kind::h_coef);
    c.wall.k_wall = s.real(kind::conductivity);
    c.wall.thickness = s.real(kind::thickness);
    c.wall.rf_inside = s.real(kind::fouling);
    c.wall.rf_outside = s.real(kind::fouling);
    c.options.method = s.choice(TH_NU_METHOD_COUNT);
    c.options.friction = s.choice(TH_F_METHOD_COUNT);
    c.options.entry = s.choice(2, TH_ENTRY_COMBINED);
    c.options.correction = s.choice(3, TH_TUBE_AUTO);
    c.options.nu_wall = s.choice(2, TH_TUBE_AUTO);
    c.options.length_factor = s.choice(2, 1);
    c.options.segments = s.choice(20);
    c.options.tolerance = s.real(kind::tolerance);
    c.options.max_iterations = s.choice(1001, 100);
    return true;
}

// The same for a call reporting in `o`: false, with the outcome marked as a
// skipped known issue, when the draw hit one.
inline bool draw_tube_case(source &s, th_tube_case &c, outcome &o) {
    if (draw_tube_case(s, c)) return true;
    o.status = skipped_known_issue;
    return false;
}

inline void record(const char *fn, outcome &o, int st, const th_tube_result &r) {
    for (double v : {r.t_out, r.q, r.h_mean, r.nu_mean, r.ua, r.ntu, r.t_wall_in, r.t_wall_out,
                     r.dp, r.dp_friction, r.t_bulk_mean, r.re, r.pr, r.f, r.velocity, r.cp_mean,
                     r.mu_ratio, r.l_over_d, r.x_fd_thermal_over_d, r.d_h, r.area, r.perimeter,
                     r.residual})
        record_real(fn, o, v);
    if (r.regime < TH_LAMINAR || r.regime > TH_TURBULENT) violation(fn, "result.regime out of range");
    if ((r.hydro_developed != 0 && r.hydro_developed != 1) ||
        (r.thermal_developed != 0 && r.thermal_developed != 1))
        violation(fn, "result.*_developed not 0/1");
    if (r.method <= TH_NU_AUTO || r.method >= TH_NU_METHOD_COUNT)
        violation(fn, "result.method is not a concrete method id");
    if (r.iterations < 0 || r.segments < 0) violation(fn, "negative iterations or segments");
    if (r.note_count < 0 || r.note_count > TH_TUBE_NOTES_MAX) violation(fn, "note_count out of range");
    if ((st == TH_OK) != (r.note_count == 0))
        violation(fn, "note_count zero/non-zero does not match TH_OK/TH_WARN_RANGE");
    check_text(fn, r.method_name, "result.method_name is NULL");
    check_text(fn, r.reason, "result.reason is NULL");
    for (int i = 0; i < TH_TUBE_NOTES_MAX; ++i) {
        check_text(fn, r.notes[i], "result.notes[i] is NULL");
        if ((i < r.note_count) == (r.notes[i][0] == '\0'))
            violation(fn, "notes[i] empty/non-empty does not match note_count");
        o.add_ptr(r.notes[i]);
    }
    for (int v : {r.regime, r.hydro_developed, r.thermal_developed, r.method, r.iterations,
                  r.segments, r.note_count})
        o.add_int(v);
    o.add_ptr(r.method_name);
    o.add_ptr(r.reason);
}

inline void record(const char *fn, outcome &o, int st, const out_slot<th_tube_result> &s) {
    if (!s.is_null()) record(fn, o, st, s.value());
}

inline void call_th_tube_case_init(source &s, outcome &o) {
    out_slot<th_tube_case> c(s);
    const int st = th_tube_case_init(c.ptr());
    if (!settle("th_tube_case_init", st, o, c) || c.is_null()) return;
    const th_tube_case &v = c.value();
    if (v.fluid.kind != TH_FLUID_UNSET || v.wall.kind != TH_TUBE_WALL_UNSET)
        violation("th_tube_case_init", "fluid or wall kind not UNSET");
    for (double x : {v.t_in, v.p_in, v.mdot, v.geometry.d, v.geometry.length, v.wall.t_wall,
                     v.wall.h_outside, v.options.tolerance})
        if (!std::isinf(x)) record_real("th_tube_case_init", o, x);
    o.add_int(v.options.max_iterations);
    o.add_int(v.options.segments);
}

// th_tube_case_set modifies *c in place: untouched on error; on success the
// kinds and shape are the ones given (sizes and value are only checked when
// solving, so they are copied as given). The case is then solved, which
// drives the solver through the flat-argument path.
inline void call_th_tube_case_set(source &s, outcome &o) {
    th_tube_case c;
    if (!draw_tube_case(s, c, o)) return;
    const int fluid = s.choice(3);
    const int shape = s.choice(4);
    const double size1 = s.real(kind::diameter);
    const double size2 = s.real(kind::outer_diameter);
    const int wall_kind = s.choice(3);
    const double value = s.real(kind::t_surround);
    const bool null_case = s.null_pointer();
    const snapshot<th_tube_case> before(c);
    const int st = th_tube_case_set(null_case ? nullptr : &c, fluid, shape, size1, size2, wall_kind,
                                    value);
    o.status = st;
    if (!status_is_defined(st)) violation("th_tube_case_set", "returned an undefined status code");
    if (TH_FAILED(st)) {
        if (!before.unchanged())
            violation("th_tube_case_set", "the case was modified although an error was returned");
        return;
    }
    if (null_case) violation("th_tube_case_set", "success with a NULL case");
    if (c.fluid.kind != fluid || c.geometry.shape != shape || c.wall.kind != wall_kind)
        violation("th_tube_case_set", "fluid kind, shape or wall kind not the ones given");
    o.add_int(c.fluid.kind);
    o.add_int(c.geometry.shape);
    o.add_int(c.wall.kind);
    out_slot<th_tube_result> r(s);
    const int solved = th_tube_solve(&c, r.ptr());
    o.add_int(solved);
    outcome solve_outcome;
    if (settle("th_tube_solve (after th_tube_case_set)", solved, solve_outcome, r))
        record("th_tube_solve (after th_tube_case_set)", o, solved, r);
}

inline void call_th_fluid_constant(source &s, outcome &o) {
    static const kind k[] = {kind::density, kind::cp, kind::viscosity, kind::conductivity};
    const reals<4> a(s, k);
    const int gas = s.choice(2);
    out_slot<th_fluid> f(s);
    const int st = th_fluid_constant(f.ptr(), a[0], a[1], a[2], a[3], gas);
    if (!settle("th_fluid_constant", st, o, f) || f.is_null()) return;
    const th_fluid &v = f.value();
    if (v.kind != TH_FLUID_USER || v.n != 1 || v.gas != gas)
        violation("th_fluid_constant", "not a one-point user fluid with the given gas flag");
    if (!(v.rho[0] == a[0] && v.cp[0] == a[1] && v.mu[0] == a[2] && v.k[0] == a[3]))
        violation("th_fluid_constant", "table point differs from the arguments");
    for (double x : {v.rho[0], v.cp[0], v.mu[0], v.k[0]}) record_real("th_fluid_constant", o, x);
}

inline void call_th_fluid_props_at(source &s, outcome &o) {
    th_fluid f;
    draw_fluid(s, f);
    const snapshot<th_fluid> before(f);
    const double t = s.real(kind::t_water);
    const double p = s.real(kind::pressure);
    const bool null_fluid = s.null_pointer();
    out_slot<th_fluid_props> out(s);
    if (f.kind == TH_FLUID_AIR && known_issue_air_pressure(p)) {
        o.status = skipped_known_issue;
        return;
    }
    const int st = th_fluid_props_at(null_fluid ? nullptr : &f, t, p, out.ptr());
    before.check_const("th_fluid_props_at");
    if (!settle("th_fluid_props_at", st, o, out)) return;
    if (null_fluid) violation("th_fluid_props_at", "success with a NULL fluid");
    record("th_fluid_props_at", o, st, out);
}

inline void call_th_tube_solve(source &s, outcome &o) {
    th_tube_case c;
    if (!draw_tube_case(s, c, o)) return;
    const snapshot<th_tube_case> before(c);
    const bool null_case = s.null_pointer();
    out_slot<th_tube_result> r(s);
    const int st = th_tube_solve(null_case ? nullptr : &c, r.ptr());
    before.check_const("th_tube_solve");
    if (!settle("th_tube_solve", st, o, r)) return;
    if (null_case) violation("th_tube_solve", "success with a NULL case");
    record("th_tube_solve", o, st, r);
}

// Output arrays of th_tube_profile: exactly n_points long when n_points is
// in the documented range (so that an overrun is an ASan report), otherwise
// a short array that must stay untouched.
class profile_array {
  public:
    profile_array(source &s, int n_points) : null_(s.null_pointer()) {
        n_ = (n_points >= 2 && n_points <= TH_TUBE_SEGMENTS_MAX + 1) ? n_points : 4;
        v_ = static_cast<double *>(std::malloc(sizeof(double) * static_cast<std::size_t>(n_)));
        if (!v_) violation("th_tube_profile harness", "out of memory");
        std::memset(v_, sentinel_byte, sizeof(double) * static_cast<std::size_t>(n_));
    }
    ~profile_array() { std::free(v_); }
    profile_array(const profile_array &) = delete;
    profile_array &operator=(const profile_array &) = delete;
    double *ptr() { return null_ ? nullptr : v_; }
    bool untouched() const {
        for (int i = 0; i < n_; ++i) {
            unsigned char fresh[sizeof(double)];
            std::memset(fresh, sentinel_byte, sizeof fresh);
            if (std::memcmp(&v_[i], fresh, sizeof fresh) != 0) return false;
        }
        return true;
    }
    bool required_but_null() const { return false; }
    void record_all(const char *fn, outcome &o) const {
        if (null_) return;
        for (int i = 0; i < n_; ++i) {
            if (!std::isfinite(v_[i])) violation(fn, "NaN or infinity in a profile array");
            if (i < 4) o.add_real(v_[i]);
        }
        o.add_real(v_[n_ - 1]);
    }

  private:
    double *v_;
    int n_;
    bool null_;
};

inline void call_th_tube_profile(source &s, outcome &o) {
    th_tube_case c;
    if (!draw_tube_case(s, c, o)) return;
    const snapshot<th_tube_case> before(c);
    const int n_points = s.choice(40, 11);
    const bool null_case = s.null_pointer();
    profile_array x(s, n_points), tb(s, n_points), tw(s, n_points), h(s, n_points);
    out_slot<th_tube_result> summary(s, true);
    const int st = th_tube_profile(null_case ? nullptr : &c, n_points, x.ptr(), tb.ptr(), tw.ptr(),
                                   h.ptr(), summary.ptr());
    before.check_const("th_tube_profile");
    if (!settle("th_tube_profile", st, o, x, tb, tw, h, summary)) return;
    if (null_case) violation("th_tube_profile", "success with a NULL case");
    if (n_points < 2 || n_points > TH_TUBE_SEGMENTS_MAX + 1)
        violation("th_tube_profile", "success with n_points outside 2..TH_TUBE_SEGMENTS_MAX+1");
    x.record_all("th_tube_profile", o);
    tb.record_all("th_tube_profile", o);
    tw.record_all("th_tube_profile", o);
    h.record_all("th_tube_profile", o);
    record("th_tube_profile", o, st, summary);
}

// The three inverse-design functions share one shape.
using tube_inverse_fn = int (*)(const th_tube_case *, double, double *, th_tube_result *);

inline void call_tube_inverse(const char *fn, tube_inverse_fn f, kind target_kind, source &s,
                              outcome &o) {
    th_tube_case c;
    if (!draw_tube_case(s, c, o)) return;
    const snapshot<th_tube_case> before(c);
    const double target = s.real(target_kind);
    const bool null_case = s.null_pointer();
    out_slot<double> answer(s);
    out_slot<th_tube_result> r(s, true);
    const int st = f(null_case ? nullptr : &c, target, answer.ptr(), r.ptr());
    before.check_const(fn);
    if (!settle(fn, st, o, answer, r)) return;
    if (null_case) violation(fn, "success with a NULL case");
    record(fn, o, answer);
    if (!answer.is_null() && !(answer.value() > 0.0)) violation(fn, "length or flow not positive");
    record(fn, o, st, r);
}

inline void call_th_tube_length_for_outlet(source &s, outcome &o) {
    call_tube_inverse("th_tube_length_for_outlet", &th_tube_length_for_outlet, kind::t_target, s, o);
}
inline void call_th_tube_flow_for_outlet(source &s, outcome &o) {
    call_tube_inverse("th_tube_flow_for_outlet", &th_tube_flow_for_outlet, kind::t_target, s, o);
}
inline void call_th_tube_flow_for_duty(source &s, outcome &o) {
    call_tube_inverse("th_tube_flow_for_duty", &th_tube_flow_for_duty, kind::heat_flux, s, o);
}

// A th_tube_result to feed th_tube_report / th_tube_result_value: either
// the answer of th_tube_solve for a drawn case, or one with every number
// drawn and a drawn note_count (out-of-range counts must not make the
// report read past notes[]). Text pointers are always valid static texts,
// as the header promises they are in any result the library wrote.
inline int draw_tube_result(source &s, th_tube_result &r) {
    std::memset(static_cast<void *>(&r), 0, sizeof r);
    if (s.choice(2) == 0) {
        th_tube_case c;
        const bool usable = draw_tube_case(s, c);
        const int st = usable ? th_tube_solve(&c, &r) : TH_ERR_INPUT;
        if (!TH_FAILED(st)) return st;
        std::memset(static_cast<void *>(&r), 0, sizeof r);
    }
    double *reals_in_order[] = {&r.t_out, &r.q, &r.h_mean, &r.nu_mean, &r.ua, &r.ntu,
                                &r.t_wall_in, &r.t_wall_out, &r.dp, &r.dp_friction,
                                &r.t_bulk_mean, &r.re, &r.pr, &r.f, &r.velocity, &r.cp_mean,
                                &r.mu_ratio, &r.l_over_d, &r.x_fd_thermal_over_d, &r.d_h,
                                &r.area, &r.perimeter, &r.residual};
    for (double *p : reals_in_order) *p = s.real(kind::any);
    r.regime = s.choice(3);
    r.hydro_developed = s.choice(2);
    r.thermal_developed = s.choice(2);
    r.method = s.choice(TH_NU_METHOD_COUNT, TH_NU_GNIELINSKI);
    r.method_name = "drawn method";
    r.reason = "drawn reason";
    r.iterations = s.choice(100, 7);
    r.segments = s.choice(20);
    r.note_count = s.choice(TH_TUBE_NOTES_MAX + 1);
    for (int i = 0; i < TH_TUBE_NOTES_MAX; ++i) r.notes[i] = i < r.note_count ? "drawn note" : "";
    return s.choice(TH_ERR_INTERNAL + 2, TH_OK);
}

inline void call_th_tube_report(source &s, outcome &o) {
    th_tube_result r;
    const int status = draw_tube_result(s, r);
    const snapshot<th_tube_result> before(r);
    const bool null_result = s.null_pointer();
    out_slot<th_tube_report_row[TH_TUBE_REPORT_ROWS]> rows(s);
    out_slot<int> n_rows(s);
    const int st = th_tube_report(null_result ? nullptr : &r, status, rows.ptr() ? *rows.ptr() : nullptr,
                                  n_rows.ptr());
    before.check_const("th_tube_report");
    if (!settle("th_tube_report", st, o, rows, n_rows)) return;
    if (null_result) violation("th_tube_report", "success with a NULL result");
    const int n = n_rows.value();
    if (n < 0 || n > TH_TUBE_REPORT_ROWS) violation("th_tube_report", "n_rows out of range");
    o.add_int(n);
    for (int i = 0; i < n; ++i) {
        const th_tube_report_row &row = rows.value()[i];
        check_text("th_tube_report", row.label, "row.label is NULL");
        check_text("th_tube_report", row.unit, "row.unit is NULL");
        check_text("th_tube_report", row.text, "row.text is NULL");
        if (row.is_text != 0 && row.is_text != 1) violation("th_tube_report", "row.is_text not 0/1");
        if (!row.is_text) record_real("th_tube_report", o, row.value);
        o.add_ptr(row.label);
        o.add_ptr(row.text);
    }
}

inline void call_th_tube_result_value(source &s, outcome &o) {
    th_tube_result r;
    draw_tube_result(s, r);
    const snapshot<th_tube_result> before(r);
    const int which = s.choice(TH_TUBE_OUT_COUNT);
    const bool null_result = s.null_pointer();
    out_slot<double> v(s);
    const int st = th_tube_result_value(null_result ? nullptr : &r, which, v.ptr());
    before.check_const("th_tube_result_value");
    if (!settle("th_tube_result_value", st, o, v)) return;
    if (null_result) violation("th_tube_result_value", "success with a NULL result");
    record("th_tube_result_value", o, v);
}

#undef TH_ROB_SIMPLE

// ---- the table ------------------------------------------------------------------
struct api_call {
    const char *name;
    void (*call)(source &, outcome &);
    // Calls that fill a lazily built cache; the TSan test runs them first so
    // that 8 threads race into the initialisation.
    bool has_cache;
};

#define TH_ROB_ROW(fn_) {#fn_, call_##fn_, false}
#define TH_ROB_CACHED_ROW(fn_) {#fn_, call_##fn_, true}
inline const api_call api_calls[] = {
    TH_ROB_ROW(th_version),
    TH_ROB_ROW(th_version_string),
    TH_ROB_ROW(th_status_message),
    TH_ROB_ROW(th_reynolds),
    TH_ROB_ROW(th_reynolds_mass_flow),
    TH_ROB_ROW(th_reynolds_mass_flow_duct),
    TH_ROB_ROW(th_prandtl),
    TH_ROB_ROW(th_peclet),
    TH_ROB_ROW(th_graetz),
    TH_ROB_ROW(th_inverse_graetz),
    TH_ROB_ROW(th_hydraulic_diameter),
    TH_ROB_ROW(th_hydraulic_diameter_rectangle),
    TH_ROB_ROW(th_hydraulic_diameter_annulus),
    TH_ROB_ROW(th_h_from_nusselt),
    TH_ROB_ROW(th_nusselt_from_h),
    TH_ROB_ROW(th_regime_of),
    TH_ROB_ROW(th_regime_name),
    TH_ROB_ROW(th_entry_length_hydro),
    TH_ROB_ROW(th_entry_length_thermal),
    TH_ROB_ROW(th_entry_state),
    TH_ROB_ROW(th_friction_factor),
    TH_ROB_ROW(th_friction_factor_array),
    TH_ROB_ROW(th_pressure_drop),
    TH_ROB_ROW(th_pressure_drop_mass_flow),
    TH_ROB_ROW(th_friction_method_from_name),
    TH_ROB_ROW(th_friction_method_name),
    TH_ROB_ROW(th_conditions_init),
    // th_nusselt reaches the exact thermal-entry series and the combined-
    // entry solver (both cached) when the library has them.
    TH_ROB_CACHED_ROW(th_nusselt),
    TH_ROB_CACHED_ROW(th_nusselt_array),
    TH_ROB_ROW(th_nusselt_method_from_name),
    TH_ROB_ROW(th_nusselt_method_name),
    TH_ROB_ROW(th_heat_rate),
    TH_ROB_ROW(th_lmtd),
    TH_ROB_ROW(th_outlet_temperature_ua),
    TH_ROB_ROW(th_outlet_temperature_flux),
    TH_ROB_ROW(th_ua_tube),
    TH_ROB_ROW(th_length_for_outlet_ua),
    TH_ROB_ROW(th_length_for_outlet_flux),
    TH_ROB_ROW(th_water_props),
    TH_ROB_ROW(th_water_density),
    TH_ROB_ROW(th_water_cp),
    TH_ROB_ROW(th_water_enthalpy),
    TH_ROB_ROW(th_water_viscosity),
    TH_ROB_ROW(th_water_conductivity),
    TH_ROB_ROW(th_water_prandtl),
    TH_ROB_ROW(th_water_saturation_pressure),
    TH_ROB_ROW(th_water_saturation_temperature),
    TH_ROB_ROW(th_air_props),
    TH_ROB_ROW(th_air_density),
    TH_ROB_ROW(th_air_cp),
    TH_ROB_ROW(th_air_enthalpy),
    TH_ROB_ROW(th_air_viscosity),
    TH_ROB_ROW(th_air_conductivity),
    TH_ROB_ROW(th_air_prandtl),
    // laminar entry region and ducts (the series table, the combined-entry
    // cache and the hydrodynamic-entry solution are built lazily)
    TH_ROB_CACHED_ROW(th_thermal_entry_nusselt),
    TH_ROB_CACHED_ROW(th_combined_entry_nusselt),
    TH_ROB_ROW(th_entry_march_study),
    TH_ROB_CACHED_ROW(th_combined_entry_friction),
    TH_ROB_CACHED_ROW(th_graetz_eigen),
    TH_ROB_ROW(th_duct_laminar),
    TH_ROB_ROW(th_annulus_laminar),
    // whole-tube solve
    TH_ROB_ROW(th_tube_case_init),
    TH_ROB_ROW(th_tube_case_set),
    TH_ROB_ROW(th_fluid_constant),
    TH_ROB_ROW(th_fluid_props_at),
    TH_ROB_CACHED_ROW(th_tube_solve),
    TH_ROB_ROW(th_tube_profile),
    TH_ROB_ROW(th_tube_length_for_outlet),
    TH_ROB_ROW(th_tube_flow_for_outlet),
    TH_ROB_ROW(th_tube_flow_for_duty),
    TH_ROB_ROW(th_tube_report),
    TH_ROB_ROW(th_tube_result_value),
};
#undef TH_ROB_ROW
#undef TH_ROB_CACHED_ROW

constexpr std::size_t api_call_count = sizeof api_calls / sizeof api_calls[0];

}  // namespace th_rob

#endif
