#pragma once
// Costing and ranking options. Per finding, the options that target it are ordered by:
//   1. whether they clear every urgent finding they target (as re-verification found),
//   2. cost, 3. findings left (still open plus introduced), 4. hours the supply is off;
// an option that introduces an urgent finding, or clears nothing, goes last whatever its cost.

#include <string>
#include <vector>

#include "planner/pricing/price_book.hpp"
#include "planner/remedies/option.hpp"
#include "planner/rules/finding.hpp"

namespace mendwright::remedies {

// Prices every option's bill. A code missing from the price book is a Problem naming the option
// and the code (the option stays unpriced); every such problem is returned.
std::vector<Problem> cost_options(const pricing::PriceBook& book, std::vector<Option>& options);

// Sets ranked_last and rank_reasons on every option (after verification and costing).
void explain_options(std::vector<Option>& options);

struct FindingRanking {
    std::string finding_id;
    rules::Code code = rules::Code::note;
    std::vector<std::string> option_ids;  // best first
    std::vector<std::string> reasons;     // one line per option, same order
};

// For each finding that some option targets, the options in rank order.
std::vector<FindingRanking> rank_by_finding(const std::vector<rules::Finding>& findings, const std::vector<Option>& options);

// The ordering itself: true when `a` ranks before `b`.
bool ranks_before(const Option& a, const Option& b);

std::string money_text(pricing::Pence pence);  // "£1,234.56"

}  // namespace mendwright::remedies
