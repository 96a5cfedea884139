// Bad input to planner/calc/circuit_breaker.hpp is refused with the parameter's name.
#include <limits>

#include "planner/calc/circuit_breaker.hpp"
#include "tests/planner/calc/calc_problem_check.hpp"

using namespace mendwright::calc;

namespace {
const double nan_value = std::numeric_limits<double>::quiet_NaN();
const double infinity = std::numeric_limits<double>::infinity();
}  // namespace

TEST_CASE("calc errors: breaker_max_zs_ohms rejects impossible ratings") {
    CALC_REQUIRE_PROBLEM(breaker_max_zs_ohms(BreakerCurve::b, 0), "rating_amps", "expected a number > 0, got 0");
    CALC_REQUIRE_PROBLEM(breaker_max_zs_ohms(BreakerCurve::b, -32), "rating_amps", "> 0");
    CALC_REQUIRE_PROBLEM(breaker_max_zs_ohms(BreakerCurve::c, nan_value), "rating_amps", "finite");
    CALC_REQUIRE_PROBLEM(breaker_max_zs_ohms(BreakerCurve::c, 160), "rating_amps", "<= 125 A");
}

TEST_CASE("calc errors: breaker_max_zs_ohms accepts only the times of Table 41.3 and refuses D at 5 s") {
    CALC_REQUIRE_PROBLEM(breaker_max_zs_ohms(BreakerCurve::b, 32, 1.0), "disconnection_time_s", "0.4 or 5");
    CALC_REQUIRE_PROBLEM(breaker_max_zs_ohms(BreakerCurve::b, 32, 0.0), "disconnection_time_s", "> 0");
    CALC_REQUIRE_PROBLEM(breaker_max_zs_ohms(BreakerCurve::d, 32, 5.0), "disconnection_time_s", "unsettled");
    CHECK(breaker_max_zs_ohms(BreakerCurve::d, 32, 0.4).ok());
}

TEST_CASE("calc errors: breaker_max_zs_ohms rejects a bad U0 or Cmin") {
    CALC_REQUIRE_PROBLEM(breaker_max_zs_ohms(BreakerCurve::b, 32, 0.4, 0.0), "u0_volts", "> 0");
    CALC_REQUIRE_PROBLEM(breaker_max_zs_ohms(BreakerCurve::b, 32, 0.4, infinity), "u0_volts", "finite");
    CALC_REQUIRE_PROBLEM(breaker_max_zs_ohms(BreakerCurve::b, 32, 0.4, 230, 0.0), "cmin", "> 0");
    CALC_REQUIRE_PROBLEM(breaker_max_zs_ohms(BreakerCurve::b, 32, 0.4, 230, 1.1), "cmin", "<= 1");
}

TEST_CASE("calc errors: measured_zs_limit_ohms rejects a maximum that is not positive") {
    CALC_REQUIRE_PROBLEM(measured_zs_limit_ohms(0.0), "max_zs_ohms", "> 0");
    CALC_REQUIRE_PROBLEM(measured_zs_limit_ohms(-1.0), "max_zs_ohms", "> 0");
    CALC_REQUIRE_PROBLEM(measured_zs_limit_ohms(nan_value), "max_zs_ohms", "finite");
}
