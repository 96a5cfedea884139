#pragma once
// What every rule reads: the installation, the profile, and the device tree walked once per
// assessment (each circuit's chain of devices above it), so that a rule never walks the tree
// itself and assess stays linear in the size of the installation.

#include <optional>
#include <span>
#include <string>
#include <string_view>
#include <vector>

#include "planner/model/installation.hpp"
#include "planner/model/navigation.hpp"
#include "planner/rules/finding.hpp"
#include "planner/rules/profile.hpp"

namespace mendwright::rules {

// One circuit of the installation (final or submain) with the devices a fault on it passes
// through, nearest first (the same order as model::devices_above).
struct CircuitEntry {
    const model::Board* board = nullptr;
    const model::Circuit* circuit = nullptr;
    std::size_t board_index = 0;    // position in installation.boards
    std::size_t circuit_index = 0;  // position in board.circuits
    // Both point into the context's own storage (one list for all circuits, not two per circuit)
    // and live as long as the context.
    std::span<const model::DeviceRef> chain;
    std::span<const model::DeviceRef> residual_current_devices;  // RCDs and RCBOs of `chain`, nearest first

    [[nodiscard]] bool is_submain() const { return circuit->feeds_board_id.has_value(); }
};

class AssessContext {
public:
    AssessContext(const model::Installation& installation, const RulesProfile& profile,
                  FindingDetail detail = FindingDetail::full);
    AssessContext(const AssessContext&) = delete;  // the entries point into refs_
    AssessContext& operator=(const AssessContext&) = delete;

    [[nodiscard]] const model::Installation& installation() const { return installation_; }
    [[nodiscard]] const RulesProfile& profile() const { return profile_; }

    // Every circuit, board by board in document order.
    [[nodiscard]] const std::vector<CircuitEntry>& circuits() const { return circuits_; }

    // Whether rules fill in the words of a finding (title, location, clause, inputs,
    // explanation); false when only the verdict is wanted (FindingDetail::verdict). Rules
    // decide whether there is a finding, and its id and code, the same way either way.
    [[nodiscard]] bool with_text() const { return detail_ == FindingDetail::full; }

    [[nodiscard]] bool is_tt() const;
    [[nodiscard]] bool is_dwelling() const;

    // RA as it now stands: the re-measured figure where remedial work was re-tested, else the
    // survey's measured figure; with the date it was taken.
    [[nodiscard]] std::optional<double> earth_resistance_ohms() const;
    [[nodiscard]] std::optional<Date> earth_resistance_measured_on() const;

    // Readable place names for findings.
    [[nodiscard]] static std::string board_text(const model::Board& board);
    [[nodiscard]] static std::string circuit_text(const model::Circuit& circuit);
    [[nodiscard]] static std::string device_text(const model::Device& device);

    // Table 41.1 (held in planner/calc): the disconnection time a circuit needs; nullopt when
    // the supply's U0 lies outside the band calc holds.
    [[nodiscard]] std::optional<double> required_disconnection_time_s(const CircuitEntry& entry) const;

    // A finding of `rule_id` / `case_name` with id "<rule>@<location_key>", its code and clause
    // from the profile, and its place filled in from whichever of board/circuit/device is given
    // (clause and readable place only with_text()).
    [[nodiscard]] Finding new_finding(std::string_view rule_id, std::string_view case_name, const std::string& location_key,
                                      const model::Board* board, const model::Circuit* circuit,
                                      const model::Device* device) const;

private:
    const model::Installation& installation_;
    const RulesProfile& profile_;
    FindingDetail detail_;
    std::vector<CircuitEntry> circuits_;
    std::vector<model::DeviceRef> refs_;  // every entry's chain, then its residual current devices
};

}  // namespace mendwright::rules
