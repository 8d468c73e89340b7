"""tools/install_extension.sh in every mix of a copy for every user ("shared") and a copy of
one's own, in temporary profiles (-env:UserInstallation, -env:UNO_SHARED_PACKAGES_CACHE through
the script's UNOPKG_ENV), each checked in a LibreOffice started on that profile: which copy's
library Calc actually loads when it computes a cell.

LibreOffice 7.4 does this on its own: with a shared copy installed, a copy of one's own added,
removed and added again stays inactive ("Insert duplicate implementation name") and Calc keeps
using the shared copy without a word. The script must never leave that state silently.

unopkg refuses per-user work as root, so as root the per-user steps run as the user "nobody".
"""
import os
import pathlib
import shutil
import subprocess
import tempfile
import unittest
import zipfile

from calc_session import CalcSession
from e2e_support import OXT

SCRIPT = pathlib.Path(__file__).resolve().parents[2] / "tools" / "install_extension.sh"
AS_ROOT = os.geteuid() == 0
PER_USER = "nobody"


def with_version(source, target, version):
    """A copy of the .oxt whose description.xml names another version (to tell copies apart)."""
    with zipfile.ZipFile(source) as zin, zipfile.ZipFile(target, "w", zipfile.ZIP_DEFLATED) as zout:
        for item in zin.infolist():
            data = zin.read(item.filename)
            if item.filename == "description.xml":
                text = data.decode()
                start = text.index('<version value="') + len('<version value="')
                data = (text[:start] + version + text[text.index('"', start):]).encode()
            zout.writestr(item, data)
    os.chmod(target, 0o644)


class InstallMixes(unittest.TestCase):
    @classmethod
    def setUpClass(cls):
        cls.files = pathlib.Path(tempfile.mkdtemp(prefix="coilwright-install-files-"))
        os.chmod(cls.files, 0o755)
        cls.old, cls.new = cls.files / "old.oxt", cls.files / "new.oxt"
        with_version(OXT, cls.old, "0.0.1")
        with_version(OXT, cls.new, "0.0.2")

    @classmethod
    def tearDownClass(cls):
        shutil.rmtree(cls.files, ignore_errors=True)

    def setUp(self):
        self.dir = pathlib.Path(tempfile.mkdtemp(prefix="coilwright-install-"))
        os.chmod(self.dir, 0o755)
        (self.dir / "profile").mkdir(mode=0o777)
        (self.dir / "shared").mkdir(mode=0o755)
        os.chmod(self.dir / "profile", 0o777)
        self.env = (f"-env:UserInstallation=file://{self.dir}/profile "
                    f"-env:UNO_SHARED_PACKAGES_CACHE=file://{self.dir}/shared")

    def tearDown(self):
        shutil.rmtree(self.dir, ignore_errors=True)

    # --- running things as the user and as the administrator ----------------------------------
    def as_user(self, argv, **extra_env):
        env = {"UNOPKG_ENV": self.env, "HOME": str(self.dir / "profile"), **extra_env}
        prefix = ["runuser", "-u", PER_USER, "--"] if AS_ROOT else []
        return subprocess.run(prefix + ["env", *(f"{k}={v}" for k, v in env.items()), *argv],
                              capture_output=True, text=True, timeout=300)

    def as_admin(self, argv, **extra_env):
        env = dict(os.environ, UNOPKG_ENV=self.env, **extra_env)
        return subprocess.run(argv, capture_output=True, text=True, timeout=300, env=env)

    def script_user(self, *args):
        return self.as_user(["sh", str(SCRIPT), *map(str, args)])

    def script_admin(self, *args, **extra_env):
        return self.as_admin(["sh", str(SCRIPT), "--shared", *map(str, args)], **extra_env)

    def unopkg_user(self, *args):
        return self.as_user(["unopkg", *args, *self.env.split()])

    def unopkg_admin(self, *args):
        return self.as_admin(["unopkg", *args, "--shared", *self.env.split()])

    def copy_in_use(self):
        """("own" or "shared", file name) of the library Calc loads on this profile."""
        session = CalcSession(directory=self.dir)
        try:
            doc = session.new_document()
            cell = doc.Sheets.getByIndex(0).getCellByPosition(0, 0)
            cell.setFormula("=LOOP_BZ(0.1;10;2;0)")
            self.assertEqual(cell.getError(), 0, "Coilwright is not active at all")
            maps = pathlib.Path(f"/proc/{session.soffice_pid()}/maps").read_text()
            libs = {line.split()[-1] for line in maps.splitlines() if line.endswith("coilwright.uno.so")}
            doc.close(True)
        finally:
            session.close()
            if AS_ROOT:  # LibreOffice ran as root on the user's profile: give it back
                subprocess.run(["chmod", "-R", "a+rwX", str(self.dir / "profile")], check=True)
        self.assertEqual(len(libs), 1, f"libraries loaded: {libs}")
        path = libs.pop()
        scope = "own" if f"{self.dir}/profile/" in path else "shared" if f"{self.dir}/shared/" in path else path
        return scope, pathlib.Path(path).parent.name

    def assert_ok(self, result):
        self.assertEqual(result.returncode, 0, result.stdout + result.stderr)

    # --- the mixes ------------------------------------------------------------------------------
    def test_an_own_copy_installs_and_upgrades(self):
        self.assert_ok(self.script_user(self.old))
        self.assertEqual(self.copy_in_use(), ("own", "old.oxt"))
        result = self.script_user(self.new)
        self.assert_ok(result)
        self.assertIn("installed Coilwright 0.0.2", result.stdout)
        self.assertIn("replacing 0.0.1", result.stdout)
        self.assertEqual(self.copy_in_use(), ("own", "new.oxt"))

    def test_no_own_copy_is_installed_beside_a_shared_one(self):
        self.assert_ok(self.script_admin(self.old))
        result = self.script_user(self.new)
        self.assertEqual(result.returncode, 3, result.stdout + result.stderr)
        self.assertIn("Coilwright 0.0.1 is installed for every user", result.stderr)
        self.assertIn("tools/install_extension.sh --shared", result.stderr)
        self.assertNotEqual(self.unopkg_user("list", "org.coilwright.calc").returncode, 0, "an own copy was installed")
        self.assertEqual(self.copy_in_use(), ("shared", "old.oxt"))
        # The administrator upgrades the shared copy, as the message says: everyone gets it.
        self.assert_ok(self.script_admin(self.new))
        self.assertEqual(self.copy_in_use(), ("shared", "new.oxt"))

    def test_add_remove_add_beside_a_shared_copy_is_never_silent(self):
        # The sequence of the report, through the script: refused with a reason at every add.
        self.assert_ok(self.script_admin(self.old))
        for args in ((self.new,), ("--remove",), (self.new,)):
            result = self.script_user(*args)
            self.assertIn("0.0.1", result.stderr, f"{args}: says nothing of the shared copy")
            if args[0] != "--remove":
                self.assertEqual(result.returncode, 3)
        self.assertEqual(self.copy_in_use(), ("shared", "old.oxt"))

    def test_an_inactive_own_copy_left_by_unopkg_is_reported(self):
        # LibreOffice's own failure, made with unopkg directly: an own copy that is not active.
        self.assert_ok(self.as_admin(["unopkg", "add", "--shared", "-f", "--suppress-license",
                                      *self.env.split(), str(self.old)]))
        self.assert_ok(self.unopkg_user("add", "-f", "--suppress-license", str(self.new)))
        self.assert_ok(self.unopkg_user("remove", "org.coilwright.calc"))
        self.unopkg_user("add", "-f", "--suppress-license", str(self.new))  # fails: inactive own copy
        listed = self.unopkg_user("list", "org.coilwright.calc").stdout
        if "is registered: no" not in listed:
            self.skipTest("this LibreOffice activates the copy; nothing to report")
        self.assertEqual(self.copy_in_use(), ("shared", "old.oxt"))  # the silent state
        result = self.script_user(self.new)
        self.assertEqual(result.returncode, 3, result.stdout + result.stderr)
        self.assertIn("Your own Coilwright 0.0.2 is installed but inactive: Calc uses the copy for every user",
                      result.stderr)
        self.assertIn("(0.0.1)", result.stderr)
        # Its advice works: remove the own copy, the administrator upgrades the shared one.
        self.assert_ok(self.script_user("--remove"))
        self.assert_ok(self.script_admin(self.new))
        self.assertEqual(self.copy_in_use(), ("shared", "new.oxt"))

    def test_removing_an_own_copy_says_which_copy_remains(self):
        self.assert_ok(self.script_user(self.new))
        self.assert_ok(self.script_admin(self.old))
        self.assertEqual(self.copy_in_use(), ("own", "new.oxt"))  # one's own copy comes first
        result = self.script_user("--remove")
        self.assert_ok(result)
        self.assertIn("removed Coilwright 0.0.2", result.stdout)
        self.assertIn("Coilwright 0.0.1 stays installed for every user, and LibreOffice now uses it", result.stderr)
        self.assertEqual(self.copy_in_use(), ("shared", "old.oxt"))

    @unittest.skipUnless(AS_ROOT, "needs root: a shared install through sudo")
    def test_a_shared_upgrade_names_the_callers_own_copy(self):
        self.assert_ok(self.script_user(self.old))
        result = self.script_admin(self.new, SUDO_USER=PER_USER)
        self.assert_ok(result)
        self.assertIn("installed Coilwright 0.0.2 for every user", result.stdout)
        self.assertIn(f"{PER_USER} has a copy of their own (0.0.1)", result.stderr)
        self.assertEqual(self.copy_in_use(), ("own", "old.oxt"))

    @unittest.skipUnless(AS_ROOT, "unopkg refuses per-user installs only as root")
    def test_root_is_told_to_pass_shared(self):
        result = self.as_admin(["sh", str(SCRIPT), str(self.old)])
        self.assertEqual(result.returncode, 2)
        self.assertIn("pass --shared", result.stderr)


if __name__ == "__main__":
    unittest.main()
