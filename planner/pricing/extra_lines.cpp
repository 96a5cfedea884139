#include "planner/pricing/extra_lines.hpp"

#include <array>
#include <charconv>
#include <cmath>
#include <fstream>
#include <iterator>
#include <set>
#include <sstream>

#include "planner/pricing/csv.hpp"
#include "planner/pricing/money.hpp"

namespace mendwright::pricing {

namespace {

constexpr std::array<std::string_view, 6> column_names = {"description", "unit", "quantity", "material_cost",
                                                          "labour_hours", "note"};
constexpr std::size_t note_column = 5;
constexpr std::size_t absent = column_names.size();

std::string columns_list() {
    std::string text;
    for (const auto name : column_names) text += (text.empty() ? "" : ", ") + std::string(name);
    return text + " (note may be left out)";
}

std::string trimmed(std::string_view text) {
    const auto first = text.find_first_not_of(" \t");
    if (first == std::string_view::npos) return {};
    const auto last = text.find_last_not_of(" \t");
    return std::string(text.substr(first, last - first + 1));
}

std::string in_quotes(std::string_view text) { return "\"" + std::string(text) + "\""; }

std::optional<double> quantity_of(const std::string& text) {
    double value = 0.0;
    const char* end = text.data() + text.size();
    auto [ptr, ec] = std::from_chars(text.data(), end, value);
    if (text.empty() || ec != std::errc() || ptr != end || !std::isfinite(value)) return std::nullopt;
    if (value <= 0.0 || value > max_quantity_units) return std::nullopt;
    return value;
}

}  // namespace

Result<std::vector<ExtraLine>> parse_extra_lines(std::string_view csv_text, std::string_view file_name) {
    auto records = parse_csv(csv_text, file_name);
    if (!records) return records.problem();
    const std::string file(file_name);
    auto at = [&](int line) { return file + ":" + std::to_string(line); };

    std::array<std::size_t, column_names.size()> column_of{};
    column_of.fill(absent);
    bool have_header = false;
    std::size_t header_width = 0;
    std::vector<ExtraLine> lines;
    for (const auto& record : records.value()) {
        bool blank = true;
        for (const auto& field : record.fields) blank = blank && trimmed(field).empty();
        if (blank || trimmed(record.fields.front()).starts_with('#')) continue;

        if (!have_header) {
            std::set<std::string> seen;
            header_width = record.fields.size();
            while (header_width > 0 && trimmed(record.fields[header_width - 1]).empty()) --header_width;
            for (std::size_t i = 0; i < header_width; ++i) {
                const std::string name = trimmed(record.fields[i]);
                std::size_t which = absent;
                for (std::size_t k = 0; k < column_names.size(); ++k)
                    if (column_names[k] == name) which = k;
                if (which == absent)
                    return problem(at(record.line) + ":header", "unknown column " + in_quotes(name) + "; expected " + columns_list());
                if (!seen.insert(name).second)
                    return problem(at(record.line) + ":header", "column " + in_quotes(name) + " appears twice");
                column_of[which] = i;
            }
            for (std::size_t k = 0; k < note_column; ++k)
                if (column_of[k] == absent)
                    return problem(at(record.line) + ":header",
                                   "missing column " + in_quotes(column_names[k]) + "; expected " + columns_list());
            have_header = true;
            continue;
        }

        std::size_t width = record.fields.size();
        while (width > header_width && trimmed(record.fields[width - 1]).empty()) --width;
        if (width != header_width)
            return problem(at(record.line), "expected " + std::to_string(header_width) + " fields, got " + std::to_string(width) +
                                                " (a comma inside a description needs the field in double quotes)");
        auto cell = [&](std::size_t k) { return column_of[k] == absent ? std::string() : trimmed(record.fields[column_of[k]]); };
        auto where = [&](std::size_t k) { return at(record.line) + ":" + std::string(column_names[k]); };

        ExtraLine line;
        line.description = cell(0);
        if (line.description.empty()) return problem(where(0), "expected a description, got an empty field");
        line.unit = cell(1);
        if (line.unit.empty()) return problem(where(1), "expected a unit such as each, m or hour, got an empty field");
        const auto quantity = quantity_of(cell(2));
        if (!quantity)
            return problem(where(2), "expected a quantity above 0 like 2 or 1.5 (at most 1000000), got " + in_quotes(cell(2)));
        line.quantity = *quantity;
        const auto material = parse_amount_pence(cell(3));
        if (!material || *material > max_item_material_pence)
            return problem(where(3), "expected an amount like 12.50 (no currency sign, at most 2 decimal places, at most " +
                                         pence_text(max_item_material_pence) + "), got " + in_quotes(cell(3)));
        line.unit_material_pence = *material;
        const auto labour = parse_milli_hours(cell(4));
        if (!labour || *labour > max_item_labour_milli_hours)
            return problem(where(4), "expected hours like 1.5 (at most 3 decimal places, at most " +
                                         milli_hours_text(max_item_labour_milli_hours) + "), got " + in_quotes(cell(4)));
        line.labour_milli_hours_per_unit = *labour;
        if (line.unit_material_pence == 0 && line.labour_milli_hours_per_unit == 0)
            return problem(where(3), "expected a material cost or labour hours above zero; a line is never priced at nothing");
        line.note = cell(note_column);
        lines.push_back(std::move(line));
    }
    if (!have_header) return problem(file, "expected a header row naming the columns " + columns_list() + ", found no rows");
    return lines;
}

Result<std::vector<ExtraLine>> read_extra_lines(const std::filesystem::path& file) {
    std::ifstream in(file, std::ios::binary);
    if (!in) return problem(file.string(), "cannot be read (missing, or no permission)");
    std::ostringstream text;
    text << in.rdbuf();
    if (in.bad()) return problem(file.string(), "could not be read to the end");
    return parse_extra_lines(text.str(), file.string());
}

}  // namespace mendwright::pricing
