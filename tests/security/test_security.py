"""What can be checked of the security promises, on the built artefacts.

The add-in touches no files, network or environment, starts no process and evaluates no user
string as code; the workbooks carry no macros; the extension names its version and license, and
declares the LibreOffice and platform it needs, which its library's needs do not exceed.
The one exception is the share command (menu Coilwright > Save Frozen Copy for Sharing,
addin/uno/share_command.cpp and the files it uses): when the user asks, it writes a frozen copy
and a PDF beside the workbook through LibreOffice's own document services, still without any
file, network or process call of its own.
"""
import os
import pathlib
import re
import subprocess
import unittest
import xml.etree.ElementTree as ET
import zipfile

SOURCE = pathlib.Path(os.environ.get("COILWRIGHT_SOURCE_DIR", pathlib.Path(__file__).resolve().parents[2]))
OXT = pathlib.Path(os.environ.get("COILWRIGHT_OXT", SOURCE / "build" / "coilwright.oxt"))
VERSION = os.environ.get("COILWRIGHT_VERSION", "")
LIBRARY = "coilwright.uno.so"

# Imports that would let the library reach files, the network, the environment, other
# processes or code loaded at run time (C library and LibreOffice's OS layer).
FORBIDDEN_IMPORT = re.compile(
    r"^(open|open64|openat|openat64|creat|creat64|fopen|fopen64|freopen|fdopen|tmpfile|mkstemp|mkdtemp|"
    r"read|write|pread|pwrite|readv|writev|sendfile|unlink|unlinkat|remove|rename|renameat|mkdir|rmdir|"
    r"opendir|readdir|scandir|chdir|chmod|chown|truncate|ftruncate|link|symlink|mmap|mmap64|"
    r"stat|stat64|lstat|fstat|fstatat|__xstat|__xstat64|access|faccessat|realpath|"
    r"socket|socketpair|connect|bind|listen|accept|accept4|send|sendto|sendmsg|recv|recvfrom|recvmsg|"
    r"getaddrinfo|gethostbyname|gethostbyname_r|getnameinfo|inet_\w+|"
    r"system|popen|fork|vfork|clone|execl|execlp|execle|execv|execvp|execvpe|execve|fexecve|"
    r"posix_spawn\w*|kill|ptrace|dlopen|dlmopen|dlsym|dlvsym|"
    r"getenv|secure_getenv|__secure_getenv|setenv|putenv|unsetenv|clearenv|environ|"
    r"osl_\w+|rtl_bootstrap\w*|rtl_getAppCommandArg\w*)$")
# LibreOffice OS-layer functions that are only locks and counters.
ALLOWED_OSL = re.compile(r"^osl_(acquireMutex|releaseMutex|tryToAcquireMutex|createMutex|destroyMutex|"
                         r"getGlobalMutex|incrementInterlockedCount|decrementInterlockedCount)$")
# ld-linux for the thread-local state of the C++ runtime, which is linked into the library.
ALLOWED_LIBRARIES = {"libuno_cppuhelpergcc3.so.3", "libuno_cppu.so.3", "libuno_sal.so.3", "libstdc++.so.6",
                     "libm.so.6", "libgcc_s.so.1", "libc.so.6", "ld-linux-x86-64.so.2"}
OXT_CONTENT = {"META-INF/manifest.xml", "description.xml", "description-en.txt", "LICENSE.txt",
               "coilwright.components", "coilwright.rdb", "CalcAddIns.xcu", "Addons.xcu", "ProtocolHandler.xcu",
               LIBRARY}
# The share command's sources: they may open LibreOffice services (storage, desktop, toolkit).
SHARE_COMMAND = re.compile(r"^addin/uno/(share_\w+|freeze_\w+|exact_values)\.(cpp|hpp)$")
DESCRIPTION_NS = {"d": "http://openoffice.org/extensions/description/2006",
                  "l": "http://libreoffice.org/extensions/description/2011",
                  "xlink": "http://www.w3.org/1999/xlink"}
# What the oldest Linux supported by a LibreOffice version offers, per symbol-version family.
# From memory (not re-checked here): LibreOffice's system requirements for the 7.x releases
# (https://www.libreoffice.org/get-help/system-requirements/) ask for glibc 2.17 on GNU/Linux,
# the C library of RHEL/CentOS 7, the baseline of The Document Foundation's builds; its GCC 4.8.5
# runtime defines up to GCC_4.8.0 (libgcc_s), GLIBCXX_3.4.19 and CXXABI_1.3.7 (GCC manual,
# "ABI Policy and Guidelines", symbol versions by release). A version declared in
# description.xml needs a line here before the test passes.
OLDEST_LINUX = {
    "7.4": {"GLIBC": "2.17", "GCC": "4.8.0", "GLIBCXX": "3.4.19", "CXXABI": "1.3.7"},
}


# Each platform an .oxt may carry a library for (the manifest's platform= value is $_OS_$_ARCH of
# that LibreOffice, compared ignoring case): the UNO C++ bridge its .components file names, and
# how its library file starts (its object format and machine). Tokens and $_OS/$_ARCH pairs from
# LibreOffice's desktop/source/deployment/misc/dp_platform.cxx; bridges from its bridges/ folder.
# Object formats: ELF (e_machine 0x3E x86-64, 0xB7 AArch64, System V gABI), PE (machine 0x8664
# x64, 0xAA64 Arm64, Microsoft PE format specification), Mach-O 64 (cputype 0x01000007 x86_64,
# 0x0100000C arm64, Apple's <mach/machine.h>).
PLATFORMS = {
    "linux_x86_64": ("gcc3", "elf", 0x3E),
    "linux_aarch64": ("gcc3", "elf", 0xB7),
    "windows_x86_64": ("mscx", "pe", 0x8664),
    "windows_aarch64": ("msca", "pe", 0xAA64),
    "macosx_x86_64": ("gcc3", "macho", 0x01000007),
    "macosx_aarch64": ("gcc3", "macho", 0x0100000C),
}
MANIFEST_NS = "{http://openoffice.org/2001/manifest}"
COMPONENTS_NS = "{http://openoffice.org/2010/uno-components}"


def object_format(data):
    """(format, machine) of a library's first bytes, or None."""
    if data[:4] == b"\x7fELF":
        return "elf", int.from_bytes(data[18:20], "little")
    if data[:2] == b"MZ":
        pe = int.from_bytes(data[0x3C:0x40], "little")
        if data[pe:pe + 4] == b"PE\0\0":
            return "pe", int.from_bytes(data[pe + 4:pe + 6], "little")
    if data[:4] == b"\xcf\xfa\xed\xfe":
        return "macho", int.from_bytes(data[4:8], "little")
    return None


def manifest_components(z):
    """{components file: platform token} from the manifest's uno-components entries."""
    found = {}
    for entry in ET.fromstring(z.read("META-INF/manifest.xml")).iter(MANIFEST_NS + "file-entry"):
        media = entry.get(MANIFEST_NS + "media-type")
        if media.startswith("application/vnd.sun.star.uno-components"):
            m = re.search(r";platform=(\w+)", media)
            found[entry.get(MANIFEST_NS + "full-path")] = m.group(1).lower() if m else None
    return found


def component_library(z, components_file):
    """(library path in the .oxt, bridge) named by a .components file (uri relative to it)."""
    component = ET.fromstring(z.read(components_file)).find(COMPONENTS_NS + "component")
    folder = str(pathlib.PurePosixPath(components_file).parent)
    path = component.get("uri") if folder == "." else f"{folder}/{component.get('uri')}"
    return path, component.get("environment")


def extracted_library(tmp):
    with zipfile.ZipFile(OXT) as z:
        return pathlib.Path(z.extract(LIBRARY, tmp))


def tool(*cmd):
    return subprocess.run(cmd, check=True, capture_output=True, text=True).stdout


def version_tuple(text):
    return tuple(int(p) for p in re.split(r"[._]", text))


def version_needs(library):
    """{(file, version name)} from the library's .gnu.version_r (readelf -V)."""
    needs, current = set(), None
    for line in tool("readelf", "-V", "--wide", str(library)).splitlines():
        m = re.search(r"File: (\S+)", line)
        if m:
            current = m.group(1)
        m = re.search(r"Name: (\S+)\s+Flags", line)
        if m and current:
            needs.add((current, m.group(1)))
    return needs


def description():
    with zipfile.ZipFile(OXT) as z:
        return ET.fromstring(z.read("description.xml"))


class AddinLibrary(unittest.TestCase):
    @classmethod
    def setUpClass(cls):
        import tempfile
        cls.tmp = tempfile.TemporaryDirectory()
        cls.library = extracted_library(cls.tmp.name)

    @classmethod
    def tearDownClass(cls):
        cls.tmp.cleanup()

    def test_imports_no_file_network_environment_process_or_loader_functions(self):
        imports = [line.split()[-1].split("@")[0]
                   for line in tool("nm", "-D", "--undefined-only", str(self.library)).splitlines() if line.strip()]
        self.assertGreater(len(imports), 10, "nm found no imports: wrong file?")
        bad = [s for s in imports if FORBIDDEN_IMPORT.match(s) and not ALLOWED_OSL.match(s)]
        self.assertEqual(bad, [], "the add-in imports functions that reach outside the calculation")
        print(f"\n{len(imports)} imports, none for files, network, environment, processes or loading code")

    def test_links_only_the_cxx_runtime_and_uno(self):
        needed = set(re.findall(r"\(NEEDED\)\s+Shared library: \[([^\]]+)\]", tool("readelf", "-d", str(self.library))))
        self.assertTrue(needed, "readelf found no NEEDED entries")
        self.assertLessEqual(needed, ALLOWED_LIBRARIES, f"unexpected libraries: {sorted(needed - ALLOWED_LIBRARIES)}")

    def test_exports_only_the_component_constructor(self):
        exported = {line.split()[-1].split("@")[0]
                    for line in tool("nm", "-D", "--defined-only", str(self.library)).splitlines()
                    if line.split()[-2] in ("T", "W", "D", "B", "V", "i")}
        exported -= {"_init", "_fini"}
        # Besides the constructor only the type information of the UNO exceptions thrown to Calc,
        # which must be visible for Calc to catch them (weak, merged with LibreOffice's own).
        rtti = {s for s in exported if re.match(r"^_ZT[IS]N3com3sun4star", s)}
        self.assertEqual(exported - rtti, {"org_coilwright_Functions_get_implementation",
                                           "org_coilwright_ShareCommand_get_implementation"})


class DeclaredRequirements(unittest.TestCase):
    """description.xml says what the extension needs; the library's ELF headers say what it
    really needs. An older LibreOffice or system than declared must refuse the extension, never
    install it and show #NAME? everywhere."""

    @classmethod
    def setUpClass(cls):
        import tempfile
        cls.tmp = tempfile.TemporaryDirectory()
        cls.library = extracted_library(cls.tmp.name)
        cls.needs = version_needs(cls.library)
        cls.root = description()
        minimal = cls.root.find("d:dependencies/l:LibreOffice-minimal-version", DESCRIPTION_NS)
        cls.declared = minimal.get("value") if minimal is not None else None

    @classmethod
    def tearDownClass(cls):
        cls.tmp.cleanup()

    def test_declares_a_libreoffice_version_and_no_openoffice_one(self):
        self.assertIsNotNone(self.declared, "no LibreOffice-minimal-version in description.xml")
        self.assertRegex(self.declared, r"^\d+\.\d+$")
        deps = self.root.find("d:dependencies", DESCRIPTION_NS)
        others = [e.tag for e in deps if not e.tag.endswith("}LibreOffice-minimal-version")]
        self.assertEqual(others, [], "only the LibreOffice version is declared (OpenOffice.org 4.0 was a false promise)")
        self.assertIn(self.declared, OLDEST_LINUX, "add the oldest Linux of that LibreOffice version to OLDEST_LINUX")
        self.assertGreater(len(self.needs), 5, "readelf found no version needs: wrong file?")

    def test_declares_the_platform_the_library_is_built_for(self):
        platform = self.root.find("d:platform", DESCRIPTION_NS)
        self.assertIsNotNone(platform)
        self.assertIn("linux_x86_64", [t.strip() for t in platform.get("value").split(",")])
        with zipfile.ZipFile(OXT) as z:
            self.assertEqual(manifest_components(z).get("coilwright.components"), "linux_x86_64")
            self.assertEqual(component_library(z, "coilwright.components"), (LIBRARY, "gcc3"))
        header = tool("readelf", "-h", str(self.library))
        self.assertRegex(header, r"Class:\s+ELF64")
        self.assertRegex(header, r"Machine:\s+Advanced Micro Devices X86-64")

    def test_needs_no_newer_libreoffice_than_declared(self):
        udk = [name for _, name in self.needs if name.startswith("LIBO_UDK_")]
        self.assertTrue(udk, "no LIBO_UDK_ need found")
        newest = max(udk, key=lambda n: version_tuple(n[len("LIBO_UDK_"):]))
        self.assertLessEqual(version_tuple(newest[len("LIBO_UDK_"):]), version_tuple(self.declared),
                             f"the library needs {newest}, newer than the declared LibreOffice {self.declared}")
        print(f"\nnewest LibreOffice interface needed: {newest}; declared: LibreOffice {self.declared}")

    def test_needs_no_newer_system_than_the_oldest_linux_of_that_version(self):
        limits = OLDEST_LINUX.get(self.declared, {})
        too_new, newest = [], {}
        for file, name in sorted(self.needs):
            family, _, number = name.partition("_")
            if family not in ("GLIBC", "GCC", "GLIBCXX", "CXXABI"):
                continue
            if family not in limits or version_tuple(number) > version_tuple(limits[family]):
                too_new.append(f"{name} ({file})")
            if family not in newest or version_tuple(number) > version_tuple(newest[family]):
                newest[family] = number
        self.assertEqual(too_new, [], f"newer than the oldest Linux of LibreOffice {self.declared} offers ({limits})")
        print("\nnewest system versions needed: " + ", ".join(f"{k}_{v}" for k, v in sorted(newest.items())))

    def test_carries_no_path_of_the_build_machine(self):
        dynamic = tool("readelf", "-d", str(self.library))
        self.assertNotRegex(dynamic, r"\((RPATH|RUNPATH)\)")

    def test_links_to_no_web_site(self):
        # The project holds no web domain: the publisher is named, not linked.
        links = [e.get(f"{{{DESCRIPTION_NS['xlink']}}}href") for e in self.root.iter()]
        links = [link for link in links if link and re.match(r"(?i)[a-z]+://", link)]
        self.assertEqual(links, [])


class AddinSource(unittest.TestCase):
    CODE_DIRS = ("engine", "addin")
    FORBIDDEN_CALL = re.compile(r"\b(getenv|secure_getenv|system|popen|fopen|freopen|dlopen|socket|"
                                r"execv|execl|execvp|fork|createInstance\w*|getServiceManager|"
                                r"createUnoService)\s*\(")
    FORBIDDEN_INCLUDE = re.compile(r"#\s*include\s*[<\"](fstream|filesystem|cstdio|stdio\.h|sys/socket\.h|"
                                   r"netinet/\w+\.h|dlfcn\.h|unistd\.h|spawn\.h|osl/file\.hxx|osl/process\.h|"
                                   r"osl/socket\.hxx|rtl/bootstrap\.hxx|com/sun/star/ucb/[^>\"]+|"
                                   r"com/sun/star/script/[^>\"]+)[>\"]")

    def test_no_code_that_reaches_outside_the_calculation(self):
        found = []
        for d in self.CODE_DIRS:
            for path in sorted((SOURCE / d).rglob("*")):
                if path.suffix not in (".cpp", ".hpp", ".h", ".inc", ".in"):
                    continue
                code = re.sub(r"//[^\n]*|/\*.*?\*/", "", path.read_text(), flags=re.S)
                name = str(path.relative_to(SOURCE))
                for rx in (self.FORBIDDEN_CALL, self.FORBIDDEN_INCLUDE):
                    found += [f"{name}: {m.group(0)}" for m in rx.finditer(code)
                              if not (SHARE_COMMAND.match(name) and m.group(0).startswith("createInstance"))]
        self.assertEqual(found, [])

    def test_the_component_ignores_its_context(self):
        # The constructor receives the component context (the door to files, network and
        # macros through UNO services) and must not keep or use it.
        text = (SOURCE / "addin" / "uno" / "component.cpp").read_text()
        m = re.search(r"get_implementation\(\s*uno::XComponentContext\s*\*\s*(\w*)\s*,", text)
        self.assertIsNotNone(m, "constructor signature not found")
        self.assertEqual(m.group(1), "", "the constructor names (and so may use) its component context")


class Extension(unittest.TestCase):
    def test_contains_only_what_the_manifest_lists(self):
        with zipfile.ZipFile(OXT) as z:
            names = set(z.namelist())
            manifest = z.read("META-INF/manifest.xml").decode()
            # Libraries of other platforms (COILWRIGHT_OXT_EXTRA_LIBRARIES) with their .components.
            others = {f for f in manifest_components(z) if f != "coilwright.components"}
            others |= {component_library(z, f)[0] for f in others}
        self.assertEqual(names, OXT_CONTENT | others)
        self.assertNotRegex(manifest, r"(?i)basic|script|macro")

    def test_each_declared_platform_has_one_library_built_for_it(self):
        # LibreOffice registers the .components file whose platform= is its own system and
        # ignores the others: each platform in description.xml needs exactly one, naming a
        # library of that system's object format and machine and that system's C++ bridge.
        with zipfile.ZipFile(OXT) as z:
            declared = [t.strip() for t in description().find("d:platform", DESCRIPTION_NS).get("value").split(",")]
            components = manifest_components(z)
            self.assertEqual(sorted(components.values()), sorted(declared))
            for components_file, token in components.items():
                with self.subTest(platform=token):
                    self.assertIn(token, PLATFORMS, "a platform LibreOffice does not know")
                    bridge, form, machine = PLATFORMS[token]
                    library, environment = component_library(z, components_file)
                    self.assertEqual(environment, bridge)
                    self.assertEqual(object_format(z.read(library)[:4096]), (form, machine),
                                     f"{library} is not a {form} library for {token}")
        print(f"\nplatforms: {', '.join(declared)}")

    def test_description_names_version_and_license(self):
        with zipfile.ZipFile(OXT) as z:
            root = ET.fromstring(z.read("description.xml"))
            license_text = z.read("LICENSE.txt").decode()
        version = root.find("d:version", DESCRIPTION_NS)
        self.assertIsNotNone(version)
        self.assertRegex(version.get("value"), r"^\d+\.\d+\.\d+$")
        if VERSION:
            self.assertEqual(version.get("value"), VERSION)
        lic = root.find("d:registration/d:simple-license/d:license-text", DESCRIPTION_NS)
        self.assertIsNotNone(lic, "description.xml has no license")
        self.assertEqual(lic.get(f"{{{DESCRIPTION_NS['xlink']}}}href"), "LICENSE.txt")
        self.assertIn("MIT License", license_text)
        self.assertEqual(license_text, (SOURCE / "LICENSE").read_text())


class Workbooks(unittest.TestCase):
    SCRIPT_MARKERS = re.compile(r"script:event-listener|vnd\.sun\.star\.script:|macro:|ooo:macro|"
                                r"office:script\b(?!s)|<office:scripts>\s*<")

    def workbooks(self):
        books = sorted((SOURCE / "sheets").glob("*.ods"))
        self.assertTrue(books, "no workbooks in sheets/")
        return books

    def test_workbooks_carry_no_macros_or_scripts(self):
        for book in self.workbooks():
            with self.subTest(book=book.name), zipfile.ZipFile(book) as z:
                names = z.namelist()
                self.assertEqual([n for n in names if re.match(r"(?i)(basic|scripts|dialogs)/", n)], [])
                manifest = z.read("META-INF/manifest.xml").decode()
                self.assertNotRegex(manifest, r"(?i)basic|script")
                for part in ("content.xml", "settings.xml", "styles.xml"):
                    if part in names:
                        self.assertNotRegex(z.read(part).decode(), self.SCRIPT_MARKERS, f"{book.name}/{part}")


if __name__ == "__main__":
    unittest.main()
