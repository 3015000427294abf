#include "core/csv/state_rows.h"

#include <fmt/format.h>

#include <optional>
#include <utility>

namespace pw::csv {
namespace {

// What is wrong with a row's values, and in which column.
struct Problem {
    std::size_t column;
    std::string message;
};

// The values in kelvin and pascal, or why they are not a physical state.
std::optional<Problem> stateProblem(double t, double p, const StateColumns &columns,
                                    StateValues &out) {
    const double T = toKelvin(t, columns.tUnit), P = toPascal(p, columns.pUnit);
    if (!std::isfinite(T) || !std::isfinite(P))  // 1e308 kPa overflows in the conversion
        return Problem{std::isfinite(T) ? columns.p : columns.t,
                       "the value is out of range after conversion to K and Pa"};
    if (!(T > 0.0))
        return Problem{columns.t,
                       fmt::format("{} {} is not a physical temperature (at or below 0 K)", t,
                                   symbol(columns.tUnit))};
    if (!(P > 0.0))
        return Problem{columns.p,
                       fmt::format("{} {} is not a physical absolute pressure (must be above "
                                   "0; gauge readings need the barometric pressure added)",
                                   p, symbol(columns.pUnit))};
    out = {T, P};
    return std::nullopt;
}

}  // namespace

StateValues checkedState(double t, double p, const StateColumns &columns,
                         const std::vector<std::string> &header, const std::string &fileName,
                         long row) {
    StateValues values{};
    if (auto problem = stateProblem(t, p, columns, values))
        throw InputError(fileName, row, header[problem->column], problem->message);
    return values;
}

StateRowScanner::StateRowScanner(const Reader &reader, const StateColumns &columns,
                                 bool decimalComma)
    : columns_(columns),
      header_(&reader.header()),
      delimiter_(reader.delimiter()),
      decimalComma_(decimalComma),
      fieldCount_(reader.header().size()) {}

bool StateRowScanner::fullRecord(std::string_view record, StateValues &values, BadRow &why) const {
    std::vector<std::string_view> fields;
    std::string scratch;
    if (!splitRecord(record, delimiter_, fields, scratch)) {
        why.message = "a quoted field is not closed";
        return false;
    }
    if (fields.size() != fieldCount_) {
        why.message = fieldCountMessage(fields.size(), fieldCount_, delimiter_);
        return false;
    }
    double cell[2] = {0.0, 0.0};
    const std::size_t column[2] = {columns_.t, columns_.p};
    for (int i = 0; i < 2; ++i) {
        if (auto problem = parseNumber(fields[column[i]], decimalComma_, cell[i])) {
            why.column = (*header_)[column[i]];
            why.message = std::move(*problem);
            return false;
        }
    }
    if (auto problem = stateProblem(cell[0], cell[1], columns_, values)) {
        why.column = (*header_)[problem->column];
        why.message = std::move(problem->message);
        return false;
    }
    return true;
}

}  // namespace pw::csv
