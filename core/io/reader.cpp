#include "core/io/reader.h"

#include <fmt/format.h>
#include <algorithm>
#include <cmath>

namespace pw::io {

std::string child(const std::string &path, std::string_view key) {
    std::string s = path + '/';
    for (const char c : key) {
        if (c == '~')
            s += "~0";
        else if (c == '/')
            s += "~1";
        else
            s += c;
    }
    return s;
}

std::string child(const std::string &path, std::size_t index) {
    return path + '/' + std::to_string(index);
}

std::string describeType(const Json &value) {
    switch (value.type()) {
        case Json::value_t::null:
            return "null";
        case Json::value_t::object:
            return "an object";
        case Json::value_t::array:
            return "an array";
        case Json::value_t::string:
            return "a string";
        case Json::value_t::boolean:
            return "a boolean";
        case Json::value_t::number_integer:
        case Json::value_t::number_unsigned:
        case Json::value_t::number_float:
            return "a number";
        default:
            return "an unsupported value";
    }
}

void Reader::add(Severity severity, const std::string &path, std::string message) {
    if (severity == Severity::Error) ++errors_;
    issues_.push_back(ValidationIssue{severity, file_, path, std::move(message)});
}

void Reader::error(const std::string &path, std::string message) {
    add(Severity::Error, path, std::move(message));
}

void Reader::warning(const std::string &path, std::string message) {
    add(Severity::Warning, path, std::move(message));
}

const Json *Reader::member(const Json &object, std::string_view key, const std::string &path,
                           bool required) {
    if (object.is_object()) {
        const auto it = object.find(key);
        if (it != object.end()) return &*it;
    }
    if (required) error(child(path, key), "missing required key '" + std::string(key) + "'");
    return nullptr;
}

std::optional<double> Reader::number(const Json &object, std::string_view key,
                                     const std::string &path, bool required) {
    const Json *v = member(object, key, path, required);
    if (v == nullptr) return std::nullopt;
    if (!v->is_number()) {
        error(child(path, key), "expected a number, found " + describeType(*v));
        return std::nullopt;
    }
    const double x = v->get<double>();
    if (!std::isfinite(x)) {
        error(child(path, key), "expected a finite number");
        return std::nullopt;
    }
    return x;
}

std::optional<double> Reader::positive(const Json &object, std::string_view key,
                                       const std::string &path, bool required) {
    const auto x = number(object, key, path, required);
    if (x && *x <= 0.0) {
        error(child(path, key), fmt::format("expected a positive number, found {}", *x));
        return std::nullopt;
    }
    return x;
}

std::optional<long long> Reader::integer(const Json &object, std::string_view key,
                                         const std::string &path, bool required) {
    const Json *v = member(object, key, path, required);
    if (v == nullptr) return std::nullopt;
    if (v->is_number_integer()) return v->get<long long>();
    if (v->is_number_unsigned()) {
        error(child(path, key), "expected a small integer, found a huge number");
        return std::nullopt;
    }
    error(child(path, key), "expected an integer, found " + describeType(*v));
    return std::nullopt;
}

std::optional<std::string> Reader::string(const Json &object, std::string_view key,
                                          const std::string &path, bool required) {
    const Json *v = member(object, key, path, required);
    if (v == nullptr) return std::nullopt;
    if (!v->is_string()) {
        error(child(path, key), "expected a string, found " + describeType(*v));
        return std::nullopt;
    }
    return v->get<std::string>();
}

std::optional<std::vector<std::string>> Reader::strings(const Json &object, std::string_view key,
                                                        const std::string &path, bool required) {
    const Json *v = member(object, key, path, required);
    if (v == nullptr) return std::nullopt;
    const std::string here = child(path, key);
    if (!v->is_array()) {
        error(here, "expected an array of strings, found " + describeType(*v));
        return std::nullopt;
    }
    std::vector<std::string> out;
    bool ok = true;
    for (std::size_t i = 0; i < v->size(); ++i) {
        if ((*v)[i].is_string()) {
            out.push_back((*v)[i].get<std::string>());
        } else {
            error(child(here, i), "expected a string, found " + describeType((*v)[i]));
            ok = false;
        }
    }
    if (!ok) return std::nullopt;
    return out;
}

bool Reader::expectObject(const Json &value, const std::string &path, std::string_view what) {
    if (value.is_object()) return true;
    error(path, fmt::format("expected {} (a JSON object), found {}", what, describeType(value)));
    return false;
}

void Reader::unknownKeys(const Json &object, std::initializer_list<std::string_view> known,
                         const std::string &path) {
    if (!object.is_object()) return;
    for (const auto &[key, value] : object.items()) {
        if (std::find(known.begin(), known.end(), key) != known.end()) continue;
        std::string list;
        for (const auto k : known) list += (list.empty() ? "" : ", ") + std::string(k);
        warning(child(path, key),
                fmt::format("unknown key '{}' is ignored (known here: {})", key, list));
    }
}

}  // namespace pw::io
