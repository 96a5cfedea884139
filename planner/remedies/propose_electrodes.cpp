// Kind 5: more earth rods. Offered as the smallest number of added rods whose predicted RA meets
// the stability threshold in the worst season, and the number that meets the ideal target; the
// prediction goes into the changed copy as the electrode's RA (in the season it was measured,
// so the rules apply the same seasonal factor), and every option carries the re-measurement.
#include <algorithm>
#include <string_view>

#include "planner/remedies/electrode_prediction.hpp"
#include "planner/remedies/model_edits.hpp"
#include "planner/remedies/proposals.hpp"

namespace mendwright::remedies {

double season_factor_for(const model::Electrode& electrode, const RemedySettings& settings) {
    const std::optional<Date> on = electrode.remeasured_ra_ohms ? electrode.remeasured_on : electrode.measured_on;
    if (!on || on->month < 1 || on->month > 12) return settings.season_factor_unknown_month;
    return settings.season_factor_by_month[on->month - 1];
}

namespace {

// The rule whose "note" case says RA is above the ideal target (planner/rules/checks/electrode_resistance.cpp).
constexpr std::string_view ideal_target_rule = "electrode.resistance";

void add_rods(model::Installation& installation, int total_rods, const RodSpec& rods, double predicted_ohms) {
    if (!installation.electrode) return;
    model::Electrode& electrode = *installation.electrode;
    // The prediction stands in for a measurement until the rods are in and re-measured.
    if (electrode.remeasured_ra_ohms) electrode.measured_on = electrode.remeasured_on;
    electrode.remeasured_ra_ohms.reset();
    electrode.remeasured_on.reset();
    electrode.measured_ra_ohms = predicted_ohms;
    electrode.count = total_rods;
    electrode.layout = model::ElectrodeLayout::line;
    electrode.rod_length_m = std::min(electrode.rod_length_m.value_or(rods.length_m), rods.length_m);
    electrode.spacing_m = rods.spacing_m;
}

}  // namespace

std::vector<Option> propose_electrodes(const ProposalContext& context) {
    std::vector<Option> options;
    const CatalogueEntry* entry = context.catalogue.find("electrodes-add");
    if (!entry || !context.installation.electrode) return options;
    if (context.installation.supply.earthing != model::EarthingArrangement::tt) return options;
    const model::Electrode& electrode = *context.installation.electrode;
    auto targets = detail::targets_for(*entry, context.findings, {});
    // Between the ideal target and the stability threshold the rules note RA only (code "note"):
    // nothing urgent, but the ideal plan aims for the target, so the ideal rod count is offered
    // for that note as well. With nothing but the note to clear, the stability count is not
    // offered (the electrode is already stable).
    const bool only_ideal_target = targets.empty();
    for (const auto& finding : context.findings)
        if (finding.code == rules::Code::note && finding.rule == ideal_target_rule) targets.push_back(finding.id);
    if (targets.empty()) return options;
    RodSpec rods;
    rods.length_m = entry->parameter("rod_length_m", 1.2);
    rods.diameter_m = entry->parameter("rod_diameter_m", 0.016);
    rods.spacing_m = entry->parameter("spacing_m", 2.4);
    const double factor = season_factor_for(electrode, context.settings);
    const int existing = std::max(1, electrode.count);
    // Smallest n for the stability threshold, then for the ideal target.
    int n_stability = 0;
    int n_ideal = 0;
    ElectrodePrediction stability_prediction, ideal_prediction;
    for (int n = 1; existing + n <= 10; ++n) {
        auto prediction = predict_added_rods(electrode, n, rods, factor);
        if (!prediction) break;
        if (n_stability == 0 && prediction->worst_season_ohms <= context.settings.electrode_stability_ohms) {
            n_stability = n;
            stability_prediction = *prediction;
        }
        if (prediction->worst_season_ohms <= context.settings.electrode_ideal_ohms) {
            n_ideal = n;
            ideal_prediction = *prediction;
            break;
        }
    }
    auto make = [&](int n, const ElectrodePrediction& prediction, const std::string& aim) {
        Option option = detail::from_entry(
            *entry, "electrodes-add-" + std::to_string(n) + "@earth",
            {{"n", std::to_string(n)}, {"length", detail::number_text(rods.length_m, 1)},
             {"spacing", detail::number_text(rods.spacing_m, 1)}, {"aim", aim}},
            {{"rod", n}, {"metre", n * rods.spacing_m}}, 0);
        for (const auto& text : prediction.assumptions) option.assumptions.push_back(text);
        option.targets = targets;
        option.slots = {"electrode"};
        option.whole_installation = true;
        option.ideal_avoid = aim != "ideal";
        const int total = existing + n;
        const double predicted = prediction.predicted_ohms;
        option.apply = [total, rods, predicted](model::Installation& copy) { add_rods(copy, total, rods, predicted); };
        return option;
    };
    if (n_stability > 0 && n_stability != n_ideal && !only_ideal_target) options.push_back(make(n_stability, stability_prediction, "stability"));
    if (n_ideal > 0) options.push_back(make(n_ideal, ideal_prediction, "ideal"));
    return options;
}

}  // namespace mendwright::remedies
