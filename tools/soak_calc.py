#!/usr/bin/python3
"""Soak test: many add-in evaluations in ONE LibreOffice session, resident memory measured.

A sheet holds scalar cells (three in four valid, one in four on the filament, so the error path
throws IllegalArgumentException through UNO) and two 100-element array formulas; every hard
recalculation (calculateAll) calls the add-in once per scalar cell and once per array formula.
The resident memory (VmRSS) of soffice.bin is read after a warm-up and at the end.

    /usr/bin/python3 tools/soak_calc.py [--evaluations N] [--oxt build/coilwright.oxt]

Used by tests/e2e/test_soak.py (one million evaluations, in CI) and tools/soak.sh (longer).
Needs Debian's /usr/bin/python3 (python3-uno).
"""
import argparse
import math
import os
import pathlib
import sys
import time

sys.path.insert(0, str(pathlib.Path(__file__).resolve().parent))
from calc_session import CalcSession  # noqa: E402

SCALAR_CELLS = 800
ARRAY_ELEMENTS = 100  # per array formula; two of them
EVALUATIONS_PER_RECALC = SCALAR_CELLS + 2 * ARRAY_ELEMENTS


def soffice_bin_pid(session):
    """The soffice.bin process of this session (soffice is a launcher that starts it)."""
    for entry in pathlib.Path("/proc").iterdir():
        if not entry.name.isdigit():
            continue
        try:
            cmd = (entry / "cmdline").read_bytes().split(b"\0")
        except OSError:
            continue
        if cmd and cmd[0].endswith(b"soffice.bin") and any(session.pipe.encode() in a for a in cmd):
            return int(entry.name)
    raise RuntimeError("soffice.bin of this session not found")


def resident_kib(pid):
    for line in pathlib.Path(f"/proc/{pid}/status").read_text().splitlines():
        if line.startswith("VmRSS:"):
            return int(line.split()[1])
    raise RuntimeError("no VmRSS")


def build_sheet(sheet):
    rows = []
    for i in range(SCALAR_CELLS):
        z = 0.001 * (i % 97)
        r = 0.1 if i % 4 == 3 else 0.0005 * (i % 89)  # r = radius with z = 0 is on the filament
        if i % 4 == 3:
            z = 0.0
        rows.append((f"=LOOP_BZ(0.1;10;2;{z};{r})",))
    sheet.getCellRangeByPosition(0, 0, 0, SCALAR_CELLS - 1).setFormulaArray(tuple(rows))
    zs = tuple((0.002 * k,) for k in range(ARRAY_ELEMENTS))
    sheet.getCellRangeByPosition(2, 0, 2, ARRAY_ELEMENTS - 1).setDataArray(zs)
    sheet.getCellRangeByPosition(3, 0, 3, ARRAY_ELEMENTS - 1).setArrayFormula(
        f"=LOOP_BR(0.1;10;2;C1:C{ARRAY_ELEMENTS};0.03)")
    sheet.getCellRangeByPosition(4, 0, 4, ARRAY_ELEMENTS - 1).setArrayFormula(
        f"=LOOP_B(0.1;10;2;C1:C{ARRAY_ELEMENTS};0.03)")


def snapshot(sheet):
    """Values (and error codes) of every add-in cell, to compare first and last recalculation."""
    out = []
    for col, n in ((0, SCALAR_CELLS), (3, ARRAY_ELEMENTS), (4, ARRAY_ELEMENTS)):
        for r in range(n):
            c = sheet.getCellByPosition(col, r)
            out.append(("error", c.getError()) if c.getError() else c.getValue())
    return out


def soak(oxt, evaluations, report=print):
    recalcs = max(1, math.ceil(evaluations / EVALUATIONS_PER_RECALC))
    with CalcSession(oxt) as session:
        doc = session.new_document()
        sheet = doc.Sheets.getByIndex(0)
        build_sheet(sheet)
        pid = soffice_bin_pid(session)
        # Warm-up: the first recalculations load code and fill caches that stay.
        for _ in range(20):
            doc.calculateAll()
        first = snapshot(sheet)
        before = resident_kib(pid)
        start = time.time()
        for _ in range(recalcs):
            doc.calculateAll()
        elapsed = time.time() - start
        after = resident_kib(pid)
        last = snapshot(sheet)
        alive = session.alive()
        doc.close(True)
    result = {
        "evaluations": recalcs * EVALUATIONS_PER_RECALC,
        "calls": recalcs * (SCALAR_CELLS + 2),
        "error_calls": recalcs * (SCALAR_CELLS // 4),
        "seconds": elapsed,
        "rss_before_kib": before,
        "rss_after_kib": after,
        "rss_growth_kib": after - before,
        "alive": alive,
        "same_results": first == last,
        "errors_in_sheet": sum(1 for v in first if isinstance(v, tuple)),
    }
    report(f"soak: {result['evaluations']:,} evaluations ({result['calls']:,} add-in calls, "
           f"{result['error_calls']:,} of them errors) in {elapsed:.1f} s; soffice.bin VmRSS "
           f"{before / 1024:.1f} MiB -> {after / 1024:.1f} MiB "
           f"({(after - before) / 1024:+.2f} MiB); results unchanged: {result['same_results']}")
    return result


def main():
    root = pathlib.Path(__file__).resolve().parents[1]
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--evaluations", type=int, default=1_000_000)
    parser.add_argument("--oxt", default=os.environ.get("COILWRIGHT_OXT", str(root / "build" / "coilwright.oxt")))
    parser.add_argument("--max-growth-mib", type=float, default=16.0)
    args = parser.parse_args()
    result = soak(args.oxt, args.evaluations)
    ok = result["alive"] and result["same_results"] and result["rss_growth_kib"] <= args.max_growth_mib * 1024
    return 0 if ok else 1


if __name__ == "__main__":
    sys.exit(main())
