#include "app/desktop/survey_edits.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <exception>
#include <optional>
#include <string>

#include "app/desktop/survey_fields.hpp"
#include "planner/io/survey_enums.hpp"
#include "planner/model/navigation.hpp"

namespace mendwright::desktop {

namespace {

std::string trimmed(std::string_view text) {
    while (!text.empty() && text.front() == ' ') text.remove_prefix(1);
    while (!text.empty() && text.back() == ' ') text.remove_suffix(1);
    return std::string(text);
}

template <class T>
std::string assign(T& slot, T value) {
    if (slot == value) return std::string(unchanged);
    slot = std::move(value);
    return {};
}

// An optional number from typed text, within the field's range; empty text clears it.
std::string set_optional(std::optional<double>& slot, std::string_view key, std::string_view text) {
    const SurveyField* spec = survey_field(key);
    if (!spec) return "no such field: " + std::string(key);
    std::string error;
    const auto entry = read_field(*spec, text, error);
    if (!error.empty()) return error;
    return assign(slot, entry ? std::optional<double>(to_model(*spec, *entry)) : std::nullopt);
}

// A number the survey must hold: empty text is refused.
template <class Number>
std::string set_required(Number& slot, std::string_view key, std::string_view text) {
    const SurveyField* spec = survey_field(key);
    if (!spec) return "no such field: " + std::string(key);
    std::string error;
    const auto entry = read_field(*spec, text, error);
    if (!error.empty()) return error;
    if (!entry) return std::string(spec->label) + ": a value is required (" + range_text(*spec) + ")";
    return assign(slot, static_cast<Number>(to_model(*spec, *entry)));
}

template <class Enum>
std::string set_word(Enum& slot, const io::WordTable<Enum>& table, std::string_view label, std::string_view text) {
    const auto value = io::enum_of(table, trimmed(text));
    if (!value) return std::string(label) + ": expected " + io::word_list(table) + ", got \"" + std::string(text) + "\"";
    return assign(slot, *value);
}

template <class Enum>
std::string set_optional_word(std::optional<Enum>& slot, const io::WordTable<Enum>& table, std::string_view label,
                              std::string_view text) {
    if (trimmed(text).empty()) return assign(slot, std::optional<Enum>());
    Enum value{};
    if (auto refused = set_word(value, table, label, text); !refused.empty() && refused != unchanged) return refused;
    return assign(slot, std::optional<Enum>(value));
}

std::string set_flag(bool& slot, std::string_view label, std::string_view text) {
    const std::string word = trimmed(text);
    if (word != "true" && word != "false")
        return std::string(label) + ": expected true or false, got \"" + std::string(text) + "\"";
    return assign(slot, word == "true");
}

std::string set_date(std::optional<Date>& slot, std::string_view label, std::string_view text) {
    const std::string word = trimmed(text);
    if (word.empty()) return assign(slot, std::optional<Date>());
    auto parsed = parse_iso_date(word, std::string(label));
    if (!parsed) return parsed.problem().to_string() + " (a date like 2026-03-14)";
    return assign(slot, std::optional<Date>(*parsed));
}

std::string set_id_ref(std::optional<std::string>& slot, std::string_view text) {
    const std::string id = trimmed(text);
    return assign(slot, id.empty() ? std::optional<std::string>() : std::optional<std::string>(id));
}

bool id_taken(const model::Installation& installation, const std::string& id) {
    for (const auto& board : installation.boards) {
        if (board.id == id) return true;
        for (const auto& device : board.devices)
            if (device.id == id) return true;
        for (const auto& circuit : board.circuits)
            if (circuit.id == id || circuit.device.id == id) return true;
    }
    return false;
}

// "rcd1", "rcd2", ...: the first id of that stem free across boards, devices and circuits.
std::string fresh_id(const model::Installation& installation, const std::string& stem) {
    for (int n = 1;; ++n)
        if (std::string id = stem + std::to_string(n); !id_taken(installation, id)) return id;
}

model::Board* board_of(model::Installation& installation, std::string_view board_id) {
    for (auto& board : installation.boards)
        if (board.id == board_id) return &board;
    return nullptr;
}

std::string edit_device(model::Device& device, std::string_view field, std::string_view text) {
    if (field == "kind") {
        auto refused = set_word(device.kind, io::device_kind_words(), "device kind", text);
        if (refused.empty()) fit_device_to_kind(device);
        return refused;
    }
    if (field == "rating") return set_required(device.rating_amps, "rating", text);
    if (field == "curve") return set_optional_word(device.curve, io::breaker_curve_words(), "curve", text);
    if (field == "breakingCapacity") return set_optional(device.breaking_capacity_ka, "breakingCapacity", text);
    if (field == "idn") {
        // An RCD or RCBO must carry its IΔn: refused here in the unit typed (mA), not by the
        // reader in amperes.
        if (!model::is_residual_current_device(device)) return set_optional(device.residual_current_amps, "idn", text);
        double amps = device.residual_current_amps.value_or(0.0);
        auto refused = set_required(amps, "idn", text);
        if (refused.empty()) device.residual_current_amps = amps;
        return refused;
    }
    if (field == "rcdType") return set_optional_word(device.rcd_type, io::rcd_type_words(), "RCD type", text);
    if (field == "delay") return set_word(device.delay, io::rcd_delay_words(), "RCD delay", text);
    if (field == "fuseStandard") return assign(device.fuse_standard, trimmed(text));
    if (field == "label") return assign(device.label, trimmed(text));
    if (field == "upstream") return set_id_ref(device.upstream_id, text);
    return "no such device field: " + std::string(field);
}

std::string edit_circuit(model::Circuit& circuit, std::string_view field, std::string_view text) {
    if (field == "number") {
        const std::string number = trimmed(text);
        if (number.empty()) return "circuit number: expected the number on the circuit chart, like 1 or L2/4";
        return assign(circuit.number, number);
    }
    if (field == "description") return assign(circuit.description, trimmed(text));
    if (field == "use") return set_word(circuit.use, io::circuit_use_words(), "circuit use", text);
    if (field == "lineCsa") return set_required(circuit.line_csa_mm2, "lineCsa", text);
    if (field == "cpcCsa") return set_required(circuit.cpc_csa_mm2, "cpcCsa", text);
    if (field == "length") return set_optional(circuit.length_m, "length", text);
    if (field == "concealed") return set_flag(circuit.concealed_in_wall, "concealed in wall", text);
    if (field == "outdoor") return set_flag(circuit.supplies_outdoor_equipment, "supplies outdoor equipment", text);
    if (field == "upstream") return set_id_ref(circuit.upstream_id, text);
    if (field == "zs" || field == "r1r2" || field == "ir" || field == "leakage" || field == "tripIdn" ||
        field == "trip5Idn") {
        const SurveyField* spec = survey_field(field);
        std::string error;
        const auto value = read_field(*spec, text, error);
        if (!error.empty()) return error;
        if (circuit_value(circuit, field) == value) return std::string(unchanged);
        set_circuit_value(circuit, field, value);
        return {};
    }
    return edit_device(circuit.device, field, text);
}

std::string edit_supply(model::Supply& supply, std::string_view field, std::string_view text) {
    if (field == "earthing") return set_word(supply.earthing, io::earthing_words(), "earthing", text);
    if (field == "u0") return set_required(supply.u0_volts, "u0", text);
    if (field == "phases") {
        const std::string word = trimmed(text);
        if (word != "1" && word != "3") return "phases: expected 1 or 3, got \"" + std::string(text) + "\"";
        return assign(supply.phases, word == "1" ? 1 : 3);
    }
    if (field == "supplyFuseType") return assign(supply.supply_fuse_type, trimmed(text));
    if (field == "supplyFuse") return set_required(supply.supply_fuse_rating_amps, "supplyFuse", text);
    if (field == "pfc") return set_optional(supply.prospective_fault_current_ka, "pfc", text);
    if (field == "ze") return set_optional(supply.ze_ohms, "ze", text);
    return "no such supply field: " + std::string(field);
}

std::string edit_tails(model::MeterTails& tails, std::string_view field, std::string_view text) {
    if (field == "tailsLength") return set_required(tails.length_m, "tailsLength", text);
    if (field == "tailsCsa") return set_required(tails.csa_mm2, "tailsCsa", text);
    if (field == "tailsRoute") return set_word(tails.route, io::tails_route_words(), "tails route", text);
    if (field == "tailsProtected") return set_flag(tails.mechanically_protected, "tails mechanically protected", text);
    if (field == "tailsOrigin")
        return set_word(tails.origin_protection, io::tails_origin_protection_words(), "device at the meter", text);
    return "no such tails field: " + std::string(field);
}

std::string edit_electrode(model::Electrode& electrode, std::string_view field, std::string_view text,
                           const Date& today) {
    if (field == "electrodeKind") return set_word(electrode.kind, io::electrode_kind_words(), "electrode kind", text);
    // Count and layout go together (the reader refuses a single layout of 2 rods and a line of
    // 1): changing one fits the other.
    if (field == "rods") {
        auto refused = set_required(electrode.count, "rods", text);
        if (refused.empty() && electrode.count > 1 && electrode.layout == model::ElectrodeLayout::single)
            electrode.layout = model::ElectrodeLayout::line;
        if (refused.empty() && electrode.count == 1) electrode.layout = model::ElectrodeLayout::single;
        return refused;
    }
    if (field == "layout") {
        auto refused = set_word(electrode.layout, io::electrode_layout_words(), "rod layout", text);
        if (refused.empty() && electrode.layout == model::ElectrodeLayout::single) electrode.count = 1;
        if (refused.empty() && electrode.layout != model::ElectrodeLayout::single && electrode.count < 2)
            electrode.count = electrode.layout == model::ElectrodeLayout::hollow_square ? 4 : 2;
        return refused;
    }
    if (field == "rodLength") return set_optional(electrode.rod_length_m, "rodLength", text);
    if (field == "rodDiameter") return set_optional(electrode.rod_diameter_m, "rodDiameter", text);
    if (field == "spacing") return set_optional(electrode.spacing_m, "spacing", text);
    if (field == "soil") return assign(electrode.soil_description, trimmed(text));
    if (field == "ra") return set_optional(electrode.measured_ra_ohms, "ra", text);
    if (field == "measuredOn") return set_date(electrode.measured_on, "measured on", text);
    if (field == "remeasuredOn") return set_date(electrode.remeasured_on, "re-measured on", text);
    if (field == "resistivity") return set_optional(electrode.soil_resistivity_ohm_m, "resistivity", text);
    if (field == "remeasuredRa") {
        auto refused = set_optional(electrode.remeasured_ra_ohms, "remeasuredRa", text);
        // A re-test entered without its date is dated today.
        if (refused.empty() && electrode.remeasured_ra_ohms && !electrode.remeasured_on) electrode.remeasured_on = today;
        return refused;
    }
    return "no such electrode field: " + std::string(field);
}

bool names_circuit(const model::Installation& installation, const std::string& circuit_id, std::string& observation) {
    for (const auto& o : installation.observations)
        if (o.circuit_id == circuit_id) {
            observation = o.id;
            return true;
        }
    return false;
}

}  // namespace

void fit_device_to_kind(model::Device& device) {
    using K = model::DeviceKind;
    const bool breaker = device.kind == K::circuit_breaker || device.kind == K::rcbo;
    const bool residual = device.kind == K::rcd || device.kind == K::rcbo;
    const bool fused = device.kind == K::fuse || device.kind == K::switch_fuse;
    if (breaker && !device.curve) device.curve = model::BreakerCurve::b;
    if (!breaker) device.curve.reset();
    // 30 mA: the additional protection of BS 7671:2018+A2 411.3.3 and 415.1.1.
    if (residual && !device.residual_current_amps) device.residual_current_amps = 0.03;
    if (!residual) {
        device.residual_current_amps.reset();
        device.rcd_type.reset();
        device.delay = model::RcdDelay::general;
    }
    if (device.kind == K::fuse && device.fuse_standard.empty()) device.fuse_standard = "BS 88-3";
    if (!fused) device.fuse_standard.clear();
    if (!breaker && !fused) device.breaking_capacity_ka.reset();
}

std::string edit_survey_field(model::Installation& installation, std::string_view target, std::string_view field,
                              std::string_view text, const Date& today) {
    if (target == "supply") return edit_supply(installation.supply, field, text);
    if (target == "tails") return edit_tails(installation.tails, field, text);
    if (target == "electrode") {
        if (!installation.electrode) return "this installation has no earth electrode recorded: add one first";
        return edit_electrode(*installation.electrode, field, text, today);
    }
    const auto colon = target.find(':');
    const std::string_view kind = target.substr(0, colon);
    const std::string id = colon == std::string_view::npos ? std::string() : std::string(target.substr(colon + 1));
    if (kind == "board") {
        model::Board* board = board_of(installation, id);
        if (!board) return "no board " + id;
        if (field == "name") return assign(board->name, trimmed(text));
        if (field == "location") return assign(board->location, trimmed(text));
        if (field == "enclosure")
            return set_word(board->enclosure, io::enclosure_material_words(), "enclosure", text);
        if (field == "spareWays") return set_required(board->spare_ways, "spareWays", text);
        if (field == "acceptsRcbos") return set_flag(board->accepts_rcbos, "accepts RCBOs", text);
        if (field == "surge") return set_flag(board->surge_protection_fitted, "surge protection fitted", text);
        return "no such board field: " + std::string(field);
    }
    for (auto& board : installation.boards) {
        if (kind == "device")
            for (auto& device : board.devices)
                if (device.id == id) return edit_device(device, field, text);
        if (kind == "circuit")
            for (auto& circuit : board.circuits)
                if (circuit.id == id) return edit_circuit(circuit, field, text);
    }
    return "no " + std::string(kind) + " " + id;
}

std::string add_electrode(model::Installation& installation) {
    if (installation.electrode) return "an earth electrode is already recorded";
    installation.electrode = model::Electrode{};
    return {};
}

std::string remove_electrode(model::Installation& installation) {
    if (!installation.electrode) return "no earth electrode is recorded";
    installation.electrode.reset();
    return {};
}

std::string add_board(model::Installation& installation, std::string_view parent_board_id) {
    model::Board* parent = board_of(installation, parent_board_id);
    if (!parent) return "no board " + std::string(parent_board_id) + " to supply the new board from";
    model::Board board;
    board.id = fresh_id(installation, "db");
    board.name = "Board " + std::to_string(installation.boards.size() + 1);
    board.enclosure = model::EnclosureMaterial::metal;
    model::Circuit submain;
    submain.id = fresh_id(installation, "sub");
    submain.number = std::to_string(parent->circuits.size() + 1);
    submain.description = "Submain to " + board.name;
    submain.use = model::CircuitUse::submain;
    submain.feeds_board_id = board.id;
    submain.device.id = submain.id + "-cb";
    submain.device.kind = model::DeviceKind::circuit_breaker;
    submain.device.rating_amps = 32.0;
    submain.device.curve = model::BreakerCurve::b;
    submain.line_csa_mm2 = 6.0;
    submain.cpc_csa_mm2 = 6.0;
    parent->circuits.push_back(std::move(submain));
    installation.boards.push_back(std::move(board));
    return {};
}

std::string remove_board(model::Installation& installation, std::string_view board_id) {
    model::Board* board = board_of(installation, board_id);
    if (!board) return "no board " + std::string(board_id);
    if (model::origin_board(installation) == board)
        return "board " + board->id + " is the origin board (the meter tails land on it): it cannot be removed";
    for (const auto& circuit : board->circuits)
        if (circuit.feeds_board_id) return "board " + board->id + " feeds board " + *circuit.feeds_board_id + ": remove that one first";
    for (const auto& o : installation.observations) {
        bool names = o.board_id == board->id;
        for (const auto& circuit : board->circuits) names = names || o.circuit_id == circuit.id;
        if (names) return "observation " + o.id + " concerns board " + board->id + ": remove or change it first";
    }
    const std::string id = board->id;
    for (auto& other : installation.boards)
        std::erase_if(other.circuits, [&](const model::Circuit& c) { return c.feeds_board_id == id; });
    std::erase_if(installation.boards, [&](const model::Board& b) { return b.id == id; });
    return {};
}

std::string add_device(model::Installation& installation, std::string_view board_id, std::string_view kind,
                       std::string_view upstream_id) {
    model::Board* board = board_of(installation, board_id);
    if (!board) return "no board " + std::string(board_id);
    model::Device device;
    if (auto refused = set_word(device.kind, io::device_kind_words(), "device kind", kind);
        !refused.empty() && refused != unchanged)
        return refused;
    using K = model::DeviceKind;
    const char* stem = device.kind == K::main_switch ? "ms"
                       : device.kind == K::rcd      ? "rcd"
                       : device.kind == K::rcbo     ? "rcbo"
                       : device.kind == K::fuse || device.kind == K::switch_fuse ? "sf"
                                                                                 : "cb";
    device.id = fresh_id(installation, stem);
    // Common ratings (common practice): a 100 A main switch, a 63 A RCD, else 32 A.
    device.rating_amps = device.kind == K::main_switch ? 100.0 : device.kind == K::rcd ? 63.0 : 32.0;
    if (device.kind == K::switch_fuse) device.fuse_standard = "BS 88-3";
    fit_device_to_kind(device);
    if (const std::string up = trimmed(upstream_id); !up.empty()) device.upstream_id = up;
    board->devices.push_back(std::move(device));
    return {};
}

std::string remove_device(model::Installation& installation, std::string_view device_id) {
    for (auto& board : installation.boards) {
        const auto found = std::find_if(board.devices.begin(), board.devices.end(),
                                        [&](const model::Device& d) { return d.id == device_id; });
        if (found == board.devices.end()) continue;
        const std::optional<std::string> above = found->upstream_id;
        board.devices.erase(found);
        for (auto& device : board.devices)
            if (device.upstream_id == device_id) device.upstream_id = above;
        for (auto& circuit : board.circuits)
            if (circuit.upstream_id == device_id) circuit.upstream_id = above;
        return {};
    }
    return "no board device " + std::string(device_id) + " (a circuit's own device goes with its circuit)";
}

std::string add_circuit(model::Installation& installation, std::string_view board_id) {
    model::Board* board = board_of(installation, board_id);
    if (!board) return "no board " + std::string(board_id);
    model::Circuit circuit;
    circuit.id = fresh_id(installation, "c");
    circuit.number = std::to_string(board->circuits.size() + 1);
    circuit.use = model::CircuitUse::other;
    circuit.device.id = circuit.id + "-cb";
    circuit.device.kind = model::DeviceKind::circuit_breaker;
    circuit.device.rating_amps = 16.0;
    circuit.device.curve = model::BreakerCurve::b;
    // Below the last device of the board that a circuit would hang under (an RCD or the main
    // switch), as a new way usually is; the user moves it with `upstream`.
    for (auto it = board->devices.rbegin(); it != board->devices.rend(); ++it)
        if (it->kind == model::DeviceKind::rcd || it->kind == model::DeviceKind::main_switch ||
            it->kind == model::DeviceKind::switch_fuse) {
            circuit.upstream_id = it->id;
            break;
        }
    board->circuits.push_back(std::move(circuit));
    return {};
}

std::string remove_circuit(model::Installation& installation, std::string_view circuit_id) {
    const std::string id(circuit_id);
    for (auto& board : installation.boards)
        for (auto it = board.circuits.begin(); it != board.circuits.end(); ++it) {
            if (it->id != id) continue;
            if (it->feeds_board_id)
                return "circuit " + id + " feeds board " + *it->feeds_board_id + ": remove that board instead";
            if (std::string observation; names_circuit(installation, id, observation))
                return "observation " + observation + " concerns circuit " + id + ": remove or change it first";
            board.circuits.erase(it);
            return {};
        }
    return "no circuit " + id;
}

namespace {

// "board cu (Consumer unit)": a board as the refusals name it.
std::string board_words(const model::Board& board) {
    return "board " + board.id + (board.name.empty() ? std::string() : " (" + board.name + ")");
}

std::string set_observation_board(model::Installation& installation, model::Observation& observation,
                                  std::string_view text) {
    const std::string id = trimmed(text);
    if (id.empty()) {
        if (!observation.board_id && !observation.circuit_id) return std::string(unchanged);
        observation.board_id.reset();
        observation.circuit_id.reset();
        return {};
    }
    const model::Board* board = model::find_board(installation, id);
    if (!board) return "Board: no board \"" + id + "\" in the survey; expected the id of one of its boards";
    if (observation.board_id == id) return std::string(unchanged);
    observation.board_id = id;
    if (observation.circuit_id) {
        const auto ref = model::find_circuit(installation, *observation.circuit_id);
        if (!ref.board || ref.board->id != id) observation.circuit_id.reset();
    }
    return {};
}

std::string set_observation_circuit(model::Installation& installation, model::Observation& observation,
                                    std::string_view text) {
    const std::string id = trimmed(text);
    if (id.empty()) return assign(observation.circuit_id, std::optional<std::string>());
    const auto ref = model::find_circuit(installation, id);
    if (!ref.circuit) return "Circuit: no circuit \"" + id + "\" in the survey; expected the id of a circuit of a board";
    if (observation.board_id && ref.board->id != *observation.board_id) {
        const model::Board* chosen = model::find_board(installation, *observation.board_id);
        return "Circuit: circuit " + ref.circuit->number + " (" + id + ") is on " + board_words(*ref.board) + ", not on " +
               (chosen ? board_words(*chosen) : "board " + *observation.board_id) +
               "; choose the board first, or a circuit of that board";
    }
    std::string result = assign(observation.circuit_id, std::optional<std::string>(id));
    if (!observation.board_id) {
        observation.board_id = ref.board->id;
        result.clear();
    }
    return result;
}

std::string set_observation_item(model::Observation& observation, std::string_view text, const pricing::PriceBook& book) {
    const std::string code = trimmed(text);
    if (code.empty()) return assign(observation.item_code, std::optional<std::string>());
    if (!book.find(code))
        return "Price-book item: no item \"" + code + "\" in the price book; expected one of its codes, or nothing";
    return assign(observation.item_code, std::optional<std::string>(code));
}

// Quantities of the survey format: above 0, at most 100000 (docs/survey-format.md, item_quantity).
std::string set_observation_quantity(model::Observation& observation, std::string_view text) {
    const std::string word = trimmed(text);
    double quantity = 0.0;
    std::size_t used = 0;
    bool read = !word.empty();
    if (read) {
        try {
            quantity = std::stod(word, &used);
        } catch (const std::exception&) {
            read = false;
        }
    }
    if (!read || used != word.size() || !std::isfinite(quantity))
        return "Quantity: expected a number above 0, got \"" + std::string(text) + "\"";
    if (quantity <= 0.0 || quantity > 100000.0)
        return "Quantity: expected above 0 and at most 100000, got " + word;
    return assign(observation.item_quantity, quantity);
}

}  // namespace

std::string edit_observation(model::Installation& installation, std::string_view observation_id,
                             std::string_view field, std::string_view text, const pricing::PriceBook& book) {
    auto found = std::find_if(installation.observations.begin(), installation.observations.end(),
                              [&](const model::Observation& o) { return o.id == observation_id; });
    if (found == installation.observations.end()) return "no observation " + std::string(observation_id);
    model::Observation& observation = *found;
    if (field == "text") {
        const std::string words = trimmed(text);
        if (words.empty()) return "Observation: expected the inspector's words, got nothing";
        return assign(observation.text, words);
    }
    if (field == "code") {
        std::string word = trimmed(text);
        std::transform(word.begin(), word.end(), word.begin(), [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
        const auto code = io::enum_of(io::observation_code_words(), word);
        if (!code) return "Code: expected C1, C2, C3 or FI, got \"" + std::string(text) + "\"";
        return assign(observation.code, *code);
    }
    if (field == "board") return set_observation_board(installation, observation, text);
    if (field == "circuit") return set_observation_circuit(installation, observation, text);
    if (field == "itemCode") return set_observation_item(observation, text, book);
    if (field == "itemQuantity") return set_observation_quantity(observation, text);
    return "no such field of an observation: " + std::string(field);
}

}  // namespace mendwright::desktop
