#include "test_workspace.hpp"

#include <QFile>
#include <filesystem>
#include <fstream>
#include <sstream>

#include "app/store/records.hpp"

namespace mendwright::desktop::test {

TestWorkspace::TestWorkspace(const std::string& demo_folder, const std::string& quote_path) {
    const std::filesystem::path base = folder.path().toStdString();
    std::filesystem::create_directories(base / "pricebook");
    for (const char* name : {"items.csv", "settings.json"})
        std::filesystem::copy_file(std::filesystem::path(MENDWRIGHT_SOURCE_DIR) / "pricebook-demo" / name,
                                   base / "pricebook" / name);
    DesktopOptions options;
    options.database_url = "sqlite:" + (base / "jobs.sqlite").string();
    options.price_book_folder = (base / "pricebook").string();
    options.profile_file = "";  // the shipped profile, whatever the user's settings say
    options.demo_folder = demo_folder.empty() ? std::string(MENDWRIGHT_TEST_SURVEYS) : demo_folder;
    options.clock = store::fixed_clock(fixed_today);
    options.quote_path = quote_path;
    workspace = Workspace::open(options, error);
    if (workspace) Workspace::install(workspace.get());
}

TestWorkspace::~TestWorkspace() {
    Workspace::install(nullptr);
}

std::string TestWorkspace::path(const std::string& name) const { return (folder.path() + "/").toStdString() + name; }

std::string TestWorkspace::survey_text(const std::string& name) {
    std::ifstream stream(std::string(MENDWRIGHT_TEST_SURVEYS) + "/" + name, std::ios::binary);
    std::ostringstream text;
    text << stream.rdbuf();
    return text.str();
}

}  // namespace mendwright::desktop::test
