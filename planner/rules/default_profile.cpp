#include <cstdlib>

#include "planner/rules/default_profile_json.hpp"  // generated at build time, see planner/CMakeLists.txt
#include "planner/rules/profile.hpp"

namespace mendwright::rules {

std::string_view default_rules_profile_json() { return generated::default_profile_json; }

const RulesProfile& default_rules_profile() {
    static const RulesProfile profile = [] {
        auto parsed = parse_rules_profile(default_rules_profile_json());
        // The shipped profile is checked by the tests (tests/planner/rules/profile_tests.cpp);
        // failing here means the build embedded a broken file, which no caller can recover from.
        if (!parsed) std::abort();
        return std::move(parsed).value();
    }();
    return profile;
}

}  // namespace mendwright::rules
