#include "planner/remedies/quote_request.hpp"

#include <algorithm>
#include <set>

namespace mendwright::remedies {

namespace {

const Option* find_option(const Analysis& analysis, const std::string& id) {
    for (const auto& option : analysis.options)
        if (option.id == id) return &option;
    return nullptr;
}

// Findings the plan as a whole clears: urgent and C3 findings of the survey that its combined
// verification no longer shows.
std::set<std::string> cleared_by_plan(const Analysis& analysis, const Plan& plan) {
    const std::set<std::string> residual(plan.figures.residual_ids.begin(), plan.figures.residual_ids.end());
    std::set<std::string> cleared;
    for (const auto& finding : analysis.verifier->baseline())
        if (finding.code != rules::Code::note && !residual.count(finding.id)) cleared.insert(finding.id);
    return cleared;
}

}  // namespace

std::string plan_display_name(const std::string& plan_name) {
    if (plan_name == "least-cost") return "Least cost that clears every C1, C2 and FI";
    if (plan_name == "ideal") return "Ideal: clears all that can be cleared";
    if (plan_name == "custom") return "Options chosen with the client";
    return plan_name;
}

Result<pricing::WorksList> plan_works_list(const Analysis& analysis, const Plan& plan, const pricing::PriceBook& book) {
    const auto cleared = cleared_by_plan(analysis, plan);
    std::set<std::string> credited;  // each cleared finding is credited to the first option that clears it
    std::vector<pricing::OptionBill> bills;
    for (const auto& id : plan.option_ids) {
        const Option* option = find_option(analysis, id);
        if (!option) return problem("plan." + plan.name, "names option \"" + id + "\" that the analysis does not hold");
        pricing::OptionBill bill{option->id, option->title, {}, option->bill};
        for (const auto& finding_id : option->verification.cleared)
            if (cleared.count(finding_id) && credited.insert(finding_id).second) bill.clears_findings.push_back(finding_id);
        // Findings cleared only by the options working together are credited to the option
        // that targets them.
        for (const auto& finding_id : option->targets)
            if (cleared.count(finding_id) && credited.insert(finding_id).second) bill.clears_findings.push_back(finding_id);
        bills.push_back(std::move(bill));
    }
    return pricing::build_works_list(book, bills);
}

Result<pricing::PlanSummary> plan_summary(const Analysis& analysis, const Plan& plan, const pricing::PriceBook& book) {
    auto works = plan_works_list(analysis, plan, book);
    if (!works) return works.problem();
    pricing::PlanSummary summary;
    summary.name = plan_display_name(plan.name);
    for (const auto& id : plan.option_ids)
        if (const Option* option = find_option(analysis, id)) summary.option_titles.push_back(option->title);
    summary.total_pence = pricing::total_works(works.value()).total_pence;
    summary.residual = {plan.figures.residual_c1, plan.figures.residual_c2, plan.figures.residual_c3, plan.figures.residual_fi};
    summary.hours_off_supply = plan.figures.hours_off_supply;
    summary.certificates = plan.figures.certificates;
    summary.building_control_notification = plan.figures.notifiable;
    return summary;
}

Result<pricing::QuoteRequest> quote_request(const Analysis& analysis, const Plan& chosen, const Plan* alternative,
                                            const pricing::PriceBook& book, const QuoteParties& parties) {
    auto works = plan_works_list(analysis, chosen, book);
    if (!works) return works.problem();
    auto chosen_summary = plan_summary(analysis, chosen, book);
    if (!chosen_summary) return chosen_summary.problem();

    pricing::QuoteRequest request;
    request.number = parties.number;
    request.date = parties.date;
    request.client_name = parties.client_name;
    request.site_address = parties.site_address;
    request.works = std::move(works).value();
    request.chosen_plan = std::move(chosen_summary).value();
    if (alternative) {
        auto other = plan_summary(analysis, *alternative, book);
        if (!other) return other.problem();
        request.alternative_plan = std::move(other).value();
    }
    for (const auto& finding : analysis.verifier->baseline()) {
        if (finding.code == rules::Code::note) continue;
        request.findings.push_back({finding.id, rules::code_text(finding.code), finding.title, finding.location, finding.clause});
    }
    return request;
}

}  // namespace mendwright::remedies
