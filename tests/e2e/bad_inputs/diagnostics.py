# Bad-input cases for CALL_CHECK. Its arguments are passed on whole to the function it explains
# (their own bad values are that function's cases, whose reasons the matrix checks through
# CALL_CHECK); a name that is no function is explained in text, not an error. Only a call
# without the function's name is an error cell.
CASES = {
    "CALL_CHECK": {
        "good": ['"LOOP_BZ"', "0.1", "10", "2", "0", "", "", "", "", "", "", "", "", "", "", ""],
        "text": True,
    },
}
