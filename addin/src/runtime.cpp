// runtime.cpp - argument conversion, checks, error mapping and the TH.WHY /
// TH.STATUS explanations shared by every generated function.
#include "runtime.hpp"

#include <com/sun/star/lang/IllegalArgumentException.hpp>
#include <com/sun/star/sheet/NoConvergenceException.hpp>
#include <com/sun/star/uno/RuntimeException.hpp>
#include <rtl/ustrbuf.hxx>

#include <cctype>
#include <charconv>
#include <cmath>
#include <cstdio>
#include <limits>
#include <string>

namespace th_addin {

namespace {

std::string utf8(const OUString &s) {
    return std::string(OUStringToOString(s, RTL_TEXTENCODING_UTF8).getStr());
}

OUString from_utf8(const std::string &s) {
    return OUString(s.c_str(), static_cast<sal_Int32>(s.size()),
                    RTL_TEXTENCODING_UTF8);
}

std::string fmt(double v) {
    if (std::isinf(v)) return v > 0 ? "inf" : "-inf";
    char buf[40];
    std::snprintf(buf, sizeof buf, "%.6g", v);
    return buf;
}

// The matching rule of the library's method names: case-insensitive, with
// '-', '_', '.' and ' ' ignored.
std::string normalised(const std::string &s) {
    std::string out;
    for (char ch : s) {
        if (ch == '-' || ch == '_' || ch == '.' || ch == ' ') continue;
        out += static_cast<char>(std::tolower(static_cast<unsigned char>(ch)));
    }
    return out;
}

// Text that is exactly one number in the C locale ("20000", " 1.5e-3 "):
// Calc converts such text itself for double parameters, so the add-in does
// the same for the parameters that arrive as any, and cell and companions
// agree.
bool numeric_text(const std::string &s, double &v) {
    std::size_t b = 0, e = s.size();
    while (b < e && std::isspace(static_cast<unsigned char>(s[b]))) ++b;
    while (e > b && std::isspace(static_cast<unsigned char>(s[e - 1]))) --e;
    if (b == e) return false;
    const char *first = s.data() + b;
    if (*first == '+') ++first;  // from_chars takes no leading '+'
    double d = 0.0;
    const auto r = std::from_chars(first, s.data() + e, d);
    if (r.ec != std::errc() || r.ptr != s.data() + e || !std::isfinite(d)) return false;
    v = d;
    return true;
}

// A 1x1 range arrives as a nested sequence: treat it as its single value.
const uno::Any &unwrap(const uno::Any &v) {
    if (v.getValueTypeClass() == uno::TypeClass_SEQUENCE) {
        const auto *rows =
            static_cast<const uno::Sequence<uno::Sequence<uno::Any>> *>(
                v.getValue());
        if (v.getValueType() ==
                cppu::UnoType<uno::Sequence<uno::Sequence<uno::Any>>>::get() &&
            rows->getLength() == 1 && (*rows)[0].getLength() == 1)
            return (*rows)[0][0];
    }
    return v;
}

const char *describe_check(Check c) {
    switch (c) {
    case Check::positive: return "> 0";
    case Check::nonnegative: return ">= 0";
    case Check::positive_or_inf: return "> 0 (or the text \"inf\")";
    case Check::finite: break;
    }
    return "a finite number";
}

bool passes(Check c, double v) {
    switch (c) {
    case Check::finite: return std::isfinite(v);
    case Check::positive: return std::isfinite(v) && v > 0.0;
    case Check::nonnegative: return std::isfinite(v) && v >= 0.0;
    case Check::positive_or_inf: return !std::isnan(v) && v > 0.0;
    }
    return false;
}

std::string got_text(const uno::Any &v) {
    OUString s;
    double d = 0.0;
    if (v >>= s) return "the text \"" + utf8(s) + "\"";
    if (v.getValueTypeClass() != uno::TypeClass_STRING && (v >>= d)) {
        std::string t = "the number " + fmt(d);
        if (d == 0.0) t += " (an empty cell counts as 0)";
        return t;
    }
    if (v.getValueTypeClass() == uno::TypeClass_SEQUENCE) return "a cell range";
    return "a value of type " + utf8(v.getValueTypeName());
}

}  // namespace

// ---------------------------------------------------------------- Args
bool Args::given(int i) const {
    return i < count_ && unwrap(values_[i]).hasValue();
}

bool Args::reject(int i, int status, bool wrong_type, const std::string &why) {
    o_.status = status;
    o_.wrong_type = wrong_type;
    std::string where = "argument " + std::to_string(i + 1);
    if (i < fn_.arg_count) {
        const ArgInfo &ai = fn_.args[i];
        where += " (" + std::string(ai.label);
        if (std::string(ai.unit) != "-" && std::string(ai.unit) != "text")
            where += std::string(" [") + ai.unit + "]";
        where += ")";
    }
    o_.detail = where + " " + why;
    return false;
}

bool Args::number(int i, Check check, double &v) {
    if (!given(i))
        return reject(i, TH_ERR_INPUT, false, "is missing");
    const uno::Any &a = unwrap(values_[i]);
    OUString s;
    if (a >>= s) {
        const std::string n = normalised(utf8(s));
        if (check == Check::positive_or_inf &&
            (n == "inf" || n == "infinite" || n == "infinity")) {
            v = std::numeric_limits<double>::infinity();
            return true;
        }
        double parsed = 0.0;
        if (numeric_text(utf8(s), parsed)) {
            if (!passes(check, parsed))
                return reject(i, TH_ERR_INPUT, false,
                              std::string("must be ") + describe_check(check) +
                                  "; got " + got_text(a));
            v = parsed;
            return true;
        }
        return reject(i, TH_ERR_INPUT, true,
                      "expects a number; got " + got_text(a));
    }
    double d = 0.0;
    if (a.getValueTypeClass() == uno::TypeClass_SEQUENCE || !(a >>= d))
        return reject(i, TH_ERR_INPUT, true,
                      "expects a single number; got " + got_text(a));
    if (!passes(check, d))
        return reject(i, TH_ERR_INPUT, false,
                      std::string("must be ") + describe_check(check) +
                          "; got " + got_text(a));
    v = d;
    return true;
}

bool Args::opt_number(int i, Check check, double fallback, double &v) {
    if (!given(i)) {
        v = fallback;
        return true;
    }
    return number(i, check, v);
}

bool Args::text_of(int i, std::string &s, const char *expected) {
    if (!given(i))
        return reject(i, TH_ERR_INPUT, false, "is missing");
    const uno::Any &a = unwrap(values_[i]);
    OUString u;
    double d = 0.0;
    if (a >>= u) {
        s = utf8(u);
    } else if (!fn_.args[i].optional && a.getValueTypeClass() == uno::TypeClass_DOUBLE &&
               (a >>= d)) {
        // A required text argument is declared `string`: Calc hands such a
        // cell over as text (an empty cell as ""). TH.WHY receives the raw
        // number; read it the same way so both report the same problem.
        s = d == 0.0 ? std::string() : fmt(d);
    } else {
        return reject(i, TH_ERR_INPUT, true,
                      std::string("expects text such as ") + expected +
                          "; got " + got_text(a));
    }
    if (normalised(s).empty())
        return reject(i, TH_ERR_INPUT, false,
                      std::string("is empty (an empty cell?); give text such as ") +
                          expected);
    return true;
}

bool Args::choice(int i, const ChoiceTable &table, int &v) {
    std::string s;
    if (!text_of(i, s, table.listing)) return false;
    const std::string n = normalised(s);
    for (int k = 0; k < table.count; ++k) {
        if (normalised(table.entries[k].text) == n) {
            v = table.entries[k].value;
            return true;
        }
    }
    return reject(i, TH_ERR_METHOD, false,
                  "does not know \"" + s + "\"; use one of " + table.listing);
}

bool Args::opt_choice(int i, const ChoiceTable &table, int fallback, int &v) {
    if (!given(i)) {
        v = fallback;
        return true;
    }
    return choice(i, table, v);
}

bool Args::method(int i, const MethodTable &table, int &v) {
    std::string s;
    if (!text_of(i, s, "a method name")) return false;
    int id = 0;
    const int st = table.from_name(s.c_str(), &id);
    if (TH_FAILED(st))
        return reject(i, TH_ERR_METHOD, false,
                      "names no known method: \"" + s + "\"; known: " +
                          table.listing);
    v = id;
    return true;
}

bool Args::opt_method(int i, const MethodTable &table, const char *fallback,
                      int &v) {
    if (!given(i)) {
        int id = 0;
        const int st = table.from_name(fallback, &id);
        if (TH_FAILED(st)) {
            o_.status = TH_ERR_INTERNAL;
            o_.detail = std::string("default method \"") + fallback +
                        "\" is unknown to the library";
            return false;
        }
        v = id;
        return true;
    }
    return method(i, table, v);
}

bool Args::init_ok(int status) {
    if (!TH_FAILED(status)) return true;
    o_.status = status;
    o_.detail = "initialising the conditions failed";
    return false;
}

// ---------------------------------------------------------------- evaluate
Outcome evaluate(const FunctionInfo &fn, const uno::Any *values, int count) {
    Outcome o;
    try {
        if (count > fn.arg_count) {
            o.status = TH_ERR_INPUT;
            o.detail = std::string(fn.display) + " takes at most " +
                       std::to_string(fn.arg_count) + " arguments; got " +
                       std::to_string(count);
            return o;
        }
        Args a(values, count, fn, o);
        fn.eval(a, o);
        if (!TH_FAILED(o.status) && fn.result_type == ResultType::number &&
            !std::isfinite(o.value)) {
            // The library promises finite results; never pass on a NaN.
            o.status = TH_ERR_INTERNAL;
            o.detail = "the library returned a non-finite value";
        }
    } catch (...) {
        o = Outcome();
        o.status = TH_ERR_INTERNAL;
        o.detail = "unexpected exception in the add-in";
    }
    return o;
}

// ---------------------------------------------------------------- cells
namespace {

// What the cell shows for an outcome; kept next to finish_* so TH.WHY
// names exactly the error the cell carries.
const char *cell_error(const Outcome &o) {
    if (o.wrong_type) return "#VALUE!";
    switch (o.status) {
    case TH_OK:
    case TH_WARN_RANGE: return "";
    case TH_ERR_INPUT:
    case TH_ERR_METHOD: return "Err:502";
    case TH_ERR_NO_CONVERGENCE: return "Err:523";
    case TH_ERR_UNREACHABLE:
    case TH_ERR_STATE: return "#NUM!";
    default: return "#VALUE!";
    }
}

OUString message(const Outcome &o) {
    std::string m = th_status_message(o.status);
    if (!o.detail.empty()) m = o.detail + " (" + m + ")";
    return from_utf8(m);
}

[[noreturn]] void throw_for(const Outcome &o) {
    if (o.wrong_type)
        throw uno::RuntimeException(message(o));
    switch (o.status) {
    case TH_ERR_INPUT:
    case TH_ERR_METHOD:
        throw ::com::sun::star::lang::IllegalArgumentException(
            message(o), uno::Reference<uno::XInterface>(), 0);
    case TH_ERR_NO_CONVERGENCE:
        throw ::com::sun::star::sheet::NoConvergenceException(
            message(o), uno::Reference<uno::XInterface>());
    default:
        throw uno::RuntimeException(message(o));
    }
}

bool shows_num_error(const Outcome &o) {
    return !o.wrong_type &&
           (o.status == TH_ERR_UNREACHABLE || o.status == TH_ERR_STATE);
}

}  // namespace

double finish_number(const Outcome &o) {
    if (!o.wrong_type && !TH_FAILED(o.status)) return o.value;
    // Calc shows a NaN result as #NUM!: the spreadsheet's own error for
    // "no such number", used here for unreachable targets and states.
    if (shows_num_error(o)) return std::numeric_limits<double>::quiet_NaN();
    throw_for(o);
}

uno::Any finish_text(const Outcome &o) {
    if (!o.wrong_type && !TH_FAILED(o.status)) {
        if (o.text != nullptr) return uno::Any(OUString::createFromAscii(o.text));
        return uno::Any(from_utf8(o.text_owned));
    }
    if (shows_num_error(o))
        return uno::Any(std::numeric_limits<double>::quiet_NaN());
    throw_for(o);
}

uno::Any finish_array(const Outcome &o) {
    if (!o.wrong_type && !TH_FAILED(o.status)) return uno::Any(o.array);
    if (shows_num_error(o))
        return uno::Any(std::numeric_limits<double>::quiet_NaN());
    throw_for(o);
}

// ---------------------------------------------------------------- WHY
const FunctionInfo *find_function(const OUString &name) {
    std::string want = normalised(utf8(name));
    if (want.rfind("th", 0) != 0) want = "th" + want;  // prefix optional
    int n = 0;
    const FunctionInfo *const *all = all_functions(n);
    for (int k = 0; k < n; ++k) {
        if (normalised(all[k]->display) == want) return all[k];
        // The programmatic name (ORG.TUBEHEAT.CALCFUNCTIONS.ID) also works.
        if (normalised(std::string("orgtubeheatcalcfunctions") + all[k]->id) ==
            normalised(utf8(name)))
            return all[k];
    }
    return nullptr;
}

OUString explain(const OUString &function_name,
                 const uno::Sequence<uno::Any> &arguments) {
    const FunctionInfo *fn = find_function(function_name);
    if (fn == nullptr)
        return from_utf8("ERROR: no function named \"" + utf8(function_name) +
                         "\"; give the name as text, e.g. \"TH.NUSSELT\"");
    const Outcome o =
        evaluate(*fn, arguments.getConstArray(), arguments.getLength());
    std::string t;
    if (o.wrong_type || TH_FAILED(o.status)) {
        t = std::string("ERROR ") + cell_error(o) + ": ";
        // The add-in's own finding names the argument; otherwise the
        // library's status text is the explanation.
        t += o.detail.empty() ? th_status_message(o.status) : o.detail;
    } else {
        std::string value;
        switch (fn->result_type) {
        case ResultType::number: value = "value " + fmt(o.value); break;
        case ResultType::text:
            value = std::string("\"") + (o.text ? o.text : o.text_owned) + "\"";
            break;
        case ResultType::array:
            value = "a table of " + std::to_string(o.array.getLength()) + " rows";
            break;
        }
        if (o.status == TH_WARN_RANGE) {
            t = "WARNING: " + value +
                " shown, but it is an extrapolation outside the method's "
                "published validity range";
            if (o.range_note && *o.range_note)
                t += std::string(": ") + o.range_note;
        } else {
            t = "OK: " + value;
        }
    }
    if (o.method_used && *o.method_used) {
        t += std::string(". Method: ") + o.method_used;
        if (o.reason && *o.reason) t += std::string(" (") + o.reason + ")";
    }
    return from_utf8(t);
}

double status_of(const OUString &function_name,
                 const uno::Sequence<uno::Any> &arguments) {
    const FunctionInfo *fn = find_function(function_name);
    if (fn == nullptr)
        throw ::com::sun::star::lang::IllegalArgumentException(
            "TH.STATUS: no function named \"" + function_name + "\"",
            uno::Reference<uno::XInterface>(), 0);
    const Outcome o =
        evaluate(*fn, arguments.getConstArray(), arguments.getLength());
    return static_cast<double>(o.status);
}

}  // namespace th_addin
