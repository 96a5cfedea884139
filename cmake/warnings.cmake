# Compiler settings every Mendwright target links: warnings on, optionally as errors, and the
# sanitizer build. Third-party code (Catch2, nlohmann-json) is not affected.
add_library(mendwright_build_flags INTERFACE)
target_compile_options(mendwright_build_flags INTERFACE -Wall -Wextra -Wpedantic)
# GCC 12 reports -Wrestrict inside libstdc++'s std::string when optimising (GCC bug 105329, a
# known false positive on correct code); it is switched off for GCC 12 only.
if(CMAKE_CXX_COMPILER_ID STREQUAL "GNU" AND CMAKE_CXX_COMPILER_VERSION VERSION_GREATER_EQUAL 12 AND CMAKE_CXX_COMPILER_VERSION VERSION_LESS 13)
  target_compile_options(mendwright_build_flags INTERFACE -Wno-restrict)
endif()
if(MENDWRIGHT_WERROR)
  target_compile_options(mendwright_build_flags INTERFACE -Werror)
endif()
if(MENDWRIGHT_SANITIZE)
  target_compile_options(mendwright_build_flags INTERFACE -fsanitize=address,undefined -fno-omit-frame-pointer -fno-sanitize-recover=undefined)
  target_link_options(mendwright_build_flags INTERFACE -fsanitize=address,undefined)
endif()
