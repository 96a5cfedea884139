#include "planner/pricing/costing.hpp"

#include "planner/core/checks.hpp"

namespace mendwright::pricing {

Result<CostedLine> cost_line(const PriceBook& book, const BillLine& line, const std::string& field) {
    const PriceItem* item = book.find(line.item_code);
    if (item == nullptr) return problem(field, "item code " + line.item_code + " is not in the price book");
    const auto quantity = quantity_milli_units(line.quantity);
    if (!quantity) {
        return problem(field + ".quantity", "expected a quantity from 0 to " + number_text(max_quantity_units) +
                                                " in " + item->unit + ", got " + number_text(line.quantity));
    }
    CostedLine costed;
    costed.item_code = item->code;
    costed.description = item->description;
    costed.unit = item->unit;
    costed.category = item->category;
    costed.note = line.note;
    costed.quantity_milli = *quantity;
    costed.unit_material_pence = item->material_pence;
    costed.labour_milli_hours_per_unit = item->labour_milli_hours;
    costed.materials_pence = line_materials_pence(item->material_pence, *quantity);
    costed.labour_pence =
        line_labour_pence(item->labour_milli_hours, *quantity, book.settings.labour_rate_per_hour_pence);
    return costed;
}

Result<CostedBill> cost_bill(const PriceBook& book, const std::vector<BillLine>& bill, std::string_view owner) {
    CostedBill costed;
    costed.lines.reserve(bill.size());
    for (std::size_t i = 0; i < bill.size(); ++i) {
        const BillLine& line = bill[i];
        // A missing code names the owner alone, as the remedies module reports it.
        if (book.find(line.item_code) == nullptr) {
            return problem(std::string(owner), "item code " + line.item_code + " is not in the price book");
        }
        auto costed_line = cost_line(book, line, std::string(owner) + ".bill[" + std::to_string(i) + "]");
        if (!costed_line) return costed_line.problem();
        costed.materials_pence += costed_line->materials_pence;
        costed.labour_pence += costed_line->labour_pence;
        costed.labour_milli_hours +=
            site_milli_hours(costed_line->labour_milli_hours_per_unit, costed_line->quantity_milli);  // R10
        costed.lines.push_back(std::move(costed_line).value());
    }
    costed.total_pence = costed.materials_pence + costed.labour_pence;
    return costed;
}

}  // namespace mendwright::pricing
