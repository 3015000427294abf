#include "core/io/json_guard.h"

#include <fmt/format.h>

namespace pw::io {
namespace {

// Offset of the first bracket that opens nesting level kMaxDepth + 1, or npos. Brackets
// inside strings do not count. Unbalanced text is left to the parser.
std::size_t tooDeepAt(std::string_view text) {
    int depth = 0;
    bool inString = false;
    for (std::size_t i = 0; i < text.size(); ++i) {
        const char c = text[i];
        if (inString) {
            if (c == '\\')
                ++i;
            else if (c == '"')
                inString = false;
            continue;
        }
        if (c == '"') {
            inString = true;
        } else if (c == '[' || c == '{') {
            if (++depth > kMaxDepth) return i;
        } else if (c == ']' || c == '}') {
            --depth;
        }
    }
    return std::string_view::npos;
}

// nlohmann messages read "[json.exception.parse_error.101] parse error at line 3, column 5:
// syntax error ..."; keep only the part after the position.
std::string detailOf(const std::string &what) {
    const auto colon = what.find(": ");
    if (colon != std::string::npos && what.find("parse error") < colon)
        return what.substr(colon + 2);
    const auto bracket = what.find("] ");
    return bracket == std::string::npos ? what : what.substr(bracket + 2);
}

void reportOverflow(std::string_view text, const std::string &what, Reader &reader) {
    // "[json.exception.out_of_range.406] number overflow parsing '1e400'"
    const auto open = what.find('\'');
    const auto close = what.rfind('\'');
    std::string token;
    if (open != std::string::npos && close > open) token = what.substr(open + 1, close - open - 1);
    const auto at = token.empty() ? std::string_view::npos : text.find(token);
    const TextPosition pos = positionOf(text, at == std::string_view::npos ? 0 : at);
    reader.error("", fmt::format("number out of range at line {}, column {}: '{}' does not fit a "
                                 "double; expected a finite number",
                                 pos.line, pos.column, token));
}

}  // namespace

TextPosition positionOf(std::string_view text, std::size_t offset) {
    TextPosition p;
    for (std::size_t i = 0; i < offset && i < text.size(); ++i) {
        if (text[i] == '\n') {
            ++p.line;
            p.column = 1;
        } else {
            ++p.column;
        }
    }
    return p;
}

std::optional<Json> parseGuarded(std::string_view text, Reader &reader) {
    if (text.size() > kMaxFileBytes) {
        reader.error("", fmt::format("file too large: {} bytes; a substance file may hold at "
                                     "most {} bytes (4 MiB)",
                                     text.size(), kMaxFileBytes));
        return std::nullopt;
    }
    if (const auto at = tooDeepAt(text); at != std::string_view::npos) {
        const TextPosition pos = positionOf(text, at);
        reader.error("", fmt::format("nesting too deep at line {}, column {}: more than {} "
                                     "levels of arrays/objects; expected at most {}",
                                     pos.line, pos.column, kMaxDepth, kMaxDepth));
        return std::nullopt;
    }
    try {
        return Json::parse(text, nullptr, true, false);
    } catch (const Json::parse_error &e) {
        const TextPosition pos = positionOf(text, e.byte > 0 ? e.byte - 1 : 0);
        reader.error("", fmt::format("malformed JSON at line {}, column {}: {}; expected a "
                                     "well-formed JSON document",
                                     pos.line, pos.column, detailOf(e.what())));
    } catch (const Json::out_of_range &e) {
        reportOverflow(text, e.what(), reader);
    } catch (const Json::exception &e) {
        reader.error("", fmt::format("malformed JSON: {}", detailOf(e.what())));
    }
    return std::nullopt;
}

}  // namespace pw::io
