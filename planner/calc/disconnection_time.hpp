#pragma once
// Maximum disconnection times for fault protection by automatic disconnection (BS 7671:2018+A2,
// 411.3.2.2-411.3.2.4 and Table 41.1).

#include "planner/core/result.hpp"

namespace mendwright::calc {

// TN covers TN-S and TN-C-S.
enum class EarthingSystem { tn, tt };

// What Table 41.1 distinguishes: final circuits of up to 63 A with socket-outlets or up to 32 A
// supplying only fixed equipment (411.3.2.2), against distribution circuits and larger final
// circuits (411.3.2.3 / 411.3.2.4).
enum class CircuitDuty { small_final, distribution_or_large_final };

// Which duty a circuit has.
// - rating_amps: the rated current of its protective device, > 0.
// - serves_socket_outlets: one or more socket-outlets on it.
Result<CircuitDuty> circuit_duty(bool is_distribution_circuit, bool serves_socket_outlets, double rating_amps);

// Table 41.1 for 120 V < U0 <= 230 V (read): small final circuits TN 0.4 s, TT 0.2 s;
// distribution and larger final circuits TN 5 s, TT 1 s. Other U0 bands are not held: a U0
// outside this band is refused with a Problem on "u0_volts".
Result<double> required_disconnection_time_s(EarthingSystem system, CircuitDuty duty, double u0_volts);

}  // namespace mendwright::calc
