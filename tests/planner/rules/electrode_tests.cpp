// electrode.resistance: BS 7671 Table 41.5 note (read): above 200 Ω RA may not be stable; the
// 100 Ω target is common practice. electrode.worst_season: 411.5.3 (RA x IΔn <= 50 V, read) at RA
// x the profile's seasonal factor (an assumption: January 1.8, July 1.0 in the shipped profile).
#include <catch2/catch.hpp>

#include "fixture_findings.hpp"
#include "fixture_installation.hpp"

using namespace mendwright;
using namespace mendwright::test;

namespace {

model::Installation with_100ma(double ra_ohms, Date measured_on) {
    auto installation = tt_dwelling(ra_ohms, measured_on);
    installation.boards.push_back(board("cu", {rcd("rcd1", 0.1, model::RcdDelay::time_delayed)},
                                        {circuit("c1", model::CircuitUse::cooker, breaker("cb1", model::BreakerCurve::b, 32), "rcd1")}));
    return installation;
}

}  // namespace

TEST_CASE("rules electrode.resistance: 201 ohm is over the 200 ohm stability threshold, C3", "[rules][electrode]") {
    const auto findings = assess_default(tt_dwelling_with_rcd(201.0));
    auto finding = finding_with_id(findings, "electrode.resistance@installation");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c3);
    CHECK(finding->explanation.find("RA 201 Ω > 200 Ω") != std::string::npos);
}

TEST_CASE("rules electrode.resistance: 101 to 200 ohm is a note, 100 ohm and below nothing", "[rules][electrode]") {
    auto at_200 = finding_with_id(assess_default(tt_dwelling_with_rcd(200.0)), "electrode.resistance@installation");
    REQUIRE(at_200);
    CHECK(at_200->code == rules::Code::note);
    REQUIRE(finding_with_id(assess_default(tt_dwelling_with_rcd(101.0)), "electrode.resistance@installation"));
    CHECK(finding_with_id(assess_default(tt_dwelling_with_rcd(100.0)), "electrode.resistance@installation") == std::nullopt);
}

TEST_CASE("rules electrode.worst_season: 310 ohm measured in January fails 50 V under 100 mA when dry", "[rules][electrode]") {
    // 310 x 1.8 = 558 Ω; 558 x 0.1 = 55.8 V > 50 V, while 310 x 0.1 = 31 V passes (hand computed).
    const auto findings = assess_default(with_100ma(310.0, Date{2026, 1, 20}));
    CHECK(findings_of_rule(findings, "tt.fault_protection").empty());
    auto finding = finding_with_id(findings, "electrode.worst_season@device:rcd1");
    REQUIRE(finding);
    CHECK(finding->code == rules::Code::c3);
    CHECK(finding->explanation.find("RA 310 Ω (measured in January) × seasonal factor 1.8 = 558 Ω; × IΔn 0.1 A = 55.8 V > 50 V") !=
          std::string::npos);
}

TEST_CASE("rules electrode.worst_season: the same 310 ohm measured in July needs no finding", "[rules][electrode]") {
    // July factor 1.0: 31 V.
    CHECK(findings_of_rule(assess_default(with_100ma(310.0, Date{2026, 7, 20})), "electrode.worst_season").empty());
}

TEST_CASE("rules electrode.worst_season: either side of the limit in January, 270 and 280 ohm", "[rules][electrode]") {
    // 270 x 1.8 = 486 Ω -> 48.6 V (passes); 280 x 1.8 = 504 Ω -> 50.4 V (fails).
    CHECK(findings_of_rule(assess_default(with_100ma(270.0, Date{2026, 1, 5})), "electrode.worst_season").empty());
    CHECK(findings_of_rule(assess_default(with_100ma(280.0, Date{2026, 1, 5})), "electrode.worst_season").size() == 1);
}

TEST_CASE("rules electrode.worst_season: a measured failure is left to tt.fault_protection", "[rules][electrode]") {
    const auto findings = assess_default(with_100ma(600.0, Date{2026, 1, 5}));
    CHECK(findings_of_rule(findings, "electrode.worst_season").empty());
    CHECK(findings_of_rule(findings, "tt.fault_protection").size() == 1);
}

TEST_CASE("rules electrode.worst_season: the seasonal factors come from the profile", "[rules][electrode][profile]") {
    // A user who holds January at 1.5: 310 x 1.5 = 465 Ω -> 46.5 V, passes.
    auto profile = rules::default_rules_profile();
    profile.electrode.seasonal_factor_by_month[0] = 1.5;
    CHECK(findings_of_rule(rules::assess(with_100ma(310.0, Date{2026, 1, 20}), profile), "electrode.worst_season").empty());
}

TEST_CASE("rules electrode.worst_season: no month recorded takes the largest factor", "[rules][electrode]") {
    auto installation = with_100ma(310.0, Date{2026, 7, 20});
    installation.electrode->measured_on.reset();
    auto finding = finding_with_id(assess_default(installation), "electrode.worst_season@device:rcd1");
    REQUIRE(finding);
    CHECK(finding->explanation.find("× seasonal factor 1.8") != std::string::npos);
}
