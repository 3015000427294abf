#include "core/run/json_file.h"

#include <fstream>
#include <sstream>

namespace pw::run {

std::string readTextFile(const std::string &path) {
    std::ifstream in(path, std::ios::binary);
    if (!in) throw InputError(path, 0, "", "cannot open the file");
    std::ostringstream ss;
    ss << in.rdbuf();
    return ss.str();
}

nlohmann::json parseJsonText(std::string_view content, const std::string &file) {
    try {
        return nlohmann::json::parse(content);
    } catch (const nlohmann::json::parse_error &e) {
        throw InputError(file, 0, "", std::string("not valid JSON: ") + e.what());
    }
}

}  // namespace pw::run
