// additional_protection: BS 7671:2018+A2 411.3.3 (socket-outlets <= 32 A), 411.3.4 (domestic
// lighting), 522.6.202 (concealed cables), 415.1.1 (IΔn <= 30 mA, 40 ms at 5 IΔn), all read.
// Codes: sockets that may supply outdoor equipment C2, otherwise C3 (common practice).
#include <catch2/catch.hpp>

#include "fixture_findings.hpp"
#include "fixture_installation.hpp"

using namespace mendwright;
using namespace mendwright::test;

namespace {

// A TN-C-S dwelling (no TT fault-protection findings to get in the way) with one board "cu"
// holding `devices` and one circuit c1 of `use` hanging below `upstream`.
model::Installation one_circuit(model::CircuitUse use, std::vector<model::Device> devices, std::optional<std::string> upstream,
                                double amps = 32.0) {
    auto installation = tn_dwelling();
    installation.boards.push_back(board("cu", std::move(devices),
                                        {circuit("c1", use, breaker("cb1", model::BreakerCurve::b, amps), std::move(upstream))}));
    return installation;
}

}  // namespace

TEST_CASE("rules additional_protection: sockets with no RCD are C3, C2 when they may supply outdoor equipment", "[rules][additional]") {
    auto indoor = one_circuit(model::CircuitUse::sockets, {main_switch("ms")}, "ms");
    auto finding = finding_with_id(assess_default(indoor), "additional_protection@circuit:c1");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c3);
    CHECK(finding->clause == "BS 7671:2018+A2 411.3.3");

    auto outdoor = indoor;
    outdoor.boards[0].circuits[0].supplies_outdoor_equipment = true;
    finding = finding_with_id(assess_default(outdoor), "additional_protection@circuit:c1");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c2);
    CHECK(finding->urgent());
}

TEST_CASE("rules additional_protection: a 30 mA general RCD above satisfies it, a 100 mA or an S-type does not", "[rules][additional]") {
    CHECK(finding_with_id(assess_default(one_circuit(model::CircuitUse::sockets, {rcd("r", 0.03)}, "r")),
                          "additional_protection@circuit:c1") == std::nullopt);
    // 415.1.1: IΔn <= 30 mA. 100 mA is not additional protection.
    CHECK(finding_with_id(assess_default(one_circuit(model::CircuitUse::sockets, {rcd("r", 0.1, model::RcdDelay::time_delayed)}, "r")),
                          "additional_protection@circuit:c1") != std::nullopt);
    // 415.1.1: 40 ms at 5 IΔn, which an S-type (150 ms allowed) does not give.
    CHECK(finding_with_id(assess_default(one_circuit(model::CircuitUse::sockets, {rcd("r", 0.03, model::RcdDelay::time_delayed)}, "r")),
                          "additional_protection@circuit:c1") != std::nullopt);
}

TEST_CASE("rules additional_protection: an RCBO of 30 mA is the circuit's own additional protection", "[rules][additional]") {
    auto installation = tn_dwelling();
    installation.boards.push_back(board("cu", {}, {circuit("c1", model::CircuitUse::sockets, rcbo("rb1", model::BreakerCurve::b, 32, 0.03))}));
    CHECK(findings_of_rule(assess_default(installation), "additional_protection").empty());
}

TEST_CASE("rules additional_protection: socket circuit over 32 A is outside 411.3.3", "[rules][additional]") {
    CHECK(findings_of_rule(assess_default(one_circuit(model::CircuitUse::sockets, {}, std::nullopt, 40.0)), "additional_protection").empty());
    CHECK(findings_of_rule(assess_default(one_circuit(model::CircuitUse::sockets, {}, std::nullopt, 32.0)), "additional_protection").size() == 1);
}

TEST_CASE("rules additional_protection: lighting needs it in a dwelling only (411.3.4)", "[rules][additional]") {
    auto dwelling = one_circuit(model::CircuitUse::lighting, {}, std::nullopt, 6.0);
    auto finding = finding_with_id(assess_default(dwelling), "additional_protection@circuit:c1");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c3);
    CHECK(finding->clause == "BS 7671:2018+A2 411.3.4");
    auto shop = dwelling;
    shop.job.occupancy = model::Occupancy::commercial;
    CHECK(findings_of_rule(assess_default(shop), "additional_protection").empty());
}

TEST_CASE("rules additional_protection: cables concealed in a wall need it whatever the circuit (522.6.202)", "[rules][additional]") {
    auto installation = one_circuit(model::CircuitUse::cooker, {}, std::nullopt);
    CHECK(findings_of_rule(assess_default(installation), "additional_protection").empty());
    installation.boards[0].circuits[0].concealed_in_wall = true;
    auto finding = finding_with_id(assess_default(installation), "additional_protection@circuit:c1");
    REQUIRE(finding);
    CHECK(finding->clause == "BS 7671:2018+A2 522.6.202");
}

TEST_CASE("rules additional_protection: boards of new work are left to the new-work rule", "[rules][additional]") {
    auto installation = one_circuit(model::CircuitUse::sockets, {}, std::nullopt);
    installation.boards[0].new_work = true;
    const auto findings = assess_default(installation);
    CHECK(findings_of_rule(findings, "additional_protection").empty());
    CHECK(finding_with_id(findings, "new_work.additional_protection@circuit:c1") != std::nullopt);
}
