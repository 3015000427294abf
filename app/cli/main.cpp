// phasewright-cli: batch classification, boundary queries, fitting and figures.
#include "app/cli/cli.h"

int main(int argc, char **argv) { return pw::cli::run(argc, argv); }
