#!/usr/bin/env python3
"""Fails when a function that the engine's public headers declare has no line in the engine
fuzz harness (tests/fuzz/fuzz_engine.cpp: ENTRY(name, ...)), so a new entry point cannot go
unfuzzed."""
import pathlib
import re
import sys

ROOT = pathlib.Path(__file__).resolve().parents[2]
DECLARATION = re.compile(r"^(?:[A-Za-z_:<>0-9]+(?:\s*[&*])?\s+)+([a-z_][a-z_0-9]*)\(", re.M)


def public_functions():
    names = {}
    for header in sorted((ROOT / "engine/include/coilwright").rglob("*.hpp")):
        text = re.sub(r"//[^\n]*", "", header.read_text(encoding="utf-8"))
        for match in DECLARATION.finditer(text):
            names.setdefault(match.group(1), header.relative_to(ROOT))
    return names


def main():
    harness = (ROOT / "tests/fuzz/fuzz_engine.cpp").read_text(encoding="utf-8")
    covered = set(re.findall(r"ENTRY\(([a-z_0-9]+),", harness))
    declared = public_functions()
    missing = sorted(name for name in declared if name not in covered)
    for name in missing:
        print(f"{declared[name]}: {name} has no ENTRY line in tests/fuzz/fuzz_engine.cpp", file=sys.stderr)
    if missing:
        return 1
    print(f"the engine fuzz harness covers all {len(declared)} public entry points")
    return 0


if __name__ == "__main__":
    sys.exit(main())
