#include "planner/remedies/report_json.hpp"

namespace mendwright::remedies {

using nlohmann::json;

json option_json(const Option& option) {
    const auto& v = option.verification;
    json bill = json::array();
    for (const auto& line : option.bill)
        bill.push_back({{"item_code", line.item_code}, {"quantity", line.quantity}, {"note", line.note}});
    json cost = {{"materials_pence", option.cost.materials_pence},
                 {"labour_pence", option.cost.labour_pence},
                 {"total_pence", option.cost.total_pence},
                 {"priced", option.cost.priced}};
    if (!option.cost.priced) cost["problem"] = option.cost.problem;
    return {{"id", option.id},
            {"kind", option.kind},
            {"title", option.title},
            {"description", option.description},
            {"targets", option.targets},
            {"verification",
             {{"cleared", v.cleared},
              {"still_open", v.still_open},
              {"introduced", v.introduced},
              {"introduced_urgent", v.introduced_urgent},
              {"clears_every_urgent_target", v.clears_every_urgent_target}}},
            {"cost", cost},
            {"bill", bill},
            {"hours_off_supply", option.hours_off_supply},
            {"notifiable", option.notifiable},
            {"certificate", option.certificate},
            {"assumptions", option.assumptions},
            {"prerequisites", option.prerequisites},
            {"leaves_open", option.leaves_open},
            {"excludes_with_slots", option.slots},
            {"ranked_last", option.ranked_last},
            {"rank_reasons", option.rank_reasons}};
}

json options_json(const std::vector<Option>& options, const std::vector<FindingRanking>& rankings) {
    json list = json::array();
    for (const auto& option : options) list.push_back(option_json(option));
    json by_finding = json::array();
    for (const auto& ranking : rankings)
        by_finding.push_back({{"finding", ranking.finding_id},
                              {"code", rules::code_text(ranking.code)},
                              {"options", ranking.option_ids},
                              {"reasons", ranking.reasons}});
    return {{"options", list}, {"by_finding", by_finding}};
}

json plan_json(const Plan& plan) {
    const auto& f = plan.figures;
    json touch = f.worst_touch_volts ? json(*f.worst_touch_volts) : json(nullptr);
    return {{"name", plan.name},
            {"options", plan.option_ids},
            {"total_pence", f.total_pence},
            {"materials_pence", f.materials_pence},
            {"labour_pence", f.labour_pence},
            {"residual", {{"C1", f.residual_c1}, {"C2", f.residual_c2}, {"C3", f.residual_c3}, {"FI", f.residual_fi}}},
            {"residual_findings", f.residual_ids},
            {"introduced_findings", f.introduced_ids},
            {"circuits_lost_on_one_trip", f.circuits_lost_on_one_trip},
            {"worst_touch_volts", touch},
            {"touch_note", f.touch_note},
            {"hours_off_supply", f.hours_off_supply},
            {"certificates", f.certificates},
            {"notifiable", f.notifiable},
            {"notes", plan.notes}};
}

}  // namespace mendwright::remedies
