# Every external library brume links, all from Debian packages (see scripts/install-deps.sh).
set(MPI_CXX_SKIP_MPICXX ON)
find_package(MPI 3.1 REQUIRED COMPONENTS C CXX)

set(HDF5_PREFER_PARALLEL TRUE)
find_package(HDF5 1.10 REQUIRED COMPONENTS C)
if(NOT HDF5_IS_PARALLEL)
  message(FATAL_ERROR "brume needs the parallel (MPI) build of HDF5: install libhdf5-openmpi-dev")
endif()
add_library(brume_hdf5 INTERFACE)
target_link_libraries(brume_hdf5 INTERFACE hdf5::hdf5 MPI::MPI_C)

find_package(Eigen3 3.4 REQUIRED NO_MODULE)
find_package(yaml-cpp 0.7 REQUIRED)

find_package(PkgConfig REQUIRED)
pkg_check_modules(FFTW3 REQUIRED IMPORTED_TARGET fftw3)
find_library(FFTW3_MPI_LIBRARY NAMES fftw3_mpi REQUIRED)
find_path(FFTW3_MPI_INCLUDE_DIR NAMES fftw3-mpi.h REQUIRED)
add_library(brume_fftw INTERFACE)
target_link_libraries(brume_fftw INTERFACE ${FFTW3_MPI_LIBRARY} PkgConfig::FFTW3 MPI::MPI_C)
target_include_directories(brume_fftw INTERFACE ${FFTW3_MPI_INCLUDE_DIR})

if(BRUME_BUILD_TESTS)
  find_package(GTest REQUIRED)
  find_package(benchmark REQUIRED)
  set(Python3_EXECUTABLE /usr/bin/python3 CACHE FILEPATH "Debian's Python, which sees numpy, scipy and h5py")
  find_package(Python3 REQUIRED COMPONENTS Interpreter)
endif()
