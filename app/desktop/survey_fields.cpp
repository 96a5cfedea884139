#include "app/desktop/survey_fields.hpp"

#include <charconv>
#include <cmath>

#include "planner/rules/text.hpp"

namespace mendwright::desktop {

namespace {

// Entry bounds (common practice, our own plausibility limits; not thresholds of any rule).
constexpr SurveyField fields[] = {
    {"zs", "Zs", "Ω", 0.0, 2000.0},
    {"r1r2", "R1+R2", "Ω", 0.0, 200.0},
    {"ir", "Insulation resistance", "MΩ", 0.0, 2000.0},
    {"leakage", "Standing leakage", "mA", 0.0, 1000.0},
    {"tripIdn", "RCD trip time at IΔn", "ms", 0.0, 5000.0},
    {"trip5Idn", "RCD trip time at 5 IΔn", "ms", 0.0, 5000.0},
    {"ra", "RA", "Ω", 0.01, 100000.0},
    {"remeasuredRa", "RA re-measured", "Ω", 0.01, 100000.0},
    {"resistivity", "Soil resistivity", "Ω·m", 1.0, 100000.0},
    {"tailsLength", "Meter tails length", "m", 0.1, 100.0},
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
    const std::string range = rules::number_text(field.min) + " to " + rules::number_text(field.max) + " " + field.unit;
    if (code != std::errc() || end != text.data() + text.size() || !std::isfinite(value)) {
        error = std::string(field.label) + ": expected a number in " + field.unit + " (" + range + "), got \"" +
                std::string(text) + "\"";
        return std::nullopt;
    }
    if (value < field.min || value > field.max) {
        error = std::string(field.label) + ": expected " + range + ", got " + std::string(text);
        return std::nullopt;
    }
    return value;
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
