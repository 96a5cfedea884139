// Reference values for BS 7671:2018+A2 Table 41.1, 120 V < U0 <= 230 V.
#include <catch2/catch.hpp>

#include "planner/calc/disconnection_time.hpp"

using mendwright::calc::CircuitDuty;
using mendwright::calc::EarthingSystem;
using mendwright::calc::required_disconnection_time_s;

TEST_CASE("calc reference: Table 41.1 times at 230 V - final circuits TN 0.4 s TT 0.2 s, others TN 5 s TT 1 s") {
    // BS 7671 Table 41.1 (read) and 411.3.2.3 / 411.3.2.4 (read).
    CHECK(*required_disconnection_time_s(EarthingSystem::tn, CircuitDuty::small_final, 230) == 0.4);
    CHECK(*required_disconnection_time_s(EarthingSystem::tt, CircuitDuty::small_final, 230) == 0.2);
    CHECK(*required_disconnection_time_s(EarthingSystem::tn, CircuitDuty::distribution_or_large_final, 230) == 5.0);
    CHECK(*required_disconnection_time_s(EarthingSystem::tt, CircuitDuty::distribution_or_large_final, 230) == 1.0);
}

TEST_CASE("calc reference: final circuits up to 63 A with sockets or 32 A fixed take Table 41.1's times (411.3.2.2)") {
    using mendwright::calc::circuit_duty;
    // BS 7671 411.3.2.2 (read): <= 63 A with socket-outlets, <= 32 A only fixed equipment.
    CHECK(*circuit_duty(false, true, 63) == CircuitDuty::small_final);
    CHECK(*circuit_duty(false, true, 80) == CircuitDuty::distribution_or_large_final);
    CHECK(*circuit_duty(false, false, 32) == CircuitDuty::small_final);
    CHECK(*circuit_duty(false, false, 40) == CircuitDuty::distribution_or_large_final);
    CHECK(*circuit_duty(true, true, 16) == CircuitDuty::distribution_or_large_final);
}

TEST_CASE("calc reference: U0 outside 120-230 V is refused rather than guessed (other Table 41.1 bands not held)") {
    auto low = required_disconnection_time_s(EarthingSystem::tn, CircuitDuty::small_final, 110);
    REQUIRE_FALSE(low.ok());
    CHECK(low.problem().field == "u0_volts");
    auto high = required_disconnection_time_s(EarthingSystem::tt, CircuitDuty::small_final, 400);
    REQUIRE_FALSE(high.ok());
    CHECK(high.problem().field == "u0_volts");
    // The band's edges: 120 V excluded, 230 V included (Table 41.1 heading, read).
    CHECK_FALSE(required_disconnection_time_s(EarthingSystem::tn, CircuitDuty::small_final, 120).ok());
    CHECK(required_disconnection_time_s(EarthingSystem::tn, CircuitDuty::small_final, 120.5).ok());
}
