#include "core/fit/fit_data.h"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <fstream>
#include <map>

#include "core/csv/columns.h"
#include "core/csv/reader.h"
#include "core/errors.h"
#include "core/units.h"

namespace pw::fit {
namespace {

std::string lowerName(std::string_view cell) {
    std::string s = csv::splitHeader(cell).name;
    for (auto &c : s) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    return s;
}

// The optional weight column ("weight" or "w"); kNoColumn when absent.
std::size_t weightColumn(const std::vector<std::string> &header, const std::string &file) {
    std::size_t found = csv::kNoColumn;
    for (std::size_t i = 0; i < header.size(); ++i) {
        const auto name = lowerName(header[i]);
        if (name != "weight" && name != "w") continue;
        if (found != csv::kNoColumn) {
            throw InputError(file, 1, header[i], "a second weight column");
        }
        found = i;
    }
    return found;
}

}  // namespace

FitData readFitCsv(std::istream &in, const std::string &fileName, const FitCsvOptions &options) {
    csv::Reader reader(in, fileName);
    csv::StateColumnOptions want;
    want.tColumn = options.tColumn;
    want.pColumn = options.pColumn;
    want.tUnit = options.tUnit;
    want.pUnit = options.pUnit;
    const auto cols = csv::resolveStateColumns(reader.header(), want, fileName);
    const auto wcol = weightColumn(reader.header(), fileName);
    FitData data;
    data.file = fileName;
    while (reader.next()) {
        FitPoint p;
        p.row = reader.row();
        p.T_K = toKelvin(reader.number(cols.t), cols.tUnit);
        p.P_Pa = toPascal(reader.number(cols.p), cols.pUnit);
        if (wcol != csv::kNoColumn) p.weight = reader.number(wcol);
        data.points.push_back(p);
    }
    return data;
}

FitData readFitCsvFile(const std::string &path, const FitCsvOptions &options) {
    std::ifstream in(path);
    if (!in) throw InputError(path, 0, "", "cannot open the file for reading");
    return readFitCsv(in, path, options);
}

void validateFitData(const FitData &data, std::size_t parameterCount) {
    const auto &pts = data.points;
    for (const auto &p : pts) {
        if (!std::isfinite(p.T_K) || p.T_K <= 0.0) {
            throw InputError(data.file, p.row, "T", "temperature must be finite and above 0 K");
        }
        if (!std::isfinite(p.P_Pa) || p.P_Pa <= 0.0) {
            throw InputError(data.file, p.row, "P", "pressure must be finite and above 0 Pa");
        }
        if (!std::isfinite(p.weight) || p.weight <= 0.0) {
            throw InputError(data.file, p.row, "weight", "weight must be finite and above 0");
        }
    }
    std::map<double, long> seen;
    for (const auto &p : pts) {
        const auto [it, fresh] = seen.emplace(p.T_K, p.row);
        if (!fresh) {
            throw InputError(data.file, p.row, "T",
                             "duplicate temperature (same as row " + std::to_string(it->second) +
                                 "); average repeated measurements before fitting");
        }
    }
    if (pts.size() < 2) {
        if (pts.empty()) throw InputError(data.file, 0, "", "no data rows");
        throw InputError(data.file, pts.front().row, "",
                         "a single data point cannot be fitted (at least 2 are needed)");
    }
    if (pts.size() < parameterCount) {
        throw InputError(data.file, 0, "",
                         std::to_string(pts.size()) + " data points are fewer than the " +
                             std::to_string(parameterCount) + " parameters of the model");
    }
}

}  // namespace pw::fit
