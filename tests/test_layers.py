"""The import graph follows the layers written in DEVELOPERS.md ("Layers"):
a module imports only from its own layer or the layers below it, lazy imports
inside functions included. Records are the hub: sources (analyses, adapters)
end in them, sinks (rendering, export) start from them, and no arrow runs
back up the house."""

from __future__ import annotations

import ast
import re
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]
PACKAGE = ROOT / "src" / "statsetter"


def layers() -> dict[str, int]:
    """Unit -> rank (0 is the bottom), from the ```layers block of DEVELOPERS.md (top layer first)."""
    text = (ROOT / "DEVELOPERS.md").read_text(encoding="utf-8")
    block = re.search(r"```layers\n(.*?)```", text, re.S)
    assert block, "DEVELOPERS.md has no ```layers block"
    lines = [line.split("#")[0].split() for line in block.group(1).splitlines()]
    lines = [line for line in lines if line]
    return {unit: len(lines) - 1 - i for i, line in enumerate(lines) for unit in line}


def _unit(name: str) -> str:
    """A name imported from the package root: a module or subpackage, else something __init__ defines."""
    return name if (PACKAGE / f"{name}.py").exists() or (PACKAGE / name / "__init__.py").exists() else "__init__"


def unit_of(path: Path) -> str:
    parts = path.relative_to(PACKAGE).with_suffix("").parts
    return parts[0] if len(parts) > 1 else parts[0]


def imports(path: Path, text: str | None = None) -> list[tuple[int, str]]:
    """(line, unit) for every statsetter module ``path`` imports, at any depth."""
    tree = ast.parse(text if text is not None else path.read_text(encoding="utf-8"))
    here = path.relative_to(PACKAGE).with_suffix("").parts
    package = here[:-1] if here[-1] != "__init__" else here[:-1]
    out = []
    for node in ast.walk(tree):
        if isinstance(node, ast.ImportFrom):
            if node.level:
                base = list(package[: len(package) - (node.level - 1)]) if node.level > 1 else list(package)
                if node.level - 1 > len(package):
                    continue
                target = base + (node.module.split(".") if node.module else [])
                if not target:  # "from . import x" at the top: x is the unit
                    out += [(node.lineno, _unit(a.name)) for a in node.names]
                    continue
                out.append((node.lineno, target[0]))
            elif node.module and node.module.startswith("statsetter"):
                parts = node.module.split(".")[1:]
                out += [(node.lineno, parts[0])] if parts else [(node.lineno, _unit(a.name)) for a in node.names]
        elif isinstance(node, ast.Import):
            for a in node.names:
                if a.name.startswith("statsetter."):
                    out.append((node.lineno, a.name.split(".")[1]))
    return out


def test_every_unit_has_a_layer():
    rank = layers()
    units = {unit_of(p) for p in PACKAGE.rglob("*.py")} | {p.name for p in PACKAGE.iterdir() if p.is_dir() and (p / "__init__.py").exists()}
    assert units - set(rank) == set(), "add these to the layers block of DEVELOPERS.md"
    assert set(rank) - units == set(), "the layers block names units that do not exist"


def test_no_import_runs_up_the_layers():
    rank = layers()
    wrong = []
    for path in sorted(PACKAGE.rglob("*.py")):
        me = unit_of(path)
        for line, other in imports(path):
            if other in rank and rank[other] > rank[me]:
                wrong.append(f"{path.relative_to(PACKAGE)}:{line} ({me}) imports {other}")
    assert wrong == []


def test_the_checker_sees_a_wrong_arrow():
    # the check can fail: a lazy import from rendering inside analyses is found, as is one from the package root
    rank = layers()
    probe = PACKAGE / "analyses" / "probe.py"  # not written: its text is given
    found = imports(probe, "def f():\n    from ..rendering.layout import table\n    from .. import render\n    return table\n")
    assert [other for _, other in found] == ["rendering", "__init__"]
    assert rank["rendering"] > rank["analyses"] and unit_of(probe) == "analyses"
