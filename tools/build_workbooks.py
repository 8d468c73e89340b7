#!/usr/bin/python3
"""Builds sheets/NAME.ods from each description sheets/src/NAME.py (or the names given).

Usage: /usr/bin/python3 tools/build_workbooks.py [--oxt build/coilwright.oxt] [NAME ...]
"""
import argparse
import importlib.util
import pathlib
import sys

ROOT = pathlib.Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT / "tools"))

from calc_session import CalcSession  # noqa: E402
from workbook_builder import Book  # noqa: E402


def load_description(path):
    spec = importlib.util.spec_from_file_location(path.stem, path)
    module = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(module)
    return module


def descriptions(names=None):
    paths = sorted((ROOT / "sheets" / "src").glob("*.py"))
    if names:
        paths = [p for p in paths if p.stem in names]
    return paths


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--oxt", default=str(ROOT / "build" / "coilwright.oxt"))
    ap.add_argument("--out-dir", default=str(ROOT / "sheets"))
    ap.add_argument("names", nargs="*")
    opts = ap.parse_args()
    with CalcSession(opts.oxt) as session:
        for path in descriptions(opts.names):
            book = Book(session)
            load_description(path).build(book)
            out = pathlib.Path(opts.out_dir) / f"{path.stem}.ods"
            book.save(out)
            book.close()
            print(f"wrote {out}")


if __name__ == "__main__":
    main()
