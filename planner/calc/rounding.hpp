#pragma once
// Rounding as printed tables round: half away from zero at a given number of decimals.

namespace mendwright::calc {

// Rounds `value` to `decimals` places, halves upwards (2.185 -> 2.19), as BS 7671 Table 41.3
// prints (read from the table itself: 0.95 x 230 / 100 = 2.185 is printed 2.19, D50 0.2185 as
// 0.22). A relative nudge of 1e-9 keeps a decimal half that binary cannot hold exactly
// (2.18499999...) on the side the printed table puts it.
double round_half_up(double value, int decimals);

}  // namespace mendwright::calc
