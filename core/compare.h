#pragma once
// Two substances side by side (docs/compare.md): the numbers an engineer choosing between
// them looks at — fixed points, normal points at 101 325 Pa, the equilibrium vapor pressure at
// a chosen temperature (volatility ranking), the boiling (or sublimation) temperature at a
// chosen pressure, the melt-slope verdict and the enthalpies the curves imply at the triple
// point — as one table of rows with the difference B − A. Also the corresponding-states
// (reduced) coordinates T/Tc, P/Pc used to overlay two diagrams.
#include <optional>
#include <string>
#include <vector>

#include "core/phase_diagram.h"

namespace pw {

// The optional conditions of the comparison (kelvin, pascal); unset rows are left out.
struct CompareConditions {
    std::optional<double> T_K;   // vapor pressure at this temperature
    std::optional<double> P_Pa;  // boiling / sublimation temperature at this pressure
};

// A value on the condensed-phase–vapor equilibrium: the vaporization curve between the
// triple and critical points, the sublimation curve below the triple point.
struct SaturationValue {
    double value = kNaN;  // Pa (vapor pressure) or K (saturation temperature)
    BoundaryKind kind = BoundaryKind::Vaporization;
    bool extrapolated = false;
};

// What one substance contributes to the table (plain values, no pointers into the diagram).
struct SubstanceSummary {
    std::string id;
    std::string name;
    std::vector<FixedPoint> triplePoints;  // [0]: solid–liquid–vapor, as in the file
    std::optional<FixedPoint> triple;      // the main triple point
    std::optional<FixedPoint> critical;
    std::optional<double> normalMelting_K, normalBoiling_K, normalSublimation_K;
    std::optional<SaturationValue> vaporPressureAtT;  // nullopt: T above Tc or no curve there
    std::optional<SaturationValue> saturationTAtP;    // nullopt: P above pc or no curve there
    bool aboveCriticalAtT = false;                    // the chosen T is at or above Tc
    std::optional<int> meltSlopeSign;                 // +1 / -1 at the main triple point
    std::optional<bool> solidDenserThanLiquid;        // Clapeyron verdict
    std::optional<double> dHvapTriple_J_mol, dHsubTriple_J_mol;
};

SubstanceSummary summarize(const PhaseDiagram &diagram, const CompareConditions &conditions);

enum class Quantity { Temperature, Pressure, Enthalpy, Sign, Reduced };  // Reduced: T/Tc, p/pc

// One row of the table. `key` is the JSON / machine name ("normal_boiling_point_K").
struct CompareRow {
    std::string key;
    std::string label;  // "Normal boiling point"
    Quantity quantity = Quantity::Temperature;
    std::optional<double> a, b;
    std::string noteA, noteB;  // "sublimation", "extrapolated", "above Tc" ...
    // b − a (nullopt when either is missing); for Sign rows 0 = same sign, 1 = differ.
    std::optional<double> difference() const;
    // b / a for pressures (nullopt otherwise or when either is missing or a == 0).
    std::optional<double> ratio() const;
};

struct Comparison {
    SubstanceSummary a, b;
    CompareConditions conditions;
    std::vector<CompareRow> rows;
    // Which substance is the more volatile at conditions.T_K: 0 = a, 1 = b, nullopt when
    // unknown (no T given, or neither has a vapor pressure there, or they are equal). A
    // substance at or above its critical temperature cannot be condensed at T and counts as
    // the more volatile one.
    std::optional<int> moreVolatileAtT;
};

// Throws DomainError for a non-positive or non-finite T or P in `conditions`.
Comparison compare(const PhaseDiagram &a, const PhaseDiagram &b,
                   const CompareConditions &conditions = {});

// Corresponding-states coordinates: T/Tc and P/pc. nullopt without a critical point.
struct ReducedPoint {
    double Tr = kNaN;
    double Pr = kNaN;
};
std::optional<ReducedPoint> reduced(const PhaseDiagram &diagram, double T_K, double P_Pa);
// The vaporization curve in reduced coordinates from the main triple point (or the curve's
// lowest temperature) up to and including Tc, `samples` + 1 points evenly spaced in 1/T; empty
// without a critical point or a vaporization curve.
std::vector<ReducedPoint> reducedVaporizationCurve(const PhaseDiagram &diagram, int samples = 200);

}  // namespace pw
