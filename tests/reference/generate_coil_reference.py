#!/usr/bin/python3
"""Reference values of the thick coil (rectangular cross-section, uniform current density) and of
the flat spiral (turns spread evenly over the radius in one plane), two independent ways each.

Thick coil, inner radius a1, outer a2, length L, current density J = N I / ((a2 - a1) L):
 1. mpmath quadrature over the winding radius a of the thin-sheet closed form of N. Derby and
    S. Olbert, Am. J. Phys. 78, 229 (2010) (see generate_solenoid_reference.py), 40 digits;
 2. a check by a different route: on the axis the closed form of the field factor of
    D. B. Montgomery, Solenoid Magnet Design (1969),
      Bz = mu0 J / 2 [F(z + h) - F(z - h)],  F(x) = x ln((a2 + sqrt(a2^2 + x^2)) / (a1 + sqrt(a1^2 + x^2)));
    off the axis a two-dimensional quadrature of the loop field over the cross-section (a, z').
Flat spiral, radii a1..a2 in the plane z = 0, N turns spread evenly over the radius:
 1. mpmath quadrature over a of the loop field (Smythe's elliptic form), 40 digits;
 2. on the axis the closed form mu0 N I / (2 (a2 - a1)) [asinh(a / |z|) - a / sqrt(a^2 + z^2)]_{a1}^{a2}
    (the on-axis loop field integrated over a); off the axis a two-dimensional Biot-Savart
    quadrature over the radius and the angle of the turns.
The two must agree to 1e-15 of |B| (the two-dimensional Gauss-Legendre quadratures run at 18 digits) or the
script stops. Output: coil_field.csv, 20 digits. Takes some minutes.
Run with Debian's python3-mpmath: /usr/bin/python3 tests/reference/generate_coil_reference.py
"""
import csv
import pathlib

import mpmath as mp

from generate_solenoid_reference import MU0, cel, loop_field

DPS = 40
CHECK_DPS = 18


def sheet_field(a, h, z, r):
    """Sheet of radius a, half-length h, 1 A-turn per metre: field at (z, r) in units of mu0."""
    zn, rn, hn = z / a, r / a, h / a
    bz = br = mp.mpf(0)
    gamma = (1 - rn) / (1 + rn)
    for sign, zeta in ((1, zn + hn), (-1, zn - hn)):
        beta = mp.sqrt((1 + rn) ** 2 + zeta ** 2)
        kc = mp.sqrt((1 - rn) ** 2 + zeta ** 2) / beta
        if gamma != 0:
            bz += sign * zeta / beta * cel(kc, gamma * gamma, 1, gamma) / (mp.pi * (1 + rn))
        else:
            bz += sign * (zeta / beta * mp.ellipk(1 - kc * kc) / (2 * mp.pi) + mp.sign(zeta) / 4)
        if r != 0:
            br += sign * cel(kc, 1, 1, -1) / (mp.pi * beta)
    return bz, br


def breakpoints(lo, hi, centre, scales):
    """lo, hi, `centre` and the points at distances s, 10 s, 100 s, ... from it inside (lo, hi), for
    each scale s (the distance of a nearby singularity from the real axis)."""
    pts = {lo, hi}
    if lo < centre < hi:
        pts.add(centre)
    for s in scales:
        d = s
        while s > 0 and d < hi - lo:
            for x in (centre - d, centre + d):
                if lo < x < hi:
                    pts.add(x)
            d *= 10
    return sorted(pts)


def loop_field_near(r, da, dz):
    """loop_field(r + da, dz, r) with the loop-to-point offsets (da, dz) given exactly."""
    a = r + da
    alpha2 = da * da + dz * dz
    beta2 = (a + r) ** 2 + dz * dz
    beta = mp.sqrt(beta2)
    # K and E from the complementary parameter kc^2 = alpha^2 / beta^2 (DLMF 19.25.1), which
    # stays exact where m = 1 - kc^2 would round to 1 next to the wire.
    kc2, m = alpha2 / beta2, 4 * a * r / beta2
    K = mp.elliprf(0, kc2, 1)
    E = K - m / 3 * mp.elliprd(0, kc2, 1)
    bz = ((a * a - r * r - dz * dz) * E + alpha2 * K) / (2 * mp.pi * alpha2 * beta)
    br = dz * ((a * a + r * r + dz * dz) * E - alpha2 * K) / (2 * mp.pi * alpha2 * beta * r)
    return bz, br


def thick_by_sheets(a1, a2, length, n, i, z, r):
    with mp.workdps(DPS):
        a1, a2, length, n, i, z, r = map(mp.mpf, (a1, a2, length, n, i, z, r))
        h = length / 2
        pts = breakpoints(a1, a2, r, [abs(z - h), abs(z + h)])
        bz = mp.quad(lambda a: sheet_field(a, h, z, r)[0], pts)
        br = mp.quad(lambda a: sheet_field(a, h, z, r)[1], pts)
        s = mp.mpf(MU0) * n * i / ((a2 - a1) * length)
        return s * bz, s * br


def thick_check(a1, a2, length, n, i, z, r):
    with mp.workdps(CHECK_DPS + 10):
        a1, a2, length, n, i, z, r = map(mp.mpf, (a1, a2, length, n, i, z, r))
        h = length / 2
        s = mp.mpf(MU0) * n * i / ((a2 - a1) * length)
        if r == 0:
            F = lambda x: x * mp.log((a2 + mp.sqrt(a2 ** 2 + x ** 2)) / (a1 + mp.sqrt(a1 ** 2 + x ** 2)))
            return "Montgomery closed form", s * (F(z + h) - F(z - h)) / 2, mp.mpf(0)
    with mp.workdps(CHECK_DPS):
        a1, a2, length, n, i, z, r = map(mp.mpf, (a1, a2, length, n, i, z, r))
        h = length / 2
        s = mp.mpf(MU0) * n * i / ((a2 - a1) * length)
        gl = "gauss-legendre"
        out = []
        for comp in (0, 1):
            f = lambda a, zp: loop_field(a, z - zp, r)[comp]
            if a1 <= r <= a2 and -h <= z <= h:
                # The loop field is singular like 1 / distance at (a, z') = (r, z), inside or on the
                # edge of the cross-section: split it into triangles with that vertex and map each
                # to a square (M. G. Duffy, SIAM J. Numer. Anal. 19, 1260, 1982), where the
                # Jacobian's factor u cancels the singularity.
                corners = [(a1, -h), (a2, -h), (a2, h), (a1, h)]
                total = mp.mpf(0)
                for k in range(4):
                    (x1, y1), (x2, y2) = corners[k], corners[(k + 1) % 4]
                    jac = abs((x1 - r) * (y2 - y1) - (y1 - z) * (x2 - x1))
                    if jac == 0:
                        continue  # the point lies on this edge
                    # Offsets from the singular point passed exactly, so that tiny u never rounds to it.
                    g = lambda u, v: u * loop_field_near(r, u * (x1 + v * (x2 - x1) - r), -u * (y1 + v * (y2 - y1) - z))[comp]
                    # u log u terms remain at u = 0: tanh-sinh there, Gauss-Legendre along v.
                    total += jac * mp.quad(lambda u: mp.quad(lambda v: g(u, v), [0, 1], method=gl), [0, 1])
                out.append(s * total)
            else:
                a_pts = breakpoints(a1, a2, r, [abs(z - h), abs(z + h)])
                z_pts = lambda a: breakpoints(-h, h, z, [abs(a - r)])
                out.append(s * mp.quad(lambda a: mp.quad(lambda zp: f(a, zp), z_pts(a), method=gl), a_pts, method=gl))
        return "2-D quadrature of the loop field", out[0], out[1]


def spiral_by_loops(a1, a2, n, i, z, r):
    with mp.workdps(DPS):
        a1, a2, n, i, z, r = map(mp.mpf, (a1, a2, n, i, z, r))
        pts = breakpoints(a1, a2, r, [abs(z)])
        s = mp.mpf(MU0) * n * i / (a2 - a1)
        return (s * mp.quad(lambda a: loop_field(a, z, r)[0], pts), s * mp.quad(lambda a: loop_field(a, z, r)[1], pts))


def spiral_check(a1, a2, n, i, z, r):
    with mp.workdps(CHECK_DPS + 10):
        a1, a2, n, i, z, r = map(mp.mpf, (a1, a2, n, i, z, r))
        s = mp.mpf(MU0) * n * i / (a2 - a1)
        if r == 0:
            G = lambda a: mp.asinh(a / abs(z)) - a / mp.sqrt(a * a + z * z)
            bz = s * (G(a2) - G(a1)) / 2 if z != 0 else s * mp.log(a2 / a1) / 2  # z -> 0: ln(a2 / a1)
            return "on-axis closed form", bz, mp.mpf(0)
    with mp.workdps(CHECK_DPS):
        a1, a2, n, i, z, r = map(mp.mpf, (a1, a2, n, i, z, r))
        s = mp.mpf(MU0) * n * i / (a2 - a1)
        # Biot-Savart of a turn of radius a (angle t, point at azimuth 0), per 1 A, over 4 pi:
        #   dBz = a (a - r cos t) / D^3 dt,  dBr = a z cos t / D^3 dt,  D^2 = a^2 + r^2 + z^2 - 2 a r cos t
        d3 = lambda a, t: (a * a + r * r + z * z - 2 * a * r * mp.cos(t)) ** mp.mpf(1.5)
        t_pts = lambda a: [0] + [mp.mpf(10) ** -k for k in range(12, 0, -1)] + [1, mp.pi / 2, mp.pi]
        a_pts = breakpoints(a1, a2, r, [abs(z)])
        gl = "gauss-legendre"
        bz = mp.quad(lambda a: mp.quad(lambda t: a * (a - r * mp.cos(t)) / d3(a, t), t_pts(a), method=gl), a_pts, method=gl)
        br = mp.quad(lambda a: mp.quad(lambda t: a * z * mp.cos(t) / d3(a, t), t_pts(a), method=gl), a_pts, method=gl)
        return "2-D Biot-Savart quadrature", s * bz / (2 * mp.pi), s * br / (2 * mp.pi)


def cases():
    """(kind, label, inner, outer, length, turns, current, z, r)."""
    out = []
    t = lambda label, z, r, a1=1.0, a2=1.5, length=2.0, n=1000, i=1.0: out.append(
        ("thick", label, a1, a2, length, n, i, z, r))
    for z in (0.0, 0.5, 3.0, 50.0):
        t("axis", z, 0.0)
    for z, r in ((0.0, 1.25), (0.5, 1.1), (0.9, 1.45), (-0.99, 1.01), (0.0, 1.0), (0.3, 1.5)):
        t("inside winding", z, r)
    for z, r in ((0.3, 1 - 1e-6), (0.3, 1 + 1e-6), (0.3, 1.5 + 1e-6), (0.3, 1.5 - 1e-6)):
        t("winding surface", z, r)
    for z in (1.0, 1 + 1e-6, 1 - 1e-6):
        t("end face", z, 1.2)
    for z, r in ((1.0, 1.0), (1.0, 1.5), (1 + 1e-5, 1.5 + 1e-5), (1 - 1e-7, 1 + 1e-7)):
        t("corner", z, r)
    for z, r in ((0.2, 0.5), (0.95, 0.99), (1e-9, 1.2), (1e-9, 0.6)):
        t("bore and mid-plane", z, r)
    for z, r in ((0.0, 2.0), (2.0, 2.0), (1.5, 0.5), (0.5, 1e-8), (5.0, 1e-6)):
        t("outside and near axis", z, r)
    for R, th in ((1e3, 0.4), (1e4, 1.3), (300.0, 1.5707963267948966)):
        t("far", R * mp.cos(th), R * mp.sin(th))
    for z, r in ((0.0, 0.06), (0.03, 0.07), (0.06, 0.09), (0.0, 0.0), (-0.02, 0.01)):
        t("winding 50-80 mm", z, r, 0.05, 0.08, 0.1, 800, 3.0)
    for z, r in ((0.0, 2.0), (0.004, 1.5), (0.02, 2.9), (0.0049, 1.0001)):
        t("short and wide", z, r, 1.0, 3.0, 0.01, 50, 2.0)
    for z, r in ((0.0, 1.005), (49.9, 1.002), (51.0, 1.0), (0.0, 0.5)):
        t("long thin wall", z, r, 1.0, 1.01, 100.0, 10000, 1.0)
    t("negative current", 0.4, 1.2, 0.05, 0.08, 0.1, 800, -3.0)

    s = lambda label, z, r: out.append(("spiral", label, 0.5, 1.0, 0.0, 20, 1.0, z, r))
    for z in (0.0001, 0.1, 2.0):
        s("axis", z, 0.0)
    s("axis", 0.0, 0.0)
    for z, r in ((0.01, 0.75), (1e-6, 0.75), (0.0, 0.25), (0.0, 1.5), (0.2, 1.2), (-0.3, 0.6), (1e-5, 1 + 1e-5),
                 (0.3, 1e-8), (-1e-6, 0.5 - 1e-6)):
        s("near and off axis", z, r)
    for R, th in ((1e3, 0.7), (1e4, 1.5707963267948966)):
        s("far", R * mp.cos(th), R * mp.sin(th))
    return [(k, lbl, a1, a2, l, n, i, float(z), float(r)) for k, lbl, a1, a2, l, n, i, z, r in out]


def main():
    rows = []
    for kind, label, a1, a2, length, n, i, z, r in cases():
        if kind == "thick":
            bz, br = thick_by_sheets(a1, a2, length, n, i, z, r)
            how, bz2, br2 = thick_check(a1, a2, length, n, i, z, r)
        else:
            bz, br = spiral_by_loops(a1, a2, n, i, z, r)
            how, bz2, br2 = spiral_check(a1, a2, n, i, z, r)
        scale = mp.sqrt(bz ** 2 + br ** 2)
        for x, y in ((bz, bz2), (br, br2)):
            if abs(x - y) > mp.mpf("1e-15") * scale:
                raise SystemExit(f"methods disagree at {kind} {label} z={z} r={r}: {x} vs {y}")
        print(kind, label, z, r, "ok by", how, flush=True)
        rows.append([kind, label, repr(a1), repr(a2), repr(length), repr(n), repr(i), repr(z), repr(r),
                     mp.nstr(bz, 20, min_fixed=1, max_fixed=0), mp.nstr(br, 20, min_fixed=1, max_fixed=0), how])
    path = pathlib.Path(__file__).with_name("coil_field.csv")
    with open(path, "w", newline="") as f:
        f.write("# Thick coil and flat spiral reference: mpmath quadrature over the radius of the Derby-Olbert sheet\n")
        f.write("# (thick) or of the loop field (spiral) at 40 digits, each checked to 1e-15 of |B| by the method in\n")
        f.write("# the last column. Generated by tests/reference/generate_coil_reference.py; mu0 = " + MU0 +
                " (CODATA 2022).\n")
        w = csv.writer(f)
        w.writerow(["kind", "case", "inner_m", "outer_m", "length_m", "turns", "current_A", "z_m", "r_m", "bz_T",
                    "br_T", "checked_by"])
        w.writerows(rows)
    print(f"wrote {len(rows)} rows to {path}")


if __name__ == "__main__":
    main()
