#pragma once
// Input checks shared by calc functions: each returns the Problem to report, or nothing.

#include <cmath>
#include <optional>
#include <string>

#include "planner/core/result.hpp"

namespace mendwright {

// Shortest decimal text of a number, for error messages ("got -3", "got nan").
std::string number_text(double value);

inline std::optional<Problem> require_finite(const std::string& field, double value) {
    if (!std::isfinite(value)) return problem(field, "expected a finite number, got " + number_text(value));
    return std::nullopt;
}

inline std::optional<Problem> require_positive(const std::string& field, double value) {
    if (auto p = require_finite(field, value)) return p;
    if (value <= 0.0) return problem(field, "expected a number > 0, got " + number_text(value));
    return std::nullopt;
}

inline std::optional<Problem> require_non_negative(const std::string& field, double value) {
    if (auto p = require_finite(field, value)) return p;
    if (value < 0.0) return problem(field, "expected a number >= 0, got " + number_text(value));
    return std::nullopt;
}

}  // namespace mendwright
