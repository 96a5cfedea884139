#pragma once
// The words a survey document uses for the model's enumerations: lowercase snake_case, the
// same spelling as the enumerator ("tt", "tn_c_s", "privately_rented_dwelling", "time_delayed").
// One table per enumeration, read and written from the same table so the two cannot drift.

#include <optional>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

#include "planner/model/installation.hpp"

namespace mendwright::io {

template <class Enum>
using WordTable = std::vector<std::pair<Enum, const char*>>;

const WordTable<model::Occupancy>& occupancy_words();
const WordTable<model::EarthingArrangement>& earthing_words();
const WordTable<model::ObservationCode>& observation_code_words();
const WordTable<model::ElectrodeKind>& electrode_kind_words();
const WordTable<model::ElectrodeLayout>& electrode_layout_words();
const WordTable<model::TailsRoute>& tails_route_words();
const WordTable<model::TailsOriginProtection>& tails_origin_protection_words();
const WordTable<model::DeviceKind>& device_kind_words();
const WordTable<model::RcdType>& rcd_type_words();
const WordTable<model::RcdDelay>& rcd_delay_words();
const WordTable<model::BreakerCurve>& breaker_curve_words();
const WordTable<model::CircuitUse>& circuit_use_words();
const WordTable<model::EnclosureMaterial>& enclosure_material_words();

template <class Enum>
std::string word_of(const WordTable<Enum>& table, Enum value) {
    for (const auto& [item, word] : table)
        if (item == value) return word;
    return "unknown";
}

template <class Enum>
std::optional<Enum> enum_of(const WordTable<Enum>& table, std::string_view word) {
    for (const auto& [item, text] : table)
        if (word == text) return item;
    return std::nullopt;
}

// "\"tt\", \"tn_s\" or \"tn_c_s\"", for messages.
template <class Enum>
std::string word_list(const WordTable<Enum>& table) {
    std::string text;
    for (std::size_t i = 0; i < table.size(); ++i) {
        if (i > 0) text += (i + 1 == table.size()) ? " or " : ", ";
        text += std::string("\"") + table[i].second + "\"";
    }
    return text;
}

}  // namespace mendwright::io
