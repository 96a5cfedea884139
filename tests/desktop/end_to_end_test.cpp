// End to end, offscreen: the application as `mendwright` starts it (same QML module, same
// workspace code) on a temporary store seeded with the demo jobs. A user opens the first job,
// compares the plans, takes the least-cost one and exports the quote; every key press counts as
// one user action and the whole path must take at most 12. The workbook is then read back by an
// independent reader (openpyxl). Then, after the works, the first urgent item is marked
// remedied (R) and re-tested (T) on the After-the-works view, by keyboard only.
#include <QFile>
#include <QProcess>
#include <QQmlApplicationEngine>
#include <QQuickWindow>
#include <QTest>
#include <QtQml/qqmlextensionplugin.h>
#include <filesystem>

#include "app/desktop/application.hpp"
#include "app/desktop/job_session.hpp"
#include "test_workspace.hpp"

Q_IMPORT_QML_PLUGIN(Mendwright_ModelsPlugin)
Q_IMPORT_QML_PLUGIN(MendwrightPlugin)

using namespace mendwright::desktop;

class EndToEndTest : public QObject {
    Q_OBJECT

    int actions_ = 0;
    QQuickWindow* window_ = nullptr;

    void act(Qt::Key key, Qt::KeyboardModifiers modifiers = Qt::NoModifier) {
        ++actions_;
        QTest::keyClick(window_, key, modifiers);
        QTest::qWait(50);
    }

private Q_SLOTS:
    void demo_job_from_start_to_exported_quote_in_at_most_12_actions() {
        set_application_identity();
        const bool demo_present = std::filesystem::exists(std::string(MENDWRIGHT_SOURCE_DIR) + "/pricebook-demo/jobs") &&
                                  !std::filesystem::is_empty(std::string(MENDWRIGHT_SOURCE_DIR) + "/pricebook-demo/jobs");
        const std::string demo = demo_present ? std::string(MENDWRIGHT_SOURCE_DIR) + "/pricebook-demo/jobs" : std::string();
        QTemporaryDir out;
        const QString quote_path = out.filePath(QStringLiteral("quote.xlsx"));
        test::TestWorkspace fixture(demo, quote_path.toStdString());
        QVERIFY2(fixture.workspace, fixture.error.c_str());
        QVERIFY(fixture.workspace->seededJobs() > 0);

        QQmlApplicationEngine engine;
        QVERIFY(load_main_window(engine));
        window_ = qobject_cast<QQuickWindow*>(engine.rootObjects().constFirst());
        QVERIFY(window_);
        QVERIFY(QTest::qWaitForWindowExposed(window_));
        auto* session = window_->findChild<JobSession*>();
        QVERIFY(session);

        act(Qt::Key_Return);                      // 1. open the first job of the list (overdue first)
        QTRY_VERIFY(session->loaded());
        QVERIFY(session->urgentItems()->count() > 0);
        QCOMPARE(window_->property("currentView").toString(), QStringLiteral("findings"));
        act(Qt::Key_4, Qt::ControlModifier);      // 2. the plans side by side
        QCOMPARE(window_->property("currentView").toString(), QStringLiteral("plans"));
        act(Qt::Key_L, Qt::ControlModifier);      // 3. take the least-cost plan into the works list
        QCOMPARE(session->worksPlan(), QStringLiteral("least-cost"));
        QCOMPARE(window_->property("currentView").toString(), QStringLiteral("works"));
        act(Qt::Key_E, Qt::ControlModifier);      // 4. export the quote
        QTRY_VERIFY(QFile::exists(quote_path));
        QVERIFY2(actions_ <= 12, qPrintable(QStringLiteral("%1 actions").arg(actions_)));
        qInfo("start to exported quote: %d user actions", actions_);
        QCOMPARE(session->status(), QStringLiteral("quoted"));

        // An independent reader: openpyxl (Debian's /usr/bin/python3) finds the four sheets, the
        // client and the total the application showed.
        QProcess reader;
        reader.start(QStringLiteral("/usr/bin/python3"),
                     {QStringLiteral(MENDWRIGHT_DESKTOP_TEST_DIR "/read_quote.py"), quote_path,
                      session->client(), session->worksTotals().total});
        QVERIFY(reader.waitForFinished(60000));
        QVERIFY2(reader.exitCode() == 0, reader.readAllStandardError().constData());

        // After the works, by keyboard: the first urgent item marked remedied with R, then
        // re-tested with T (the list has the focus when the view opens).
        act(Qt::Key_6, Qt::ControlModifier);      // the After-the-works view
        QCOMPARE(window_->property("currentView").toString(), QStringLiteral("aftercare"));
        const QString item = session->urgentItems()->get(0).value("findingId").toString();
        QCOMPARE(session->urgentItems()->get(0).value("state").toString(), QStringLiteral("open"));
        act(Qt::Key_R);
        QTRY_COMPARE(session->urgentItems()->get(session->urgentItems()->indexOf(QStringLiteral("findingId"), item))
                         .value("state").toString(),
                     QStringLiteral("remedied"));
        QCOMPARE(session->status(), QStringLiteral("in_progress"));
        act(Qt::Key_T);
        QTRY_COMPARE(session->urgentItems()->get(session->urgentItems()->indexOf(QStringLiteral("findingId"), item))
                         .value("state").toString(),
                     QStringLiteral("retested"));
    }
};

QTEST_MAIN(EndToEndTest)
#include "end_to_end_test.moc"
