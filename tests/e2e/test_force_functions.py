"""Force functions (LOOP_FZ, COIL_FZ, STACK_FZ, SOLENOID_PRESSURE) in a real headless Calc."""
import unittest

from e2e_support import CalcTestCase, read_reference

MU0 = 1.25663706127e-6  # CODATA 2022


class ForceFunctionsInCalc(CalcTestCase):
    def test_loop_force_against_mpmath_reference(self):
        # tests/reference/loop_mutual.csv: dM/dd by mpmath.diff of Maxwell's formula at 80 digits.
        rows = [r for r in read_reference("loop_mutual.csv") if float(r["dm_dd_H_per_m"]) != 0]
        for i, row in enumerate(rows):
            for j, key in enumerate(("radius1_m", "radius2_m", "distance_m")):
                self.sheet.getCellByPosition(j, i).setValue(float(row[key]))
            n = i + 1
            got = self.value(f"E{n}", f"=LOOP_FZ(A{n};3;2;B{n};5;-1.5;C{n})")
            self.assert_rel(got, 3 * 2 * 5 * -1.5 * float(row["dm_dd_H_per_m"]), 5e-15, row["case"])

    def test_coil_force_is_the_derivative_of_the_mutual_inductance(self):
        # Energy consistency checked in the sheet itself: COIL_FZ against a finite difference
        # (Richardson) of COIL_M typed as formulas.
        coil1, coil2 = "0.1;0.15;0.05;200;1.5", "0.08;0.12;0.03;100;-2"
        d, h = 0.06, 1e-4
        f = self.value("A1", f"=COIL_FZ({coil1};{coil2};{d})")

        def m(x):
            return self.value("A2", f"=COIL_M(0.1;0.15;0.05;200;0.08;0.12;0.03;100;{x!r})")
        d1 = (m(d + h) - m(d - h)) / (2 * h)
        d2 = (m(d + h / 2) - m(d - h / 2)) / h
        self.assert_rel(f, 1.5 * -2 * (4 * d2 - d1) / 3, 1e-7, "COIL_FZ = I1 I2 dM/dz")
        self.assertGreater(f, 0)  # opposite currents repel: coil 2 is pushed towards +z

    def test_stack_forces_are_a_column_that_balances(self):
        table = [[0.10, 0.12, 0.02, -0.05, 100, 1.0],
                 [0.10, 0.12, 0.02, 0.05, 100, 1.0],
                 [0.06, 0.06, 0.20, 0.00, 300, 0.5]]
        for i, r in enumerate(table):
            for j, v in enumerate(r):
                self.sheet.getCellByPosition(j, i).setValue(v)
        f = [row[0] for row in self.array("H1:H3", "=STACK_FZ(A1:F3)")]
        self.assertLess(abs(sum(f)), 1e-12 * max(map(abs, f)))  # Newton's third law
        self.assertLess(f[1], 0)  # row 2 is pulled towards row 1
        pair = self.value("J1", "=COIL_FZ(0.1;0.12;0.02;100;1;0.1;0.12;0.02;100;1;0.1)") + \
            self.value("J2", "=COIL_FZ(0.06;0.06;0.2;300;0.5;0.1;0.12;0.02;100;1;0.05)")
        self.assert_rel(f[1], pair, 1e-13, "row 2 = sum of pair forces")

    def test_solenoid_pressure(self):
        # Long solenoid: B^2/(2 mu0) with B = mu0 N I / l (magnetic pressure on a current sheet).
        p = self.value("A1", "=SOLENOID_PRESSURE(0.01;10;20000;2)")
        b = MU0 * 20000 * 2 / 10
        self.assert_rel(p, b * b / (2 * MU0), 2e-3, "long solenoid")
        short = self.value("A2", "=SOLENOID_PRESSURE(0.05;0.05;100;2)")
        self.assertTrue(0 < short < (MU0 * 100 * 2 / 0.05) ** 2 / (2 * MU0))  # weaker field inside

    def test_bad_input_gives_error_cells(self):
        for text in ("=LOOP_FZ(0.1;1;1;0.1;1;1;0)", "=LOOP_FZ(0;1;1;0.1;1;1;1)", "=LOOP_FZ(0.1;-1;1;0.1;1;1;1)",
                     "=COIL_FZ(0.1;0.1;0;1;1;0.1;0.1;0.2;1;1;0.1)", "=COIL_FZ(0.2;0.1;0.1;1;1;0.1;0.12;0.1;1;1;1)",
                     "=STACK_FZ_ARRAY({0.1;0.12;0.02;0;100})", "=SOLENOID_PRESSURE(0.1;0;1;1)",
                     "=SOLENOID_PRESSURE(0.1;0.1;1;1E200)"):
            with self.subTest(text=text):
                self.assert_error(text, where="A1")


if __name__ == "__main__":
    unittest.main()
