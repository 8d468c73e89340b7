#!/usr/bin/python3
"""Where the time of a recalculation goes, counted in machine instructions (valgrind's
callgrind), which other processes on a busy machine do not disturb the way they disturb clocks.

For the cases of bench/calc_bench.py (smaller, since callgrind runs code about 50 times
slower; the native column doubles as the native cells) it starts a private LibreOffice under callgrind with instrumentation off, builds the
document, switches instrumentation on for exactly one calculateAll, and reads the inclusive
instruction counts of the functions that matter. Prints instructions per cell for:
  total        the whole recalculation, every thread of LibreOffice (Calc may spread
               formula groups over a thread pool)
  reflection   LibreOffice's UNO core reflection and bridge calls into the add-in
               (IdlInterfaceMethodImpl::invoke and below, ours excluded)
  addin        the Coilwright add-in itself (the generated interface methods and below)
  engine       of which the field kernels (coilwright::loop_field*)
Needs valgrind (callgrind_control, callgrind_annotate).

Run: /usr/bin/python3 bench/calc_callgrind.py [--oxt build/coilwright.oxt] [--cells 5000] [--keep DIR]
"""
import argparse
import os
import pathlib
import re
import subprocess
import sys
import tempfile

ROOT = pathlib.Path(__file__).resolve().parents[1]
sys.path.insert(0, str(ROOT / "tools"))
sys.path.insert(0, str(ROOT / "bench"))

import calc_bench as cb  # noqa: E402
from calc_session import CalcSession  # noqa: E402


def valgrinded_soffice():
    for p in pathlib.Path("/proc").iterdir():
        if p.name.isdigit():
            try:
                cmd = (p / "cmdline").read_bytes()
            except OSError:
                continue
            if b"callgrind" in cmd and b"soffice.bin" in cmd:
                return p.name
    raise SystemExit("soffice.bin under callgrind not found")


def inclusive_counts(dump):
    """{function text: inclusive Ir} from callgrind_annotate."""
    text = subprocess.run(["callgrind_annotate", "--inclusive=yes", "--threshold=100", dump],
                          check=True, capture_output=True, text=True).stdout
    out = {}
    m = re.search(r"^\s*([\d,]+) \([\s\d.]+%\)\s+PROGRAM TOTALS", text, re.M)
    out["PROGRAM TOTALS"] = int(m.group(1).replace(",", "")) if m else 0
    for line in text.splitlines():
        m = re.match(r"\s*([\d,]+) \([\s\d.]+%\)\s+(.*)$", line)
        if m:
            out[m.group(2)] = int(m.group(1).replace(",", ""))
    return out


def first(counts, pattern):
    """The largest inclusive count among functions whose text matches."""
    values = [v for k, v in counts.items() if re.search(pattern, k)]
    return max(values) if values else 0


def profile_case(oxt, name, build, cells, workdir):
    env_before = dict(os.environ)
    os.environ["VALGRIND"] = "callgrind"  # read by LibreOffice's soffice launcher script
    os.environ["VALGRIND_OPTS"] = f"--instr-atstart=no --callgrind-out-file={workdir}/cg.%p"
    try:
        with CalcSession(oxt, timeout=900) as session:
            pid = valgrinded_soffice()
            doc = session.new_document()
            build(doc.Sheets.getByIndex(0))
            doc.calculateAll()
            subprocess.run(["callgrind_control", "-i", "on", pid], check=True, capture_output=True)
            doc.calculateAll()
            subprocess.run(["callgrind_control", "-d", name, pid], check=True, capture_output=True)
            subprocess.run(["callgrind_control", "-i", "off", pid], check=True, capture_output=True)
            doc.close(True)
    finally:
        os.environ.clear()
        os.environ.update(env_before)
    dumps = sorted(pathlib.Path(workdir).glob(f"cg.{pid}.*"))
    counts = inclusive_counts(str(dumps[-1]))
    total = counts["PROGRAM TOTALS"]  # every thread: Calc may compute formula groups on several
    addin = first(counts, r"non-virtual thunk to coilwright::uno_glue::.*FunctionsComponent::[A-Z_]+\(")
    reflection = first(counts, r"libreflectionlo\.so") - addin if addin else 0
    engine = sum(v for k, v in counts.items() if re.search(r"coilwright::loop_field\w*\(|coilwright::\(anonymous "
                                                              r"namespace\)::block_\w+\(", k))
    per = lambda v: v / cells  # noqa: E731
    print(f"{name:14s} {cells:6d} cells: total {per(total):8.0f}  reflection {per(reflection):8.0f}  "
          f"addin {per(addin):7.0f}  engine {per(engine):6.0f}  instructions per cell", flush=True)
    return total


def main():
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--oxt", default=str(ROOT / "build" / "coilwright.oxt"))
    ap.add_argument("--cells", type=int, default=5000)
    ap.add_argument("--keep", metavar="DIR", help="keep the callgrind files in DIR (for callgrind_annotate)")
    args = ap.parse_args()
    n = args.cells
    zs, rs = cb.points(n)

    def native(sheet):
        cb.column(sheet, 0, zs)
        cb.formulas(sheet, 1, cb.NATIVE, n)

    def addin_cells(sheet):
        cb.column(sheet, 0, zs)
        cb.formulas(sheet, 1, cb.ADDIN_CELL, n)

    def addin_array(sheet):
        cb.column(sheet, 0, zs)
        cb.column(sheet, 1, rs)
        sheet.getCellRangeByPosition(2, 0, 2, n - 1).setArrayFormula(
            f"=LOOP_BZ({cb.RADIUS};{cb.TURNS};{cb.CURRENT};A1:A{n};B1:B{n})")

    def native_array(sheet):  # reference: Calc's own array formula, no UNO
        cb.column(sheet, 0, zs)
        cb.column(sheet, 1, rs)
        sheet.getCellRangeByPosition(2, 0, 2, n - 1).setArrayFormula(f"=A1:A{n}*B1:B{n}")

    with tempfile.TemporaryDirectory(prefix="coilwright-callgrind-") as tmp:
        workdir = args.keep or tmp
        pathlib.Path(workdir).mkdir(parents=True, exist_ok=True)
        totals = {name: profile_case(args.oxt, name, build, n, workdir)
                  for name, build in (("native_cells", native), ("addin_cells", addin_cells),
                                      ("addin_array", addin_array), ("native_array", native_array))}
    print(f"per_cell_ratio addin/native {totals['addin_cells'] / totals['native_cells']:.2f} (instructions)")
    print(f"array_ratio addin_array/native_column {totals['addin_array'] / totals['native_cells']:.2f} (instructions)")
    print(f"reference native_array/native_column {totals['native_array'] / totals['native_cells']:.2f} (instructions)")


if __name__ == "__main__":
    main()
