"""Runs a family's tests/e2e/bad_inputs/<family>.py in Calc: the good call must give a number,
every listed bad substitute and bad call an error cell. (Generic bad values are the robustness
runner's job; this checks each family's own domain cases where the family is tested.)"""
import importlib.util
import pathlib

from catalogue import array_twin_name, has_table, load as load_catalogue

IDL_DIR = pathlib.Path(__file__).resolve().parents[2] / "idl"


def load_cases(family):
    path = pathlib.Path(__file__).resolve().parent / "bad_inputs" / f"{family}.py"
    spec = importlib.util.spec_from_file_location(f"bad_inputs_{family}", path)
    module = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(module)
    return module.CASES


def parse_inline_array(text):
    """'{1;2|3;4}' -> [['1','2'],['3','4']], or None when text is not an inline array."""
    text = text.strip()
    if not (text.startswith("{") and text.endswith("}")):
        return None
    return [row.split(";") for row in text[1:-1].split("|")]


def column_name(index):
    name = ""
    index += 1
    while index:
        index, rem = divmod(index - 1, 26)
        name = chr(65 + rem) + name
    return name


def callables_of(fn):
    """(name as typed, fn, tables given as cell ranges?): the function itself, whose coil table is
    a cell range, and for a function with a table its array twin (tools/catalogue.py)."""
    yield fn["name"], fn, has_table(fn)
    if has_table(fn):
        yield array_twin_name(fn), fn, False


class TableCells:
    """Inline-array tables written into cells of one sheet (one block per distinct table, far to
    the right of everything else), for functions whose table is a cell range."""
    FIRST_COLUMN = 300

    def __init__(self, sheet):
        self.sheet, self.blocks, self.next_row = sheet, {}, 0

    def ref(self, text):
        rows = parse_inline_array(text)
        if rows is None:
            return text
        if text not in self.blocks:
            top = self.next_row
            for r, row in enumerate(rows):
                for k, v in enumerate(row):
                    self.sheet.getCellByPosition(self.FIRST_COLUMN + k, top + r).setFormula("=" + v)
            width = max(len(row) for row in rows)
            self.blocks[text] = (f"${column_name(self.FIRST_COLUMN)}${top + 1}:"
                                 f"${column_name(self.FIRST_COLUMN + width - 1)}${top + len(rows)}")
            self.next_row = top + len(rows) + 1
        return self.blocks[text]

    def bind(self, fn, by_reference, args):
        """args with every inline-array table replaced by the reference of its cells."""
        if not by_reference:
            return list(args)
        return [self.ref(a) if i < len(fn["args"]) and fn["args"][i]["kind"] == "table" else a
                for i, a in enumerate(args)]


def formula(name, args):
    return f"={name}({';'.join(args)})"


def check_family(test, family, expected_names):
    """`test` is a CalcTestCase; `expected_names` the catalogue functions the file must cover. A
    function with a coil table is checked with its tables in cells and through its array twin."""
    cases = load_cases(family)
    test.assertEqual(set(cases), set(expected_names), f"bad_inputs/{family}.py covers other functions")
    catalogue = {fn["name"]: fn for fn in load_catalogue(IDL_DIR)["function"]}
    tables = TableCells(test.sheet)
    for base, case in cases.items():
        for name, fn, by_reference in callables_of(catalogue[base]):
            check_case(test, name, case, lambda args: tables.bind(fn, by_reference, args))


def check_case(test, name, case, bind):
    good = formula(name, bind(case["good"]))
    cell = test.formula("A1", good)
    test.assertEqual(cell.getError(), 0, f"{good} gave Err:{cell.getError()}")
    calls = [list(call) for call in case["bad_calls"]]
    for index, substitutes in case["bad"].items():
        for bad in substitutes:
            args = list(case["good"])
            args[index] = bad
            calls.append(args)
    for args in calls:
        text = formula(name, bind(args))
        with test.subTest(formula=text):
            cell = test.formula("A2", text)
            test.assertNotEqual(cell.getError(), 0, f"{text} gave the number {cell.getValue()!r}")
