# Snapshots from 1, 2, 4 and 8 ranks are identical (issue "Runs that outgrow one core"): the same
# input run with `brume run` on each rank count, every dataset of every snapshot compared with the
# 1-rank run's, as raw float64 bits, with h5py (Debian python3-h5py, the reference reader).
#
# snapshot_identity.py WORK CONFIG RANKS... -- MPIEXEC... -- BRUME
import glob
import os
import shutil
import subprocess
import sys

import h5py
import numpy as np

work, config = sys.argv[1], sys.argv[2]
first = sys.argv.index("--")
second = sys.argv.index("--", first + 1)
rank_counts = [int(r) for r in sys.argv[3:first]]
mpiexec, brume = sys.argv[first + 1:second], sys.argv[second + 1]
shutil.rmtree(work, ignore_errors=True)
os.makedirs(work)

snapshots = {}
for ranks in rank_counts:
    out = os.path.join(work, f"ranks{ranks}")
    command = mpiexec + ["-n", str(ranks), "--oversubscribe", brume, "run", config, "--out", out,
                         "--set", "output.snapshot_interval=0.05 Myr", "-q"]
    done = subprocess.run(command, capture_output=True, text=True)
    if done.returncode != 0:
        sys.exit(f"{' '.join(command)}: exit {done.returncode}\n{done.stdout}{done.stderr}")
    snapshots[ranks] = sorted(glob.glob(os.path.join(out, "snapshot-*.h5")))

reference = snapshots[rank_counts[0]]
failures = []
for ranks in rank_counts[1:]:
    if len(snapshots[ranks]) != len(reference):
        failures.append(f"{ranks} ranks wrote {len(snapshots[ranks])} snapshots, 1 rank "
                        f"{len(reference)}")
        continue
    for a_name, b_name in zip(reference, snapshots[ranks]):
        a, b = h5py.File(a_name, "r"), h5py.File(b_name, "r")
        for key in ("time", "step"):
            if a.attrs[key] != b.attrs[key]:
                failures.append(f"{b_name}: {key} differs")
        for name in a["fields"]:
            x, y = a["fields"][name][...], b["fields"][name][...]
            if x.shape != y.shape or not np.array_equal(x.view(np.uint64), y.view(np.uint64)):
                failures.append(f"{b_name}: {name} differs in {np.count_nonzero(x != y)} values")
print(f"{len(reference)} snapshots on {rank_counts} ranks:",
      "identical" if not failures else "; ".join(failures))
sys.exit(1 if failures else 0)
