// `mendwright-cli validate FILE`, run as a separate process: exit codes and what it prints
// (exit codes from app/cli/command.hpp; messages and paths from docs/survey-format.md).
#include <catch2/catch.hpp>

#include <sys/wait.h>

#include <array>
#include <cstdio>
#include <string>

namespace {

struct Run {
    int exit_code = -1;
    std::string output;  // stdout and stderr together
};

Run run_cli(const std::string& arguments) {
    const std::string command = std::string("'") + MENDWRIGHT_CLI_PATH + "' " + arguments + " 2>&1";
    Run run;
    FILE* pipe = popen(command.c_str(), "r");
    REQUIRE(pipe != nullptr);
    std::array<char, 4096> buffer{};
    while (std::size_t n = std::fread(buffer.data(), 1, buffer.size(), pipe)) run.output.append(buffer.data(), n);
    const int status = pclose(pipe);
    run.exit_code = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
    return run;
}

std::string source_file(const std::string& relative) { return std::string("'") + MENDWRIGHT_SOURCE_DIR + "/" + relative + "'"; }

}  // namespace

TEST_CASE("cli.validate: a demo job is valid (exit 0)", "[cli][validate]") {
    const Run run = run_cli("validate " + source_file("pricebook-demo/jobs/farmhouse-tt-partial-rcd.json"));
    INFO(run.output);
    CHECK(run.exit_code == 0);
    CHECK_THAT(run.output, Catch::Contains("farmhouse-tt-partial-rcd.json: valid"));
    CHECK_THAT(run.output, !Catch::Contains("error:"));
}

TEST_CASE("cli.validate: warnings of a valid document are listed with their paths", "[cli][validate]") {
    const Run run = run_cli("validate " + source_file("pricebook-demo/jobs/rented-terrace-tt-no-rcd.json"));
    INFO(run.output);
    CHECK(run.exit_code == 0);
    CHECK_THAT(run.output, Catch::Contains("valid, 2 warnings"));
    CHECK_THAT(run.output, Catch::Contains("warning: electrode.measured_ra_ohms: 260 ohms is over 200 ohms"));
    CHECK_THAT(run.output, Catch::Contains("warning: tails.length_m: 14 m is over 10 m"));
}

TEST_CASE("cli.validate: a broken document exits 3 listing every error with its path", "[cli][validate]") {
    const Run run = run_cli("validate " + source_file("tests/data/surveys/several-problems.json"));
    INFO(run.output);
    CHECK(run.exit_code == 3);
    CHECK_THAT(run.output, Catch::Contains("invalid, 3 errors, 1 warning"));
    CHECK_THAT(run.output, Catch::Contains("error: job.inspection_date: expected a real calendar date"));
    CHECK_THAT(run.output, Catch::Contains("error: boards[0].circuits[0].device.rating_amps: expected a number > 0"));
    CHECK_THAT(run.output, Catch::Contains("got \"32A\""));
    CHECK_THAT(run.output, Catch::Contains("error: boards[0].circuits[0].upstream_id: no device \"rcd-missing\""));
    CHECK_THAT(run.output, Catch::Contains("warning: electrode.measured_ra_ohms"));
}

TEST_CASE("cli.validate: text that is not JSON exits 3 naming line and column", "[cli][validate]") {
    const Run run = run_cli("validate " + source_file("tests/data/surveys/not-json.json"));
    INFO(run.output);
    CHECK(run.exit_code == 3);
    CHECK_THAT(run.output, Catch::Contains("not valid JSON") && Catch::Contains("line 4, column 7"));
}

TEST_CASE("cli.validate: a file that cannot be read exits 1 with its path and the reason", "[cli][validate]") {
    const Run run = run_cli("validate /nonexistent/survey.json");
    INFO(run.output);
    CHECK(run.exit_code == 1);
    CHECK_THAT(run.output, Catch::Contains("/nonexistent/survey.json: cannot read: No such file or directory"));
    const Run folder = run_cli("validate " + source_file("tests/data/surveys"));
    CHECK(folder.exit_code == 1);
    CHECK_THAT(folder.output, Catch::Contains("is a directory"));
}

TEST_CASE("cli.validate: without a file it is a usage error (exit 2)", "[cli][validate]") {
    const Run run = run_cli("validate");
    CHECK(run.exit_code == 2);
    CHECK_THAT(run.output, Catch::Contains("FILE: is required"));
}
