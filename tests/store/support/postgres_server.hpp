#pragma once
// A throw-away PostgreSQL server for the tests: initdb in a temporary folder, started on
// loopback on a free port, stopped (pg_ctl stop -m fast) when the object goes away. As root
// the server runs as the "postgres" user (initdb refuses root; docs: TOOLCHAIN.md pitfall 11).
// One server per test process, shared by its test cases; each case makes its own database.

#include <QTemporaryDir>
#include <memory>
#include <string>

#include "app/store/database_url.hpp"

namespace mendwright::store::testing {

class PostgresServer {
public:
    // The process's server, started on first use. `problem()` is non-empty if it failed.
    static PostgresServer& shared();
    // Stops the shared server if it was started (called at the end of main).
    static void stop_shared();

    ~PostgresServer();
    PostgresServer(const PostgresServer&) = delete;
    PostgresServer& operator=(const PostgresServer&) = delete;

    [[nodiscard]] const std::string& problem() const { return problem_; }
    [[nodiscard]] int port() const { return port_; }

    // Creates a new empty database and returns its URL (empty URL database on failure: see problem()).
    DatabaseUrl create_database();

private:
    PostgresServer();
    bool run(const std::string& program, const std::vector<std::string>& arguments, bool as_server_user);

    QTemporaryDir folder_;
    std::string bin_;
    std::string problem_;
    int port_ = 0;
    int databases_ = 0;
    bool started_ = false;
    bool as_root_ = false;
};

}  // namespace mendwright::store::testing
