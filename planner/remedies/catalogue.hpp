#pragma once
// The remedy catalogue: one entry per kind of remedial work, as data (planner/remedies/
// catalogue.json, embedded in the program at build time). An entry says which findings the
// kind is meant for, which price-book items and how many, the assumptions and prerequisites it
// carries, whether the work is notifiable and which certificate it needs, and how long the
// supply is off. The one function per kind that makes the change lives in propose_*.cpp.
//
//   const Catalogue& catalogue = default_catalogue();
//   const CatalogueEntry* entry = catalogue.find("upstream-rcd-s100");

#include <map>
#include <string>
#include <string_view>
#include <vector>

#include "planner/core/result.hpp"
#include "planner/pricing/costing.hpp"

namespace mendwright::remedies {

// One price-book item of a kind. `per` says what the quantity is multiplied by:
// "job" (once), "circuit" (each circuit the work touches), "rod" (each rod added),
// "metre" (each metre of cable run), "way" (each way of a board).
struct CatalogueItem {
    std::string code;
    std::string per = "job";
    double quantity = 1.0;
    std::string note;
};

struct CatalogueEntry {
    std::string kind;         // "upstream-rcd-s100"
    std::string title;        // "{board}" is replaced by the board's name
    std::string description;
    std::vector<std::string> target_rules;  // rule ids; a trailing '*' matches a prefix
    std::vector<CatalogueItem> items;
    std::vector<std::string> assumptions;
    std::vector<std::string> prerequisites;
    std::vector<std::string> leaves_open;
    bool notifiable = false;
    std::string certificate;
    double hours_off_fixed = 0.0;
    double hours_off_per_circuit = 0.0;
    bool ideal_avoid = false;
    std::map<std::string, double> parameters;  // kind-specific numbers, named with their units

    [[nodiscard]] bool targets_rule(std::string_view rule) const;
    // A parameter, or `fallback` when the entry does not set it.
    [[nodiscard]] double parameter(const std::string& name, double fallback) const;
    // The bill: each item's quantity times the count named by its `per`
    // (counts missing from `counts` are taken as 0; "job" is always 1).
    [[nodiscard]] std::vector<pricing::BillLine> bill(const std::map<std::string, double>& counts) const;
    [[nodiscard]] double hours_off_supply(int circuits) const;
};

struct Catalogue {
    std::vector<CatalogueEntry> entries;
    [[nodiscard]] const CatalogueEntry* find(std::string_view kind) const;
};

// Parses catalogue JSON; errors name the JSON path ("entries[3].items[0].per").
Result<Catalogue> parse_catalogue(std::string_view json_text);

// The catalogue shipped inside the program.
const Catalogue& default_catalogue();
std::string_view default_catalogue_json();

}  // namespace mendwright::remedies
