// The job store's dashboard on a large synthetic store (docs/benchmarks.md, "Job store").
//
//   store_bench [--store PATH] [google benchmark flags]
//
// Builds (or reuses, with --store PATH of an existing file) an invented SQLite store of 100,000
// jobs and 1,000,000 findings, then times the store's queries through the public API. The data
// are synthetic and invented: no real clients or sites. Mix (our own assumption of a contractor's
// store after some years, not measured anywhere): 85 % of jobs closed with every urgent item
// re-tested, 5 % completed (items remedied), 5 % declined (items left open), 5 % in the
// pipeline (surveyed .. in progress, items open); 10 findings a job, of which on average 2.5 are
// urgent (C1 in 5 % of jobs, two C2, an FI in half of them).
#include <QCoreApplication>
#include <QFile>
#include <QSqlError>
#include <QSqlQuery>
#include <QTemporaryDir>
#include <benchmark/benchmark.h>
#include <cstdio>
#include <cstring>
#include <memory>
#include <random>

#include "app/store/job_store.hpp"
#include "bench/store/synthetic_store.hpp"

using namespace mendwright;
using namespace mendwright::store;

namespace {

constexpr int job_count = 100000;
constexpr int findings_per_job = 10;
const Date today{2026, 3, 10};

std::unique_ptr<JobStore> bench_store;

long long count(JobStore& store, const char* sql) {
    QSqlQuery query(store.connection().database());
    if (!query.exec(QString::fromLatin1(sql)) || !query.next()) return -1;
    return query.value(0).toLongLong();
}

void print_plan(JobStore& store, const QString& sql) {
    QSqlQuery query(store.connection().database());
    if (!query.exec(QStringLiteral("EXPLAIN QUERY PLAN ") + sql)) return;
    while (query.next()) std::printf("    %s\n", query.value(3).toString().toUtf8().constData());
}

void BM_dashboard_first_page(benchmark::State& state) {
    for (auto _ : state) {
        auto board = bench_store->dashboard(50);
        if (!board) state.SkipWithError(board.error().to_string().c_str());
        benchmark::DoNotOptimize(board);
    }
}

void BM_dashboard_every_urgent_job(benchmark::State& state) {
    std::size_t lines = 0;
    for (auto _ : state) {
        auto board = bench_store->dashboard();
        if (!board) state.SkipWithError(board.error().to_string().c_str());
        else lines = board->urgent_jobs.size();
        benchmark::DoNotOptimize(board);
    }
    state.counters["jobs_listed"] = double(lines);
}

void BM_list_overdue(benchmark::State& state) {
    std::size_t lines = 0;
    for (auto _ : state) {
        auto list = bench_store->list_jobs(JobFilter{false, true, std::nullopt});
        if (!list) state.SkipWithError(list.error().to_string().c_str());
        else lines = list->size();
        benchmark::DoNotOptimize(list);
    }
    state.counters["jobs_listed"] = double(lines);
}

void BM_show_one_job(benchmark::State& state) {
    std::mt19937 random(7);
    for (auto _ : state) {
        auto job = bench_store->job(JobId(random() % job_count + 1));
        if (!job) state.SkipWithError(job.error().to_string().c_str());
        benchmark::DoNotOptimize(job);
    }
}

void BM_save_revision(benchmark::State& state) {
    SurveySnapshot snapshot;
    snapshot.facts = JobFacts{"INV-1", "Invented Client 1", "1 Example Row (invented)", "owner_occupied_dwelling", today,
                              "Invented Inspector"};
    snapshot.document = std::string(20000, 'x');
    for (int f = 0; f < findings_per_job; ++f) {
        FindingRecord finding;
        finding.id = "rule." + std::to_string(f) + "@circuit:c" + std::to_string(f + 1);
        finding.code = f < 3 ? "C2" : "C3";
        finding.urgent = f < 3;
        finding.due = today.plus_days(28);
        snapshot.findings.push_back(finding);
    }
    const JobId job = job_count;  // an open job
    for (auto _ : state) {
        auto latest = bench_store->job(job);
        auto saved = bench_store->save_revision(job, latest->latest_revision, snapshot);
        if (!saved) state.SkipWithError(saved.error().to_string().c_str());
    }
}

}  // namespace

BENCHMARK(BM_dashboard_first_page)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_dashboard_every_urgent_job)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_list_overdue)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_show_one_job)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_save_revision)->Unit(benchmark::kMillisecond);

int main(int argc, char** argv) {
    QCoreApplication app(argc, argv);
    QTemporaryDir folder;
    std::string path = folder.filePath(QStringLiteral("bench.sqlite")).toStdString();
    std::vector<char*> rest;
    for (int i = 0; i < argc; ++i) {
        if (std::strcmp(argv[i], "--store") == 0 && i + 1 < argc) path = argv[++i];
        else rest.push_back(argv[i]);
    }
    int rest_count = int(rest.size());
    benchmark::Initialize(&rest_count, rest.data());

    auto url = parse_database_url("sqlite:" + path);
    auto store = JobStore::open(*url, OpenOptions{fixed_clock(today), std::nullopt});
    if (!store) {
        std::fprintf(stderr, "store_bench: %s\n", store.error().to_string().c_str());
        return 1;
    }
    bench_store = std::move(store).value();
    if (count(*bench_store, "SELECT COUNT(*) FROM jobs") == 0) {
        std::printf("Building the synthetic store in %s ...\n", path.c_str());
        if (!fill_synthetic_store(*bench_store, job_count, today)) return 1;
    }
    std::printf("Store %s: %lld jobs, %lld findings, %lld urgent items, %lld open, %.0f MB\n", path.c_str(),
                count(*bench_store, "SELECT COUNT(*) FROM jobs"), count(*bench_store, "SELECT COUNT(*) FROM findings"),
                count(*bench_store, "SELECT COUNT(*) FROM urgent_items"),
                count(*bench_store, "SELECT COUNT(*) FROM urgent_items WHERE state = 'open'"),
                double(QFile(QString::fromStdString(path)).size()) / 1e6);
    std::printf("Query plan of the dashboard's job list:\n");
    print_plan(*bench_store,
               QStringLiteral("SELECT id, reference, client, site, status, urgent_open, next_due FROM jobs"
                              " WHERE urgent_open > 0 ORDER BY (next_due IS NULL), next_due, id LIMIT 50"));
    std::printf("Query plan of the counts by code:\n");
    print_plan(*bench_store,
               QStringLiteral("SELECT code, COUNT(*), SUM(CASE WHEN due < '2026-03-10' THEN 1 ELSE 0 END) FROM urgent_items"
                              " WHERE state = 'open' AND absent_since_revision IS NULL GROUP BY code"));
    std::printf("Query plan of the counts by status:\n");
    print_plan(*bench_store, QStringLiteral("SELECT status, jobs FROM job_status_counts"));
    benchmark::RunSpecifiedBenchmarks();
    benchmark::Shutdown();
    bench_store.reset();
    return 0;
}
