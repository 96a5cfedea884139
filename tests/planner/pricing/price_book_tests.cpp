// Price-book validation: every error path names the file, the line and the column (items.csv)
// or the field (settings.json), and says what was expected. Format: docs/pricebook-format.md.
#include <catch2/catch.hpp>

#include <nlohmann/json.hpp>
#include <string>

#include "planner/pricing/price_book.hpp"

using namespace mendwright::pricing;

namespace {

const std::string header = "code,description,unit,material_cost,labour_hours,category\n";

std::string items_problem(const std::string& text) {
    const auto items = parse_price_items(text, "items.csv");
    REQUIRE_FALSE(items.ok());
    return items.problem().to_string();
}

const std::string good_settings = R"({
  "format": "mendwright-price-settings", "version": 1, "note": "invented",
  "currency": "GBP", "currency_symbol": "£", "labour_rate_per_hour": "47.50",
  "markup_on_materials_percent": "15", "vat_percent": "20",
  "contingency": {"percent": "10"}, "quote_validity_days": 30
})";

// good_settings with one field replaced (or removed when `value` is empty).
std::string settings_with(const std::string& field, const std::string& value) {
    auto json = nlohmann::json::parse(good_settings);
    if (value.empty()) {
        json.erase(field);
    } else {
        json[field] = nlohmann::json::parse(value);
    }
    return json.dump();
}

std::string settings_problem(const std::string& text) {
    const auto settings = parse_pricing_settings(text, "settings.json");
    REQUIRE_FALSE(settings.ok());
    return settings.problem().to_string();
}

}  // namespace

TEST_CASE("pricing book: items parse with quoted commas, comments, padding and any column order", "[pricing][book]") {
    const auto items = parse_price_items(
        "# invented prices,,,,,\n"
        "category,code,unit,description,labour_hours,material_cost,,\n"
        "protection,RCD-S100-ENCL,each,\"RCD 100 mA, S-type, in enclosure\",1.5,68.40,,\n"
        "testing,TEST-IR-CIRCUIT,circuit,Insulation resistance test,0.35,0\n",
        "items.csv");
    REQUIRE(items.ok());
    REQUIRE(items->size() == 2);
    const PriceItem& rcd = items->at(0);
    CHECK(rcd.code == "RCD-S100-ENCL");
    CHECK(rcd.description == "RCD 100 mA, S-type, in enclosure");
    CHECK(rcd.material_pence == 6840);
    CHECK(rcd.labour_milli_hours == 1500);
    CHECK(rcd.category == "protection");
    CHECK(rcd.line == 3);
    CHECK(items->at(1).material_pence == 0);
    CHECK(items->at(1).labour_milli_hours == 350);
}

TEST_CASE("pricing book: a bad material cost names file, line, column and what was expected", "[pricing][book]") {
    std::string text = header;
    for (int i = 2; i < 12; ++i) text += "ITEM-" + std::to_string(i) + ",Item,each,1.00,0,misc\n";
    text += "ITEM-12,Item,each,twelve,0.5,misc\n";
    CHECK(items_problem(text) ==
          "items.csv:12:material_cost: expected an amount like 12.50 (no currency sign, at most 2 decimal places, at "
          "most 1000000.00), got \"twelve\"");
}

TEST_CASE("pricing book: each item field is checked", "[pricing][book]") {
    CHECK(items_problem(header + "rcd s100,RCD,each,1.00,1,protection\n") ==
          "items.csv:2:code: expected a code of capital letters, digits and single hyphens like RCD-S100-ENCL (at most "
          "40 characters), got \"rcd s100\"");
    CHECK(items_problem(header + "RCD--S100,RCD,each,1.00,1,protection\n").starts_with("items.csv:2:code: "));
    CHECK(items_problem(header + "A-1,RCD,each,1.00,1,p\nB-2,X,each,1,1,p\nA-1,RCD,each,1.00,1,p\n") ==
          "items.csv:4:code: code A-1 is already defined on line 2");
    CHECK(items_problem(header + "A-1, ,each,1.00,1,p\n") ==
          "items.csv:2:description: expected a description, got an empty field");
    CHECK(items_problem(header + "A-1,RCD,,1.00,1,p\n") ==
          "items.csv:2:unit: expected a unit such as each, m, visit or hour, got an empty field");
    CHECK(items_problem(header + "A-1,RCD,each,12.505,1,p\n").starts_with("items.csv:2:material_cost: expected an amount"));
    CHECK(items_problem(header + "A-1,RCD,each,1000000.01,1,p\n").starts_with("items.csv:2:material_cost: "));
    CHECK(items_problem(header + "A-1,RCD,each,1.00,an hour,p\n") ==
          "items.csv:2:labour_hours: expected hours like 1.5 (at most 3 decimal places, at most 1000), got \"an hour\"");
    CHECK(items_problem(header + "A-1,RCD,each,1.00,1001,p\n").starts_with("items.csv:2:labour_hours: "));
    CHECK(items_problem(header + "A-1,RCD,each,0.00,0,p\n") ==
          "items.csv:2:material_cost: expected a material cost or labour hours above zero; an item is never priced at "
          "nothing");
    CHECK(items_problem(header + "A-1,RCD,each,1.00,1,\n") ==
          "items.csv:2:category: expected a category such as protection, earthing or testing, got an empty field");
}

TEST_CASE("pricing book: the header and the shape of rows are checked", "[pricing][book]") {
    CHECK(items_problem("code,description,unit,price,labour_hours,category\n") ==
          "items.csv:1:header: unknown column \"price\"; expected the columns code, description, unit, material_cost, "
          "labour_hours, category");
    CHECK(items_problem("code,code,unit,material_cost,labour_hours,category\n") ==
          "items.csv:1:header: column \"code\" appears twice");
    CHECK(items_problem("code,description,unit,material_cost,labour_hours\n") ==
          "items.csv:1:header: missing column \"category\"; expected the columns code, description, unit, "
          "material_cost, labour_hours, category");
    CHECK(items_problem(header + "A-1,RCD, 100 mA,each,1.00,1,p\n") ==
          "items.csv:2: expected 6 fields (code, description, unit, material_cost, labour_hours, category), got 7 (a "
          "comma inside a description needs the field in double quotes)");
    CHECK(items_problem("# only a comment\n") ==
          "items.csv: expected a header row naming the columns code, description, unit, material_cost, labour_hours, "
          "category, found no rows");
    CHECK(items_problem(header) == "items.csv: expected at least one item after the header, found none");
    CHECK(items_problem(header + "A-1,\"RCD,each,1.00,1,p\n") ==
          "items.csv:2: unterminated quoted field: expected a closing quote (\") before the end of the file");
}

TEST_CASE("pricing book: settings parse, amounts given as text or as JSON numbers", "[pricing][book]") {
    const auto settings = parse_pricing_settings(good_settings, "settings.json");
    REQUIRE(settings.ok());
    CHECK(settings->labour_rate_per_hour_pence == 4750);
    CHECK(settings->markup_on_materials_bp == 1500);
    CHECK(settings->vat_bp == 2000);
    CHECK(settings->contingency.is_percentage);
    CHECK(settings->contingency.percent_bp == 1000);
    CHECK(settings->quote_validity_days == 30);
    CHECK(settings->currency_symbol == "£");

    const auto numbers = parse_pricing_settings(
        settings_with("labour_rate_per_hour", "48.5") /* as a JSON number */, "settings.json");
    REQUIRE(numbers.ok());
    CHECK(numbers->labour_rate_per_hour_pence == 4850);
    const auto amount = parse_pricing_settings(settings_with("contingency", R"({"amount": "150.00"})"), "s.json");
    REQUIRE(amount.ok());
    CHECK_FALSE(amount->contingency.is_percentage);
    CHECK(amount->contingency.amount_pence == 15000);
}

TEST_CASE("pricing book: each settings field is checked", "[pricing][book]") {
    CHECK(settings_problem("{\"format\": ").starts_with("settings.json: expected a JSON object: "));
    CHECK(settings_problem("[1]") == "settings.json: expected a JSON object, got array");
    CHECK(settings_problem(settings_with("labour_rate", "\"48\"")).starts_with("settings.json:labour_rate: unknown field"));
    CHECK(settings_problem(settings_with("vat_percent", "")) == "settings.json:vat_percent: missing; this field is required");
    CHECK(settings_problem(settings_with("format", "\"prices\"")) ==
          "settings.json:format: expected \"mendwright-price-settings\", got \"prices\"");
    CHECK(settings_problem(settings_with("version", "2")) == "settings.json:version: expected 1 (the only version so far), got 2");
    CHECK(settings_problem(settings_with("note", "5")) == "settings.json:note: expected text, got 5");
    CHECK(settings_problem(settings_with("currency", "\"pounds\"")) ==
          "settings.json:currency: expected a three-letter code like \"GBP\", got \"pounds\"");
    CHECK(settings_problem(settings_with("currency_symbol", "\"\"")).starts_with("settings.json:currency_symbol: "));
    CHECK(settings_problem(settings_with("labour_rate_per_hour", "\"0\"")) ==
          "settings.json:labour_rate_per_hour: expected an amount per hour like \"48.00\", above 0 and at most 1000.00, "
          "got \"0\"");
    CHECK(settings_problem(settings_with("labour_rate_per_hour", "\"forty\"")).starts_with("settings.json:labour_rate_per_hour: "));
    CHECK(settings_problem(settings_with("markup_on_materials_percent", "\"-5\"")) ==
          "settings.json:markup_on_materials_percent: expected a percentage like \"20\" or \"17.5\" (at most 2 decimal "
          "places, 0 to 1000), got \"-5\"");
    CHECK(settings_problem(settings_with("vat_percent", "120")).starts_with("settings.json:vat_percent: expected a percentage"));
    CHECK(settings_problem(settings_with("contingency", R"({"percent": "10", "amount": "5"})"))
              .starts_with("settings.json:contingency: expected an object with exactly one of"));
    CHECK(settings_problem(settings_with("contingency", "10")).starts_with("settings.json:contingency: "));
    CHECK(settings_problem(settings_with("contingency", R"({"percent": "ten"})"))
              .starts_with("settings.json:contingency.percent: expected a percentage"));
    CHECK(settings_problem(settings_with("contingency", R"({"amount": "lots"})")) ==
          "settings.json:contingency.amount: expected an amount like \"150.00\", got \"lots\"");
    CHECK(settings_problem(settings_with("quote_validity_days", "30.5")) ==
          "settings.json:quote_validity_days: expected a whole number of days from 1 to 365, got 30.5");
    CHECK(settings_problem(settings_with("quote_validity_days", "0")).starts_with("settings.json:quote_validity_days: "));
}

TEST_CASE("pricing book: the demo book loads and holds the items the remedies need", "[pricing][book]") {
    const auto book = read_price_book(std::string(MENDWRIGHT_SOURCE_DIR) + "/pricebook-demo");
    REQUIRE(book.ok());
    for (const char* code : {"RCD-S100-ENCL", "RCD-30-ENCL", "ENCL-2MOD", "CU-METAL-2RCD-10", "CU-METAL-RCBO-12",
                             "RCBO-1MOD", "EARTH-ROD-1M2", "EARTH-ROD-2M4", "EARTH-COND-16", "TAILS-25-M",
                             "TAILS-SWA-25-M", "CONDUIT-MECH-M", "SPD-T2-CU", "TEST-IR-CIRCUIT", "FAULT-FIND-HOUR",
                             "TEST-RA-VISIT", "FEE-BC-NOTIFY", "CERT-EIC", "CERT-MINOR", "LAB-MOVE-BOARD"}) {
        INFO(code);
        CHECK(book->find(code) != nullptr);
    }
    CHECK(book->find("NOT-A-CODE") == nullptr);
    CHECK(book->settings.currency_code == "GBP");
}

TEST_CASE("pricing book: a missing folder is an error naming the file", "[pricing][book]") {
    const auto book = read_price_book("/nonexistent/mendwright-pricebook");
    REQUIRE_FALSE(book.ok());
    CHECK(book.problem().to_string() == "/nonexistent/mendwright-pricebook/items.csv: cannot be opened for reading");
}
