#!/usr/bin/env bash
# Sets brume up (dependencies, configure, build with warnings as errors) and runs the whole default
# test suite under CTest: unit, regression and MPI tests; tests labelled `slow` are left out.
#   scripts/run-tests.sh [PRESET]     PRESET: ci (default), release, debug, asan
set -euo pipefail
here=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
preset=${1:-ci}

bash "$here/scripts/build.sh" "$preset"
# Open MPI refuses to run as root without these; they are harmless otherwise.
export OMPI_ALLOW_RUN_AS_ROOT=1 OMPI_ALLOW_RUN_AS_ROOT_CONFIRM=1
export OMPI_MCA_pml=ob1 OMPI_MCA_btl=self,vader OMPI_MCA_rmaps_base_oversubscribe=1
cd "$here"
jobs=$(nproc 2>/dev/null || echo 2)
ctest --preset "$preset" -j "$jobs"
