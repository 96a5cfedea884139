// Money text and the rounding rules of planner/pricing/money.hpp. The expected figures are
// worked by hand in the comments (decimal arithmetic, half up).
#include <catch2/catch.hpp>

#include <limits>

#include "planner/pricing/money.hpp"

using namespace mendwright::pricing;

TEST_CASE("pricing: amounts are read as exact decimal pence", "[pricing][money]") {
    CHECK(parse_amount_pence("12.50") == 1250);
    CHECK(parse_amount_pence("7") == 700);
    CHECK(parse_amount_pence("0.5") == 50);
    CHECK(parse_amount_pence("0.05") == 5);
    CHECK(parse_amount_pence(".5") == 50);
    // 0.1 + 0.2 is not 0.3 in binary; as text it is exact.
    CHECK(parse_amount_pence("0.30") == 30);
    for (const char* bad : {"", "twelve", "12.505", "-1", "+1", "1,000", "£12", "12.", ".", "1.2.3", " 12",
                            "1234567890123"}) {
        INFO(bad);
        CHECK_FALSE(parse_amount_pence(bad).has_value());
    }
}

TEST_CASE("pricing: hours keep three decimals and percentages two", "[pricing][money]") {
    CHECK(parse_milli_hours("1.5") == 1500);
    CHECK(parse_milli_hours("0.125") == 125);
    CHECK_FALSE(parse_milli_hours("0.1255").has_value());
    CHECK(parse_basis_points("20") == 2000);
    CHECK(parse_basis_points("17.5") == 1750);
    CHECK_FALSE(parse_basis_points("17.555").has_value());
}

TEST_CASE("pricing: a quantity is rounded once to the thousandth and bounded", "[pricing][money]") {
    CHECK(quantity_milli_units(4.5) == 4500);
    CHECK(quantity_milli_units(0.0) == 0);
    CHECK(quantity_milli_units(2.0004) == 2000);
    CHECK(quantity_milli_units(2.0006) == 2001);
    CHECK_FALSE(quantity_milli_units(-0.5).has_value());
    CHECK_FALSE(quantity_milli_units(std::numeric_limits<double>::quiet_NaN()).has_value());
    CHECK_FALSE(quantity_milli_units(std::numeric_limits<double>::infinity()).has_value());
    CHECK_FALSE(quantity_milli_units(max_quantity_units * 2).has_value());
}

TEST_CASE("pricing: line figures round once, half up, to the penny", "[pricing][money]") {
    // 2.35 x 2.5 = 5.875 pounds = 587.5 p -> 588 (half up).
    CHECK(line_materials_pence(235, 2500) == 588);
    // 2.35 x 2.499 = 5.87265 pounds = 587.265 p -> 587.
    CHECK(line_materials_pence(235, 2499) == 587);
    // 0.35 h x 3 x 47.50 = 49.875 pounds = 4987.5 p -> 4988 (half up).
    CHECK(line_labour_pence(350, 3000, 4750) == 4988);
    // 0.125 h x 2.5 x 47.50 = 14.84375 pounds -> 1484 p.
    CHECK(line_labour_pence(125, 2500, 4750) == 1484);
    // Largest allowed: 1,000,000.00 x 1,000,000 units = 10^12 pounds = 10^14 p, no overflow.
    CHECK(line_materials_pence(max_item_material_pence, 1'000'000'000) == 100'000'000'000'000);
    // Largest labour: 1000 h x 1,000,000 units x 1000.00 an hour = 10^12 pounds = 10^14 p.
    CHECK(line_labour_pence(max_item_labour_milli_hours, 1'000'000'000, 100'000) == 100'000'000'000'000);
}

TEST_CASE("pricing: a percentage of a total rounds once, half up", "[pricing][money]") {
    CHECK(percentage_of_pence(21025, 1000) == 2103);  // 2102.5 -> 2103
    CHECK(percentage_of_pence(7428, 1500) == 1114);   // 1114.2 -> 1114
    CHECK(percentage_of_pence(24242, 2000) == 4848);  // 4848.4 -> 4848
    CHECK(percentage_of_pence(24243, 2000) == 4849);  // 4848.6 -> 4849
    CHECK(percentage_of_pence(1000, 1750) == 175);    // 17.5 % of 10.00 = 1.75
}

TEST_CASE("pricing: money and rates print as plain decimals", "[pricing][money]") {
    CHECK(pence_text(123456) == "1234.56");
    CHECK(pence_text(5) == "0.05");
    CHECK(pence_text(-250) == "-2.50");
    CHECK(milli_hours_text(1500) == "1.5");
    CHECK(milli_hours_text(125) == "0.125");
    CHECK(basis_points_text(2000) == "20");
    CHECK(basis_points_text(1750) == "17.5");
}
