// `mendwright-cli assess`, run as a separate process: JSON parsed back, the table, exit codes
// (app/cli/command.hpp: 0 ok, 1 unreadable, 3 invalid document), the caution in both forms.
// Expected findings: common practice codes (DOMAIN.md) and SI 2020/312 reg. 3 (read) for the due date.
#include <catch2/catch.hpp>

#include <cstdio>
#include <fstream>
#include <sstream>

#include <nlohmann/json.hpp>

#include "calc_cli_run.hpp"

using calc_cli_test::run_cli;
using nlohmann::json;

namespace {

std::string demo(const std::string& name) { return std::string(MENDWRIGHT_SOURCE_DIR) + "/pricebook-demo/jobs/" + name; }

std::string write_temp(const std::string& text) {
    char path[] = "/tmp/mendwright-assess-test-XXXXXX";
    const int fd = mkstemp(path);
    REQUIRE(fd >= 0);
    const auto written = ::write(fd, text.data(), text.size());
    close(fd);
    REQUIRE(written == static_cast<ssize_t>(text.size()));
    return path;
}

std::string read_file(const std::string& path) {
    std::ifstream file(path);
    std::stringstream text;
    text << file.rdbuf();
    return text.str();
}

}  // namespace

TEST_CASE("cli assess: --json on the rented terrace lists C2 findings due in 28 days and the caution", "[cli][assess]") {
    const auto run = run_cli({"assess", demo("rented-terrace-tt-no-rcd.json"), "--json"});
    INFO(run.err);
    REQUIRE(run.exit_code == 0);
    const json document = json::parse(run.out);
    REQUIRE(document.contains("caution"));
    CHECK(document["caution"].get<std::string>().find("competent person") != std::string::npos);
    const auto& findings = document["findings"];
    REQUIRE(findings.is_array());
    bool found = false;
    for (const auto& f : findings) {
        for (const char* key : {"id", "rule", "code", "title", "board", "circuit", "clause", "explanation", "inputs", "urgent", "due"})
            CHECK(f.contains(key));
        if (f["id"] == "tt.fault_protection@circuit:c-terrace-1") {
            found = true;
            CHECK(f["code"] == "C2");
            CHECK(f["urgent"] == true);
            CHECK(f["due"] == "2026-10-06");  // 2026-09-08 + 28 days
            CHECK(f["board"] == "cu-terrace");
            CHECK(f["circuit"] == "c-terrace-1");
        }
        if (f["urgent"] == false) CHECK(f["due"].is_null());
    }
    CHECK(found);
    int c2 = 0;
    for (const auto& f : findings) c2 += f["code"] == "C2" ? 1 : 0;
    CHECK(document["summary"]["C2"] == c2);
    CHECK(document["summary"]["C1"] == 0);
}

TEST_CASE("cli assess: the table shows code, place, clause, arithmetic, summary and caution", "[cli][assess]") {
    const auto run = run_cli({"assess", demo("farmhouse-tt-partial-rcd.json")});
    REQUIRE(run.exit_code == 0);
    CHECK_THAT(run.out, Catch::Contains("C2    "));
    CHECK_THAT(run.out, Catch::Contains("BS 7671:2018+A2 411.5.2, Table 41.1; due as agreed"));
    CHECK_THAT(run.out, Catch::Contains("If = U0 230 V / (Zs 143 Ω) = 1.61 A < Ia 30 A (5 × 6 A)"));
    CHECK_THAT(run.out, Catch::Contains("Summary: C1 0, C2 "));
    CHECK_THAT(run.out, Catch::Contains("Caution: results are a planning aid"));
}

TEST_CASE("cli assess: an invalid survey exits 3 and lists errors with their paths", "[cli][assess]") {
    json survey = json::parse(read_file(demo("farmhouse-tt-partial-rcd.json")));
    survey["boards"][0]["circuits"][0]["device"]["rating_amps"] = -32;
    const auto path = write_temp(survey.dump());
    const auto run = run_cli({"assess", path});
    std::remove(path.c_str());
    CHECK(run.exit_code == 3);
    CHECK_THAT(run.err, Catch::Contains("boards[0].circuits[0].device.rating_amps"));
    CHECK(run.out.empty());
}

TEST_CASE("cli assess: an unreadable file exits 1", "[cli][assess]") {
    const auto run = run_cli({"assess", "/nonexistent/mendwright/survey.json"});
    CHECK(run.exit_code == 1);
    CHECK_THAT(run.err, Catch::Contains("cannot read"));
}

TEST_CASE("cli assess: --profile with a changed code changes the finding; a bad profile exits 3 naming its path", "[cli][assess]") {
    json profile = json::parse(read_file(std::string(MENDWRIGHT_SOURCE_DIR) + "/profiles/bs7671-2018-a2.json"));
    profile["rules"]["electrode.resistance"]["above_stability_limit"]["code"] = "C2";
    const auto good = write_temp(profile.dump());
    auto run = run_cli({"assess", demo("rented-terrace-tt-no-rcd.json"), "--profile", good, "--json"});
    std::remove(good.c_str());
    REQUIRE(run.exit_code == 0);
    bool found = false;
    const json document = json::parse(run.out);
    for (const auto& f : document["findings"])
        if (f["id"] == "electrode.resistance@installation") {
            found = true;
            CHECK(f["code"] == "C2");
        }
    CHECK(found);

    profile["electrode"]["target_ohms"] = "a hundred";
    const auto bad = write_temp(profile.dump());
    run = run_cli({"assess", demo("rented-terrace-tt-no-rcd.json"), "--profile", bad});
    std::remove(bad.c_str());
    CHECK(run.exit_code == 3);
    CHECK_THAT(run.err, Catch::Contains("electrode.target_ohms: expected a number, got string"));
}
