"""Checks the figures `brume plot` drew for tests/cli/plot_test.cpp, and the temperature the
plotting script derives from a snapshot against brume's own overview of the same state.

usage: check_plot_figures.py RUN_FOLDER FIGURES_FOLDER
"""
import importlib.util
import os
import struct
import sys

import h5py
import matplotlib

matplotlib.use("Agg")
import matplotlib.image  # noqa: E402
import numpy as np  # noqa: E402

# Every figure of a stirred, magnetized, cooling run (docs/plots.md).
EXPECTED = ["timeline-energies.png", "timeline-budget.png", "timeline-phases.png",
            "timeline-mach.png", "density-pdf.png", "phase-diagram.png", "temperature-pdf.png",
            "beta-pdf.png", "field-density.png", "jeans.png", "spectra.png", "helmholtz.png",
            "structure-functions.png", "column-density.png", "polarization.png",
            "eb-spectra.png", "slices.png"]
PNG_SIGNATURE = b"\x89PNG\r\n\x1a\n"  # PNG specification (ISO/IEC 15948:2004), section 5.2
MINIMUM_BYTES = 15_000  # a figure with axes, labels and data: every one measured is above 25 kB
MINIMUM_SIDE = 400  # pixels: the smallest figure is 7 in × 4.5 in at 110 dpi (770 × 495)


def check_png(path, failures):
    with open(path, "rb") as f:
        head = f.read(24)
    size = os.path.getsize(path)
    if head[:8] != PNG_SIGNATURE or head[12:16] != b"IHDR":
        return failures.append(f"{path}: not a PNG (signature or IHDR)")
    # IHDR: width and height, 4-byte big-endian integers after the chunk type (PNG spec. 11.2.2).
    width, height = struct.unpack(">II", head[16:24])
    pixels = matplotlib.image.imread(path)  # reference decoder: matplotlib (Pillow)
    if pixels.shape[:2] != (height, width):
        failures.append(f"{path}: IHDR {width}×{height} but decoded {pixels.shape}")
    if size < MINIMUM_BYTES or min(width, height) < MINIMUM_SIDE:
        failures.append(f"{path}: {size} bytes, {width}×{height}: too small for a figure")
    # A blank canvas has one colour; a drawn figure has many (common practice, no source).
    channels = np.round(pixels * 255).astype(np.uint32).reshape(-1, pixels.shape[-1])
    packed = sum(channels[:, c] << (8 * c) for c in range(min(channels.shape[1], 3)))
    colours = np.unique(packed).size  # distinct RGB values
    if colours < 50:
        failures.append(f"{path}: only {colours} colours: nothing drawn")
    print(f"{os.path.basename(path)}: {width}×{height}, {size} bytes, {colours} colours")


def load_plot_script():
    script = os.path.join(os.path.dirname(__file__), "..", "..", "scripts", "brume_plot.py")
    spec = importlib.util.spec_from_file_location("brume_plot", script)
    module = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(module)
    return module


def check_temperature(run, failures):
    """The script's T (slice_temperature on every plane) against the overview's extremes of the
    statistics file written with the same (last) snapshot: brume's C++ cell quantities."""
    plot = load_plot_script()
    snapshot = plot.numbered_files(run, "snapshot")[-1]
    statistics = plot.numbered_files(run, "statistics")[-1]
    with h5py.File(snapshot, "r") as snap, h5py.File(statistics, "r") as stats:
        if snap.attrs["step"] != stats.attrs["step"]:
            return failures.append(f"{snapshot} and {statistics} are of different steps")
        fields = snap["fields"]
        mu_mh = 1.27 * plot.HYDROGEN_MASS  # gas.mean_molecular_weight of tests/cli/plot_box.yaml
        temperatures = []
        for z in range(fields["density"].shape[0]):
            rho = plot.cgs_planes(fields["density"], z)[0]
            temperatures.append(plot.slice_temperature(fields, z, rho, mu_mh, 5.0 / 3.0))
        low, high = np.min(temperatures), np.max(temperatures)
        want_low = float(stats["overview/temperature_min"][()])
        want_high = float(stats["overview/temperature_max"][()])
    # 1e-9 relative: p = (γ−1)(E − ρv²/2 − B²/8π) loses digits in the subtraction, here
    # E/p ≈ 1.5 (nearly all thermal); cgs against code units rounds differently (~1e-15).
    for name, got, want in [("min", low, want_low), ("max", high, want_high)]:
        error = abs(got / want - 1)
        print(f"temperature {name}: script {got:.12g} K, overview {want:.12g} K, error {error:.2e}")
        if not error < 1e-9:
            failures.append(f"temperature {name}: {got} K against {want} K")


def main(run, figures):
    failures = []
    present = sorted(os.listdir(figures))
    for name in EXPECTED:
        if name not in present:
            failures.append(f"{name}: missing from {figures}")
        else:
            check_png(os.path.join(figures, name), failures)
    extra = sorted(set(present) - set(EXPECTED))
    if extra:
        failures.append(f"unexpected files in {figures}: {extra} (add them to docs/plots.md)")
    check_temperature(run, failures)
    for f in failures:
        print("FAIL:", f)
    print(f"{len(EXPECTED)} figures checked, {len(failures)} failures")
    return 1 if failures else 0


if __name__ == "__main__":
    sys.exit(main(sys.argv[1], sys.argv[2]))
