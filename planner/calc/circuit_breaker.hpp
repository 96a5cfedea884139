#pragma once
// Circuit-breakers to BS EN 60898-1 as fault protection in a TN system: the instantaneous
// tripping bands and the largest earth fault loop impedance Zs with which the breaker still
// disconnects within the time Table 41.1 requires (BS 7671:2018+A2, 411.4.4 and Table 41.3).

#include "planner/core/result.hpp"

namespace mendwright::calc {

enum class BreakerCurve { b, c, d };

// Instantaneous tripping band, as multiples of the rated current In: the breaker may trip
// instantaneously above `lower_multiple` and must at `upper_multiple`.
struct TripBand {
    double lower_multiple;
    double upper_multiple;
};

// IEC/BS EN 60898-1, standard ranges of instantaneous tripping: B >3-5 In, C >5-10 In,
// D >10-20 In (read; the clause number in the standard is not checked here).
TripBand instantaneous_trip_band(BreakerCurve curve);

// The breaker's rated current In, amperes: the breakers in scope of IEC 60898-1 go to 125 A
// (memory). Rejects zero, negatives, non-finite values and ratings above 125 A.
inline constexpr double breaker_largest_rating_amps = 125.0;

// BS 7671 Appendix 3 / 411.4.4: Cmin, the factor for the lowest supply voltage.
inline constexpr double default_cmin = 0.95;
// BS 7671 nominal U0 of the default profile, volts.
inline constexpr double default_u0_volts = 230.0;

// Maximum Zs (ohms) for a BS EN 60898-1 circuit-breaker: Zs_max = Cmin x U0 / Ia, where
// Ia = upper instantaneous multiple x In (411.4.4; Appendix 3; Table 41.3 is this formula
// rounded half up to 2 decimals).
// - rating_amps: In, 0 < In <= 125 A.
// - disconnection_time_s: 0.4 or 5 (the two parts of Table 41.3). Curves B and C give the
//   same value at both, since the instantaneous trip is well inside either time. Curve D at
//   5 s is refused: the table's values there are believed to use 10 In (memory) and are
//   unsettled here; the 0.4 s value is the safe side for a caller that needs one.
// - u0_volts: nominal line-to-earth voltage, > 0.
// - cmin: 0 < Cmin <= 1.
Result<double> breaker_max_zs_ohms(BreakerCurve curve, double rating_amps, double disconnection_time_s = 0.4,
                                   double u0_volts = default_u0_volts, double cmin = default_cmin);

// GN3 / BS 7671 Appendix 3 rule of thumb (read): a Zs measured at ambient temperature is
// compared with 0.8 x the tabulated maximum, allowing for the conductors' rise to their
// operating temperature under fault.
inline constexpr double ambient_measurement_factor = 0.8;

// The limit for a measured Zs: 0.8 x max_zs_ohms. Rejects a maximum that is not > 0.
Result<double> measured_zs_limit_ohms(double max_zs_ohms);

}  // namespace mendwright::calc
