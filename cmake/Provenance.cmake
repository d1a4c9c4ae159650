# Build provenance compiled into the binary: version, commit, compiler, flags, library versions.
find_package(Git QUIET)
set(BRUME_GIT_COMMIT "unknown")
if(GIT_FOUND)
  execute_process(COMMAND ${GIT_EXECUTABLE} -C ${PROJECT_SOURCE_DIR} rev-parse --short=12 HEAD
                  OUTPUT_VARIABLE BRUME_GIT_COMMIT OUTPUT_STRIP_TRAILING_WHITESPACE
                  ERROR_QUIET RESULT_VARIABLE git_result)
  if(NOT git_result EQUAL 0 OR BRUME_GIT_COMMIT STREQUAL "")
    set(BRUME_GIT_COMMIT "unknown")
  endif()
endif()
string(TOUPPER "${CMAKE_BUILD_TYPE}" build_type_upper)
set(BRUME_CXX_FLAGS "${CMAKE_CXX_FLAGS} ${CMAKE_CXX_FLAGS_${build_type_upper}}")
string(STRIP "${BRUME_CXX_FLAGS}" BRUME_CXX_FLAGS)
if(BRUME_SANITIZE)
  string(APPEND BRUME_CXX_FLAGS " -fsanitize=address,undefined")
endif()
set(BRUME_HDF5_VERSION "${HDF5_VERSION}")
set(BRUME_MPI_VERSION "${MPI_CXX_VERSION}")
set(BRUME_FFTW_VERSION "${FFTW3_VERSION}")
set(BRUME_YAML_CPP_VERSION "${yaml-cpp_VERSION}")
set(BRUME_EIGEN_VERSION "${Eigen3_VERSION}")
configure_file(${PROJECT_SOURCE_DIR}/cmake/provenance.hpp.in
               ${PROJECT_BINARY_DIR}/generated/brume/provenance.hpp @ONLY)
