// The works list and its totals against an example worked by hand.
#include <catch2/catch.hpp>

#include "planner/pricing/works.hpp"
#include "pricing_fixture.hpp"

using namespace mendwright::pricing;

namespace {

std::vector<OptionBill> hand_worked_options() {
    return {
        {"opt-rcd", "Time-delayed RCD at the origin", {"F1"}, {{"A-RCD", 1, ""}, {"B-CABLE", 2.5, ""}}},
        {"opt-test", "Test the circuits", {"F2"}, {{"C-TEST", 3, ""}}},
    };
}

}  // namespace

TEST_CASE("pricing works: totals, contingency, markup and VAT match the hand-worked example", "[pricing][works]") {
    // Hand-worked (rounding rules R6-R8 of planner/pricing/money.hpp; decimal arithmetic):
    //   lines as in costing_tests.cpp: materials 68.40 + 5.88 + 0 = 74.28
    //                                  labour    71.25 + 14.84 + 49.88 = 135.97
    //   group "opt-rcd" = 68.40 + 71.25 + 5.88 + 14.84 = 160.37; group "opt-test" = 49.88
    //   subtotal    = 74.28 + 135.97                     = 210.25
    //   contingency = 10 % x 210.25 = 21.025  -> 21.03 (half up)
    //   markup      = 15 % x 74.28  = 11.142  -> 11.14
    //   net         = 210.25 + 21.03 + 11.14             = 242.42
    //   VAT         = 20 % x 242.42 = 48.484  -> 48.48
    //   total       = 242.42 + 48.48                     = 290.90
    const auto works = build_works_list(test::hand_worked_book(), hand_worked_options());
    REQUIRE(works.ok());
    const WorksTotals totals = total_works(works.value());
    CHECK(totals.group_pence == std::vector<Pence>{16037, 4988});
    CHECK(totals.materials_pence == 7428);
    CHECK(totals.labour_pence == 13597);
    CHECK(totals.subtotal_pence == 21025);
    CHECK(totals.contingency_pence == 2103);
    CHECK(totals.markup_pence == 1114);
    CHECK(totals.net_pence == 24242);
    CHECK(totals.vat_pence == 4848);
    CHECK(totals.total_pence == 29090);
}

TEST_CASE("pricing works: an edited quantity and an extra line change the totals", "[pricing][works]") {
    auto works = build_works_list(test::hand_worked_book(), hand_worked_options()).value();
    // B-CABLE from 2.5 to 4 m: materials 2.35 x 4 = 9.40; labour 0.125 x 4 x 47.50 = 23.75.
    REQUIRE_FALSE(set_quantity(works, 0, 1, 4.0).has_value());
    // Extra: 2 x (materials 3.10, 0.5 h): materials 6.20; labour 2 x 0.5 x 47.50 = 47.50.
    REQUIRE_FALSE(add_extra_line(works, ExtraLine{"Lift and refit floorboards", "each", 2, 310, 500, ""}).has_value());
    // materials 68.40 + 9.40 + 0 + 6.20 = 84.00; labour 71.25 + 23.75 + 49.88 + 47.50 = 192.38
    // subtotal 276.38; contingency 27.638 -> 27.64; markup 15 % x 84.00 = 12.60
    // net 276.38 + 27.64 + 12.60 = 316.62; VAT 63.324 -> 63.32; total 379.94
    const WorksTotals totals = total_works(works);
    CHECK(totals.extras_pence == 5370);
    CHECK(totals.materials_pence == 8400);
    CHECK(totals.labour_pence == 19238);
    CHECK(totals.contingency_pence == 2764);
    CHECK(totals.markup_pence == 1260);
    CHECK(totals.net_pence == 31662);
    CHECK(totals.vat_pence == 6332);
    CHECK(totals.total_pence == 37994);

    REQUIRE_FALSE(set_extra_quantity(works, 0, 1).has_value());
    CHECK(total_works(works).extras_pence == 2685);
}

TEST_CASE("pricing works: a fixed contingency is added as it stands", "[pricing][works]") {
    PriceBook book = test::hand_worked_book();
    book.settings.contingency = Contingency{false, 0, 15000};
    const auto works = build_works_list(book, hand_worked_options());
    REQUIRE(works.ok());
    // net 210.25 + 150.00 + 11.14 = 371.39; VAT 74.278 -> 74.28; total 445.67
    const WorksTotals totals = total_works(works.value());
    CHECK(totals.contingency_pence == 15000);
    CHECK(totals.net_pence == 37139);
    CHECK(totals.vat_pence == 7428);
    CHECK(totals.total_pence == 44567);
}

TEST_CASE("pricing works: refused edits name the line and change nothing", "[pricing][works]") {
    auto works = build_works_list(test::hand_worked_book(), hand_worked_options()).value();
    const Pence before = total_works(works).total_pence;
    auto refused = set_quantity(works, 0, 1, -1.0);
    REQUIRE(refused.has_value());
    CHECK(refused->to_string() == "groups[0].lines[1].quantity: expected a quantity from 0 to 1000000 in m, got -1");
    refused = set_quantity(works, 5, 0, 1.0);
    REQUIRE(refused.has_value());
    CHECK(refused->to_string() == "groups[5].lines[0]: no such line in the works list");
    refused = add_extra_line(works, ExtraLine{"", "each", 1, 100, 0, ""});
    REQUIRE(refused.has_value());
    CHECK(refused->field == "extra_lines[0].description");
    refused = add_extra_line(works, ExtraLine{"Nothing", "each", 1, 0, 0, ""});
    REQUIRE(refused.has_value());
    CHECK(refused->field == "extra_lines[0]");
    refused = set_extra_quantity(works, 0, 1.0);
    REQUIRE(refused.has_value());
    CHECK(refused->field == "extra_lines[0]");
    CHECK(total_works(works).total_pence == before);
}

TEST_CASE("pricing works: a missing code or a repeated option is refused", "[pricing][works]") {
    const PriceBook book = test::hand_worked_book();
    auto options = hand_worked_options();
    options[1].bill.push_back({"Z-MISSING", 1, ""});
    const auto missing = build_works_list(book, options);
    REQUIRE_FALSE(missing.ok());
    CHECK(missing.problem().to_string() == "opt-test: item code Z-MISSING is not in the price book");
    options = hand_worked_options();
    options[1].option_id = "opt-rcd";
    const auto twice = build_works_list(book, options);
    REQUIRE_FALSE(twice.ok());
    CHECK(twice.problem().to_string() == "opt-rcd: option appears twice in the works list");
}
