// board.combustible_enclosure and new_work.enclosure: BS 7671:2018+A2 421.1.201 (read).
// new_work.additional_protection: 411.3.3 / 411.3.4 (read). new_work.surge_protection: 443.4 /
// 534 (clause numbers from memory), coded C3 by the shipped profile. recorded: observations pass through.
#include <catch2/catch.hpp>

#include "fixture_findings.hpp"
#include "fixture_installation.hpp"

using namespace mendwright;
using namespace mendwright::test;

TEST_CASE("rules board.combustible_enclosure: a plastic board in a dwelling is C3, in a shop nothing", "[rules][board]") {
    auto installation = tt_dwelling_with_rcd(40.0);
    installation.boards[0].enclosure = model::EnclosureMaterial::combustible;
    auto finding = finding_with_id(assess_default(installation), "board.combustible_enclosure@board:cu");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c3);
    CHECK(finding->clause == "BS 7671:2018+A2 421.1.201");
    installation.job.occupancy = model::Occupancy::commercial;
    CHECK(findings_of_rule(assess_default(installation), "board.combustible_enclosure").empty());
}

TEST_CASE("rules new_work: a new plastic board in a dwelling is C2 under the new-work rule", "[rules][board][new_work]") {
    auto installation = tt_dwelling_with_rcd(40.0);
    installation.boards[0].enclosure = model::EnclosureMaterial::combustible;
    installation.boards[0].new_work = true;
    installation.boards[0].surge_protection_fitted = true;
    const auto findings = assess_default(installation);
    CHECK(findings_of_rule(findings, "board.combustible_enclosure").empty());
    auto finding = finding_with_id(findings, "new_work.enclosure@board:cu");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c2);
}

TEST_CASE("rules new_work: sockets and lighting under a 100 mA S-type only are C2 on a new board", "[rules][new_work]") {
    auto installation = tt_dwelling(40.0);
    installation.boards.push_back(board("cu", {rcd("rs", 0.1, model::RcdDelay::time_delayed)},
                                        {circuit("c1", model::CircuitUse::sockets, breaker("cb1", model::BreakerCurve::b, 32), "rs"),
                                         circuit("c2", model::CircuitUse::lighting, breaker("cb2", model::BreakerCurve::b, 6), "rs"),
                                         circuit("c3", model::CircuitUse::immersion, breaker("cb3", model::BreakerCurve::b, 16), "rs")}));
    installation.boards[0].new_work = true;
    installation.boards[0].surge_protection_fitted = true;
    const auto findings = findings_of_rule(assess_default(installation), "new_work.additional_protection");
    REQUIRE(findings.size() == 2);
    CHECK(findings[0].id == "new_work.additional_protection@circuit:c1");
    CHECK(findings[1].id == "new_work.additional_protection@circuit:c2");
    CHECK(findings[0].code == rules::Code::c2);
}

TEST_CASE("rules new_work: a new board of 30 mA RCBOs with surge protection in metal has no new-work finding", "[rules][new_work]") {
    auto installation = tt_dwelling(40.0);
    installation.boards.push_back(board("cu", {main_switch("ms")},
                                        {circuit("c1", model::CircuitUse::sockets, rcbo("rb1", model::BreakerCurve::b, 32, 0.03), "ms"),
                                         circuit("c2", model::CircuitUse::lighting, rcbo("rb2", model::BreakerCurve::b, 6, 0.03), "ms")}));
    installation.boards[0].new_work = true;
    installation.boards[0].surge_protection_fitted = true;
    const auto findings = assess_default(installation);
    for (const auto& f : findings) CHECK(f.rule.rfind("new_work.", 0) != 0);
}

TEST_CASE("rules new_work.surge_protection: a new board without an SPD is C3, not urgent", "[rules][new_work]") {
    auto installation = tt_dwelling_with_rcd(40.0);
    installation.boards[0].new_work = true;
    auto finding = finding_with_id(assess_default(installation), "new_work.surge_protection@board:cu");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c3);
    CHECK_FALSE(finding->urgent());
    installation.boards[0].surge_protection_fitted = true;
    CHECK(finding_with_id(assess_default(installation), "new_work.surge_protection@board:cu") == std::nullopt);
}

TEST_CASE("rules recorded: an observation passes through with its code, words, place and item", "[rules][recorded]") {
    auto installation = tt_dwelling_with_rcd(40.0);
    model::Observation observation;
    observation.id = "obs7";
    observation.text = "Cracked socket-outlet in kitchen";
    observation.code = model::ObservationCode::c2;
    observation.circuit_id = "c1";
    observation.item_code = "SKT-DBL";
    observation.item_quantity = 2.0;
    installation.observations.push_back(observation);
    auto finding = finding_with_id(assess_default(installation), "recorded@observation:obs7");
    REQUIRE(finding);
    CHECK(finding->rule == "recorded");
    CHECK(finding->code == rules::Code::c2);
    CHECK(finding->origin == rules::FindingOrigin::recorded);
    CHECK(finding->board_id == "cu");
    CHECK(finding->circuit_id == "c1");
    CHECK(finding->item_code == std::optional<std::string>("SKT-DBL"));
    CHECK(finding->item_quantity == 2.0);
    CHECK(finding->title == "Cracked socket-outlet in kitchen");
}
