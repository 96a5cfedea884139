// zs.maximum: Table 41.3 (read) B32 1.37 Ω at Cmin 0.95, x 0.8 for a measured Zs (Appendix 3 /
// GN3 rule of thumb, read) = 1.096 Ω; Table 41.5 (read) 30 mA -> 1667 Ω.
// device.breaking_capacity: 434.5.1; BS EN 61439-3 Annex ZB 16 kA conditional rating under a
// <= 100 A BS 1361 / BS 88-3 fuse (read).
#include <catch2/catch.hpp>

#include "fixture_findings.hpp"
#include "fixture_installation.hpp"

using namespace mendwright;
using namespace mendwright::test;

TEST_CASE("rules zs.maximum: TN, B32 with Zs 1.09 ohm passes and 1.10 ohm fails 0.8 x 1.37", "[rules][zs]") {
    auto installation = tn_dwelling();
    auto c1 = circuit("c1", model::CircuitUse::sockets, breaker("cb1", model::BreakerCurve::b, 32));
    c1.measured_zs_ohms = 1.09;
    installation.boards.push_back(board("cu", {}, {c1}));
    CHECK(findings_of_rule(assess_default(installation), "zs.maximum").empty());

    installation.boards[0].circuits[0].measured_zs_ohms = 1.10;
    auto finding = finding_with_id(assess_default(installation), "zs.maximum@circuit:c1");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c2);
    CHECK(finding->explanation.find("Zs 1.1 Ω > 0.8 × 1.37 Ω = 1.096 Ω") != std::string::npos);
}

TEST_CASE("rules zs.maximum: TN, C16 has the same 1.37 ohm maximum as B32 (Table 41.3)", "[rules][zs]") {
    auto installation = tn_dwelling();
    auto c1 = circuit("c1", model::CircuitUse::cooker, breaker("cb1", model::BreakerCurve::c, 16));
    c1.measured_zs_ohms = 1.2;  // > 1.096
    installation.boards.push_back(board("cu", {}, {c1}));
    REQUIRE(finding_with_id(assess_default(installation), "zs.maximum@circuit:c1"));
    CHECK(finding_with_id(assess_default(installation), "zs.maximum@circuit:c1")->inputs.at(2).value == "1.37");
}

TEST_CASE("rules zs.maximum: TN, an RCD above that still disconnects makes it C3 (411.4.5)", "[rules][zs]") {
    auto installation = tn_dwelling();
    auto c1 = circuit("c1", model::CircuitUse::sockets, breaker("cb1", model::BreakerCurve::b, 32), "rcd1");
    c1.measured_zs_ohms = 1.5;  // 1.5 x 0.03 = 0.045 V
    installation.boards.push_back(board("cu", {rcd("rcd1", 0.03)}, {c1}));
    auto finding = finding_with_id(assess_default(installation), "zs.maximum@circuit:c1");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c3);
}

TEST_CASE("rules zs.maximum: TT, Zs against 50 V / IΔn, 1666 ohm passes and 1667 ohm fails at 30 mA", "[rules][zs]") {
    auto installation = tt_dwelling_with_rcd(20.0);
    installation.boards[0].circuits[0].measured_zs_ohms = 1666.0;
    CHECK(findings_of_rule(assess_default(installation), "zs.maximum").empty());
    installation.boards[0].circuits[0].measured_zs_ohms = 1667.0;
    auto finding = finding_with_id(assess_default(installation), "zs.maximum@circuit:c1");
    REQUIRE(finding);
    CHECK(finding->explanation.find("Zs 1667 Ω > 50 V / IΔn 0.03 A = 1666.7 Ω") != std::string::npos);
}

TEST_CASE("rules device.breaking_capacity: 6 kA breakers in a dwelling under a 100 A BS 1361 fuse meet 10 kA, not 17 kA", "[rules][capacity]") {
    auto installation = tt_dwelling_with_rcd(40.0);
    installation.supply.prospective_fault_current_ka = 10.0;
    CHECK(findings_of_rule(assess_default(installation), "device.breaking_capacity").empty());
    installation.supply.prospective_fault_current_ka = 17.0;  // over the 16 kA conditional rating
    const auto findings = findings_of_rule(assess_default(installation), "device.breaking_capacity");
    REQUIRE(findings.size() == 2);
    CHECK(findings[0].code == rules::Code::c2);
}

TEST_CASE("rules device.breaking_capacity: no conditional rating outside a dwelling or above a 100 A fuse", "[rules][capacity]") {
    auto shop = tt_dwelling_with_rcd(40.0);
    shop.job.occupancy = model::Occupancy::commercial;
    shop.supply.prospective_fault_current_ka = 10.0;
    const auto findings = findings_of_rule(assess_default(shop), "device.breaking_capacity");
    REQUIRE(findings.size() == 2);
    CHECK(findings[0].explanation.find("Breaking capacity 6 kA < prospective fault current 10 kA") != std::string::npos);

    auto big_fuse = tt_dwelling_with_rcd(40.0);
    big_fuse.supply.supply_fuse_rating_amps = 125.0;
    big_fuse.supply.prospective_fault_current_ka = 10.0;
    CHECK(findings_of_rule(assess_default(big_fuse), "device.breaking_capacity").size() == 2);

    shop.boards[0].circuits[0].device.breaking_capacity_ka = 10.0;
    CHECK(findings_of_rule(assess_default(shop), "device.breaking_capacity").size() == 1);
}
