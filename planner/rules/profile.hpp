#pragma once
// A rules profile: every threshold the rules compare against and the code and clause each rule
// gives, read from JSON (profiles/bs7671-2018-a2.json is the default, embedded in the program at
// build time). Rules read numbers from here, never from literals of their own.
//
//   auto profile = mendwright::rules::parse_rules_profile(text);
//   if (!profile) std::cerr << profile.problem().to_string();   // "fault_protection.cmin: expected ..."
//   auto findings = mendwright::rules::assess(installation, *profile);
//
// The JSON keys mirror the struct members below one for one (docs/rules.md lists them).

#include <array>
#include <map>
#include <string>
#include <string_view>
#include <vector>

#include "planner/core/result.hpp"
#include "planner/model/installation.hpp"
#include "planner/rules/finding.hpp"

namespace mendwright::rules {

inline constexpr const char* rules_profile_format_name = "mendwright-rules-profile";
inline constexpr int rules_profile_format_version = 1;

// Automatic disconnection (BS 7671 Chapter 41).
struct FaultProtectionLimits {
    double touch_voltage_limit_volts = 0.0;  // UL, 411.5.3
    double cmin = 0.0;                       // Appendix 3 / 411.4.4
    double measured_zs_factor = 0.0;         // the "0.8 rule" for Zs measured at ambient temperature
    // Table 41.1's times and the circuits they apply to (411.3.2.2) are published values, not
    // choices of practice: their one home is planner/calc/disconnection_time.hpp.

    bool operator==(const FaultProtectionLimits&) const = default;
};

struct ElectrodeLimits {
    double stability_limit_ohms = 0.0;  // Table 41.5 note: above this RA may not be stable
    double target_ohms = 0.0;           // trade aim (common practice)
    // RA measured in month m (1..12) x factor[m-1] = the worst-season estimate. An assumption.
    std::array<double, 12> seasonal_factor_by_month{};
    std::string seasonal_factor_basis;

    bool operator==(const ElectrodeLimits&) const = default;
};

struct TailsLimits {
    // Longest meter tails without protection at the origin, by route. Mechanically protected
    // tails are held to the surface length whatever their route.
    double surface_max_length_m = 0.0;
    double concealed_in_wall_max_length_m = 0.0;
    double buried_max_length_m = 0.0;
    std::string basis;

    bool operator==(const TailsLimits&) const = default;
};

struct RcdLimits {
    double leakage_fraction = 0.0;                     // 531.3.2: standing leakage <= fraction x IΔn
    double selectivity_ratio = 0.0;                    // upstream IΔn >= ratio x downstream IΔn
    double additional_protection_max_idn_amps = 0.0;   // 415.1.1: IΔn <= 30 mA
    double socket_outlet_max_amps = 0.0;               // 411.3.3: socket-outlets <= 32 A
    // The BS EN 61008-1 / 61009-1 break times are published values: their one home is
    // planner/calc/rcd.hpp (rcd_time_limits).

    bool operator==(const RcdLimits&) const = default;
};

struct BreakingCapacityLimits {
    // BS EN 61439-3 Annex ZB: a domestic consumer unit's conditional short-circuit rating when
    // supplied through a fuse of one of these standards rated up to supply_fuse_max_amps.
    double conditional_rating_ka = 0.0;
    double supply_fuse_max_amps = 0.0;
    std::vector<std::string> supply_fuse_standards;

    bool operator==(const BreakingCapacityLimits&) const = default;
};

// A deadline for urgent findings (C1, C2, FI) from the inspection date.
struct DueRule {
    model::Occupancy occupancy = model::Occupancy::privately_rented_dwelling;
    std::string country;  // compared without regard to case: "england"
    int days = 0;
    std::string basis;    // "SI 2020/312 reg. 3"

    bool operator==(const DueRule&) const = default;
};

struct DueDates {
    std::string default_text;  // where no rule matches: "as agreed"
    std::vector<DueRule> rules;

    bool operator==(const DueDates&) const = default;
};

// What one case of a rule gives: its code and the clause it rests on.
struct RuleCase {
    Code code = Code::note;
    std::string clause;  // full reference: "BS 7671:2018+A2 411.5.3"

    bool operator==(const RuleCase&) const = default;
};

struct RulesProfile {
    std::string name;   // "BS 7671:2018+A2"
    std::string basis;  // "BS 7671:2018+A2 practice; local rules may differ"
    std::vector<std::string> notes;  // sources and cautions, shown with the profile
    FaultProtectionLimits fault_protection;
    ElectrodeLimits electrode;
    TailsLimits tails;
    RcdLimits rcd;
    BreakingCapacityLimits breaking_capacity;
    DueDates due_dates;
    // rule id -> case name -> code and clause; every rule and case of the rule table is present.
    // (std::less<> lets rule_case look up by string_view without making strings.)
    std::map<std::string, std::map<std::string, RuleCase, std::less<>>, std::less<>> rules;

    // The code and clause of one case of a rule. The pair must be in the rule table (a profile
    // that parsed has every one).
    [[nodiscard]] const RuleCase& rule_case(std::string_view rule_id, std::string_view case_name) const;

    bool operator==(const RulesProfile&) const = default;
};

// Parses and checks a profile. Errors name the JSON path ("electrode.seasonal_factor_by_month[3]",
// "rules.tt.fault_protection.no_rcd.code") and what was expected. Every key is required and
// unknown keys are refused, so that a typing error cannot silently leave a default in force.
Result<RulesProfile> parse_rules_profile(std::string_view json_text);

// The profile shipped with the program (profiles/bs7671-2018-a2.json, embedded at build time).
const RulesProfile& default_rules_profile();

// The text of the shipped profile, as embedded.
std::string_view default_rules_profile_json();

}  // namespace mendwright::rules
