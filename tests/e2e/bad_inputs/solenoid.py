# Bad-input cases for the thin solenoid. Arguments are formula text as a user would type them.
# Order: radius; length; turns; current; z; r. The three components share their arguments.
GOOD = ["0.05", "0.2", "500", "2", "0.03", "0.01"]
BAD = {
    0: ["0", "-0.05"],                 # radius must be > 0
    1: ["0", "-0.2"],                  # length must be > 0
    2: ["-1"],                         # turns must be >= 0
    5: ["-0.01", "0.05"],              # r < 0; r = radius with |z| < length/2: on the sheet
}
CASES = {
    "SOLENOID_BZ": {
        "good": GOOD,
        "bad": BAD,
        "bad_calls": [
            ["0.05", "0.2", "500", "2", "0.1", "0.05"],    # on the rim (z = length/2, r = radius)
            ["0.05", "0.2", "500", "2", "-0.1", "0.05"],   # the other rim
            ["0.05", "0.2", "1E300", "1E300", "0", "0"],   # overflows: an error, not inf
            ["1E-300", "1E300", "1", "1", "0", "0"],       # length over radius beyond 1e308
        ],
    },
    "SOLENOID_BR": {
        "good": GOOD,
        "bad": BAD,
        "bad_calls": [
            ["0.05", "0.2", "500", "2", "0.03"],           # r is required for BR
            ["0.05", "0.2", "500", "2", "0.1", "0.05"],
        ],
    },
    "SOLENOID_B": {
        "good": GOOD,
        "bad": BAD,
        "bad_calls": [["0.05", "0.2", "500", "2", "-0.1", "0.05"]],
    },
}
