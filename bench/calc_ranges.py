#!/usr/bin/python3
"""What whole-column and whole-sheet ranges cost in a real (headless) LibreOffice Calc.

A coil table of two rows sits in K1:P2 of an otherwise empty sheet; each case puts one formula
over a whole-column range next to it, in a LibreOffice of its own (so that its peak memory is
its own), and reports:

  first     seconds until the formula's first result (setFormula and reading the result,
            what a user waits for after typing it);
  recalc    median seconds of a hard recalculation (calculateAll) of that one formula;
  peak MiB  how far soffice.bin's peak resident memory (VmHWM, reset through
            /proc/<pid>/clear_refs just before) rose above its size before the formula was typed;
  result    the cell's text or error, or "LibreOffice died".

A last case times what passing a table by reference costs where tables are small and cells
many: 10,000 cells =STACK_BZ($K$1:$P$2;A1) (a two-row table, z down column A) against 10,000
cells =LOOP_BZ(...) of the same field (median recalculation, microseconds per cell, wall clock
and LibreOffice's processor time, which a busy machine disturbs less).

The reference is Calc's own =MULTINOMIAL over the same range (the issue's yardstick): a
wrong-width table range must answer within 1.5 times its time. LibreOffice runs under an
address-space limit (--memory-limit-gb, default 8) so that a case that would take all the
machine's memory kills only its own LibreOffice.

Run: /usr/bin/python3 bench/calc_ranges.py [--oxt build/coilwright.oxt] [--repeat 5] [--hazards]
--hazards adds the cases that only a limit keeps from taking the whole machine: a whole sheet
given to a number argument, which Calc converts cell by cell before any add-in sees it.
"""
import argparse
import os
import pathlib
import resource
import statistics
import sys
import time

ROOT = pathlib.Path(__file__).resolve().parents[1]
sys.path.insert(0, str(ROOT / "tools"))

from calc_session import CalcSession  # noqa: E402

TABLE = [[0.1, 0.1, 0.0, -0.05, 10, 1.0], [0.1, 0.1, 0.0, 0.05, 10, 1.0]]  # a Helmholtz pair of loops

CASES = [
    ("Calc's MULTINOMIAL, 20 whole columns", "=MULTINOMIAL(K:AD)"),
    ("STACK_CHECK, 20 whole columns (wrong width)", "=STACK_CHECK(K:AD)"),
    ("STACK_CHECK, the whole sheet (wrong width)", "=STACK_CHECK(A:AMJ)"),
    ("STACK_BZ, 6 whole columns (right width)", "=STACK_BZ(K:P;0)"),
    ("STACK_CHECK, a two-sheet range", "=STACK_CHECK($Sheet1.K1:$Sheet2.P2)"),
]
HAZARDS = [
    ("LOOP_BZ, 20 whole columns as z", "=LOOP_BZ(0.1;10;2;K:AD)"),
    ("LOOP_BZ, the whole sheet as z", "=LOOP_BZ(0.1;10;2;A:AMJ)"),
]


def status_kib(pid, key):
    for line in pathlib.Path(f"/proc/{pid}/status").read_text().splitlines():
        if line.startswith(key + ":"):
            return int(line.split()[1])
    raise KeyError(key)


def result_text(cell):
    err = cell.getError()
    return f"Err:{err}" if err else cell.getString()


def run_case(oxt, formula, repeat):
    session = CalcSession(oxt)
    try:
        doc = session.new_document()
        doc.Sheets.insertNewByName("Sheet2", 1)
        sheet, sheet2 = doc.Sheets.getByIndex(0), doc.Sheets.getByIndex(1)
        sheet.getCellRangeByName("K1:P2").setDataArray(tuple(tuple(r) for r in TABLE))
        bad = [list(r) for r in TABLE]
        bad[1][1] = 0.05  # outer radius below inner: a bad row on the second sheet
        sheet2.getCellRangeByName("K1:P2").setDataArray(tuple(tuple(r) for r in bad))
        pid = session.soffice_pid()
        pathlib.Path(f"/proc/{pid}/clear_refs").write_text("5")  # VmHWM := VmRSS
        base = status_kib(pid, "VmRSS")
        cell = sheet.getCellByPosition(7, 5)  # H6: outside every range above
        start = time.perf_counter()
        try:
            cell.setFormula(formula)
            text = result_text(cell)  # Calc computes the cell when its result is first asked for
            first = time.perf_counter() - start
            times = []
            for _ in range(repeat):
                t0 = time.perf_counter()
                doc.calculateAll()
                times.append(time.perf_counter() - t0)
            peak = (status_kib(pid, "VmHWM") - base) / 1024
        except Exception as e:  # the bridge breaks when soffice dies; bad_alloc comes back as an exception
            elapsed = time.perf_counter() - start
            if session.alive():
                return {"first": elapsed, "recalc": float("nan"), "peak": (status_kib(pid, "VmHWM") - base) / 1024,
                        "result": f"failed, LibreOffice still up: {str(e).splitlines()[0][:60]}"}
            return {"first": elapsed, "recalc": float("nan"), "peak": float("nan"),
                    "result": f"LibreOffice died ({type(e).__name__})"}
        return {"first": first, "recalc": statistics.median(times), "peak": peak, "result": text}
    finally:
        session.close()


def cpu_seconds(pid):
    """Processor time of every thread of a process (from /proc/<pid>/task/*/schedstat)."""
    total = 0
    for task in pathlib.Path(f"/proc/{pid}/task").iterdir():
        try:
            total += int((task / "schedstat").read_text().split()[0])
        except OSError:
            pass  # a thread that just ended
    return total * 1e-9


def run_many(oxt, repeat, n=10_000):
    """Microseconds per cell of n cells of a small-table formula and of a plain one."""
    from com.sun.star.sheet.FillDirection import TO_BOTTOM
    session = CalcSession(oxt)
    try:
        out = {}
        for label, formula in (("STACK_BZ($K$1:$P$2;A1)", "=STACK_BZ($K$1:$P$2;A1)"),
                               ("LOOP_BZ(0.1;20;1;A1)", "=LOOP_BZ(0.1;20;1;A1)")):
            doc = session.new_document()
            sheet = doc.Sheets.getByIndex(0)
            sheet.getCellRangeByName("K1:P2").setDataArray(tuple(tuple(r) for r in TABLE))
            sheet.getCellRangeByPosition(0, 0, 0, n - 1).setDataArray(tuple((0.3 + 1e-5 * i,) for i in range(n)))
            sheet.getCellByPosition(1, 0).setFormula(formula)
            sheet.getCellRangeByPosition(1, 0, 1, n - 1).fillAuto(TO_BOTTOM, 1)
            doc.calculateAll()
            pid = session.soffice_pid()
            times, cpu = [], []
            for _ in range(repeat):
                c0, t0 = cpu_seconds(pid), time.perf_counter()
                doc.calculateAll()
                times.append(time.perf_counter() - t0)
                cpu.append(cpu_seconds(pid) - c0)
            bad = sum(1 for (v,) in sheet.getCellRangeByPosition(1, 0, 1, n - 1).getDataArray() if not isinstance(v, float))
            out[label] = (statistics.median(times) / n * 1e6, statistics.median(cpu) / n * 1e6, bad)
            doc.close(True)
        return out
    finally:
        session.close()


def main():
    ap = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    ap.add_argument("--oxt", default=str(ROOT / "build" / "coilwright.oxt"))
    ap.add_argument("--repeat", type=int, default=5)
    ap.add_argument("--memory-limit-gb", type=float, default=8.0)
    ap.add_argument("--hazards", action="store_true")
    opts = ap.parse_args()
    limit = int(opts.memory_limit_gb * 2**30)
    resource.setrlimit(resource.RLIMIT_AS, (limit, limit))  # inherited by LibreOffice

    cases = CASES + (HAZARDS if opts.hazards else [])
    print(f"{os.path.basename(opts.oxt)}, {opts.repeat} recalculations per case, "
          f"address space limited to {opts.memory_limit_gb:g} GiB")
    print(f"{'case':48} {'first s':>8} {'recalc s':>9} {'peak MiB':>9}  result")
    results = {}
    for label, formula in cases:
        r = run_case(opts.oxt, formula, opts.repeat)
        results[formula] = r
        print(f"{label:48} {r['first']:8.3f} {r['recalc']:9.3f} {r['peak']:9.0f}  {r['result'][:60]}", flush=True)
    for label, (us, cpu, bad) in run_many(opts.oxt, opts.repeat).items():
        print(f"10,000 cells ={label:25} {us:8.2f} us per cell, {cpu:6.2f} us processor time"
              + (f"  ({bad} not numbers)" if bad else ""))
    ref, check = results["=MULTINOMIAL(K:AD)"], results["=STACK_CHECK(K:AD)"]
    if ref["recalc"] == ref["recalc"] and check["recalc"] == check["recalc"]:
        print(f"wrong-width table range / MULTINOMIAL over K:AD: first {check['first'] / ref['first']:.2f}, "
              f"recalc {check['recalc'] / ref['recalc']:.2f} (goal: at most 1.5)")


if __name__ == "__main__":
    main()
