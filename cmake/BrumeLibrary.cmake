# brume_add_library(NAME DEPENDS ...): a static library of the .cpp files directly in the calling
# folder (not its subfolders: a subfolder that holds code is its own library with its own
# CMakeLists.txt). Sources are globbed (CONFIGURE_DEPENDS) so that adding a file needs no CMake edit.
function(brume_add_library name)
  cmake_parse_arguments(arg "" "" "DEPENDS" ${ARGN})
  file(GLOB sources CONFIGURE_DEPENDS ${CMAKE_CURRENT_SOURCE_DIR}/*.cpp)
  if(sources)
    add_library(${name} STATIC ${sources})
    target_link_libraries(${name} PUBLIC brume_flags ${arg_DEPENDS})
  else()
    add_library(${name} INTERFACE)
    target_link_libraries(${name} INTERFACE brume_flags ${arg_DEPENDS})
  endif()
endfunction()
