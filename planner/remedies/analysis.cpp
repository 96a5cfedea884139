#include "planner/remedies/analysis.hpp"

#include "planner/remedies/proposals.hpp"

namespace mendwright::remedies {

RemedySettings settings_from_profile(const rules::RulesProfile& profile) {
    RemedySettings settings;
    settings.electrode_stability_ohms = profile.electrode.stability_limit_ohms;
    settings.electrode_ideal_ohms = profile.electrode.target_ohms;
    settings.season_factor_by_month = profile.electrode.seasonal_factor_by_month;
    // An unknown month: the largest factor of the year (the safe side).
    double largest = 1.0;
    for (double f : profile.electrode.seasonal_factor_by_month) largest = std::max(largest, f);
    settings.season_factor_unknown_month = largest;
    settings.touch_limit_volts = profile.fault_protection.touch_voltage_limit_volts;
    settings.leakage_fraction = profile.rcd.leakage_fraction;
    settings.tails_limit_m = profile.tails.surface_max_length_m;
    return settings;
}

Analysis analyse(const model::Installation& installation, Assessor assess, const pricing::PriceBook& book,
                 const RemedySettings& settings, const Catalogue& catalogue) {
    Analysis analysis;
    analysis.settings = settings;
    analysis.verifier = std::make_unique<Verifier>(installation, std::move(assess));
    const ProposalContext context{installation, analysis.verifier->baseline(), catalogue, analysis.settings};
    analysis.options = propose_options(context);
    verify_options(*analysis.verifier, analysis.options);
    analysis.pricing_problems = cost_options(book, analysis.options);
    explain_options(analysis.options);
    analysis.rankings = rank_by_finding(analysis.verifier->baseline(), analysis.options);
    return analysis;
}

}  // namespace mendwright::remedies
