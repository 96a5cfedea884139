// rules::number_text formats numbers with std::to_chars (fixed, with a precision) for speed; these
// checks hold it to the C library's printf "%.*f" (C11 7.21.6.1, the %f conversion: the value
// rounded to the precision), with trailing zeros dropped, over values where the rounding matters.
// remedies::detail::number_text does the same for option texts; it is held to what an output
// stream prints with std::fixed and setprecision (C++ [facet.num.put.virtuals]: %f).
#include <catch2/catch.hpp>

#include <cstdio>
#include <iomanip>
#include <sstream>
#include <string>

#include "planner/remedies/proposals.hpp"
#include "planner/rules/text.hpp"

namespace {

std::string printf_text(double value, int decimals) {
    char text[512];
    std::snprintf(text, sizeof text, "%.*f", decimals, value);
    std::string result = text;
    if (result.find('.') != std::string::npos) {
        while (result.back() == '0') result.pop_back();
        if (result.back() == '.') result.pop_back();
    }
    if (result == "-0") result = "0";
    return result;
}

}  // namespace

TEST_CASE("number_text: worked values as findings print them", "[rules][text]") {
    using mendwright::rules::number_text;
    CHECK(number_text(31.0) == "31");
    CHECK(number_text(0.1) == "0.1");
    CHECK(number_text(1.3666) == "1.37");
    CHECK(number_text(0.03, 3) == "0.03");
    CHECK(number_text(-0.001) == "0");  // rounds to -0.00: printed as 0
    // 0.125 and 2.675 are not what they look like in binary; %f rounds the exact binary value
    // (0.125 exactly: a tie, printed to even by glibc; 2.675 is 2.67499999...).
    CHECK(number_text(2.675) == "2.67");
    CHECK(number_text(1e300, 1).size() == 301);  // longer than the fast path's buffer
}

TEST_CASE("number_text: the same text as printf %.*f over many values and precisions", "[rules][text]") {
    using mendwright::rules::number_text;
    int checked = 0;
    for (int decimals = 0; decimals <= 3; ++decimals) {
        for (int i = -20000; i <= 20000; i += 7) {
            for (double scale : {0.001, 0.0125, 0.1, 1.0, 3.3, 1000.0}) {
                const double value = i * scale;
                INFO("value " << value << " decimals " << decimals);
                REQUIRE(number_text(value, decimals) == printf_text(value, decimals));
                ++checked;
            }
        }
    }
    for (double value : {0.005, 0.015, 0.025, 0.125, 0.375, 1.005, 2.5, 3.5, 1e15 + 0.5, 123456.789})
        for (int decimals = 0; decimals <= 3; ++decimals) CHECK(number_text(value, decimals) == printf_text(value, decimals));
    CHECK(checked > 100000);
}

TEST_CASE("number_text: remedies' option texts as an output stream prints them with std::fixed", "[rules][text]") {
    for (int decimals = 0; decimals <= 2; ++decimals) {
        for (int i = -5000; i <= 5000; i += 3) {
            for (double scale : {0.005, 0.1, 1.0, 2.4}) {
                const double value = i * scale;
                std::ostringstream stream;
                stream << std::fixed << std::setprecision(decimals) << value;
                INFO("value " << value << " decimals " << decimals);
                REQUIRE(mendwright::remedies::detail::number_text(value, decimals) == stream.str());
            }
        }
    }
}
