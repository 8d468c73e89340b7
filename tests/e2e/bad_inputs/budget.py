# Bad-input cases for budget. Arguments are formula text as a user would type them.
# "material" is a choice (copper, aluminium, aluminum, cu, al); "thermalClass" is a choice that
# also takes the class as a number (90, 105, 120, 130, 155, 180, 200, 220, 250 or Y, A, E, B, F,
# H, N, R).
_MATERIAL_BAD = ['"gold"', '""', "0"]
_HOT_GOOD = ["2", "3", "0.05", "25", "10", '"copper"']
_HOT_BAD = {0: ["0", "-2"], 2: ["0", "-0.05"], 3: ["-101", "401"], 4: ["0", "-10"], 5: _MATERIAL_BAD}

CASES = {
    "COIL_RESISTANCE": {
        "good": ["200", "0.5", "0.001", '"copper"', "20"],
        "bad": {0: ["-1"], 1: ["0", "-0.5"], 2: ["0", "-0.001"], 3: _MATERIAL_BAD, 4: ["-150", "450"]},
        "bad_calls": [],
    },
    "COIL_VOLTAGE": {"good": ["2", "3"], "bad": {0: ["-1"]}, "bad_calls": [["1E200", "1E200"]]},
    "COIL_POWER": {"good": ["2", "3"], "bad": {0: ["-1"]}, "bad_calls": [["1E100", "1E200"]]},
    "COIL_CURRENT_DENSITY": {"good": ["2", "0.001"], "bad": {1: ["0", "-0.001"]}, "bad_calls": []},
    "COIL_COOLING_AREA": {
        "good": ["0.08", "0.1", "0.05"],
        "bad": {0: ["0", "-0.08"], 1: ["0", "0.05"], 2: ["-0.05"]},   # outer below inner
        "bad_calls": [],
    },
    "COIL_COOLING_AREA_RECT": {
        "good": ["1", "0.5", "0.01", "0.02"],
        "bad": {0: ["0", "-1"], 1: ["0", "-0.5"], 2: ["0", "-0.01"], 3: ["-0.02"]},
        "bad_calls": [],
    },
    "COIL_TEMPERATURE_RISE": {
        "good": ["20", "0.5", "10"],
        "bad": {0: ["-1"], 1: ["0", "-0.5"], 2: ["0", "-10"]},
        "bad_calls": [],
    },
    "COIL_HOT_TEMPERATURE": {
        "good": _HOT_GOOD, "bad": _HOT_BAD,
        "bad_calls": [["2", "8", "0.05", "25", "10", '"copper"'],      # thermal runaway
                      ["2", "7.9", "0.05", "25", "10", '"copper"']],   # would settle above 400 C
    },
    "COIL_HOT_RESISTANCE": {
        "good": _HOT_GOOD, "bad": _HOT_BAD,
        "bad_calls": [["2", "8", "0.05", "25", "10", '"copper"']],
    },
    "COIL_HOT_TEMPERATURE_AT_VOLTAGE": {
        "good": ["2", "6", "0.05", "25", "10", '"copper"'], "bad": _HOT_BAD,
        "bad_calls": [["2", "1000", "0.05", "25", "10", '"copper"']],  # above 400 C
    },
    "COIL_HOT_RESISTANCE_AT_VOLTAGE": {
        "good": ["2", "6", "0.05", "25", "10", '"al"'], "bad": _HOT_BAD,
        "bad_calls": [["2", "1000", "0.05", "25", "10", '"copper"']],
    },
    "COIL_MAX_CURRENT": {
        "good": ["2", "0.05", "145", "25", "10", '"copper"'],
        "bad": {0: ["0", "-2"], 1: ["0"], 2: ["20", "25", "500"], 3: ["-150"], 4: ["0"], 5: _MATERIAL_BAD},
        "bad_calls": [],
    },
    "INSULATION_CLASS_LIMIT": {
        "good": ['"F"'],
        "bad": {0: ["150", "0", '"G"', '"155 C"', '""']},
        "bad_calls": [],
    },
    "INSULATION_MARGIN": {
        "good": ["155", "120", "10"],
        "bad": {0: ["150", '"G"'], 2: ["-1"]},
        "bad_calls": [],
    },
    "COIL_ENERGY": {"good": ["0.05", "3"], "bad": {0: ["-1"]}, "bad_calls": [["1E300", "1E200"]]},
    "COIL_TIME_CONSTANT": {"good": ["0.05", "2"], "bad": {0: ["-1"], 1: ["0", "-2"]}, "bad_calls": []},
}
