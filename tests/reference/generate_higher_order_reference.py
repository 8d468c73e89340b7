#!/usr/bin/python3
"""Reference values for the higher-order coaxial designs and the real turns of a layer winding,
computed independently of the engine with mpmath (Debian's python3-mpmath):

higher_order_designs.csv: each design solved at 40 digits by mpmath.findroot from the engine's
rounded starting points (engine/src/design/higher_order_seeds.hpp). The axial field's Taylor
coefficients come from the generating function of the Gegenbauer polynomials (DLMF 18.12.4; the polynomials by their recurrence, 18.9.1):
a^2 (a^2 + (u - z)^2)^(-3/2) = a^2 rho^-3 sum_n C_n^(3/2)(z / rho) (u / rho)^n, rho^2 = a^2 + z^2,
where the engine differentiates the closed form with Taylor jets. Rows: one per loop, radius 1
and the reference loop's ampere-turns 1 (as the engine's tables), sorted by z.

real_turns.csv: Bz and Br of layer windings as the sum of their turns, each the classical
elliptic-integral loop field of mp_kernels.loop_field at 30 digits, the turns placed by the
conventions stated in engine/include/coilwright/field/real_turns.hpp.

Run: /usr/bin/python3 tests/reference/generate_higher_order_reference.py
"""
import pathlib
import re
import sys

import mpmath as mp

sys.path.insert(0, str(pathlib.Path(__file__).parent))
from mp_kernels import MU0, loop_field, write_csv  # noqa: E402

HERE = pathlib.Path(__file__).parent
SEEDS = HERE.parent.parent / "engine/src/design/higher_order_seeds.hpp"


def seeds():
    text = SEEDS.read_text()
    for m in re.finditer(r"\{(true|false), (true|false), (\d), (true|false), \{([^}]*)\}\}", text):
        yield (m.group(1) == "true", m.group(2) == "true", int(m.group(3)), m.group(4) == "true",
               [mp.mpf(v) for v in m.group(5).split(",")])


def coefficients(a, z, n_max):
    """Taylor coefficients about u = 0 of a^2 (a^2 + (u - z)^2)^(-3/2)."""
    rho = mp.sqrt(a * a + z * z)
    x, lam = z / rho, mp.mpf(3) / 2
    c = [mp.mpf(1), 2 * lam * x]  # C_n^(3/2)(x) by the recurrence DLMF 18.9.1
    for n in range(1, n_max):
        c.append((2 * (n + lam) * x * c[n] - (n + 2 * lam - 1) * c[n - 1]) / (n + 1))
    return [a * a / rho ** 3 * c[n] / rho ** n for n in range(n_max + 1)]


def loops(gradient, sphere, pairs, centre, x):
    """(radius, z, weight) of every loop of unknowns x (the engine's layout)."""
    w = [mp.mpf(1)] * pairs
    if centre:
        w = list(x[pairs:2 * pairs])
    else:
        w[1:] = x[pairs:2 * pairs - 1]
    out = []
    for i in range(pairs):
        a = mp.sqrt(1 - x[i] ** 2) if sphere else mp.mpf(1)
        out.append((a, x[i], w[i]))
        out.append((a, -x[i], -w[i] if gradient else w[i]))
    if centre:
        out.append((mp.mpf(1), mp.mpf(0), mp.mpf(1)))
    return out


def residuals(gradient, sphere, pairs, centre, x, n_max=22):
    total = [mp.mpf(0)] * (n_max + 1)
    for a, z, w in loops(gradient, sphere, pairs, centre, x):
        for n, c in enumerate(coefficients(a, z, n_max)):
            total[n] += w * c
    m = 2 * pairs - 1 + (1 if centre else 0)
    ref = total[1] if gradient else total[0]
    return [total[2 * (k + 1) + (1 if gradient else 0)] / ref for k in range(m)]


def designs():
    rows = []
    for gradient, sphere, pairs, centre, x0 in seeds():
        f = lambda *v: residuals(gradient, sphere, pairs, centre, list(v))  # noqa: E731
        x = mp.findroot(f, x0, tol=mp.mpf(10) ** -35, maxsteps=100)
        x = [x] if pairs == 1 and not centre and not hasattr(x, "rows") else list(x)
        assert max(abs(r) for r in f(*x)) < mp.mpf(10) ** -30
        ls = sorted(loops(gradient, sphere, pairs, centre, x), key=lambda t: t[1])
        nearest = min(ls, key=lambda t: (abs(t[1]), -t[1]))
        for i, (a, z, w) in enumerate(ls):
            rows.append(["gradient" if gradient else "uniform", "sphere" if sphere else "cylinder", pairs,
                         int(centre), i, mp.nstr(z, 20), mp.nstr(a, 20), mp.nstr(w / abs(nearest[2]), 20)])
    return rows


WINDINGS = [  # inner radius, wire diameter, turns per layer, layers, packing
    (0.02, 0.001, 10, 3, "square"),
    (0.02, 0.001, 10, 4, "hexagonal"),
    (0.05, 0.0005, 40, 5, "square"),
]
POINTS = [(0.0, 0.0), (0.003, 0.004), (0.0, 0.0195), (0.0052, 0.0201), (-0.01, 0.0235), (0.06, 0.03), (0.4, 0.1)]


def turn_positions(inner, d, n, layers, packing):
    p = d * mp.sqrt(3) / 2 if packing == "hexagonal" else d
    out = []
    for j in range(layers):
        nj = n - 1 if packing == "hexagonal" and j % 2 == 1 else n
        for k in range(nj):
            out.append((inner + d / 2 + j * p, (k - mp.mpf(nj - 1) / 2) * d))
    return out


def turns():
    rows = []
    for inner, d, n, layers, packing in WINDINGS:
        ts = turn_positions(mp.mpf(inner), mp.mpf(d), n, layers, packing)
        for z, r in POINTS:
            bz = br = mp.mpf(0)
            for a, zt in ts:
                fz, fr = loop_field(a, mp.mpf(z) - zt, r)
                bz, br = bz + fz, br + fr
            k = mp.mpf(MU0) * 1.5  # 1.5 A per turn
            rows.append([inner, d, n, layers, packing, z, r, mp.nstr(k * bz, 20), mp.nstr(k * br, 20)])
    return rows


def main():
    mp.mp.dps = 40
    write_csv(HERE / "higher_order_designs.csv",
              ["Higher-order coaxial designs (radius 1, reference ampere-turns 1), solved in mpmath from the",
               "Gegenbauer series of the loop's axial field; generate_higher_order_reference.py"],
              ["kind", "constraint", "pairs", "centre", "index", "z", "radius", "ampere_turns"], designs())
    mp.mp.dps = 30
    write_csv(HERE / "real_turns.csv",
              ["Layer windings as sums of loops (mp_kernels.loop_field), 1.5 A per turn, T;",
               "generate_higher_order_reference.py"],
              ["inner", "d", "n", "layers", "packing", "z", "r", "bz", "br"], turns())


if __name__ == "__main__":
    main()
