#!/usr/bin/python3
"""Seconds that single heavy cells take in a real (headless) LibreOffice Calc: the cells that once
froze it for 10-17 s (tests/e2e/test_long_cells.py checks that they come back at all, and that
the thick-coil inductance and force cells, now closed forms, come back with values), and a
native formula of Calc's over as many elements for scale. Each case is typed into a fresh
document; the time is from typing it to reading its result, then the median of hard
recalculations. No cell may keep Calc for more than about 2 s (addin/core/work_costs.hpp:
the work bound refuses a call before it starts, the deadline ends an array call that runs on).

Run: /usr/bin/python3 bench/calc_long_cells.py [--oxt build/coilwright.oxt] [--repeat 3]
"""
import argparse
import pathlib
import statistics
import sys
import time

ROOT = pathlib.Path(__file__).resolve().parents[1]
sys.path.insert(0, str(ROOT / "tools"))
sys.path.insert(0, str(ROOT / "tests" / "e2e"))

from calc_session import CalcSession  # noqa: E402
from test_long_cells import LONG_CELLS, SOLENOID_HANG  # noqa: E402

CASES = [("Calc's own SUMPRODUCT over 3999 elements", "=SUMPRODUCT(SQRT(ROW($A$1:$A$3999)*1E-7))"),
         ("the 1e308 m solenoid", SOLENOID_HANG)] + [(f, f) for f in LONG_CELLS]


def result_text(cell):
    err = cell.getError()
    return f"Err:{err}" if err else f"{cell.getValue():.6g}"


def main():
    ap = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    ap.add_argument("--oxt", default=str(ROOT / "build" / "coilwright.oxt"))
    ap.add_argument("--repeat", type=int, default=3)
    opts = ap.parse_args()
    session = CalcSession(opts.oxt)
    try:
        print(f"{'first s':>8} {'recalc s':>9}  result        formula")
        for label, formula in CASES:
            doc = session.new_document()
            cell = doc.Sheets.getByIndex(0).getCellByPosition(7, 5)
            start = time.perf_counter()
            cell.setFormula(formula)
            text = result_text(cell)
            first = time.perf_counter() - start
            times = []
            for _ in range(opts.repeat):
                t0 = time.perf_counter()
                doc.calculateAll()
                times.append(time.perf_counter() - t0)
            print(f"{first:8.2f} {statistics.median(times):9.2f}  {text:12}  {label[:90]}", flush=True)
            doc.close(True)
    finally:
        session.close()


if __name__ == "__main__":
    main()
