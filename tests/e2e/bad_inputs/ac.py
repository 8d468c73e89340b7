# Bad-input cases for coils at a frequency (75_ac.toml). Arguments are formula text as typed.
_MATERIAL_BAD = ['"brass"', '""', "0", "1"]
_TEMPERATURE_BAD = ["-101", "401"]   # outside the linear resistance law

CASES = {
    "SKIN_DEPTH": {
        "good": ["1000", '"copper"', "20"],
        "bad": {0: ["0", "-50"], 1: _MATERIAL_BAD, 2: _TEMPERATURE_BAD},
        "bad_calls": [],
    },
    "WIRE_RAC_RATIO": {
        "good": ["0.001", "1E5", '"cu"', "60"],
        "bad": {0: ["0", "-0.001"], 1: ["-1", "-1E5"], 2: _MATERIAL_BAD, 3: _TEMPERATURE_BAD},
        "bad_calls": [["1E300", "1E300", '"copper"', "20"]],     # d / skin depth overflows
    },
    "COIL_RAC_RATIO": {
        "good": ["0.0005", "0.00055", "2E4", "6", "1", '"copper"', "20"],
        "bad": {0: ["0", "-0.0005", "0.0006"],                  # bare thicker than the insulated wire
                1: ["0", "-0.00055"],
                2: ["-1", "-2E4"],                               # negative frequency
                3: ["0", "2.5", "-3"],
                4: ["0", "1.5", "-1", "2"],                      # two strands do not fit in 0.55 mm
                5: _MATERIAL_BAD, 6: _TEMPERATURE_BAD},
        "bad_calls": [],
    },
    "COIL_C_SELF": {
        "good": ["0.02", "0.05", "400", "8", "0.0005", "0.00055", "3.5"],
        "bad": {0: ["0", "-0.02"], 1: ["0", "-0.05"], 2: ["0", "-400", "7"],   # fewer turns than layers
                3: ["0", "2.5", "-1", "20000"], 4: ["0", "-0.0005", "0.00055"], 5: ["0", "0.0004"],
                6: ["0.5", "-3.5"]},
        "bad_calls": [["0.02", "0.01", "40", "1", "0.0005", "0.00055"],          # one layer, l/D < 1
                      ["0.02", "0.5", "40", "1", "0.0005", "0.00055"]],          # one layer, l/D > 5
    },
    "COIL_SRF": {
        "good": ["0.01", "1E-10"],
        "bad": {0: ["0", "-0.01"], 1: ["0", "-1E-10"]},
        "bad_calls": [],
    },
    "COIL_Z": {
        "good": ["10", "0.01", "1000", "1E-10"],
        "bad": {0: ["-10"], 1: ["-0.01"], 2: ["-1000", "1E6"],                  # above the self-resonance
                3: ["-1E-10"]},
        "bad_calls": [],
    },
    "COIL_PHASE": {
        "good": ["10", "0.01", "1000", "1E-10"],
        "bad": {0: ["-10"], 1: ["-0.01"], 2: ["-1000", "1E6"], 3: ["-1E-10"]},
        "bad_calls": [],
    },
    "COIL_VOLTAGE_AC": {
        "good": ["10", "0.01", "1000", "2"],
        "bad": {0: ["-10"], 1: ["-0.01"], 2: ["-1000"]},
        "bad_calls": [["10", "1E300", "1E300", "2"]],                          # reactance overflows
    },
    "RESONANCE_C": {
        "good": ["0.01", "1000"],
        "bad": {0: ["0", "-0.01"], 1: ["0", "-1000"]},                         # zero inductance divides
        "bad_calls": [],
    },
    "RESONANCE_CAP_VOLTAGE": {
        "good": ["2", "0.01", "1000"],
        "bad": {1: ["0", "-0.01"], 2: ["0", "-1000"]},
        "bad_calls": [["1E300", "1E10", "1E10"]],                              # overflows
    },
}
