// `mendwright-cli quote FILE --pricebook DIR --plan least-cost|ideal|custom [--choose IDS]
//  --out quote.xlsx [--extra-lines FILE.csv] [--number Q] [--date YYYY-MM-DD] [--profile FILE] [--json]`:
// the chosen plan priced from the price book, beside the alternative plan, written as the
// client's quote workbook.
#include <chrono>
#include <ostream>
#include <sstream>

#include <nlohmann/json.hpp>

#include "app/cli/command.hpp"
#include "app/cli/remedies_input.hpp"
#include "planner/export/quote_workbook.hpp"
#include "planner/pricing/extra_lines.hpp"
#include "planner/pricing/money.hpp"
#include "planner/remedies/plans.hpp"
#include "planner/remedies/quote_request.hpp"

namespace mendwright::cli {
namespace {

Date today() {
    const auto days = std::chrono::floor<std::chrono::days>(std::chrono::system_clock::now());
    const std::chrono::year_month_day ymd{days};
    return Date{int(ymd.year()), unsigned(ymd.month()), unsigned(ymd.day())};
}

nlohmann::json line_json(const std::string& option_id, const pricing::CostedLine& line) {
    return {{"option", option_id},
            {"item_code", line.item_code},
            {"description", line.description},
            {"unit", line.unit},
            {"quantity", line.quantity()},
            {"materials_pence", line.materials_pence},
            {"labour_pence", line.labour_pence},
            {"total_pence", line.total_pence()}};
}

int run_quote(const ParsedArgs& args, CommandContext& context) {
    const std::string command = "quote";
    auto plan_name = args.required_text("plan");
    if (!plan_name) return usage_error(context, command, plan_name.problem());
    if (*plan_name != "least-cost" && *plan_name != "ideal" && *plan_name != "custom")
        return usage_error(context, command, problem("--plan", "expected least-cost, ideal or custom, got \"" + *plan_name + "\""));
    const std::vector<std::string> chosen_ids = args.word_list("choose");
    if (*plan_name == "custom" && chosen_ids.empty())
        return usage_error(context, command, problem("--choose", "expected option ids separated by commas with --plan custom"));
    if (*plan_name != "custom" && args.has("choose"))
        return usage_error(context, command, problem("--choose", "goes with --plan custom only"));
    auto out_path = args.required_text("out");
    if (!out_path) return usage_error(context, command, out_path.problem());
    Date quote_date = today();
    if (auto text = args.text("date")) {
        auto parsed = parse_iso_date(*text, "--date");
        if (!parsed) return usage_error(context, command, parsed.problem());
        quote_date = parsed.value();
    }

    // Free lines beyond the plan's options, read before the analysis so a bad file fails fast.
    std::vector<pricing::ExtraLine> extra_lines;
    if (auto extras_path = args.text("extra-lines")) {
        auto read = pricing::read_extra_lines(*extras_path);
        if (!read) {
            context.err << "mendwright-cli " << command << ": --extra-lines: " << read.problem().to_string() << "\n";
            return exit_invalid_input;
        }
        extra_lines = std::move(read).value();
    }

    RemedyInputs inputs;
    if (auto code = load_remedy_inputs(args, context, command, inputs)) return *code;
    remedies::Analysis analysis;
    if (auto code = run_remedy_analysis(inputs, context, command, analysis)) return *code;

    remedies::Plan least_cost = remedies::least_cost_plan(*analysis.verifier, analysis.options, analysis.settings);
    remedies::Plan ideal = remedies::ideal_plan(*analysis.verifier, analysis.options, analysis.settings);
    remedies::Plan chosen;
    const remedies::Plan* alternative = nullptr;
    if (*plan_name == "least-cost") {
        chosen = least_cost;
        alternative = &ideal;
    } else if (*plan_name == "ideal") {
        chosen = ideal;
        alternative = &least_cost;
    } else {
        auto custom = remedies::custom_plan(*analysis.verifier, analysis.options, chosen_ids, analysis.settings);
        if (!custom) return usage_error(context, command, custom.problem());
        chosen = std::move(custom).value();
        alternative = &least_cost;
    }

    const auto& job = inputs.installation.job;
    remedies::QuoteParties parties{args.text("number").value_or("Q-" + (job.reference.empty() ? quote_date.to_iso() : job.reference)),
                                   quote_date, job.client, job.site};
    auto request = remedies::quote_request(analysis, chosen, alternative, inputs.book, parties);
    if (!request) {
        context.err << "mendwright-cli " << command << ": " << request.problem().to_string() << "\n";
        return exit_invalid_input;
    }
    for (const auto& extra : extra_lines) {
        if (auto refused = pricing::add_extra_line(request.value().works, extra)) {
            context.err << "mendwright-cli " << command << ": --extra-lines: " << refused->to_string() << "\n";
            return exit_invalid_input;
        }
    }
    auto quote = pricing::make_quote(std::move(request).value());
    if (!quote) {
        context.err << "mendwright-cli " << command << ": " << quote.problem().to_string() << "\n";
        return exit_invalid_input;
    }
    auto written = spreadsheet::write_quote_workbook(quote.value(), *out_path);
    if (!written) {
        context.err << "mendwright-cli " << command << ": " << written.problem().to_string() << "\n";
        return exit_failure;
    }

    const auto& totals = quote->totals;
    if (args.has("json")) {
        nlohmann::json lines = nlohmann::json::array();
        for (const auto& group : quote->works.groups)
            for (const auto& line : group.lines) lines.push_back(line_json(group.option_id, line));
        for (const auto& line : quote->works.extra_lines) lines.push_back(line_json("", line));
        context.out << nlohmann::json{{"file", written->path.string()},
                                      {"number", quote->number},
                                      {"plan", chosen.name},
                                      {"options", chosen.option_ids},
                                      {"subtotal_pence", totals.subtotal_pence},
                                      {"contingency_pence", totals.contingency_pence},
                                      {"markup_pence", totals.markup_pence},
                                      {"net_pence", totals.net_pence},
                                      {"vat_pence", totals.vat_pence},
                                      {"total_pence", totals.total_pence},
                                      {"lines", lines},
                                      {"caution", remedies_caution()}}
                           .dump(2)
                    << "\n";
    } else {
        context.out << "Quote " << quote->number << " for " << quote->client_name << " (" << remedies::plan_display_name(chosen.name)
                    << ", " << chosen.option_ids.size() << " options)\n"
                    << "  subtotal     " << pricing::pence_text(totals.subtotal_pence) << "\n"
                    << "  contingency  " << pricing::pence_text(totals.contingency_pence) << "\n"
                    << "  markup       " << pricing::pence_text(totals.markup_pence) << "\n"
                    << "  VAT          " << pricing::pence_text(totals.vat_pence) << "\n"
                    << "  total        " << pricing::pence_text(totals.total_pence) << "\n"
                    << "Written: " << written->path.string() << "\n\n"
                    << remedies_caution() << "\n";
    }
    return exit_ok;
}

[[maybe_unused]] const bool registered = register_command({
    "quote",
    "FILE",
    "Price a plan from the price book and write the client's quote workbook (.xlsx)",
    {{"pricebook", "DIR", "price book folder (items.csv and settings.json)"},
     {"plan", "least-cost|ideal|custom", "which plan to quote; the other of least-cost/ideal goes beside it"},
     {"choose", "ID,ID,...", "option ids of a custom plan (with --plan custom)"},
     {"out", "FILE.xlsx", "where to write the workbook (written whole, or not at all)"},
     {"extra-lines", "FILE.csv", "free lines to add (description,unit,quantity,material_cost,labour_hours[,note])"},
     {"number", "Q", "quote number (default: Q-<job reference>)"},
     {"date", "YYYY-MM-DD", "quote date (default: today)"},
     {"profile", "FILE", "rules profile JSON (default: the shipped profile)"},
     {"json", "", "print JSON"}},
    1,
    1,
    run_quote,
});

}  // namespace
}  // namespace mendwright::cli
