// mendwright-cli: the field calculator, survey assessment, remedy options, quotes and job store
// from the command line. All work is done by the registered commands (one file each).
#include <iostream>
#include <string>
#include <vector>

#include "app/cli/command.hpp"

int main(int argc, char** argv) {
    std::vector<std::string> args(argv, argv + argc);
    return mendwright::cli::run_cli(args, std::cout, std::cerr);
}
