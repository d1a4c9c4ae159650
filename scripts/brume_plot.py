#!/usr/bin/python3
"""brume plot RUN_FOLDER [--out DIR]: the figures of a run folder, as PNG files.

Reads timeline.h5, the last statistics-NNNN.h5 and the last snapshot-NNNN.h5 of a run folder
(docs/statistics.md, docs/snapshots.md) and writes one PNG per figure into RUN_FOLDER/figures/
or DIR. The target folder must be absent or empty: brume never replaces figures (exit code 2).
A figure whose data is absent is skipped with one line on stderr. docs/plots.md lists them.
Run with Debian's /usr/bin/python3 (matplotlib, numpy, h5py, PyYAML).
"""
import argparse
import math
import os
import re
import sys

import matplotlib

matplotlib.use("Agg")
import h5py  # noqa: E402
import matplotlib.pyplot as plt  # noqa: E402
import numpy as np  # noqa: E402
import yaml  # noqa: E402
from matplotlib.colors import LogNorm, Normalize  # noqa: E402

# Constants as solver/units/constants.hpp has them (CODATA 2018, IAU 2015 B2, Julian year).
BOLTZMANN = 1.380649e-16  # erg/K
HYDROGEN_MASS = 1.00784 * 1.66053906660e-24  # g
PARSEC = 648000.0 / math.pi * 1.495978707e13  # cm
MEGAYEAR = 1.0e6 * 365.25 * 86400.0  # s
KM_PER_S = 1.0e5  # cm/s
DPI = 110


class BadInput(Exception):
    """Bad input from the user: printed as one line, exit code 2."""


def skip(name, why):
    print(f"brume plot: skipped {name}: {why}", file=sys.stderr)


def numbered_files(folder, stem):
    pattern = re.compile(re.escape(stem) + r"-(\d{4,})\.h5$")
    found = [(int(m.group(1)), f) for f in os.listdir(folder) if (m := pattern.match(f))]
    return [os.path.join(folder, f) for _, f in sorted(found)]


def cgs(dataset):
    """The values of a dataset times its to_cgs factor."""
    return np.asarray(dataset[()], dtype=float) * float(dataset.attrs.get("to_cgs", 1.0))


def cgs_planes(dataset, first, count=1):
    """Planes first … first + count − 1 of a [z][y][x] dataset times its to_cgs factor."""
    planes = np.asarray(dataset[first:first + count], dtype=float)
    return planes * float(dataset.attrs.get("to_cgs", 1.0))


def file_time_myr(h5):
    return float(h5.attrs["time"]) * float(h5.attrs["time_to_cgs"]) / MEGAYEAR


def save(fig, out, name, written):
    path = os.path.join(out, name)
    fig.savefig(path, dpi=DPI)
    plt.close(fig)
    written.append(name)


def per_log_bin(fraction, edges):
    """A histogram's fractions divided by the width in ln x of its bins: the PDF per unit ln x."""
    return np.asarray(fraction) / np.diff(np.log(edges))


def colour_scale(values):
    """Logarithmic colours for values spanning more than a decade, else linear ones."""
    low, high = np.nanmin(values), np.nanmax(values)
    return LogNorm(vmin=low, vmax=high) if high > 10 * low else Normalize(vmin=low, vmax=high)


def positive(values):
    """Zeros and negatives as NaN, so that log axes leave them out."""
    v = np.array(values, dtype=float)
    v[~(v > 0)] = np.nan
    return v


# --- time series -----------------------------------------------------------------------------


def timeline_energies(tl, out, written):
    t = tl["time"][()]
    fig, ax = plt.subplots(figsize=(7, 4.5))
    for key, label in [("kinetic_energy", "kinetic"), ("thermal_energy", "thermal"),
                       ("magnetic_energy_mean_field", "magnetic, mean field"),
                       ("magnetic_energy_fluctuating", "magnetic, fluctuating"),
                       ("total_energy", "total")]:
        if key in tl:
            ax.plot(t, positive(tl[key][()]), label=label, lw=2 if key == "total_energy" else 1.3)
    ax.set_yscale("log")
    ax.set_xlabel("t (Myr)")
    ax.set_ylabel("energy in the box (erg)")
    ax.set_title(f"Energies, t = 0 – {t[-1]:.3g} Myr")
    ax.legend()
    ax.grid(alpha=0.3)
    fig.tight_layout()
    save(fig, out, "timeline-energies.png", written)


def timeline_budget(tl, out, written):
    keys = [("stirring_work", "stirring work"), ("dissipated_energy", "dissipated"),
            ("radiated_energy", "radiated (cooling − heating)")]
    present = [(k, lab) for k, lab in keys if k in tl and np.any(tl[k][()] != 0)]
    if not present:
        return skip("timeline-budget.png", "no stirring work, dissipation or radiation recorded")
    t = tl["time"][()]
    fig, ax = plt.subplots(figsize=(7, 4.5))
    for key, label in present:
        ax.plot(t, tl[key][()], label=label)
    ax.axhline(0, color="k", lw=0.5)
    ax.set_xlabel("t (Myr)")
    ax.set_ylabel("energy since the start (erg)")
    ax.set_title(f"Energy budget (cumulative), t = 0 – {t[-1]:.3g} Myr")
    ax.legend()
    ax.grid(alpha=0.3)
    fig.tight_layout()
    save(fig, out, "timeline-budget.png", written)


def timeline_phases(tl, out, written):
    if "cold_volume_fraction" not in tl:
        return skip("timeline-phases.png", "no phase fractions in timeline.h5")
    t = tl["time"][()]
    cold, warm = tl["cold_below"][-1], tl["warm_above"][-1]
    fig, axes = plt.subplots(1, 2, figsize=(11, 4.2), sharey=True)
    for ax, weight in zip(axes, ["volume", "mass"]):
        for phase, colour, label in [("cold", "tab:blue", f"cold, T < {cold:.4g} K"),
                                     ("unstable", "tab:orange", "thermally unstable"),
                                     ("warm", "tab:red", f"warm, T > {warm:.4g} K")]:
            ax.plot(t, tl[f"{phase}_{weight}_fraction"][()], color=colour, label=label)
        ax.set_xlabel("t (Myr)")
        ax.set_title(f"{weight} fractions")
        ax.set_ylim(-0.02, 1.02)
        ax.grid(alpha=0.3)
    axes[0].set_ylabel("fraction of the box")
    axes[0].legend()
    fig.suptitle(f"Phases, t = 0 – {t[-1]:.3g} Myr")
    fig.tight_layout()
    save(fig, out, "timeline-phases.png", written)


def timeline_mach(tl, out, written):
    t = tl["time"][()]
    fig, axes = plt.subplots(1, 2, figsize=(11, 4.2))
    ax = axes[0]
    for key, label in [("sonic_mach_volume", "sonic, volume"), ("sonic_mach_mass", "sonic, mass"),
                       ("alfven_mach_volume", "Alfvén, volume"),
                       ("alfven_mach_mass", "Alfvén, mass")]:
        if key in tl and np.any(tl[key][()] > 0):
            ax.plot(t, tl[key][()], label=label, ls="--" if key.endswith("mass") else "-")
    ax.set_xlabel("t (Myr)")
    ax.set_ylabel("rms Mach number")
    ax.set_title("Mach numbers √⟨v²/c²⟩")
    ax.legend()
    ax.grid(alpha=0.3)
    ax = axes[1]
    ax.plot(t, tl["velocity_rms_volume"][()], label="volume weighted")
    ax.plot(t, tl["velocity_rms_mass"][()], ls="--", label="mass weighted")
    ax.set_xlabel("t (Myr)")
    ax.set_ylabel("rms velocity (km/s)")
    ax.set_title("rms velocity")
    ax.legend()
    ax.grid(alpha=0.3)
    fig.suptitle(f"Mach numbers and rms velocity, t = 0 – {t[-1]:.3g} Myr")
    fig.tight_layout()
    save(fig, out, "timeline-mach.png", written)


# --- distributions (last statistics file) ----------------------------------------------------


def pdf_panel(ax, group, name, xlabel, symbol):
    edges = group[f"{name}_edges"][()]
    centres = np.sqrt(edges[:-1] * edges[1:])
    for weight, style in [("volume", "-"), ("mass", "--")]:
        ax.step(centres, positive(per_log_bin(group[f"{name}_{weight}_fraction"][()], edges)),
                where="mid", ls=style, label=f"{weight} weighted")
    ax.set_xscale("log")
    ax.set_yscale("log")
    ax.set_xlabel(xlabel)
    ax.set_ylabel(f"PDF per unit ln {symbol}")
    ax.grid(alpha=0.3)


def density_pdf(dist, when, out, written):
    fig, ax = plt.subplots(figsize=(7, 4.5))
    pdf_panel(ax, dist, "density", "number density n (cm$^{-3}$)", "n")
    ax.set_title(f"Density PDF, {when}")
    ax.legend()
    fig.tight_layout()
    save(fig, out, "density-pdf.png", written)


def temperature_pdf(dist, overview, when, out, written):
    fig, ax = plt.subplots(figsize=(7, 4.5))
    pdf_panel(ax, dist, "temperature", "temperature T (K)", "T")
    for key, label in [("cold_below", "cold below"), ("warm_above", "warm above")]:
        if key in overview:
            value = float(overview[key][()])
            ax.axvline(value, color="grey", ls=":", lw=1)
            ax.annotate(f"{label} {value:.4g} K", (value, 0.02), xycoords=("data", "axes fraction"),
                        rotation=90, fontsize=8, color="grey", ha="right")
    ax.set_title(f"Temperature PDF, {when}")
    ax.legend()
    fig.tight_layout()
    save(fig, out, "temperature-pdf.png", written)


def beta_pdf(dist, when, out, written):
    if "plasma_beta_edges" not in dist:
        return skip("beta-pdf.png", "no magnetic histograms (hydrodynamic run)")
    fig, axes = plt.subplots(1, 2, figsize=(11, 4.2))
    pdf_panel(axes[0], dist, "plasma_beta", "plasma β = 2p/B² (thermal / magnetic pressure)",
              "β")
    axes[0].set_title("plasma β")
    pdf_panel(axes[1], dist, "dynamic_ratio", "ρv²/B² (dynamic / magnetic pressure)",
              "(ρv²/B²)")
    axes[1].set_title("dynamic over magnetic pressure")
    for ax in axes:
        ax.axvline(1, color="grey", ls=":", lw=1)
    axes[0].legend()
    fig.suptitle(f"Magnetization PDFs, {when}")
    fig.tight_layout()
    save(fig, out, "beta-pdf.png", written)


def histogram_2d(fig, ax, x_edges, y_edges, fraction, title):
    """A 2D histogram (shape [x bins][y bins]) per unit ln x ln y, on a logarithmic colour scale."""
    density = np.asarray(fraction) / np.outer(np.diff(np.log(x_edges)), np.diff(np.log(y_edges)))
    density = positive(density).T
    finite = density[np.isfinite(density)]
    if finite.size == 0:
        ax.text(0.5, 0.5, "empty", transform=ax.transAxes, ha="center")
        return
    norm = LogNorm(vmin=max(finite.min(), finite.max() * 1e-6), vmax=finite.max())
    mesh = ax.pcolormesh(x_edges, y_edges, np.ma.masked_invalid(density), norm=norm,
                         cmap="viridis", shading="flat")
    fig.colorbar(mesh, ax=ax, label="PDF per unit ln x ln y")
    ax.set_xscale("log")
    ax.set_yscale("log")
    ax.set_title(title)
    # The occupied bins and a decade around them: the rest of the range is empty.
    rows, cols = np.nonzero(np.isfinite(density))
    ax.set_xlim(max(x_edges[0], x_edges[cols.min()] / 10),
                min(x_edges[-1], x_edges[cols.max() + 1] * 10))
    ax.set_ylim(max(y_edges[0], y_edges[rows.min()] / 10),
                min(y_edges[-1], y_edges[rows.max() + 1] * 10))


def phase_diagram(dist, overview, when, out, written):
    n_edges, p_edges = dist["phase_density_edges"][()], dist["phase_pressure_edges"][()]
    fig, axes = plt.subplots(1, 2, figsize=(12, 4.8), sharey=True)
    for ax, weight in zip(axes, ["volume", "mass"]):
        histogram_2d(fig, ax, n_edges, p_edges, dist[f"phase_{weight}_fraction"][()],
                     f"{weight} weighted")
        if "phase_equilibrium_density" in dist:
            ax.plot(dist["phase_equilibrium_density"][()], dist["phase_equilibrium_pressure"][()],
                    color="red", lw=1.5, label="thermal equilibrium P_eq(n)")
        limits = ax.get_xlim(), ax.get_ylim()  # the isotherms must not widen them
        for key, colour in [("cold_below", "tab:blue"), ("warm_above", "tab:orange")]:
            if key in overview:
                temperature = float(overview[key][()])
                ax.plot(n_edges, n_edges * temperature, color=colour, ls="--", lw=0.8,
                        label=f"isotherm T = {temperature:.4g} K ({key})")
        ax.set_xlim(limits[0])
        ax.set_ylim(limits[1])
        ax.set_xlabel("number density n (cm$^{-3}$)")
    axes[0].set_ylabel("thermal pressure P/k$_B$ (K cm$^{-3}$)")
    axes[0].legend(fontsize=8, loc="upper left")
    if "phase_equilibrium_density" not in dist:
        skip("the equilibrium curve of phase-diagram.png", "cooling was off (no curve stored)")
    fig.suptitle(f"Pressure–density phase diagram, {when}")
    fig.tight_layout()
    save(fig, out, "phase-diagram.png", written)


def field_density(dist, when, out, written):
    if "field_density_density_edges" not in dist:
        return skip("field-density.png", "no magnetic histograms (hydrodynamic run)")
    n_edges = dist["field_density_density_edges"][()]
    b_edges = dist["field_density_field_edges"][()]
    fig, axes = plt.subplots(1, 2, figsize=(12, 4.8), sharey=True)
    for ax, weight in zip(axes, ["volume", "mass"]):
        histogram_2d(fig, ax, n_edges, b_edges, dist[f"field_density_{weight}_fraction"][()],
                     f"{weight} weighted")
        ax.set_xlabel("number density n (cm$^{-3}$)")
    axes[0].set_ylabel("field strength |B| (μG)")
    fig.suptitle(f"Field strength against density, {when}")
    fig.tight_layout()
    save(fig, out, "field-density.png", written)


def jeans_figure(jeans, when, out, written):
    edges = jeans["density_contrast_edges"][()]
    fig, ax = plt.subplots(figsize=(7, 4.5))
    pdf_panel(ax, jeans, "density_contrast", "density contrast ρ/ρ̄", "(ρ/ρ̄)")
    s_crit = float(jeans["critical_log_density"][()])
    if math.isfinite(s_crit):
        ax.axvline(math.exp(s_crit), color="red", ls="--",
                   label=f"critical density (KM), s_crit = {s_crit:.3g}")
    fraction = float(jeans["mass_fraction_below_truelove"][()])
    rate = float(jeans["star_formation_rate_per_free_fall"][()])
    ax.set_title(f"Jeans: density contrast PDF, {when}\nmass with λ_J < 4 cells: {fraction:.3g};"
                 f" SFR_ff estimate (no self-gravity): {rate:.3g}", fontsize=10)
    used = positive(jeans["density_contrast_volume_fraction"][()])
    rows = np.nonzero(np.isfinite(used))[0]
    if rows.size:  # the occupied bins, and the critical density
        low, high = edges[max(rows[0] - 5, 0)], edges[min(rows[-1] + 6, edges.size - 1)]
        if math.isfinite(s_crit):
            low, high = min(low, 0.5 * math.exp(s_crit)), max(high, 2 * math.exp(s_crit))
        ax.set_xlim(low, high)
    ax.legend(fontsize=8)
    fig.tight_layout()
    save(fig, out, "jeans.png", written)


# --- spectra and structure functions ---------------------------------------------------------


def nyquist_shell(h5):
    """n/2 of the axis with the fewest cells (of those with more than one cell)."""
    cells = [c for c in yaml.safe_load(h5.attrs["configuration"])["box"]["cells"] if c > 1]
    return min(cells) // 2


def spectra(spec, k_nyquist, when, out, written):
    """Shell spectra times k^(5/3), flat in a Kolmogorov inertial range (Kolmogorov 1941, Dokl.
    Akad. Nauk SSSR 30, 301; from memory)."""
    k = spec["wavenumber"][()]  # stored in units of 2π/L (to_cgs is 2π/L in cm^-1)
    shells = (k >= 1) & (k <= k_nyquist)
    kk = k[shells]
    comp = kk ** (5.0 / 3.0)
    fig, axes = plt.subplots(2, 2, figsize=(12, 8.5))

    def panel(ax, entries, scale, ylabel, compensate=True):
        for key, label in entries:
            if key in spec:
                values = cgs(spec[key])[shells] * scale
                ax.plot(kk, positive(values * (comp if compensate else 1.0)), marker=".",
                        label=label)
        ax.set_xscale("log")
        ax.set_yscale("log")
        ax.set_xlabel("wavenumber k (units of 2π/L)")
        ax.set_ylabel(ylabel)
        ax.grid(alpha=0.3)
        ax.legend(fontsize=8)

    panel(axes[0, 0], [("velocity_power", "v, total"), ("velocity_solenoidal_power", "solenoidal"),
                       ("velocity_compressive_power", "compressive")], 1 / KM_PER_S**2,
          "k$^{5/3}$ E$_v$(k)  ((km/s)$^2$)")
    axes[0, 0].set_title("velocity")
    panel(axes[0, 1], [("kinetic_energy_power", "kinetic, √ρ v"),
                       ("magnetic_field_power", "magnetic, B")], 1.0,
          "k$^{5/3}$ E(k)  (erg cm$^{-3}$)")
    axes[0, 1].set_title("energy densities")
    panel(axes[1, 0], [("cube_root_weighted_velocity_power", "ρ$^{1/3}$ v")], 1.0,
          "k$^{5/3}$ E(k)  (g$^{2/3}$ cm$^{-2}$ s$^{-2}$)")
    axes[1, 0].set_title("density-weighted velocity ρ$^{1/3}$v (Kritsuk et al. 2007)")
    panel(axes[1, 1], [("log_density_power", "ln ρ")], 1.0, "E$_{ln ρ}$(k) (not compensated)",
          compensate=False)
    axes[1, 1].set_title("log density")
    fig.suptitle(f"Power spectra per shell, compensated by k$^{{5/3}}$ (flat: Kolmogorov), {when};"
                 f" shells 1 … {k_nyquist} (Nyquist)")
    fig.tight_layout()
    save(fig, out, "spectra.png", written)


def helmholtz(spec, k_nyquist, when, out, written):
    """The compressive share per shell; 1/3 for random phases in 3D, one longitudinal of three
    components (common practice, no source)."""
    k = spec["wavenumber"][()]
    shells = (k >= 1) & (k <= k_nyquist)
    fig, ax = plt.subplots(figsize=(7, 4.5))
    ax.plot(k[shells], spec["velocity_compressive_ratio"][()][shells], marker="o",
            label="per shell")
    total = float(spec["velocity_compressive_ratio_total"][()])
    ax.axhline(total, color="tab:red", ls="--", label=f"all k > 0: {total:.3g}")
    ax.axhline(1 / 3, color="grey", ls=":", label="1/3: random phases, equipartition")
    ax.set_xscale("log")
    ax.set_ylim(0, 1)
    ax.set_xlabel("wavenumber k (units of 2π/L)")
    ax.set_ylabel("compressive / (solenoidal + compressive) power")
    ax.set_title(f"Helmholtz decomposition of the velocity, {when}")
    ax.legend()
    ax.grid(alpha=0.3)
    fig.tight_layout()
    save(fig, out, "helmholtz.png", written)


def structure_functions(sf, when, out, written):
    """S_2 with the guides ℓ^(2/3) (Kolmogorov 1941, from memory) and ℓ (shock-dominated,
    Burgers; common practice, no source), S_p^(1/p), F_3 and the cold-gas σ(ℓ)."""
    lag_pc = cgs(sf["lag_length"])[0] / PARSEC  # the x spacing; the axis mean assumes equal ones
    fig, axes = plt.subplots(2, 2, figsize=(12, 8.5))
    ax = axes[0, 0]
    for kind, style in [("longitudinal", "-"), ("transverse", "--")]:
        ax.plot(lag_pc, cgs(sf[f"{kind}_order_2"]) / KM_PER_S**2, ls=style, marker=".", label=kind)
    reference = cgs(sf["longitudinal_order_2"])[0] / KM_PER_S**2
    ax.plot(lag_pc, reference * (lag_pc / lag_pc[0]) ** (2 / 3), color="grey", ls=":",
            label="∝ ℓ$^{2/3}$ (Kolmogorov)")
    ax.plot(lag_pc, reference * (lag_pc / lag_pc[0]), color="grey", ls="-.",
            label="∝ ℓ (Burgers)")
    ax.set_ylabel("S$_2$(ℓ)  ((km/s)$^2$)")
    ax.set_title("second order")
    ax = axes[0, 1]
    order = 1
    while f"longitudinal_order_{order}" in sf:
        values = cgs(sf[f"longitudinal_order_{order}"]) / KM_PER_S**order
        ax.plot(lag_pc, positive(values) ** (1.0 / order), marker=".", label=f"p = {order}")
        order += 1
    ax.set_ylabel("S$_p$(ℓ)$^{1/p}$, longitudinal (km/s)")
    ax.set_title("orders 1 … p")
    ax = axes[1, 0]
    flux = cgs(sf["flux_third_order"])  # g s^-3, docs/structure-functions.md
    ax.plot(lag_pc, flux, marker=".", label="F$_3$ = ⟨δ(ρv$_∥$) |δv|²⟩")
    ax.axhline(0, color="k", lw=0.5)
    ax.set_yscale("symlog", linthresh=max(np.nanmax(np.abs(flux)) * 1e-3, 1e-300))
    ax.set_ylabel("F$_3$(ℓ)  (g s$^{-3}$)")
    ax.set_title("flux-based third order (signed)")
    ax = axes[1, 1]
    sigma = cgs(sf["cold_velocity_dispersion"]) / KM_PER_S
    if np.any(np.isfinite(sigma) & (sigma > 0)):
        ax.plot(lag_pc, positive(sigma), marker="o", label="σ(ℓ) of cold pairs")
        slope = float(sf["size_linewidth_slope"][()])
        if math.isfinite(slope):
            error = float(sf["size_linewidth_slope_error"][()])
            ax.plot(lag_pc, np.nanmax(sigma) * (lag_pc / lag_pc[-1]) ** slope, color="grey",
                    ls=":", label=f"fitted slope {slope:.2f} ± {error:.2f}")
        else:
            ax.text(0.95, 0.05, "size–linewidth slope not fitted (too few cold pairs)",
                    transform=ax.transAxes, fontsize=8, ha="right")
        ax.set_ylabel("cold-gas velocity dispersion σ(ℓ) (km/s)")
    else:
        ax.text(0.5, 0.5, "no pairs of cold cells", transform=ax.transAxes, ha="center")
    ax.set_title(f"cold gas, T < {float(sf['cold_temperature'][()]):.4g} K")
    for ax in axes.flat:
        ax.set_xscale("log")
        if ax is not axes[1, 0] and ax.lines:
            ax.set_yscale("log")
        ax.set_xlabel("lag ℓ (pc)")
        ax.grid(alpha=0.3)
        if ax.lines:
            ax.legend(fontsize=8)
    fig.suptitle(f"Velocity structure functions (axis means), {when}")
    fig.tight_layout()
    save(fig, out, "structure-functions.png", written)


# --- sky maps (last statistics file) ---------------------------------------------------------

MAP_AXES = {"x": ("y", "z"), "y": ("z", "x"), "z": ("x", "y")}  # line of sight: (u, v)


def sky_axes(sky):
    return [a for a in "xyz" if f"column_density_along_{a}" in sky]


def polarized(sky, axes):
    """Whether any map has Q or U: a hydrodynamic run has none (docs/sky-maps.md)."""
    return any(np.any(sky[f"stokes_{s}_along_{a}"][()] != 0) for a in axes for s in "qu")


def map_extent(box_pc, axis):
    """imshow extent of a map along `axis`, in pc when the box size is known, else in cells."""
    if box_pc is None:
        return None, "cells"
    u, v = MAP_AXES[axis]
    return [0, box_pc["xyz".index(u)], 0, box_pc["xyz".index(v)]], "pc"


def column_density(sky, box_pc, when, out, written):
    axes_present = sky_axes(sky)
    fig, axes = plt.subplots(1, len(axes_present), figsize=(5 * len(axes_present) + 1, 4.6),
                             squeeze=False)
    for ax, axis in zip(axes[0], axes_present):
        column = positive(sky[f"column_density_along_{axis}"][()])
        extent, unit = map_extent(box_pc, axis)
        image = ax.imshow(column, origin="lower", extent=extent, cmap="magma",
                          norm=colour_scale(column))
        fig.colorbar(image, ax=ax, label="column density N (cm$^{-2}$)", shrink=0.85)
        u, v = MAP_AXES[axis]
        ax.set_xlabel(f"{u} ({unit})")
        ax.set_ylabel(f"{v} ({unit})")
        ax.set_title(f"along {axis}")
    fig.suptitle(f"Column density N = ∫ n ds, {when}")
    fig.tight_layout()
    save(fig, out, "column-density.png", written)


def polarization(sky, box_pc, when, out, written):
    axes_present = sky_axes(sky)
    if not polarized(sky, axes_present):
        return skip("polarization.png", "Q = U = 0 (no magnetic field)")
    p0 = float(sky["polarization_fraction"][()])
    fig, axes = plt.subplots(1, len(axes_present), figsize=(5 * len(axes_present) + 1, 4.8),
                             squeeze=False)
    for ax, axis in zip(axes[0], axes_present):
        column = positive(sky[f"column_density_along_{axis}"][()])
        extent, unit = map_extent(box_pc, axis)
        rows, cols = column.shape
        width_u = (extent[1] - extent[0]) / cols if extent else 1.0
        width_v = (extent[3] - extent[2]) / rows if extent else 1.0
        image = ax.imshow(column, origin="lower", extent=extent or [0, cols, 0, rows], cmap="bone",
                          norm=colour_scale(column))
        fig.colorbar(image, ax=ax, label="column density N (cm$^{-2}$)", shrink=0.85)
        # Plane-of-sky field orientation, IAU (from north +v through east −u): (−sin, cos).
        angle = np.radians(sky[f"field_angle_along_{axis}"][()])
        fraction = sky[f"polarization_fraction_along_{axis}"][()]
        stride = max(1, max(rows, cols) // 24)
        vv, uu = np.mgrid[0:rows:stride, 0:cols:stride]
        a, p = angle[vv, uu], fraction[vv, uu] / p0
        length = 0.9 * stride * p
        du, dv = -np.sin(a) * length * width_u, np.cos(a) * length * width_v
        cu, cv = (uu + 0.5) * width_u, (vv + 0.5) * width_v
        ax.quiver(cu, cv, du, dv, angles="xy", scale_units="xy", scale=1, pivot="middle",
                  headwidth=0, headlength=0, headaxislength=0, color="orangered", width=0.004)
        u, v = MAP_AXES[axis]
        ax.set_xlabel(f"{u} ({unit})   [east ←]")
        ax.set_ylabel(f"{v} ({unit})   [north ↑]")
        ax.set_title(f"along {axis}: mean p = {np.mean(fraction):.3g}")
    fig.suptitle("Column density and plane-of-sky field orientation (ψ + 90°, IAU; segment "
                 "length ∝ "
                 f"p/p$_0$, p$_0$ = {p0:g}), {when}", fontsize=10)
    fig.tight_layout()
    save(fig, out, "polarization.png", written)


def eb_spectra(sky, when, out, written):
    """C_TT, C_EE, C_BB per map with the slopes brume fitted (docs/sky-maps.md)."""
    axes_present = [a for a in sky_axes(sky) if f"spectrum_ee_along_{a}" in sky]
    if not axes_present:
        return skip("eb-spectra.png", "no map spectra (maps thinner than two cells)")
    if not polarized(sky, axes_present):
        return skip("eb-spectra.png", "Q = U = 0 (no magnetic field): no E and B modes")
    fig, axes = plt.subplots(1, len(axes_present), figsize=(5 * len(axes_present) + 1, 4.6),
                             squeeze=False)
    for ax, axis in zip(axes[0], axes_present):
        kappa = sky[f"spectrum_wavenumber_along_{axis}"][()]
        low = float(sky[f"fit_lowest_along_{axis}"][()])
        high = float(sky[f"fit_highest_along_{axis}"][()])
        annulus = np.arange(1, kappa.size + 1)
        fitted = (annulus >= low) & (annulus <= high)
        for name, colour in [("tt", "k"), ("ee", "tab:blue"), ("bb", "tab:red")]:
            c = positive(sky[f"spectrum_{name}_along_{axis}"][()])
            slope = float(sky[f"slope_{name}_along_{axis}"][()])
            ax.plot(kappa, c, marker=".", color=colour,
                    label=f"{name.upper()}, slope {slope:.2f}")
            use = fitted & np.isfinite(c)
            if math.isfinite(slope) and np.any(use):
                # The stored slope; its amplitude by least squares in log space (common practice).
                amplitude = np.mean(np.log(c[use]) - slope * np.log(kappa[use]))
                ax.plot(kappa[use], np.exp(amplitude) * kappa[use] ** slope, color=colour, ls=":")
        ax.axvspan(low - 0.5, high + 0.5, color="grey", alpha=0.1, label="fit range")
        ax.set_xscale("log")
        ax.set_yscale("log")
        ax.set_xlabel("map wavenumber κ (units of 2π/L)")
        ax.set_ylabel("C(κ) (cm$^{-2}$)")
        ratio = float(sky[f"bb_over_ee_along_{axis}"][()])
        ax.set_title(f"along {axis}: BB/EE = {ratio:.3g}")
        ax.legend(fontsize=8)
        ax.grid(alpha=0.3)
    fig.suptitle(f"Dust-polarization power spectra TT, EE, BB (dotted: fitted power laws), {when}")
    fig.tight_layout()
    save(fig, out, "eb-spectra.png", written)


# --- the last snapshot -----------------------------------------------------------------------


def snapshot_slices(path, out, written):
    with h5py.File(path, "r") as snap:
        fields = snap["fields"]
        config = yaml.safe_load(snap.attrs["configuration"])
        gas = config["gas"]
        size = np.asarray(snap.attrs["size"], dtype=float)
        box_pc = size * float(snap.attrs["length_to_cgs"]) / PARSEC
        when = f"{os.path.basename(path)}, t = {file_time_myr(snap):.3g} Myr"
        nz = fields["density"].shape[0]
        z = nz // 2
        z_pc = (z + 0.5) * box_pc[2] / nz
        rho = cgs_planes(fields["density"], z)[0]  # g cm^-3
        mu_mh = float(gas["mean_molecular_weight"]) * HYDROGEN_MASS
        n = rho / mu_mh
        panels = [(n, "number density n (cm$^{-3}$)", "viridis")]
        if "total_energy" in fields:
            panels.append((slice_temperature(fields, z, rho, mu_mh, float(gas["adiabatic_index"])),
                           "temperature T (K)", "inferno"))
        else:
            skip("the temperature slice of slices.png", "isothermal gas (no total_energy)")
    fig, axes = plt.subplots(1, len(panels), figsize=(5.5 * len(panels) + 0.5, 4.6), squeeze=False)
    for ax, (values, label, cmap) in zip(axes[0], panels):
        v = positive(values)
        image = ax.imshow(v, origin="lower", extent=[0, box_pc[0], 0, box_pc[1]], cmap=cmap,
                          norm=colour_scale(v))
        fig.colorbar(image, ax=ax, label=label, shrink=0.85)
        ax.set_xlabel("x (pc)")
        ax.set_ylabel("y (pc)")
    fig.suptitle(f"Slices at z = {z_pc:.3g} pc (cell {z} of {nz}), {when}")
    fig.tight_layout()
    save(fig, out, "slices.png", written)


def slice_temperature(fields, z, rho, mu_mh, gamma):
    """T = p μ m_H/(ρ k_B), p = (γ − 1)(E − ρv²/2 − B²/8π) in cgs; B the face average.

    Plane z of the snapshot (docs/snapshots.md); p = n k_B T with one μ, as docs/cooling.md."""
    energy = cgs_planes(fields["total_energy"], z)[0]
    kinetic = sum(cgs_planes(fields[f"momentum_{a}"], z)[0] ** 2 for a in "xyz") / (2 * rho)
    magnetic = 0.0
    if "face_field_x" in fields:  # gauss; an axis with one cell has no extra face
        nz, ny, nx = fields["density"].shape
        bx = cgs_planes(fields["face_field_x"], z)[0]
        bx = 0.5 * (bx[:, :-1] + bx[:, 1:]) if bx.shape[1] == nx + 1 else bx
        by = cgs_planes(fields["face_field_y"], z)[0]
        by = 0.5 * (by[:-1] + by[1:]) if by.shape[0] == ny + 1 else by
        bz = fields["face_field_z"]
        bz = cgs_planes(bz, z, 2).mean(axis=0) if bz.shape[0] == nz + 1 else cgs_planes(bz, z)[0]
        magnetic = (bx**2 + by**2 + bz**2) / (8 * math.pi)
    pressure = (gamma - 1) * (energy - kinetic - magnetic)
    return pressure * mu_mh / (rho * BOLTZMANN)


# --- the program -----------------------------------------------------------------------------


def figures_folder(run, out):
    """The folder to write into: absent or empty, never one with files in it (exit code 2)."""
    folder = out if out else os.path.join(run, "figures")
    if os.path.exists(folder):
        if not os.path.isdir(folder):
            raise BadInput(f"{folder}: exists and is not a folder (choose another with --out DIR)")
        if os.listdir(folder):
            raise BadInput(f"{folder}: exists and is not empty; brume plot never replaces figures "
                           "(remove it or choose another folder with --out DIR)")
    else:
        os.makedirs(folder)
    return folder


def plot_timeline(run, out, written):
    path = os.path.join(run, "timeline.h5")
    if not os.path.exists(path):
        return skip("timeline-*.png", f"no {path}")
    with h5py.File(path, "r") as tl:
        if tl["time"].shape[0] < 2:
            return skip("timeline-*.png", f"{path} has fewer than two rows")
        timeline_energies(tl, out, written)
        timeline_budget(tl, out, written)
        timeline_phases(tl, out, written)
        timeline_mach(tl, out, written)


def plot_statistics(path, out, written):
    with h5py.File(path, "r") as stats:
        when = f"{os.path.basename(path)}, t = {file_time_myr(stats):.3g} Myr"
        overview = stats["overview"] if "overview" in stats else {}
        box_pc = box_size_pc(stats)
        if "distributions" in stats:
            dist = stats["distributions"]
            density_pdf(dist, when, out, written)
            phase_diagram(dist, overview, when, out, written)
            temperature_pdf(dist, overview, when, out, written)
            beta_pdf(dist, when, out, written)
            field_density(dist, when, out, written)
        else:
            skip("density-pdf.png, phase-diagram.png, ...", f"no group distributions in {path}")
        if "jeans" in stats:
            jeans_figure(stats["jeans"], when, out, written)
        else:
            skip("jeans.png", f"no group jeans in {path}")
        if "spectra" in stats:
            k_nyquist = nyquist_shell(stats)
            spectra(stats["spectra"], k_nyquist, when, out, written)
            helmholtz(stats["spectra"], k_nyquist, when, out, written)
        else:
            skip("spectra.png, helmholtz.png", f"no group spectra in {path}")
        if "structure_functions" in stats:
            structure_functions(stats["structure_functions"], when, out, written)
        else:
            skip("structure-functions.png", f"no group structure_functions in {path}")
        if "sky_maps" in stats and sky_axes(stats["sky_maps"]):
            column_density(stats["sky_maps"], box_pc, when, out, written)
            polarization(stats["sky_maps"], box_pc, when, out, written)
            eb_spectra(stats["sky_maps"], when, out, written)
        else:
            skip("column-density.png, polarization.png, eb-spectra.png",
                 f"no group sky_maps in {path}")


def box_size_pc(stats):
    """The box edges in pc from the stored configuration ("20 pc", "1 kpc"), or None."""
    factors = {"pc": 1.0, "kpc": 1.0e3, "Mpc": 1.0e6, "cm": 1.0 / PARSEC, "km": 1.0e5 / PARSEC}
    try:
        sizes = yaml.safe_load(stats.attrs["configuration"])["box"]["size"]
        return [float(s.split()[0]) * factors[s.split()[1]] for s in sizes]
    except (KeyError, IndexError, ValueError, AttributeError, TypeError):
        return None


def main(argv):
    parser = argparse.ArgumentParser(prog="brume plot", description=__doc__.splitlines()[0])
    parser.add_argument("run_folder")
    parser.add_argument("--out", help="folder for the figures (default RUN_FOLDER/figures)")
    args = parser.parse_args(argv)
    run = args.run_folder
    if not os.path.isdir(run):
        raise BadInput(f"{run}: no such run folder")
    statistics = numbered_files(run, "statistics")
    snapshots = numbered_files(run, "snapshot")
    if not statistics and not snapshots and not os.path.exists(os.path.join(run, "timeline.h5")):
        raise BadInput(f"{run}: not a run folder (no timeline.h5, statistics-NNNN.h5 or "
                       "snapshot-NNNN.h5 in it)")
    out = figures_folder(run, args.out)
    written = []
    plot_timeline(run, out, written)
    if statistics:
        plot_statistics(statistics[-1], out, written)
    else:
        skip("the statistics figures", f"no statistics-NNNN.h5 in {run}")
    if snapshots:
        snapshot_slices(snapshots[-1], out, written)
    else:
        skip("slices.png", f"no snapshot-NNNN.h5 in {run}")
    print(f"brume plot: {len(written)} figures written to {out}: {', '.join(written)}")
    return 0


if __name__ == "__main__":
    try:
        sys.exit(main(sys.argv[1:]))
    except BadInput as error:
        print(f"brume plot: error: {error}", file=sys.stderr)
        sys.exit(2)
