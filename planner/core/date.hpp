#pragma once
// Calendar dates as the trade writes them on certificates: ISO 8601 text "YYYY-MM-DD" at the
// boundary, a proleptic Gregorian day count inside (std::chrono's civil calendar).

#include <compare>
#include <string>
#include <string_view>

#include "planner/core/result.hpp"

namespace mendwright {

struct Date {
    int year = 1970;
    unsigned month = 1;  // 1..12
    unsigned day = 1;    // 1..31

    auto operator<=>(const Date&) const = default;

    [[nodiscard]] std::string to_iso() const;             // "2026-12-02"
    [[nodiscard]] Date plus_days(long days) const;
    [[nodiscard]] long days_until(const Date& later) const;  // later - this, in days
};

// Parses "YYYY-MM-DD"; `field` names the input in the Problem.
Result<Date> parse_iso_date(std::string_view text, const std::string& field);

}  // namespace mendwright
