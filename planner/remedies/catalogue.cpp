#include "planner/remedies/catalogue.hpp"

#include <cmath>
#include <nlohmann/json.hpp>

namespace mendwright::remedies {

bool CatalogueEntry::targets_rule(std::string_view rule) const {
    for (const auto& pattern : target_rules) {
        if (!pattern.empty() && pattern.back() == '*') {
            if (rule.substr(0, pattern.size() - 1) == std::string_view(pattern).substr(0, pattern.size() - 1)) return true;
        } else if (rule == pattern) {
            return true;
        }
    }
    return false;
}

double CatalogueEntry::parameter(const std::string& name, double fallback) const {
    auto it = parameters.find(name);
    return it == parameters.end() ? fallback : it->second;
}

std::vector<pricing::BillLine> CatalogueEntry::bill(const std::map<std::string, double>& counts) const {
    std::vector<pricing::BillLine> lines;
    for (const auto& item : items) {
        double multiplier = 1.0;
        if (item.per != "job") {
            auto it = counts.find(item.per);
            multiplier = it == counts.end() ? 0.0 : it->second;
        }
        const double quantity = item.quantity * multiplier;
        if (quantity <= 0.0) continue;
        lines.push_back({item.code, quantity, item.note});
    }
    return lines;
}

double CatalogueEntry::hours_off_supply(int circuits) const {
    return hours_off_fixed + hours_off_per_circuit * circuits;
}

const CatalogueEntry* Catalogue::find(std::string_view kind) const {
    for (const auto& entry : entries)
        if (entry.kind == kind) return &entry;
    return nullptr;
}

namespace {

using nlohmann::json;

std::optional<Problem> read_strings(const json& object, const char* key, const std::string& path,
                                    std::vector<std::string>& out) {
    if (!object.contains(key)) return std::nullopt;
    const json& list = object.at(key);
    if (!list.is_array()) return problem(path + "." + key, "expected a list of texts");
    for (std::size_t i = 0; i < list.size(); ++i) {
        if (!list[i].is_string())
            return problem(path + "." + key + "[" + std::to_string(i) + "]", "expected a text");
        out.push_back(list[i].get<std::string>());
    }
    return std::nullopt;
}

std::optional<Problem> read_number(const json& object, const char* key, const std::string& path, double& out,
                                   bool required) {
    if (!object.contains(key)) {
        if (required) return problem(path + "." + key, "is required");
        return std::nullopt;
    }
    const json& value = object.at(key);
    if (!value.is_number() || !std::isfinite(value.get<double>()) || value.get<double>() < 0.0)
        return problem(path + "." + key, "expected a number >= 0");
    out = value.get<double>();
    return std::nullopt;
}

std::optional<Problem> read_text(const json& object, const char* key, const std::string& path, std::string& out,
                                 bool required) {
    if (!object.contains(key)) {
        if (required) return problem(path + "." + key, "is required");
        return std::nullopt;
    }
    if (!object.at(key).is_string()) return problem(path + "." + key, "expected a text");
    out = object.at(key).get<std::string>();
    return std::nullopt;
}

Result<CatalogueEntry> read_entry(const json& object, const std::string& path) {
    if (!object.is_object()) return problem(path, "expected an object");
    static const std::vector<std::string> known = {
        "kind", "title", "description", "targets", "items", "assumptions", "prerequisites", "leaves_open",
        "notifiable", "certificate", "hours_off_supply", "ideal_avoid", "parameters", "comment"};
    for (const auto& [key, value] : object.items()) {
        (void)value;
        if (std::find(known.begin(), known.end(), key) == known.end())
            return problem(path + "." + key, "is not a field of a catalogue entry");
    }
    CatalogueEntry entry;
    if (auto p = read_text(object, "kind", path, entry.kind, true)) return *p;
    if (auto p = read_text(object, "title", path, entry.title, true)) return *p;
    if (auto p = read_text(object, "description", path, entry.description, false)) return *p;
    if (auto p = read_strings(object, "targets", path, entry.target_rules)) return *p;
    if (auto p = read_strings(object, "assumptions", path, entry.assumptions)) return *p;
    if (auto p = read_strings(object, "prerequisites", path, entry.prerequisites)) return *p;
    if (auto p = read_strings(object, "leaves_open", path, entry.leaves_open)) return *p;
    if (auto p = read_text(object, "certificate", path, entry.certificate, true)) return *p;
    if (!object.contains("notifiable") || !object.at("notifiable").is_boolean())
        return problem(path + ".notifiable", "expected true or false");
    entry.notifiable = object.at("notifiable").get<bool>();
    if (object.contains("ideal_avoid")) {
        if (!object.at("ideal_avoid").is_boolean()) return problem(path + ".ideal_avoid", "expected true or false");
        entry.ideal_avoid = object.at("ideal_avoid").get<bool>();
    }
    if (!object.contains("hours_off_supply") || !object.at("hours_off_supply").is_object())
        return problem(path + ".hours_off_supply", "expected an object {\"fixed\", \"per_circuit\"}");
    const json& hours = object.at("hours_off_supply");
    if (auto p = read_number(hours, "fixed", path + ".hours_off_supply", entry.hours_off_fixed, true)) return *p;
    if (auto p = read_number(hours, "per_circuit", path + ".hours_off_supply", entry.hours_off_per_circuit, false))
        return *p;
    if (object.contains("items")) {
        const json& items = object.at("items");
        if (!items.is_array()) return problem(path + ".items", "expected a list of items");
        for (std::size_t i = 0; i < items.size(); ++i) {
            const std::string item_path = path + ".items[" + std::to_string(i) + "]";
            if (!items[i].is_object()) return problem(item_path, "expected an object");
            CatalogueItem item;
            if (auto p = read_text(items[i], "code", item_path, item.code, true)) return *p;
            if (auto p = read_text(items[i], "per", item_path, item.per, false)) return *p;
            static const std::vector<std::string> pers = {"job", "circuit", "rod", "metre", "way"};
            if (std::find(pers.begin(), pers.end(), item.per) == pers.end())
                return problem(item_path + ".per", "expected one of job, circuit, rod, metre, way; got \"" + item.per + "\"");
            if (auto p = read_number(items[i], "quantity", item_path, item.quantity, false)) return *p;
            if (auto p = read_text(items[i], "note", item_path, item.note, false)) return *p;
            entry.items.push_back(std::move(item));
        }
    }
    if (object.contains("parameters")) {
        const json& parameters = object.at("parameters");
        if (!parameters.is_object()) return problem(path + ".parameters", "expected an object of numbers");
        for (const auto& [key, value] : parameters.items()) {
            if (!value.is_number()) return problem(path + ".parameters." + key, "expected a number");
            entry.parameters[key] = value.get<double>();
        }
    }
    return entry;
}

}  // namespace

Result<Catalogue> parse_catalogue(std::string_view json_text) {
    json document = json::parse(json_text, nullptr, false);
    if (document.is_discarded()) return problem("", "the remedy catalogue is not valid JSON");
    if (!document.is_object() || !document.contains("entries") || !document.at("entries").is_array())
        return problem("entries", "expected a list of catalogue entries");
    Catalogue catalogue;
    const json& entries = document.at("entries");
    for (std::size_t i = 0; i < entries.size(); ++i) {
        auto entry = read_entry(entries[i], "entries[" + std::to_string(i) + "]");
        if (!entry) return entry.problem();
        if (catalogue.find(entry->kind))
            return problem("entries[" + std::to_string(i) + "].kind", "duplicate kind \"" + entry->kind + "\"");
        catalogue.entries.push_back(std::move(entry).value());
    }
    return catalogue;
}

const Catalogue& default_catalogue() {
    static const Catalogue catalogue = [] {
        auto parsed = parse_catalogue(default_catalogue_json());
        // The embedded catalogue is checked by the tests; a broken one is a build defect.
        return parsed ? std::move(parsed).value() : Catalogue{};
    }();
    return catalogue;
}

}  // namespace mendwright::remedies
