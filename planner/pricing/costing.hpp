#pragma once
// Costing a bill of items against the price book: what the remedies module calls to price an
// option. Rounding follows planner/pricing/money.hpp (R5, R6, R7); the figures are before
// markup, contingency and VAT, which belong to the whole works list (works.hpp).
//
// Example:
//   auto costed = cost_bill(book, {{"RCD-S100-ENCL", 1, ""}, {"TAILS-SWA-25", 4.5, "garage run"}}, "opt-tt-rcd");
//   if (!costed) return costed.problem();   // "opt-tt-rcd: item code X is not in the price book"
//   Pence total = costed->total_pence;

#include <string>
#include <string_view>
#include <vector>

#include "planner/core/result.hpp"
#include "planner/pricing/price_book.hpp"

namespace mendwright::pricing {

struct BillLine {
    std::string item_code;
    double quantity = 1.0;  // in the item's unit; rounded to the nearest thousandth (R5)
    std::string note;       // why it is there: "garage run, buried"
};

struct CostedLine {
    std::string item_code;
    std::string description;
    std::string unit;
    std::string category;
    std::string note;
    MilliUnits quantity_milli = 0;
    Pence unit_material_pence = 0;
    MilliHours labour_milli_hours_per_unit = 0;
    Pence materials_pence = 0;  // R6
    Pence labour_pence = 0;     // R6
    [[nodiscard]] Pence total_pence() const { return materials_pence + labour_pence; }
    [[nodiscard]] double quantity() const { return static_cast<double>(quantity_milli) / 1000.0; }
};

struct CostedBill {
    std::vector<CostedLine> lines;
    Pence materials_pence = 0;  // R7: sums of the lines
    Pence labour_pence = 0;
    Pence total_pence = 0;
    MilliHours labour_milli_hours = 0;  // hours on site, for planning
};

// One costed line; `field` names the line in a Problem.
Result<CostedLine> cost_line(const PriceBook& book, const BillLine& line, const std::string& field);

// Every line priced from the book. A code that is not in the book is an error naming the owner
// (e.g. the option id) and the code, never a zero price:
//   Problem{owner, "item code X is not in the price book"}.
// A quantity that is not finite, negative or above max_quantity_units is an error naming
// "<owner>.bill[i].quantity".
Result<CostedBill> cost_bill(const PriceBook& book, const std::vector<BillLine>& bill, std::string_view owner);

}  // namespace mendwright::pricing
