#pragma once
// Standing protective-conductor current on one RCD against the share of IΔn it may use
// (BS 7671:2018+A2, 531.3.2: accumulated protective-conductor current <= 30 % of IΔn).

#include <vector>

#include "planner/core/result.hpp"

namespace mendwright::calc {

// BS 7671 531.3.2 (read): the default share of IΔn.
inline constexpr double default_leakage_fraction = 0.30;

struct LeakageBudget {
    double budget_amps;     // fraction x IΔn
    double used_amps;       // sum of the standing currents
    double remaining_amps;  // budget - used; negative when over budget
    bool within;            // used <= budget
};

// - rated_residual_amps: IΔn of the RCD, amperes, > 0.
// - standing_currents_amps: the protective-conductor current of each circuit or appliance
//   behind it, amperes, each >= 0 (an empty list uses nothing).
// - allowed_fraction: 0 < fraction <= 1 (0.30 by default).
Result<LeakageBudget> leakage_budget(double rated_residual_amps, const std::vector<double>& standing_currents_amps,
                                     double allowed_fraction = default_leakage_fraction);

}  // namespace mendwright::calc
