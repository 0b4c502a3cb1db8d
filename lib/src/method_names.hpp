// method_names.hpp - the published-name tables behind every
// th_*_method_from_name / th_*_method_name pair: one lookup, one display
// name per id. Not installed.
#ifndef TUBEHEAT_METHOD_NAMES_HPP
#define TUBEHEAT_METHOD_NAMES_HPP

#include "internal.hpp"

#include <cstddef>

namespace th {

struct method_name {
    int id;
    const char *name;
};

// Display names indexed by id: the first entry of each id in a name list
// (later entries are accepted aliases). Built at compile time, so naming the
// method of every result costs an array read, not a search.
template <int Count>
struct display_names {
    const char *name[Count];
    const char *operator()(int id) const { return id >= 0 && id < Count ? name[id] : nullptr; }
};

template <int Count, std::size_t N>
constexpr display_names<Count> index_names(const method_name (&list)[N]) {
    display_names<Count> t{};
    for (const auto &m : list)
        if (m.id >= 0 && m.id < Count && t.name[m.id] == nullptr) t.name[m.id] = m.name;
    return t;
}

// The C entry point of a lookup by name (case-insensitive, '-', '_', ' ' and
// '.' ignored): TH_ERR_METHOD when no name matches.
template <std::size_t N>
int method_from_name(const method_name (&list)[N], const char *name, int *method) {
    return guard([&] {
        need_out(method);
        need(name != nullptr);
        for (const auto &m : list)
            if (name_matches(name, m.name)) {
                *method = m.id;
                return TH_OK;
            }
        fail(TH_ERR_METHOD);
    });
}

}  // namespace th

#endif
