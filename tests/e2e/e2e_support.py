"""Shared set-up for the end-to-end tests: one Calc session per test module."""
import csv
import math
import os
import pathlib
import unittest

from calc_session import CalcSession

OXT = os.environ.get("COILWRIGHT_OXT", str(pathlib.Path(__file__).resolve().parents[2] / "build" / "coilwright.oxt"))
REFERENCE_DIR = pathlib.Path(os.environ.get("COILWRIGHT_REFERENCE_DIR",
                                            pathlib.Path(__file__).resolve().parents[1] / "reference"))

ERR_ILLEGAL_ARGUMENT = 502  # Calc's Err:502, what the add-in's IllegalArgumentException shows as
ERR_NO_CONVERGENCE = 523
ERR_DIV_ZERO = 532
ERR_OVERFLOW = 503  # Calc's #NUM! for an overflowing expression
ERR_PARAMETER_LIST = 504  # Calc's own refusal of an argument its parameter cannot take
ERR_VALUE = 519  # Calc's #VALUE!


def read_reference(name):
    with open(REFERENCE_DIR / name, newline="") as f:
        rows = [line for line in f if not line.startswith("#")]
    return list(csv.DictReader(rows))


class CalcSessionTestCase(unittest.TestCase):
    """Starts LibreOffice with the extension once for the class (self.session)."""

    @classmethod
    def setUpClass(cls):
        cls.session = CalcSession(OXT)

    @classmethod
    def tearDownClass(cls):
        cls.session.close()


class CalcTestCase(CalcSessionTestCase):
    """A CalcSessionTestCase with a fresh sheet per test."""

    def setUp(self):
        self.doc = self.session.new_document()
        self.sheet = self.doc.Sheets.getByIndex(0)

    def tearDown(self):
        self.doc.close(True)
        self.assertTrue(self.session.alive(), "LibreOffice died")

    def cell(self, name):
        return self.sheet.getCellRangeByName(name)

    def formula(self, name, text):
        c = self.cell(name)
        c.setFormula(text)
        return c

    def value(self, name, text):
        c = self.formula(name, text)
        self.assertEqual(c.getError(), 0, f"{text} gave Err:{c.getError()}")
        return c.getValue()

    def assert_error(self, text, code=ERR_ILLEGAL_ARGUMENT, where="Z1"):
        c = self.formula(where, text)
        self.assertEqual(c.getError(), code, f"{text} gave {c.getValue()} (error {c.getError()})")

    def array(self, range_name, text):
        rng = self.cell(range_name)
        rng.setArrayFormula(text)
        addr = rng.getRangeAddress()
        out = []
        for r in range(addr.StartRow, addr.EndRow + 1):
            row = []
            for c in range(addr.StartColumn, addr.EndColumn + 1):
                cell = self.sheet.getCellByPosition(c, r)
                row.append(("error", cell.getError()) if cell.getError() else cell.getValue())
            out.append(row)
        return out

    def put_column(self, col, start_row, values):
        for i, v in enumerate(values):
            cell = self.sheet.getCellByPosition(col, start_row + i)
            if isinstance(v, str):
                cell.setString(v)
            elif v is not None:
                cell.setValue(v)

    def assert_field_matches(self, row, bz, br, b, tol=1e-13):
        """Bz, Br and |B| from Calc against a row of a reference CSV (columns bz_T, br_T, case,
        z_m, r_m), relative to |B| where Bz changes sign."""
        bz_ref, br_ref = float(row["bz_T"]), float(row["br_T"])
        mag = math.hypot(bz_ref, br_ref)
        label = f"{row['case']} z={row['z_m']} r={row['r_m']}"
        if row["case"] == "sign change":
            self.assertLessEqual(abs(bz - bz_ref), tol * mag, label)
        else:
            self.assert_rel(bz, bz_ref, tol, label)
        if br_ref == 0:
            self.assertEqual(br, 0.0, label)
        else:
            self.assert_rel(br, br_ref, tol, label)
        self.assert_rel(b, mag, tol, label)

    def assert_rel(self, got, want, tol, msg=""):
        scale = abs(want) if want != 0 else 1e-300
        self.assertLessEqual(abs(got - want), tol * scale, f"{msg}: got {got!r}, want {want!r}")
