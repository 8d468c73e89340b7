#!/usr/bin/python3
"""High-precision reference values of the self-inductance (and a few mutual inductances) of
coaxial windings of rectangular cross-section with uniform current density, with mpmath.

Neumann's formula for two coaxial circles reduced to one angle,
  M(x, y, u) = mu0 x y integral_0^pi cos(phi) / R dphi,  R^2 = x^2 + y^2 - 2 x y cos(phi) + u^2,
averaged over both cross-sections. Here the engine's closed form over all four variables
(engine/src/inductance/rectangular_primitive.cpp) is NOT used: only the two axial integrals
and the integral over the radius x of winding 1 are done in closed form, by textbook
primitives (checked below by numerical differentiation), and the remaining integrals over the
radius y of winding 2 and the angle phi by mpmath's tanh-sinh quadrature, which absorbs the
end-point singularities where the two circles coincide (phi = 0, y = x, u = 0):
  - over x:   integral x y / R dx = y (R + c y ln(x - c y + R))      (c = cos phi)
  - twice over u (second difference over the axial corners):
      R           ->  R^3/6 + (rho^2/2)(u asinh(u/rho) - R),         rho^2 = R^2 - u^2
      ln(xi + R)  ->  (u^2 - s^2 y^2)/2 ln(xi + R) + xi u asinh(u/rho) - xi R/2
                      - s y u atan(u xi / (s y R))                   (xi = x - c y, s = sin phi)
    each up to terms independent of x (which the corner sum over x cancels) and linear in u.
mpmath's error estimate of the tanh-sinh quadrature (the change between its last two levels)
must be below 1e-17. Output: thick_self_inductance.csv (20 digits),
per turn pair. Run with Debian's python3-mpmath:
  /usr/bin/python3 tests/reference/generate_thick_self_reference.py
"""
import pathlib
import sys

import mpmath as mp

sys.path.insert(0, str(pathlib.Path(__file__).parent))
from mp_kernels import MU0, write_csv  # noqa: E402


def x_primitive(x, y, u, c, s, omc):
    """Twice over u and once over x of x y / R, up to the terms the corner sums cancel.
    omc = 1 - c, passed separately so that rho keeps its digits at small angles."""
    rho2 = (x - y) ** 2 + 2 * x * y * omc
    rho = mp.sqrt(rho2)
    R = mp.sqrt(rho2 + u * u)
    xi = (x - y) + y * omc
    # Where rho = 0 (coincident circles: a quadrature node at phi = 0, y = x) every coefficient
    # of asinh(u / rho) vanishes.
    ash = mp.asinh(u / rho) if rho2 > 0 else mp.mpf(0)
    lx = mp.log(xi + R) if xi >= 0 else mp.log((s * s * y * y + u * u) / (R - xi))
    u2_r = R ** 3 / 6 + rho2 / 2 * (u * ash - R)
    atan_term = mp.atan(u * xi / (s * y * R)) if u != 0 and s != 0 else mp.mpf(0)
    u2_lx = (u * u - s * s * y * y) / 2 * lx + xi * u * ash - xi * R / 2 - s * y * u * atan_term
    return y * (u2_r + c * y * u2_lx)


def check_primitive():
    """d/dx (d/du)^2 of the primitive is x y / R (numerical differentiation, 40 digits)."""
    with mp.workdps(40):
        for x, y, u, phi in [("1.3", "0.8", "0.6", "0.9"), ("0.5", "1.7", "0.3", "2.4"), ("1.1", "1.0", "0.05", "0.2")]:
            x, y, u, phi = map(mp.mpf, (x, y, u, phi))
            c, s = mp.cos(phi), mp.sin(phi)
            d = mp.diff(lambda X, U: x_primitive(X, y, U, c, s, 1 - c), (x, u), (1, 2))
            exact = x * y / mp.sqrt(x * x + y * y - 2 * c * x * y + u * u)
            assert abs(d / exact - 1) < mp.mpf("1e-25"), (x, y, u, phi, d / exact)


def mutual(w1, w2, d, degree):
    (a1, b1, h1), (a2, b2, h2) = [tuple(map(mp.mpf, w)) for w in (w1, w2)]
    d = mp.mpf(d)
    us = [(d + (h1 + h2) / 2, 1), (d + (h2 - h1) / 2, -1), (d - (h2 - h1) / 2, -1), (d - (h1 + h2) / 2, 1)]

    def inner(phi, y):
        c, s, omc = mp.cos(phi), mp.sin(phi), 2 * mp.sin(phi / 2) ** 2
        total = mp.mpf(0)
        for x, sx in ((b1, 1), (a1, -1)):
            for u, su in us:
                total += sx * su * x_primitive(x, y, u, c, s, omc)
        return c * total

    # Break points: the radii of winding 1 inside winding 2's extent (where y = x meets a corner).
    ys = sorted({a2, b2} | {r for r in (a1, b1) if a2 < r < b2})
    value, error = mp.quad(inner, [0, mp.pi / 8, mp.pi], ys, maxdegree=degree, error=True)
    scale = mp.mpf(MU0) / ((b1 - a1) * (b2 - a2) * h1 * h2)
    return scale * value, abs(error / value)


CASES = [
    # label, winding 1 (inner, outer, length), winding 2, distance
    ("square section", (1.0, 2.0, 1.0), (1.0, 2.0, 1.0), 0.0),
    ("Brooks coil", (2 / 3, 4 / 3, 2 / 3), (2 / 3, 4 / 3, 2 / 3), 0.0),
    ("long thick", (0.5, 1.0, 4.0), (0.5, 1.0, 4.0), 0.0),
    ("flat thick", (0.3, 1.0, 0.2), (0.3, 1.0, 0.2), 0.0),
    ("thin build", (1.0, 1.1, 0.5), (1.0, 1.1, 0.5), 0.0),
    ("nested touching", (0.5, 1.0, 0.6), (1.0, 1.4, 0.3), 0.1),
]


def main():
    mp.mp.dps = 20
    check_primitive()
    rows = []
    for label, w1, w2, d in CASES:
        fine, change = mutual(w1, w2, d, 6)
        print(label, mp.nstr(fine, 22), "quadrature error estimate", mp.nstr(change, 3), flush=True)
        if change > mp.mpf("1e-17"):
            raise SystemExit(f"{label}: not converged")
        rows.append([label, *map(repr, w1), *map(repr, w2), repr(d), mp.nstr(fine, 20, min_fixed=1, max_fixed=0)])
    write_csv(pathlib.Path(__file__).with_name("thick_self_inductance.csv"),
              ["Mutual inductance per turn pair (H) of coaxial windings of rectangular cross-section",
               "(self-inductance when both are the same winding at distance 0): Neumann's angle integral,",
               "closed forms over the axial offsets and one radius, mpmath tanh-sinh over the other radius and",
               "the angle at 20 digits. Generated by tests/reference/generate_thick_self_reference.py;",
               "mu0 = 1.25663706127e-6 (CODATA 2022)."],
              ["case", "inner1_m", "outer1_m", "length1_m", "inner2_m", "outer2_m", "length2_m", "distance_m",
               "value"], rows)


if __name__ == "__main__":
    main()
