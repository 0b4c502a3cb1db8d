// adapters.cpp - hand-written adapters for catalogue entries whose shape the
// generic dispatch cannot express (`adapter = "..."` in the catalogue). Each
// receives the already converted and checked arguments in catalogue order.
#include "runtime.hpp"

#include <string>

namespace th_addin {

namespace {
uno::Any text(const char *s) { return uno::Any(OUString::createFromAscii(s)); }

uno::Sequence<uno::Any> row(const char *label, const uno::Any &value) {
    uno::Sequence<uno::Any> r(2);
    r.getArray()[0] = text(label);
    r.getArray()[1] = value;
    return r;
}
// th_entry_state and the regime's name; nullptr (with o.status set) when
// either fails.
const char *entry_state(Outcome &o, double re, double pr, double x_over_d, int wall,
                        int method, th_entry_info &info) {
    o.status = th_entry_state(method, re, pr, x_over_d, wall, &info);
    if (TH_FAILED(o.status)) return nullptr;
    const char *regime = th_regime_name(info.regime);
    if (regime == nullptr) o.status = TH_ERR_INTERNAL;
    return regime;
}
}  // namespace

// TH.ENTRY.STATE: one text for th_entry_state, e.g. "laminar, thermally
// developing".
void adapter_entry_state_text(Outcome &o, double re, double pr, double xOverD,
                              int wall, int method) {
    th_entry_info info{};
    const char *regime = entry_state(o, re, pr, xOverD, wall, method, info);
    if (regime == nullptr) return;
    const char *state =
        info.hydro_developed && info.thermal_developed ? "fully developed"
        : !info.hydro_developed && !info.thermal_developed
            ? "developing (velocity and temperature)"
        : info.hydro_developed ? "thermally developing"
                               : "hydrodynamically developing";
    o.text_owned = std::string(regime) + ", " + state;
}

// TH.ENTRY.STATE.TABLE: every field of th_entry_info as label/value rows.
void adapter_entry_state_table(Outcome &o, double re, double pr, double xOverD,
                               int wall, int method) {
    th_entry_info info{};
    const char *regime = entry_state(o, re, pr, xOverD, wall, method, info);
    if (regime == nullptr) return;
    uno::Sequence<uno::Sequence<uno::Any>> t(6);
    auto *rows = t.getArray();
    rows[0] = row("regime", text(regime));
    rows[1] = row("velocity developed", text(info.hydro_developed ? "yes" : "no"));
    rows[2] = row("temperature developed",
                  text(info.thermal_developed ? "yes" : "no"));
    rows[3] = row("x_fd,h / D", uno::Any(info.x_fd_hydro_over_d));
    rows[4] = row("x_fd,t / D", uno::Any(info.x_fd_thermal_over_d));
    rows[5] = row("x* = x/(D Re Pr)", uno::Any(info.x_star));
    o.array = t;
}

}  // namespace th_addin
