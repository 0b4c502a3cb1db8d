// th_test.hpp - small helpers shared by the unit tests: reading the
// generated reference tables in tests/reference and checking the C API's
// output contract.
#ifndef TH_TEST_HPP
#define TH_TEST_HPP

#include "tubeheat.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <cstdlib>
#include <fstream>
#include <sstream>
#include <string>
#include <vector>

namespace th_test {

// A reference table: '#' lines are comments (they carry the generating
// command and the source), the first other line holds column names, the
// rest comma-separated numbers.
struct table {
    std::vector<std::string> columns;
    std::vector<std::vector<double>> rows;
    std::size_t col(const std::string &name) const {
        for (std::size_t i = 0; i < columns.size(); ++i)
            if (columns[i] == name) return i;
        FAIL("column " << name << " not in reference table");
        return 0;
    }
};

inline std::string reference_path(const std::string &file) {
    const char *dir = std::getenv("TH_REFERENCE_DIR");
    return std::string(dir ? dir : TH_REFERENCE_DIR) + "/" + file;
}

inline table read_table(const std::string &file) {
    table t;
    std::ifstream in(reference_path(file));
    REQUIRE(in.good());
    std::string line;
    while (std::getline(in, line)) {
        if (line.empty() || line[0] == '#') continue;
        std::stringstream ss(line);
        std::string cell;
        if (t.columns.empty()) {
            while (std::getline(ss, cell, ',')) t.columns.push_back(cell);
            continue;
        }
        std::vector<double> row;
        while (std::getline(ss, cell, ',')) row.push_back(std::stod(cell));
        REQUIRE(row.size() == t.columns.size());
        t.rows.push_back(row);
    }
    REQUIRE(!t.rows.empty());
    return t;
}

inline double rel_err(double got, double want) {
    return std::fabs(got - want) / std::fabs(want);
}

// Records one external check for docs/validation.md: what was compared, the
// source, the largest deviation measured and the tolerance asserted. When
// TH_VALIDATION_LOG names a file, one tab-separated line is appended per
// call; otherwise nothing is written. Call it next to the REQUIRE/CHECK
// that asserts the same tolerance.
inline void record(const std::string &check, const std::string &source,
                   double max_deviation, double tolerance,
                   const std::string &kind = "relative") {
    const char *log = std::getenv("TH_VALIDATION_LOG");
    if (log == nullptr || *log == '\0') return;
    std::ofstream out(log, std::ios::app);
    out << check << '\t' << source << '\t' << max_deviation << '\t'
        << tolerance << '\t' << kind << '\n';
}

// The output contract: a success or warning code comes with a finite value.
inline bool success(int status) { return status == TH_OK || status == TH_WARN_RANGE; }

}  // namespace th_test

#endif
