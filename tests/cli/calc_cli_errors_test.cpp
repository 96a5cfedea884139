// `mendwright-cli calc ...` refuses bad input on every flag with exit code 2 and a message that
// names the flag, and prints nothing on standard output.
#include <catch2/catch.hpp>

#include <string>
#include <vector>

#include "tests/cli/calc_cli_run.hpp"

using calc_cli_test::run_cli;

namespace {

struct BadCase {
    std::vector<std::string> args;
    std::string flag;      // must appear in the message
    std::string expected;  // a fragment of what the message says was expected
};

void check_refused(const std::vector<BadCase>& cases) {
    for (const auto& bad : cases) {
        std::string joined;
        for (const auto& arg : bad.args) joined += arg + " ";
        INFO("mendwright-cli " << joined);
        auto run = run_cli(bad.args);
        INFO("stderr: " << run.err);
        CHECK(run.exit_code == 2);
        CHECK(run.out.empty());
        CHECK_THAT(run.err, Catch::Contains("mendwright-cli " + bad.args[0] + " " + bad.args[1] + ": " + bad.flag + ":"));
        CHECK_THAT(run.err, Catch::Contains(bad.expected));
    }
}

const std::vector<std::string> rod = {"calc", "rod"};

std::vector<std::string> with(std::vector<std::string> base, const std::vector<std::string>& more) {
    base.insert(base.end(), more.begin(), more.end());
    return base;
}

}  // namespace

TEST_CASE("calc cli errors: rod names the flag of every bad value") {
    const std::vector<std::string> ok_rod = {"--resistivity", "100", "--length", "3", "--diameter", "0.016"};
    check_refused({
        {with(rod, {"--length", "3", "--diameter", "0.016"}), "--resistivity", "is required"},
        {with(rod, {"--resistivity", "abc", "--length", "3", "--diameter", "0.016"}), "--resistivity", "expected a number > 0, got \"abc\""},
        {with(rod, {"--resistivity", "0", "--length", "3", "--diameter", "0.016"}), "--resistivity", "expected a number > 0"},
        {with(rod, {"--resistivity", "100", "--length", "abc", "--diameter", "0.016"}), "--length", "expected a number > 0, got \"abc\""},
        {with(rod, {"--resistivity", "100", "--length", "-3", "--diameter", "0.016"}), "--length", "expected a number > 0"},
        {with(rod, {"--resistivity", "100", "--length", "0.01", "--diameter", "0.016"}), "--length", "greater than the diameter"},
        {with(rod, {"--resistivity", "100", "--length", "3"}), "--diameter", "is required"},
        {with(rod, {"--resistivity", "100", "--length", "3", "--diameter", "nan"}), "--diameter", "expected a number > 0"},
        {with(with(rod, ok_rod), {"--count", "0", "--spacing", "3"}), "--count", ">= 1"},
        {with(with(rod, ok_rod), {"--count", "2.5", "--spacing", "3"}), "--count", "expected a whole number"},
        {with(with(rod, ok_rod), {"--count", "11", "--spacing", "3"}), "--count", "at most 10"},
        {with(with(rod, ok_rod), {"--layout", "square", "--spacing", "3"}), "--count", "required with --layout square"},
        {with(with(rod, ok_rod), {"--count", "2"}), "--spacing", "is required"},
        {with(with(rod, ok_rod), {"--count", "2", "--spacing", "0"}), "--spacing", "expected a number > 0"},
        {with(with(rod, ok_rod), {"--spacing", "x"}), "--spacing", "expected a number > 0"},
        {with(with(rod, ok_rod), {"--layout", "triangle", "--count", "3", "--spacing", "3"}), "--layout", "expected one of line, square"},
        {with(with(rod, ok_rod), {"--layout", "square", "--count", "1", "--spacing", "3"}), "--count", "2 to 10"},
        {with(with(rod, ok_rod), {"--season-factor", "0.5"}), "--season-factor", ">= 1"},
        {with(with(rod, ok_rod), {"--season-factor", "dry"}), "--season-factor", "expected a number > 0"},
        {with(with(rod, ok_rod), {"--json=yes"}), "--json", "takes no value"},
        {with(with(rod, ok_rod), {"--depth", "3"}), "--depth", "is not an option"},
        {with(rod, {"--resistivity"}), "--resistivity", "expected a value"},
    });
}

TEST_CASE("calc cli errors: zs-max names the flag of every bad value") {
    const std::vector<std::string> zs = {"calc", "zs-max"};
    check_refused({
        {with(zs, {"--rating", "32"}), "--curve", "is required"},
        {with(zs, {"--curve", "E", "--rating", "32"}), "--curve", "expected one of B, C, D, got \"E\""},
        {with(zs, {"--curve", "B"}), "--rating", "is required"},
        {with(zs, {"--curve", "B", "--rating", "0"}), "--rating", "expected a number > 0"},
        {with(zs, {"--curve", "B", "--rating", "thirty"}), "--rating", "expected a number > 0"},
        {with(zs, {"--curve", "B", "--rating", "200"}), "--rating", "<= 125 A"},
        {with(zs, {"--curve", "B", "--rating", "32", "--u0", "-230"}), "--u0", "expected a number > 0"},
        {with(zs, {"--curve", "B", "--rating", "32", "--u0", "inf"}), "--u0", "expected a number > 0"},
        {with(zs, {"--curve", "B", "--rating", "32", "--cmin", "1.5"}), "--cmin", "<= 1"},
        {with(zs, {"--curve", "B", "--rating", "32", "--cmin", "x"}), "--cmin", "expected a number > 0"},
        {with(zs, {"--curve", "B", "--rating", "32", "--json=1"}), "--json", "takes no value"},
    });
}

TEST_CASE("calc cli errors: rcd-limit names the flag of every bad value") {
    const std::vector<std::string> rcd = {"calc", "rcd-limit"};
    check_refused({
        {with(rcd, {}), "--idn", "is required"},
        {with(rcd, {"--idn", "0"}), "--idn", "expected a number > 0"},
        {with(rcd, {"--idn", "30mA"}), "--idn", "expected a number > 0, got \"30mA\""},
        {with(rcd, {"--idn", "30"}), "--idn", "in amperes (0.03 for 30 mA)"},
        {with(rcd, {"--idn", "0.03", "--touch-limit", "0"}), "--touch-limit", "expected a number > 0"},
        {with(rcd, {"--idn", "0.03", "--touch-limit", "fifty"}), "--touch-limit", "expected a number > 0"},
        {with(rcd, {"--idn", "0.03", "--json=true"}), "--json", "takes no value"},
    });
}

TEST_CASE("calc cli errors: fault-path names the flag of every bad value") {
    const std::vector<std::string> fault = {"calc", "fault-path"};
    check_refused({
        {with(fault, {"--ohms", "1,2"}), "--u0", "is required"},
        {with(fault, {"--u0", "0", "--ohms", "1,2"}), "--u0", "expected a number > 0"},
        {with(fault, {"--u0", "volts", "--ohms", "1,2"}), "--u0", "expected a number > 0"},
        {with(fault, {"--u0", "230"}), "--ohms", "is required"},
        {with(fault, {"--u0", "230", "--ohms", "1,-2"}), "--ohms", "item 2: expected a number >= 0"},
        {with(fault, {"--u0", "230", "--ohms", "a,b"}), "--ohms", "item 1"},
        {with(fault, {"--u0", "230", "--ohms", ""}), "--ohms", "expected a comma-separated list"},
        {with(fault, {"--u0", "230", "--ohms", "0,0"}), "--ohms", "total resistance > 0"},
        {with(fault, {"--u0", "230", "--ohms", "1,2", "--touch-index", "2"}), "--touch-index", "from 0 to 1"},
        {with(fault, {"--u0", "230", "--ohms", "1,2", "--touch-index", "-1"}), "--touch-index", ">= 0"},
        {with(fault, {"--u0", "230", "--ohms", "1,2", "--touch-index", "last"}), "--touch-index", "expected a whole number"},
        {with(fault, {"--u0", "230", "--ohms", "1,2", "--json=no"}), "--json", "takes no value"},
    });
}

TEST_CASE("calc cli errors: r1r2 names the flag of every bad value") {
    const std::vector<std::string> r1r2 = {"calc", "r1r2"};
    check_refused({
        {with(r1r2, {"--cpc-csa", "1.5", "--length", "20"}), "--line-csa", "is required"},
        {with(r1r2, {"--line-csa", "3", "--cpc-csa", "1.5", "--length", "20"}), "--line-csa", "expected one of the sizes"},
        {with(r1r2, {"--line-csa", "0", "--cpc-csa", "1.5", "--length", "20"}), "--line-csa", "expected a number > 0"},
        {with(r1r2, {"--line-csa", "2.5", "--length", "20"}), "--cpc-csa", "is required"},
        {with(r1r2, {"--line-csa", "2.5", "--cpc-csa", "2", "--length", "20"}), "--cpc-csa", "expected one of the sizes"},
        {with(r1r2, {"--line-csa", "2.5", "--cpc-csa", "1.5"}), "--length", "is required"},
        {with(r1r2, {"--line-csa", "2.5", "--cpc-csa", "1.5", "--length", "-20"}), "--length", "expected a number > 0"},
        {with(r1r2, {"--line-csa", "2.5", "--cpc-csa", "1.5", "--length", "20", "--temperature", "300"}), "--temperature",
         "-50 to 250"},
        {with(r1r2, {"--line-csa", "2.5", "--cpc-csa", "1.5", "--length", "20", "--temperature", "warm"}), "--temperature",
         "expected a number, got \"warm\""},
        {with(r1r2, {"--line-csa", "2.5", "--cpc-csa", "1.5", "--length", "20", "--json=1"}), "--json", "takes no value"},
    });
}

TEST_CASE("calc cli errors: adiabatic names the flag of every bad value") {
    const std::vector<std::string> adiabatic = {"calc", "adiabatic"};
    check_refused({
        {with(adiabatic, {"--time", "0.1", "--k", "115"}), "--fault-current", "is required"},
        {with(adiabatic, {"--fault-current", "0", "--time", "0.1", "--k", "115"}), "--fault-current", "expected a number > 0"},
        {with(adiabatic, {"--fault-current", "1000", "--k", "115"}), "--time", "is required"},
        {with(adiabatic, {"--fault-current", "1000", "--time", "6", "--k", "115"}), "--time", "<= 5 s"},
        {with(adiabatic, {"--fault-current", "1000", "--time", "-0.1", "--k", "115"}), "--time", "expected a number > 0"},
        {with(adiabatic, {"--fault-current", "1000", "--time", "0.1"}), "--k", "is required"},
        {with(adiabatic, {"--fault-current", "1000", "--time", "0.1", "--k", "0"}), "--k", "expected a number > 0"},
        {with(adiabatic, {"--fault-current", "1000", "--time", "0.1", "--k", "k115"}), "--k", "expected a number > 0"},
        {with(adiabatic, {"--fault-current", "1000", "--time", "0.1", "--k", "115", "--json=1"}), "--json", "takes no value"},
    });
}

TEST_CASE("calc cli errors: an unknown calc subcommand is a usage error") {
    auto run = run_cli({"calc", "ohms-law"});
    CHECK(run.exit_code == 2);
    CHECK_THAT(run.err, Catch::Contains("unknown subcommand \"ohms-law\""));
}
