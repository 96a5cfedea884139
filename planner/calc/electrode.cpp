#include "planner/calc/electrode.hpp"

#include <cmath>
#include <numbers>
#include <string>

#include "planner/core/checks.hpp"

namespace mendwright::calc {

namespace {

std::optional<Problem> check_rod_geometry(double length_m, double diameter_m) {
    if (auto p = require_positive("length_m", length_m)) return p;
    if (auto p = require_positive("diameter_m", diameter_m)) return p;
    if (length_m <= diameter_m)
        return problem("length_m", "expected a length greater than the diameter (" + number_text(diameter_m) +
                                       " m) for a driven rod, got " + number_text(length_m));
    return std::nullopt;
}

// ln(8L/d) - 1, the shape term of Dwight's formula; > 0 whenever L > d.
double shape_term(double length_m, double diameter_m) { return std::log(8.0 * length_m / diameter_m) - 1.0; }

}  // namespace

Result<double> rod_resistance_ohms(double resistivity_ohm_m, double length_m, double diameter_m) {
    if (auto p = require_positive("resistivity_ohm_m", resistivity_ohm_m)) return *p;
    if (auto p = check_rod_geometry(length_m, diameter_m)) return *p;
    // Dwight / IEEE Std 142 / BS 7430: R = rho / (2 pi L) (ln(8L/d) - 1).
    return resistivity_ohm_m / (2.0 * std::numbers::pi * length_m) * shape_term(length_m, diameter_m);
}

Result<double> resistivity_from_rod_ohm_m(double measured_ohms, double length_m, double diameter_m) {
    if (auto p = require_positive("measured_ohms", measured_ohms)) return *p;
    if (auto p = check_rod_geometry(length_m, diameter_m)) return *p;
    // The rod formula above solved for rho (uniform soil assumed).
    return measured_ohms * 2.0 * std::numbers::pi * length_m / shape_term(length_m, diameter_m);
}

Result<double> rod_group_lambda(RodLayout layout, int rods_per_side) {
    if (rods_per_side < 2 || rods_per_side > 10)
        return problem("rods_per_side",
                       "expected 2 to 10 rods (the range of BS 7430's lambda table), got " + std::to_string(rods_per_side));
    // BS 7430 factors lambda for n = 2..10 (memory).
    const double line[] = {1.00, 1.66, 2.15, 2.54, 2.87, 3.15, 3.39, 3.61, 3.81};
    const double hollow_square[] = {2.71, 4.51, 5.48, 6.13, 6.63, 7.03, 7.36, 7.65, 7.90};
    const auto index = static_cast<std::size_t>(rods_per_side - 2);
    return layout == RodLayout::line ? line[index] : hollow_square[index];
}

Result<RodGroup> rod_group_resistance(double single_rod_ohms, double resistivity_ohm_m, double spacing_m,
                                      RodLayout layout, int rods_per_side) {
    if (auto p = require_positive("single_rod_ohms", single_rod_ohms)) return *p;
    if (auto p = require_positive("resistivity_ohm_m", resistivity_ohm_m)) return *p;
    if (auto p = require_positive("spacing_m", spacing_m)) return *p;
    if (layout == RodLayout::line && (rods_per_side < 1 || rods_per_side > 10))
        return problem("rods_per_side", "expected 1 to 10 rods in a line (the range of BS 7430's lambda table), got " +
                                            std::to_string(rods_per_side));
    if (layout == RodLayout::line && rods_per_side == 1) return RodGroup{single_rod_ohms, 1, 0.0, 0.0};
    auto lambda = rod_group_lambda(layout, rods_per_side);
    if (!lambda) return lambda.problem();
    // BS 7430: N = n in a line; N = 4(n - 1) for a hollow square of n a side (memory).
    const int rods = layout == RodLayout::line ? rods_per_side : 4 * (rods_per_side - 1);
    // BS 7430: alpha = rho / (2 pi R s); R_group = R (1 + lambda alpha) / N.
    const double alpha = resistivity_ohm_m / (2.0 * std::numbers::pi * single_rod_ohms * spacing_m);
    const double group_ohms = single_rod_ohms * (1.0 + *lambda * alpha) / rods;
    return RodGroup{group_ohms, rods, *lambda, alpha};
}

Result<double> worst_season_resistance_ohms(double measured_ohms, double season_factor) {
    if (auto p = require_positive("measured_ohms", measured_ohms)) return *p;
    if (auto p = require_finite("season_factor", season_factor)) return *p;
    if (season_factor < 1.0)
        return problem("season_factor",
                       "expected a factor >= 1 (soil is at its worst when driest), got " + number_text(season_factor));
    // Common practice: RA_worst = RA x seasonal factor (the factor is an assumption).
    return measured_ohms * season_factor;
}

}  // namespace mendwright::calc
