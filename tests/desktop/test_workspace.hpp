#pragma once
// A workspace for the desktop tests: a fresh SQLite store in a temporary folder, a copy of the
// demo price book, the invented test surveys (tests/desktop/data) seeded into it, and a fixed
// "today" (2026-12-02) so that due dates and overdue items do not move with the calendar.

#include <QTemporaryDir>
#include <memory>
#include <string>

#include "app/desktop/workspace.hpp"

namespace mendwright::desktop::test {

inline constexpr Date fixed_today{2026, 12, 2};

struct TestWorkspace {
    QTemporaryDir folder;
    std::unique_ptr<Workspace> workspace;
    std::string error;

    // Seeds the surveys of `demo_folder` (the test surveys when empty); quotes go to
    // `quote_path` without a dialog when it is given.
    explicit TestWorkspace(const std::string& demo_folder = {}, const std::string& quote_path = {});
    ~TestWorkspace();

    [[nodiscard]] std::string path(const std::string& name) const;
    // The text of a test survey (tests/desktop/data/<name>).
    static std::string survey_text(const std::string& name);
};

}  // namespace mendwright::desktop::test
