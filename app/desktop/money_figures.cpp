#include "app/desktop/money_figures.hpp"

#include "planner/remedies/ranking.hpp"

namespace mendwright::desktop {

MoneyFigures MoneyFigures::of(const pricing::WorksTotals& totals) {
    auto money = [](pricing::Pence pence) { return QString::fromStdString(remedies::money_text(pence)); };
    MoneyFigures figures;
    figures.materials = money(totals.materials_pence);
    figures.labour = money(totals.labour_pence);
    figures.subtotal = money(totals.subtotal_pence);
    figures.contingency = money(totals.contingency_pence);
    figures.markup = money(totals.markup_pence);
    figures.net = money(totals.net_pence);
    figures.vat = money(totals.vat_pence);
    figures.total = money(totals.total_pence);
    figures.hoursOnSite = QString::fromStdString(pricing::milli_hours_text(totals.labour_milli_hours));
    figures.totalPence = totals.total_pence;
    return figures;
}

}  // namespace mendwright::desktop
