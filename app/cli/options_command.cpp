// `mendwright-cli options FILE --pricebook DIR [--profile FILE] [--json]`: the remedy options for
// a survey, each re-verified by running the rules again on a changed copy, costed from the price
// book and ranked per finding (docs/remedies.md).
#include <iomanip>
#include <ostream>

#include "app/cli/command.hpp"
#include "app/cli/remedies_input.hpp"
#include "planner/remedies/report_json.hpp"

namespace mendwright::cli {
namespace {

std::string joined(const std::vector<std::string>& ids) {
    if (ids.empty()) return "none";
    std::string text;
    for (const auto& id : ids) text += (text.empty() ? "" : ", ") + id;
    return text;
}

void print_text(std::ostream& out, const remedies::Analysis& analysis) {
    out << "Remedy options (" << analysis.options.size() << "), each verified by re-running the rules on a changed copy\n";
    for (const auto& option : analysis.options) {
        const auto& v = option.verification;
        out << "\n" << option.id << (option.ranked_last ? "  [ranked last]" : "") << "\n"
            << "  " << option.title << "\n"
            << "  cost: " << remedies::money_text(option.cost.total_pence) << " (materials "
            << remedies::money_text(option.cost.materials_pence) << ", labour " << remedies::money_text(option.cost.labour_pence)
            << "), supply off " << option.hours_off_supply << " h\n"
            << "  targets: " << joined(option.targets) << "\n"
            << "  cleared: " << joined(v.cleared) << "\n"
            << "  still open: " << joined(v.still_open) << "\n"
            << "  introduced: " << joined(v.introduced) << "\n"
            << "  certificate: " << option.certificate << (option.notifiable ? "; notifiable" : "; not notifiable") << "\n";
        for (const auto& text : option.prerequisites) out << "  before: " << text << "\n";
        for (const auto& text : option.assumptions) out << "  assumes: " << text << "\n";
        for (const auto& text : option.leaves_open) out << "  leaves open: " << text << "\n";
    }
    out << "\nBest option per finding:\n";
    for (const auto& ranking : analysis.rankings) {
        out << "  " << rules::code_text(ranking.code) << " " << ranking.finding_id << "\n";
        for (std::size_t i = 0; i < ranking.reasons.size(); ++i) out << "    " << (i + 1) << ". " << ranking.reasons[i] << "\n";
    }
}

int run_options(const ParsedArgs& args, CommandContext& context) {
    RemedyInputs inputs;
    if (auto code = load_remedy_inputs(args, context, "options", inputs)) return *code;
    remedies::Analysis analysis;
    if (auto code = run_remedy_analysis(inputs, context, "options", analysis)) return *code;
    if (args.has("json")) {
        nlohmann::json document = remedies::options_json(analysis.options, analysis.rankings);
        document["caution"] = remedies_caution();
        context.out << document.dump(2) << "\n";
    } else {
        print_text(context.out, analysis);
        context.out << "\n" << remedies_caution() << "\n";
    }
    return exit_ok;
}

[[maybe_unused]] const bool registered = register_command({
    "options",
    "FILE",
    "Remedy options for a survey's findings, each re-verified by the rules, costed and ranked",
    {{"pricebook", "DIR", "price book folder (items.csv and settings.json)"},
     {"profile", "FILE", "rules profile JSON (default: the shipped profile)"},
     {"json", "", "print JSON"}},
    1,
    1,
    run_options,
});

}  // namespace
}  // namespace mendwright::cli
