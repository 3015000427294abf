#include "core/model_spec.h"

#include <fmt/format.h>
#include <fmt/ranges.h>
#include <cmath>
#include <memory>
#include <set>

#include "core/models/corresponding_states.h"
#include "core/models/melting.h"
#include "core/models/vapor_pressure.h"

namespace pw {

namespace {

// Reads the parameters of one spec, converting units and checking every value.
class SpecReader {
public:
    explicit SpecReader(const ModelSpec &spec) : spec_(spec) {}

    double number(const std::string &name) const {
        const auto it = spec_.scalars.find(name);
        if (it == spec_.scalars.end()) fail(name, "missing parameter '" + name + "'");
        if (!std::isfinite(it->second)) fail(name, "parameter '" + name + "' is not finite");
        return it->second;
    }
    double optional(const std::string &name, double fallback) const {
        return spec_.scalars.count(name) != 0 ? number(name) : fallback;
    }
    double nonZero(const std::string &name) const {
        const double v = number(name);
        if (v == 0.0) fail(name, "parameter '" + name + "' must not be zero");
        return v;
    }
    double temperature(const std::string &name) const {
        const double T = toKelvin(number(name), spec_.tUnit);
        if (!(T > 0.0)) fail(name, fmt::format("temperature '{}' must be above 0 K", name));
        return T;
    }
    double pressure(const std::string &name) const {
        const double p = toPascal(number(name), spec_.pUnit);
        if (!(p > 0.0)) fail(name, fmt::format("pressure '{}' must be positive", name));
        return p;
    }
    bool has(const std::string &name) const {
        return spec_.arrays.count(name) != 0 || spec_.scalars.count(name) != 0 ||
               spec_.strings.count(name) != 0 || spec_.flags.count(name) != 0;
    }
    std::vector<double> array(const std::string &name) const {
        const auto it = spec_.arrays.find(name);
        if (it == spec_.arrays.end()) fail(name, "missing array parameter '" + name + "'");
        if (it->second.empty()) fail(name, "array '" + name + "' is empty");
        for (double v : it->second) {
            if (!std::isfinite(v)) fail(name, "array '" + name + "' holds a non-finite value");
        }
        return it->second;
    }
    // Two arrays that go together: same, non-zero length.
    void sameLength(const std::vector<double> &a, const std::vector<double> &b,
                    const std::string &bName) const {
        if (a.size() != b.size()) {
            fail(bName,
                 fmt::format("array '{}' has {} values but 'a' has {}", bName, b.size(), a.size()));
        }
    }
    std::string text(const std::string &name) const {
        const auto it = spec_.strings.find(name);
        if (it == spec_.strings.end()) fail(name, "missing parameter '" + name + "'");
        return it->second;
    }
    bool flag(const std::string &name) const {
        const auto it = spec_.flags.find(name);
        return it != spec_.flags.end() && it->second;
    }
    // Every parameter given must be one the form uses.
    void onlyKnown(const std::set<std::string> &known) const {
        auto check = [&](const auto &map) {
            for (const auto &entry : map) {
                if (known.count(entry.first) == 0) {
                    fail(entry.first, fmt::format("parameter '{}' is not used by model '{}' "
                                                  "(expected: {})",
                                                  entry.first, spec_.form, fmt::join(known, ", ")));
                }
            }
        };
        check(spec_.scalars);
        check(spec_.arrays);
        check(spec_.strings);
        check(spec_.flags);
    }
    [[noreturn]] void fail(const std::string &parameter, const std::string &what) const {
        throw ModelSpecError(parameter, "model '" + spec_.form + "': " + what);
    }
    const ModelSpec &spec() const { return spec_; }

private:
    const ModelSpec &spec_;
};

BoundaryModelPtr makeWagner(const SpecReader &r) {
    r.onlyKnown({"T_ref", "P_ref", "a", "exponents", "exponent_set"});
    const auto a = r.array("a");
    std::vector<double> e;
    if (r.has("exponent_set")) {
        if (r.has("exponents")) r.fail("exponents", "give 'exponents' or 'exponent_set', not both");
        const std::string set = r.text("exponent_set");
        if (set == "1-1.5-3-6") {
            e = {1.0, 1.5, 3.0, 6.0};
        } else if (set == "1-1.5-2.5-5") {
            e = {1.0, 1.5, 2.5, 5.0};
        } else {
            r.fail("exponent_set", "unknown exponent_set '" + set +
                                       "' (expected \"1-1.5-3-6\" or \"1-1.5-2.5-5\")");
        }
    } else {
        e = r.array("exponents");
    }
    r.sameLength(a, e, r.has("exponent_set") ? "exponent_set" : "exponents");
    return std::make_shared<WagnerModel>(r.temperature("T_ref"), r.pressure("P_ref"), a, e);
}

BoundaryModelPtr makeIapwsSublimation(const SpecReader &r) {
    r.onlyKnown({"T_ref", "P_ref", "a", "b"});
    const auto a = r.array("a");
    const auto b = r.array("b");
    r.sameLength(a, b, "b");
    return std::make_shared<IapwsSublimationModel>(r.temperature("T_ref"), r.pressure("P_ref"), a,
                                                   b);
}

BoundaryModelPtr makeAntoine(const SpecReader &r, bool extended) {
    if (extended) {
        r.onlyKnown({"base", "A", "B", "C", "D", "E", "F"});
    } else {
        r.onlyKnown({"base", "A", "B", "C"});
    }
    AntoineCoefficients c;
    const std::string base = r.text("base");
    if (base == "10") {
        c.base = 10.0;
    } else if (base == "e") {
        c.base = std::exp(1.0);
    } else {
        r.fail("base", "unknown base '" + base + "' (expected \"10\" or \"e\")");
    }
    c.A = r.number("A");
    c.B = r.number("B");
    c.C = extended ? r.optional("C", 0.0) : r.number("C");
    c.D = r.optional("D", 0.0);
    c.E = r.optional("E", 0.0);
    c.F = r.optional("F", 0.0);
    c.tUnit = r.spec().tUnit;
    c.pUnit = r.spec().pUnit;
    if (!extended && !(c.B > 0.0)) r.fail("B", "parameter 'B' must be positive");
    return std::make_shared<AntoineModel>(extended ? "antoine-extended" : "antoine", c);
}

BoundaryModelPtr makeClausiusClapeyron(const SpecReader &r) {
    r.onlyKnown({"T_ref", "P_ref", "dH_J_mol"});
    const double dH = r.number("dH_J_mol");
    if (!(dH > 0.0)) r.fail("dH_J_mol", "parameter 'dH_J_mol' must be positive");
    return std::make_shared<ClausiusClapeyronModel>(r.temperature("T_ref"), r.pressure("P_ref"),
                                                    dH);
}

BoundaryModelPtr makeCorrespondingStates(const SpecReader &r, CorrespondingStates kind) {
    r.onlyKnown({"T_c", "P_c", "omega"});
    return std::make_shared<CorrespondingStatesModel>(kind, r.temperature("T_c"), r.pressure("P_c"),
                                                      r.number("omega"));
}

BoundaryModelPtr makeClapeyron(const SpecReader &r, bool integrated) {
    r.onlyKnown({"T_ref", "P_ref", "dH_J_mol", "dV_m3_mol"});
    return std::make_shared<ClapeyronModel>(integrated, r.temperature("T_ref"), r.pressure("P_ref"),
                                            r.nonZero("dH_J_mol"), r.nonZero("dV_m3_mol"));
}

BoundaryModelPtr makeSimonGlatzel(const SpecReader &r) {
    r.onlyKnown({"T_ref", "P_ref", "a", "c"});
    const double a = toPascal(r.nonZero("a"), r.spec().pUnit);
    return std::make_shared<SimonGlatzelModel>(r.temperature("T_ref"), r.pressure("P_ref"), a,
                                               r.nonZero("c"));
}

BoundaryModelPtr makeMeltingSum(const SpecReader &r, bool iapws) {
    const std::string expName = iapws ? "b" : "exponents";
    if (iapws) {
        r.onlyKnown({"T_ref", "P_ref", "a", "b", "log"});
    } else {
        r.onlyKnown({"T_ref", "P_ref", "a", "exponents"});
    }
    const auto a = r.array("a");
    const auto e = r.array(expName);
    r.sameLength(a, e, expName);
    using Kind = MeltingSumModel::Kind;
    const Kind kind = !iapws ? Kind::Polynomial : (r.flag("log") ? Kind::IapwsLog : Kind::Iapws);
    return std::make_shared<MeltingSumModel>(kind, r.temperature("T_ref"), r.pressure("P_ref"), a,
                                             e);
}

}  // namespace

BoundaryModelPtr makeModel(const ModelSpec &spec) {
    const SpecReader r(spec);
    const std::string &f = spec.form;
    if (f == "wagner") return makeWagner(r);
    if (f == "iapws-sublimation") return makeIapwsSublimation(r);
    if (f == "antoine") return makeAntoine(r, false);
    if (f == "antoine-extended") return makeAntoine(r, true);
    if (f == "clausius-clapeyron") return makeClausiusClapeyron(r);
    if (f == "lee-kesler") return makeCorrespondingStates(r, CorrespondingStates::LeeKesler);
    if (f == "ambrose-walton")
        return makeCorrespondingStates(r, CorrespondingStates::AmbroseWalton);
    if (f == "clapeyron-linear") return makeClapeyron(r, false);
    if (f == "clapeyron-integrated") return makeClapeyron(r, true);
    if (f == "simon-glatzel") return makeSimonGlatzel(r);
    if (f == "melting-polynomial") return makeMeltingSum(r, false);
    if (f == "iapws-melting") return makeMeltingSum(r, true);
    throw ModelSpecError("model", fmt::format("unknown model '{}' (expected one of: {})", f,
                                              fmt::join(modelForms(), ", ")));
}

const std::vector<std::string> &modelForms() {
    static const std::vector<std::string> forms{
        "wagner",           "iapws-sublimation",  "antoine",
        "antoine-extended", "clausius-clapeyron", "lee-kesler",
        "ambrose-walton",   "clapeyron-linear",   "clapeyron-integrated",
        "simon-glatzel",    "melting-polynomial", "iapws-melting"};
    return forms;
}

}  // namespace pw
