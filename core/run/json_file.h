#pragma once
// Reading the small JSON files of runs (plans, rules): the whole text of a file, the parsed
// document, and nlohmann's type errors turned into pw::InputError naming the file.
#include <nlohmann/json.hpp>
#include <string>
#include <string_view>

#include "core/errors.h"

namespace pw::run {

// The file's bytes; InputError "cannot open the file" naming it.
std::string readTextFile(const std::string &path);

// The parsed document; InputError "not valid JSON: ..." naming the file.
nlohmann::json parseJsonText(std::string_view content, const std::string &file);

// f(), with a json::exception (a value of the wrong type) reported as InputError naming the
// file; InputErrors thrown by f pass unchanged.
template <class F>
auto withJsonErrors(const std::string &file, F &&f) -> decltype(f()) {
    try {
        return f();
    } catch (const nlohmann::json::exception &e) {
        throw InputError(file, 0, "", std::string("unexpected JSON value: ") + e.what());
    }
}

}  // namespace pw::run
