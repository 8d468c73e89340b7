# Bad-input cases for the axis of a coil table. Arguments are formula text as a user would type them.
_PAIR = "{0.3;0.3;0;-0.15;50;1|0.3;0.3;0;0.15;50;1}"
_BAD_TABLES = ["{0.3;0.3;0;-0.15;50}",            # five columns
               "{-0.3;0.3;0;0;1;1}",              # negative inner radius
               "{0.3;0.2;0;0;1;1}",               # outer below inner
               "{0.3;0.3;-0.1;0;1;1}",            # negative length
               "{0.3;0.3;0;0;-1;1}",              # negative turns
               '{0.3;0.3;0;0;"x";1}']             # text in a row

CASES = {
    "STACK_DNBZ": {
        "good": [_PAIR, "2", "0.01"],
        "bad": {0: _BAD_TABLES, 1: ["13", "-1", "2.5"]},
        "bad_calls": [],
    },
    "STACK_UNIFORM_Z": {
        "good": [_PAIR, "0.001", "0"],
        "bad": {0: _BAD_TABLES, 1: ["0", "1", "-0.01", "2"]},
        "bad_calls": [["{0.3;0.3;0;-0.15;50;1|0.3;0.3;0;0.15;50;-1}", "0.001", "0"]],   # B0 = 0
    },
    "STACK_LINEAR_Z": {
        "good": ["{0.1;0.1;0;-0.0866;10;-1|0.1;0.1;0;0.0866;10;1}", "0.01", "0"],
        "bad": {0: _BAD_TABLES, 1: ["0", "1", "-0.01"]},
        "bad_calls": [[_PAIR, "0.01", "0"]],     # a Helmholtz pair has no gradient at its centre
    },
}
