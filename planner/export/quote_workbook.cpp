#include "planner/export/quote_workbook.hpp"

#include <xlsxwriter.h>

#include <algorithm>
#include <iterator>
#include <map>

#include "planner/export/heap_kept_for_reuse.hpp"
#include "planner/export/replace_file.hpp"
#include "planner/export/xlsx_sheet.hpp"

namespace mendwright::spreadsheet {

namespace {

using pricing::CostedLine;
using pricing::Pence;
using pricing::pence_to_pounds;

double pounds(Pence pence) { return pence_to_pounds(pence); }
double hours(pricing::MilliHours milli) { return static_cast<double>(milli) / 1000.0; }
double percent_fraction(pricing::BasisPoints bp) { return static_cast<double>(bp) / 10000.0; }

std::string joined(const std::vector<std::string>& parts, const std::string& separator) {
    std::string text;
    for (const auto& part : parts) text += (text.empty() ? "" : separator) + part;
    return text;
}

// Height of a merged, wrapped row of about `width_chars` characters (Excel has no auto-fit
// for merged cells): 13.5 points a line.
double wrapped_height(const std::string& text, std::size_t width_chars) {
    const std::size_t lines = text.size() / width_chars + 1;
    return 13.5 * static_cast<double>(lines);
}

struct Writer {
    const pricing::Quote& quote;
    lxw_workbook* book;
    Formats formats;
    lxw_error first_error = LXW_NO_ERROR;
    bool keep_figures = false;
    std::vector<WrittenFigure> figures;

    // Rows of the quote sheet that the other sheets refer to.
    lxw_row_t first_line_row = 0;
    lxw_row_t last_line_row = 0;
    lxw_row_t total_row = 0;
    struct LineRow {
        const CostedLine* line;
        lxw_row_t row;
    };
    std::vector<LineRow> line_rows;

    Writer(const pricing::Quote& q, lxw_workbook* b) : quote(q), book(b), formats(b, q.works.settings.currency_symbol) {}

    void figure(const std::string& name, const char* sheet, lxw_row_t row, lxw_col_t col, Pence pence) {
        if (!keep_figures) return;
        figures.push_back(WrittenFigure{name, sheet, cell_name(row, col), pence});
    }

    std::string page_header(const std::string& what) const {
        return "&L" + header_text("Quotation " + quote.number + " - " + what) + "&R" +
               header_text(quote.client_name);
    }
    static std::string page_footer() {
        return "&LPlanning aid: work to be done and certified by a competent person&RPage &P of &N";
    }

    void quote_sheet_contents(lxw_worksheet* raw_sheet);
    void plans_sheet_contents(lxw_worksheet* raw_sheet);
    void findings_sheet_contents(lxw_worksheet* raw_sheet);
    void materials_sheet_contents(lxw_worksheet* raw_sheet);
};

// Quote sheet columns.
constexpr lxw_col_t col_code = 0, col_description = 1, col_quantity = 2, col_unit = 3, col_unit_cost = 4,
                    col_materials = 5, col_hours = 6, col_labour = 7, col_line_total = 8;
constexpr lxw_row_t row_rate = 3, row_markup = 4, row_contingency = 5, row_vat = 6, row_table_header = 8;

void Writer::quote_sheet_contents(lxw_worksheet* raw_sheet) {
    Sheet sheet(raw_sheet, first_error);
    const auto& settings = quote.works.settings;
    const auto& totals = quote.totals;
    const Formats& f = formats;

    sheet.column(col_code, col_code, 17);
    sheet.column(col_description, col_description, 50);
    sheet.column(col_quantity, col_unit, 8);
    sheet.column(col_unit_cost, col_materials, 12);
    sheet.column(col_hours, col_hours, 10);
    sheet.column(col_labour, col_line_total, 13);

    // Rows go top to bottom on every sheet: the workbook is written in libxlsxwriter's
    // constant-memory mode, which streams each row out when the next one starts and refuses a
    // cell above it (the refusal reaches the caller as an error, never as a missing cell).
    sheet.text(0, 0, "Quotation " + quote.number, f.title);
    sheet.text(1, 0, "Client", f.label);
    sheet.text(1, 1, quote.client_name);
    sheet.text(1, col_unit_cost, "Date", f.label);
    sheet.date(1, col_labour, quote.date.year, quote.date.month, quote.date.day, f.date);
    sheet.text(2, 0, "Site", f.label);
    sheet.text(2, 1, quote.site_address);
    sheet.text(2, col_unit_cost, "Valid until", f.label);
    sheet.date(2, col_labour, quote.valid_until.year, quote.valid_until.month, quote.valid_until.day, f.date);
    sheet.text(row_rate, 0, "Plan", f.label);
    sheet.text(row_rate, 1, quote.chosen_plan.name);
    sheet.text(row_rate, col_unit_cost, "Labour rate per hour", f.label);
    sheet.number(row_rate, col_labour, pounds(settings.labour_rate_per_hour_pence), f.money);
    sheet.text(row_markup, 0, "Alternative", f.label);
    sheet.text(row_markup, 1,
               quote.alternative_plan ? quote.alternative_plan->name + " (see \"Plans compared\")" : "none offered");
    sheet.text(row_markup, col_unit_cost, "Markup on materials", f.label);
    sheet.number(row_markup, col_labour, percent_fraction(settings.markup_on_materials_bp), f.percent);
    if (settings.contingency.is_percentage) {
        sheet.text(row_contingency, col_unit_cost, "Contingency (% of works subtotal)", f.label);
        sheet.number(row_contingency, col_labour, percent_fraction(settings.contingency.percent_bp), f.percent);
    } else {
        sheet.text(row_contingency, col_unit_cost, "Contingency (fixed amount)", f.label);
        sheet.number(row_contingency, col_labour, pounds(settings.contingency.amount_pence), f.money);
    }
    sheet.text(row_vat, col_unit_cost, "VAT", f.label);
    sheet.number(row_vat, col_labour, percent_fraction(settings.vat_bp), f.percent);

    const char* headings[] = {"Code",      "Description", "Qty",         "Unit",      "Unit materials",
                              "Materials", "Labour hours per unit", "Labour", "Line total"};
    for (lxw_col_t c = 0; c <= col_line_total; ++c) sheet.text(row_table_header, c, headings[c], f.header);
    worksheet_freeze_panes(sheet.raw(), row_table_header + 1, 0);

    const std::string rate_cell = cell_name(row_rate, col_labour, true);
    lxw_row_t row = row_table_header + 1;
    first_line_row = row;

    // What a client reads for the findings an option puts right: code, title and place ("C2 No
    // RCD ... (Kitchen sockets)"); the same finding at several places is said once with its count
    // and the places are left to the Findings sheet, which also keeps the finding ids.
    std::map<std::string, const pricing::ScheduledFinding*> finding_of_id;
    for (const auto& quoted : quote.findings) finding_of_id[quoted.finding.id] = &quoted.finding;
    auto puts_right_text = [&](const std::vector<std::string>& finding_ids) {
        std::vector<std::pair<std::string, std::vector<std::string>>> places_of_title;  // in order of first mention
        for (const auto& id : finding_ids) {
            auto found = finding_of_id.find(id);
            const std::string title = found == finding_of_id.end() ? id : found->second->code + " " + found->second->title;
            const std::string place = found == finding_of_id.end() ? std::string() : found->second->location;
            auto same = std::find_if(places_of_title.begin(), places_of_title.end(),
                                     [&](const auto& entry) { return entry.first == title; });
            if (same == places_of_title.end()) places_of_title.push_back({title, {place}});
            else same->second.push_back(place);
        }
        std::vector<std::string> parts;
        for (const auto& [title, places] : places_of_title) {
            if (places.size() > 1) parts.push_back(title + " (at " + std::to_string(places.size()) + " places: see Findings)");
            else parts.push_back(title + (places.front().empty() ? std::string() : " (" + places.front() + ")"));
        }
        return parts.empty() ? std::string() : "Puts right: " + joined(parts, "; ");
    };
    constexpr std::size_t merged_width_chars = 150;

    auto write_lines = [&](const std::string& heading, const std::vector<CostedLine>& lines, const std::string& prefix,
                           Pence group_pence, const std::string& puts_right) {
        sheet.merged_text(row, col_code, col_line_total, heading, f.group, 15);
        ++row;
        if (!puts_right.empty()) {
            sheet.merged_text(row, col_code, col_line_total, puts_right, f.wrap, wrapped_height(puts_right, merged_width_chars));
            ++row;
        }
        const lxw_row_t first = row;
        for (std::size_t i = 0; i < lines.size(); ++i, ++row) {
            const CostedLine& line = lines[i];
            const std::string r = std::to_string(row + 1);
            sheet.text(row, col_code, line.item_code);
            sheet.text(row, col_description, line.note.empty() ? line.description : line.description + " (" + line.note + ")",
                       f.wrap);
            sheet.number(row, col_quantity, line.quantity(), f.number);
            sheet.text(row, col_unit, line.unit);
            sheet.number(row, col_unit_cost, pounds(line.unit_material_pence), f.money);
            // money.hpp R6: one ROUND per line, on the materials and on the labour.
            sheet.formula(row, col_materials, "=ROUND(C" + r + "*E" + r + ",2)", pounds(line.materials_pence), f.money);
            sheet.number(row, col_hours, hours(line.labour_milli_hours_per_unit), f.number);
            sheet.formula(row, col_labour, "=ROUND(C" + r + "*G" + r + "*" + rate_cell + ",2)", pounds(line.labour_pence),
                          f.money);
            sheet.formula(row, col_line_total, "=F" + r + "+H" + r, pounds(line.total_pence()), f.money);
            if (keep_figures) {
                const std::string name = prefix + "[" + std::to_string(i) + "]";
                figure(name + ".materials", quote_sheet, row, col_materials, line.materials_pence);
                figure(name + ".labour", quote_sheet, row, col_labour, line.labour_pence);
                figure(name + ".total", quote_sheet, row, col_line_total, line.total_pence());
            }
            line_rows.push_back(LineRow{&line, row});
        }
        sheet.text(row, col_labour, "Total for these items", f.label_total);
        const std::string sum = lines.empty() ? "=0"
                                              : "=SUM(" + cell_name(first, col_line_total) + ":" +
                                                    cell_name(row - 1, col_line_total) + ")";
        sheet.formula(row, col_line_total, sum, pounds(group_pence), f.money_total);
        figure(prefix + ".total", quote_sheet, row, col_line_total, group_pence);
        row += 2;
    };

    for (std::size_t g = 0; g < quote.works.groups.size(); ++g) {
        const auto& group = quote.works.groups[g];
        write_lines(group.title, group.lines, "group[" + std::to_string(g) + "]", totals.group_pence[g],
                    puts_right_text(group.clears_findings));
    }
    if (!quote.works.extra_lines.empty()) {
        write_lines("Additional items", quote.works.extra_lines, "extras", totals.extras_pence, std::string());
    }
    last_line_row = row - 2;

    // The totals block: labels in the labour column (right-aligned), figures in the last column.
    const std::string lines_from = std::to_string(first_line_row + 1);
    const std::string lines_to = std::to_string(last_line_row + 1);
    struct Total {
        const char* name;
        std::string label;
        std::string formula;
        Pence pence;
        lxw_format* format;
    };
    const lxw_row_t first_total = row;
    auto at = [&](lxw_row_t offset) { return cell_name(first_total + offset, col_line_total); };
    const std::string contingency_formula =
        settings.contingency.is_percentage
            ? "=ROUND(" + at(2) + "*" + cell_name(row_contingency, col_labour, true) + ",2)"
            : "=" + cell_name(row_contingency, col_labour, true);
    const std::vector<Total> block = {
        {"materials", "Materials", "=SUM(F" + lines_from + ":F" + lines_to + ")", totals.materials_pence, f.money},
        {"labour", "Labour", "=SUM(H" + lines_from + ":H" + lines_to + ")", totals.labour_pence, f.money},
        {"subtotal", "Works subtotal", "=" + at(0) + "+" + at(1), totals.subtotal_pence, f.money_total},
        {"contingency", "Contingency for faults found during the work", contingency_formula, totals.contingency_pence,
         f.money},
        {"markup", "Markup on materials",
         "=ROUND(" + at(0) + "*" + cell_name(row_markup, col_labour, true) + ",2)", totals.markup_pence, f.money},
        {"net", "Price before VAT", "=" + at(2) + "+" + at(3) + "+" + at(4), totals.net_pence, f.money_total},
        {"vat", "VAT", "=ROUND(" + at(5) + "*" + cell_name(row_vat, col_labour, true) + ",2)", totals.vat_pence,
         f.money},
        {"total", "Total including VAT", "=" + at(5) + "+" + at(6), totals.total_pence, f.money_grand},
    };
    for (const auto& total : block) {
        sheet.text(row, col_labour, total.label, f.label_total);
        sheet.formula(row, col_line_total, total.formula, pounds(total.pence), total.format);
        figure(total.name, quote_sheet, row, col_line_total, total.pence);
        ++row;
    }
    total_row = row - 1;
    sheet.text(row, col_labour, "Estimated hours on site", f.label_total);
    sheet.number(row, col_line_total, hours(totals.labour_milli_hours), f.number);
    row += 2;

    auto paragraph_list = [&](const std::string& heading, const std::vector<std::string>& items) {
        sheet.text(row++, col_code, heading, f.label);
        for (const auto& item : items) {
            sheet.merged_text(row, col_code, col_line_total, item, f.wrap, wrapped_height(item, merged_width_chars));
            ++row;
        }
        ++row;
    };
    paragraph_list("Not included", quote.exclusions);
    paragraph_list("Please note", quote.cautions);

    sheet.print_setup(true, page_header("quote"), page_footer(), row_table_header, row_table_header);
    worksheet_print_area(sheet.raw(), 0, 0, row, col_line_total);
}

void Writer::plans_sheet_contents(lxw_worksheet* raw_sheet) {
    Sheet sheet(raw_sheet, first_error);
    const Formats& f = formats;
    const bool has_alternative = quote.alternative_plan.has_value();
    sheet.column(0, 0, 34);
    sheet.column(1, 2, 48);
    sheet.text(0, 0, "Plans compared for quotation " + quote.number, f.title);
    sheet.text(2, 0, "", f.header);
    sheet.text(2, 1, "Chosen plan (quoted)", f.header);
    if (has_alternative) sheet.text(2, 2, "Alternative plan", f.header);
    worksheet_freeze_panes(sheet.raw(), 3, 1);

    const pricing::PlanSummary& chosen = quote.chosen_plan;
    const pricing::PlanSummary* other = has_alternative ? &*quote.alternative_plan : nullptr;
    lxw_row_t row = 3;
    auto text_row = [&](const std::string& label, auto&& value_of) {
        sheet.text(row, 0, label, f.label);
        sheet.text(row, 1, value_of(chosen), f.wrap);
        if (other) sheet.text(row, 2, value_of(*other), f.wrap);
        ++row;
    };
    auto number_row = [&](const std::string& label, auto&& value_of) {
        sheet.text(row, 0, label, f.label);
        sheet.number(row, 1, value_of(chosen), f.number);
        if (other) sheet.number(row, 2, value_of(*other), f.number);
        ++row;
    };
    text_row("Plan", [](const pricing::PlanSummary& p) { return p.name; });
    const std::size_t most_options =
        std::max(chosen.option_titles.size(), other ? other->option_titles.size() : std::size_t{0});
    text_row("Options", [](const pricing::PlanSummary& p) { return joined(p.option_titles, "\n"); });
    sheet.row_height(row - 1, 13.5 * static_cast<double>(std::max<std::size_t>(most_options, 1)));

    sheet.text(row, 0, "Price including VAT", f.label);
    sheet.formula(row, 1, "='" + std::string(quote_sheet) + "'!" + cell_name(total_row, col_line_total),
                  pounds(chosen.total_pence), f.money_total);
    figure("plans.chosen.total", plans_sheet, row, 1, chosen.total_pence);
    if (other) {
        sheet.number(row, 2, pounds(other->total_pence), f.money_total);
        ++row;
        sheet.text(row, 0, "Difference from the chosen plan", f.label);
        sheet.formula(row, 2, "=" + cell_name(row - 1, 2) + "-" + cell_name(row - 1, 1),
                      pounds(other->total_pence - chosen.total_pence), f.money);
        figure("plans.difference", plans_sheet, row, 2, other->total_pence - chosen.total_pence);
    }
    ++row;
    number_row("C1 left open", [](const pricing::PlanSummary& p) { return double(p.residual.c1); });
    number_row("C2 left open", [](const pricing::PlanSummary& p) { return double(p.residual.c2); });
    number_row("C3 left open", [](const pricing::PlanSummary& p) { return double(p.residual.c3); });
    number_row("FI left open", [](const pricing::PlanSummary& p) { return double(p.residual.fi); });
    number_row("Hours off supply (estimate)", [](const pricing::PlanSummary& p) { return p.hours_off_supply; });
    text_row("Certificates", [](const pricing::PlanSummary& p) {
        return p.certificates.empty() ? std::string("none") : joined(p.certificates, ", ");
    });
    text_row("Building-control notification",
             [](const pricing::PlanSummary& p) { return std::string(p.building_control_notification ? "yes" : "no"); });
    sheet.print_setup(false, page_header("plans compared"), page_footer(), 2, 2);
}

void Writer::findings_sheet_contents(lxw_worksheet* raw_sheet) {
    Sheet sheet(raw_sheet, first_error);
    const Formats& f = formats;
    const double widths[] = {24, 6, 44, 34, 22, 40};
    for (lxw_col_t c = 0; c < 6; ++c) sheet.column(c, c, widths[c]);
    sheet.text(0, 0, "Findings schedule for quotation " + quote.number, f.title);
    const char* headings[] = {"Ref", "Code", "Finding", "Location", "Clause", "Cleared by (this quote)"};
    for (lxw_col_t c = 0; c < 6; ++c) sheet.text(2, c, headings[c], f.header);
    worksheet_freeze_panes(sheet.raw(), 3, 0);
    // The filter spans the header and one row per finding. It is set before those rows are
    // written: in constant-memory mode a range ending above the current row is refused.
    const auto last_finding_row = static_cast<lxw_row_t>(2 + quote.findings.size());
    sheet.autofilter(2, 0, last_finding_row, 5);
    lxw_row_t row = 3;
    for (const auto& quoted : quote.findings) {
        sheet.text(row, 0, quoted.finding.id, f.wrap);
        sheet.text(row, 1, quoted.finding.code, f.wrap);
        sheet.text(row, 2, quoted.finding.title, f.wrap);
        sheet.text(row, 3, quoted.finding.location, f.wrap);
        sheet.text(row, 4, quoted.finding.clause, f.wrap);
        sheet.text(row, 5, quoted.cleared_by.empty() ? "left open" : joined(quoted.cleared_by, "; "), f.wrap);
        ++row;
    }
    if (quote.findings.empty()) sheet.text(row, 0, "No findings listed.");
    sheet.print_setup(true, page_header("findings"), page_footer(), 2, 2);
}

void Writer::materials_sheet_contents(lxw_worksheet* raw_sheet) {
    Sheet sheet(raw_sheet, first_error);
    const Formats& f = formats;
    const double widths[] = {17, 50, 8, 10, 12, 13, 14};
    for (lxw_col_t c = 0; c < 7; ++c) sheet.column(c, c, widths[c]);
    sheet.text(0, 0, "Materials to order for quotation " + quote.number + " (price-book cost, before markup and VAT)",
               f.title);
    const char* headings[] = {"Code", "Description", "Unit", "Quantity", "Unit cost", "Cost", "Category"};
    for (lxw_col_t c = 0; c < 7; ++c) sheet.text(2, c, headings[c], f.header);
    worksheet_freeze_panes(sheet.raw(), 3, 0);

    // Coded items summed over every line that uses them, in order of first use.
    struct Order {
        const CostedLine* line;
        pricing::MilliUnits quantity_milli;
        std::vector<lxw_row_t> quote_rows;
    };
    std::vector<Order> orders;
    std::map<std::string, std::size_t> index_of_code;
    for (const auto& [line, quote_row] : line_rows) {
        if (line->unit_material_pence == 0) continue;  // labour-only items: nothing to order
        if (line->item_code.empty()) {
            orders.push_back(Order{line, line->quantity_milli, {quote_row}});
            continue;
        }
        auto [it, inserted] = index_of_code.emplace(line->item_code, orders.size());
        if (inserted) {
            orders.push_back(Order{line, line->quantity_milli, {quote_row}});
        } else {
            orders[it->second].quantity_milli += line->quantity_milli;
            orders[it->second].quote_rows.push_back(quote_row);
        }
    }
    const std::string q = "'" + std::string(quote_sheet) + "'!";
    const std::string codes = q + cell_name(first_line_row, col_code, true) + ":" + cell_name(last_line_row, col_code, true);
    const std::string quantities =
        q + cell_name(first_line_row, col_quantity, true) + ":" + cell_name(last_line_row, col_quantity, true);
    lxw_row_t row = 3;
    Pence total = 0;
    for (std::size_t i = 0; i < orders.size(); ++i, ++row) {
        const Order& order = orders[i];
        const std::string r = std::to_string(row + 1);
        const double quantity = static_cast<double>(order.quantity_milli) / 1000.0;
        sheet.text(row, 0, order.line->item_code);
        sheet.text(row, 1, order.line->description, f.wrap);
        sheet.text(row, 2, order.line->unit);
        const std::string quantity_formula = order.line->item_code.empty()
                                                 ? "=" + q + cell_name(order.quote_rows.front(), col_quantity)
                                                 : "=SUMIF(" + codes + ",A" + r + "," + quantities + ")";
        sheet.formula(row, 3, quantity_formula, quantity, f.number);
        sheet.number(row, 4, pounds(order.line->unit_material_pence), f.money);
        // money.hpp R6 on the summed quantity: one ROUND per ordered item.
        const Pence cost = pricing::line_materials_pence(order.line->unit_material_pence, order.quantity_milli);
        sheet.formula(row, 5, "=ROUND(D" + r + "*E" + r + ",2)", pounds(cost), f.money);
        sheet.text(row, 6, order.line->category);
        if (keep_figures) figure("order[" + std::to_string(i) + "].cost", materials_sheet, row, 5, cost);
        total += cost;
    }
    if (orders.empty()) sheet.text(row++, 1, "No materials to order: labour and fees only.");
    sheet.text(row, 4, "Total cost", f.label_total);
    sheet.formula(row, 5, orders.empty() ? "=0" : "=SUM(F4:F" + std::to_string(row) + ")", pounds(total), f.money_grand);
    figure("materials.total", materials_sheet, row, 5, total);
    sheet.print_setup(true, page_header("materials to order"), page_footer(), 2, 2);
}

}  // namespace

Result<WrittenWorkbook> write_quote_workbook(const pricing::Quote& quote, const std::filesystem::path& target,
                                             FigureList figure_list) {
    std::vector<WrittenFigure> figures;
    const HeapKeptForReuse heap_kept;
    auto written = replace_file(target, [&](const std::filesystem::path& temporary) -> std::optional<Problem> {
        // Constant-memory mode: each row is written out as soon as the next one starts, so the
        // cells are not all held until the workbook is closed (see the row order note above).
        lxw_workbook_options options{};
        options.constant_memory = LXW_TRUE;
        lxw_workbook* book = workbook_new_opt(temporary.c_str(), &options);
        if (book == nullptr) return problem("", "the spreadsheet library could not start a workbook");
        // In constant-memory mode each sheet opens its own temporary file as it is added, so a
        // sheet can fail to start (temporary folder not writable or full, no file handles left).
        const char* const sheet_names[] = {quote_sheet, plans_sheet, findings_sheet, materials_sheet};
        lxw_worksheet* sheets[std::size(sheet_names)] = {};
        for (std::size_t i = 0; i < std::size(sheet_names); ++i) {
            sheets[i] = workbook_add_worksheet(book, sheet_names[i]);
            if (sheets[i] == nullptr) {
                // Freed without packaging: workbook_close() on a workbook with no sheet would add a
                // default one, fail again, and read the empty sheet list.
                lxw_workbook_free(book);
                return problem("", std::string("the spreadsheet library could not start the sheet \"") + sheet_names[i] +
                                       "\": its temporary file could not be made (check that the temporary folder, "
                                       "TMPDIR, is writable and has space)");
            }
        }
        Writer writer(quote, book);
        writer.keep_figures = figure_list == FigureList::kept;
        writer.quote_sheet_contents(sheets[0]);
        writer.plans_sheet_contents(sheets[1]);
        writer.findings_sheet_contents(sheets[2]);
        writer.materials_sheet_contents(sheets[3]);
        worksheet_activate(sheets[0]);
        const lxw_error closed = workbook_close(book);  // frees the workbook whatever happens
        if (writer.first_error != LXW_NO_ERROR) {
            return problem("", std::string("a cell could not be written: ") + lxw_strerror(writer.first_error));
        }
        if (closed != LXW_NO_ERROR) return problem("", lxw_strerror(closed));
        figures = std::move(writer.figures);
        return std::nullopt;
    });
    if (!written) return written.problem();
    return WrittenWorkbook{written.value(), std::move(figures)};
}

}  // namespace mendwright::spreadsheet
