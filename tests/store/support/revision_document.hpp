#pragma once
// The documents the crash and two-process tests save: revision n carries a payload made from n
// and a checksum of it (FNV-1a, 64 bit), so a torn or mixed-up revision is recognisable.

#include <cstdint>
#include <optional>
#include <string>

namespace mendwright::store::testing {

// FNV-1a, 64-bit (Fowler, Noll, Vo; offset basis 14695981039346656037, prime 1099511628211).
inline std::uint64_t fnv1a(const std::string& text) {
    std::uint64_t hash = 14695981039346656037ull;
    for (unsigned char c : text) {
        hash ^= c;
        hash *= 1099511628211ull;
    }
    return hash;
}

// A payload of some tens of kilobytes, different for every n: several database pages per save.
inline std::string payload_for(int n) {
    std::string payload;
    const std::size_t size = 20000 + std::size_t(n % 7) * 5000;
    payload.reserve(size);
    std::uint64_t state = 0x9e3779b97f4a7c15ull * std::uint64_t(n + 1);
    while (payload.size() < size) {
        state ^= state << 13;
        state ^= state >> 7;
        state ^= state << 17;
        payload.push_back(char('a' + state % 26));
    }
    return payload;
}

inline std::string revision_document(int n) {
    const std::string payload = payload_for(n);
    return "{\"n\": " + std::to_string(n) + ", \"check\": \"" + std::to_string(fnv1a(payload)) + "\", \"payload\": \"" +
           payload + "\"}";
}

// The n the document claims, if the document is exactly what revision_document(n) writes.
inline std::optional<int> verified_revision(const std::string& document) {
    const std::string head = "{\"n\": ";
    if (document.compare(0, head.size(), head) != 0) return std::nullopt;
    const int n = std::atoi(document.c_str() + head.size());
    if (document != revision_document(n)) return std::nullopt;
    return n;
}

}  // namespace mendwright::store::testing
