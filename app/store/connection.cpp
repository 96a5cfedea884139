#include "app/store/connection.hpp"

#include <QDir>
#include <QFileInfo>
#include <QSqlError>
#include <atomic>

namespace mendwright::store {

namespace {

QString next_connection_name() {
    static std::atomic<long long> counter{0};
    return QStringLiteral("mendwright-store-%1").arg(++counter);
}

std::string error_text(const QSqlError& error) {
    std::string text = error.text().toStdString();
    if (text.empty() || text == " ") text = "unknown database error";
    return text;
}

}  // namespace

Outcome<std::unique_ptr<Connection>> Connection::open(const DatabaseUrl& url) {
    const QString name = next_connection_name();
    const char* driver = url.dialect == Dialect::sqlite ? "QSQLITE" : "QPSQL";
    if (!QSqlDatabase::isDriverAvailable(driver))
        return store_error(ErrorKind::database, url.display(),
                           std::string("the Qt SQL driver ") + driver + " is not installed (Debian: " +
                               (url.dialect == Dialect::sqlite ? "libqt6sql6-sqlite" : "libqt6sql6-psql") + ")");
    std::unique_ptr<Connection> connection(new Connection(url, name));
    {
        QSqlDatabase db = QSqlDatabase::addDatabase(driver, name);
        if (url.dialect == Dialect::sqlite) {
            const QFileInfo file(QString::fromStdString(url.sqlite_path));
            if (url.create_folder) QDir().mkpath(file.dir().path());
            if (!file.dir().exists())
                return store_error(ErrorKind::invalid_input, url.display(),
                                   "the folder " + file.dir().path().toStdString() + " does not exist");
            db.setDatabaseName(file.filePath());
            db.setConnectOptions(QStringLiteral("QSQLITE_BUSY_TIMEOUT=10000"));
        } else {
            db.setHostName(QString::fromStdString(url.host));
            db.setPort(url.port);
            db.setUserName(QString::fromStdString(url.user));
            if (!url.password.empty()) db.setPassword(QString::fromStdString(url.password));
            db.setDatabaseName(QString::fromStdString(url.database));
            db.setConnectOptions(QStringLiteral("connect_timeout=10"));
        }
        if (!db.open())
            return store_error(ErrorKind::database, url.display(), "cannot open the database: " + error_text(db.lastError()));
    }
    if (url.dialect == Dialect::sqlite) {
        // SQLite documentation, "Write-Ahead Logging" (sqlite.org/wal.html): readers do not block
        // the writer, and a commit is atomic across a crash of the writing process.
        auto mode = connection->run(QStringLiteral("PRAGMA journal_mode = WAL"), {}, "switching to WAL journalling");
        if (!mode) return mode.error();
        if (!mode->next() || mode->value(0).toString().toLower() != QStringLiteral("wal"))
            return store_error(ErrorKind::database, url.display(), "the file refused WAL journalling");
        mode->finish();
        for (const char* pragma : {"PRAGMA foreign_keys = ON", "PRAGMA synchronous = FULL"})
            if (auto done = connection->run_fixed(QString::fromLatin1(pragma), pragma); !done) return done.error();
    } else {
        if (auto done = connection->run_fixed(QStringLiteral("SET client_min_messages = warning"), "quietening notices"); !done)
            return done.error();
    }
    return connection;
}

Connection::~Connection() {
    {
        QSqlDatabase db = QSqlDatabase::database(name_, false);
        if (db.isValid()) db.close();
    }
    QSqlDatabase::removeDatabase(name_);
}

QSqlDatabase Connection::database() const { return QSqlDatabase::database(name_, false); }

Outcome<QSqlQuery> Connection::run(const QString& sql, const std::vector<QVariant>& values, const std::string& what) {
    QSqlQuery query(database());
    query.setForwardOnly(true);
    if (!query.prepare(sql))
        return store_error(ErrorKind::database, url_.display(), what + ": " + error_text(query.lastError()));
    for (const QVariant& value : values) query.addBindValue(value);
    if (!query.exec())
        return store_error(ErrorKind::database, url_.display(), what + ": " + error_text(query.lastError()));
    return query;
}

Outcome<Done> Connection::run_fixed(const QString& sql, const std::string& what) {
    QSqlQuery query(database());
    if (!query.exec(sql))
        return store_error(ErrorKind::database, url_.display(), what + ": " + error_text(query.lastError()));
    return Done{};
}

Outcome<bool> Connection::table_exists(const QString& name) {
    const QString sql = dialect() == Dialect::sqlite
                            ? QStringLiteral("SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = ?")
                            : QStringLiteral("SELECT 1 FROM information_schema.tables "
                                             "WHERE table_schema = current_schema() AND table_name = ?");
    auto query = run(sql, {name}, "looking for table " + name.toStdString());
    if (!query) return query.error();
    return query->next();
}

Outcome<std::unique_ptr<Transaction>> Transaction::begin(Connection& connection, TransactionKind kind) {
    const bool sqlite = connection.dialect() == Dialect::sqlite;
    const QString sql = kind == TransactionKind::write
                            ? (sqlite ? QStringLiteral("BEGIN IMMEDIATE") : QStringLiteral("BEGIN"))
                            : (sqlite ? QStringLiteral("BEGIN") : QStringLiteral("BEGIN ISOLATION LEVEL REPEATABLE READ READ ONLY"));
    if (auto done = connection.run_fixed(sql, "beginning a transaction"); !done) return done.error();
    return std::unique_ptr<Transaction>(new Transaction(connection));
}

Transaction::~Transaction() {
    if (!finished_) (void)connection_.run_fixed(QStringLiteral("ROLLBACK"), "rolling back");
}

Outcome<Done> Transaction::commit() {
    auto done = connection_.run_fixed(QStringLiteral("COMMIT"), "committing");
    if (done) finished_ = true;
    return done;
}

QVariant sql_text(const std::string& text) { return QVariant(QString::fromStdString(text)); }

QVariant sql_date(const std::optional<Date>& date) {
    if (!date) return QVariant(QMetaType::fromType<QString>());
    return sql_date(*date);
}

QVariant sql_date(const Date& date) { return QVariant(QString::fromStdString(date.to_iso())); }

std::string text_of(const QVariant& value) { return value.toString().toStdString(); }

std::optional<Date> date_of(const QVariant& value) {
    if (value.isNull()) return std::nullopt;
    auto parsed = parse_iso_date(value.toString().toStdString(), "date");
    if (!parsed) return std::nullopt;
    return parsed.value();
}

}  // namespace mendwright::store
