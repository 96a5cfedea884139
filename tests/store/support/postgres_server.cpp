#include "tests/store/support/postgres_server.hpp"

#include <QDir>
#include <QFile>
#include <QProcess>
#include <QSqlDatabase>
#include <QSqlError>
#include <QSqlQuery>
#include <arpa/inet.h>
#include <netinet/in.h>
#include <sys/socket.h>
#include <unistd.h>

#include <cstdlib>

namespace mendwright::store::testing {

namespace {

std::unique_ptr<PostgresServer>& shared_slot() {
    static std::unique_ptr<PostgresServer> server;
    return server;
}

// A port nobody listens on now: bind port 0 on loopback and ask which one was given.
int free_loopback_port() {
    const int fd = ::socket(AF_INET, SOCK_STREAM, 0);
    if (fd < 0) return 0;
    sockaddr_in address{};
    address.sin_family = AF_INET;
    address.sin_addr.s_addr = htonl(INADDR_LOOPBACK);
    address.sin_port = 0;
    int port = 0;
    if (::bind(fd, reinterpret_cast<sockaddr*>(&address), sizeof address) == 0) {
        socklen_t length = sizeof address;
        if (::getsockname(fd, reinterpret_cast<sockaddr*>(&address), &length) == 0) port = ntohs(address.sin_port);
    }
    ::close(fd);
    return port;
}

}  // namespace

PostgresServer& PostgresServer::shared() {
    auto& slot = shared_slot();
    if (!slot) slot.reset(new PostgresServer());
    return *slot;
}

void PostgresServer::stop_shared() { shared_slot().reset(); }

bool PostgresServer::run(const std::string& program, const std::vector<std::string>& arguments, bool as_server_user) {
    QProcess process;
    QStringList args;
    QString executable = QString::fromStdString(bin_ + "/" + program);
    if (as_server_user && as_root_) {
        args << "-u" << "postgres" << "--" << executable;
        executable = QStringLiteral("/usr/sbin/runuser");
    }
    for (const auto& argument : arguments) args << QString::fromStdString(argument);
    process.setProcessChannelMode(QProcess::MergedChannels);
    process.start(executable, args);
    if (!process.waitForFinished(60000) || process.exitStatus() != QProcess::NormalExit || process.exitCode() != 0) {
        problem_ = program + " failed: " + process.readAll().toStdString() + process.errorString().toStdString();
        return false;
    }
    return true;
}

PostgresServer::PostgresServer() {
    const char* override_bin = std::getenv("MENDWRIGHT_PG_BIN");
    bin_ = override_bin && *override_bin ? override_bin : "/usr/lib/postgresql/15/bin";
    if (!QFile::exists(QString::fromStdString(bin_ + "/initdb"))) {
        problem_ = "no PostgreSQL server binaries in " + bin_ +
                   " (scripts/bootstrap installs the postgresql package; MENDWRIGHT_PG_BIN names another folder)";
        return;
    }
    if (!folder_.isValid()) {
        problem_ = "cannot make a temporary folder for the server";
        return;
    }
    as_root_ = ::geteuid() == 0;
    const std::string root = folder_.path().toStdString();
    const std::string data = root + "/data";
    const std::string sockets = root + "/sock";
    if (!QDir().mkpath(QString::fromStdString(sockets))) {
        problem_ = "cannot make " + sockets;
        return;
    }
    if (as_root_) {
        QProcess chown;
        chown.start(QStringLiteral("/bin/chown"), {"-R", "postgres:postgres", folder_.path()});
        if (!chown.waitForFinished(10000) || chown.exitCode() != 0) {
            problem_ = "cannot give " + root + " to the postgres user";
            return;
        }
    }
    if (!run("initdb", {"-D", data, "-U", "mw", "--auth=trust", "-E", "UTF8", "--no-locale", "--no-sync"}, true)) return;
    port_ = free_loopback_port();
    if (port_ == 0) {
        problem_ = "no free port on loopback";
        return;
    }
    const std::string options = "-c listen_addresses=127.0.0.1 -p " + std::to_string(port_) + " -k " + sockets +
                                " -c fsync=off";
    if (!run("pg_ctl", {"-D", data, "-l", root + "/log", "-w", "-t", "60", "-o", options, "start"}, true)) return;
    started_ = true;
}

PostgresServer::~PostgresServer() {
    if (started_) run("pg_ctl", {"-D", folder_.path().toStdString() + "/data", "-m", "fast", "-w", "stop"}, true);
}

DatabaseUrl PostgresServer::create_database() {
    DatabaseUrl url;
    url.dialect = Dialect::postgresql;
    url.host = "127.0.0.1";
    url.port = port_;
    url.user = "mw";
    if (!started_) return url;
    const std::string name = "store_test_" + std::to_string(++databases_);
    {
        QSqlDatabase admin = QSqlDatabase::addDatabase(QStringLiteral("QPSQL"), QStringLiteral("test-admin"));
        admin.setHostName(QStringLiteral("127.0.0.1"));
        admin.setPort(port_);
        admin.setUserName(QStringLiteral("mw"));
        admin.setDatabaseName(QStringLiteral("postgres"));
        if (!admin.open()) {
            problem_ = "cannot connect to the test server: " + admin.lastError().text().toStdString();
        } else {
            QSqlQuery query(admin);
            // The name is made here from a counter, never from outside input.
            if (!query.exec(QString::fromStdString("CREATE DATABASE " + name)))
                problem_ = "cannot create a database: " + query.lastError().text().toStdString();
        }
        admin.close();
    }
    QSqlDatabase::removeDatabase(QStringLiteral("test-admin"));
    url.database = name;
    return url;
}

}  // namespace mendwright::store::testing
