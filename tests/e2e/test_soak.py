"""Soak: one million add-in evaluations in one LibreOffice session (tools/soak_calc.py).

Checks that LibreOffice stays up, that the last recalculation gives bit-for-bit the values and
error cells of the first, and that soffice.bin's resident memory grows by at most 16 MiB over
the million evaluations (about 800,000 add-in calls, a quarter of them errors): a leak of even
20 bytes per call would exceed it. tools/soak.sh runs the same for longer.
"""
import os
import unittest

from e2e_support import OXT
from soak_calc import soak

EVALUATIONS = int(os.environ.get("COILWRIGHT_SOAK_EVALUATIONS", "1000000"))
MAX_GROWTH_KIB = 16 * 1024


class Soak(unittest.TestCase):
    def test_a_million_evaluations_in_one_session(self):
        result = soak(OXT, EVALUATIONS, report=lambda line: print("\n" + line, flush=True))
        self.assertGreaterEqual(result["evaluations"], EVALUATIONS)
        self.assertTrue(result["alive"], "LibreOffice died")
        self.assertTrue(result["same_results"], "results changed between the first and last recalculation")
        self.assertEqual(result["errors_in_sheet"], 200, "a quarter of the scalar cells are on the filament")
        self.assertLessEqual(result["rss_growth_kib"], MAX_GROWTH_KIB, "soffice.bin memory grew")


if __name__ == "__main__":
    unittest.main()
