#include "planner/remedies/electrode_prediction.hpp"

#include <algorithm>

#include "planner/calc/electrode.hpp"
#include "planner/remedies/proposals.hpp"

namespace mendwright::remedies {

namespace {

// Resistance of the rods of `count` in a line in soil of 1 ohm metre: the group resistance is
// proportional to rho (rod formula and BS 7430's alpha are both linear in rho).
Result<double> ohms_per_unit_resistivity(int count, double length_m, double diameter_m, double spacing_m) {
    auto single = calc::rod_resistance_ohms(1.0, length_m, diameter_m);
    if (!single) return single.problem();
    if (count <= 1) return *single;
    auto group = calc::rod_group_resistance(*single, 1.0, spacing_m, calc::RodLayout::line, count);
    if (!group) return group.problem();
    return group->resistance_ohms;
}

}  // namespace

Result<double> soil_resistivity_ohm_m(const model::Electrode& electrode, const RodSpec& defaults,
                                      std::vector<std::string>& assumptions) {
    if (electrode.soil_resistivity_ohm_m) {
        assumptions.push_back("Soil resistivity " + detail::number_text(*electrode.soil_resistivity_ohm_m, 0) +
                              " Ω·m as measured, taken as uniform with depth.");
        return *electrode.soil_resistivity_ohm_m;
    }
    const std::optional<double> measured = electrode.remeasured_ra_ohms ? electrode.remeasured_ra_ohms : electrode.measured_ra_ohms;
    if (!measured) return problem("electrode.measured_ra_ohms", "is needed to estimate the soil resistivity");
    if (electrode.kind != model::ElectrodeKind::rod)
        return problem("electrode.kind", "only rod electrodes can be back-calculated; measure the soil resistivity");
    const double length = electrode.rod_length_m.value_or(defaults.length_m);
    const double diameter = electrode.rod_diameter_m.value_or(defaults.diameter_m);
    const double spacing = electrode.spacing_m.value_or(defaults.spacing_m);
    if (!electrode.rod_length_m)
        assumptions.push_back("Existing rod length not recorded: taken as " + detail::number_text(length, 1) + " m.");
    if (!electrode.rod_diameter_m)
        assumptions.push_back("Existing rod diameter not recorded: taken as " + detail::number_text(diameter * 1000.0, 0) + " mm.");
    const int count = std::clamp(electrode.count, 1, 10);
    auto per_unit = ohms_per_unit_resistivity(count, length, diameter, spacing);
    if (!per_unit) return per_unit.problem();
    // The rod formula (BS 7430; Dwight) solved for rho: rho = RA / R(rho = 1).
    const double rho = *measured / *per_unit;
    assumptions.push_back("Soil resistivity not measured: " + detail::number_text(rho, 0) +
                          " Ω·m back-calculated from the measured RA of " + detail::number_text(*measured, 0) +
                          " Ω with BS 7430's rod formula, assuming uniform soil (the RA includes the protective "
                          "conductor, so this errs high).");
    return rho;
}

Result<ElectrodePrediction> predict_added_rods(const model::Electrode& electrode, int added_rods, const RodSpec& rods,
                                               double season_factor) {
    ElectrodePrediction prediction;
    auto rho = soil_resistivity_ohm_m(electrode, rods, prediction.assumptions);
    if (!rho) return rho.problem();
    prediction.resistivity_ohm_m = *rho;
    prediction.resistivity_measured = electrode.soil_resistivity_ohm_m.has_value();
    prediction.existing_rods = std::max(1, electrode.count);
    prediction.added_rods = added_rods;
    const int total = prediction.existing_rods + added_rods;
    if (total > 10) return problem("added_rods", "BS 7430's table covers at most 10 rods in a line");
    const double length = std::min(electrode.rod_length_m.value_or(rods.length_m), rods.length_m);
    const double diameter = std::min(electrode.rod_diameter_m.value_or(rods.diameter_m), rods.diameter_m);
    // BS 7430: R of one rod (Dwight), then the line of N rods R_N = R (1 + lambda alpha) / N.
    auto single = calc::rod_resistance_ohms(*rho, length, diameter);
    if (!single) return single.problem();
    auto group = calc::rod_group_resistance(*single, *rho, rods.spacing_m, calc::RodLayout::line, total);
    if (!group) return group.problem();
    prediction.predicted_ohms = group->resistance_ohms;
    prediction.season_factor = season_factor;
    prediction.worst_season_ohms = group->resistance_ohms * season_factor;
    prediction.assumptions.push_back(std::to_string(total) + " rods of " + detail::number_text(length, 1) +
                                     " m in a line " + detail::number_text(rods.spacing_m, 1) +
                                     " m apart (BS 7430): about " + detail::number_text(group->resistance_ohms, 0) +
                                     " Ω in the season of the measurement, " +
                                     detail::number_text(prediction.worst_season_ohms, 0) + " Ω in the worst season (×" +
                                     detail::number_text(season_factor, 2) + ", the profile's seasonal factor).");
    return prediction;
}

}  // namespace mendwright::remedies
