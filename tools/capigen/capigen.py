#!/usr/bin/env python3
"""capigen: pumploss.h is the one source of the C API bindings. This build tool reads the header
and writes, at build time, everything that would otherwise be kept by hand:

    capigen.py all     HEADER OUTDIR     pumploss.def (Windows exports), pumploss_signatures.py
                                         (ctypes table of the Python package, python/pumploss), pumploss.f90
                                         (Fortran 2003 module) and pumploss.bas (VBA module for
                                         64-bit spreadsheet hosts) into OUTDIR
    capigen.py def     HEADER OUT.def    one of them
    capigen.py python  HEADER OUT.py
    capigen.py fortran HEADER OUT.f90
    capigen.py vba     HEADER OUT.bas    (the worksheet functions come from pumploss.bas.in here)
    capigen.py table   HEADER OUT.inc    C++ table of every function (parameter kinds, a thunk
                                         that calls it, a first guess of a valid input), used by
                                         the bad-input, thread, shared-handle and no-allocation tests
    capigen.py cases   HEADER OUT.json   the web module's comparison cases (scalar and batch
    capigen.py native  HEADER OUT.c      functions at three scales) and the C program that
                                         evaluates them natively (web/gen_web.py, web_test.sh)
    capigen.py list    HEADER            print each function with its class and kinds

Parameter kinds (by C type): double in, int in, size_t (batch length or buffer capacity),
const double* (input array), double* (output: scalar, or array in a batch function), int*
(per-element status array in a batch function, else an int output), size_t* (a count output),
const int* (input array), const char* (string), char* (output buffer, followed by its size_t
capacity), T* / const T* (handle, T declared by `typedef struct X T;`), T** (handle out, in a
create function). An unknown type stops the build with a message naming the function: teach
this script the kind rather than leaving a function untested.

Counts: array_counts() states once which size_t parameters dimension which array (the test
table, the ctypes table's COUNTS for Python and the web module follow it).

Constants: the status codes are the integer #defines inside the header's "Status codes" group;
every other `#define PUMPLOSS_NAME <integer>` (except the version) is an option constant. Both
go into every binding.
"""
import io
import json
import os
import re
import sys

KINDS = ("DIN", "IIN", "SIZE", "BUFLEN", "DARR", "DOUT", "IOUT", "ZOUT", "IARR", "STR", "CBUF", "HIN", "HOUT")


class Param:
    def __init__(self, ctype, name, kind, handle=None, const=False):
        self.ctype, self.name, self.kind, self.handle, self.const = ctype, name, kind, handle, const
        self.array = kind in ("DARR", "IARR")  # outputs: set after parsing (see parse())


class Function:
    def __init__(self, name, ret, params):
        self.name, self.ret, self.params = name, ret, params
        kinds = [p.kind for p in params]
        if "HOUT" in kinds:
            self.cls = "CREATE"
        elif ret == "void" and kinds == ["HIN"]:
            self.cls = "DESTROY"
        elif "HIN" in kinds:
            self.cls = "METHOD"
        elif "SIZE" in kinds and name.endswith("_batch"):
            self.cls = "BATCH"  # per-point function over arrays
        else:
            self.cls = "SCALAR"  # one calculation (possibly a fit over arrays of a size_t count)


def strip_comments(text):
    text = re.sub(r"/\*.*?\*/", " ", text, flags=re.S)
    return re.sub(r"//[^\n]*", " ", text)


def norm_type(t):
    t = re.sub(r"\s*\*\s*", "*", t.strip())
    t = re.sub(r"\s+", " ", t)
    # "double const*" -> "const double*"
    m = re.match(r"^(\w+) const(\**)$", t)
    if m:
        t = "const " + m.group(1) + m.group(2)
    return t


def doc_comments(raw):
    """The Doxygen comment right before each function's declaration: name -> plain text."""
    docs = {}
    rx = r"/\*\*((?:(?!\*/).)*)\*/\s*PUMPLOSS_API[^;(]*?PUMPLOSS_CALL\s+(pumploss_\w+)\s*\("
    for m in re.finditer(rx, raw, flags=re.S):
        lines = [re.sub(r"^\s*\*? ?", "", ln).rstrip() for ln in m.group(1).splitlines()]
        text = "\n".join(lines).strip()
        text = re.sub(r"@(brief|return|param|sa|par)\b ?", lambda k: {"brief": "", "sa": "See also: "}.get(k.group(1), k.group(1).capitalize() + " "), text)
        docs[m.group(2)] = text
    return docs


DOCS = {}  # filled by parse(): the header's comment of each function, for the Python docstrings


def parse(path):
    """Returns (functions, handle_types, status_codes, option_constants)."""
    raw = open(path, encoding="utf-8").read()
    DOCS.update(doc_comments(raw))
    block = re.search(r"@name Status codes(.*?)@\}", raw, flags=re.S)
    if not block:
        sys.exit(f"capigen.py: no '@name Status codes' group in {path}")
    define = r"#define\s+(PUMPLOSS_[A-Z0-9_]+)\s+(0x[0-9A-Fa-f]+|\d+)\b"
    codes = [(m.group(1), int(m.group(2), 0)) for m in re.finditer(define, block.group(1))]
    code_names = {n for n, _ in codes}
    consts = [(m.group(1), int(m.group(2), 0)) for m in re.finditer(define, raw)
              if m.group(1) not in code_names and not m.group(1).startswith("PUMPLOSS_VERSION")]
    text = strip_comments(raw)
    handles = re.findall(r"typedef\s+struct\s+\w+\s+(\w+)\s*;", text)
    funcs = []
    for m in re.finditer(r"PUMPLOSS_API\s+([^;{}()]*?)\s*PUMPLOSS_CALL\s+(pumploss_\w+)\s*\(([^)]*)\)\s*;", text):
        ret, name, args = norm_type(m.group(1)), m.group(2), m.group(3).strip()
        if ret not in ("int", "void", "const char*"):
            sys.exit(f"capigen.py: {name}: return type '{ret}' is not one the C API conventions allow "
                     "(int status, void for destroy, const char* for static strings)")
        params = []
        if args and args != "void":
            for a in args.split(","):
                declared_array = re.search(r"\[\s*\]", a) is not None
                a = re.sub(r"\[\s*\]", "", a.strip())  # double x[] -> double *x
                pm = re.match(r"^(.*?)([A-Za-z_]\w*)$", a)
                if not pm:
                    sys.exit(f"capigen.py: {name}: cannot read parameter '{a}'")
                ctype = norm_type(pm.group(1) + ("*" if declared_array else ""))
                pname = pm.group(2)
                prm = classify(name, ctype, pname, handles)
                # An output is an array in a *_batch function, or when the header declares it
                # with [] (e.g. `double t_k[]`); its length is the product of the size_t
                # parameters. Any other double* / int* is one value.
                if prm.kind in ("DOUT", "IOUT", "ZOUT"):
                    prm.array = name.endswith("_batch") or declared_array
                params.append(prm)
        # a size_t right after a char* buffer is its capacity; other size_t make a batch function
        for i, p in enumerate(params):
            if p.kind == "SIZE" and i > 0 and params[i - 1].kind == "CBUF":
                p.kind = "BUFLEN"
        for i, p in enumerate(params):
            if p.kind == "CBUF" and (i + 1 >= len(params) or params[i + 1].kind != "BUFLEN"):
                sys.exit(f"capigen.py: {name}: char* {p.name} must be followed by its size_t capacity")
        funcs.append(Function(name, ret, params))
    if not funcs:
        sys.exit(f"capigen.py: no PUMPLOSS_API functions found in {path}")
    return funcs, handles, codes, consts


def array_counts(f):
    """The count-to-array rule, written once for every binding (the test table's arrays, the
    ctypes table's COUNTS for Python, the web module's lengths): parameter name -> the names of
    the size_t parameters whose product is that array's length. An input array (const double*,
    const int*) is counted by the run of size_t parameters nearest before it (`n` of a batch;
    `levels, per_level` of a grid; `n_dp` before `dp_pa`), else by the run right after it
    (`const double t_k[], size_t count`); an array output by all the size_t parameters."""
    ps = f.params
    sizes = tuple(p.name for p in ps if p.kind == "SIZE")
    counts = {}
    for idx, p in enumerate(ps):
        if p.kind in ("DOUT", "IOUT", "ZOUT") and p.array:
            counts[p.name] = sizes
        if p.kind not in ("DARR", "IARR"):
            continue
        j = idx - 1
        while j >= 0 and ps[j].kind != "SIZE":
            j -= 1
        run = []
        while j >= 0 and ps[j].kind == "SIZE":
            run.insert(0, ps[j].name)
            j -= 1
        if not run:  # the count follows its arrays
            j = idx + 1
            while j < len(ps) and ps[j].kind != "SIZE":
                j += 1
            while j < len(ps) and ps[j].kind == "SIZE":
                run.append(ps[j].name)
                j += 1
        counts[p.name] = tuple(run)
    return counts


def count_sources(f):
    """Where a caller's binding takes each size_t count from (by array_counts()): "after" (the
    length of the input arrays after it), "before" (of the arrays before it: the count follows
    its arrays) or "explicit" (no input array is counted by it alone, as the two counts of a
    levels x per_level grid: the caller gives it)."""
    ps = f.params
    counts = array_counts(f)
    arrays = [i for i, p in enumerate(ps) if p.kind in ("DARR", "IARR")]
    src = {}
    for i, p in enumerate(ps):
        if p.kind != "SIZE":
            continue
        mine = [k for k in arrays if counts[ps[k].name] == (p.name,)]
        src[p.name] = "explicit" if not mine else ("after" if any(k > i for k in mine) else "before")
    return src


def classify(fname, ctype, pname, handles):
    simple = {
        "double": "DIN", "int": "IIN", "size_t": "SIZE", "const double*": "DARR", "double*": "DOUT",
        "int*": "IOUT", "size_t*": "ZOUT", "const int*": "IARR", "const char*": "STR", "char*": "CBUF",
    }
    if ctype in simple:
        return Param(ctype, pname, simple[ctype])
    m = re.match(r"^(const )?(\w+)(\*+)$", ctype)
    if m and m.group(2) in handles:
        if m.group(3) == "*":
            return Param(ctype, pname, "HIN", m.group(2), bool(m.group(1)))
        if m.group(3) == "**" and not m.group(1):
            return Param(ctype, pname, "HOUT", m.group(2))
    sys.exit(f"capigen.py: {fname}: parameter '{ctype} {pname}' has a type the C API machinery does not "
             "know; use one of the documented kinds or add the kind to tools/capigen/capigen.py")


# First guesses of a valid input from the unit suffix of a parameter name (SI, typical of an
# axial piston pump on mineral oil). Only a starting point: the tests search around it.
SUFFIX_GUESS = [
    ("_j_kg_k", 1900.0), ("_pa_s", 0.04), ("_m2_s", 46e-6), ("_m3_s", 1e-3), ("_m3_rev", 50e-6),
    ("_kg_m3", 870.0), ("_kg_s", 1.0), ("_per_pa", 2e-8), ("_per_k", 6.5e-4), ("_rev_s", 25.0),
    ("_rad_s", 157.0), ("_n_m", 100.0), ("_m3", 1e-3), ("_m2", 1e-4), ("_pa", 1e7), ("_k", 313.15),
    ("_mm", 10.0), ("_um", 10.0), ("_m", 0.01), ("_kw", 10.0), ("_w", 1e4), ("_s", 1.0), ("_n", 1000.0),
    ("_deg", 15.0), ("_rad", 0.25),
]
WORD_GUESS = [
    (r"eta|eff", 0.9), (r"frac|ratio|share|fraction", 0.5), (r"^re$|reynolds", 1e5),
    (r"rough|eps", 1e-5), (r"sus", 200.0), (r"grade", 46.0), (r"count|pistons|^z$|^n_", 9.0),
    (r"^h|gap|clearance", 10e-6),
]


def guess(p):
    n = p.name.lower()
    for suf, v in SUFFIX_GUESS:
        if n.endswith(suf):
            return v
    for rx, v in WORD_GUESS:
        if re.search(rx, n):
            return v
    return 1.0


def c_string(s):
    return '"' + s.replace("\\", "\\\\").replace('"', '\\"') + '"'


# The member of tests/capi/capi_harness.hpp's Slot that carries each kind (handles apart).
SLOT = {"DIN": "d", "IIN": "i", "SIZE": "z", "BUFLEN": "z", "DARR": "cpd", "DOUT": "pd", "IOUT": "pi",
        "ZOUT": "pz", "IARR": "cpi", "STR": "s", "CBUF": "buf"}


def write_table(funcs, handles, codes, consts, out):
    w = out.write
    w("// Generated by tools/capigen/capigen.py from pumploss.h at build time: do not edit.\n")
    w("// Included by tests/capi/capi_harness.hpp.\n\n")
    w("namespace plcapi {\n\n")
    w(f"inline constexpr int kHandleTypeCount = {len(handles)};\n")
    w("inline const char* const kHandleTypes[] = {" + "".join(c_string(h) + ", " for h in handles) + "nullptr};\n")
    w("inline constexpr int kStatusCodes[] = {" + ", ".join(str(v) for _, v in codes) + "};\n")
    w("inline const char* const kStatusNames[] = {" + ", ".join(c_string(n) for n, _ in codes) + "};\n\n")
    w("namespace gen {\n")
    for i, f in enumerate(funcs):
        w(f"// {f.ret} {f.name}({', '.join(p.ctype + ' ' + p.name for p in f.params) or 'void'})\n")
        w(f"inline void thunk{i}([[maybe_unused]] Slot* a, Ret* r) {{\n")
        args = []
        pre, post = [], []
        for k, p in enumerate(f.params):
            if p.kind in SLOT:
                args.append(f"a[{k}].{SLOT[p.kind]}")
            elif p.kind == "HIN":
                c = "const " if p.const else ""
                args.append(f"static_cast<{c}{p.handle}*>(a[{k}].h)")
            elif p.kind == "HOUT":
                pre.append(f"  {p.handle}* h{k} = a[{k}].ph ? static_cast<{p.handle}*>(*a[{k}].ph) : nullptr;")
                args.append(f"a[{k}].ph ? &h{k} : nullptr")
                post.append(f"  if (a[{k}].ph) *a[{k}].ph = h{k};")
        call = f"{f.name}({', '.join(args)})"
        for line in pre:
            w(line + "\n")
        if f.ret == "int":
            w(f"  r->code = {call};\n")
        elif f.ret == "void":
            w(f"  {call};\n  r->code = 0;\n")
        else:
            w(f"  r->str = {call};\n")
        for line in post:
            w(line + "\n")
        w("}\n")
        if f.params:
            w(f"inline const Param params{i}[] = {{\n")
            for p in f.params:
                hidx = handles.index(p.handle) if p.handle else -1
                w(f"  {{K_{p.kind}, {c_string(p.name)}, {hidx}, {guess(p)!r}, {'true' if p.array else 'false'}, {'true' if p.const else 'false'}}},\n")
            w("};\n")
    w("}  // namespace gen\n\n")
    w("inline const Fn kFunctions[] = {\n")
    for i, f in enumerate(funcs):
        ret = {"int": "R_INT", "void": "R_VOID", "const char*": "R_STR"}[f.ret]
        if f.ret == "int" and not f.params:
            ret = "R_VALUE"  # e.g. pumploss_version_number(): an int value, not a status
        params = f"gen::params{i}" if f.params else "nullptr"
        w(f"  {{{c_string(f.name)}, {ret}, C_{f.cls}, {len(f.params)}, {params}, &gen::thunk{i}}},\n")
    w("};\n")
    w("inline constexpr int kFunctionCount = static_cast<int>(sizeof(kFunctions) / sizeof(kFunctions[0]));\n\n")
    w("}  // namespace plcapi\n")


def fortran_wrap(head, names, indent="      "):
    """'head(a, b, c)' broken into free-form lines of at most 100 characters."""
    lines, cur = [], head + "("
    for i, n in enumerate(names):
        piece = n + (", " if i + 1 < len(names) else ")")
        if len(cur) + len(piece) > 98:
            lines.append(cur + "&")
            cur = indent + "& "
        cur += piece
    if not names:
        cur += ")"
    lines.append(cur)
    return lines


def write_fortran(funcs, handles, codes, consts, out):
    w = out.write
    w("! Generated from pumploss.h by tools/capigen/capigen.py: do not edit.\n")
    w("! pumploss for Fortran 2003: ISO_C_BINDING interfaces of every C API function, the status\n")
    w("! codes, and pumploss_string() to read the C strings of pumploss_version() and\n")
    w("! pumploss_status_message(). Units are SI, as in pumploss.h. Pass strings as 'bar'//C_NULL_CHAR.\n")
    w("! Results are engineering estimates; defer to the pump maker's limits and local codes.\n")
    w("module pumploss\n  use, intrinsic :: iso_c_binding\n  implicit none\n\n")
    for n, v in codes + consts:
        w(f"  integer(c_int), parameter :: {n} = {v}\n")
    w("\n  interface\n")
    for f in funcs:
        names, seen = [], set()
        for p in f.params:
            nm = p.name
            while nm.lower() in seen or nm.lower() in ("rc_pl",) or nm.lower() == f.name.lower():
                nm += "_"
            seen.add(nm.lower())
            names.append(nm)
        batch = f.cls in ("BATCH", "CREATE", "METHOD") and any(p.kind == "SIZE" for p in f.params)
        if f.ret == "void":
            head = f"    subroutine {f.name}"
        else:
            head = f"    function {f.name}"
        lines = fortran_wrap(head, names)
        lines[-1] += f" &\n        bind(C, name=\"{f.name}\")"
        if f.ret != "void":
            lines[-1] += " result(rc_pl)"
        w("\n".join(lines) + "\n")
        w("      import\n")
        for p, nm in zip(f.params, names):
            if p.kind == "DIN":
                d = "real(c_double), value"
            elif p.kind == "IIN":
                d = "integer(c_int), value"
            elif p.kind in ("SIZE", "BUFLEN"):
                d = "integer(c_size_t), value"
            elif p.kind == "DARR":
                d = "real(c_double), intent(in)"
                nm += "(*)"
            elif p.kind == "DOUT":
                d = "real(c_double), intent(out)"
                nm += "(*)" if p.array else ""
            elif p.kind == "IOUT":
                d = "integer(c_int), intent(out)"
                nm += "(*)" if p.array else ""
            elif p.kind == "ZOUT":
                d = "integer(c_size_t), intent(out)"
                nm += "(*)" if p.array else ""
            elif p.kind == "IARR":
                d = "integer(c_int), intent(in)"
                nm += "(*)"
            elif p.kind == "STR":
                d = "character(kind=c_char), intent(in)"
                nm += "(*)"
            elif p.kind == "CBUF":
                d = "character(kind=c_char), intent(out)"
                nm += "(*)"
            elif p.kind == "HIN":
                d = "type(c_ptr), value"
            else:  # HOUT
                d = "type(c_ptr), intent(out)"
            w(f"      {d} :: {nm}\n")
        if f.ret == "int":
            w("      integer(c_int) :: rc_pl\n")
        elif f.ret == "const char*":
            w("      type(c_ptr) :: rc_pl\n")
        w(f"    end {'subroutine' if f.ret == 'void' else 'function'} {f.name}\n")
    w("  end interface\n\ncontains\n\n")
    w("  !> Copy a NUL-terminated C string (static storage in pumploss) into a Fortran string.\n")
    w("  function pumploss_string(p) result(s)\n")
    w("    type(c_ptr), intent(in) :: p\n")
    w("    character(len=:), allocatable :: s\n")
    w("    character(kind=c_char), pointer :: chars(:)\n")
    w("    integer :: n\n")
    w("    if (.not. c_associated(p)) then\n      s = ''\n      return\n    end if\n")
    w("    call c_f_pointer(p, chars, [4096])\n")
    w("    n = 0\n")
    w("    do while (n < 4096)\n      if (chars(n + 1) == c_null_char) exit\n      n = n + 1\n    end do\n")
    w("    allocate(character(len=n) :: s)\n")
    w("    s = transfer(chars(1:n), s)\n")
    w("  end function pumploss_string\n\n")
    w("end module pumploss\n")


def write_def(funcs, handles, codes, consts, out):
    out.write("; Generated from pumploss.h by tools/capigen/capigen.py at build time: do not edit.\n")
    out.write("; Exports of pumploss.dll: every function of the C API, undecorated.\n")
    out.write("LIBRARY pumploss\nEXPORTS\n")
    for f in sorted(funcs, key=lambda f: f.name):
        out.write(f"    {f.name}\n")


def write_python(funcs, handles, codes, consts, out):
    w = out.write
    w('"""ctypes signatures of the pumploss C API, generated from pumploss.h by\n')
    w('tools/capigen/capigen.py at build time: do not edit. Read by the Python package (python/pumploss).\n\n')
    w("FUNCTIONS: name -> (return type, ((kind, C type, parameter name), ...), names of the array\n")
    w("outputs). Kinds: see tools/capigen/capigen.py.\n")
    w('"""\n\n')
    w("FUNCTIONS = {\n")
    for f in funcs:
        params = "".join(f"({p.kind!r}, {p.ctype!r}, {p.name!r}), " for p in f.params)
        arrays = "".join(f"{p.name!r}, " for p in f.params if p.kind in ("DOUT", "IOUT", "ZOUT") and p.array)
        w(f"    {f.name!r}: ({f.ret!r}, ({params}), ({arrays})),\n")
    w("}\n\n# name -> {size_t parameter: 'after' | 'before' | 'explicit'}: where the count comes from\n")
    w("# (tools/capigen/capigen.py count_sources(): the one statement of the count-to-array rule)\n")
    w("COUNTS = {\n")
    for f in funcs:
        src = count_sources(f)
        if src:
            w(f"    {f.name!r}: {{" + ", ".join(f"{k!r}: {v!r}" for k, v in src.items()) + "},\n")
    w("}\n\n# name -> {array parameter: (size_t parameters whose product is its length)}: array_counts()\n")
    w("ARRAY_COUNTS = {\n")
    for f in funcs:
        dims = array_counts(f)
        if dims:
            w(f"    {f.name!r}: {{" + ", ".join(f"{k!r}: {v!r}" for k, v in dims.items()) + "},\n")
    w("}\n\nHANDLES = (" + "".join(f"{h!r}, " for h in handles) + ")\n\n")
    w("STATUS_CODES = {\n" + "".join(f"    {n!r}: {v},\n" for n, v in codes) + "}\n\n")
    w("CONSTANTS = {\n" + "".join(f"    {n!r}: {v},\n" for n, v in consts) + "}\n\n")
    w("DOCS = {\n" + "".join(f"    {f.name!r}: {DOCS.get(f.name, '')!r},\n" for f in funcs) + "}\n")


# Words a VBA parameter may not be called (keywords and statements); such names get a "_".
VBA_RESERVED = set("""and as boolean byref byte byval call case close const currency date declare dim do
double each else elseif empty end enum eqv erase error event exit false for friend function get
global gosub goto if imp implements in input integer is let lib like line lock long longlong longptr
loop lset me mid mod name new next not nothing null on open option optional or output paramarray
preserve print private property public put raiseevent random read redim rem resume return rset
seek select set shared single spc static step stop string sub tab then to true type typeof unlock
until variant wend while width with withevents write xor""".split())


def vba_name(n, taken):
    nm = n
    while nm.lower() in VBA_RESERVED or nm.lower() in taken:
        nm += "_"
    taken.add(nm.lower())
    return nm


def vba_declarations(funcs, codes, consts):
    lines = ["' ---- constants of pumploss.h ----------------------------------------------------------------"]
    for n, v in codes + consts:
        lines.append(f"Public Const {n} As Long = {v}")
    lines.append("")
    lines.append("' ---- declarations of every C function of pumploss.h ------------------------------------------")
    for f in funcs:
        taken = {f.name.lower()}
        args = []
        for p in f.params:
            nm = vba_name(p.name, taken)
            t = {
                "DIN": f"ByVal {nm} As Double", "IIN": f"ByVal {nm} As Long",
                "SIZE": f"ByVal {nm} As LongPtr", "BUFLEN": f"ByVal {nm} As LongPtr",
                "DARR": f"ByRef {nm} As Double", "DOUT": f"ByRef {nm} As Double",
                "IOUT": f"ByRef {nm} As Long", "ZOUT": f"ByRef {nm} As LongPtr",
                "IARR": f"ByRef {nm} As Long", "STR": f"ByVal {nm} As String",
                "CBUF": f"ByVal {nm} As String", "HIN": f"ByVal {nm} As LongPtr",
                "HOUT": f"ByRef {nm} As LongPtr",
            }[p.kind]
            args.append(t)
        if f.ret == "void":
            head, tail = f"Public Declare PtrSafe Sub {f.name} Lib \"pumploss.dll\" (", ")"
        else:
            ret = "LongPtr" if f.ret == "const char*" else "Long"
            head, tail = f"Public Declare PtrSafe Function {f.name} Lib \"pumploss.dll\" (", f") As {ret}"
        if not args:
            lines.append(head + tail)
            continue
        # three parameters per line: at most 24 line continuations in one VBA statement
        chunks = [", ".join(args[i:i + 3]) for i in range(0, len(args), 3)]
        if len(chunks) > 24:
            sys.exit(f"capigen.py: {f.name}: too many parameters for one VBA statement")
        lines.append(head + " _")
        for i, c in enumerate(chunks):
            lines.append("    " + c + ("," + " _" if i + 1 < len(chunks) else tail))
    return "\n".join(lines) + "\n"


def write_vba(funcs, handles, codes, consts, out, template):
    text = open(template, encoding="utf-8").read()
    if "' @DECLARATIONS@" not in text:
        sys.exit(f"capigen.py: {template} lacks the line \"' @DECLARATIONS@\"")
    text = text.replace("' @DECLARATIONS@\n", vba_declarations(funcs, codes, consts))
    # VBA modules are read as CRLF text by the host's importer
    out.write(text.replace("\r\n", "\n").replace("\n", "\r\n"))


# ---- comparison cases: the web module (web/gen_web.py, scripts/web_test.sh) against native ----

CASE_SCALES = (1.0, 0.5, 3.0)
# the C type of an output of each kind, and the printer of its values in the native program
OUT_C = {"DOUT": ("double", "pd"), "IOUT": ("int", "pi"), "ZOUT": ("size_t", "pz")}


def case_functions(funcs):
    """Scalar and batch functions with at most one count (each count is 3 in the cases)."""
    return [f for f in funcs if f.ret == "int" and f.params and f.cls in ("SCALAR", "BATCH")
            and sum(p.kind == "SIZE" for p in f.params) <= 1]


def case_inputs(f, scale):
    """Inputs of one case: each parameter's guess times `scale` (batches: three elements)."""
    vals, nstr = [], 0
    for p in f.params:
        g = guess(p)
        if p.kind == "DIN":
            vals.append(g * scale)
        elif p.kind == "IIN":
            vals.append(int(g))
        elif p.kind == "SIZE":
            vals.append(3)
        elif p.kind == "DARR":
            vals.append([g * scale, g * scale * 1.25, g * scale * 0.8])
        elif p.kind == "IARR":
            vals.append([int(g)] * 3)
        elif p.kind == "STR":
            vals.append(["bar", "psi", "degC"][min(nstr, 2)])
            nstr += 1
        else:
            vals.append(None)  # outputs
    return vals


def write_cases(funcs, handles, codes, consts, out):
    """The cases as JSON for the module's side: [{"fn": short name, "inputs": [...]}, ...]."""
    cases = []
    for f in case_functions(funcs):
        for s in CASE_SCALES:
            cases.append({"fn": f.name[len("pumploss_"):], "inputs": case_inputs(f, s)})
    json.dump(cases, out, indent=0)


def write_native(funcs, handles, codes, consts, out):
    """A C program that evaluates the cases with the native library, one JSON line per case."""
    w = out.write
    w("/* Generated from pumploss.h by web/gen_web.py: do not edit. Evaluates the comparison\n")
    w("   cases with the native library and prints one JSON line per case (hex floats). */\n")
    w("#include <stdio.h>\n#include \"pumploss.h\"\n\n")
    w("static int first;\n")
    w("static void pd(const char *name, const double *v, size_t n) {\n")
    w("  size_t i;\n  printf(\"%s\\\"%s\\\":[\", first ? \"\" : \",\", name);\n  first = 0;\n")
    w("  for (i = 0; i < n; ++i) printf(\"%s\\\"%a\\\"\", i ? \",\" : \"\", v[i]);\n  printf(\"]\");\n}\n")
    if any(p.kind == "ZOUT" for f in case_functions(funcs) for p in f.params):
        w("static void pz(const char *name, const size_t *v) {\n")
        w("  printf(\"%s\\\"%s\\\":[%lu]\", first ? \"\" : \",\", name, (unsigned long)v[0]);\n  first = 0;\n}\n")
    w("static void pi(const char *name, const int *v, size_t n) {\n")
    w("  size_t i;\n  printf(\"%s\\\"%s\\\":[\", first ? \"\" : \",\", name);\n  first = 0;\n")
    w("  for (i = 0; i < n; ++i) printf(\"%s%d\", i ? \",\" : \"\", v[i]);\n  printf(\"]\");\n}\n\n")
    w("int main(void) {\n  int st;\n")
    k = 0
    for f in case_functions(funcs):
        short = f.name[len("pumploss_"):]
        for s in CASE_SCALES:
            vals = case_inputs(f, s)
            w("  {\n")
            args = []
            for p, v in zip(f.params, vals):
                if p.kind == "DIN":
                    args.append(repr(float(v)))
                elif p.kind in ("IIN", "SIZE"):
                    args.append(str(v))
                elif p.kind in ("DARR", "IARR"):
                    ctype, fmt = ("double", lambda x: repr(float(x))) if p.kind == "DARR" else ("int", str)
                    w(f"    const {ctype} a_{p.name}[3] = {{{', '.join(fmt(x) for x in v)}}};\n")
                    args.append(f"a_{p.name}")
                elif p.kind == "STR":
                    args.append(json.dumps(v))
                elif p.kind in OUT_C or p.kind == "CBUF":
                    ctype, size = (OUT_C[p.kind][0], 9) if p.kind in OUT_C else ("char", 1024)
                    w(f"    {ctype} o_{p.name}[{size}];\n")
                    args.append(f"o_{p.name}")
                elif p.kind == "BUFLEN":
                    args.append("1024")
            w(f"    st = {f.name}({', '.join(args)});\n")
            w(f"    printf(\"{{\\\"case\\\":{k},\\\"fn\\\":\\\"{short}\\\",\\\"status\\\":%d,\\\"out\\\":{{\", st);\n    first = 1;\n")
            n = 3 if any(p.kind == "SIZE" for p in f.params) else 1
            for p in f.params:
                if p.kind == "ZOUT":
                    w(f"    pz(\"{p.name}\", o_{p.name});\n")
                elif p.kind in OUT_C:
                    w(f"    {OUT_C[p.kind][1]}(\"{p.name}\", o_{p.name}, {n if p.array else 1});\n")
            w("    printf(\"}}\\n\");\n  }\n")
            k += 1
    w("  return 0;\n}\n")


WRITERS = {"table": write_table, "fortran": write_fortran, "def": write_def, "python": write_python,
           "cases": write_cases, "native": write_native}
ALL = {"def": "pumploss.def", "python": "pumploss_signatures.py", "fortran": "pumploss.f90", "vba": "pumploss.bas"}
VBA_TEMPLATE = os.path.join(os.path.dirname(os.path.abspath(__file__)), "pumploss.bas.in")


def render(mode, parsed):
    buf = io.StringIO(newline="")
    if mode == "vba":
        write_vba(*parsed, buf, VBA_TEMPLATE)
    else:
        WRITERS[mode](*parsed, buf)
    return buf.getvalue()


def write_if_changed(path, text):
    """Write only when the text changed, so dependants are not rebuilt for nothing."""
    try:
        with open(path, encoding="utf-8", newline="") as f:
            if f.read() == text:
                return
    except OSError:
        pass
    with open(path, "w", encoding="utf-8", newline="") as f:
        f.write(text)


def main(argv):
    modes = ("all", "list", "vba") + tuple(WRITERS)
    if len(argv) < 3 or argv[1] not in modes or (argv[1] != "list" and len(argv) < 4):
        sys.exit(__doc__)
    parsed = parse(argv[2])
    funcs, handles, codes, consts = parsed
    if argv[1] == "list":
        for f in funcs:
            print(f"{f.cls:8} {f.ret:12} {f.name}(" + ", ".join(p.kind + " " + p.name for p in f.params) + ")")
        print(f"{len(funcs)} functions, {len(handles)} handle types, {len(codes)} status codes, "
              f"{len(consts)} option constants")
        return 0
    if argv[1] == "all":
        os.makedirs(argv[3], exist_ok=True)
        for mode, name in ALL.items():
            write_if_changed(os.path.join(argv[3], name), render(mode, parsed))
        return 0
    write_if_changed(argv[3], render(argv[1], parsed))
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
