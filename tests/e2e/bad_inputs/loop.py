# Bad-input cases for the loop field (LOOP_*). Arguments are formula text as a user would type them.
# The runner (tests/e2e/test_bad_input_matrix.py) adds the generic bad values for every argument:
# text, a number as text, the argument left out, an error from another cell, 1E308*10, SQRT(-1).
_SUBNORMAL = "1E-300*1E-10"  # Calc refuses to parse 1E-310 but computes it; it carries < 53 bits

_ARGS = {
    0: ["0", "-0.1", "-1E-300", _SUBNORMAL,
        "1E308"],                       # radius 1e308 m: the field underflows below 2.2e-308
    1: ["-1", "-1E-300", _SUBNORMAL],   # turns
    2: [_SUBNORMAL, "-" + _SUBNORMAL],  # current: any sign and size, but not subnormal
    3: ["1E308", "-1E308", _SUBNORMAL],  # z: 1e309 radii away is beyond double precision
    4: ["-0.01", "-1E-300", "1E308", _SUBNORMAL],  # r
}

_CALLS = [
    ["0.1", "10", "2", "0", "0.1"],      # on the filament
    ["0.1", "10", "2", "-0", "0.1"],
    ["2E23", "1", "1", "1E-300", "2E23"],  # distance from the wire underflows (used to hang Calc)
    ["1", "1", "1", "1E-300", "1"],      # 1e-300 radii from the wire: the field overflows
    ["0.1", "1E10", "1E308", "0", "0.05"],  # the result overflows
    ["1E308", "10", "2", "0", "0"],      # the result underflows
    ["1E-300", "1", "1", "0", "1E10"],   # r / radius overflows
]

CASES = {
    name: {"good": ["0.1", "10", "2", "0.05", "0.02"], "bad": _ARGS, "bad_calls": _CALLS}
    for name in ("LOOP_BZ", "LOOP_BR", "LOOP_B")
}
