# Compiler settings every Mendwright target links: warnings on, optionally as errors, and the
# sanitizer build. Third-party code (Catch2, nlohmann-json) is not affected.
add_library(mendwright_build_flags INTERFACE)
target_compile_options(mendwright_build_flags INTERFACE -Wall -Wextra -Wpedantic)
if(MENDWRIGHT_WERROR)
  target_compile_options(mendwright_build_flags INTERFACE -Werror)
endif()
if(MENDWRIGHT_SANITIZE)
  target_compile_options(mendwright_build_flags INTERFACE -fsanitize=address,undefined -fno-omit-frame-pointer -fno-sanitize-recover=undefined)
  target_link_options(mendwright_build_flags INTERFACE -fsanitize=address,undefined)
endif()
