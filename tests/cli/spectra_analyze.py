"""The spectra end to end: `brume run` makes a small magnetized snapshot (the given input, few
steps), `brume analyze` measures it on one rank and on two (mpiexec), and each result is compared
with an independent numpy computation from the snapshot's datasets read with h5py
(tests/physics/spectra_reference.py: numpy.fft.fftn on the full grid, np.bincount over shells),
to 1e-10 relative to each array's largest value.

Usage: spectra_analyze.py BRUME INPUT_YAML FOLDER MPIEXEC
"""
import os
import re
import subprocess
import sys

import h5py

sys.path.insert(0, os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "physics"))
import spectra_reference  # noqa: E402


def run(command, env):
    done = subprocess.run(command, capture_output=True, text=True, env=env)
    if done.returncode != 0:
        print(" ".join(command), "exited", done.returncode)
        print(done.stdout, done.stderr)
        sys.exit(1)


def main():
    brume, config, folder, mpiexec = sys.argv[1:5]
    env = dict(os.environ, OMPI_ALLOW_RUN_AS_ROOT="1", OMPI_ALLOW_RUN_AS_ROOT_CONFIRM="1",
               OMPI_MCA_pml="ob1", OMPI_MCA_btl="self,vader")
    run_folder = os.path.join(folder, "run")
    run([brume, "run", config, "--out", run_folder, "--set", "clock.max_steps=4"], env)
    snapshots = sorted(p for p in os.listdir(run_folder) if re.match(r"snapshot-\d+\.h5$", p))
    snapshot = os.path.join(run_folder, snapshots[-1])
    one = os.path.join(folder, "one.h5")
    two = os.path.join(folder, "two.h5")
    run([brume, "analyze", snapshot, "--out", one], env)
    run([mpiexec, "-n", "2", "--oversubscribe", brume, "analyze", snapshot, "--out", two], env)
    fields = spectra_reference.fields_from_snapshot(snapshot)
    if not fields[4]:
        print("the snapshot has no magnetic field: pick a magnetized input")
        sys.exit(1)
    passed = True
    for ranks, path in ((1, one), (2, two)):
        print(f"brume analyze on {ranks} rank(s) against numpy:")
        with h5py.File(path, "r") as f:
            passed &= spectra_reference.check(*fields, f["spectra"])
    print("all within tolerance" if passed else "FAILED")
    sys.exit(0 if passed else 1)


if __name__ == "__main__":
    main()
