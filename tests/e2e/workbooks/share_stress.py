"""Stress workbook for the share command (tests/e2e/test_share.py): everything a frozen copy must
keep, in one invented design. Scalar and array results of every size from 1e-14 T to 1e-4 T,
a text result, error cells of every code a Coilwright formula can show (502 illegal argument,
523 no convergence, 519 #VALUE!, 532 #DIV/0!, #N/A) as scalars and inside arrays, native
formulas over them, named expressions, conditional formats and validity rules that call
Coilwright with fixed and with cell-relative arguments. Sheet names contain spaces on purpose.
Built through tools/workbook_builder.py like sheets/src/*.py; the numbers are a demo scenario.
"""
import uno
from com.sun.star.table import CellAddress

from workbook_builder import split_cell

TITLE = "Share stress workbook"
ONE_ROW = 0.99999999999  # STACK_UNIFORM_Z tolerance so close to 1 that the search ends first: Err:523


def _address(sheet, cell):
    col, row = split_cell(cell)
    return CellAddress(sheet.book.index_of(sheet.name), col, row)


def conditional(sheet, rng, operator, formula1, formula2="", style="Accent", separate=False):
    """A conditional format entry whose formulas are relative to the range's top-left cell; added to
    the range's first format, or (separate) a format of its own that may overlap others."""
    target = sheet.cell(rng)
    entries = target.ConditionalFormat
    if separate:
        entries.clear()
    props = [("Operator", uno.Enum("com.sun.star.sheet.ConditionOperator", operator)), ("Formula1", formula1),
             ("Formula2", formula2), ("StyleName", style), ("SourcePosition", _address(sheet, rng.split(":")[0]))]
    entries.addNew(tuple(uno.createUnoStruct("com.sun.star.beans.PropertyValue", n, 0, v, 0) for n, v in props))
    target.ConditionalFormat = entries


def validity(sheet, rng, kind, operator, formula1):
    target = sheet.cell(rng)
    rule = target.Validation
    rule.Type = uno.Enum("com.sun.star.sheet.ValidationType", kind)
    rule.setOperator(uno.Enum("com.sun.star.sheet.ConditionOperator", operator))
    rule.setFormula1(formula1)
    rule.setSourcePosition(_address(sheet, rng.split(":")[0]))
    rule.ShowErrorMessage = True
    target.Validation = rule


def build(book):
    book.set_info(TITLE, "Coilwright test workbook for frozen copies (invented scenario).")
    data = book.sheet("Coil data")
    data.text("A1", "Share stress workbook (Coilwright test)", bold=True, size=14)
    data.input(3, "Loop radius", "radius", 0.1, "m")
    data.input(4, "Turns", "turns", 10, "", fmt="0")
    data.input(5, "Current", "current", 2, "A")
    data.input(6, "Sensing current", "tiny_current", 1e-9, "A", fmt="0.0E+00")
    for col, text in zip("FGHIJK", ("inner", "outer", "length", "centre z", "turns", "current")):
        data.text(f"{col}2", text, bold=True)
    for row, values in ((3, (0.1, 0.11, 0.01, -0.05, 10, 1)), (4, (0.1, 0.11, 0.01, 0.05, 10, 1))):
        for col, v in zip("FGHIJK", values):
            data.value(f"{col}{row}", v)
    data.define_name("coils", "F3:K4")
    # The current must stay below the current that gives 1e5 times the field of 1 A (never binds).
    validity(data, "B5", "DECIMAL", "LESS", "LOOP_BZ(radius;turns;1;0)*1E5")

    doc = book.doc
    origin = CellAddress(0, 0, 0)
    for name, content in (("BZERO", "LOOP_BZ(radius;turns;current;0)"),
                          ("TINY", "LOOP_BZ(radius;turns;tiny_current;0.05)"),
                          ("BADNAME", "LOOP_BZ(0;1;1;0)"),
                          ("MIXED", "LOOP_BZ(radius;turns;current;0)+$'Coil data'.$B$5")):
        doc.NamedRanges.addNewByName(name, content, origin, 0)

    s = book.sheet("Field results")
    s.text("A1", "Results", bold=True)
    s.result(3, "Centre field", None, "=LOOP_BZ(radius;turns;current;0)", "T", fmt="0.000E+00")
    for k in range(7):  # 4.5e-14 T to 4.5e-8 T: where LibreOffice's own file keeps 7 to 13 digits
        s.result(4 + k, f"Field of 10^{k} x sensing current", None,
                 f"=LOOP_BZ(radius;turns;tiny_current*10^{k};0.05)", "T", fmt="0.000E+00")
    s.result(11, "Inductance of the coil table", None, "=STACK_L(coils)", "H", fmt="0.000E+00")
    s.result(12, "Coil table check (text)", None, "=STACK_CHECK(coils)", "")
    s.result(13, "Radius 0 (Err:502)", None, "=LOOP_BZ(0;turns;current;0)", "")
    s.result(14, "No convergence (Err:523)", None, f"=STACK_UNIFORM_Z(coils;{ONE_ROW})", "")
    s.result(15, "Times text (#VALUE!)", None, '=LOOP_BZ(radius;turns;current;0)*"x"', "")
    s.result(16, "Over zero (#DIV/0!)", None, "=LOOP_BZ(radius;turns;current;0)/0", "")
    s.result(17, "Not available (#N/A)", None, "=IF(LOOP_BZ(radius;turns;current;0)>0;NA();0)", "")
    # Native formulas over the frozen cells and names: they stay live in the copy.
    s.result(19, "Sum over Err:502", None, "=SUM(B13;1)", "")
    s.result(20, "Sum over Err:523", None, "=SUM(B14;1)", "")
    s.result(21, "Centre field in uT", None, "=B3*1E6", "uT")
    s.result(22, "BZERO in mT", None, "=BZERO*1000", "mT")
    s.result(23, "Sum of the small fields", None, "=SUM(B4:B10)", "T", fmt="0.000E+00")
    s.result(24, "Is B13 an error", None, "=ISERROR(B13)", "")
    s.result(25, "Error type of B15", None, "=ERROR.TYPE(B15)", "")
    s.result(26, "Named error", None, "=BADNAME", "")
    s.result(27, "Named small field", None, "=TINY*1", "T", fmt="0.000E+00")
    s.result(28, "Named mixed", None, "=MIXED", "")

    s.text("D2", "z (m)", bold=True)
    s.text("E2", "Bz at 1 uA (T)", bold=True)
    s.text("F2", "Bz on the winding radius", bold=True)
    s.array("D3:D23", "=(ROW(D3:D23)-3)*0.01")
    s.array("E3:E23", "=LOOP_BZ(radius;turns;1E-6;D3:D23)", fmt="0.000E+00")
    s.array("F3:F23", "=LOOP_BZ(radius;turns;1E-6;D3:D23;radius)", fmt="0.000E+00")  # z = 0: on the filament
    s.array("H3:I4", "=STACK_UNIFORM_Z(coils;{0.5;0.99999999999|0.9;0.999})", fmt="0.0000")
    s.array("H6:H8", "=IF(LOOP_BZ(radius;turns;1E-6;{0|0.05|0.1})>5E-11;NA();LOOP_BZ(radius;turns;1E-6;{0|0.05|0.1}))")
    s.array("H10", "=LOOP_BZ(radius;turns;current;0)")
    s.array("H12:H13", '=LOOP_BZ({0|0.1};turns;current;0)*{1|"x"}')

    for i in range(10):  # values a validity rule checks against a cell-relative call
        s.value(f"J{3 + i}", 1e-12 * (i + 1) ** 3)
    conditional(s, "B4:B10", "FORMULA", "B4>LOOP_BZ(radius;turns;tiny_current*1000;0.05)")
    conditional(s, "E3:E23", "FORMULA", "LOOP_BZ(radius;turns;1E-6;$D3)>5E-11")
    conditional(s, "B3", "GREATER", "LOOP_BZ(radius;turns;current;0)*0.5")
    conditional(s, "B4:B10", "BETWEEN", "LOOP_BZ(radius;turns;tiny_current*10;0.05)",
                "LOOP_BZ(radius;turns;tiny_current*1E5;0.05)", style="Good")
    conditional(s, "B5:B6", "LESS", "LOOP_BZ(radius;turns;tiny_current*10^(ROW(B5)-3);0.05)", style="Bad", separate=True)
    validity(s, "J3:J12", "CUSTOM", "NONE", "J3<LOOP_BZ(radius;turns;1E-6;$D3)")
