#pragma once
// Points as CSV, with the command line's columns: the input columns (label, T, P with their
// units in brackets) followed by phase, solid_form, nearest_boundary, dT_K, dP_Pa,
// on_boundary, flags. Import reads label/T/P from any CSV in those conventions (comma,
// semicolon or tab separated; units from header brackets such as "T [degC]", default K and Pa)
// and ignores the other columns. Errors name the file, row (header = row 1) and column.
#include <QString>
#include <vector>

#include "core/phase_diagram.h"
#include "widgets/document.h"
#include "widgets/settings.h"

namespace pw::ui {

// The CSV text; classification columns are left empty when `diagram` is null.
QString pointsToCsv(const std::vector<StatePoint> &points, const PhaseDiagram *diagram,
                    DisplayUnits units);
// Atomic write (QSaveFile); false with a message on failure, and no file is left behind.
bool writePointsCsv(const QString &path, const std::vector<StatePoint> &points,
                    const PhaseDiagram *diagram, DisplayUnits units, QString *error);

// Throws pw::InputError for any bad row: nothing is imported from a file with an error.
std::vector<StatePoint> parsePointsCsv(const QString &text, const QString &fileName);
std::vector<StatePoint> readPointsCsv(const QString &path);

}  // namespace pw::ui
