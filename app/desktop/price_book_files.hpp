#pragma once
// Writing a price book back to its two files (docs/pricebook-format.md): items.csv and
// settings.json, each checked by reading it back with the planner's own parsers before it
// replaces the old file, so an edit the reader would refuse is never saved.

#include <filesystem>
#include <string>

#include "planner/core/result.hpp"
#include "planner/pricing/price_book.hpp"

namespace mendwright::desktop {

std::string price_items_csv(const std::vector<pricing::PriceItem>& items);
std::string pricing_settings_json(const pricing::PricingSettings& settings);

// Writes both files into `folder` (created if missing), each through a temporary file.
Result<bool> write_price_book(const pricing::PriceBook& book, const std::filesystem::path& folder);

}  // namespace mendwright::desktop
