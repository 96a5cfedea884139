#pragma once
// Small helpers several rules share.

#include <optional>
#include <string>

#include "planner/calc/circuit_breaker.hpp"
#include "planner/calc/rcd.hpp"
#include "planner/rules/context.hpp"

namespace mendwright::rules::checks {

// The RCD or RCBO above a circuit that gives the best fault protection in TT: the one with the
// smallest recorded IΔn (the largest RA it tolerates, 411.5.3). Null when none has an IΔn.
const model::DeviceRef* fault_protection_rcd(const CircuitEntry& entry);

// The nearest RCD or RCBO above a circuit with IΔn <= the profile's additional-protection limit
// and no intentional delay (415.1.1: 40 ms at 5 IΔn, which an S-type does not give). Null if none.
const model::DeviceRef* additional_protection_rcd(const AssessContext& context, const CircuitEntry& entry);

// The calc module's curve for a model curve.
calc::BreakerCurve calc_curve(model::BreakerCurve curve);
calc::RcdType calc_rcd_type(model::RcdDelay delay);

// "B32", "C16", "RCBO B32", "BS 3036 fuse 30 A".
std::string device_rating_text(const model::Device& device);

// Whether a device has an overcurrent part with an instantaneous tripping band (circuit-breaker
// or RCBO with a recorded curve).
bool has_breaker_curve(const model::Device& device);

}  // namespace mendwright::rules::checks
