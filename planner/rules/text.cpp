#include "planner/rules/text.hpp"

#include <cmath>
#include <cstdio>

namespace mendwright::rules {

std::string number_text(double value, int max_decimals) {
    if (!std::isfinite(value)) return std::isnan(value) ? "nan" : (value > 0 ? "inf" : "-inf");
    char text[64];
    std::snprintf(text, sizeof text, "%.*f", max_decimals, value);
    std::string result = text;
    if (result.find('.') != std::string::npos) {
        while (!result.empty() && result.back() == '0') result.pop_back();
        if (!result.empty() && result.back() == '.') result.pop_back();
    }
    if (result == "-0") result = "0";
    return result;
}

std::string month_name(unsigned month) {
    static const char* const names[] = {"January", "February", "March",     "April",   "May",      "June",
                                        "July",    "August",   "September", "October", "November", "December"};
    if (month < 1 || month > 12) return "month ?";
    return names[month - 1];
}

FindingInput number_input(std::string name, double value, std::string unit, int max_decimals) {
    return FindingInput{std::move(name), number_text(value, max_decimals), std::move(unit)};
}

FindingInput text_input(std::string name, std::string value) {
    return FindingInput{std::move(name), std::move(value), ""};
}

}  // namespace mendwright::rules
