// End-to-end: mendwright-cli options and plans on an invented survey written to a temporary file.
#include <catch2/catch.hpp>

#include <cstdio>
#include <filesystem>
#include <fstream>
#include <nlohmann/json.hpp>
#include <unistd.h>

#include "planner/io/survey_document.hpp"
#include "tests/cli/calc_cli_run.hpp"
#include "tests/planner/remedies/remedy_fixtures.hpp"

using namespace mendwright;

namespace {

std::string cottage_file() {
    static const std::string path = [] {
        // One file per test process: CTest runs test cases in parallel processes (and another
        // checkout's tests may run on the same machine), each rewriting its copy.
        const auto file = std::filesystem::temp_directory_path() /
                          ("mendwright-remedies-cli-cottage-" + std::to_string(::getpid()) + ".json");
        std::ofstream(file) << io::write_survey(remedy_test::tt_cottage_without_rcd());
        return file.string();
    }();
    return path;
}

const std::string demo_book = std::string(MENDWRIGHT_SOURCE_DIR) + "/pricebook-demo";

}  // namespace

TEST_CASE("options CLI: JSON lists verified, costed options with the caution", "[cli][remedies]") {
    const auto run = calc_cli_test::run_cli({"options", cottage_file(), "--pricebook", demo_book, "--json"});
    INFO(run.err);
    REQUIRE(run.exit_code == 0);
    const auto document = nlohmann::json::parse(run.out);
    CHECK_THAT(document.at("caution").get<std::string>(), Catch::Contains("competent person") && Catch::Contains("re-measure"));
    bool seen = false;
    for (const auto& option : document.at("options")) {
        const auto& cost = option.at("cost");
        CHECK(cost.at("total_pence").get<long long>() ==
              cost.at("materials_pence").get<long long>() + cost.at("labour_pence").get<long long>());
        if (option.at("id") != "upstream-rcd-s100@board:cu1") continue;
        seen = true;
        const auto cleared = option.at("verification").at("cleared").get<std::vector<std::string>>();
        CHECK(std::find(cleared.begin(), cleared.end(), "tt.fault_protection@circuit:c1") != cleared.end());
        CHECK(option.at("certificate").get<std::string>().find("from memory") != std::string::npos);
    }
    CHECK(seen);
}

TEST_CASE("options CLI: a price-book code missing for an option is an error naming the option and the code",
          "[cli][remedies]") {
    const auto folder =
        std::filesystem::temp_directory_path() / ("mendwright-remedies-cli-book-" + std::to_string(::getpid()));
    std::filesystem::create_directories(folder);
    std::filesystem::copy_file(demo_book + "/settings.json", folder / "settings.json",
                               std::filesystem::copy_options::overwrite_existing);
    {
        std::ifstream in(demo_book + "/items.csv");
        std::ofstream out(folder / "items.csv");
        std::string line;
        while (std::getline(in, line))
            if (line.rfind("RCD-30-ENCL,", 0) != 0) out << line << "\n";
    }
    const auto run = calc_cli_test::run_cli({"options", cottage_file(), "--pricebook", folder.string()});
    CHECK(run.exit_code == 3);
    CHECK_THAT(run.err, Catch::Contains("upstream-rcd-30@board:cu1") && Catch::Contains("RCD-30-ENCL"));
}

TEST_CASE("plans CLI: least-cost, ideal and custom plans side by side, in JSON and as a table", "[cli][remedies]") {
    const auto run = calc_cli_test::run_cli(
        {"plans", cottage_file(), "--pricebook", demo_book, "--choose", "board-two-rcd@board:cu1", "--json"});
    INFO(run.err);
    REQUIRE(run.exit_code == 0);
    const auto plans = nlohmann::json::parse(run.out).at("plans");
    REQUIRE(plans.size() == 3);
    CHECK(plans[0].at("name") == "least-cost");
    CHECK(plans[0].at("residual").at("C2") == 0);
    CHECK(plans[1].at("name") == "ideal");
    CHECK(plans[1].at("circuits_lost_on_one_trip") == 1);
    CHECK(plans[2].at("options") == nlohmann::json::array({"board-two-rcd@board:cu1"}));
    // Worst-season touch voltage with 30 mA devices: RA 160 ohms x 1.6 (March) x 0.03 A = 7.68 V.
    CHECK(plans[2].at("worst_touch_volts").get<double>() == Approx(7.68).margin(0.01));

    const auto table = calc_cli_test::run_cli({"plans", cottage_file(), "--pricebook", demo_book});
    REQUIRE(table.exit_code == 0);
    CHECK_THAT(table.out, Catch::Contains("least-cost") && Catch::Contains("circuits lost on one trip") &&
                              Catch::Contains("Caution"));
}

TEST_CASE("plans CLI: an unknown option id in --choose is a usage error naming the flag", "[cli][remedies]") {
    const auto run = calc_cli_test::run_cli({"plans", cottage_file(), "--pricebook", demo_book, "--choose", "nothing@here"});
    CHECK(run.exit_code == 2);
    CHECK_THAT(run.err, Catch::Contains("--choose") && Catch::Contains("nothing@here"));
}
