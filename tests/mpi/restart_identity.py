# Restart identity (issue "Runs that outgrow one core"): a run of 2N steps equals a run of N steps,
# a checkpoint, and N more steps after `brume run --restart`, bit for bit — also when the restart
# runs on another number of ranks. The snapshots are compared with h5py (Debian python3-h5py, the
# reference reader): every dataset under /fields, as raw float64 bits.
#
# restart_identity.py WORK CONFIG N RANKS_FULL RANKS_FIRST RANKS_RESTART MPIEXEC... -- BRUME
import glob
import os
import shutil
import subprocess
import sys

import h5py
import numpy as np

work, config, n = sys.argv[1], sys.argv[2], int(sys.argv[3])
ranks_full, ranks_first, ranks_restart = (int(r) for r in sys.argv[4:7])
split = sys.argv.index("--")
mpiexec, brume = sys.argv[7:split], sys.argv[split + 1]
shutil.rmtree(work, ignore_errors=True)
os.makedirs(work)


def brume_on(ranks, *arguments):
    command = mpiexec + ["-n", str(ranks), "--oversubscribe", brume, *arguments, "-q"]
    done = subprocess.run(command, capture_output=True, text=True)
    if done.returncode != 0:
        sys.exit(f"{' '.join(command)}: exit {done.returncode}\n{done.stdout}{done.stderr}")


def last_snapshot(folder):
    return sorted(glob.glob(os.path.join(folder, "snapshot-*.h5")))[-1]


full, split_run = os.path.join(work, "full"), os.path.join(work, "split")
brume_on(ranks_full, "run", config, "--out", full, "--set", f"clock.max_steps={2 * n}")
brume_on(ranks_first, "run", config, "--out", split_run, "--set", f"clock.max_steps={n}")
brume_on(ranks_restart, "run", "--restart", split_run, "--set", f"clock.max_steps={2 * n}")

a, b = h5py.File(last_snapshot(full), "r"), h5py.File(last_snapshot(split_run), "r")
failures = []
if a.attrs["step"] != 2 * n or b.attrs["step"] != 2 * n:
    failures.append(f"steps {a.attrs['step']} and {b.attrs['step']}, expected {2 * n}")
if a.attrs["time"] != b.attrs["time"]:
    failures.append(f"times differ: {a.attrs['time']!r} {b.attrs['time']!r}")
for name in a["fields"]:
    x, y = a["fields"][name][...], b["fields"][name][...]
    if x.shape != y.shape or not np.array_equal(x.view(np.uint64), y.view(np.uint64)):
        failures.append(f"{name}: {np.count_nonzero(x != y)} values differ")
print(f"{ranks_full} ranks for {2 * n} steps against {ranks_first} + {ranks_restart} ranks:",
      "identical" if not failures else "; ".join(failures))
sys.exit(1 if failures else 0)
