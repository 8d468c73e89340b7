"""COIL_HOTSPOT_RISE, COIL_TEMPERATURE_AT_TIME and COIL_PULSE_TEMPERATURE_RISE in a real headless
Calc: the engine's references (tests/engine/test_winding_heat.cpp) reached through cells, ranges
broadcast, and their bad inputs."""
import math
import unittest

from bad_input_check import check_family
from e2e_support import CalcTestCase

NAMES = ["COIL_HOTSPOT_RISE", "COIL_TEMPERATURE_AT_TIME", "COIL_PULSE_TEMPERATURE_RISE"]


class WindingHeatInCalc(CalcTestCase):
    def test_hotspot_against_mpmath(self):
        # tests/reference/winding_heat.csv (mpmath, closed form and quadrature of the heat balance):
        # a = 0.02 m, b = 0.03 m, 10 W over 0.05 m, k = 0.7 W/(m K).
        self.assert_rel(self.value("A1", "=COIL_HOTSPOT_RISE(0.02;0.03;0.05;10;0.7)"), 7.986300165881254537541666,
                        1e-13, "outer surface cooled")
        self.assert_rel(self.value("A2", '=COIL_HOTSPOT_RISE(0.02;0.03;0.05;10;0.7;"both")'), 2.283959206291538905078738,
                        1e-13, "both surfaces cooled")
        # A near-solid rod tends to q b^2 / (4k) = P / (4 pi k l) (Incropera sec. 3.5).
        self.assert_rel(self.value("A3", "=COIL_HOTSPOT_RISE(1E-8;0.1;0.05;10;0.7)"), 10 / (4 * math.pi * 0.7 * 0.05),
                        1e-12, "solid rod")
        self.assert_error('=COIL_HOTSPOT_RISE(0.02;0.02;0.05;10;0.7)')  # no build

    def test_warm_up_reaches_the_steady_temperature(self):
        # The budget's hand case (test_budget.py): settles at 67.7566 C; C = 500 J/K, time constant 1165 s.
        steady = self.value("A1", "=COIL_HOT_TEMPERATURE(2;3;0.05)")
        self.assert_rel(self.value("A2", "=COIL_TEMPERATURE_AT_TIME(2;3;0.05;500;50*1165)"), steady, 1e-14,
                        "long after switch-on")
        self.assertEqual(self.value("A3", "=COIL_TEMPERATURE_AT_TIME(2;3;0.05;500;0)"), 25.0)
        # A column of times is one array call; the temperature rises monotonically.
        for row, t in enumerate((0, 60, 600, 3600), start=1):
            self.sheet.getCellByPosition(2, row - 1).setValue(t)
        self.sheet.getCellRangeByName("D1:D4").setArrayFormula("=COIL_TEMPERATURE_AT_TIME(2;3;0.05;500;C1:C4)")
        self.doc.calculateAll()
        temps = [self.sheet.getCellByPosition(3, i).getValue() for i in range(4)]
        self.assertEqual(temps, sorted(temps))
        self.assertLess(temps[-1], steady)
        # Runaway: 8 A has no steady state; after 60 s a number, after a day an error.
        self.assertGreater(self.value("A4", "=COIL_TEMPERATURE_AT_TIME(2;8;0.05;500;60)"), 25.0)
        self.assert_error("=COIL_TEMPERATURE_AT_TIME(2;8;0.05;500;86400)")

    def test_pulse_is_iec_60949_adiabatic(self):
        # 1 m of 1 mm^2 copper (R20 = 1/58 ohm, IEC 60028; heat capacity 3.45 J/K from IEC 60949's
        # 3.45e6 J/(K m^3)), 100 A for 1 s from 20 C. IEC 60949 adiabatic formula with copper's
        # K = 226 A s^0.5/mm^2, beta = 234.5 K (as published summaries of the standard quote them;
        # rounded): 0.5 %.
        rise = self.value("A1", "=COIL_PULSE_TEMPERATURE_RISE(1/58;100;1;3.45;20)")
        iec = (20 + 234.5) * math.exp(100 ** 2 / 226 ** 2) - 234.5 - 20
        self.assertLess(abs(rise / iec - 1), 5e-3, f"{rise} against {iec}")
        # The same with K from the same data, K^2 = sigma (beta + 20) / rho20: the same formula.
        beta = 1 / 0.00393 - 20
        k2 = 3.45e6 * (beta + 20) / (1 / 58 * 1e-6) * 1e-12
        self.assert_rel(rise, (20 + beta) * math.exp(1e4 / k2) - beta - 20, 1e-13, "adiabatic closed form")
        self.assert_error("=COIL_PULSE_TEMPERATURE_RISE(0.5;200;10;40;60)")  # beyond 400 C

    def test_bad_inputs(self):
        check_family(self, "winding_heat", NAMES)


if __name__ == "__main__":
    unittest.main()
