#pragma once
// Extra lines a contractor adds to a quote beyond the plan's options (free lines: "lift and
// refit floorboards", "make good plaster"), kept in a small CSV beside the job so that a quote
// can be made again with the same lines. Same CSV rules as items.csv (RFC 4180, '#' comment
// rows, a header naming the columns in any order); docs/pricebook-format.md describes it.
//
//   description,unit,quantity,material_cost,labour_hours,note
//   "Lift and refit floorboards, landing",each,2,1.35,4,
//
// `note` may be left out of the header. Errors name the file, line and column:
// `extras.csv:3:quantity: expected a quantity like 2 or 1.5 (at most 1000000), got "two"`.

#include <filesystem>
#include <string_view>
#include <vector>

#include "planner/core/result.hpp"
#include "planner/pricing/works.hpp"

namespace mendwright::pricing {

Result<std::vector<ExtraLine>> parse_extra_lines(std::string_view csv_text, std::string_view file_name);

// Reads the file whole; errors name it as given.
Result<std::vector<ExtraLine>> read_extra_lines(const std::filesystem::path& file);

}  // namespace mendwright::pricing
