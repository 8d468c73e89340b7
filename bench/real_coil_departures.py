#!/usr/bin/python3
"""How far a real winding departs from Coilwright's models: figures for the README.

Prints, for an example single-layer solenoid and a Helmholtz pair:
- helix against current sheet: the field at the centre of a helical winding (Biot-Savart along
  the wire, scipy quad per turn) against the thin current-sheet solenoid (closed form on the
  axis) and against N coaxial loops; the azimuthal field of the helix's axial current outside
  it, mu0 I / (2 pi r), against the axial field mu0 N I / l inside;
- the ripple of the discrete turns near the winding, from the loops-against-sheet difference;
- leads: a single unpaired lead and a parallel lead pair near the working volume;
- winding errors: a spacing error of a Helmholtz pair, by the closed form on the axis.
Run: /usr/bin/python3 bench/real_coil_departures.py
"""
import math

import numpy as np
from scipy import integrate

MU0 = 1.25663706127e-6  # CODATA 2022, as engine/include/coilwright/constants.hpp


def helix_bz(radius, pitch, turns, point):
    """Bz at `point` of a helix centred on z = 0 (Biot-Savart, one quad per turn)."""
    x0, y0, z0 = point
    length = pitch * turns
    k = pitch / (2 * math.pi)

    def integrand(t):
        x, y, z = radius * math.cos(t), radius * math.sin(t), k * t - length / 2
        dx, dy = -radius * math.sin(t), radius * math.cos(t)  # dl/dt (dz/dt = k adds no Bz)
        rx, ry, rz = x0 - x, y0 - y, z0 - z
        r3 = (rx * rx + ry * ry + rz * rz) ** 1.5
        return (dx * ry - dy * rx) / r3

    total = sum(integrate.quad(integrand, 2 * math.pi * n, 2 * math.pi * (n + 1), epsabs=0, epsrel=1e-13)[0]
                for n in range(turns))
    return MU0 / (4 * math.pi) * total


def sheet_bz_axis(radius, length, turns, z):
    n = turns / length
    a, b = z + length / 2, z - length / 2
    return MU0 * n / 2 * (a / math.hypot(a, radius) - b / math.hypot(b, radius))


def loops_bz(radius, pitch, turns, point_z):
    zs = (np.arange(turns) + 0.5) * pitch - pitch * turns / 2
    return float(np.sum(MU0 * radius**2 / (2 * (radius**2 + (point_z - zs) ** 2) ** 1.5)))


def main():
    radius, pitch, turns = 0.02, 0.001, 60  # 40 mm bore, 60 turns of 1 mm pitch: l = 60 mm
    length = pitch * turns
    sheet = sheet_bz_axis(radius, length, turns, 0.0)
    helix = helix_bz(radius, pitch, turns, (0.0, 0.0, 0.0))
    loops = loops_bz(radius, pitch, turns, 0.0)
    print(f"solenoid r = {radius * 1e3:g} mm, {turns} turns at {pitch * 1e3:g} mm pitch, 1 A:")
    print(f"  centre Bz: sheet {sheet:.10e} T, helix {helix:.10e} T ({helix / sheet - 1:+.2e}), "
          f"loops {loops:.10e} T ({loops / sheet - 1:+.2e})")
    print(f"  helix's axial current outside: B_phi / Bz_inside = pitch / (2 pi r) = {pitch / (2 * math.pi * radius):.2e}")
    for gap in (0.0005, 0.001, 0.002):
        r = radius - gap
        # The ripple has the pitch as its period: half a pitch along it is in opposite phase,
        # a whole pitch along in the same (only the smooth variation along the coil remains).
        h0, h_half, h_one = (helix_bz(radius, pitch, turns, (r, 0.0, z)) for z in (0.0, pitch / 2, pitch))
        ripple = abs(h_half - (h0 + h_one) / 2) / abs(h0)
        print(f"  {gap * 1e3:g} mm inside the winding ({gap / pitch:g} pitch): turn ripple of Bz {ripple:.1e}")
    # Leads, 3 A, 50 mm from the working point, against a 100 uT rig.
    current, d, s = 3.0, 0.05, 0.002
    single = MU0 * current / (2 * math.pi * d)
    pair = MU0 * current * s / (2 * math.pi * d * d)
    print(f"leads at {d * 1e3:g} mm, {current:g} A: one lead {single * 1e6:.2f} uT, a pair {s * 1e3:g} mm apart "
          f"{pair * 1e6:.3f} uT ({pair / 100e-6:.2%} of 100 uT)")
    # Helmholtz pair R = 0.5 m: centre field against spacing error ds.
    big_r = 0.5
    for ds in (0.001, 0.005):
        b = lambda sp: big_r**2 / (big_r**2 + sp**2 / 4) ** 1.5  # per loop, common factors out
        change = b(big_r + ds) / b(big_r) - 1
        # field at z = 0.1 R relative to the centre, Helmholtz and with the error
        def rel_off(sp, z):
            f = lambda zz: big_r**2 / (big_r**2 + zz**2) ** 1.5
            return (f(z - sp / 2) + f(z + sp / 2)) / (f(-sp / 2) + f(sp / 2)) - 1
        print(f"Helmholtz R = {big_r} m, spacing {ds * 1e3:g} mm too long: centre field {change:+.2e}, "
              f"deviation at z = 50 mm {rel_off(big_r, 0.05):+.1e} -> {rel_off(big_r + ds, 0.05):+.1e}")


if __name__ == "__main__":
    main()
