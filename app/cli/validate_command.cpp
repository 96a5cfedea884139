// `mendwright-cli validate FILE`: reads a survey document (docs/survey-format.md) and lists every
// problem with its JSON path. Exit 0 when valid (warnings listed), 3 when it has errors, 1 when
// the file cannot be read.
#include <ostream>

#include "app/cli/command.hpp"
#include "app/cli/text_file.hpp"
#include "planner/io/survey_document.hpp"

namespace mendwright::cli {
namespace {

std::string count_text(std::size_t count, const char* noun) {
    return std::to_string(count) + " " + noun + (count == 1 ? "" : "s");
}

int run_validate(const ParsedArgs& args, CommandContext& context) {
    const std::string& file = args.positionals.at(0);
    const auto text = read_text_file(file, context.err, "mendwright-cli validate");
    if (!text) return exit_failure;

    const io::SurveyLoad load = io::read_survey(*text);
    const auto errors = load.errors();
    const auto warnings = load.warnings();
    if (load.ok())
        context.out << file << ": valid" << (warnings.empty() ? "" : ", " + count_text(warnings.size(), "warning")) << "\n";
    else
        context.out << file << ": invalid, " << count_text(errors.size(), "error")
                    << (warnings.empty() ? "" : ", " + count_text(warnings.size(), "warning")) << "\n";
    for (const auto& d : errors) context.out << "  error: " << d.to_string() << "\n";
    for (const auto& d : warnings) context.out << "  warning: " << d.to_string() << "\n";
    return load.ok() ? exit_ok : exit_invalid_input;
}

[[maybe_unused]] const bool registered = register_command({
    "validate",
    "FILE",
    "Check a survey document (JSON) and list every problem with its field path",
    {},
    1,
    1,
    run_validate,
});

}  // namespace
}  // namespace mendwright::cli
