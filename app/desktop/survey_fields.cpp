#include "app/desktop/survey_fields.hpp"

#include <charconv>
#include <cmath>

#include "planner/rules/text.hpp"

namespace mendwright::desktop {

namespace {

// Entry bounds (common practice, our own plausibility limits; not thresholds of any rule).
constexpr SurveyField fields[] = {
    // Measured values of a circuit.
    {"zs", "Zs", "Ω", 0.0, 2000.0, 1.0, false},
    {"r1r2", "R1+R2", "Ω", 0.0, 200.0, 1.0, false},
    {"ir", "Insulation resistance", "MΩ", 0.0, 2000.0, 1.0, false},
    {"leakage", "Standing leakage", "mA", 0.0, 1000.0, 1.0, false},
    {"tripIdn", "RCD trip time at IΔn", "ms", 0.0, 5000.0, 1.0, false},
    {"trip5Idn", "RCD trip time at 5 IΔn", "ms", 0.0, 5000.0, 1.0, false},
    // Electrode.
    {"ra", "RA", "Ω", 0.01, 100000.0, 1.0, false},
    {"remeasuredRa", "RA re-measured", "Ω", 0.01, 100000.0, 1.0, false},
    {"resistivity", "Soil resistivity", "Ω·m", 1.0, 100000.0, 1.0, false},
    {"rods", "Rods", "", 1.0, 100.0, 1.0, true},
    {"rodLength", "Rod length", "m", 0.3, 50.0, 1.0, false},
    // Typed in millimetres: the reader refuses a 16 mm rod written as 16 metres.
    {"rodDiameter", "Rod diameter", "mm", 5.0, 200.0, 1000.0, false},
    {"spacing", "Rod spacing", "m", 0.1, 1000.0, 1.0, false},
    // Supply.
    {"u0", "U0", "V", 50.0, 1000.0, 1.0, false},
    {"supplyFuse", "Supply fuse rating", "A", 1.0, 6300.0, 1.0, false},
    {"pfc", "Prospective fault current", "kA", 0.01, 200.0, 1.0, false},
    {"ze", "Ze", "Ω", 0.001, 2000.0, 1.0, false},
    // Meter tails.
    {"tailsLength", "Meter tails length", "m", 0.1, 100.0, 1.0, false},
    {"tailsCsa", "Meter tails csa", "mm²", 1.0, 500.0, 1.0, false},
    // Board.
    {"spareWays", "Spare ways", "", 0.0, 200.0, 1.0, true},
    // Device (a board's device or a circuit's own).
    {"rating", "Rating In", "A", 0.5, 6300.0, 1.0, false},
    {"breakingCapacity", "Breaking capacity", "kA", 1.0, 200.0, 1.0, false},
    // IΔn typed in mA and stored in amperes: 30 typed is 0.03 A.
    {"idn", "IΔn", "mA", 1.0, 3000.0, 1000.0, false},
    // Circuit.
    {"lineCsa", "Line csa", "mm²", 0.5, 630.0, 1.0, false},
    {"cpcCsa", "cpc csa", "mm²", 0.5, 630.0, 1.0, false},
    {"length", "Length", "m", 0.1, 2000.0, 1.0, false},
};

std::optional<double>* circuit_slot(model::Circuit& circuit, std::string_view key) {
    if (key == "zs") return &circuit.measured_zs_ohms;
    if (key == "r1r2") return &circuit.r1_plus_r2_ohms;
    if (key == "ir") return &circuit.insulation_resistance_megohms;
    if (key == "leakage") return &circuit.standing_leakage_ma;
    if (key == "tripIdn") return &circuit.rcd_trip_ms_at_idn;
    if (key == "trip5Idn") return &circuit.rcd_trip_ms_at_5idn;
    return nullptr;
}

}  // namespace

const SurveyField* survey_field(std::string_view key) {
    for (const auto& field : fields)
        if (key == field.key) return &field;
    return nullptr;
}

std::optional<double> read_field(const SurveyField& field, std::string_view text, std::string& error) {
    error.clear();
    while (!text.empty() && text.front() == ' ') text.remove_prefix(1);
    while (!text.empty() && text.back() == ' ') text.remove_suffix(1);
    if (text.empty()) return std::nullopt;
    double value = 0.0;
    auto [end, code] = std::from_chars(text.data(), text.data() + text.size(), value);
    const std::string range = range_text(field);
    if (code != std::errc() || end != text.data() + text.size() || !std::isfinite(value)) {
        error = std::string(field.label) + ": expected " + (field.whole ? "a whole number" : "a number") +
                (*field.unit ? std::string(" in ") + field.unit : std::string()) + " (" + range + "), got \"" +
                std::string(text) + "\"";
        return std::nullopt;
    }
    if (field.whole && value != std::floor(value)) {
        error = std::string(field.label) + ": expected a whole number (" + range + "), got " + std::string(text);
        return std::nullopt;
    }
    if (value < field.min || value > field.max) {
        error = std::string(field.label) + ": expected " + range + ", got " + std::string(text);
        return std::nullopt;
    }
    return value;
}

double to_model(const SurveyField& field, double entry) { return entry / field.entry_per_model; }

double to_entry(const SurveyField& field, double model_value) { return model_value * field.entry_per_model; }

std::string entry_text(const SurveyField& field, const std::optional<double>& model_value) {
    return model_value ? rules::number_text(to_entry(field, *model_value), 3) : std::string();
}

std::string range_text(const SurveyField& field) {
    std::string text = rules::number_text(field.min, 3) + " to " + rules::number_text(field.max, 3);
    if (*field.unit) text += std::string(" ") + field.unit;
    return text;
}

bool set_circuit_value(model::Circuit& circuit, std::string_view key, std::optional<double> value) {
    auto* slot = circuit_slot(circuit, key);
    if (!slot) return false;
    *slot = value;
    return true;
}

std::optional<double> circuit_value(const model::Circuit& circuit, std::string_view key) {
    model::Circuit copy = circuit;
    auto* slot = circuit_slot(copy, key);
    return slot ? *slot : std::nullopt;
}

std::string reading_text(const std::optional<double>& value) {
    return value ? rules::number_text(*value, 3) : std::string();
}

}  // namespace mendwright::desktop
