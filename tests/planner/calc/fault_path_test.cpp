// planner/calc/fault_path.hpp: Ohm's law and the voltage divider on a worked TT fault, and
// its bad input.
#include <limits>

#include "planner/calc/fault_path.hpp"
#include "tests/planner/calc/calc_problem_check.hpp"

using namespace mendwright::calc;

TEST_CASE("calc fault path: an invented TT fault worked by hand (Ohm's law, voltage divider)") {
    // Invented example: 230 V through line 0.5, cpc 0.3, installation electrode 100 and supply
    // electrode 14.2 ohm: total 115 ohm, I = 230 / 115 = 2 A; volts 1.0, 0.6, 200, 28.4.
    auto path = series_fault_path(230.0, {0.5, 0.3, 100.0, 14.2}, 2);
    REQUIRE(path.ok());
    CHECK(path->total_ohms == Approx(115.0));
    CHECK(path->current_amps == Approx(2.0));
    REQUIRE(path->elements.size() == 4);
    CHECK(path->elements[0].volts == Approx(1.0));
    CHECK(path->elements[1].volts == Approx(0.6));
    CHECK(path->elements[2].volts == Approx(200.0));
    CHECK(path->elements[3].volts == Approx(28.4));
    // Node potentials fall from 230 V to 0: 230, 229, 228.4, 28.4, 0.
    REQUIRE(path->node_potentials_volts.size() == 5);
    CHECK(path->node_potentials_volts[0] == Approx(230.0));
    CHECK(path->node_potentials_volts[1] == Approx(229.0));
    CHECK(path->node_potentials_volts[2] == Approx(228.4));
    CHECK(path->node_potentials_volts[3] == Approx(28.4));
    CHECK(path->node_potentials_volts[4] == 0.0);
    // Touch voltage across the installation electrode: 2 A x 100 ohm = 200 V (Ohm's law).
    CHECK(path->touch_index == 2);
    CHECK(path->touch_volts == Approx(200.0));
}

TEST_CASE("calc fault path: the last element is the touch path unless another is named") {
    auto path = series_fault_path(230.0, {1.0, 45.0});
    REQUIRE(path.ok());
    CHECK(path->touch_index == 1);
    CHECK(path->touch_volts == Approx(225.0));  // 230 x 45 / 46
}

TEST_CASE("calc errors: series_fault_path names the voltage, the bad resistance or the touch index") {
    CALC_REQUIRE_PROBLEM(series_fault_path(0.0, {1.0}), "supply_volts", "> 0");
    CALC_REQUIRE_PROBLEM(series_fault_path(std::numeric_limits<double>::quiet_NaN(), {1.0}), "supply_volts", "finite");
    CALC_REQUIRE_PROBLEM(series_fault_path(230.0, {}), "resistances_ohms", "at least one");
    CALC_REQUIRE_PROBLEM(series_fault_path(230.0, {1.0, -2.0}), "resistances_ohms[1]", ">= 0");
    CALC_REQUIRE_PROBLEM(series_fault_path(230.0, {1.0, std::numeric_limits<double>::infinity()}), "resistances_ohms[1]",
                         "finite");
    CALC_REQUIRE_PROBLEM(series_fault_path(230.0, {0.0, 0.0}), "resistances_ohms", "total resistance > 0");
    CALC_REQUIRE_PROBLEM(series_fault_path(230.0, {1.0, 2.0}, 2), "touch_index", "0 to 1");
}

