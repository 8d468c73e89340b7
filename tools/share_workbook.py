#!/usr/bin/python3
"""Frozen copies of workbooks for colleagues without the add-in.

For each workbook: recalculate it with the extension installed, replace every formula that
calls a Coilwright function by its value (the formula text is kept in a cell comment, so a
reviewer still sees how each number was made), and write NAME.ods and NAME.pdf (with charts)
into the output folder. The copy opens without error cells where the add-in is missing; the
sheet's own native formulas stay live.

Usage: /usr/bin/python3 tools/share_workbook.py --out-dir build/share sheets/*.ods
"""
import argparse
import pathlib
import sys

import uno

ROOT = pathlib.Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT / "tools"))

from calc_session import CalcSession, props  # noqa: E402

ADDIN_PREFIX = "ORG.COILWRIGHT.FUNCTIONS."
FORMULA = uno.Enum("com.sun.star.table.CellContentType", "FORMULA")


def used_area(sheet):
    cursor = sheet.createCursor()
    cursor.gotoEndOfUsedArea(False)
    return cursor.getRangeAddress()


def freeze(doc):
    """Replaces add-in formulas by values in place; returns how many cells were frozen."""
    frozen = 0
    for sheet in doc.Sheets:
        end = used_area(sheet)
        handled = set()
        for row in range(end.EndRow + 1):
            for col in range(end.EndColumn + 1):
                if (col, row) in handled:
                    continue
                cell = sheet.getCellByPosition(col, row)
                if cell.getType() != FORMULA or ADDIN_PREFIX not in cell.getFormula().upper():
                    continue
                # An array formula is replaced as a block; its text goes on the top-left cell.
                cursor = sheet.createCursorByRange(cell)
                cursor.collapseToCurrentArray()
                block = cursor.getRangeAddress()
                text = cell.getFormula()
                display = text
                if block.EndRow > block.StartRow or block.EndColumn > block.StartColumn:
                    display = "{" + text + "}"
                    data = cursor.getDataArray()
                    cursor.setArrayFormula("")
                    cursor.setDataArray(data)
                else:
                    value, error = cell.getValue(), cell.getError()
                    if cell.FormulaResultType2 == 2:  # text result (FormulaResult.STRING)
                        cell.setString(cell.getString())
                    elif error:
                        cell.setString(f"Err:{error}")
                    else:
                        cell.setValue(value)
                for r in range(block.StartRow, block.EndRow + 1):
                    for c in range(block.StartColumn, block.EndColumn + 1):
                        handled.add((c, r))
                        frozen += 1
                top_left = sheet.getCellByPosition(block.StartColumn, block.StartRow)
                sheet.Annotations.insertNew(top_left.CellAddress,
                                            "Frozen value. Computed with the Coilwright add-in by:\n" +
                                            display.replace(ADDIN_PREFIX, "").replace(ADDIN_PREFIX.lower(), ""))
    return frozen


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--oxt", default=str(ROOT / "build" / "coilwright.oxt"))
    ap.add_argument("--out-dir", required=True)
    ap.add_argument("workbooks", nargs="+")
    opts = ap.parse_args()
    out_dir = pathlib.Path(opts.out_dir).resolve()
    out_dir.mkdir(parents=True, exist_ok=True)
    with CalcSession(opts.oxt) as session:
        for wb in opts.workbooks:
            path = pathlib.Path(wb)
            doc = session.open_document(path)
            doc.calculateAll()
            n = freeze(doc)
            doc.calculateAll()
            info = doc.DocumentProperties
            info.Description = (info.Description + "\n" if info.Description else "") + \
                "Shared copy: Coilwright results frozen as values; formulas shown in cell comments."
            ods, pdf = out_dir / path.name, out_dir / f"{path.stem}.pdf"
            doc.storeToURL(uno.systemPathToFileUrl(str(ods)), props(FilterName="calc8"))
            doc.storeToURL(uno.systemPathToFileUrl(str(pdf)), props(FilterName="calc_pdf_Export"))
            doc.close(True)
            print(f"{path.name}: froze {n} cells; wrote {ods} and {pdf}")


if __name__ == "__main__":
    main()
