#include "app/cli/atomic_output.h"

#include <fmt/format.h>
#include <unistd.h>

#include <cerrno>
#include <cstdio>
#include <cstring>
#include <filesystem>
#include <ostream>
#include <vector>

#include "core/errors.h"

namespace pw::cli {

AtomicOutput::AtomicOutput(const std::string &path, std::ostream &standardOutput)
    : path_(path), stdout_(&standardOutput), toStdout_(path == "-") {
    if (toStdout_) return;
    const std::filesystem::path target(path);
    const std::filesystem::path folder =
        target.has_parent_path() ? target.parent_path() : std::filesystem::path(".");
    std::string pattern = (folder / ("." + target.filename().string() + ".tmp-XXXXXX")).string();
    std::vector<char> name(pattern.begin(), pattern.end());
    name.push_back('\0');
    const int fd = ::mkstemp(name.data());
    if (fd < 0)
        throw Error(fmt::format("{}: cannot create a file in '{}': {}", path, folder.string(),
                                std::strerror(errno)));
    ::close(fd);
    tempPath_ = name.data();
    // The new, empty file opened without O_TRUNC: on ext4 a truncation to zero makes close()
    // start writing the whole file back (auto_da_alloc), which the command would wait for.
    file_.open(tempPath_, std::ios::binary | std::ios::in | std::ios::out);
    if (!file_) {
        std::remove(tempPath_.c_str());
        throw Error(fmt::format("{}: cannot open a temporary file for writing", path));
    }
}

AtomicOutput::~AtomicOutput() {
    if (toStdout_ || committed_) return;
    file_.close();
    std::remove(tempPath_.c_str());
}

void AtomicOutput::commit() {
    if (toStdout_) {
        stdout_->flush();
        if (!*stdout_) throw Error("writing to standard output failed");
        committed_ = true;
        return;
    }
    file_.flush();
    const bool written = static_cast<bool>(file_);
    file_.close();
    if (!written || file_.fail())
        throw Error(fmt::format("{}: writing failed (disk full?); no file written", path_));
    // mkstemp creates the file 0600; give the result the usual permissions.
    std::error_code ec;
    std::filesystem::permissions(
        tempPath_,
        std::filesystem::perms::owner_read | std::filesystem::perms::owner_write |
            std::filesystem::perms::group_read | std::filesystem::perms::others_read,
        ec);
    if (std::rename(tempPath_.c_str(), path_.c_str()) != 0)
        throw Error(fmt::format("{}: cannot replace the file: {}", path_, std::strerror(errno)));
    committed_ = true;
}

}  // namespace pw::cli
