#!/usr/bin/python3
"""Reference values for rectangular loops and rectangle pairs, computed with mpmath.

rect_field.csv: field of N turns on a rectangle (centred at the origin in z = 0, sides along
x and y, current counter-clockwise seen from +z), two independent ways:
1. Numerical quadrature of the Biot-Savart line integral B = mu0 N I / (4 pi) * sum over the
   four sides of int dl x (P - s) / |P - s|^3, at 40 digits, each side split at the foot of
   the perpendicular from P (where the integrand peaks when P is close to the side).
2. The closed-form straight-segment result B = mu0 I / (4 pi) (e x r1) (t1/R1 - t2/R2) / d^2
   (textbook (cos a1 - cos a2) / d form) evaluated naively at 80 digits, where its cancellation
   far away (up to 2 log10(R / size) digits) is harmless.
They must agree to 1e-28 of |B| or the script stops.

rect_pair_spacing.csv: spacing D of two identical rectangles at z = +-D/2 at which
d^2 Bz / dz^2 = 0 at the centre, found with mpmath.findroot (Anderson, bracketed by a sign scan)
on the second derivative, taken by mpmath.diff, of the single rectangle's on-axis field
summed side by side at 50 digits, then checked to vanish for the pair by mpmath.diff.

Run with Debian's python3-mpmath: /usr/bin/python3 tests/reference/generate_rect_reference.py
"""
import csv
import pathlib
import mpmath as mp

MU0 = "1.25663706127e-6"  # CODATA 2022, as in engine/include/coilwright/constants.hpp


def sides(w, h):
    """(start, end) corners of the four sides in the direction of positive current."""
    a, b = w / 2, h / 2
    c = [(-a, -b), (a, -b), (a, b), (-a, b)]
    return [(c[k], c[(k + 1) % 4]) for k in range(4)]


def by_quadrature(w, h, n, i, x, y, z):
    with mp.workdps(40):
        w, h, n, i, x, y, z = map(mp.mpf, (w, h, n, i, x, y, z))
        total = [mp.mpf(0)] * 3
        for (x0, y0), (x1, y1) in sides(w, h):
            lx, ly = x1 - x0, y1 - y0
            length2 = lx * lx + ly * ly
            # foot of the perpendicular, as a fraction of the side, clipped to [0, 1]
            foot = min(max(((x - x0) * lx + (y - y0) * ly) / length2, mp.mpf(0)), mp.mpf(1))
            pts = sorted(set([mp.mpf(0), foot, mp.mpf(1)]))

            def comp(k):
                def f(t):
                    rx, ry, rz = x - (x0 + t * lx), y - (y0 + t * ly), z
                    r3 = (rx * rx + ry * ry + rz * rz) ** mp.mpf(1.5)
                    # dl x r with dl = (lx, ly, 0)
                    cross = (ly * rz, -lx * rz, lx * ry - ly * rx)
                    return cross[k] / r3
                return mp.quad(f, pts)

            for k in range(3):
                total[k] += comp(k)
        s = mp.mpf(MU0) * n * i / (4 * mp.pi)
        return [s * v for v in total]


def by_closed_form(w, h, n, i, x, y, z):
    with mp.workdps(80):
        w, h, n, i, x, y, z = map(mp.mpf, (w, h, n, i, x, y, z))
        total = [mp.mpf(0)] * 3
        for (x0, y0), (x1, y1) in sides(w, h):
            lx, ly = x1 - x0, y1 - y0
            length = mp.sqrt(lx * lx + ly * ly)
            ex, ey = lx / length, ly / length
            r1 = (x - x0, y - y0, z)
            r2 = (x - x1, y - y1, z)
            t1 = r1[0] * ex + r1[1] * ey
            t2 = r2[0] * ex + r2[1] * ey
            R1 = mp.sqrt(sum(c * c for c in r1))
            R2 = mp.sqrt(sum(c * c for c in r2))
            cross = (ey * r1[2], -ex * r1[2], ex * r1[1] - ey * r1[0])
            d2 = sum(c * c for c in cross)
            if d2 == 0:
                continue  # on the line of the side, beyond its ends: no contribution
            f = (t1 / R1 - t2 / R2) / d2
            for k in range(3):
                total[k] += cross[k] * f
        s = mp.mpf(MU0) * n * i / (4 * mp.pi)
        return [s * v for v in total]


def field_cases():
    """(label, width, height, turns, current, x, y, z)."""
    out = []
    for x, y, z in [(0, 0, 0), (0, 0, 0.3), (0.1, 0.2, 0.3), (-0.3, 0.45, -0.2), (0.2, -0.1, 0),
                    (0.7, 0.2, 0.1), (0.5, 0.5, 0.5), (-1.2, 0.3, 0.8), (0.25, 0.25, -1.5), (0, 0.9, 0)]:
        out.append(("square", 1.0, 1.0, 1, 1.0, x, y, z))
    for x, y, z in [(0.1, 0.05, 0.2), (1.5, 0.1, 0.3), (-0.9, -0.2, 0.05), (0, 0, 2)]:
        out.append(("oblong", 2.0, 0.5, 3, 1.5, x, y, z))
    for z in (1e-3, 0.5, 3, 50):                                      # near the axis
        for x in (1e-9, 1e-5):
            out.append(("near axis", 1.0, 1.0, 1, 1.0, x, 0.3 * x, z))
    for d in (1e-4, 1e-7):                                            # near a side and a corner
        out += [("near side", 1.0, 1.0, 1, 1.0, 0.1, -0.5 - d, 0), ("near side", 1.0, 1.0, 1, 1.0, 0.1, -0.5, d),
                ("near side", 1.0, 1.0, 1, 1.0, 0.5 - d, 0.3, d), ("near corner", 1.0, 1.0, 1, 1.0, 0.5 + d, 0.5 + d, 0),
                ("near corner", 1.0, 1.0, 1, 1.0, 0.5 - d, -0.5 + d, d)]
    out.append(("side line", 1.0, 1.0, 1, 1.0, 0.9, -0.5, 0))        # on a side's line, beyond its end
    out.append(("side line", 1.0, 1.0, 1, 1.0, -3.0, 0.5, 0))
    for r, (ux, uy, uz) in [(3, (1, 0, 0)), (5, (0.6, 0.8, 0)), (10, (0, 0, 1)), (100, (0.3, 0.4, 0.866)),
                            (1000, (1, 0, 0)), (1000, (0.48, 0.64, 0.6)), (1e5, (0.8, 0, 0.6)),
                            (1e5, (0, 1, 0))]:
        out.append(("far field", 1.0, 1.0, 1, 1.0, r * ux, r * uy, r * uz))
    for r, (ux, uy, uz) in [(2.5, (1, 0, 0)), (2.9, (0.2, 0.9, 0.3)), (3.2, (0.7, 0.1, 0.7)), (4, (0, 0.6, 0.8))]:
        out.append(("far field", 3.0, 0.4, 1, 1.0, r * ux, r * uy, r * uz))  # about the switch distance
    out += [("tiny coil", 2e-6, 1e-6, 10, 0.05, 1e-7, 3e-7, 2e-7), ("large coil", 40.0, 25.0, 3, 2000.0, 5.0, -7.0, 3.0),
            ("negative current", 0.3, 0.2, 200, -2.5, 0.05, 0.02, 0.1), ("many turns", 0.5, 0.5, 12000, 0.001, 0.2, 0.1, 0.3),
            ("in plane outside", 1.0, 1.0, 1, 1.0, 1.5, 0.2, 0)]
    # Bz passes through zero: near the dipole's magic angle far away, and outside the loop in its plane.
    out += [("sign change", 1.0, 1.0, 1, 1.0, 577000.0, 577000.0, 578000.0),
            ("sign change", 1.0, 1.0, 1, 1.0, 0.4, 0.3, 1.2), ("sign change", 2.0, 0.5, 1, 1.0, 0.3, 0.6, 0.9)]
    # Very oblong loops, near and far (the pairing of opposite sides matters most here).
    for x, y, z in [(0.0, 0.004, 0.001), (0.7, 0.0, 0.002), (0.3, 0.2, 0.1), (40.0, 3.0, 1.0), (0.0, 500.0, 0.0),
                    (2000.0, 0.0, 0.0), (1e-8, 2e-9, 0.01)]:
        out.append(("oblong 1e-3", 2.0, 0.002, 1, 1.0, x, y, z))
    return out


def onaxis_f(z, w, h):
    a2, b2 = (w / 2) ** 2, (h / 2) ** 2
    return (1 / (a2 + z * z) + 1 / (b2 + z * z)) / mp.sqrt(a2 + b2 + z * z)


def spacing(w, h):
    with mp.workdps(50):
        w, h = mp.mpf(w), mp.mpf(h)
        d2 = lambda z: mp.diff(lambda t: onaxis_f(t, w, h), z, 2)
        top = max(w, h)
        grid = [min(w, h) * k / 1000 for k in range(1, 2000)]  # the inflection lies below min(w, h)
        prev = d2(grid[0])
        for lo, hi in zip(grid, grid[1:]):
            cur = d2(hi)
            if mp.sign(cur) != mp.sign(prev):
                break
            prev = cur
        else:
            raise SystemExit(f"no inflection found for {w} x {h}")
        z = mp.findroot(d2, (lo, hi), solver="anderson")
        D = 2 * z
        pair = lambda t: onaxis_f(t - D / 2, w, h) + onaxis_f(t + D / 2, w, h)
        curv = mp.diff(pair, 0, 2)
        if abs(curv) > mp.mpf("1e-30") * onaxis_f(0, w, h) / top ** 2:
            raise SystemExit(f"pair curvature does not vanish for {w} x {h}: {curv}")
        return D


def main():
    here = pathlib.Path(__file__).resolve().parent
    rows = []
    for label, w, h, n, i, x, y, z in field_cases():
        q = by_quadrature(w, h, n, i, x, y, z)
        c = by_closed_form(w, h, n, i, x, y, z)
        mag = mp.sqrt(sum(v * v for v in q))
        for a, b in zip(q, c):
            if abs(a - b) > mp.mpf("1e-28") * mag:
                raise SystemExit(f"methods disagree at {label} {x} {y} {z}: {q} vs {c}")
        rows.append([label, repr(w), repr(h), repr(n), repr(i), repr(x), repr(y), repr(z)] +
                    [mp.nstr(v, 25, min_fixed=1, max_fixed=0) for v in q])
    with open(here / "rect_field.csv", "w", newline="") as f:
        f.write("# Rectangular loop field reference: mpmath Biot-Savart line-integral quadrature (40 digits),\n")
        f.write("# checked against the closed-form segment sum at 80 digits to 1e-28 of |B|.\n")
        f.write("# Generated by tests/reference/generate_rect_reference.py; mu0 = " + MU0 + " (CODATA 2022).\n")
        wr = csv.writer(f)
        wr.writerow(["case", "width_m", "height_m", "turns", "current_A", "x_m", "y_m", "z_m", "bx_T", "by_T", "bz_T"])
        wr.writerows(rows)
    print(f"wrote {len(rows)} rows to rect_field.csv")

    srows = []
    for w, h in [(1, 1), (1, 0.5), (1, 2), (1, 0.8), (2, 3), (1, 0.1), (1, 10), (1, 0.01), (1, 1e-3), (0.35, 0.35),
                 (1, 2e-4)]:
        srows.append([repr(float(w)), repr(float(h)), mp.nstr(spacing(w, h), 25, min_fixed=1, max_fixed=0)])
    with open(here / "rect_pair_spacing.csv", "w", newline="") as f:
        f.write("# Spacing of two identical rectangles with zero d2Bz/dz2 at the centre: mpmath findroot on the\n")
        f.write("# second derivative (mpmath.diff) of the on-axis field at 50 digits, verified on the pair.\n")
        f.write("# Generated by tests/reference/generate_rect_reference.py.\n")
        wr = csv.writer(f)
        wr.writerow(["width_m", "height_m", "spacing_m"])
        wr.writerows(srows)
    print(f"wrote {len(srows)} rows to rect_pair_spacing.csv")


if __name__ == "__main__":
    main()
