#!/usr/bin/python3
"""Writes an invented, synthetic survey document for the remedies benchmark (no real site).

    make_survey.py BOARDS CIRCUITS_PER_BOARD > survey.json

A TT installation: an origin board feeding up to 7 boards, each of those feeding more, until
BOARDS boards; every board holds CIRCUITS_PER_BOARD circuits (its submains included). Boards
vary: a third with no RCD at all, a third split-load under one 30 mA RCD, a third under a
general 100 mA RCD above two 30 mA RCDs (not selective); half take RCBOs; a quarter are in
combustible enclosures. Standing leakage is set on every circuit.
"""
import json
import sys

USES = ["sockets", "lighting", "sockets", "lighting", "cooker", "shower", "immersion", "other"]
AREAS = ["north", "south", "east", "west", "upper", "lower"]


def device(device_id, kind, amps, **extra):
    d = {"id": device_id, "kind": kind, "rating_amps": amps}
    if kind in ("circuit_breaker", "rcbo"):
        d["curve"] = "b"
        d["breaking_capacity_ka"] = 6.0
    d.update(extra)
    return d


def board(index, circuits_per_board, children):
    bid = "b%02d" % index
    style = index % 3
    devices = [device(bid + "-ms", "main_switch", 100.0, label="Main switch")]
    upstream = [bid + "-ms"]
    if style == 1:
        devices.append(device(bid + "-rcd", "rcd", 63.0, upstream_id=bid + "-ms", residual_current_amps=0.03,
                              rcd_type="a", delay="general"))
        upstream = [bid + "-rcd", bid + "-ms"]
    elif style == 2:
        devices.append(device(bid + "-rcd100", "rcd", 100.0, upstream_id=bid + "-ms", residual_current_amps=0.1,
                              rcd_type="a", delay="general"))
        for side in ("a", "b"):
            devices.append(device(bid + "-rcd" + side, "rcd", 63.0, upstream_id=bid + "-rcd100",
                                  residual_current_amps=0.03, rcd_type="a", delay="general"))
        upstream = [bid + "-rcda", bid + "-rcdb"]
    circuits = []
    for n in range(circuits_per_board):
        cid = "%s-c%02d" % (bid, n + 1)
        use = USES[n % len(USES)]
        area = AREAS[(n // 2) % len(AREAS)]
        amps = {"sockets": 32.0, "lighting": 6.0, "cooker": 32.0, "shower": 40.0, "immersion": 16.0}.get(use, 20.0)
        circuit = {
            "id": cid, "number": str(n + 1), "description": "%s %s" % (area, use), "use": use,
            "device": device(cid + "-cb", "circuit_breaker", amps),
            "upstream_id": upstream[n % len(upstream)],
            "line_csa_mm2": 2.5, "cpc_csa_mm2": 1.5, "length_m": 20.0,
            "r1_plus_r2_ohms": 0.5, "insulation_resistance_megohms": 100.0,
            "standing_leakage_ma": 0.4 + 0.1 * (n % 4),
        }
        if n < len(children):
            circuit.update({"description": "feed to board %s" % children[n], "use": "submain",
                            "feeds_board_id": children[n], "upstream_id": bid + "-ms"})
            circuit["device"] = device(cid + "-cb", "circuit_breaker", 40.0)
            circuit.pop("standing_leakage_ma")
        circuits.append(circuit)
    return {"id": bid, "name": "Board %d" % index, "location": "invented location %d" % index,
            "enclosure": "combustible" if index % 4 == 0 else "metal", "spare_ways": 2,
            "accepts_rcbos": index % 2 == 0, "surge_protection_fitted": False, "new_work": False,
            "devices": devices, "circuits": circuits}


def main():
    boards_wanted = int(sys.argv[1])
    circuits_per_board = int(sys.argv[2])
    # Breadth first: each board feeds up to 7 more until the count is reached.
    children = {0: []}
    next_index = 1
    queue = [0]
    while next_index < boards_wanted and queue:
        parent = queue.pop(0)
        for _ in range(min(7, circuits_per_board - 1)):
            if next_index >= boards_wanted:
                break
            children[parent].append("b%02d" % next_index)
            children[next_index] = []
            queue.append(next_index)
            next_index += 1
    document = {
        "format": "mendwright-survey", "version": 1,
        "job": {"reference": "BENCH-%dx%d" % (boards_wanted, circuits_per_board),
                "client": "Invented benchmark client", "site": "Invented benchmark site",
                "occupancy": "commercial", "inspection_date": "2026-03-10", "inspector": "Invented",
                "country": "england"},
        "supply": {"earthing": "tt", "u0_volts": 230.0, "phases": 1, "supply_fuse_type": "BS 88-3",
                   "supply_fuse_rating_amps": 100.0},
        "electrode": {"kind": "rod", "count": 1, "layout": "single", "rod_length_m": 1.2, "rod_diameter_m": 0.016,
                      "measured_ra_ohms": 260.0, "measured_on": "2026-03-10", "soil_description": "invented"},
        "tails": {"length_m": 4.5, "csa_mm2": 25.0, "route": "concealed_in_wall", "mechanically_protected": False,
                  "origin_protection": "none"},
        "boards": [board(i, circuits_per_board, children[i]) for i in range(boards_wanted)],
        "observations": [],
    }
    json.dump(document, sys.stdout, indent=1)
    sys.stdout.write("\n")


if __name__ == "__main__":
    main()
