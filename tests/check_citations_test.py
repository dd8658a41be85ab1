#!/usr/bin/python3
"""Tests of scripts/check_citations.py on small trees made here: a dangling citation, a note
outside the tree and a citation that resolves in several ways (run by ctest as
check_citations_selftest, with /usr/bin/python3)."""
import os
import subprocess
import sys
import tempfile
import unittest

SCRIPT = os.path.join(os.path.dirname(os.path.dirname(os.path.abspath(__file__))), "scripts", "check_citations.py")


def run(files):
    """Write the files into a fresh folder, run the checker on it, return (exit code, output)."""
    with tempfile.TemporaryDirectory() as root:
        for rel, text in files.items():
            path = os.path.join(root, rel)
            os.makedirs(os.path.dirname(path), exist_ok=True)
            with open(path, "w", encoding="utf-8") as f:
                f.write(text)
        p = subprocess.run([sys.executable, SCRIPT, "--root", root, "include", "docs", "tests"],
                           capture_output=True, text=True)
        return p.returncode, p.stdout


BASE = {
    "docs/pages/theory_gap.md": "# Gaps\nSee `tests/reference/SOURCES.md` and include/pumploss/gap.hpp.\n",
    "tests/reference/SOURCES.md": "| key | tag | source |\n",
    "include/pumploss/gap.hpp": "/// @par Source\n/// docs/pages/theory_gap.md; pumploss/gap.hpp; SOURCES.md.\n",
}


class CheckCitations(unittest.TestCase):
    def fails_with(self, path, text, message):
        """The base tree with `path` holding `text` fails, and the output names `message`."""
        files = dict(BASE)
        files[path] = text
        code, out = run(files)
        self.assertEqual(code, 1, out)
        self.assertIn(message, out)

    def test_resolving_citations_pass(self):
        code, out = run(BASE)
        self.assertEqual(code, 0, out)

    def test_dangling_citation_in_a_comment_fails(self):
        self.fails_with("include/pumploss/orifice.hpp", "// Source: docs/pages/theory_orifice.md (missing)\nint x;\n",
                        "include/pumploss/orifice.hpp:1: cites docs/pages/theory_orifice.md")

    def test_dangling_bare_name_in_a_block_comment_fails(self):
        self.fails_with("tests/gap_test.cpp", "int a;\n/* check values:\n   from notes.md section 6 */\n",
                        "tests/gap_test.cpp:3: cites notes.md")

    def test_dangling_citation_in_a_page_fails(self):
        self.fails_with("docs/pages/capi.md", "Handles: see docs/pages/handles.md.\n",
                        "docs/pages/capi.md:1: cites docs/pages/handles.md")

    def test_note_outside_the_tree_fails(self):
        self.fails_with("include/pumploss/fluid.hpp", "/// @par Source\n/// The design note, section 9.\n",
                        "outside the repository")

    def test_code_strings_urls_outputs_and_placeholders_pass(self):
        files = dict(BASE)
        files["tests/x_test.cpp"] = ('#include "missing_header.hpp"\nconst char* f = "out/missing.csv";\n'
                                     "// see https://example.org/a/b.md and OUT.f90\n")
        files["docs/pages/cli.md"] = ("Writes `report.txt`; run `cc app.c -lpumploss`.\n"
                                      "```\ncat missing/file.txt\n```\n")
        code, out = run(files)
        self.assertEqual(code, 0, out)


if __name__ == "__main__":
    unittest.main()
