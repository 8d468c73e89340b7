"""The cautions reach the Function Wizard: in a real Calc with the add-in installed, the
description Calc shows for every hazard function (com.sun.star.sheet.FunctionDescriptions, what
the Function Wizard reads) carries its caution with the words tests/catalogue/check_cautions.py
requires of the catalogue."""
import pathlib
import sys
import unittest

ROOT = pathlib.Path(__file__).resolve().parents[2]
sys.path.insert(0, str(ROOT / "tests" / "catalogue"))

from check_cautions import HAZARDS, caution_of  # noqa: E402
from e2e_support import CalcTestCase  # noqa: E402


class CautionsInTheFunctionWizard(CalcTestCase):
    def test_every_hazard_function_shows_its_caution(self):
        descriptions = self.session.smgr.createInstanceWithContext("com.sun.star.sheet.FunctionDescriptions",
                                                                   self.session.ctx)
        shown = {}
        for i in range(descriptions.getCount()):
            props = {p.Name: p.Value for p in descriptions.getByIndex(i)}
            shown[props["Name"].upper()] = props.get("Description", "")
        checked = 0
        for category, (names, words) in HAZARDS.items():
            for name in names:
                with self.subTest(function=name):
                    self.assertIn(name, shown, "not among Calc's functions")
                    caution = caution_of(shown[name])
                    self.assertIsNotNone(caution, f"{name}: no caution in {shown[name]!r}")
                    for word in words:
                        self.assertIn(word, caution.lower(), f"{name} ({category})")
                    checked += 1
        self.assertEqual(checked, sum(len(n) for n, _ in HAZARDS.values()))


if __name__ == "__main__":
    unittest.main()
