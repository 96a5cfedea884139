#include "planner/rules/rule_table.hpp"

#include "planner/rules/checks/checks.hpp"

namespace mendwright::rules {

const std::vector<RuleSpec>& rule_table() {
    static const std::vector<RuleSpec> table = {
        {"tt.fault_protection", {"no_rcd", "ra_over_limit", "not_recorded"}, &checks::tt_fault_protection},
        {"additional_protection", {"outdoor", "sockets", "lighting", "concealed_cable"}, &checks::additional_protection},
        {"electrode.resistance", {"above_stability_limit", "above_target"}, &checks::electrode_resistance},
        {"electrode.worst_season", {"fails_when_dry"}, &checks::electrode_worst_season},
        {"tails.origin_protection", {"surface", "concealed_in_wall", "buried"}, &checks::tails_origin_protection},
        {"rcd.selectivity", {"not_selective"}, &checks::rcd_selectivity},
        {"rcd.standing_leakage", {"over_budget"}, &checks::rcd_standing_leakage},
        {"zs.maximum", {"over_breaker_maximum", "over_breaker_maximum_rcd_covers", "over_rcd_maximum"}, &checks::zs_maximum},
        {"device.breaking_capacity", {"below_fault_current"}, &checks::breaking_capacity},
        {"rcd.trip_time", {"too_slow"}, &checks::rcd_trip_time},
        {"board.combustible_enclosure", {"dwelling"}, &checks::combustible_enclosure},
        {"recorded", {}, &checks::recorded_observations},
        {"new_work.additional_protection", {"sockets", "lighting", "outdoor", "concealed_cable"},
         &checks::new_work_additional_protection},
        {"new_work.enclosure", {"combustible_in_dwelling"}, &checks::new_work_enclosure},
        {"new_work.surge_protection", {"not_fitted"}, &checks::new_work_surge_protection},
    };
    return table;
}

}  // namespace mendwright::rules
