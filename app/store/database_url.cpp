#include "app/store/database_url.hpp"

#include <QByteArray>
#include <QStandardPaths>
#include <QString>
#include <QUrl>
#include <cstdlib>

namespace mendwright::store {

namespace {

constexpr const char* expected_forms = "expected sqlite:PATH or postgresql://USER@HOST[:PORT]/NAME";

StoreError bad_url(const std::string& field, std::string_view text, const std::string& why) {
    return store_error(ErrorKind::invalid_input, field,
                       why + " in \"" + std::string(text) + "\" (" + expected_forms + ")");
}

bool starts_with(std::string_view text, std::string_view prefix) { return text.substr(0, prefix.size()) == prefix; }

}  // namespace

std::string DatabaseUrl::display() const {
    if (dialect == Dialect::sqlite) return "sqlite:" + sqlite_path;
    return "postgresql://" + user + "@" + host + ":" + std::to_string(port) + "/" + database;
}

Outcome<DatabaseUrl> parse_database_url(std::string_view text, const std::string& field) {
    if (starts_with(text, "sqlite:")) {
        std::string path(text.substr(7));
        if (starts_with(path, "//")) path = path.substr(2);  // sqlite:///abs/path
        if (path.empty()) return bad_url(field, text, "the file path is missing");
        DatabaseUrl url;
        url.dialect = Dialect::sqlite;
        url.sqlite_path = path;
        return url;
    }
    if (starts_with(text, "postgresql://") || starts_with(text, "postgres://")) {
        const QUrl parsed(QString::fromUtf8(text.data(), qsizetype(text.size())), QUrl::StrictMode);
        if (!parsed.isValid()) return bad_url(field, text, "not a valid URL: " + parsed.errorString().toStdString());
        DatabaseUrl url;
        url.dialect = Dialect::postgresql;
        url.host = parsed.host().toStdString();
        url.user = parsed.userName().toStdString();
        url.password = parsed.password().toStdString();
        url.port = parsed.port(5432);
        QString name = parsed.path();
        if (name.startsWith('/')) name.remove(0, 1);
        url.database = name.toStdString();
        if (url.host.empty()) return bad_url(field, text, "the host is missing");
        if (url.user.empty()) return bad_url(field, text, "the user is missing");
        if (url.database.empty() || name.contains('/')) return bad_url(field, text, "expected one database name after the host");
        if (parsed.hasQuery() || parsed.hasFragment()) return bad_url(field, text, "options after '?' or '#' are not supported");
        if (url.port <= 0 || url.port > 65535) return bad_url(field, text, "the port is out of range");
        return url;
    }
    if (text.empty()) return store_error(ErrorKind::invalid_input, field, std::string(expected_forms) + ", got an empty value");
    return bad_url(field, text, "unknown kind of database");
}

std::string default_sqlite_path() {
    const QString base = QStandardPaths::writableLocation(QStandardPaths::GenericDataLocation);
    return (base + "/mendwright/jobs.sqlite").toStdString();
}

Outcome<DatabaseUrl> resolve_database_url(const std::optional<std::string>& given) {
    if (given) return parse_database_url(*given, "--db");
    if (const char* from_environment = std::getenv("MENDWRIGHT_DB"); from_environment && *from_environment)
        return parse_database_url(from_environment, "MENDWRIGHT_DB");
    DatabaseUrl url;
    url.dialect = Dialect::sqlite;
    url.sqlite_path = default_sqlite_path();
    url.create_folder = true;
    return url;
}

}  // namespace mendwright::store
