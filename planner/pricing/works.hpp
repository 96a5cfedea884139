#pragma once
// The works list: the costed lines of a plan, grouped by the option each line belongs to, plus
// lines the contractor adds by hand, and the figures that turn it into a price: contingency for
// faults found during the work, markup on materials, VAT. Rounding: planner/pricing/money.hpp.
//
// Totals are always worked out from the lines (total_works), never stored beside them, so an
// edited quantity can never leave a stale total.
//
// Example:
//   auto works = build_works_list(book, {{"opt-rcd", "Time-delayed 100 mA RCD at the origin",
//                                         {"F1"}, {{"RCD-S100-ENCL", 1, ""}}}});
//   set_quantity(works.value(), 0, 0, 2.0);
//   WorksTotals totals = total_works(works.value());

#include <cstddef>
#include <optional>
#include <string>
#include <vector>

#include "planner/core/result.hpp"
#include "planner/pricing/costing.hpp"
#include "planner/pricing/price_book.hpp"

namespace mendwright::pricing {

// What the remedies module hands over for one chosen option.
struct OptionBill {
    std::string option_id;                 // "opt-tt-rcd-origin"
    std::string title;                     // as the client reads it
    std::vector<std::string> clears_findings;  // ids of the findings this option clears (re-verified)
    std::vector<BillLine> bill;
};

struct WorksGroup {
    std::string option_id;
    std::string title;
    std::vector<std::string> clears_findings;
    std::vector<CostedLine> lines;
};

// A line typed by hand (no price-book code): e.g. "Lift and refit floorboards, landing".
struct ExtraLine {
    std::string description;
    std::string unit = "each";
    double quantity = 1.0;
    Pence unit_material_pence = 0;
    MilliHours labour_milli_hours_per_unit = 0;
    std::string note;
};

struct WorksList {
    PricingSettings settings;  // copied from the price book: the list prices itself
    std::vector<WorksGroup> groups;
    std::vector<CostedLine> extra_lines;  // item_code empty, category "extra"
};

struct WorksTotals {
    std::vector<Pence> group_pence;  // per group, materials + labour (R7)
    Pence extras_pence = 0;
    Pence materials_pence = 0;       // every line's materials, extras included (R7)
    Pence labour_pence = 0;
    Pence subtotal_pence = 0;        // materials + labour
    Pence contingency_pence = 0;     // R8 of the subtotal, or the fixed amount
    Pence markup_pence = 0;          // R8 of materials_pence
    Pence net_pence = 0;             // subtotal + contingency + markup
    Pence vat_pence = 0;             // R8 of net_pence
    Pence total_pence = 0;           // net + VAT
    MilliHours labour_milli_hours = 0;  // hours on site, for planning
};

// One group per option, in the order given. Errors name the option (missing code) or
// "<option_id>.bill[i].quantity". An option id given twice is an error.
Result<WorksList> build_works_list(const PriceBook& book, const std::vector<OptionBill>& options);

// Edits. Each returns the Problem, or nothing when the edit was made; a refused edit changes
// nothing. Fields are named "groups[g].lines[i].quantity" and "extra_lines[i]...".
std::optional<Problem> set_quantity(WorksList& works, std::size_t group, std::size_t line, double quantity);
std::optional<Problem> set_extra_quantity(WorksList& works, std::size_t line, double quantity);
std::optional<Problem> add_extra_line(WorksList& works, const ExtraLine& extra);

WorksTotals total_works(const WorksList& works);

}  // namespace mendwright::pricing
