// Start to first frame of the desktop application with a store of many jobs (100,000 by
// default), and the cost of the job list's paged reads on that store.
//
//   desktop_first_frame_bench --app PATH/mendwright [--jobs 100000] [--work DIR] [--runs 5]
//
// 1. Builds (once, kept in --work) an SQLite job store of N invented jobs through the store's
//    own schema: JobStore::open creates it, then the rows go in by bulk INSERTs in one
//    transaction (add_job per job would take minutes and measures something else). One job in
//    twenty carries open urgent items with due dates spread over a year around "today".
// 2. Runs `mendwright --db sqlite:FILE --no-demo --first-frame` offscreen --runs times and times
//    each from process start to its "first-frame" line (the first frame swapped on screen).
// 3. Times the list's reads in this process: the count, the first page, a page 50,000 rows
//    down, and the same with the "urgent only" filter and a search.
// Prints a Markdown table for docs/benchmarks.md.
#include <QCoreApplication>
#include <QElapsedTimer>
#include <QProcess>
#include <QTemporaryDir>
#include <algorithm>
#include <filesystem>
#include <iostream>
#include <vector>

#include "app/desktop/job_pages.hpp"
#include "app/store/job_store.hpp"

using namespace mendwright;

namespace {

const Date today{2026, 12, 2};

std::string arg_value(const QStringList& args, const QString& flag, const std::string& fallback) {
    const int i = args.indexOf(flag);
    return i >= 0 && i + 1 < args.size() ? args.at(i + 1).toStdString() : fallback;
}

bool build_store(const std::string& path, int jobs) {
    auto url = store::parse_database_url("sqlite:" + path);
    if (!url) return false;
    auto opened = store::JobStore::open(*url, {store::fixed_clock(today), {}});
    if (!opened) {
        std::cerr << opened.error().to_string() << "\n";
        return false;
    }
    store::Connection& db = (*opened)->connection();
    auto transaction = store::Transaction::begin(db);
    if (!transaction) return false;
    const QString document = QStringLiteral("{\"format\":\"mendwright-survey\",\"version\":1}");
    const char* statuses[] = {"surveyed", "quoted", "accepted", "in_progress", "completed", "closed"};
    for (int i = 1; i <= jobs; ++i) {
        const QString reference = QStringLiteral("BJ-%1").arg(i, 6, 10, QLatin1Char('0'));
        const QString inspected = QString::fromStdString(today.plus_days(-(i % 700)).to_iso());
        auto job = db.run(QStringLiteral("INSERT INTO jobs (id, reference, client, site, occupancy, inspection_date, inspector,"
                                         " status, created_on, latest_revision) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, 1)"),
                          {QVariant(i), reference, QStringLiteral("Invented client %1").arg(i),
                           QStringLiteral("Invented site %1, Benchmark Road").arg(i), QStringLiteral("owner_occupied_dwelling"),
                           inspected, QStringLiteral("Invented inspector"), QString::fromLatin1(statuses[i % 6]), inspected},
                          "benchmark job");
        if (!job) {
            std::cerr << job.error().to_string() << "\n";
            return false;
        }
        auto revision = db.run(QStringLiteral("INSERT INTO survey_revisions (job_id, revision, based_on, saved_on, document)"
                                              " VALUES (?, 1, NULL, ?, ?)"),
                               {QVariant(i), inspected, document}, "benchmark revision");
        if (!revision) return false;
        if (i % 20 != 0) continue;
        for (int item = 0; item < 2; ++item) {
            const QString due = QString::fromStdString(today.plus_days((i * 7 + item * 13) % 365 - 180).to_iso());
            auto urgent = db.run(
                QStringLiteral("INSERT INTO urgent_items (job_id, finding_id, code, title, location, due, due_text, state,"
                               " first_revision, absent_since_revision, remedied_on, remedied_note, retested_on, retested_note)"
                               " VALUES (?, ?, 'C2', 'Invented urgent item', 'Consumer unit', ?, ?, 'open', 1, NULL, NULL, '', NULL, '')"),
                {QVariant(i), QStringLiteral("bench.item@%1").arg(item), due, due}, "benchmark urgent item");
            if (!urgent) return false;
        }
    }
    return (*transaction)->commit().ok();
}

double median(std::vector<double> values) {
    std::sort(values.begin(), values.end());
    return values.empty() ? 0.0 : values[values.size() / 2];
}

}  // namespace

int main(int argc, char* argv[]) {
    QCoreApplication app(argc, argv);
    const QStringList args = app.arguments();
    const std::string app_path = arg_value(args, QStringLiteral("--app"), "");
    const int jobs = std::stoi(arg_value(args, QStringLiteral("--jobs"), "100000"));
    const int runs = std::stoi(arg_value(args, QStringLiteral("--runs"), "5"));
    QTemporaryDir scratch;
    const std::string work = arg_value(args, QStringLiteral("--work"), scratch.path().toStdString());
    if (app_path.empty()) {
        std::cerr << "usage: desktop_first_frame_bench --app PATH/mendwright [--jobs N] [--work DIR] [--runs N]\n";
        return 2;
    }
    std::filesystem::create_directories(work);
    const std::string db_path = work + "/bench-" + std::to_string(jobs) + ".sqlite";
    if (!std::filesystem::exists(db_path)) {
        QElapsedTimer build;
        build.start();
        if (!build_store(db_path, jobs)) {
            std::filesystem::remove(db_path);
            std::cerr << "could not build the benchmark store\n";
            return 1;
        }
        std::cerr << "built " << db_path << " (" << jobs << " jobs) in " << build.elapsed() << " ms\n";
    }

    // 2. Start to first frame, a fresh process each run.
    QProcessEnvironment environment = QProcessEnvironment::systemEnvironment();
    environment.insert(QStringLiteral("QT_QPA_PLATFORM"), QStringLiteral("offscreen"));
    for (const char* name : {"runtime", "data", "config"}) {
        const std::string folder = work + "/xdg-" + name;
        std::filesystem::create_directories(folder);
        std::filesystem::permissions(folder, std::filesystem::perms::owner_all);
    }
    environment.insert(QStringLiteral("XDG_RUNTIME_DIR"), QString::fromStdString(work + "/xdg-runtime"));
    environment.insert(QStringLiteral("XDG_DATA_HOME"), QString::fromStdString(work + "/xdg-data"));
    environment.insert(QStringLiteral("XDG_CONFIG_HOME"), QString::fromStdString(work + "/xdg-config"));
    std::vector<double> first_frame_ms;
    for (int run = 0; run < runs; ++run) {
        QProcess process;
        process.setProcessEnvironment(environment);
        QElapsedTimer timer;
        timer.start();
        process.start(QString::fromStdString(app_path),
                      {QStringLiteral("--db"), QString::fromStdString("sqlite:" + db_path), QStringLiteral("--no-demo"),
                       QStringLiteral("--pricebook"), QStringLiteral(MENDWRIGHT_SOURCE_DIR "/pricebook-demo"),
                       QStringLiteral("--first-frame")});
        double at = -1;
        while (process.state() != QProcess::NotRunning || process.bytesAvailable() > 0) {
            process.waitForReadyRead(100);
            if (process.readAllStandardOutput().contains("first-frame")) {
                at = static_cast<double>(timer.nsecsElapsed()) / 1e6;
                break;
            }
            if (timer.elapsed() > 60000) break;
        }
        process.waitForFinished(10000);
        if (at < 0) {
            std::cerr << "run " << run << ": no first frame; stderr:\n" << process.readAllStandardError().toStdString();
            return 1;
        }
        first_frame_ms.push_back(at);
    }

    // 3. The list's reads.
    auto url = store::parse_database_url("sqlite:" + db_path);
    auto opened = store::JobStore::open(*url, {store::fixed_clock(today), {}});
    if (!opened) return 1;
    store::Connection& db = (*opened)->connection();
    auto time_ms = [](auto&& work_fn) {
        QElapsedTimer timer;
        timer.start();
        work_fn();
        return static_cast<double>(timer.nsecsElapsed()) / 1e6;
    };
    desktop::JobQuery all, urgent, search;
    urgent.urgent_only = true;
    search.search = "site 4242";
    const double count_ms = time_ms([&] { (void)desktop::count_jobs(db, all, today); });
    const double first_page_ms = time_ms([&] { (void)desktop::job_page(db, all, today, 0, 100); });
    const double deep_page_ms = time_ms([&] { (void)desktop::job_page(db, all, today, jobs / 2, 100); });
    const double urgent_page_ms = time_ms([&] { (void)desktop::job_page(db, urgent, today, 0, 100); });
    const double search_ms = time_ms([&] {
        (void)desktop::count_jobs(db, search, today);
        (void)desktop::job_page(db, search, today, 0, 100);
    });

    std::cout << "| measure (" << jobs << " jobs, SQLite) | ms |\n|---|---|\n";
    std::cout << "| start to first frame, median of " << runs << " runs | " << median(first_frame_ms) << " |\n";
    std::cout << "| start to first frame, slowest run | " << *std::max_element(first_frame_ms.begin(), first_frame_ms.end())
              << " |\n";
    std::cout << "| count of jobs (list header) | " << count_ms << " |\n";
    std::cout << "| first page of 100 rows | " << first_page_ms << " |\n";
    std::cout << "| page of 100 rows at row " << jobs / 2 << " | " << deep_page_ms << " |\n";
    std::cout << "| first page, open urgent items only | " << urgent_page_ms << " |\n";
    std::cout << "| search (count and first page) | " << search_ms << " |\n";
    return median(first_frame_ms) <= 1000.0 ? 0 : 3;
}
