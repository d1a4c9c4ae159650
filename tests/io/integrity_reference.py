"""Reference for io::check_integrity, computed with numpy from the file as h5py (both Debian's)
reads it:
    integrity_reference.py FILE
prints one line per field, "field NAME VALUES NON_FINITE MIN MAX" (the min and max of the finite
values), then "divergence VALUE" for a magnetized state: the largest |div B| dx / |B| over the cells (the divergence of the face field
from face differences over cell widths, times the smallest width of the axes with more than one
cell, over the largest |B| on the cell's faces; 0 where all faces are 0)."""
import sys

import h5py
import numpy as np

with h5py.File(sys.argv[1], "r") as f:
    cells = [int(c) for c in f.attrs["cells"]]
    size = [float(s) for s in f.attrs["size"]]
    for name, d in f["fields"].items():
        v = d[...].astype(np.float64)
        finite = np.isfinite(v)
        print("field", name, v.size, v.size - finite.sum(), repr(float(v[finite].min())),
              repr(float(v[finite].max())))
    if "face_field_x" in f["fields"]:
        b = [f["fields/face_field_" + a][...] for a in "xyz"]
        dx = [s / c for s, c in zip(size, cells)]
        width = min(dx[a] for a in range(3) if cells[a] > 1)
        total = np.zeros((cells[2], cells[1], cells[0]))
        scale = np.zeros_like(total)
        for a in range(3):
            axis = 2 - a  # numpy axis of x is the last
            n = cells[a]
            lower = np.take(b[a], range(0, n), axis=axis)
            upper = np.take(b[a], range(1, n + 1), axis=axis) if n > 1 else lower
            if n > 1:
                total += (width / dx[a]) * (upper - lower)
            scale = np.maximum(scale, np.maximum(np.abs(lower), np.abs(upper)))
        measure = np.where(scale > 0, np.abs(total) / np.where(scale > 0, scale, 1), 0)
        print("divergence", repr(float(measure.max())))
