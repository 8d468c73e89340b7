"""Regions and inverse design in real Calc."""
import unittest

from bad_input_check import check_family
from e2e_support import CalcTestCase

MU0 = 1.25663706127e-6  # CODATA 2022
PAIR = "{0.3;0.3;0;-0.15;50;1|0.3;0.3;0;0.15;50;1}"


class Regions(CalcTestCase):
    def test_scale_for_a_target_reaches_it(self):
        k = self.value("A1", f"=STACK_SCALE_FOR_BZ_ARRAY({PAIR};1E-4;0)")
        # Helmholtz centre field (4/5)^(3/2) mu0 N I / R (textbook): the scale is the current needed.
        self.assert_rel(k, 1e-4 / ((4 / 5) ** 1.5 * MU0 * 50 / 0.3), 1e-14, "current for 100 uT")
        got = self.value("A2", f"=STACK_BZ_ARRAY({PAIR}*{{1;1;1;1;1;1}}*1;0)*A1")
        self.assert_rel(got, 1e-4, 1e-14, "field at that current")

    def test_regions_are_ordered(self):
        axial = self.value("A1", f"=STACK_UNIFORM_Z_ARRAY({PAIR};0.001)")
        radial = self.value("A2", f"=STACK_UNIFORM_R_ARRAY({PAIR};0.001)")
        sphere = self.value("A3", f"=STACK_UNIFORM_SPHERE_ARRAY({PAIR};0.001)")
        self.assertLessEqual(sphere, min(axial, radial) * (1 + 1e-9))
        self.assertGreater(sphere, 0.05)
        # Gradient anywhere: zero on the mid-plane of a symmetric pair, by symmetry.
        self.assertAlmostEqual(self.value("A4", f"=STACK_DBZDZ_ARRAY({PAIR};0;0.1)"), 0.0, delta=1e-12)

    def test_bad_inputs(self):
        check_family(self, "regions", ["STACK_DBZDZ", "STACK_UNIFORM_R", "STACK_UNIFORM_SPHERE",
                                       "STACK_SCALE_FOR_BZ", "STACK_SCALE_FOR_GRADIENT"])


if __name__ == "__main__":
    unittest.main()
