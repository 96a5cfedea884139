#include "app/cli/remedies_input.hpp"

#include <ostream>

#include "app/cli/text_file.hpp"
#include "planner/io/survey_document.hpp"
#include "planner/rules/assess.hpp"

namespace mendwright::cli {

std::string remedies_caution() {
    return std::string(caution_text) +
           " Remedy options are checked by re-running the same rules on a changed copy of the survey, not by a site "
           "visit. Predicted electrode resistances are estimates: re-measure RA after any electrode work.";
}

std::optional<int> load_remedy_inputs(const ParsedArgs& args, CommandContext& context, const std::string& command,
                                      RemedyInputs& inputs) {
    auto survey_text = read_text_file(args.positionals.at(0), context.err, "mendwright-cli " + command);
    if (!survey_text) return exit_failure;
    const io::SurveyLoad load = io::read_survey(*survey_text);
    if (!load.ok()) {
        context.err << "mendwright-cli " << command << ": " << args.positionals.at(0) << ": invalid survey document\n";
        for (const auto& d : load.errors()) context.err << "  error: " << d.to_string() << "\n";
        return exit_invalid_input;
    }
    inputs.installation = *load.installation;

    if (auto profile_path = args.text("profile")) {
        auto profile_text = read_text_file(*profile_path, context.err, "mendwright-cli " + command);
        if (!profile_text) return exit_failure;
        auto profile = rules::parse_rules_profile(*profile_text);
        if (!profile) {
            context.err << "mendwright-cli " << command << ": " << *profile_path << ": " << profile.problem().to_string() << "\n";
            return exit_invalid_input;
        }
        inputs.profile = std::move(profile).value();
    } else {
        inputs.profile = rules::default_rules_profile();
    }

    auto folder = args.required_text("pricebook");
    if (!folder) return usage_error(context, command, folder.problem());
    auto book = pricing::read_price_book(*folder);
    if (!book) {
        context.err << "mendwright-cli " << command << ": price book " << *folder << ": " << book.problem().to_string() << "\n";
        return exit_invalid_input;
    }
    inputs.book = std::move(book).value();
    return std::nullopt;
}

std::optional<int> run_remedy_analysis(const RemedyInputs& inputs, CommandContext& context, const std::string& command,
                                       remedies::Analysis& analysis) {
    const rules::RulesProfile& profile = inputs.profile;
    remedies::Assessor assess = [&profile](const model::Installation& installation, rules::FindingDetail detail) {
        return rules::assess(installation, profile, {detail});
    };
    analysis = remedies::analyse(inputs.installation, assess, inputs.book, remedies::settings_from_profile(profile));
    if (!analysis.pricing_problems.empty()) {
        for (const auto& p : analysis.pricing_problems)
            context.err << "mendwright-cli " << command << ": price book: " << p.to_string() << "\n";
        return exit_invalid_input;
    }
    return std::nullopt;
}

}  // namespace mendwright::cli
