// A process that writes to the job store, for the tests that need a second process or one
// killed half-way through a save.
//   store_test_writer URL crash          saves revisions of job 1 forever, printing
//                                        "committed N" after each commit
//   store_test_writer URL contend COUNT  saves COUNT revisions of job 1, each edited from the
//                                        latest one, retrying after a conflict; prints
//                                        "saved N" and, at the end, "conflicts K"
// Exit 0 when done, 1 with the store's message on stderr otherwise.
#include <QCoreApplication>
#include <cstdio>
#include <cstdlib>
#include <string>

#include "app/store/job_store.hpp"
#include "tests/store/support/revision_document.hpp"

using namespace mendwright;
using namespace mendwright::store;

namespace {

int fail(const StoreError& error) {
    std::fprintf(stderr, "store_test_writer: %s (%s)\n", error.to_string().c_str(), kind_text(error.kind).c_str());
    return 1;
}

SurveySnapshot snapshot_for(int n) {
    SurveySnapshot snapshot;
    snapshot.facts = JobFacts{"INV-CRASH", "Invented Client", "1 Example Row (invented)", "owner_occupied_dwelling",
                              Date{2026, 2, 20}, "Invented Inspector"};
    snapshot.document = testing::revision_document(n);
    for (int i = 0; i < 30; ++i) {
        FindingRecord finding;
        finding.id = "rule." + std::to_string(i) + "@circuit:c" + std::to_string((i + n) % 40);
        finding.rule = "rule." + std::to_string(i);
        finding.code = i % 3 == 0 ? "C2" : "C3";
        finding.urgent = finding.code == "C2";
        finding.title = "invented finding of revision " + std::to_string(n);
        finding.location = "invented";
        finding.due = Date{2026, 4, 1}.plus_days(i);
        finding.due_text = finding.due->to_iso();
        snapshot.findings.push_back(finding);
    }
    return snapshot;
}

}  // namespace

int main(int argc, char** argv) {
    QCoreApplication app(argc, argv);
    if (argc < 3) {
        std::fprintf(stderr, "usage: store_test_writer URL crash | URL contend COUNT\n");
        return 2;
    }
    auto url = parse_database_url(argv[1], "URL");
    if (!url) return fail(url.error());
    auto store = JobStore::open(*url, OpenOptions{fixed_clock(Date{2026, 3, 10}), std::nullopt});
    if (!store) return fail(store.error());
    JobStore& jobs = **store;
    auto first = jobs.job(1);
    if (!first) {
        if (first.error().kind != ErrorKind::not_found) return fail(first.error());
        auto added = jobs.add_job(snapshot_for(1));
        if (!added) return fail(added.error());
        std::printf("committed 1\n");
        std::fflush(stdout);
    }
    const std::string mode = argv[2];
    if (mode == "crash") {
        for (;;) {
            auto latest = jobs.job(1);
            if (!latest) return fail(latest.error());
            const int next = latest->latest_revision + 1;
            auto saved = jobs.save_revision(1, latest->latest_revision, snapshot_for(next));
            if (!saved) return fail(saved.error());
            std::printf("committed %d\n", *saved);
            std::fflush(stdout);
        }
    }
    if (mode == "contend" && argc == 4) {
        const int count = std::atoi(argv[3]);
        int conflicts = 0;
        for (int done = 0; done < count;) {
            auto latest = jobs.job(1);
            if (!latest) return fail(latest.error());
            auto saved = jobs.save_revision(1, latest->latest_revision, snapshot_for(latest->latest_revision + 1));
            if (!saved) {
                if (saved.error().kind != ErrorKind::conflict) return fail(saved.error());
                ++conflicts;
                continue;
            }
            std::printf("saved %d\n", *saved);
            ++done;
        }
        std::printf("conflicts %d\n", conflicts);
        return 0;
    }
    std::fprintf(stderr, "store_test_writer: unknown mode %s\n", mode.c_str());
    return 2;
}
