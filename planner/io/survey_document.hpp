#pragma once
// The survey document: Mendwright's own versioned JSON form of a model::Installation
// (field by field in docs/survey-format.md).
//
//   auto load = mendwright::io::read_survey(text);
//   if (!load.ok()) for (const auto& d : load.errors()) std::cerr << d.to_string() << "\n";
//   else use(*load.installation);   // warnings, if any, are in load.warnings()
//
// Reading validates the whole document and reports every problem, each with its JSON path
// ("boards[0].circuits[3].device.rating_amps") and what was expected there. Errors are values
// that cannot be right (wrong type, unknown field, dangling reference, negative ohms, a loop in
// the board tree); warnings are values that are possible but unusual and worth a second look
// (an electrode reading over 200 ohms, tails over 10 m). A document with errors yields no
// Installation.

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "planner/model/installation.hpp"

namespace mendwright::io {

inline constexpr const char* survey_format_name = "mendwright-survey";
inline constexpr int survey_format_version = 1;

enum class Severity { error, warning };

struct Diagnostic {
    Severity severity = Severity::error;
    std::string path;     // JSON path: "tails.length_m", "boards[1].devices[0].upstream_id"; empty for the whole text
    std::string message;  // what was expected and what was given

    [[nodiscard]] std::string to_string() const;  // "path: message" (just the message when path is empty)
};

struct SurveyLoad {
    std::optional<model::Installation> installation;  // set only when there are no errors
    std::vector<Diagnostic> diagnostics;              // field by field in document order, then cross-field checks

    [[nodiscard]] bool ok() const;  // no errors (warnings allowed)
    [[nodiscard]] std::vector<Diagnostic> errors() const;
    [[nodiscard]] std::vector<Diagnostic> warnings() const;
};

// Parses and validates a survey document. Never throws: invalid JSON is one Diagnostic giving
// the line and column; a document of a newer version is refused with one Diagnostic.
SurveyLoad read_survey(std::string_view json_text);

// The canonical text of an installation: fixed field order, 2-space indent, trailing newline.
// write_survey(*read_survey(write_survey(x)).installation) == write_survey(x).
std::string write_survey(const model::Installation& installation);

}  // namespace mendwright::io
