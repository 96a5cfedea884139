#pragma once
// Whole-installation plans built from verified, costed options:
//   least-cost  clears every C1, C2 and FI that some option can clear, at the least total cost
//               (exact search, cover_search.hpp);
//   ideal       clears everything any option can clear, passing over the cheaper variants the
//               catalogue marks (a device per circuit rather than shared RCDs, the ideal
//               electrode target rather than the stability threshold) unless nothing else will do;
//   custom      the options the user chose.
// Options interact, so every plan is verified again as a whole: all its options applied to one
// copy, the rules run once, and the plan's residual findings are what that run leaves. When the
// combined run leaves open an urgent finding the search counted as cleared, that combination is
// set aside and the search runs again (a few rounds), so the plan shown is one that verifies.

#include <optional>
#include <string>
#include <vector>

#include "planner/core/result.hpp"
#include "planner/remedies/option.hpp"
#include "planner/remedies/settings.hpp"
#include "planner/remedies/verify.hpp"
#include "planner/rules/finding.hpp"

namespace mendwright::remedies {

struct PlanFigures {
    pricing::Pence materials_pence = 0;
    pricing::Pence labour_pence = 0;
    pricing::Pence total_pence = 0;          // before markup, contingency and VAT
    int residual_c1 = 0, residual_c2 = 0, residual_c3 = 0, residual_fi = 0;
    std::vector<std::string> residual_ids;    // every finding (notes excluded) left after the plan
    std::vector<std::string> introduced_ids;  // findings the plan brings that were not there before
    int circuits_lost_on_one_trip = 0;        // the most final circuits one earth fault switches off
    std::optional<double> worst_touch_volts;  // TT: worst-season RA x IΔn of the device giving fault protection
    std::string touch_note;
    double hours_off_supply = 0.0;
    std::vector<std::string> certificates;
    bool notifiable = false;
};

struct Plan {
    std::string name;                     // "least-cost", "ideal", "custom"
    std::vector<std::string> option_ids;  // in the order they are applied
    PlanFigures figures;
    std::vector<std::string> notes;       // what could not be cleared, rounds of re-search, ...
};

// Figures of an installation after a plan (or of the surveyed one, with no options).
PlanFigures plan_figures(const model::Installation& changed, const std::vector<rules::Finding>& before,
                         const std::vector<rules::Finding>& after, const std::vector<const Option*>& options,
                         const RemedySettings& settings);

// The three kinds of plan. `options` verified, costed and explained first.
Plan least_cost_plan(Verifier& verifier, const std::vector<Option>& options, const RemedySettings& settings);
Plan ideal_plan(Verifier& verifier, const std::vector<Option>& options, const RemedySettings& settings);
// Errors: an id that is not an option ("--choose: no option \"x\""), two options that exclude
// each other.
Result<Plan> custom_plan(Verifier& verifier, const std::vector<Option>& options, const std::vector<std::string>& chosen_ids,
                         const RemedySettings& settings);

}  // namespace mendwright::remedies
