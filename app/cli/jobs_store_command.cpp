// `mendwright-cli jobs ...`: the job store from the command line (app/store, docs/store.md).
//   jobs add SURVEY.json                      a new job from a survey and its assessment
//   jobs list [--urgent] [--overdue] [--json] jobs, those with open urgent items first
//   jobs show ID [--json]                     one job: facts, status history, urgent items
//   jobs status ID STATE [--note T]           move a job on (surveyed, quoted, accepted, ...)
//   jobs remedied ID FINDING_ID [--date D] [--note T]
//   jobs retested ID FINDING_ID [--date D] [--note T]
// Each takes --db URL (sqlite:PATH or postgresql://USER@HOST[:PORT]/NAME); without it the
// store is $MENDWRIGHT_DB, else the embedded SQLite file in the user's data folder.
// $MENDWRIGHT_TODAY=YYYY-MM-DD pins "today" (scripts and tests).
// Exit 0 done; 1 the store refused or failed (a save conflict, no such job, database error);
// 2 usage; 3 an invalid survey document.
#include <QCoreApplication>
#include <cerrno>
#include <cstdlib>
#include <cstring>
#include <memory>
#include <nlohmann/json.hpp>
#include <ostream>

#include "app/cli/command.hpp"
#include "app/cli/text_file.hpp"
#include "app/store/job_store.hpp"
#include "app/store/survey_snapshot.hpp"
#include "planner/io/survey_document.hpp"
#include "planner/rules/profile.hpp"

namespace mendwright::cli {
namespace {

using store::JobStore;

const FlagSpec db_flag{"db", "URL", "job store: sqlite:PATH or postgresql://USER@HOST[:PORT]/NAME (default: $MENDWRIGHT_DB, else the embedded store)"};

// Qt loads its SQL drivers as plugins, which needs an application object.
void ensure_qt_application() {
    if (QCoreApplication::instance()) return;
    static int argc = 1;
    static char name[] = "mendwright-cli";
    static char* argv[] = {name, nullptr};
    static QCoreApplication application(argc, argv);
}

std::string prefix(const std::string& command) { return "mendwright-cli jobs " + command + ": "; }

int store_failure(CommandContext& context, const std::string& command, const store::StoreError& error) {
    context.err << prefix(command) << error.to_string() << "\n";
    return error.kind == store::ErrorKind::invalid_input && error.field.rfind("--", 0) == 0 ? exit_usage : exit_failure;
}

// Opens the store named by --db (or the default), with today from $MENDWRIGHT_TODAY if set.
std::unique_ptr<JobStore> open_store(const ParsedArgs& args, CommandContext& context, const std::string& command,
                                     int& exit_code) {
    ensure_qt_application();
    store::Clock clock = store::system_today;
    if (const char* pinned = std::getenv("MENDWRIGHT_TODAY"); pinned && *pinned) {
        auto today = parse_iso_date(pinned, "MENDWRIGHT_TODAY");
        if (!today) {
            context.err << prefix(command) << today.problem().to_string() << "\n";
            exit_code = exit_usage;
            return nullptr;
        }
        clock = store::fixed_clock(today.value());
    }
    auto url = store::resolve_database_url(args.text("db"));
    if (!url) {
        exit_code = url.error().field == "--db" ? usage_error(context, "jobs " + command, Problem{url.error().field, url.error().message})
                                                : store_failure(context, command, url.error());
        return nullptr;
    }
    auto opened = JobStore::open(*url, store::OpenOptions{clock, std::nullopt});
    if (!opened) {
        exit_code = store_failure(context, command, opened.error());
        return nullptr;
    }
    return std::move(opened).value();
}

// A job id from the command line: a whole number >= 1.
std::optional<store::JobId> job_id(const std::string& text, CommandContext& context, const std::string& command) {
    char* end = nullptr;
    errno = 0;
    const long long value = std::strtoll(text.c_str(), &end, 10);
    if (text.empty() || end != text.c_str() + text.size() || errno == ERANGE || value < 1) {
        usage_error(context, "jobs " + command, problem("ID", "expected a job number (a whole number >= 1), got \"" + text + "\""));
        return std::nullopt;
    }
    return value;
}

nlohmann::ordered_json date_json(const std::optional<Date>& date) {
    return date ? nlohmann::ordered_json(date->to_iso()) : nlohmann::ordered_json(nullptr);
}

std::string padded(std::string text, std::size_t width) {
    if (text.size() < width) text.resize(width, ' ');
    return text + " ";
}

// --- jobs add ------------------------------------------------------------------------------

int run_add(const ParsedArgs& args, CommandContext& context) {
    const std::string& file = args.positionals.at(0);
    const auto text = read_text_file(file, context.err, "mendwright-cli jobs add");
    if (!text) return exit_failure;
    const io::SurveyLoad load = io::read_survey(*text);
    if (!load.ok()) {
        const auto errors = load.errors();
        context.err << prefix("add") << file << ": invalid survey, " << errors.size() << (errors.size() == 1 ? " error" : " errors")
                    << "; nothing was added\n";
        for (const auto& d : errors) context.err << "  error: " << d.to_string() << "\n";
        return exit_invalid_input;
    }
    int code = exit_ok;
    auto jobs = open_store(args, context, "add", code);
    if (!jobs) return code;
    auto added = jobs->add_job(store::survey_snapshot(*load.installation, *text, rules::default_rules_profile()));
    if (!added) return store_failure(context, "add", added.error());
    auto job = jobs->job(*added);
    if (!job) return store_failure(context, "add", job.error());
    if (args.has("json")) {
        context.out << nlohmann::ordered_json{{"id", job->id}, {"revision", job->latest_revision},
                                      {"urgent_open", job->urgent_items.size()}, {"findings", job->findings.size()}}
                           .dump(2)
                    << "\n";
        return exit_ok;
    }
    context.out << "Added job " << job->id << ": " << job->facts.client << ", " << job->facts.site << " ("
                << jobs->url().display() << ")\n"
                << job->findings.size() << " findings, " << job->urgent_items.size() << " urgent (C1, C2, FI)";
    for (const auto& item : job->urgent_items)
        if (item.due) {
            context.out << ", first due " << item.due->to_iso();
            break;
        }
    context.out << "\n\n" << caution_text << "\n";
    return exit_ok;
}

// --- jobs list -----------------------------------------------------------------------------

int run_list(const ParsedArgs& args, CommandContext& context) {
    int code = exit_ok;
    auto jobs = open_store(args, context, "list", code);
    if (!jobs) return code;
    auto lines = jobs->list_jobs(store::JobFilter{args.has("urgent"), args.has("overdue"), std::nullopt});
    if (!lines) return store_failure(context, "list", lines.error());
    if (args.has("json")) {
        nlohmann::ordered_json list = nlohmann::ordered_json::array();
        for (const auto& line : *lines)
            list.push_back({{"id", line.id},
                            {"client", line.client},
                            {"site", line.site},
                            {"status", store::status_text(line.status)},
                            {"urgent_open", line.urgent_open},
                            {"next_due", date_json(line.next_due)},
                            {"overdue", line.overdue}});
        context.out << nlohmann::ordered_json{{"jobs", list}}.dump(2) << "\n";
        return exit_ok;
    }
    if (lines->empty()) {
        context.out << (args.has("overdue") ? "No job has an overdue urgent item.\n"
                        : args.has("urgent") ? "No job has an open urgent item.\n"
                                             : "No jobs in the store.\n");
    } else {
        context.out << padded("ID", 6) << padded("STATUS", 12) << padded("URGENT", 7) << padded("NEXT DUE", 19)
                    << padded("CLIENT", 24) << "SITE\n";
        for (const auto& line : *lines) {
            std::string due = line.next_due ? line.next_due->to_iso() : (line.urgent_open ? "as agreed" : "-");
            if (line.overdue) due += " OVERDUE";
            context.out << padded(std::to_string(line.id), 6) << padded(store::status_text(line.status), 12)
                        << padded(std::to_string(line.urgent_open), 7) << padded(due, 19) << padded(line.client, 24)
                        << line.site << "\n";
        }
    }
    context.out << "\n" << caution_text << "\n";
    return exit_ok;
}

// --- jobs show -----------------------------------------------------------------------------

int run_show(const ParsedArgs& args, CommandContext& context) {
    const auto id = job_id(args.positionals.at(0), context, "show");
    if (!id) return exit_usage;
    int code = exit_ok;
    auto jobs = open_store(args, context, "show", code);
    if (!jobs) return code;
    auto job = jobs->job(*id);
    if (!job) return store_failure(context, "show", job.error());
    const Date today = jobs->today();
    if (args.has("json")) {
        nlohmann::ordered_json history = nlohmann::ordered_json::array();
        for (const auto& change : job->history)
            history.push_back({{"status", store::status_text(change.status)}, {"on", change.changed_on.to_iso()}, {"note", change.note}});
        nlohmann::ordered_json items = nlohmann::ordered_json::array();
        for (const auto& item : job->urgent_items)
            items.push_back({{"id", item.finding_id},
                             {"code", item.code},
                             {"title", item.title},
                             {"due", date_json(item.due)},
                             {"state", store::urgent_state_text(item.state)},
                             {"remedied_on", date_json(item.remedied_on)},
                             {"retested_on", date_json(item.retested_on)}});
        context.out << nlohmann::ordered_json{{"id", job->id},
                                      {"reference", job->facts.reference},
                                      {"client", job->facts.client},
                                      {"site", job->facts.site},
                                      {"occupancy", job->facts.occupancy},
                                      {"inspection_date", job->facts.inspection_date.to_iso()},
                                      {"inspector", job->facts.inspector},
                                      {"status", store::status_text(job->status)},
                                      {"created_on", job->created_on.to_iso()},
                                      {"latest_revision", job->latest_revision},
                                      {"status_history", history},
                                      {"urgent_items", items},
                                      {"caution", caution_text}}
                           .dump(2)
                    << "\n";
        return exit_ok;
    }
    const auto& facts = job->facts;
    context.out << "Job " << job->id << (facts.reference.empty() ? "" : " (" + facts.reference + ")") << ": " << facts.client
                << "\nSite:        " << facts.site << "\nOccupancy:   " << facts.occupancy
                << "\nInspected:   " << facts.inspection_date.to_iso() << " by " << facts.inspector
                << "\nStatus:      " << store::status_text(job->status) << "\nRevision:    " << job->latest_revision << " of "
                << job->revisions.size() << "\n\nHistory:\n";
    for (const auto& change : job->history)
        context.out << "  " << change.changed_on.to_iso() << "  " << padded(store::status_text(change.status), 12) << change.note
                    << "\n";
    context.out << "\nUrgent items (" << job->urgent_items.size() << "):\n";
    if (job->urgent_items.empty()) context.out << "  none\n";
    for (const auto& item : job->urgent_items) {
        std::string state = store::urgent_state_text(item.state);
        if (item.remedied_on) state += " " + item.remedied_on->to_iso();
        if (item.retested_on) state += ", re-tested " + item.retested_on->to_iso();
        if (item.overdue(today)) state += " OVERDUE";
        context.out << "  " << padded(item.code, 3) << padded(item.due ? item.due->to_iso() : item.due_text, 11) << item.title
                    << "\n      " << item.location << "\n      " << state << "   [" << item.finding_id << "]\n";
    }
    for (const auto& quote : job->quotes)
        context.out << "\nQuote " << quote.number << " (" << quote.plan << ", revision " << quote.revision << ", "
                    << quote.issued_on.to_iso() << "): total " << quote.total_pence << " pence, " << quote.file_path << "\n";
    context.out << "\n" << caution_text << "\n";
    return exit_ok;
}

// --- jobs status, remedied, retested ---------------------------------------------------------

int run_status(const ParsedArgs& args, CommandContext& context) {
    const auto id = job_id(args.positionals.at(0), context, "status");
    if (!id) return exit_usage;
    const auto status = store::parse_status(args.positionals.at(1));
    if (!status) {
        std::string known;
        for (auto s : store::all_statuses()) known += (known.empty() ? "" : ", ") + store::status_text(s);
        return usage_error(context, "jobs status",
                           problem("STATE", "expected one of " + known + ", got \"" + args.positionals.at(1) + "\""));
    }
    int code = exit_ok;
    auto jobs = open_store(args, context, "status", code);
    if (!jobs) return code;
    auto done = jobs->set_status(*id, *status, args.text("note").value_or(""));
    if (!done) return store_failure(context, "status", done.error());
    context.out << "Job " << *id << " is now " << store::status_text(*status) << ".\n";
    return exit_ok;
}

int run_mark(const ParsedArgs& args, CommandContext& context, bool retest) {
    const std::string command = retest ? "retested" : "remedied";
    const auto id = job_id(args.positionals.at(0), context, command);
    if (!id) return exit_usage;
    std::optional<Date> on;
    if (auto text = args.text("date")) {
        auto date = parse_iso_date(*text, "--date");
        if (!date) return usage_error(context, "jobs " + command, date.problem());
        on = date.value();
    }
    int code = exit_ok;
    auto jobs = open_store(args, context, command, code);
    if (!jobs) return code;
    const std::string& finding = args.positionals.at(1);
    const std::string note = args.text("note").value_or("");
    auto done = retest ? jobs->mark_retested(*id, finding, on, note) : jobs->mark_remedied(*id, finding, on, note);
    if (!done) {
        auto error = done.error();
        if (error.field == "date") error.field = "--date";
        return store_failure(context, command, error);
    }
    context.out << "Job " << *id << ", " << finding << ": " << (retest ? "re-tested" : "remedied") << " on "
                << on.value_or(jobs->today()).to_iso() << ".\n";
    return exit_ok;
}

[[maybe_unused]] const bool registered_add = register_command({
    "jobs add", "SURVEY.json", "Add a job to the store from a survey document, with its findings and urgent items",
    {db_flag, {"json", "", "print the new job's id as JSON"}}, 1, 1, run_add});

[[maybe_unused]] const bool registered_list = register_command({
    "jobs list", "", "List jobs: open urgent items first, overdue first, then by due date",
    {db_flag,
     {"urgent", "", "only jobs with open urgent items (C1, C2, FI)"},
     {"overdue", "", "only jobs with an open urgent item past its due date"},
     {"json", "", "print JSON: {\"jobs\": [{id, client, site, status, urgent_open, next_due, overdue}]}"}},
    0, 0, run_list});

[[maybe_unused]] const bool registered_show = register_command({
    "jobs show", "ID", "Show one job: facts, status history, urgent items and their state",
    {db_flag, {"json", "", "print JSON"}}, 1, 1, run_show});

[[maybe_unused]] const bool registered_status = register_command({
    "jobs status", "ID STATE",
    "Move a job to another status (surveyed, quoted, accepted, in_progress, completed, closed, declined)",
    {db_flag, {"note", "TEXT", "a note kept in the job's history"}}, 2, 2, run_status});

[[maybe_unused]] const bool registered_remedied = register_command({
    "jobs remedied", "ID FINDING_ID", "Record that an urgent item has been remedied",
    {db_flag, {"date", "YYYY-MM-DD", "when (default: today)"}, {"note", "TEXT", "what was done"}}, 2, 2,
    [](const ParsedArgs& args, CommandContext& context) { return run_mark(args, context, false); }});

[[maybe_unused]] const bool registered_retested = register_command({
    "jobs retested", "ID FINDING_ID", "Record that a remedied urgent item has been re-tested",
    {db_flag, {"date", "YYYY-MM-DD", "when (default: today)"}, {"note", "TEXT", "the re-test result"}}, 2, 2,
    [](const ParsedArgs& args, CommandContext& context) { return run_mark(args, context, true); }});

}  // namespace
}  // namespace mendwright::cli
