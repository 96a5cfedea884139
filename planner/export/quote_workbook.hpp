#pragma once
// The quote as an .xlsx workbook (libxlsxwriter), four sheets:
//   "Quote"           the client quote: lines grouped by option, totals, exclusions, cautions
//   "Plans compared"  the chosen plan beside the alternative (price, findings left open, ...)
//   "Findings"        the findings schedule: ref, code, finding, location, clause, cleared by
//   "Materials"       materials to order, summed by item code, at price-book cost
// Every money figure that is worked out is a formula with its value cached, so the file shows
// the right figures when opened and recalculates when a quantity is edited. The formulas round
// where planner/pricing/money.hpp rounds (ROUND(...,2) per line and per percentage).
//
// Example:
//   auto written = mendwright::spreadsheet::write_quote_workbook(quote, "out/Q-0042.xlsx");
//   if (!written) std::cerr << written.problem().to_string() << "\n";  // nothing left behind

#include <filesystem>
#include <string>
#include <vector>

#include "planner/core/result.hpp"
#include "planner/pricing/quote.hpp"

namespace mendwright::spreadsheet {

inline constexpr const char* quote_sheet = "Quote";
inline constexpr const char* plans_sheet = "Plans compared";
inline constexpr const char* findings_sheet = "Findings";
inline constexpr const char* materials_sheet = "Materials";

// Where one worked-out money figure was written, and the figure the pricing module gave for it.
struct WrittenFigure {
    std::string name;   // "total", "vat", "group[0]", "line[0][2].materials", "materials.total" ...
    std::string sheet;
    std::string cell;   // "I42"
    pricing::Pence pence = 0;
};

// Whether write_quote_workbook lists where each money figure went (for checks that compare the
// workbook with the pricing module, cell by cell). The quote itself does not need the list.
enum class FigureList { not_kept, kept };

struct WrittenWorkbook {
    std::filesystem::path path;
    std::vector<WrittenFigure> figures;  // empty unless FigureList::kept
};

// Writes the workbook through a temporary file in the target's folder and renames it into
// place. A target that cannot be written is a Problem naming it, and leaves no file behind.
Result<WrittenWorkbook> write_quote_workbook(const pricing::Quote& quote, const std::filesystem::path& target,
                                             FigureList figure_list = FigureList::not_kept);

}  // namespace mendwright::spreadsheet
