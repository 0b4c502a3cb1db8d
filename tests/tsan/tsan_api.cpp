// tsan_api.cpp - every C API function called from 8 threads at once over a
// shared grid of inputs, under ThreadSanitizer; every result compared bit for
// bit with a single-threaded run.
//
// The functions and their contract checks are the table the fuzzer uses
// (tests/fuzz/api_calls.hpp). Inputs come from grid_source: per argument
// kind a grid of 10 log-spaced plausible values (so that the cached
// solvers see a bounded set of Prandtl numbers: 20 (Pr, wall) pairs, more
// than the combined-entry cache's 16 slots, so eviction runs concurrently
// too), plus IEEE special values, out-of-range ids, method names and a few
// NULL pointers. Case j of function i is a fixed function of (i, j).
//
// Phases:
//   1. cold:  8 threads released together by a barrier, each running every
//             case in the same order, the cached functions first, so that
//             the lazy initialisation of the Graetz eigenvalue table, the
//             thermal-entry series table, the combined-entry cache and the
//             hydrodynamic-entry table is entered by all threads at once;
//   2. reference: the same cases once on the main thread;
//   3. warm:  8 threads again, each starting at a different case and going
//             backwards or forwards (other interleavings, warm caches).
// Exit status 0 when every thread's outcome equals the reference bit for
// bit and no contract check failed; ThreadSanitizer reports abort the run
// (halt_on_error=1 set by run_tsan.sh).
#include "api_calls.hpp"

#include <atomic>
#include <chrono>
#include <condition_variable>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <mutex>
#include <thread>
#include <vector>

namespace {

constexpr int n_threads = 8;
constexpr int cases_per_function = 24;
constexpr int grid_levels = 10;

std::uint64_t splitmix64(std::uint64_t &x) {
    std::uint64_t z = (x += 0x9E3779B97F4A7C15ull);
    z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9ull;
    z = (z ^ (z >> 27)) * 0x94D049BB133111EBull;
    return z ^ (z >> 31);
}

class grid_source final : public th_rob::source {
  public:
    explicit grid_source(std::uint64_t seed) : state_(seed) {}

    double real(th_rob::kind k) override {
        const std::uint64_t r = splitmix64(state_);
        const unsigned pick = static_cast<unsigned>(r % 100);
        if (pick < 5) return th_rob::special(static_cast<unsigned>((r >> 8) % 32));
        if (pick < 15) return th_rob::info(k).nominal;
        const double u = static_cast<double>((r >> 8) % grid_levels) / (grid_levels - 1);
        return th_rob::plausible(k, u, ((r >> 20) & 1u) != 0);
    }

    int choice(int count, int nominal) override {
        const std::uint64_t r = splitmix64(state_);
        const unsigned pick = static_cast<unsigned>(r % 100);
        if (pick < 20) return nominal;
        if (pick < 23) return -1;
        if (pick < 25) return count;
        // Large counts (cells, iterations, eigenvalue index): stay near the
        // nominal value so that no single call takes seconds under TSan.
        if (count > 64) return nominal + static_cast<int>((r >> 8) % 16);
        return static_cast<int>((r >> 8) % static_cast<std::uint64_t>(count));
    }

    const char *text() override {
        static const char *const names[] = {
            "Colebrook", "swamee_jain", "HAALAND", "Dittus-Boelter", "gnielinski 2013",
            "Graetz", "combined entry", "auto", "laminar", "no such method", "", "-",
            nullptr,
        };
        const std::uint64_t r = splitmix64(state_);
        return names[r % (sizeof names / sizeof names[0])];
    }

    bool null_pointer() override { return splitmix64(state_) % 100 < 3; }

  private:
    std::uint64_t state_;
};

struct test_case {
    std::size_t function;
    std::uint64_t seed;
};

th_rob::outcome run_case(const test_case &c) {
    grid_source src(c.seed);
    th_rob::outcome o;
    th_rob::api_calls[c.function].call(src, o);
    return o;
}

// All threads wait here until the last one arrives, then start together.
class barrier {
  public:
    explicit barrier(int n) : n_(n) {}
    void arrive_and_wait() {
        std::unique_lock<std::mutex> lock(m_);
        if (++arrived_ == n_) {
            cv_.notify_all();
            return;
        }
        cv_.wait(lock, [&] { return arrived_ >= n_; });
    }

  private:
    std::mutex m_;
    std::condition_variable cv_;
    int n_;
    int arrived_ = 0;
};

using results = std::vector<th_rob::outcome>;

// One concurrent phase: thread t runs every case, in the order given by
// order(t, k) -> case index, and stores outcomes by case index.
template <class Order>
std::vector<results> concurrent_phase(const std::vector<test_case> &cases, Order order) {
    std::vector<results> out(n_threads, results(cases.size()));
    barrier start(n_threads);
    std::vector<std::thread> threads;
    for (int t = 0; t < n_threads; ++t)
        threads.emplace_back([&, t] {
            start.arrive_and_wait();
            for (std::size_t k = 0; k < cases.size(); ++k) {
                const std::size_t i = order(t, k);
                out[static_cast<std::size_t>(t)][i] = run_case(cases[i]);
            }
        });
    for (auto &th : threads) th.join();
    return out;
}

int compare(const char *phase, const std::vector<test_case> &cases, const results &ref,
            const std::vector<results> &got) {
    int mismatches = 0;
    for (int t = 0; t < n_threads; ++t)
        for (std::size_t i = 0; i < cases.size(); ++i)
            if (!got[static_cast<std::size_t>(t)][i].same_as(ref[i])) {
                if (++mismatches <= 20)
                    std::fprintf(stderr, "%s: thread %d differs from the single-threaded run: %s case %zu "
                                 "(status %d vs %d)\n",
                                 phase, t, th_rob::api_calls[cases[i].function].name, i,
                                 got[static_cast<std::size_t>(t)][i].status, ref[i].status);
            }
    return mismatches;
}

double seconds_since(std::chrono::steady_clock::time_point t0) {
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
}

}  // namespace

int main() {
    // The case list: functions with lazily built caches first.
    std::vector<test_case> cases;
    for (int pass = 0; pass < 2; ++pass)
        for (std::size_t f = 0; f < th_rob::api_call_count; ++f) {
            if (th_rob::api_calls[f].has_cache != (pass == 0)) continue;
            for (int j = 0; j < cases_per_function; ++j)
                cases.push_back({f, 0x7475626568656174ull ^ (f * 1000003ull + static_cast<std::uint64_t>(j))});
        }
    std::printf("%zu API functions, %zu cases, %d threads\n", th_rob::api_call_count, cases.size(),
                n_threads);

    auto t0 = std::chrono::steady_clock::now();
    const auto cold = concurrent_phase(cases, [](int, std::size_t k) { return k; });
    std::printf("cold concurrent phase: %.1f s\n", seconds_since(t0));

    t0 = std::chrono::steady_clock::now();
    results ref(cases.size());
    for (std::size_t i = 0; i < cases.size(); ++i) ref[i] = run_case(cases[i]);
    std::printf("single-threaded reference: %.1f s\n", seconds_since(t0));

    t0 = std::chrono::steady_clock::now();
    const std::size_t n = cases.size();
    const auto warm = concurrent_phase(cases, [n](int t, std::size_t k) {
        const std::size_t start = static_cast<std::size_t>(t) * n / n_threads;
        return (t % 2 == 0) ? (start + k) % n : (start + n - k) % n;
    });
    std::printf("warm concurrent phase: %.1f s\n", seconds_since(t0));

    int succeeded = 0, failed = 0, skipped = 0;
    for (const auto &o : ref) {
        succeeded += o.status == TH_OK || o.status == TH_WARN_RANGE;
        failed += TH_FAILED(o.status);
        skipped += o.status == th_rob::skipped_expensive;
    }
    std::printf("outcomes per pass: %d success (OK/WARN), %d error codes, %d skipped as too slow\n",
                succeeded, failed, skipped);

    const int bad = compare("cold", cases, ref, cold) + compare("warm", cases, ref, warm);
    const std::size_t calls = cases.size() * (2 * n_threads + 1);
    if (bad) {
        std::fprintf(stderr, "FAILED: %d outcomes differ from the single-threaded run\n", bad);
        return 1;
    }
    std::printf("OK: %zu calls, every concurrent outcome identical bit for bit to the "
                "single-threaded one\n", calls);
    return 0;
}
