// Start to first frame of the desktop application with a store of many invented jobs (100,000
// by default), and its job list scrolled to the end (docs/benchmarks.md, "Desktop").
//
//   desktop_first_frame_bench --app PATH/mendwright [--jobs 100000] [--work DIR] [--runs 5]
//
// 1. Builds (once, kept in --work) an SQLite job store of N invented jobs with the job store
//    benchmark's generator (bench/store/synthetic_store.hpp), dated up to today.
// 2. Runs `mendwright --db sqlite:FILE --no-demo --first-frame` offscreen --runs times, a fresh
//    process each, and times each from its start to its "first-frame" line (printed when the
//    first frame has been swapped). CPU time and peak resident size of those processes come
//    from getrusage(RUSAGE_CHILDREN).
// 3. Starts the same application in this process (the same workspace and QML main window),
//    waits for its first frame, then moves the job list to its last row and back up screen by
//    screen, and reports how many lines the list read from the store and keeps.
// 4. Times the store's list reads: the count, the first page, a page half-way down, the last
//    page, the urgent filter, a status filter and a search.
// Prints Markdown tables for docs/benchmarks.md. Exit status 3 when the median first frame
// takes longer than 1 s or the scroll read every line.
#include <QElapsedTimer>
#include <QFile>
#include <QGuiApplication>
#include <QProcess>
#include <QQmlApplicationEngine>
#include <QQuickItem>
#include <QQuickWindow>
#include <QTemporaryDir>
#include <QtQml/qqmlextensionplugin.h>
#include <algorithm>
#include <filesystem>
#include <iostream>
#include <sys/resource.h>
#include <vector>

#include "app/desktop/application.hpp"
#include "app/desktop/job_list_model.hpp"
#include "app/store/job_store.hpp"
#include "bench/store/synthetic_store.hpp"

Q_IMPORT_QML_PLUGIN(Mendwright_ModelsPlugin)
Q_IMPORT_QML_PLUGIN(MendwrightPlugin)

using namespace mendwright;

namespace {

std::string arg_value(const QStringList& args, const QString& flag, const std::string& fallback) {
    const int i = args.indexOf(flag);
    return i >= 0 && i + 1 < args.size() ? args.at(i + 1).toStdString() : fallback;
}

double median(std::vector<double> values) {
    std::sort(values.begin(), values.end());
    return values.empty() ? 0.0 : values[values.size() / 2];
}

double ms_since(const QElapsedTimer& timer) { return static_cast<double>(timer.nsecsElapsed()) / 1e6; }

struct ChildUsage {
    double cpu_ms = 0;
    long max_rss_kb = 0;
};

ChildUsage children_usage() {
    rusage usage{};
    getrusage(RUSAGE_CHILDREN, &usage);
    auto ms = [](const timeval& t) { return static_cast<double>(t.tv_sec) * 1e3 + static_cast<double>(t.tv_usec) / 1e3; };
    return {ms(usage.ru_utime) + ms(usage.ru_stime), usage.ru_maxrss};
}

// Waits (processing events) until `window` has swapped one more frame, at most `limit_ms`.
bool wait_for_frame(QQuickWindow& window, int limit_ms = 10000) {
    bool swapped = false;
    auto connection = QObject::connect(&window, &QQuickWindow::frameSwapped, [&swapped] { swapped = true; });
    window.update();
    QElapsedTimer timer;
    timer.start();
    while (!swapped && timer.elapsed() < limit_ms) {
        QCoreApplication::processEvents(QEventLoop::AllEvents, 5);
        // Outside exec() processEvents leaves deleteLater() undone: delegates scrolled out
        // would pile up here as they never do in the application's own event loop.
        QCoreApplication::sendPostedEvents(nullptr, QEvent::DeferredDelete);
    }
    QObject::disconnect(connection);
    return swapped;
}

// The ListView showing a JobListModel at or under `item` (visual children, depth first).
QQuickItem* job_list_view(QQuickItem* item, desktop::JobListModel*& model) {
    if (item->inherits("QQuickListView")) {
        model = qobject_cast<desktop::JobListModel*>(item->property("model").value<QObject*>());
        if (model) return item;
    }
    for (QQuickItem* child : item->childItems())
        if (QQuickItem* found = job_list_view(child, model)) return found;
    return nullptr;
}

// This process's resident size now, in MB (/proc/self/status, VmRSS).
long resident_mb() {
    QFile status(QStringLiteral("/proc/self/status"));
    if (!status.open(QIODevice::ReadOnly)) return -1;
    for (const QByteArray& line : status.readAll().split('\n'))
        if (line.startsWith("VmRSS:")) return line.mid(6).trimmed().split(' ').first().toLong() / 1024;
    return -1;
}

}  // namespace

int main(int argc, char* argv[]) {
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM")) qputenv("QT_QPA_PLATFORM", "offscreen");
    QGuiApplication app(argc, argv);
    desktop::set_application_identity();
    const QStringList args = app.arguments();
    const std::string app_path = arg_value(args, QStringLiteral("--app"), "");
    const int jobs = std::stoi(arg_value(args, QStringLiteral("--jobs"), "100000"));
    const int runs = std::max(1, std::stoi(arg_value(args, QStringLiteral("--runs"), "5")));
    QTemporaryDir scratch;
    const std::string work = arg_value(args, QStringLiteral("--work"), scratch.path().toStdString());
    if (app_path.empty()) {
        std::cerr << "usage: desktop_first_frame_bench --app PATH/mendwright [--jobs N] [--work DIR] [--runs N]\n";
        return 2;
    }
    std::filesystem::create_directories(work);
    const Date today = store::system_today();  // the application's today too
    const std::string db_path = work + "/bench-" + std::to_string(jobs) + "-" + today.to_iso() + ".sqlite";
    const std::string db_url = "sqlite:" + db_path;
    if (!std::filesystem::exists(db_path)) {
        QElapsedTimer build;
        build.start();
        auto url = store::parse_database_url(db_url);
        auto opened = url ? store::JobStore::open(*url) : store::Outcome<std::unique_ptr<store::JobStore>>(url.error());
        if (!opened || !store::fill_synthetic_store(**opened, jobs, today)) {
            if (!opened) std::cerr << opened.error().to_string() << "\n";
            std::filesystem::remove(db_path);
            std::cerr << "could not build the benchmark store\n";
            return 1;
        }
        std::cerr << "built " << db_path << " (" << jobs << " jobs) in " << build.elapsed() << " ms\n";
    }
    const QStringList launch{QStringLiteral("--db"), QString::fromStdString(db_url), QStringLiteral("--no-demo"),
                             QStringLiteral("--pricebook"), QStringLiteral(MENDWRIGHT_SOURCE_DIR "/pricebook-demo")};

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
    std::vector<double> first_frame_ms, cpu_ms;
    long max_rss_kb = 0;
    for (int run = 0; run < runs; ++run) {
        QProcess process;
        process.setProcessEnvironment(environment);
        const ChildUsage before = children_usage();
        QElapsedTimer timer;
        timer.start();
        process.start(QString::fromStdString(app_path), launch + QStringList{QStringLiteral("--first-frame")});
        double at = -1;
        QByteArray output;
        while (process.state() != QProcess::NotRunning || process.bytesAvailable() > 0) {
            process.waitForReadyRead(20);
            output += process.readAllStandardOutput();
            if (output.contains("first-frame")) {
                at = ms_since(timer);
                break;
            }
            if (timer.elapsed() > 60000) break;
        }
        process.waitForFinished(10000);
        if (at < 0) {
            std::cerr << "run " << run << ": no first frame; stderr:\n" << process.readAllStandardError().toStdString();
            return 1;
        }
        const ChildUsage after = children_usage();
        first_frame_ms.push_back(at);
        cpu_ms.push_back(after.cpu_ms - before.cpu_ms);
        max_rss_kb = std::max(max_rss_kb, after.max_rss_kb);
    }

    // 3. The same application in this process: first frame, then the job list to its end.
    desktop::LaunchOptions options;
    if (auto usage = desktop::parse_launch_options(launch, options)) {
        std::cerr << *usage << "\n";
        return 1;
    }
    std::string error;
    auto workspace = desktop::Workspace::open(options.desktop, error);
    if (!workspace) {
        std::cerr << error << "\n";
        return 1;
    }
    desktop::Workspace::install(workspace.get());
    QQmlApplicationEngine engine;
    if (!desktop::load_main_window(engine)) return 1;
    auto* window = qobject_cast<QQuickWindow*>(engine.rootObjects().constFirst());
    if (!window || !wait_for_frame(*window)) {
        std::cerr << "no first frame in this process\n";
        return 1;
    }
    desktop::JobListModel* model = nullptr;
    QQuickItem* list = job_list_view(window->contentItem(), model);
    if (!list) {
        std::cerr << "no job list in the main window\n";
        return 1;
    }
    const qint64 lines_at_first_frame = model->linesRead();
    const long rss_at_first_frame = resident_mb();
    QElapsedTimer scroll;
    scroll.start();
    QMetaObject::invokeMethod(list, "positionViewAtEnd");
    wait_for_frame(*window);
    const double to_end_ms = ms_since(scroll);
    const QString last_reference = model->data(model->index(model->count() - 1), desktop::JobListModel::ReferenceRole).toString();
    const qint64 lines_at_end = model->linesRead();
    // Back up, one screen at a time.
    const int screens = 200;
    const double screen_px = list->height();
    scroll.restart();
    for (int i = 0; i < screens; ++i) {
        list->setProperty("contentY", list->property("contentY").toDouble() - screen_px);
        wait_for_frame(*window);
    }
    const double screens_ms = ms_since(scroll);
    const qint64 lines_after_screens = model->linesRead();
    const qint64 lines_kept = model->linesKept();
    const long rss_after_screens = resident_mb();
    auto* row_item = list->property("currentItem").value<QQuickItem*>();
    const int rows_shown = row_item && row_item->height() > 0 ? static_cast<int>(screen_px / row_item->height()) : 0;

    // 4. The store's list reads, each once, on a fresh connection.
    auto url = store::parse_database_url(db_url);
    auto opened = store::JobStore::open(*url);
    if (!opened) return 1;
    store::JobStore& job_store = **opened;
    auto time_ms = [](auto&& work_fn) {
        QElapsedTimer timer;
        timer.start();
        work_fn();
        return ms_since(timer);
    };
    store::JobQuery all, urgent, quoted, search;
    urgent.urgent_only = true;
    quoted.status = store::JobStatus::quoted;
    search.search = "client 4242";
    long long total = 0;
    const double count_ms = time_ms([&] { total = job_store.job_count(all).value(); });
    const double first_page_ms = time_ms([&] { (void)job_store.job_page(all, 0, 100); });
    const double middle_page_ms = time_ms([&] { (void)job_store.job_page(all, total / 2, 100); });
    const double last_page_ms = time_ms([&] { (void)job_store.job_page(all, std::max(0LL, total - 100), 100); });
    const double urgent_ms = time_ms([&] {
        (void)job_store.job_count(urgent);
        (void)job_store.job_page(urgent, 0, 100);
    });
    const double quoted_ms = time_ms([&] {
        const long long n = job_store.job_count(quoted).value();
        (void)job_store.job_page(quoted, std::max(0LL, n - 100), 100);
    });
    const double search_ms = time_ms([&] {
        (void)job_store.job_count(search);
        (void)job_store.job_page(search, 0, 100);
    });

    std::cout << "| start to first frame (" << jobs << " jobs, SQLite, offscreen), " << runs << " runs | figure |\n|---|---|\n";
    std::cout << "| wall, median | " << median(first_frame_ms) << " ms |\n";
    std::cout << "| wall, slowest | " << *std::max_element(first_frame_ms.begin(), first_frame_ms.end()) << " ms |\n";
    std::cout << "| CPU (user + system) to exit, median | " << median(cpu_ms) << " ms |\n";
    std::cout << "| peak resident size, largest | " << max_rss_kb / 1024 << " MB |\n\n";
    std::cout << "| job list in the running application | figure |\n|---|---|\n";
    std::cout << "| rows in the list | " << model->count() << " |\n";
    std::cout << "| lines read from the store for the first frame | " << lines_at_first_frame << " |\n";
    std::cout << "| to the last row (" << last_reference.toStdString() << "): time to its frame | " << to_end_ms << " ms |\n";
    std::cout << "| lines read after moving to the last row | " << lines_at_end << " |\n";
    std::cout << "| back up " << screens << " screens (about " << rows_shown << " rows each): time | " << screens_ms
              << " ms |\n";
    std::cout << "| lines read after that, in all | " << lines_after_screens << " |\n";
    std::cout << "| lines kept in memory at the end | " << lines_kept << " |\n";
    std::cout << "| resident size of this process: at its first frame, after the scrolling | " << rss_at_first_frame
              << " MB, " << rss_after_screens << " MB |\n\n";
    std::cout << "| store read (" << total << " jobs) | ms |\n|---|---|\n";
    std::cout << "| count of jobs (list header) | " << count_ms << " |\n";
    std::cout << "| first page of 100 lines | " << first_page_ms << " |\n";
    std::cout << "| page of 100 lines half-way down | " << middle_page_ms << " |\n";
    std::cout << "| last page of 100 lines | " << last_page_ms << " |\n";
    std::cout << "| open urgent items only: count and first page | " << urgent_ms << " |\n";
    std::cout << "| status quoted: count and last page | " << quoted_ms << " |\n";
    std::cout << "| search \"client 4242\": count and first page | " << search_ms << " |\n";
    const bool fast = median(first_frame_ms) <= 1000.0;
    const bool lazy = lines_after_screens < model->count();
    return fast && lazy ? 0 : 3;
}
