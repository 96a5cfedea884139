// The three invented demo jobs (pricebook-demo/jobs) assess to what a competent inspector would
// record: in TT, circuits with no RCD are C2 (common practice, DOMAIN.md), sockets that may supply
// outdoor equipment without 30 mA protection C2, otherwise C3 (common practice); RA over 200 Ω C3
// (Table 41.5 note, read); 28 days in a privately rented dwelling in England (SI 2020/312 reg. 3).
#include <catch2/catch.hpp>

#include <fstream>
#include <sstream>

#include "fixture_findings.hpp"
#include "planner/io/survey_document.hpp"

using namespace mendwright;
using namespace mendwright::test;

namespace {

model::Installation demo_job(const std::string& name) {
    std::ifstream file(std::string(MENDWRIGHT_SOURCE_DIR) + "/pricebook-demo/jobs/" + name);
    std::stringstream text;
    text << file.rdbuf();
    auto load = io::read_survey(text.str());
    INFO(name);
    for (const auto& d : load.errors()) INFO(d.to_string());
    REQUIRE(load.ok());
    return *load.installation;
}

std::string code_of(const std::vector<rules::Finding>& findings, const std::string& id) {
    const auto finding = finding_with_id(findings, id);
    return finding ? rules::code_text(finding->code) : "absent";
}

}  // namespace

TEST_CASE("rules demo: rented terrace on TT with rewireable fuses and no RCD", "[rules][demo]") {
    const auto findings = assess_default(demo_job("rented-terrace-tt-no-rcd.json"));
    // Every final circuit lacks fault protection: fuses cannot open at under 1 A (230 V / ~262 Ω).
    for (int c = 1; c <= 5; ++c) CHECK(code_of(findings, "tt.fault_protection@circuit:c-terrace-" + std::to_string(c)) == "C2");
    CHECK(code_of(findings, "additional_protection@circuit:c-terrace-2") == "C2");  // garden socket
    CHECK(code_of(findings, "additional_protection@circuit:c-terrace-1") == "C3");
    CHECK(code_of(findings, "electrode.resistance@installation") == "C3");          // RA 260 Ω > 200 Ω
    CHECK(code_of(findings, "tails.origin_protection@installation") == "C2");       // 14 m buried
    CHECK(code_of(findings, "board.combustible_enclosure@board:cu-terrace") == "C3");
    CHECK(code_of(findings, "recorded@observation:obs-terrace-1") == "C2");
    // Inspected 2026-09-08: due 28 days later, 2026-10-06 (hand counted).
    for (const auto& f : findings)
        if (f.urgent()) CHECK(f.due_text == "2026-10-06");
    const auto summary = rules::summarise(findings);
    CHECK(summary.c1 == 0);
    CHECK(summary.c2 >= 8);
}

TEST_CASE("rules demo: farmhouse on TT with an RCD over the sockets only", "[rules][demo]") {
    const auto findings = assess_default(demo_job("farmhouse-tt-partial-rcd.json"));
    // Sockets under the 30 mA RCD: 140 Ω x 0.03 A = 4.2 V, fault protection and additional protection met.
    for (int c = 1; c <= 3; ++c) {
        CHECK(code_of(findings, "tt.fault_protection@circuit:c-house-" + std::to_string(c)) == "absent");
        CHECK(code_of(findings, "additional_protection@circuit:c-house-" + std::to_string(c)) == "absent");
    }
    // Lighting, immersion, cooker and the barn submain hang off the main switch: no fault protection.
    for (int c = 4; c <= 8; ++c) CHECK(code_of(findings, "tt.fault_protection@circuit:c-house-" + std::to_string(c)) == "C2");
    CHECK(code_of(findings, "tt.fault_protection@circuit:c-barn-2") == "C2");
    CHECK(code_of(findings, "additional_protection@circuit:c-barn-2") == "C2");  // pressure washer in the yard
    CHECK(code_of(findings, "additional_protection@circuit:c-house-4") == "C3");  // domestic lighting
    // RA 140 Ω measured in February: above the 100 Ω aim (note); 140 x 1.8 = 252 Ω x 0.03 A = 7.6 V, no seasonal finding.
    CHECK(code_of(findings, "electrode.resistance@installation") == "note");
    CHECK(findings_of_rule(findings, "electrode.worst_season").empty());
    for (const auto& f : findings)
        if (f.urgent()) CHECK(f.due_text == "as agreed");  // owner-occupied
}

TEST_CASE("rules demo: workshop on TT with RCDs in series and a busy office RCD", "[rules][demo]") {
    const auto findings = assess_default(demo_job("workshop-tt-rcd-selectivity.json"));
    CHECK(findings_of_rule(findings, "tt.fault_protection").empty());  // 48 Ω x 0.1 A = 4.8 V
    // 100 mA without delay over two 30 mA RCDs: not selective.
    CHECK(code_of(findings, "rcd.selectivity@device:rcd-workshop-100>rcd-workshop-30a") == "C3");
    CHECK(code_of(findings, "rcd.selectivity@device:rcd-workshop-100>rcd-workshop-30b") == "C3");
    // 5.6 + 5.4 = 11 mA > 9 mA on the office RCD; the workshop RCD carries 1.2 mA.
    CHECK(code_of(findings, "rcd.standing_leakage@device:rcd-workshop-30a") == "C3");
    CHECK(code_of(findings, "rcd.standing_leakage@device:rcd-workshop-30b") == "absent");
    // 3 kA breakers under a 4.2 kA prospective fault current, and no 16 kA conditional rating outside a dwelling.
    CHECK(findings_of_rule(findings, "device.breaking_capacity").size() == 4);
    CHECK(code_of(findings, "recorded@observation:obs-workshop-2") == "FI");
}
