#include "planner/remedies/two_rcd_split.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <map>
#include <sstream>

namespace mendwright::remedies {

std::string circuit_area(const std::string& description) {
    static const std::vector<std::string> use_words = {
        "sockets", "socket", "socket-outlets", "lights", "lighting", "light", "ring", "radial", "circuit",
        "final", "power", "and", "&", "-", "/", "outlets", "plugs"};
    std::string lowered;
    for (char c : description) lowered += static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    std::istringstream words(lowered);
    std::string word;
    std::string area;
    while (words >> word) {
        while (!word.empty() && (word.back() == ',' || word.back() == '.')) word.pop_back();
        if (word.empty() || std::find(use_words.begin(), use_words.end(), word) != use_words.end()) continue;
        if (std::all_of(word.begin(), word.end(), [](char c) { return std::isdigit(static_cast<unsigned char>(c)); }))
            continue;
        area += (area.empty() ? "" : " ") + word;
    }
    return area;
}

namespace {

// A group of circuits that must go together, and optionally a partner group that must go to
// the other device (an area's lighting and its sockets).
struct Component {
    std::vector<std::size_t> first;
    std::vector<std::size_t> second;
    double leakage_first = 0.0;
    double leakage_second = 0.0;
};

struct Score {
    double worst_ma;
    double difference_ma;
    int count_difference;
    bool operator<(const Score& other) const {
        // Leakage compared to 1 µA so that rounding noise does not decide.
        if (std::abs(worst_ma - other.worst_ma) > 1e-3) return worst_ma < other.worst_ma;
        if (std::abs(difference_ma - other.difference_ma) > 1e-3) return difference_ma < other.difference_ma;
        return count_difference < other.count_difference;
    }
};

}  // namespace

TwoRcdSplit split_between_two_rcds(const std::vector<SplitCircuit>& circuits, double budget_ma) {
    // Lighting and sockets of each area form one component with two sides; other circuits are
    // components of one.
    std::map<std::string, Component> areas;
    std::vector<Component> components;
    for (std::size_t i = 0; i < circuits.size(); ++i) {
        const auto& c = circuits[i];
        if (c.use == model::CircuitUse::lighting) {
            areas[c.area].first.push_back(i);
            areas[c.area].leakage_first += c.leakage_ma;
        } else if (c.use == model::CircuitUse::sockets) {
            areas[c.area].second.push_back(i);
            areas[c.area].leakage_second += c.leakage_ma;
        } else {
            components.push_back({{i}, {}, c.leakage_ma, 0.0});
        }
    }
    for (auto& [area, component] : areas) components.push_back(component);
    // Largest first: the order of the greedy fallback, and a better first guess for the search.
    std::sort(components.begin(), components.end(), [](const Component& a, const Component& b) {
        return a.leakage_first + a.leakage_second > b.leakage_first + b.leakage_second;
    });

    const std::size_t k = components.size();
    std::vector<int> orientation(k, 0);
    auto evaluate = [&](const std::vector<int>& orient, double leak[2], int count[2]) {
        leak[0] = leak[1] = 0.0;
        count[0] = count[1] = 0;
        for (std::size_t j = 0; j < k; ++j) {
            const int a = orient[j];
            leak[a] += components[j].leakage_first;
            count[a] += static_cast<int>(components[j].first.size());
            leak[1 - a] += components[j].leakage_second;
            count[1 - a] += static_cast<int>(components[j].second.size());
        }
        return Score{std::max(leak[0], leak[1]), std::abs(leak[0] - leak[1]), std::abs(count[0] - count[1])};
    };

    TwoRcdSplit result;
    result.budget_ma = budget_ma;
    constexpr std::size_t exhaustive_limit = 12;  // 2^11 arrangements at most
    if (k <= exhaustive_limit) {
        std::vector<int> best = orientation;
        double leak[2];
        int count[2];
        Score best_score = evaluate(best, leak, count);
        // The first component's side is fixed: swapping both devices gives the same split.
        const std::size_t arrangements = k == 0 ? 1 : (std::size_t{1} << (k - 1));
        for (std::size_t mask = 1; mask < arrangements; ++mask) {
            for (std::size_t j = 1; j < k; ++j) orientation[j] = static_cast<int>((mask >> (j - 1)) & 1U);
            Score score = evaluate(orientation, leak, count);
            if (score < best_score) {
                best_score = score;
                best = orientation;
            }
        }
        orientation = best;
    } else {
        result.exhaustive = false;
        double leak[2] = {0.0, 0.0};
        int count[2] = {0, 0};
        for (std::size_t j = 0; j < k; ++j) {
            // Put the component's larger side on the lighter device.
            const bool first_larger = components[j].leakage_first >= components[j].leakage_second;
            const int lighter = (leak[0] < leak[1] || (leak[0] == leak[1] && count[0] <= count[1])) ? 0 : 1;
            orientation[j] = first_larger ? lighter : 1 - lighter;
            leak[orientation[j]] += components[j].leakage_first;
            leak[1 - orientation[j]] += components[j].leakage_second;
            count[orientation[j]] += static_cast<int>(components[j].first.size());
            count[1 - orientation[j]] += static_cast<int>(components[j].second.size());
        }
    }
    result.side.assign(circuits.size(), 0);
    for (std::size_t j = 0; j < k; ++j) {
        for (std::size_t i : components[j].first) result.side[i] = orientation[j];
        for (std::size_t i : components[j].second) result.side[i] = 1 - orientation[j];
    }
    for (std::size_t i = 0; i < circuits.size(); ++i) {
        result.leakage_ma[result.side[i]] += circuits[i].leakage_ma;
        result.circuits[result.side[i]] += 1;
    }
    result.within_budget = result.leakage_ma[0] <= budget_ma + 1e-9 && result.leakage_ma[1] <= budget_ma + 1e-9;
    return result;
}

}  // namespace mendwright::remedies
