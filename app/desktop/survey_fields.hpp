#pragma once
// The survey fields the editor lets a user type, with their units and the range accepted at
// entry. The ranges are plausibility bounds of our own (common practice: a reading outside them
// is a typing slip, e.g. megohms typed as ohms), inside the limits of the survey reader
// (docs/survey-format.md), whose own checks run as well.

#include <optional>
#include <string>
#include <string_view>

#include "planner/model/installation.hpp"

namespace mendwright::desktop {

struct SurveyField {
    const char* key;    // "zs", "ra", "idn", ...
    const char* label;  // "Zs"
    const char* unit;   // "Ω": the unit the user types in
    double min;         // in the unit typed
    double max;
    double entry_per_model;  // typed units per model unit: 1000 for mA typed into amperes, else 1
    bool whole;              // a whole number (rods, spare ways)
};

const SurveyField* survey_field(std::string_view key);

// Reads `text` for `field`: empty text clears the value (nullopt with no error); otherwise a
// number inside the field's range. `error` says what was expected, with the unit and range.
// The value returned is in the unit typed (see to_model / to_entry).
std::optional<double> read_field(const SurveyField& field, std::string_view text, std::string& error);

// Between the typed unit and the model's unit (30 mA typed -> 0.03 A stored).
double to_model(const SurveyField& field, double entry);
double to_entry(const SurveyField& field, double model_value);

// "0.03 A" stored shown as "30" for a field typed in mA; empty when absent.
std::string entry_text(const SurveyField& field, const std::optional<double>& model_value);

// "1 to 100 m", for hints and messages.
std::string range_text(const SurveyField& field);

// Sets a circuit's measured value named by `key` ("zs", "r1r2", "ir", "leakage", "tripIdn",
// "trip5Idn"); false for an unknown key.
bool set_circuit_value(model::Circuit& circuit, std::string_view key, std::optional<double> value);
std::optional<double> circuit_value(const model::Circuit& circuit, std::string_view key);

// "0.35" style text of a reading: no trailing zeros; empty when absent.
std::string reading_text(const std::optional<double>& value);

}  // namespace mendwright::desktop
