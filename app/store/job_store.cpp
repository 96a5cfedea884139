// Opening the store, checking what is handed to it, and every write.
#include "app/store/job_store.hpp"

#include <QString>
#include <set>

#include "app/store/migrations.hpp"

namespace mendwright::store {

namespace {

std::string job_field(JobId job) { return "job " + std::to_string(job); }

bool code_is_urgent(const std::string& code) { return code == "C1" || code == "C2" || code == "FI"; }

bool code_is_known(const std::string& code) {
    return code_is_urgent(code) || code == "C3" || code == "note";
}

StoreError no_such_job(JobId job) {
    return store_error(ErrorKind::not_found, job_field(job), "no such job in the store");
}

}  // namespace

std::optional<StoreError> check_findings(const std::vector<FindingRecord>& findings) {
    std::set<std::string> seen;
    for (std::size_t i = 0; i < findings.size(); ++i) {
        const FindingRecord& finding = findings[i];
        const std::string field = "findings[" + std::to_string(i) + "]";
        if (finding.id.empty()) return store_error(ErrorKind::invalid_input, field + ".id", "expected a finding id, got an empty one");
        if (!seen.insert(finding.id).second)
            return store_error(ErrorKind::invalid_input, field + ".id", "the id \"" + finding.id + "\" appears twice");
        if (!code_is_known(finding.code))
            return store_error(ErrorKind::invalid_input, field + ".code",
                               "expected C1, C2, C3, FI or note, got \"" + finding.code + "\"");
        if (finding.urgent != code_is_urgent(finding.code))
            return store_error(ErrorKind::invalid_input, field + ".urgent",
                               "a " + finding.code + " finding is " + (code_is_urgent(finding.code) ? "" : "not ") +
                                   "urgent (C1, C2 and FI are)");
    }
    return std::nullopt;
}

std::optional<StoreError> check_snapshot(const SurveySnapshot& snapshot) {
    if (snapshot.facts.client.empty())
        return store_error(ErrorKind::invalid_input, "job.client", "expected the client's name, got an empty one");
    if (snapshot.facts.site.empty())
        return store_error(ErrorKind::invalid_input, "job.site", "expected the site, got an empty one");
    if (snapshot.document.empty())
        return store_error(ErrorKind::invalid_input, "document", "expected the survey document, got an empty one");
    return check_findings(snapshot.findings);
}

Outcome<std::unique_ptr<JobStore>> JobStore::open(const DatabaseUrl& url, OpenOptions options) {
    if (!options.clock) options.clock = system_today;
    auto connection = Connection::open(url);
    if (!connection) return connection.error();
    const int target = options.schema_version.value_or(latest_schema_version());
    auto migrated = migrate(**connection, target, options.clock);
    if (!migrated) return migrated.error();
    std::unique_ptr<JobStore> store(new JobStore(std::move(*connection), options.clock));
    store->schema_version_ = migrated->to_version;
    store->upgrade_backup_ = migrated->backup_path;
    return store;
}

Outcome<int> JobStore::latest_revision(JobId job) {
    auto query = connection_->run(QStringLiteral("SELECT latest_revision FROM jobs WHERE id = ?"), {QVariant(job)},
                                  "reading " + job_field(job));
    if (!query) return query.error();
    if (!query->next()) return no_such_job(job);
    return query->value(0).toInt();
}

Outcome<JobId> JobStore::add_job(const SurveySnapshot& snapshot) {
    if (auto problem = check_snapshot(snapshot)) return *problem;
    const Date today = clock_();
    auto transaction = Transaction::begin(*connection_);
    if (!transaction) return transaction.error();
    auto inserted = connection_->run(
        QStringLiteral("INSERT INTO jobs (reference, client, site, occupancy, inspection_date, inspector, status,"
                       " created_on, latest_revision) VALUES (?, ?, ?, ?, ?, ?, ?, ?, 1) RETURNING id"),
        {sql_text(snapshot.facts.reference), sql_text(snapshot.facts.client), sql_text(snapshot.facts.site),
         sql_text(snapshot.facts.occupancy), sql_date(snapshot.facts.inspection_date), sql_text(snapshot.facts.inspector),
         sql_text(status_text(JobStatus::surveyed)), sql_date(today)},
        "adding the job");
    if (!inserted) return inserted.error();
    if (!inserted->next()) return store_error(ErrorKind::database, url().display(), "adding the job: no id came back");
    const JobId job = inserted->value(0).toLongLong();
    inserted->finish();

    auto history = connection_->run(
        QStringLiteral("INSERT INTO job_status_changes (job_id, status, changed_on, note) VALUES (?, ?, ?, ?)"),
        {QVariant(job), sql_text(status_text(JobStatus::surveyed)), sql_date(today), sql_text("added from the survey")},
        "recording the job's first status");
    if (!history) return history.error();
    if (auto counted = count_status(JobStatus::surveyed, +1); !counted) return counted.error();
    auto revision = connection_->run(
        QStringLiteral("INSERT INTO survey_revisions (job_id, revision, based_on, saved_on, document) VALUES (?, 1, ?, ?, ?)"),
        {QVariant(job), QVariant(QMetaType::fromType<int>()), sql_date(today), sql_text(snapshot.document)},
        "saving the survey document");
    if (!revision) return revision.error();
    if (auto done = write_findings(job, 1, snapshot.findings); !done) return done.error();
    if (auto done = merge_urgent_items(job, 1, snapshot.findings); !done) return done.error();
    if (auto committed = (*transaction)->commit(); !committed) return committed.error();
    return job;
}

Outcome<int> JobStore::save_revision(JobId job, int based_on_revision, const SurveySnapshot& snapshot) {
    if (auto problem = check_snapshot(snapshot)) return *problem;
    const Date today = clock_();
    const int revision = based_on_revision + 1;
    auto transaction = Transaction::begin(*connection_);
    if (!transaction) return transaction.error();
    // Compare-and-set on the job's latest revision: of two saves edited from the same revision,
    // exactly one finds it unchanged (SQLite: the write lock is already held; PostgreSQL: the
    // second waits for the row lock, then sees the new value and updates nothing).
    auto claimed = connection_->run(
        QStringLiteral("UPDATE jobs SET latest_revision = ?, reference = ?, client = ?, site = ?, occupancy = ?,"
                       " inspection_date = ?, inspector = ? WHERE id = ? AND latest_revision = ?"),
        {revision, sql_text(snapshot.facts.reference), sql_text(snapshot.facts.client), sql_text(snapshot.facts.site),
         sql_text(snapshot.facts.occupancy), sql_date(snapshot.facts.inspection_date), sql_text(snapshot.facts.inspector),
         QVariant(job), based_on_revision},
        "saving " + job_field(job));
    if (!claimed) return claimed.error();
    if (claimed->numRowsAffected() != 1) {
        auto latest = latest_revision(job);
        if (!latest) return latest.error();
        return store_error(ErrorKind::conflict, job_field(job),
                           "this edit started from revision " + std::to_string(based_on_revision) +
                               " but the latest revision is " + std::to_string(*latest) +
                               ": nothing was saved; reload revision " + std::to_string(*latest) +
                               " and apply the changes to it");
    }
    auto saved = connection_->run(
        QStringLiteral("INSERT INTO survey_revisions (job_id, revision, based_on, saved_on, document) VALUES (?, ?, ?, ?, ?)"),
        {QVariant(job), revision, based_on_revision, sql_date(today), sql_text(snapshot.document)},
        "saving revision " + std::to_string(revision) + " of " + job_field(job));
    if (!saved) return saved.error();
    if (auto done = write_findings(job, revision, snapshot.findings); !done) return done.error();
    if (auto done = merge_urgent_items(job, revision, snapshot.findings); !done) return done.error();
    if (auto committed = (*transaction)->commit(); !committed) return committed.error();
    return revision;
}

Outcome<Done> JobStore::reassess(JobId job, int revision, const std::vector<FindingRecord>& findings) {
    if (auto problem = check_findings(findings)) return *problem;
    auto transaction = Transaction::begin(*connection_);
    if (!transaction) return transaction.error();
    auto latest = latest_revision(job);
    if (!latest) return latest.error();
    if (*latest != revision)
        return store_error(ErrorKind::conflict, job_field(job),
                           "the assessment is of revision " + std::to_string(revision) + " but the latest revision is " +
                               std::to_string(*latest) + ": nothing was changed; assess revision " +
                               std::to_string(*latest) + " instead");
    if (auto done = write_findings(job, revision, findings); !done) return done.error();
    if (auto done = merge_urgent_items(job, revision, findings); !done) return done.error();
    return (*transaction)->commit();
}

Outcome<Done> JobStore::write_findings(JobId job, int revision, const std::vector<FindingRecord>& findings) {
    auto cleared = connection_->run(QStringLiteral("DELETE FROM findings WHERE job_id = ?"), {QVariant(job)},
                                    "replacing the findings of " + job_field(job));
    if (!cleared) return cleared.error();
    for (const FindingRecord& finding : findings) {
        auto inserted = connection_->run(
            QStringLiteral("INSERT INTO findings (job_id, finding_id, revision, rule, code, title, location, clause,"
                           " explanation, urgent, due, due_text) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)"),
            {QVariant(job), sql_text(finding.id), revision, sql_text(finding.rule), sql_text(finding.code),
             sql_text(finding.title), sql_text(finding.location), sql_text(finding.clause), sql_text(finding.explanation),
             finding.urgent ? 1 : 0, sql_date(finding.due), sql_text(finding.due_text)},
            "saving finding " + finding.id);
        if (!inserted) return inserted.error();
    }
    return Done{};
}

Outcome<Done> JobStore::merge_urgent_items(JobId job, int revision, const std::vector<FindingRecord>& findings) {
    std::set<std::string> known;
    {
        auto existing = connection_->run(QStringLiteral("SELECT finding_id FROM urgent_items WHERE job_id = ?"),
                                         {QVariant(job)}, "reading the urgent items of " + job_field(job));
        if (!existing) return existing.error();
        while (existing->next()) known.insert(text_of(existing->value(0)));
    }
    std::set<std::string> reported;
    for (const FindingRecord& finding : findings) {
        if (!finding.urgent) continue;
        reported.insert(finding.id);
        const std::vector<QVariant> details{sql_text(finding.code), sql_text(finding.title), sql_text(finding.location),
                                            sql_date(finding.due), sql_text(finding.due_text)};
        if (known.count(finding.id)) {
            // Same finding: its description and due date follow the latest assessment; its
            // state and dates (remedied, re-tested) are the contractor's record and stay.
            auto values = details;
            values.insert(values.end(), {QVariant(job), sql_text(finding.id)});
            auto updated = connection_->run(
                QStringLiteral("UPDATE urgent_items SET code = ?, title = ?, location = ?, due = ?, due_text = ?,"
                               " absent_since_revision = NULL WHERE job_id = ? AND finding_id = ?"),
                values, "updating urgent item " + finding.id);
            if (!updated) return updated.error();
        } else {
            std::vector<QVariant> values{QVariant(job), sql_text(finding.id)};
            values.insert(values.end(), details.begin(), details.end());
            values.push_back(revision);
            auto inserted = connection_->run(
                QStringLiteral("INSERT INTO urgent_items (job_id, finding_id, code, title, location, due, due_text, state,"
                               " first_revision, absent_since_revision, remedied_on, remedied_note, retested_on,"
                               " retested_note) VALUES (?, ?, ?, ?, ?, ?, ?, 'open', ?, NULL, NULL, '', NULL, '')"),
                values, "adding urgent item " + finding.id);
            if (!inserted) return inserted.error();
        }
    }
    for (const std::string& id : known) {
        if (reported.count(id)) continue;
        auto absent = connection_->run(
            QStringLiteral("UPDATE urgent_items SET absent_since_revision = ? WHERE job_id = ? AND finding_id = ?"
                           " AND absent_since_revision IS NULL"),
            {revision, QVariant(job), sql_text(id)}, "retiring urgent item " + id);
        if (!absent) return absent.error();
    }
    return refresh_urgent_summary(job);
}

Outcome<Done> JobStore::count_status(JobStatus status, int change) {
    if (schema_version_ < 3) return Done{};
    auto updated = connection_->run(QStringLiteral("UPDATE job_status_counts SET jobs = jobs + ? WHERE status = ?"),
                                    {change, sql_text(status_text(status))}, "counting jobs by status");
    if (!updated) return updated.error();
    return Done{};
}

Outcome<Done> JobStore::refresh_urgent_summary(JobId job) {
    if (schema_version_ < 3) return Done{};  // a store kept at an older schema (upgrade tests)
    auto updated = connection_->run(
        QStringLiteral("UPDATE jobs SET"
                       " urgent_open = (SELECT COUNT(*) FROM urgent_items u WHERE u.job_id = ?"
                       " AND u.state = 'open' AND u.absent_since_revision IS NULL),"
                       " next_due = (SELECT MIN(u.due) FROM urgent_items u WHERE u.job_id = ?"
                       " AND u.state = 'open' AND u.absent_since_revision IS NULL)"
                       " WHERE id = ?"),
        {QVariant(job), QVariant(job), QVariant(job)}, "updating the urgent summary of " + job_field(job));
    if (!updated) return updated.error();
    return Done{};
}

Outcome<Done> JobStore::set_status(JobId job, JobStatus status, const std::string& note) {
    auto transaction = Transaction::begin(*connection_);
    if (!transaction) return transaction.error();
    auto current = connection_->run(QStringLiteral("SELECT status FROM jobs WHERE id = ?"), {QVariant(job)},
                                    "reading " + job_field(job));
    if (!current) return current.error();
    if (!current->next()) return no_such_job(job);
    const std::string was = text_of(current->value(0));
    current->finish();
    if (was == status_text(status))
        return store_error(ErrorKind::invalid_input, job_field(job), "the job is already " + was);
    auto updated = connection_->run(QStringLiteral("UPDATE jobs SET status = ? WHERE id = ?"),
                                    {sql_text(status_text(status)), QVariant(job)}, "changing the status of " + job_field(job));
    if (!updated) return updated.error();
    auto history = connection_->run(
        QStringLiteral("INSERT INTO job_status_changes (job_id, status, changed_on, note) VALUES (?, ?, ?, ?)"),
        {QVariant(job), sql_text(status_text(status)), sql_date(clock_()), sql_text(note)},
        "recording the status change of " + job_field(job));
    if (!history) return history.error();
    if (auto counted = count_status(parse_status(was).value_or(JobStatus::surveyed), -1); !counted) return counted.error();
    if (auto counted = count_status(status, +1); !counted) return counted.error();
    return (*transaction)->commit();
}

Outcome<UrgentItem> JobStore::current_urgent_item(JobId job, const std::string& finding_id) {
    if (auto latest = latest_revision(job); !latest) return latest.error();
    auto query = connection_->run(
        QStringLiteral("SELECT state, remedied_on, absent_since_revision, code, title FROM urgent_items"
                       " WHERE job_id = ? AND finding_id = ?"),
        {QVariant(job), sql_text(finding_id)}, "reading urgent item " + finding_id);
    if (!query) return query.error();
    const std::string field = job_field(job) + ", finding " + finding_id;
    if (!query->next())
        return store_error(ErrorKind::not_found, field, "the job has no urgent item (C1, C2 or FI) with this finding id");
    if (!query->value(2).isNull())
        return store_error(ErrorKind::invalid_input, field,
                           "no longer reported since revision " + query->value(2).toString().toStdString());
    UrgentItem item;
    item.finding_id = finding_id;
    item.state = parse_urgent_state(text_of(query->value(0))).value_or(UrgentState::open);
    item.remedied_on = date_of(query->value(1));
    item.code = text_of(query->value(3));
    item.title = text_of(query->value(4));
    return item;
}

Outcome<Done> JobStore::mark_remedied(JobId job, const std::string& finding_id, std::optional<Date> on,
                                      const std::string& note) {
    const Date today = clock_();
    const Date date = on.value_or(today);
    if (date > today)
        return store_error(ErrorKind::invalid_input, "date", date.to_iso() + " is after today (" + today.to_iso() + ")");
    auto transaction = Transaction::begin(*connection_);
    if (!transaction) return transaction.error();
    auto item = current_urgent_item(job, finding_id);
    if (!item) return item.error();
    if (item->state != UrgentState::open)
        return store_error(ErrorKind::invalid_input, job_field(job) + ", finding " + finding_id,
                           "already " + urgent_state_text(item->state) + " (remedied on " +
                               (item->remedied_on ? item->remedied_on->to_iso() : "?") + ")");
    auto updated = connection_->run(
        QStringLiteral("UPDATE urgent_items SET state = 'remedied', remedied_on = ?, remedied_note = ?"
                       " WHERE job_id = ? AND finding_id = ?"),
        {sql_date(date), sql_text(note), QVariant(job), sql_text(finding_id)}, "marking " + finding_id + " remedied");
    if (!updated) return updated.error();
    if (auto done = refresh_urgent_summary(job); !done) return done.error();
    return (*transaction)->commit();
}

Outcome<Done> JobStore::mark_retested(JobId job, const std::string& finding_id, std::optional<Date> on,
                                      const std::string& note) {
    const Date today = clock_();
    const Date date = on.value_or(today);
    if (date > today)
        return store_error(ErrorKind::invalid_input, "date", date.to_iso() + " is after today (" + today.to_iso() + ")");
    auto transaction = Transaction::begin(*connection_);
    if (!transaction) return transaction.error();
    auto item = current_urgent_item(job, finding_id);
    if (!item) return item.error();
    const std::string field = job_field(job) + ", finding " + finding_id;
    if (item->state == UrgentState::open)
        return store_error(ErrorKind::invalid_input, field, "still open: record the remedy before the re-test");
    if (item->state == UrgentState::retested) return store_error(ErrorKind::invalid_input, field, "already re-tested");
    if (item->remedied_on && date < *item->remedied_on)
        return store_error(ErrorKind::invalid_input, "date",
                           "the re-test date " + date.to_iso() + " is before the remedy (" + item->remedied_on->to_iso() + ")");
    auto updated = connection_->run(
        QStringLiteral("UPDATE urgent_items SET state = 'retested', retested_on = ?, retested_note = ?"
                       " WHERE job_id = ? AND finding_id = ?"),
        {sql_date(date), sql_text(note), QVariant(job), sql_text(finding_id)}, "marking " + finding_id + " re-tested");
    if (!updated) return updated.error();
    return (*transaction)->commit();
}

Outcome<Done> JobStore::record_quote(JobId job, const QuoteRecord& quote) {
    if (quote.number.empty())
        return store_error(ErrorKind::invalid_input, "quote.number", "expected a quote number, got an empty one");
    if (quote.total_pence != quote.net_pence + quote.tax_pence)
        return store_error(ErrorKind::invalid_input, "quote.total_pence",
                           "expected net + tax = " + std::to_string(quote.net_pence + quote.tax_pence) + ", got " +
                               std::to_string(quote.total_pence));
    auto transaction = Transaction::begin(*connection_);
    if (!transaction) return transaction.error();
    auto latest = latest_revision(job);
    if (!latest) return latest.error();
    if (quote.revision < 1 || quote.revision > *latest)
        return store_error(ErrorKind::not_found, "quote.revision",
                           "the job has revisions 1 to " + std::to_string(*latest) + ", got " + std::to_string(quote.revision));
    {
        auto existing = connection_->run(QStringLiteral("SELECT job_id FROM quotes WHERE number = ?"),
                                         {sql_text(quote.number)}, "looking up quote " + quote.number);
        if (!existing) return existing.error();
        if (existing->next())
            return store_error(ErrorKind::invalid_input, "quote.number",
                               "quote " + quote.number + " was already issued (job " + existing->value(0).toString().toStdString() + ")");
    }
    auto inserted = connection_->run(
        QStringLiteral("INSERT INTO quotes (job_id, number, revision, plan, net_pence, tax_pence, total_pence, issued_on,"
                       " file_path) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)"),
        {QVariant(job), sql_text(quote.number), quote.revision, sql_text(quote.plan), QVariant(quote.net_pence),
         QVariant(quote.tax_pence), QVariant(quote.total_pence), sql_date(quote.issued_on), sql_text(quote.file_path)},
        "recording quote " + quote.number);
    if (!inserted) return inserted.error();
    return (*transaction)->commit();
}

}  // namespace mendwright::store
