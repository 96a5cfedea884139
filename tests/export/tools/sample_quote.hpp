#pragma once
// An invented sample quote for the export tests and the export benchmark: the demo price book,
// three options, one extra line, a findings schedule and two plans. Nothing here is a real
// job, client or address. With `line_count` > 0 the works list is instead `line_count` lines
// cycling through the price book, 100 to an option, with awkward quantities (three decimals)
// to exercise every rounding rule. `findings` = Findings::none leaves the findings schedule empty
// (for the bulk works list, whose options clear none).
#include <cstddef>
#include <string>

#include "planner/pricing/quote.hpp"

namespace mendwright::test {

enum class Findings { listed, none };

Result<pricing::Quote> sample_quote(const std::string& price_book_folder, std::size_t line_count,
                                    Findings findings = Findings::listed);

}  // namespace mendwright::test
