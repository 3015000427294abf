#include "core/fit/fit_data.h"

#include <algorithm>
#include <cctype>
#include <charconv>
#include <cmath>
#include <fstream>
#include <istream>
#include <map>
#include <optional>

#include "core/errors.h"
#include "core/units.h"

namespace pw::fit {
namespace {

std::string trim(std::string_view s) {
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.front()))) s.remove_prefix(1);
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.back()))) s.remove_suffix(1);
    if (s.size() >= 2 && s.front() == '"' && s.back() == '"') s = s.substr(1, s.size() - 2);
    return std::string(s);
}

std::string lower(std::string s) {
    for (auto &c : s) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    return s;
}

char detectDelimiter(const std::string &header) {
    if (header.find(',') != std::string::npos) return ',';
    if (header.find(';') != std::string::npos) return ';';
    if (header.find('\t') != std::string::npos) return '\t';
    return ',';
}

std::vector<std::string> split(const std::string &line, char delimiter) {
    std::vector<std::string> fields;
    std::size_t start = 0;
    while (true) {
        const auto end = line.find(delimiter, start);
        fields.push_back(trim(std::string_view(line).substr(start, end - start)));
        if (end == std::string::npos) break;
        start = end + 1;
    }
    return fields;
}

struct Column {
    std::size_t index = 0;
    std::string header;
    std::string unit;  // text inside the brackets
};

struct Layout {
    std::optional<Column> T, P, weight;
};

// "T [degC]" -> name "t", unit "degC".
std::pair<std::string, std::string> nameAndUnit(const std::string &header) {
    const auto open = header.find('[');
    const auto close = header.rfind(']');
    if (open == std::string::npos || close == std::string::npos || close < open) {
        return {lower(trim(header)), ""};
    }
    return {lower(trim(header.substr(0, open))), trim(header.substr(open + 1, close - open - 1))};
}

Layout findColumns(const std::vector<std::string> &headers, const std::string &file) {
    Layout layout;
    for (std::size_t i = 0; i < headers.size(); ++i) {
        const auto [name, unit] = nameAndUnit(headers[i]);
        const Column column{i, headers[i], unit};
        std::optional<Column> *slot = nullptr;
        if (name == "t" || name == "temp" || name == "temperature") slot = &layout.T;
        if (name == "p" || name == "psat" || name == "p_sat" || name == "pressure") {
            slot = &layout.P;
        }
        if (name == "weight" || name == "w") slot = &layout.weight;
        if (slot == nullptr) continue;
        if (slot->has_value()) {
            throw InputError(
                file, 1, headers[i],
                "a second column of the same quantity (first: '" + (*slot)->header + "')");
        }
        *slot = column;
    }
    if (!layout.T) {
        throw InputError(file, 1, "", "no temperature column (expected a header such as 'T [K]')");
    }
    if (!layout.P) {
        throw InputError(file, 1, "", "no pressure column (expected a header such as 'P [Pa]')");
    }
    for (const auto *c : {&*layout.T, &*layout.P}) {
        if (c->unit.empty()) {
            throw InputError(file, 1, c->header,
                             "no unit: write it in brackets, e.g. 'T [degC]' or 'P [kPa]'");
        }
    }
    return layout;
}

double parseNumber(const std::string &text, const std::string &file, long row,
                   const std::string &field) {
    double value = 0.0;
    const char *first = text.data();
    const char *last = first + text.size();
    if (!text.empty() && *first == '+') ++first;
    const auto [ptr, ec] = std::from_chars(first, last, value);
    if (text.empty() || ec != std::errc() || ptr != last) {
        throw InputError(file, row, field, "'" + text + "' is not a number");
    }
    if (!std::isfinite(value)) throw InputError(file, row, field, "value is not finite");
    return value;
}

template <typename Unit, typename Parse>
Unit parseUnitOf(const Column &c, const std::string &file, Parse parse) {
    try {
        return parse(c.unit);
    } catch (const UnitError &e) {
        throw InputError(file, 1, c.header, e.what());
    }
}

}  // namespace

FitData readFitCsv(std::istream &in, const std::string &fileName) {
    FitData data;
    data.file = fileName;
    std::string line;
    long row = 0;
    std::optional<Layout> layout;
    char delimiter = ',';
    TemperatureUnit tUnit = TemperatureUnit::Kelvin;
    PressureUnit pUnit = PressureUnit::Pa;
    while (std::getline(in, line)) {
        ++row;
        if (!line.empty() && line.back() == '\r') line.pop_back();
        const auto t = trim(line);
        if (t.empty() || t.front() == '#') continue;
        if (!layout) {
            delimiter = detectDelimiter(line);
            layout = findColumns(split(line, delimiter), fileName);
            tUnit = parseUnitOf<TemperatureUnit>(*layout->T, fileName, parseTemperatureUnit);
            pUnit = parseUnitOf<PressureUnit>(*layout->P, fileName, parsePressureUnit);
            continue;
        }
        const auto fields = split(line, delimiter);
        auto field = [&](const Column &c) -> const std::string & {
            if (c.index >= fields.size()) {
                throw InputError(fileName, row, c.header, "missing value (row too short)");
            }
            return fields[c.index];
        };
        FitPoint p;
        p.row = row;
        p.T_K = toKelvin(parseNumber(field(*layout->T), fileName, row, layout->T->header), tUnit);
        p.P_Pa = toPascal(parseNumber(field(*layout->P), fileName, row, layout->P->header), pUnit);
        if (layout->weight) {
            p.weight = parseNumber(field(*layout->weight), fileName, row, layout->weight->header);
        }
        data.points.push_back(p);
    }
    if (!layout) throw InputError(fileName, 0, "", "the file is empty (no header row)");
    return data;
}

FitData readFitCsvFile(const std::string &path) {
    std::ifstream in(path);
    if (!in) throw InputError(path, 0, "", "cannot open the file for reading");
    return readFitCsv(in, path);
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
