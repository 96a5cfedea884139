#pragma once
// Looking findings up in tests.

#include <algorithm>
#include <optional>
#include <string>
#include <vector>

#include "planner/rules/assess.hpp"

namespace mendwright::test {

// A copy, so that it may be called on a temporary list of findings.
inline std::optional<rules::Finding> finding_with_id(const std::vector<rules::Finding>& findings, const std::string& id) {
    const auto found = std::find_if(findings.begin(), findings.end(), [&](const rules::Finding& f) { return f.id == id; });
    if (found == findings.end()) return std::nullopt;
    return *found;
}

inline std::vector<rules::Finding> findings_of_rule(const std::vector<rules::Finding>& findings, const std::string& rule) {
    std::vector<rules::Finding> result;
    for (const auto& f : findings)
        if (f.rule == rule) result.push_back(f);
    return result;
}

inline std::vector<rules::Finding> assess_default(const model::Installation& installation) {
    return rules::assess(installation, rules::default_rules_profile());
}

}  // namespace mendwright::test
