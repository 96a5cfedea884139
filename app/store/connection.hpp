#pragma once
// One QtSql connection to the store's database, SQLite or PostgreSQL, and the two things every
// statement goes through: prepared statements with bound values (never text spliced into
// SQL), and transactions that take the write lock up front and roll back unless committed.

#include <QSqlDatabase>
#include <QSqlQuery>
#include <QString>
#include <QVariant>
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "app/store/database_url.hpp"
#include "app/store/outcome.hpp"
#include "planner/core/date.hpp"

namespace mendwright::store {

class Connection {
public:
    // Opens (and for SQLite creates) the database: SQLite gets WAL journalling, foreign keys,
    // full synchronous commits and a 10 s busy timeout.
    static Outcome<std::unique_ptr<Connection>> open(const DatabaseUrl& url);
    ~Connection();
    Connection(const Connection&) = delete;
    Connection& operator=(const Connection&) = delete;

    [[nodiscard]] Dialect dialect() const { return url_.dialect; }
    [[nodiscard]] const DatabaseUrl& url() const { return url_; }
    [[nodiscard]] QSqlDatabase database() const;

    // Prepares `sql` (positional ? placeholders), binds `values` in order and runs it.
    // `what` says what the statement was for, in the error.
    Outcome<QSqlQuery> run(const QString& sql, const std::vector<QVariant>& values, const std::string& what);
    // A statement with no values (DDL, PRAGMA, BEGIN); nothing the caller gave goes into `sql`.
    Outcome<Done> run_fixed(const QString& sql, const std::string& what);

    // Whether a table of that name exists.
    Outcome<bool> table_exists(const QString& name);

private:
    Connection(DatabaseUrl url, QString name) : url_(std::move(url)), name_(std::move(name)) {}
    DatabaseUrl url_;
    QString name_;
};

// A transaction, rolled back on destruction unless committed. For writing, SQLite takes the
// write lock before anything is read (BEGIN IMMEDIATE), PostgreSQL runs READ COMMITTED with
// row locks. For reading, both read one snapshot (SQLite: a deferred transaction in WAL mode;
// PostgreSQL: REPEATABLE READ, READ ONLY), so the parts of one answer agree.
enum class TransactionKind { write, read };

class Transaction {
public:
    static Outcome<std::unique_ptr<Transaction>> begin(Connection& connection,
                                                       TransactionKind kind = TransactionKind::write);
    ~Transaction();
    Transaction(const Transaction&) = delete;
    Transaction& operator=(const Transaction&) = delete;
    Outcome<Done> commit();

private:
    explicit Transaction(Connection& connection) : connection_(connection) {}
    Connection& connection_;
    bool finished_ = false;
};

// Values in and out of SQL. Dates are ISO 8601 text in both databases, so that text order is
// date order and the schema is the same.
QVariant sql_text(const std::string& text);
QVariant sql_date(const std::optional<Date>& date);
QVariant sql_date(const Date& date);
std::string text_of(const QVariant& value);
std::optional<Date> date_of(const QVariant& value);

}  // namespace mendwright::store
