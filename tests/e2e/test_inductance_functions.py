"""Inductance functions (SOLENOID_L, LOOP_M, LOOP_L, LOOP_K, COIL_L, COIL_M, COIL_K,
STACK_LMATRIX, STACK_L, STACK_ENERGY) in a real headless Calc with the built extension."""
import math
import unittest

from e2e_support import CalcTestCase, ERR_DIV_ZERO, read_reference

MU0 = 1.25663706127e-6  # CODATA 2022


class InductanceFunctionsInCalc(CalcTestCase):
    def put_row(self, row, values, col=0):
        for j, v in enumerate(values):
            self.sheet.getCellByPosition(col + j, row).setValue(v)

    def test_solenoid_against_mpmath_reference(self):
        # tests/reference/solenoid_inductance.csv: Lorenz/Nagaoka closed form at 120 digits,
        # checked against the sheet double integral (mpmath). Inputs go in as cell values.
        rows = read_reference("solenoid_inductance.csv")
        for i, row in enumerate(rows):
            self.put_row(i, [float(row["radius_m"]), float(row["length_m"])])
            got = self.value(f"D{i + 1}", f"=SOLENOID_L(A{i + 1};B{i + 1};1)")
            self.assert_rel(got, float(row["l_H"]), 1e-14, f"a={row['radius_m']} l={row['length_m']}")
        self.assertEqual(self.cell("D1").getFormula(), "=ORG.COILWRIGHT.FUNCTIONS.SOLENOID_L(A1;B1;1)")
        # N^2 scaling and the long-solenoid limit mu0 N^2 pi a^2 / l (1 - 8a/(3 pi l)).
        long = self.value("F1", "=SOLENOID_L(0.01;100;1000)")
        self.assert_rel(long, MU0 * 1e6 * math.pi * 1e-4 / 100 * (1 - 8 * 0.01 / (3 * math.pi * 100)), 1e-7, "long")

    def test_loop_mutual_against_mpmath_reference(self):
        # tests/reference/loop_mutual.csv: Maxwell's formula at 80 digits checked against
        # Neumann's integral (mpmath): touching, 1e6 radii apart, radius ratios to 1e5.
        rows = read_reference("loop_mutual.csv")
        for i, row in enumerate(rows):
            self.put_row(i, [float(row["radius1_m"]), float(row["radius2_m"]), float(row["distance_m"])])
            got = self.value(f"E{i + 1}", f"=LOOP_M(A{i + 1};B{i + 1};C{i + 1})")
            self.assert_rel(got, float(row["m_H"]), 5e-15, row["case"])

    def test_loops_of_round_wire(self):
        # Thin-ring formula mu0 a (ln(8a/rho) - 7/4) for a thin wire (Rosa and Grover 1912).
        got = self.value("A1", "=LOOP_L(0.1;0.0001)")
        self.assert_rel(got, MU0 * 0.1 * (math.log(8 * 0.1 / 5e-5) - 1.75), 1e-6, "thin ring")
        self.assert_rel(self.value("A2", "=LOOP_L(0.1;0.0001;20)"), 400 * got, 1e-15, "N^2")
        k = self.value("A3", "=LOOP_K(0.1;0.001;0.1;0.001;0.01)")
        self.assertTrue(0 < k < 1)
        m = self.value("A4", "=LOOP_M(0.1;0.1;0.01)")
        self.assert_rel(k, m / self.value("A5", "=LOOP_L(0.1;0.001)"), 1e-14, "k = M/L")

    def test_thick_coils_against_reference(self):
        # tests/reference/winding_inductance.csv: Neumann's angle integral with closed-form axial
        # averages (numpy extended precision); a formulation independent of the engine's.
        rows = [r for r in read_reference("winding_inductance.csv") if r["quantity"] == "m"]
        for i, row in enumerate(rows):
            self.put_row(i, [float(row[k]) for k in ("inner1_m", "outer1_m", "length1_m", "inner2_m", "outer2_m",
                                                       "length2_m", "distance_m")])
            n = i + 1
            got = self.value(f"H{n}", f"=COIL_M(A{n};B{n};C{n};1;D{n};E{n};F{n};1;G{n})")
            self.assert_rel(got, float(row["value"]), 1e-12, row["case"])
        # Brooks coil: L = 1.6994e-6 a N^2 (mu0 = 4 pi 1e-7; Grover 1946, quoted from memory).
        brooks = self.value("J1", "=COIL_L(0.1-0.1/3;0.1+0.1/3;0.2/3;1)") * 4e-7 * math.pi / MU0
        self.assertAlmostEqual(brooks / 0.1 / 1.6994e-6, 1.0, delta=1e-4)
        # inner = outer is the thin solenoid.
        self.assert_rel(self.value("J2", "=COIL_L(0.05;0.05;0.2;30)"), self.value("J3", "=SOLENOID_L(0.05;0.2;30)"),
                        1e-14, "sheet")
        k = self.value("J4", "=COIL_K(0.1;0.12;0.02;0.1;0.12;0.02;0.1)")
        self.assertTrue(0 < k < 1)

    def test_a_column_of_lengths_is_one_array_formula(self):
        self.put_column(0, 0, [0.0, 0.01, 0.05, -1.0])
        got = self.array("B1:B4", "=COIL_L(0.1;0.12;A1:A4;50)")
        self.assertGreater(got[0][0], got[1][0])
        self.assertGreater(got[1][0], got[2][0])
        self.assertEqual(got[3][0], ("error", 502))

    def test_stack_matrix_is_an_n_by_n_array(self):
        table = [[0.10, 0.12, 0.02, -0.05, 100, 1.0],
                 [0.10, 0.12, 0.02, 0.05, 100, -1.0],
                 [0.15, 0.15, 0.00, 0.20, 5, 2.0]]  # a loop
        for i, r in enumerate(table):
            self.put_row(i, r)
        m = self.array("H1:J3", "=STACK_LMATRIX(A1:F3)")
        self.assertEqual(m[2][2], ("error", 502))  # a loop's self term needs a wire diameter
        for i in range(3):
            for j in range(3):
                if (i, j) != (2, 2):
                    self.assertEqual(m[i][j], m[j][i])
        self.assert_rel(m[0][0], self.value("L1", "=COIL_L(0.1;0.12;0.02;100)"), 1e-15, "diagonal")
        self.assert_rel(m[0][1], self.value("L2", "=COIL_M(0.1;0.12;0.02;100;0.1;0.12;0.02;100;0.1)"), 1e-15, "M12")
        full = self.array("H5:J7", "=STACK_LMATRIX(A1:F3;0.001)")
        self.assert_rel(full[2][2], self.value("L3", "=LOOP_L(0.15;0.001;5)"), 1e-15, "loop diagonal")
        # Series inductance with polarities from the current signs, and the stored energy.
        s = [1, -1, 1]
        series = sum(s[i] * s[j] * full[i][j] for i in range(3) for j in range(3))
        self.assert_rel(self.value("L4", "=STACK_L(A1:F3;0.001)"), series, 1e-13, "series")
        cur = [r[5] for r in table]
        energy = 0.5 * sum(cur[i] * cur[j] * full[i][j] for i in range(3) for j in range(3))
        self.assert_rel(self.value("L5", "=STACK_ENERGY(A1:F3;0.001)"), energy, 1e-13, "energy")
        self.assert_error("=STACK_L(A1:F3)", where="L6")  # the loop is in the circuit

    def test_bad_input_gives_error_cells(self):
        for text in ("=SOLENOID_L(0;1;1)", "=SOLENOID_L(1;0;1)", "=SOLENOID_L(1;1;-1)", "=LOOP_M(0.1;0.1;0)",
                     "=LOOP_M(-0.1;0.1;1)", "=LOOP_L(0.1;0.2)", "=LOOP_L(0.1;0)", "=COIL_L(0.1;0.1;0;10)",
                     "=COIL_L(0.2;0.1;0.1;10)", "=COIL_M(0.1;0.1;0;1;0.1;0.1;0;1;0)",
                     "=COIL_K(0.1;0.1;0;0.1;0.12;0.02;0.1)", "=STACK_LMATRIX_ARRAY({0.1;0.12;0.02;0;100})",
                     "=STACK_LMATRIX_ARRAY({0.1;0.12;0.02;0;100;1};-1)", '=COIL_L("0.1";0.12;0.02;1)',
                     "=STACK_L_ARRAY({0.1;0.12;0.02;0;100;0})"):
            with self.subTest(text=text):
                self.assert_error(text, where="A1")
        self.assert_error("=SOLENOID_L(1/0;1;1)", ERR_DIV_ZERO)


if __name__ == "__main__":
    unittest.main()
