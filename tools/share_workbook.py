#!/usr/bin/python3
"""Frozen copies of workbooks for colleagues without the add-in.

    /usr/bin/python3 tools/share_workbook.py IN.ods OUT_DIR
    /usr/bin/python3 tools/share_workbook.py --out-dir build/share sheets/*.ods   (several at once)

Each workbook is opened in a private headless LibreOffice with the extension installed, and the
extension's own menu command (Coilwright > Save Frozen Copy for Sharing, written in C++ in
addin/uno/share_command.cpp) writes OUT_DIR/NAME.ods and OUT_DIR/NAME.pdf. The menu and the
command line are one implementation. In the copy every Coilwright formula is replaced by what it
shows (number, text, or a native formula giving the same error code; the formula text goes into
a cell comment), named expressions, conditional formats and validity rules that call Coilwright
refer to frozen values on a sheet "Frozen values", and every number is written with all its
digits. The sheet's own formulas stay live.
"""
import argparse
import pathlib
import sys

import uno

ROOT = pathlib.Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT / "tools"))

from calc_session import CalcSession, props  # noqa: E402,F401  (props: used by callers too)

SHARE_URL = "org.coilwright.share:FrozenCopy"


def share_document(session, doc, out_ods=None):
    """Runs the extension's share command on an open document; returns its report as a dict
    (Copy, Pdf, FrozenCells, FrozenArrays, ErrorCells, FrozenNames, FrozenConditionalFormats,
    FrozenValidations, ExactValues, Warnings, Message). Without out_ods the command writes
    NAME-shared.ods beside the document, as the menu entry does."""
    helper = session.smgr.createInstanceWithContext("com.sun.star.frame.DispatchHelper", session.ctx)
    frame = doc.getCurrentController().getFrame()
    args = {"Silent": True}
    if out_ods is not None:
        args["TargetURL"] = uno.systemPathToFileUrl(str(pathlib.Path(out_ods).resolve()))
    answer = helper.executeDispatch(frame, SHARE_URL, "", 0, props(**args))
    # DispatchHelper hands back the command's DispatchResultEvent; its Result is the report.
    result = getattr(answer, "Result", None)
    report = {p.Name: p.Value for p in result} if result else {}
    if not report.get("Success"):
        raise RuntimeError(report.get("Message", "the share command did not answer: is the extension installed?"))
    return report


def share_workbook(session, path, out_dir):
    """Writes out_dir/NAME.ods and out_dir/NAME.pdf for the workbook at `path`."""
    path = pathlib.Path(path).resolve()
    out_ods = pathlib.Path(out_dir).resolve() / path.name
    if out_ods == path:
        raise RuntimeError(f"{path}: the copy would replace the workbook; choose another output folder")
    doc = session.open_document(path)
    try:
        return share_document(session, doc, out_ods)
    finally:
        doc.close(True)


def main():
    ap = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    ap.add_argument("--oxt", default=str(ROOT / "build" / "coilwright.oxt"))
    ap.add_argument("--out-dir", help="output folder (then every positional argument is a workbook)")
    ap.add_argument("paths", nargs="+", metavar="IN.ods [OUT_DIR]")
    opts = ap.parse_args()
    if opts.out_dir:
        workbooks, out_dir = opts.paths, opts.out_dir
    elif len(opts.paths) == 2:
        workbooks, out_dir = opts.paths[:1], opts.paths[1]
    else:
        ap.error("give IN.ods OUT_DIR, or --out-dir OUT_DIR and the workbooks")
    out_dir = pathlib.Path(out_dir).resolve()
    out_dir.mkdir(parents=True, exist_ok=True)
    failed = 0
    with CalcSession(opts.oxt) as session:
        for wb in workbooks:
            try:
                r = share_workbook(session, wb, out_dir)
            except Exception as e:  # one bad workbook does not stop the others
                print(f"{wb}: {e}", file=sys.stderr)
                failed += 1
                continue
            print(f"{pathlib.Path(wb).name}: froze {r['FrozenCells']} cells ({r['FrozenArrays']} array formulas, "
                  f"{r['ErrorCells']} errors), {r['FrozenNames']} named expressions, "
                  f"{r['FrozenConditionalFormats']} conditional formats, {r['FrozenValidations']} validity rules; "
                  f"{r['ExactValues']} numbers written exactly; wrote {uno.fileUrlToSystemPath(r['Copy'])} and "
                  f"{uno.fileUrlToSystemPath(r['Pdf'])}")
            for w in r["Warnings"]:
                print(f"  warning: {w}")
    sys.exit(1 if failed else 0)


if __name__ == "__main__":
    main()
