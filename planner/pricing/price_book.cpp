#include "planner/pricing/price_book.hpp"

#include <algorithm>
#include <array>
#include <fstream>
#include <map>
#include <nlohmann/json.hpp>
#include <set>
#include <sstream>

#include "planner/pricing/csv.hpp"

namespace mendwright::pricing {

namespace {

constexpr std::array<std::string_view, 6> column_names = {"code",         "description",  "unit",
                                                          "material_cost", "labour_hours", "category"};

std::string columns_list() {
    std::string text;
    for (auto name : column_names) text += (text.empty() ? "" : ", ") + std::string(name);
    return text;
}

std::string trimmed(std::string_view text) {
    const auto first = text.find_first_not_of(" \t");
    if (first == std::string_view::npos) return {};
    const auto last = text.find_last_not_of(" \t");
    return std::string(text.substr(first, last - first + 1));
}

std::string in_quotes(std::string_view text) { return "\"" + std::string(text) + "\""; }

bool is_item_code(std::string_view code) {
    if (code.empty() || code.size() > 40 || code.front() == '-' || code.back() == '-') return false;
    char previous = ' ';
    for (char c : code) {
        const bool ok = (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9') || c == '-';
        if (!ok || (c == '-' && previous == '-')) return false;
        previous = c;
    }
    return true;
}

bool all_empty(const std::vector<std::string>& fields) {
    for (const auto& field : fields) {
        if (!trimmed(field).empty()) return false;
    }
    return true;
}

}  // namespace

const PriceItem* PriceBook::find(std::string_view code) const {
    for (const auto& item : items) {
        if (item.code == code) return &item;
    }
    return nullptr;
}

Result<std::vector<PriceItem>> parse_price_items(std::string_view csv_text, std::string_view file_name) {
    auto records = parse_csv(csv_text, file_name);
    if (!records) return records.problem();
    const std::string file(file_name);
    auto at = [&](int line) { return file + ":" + std::to_string(line); };

    std::array<std::size_t, column_names.size()> column_of{};  // column index of each named column
    bool have_header = false;
    std::size_t header_width = 0;
    std::vector<PriceItem> items;
    std::map<std::string, int> line_of_code;

    for (const auto& record : records.value()) {
        if (all_empty(record.fields)) continue;
        if (trimmed(record.fields.front()).starts_with('#')) continue;

        if (!have_header) {
            std::set<std::string> seen;
            column_of.fill(column_names.size());
            header_width = record.fields.size();
            while (header_width > 0 && trimmed(record.fields[header_width - 1]).empty()) --header_width;
            for (std::size_t i = 0; i < header_width; ++i) {
                const std::string name = trimmed(record.fields[i]);
                std::size_t which = column_names.size();
                for (std::size_t k = 0; k < column_names.size(); ++k) {
                    if (column_names[k] == name) which = k;
                }
                if (which == column_names.size()) {
                    return problem(at(record.line) + ":header",
                                   "unknown column " + in_quotes(name) + "; expected the columns " + columns_list());
                }
                if (!seen.insert(name).second) {
                    return problem(at(record.line) + ":header", "column " + in_quotes(name) + " appears twice");
                }
                column_of[which] = i;
            }
            for (std::size_t k = 0; k < column_names.size(); ++k) {
                if (column_of[k] == column_names.size()) {
                    return problem(at(record.line) + ":header", "missing column " + in_quotes(column_names[k]) +
                                                                    "; expected the columns " + columns_list());
                }
            }
            have_header = true;
            continue;
        }

        // Spreadsheets may pad rows with empty trailing cells; anything else must match the header.
        std::size_t width = record.fields.size();
        while (width > header_width && trimmed(record.fields[width - 1]).empty()) --width;
        if (width != header_width) {
            return problem(at(record.line), "expected " + std::to_string(header_width) + " fields (" + columns_list() +
                                                "), got " + std::to_string(width) +
                                                " (a comma inside a description needs the field in double quotes)");
        }
        auto cell = [&](std::size_t k) { return trimmed(record.fields[column_of[k]]); };
        auto where = [&](std::size_t k) { return at(record.line) + ":" + std::string(column_names[k]); };

        PriceItem item;
        item.line = record.line;
        item.code = cell(0);
        if (!is_item_code(item.code)) {
            return problem(where(0), "expected a code of capital letters, digits and single hyphens like "
                                     "RCD-S100-ENCL (at most 40 characters), got " + in_quotes(item.code));
        }
        if (auto [it, inserted] = line_of_code.emplace(item.code, record.line); !inserted) {
            return problem(where(0), "code " + item.code + " is already defined on line " + std::to_string(it->second));
        }
        item.description = cell(1);
        if (item.description.empty()) return problem(where(1), "expected a description, got an empty field");
        item.unit = cell(2);
        if (item.unit.empty()) return problem(where(2), "expected a unit such as each, m, visit or hour, got an empty field");
        const std::string material = cell(3);
        const auto material_pence = parse_amount_pence(material);
        if (!material_pence || *material_pence > max_item_material_pence) {
            return problem(where(3), "expected an amount like 12.50 (no currency sign, at most 2 decimal places, at "
                                     "most " + pence_text(max_item_material_pence) + "), got " + in_quotes(material));
        }
        item.material_pence = *material_pence;
        const std::string hours = cell(4);
        const auto labour = parse_milli_hours(hours);
        if (!labour || *labour > max_item_labour_milli_hours) {
            return problem(where(4), "expected hours like 1.5 (at most 3 decimal places, at most " +
                                         milli_hours_text(max_item_labour_milli_hours) + "), got " + in_quotes(hours));
        }
        item.labour_milli_hours = *labour;
        if (item.material_pence == 0 && item.labour_milli_hours == 0) {
            return problem(where(3), "expected a material cost or labour hours above zero; an item is never priced "
                                     "at nothing");
        }
        item.category = cell(5);
        if (item.category.empty()) {
            return problem(where(5), "expected a category such as protection, earthing or testing, got an empty field");
        }
        items.push_back(std::move(item));
    }
    if (!have_header) {
        return problem(file, "expected a header row naming the columns " + columns_list() + ", found no rows");
    }
    if (items.empty()) return problem(file, "expected at least one item after the header, found none");
    return items;
}

namespace {

using nlohmann::json;

// A money or percentage field as exact text: JSON strings as written, JSON numbers through
// their shortest round-trip text ("48.5"), so no binary fraction reaches the figures.
std::optional<std::string> decimal_text(const json& value) {
    if (value.is_string()) return trimmed(value.get<std::string>());
    if (value.is_number()) return value.dump();
    return std::nullopt;
}

std::string shown(const json& value) { return value.is_string() ? in_quotes(value.get<std::string>()) : value.dump(); }

}  // namespace

Result<PricingSettings> parse_pricing_settings(std::string_view json_text, std::string_view file_name) {
    const std::string file(file_name);
    auto at = [&](const std::string& field) { return file + ":" + field; };
    json document;
    try {
        document = json::parse(json_text);
    } catch (const json::parse_error& error) {
        return problem(file, std::string("expected a JSON object: ") + error.what());
    }
    if (!document.is_object()) return problem(file, "expected a JSON object, got " + std::string(document.type_name()));

    static const std::set<std::string> known = {"format",       "version",     "note",
                                                "currency",     "currency_symbol", "labour_rate_per_hour",
                                                "markup_on_materials_percent", "vat_percent", "contingency",
                                                "quote_validity_days"};
    for (const auto& [key, value] : document.items()) {
        if (!known.contains(key)) {
            std::string list;
            for (const auto& name : known) list += (list.empty() ? "" : ", ") + name;
            return problem(at(key), "unknown field; expected only " + list);
        }
    }
    auto require = [&](const char* key) -> Result<json> {
        if (!document.contains(key)) return problem(at(key), "missing; this field is required");
        return document.at(key);
    };

    auto format = require("format");
    if (!format) return format.problem();
    if (*format != "mendwright-price-settings") {
        return problem(at("format"), "expected \"mendwright-price-settings\", got " + shown(*format));
    }
    auto version = require("version");
    if (!version) return version.problem();
    if (*version != 1) return problem(at("version"), "expected 1 (the only version so far), got " + shown(*version));
    if (document.contains("note") && !document.at("note").is_string()) {
        return problem(at("note"), "expected text, got " + shown(document.at("note")));
    }

    PricingSettings settings;
    auto currency = require("currency");
    if (!currency) return currency.problem();
    const std::string code = currency->is_string() ? currency->get<std::string>() : std::string();
    const bool currency_ok =
        code.size() == 3 && std::all_of(code.begin(), code.end(), [](char c) { return c >= 'A' && c <= 'Z'; });
    if (!currency_ok) return problem(at("currency"), "expected a three-letter code like \"GBP\", got " + shown(*currency));
    settings.currency_code = currency->get<std::string>();
    auto symbol = require("currency_symbol");
    if (!symbol) return symbol.problem();
    if (!symbol->is_string() || symbol->get<std::string>().empty() || symbol->get<std::string>().size() > 8 ||
        symbol->get<std::string>().find('"') != std::string::npos) {
        return problem(at("currency_symbol"), "expected a short symbol like \"£\" (no quotes), got " + shown(*symbol));
    }
    settings.currency_symbol = symbol->get<std::string>();

    auto rate = require("labour_rate_per_hour");
    if (!rate) return rate.problem();
    const auto rate_text = decimal_text(*rate);
    const auto rate_pence = rate_text ? parse_amount_pence(*rate_text) : std::nullopt;
    if (!rate_pence || *rate_pence == 0 || *rate_pence > 100'000) {
        return problem(at("labour_rate_per_hour"),
                       "expected an amount per hour like \"48.00\", above 0 and at most 1000.00, got " + shown(*rate));
    }
    settings.labour_rate_per_hour_pence = *rate_pence;

    auto percentage = [&](const std::string& field, const json& value, BasisPoints most) -> Result<BasisPoints> {
        const auto text = decimal_text(value);
        const auto bp = text ? parse_basis_points(*text) : std::nullopt;
        if (!bp || *bp > most) {
            return problem(at(field), "expected a percentage like \"20\" or \"17.5\" (at most 2 decimal places, 0 to " +
                                          basis_points_text(most) + "), got " + shown(value));
        }
        return *bp;
    };
    auto markup = require("markup_on_materials_percent");
    if (!markup) return markup.problem();
    auto markup_bp = percentage("markup_on_materials_percent", *markup, 100'000);
    if (!markup_bp) return markup_bp.problem();
    settings.markup_on_materials_bp = *markup_bp;
    auto vat = require("vat_percent");
    if (!vat) return vat.problem();
    auto vat_bp = percentage("vat_percent", *vat, 10'000);
    if (!vat_bp) return vat_bp.problem();
    settings.vat_bp = *vat_bp;

    auto contingency = require("contingency");
    if (!contingency) return contingency.problem();
    const bool has_percent = contingency->is_object() && contingency->contains("percent");
    const bool has_amount = contingency->is_object() && contingency->contains("amount");
    if (!contingency->is_object() || contingency->size() != 1 || has_percent == has_amount) {
        return problem(at("contingency"),
                       "expected an object with exactly one of \"percent\" (of the works subtotal) or \"amount\", "
                       "like {\"percent\": \"10\"}, got " + contingency->dump());
    }
    if (has_percent) {
        auto bp = percentage("contingency.percent", contingency->at("percent"), 10'000);
        if (!bp) return bp.problem();
        settings.contingency = Contingency{true, *bp, 0};
    } else {
        const auto text = decimal_text(contingency->at("amount"));
        const auto pence = text ? parse_amount_pence(*text) : std::nullopt;
        if (!pence) {
            return problem(at("contingency.amount"),
                           "expected an amount like \"150.00\", got " + shown(contingency->at("amount")));
        }
        settings.contingency = Contingency{false, 0, *pence};
    }

    auto validity = require("quote_validity_days");
    if (!validity) return validity.problem();
    if (!validity->is_number_integer() || validity->get<long long>() < 1 || validity->get<long long>() > 365) {
        return problem(at("quote_validity_days"), "expected a whole number of days from 1 to 365, got " + shown(*validity));
    }
    settings.quote_validity_days = static_cast<int>(validity->get<long long>());
    return settings;
}

Result<PriceBook> read_price_book(const std::filesystem::path& folder) {
    auto read = [](const std::filesystem::path& path) -> Result<std::string> {
        std::ifstream in(path, std::ios::binary);
        if (!in) return problem(path.string(), "cannot be opened for reading");
        std::ostringstream text;
        text << in.rdbuf();
        if (in.bad()) return problem(path.string(), "could not be read to the end");
        return text.str();
    };
    auto items_text = read(folder / "items.csv");
    if (!items_text) return items_text.problem();
    auto settings_text = read(folder / "settings.json");
    if (!settings_text) return settings_text.problem();
    auto items = parse_price_items(items_text.value(), "items.csv");
    if (!items) return items.problem();
    auto settings = parse_pricing_settings(settings_text.value(), "settings.json");
    if (!settings) return settings.problem();
    return PriceBook{std::move(items).value(), std::move(settings).value()};
}

}  // namespace mendwright::pricing
