#pragma once
// Shared by the calc error tests: a failed Result must name the expected field and say why.
#include <catch2/catch.hpp>

#include <string>

#include "planner/core/result.hpp"

#define CALC_REQUIRE_PROBLEM(result_expr, field_name, words)                   \
    do {                                                                      \
        const auto calc_result_ = (result_expr);                              \
        REQUIRE_FALSE(calc_result_.ok());                                     \
        CHECK(calc_result_.problem().field == (field_name));                  \
        CHECK_THAT(calc_result_.problem().message, Catch::Contains(words));   \
    } while (false)
