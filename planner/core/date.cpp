#include "planner/core/date.hpp"

#include <chrono>
#include <cstdio>

namespace mendwright {

namespace {
std::chrono::sys_days to_sys_days(const Date& date) {
    return std::chrono::sys_days{std::chrono::year{date.year} / std::chrono::month{date.month} / std::chrono::day{date.day}};
}
Date from_sys_days(std::chrono::sys_days days) {
    const std::chrono::year_month_day ymd{days};
    return Date{int(ymd.year()), unsigned(ymd.month()), unsigned(ymd.day())};
}
}  // namespace

std::string Date::to_iso() const {
    char text[16];
    std::snprintf(text, sizeof text, "%04d-%02u-%02u", year, month, day);
    return text;
}

Date Date::plus_days(long days) const { return from_sys_days(to_sys_days(*this) + std::chrono::days{days}); }

long Date::days_until(const Date& later) const { return (to_sys_days(later) - to_sys_days(*this)).count(); }

Result<Date> parse_iso_date(std::string_view text, const std::string& field) {
    const auto fail = [&] { return problem(field, "expected a date as YYYY-MM-DD, got \"" + std::string(text) + "\""); };
    if (text.size() != 10 || text[4] != '-' || text[7] != '-') return fail();
    for (std::size_t i : {0u, 1u, 2u, 3u, 5u, 6u, 8u, 9u})
        if (text[i] < '0' || text[i] > '9') return fail();
    const int year = std::stoi(std::string(text.substr(0, 4)));
    const unsigned month = unsigned(std::stoi(std::string(text.substr(5, 2))));
    const unsigned day = unsigned(std::stoi(std::string(text.substr(8, 2))));
    const std::chrono::year_month_day ymd{std::chrono::year{year} / std::chrono::month{month} / std::chrono::day{day}};
    if (!ymd.ok()) return problem(field, "expected a real calendar date, got \"" + std::string(text) + "\"");
    return Date{year, month, day};
}

}  // namespace mendwright
