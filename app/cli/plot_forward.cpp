// `phasewright-cli plot` handed on to the helper program phasewright-plot (see app/cli/cli.h):
// the same arguments, the same streams, its exit code (the helper replaces this process).
#include <fmt/format.h>
#include <unistd.h>

#include <CLI/CLI.hpp>
#include <cerrno>
#include <cstring>
#include <filesystem>
#include <iostream>
#include <string>
#include <vector>

#include "app/cli/cli.h"
#include "core/errors.h"

namespace pw::cli {
namespace {

namespace fs = std::filesystem;

constexpr const char *kHelper = "phasewright-plot";

// Beside this program (the build tree), or in ../libexec/phasewright/ (installed).
fs::path findHelper() {
    std::error_code ec;
    const fs::path self = fs::read_symlink("/proc/self/exe", ec);
    if (ec) throw Error(fmt::format("plot: cannot find this program's folder: {}", ec.message()));
    const fs::path folder = self.parent_path();
    for (const fs::path &candidate :
         {folder / kHelper, folder / ".." / "libexec" / "phasewright" / kHelper}) {
        if (::access(candidate.c_str(), X_OK) == 0) return candidate;
    }
    throw Error(
        fmt::format("plot: the figure helper {} is not installed (looked beside {} and in "
                    "{}); a build without the desktop part draws no figures",
                    kHelper, self.string(), (folder / ".." / "libexec" / "phasewright").string()));
}

[[noreturn]] void runHelper(const std::vector<std::string> &args, Io &io) {
    // Only the real process streams can be handed on; in-process callers (tests) add the
    // plot command itself (run(..., &addPlotCommand)).
    if (&io.out != &std::cout || &io.err != &std::cerr)
        throw Error("plot: in-process callers pass addPlotCommand to run()");
    const fs::path helper = findHelper();
    std::vector<std::string> argv{kHelper, "plot"};
    argv.insert(argv.end(), args.begin(), args.end());
    std::vector<char *> pointers;
    for (std::string &a : argv) pointers.push_back(a.data());
    pointers.push_back(nullptr);
    std::cout.flush();
    std::cerr.flush();
    ::execv(helper.c_str(), pointers.data());
    throw Error(fmt::format("plot: cannot start {}: {}", helper.string(), std::strerror(errno)));
}

}  // namespace

void addPlotForwarding(CLI::App &app, Io &io) {
    CLI::App *cmd = app.add_subcommand(
        "plot",
        "Annotated phase diagram as PNG, SVG or PDF (format from the --output extension), "
        "drawn without a display by the desktop's rendering code ('plot --help' for its "
        "options)");
    cmd->prefix_command();  // every argument after `plot` goes to the helper as it is
    cmd->set_help_flag();   // --help too
    cmd->callback([cmd, &io] { runHelper(cmd->remaining(), io); });
}

}  // namespace pw::cli
