#include "planner/io/survey_document.hpp"

namespace mendwright::io {

std::string Diagnostic::to_string() const { return path.empty() ? message : path + ": " + message; }

bool SurveyLoad::ok() const {
    for (const auto& d : diagnostics)
        if (d.severity == Severity::error) return false;
    return true;
}

std::vector<Diagnostic> SurveyLoad::errors() const {
    std::vector<Diagnostic> result;
    for (const auto& d : diagnostics)
        if (d.severity == Severity::error) result.push_back(d);
    return result;
}

std::vector<Diagnostic> SurveyLoad::warnings() const {
    std::vector<Diagnostic> result;
    for (const auto& d : diagnostics)
        if (d.severity == Severity::warning) result.push_back(d);
    return result;
}

// Placeholder until the reader lands (same day): refuses every document.
SurveyLoad read_survey(std::string_view) {
    SurveyLoad load;
    load.diagnostics.push_back({Severity::error, "", "survey reading is not implemented yet"});
    return load;
}

std::string write_survey(const model::Installation&) { return "{}\n"; }

}  // namespace mendwright::io
