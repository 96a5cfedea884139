#pragma once
// Runs the built mendwright-cli (MENDWRIGHT_CLI_PATH) with arguments and captures its exit
// code, standard output and standard error, for the calc command tests.
#include <sys/wait.h>
#include <unistd.h>

#include <cstdio>
#include <cstdlib>
#include <fstream>
#include <sstream>
#include <string>
#include <vector>

namespace calc_cli_test {

struct Run {
    int exit_code = -1;
    std::string out;
    std::string err;
};

inline std::string shell_quoted(const std::string& text) {
    std::string quoted = "'";
    for (char c : text) quoted += c == '\'' ? std::string("'\\''") : std::string(1, c);
    return quoted + "'";
}

inline Run run_cli(const std::vector<std::string>& args) {
    char err_path[] = "/tmp/mendwright-calc-cli-XXXXXX";
    const int fd = mkstemp(err_path);
    if (fd >= 0) close(fd);
    std::string command = shell_quoted(MENDWRIGHT_CLI_PATH);
    for (const auto& arg : args) command += " " + shell_quoted(arg);
    command += " 2>" + shell_quoted(err_path);
    Run run;
    if (FILE* pipe = popen(command.c_str(), "r")) {
        char buffer[4096];
        std::size_t got = 0;
        while ((got = std::fread(buffer, 1, sizeof buffer, pipe)) > 0) run.out.append(buffer, got);
        const int status = pclose(pipe);
        run.exit_code = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
    }
    std::ifstream err_file(err_path);
    std::stringstream err_text;
    err_text << err_file.rdbuf();
    run.err = err_text.str();
    std::remove(err_path);
    return run;
}

}  // namespace calc_cli_test
