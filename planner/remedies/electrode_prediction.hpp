#pragma once
// The resistance of an earth electrode system after adding rods, predicted with BS 7430's method
// for rods in a line (calc/electrode.hpp), from a soil resistivity that is either measured or
// back-calculated from the measured RA of the existing electrode (uniform soil assumed).

#include <string>
#include <vector>

#include "planner/core/result.hpp"
#include "planner/model/installation.hpp"

namespace mendwright::remedies {

struct RodSpec {
    double length_m = 1.2;
    double diameter_m = 0.016;
    double spacing_m = 2.4;
};

struct ElectrodePrediction {
    double resistivity_ohm_m = 0.0;
    bool resistivity_measured = false;
    int existing_rods = 1;
    int added_rods = 0;
    double predicted_ohms = 0.0;     // in the season of the original measurement
    double season_factor = 1.0;
    double worst_season_ohms = 0.0;  // predicted x season factor
    std::vector<std::string> assumptions;
};

// Soil resistivity for the prediction: the measured figure, or the rod formula inverted for the
// existing electrode (its rods taken as a line at their recorded spacing; unknown length,
// diameter or spacing take the defaults in `defaults`, each stated as an assumption).
Result<double> soil_resistivity_ohm_m(const model::Electrode& electrode, const RodSpec& defaults,
                                      std::vector<std::string>& assumptions);

// The existing rods plus `added_rods` new ones in one line at `rods.spacing_m`, every rod taken
// as the shorter of the existing and the new length (on the safe side). At most 10 rods in all
// (BS 7430's table of lambda).
Result<ElectrodePrediction> predict_added_rods(const model::Electrode& electrode, int added_rods, const RodSpec& rods,
                                               double season_factor);

}  // namespace mendwright::remedies
