// `mendwright-cli plans FILE --pricebook DIR [--choose ID,ID,...] [--profile FILE] [--json]`:
// whole-installation plans (least-cost compliant, ideal, and custom from --choose), each verified
// by applying all its options to one copy and running the rules once; figures side by side.
#include <iomanip>
#include <ostream>
#include <sstream>

#include "app/cli/command.hpp"
#include "app/cli/remedies_input.hpp"
#include "planner/remedies/plans.hpp"
#include "planner/remedies/report_json.hpp"

namespace mendwright::cli {
namespace {

std::string cell(const std::string& text, std::size_t width) {
    std::string out = text.size() > width ? text.substr(0, width) : text;
    out.resize(width, ' ');
    return out;
}

void print_table(std::ostream& out, const std::vector<remedies::Plan>& plans) {
    constexpr std::size_t label_width = 28;
    constexpr std::size_t column_width = 26;
    auto row = [&](const std::string& label, auto value_of) {
        out << cell(label, label_width);
        for (const auto& plan : plans) out << " " << cell(value_of(plan), column_width);
        out << "\n";
    };
    row("plan", [](const remedies::Plan& p) { return p.name; });
    row("total (before markup, VAT)", [](const remedies::Plan& p) { return remedies::money_text(p.figures.total_pence); });
    row("residual C1 / C2 / C3 / FI", [](const remedies::Plan& p) {
        const auto& f = p.figures;
        return std::to_string(f.residual_c1) + " / " + std::to_string(f.residual_c2) + " / " + std::to_string(f.residual_c3) +
               " / " + std::to_string(f.residual_fi);
    });
    row("introduced findings", [](const remedies::Plan& p) { return std::to_string(p.figures.introduced_ids.size()); });
    row("circuits lost on one trip", [](const remedies::Plan& p) { return std::to_string(p.figures.circuits_lost_on_one_trip); });
    row("worst touch voltage", [](const remedies::Plan& p) {
        if (!p.figures.worst_touch_volts) return std::string("n/a");
        std::ostringstream text;
        text << std::fixed << std::setprecision(1) << *p.figures.worst_touch_volts << " V";
        return text.str();
    });
    row("hours off supply", [](const remedies::Plan& p) {
        std::ostringstream text;
        text << std::fixed << std::setprecision(1) << p.figures.hours_off_supply << " h";
        return text.str();
    });
    row("notifiable", [](const remedies::Plan& p) { return std::string(p.figures.notifiable ? "yes" : "no"); });
    row("options", [](const remedies::Plan& p) { return std::to_string(p.option_ids.size()); });
    for (const auto& plan : plans) {
        out << "\n" << plan.name << ":\n";
        for (const auto& id : plan.option_ids) out << "  - " << id << "\n";
        for (const auto& c : plan.figures.certificates) out << "  certificate: " << c << "\n";
        if (!plan.figures.touch_note.empty()) out << "  touch voltage: " << plan.figures.touch_note << "\n";
        for (const auto& id : plan.figures.residual_ids) out << "  left open: " << id << "\n";
        for (const auto& note : plan.notes) out << "  note: " << note << "\n";
    }
}

int run_plans(const ParsedArgs& args, CommandContext& context) {
    RemedyInputs inputs;
    if (auto code = load_remedy_inputs(args, context, "plans", inputs)) return *code;
    std::vector<std::string> chosen;
    if (args.text("choose")) {
        chosen = args.word_list("choose");
        if (chosen.empty()) return usage_error(context, "plans", problem("--choose", "expected option ids separated by commas"));
    }
    remedies::Analysis analysis;
    if (auto code = run_remedy_analysis(inputs, context, "plans", analysis)) return *code;
    std::vector<remedies::Plan> plans;
    plans.push_back(remedies::least_cost_plan(*analysis.verifier, analysis.options, analysis.settings));
    plans.push_back(remedies::ideal_plan(*analysis.verifier, analysis.options, analysis.settings));
    if (!chosen.empty()) {
        auto custom = remedies::custom_plan(*analysis.verifier, analysis.options, chosen, analysis.settings);
        if (!custom) return usage_error(context, "plans", custom.problem());
        plans.push_back(std::move(custom).value());
    }
    if (args.has("json")) {
        nlohmann::json list = nlohmann::json::array();
        for (const auto& plan : plans) list.push_back(remedies::plan_json(plan));
        context.out << nlohmann::json{{"plans", list}, {"caution", remedies_caution()}}.dump(2) << "\n";
    } else {
        print_table(context.out, plans);
        context.out << "\nFigures are before markup, contingency and VAT; hours off supply are added up option by option.\n"
                    << remedies_caution() << "\n";
    }
    return exit_ok;
}

[[maybe_unused]] const bool registered = register_command({
    "plans",
    "FILE",
    "Whole-installation plans (least-cost compliant, ideal, custom), verified together, side by side",
    {{"pricebook", "DIR", "price book folder (items.csv and settings.json)"},
     {"choose", "ID,ID,...", "a custom plan from these option ids"},
     {"profile", "FILE", "rules profile JSON (default: the shipped profile)"},
     {"json", "", "print JSON"}},
    1,
    1,
    run_plans,
});

}  // namespace
}  // namespace mendwright::cli
