// Tests of the QML-facing C++ types (app/desktop): each model is checked against Qt's own
// model contract with QAbstractItemModelTester, and the job session's behaviour against the
// invented test surveys (tests/desktop/data) and the demo price book.
#include <QAbstractItemModelTester>
#include <QSet>
#include <QSignalSpy>
#include <QTest>
#include <algorithm>
#include <filesystem>

#include "app/desktop/job_list_model.hpp"
#include "app/desktop/job_session.hpp"
#include "app/desktop/price_book_model.hpp"
#include "app/desktop/record_list_model.hpp"
#include "planner/pricing/price_book.hpp"
#include "test_workspace.hpp"

using namespace mendwright;
using namespace mendwright::desktop;

namespace {

// Opens the job whose reference is `reference` in `session`.
bool open_job(JobSession& session, JobListModel& jobs, const QString& reference) {
    for (int row = 0; row < jobs.count(); ++row)
        if (jobs.data(jobs.index(row), JobListModel::ReferenceRole).toString() == reference) {
            session.setJobId(jobs.jobIdAt(row));
            return session.loaded();
        }
    return false;
}

int find_row(const RecordListModel& model, const QString& role, const QVariant& value) { return model.indexOf(role, value); }

}  // namespace

class DesktopModelTests : public QObject {
    Q_OBJECT

private Q_SLOTS:
    void job_list_reads_only_the_pages_a_view_asks_for_within_the_model_contract() {
        test::TestWorkspace fixture;
        QVERIFY2(fixture.workspace, fixture.error.c_str());
        const std::string flat = test::TestWorkspace::survey_text("flat-tncs.json");
        for (int i = 0; i < 248; ++i) {
            std::string text = flat;
            const std::string from = "\"DT-102\"";
            text.replace(text.find(from), from.size(), "\"PG-" + std::to_string(i) + "\"");
            std::string error;
            QVERIFY2(fixture.workspace->addSurvey(text, error), error.c_str());
        }
        JobListModel jobs;
        jobs.setPageSize(40);
        QCOMPARE(jobs.totalCount(), 250);
        QCOMPARE(jobs.count(), 250);   // a row for every job...
        QCOMPARE(jobs.linesRead(), 0);  // ...but nothing read until a view asks
        QCOMPARE(jobs.data(jobs.index(0), JobListModel::ReferenceRole).toString(), QStringLiteral("DT-101"));  // overdue first
        QCOMPARE(jobs.linesRead(), 40);  // one page
        // The last row reads its own page (rows 240..249) and none of the 200 rows between.
        QVERIFY(jobs.data(jobs.index(249), JobListModel::ReferenceRole).toString().startsWith(QStringLiteral("PG-")));
        QCOMPARE(jobs.linesRead(), 50);
        QAbstractItemModelTester tester(&jobs, QAbstractItemModelTester::FailureReportingMode::QtTest);
        // Every row in turn: each job exactly once (pages neither overlap nor skip), and only a
        // few pages kept at a time.
        QSet<QString> references;
        qint64 most_kept = 0;
        for (int row = 0; row < jobs.count(); ++row) {
            references.insert(jobs.data(jobs.index(row), JobListModel::ReferenceRole).toString());
            most_kept = std::max(most_kept, jobs.linesKept());
        }
        QCOMPARE(references.size(), 250);
        QVERIFY(most_kept <= 8 * 40);
        QVERIFY(!jobs.canFetchMore({}));
    }

    void job_list_puts_the_overdue_job_first_and_says_so() {
        test::TestWorkspace fixture;
        QVERIFY2(fixture.workspace, fixture.error.c_str());
        JobListModel jobs;
        QAbstractItemModelTester tester(&jobs, QAbstractItemModelTester::FailureReportingMode::QtTest);
        jobs.fetchMore({});
        QCOMPARE(jobs.count(), 2);
        // Privately rented dwelling in England inspected 2026-10-01: urgent items due within
        // 28 days (The Electrical Safety Standards in the Private Rented Sector (England)
        // Regulations 2020, SI 2020/312, reg. 3), so overdue on 2026-12-02.
        QCOMPARE(jobs.data(jobs.index(0), JobListModel::ReferenceRole).toString(), QStringLiteral("DT-101"));
        QVERIFY(jobs.data(jobs.index(0), JobListModel::OverdueRole).toBool());
        QCOMPARE(jobs.data(jobs.index(0), JobListModel::NextDueRole).toString(), QStringLiteral("2026-10-29"));
        QVERIFY(jobs.data(jobs.index(0), JobListModel::UrgentOpenRole).toInt() > 0);
        QCOMPARE(jobs.data(jobs.index(1), JobListModel::UrgentOpenRole).toInt(), 0);
    }

    void job_list_filters_by_urgency_status_and_search_text() {
        test::TestWorkspace fixture;
        QVERIFY2(fixture.workspace, fixture.error.c_str());
        JobListModel jobs;
        QAbstractItemModelTester tester(&jobs, QAbstractItemModelTester::FailureReportingMode::QtTest);
        jobs.setSearch(QStringLiteral("FLAT 2"));  // without regard to case
        QCOMPARE(jobs.totalCount(), 1);
        jobs.fetchMore({});
        QCOMPARE(jobs.data(jobs.index(0), JobListModel::ReferenceRole).toString(), QStringLiteral("DT-102"));
        jobs.setSearch({});
        jobs.setUrgentOnly(true);
        QCOMPARE(jobs.totalCount(), 1);
        jobs.setOverdueOnly(true);
        QCOMPARE(jobs.totalCount(), 1);
        jobs.setUrgentOnly(false);
        jobs.setOverdueOnly(false);
        jobs.setStatus(QStringLiteral("quoted"));
        QCOMPARE(jobs.totalCount(), 0);
        jobs.setStatus(QStringLiteral("surveyed"));
        QCOMPARE(jobs.totalCount(), 2);
        jobs.setSearch(QStringLiteral("100%_"));  // wildcards are taken as text, not patterns
        QCOMPARE(jobs.totalCount(), 0);
    }

    void record_list_updates_rows_in_place_while_their_count_holds() {
        RecordListModel model({QStringLiteral("name"), QStringLiteral("value")});
        QAbstractItemModelTester tester(&model, QAbstractItemModelTester::FailureReportingMode::QtTest);
        QSignalSpy resets(&model, &QAbstractItemModel::modelReset);
        QSignalSpy changes(&model, &QAbstractItemModel::dataChanged);
        model.setRows({{{"name", "a"}, {"value", 1}}, {{"name", "b"}, {"value", 2}}});
        QCOMPARE(resets.count(), 1);
        model.setRows({{{"name", "a"}, {"value", 1}}, {{"name", "b"}, {"value", 3}}});
        QCOMPARE(resets.count(), 1);
        QCOMPARE(changes.count(), 1);  // only the row that changed
        QCOMPARE(model.get(1).value("value").toInt(), 3);
        QCOMPARE(model.indexOf(QStringLiteral("name"), QStringLiteral("b")), 1);
        model.setRows({});
        QCOMPARE(model.count(), 0);
    }

    void price_book_refuses_a_third_decimal_place_and_saves_what_the_reader_accepts() {
        test::TestWorkspace fixture;
        QVERIFY2(fixture.workspace, fixture.error.c_str());
        PriceBookModel* book = fixture.workspace->priceBook();
        QAbstractItemModelTester tester(book, QAbstractItemModelTester::FailureReportingMode::QtTest);
        // docs/pricebook-format.md, rule R2: amounts with more than 2 decimal places are refused, not rounded.
        QVERIFY(book->setField(0, QStringLiteral("materialCost"), QStringLiteral("12.345")).contains(QStringLiteral("2 decimal places")));
        QCOMPARE(book->setField(0, QStringLiteral("materialCost"), QStringLiteral("12.34")), QString());
        QVERIFY(!book->setSetting(QStringLiteral("vatPercent"), QStringLiteral("twenty")).isEmpty());
        QCOMPARE(book->setSetting(QStringLiteral("vatPercent"), QStringLiteral("17.5")), QString());
        const int added = book->addItem();
        QCOMPARE(book->setField(added, QStringLiteral("code"), book->data(book->index(0), PriceBookModel::CodeRole).toString())
                     .isEmpty(),
                 false);  // codes stay unique
        QVERIFY(book->modified());
        QCOMPARE(book->save(), QString());
        auto reread = pricing::read_price_book(fixture.path("pricebook"));
        QVERIFY2(reread.ok(), reread.ok() ? "" : reread.problem().to_string().c_str());
        QCOMPARE(reread->items.front().material_pence, 1234);
        QCOMPARE(reread->settings.vat_bp, 1750);
        QCOMPARE(static_cast<int>(reread->items.size()), book->count());
        QCOMPARE(fixture.workspace->book().settings.vat_bp, 1750);  // the workspace prices with the saved book
    }

    void session_groups_findings_by_code_and_ranks_the_options_of_each() {
        test::TestWorkspace fixture;
        QVERIFY2(fixture.workspace, fixture.error.c_str());
        JobListModel jobs;
        jobs.fetchMore({});
        JobSession session;
        QVERIFY(open_job(session, jobs, QStringLiteral("DT-101")));
        RecordListModel* findings = session.findings();
        QAbstractItemModelTester tester(findings, QAbstractItemModelTester::FailureReportingMode::QtTest);
        QVERIFY(findings->count() > 0);
        // Grouped by code in the order C1, C2, FI, C3, notes: each section starts with its code.
        const QStringList order{QStringLiteral("C1"), QStringLiteral("C2"), QStringLiteral("FI"), QStringLiteral("C3"), QStringLiteral("note")};
        int last = 0;
        for (int row = 0; row < findings->count(); ++row) {
            const QVariantMap f = findings->get(row);
            const int rank = order.indexOf(f.value("code").toString());
            QVERIFY(rank >= last);
            last = rank;
            QVERIFY(f.value("section").toString().startsWith(f.value("code").toString()));
            QVERIFY(!f.value("clause").toString().isEmpty());
        }
        // The recorded C2 observation is among them, with its words.
        QVERIFY(findings->indexOf(QStringLiteral("code"), QStringLiteral("C2")) >= 0);

        QVERIFY(!session.selectedFindingId().isEmpty());  // the first urgent finding
        RecordListModel* options = session.options();
        QAbstractItemModelTester option_tester(options, QAbstractItemModelTester::FailureReportingMode::QtTest);
        QVERIFY(options->count() > 0);
        for (int row = 0; row < options->count(); ++row) QCOMPARE(options->get(row).value("rank").toInt(), row + 1);

        RecordListModel* plans = session.plans();
        QAbstractItemModelTester plan_tester(plans, QAbstractItemModelTester::FailureReportingMode::QtTest);
        QCOMPARE(plans->count(), 3);
        QCOMPARE(plans->get(0).value("name").toString(), QStringLiteral("least-cost"));
        QCOMPARE(plans->get(1).value("name").toString(), QStringLiteral("ideal"));
        QCOMPARE(plans->get(2).value("name").toString(), QStringLiteral("custom"));
        // The own plan starts as the least-cost one.
        QCOMPARE(plans->get(2).value("costPence"), plans->get(0).value("costPence"));
    }

    void choosing_an_option_rebuilds_the_own_plan_only() {
        test::TestWorkspace fixture;
        QVERIFY2(fixture.workspace, fixture.error.c_str());
        JobListModel jobs;
        jobs.fetchMore({});
        JobSession session;
        QVERIFY(open_job(session, jobs, QStringLiteral("DT-101")));
        RecordListModel* options = session.options();
        // The first finding with an option the least-cost plan does not take (the ideal plan's
        // electrode target, for one, is never the cheapest).
        int unchosen = -1;
        for (int f = 0; f < session.findings()->count() && unchosen < 0; ++f) {
            session.selectFinding(session.findings()->get(f).value("findingId").toString());
            for (int row = 0; row < options->count(); ++row)
                if (!options->get(row).value("chosen").toBool()) unchosen = row;
        }
        QVERIFY(unchosen >= 0);
        const QVariant least_cost_before = session.plans()->get(0).value("costPence");
        session.setOptionChosen(options->get(unchosen).value("optionId").toString(), true);
        QVERIFY(options->get(unchosen).value("chosen").toBool());
        QCOMPARE(session.plans()->get(0).value("costPence"), least_cost_before);
    }

    void works_list_totals_follow_an_edited_quantity_and_refuse_a_negative_one() {
        test::TestWorkspace fixture;
        QVERIFY2(fixture.workspace, fixture.error.c_str());
        JobListModel jobs;
        jobs.fetchMore({});
        JobSession session;
        QVERIFY(open_job(session, jobs, QStringLiteral("DT-101")));
        QVERIFY(session.usePlan(QStringLiteral("least-cost")));
        RecordListModel* works = session.works();
        QAbstractItemModelTester tester(works, QAbstractItemModelTester::FailureReportingMode::QtTest);
        const int line = works->indexOf(QStringLiteral("kind"), QStringLiteral("line"));
        QVERIFY(line > 0);
        QCOMPARE(works->get(0).value("kind").toString(), QStringLiteral("group"));
        // The same finding at several places is said once with its count (common practice: a
        // works list the client reads), never repeated title after title.
        bool counted = false;
        for (int row = 0; row < works->rowCount(); ++row) {
            const QStringList parts = works->get(row).value("clears").toString().split(QStringLiteral("; "), Qt::SkipEmptyParts);
            QCOMPARE(QSet<QString>(parts.begin(), parts.end()).size(), parts.size());
            for (const auto& part : parts) counted = counted || part.contains(QStringLiteral("(× "));
        }
        QVERIFY(counted);
        const qint64 before = session.worksTotals().totalPence;
        QVERIFY(before > 0);
        QSignalSpy changed(&session, &JobSession::worksChanged);
        const double quantity = works->get(line).value("quantity").toString().toDouble();
        QCOMPARE(session.setWorksQuantity(line, QString::number(quantity + 1)), QString());
        QCOMPARE(changed.count(), 1);
        QVERIFY(session.worksTotals().totalPence > before);
        QVERIFY(session.setWorksQuantity(line, QStringLiteral("-1")).contains(QStringLiteral("quantity")));
        QCOMPARE(session.addWorksLine(QStringLiteral("Lift and refit floorboards"), QStringLiteral("each"), QStringLiteral("1"),
                                      QStringLiteral("0"), QStringLiteral("2")),
                 QString());
        QVERIFY(works->indexOf(QStringLiteral("kind"), QStringLiteral("extra")) > 0);
        QVERIFY(!session.addWorksLine(QStringLiteral("x"), QStringLiteral("each"), QStringLiteral("1"), QStringLiteral("£3"),
                                      QStringLiteral("0"))
                     .isEmpty());
    }

    void a_reading_out_of_range_is_refused_with_its_unit_and_range_and_nothing_saved() {
        test::TestWorkspace fixture;
        QVERIFY2(fixture.workspace, fixture.error.c_str());
        JobListModel jobs;
        jobs.fetchMore({});
        JobSession session;
        QVERIFY(open_job(session, jobs, QStringLiteral("DT-101")));
        const QString refused = session.editCircuit(QStringLiteral("c1"), QStringLiteral("zs"), QStringLiteral("5000"));
        QVERIFY2(refused.contains(QStringLiteral("Ω")) && refused.contains(QStringLiteral("2000")), qPrintable(refused));
        QVERIFY(session.editCircuit(QStringLiteral("c1"), QStringLiteral("ir"), QStringLiteral("lots")).contains(QStringLiteral("MΩ")));
        QCOMPARE(session.revision(), 1);
        QVERIFY(!session.canUndo());
    }

    void every_edit_is_a_new_revision_and_undo_redo_are_revisions_too() {
        test::TestWorkspace fixture;
        QVERIFY2(fixture.workspace, fixture.error.c_str());
        JobListModel jobs;
        jobs.fetchMore({});
        JobSession session;
        QVERIFY(open_job(session, jobs, QStringLiteral("DT-101")));
        const int row = find_row(*session.circuits(), QStringLiteral("circuitId"), QStringLiteral("c4"));
        QVERIFY(row >= 0);
        QCOMPARE(session.circuits()->get(row).value("zs").toString(), QString());
        QCOMPARE(session.editCircuit(QStringLiteral("c4"), QStringLiteral("zs"), QStringLiteral("161.2")), QString());
        QCOMPARE(session.revision(), 2);
        QCOMPARE(session.circuits()->get(row).value("zs").toString(), QStringLiteral("161.2"));
        QVERIFY(session.canUndo());
        session.undo();
        QCOMPARE(session.revision(), 3);
        QCOMPARE(session.circuits()->get(row).value("zs").toString(), QString());
        QVERIFY(session.canRedo());
        session.redo();
        QCOMPARE(session.revision(), 4);
        QCOMPARE(session.circuits()->get(row).value("zs").toString(), QStringLiteral("161.2"));
        QCOMPARE(session.addObservation(QStringLiteral("Missing blank at way 6"), QStringLiteral("C2")), QString());
        QCOMPARE(session.revision(), 5);
        QVERIFY(session.addObservation(QStringLiteral("x"), QStringLiteral("C9")).contains(QStringLiteral("C1, C2, C3 or FI")));
    }

    void exporting_records_the_quote_and_the_items_then_follow_to_completion() {
        test::TestWorkspace fixture;
        QVERIFY2(fixture.workspace, fixture.error.c_str());
        JobListModel jobs;
        jobs.fetchMore({});
        JobSession session;
        QVERIFY(open_job(session, jobs, QStringLiteral("DT-101")));
        const QString target = QString::fromStdString(fixture.path("DT-101 quote"));
        QVERIFY2(session.exportQuote(target), qPrintable(session.errorText()));
        QVERIFY(QFile::exists(target + QStringLiteral(".xlsx")));
        QCOMPARE(session.status(), QStringLiteral("quoted"));
        RecordListModel* items = session.urgentItems();
        QAbstractItemModelTester tester(items, QAbstractItemModelTester::FailureReportingMode::QtTest);
        QVERIFY(items->count() > 0);
        QVERIFY(!session.markRetested(items->get(0).value("findingId").toString()));  // not remedied yet
        for (int row = 0; row < items->count(); ++row) {
            QVERIFY2(session.markRemedied(items->get(row).value("findingId").toString()), qPrintable(session.errorText()));
            QCOMPARE(session.status(), QStringLiteral("in_progress"));
        }
        for (int row = 0; row < items->count(); ++row)
            QVERIFY2(session.markRetested(items->get(row).value("findingId").toString()), qPrintable(session.errorText()));
        QCOMPARE(session.status(), QStringLiteral("completed"));
        jobs.setUrgentOnly(true);
        QCOMPARE(jobs.totalCount(), 0);
    }

    void electrode_chart_reads_the_seasonal_factors_backwards_from_the_reading() {
        test::TestWorkspace fixture;
        QVERIFY2(fixture.workspace, fixture.error.c_str());
        JobListModel jobs;
        jobs.fetchMore({});
        JobSession session;
        QVERIFY(open_job(session, jobs, QStringLiteral("DT-101")));
        QVERIFY(session.hasElectrode());
        RecordListModel* series = session.electrodeSeries();
        const int surveyed = series->indexOf(QStringLiteral("name"), QStringLiteral("surveyed"));
        QVERIFY(surveyed >= 0);
        const QVariantList values = series->get(surveyed).value("values").toList();
        QCOMPARE(values.size(), 12);
        const QVariantMap top_tick = session.electrodeTicks()->get(session.electrodeTicks()->count() - 1);
        const double top_ohms = top_tick.value("label").toString().split(QLatin1Char(' ')).front().toDouble();
        // Measured 160 ohms on 2026-07-20. The shipped profile (profiles/bs7671-2018-a2.json,
        // electrode.seasonal_factor_by_month, an assumption of the profile, common practice) has
        // 1.0 for July and 1.8 for January: worst season 160 x 1.0; January 160 / 1.8 = 88.9.
        QVERIFY(qAbs(values.at(6).toDouble() * top_ohms - 160.0) < 1e-6);
        QVERIFY(qAbs(values.at(0).toDouble() * top_ohms - 160.0 / 1.8) < 1e-6);
        // The limits that matter are all there: the 30 mA RCD's touch limit (50 V / 0.03 A,
        // BS 7671 411.5.3), the stability threshold and the ideal target.
        QVERIFY(series->indexOf(QStringLiteral("name"), QStringLiteral("touch")) >= 0);
        QVERIFY(series->get(series->indexOf(QStringLiteral("name"), QStringLiteral("touch"))).value("label").toString().contains(QStringLiteral("1667")));
        QVERIFY(series->indexOf(QStringLiteral("name"), QStringLiteral("stability")) >= 0);
        QVERIFY(series->indexOf(QStringLiteral("name"), QStringLiteral("ideal")) >= 0);
    }
};

QTEST_GUILESS_MAIN(DesktopModelTests)
#include "model_tests.moc"
