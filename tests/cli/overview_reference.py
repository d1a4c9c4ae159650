"""Independent check of brume's box overview (group "overview" of a statistics file) against
numpy on the snapshot it was measured on (numpy and scipy from Debian are the reference
libraries). Phase boundaries: the ends of the isobarically unstable range of the Koyama &
Inutsuka (2002, ApJ 564, L97, eq. 4) fit, where d ln Lambda / d ln T = 1 along the equilibrium
curve (Field 1965, ApJ 142, 531: (dL/dT)_P < 0 with L = n^2 Lambda - n Gamma and n Lambda = Gamma
gives d ln Lambda / d ln T < 1), found with scipy.optimize.brentq.

usage: overview_reference.py SNAPSHOT STATISTICS [STATISTICS...]
       overview_reference.py --run BRUME CONFIG FOLDER [--set KEY=VALUE ...]
The second form runs `brume run CONFIG` into FOLDER, `brume analyze` on its last snapshot on 1 and
2 ranks, and checks the run's last statistics file and both analyses against numpy, the 1- and
2-rank analyses against each other (bitwise: exact sums), timeline.h5 against timeline.txt and the
time series' last row against the last statistics file (the same state).
Prints the largest relative difference; exit status 1 beyond the tolerance or on any mismatch."""
import glob
import math
import os
import re
import shutil
import subprocess
import sys

import h5py
import numpy as np
from scipy.optimize import brentq

K_B = 1.380649e-16          # erg/K, CODATA 2018 (exact)
M_H = 1.00784 * 1.66053906660e-24  # g: standard atomic weight of H times the atomic mass constant
TOLERANCE = 1e-10


def config_value(text, section, key):
    block = re.search(r"^" + section + r":\n((?:[ ].*\n?)*)", text, re.M).group(1)
    return re.search(r"^\s+" + key + r":\s*([^\s#]+)", block, re.M).group(1)


def phase_boundaries():
    # d ln Lambda / d ln T of the fit, analytically: Lambda = a exp(-118400/(T+1000)) +
    # b sqrt(T) exp(-92/T), a = 1e7 Gamma, b = 1.4e-2 Gamma (Gamma cancels).
    def slope_minus_one(t):
        warm = 1e7 * math.exp(-1.184e5 / (t + 1000.0))
        cold = 1.4e-2 * math.sqrt(t) * math.exp(-92.0 / t)
        d_warm = warm * 1.184e5 * t / (t + 1000.0) ** 2
        d_cold = cold * (0.5 + 92.0 / t)
        return (d_warm + d_cold) / (warm + cold) - 1.0
    # The slope exceeds 1 below ~100 K and around 10^4 K, and falls below 1 between.
    low = brentq(slope_minus_one, 50.0, 1000.0, xtol=1e-13, rtol=1e-15)
    high = brentq(slope_minus_one, 1000.0, 2e4, xtol=1e-13, rtol=1e-15)
    return low, high


def reference(snapshot):
    with h5py.File(snapshot, "r") as f:
        config = f.attrs["configuration"]
        config = config.decode() if isinstance(config, bytes) else config
        fields = f["fields"]
        def load(name):
            return fields[name][...] * fields[name].attrs["to_cgs"]
        rho = load("density")
        mom = [load("momentum_" + a) for a in "xyz"]
        energy = load("total_energy")
        bx, by, bz = (fields["face_field_" + a][...] for a in "xyz")
        b_unit = fields["face_field_x"].attrs["to_cgs"]
        size = f.attrs["size"] * f.attrs["length_to_cgs"]
        cells = f.attrs["cells"]
    gamma = float(config_value(config, "gas", "adiabatic_index"))
    mu = float(config_value(config, "gas", "mean_molecular_weight"))
    b = [0.5 * (bx[:, :, 1:] + bx[:, :, :-1]) * b_unit, 0.5 * (by[:, 1:, :] + by[:, :-1, :]) * b_unit,
         0.5 * (bz[1:] + bz[:-1]) * b_unit]
    v = [m / rho for m in mom]
    v2 = sum(x * x for x in v)
    b2 = sum(x * x for x in b)
    kinetic = 0.5 * rho * v2
    magnetic = b2 / (8 * math.pi)
    p = (gamma - 1.0) * (energy - kinetic - magnetic)
    n = rho / (mu * M_H)
    t = p / (n * K_B)
    dv = np.prod(size / cells)
    mass = rho.sum()
    mean_b = [x.mean() for x in b]
    mean_field = sum(x * x for x in mean_b) / (8 * math.pi) * np.prod(size)
    sonic2 = v2 * rho / (gamma * p)
    alfven2 = v2 * 4 * math.pi * rho / b2
    cold_below, warm_above = phase_boundaries()
    phase = np.where(t < cold_below, 0, np.where(t > warm_above, 2, 1))
    r = {
        "kinetic_energy": kinetic.sum() * dv,
        "magnetic_energy_mean_field": mean_field,
        "magnetic_energy_fluctuating": magnetic.sum() * dv - mean_field,
        "thermal_energy": (p / (gamma - 1.0)).sum() * dv,
        "total_energy": (kinetic + magnetic + p / (gamma - 1.0)).sum() * dv,
        "velocity_rms_volume": math.sqrt(v2.mean()) / 1e5,
        "velocity_rms_mass": math.sqrt((rho * v2).sum() / mass) / 1e5,
        "sonic_mach_volume": math.sqrt(sonic2.mean()),
        "sonic_mach_mass": math.sqrt((rho * sonic2).sum() / mass),
        "alfven_mach_volume": math.sqrt(alfven2.mean()),
        "alfven_mach_mass": math.sqrt((rho * alfven2).sum() / mass),
        "cold_below": cold_below,
        "warm_above": warm_above,
        "number_density_min": n.min(),
        "number_density_max": n.max(),
        "temperature_min": t.min(),
        "temperature_max": t.max(),
    }
    for k, name in enumerate(["cold", "unstable", "warm"]):
        r[name + "_volume_fraction"] = (phase == k).mean()
        r[name + "_mass_fraction"] = rho[phase == k].sum() / mass
    return r


def compare(snapshot, paths):
    expected = reference(snapshot)
    worst = 0.0
    for path in paths:
        with h5py.File(path, "r") as f:
            group = f["overview"]
            missing = set(expected) - set(group.keys())
            if missing:
                print("missing in", path, ":", sorted(missing))
                return 1
            for name, value in expected.items():
                got = float(group[name][()])
                # Energies differing by cancellation (the fluctuating field) are compared to
                # the total magnetic energy they come from.
                scale = abs(value)
                if name == "magnetic_energy_fluctuating":
                    scale = abs(value) + abs(expected["magnetic_energy_mean_field"])
                error = abs(got - value) / scale if scale > 0 else abs(got)
                if error > worst:
                    worst = error
                if error > TOLERANCE:
                    print(f"{path}: {name} = {got!r}, numpy {value!r}, relative {error:.3g}")
    print(f"largest relative difference {worst:.3g}")
    return 0 if worst <= TOLERANCE else 1


def timeline_text(folder):
    names, rows = None, []
    for line in open(os.path.join(folder, "timeline.txt")):
        if line.startswith("# columns:"):
            names = [w.split("[")[0] for w in line[len("# columns:"):].split()]
        elif not line.startswith("#"):
            rows.append([float(w) for w in line.split()])
    return names, np.array(rows)


def run_and_check(brume, config, folder, overrides):
    env = dict(os.environ, OMPI_ALLOW_RUN_AS_ROOT="1", OMPI_ALLOW_RUN_AS_ROOT_CONFIRM="1",
               OMPI_MCA_pml="ob1", OMPI_MCA_btl="self,vader")
    run = os.path.join(folder, "run")
    subprocess.run([brume, "run", config, "--out", run, "-q"] + overrides, check=True, env=env)
    snapshots = sorted(glob.glob(os.path.join(run, "snapshot-*.h5")))
    statistics = sorted(glob.glob(os.path.join(run, "statistics-*.h5")))
    if len(snapshots) < 2 or len(statistics) != len(snapshots):
        print("expected a statistics file with every snapshot:", snapshots, statistics)
        return 1
    analyses = []
    for ranks in (1, 2):
        out = os.path.join(folder, f"analysis-{ranks}.h5")
        subprocess.run([shutil.which("mpiexec"), "-n", str(ranks), "--oversubscribe", brume,
                        "analyze", snapshots[-1], "--out", out, "-q"], check=True, env=env)
        analyses.append(out)
    status = compare(snapshots[-1], [statistics[-1]] + analyses)
    with h5py.File(analyses[0], "r") as one, h5py.File(analyses[1], "r") as two:
        for name in one["overview"]:
            if one["overview"][name][()] != two["overview"][name][()]:
                print("overview", name, "differs between 1 and 2 ranks")
                status = 1
    names, rows = timeline_text(run)
    with h5py.File(os.path.join(run, "timeline.h5"), "r") as h5:
        for c, name in enumerate(names):
            if not np.array_equal(h5[name][...], rows[:, c]):
                print("timeline.h5", name, "differs from timeline.txt")
                status = 1
    with h5py.File(statistics[-1], "r") as last:
        if rows[-1, names.index("step")] != last.attrs["step"]:
            print("the time series does not end at the last statistics file's step")
            status = 1
        for name in last["overview"]:
            if name in names and rows[-1, names.index(name)] != last["overview"][name][()]:
                print("last timeline row and last statistics file differ in", name)
                status = 1
    print(f"{len(rows)} timeline rows, {len(names)} columns")
    return status


def main():
    if sys.argv[1] == "--run":
        brume, config, folder = sys.argv[2:5]
        return run_and_check(brume, config, folder, sys.argv[5:])
    return compare(sys.argv[1], sys.argv[2:])


if __name__ == "__main__":
    sys.exit(main())
