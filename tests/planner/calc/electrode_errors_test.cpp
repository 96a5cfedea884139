// Bad input to planner/calc/electrode.hpp is refused with the parameter's name.
#include <limits>

#include "planner/calc/electrode.hpp"
#include "tests/planner/calc/calc_problem_check.hpp"

using namespace mendwright::calc;

TEST_CASE("calc errors: rod_resistance_ohms rejects impossible soil or rod sizes") {
    CALC_REQUIRE_PROBLEM(rod_resistance_ohms(0.0, 3.0, 0.016), "resistivity_ohm_m", "> 0");
    CALC_REQUIRE_PROBLEM(rod_resistance_ohms(-100.0, 3.0, 0.016), "resistivity_ohm_m", "> 0");
    CALC_REQUIRE_PROBLEM(rod_resistance_ohms(std::numeric_limits<double>::quiet_NaN(), 3.0, 0.016), "resistivity_ohm_m",
                         "finite");
    CALC_REQUIRE_PROBLEM(rod_resistance_ohms(100.0, 0.0, 0.016), "length_m", "> 0");
    CALC_REQUIRE_PROBLEM(rod_resistance_ohms(100.0, 3.0, 0.0), "diameter_m", "> 0");
    CALC_REQUIRE_PROBLEM(rod_resistance_ohms(100.0, 0.01, 0.016), "length_m", "greater than the diameter");
}

TEST_CASE("calc errors: resistivity_from_rod_ohm_m rejects a non-positive measurement or bad rod") {
    CALC_REQUIRE_PROBLEM(resistivity_from_rod_ohm_m(0.0, 3.0, 0.016), "measured_ohms", "> 0");
    CALC_REQUIRE_PROBLEM(resistivity_from_rod_ohm_m(20.0, -3.0, 0.016), "length_m", "> 0");
    CALC_REQUIRE_PROBLEM(resistivity_from_rod_ohm_m(20.0, 3.0, std::numeric_limits<double>::infinity()), "diameter_m",
                         "finite");
}

TEST_CASE("calc errors: rod groups outside BS 7430's table or with bad spacing are refused") {
    CALC_REQUIRE_PROBLEM(rod_group_lambda(RodLayout::line, 1), "rods_per_side", "2 to 10");
    CALC_REQUIRE_PROBLEM(rod_group_lambda(RodLayout::hollow_square, 11), "rods_per_side", "2 to 10");
    CALC_REQUIRE_PROBLEM(rod_group_resistance(30.0, 100.0, 3.0, RodLayout::line, 0), "rods_per_side", "1 to 10");
    CALC_REQUIRE_PROBLEM(rod_group_resistance(30.0, 100.0, 3.0, RodLayout::line, 11), "rods_per_side", "1 to 10");
    CALC_REQUIRE_PROBLEM(rod_group_resistance(30.0, 100.0, 3.0, RodLayout::hollow_square, 1), "rods_per_side", "2 to 10");
    CALC_REQUIRE_PROBLEM(rod_group_resistance(0.0, 100.0, 3.0, RodLayout::line, 2), "single_rod_ohms", "> 0");
    CALC_REQUIRE_PROBLEM(rod_group_resistance(30.0, 0.0, 3.0, RodLayout::line, 2), "resistivity_ohm_m", "> 0");
    CALC_REQUIRE_PROBLEM(rod_group_resistance(30.0, 100.0, 0.0, RodLayout::line, 2), "spacing_m", "> 0");
    // One rod in a line is the rod itself.
    auto one = rod_group_resistance(30.0, 100.0, 3.0, RodLayout::line, 1);
    REQUIRE(one.ok());
    CHECK(one->resistance_ohms == 30.0);
    CHECK(one->rods == 1);
}

TEST_CASE("calc errors: worst_season_resistance_ohms rejects a factor below 1 or a bad resistance") {
    CALC_REQUIRE_PROBLEM(worst_season_resistance_ohms(80.0, 0.8), "season_factor", ">= 1");
    CALC_REQUIRE_PROBLEM(worst_season_resistance_ohms(80.0, std::numeric_limits<double>::quiet_NaN()), "season_factor",
                         "finite");
    CALC_REQUIRE_PROBLEM(worst_season_resistance_ohms(0.0, 1.5), "measured_ohms", "> 0");
}
