#!/usr/bin/python3
"""The off-axis loop field vectorised with numpy and scipy, against field-bench's loop_offaxis.

Runs field-bench for loop_offaxis on its fixed points, reads the same points back, evaluates
the textbook elliptic-integral formula (W. R. Smythe, Static and Dynamic Electricity, 1950;
J. D. Jackson, Classical Electrodynamics, sec. 5.5) with scipy.special.ellipk/ellipe over
whole numpy arrays, and prints both costs per point and their ratio. Also prints how far the
two results are apart, to show they compute the same field (the textbook form loses digits
near the axis and far away, so some difference there is expected from it). Both sides are
timed in this thread's processor time, in alternating rounds, and medians are printed.

Run with Debian's python (numpy, scipy):
    /usr/bin/python3 bench/numpy_compare.py [--bench build/bench/field-bench] [--points N] [--rounds R]
"""
import argparse
import os
import pathlib
import statistics
import subprocess
import tempfile
import time

import numpy as np
from scipy.special import ellipe, ellipk

MU0 = 1.25663706127e-6  # CODATA 2022, as engine/include/coilwright/constants.hpp
# The loop field-bench uses (bench/field_bench.cpp: kLoop).
RADIUS, TURNS, CURRENT = 0.1, 100.0, 1.5


def textbook_field(z, r, a=RADIUS, n=TURNS, i=CURRENT):
    """Bz, Br of a thin loop; every step a whole-array numpy operation."""
    rho2 = r * r + z * z
    alpha2 = a * a + rho2 - 2 * a * r
    beta2 = a * a + rho2 + 2 * a * r
    beta = np.sqrt(beta2)
    m = 1 - alpha2 / beta2  # parameter m = k^2 in scipy's convention
    K, E = ellipk(m), ellipe(m)
    c = MU0 * n * i / np.pi
    bz = c / (2 * alpha2 * beta) * ((a * a - rho2) * E + alpha2 * K)
    with np.errstate(invalid="ignore", divide="ignore"):
        br = np.where(r > 0, c * z / (2 * alpha2 * beta * r) * ((a * a + rho2) * E - alpha2 * K), 0.0)
    return bz, br


def time_numpy(z, r, repeat):
    textbook_field(z, r)  # warm-up
    times = []
    for _ in range(repeat):
        t0 = time.thread_time()
        textbook_field(z, r)
        times.append(time.thread_time() - t0)
    return statistics.median(times) / len(z) * 1e9


def main():
    root = pathlib.Path(__file__).resolve().parents[1]
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--bench", default=str(root / "build" / "bench" / "field-bench"))
    ap.add_argument("--points", type=int, default=100000)
    ap.add_argument("--repeat", type=int, default=15)
    ap.add_argument("--rounds", type=int, default=5, help="alternating runs of each side (median taken)")
    args = ap.parse_args()

    with tempfile.TemporaryDirectory() as tmp:
        points_file, field_file = os.path.join(tmp, "points"), os.path.join(tmp, "field")
        # Interleave the two measurements so that a busy machine affects both alike.
        numpy_ns, bench_ns = [], []
        for _ in range(args.rounds):
            out = subprocess.run([args.bench, "--kernel", "loop_offaxis", "--points", str(args.points),
                                  "--repeat", str(args.repeat), "--write-points", points_file,
                                  "--write-field", field_file],
                                 check=True, capture_output=True, text=True).stdout
            name, ns = out.split()
            assert name == "loop_offaxis"
            bench_ns.append(float(ns))
            zr = np.fromfile(points_file, dtype="<f8").reshape(2, -1)
            numpy_ns.append(time_numpy(zr[0], zr[1], args.repeat))
        field = np.fromfile(field_file, dtype="<f8").reshape(2, -1)

    bz_np, br_np = textbook_field(zr[0], zr[1])
    scale = np.hypot(field[0], field[1])
    worst = max(np.max(np.abs(bz_np - field[0]) / scale), np.max(np.abs(br_np - field[1]) / scale))
    numpy_med, bench_med = statistics.median(numpy_ns), statistics.median(bench_ns)
    print(f"numpy_scipy_loop_offaxis {numpy_med:.1f}")
    print(f"loop_offaxis {bench_med:.1f}")
    print(f"ratio numpy_scipy/loop_offaxis {numpy_med / bench_med:.1f}")
    print(f"# {args.points} points; medians of {args.rounds} alternating runs x {args.repeat} passes "
          f"(processor time, ns per point); "
          f"largest difference numpy - engine: {worst:.1e} of |B|")


if __name__ == "__main__":
    main()
