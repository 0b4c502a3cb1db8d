// tube_report.cpp - th_tube_report(): a solved tube as labelled rows
// (label, value, unit) that a spreadsheet shows as an array and an
// engineer checks line by line.
#include "tube_internal.hpp"

#include <cmath>

namespace {

class rows_writer {
  public:
    explicit rows_writer(th_tube_report_row *rows) : rows_(rows) {}
    void number(const char *label, double v, const char *unit) {
        th_tube_report_row &r = next();
        r.label = label;
        th::need(std::isfinite(v));  // a result handed in with NaN or inf is bad input
        r.value = v;
        r.unit = unit;
        r.is_text = 0;
        r.text = "";
    }
    void text(const char *label, const char *t) {
        th_tube_report_row &r = next();
        r.label = label;
        r.value = 0.0;
        r.unit = "text";
        r.is_text = 1;
        r.text = t != nullptr ? t : "";
    }
    int count() const { return n_; }

  private:
    th_tube_report_row &next() {
        if (n_ >= TH_TUBE_REPORT_ROWS) th::fail(TH_ERR_INTERNAL);
        return rows_[n_++];
    }
    th_tube_report_row *rows_;
    int n_ = 0;
};

const char *entry_text(const th_tube_result &r) {
    if (r.hydro_developed && r.thermal_developed) return "fully developed at the outlet";
    if (!r.hydro_developed && !r.thermal_developed)
        return "developing at the outlet (velocity and temperature)";
    return r.hydro_developed ? "thermally developing at the outlet"
                             : "hydrodynamically developing at the outlet";
}

}  // namespace

extern "C" {

int th_tube_report(const th_tube_result *r, int status,
                   th_tube_report_row rows[TH_TUBE_REPORT_ROWS], int *n_rows) {
    return th::guard([&] {
        th::need_out(n_rows);
        th::need(r != nullptr && rows != nullptr);
        // Only a written result (success or warning) has a report.
        th::need(status == TH_OK || status == TH_WARN_RANGE);
        th::need(r->note_count >= 0 && r->note_count <= TH_TUBE_NOTES_MAX);
        const char *regime = th_regime_name(r->regime);
        th::need(regime != nullptr);
        // Build into scratch rows: the caller's are written only on success.
        th_tube_report_row scratch[TH_TUBE_REPORT_ROWS] = {};
        rows_writer w(scratch);
        w.number("mean bulk temperature (t_in + t_out)/2", r->t_bulk_mean, "K");
        w.number("Reynolds number Re", r->re, "-");
        w.number("Prandtl number Pr", r->pr, "-");
        w.text("flow regime", regime);
        w.number("length over hydraulic diameter L/D_h", r->l_over_d, "-");
        w.text("entry state", entry_text(*r));
        w.number("thermal entry length x_fd,t/D_h", r->x_fd_thermal_over_d, "-");
        w.number("mean velocity", r->velocity, "m/s");
        w.number("Darcy friction factor f", r->f, "-");
        w.number("pressure drop p_in - p_out", r->dp, "Pa");
        w.number("friction part of the pressure drop", r->dp_friction, "Pa");
        w.text("Nusselt method", r->method_name);
        w.text("why this method", r->reason);
        w.number("mean Nusselt number Nu = h D_h/k", r->nu_mean, "-");
        w.number("mean inside coefficient h", r->h_mean, "W/(m2 K)");
        w.number("overall conductance UA", r->ua, "W/K");
        w.number("number of transfer units NTU = UA/(mdot cp)", r->ntu, "-");
        w.number("mean heat capacity cp = dh/dT", r->cp_mean, "J/(kg K)");
        w.number("outlet temperature", r->t_out, "K");
        w.number("heat rate into the fluid q", r->q, "W");
        w.number("wall temperature at the inlet", r->t_wall_in, "K");
        w.number("wall temperature at the outlet", r->t_wall_out, "K");
        w.number("viscosity ratio mu_bulk/mu_wall", r->mu_ratio, "-");
        w.number("hydraulic diameter D_h", r->d_h, "m");
        w.number("flow area", r->area, "m2");
        w.number("heated perimeter", r->perimeter, "m");
        w.number("segments marched (0 = one-shot)", r->segments, "-");
        w.number("iterations", r->iterations, "-");
        w.number("iteration residual", r->residual, "K");
        w.number("status code", status, "-");
        w.text("status", th_status_message(status));
        w.number("warnings", r->note_count, "-");
        for (int i = 0; i < r->note_count; ++i) w.text("warning", r->notes[i]);
        for (int i = 0; i < w.count(); ++i) rows[i] = scratch[i];
        *n_rows = w.count();
        return TH_OK;
    });
}

}  // extern "C"
