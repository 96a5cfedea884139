#pragma once
// Invented jobs and findings for the store's tests (no real people, firms or addresses), a
// temporary folder per test, and the pinned date every test runs on.

#include <QTemporaryDir>
#include <functional>
#include <memory>
#include <string>
#include <vector>

#include "app/store/job_store.hpp"

namespace mendwright::store::testing {

// Every test's "today".
inline const Date pinned_today{2026, 3, 10};

// A temporary folder removed at the end of the test.
class TempFolder {
public:
    TempFolder();
    [[nodiscard]] std::string path() const { return dir_.path().toStdString(); }
    [[nodiscard]] std::string file(const std::string& name) const { return path() + "/" + name; }

private:
    QTemporaryDir dir_;
};

FindingRecord finding(const std::string& id, const std::string& code, std::optional<Date> due = std::nullopt);

// An invented survey: client "Invented Client 1" at "1 Example Row (invented)", with
//   tt.fault_protection@circuit:c3  C1 due 2026-03-01 (overdue on the pinned date)
//   tails.protection@origin         C2 due 2026-04-09
//   rcd.type@board:cu               FI, no deadline ("as agreed")
//   spd.absent@board:cu             C3 (not urgent)
SurveySnapshot sample_snapshot(int variant = 1);

// A database to test against: a fresh empty store each time `fresh_url` is called.
struct Backend {
    std::string name;
    std::function<DatabaseUrl()> fresh_url;
};

Backend sqlite_backend(const TempFolder& folder);

std::unique_ptr<JobStore> open_store(const DatabaseUrl& url, Date today = pinned_today);

}  // namespace mendwright::store::testing
