// `mendwright-cli calc ...` run as a program: JSON results against the same published values
// as the calc reference tests, and the text form with its caution.
#include <catch2/catch.hpp>

#include <nlohmann/json.hpp>

#include "tests/cli/calc_cli_run.hpp"

using calc_cli_test::run_cli;
using nlohmann::json;

namespace {

json json_of(const std::vector<std::string>& args) {
    auto run = run_cli(args);
    INFO("stderr: " << run.err);
    REQUIRE(run.exit_code == 0);
    REQUIRE(run.err.empty());
    auto parsed = json::parse(run.out);  // throws, failing the test, if not exactly one JSON document
    REQUIRE(parsed.is_object());
    REQUIRE(parsed.contains("value"));
    REQUIRE(parsed.contains("unit"));
    REQUIRE(parsed.contains("source"));
    return parsed;
}

const std::string caution_start = "Caution: results are a planning aid.";

}  // namespace

TEST_CASE("calc cli: rod --json gives 17.12 ohm for rho 55, 3.0 m, 25 mm") {
    // Recomputed from the published rod formula (BS 7430 / IEEE Std 142), DOMAIN.md check.
    auto result = json_of({"calc", "rod", "--resistivity", "55", "--length", "3.0", "--diameter", "0.025", "--json"});
    CHECK(result["value"].get<double>() == Approx(17.12).margin(0.005));
    CHECK(result["unit"] == "ohm");
    CHECK(result["rods"] == 1);
    CHECK(result["single_rod_ohms"].get<double>() == Approx(17.12).margin(0.005));
    CHECK_FALSE(result.contains("worst_season_ohms"));
    CHECK(result["caution"].get<std::string>().rfind(caution_start, 0) == 0);
}

TEST_CASE("calc cli: rod group and worst season (BS 7430 two rods, factor 1.5)") {
    // BS 7430 two rods 3 m apart (worked by hand in the reference tests): 10.018 ohm; x 1.5 = 15.03.
    auto result = json_of({"calc", "rod", "--resistivity", "55", "--length", "3", "--diameter", "0.025", "--count", "2",
                           "--spacing", "3", "--season-factor", "1.5", "--json"});
    CHECK(result["value"].get<double>() == Approx(10.018).epsilon(1e-4));
    CHECK(result["rods"] == 2);
    CHECK(result["layout"] == "line");
    CHECK(result["worst_season_ohms"].get<double>() == Approx(15.027).epsilon(1e-4));
}

TEST_CASE("calc cli: rod hollow square of 3 a side has 8 rods and warns above 200 ohm") {
    // BS 7430 (memory): N = 4(n - 1) = 8.
    auto square = json_of({"calc", "rod", "--resistivity", "100", "--length", "3", "--diameter", "0.016", "--count", "3",
                           "--spacing", "3", "--layout", "square", "--json"});
    CHECK(square["rods"] == 8);
    CHECK(square["layout"] == "square");
    CHECK(square["notes"].empty());
    // 1000 ohm m soil: one rod is about 335 ohm, above the 200 ohm note of Table 41.5 (read).
    auto poor = json_of({"calc", "rod", "--resistivity", "1000", "--length", "3", "--diameter", "0.016", "--json"});
    REQUIRE(poor["notes"].size() == 1);
    CHECK_THAT(poor["notes"][0].get<std::string>(), Catch::Contains("200 ohm"));
}

TEST_CASE("calc cli: zs-max --json reproduces Table 41.3 B32 1.37 and D50 0.22 with the 0.8 limit") {
    // BS 7671 Table 41.3 (read): B32 1.37 ohm; GN3 0.8 rule (read).
    auto b32 = json_of({"calc", "zs-max", "--curve", "B", "--rating", "32", "--json"});
    CHECK(b32["table_precision_ohms"].get<double>() == Approx(1.37).margin(1e-9));
    CHECK(b32["value"].get<double>() == Approx(1.365625).epsilon(1e-9));
    CHECK(b32["measured_limit_ohms"].get<double>() == Approx(0.8 * 1.365625).epsilon(1e-9));
    CHECK(b32["unit"] == "ohm");
    auto d50 = json_of({"calc", "zs-max", "--curve", "d", "--rating", "50", "--json"});
    CHECK(d50["table_precision_ohms"].get<double>() == Approx(0.22).margin(1e-9));
    CHECK(d50["curve"] == "D");
    // Without Cmin the 2008 edition's B32 was 1.44 ohm (read).
    auto old = json_of({"calc", "zs-max", "--curve", "B", "--rating", "32", "--cmin", "1", "--json"});
    CHECK(old["table_precision_ohms"].get<double>() == Approx(1.44).margin(1e-9));
}

TEST_CASE("calc cli: rcd-limit --json gives Table 41.5's 1667 ohm for 30 mA") {
    // BS 7671 Table 41.5 (read).
    auto result = json_of({"calc", "rcd-limit", "--idn", "0.03", "--json"});
    CHECK(result["value"].get<double>() == Approx(1666.67).epsilon(1e-5));
    CHECK(result["table_precision_ohms"].get<double>() == 1667.0);
    auto hundred = json_of({"calc", "rcd-limit", "--idn", "0.1", "--touch-limit", "50", "--json"});
    CHECK(hundred["table_precision_ohms"].get<double>() == 500.0);
}

TEST_CASE("calc cli: fault-path --json on an invented TT fault worked by hand") {
    // Invented example (Ohm's law): 230 V, 0.5 + 0.3 + 100 + 14.2 = 115 ohm, 2 A; 200 V on element 2.
    auto result = json_of({"calc", "fault-path", "--u0", "230", "--ohms", "0.5,0.3,100,14.2", "--touch-index", "2", "--json"});
    CHECK(result["current_amps"].get<double>() == Approx(2.0));
    CHECK(result["unit"] == "A");
    REQUIRE(result["elements"].size() == 4);
    CHECK(result["elements"][2]["ohms"].get<double>() == Approx(100.0));
    CHECK(result["elements"][2]["volts"].get<double>() == Approx(200.0));
    CHECK(result["touch_volts"].get<double>() == Approx(200.0));
    CHECK(result["touch_above_limit"] == true);
    REQUIRE(result["node_volts"].size() == 5);
    CHECK(result["node_volts"][3].get<double>() == Approx(28.4));
    // Without --touch-index the last element is the electrode-to-earth path: 2 A x 14.2 = 28.4 V.
    auto last = json_of({"calc", "fault-path", "--u0", "230", "--ohms", "0.5,0.3,100,14.2", "--json"});
    CHECK(last["touch_index"] == 3);
    CHECK(last["touch_volts"].get<double>() == Approx(28.4));
    CHECK(last["touch_above_limit"] == false);
}

TEST_CASE("calc cli: r1r2 --json gives 19.51 mohm/m for 2.5/1.5 and scales to 70 C by 1.20") {
    // IEC 60228 / twin and earth R1+R2 19.51 mohm/m (read); 70 C multiplier 1.20 (memory).
    auto result = json_of({"calc", "r1r2", "--line-csa", "2.5", "--cpc-csa", "1.5", "--length", "20", "--json"});
    CHECK(result["value"].get<double>() == Approx(0.3902).epsilon(1e-9));
    CHECK(result["r1_plus_r2_mohm_per_m_at_20c"].get<double>() == Approx(19.51).epsilon(1e-12));
    CHECK(result["ohms_at_70c"].get<double>() == Approx(0.46824).epsilon(1e-9));
    auto hot = json_of({"calc", "r1r2", "--line-csa", "2.5", "--cpc-csa", "1.5", "--length", "20", "--temperature", "70",
                        "--json"});
    CHECK(hot["value"].get<double>() == Approx(0.46824).epsilon(1e-9));
    CHECK(hot["temperature_multiplier"].get<double>() == Approx(1.2).epsilon(1e-12));
}

TEST_CASE("calc cli: adiabatic --json gives 2.75 mm2 for 1000 A, 0.1 s, k 115") {
    // BS 7671 543.1.3 (read).
    auto result = json_of({"calc", "adiabatic", "--fault-current", "1000", "--time", "0.1", "--k", "115", "--json"});
    CHECK(result["value"].get<double>() == Approx(2.75).margin(0.005));
    CHECK(result["unit"] == "mm2");
    CHECK(result["next_standard_csa_mm2"].get<double>() == 4.0);
}

TEST_CASE("calc cli: text output is one result line with value, unit and source, then the caution") {
    auto rod = run_cli({"calc", "rod", "--resistivity", "55", "--length", "3", "--diameter", "0.025"});
    REQUIRE(rod.exit_code == 0);
    CHECK(rod.out.rfind("17.12 ohm - ", 0) == 0);
    CHECK_THAT(rod.out, Catch::Contains("BS 7430"));
    CHECK_THAT(rod.out, Catch::EndsWith("take precedence.\n"));
    CHECK_THAT(rod.out, Catch::Contains("\n" + caution_start));

    auto zs = run_cli({"calc", "zs-max", "--curve", "C", "--rating", "32"});
    REQUIRE(zs.exit_code == 0);
    CHECK(zs.out.rfind("0.68 ohm - ", 0) == 0);  // Table 41.3 C32 (read)
    CHECK_THAT(zs.out, Catch::Contains("Table 41.3"));

    for (const auto& args : std::vector<std::vector<std::string>>{
             {"calc", "rcd-limit", "--idn", "0.3"},
             {"calc", "fault-path", "--u0", "230", "--ohms", "1,45"},
             {"calc", "r1r2", "--line-csa", "1.5", "--cpc-csa", "1", "--length", "10"},
             {"calc", "adiabatic", "--fault-current", "400", "--time", "0.4", "--k", "143"}}) {
        auto run = run_cli(args);
        INFO(args[1]);
        REQUIRE(run.exit_code == 0);
        CHECK_THAT(run.out, Catch::Contains(caution_start));
    }
    auto rcd = run_cli({"calc", "rcd-limit", "--idn", "0.3"});
    CHECK(rcd.out.rfind("166.7 ohm - ", 0) == 0);  // Table 41.5 300 mA: 167 (read)
}

TEST_CASE("calc cli: --help lists every calc subcommand") {
    auto top = run_cli({"--help"});
    REQUIRE(top.exit_code == 0);
    auto calc = run_cli({"calc", "--help"});
    REQUIRE(calc.exit_code == 0);
    for (const char* name : {"calc rod", "calc zs-max", "calc rcd-limit", "calc fault-path", "calc r1r2", "calc adiabatic"}) {
        CHECK_THAT(top.out, Catch::Contains(name));
        CHECK_THAT(calc.out, Catch::Contains(name));
    }
    auto rod_help = run_cli({"calc", "rod", "--help"});
    REQUIRE(rod_help.exit_code == 0);
    for (const char* flag : {"--resistivity", "--length", "--diameter", "--count", "--spacing", "--layout",
                             "--season-factor", "--json"})
        CHECK_THAT(rod_help.out, Catch::Contains(flag));
}
