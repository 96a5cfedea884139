// Standing protective-conductor current accumulated on one RCD: the sum of the recorded
// standing leakage of every final circuit below it against the profile's fraction (30 %) of its
// IΔn (BS 7671 531.3.2, read), beyond which the device may trip without a fault.
#include <algorithm>
#include <map>

#include "planner/rules/checks/checks.hpp"
#include "planner/rules/checks/common.hpp"
#include "planner/rules/text.hpp"

namespace mendwright::rules::checks {

namespace {

struct Load {
    const model::DeviceRef* ref = nullptr;
    double leakage_ma = 0.0;
    std::vector<std::string> terms;  // "c1 4 mA"
    std::size_t order = 0;
};

}  // namespace

std::vector<Finding> rcd_standing_leakage(const AssessContext& context) {
    std::vector<Finding> findings;
    const double fraction = context.profile().rcd.leakage_fraction;
    std::map<const model::Device*, Load> loads;
    for (const auto& entry : context.circuits()) {
        if (entry.is_submain() || !entry.circuit->standing_leakage_ma) continue;
        const double leakage_ma = *entry.circuit->standing_leakage_ma;
        for (const auto& ref : entry.residual_current_devices) {
            if (!ref.device->residual_current_amps) continue;
            auto [it, inserted] = loads.try_emplace(ref.device);
            if (inserted) {
                it->second.ref = &ref;
                it->second.order = loads.size();
            }
            it->second.leakage_ma += leakage_ma;
            if (context.with_text())
                it->second.terms.push_back(AssessContext::circuit_text(*entry.circuit) + " " + number_text(leakage_ma) + " mA");
        }
    }
    std::vector<const Load*> ordered;
    for (const auto& [device, load] : loads) ordered.push_back(&load);
    std::sort(ordered.begin(), ordered.end(), [](const Load* a, const Load* b) { return a->order < b->order; });

    for (const Load* load : ordered) {
        const auto& device = *load->ref->device;
        const double idn_ma = *device.residual_current_amps * 1000.0;
        // BS 7671 531.3.2: accumulated protective-conductor current <= 30 % of IΔn.
        const double budget_ma = fraction * idn_ma;
        if (load->leakage_ma <= budget_ma * (1.0 + 1e-9)) continue;
        Finding finding = context.new_finding("rcd.standing_leakage", "over_budget", "device:" + device.id, load->ref->board,
                                              load->ref->circuit, &device);
        if (context.with_text()) {
            finding.title = "Standing leakage on the RCD over its budget: unwanted tripping likely";
            std::string sum;
            for (const auto& term : load->terms) sum += (sum.empty() ? "" : " + ") + term;
            finding.inputs = {number_input("standing leakage", load->leakage_ma, "mA"), number_input("IΔn", idn_ma, "mA"),
                              number_input("fraction allowed", fraction, "", 2)};
            finding.explanation = "Standing leakage " + sum + " = " + number_text(load->leakage_ma) + " mA > " +
                                  number_text(fraction * 100.0) + " % × " + number_text(idn_ma) + " mA = " +
                                  number_text(budget_ma) + " mA.";
        }
        findings.push_back(std::move(finding));
    }
    return findings;
}

}  // namespace mendwright::rules::checks
