// laminar_entry_march.cpp - the combined (simultaneously developing) laminar
// entry of a circular tube, computed by marching the axisymmetric
// boundary-layer ("parabolic") equations down the tube with an implicit
// finite-volume scheme in the manner of Patankar & Spalding (1970).
//
// Equations (eta = r/r0, X = x+ = x/(D Re), U = u/u_m, V = 2 v D/nu,
// P = p/(rho u_m^2)):
//   continuity   d(eta U)/dX + d(eta V)/deta = 0
//   momentum     U dU/dX + V dU/deta = -dP/dX + 4 (1/eta) d(eta dU/deta)/deta
//   energy       U dt/dX + V dt/deta = (4/Pr) (1/eta) d(eta dt/deta)/deta
// with x* = X/Pr. Inlet: U = 1 and uniform temperature. Wall: U = V = 0 and
// either a uniform temperature (T) or a uniform heat flux (H). Axial
// diffusion and the radial pressure gradient are neglected (the
// boundary-layer approximation; it fails within about one diameter of the
// inlet at low Re, and for low Peclet numbers).
// Fully developed check: U -> 2 (1 - eta^2), dP/dX -> -32 (Darcy f Re = 64).
//
// Temperature variables:
//   T: phi = (T - T_w)/(T_in - T_w), 1 at the inlet, 0 at the wall (it
//      decays to 0, so the ratios below keep their precision far down the
//      tube); Nu_x = -2 (dphi/deta)_w / phi_b,  Nu_m = -ln(phi_b)/(4 x*)
//   H: phi = (T - T_in) k/(q'' D), (dphi/deta)_w = 1/2, phi_b = 4 x*;
//      Nu_x = 1/(phi_w - phi_b),  Nu_m = (1/x*) int_0^x* Nu_x dx*
// (the same mean definitions as the exact thermal-entry series).
//
// Scheme:
//  - radial grid of `cells` finite volumes, faces clustered at the wall by
//    a sinh stretching (first cell ~ 1.5e-4 r0 at 200 cells);
//  - axial steps growing geometrically in X (X_{n+1} = (1 + growth) X_n)
//    from a tiny first step, so every decade of x+ and x* gets the same
//    number of steps;
//  - second-order backward differences (variable-step BDF2) in X, the
//    first step backward Euler;
//  - Patankar's power-law scheme for the radial convection and diffusion,
//    written in the conservative form so that the discrete bulk energy
//    balance is exact (the mean Nusselt number for T follows from it);
//  - the pressure gradient from the mass-flow constraint at each step: the
//    momentum equation is linear in dP/dX for given coefficients, so two
//    tridiagonal solves give U = U_a - dP/dX U_b, and sum vol U = 1/2 fixes
//    dP/dX;
//  - a linear predictor of the new velocity, then up to three Picard passes
//    on the convective coefficients (V from continuity); fully converged
//    passes change the results by ~1e-4 (docs/laminar-entry.md);
//  - wall faces use the exact conduction conductance of a cylindrical
//    shell, eta dphi/deta = (phi_w - phi_P)/ln(1/eta_P).
// Once the velocity stops changing (X ~ 1.5) it is frozen at its discrete
// fully developed profile and only the energy equation is marched; where
// the steps get long against the thermal decay (x* step > 0.02) the energy
// equation uses backward Euler (see step()).
// Tables run from x* = 1e-7 (the march starts 1e4 times earlier) to
// x* = 2 or to x+ = 4, whichever is later.
//
// Cost and caching: one march for one (Pr, wall) takes ~15-25 ms at the
// default resolution (200 cells, 2 % growth: ~1400 steps). Results are kept as tables of (ln x*, Nu_x, Nu_m) and
// interpolated (PCHIP in ln x*); the tables live in a small LRU cache
// (16 entries) keyed by (Pr, wall) and protected by a mutex: the only mutable
// shared state of this file. The pure-hydrodynamic (f_app Re) table is a
// function-local static (computed once).
#include "entry_internal.hpp"
#include "internal.hpp"

#include <boost/math/interpolators/pchip.hpp>

#include <algorithm>
#include <cmath>
#include <cstring>
#include <list>
#include <memory>
#include <mutex>
#include <utility>
#include <vector>

namespace th {
namespace entry {
namespace {

using pchip = boost::math::interpolators::pchip<std::vector<double>>;

constexpr double x_star_first_record = 1e-7;  // tables start here (x*)
// Prandtl numbers the march can represent (the step count grows like
// ln(Pr) at both ends); outside: TH_ERR_INPUT.
constexpr double pr_computable_min = 1e-6;
constexpr double pr_computable_max = 1e9;
constexpr double x_star_last = 2.0;    // thermal fully developed beyond (x*)
constexpr double x_plus_first = 1e-8;  // friction table start (x+)
constexpr double x_plus_last = 4.0;    // hydrodynamically developed beyond

// Power-law scheme weight A(|Pe|) (Patankar 1980).
double power_law(double pe) {
    const double t = 1.0 - 0.1 * std::fabs(pe);
    return t > 0.0 ? t * t * t * t * t : 0.0;
}

struct grid {
    int n = 0;
    std::vector<double> face;  // n + 1 faces, face[0] = 0 (axis), face[n] = 1
    std::vector<double> node;  // n cell centres
    std::vector<double> vol;   // int eta deta over the cell
    double wall_log = 0;       // ln(1/node[n-1])
};

grid make_grid(int cells) {
    grid g;
    g.n = cells;
    // Wall clustering: distance from the wall y = sinh(b (1 - i/n)) / sinh(b).
    const double b = 6.0;
    g.face.resize(static_cast<std::size_t>(cells) + 1);
    for (int i = 0; i <= cells; ++i) {
        const double s = 1.0 - static_cast<double>(i) / cells;
        g.face[static_cast<std::size_t>(i)] = 1.0 - std::sinh(b * s) / std::sinh(b);
    }
    g.face[0] = 0.0;
    g.face[static_cast<std::size_t>(cells)] = 1.0;
    g.node.resize(static_cast<std::size_t>(cells));
    g.vol.resize(static_cast<std::size_t>(cells));
    for (std::size_t j = 0; j < static_cast<std::size_t>(cells); ++j) {
        g.node[j] = 0.5 * (g.face[j] + g.face[j + 1]);
        g.vol[j] = 0.5 * (g.face[j + 1] * g.face[j + 1] - g.face[j] * g.face[j]);
    }
    g.wall_log = std::log(1.0 / g.node.back());
    return g;
}

constexpr int default_picard = 3;

// Thomas algorithm for a_p x_j = a_n x_{j+1} + a_s x_{j-1} + b_j, for one
// or two right-hand sides sharing the matrix (b2/x2 may be null).
void tridiag(const std::vector<double> &ap, const std::vector<double> &an,
             const std::vector<double> &as, const std::vector<double> &b,
             std::vector<double> &x, std::vector<double> &work_p,
             std::vector<double> &work_q, const std::vector<double> *b2 = nullptr,
             std::vector<double> *x2 = nullptr, std::vector<double> *work_q2 = nullptr) {
    const std::size_t n = ap.size();
    double p_prev = 0.0, q_prev = 0.0, q2_prev = 0.0;
    for (std::size_t j = 0; j < n; ++j) {
        const double inv = 1.0 / (ap[j] - as[j] * p_prev);
        p_prev = work_p[j] = an[j] * inv;
        q_prev = work_q[j] = (b[j] + as[j] * q_prev) * inv;
        if (b2) q2_prev = (*work_q2)[j] = ((*b2)[j] + as[j] * q2_prev) * inv;
    }
    double next = 0.0, next2 = 0.0;
    for (std::size_t j = n; j-- > 0;) {
        next = x[j] = work_p[j] * next + work_q[j];
        if (b2) next2 = (*x2)[j] = work_p[j] * next2 + (*work_q2)[j];
    }
}

// One marching problem: the velocity field and (optionally) one
// temperature field. All work arrays are allocated once.
class marcher {
  public:
    // developed_flow: start from the fully developed (parabolic) velocity,
    // frozen, instead of a uniform one: the thermal entry problem, used to
    // check the energy solver against the exact series.
    marcher(int cells, double pr, int wall, bool with_energy, bool developed_flow = false,
            int picard = default_picard)
        : g_(make_grid(cells)), pr_(pr), wall_(wall), energy_(with_energy), picard_(picard) {
        const std::size_t n = static_cast<std::size_t>(cells);
        u_.assign(n, 1.0);
        if (developed_flow) {
            // Cell averages of 2 (1 - eta^2), which carry exactly the mass
            // flow sum vol U = 1/2.
            for (std::size_t j = 0; j < n; ++j) {
                const double a = g_.face[j], b = g_.face[j + 1];
                const double m = (b * b - a * a) / 2.0 - (b * b * b * b - a * a * a * a) / 4.0;
                u_[j] = 2.0 * m / g_.vol[j];
            }
            frozen_ = true;
            dpdx_frozen_ = -32.0;
        }
        u_old_ = u_;
        un_ = u_;
        ut_ = u_;
        t_.assign(n, wall == TH_WALL_T ? 1.0 : 0.0);
        t_old_ = t_;
        tn_ = t_;
        f_.assign(n + 1, 0.0);
        // Face conductances per unit diffusivity: eta_f / (distance between
        // the nodes either side); the wall face uses the shell conductance.
        cond_.assign(n + 1, 0.0);
        for (std::size_t j = 1; j < n; ++j) cond_[j] = g_.face[j] / (g_.node[j] - g_.node[j - 1]);
        cond_[n] = 1.0 / g_.wall_log;
        for (auto *v : {&ap_, &an_, &as_, &b_, &ua_, &ub_, &wp_, &wq_, &wq2_}) v->assign(n, 0.0);
    }

    // Advance from x_ to x_ + h (BDF1 for the first step, BDF2 after).
    void step(double h) {
        const std::size_t n = u_.size();
        // BDF coefficients: y' ~ (a0 y_new + a1 y_old + a2 y_old2)/h.
        double a0 = 1.0, a1 = -1.0, a2 = 0.0;
        if (steps_ > 0) {
            const double w = h / h_prev_;
            a0 = (1.0 + 2.0 * w) / (1.0 + w);
            a1 = -(1.0 + w);
            a2 = w * w / (1.0 + w);
        }
        if (!frozen_) {
            // Predictor: linear extrapolation of the last two levels, then a
            // fixed number of Picard passes on the convective coefficients.
            // The predictor is already second-order accurate; each pass
            // shrinks its error further (the convergence study in
            // docs/laminar-entry.md includes fully converged passes).
            const double w = steps_ > 0 ? h / h_prev_ : 0.0;
            for (std::size_t j = 0; j < n; ++j) un_[j] = u_[j] + w * (u_[j] - u_old_[j]);
            for (int it = 0; it < picard_; ++it) {
                fluxes(un_, a0, a1, a2, h);
                solve_momentum(a1, a2, h);
                double change = 0.0;
                for (std::size_t j = 0; j < n; ++j) change = std::max(change, std::fabs(ut_[j] - un_[j]));
                un_.swap(ut_);
                ++iterations_;
                if (change < 1e-11) break;
            }
            fluxes(un_, a0, a1, a2, h);
        } else {
            un_ = u_;
            std::fill(f_.begin(), f_.end(), 0.0);
            dpdx_ = dpdx_frozen_;
        }
        if (energy_) {
            // Far down the tube the fully developed T mode decays by
            // exp(-4 Nu h/Pr) per step; once that exceeds ~25 % per step
            // (h/Pr > 0.02) BDF2 would turn it oscillatory (its roots go
            // complex above 0.5), so the energy equation switches to backward
            // Euler, which keeps the decaying mode positive and its shape
            // exact. The transient is long gone there (x* > 1 at the default
            // growth), and Nu depends only on the shape.
            if (h / pr_ > 0.02) {
                fluxes(un_, 1.0, -1.0, 0.0, h);
                solve_energy(-1.0, 0.0, h);
            } else {
                solve_energy(a1, a2, h);
            }
        }

        // Pressure: trapezoidal rule in X.
        p_ += h * (steps_ > 0 ? 0.5 * (dpdx_ + dpdx_prev_) : dpdx_);
        dpdx_prev_ = dpdx_;

        if (!frozen_) {
            double change = 0.0;
            for (std::size_t j = 0; j < n; ++j) change = std::max(change, std::fabs(un_[j] - u_[j]));
            if (steps_ > 2 && change < 1e-13 && x_ > 0.5) {
                frozen_ = true;
                dpdx_frozen_ = dpdx_;
            }
        }
        // Rotate the levels: old <- current <- new.
        u_old_.swap(u_);
        u_.swap(un_);
        if (energy_) {
            t_old_.swap(t_);
            t_.swap(tn_);
            // T: the problem is homogeneous in phi, which decays like
            // exp(-14.6 x*); at low Pr the table runs to x* ~ 1/Pr, so rescale
            // both stored levels before they underflow (Nu is a ratio and the
            // mean comes from the running integral of Nu, so nothing else
            // depends on the scale).
            const double tb = bulk();
            if (wall_ == TH_WALL_T && tb > 0.0 && tb < 1e-150) {
                for (std::size_t j = 0; j < n; ++j) {
                    t_[j] *= 1e150;
                    t_old_[j] *= 1e150;
                }
            }
        }
        h_prev_ = h;
        x_ += h;
        ++steps_;
    }

    double x() const { return x_; }
    double pressure_drop() const { return -p_; }  // (p_in - p)/(rho u_m^2)
    bool frozen() const { return frozen_; }

    // Bulk (mixing-cup) temperature variable: 2 sum vol U phi.
    double bulk() const {
        double s = 0.0;
        for (std::size_t j = 0; j < u_.size(); ++j) s += g_.vol[j] * u_[j] * t_[j];
        return 2.0 * s;
    }
    // Local Nusselt number at the current station.
    double nu_local() const {
        const double tb = bulk();
        if (wall_ == TH_WALL_T) {
            // -eta dphi/deta at the wall from the exact shell conductance.
            const double grad = t_.back() / g_.wall_log;
            return 2.0 * grad / tb;
        }
        const double tw = t_.back() + 0.5 * g_.wall_log;
        return 1.0 / (tw - tb);
    }
    double centreline_velocity() const { return u_.front(); }
    long iterations() const { return iterations_; }

  private:
    // Radial mass fluxes F (= eta V at the faces) from discrete continuity
    // with the trial velocity u_trial at the new level.
    void fluxes(const std::vector<double> &u_trial, double a0, double a1, double a2,
                double h) {
        const std::size_t n = u_trial.size();
        f_[0] = 0.0;
        for (std::size_t j = 0; j < n; ++j) {
            const double dm = g_.vol[j] * (a0 * u_trial[j] + a1 * u_[j] + a2 * u_old_[j]) / h;
            f_[j + 1] = f_[j] - dm;
        }
        // The mass constraint makes the last flux zero; remove round-off.
        f_[n] = 0.0;
    }

    // Coefficients of the transport equation for diffusivity gam (face
    // fluxes by the power-law scheme, BDF2 in X, conservative form less
    // phi_P times continuity). Writes ap, an, as and the old-level part of b.
    void assemble(double gam, const std::vector<double> &old1,
                  const std::vector<double> &old2, double a1, double a2, double h) {
        const std::size_t n = u_.size();
        double as_face = 0.0;  // west-face neighbour weight of cell j
        for (std::size_t j = 0; j < n; ++j) {
            double an = 0.0, an_next_as = 0.0;
            if (j + 1 < n) {
                const double d = gam * cond_[j + 1];
                const double fe = f_[j + 1];
                const double a = d * power_law(fe / d);
                an = a + std::max(-fe, 0.0);
                an_next_as = a + std::max(fe, 0.0);
            }
            const double m1 = g_.vol[j] * u_[j], m2 = g_.vol[j] * u_old_[j];
            const double c0 = -(a1 * m1 + a2 * m2) / h;
            an_[j] = an;
            as_[j] = as_face;
            ap_[j] = an + as_face + c0;
            b_[j] = -(a1 * m1 * old1[j] + a2 * m2 * old2[j]) / h;
            as_face = an_next_as;
        }
    }

    void solve_momentum(double a1, double a2, double h) {
        const std::size_t n = u_.size();
        assemble(4.0, u_, u_old_, a1, a2, h);
        ap_[n - 1] += 4.0 * cond_[n];  // wall: U = 0
        // U = U_a - dP/dX U_b: the same matrix with the old-level terms and
        // with the unit pressure-gradient source vol_j.
        tridiag(ap_, an_, as_, b_, ua_, wp_, wq_, &g_.vol, &ub_, &wq2_);
        double sa = 0.0, sb = 0.0;
        for (std::size_t j = 0; j < n; ++j) {
            sa += g_.vol[j] * ua_[j];
            sb += g_.vol[j] * ub_[j];
        }
        const double minus_dpdx = (0.5 - sa) / sb;
        for (std::size_t j = 0; j < n; ++j) ut_[j] = ua_[j] + minus_dpdx * ub_[j];
        dpdx_ = -minus_dpdx;
    }

    void solve_energy(double a1, double a2, double h) {
        const std::size_t n = u_.size();
        const double gam = 4.0 / pr_;
        assemble(gam, t_, t_old_, a1, a2, h);
        if (wall_ == TH_WALL_T)
            ap_[n - 1] += gam * cond_[n];  // phi_w = 0
        else
            b_[n - 1] += gam * 0.5;  // gam * eta * dphi/deta at the wall
        tridiag(ap_, an_, as_, b_, tn_, wp_, wq_);
    }

    grid g_;
    double pr_;
    int wall_;
    bool energy_;
    int picard_;
    std::vector<double> u_, u_old_, un_, ut_, t_, t_old_, tn_, f_, cond_;
    std::vector<double> ap_, an_, as_, b_, ua_, ub_, wp_, wq_, wq2_;
    double x_ = 0.0, h_prev_ = 0.0, p_ = 0.0, dpdx_ = 0.0, dpdx_prev_ = 0.0,
           dpdx_frozen_ = 0.0;
    int steps_ = 0;
    bool frozen_ = false;
    long iterations_ = 0;  // Picard passes, for diagnostics
};

// A marched result: ln x (x* or x+) and the recorded quantities.
struct curve {
    std::vector<double> lnx, local, mean;
    std::shared_ptr<pchip> local_i, mean_i;
    double x_first = 0, x_last = 0;
    double local_last = 0, integral_last = 0;  // for x beyond the table
    double slope_first_local = 0, slope_first_mean = 0;  // d ln Nu/d ln x
    void finish() {
        x_first = std::exp(lnx.front());
        x_last = std::exp(lnx.back());
        local_last = local.back();
        integral_last = mean.back() * x_last;
        slope_first_local = (std::log(local[1]) - std::log(local[0])) / (lnx[1] - lnx[0]);
        slope_first_mean = (std::log(mean[1]) - std::log(mean[0])) / (lnx[1] - lnx[0]);
        auto x1 = lnx, y1 = local, x2 = lnx, y2 = mean;
        local_i = std::make_shared<pchip>(std::move(x1), std::move(y1));
        mean_i = std::make_shared<pchip>(std::move(x2), std::move(y2));
    }
};

// Stations X_0 = x_start, X_k = x_start q^k, ..., X_m = x_end, with q the
// ratio nearest to 1 + growth that lands exactly on x_end.
std::vector<double> stations(double x_start, double x_end, double growth) {
    const double span = std::log(x_end / x_start);
    const int m = std::max(1, static_cast<int>(std::ceil(span / std::log1p(growth))));
    std::vector<double> xs(static_cast<std::size_t>(m) + 1);
    for (int k = 0; k <= m; ++k) xs[static_cast<std::size_t>(k)] = x_start * std::exp(span * k / m);
    xs.back() = x_end;
    return xs;
}

// Marches one (Pr, wall) case and records Nu_x and Nu_m against x*.
curve march_thermal(double pr, int wall, int cells, double growth,
                    bool developed_flow = false) {
    marcher m(cells, pr, wall, true, developed_flow);
    const double x_end = std::max(x_star_last * pr, x_plus_last);
    const double x_start = 1e-4 * x_star_first_record * pr;
    curve c;
    // Running integral of Nu_x over x* (trapezoidal rule between stations).
    // The mean is taken from it for both wall conditions: for T the bulk
    // temperature would give the same value (-ln(phi_b)/(4 x*)), but far
    // down the tube the step error of the decaying amplitude makes phi_b
    // drift (a few 0.1 % at x* ~ 1) while the local value stays accurate.
    double integral = 0.0, prev_x = 0.0, prev_nu = 0.0;
    int station = 0;
    for (double x_next : stations(x_start, x_end, growth)) {
        m.step(x_next - m.x());
        const double xs = m.x() / pr;
        const double nu = m.nu_local();
        if (!std::isfinite(nu)) fail(TH_ERR_INTERNAL);
        if (station == 1) {
            // Below the first station Nu ~ x*^-p with p from the first two
            // stations (p = 1/3 for a developed flow, up to 1/2 for a
            // uniform one): int_0^x1 = x1 Nu1/(1 - p). Its share at the
            // first recorded station (1e4 x1) is ~0.2 %, and its error far
            // smaller.
            const double p = std::clamp(-std::log(nu / prev_nu) / std::log(xs / prev_x), 0.0, 0.75);
            integral = prev_x * prev_nu / (1.0 - p);
        }
        if (station >= 1) integral += 0.5 * (nu + prev_nu) * (xs - prev_x);
        ++station;
        prev_x = xs;
        prev_nu = nu;
        const double mean = integral / xs;
        if (xs >= x_star_first_record * 0.999) {
            c.lnx.push_back(std::log(xs));
            c.local.push_back(nu);
            c.mean.push_back(mean);
        }
    }
    c.finish();
    return c;
}

// Marches the flow alone and records (f_app Re) (Darcy) against x+.
curve march_friction(int cells, double growth) {
    marcher m(cells, 1.0, TH_WALL_T, false);
    curve c;
    for (double x_next : stations(1e-4 * x_plus_first, x_plus_last, growth)) {
        m.step(x_next - m.x());
        const double x = m.x();
        if (x >= x_plus_first * 0.999) {
            c.lnx.push_back(std::log(x));
            c.local.push_back(2.0 * m.pressure_drop() / x);  // (f_app Re), Darcy
            c.mean.push_back(m.centreline_velocity());
        }
    }
    c.finish();
    return c;
}

// Default resolution (see the convergence study in docs/laminar-entry.md).
constexpr int default_cells = 200;
constexpr double default_growth = 0.02;

// Mutex-protected LRU of marched tables keyed by (Pr, wall). The tables are
// immutable once built and shared by pointer, so a reader keeps using its
// table even if it is evicted meanwhile.
class table_cache {
  public:
    std::shared_ptr<const curve> get(double pr, int wall) {
        {
            std::lock_guard<std::mutex> lock(mutex_);
            for (auto it = entries_.begin(); it != entries_.end(); ++it) {
                if (it->pr == pr && it->wall == wall) {
                    entries_.splice(entries_.begin(), entries_, it);
                    return entries_.front().table;
                }
            }
        }
        // March outside the lock: other threads keep reading meanwhile. Two
        // threads asking for the same new key at once both march; the second
        // insert finds the first and keeps it.
        auto table = std::make_shared<const curve>(
            march_thermal(pr, wall, default_cells, default_growth));
        std::lock_guard<std::mutex> lock(mutex_);
        for (auto &e : entries_)
            if (e.pr == pr && e.wall == wall) return e.table;
        entries_.push_front(entry{pr, wall, table});
        if (entries_.size() > capacity) entries_.pop_back();
        return table;
    }

  private:
    static constexpr std::size_t capacity = 16;
    struct entry {
        double pr;
        int wall;
        std::shared_ptr<const curve> table;
    };
    std::mutex mutex_;
    std::list<entry> entries_;
};

table_cache &cache() {
    static table_cache c;  // thread-safe construction (magic static)
    return c;
}

// Evaluates a recorded curve at x. Below the first station: power-law
// extrapolation with the first recorded slope; beyond the last: the local
// value is constant and the mean follows from the running integral.
double eval(const curve &c, double x, bool mean) {
    if (x >= c.x_last) {
        if (!mean) return c.local_last;
        return (c.integral_last + c.local_last * (x - c.x_last)) / x;
    }
    const double lx = std::log(x);
    if (x < c.x_first) {
        const double y0 = mean ? c.mean.front() : c.local.front();
        const double s = mean ? c.slope_first_mean : c.slope_first_local;
        return y0 * std::exp(s * (lx - c.lnx.front()));
    }
    return mean ? (*c.mean_i)(lx) : (*c.local_i)(lx);
}

void need_wall_avg(int wall, int averaging) {
    need(wall == TH_WALL_T || wall == TH_WALL_H);
    need(averaging == TH_MEAN || averaging == TH_LOCAL);
}

}  // namespace

double entry_march_uncached(bool developed_flow, double x_star, double pr, int wall,
                            int averaging, int cells, double growth) {
    need(!std::isnan(x_star) && x_star > 0.0);
    need(pr >= pr_computable_min && pr <= pr_computable_max);
    need_wall_avg(wall, averaging);
    need(cells >= 20 && cells <= 5000);
    need(finite(growth) && growth >= 1e-3 && growth <= 0.5);
    const curve c = march_thermal(pr, wall, cells, growth, developed_flow);
    if (std::isinf(x_star)) return c.local_last;
    return checked(eval(c, x_star, averaging == TH_MEAN));
}

double combined_entry_x_star_min() { return x_star_first_record; }
double combined_entry_x_plus_min() { return x_plus_first; }

}  // namespace entry

double combined_entry_nu(double x_star, double pr, int wall, int averaging) {
    need(!std::isnan(x_star) && x_star > 0.0);
    need(pr >= entry::pr_computable_min && pr <= entry::pr_computable_max);
    entry::need_wall_avg(wall, averaging);
    if (std::isinf(x_star)) return entry::nu_fully_developed(wall);
    const auto table = entry::cache().get(pr, wall);
    return checked(entry::eval(*table, x_star, averaging == TH_MEAN));
}

double combined_entry_fre_app(double x_plus) {
    need(!std::isnan(x_plus) && x_plus > 0.0);
    if (std::isinf(x_plus)) return 64.0;
    // Computed once (thread-safe magic static), read-only afterwards.
    static const entry::curve table =
        entry::march_friction(entry::default_cells, entry::default_growth);
    if (x_plus >= table.x_last) {
        // Fully developed beyond: dP/dX = -32, so 2 dP grows by 64 per unit X.
        const double dp2 = table.local_last * table.x_last + 64.0 * (x_plus - table.x_last);
        return dp2 / x_plus;
    }
    return checked(entry::eval(table, x_plus, false));
}

}  // namespace th
