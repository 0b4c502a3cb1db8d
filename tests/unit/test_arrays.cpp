// The *_array functions against their single-row counterparts: every row's
// value and status must be exactly what th_nusselt / th_friction_factor
// give for that row, bit for bit, good rows and bad ones mixed.
#include "th_test.hpp"

#include <cmath>
#include <cstdint>
#include <cstring>
#include <limits>
#include <random>
#include <vector>

namespace {

const double not_a_number = std::numeric_limits<double>::quiet_NaN();
const double infinity = std::numeric_limits<double>::infinity();

bool same_bits(double a, double b) { return std::memcmp(&a, &b, sizeof a) == 0; }

// Rows spread over laminar, transitional and turbulent flow and over Pr,
// with hostile values mixed in (one row in six).
struct rows {
    std::vector<double> re, pr, ld;
};
rows make_rows(std::size_t n, unsigned seed) {
    std::mt19937 gen(seed);
    std::uniform_real_distribution<double> u(0.0, 1.0);
    const double hostile[] = {0.0, -1.0, not_a_number, infinity, -infinity, 1e308, 5e-324};
    rows r;
    for (std::size_t i = 0; i < n; ++i) {
        double re = std::pow(10.0, 1.0 + 6.0 * u(gen));
        double pr = std::pow(10.0, -2.5 + 5.0 * u(gen));
        double ld = std::pow(10.0, -0.5 + 4.0 * u(gen));
        const auto pick = [&] { return hostile[gen() % (sizeof hostile / sizeof hostile[0])]; };
        switch (gen() % 18) {
        case 0: re = pick(); break;
        case 1: pr = pick(); break;
        case 2: ld = pick(); break;
        default: break;
        }
        r.re.push_back(re);
        r.pr.push_back(pr);
        r.ld.push_back(ld);
    }
    return r;
}

// The return value the header states: first failed row, else a warning,
// else success.
int expected_return(const std::vector<int> &statuses) {
    bool warned = false;
    for (int s : statuses) {
        if (TH_FAILED(s)) return s;
        warned = warned || s == TH_WARN_RANGE;
    }
    return warned ? TH_WARN_RANGE : TH_OK;
}

// Shared conditions the rows are run under: defaults, then variations of
// every field some method reads (one of them bad).
std::vector<th_conditions> shared_variants() {
    std::vector<th_conditions> v;
    th_conditions c;
    REQUIRE(th_conditions_init(&c) == TH_OK);
    c.re = -5.0;  // not read by the array form
    c.pr = not_a_number;   // not read by the array form
    v.push_back(c);
    th_conditions d = c;
    d.averaging = TH_LOCAL;
    d.wall = TH_WALL_H;
    d.entry = TH_ENTRY_THERMAL;
    d.direction = TH_COOLING;
    d.mu_ratio = 2.5;
    d.rel_roughness = 1e-3;
    d.correction = TH_CORR_LIQUID;
    d.pr_wall = 3.0;
    v.push_back(d);
    d = c;
    d.correction = TH_CORR_GAS;
    d.t_ratio = 0.7;
    d.length_factor = 0;
    d.duct = TH_DUCT_RECTANGLE;
    d.duct_ratio = 0.25;
    v.push_back(d);
    d = c;
    d.mu_ratio = 0.0;  // bad for the methods that read it
    v.push_back(d);
    return v;
}

}  // namespace

TEST_CASE("nusselt array: every row as th_nusselt gives it", "[arrays][nusselt]") {
    // Source: the contract in tubeheat.h (th_nusselt_array), with
    // th_nusselt row by row as the reference.
    const std::size_t n = 300;
    int checked_rows = 0;
    for (const th_conditions &shared : shared_variants()) {
        for (int m = 0; m < TH_NU_METHOD_COUNT; ++m) {
            if (m == TH_NU_COMBINED_ENTRY_NUMERIC) continue;  // below, fewer rows (a march per new Pr)
            for (bool per_row_length : {false, true}) {
                const rows r = make_rows(n, 1000u * unsigned(m) + (per_row_length ? 7u : 0u));
                std::vector<double> nu(n, -1.0);
                std::vector<int> status(n, -1);
                const int ret = th_nusselt_array(m, &shared, n, r.re.data(), r.pr.data(),
                                                 per_row_length ? r.ld.data() : nullptr, nu.data(),
                                                 status.data());
                INFO("method " << th_nusselt_method_name(m) << ", per-row L/D " << per_row_length);
                std::vector<int> want(n);
                for (std::size_t i = 0; i < n; ++i) {
                    th_conditions c = shared;
                    c.re = r.re[i];
                    c.pr = r.pr[i];
                    if (per_row_length) c.l_over_d = r.ld[i];
                    th_nusselt_result one{};
                    want[i] = th_nusselt(m, &c, &one);
                    CHECK(status[i] == want[i]);
                    if (TH_FAILED(want[i]))
                        CHECK(std::isnan(nu[i]));
                    else
                        CHECK(same_bits(nu[i], one.nu));
                    ++checked_rows;
                }
                CHECK(ret == expected_return(want));
            }
        }
    }
    CHECK(checked_rows == 4 * 13 * 2 * 300);
}

TEST_CASE("nusselt array: combined entry and the automatic choice", "[arrays][nusselt]") {
    // Source: as above; the numerical solution marches once per new Pr, so
    // these rows share a few Pr values.
    th_conditions shared;
    REQUIRE(th_conditions_init(&shared) == TH_OK);
    shared.l_over_d = 40.0;
    const double re[] = {500.0, 1500.0, 0.0, 2000.0, 3e4, 800.0};
    const double pr[] = {0.7, 7.0, 7.0, not_a_number, 7.0, 0.7};
    double nu[6];
    int status[6];
    for (int m : {int(TH_NU_COMBINED_ENTRY_NUMERIC), int(TH_NU_AUTO)}) {
        const int ret = th_nusselt_array(m, &shared, 6, re, pr, nullptr, nu, status);
        std::vector<int> want;
        for (int i = 0; i < 6; ++i) {
            th_conditions c = shared;
            c.re = re[i];
            c.pr = pr[i];
            th_nusselt_result one{};
            want.push_back(th_nusselt(m, &c, &one));
            CHECK(status[i] == want.back());
            if (!TH_FAILED(want.back())) CHECK(same_bits(nu[i], one.nu));
        }
        CHECK(ret == expected_return(want));
        CHECK(ret == TH_ERR_INPUT);  // row 2 (Re = 0) is the first failed row
    }
}

TEST_CASE("nusselt array: bad calls write nothing; in place; empty", "[arrays][nusselt][input]") {
    // Source: the contract in tubeheat.h (th_nusselt_array).
    th_conditions shared;
    REQUIRE(th_conditions_init(&shared) == TH_OK);
    double re[] = {2e4, 5e4, 1e5};
    double pr[] = {3.0, 5.0, 7.0};
    double nu[3] = {-1.0, -1.0, -1.0};
    int status[3] = {-1, -1, -1};
    CHECK(th_nusselt_array(TH_NU_METHOD_COUNT, &shared, 3, re, pr, nullptr, nu, status) == TH_ERR_METHOD);
    CHECK(th_nusselt_array(-1, &shared, 3, re, pr, nullptr, nu, status) == TH_ERR_METHOD);
    CHECK(th_nusselt_array(TH_NU_GNIELINSKI, nullptr, 3, re, pr, nullptr, nu, status) == TH_ERR_INPUT);
    CHECK(th_nusselt_array(TH_NU_GNIELINSKI, &shared, 3, nullptr, pr, nullptr, nu, status) == TH_ERR_INPUT);
    CHECK(th_nusselt_array(TH_NU_GNIELINSKI, &shared, 3, re, nullptr, nullptr, nu, status) == TH_ERR_INPUT);
    CHECK(th_nusselt_array(TH_NU_GNIELINSKI, &shared, 3, re, pr, nullptr, nullptr, status) == TH_ERR_INPUT);
    CHECK(th_nusselt_array(TH_NU_GNIELINSKI, &shared, 3, re, pr, nullptr, nu, nullptr) == TH_ERR_INPUT);
    for (int i = 0; i < 3; ++i) {
        CHECK(nu[i] == -1.0);
        CHECK(status[i] == -1);
    }
    CHECK(th_nusselt_array(TH_NU_GNIELINSKI, &shared, 0, nullptr, nullptr, nullptr, nullptr, nullptr) == TH_OK);
    // In place: the results overwrite the Re column.
    REQUIRE(th_nusselt_array(TH_NU_GNIELINSKI, &shared, 3, re, pr, nullptr, nu, status) == TH_OK);
    REQUIRE(th_nusselt_array(TH_NU_GNIELINSKI, &shared, 3, re, pr, nullptr, re, status) == TH_OK);
    for (int i = 0; i < 3; ++i) CHECK(same_bits(re[i], nu[i]));
}

TEST_CASE("friction array: every row as th_friction_factor gives it", "[arrays][friction]") {
    // Source: the contract in tubeheat.h (th_friction_factor_array), with
    // th_friction_factor row by row as the reference.
    const rows r = make_rows(400, 99u);
    for (double rr : {0.0, 1e-4, 0.02, 0.3, -1e-3, not_a_number}) {
        for (int m = 0; m < TH_F_METHOD_COUNT; ++m) {
            std::vector<double> f(r.re.size(), -1.0);
            std::vector<int> status(r.re.size(), -1);
            const int ret = th_friction_factor_array(m, r.re.size(), r.re.data(), rr, f.data(), status.data());
            INFO("method " << th_friction_method_name(m) << ", eps/D " << rr);
            std::vector<int> want;
            for (std::size_t i = 0; i < r.re.size(); ++i) {
                double one = -1.0;
                want.push_back(th_friction_factor(m, r.re[i], rr, &one));
                CHECK(status[i] == want.back());
                if (TH_FAILED(want.back()))
                    CHECK(std::isnan(f[i]));
                else
                    CHECK(same_bits(f[i], one));
            }
            CHECK(ret == expected_return(want));
        }
    }
    double re[] = {1e3, 1e5};
    double f[2] = {-1.0, -1.0};
    int status[2] = {-1, -1};
    CHECK(th_friction_factor_array(TH_F_METHOD_COUNT, 2, re, 0.0, f, status) == TH_ERR_METHOD);
    CHECK(th_friction_factor_array(TH_F_COLEBROOK, 2, nullptr, 0.0, f, status) == TH_ERR_INPUT);
    CHECK(th_friction_factor_array(TH_F_COLEBROOK, 2, re, 0.0, nullptr, status) == TH_ERR_INPUT);
    CHECK(th_friction_factor_array(TH_F_COLEBROOK, 2, re, 0.0, f, nullptr) == TH_ERR_INPUT);
    CHECK(f[0] == -1.0);
    CHECK(status[1] == -1);
    CHECK(th_friction_factor_array(TH_F_COLEBROOK, 0, nullptr, 0.0, nullptr, nullptr) == TH_OK);
    // In place.
    REQUIRE(th_friction_factor_array(TH_F_AUTO, 2, re, 1e-4, f, status) == TH_OK);
    REQUIRE(th_friction_factor_array(TH_F_AUTO, 2, re, 1e-4, re, status) == TH_OK);
    CHECK(same_bits(re[0], f[0]));
    CHECK(same_bits(re[1], f[1]));
}
