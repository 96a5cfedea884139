#include "planner/calc/rounding.hpp"

#include <cmath>

namespace mendwright::calc {

double round_half_up(double value, int decimals) {
    const double scale = std::pow(10.0, decimals);
    const double scaled = std::fabs(value) * scale;
    const double rounded = std::floor(scaled * (1.0 + 1e-9) + 0.5) / scale;
    return value < 0.0 ? -rounded : rounded;
}

}  // namespace mendwright::calc
