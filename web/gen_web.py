#!/usr/bin/env python3
"""Write the WebAssembly bindings of pumploss from pumploss.h (the one source of every binding).

    gen_web.py exports HEADER OUT.json   the symbols emcc keeps (-sEXPORTED_FUNCTIONS=@OUT.json)
    gen_web.py module  HEADER OUT.mjs    the ES module: every C function by its name without the
                                         prefix, SI units, errors as exceptions (see below)
    gen_web.py dts     HEADER OUT.d.ts   TypeScript declarations of that module
    gen_web.py cases   HEADER OUT.json   the comparison cases of the tests: every scalar and batch
                                         function at inputs guessed from the parameter units
    gen_web.py native  HEADER OUT.c      a C program that evaluates those cases with the native
                                         library and prints the results as JSON (hex floats)

The header is read by the C API generator's parser (its path is found beside this file's
repository root, or given by PUMPLOSS_CAPIGEN), so the web module knows exactly the functions,
parameter kinds and status codes the C tests know; the count of each array (capigen's
array_counts()) and the comparison cases (capigen's `cases` and `native` modes) come from it too.

Calling convention of the ES module (stated in the .d.ts and docs/pages/web.md):
- inputs in the order of the C declaration, outputs left out; size_t counts stay explicit;
- the result is an object of the named outputs (numbers, Float64Array / Int32Array / Uint32Array for arrays,
  strings for text buffers) plus `status`: 0, or a report code >= 100 whose outputs are valid;
- an error code (1-99) throws PumplossError {fn, status, message}; no NaN leaves a call unnoticed;
- create functions return a Handle; destroy functions take it and mark it destroyed.
"""
import importlib.util
import json
import os
import sys

HERE = os.path.dirname(os.path.abspath(__file__))
ROOT = os.path.dirname(HERE)


def load_capigen():
    path = os.environ.get("PUMPLOSS_CAPIGEN") or os.path.join(ROOT, "tools", "capigen", "capigen.py")
    spec = importlib.util.spec_from_file_location("capigen", path)
    mod = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(mod)
    return mod


CG = load_capigen()
PREFIX = "pumploss_"


def short(name):
    return name[len(PREFIX):]


def out_len_expr(f):
    """JS expression of an output array's length: the product of the function's size_t params."""
    return " * ".join(p.name for p in f.params if p.kind == "SIZE") or "1"


def in_len_expr(f, idx):
    """JS expression of an input array's length: the product of its counts (capigen's
    array_counts(), the one statement of the count-to-array rule)."""
    return " * ".join(CG.array_counts(f)[f.params[idx].name]) or "0"


# ---- the ES module -------------------------------------------------------------------------

MODULE_HEAD = '''\
// Generated from pumploss.h by web/gen_web.py: do not edit.
// pumploss in the browser: the C API compiled to WebAssembly, every function by its name
// without the prefix, SI units. Results are engineering estimates; the pump maker's limits,
// local codes and licensed practice take precedence.
import createCore from './pumploss_core.mjs';

/** An error status (1-99) of a pumploss call: the outputs would have been NaN. */
export class PumplossError extends Error {
  constructor(fn, status, message) {
    super(`${fn}: ${message} (status ${status})`);
    this.name = 'PumplossError';
    this.fn = fn;
    this.status = status;
  }
}

/** An opaque handle made by a create function; give it back to the matching destroy. */
export class Handle {
  constructor(type, ptr, status) { this.type = type; this.ptr = ptr; this.status = status; }
  get destroyed() { return this.ptr === 0; }
}

export const isError = (st) => st > 0 && st < 100;
export const isReport = (st) => st >= 100;

class Core {
  constructor(m) {
    this.m = m;
    this.scratch = m._malloc(4096);  // scalar outputs and short strings of one call
  }
  f64(ptr, i) { return this.m.HEAPF64[(ptr >> 3) + i]; }
  i32(ptr, i) { return this.m.HEAP32[(ptr >> 2) + i]; }
  darr(fn, name, a, n) {  // copy an input array into the heap
    if (a == null || typeof a.length !== 'number' || a.length < n) {
      throw new RangeError(`${fn}: ${name} needs ${n} numbers`);
    }
    const p = n > 0 ? this.m._malloc(8 * n) : 0;
    if (n > 0) this.m.HEAPF64.set(a.length === n ? a : Array.prototype.slice.call(a, 0, n), p >> 3);
    return p;
  }
  iarr(fn, name, a, n) {
    if (a == null || typeof a.length !== 'number' || a.length < n) {
      throw new RangeError(`${fn}: ${name} needs ${n} integers`);
    }
    const p = n > 0 ? this.m._malloc(4 * n) : 0;
    if (n > 0) this.m.HEAP32.set(Array.prototype.slice.call(a, 0, n), p >> 2);
    return p;
  }
  str(s) {
    const n = this.m.lengthBytesUTF8(String(s)) + 1;
    const p = this.m._malloc(n);
    this.m.stringToUTF8(String(s), p, n);
    return p;
  }
  handle(fn, type, h, allowDestroyed) {
    if (!(h instanceof Handle) || h.type !== type) throw new TypeError(`${fn}: expects a ${type} handle`);
    if (h.ptr === 0 && !allowDestroyed) throw new TypeError(`${fn}: the ${type} handle was destroyed`);
    return h.ptr;
  }
  check(fn, st) {
    if (st > 0 && st < 100) throw new PumplossError(fn, st, this.m.UTF8ToString(this.m._pumploss_status_message(st)));
    return st;
  }
}

/**
 * Load the WebAssembly module and return the pumploss functions.
 * @returns {Promise<Pumploss>}
 */
export default async function loadPumploss() {
  const c = new Core(await createCore());
  const api = {};
'''


def js_function(f):
    """The JS body of one C function (straight-line code, no interpretation per call)."""
    fn = short(f.name)
    ins = [p for p in f.params if p.kind in ("DIN", "IIN", "SIZE", "DARR", "IARR", "STR", "HIN")]
    sig = ", ".join(p.name for p in ins)
    L = [f"  api.{fn} = function ({sig}) {{"]
    if f.ret == "const char*":
        args = []
        for p in f.params:
            if p.kind == "IIN":
                args.append(f"({p.name} | 0)")
            elif p.kind == "HIN":
                args.append(f"c.handle('{fn}', '{p.handle}', {p.name}, false)")
            else:
                raise SystemExit(f"gen_web.py: {f.name}: string function with a {p.kind} parameter")
        L.append(f"    return m.UTF8ToString(m._{f.name}({', '.join(args)}));")
        L.append("  };")
        return L
    if f.ret == "int" and not f.params:
        L.append(f"    return m._{f.name}();")
        L.append("  };")
        return L
    if f.cls == "DESTROY":
        p = f.params[0]
        L.append(f"    const ptr = c.handle('{fn}', '{p.handle}', {p.name}, true);")
        L.append(f"    if (ptr !== 0) m._{f.name}(ptr);")
        L.append(f"    {p.name}.ptr = 0;")
        L.append("  };")
        return L
    n_expr = out_len_expr(f)
    frees, args, reads = [], [], []
    slot = 0  # 8-byte slots of the scratch area
    L.append("    const s = c.scratch;")
    for idx, p in enumerate(f.params):
        k = p.kind
        if k == "DIN":
            args.append(f"+{p.name}")
        elif k in ("IIN",):
            args.append(f"({p.name} | 0)")
        elif k == "SIZE":
            L.append(f"    if (!(Number.isInteger({p.name}) && {p.name} >= 0)) throw new RangeError('{fn}: {p.name} must be a count');")
            args.append(f"{p.name}")
        elif k == "BUFLEN":
            args.append("1024")
        elif k == "DARR":
            L.append(f"    const p_{p.name} = c.darr('{fn}', '{p.name}', {p.name}, {in_len_expr(f, idx)});")
            frees.append(f"p_{p.name}")
            args.append(f"p_{p.name}")
        elif k == "IARR":
            L.append(f"    const p_{p.name} = c.iarr('{fn}', '{p.name}', {p.name}, {in_len_expr(f, idx)});")
            frees.append(f"p_{p.name}")
            args.append(f"p_{p.name}")
        elif k == "STR":
            L.append(f"    const p_{p.name} = c.str({p.name});")
            frees.append(f"p_{p.name}")
            args.append(f"p_{p.name}")
        elif k == "CBUF":
            L.append(f"    const p_{p.name} = m._malloc(1024);")
            frees.append(f"p_{p.name}")
            args.append(f"p_{p.name}")
            reads.append(f"{p.name}: m.UTF8ToString(p_{p.name})")
        elif k == "HIN":
            args.append(f"c.handle('{fn}', '{p.handle}', {p.name}, false)")
        elif k == "HOUT":
            args.append(f"s + {8 * slot}")
            reads.append(f"__handle: new Handle('{p.handle}', m.HEAPU32[(s + {8 * slot}) >> 2], st)")
            L.append(f"    m.HEAPU32[(s + {8 * slot}) >> 2] = 0;")
            slot += 1
        elif k in ("DOUT", "IOUT", "ZOUT"):
            key = "element_status" if p.name == "status" else p.name  # `status` is the call's
            if p.array:
                size = 8 if k == "DOUT" else 4  # size_t: 32 bits in wasm32
                L.append(f"    const n_{p.name} = {n_expr};")
                L.append(f"    const p_{p.name} = n_{p.name} > 0 ? m._malloc({size} * n_{p.name}) : 0;")
                frees.append(f"p_{p.name}")
                args.append(f"p_{p.name}")
                view = {"DOUT": "HEAPF64", "IOUT": "HEAP32", "ZOUT": "HEAPU32"}[k]
                arr = {"DOUT": "Float64Array", "IOUT": "Int32Array", "ZOUT": "Uint32Array"}[k]
                sh = 3 if k == "DOUT" else 2
                reads.append(f"{key}: {arr}.from(m.{view}.subarray(p_{p.name} >> {sh}, (p_{p.name} >> {sh}) + n_{p.name}))")
            else:
                args.append(f"s + {8 * slot}")
                if k == "DOUT":
                    reads.append(f"{key}: c.f64(s, {slot})")
                elif k == "ZOUT":  # size_t: 32 bits in wasm32
                    reads.append(f"{key}: m.HEAPU32[(s + {8 * slot}) >> 2]")
                else:
                    reads.append(f"{key}: c.i32(s + {8 * slot}, 0)")
                slot += 1
        else:
            raise SystemExit(f"gen_web.py: {f.name}: unknown kind {k}")
    if slot * 8 > 4096 - 8:
        raise SystemExit(f"gen_web.py: {f.name}: too many outputs for the scratch area")
    call = f"m._{f.name}({', '.join(args)})"
    if frees:
        L.append("    let st;")
        L.append("    try {")
        L.append(f"      st = {call};")
        L.append(f"      c.check('{fn}', st);")
        result = "{ " + ", ".join(reads + ["status: st"]) + " }"
        L.append(f"      return {result};" if f.cls != "CREATE" else f"      return ({result}).__handle;")
        L.append("    } finally {")
        for v in frees:
            L.append(f"      if ({v}) m._free({v});")
        L.append("    }")
    else:
        L.append(f"    const st = {call};")
        L.append(f"    c.check('{fn}', st);")
        result = "{ " + ", ".join(reads + ["status: st"]) + " }"
        L.append(f"    return {result};" if f.cls != "CREATE" else f"    return ({result}).__handle;")
    L.append("  };")
    return L


def write_module(funcs, handles, codes, out, consts=()):
    w = out.write
    w(MODULE_HEAD)
    w("  const m = c.m;\n")
    for f in funcs:
        w("\n".join(js_function(f)) + "\n")
    w("  api.STATUS = Object.freeze({" + ", ".join(f"{n[len('PUMPLOSS_'):]}: {v}" for n, v in codes) + "});\n")
    w("  api.CONSTANTS = Object.freeze({" + ", ".join(f"{n[len('PUMPLOSS_'):]}: {v}" for n, v in consts) + "});\n")
    w("  api.isError = isError;\n  api.isReport = isReport;\n")
    w("  return Object.freeze(api);\n}\n")


# ---- TypeScript declarations ---------------------------------------------------------------

def ts_type(p):
    return {
        "DIN": "number", "IIN": "number", "SIZE": "number", "DARR": "ArrayLike<number>",
        "IARR": "ArrayLike<number>", "STR": "string",
    }.get(p.kind, "Handle")


def write_dts(funcs, handles, codes, out, consts=()):
    w = out.write
    w("// Generated from pumploss.h by web/gen_web.py: do not edit.\n")
    w("// Units are SI and part of each parameter name (dp_pa, mu_pa_s, q_m3_s, t_k).\n")
    w("// Error statuses (1-99) throw PumplossError; report statuses (>= 100) come back in `status`.\n\n")
    w("export declare class PumplossError extends Error {\n  readonly fn: string;\n  readonly status: number;\n}\n")
    w("export declare class Handle {\n  readonly type: string;\n  readonly ptr: number;\n  readonly status: number;\n  readonly destroyed: boolean;\n}\n")
    w("export declare function isError(status: number): boolean;\nexport declare function isReport(status: number): boolean;\n\n")
    w("export interface Pumploss {\n")
    for f in funcs:
        fn = short(f.name)
        ins = [p for p in f.params if p.kind in ("DIN", "IIN", "SIZE", "DARR", "IARR", "STR", "HIN")]
        sig = ", ".join(f"{p.name}: {ts_type(p)}" for p in ins)
        if f.ret == "const char*":
            ret = "string"
        elif f.ret == "int" and not f.params:
            ret = "number"
        elif f.cls == "DESTROY":
            ret = "void"
        elif f.cls == "CREATE":
            ret = "Handle"
        else:
            fields = []
            for p in f.params:
                key = "element_status" if p.name == "status" else p.name
                if p.kind == "DOUT":
                    fields.append(f"{key}: {'Float64Array' if p.array else 'number'}")
                elif p.kind == "IOUT":
                    fields.append(f"{key}: {'Int32Array' if p.array else 'number'}")
                elif p.kind == "ZOUT":
                    fields.append(f"{key}: {'Uint32Array' if p.array else 'number'}")
                elif p.kind == "CBUF":
                    fields.append(f"{p.name}: string")
            ret = "{ " + "; ".join(fields + ["status: number"]) + " }"
        w(f"  /** {f.name} of pumploss.h. */\n")
        w(f"  {fn}({sig}): {ret};\n")
    w("  readonly STATUS: Readonly<{" + " ".join(f"{n[len('PUMPLOSS_'):]}: {v};" for n, v in codes) + "}>;\n")
    w("  /** Option constants of pumploss.h by name without the prefix (PUMPLOSS_STATE_DEADHEAD: STATE_DEADHEAD). */\n")
    w("  readonly CONSTANTS: Readonly<{" + " ".join(f"{n[len('PUMPLOSS_'):]}: {v};" for n, v in consts) + "}>;\n")
    w("  isError(status: number): boolean;\n  isReport(status: number): boolean;\n")
    w("}\n\n/** Load the WebAssembly module (single file, works offline). */\n")
    w("export default function loadPumploss(): Promise<Pumploss>;\n")


def main():
    if len(sys.argv) != 4:
        sys.exit(__doc__)
    mode, header, dest = sys.argv[1:]
    parsed = CG.parse(header)
    funcs, handles, codes = parsed[:3]
    consts = parsed[3] if len(parsed) > 3 else ()
    with open(dest, "w", encoding="utf-8", newline="\n") as out:
        if mode == "exports":
            json.dump([f"_{f.name}" for f in funcs] + ["_malloc", "_free"], out)
        elif mode == "module":
            write_module(funcs, handles, codes, out, consts)
        elif mode == "dts":
            write_dts(funcs, handles, codes, out, consts)
        elif mode in ("cases", "native"):  # the comparison cases: a capigen mode
            CG.WRITERS[mode](funcs, handles, codes, consts, out)
        else:
            sys.exit(__doc__)


if __name__ == "__main__":
    main()
