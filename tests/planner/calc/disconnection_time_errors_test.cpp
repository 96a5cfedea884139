// Bad input to planner/calc/disconnection_time.hpp and rounding.hpp.
#include <limits>

#include "planner/calc/disconnection_time.hpp"
#include "planner/calc/rounding.hpp"
#include "tests/planner/calc/calc_problem_check.hpp"

using namespace mendwright::calc;

TEST_CASE("calc errors: circuit_duty rejects a rating that is not positive") {
    CALC_REQUIRE_PROBLEM(circuit_duty(false, true, 0.0), "rating_amps", "> 0");
    CALC_REQUIRE_PROBLEM(circuit_duty(false, false, std::numeric_limits<double>::quiet_NaN()), "rating_amps", "finite");
}

TEST_CASE("calc errors: required_disconnection_time_s rejects U0 that is not positive or out of band") {
    CALC_REQUIRE_PROBLEM(required_disconnection_time_s(EarthingSystem::tn, CircuitDuty::small_final, 0.0), "u0_volts",
                         "> 0");
    CALC_REQUIRE_PROBLEM(required_disconnection_time_s(EarthingSystem::tn, CircuitDuty::small_final, 240.0), "u0_volts",
                         "120 V < U0 <= 230 V");
}

TEST_CASE("calc rounding: round_half_up rounds halves away from zero at the given decimals") {
    CHECK(round_half_up(2.185, 2) == Approx(2.19).margin(1e-12));
    CHECK(round_half_up(2.1849, 2) == Approx(2.18).margin(1e-12));
    CHECK(round_half_up(-0.125, 2) == Approx(-0.13).margin(1e-12));
    CHECK(round_half_up(1666.6667, 0) == Approx(1667).margin(1e-12));
}
