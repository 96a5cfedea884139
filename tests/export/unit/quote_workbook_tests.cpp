// The workbook writer: where figures go, and that a target that cannot be written is an
// error that leaves no file (no half-written quote, no temporary file) behind.
#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <fcntl.h>
#include <sys/resource.h>
#include <unistd.h>

#include "planner/export/quote_workbook.hpp"
#include "planner/export/xlsx_sheet.hpp"
#include "tests/export/tools/sample_quote.hpp"

namespace fs = std::filesystem;
using namespace mendwright;

namespace {

struct TemporaryFolder {
    fs::path path;
    TemporaryFolder() {
        path = fs::temp_directory_path() / ("mendwright-export-" + std::to_string(::getpid()) + "-" +
                                            std::to_string(reinterpret_cast<std::uintptr_t>(this)));
        fs::create_directories(path);
    }
    ~TemporaryFolder() {
        std::error_code ignored;
        fs::remove_all(path, ignored);
    }
    [[nodiscard]] std::size_t entries() const {
        return static_cast<std::size_t>(std::distance(fs::directory_iterator(path), fs::directory_iterator()));
    }
};

pricing::Quote demo_quote() {
    auto quote = test::sample_quote(std::string(MENDWRIGHT_SOURCE_DIR) + "/pricebook-demo", 0);
    REQUIRE(quote.ok());
    return std::move(quote).value();
}

}  // namespace

TEST_CASE("export: a workbook is written under its name and nothing else is left", "[export]") {
    TemporaryFolder folder;
    const auto written = spreadsheet::write_quote_workbook(demo_quote(), folder.path / "quote.xlsx");
    REQUIRE(written.ok());
    CHECK(fs::file_size(folder.path / "quote.xlsx") > 1000);
    CHECK(folder.entries() == 1);
    // An xlsx file is a zip archive: "PK" at the start (ECMA-376 Part 2, Open Packaging Conventions).
    std::ifstream in(folder.path / "quote.xlsx", std::ios::binary);
    char magic[2] = {};
    in.read(magic, 2);
    CHECK(std::string(magic, 2) == "PK");
}

TEST_CASE("export: the figures written are the pricing module's own", "[export]") {
    TemporaryFolder folder;
    const pricing::Quote quote = demo_quote();
    const auto written = spreadsheet::write_quote_workbook(quote, folder.path / "quote.xlsx", spreadsheet::FigureList::kept);
    REQUIRE(written.ok());
    auto find = [&](const std::string& name) -> const spreadsheet::WrittenFigure& {
        for (const auto& f : written->figures) {
            if (f.name == name) return f;
        }
        FAIL("no figure " << name);
        return written->figures.front();
    };
    CHECK(find("total").pence == quote.totals.total_pence);
    CHECK(find("total").sheet == "Quote");
    CHECK(find("vat").pence == quote.totals.vat_pence);
    CHECK(find("group[0].total").pence == quote.totals.group_pence[0]);
    CHECK(find("extras.total").pence == quote.totals.extras_pence);
    CHECK(find("plans.chosen.total").pence == quote.totals.total_pence);
}

TEST_CASE("export: without a figure list the workbook is the same and no list is kept", "[export]") {
    TemporaryFolder folder;
    const pricing::Quote quote = demo_quote();
    const auto listed = spreadsheet::write_quote_workbook(quote, folder.path / "listed.xlsx", spreadsheet::FigureList::kept);
    const auto plain = spreadsheet::write_quote_workbook(quote, folder.path / "plain.xlsx");
    REQUIRE(listed.ok());
    REQUIRE(plain.ok());
    CHECK_FALSE(listed->figures.empty());
    CHECK(plain->figures.empty());
    CHECK(fs::file_size(folder.path / "listed.xlsx") == fs::file_size(folder.path / "plain.xlsx"));
}

TEST_CASE("export: a target in a missing folder is an error and leaves no file", "[export]") {
    TemporaryFolder folder;
    const fs::path target = folder.path / "no-such-folder" / "quote.xlsx";
    const auto written = spreadsheet::write_quote_workbook(demo_quote(), target);
    REQUIRE_FALSE(written.ok());
    CHECK(written.problem().field == target.string());
    CHECK_THAT(written.problem().message, Catch::Contains("does not exist"));
    CHECK(folder.entries() == 0);
}

TEST_CASE("export: a target that is a folder is an error and leaves no file", "[export]") {
    TemporaryFolder folder;
    fs::create_directory(folder.path / "quote.xlsx");
    const auto written = spreadsheet::write_quote_workbook(demo_quote(), folder.path / "quote.xlsx");
    REQUIRE_FALSE(written.ok());
    CHECK_THAT(written.problem().message, Catch::Contains("it is a folder"));
    CHECK(folder.entries() == 1);
    CHECK(fs::is_empty(folder.path / "quote.xlsx"));
}

TEST_CASE("export: a failed write keeps the earlier file whole and removes the temporary one", "[export]") {
    TemporaryFolder folder;
    const fs::path target = folder.path / "quote.xlsx";
    { std::ofstream(target) << "earlier quote"; }
    // A cell text longer than a spreadsheet allows (32,767 characters) makes the write fail
    // part-way, after the temporary file was begun.
    pricing::Quote quote = demo_quote();
    quote.client_name = std::string(40'000, 'x');
    const auto written = spreadsheet::write_quote_workbook(quote, target);
    REQUIRE_FALSE(written.ok());
    CHECK_THAT(written.problem().message, Catch::Contains("cannot be written"));
    CHECK(folder.entries() == 1);
    std::ifstream in(target);
    std::string text;
    std::getline(in, text);
    CHECK(text == "earlier quote");
}

TEST_CASE("export: a sheet whose temporary file cannot be made is an error, not a crash, and leaves no file",
          "[export]") {
    TemporaryFolder folder;
    const pricing::Quote quote = demo_quote();
    // Every file descriptor below the lowest free one is in use, so a limit at that number makes
    // the next open fail (EMFILE, getrlimit(2)): the first sheet's temporary file cannot be made.
    const int lowest_free = ::open("/dev/null", O_RDONLY);
    REQUIRE(lowest_free >= 0);
    ::close(lowest_free);
    rlimit saved{};
    REQUIRE(::getrlimit(RLIMIT_NOFILE, &saved) == 0);
    rlimit tight = saved;
    tight.rlim_cur = static_cast<rlim_t>(lowest_free);
    REQUIRE(::setrlimit(RLIMIT_NOFILE, &tight) == 0);
    const auto written = spreadsheet::write_quote_workbook(quote, folder.path / "quote.xlsx");
    REQUIRE(::setrlimit(RLIMIT_NOFILE, &saved) == 0);
    REQUIRE_FALSE(written.ok());
    CHECK_THAT(written.problem().message, Catch::Contains("temporary file could not be made"));
    CHECK_THAT(written.problem().message, Catch::Contains("\"Quote\""));
    CHECK(folder.entries() == 0);
}

TEST_CASE("export: a merged note longer than a cell holds is an error, not an empty cell", "[export]") {
    TemporaryFolder folder;
    pricing::Quote quote = demo_quote();
    // 32,767 characters is a cell's limit (libxlsxwriter's LXW_STR_MAX); the notes are merged rows.
    quote.exclusions.push_back(std::string(32'768, 'x'));
    const auto written = spreadsheet::write_quote_workbook(quote, folder.path / "quote.xlsx");
    REQUIRE_FALSE(written.ok());
    CHECK_THAT(written.problem().message, Catch::Contains("cannot be written"));
    CHECK(folder.entries() == 0);
    // Exactly at the limit, counted in characters (here two bytes each), it is written.
    quote.exclusions.back() = std::string();
    for (int i = 0; i < 32'767; ++i) quote.exclusions.back() += "\u00e9";
    CHECK(spreadsheet::write_quote_workbook(quote, folder.path / "quote.xlsx").ok());
}

TEST_CASE("export: cell names and page-header text", "[export]") {
    CHECK(spreadsheet::cell_name(0, 0) == "A1");
    CHECK(spreadsheet::cell_name(41, 8) == "I42");
    CHECK(spreadsheet::cell_name(0, 26) == "AA1");
    CHECK(spreadsheet::cell_name(9, 2, true) == "$C$10");
    CHECK(spreadsheet::header_text("Smith & Sons") == "Smith && Sons");  // '&' starts a code in headers
}
