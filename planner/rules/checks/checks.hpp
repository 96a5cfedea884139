#pragma once
// One function per rule, one file each (checks/<rule>.cpp); listed in rule_table.cpp.

#include <vector>

#include "planner/rules/context.hpp"

namespace mendwright::rules::checks {

std::vector<Finding> tt_fault_protection(const AssessContext& context);
std::vector<Finding> additional_protection(const AssessContext& context);
std::vector<Finding> electrode_resistance(const AssessContext& context);
std::vector<Finding> electrode_worst_season(const AssessContext& context);
std::vector<Finding> tails_origin_protection(const AssessContext& context);
std::vector<Finding> rcd_selectivity(const AssessContext& context);
std::vector<Finding> rcd_standing_leakage(const AssessContext& context);
std::vector<Finding> zs_maximum(const AssessContext& context);
std::vector<Finding> breaking_capacity(const AssessContext& context);
std::vector<Finding> rcd_trip_time(const AssessContext& context);
std::vector<Finding> combustible_enclosure(const AssessContext& context);
std::vector<Finding> recorded_observations(const AssessContext& context);
std::vector<Finding> new_work_additional_protection(const AssessContext& context);
std::vector<Finding> new_work_enclosure(const AssessContext& context);
std::vector<Finding> new_work_surge_protection(const AssessContext& context);

}  // namespace mendwright::rules::checks
