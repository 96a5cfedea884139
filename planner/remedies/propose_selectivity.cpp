// Kind 7: selectivity between RCDs in series. A general-type RCD with another RCD or RCBO below
// it is replaced by a time-delayed (S-type) one of at least three times the downstream IΔn
// (general rule read; BS 7671 536.4.1.4 as its home from memory).
#include <algorithm>
#include <map>
#include <set>

#include "planner/model/navigation.hpp"
#include "planner/remedies/model_edits.hpp"
#include "planner/remedies/proposals.hpp"

namespace mendwright::remedies {

namespace {

// Standard IΔn ratings in amperes (BS EN 61008-1 preferred values, read: 0.01, 0.03, 0.1, 0.3,
// 0.5); the smallest that is at least `needed_amps`.
double standard_rating_at_least(double needed_amps) {
    for (double rating : {0.1, 0.3, 0.5, 1.0})
        if (rating + 1e-9 >= needed_amps) return rating;
    return 1.0;
}

}  // namespace

std::vector<Option> propose_selectivity(const ProposalContext& context) {
    std::vector<Option> options;
    const CatalogueEntry* entry = context.catalogue.find("rcd-s-type");
    if (!entry) return options;
    const auto& installation = context.installation;
    // For each general RCD that has a residual current device below it: the largest IΔn below
    // and the circuits and devices below it.
    struct Upstream {
        const model::Board* board = nullptr;
        const model::Device* device = nullptr;
        double largest_below_amps = 0.0;
        std::set<std::string> below;  // circuit and device ids below it
    };
    std::map<std::string, Upstream> upstream;
    std::map<std::string, int> finals_below;
    for (const auto& chain : edits::final_circuit_chains(installation)) {
        const auto& ref = chain.circuit;
        std::vector<model::DeviceRef> rcds;
        for (const auto& d : chain.devices) {
            ++finals_below[d.device->id];
            if (model::is_residual_current_device(*d.device)) rcds.push_back(d);
        }
        for (std::size_t i = 1; i < rcds.size(); ++i) {
            const model::Device& device = *rcds[i].device;
            if (device.kind != model::DeviceKind::rcd || device.delay != model::RcdDelay::general) continue;
            Upstream& u = upstream[device.id];
            u.board = rcds[i].board;
            u.device = &device;
            u.largest_below_amps = std::max(u.largest_below_amps, rcds[0].device->residual_current_amps.value_or(0.03));
            u.below.insert(ref.circuit->id);
            for (std::size_t j = 0; j < i; ++j) u.below.insert(rcds[j].device->id);
        }
    }
    for (const auto& [device_id, u] : upstream) {
        std::vector<std::string> targets;
        for (const auto& finding : context.findings) {
            if (finding.code == rules::Code::note || !entry->targets_rule(finding.rule)) continue;
            if (finding.device_id == device_id || u.below.count(finding.device_id) || u.below.count(finding.circuit_id))
                targets.push_back(finding.id);
        }
        if (targets.empty()) continue;
        const double rating = standard_rating_at_least(entry->parameter("selectivity_ratio", 3.0) * u.largest_below_amps);
        // In its own enclosure (a board holding only this device's circuit) or a board module.
        const bool own_enclosure = u.board->circuits.size() == 1 && u.board->devices.size() <= 1;
        Option option = detail::from_entry(
            *entry, "rcd-s-type@device:" + device_id,
            {{"device", u.device->label.empty() ? device_id : u.device->label}, {"board", detail::board_name(*u.board)},
             {"milliamps", detail::number_text(rating * 1000.0, 0)}},
            {}, finals_below[device_id]);
        option.bill.insert(option.bill.begin(),
                           {own_enclosure ? "RCD-S100-ENCL" : "RCD-S100-MOD", 1.0, "time-delayed RCD in place of " + device_id});
        option.targets = std::move(targets);
        option.slots = {"device:" + device_id, "board:" + u.board->id};
        option.touched_boards = {u.board->id};
        option.apply = [device_id, rating](model::Installation& copy) {
            model::Device* device = edits::device(copy, device_id);
            if (!device) return;
            device->delay = model::RcdDelay::time_delayed;
            device->residual_current_amps = std::max(device->residual_current_amps.value_or(0.0), rating);
            device->rcd_type = model::RcdType::a;
            device->installed_new = true;
        };
        options.push_back(std::move(option));
    }
    return options;
}

}  // namespace mendwright::remedies
