"""Runs `brume bench scaling --json` on several ranks and checks the document's shape and
consistency, not speed:
    check_scaling_json.py RANKS CELLS STEPS COMMAND...
COMMAND is the whole mpiexec command line; RANKS, CELLS and STEPS are what it was given (ranks of
the job, --cells, --steps). The JSON is parsed with Python's json module (RFC 8259). Exit code 0
when every check passes."""
import json
import math
import subprocess
import sys

ranks, cells, steps = (int(word) for word in sys.argv[1:4])
run = subprocess.run(sys.argv[4:], capture_output=True, text=True, timeout=300)
if run.returncode != 0:
    sys.exit(f"exit code {run.returncode}\n{run.stdout}\n{run.stderr}")
document = json.loads(run.stdout)
failures = []


def expect(condition, what):
    if not condition:
        failures.append(what)


def close(a, b):
    # Figures are printed with 6 significant digits (%.6g): a relative 1e-5 covers two of them.
    return math.isclose(a, b, rel_tol=1e-5)


# PLM's stencil (solver/reconstruction.hpp) and the fields of a periodic ideal gas
# (solver/halo_exchange.cpp): ρ, three momenta, energy, and three face fields for MHD.
ghost_layers = 2
field_counts = {"mhd": 8, "hydro": 5}


def expected_halo(entry):
    """Messages and bytes one block sends per VL2 step (two ghost fills, two flag exchanges),
    counted from the message layout of solver/halo_exchange.cpp: along each axis split over more
    than one rank, one message to each side; planes span the storage of the two other axes
    (interior, 2 ghost layers on each side, one face slot); the message towards the lower
    neighbour carries one more layer of the face field normal to the axis. Common practice for a
    halo count, no source."""
    block = entry["block_cells"]
    fields = field_counts[entry["physics"]]
    staggered = 1 if entry["physics"] == "mhd" else 0
    extent = [n + 2 * ghost_layers + 1 for n in block]
    fill_messages = flag_messages = 0
    fill_doubles = flag_bytes = 0
    for axis in range(3):
        if entry["ranks_per_axis"][axis] == 1:
            continue
        plane = math.prod(extent[e] for e in range(3) if e != axis)
        interior_plane = math.prod(block[e] for e in range(3) if e != axis)
        fill_messages += 2
        fill_doubles += plane * (fields * ghost_layers + staggered) + plane * fields * ghost_layers
        flag_messages += 2
        flag_bytes += 2 * interior_plane  # one byte per cell of the first or last layer
    return 2 * (fill_messages + flag_messages), 2 * (8 * fill_doubles + flag_bytes)


expect(isinstance(document.get("cases"), list), "a list of cases")
for key in ("bytes_per_cell_source", "compiler", "flags"):
    expect(isinstance(document.get(key), str), key)
entries = document.get("cases", [])
text_fields = ("physics", "reconstruction", "riemann", "scaling")
integer_fields = ("cells", "cells_per_dimension", "ranks", "steps", "halo_messages_per_step",
                  "halo_bytes_per_step")
number_fields = ("seconds", "cell_updates_per_second_per_core",
                 "best_step_cell_updates_per_second_per_core", "bytes_per_cell", "efficiency",
                 "best_step_efficiency", "halo_seconds_per_step", "halo_share",
                 "reduction_seconds_per_step")
triple_fields = ("box_cells", "block_cells", "ranks_per_axis")
counts = [2**m for m in range(ranks.bit_length()) if 2**m <= ranks]
expected_series = {(series, physics, r) for series in ("strong", "weak")
                   for physics in ("mhd", "hydro") for r in counts}
found_series = set()
one_rank_rate = {}
for e in entries:
    name = f"{e.get('scaling')} {e.get('physics')} on {e.get('ranks')} ranks"
    shape_ok = all(isinstance(e.get(k), str) for k in text_fields) and \
        all(isinstance(e.get(k), int) for k in integer_fields) and \
        all(isinstance(e.get(k), (int, float)) for k in number_fields) and \
        all(isinstance(e.get(k), list) and len(e[k]) == 3 for k in triple_fields) and \
        isinstance(e.get("oversubscribed"), bool)
    expect(shape_ok, name + ": fields and their types")
    if not shape_ok:
        continue
    found_series.add((e["scaling"], e["physics"], e["ranks"]))
    expect(e["reconstruction"] == "plm", name + ": PLM")
    expect(e["riemann"] == {"mhd": "hlld", "hydro": "hllc"}[e["physics"]], name + ": solver")
    expect(e["steps"] == steps, name + ": steps as asked")
    expect(math.prod(e["ranks_per_axis"]) == e["ranks"], name + ": layout multiplies to ranks")
    expect(math.prod(e["box_cells"]) == e["cells"], name + ": cells of the box")
    expect(all(box == block * p for box, block, p in zip(e["box_cells"], e["block_cells"],
                                                         e["ranks_per_axis"])),
           name + ": blocks tile the box")
    size = e["box_cells"] if e["scaling"] == "strong" else e["block_cells"]
    expect(size == [cells] * 3 and e["cells_per_dimension"] == cells, name + ": --cells")
    # The per-core rate from the entry's own figures: box cells × steps / (seconds × ranks).
    expect(close(e["cell_updates_per_second_per_core"],
                 e["cells"] * e["steps"] / (e["seconds"] * e["ranks"])), name + ": rate")
    expect(close(e["halo_share"], e["halo_seconds_per_step"] / (e["seconds"] / e["steps"])),
           name + ": halo share of the mean step")
    expect(e["halo_seconds_per_step"] > 0 and e["reduction_seconds_per_step"] >= 0,
           name + ": communication times")
    # Not speed: the halo is timed on its own and a tiny box on a shared machine is noisy, so
    # the share is only required to be a positive, finite figure (no timed bound in a test).
    expect(0 < e["halo_share"] < math.inf, name + f": halo share {e['halo_share']}")
    expect((e["halo_messages_per_step"], e["halo_bytes_per_step"]) == expected_halo(e),
           name + f": halo traffic {e['halo_messages_per_step']} messages, "
           f"{e['halo_bytes_per_step']} bytes, expected {expected_halo(e)}")
    # The state alone holds `fields` arrays over the block's storage (ghosts and face slot).
    storage = math.prod(c + 2 * ghost_layers + 1 for c in e["block_cells"])
    state_bytes = 8 * field_counts[e["physics"]] * storage / math.prod(e["block_cells"])
    expect(e["bytes_per_cell"] > state_bytes, name + ": bytes per cell above the state's")
    if e["ranks"] == 1:
        # A ratio of a rate to itself: exactly 1.
        expect(e["efficiency"] == 1 and e["best_step_efficiency"] == 1, name + ": efficiency 1")
        one_rank_rate[(e["scaling"], e["physics"])] = e["cell_updates_per_second_per_core"]
for e in entries:
    if not all(isinstance(e.get(k), (int, float)) for k in number_fields):
        continue
    name = f"{e.get('scaling')} {e.get('physics')} on {e.get('ranks')} ranks"
    base = one_rank_rate.get((e.get("scaling"), e.get("physics")))
    expect(base is not None, name + ": a one-rank entry of its series")
    if base is None:
        continue
    # Efficiency: per-core rate over the one-rank per-core rate (common practice, no source).
    expect(close(e["efficiency"], e["cell_updates_per_second_per_core"] / base),
           name + ": efficiency from the rates")
    # Not speed: a positive, finite figure (timings on a shared machine bound nothing).
    expect(0 < e["efficiency"] < math.inf and 0 < e["best_step_efficiency"] < math.inf,
           name + f": efficiency {e['efficiency']} positive and finite")
expect(found_series == expected_series and len(entries) == len(expected_series),
       f"one entry per series and rank count: {sorted(found_series)}")
if failures:
    print(run.stdout)
    sys.exit("failed: " + "; ".join(failures))
print(f"{len(entries)} entries checked")
