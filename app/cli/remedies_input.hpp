#pragma once
// What the options and plans commands both read: the survey document, the rules profile
// (shipped, or --profile FILE) and the price book (--pricebook DIR); then the remedies analysis.

#include <optional>
#include <string>

#include "app/cli/command.hpp"
#include "planner/model/installation.hpp"
#include "planner/pricing/price_book.hpp"
#include "planner/remedies/analysis.hpp"
#include "planner/rules/profile.hpp"

namespace mendwright::cli {

struct RemedyInputs {
    model::Installation installation;
    rules::RulesProfile profile;
    pricing::PriceBook book;
};

// Reads everything; on failure prints the error (naming the file and field) and returns the exit code.
std::optional<int> load_remedy_inputs(const ParsedArgs& args, CommandContext& context, const std::string& command,
                                      RemedyInputs& inputs);

// Runs the analysis; on a price-book problem prints every one and returns the exit code.
std::optional<int> run_remedy_analysis(const RemedyInputs& inputs, CommandContext& context, const std::string& command,
                                       remedies::Analysis& analysis);

// The cautions of both commands: caution_text and the electrode re-measurement.
std::string remedies_caution();

}  // namespace mendwright::cli
