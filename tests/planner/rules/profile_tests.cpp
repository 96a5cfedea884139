// The rules profile: the shipped file, its embedded copy, its values against their published
// sources, and errors that name the JSON path.
#include <catch2/catch.hpp>

#include <fstream>
#include <sstream>

#include <nlohmann/json.hpp>

#include "planner/rules/profile.hpp"
#include "planner/rules/rule_table.hpp"

using namespace mendwright;
using nlohmann::json;

namespace {

std::string shipped_profile_text() {
    std::ifstream file(std::string(MENDWRIGHT_SOURCE_DIR) + "/profiles/bs7671-2018-a2.json");
    std::stringstream text;
    text << file.rdbuf();
    return text.str();
}

// The shipped profile with one change made by `edit`, parsed.
template <class Edit>
Result<rules::RulesProfile> parse_edited(Edit edit) {
    json document = json::parse(shipped_profile_text());
    edit(document);
    return rules::parse_rules_profile(document.dump());
}

}  // namespace

TEST_CASE("rules profile: the embedded default equals the shipped file", "[rules][profile]") {
    const auto text = shipped_profile_text();
    REQUIRE_FALSE(text.empty());
    CHECK(rules::default_rules_profile_json() == text);
    const auto parsed = rules::parse_rules_profile(text);
    REQUIRE(parsed.ok());
    CHECK(*parsed == rules::default_rules_profile());
}

TEST_CASE("rules profile: the default holds BS 7671:2018+A2 values", "[rules][profile]") {
    const auto& profile = rules::default_rules_profile();
    CHECK(profile.basis == "BS 7671:2018+A2 practice; local rules may differ");
    // 411.5.3 (read): UL 50 V.
    CHECK(profile.fault_protection.touch_voltage_limit_volts == 50.0);
    // Appendix 3 / 411.4.4 (read): Cmin 0.95; the 0.8 rule (GN3, read).
    CHECK(profile.fault_protection.cmin == 0.95);
    CHECK(profile.fault_protection.measured_zs_factor == 0.8);
    // Table 41.5 note (read): 200 Ω; target 100 Ω (common practice).
    CHECK(profile.electrode.stability_limit_ohms == 200.0);
    CHECK(profile.electrode.target_ohms == 100.0);
    // Seasonal factors: an assumption; wet winter months 1.5-2.0, summer 1.0-1.1 (common practice).
    for (unsigned month : {1u, 2u, 12u}) CHECK(profile.electrode.seasonal_factor_by_month[month - 1] >= 1.5);
    for (unsigned month : {7u, 8u}) CHECK(profile.electrode.seasonal_factor_by_month[month - 1] <= 1.1);
    // 531.3.2 (read): 30 % of IΔn; selectivity 3x (read); 415.1.1: 30 mA (read).
    CHECK(profile.rcd.leakage_fraction == 0.3);
    CHECK(profile.rcd.selectivity_ratio == 3.0);
    CHECK(profile.rcd.additional_protection_max_idn_amps == 0.03);
    // BS EN 61439-3 Annex ZB (read): 16 kA under a <= 100 A BS 1361 / BS 88-3 fuse.
    CHECK(profile.breaking_capacity.conditional_rating_ka == 16.0);
    CHECK(profile.breaking_capacity.supply_fuse_max_amps == 100.0);
    // SI 2020/312 reg. 3 (read): 28 days, privately rented dwelling in England.
    REQUIRE(profile.due_dates.rules.size() == 1);
    CHECK(profile.due_dates.rules[0].days == 28);
    CHECK(profile.due_dates.rules[0].occupancy == model::Occupancy::privately_rented_dwelling);
    CHECK(profile.due_dates.default_text == "as agreed");
    // Common practice (DOMAIN.md): TT without an RCD C2; sockets that may go outdoors C2, else C3.
    CHECK(profile.rule_case("tt.fault_protection", "no_rcd").code == rules::Code::c2);
    CHECK(profile.rule_case("additional_protection", "outdoor").code == rules::Code::c2);
    CHECK(profile.rule_case("additional_protection", "sockets").code == rules::Code::c3);
}

TEST_CASE("rules profile: every rule and case of the rule table has a code and clause", "[rules][profile]") {
    const auto& profile = rules::default_rules_profile();
    for (const auto& spec : rules::rule_table())
        for (const auto& case_name : spec.cases) CHECK_FALSE(profile.rule_case(spec.id, case_name).clause.empty());
}

TEST_CASE("rules profile: a missing key is named with its path", "[rules][profile]") {
    const auto parsed = parse_edited([](json& d) { d["fault_protection"].erase("cmin"); });
    REQUIRE_FALSE(parsed.ok());
    CHECK(parsed.problem().field == "fault_protection.cmin");
    CHECK(parsed.problem().message == "is required");
}

TEST_CASE("rules profile: a wrong type or a number out of range is named with its path", "[rules][profile]") {
    auto parsed = parse_edited([](json& d) { d["fault_protection"]["touch_voltage_limit_volts"] = "fifty"; });
    REQUIRE_FALSE(parsed.ok());
    CHECK(parsed.problem().field == "fault_protection.touch_voltage_limit_volts");
    CHECK(parsed.problem().message == "expected a number, got string");

    parsed = parse_edited([](json& d) { d["fault_protection"]["cmin"] = 1.2; });
    REQUIRE_FALSE(parsed.ok());
    CHECK(parsed.problem().to_string() == "fault_protection.cmin: expected a number <= 1, got 1.2");

    parsed = parse_edited([](json& d) { d["electrode"]["seasonal_factor_by_month"][3] = 0.9; });
    REQUIRE_FALSE(parsed.ok());
    CHECK(parsed.problem().field == "electrode.seasonal_factor_by_month[3]");

    parsed = parse_edited([](json& d) { d["electrode"]["seasonal_factor_by_month"].erase(11); });
    REQUIRE_FALSE(parsed.ok());
    CHECK(parsed.problem().to_string() ==
          "electrode.seasonal_factor_by_month: expected an array of 12 numbers (January to December), got an array of 11");
}

TEST_CASE("rules profile: an unknown key is refused, not silently dropped", "[rules][profile]") {
    const auto parsed = parse_edited([](json& d) { d["rcd"]["leakage_fraktion"] = 0.3; });
    REQUIRE_FALSE(parsed.ok());
    CHECK(parsed.problem().to_string() == "rcd.leakage_fraktion: is not a known key here");
}

TEST_CASE("rules profile: a bad code and a missing rule case are named with their paths", "[rules][profile]") {
    auto parsed = parse_edited([](json& d) { d["rules"]["tt.fault_protection"]["no_rcd"]["code"] = "C4"; });
    REQUIRE_FALSE(parsed.ok());
    CHECK(parsed.problem().to_string() == "rules.tt.fault_protection.no_rcd.code: expected one of C1, C2, C3, FI, note, got \"C4\"");

    parsed = parse_edited([](json& d) { d["rules"]["rcd.selectivity"].erase("not_selective"); });
    REQUIRE_FALSE(parsed.ok());
    CHECK(parsed.problem().field == "rules.rcd.selectivity.not_selective");
}

TEST_CASE("rules profile: due rules are checked for occupancy and whole days", "[rules][profile]") {
    auto parsed = parse_edited([](json& d) { d["due_dates"]["rules"][0]["occupancy"] = "rented"; });
    REQUIRE_FALSE(parsed.ok());
    CHECK(parsed.problem().field == "due_dates.rules[0].occupancy");
    parsed = parse_edited([](json& d) { d["due_dates"]["rules"][0]["days"] = 28.5; });
    REQUIRE_FALSE(parsed.ok());
    CHECK(parsed.problem().field == "due_dates.rules[0].days");
}

TEST_CASE("rules profile: text that is not JSON, or of another format, is refused", "[rules][profile]") {
    auto parsed = rules::parse_rules_profile("{ not json");
    REQUIRE_FALSE(parsed.ok());
    CHECK(parsed.problem().field == "(document)");
    parsed = parse_edited([](json& d) { d["format"] = "something-else"; });
    REQUIRE_FALSE(parsed.ok());
    CHECK(parsed.problem().field == "format");
    parsed = parse_edited([](json& d) { d["version"] = 2; });
    REQUIRE_FALSE(parsed.ok());
    CHECK(parsed.problem().field == "version");
}
