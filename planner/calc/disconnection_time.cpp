#include "planner/calc/disconnection_time.hpp"

#include "planner/core/checks.hpp"

namespace mendwright::calc {

Result<CircuitDuty> circuit_duty(bool is_distribution_circuit, bool serves_socket_outlets, double rating_amps) {
    if (auto p = require_positive("rating_amps", rating_amps)) return *p;
    if (is_distribution_circuit) return CircuitDuty::distribution_or_large_final;
    // BS 7671 411.3.2.2: <= 63 A with socket-outlets, <= 32 A supplying only fixed equipment.
    const double limit_amps = serves_socket_outlets ? 63.0 : 32.0;
    return rating_amps <= limit_amps ? CircuitDuty::small_final : CircuitDuty::distribution_or_large_final;
}

Result<double> required_disconnection_time_s(EarthingSystem system, CircuitDuty duty, double u0_volts) {
    if (auto p = require_positive("u0_volts", u0_volts)) return *p;
    if (u0_volts <= 120.0 || u0_volts > 230.0)
        return problem("u0_volts", "expected 120 V < U0 <= 230 V (the only band of Table 41.1 held), got " +
                                       number_text(u0_volts));
    // BS 7671 Table 41.1, 120 V < U0 <= 230 V (read); 411.3.2.3 (TN, 5 s) and 411.3.2.4 (TT, 1 s).
    if (duty == CircuitDuty::small_final) return system == EarthingSystem::tn ? 0.4 : 0.2;
    return system == EarthingSystem::tn ? 5.0 : 1.0;
}

}  // namespace mendwright::calc
