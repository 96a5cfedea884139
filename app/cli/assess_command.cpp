// `mendwright-cli assess FILE [--profile FILE] [--json]`: the findings of a survey document
// under a rules profile (the built-in BS 7671:2018+A2 profile unless --profile is given), as a
// table or as JSON. Exit 0 with findings printed; 3 when the survey or the profile is invalid
// (every error listed with its path); 1 when a file cannot be read.
#include <optional>
#include <ostream>

#include <nlohmann/json.hpp>

#include "app/cli/command.hpp"
#include "app/cli/text_file.hpp"
#include "planner/io/survey_document.hpp"
#include "planner/rules/assess.hpp"

namespace mendwright::cli {
namespace {

constexpr const char* command_name = "mendwright-cli assess";

nlohmann::json finding_json(const rules::Finding& finding) {
    nlohmann::json inputs = nlohmann::json::array();
    for (const auto& input : finding.inputs) inputs.push_back({{"name", input.name}, {"value", input.value}, {"unit", input.unit}});
    nlohmann::json item = {
        {"id", finding.id},
        {"rule", finding.rule},
        {"code", rules::code_text(finding.code)},
        {"title", finding.title},
        {"board", finding.board_id},
        {"circuit", finding.circuit_id},
        {"device", finding.device_id},
        {"location", finding.location},
        {"clause", finding.clause},
        {"explanation", finding.explanation},
        {"inputs", inputs},
        {"origin", finding.origin == rules::FindingOrigin::recorded ? "recorded" : "derived"},
        {"urgent", finding.urgent()},
        {"due", finding.urgent() ? nlohmann::json(finding.due_text) : nlohmann::json(nullptr)},
    };
    if (finding.item_code) {
        item["item_code"] = *finding.item_code;
        item["item_quantity"] = finding.item_quantity;
    }
    return item;
}

void print_json(std::ostream& out, const std::string& file, const rules::RulesProfile& profile,
                const std::vector<rules::Finding>& findings) {
    nlohmann::json findings_json = nlohmann::json::array();
    for (const auto& finding : findings) findings_json.push_back(finding_json(finding));
    const auto summary = rules::summarise(findings);
    const nlohmann::json document = {
        {"survey", file},
        {"profile", {{"name", profile.name}, {"basis", profile.basis}}},
        {"findings", findings_json},
        {"summary", {{"C1", summary.c1}, {"C2", summary.c2}, {"C3", summary.c3}, {"FI", summary.fi}, {"note", summary.note}}},
        {"caution", caution_text},
    };
    out << document.dump(2) << "\n";
}

void print_table(std::ostream& out, const std::string& file, const rules::RulesProfile& profile,
                 const std::vector<rules::Finding>& findings) {
    out << "Findings for " << file << "\nProfile: " << profile.name << " (" << profile.basis << ")\n\n";
    if (findings.empty()) out << "No findings.\n";
    for (const auto& finding : findings) {
        std::string code = rules::code_text(finding.code);
        code.resize(6, ' ');
        out << code << finding.location << "\n"
            << "      " << finding.title << "\n"
            << "      " << finding.clause;
        if (finding.urgent()) out << "; due " << finding.due_text;
        out << "\n      " << finding.explanation << "\n"
            << "      [" << finding.id << "]\n\n";
    }
    const auto summary = rules::summarise(findings);
    out << "Summary: C1 " << summary.c1 << ", C2 " << summary.c2 << ", C3 " << summary.c3 << ", FI " << summary.fi
        << ", notes " << summary.note << "; " << summary.urgent() << " urgent (C1, C2, FI)\n\n"
        << caution_text << "\n";
}

int run_assess(const ParsedArgs& args, CommandContext& context) {
    const std::string& file = args.positionals.at(0);

    std::optional<rules::RulesProfile> custom_profile;
    if (auto profile_file = args.text("profile")) {
        const auto text = read_text_file(*profile_file, context.err, command_name);
        if (!text) return exit_failure;
        auto parsed = rules::parse_rules_profile(*text);
        if (!parsed) {
            context.err << command_name << ": " << *profile_file << ": invalid rules profile: " << parsed.problem().to_string()
                        << "\n";
            return exit_invalid_input;
        }
        custom_profile = std::move(parsed).value();
    }
    const rules::RulesProfile& profile = custom_profile ? *custom_profile : rules::default_rules_profile();

    const auto text = read_text_file(file, context.err, command_name);
    if (!text) return exit_failure;
    const io::SurveyLoad load = io::read_survey(*text);
    if (!load.ok()) {
        const auto errors = load.errors();
        context.err << command_name << ": " << file << ": invalid survey, " << errors.size()
                    << (errors.size() == 1 ? " error" : " errors") << "\n";
        for (const auto& d : errors) context.err << "  error: " << d.to_string() << "\n";
        return exit_invalid_input;
    }

    const auto findings = rules::assess(*load.installation, profile);
    if (args.has("json"))
        print_json(context.out, file, profile, findings);
    else
        print_table(context.out, file, profile, findings);
    return exit_ok;
}

[[maybe_unused]] const bool registered = register_command({
    "assess",
    "FILE",
    "Findings of a survey document (C1/C2/C3/FI) with clause, arithmetic and due dates",
    {
        {"profile", "FILE", "rules profile (JSON) to use instead of the built-in BS 7671:2018+A2 one"},
        {"json", "", "print JSON instead of a table"},
    },
    1,
    1,
    run_assess,
});

}  // namespace
}  // namespace mendwright::cli
