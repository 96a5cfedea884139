#pragma once
// A thin layer over libxlsxwriter's C API for the quote workbook: cell names, the shared cell
// formats, and the first error of any write kept so a failed write is reported, not ignored.

#include <xlsxwriter.h>

#include <string>

namespace mendwright::spreadsheet {

// "A1" style name of a 0-based row and column; `fixed` gives "$A$1".
std::string cell_name(lxw_row_t row, lxw_col_t col, bool fixed = false);
// Text for a page header or footer: '&' doubled, at most 200 bytes.
std::string header_text(const std::string& text);

struct Formats {
    lxw_format* title = nullptr;
    lxw_format* label = nullptr;
    lxw_format* header = nullptr;
    lxw_format* group = nullptr;
    lxw_format* wrap = nullptr;
    lxw_format* money = nullptr;
    lxw_format* money_total = nullptr;
    lxw_format* money_grand = nullptr;
    lxw_format* label_total = nullptr;
    lxw_format* percent = nullptr;
    lxw_format* number = nullptr;
    lxw_format* date = nullptr;

    // `currency_symbol` has no double quote (the price-book settings check it).
    Formats(lxw_workbook* book, const std::string& currency_symbol);
};

class Sheet {
public:
    explicit Sheet(lxw_worksheet* sheet, lxw_error& first_error) : sheet_(sheet), error_(first_error) {}

    void text(lxw_row_t row, lxw_col_t col, const std::string& value, lxw_format* format = nullptr);
    void number(lxw_row_t row, lxw_col_t col, double value, lxw_format* format = nullptr);
    void formula(lxw_row_t row, lxw_col_t col, const std::string& formula, double cached, lxw_format* format = nullptr);
    void date(lxw_row_t row, lxw_col_t col, int year, unsigned month, unsigned day, lxw_format* format);
    // One row only: in constant-memory mode libxlsxwriter can merge cells only within the row
    // being written (its documentation says merges "generally don't work" in that mode; a
    // single-row merge puts the text, the formatted blanks and the height all on that row).
    void merged_text(lxw_row_t row, lxw_col_t first_col, lxw_col_t last_col, const std::string& value,
                     lxw_format* format, double height_points);
    void row_height(lxw_row_t row, double height_points);
    void autofilter(lxw_row_t first_row, lxw_col_t first_col, lxw_row_t last_row, lxw_col_t last_col);
    void column(lxw_col_t first, lxw_col_t last, double width, lxw_format* format = nullptr);
    // A4, fitted to one page wide, header and footer, the header rows repeated on each page.
    void print_setup(bool landscape, const std::string& header, const std::string& footer, lxw_row_t repeat_first,
                     lxw_row_t repeat_last);
    lxw_worksheet* raw() { return sheet_; }

private:
    void keep(lxw_error error) {
        if (error_ == LXW_NO_ERROR) error_ = error;
    }
    lxw_worksheet* sheet_;
    lxw_error& error_;
};

}  // namespace mendwright::spreadsheet
