// runtime.hpp - the hand-written half of the spreadsheet dispatch: argument
// conversion and checking, the outcome of one call, and how an outcome turns
// into what a Calc cell shows. The generated dispatch.cpp (from the
// catalogue, addin/catalogue/*.toml) calls only what is declared here.
#ifndef TUBEHEAT_ADDIN_RUNTIME_HPP
#define TUBEHEAT_ADDIN_RUNTIME_HPP

#include "tubeheat.h"

#include <com/sun/star/uno/Any.hxx>
#include <com/sun/star/uno/Sequence.hxx>
#include <rtl/ustring.hxx>

#include <string>

namespace th_addin {

namespace uno = ::com::sun::star::uno;
using ::rtl::OUString;

// Argument checks named in the catalogue (`check = ...`).
enum class Check { finite, positive, nonnegative, positive_or_inf };

// One text choice: the canonical text, or an alias, and the C value.
struct ChoiceEntry {
    const char *text;
    int value;
};
struct ChoiceTable {
    const char *key;
    const ChoiceEntry *entries;  // canonical texts first, then aliases
    int count;
    const char *listing;         // "\"T\", \"H\"" for messages
};

// A method-name lookup (th_*_method_from_name) and the documented names.
struct MethodTable {
    int (*from_name)(const char *, int *);
    const char *(*name_of)(int);  // may be null
    const char *listing;
};

// Static description of one argument (for messages and TH.WHY).
struct ArgInfo {
    const char *name;   // IDL name
    const char *label;  // Function Wizard label
    const char *unit;
    bool optional;
};

// The result of evaluating one catalogue function for one set of arguments.
struct Outcome {
    int status = TH_OK;          // th_status (add-in rejections: TH_ERR_INPUT
                                 // or TH_ERR_METHOD with `detail` set)
    bool wrong_type = false;     // text/range given where a number is due
    std::string detail;          // which argument was rejected and why
    double value = 0.0;          // number result
    const char *text = nullptr;  // text result (static)
    std::string text_owned;      // text result built at run time
    uno::Sequence<uno::Sequence<uno::Any>> array;  // array result
    const char *method_used = nullptr;
    const char *reason = nullptr;
    const char *range_note = nullptr;
};

enum class ResultType { number, text, array };

class Args;
struct FunctionInfo {
    const char *display;  // TH.NUSSELT
    const char *id;       // nusselt
    void (*eval)(Args &, Outcome &);
    const ArgInfo *args;
    int arg_count;
    int required_count;
    ResultType result_type;
};

// Typed access to the arguments of one call. Every accessor returns false
// after recording the problem in the Outcome; the generated code then
// returns at once, so the library is never called with a bad value.
class Args {
  public:
    Args(const uno::Any *values, int count, const FunctionInfo &fn, Outcome &o)
        : values_(values), count_(count), fn_(fn), o_(o) {}

    bool given(int i) const;
    bool number(int i, Check check, double &v);
    bool opt_number(int i, Check check, double fallback, double &v);
    bool choice(int i, const ChoiceTable &table, int &v);
    bool opt_choice(int i, const ChoiceTable &table, int fallback, int &v);
    bool method(int i, const MethodTable &table, int &v);
    bool opt_method(int i, const MethodTable &table, const char *fallback,
                    int &v);
    // Status of an init function on a local struct (th_conditions_init).
    bool init_ok(int status);

  private:
    bool reject(int i, int status, bool wrong_type, const std::string &why);
    bool text_of(int i, std::string &s, const char *expected);
    const uno::Any *values_;
    int count_;
    const FunctionInfo &fn_;
    Outcome &o_;
};

// Run one function on arguments given as Anys (used by the typed UNO
// methods and by TH.WHY / TH.STATUS alike, so both see the same checks).
Outcome evaluate(const FunctionInfo &fn, const uno::Any *values, int count);

// Turn an outcome into the cell: the value, or the exception / NaN that
// makes Calc show the documented error.
double finish_number(const Outcome &o);
uno::Any finish_text(const Outcome &o);
uno::Any finish_array(const Outcome &o);

// Labelled report rows (a th_* struct with label, value, unit, is_text and
// text, as th_tube_report fills them) as a 3-column array: label, value or
// text, unit. Used by catalogue entries with `report = ...`.
template <class Row>
uno::Sequence<uno::Sequence<uno::Any>> rows_to_array(const Row *rows, int n) {
    if (n < 0) n = 0;
    uno::Sequence<uno::Sequence<uno::Any>> t(n);
    auto *out = t.getArray();
    for (int i = 0; i < n; ++i) {
        uno::Sequence<uno::Any> r(3);
        auto *c = r.getArray();
        c[0] <<= OUString::createFromAscii(rows[i].label ? rows[i].label : "");
        if (rows[i].is_text)
            c[1] <<= OUString::createFromAscii(rows[i].text ? rows[i].text : "");
        else
            c[1] <<= rows[i].value;
        c[2] <<= OUString::createFromAscii(rows[i].unit ? rows[i].unit : "");
        out[i] = r;
    }
    return t;
}

// The generated registry of every catalogue function.
const FunctionInfo *const *all_functions(int &count);
const FunctionInfo *find_function(const OUString &name);

// TH.WHY and TH.STATUS.
OUString explain(const OUString &function_name,
                 const uno::Sequence<uno::Any> &arguments);
double status_of(const OUString &function_name,
                 const uno::Sequence<uno::Any> &arguments);

}  // namespace th_addin

#endif
