#pragma once
// From a verified plan to the pieces of a quote: the works list of its options, the plan in a
// few figures, and the findings schedule. Plain glue between planner/remedies and
// planner/pricing; no arithmetic of its own (totals come from pricing::total_works).

#include <string>
#include <vector>

#include "planner/core/result.hpp"
#include "planner/pricing/quote.hpp"
#include "planner/pricing/works.hpp"
#include "planner/remedies/option.hpp"
#include "planner/remedies/plans.hpp"
#include "planner/rules/finding.hpp"

namespace mendwright::desktop {

const remedies::Option* find_option(const std::vector<remedies::Option>& options, const std::string& id);

// The findings schedule of a quote: every coded finding (notes left out).
std::vector<pricing::ScheduledFinding> finding_schedule(const std::vector<rules::Finding>& findings);

// The works list of a plan: one group per option, in the plan's order. Each group's cleared
// findings are those re-verification cleared that are in `findings`' schedule.
Result<pricing::WorksList> plan_works(const pricing::PriceBook& book, const remedies::Plan& plan,
                                      const std::vector<remedies::Option>& options,
                                      const std::vector<rules::Finding>& findings);

// The plan in a few figures for the quote; `total_pence` from the plan's own works list.
pricing::PlanSummary plan_summary(const remedies::Plan& plan, const std::string& label,
                                  const std::vector<remedies::Option>& options, pricing::Pence total_pence);

}  // namespace mendwright::desktop
