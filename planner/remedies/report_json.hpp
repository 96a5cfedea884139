#pragma once
// Options and plans as JSON values, for the command line and the app (no I/O here).
// Shapes in docs/remedies.md.

#include <nlohmann/json.hpp>
#include <vector>

#include "planner/remedies/option.hpp"
#include "planner/remedies/plans.hpp"
#include "planner/remedies/ranking.hpp"

namespace mendwright::remedies {

nlohmann::json option_json(const Option& option);
nlohmann::json options_json(const std::vector<Option>& options, const std::vector<FindingRanking>& rankings);
nlohmann::json plan_json(const Plan& plan);

}  // namespace mendwright::remedies
