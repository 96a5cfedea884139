#include "planner/pricing/money.hpp"

#include <cmath>

namespace mendwright::pricing {

namespace {

// 128-bit integer for the products of R6 (GCC and Clang; __extension__ keeps -Wpedantic quiet).
__extension__ using Wide = __int128;

// Exact decimal text -> integer count of 10^-places units. Digits, at most one '.', at most
// `places` digits after it, at most 12 before it.
std::optional<std::int64_t> parse_fixed(std::string_view text, int places) {
    if (text.empty()) return std::nullopt;
    std::int64_t whole = 0;
    std::int64_t fraction = 0;
    int whole_digits = 0;
    int fraction_digits = 0;
    bool seen_point = false;
    for (char c : text) {
        if (c == '.') {
            if (seen_point) return std::nullopt;
            seen_point = true;
        } else if (c >= '0' && c <= '9') {
            if (seen_point) {
                if (++fraction_digits > places) return std::nullopt;
                fraction = fraction * 10 + (c - '0');
            } else {
                if (++whole_digits > 12) return std::nullopt;
                whole = whole * 10 + (c - '0');
            }
        } else {
            return std::nullopt;
        }
    }
    if (whole_digits == 0 && fraction_digits == 0) return std::nullopt;  // "." alone
    if (seen_point && fraction_digits == 0) return std::nullopt;         // "12."
    std::int64_t scale = 1;
    for (int i = 0; i < places; ++i) scale *= 10;
    for (int i = fraction_digits; i < places; ++i) fraction *= 10;
    return whole * scale + fraction;
}

// round_half_up(numerator / denominator) for numerator >= 0, denominator > 0 (R6, R8, R9).
Pence divide_half_up(Wide numerator, Wide denominator) {
    return static_cast<Pence>((numerator * 2 + denominator) / (denominator * 2));
}

std::string fixed_text(std::int64_t value, int places, bool trim_zeros) {
    std::int64_t scale = 1;
    for (int i = 0; i < places; ++i) scale *= 10;
    const bool negative = value < 0;
    const std::uint64_t magnitude = negative ? 0 - static_cast<std::uint64_t>(value) : static_cast<std::uint64_t>(value);
    std::string fraction = std::to_string(magnitude % static_cast<std::uint64_t>(scale));
    fraction.insert(0, static_cast<std::size_t>(places) - fraction.size(), '0');
    if (trim_zeros) {
        while (!fraction.empty() && fraction.back() == '0') fraction.pop_back();
    }
    std::string text = (negative ? "-" : "") + std::to_string(magnitude / static_cast<std::uint64_t>(scale));
    if (!fraction.empty()) text += "." + fraction;
    return text;
}

}  // namespace

std::optional<Pence> parse_amount_pence(std::string_view text) { return parse_fixed(text, 2); }
std::optional<MilliHours> parse_milli_hours(std::string_view text) { return parse_fixed(text, 3); }
std::optional<BasisPoints> parse_basis_points(std::string_view text) { return parse_fixed(text, 2); }

std::optional<MilliUnits> quantity_milli_units(double quantity_units) {
    if (!std::isfinite(quantity_units) || quantity_units < 0.0 || quantity_units > max_quantity_units) {
        return std::nullopt;
    }
    // R5: to the nearest thousandth (at most 1e9 milli-units, well inside a double's 2^53).
    return static_cast<MilliUnits>(std::llround(quantity_units * 1000.0));
}

Pence line_materials_pence(Pence unit_material_pence, MilliUnits quantity) {
    return divide_half_up(static_cast<Wide>(unit_material_pence) * quantity, 1000);
}

Pence line_labour_pence(MilliHours labour_per_unit, MilliUnits quantity, Pence labour_rate_per_hour_pence) {
    return divide_half_up(static_cast<Wide>(labour_per_unit) * quantity * labour_rate_per_hour_pence, 1'000'000);
}

Pence percentage_of_pence(Pence total, BasisPoints rate) {
    return divide_half_up(static_cast<Wide>(total) * rate, 10'000);
}

MilliHours site_milli_hours(MilliHours labour_per_unit, MilliUnits quantity) {
    return divide_half_up(static_cast<Wide>(labour_per_unit) * quantity, 1000);
}

std::string pence_text(Pence amount) { return fixed_text(amount, 2, false); }
std::string milli_hours_text(MilliHours hours) { return fixed_text(hours, 3, true); }
std::string basis_points_text(BasisPoints rate) { return fixed_text(rate, 2, true); }

}  // namespace mendwright::pricing
