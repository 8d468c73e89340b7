#!/usr/bin/python3
"""Reference values for coils anywhere in space (coil sets), computed with mpmath.

set_field.csv: field of one tilted circle or rotated rectangle (N turns, current I) at points
near the wire, on and off the axis, and far away. The coil's frame follows the coil-set rule
(axis n normalised; width direction u = normalise(n x z-hat), or x-hat when n is parallel to z,
turned by the roll angle about n; v = n x u), built here at 50 digits. The field is computed two
independent ways and they must agree to 1e-25 of |B| or the script stops:
1. Biot-Savart line-integral quadrature B = mu0 N I / (4 pi) int dl x (P - s) / |P - s|^3 over
   the filament in global coordinates (mpmath.quad, 40 digits), split where the integrand peaks.
2. Circles: the classical elliptic-integral closed form in the coil's own frame (Smythe, Static
   and Dynamic Electricity, 1950, sec. 7.10) at 60 digits; rectangles: the closed-form straight
   segment sum at 80 digits.

set_mutual.csv: mutual inductance of two circular or rectangular filaments in any position,
Neumann's double integral M = mu0/(4 pi) int int dl1 . dl2 / |r1 - r2| (mpmath.quad in two
dimensions at 30 digits), checked against the single integral of the first filament's closed-form
vector potential along the second at 40 digits (must agree to 1e-20).

Run with Debian's python3-mpmath: /usr/bin/python3 tests/reference/generate_set_reference.py
"""
import csv
import pathlib
import mpmath as mp

MU0 = "1.25663706127e-6"  # CODATA 2022, as in engine/include/coilwright/constants.hpp
HERE = pathlib.Path(__file__).resolve().parent


def vec(*a):
    return [mp.mpf(x) for x in a]


def dot(a, b):
    return sum(x * y for x, y in zip(a, b))


def cross(a, b):
    return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]]


def norm(a):
    return mp.sqrt(dot(a, a))


def scale(s, a):
    return [s * x for x in a]


def add(*vs):
    return [sum(c) for c in zip(*vs)]


def frame(axis, roll_deg):
    axis = vec(*axis)
    n = scale(1 / norm(axis), axis)
    u0 = cross(n, vec(0, 0, 1))
    if norm(u0) <= mp.mpf("1e-12"):
        u0 = vec(1, 0, 0)
    else:
        u0 = scale(1 / norm(u0), u0)
    r = mp.radians(mp.mpf(roll_deg))
    w0 = cross(n, u0)
    u = add(scale(mp.cos(r), u0), scale(mp.sin(r), w0))
    return u, cross(n, u), n


def pieces(coil):
    """The filament as a list of (point(t), tangent dl/dt, [t0, t1], peak-split function)."""
    shape, c, axis, size, height, roll = coil
    c, axis = vec(*c), vec(*axis)
    u, v, n = frame(axis, roll)
    if shape == "circle":
        a = mp.mpf(size)
        pt = lambda p: add(c, scale(a * mp.cos(p), u), scale(a * mp.sin(p), v))
        tg = lambda p: add(scale(-a * mp.sin(p), u), scale(a * mp.cos(p), v))
        return [(pt, tg, (mp.mpf(0), 2 * mp.pi), "circle", (c, u, v))]
    hw, hh = mp.mpf(size) / 2, mp.mpf(height) / 2
    corners = [add(c, scale(-hw, u), scale(-hh, v)), add(c, scale(hw, u), scale(-hh, v)),
               add(c, scale(hw, u), scale(hh, v)), add(c, scale(-hw, u), scale(hh, v))]
    out = []
    for k in range(4):
        p0, p1 = corners[k], corners[(k + 1) % 4]
        d = add(p1, scale(-1, p0))
        out.append((lambda t, p0=p0, d=d: add(p0, scale(t, d)), lambda t, d=d: d, (mp.mpf(0), mp.mpf(1)), "side", (p0, d)))
    return out


def split_points(kind, data, t0, t1, P):
    """Interval split at the parameter nearest P (where the integrand peaks)."""
    if kind == "circle":
        c, u, v = data
        d = add(P, scale(-1, c))
        phi = mp.atan2(dot(d, v), dot(d, u)) % (2 * mp.pi)
        pts = {t0, t1, phi, (phi + mp.pi) % (2 * mp.pi)}
    else:
        p0, d = data
        foot = dot(add(P, scale(-1, p0)), d) / dot(d, d)
        pts = {t0, t1, min(max(foot, t0), t1)}
    return sorted(pts)


def field_quadrature(coil, turns, current, P):
    with mp.workdps(40):
        P = vec(*P)
        total = vec(0, 0, 0)
        for pt, tg, (t0, t1), kind, data in pieces(coil):
            pts = split_points(kind, data, t0, t1, P)
            for k in range(3):
                def f(t, k=k):
                    r = add(P, scale(-1, pt(t)))
                    return cross(tg(t), r)[k] / norm(r) ** 3
                total[k] += mp.quad(f, pts)
        s = mp.mpf(MU0) * turns * current / (4 * mp.pi)
        return [s * x for x in total]


def field_closed_form(coil, turns, current, P):
    shape, c, axis, size, height, roll = coil
    if shape == "circle":
        with mp.workdps(60):
            c, P = vec(*c), vec(*P)
            u, v, n = frame(vec(*axis), roll)
            d = add(P, scale(-1, c))
            z = dot(d, n)
            rv = add(d, scale(-z, n))
            r = norm(rv)
            a = mp.mpf(size)
            beta2 = (a + r) ** 2 + z * z
            m = 4 * a * r / beta2  # k^2
            K, E = mp.ellipk(m), mp.ellipe(m)
            alpha2 = (a - r) ** 2 + z * z
            pref = mp.mpf(MU0) * turns * current / (2 * mp.pi * mp.sqrt(beta2))
            bz = pref * (K + (a * a - r * r - z * z) / alpha2 * E)
            br = pref * z / r * (-K + (a * a + r * r + z * z) / alpha2 * E) if r != 0 else mp.mpf(0)
            radial = scale(1 / r, rv) if r != 0 else vec(0, 0, 0)
            return add(scale(bz, n), scale(br, radial))
    with mp.workdps(80):
        P = vec(*P)
        total = vec(0, 0, 0)
        for pt, tg, (t0, t1), kind, data in pieces((shape, vec(*c), vec(*axis), size, height, roll)):
            p0, d = data
            L = norm(d)
            e = scale(1 / L, d)
            r1 = add(P, scale(-1, p0))
            r2 = add(P, scale(-1, add(p0, d)))
            t1v, t2v = dot(r1, e), dot(r2, e)
            perp = add(r1, scale(-t1v, e))
            dd = dot(perp, perp)
            fac = (t1v / norm(r1) - t2v / norm(r2)) / dd
            total = add(total, scale(fac, cross(e, r1)))
        s = mp.mpf(MU0) * turns * current / (4 * mp.pi)
        return [s * x for x in total]


# (case, coil, turns, current, point)
TILTED = ("circle", (0.1, -0.2, 0.3), (1, 2, 2), 0.25, 0, 0)
OFFAXIS = ("circle", (-0.5, 0.25, 0.0), (0.3, -0.7, 0.1), 0.4, 0, 0)
ROTRECT = ("rect", (0.2, 0.1, -0.3), (0.5, -1, 2), 0.6, 0.35, 30)
XRECT = ("rect", (0.0, 0.0, 0.0), (1, 0, 0), 1.0, 0.5, -12.5)


def on_circle(coil, phi, du=0, dv=0, dn=0):
    """A point at angle phi on the circle, moved by du radially, dn along the axis."""
    shape, c, axis, size, height, roll = coil
    with mp.workdps(50):
        u, v, n = frame(vec(*axis), roll)
        a = mp.mpf(size) + du
        p = add(vec(*c), scale(a * mp.cos(phi), u), scale(a * mp.sin(phi), v), scale(dn, n))
        return [float(x) for x in p]


def local_point(coil, lu, lv, ln):
    shape, c, axis, size, height, roll = coil
    with mp.workdps(50):
        u, v, n = frame(vec(*axis), roll)
        return [float(x) for x in add(vec(*c), scale(lu, u), scale(lv, v), scale(ln, n))]


CASES = [
    ("tilted_centre", TILTED, 10, 2.0, local_point(TILTED, 0, 0, 0)),
    ("tilted_axis", TILTED, 10, 2.0, local_point(TILTED, 0, 0, 0.17)),
    ("tilted_generic", TILTED, 10, 2.0, (0.31, 0.02, -0.11)),
    ("tilted_near_wire", TILTED, 10, 2.0, on_circle(TILTED, 1.1, du=1e-6)),
    ("tilted_near_wire_axial", TILTED, 10, 2.0, on_circle(TILTED, -2.3, dn=3e-5)),
    ("tilted_plane_outside", TILTED, 10, 2.0, on_circle(TILTED, 0.4, du=0.3)),
    ("tilted_far", TILTED, 10, 2.0, (150.0, -220.0, 90.0)),
    ("tilted_very_far", TILTED, 10, 2.0, (-4e3, 1e3, 2.5e3)),
    ("offaxis_generic", OFFAXIS, 3, -1.5, (0.1, 0.2, 0.3)),
    ("offaxis_near_axis", OFFAXIS, 3, -1.5, local_point(OFFAXIS, 1e-7, 2e-7, 0.05)),
    ("offaxis_near_wire", OFFAXIS, 3, -1.5, on_circle(OFFAXIS, 2.9, du=-2e-5, dn=1e-5)),
    ("rect_centre", ROTRECT, 7, 1.25, local_point(ROTRECT, 0, 0, 0)),
    ("rect_axis", ROTRECT, 7, 1.25, local_point(ROTRECT, 0, 0, -0.4)),
    ("rect_generic", ROTRECT, 7, 1.25, (0.5, -0.2, 0.1)),
    ("rect_near_side", ROTRECT, 7, 1.25, local_point(ROTRECT, 0.1, -0.175 - 1e-6, 0)),
    ("rect_near_side_axial", ROTRECT, 7, 1.25, local_point(ROTRECT, -0.12, 0.175, 2e-6)),
    ("rect_near_corner", ROTRECT, 7, 1.25, local_point(ROTRECT, 0.3 + 1e-5, 0.175 + 1e-5, 1e-5)),
    ("rect_beyond_end", ROTRECT, 7, 1.25, local_point(ROTRECT, 0.9, -0.175, 0.0)),
    ("rect_far", ROTRECT, 7, 1.25, (300.0, 100.0, -200.0)),
    ("rect_very_far", ROTRECT, 7, 1.25, (2e3, -5e3, 1e3)),
    ("xrect_generic", XRECT, 1, 1.0, (0.2, 0.3, -0.1)),
    ("xrect_in_plane", XRECT, 1, 1.0, (0.0, 0.7, 0.1)),
]


def mutual_neumann(c1, c2):
    with mp.workdps(30):
        p1, p2 = pieces(c1), pieces(c2)
        total = mp.mpf(0)
        for pt1, tg1, (a0, a1), _, _ in p1:
            for pt2, tg2, (b0, b1), _, _ in p2:
                f = lambda s, t: dot(tg1(s), tg2(t)) / norm(add(pt1(s), scale(-1, pt2(t))))
                total += mp.quad(f, [a0, a1], [b0, b1])
        return mp.mpf(MU0) / (4 * mp.pi) * total


def potential(coil, P):
    """Closed-form vector potential per ampere of a circle or rectangle at P (global)."""
    shape, c, axis, size, height, roll = coil
    c, P = vec(*c), vec(*P)
    if shape == "circle":
        u, v, n = frame(vec(*axis), roll)
        d = add(P, scale(-1, c))
        z = dot(d, n)
        rv = add(d, scale(-z, n))
        r = norm(rv)
        if r == 0:
            return vec(0, 0, 0)
        a = mp.mpf(size)
        m = 4 * a * r / ((a + r) ** 2 + z * z)
        k = mp.sqrt(m)
        aphi = mp.mpf(MU0) / (mp.pi * k) * mp.sqrt(a / r) * ((1 - m / 2) * mp.ellipk(m) - mp.ellipe(m))
        return scale(aphi / r, cross(n, rv))
    total = vec(0, 0, 0)
    for pt, tg, _, _, (p0, d) in pieces(("rect", c, axis, size, height, roll)):
        L = norm(d)
        r1, r2 = norm(add(P, scale(-1, p0))), norm(add(P, scale(-1, add(p0, d))))
        total = add(total, scale(mp.mpf(MU0) / (4 * mp.pi) * mp.log((r1 + r2 + L) / (r1 + r2 - L)) / L, d))
    return total


def mutual_potential(c1, c2):
    with mp.workdps(40):
        total = mp.mpf(0)
        for pt, tg, (t0, t1), _, _ in pieces(c2):
            total += mp.quad(lambda t: dot(potential(c1, pt(t)), tg(t)), [t0, (t0 + t1) / 2, t1])
        return total


MUTUAL = [
    ("circles_inclined_concentric", ("circle", (0, 0, 0), (0, 0, 1), 0.2, 0, 0), ("circle", (0, 0, 0), (0, 1, 1), 0.05, 0, 0)),
    ("circles_lateral_tilted", ("circle", (0, 0, 0), (0, 0, 1), 0.1, 0, 0), ("circle", (0.05, 0.02, 0.08), (0.3, 0.1, 1), 0.07, 0, 0)),
    ("circles_perpendicular", ("circle", (0, 0, 0), (0, 0, 1), 0.1, 0, 0), ("circle", (0.02, 0, 0.15), (1, 0, 0), 0.05, 0, 0)),
    ("circle_rect", ("circle", (0, 0, 0), (0, 0, 1), 0.1, 0, 0), ("rect", (0.01, -0.02, 0.12), (0.2, 0, 1), 0.15, 0.1, 20)),
    ("rects_rotated", ("rect", (0, 0, 0), (0, 0, 1), 0.3, 0.2, 0), ("rect", (0.05, 0.03, 0.1), (0.1, 0.2, 1), 0.25, 0.25, 45)),
    ("rects_orthogonal_rig", ("rect", (0, 0, -0.27), (0, 0, 1), 1.0, 1.0, 0), ("rect", (0.24, 0, 0), (1, 0, 0), 0.9, 0.9, 0)),
]


def flat(coil):
    shape, c, axis, size, height, roll = coil
    return [shape, *c, *axis, size, height, roll]


def main():
    rows = []
    for case, coil, turns, current, P in CASES:
        q = field_quadrature(coil, turns, current, P)
        cf = field_closed_form(coil, turns, current, P)
        with mp.workdps(40):
            size = norm(q)
            diff = norm(add(q, scale(-1, cf)))
            if not diff <= mp.mpf("1e-25") * size:
                raise SystemExit(f"{case}: quadrature and closed form differ by {mp.nstr(diff / size, 3)}")
        shape, c, axis, sz, h, roll = coil
        rows.append([case, shape, *c, *axis, sz, h, roll, turns, current, *[repr(float(x)) for x in P],
                     *[mp.nstr(x, 25) for x in q]])
        print(case, "ok")
    with open(HERE / "set_field.csv", "w", newline="") as f:
        f.write("# Field of one tilted circle or rotated rectangle (coil-set frame rule): mpmath Biot-Savart\n")
        f.write("# quadrature (40 digits) checked against the closed form (60/80 digits) to 1e-25 of |B|.\n")
        f.write("# Generated by tests/reference/generate_set_reference.py; mu0 = 1.25663706127e-6 (CODATA 2022).\n")
        w = csv.writer(f, lineterminator="\n")
        w.writerow(["case", "shape", "cx", "cy", "cz", "ax", "ay", "az", "size", "height", "roll_deg", "turns",
                    "current", "x", "y", "z", "bx", "by", "bz"])
        w.writerows(rows)
    mrows = []
    for case, c1, c2 in MUTUAL:
        m1 = mutual_neumann(c1, c2)
        m2 = mutual_potential(c1, c2)
        if not abs(m1 - m2) <= mp.mpf("1e-20") * abs(m2):
            raise SystemExit(f"{case}: Neumann and potential forms differ: {m1} {m2}")
        mrows.append([case, *flat(c1), *flat(c2), mp.nstr(m2, 25)])
        print(case, "ok", mp.nstr(m2, 15))
    with open(HERE / "set_mutual.csv", "w", newline="") as f:
        f.write("# Mutual inductance of two filaments (circle or rect, coil-set frame rule), one turn each:\n")
        f.write("# Neumann's double integral (mpmath, 30 digits) checked against the potential line integral\n")
        f.write("# (40 digits) to 1e-20. Generated by tests/reference/generate_set_reference.py; mu0 = 1.25663706127e-6.\n")
        w = csv.writer(f, lineterminator="\n")
        cols = ["shape", "cx", "cy", "cz", "ax", "ay", "az", "size", "height", "roll_deg"]
        w.writerow(["case", *[c + "1" for c in cols], *[c + "2" for c in cols], "m_H"])
        w.writerows(mrows)


if __name__ == "__main__":
    main()
