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

namespace {

struct UpstreamRcd {
    std::string origin_board_id;
    double residual_amps = 0.1;
    model::RcdDelay delay = model::RcdDelay::time_delayed;
    double new_tails_length_m = 1.0;
};

void insert_upstream_rcd(model::Installation& installation, const UpstreamRcd& spec) {
    if (!edits::board(installation, spec.origin_board_id)) return;
    model::Board enclosure;
    enclosure.id = edits::unused_id(installation, "upstream-rcd-enclosure");
    enclosure.name = "RCD enclosure";
    enclosure.location = "beside the meter";
    enclosure.enclosure = model::EnclosureMaterial::non_combustible_other;
    model::Circuit feed;
    feed.id = edits::unused_id(installation, "upstream-rcd-feed");
    feed.number = "1";
    feed.description = "Supply to the board (the former tails run)";
    feed.use = model::CircuitUse::submain;
    feed.feeds_board_id = spec.origin_board_id;
    feed.device = edits::new_residual_device(edits::unused_id(installation, "upstream-rcd"), model::DeviceKind::rcd,
                                             std::max(installation.supply.supply_fuse_rating_amps, 63.0),
                                             spec.residual_amps, spec.delay);
    feed.line_csa_mm2 = installation.tails.csa_mm2;
    feed.cpc_csa_mm2 = installation.tails.csa_mm2;
    feed.length_m = installation.tails.length_m;
    enclosure.circuits.push_back(feed);
    installation.tails.length_m = spec.new_tails_length_m;
    installation.tails.route = model::TailsRoute::surface;
    installation.boards.insert(installation.boards.begin(), std::move(enclosure));
}

}  // namespace

std::vector<Option> propose_upstream_rcd(const ProposalContext& context) {
    std::vector<Option> options;
    const model::Board* origin = model::origin_board(context.installation);
    if (!origin) return options;
    for (const char* kind : {"upstream-rcd-s100", "upstream-rcd-30"}) {
        const CatalogueEntry* entry = context.catalogue.find(kind);
        if (!entry) continue;
        auto targets = detail::targets_for(*entry, context.findings, {});
        if (targets.empty()) continue;
        UpstreamRcd spec;
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
        option.apply = [spec](model::Installation& installation) { insert_upstream_rcd(installation, spec); };
        options.push_back(std::move(option));
    }
    return options;
}

}  // namespace mendwright::remedies
