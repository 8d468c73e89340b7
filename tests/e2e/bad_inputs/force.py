# Bad-input cases for the force family (idl/functions/95_force.toml). Arguments are formula
# text as a user would type them.
BAD_TABLES = [
    "{0.1;0.12;0.02;0;100}",                 # five columns
    "{0;0.12;0.02;0;100;1}",                 # inner radius 0
    "{0.2;0.12;0.02;0;100;1}",               # outer < inner
    "{0.1;0.12;-0.02;0;100;1}",              # negative length
    "{0.1;0.12;0.02;0;-100;1}",              # negative turns
    '{0.1;0.12;0.02;0;"x";1}',               # text in the table
    "{0.1;0.1;0;0;5;1|0.1;0.1;0;0;5;1}",     # two coincident loops (row 1's force is infinite)
]

CASES = {
    "LOOP_FZ": {
        "good": ["0.1", "10", "2", "0.12", "5", "1", "0.04"],
        "bad": {0: ["0", "-0.1"], 1: ["-10"], 3: ["0", "-0.12"], 4: ["-5"]},
        "bad_calls": [["0.1", "10", "2", "0.1", "5", "1", "0"]],  # coincident loops
    },
    "COIL_FZ": {
        "good": ["0.1", "0.12", "0.02", "100", "1", "0.1", "0.12", "0.02", "100", "1", "0.05"],
        "bad": {0: ["0", "-0.1"], 1: ["0.05"], 2: ["-0.02"], 3: ["-100"], 5: ["0", "-0.1"], 6: ["0.05"],
                7: ["-0.02"], 8: ["-100"]},
        "bad_calls": [["0.1", "0.1", "0", "1", "1", "0.1", "0.1", "0.2", "1", "1", "0.1"]],  # loop on a sheet's end
    },
    "STACK_FZ": {
        "good": ["{0.1;0.12;0.02;-0.05;100;1|0.1;0.12;0.02;0.05;100;-1}"],
        "bad": {0: BAD_TABLES},
        "bad_calls": [],
    },
    "SOLENOID_PRESSURE": {
        "good": ["0.02", "0.1", "200", "3"],
        "bad": {0: ["0", "-0.02"], 1: ["0", "-0.1"], 2: ["-200"]},
        "bad_calls": [["0.02", "0.1", "200", "1E200"]],  # overflows
    },
}
