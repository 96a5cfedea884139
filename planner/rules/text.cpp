#include "planner/rules/text.hpp"

#include <charconv>
#include <cmath>
#include <cstdio>
#include <vector>

namespace mendwright::rules {

std::string number_text(double value, int max_decimals) {
    if (!std::isfinite(value)) return std::isnan(value) ? "nan" : (value > 0 ? "inf" : "-inf");
    // std::to_chars in fixed format with a precision gives exactly printf's "%.*f" (C++17
    // [charconv.to.chars]) without printf's locale and format parsing: rules format thousands of
    // numbers per assessment. Values too large for the buffer fall back to snprintf.
    char text[64];
    const auto [end, error] = std::to_chars(text, text + sizeof text, value, std::chars_format::fixed, max_decimals);
    std::string result;
    if (error == std::errc()) {
        result.assign(text, end);
    } else {
        std::vector<char> wide(std::size_t(std::snprintf(nullptr, 0, "%.*f", max_decimals, value)) + 1);
        std::snprintf(wide.data(), wide.size(), "%.*f", max_decimals, value);
        result = wide.data();
    }
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
