// Bad input to planner/calc/conductor.hpp, adiabatic.hpp and voltage_drop.hpp is refused with
// the parameter's name.
#include <limits>

#include "planner/calc/adiabatic.hpp"
#include "planner/calc/conductor.hpp"
#include "planner/calc/voltage_drop.hpp"
#include "tests/planner/calc/calc_problem_check.hpp"

using namespace mendwright::calc;

TEST_CASE("calc errors: copper_resistance_mohm_per_m accepts only tabulated sizes") {
    CALC_REQUIRE_PROBLEM(copper_resistance_mohm_per_m(3.0), "csa_mm2", "expected one of the sizes 1, 1.5, 2.5");
    CALC_REQUIRE_PROBLEM(copper_resistance_mohm_per_m(0.0), "csa_mm2", "> 0");
    CALC_REQUIRE_PROBLEM(copper_resistance_mohm_per_m(70.0), "csa_mm2", "expected one of the sizes");
}

TEST_CASE("calc errors: copper_temperature_multiplier rejects temperatures outside -50 to 250 C") {
    CALC_REQUIRE_PROBLEM(copper_temperature_multiplier(300.0), "conductor_temperature_c", "-50 to 250");
    CALC_REQUIRE_PROBLEM(copper_temperature_multiplier(-60.0), "conductor_temperature_c", "-50 to 250");
    CALC_REQUIRE_PROBLEM(copper_temperature_multiplier(std::numeric_limits<double>::quiet_NaN()),
                         "conductor_temperature_c", "finite");
}

TEST_CASE("calc errors: r1_plus_r2_ohms names the line, cpc, length or temperature at fault") {
    CALC_REQUIRE_PROBLEM(r1_plus_r2_ohms(3.0, 1.5, 10.0), "line_csa_mm2", "expected one of the sizes");
    CALC_REQUIRE_PROBLEM(r1_plus_r2_ohms(2.5, 2.0, 10.0), "cpc_csa_mm2", "expected one of the sizes");
    CALC_REQUIRE_PROBLEM(r1_plus_r2_ohms(2.5, 1.5, 0.0), "length_m", "> 0");
    CALC_REQUIRE_PROBLEM(r1_plus_r2_ohms(2.5, 1.5, 10.0, 400.0), "conductor_temperature_c", "-50 to 250");
}

TEST_CASE("calc errors: loop_impedance_ohms rejects negative Ze or R1+R2") {
    CALC_REQUIRE_PROBLEM(loop_impedance_ohms(-0.1, 0.5), "ze_ohms", ">= 0");
    CALC_REQUIRE_PROBLEM(loop_impedance_ohms(0.35, -0.5), "r1_plus_r2_ohms", ">= 0");
    CALC_REQUIRE_PROBLEM(loop_impedance_ohms(std::numeric_limits<double>::infinity(), 0.5), "ze_ohms", "finite");
}

TEST_CASE("calc errors: adiabatic functions reject zero current, time beyond 5 s or zero k") {
    CALC_REQUIRE_PROBLEM(adiabatic_min_csa_mm2(0.0, 0.1, 115), "fault_current_amps", "> 0");
    CALC_REQUIRE_PROBLEM(adiabatic_min_csa_mm2(1000.0, 0.0, 115), "time_s", "> 0");
    CALC_REQUIRE_PROBLEM(adiabatic_min_csa_mm2(1000.0, 6.0, 115), "time_s", "<= 5 s");
    CALC_REQUIRE_PROBLEM(adiabatic_min_csa_mm2(1000.0, 0.1, 0.0), "k", "> 0");
    CALC_REQUIRE_PROBLEM(adiabatic_max_time_s(0.0, 1.5, 115), "fault_current_amps", "> 0");
    CALC_REQUIRE_PROBLEM(adiabatic_max_time_s(500.0, 0.0, 115), "csa_mm2", "> 0");
    CALC_REQUIRE_PROBLEM(adiabatic_max_time_s(500.0, 1.5, -115), "k", "> 0");
}

TEST_CASE("calc errors: voltage drop functions name the bad input") {
    CALC_REQUIRE_PROBLEM(twin_and_earth_mv_per_amp_metre(25.0), "csa_mm2", "expected one of the sizes");
    CALC_REQUIRE_PROBLEM(twin_and_earth_mv_per_amp_metre(-1.0), "csa_mm2", "> 0");
    CALC_REQUIRE_PROBLEM(voltage_drop_volts(0.0, 20, 25), "mv_per_amp_metre", "> 0");
    CALC_REQUIRE_PROBLEM(voltage_drop_volts(18.0, -20, 25), "current_amps", ">= 0");
    CALC_REQUIRE_PROBLEM(voltage_drop_volts(18.0, 20, 0), "length_m", "> 0");
    CALC_REQUIRE_PROBLEM(voltage_drop_percent(-1.0, 230), "drop_volts", ">= 0");
    CALC_REQUIRE_PROBLEM(voltage_drop_percent(9.0, 0), "nominal_volts", "> 0");
}
