#pragma once
// Error types thrown by the core. Every message is meant for the user: it names what was
// wrong and, where a file is involved, the file, row (1-based, header = row 1) and field.
#include <stdexcept>
#include <string>

namespace pw {

// Base of all Phasewright errors.
class Error : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

// An unknown or malformed unit string.
class UnitError : public Error {
public:
    using Error::Error;
};

// A non-physical or non-finite state value (T <= 0 K, p <= 0 Pa, NaN, inf) or a request
// outside what a model can answer (e.g. a pressure above the critical point for T_vap(p)).
class DomainError : public Error {
public:
    using Error::Error;
};

// Bad content in an input file: carries where it happened.
class InputError : public Error {
public:
    InputError(std::string file, long row, std::string field, const std::string &what)
        : Error(format(file, row, field, what)),
          file_(std::move(file)),
          row_(row),
          field_(std::move(field)) {}
    const std::string &file() const { return file_; }
    long row() const { return row_; }
    const std::string &field() const { return field_; }

private:
    static std::string format(const std::string &file, long row, const std::string &field,
                              const std::string &what) {
        std::string s = file.empty() ? std::string("<input>") : file;
        if (row > 0) s += ", row " + std::to_string(row);
        if (!field.empty()) s += ", field '" + field + "'";
        return s + ": " + what;
    }
    std::string file_;
    long row_ = 0;
    std::string field_;
};

}  // namespace pw
