#pragma once
// The rules engine's entry point: findings of an installation under a rules profile.
//
//   const auto& profile = mendwright::rules::default_rules_profile();
//   auto findings = mendwright::rules::assess(installation, profile);
//   auto counts = mendwright::rules::summarise(findings);   // counts.c2 == 3
//
// Findings come in a fixed order (code: C1, C2, FI, C3, note; then board, circuit and id) and
// carry stable ids ("tt.fault_protection@circuit:c3"), so that two assessments of the same
// installation compare id by id. Urgent findings (C1, C2, FI) carry a due date or "as agreed".

#include <vector>

#include "planner/model/installation.hpp"
#include "planner/rules/finding.hpp"
#include "planner/rules/profile.hpp"

namespace mendwright::rules {

// `options.detail == FindingDetail::verdict` leaves the findings' words empty (see finding.hpp).
std::vector<Finding> assess(const model::Installation& installation, const RulesProfile& profile,
                            AssessOptions options = {});

struct CodeSummary {
    int c1 = 0, c2 = 0, c3 = 0, fi = 0, note = 0;

    [[nodiscard]] int urgent() const { return c1 + c2 + fi; }
    bool operator==(const CodeSummary&) const = default;
};

CodeSummary summarise(const std::vector<Finding>& findings);

// The due date of an urgent finding for this job under the profile: a date when a due rule
// matches the occupancy and country, else the profile's default text ("as agreed").
struct DueDate {
    std::optional<Date> date;
    std::string text;   // the date as YYYY-MM-DD, or the default text
    std::string basis;  // "SI 2020/312 reg. 3", empty for the default
};
DueDate due_date_for(const model::JobFacts& job, const RulesProfile& profile);

}  // namespace mendwright::rules
