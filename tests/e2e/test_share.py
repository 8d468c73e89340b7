"""Frozen copies for sharing: the menu command Coilwright > Save Frozen Copy for Sharing and
tools/share_workbook.py, one C++ implementation (addin/uno/share_command.cpp).

The stress workbook (tests/e2e/workbooks/share_stress.py) is built and recalculated with the
add-in (the live copy), frozen by the command, and the frozen copy is opened in a second
LibreOffice WITHOUT the add-in, as a colleague would. There it must show:
- every number of the live copy to 1e-15 relative (it is in fact bit for bit), before and after a
  hard recalculation, and every saved office:value in content.xml equal to the live number;
- the same error code in the same cell, scalar or array element (502, 523, 519, 532, #N/A), through
  native formulas that give those codes without the add-in (=#ERR502!, =#ERR523!, =#VALUE!, ...);
  native formulas over them (SUM, ISERROR, ERROR.TYPE) give what they gave live;
- named expressions, conditional formats and validity rules that no longer call Coilwright but
  whose formulas give, cell by cell, what they gave live.
It also measures what a colleague sees (printed, and stated in README.md) and checks that the
command line and the menu entry reach the same command.
"""
import math
import os
import pathlib
import subprocess
import sys
import tempfile
import unittest
import zipfile

import uno
from com.sun.star.table import CellAddress

ROOT = pathlib.Path(__file__).resolve().parents[2]
sys.path.insert(0, str(ROOT / "tools"))

from calc_session import CalcSession, props  # noqa: E402
from e2e_support import OXT  # noqa: E402
from ods_cells import read_cells  # noqa: E402
import build_workbooks  # noqa: E402
import share_workbook  # noqa: E402
from workbook_builder import Book  # noqa: E402

STRESS = ROOT / "tests" / "e2e" / "workbooks" / "share_stress.py"
ORIGINAL_SHEETS = ("Coil data", "Field results")
ERR_NAME = 525  # #NAME?: what an unknown function shows
FLAGS = 1 | 2 | 4 | 16  # CellFlags VALUE | DATETIME | STRING | FORMULA
SCRATCH_COLUMN = 600  # far right of every sheet: where the tests evaluate a rule's formula


def cell_state(cell):
    """('error', code) | ('text', s) | ('number', v) of what a cell shows."""
    if cell.getError():
        return ("error", cell.getError())
    kind = cell.getType().value
    if kind == "TEXT" or (kind == "FORMULA" and cell.FormulaResultType2 == 2):
        return ("text", cell.getString())
    return ("number", cell.getValue())


def sheet_states(doc, names=ORIGINAL_SHEETS):
    states = {}
    for name in names:
        sheet = doc.Sheets.getByName(name)
        for r in sheet.queryContentCells(FLAGS).getRangeAddresses():
            for row in range(r.StartRow, r.EndRow + 1):
                for col in range(r.StartColumn, r.EndColumn + 1):
                    states[(name, row, col)] = cell_state(sheet.getCellByPosition(col, row))
    return states


def same_state(a, b, rel=1e-15):
    if a[0] != b[0]:
        return False
    if a[0] != "number":
        return a[1] == b[1]
    return a[1] == b[1] or abs(a[1] - b[1]) <= rel * max(abs(a[1]), abs(b[1]))


def cells_of(ranges):
    for r in ranges:
        for row in range(r.StartRow, r.EndRow + 1):
            for col in range(r.StartColumn, r.EndColumn + 1):
                yield col, row


def evaluate_at(doc, sheet, text, source, col, row, english):
    """What formula `text` (relative to `source`) gives when a rule applies it to cell (col, row):
    moved there by Calc's formula parser and computed in a scratch cell of the same sheet."""
    parser = doc.createInstance("com.sun.star.sheet.FormulaParser")
    parser.CompileEnglish = english
    tokens = parser.parseFormula(text, source)
    parser.CompileEnglish = True
    moved = parser.printFormula(tokens, CellAddress(source.Sheet, col, row))
    scratch = sheet.getCellByPosition(SCRATCH_COLUMN, row)
    scratch.setFormula("=" + moved)
    state = cell_state(scratch)
    scratch.setFormula("")
    return state


def rule_values(doc):
    """{(kind, sheet, ranges, style/operator, formula index, col, row): state} of every formula of
    every conditional format and validity rule on the original sheets, evaluated cell by cell. The
    stress workbook's rules are relative to the top-left cell of their range."""
    out = {}
    for name in ORIGINAL_SHEETS:
        sheet = doc.Sheets.getByName(name)
        index = doc.Sheets.getByName(name).RangeAddress.Sheet
        for fmt in sheet.ConditionalFormats.getConditionalFormats():
            ranges = fmt.Range.getRangeAddresses()
            where = fmt.Range.RangeAddressesAsString
            top_left = CellAddress(index, ranges[0].StartColumn, ranges[0].StartRow)
            for i in range(fmt.getCount()):
                entry = fmt.getByIndex(i)
                texts = [entry.Formula1] + ([entry.Formula2] if entry.Operator in (6, 7) else [])
                for k, text in enumerate(texts):
                    for col, row in cells_of(ranges):
                        key = ("format", name, where, entry.StyleName, entry.Operator, k, col, row)
                        out[key] = evaluate_at(doc, sheet, text, top_left, col, row, english=False)
        for r in sheet.getCellFormatRanges():
            rule = r.Validation
            if rule.Type.value == "ANY":
                continue
            for col, row in cells_of([r.RangeAddress]):
                key = ("validity", name, rule.Type.value, 0, col, row)
                out[key] = evaluate_at(doc, sheet, rule.getFormula1(), rule.getSourcePosition(), col, row, english=True)
    return out


def rule_texts(doc):
    """Every formula of the document's named expressions, conditional formats and validity rules."""
    texts = [n.getContent() for n in doc.NamedRanges]
    for sheet in doc.Sheets:
        for fmt in sheet.ConditionalFormats.getConditionalFormats():
            for i in range(fmt.getCount()):
                texts += [fmt.getByIndex(i).Formula1, fmt.getByIndex(i).Formula2]
        for r in sheet.getCellFormatRanges():
            texts += [r.Validation.getFormula1(), r.Validation.getFormula2()]
    return texts


def coilwright_cells(path):
    """(scalar, array) cells of a saved workbook whose formula calls Coilwright, from content.xml."""
    cells = read_cells(path)
    scalar, array = set(), set()
    for key, cell in cells.items():
        formula = cell.formula or (cells[cell.block].formula if cell.block else None)
        if formula and "ORG.COILWRIGHT.FUNCTIONS." in formula.upper():
            (array if cell.block else scalar).add(key)
    return scalar, array


class FrozenCopy(unittest.TestCase):
    @classmethod
    def setUpClass(cls):
        cls.tmp = tempfile.TemporaryDirectory()
        tmp = pathlib.Path(cls.tmp.name)
        cls.live_path = tmp / "stress.ods"
        cls.frozen_path = tmp / "out" / "stress.ods"
        cls.session = CalcSession(OXT)
        book = Book(cls.session)
        build_workbooks.load_description(STRESS).build(book)
        book.save(cls.live_path)
        book.close()
        doc = cls.session.open_document(cls.live_path)
        doc.calculateAll()
        cls.live = sheet_states(doc)
        cls.live_rules = rule_values(doc)
        cls.report = share_workbook.share_document(cls.session, doc, cls.frozen_path)
        doc.close(True)
        cls.bare = CalcSession(None)  # a colleague's LibreOffice: no Coilwright

    @classmethod
    def tearDownClass(cls):
        cls.bare.close()
        cls.session.close()
        cls.tmp.cleanup()

    def open_bare(self, path):
        doc = self.bare.open_document(path)
        self.assertIsNotNone(doc, f"LibreOffice without the add-in could not open {path.name}")
        self.addCleanup(doc.close, True)
        return doc

    def test_the_command_reports_what_it_froze(self):
        r = self.report
        print(f"\nshare command: {r['FrozenCells']} cells ({r['FrozenArrays']} array formulas, {r['ErrorCells']} "
              f"error cells), {r['FrozenNames']} named expressions, {r['FrozenConditionalFormats']} conditional "
              f"formats, {r['FrozenValidations']} validity rules, {r['ExactValues']} numbers written exactly")
        self.assertEqual(list(r["Warnings"]), [])
        self.assertEqual(r["FrozenNames"], 4)
        self.assertEqual(r["FrozenConditionalFormats"], 4)
        self.assertEqual(r["FrozenValidations"], 2)
        self.assertGreaterEqual(r["ErrorCells"], 10)
        self.assertTrue(self.frozen_path.exists() and self.frozen_path.with_suffix(".pdf").exists())
        self.assertTrue(self.frozen_path.with_suffix(".pdf").read_bytes().startswith(b"%PDF"))

    def test_without_the_addin_every_cell_shows_what_it_showed_live(self):
        doc = self.open_bare(self.frozen_path)
        kinds = {}
        for when in ("as opened", "after a hard recalculation"):
            seen = sheet_states(doc)
            self.assertEqual(set(seen), set(self.live), when)
            worst = 0.0
            for key, live in self.live.items():
                self.assertTrue(same_state(live, seen[key]), f"{when}: {key} live {live}, frozen {seen[key]}")
                if live[0] == "number" and live[1]:
                    worst = max(worst, abs(live[1] - seen[key][1]) / abs(live[1]))
                kinds[live[0]] = kinds.get(live[0], 0) + 1
            print(f"\n{when}: {len(self.live)} cells equal to the live copy, largest relative difference {worst:g}")
            doc.calculateAll()
        codes = {s[1] for s in self.live.values() if s[0] == "error"}
        self.assertLessEqual({502, 523, 519, 532, 32767}, codes, "the stress workbook covers every error code")
        self.assertGreater(kinds.get("text", 0), 0)

    def test_saved_numbers_are_exact_where_libreoffice_alone_loses_digits(self):
        frozen, live_saved = read_cells(self.frozen_path), read_cells(self.live_path)
        exact = lost = small = 0
        worst = 0.0
        for key, state in self.live.items():
            if state[0] != "number" or state[1] == 0:
                continue
            v = state[1]
            if frozen[key].value_type not in ("float", "percentage", "currency"):
                continue  # a boolean (ISERROR) is stored as true or false
            self.assertEqual(float(frozen[key].value), v, f"{key}: content.xml has {frozen[key].value}, live {v!r}")
            exact += 1
            small += 1e-14 <= abs(v) <= 1e-7
            saved = float(live_saved[key].value)
            if saved != v:
                lost += 1
                worst = max(worst, abs(saved - v) / abs(v))
        print(f"\n{exact} numbers exact in the frozen copy's content.xml ({small} between 1e-14 and 1e-7); "
              f"LibreOffice's own save of the live copy changes {lost} of them, by up to {worst:.2g} relative")
        self.assertGreater(small, 10)
        # Stated in README.md (section on sharing): update both together.
        self.assertEqual((exact, lost, f"{worst:.2g}"), (108, 57, "9.5e-08"))

    def test_errors_are_stored_as_native_formulas(self):
        forms = {c.formula for c in read_cells(self.frozen_path).values() if c.value_type == "error" or
                 (c.formula and "#" in c.formula)}
        for form in ("of:=#ERR502!", "of:=#ERR523!", "of:=#VALUE!", "of:=#DIV/0!", "of:=#N/A"):
            self.assertIn(form, forms)
        # Each of them gives its code in LibreOffice alone, typed fresh as well as loaded.
        doc = self.bare.new_document()
        self.addCleanup(doc.close, True)
        cell = doc.Sheets.getByIndex(0).getCellByPosition(0, 0)
        for text, code in (("=#ERR502!", 502), ("=#ERR523!", 523), ("=#VALUE!", 519), ("=#DIV/0!", 532),
                           ("=#N/A", 32767), ("=SUM(#ERR502!;1)", 502), ("=SUM(#ERR523!;1)", 523)):
            cell.setFormula(text)
            self.assertEqual(cell.getError(), code, text)

    def test_named_expressions_conditional_formats_and_validity_rules_are_frozen(self):
        doc = self.open_bare(self.frozen_path)
        for text in rule_texts(doc):
            self.assertNotIn("ORG.COILWRIGHT", text.upper(), text)
            self.assertNotIn("LOOP_BZ", text.upper(), text)
        frozen_rules = rule_values(doc)
        self.assertEqual(set(frozen_rules), set(self.live_rules))
        for key, live in self.live_rules.items():
            self.assertTrue(same_state(live, frozen_rules[key]), f"{key}: live {live}, frozen {frozen_rules[key]}")
        print(f"\n{len(self.live_rules)} rule formulas, cell by cell, equal to the live ones")
        # The named expressions still serve the cells that use them (=BZERO*1000 showed #NAME? before).
        results = doc.Sheets.getByName("Field results")
        self.assertEqual(cell_state(results.getCellRangeByName("B22")), self.live[("Field results", 21, 1)])

    def test_what_a_colleague_sees(self):
        """Measured for README.md: the live copy and the frozen copy, without and with the add-in."""
        scalar, array = coilwright_cells(self.live_path)
        saved = read_cells(self.live_path)
        live_bare = self.open_bare(self.live_path)

        def shown(keys):
            return {k: cell_state(live_bare.Sheets.getByName(k[0]).getCellByPosition(k[2], k[1])) for k in keys}

        # As opened, LibreOffice shows the values saved in the file for scalar cells that had a
        # number or a text (with the digits the file kept), and #NAME? for error cells and arrays.
        opened = shown(scalar | array)
        scalar_values = {k for k in scalar if self.live[k][0] != "error"}
        for k in scalar_values:
            want = ("text", saved[k].value) if saved[k].value_type == "string" else ("number", float(saved[k].value))
            self.assertEqual(opened[k], want, k)
        for k in (scalar - scalar_values) | array:
            self.assertEqual(opened[k], ("error", ERR_NAME), k)
        rounded = sum(1 for k in scalar_values if opened[k][0] == "number" and opened[k] != self.live[k])
        live_bare.calculateAll()
        after = shown(scalar | array)
        self.assertTrue(all(v == ("error", ERR_NAME) for v in after.values()))
        print(f"\nlive copy without the add-in, as opened: saved values in {len(scalar_values)} of {len(scalar)} "
              f"scalar cells ({rounded} of them with digits lost), #NAME? in the other {len(scalar) - len(scalar_values)}"
              f" (errors) and in all {len(array)} array cells; after a recalculation #NAME? in all "
              f"{len(scalar) + len(array)}")
        # Stated in README.md (section on sharing): update both together.
        self.assertEqual((len(scalar), len(array), len(scalar_values), rounded), (15, 52, 10, 8))
        frozen_live = self.session.open_document(self.frozen_path)
        self.addCleanup(frozen_live.close, True)
        for when in ("as opened", "after a hard recalculation"):
            seen = sheet_states(frozen_live)
            self.assertTrue(all(same_state(v, seen[k]) for k, v in self.live.items()), when)
            frozen_live.calculateAll()
        print(f"frozen copy with or without the add-in, as opened and after a recalculation: the live values in "
              f"all {len(scalar)} scalar and {len(array)} array cells")

    def test_the_command_line_writes_the_same_copy(self):
        out = pathlib.Path(self.tmp.name) / "cli"
        run = subprocess.run([sys.executable, str(ROOT / "tools" / "share_workbook.py"), "--oxt", str(OXT),
                              str(self.live_path), str(out)], capture_output=True, text=True, timeout=300)
        self.assertEqual(run.returncode, 0, run.stderr)
        self.assertTrue((out / "stress.pdf").exists())
        a, b = read_cells(self.frozen_path), read_cells(out / "stress.ods")
        self.assertEqual(set(a), set(b))
        for key, cell in a.items():
            self.assertEqual((cell.formula, cell.value_type, cell.value, cell.text),
                             (b[key].formula, b[key].value_type, b[key].value, b[key].text), key)

    def test_the_menu_entry_runs_the_command_beside_the_workbook(self):
        config = self.session.smgr.createInstanceWithContext("com.sun.star.configuration.ConfigurationProvider",
                                                             self.session.ctx)
        menus = config.createInstanceWithArguments("com.sun.star.configuration.ConfigurationAccess",
                                                   props(nodepath="/org.openoffice.Office.Addons/AddonUI/OfficeMenuBar"))
        entry = menus.getByName("org.coilwright.menu").getByName("Submenu").getByName("m01_share")
        self.assertEqual(entry.URL, share_workbook.SHARE_URL)
        self.assertIn("Frozen Copy", entry.Title)
        copy = pathlib.Path(self.tmp.name) / "menu" / "my design.ods"
        copy.parent.mkdir()
        copy.write_bytes(self.live_path.read_bytes())
        doc = self.session.open_document(copy)
        self.addCleanup(doc.close, True)
        url = uno.createUnoStruct("com.sun.star.util.URL")
        url.Complete = share_workbook.SHARE_URL
        transformer = self.session.smgr.createInstanceWithContext("com.sun.star.util.URLTransformer", self.session.ctx)
        _, url = transformer.parseStrict(url)
        self.assertIsNotNone(doc.CurrentController.Frame.queryDispatch(url, "", 0), "no dispatch for the menu's URL")
        report = share_workbook.share_document(self.session, doc)  # no target: as the menu does
        self.assertTrue((copy.parent / "my design-shared.ods").exists(), report)
        self.assertTrue((copy.parent / "my design-shared.pdf").exists())
        self.assertEqual(uno.fileUrlToSystemPath(report["Copy"]), str(copy.parent / "my design-shared.ods"))

    def test_what_cannot_be_frozen_is_reported_and_left_live(self):
        doc = self.session.new_document()  # never saved: the command needs a target
        self.addCleanup(doc.close, True)
        sheet = doc.Sheets.getByIndex(0)
        sheet.getCellRangeByName("A1").setValue(0.01)
        sheet.getCellRangeByName("B1").setFormula("=LOOP_BZ(0.1;10;2;A1)")
        # A name with a relative reference follows the cell that uses it; ROW() in a rule names the
        # cell the rule is evaluated in: no frozen value can stand in for either.
        doc.NamedRanges.addNewByName("FOLLOWS", "LOOP_BZ(0.1;10;2;A1)", CellAddress(0, 1, 0), 0)
        target = sheet.getCellRangeByName("C1:C3")
        entries = target.ConditionalFormat
        entries.addNew(props(Operator=uno.Enum("com.sun.star.sheet.ConditionOperator", "FORMULA"),
                             Formula1="LOOP_BZ(0.1;10;2;ROW()/100)>0", StyleName="Accent",
                             SourcePosition=CellAddress(0, 2, 0)))
        target.ConditionalFormat = entries
        with self.assertRaisesRegex(RuntimeError, "Save the workbook first"):
            share_workbook.share_document(self.session, doc)
        report = share_workbook.share_document(self.session, doc, pathlib.Path(self.tmp.name) / "limits" / "a.ods")
        warnings = "\n".join(report["Warnings"])
        self.assertIn("named expression FOLLOWS: its call depends on the cell that uses the name", warnings)
        self.assertIn("ROW() or COLUMN() of the cell itself", warnings)
        self.assertEqual((report["FrozenCells"], report["FrozenNames"], report["FrozenConditionalFormats"]), (1, 0, 0))

    def test_the_copy_never_replaces_the_workbook(self):
        doc = self.session.open_document(self.live_path)
        self.addCleanup(doc.close, True)
        with self.assertRaisesRegex(RuntimeError, "replace the workbook"):
            share_workbook.share_document(self.session, doc, self.live_path)


if __name__ == "__main__":
    unittest.main()
