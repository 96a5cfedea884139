#pragma once
// The price book: items a contractor edits in a spreadsheet (items.csv) and a small settings
// file (settings.json) with the labour rate, markup, VAT, contingency and currency. The format
// is described in docs/pricebook-format.md. Parsing takes text; read_price_book takes the
// folder it is handed and reads exactly the two files in it.
//
// Example:
//   auto book = mendwright::pricing::read_price_book("pricebook-demo");
//   if (!book) std::cerr << book.problem().to_string() << "\n";
//   const PriceItem* rod = book->find("EARTH-ROD-1M2");

#include <filesystem>
#include <string>
#include <string_view>
#include <vector>

#include "planner/core/result.hpp"
#include "planner/pricing/money.hpp"

namespace mendwright::pricing {

struct PriceItem {
    std::string code;         // readable and unique: "RCD-S100-ENCL"
    std::string description;  // as the client reads it on the quote
    std::string unit;         // "each", "m", "visit", "hour", "circuit"
    Pence material_pence = 0;          // our cost of the material per unit (before markup)
    MilliHours labour_milli_hours = 0; // labour per unit
    std::string category;     // groups the materials list: "protection", "earthing", "testing" ...
    int line = 0;             // line of items.csv that defines it
};

// A contingency for faults found during the work: a percentage of the works subtotal, or a
// fixed amount. Exactly one of the two is used.
struct Contingency {
    bool is_percentage = true;
    BasisPoints percent_bp = 0;  // when is_percentage
    Pence amount_pence = 0;      // otherwise
};

struct PricingSettings {
    std::string currency_code = "GBP";   // ISO 4217 code, three capital letters
    std::string currency_symbol = "£";   // shown in the workbook's number formats
    Pence labour_rate_per_hour_pence = 0;
    BasisPoints markup_on_materials_bp = 0;  // the labour rate is a charge-out rate: no markup on it
    BasisPoints vat_bp = 0;
    Contingency contingency;
    int quote_validity_days = 30;
};

struct PriceBook {
    std::vector<PriceItem> items;
    PricingSettings settings;

    // Nothing when the code is not in the book. Codes are compared exactly.
    [[nodiscard]] const PriceItem* find(std::string_view code) const;
};

// items.csv text. Header row naming the six columns (any order): code, description, unit,
// material_cost, labour_hours, category. Rows whose first field starts with '#' are comments.
// Errors name the file, line and column: `items.csv:12:material_cost: expected an amount like
// 12.50, got "twelve"`.
Result<std::vector<PriceItem>> parse_price_items(std::string_view csv_text, std::string_view file_name = "items.csv");

// settings.json text. Errors name the file and field: `settings.json:vat_percent: ...`.
Result<PricingSettings> parse_pricing_settings(std::string_view json_text,
                                               std::string_view file_name = "settings.json");

// Reads `<folder>/items.csv` and `<folder>/settings.json`.
Result<PriceBook> read_price_book(const std::filesystem::path& folder);

}  // namespace mendwright::pricing
