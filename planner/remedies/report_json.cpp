#include "planner/remedies/report_json.hpp"

#include "planner/remedies/parallel.hpp"

namespace mendwright::remedies {

using nlohmann::json;

namespace {

// An array of strings, built in place (the initializer-list form copies every value again).
json string_array(const std::vector<std::string>& items) {
    json array = json::array();
    auto& list = array.get_ref<json::array_t&>();
    list.reserve(items.size());
    for (const auto& item : items) list.emplace_back(item);
    return array;
}

}  // namespace

json option_json(const Option& option) {
    const auto& v = option.verification;
    json bill = json::array();
    for (const auto& line : option.bill) {
        json entry = json::object();
        entry["item_code"] = line.item_code;
        entry["quantity"] = line.quantity;
        entry["note"] = line.note;
        bill.push_back(std::move(entry));
    }
    json cost = json::object();
    cost["materials_pence"] = option.cost.materials_pence;
    cost["labour_pence"] = option.cost.labour_pence;
    cost["total_pence"] = option.cost.total_pence;
    cost["priced"] = option.cost.priced;
    if (!option.cost.priced) cost["problem"] = option.cost.problem;
    json verification = json::object();
    verification["cleared"] = string_array(v.cleared);
    verification["still_open"] = string_array(v.still_open);
    verification["introduced"] = string_array(v.introduced);
    verification["introduced_urgent"] = string_array(v.introduced_urgent);
    verification["clears_every_urgent_target"] = v.clears_every_urgent_target;
    json result = json::object();
    result["id"] = option.id;
    result["kind"] = option.kind;
    result["title"] = option.title;
    result["description"] = option.description;
    result["targets"] = string_array(option.targets);
    result["verification"] = std::move(verification);
    result["cost"] = std::move(cost);
    result["bill"] = std::move(bill);
    result["hours_off_supply"] = option.hours_off_supply;
    result["notifiable"] = option.notifiable;
    result["certificate"] = option.certificate;
    result["assumptions"] = string_array(option.assumptions);
    result["prerequisites"] = string_array(option.prerequisites);
    result["leaves_open"] = string_array(option.leaves_open);
    result["excludes_with_slots"] = string_array(option.slots);
    result["ranked_last"] = option.ranked_last;
    result["rank_reasons"] = string_array(option.rank_reasons);
    return result;
}

json options_json(const std::vector<Option>& options, const std::vector<FindingRanking>& rankings) {
    // Each option's object and each finding's ranking are their own: all are built across the
    // cores (parallel.hpp), each into its own place, then put in order.
    json::array_t built_options(options.size());
    json::array_t built_rankings(rankings.size());
    run_in_parallel(options.size() + rankings.size(), [&](std::size_t i) {
        if (i < options.size()) {
            built_options[i] = option_json(options[i]);
            return;
        }
        const FindingRanking& ranking = rankings[i - options.size()];
        json entry = json::object();
        entry["finding"] = ranking.finding_id;
        entry["code"] = rules::code_text(ranking.code);
        entry["options"] = string_array(ranking.option_ids);
        entry["reasons"] = string_array(ranking.reasons);
        built_rankings[i - options.size()] = std::move(entry);
    });
    json result = json::object();
    result["options"] = std::move(built_options);
    result["by_finding"] = std::move(built_rankings);
    return result;
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
