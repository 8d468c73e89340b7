#!/usr/bin/env python3
"""Every heat, shock, energy, force and exposure function carries its caution in its help.

The catalogue's summary of a function is its Function Wizard help and its README row, so the
caution reaches the user wherever the function is looked up. Each hazard category lists its
functions and the words its caution must hold; a function named here that the catalogue lacks,
or a help without a "Caution:" sentence with those words, fails. A new function of a hazard kind
belongs in its list (a second check names every COIL_*TEMPERATURE*/ENERGY/_FZ function found in
the catalogue that no list covers).
"""
import pathlib
import re
import sys

ROOT = pathlib.Path(__file__).resolve().parents[2]
sys.path.insert(0, str(ROOT / "tools"))

from catalogue import load  # noqa: E402

# category: (functions, words the caution sentence must contain)
HAZARDS = {
    "hot surfaces": (["COIL_POWER", "COIL_TEMPERATURE_RISE", "COIL_HOT_TEMPERATURE", "COIL_HOT_RESISTANCE",
                      "COIL_HOT_TEMPERATURE_AT_VOLTAGE", "COIL_HOT_RESISTANCE_AT_VOLTAGE", "COIL_MAX_CURRENT",
                      "INSULATION_MARGIN", "COIL_HOTSPOT_RISE", "COIL_TEMPERATURE_AT_TIME",
                      "COIL_PULSE_TEMPERATURE_RISE"], ["hot"]),
    "shock from the supply": (["COIL_VOLTAGE", "COIL_VOLTAGE_AC", "RESONANCE_CAP_VOLTAGE"], ["shock"]),
    "stored energy and flyback": (["COIL_ENERGY", "STACK_ENERGY", "COIL_TIME_CONSTANT"],
                                  ["flyback", "clamp", "insulation", "voltage rating"]),
    "forces, loose ferromagnetic objects, hands": (["LOOP_FZ", "COIL_FZ", "STACK_FZ", "SOLENOID_PRESSURE",
                                                    "SET_FORCE", "SET_TORQUE"], ["ferromagnetic", "hands", "bore"]),
    "exposure of people and implants": (["LOOP_B", "SOLENOID_B", "COIL_B", "STACK_B", "RECT_B", "RECTPAIR_B",
                                         "SET_B"], ["exposure", "implant", "standard that applies at the site"]),
}
# Names that are hazard functions by their kind: a new one must be put in a list above.
HAZARD_NAME = re.compile(r"(TEMPERATURE|HOTSPOT|ENERGY|_FZ$|_FORCE$|_TORQUE$|PRESSURE|VOLTAGE)")


def caution_of(summary):
    """The text from "Caution:" to the end of the summary, or None."""
    at = summary.find("Caution:")
    return None if at < 0 else summary[at:]


def problems(functions):
    by_name = {fn["name"]: fn for fn in functions}
    found = []
    listed = set()
    for category, (names, words) in HAZARDS.items():
        for name in names:
            listed.add(name)
            if name not in by_name:
                found.append(f"{name} ({category}): not in the catalogue")
                continue
            caution = caution_of(by_name[name]["summary"])
            if caution is None:
                found.append(f"{name} ({category}): no 'Caution:' sentence in its help")
                continue
            missing = [w for w in words if w not in caution.lower()]
            if missing:
                found.append(f"{name} ({category}): its caution lacks {missing}")
    for name in by_name:
        if HAZARD_NAME.search(name) and name not in listed:
            found.append(f"{name}: a hazard function by its name, in no caution list")
    return found


def main():
    found = problems(load(ROOT / "idl")["function"])
    # The check can fail: a made-up catalogue without cautions fails every listed function.
    bare = [{"name": n, "summary": "no caution"} for names, _ in HAZARDS.values() for n in names]
    assert len(problems(bare)) == len(bare), "the check must catch a help without its caution"
    for line in found:
        print(line, file=sys.stderr)
    print(f"{sum(len(n) for n, _ in HAZARDS.values())} hazard functions checked, {len(found)} problems")
    return 1 if found else 0


if __name__ == "__main__":
    sys.exit(main())
