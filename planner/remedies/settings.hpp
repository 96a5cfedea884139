#pragma once
// The numbers the remedies need besides the catalogue: taken from the rules profile by the
// caller (so the remedies propose against the same thresholds the rules check), with the
// defaults below for tests. None of them decides whether an option worked: the rules do.

#include <array>

namespace mendwright::remedies {

struct RemedySettings {
    // Electrode targets in the worst season (BS 7671 Table 41.5 note, read: above 200 ohms may
    // not be stable; trade practice aims below 100 ohms, common practice).
    double electrode_stability_ohms = 200.0;
    double electrode_ideal_ohms = 100.0;
    // Worst-season factor by month of measurement (index 0 = January); an assumption the user
    // can change in the rules profile (common practice, no standard gives it).
    std::array<double, 12> season_factor_by_month = {1.6, 1.6, 1.4, 1.2, 1.1, 1.0, 1.0, 1.0, 1.1, 1.3, 1.5, 1.6};
    double season_factor_unknown_month = 1.6;
    // BS 7671 411.5.3 (read): RA x IΔn <= 50 V.
    double touch_limit_volts = 50.0;
    // BS 7671 531.3.2 (read): accumulated protective-conductor current <= 30 % of IΔn.
    double leakage_fraction = 0.30;
    // Standing leakage assumed for a circuit with no measurement when splitting circuits
    // between RCDs (an assumption, stated on the option).
    double assumed_leakage_ma_per_circuit = 1.0;
    // Meter tails: longer than this needs attention (common practice, about 3 m).
    double tails_limit_m = 3.0;
};

}  // namespace mendwright::remedies
