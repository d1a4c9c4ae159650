"""Independent reference for brume's `spectra` measurement, with numpy.fft on the full complex
grid (numpy.fft.fftn, np.bincount over shells), compared to what brume wrote.

Usage:
  spectra_reference.py fields STATS_FILE          the test wrote the fields itself: group
                                                  /fields (density, velocity_x.., field_x..,
                                                  box_size_x..) beside /spectra
  spectra_reference.py snapshot SNAPSHOT STATS    fields from a brume snapshot (/fields:
                                                  density, momentum_*, face_field_*), spectra
                                                  from what `brume analyze` wrote

brume stores the spectra in cgs (the `unit` of each dataset); the reference is computed from the
fields in code units and converted with the snapshot's own factors (in `fields` mode the code
units are cgs). Prints the largest relative error of each array and exits 1 when one exceeds
1e-10 (relative to the array's largest magnitude).
"""
import itertools
import sys

import h5py
import numpy as np

TOLERANCE = 1e-10


def fields_from_test_file(stats):
    g = stats["fields"]
    rho = g["density"][...]
    v = [g["velocity_" + a][...] for a in "xyz"]
    b = [g["field_" + a][...] for a in "xyz"]
    size = [float(g["box_size_" + a][()]) for a in "xyz"]
    return rho, v, b, size, True, {"density": 1.0, "velocity": 1.0}


def fields_from_snapshot(path):
    with h5py.File(path, "r") as f:
        g = f["fields"]
        rho = g["density"][...].astype(np.float64)
        v = [g["momentum_" + a][...] / rho for a in "xyz"]
        magnetic = "face_field_x" in g
        b = []
        if magnetic:
            # Cell-centred B: the mean of the two faces along the normal (docs/snapshots.md:
            # face_field_x has nx + 1 entries along x, none extra on an axis of one cell).
            for axis_name, axis in zip("xyz", (2, 1, 0)):
                face = g["face_field_" + axis_name][...]
                if face.shape[axis] == rho.shape[axis] + 1:
                    lo = np.take(face, range(0, rho.shape[axis]), axis=axis)
                    hi = np.take(face, range(1, rho.shape[axis] + 1), axis=axis)
                    face = 0.5 * (lo + hi)
                b.append(face)
        size = [float(s) for s in f.attrs["size"]]
        density_unit = float(g["density"].attrs["to_cgs"])
        velocity_unit = float(g["momentum_x"].attrs["to_cgs"]) / density_unit
    return rho, v, b, size, magnetic, {"density": density_unit, "velocity": velocity_unit}


def check(rho, v, b, size, magnetic, units, spectra):
    """Compares the group `spectra` with numpy; prints the errors, returns True when all pass."""
    du, vu = units["density"], units["velocity"]
    # cgs per code unit of each spectrum (B_G^2/8pi = B_code^2/2 rho_u v_u^2).
    to_cgs = {"velocity_power": vu**2, "velocity_solenoidal_power": vu**2,
              "velocity_compressive_power": vu**2, "velocity_mean_flow_power": vu**2,
              "kinetic_energy_power": du * vu**2, "magnetic_field_power": du * vu**2,
              "cube_root_weighted_velocity_power": du ** (2.0 / 3.0) * vu**2,
              "density_power": du**2}
    nz, ny, nx = rho.shape
    n = rho.size
    longest = max(size)
    # Wave numbers in units of 2 pi / L (L the longest edge), numpy's fftfreq order.
    k = [np.fft.fftfreq(m, 1.0 / m) * (longest / s) for m, s in zip((nx, ny, nz), size)]
    kx, ky, kz = k[0][None, None, :], k[1][None, :, None], k[2][:, None, None]
    k2 = kx**2 + ky**2 + kz**2
    shell = np.floor(np.sqrt(k2) + 0.5).astype(np.int64).ravel()
    shells = len(spectra["wavenumber"])

    def spectrum(components):
        power = sum(np.abs(np.fft.fftn(c) / n) ** 2 for c in components)
        return 0.5 * np.bincount(shell, weights=power.ravel(), minlength=shells)

    reference = {
        "mode_count": np.bincount(shell, minlength=shells).astype(np.float64),
        "wavenumber": np.arange(shells, dtype=np.float64),
        "velocity_power": spectrum(v),
        "kinetic_energy_power": spectrum([np.sqrt(rho) * c for c in v]),
        "cube_root_weighted_velocity_power": spectrum([np.cbrt(rho) * c for c in v]),
        "density_power": spectrum([rho]),
        "log_density_power": spectrum([np.log(rho)]),
    }
    if magnetic:
        reference["magnetic_field_power"] = spectrum(b)

    # Helmholtz parts, averaged over the signs of every Nyquist component (index m/2 of an even
    # axis m): over all 8 sign patterns, which repeat evenly for coefficients with fewer
    # Nyquist components.
    hat = [np.fft.fftn(c) / n for c in v]
    nyquist = [np.zeros(m, bool) for m in (nx, ny, nz)]
    for flags, m in zip(nyquist, (nx, ny, nz)):
        if m % 2 == 0:
            flags[m // 2] = True
    nyq = [nyquist[0][None, None, :], nyquist[1][None, :, None], nyquist[2][:, None, None]]
    safe_k2 = np.where(k2 == 0.0, np.inf, k2)
    sol = np.zeros(rho.shape)
    comp = np.zeros(rho.shape)
    for signs in itertools.product((1.0, -1.0), repeat=3):
        q = [np.where(f, s * kk, kk) for f, s, kk in zip(nyq, signs, (kx, ky, kz))]
        dot = q[0] * hat[0] + q[1] * hat[1] + q[2] * hat[2]
        cross = [q[1] * hat[2] - q[2] * hat[1], q[2] * hat[0] - q[0] * hat[2],
                 q[0] * hat[1] - q[1] * hat[0]]
        comp += np.abs(dot) ** 2 / safe_k2 / 8.0
        sol += sum(np.abs(c) ** 2 for c in cross) / safe_k2 / 8.0
    reference["velocity_solenoidal_power"] = 0.5 * np.bincount(shell, weights=sol.ravel(),
                                                               minlength=shells)
    reference["velocity_compressive_power"] = 0.5 * np.bincount(shell, weights=comp.ravel(),
                                                                minlength=shells)
    s_tot = reference["velocity_solenoidal_power"].sum()
    c_tot = reference["velocity_compressive_power"].sum()
    numbers = {
        "velocity_compressive_ratio_total": c_tot / (s_tot + c_tot),
        "velocity_compressive_to_solenoidal": c_tot / s_tot,
        "velocity_mean_flow_power": 0.5 * sum(np.mean(c) ** 2 for c in v),
    }

    worst = 0.0
    failed = False
    for name, expected in reference.items():
        expected = expected * to_cgs.get(name, 1.0)
        got = spectra[name][...]
        if got.shape != expected.shape:
            print(f"{name}: shape {got.shape}, expected {expected.shape}")
            failed = True
            continue
        scale = np.max(np.abs(expected))
        error = np.max(np.abs(got - expected)) / scale
        worst = max(worst, error)
        print(f"{name}: largest relative error {error:.3e}")
        failed |= not error <= TOLERANCE
    for name, expected in numbers.items():
        expected = expected * to_cgs.get(name, 1.0)
        got = float(spectra[name][()])
        error = abs(got - expected) / abs(expected)
        worst = max(worst, error)
        print(f"{name}: {got:.15g} vs {expected:.15g}, relative error {error:.3e}")
        failed |= not error <= TOLERANCE
    for name in to_cgs:  # stored in cgs: nothing left to convert
        if name in spectra and float(spectra[name].attrs["to_cgs"]) != 1.0:
            print(f"{name}: to_cgs {spectra[name].attrs['to_cgs']}, expected 1 (values in cgs)")
            failed = True
    ratio = spectra["velocity_compressive_ratio"][...]
    with np.errstate(invalid="ignore"):  # 0/0 in an empty shell: NaN, as brume writes
        expected_ratio = reference["velocity_compressive_power"] / (
            reference["velocity_compressive_power"] + reference["velocity_solenoidal_power"])
    both = np.isfinite(expected_ratio)
    ratio_error = np.max(np.abs(ratio[both] - expected_ratio[both]))
    print(f"velocity_compressive_ratio: largest error {ratio_error:.3e}")
    failed |= not ratio_error <= TOLERANCE
    failed |= not np.array_equal(np.isfinite(ratio), both)
    print(f"worst relative error {worst:.3e}")
    return not failed


def main():
    mode = sys.argv[1]
    if mode == "fields":
        stats = h5py.File(sys.argv[2], "r")
        fields = fields_from_test_file(stats)
    else:
        fields = fields_from_snapshot(sys.argv[2])
        stats = h5py.File(sys.argv[3], "r")
    sys.exit(0 if check(*fields, stats["spectra"]) else 1)


if __name__ == "__main__":
    main()
