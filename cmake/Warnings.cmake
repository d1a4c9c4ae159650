# House warning and sanitizer flags, applied to every brume target through brume_flags.
add_library(brume_flags INTERFACE)
target_compile_options(brume_flags INTERFACE -Wall -Wextra -Wpedantic -Wshadow -Wconversion
                       -Wno-sign-conversion)
if(BRUME_WERROR)
  target_compile_options(brume_flags INTERFACE -Werror)
endif()
if(BRUME_SANITIZE)
  target_compile_options(brume_flags INTERFACE -fsanitize=address,undefined -fno-omit-frame-pointer
                         -fno-sanitize-recover=undefined)
  target_link_options(brume_flags INTERFACE -fsanitize=address,undefined)
endif()
target_include_directories(brume_flags INTERFACE ${PROJECT_SOURCE_DIR} ${PROJECT_BINARY_DIR}/generated)
