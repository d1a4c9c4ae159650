"""Checks brume's XDMF files against the HDF5 files they describe:
    check_xdmf.py FOLDER
Every *.xmf in FOLDER is parsed with xml.etree (Python's standard library); every DataItem of
Format HDF must name, relative to the XDMF file, a dataset that exists (read with Debian's h5py)
with the stated Dimensions, NumberType and Precision. The grid must match the file's root
attributes: 3DCoRectMesh with cells + 1 nodes (or the face array's shape for a face grid),
ORIGIN_DXDYDZ origin and spacing listed slowest axis first like the Dimensions (XDMF model:
Topology, Geometry, Attribute and DataItem elements; Center Cell or Node), the Time the file's
time. snapshots.xmf must hold one temporal collection per grid, over every snapshot-NNNN.h5 in
order. Exit code 0 when all hold."""
import glob
import os
import sys
import xml.etree.ElementTree as ET

import h5py

folder = sys.argv[1]
failures = []


def expect(condition, what):
    if not condition:
        failures.append(what)


def numbers(text):
    return [float(x) for x in text.split()]


def check_uniform_grid(grid, place):
    topology = grid.find("Topology")
    geometry = grid.find("Geometry")
    expect(topology is not None and topology.get("TopologyType") == "3DCoRectMesh",
           place + ": topology 3DCoRectMesh")
    expect(geometry is not None and geometry.get("GeometryType") == "ORIGIN_DXDYDZ",
           place + ": geometry ORIGIN_DXDYDZ")
    if topology is None or geometry is None:
        return None
    nodes = [int(x) for x in topology.get("Dimensions").split()]
    items = geometry.findall("DataItem")
    expect(len(items) == 2, place + ": origin and spacing")
    origin, spacing = numbers(items[0].text), numbers(items[1].text)
    attributes = grid.findall("Attribute")
    expect(len(attributes) > 0, place + ": attributes")
    data_file = None
    for attribute in attributes:
        item = attribute.find("DataItem")
        name = attribute.get("Name")
        expect(item.get("Format") == "HDF", place + "/" + name + ": Format HDF")
        file_name, dataset = item.text.strip().split(":", 1)
        path = os.path.join(os.path.dirname(place.split("#")[0]), file_name)
        expect(os.path.exists(path), place + ": " + file_name + " exists")
        if not os.path.exists(path):
            continue
        data_file = path
        with h5py.File(path, "r") as f:
            expect(dataset in f, place + ": dataset " + dataset + " in " + file_name)
            if dataset not in f:
                continue
            d = f[dataset]
            dims = [int(x) for x in item.get("Dimensions").split()]
            expect(list(d.shape) == dims, f"{place}/{name}: shape {d.shape} vs Dimensions {dims}")
            expect(d.dtype.kind == "f" and item.get("NumberType") == "Float",
                   place + "/" + name + ": floating point")
            expect(d.dtype.itemsize == int(item.get("Precision")),
                   f"{place}/{name}: {d.dtype} vs Precision {item.get('Precision')}")
            center = attribute.get("Center")
            if center == "Cell":
                expect(dims == [n - 1 for n in nodes], place + "/" + name + ": cells of the grid")
            else:
                expect(center == "Node" and dims == nodes, place + "/" + name + ": grid nodes")
            cells = list(f.attrs["cells"])[::-1]  # slowest first, like Dimensions
            lower = list(f.attrs["lower"])[::-1]
            size = list(f.attrs["size"])[::-1]
            dx = [s / c for s, c in zip(size, cells)]
            expect(spacing == dx, f"{place}: spacing {spacing} vs {dx}")
            # A face array normal to axis a sits on the faces along a (when it has more than one
            # cell) and at the cell centres along the others.
            normal = {"face_field_x": 2, "face_field_y": 1, "face_field_z": 0}.get(name)
            want = [lo + (0.0 if (a == normal and cells[a] > 1) or center == "Cell" else 0.5 * h)
                    for a, (lo, h) in enumerate(zip(lower, dx))]
            expect(origin == want, f"{place}/{name}: origin {origin} vs {want}")
            time = grid.find("Time")
            expect(time is not None and float(time.get("Value")) == float(f.attrs["time"]),
                   place + ": time")
    return data_file


xmf_files = sorted(glob.glob(os.path.join(folder, "*.xmf")))
expect(len(xmf_files) > 0, "XDMF files in " + folder)
snapshots = sorted(glob.glob(os.path.join(folder, "snapshot-[0-9][0-9][0-9][0-9].h5")))
for xmf in xmf_files:
    root = ET.parse(xmf).getroot()
    expect(root.tag == "Xdmf" and root.get("Version") == "3.0", xmf + ": Xdmf version 3.0")
    domain = root.find("Domain")
    grids = domain.findall("Grid")
    expect(len(grids) in (1, 4), xmf + ": cells grid and, magnetized, three face grids")
    expect(grids[0].get("Name") == "cells", xmf + ": first grid is cells")
    if os.path.basename(xmf) == "snapshots.xmf":
        for collection in grids:
            expect(collection.get("GridType") == "Collection" and
                   collection.get("CollectionType") == "Temporal", xmf + ": temporal")
            members = collection.findall("Grid")
            files = [check_uniform_grid(g, xmf + "#" + collection.get("Name") + "/" +
                                        g.get("Name")) for g in members]
            expect(files == snapshots, f"{xmf}: series {files} vs {snapshots}")
    else:
        for g in grids:
            data_file = check_uniform_grid(g, xmf + "#" + g.get("Name"))
            expect(data_file is not None and
                   os.path.splitext(data_file)[0] == os.path.splitext(xmf)[0],
                   xmf + ": describes the HDF5 file beside it")

if failures:
    print("XDMF check failed:\n  " + "\n  ".join(failures))
    sys.exit(1)
print("XDMF check passed: " + ", ".join(os.path.basename(x) for x in xmf_files))
