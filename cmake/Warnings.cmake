# House warning and sanitizer flags, applied to every brume target through brume_flags.
add_library(brume_flags INTERFACE)
target_compile_options(brume_flags INTERFACE -Wall -Wextra -Wpedantic -Wshadow -Wconversion
                       -Wno-sign-conversion)
# Results must not depend on how a loop is split into vector body and scalar remainder (that is, on
# the block size, and so on the number of MPI ranks): no contraction of a*b+c into fused
# multiply-adds, whose rounding differs from the separate operations.
target_compile_options(brume_flags INTERFACE -ffp-contract=off)
if(BRUME_WERROR)
  target_compile_options(brume_flags INTERFACE -Werror)
endif()
if(BRUME_SANITIZE)
  target_compile_options(brume_flags INTERFACE -fsanitize=address,undefined -fno-omit-frame-pointer
                         -fno-sanitize-recover=undefined)
  target_link_options(brume_flags INTERFACE -fsanitize=address,undefined)
endif()
target_include_directories(brume_flags INTERFACE ${PROJECT_SOURCE_DIR} ${PROJECT_BINARY_DIR}/generated)

# g++ 12 reports -Wmaybe-uninitialized and -Warray-bounds inside its own AVX-512 intrinsics when
# Eigen's vectorized kernels are inlined (false positives of the compiler, not of brume); targets
# that use Eigen's dense solvers turn those two warnings off.
function(brume_allow_eigen_intrinsics target)
  target_compile_options(${target} PRIVATE -Wno-maybe-uninitialized -Wno-array-bounds)
endfunction()
