// tube_internal.hpp - the whole-tube solver behind th_tube_*(): the fluid
// model (water, air or the caller's table), the cross-section, the wall
// condition, the coefficient of a stretch of tube with its wall-temperature
// iteration, and the one-shot and marching solutions. Shared by
// tube_solve.cpp, tube_inverse.cpp and tube_report.cpp. Not installed.
//
// Everything here may throw th::status_error (and lets Boost.Math errors
// through); call it inside th::guard().
#ifndef TUBEHEAT_TUBE_INTERNAL_HPP
#define TUBEHEAT_TUBE_INTERNAL_HPP

#include "internal.hpp"

#include <array>
#include <vector>

namespace th {
namespace tube {

// Up to TH_TUBE_NOTES_MAX distinct static warning texts. Every evaluation
// collects its own notes; only the notes of the evaluations that make up
// the answer are passed on to the caller (a root search probes states that
// are not the answer, and their warnings would be misleading).
class note_list {
  public:
    void add(const char *s);
    void add(const range_check &rc) {
        if (!rc.ok()) add(rc.note());
    }
    void merge(const note_list &o);
    int count() const { return n_; }
    const char *at(int i) const { return v_[static_cast<std::size_t>(i)]; }
    bool empty() const { return n_ == 0; }

  private:
    std::array<const char *, TH_TUBE_NOTES_MAX> v_{};
    int n_ = 0;
};

// Properties at one temperature (the fluid's pressure fixed).
struct state {
    double rho = 0.0, cp = 0.0, mu = 0.0, k = 0.0, pr = 0.0;
};

// A validated th_fluid at a fixed pressure.
class fluid_model {
  public:
    fluid_model(const th_fluid &f, double p);
    // Bulk properties; outside the fluid's range: TH_ERR_STATE.
    state at(double t, note_list &notes) const;
    // Wall properties: like at(), but a wall temperature beyond the
    // formulation's range is evaluated at the nearest limit with a note
    // (e.g. water hotter than saturation: boiling likely).
    state wall_at(double t, note_list &notes) const;
    // Specific enthalpy [J/kg], differences only.
    double enthalpy(double t) const;
    // Mean heat capacity (h(tb) - h(ta))/(tb - ta); cp at the midpoint when
    // the two are within 1e-3 K (where the difference loses digits and the
    // midpoint value is exact to ~1e-12 relative).
    double cp_between(double ta, double tb) const;
    // Temperatures the bulk may have (water: up to saturation at p).
    double t_lowest() const { return t_lo_; }
    double t_highest() const { return t_hi_; }
    bool gas() const { return gas_; }
    // A user fluid with constant properties.
    bool constant() const { return kind_ == TH_FLUID_USER && n_ == 1; }

  private:
    state table_at(double t, bool &extrapolated) const;
    th_fluid f_;
    double p_;
    int kind_;
    int n_;
    bool gas_;
    double t_lo_, t_hi_;
    std::array<double, TH_FLUID_TABLE_MAX> h_node_{};  // user: h at t[i]
};

// Validates a th_fluid (kind, table) without a pressure.
void validate_fluid(const th_fluid &f);

// Derived cross-section and wall data.
struct section {
    int shape = TH_DUCT_CIRCLE;
    double d_h = 0.0;        // hydraulic diameter [m]
    double area = 0.0;       // flow area [m2]
    double perimeter = 0.0;  // heated perimeter [m]
    double duct_ratio = 1.0; // for th_conditions
    double length = 0.0;     // [m]
    double rel_roughness = 0.0;
};
section make_section(const th_tube_geometry &g, note_list &notes);

// The wall condition in a form the solver uses.
struct wall_model {
    int kind = TH_TUBE_WALL_TEMPERATURE;
    double t_limit = 0.0;  // wall or outside temperature (not for a flux)
    double q_flux = 0.0;   // flux [W/m2]
    double r_rest = 0.0;   // outside: resistance beyond the inside film per
                           // unit heated inner area [m2 K/W]
    // Overall coefficient per heated inner area for an inside coefficient h.
    double u_of(double h) const { return kind == TH_TUBE_WALL_OUTSIDE ? 1.0 / (1.0 / h + r_rest) : h; }
    // Inner-surface temperature for bulk t_b and inside coefficient h.
    double surface(double t_b, double h) const;
};
wall_model make_wall(const th_tube_wall &w, const section &s);

// Everything fixed for one case.
struct model {
    th_tube_case c;
    note_list setup_notes;  // notes about the case itself (before sec: filled
                            // while sec is built)
    fluid_model fluid;
    section sec;
    wall_model wall;
    int method, friction, entry, correction, nu_wall, length_factor;
    double tol;
    int max_iter;
    int direction;     // TH_HEATING / TH_COOLING
    explicit model(const th_tube_case &tc);
};

// Coefficient of the stretch x_a..x_b (x_a = 0: the mean over 0..x_b) or
// the local value at x_b (local = true), at bulk temperature t_b, with the
// wall temperature iterated for the property corrections.
struct coefficient {
    state bulk;
    double re = 0.0, pr = 0.0;
    double h = 0.0;          // [W/(m2 K)]
    double nu = 0.0;         // h D_h / k
    double t_wall = 0.0;     // inner surface [K]
    double mu_ratio = 1.0;
    th_nusselt_result nu_info{};
    int wall_iterations = 0;
    note_list notes;
};
coefficient coefficient_over(const model &m, double t_b, double x_a, double x_b);
coefficient coefficient_local(const model &m, double t_b, double x);

// One stretch solved: the outlet of x_a..x_b from its inlet t_a.
struct stretch {
    double t_out = 0.0;
    double cp_mean = 0.0;
    double u = 0.0;          // overall coefficient per heated area
    coefficient coef;        // at the stretch's mean bulk temperature
    int evaluations = 0;
    double residual = 0.0;   // |G(t_out) - t_out| [K]
};
stretch solve_stretch(const model &m, double t_a, double x_a, double x_b);

// Whole tube. When profile arrays are given (n_nodes entries each, equal
// segments n_nodes - 1), they are filled; segments = 0 is the one-shot.
struct profile_out {
    double *x = nullptr, *t_bulk = nullptr, *t_wall = nullptr, *h = nullptr;
};
th_tube_result solve_tube(const model &m, int segments, const profile_out *prof,
                          int &status);

}  // namespace tube
}  // namespace th

#endif
