#include "core/compare.h"

#include <cmath>

#include "core/errors.h"

namespace pw {
namespace {

std::optional<SaturationValue> saturation(const std::optional<BoundaryValue> &v,
                                          BoundaryKind kind) {
    if (!v || !std::isfinite(v->value)) return std::nullopt;
    return SaturationValue{v->value, kind, v->extrapolated};
}

std::optional<SaturationValue> vaporPressure(const PhaseDiagram &d, double T, bool &aboveTc) {
    const FixedPoint *cp = d.criticalPoint();
    const FixedPoint *tp = d.triplePoint();
    aboveTc = cp != nullptr && T >= cp->T_K;
    if (aboveTc) return std::nullopt;
    try {
        if (tp != nullptr && T < tp->T_K)
            return saturation(d.sublimationPressure(T), BoundaryKind::Sublimation);
        return saturation(d.vaporizationPressure(T), BoundaryKind::Vaporization);
    } catch (const pw::Error &) {
        return std::nullopt;  // a model that cannot be evaluated there: no value
    }
}

std::optional<SaturationValue> saturationTemperature(const PhaseDiagram &d, double P) {
    const FixedPoint *cp = d.criticalPoint();
    const FixedPoint *tp = d.triplePoint();
    if (cp != nullptr && P > cp->P_Pa) return std::nullopt;
    try {
        if (tp != nullptr && P < tp->P_Pa)
            return saturation(d.sublimationTemperature(P), BoundaryKind::Sublimation);
        return saturation(d.vaporizationTemperature(P), BoundaryKind::Vaporization);
    } catch (const pw::Error &) {
        return std::nullopt;
    }
}

std::optional<double> valueOf(const std::optional<SaturationValue> &v) {
    return v ? std::optional<double>(v->value) : std::nullopt;
}

std::string saturationNote(const std::optional<SaturationValue> &v) {
    if (!v) return {};
    std::string note = v->kind == BoundaryKind::Sublimation ? "sublimation (over the solid)" : "";
    if (v->extrapolated) note += note.empty() ? "extrapolated" : ", extrapolated";
    return note;
}

std::string densityNote(const std::optional<bool> &denser) {
    if (!denser) return "no melting curve";
    return *denser ? "solid denser, sinks" : "solid less dense, floats";
}

void checkCondition(const std::optional<double> &x, const char *what) {
    if (x && !(std::isfinite(*x) && *x > 0))
        throw DomainError(std::string("compare: the chosen ") + what +
                          " must be a finite positive absolute value");
}

std::optional<double> fixed(const std::optional<FixedPoint> &fp, bool temperature) {
    if (!fp) return std::nullopt;
    return temperature ? fp->T_K : fp->P_Pa;
}

std::optional<double> reducedOf(const SubstanceSummary &s, bool temperature) {
    if (!s.triple || !s.critical) return std::nullopt;
    return temperature ? s.triple->T_K / s.critical->T_K : s.triple->P_Pa / s.critical->P_Pa;
}

void addFixedRows(Comparison &c) {
    const SubstanceSummary &a = c.a, &b = c.b;
    auto row = [&c](std::string key, std::string label, Quantity q, std::optional<double> x,
                    std::optional<double> y) {
        c.rows.push_back({std::move(key), std::move(label), q, x, y, {}, {}});
    };
    using Q = Quantity;
    row("triple_point_T_K", "Triple point temperature", Q::Temperature, fixed(a.triple, true),
        fixed(b.triple, true));
    row("triple_point_P_Pa", "Triple point pressure", Q::Pressure, fixed(a.triple, false),
        fixed(b.triple, false));
    row("critical_point_T_K", "Critical temperature", Q::Temperature, fixed(a.critical, true),
        fixed(b.critical, true));
    row("critical_point_P_Pa", "Critical pressure", Q::Pressure, fixed(a.critical, false),
        fixed(b.critical, false));
    row("triple_point_T_reduced", "Triple point T/Tc", Q::Reduced, reducedOf(a, true),
        reducedOf(b, true));
    row("triple_point_P_reduced", "Triple point p/pc", Q::Reduced, reducedOf(a, false),
        reducedOf(b, false));
    row("normal_melting_point_K", "Normal melting point", Q::Temperature, a.normalMelting_K,
        b.normalMelting_K);
    row("normal_boiling_point_K", "Normal boiling point", Q::Temperature, a.normalBoiling_K,
        b.normalBoiling_K);
    row("normal_sublimation_point_K", "Normal sublimation point", Q::Temperature,
        a.normalSublimation_K, b.normalSublimation_K);
}

void addConditionRows(Comparison &c) {
    const SubstanceSummary &a = c.a, &b = c.b;
    if (c.conditions.T_K) {
        CompareRow r{"vapor_pressure_at_T_Pa",
                     "Vapor pressure at T",
                     Quantity::Pressure,
                     valueOf(a.vaporPressureAtT),
                     valueOf(b.vaporPressureAtT),
                     a.aboveCriticalAtT ? "T above Tc" : saturationNote(a.vaporPressureAtT),
                     b.aboveCriticalAtT ? "T above Tc" : saturationNote(b.vaporPressureAtT)};
        c.rows.push_back(std::move(r));
    }
    if (c.conditions.P_Pa) {
        CompareRow r{"saturation_temperature_at_P_K", "Boiling (or sublimation) T at P",
                     Quantity::Temperature,           valueOf(a.saturationTAtP),
                     valueOf(b.saturationTAtP),       saturationNote(a.saturationTAtP),
                     saturationNote(b.saturationTAtP)};
        if (!a.saturationTAtP && a.critical && *c.conditions.P_Pa > a.critical->P_Pa)
            r.noteA = "P above pc";
        if (!b.saturationTAtP && b.critical && *c.conditions.P_Pa > b.critical->P_Pa)
            r.noteB = "P above pc";
        c.rows.push_back(std::move(r));
    }
}

void addSlopeAndEnthalpyRows(Comparison &c) {
    const SubstanceSummary &a = c.a, &b = c.b;
    auto sign = [](const std::optional<int> &s) {
        return s ? std::optional<double>(*s) : std::nullopt;
    };
    c.rows.push_back({"melt_slope_sign", "Melting-curve slope sign", Quantity::Sign,
                      sign(a.meltSlopeSign), sign(b.meltSlopeSign),
                      densityNote(a.solidDenserThanLiquid), densityNote(b.solidDenserThanLiquid)});
    c.rows.push_back({"dH_vap_triple_J_mol",
                      "Enthalpy of vaporization at the triple point",
                      Quantity::Enthalpy,
                      a.dHvapTriple_J_mol,
                      b.dHvapTriple_J_mol,
                      {},
                      {}});
    c.rows.push_back({"dH_sub_triple_J_mol",
                      "Enthalpy of sublimation at the triple point",
                      Quantity::Enthalpy,
                      a.dHsubTriple_J_mol,
                      b.dHsubTriple_J_mol,
                      {},
                      {}});
}

std::optional<int> volatility(const SubstanceSummary &a, const SubstanceSummary &b) {
    if (a.aboveCriticalAtT != b.aboveCriticalAtT) return a.aboveCriticalAtT ? 0 : 1;
    if (!a.vaporPressureAtT || !b.vaporPressureAtT) return std::nullopt;
    const double pa = a.vaporPressureAtT->value, pb = b.vaporPressureAtT->value;
    if (pa == pb) return std::nullopt;
    return pa > pb ? 0 : 1;
}

}  // namespace

SubstanceSummary summarize(const PhaseDiagram &d, const CompareConditions &conditions) {
    SubstanceSummary s;
    s.id = d.substance().id;
    s.name = d.substance().name;
    s.triplePoints = d.substance().triplePoints;
    if (const FixedPoint *tp = d.triplePoint()) s.triple = *tp;
    if (const FixedPoint *cp = d.criticalPoint()) s.critical = *cp;
    s.normalMelting_K = d.normalMeltingPoint();
    s.normalBoiling_K = d.normalBoilingPoint();
    s.normalSublimation_K = d.normalSublimationPoint();
    if (conditions.T_K) s.vaporPressureAtT = vaporPressure(d, *conditions.T_K, s.aboveCriticalAtT);
    if (conditions.P_Pa) s.saturationTAtP = saturationTemperature(d, *conditions.P_Pa);
    s.meltSlopeSign = d.meltSlopeSign();
    s.solidDenserThanLiquid = d.solidDenserThanLiquid();
    s.dHvapTriple_J_mol = d.dHvapTriple();
    s.dHsubTriple_J_mol = d.dHsubTriple();
    return s;
}

std::optional<double> CompareRow::difference() const {
    if (!a || !b) return std::nullopt;
    if (quantity == Quantity::Sign) return *a == *b ? 0.0 : 1.0;
    return *b - *a;
}

std::optional<double> CompareRow::ratio() const {
    if (quantity != Quantity::Pressure || !a || !b || *a == 0.0) return std::nullopt;
    return *b / *a;
}

Comparison compare(const PhaseDiagram &a, const PhaseDiagram &b,
                   const CompareConditions &conditions) {
    checkCondition(conditions.T_K, "temperature");
    checkCondition(conditions.P_Pa, "pressure");
    Comparison c;
    c.conditions = conditions;
    c.a = summarize(a, conditions);
    c.b = summarize(b, conditions);
    addFixedRows(c);
    addConditionRows(c);
    addSlopeAndEnthalpyRows(c);
    if (conditions.T_K) c.moreVolatileAtT = volatility(c.a, c.b);
    return c;
}

std::optional<ReducedPoint> reduced(const PhaseDiagram &d, double T_K, double P_Pa) {
    const FixedPoint *cp = d.criticalPoint();
    if (cp == nullptr) return std::nullopt;
    return ReducedPoint{T_K / cp->T_K, P_Pa / cp->P_Pa};
}

std::vector<ReducedPoint> reducedVaporizationCurve(const PhaseDiagram &d, int samples) {
    const FixedPoint *cp = d.criticalPoint();
    const Boundary *vap = d.vaporization();
    if (cp == nullptr || vap == nullptr || samples < 1) return {};
    const FixedPoint *tp = d.triplePoint();
    const double lo = tp != nullptr ? tp->T_K : vap->validity.min_K;
    const double hi = cp->T_K;
    std::vector<ReducedPoint> out;
    out.reserve(static_cast<std::size_t>(samples) + 1);
    for (int i = 0; i <= samples; ++i) {  // uniform in 1/T; the last sample is exactly Tc
        const double T = i == samples ? hi : 1.0 / (1.0 / lo + (1.0 / hi - 1.0 / lo) * i / samples);
        try {
            const auto p = d.vaporizationPressure(T);
            if (p && std::isfinite(p->value)) out.push_back({T / hi, p->value / cp->P_Pa});
        } catch (const pw::Error &) {
            // outside what the model can answer: leave the sample out
        }
    }
    return out;
}

}  // namespace pw
