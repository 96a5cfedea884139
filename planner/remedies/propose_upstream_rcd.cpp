// Kind 1 (and the first remedy of kind 6): an RCD in its own enclosure at the meter, ahead of
// the origin board, in two variants from the catalogue: "upstream-rcd-s100" (100 mA
// time-delayed, S-type) and "upstream-rcd-30" (30 mA general, every circuit on one device).
// The enclosure sits beside the meter, so the old tails run becomes the cable from the
// enclosure to the board, protected by the new RCD.
#include <algorithm>

#include "planner/model/navigation.hpp"
#include "planner/remedies/model_edits.hpp"
#include "planner/remedies/proposals.hpp"

namespace mendwright::remedies {

std::vector<Option> propose_upstream_rcd(const ProposalContext& context) {
    std::vector<Option> options;
    const model::Board* origin = model::origin_board(context.installation);
    if (!origin) return options;
    for (const char* kind : {"upstream-rcd-s100", "upstream-rcd-30"}) {
        const CatalogueEntry* entry = context.catalogue.find(kind);
        if (!entry) continue;
        auto targets = detail::targets_for(*entry, context.findings, {});
        if (targets.empty()) continue;
        edits::UpstreamRcd spec;
        spec.origin_board_id = origin->id;
        spec.residual_amps = entry->parameter("residual_current_amps", 0.1);
        spec.delay = entry->parameter("time_delayed", 1.0) > 0.5 ? model::RcdDelay::time_delayed : model::RcdDelay::general;
        spec.new_tails_length_m = entry->parameter("new_tails_length_m", 1.0);
        // Circuits that come under an RCD for the first time need their insulation tested first.
        int newly_covered = 0;
        const auto chains = edits::final_circuit_chains(context.installation);
        for (const auto& chain : chains)
            newly_covered += std::none_of(chain.devices.begin(), chain.devices.end(),
                                          [](const model::DeviceRef& d) { return model::is_residual_current_device(*d.device); });
        const int all_circuits = static_cast<int>(chains.size());
        Option option = detail::from_entry(
            *entry, std::string(kind) + "@board:" + origin->id,
            {{"board", detail::board_name(*origin)}, {"circuits", std::to_string(newly_covered)},
             {"tails_length", detail::number_text(spec.new_tails_length_m, 1)}},
            {{"circuit", newly_covered}, {"metre", spec.new_tails_length_m}}, all_circuits);
        option.targets = std::move(targets);
        option.slots = {"origin", "tails"};
        option.whole_installation = true;
        option.apply = [spec](model::Installation& installation) { edits::insert_rcd_at_meter(installation, spec); };
        options.push_back(std::move(option));
    }
    return options;
}

}  // namespace mendwright::remedies
