#include "planner/rules/checks/common.hpp"

#include "planner/rules/text.hpp"

namespace mendwright::rules::checks {

const model::DeviceRef* fault_protection_rcd(const CircuitEntry& entry) {
    const model::DeviceRef* best = nullptr;
    for (const auto& ref : entry.residual_current_devices) {
        if (!ref.device->residual_current_amps) continue;
        if (!best || *ref.device->residual_current_amps < *best->device->residual_current_amps) best = &ref;
    }
    return best;
}

const model::DeviceRef* additional_protection_rcd(const AssessContext& context, const CircuitEntry& entry) {
    const double limit_amps = context.profile().rcd.additional_protection_max_idn_amps;
    for (const auto& ref : entry.residual_current_devices) {
        const auto& device = *ref.device;
        if (!device.residual_current_amps || device.delay != model::RcdDelay::general) continue;
        // A small tolerance so that 0.03 read from text compares equal to the 0.03 limit.
        if (*device.residual_current_amps <= limit_amps * (1.0 + 1e-9)) return &ref;
    }
    return nullptr;
}

calc::BreakerCurve calc_curve(model::BreakerCurve curve) {
    switch (curve) {
        case model::BreakerCurve::b: return calc::BreakerCurve::b;
        case model::BreakerCurve::c: return calc::BreakerCurve::c;
        case model::BreakerCurve::d: return calc::BreakerCurve::d;
    }
    return calc::BreakerCurve::d;
}

calc::RcdType calc_rcd_type(model::RcdDelay delay) {
    return delay == model::RcdDelay::time_delayed ? calc::RcdType::time_delayed : calc::RcdType::general;
}

bool has_breaker_curve(const model::Device& device) {
    return (device.kind == model::DeviceKind::circuit_breaker || device.kind == model::DeviceKind::rcbo) &&
           device.curve.has_value();
}

std::string device_rating_text(const model::Device& device) {
    const std::string amps = number_text(device.rating_amps);
    std::string curve;
    if (device.curve) {
        switch (*device.curve) {
            case model::BreakerCurve::b: curve = "B"; break;
            case model::BreakerCurve::c: curve = "C"; break;
            case model::BreakerCurve::d: curve = "D"; break;
        }
    }
    switch (device.kind) {
        case model::DeviceKind::circuit_breaker: return curve.empty() ? "circuit-breaker " + amps + " A" : curve + amps;
        case model::DeviceKind::rcbo: return "RCBO " + (curve.empty() ? amps + " A" : curve + amps);
        case model::DeviceKind::fuse:
        case model::DeviceKind::switch_fuse:
            return (device.fuse_standard.empty() ? std::string() : device.fuse_standard + " ") + "fuse " + amps + " A";
        case model::DeviceKind::rcd: return "RCD " + amps + " A";
        case model::DeviceKind::main_switch: return "main switch " + amps + " A";
    }
    return amps + " A";
}

}  // namespace mendwright::rules::checks
