#include "tests/store/support/fixtures.hpp"

#include <catch2/catch.hpp>

namespace mendwright::store::testing {

TempFolder::TempFolder() { REQUIRE(dir_.isValid()); }

FindingRecord finding(const std::string& id, const std::string& code, std::optional<Date> due) {
    FindingRecord record;
    record.id = id;
    record.rule = id.substr(0, id.find('@'));
    record.code = code;
    record.title = "Invented finding " + id;
    record.location = "Consumer unit, hall (invented)";
    record.clause = "BS 7671:2018+A2 (invented test clause)";
    record.explanation = "invented for the store's tests";
    record.urgent = code == "C1" || code == "C2" || code == "FI";
    record.due = due;
    record.due_text = due ? due->to_iso() : (record.urgent ? "as agreed" : "");
    return record;
}

SurveySnapshot sample_snapshot(int variant) {
    SurveySnapshot snapshot;
    snapshot.facts.reference = "INV-" + std::to_string(variant);
    snapshot.facts.client = "Invented Client " + std::to_string(variant);
    snapshot.facts.site = std::to_string(variant) + " Example Row (invented)";
    snapshot.facts.occupancy = "owner_occupied_dwelling";
    snapshot.facts.inspection_date = Date{2026, 2, 20};
    snapshot.facts.inspector = "Invented Inspector";
    snapshot.document = "{\"format\": \"mendwright-survey\", \"version\": 1, \"invented\": " + std::to_string(variant) + "}";
    snapshot.findings = {
        finding("tt.fault_protection@circuit:c3", "C1", Date{2026, 3, 1}),
        finding("tails.protection@origin", "C2", Date{2026, 4, 9}),
        finding("rcd.type@board:cu", "FI"),
        finding("spd.absent@board:cu", "C3"),
    };
    return snapshot;
}

Backend sqlite_backend(const TempFolder& folder) {
    auto counter = std::make_shared<int>(0);
    const std::string base = folder.path();
    return Backend{"sqlite", [counter, base] {
                       DatabaseUrl url;
                       url.dialect = Dialect::sqlite;
                       url.sqlite_path = base + "/store-" + std::to_string(++*counter) + ".sqlite";
                       return url;
                   }};
}

std::unique_ptr<JobStore> open_store(const DatabaseUrl& url, Date today) {
    auto store = JobStore::open(url, OpenOptions{fixed_clock(today), std::nullopt});
    INFO((store ? std::string() : store.error().to_string()));
    REQUIRE(store.ok());
    return std::move(store).value();
}

}  // namespace mendwright::store::testing
