#include "planner/io/survey_checks.hpp"

#include <algorithm>
#include <cmath>
#include <map>
#include <set>
#include <string_view>
#include <unordered_map>

#include "planner/core/checks.hpp"
#include "planner/model/navigation.hpp"

namespace mendwright::io {

using namespace model;

namespace {

std::string q(const std::string& text) { return "\"" + text + "\""; }

std::string board_path(std::size_t b) { return index_path("boards", b); }
std::string board_device_path(std::size_t b, std::size_t d) { return index_path(board_path(b) + ".devices", d); }
std::string circuit_path(std::size_t b, std::size_t c) { return index_path(board_path(b) + ".circuits", c); }
std::string observation_path(std::size_t o) { return index_path("observations", o); }

// Where an id was given, as indices; its JSON path is written out only for an error.
struct IdPlace {
    enum class Kind { board, board_device, circuit, circuit_device, observation } kind = Kind::board;
    std::size_t first = 0, second = 0;

    [[nodiscard]] std::string path() const {
        switch (kind) {
            case Kind::board: return board_path(first) + ".id";
            case Kind::board_device: return board_device_path(first, second) + ".id";
            case Kind::circuit: return circuit_path(first, second) + ".id";
            case Kind::circuit_device: return circuit_path(first, second) + ".device.id";
            case Kind::observation: return observation_path(first) + ".id";
        }
        return "";
    }
};

// First place seen for each id; reports later ones as duplicates. Holds views of the ids, which
// live in the installation being checked.
class IdRegister {
public:
    IdRegister(std::string what, Diagnostics& d) : what_(std::move(what)), d_(d) {}
    void add(const std::string& id, const IdPlace& place) {
        if (id.empty()) return;  // a missing id is already an error of its own
        auto [it, inserted] = first_.emplace(id, place);
        if (!inserted) d_.error(place.path(), "duplicate " + what_ + " id " + q(id) + " (first used at " + it->second.path() + ")");
    }

private:
    std::string what_;
    Diagnostics& d_;
    std::unordered_map<std::string_view, IdPlace> first_;
};

void check_ids(const Installation& inst, Diagnostics& d) {
    using Kind = IdPlace::Kind;
    IdRegister boards("board", d), devices("device", d), circuits("circuit", d), observations("observation", d);
    for (std::size_t b = 0; b < inst.boards.size(); ++b) {
        const Board& board = inst.boards[b];
        boards.add(board.id, {Kind::board, b, 0});
        for (std::size_t i = 0; i < board.devices.size(); ++i) devices.add(board.devices[i].id, {Kind::board_device, b, i});
        for (std::size_t c = 0; c < board.circuits.size(); ++c) {
            circuits.add(board.circuits[c].id, {Kind::circuit, b, c});
            devices.add(board.circuits[c].device.id, {Kind::circuit_device, b, c});
        }
    }
    for (std::size_t o = 0; o < inst.observations.size(); ++o) observations.add(inst.observations[o].id, {Kind::observation, o, 0});
}

// An upstream_id must name one of the board's own distribution devices.
void check_upstream_reference(const Installation& inst, const Board& board, const std::string& upstream,
                              const std::string& path, Diagnostics& d) {
    if (std::any_of(board.devices.begin(), board.devices.end(), [&](const Device& x) { return x.id == upstream; })) return;
    const DeviceRef elsewhere = find_device(inst, upstream);
    if (elsewhere.device && elsewhere.circuit)
        d.error(path, "refers to " + q(upstream) + ", the protective device of circuit " + q(elsewhere.circuit->id) +
                          "; expected the id of one of this board's devices");
    else if (elsewhere.device)
        d.error(path, "refers to " + q(upstream) + ", a device of board " + q(elsewhere.board->id) +
                          "; expected the id of one of this board's devices (a board below another is fed by a "
                          "circuit's feeds_board_id)");
    else
        d.error(path, "no device " + q(upstream) + " in this board; expected the id of one of this board's devices");
}

void check_device_tree(const Installation& inst, Diagnostics& d) {
    for (std::size_t b = 0; b < inst.boards.size(); ++b) {
        const Board& board = inst.boards[b];
        for (std::size_t i = 0; i < board.devices.size(); ++i) {
            const Device& device = board.devices[i];
            if (!device.upstream_id) continue;
            const std::string path = board_device_path(b, i) + ".upstream_id";
            if (*device.upstream_id == device.id) {
                d.error(path, "a device cannot be upstream of itself");
                continue;
            }
            check_upstream_reference(inst, board, *device.upstream_id, path, d);
        }
        // Loops among the board's devices: follow upstream_id from each; report a loop once,
        // at its first member in document order.
        std::set<std::string> reported;
        for (std::size_t i = 0; i < board.devices.size(); ++i) {
            std::vector<std::string> chain{board.devices[i].id};
            std::optional<std::string> next = board.devices[i].upstream_id;
            while (next && *next != board.devices[i].id && chain.size() <= board.devices.size()) {
                if (std::find(chain.begin(), chain.end(), *next) != chain.end()) { next.reset(); break; }
                chain.push_back(*next);
                const auto it = std::find_if(board.devices.begin(), board.devices.end(),
                                             [&](const Device& x) { return x.id == *next; });
                next = it == board.devices.end() ? std::nullopt : it->upstream_id;
            }
            if (!next || chain.size() < 2 || reported.count(board.devices[i].id)) continue;
            std::string text;
            for (const auto& id : chain) text += q(id) + " -> ";
            text += q(board.devices[i].id);
            reported.insert(chain.begin(), chain.end());
            d.error(board_device_path(b, i) + ".upstream_id", "the devices' upstream_id form a loop: " + text);
        }
        for (std::size_t c = 0; c < board.circuits.size(); ++c)
            if (board.circuits[c].upstream_id)
                check_upstream_reference(inst, board, *board.circuits[c].upstream_id, circuit_path(b, c) + ".upstream_id", d);
    }
}

void check_board_tree(const Installation& inst, Diagnostics& d) {
    // Which circuit feeds each board (by index), checking each feeds_board_id on the way.
    std::map<std::size_t, std::pair<std::size_t, std::size_t>> fed_by;  // board -> (board, circuit)
    for (std::size_t b = 0; b < inst.boards.size(); ++b) {
        for (std::size_t c = 0; c < inst.boards[b].circuits.size(); ++c) {
            const Circuit& circuit = inst.boards[b].circuits[c];
            const std::string path = circuit_path(b, c) + ".feeds_board_id";
            if (!circuit.feeds_board_id) {
                if (circuit.use == CircuitUse::submain)
                    d.warning(path, "missing: a submain that feeds no board of this survey; add the board it "
                                    "supplies if it can be surveyed");
                continue;
            }
            if (circuit.use != CircuitUse::submain && !d.has_error_at(circuit_path(b, c) + ".use"))
                d.error(circuit_path(b, c) + ".use",
                        "expected \"submain\" for a circuit that feeds a board, got " +
                            q(word_of(circuit_use_words(), circuit.use)));
            const auto target = std::find_if(inst.boards.begin(), inst.boards.end(),
                                             [&](const Board& x) { return x.id == *circuit.feeds_board_id; });
            if (target == inst.boards.end()) {
                d.error(path, "no board " + q(*circuit.feeds_board_id) + "; expected the id of a board in boards");
                continue;
            }
            const auto t = std::size_t(target - inst.boards.begin());
            if (t == b) {
                d.error(path, "a circuit cannot feed its own board " + q(inst.boards[b].id));
                continue;
            }
            if (auto it = fed_by.find(t); it != fed_by.end()) {
                d.error(path, "board " + q(target->id) + " is already fed by " +
                                  circuit_path(it->second.first, it->second.second) + "; a board has one supply");
                continue;
            }
            fed_by[t] = {b, c};
        }
    }
    // Loops: walk up from each board; a walk that comes back to a board already on it is a loop.
    std::set<std::size_t> in_reported_loop;
    for (std::size_t start = 0; start < inst.boards.size(); ++start) {
        std::vector<std::size_t> walk{start};
        for (auto it = fed_by.find(start); it != fed_by.end(); it = fed_by.find(walk.back())) {
            const std::size_t parent = it->second.first;
            const auto seen = std::find(walk.begin(), walk.end(), parent);
            if (seen != walk.end()) {
                if (parent == start && !in_reported_loop.count(start)) {
                    std::string text;
                    for (auto b = walk.rbegin(); b != walk.rend(); ++b) text += q(inst.boards[*b].id) + " -> ";
                    text += q(inst.boards[walk.back()].id);
                    const auto feeder = fed_by[start];
                    d.error(circuit_path(feeder.first, feeder.second) + ".feeds_board_id",
                            "the boards feed each other in a loop: " + text);
                    in_reported_loop.insert(walk.begin(), walk.end());
                }
                break;
            }
            walk.push_back(parent);
        }
    }
    std::vector<std::string> origins;
    for (std::size_t b = 0; b < inst.boards.size(); ++b)
        if (!fed_by.count(b)) origins.push_back(q(inst.boards[b].id));
    if (!inst.boards.empty() && origins.empty())
        d.error("boards", "no origin board: every board is fed by a circuit; expected exactly one board that the "
                          "meter tails land on");
    if (origins.size() > 1) {
        std::string list;
        for (std::size_t i = 0; i < origins.size(); ++i) list += (i ? ", " : "") + origins[i];
        d.error("boards", "more than one origin board (" + list +
                              "); expected exactly one board not fed by a circuit (every other board needs a "
                              "circuit whose feeds_board_id names it)");
    }
}

// What each kind of device must carry, and what it cannot.
void check_device_kind(const Device& device, const std::string& path, Diagnostics& d) {
    if (d.has_error_at(path + ".kind") || d.has_error_at(path)) return;  // kind unknown: nothing to check against
    const std::string kind = q(word_of(device_kind_words(), device.kind));
    const bool residual = device.kind == DeviceKind::rcd || device.kind == DeviceKind::rcbo;
    const bool curved = device.kind == DeviceKind::circuit_breaker || device.kind == DeviceKind::rcbo;
    // A field whose own value was refused is reported once, by the reader, not again as missing.
    const auto refused = [&](const char* field) { return d.has_error_at(path + "." + field); };
    if (curved && !device.curve && !refused("curve"))
        d.error(path + ".curve", "missing; a " + kind + " needs its curve (" + word_list(breaker_curve_words()) + ")");
    if (!curved && device.curve)
        d.error(path + ".curve", "only circuit-breakers and RCBOs have a curve; this device is a " + kind);
    if (residual && !device.residual_current_amps && !refused("residual_current_amps"))
        d.error(path + ".residual_current_amps",
                "missing; a " + kind + " needs its rated residual operating current IΔn in amperes (30 mA is 0.03)");
    if (!residual && device.residual_current_amps)
        d.error(path + ".residual_current_amps", "only RCDs and RCBOs have a residual operating current; this device is a " + kind);
    if (!residual && device.rcd_type)
        d.error(path + ".rcd_type", "only RCDs and RCBOs have an RCD type; this device is a " + kind);
    if (!residual && device.delay != RcdDelay::general)
        d.error(path + ".delay", "only RCDs and RCBOs can be time-delayed; this device is a " + kind);
    if (device.kind == DeviceKind::fuse && device.fuse_standard.empty() && !refused("fuse_standard"))
        d.error(path + ".fuse_standard", "missing; a fuse needs the standard it is made to (\"BS 3036\", \"BS 1361\", \"BS 88-3\"...)");
    if (device.kind != DeviceKind::fuse && device.kind != DeviceKind::switch_fuse && !device.fuse_standard.empty())
        d.error(path + ".fuse_standard", "only fuses and switch-fuses have a fuse standard; this device is a " + kind);
}

// IΔn values in common use (BS EN 61008-1 / 61009-1 preferred values; common practice).
bool usual_residual_current(double amps) {
    for (double usual : {0.01, 0.03, 0.1, 0.3, 0.5})
        if (std::fabs(amps - usual) < 1e-9) return true;
    return false;
}

void warn_device(const Device& device, const std::string& path, Diagnostics& d) {
    if (device.residual_current_amps && !usual_residual_current(*device.residual_current_amps))
        d.warning(path + ".residual_current_amps",
                  "IΔn " + number_text(*device.residual_current_amps * 1000.0) +
                      " mA is not one of the usual ratings (10, 30, 100, 300, 500 mA); check the marking");
}

void check_devices_and_circuits(const Installation& inst, Diagnostics& d) {
    for (std::size_t b = 0; b < inst.boards.size(); ++b) {
        const Board& board = inst.boards[b];
        for (std::size_t i = 0; i < board.devices.size(); ++i) {
            check_device_kind(board.devices[i], board_device_path(b, i), d);
            warn_device(board.devices[i], board_device_path(b, i), d);
        }
        for (std::size_t c = 0; c < board.circuits.size(); ++c) {
            const Circuit& circuit = board.circuits[c];
            const std::string path = circuit_path(b, c);
            const std::string device_path = path + ".device";
            check_device_kind(circuit.device, device_path, d);
            warn_device(circuit.device, device_path, d);
            const DeviceKind kind = circuit.device.kind;
            const bool kind_known = !d.has_error_at(device_path + ".kind") && !d.has_error_at(device_path);
            if (kind_known && !circuit.feeds_board_id && kind != DeviceKind::circuit_breaker && kind != DeviceKind::rcbo &&
                kind != DeviceKind::fuse)
                d.error(device_path + ".kind", "expected \"circuit_breaker\", \"rcbo\" or \"fuse\" for a final circuit's "
                                               "own device, got " + q(word_of(device_kind_words(), kind)));
            if (kind_known && circuit.feeds_board_id && kind == DeviceKind::main_switch)
                d.error(device_path + ".kind", "a main switch gives no protection; expected the device protecting the submain");

            const double rating = circuit.device.rating_amps;
            if (circuit.use == CircuitUse::lighting && rating > 16.0)
                d.warning(device_path + ".rating_amps", number_text(rating) + " A is unusual for a lighting circuit "
                                                        "(6 or 10 A are usual); check the rating");
            if (circuit.use == CircuitUse::sockets && rating > 32.0)
                d.warning(device_path + ".rating_amps", number_text(rating) + " A is unusual for a socket-outlet "
                                                        "circuit (32 A or less is usual); check the rating");
            if (rating > inst.supply.supply_fuse_rating_amps)
                d.warning(device_path + ".rating_amps", number_text(rating) + " A is above the supply fuse (" +
                                                        number_text(inst.supply.supply_fuse_rating_amps) + " A)");
            if (circuit.cpc_csa_mm2 > circuit.line_csa_mm2)
                d.warning(path + ".cpc_csa_mm2", "larger than the line conductor (" + number_text(circuit.line_csa_mm2) +
                                                 " mm²); check the two are not swapped");
            if (circuit.measured_zs_ohms && !circuit.r1_plus_r2_ohms)
                d.warning(path + ".r1_plus_r2_ohms", "missing while Zs is measured; without R1+R2 the Zs reading "
                                                     "cannot be cross-checked");
            if (circuit.measured_zs_ohms && circuit.r1_plus_r2_ohms && *circuit.r1_plus_r2_ohms > *circuit.measured_zs_ohms)
                d.warning(path + ".r1_plus_r2_ohms", "R1+R2 " + number_text(*circuit.r1_plus_r2_ohms) +
                                                     " ohms exceeds the measured Zs " + number_text(*circuit.measured_zs_ohms) +
                                                     " ohms, which includes it; one of them is mis-recorded");
            if (circuit.rcd_trip_ms_at_idn && circuit.rcd_trip_ms_at_5idn &&
                *circuit.rcd_trip_ms_at_5idn > *circuit.rcd_trip_ms_at_idn)
                d.warning(path + ".rcd_trip_ms_at_5idn", "slower than the test at IΔn; a test at 5 IΔn normally trips "
                                                         "faster; check the two are not swapped");
            if ((circuit.rcd_trip_ms_at_idn || circuit.rcd_trip_ms_at_5idn) &&
                residual_current_devices_above(inst, board, circuit).empty())
                d.warning(path + (circuit.rcd_trip_ms_at_idn ? ".rcd_trip_ms_at_idn" : ".rcd_trip_ms_at_5idn"),
                          "an RCD trip time is recorded but no RCD or RCBO protects this circuit in the survey");
        }
    }
}

void check_observations(const Installation& inst, Diagnostics& d) {
    for (std::size_t o = 0; o < inst.observations.size(); ++o) {
        const Observation& obs = inst.observations[o];
        const std::string path = observation_path(o);
        if (obs.board_id && !find_board(inst, *obs.board_id))
            d.error(path + ".board_id", "no board " + q(*obs.board_id) + "; expected the id of a board in boards");
        if (obs.circuit_id) {
            const CircuitRef ref = find_circuit(inst, *obs.circuit_id);
            if (!ref.circuit)
                d.error(path + ".circuit_id", "no circuit " + q(*obs.circuit_id) + "; expected the id of a circuit of a board");
            else if (obs.board_id && ref.board->id != *obs.board_id)
                d.error(path + ".circuit_id", "circuit " + q(*obs.circuit_id) + " is in board " + q(ref.board->id) +
                                                  ", not in " + q(*obs.board_id));
        }
    }
}

void check_supply_electrode_tails(const Installation& inst, Diagnostics& d) {
    const Supply& supply = inst.supply;
    if (supply.u0_volts < 200.0 || supply.u0_volts > 250.0)
        d.warning("supply.u0_volts", number_text(supply.u0_volts) + " V: the default rules profile is for U0 = 230 V; "
                                     "check the value and the profile");
    if (supply.phases == 1 && supply.supply_fuse_rating_amps > 100.0)
        d.warning("supply.supply_fuse_rating_amps", number_text(supply.supply_fuse_rating_amps) +
                                                        " A is unusual for a single-phase supply (100 A or less is usual)");
    if (supply.earthing == EarthingArrangement::tt && !inst.electrode)
        d.warning("electrode", "missing: a TT installation's fault protection rests on its earth electrode; record it");
    if (inst.electrode) {
        const Electrode& e = *inst.electrode;
        const bool layout_known = !d.has_error_at("electrode.layout") && !d.has_error_at("electrode.count");
        if (layout_known && e.layout == ElectrodeLayout::single && e.count != 1)
            d.error("electrode.count", "expected 1 for layout \"single\", got " + std::to_string(e.count));
        if (layout_known && e.layout != ElectrodeLayout::single && e.count < 2)
            d.error("electrode.count", "expected 2 or more for layout " + q(word_of(electrode_layout_words(), e.layout)) +
                                           ", got " + std::to_string(e.count));
        if (e.count > 1 && !e.spacing_m)
            d.warning("electrode.spacing_m", "missing: the spacing between rods is needed to estimate the group's resistance");
        // Table 41.5 note: a resistance above 200 ohms may not be stable (BS 7671:2018+A2; read).
        if (e.measured_ra_ohms && *e.measured_ra_ohms > 200.0)
            d.warning("electrode.measured_ra_ohms", number_text(*e.measured_ra_ohms) +
                                                        " ohms is over 200 ohms: possible, but may not be stable "
                                                        "(BS 7671 Table 41.5, note); check the reading");
        if (e.measured_ra_ohms && !e.measured_on)
            d.warning("electrode.measured_on", "missing: the month of the RA measurement matters (soil dries in summer)");
        if (e.measured_on && !e.measured_ra_ohms)
            d.warning("electrode.measured_ra_ohms", "missing while measured_on is given");
        if (e.remeasured_on && !e.remeasured_ra_ohms)
            d.warning("electrode.remeasured_ra_ohms", "missing while remeasured_on is given");
        if (e.remeasured_ra_ohms && !e.remeasured_on)
            d.warning("electrode.remeasured_on", "missing: the month of the re-measurement matters");
        if (e.remeasured_ra_ohms && *e.remeasured_ra_ohms > 200.0)
            d.warning("electrode.remeasured_ra_ohms", number_text(*e.remeasured_ra_ohms) +
                                                          " ohms is over 200 ohms: possible, but may not be stable "
                                                          "(BS 7671 Table 41.5, note); check the reading");
        if (e.measured_on && e.remeasured_on && *e.remeasured_on < *e.measured_on)
            d.warning("electrode.remeasured_on", "earlier than measured_on (" + e.measured_on->to_iso() + ")");
    }
    // Network operators commonly limit tails to about 3 m; 10 m is well past that (common practice).
    if (inst.tails.length_m > 10.0)
        d.warning("tails.length_m", number_text(inst.tails.length_m) + " m is over 10 m: possible (a meter box at the "
                                    "boundary), but check the length");
    if (inst.tails.csa_mm2 < 16.0)
        d.warning("tails.csa_mm2", number_text(inst.tails.csa_mm2) + " mm² is small for meter tails (25 mm² is usual)");
}

}  // namespace

void check_installation(const Installation& installation, Diagnostics& diagnostics) {
    check_supply_electrode_tails(installation, diagnostics);
    check_ids(installation, diagnostics);
    check_device_tree(installation, diagnostics);
    check_board_tree(installation, diagnostics);
    check_devices_and_circuits(installation, diagnostics);
    check_observations(installation, diagnostics);
}

}  // namespace mendwright::io
