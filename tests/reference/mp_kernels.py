"""High-precision kernels shared by the reference generators (mpmath, Debian's python3-mpmath).

Each generator computes its references at least two independent ways; the pieces they share
live here once: the constant, the loop field in the classical elliptic-integral form
(W. R. Smythe, Static and Dynamic Electricity, 1950; J. D. Jackson, Classical Electrodynamics,
sec. 5.5) and Bulirsch's cel through Carlson's symmetric integrals (DLMF 19.25).
"""
import csv

import mpmath as mp

MU0 = "1.25663706127e-6"  # CODATA 2022, as in engine/include/coilwright/constants.hpp


def loop_field(a, z, r):
    """(Bz, Br) of one turn of radius a carrying 1 A, in units of mu0, at the working precision;
    its cancellation near the axis and far away is harmless at 50 digits and more."""
    a, z, r = map(mp.mpf, (a, z, r))
    alpha2 = (a - r) ** 2 + z * z
    beta2 = (a + r) ** 2 + z * z
    beta = mp.sqrt(beta2)
    m = 1 - alpha2 / beta2
    K, E = mp.ellipk(m), mp.ellipe(m)
    bz = ((a * a - r * r - z * z) * E + alpha2 * K) / (2 * mp.pi * alpha2 * beta)
    br = 0 if r == 0 else z * ((a * a + r * r + z * z) * E - alpha2 * K) / (2 * mp.pi * alpha2 * beta * r)
    return bz, mp.mpf(br)


def cel(kc, p, a, b):
    """Bulirsch's cel(kc, p, a, b) = a R_F(0, kc^2, 1) + (b - a p) / 3 R_J(0, kc^2, 1, p)."""
    kc, p, a, b = map(mp.mpf, (kc, p, a, b))  # no Python float may slip in (-2 / 3 would)
    x = kc * kc
    rj = mp.elliprd(0, x, 1) if p == 1 else mp.elliprj(0, x, 1, p)  # R_J(x, y, z, z) = R_D
    return a * mp.elliprf(0, x, 1) + (b - a * p) / 3 * rj


def write_csv(path, comments, header, rows):
    """A reference table: comment lines ("# ..."), a header line, then one row per case."""
    with open(path, "w", newline="") as f:
        for line in comments:
            f.write("# " + line + "\n")
        writer = csv.writer(f)
        writer.writerow(header)
        writer.writerows(rows)
