#pragma once
// The table of rules: one entry per rule, each a function of the assessment context (the
// installation and the profile) giving findings. A new rule is one entry here, one file in
// checks/, its cases in the profile, its tests and a line in docs/rules.md.

#include <string>
#include <vector>

#include "planner/rules/context.hpp"

namespace mendwright::rules {

using RuleCheck = std::vector<Finding> (*)(const AssessContext& context);

struct RuleSpec {
    std::string id;                  // "tt.fault_protection"; prefix of every finding id it gives
    std::vector<std::string> cases;  // case names the profile must give a code and clause for
    RuleCheck check = nullptr;
};

const std::vector<RuleSpec>& rule_table();

}  // namespace mendwright::rules
