# Bad-input cases for the thick coil. Arguments are formula text as a user would type them.
# Order: inner; outer; length; turns; current; z; r. Points inside the winding are valid (finite).
# The three components share their arguments.
GOOD = ["0.05", "0.08", "0.1", "800", "3", "0.01", "0.06"]
BAD = {
    0: ["0", "-0.05"],                 # inner radius must be > 0
    1: ["0.04", "-0.08"],              # outer radius must be >= inner radius
    2: ["0", "-0.1"],                  # length must be > 0
    3: ["-1"],                         # turns must be >= 0
    6: ["-0.01"],                      # r < 0
}
CASES = {
    "COIL_BZ": {
        "good": GOOD,
        "bad": BAD,
        "bad_calls": [
            ["0.05", "0.05", "0.1", "800", "3", "0", "0.05"],   # inner = outer: a sheet, and the point is on it
            ["0.05", "0.08", "0.1", "1E300", "1E300", "0", "0.06"],  # overflows: an error, not inf
        ],
    },
    "COIL_BR": {
        "good": GOOD,
        "bad": BAD,
        "bad_calls": [["0.05", "0.08", "0.1", "800", "3", "0.01"]],   # r is required for BR
    },
    "COIL_B": {
        "good": GOOD,
        "bad": BAD,
        "bad_calls": [["0.05", "0.05", "0.1", "800", "3", "0.05", "0.05"]],   # sheet rim
    },
}
