// Kinds 2 and 3: a replacement board. "board-two-rcd": a metal board with two 30 mA RCDs, the
// circuits shared between them by split_between_two_rcds. "board-rcbo": a metal board with one
// RCBO per final circuit. Both are new work (Board::new_work), so the rules for new work apply
// to the changed copy; both carry a surge protective device; on a TT supply with no RCD above
// the board (the origin board), a 100 mA time-delayed RCD in its own enclosure at the meter comes
// with it, so that the tails and the part ahead of the first 30 mA device have fault protection
// and stay selective.
#include <algorithm>

#include "planner/model/navigation.hpp"
#include "planner/remedies/model_edits.hpp"
#include "planner/remedies/proposals.hpp"
#include "planner/remedies/two_rcd_split.hpp"

namespace mendwright::remedies {

namespace {

struct BoardSpec {
    std::string board_id;
    bool rcbo_per_circuit = false;
    bool time_delayed_incomer = false;
    std::vector<std::pair<std::string, int>> rcd_side;  // two-RCD board: circuit id -> 0 or 1
    double breaking_capacity_ka = 6.0;
    bool surge_protection = true;
    int ways = 10;
};

model::Device new_breaker(const std::string& id, const model::Device& old) {
    model::Device device;
    device.id = id;
    device.kind = model::DeviceKind::circuit_breaker;
    device.rating_amps = old.rating_amps;
    device.curve = old.curve.value_or(model::BreakerCurve::b);
    device.installed_new = true;
    device.label = old.label;
    return device;
}

void replace_board(model::Installation& installation, const BoardSpec& spec) {
    model::Board* board = edits::board(installation, spec.board_id);
    if (!board) return;
    // New ids are chosen before the old devices go, against the whole installation.
    std::vector<std::string> old_ids;
    for (const auto& d : board->devices) old_ids.push_back(d.id);
    const edits::IdsInUse in_use(installation);
    const std::string incomer_id = in_use.unused(spec.board_id + "-new-incomer");
    const std::string rcd_ids[2] = {in_use.unused(spec.board_id + "-new-rcd1"), in_use.unused(spec.board_id + "-new-rcd2")};
    std::vector<std::string> circuit_device_ids;
    for (const auto& circuit : board->circuits) circuit_device_ids.push_back(in_use.unused(spec.board_id + "-new-" + circuit.id));
    board = edits::board(installation, spec.board_id);

    model::Device incomer;
    incomer.id = incomer_id;
    incomer.kind = model::DeviceKind::main_switch;
    incomer.rating_amps = 100.0;
    incomer.installed_new = true;
    incomer.label = "Main switch";
    board->devices.clear();
    board->devices.push_back(incomer);
    if (!spec.rcbo_per_circuit) {
        for (int side = 0; side < 2; ++side) {
            model::Device rcd = edits::new_residual_device(rcd_ids[side], model::DeviceKind::rcd, 63.0, 0.03,
                                                           model::RcdDelay::general);
            rcd.upstream_id = incomer_id;
            rcd.label = "RCD " + std::to_string(side + 1);
            board->devices.push_back(rcd);
        }
    }
    for (std::size_t i = 0; i < board->circuits.size(); ++i) {
        model::Circuit& circuit = board->circuits[i];
        const model::Device old = circuit.device;
        edits::forget_device_tests(circuit);
        if (circuit.feeds_board_id) {  // a submain: straight from the incoming device
            circuit.device = new_breaker(circuit_device_ids[i], old);
            circuit.device.breaking_capacity_ka = spec.breaking_capacity_ka;
            circuit.upstream_id = incomer_id;
            continue;
        }
        if (spec.rcbo_per_circuit) {
            circuit.device = edits::new_residual_device(circuit_device_ids[i], model::DeviceKind::rcbo, old.rating_amps,
                                                        0.03, model::RcdDelay::general);
            circuit.device.curve = old.curve.value_or(model::BreakerCurve::b);
            circuit.device.label = old.label;
            circuit.upstream_id = incomer_id;
        } else {
            circuit.device = new_breaker(circuit_device_ids[i], old);
            int side = 0;
            for (const auto& [id, s] : spec.rcd_side)
                if (id == circuit.id) side = s;
            circuit.upstream_id = rcd_ids[side];
        }
        circuit.device.breaking_capacity_ka = spec.breaking_capacity_ka;
    }
    board->enclosure = model::EnclosureMaterial::metal;
    board->new_work = true;
    board->accepts_rcbos = true;
    board->surge_protection_fitted = spec.surge_protection;
    const int finals = static_cast<int>(std::count_if(board->circuits.begin(), board->circuits.end(),
                                                      [](const model::Circuit& c) { return !c.feeds_board_id; }));
    board->spare_ways = std::max(0, spec.ways - finals);
    // TT at the origin: the time-delayed 100 mA RCD goes in its own enclosure at the meter, so the
    // tails, the main switch and the busbar ahead of the 30 mA devices all have fault protection.
    if (spec.time_delayed_incomer) edits::insert_rcd_at_meter(installation, {spec.board_id, 0.1, model::RcdDelay::time_delayed, 1.0});
}

}  // namespace

std::vector<Option> propose_replacement_boards(const ProposalContext& context) {
    std::vector<Option> options;
    const auto& installation = context.installation;
    const bool tt = installation.supply.earthing == model::EarthingArrangement::tt;
    for (const auto& board : installation.boards) {
        // A board with no circuits of its own (an RCD enclosure) is not replaced as a board.
        int finals = 0;
        for (const auto& circuit : board.circuits) finals += circuit.feeds_board_id ? 0 : 1;
        if (finals == 0) continue;
        const model::CircuitRef feeder = model::feeding_circuit(installation, board);
        const bool rcd_above = feeder.circuit &&
            !model::residual_current_devices_above(installation, *feeder.board, *feeder.circuit).empty();
        const bool is_origin = !feeder.circuit;
        for (const char* kind : {"board-two-rcd", "board-rcbo"}) {
            const CatalogueEntry* entry = context.catalogue.find(kind);
            if (!entry) continue;
            auto targets = detail::targets_for(*entry, context.findings, {board.id});
            if (targets.empty()) continue;
            BoardSpec spec;
            spec.board_id = board.id;
            spec.rcbo_per_circuit = std::string(kind) == "board-rcbo";
            // Only the origin board needs its own time-delayed incomer: a board fed from another takes
            // its protection ahead of the first RCD from the board above (an S-type incomer here too
            // would sit in series with the one above and not be selective).
            spec.time_delayed_incomer = tt && is_origin && !rcd_above;
            spec.breaking_capacity_ka = entry->parameter("breaking_capacity_ka", 6.0);
            spec.surge_protection = entry->parameter("surge_protection", 1.0) > 0.5;
            spec.ways = static_cast<int>(entry->parameter("ways", 10.0));
            std::map<std::string, std::string> words = {{"board", detail::board_name(board)},
                                                        {"circuits", std::to_string(finals)}};
            std::vector<std::string> split_notes;
            if (!spec.rcbo_per_circuit) {
                std::vector<SplitCircuit> split_input;
                int assumed = 0;
                for (const auto& circuit : board.circuits) {
                    if (circuit.feeds_board_id) continue;
                    SplitCircuit c{circuit.id, circuit_area(circuit.description), circuit.use,
                                   circuit.standing_leakage_ma.value_or(context.settings.assumed_leakage_ma_per_circuit),
                                   circuit.standing_leakage_ma.has_value()};
                    if (!c.leakage_measured) ++assumed;
                    split_input.push_back(c);
                }
                const double budget_ma = context.settings.leakage_fraction * 30.0;
                const TwoRcdSplit split = split_between_two_rcds(split_input, budget_ma);
                for (std::size_t i = 0; i < split_input.size(); ++i)
                    spec.rcd_side.emplace_back(split_input[i].circuit_id, split.side[i]);
                std::string rcd1, rcd2;
                for (std::size_t i = 0; i < split_input.size(); ++i) {
                    const model::Circuit* circuit = nullptr;
                    for (const auto& c : board.circuits)
                        if (c.id == split_input[i].circuit_id) circuit = &c;
                    const std::string name = circuit->number.empty() ? circuit->id : circuit->number;
                    std::string& list = split.side[i] == 0 ? rcd1 : rcd2;
                    list += (list.empty() ? "" : ", ") + name;
                }
                split_notes.push_back("RCD 1: circuits " + (rcd1.empty() ? std::string("none") : rcd1) + " (" +
                                      detail::number_text(split.leakage_ma[0], 1) + " mA standing); RCD 2: circuits " +
                                      (rcd2.empty() ? std::string("none") : rcd2) + " (" +
                                      detail::number_text(split.leakage_ma[1], 1) + " mA standing); budget " +
                                      detail::number_text(budget_ma, 1) + " mA each (BS 7671 531.3.2).");
                if (assumed > 0)
                    split_notes.push_back(std::to_string(assumed) + " circuit(s) without a leakage measurement taken as " +
                                          detail::number_text(context.settings.assumed_leakage_ma_per_circuit, 1) +
                                          " mA each (assumption).");
                if (!split.within_budget)
                    split_notes.push_back("Standing leakage over the budget of one RCD even in the best arrangement: "
                                          "find and reduce the leakage, or choose a device per circuit.");
            }
            const int extra_ways = std::max(0, finals - spec.ways);
            Option option = detail::from_entry(*entry, std::string(kind) + "@board:" + board.id, words,
                                               {{"circuit", finals}, {"way", extra_ways}}, finals);
            for (auto& note : split_notes) option.assumptions.push_back(note);
            if (tt && !is_origin && !rcd_above)
                option.leaves_open.push_back("The cable feeding this board and its incoming side have no RCD above them on "
                                             "this TT supply: that is for the board above to give.");
            if (spec.time_delayed_incomer) {
                option.bill.push_back({"RCD-S100-ENCL", 1.0, "time-delayed 100 mA RCD at the meter, ahead of the board (TT)"});
                option.bill.push_back({"TAILS-25-M", 1.0, "new tails, meter to RCD enclosure"});
                option.assumptions.push_back("On this TT supply a time-delayed 100 mA RCD in its own enclosure beside the meter "
                                             "protects the tails and the board ahead of its 30 mA devices; the old tails run "
                                             "becomes the cable from it to the board.");
                option.whole_installation = true;
            }
            option.targets = std::move(targets);
            option.slots = {"board:" + board.id};
            if (is_origin) option.slots.push_back("origin");
            if (spec.time_delayed_incomer) option.slots.push_back("tails");
            option.touched_boards = {board.id};
            option.apply = [spec](model::Installation& copy) { replace_board(copy, spec); };
            options.push_back(std::move(option));
        }
    }
    return options;
}

}  // namespace mendwright::remedies
