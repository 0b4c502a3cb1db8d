// fuzz_api.cpp - libFuzzer harness over the whole public C API.
//
// Input layout (every part optional; missing bytes give plausible nominal
// values, so even a 1-byte input reaches the computing code):
//   byte 0        which API function (index into th_rob::api_calls, modulo)
//   byte 1        pointer flags: when the high nibble is 0xF, bit i of the low
//                 nibble passes the i-th pointer argument (output, or the
//                 th_conditions input) as NULL
//   then          the arguments in declaration order, each decoded by
//                 fuzz_source below: a double takes a tag byte and then 0, 2
//                 or 8 bytes (IEEE special values and thresholds, a plausible
//                 value for the argument's meaning, or raw bits: NaN payloads,
//                 denormals, huge, negative...), an int takes 1 or 5 bytes, a
//                 string takes a length byte (255 = NULL) and that many bytes.
//
// The contract checks live in api_calls.hpp; a violation aborts, which
// libFuzzer reports as a crash and saves the input. AddressSanitizer and
// UndefinedBehaviorSanitizer (no recovery) catch the rest.
//
// With TH_FUZZ_WRITE_SEEDS=<dir> in the environment the binary writes one
// seed input per API function into <dir> and exits (used by run_fuzz.sh).
#include "api_calls.hpp"

#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <string>

namespace {

class fuzz_source final : public th_rob::source {
  public:
    fuzz_source(const std::uint8_t *data, std::size_t size) : p_(data), n_(size) {
        const std::uint8_t flags = take();
        null_mask_ = (flags & 0xF0u) == 0xF0u ? (flags & 0x0Fu) : 0u;
    }

    double real(th_rob::kind k) override {
        if (n_ == 0) return th_rob::info(k).nominal;
        const std::uint8_t tag = take();
        switch (tag >> 5) {
        case 0:  // 32 special values
            exotic_ = true;
            return th_rob::special(tag & 31u);
        case 1:
        case 2: {  // raw IEEE bits
            exotic_ = true;
            std::uint64_t bits = 0;
            for (int i = 0; i < 8; ++i) bits = (bits << 8) | take();
            double v;
            std::memcpy(&v, &bits, sizeof v);
            return v;
        }
        default: {  // plausible for the argument's meaning
            const unsigned hi = take();
            const unsigned lo = take();
            const double u = static_cast<double>((hi << 8) | lo) / 65535.0;
            return th_rob::plausible(k, u, (tag & 1u) != 0);
        }
        }
    }

    int choice(int count, int nominal) override {
        if (n_ == 0) return nominal;
        const std::uint8_t b = take();
        // Mostly -1 .. count (just outside both ends included), some near
        // the top end, a few raw 32-bit values (INT_MIN, huge counts...).
        if (b < 200) return static_cast<int>(b % static_cast<unsigned>(count + 2)) - 1;
        if (b < 240) return count - 2 + static_cast<int>(b % 4u);
        std::uint32_t raw = 0;
        for (int i = 0; i < 4; ++i) raw = (raw << 8) | take();
        std::int32_t v;
        std::memcpy(&v, &raw, sizeof v);
        return v;
    }

    const char *text() override {
        if (n_ == 0) return "";
        const std::uint8_t len = take();
        if (len == 255) return nullptr;
        const std::size_t m = len < n_ ? len : n_;
        text_.assign(reinterpret_cast<const char *>(p_), m);  // may hold NULs
        p_ += m;
        n_ -= m;
        return text_.c_str();
    }

    bool null_pointer() override {
        const bool null = (null_mask_ >> (pointer_index_ & 3u)) & 1u;
        ++pointer_index_;
        return null;
    }

    // True once a special value or raw bits were drawn (as opposed to only
    // plausible and nominal values).
    bool exotic() const { return exotic_; }

  private:
    std::uint8_t take() {
        if (n_ == 0) return 0;
        --n_;
        return *p_++;
    }

    const std::uint8_t *p_;
    std::size_t n_;
    unsigned null_mask_ = 0;
    unsigned pointer_index_ = 0;
    bool exotic_ = false;
    std::string text_;
};

// TH_FUZZ_EXPLAIN=1: print every argument as it is drawn and the status
// (replay one input: TH_FUZZ_EXPLAIN=1 build-fuzz/th_fuzz <file>).
class explaining_source final : public th_rob::source {
  public:
    explicit explaining_source(th_rob::source &inner) : inner_(inner) {}
    double real(th_rob::kind k) override {
        const double v = inner_.real(k);
        std::printf("  real   %.17g\n", v);
        return v;
    }
    int choice(int count, int nominal) override {
        const int v = inner_.choice(count, nominal);
        std::printf("  choice %d (of %d)\n", v, count);
        return v;
    }
    const char *text() override {
        const char *v = inner_.text();
        std::printf("  text   %s%s%s\n", v ? "\"" : "", v ? v : "NULL", v ? "\"" : "");
        return v;
    }
    bool null_pointer() override {
        const bool v = inner_.null_pointer();
        std::printf("  pointer %s\n", v ? "NULL" : "valid");
        return v;
    }

  private:
    th_rob::source &inner_;
};
bool explain = false;

// TH_FUZZ_STATS=1: count the statuses each function returned and print the
// table at exit (replay a corpus with -runs=0 to survey it). TH_ERR_INTERNAL
// ("please report") or TH_ERR_NO_CONVERGENCE from only plausible argument
// values are worth a look; TH_FUZZ_SUSPECT_DIR=<dir> saves those inputs
// (with TH_FUZZ_SUSPECT_ALL=1 also those from special or raw values).
constexpr int n_codes = 8;  // OK, WARN, then errors 10..15
long status_counts[th_rob::api_call_count][n_codes];
long plausible_internal[th_rob::api_call_count];
bool stats_enabled = false;
bool suspect_all = false;
const char *suspect_dir = nullptr;

int code_index(int st) { return st <= 1 ? st : st - 8; }

void print_stats() {
    std::printf("\n%-36s %8s %8s %8s %8s %8s %8s %8s %8s %s\n", "function", "OK", "WARN", "INPUT",
                "METHOD", "NOCONV", "UNREACH", "STATE", "INTERNAL", "internal(plausible args)");
    for (std::size_t f = 0; f < th_rob::api_call_count; ++f) {
        std::printf("%-36s", th_rob::api_calls[f].name);
        for (int c = 0; c < n_codes; ++c) std::printf(" %8ld", status_counts[f][c]);
        std::printf(" %ld\n", plausible_internal[f]);
    }
}

void save_suspect(const std::uint8_t *data, std::size_t size) {
    if (!suspect_dir) return;
    static int n = 0;
    const std::string path = std::string(suspect_dir) + "/suspect-" + std::to_string(n++);
    if (std::FILE *f = std::fopen(path.c_str(), "wb")) {
        std::fwrite(data, 1, size, f);
        std::fclose(f);
    }
}

void write_seeds(const char *dir) {
    for (std::size_t i = 0; i < th_rob::api_call_count; ++i) {
        const std::string path = std::string(dir) + "/seed_" + th_rob::api_calls[i].name;
        std::FILE *f = std::fopen(path.c_str(), "wb");
        if (!f) {
            std::perror(path.c_str());
            std::exit(1);
        }
        // Function index, no NULL pointers, then nominal arguments.
        const unsigned char seed[2] = {static_cast<unsigned char>(i), 0};
        std::fwrite(seed, 1, sizeof seed, f);
        std::fclose(f);
    }
    std::printf("wrote %zu seeds to %s\n", th_rob::api_call_count, dir);
    // Smoke run of every seed: a contract violation aborts here already.
    for (std::size_t i = 0; i < th_rob::api_call_count; ++i) {
        const std::uint8_t seed[2] = {static_cast<std::uint8_t>(i), 0};
        fuzz_source src(seed + 1, 1);
        th_rob::outcome o;
        th_rob::api_calls[i].call(src, o);
    }
    std::exit(0);
}

}  // namespace

extern "C" int LLVMFuzzerInitialize(int *, char ***) {
    static_assert(th_rob::api_call_count <= 256, "dispatch uses one byte");
    th_rob::skip_known_issues = std::getenv("TH_FUZZ_REPORT_KNOWN") == nullptr;
    explain = std::getenv("TH_FUZZ_EXPLAIN") != nullptr;
    if (std::getenv("TH_FUZZ_STATS")) {
        stats_enabled = true;
        suspect_dir = std::getenv("TH_FUZZ_SUSPECT_DIR");
        suspect_all = std::getenv("TH_FUZZ_SUSPECT_ALL") != nullptr;
        std::atexit(print_stats);
    }
    if (const char *dir = std::getenv("TH_FUZZ_WRITE_SEEDS")) write_seeds(dir);
    return 0;
}

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t *data, std::size_t size) {
    if (size == 0) return 0;
    const std::size_t f = data[0] % th_rob::api_call_count;
    fuzz_source src(data + 1, size - 1);
    th_rob::outcome o;
    if (explain) {
        std::printf("%s\n", th_rob::api_calls[f].name);
        explaining_source ex(src);
        th_rob::api_calls[f].call(ex, o);
        std::printf("  -> status %d\n", o.status);
    } else {
        th_rob::api_calls[f].call(src, o);
    }
    if (stats_enabled && th_rob::status_is_defined(o.status)) {
        ++status_counts[f][code_index(o.status)];
        if (o.status == TH_ERR_INTERNAL || o.status == TH_ERR_NO_CONVERGENCE) {
            if (!src.exotic()) ++plausible_internal[f];
            if (!src.exotic() || suspect_all) save_suspect(data, size);
        }
    }
    return 0;
}
