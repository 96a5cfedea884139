#pragma once
// A small invented price book for the pricing tests; its figures are chosen so the hand-worked
// example in works_tests.cpp meets both half-up cases.
#include <catch2/catch.hpp>

#include "planner/pricing/price_book.hpp"

namespace mendwright::pricing::test {

inline PriceBook hand_worked_book() {
    auto items = parse_price_items(
        "code,description,unit,material_cost,labour_hours,category\n"
        "A-RCD,\"RCD 100 mA, S-type, in enclosure\",each,68.40,1.5,protection\n"
        "B-CABLE,\"Cable, per metre\",m,2.35,0.125,cables\n"
        "C-TEST,\"Testing, per circuit\",circuit,0,0.35,testing\n",
        "items.csv");
    REQUIRE(items.ok());
    PricingSettings settings;
    settings.labour_rate_per_hour_pence = 4750;   // 47.50 an hour
    settings.markup_on_materials_bp = 1500;       // 15 %
    settings.vat_bp = 2000;                       // 20 %: UK standard rate since 2011 (from memory)
    settings.contingency = Contingency{true, 1000, 0};  // 10 % of the works subtotal
    settings.quote_validity_days = 30;
    return PriceBook{std::move(items).value(), settings};
}

}  // namespace mendwright::pricing::test
