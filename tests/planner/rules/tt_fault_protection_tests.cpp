// tt.fault_protection: BS 7671:2018+A2 411.5.3 (RA x IΔn <= 50 V, read) and, without an RCD,
// the fault current U0 / (RA + R1+R2) against Ia = 5 In for a type B breaker (BS EN 60898-1, read).
#include <catch2/catch.hpp>

#include "fixture_findings.hpp"
#include "fixture_installation.hpp"

using namespace mendwright;
using namespace mendwright::test;

TEST_CASE("rules tt.fault_protection: RA 310 ohm under a 100 mA RCD gives 31 V, within 50 V", "[rules][tt]") {
    // 411.5.3: 310 x 0.1 = 31 V <= 50 V (hand computed).
    auto installation = tt_dwelling(310.0);
    installation.boards.push_back(board("cu", {rcd("rcd1", 0.1)},
                                        {circuit("c1", model::CircuitUse::cooker, breaker("cb1", model::BreakerCurve::b, 32), "rcd1")}));
    const auto findings = assess_default(installation);
    CHECK(findings_of_rule(findings, "tt.fault_protection").empty());
}

TEST_CASE("rules tt.fault_protection: RA 600 ohm under a 100 mA RCD gives 60 V, over 50 V, C2", "[rules][tt]") {
    // 411.5.3: 600 x 0.1 = 60 V > 50 V; common practice codes it C2.
    auto installation = tt_dwelling(600.0);
    installation.boards.push_back(board("cu", {rcd("rcd1", 0.1)},
                                        {circuit("c1", model::CircuitUse::cooker, breaker("cb1", model::BreakerCurve::b, 32), "rcd1")}));
    const auto findings = assess_default(installation);
    auto finding = finding_with_id(findings, "tt.fault_protection@circuit:c1");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c2);
    CHECK(finding->device_id == "rcd1");
    CHECK(finding->clause == "BS 7671:2018+A2 411.5.3");
    CHECK(finding->explanation.find("RA 600 Ω × IΔn 0.1 A = 60 V > 50 V") != std::string::npos);
}

TEST_CASE("rules tt.fault_protection: Table 41.5 edges, 500 ohm at 100 mA and 1667 ohm at 30 mA", "[rules][tt]") {
    // Table 41.5 (read): 100 mA -> 500 Ω, 30 mA -> 1667 Ω (50 / 0.03 = 1666.7, printed rounded up).
    auto at_limit = tt_dwelling(500.0);
    at_limit.boards.push_back(board("cu", {rcd("rcd1", 0.1)},
                                    {circuit("c1", model::CircuitUse::cooker, breaker("cb1", model::BreakerCurve::b, 32), "rcd1")}));
    CHECK(findings_of_rule(assess_default(at_limit), "tt.fault_protection").empty());  // 50 V, not over

    auto just_under = tt_dwelling_with_rcd(1666.0);  // 49.98 V
    CHECK(findings_of_rule(assess_default(just_under), "tt.fault_protection").empty());
    auto just_over = tt_dwelling_with_rcd(1667.0);  // 50.01 V
    CHECK(findings_of_rule(assess_default(just_over), "tt.fault_protection").size() == 2);
}

TEST_CASE("rules tt.fault_protection: no RCD, RA 45 ohm, B32 breaker cannot disconnect, C2 with the arithmetic", "[rules][tt]") {
    // If = 230 / (45 + 0.62) = 5.04 A < Ia = 5 x 32 = 160 A (hand computed; 5 In from BS EN 60898-1, read).
    auto installation = tt_dwelling(45.0);
    auto c1 = circuit("c1", model::CircuitUse::sockets, breaker("cb1", model::BreakerCurve::b, 32));
    c1.r1_plus_r2_ohms = 0.62;
    installation.boards.push_back(board("cu", {main_switch("ms")}, {c1}));
    const auto findings = assess_default(installation);
    auto finding = finding_with_id(findings, "tt.fault_protection@circuit:c1");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c2);
    CHECK(finding->explanation.find("If = U0 230 V / (RA 45 Ω + R1+R2 0.62 Ω) = 5.04 A < Ia 160 A") != std::string::npos);
    CHECK(finding->explanation.find("0.2 s") != std::string::npos);  // Table 41.1, TT final circuit (read)
}

TEST_CASE("rules tt.fault_protection: no RCD but a loop low enough that the B32 breaker trips instantly", "[rules][tt]") {
    // Ia = 5 x 32 = 160 A; Zs 1.4375 Ω gives 230 / 1.4375 = 160 A (meets), 1.44 Ω gives 159.7 A (fails).
    auto meets = tt_dwelling(1.2);
    auto c1 = circuit("c1", model::CircuitUse::sockets, breaker("cb1", model::BreakerCurve::b, 32));
    c1.measured_zs_ohms = 1.4375;
    meets.boards.push_back(board("cu", {}, {c1}));
    CHECK(finding_with_id(assess_default(meets), "tt.fault_protection@circuit:c1") == std::nullopt);

    auto fails = meets;
    fails.boards[0].circuits[0].measured_zs_ohms = 1.44;
    CHECK(finding_with_id(assess_default(fails), "tt.fault_protection@circuit:c1") != std::nullopt);
}

TEST_CASE("rules tt.fault_protection: a fuse alone in TT cannot be shown to disconnect", "[rules][tt]") {
    auto installation = tt_dwelling(60.0);
    model::Device fuse;
    fuse.id = "f1";
    fuse.kind = model::DeviceKind::fuse;
    fuse.fuse_standard = "BS 3036";
    fuse.rating_amps = 30.0;
    installation.boards.push_back(board("fb", {}, {circuit("c1", model::CircuitUse::sockets, fuse)}));
    auto finding = finding_with_id(assess_default(installation), "tt.fault_protection@circuit:c1");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c2);
}

TEST_CASE("rules tt.fault_protection: RA not recorded under RCDs is one FI for the installation", "[rules][tt]") {
    auto installation = tt_dwelling_with_rcd(100.0);
    installation.electrode->measured_ra_ohms.reset();
    const auto findings = assess_default(installation);
    const auto tt = findings_of_rule(findings, "tt.fault_protection");
    REQUIRE(tt.size() == 1);
    CHECK(tt[0].id == "tt.fault_protection@installation");
    CHECK(tt[0].code == rules::Code::fi);
}

TEST_CASE("rules tt.fault_protection: a re-measured RA after remedial work takes precedence", "[rules][tt]") {
    auto installation = tt_dwelling(600.0);
    installation.boards.push_back(board("cu", {rcd("rcd1", 0.1)},
                                        {circuit("c1", model::CircuitUse::cooker, breaker("cb1", model::BreakerCurve::b, 32), "rcd1")}));
    REQUIRE(findings_of_rule(assess_default(installation), "tt.fault_protection").size() == 1);
    installation.electrode->remeasured_ra_ohms = 80.0;  // 80 x 0.1 = 8 V
    installation.electrode->remeasured_on = Date{2027, 1, 10};
    CHECK(findings_of_rule(assess_default(installation), "tt.fault_protection").empty());
}

TEST_CASE("rules tt.fault_protection: not applied to a TN-C-S installation", "[rules][tt]") {
    auto installation = tn_dwelling();
    installation.boards.push_back(board("cu", {}, {circuit("c1", model::CircuitUse::cooker, breaker("cb1", model::BreakerCurve::b, 32))}));
    CHECK(findings_of_rule(assess_default(installation), "tt.fault_protection").empty());
}

TEST_CASE("rules tt.fault_protection: the touch-voltage limit comes from the profile", "[rules][tt][profile]") {
    // With UL = 25 V (a stricter local rule), RA 310 x 0.1 = 31 V fails.
    auto profile = rules::default_rules_profile();
    profile.fault_protection.touch_voltage_limit_volts = 25.0;
    auto installation = tt_dwelling(310.0);
    installation.boards.push_back(board("cu", {rcd("rcd1", 0.1)},
                                        {circuit("c1", model::CircuitUse::cooker, breaker("cb1", model::BreakerCurve::b, 32), "rcd1")}));
    CHECK(finding_with_id(rules::assess(installation, profile), "tt.fault_protection@circuit:c1") != std::nullopt);
}

TEST_CASE("rules tt.fault_protection: a U0 outside the held Table 41.1 band names no time rather than guess one", "[rules][tt]") {
    // Table 41.1 is held for 120 V < U0 <= 230 V only (read); at U0 240 V the 230-400 V band would
    // apply, which planner/calc does not hold, so the finding must not quote 0.2 s.
    auto installation = tt_dwelling(45.0);
    installation.supply.u0_volts = 240.0;
    auto c1 = circuit("c1", model::CircuitUse::sockets, breaker("cb1", model::BreakerCurve::b, 32));
    c1.r1_plus_r2_ohms = 0.62;
    installation.boards.push_back(board("cu", {main_switch("ms")}, {c1}));
    const auto findings = assess_default(installation);
    auto finding = finding_with_id(findings, "tt.fault_protection@circuit:c1");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c2);
    CHECK(finding->explanation.find("0.2 s") == std::string::npos);
    CHECK(finding->explanation.find("Table 41.1 time for U0 240 V (not held") != std::string::npos);
}

TEST_CASE("rules tt.fault_protection: a 40 A cooker circuit (fixed equipment) gets the 1 s distribution time", "[rules][tt]") {
    // 411.3.2.2 (read): the short times apply to final circuits up to 32 A for fixed equipment;
    // above that Table 41.1 gives TT 1 s (read).
    auto installation = tt_dwelling(45.0);
    auto c1 = circuit("c1", model::CircuitUse::cooker, breaker("cb1", model::BreakerCurve::b, 40));
    c1.r1_plus_r2_ohms = 0.3;
    installation.boards.push_back(board("cu", {main_switch("ms")}, {c1}));
    const auto findings = assess_default(installation);
    auto finding = finding_with_id(findings, "tt.fault_protection@circuit:c1");
    REQUIRE(finding);
    CHECK(finding->explanation.find("within 1 s (Table 41.1, TT)") != std::string::npos);
}
