#include "app/desktop/quote_assembly.hpp"

#include <algorithm>
#include <set>

namespace mendwright::desktop {

const remedies::Option* find_option(const std::vector<remedies::Option>& options, const std::string& id) {
    for (const auto& option : options)
        if (option.id == id) return &option;
    return nullptr;
}

std::vector<pricing::ScheduledFinding> finding_schedule(const std::vector<rules::Finding>& findings) {
    std::vector<pricing::ScheduledFinding> schedule;
    for (const auto& finding : findings) {
        if (finding.code == rules::Code::note) continue;
        schedule.push_back({finding.id, rules::code_text(finding.code), finding.title, finding.location, finding.clause});
    }
    return schedule;
}

Result<pricing::WorksList> plan_works(const pricing::PriceBook& book, const remedies::Plan& plan,
                                      const std::vector<remedies::Option>& options,
                                      const std::vector<rules::Finding>& findings) {
    std::set<std::string> scheduled;
    for (const auto& line : finding_schedule(findings)) scheduled.insert(line.id);
    std::vector<pricing::OptionBill> bills;
    for (const auto& id : plan.option_ids) {
        const remedies::Option* option = find_option(options, id);
        if (!option) return problem("plan." + plan.name, "no option \"" + id + "\"");
        pricing::OptionBill bill{option->id, option->title, {}, option->bill};
        for (const auto& cleared : option->verification.cleared)
            if (scheduled.count(cleared)) bill.clears_findings.push_back(cleared);
        bills.push_back(std::move(bill));
    }
    return pricing::build_works_list(book, bills);
}

pricing::PlanSummary plan_summary(const remedies::Plan& plan, const std::string& label,
                                  const std::vector<remedies::Option>& options, pricing::Pence total_pence) {
    pricing::PlanSummary summary;
    summary.name = label;
    for (const auto& id : plan.option_ids)
        if (const auto* option = find_option(options, id)) summary.option_titles.push_back(option->title);
    summary.total_pence = total_pence;
    summary.residual = {plan.figures.residual_c1, plan.figures.residual_c2, plan.figures.residual_c3, plan.figures.residual_fi};
    summary.hours_off_supply = plan.figures.hours_off_supply;
    summary.certificates = plan.figures.certificates;
    summary.building_control_notification = plan.figures.notifiable;
    return summary;
}

}  // namespace mendwright::desktop
