"""Reads a snapshot written by tests/io/snapshot_test.cpp with h5py (Debian's python3-h5py, the
reference reader) and checks shapes, values and unit attributes:
    check_snapshot.py FILE NX NY NZ [DEFLATE_LEVEL]
With a level every dataset must be chunked, shuffled, deflated (h5py calls it gzip) at that level
and checksummed (Fletcher-32); without, contiguous and unfiltered. Exit code 0 when all hold."""
import sys

import h5py
import numpy as np

path, nx, ny, nz = sys.argv[1], int(sys.argv[2]), int(sys.argv[3]), int(sys.argv[4])
level = int(sys.argv[5]) if len(sys.argv) > 5 else None
failures = []


def expect(condition, what):
    if not condition:
        failures.append(what)


with h5py.File(path, "r") as f:
    expect(f.attrs["format"] == b"brume snapshot 1" or f.attrs["format"] == "brume snapshot 1",
           "format attribute")
    expect(f.attrs["step"] == 7, "step attribute")
    expect(abs(f.attrs["time"] - 0.25) == 0.0, "time attribute")
    expect(list(f.attrs["cells"]) == [nx, ny, nz], "cells attribute")
    expect("commit" in f["build"].attrs, "build provenance")
    expect("box:" in str(f.attrs["configuration"]), "configuration attribute")
    rho = f["fields/density"]
    expect(rho.shape == (nz, ny, nx), f"density shape {rho.shape}")
    expect(rho.attrs["unit"] in (b"g cm^-3", "g cm^-3"), "density unit")
    expect(rho.attrs["to_cgs"] == 2.0e-24, "density to_cgs")
    k, j, i = np.meshgrid(np.arange(nz), np.arange(ny), np.arange(nx), indexing="ij")
    expect(np.array_equal(rho[...], 1.0 + i + 10.0 * j + 100.0 * k), "density values")
    bx = f["fields/face_field_x"]
    expect(bx.shape == (nz, ny, nx + 1), f"face_field_x shape {bx.shape}")
    ki, ji, ii = np.meshgrid(np.arange(nz), np.arange(ny), np.arange(nx + 1), indexing="ij")
    expect(np.array_equal(bx[...], 0.5 * ii - ji + 3.0 * ki), "face_field_x values")
    expect(f["fields/face_field_y"].shape == (nz, ny + 1, nx), "face_field_y shape")
    expect(f["fields/face_field_z"].shape == (nz + 1, ny, nx), "face_field_z shape")
    expect(f["fields/momentum_y"].attrs["unit"] in (b"g cm^-2 s^-1", "g cm^-2 s^-1"),
           "momentum unit")
    for name, d in f["fields"].items():
        if level is None:
            expect(d.chunks is None and d.compression is None, name + " contiguous")
        else:
            expect(d.chunks is not None and d.compression == "gzip" and
                   d.compression_opts == level and d.shuffle and d.fletcher32,
                   f"{name} chunked {d.chunks}, {d.compression} {d.compression_opts}, "
                   f"shuffle {d.shuffle}, fletcher32 {d.fletcher32}")

if failures:
    print("snapshot check failed: " + "; ".join(failures))
    sys.exit(1)
print("snapshot check passed")
