"""Text arguments with control characters, in real Calc: an error cell, never the text read up to
the character. ("copper"&CHAR(0)&"junk" once gave copper's resistivity, "F"&CHAR(0)&"zzz" 155.)"""
import unittest

from e2e_support import CalcTestCase

CONTROL = ["CHAR(0)", "CHAR(1)", "CHAR(9)", "CHAR(10)", "CHAR(13)", "CHAR(31)", "CHAR(127)", "UNICHAR(133)",
           "UNICHAR(159)"]


class TextArguments(CalcTestCase):
    def test_text_with_a_nul_is_an_error(self):
        self.assert_error('=WIRE_RESISTIVITY("copper"&CHAR(0)&"junk")')
        self.assert_error('=INSULATION_CLASS_LIMIT("F"&CHAR(0)&"zzz")')
        self.assert_error('=AWG_DIAMETER("2/0"&CHAR(0))')

    def test_every_control_character_is_an_error_wherever_it_sits(self):
        for ctrl in CONTROL:
            for text in (f'"copper"&{ctrl}', f'{ctrl}&"copper"', f'"cop"&{ctrl}&"per"'):
                with self.subTest(text=text):
                    self.assert_error(f"=WIRE_RESISTIVITY({text})")
                    self.assert_error(f"=WINDING_LAYERS(0.01;0.001;{text.replace('copper', 'square')})")

    def test_a_cell_holding_such_text_is_an_error_too(self):
        self.formula("A1", '="F"&CHAR(0)')
        self.assert_error("=INSULATION_CLASS_LIMIT(A1)")
        self.assert_error("=INSULATION_CLASS_LIMIT(A1:A1)")

    def test_clean_text_still_works(self):
        # IEC 60085: thermal class F is 155 degrees Celsius.
        self.assertEqual(self.value("A1", '=INSULATION_CLASS_LIMIT("F")'), 155.0)
        self.assertEqual(self.value("A2", '=WIRE_RESISTIVITY(" Copper ")'), self.value("A3", '=WIRE_RESISTIVITY("cu")'))


if __name__ == "__main__":
    unittest.main()
