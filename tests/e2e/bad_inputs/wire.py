# Bad-input cases for wire. Arguments are formula text as a user would type them.
# "material" is a choice: text (copper, aluminium, aluminum, cu, al; any case); numbers are errors.
_MATERIAL_BAD = ['"brass"', '""', '"copper 99"', "0", "1"]
_TEMPERATURE_BAD = ["-101", "401"]   # outside the linear resistance law

CASES = {
    "AWG_DIAMETER": {
        "good": ['"2/0"'],
        "bad": {0: ["57", "-4", "12.5", '"5/0"', '"AWG 10"', '"1/2"']},
        "bad_calls": [],
    },
    "WIRE_AREA": {
        "good": ["0.001"],
        "bad": {0: ["0", "-0.001"]},
        "bad_calls": [["1E200"]],                   # area overflows
    },
    "WIRE_RESISTIVITY": {
        "good": ['"aluminium"', "60"],
        "bad": {0: _MATERIAL_BAD, 1: _TEMPERATURE_BAD},
        "bad_calls": [],
    },
    "WIRE_RESISTANCE": {
        "good": ["0.001", "10", '"Copper"', "60"],
        "bad": {0: ["0", "-0.001"], 1: ["-1"], 2: _MATERIAL_BAD, 3: _TEMPERATURE_BAD},
        "bad_calls": [["1E-200", "1E200", '"copper"', "20"]],   # overflows
    },
    "WIRE_RESISTANCE_PER_M": {
        "good": ["0.001", '"al"', "-20"],
        "bad": {0: ["0", "-0.001"], 1: _MATERIAL_BAD, 2: _TEMPERATURE_BAD},
        "bad_calls": [],
    },
    "WIRE_MASS": {
        "good": ["0.001", "10", '"aluminum"'],
        "bad": {0: ["0", "-0.001"], 1: ["-1"], 2: _MATERIAL_BAD},
        "bad_calls": [["1E150", "1E10", '"copper"']],           # overflows
    },
    "WIRE_DIAMETER_FOR_CURRENT": {
        "good": ["10", "3E6"],
        "bad": {0: ["0"], 1: ["0", "-3E6"]},
        "bad_calls": [],
    },
}
