#pragma once
// The command-line front end. Exit codes: 0 ok, 1 bad input (files, values, substances),
// 2 usage error (unknown or conflicting options), 3 a checked rule failed (path --rules).
#include <exception>
#include <iosfwd>
#include <string>
#include <vector>

namespace CLI {
class App;
}

namespace pw::cli {

inline constexpr int kExitOk = 0;
inline constexpr int kExitBadInput = 1;
inline constexpr int kExitUsage = 2;
inline constexpr int kExitRulesFailed = 3;  // path --rules: the run broke a rule

// Thrown by a command whose output is complete but whose checks failed (exit 3).
struct RulesFailed : std::exception {
    const char *what() const noexcept override { return "a rule failed"; }
};

// Streams the commands write to; tests substitute string streams.
struct Io {
    std::ostream &out;
    std::ostream &err;
    std::istream &in;
};

// Adds a subcommand (and its callback) to the command line.
using CommandAdder = void (*)(CLI::App &app, Io &io);

// `plot` draws with Qt; phasewright-cli itself links no Qt, so that the other commands start
// without loading it. Its `plot` (no adder given) hands the command line on to the helper
// program phasewright-plot (app/plot_helper.cpp), which is the same command line with
// addPlotCommand (library phasewright_cli_plot) and so draws in-process.
int run(int argc, char **argv, CommandAdder plot = nullptr);
int run(const std::vector<std::string> &args, Io io, CommandAdder plot = nullptr);

// Each command adds its subcommand and the callback that performs it. The callback reports
// failures by throwing (pw::Error -> exit 1) after writing nothing to its output file.
void addListCommand(CLI::App &app, Io &io);
void addInfoCommand(CLI::App &app, Io &io);
void addValidateCommand(CLI::App &app, Io &io);
void addClassifyCommand(CLI::App &app, Io &io);
void addBoundaryCommand(CLI::App &app, Io &io);
void addPathCommand(CLI::App &app, Io &io);
void addFitCommand(CLI::App &app, Io &io);
void addCompareCommand(CLI::App &app, Io &io);
void addPlotCommand(CLI::App &app, Io &io);  // phasewright_cli_plot (with Qt) only
// `plot` handed on to phasewright-plot: found beside this program or in
// ../libexec/phasewright/ (app/cli/plot_forward.cpp).
void addPlotForwarding(CLI::App &app, Io &io);

}  // namespace pw::cli
