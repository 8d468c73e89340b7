#!/usr/bin/python3
"""Reference values of the thin current-sheet solenoid field, computed two independent ways.

1. Quadrature along the winding of the thin-loop field: the sheet is n = N / L turns per metre,
   so B(z, r) = n * integral_{-L/2}^{L/2} B_loop(z - z', r) dz', with B_loop the classical
   elliptic-integral form (W. R. Smythe, Static and Dynamic Electricity, 1950; the same form
   generate_loop_reference.py checks against Biot-Savart) evaluated by mpmath at 50 digits and
   the quadrature split around the point nearest to the field point.
2. The closed form of N. Derby and S. Olbert, Am. J. Phys. 78, 229 (2010), with Bulirsch's
   cel written through Carlson's symmetric integrals (DLMF 19.25.1, 19.25.14), at 50 digits:
     Bz = mu0 n I a / (pi (a + r)) * sum_ends +- zeta / beta * cel(kc, gamma^2, 1, gamma)
     Br = mu0 n I a / pi * sum_ends +- cel(kc, 1, 1, -1) / beta      (lengths in units of a)
The two must agree to 1e-24 of |B| or the script stops. Output: solenoid_field.csv, 25 digits.
Also solenoid_field_random.csv: seeded random points in every region of a unit-radius sheet
(near the sheet and the rims, near the axis, beyond the ends, far away) by the closed form 2,
in units of mu0 n I, for a denser check than the curated cases.
Run with Debian's python3-mpmath: /usr/bin/python3 tests/reference/generate_solenoid_reference.py
"""
import csv
import math
import pathlib
import random

import mpmath as mp

from mp_kernels import MU0, cel, loop_field

DPS = 50


def by_quadrature(a, length, n_turns, current, z, r):
    with mp.workdps(DPS):
        a, length, n_turns, current, z, r = map(mp.mpf, (a, length, n_turns, current, z, r))
        h = length / 2
        # The integrand peaks at z' = z when the point is near the sheet: split there and at
        # geometric distances around it (scale |a - r|, and h for the ends).
        pts = {-h, h}
        scale = abs(a - r) if r != a else h * mp.mpf("1e-12")
        for k in range(0, 14):
            for d in (scale * mp.mpf(10) ** k, h * mp.mpf(10) ** -k):
                for x in (z - d, z + d):
                    if -h < x < h:
                        pts.add(x)
        if -h < z < h:
            pts.add(z)
        pts = sorted(pts)
        bz = mp.quad(lambda zp: loop_field(a, z - zp, r)[0], pts)
        br = mp.quad(lambda zp: loop_field(a, z - zp, r)[1], pts)
        s = mp.mpf(MU0) * n_turns / length * current
        return s * bz, s * br


def closed_form_unit(zn, rn, hn):
    """Derby-Olbert for a sheet of radius 1 and half-length hn: field in units of mu0 n I."""
    bz = br = mp.mpf(0)
    gamma = (1 - rn) / (1 + rn)
    for sign, zeta in ((1, zn + hn), (-1, zn - hn)):
        beta = mp.sqrt((1 + rn) ** 2 + zeta ** 2)
        kc = mp.sqrt((1 - rn) ** 2 + zeta ** 2) / beta
        if gamma != 0:
            bz += sign * zeta / beta * cel(kc, gamma * gamma, 1, gamma) / (mp.pi * (1 + rn))
        else:  # r = a beyond the ends: the limit gamma -> 0 (both ends on one side)
            bz += sign * (zeta / beta * mp.ellipk(1 - kc * kc) / (2 * mp.pi) + mp.sign(zeta) / 4)
        br += sign * cel(kc, 1, 1, -1) / (mp.pi * beta)
    return bz, (br if rn != 0 else mp.mpf(0))


def by_closed_form(a, length, n_turns, current, z, r):
    with mp.workdps(DPS):
        a, length, n_turns, current, z, r = map(mp.mpf, (a, length, n_turns, current, z, r))
        bz, br = closed_form_unit(z / a, r / a, length / (2 * a))
        s = mp.mpf(MU0) * n_turns / length * current
        return s * bz, s * br


def cases():
    """(label, radius, length, turns, current, z, r)."""
    out = []
    # A unit sheet of length 2 (h = 1) at ordinary and hard points.
    for z, r in ((0, 0), (0.3, 0.2), (0, 0.5), (0.7, 0.9), (-0.9, 0.5), (0.5, 1.5), (0, 3), (-2, 0.3),
                 (1.5, 1.5), (3, 0.5), (-0.2, 0.999)):
        out.append(("ordinary", 1.0, 2.0, 100, 1.0, z, r))
    for z, r in ((0.5, 1 - 1e-6), (0.5, 1 + 1e-6), (0, 1 - 1e-9), (-0.8, 1 + 1e-9)):
        out.append(("near sheet", 1.0, 2.0, 100, 1.0, z, r))
    for dz, dr in ((1e-4, 0), (-1e-4, 1e-4), (1e-6, -1e-6), (0, 1e-5), (0, -1e-5), (2e-3, 1e-3)):
        out.append(("near rim", 1.0, 2.0, 100, 1.0, 1.0 + dz, 1.0 + dr))
    for r in (0.0, 0.4, 0.99, 1.01, 2.5):
        out.append(("end plane", 1.0, 2.0, 100, 1.0, 1.0, r))
    for z in (1e-9, 1e-5, 0.01):
        out.append(("mid-plane", 1.0, 2.0, 100, 1.0, z, 0.7))
        out.append(("mid-plane", 1.0, 2.0, 100, 1.0, z, 1.7))
    for z, r in ((0.2, 1e-9), (3, 1e-6), (-40, 1e-3), (0.99, 1e-7)):
        out.append(("near axis", 1.0, 2.0, 100, 1.0, z, r))
    # A long sheet (L = 200 a): the inside is nearly mu0 n I, the field beyond the ends small.
    for z, r in ((0, 0.5), (80, 0.9), (99.9, 0.3), (110, 0.2), (110, 0.999), (101, 1.0), (130, 2), (0, 5), (95, 1.2)):
        out.append(("long", 1.0, 200.0, 20000, 1.0, z, r))
    # A short sheet (L = 1e-3 a): nearly a loop.
    for z, r in ((0, 0.5), (0.0004, 0.9995), (0.01, 1.0), (0.3, 2.0), (-2, 0.1)):
        out.append(("short", 1.0, 1e-3, 1, 1.0, z, r))
    for R, th in ((1e3, 0.3), (1e3, 1.4), (1e5, 2.2), (1e5, 0.0), (3e2, 1.5707963267948966)):
        out.append(("far", 1.0, 2.0, 100, 1.0, R * mp.cos(th), R * mp.sin(th)))
    # A realistic winding: 50 mm radius, 200 mm long, 500 turns at 2 A; and large/small scales.
    for z, r in ((0, 0), (0.05, 0.03), (0.12, 0.04), (0.1, 0.05 + 1e-4), (-0.3, 0.2), (0.0, 0.049999)):
        out.append(("winding", 0.05, 0.2, 500, 2.0, z, r))
    # Within nanometres of a rim of the 50 mm winding: |z| - L/2 and r - a must keep their digits.
    for z, r in ((0.1 + 1e-9, 0.05 + 1e-9), (0.1 - 1e-9, 0.05 + 2e-9), (-0.1 - 3e-10, 0.05 - 1e-9), (0.1 + 2e-9, 0.05)):
        out.append(("winding near rim", 0.05, 0.2, 500, 2.0, z, r))
    out += [("negative current", 0.05, 0.2, 500, -2.0, 0.08, 0.02), ("tiny", 2e-6, 1e-5, 30, 0.01, 3e-6, 1e-6),
            ("large", 30.0, 60.0, 2000, 500.0, 25.0, 28.0)]
    # Where Bz changes sign outside the sheet: compared against |B| there.
    out += [("sign change", 1.0, 2.0, 100, 1.0, 1.3, 1.2), ("sign change", 1.0, 2.0, 100, 1.0, 800.0, 1131.37)]
    return [(lbl, a, l, n, i, float(z), float(r)) for lbl, a, l, n, i, z, r in out]


def main():
    rows = []
    for label, a, length, n_turns, current, z, r in cases():
        bz_q, br_q = by_quadrature(a, length, n_turns, current, z, r)
        bz_c, br_c = by_closed_form(a, length, n_turns, current, z, r)
        scale = mp.sqrt(bz_q ** 2 + br_q ** 2)
        for q, c in ((bz_q, bz_c), (br_q, br_c)):
            if abs(q - c) > mp.mpf("1e-24") * scale:
                raise SystemExit(f"methods disagree at {label} z={z} r={r}: {q} vs {c}")
        rows.append([label, repr(a), repr(length), repr(n_turns), repr(current), repr(z), repr(r),
                     mp.nstr(bz_c, 25, min_fixed=1, max_fixed=0), mp.nstr(br_c, 25, min_fixed=1, max_fixed=0)])
    path = pathlib.Path(__file__).with_name("solenoid_field.csv")
    with open(path, "w", newline="") as f:
        f.write("# Thin current-sheet solenoid reference: mpmath quadrature of the loop field along the winding\n")
        f.write("# (50 digits), checked against the Derby-Olbert closed form (Carlson integrals, 50 digits) to 1e-24.\n")
        f.write("# Generated by tests/reference/generate_solenoid_reference.py; mu0 = " + MU0 + " (CODATA 2022).\n")
        w = csv.writer(f)
        w.writerow(["case", "radius_m", "length_m", "turns", "current_A", "z_m", "r_m", "bz_T", "br_T"])
        w.writerows(rows)
    print(f"wrote {len(rows)} rows to {path}")


def random_rows(count, seed=20240601):
    """(z, r, h, Bz, Br) for a unit-radius sheet of half-length h, field in units of mu0 n I."""
    rng = random.Random(seed)
    rows = []
    while len(rows) < count:
        h = 10 ** rng.uniform(-4, 4)
        kind = rng.random()
        if kind < 0.2:
            z, r = 10 ** rng.uniform(-5, 5) * rng.choice([-1, 1]), 10 ** rng.uniform(-5, 5)
        elif kind < 0.45:  # near the rims
            r = 1 + rng.choice([-1, 1]) * 10 ** rng.uniform(-12, 0)
            z = h * (1 + rng.choice([-1, 1]) * 10 ** rng.uniform(-12, 0.5))
        elif kind < 0.6:  # near the sheet
            r, z = 1 + rng.choice([-1, 1]) * 10 ** rng.uniform(-12, 0), h * rng.uniform(-1, 1)
        elif kind < 0.8:  # near the axis
            r = 10 ** rng.uniform(-12, -1) if rng.random() < 0.9 else 0.0
            z = 10 ** rng.uniform(-4, 5) * rng.choice([-1, 1])
        else:  # far
            big, th = 10 ** rng.uniform(0.5, 8) * max(h, 1), rng.uniform(0, math.pi)
            z, r = big * math.cos(th), big * math.sin(th)
        if r == 1 and abs(z) <= h:
            continue
        with mp.workdps(DPS):
            bz, br = closed_form_unit(mp.mpf(z), mp.mpf(r), mp.mpf(h))
            rows.append([repr(1.0), repr(z), repr(r), repr(h), mp.nstr(bz, 20, min_fixed=1, max_fixed=0),
                         mp.nstr(br, 20, min_fixed=1, max_fixed=0)])
    return rows


def write_random(count=400):
    path = pathlib.Path(__file__).with_name("solenoid_field_random.csv")
    with open(path, "w", newline="") as f:
        f.write("# Thin current-sheet solenoid of radius 1 and half-length h at seeded random points, field in units of\n")
        f.write("# mu0 n I, by the Derby-Olbert closed form at 50 digits (Carlson integrals).\n")
        f.write("# Generated by tests/reference/generate_solenoid_reference.py.\n")
        w = csv.writer(f)
        w.writerow(["radius", "z", "r", "h", "bz", "br"])
        w.writerows(random_rows(count))
    print(f"wrote {count} rows to {path}")


if __name__ == "__main__":
    main()
    write_random()
