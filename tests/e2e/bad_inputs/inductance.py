# Bad-input cases for the inductance family (idl/functions/90_inductance.toml). Arguments are
# formula text as a user would type them.
TABLE = "{0.1;0.12;0.02;-0.05;100;1|0.1;0.12;0.02;0.05;100;-1}"
LOOP_FIRST = "{0.1;0.1;0;0;5;1|0.1;0.12;0.02;0.05;100;1}"  # row 1 is a loop
BAD_TABLES = [
    "{0.1;0.12;0.02;0;100}",                 # five columns
    "{0;0.12;0.02;0;100;1}",                 # inner radius 0
    "{0.2;0.12;0.02;0;100;1}",               # outer < inner
    "{0.1;0.12;-0.02;0;100;1}",              # negative length
    "{0.1;0.12;0.02;0;-100;1}",              # negative turns
    '{0.1;0.12;0.02;0;"x";1}',               # text in the table
]
COINCIDENT_LOOPS = "{0.1;0.1;0;0;5;1|0.1;0.1;0;0;5;1}"  # their mutual inductance is infinite

CASES = {
    "SOLENOID_L": {
        "good": ["0.02", "0.1", "200"],
        "bad": {0: ["0", "-0.02"], 1: ["0", "-0.1"], 2: ["-1"]},
        "bad_calls": [["1E200", "1E-200", "1E100"]],  # overflows: an error, not inf
    },
    "LOOP_M": {
        "good": ["0.1", "0.12", "0.05"],
        "bad": {0: ["0", "-0.1"], 1: ["0", "-0.12"]},
        "bad_calls": [["0.1", "0.1", "0"]],  # coincident circles
    },
    "LOOP_L": {
        "good": ["0.1", "0.001", "10"],
        "bad": {0: ["0", "-0.1"], 1: ["0", "-0.001", "0.11"], 2: ["-1"]},
        "bad_calls": [],
    },
    "LOOP_K": {
        "good": ["0.1", "0.001", "0.12", "0.002", "0.05"],
        "bad": {0: ["0", "-0.1"], 1: ["0", "-0.001", "0.2"], 2: ["0", "-0.12"], 3: ["0", "0.2"]},
        "bad_calls": [["0.1", "0.001", "0.1", "0.001", "0"]],  # coincident loops
    },
    "COIL_L": {
        "good": ["0.1", "0.12", "0.02", "100"],
        "bad": {0: ["0", "-0.1"], 1: ["0.05", "-0.12"], 2: ["-0.02"], 3: ["-100"]},
        "bad_calls": [["0.1", "0.1", "0", "10"]],  # a loop: needs LOOP_L and a wire diameter
    },
    "COIL_M": {
        "good": ["0.1", "0.12", "0.02", "100", "0.05", "0.07", "0.01", "20", "0.03"],
        "bad": {0: ["0", "-0.1"], 1: ["0.05"], 2: ["-0.02"], 3: ["-100"], 4: ["0", "-0.05"], 5: ["0.01"],
                6: ["-0.01"], 7: ["-20"]},
        "bad_calls": [["0.1", "0.1", "0", "1", "0.1", "0.1", "0", "1", "0"]],  # coincident loops
    },
    "COIL_K": {
        "good": ["0.1", "0.12", "0.02", "0.05", "0.07", "0.01", "0.03"],
        "bad": {0: ["0", "-0.1"], 1: ["0.05"], 2: ["-0.02"], 3: ["0"], 4: ["0.01"], 5: ["-0.01"]},
        "bad_calls": [["0.1", "0.1", "0", "0.05", "0.07", "0.01", "0.03"]],  # coil 1 is a loop
    },
    "STACK_LMATRIX": {
        "good": [TABLE, "0.001"],
        "bad": {0: BAD_TABLES, 1: ["-0.001"]},
        # The loop's diagonal cell (top left) without a diameter. (Coincident loops give error
        # cells off the diagonal, not in the top-left cell a single-cell formula shows.)
        "bad_calls": [[LOOP_FIRST, "0"]],
        "shaped": True,   # an n x n result of its own shape: single values besides the table
    },
    "STACK_L": {
        "good": [TABLE, "0.001"],
        "bad": {0: BAD_TABLES + [COINCIDENT_LOOPS, "{0.1;0.12;0.02;0;100;0}"], 1: ["-0.001"]},  # no current
        "bad_calls": [[LOOP_FIRST, "0"]],
    },
    "STACK_ENERGY": {
        "good": [TABLE, "0.001"],
        "bad": {0: BAD_TABLES + [COINCIDENT_LOOPS], 1: ["-0.001"]},
        "bad_calls": [[LOOP_FIRST, "0"]],
    },
}
