"""Build Calc workbooks from short Python descriptions (sheets/src/*.py) through the UNO API.

A description is text a reviewer can diff; the .ods in sheets/ is its built form. Each
description module defines TITLE and build(book). The builder offers the few things design
sheets need: labelled inputs with units and names, result rows, array formulas, number
formats, checks that turn red when out of budget, notes and XY charts. No macros, ever.
"""
import re

import uno
from com.sun.star.awt import Rectangle
from com.sun.star.table import CellRangeAddress

from calc_session import props

# Colours (RGB ints) used consistently across workbooks.
INPUT_FILL = 0xFFF5CC    # what the designer types
RESULT_FILL = 0xE6F0FA   # what Coilwright computes
HEADER_FILL = 0x2F4F6F
CAUTION_FILL = 0xFDE9E7
BOLD = 150.0

# What every coil's workbook says under its own cautions.
GENERAL_CAUTIONS = [
    "For every coil: a hot winding burns (guard its surface and let it cool); the supply can give a shock",
    "(cover live parts, switch off first); interrupting the current makes a flyback voltage (clamp it below",
    "the insulation's voltage rating); the field pulls loose ferromagnetic objects into the coil (keep them,",
    "and hands, out of the bore while it is energised); compare fields where people stand, static, pulsed",
    "or AC, with the exposure and implant limits of the standard that applies at your site. Defer to local",
    "codes and licensed practice, and have designs that carry real power reviewed.",
]
EMPTY = uno.Enum("com.sun.star.table.CellContentType", "EMPTY")
TEXT = uno.Enum("com.sun.star.table.CellContentType", "TEXT")
FORMULA = uno.Enum("com.sun.star.table.CellContentType", "FORMULA")
TEXT_RESULT = 2  # com.sun.star.sheet.FormulaResult.STRING


def _col_index(letters):
    n = 0
    for ch in letters:
        n = n * 26 + (ord(ch) - 64)
    return n - 1


def split_cell(name):
    m = re.fullmatch(r"([A-Z]+)(\d+)", name)
    if not m:
        raise ValueError(f"bad cell name {name}")
    return _col_index(m.group(1)), int(m.group(2)) - 1


class Sheet:
    def __init__(self, book, sheet, name):
        self.book, self.sheet, self.name = book, sheet, name

    def cell(self, name):
        return self.sheet.getCellRangeByName(name)

    # --- content -------------------------------------------------------------------------
    def text(self, cell, text, bold=False, size=None, fill=None, color=None, wrap=False):
        c = self.cell(cell)
        c.setString(text)
        self._style(c, bold, size, fill, color, wrap)
        return c

    def value(self, cell, number, fmt=None, fill=None):
        c = self.cell(cell)
        c.setValue(number)
        if fmt:
            self.format(cell, fmt)
        if fill is not None:
            c.CellBackColor = fill
        return c

    def formula(self, cell, text, fmt=None, fill=None, bold=False):
        c = self.cell(cell)
        c.setFormula(text)
        if fmt:
            self.format(cell, fmt)
        self._style(c, bold, None, fill, None, False)
        return c

    def array(self, rng, text, fmt=None):
        r = self.cell(rng)
        r.setArrayFormula(text)
        if fmt:
            self.format(rng, fmt)
        return r

    def define_name(self, name, cell):
        """A workbook-wide name for one cell or a range ("B4" or "J5:O6"), so formulas read
        like the design."""
        first = cell.split(":")[0]
        col, row = split_cell(first)
        addr = uno.createUnoStruct("com.sun.star.table.CellAddress")
        addr.Sheet, addr.Column, addr.Row = self.book.index_of(self.name), col, row
        absolute = ":".join("$" + re.sub(r"([A-Z]+)(\d+)", r"\1$\2", part) for part in cell.split(":"))
        sheet = self.name if re.fullmatch(r"[A-Za-z_]\w*", self.name) else "'" + self.name.replace("'", "''") + "'"
        self.book.doc.NamedRanges.addNewByName(name, f"${sheet}.{absolute}", addr, 0)

    def input(self, row, label, name, number, unit, note="", fmt="0.000"):
        """Label | value (named, yellow) | unit | note."""
        self.text(f"A{row}", label)
        self.value(f"B{row}", number, fmt, INPUT_FILL)
        self.define_name(name, f"B{row}")
        self.text(f"C{row}", unit)
        if note:
            self.text(f"D{row}", note, color=0x555555)

    def result(self, row, label, name, formula, unit, note="", fmt="0.000"):
        """Label | formula (named, blue) | unit | note."""
        self.text(f"A{row}", label)
        self.formula(f"B{row}", formula, fmt, RESULT_FILL)
        if name:
            self.define_name(name, f"B{row}")
        self.text(f"C{row}", unit)
        if note:
            self.text(f"D{row}", note, color=0x555555)

    def check(self, row, label, condition, ok_text, bad_text, note=""):
        """A check row: shows ok_text, or bad_text on a red fill when the condition fails."""
        self.text(f"A{row}", label)
        self.formula(f"B{row}", f'=IF({condition};"{ok_text}";"{bad_text}")')
        # Absolute address: a conditional format's relative references count from A1.
        self.book.flag_unless(self.cell(f"B{row}"), f'$B${row}="{ok_text}"')
        if note:
            self.text(f"D{row}", note, color=0x555555)

    def header(self, cell, text):
        return self.text(cell, text, bold=True, fill=HEADER_FILL, color=0xFFFFFF)

    def cautions(self, row, lines, width_cols="A:F"):
        """The workbook's own cautions, then those every coil needs (GENERAL_CAUTIONS)."""
        self.text(f"A{row}", "Cautions", bold=True, fill=CAUTION_FILL)
        for i, line in enumerate(list(lines) + GENERAL_CAUTIONS, start=1):
            self.text(f"A{row + i}", line, fill=CAUTION_FILL)
        return row + len(lines) + len(GENERAL_CAUTIONS) + 1

    def comment(self, cell, text):
        col, row = split_cell(cell)
        addr = uno.createUnoStruct("com.sun.star.table.CellAddress")
        addr.Sheet, addr.Column, addr.Row = self.book.index_of(self.name), col, row
        self.sheet.Annotations.insertNew(addr, text)

    # --- layout ----------------------------------------------------------------------------
    def format(self, rng, fmt):
        self.cell(rng).NumberFormat = self.book.number_format(fmt)

    def widths(self, **cols_mm):
        for letters, mm in cols_mm.items():
            self.sheet.Columns.getByIndex(_col_index(letters)).Width = int(mm * 100)

    def _style(self, c, bold, size, fill, color, wrap):
        if bold:
            c.CharWeight = BOLD
        if size:
            c.CharHeight = size
        if fill is not None:
            c.CellBackColor = fill
        if color is not None:
            c.CharColor = color
        if wrap:
            c.IsTextWrapped = True

    def chart(self, name, anchor, size_mm, data_range, title, x_title, y_title, series_in_columns=True):
        """An XY (scatter) line chart: first column x, the other columns y series, row 1 names.
        data_range is one range or a list of ranges of equal height (e.g. x and a distant y column)."""
        col, row = split_cell(anchor)
        x = sum(self.sheet.Columns.getByIndex(i).Width for i in range(col))
        y = sum(self.sheet.Rows.getByIndex(i).Height for i in range(row))
        rect = Rectangle(x, y, int(size_mm[0] * 100), int(size_mm[1] * 100))
        ranges = [data_range] if isinstance(data_range, str) else list(data_range)
        addrs = []
        for text in ranges:  # several ranges: the first column of the first is x
            # "Sheet.A1:B9" names a range on another sheet (charts gathered on a sheet of their own).
            owner = self.book.doc.Sheets.getByName(text.split(".")[0]) if "." in text else self.sheet
            r = owner.getCellRangeByName(text.split(".")[-1]).getRangeAddress()
            addrs.append(CellRangeAddress(r.Sheet, r.StartColumn, r.StartRow, r.EndColumn, r.EndRow))
        self.sheet.Charts.addNewByName(name, rect, tuple(addrs), True, False)
        series = sum(a.EndColumn - a.StartColumn + 1 for a in addrs) - 1
        doc = self.sheet.Charts.getByName(name).EmbeddedObject
        diagram = doc.createInstance("com.sun.star.chart.XYDiagram")
        doc.setDiagram(diagram)
        diagram.DataRowSource = uno.Enum("com.sun.star.chart.ChartDataRowSource",
                                         "COLUMNS" if series_in_columns else "ROWS")
        diagram.SymbolType = -3  # ChartSymbolType.NONE: lines only
        doc.HasMainTitle = True
        doc.Title.String = title
        diagram.HasXAxisTitle = True
        diagram.XAxisTitle.String = x_title
        diagram.HasYAxisTitle = True
        diagram.YAxisTitle.String = y_title
        doc.HasLegend = series > 1
        position = uno.Enum("com.sun.star.chart.ChartAxisPosition", "START")
        for axis in (diagram.XAxis, diagram.YAxis):
            axis.CrossoverPosition = position  # axes at the plot's edge, not through zero
            axis.LinkNumberFormatToSource = False
        diagram.Wall.FillStyle = uno.Enum("com.sun.star.drawing.FillStyle", "NONE")
        return doc


def _shows_text(cell):
    """A text or a formula with a text result: it may overflow into empty cells to its right."""
    return cell.getType() == TEXT or (cell.getType() == FORMULA and cell.FormulaResultType2 == TEXT_RESULT)


def _room_to_the_right(sheet, col, row, last_col):
    """Width (1/100 mm) of the empty cells right of (col, row), up to the next taken cell or the
    last used column (the printed area ends there)."""
    room = 0
    while col < last_col:
        col += 1
        if sheet.getCellByPosition(col, row).getType() != EMPTY:
            break
        room += sheet.Columns.getByIndex(col).Width
    return room


def _extend_fill(sheet, col, row, width):
    """Paint the header fill over the empty cells a header's text runs into."""
    covered = sheet.Columns.getByIndex(col).Width
    while covered < width:
        col += 1
        nxt = sheet.getCellByPosition(col, row)
        if nxt.getType() != EMPTY:
            break
        nxt.CellBackColor = HEADER_FILL
        covered += sheet.Columns.getByIndex(col).Width


class Book:
    def __init__(self, session):
        self.session = session
        self.doc = session.new_document()
        self._sheets = []
        self._formats = {}
        self._ensure_styles()
        self._page_setup()

    def index_of(self, name):
        return self._sheets.index(name)

    def sheet(self, name):
        sheets = self.doc.Sheets
        if not self._sheets:
            first = sheets.getByIndex(0)
            sheets.getByIndex(0).Name = name
        else:
            sheets.insertNewByName(name, len(self._sheets))
        self._sheets.append(name)
        return Sheet(self, sheets.getByName(name), name)

    def number_format(self, fmt):
        if fmt not in self._formats:
            formats = self.doc.NumberFormats
            locale = uno.createUnoStruct("com.sun.star.lang.Locale")
            locale.Language, locale.Country = "en", "US"
            key = formats.queryKey(fmt, locale, False)
            if key == -1:
                key = formats.addNew(fmt, locale)
            self._formats[fmt] = key
        return self._formats[fmt]

    def _page_setup(self):
        # Landscape, one page wide: a design sheet reads across.
        page = self.doc.StyleFamilies.getByName("PageStyles").getByName("Default")
        if not page.IsLandscape:
            page.IsLandscape = True
            page.Width, page.Height = page.Height, page.Width
        page.ScaleToPagesX = 1
        page.ScaleToPagesY = 0

    def _ensure_styles(self):
        styles = self.doc.StyleFamilies.getByName("CellStyles")
        if not styles.hasByName("Out of budget"):
            style = self.doc.createInstance("com.sun.star.style.CellStyle")
            styles.insertByName("Out of budget", style)
            style.CellBackColor = 0xF4B6B0
            style.CharWeight = BOLD

    def flag_unless(self, cell, ok_condition):
        """Conditional format: the 'Out of budget' style whenever ok_condition is false."""
        cf = cell.ConditionalFormat
        cf.addNew(props(Operator=uno.Enum("com.sun.star.sheet.ConditionOperator", "FORMULA"),
                        Formula1=f"NOT({ok_condition})", StyleName="Out of budget"))
        cell.ConditionalFormat = cf

    def set_info(self, title, description):
        info = self.doc.DocumentProperties
        info.Title = title
        info.Description = description

    def fit_columns(self):
        """Widen every column to its optimal width over the cells that must fit in it, so that
        printed labels, units and numbers are whole: numbers, wrapped texts and texts whose
        right neighbour is taken (a text overflows only into empty cells). A header (white on
        the header fill) that overflows gets the fill over the cells its text runs into."""
        sheets = self.doc.Sheets
        sheets.insertNewByName("__fit", sheets.getCount())
        scratch = sheets.getByName("__fit")
        probe = scratch.getCellByPosition(0, 0)
        probe_column = scratch.Columns.getByIndex(0)

        def text_width(cell):
            probe.setString(cell.getString())
            probe.CharHeight, probe.CharWeight = cell.CharHeight, cell.CharWeight
            probe_column.Width = 100
            probe_column.OptimalWidth = True
            return probe_column.Width

        try:
            for name in self._sheets:
                sheet = sheets.getByName(name)
                cursor = sheet.createCursor()
                cursor.gotoEndOfUsedArea(False)
                end = cursor.getRangeAddress()
                columns = sheet.Columns
                for row in range(end.EndRow + 1):
                    for col in range(end.EndColumn + 1):
                        cell = sheet.getCellByPosition(col, row)
                        if cell.getType() == EMPTY or not cell.getString() or cell.IsTextWrapped:
                            continue
                        width = text_width(cell)
                        column = columns.getByIndex(col)
                        if _shows_text(cell):
                            # It may run over the empty cells to its right: widen its own column
                            # by what they lack.
                            room = _room_to_the_right(sheet, col, row, end.EndColumn)
                            if cell.CellBackColor == HEADER_FILL:
                                _extend_fill(sheet, col, row, width)
                            width -= room
                        if width > 0:
                            column.Width = max(column.Width, width)
        finally:
            sheets.removeByName("__fit")

    def save(self, path):
        self.doc.calculateAll()
        self.fit_columns()
        url = uno.systemPathToFileUrl(str(path))
        self.doc.storeToURL(url, props(FilterName="calc8"))

    def close(self):
        self.doc.close(True)
