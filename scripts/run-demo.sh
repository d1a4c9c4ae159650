#!/usr/bin/env bash
# Sets brume up (dependencies, configure, build) and runs the main job on every core of this machine:
# the demo box of problems/ (driven two-phase MHD turbulence), writing into a new run folder under
# runs/, draws its figures into the folder's figures/ and judges from its time series whether the
# box is statistically steady after its first 4 Myr.
#   scripts/run-demo.sh [extra brume run options, e.g. --set clock.stop_time=2Myr]
set -euo pipefail
here=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
config="$here/problems/demo.yaml"

bash "$here/scripts/build.sh" release brume
export OMPI_ALLOW_RUN_AS_ROOT=1 OMPI_ALLOW_RUN_AS_ROOT_CONFIRM=1
export OMPI_MCA_pml=ob1 OMPI_MCA_btl=self,vader
ranks=$(nproc 2>/dev/null || echo 1)
out="$here/runs/demo-$(date +%Y%m%d-%H%M%S)"
echo "brume: running $config on $ranks cores into $out"
mpiexec -n "$ranks" "$here/build/release/bin/brume" run "$config" --out "$out" "$@"
"$here/build/release/bin/brume" plot "$out"
"$here/build/release/bin/brume" steadiness "$out" --since 4Myr || echo "brume: steadiness not judged (see the message above)"
echo "brume: outputs are in $out, figures in $out/figures"
