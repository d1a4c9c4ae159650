"""Compares `brume inspect --json` (parsed with Python's json module, RFC 8259) with the snapshot
as Debian's h5py and numpy read it:
    check_inspect_json.py JSON_FILE SNAPSHOT
Header values, every field's shape, type, unit and factor, its non-finite count and the min and
max of its finite values, the provenance and the configuration. Exit code 0 when all agree."""
import json
import sys

import h5py
import numpy as np

with open(sys.argv[1]) as text:
    report = json.load(text)
failures = []


def expect(condition, what):
    if not condition:
        failures.append(what)


def text(value):
    return value.decode() if isinstance(value, bytes) else str(value)


with h5py.File(sys.argv[2], "r") as f:
    a = f.attrs
    expect(report["format"] == text(a["format"]), "format")
    expect(report["reason"] == text(a["reason"]), "reason")
    expect(report["time"] == float(a["time"]), "time")
    expect(report["time_to_cgs"] == float(a["time_to_cgs"]), "time_to_cgs")
    expect(report["step"] == int(a["step"]), "step")
    expect(report["cells"] == [int(c) for c in a["cells"]], "cells")
    expect(report["lower"] == [float(x) for x in a["lower"]], "lower")
    expect(report["size"] == [float(x) for x in a["size"]], "size")
    expect(report["length_to_cgs"] == float(a["length_to_cgs"]), "length_to_cgs")
    expect(report["configuration"] == text(a["configuration"]), "configuration")
    expect(report["build"] == {k: text(v) for k, v in f["build"].attrs.items()}, "build")
    names = sorted(field["name"] for field in report["fields"])
    expect(names == sorted(f["fields"].keys()), f"fields {names}")
    for field in report["fields"]:
        d = f["fields"][field["name"]]
        v = d[...].astype(np.float64)
        finite = np.isfinite(v)
        where = field["name"]
        expect(field["shape"] == list(d.shape), where + " shape")
        expect(field["type"] == "float%d" % (8 * d.dtype.itemsize), where + " type")
        expect(field["unit"] == text(d.attrs["unit"]), where + " unit")
        expect(field["to_cgs"] == float(d.attrs["to_cgs"]), where + " to_cgs")
        expect(field["non_finite"] == int(v.size - finite.sum()), where + " non-finite count")
        expect(field["min"] == float(v[finite].min()), where + " min")
        expect(field["max"] == float(v[finite].max()), where + " max")
        expect(("deflate" in field["storage"]) == (d.compression == "gzip"), where + " storage")
    expect(report["sound"] is True and report["problems"] == [], "sound")

if failures:
    print("inspect --json disagrees with h5py: " + "; ".join(failures))
    sys.exit(1)
print("inspect --json agrees with h5py")
