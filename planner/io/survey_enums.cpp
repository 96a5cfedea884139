#include "planner/io/survey_enums.hpp"

namespace mendwright::io {

using namespace model;

const WordTable<Occupancy>& occupancy_words() {
    static const WordTable<Occupancy> table{{Occupancy::owner_occupied_dwelling, "owner_occupied_dwelling"},
                                            {Occupancy::privately_rented_dwelling, "privately_rented_dwelling"},
                                            {Occupancy::commercial, "commercial"},
                                            {Occupancy::other, "other"}};
    return table;
}

const WordTable<EarthingArrangement>& earthing_words() {
    static const WordTable<EarthingArrangement> table{
        {EarthingArrangement::tt, "tt"}, {EarthingArrangement::tn_s, "tn_s"}, {EarthingArrangement::tn_c_s, "tn_c_s"}};
    return table;
}

const WordTable<ObservationCode>& observation_code_words() {
    static const WordTable<ObservationCode> table{
        {ObservationCode::c1, "c1"}, {ObservationCode::c2, "c2"}, {ObservationCode::c3, "c3"}, {ObservationCode::fi, "fi"}};
    return table;
}

const WordTable<ElectrodeKind>& electrode_kind_words() {
    static const WordTable<ElectrodeKind> table{
        {ElectrodeKind::rod, "rod"}, {ElectrodeKind::tape, "tape"}, {ElectrodeKind::plate, "plate"}};
    return table;
}

const WordTable<ElectrodeLayout>& electrode_layout_words() {
    static const WordTable<ElectrodeLayout> table{{ElectrodeLayout::single, "single"},
                                                  {ElectrodeLayout::line, "line"},
                                                  {ElectrodeLayout::hollow_square, "hollow_square"}};
    return table;
}

const WordTable<TailsRoute>& tails_route_words() {
    static const WordTable<TailsRoute> table{{TailsRoute::surface, "surface"},
                                             {TailsRoute::concealed_in_wall, "concealed_in_wall"},
                                             {TailsRoute::buried, "buried"}};
    return table;
}

const WordTable<TailsOriginProtection>& tails_origin_protection_words() {
    static const WordTable<TailsOriginProtection> table{{TailsOriginProtection::none, "none"},
                                                        {TailsOriginProtection::switch_fuse, "switch_fuse"}};
    return table;
}

const WordTable<DeviceKind>& device_kind_words() {
    static const WordTable<DeviceKind> table{{DeviceKind::main_switch, "main_switch"}, {DeviceKind::rcd, "rcd"},
                                             {DeviceKind::circuit_breaker, "circuit_breaker"}, {DeviceKind::rcbo, "rcbo"},
                                             {DeviceKind::fuse, "fuse"}, {DeviceKind::switch_fuse, "switch_fuse"}};
    return table;
}

const WordTable<RcdType>& rcd_type_words() {
    static const WordTable<RcdType> table{{RcdType::ac, "ac"}, {RcdType::a, "a"}, {RcdType::f, "f"}, {RcdType::b, "b"}};
    return table;
}

const WordTable<RcdDelay>& rcd_delay_words() {
    static const WordTable<RcdDelay> table{{RcdDelay::general, "general"}, {RcdDelay::time_delayed, "time_delayed"}};
    return table;
}

const WordTable<BreakerCurve>& breaker_curve_words() {
    static const WordTable<BreakerCurve> table{{BreakerCurve::b, "b"}, {BreakerCurve::c, "c"}, {BreakerCurve::d, "d"}};
    return table;
}

const WordTable<CircuitUse>& circuit_use_words() {
    static const WordTable<CircuitUse> table{{CircuitUse::sockets, "sockets"},   {CircuitUse::lighting, "lighting"},
                                             {CircuitUse::cooker, "cooker"},     {CircuitUse::shower, "shower"},
                                             {CircuitUse::immersion, "immersion"}, {CircuitUse::outdoor, "outdoor"},
                                             {CircuitUse::submain, "submain"},   {CircuitUse::other, "other"}};
    return table;
}

const WordTable<EnclosureMaterial>& enclosure_material_words() {
    static const WordTable<EnclosureMaterial> table{{EnclosureMaterial::metal, "metal"},
                                                    {EnclosureMaterial::non_combustible_other, "non_combustible_other"},
                                                    {EnclosureMaterial::combustible, "combustible"}};
    return table;
}

}  // namespace mendwright::io
