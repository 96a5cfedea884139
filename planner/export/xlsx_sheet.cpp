#include "planner/export/xlsx_sheet.hpp"

#include <algorithm>

namespace mendwright::spreadsheet {

namespace {
// The most characters a cell holds: libxlsxwriter's LXW_STR_MAX (src/worksheet.c), the limit its
// worksheet_write_string() documentation gives.
constexpr std::ptrdiff_t cell_text_max_characters = 32767;
}  // namespace

std::string cell_name(lxw_row_t row, lxw_col_t col, bool fixed) {
    std::string letters;
    for (unsigned n = static_cast<unsigned>(col) + 1; n > 0; n = (n - 1) / 26) {
        letters.insert(letters.begin(), static_cast<char>('A' + (n - 1) % 26));
    }
    const std::string dollar = fixed ? "$" : "";
    return dollar + letters + dollar + std::to_string(row + 1);
}

std::string header_text(const std::string& text) {
    std::string out;
    for (char c : text) {
        if (out.size() >= 200) break;
        out += c;
        if (c == '&') out += '&';
    }
    return out;
}

Formats::Formats(lxw_workbook* book, const std::string& currency_symbol) {
    const std::string money_format = "\"" + currency_symbol + "\"#,##0.00";
    auto make = [&](auto&& setup) {
        lxw_format* format = workbook_add_format(book);
        format_set_font_size(format, 10);
        setup(format);
        return format;
    };
    title = make([](lxw_format* f) {
        format_set_bold(f);
        format_set_font_size(f, 14);
    });
    label = make([](lxw_format* f) { format_set_bold(f); });
    header = make([](lxw_format* f) {
        format_set_bold(f);
        format_set_text_wrap(f);
        format_set_align(f, LXW_ALIGN_VERTICAL_TOP);
        format_set_bottom(f, LXW_BORDER_THIN);
        format_set_bg_color(f, 0xDDE4EE);
    });
    group = make([](lxw_format* f) {
        format_set_bold(f);
        format_set_bg_color(f, 0xF1F4F8);
    });
    wrap = make([](lxw_format* f) {
        format_set_text_wrap(f);
        format_set_align(f, LXW_ALIGN_VERTICAL_TOP);
    });
    money = make([&](lxw_format* f) { format_set_num_format(f, money_format.c_str()); });
    money_total = make([&](lxw_format* f) {
        format_set_num_format(f, money_format.c_str());
        format_set_bold(f);
        format_set_top(f, LXW_BORDER_THIN);
    });
    money_grand = make([&](lxw_format* f) {
        format_set_num_format(f, money_format.c_str());
        format_set_bold(f);
        format_set_top(f, LXW_BORDER_THIN);
        format_set_bottom(f, LXW_BORDER_DOUBLE);
    });
    label_total = make([](lxw_format* f) {
        format_set_bold(f);
        format_set_align(f, LXW_ALIGN_RIGHT);
    });
    percent = make([](lxw_format* f) { format_set_num_format(f, "0.00%"); });
    number = make([](lxw_format* f) { format_set_num_format(f, "General"); });
    date = make([](lxw_format* f) {
        format_set_num_format(f, "d mmm yyyy");
        format_set_align(f, LXW_ALIGN_LEFT);
    });
}

void Sheet::text(lxw_row_t row, lxw_col_t col, const std::string& value, lxw_format* format) {
    keep(worksheet_write_string(sheet_, row, col, value.c_str(), format));
}

void Sheet::number(lxw_row_t row, lxw_col_t col, double value, lxw_format* format) {
    keep(worksheet_write_number(sheet_, row, col, value, format));
}

void Sheet::formula(lxw_row_t row, lxw_col_t col, const std::string& formula, double cached, lxw_format* format) {
    keep(worksheet_write_formula_num(sheet_, row, col, formula.c_str(), format, cached));
}

void Sheet::date(lxw_row_t row, lxw_col_t col, int year, unsigned month, unsigned day, lxw_format* format) {
    lxw_datetime when{year, static_cast<int>(month), static_cast<int>(day), 0, 0, 0.0};
    keep(worksheet_write_datetime(sheet_, row, col, &when, format));
}

void Sheet::merged_text(lxw_row_t row, lxw_col_t first_col, lxw_col_t last_col, const std::string& value,
                        lxw_format* format, double height_points) {
    // libxlsxwriter drops the result of writing a merged range's text, so the length limit it
    // would refuse is checked here (characters counted as UTF-8 lead bytes).
    const auto characters = std::count_if(value.begin(), value.end(), [](char c) { return (c & 0xC0) != 0x80; });
    if (characters > cell_text_max_characters) keep(LXW_ERROR_MAX_STRING_LENGTH_EXCEEDED);
    keep(worksheet_merge_range(sheet_, row, first_col, row, last_col, value.c_str(), format));
    row_height(row, height_points);
}

void Sheet::row_height(lxw_row_t row, double height_points) {
    keep(worksheet_set_row(sheet_, row, height_points, nullptr));
}

void Sheet::autofilter(lxw_row_t first_row, lxw_col_t first_col, lxw_row_t last_row, lxw_col_t last_col) {
    keep(worksheet_autofilter(sheet_, first_row, first_col, last_row, last_col));
}

void Sheet::column(lxw_col_t first, lxw_col_t last, double width, lxw_format* format) {
    keep(worksheet_set_column(sheet_, first, last, width, format));
}

void Sheet::print_setup(bool landscape, const std::string& header, const std::string& footer, lxw_row_t repeat_first,
                        lxw_row_t repeat_last) {
    worksheet_set_paper(sheet_, 9);  // 9 = A4 in the OOXML paper-size list
    if (landscape) worksheet_set_landscape(sheet_);
    worksheet_fit_to_pages(sheet_, 1, 0);  // one page wide, as many pages tall as needed
    keep(worksheet_set_header(sheet_, header.c_str()));
    keep(worksheet_set_footer(sheet_, footer.c_str()));
    keep(worksheet_repeat_rows(sheet_, repeat_first, repeat_last));
}

}  // namespace mendwright::spreadsheet
