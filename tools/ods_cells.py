"""Reads the cells of an .ods file straight from its content.xml, without LibreOffice.

Used to compare what a workbook *saved* (formulas, inputs and cached results) with what
Calc computes now, independently of whether Calc recalculates on load.
"""
import zipfile
import xml.etree.ElementTree as ET

NS = {
    "table": "urn:oasis:names:tc:opendocument:xmlns:table:1.0",
    "office": "urn:oasis:names:tc:opendocument:xmlns:office:1.0",
    "text": "urn:oasis:names:tc:opendocument:xmlns:text:1.0",
}


def _q(prefix, name):
    return f"{{{NS[prefix]}}}{name}"


class SavedCell:
    __slots__ = ("formula", "value_type", "value", "text", "array_member", "block")

    def __init__(self, formula, value_type, value, text):
        self.formula, self.value_type, self.value, self.text = formula, value_type, value, text
        self.array_member = False  # inside an array formula's block (the formula is on its top-left)
        self.block = None          # (sheet, row, col) of the top-left cell of its array formula

    @property
    def computed(self):
        """True when the cached value came from a formula (its own or its array's)."""
        return bool(self.formula) or self.array_member

    def __repr__(self):
        return f"SavedCell({self.formula!r}, {self.value_type!r}, {self.value!r}, {self.text!r})"


def read_cells(path):
    """{(sheet name, row, col): SavedCell} for every non-empty cell (0-based row and column)."""
    with zipfile.ZipFile(path) as z:
        root = ET.fromstring(z.read("content.xml"))
    cells = {}
    arrays = []
    for table in root.iter(_q("table", "table")):
        name = table.get(_q("table", "name"))
        row = 0
        for tr in table.iter(_q("table", "table-row")):
            rows_rep = int(tr.get(_q("table", "number-rows-repeated"), "1"))
            col = 0
            for tc in tr:
                if tc.tag not in (_q("table", "table-cell"), _q("table", "covered-table-cell")):
                    continue
                cols_rep = int(tc.get(_q("table", "number-columns-repeated"), "1"))
                formula = tc.get(_q("table", "formula"))
                vtype = tc.get(_q("office", "value-type"))
                text = "\n".join("".join(p.itertext()) for p in tc.findall(_q("text", "p")))
                if formula or vtype or text:
                    value = tc.get(_q("office", "value"))
                    if vtype == "string":
                        value = tc.get(_q("office", "string-value"), text)
                    for dr in range(rows_rep):
                        for dc in range(cols_rep):
                            cells[(name, row + dr, col + dc)] = SavedCell(formula, vtype, value, text)
                    spans = (tc.get(_q("table", "number-matrix-rows-spanned")),
                             tc.get(_q("table", "number-matrix-columns-spanned")))
                    if formula and spans[0]:
                        arrays.append((name, row, col, int(spans[0]), int(spans[1])))
                col += cols_rep
            row += rows_rep
    for name, row, col, nrows, ncols in arrays:
        for r in range(row, row + nrows):
            for c in range(col, col + ncols):
                cell = cells.get((name, r, c))
                if cell is None:
                    continue
                cell.block = (name, row, col)
                if not cell.formula:
                    cell.array_member = True
    return cells
