#include "planner/remedies/model_edits.hpp"

#include "planner/model/navigation.hpp"

#include <algorithm>
#include <unordered_map>

namespace mendwright::remedies::edits {

model::Board* board(model::Installation& installation, const std::string& board_id) {
    for (auto& b : installation.boards)
        if (b.id == board_id) return &b;
    return nullptr;
}

model::Device* device(model::Installation& installation, const std::string& device_id) {
    for (auto& b : installation.boards) {
        for (auto& d : b.devices)
            if (d.id == device_id) return &d;
        for (auto& c : b.circuits)
            if (c.device.id == device_id) return &c.device;
    }
    return nullptr;
}

std::string unused_id(const model::Installation& installation, const std::string& wanted) {
    auto used = [&](const std::string& id) {
        for (const auto& b : installation.boards) {
            if (b.id == id) return true;
            for (const auto& d : b.devices)
                if (d.id == id) return true;
            for (const auto& c : b.circuits)
                if (c.id == id || c.device.id == id) return true;
        }
        return false;
    };
    if (!used(wanted)) return wanted;
    for (int n = 2;; ++n) {
        std::string candidate = wanted + "-" + std::to_string(n);
        if (!used(candidate)) return candidate;
    }
}

IdsInUse::IdsInUse(const model::Installation& installation) {
    for (const auto& b : installation.boards) {
        ids_.insert(b.id);
        for (const auto& d : b.devices) ids_.insert(d.id);
        for (const auto& c : b.circuits) {
            ids_.insert(c.id);
            ids_.insert(c.device.id);
        }
    }
}

std::string IdsInUse::unused(const std::string& wanted) const {
    if (!ids_.count(wanted)) return wanted;
    for (int n = 2;; ++n) {
        std::string candidate = wanted + "-" + std::to_string(n);
        if (!ids_.count(candidate)) return candidate;
    }
}

int circuits_without_rcd(const model::Installation& installation, const model::Board& board) {
    int count = 0;
    for (const auto& circuit : board.circuits) {
        if (circuit.feeds_board_id) continue;
        if (model::residual_current_devices_above(installation, board, circuit).empty()) ++count;
    }
    return count;
}

int final_circuits_in_and_below(const model::Installation& installation, const std::string& board_id) {
    const model::Board* start = model::find_board(installation, board_id);
    if (!start) return 0;
    int count = 0;
    std::vector<const model::Board*> stack = {start};
    std::size_t guard = 0;
    while (!stack.empty() && guard++ <= installation.boards.size()) {
        const model::Board* b = stack.back();
        stack.pop_back();
        for (const auto& circuit : b->circuits) {
            if (!circuit.feeds_board_id) {
                ++count;
            } else if (const model::Board* child = model::find_board(installation, *circuit.feeds_board_id)) {
                stack.push_back(child);
            }
        }
    }
    return count;
}

std::vector<CircuitChain> final_circuit_chains(const model::Installation& installation) {
    std::unordered_map<std::string, model::CircuitRef> feeder_of;
    for (const auto& b : installation.boards)
        for (const auto& c : b.circuits)
            if (c.feeds_board_id) feeder_of.emplace(*c.feeds_board_id, model::CircuitRef{&b, &c});
    std::vector<CircuitChain> chains;
    for (const auto& b : installation.boards) {
        std::unordered_map<std::string, const model::Device*> devices;
        for (const auto& d : b.devices) devices.emplace(d.id, &d);
        (void)devices;
        for (const auto& c : b.circuits) {
            if (c.feeds_board_id) continue;
            CircuitChain chain{{&b, &c}, {}};
            const model::Board* board = &b;
            const model::Circuit* circuit = &c;
            for (std::size_t hops = 0; board && circuit && hops <= installation.boards.size(); ++hops) {
                chain.devices.push_back({board, &circuit->device, circuit});
                std::optional<std::string> next = circuit->upstream_id;
                std::size_t steps = 0;
                while (next && steps++ <= board->devices.size()) {
                    const model::Device* found = nullptr;
                    for (const auto& d : board->devices)
                        if (d.id == *next) found = &d;
                    if (!found) break;
                    chain.devices.push_back({board, found, nullptr});
                    next = found->upstream_id;
                }
                auto it = feeder_of.find(board->id);
                if (it == feeder_of.end()) break;
                board = it->second.board;
                circuit = it->second.circuit;
            }
            chains.push_back(std::move(chain));
        }
    }
    return chains;
}

model::Device new_residual_device(const std::string& id, model::DeviceKind kind, double rating_amps,
                                  double residual_amps, model::RcdDelay delay) {
    model::Device device;
    device.id = id;
    device.kind = kind;
    device.rating_amps = rating_amps;
    device.residual_current_amps = residual_amps;
    device.rcd_type = model::RcdType::a;
    device.delay = delay;
    device.installed_new = true;
    return device;
}

void insert_rcd_at_meter(model::Installation& installation, const UpstreamRcd& spec) {
    if (!board(installation, spec.origin_board_id)) return;
    model::Board enclosure;
    enclosure.id = unused_id(installation, "upstream-rcd-enclosure");
    enclosure.name = "RCD enclosure";
    enclosure.location = "beside the meter";
    enclosure.enclosure = model::EnclosureMaterial::non_combustible_other;
    model::Circuit feed;
    feed.id = unused_id(installation, "upstream-rcd-feed");
    feed.number = "1";
    feed.description = "Supply to the board (the former tails run)";
    feed.use = model::CircuitUse::submain;
    feed.feeds_board_id = spec.origin_board_id;
    feed.device = new_residual_device(unused_id(installation, "upstream-rcd"), model::DeviceKind::rcd,
                                      std::max(installation.supply.supply_fuse_rating_amps, 63.0), spec.residual_amps,
                                      spec.delay);
    feed.line_csa_mm2 = installation.tails.csa_mm2;
    feed.cpc_csa_mm2 = installation.tails.csa_mm2;
    feed.length_m = installation.tails.length_m;
    enclosure.circuits.push_back(feed);
    installation.tails.length_m = spec.new_tails_length_m;
    installation.tails.route = model::TailsRoute::surface;
    installation.boards.insert(installation.boards.begin(), std::move(enclosure));
}

void forget_device_tests(model::Circuit& circuit) {
    circuit.rcd_trip_ms_at_idn.reset();
    circuit.rcd_trip_ms_at_5idn.reset();
}

}  // namespace mendwright::remedies::edits
