# Bad-input cases for rect. Arguments are formula text as a user would type them.
_LOOP_GOOD = ["0.6", "0.4", "25", "1.2", "0.1", "0.05", "0.2"]
_LOOP_BAD = {
    0: ["0", "-0.6"],       # width
    1: ["0", "-0.4"],       # height
    2: ["-1"],              # turns
}
_LOOP_BAD_CALLS = [
    ["0.6", "0.4", "25", "1.2", "0.1", "-0.2", "0"],     # on the side y = -h/2
    ["0.6", "0.4", "25", "1.2", "0.3", "0.2", "0"],      # on a corner
    ["0.6", "0.4", "25", "1.2", "-0.3", "0", "0"],       # on the side x = -w/2
    ["1E-300", "1E-300", "1E300", "1E300", "0", "0", "0"],  # overflows: an error, not inf
]
_PAIR_GOOD = ["0.6", "0.4", "0.3", "25", "1.2", "0.1", "0.05", "0.2"]
_PAIR_BAD = {
    0: ["0", "-0.6"],
    1: ["0", "-0.4"],
    2: ["0", "-0.3"],       # spacing
    3: ["-1"],
}
_PAIR_BAD_CALLS = [
    ["0.6", "0.4", "0.3", "25", "1.2", "0.1", "-0.2", "0.15"],   # on the upper loop's side
    ["0.6", "0.4", "0.3", "25", "1.2", "0.3", "0.2", "-0.15"],   # on the lower loop's corner
]

CASES = {
    **{name: {"good": _LOOP_GOOD, "bad": _LOOP_BAD, "bad_calls": _LOOP_BAD_CALLS}
       for name in ("RECT_BX", "RECT_BY", "RECT_BZ", "RECT_B")},
    **{name: {"good": _PAIR_GOOD, "bad": _PAIR_BAD, "bad_calls": _PAIR_BAD_CALLS}
       for name in ("RECTPAIR_BX", "RECTPAIR_BY", "RECTPAIR_BZ", "RECTPAIR_B")},
    "RECTPAIR_SPACING": {
        "good": ["0.6", "0.4"],
        "bad": {0: ["0", "-0.6"], 1: ["0", "-0.4"]},
        "bad_calls": [],
    },
}
