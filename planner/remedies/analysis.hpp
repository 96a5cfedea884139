#pragma once
// The whole remedies step in one call, as the CLI, the app and the benchmark use it:
// findings -> proposed options -> each verified on a changed copy -> costed -> ranked.
//
//   const auto& profile = rules::default_rules_profile();
//   remedies::Assessor assess = [&](const model::Installation& i) { return rules::assess(i, profile); };
//   auto analysis = remedies::analyse(installation, assess, book, remedies::settings_from_profile(profile));
//   auto plan = remedies::least_cost_plan(*analysis.verifier, analysis.options, analysis.settings);

#include <memory>
#include <vector>

#include "planner/pricing/price_book.hpp"
#include "planner/remedies/catalogue.hpp"
#include "planner/remedies/option.hpp"
#include "planner/remedies/ranking.hpp"
#include "planner/remedies/settings.hpp"
#include "planner/remedies/verify.hpp"
#include "planner/rules/profile.hpp"

namespace mendwright::remedies {

struct Analysis {
    std::unique_ptr<Verifier> verifier;   // holds the baseline findings
    RemedySettings settings;
    std::vector<Option> options;          // in proposal order, verified, costed, explained
    std::vector<FindingRanking> rankings;
    std::vector<Problem> pricing_problems;  // codes missing from the price book
};

// The thresholds the rules check, for proposing against them.
RemedySettings settings_from_profile(const rules::RulesProfile& profile);

// `installation` must outlive the result (the verifier refers to it).
Analysis analyse(const model::Installation& installation, Assessor assess, const pricing::PriceBook& book,
                 const RemedySettings& settings, const Catalogue& catalogue = default_catalogue());

}  // namespace mendwright::remedies
