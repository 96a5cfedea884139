#pragma once
// From verified plans to a priced quote request: the chosen plan's options become the works
// list (one group per option, its bill from the price book), the other plan becomes the
// side-by-side alternative, and the surveyed findings become the schedule. The quote itself is
// checked and priced by pricing::make_quote.

#include <string>

#include "planner/core/date.hpp"
#include "planner/pricing/price_book.hpp"
#include "planner/pricing/quote.hpp"
#include "planner/remedies/analysis.hpp"
#include "planner/remedies/plans.hpp"

namespace mendwright::remedies {

struct QuoteParties {
    std::string number;  // the contractor's quote number
    Date date;
    std::string client_name;
    std::string site_address;
};

// The client-facing name of a plan: "least-cost" -> "Least cost that clears every C1, C2 and FI".
std::string plan_display_name(const std::string& plan_name);

// The works list of `plan` priced from `book`; errors name the option and the missing code.
Result<pricing::WorksList> plan_works_list(const Analysis& analysis, const Plan& plan, const pricing::PriceBook& book);

// Summary figures of `plan` for the comparison, priced as a whole (contingency, markup, VAT).
Result<pricing::PlanSummary> plan_summary(const Analysis& analysis, const Plan& plan, const pricing::PriceBook& book);

// The request for the chosen plan, with `alternative` beside it when given.
Result<pricing::QuoteRequest> quote_request(const Analysis& analysis, const Plan& chosen, const Plan* alternative,
                                            const pricing::PriceBook& book, const QuoteParties& parties);

}  // namespace mendwright::remedies
