// The store's tests run inside a QCoreApplication (Qt loads its SQL drivers as plugins), with
// the user's data and runtime folders pointed at a temporary folder, so that the default store
// of the machine is never touched.
#define CATCH_CONFIG_RUNNER
#include <QCoreApplication>
#include <QTemporaryDir>
#include <catch2/catch.hpp>
#include <cstdlib>

#include "tests/store/support/postgres_server.hpp"

int main(int argc, char** argv) {
    QTemporaryDir home;
    if (!home.isValid()) return 1;
    const QByteArray data = (home.path() + "/data").toUtf8();
    const QByteArray runtime = (home.path() + "/runtime").toUtf8();
    ::setenv("XDG_DATA_HOME", data.constData(), 1);
    ::setenv("XDG_RUNTIME_DIR", runtime.constData(), 1);
    ::unsetenv("MENDWRIGHT_DB");
    QDir().mkpath(QString::fromUtf8(runtime));
    QFile::setPermissions(QString::fromUtf8(runtime), QFileDevice::ReadOwner | QFileDevice::WriteOwner | QFileDevice::ExeOwner);
    QCoreApplication app(argc, argv);
    const int failed = Catch::Session().run(argc, argv);
    mendwright::store::testing::PostgresServer::stop_shared();
    return failed;
}
