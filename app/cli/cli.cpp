#include "app/cli/cli.h"

#include <CLI/CLI.hpp>
#include <iostream>

#include "core/errors.h"

namespace pw::cli {
namespace {

void addCommands(CLI::App &app, Io &io, CommandAdder plot) {
    // One line per command; each lives in its own cmd_*.cpp.
    addListCommand(app, io);
    addInfoCommand(app, io);
    addValidateCommand(app, io);
    addClassifyCommand(app, io);
    addBoundaryCommand(app, io);
    addPathCommand(app, io);
    addFitCommand(app, io);
    addCompareCommand(app, io);
    if (plot != nullptr)
        plot(app, io);
    else
        addPlotForwarding(app, io);
}

// "phasewright-cli frobnicate": name the word and the commands (CLI11 would only say that a
// subcommand is required).
bool unknownCommand(const CLI::App &app, const std::vector<std::string> &args, Io &io) {
    if (args.empty() || args.front().empty() || args.front().front() == '-') return false;
    std::string names;
    for (const CLI::App *sub : app.get_subcommands({})) {
        if (sub->get_name() == args.front()) return false;
        names += (names.empty() ? "" : ", ") + sub->get_name();
    }
    io.err << "phasewright-cli: unknown command '" << args.front() << "' (commands: " << names
           << "; --help for more)\n";
    return true;
}

}  // namespace

int run(const std::vector<std::string> &args, Io io, CommandAdder plot) {
    CLI::App app{
        "phasewright-cli: phase of a pure substance at a state point, margins to its phase "
        "boundaries, path crossings, fits and figures.\n"
        "Exit codes: 0 ok, 1 bad input, 2 usage error, 3 a rule failed (path --rules).",
        "phasewright-cli"};
    app.set_version_flag("--version", std::string("phasewright-cli ") + PW_VERSION);
    app.require_subcommand(1);
    app.fallthrough(false);
    addCommands(app, io, plot);
    if (unknownCommand(app, args, io)) return kExitUsage;

    std::vector<std::string> reversed(args.rbegin(), args.rend());
    try {
        app.parse(reversed);
    } catch (const CLI::ParseError &e) {
        // Help and version go to stdout (exit 0); real parse errors to stderr (exit 2).
        const bool informational = e.get_exit_code() == 0;
        app.exit(e, io.out, io.err);
        return informational ? kExitOk : kExitUsage;
    } catch (const RulesFailed &) {
        return kExitRulesFailed;
    } catch (const pw::Error &e) {
        io.err << "phasewright-cli: error: " << e.what() << '\n';
        return kExitBadInput;
    } catch (const std::exception &e) {
        io.err << "phasewright-cli: error: " << e.what() << '\n';
        return kExitBadInput;
    }
    return kExitOk;
}

int run(int argc, char **argv, CommandAdder plot) {
    std::vector<std::string> args;
    for (int i = 1; i < argc; ++i) args.emplace_back(argv[i]);
    Io io{std::cout, std::cerr, std::cin};
    std::ios::sync_with_stdio(false);
    return run(args, io, plot);
}

}  // namespace pw::cli
