#pragma once
// A remedy option: one proposed piece of remedial work, described as data (what it changes,
// its bill of price-book items, its assumptions and prerequisites) plus the function that makes
// that change on a COPY of the installation. An option never says whether it worked: the rules,
// run again on the changed copy, decide (verify.hpp), and the verdict is stored beside it.

#include <functional>
#include <string>
#include <vector>

#include "planner/model/installation.hpp"
#include "planner/pricing/costing.hpp"
#include "planner/pricing/money.hpp"

namespace mendwright::remedies {

// What re-running the rules on the changed copy showed, by finding id.
struct Verification {
    bool done = false;
    std::vector<std::string> cleared;     // present before, gone after
    std::vector<std::string> still_open;  // targeted, still present after
    std::vector<std::string> introduced;  // absent before, present after
    std::vector<std::string> introduced_urgent;  // the introduced ones coded C1, C2 or FI
    bool clears_every_urgent_target = false;     // every targeted C1/C2/FI is among `cleared`
};

struct OptionCost {
    bool priced = false;
    pricing::Pence materials_pence = 0;
    pricing::Pence labour_pence = 0;
    pricing::Pence total_pence = 0;
    std::string problem;  // why it could not be priced (a code missing from the price book)
};

struct Option {
    // Stable and readable: "<kind>@<place>", e.g. "upstream-rcd-s100@board:cu1",
    // "electrodes-add-2@earth". Plans and quotes refer to options by it.
    std::string id;
    std::string kind;        // the catalogue entry
    std::string title;       // as the client reads it
    std::string description; // what is changed, in the trade's words
    std::vector<std::string> targets;  // finding ids it is meant to clear
    // Options that share a slot exclude each other (two changes to the same board or the same
    // place between meter and board).
    std::vector<std::string> slots;
    // Boards whose contents the change touches; verification looks at these, everything below
    // them and the boards above them. Empty with `whole_installation` for changes at the origin.
    std::vector<std::string> touched_boards;
    bool whole_installation = false;
    std::vector<pricing::BillLine> bill;
    std::vector<std::string> assumptions;
    std::vector<std::string> prerequisites;
    std::vector<std::string> leaves_open;  // what the option itself says it does not settle
    bool notifiable = false;
    std::string certificate;
    double hours_off_supply = 0.0;
    bool ideal_avoid = false;  // a cheaper variant the ideal plan passes over (catalogue flag)
    // The change, made on a copy. Never called on the surveyed installation itself.
    std::function<void(model::Installation&)> apply;

    // Filled in by verify_options, cost_options and rank_options.
    Verification verification;
    OptionCost cost;
    bool ranked_last = false;           // introduces an urgent finding, or clears nothing
    std::vector<std::string> rank_reasons;
};

// Applies an option to a copy of `installation` and returns the copy.
model::Installation applied_copy(const model::Installation& installation, const Option& option);

}  // namespace mendwright::remedies
