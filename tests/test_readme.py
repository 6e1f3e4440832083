"""The README's Python examples run as written, in order, in one namespace,
and print what the README says they print (the comment lines after each
print, compared with whitespace normalised). A changed sentence or API shows
here before a reader meets it."""

from __future__ import annotations

import contextlib
import io
import os
import re
from pathlib import Path

README = Path(__file__).resolve().parents[1] / "README.md"


def blocks() -> list[str]:
    return re.findall(r"```python\n(.*?)```", README.read_text(encoding="utf-8"), re.S)


def expected_prints(code: str) -> list[str]:
    """What each print is said to print: its trailing comment, or the comment lines right after it."""
    out, lines = [], code.splitlines()
    for i, line in enumerate(lines):
        if not line.lstrip().startswith(("print(", "for ")) and "print(" not in line:
            continue
        said = []
        inline = re.search(r"\)\s+#\s(.*)$", line)
        if inline and line.lstrip().startswith("print("):
            said.append(inline.group(1))
        j = i + 1
        while j < len(lines) and lines[j].startswith("#"):
            said.append(lines[j][1:].strip())
            j += 1
        if said:
            out.append(" ".join(said))
    return out


def test_the_readme_has_python_examples():
    assert len(blocks()) >= 5


def test_every_python_example_runs_and_prints_what_it_says(tmp_path):
    namespace: dict = {}
    here = os.getcwd()
    os.chdir(tmp_path)  # an example that writes a file writes it here
    try:
        for k, code in enumerate(blocks(), 1):
            buffer = io.StringIO()
            with contextlib.redirect_stdout(buffer):
                exec(compile(code, f"README.md python block {k}", "exec"), namespace)  # noqa: S102
            printed = " ".join(buffer.getvalue().split())
            for said in expected_prints(code):
                assert " ".join(said.split()) in printed, f"block {k}: the README says\n{said}\nbut it printed\n{buffer.getvalue()}"
    finally:
        os.chdir(here)
    assert (tmp_path / "results.docx").stat().st_size > 0
