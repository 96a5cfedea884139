// Bad input to planner/calc/rcd.hpp and leakage.hpp is refused with the parameter's name.
#include <limits>

#include "planner/calc/leakage.hpp"
#include "planner/calc/rcd.hpp"
#include "tests/planner/calc/calc_problem_check.hpp"

using namespace mendwright::calc;

TEST_CASE("calc errors: rcd_max_earth_resistance_ohms rejects a zero IΔn or touch limit") {
    CALC_REQUIRE_PROBLEM(rcd_max_earth_resistance_ohms(0.0), "rated_residual_amps", "> 0");
    CALC_REQUIRE_PROBLEM(rcd_max_earth_resistance_ohms(-0.03), "rated_residual_amps", "> 0");
    CALC_REQUIRE_PROBLEM(rcd_max_earth_resistance_ohms(std::numeric_limits<double>::infinity()), "rated_residual_amps",
                         "finite");
    CALC_REQUIRE_PROBLEM(rcd_max_earth_resistance_ohms(0.03, 0.0), "touch_limit_volts", "> 0");
}

TEST_CASE("calc errors: rcd_time_limits and check_rcd_trip_time accept only 1, 2 and 5 x IΔn") {
    CALC_REQUIRE_PROBLEM(rcd_time_limits(RcdType::general, 3.0), "residual_multiple", "1, 2 or 5");
    CALC_REQUIRE_PROBLEM(rcd_time_limits(RcdType::general, 0.5), "residual_multiple", "1, 2 or 5");
    CALC_REQUIRE_PROBLEM(rcd_time_limits(RcdType::time_delayed, 0.0), "residual_multiple", "> 0");
    CALC_REQUIRE_PROBLEM(check_rcd_trip_time(RcdType::general, 4.0, 0.02), "residual_multiple", "1, 2 or 5");
    CALC_REQUIRE_PROBLEM(check_rcd_trip_time(RcdType::general, 1.0, -0.02), "measured_time_s", ">= 0");
    CALC_REQUIRE_PROBLEM(check_rcd_trip_time(RcdType::general, 1.0, std::numeric_limits<double>::quiet_NaN()),
                         "measured_time_s", "finite");
}

TEST_CASE("calc errors: rcd_selectivity and rcd_gives_additional_protection reject a zero IΔn") {
    CALC_REQUIRE_PROBLEM(rcd_selectivity(RcdType::time_delayed, 0.0, RcdType::general, 0.03), "upstream_idn_amps", "> 0");
    CALC_REQUIRE_PROBLEM(rcd_selectivity(RcdType::time_delayed, 0.1, RcdType::general, -0.03), "downstream_idn_amps",
                         "> 0");
    CALC_REQUIRE_PROBLEM(rcd_gives_additional_protection(RcdType::general, 0.0), "rated_residual_amps", "> 0");
}

TEST_CASE("calc errors: leakage_budget names the bad IΔn, fraction or list item") {
    CALC_REQUIRE_PROBLEM(leakage_budget(0.0, {0.001}), "rated_residual_amps", "> 0");
    CALC_REQUIRE_PROBLEM(leakage_budget(0.03, {0.001}, 0.0), "allowed_fraction", "> 0");
    CALC_REQUIRE_PROBLEM(leakage_budget(0.03, {0.001}, 1.5), "allowed_fraction", "<= 1");
    CALC_REQUIRE_PROBLEM(leakage_budget(0.03, {0.001, -0.002}), "standing_currents_amps[1]", ">= 0");
    auto empty = leakage_budget(0.03, {});
    REQUIRE(empty.ok());
    CHECK(empty->used_amps == 0.0);
    CHECK(empty->within);
}
