"""End-to-end check of the distributions and Jeans diagnostics (docs/distributions.md,
docs/jeans.md) against an independent numpy/scipy computation from a snapshot's fields.

  distributions_reference.py BRUME INPUT FOLDER [--set KEY=VALUE ...]

Runs `brume run INPUT` (one rank), then `brume analyze` on the last snapshot on 1 and on 2 ranks
(mpiexec, with the --set overrides), and checks:
  1. the groups `distributions` and `jeans` are bitwise identical for 1 and 2 ranks;
  2. every histogram (volume counts, mass fractions, under/overflow) against numpy's histogram
     of the quantities computed here from the snapshot's conserved fields read with h5py;
  3. the Jeans fractions, the Krumholz-McKee critical density and the multi-free-fall integral,
     the latter by scipy.integrate.quad over the numpy PDF, bin by bin;
  4. the equilibrium curve against scipy.optimize.brentq of the Koyama & Inutsuka 2002 fit as
     physics/cooling_curve.cpp implements it.
Constants: scipy.constants (CODATA 2018 in scipy 1.10: k, G, atomic mass; parsec from the au).
Tolerance: 1e-10 relative (values that are 0 in one must be 0 in both); every quantity here is
a sum of a few thousand terms or a root, computed to ~1e-15 on both sides.
Prints the largest relative differences and exits 1 on any failure.
"""
import math
import os
import shutil
import subprocess
import sys

import h5py
import numpy as np
import yaml
from scipy import constants
from scipy.integrate import quad
from scipy.optimize import brentq

K_B = constants.k * 1e7                                # erg/K
G = constants.G * 1e3                                  # cm^3 g^-1 s^-2
M_H = 1.00784 * constants.atomic_mass * 1e3            # g: hydrogen atom, as brume (1.00784 u)
PARSEC = constants.parsec * 1e2                        # cm
MICROGAUSS = 1e-6
TOLERANCE = 1e-10

failures = []
worst = {}


def check(name, brume, reference, tolerance=TOLERANCE):
    brume = np.asarray(brume, dtype=float)
    reference = np.asarray(reference, dtype=float)
    if brume.shape != reference.shape:
        failures.append("%s: shape %s, expected %s" % (name, brume.shape, reference.shape))
        return
    both_nan = np.isnan(brume) & np.isnan(reference)
    scale = np.maximum(np.abs(reference), 1e-300)
    error = np.where(both_nan, 0.0, np.abs(brume - reference) / scale)
    zero = reference == 0.0
    error = np.where(zero, np.where(brume == 0.0, 0.0, np.inf), error)
    largest = float(np.max(error)) if error.size else 0.0
    worst[name] = largest
    if not largest <= tolerance:
        failures.append("%s: relative difference %.3g > %.1g" % (name, largest, tolerance))


def environment():
    env = dict(os.environ)
    env.update(OMPI_ALLOW_RUN_AS_ROOT="1", OMPI_ALLOW_RUN_AS_ROOT_CONFIRM="1",
               OMPI_MCA_pml="ob1", OMPI_MCA_btl="self,vader")
    return env


def run(command):
    result = subprocess.run(command, env=environment(), capture_output=True, text=True)
    if result.returncode != 0:
        raise SystemExit("failed (%d): %s\n%s%s" % (result.returncode, " ".join(command),
                                                    result.stdout, result.stderr))
    return result


class Fields:
    """Primitive quantities in code units, [z][y][x], from a snapshot, and the unit factors."""

    def __init__(self, path):
        with h5py.File(path, "r") as f:
            config = yaml.safe_load(f.attrs["configuration"])
            g = f["fields"]
            self.rho = g["density"][...]
            self.density_unit = g["density"].attrs["to_cgs"]
            self.velocity_unit = g["momentum_x"].attrs["to_cgs"] / self.density_unit
            self.field_unit = g["face_field_x"].attrs["to_cgs"]
            self.length_unit = f.attrs["length_to_cgs"]
            self.size = f.attrs["size"]
            self.cells = f.attrs["cells"]
            v = [g["momentum_" + a][...] / self.rho for a in "xyz"]
            # Cell-centred B: the average of the two faces (docs/snapshots.md).
            b = [0.5 * (g["face_field_x"][:, :, 1:] + g["face_field_x"][:, :, :-1]),
                 0.5 * (g["face_field_y"][:, 1:, :] + g["face_field_y"][:, :-1, :]),
                 0.5 * (g["face_field_z"][1:, :, :] + g["face_field_z"][:-1, :, :])]
            self.v2 = v[0] ** 2 + v[1] ** 2 + v[2] ** 2
            self.v = v
            self.b2 = b[0] ** 2 + b[1] ** 2 + b[2] ** 2
            gamma = float(config["gas"]["adiabatic_index"])
            self.mu = float(config["gas"]["mean_molecular_weight"])
            self.p = (gamma - 1.0) * (g["total_energy"][...] - 0.5 * self.rho * self.v2
                                      - 0.5 * self.b2)
        self.pressure_unit = self.density_unit * self.velocity_unit ** 2
        self.n = self.rho * self.density_unit / (self.mu * M_H)
        self.temperature = self.p / self.rho * self.mu * M_H * self.velocity_unit ** 2 / K_B


def log_histogram(x, weights, edges_count, lowest, highest):
    """Counts in logarithmic bins plus (underflow, overflow) by numpy.histogram of ln x."""
    x = x.ravel()
    weights = weights.ravel()
    positive = x > 0
    logs = np.log(np.where(positive, x, 1.0))
    inside = positive & (x >= lowest) & (x < highest)
    counts, _ = np.histogram(logs[inside], bins=edges_count,
                             range=(math.log(lowest), math.log(highest)), weights=weights[inside])
    under = weights[~positive | (positive & (x < lowest))]
    over = weights[positive & (x >= highest)]
    return counts, math.fsum(under), math.fsum(over)


def check_histogram(group, name, x, rho, bins, lowest, highest):
    ones = np.ones_like(rho)
    total_mass = math.fsum(rho.ravel())
    volume, vu, vo = log_histogram(x, ones, bins, lowest, highest)
    cells = rho.size
    check(name + "_volume_fraction", group[name + "_volume_fraction"][...], volume / cells)
    check(name + "_volume_underflow", group[name + "_volume_underflow"][()], vu / cells)
    check(name + "_volume_overflow", group[name + "_volume_overflow"][()], vo / cells)
    # numpy's weighted histogram adds in its own order: fsum per bin for the reference.
    xs, rs = x.ravel(), rho.ravel()
    index = np.floor((np.log(np.where(xs > 0, xs, 1.0)) - math.log(lowest))
                     * bins / math.log(highest / lowest))
    mass = [math.fsum(rs[(index == k) & (xs >= lowest) & (xs < highest)]) / total_mass
            for k in range(bins)]
    check(name + "_mass_fraction", group[name + "_mass_fraction"][...], mass)
    _, mu, mo = log_histogram(x, rho, bins, lowest, highest)
    check(name + "_mass_overflow", group[name + "_mass_overflow"][()], mo / total_mass)
    check(name + "_mass_underflow", group[name + "_mass_underflow"][()], mu / total_mass)
    edges = lowest * (highest / lowest) ** (np.arange(bins + 1) / bins)
    check(name + "_edges", group[name + "_edges"][...], edges, 1e-13)  # pow vs **: few ulp


def check_joint(group, name, x, y, rho, xb, yb):
    cells = rho.size
    counts, _, _ = np.histogram2d(np.log(x.ravel()), np.log(y.ravel()), bins=(xb[0], yb[0]),
                                  range=((math.log(xb[1]), math.log(xb[2])),
                                         (math.log(yb[1]), math.log(yb[2]))))
    check(name + "_volume_fraction", group[name + "_volume_fraction"][...], counts / cells)
    check(name + "_volume_outside", group[name + "_volume_outside"][()],
          1.0 - counts.sum() / cells, 1e-12)  # 1 - sum: cancellation, absolute ~1e-16


def cooling(t):
    return 2.0e-26 * (1.0e7 * math.exp(-1.184e5 / (t + 1000.0))
                      + 1.4e-2 * math.sqrt(t) * math.exp(-92.0 / t))


def equilibrium_pressure(n, low=10.0, high=1e9):
    grid = np.geomspace(low, high, 4001)
    for a, b in zip(grid[:-1], grid[1:]):
        fa, fb = n * cooling(a) - 2e-26, n * cooling(b) - 2e-26
        if (fa < 0.0) != (fb < 0.0):
            return n * brentq(lambda t: n * cooling(t) - 2e-26, a, b, xtol=1e-300, rtol=1e-15)
    return float("nan")


def check_distributions(group, f):
    """The default bins of the section distributions (docs/configuration.md)."""
    check_histogram(group, "density", f.n, f.rho, 100, 1e-4, 1e6)
    check_histogram(group, "temperature", f.temperature, f.rho, 100, 1.0, 1e9)
    check_histogram(group, "plasma_beta", 2.0 * f.p / f.b2, f.rho, 100, 1e-4, 1e6)
    check_histogram(group, "dynamic_ratio", f.rho * f.v2 / f.b2, f.rho, 100, 1e-4, 1e6)
    check_joint(group, "phase", f.n, f.p * f.pressure_unit / K_B, f.rho, (100, 1e-4, 1e6),
                (100, 1.0, 1e8))
    check_joint(group, "field_density", f.n, np.sqrt(f.b2) * f.field_unit / MICROGAUSS, f.rho,
                (100, 1e-4, 1e6), (100, 1e-3, 1e4))
    centres = group["phase_equilibrium_density"][...]
    edges = group["density_edges"][...]
    check("phase_equilibrium_density", centres, np.sqrt(edges[1:] * edges[:-1]), 1e-15)
    check("phase_equilibrium_pressure", group["phase_equilibrium_pressure"][...],
          [equilibrium_pressure(n) for n in centres])


def check_jeans(group, f, length_pc, phi_x, epsilon, phi_t):
    rho = f.rho
    time_unit = f.length_unit / f.velocity_unit
    g_code = G * f.density_unit * time_unit ** 2
    jeans2 = math.pi * (f.p / rho) / (g_code * rho)
    width = max(f.size / f.cells)
    length = length_pc * PARSEC / f.length_unit if length_pc > 0 else 4.0 * width
    mass = math.fsum(rho.ravel())
    for name, limit in (("below_length", length), ("below_truelove", 4.0 * width)):
        below = jeans2 < limit * limit
        check("volume_fraction_" + name, group["volume_fraction_" + name][()],
              below.sum() / rho.size)
        check("mass_fraction_" + name, group["mass_fraction_" + name][()],
              math.fsum(rho[below]) / mass)
    check("smallest_jeans_length", group["smallest_jeans_length"][()],
          math.sqrt(jeans2.min()) * f.length_unit / PARSEC)
    # Box moments: mass-weighted 3D dispersion, mass-weighted c_s^2, volume-mean beta.
    mean_v = [math.fsum((rho * v).ravel()) / mass for v in f.v]
    sigma2 = math.fsum((rho * f.v2).ravel()) / mass - sum(m * m for m in mean_v)
    sound2 = math.fsum(f.p.ravel()) / mass
    mach = math.sqrt(sigma2 / sound2)
    mean_rho = mass / rho.size
    box = (f.size[0] * f.size[1] * f.size[2]) ** (1.0 / 3.0)
    virial = 5.0 * sigma2 / (math.pi * g_code * mean_rho * box * box)
    beta = math.fsum(f.p.ravel()) / math.fsum((0.5 * f.b2).ravel())
    s_crit = math.log(math.pi ** 2 / 5.0 * phi_x ** 2 * virial * mach ** 2 / (1.0 + 1.0 / beta))
    check("mach_number", group["mach_number"][()], mach)
    check("virial_parameter", group["virial_parameter"][()], virial)
    check("plasma_beta", group["plasma_beta"][()], beta)
    check("critical_log_density", group["critical_log_density"][()], s_crit)
    s = np.log(rho / mean_rho).ravel()
    bins, lowest, highest = 400, -20.0, 20.0
    counts, edges = np.histogram(s, bins=bins, range=(lowest, highest))
    pdf = counts / rho.size / ((highest - lowest) / bins)
    check("density_contrast_volume_fraction", group["density_contrast_volume_fraction"][...],
          counts / rho.size)
    integral = 0.0
    for k in range(bins):
        a, b = edges[k], edges[k + 1]
        if b <= s_crit or counts[k] == 0:
            continue
        value, _ = quad(lambda x: math.exp(1.5 * x) * pdf[k], max(a, s_crit), b,
                        epsabs=0.0, epsrel=1e-13)
        integral += value
    above = rho > mean_rho * math.exp(s_crit)
    check("volume_fraction_above_critical", group["volume_fraction_above_critical"][()],
          above.sum() / rho.size)
    check("mass_fraction_above_critical", group["mass_fraction_above_critical"][()],
          math.fsum(rho[above]) / mass)
    check("multi_free_fall_integral", group["multi_free_fall_integral"][()], integral)
    check("star_formation_rate_per_free_fall", group["star_formation_rate_per_free_fall"][()],
          epsilon / phi_t * integral)
    below = (jeans2 < length * length).sum()
    if not 0 < below < rho.size:
        failures.append("all or no gas below the resolution length: choose another jeans.length")
    return above.sum(), integral


def identical(a, b, group):
    for name in a[group]:
        x, y = a[group][name][()], b[group][name][()]
        if np.asarray(x).tobytes() != np.asarray(y).tobytes():
            failures.append("%s/%s differs between 1 and 2 ranks" % (group, name))
    for key in a[group].attrs:
        if a[group].attrs[key] != b[group].attrs[key]:
            failures.append("%s attribute %s differs between 1 and 2 ranks" % (group, key))


def main(argv):
    brume, source, folder = argv[0], argv[1], argv[2]
    overrides = []
    for word in argv[3:]:
        if word != "--set":
            overrides += ["--set", word]
    settings = dict(w.split("=", 1) for w in argv[3:] if w != "--set")
    shutil.rmtree(folder, ignore_errors=True)
    os.makedirs(folder)
    run([brume, "run", source, "--out", os.path.join(folder, "run"), "--quiet"])
    snapshots = sorted(n for n in os.listdir(os.path.join(folder, "run"))
                       if n.startswith("snapshot-") and n.endswith(".h5"))
    snapshot = os.path.join(folder, "run", snapshots[-1])
    mpiexec = shutil.which("mpiexec")
    outputs = []
    for ranks in (1, 2):
        out = os.path.join(folder, "analysis-%d.h5" % ranks)
        run([mpiexec, "-n", str(ranks), "--oversubscribe", brume, "analyze", snapshot,
             "--out", out] + overrides)
        outputs.append(h5py.File(out, "r"))
    for group in ("distributions", "jeans"):
        identical(outputs[0], outputs[1], group)
    f = Fields(snapshot)
    check_distributions(outputs[0]["distributions"], f)
    length_pc = float(settings.get("jeans.length", "0pc").replace("pc", ""))
    cells_above, integral = check_jeans(outputs[0]["jeans"], f, length_pc,
                                        float(settings.get("jeans.critical_density_factor",
                                                           1.12)),
                                        float(settings.get("jeans.efficiency", 0.5)),
                                        float(settings.get("jeans.time_factor", 1.91)))
    for name in sorted(worst, key=worst.get, reverse=True)[:8]:
        print("largest relative difference %-36s %.3g" % (name, worst[name]))
    print("checked %d quantities; cells above the critical density %d; multi-ff integral %.6g"
          % (len(worst), cells_above, integral))
    if not 0 < cells_above < f.rho.size or integral <= 0.0:
        failures.append("all or no gas above the critical density: choose another "
                        "jeans.critical_density_factor so that the integral's lower end counts")
    for message in failures:
        print("FAIL " + message)
    return 1 if failures else 0


if __name__ == "__main__":
    sys.exit(main(sys.argv[1:]))
