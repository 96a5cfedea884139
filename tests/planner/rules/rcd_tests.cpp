// rcd.selectivity: upstream S-type and IΔn >= 3 x downstream (general rule read; 536.4.1.4 from
// memory). rcd.standing_leakage: <= 30 % of IΔn (531.3.2, read: 9 mA on a 30 mA device).
// rcd.trip_time: BS EN 61008-1 / 61009-1 (read): general 300 ms at IΔn, 40 ms at 5 IΔn;
// S-type 500 ms and 150 ms.
#include <catch2/catch.hpp>

#include "fixture_findings.hpp"
#include "fixture_installation.hpp"

using namespace mendwright;
using namespace mendwright::test;

namespace {

// Upstream device "up" in the origin enclosure, feeding board "cu" whose 30 mA RCD rcd1 serves c1.
model::Installation two_in_series(double up_idn_amps, model::RcdDelay up_delay, double down_idn_amps = 0.03) {
    auto installation = tt_dwelling(40.0);
    auto feed = circuit("s1", model::CircuitUse::submain, main_switch("iso"), "up");
    feed.feeds_board_id = "cu";
    installation.boards.push_back(board("origin", {rcd("up", up_idn_amps, up_delay)}, {feed}));
    installation.boards.push_back(board("cu", {rcd("rcd1", down_idn_amps)},
                                        {circuit("c1", model::CircuitUse::sockets, breaker("cb1", model::BreakerCurve::b, 32), "rcd1")}));
    return installation;
}

}  // namespace

TEST_CASE("rules rcd.selectivity: 100 mA S-type above 30 mA is selective", "[rules][rcd]") {
    // 100 >= 3 x 30 = 90 mA, and time-delayed.
    CHECK(findings_of_rule(assess_default(two_in_series(0.1, model::RcdDelay::time_delayed)), "rcd.selectivity").empty());
}

TEST_CASE("rules rcd.selectivity: 100 mA without delay above 30 mA is not selective, C3", "[rules][rcd]") {
    const auto findings = assess_default(two_in_series(0.1, model::RcdDelay::general));
    auto finding = finding_with_id(findings, "rcd.selectivity@device:up>rcd1");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c3);
    CHECK(finding->device_id == "up");
    CHECK(finding->explanation.find("not time-delayed") != std::string::npos);
}

TEST_CASE("rules rcd.selectivity: 80 mA S-type above 30 mA falls short of 3 times", "[rules][rcd]") {
    // 80 < 3 x 30 = 90 mA.
    auto finding = finding_with_id(assess_default(two_in_series(0.08, model::RcdDelay::time_delayed)), "rcd.selectivity@device:up>rcd1");
    REQUIRE(finding);
    CHECK(finding->explanation.find("upstream IΔn 80 mA < 3 × 30 mA = 90 mA") != std::string::npos);
}

TEST_CASE("rules rcd.selectivity: 300 mA S-type above a 100 mA S-type is exactly 3 times, selective", "[rules][rcd]") {
    CHECK(findings_of_rule(assess_default(two_in_series(0.3, model::RcdDelay::time_delayed, 0.1)), "rcd.selectivity").empty());
}

TEST_CASE("rules rcd.standing_leakage: 9.5 mA on a 30 mA RCD is over the 9 mA budget, 9 mA is not", "[rules][rcd]") {
    auto installation = tt_dwelling(40.0);
    auto make = [](const std::string& id, double leakage_ma) {
        auto c = circuit(id, model::CircuitUse::other, breaker("cb" + id, model::BreakerCurve::b, 16), "rcd1");
        c.standing_leakage_ma = leakage_ma;
        return c;
    };
    installation.boards.push_back(board("cu", {rcd("rcd1", 0.03)}, {make("c1", 4.0), make("c2", 3.5), make("c3", 2.0)}));
    auto finding = finding_with_id(assess_default(installation), "rcd.standing_leakage@device:rcd1");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c3);
    CHECK(finding->explanation.find("= 9.5 mA > 30 % × 30 mA = 9 mA") != std::string::npos);

    installation.boards[0].circuits[1].standing_leakage_ma = 3.0;  // 4 + 3 + 2 = 9 mA
    CHECK(findings_of_rule(assess_default(installation), "rcd.standing_leakage").empty());
}

TEST_CASE("rules rcd.standing_leakage: circuits of a sub-board count against the RCD upstream", "[rules][rcd]") {
    auto installation = two_in_series(0.1, model::RcdDelay::time_delayed);
    installation.boards[1].circuits[0].standing_leakage_ma = 31.0;  // 31 > 0.3 x 100 = 30 mA, and > 9 mA
    const auto findings = assess_default(installation);
    CHECK(finding_with_id(findings, "rcd.standing_leakage@device:up") != std::nullopt);
    CHECK(finding_with_id(findings, "rcd.standing_leakage@device:rcd1") != std::nullopt);
}

TEST_CASE("rules rcd.trip_time: a general RCD at 28 ms (5 IΔn) passes, at 45 ms fails C2", "[rules][rcd]") {
    auto installation = tt_dwelling_with_rcd(40.0);
    installation.boards[0].circuits[0].rcd_trip_ms_at_idn = 120.0;
    installation.boards[0].circuits[0].rcd_trip_ms_at_5idn = 28.0;
    CHECK(findings_of_rule(assess_default(installation), "rcd.trip_time").empty());
    installation.boards[0].circuits[1].rcd_trip_ms_at_5idn = 45.0;  // the slowest of the two tests counts
    auto finding = finding_with_id(assess_default(installation), "rcd.trip_time@device:rcd1");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c2);
    CHECK(finding->explanation.find("at 5 IΔn 45 ms > 40 ms") != std::string::npos);
}

TEST_CASE("rules rcd.trip_time: a general RCD at 310 ms at IΔn fails the 300 ms limit", "[rules][rcd]") {
    auto installation = tt_dwelling_with_rcd(40.0);
    installation.boards[0].circuits[0].rcd_trip_ms_at_idn = 310.0;
    CHECK(findings_of_rule(assess_default(installation), "rcd.trip_time").size() == 1);
}

TEST_CASE("rules rcd.trip_time: S-type limits are 500 ms at IΔn and 150 ms at 5 IΔn", "[rules][rcd]") {
    auto installation = tt_dwelling(40.0);
    auto c1 = circuit("c1", model::CircuitUse::cooker, breaker("cb1", model::BreakerCurve::b, 32), "rs");
    c1.rcd_trip_ms_at_idn = 450.0;
    c1.rcd_trip_ms_at_5idn = 140.0;
    installation.boards.push_back(board("cu", {rcd("rs", 0.1, model::RcdDelay::time_delayed)}, {c1}));
    CHECK(findings_of_rule(assess_default(installation), "rcd.trip_time").empty());
    installation.boards[0].circuits[0].rcd_trip_ms_at_5idn = 160.0;
    CHECK(findings_of_rule(assess_default(installation), "rcd.trip_time").size() == 1);
    installation.boards[0].circuits[0].rcd_trip_ms_at_5idn = 140.0;
    installation.boards[0].circuits[0].rcd_trip_ms_at_idn = 510.0;
    CHECK(findings_of_rule(assess_default(installation), "rcd.trip_time").size() == 1);
}
