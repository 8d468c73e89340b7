#!/usr/bin/python3
"""Recalculates workbooks in a private headless LibreOffice with the extension installed and
writes, for each, a PDF (all sheets, with charts) and a CSV of its first sheet's values.

Usage: /usr/bin/python3 tools/recalc_workbook.py --out-dir DIR WORKBOOK.ods [...]
"""
import argparse
import pathlib
import sys

import uno

ROOT = pathlib.Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT / "tools"))

from calc_session import CalcSession, cell_name, props, used_cells  # noqa: E402


def error_cells(doc):
    """Addresses of formula cells that show an error after recalculation."""
    return [f"{sheet.Name}.{cell_name(cell)}: Err:{cell.getError()}"
            for sheet, cell in used_cells(doc) if cell.getError()]


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--oxt", default=str(ROOT / "build" / "coilwright.oxt"))
    ap.add_argument("--out-dir", required=True)
    ap.add_argument("workbooks", nargs="+")
    opts = ap.parse_args()
    out_dir = pathlib.Path(opts.out_dir)
    out_dir.mkdir(parents=True, exist_ok=True)
    status = 0
    with CalcSession(opts.oxt) as session:
        for wb in opts.workbooks:
            path = pathlib.Path(wb)
            doc = session.open_document(path)
            doc.calculateAll()
            pdf = out_dir / f"{path.stem}.pdf"
            doc.storeToURL(uno.systemPathToFileUrl(str(pdf.resolve())), props(FilterName="calc_pdf_Export"))
            csv = out_dir / f"{path.stem}.csv"
            doc.storeToURL(uno.systemPathToFileUrl(str(csv.resolve())),
                           props(FilterName="Text - txt - csv (StarCalc)", FilterOptions="44,34,76,1"))
            bad = error_cells(doc)
            doc.close(True)
            print(f"{path.name}: recalculated; wrote {pdf} and {csv}")
            if bad:
                status = 1
                print(f"{path.name}: error cells: {', '.join(bad[:20])}")
    return status


if __name__ == "__main__":
    sys.exit(main())
