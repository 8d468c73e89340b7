#!/usr/bin/python3
"""Reference values of mutual and self-inductance, and of dM/dd, for coaxial windings of
rectangular cross-section (uniform current density), including thin sheets, flat spirals
and loops, by a formulation independent of the engine's:

  M = mu0 < r1 r2 integral_0^pi cos(phi) Z(rho) dphi >_{r1, r2},
  rho^2 = (r1 - r2)^2 + 4 r1 r2 sin^2(phi / 2),

Neumann's double line integral over two coaxial circles reduced to one angle, with the axial
averages over both windings in closed form: Z is the average of 1 / sqrt(u^2 + rho^2) over
u = z2 - z1, i.e. the second antiderivative u asinh(u/rho) - sqrt(u^2 + rho^2) at the four
corners of the axial extents divided by h1 h2 (the slope dM/dd uses the first antiderivative
asinh(u/rho); zero lengths use the lower antiderivatives). The engine instead averages
Maxwell's elliptic-integral formula numerically over u.

Arithmetic in numpy's extended precision (x87 long double, 64-bit mantissa), so that the
cancellations of the four-corner sums and of the angle integral stay far below 1e-15.
Quadrature: Gauss-Legendre on subintervals graded geometrically (ratio 2) towards the
places where filaments coincide (phi = 0 for r1 = r2; zero radial gap), each radial extent
cut at the other's end points and a common radial piece folded onto r1 >= r2 and integrated
over the gap. Every value is computed at two resolutions and must agree to 1e-15.
Output: winding_inductance.csv (17 digits), per turn pair.
Run with Debian's python3-numpy: /usr/bin/python3 tests/reference/generate_winding_reference.py
"""
import csv
import pathlib
import sys

import numpy as np

LD = np.longdouble
MU0 = LD("1.25663706127e-6")  # CODATA 2022, as in engine/include/coilwright/constants.hpp
PI = LD("3.14159265358979323846264338327950288")


def gauss(n):
    x, w = np.polynomial.legendre.leggauss(n)
    return (LD(1) + x.astype(LD)) / 2, w.astype(LD) / 2


def graded(lo, hi, toward_lo, n, levels):
    """Gauss nodes and weights on [lo, hi], subintervals halving towards lo (if toward_lo)."""
    lo, hi = LD(lo), LD(hi)
    if hi <= lo:
        return np.array([lo]), np.array([LD(1)])  # a single point, weight 1
    x, w = gauss(n)
    edges = [lo, hi]
    if toward_lo:
        edges = [lo] + [lo + (hi - lo) * LD(2) ** -k for k in range(levels, -1, -1)]
    nodes, weights = [], []
    for a, b in zip(edges[:-1], edges[1:]):
        nodes.append(a + (b - a) * x)
        weights.append((b - a) * w)
    return np.concatenate(nodes), np.concatenate(weights)


def axial_average(rho, d, h1, h2, slope):
    r2 = rho * rho
    a0 = lambda u: 1 / np.sqrt(u * u + r2)
    da0 = lambda u: -u / (u * u + r2) ** LD(1.5)
    a1 = lambda u: np.arcsinh(u / rho)
    a2 = lambda u: u * np.arcsinh(u / rho) - np.sqrt(u * u + r2)
    if h1 > 0 and h2 > 0:
        c1, e1, c2, e2 = -h1 / 2, h1 / 2, d - h2 / 2, d + h2 / 2
        f = a1 if slope else a2
        return (f(e2 - c1) - f(e2 - e1) - f(c2 - c1) + f(c2 - e1)) / (h1 * h2)
    if h1 > 0 or h2 > 0:
        h = h1 + h2
        f = a0 if slope else a1
        return (f(d + h / 2) - f(d - h / 2)) / h
    return da0(d) if slope else a0(d)


class Pair:
    def __init__(self, w1, w2, d, slope, n, levels):
        (self.a1, self.b1, self.h1), (self.a2, self.b2, self.h2) = [tuple(map(LD, w)) for w in (w1, w2)]
        self.d, self.slope, self.n, self.levels = LD(d), slope, n, levels
        self.phi, self.wphi = graded(0, PI, True, n, levels + 8)

    def kernel(self, r1, r2):
        """mu0 r1 r2 integral cos(phi) Z dphi for arrays of radii."""
        out = np.empty(r1.shape, dtype=LD)
        flat1, flat2, res = r1.ravel(), r2.ravel(), out.ravel()
        for start in range(0, flat1.size, 2000):
            x, y = flat1[start:start + 2000, None], flat2[start:start + 2000, None]
            rho = np.sqrt((x - y) ** 2 + 4 * x * y * np.sin(self.phi / 2) ** 2)
            z = axial_average(rho, self.d, self.h1, self.h2, self.slope)
            res[start:start + 2000] = MU0 * x[:, 0] * y[:, 0] * ((np.cos(self.phi) * z) @ self.wphi)
        return out

    def value(self):
        a1, b1, a2, b2 = self.a1, self.b1, self.a2, self.b2
        breaks = sorted({a1, b1, a2, b2})
        cut = lambda lo, hi: [(lo, hi)] if lo == hi else list(
            zip(*(lambda e: (e[:-1], e[1:]))([lo] + [b for b in breaks if lo < b < hi] + [hi])))
        f1 = 1 / (b1 - a1) if b1 > a1 else LD(1)
        f2 = 1 / (b2 - a2) if b2 > a2 else LD(1)
        total = LD(0)
        n, lv = self.n, self.levels
        # Filaments can only come close where the axial offsets approach 0.
        axial_gap = max(LD(0), abs(self.d) - (self.h1 + self.h2) / 2)
        near = axial_gap < max(b1 - a1, b2 - a2, LD("1e-300"))
        for p in cut(a1, b1):
            for q in cut(a2, b2):
                if p == q and p[1] > p[0]:
                    lo, w = p
                    w = w - lo
                    g, wg = graded(0, w, near, n, lv)
                    t, wt = graded(0, 1, lo < w, n, lv // 2)  # grade towards the axis for coils near it
                    G, T = np.meshgrid(g, t, indexing="ij")
                    r2 = lo + (w - G) * T
                    k = self.kernel(r2 + G, r2)
                    total += 2 * np.einsum("i,j,ij->", wg, wt, k * (w - G))
                else:
                    left, right = (p, q) if p[1] <= q[0] else (q, p)
                    touching = left[1] == right[0] and near
                    # Distances below and above the meeting radius; a touching corner is a point
                    # singularity (weaker than the diagonal's edge): half the grading depth.
                    x, wx = graded(0, left[1] - left[0], touching, n, lv // 2)
                    y, wy = graded(right[0] - left[1], right[1] - left[1], touching, n, lv // 2)
                    X, Y = np.meshgrid(x, y, indexing="ij")
                    total += np.einsum("i,j,ij->", wx, wy, self.kernel(left[1] - X, left[1] + Y))
        return total * f1 * f2


CASES = [
    # label, winding 1 (inner, outer, length), winding 2, distance, quantity
    ("thick self", (1.0, 2.0, 1.0), (1.0, 2.0, 1.0), 0.0, "m"),
    ("Brooks coil self", (2 / 3, 4 / 3, 2 / 3), (2 / 3, 4 / 3, 2 / 3), 0.0, "m"),
    ("thin-wall self", (1.0, 1.01, 1.0), (1.0, 1.01, 1.0), 0.0, "m"),
    ("flat spiral self", (0.5, 1.0, 0.0), (0.5, 1.0, 0.0), 0.0, "m"),
    ("pancake self", (1.0, 2.0, 0.01), (1.0, 2.0, 0.01), 0.0, "m"),
    ("long thick self", (0.5, 1.0, 10.0), (0.5, 1.0, 10.0), 0.0, "m"),
    ("near-axis self", (0.01, 1.0, 0.5), (0.01, 1.0, 0.5), 0.0, "m"),
    ("separated coils", (1.0, 1.5, 0.5), (0.8, 1.2, 0.3), 2.0, "m"),
    ("nested coils", (0.5, 0.8, 0.3), (1.0, 1.5, 0.5), 0.05, "m"),
    ("touching layers", (1.0, 1.2, 0.4), (1.2, 1.5, 0.4), 0.0, "m"),
    ("stacked touching", (1.0, 1.5, 0.5), (1.0, 1.5, 0.5), 0.5, "m"),
    ("partial overlap", (1.0, 1.5, 0.5), (0.8, 1.2, 0.3), 0.4, "m"),
    ("sheets", (1.0, 1.0, 2.0), (0.5, 0.5, 1.0), 0.3, "m"),
    ("loop in thick coil", (1.2, 1.2, 0.0), (1.0, 1.5, 0.5), 0.1, "m"),
    ("loop and flat spiral", (0.7, 0.7, 0.0), (0.5, 1.0, 0.0), 0.2, "m"),
    ("far apart", (1.0, 1.5, 0.5), (0.8, 1.2, 0.3), 6.0, "m"),
    ("separated coils", (1.0, 1.5, 0.5), (0.8, 1.2, 0.3), 2.0, "slope"),
    ("nested coils", (0.5, 0.8, 0.3), (1.0, 1.5, 0.5), 0.05, "slope"),
    ("stacked touching", (1.0, 1.5, 0.5), (1.0, 1.5, 0.5), 0.5, "slope"),
    ("partial overlap", (1.0, 1.5, 0.5), (0.8, 1.2, 0.3), 0.4, "slope"),
    ("sheets", (1.0, 1.0, 2.0), (0.5, 0.5, 1.0), 0.3, "slope"),
    ("loop in thick coil", (1.2, 1.2, 0.0), (1.0, 1.5, 0.5), 0.1, "slope"),
    ("flat spirals", (0.5, 1.0, 0.0), (0.3, 0.8, 0.0), 0.25, "slope"),
]


def main():
    only = {int(a) for a in sys.argv[1:]}
    rows = []
    for index, (label, w1, w2, d, what) in enumerate(CASES):
        if only and index not in only:
            continue
        coarse = Pair(w1, w2, d, what == "slope", 14, 44).value()
        fine = Pair(w1, w2, d, what == "slope", 18, 52).value()
        diff = abs(coarse - fine) / abs(fine)
        print(index, label, what, np.format_float_scientific(fine, 19), f"refinement changed it by {float(diff):.1e}",
              flush=True)
        if diff > 1e-15:
            raise SystemExit(f"{label}: not converged")
        rows.append([label, *map(repr, w1), *map(repr, w2), repr(d), what,
                     np.format_float_scientific(fine, 17, unique=False)])
    if only:
        return
    path = pathlib.Path(__file__).with_name("winding_inductance.csv")
    with open(path, "w", newline="") as f:
        f.write("# Mutual inductance per turn pair (quantity m, H) or its slope dM/dd (slope, H/m) of coaxial\n")
        f.write("# windings: Neumann's angle integral with closed-form axial averages, graded Gauss-Legendre in\n")
        f.write("# x87 extended precision, two resolutions agreeing to 1e-15. Self-inductance: a winding with\n")
        f.write("# itself at distance 0. Generated by tests/reference/generate_winding_reference.py;\n")
        f.write("# mu0 = 1.25663706127e-6 (CODATA 2022).\n")
        w = csv.writer(f)
        w.writerow(["case", "inner1_m", "outer1_m", "length1_m", "inner2_m", "outer2_m", "length2_m", "distance_m",
                    "quantity", "value"])
        w.writerows(rows)
    print(f"wrote {len(rows)} rows to {path}")


if __name__ == "__main__":
    main()
