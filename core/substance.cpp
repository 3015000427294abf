#include "core/substance.h"

#include <algorithm>
#include <cctype>

namespace pw {

std::string_view toString(BoundaryKind kind) {
    switch (kind) {
        case BoundaryKind::Melting:
            return "melting";
        case BoundaryKind::Vaporization:
            return "vaporization";
        case BoundaryKind::Sublimation:
            return "sublimation";
        case BoundaryKind::SolidSolid:
            return "solid-solid";
    }
    return "unknown";
}

std::string Citation::text() const {
    std::string s = authors;
    if (year != 0) s += " (" + std::to_string(year) + ")";
    s += ".";
    if (!title.empty()) s += " " + title + ".";
    if (!publication.empty()) s += " " + publication + ".";
    if (!note.empty()) s += " (" + note + ")";
    return s;
}

std::string Boundary::label() const {
    std::string s(toString(kind));
    if (!solidForm.empty()) s += " (" + solidForm + ")";
    return s;
}

std::pair<std::string, std::string> Boundary::phases() const {
    const std::string solid = solidForm.empty() ? "solid" : solidForm;
    switch (kind) {
        case BoundaryKind::Melting:
            return {solid, "liquid"};
        case BoundaryKind::Vaporization:
            return {"liquid", "vapor"};
        case BoundaryKind::Sublimation:
            return {solid, "vapor"};
        case BoundaryKind::SolidSolid: {
            const auto bar = solidForm.find('|');
            if (bar == std::string::npos) return {solid, "solid"};
            return {solidForm.substr(0, bar), solidForm.substr(bar + 1)};
        }
    }
    return {"", ""};
}

namespace {

std::string_view trim(std::string_view s) {
    auto blank = [](char c) { return std::isspace(static_cast<unsigned char>(c)) != 0; };
    while (!s.empty() && blank(s.front())) s.remove_prefix(1);
    while (!s.empty() && blank(s.back())) s.remove_suffix(1);
    return s;
}

bool sameText(std::string_view a, std::string_view b) {
    return a.size() == b.size() && std::equal(a.begin(), a.end(), b.begin(), [](char x, char y) {
               return std::tolower(static_cast<unsigned char>(x)) ==
                      std::tolower(static_cast<unsigned char>(y));
           });
}

}  // namespace

bool Substance::matches(std::string_view key) const {
    key = trim(key);
    if (key.empty()) return false;
    if (sameText(key, id) || sameText(key, name) || sameText(key, formula)) return true;
    return std::any_of(aliases.begin(), aliases.end(),
                       [&](const std::string &alias) { return sameText(key, alias); });
}

}  // namespace pw
