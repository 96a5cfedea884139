// End-to-end: mendwright-cli quote on the invented demo jobs writes the workbook and reports
// totals that add up; bad arguments name the flag and leave no file behind.
#include <catch2/catch.hpp>

#include <cmath>
#include <filesystem>
#include <fstream>
#include <nlohmann/json.hpp>
#include <unistd.h>

#include "tests/cli/calc_cli_run.hpp"

namespace {

const std::string demo_dir = std::string(MENDWRIGHT_SOURCE_DIR) + "/pricebook-demo";
const std::string terrace = demo_dir + "/jobs/rented-terrace-tt-no-rcd.json";

std::filesystem::path fresh_dir(const std::string& name) {
    // Per process: another checkout's tests may run on the same machine at the same time.
    auto dir = std::filesystem::temp_directory_path() / ("mendwright-quote-cli-" + name + "-" + std::to_string(::getpid()));
    std::filesystem::remove_all(dir);
    std::filesystem::create_directories(dir);
    return dir;
}

}  // namespace

TEST_CASE("quote CLI: least-cost quote of a demo job writes a workbook whose totals add up", "[cli][quote]") {
    const auto dir = fresh_dir("least-cost");
    const auto out = dir / "Q-terrace.xlsx";
    const auto run = calc_cli_test::run_cli({"quote", terrace, "--pricebook", demo_dir, "--plan", "least-cost", "--out",
                                            out.string(), "--date", "2026-12-02", "--json"});
    INFO(run.err);
    REQUIRE(run.exit_code == 0);
    const auto doc = nlohmann::json::parse(run.out);
    CHECK(doc.at("file").get<std::string>() == out.string());
    REQUIRE(std::filesystem::exists(out));
    std::ifstream file(out, std::ios::binary);
    char magic[2] = {};
    file.read(magic, 2);
    CHECK(std::string(magic, 2) == "PK");  // an .xlsx is a zip container (ECMA-376 Part 2, OPC)

    long long lines_total = 0;
    for (const auto& line : doc.at("lines")) {
        CHECK(line.at("total_pence").get<long long>() ==
              line.at("materials_pence").get<long long>() + line.at("labour_pence").get<long long>());
        lines_total += line.at("total_pence").get<long long>();
    }
    CHECK(lines_total == doc.at("subtotal_pence").get<long long>());
    const long long net = doc.at("net_pence").get<long long>();
    CHECK(net == doc.at("subtotal_pence").get<long long>() + doc.at("contingency_pence").get<long long>() +
                     doc.at("markup_pence").get<long long>());
    // VAT at the demo price book's 20 % (the UK standard rate, VAT Act 1994 s.2), to the nearest penny.
    CHECK(doc.at("vat_pence").get<long long>() == std::llround(net * 0.20));
    CHECK(doc.at("total_pence").get<long long>() == net + doc.at("vat_pence").get<long long>());
    CHECK_THAT(doc.at("caution").get<std::string>(), Catch::Contains("competent person"));
}

TEST_CASE("quote CLI: an unknown plan name is a usage error naming --plan", "[cli][quote]") {
    const auto dir = fresh_dir("bad-plan");
    const auto run = calc_cli_test::run_cli(
        {"quote", terrace, "--pricebook", demo_dir, "--plan", "cheapest", "--out", (dir / "q.xlsx").string()});
    CHECK(run.exit_code == 2);
    CHECK_THAT(run.err, Catch::Contains("--plan") && Catch::Contains("least-cost, ideal or custom"));
    CHECK(std::filesystem::is_empty(dir));
}

TEST_CASE("quote CLI: a custom plan needs --choose, and an unknown option id is named", "[cli][quote]") {
    const auto dir = fresh_dir("custom");
    auto run = calc_cli_test::run_cli(
        {"quote", terrace, "--pricebook", demo_dir, "--plan", "custom", "--out", (dir / "q.xlsx").string()});
    CHECK(run.exit_code == 2);
    CHECK_THAT(run.err, Catch::Contains("--choose"));
    run = calc_cli_test::run_cli({"quote", terrace, "--pricebook", demo_dir, "--plan", "custom", "--choose", "no-such-option",
                                  "--out", (dir / "q.xlsx").string()});
    CHECK(run.exit_code == 2);
    CHECK_THAT(run.err, Catch::Contains("no-such-option"));
    CHECK(std::filesystem::is_empty(dir));
}

TEST_CASE("quote CLI: a target folder that does not exist is an error and writes nothing", "[cli][quote]") {
    const auto dir = fresh_dir("unwritable");
    const auto target = dir / "missing-folder" / "q.xlsx";
    const auto run = calc_cli_test::run_cli(
        {"quote", terrace, "--pricebook", demo_dir, "--plan", "ideal", "--out", target.string(), "--date", "2026-12-02"});
    CHECK(run.exit_code == 1);
    CHECK_THAT(run.err, Catch::Contains("missing-folder"));
    CHECK_FALSE(std::filesystem::exists(target));
    CHECK(std::filesystem::is_empty(dir));
}

TEST_CASE("quote CLI: a malformed --date names the flag", "[cli][quote]") {
    const auto dir = fresh_dir("bad-date");
    const auto run = calc_cli_test::run_cli({"quote", terrace, "--pricebook", demo_dir, "--plan", "ideal", "--out",
                                            (dir / "q.xlsx").string(), "--date", "02/12/2026"});
    CHECK(run.exit_code == 2);
    CHECK_THAT(run.err, Catch::Contains("--date") && Catch::Contains("YYYY-MM-DD"));
}

TEST_CASE("quote CLI: free lines from --extra-lines are priced into the quote by the money rules", "[cli][quote]") {
    const auto dir = fresh_dir("extra-lines");
    const auto extras = dir / "extras.csv";
    std::ofstream(extras) << "# invented free lines\n"
                             "description,unit,quantity,material_cost,labour_hours,note\n"
                             "\"Lift and refit floorboards, landing\",each,2,1.35,0.5,invented\n";
    const auto out = dir / "q.xlsx";
    const auto run = calc_cli_test::run_cli({"quote", terrace, "--pricebook", demo_dir, "--plan", "least-cost", "--out",
                                            out.string(), "--extra-lines", extras.string(), "--json"});
    INFO(run.err);
    REQUIRE(run.exit_code == 0);
    const auto doc = nlohmann::json::parse(run.out);
    const nlohmann::json* free_line = nullptr;
    for (const auto& line : doc.at("lines"))
        if (line.at("description") == "Lift and refit floorboards, landing") free_line = &line;
    REQUIRE(free_line);
    CHECK(free_line->at("option") == "");
    CHECK(free_line->at("quantity").get<double>() == 2.0);
    // Hand-worked: materials 2 x £1.35 = £2.70; labour 2 x 0.5 h x the demo rate of £48.00/h = £48.00.
    CHECK(free_line->at("materials_pence").get<long long>() == 270);
    CHECK(free_line->at("labour_pence").get<long long>() == 4800);
}

TEST_CASE("quote CLI: a bad --extra-lines file names the file, line and column and writes nothing", "[cli][quote]") {
    const auto dir = fresh_dir("extra-lines-bad");
    const auto extras = dir / "extras.csv";
    std::ofstream(extras) << "description,unit,quantity,material_cost,labour_hours\n"
                             "Make good plaster,each,two,5.00,1\n";
    const auto out = dir / "q.xlsx";
    const auto run = calc_cli_test::run_cli({"quote", terrace, "--pricebook", demo_dir, "--plan", "least-cost", "--out",
                                            out.string(), "--extra-lines", extras.string()});
    CHECK(run.exit_code == 3);
    CHECK_THAT(run.err, Catch::Contains("extras.csv:2:quantity") && Catch::Contains("got \"two\""));
    CHECK_FALSE(std::filesystem::exists(out));
}
