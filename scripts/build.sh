#!/usr/bin/env bash
# Sets brume up from nothing: installs the Debian packages it needs, configures and builds.
#   scripts/build.sh [PRESET [TARGET...]]   PRESET: release (default), debug, asan, ci (see
#                                           CMakePresets.json); TARGETs: all when none given
# The binary ends up in build/PRESET/bin/brume.
set -euo pipefail
here=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
preset=${1:-release}
shift || true
targets=()
for target in "$@"; do targets+=(--target "$target"); done

bash "$here/scripts/install-deps.sh"
cd "$here"
cmake --preset "$preset" >/dev/null
jobs=$(nproc 2>/dev/null || echo 2)
echo "brume: building the '$preset' preset with $jobs jobs (build/$preset)"
cmake --build --preset "$preset" -j "$jobs" "${targets[@]}"
