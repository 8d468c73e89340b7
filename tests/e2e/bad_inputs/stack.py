# Bad-input cases for coil tables. Arguments are formula text as a user would type them; a table
# is an inline array of 6 columns: inner; outer; length; centre z; turns; current ('|' between rows).
GOOD_TABLE = "{0.1;0.1;0;-0.05;10;1|0.1;0.1;0;0.05;10;1|0.05;0.06;0.02;0;100;2}"
BAD_TABLES = [
    "{0.1;0.1;0;0;10}",                                   # 5 columns
    "{0.1;0.1;0;0;10;1;7}",                               # 7 columns
    "{0.2;0.1;0;0;10;1}",                                 # outer < inner
    "{0;0;0;0;10;1}",                                     # radius 0
    "{0.1;0.1;-0.1;0;10;1}",                              # negative length
    "{0.1;0.1;0;0;-10;1}",                                # negative turns
    '{0.1;0.1;0;0;"ten";1}',                              # text in a row
    "{0.1;0.1;0;0;10;1|0.2;0.1;0;0;10;1}",                # second row bad
    "5",                                                  # a single value is no table
]
CASES = {
    "STACK_BZ": {
        "good": [GOOD_TABLE, "0.01", "0.02"],
        "bad": {0: BAD_TABLES, 2: ["-0.01"]},
        "bad_calls": [
            ["{0.1;0.1;0.2;0;10;1}", "0", "0.1"],         # on a thin solenoid row's sheet
            ["{0.05;0.08;0;0;10;1}", "0", "0.06"],         # on a flat spiral row's winding
            ["{0.1;0.1;0;0.3;10;1}", "0.3", "0.1"],        # on a loop row's wire
        ],
    },
    "STACK_BR": {
        "good": [GOOD_TABLE, "0.01", "0.02"],
        "bad": {0: BAD_TABLES, 2: ["-0.01"]},
        "bad_calls": [[GOOD_TABLE, "0.01"]],               # r is required for BR
    },
    "STACK_B": {
        "good": [GOOD_TABLE, "0.01", "0.02"],
        "bad": {0: BAD_TABLES, 2: ["-0.01"]},
        "bad_calls": [["{0.1;0.1;0;0;10;1}", "0", "0.1"]],
    },
    # STACK_CHECK explains a bad table as text (that is its job), so only what is not a table at
    # all is an error cell; the runner's generic variants (text, omitted, error values) cover it.
    "STACK_CHECK": {
        "good": [GOOD_TABLE],
        "bad": {0: ["5"]},
        "bad_calls": [],
        "text": True,
    },
}
