// RCD trip times measured at the circuits against the maximum break times for the device's type
// (BS EN 61008-1 / 61009-1, held in planner/calc/rcd.hpp: general 300 ms at IΔn, 40 ms at 5 IΔn; S-type 500 / 150 ms;
// 40 ms at 5 IΔn is also what 415.1.1 asks of additional protection). The device tested from a
// circuit is the nearest RCD or RCBO above it; one finding per device, giving the slowest times.
#include <algorithm>
#include <map>

#include "planner/calc/rcd.hpp"
#include "planner/rules/checks/checks.hpp"
#include "planner/rules/checks/common.hpp"
#include "planner/rules/text.hpp"

namespace mendwright::rules::checks {

namespace {

struct Slowest {
    const model::DeviceRef* ref = nullptr;
    std::size_t order = 0;
    std::optional<double> at_idn_ms;
    std::optional<double> at_5idn_ms;
};

void keep_slowest(std::optional<double>& slowest, const std::optional<double>& measured) {
    if (measured && (!slowest || *measured > *slowest)) slowest = measured;
}

}  // namespace

std::vector<Finding> rcd_trip_time(const AssessContext& context) {
    std::vector<Finding> findings;
    std::map<const model::Device*, Slowest> tested;
    for (const auto& entry : context.circuits()) {
        const auto& circuit = *entry.circuit;
        if (!circuit.rcd_trip_ms_at_idn && !circuit.rcd_trip_ms_at_5idn) continue;
        if (entry.residual_current_devices.empty()) continue;
        const auto& ref = entry.residual_current_devices.front();
        auto [it, inserted] = tested.try_emplace(ref.device);
        if (inserted) {
            it->second.ref = &ref;
            it->second.order = tested.size();
        }
        keep_slowest(it->second.at_idn_ms, circuit.rcd_trip_ms_at_idn);
        keep_slowest(it->second.at_5idn_ms, circuit.rcd_trip_ms_at_5idn);
    }
    std::vector<const Slowest*> ordered;
    for (const auto& [device, slowest] : tested) ordered.push_back(&slowest);
    std::sort(ordered.begin(), ordered.end(), [](const Slowest* a, const Slowest* b) { return a->order < b->order; });

    for (const Slowest* result : ordered) {
        const auto& device = *result->ref->device;
        const bool delayed = device.delay == model::RcdDelay::time_delayed;
        // BS EN 61008-1 / 61009-1 maximum break times at IΔn and 5 IΔn, held in planner/calc.
        const auto type = delayed ? calc::RcdType::time_delayed : calc::RcdType::general;
        const double max_at_idn_ms = calc::rcd_time_limits(type, 1.0)->max_break_s * 1000.0;
        const double max_at_5idn_ms = calc::rcd_time_limits(type, 5.0)->max_break_s * 1000.0;
        const bool slow_at_idn = result->at_idn_ms && *result->at_idn_ms > max_at_idn_ms;
        const bool slow_at_5idn = result->at_5idn_ms && *result->at_5idn_ms > max_at_5idn_ms;
        if (!slow_at_idn && !slow_at_5idn) continue;

        Finding finding = context.new_finding("rcd.trip_time", "too_slow", "device:" + device.id, result->ref->board,
                                              result->ref->circuit, &device);
        if (context.with_text()) {
            finding.title = std::string("RCD trips too slowly") + (delayed ? " for an S-type device" : "");
            if (result->at_idn_ms) finding.inputs.push_back(number_input("trip time at IΔn", *result->at_idn_ms, "ms"));
            if (result->at_5idn_ms) finding.inputs.push_back(number_input("trip time at 5 IΔn", *result->at_5idn_ms, "ms"));
            finding.inputs.push_back(text_input("type", delayed ? "S-type (time-delayed)" : "general"));
            std::vector<std::string> failures;
            if (slow_at_idn)
                failures.push_back("at IΔn " + number_text(*result->at_idn_ms) + " ms > " + number_text(max_at_idn_ms) + " ms");
            if (slow_at_5idn)
                failures.push_back("at 5 IΔn " + number_text(*result->at_5idn_ms) + " ms > " + number_text(max_at_5idn_ms) +
                                   " ms");
            std::string words;
            for (const auto& failure : failures) words += (words.empty() ? "" : "; ") + failure;
            finding.explanation = "Slowest trip measured " + words + " (maximum for a " +
                                  (delayed ? std::string("S-type") : std::string("general")) + " device).";
        }
        findings.push_back(std::move(finding));
    }
    return findings;
}

}  // namespace mendwright::rules::checks
