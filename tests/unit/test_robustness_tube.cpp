// Regression tests for defects the fuzzer (tests/fuzz/) found in the
// whole-tube solver. Expected behaviour: the output contract of
// lib/include/tubeheat.h and the notes the solver documents.
#include "th_test.hpp"

#include <cstring>

// Found by the fuzzer (fixed by the solver's owner while this test was
// written, tube_internal.hpp): model::model() passed the member
// setup_notes to make_section() while initialising the member sec, which
// was declared before setup_notes; the parallel-plates note was added to a
// note_list whose constructor had not run yet (AddressSanitizer: SEGV in
// note_list::add reading a garbage pointer) and then wiped when
// setup_notes was constructed. Expected: the case solves with
// TH_WARN_RANGE and carries the note.
// Source: tube_model.cpp note for plates narrower than 10 spacings and the
// tubeheat.h rule "TH_WARN_RANGE ... (every note in the result's notes[])".
// Scenario: invented test data.
TEST_CASE("robustness: narrow parallel plates", "[robustness][tube]") {
    th_tube_case c;
    REQUIRE(th_tube_case_init(&c) == TH_OK);
    c.fluid.kind = TH_FLUID_WATER;
    c.t_in = 300.0;
    c.p_in = 2e5;
    c.mdot = 0.2;  // Re ~ 2e4: turbulent, so no laminar duct table is needed
    c.geometry.shape = TH_DUCT_PARALLEL_PLATES;
    c.geometry.a = 0.004;  // spacing
    c.geometry.b = 0.02;   // width: only 5 spacings
    c.geometry.length = 1.0;
    c.wall.kind = TH_TUBE_WALL_TEMPERATURE;
    c.wall.t_wall = 320.0;
    th_tube_result r;
    const int st = th_tube_solve(&c, &r);
    REQUIRE(st == TH_WARN_RANGE);
    bool noted = false;
    for (int i = 0; i < r.note_count && i < TH_TUBE_NOTES_MAX; ++i)
        noted = noted || std::strstr(r.notes[i], "parallel plates") != nullptr;
    CHECK(noted);
}
