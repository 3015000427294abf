#pragma once
// An output file that appears only when complete: the text goes to a temporary file in the
// same folder, and commit() renames it over the target. If commit() is never reached (an
// error, an exception) the destructor removes the temporary file, so nothing is left behind
// and an existing file of that name is untouched. The name "-" means the given stream
// (stdout), written directly.
#include <fstream>
#include <iosfwd>
#include <string>

namespace pw::cli {

class AtomicOutput {
public:
    // Throws pw::Error naming the file when the temporary file cannot be created.
    AtomicOutput(const std::string &path, std::ostream &standardOutput);
    AtomicOutput(const AtomicOutput &) = delete;
    AtomicOutput &operator=(const AtomicOutput &) = delete;
    ~AtomicOutput();

    std::ostream &stream() { return toStdout_ ? *stdout_ : file_; }
    bool isStdout() const { return toStdout_; }
    // Flushes, closes and renames; throws pw::Error naming the file on any failure (and then
    // removes the temporary file).
    void commit();

private:
    std::string path_;
    std::string tempPath_;
    std::ostream *stdout_;
    std::ofstream file_;
    bool toStdout_ = false;
    bool committed_ = false;
};

}  // namespace pw::cli
