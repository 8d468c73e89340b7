# Bad-input cases for the higher-order designs and the real turns. Arguments are formula text as
# a user would type them. "constraint", "centre", "packing", "parameter" and "quantity" are
# choices: text only.
_HELMHOLTZ = "{0.1;0.1;0;-0.05;1;1|0.1;0.1;0;0.05;1;1}"
_BAD_TABLES = ["{0.1;0.1;0;0;1}", "{0.1;0.05;0;0;1;1}"]
_WINDING = ["0.02", "0.001", "10", "3", "1.5"]
_WINDING_BAD = {0: ["0", "-0.02"], 1: ["0", "-0.001"], 2: ["0", "2.5", "-1"], 3: ["0", "1.5"]}
_PACKING_BAD = ['"round"', '""', "0"]

CASES = {
    "UNIFORM_COILS": {
        "good": ["0.3", "2", "100", '"sphere"', '"loop"'],
        "bad": {0: ["0", "-0.3"], 1: ["0", "5", "1.5"], 3: ['"cube"', '""', "1"], 4: ['"two"', "1"]},
        "bad_calls": [],
        "shaped": True,
    },
    "GRADIENT_COILS": {
        "good": ["0.3", "3", "100", '"cylinder"'],
        "bad": {0: ["0", "-0.3"], 1: ["0", "5", "2.5"], 3: ['"cube"', "0"]},
        "bad_calls": [],
        "shaped": True,
    },
    "MULTIPAIR_COILS": {
        "good": ["0.1", "0.12", "0.02", "2", "100", '"none"'],
        "bad": {0: ["0", "-0.1"], 1: ["0.05"], 2: ["-0.02"], 3: ["0", "5", "1.5"], 5: ['"two"']},
        "bad_calls": [["0.1", "0.12", "0.2", "2", "100", '"none"']],   # the windings would overlap
        "shaped": True,
    },
    "GRADMULTIPAIR_COILS": {
        "good": ["0.1", "0.12", "0.02", "2", "100"],
        "bad": {0: ["0", "-0.1"], 1: ["0.05"], 2: ["-0.02"], 3: ["0", "5", "1.5"]},
        "bad_calls": [["0.1", "0.12", "0.3", "2", "100"]],
        "shaped": True,
    },
    "STACK_ORDER": {
        "good": [_HELMHOLTZ, "0"],
        "bad": {0: _BAD_TABLES},
        "bad_calls": [["{0.1;0.1;0;0;1;0}", "0"]],   # no field at all
    },
    "TURNS_BZ": {
        "good": _WINDING + ["0.001", "0.002", '"square"'],
        "bad": {**_WINDING_BAD, 6: ["-0.001"], 7: _PACKING_BAD},
        "bad_calls": [_WINDING + ["0.0005", "0.0205", '"square"'],   # on a wire's centre line
                      ["0.02", "0.001", "1000", "1000", "1", "0", "0", '"square"']],   # 1e6 turns
    },
    "TURNS_BR": {
        "good": _WINDING + ["0.001", "0.002", '"hexagonal"'],
        "bad": {**_WINDING_BAD, 6: ["-0.001"], 7: _PACKING_BAD},
        "bad_calls": [_WINDING + ["0.0005", "0.0205", '"square"']],
    },
    "TURNS_B": {
        "good": _WINDING + ["0.001", "0.002", '"square"'],
        "bad": {**_WINDING_BAD, 6: ["-0.001"], 7: _PACKING_BAD},
        "bad_calls": [_WINDING + ["0.0005", "0.0205", '"square"']],
    },
    "TURNS_BPHI": {
        "good": _WINDING + ["0.001", "0.03", '"square"'],
        "bad": {**_WINDING_BAD, 6: ["-0.001"], 7: _PACKING_BAD},
        "bad_calls": [],
    },
    "TURNS_MODEL_ERROR": {
        "good": _WINDING + ["0.001", "0.002", '"square"'],
        "bad": {**_WINDING_BAD, 6: ["-0.001"], 7: _PACKING_BAD},
        "bad_calls": [["0.02", "0.001", "10", "3", "0", "0", "0", '"square"'],   # no current, no field
                      _WINDING + ["0.0005", "0.0205", '"square"']],
    },
    "TURNS_SENSITIVITY": {
        "good": _WINDING + ["2", "1", '"position"', "0.0001", '"uniform"', "0", "0.001", '"square"'],
        "bad": {**_WINDING_BAD, 5: ["0", "4", "1.5"], 6: ["0", "11"], 7: ['"inner"', '"length"', '""'],
                9: ['"both"'], 11: ["0", "1"], 12: _PACKING_BAD},
        "bad_calls": [_WINDING + ["1", "1", '"radius"', "-1", '"field"', "0", "0.001", '"square"']],
    },
}
