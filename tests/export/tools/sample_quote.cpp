#include "tests/export/tools/sample_quote.hpp"

namespace mendwright::test {

using namespace pricing;

Result<Quote> sample_quote(const std::string& price_book_folder, std::size_t line_count, Findings findings) {
    auto book = read_price_book(price_book_folder);
    if (!book) return book.problem();

    QuoteRequest request;
    request.number = line_count > 0 ? "Q-BULK-" + std::to_string(line_count) : "Q-DEMO-0042";
    request.date = parse_iso_date("2026-03-02", "date").value();
    request.client_name = "A. Example (invented client)";
    request.site_address = "12 Invented Lane, Sampleton (invented address)";
    request.findings = {
        {"tt.fault_protection@board:main", "C2", "No device gives fault protection: RA 310 ohm, no RCD",
         "Consumer unit, hall", "BS 7671 411.5.3"},
        {"tt.fault_protection@board:garage", "C2", "No device gives fault protection: RA 310 ohm, no RCD",
         "Garage board", "BS 7671 411.5.3"},
        {"tt.electrode_stability@installation", "C3", "Electrode resistance above 200 ohm may not be stable",
         "Earth electrode, front garden", "BS 7671 Table 41.5 note"},
        {"tails.unprotected@board:main", "C2", "Meter tails 4 m long, concealed, with no protection at the origin",
         "Meter position to consumer unit", "BS 7671 522.6.202"},
        {"spd.absent@board:main", "C3", "No surge protection", "Consumer unit, hall", "BS 7671 443.4"},
        {"recorded:garage-socket", "FI", "Garage socket-outlet shows signs of heat", "Garage", "BS 7671 421.1"},
    };

    if (findings == Findings::none) request.findings.clear();

    std::vector<OptionBill> options;
    if (line_count == 0) {
        options = {
            {"opt-rcd-origin",
             "Time-delayed 100 mA RCD at the origin, tails in armoured cable",
             {"tt.fault_protection@board:main", "tt.fault_protection@board:garage", "tails.unprotected@board:main"},
             {{"RCD-S100-ENCL", 1, ""},
              {"TAILS-SWA-25-M", 3.7, "meter to board"},
              {"CONDUIT-MECH-M", 1.35, "where the run leaves the wall"},
              {"TEST-IR-CIRCUIT", 6, ""},
              {"CERT-MINOR", 1, ""}}},
            {"opt-second-rod",
             "Second earth rod 2.4 m, coupled to the first",
             {"tt.electrode_stability@installation"},
             {{"EARTH-ROD-2M4", 1, ""}, {"EARTH-COND-16", 4.25, ""}, {"EARTH-LABEL", 1, ""}, {"TEST-RA-VISIT", 1, ""}}},
            {"opt-spd", "Surge protective device at the consumer unit", {"spd.absent@board:main"}, {{"SPD-T2-CU", 1, ""}}},
        };
    } else {
        const auto& items = book->items;
        for (std::size_t i = 0; i < line_count; ++i) {
            if (i % 100 == 0) {
                const std::string n = std::to_string(options.size() + 1);
                options.push_back(OptionBill{"opt-bulk-" + n, "Bulk option " + n + " (invented)", {}, {}});
            }
            // Quantities 0.001 .. 9.999 with three decimals: every half-penny case turns up.
            const double quantity = static_cast<double>(1 + (i * 7919) % 9999) / 1000.0;
            options.back().bill.push_back(BillLine{items[i % items.size()].code, quantity, ""});
        }
    }
    auto works = build_works_list(book.value(), options);
    if (!works) return works.problem();
    request.works = std::move(works).value();
    if (line_count == 0) {
        if (auto refused = add_extra_line(request.works,
                                          ExtraLine{"Lift and refit floorboards, landing", "each", 2, 135, 400, ""})) {
            return *refused;
        }
    }

    request.chosen_plan = PlanSummary{"Least cost that clears every C1 and C2",
                                      {},
                                      0,
                                      FindingCounts{0, 0, 0, 1},
                                      1.5,
                                      {"Minor Works certificate"},
                                      false};
    for (const auto& group : request.works.groups) request.chosen_plan.option_titles.push_back(group.title);
    request.alternative_plan = PlanSummary{"Ideal: metal consumer unit with RCBOs, second rod, surge protection",
                                           {"Consumer unit, metal, populated with RCBOs", "Second earth rod 2.4 m",
                                            "Tails in armoured cable"},
                                           187'655,
                                           FindingCounts{0, 0, 0, 1},
                                           7.0,
                                           {"Electrical Installation Certificate"},
                                           true};
    return make_quote(std::move(request));
}

}  // namespace mendwright::test
