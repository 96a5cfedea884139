#include "app/cli/text_file.hpp"

#include <cerrno>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <iterator>

namespace mendwright::cli {

std::optional<std::string> read_text_file(const std::string& path, std::ostream& err, std::string_view who) {
    auto refuse = [&](const std::string& reason) -> std::optional<std::string> {
        err << who << ": " << path << ": cannot read: " << reason << "\n";
        return std::nullopt;
    };
    std::error_code code;
    if (std::filesystem::is_directory(path, code)) return refuse("is a directory");
    std::ifstream stream(path, std::ios::binary);
    if (!stream) return refuse(std::strerror(errno));
    std::string text;
    const auto size = std::filesystem::is_regular_file(path, code) ? std::filesystem::file_size(path, code) : 0;
    if (!code && size > 0) {
        text.resize(static_cast<std::size_t>(size));
        stream.read(text.data(), static_cast<std::streamsize>(size));
        text.resize(static_cast<std::size_t>(stream.gcount()));  // the file may have shrunk meanwhile
        if (stream.eof() && !stream.bad()) return text;           // it did: what was read is all there is
    }
    // Anything left (a file that grew, a pipe, a size the system does not report) is read to its end.
    stream.clear(stream.rdstate() & ~std::ios::failbit);
    text.append(std::istreambuf_iterator<char>(stream), std::istreambuf_iterator<char>());
    if (stream.bad()) return refuse(std::strerror(errno));
    return text;
}

}  // namespace mendwright::cli
