#pragma once
// Numbers and words as findings print them: "310", "0.1", "31.3", "January".

#include <string>

#include "planner/rules/finding.hpp"

namespace mendwright::rules {

// Fixed to at most `max_decimals` places, trailing zeros dropped: 31.0 -> "31", 0.1 -> "0.1",
// 1.3666 -> "1.37" (2 places).
std::string number_text(double value, int max_decimals = 2);

// "January" .. "December"; "month ?" outside 1..12.
std::string month_name(unsigned month);

FindingInput number_input(std::string name, double value, std::string unit, int max_decimals = 2);
FindingInput text_input(std::string name, std::string value);

}  // namespace mendwright::rules
