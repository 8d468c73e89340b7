"""Runs a family's tests/e2e/bad_inputs/<family>.py in Calc: the good call must give a number,
every listed bad substitute and bad call an error cell. (Generic bad values are the robustness
runner's job; this checks each family's own domain cases where the family is tested.)"""
import importlib.util
import pathlib


def load_cases(family):
    path = pathlib.Path(__file__).resolve().parent / "bad_inputs" / f"{family}.py"
    spec = importlib.util.spec_from_file_location(f"bad_inputs_{family}", path)
    module = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(module)
    return module.CASES


def formula(name, args):
    return f"={name}({';'.join(args)})"


def check_family(test, family, expected_names):
    """`test` is a CalcTestCase; `expected_names` the catalogue functions the file must cover."""
    cases = load_cases(family)
    test.assertEqual(set(cases), set(expected_names), f"bad_inputs/{family}.py covers other functions")
    for name, case in cases.items():
        good = formula(name, case["good"])
        cell = test.formula("A1", good)
        test.assertEqual(cell.getError(), 0, f"{good} gave Err:{cell.getError()}")
        calls = [list(call) for call in case["bad_calls"]]
        for index, substitutes in case["bad"].items():
            for bad in substitutes:
                args = list(case["good"])
                args[index] = bad
                calls.append(args)
        for args in calls:
            text = formula(name, args)
            with test.subTest(formula=text):
                cell = test.formula("A2", text)
                test.assertNotEqual(cell.getError(), 0, f"{text} gave the number {cell.getValue()!r}")
