#pragma once
// The survey fields the editor lets a user type, with their units and the range accepted at
// entry. The ranges are plausibility bounds of our own (common practice: a reading outside them
// is a typing slip, e.g. megohms typed as ohms); the survey reader's own checks run as well.

#include <optional>
#include <string>
#include <string_view>

#include "planner/model/installation.hpp"

namespace mendwright::desktop {

struct SurveyField {
    const char* key;    // "zs", "ra", ...
    const char* label;  // "Zs"
    const char* unit;   // "Ω"
    double min;
    double max;
};

const SurveyField* survey_field(std::string_view key);

// Reads `text` for `field`: empty text clears the value (nullopt with no error); otherwise a
// number inside the field's range. `error` says what was expected, with the unit and range.
std::optional<double> read_field(const SurveyField& field, std::string_view text, std::string& error);

// Sets a circuit's measured value named by `key` ("zs", "r1r2", "ir", "leakage", "tripIdn",
// "trip5Idn"); false for an unknown key.
bool set_circuit_value(model::Circuit& circuit, std::string_view key, std::optional<double> value);
std::optional<double> circuit_value(const model::Circuit& circuit, std::string_view key);

// "0.35" style text of a reading: no trailing zeros; empty when absent.
std::string reading_text(const std::optional<double>& value);

}  // namespace mendwright::desktop
