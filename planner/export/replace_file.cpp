#include "planner/export/replace_file.hpp"

#include <atomic>
#include <system_error>
#include <unistd.h>

namespace mendwright::spreadsheet {

namespace fs = std::filesystem;

Result<fs::path> replace_file(const fs::path& target,
                              const std::function<std::optional<Problem>(const fs::path&)>& write) {
    const std::string field = target.string();
    if (target.empty() || !target.has_filename()) return problem(field, "expected a file name to write, got none");
    const fs::path folder = target.parent_path().empty() ? fs::path(".") : target.parent_path();
    std::error_code error;
    if (!fs::is_directory(folder, error)) {
        return problem(field, "cannot be written: the folder " + folder.string() + " does not exist");
    }
    if (fs::is_directory(target, error)) return problem(field, "cannot be written: it is a folder, expected a file name");

    // Hidden, in the same folder (same file system, so the rename is atomic), unique per call.
    static std::atomic<unsigned> counter{0};
    const fs::path temporary = folder / ("." + target.filename().string() + ".part-" + std::to_string(::getpid()) +
                                         "-" + std::to_string(counter++));
    auto discard = [&] {
        std::error_code ignored;
        fs::remove(temporary, ignored);
    };
    if (auto failed = write(temporary)) {
        discard();
        return problem(field, "cannot be written: " + failed->to_string());
    }
    fs::rename(temporary, target, error);
    if (error) {
        discard();
        return problem(field, "cannot be written: " + error.message());
    }
    return target;
}

}  // namespace mendwright::spreadsheet
