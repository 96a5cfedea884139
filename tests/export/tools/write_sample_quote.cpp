// Writes the invented sample quote workbook and, beside it, a JSON file of every money figure
// the pricing module worked out and the cell it was written to; the read-back script compares
// the workbook (as written, and as recalculated by LibreOffice) with those figures.
//
//   export_sample_quote --out DIR [--name NAME] [--lines N] [--no-findings] [--no-figures]
// writes DIR/NAME.xlsx and DIR/NAME.expected.json (NAME defaults to sample-quote). The JSON
// also holds the figures after one quantity edit ("edit"), for the recalculation check.
// --no-findings leaves the findings schedule empty (use it with --lines, whose options clear none).
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <iostream>
#include <nlohmann/json.hpp>
#include <string>

#include "planner/export/quote_workbook.hpp"
#include "tests/export/tools/sample_quote.hpp"

namespace {

nlohmann::json figures_json(const std::vector<mendwright::spreadsheet::WrittenFigure>& figures) {
    nlohmann::json list = nlohmann::json::array();
    for (const auto& f : figures) list.push_back({{"name", f.name}, {"sheet", f.sheet}, {"cell", f.cell}, {"pence", f.pence}});
    return list;
}

int fail(const std::string& message) {
    std::cerr << "export_sample_quote: " << message << "\n";
    return 1;
}

}  // namespace

int main(int argc, char** argv) {
    std::filesystem::path out;
    std::string name = "sample-quote";
    std::size_t lines = 0;
    bool write_figures = true;
    auto findings = mendwright::test::Findings::listed;
    for (int i = 1; i < argc; ++i) {
        const std::string arg = argv[i];
        if (arg == "--out" && i + 1 < argc) {
            out = argv[++i];
        } else if (arg == "--name" && i + 1 < argc) {
            name = argv[++i];
        } else if (arg == "--lines" && i + 1 < argc) {
            lines = std::strtoul(argv[++i], nullptr, 10);
        } else if (arg == "--no-findings") {
            findings = mendwright::test::Findings::none;
        } else if (arg == "--no-figures") {
            write_figures = false;
        } else {
            return fail("usage: export_sample_quote --out DIR [--name NAME] [--lines N] [--no-findings] [--no-figures]");
        }
    }
    if (out.empty()) return fail("--out DIR is required");

    auto quote = mendwright::test::sample_quote(std::string(MENDWRIGHT_SOURCE_DIR) + "/pricebook-demo", lines, findings);
    if (!quote) return fail(quote.problem().to_string());
    const auto target = out / (name + ".xlsx");
    // With --no-figures the tool writes the workbook as the product does (no figure list).
    const auto figure_list = write_figures ? mendwright::spreadsheet::FigureList::kept : mendwright::spreadsheet::FigureList::not_kept;
    auto written = mendwright::spreadsheet::write_quote_workbook(quote.value(), target, figure_list);
    if (!written) return fail(written.problem().to_string());
    if (!write_figures) return 0;

    // The edit the recalculation check makes: the second line of the first option to 7.25 units.
    mendwright::pricing::Quote edited = quote.value();
    constexpr double edited_quantity = 7.25;
    if (auto refused = mendwright::pricing::set_quantity(edited.works, 0, 1, edited_quantity)) {
        return fail(refused->to_string());
    }
    edited.totals = mendwright::pricing::total_works(edited.works);
    edited.chosen_plan.total_pence = edited.totals.total_pence;
    const auto edited_target = out / (name + ".edited-by-engine.xlsx");
    auto edited_written = mendwright::spreadsheet::write_quote_workbook(edited, edited_target, mendwright::spreadsheet::FigureList::kept);
    if (!edited_written) return fail(edited_written.problem().to_string());
    std::filesystem::remove(edited_target);

    std::string quantity_cell;
    for (const auto& f : written->figures) {
        if (f.name == "group[0][1].total") quantity_cell = "C" + f.cell.substr(1);
    }
    const nlohmann::json document = {
        {"workbook", target.string()},
        {"figures", figures_json(written->figures)},
        {"edit", {{"sheet", "Quote"}, {"cell", quantity_cell}, {"quantity", edited_quantity},
                  {"figures", figures_json(edited_written->figures)}}},
    };
    std::ofstream json_out(out / (name + ".expected.json"));
    json_out << document.dump(1) << "\n";
    return json_out ? 0 : fail("could not write the figures file");
}
