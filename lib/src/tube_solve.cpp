// tube_solve.cpp - C entry points of the whole-tube solution: case
// defaults, the one-shot or marching solve, the marched profile, and single
// values of a result. The solver itself is in tube_model.cpp.
#include "tube_internal.hpp"

#include <cmath>
#include <limits>

extern "C" {

int th_tube_case_init(th_tube_case *c) {
    return th::guard([&] {
        th::need_out(c);
        th_tube_case d{};
        d.fluid.kind = TH_FLUID_UNSET;
        d.fluid.gas = 0;
        d.fluid.n = 0;
        d.geometry.shape = TH_DUCT_CIRCLE;
        d.wall.kind = TH_TUBE_WALL_UNSET;
        d.wall.h_outside = std::numeric_limits<double>::infinity();
        d.options.method = TH_NU_AUTO;
        d.options.friction = TH_F_AUTO;
        d.options.entry = TH_ENTRY_COMBINED;
        d.options.correction = TH_TUBE_AUTO;
        d.options.nu_wall = TH_TUBE_AUTO;
        d.options.length_factor = 1;
        d.options.segments = 0;
        d.options.tolerance = 1e-9;
        d.options.max_iterations = 100;
        *c = d;
        return TH_OK;
    });
}

int th_tube_case_set(th_tube_case *c, int fluid, int shape, double size1, double size2,
                     int wall_kind, double value) {
    return th::guard([&] {
        th::need_out(c);
        th::need(fluid == TH_FLUID_WATER || fluid == TH_FLUID_AIR || fluid == TH_FLUID_USER);
        th::need(shape >= TH_DUCT_CIRCLE && shape <= TH_DUCT_ANNULUS);
        th::need(wall_kind == TH_TUBE_WALL_TEMPERATURE || wall_kind == TH_TUBE_WALL_FLUX ||
                 wall_kind == TH_TUBE_WALL_OUTSIDE);
        th_tube_case k = *c;
        k.fluid.kind = fluid;
        if (fluid == TH_FLUID_USER && k.fluid.n == 0) k.fluid.n = 1;
        k.geometry.shape = shape;
        switch (shape) {
        case TH_DUCT_CIRCLE:
            k.geometry.d = size1;
            break;
        case TH_DUCT_RECTANGLE:
        case TH_DUCT_PARALLEL_PLATES:
            k.geometry.a = size1;
            k.geometry.b = size2;
            break;
        default:  // annulus
            k.geometry.d = size1;
            k.geometry.d_inner = size2;
            break;
        }
        k.wall.kind = wall_kind;
        if (wall_kind == TH_TUBE_WALL_TEMPERATURE) k.wall.t_wall = value;
        if (wall_kind == TH_TUBE_WALL_FLUX) k.wall.q_flux = value;
        if (wall_kind == TH_TUBE_WALL_OUTSIDE) k.wall.t_outside = value;
        *c = k;
        return TH_OK;
    });
}

int th_tube_solve(const th_tube_case *c, th_tube_result *out) {
    return th::guard([&] {
        th::need_out(out);
        th::need(c != nullptr);
        const th::tube::model m(*c);
        int status = TH_OK;
        const th_tube_result r = th::tube::solve_tube(m, c->options.segments, nullptr, status);
        *out = r;
        return status;
    });
}

int th_tube_profile(const th_tube_case *c, int n_points, double *x, double *t_bulk,
                    double *t_wall, double *h, th_tube_result *summary) {
    return th::guard([&] {
        th::need(c != nullptr);
        th::need(n_points >= 2 && n_points <= TH_TUBE_SEGMENTS_MAX + 1);
        // Nothing to write is a caller mistake, not a request.
        th::need(x != nullptr || t_bulk != nullptr || t_wall != nullptr || h != nullptr ||
                 summary != nullptr);
        const th::tube::model m(*c);
        // Solve into scratch arrays first: the caller's arrays are written
        // only when the whole solution succeeded.
        const auto n = static_cast<std::size_t>(n_points);
        std::vector<double> sx(n), stb(n), stw(n), sh(n);
        th::tube::profile_out prof;
        prof.x = sx.data();
        prof.t_bulk = stb.data();
        prof.t_wall = t_wall != nullptr ? stw.data() : nullptr;
        prof.h = h != nullptr ? sh.data() : nullptr;
        int status = TH_OK;
        const th_tube_result r = th::tube::solve_tube(m, n_points - 1, &prof, status);
        for (std::size_t i = 0; i < n; ++i) {
            if (x != nullptr) x[i] = sx[i];
            if (t_bulk != nullptr) t_bulk[i] = stb[i];
            if (t_wall != nullptr) t_wall[i] = stw[i];
            if (h != nullptr) h[i] = sh[i];
        }
        if (summary != nullptr) *summary = r;
        return status;
    });
}

int th_tube_result_value(const th_tube_result *r, int which, double *value) {
    return th::guard([&] {
        th::need_out(value);
        th::need(r != nullptr);
        double v = 0.0;
        switch (which) {
        case TH_TUBE_OUT_T_OUT: v = r->t_out; break;
        case TH_TUBE_OUT_Q: v = r->q; break;
        case TH_TUBE_OUT_H: v = r->h_mean; break;
        case TH_TUBE_OUT_NU: v = r->nu_mean; break;
        case TH_TUBE_OUT_RE: v = r->re; break;
        case TH_TUBE_OUT_PR: v = r->pr; break;
        case TH_TUBE_OUT_REGIME: v = r->regime; break;
        case TH_TUBE_OUT_F: v = r->f; break;
        case TH_TUBE_OUT_DP: v = r->dp; break;
        case TH_TUBE_OUT_UA: v = r->ua; break;
        case TH_TUBE_OUT_NTU: v = r->ntu; break;
        case TH_TUBE_OUT_T_WALL_IN: v = r->t_wall_in; break;
        case TH_TUBE_OUT_T_WALL_OUT: v = r->t_wall_out; break;
        case TH_TUBE_OUT_METHOD: v = r->method; break;
        case TH_TUBE_OUT_ITERATIONS: v = r->iterations; break;
        default: th::fail(TH_ERR_INPUT);
        }
        *value = th::checked(v);
        return TH_OK;
    });
}

}  // extern "C"
