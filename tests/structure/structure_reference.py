"""End-to-end check of the structure functions (docs/structure-functions.md).

Makes a small snapshot with `brume run`, measures it with `brume analyze` on 1 and on 2 ranks,
and compares the group /structure_functions with an independent numpy computation from the
snapshot's fields (periodic shifts with np.roll, fit with scipy.stats.linregress).

usage: structure_reference.py BRUME MPIEXEC INPUT WORK_FOLDER
Prints one line per check and "ok" at the end; exit code 1 on any failure.

Tolerance 1e-10 relative (of the value, or of the mean magnitude of the summed terms for the
signed flux function): brume sums line by line in another order than numpy's pairwise sums, and
forms |dv|^p by repeated products where numpy uses pow; both differ by a few ulp per term.
"""
import math
import os
import subprocess
import sys

import h5py
import numpy as np
import scipy.constants
import scipy.stats
import yaml

RELATIVE = 1e-10
COLD = 8000.0  # K: the initial temperature of the box, so that part of the gas is cold
SETTINGS = [
    "phases.cold_below=%g K" % COLD,
    "phases.warm_above=%g K" % (10 * COLD),
    "structure_functions.fit_lowest_lag=1",
    "structure_functions.fit_highest_lag=8",
    "structure_functions.minimum_cold_pairs=10",
    "structure_functions.lag_set=logarithmic",
    "structure_functions.lags_per_octave=2",
]
failures = []


def check(name, good, detail=""):
    print(("pass " if good else "FAIL ") + name + (" " + detail if detail else ""))
    if not good:
        failures.append(name)


def close(name, value, reference, scale=None):
    scale = np.maximum(np.abs(reference), 0.0 if scale is None else scale)
    error = np.abs(np.asarray(value) - reference)
    worst = float(np.max(error / np.where(scale > 0, scale, 1.0)))
    check(name, bool(np.all(error <= RELATIVE * scale)), "max relative error %.2e" % worst)
    return worst


# Open MPI on this machine (DEVELOPERS.md): root, shared memory only.
MPI_ENVIRONMENT = {"OMPI_ALLOW_RUN_AS_ROOT": "1", "OMPI_ALLOW_RUN_AS_ROOT_CONFIRM": "1",
                   "OMPI_MCA_pml": "ob1", "OMPI_MCA_btl": "self,vader"}


def run(command):
    # The caller may itself be an MPI process (a singleton): its Open MPI / PMIx variables would
    # make mpiexec and brume join it instead of starting afresh.
    environment = {k: v for k, v in os.environ.items()
                   if not k.startswith(("OMPI_", "PMIX_", "OPAL_", "PRTE_"))}
    environment.update(MPI_ENVIRONMENT)
    done = subprocess.run(command, capture_output=True, text=True, env=environment)
    if done.returncode != 0:
        print(" ".join(command))
        print(done.stdout + done.stderr)
        sys.exit(1)


def main():
    brume, mpiexec, input_file, work = sys.argv[1:5]
    os.makedirs(work, exist_ok=True)
    folder = os.path.join(work, "run")
    run([brume, "run", input_file, "--out", folder, "--set", "clock.max_steps=6"])
    snapshot = os.path.join(folder, "snapshot-0001.h5")
    overrides = [w for s in SETTINGS for w in ("--set", s)]
    one = os.path.join(work, "one-rank.h5")
    two = os.path.join(work, "two-ranks.h5")
    run([brume, "analyze", snapshot, "--out", one] + overrides)
    run([mpiexec, "-n", "2", "--oversubscribe", brume, "analyze", snapshot, "--out", two]
        + overrides)

    with h5py.File(snapshot, "r") as f:
        fields = {k: f["fields"][k][()] for k in f["fields"]}
        density_to_cgs = f["fields/density"].attrs["to_cgs"]
        velocity_to_cgs = f["fields/momentum_x"].attrs["to_cgs"] / density_to_cgs
        configuration = yaml.safe_load(f.attrs["configuration"])
    gamma = float(configuration["gas"]["adiabatic_index"])
    mu = float(configuration["gas"]["mean_molecular_weight"])

    # Cell-centred primitives, arrays [z][y][x]; brume's axis d is numpy axis 2 - d.
    rho = fields["density"]
    v = [fields["momentum_" + c] / rho for c in "xyz"]
    b = [0.5 * (fields["face_field_x"][:, :, :-1] + fields["face_field_x"][:, :, 1:]),
         0.5 * (fields["face_field_y"][:, :-1, :] + fields["face_field_y"][:, 1:, :]),
         0.5 * (fields["face_field_z"][:-1, :, :] + fields["face_field_z"][1:, :, :])]
    kinetic = sum(rho * u * u for u in v)
    magnetic = sum(c * c for c in b)
    pressure = (gamma - 1.0) * (fields["total_energy"] - 0.5 * (kinetic + magnetic))
    # T = μ m_H p / (ρ k_B); m_H = 1.00784 u (IUPAC standard atomic weight of H), CODATA 2018
    # constants from scipy.constants; cgs throughout.
    hydrogen = 1.00784 * scipy.constants.physical_constants["atomic mass constant"][0] * 1e3
    temperature = pressure / rho * mu * hydrogen * velocity_to_cgs**2 / (scipy.constants.k * 1e7)
    cold = temperature < COLD
    check("some cells are cold, not all", 0.05 < cold.mean() < 0.95, "%.3f" % cold.mean())

    cells = rho.shape[::-1]
    half = min(n for n in cells if n > 1) // 2
    lags = sorted({math.floor(2 ** (k / 2) + 0.5) for k in range(64)
                   if math.floor(2 ** (k / 2) + 0.5) <= half} | {half})

    with h5py.File(one, "r") as f:
        g = f["structure_functions"]
        got = {k: g[k][()] for k in g}
        stored = dict(got)  # as written, for the comparison of rank counts
        units = {k: g[k].attrs["to_cgs"] for k in g}
        unit_names = {k: g[k].attrs["unit"] for k in g}
        unit_names = {k: u.decode() if isinstance(u, bytes) else str(u)
                      for k, u in unit_names.items()}
    check("lags", list(got["lag_cells"]) == lags, str(lags))
    # brume stores cgs (to_cgs 1, `unit` the unit of the values); numpy below works in code
    # units, so the stored values go back by the snapshot's own factors.
    check("S_2 is stored in cm^2 s^-2", units["longitudinal_order_2"] == 1.0
          and unit_names["longitudinal_order_2"] == "cm^2 s^-2")
    code = {"cold_velocity_dispersion": velocity_to_cgs,
            "flux_third_order": density_to_cgs * velocity_to_cgs**3}
    for p in range(1, 7):
        code["longitudinal_order_%d" % p] = velocity_to_cgs**p
        code["transverse_order_%d" % p] = velocity_to_cgs**p
    for name, factor in list(code.items()):
        for key in (name, name + "_per_axis"):
            check("%s stored with to_cgs 1" % key, units[key] == 1.0)
            got[key] = got[key] / factor

    worst = 0.0
    pairs_all = np.zeros(len(lags))
    square_all = np.zeros(len(lags))
    for d in range(3):
        axis = 2 - d
        across = [c for c in range(3) if c != d]
        for li, lag in enumerate(lags):
            dv = [np.roll(u, -lag, axis=axis) - u for u in v]
            for p in range(1, 7):
                lon = np.mean(np.abs(dv[d]) ** p)
                tra = 0.5 * (np.mean(np.abs(dv[across[0]]) ** p) +
                             np.mean(np.abs(dv[across[1]]) ** p))
                worst = max(worst, close("longitudinal p=%d axis %d lag %d" % (p, d, lag),
                                         got["longitudinal_order_%d_per_axis" % p][d][li], lon))
                worst = max(worst, close("transverse p=%d axis %d lag %d" % (p, d, lag),
                                         got["transverse_order_%d_per_axis" % p][d][li], tra))
            square = dv[0] ** 2 + dv[1] ** 2 + dv[2] ** 2
            momentum = rho * v[d]
            terms = (np.roll(momentum, -lag, axis=axis) - momentum) * square
            worst = max(worst, close("flux axis %d lag %d" % (d, lag),
                                     got["flux_third_order_per_axis"][d][li], terms.mean(),
                                     np.abs(terms).mean()))
            both = cold & np.roll(cold, -lag, axis=axis)
            pairs = int(both.sum())
            check("cold pairs axis %d lag %d" % (d, lag),
                  got["cold_pair_count_per_axis"][d][li] == pairs, str(pairs))
            worst = max(worst, close("cold dispersion axis %d lag %d" % (d, lag),
                                     got["cold_velocity_dispersion_per_axis"][d][li],
                                     math.sqrt(square[both].sum() / pairs)))
            pairs_all[li] += pairs
            square_all[li] += square[both].sum()
    for p in range(1, 7):
        worst = max(worst, close("axis mean p=%d" % p, got["longitudinal_order_%d" % p],
                                 got["longitudinal_order_%d_per_axis" % p].mean(axis=0)))
    sigma = np.sqrt(square_all / pairs_all)
    check("pooled pairs", np.array_equal(got["cold_pair_count"], pairs_all))
    worst = max(worst, close("pooled dispersion", got["cold_velocity_dispersion"], sigma))
    use = [i for i, lag in enumerate(lags) if 1 <= lag <= 8 and pairs_all[i] >= 10]
    fit = scipy.stats.linregress(np.log(np.array(lags)[use]), np.log(sigma[use]))
    check("fit uses every lag", float(got["size_linewidth_fit_lags"]) == len(use) == len(lags))
    worst = max(worst, close("size-linewidth slope", got["size_linewidth_slope"], fit.slope))
    worst = max(worst, close("size-linewidth slope error", got["size_linewidth_slope_error"],
                             fit.stderr))
    print("worst relative error against numpy: %.3e" % worst)

    with h5py.File(two, "r") as f:
        g = f["structure_functions"]
        same = all(np.array_equal(g[k][()], stored[k], equal_nan=True) for k in stored)
        check("two ranks give the same bits as one", same and set(g.keys()) == set(stored))
    if failures:
        print("%d failures" % len(failures))
        sys.exit(1)
    print("ok")


main()
