#include "app/cli/cli.h"

#include <CLI/CLI.hpp>
#include <iostream>

#include "core/errors.h"

namespace pw::cli {
namespace {

void addCommands(CLI::App &app, Io &io) {
    // One line per command; each lives in its own cmd_*.cpp.
    addListCommand(app, io);
    addInfoCommand(app, io);
    addValidateCommand(app, io);
    addClassifyCommand(app, io);
    addBoundaryCommand(app, io);
    addPathCommand(app, io);
    addFitCommand(app, io);
    addCompareCommand(app, io);
#ifdef PW_HAVE_GUI
    addPlotCommand(app, io);
#endif
    (void)app;
    (void)io;
}

}  // namespace

int run(const std::vector<std::string> &args, Io io) {
    CLI::App app{
        "phasewright-cli: phase of a pure substance at a state point, margins to its phase "
        "boundaries, path crossings, fits and figures.\n"
        "Exit codes: 0 ok, 1 bad input, 2 usage error, 3 a rule failed (path --rules).",
        "phasewright-cli"};
    app.set_version_flag("--version", std::string("phasewright-cli ") + PW_VERSION);
    app.require_subcommand(1);
    app.fallthrough(false);
    addCommands(app, io);

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

int run(int argc, char **argv) {
    std::vector<std::string> args;
    for (int i = 1; i < argc; ++i) args.emplace_back(argv[i]);
    Io io{std::cout, std::cerr, std::cin};
    std::ios::sync_with_stdio(false);
    return run(args, io);
}

}  // namespace pw::cli
