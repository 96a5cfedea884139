#pragma once
// The store's schema, as numbered migrations. A database records each migration it has had in
// `schema_version`; opening the store applies the missing ones in one transaction (after a
// backup copy of an older SQLite file) and refuses a database newer than this program.
// docs/store.md describes every table.

#include <optional>
#include <string>
#include <vector>

#include "app/store/connection.hpp"
#include "app/store/outcome.hpp"
#include "app/store/records.hpp"

namespace mendwright::store {

struct Migration {
    int version = 0;
    std::string description;
    // Statements shared by both databases; `{id}` is the auto-numbered key column and
    // `{bigint}` a 64-bit integer, the only two words that differ between them.
    std::vector<std::string> statements;
};

const std::vector<Migration>& migrations();
int latest_schema_version();

// The version of the schema in the database (0 when empty). A database with Mendwright's
// tables but no version table is not a job store.
Outcome<int> schema_version(Connection& connection);

struct MigrationReport {
    int from_version = 0;
    int to_version = 0;
    std::optional<std::string> backup_path;  // SQLite: the copy taken before upgrading
};

// Brings the schema to `target_version`. Older SQLite files are first copied beside
// themselves ("jobs.sqlite.before-schema-4.bak"); PostgreSQL upgrades are protected by the
// transaction alone (its DDL is transactional). Two processes opening the same new database
// at once are serialised: the second sees the first one's work and does nothing.
Outcome<MigrationReport> migrate(Connection& connection, int target_version, const Clock& clock);

}  // namespace mendwright::store
