#!/usr/bin/env python3
"""Generate every artefact that describes the spreadsheet functions from the catalogue:
idl/addin.toml (the add-in) and idl/functions/*.toml (the functions, one file per family).

One catalogue, several views, so the names, arguments and help cannot drift apart:
  idl            the UNO interface the add-in implements
  specs          C++ argument specs for the UNO-free core
  args           C++ function tags with named argument structs (function_args.hpp)
  bindings       the compile-time binding table: one implement<fn::NAME>() per function
  methods        the add-in's method glue
  xcu            CalcAddIns configuration: display names, descriptions, argument help
  readme-table   the README's function reference (check-readme / update-readme keep it in step)
"""
import argparse
import html
import pathlib
import sys
import tomllib

IDL_KEYWORDS = {
    "any", "attribute", "boolean", "bound", "byte", "char", "const", "constants", "constrained",
    "double", "enum", "exception", "float", "hyper", "in", "inout", "interface", "long",
    "maybevoid", "method", "module", "needs", "observes", "oneway", "optional", "out",
    "property", "published", "raises", "readonly", "removable", "sequence", "service",
    "short", "singleton", "string", "struct", "transient", "type", "typedef", "unsigned", "void",
}
CXX_KEYWORDS = {
    "alignas", "alignof", "and", "asm", "auto", "bitand", "bitor", "bool", "break", "case", "catch", "char",
    "class", "compl", "concept", "const", "consteval", "constexpr", "constinit", "continue", "decltype", "default",
    "delete", "do", "double", "else", "enum", "explicit", "export", "extern", "false", "float", "for", "friend",
    "goto", "if", "inline", "int", "long", "mutable", "namespace", "new", "noexcept", "not", "nullptr", "operator",
    "or", "private", "protected", "public", "register", "requires", "return", "short", "signed", "sizeof",
    "static", "struct", "switch", "template", "this", "throw", "true", "try", "typedef", "typeid", "typename",
    "union", "unsigned", "using", "virtual", "void", "volatile", "while", "xor", "from",
}
KINDS = {"number", "gauge", "choice", "table", "raw"}
# Kinds passed to the implementation whole, never broadcast.
WHOLE_KINDS = {"table", "raw"}
CHOICE_KEYS = ("choices", "values", "aliases", "accept_numbers")
CHOICE_SET_KEYS = CHOICE_KEYS + ("enum", "enumerators", "header")
# A table argument is declared as a cell range in the interface: Calc then passes the range
# object itself instead of converting every cell of it (a whole column is a million cells).
# Calc passes nothing but references to such a parameter, so each function with a table also
# gets an array twin, NAME + ARRAY_TWIN_SUFFIX, whose table is an `any`: an inline array {...}
# or another function's result.
CELL_RANGE_TYPE = "com::sun::star::table::XCellRange"
ARRAY_TWIN_SUFFIX = "_ARRAY"
README_BEGIN = "<!-- function-table:begin (generated from idl/functions/*.toml; do not edit) -->"
README_END = "<!-- function-table:end -->"


def load(idl_dir):
    idl_dir = pathlib.Path(idl_dir)
    with open(idl_dir / "addin.toml", "rb") as f:
        data = tomllib.load(f)
    data["function"] = []
    data.setdefault("choices", {})
    for set_name, choice_set in data["choices"].items():
        for key in choice_set:
            if key not in CHOICE_SET_KEYS:
                sys.exit(f"catalogue: choice set {set_name}: unknown key {key}")
        if ("enum" in choice_set) != ("enumerators" in choice_set) or ("enum" in choice_set) != ("header" in choice_set):
            sys.exit(f"catalogue: choice set {set_name}: enum, enumerators and header go together")
        if "enumerators" in choice_set and len(choice_set["enumerators"]) != len(choice_set["choices"]):
            sys.exit(f"catalogue: choice set {set_name}: one enumerator per choice")
    for path in sorted((idl_dir / "functions").glob("*.toml")):
        with open(path, "rb") as f:
            family = tomllib.load(f)
        for key in family:
            if key != "function":
                sys.exit(f"catalogue: {path.name}: unknown key {key} (a family file holds [[function]] tables)")
        data["function"].extend(family.get("function", []))
    names = set()
    for fn in data["function"]:
        if fn["name"] in names:
            sys.exit(f"catalogue: duplicate function {fn['name']}")
        names.add(fn["name"])
    for fn in data["function"]:
        if has_table(fn) and array_twin_name(fn) in names:
            sys.exit(f"catalogue: {array_twin_name(fn)} is the array twin of {fn['name']}; choose another name")
        seen_optional = False
        arg_names = set()
        for arg in fn["args"]:
            kind = arg.setdefault("kind", "number")
            if kind not in KINDS:
                sys.exit(f"catalogue: {fn['name']}.{arg['name']}: unknown kind {kind}")
            if arg["name"] in IDL_KEYWORDS or arg["name"] in CXX_KEYWORDS or not arg["name"].isidentifier():
                sys.exit(f"catalogue: {fn['name']}: bad argument name {arg['name']}")
            if "_" in arg["name"]:  # unoidl-write rejects it ("illegal identifier")
                sys.exit(f"catalogue: {fn['name']}: argument {arg['name']}: UNO IDL allows no underscore here; use camelCase")
            if arg["name"] in arg_names:
                sys.exit(f"catalogue: {fn['name']}: duplicate argument {arg['name']}")
            arg_names.add(arg["name"])
            check_vocabulary(fn["name"], arg, data.get("vocabulary", {}))
            if "default" in arg:
                seen_optional = True
            elif seen_optional:
                sys.exit(f"catalogue: {fn['name']}: required {arg['name']} after an optional argument")
            for key in ("unit", "help"):
                if not arg.get(key):
                    sys.exit(f"catalogue: {fn['name']}.{arg['name']}: missing {key}")
            if "columns" in arg and (kind != "table" or len(arg["columns"]) != 2 or not 1 <= arg["columns"][0] <= arg["columns"][1]):
                sys.exit(f"catalogue: {fn['name']}.{arg['name']}: columns = [fewest, most] is for tables")
            resolve_choice_set(fn["name"], arg, data["choices"])
            check_choice(fn["name"], arg)
        for key in ("group", "returns", "summary", "accuracy"):
            if not fn.get(key):
                sys.exit(f"catalogue: {fn['name']}: missing {key}")
        # returns = "text": the result is one text value (no broadcasting), so every argument is
        # passed whole (a table or a raw value).
        if fn["returns"] == "text" and any(arg["kind"] not in WHOLE_KINDS for arg in fn["args"]):
            sys.exit(f"catalogue: {fn['name']}: a text result takes only arguments passed whole (table, raw)")
    return data


def check_vocabulary(fn_name, arg, vocabulary):
    """An argument is named from the vocabulary (idl/addin.toml), with a trailing number for
    several objects of one call (radius1, radius2; argument1 .. argument15), and has the
    vocabulary's unit."""
    stem = arg["name"].rstrip("0123456789")
    base = stem if stem != arg["name"] and stem in vocabulary else arg["name"]
    if base not in vocabulary:
        sys.exit(f"catalogue: {fn_name}.{arg['name']}: not in the argument vocabulary of idl/addin.toml "
                 "(use its name for the quantity, or add the new quantity there)")
    if arg.get("unit") != vocabulary[base]["unit"]:
        sys.exit(f"catalogue: {fn_name}.{arg['name']}: unit {arg.get('unit')} differs from the vocabulary's "
                 f"{vocabulary[base]['unit']}")


def resolve_choice_set(fn_name, arg, choice_sets):
    """choices = "<set>" names a set of idl/addin.toml: its keys are copied into the argument."""
    if arg["kind"] != "choice" or not isinstance(arg.get("choices"), str):
        return
    name = arg["choices"]
    if name not in choice_sets:
        sys.exit(f"catalogue: {fn_name}.{arg['name']}: no choice set {name}")
    if any(key in arg for key in CHOICE_KEYS if key != "choices"):
        sys.exit(f"catalogue: {fn_name}.{arg['name']}: a choice set is used whole (no values, aliases here)")
    arg.update(choice_sets[name])
    arg["choice_set"] = name


def check_choice(fn_name, arg):
    """A "choice" argument: text from a fixed list (case-insensitive), converted to a number
    before broadcasting. choices = primary texts; values = their numbers (default 0, 1, ...);
    aliases = {alias = primary}; accept_numbers = a number equal to a value is accepted too;
    default = one of the texts. Fills arg["choice_table"]: [(lower text, value, primary)]."""
    where = f"catalogue: {fn_name}.{arg['name']}"
    if arg["kind"] != "choice":
        for key in CHOICE_SET_KEYS:
            if key in arg:
                sys.exit(f"{where}: {key} is only for kind = \"choice\"")
        return
    choices = arg.get("choices")
    if not choices or not all(isinstance(c, str) and c.strip() for c in choices):
        sys.exit(f"{where}: choices must be a non-empty list of texts")
    values = arg.get("values", list(range(len(choices))))
    if len(values) != len(choices) or not all(isinstance(v, (int, float)) for v in values):
        sys.exit(f"{where}: values must be one number per choice")
    table = [(c.lower(), float(v), True) for c, v in zip(choices, values)]
    by_text = {c.lower(): float(v) for c, v in zip(choices, values)}
    for alias, target in arg.get("aliases", {}).items():
        if target.lower() not in by_text:
            sys.exit(f"{where}: alias {alias} names no choice")
        table.append((alias.lower(), by_text[target.lower()], False))
    texts = [t for t, _, _ in table]
    if len(set(texts)) != len(texts):
        sys.exit(f"{where}: a choice or alias appears twice (case is ignored)")
    if "default" in arg:
        default = arg["default"]
        if not isinstance(default, str) or default.lower() not in texts:
            sys.exit(f"{where}: default must be one of the choices")
        arg["default_text"] = default.lower()
        arg["default"] = default
    arg["choice_table"] = table


def choice_help(arg):
    if arg["kind"] != "choice":
        return ""
    aliases = list(arg.get("aliases", {}))
    text = " Text, one of: " + ", ".join(arg["choices"])
    if aliases:
        text += " (also " + ", ".join(aliases) + ")"
    return text + "; case is ignored."


def has_table(fn):
    return any(arg.get("kind", "number") == "table" for arg in fn["args"])


def array_twin_name(fn):
    return fn["name"] + ARRAY_TWIN_SUFFIX


def uno_methods(data):
    """(method name, catalogue index, function, twin?) for every interface method: each function,
    and after one with a table argument its array twin, which shares its catalogue index."""
    for index, fn in enumerate(data["function"]):
        yield fn["name"], index, fn, False
        if has_table(fn):
            yield array_twin_name(fn), index, fn, True


def passed_by_reference(arg, twin):
    return arg["kind"] == "table" and not twin


def gen_idl(data):
    a = data["addin"]
    mods = a["module"].split(".")
    out = ["// Generated from idl/functions/*.toml by tools/catalogue.py: do not edit.",
           "#include <com/sun/star/uno/XInterface.idl>",
           "#include <com/sun/star/table/XCellRange.idl>", ""]
    out += [f"module {m} {{" for m in mods]
    out.append(f"interface {a['interface']} : com::sun::star::uno::XInterface")
    out.append("{")
    for method, _, fn, twin in uno_methods(data):
        params = ", ".join(f"[in] {CELL_RANGE_TYPE if passed_by_reference(arg, twin) else 'any'} {arg['name']}"
                           for arg in fn["args"])
        out.append(f"    any {method}({params});")
    out.append("};")
    out += ["};" for _ in mods]
    return "\n".join(out) + "\n"


def cxx_string(s):
    return '"' + s.replace("\\", "\\\\").replace('"', '\\"') + '"'


def gen_specs(data):
    """UNO-free argument specifications, one table indexed like the IDL methods."""
    out = ["// Generated from idl/functions/*.toml by tools/catalogue.py: do not edit.",
           "// Included by addin/core/catalogue.cpp.", "",
           f"const char kServiceName[] = {cxx_string(data['addin']['service'])};", ""]
    for fn in data["function"]:
        rows = []
        for arg in fn["args"]:
            optional = "true" if "default" in arg else "false"
            if arg["kind"] == "choice":
                table = f"kChoices_{fn['name']}_{arg['name']}"
                out.append(f"const Choice {table}[] = {{")
                out += [f"    {{{cxx_string(t)}, {v!r}, {'true' if p else 'false'}}}," for t, v, p in arg["choice_table"]]
                out.append("};")
                default_text = cxx_string(arg["default_text"]) if "default_text" in arg else "nullptr"
                accepts = "true" if arg.get("accept_numbers") else "false"
                extra = f"{table}, {len(arg['choice_table'])}, {accepts}, {default_text}"
                default = "0.0"
            else:
                extra = "nullptr, 0, false, nullptr"
                default = "0.0" if arg["kind"] == "raw" else repr(float(arg.get("default", 0.0)))
            if arg["kind"] == "table":
                low, high = arg.get("columns", [6, 6])
                extra += f", {low}, {high}"
            rows.append(f"    {{{cxx_string(arg['name'])}, ArgKind::{arg['kind'].capitalize()}, {optional}, {default}, {extra}}},")
        out.append(f"const ArgSpec kArgs_{fn['name']}[] = {{")
        out += rows
        out.append("};")
    out.append("")
    out.append("const FunctionSpec kFunctionSpecs[] = {")
    for fn in data["function"]:
        text = ", true" if fn["returns"] == "text" else ""
        out.append(f"    {{{cxx_string(fn['name'])}, kArgs_{fn['name']}, {len(fn['args'])}{text}}},")
    out.append("};")
    return "\n".join(out) + "\n"


def cxx_arg_type(arg):
    return arg["enum"] if arg["kind"] == "choice" and "enum" in arg else "double"


def gen_args(data):
    """One tag per function (fn::NAME): its catalogue index and name, its number of table
    arguments, and Args, the struct of its other arguments by name, typed (a choice set with an
    enum arrives as that enum), built from the numbers the call layer broadcasts."""
    out = ["// Generated from idl/*.toml by tools/catalogue.py: do not edit.",
           "// The function tags and argument structs the bindings (addin/functions/*.cpp) use.",
           "#pragma once", "", "#include <cstddef>", ""]
    headers = sorted({s["header"] for s in data["choices"].values() if "header" in s})
    out += [f'#include "{h}"' for h in headers]
    out += ["", "namespace coilwright::sheet::fn {", ""]
    for set_name, choice_set in sorted(data["choices"].items()):
        if "enum" not in choice_set:
            continue
        values = choice_set.get("values", list(range(len(choice_set["choices"]))))
        for enumerator, value in zip(choice_set["enumerators"], values):
            out.append(f"static_assert(static_cast<int>({choice_set['enum']}::{enumerator}) == {int(value)}, "
                       f"\"choice set {set_name}: {enumerator} must be {int(value)}\");")
    out.append("")
    for index, fn in enumerate(data["function"]):
        numbers = [a for a in fn["args"] if a["kind"] not in WHOLE_KINDS]
        whole = len(fn["args"]) - len(numbers)
        members = [f"        {cxx_arg_type(a)} {a['name']};" for a in numbers]
        conversions = [f"static_cast<{a['enum']}>(a[{k}])" if cxx_arg_type(a) != "double" else f"a[{k}]"
                       for k, a in enumerate(numbers)]
        from_param = "a" if numbers else ""
        out += [f"struct {fn['name']} {{",
                f"    static constexpr std::size_t index = {index};",
                f"    static constexpr const char* name = {cxx_string(fn['name'])};",
                f"    static constexpr std::size_t whole_count = {whole};  // arguments passed whole (tables, raw values)",
                "    struct Args {"] + members + [
                f"        static Args from([[maybe_unused]] const double* {from_param or 'a'}) {{ return {{{', '.join(conversions)}}}; }}",
                "    };",
                "};", ""]
    out.append("}  // namespace coilwright::sheet::fn")
    return "\n".join(out) + "\n"


def gen_bindings(data):
    """The binding table in catalogue order: every function's implement<fn::NAME>(), which its
    family file (addin/functions/*.cpp) defines. A function without one fails to link; one for a
    name the catalogue lacks fails to compile."""
    out = ["// Generated from idl/*.toml by tools/catalogue.py: do not edit.",
           "// Included by addin/core/registry.cpp.", "",
           "const ImplementFn kImplementers[] = {"]
    out += [f"    implement<fn::{fn['name']}>," for fn in data["function"]]
    out += ["};"]
    return "\n".join(out) + "\n"


def gen_methods(data):
    """Method declarations for the add-in class body: each forwards to one dispatcher, a range
    passed by reference wrapped in an Any like every other argument."""
    out = ["// Generated from idl/functions/*.toml by tools/catalogue.py: do not edit.",
           "// Included inside the add-in class body (addin/uno/component.cpp).", ""]
    for method, index, fn, twin in uno_methods(data):
        params, ptrs, wraps = [], [], []
        for arg in fn["args"]:
            if passed_by_reference(arg, twin):
                params.append(f"const css::uno::Reference<css::table::XCellRange>& {arg['name']}")
                wraps.append(f"    const css::uno::Any {arg['name']}Range({arg['name']});")
                ptrs.append(f"&{arg['name']}Range")
            else:
                params.append(f"const css::uno::Any& {arg['name']}")
                ptrs.append(f"&{arg['name']}")
        n = len(fn["args"])
        out.append(f"css::uno::Any SAL_CALL {method}({', '.join(params)}) override {{")
        out += wraps
        out.append(f"    const css::uno::Any* args[{n}] = {{{', '.join(ptrs)}}};")
        out.append(f"    return dispatch({index}, args, {n});")
        out.append("}")
    return "\n".join(out) + "\n"


def xml_value(text, lang=True):
    attr = ' xml:lang="en-US"' if lang else ""
    return f"<value{attr}>{html.escape(text, quote=False)}</value>"


def arg_help(arg, twin=False):
    # Calc lists every `any` argument as optional, so the help says which ones are not.
    return arg["help"] + choice_help(arg) + table_help(arg, twin) + (" Optional." if "default" in arg else " Required.")


def table_help(arg, twin):
    if arg["kind"] != "table":
        return ""
    if twin:
        return " Here an inline array {...} or another function's result; a cell range goes to the function without _ARRAY."
    return " A cell range on one sheet; for an inline array or another function's result use the function + _ARRAY."


def twin_note(fn, twin):
    if not has_table(fn):
        return ""
    if twin:
        return (f" The same as {fn['name']}, with the coil table given as an inline array {{...}} or as another "
                f"function's result (such as PAIR_COILS(...)).")
    return f" The coil table is a cell range; {array_twin_name(fn)} takes it as an array."


def gen_xcu(data):
    a = data["addin"]
    out = ['<?xml version="1.0" encoding="UTF-8"?>',
           "<!-- Generated from idl/functions/*.toml by tools/catalogue.py: do not edit. -->",
           '<oor:component-data xmlns:oor="http://openoffice.org/2001/registry" '
           'xmlns:xs="http://www.w3.org/2001/XMLSchema" oor:name="CalcAddIns" oor:package="org.openoffice.Office">',
           '  <node oor:name="AddInInfo">',
           f'    <node oor:name="{a["service"]}" oor:op="replace">',
           '      <node oor:name="AddInFunctions">']
    for method, _, fn, twin in uno_methods(data):
        desc = a["description_prefix"] + fn["summary"] + f" Returns {fn['returns']}." + twin_note(fn, twin)
        out += [f'        <node oor:name="{method}" oor:op="replace">',
                f'          <prop oor:name="DisplayName">{xml_value(method)}</prop>',
                f'          <prop oor:name="Description">{xml_value(desc)}</prop>',
                f'          <prop oor:name="Category">{xml_value(a["category"], lang=False)}</prop>',
                f'          <prop oor:name="CompatibilityName">{xml_value(method)}</prop>',
                '          <node oor:name="Parameters">']
        for arg in fn["args"]:
            out += [f'            <node oor:name="{arg["name"]}" oor:op="replace">',
                    f'              <prop oor:name="DisplayName">{xml_value(arg["name"])}</prop>',
                    f'              <prop oor:name="Description">{xml_value(arg_help(arg, twin))}</prop>',
                    "            </node>"]
        out += ["          </node>", "        </node>"]
    out += ["      </node>", "    </node>", "  </node>", "</oor:component-data>"]
    return "\n".join(out) + "\n"


def md(text):
    return text.replace("|", "\\|")


def gen_readme_table(data):
    out = [README_BEGIN]
    group = None
    for fn in data["function"]:
        if fn["group"] != group:
            group = fn["group"]
            out += ["", f"#### {group}", "",
                    "| function | arguments (units) | returns | accuracy |",
                    "|---|---|---|---|"]
        args = []
        for arg in fn["args"]:
            text = f"{arg['name']} [{arg['unit']}]"
            if "default" in arg:
                default = arg["default"] if isinstance(arg["default"], str) else f"{arg['default']:g}"
                text = f"[{arg['name']} [{arg['unit']}] = {default}]"
            args.append(text)
        names = f"`{fn['name']}`" + (f", `{array_twin_name(fn)}`" if has_table(fn) else "")
        out.append(f"| {names} | {md('; '.join(args))} | {md(fn['summary'])} ({md(fn['returns'])}) "
                   f"| {md(fn['accuracy'])} |")
    out += ["", README_END]
    return "\n".join(out) + "\n"


def readme_parts(readme_text):
    try:
        head, rest = readme_text.split(README_BEGIN, 1)
        _, tail = rest.split(README_END, 1)
    except ValueError:
        sys.exit("README.md has no function-table markers")
    return head, tail


def main():
    ap = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    ap.add_argument("what", choices=["idl", "specs", "args", "bindings", "methods", "xcu", "readme-table", "check-readme",
                                     "update-readme"])
    ap.add_argument("--idl-dir", default=str(pathlib.Path(__file__).resolve().parent.parent / "idl"))
    ap.add_argument("--out", help="output file (default: stdout); README path for *-readme")
    opts = ap.parse_args()
    data = load(opts.idl_dir)

    if opts.what in ("check-readme", "update-readme"):
        path = pathlib.Path(opts.out or pathlib.Path(opts.idl_dir).resolve().parent / "README.md")
        text = path.read_text(encoding="utf-8")
        head, tail = readme_parts(text)
        wanted = head + gen_readme_table(data).rstrip("\n") + tail
        if opts.what == "update-readme":
            path.write_text(wanted, encoding="utf-8")
            return 0
        if wanted != text:
            print(f"{path}: function table differs from idl/functions/*.toml; run "
                  "'python3 tools/catalogue.py update-readme'", file=sys.stderr)
            return 1
        print("README function table matches the catalogue")
        return 0

    text = {"idl": gen_idl, "specs": gen_specs, "args": gen_args, "bindings": gen_bindings, "methods": gen_methods, "xcu": gen_xcu,
            "readme-table": gen_readme_table}[opts.what](data)
    if opts.out:
        out = pathlib.Path(opts.out)
        out.parent.mkdir(parents=True, exist_ok=True)
        # Leave an unchanged file untouched so the build does not recompile for nothing.
        if not out.exists() or out.read_text(encoding="utf-8") != text:
            out.write_text(text, encoding="utf-8")
    else:
        sys.stdout.write(text)
    return 0


if __name__ == "__main__":
    sys.exit(main())
