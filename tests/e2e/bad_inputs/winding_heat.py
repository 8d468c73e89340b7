# Bad-input cases for winding_heat (COIL_HOTSPOT_RISE, COIL_TEMPERATURE_AT_TIME,
# COIL_PULSE_TEMPERATURE_RISE). Arguments are formula text as a user would type them.
# "cooled" is a choice (outer, both); "material" a choice (copper, aluminium, aluminum, cu, al).
_MATERIAL_BAD = ['"gold"', '""', "0"]

CASES = {
    "COIL_HOTSPOT_RISE": {
        "good": ["0.02", "0.03", "0.05", "10", "0.7", '"outer"'],
        "bad": {0: ["0", "-0.02"], 1: ["0.02", "0.01"], 2: ["0", "-0.05"], 3: ["-1"], 4: ["0", "-0.7"],
                5: ['"inner"', '""', "0"]},
        "bad_calls": [["0.02", "0.03", "1E-300", "1E300", "1E-300", '"both"']],   # overflows: not a number
    },
    "COIL_TEMPERATURE_AT_TIME": {
        "good": ["2", "3", "0.05", "500", "600", "25", "10", '"copper"'],
        "bad": {0: ["0", "-2"], 2: ["0", "-0.05"], 3: ["0", "-500"], 4: ["-1"], 5: ["-101", "401"],
                6: ["0", "-10"], 7: _MATERIAL_BAD},
        "bad_calls": [["2", "8", "0.05", "500", "100000", "25", "10", '"copper"']],   # runaway past 400 C
    },
    "COIL_PULSE_TEMPERATURE_RISE": {
        "good": ["0.5", "20", "0.3", "40", "60", '"copper"'],
        "bad": {0: ["0", "-0.5"], 2: ["-0.3"], 3: ["0", "-40"], 4: ["-101", "401"], 5: _MATERIAL_BAD},
        "bad_calls": [["0.5", "200", "10", "40", "60", '"copper"']],   # beyond 400 C
    },
}
