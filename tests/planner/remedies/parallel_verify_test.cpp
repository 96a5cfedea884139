// verify_options shares the options out over the cores (planner/remedies/parallel.hpp) after
// assessing every view's "before" once. The verdicts must be exactly those of Verifier::verify
// called option by option on one thread, on the three invented demo jobs and on seeded random
// invented installations; and the helper that shares out the work must run each piece once and
// hand back a failure. A race or a view left unprepared shows up here as a different verdict.
#include <catch2/catch.hpp>

#include <atomic>
#include <stdexcept>
#include <vector>

#include "planner/remedies/parallel.hpp"
#include "planner/remedies/proposals.hpp"
#include "planner/remedies/verify.hpp"
#include "tests/planner/remedies/random_installation.hpp"
#include "tests/planner/remedies/remedy_fixtures.hpp"

using namespace mendwright;

namespace {

// Options verified by verify_options, and a second Verifier's verify() one by one. Returns how
// many options were compared.
int compare_shared_with_serial(const model::Installation& installation, const std::string& name) {
    const auto settings = remedy_test::shipped_settings();
    remedies::Verifier shared(installation, remedy_test::shipped_rules());
    const remedies::ProposalContext context{installation, shared.baseline(), remedies::default_catalogue(), settings};
    auto options = remedies::propose_options(context);
    remedies::verify_options(shared, options);
    remedies::Verifier serial(installation, remedy_test::shipped_rules());
    int compared = 0;
    for (const auto& option : options) {
        INFO(name << ": " << option.id);
        const auto one = serial.verify(option);
        const auto& v = option.verification;
        CHECK(v.done);
        remedy_test::check_same_verdict(v, one);
        // And the read-only path gives the same again on a verifier that was never prepared.
        remedies::Verifier fresh(installation, remedy_test::shipped_rules());
        CHECK(fresh.verify_prepared(option).cleared == one.cleared);
        ++compared;
    }
    return compared;
}

}  // namespace

TEST_CASE("remedies parallel verification: the same verdicts as one by one on the demo jobs", "[remedies][verify][parallel]") {
    const auto jobs = remedy_test::demo_installations();
    for (const auto& job : jobs) CHECK(compare_shared_with_serial(job.installation, job.file_name) > 0);
    CHECK(jobs.size() == 3);
}

TEST_CASE("remedies parallel verification: the same verdicts as one by one on seeded random installations",
          "[remedies][verify][parallel]") {
    int compared = 0;
    for (unsigned seed = 101; seed <= 116; ++seed)
        compared += compare_shared_with_serial(remedy_test::random_installation(seed, 8, 5), "seed " + std::to_string(seed));
    CHECK(compared > 100);
}

TEST_CASE("remedies parallel verification: every piece of work runs exactly once", "[remedies][parallel]") {
    for (std::size_t count : {std::size_t{0}, std::size_t{1}, std::size_t{2}, std::size_t{7}, std::size_t{500}}) {
        std::vector<std::atomic<int>> runs(count);
        remedies::run_in_parallel(count, [&](std::size_t i) { runs[i].fetch_add(1); });
        for (std::size_t i = 0; i < count; ++i) {
            INFO("count " << count << ", piece " << i);
            CHECK(runs[i].load() == 1);
        }
    }
    CHECK(remedies::parallel_thread_count() >= 1);
    CHECK(remedies::parallel_thread_count() <= 4);
}

TEST_CASE("remedies parallel verification: a failing piece of work is reported to the caller", "[remedies][parallel]") {
    std::atomic<int> started{0};
    CHECK_THROWS_WITH(remedies::run_in_parallel(200,
                                                [&](std::size_t i) {
                                                    started.fetch_add(1);
                                                    if (i == 3) throw std::runtime_error("piece 3 failed");
                                                }),
                      "piece 3 failed");
    CHECK(started.load() >= 4);  // pieces 0 to 3 at least were taken in order
}
