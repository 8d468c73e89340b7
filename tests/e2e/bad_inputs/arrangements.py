# Bad-input cases for ready-made coil tables. Arguments are formula text as a user would type them.
CASES = {
    "PAIR_COILS": {
        "good": ["0.2", "0.22", "0.02", "100", "1"],
        "bad": {0: ["0", "-0.2"], 1: ["0.1"], 2: ["-0.01"], 3: ["-1"]},
        "bad_calls": [],
        "shaped": True,
    },
    "GRADPAIR_COILS": {
        "good": ["0.2", "0.22", "0.02", "100", "1"],
        "bad": {0: ["0", "-0.2"], 1: ["0.1"], 2: ["-0.01"], 3: ["-1"]},
        "bad_calls": [],
        "shaped": True,
    },
    "MAXWELL_COILS": {
        "good": ["0.5", "64", "1"],
        "bad": {0: ["0", "-0.5"], 1: ["-1"]},
        "bad_calls": [],
        "shaped": True,
    },
}
