#include "planner/calc/leakage.hpp"

#include <string>

#include "planner/core/checks.hpp"

namespace mendwright::calc {

Result<LeakageBudget> leakage_budget(double rated_residual_amps, const std::vector<double>& standing_currents_amps,
                                     double allowed_fraction) {
    if (auto p = require_positive("rated_residual_amps", rated_residual_amps)) return *p;
    if (auto p = require_positive("allowed_fraction", allowed_fraction)) return *p;
    if (allowed_fraction > 1.0)
        return problem("allowed_fraction", "expected a fraction > 0 and <= 1, got " + number_text(allowed_fraction));
    double used_amps = 0.0;
    for (std::size_t i = 0; i < standing_currents_amps.size(); ++i) {
        const std::string field = "standing_currents_amps[" + std::to_string(i) + "]";
        if (auto p = require_non_negative(field, standing_currents_amps[i])) return *p;
        used_amps += standing_currents_amps[i];
    }
    // BS 7671 531.3.2: accumulated protective-conductor current <= fraction x IΔn.
    const double budget_amps = allowed_fraction * rated_residual_amps;
    return LeakageBudget{budget_amps, used_amps, budget_amps - used_amps, used_amps <= budget_amps * (1.0 + 1e-12)};
}

}  // namespace mendwright::calc
