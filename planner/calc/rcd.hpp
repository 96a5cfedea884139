#pragma once
// Residual current devices (RCDs, RCBOs): the largest earth path resistance for a touch-voltage
// limit (BS 7671 411.5.3, Table 41.5), the break-time limits of BS EN 61008-1 / 61009-1, and
// selectivity between two RCDs in series.

#include <optional>
#include <string>
#include <vector>

#include "planner/core/result.hpp"

namespace mendwright::calc {

// General (no intentional delay) or time-delayed S-type.
enum class RcdType { general, time_delayed };

// BS 7671 411.5.3: the conventional touch-voltage limit UL, volts.
inline constexpr double default_touch_limit_volts = 50.0;

// Maximum RA (electrode plus protective-conductor resistance), ohms, so that a residual
// current of IΔn raises exposed metalwork no higher than the touch limit:
// RA_max = UL / IΔn (BS 7671 411.5.3, RA x IΔn <= 50 V; Table 41.5 prints it rounded to whole
// ohms: 30 mA 1667, 100 mA 500, 300 mA 167, 500 mA 100).
// - rated_residual_amps: IΔn in amperes (0.03 for 30 mA), > 0.
// - touch_limit_volts: UL, > 0 (50 V by default).
Result<double> rcd_max_earth_resistance_ohms(double rated_residual_amps,
                                             double touch_limit_volts = default_touch_limit_volts);

// BS 7671 Table 41.5 note (read): an RA above 200 ohms may not be stable.
inline constexpr double ra_stability_limit_ohms = 200.0;

// BS EN 61008-1 / 61009-1 (read): a residual current of 0.5 IΔn must not trip the device.
inline constexpr double non_operating_multiple = 0.5;

// Time limits at one test current.
struct RcdTimeLimits {
    double max_break_s;
    std::optional<double> min_non_actuating_s;  // S-type only: the device must not break sooner
};

// BS EN 61008-1 / 61009-1 limits at `residual_multiple` x IΔn, which must be 1, 2 or 5 (the
// tabulated test currents):
//   general:       max break 0.3 s, 0.15 s, 0.04 s (read)
//   S-type:        max break 0.5 s, 0.2 s (memory), 0.15 s (read)
//   S-type:        min non-actuating 0.13 s, 0.06 s, 0.05 s (read)
Result<RcdTimeLimits> rcd_time_limits(RcdType type, double residual_multiple);

// A measured trip time against those limits.
struct RcdTripCheck {
    bool within;
    RcdTimeLimits limits;
    std::string reason;  // why it passes or fails, in words a report can quote
};

// - residual_multiple: 1, 2 or 5.
// - measured_time_s: the trip time measured at that current, >= 0.
Result<RcdTripCheck> check_rcd_trip_time(RcdType type, double residual_multiple, double measured_time_s);

// Whether two RCDs in series discriminate: upstream time-delayed (S-type) and IΔn upstream
// >= 3 x IΔn downstream (general rule read; its home, BS 7671 536.4.1.4, from memory).
struct RcdSelectivity {
    bool selective;
    std::vector<std::string> reasons;  // one line per condition, met or not
};

// - upstream_idn_amps, downstream_idn_amps: IΔn of each device in amperes, > 0.
Result<RcdSelectivity> rcd_selectivity(RcdType upstream_type, double upstream_idn_amps, RcdType downstream_type,
                                       double downstream_idn_amps);

// BS 7671 536.4.1.4 (memory): the ratio of upstream to downstream IΔn for selectivity.
inline constexpr double selectivity_ratio = 3.0;

// Additional protection (BS 7671 415.1.1, read): IΔn <= 30 mA and a break within 40 ms at
// 5 IΔn, which only a general (not time-delayed) device gives.
Result<bool> rcd_gives_additional_protection(RcdType type, double rated_residual_amps);

}  // namespace mendwright::calc
