#include "planner/remedies/plans.hpp"

#include <algorithm>
#include <map>
#include <set>
#include <unordered_map>
#include <unordered_set>

#include "planner/calc/rcd.hpp"
#include "planner/model/navigation.hpp"
#include "planner/remedies/cover_search.hpp"
#include "planner/remedies/model_edits.hpp"
#include "planner/remedies/proposals.hpp"

namespace mendwright::remedies {

namespace {

calc::RcdType rcd_type_of(const model::Device& device) {
    return device.delay == model::RcdDelay::time_delayed ? calc::RcdType::time_delayed : calc::RcdType::general;
}

// Whether an upstream residual current device stays closed for a fault the downstream one clears
// (calc::rcd_selectivity: S-type upstream and IΔn ratio >= 3).
bool selective(const model::Device& upstream, const model::Device& downstream) {
    auto check = calc::rcd_selectivity(rcd_type_of(upstream), upstream.residual_current_amps.value_or(0.03),
                                       rcd_type_of(downstream), downstream.residual_current_amps.value_or(0.03));
    return check && check->selective;
}

}  // namespace

PlanFigures plan_figures(const model::Installation& changed, const std::vector<rules::Finding>& before,
                         const std::vector<rules::Finding>& after, const std::vector<const Option*>& options,
                         const RemedySettings& settings) {
    PlanFigures figures;
    std::set<std::string> certificates;
    for (const Option* option : options) {
        figures.materials_pence += option->cost.materials_pence;
        figures.labour_pence += option->cost.labour_pence;
        figures.total_pence += option->cost.total_pence;
        figures.hours_off_supply += option->hours_off_supply;
        figures.notifiable = figures.notifiable || option->notifiable;
        if (!option->certificate.empty() && option->certificate != "none") certificates.insert(option->certificate);
    }
    figures.certificates.assign(certificates.begin(), certificates.end());
    std::unordered_set<std::string> before_ids;
    for (const auto& f : before) before_ids.insert(f.id);
    for (const auto& f : after) {
        if (f.code == rules::Code::note) continue;
        figures.residual_ids.push_back(f.id);
        if (!before_ids.count(f.id)) figures.introduced_ids.push_back(f.id);
        switch (f.code) {
            case rules::Code::c1: ++figures.residual_c1; break;
            case rules::Code::c2: ++figures.residual_c2; break;
            case rules::Code::c3: ++figures.residual_c3; break;
            case rules::Code::fi: ++figures.residual_fi; break;
            case rules::Code::note: break;
        }
    }

    // Circuits lost on one trip: for an earth fault on each final circuit, the highest device in
    // its chain that may open (its nearest RCD, and any RCD above that is not selective with it;
    // with no RCD, its own device); the count of final circuits below that device.
    std::unordered_map<const model::Device*, int> below_count;
    std::vector<std::vector<model::DeviceRef>> chains;
    for (auto& chain : edits::final_circuit_chains(changed)) {
        for (const auto& d : chain.devices) ++below_count[d.device];
        chains.push_back(std::move(chain.devices));
    }
    bool ra_known = false;
    double ra_ohms = 0.0;
    if (changed.electrode) {
        const auto& e = *changed.electrode;
        if (e.remeasured_ra_ohms) { ra_known = true; ra_ohms = *e.remeasured_ra_ohms; }
        else if (e.measured_ra_ohms) { ra_known = true; ra_ohms = *e.measured_ra_ohms; }
    }
    const bool tt = changed.supply.earthing == model::EarthingArrangement::tt;
    const double factor = changed.electrode ? season_factor_for(*changed.electrode, settings) : settings.season_factor_unknown_month;
    bool any_without_rcd = false;
    double worst_touch = 0.0;
    for (const auto& chain : chains) {
        const model::Device* nearest = nullptr;
        const model::Device* highest = chain.empty() ? nullptr : chain.front().device;
        for (const auto& d : chain) {
            if (!model::is_residual_current_device(*d.device)) continue;
            if (!nearest) {
                nearest = d.device;
                highest = d.device;
            } else if (!selective(*d.device, *nearest)) {
                highest = d.device;
            }
        }
        if (highest) figures.circuits_lost_on_one_trip = std::max(figures.circuits_lost_on_one_trip, below_count[highest]);
        if (tt && ra_known) {
            if (nearest) worst_touch = std::max(worst_touch, ra_ohms * factor * nearest->residual_current_amps.value_or(0.03));
            else any_without_rcd = true;
        }
    }
    if (!tt) {
        figures.touch_note = "not a TT supply: touch voltage follows the supply's earth path, not RA × IΔn";
    } else if (!ra_known) {
        figures.touch_note = "RA not recorded";
    } else if (any_without_rcd) {
        // With no RCD the fault current is limited only by the earth path and the device may never
        // open: the metalwork can stay near U0 (DOMAIN.md, TT).
        figures.worst_touch_volts = changed.supply.u0_volts;
        figures.touch_note = "a circuit has no RCD: exposed metalwork can rise towards U0 and stay there";
    } else {
        figures.worst_touch_volts = worst_touch;
        figures.touch_note = "worst-season RA " + detail::number_text(ra_ohms * factor, 0) + " Ω (×" +
                             detail::number_text(factor, 2) + ") × IΔn of the nearest RCD";
    }
    return figures;
}

namespace {

bool eligible(const Option& option) { return option.cost.priced && !option.ranked_last && option.apply; }

Plan verified_plan(Verifier& verifier, const std::string& name, const std::vector<const Option*>& chosen,
                   const RemedySettings& settings) {
    Plan plan;
    plan.name = name;
    for (const Option* option : chosen) plan.option_ids.push_back(option->id);
    const model::Installation copy = verifier.combined_copy(chosen);
    // plan_figures reads only ids and codes of what is left: the verdict is enough.
    const auto after = verifier.assess(copy, rules::FindingDetail::verdict);
    plan.figures = plan_figures(copy, verifier.baseline(), after, chosen, settings);
    return plan;
}

// Searches, verifies the combination, and searches again without a combination whose combined
// verification leaves open an urgent finding it was chosen to clear.
Plan searched_plan(Verifier& verifier, const std::vector<Option>& options, const std::string& name,
                   const std::vector<std::string>& required, const std::vector<CoverOption>& cover,
                   const std::vector<std::size_t>& cover_to_option, const RemedySettings& settings) {
    std::vector<std::set<std::size_t>> forbidden;
    Plan last;
    constexpr int max_rounds = 4;
    for (int round = 0; round < max_rounds; ++round) {
        CoverResult result = least_cost_cover(cover, required, forbidden);
        std::vector<const Option*> chosen;
        for (std::size_t i : result.chosen) chosen.push_back(&options[cover_to_option[i]]);
        // Apply in the order the options were proposed (origin first, then boards, ...).
        std::sort(chosen.begin(), chosen.end());
        Plan plan = verified_plan(verifier, name, chosen, settings);
        for (const auto& id : result.uncoverable)
            plan.notes.push_back("no option clears " + id);
        for (const auto& id : result.left_open)
            plan.notes.push_back("left open: options that clear " + id + " exclude others the plan needs");
        plan.notes.push_back("exact search: " + std::to_string(result.nodes) + " nodes");
        // Only urgent findings the search counted on and the combination left open send it back.
        std::set<std::string> residual(plan.figures.residual_ids.begin(), plan.figures.residual_ids.end());
        std::set<std::string> urgent;
        for (const auto& f : verifier.baseline())
            if (f.urgent()) urgent.insert(f.id);
        std::vector<std::string> missed;
        for (const auto& id : required)
            if (urgent.count(id) && residual.count(id) &&
                std::find(result.uncoverable.begin(), result.uncoverable.end(), id) == result.uncoverable.end())
                missed.push_back(id);
        if (round > 0 && result.chosen.empty()) {
            // Nothing else to try: the best combination found, with what it leaves open.
            last.notes.push_back("no other combination of options clears them");
            return last;
        }
        if (missed.empty() || result.chosen.empty()) {
            if (round > 0)
                plan.notes.push_back(std::to_string(round) +
                                     " cheaper combination(s) set aside: verified together they left urgent findings open");
            return plan;
        }
        std::string text;
        for (const auto& id : missed) text += (text.empty() ? "" : ", ") + id;
        plan.notes.push_back("verified together, the options leave open: " + text);
        last = plan;
        forbidden.emplace_back(result.chosen.begin(), result.chosen.end());
    }
    return last;
}

}  // namespace

Plan least_cost_plan(Verifier& verifier, const std::vector<Option>& options, const RemedySettings& settings) {
    std::vector<std::string> required;
    for (const auto& f : verifier.baseline())
        if (f.urgent()) required.push_back(f.id);
    std::vector<CoverOption> cover;
    std::vector<std::size_t> cover_to_option;
    for (std::size_t i = 0; i < options.size(); ++i) {
        if (!eligible(options[i])) continue;
        cover.push_back({options[i].id, options[i].cost.total_pence, options[i].verification.cleared, options[i].slots});
        cover_to_option.push_back(i);
    }
    return searched_plan(verifier, options, "least-cost", required, cover, cover_to_option, settings);
}

Plan ideal_plan(Verifier& verifier, const std::vector<Option>& options, const RemedySettings& settings) {
    std::vector<std::string> required;
    for (const auto& f : verifier.baseline())
        if (f.code != rules::Code::note) required.push_back(f.id);
    // The ideal plan also aims for the ideal electrode target, which the rules only note: the
    // note joins what the plan must clear when an eligible option clears it.
    for (const auto& f : verifier.baseline()) {
        if (f.code != rules::Code::note || f.rule != "electrode.resistance") continue;
        const bool clearable = std::any_of(options.begin(), options.end(), [&](const Option& o) {
            return eligible(o) && std::find(o.verification.cleared.begin(), o.verification.cleared.end(), f.id) !=
                                      o.verification.cleared.end();
        });
        if (clearable) required.push_back(f.id);
    }
    // An option the catalogue marks as the cheaper variant costs a penalty larger than any real
    // plan, so it is used only where no other option clears a finding.
    constexpr std::int64_t avoid_penalty = 100'000'000'000LL;
    std::vector<CoverOption> cover;
    std::vector<std::size_t> cover_to_option;
    for (std::size_t i = 0; i < options.size(); ++i) {
        if (!eligible(options[i])) continue;
        const std::int64_t cost = options[i].cost.total_pence + (options[i].ideal_avoid ? avoid_penalty : 0);
        cover.push_back({options[i].id, cost, options[i].verification.cleared, options[i].slots});
        cover_to_option.push_back(i);
    }
    return searched_plan(verifier, options, "ideal", required, cover, cover_to_option, settings);
}

Result<Plan> custom_plan(Verifier& verifier, const std::vector<Option>& options, const std::vector<std::string>& chosen_ids,
                         const RemedySettings& settings) {
    std::vector<const Option*> chosen;
    std::map<std::string, std::string> slot_owner;
    for (const auto& id : chosen_ids) {
        auto it = std::find_if(options.begin(), options.end(), [&](const Option& o) { return o.id == id; });
        if (it == options.end()) return problem("--choose", "no option \"" + id + "\" (see the options command for the ids)");
        if (std::find(chosen.begin(), chosen.end(), &*it) != chosen.end())
            return problem("--choose", "option \"" + id + "\" is given twice");
        for (const auto& slot : it->slots) {
            auto [owner, inserted] = slot_owner.emplace(slot, id);
            if (!inserted)
                return problem("--choose", "options \"" + owner->second + "\" and \"" + id + "\" exclude each other (both change " + slot + ")");
        }
        chosen.push_back(&*it);
    }
    std::sort(chosen.begin(), chosen.end());
    Plan plan = verified_plan(verifier, "custom", chosen, settings);
    for (const Option* option : chosen)
        if (!option->cost.priced) plan.notes.push_back(option->id + " is not priced: " + option->cost.problem);
    return plan;
}

}  // namespace mendwright::remedies
