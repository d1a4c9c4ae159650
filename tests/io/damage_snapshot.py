"""Copies a brume snapshot and damages the copy in one way, with h5py (Debian's python3-h5py):
    damage_snapshot.py SOURCE TARGET KIND
KIND: drop_time (root attribute), drop_momentum_y (dataset), reshape_density (one cell more
along x), integer_density (same shape, integer type), format (another format text), nan_density
(one NaN), kick_face_x (adds 1 to one x-face value: a divergence), drop_unit (attribute of a
dataset), foreign (a new HDF5 file of someone else's, with none of brume's attributes). Exit code
0 when the damage was done."""
import shutil
import sys

import h5py
import numpy as np

source, target, kind = sys.argv[1], sys.argv[2], sys.argv[3]
shutil.copyfile(source, target)
if kind == "foreign":
    with h5py.File(target, "w") as f:
        f.attrs["creator"] = "another program"
        f["temperature"] = np.arange(24.0).reshape(2, 3, 4)
    sys.exit(0)


def replace(fields, name, data):
    attrs = dict(fields[name].attrs)
    del fields[name]
    fields[name] = data
    for key, value in attrs.items():
        fields[name].attrs[key] = value


with h5py.File(target, "r+") as f:
    fields = f["fields"]
    if kind == "drop_time":
        del f.attrs["time"]
    elif kind == "drop_momentum_y":
        del fields["momentum_y"]
    elif kind == "reshape_density":
        rho = fields["density"][...]
        replace(fields, "density", np.concatenate([rho, rho[:, :, :1]], axis=2))
    elif kind == "integer_density":
        replace(fields, "density", np.zeros(fields["density"].shape, dtype=np.int32))
    elif kind == "format":
        f.attrs["format"] = "brume checkpoint 9"
    elif kind == "nan_density":
        rho = fields["density"]
        rho[0, 0, 0] = np.nan
    elif kind == "kick_face_x":
        bx = fields["face_field_x"]
        k, j, i = bx.shape[0] // 2, bx.shape[1] // 2, bx.shape[2] // 2
        bx[k, j, i] = bx[k, j, i] + 1.0
    elif kind == "drop_unit":
        del fields["total_energy"].attrs["unit"]
    else:
        sys.exit("unknown damage " + kind)
