#pragma once
// Measurements for a boundary fit: (T, p) pairs with optional weights, read from CSV with the
// units taken from the header brackets ("T [degC]", "P [kPa]"), and checked before fitting.
#include <cstddef>
#include <iosfwd>
#include <optional>
#include <string>
#include <vector>

namespace pw::fit {

struct FitPoint {
    double T_K = 0.0;
    double P_Pa = 0.0;
    double weight = 1.0;  // multiplies the squared residual of this point
    long row = 0;         // line in the input file (header = row 1); 0 when built in code
};

struct FitData {
    std::string file;  // for messages ("<input>" when empty)
    std::vector<FitPoint> points;
};

struct FitCsvOptions {
    std::string tColumn;  // header text or name; empty: "T", "temperature", "temp"
    std::string pColumn;  // empty: "P", "pressure"
    std::optional<std::string> tUnit, pUnit;  // when the header has no brackets
};

// Reads a CSV table with the shared CSV reader (core/csv: ',', ';' or tab, quotes, units from
// header brackets "T [degC]", "P [kPa]", else the options, else K and Pa). An optional column
// "weight" (or "w") gives each point's weight. Throws InputError naming file, row and field.
FitData readFitCsv(std::istream &in, const std::string &fileName,
                   const FitCsvOptions &options = {});
FitData readFitCsvFile(const std::string &path, const FitCsvOptions &options = {});

// Checks the data for a fit with `parameterCount` parameters: at least two points, at least
// as many points as parameters, finite positive T and p, finite positive weights, no
// duplicate temperature. Throws InputError naming the row and field of the first problem.
void validateFitData(const FitData &data, std::size_t parameterCount);

}  // namespace pw::fit
