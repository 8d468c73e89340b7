# Bad-input cases for regions and inverse design. Arguments are formula text as a user would type them.
_PAIR = "{0.3;0.3;0;-0.15;50;1|0.3;0.3;0;0.15;50;1}"
_GRAD = "{0.1;0.1;0;-0.0866;10;-1|0.1;0.1;0;0.0866;10;1}"
_BAD_TABLES = ["{0.3;0.3;0;-0.15;50}", "{0.3;0.2;0;0;1;1}", "{-0.3;0.3;0;0;1;1}", '{0.3;0.3;0;0;"x";1}']

CASES = {
    "STACK_DBZDZ": {
        "good": [_GRAD, "0.01", "0.02"],
        "bad": {0: _BAD_TABLES, 2: ["-0.01"]},
        "bad_calls": [[_PAIR, "0.15", "0.3"]],            # on a loop
    },
    "STACK_UNIFORM_R": {
        "good": [_PAIR, "0.001", "0"],
        "bad": {0: _BAD_TABLES, 1: ["0", "1", "-0.001"]},
        "bad_calls": [["{0.3;0.3;0;-0.15;50;1|0.3;0.3;0;0.15;50;-1}", "0.001", "0"]],   # B0 = 0
    },
    "STACK_UNIFORM_SPHERE": {
        "good": [_PAIR, "0.001", "0"],
        "bad": {0: _BAD_TABLES, 1: ["0", "1", "-0.001"]},
        "bad_calls": [["{0.3;0.3;0;-0.15;50;1|0.3;0.3;0;0.15;50;-1}", "0.001", "0"]],
    },
    "STACK_SCALE_FOR_BZ": {
        "good": [_PAIR, "1E-4", "0", "0.05"],
        "bad": {0: _BAD_TABLES, 3: ["-0.05"]},
        "bad_calls": [[_GRAD, "1E-4", "0", "0"], [_PAIR, "1E-4", "0.15", "0.3"]],   # no field there; on a loop
    },
    "STACK_SCALE_FOR_GRADIENT": {
        "good": [_GRAD, "0.5", "0", "0"],
        "bad": {0: _BAD_TABLES, 3: ["-0.05"]},
        "bad_calls": [[_PAIR, "0.5", "0", "0"]],           # a Helmholtz pair has no gradient at its centre
    },
}
