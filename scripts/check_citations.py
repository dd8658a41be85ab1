#!/usr/bin/python3
"""Every file a comment or a page cites must exist in the repository.

Scans the comments of C, C++, Python, shell and CMake sources and the whole text of Markdown and
plain-text pages for citations of files (a page, a header path, a table) and fails when a
cited file is not in the tree. A citation resolves when the path exists relative to the
repository root or to the citing file's folder, when a tracked file ends with the cited path
(`pumploss/gap.hpp`), or, for a bare name, when a tracked file has that name. Not citations:
URLs, placeholders in capitals (`OUT.f90`), paths under build folders, files generated at build
time (GENERATED), and in Markdown the fenced code blocks, backticked commands (with a space) and
backticked bare names (files a user or the program makes). Phrases that point at
notes kept outside the tree fail too (BANNED): cite the published source, a theory page
docs/pages/theory_*.md or tests/reference/SOURCES.md instead.

Usage: scripts/check_citations.py [--root DIR] [FILE_OR_DIR ...]
Without paths it scans the folders listed in SCANNED below. Exit status 0 when every citation
resolves, 1 otherwise (each failure printed as path:line: message).
"""
import argparse
import os
import re
import subprocess
import sys

# Folders (and top-level files) scanned by default.
SCANNED = ["include", "src", "capi", "tests", "examples", "docs", "scripts", "bench", "app", "cmake",
           "README.md", "DEVELOPERS.md", "CMakeLists.txt"]
# Extensions that make a word a file citation.
EXTENSIONS = ("md", "hpp", "h", "cpp", "c", "ipp", "py", "sh", "txt", "cmake", "in", "def", "map",
              "json", "csv", "toml", "f90", "bas", "cfg", "yml", "yaml", "ini")
# Files that exist only in a build folder (generated at build time), cited on purpose.
GENERATED = {"pumploss_export.h", "pumploss.def", "pumploss.f90", "pumploss.bas", "compile_commands.json",
             "CMakeCache.txt", "Doxyfile", "pumploss_capi_generated.h", "exports_generated.txt"}
# Phrases that cite a note outside the repository.
BANNED = [re.compile(r"\bdesign notes?\b", re.I), re.compile(r"\bmethods\.md\b"), re.compile(r"\barchitecture\.md\b")]

CITATION = re.compile(
    r"(?<![\w/.<>*{}$@%-])((?:\.{1,2}/)?(?:[\w.-]+/)*[\w-]+(?:\.[\w-]+)*\.(?:" + "|".join(EXTENSIONS) +
    r"))(?![\w<>*{}/(-])")
URL = re.compile(r"\b(?:https?|ftp|file)://\S+|\bwww\.\S+|\b[\w-]+(?:\.[\w-]+)+\.(?:org|com|net|io|de)\b\S*")
C_LIKE = {".hpp", ".h", ".cpp", ".c", ".ipp", ".cc", ".hh"}
HASH_LIKE = {".py", ".sh", ".cmake", ".toml", ".yml", ".yaml", ".cfg", ".in"}
PAGES = {".md", ".txt", ".dox"}


def comments_c(text):
    """(line number, comment text) of // and /* */ comments, skipping string literals."""
    out, i, line, n = [], 0, 1, len(text)
    while i < n:
        ch = text[i]
        if ch == "\n":
            line += 1
            i += 1
        elif ch == '"' or ch == "'":
            j = i + 1
            while j < n and text[j] != ch and text[j] != "\n":
                j += 2 if text[j] == "\\" else 1
            i = j + 1
        elif text.startswith("//", i):
            j = text.find("\n", i)
            j = n if j < 0 else j
            out.append((line, text[i:j]))
            i = j
        elif text.startswith("/*", i):
            j = text.find("*/", i + 2)
            j = n if j < 0 else j + 2
            for k, part in enumerate(text[i:j].split("\n")):
                out.append((line + k, part))
            line += text.count("\n", i, j)
            i = j
        else:
            i += 1
    return out


def comments_hash(text, python):
    """(line number, comment text) of # comments (and Python docstrings)."""
    out = []
    in_doc = None
    for no, raw in enumerate(text.split("\n"), 1):
        if python:
            stripped = raw.strip()
            if in_doc:
                out.append((no, raw))
                if in_doc in stripped:
                    in_doc = None
                continue
            for q in ('"""', "'''"):
                if stripped.startswith(q) or stripped.startswith("r" + q):
                    out.append((no, raw))
                    if stripped.count(q) == 1:
                        in_doc = q
                    break
            if in_doc or stripped.startswith(('"""', "'''", 'r"""')):
                continue
        m = re.search(r"(?:^|\s)#(?![!{])(.*)$", raw)
        if m and not raw.lstrip().startswith("#include"):
            out.append((no, m.group(1)))
    return out


def markdown_lines(text):
    """(line number, text) of a page without fenced code, backticked commands and backticked bare
    names (those name files a user or a program makes, not sources)."""
    out, fenced = [], False
    for no, raw in enumerate(text.split("\n"), 1):
        if raw.lstrip().startswith(("```", "~~~")):
            fenced = not fenced
            continue
        if fenced:
            continue
        out.append((no, re.sub(r"`([^`]*)`", lambda m: " " if (" " in m.group(1) or "/" not in m.group(1))
                               and not any(b.search(m.group(1)) for b in BANNED) else m.group(0), raw)))
    return out


def scanned_lines(path, text):
    """The (line, text) pairs of a file that may hold citations."""
    base = os.path.basename(path)
    ext = os.path.splitext(base)[1].lower()
    if ext == ".md":
        return markdown_lines(text)
    if ext in PAGES and base != "CMakeLists.txt":
        return list(enumerate(text.split("\n"), 1))
    if ext in C_LIKE:
        return comments_c(text)
    if ext in HASH_LIKE or base == "CMakeLists.txt":
        return comments_hash(text, ext == ".py")
    return []


def tracked_files(root):
    """Paths of the repository's files (git ls-files, else a walk without build folders)."""
    try:
        out = subprocess.run(["git", "-C", root, "ls-files", "--cached", "--others", "--exclude-standard"],
                             check=True, capture_output=True, text=True).stdout
        files = [f for f in out.split("\n") if f]
        if files:
            return files
    except (OSError, subprocess.CalledProcessError):
        pass
    files = []
    for d, subdirs, names in os.walk(root):
        subdirs[:] = [s for s in subdirs if not s.startswith(("build", ".git"))]
        files += [os.path.relpath(os.path.join(d, f), root) for f in names]
    return files


class Resolver:
    """Answers whether a cited path names a file of the repository."""

    def __init__(self, root, files):
        self.root = root
        self.files = set(f.replace(os.sep, "/") for f in files)
        self.names = set(os.path.basename(f) for f in self.files)

    def exists(self, cited, citing):
        cited = cited.rstrip(".")
        if os.path.basename(cited) in GENERATED:
            return True
        if os.path.exists(os.path.join(self.root, cited)):
            return True
        if os.path.exists(os.path.join(self.root, os.path.dirname(citing), cited)):
            return True
        if "/" not in cited:
            return cited in self.names
        tail = cited.lstrip("./")
        return any(f == tail or f.endswith("/" + tail) for f in self.files)


def check_file(path, rel, resolver, errors):
    try:
        with open(path, encoding="utf-8") as f:
            text = f.read()
    except (UnicodeDecodeError, OSError):
        return
    for no, line in scanned_lines(rel, text):
        for pat in BANNED:
            m = pat.search(line)
            if m:
                errors.append("%s:%d: cites a note outside the repository (%r): cite the published source, "
                              "a theory page or tests/reference/SOURCES.md" % (rel, no, m.group(0)))
        clean = URL.sub(" ", line)
        for m in CITATION.finditer(clean):
            cited = m.group(1)
            stem = os.path.basename(cited).split(".")[0]
            if re.fullmatch(r"[\d.]+", stem) or re.fullmatch(r"[A-Z][A-Z0-9_]*", stem):
                continue  # a number or a placeholder such as OUT.f90
            if cited.startswith("build") or (cited.endswith(".in") and "/" not in cited and
                                             not resolver.exists(cited, rel)):
                continue  # build output; "lbf.in" is a unit symbol, not a file
            if not resolver.exists(cited, rel):
                errors.append("%s:%d: cites %s, which is not in the repository" % (rel, no, cited))


def main(argv):
    ap = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    ap.add_argument("--root", default=os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
    ap.add_argument("paths", nargs="*")
    args = ap.parse_args(argv)
    root = os.path.abspath(args.root)
    resolver = Resolver(root, tracked_files(root))
    targets = args.paths or [p for p in SCANNED if os.path.exists(os.path.join(root, p))]
    errors, count = [], 0
    for t in targets:
        full = t if os.path.isabs(t) else os.path.join(root, t)
        if os.path.isfile(full):
            walk = [(os.path.dirname(full), [], [os.path.basename(full)])]
        else:
            walk = os.walk(full)
        for d, subdirs, names in walk:
            subdirs[:] = [s for s in subdirs if not s.startswith(("build", ".git", "__pycache__"))]
            for name in sorted(names):
                p = os.path.join(d, name)
                rel = os.path.relpath(p, root).replace(os.sep, "/")
                if "/corpus/" in rel:
                    continue
                count += 1
                check_file(p, rel, resolver, errors)
    for e in errors:
        print(e)
    print("check_citations: %d files scanned, %d unresolved citations" % (count, len(errors)))
    return 1 if errors else 0


if __name__ == "__main__":
    sys.exit(main(sys.argv[1:]))
