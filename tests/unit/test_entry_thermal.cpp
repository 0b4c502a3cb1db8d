// Thermal entry, exact (th_thermal_entry_nusselt, th_graetz_eigen): the
// Graetz / Siegel-Sparrow-Hallman series against analytic limits, an
// independent scipy solution (ODE shooting, method of lines, perturbation
// ODEs) and published values.
#include "th_test.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <string>
#include <thread>
#include <vector>

namespace {

double nu_te(double x, int wall, int avg) {
    double v = std::numeric_limits<double>::quiet_NaN();
    const int s = th_thermal_entry_nusselt(x, wall, avg, &v);
    REQUIRE(s == TH_OK);
    REQUIRE(std::isfinite(v));
    return v;
}

const char *wall_name(int w) { return w == TH_WALL_T ? "T" : "H"; }

}  // namespace

TEST_CASE("thermal entry: fully developed limits", "[entry][thermal][analytic]") {
    // Source: Nu_T = lambda_0^2/2 = 3.6568 and Nu_H = 48/11 (analytic fully
    // developed circular-tube values; Shah & London 1978 give 3.65679).
    const double inf = std::numeric_limits<double>::infinity();
    const double t = nu_te(inf, TH_WALL_T, TH_LOCAL);
    const double h = nu_te(inf, TH_WALL_H, TH_MEAN);
    CHECK(t == Approx(3.65679).epsilon(3e-6));
    CHECK(h == Approx(48.0 / 11.0).epsilon(1e-14));
    th_test::record("thermal entry Nu_T fully developed", "analytic 3.65679 (Shah & London 1978)",
                    th_test::rel_err(t, 3.65679), 3e-6);
    th_test::record("thermal entry Nu_H fully developed", "analytic 48/11",
                    th_test::rel_err(h, 48.0 / 11.0), 1e-14);
    // Far down the tube the local value is the limit and the mean tends to it
    // like 1/x* (mean = limit + const/x*).
    CHECK(nu_te(50.0, TH_WALL_T, TH_LOCAL) == Approx(t).epsilon(1e-14));
    CHECK(nu_te(50.0, TH_WALL_H, TH_LOCAL) == Approx(h).epsilon(1e-14));
    CHECK(nu_te(1e6, TH_WALL_T, TH_MEAN) == Approx(t).epsilon(1e-6));
    CHECK(nu_te(1e6, TH_WALL_H, TH_MEAN) == Approx(h).epsilon(1e-6));
}

TEST_CASE("thermal entry: eigenvalues and coefficients vs scipy", "[entry][thermal][reference]") {
    // Source: tests/reference/graetz_scipy.csv - for n < 60 ODE shooting
    // (DOP853) + brentq + integrated norm; for n < 340 scipy.special.hyp1f1 +
    // brentq + the norm identity by central differences. The library uses
    // Boost's Kummer function, toms748 and a sixth-order difference for
    // n < 120 and its fitted asymptotic forms for 120 <= n < 1200, so the
    // rows n >= 120 also check those forms.
    const auto t = th_test::read_table("graetz_scipy.csv");
    const auto cw = t.col("wall"), cn = t.col("n"), cl = t.col("lambda_ode"),
               cc = t.col("coef_ode"), ck = t.col("lambda_hyp1f1"), cck = t.col("coef_hyp1f1");
    double dl = 0, dc = 0, dk = 0, dck = 0, dka = 0, dcka = 0;
    for (const auto &r : t.rows) {
        const int n = static_cast<int>(r[cn]);
        double lam = 0, coef = 0;
        REQUIRE(th_graetz_eigen(static_cast<int>(r[cw]), n, &lam, &coef) == TH_OK);
        if (std::isfinite(r[cl])) {
            dl = std::max(dl, th_test::rel_err(lam, r[cl]));
            dc = std::max(dc, th_test::rel_err(coef, r[cc]));
        }
        if (n < 120) {
            dk = std::max(dk, th_test::rel_err(lam, r[ck]));
            dck = std::max(dck, th_test::rel_err(coef, r[cck]));
        } else {
            dka = std::max(dka, th_test::rel_err(lam, r[ck]));
            dcka = std::max(dcka, th_test::rel_err(coef, r[cck]));
        }
    }
    CHECK(dl < 1e-11);
    CHECK(dc < 1e-8);
    CHECK(dk < 1e-11);
    CHECK(dck < 1e-7);
    CHECK(dka < 1e-9);
    CHECK(dcka < 2e-6);
    th_test::record("Graetz/SSH eigenvalues n<60 (T,H)", "scipy ODE shooting (graetz_scipy.csv)", dl, 1e-11);
    th_test::record("Graetz G_n, SSH c_n n<60", "scipy ODE shooting + norm (graetz_scipy.csv)", dc, 1e-8);
    th_test::record("Graetz/SSH eigenvalues n<120 (Kummer roots)", "scipy hyp1f1+brentq (graetz_scipy.csv)", dk, 1e-11);
    th_test::record("Graetz G_n, SSH c_n n<120", "scipy hyp1f1 + norm identity (graetz_scipy.csv)", dck, 1e-7);
    th_test::record("asymptotic eigenvalues 120<=n<340", "scipy hyp1f1+brentq (graetz_scipy.csv)", dka, 1e-9);
    th_test::record("asymptotic G_n, c_n 120<=n<340", "scipy hyp1f1 + norm identity (graetz_scipy.csv)", dcka, 2e-6);
}

TEST_CASE("thermal entry: first eigenvalues as published", "[entry][thermal][handbook]") {
    // Source: Shah & London (1978) tables; T values also in the project's
    // field notes; all (from memory), given to 4-5 digits.
    struct pub {
        int wall, n;
        double lam, coef;
    };
    const pub v[] = {{TH_WALL_T, 0, 2.70436, 0.74877}, {TH_WALL_T, 1, 6.67903, 0.54383},
                     {TH_WALL_T, 2, 10.67338, 0.46286}, {TH_WALL_H, 0, 5.0675, 0.0},
                     {TH_WALL_H, 1, 9.1576, 0.0},       {TH_WALL_H, 2, 13.1972, 0.0}};
    double dev = 0;
    for (const auto &p : v) {
        double lam = 0, coef = 0;
        REQUIRE(th_graetz_eigen(p.wall, p.n, &lam, &coef) == TH_OK);
        CHECK(lam == Approx(p.lam).epsilon(2e-5));
        dev = std::max(dev, th_test::rel_err(lam, p.lam));
        if (p.coef > 0) CHECK(coef == Approx(p.coef).epsilon(2e-5));
    }
    th_test::record("first three Graetz and SSH eigenvalues", "Shah & London 1978 (from memory)",
                    dev, 2e-5);
    // H: Siegel-Sparrow-Hallman's A_1 = 1/(2 c_1 beta_1^4) ~ 7.6e-3 (from memory).
    double b1 = 0, c1 = 0;
    REQUIRE(th_graetz_eigen(TH_WALL_H, 0, &b1, &c1) == TH_OK);
    CHECK(1.0 / (2.0 * c1 * std::pow(b1, 4)) == Approx(7.63e-3).epsilon(0.01));
}

TEST_CASE("thermal entry: series identities", "[entry][thermal][analytic]") {
    // Source: analytic. theta_m(0) = 1 gives 8 sum G_n/lambda_n^2 = 1 (T);
    // T_w - T_b = 0 at x* = 0 gives sum c_n = 11/48 (H). Both sums converge
    // slowly (tails ~ n^-4/3 and n^-2/3), so they are completed with the
    // asymptotic tail integral of the leading large-n forms.
    for (int wall : {TH_WALL_T, TH_WALL_H}) {
        double sum = 0, lam = 0, coef = 0;
        int n = 0;
        for (; n < 1200; ++n) {
            REQUIRE(th_graetz_eigen(wall, n, &lam, &coef) == TH_OK);
            sum += wall == TH_WALL_T ? 8.0 * coef / (lam * lam) : coef;
        }
        // tail n >= 1200: coef ~ C lam^-p with lam ~ 4n: sum ~ int from
        // lam_last + 2 of C lam^-p d(lam)/4.
        const double p = wall == TH_WALL_T ? 7.0 / 3.0 : 5.0 / 3.0;
        const double c = (wall == TH_WALL_T ? 8.0 * coef / (lam * lam) : coef) * std::pow(lam, p);
        sum += c * std::pow(lam + 2.0, 1.0 - p) / (4.0 * (p - 1.0));
        const double want = wall == TH_WALL_T ? 1.0 : 11.0 / 48.0;
        INFO("wall " << wall_name(wall));
        CHECK(sum == Approx(want).epsilon(2e-5));
        th_test::record(std::string("series completeness identity, ") + wall_name(wall),
                        "analytic (initial condition)", th_test::rel_err(sum, want), 2e-5);
    }
    // Eigenvalue table size: n = 1200 is out of range.
    double l = 0, c = 0;
    CHECK(th_graetz_eigen(TH_WALL_T, 1200, &l, &c) == TH_ERR_INPUT);
}

TEST_CASE("thermal entry: Nu vs scipy eigen-series", "[entry][thermal][reference]") {
    // Source: tests/reference/graetz_nu_scipy.csv (340 hyp1f1 eigenpairs,
    // converged for x* >= 1.1e-5; T mean from ln(1/theta_m), H mean by
    // quadrature with a two-term Leveque head below x* = 1.2e-5 whose error
    // is below 1e-4 from x* = 1e-3 on and up to ~1e-3 at 1.2e-5).
    const auto t = th_test::read_table("graetz_nu_scipy.csv");
    double dl = 0, dm = 0, dh_far = 0, dh_near = 0;
    for (const auto &r : t.rows) {
        const int wall = static_cast<int>(r[t.col("wall")]);
        const double x = r[t.col("x_star")];
        dl = std::max(dl, th_test::rel_err(nu_te(x, wall, TH_LOCAL), r[t.col("nu_local")]));
        const double m = th_test::rel_err(nu_te(x, wall, TH_MEAN), r[t.col("nu_mean")]);
        if (wall == TH_WALL_T)
            dm = std::max(dm, m);
        else if (x >= 1e-3)
            dh_far = std::max(dh_far, m);
        else
            dh_near = std::max(dh_near, m);
    }
    CHECK(dl < 1e-6);
    // The reference's T mean, ln(1/theta_m)/(4x*), amplifies its coefficient
    // errors (~1e-8, five-point differences) by 1/(1 - theta_m) ~ 300 at
    // x* = 1.2e-5.
    CHECK(dm < 3e-6);
    CHECK(dh_far < 1e-4);
    CHECK(dh_near < 1.5e-3);
    th_test::record("thermal entry local Nu (T,H), 1.2e-5 <= x* <= 1",
                    "scipy hyp1f1 eigen-series (graetz_nu_scipy.csv)", dl, 1e-6);
    th_test::record("thermal entry mean Nu (T), 1.2e-5 <= x* <= 1",
                    "scipy hyp1f1 eigen-series (graetz_nu_scipy.csv)", dm, 3e-6);
    th_test::record("thermal entry mean Nu (H), 1e-3 <= x* <= 1",
                    "scipy series + quadrature (graetz_nu_scipy.csv)", dh_far, 1e-4);
    th_test::record("thermal entry mean Nu (H), 1.2e-5 <= x* < 1e-3",
                    "scipy series + quadrature, Leveque head (graetz_nu_scipy.csv)", dh_near, 1.5e-3);
}

TEST_CASE("thermal entry: T vs method of lines down to x* = 1e-6", "[entry][thermal][reference]") {
    // Source: tests/reference/graetz_mol_scipy.csv - finite volumes in r with
    // scipy's BDF integrator in x*, 800/1600 cells, Richardson-extrapolated
    // (an independent discretisation of the PDE, no eigenfunctions). The
    // extrapolation error is estimated from the 800/1600 difference.
    const auto t = th_test::read_table("graetz_mol_scipy.csv");
    double dl = 0, dm = 0;
    for (const auto &r : t.rows) {
        const double x = r[t.col("x_star")];
        dl = std::max(dl, th_test::rel_err(nu_te(x, TH_WALL_T, TH_LOCAL), r[t.col("nu_local")]));
        dm = std::max(dm, th_test::rel_err(nu_te(x, TH_WALL_T, TH_MEAN), r[t.col("nu_mean")]));
    }
    CHECK(dl < 2e-5);
    CHECK(dm < 2e-5);
    th_test::record("thermal entry local Nu (T), 1e-6 <= x* <= 1",
                    "scipy method of lines (graetz_mol_scipy.csv)", dl, 2e-5);
    th_test::record("thermal entry mean Nu (T), 1e-6 <= x* <= 1",
                    "scipy method of lines (graetz_mol_scipy.csv)", dm, 2e-5);
}

TEST_CASE("thermal entry: Leveque limit and its second term", "[entry][thermal][analytic]") {
    // Source: Leveque (1928) leading terms, local 1.0767 / 1.3020 and mean
    // 1.6151 / 1.9530 (x 1.5) (analytic; 1.077/1.615/1.302/1.953 in Shah &
    // London 1978); the constant b0 from the first-order perturbation problem
    // solved independently with scipy (tests/reference/leveque_scipy.csv).
    // At x* = 1e-9 the neglected O(x*^1/3) term (~6 x*^1/3) is < 0.01.
    const auto t = th_test::read_table("leveque_scipy.csv");
    for (const auto &r : t.rows) {
        const int wall = static_cast<int>(r[t.col("wall")]);
        const double a = r[t.col("a")], b0 = r[t.col("b0")];
        INFO("wall " << wall_name(wall));
        CHECK(a == Approx(wall == TH_WALL_T ? 1.077 : 1.302).epsilon(5e-4));
        CHECK(r[t.col("a_ode")] == Approx(a).epsilon(1e-9));
        const double x = 1e-9, c = std::cbrt(x);
        const double loc = nu_te(x, wall, TH_LOCAL), mean = nu_te(x, wall, TH_MEAN);
        CHECK(std::fabs(loc - (a / c + b0)) < 0.01);
        CHECK(std::fabs(mean - (1.5 * a / c + b0)) < 0.01);
        th_test::record(std::string("Leveque + b0, local, x*=1e-9, ") + wall_name(wall),
                        "Leveque 1928 + scipy perturbation ODE (leveque_scipy.csv)",
                        std::fabs(loc - (a / c + b0)), 0.01, "absolute");
        // The published three-digit constants, as the x* -> 0 limit (at
        // x* = 1e-12, where b0 x*^1/3 is 1e-4 of a).
        const double x12 = 1e-12, c12 = std::cbrt(x12);
        const double lim = nu_te(x12, wall, TH_LOCAL) * c12, limm = nu_te(x12, wall, TH_MEAN) * c12;
        CHECK(lim == Approx(wall == TH_WALL_T ? 1.077 : 1.302).epsilon(1e-3));
        CHECK(limm == Approx(wall == TH_WALL_T ? 1.615 : 1.953).epsilon(1e-3));
        th_test::record(std::string("Leveque constants local/mean, ") + wall_name(wall),
                        "Shah & London 1978 (1.077/1.615, 1.302/1.953)",
                        std::max(th_test::rel_err(lim, wall == TH_WALL_T ? 1.077 : 1.302),
                                 th_test::rel_err(limm, wall == TH_WALL_T ? 1.615 : 1.953)),
                        1e-3);
    }
}

TEST_CASE("thermal entry: continuous at the series/Leveque switch", "[entry][thermal]") {
    // Source: the switch at x* = 1e-6 blends over 1e-6 .. 2e-6 (smoothstep in
    // ln x*); values on either side of both ends must agree, and the slope
    // d ln Nu / d ln x* must stay near -1/3 through the blend.
    for (int wall : {TH_WALL_T, TH_WALL_H})
        for (int avg : {TH_LOCAL, TH_MEAN})
            for (double xs : {1e-6, 2e-6}) {
                const double lo = nu_te(xs * (1 - 1e-10), wall, avg);
                const double hi = nu_te(xs * (1 + 1e-10), wall, avg);
                INFO(wall_name(wall) << " avg " << avg << " at " << xs);
                CHECK(hi == Approx(lo).epsilon(1e-9));
            }
    for (int wall : {TH_WALL_T, TH_WALL_H}) {
        double prev = nu_te(5e-7, wall, TH_LOCAL);
        for (int i = 1; i <= 40; ++i) {
            const double x = 5e-7 * std::pow(10.0, i / 40.0 * 1.0);
            const double v = nu_te(x, wall, TH_LOCAL);
            const double slope = std::log(v / prev) / std::log(std::pow(10.0, 1.0 / 40.0));
            CHECK(slope < -0.30);
            CHECK(slope > -0.34);
            prev = v;
        }
    }
}

TEST_CASE("thermal entry: monotonic, mean above local", "[entry][thermal][analytic]") {
    // Source: physics of the entry region (analytic): the local Nu falls
    // monotonically to its limit and the mean of a falling function lies
    // above its end value.
    for (int wall : {TH_WALL_T, TH_WALL_H}) {
        double pl = 1e300, pm = 1e300;
        for (int i = 0; i <= 140; ++i) {
            const double x = 1e-9 * std::pow(10.0, i / 14.0);  // 1e-9 .. 10
            const double l = nu_te(x, wall, TH_LOCAL), m = nu_te(x, wall, TH_MEAN);
            CHECK(l <= pl);
            CHECK(m <= pm);
            CHECK(m >= l);
            pl = l;
            pm = m;
        }
    }
}

TEST_CASE("thermal entry: mean is the integral of the local value", "[entry][thermal][analytic]") {
    // Source: definition Nu_m = (1/x*) int_0^x* Nu_x dx* (the library's mean,
    // the Shah & London 1978 definition for H; for T equal to
    // ln(1/theta_b)/(4x*)). Integrated here independently with a 20-point
    // Gauss-Legendre rule per half decade in ln x* from the library's local
    // values, with the extended-Leveque head below 1e-9.
    static const double gx[10] = {0.0765265211334973, 0.2277858511416451, 0.3737060887154195,
                                  0.5108670019508271, 0.6360536807265150, 0.7463319064601508,
                                  0.8391169718222188, 0.9122344282513259, 0.9639719272779138,
                                  0.9931285991850949};
    static const double gw[10] = {0.1527533871307258, 0.1491729864726037, 0.1420961093183820,
                                  0.1316886384491766, 0.1181945319615184, 0.1019301198172404,
                                  0.0832767415767048, 0.0626720483341091, 0.0406014298003869,
                                  0.0176140071391521};
    const auto t = th_test::read_table("leveque_scipy.csv");
    double dev = 0;
    for (int wall : {TH_WALL_T, TH_WALL_H}) {
        const double a = t.rows[static_cast<std::size_t>(wall)][t.col("a")];
        const double b0 = t.rows[static_cast<std::size_t>(wall)][t.col("b0")];
        const double x0 = 1e-9;
        double integral = 1.5 * a * std::pow(x0, 2.0 / 3.0) + b0 * x0;
        double u = std::log(x0);
        const double du = std::log(10.0) / 2.0;
        for (int k = 0; k < 18; ++k, u += du) {  // up to x* = 1
            const double mid = u + du / 2, half = du / 2;
            for (int i = 0; i < 10; ++i)
                for (double sgn : {-1.0, 1.0}) {
                    const double x = std::exp(mid + sgn * half * gx[i]);
                    integral += gw[i] * half * x * nu_te(x, wall, TH_LOCAL);
                }
            const double xe = std::exp(u + du);
            const double e = th_test::rel_err(nu_te(xe, wall, TH_MEAN), integral / xe);
            dev = std::max(dev, e);
            INFO(wall_name(wall) << " x* " << xe);
            CHECK(e < 2e-6);
        }
    }
    th_test::record("thermal entry mean = (1/x*) int Nu_x, 1e-8 <= x* <= 1 (T,H)",
                    "definition; Gauss-Legendre of the local values", dev, 2e-6);
}

TEST_CASE("thermal entry: Shah fits within their accuracy", "[entry][thermal][handbook]") {
    // Source: Shah (1975) fits as given in Shah & London (1978), project field
    // notes section 4 (from memory). The field notes give the T local split
    // at x* = 0.01; at that point the first branch is 12 % below the exact
    // value and the second agrees, so the split is taken at 1e-3 here (the
    // branches meet there within 0.3 %); flagged to the lead. Shah & London
    // quote these fits as good to a few per cent (from memory): measured
    // worst deviations below.
    auto shah = [](double x, int wall, int avg) {
        const double c = std::cbrt(x);
        if (wall == TH_WALL_T && avg == TH_LOCAL)
            return x <= 1e-3 ? 1.077 / c - 0.7
                             : 3.657 + 6.874 * std::pow(1e3 * x, -0.488) * std::exp(-57.2 * x);
        if (wall == TH_WALL_T)
            return x <= 0.005 ? 1.615 / c - 0.7 : (x < 0.03 ? 1.615 / c - 0.2 : 3.657 + 0.0499 / x);
        if (avg == TH_LOCAL)
            return x <= 5e-5 ? 1.302 / c - 1.0
                             : (x <= 1.5e-3 ? 1.302 / c - 0.5
                                            : 4.364 + 8.68 * std::pow(1e3 * x, -0.506) *
                                                          std::exp(-41.0 * x));
        return x <= 0.03 ? 1.953 / c : 4.364 + 0.0722 / x;
    };
    struct lim {
        int wall, avg;
        double tol;
    };
    for (const lim &l : {lim{TH_WALL_T, TH_LOCAL, 0.012}, lim{TH_WALL_T, TH_MEAN, 0.035},
                         lim{TH_WALL_H, TH_LOCAL, 0.012}, lim{TH_WALL_H, TH_MEAN, 0.04}}) {
        double dev = 0;
        for (int i = 0; i <= 50; ++i) {
            const double x = 1e-5 * std::pow(10.0, i / 10.0);
            dev = std::max(dev, th_test::rel_err(shah(x, l.wall, l.avg), nu_te(x, l.wall, l.avg)));
        }
        INFO(wall_name(l.wall) << " avg " << l.avg << " max deviation " << dev);
        CHECK(dev < l.tol);
        th_test::record(std::string("Shah fits vs exact, 1e-5..1, ") + wall_name(l.wall) +
                            (l.avg == TH_LOCAL ? " local" : " mean"),
                        "Shah 1975 / Shah & London 1978 (from memory)", dev, l.tol);
    }
}

TEST_CASE("thermal entry: handbook values", "[entry][thermal][handbook]") {
    // Source: Shah & London (1978) thermal-entry tables (from memory, 4-5
    // digits): T x* = 0.001: Nu_x 10.130, Nu_m 15.384; x* = 0.01: 4.916,
    // 7.155; H x* = 0.001: Nu_x 12.538; x* = 0.01: 6.148. Tolerance 2e-4.
    struct v {
        int wall, avg;
        double x, nu;
    };
    double dev = 0;
    for (const v &p : {v{TH_WALL_T, TH_LOCAL, 1e-3, 10.130}, v{TH_WALL_T, TH_MEAN, 1e-3, 15.384},
                       v{TH_WALL_T, TH_LOCAL, 1e-2, 4.916}, v{TH_WALL_T, TH_MEAN, 1e-2, 7.155},
                       v{TH_WALL_H, TH_LOCAL, 1e-3, 12.538}, v{TH_WALL_H, TH_LOCAL, 1e-2, 6.148}}) {
        const double e = th_test::rel_err(nu_te(p.x, p.wall, p.avg), p.nu);
        CHECK(e < 2e-4);
        dev = std::max(dev, e);
    }
    th_test::record("thermal entry Nu at x*=1e-3, 1e-2", "Shah & London 1978 tables (from memory)",
                    dev, 2e-4);
}

TEST_CASE("thermal entry: bad input", "[entry][thermal][errors]") {
    const double nan = std::numeric_limits<double>::quiet_NaN();
    double v = 123.0;
    CHECK(th_thermal_entry_nusselt(nan, TH_WALL_T, TH_LOCAL, &v) == TH_ERR_INPUT);
    CHECK(th_thermal_entry_nusselt(0.0, TH_WALL_T, TH_LOCAL, &v) == TH_ERR_INPUT);
    CHECK(th_thermal_entry_nusselt(-1e-3, TH_WALL_T, TH_LOCAL, &v) == TH_ERR_INPUT);
    CHECK(th_thermal_entry_nusselt(-INFINITY, TH_WALL_T, TH_LOCAL, &v) == TH_ERR_INPUT);
    CHECK(th_thermal_entry_nusselt(1e-3, 2, TH_LOCAL, &v) == TH_ERR_INPUT);
    CHECK(th_thermal_entry_nusselt(1e-3, -1, TH_LOCAL, &v) == TH_ERR_INPUT);
    CHECK(th_thermal_entry_nusselt(1e-3, TH_WALL_T, 2, &v) == TH_ERR_INPUT);
    CHECK(th_thermal_entry_nusselt(1e-3, TH_WALL_T, TH_LOCAL, nullptr) == TH_ERR_INPUT);
    CHECK(v == 123.0);  // untouched on error
    double l = 1.0, c = 2.0;
    CHECK(th_graetz_eigen(TH_WALL_T, -1, &l, &c) == TH_ERR_INPUT);
    CHECK(th_graetz_eigen(TH_WALL_H, 1200, &l, &c) == TH_ERR_INPUT);
    CHECK(th_graetz_eigen(3, 0, &l, &c) == TH_ERR_INPUT);
    CHECK(th_graetz_eigen(TH_WALL_T, 0, nullptr, &c) == TH_ERR_INPUT);
    CHECK(th_graetz_eigen(TH_WALL_T, 0, &l, nullptr) == TH_ERR_INPUT);
    CHECK(l == 1.0);
    CHECK(c == 2.0);
    // Extremes are finite.
    for (double x : {1e-300, 1e-30, 1e30, 1e300})
        for (int w : {TH_WALL_T, TH_WALL_H})
            for (int a : {TH_LOCAL, TH_MEAN}) {
                REQUIRE(th_thermal_entry_nusselt(x, w, a, &v) == TH_OK);
                CHECK(std::isfinite(v));
                CHECK(v > 3.6);
            }
}

TEST_CASE("thermal entry: concurrent first use", "[entry][thermal][threads]") {
    // The eigenvalue tables are function-local statics: concurrent callers
    // must all see the same finished table.
    std::vector<std::thread> pool;
    std::vector<double> out(8, 0.0);
    for (int i = 0; i < 8; ++i)
        pool.emplace_back([i, &out] {
            double v = 0;
            th_thermal_entry_nusselt(1e-4, i % 2, TH_MEAN, &v);
            out[static_cast<std::size_t>(i)] = v;
        });
    for (auto &t : pool) t.join();
    for (int i = 2; i < 8; ++i) CHECK(out[static_cast<std::size_t>(i)] == out[static_cast<std::size_t>(i % 2)]);
}
