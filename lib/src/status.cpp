// status.cpp - status texts, version, and the name matching shared by every
// method-name lookup.
#include "internal.hpp"

#include <cctype>

extern "C" {

int th_version(void) { return TH_VERSION_NUMBER; }

const char *th_version_string(void) { return TH_VERSION_STRING; }

const char *th_status_message(int status) {
    switch (status) {
    case TH_OK:
        return "success";
    case TH_WARN_RANGE:
        return "computed, but outside the method's published validity range "
               "(the value is an extrapolation)";
    case TH_ERR_INPUT:
        return "bad input: an argument is missing, not a finite number, "
               "zero or negative where that has no physical meaning, "
               "inconsistent with another argument, or so extreme that the "
               "result is not representable";
    case TH_ERR_METHOD:
        return "unknown method";
    case TH_ERR_NO_CONVERGENCE:
        return "no convergence: an iteration or root search did not reach "
               "its tolerance";
    case TH_ERR_UNREACHABLE:
        return "target unreachable: no solution gives the requested value";
    case TH_ERR_STATE:
        return "state outside the fluid formulation (wrong phase, or "
               "temperature or pressure outside its range)";
    case TH_ERR_INTERNAL:
        return "internal numerical failure";
    default:
        return "unknown status code";
    }
}

}  // extern "C"

namespace th {

bool name_matches(const char *given, const char *canonical) noexcept {
    if (given == nullptr || canonical == nullptr) return false;
    auto skip = [](const char *&p) {
        while (*p == '-' || *p == '_' || *p == ' ' || *p == '.') ++p;
    };
    const char *a = given;
    const char *b = canonical;
    for (;;) {
        skip(a);
        skip(b);
        if (*a == '\0' || *b == '\0') return *a == '\0' && *b == '\0';
        if (std::tolower(static_cast<unsigned char>(*a)) !=
            std::tolower(static_cast<unsigned char>(*b)))
            return false;
        ++a;
        ++b;
    }
}

}  // namespace th
