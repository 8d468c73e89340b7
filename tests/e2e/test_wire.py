"""AWG_DIAMETER and WIRE_* in a real headless Calc with the built extension installed."""
import math
import unittest

from bad_input_check import check_family
from e2e_support import CalcTestCase

INCH = 0.0254
NAMES = ["AWG_DIAMETER", "WIRE_AREA", "WIRE_RESISTIVITY", "WIRE_RESISTANCE", "WIRE_RESISTANCE_PER_M", "WIRE_MASS",
         "WIRE_DIAMETER_FOR_CURRENT"]


class WireFunctionsInCalc(CalcTestCase):
    def test_awg_sizes_as_numbers_and_text(self):
        # ASTM B258 Table 1 (from memory): 4/0 = 0.4600 in, 1/0 = 0.3249 in, 10 = 0.1019 in,
        # 24 = 0.0201 in, to the table's rounding of 0.00005 in.
        self.assertAlmostEqual(self.value("A1", '=AWG_DIAMETER("4/0")') / INCH, 0.4600, delta=5e-5)
        self.assertAlmostEqual(self.value("A2", '=AWG_DIAMETER("1/0")') / INCH, 0.3249, delta=5e-5)
        self.assertAlmostEqual(self.value("A3", "=AWG_DIAMETER(10)") / INCH, 0.1019, delta=5e-5)
        self.assertAlmostEqual(self.value("A4", '=AWG_DIAMETER("24")') / INCH, 0.0201, delta=5e-5)
        # A column mixing text and numbers is one array formula.
        self.put_column(1, 0, ["4/0", "2/0", 0, 10, 24])
        got = self.array("C1:C5", "=AWG_DIAMETER(B1:B5)")
        for (row,), inches in zip(got, (0.4600, 0.3648, 0.3249, 0.1019, 0.0201)):
            self.assertAlmostEqual(row / INCH, inches, delta=5e-5)

    def test_resistance_per_iec_60028_and_materials_as_text(self):
        # 1 km of 1 mm^2 annealed copper at 20 C: 17.241 ohm (IEC 60028, 1/58 ohm mm^2/m).
        d = math.sqrt(4e-6 / math.pi)
        self.sheet.getCellRangeByName("A1").setValue(d)
        self.assertAlmostEqual(self.value("B1", "=WIRE_RESISTANCE(A1;1000)"), 1000 / 58, delta=1e-12)
        self.assertAlmostEqual(self.value("B2", '=WIRE_RESISTANCE(A1;1000;"COPPER";20)'), 1000 / 58, delta=1e-12)
        # Aluminium, IEC 60889: 0.028264 ohm mm^2/m (61 % IACS), 0.00403 /K (K. C. Agrawal, Industrial
        # Power Engineering and Applications Handbook, 2001, table of conductor metals); "aluminum" is accepted.
        self.assertAlmostEqual(self.value("B3", '=WIRE_RESISTANCE(A1;1000;"Aluminum";70)'),
                               28.264 * (1 + 0.00403 * 50), delta=1e-11)
        self.assertAlmostEqual(self.value("B4", '=WIRE_RESISTANCE_PER_M(A1;"al")'), 0.028264, delta=1e-15)
        self.assertAlmostEqual(self.value("B5", '=WIRE_RESISTIVITY("cu";75)'), 1e-6 / 58 * (1 + 0.00393 * 55),
                               delta=1e-22)
        # Masses: 8.89 g and 2.703 g per metre of 1 mm^2 (IEC 60028, IEC 60889 densities).
        self.assertAlmostEqual(self.value("B6", "=WIRE_MASS(A1;1)"), 8.89e-3, delta=1e-15)
        self.assertAlmostEqual(self.value("B7", '=WIRE_MASS(A1;1;"aluminium")'), 2.703e-3, delta=1e-15)

    def test_a_range_of_materials_and_temperatures(self):
        self.put_column(0, 0, ["copper", "aluminium", "brass"])
        got = self.array("B1:D3", "=WIRE_RESISTANCE_PER_M(0.001;A1:A3;{20;60;100})")
        area = math.pi / 4 * 1e-6
        for j, t in enumerate((20, 60, 100)):
            self.assertAlmostEqual(got[0][j], 1e-6 / 58 * (1 + 0.00393 * (t - 20)) / area, delta=1e-15)
            self.assertAlmostEqual(got[1][j], 0.028264e-6 * (1 + 0.00403 * (t - 20)) / area, delta=1e-15)
            self.assertEqual(got[2][j], ("error", 502))

    def test_wire_for_a_current(self):
        # 10 A at 4 A/mm^2: 2.5 mm^2, d = sqrt(10 / pi) mm.
        self.assert_rel(self.value("A1", "=WIRE_DIAMETER_FOR_CURRENT(10;4E6)"), math.sqrt(10 / math.pi) * 1e-3, 1e-15,
                        "diameter")
        self.assert_rel(self.value("A2", "=WIRE_AREA(A1)"), 2.5e-6, 1e-15, "area")

    def test_bad_inputs(self):
        check_family(self, "wire", NAMES)


if __name__ == "__main__":
    unittest.main()
