# Bad-input cases for coil sets (coils anywhere in space). Arguments are formula text as a user
# would type them; a set is an inline array of 12 columns: shape; centre x; y; z; axis x; y; z;
# radius or width; height; roll; turns; current ('|' between rows). The two rows carry different
# currents, so a 13th column (a circuit number putting both in one series circuit) is an error
# too, as the matrix's "a column too many" variant expects.
GOOD_SET = '{"circle";0;0;-0.05;0;0;1;0.1;0;0;10;1|"rect";0;0;0.05;0;0;1;0.2;0.15;0;10;2}'
RIG_SET = ('{"circle";-0.15;0;0;1;0;0;0.3;0;0;10;1|"circle";0.15;0;0;1;0;0;0.3;0;0;10;2'
           '|"circle";0;-0.12;0;0;1;0;0.25;0;0;10;1|"circle";0;0;-0.1;0;0;1;0.2;0;0;10;1}')
BAD_SETS = [
    '{"circle";0;0;0;0;0;1;0.1;0;0;10}',                        # 11 columns
    '{"circle";0;0;0;0;0;1;0.1;0;0;10;1;1;0;0;1}',              # 16 columns
    '{"circle";0;0;0;0;0;0;0.1;0;0;10;1}',                      # zero axis
    '{"circle";0;0;0;0;0;1;-0.1;0;0;10;1}',                     # negative radius
    '{"circle";0;0;0;0;0;1;0.1;0.2;0;10;1}',                    # a circle with a height
    '{"rect";0;0;0;0;0;1;0.1;0;0;10;1}',                        # a rect without height
    '{"hexagon";0;0;0;0;0;1;0.1;0;0;10;1}',                     # unknown shape
    '{5;0;0;0;0;0;1;0.1;0;0;10;1}',                             # shape is a number
    '{"circle";0;0;0;0;0;1;0.1;0;0;-10;1}',                     # negative turns
    '{"circle";0;0;0;0;0;1;0.1;0;0;10;1;1.5}',                  # fractional circuit number
    '{"circle";0;0;0;0;0;1;0.1;0;0;10;1;1;0.3}',                # winding deeper than the diameter
    '{"circle";0;0;0;0;0;1;0.1;0;0;10;1;1|"circle";0;0;1;0;0;1;0.1;0;0;10;2;1}',  # series, unequal currents
    "5",                                                        # a single value is no set
]
FIELD = {
    "good": [GOOD_SET, "0.01", "0.02", "0.03"],
    "bad": {0: BAD_SETS},
    "bad_calls": [
        ['{"circle";0;0;0;0;0;1;0.1;0;0;10;1}', "0.1", "0", "0"],            # on the circle's wire
        ['{"circle";0;0;0;1;1;1;0.1;0;0;10;1}', "0.1/SQRT(2)", "-0.1/SQRT(2)", "0"],  # on the tilted circle's wire
        ['{"rect";0;0;0;0;0;1;0.2;0.1;0;10;1}', "0.1", "0", "0"],              # on a side of the rect
        ['{"rect";0;0;0;0;0;1;0.2;0.1;0;10;1}', "0.1", "0.05", "0"],           # on a corner
        ['{"rect";0;0;0;0;0;1;0.2;0.1;0;10;1;1;0;0.02}', "0.1", "0", "0.005"], # on a rectangular sheet
        ['{"circle";0;0;0;0;0;1;0.1;0;0;10;1;1;0.02;0}', "0.1", "0", "0"],     # on a flat circular winding
    ],
}
CASES = {
    "SET_BX": FIELD,
    "SET_BY": FIELD,
    "SET_BZ": FIELD,
    "SET_B": FIELD,
    # SET_CHECK explains a bad set as text; only what is not a set at all is an error cell.
    "SET_CHECK": {"good": [GOOD_SET], "bad": {0: ["5"]}, "bad_calls": [], "text": True},
    "SET_CURRENTS": {
        # Two points in a row (x, y, z ranges of one value per point).
        "good": [RIG_SET, "1E-5", "2E-5", "3E-5", "{0;0.01}", "{0;0}", "{0;0}"],
        "bad": {0: BAD_SETS, 4: ["{0;0.01;0.02}"], 5: ["{0}"]},
        "bad_calls": [
            # Two parallel coils cannot make a field across their axis.
            ['{"circle";0;0;-0.05;0;0;1;0.1;0;0;10;1|"circle";0;0;0.05;0;0;1;0.1;0;0;10;2}', "1E-5", "0", "0"],
            # Two circuits with the same field at the point.
            ['{"circle";0;0;-0.05;0;0;1;0.1;0;0;10;1|"circle";0;0;0.05;0;0;1;0.1;0;0;10;1}', "0", "0", "1E-5"],
            # The point on a wire.
            [RIG_SET, "1E-5", "0", "0", "{0.15}", "{0.3}", "{0}"],
        ],
        "shaped": True,
    },
    "SET_UNIFORM_SPHERE": {
        "good": [RIG_SET, "0.01", "0", "0", "0"],
        "bad": {0: BAD_SETS, 1: ["0", "1", "-0.1"]},
        "bad_calls": [
            # No field at the centre of two opposed circles.
            ['{"circle";0;0;-0.05;0;0;1;0.1;0;0;10;1|"circle";0;0;0.05;0;0;1;0.1;0;0;10;-1}', "0.01"],
            [RIG_SET, "0.01", "0.15", "0.3", "0"],   # the centre on a wire
        ],
    },
    "SET_LMATRIX": {
        "good": [GOOD_SET, "0.001"],
        "bad": {0: BAD_SETS, 1: ["0", "-0.001", "0.5"]},
        "bad_calls": [],
        "shaped": True,
    },
    "SET_FORCE": {
        "good": [GOOD_SET, "2", '"z"'],
        "bad": {0: BAD_SETS, 1: ["0", "3", "1.5", "-1"], 2: ['"w"', '""', "4"]},
        "bad_calls": [
            # Two circles whose wires touch: the force is infinite.
            ['{"circle";0;0;0;0;0;1;0.1;0;0;10;1|"circle";0.1;0.05;0;1;0;0;0.05;0;0;10;1}', "1", '"x"'],
        ],
        "table_row_arg": 1,
    },
    "SET_TORQUE": {
        "good": [GOOD_SET, "2", '"x"'],
        "bad": {0: BAD_SETS, 1: ["0", "3", "1.5", "-1"], 2: ['"w"', '""', "4"]},
        "bad_calls": [
            ['{"circle";0;0;0;0;0;1;0.1;0;0;10;1|"circle";0.1;0.05;0;1;0;0;0.05;0;0;10;1}', "1", '"x"'],
        ],
        "table_row_arg": 1,
    },
    "RIG3_COILS": {
        "good": ["1", "50", "1", '"square"'],
        "bad": {0: ["0", "-1"], 1: ["-1"], 2: [], 3: ['"hexagon"', "2"]},
        "bad_calls": [],
        "shaped": True,
        # A coil set: a single cell shows its top-left cell, the text of the first row's shape.
        "text": True,
    },
}
