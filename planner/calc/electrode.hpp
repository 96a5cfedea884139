#pragma once
// Earth electrodes: resistance to earth of one driven rod and of rods in a line or a hollow
// square, soil resistivity from a measured rod, and a worst-season figure. All assume uniform
// soil; a measured RA always takes precedence over these estimates.

#include "planner/core/result.hpp"

namespace mendwright::calc {

// Resistance to earth of one vertical rod, ohms (Dwight's formula; IEEE Std 142; BS 7430):
//   R = rho / (2 pi L) x (ln(8L / d) - 1)
// - resistivity_ohm_m: soil resistivity rho, > 0.
// - length_m: driven length L, > 0 and longer than the diameter (the formula is for a slender rod).
// - diameter_m: rod diameter d, > 0.
Result<double> rod_resistance_ohms(double resistivity_ohm_m, double length_m, double diameter_m);

// The rod formula inverted: the uniform-soil resistivity that gives a measured single-rod
// resistance, ohm metres: rho = R x 2 pi L / (ln(8L / d) - 1). Real soil is layered and this
// is an equivalent figure only.
// - measured_ohms: the rod's measured resistance to earth, > 0.
Result<double> resistivity_from_rod_ohm_m(double measured_ohms, double length_m, double diameter_m);

enum class RodLayout { line, hollow_square };

// Rods in a line, or a hollow square with `rods_per_side` rods along each side.
struct RodGroup {
    double resistance_ohms;  // of the whole group
    int rods;                // total number of rods
    double lambda;           // BS 7430 group factor (memory, see rod_group_lambda)
    double alpha;            // rho / (2 pi R s)
};

// BS 7430 group factor lambda for n rods in a line or n rods a side of a hollow square,
// n = 2..10 (memory). Problem on "rods_per_side" outside that range.
Result<double> rod_group_lambda(RodLayout layout, int rods_per_side);

// Resistance of a group of equal rods (BS 7430, read for the line; the hollow-square count
// N = 4(n - 1), memory):
//   R_group = R (1 + lambda alpha) / N,  alpha = rho / (2 pi R s)
// - single_rod_ohms: R of one rod (rod_resistance_ohms), > 0.
// - resistivity_ohm_m: rho, > 0.
// - spacing_m: s, the distance between neighbouring rods, > 0. The method is meant for
//   spacing of at least the rod length; closer rods share more soil than it allows for.
// - rods_per_side: n, rods in the line, or along each side of the square; 1..10 for a line
//   (1 gives the single rod), 2..10 for a square.
Result<RodGroup> rod_group_resistance(double single_rod_ohms, double resistivity_ohm_m, double spacing_m,
                                      RodLayout layout, int rods_per_side);

// A worst-season estimate from a resistance measured in another season: RA x factor. No
// standard gives the factor; it is the user's assumption (common practice), >= 1.
Result<double> worst_season_resistance_ohms(double measured_ohms, double season_factor);

}  // namespace mendwright::calc
