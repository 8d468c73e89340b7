"""A private headless LibreOffice with the Coilwright extension installed, driven over UNO.

Used by the end-to-end tests, the Calc benchmarks, the demo run and the workbook tools.
Everything lives in a temporary folder (profile and shared-extension cache), so the system's
LibreOffice and the user's own profile are never touched. Needs Debian's /usr/bin/python3
(python3-uno).
"""
import os
import pathlib
import shutil
import subprocess
import tempfile
import time

import uno  # noqa: F401  (registers the com.sun.star import hook)
from com.sun.star.beans import PropertyValue
from com.sun.star.connection import NoConnectException


def props(**kw):
    out = []
    for k, v in kw.items():
        p = PropertyValue()
        p.Name, p.Value = k, v
        out.append(p)
    return tuple(out)


def used_cells(doc):
    """(sheet, cell) for every cell of each sheet's used area, row by row."""
    for sheet in doc.Sheets:
        cursor = sheet.createCursor()
        cursor.gotoEndOfUsedArea(False)
        end = cursor.getRangeAddress()
        for row in range(end.EndRow + 1):
            for col in range(end.EndColumn + 1):
                yield sheet, sheet.getCellByPosition(col, row)


def cell_name(cell):
    """The cell's address within its sheet, e.g. B4."""
    return cell.AbsoluteName.split(".")[-1].replace("$", "")


class CalcSession:
    def __init__(self, oxt=None, keep_dir=False, timeout=60, directory=None):
        # directory: use (and keep) the profile and shared-extension cache already in it.
        self.dir = pathlib.Path(directory) if directory else pathlib.Path(tempfile.mkdtemp(prefix="coilwright-lo-"))
        self.keep_dir = keep_dir or directory is not None
        self.env = [f"-env:UserInstallation=file://{self.dir}/profile",
                    f"-env:UNO_SHARED_PACKAGES_CACHE=file://{self.dir}/shared"]
        if oxt:
            subprocess.run(["unopkg", "add", "--shared", "-f", "--suppress-license", *self.env, str(oxt)],
                           check=True, stdout=subprocess.DEVNULL, stderr=subprocess.PIPE, timeout=timeout)
        self.pipe = f"coilwright_{os.getpid()}_{int(time.time() * 1000) % 100000}"
        self.proc = subprocess.Popen(
            ["soffice", "--headless", "--invisible", "--norestore", "--nologo", "--nodefault",
             "--nolockcheck", f"--accept=pipe,name={self.pipe};urp;", *self.env],
            stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL)
        local = uno.getComponentContext()
        resolver = local.ServiceManager.createInstanceWithContext("com.sun.star.bridge.UnoUrlResolver", local)
        deadline = time.time() + timeout
        while True:
            try:
                self.ctx = resolver.resolve(f"uno:pipe,name={self.pipe};urp;StarOffice.ComponentContext")
                break
            except NoConnectException:
                if time.time() > deadline or self.proc.poll() is not None:
                    self.close()
                    raise RuntimeError("LibreOffice did not start")
                time.sleep(0.2)
        self.smgr = self.ctx.ServiceManager
        self.desktop = self.smgr.createInstanceWithContext("com.sun.star.frame.Desktop", self.ctx)

    def alive(self):
        if self.proc.poll() is not None:
            return False
        try:
            self.desktop.getComponents()
            return True
        except Exception:
            return False

    def soffice_pid(self):
        """The soffice.bin process under the launcher (the launcher may be it), or None."""
        todo = [self.proc.pid]
        while todo:
            pid = todo.pop()
            try:
                if pathlib.Path(f"/proc/{pid}/comm").read_text().strip() == "soffice.bin":
                    return pid
                for task in pathlib.Path(f"/proc/{pid}/task").iterdir():
                    todo += [int(c) for c in (task / "children").read_text().split()]
            except OSError:
                pass
        return None

    def new_document(self):
        return self.desktop.loadComponentFromURL("private:factory/scalc", "_blank", 0, props(Hidden=True))

    def open_document(self, path):
        url = uno.systemPathToFileUrl(str(pathlib.Path(path).resolve()))
        return self.desktop.loadComponentFromURL(url, "_blank", 0, props(Hidden=True))

    def close(self):
        office = self.soffice_pid() if getattr(self, "proc", None) is not None else None
        try:
            if getattr(self, "desktop", None) is not None:
                self.desktop.terminate()
        except Exception:
            pass  # the bridge drops when soffice quits
        try:
            self.proc.wait(timeout=30)
        except subprocess.TimeoutExpired:
            self.proc.kill()
            self.proc.wait()
        # A LibreOffice that refused to terminate (after running out of memory, say) outlives its
        # launcher: end it too, or it stays behind with its memory.
        if office is not None and office != self.proc.pid:
            deadline = time.time() + 10
            while pathlib.Path(f"/proc/{office}").exists() and time.time() < deadline:
                time.sleep(0.2)
            try:  # only if it is still this session's LibreOffice (its profile is ours)
                if str(self.dir) in pathlib.Path(f"/proc/{office}/cmdline").read_text(errors="replace"):
                    os.kill(office, 9)
            except OSError:
                pass  # already gone
        if not self.keep_dir:
            shutil.rmtree(self.dir, ignore_errors=True)

    def __enter__(self):
        return self

    def __exit__(self, *exc):
        self.close()
