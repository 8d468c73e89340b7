#!/usr/bin/python3
"""Cost of Coilwright's cell functions in a real (headless) LibreOffice Calc.

Starts a private LibreOffice with the built extension (tools/calc_session.py), builds one
document per case and times full recalculations (calculateAll, a hard recalculation of every
formula) of each, interleaving the cases so that a busy machine disturbs them alike. Prints
medians, in one run:

  per-cell    50,000 cells =LOOP_BZ(a;N;I;A1) against 50,000 cells of the hand-typed on-axis
              formula =mu0*N*I*a^2/(2*(a^2+A1^2)^1.5): time per cell and the ratio add-in/native;
  array       one array formula {=LOOP_BZ(a;N;I;A1:A1000000;B1:B1000000)} (1,000,000 off-axis
              points by default) against Calc's own array arithmetic over the same two columns,
              {=A1:A1000000*B1:B1000000+A1:A1000000} (what any array result of that size costs
              in Calc, without UNO), and against a native column of the hand-typed formula.

Times are wall-clock seconds of the calculateAll call (what a user waits for) and, beside
them, the processor time LibreOffice spent (all its threads, from /proc/<pid>/task/*/schedstat),
since Calc may spread native formulas over several threads.

Run: /usr/bin/python3 bench/calc_bench.py [--oxt build/coilwright.oxt] [--repeat 7]
"""
import argparse
import os
import pathlib
import statistics
import sys
import time

ROOT = pathlib.Path(__file__).resolve().parents[1]
sys.path.insert(0, str(ROOT / "tools"))

from calc_session import CalcSession  # noqa: E402
from com.sun.star.sheet.FillDirection import TO_BOTTOM  # noqa: E402

RADIUS, TURNS, CURRENT = 0.1, 100, 1.5
MU0 = "1.25663706127E-6"  # CODATA 2022, as engine/include/coilwright/constants.hpp
NATIVE = f"={MU0}*{TURNS}*{CURRENT}*{RADIUS}^2/(2*({RADIUS}^2+A{{row}}^2)^1.5)"
ADDIN_CELL = f"=LOOP_BZ({RADIUS};{TURNS};{CURRENT};A{{row}})"


def points(n):
    """Fixed points in a box around the loop: z in [-3a, 3a], r in [0, 3a] (a linear
    congruential sequence, the same on every run)."""
    state, zs, rs = 12345, [], []
    for _ in range(n):
        state = (6364136223846793005 * state + 1442695040888963407) % 2**64
        zs.append((6 * (state >> 11) / 2**53 - 3) * RADIUS)
        state = (6364136223846793005 * state + 1442695040888963407) % 2**64
        rs.append(3 * (state >> 11) / 2**53 * RADIUS)
    return zs, rs


def soffice_pid(session):
    """The soffice.bin process under the session's launcher (the launcher may be it)."""
    todo = [session.proc.pid]
    while todo:
        pid = todo.pop()
        try:
            if pathlib.Path(f"/proc/{pid}/comm").read_text().strip() == "soffice.bin":
                return pid
            for task in pathlib.Path(f"/proc/{pid}/task").iterdir():
                todo += [int(c) for c in (task / "children").read_text().split()]
        except OSError:
            pass
    return None


def cpu_seconds(pid):
    """Processor time of every thread of a process, in seconds (nanosecond resolution)."""
    if pid is None:
        return float("nan")
    total = 0
    for task in pathlib.Path(f"/proc/{pid}/task").iterdir():
        try:
            total += int((task / "schedstat").read_text().split()[0])
        except OSError:
            pass  # a thread that just ended
    return total * 1e-9


class Case:
    """One document whose recalculation is timed."""

    def __init__(self, session, name, cells, build):
        self.name, self.cells = name, cells
        self.doc = session.new_document()
        build(self.doc.Sheets.getByIndex(0))
        self.doc.calculateAll()  # first calculation outside the timing
        self.wall, self.cpu = [], []

    def time_once(self, pid):
        c0, t0 = cpu_seconds(pid), time.perf_counter()
        self.doc.calculateAll()
        t1, c1 = time.perf_counter(), cpu_seconds(pid)
        self.wall.append(t1 - t0)
        self.cpu.append(c1 - c0)

    def median(self, which):
        return statistics.median(getattr(self, which))


def column(sheet, col, values):
    rng = sheet.getCellRangeByPosition(col, 0, col, len(values) - 1)
    rng.setDataArray(tuple((v,) for v in values))


def formulas(sheet, col, template, n):
    """The formula of row 1 filled down n rows, as a user fills a column (setting n formulas one
    by one through the API takes minutes in LibreOffice 7.4: it grows with the square of n)."""
    sheet.getCellByPosition(col, 0).setFormula(template.format(row=1))
    sheet.getCellRangeByPosition(col, 0, col, n - 1).fillAuto(TO_BOTTOM, 1)


def check_no_errors(sheet, col, n):
    rng = sheet.getCellRangeByPosition(col, 0, col, n - 1)
    bad = [i for i, (v,) in enumerate(rng.getDataArray()) if not isinstance(v, float)]
    if bad:
        raise SystemExit(f"column {col} has non-numbers, first at row {bad[0] + 1}")


def build_cases(session, cells, array_points):
    zs, rs = points(max(cells, array_points))

    def native(n):
        def build(sheet):
            column(sheet, 0, zs[:n])
            formulas(sheet, 1, NATIVE, n)
            check_no_errors(sheet, 1, n)
        return build

    def addin_cells(sheet):
        column(sheet, 0, zs[:cells])
        formulas(sheet, 1, ADDIN_CELL, cells)
        check_no_errors(sheet, 1, cells)

    def addin_array(sheet):
        n = array_points
        column(sheet, 0, zs[:n])
        column(sheet, 1, rs[:n])
        sheet.getCellRangeByPosition(2, 0, 2, n - 1).setArrayFormula(
            f"=LOOP_BZ({RADIUS};{TURNS};{CURRENT};A1:A{n};B1:B{n})")
        check_no_errors(sheet, 2, n)

    def native_array(sheet):  # reference: Calc's own array formula over the same two columns
        n = array_points
        column(sheet, 0, zs[:n])
        column(sheet, 1, rs[:n])
        sheet.getCellRangeByPosition(2, 0, 2, n - 1).setArrayFormula(f"=A1:A{n}*B1:B{n}+A1:A{n}")
        check_no_errors(sheet, 2, n)

    return {
        "native_cells": Case(session, "native_cells", cells, native(cells)),
        "addin_cells": Case(session, "addin_cells", cells, addin_cells),
        "native_column": Case(session, "native_column", array_points, native(array_points)),
        "addin_array": Case(session, "addin_array", array_points, addin_array),
        "native_array": Case(session, "native_array", array_points, native_array),
    }


def main():
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--oxt", default=str(ROOT / "build" / "coilwright.oxt"))
    ap.add_argument("--repeat", type=int, default=7)
    ap.add_argument("--cells", type=int, default=50000)
    ap.add_argument("--array-points", type=int, default=1000000)
    args = ap.parse_args()

    with CalcSession(args.oxt) as session:
        pid = soffice_pid(session)
        cases = build_cases(session, args.cells, args.array_points)
        for _ in range(args.repeat):
            for case in cases.values():
                case.time_once(pid)
        for case in cases.values():
            case.doc.close(True)

    print(f"# medians of {args.repeat} calculateAll runs per case; wall s / LibreOffice processor s; "
          f"load average {os.getloadavg()[0]:.1f}")
    for case in cases.values():
        print(f"{case.name} {case.cells} cells: wall {case.median('wall'):.4f} s "
              f"({case.median('wall') / case.cells * 1e6:.3f} us per cell), cpu {case.median('cpu'):.4f} s")
    for label, num, den in (("per_cell_ratio addin/native", "addin_cells", "native_cells"),
                            ("array_ratio addin_array/native_array", "addin_array", "native_array"),
                            ("array_ratio addin_array/native_column", "addin_array", "native_column"),
                            ("reference native_array/native_column", "native_array", "native_column")):
        wall = cases[num].median("wall") / cases[den].median("wall")
        cpu = cases[num].median("cpu") / cases[den].median("cpu")
        print(f"{label} {wall:.2f} (processor time {cpu:.2f})")


if __name__ == "__main__":
    main()
