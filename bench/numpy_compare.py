#!/usr/bin/python3
"""The off-axis loop field in lean numpy and scipy, against field-bench's loop_offaxis.

Runs field-bench for loop_offaxis on its fixed points (1,000,000 by default), reads the same
points back (field-bench --write-points), evaluates the textbook elliptic-integral formula
(W. R. Smythe, Static and Dynamic Electricity, 1950; J. D. Jackson, Classical
Electrodynamics, sec. 5.5) in its leanest numpy form - scipy.special.ellipk and ellipe once
each, the shared distances once, one expression each for Bz and Br - and prints both costs per
point and their ratio. Both sides are timed warm, in this thread's processor time, best of
--passes passes; the two sides run in alternating rounds (the best over all rounds is printed)
so that a busy machine affects both alike. Also prints how far the two results are apart, to
show they compute the same field (the textbook form loses digits near the axis and far away,
so some difference there is expected from it).

Run with Debian's python (numpy, scipy):
    /usr/bin/python3 bench/numpy_compare.py [--bench build/bench/field-bench] [--points N]
                                            [--passes P] [--rounds R]
"""
import argparse
import os
import pathlib
import subprocess
import tempfile
import time

import numpy as np
from scipy.special import ellipe, ellipk

MU0 = 1.25663706127e-6  # CODATA 2022, as engine/include/coilwright/constants.hpp
# The loop field-bench uses (bench/field_bench.cpp: kLoop).
RADIUS, TURNS, CURRENT = 0.1, 100.0, 1.5


def lean_field(z, r, a=RADIUS, c=MU0 * TURNS * CURRENT / (2 * np.pi)):
    """Bz, Br of a thin loop: the textbook formula with the fewest whole-array operations."""
    beta2 = (a + r) ** 2 + z * z
    m = 4 * a * r / beta2  # parameter m = k^2 in scipy's convention
    K, E = ellipk(m), ellipe(m)
    q, alpha2, s = c / np.sqrt(beta2), beta2 - 4 * a * r, r * r + z * z
    with np.errstate(invalid="ignore", divide="ignore"):  # Br at r = 0 (not among the points)
        return q * (K + (a * a - s) / alpha2 * E), q * z / r * ((a * a + s) / alpha2 * E - K)


def best_numpy_ns(z, r, passes):
    lean_field(z, r)  # warm-up
    best = float("inf")
    for _ in range(passes):
        t0 = time.thread_time()
        lean_field(z, r)
        best = min(best, time.thread_time() - t0)
    return best / len(z) * 1e9


def main():
    root = pathlib.Path(__file__).resolve().parents[1]
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--bench", default=str(root / "build" / "bench" / "field-bench"))
    ap.add_argument("--points", type=int, default=1000000)
    ap.add_argument("--passes", type=int, default=7, help="timed passes of each side per round (best taken)")
    ap.add_argument("--rounds", type=int, default=3, help="alternating rounds of the two sides (best taken)")
    args = ap.parse_args()

    with tempfile.TemporaryDirectory() as tmp:
        points_file, field_file = os.path.join(tmp, "points"), os.path.join(tmp, "field")
        numpy_ns, bench_ns = [], []
        for _ in range(args.rounds):
            out = subprocess.run([args.bench, "--kernel", "loop_offaxis", "--points", str(args.points),
                                  "--repeat", str(args.passes), "--best", "--write-points", points_file,
                                  "--write-field", field_file],
                                 check=True, capture_output=True, text=True).stdout
            name, ns = out.split()
            assert name == "loop_offaxis"
            bench_ns.append(float(ns))
            zr = np.fromfile(points_file, dtype="<f8").reshape(2, -1)
            numpy_ns.append(best_numpy_ns(zr[0], zr[1], args.passes))
        field = np.fromfile(field_file, dtype="<f8").reshape(2, -1)

    bz_np, br_np = lean_field(zr[0], zr[1])
    scale = np.hypot(field[0], field[1])
    worst = max(np.max(np.abs(bz_np - field[0]) / scale), np.max(np.abs(br_np - field[1]) / scale))
    numpy_best, bench_best = min(numpy_ns), min(bench_ns)
    print(f"numpy_scipy_loop_offaxis {numpy_best:.1f}")
    print(f"loop_offaxis {bench_best:.1f}")
    print(f"ratio numpy_scipy/loop_offaxis {numpy_best / bench_best:.1f}")
    print(f"# {args.points} points; best of {args.rounds} alternating rounds x {args.passes} passes "
          f"(processor time, ns per point); largest difference numpy - engine: {worst:.1e} of |B|")


if __name__ == "__main__":
    main()
