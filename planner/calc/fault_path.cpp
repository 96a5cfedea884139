#include "planner/calc/fault_path.hpp"

#include <string>

#include "planner/core/checks.hpp"

namespace mendwright::calc {

Result<FaultPath> series_fault_path(double supply_volts, const std::vector<double>& resistances_ohms,
                                    std::optional<std::size_t> touch_index) {
    if (auto p = require_positive("supply_volts", supply_volts)) return *p;
    if (resistances_ohms.empty()) return problem("resistances_ohms", "expected at least one resistance, got none");
    double total_ohms = 0.0;
    for (std::size_t i = 0; i < resistances_ohms.size(); ++i) {
        const std::string field = "resistances_ohms[" + std::to_string(i) + "]";
        if (auto p = require_non_negative(field, resistances_ohms[i])) return *p;
        total_ohms += resistances_ohms[i];
    }
    if (total_ohms <= 0.0)
        return problem("resistances_ohms", "expected a total resistance > 0 (a dead short has no finite current)");
    const std::size_t touch = touch_index.value_or(resistances_ohms.size() - 1);
    if (touch >= resistances_ohms.size())
        return problem("touch_index", "expected an element index from 0 to " + std::to_string(resistances_ohms.size() - 1) +
                                          ", got " + std::to_string(touch));

    FaultPath path;
    path.total_ohms = total_ohms;
    // Ohm's law: I = U / sum(R).
    path.current_amps = supply_volts / total_ohms;
    // Voltage divider: each element takes I x R; node potentials fall from U to 0 along the chain.
    path.node_potentials_volts.push_back(supply_volts);
    double behind_ohms = 0.0;
    for (double ohms : resistances_ohms) {
        path.elements.push_back({ohms, path.current_amps * ohms});
        behind_ohms += ohms;
        // U x (remaining resistance / total) keeps the last node at exactly 0 V.
        path.node_potentials_volts.push_back(supply_volts * (total_ohms - behind_ohms) / total_ohms);
    }
    path.node_potentials_volts.back() = 0.0;
    path.touch_index = touch;
    path.touch_volts = path.elements[touch].volts;
    return path;
}

}  // namespace mendwright::calc
