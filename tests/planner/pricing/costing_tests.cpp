// cost_bill: per-line figures and the missing-code error the remedies module relies on.
#include <catch2/catch.hpp>

#include <limits>

#include "planner/pricing/costing.hpp"
#include "pricing_fixture.hpp"

using namespace mendwright::pricing;

TEST_CASE("pricing cost: a missing item code names the option and the code, never a zero price", "[pricing][cost]") {
    const PriceBook book = test::hand_worked_book();
    const auto costed = cost_bill(book, {{"A-RCD", 1, ""}, {"NO-SUCH-ITEM", 2, ""}}, "opt-tt-rcd");
    REQUIRE_FALSE(costed.ok());
    CHECK(costed.problem().field == "opt-tt-rcd");
    CHECK(costed.problem().message == "item code NO-SUCH-ITEM is not in the price book");
}

TEST_CASE("pricing cost: a bad quantity names the bill line", "[pricing][cost]") {
    const PriceBook book = test::hand_worked_book();
    const auto negative = cost_bill(book, {{"A-RCD", 1, ""}, {"B-CABLE", -3, ""}}, "opt-a");
    REQUIRE_FALSE(negative.ok());
    CHECK(negative.problem().to_string() == "opt-a.bill[1].quantity: expected a quantity from 0 to 1000000 in m, got -3");
    const auto not_a_number = cost_bill(book, {{"A-RCD", std::numeric_limits<double>::quiet_NaN(), ""}}, "opt-a");
    REQUIRE_FALSE(not_a_number.ok());
    CHECK(not_a_number.problem().field == "opt-a.bill[0].quantity");
}

TEST_CASE("pricing cost: lines and bill totals follow the rounding rules", "[pricing][cost]") {
    // Worked by hand (rate 47.50 an hour):
    //   A-RCD   x 1   : materials 68.40 x 1 = 68.40;            labour 1.5 h x 1 x 47.50 = 71.25
    //   B-CABLE x 2.5 : materials 2.35 x 2.5 = 5.875 -> 5.88;   labour 0.125 x 2.5 x 47.50 = 14.84375 -> 14.84
    //   C-TEST  x 3   : materials 0;                            labour 0.35 x 3 x 47.50 = 49.875 -> 49.88
    //   materials 74.28, labour 135.97, total 210.25; hours 1.5 + 0.3125 + 1.05 = 2.8625 h
    const PriceBook book = test::hand_worked_book();
    const auto costed = cost_bill(book, {{"A-RCD", 1, ""}, {"B-CABLE", 2.5, "loft run"}, {"C-TEST", 3, ""}}, "opt-a");
    REQUIRE(costed.ok());
    REQUIRE(costed->lines.size() == 3);
    CHECK(costed->lines[0].materials_pence == 6840);
    CHECK(costed->lines[0].labour_pence == 7125);
    CHECK(costed->lines[1].materials_pence == 588);
    CHECK(costed->lines[1].labour_pence == 1484);
    CHECK(costed->lines[1].note == "loft run");
    CHECK(costed->lines[1].description == "Cable, per metre");
    CHECK(costed->lines[2].materials_pence == 0);
    CHECK(costed->lines[2].labour_pence == 4988);
    CHECK(costed->materials_pence == 7428);
    CHECK(costed->labour_pence == 13597);
    CHECK(costed->total_pence == 21025);
    CHECK(costed->labour_milli_hours == 2863);  // 2.8625 h to the nearest milli-hour, half up
}
