# Bad-input cases for coil pairs. Arguments are formula text as a user would type them.
_SHAPE_BAD = {0: ["0", "-0.1"], 1: ["0.05"]}   # inner must be > 0; outer must not be below inner (0.1)

CASES = {
    "HELMHOLTZ_B0": {
        "good": ["0.3", "50", "1"],
        "bad": {0: ["0", "-0.3"], 1: ["-1"]},
        "bad_calls": [["1E-300", "1E300", "1E300"]],   # overflows
    },
    "PAIR_SPACING": {
        "good": ["0.1", "0.12", "0.02"],
        "bad": {**_SHAPE_BAD, 2: ["-0.01"]},
        "bad_calls": [],
    },
    "PAIR_B0": {
        "good": ["0.1", "0.12", "0.02", "100", "2", "0.11"],
        "bad": {**_SHAPE_BAD, 2: ["-0.01"], 3: ["-1"], 5: ["-0.1", "0.01"]},   # 0.01 < length: overlap
        "bad_calls": [],
    },
    "GRADPAIR_SPACING": {
        "good": ["0.1", "0.12", "0.02"],
        "bad": {**_SHAPE_BAD, 2: ["-0.01"]},
        "bad_calls": [],
    },
    "GRADPAIR_GRADIENT": {
        "good": ["0.1", "0.12", "0.02", "100", "2", "0.18"],
        "bad": {**_SHAPE_BAD, 2: ["-0.01"], 3: ["-1"], 5: ["-0.1", "0.01"]},
        "bad_calls": [],
    },
}
