// phasewright-plot: the command line with `plot` drawn in this process (Qt). phasewright-cli
// hands `plot` on to this program (app/cli/plot_forward.cpp); every other command works here
// too, as in phasewright-cli.
#include "app/cli/cli.h"

int main(int argc, char **argv) { return pw::cli::run(argc, argv, &pw::cli::addPlotCommand); }
