# Bad-input cases for winding. Arguments are formula text as a user would type them.
# "packing" is a choice: text (square, hexagonal, hex, orthocyclic; any case); numbers are errors.
_PACKING_BAD = ['"round"', '""', "0", "1"]

CASES = {
    "WINDING_LAYERS": {
        "good": ["0.005", "0.001", '"hexagonal"'],
        "bad": {0: ["-0.001"], 1: ["0", "-0.001"], 2: _PACKING_BAD},
        "bad_calls": [["1", "1E-12", '"square"']],               # 1e12 layers: wrong units
    },
    "WINDING_TURNS_PER_LAYER": {
        "good": ["0.01", "0.001"],
        "bad": {0: ["-0.01"], 1: ["0", "-0.001"]},
        "bad_calls": [["1", "1E-12"]],
    },
    "WINDING_TURNS": {
        "good": ["0.005", "0.01", "0.001", '"square"'],
        "bad": {0: ["-0.001"], 1: ["-0.01"], 2: ["0", "-0.001"], 3: _PACKING_BAD},
        "bad_calls": [["0.005", "0.0012", "0.001", '"hexagonal"']],   # no groove for layer 2
    },
    "WINDING_BUILD": {
        "good": ["25", "0.01", "0.001", '"orthocyclic"'],
        "bad": {0: ["-1", "2.5"], 1: ["0", "-0.01"], 2: ["0", "-0.001"], 3: _PACKING_BAD},
        "bad_calls": [["5", "0.0005", "0.001", '"square"'],        # the wire is longer than the window
                      ["5", "0.0012", "0.001", '"hexagonal"']],
    },
    "WINDING_WIRE_LENGTH": {
        "good": ["0.01", "0.01", "0.001", "25", '"square"'],
        "bad": {0: ["0", "-0.01"], 1: ["0", "-0.01"], 2: ["0", "-0.001"], 3: ["-1", "2.5"], 4: _PACKING_BAD},
        "bad_calls": [["0.01", "0.0005", "0.001", "5", '"square"']],
    },
    "WINDING_FILL": {
        "good": ["50", "0.0009", "0.005", "0.01"],
        "bad": {0: ["-1"], 1: ["0", "-0.0009"], 2: ["0", "-0.005"], 3: ["0", "-0.01"]},
        "bad_calls": [["100", "0.001", "0.005", "0.01"]],           # fill 1.57: cannot fit
    },
    "WINDING_MEAN_TURN": {
        "good": ["0.1", "0.12"],
        "bad": {0: ["0", "-0.1"], 1: ["0", "0.05"]},                # outer below inner
        "bad_calls": [],
    },
    "WINDING_MEAN_TURN_RECT": {
        "good": ["0.5", "0.3", "0.02"],
        "bad": {0: ["0", "-0.5"], 1: ["0", "-0.3"], 2: ["-0.02"]},
        "bad_calls": [],
    },
}
