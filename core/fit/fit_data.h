#pragma once
// Measurements for a boundary fit: (T, p) pairs with optional weights, read from CSV with the
// units taken from the header brackets ("T [degC]", "P [kPa]"), and checked before fitting.
#include <cstddef>
#include <iosfwd>
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

// Reads a CSV table (',', ';' or tab separated; '#' lines and blank lines skipped).
// Columns by header name, case-insensitive: temperature "T", "temp", "temperature"; pressure
// "P", "p_sat", "psat", "pressure"; optional "weight" or "w". Units are required in brackets
// after the temperature and pressure names. Throws InputError naming file, row and field.
FitData readFitCsv(std::istream &in, const std::string &fileName);
FitData readFitCsvFile(const std::string &path);

// Checks the data for a fit with `parameterCount` parameters: at least two points, at least
// as many points as parameters, finite positive T and p, finite positive weights, no
// duplicate temperature. Throws InputError naming the row and field of the first problem.
void validateFitData(const FitData &data, std::size_t parameterCount);

}  // namespace pw::fit
