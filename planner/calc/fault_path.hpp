#pragma once
// An earth fault as a series circuit: the supply voltage drives one current through an ordered
// chain of resistances (Ohm's law), and each element takes its share of the voltage (voltage
// divider). Used for TT faults (line, fault, protective conductor, installation electrode, soil,
// supply electrode) and for touch voltage on exposed metalwork.

#include <cstddef>
#include <optional>
#include <vector>

#include "planner/core/result.hpp"

namespace mendwright::calc {

struct FaultPathElement {
    double resistance_ohms;
    double volts;  // across this element: I x R
};

struct FaultPath {
    double total_ohms;
    double current_amps;                        // U / sum(R)
    std::vector<FaultPathElement> elements;     // in the order given
    std::vector<double> node_potentials_volts;  // n + 1 nodes: node 0 is the supply terminal (U),
                                                // node n the return end (0 V); node i sits between
                                                // element i - 1 and element i
    std::size_t touch_index;                    // the element taken as metalwork-to-true-earth
    double touch_volts;                         // voltage across that element
};

// - supply_volts: U, the open-circuit voltage driving the fault (U0), > 0.
// - resistances_ohms: the chain in order, each >= 0, at least one, total > 0.
// - touch_index: the element between the exposed metalwork and true earth, usually the
//   installation's electrode-to-earth resistance RA; the last element when not given. Touch
//   voltage = I x R[touch_index] (Ohm's law).
Result<FaultPath> series_fault_path(double supply_volts, const std::vector<double>& resistances_ohms,
                                    std::optional<std::size_t> touch_index = std::nullopt);

}  // namespace mendwright::calc
