#pragma once
// A quote: the works list of the chosen plan priced for a client, beside the alternative plan,
// with the findings schedule, exclusions and cautions. Everything the spreadsheet export
// (planner/export/quote_workbook.hpp) writes comes from here.
//
// Example:
//   QuoteRequest request{.number = "Q-0042", .date = *parse_iso_date("2026-03-02", "date"), ...};
//   auto quote = make_quote(std::move(request));   // checks it, fills totals and cautions

#include <optional>
#include <string>
#include <vector>

#include "planner/core/date.hpp"
#include "planner/core/result.hpp"
#include "planner/pricing/works.hpp"

namespace mendwright::pricing {

// Findings a plan leaves open, by code.
struct FindingCounts {
    int c1 = 0;
    int c2 = 0;
    int c3 = 0;
    int fi = 0;
};

// One plan in a few figures, for the side-by-side comparison (cheaper vs ideal).
struct PlanSummary {
    std::string name;                        // "Least cost that clears every C1/C2", "Ideal"
    std::vector<std::string> option_titles;
    Pence total_pence = 0;                   // including VAT; make_quote fills it for the chosen plan
    FindingCounts residual;                  // still open after the plan
    double hours_off_supply = 0.0;
    std::vector<std::string> certificates;   // "Electrical Installation Certificate", "Minor Works certificate"
    bool building_control_notification = false;
};

// A line of the findings schedule. `code` is "C1", "C2", "C3" or "FI".
struct ScheduledFinding {
    std::string id;        // stable finding id, as the options' clears_findings name it
    std::string code;
    std::string title;
    std::string location;
    std::string clause;
};

struct QuoteRequest {
    std::string number;          // the contractor's own quote number
    Date date;
    std::string client_name;
    std::string site_address;
    WorksList works;             // of the chosen plan
    PlanSummary chosen_plan;
    std::optional<PlanSummary> alternative_plan;
    std::vector<ScheduledFinding> findings;
    std::vector<std::string> exclusions;  // default_exclusions() when left empty
};

// A finding with what clears it in this quote: the titles of the options that clear it, or
// none when the chosen plan leaves it open.
struct QuotedFinding {
    ScheduledFinding finding;
    std::vector<std::string> cleared_by;
};

struct Quote {
    std::string number;
    Date date;
    Date valid_until;            // date + settings.quote_validity_days
    std::string client_name;
    std::string site_address;
    WorksList works;
    WorksTotals totals;
    PlanSummary chosen_plan;
    std::optional<PlanSummary> alternative_plan;
    std::vector<QuotedFinding> findings;
    std::vector<std::string> exclusions;
    std::vector<std::string> cautions;
};

// The cautions every quote carries (planning aid, competent person, local rules, electrode
// re-measurement).
std::vector<std::string> quote_cautions();
// What a remedial quote does not include unless a line says otherwise (common practice).
std::vector<std::string> default_exclusions();

// Checks the request (number, client, site, codes, that every cleared finding is in the
// schedule) and prices it. Errors name the field: "findings[2].code: expected C1, C2, C3 or FI".
Result<Quote> make_quote(QuoteRequest request);

}  // namespace mendwright::pricing
