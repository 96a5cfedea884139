#include "planner/pricing/works.hpp"

#include <set>

#include "planner/core/checks.hpp"

namespace mendwright::pricing {

namespace {

void reprice(CostedLine& line, MilliUnits quantity, const PricingSettings& settings) {
    line.quantity_milli = quantity;
    line.materials_pence = line_materials_pence(line.unit_material_pence, quantity);
    line.labour_pence = line_labour_pence(line.labour_milli_hours_per_unit, quantity, settings.labour_rate_per_hour_pence);
}

std::optional<Problem> requantify(CostedLine& line, double quantity, const PricingSettings& settings,
                                  const std::string& field) {
    const auto milli = quantity_milli_units(quantity);
    if (!milli) {
        return problem(field, "expected a quantity from 0 to " + number_text(max_quantity_units) + " in " + line.unit +
                                  ", got " + number_text(quantity));
    }
    reprice(line, *milli, settings);
    return std::nullopt;
}

}  // namespace

Result<WorksList> build_works_list(const PriceBook& book, const std::vector<OptionBill>& options) {
    WorksList works;
    works.settings = book.settings;
    works.groups.reserve(options.size());
    std::set<std::string> seen;
    for (const auto& option : options) {
        if (option.option_id.empty()) return problem("options", "expected every option to have an id, got an empty one");
        if (!seen.insert(option.option_id).second) {
            return problem(option.option_id, "option appears twice in the works list");
        }
        auto costed = cost_bill(book, option.bill, option.option_id);
        if (!costed) return costed.problem();
        works.groups.push_back(
            WorksGroup{option.option_id, option.title, option.clears_findings, std::move(costed).value().lines});
    }
    return works;
}

std::optional<Problem> set_quantity(WorksList& works, std::size_t group, std::size_t line, double quantity) {
    const std::string field = "groups[" + std::to_string(group) + "].lines[" + std::to_string(line) + "]";
    if (group >= works.groups.size() || line >= works.groups[group].lines.size()) {
        return problem(field, "no such line in the works list");
    }
    return requantify(works.groups[group].lines[line], quantity, works.settings, field + ".quantity");
}

std::optional<Problem> set_extra_quantity(WorksList& works, std::size_t line, double quantity) {
    const std::string field = "extra_lines[" + std::to_string(line) + "]";
    if (line >= works.extra_lines.size()) return problem(field, "no such extra line in the works list");
    return requantify(works.extra_lines[line], quantity, works.settings, field + ".quantity");
}

std::optional<Problem> add_extra_line(WorksList& works, const ExtraLine& extra) {
    const std::string field = "extra_lines[" + std::to_string(works.extra_lines.size()) + "]";
    if (extra.description.empty()) return problem(field + ".description", "expected a description, got nothing");
    if (extra.unit.empty()) return problem(field + ".unit", "expected a unit such as each or m, got nothing");
    if (extra.unit_material_pence < 0 || extra.unit_material_pence > max_item_material_pence) {
        return problem(field + ".unit_material_pence",
                       "expected 0 to " + std::to_string(max_item_material_pence) + " pence, got " +
                           std::to_string(extra.unit_material_pence));
    }
    if (extra.labour_milli_hours_per_unit < 0 || extra.labour_milli_hours_per_unit > max_item_labour_milli_hours) {
        return problem(field + ".labour_milli_hours_per_unit",
                       "expected 0 to " + std::to_string(max_item_labour_milli_hours) + " milli-hours, got " +
                           std::to_string(extra.labour_milli_hours_per_unit));
    }
    if (extra.unit_material_pence == 0 && extra.labour_milli_hours_per_unit == 0) {
        return problem(field, "expected a material cost or labour hours above zero; a line is never priced at nothing");
    }
    CostedLine line;
    line.description = extra.description;
    line.unit = extra.unit;
    line.category = "extra";
    line.note = extra.note;
    line.unit_material_pence = extra.unit_material_pence;
    line.labour_milli_hours_per_unit = extra.labour_milli_hours_per_unit;
    if (auto refused = requantify(line, extra.quantity, works.settings, field + ".quantity")) return refused;
    works.extra_lines.push_back(std::move(line));
    return std::nullopt;
}

WorksTotals total_works(const WorksList& works) {
    WorksTotals totals;
    auto add_line = [&](const CostedLine& line) {
        totals.materials_pence += line.materials_pence;
        totals.labour_pence += line.labour_pence;
        totals.labour_milli_hours += site_milli_hours(line.labour_milli_hours_per_unit, line.quantity_milli);  // R10
        return line.total_pence();
    };
    for (const auto& group : works.groups) {
        Pence group_total = 0;
        for (const auto& line : group.lines) group_total += add_line(line);
        totals.group_pence.push_back(group_total);
    }
    for (const auto& line : works.extra_lines) totals.extras_pence += add_line(line);

    const PricingSettings& s = works.settings;
    totals.subtotal_pence = totals.materials_pence + totals.labour_pence;
    totals.contingency_pence = s.contingency.is_percentage
                                   ? percentage_of_pence(totals.subtotal_pence, s.contingency.percent_bp)
                                   : s.contingency.amount_pence;
    totals.markup_pence = percentage_of_pence(totals.materials_pence, s.markup_on_materials_bp);
    totals.net_pence = totals.subtotal_pence + totals.contingency_pence + totals.markup_pence;
    totals.vat_pence = percentage_of_pence(totals.net_pence, s.vat_bp);
    totals.total_pence = totals.net_pence + totals.vat_pence;
    return totals;
}

}  // namespace mendwright::pricing
