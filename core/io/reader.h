#pragma once
// Helpers for reading a substance file: typed access to JSON members that records a
// ValidationIssue (file, JSON path, what is wrong, what was expected) instead of throwing.
#include <initializer_list>
#include <nlohmann/json.hpp>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "core/substance_io.h"

namespace pw::io {

using Json = nlohmann::json;

// RFC 6901 paths: child("/boundaries", 2) == "/boundaries/2"; '~' and '/' are escaped.
std::string child(const std::string &path, std::string_view key);
std::string child(const std::string &path, std::size_t index);
// "a number", "a string", "an object"...
std::string describeType(const Json &value);

class Reader {
public:
    explicit Reader(std::string file) : file_(std::move(file)) {}

    void error(const std::string &path, std::string message);
    void warning(const std::string &path, std::string message);
    void add(Severity severity, const std::string &path, std::string message);
    bool hasErrors() const { return errors_ > 0; }
    int errorCount() const { return errors_; }
    const std::string &file() const { return file_; }
    std::vector<ValidationIssue> take() { return std::move(issues_); }

    // The member `key` of `object` at `path`; records "missing required key" when required.
    const Json *member(const Json &object, std::string_view key, const std::string &path,
                       bool required);
    // Typed members: nullopt when absent (an error if required) or of the wrong type (an error).
    std::optional<double> number(const Json &object, std::string_view key, const std::string &path,
                                 bool required);
    std::optional<double> positive(const Json &object, std::string_view key,
                                   const std::string &path, bool required);
    std::optional<long long> integer(const Json &object, std::string_view key,
                                     const std::string &path, bool required);
    std::optional<std::string> string(const Json &object, std::string_view key,
                                      const std::string &path, bool required);
    std::optional<std::vector<std::string>> strings(const Json &object, std::string_view key,
                                                    const std::string &path, bool required);
    // `value` must be an object; records an error naming `what` otherwise.
    bool expectObject(const Json &value, const std::string &path, std::string_view what);
    // Warns about every key of `object` not in `known` (such keys are ignored).
    void unknownKeys(const Json &object, std::initializer_list<std::string_view> known,
                     const std::string &path);

private:
    std::string file_;
    std::vector<ValidationIssue> issues_;
    int errors_ = 0;
};

}  // namespace pw::io
