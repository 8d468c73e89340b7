# Bad-input cases for tolerance sensitivity. Arguments are formula text as a user would type them.
_PAIR = "{0.3;0.3;0;-0.15;50;1|0.3;0.3;0;0.15;50;1}"

CASES = {
    "STACK_SENSITIVITY": {
        "good": [_PAIR, "2", '"position"', '"uniform"', "0", "0.001"],
        "bad": {0: ["{0.3;0.3;0;-0.15;50}", "{0.3;0.2;0;0;1;1}"],
                1: ["0", "3", "1.5", "-1"],
                2: ['"diameter"', '""', "2"],
                3: ['"both"'],
                5: ["0", "1"]},
        "bad_calls": [[_PAIR, "1", '"inner"', '"field"', "0", "0.001"]],   # a loop has no separate inner radius
        # The row argument counts rows by position in the range, blank rows included.
        "table_row_arg": 1,
    },
}
