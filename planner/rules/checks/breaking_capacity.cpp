// A protective device's breaking capacity must not be below the prospective fault current at
// its point (BS 7671:2018+A2 434.5.1). In a dwelling's consumer unit supplied through a fuse of
// up to 100 A to BS 1361 / BS 88-3, the assembly's conditional short-circuit rating of 16 kA
// (BS EN 61439-3 Annex ZB, read) stands in for the devices' own ratings; the profile holds the
// rating, the fuse limit and the fuse standards. The origin's prospective fault current is used
// for every board, which is the safe side for boards further out.
#include <algorithm>
#include <cctype>

#include "planner/rules/checks/checks.hpp"
#include "planner/rules/checks/common.hpp"
#include "planner/rules/text.hpp"

namespace mendwright::rules::checks {

namespace {

std::string folded(const std::string& text) {
    std::string out;
    for (char ch : text)
        if (!std::isspace(static_cast<unsigned char>(ch))) out += char(std::tolower(static_cast<unsigned char>(ch)));
    return out;
}

bool interrupts_fault_current(const model::Device& device) {
    switch (device.kind) {
        case model::DeviceKind::circuit_breaker:
        case model::DeviceKind::rcbo:
        case model::DeviceKind::fuse:
        case model::DeviceKind::switch_fuse: return true;
        case model::DeviceKind::main_switch:
        case model::DeviceKind::rcd: return false;
    }
    return false;
}

}  // namespace

std::vector<Finding> breaking_capacity(const AssessContext& context) {
    std::vector<Finding> findings;
    const auto& supply = context.installation().supply;
    if (!supply.prospective_fault_current_ka) return findings;
    const double pfc_ka = *supply.prospective_fault_current_ka;
    const auto& limits = context.profile().breaking_capacity;

    const bool fuse_standard_listed =
        std::any_of(limits.supply_fuse_standards.begin(), limits.supply_fuse_standards.end(),
                    [&](const std::string& standard) { return folded(standard) == folded(supply.supply_fuse_type); });
    const bool conditional = context.is_dwelling() && fuse_standard_listed &&
                             supply.supply_fuse_rating_amps <= limits.supply_fuse_max_amps;
    std::string conditional_words;
    if (conditional) {
        conditional_words = "the " + number_text(limits.conditional_rating_ka) +
                            " kA conditional rating of a consumer unit (BS EN 61439-3 Annex ZB) applies";
    } else {
        std::string why;
        if (!context.is_dwelling()) why = "not a dwelling";
        if (!fuse_standard_listed)
            why += (why.empty() ? "" : "; ") + std::string("supply fuse \"") + supply.supply_fuse_type +
                   "\" is not one of the standards it needs";
        if (supply.supply_fuse_rating_amps > limits.supply_fuse_max_amps)
            why += (why.empty() ? "" : "; ") + std::string("supply fuse ") + number_text(supply.supply_fuse_rating_amps) +
                   " A > " + number_text(limits.supply_fuse_max_amps) + " A";
        conditional_words = "the " + number_text(limits.conditional_rating_ka) +
                            " kA conditional rating (BS EN 61439-3 Annex ZB) does not apply: " + why;
    }

    auto check = [&](const model::Board& board, const model::Circuit* circuit, const model::Device& device) {
        if (!interrupts_fault_current(device) || !device.breaking_capacity_ka) return;
        const double own_ka = *device.breaking_capacity_ka;
        const double effective_ka = conditional ? std::max(own_ka, limits.conditional_rating_ka) : own_ka;
        if (pfc_ka <= effective_ka) return;
        Finding finding = context.new_finding("device.breaking_capacity", "below_fault_current", "device:" + device.id, &board,
                                              circuit, &device);
        if (context.with_text()) {
            finding.title = "Breaking capacity below the prospective fault current";
            finding.inputs = {text_input("device", device_rating_text(device)), number_input("breaking capacity", own_ka, "kA"),
                              number_input("prospective fault current", pfc_ka, "kA"),
                              text_input("supply fuse", supply.supply_fuse_type + " " + number_text(supply.supply_fuse_rating_amps) + " A")};
            finding.explanation = "Breaking capacity " + number_text(effective_ka) + " kA < prospective fault current " +
                                  number_text(pfc_ka) + " kA; " + conditional_words + ".";
        }
        findings.push_back(std::move(finding));
    };
    for (const auto& board : context.installation().boards) {
        for (const auto& device : board.devices) check(board, nullptr, device);
        for (const auto& circuit : board.circuits) check(board, &circuit, circuit.device);
    }
    return findings;
}

}  // namespace mendwright::rules::checks
