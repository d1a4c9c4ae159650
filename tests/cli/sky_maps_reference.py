"""End-to-end reference check of the sky maps (docs/sky-maps.md).

Makes a small magnetized snapshot with `brume run`, measures it with `brume analyze` on one rank
and on two ranks (mpiexec), and recomputes every map, spectrum, slope and ratio independently
with numpy (maps by np.sum along the axes, the E/B decomposition with numpy.fft) from the
snapshot's datasets read with h5py. Prints the largest deviations; exits 1 when any exceeds its
tolerance, 0 otherwise.

usage: sky_maps_reference.py BRUME INPUT.yaml FOLDER MPIEXEC
"""
import os
import re
import subprocess
import sys

import h5py
import numpy as np

# brume's mass of a hydrogen atom: 1.00784 u × m_u (CODATA 2018), solver/units/constants.hpp.
HYDROGEN_MASS = 1.00784 * 1.66053906660e-24

P0 = 0.15
CUT = 1.0007  # cm^-3, just above the initial density (not at it: no cell sits on the cut)
FIT = (1.0, 5.0)
SETTINGS = [
    "sky_maps.polarization_fraction=%r" % P0,
    "sky_maps.intensity=alignment_corrected",
    "sky_maps.density_cut=%r cm^-3" % CUT,
    "sky_maps.fit_lowest_wavenumber=%r" % FIT[0],
    "sky_maps.fit_highest_wavenumber=%r" % FIT[1],
]

# Tolerance of the brief: 1e-10 relative. brume sums the cells in order, numpy pairwise; both are
# within ~1e-15 of the exact sums here, so 1e-10 leaves five orders of magnitude. Q, U and TE
# change sign: their deviations are taken relative to the largest magnitude of the map or curve.
TOLERANCE = 1e-10


def run(command, env=None):
    done = subprocess.run(command, capture_output=True, text=True, env=env)
    if done.returncode != 0:
        print("failed (%d): %s\n%s\n%s" % (done.returncode, " ".join(command), done.stdout,
                                          done.stderr))
        sys.exit(1)


def cell_field(fields, axis, cells):
    """Face average of the face field along `axis` (brume's cell-centred B), [z][y][x]."""
    face = fields["face_field_" + "xyz"[axis]][...] * fields["face_field_" + "xyz"[axis]].attrs[
        "to_cgs"]
    numpy_axis = 2 - axis
    if cells[axis] == 1:
        return face
    lower = np.take(face, np.arange(cells[axis]), axis=numpy_axis)
    upper = np.take(face, np.arange(1, cells[axis] + 1), axis=numpy_axis)
    return 0.5 * (lower + upper)


def project(values, axis):
    """Sum along a box axis into the map layout [v][u] (docs/sky-maps.md)."""
    summed = np.sum(values, axis=2 - axis)
    return summed.T if axis == 1 else summed


def reference(snapshot):
    with h5py.File(snapshot, "r") as f:
        cells = [int(c) for c in f.attrs["cells"]]
        size = np.array(f.attrs["size"], dtype=float) * float(f.attrs["length_to_cgs"])
        configuration = f.attrs["configuration"]
        if isinstance(configuration, bytes):
            configuration = configuration.decode()
        mu = float(re.search(r"mean_molecular_weight:\s*([0-9.eE+-]+)", configuration).group(1))
        fields = f["fields"]
        rho = fields["density"][...] * fields["density"].attrs["to_cgs"]
        b = [cell_field(fields, a, cells) for a in range(3)]
    n = rho / (mu * HYDROGEN_MASS)
    kept = np.where(n <= CUT, n, 0.0)
    removed = float(np.mean(n > CUT))
    result = {}
    for axis in range(3):
        u_axis, v_axis = (axis + 1) % 3, (axis + 2) % 3
        bu, bv, ba = b[u_axis], b[v_axis], b[axis]
        plane = bu * bu + bv * bv
        total = plane + ba * ba
        weight = np.where(total > 0, kept / np.where(total > 0, total, 1.0), 0.0)
        dl = size[axis] / cells[axis]
        column = project(kept, axis) * dl
        alignment = project(weight * (plane - 2.0 / 3.0 * total), axis) * dl
        q = P0 * project(weight * (bu * bu - bv * bv), axis) * dl
        u = P0 * project(weight * 2.0 * bu * bv, axis) * dl
        i = column - P0 * alignment
        lit = i > 0
        p = np.where(lit, np.hypot(q, u) / np.where(lit, i, 1.0), 0.0)
        psi = np.where(lit, np.degrees(0.5 * np.arctan2(u, q)), 0.0)
        along = "_along_" + "xyz"[axis]
        result["column_density" + along] = column
        result["stokes_i" + along] = i
        result["stokes_q" + along] = q
        result["stokes_u" + along] = u
        result["polarization_fraction" + along] = p
        result["polarization_angle" + along] = psi
        result["field_angle" + along] = np.where(psi > 0, psi - 90.0, psi + 90.0)
        result.update(spectra(i, q, u, size[u_axis], size[v_axis], along))
    return result, removed


def spectra(t, q, u, lu, lv, along):
    """Flat-sky E/B (Seljak 1997; Zaldarriaga & Seljak 1997), annuli as in docs/sky-maps.md."""
    nv, nu = t.shape
    longer = max(lu, lv)
    north = (np.fft.fftfreq(nv, d=1.0 / nv) / lv)[:, None] * np.ones((1, nu))
    east = -(np.fft.fftfreq(nu, d=1.0 / nu) / lu)[None, :] * np.ones((nv, 1))
    k2 = north ** 2 + east ** 2
    kappa = longer * np.sqrt(k2)
    nyquist = min(longer * nu / (2 * lu), longer * nv / (2 * lv))
    largest = max(0, int(np.floor(nyquist - 0.5)))
    annulus = np.floor(kappa + 0.5).astype(int)
    safe = np.where(k2 > 0, k2, 1.0)
    cos2 = (north ** 2 - east ** 2) / safe
    sin2 = 2 * north * east / safe
    th, qh, uh = np.fft.fft2(t), np.fft.fft2(q), np.fft.fft2(u)
    e = qh * cos2 + uh * sin2
    b = -qh * sin2 + uh * cos2
    scale = lu * lv / float(nu * nv) ** 2
    out = {k: [] for k in ("wavenumber", "modes", "tt", "ee", "bb", "te")}
    for m in range(1, largest + 1):
        sel = annulus == m
        count = np.count_nonzero(sel)
        if count == 0:
            continue
        out["wavenumber"].append(kappa[sel].mean())
        out["modes"].append(count)
        out["tt"].append(np.mean(np.abs(th[sel]) ** 2) * scale)
        out["ee"].append(np.mean(np.abs(e[sel]) ** 2) * scale)
        out["bb"].append(np.mean(np.abs(b[sel]) ** 2) * scale)
        out["te"].append(np.mean((th[sel] * np.conj(e[sel])).real) * scale)
    result = {"spectrum_" + k + along: np.array(v, dtype=float) for k, v in out.items()}
    k = result["spectrum_wavenumber" + along]
    fit = (np.round(k) >= FIT[0]) & (np.round(k) <= FIT[1])
    for name in ("tt", "ee", "bb"):
        c = result["spectrum_" + name + along]
        use = fit & (c > 0)
        result["slope_" + name + along] = np.polyfit(np.log(k[use]), np.log(c[use]), 1)[0]
    modes = result["spectrum_modes" + along]
    result["bb_over_ee" + along] = (np.sum(modes[fit] * result["spectrum_bb" + along][fit]) /
                                    np.sum(modes[fit] * result["spectrum_ee" + along][fit]))
    return result


def deviation(name, mine, ref):
    """Largest deviation, relative as stated beside TOLERANCE; angles modulo 180°."""
    mine = np.asarray(mine, dtype=float)
    ref = np.asarray(ref, dtype=float)
    if mine.shape != ref.shape:
        return np.inf
    if "angle" in name:
        d = np.abs((mine - ref + 90.0) % 180.0 - 90.0)
        return float(np.max(d)) / 90.0 if d.size else 0.0
    if "slope" in name:
        return float(np.max(np.abs(mine - ref)))
    signed = any(s in name for s in ("stokes_q", "stokes_u", "spectrum_te"))
    if signed:
        scale = np.max(np.abs(ref)) if ref.size else 1.0
        return float(np.max(np.abs(mine - ref)) / scale) if ref.size else 0.0
    with np.errstate(divide="ignore", invalid="ignore"):
        rel = np.where(ref != 0, np.abs(mine - ref) / np.abs(ref), np.abs(mine - ref))
    return float(np.max(rel)) if rel.size else 0.0


def main():
    brume, config, folder, mpiexec = sys.argv[1:5]
    env = dict(os.environ, OMPI_ALLOW_RUN_AS_ROOT="1", OMPI_ALLOW_RUN_AS_ROOT_CONFIRM="1",
               OMPI_MCA_pml="ob1", OMPI_MCA_btl="self,vader")
    run_folder = os.path.join(folder, "run")
    run([brume, "run", config, "--out", run_folder, "--set", "clock.max_steps=6"], env)
    snapshots = sorted(p for p in os.listdir(run_folder) if re.match(r"snapshot-\d+\.h5$", p))
    snapshot = os.path.join(run_folder, snapshots[-1])
    sets = [word for s in SETTINGS for word in ("--set", s)]
    one = os.path.join(folder, "one.h5")
    two = os.path.join(folder, "two.h5")
    run([brume, "analyze", snapshot, "--out", one] + sets, env)
    run([mpiexec, "-n", "2", "--oversubscribe", brume, "analyze", snapshot, "--out", two] + sets,
        env)
    ref, removed = reference(snapshot)
    worst = 0.0
    by_name = {}
    bitwise = True
    with h5py.File(one, "r") as f1, h5py.File(two, "r") as f2:
        g1, g2 = f1["sky_maps"], f2["sky_maps"]
        missing = [name for name in ref if name not in g1 or name not in g2]
        if missing:
            print("missing in the statistics files:", missing)
            return 1
        for ranks, g in (("1 rank", g1), ("2 ranks", g2)):
            for name in sorted(ref):
                d = deviation(name, g[name][()], ref[name])
                worst = max(worst, d)
                by_name[name] = max(by_name.get(name, 0.0), d)
                if d > TOLERANCE:
                    print("%s: %s deviates by %.3e" % (ranks, name, d))
        for name in ref:
            if g1[name].ndim == 2 and not np.array_equal(g1[name][()], g2[name][()]):
                bitwise = False
                print("%s differs between 1 and 2 ranks" % name)
        print("largest deviation from numpy: %.3e over %d datasets; maps 1 vs 2 ranks %s" %
              (worst, len(ref), "bitwise identical" if bitwise else "DIFFER"))
        top = sorted(by_name.items(), key=lambda item: -item[1])[:4]
        print("largest: " + ", ".join("%s %.2e" % item for item in top))
        maps = [item for item in by_name.items() if np.ndim(ref[item[0]]) == 2]
        curves = [item for item in by_name.items() if np.ndim(ref[item[0]]) == 1]
        print("largest among maps: %s %.2e; among spectra: %s %.2e" %
              (max(maps, key=lambda item: item[1]) + max(curves, key=lambda item: item[1])))
        print("slopes along z: TT %.4f EE %.4f BB %.4f, BB/EE %.4f" %
              (ref["slope_tt_along_z"], ref["slope_ee_along_z"], ref["slope_bb_along_z"],
               ref["bb_over_ee_along_z"]))
        print("density cut %g cm^-3 leaves out %.1f %% of the cells" % (CUT, 100 * removed))
    return 0 if worst <= TOLERANCE and bitwise else 1


if __name__ == "__main__":
    sys.exit(main())
