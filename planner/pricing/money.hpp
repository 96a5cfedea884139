#pragma once
// Money, quantities and every rounding rule of the pricing module, stated once and
// implemented here. Nothing else in planner/pricing or planner/export rounds money.
//
//   R1  Money is held in integer pence (std::int64_t), never in floating point.
//   R2  Amounts typed by people ("12.50", "48", "0.5") are read as exact decimal text with at
//       most 2 decimal places; more places are an error, not rounded.
//   R3  Labour hours per unit are read as exact decimal text with at most 3 decimal places and
//       held in thousandths of an hour (milli-hours).
//   R4  Percentages (markup, VAT, contingency) are read as exact decimal text with at most
//       2 decimal places and held in hundredths of a percent (basis points: 20% = 2000).
//   R5  A quantity arrives as a double (a length in metres, a count) and is rounded ONCE to the
//       nearest thousandth of a unit (milli-units) before any money is worked out; the
//       exported workbook shows that rounded quantity.
//   R6  Each line is rounded once, half up, to the penny:
//         line materials = round(unit material pence x quantity)
//         line labour    = round(labour hours per unit x quantity x labour rate pence per hour)
//       The products are worked in exact integers; only the final division rounds.
//   R7  Totals are sums of already-rounded figures; a sum never rounds.
//   R8  A percentage of a total (contingency, markup, VAT) is rounded once, half up, to the
//       penny: round(total pence x basis points / 10000).
//   R9  All figures are >= 0, so "half up" and "half away from zero" agree; this is what a
//       spreadsheet's ROUND(x, 2) does on the pound figure, which the exported workbook uses
//       in the same places (R6, R8) so that it recalculates to the same pence.
//   R10 Hours on site (for planning, not money) = hours per unit x quantity, to the nearest
//       milli-hour, half up.

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>

namespace mendwright::pricing {

using Pence = std::int64_t;
using MilliHours = std::int64_t;   // thousandths of an hour (R3)
using BasisPoints = std::int64_t;  // hundredths of a percent (R4)
using MilliUnits = std::int64_t;   // thousandths of a unit of quantity (R5)

// Largest quantity accepted on a line, in units: keeps every product of R6 inside 128 bits
// with a wide margin and catches typing slips (a length typed in millimetres).
inline constexpr double max_quantity_units = 1'000'000.0;
// Largest material cost and labour per unit of one item (1,000,000.00 and 1000 hours).
inline constexpr Pence max_item_material_pence = 100'000'000;
inline constexpr MilliHours max_item_labour_milli_hours = 1'000'000;

// R2: "12.50" -> 1250, "7" -> 700, "0.5" -> 50. Nothing for anything else (signs, thousands
// separators, currency symbols, 3+ decimal places, empty text, more than 12 whole digits).
std::optional<Pence> parse_amount_pence(std::string_view text);

// R3: "1.5" -> 1500, "0.125" -> 125. Same refusals as parse_amount_pence, 3 decimal places.
std::optional<MilliHours> parse_milli_hours(std::string_view text);

// R4: "20" -> 2000, "17.5" -> 1750. Same refusals, 2 decimal places.
std::optional<BasisPoints> parse_basis_points(std::string_view text);

// R5: nothing when the quantity is not finite, negative or above max_quantity_units.
std::optional<MilliUnits> quantity_milli_units(double quantity_units);

// R6, materials: round_half_up(unit_pence x quantity_milli / 1000).
Pence line_materials_pence(Pence unit_material_pence, MilliUnits quantity);

// R6, labour: round_half_up(milli_hours x quantity_milli x rate / 1'000'000).
Pence line_labour_pence(MilliHours labour_per_unit, MilliUnits quantity, Pence labour_rate_per_hour_pence);

// R8: round_half_up(total x basis_points / 10000).
Pence percentage_of_pence(Pence total, BasisPoints rate);

// R10: round_half_up(milli_hours x quantity_milli / 1000).
MilliHours site_milli_hours(MilliHours labour_per_unit, MilliUnits quantity);

// Display: 123456 -> "1234.56" (no symbol, no separators); used in messages and CSV-like text.
std::string pence_text(Pence amount);
// 1500 milli-hours -> "1.5"; 125 -> "0.125".
std::string milli_hours_text(MilliHours hours);
// 2000 -> "20", 1750 -> "17.5".
std::string basis_points_text(BasisPoints rate);

// Pounds as a double for a spreadsheet cell: the nearest double to the exact pound figure.
inline double pence_to_pounds(Pence amount) { return static_cast<double>(amount) / 100.0; }

}  // namespace mendwright::pricing
