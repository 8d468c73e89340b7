"""SET_* and RIG3_COILS (coils anywhere in space) in a real headless Calc with the built extension."""
import math
import unittest

from bad_input_check import check_family
from e2e_support import CalcTestCase, read_reference

MU0 = 1.25663706127e-6  # CODATA 2022
NAMES = ["SET_BX", "SET_BY", "SET_BZ", "SET_B", "SET_CHECK", "SET_CURRENTS", "SET_UNIFORM_SPHERE", "SET_LMATRIX",
         "SET_FORCE", "SET_TORQUE", "RIG3_COILS"]
HELMHOLTZ = '{"circle";0;0;-0.05;0;0;1;0.1;;;10;2|"circle";0;0;0.05;0;0;1;0.1;;;10;2}'


class SetFunctionsInCalc(CalcTestCase):
    def put_set(self, top, rows):
        """A coil set typed into cells from row `top` (0-based), columns A..; None leaves a cell blank."""
        for r, row in enumerate(rows):
            for c, v in enumerate(row):
                cell = self.sheet.getCellByPosition(c, top + r)
                if isinstance(v, str):
                    cell.setString(v)
                elif v is not None:
                    cell.setValue(v)

    def test_helmholtz_pair_typed_as_a_user_would(self):
        # A Helmholtz pair (spacing = radius) on the z axis: the centre field is
        # (4/5)^(3/2) mu0 N I / R, the textbook result, along z.
        self.put_set(0, [["circle", 0, 0, -0.05, 0, 0, 1, 0.1, None, None, 10, 2],
                         ["circle", 0, 0, 0.05, 0, 0, 1, 0.1, None, None, 10, 2]])
        bz = self.value("N1", "=SET_BZ(A1:L2;0;0;0)")
        self.assert_rel(bz, 0.8 ** 1.5 * MU0 * 10 * 2 / 0.1, 1e-15, "Helmholtz centre")
        self.assertEqual(self.value("N2", "=SET_BX(A1:L2;0;0;0)"), 0.0)
        self.assertEqual(self.value("N3", "=SET_B(A1:L2;0;0;0)"), bz)
        self.assertEqual(self.cell("N1").getFormula(), "=ORG.COILWRIGHT.FUNCTIONS.SET_BZ(A1:L2;0;0;0)")
        self.assertEqual(self.formula("N4", "=SET_CHECK(A1:L2)").getString(), "OK: 2 coils, 2 circuits")
        # The same pair as a coaxial coil table (STACK_*) off the axis: Bz and Br at r = hypot(x, y).
        x, y, z = 0.03, -0.04, 0.02
        stack_bz = self.value("O1", f"=STACK_BZ_ARRAY({{0.1;0.1;0;-0.05;10;2|0.1;0.1;0;0.05;10;2}};{z};0.05)")
        stack_br = self.value("O2", f"=STACK_BR_ARRAY({{0.1;0.1;0;-0.05;10;2|0.1;0.1;0;0.05;10;2}};{z};0.05)")
        self.assert_rel(self.value("P1", f"=SET_BZ(A1:L2;{x};{y};{z})"), stack_bz, 1e-14, "Bz as STACK_BZ")
        self.assert_rel(self.value("P2", f"=SET_BX(A1:L2;{x};{y};{z})"), stack_br * x / 0.05, 1e-14, "Bx from STACK_BR")
        self.assert_rel(self.value("P3", f"=SET_BY(A1:L2;{x};{y};{z})"), stack_br * y / 0.05, 1e-14, "By from STACK_BR")

    def test_agrees_with_mpmath_reference(self):
        # tests/reference/set_field.csv: Biot-Savart quadrature of the tilted filament at 40 digits.
        rows = read_reference("set_field.csv")
        worst = 0.0
        for i, row in enumerate(rows):
            coil = [row["shape"]] + [float(row[k]) for k in ("cx", "cy", "cz", "ax", "ay", "az", "size", "height",
                                                              "roll_deg", "turns", "current")]
            self.put_set(i, [coil])
            n = i + 1
            p = [row["x"], row["y"], row["z"]]
            ref = [float(row[k]) for k in ("bx", "by", "bz")]
            mag = math.sqrt(sum(v * v for v in ref))
            got = [self.value(f"{col}{n}", f"=SET_{name}(A{n}:L{n};{p[0]};{p[1]};{p[2]})")
                   for col, name in (("N", "BX"), ("O", "BY"), ("P", "BZ"))]
            err = math.sqrt(sum((g - r) ** 2 for g, r in zip(got, ref))) / mag
            near = "near" in row["case"]
            # Near a wire of a tilted coil the rounding of the point in the coil's frame bounds
            # any double computation (see tests/engine/sets/test_set_field.cpp).
            self.assertLessEqual(err, 1e-10 if near else 1e-13, row["case"])
            if not near:
                worst = max(worst, err)
        print(f"\nset field through Calc: worst relative error {worst:.2e} away from the wires")

    def test_field_map_is_one_array_formula_and_matches_single_cells(self):
        rig = "RIG3_COILS(1;50;1;\"square\")"
        grid = self.array("A1:E4", f"=SET_BZ_ARRAY({rig};{{-0.2;-0.1;0;0.1;0.2}};0.05;{{-0.1|0|0.1|0.2}})")
        for j, x in enumerate((-0.2, -0.1, 0, 0.1, 0.2)):
            for i, z in enumerate((-0.1, 0, 0.1, 0.2)):
                single = self.value("H1", f"=SET_BZ_ARRAY({rig};{x};0.05;{z})")
                self.assertEqual(grid[i][j], single, f"element ({i},{j}) equals its single-cell formula")

    def test_rig_currents_cancel_a_measured_field(self):
        # A cage cancelling an ambient field: the currents that make -B_ambient at the centre,
        # then the residual is zero at the centre (the field is linear in the currents).
        rig = self.array("A1:M6", "=RIG3_COILS(1.2;40;1;\"square\")")
        self.assertEqual(self.sheet.getCellByPosition(0, 0).getString(), "rect")
        self.assertEqual([r[12] for r in rig], [1, 1, 2, 2, 3, 3])
        currents = self.array("O1:O3", "=SET_CURRENTS(A1:M6;-20E-6;5E-6;-45E-6)")
        # A copy of the rig whose rows carry their circuit's current: the field it makes.
        for r in range(6):
            for c in range(13):
                src = self.sheet.getCellByPosition(c, r)
                dst = self.sheet.getCellByPosition(c, 10 + r)
                if c == 0:
                    dst.setString(src.getString())
                elif c == 11:
                    dst.setFormula(f"=O{int(rig[r][12])}")
                else:
                    dst.setValue(src.getValue())
        self.assertEqual(len(currents), 3)
        for name, want in (("BX", -20e-6), ("BY", 5e-6), ("BZ", -45e-6)):
            got = self.value("Q1", f"=SET_{name}(A11:M16;0;0;0)")
            self.assertLessEqual(abs(got - want), 1e-14 * 45e-6, name)
        self.assertEqual(self.formula("Q2", "=SET_CHECK(A1:M6)").getString(), "OK: 6 coils, 3 circuits")
        # Uniform sphere of the rig at 0.1 %, and the per-circuit inductance matrix.
        radius = self.value("Q3", "=SET_UNIFORM_SPHERE(A1:M6;0.001)")
        self.assertTrue(0.05 < radius < 0.5, radius)
        lm = self.array("S1:U3", "=SET_LMATRIX(A1:M6;0.001)")
        for i in range(3):
            self.assertGreater(lm[i][i], 0)
            for j in range(3):
                self.assertEqual(lm[i][j], lm[j][i])
                if i != j:
                    self.assertLess(abs(lm[i][j]), 1e-12 * lm[i][i], "orthogonal axes do not couple")

    def test_force_and_torque(self):
        # Coaxial loops: the force is N1 N2 I1 I2 dM/dz, the same as LOOP_FZ.
        s = '{"circle";0;0;0;0;0;1;0.1;;;10;2|"circle";0;0;0.07;0;0;1;0.08;;;5;-1.5}'
        fz = self.value("A1", f"=SET_FORCE_ARRAY({s};2;\"z\")")
        self.assert_rel(fz, self.value("A2", "=LOOP_FZ(0.1;10;2;0.08;5;-1.5;0.07)"), 1e-12, "LOOP_FZ")
        self.assert_rel(self.value("A3", f"=SET_FORCE_ARRAY({s};1;\"z\")"), -fz, 1e-12, "third law")
        self.assertLess(abs(self.value("A4", f"=SET_TORQUE_ARRAY({s};2;\"x\")")), 1e-12 * abs(fz))
        self.assertEqual(self.value("A5", f"=SET_FORCE_ARRAY({s};2;\"magnitude\")"), abs(fz))

    def test_blank_rows_and_optional_columns(self):
        self.put_set(0, [["circle", 0, 0, -0.05, 0, 0, 1, 0.1, None, None, 10, 2, 1],
                         [None] * 13,
                         ["Circle", 0, 0, 0.05, 0, 0, 1, 0.1, 0, 0, 10, 2, 1]])
        self.assertEqual(self.formula("P1", "=SET_CHECK(A1:M3)").getString(), "OK: 2 coils, 1 circuit")
        self.assertEqual(self.value("P2", "=SET_BZ(A1:M3;0;0;0.01)"), self.value("P3", f"=SET_BZ_ARRAY({HELMHOLTZ};0;0;0.01)"))
        # One circuit: one current.
        self.assertEqual(len(self.array("P5:P5", "=SET_CURRENTS(A1:M3;0;0;1E-4)")), 1)
        # Rows are counted by position in the range: the blank row 2 is not a coil.
        self.assert_error("=SET_FORCE(A1:M3;2;\"z\")")
        self.assertEqual(self.formula("P4", "=SET_CHECK(A1:L1)").getString(), "OK: 1 coil, 1 circuit")

    def test_check_explains_in_words(self):
        self.put_set(0, [["circle", 0, 0, 0, 0, 0, 1, 0.1, None, None, 10, 2],
                         ["circle", 0, 0, 0.1, 0, 0, 0, 0.1, None, None, 10, 2]])
        self.assertEqual(self.formula("P1", "=SET_CHECK(A1:L2)").getString(),
                         "row 2: the axis is the zero vector; give its direction, e.g. 0, 0, 1")
        self.assert_error("=SET_BZ(A1:L2;0;0;0)")
        self.sheet.getCellByPosition(0, 1).setString("oval")
        self.assertEqual(self.formula("P1", "=SET_CHECK(A1:L2)").getString(), 'row 2: shape "oval" is not circle or rect')

    def test_bad_inputs(self):
        check_family(self, "sets", NAMES)


if __name__ == "__main__":
    unittest.main()
