"""The analysis plan: one TOML file of our own format from the data to every
table and paragraph of a results section.

```toml
title = "Results"
style = "apa7"                         # a built-in name or a style file
[data]
path = "data/survey.csv"               # .csv .xlsx .sav .dta .parquet
missing = [-99]                        # codes meaning missing
labels = { fatigue = "fatigue score" }
levels = { shift = "nominal" }
[[scales]]
name = "fatigue"
items = ["f1", "f2", "f3"]
reverse = ["f3"]
minimum = 1
maximum = 5
alpha = true                           # adds a record "<name>_alpha"
[[analyses]]
id = "fatigue_by_shift"
kind = "anova_oneway"                  # a statsetter.analyses function, or "auto"
outcome = "fatigue"
group = "shift"
[[tables]]
kind = "descriptives"                  # or "results" (analyses = [ids]), "correlations", "regression", "anova" or "multilevel" (analysis = id)
variables = ["age", "fatigue"]
by = "shift"
[outputs]
folder = "out"
docx = "results.docx"
md = "results.md"
[chapter]
path = "chapter.docx"                  # [[id]] markers filled into out
out = "chapter-filled.docx"
```

Every key is checked: a bad key or value is reported with its line and, for
an unknown key or variable, the close matches.
"""

from __future__ import annotations

import difflib
import inspect
import re
import tomllib
from dataclasses import dataclass, field, replace
from pathlib import Path
from typing import TYPE_CHECKING, Any, Callable

from .errors import InputError, RecordError, StyleError
from .records import CorrelationMatrix, Description, Record, Result, name_records, with_table_labels
from .rendering.compose import PLACES, Block, Shown
from .style.profile import PAPERS

if TYPE_CHECKING:
    import pandas as pd

    from .rendering.figures import FigureModel
    from .rendering.tables import TableModel
    from .style.profile import Style

__all__ = ["Plan", "PlanError", "load_plan", "run_plan", "write_outputs", "RunResult", "ANALYSIS_KINDS"]

ANALYSIS_KINDS = (
    "pearson", "spearman", "kendall", "correlation_matrix", "t_independent", "t_paired", "t_one_sample",
    "chi_square", "fisher_exact", "goodness_of_fit", "anova_oneway", "posthoc", "factorial_anova", "linear_regression",
    "hierarchical_steps", "logistic_regression", "mann_whitney", "wilcoxon_signed_rank", "kruskal_wallis",
    "mcnemar", "cochran_q", "friedman", "rm_anova", "mixed_anova", "moderation", "mediation", "ancova", "mixed_model", "compare_models", "cronbach_alpha", "auto",
)
_TOP = {"title", "style", "data", "scales", "analyses", "tables", "figures", "outputs", "chapter", "level", "alpha"}
_FIGURE = {"kind", "id", "analysis", "table", "variable", "title", "note"}
_DATA = {"path", "sheet", "missing", "labels", "table_labels", "levels", "value_labels", "encoding", "identifiers", "sep", "decimal"}
_SCALE = {"name", "items", "reverse", "minimum", "maximum", "scoring", "alpha", "label", "min_share"}
_TABLE = {
    "descriptives": {"kind", "id", "title", "variables", "group", "compare", "smd", "show", "weights", "suppress_below", "percent_of"},
    "results": {"kind", "id", "title", "analyses"},
    "correlations": {"kind", "id", "title", "analysis", "means", "intervals"},
    "regression": {"kind", "id", "title", "analysis"},
    "anova": {"kind", "id", "title", "analysis"},
    "multilevel": {"kind", "id", "title", "analysis"},
}
_OUTPUTS = {"folder", "docx", "md", "tex", "html", "json", "notes", "allow_outside", "caution", "paper"}
_OUTPUT_OPTIONS = {"allow_outside": bool, "caution": bool, "paper": str}  # outputs keys that are not files
_RESERVED_IDS = ("table", "ref")
_MARKER_ID = re.compile(r"[A-Za-z0-9_.\-]+")  # an analysis or table id: a chapter marker's key  # chapter markers [[table:ID]] and [[ref:ID]]
_CHAPTER = {"path", "out"}


class PlanError(InputError):
    """A problem in the plan file, with its line."""


@dataclass
class Plan:
    path: Path
    data: dict[str, Any]
    title: str = "Results"
    style: str | None = None
    level: float = 0.95
    scales: list[dict[str, Any]] = field(default_factory=list)
    analyses: list[dict[str, Any]] = field(default_factory=list)
    tables: list[dict[str, Any]] = field(default_factory=list)
    figures: list[dict[str, Any]] = field(default_factory=list)
    outputs: dict[str, Any] = field(default_factory=dict)
    chapter: dict[str, Any] | None = None
    lines: dict[str, int] = field(default_factory=dict)

    def where(self, key: str) -> str:
        line = self.lines.get(key) or self.lines.get(key.rsplit(".", 1)[0])
        return f"{self.path}, line {line}" if line else str(self.path)

    def fail(self, key: str, message: str) -> PlanError:
        return PlanError(f"{self.where(key)} ({key}): {message}")

    def resolve(self, value: str) -> Path:
        p = Path(value)
        return p if p.is_absolute() else self.path.parent / p


def _lines(text: str) -> dict[str, int]:
    """Line numbers of keys as dotted paths: ``analyses[2].outcome``, ``data.path``."""
    out: dict[str, int] = {}
    section, counts = "", {}
    for number, line in enumerate(text.splitlines(), 1):
        stripped = line.strip()
        m = re.fullmatch(r"\[\[\s*([\w.]+)\s*\]\](?:\s*#.*)?", stripped)
        if m:
            name = m.group(1)
            counts[name] = counts.get(name, -1) + 1
            section = f"{name}[{counts[name]}]"
            out[section] = number
            continue
        m = re.fullmatch(r"\[\s*([\w.]+)\s*\](?:\s*#.*)?", stripped)
        if m:
            section = m.group(1)
            out[section] = number
            continue
        m = re.match(r"([A-Za-z_][\w-]*)\s*=", stripped)
        if m:
            out[f"{section}.{m.group(1)}" if section else m.group(1)] = number
    return out


def _renamed(plan: Plan, where: str, entry: dict[str, Any], function: str) -> None:
    """Accept a key's former name (the analyses' ``RENAMED`` for ``function``)
    for one release, with a warning naming the line."""
    import warnings

    from .analyses import RENAMED, renamed_value
    from .errors import FormerName

    for old, new in RENAMED.get(function, {}).items():
        if old in entry:
            if new in entry:
                raise plan.fail(f"{where}.{old}", f"{old!r} is the former name of {new!r}; give one of them")
            warnings.warn(f"{plan.where(f'{where}.{old}')}: {old!r} is now {new!r}; the former name will stop working in the next release", FormerName, stacklevel=2)
            entry[new] = renamed_value(function, old, entry.pop(old))


def _wrong_kinds(plan: Plan, where: str, entry: dict[str, Any], kind: str) -> None:
    """Each key of an analysis holds the kind of TOML value its parameter's annotation asks for (text, a number, a
    list of column names, a table of labels, one of a few words), or the line is named: the analyses' own checks
    are of the data, not of the plan's types (a list given for a number had been an internal error)."""
    import sys

    function = _function(kind)
    module = sys.modules[function.__module__]
    for name, parameter in inspect.signature(function).parameters.items():
        if name in entry and isinstance(parameter.annotation, str):
            wanted = _wanted(parameter.annotation, entry[name], module)
            if wanted is not None:
                raise plan.fail(f"{where}.{name}", f"{name} must be {wanted}, not {entry[name]!r}"[:300])


# what each key of a table holds, as an analysis's parameters say it (a descriptives table's other keys: describe's own)
_TABLE_TYPES = {"id": "str", "title": "str", "analyses": "Sequence[str]", "analysis": "str", "means": "bool", "intervals": "bool"}


def _wrong_table_types(plan: Plan, where: str, table: dict[str, Any]) -> None:
    """Each key of a table holds the kind of TOML value it is read as, or the line is named (a list given for an
    analysis's id had been an internal error)."""
    from .analyses import descriptives

    signature = inspect.signature(descriptives.describe).parameters
    for key, value in table.items():
        annotation = _TABLE_TYPES.get(key) or (signature[key].annotation if key in signature else None)
        wanted = _wanted(annotation, value, descriptives) if isinstance(annotation, str) else None
        if wanted is not None:
            raise plan.fail(f"{where}.{key}", f"{key} must be {wanted}, not {value!r}"[:300])


def _required(plan: Plan, where: str, entry: dict[str, Any], kind: str) -> None:
    """Each parameter an analysis cannot do without (no default) is given, or the line is named (Python's own message
    about a missing argument had been shown instead)."""
    for name, parameter in inspect.signature(_function(kind)).parameters.items():
        if name != "df" and parameter.default is parameter.empty and parameter.kind is not parameter.VAR_KEYWORD and name not in entry:
            raise plan.fail(where, f"this {kind} analysis needs {name!r}")


def _alternatives(annotation: str, separator: str) -> list[str]:
    """The parts of ``annotation`` split at ``separator`` outside brackets."""
    parts, depth, start = [], 0, 0
    for i, ch in enumerate(annotation):
        depth += ch == "["
        depth -= ch == "]"
        if depth == 0 and annotation.startswith(separator, i):
            parts.append(annotation[start:i].strip())
            start = i + len(separator)
    return parts + [annotation[start:].strip()]


def _wanted(annotation: str, value: Any, module: Any) -> str | None:
    """None when ``value`` can be what ``annotation`` (a parameter's, as written) asks for; else what it asks, in words."""
    import ast
    import typing

    words = []
    for part in _alternatives(annotation, "|"):
        head, _, inner = part.partition("[")
        inner = inner[:-1]
        if part == "None":
            continue
        if part == "object":
            return None
        if part in ("str", "float", "int", "bool"):
            number = isinstance(value, (int, float)) and not isinstance(value, bool)
            if {"str": isinstance(value, str), "float": number, "int": number and isinstance(value, int), "bool": isinstance(value, bool)}[part]:
                return None
            words.append({"str": "text in quotes", "float": "a number", "int": "a whole number", "bool": "true or false"}[part])
        elif head in ("Sequence", "tuple"):
            items = _alternatives(inner, ",") if head == "tuple" else None
            if isinstance(value, list) and (items is None or len(items) == len(value)) and all(
                    _wanted(items[i] if items else inner, v, module) is None for i, v in enumerate(value)):
                return None
            words.append(f"a list of {len(items)}" if items else "a list [...]")
        elif head == "Mapping":
            kind = _alternatives(inner, ",")[1]
            if isinstance(value, dict) and all(_wanted(kind, v, module) is None for v in value.values()):
                return None
            words.append(f"a table (name = {'value' if kind == 'object' else _wanted(kind, None, module)})")
        else:  # Literal[...] written out, or a Literal alias of the analysis's module; another name is the analysis's to check
            allowed = ast.literal_eval(f"({inner},)") if head == "Literal" else typing.get_args(getattr(module, part, None))
            if head != "Literal" and typing.get_origin(getattr(module, part, None)) is not typing.Literal:
                return None
            if value in allowed and type(value) in {type(a) for a in allowed}:
                return None
            words.append("one of " + ", ".join(repr(a) for a in allowed))
    return " or ".join(dict.fromkeys(words)) or None


def _unknown(plan: Plan, where: str, keys: set[str], allowed: set[str]) -> None:
    for key in sorted(keys - allowed):
        close = difflib.get_close_matches(key, sorted(allowed), n=2, cutoff=0.6)
        hint = f"; did you mean {' or '.join(close)}?" if close else f"; allowed: {', '.join(sorted(allowed))}"
        raise plan.fail(f"{where}.{key}" if where else key, f"unknown key {key!r}{hint}")


def load_plan(path: "str | Path") -> Plan:
    """Read and check a plan file (nothing is computed yet)."""
    p = Path(path)
    from .files import read_input

    try:
        text = read_input(p, "plan").decode("utf-8")
    except InputError as exc:
        raise PlanError(str(exc)) from None
    except UnicodeDecodeError as exc:
        raise PlanError(f"{p}: not UTF-8 text (byte {exc.start})") from None
    try:
        raw = tomllib.loads(text)
    except tomllib.TOMLDecodeError as exc:
        raise PlanError(f"{p}: not valid TOML ({exc})") from None
    except RecursionError:
        raise PlanError(f"{p}: nested too deeply to read") from None
    plan = Plan(p, {}, lines=_lines(text))
    _unknown(plan, "", set(raw), _TOP)
    _check_shapes(plan, raw)
    data = raw.get("data")
    if not isinstance(data, dict) or "path" not in data:
        raise plan.fail("data", "the plan needs a [data] table with a path")
    _unknown(plan, "data", set(data), _DATA)
    plan.data = data
    plan.title = str(raw.get("title", "Results"))
    plan.style = raw.get("style")
    plan.level = float(raw.get("level", 0.95))
    if not 0 < plan.level < 1:
        raise plan.fail("level", f"{plan.level:g} is not between 0 and 1 (write 0.95 for 95%)")
    for i, scale in enumerate(raw.get("scales", [])):
        _unknown(plan, f"scales[{i}]", set(scale), _SCALE)
        for need in ("name", "items"):
            if need not in scale:
                raise plan.fail(f"scales[{i}]", f"a scale needs {need!r}")
        plan.scales.append(scale)
    ids: set[str] = set()
    for i, analysis in enumerate(raw.get("analyses", [])):
        where = f"analyses[{i}]"
        for need in ("id", "kind"):
            if need not in analysis:
                raise plan.fail(where, f"an analysis needs {need!r}")
        if not isinstance(analysis["id"], str):
            raise plan.fail(f"{where}.id", f"id must be text in quotes, not {analysis['id']!r}"[:300])
        if analysis["id"] in ids:
            raise plan.fail(f"{where}.id", f"the id {analysis['id']!r} is used twice")
        if not _MARKER_ID.fullmatch(str(analysis["id"])):
            raise plan.fail(f"{where}.id", f"{analysis['id']!r}: ids use letters, digits, _, . and - (they are chapter markers)")
        if analysis["id"] in _RESERVED_IDS:
            raise plan.fail(f"{where}.id", f"{analysis['id']!r} is kept for the chapter markers [[table:ID]] and [[ref:ID]]; choose another id")
        ids.add(analysis["id"])
        kind = analysis["kind"]
        if kind not in ANALYSIS_KINDS:
            close = difflib.get_close_matches(str(kind), ANALYSIS_KINDS, n=2)
            raise plan.fail(f"{where}.kind", f"unknown kind {kind!r}" + (f"; did you mean {' or '.join(close)}?" if close else f"; kinds: {', '.join(ANALYSIS_KINDS)}"))
        _renamed(plan, where, analysis, kind)
        _unknown(plan, where, set(analysis), {"id", "kind", "place"} | set(_parameters(kind)))
        _wrong_kinds(plan, where, analysis, kind)
        _required(plan, where, analysis, kind)
        if analysis.get("place", "text") not in PLACES:
            raise plan.fail(f"{where}.place", f"{analysis['place']!r} is not one of {', '.join(PLACES)} (where the result goes: its sentence, a table, or both)")
        plan.analyses.append(analysis)
    table_ids: set[str] = set()
    for i, table in enumerate(raw.get("tables", [])):
        kind = table.get("kind")
        _renamed(plan, f"tables[{i}]", table, "describe" if kind == "descriptives" else "")
        if not isinstance(kind, str) or kind not in _TABLE:
            raise plan.fail(f"tables[{i}].kind", f"{kind!r} is not one of {', '.join(_TABLE)}")
        _unknown(plan, f"tables[{i}]", set(table), _TABLE[kind])
        _wrong_table_types(plan, f"tables[{i}]", table)
        needed = {"descriptives": None, "results": "analyses"}.get(kind, "analysis")
        if needed is not None and needed not in table:
            what = "the ids of the analyses it shows" if needed == "analyses" else "the id of the analysis it shows"
            raise plan.fail(f"tables[{i}]", f"a {kind} table needs {needed} = … ({what})")
        for ref in table.get("analyses", []) + ([table["analysis"]] if "analysis" in table else []):
            if ref not in ids:
                raise plan.fail(f"tables[{i}].analyses", f"no analysis with id {ref!r}")
        table_id = str(table.get("id") or f"table_{i + 1}")
        if not _MARKER_ID.fullmatch(table_id) or table_id in table_ids:
            raise plan.fail(f"tables[{i}].id", f"{table_id!r}: a table id is used once and uses letters, digits, _, . and - (it is a chapter marker)")
        table_ids.add(table_id)
        plan.tables.append(table)
    from .rendering.figures import FIGURE_KINDS

    for i, fig in enumerate(raw.get("figures", [])):
        where = f"figures[{i}]"
        _unknown(plan, where, set(fig), _FIGURE)
        for key in ("kind", "analysis", "table", "variable", "title", "note", "id"):
            if key in fig and not isinstance(fig[key], str):
                raise plan.fail(f"{where}.{key}", f"{key} must be text in quotes, not {fig[key]!r}"[:300])
        if "note" in fig:  # markup, as the figure's own note is (<i>n</i>): a bare "<" is refused here, with its key and line
            from .styled import StyledText

            try:
                StyledText.from_markup(fig["note"])
            except ValueError as exc:
                raise plan.fail(f"{where}.note", f"{exc} (a figure's note is markup: <i>…</i> sets italics)") from None
        if fig.get("kind") not in FIGURE_KINDS:
            raise plan.fail(f"{where}.kind", f"{fig.get('kind')!r} is not one of {', '.join(FIGURE_KINDS)}")
        if fig.get("kind") == "categories":
            described = [str(t.get("id") or f"table_{j + 1}") for j, t in enumerate(plan.tables) if t.get("kind") == "descriptives"]
            if fig.get("table") not in described:
                raise plan.fail(f"{where}.table", f"no descriptives table with id {fig.get('table')!r} (a categories figure draws one variable "
                                                  f"of a Table 1; descriptives tables: {', '.join(described) or 'none'})")
        elif fig.get("analysis") not in ids:
            raise plan.fail(f"{where}.analysis", f"no analysis with id {fig.get('analysis')!r} (a figure draws the records of one analysis)")
        figure_id = str(fig.get("id") or f"figure_{i + 1}")
        if not _MARKER_ID.fullmatch(figure_id) or figure_id in table_ids:
            raise plan.fail(f"{where}.id", f"{figure_id!r}: a figure id is used once, not by a table, and uses letters, digits, _, . and - "
                                           "(it names the figure's files and its chapter marker)")
        table_ids.add(figure_id)
        plan.figures.append({**fig, "id": figure_id})
    outputs = raw.get("outputs", {})
    _unknown(plan, "outputs", set(outputs), _OUTPUTS)
    plan.outputs = outputs
    if "chapter" in raw:
        _unknown(plan, "chapter", set(raw["chapter"]), _CHAPTER)
        if "path" not in raw["chapter"]:
            raise plan.fail("chapter", "the chapter needs a path")
        plan.chapter = raw["chapter"]
    _check_targets(plan)
    return plan


def _check_targets(plan: Plan) -> None:
    """Outputs stay inside the plan's folder (unless ``allow_outside = true``),
    never share a path, and are never one of the plan's inputs."""
    import os

    for key, kind in _OUTPUT_OPTIONS.items():
        if key in plan.outputs and not isinstance(plan.outputs[key], kind):
            raise plan.fail(f"outputs.{key}", f"{key} must be {'true or false' if kind is bool else 'text in quotes'}")
    if plan.outputs.get("paper", "letter") not in PAPERS:
        raise plan.fail("outputs.paper", f"{plan.outputs['paper']!r} is not one of {', '.join(PAPERS)}")
    for key, value in plan.outputs.items():
        if key not in _OUTPUT_OPTIONS and not isinstance(value, str):
            raise plan.fail(f"outputs.{key}", f"{key} must be a file name in quotes, not {type(value).__name__}")
    home = os.path.realpath(plan.path.parent)
    seen: dict[str, str] = {}
    inputs = {os.path.normcase(os.path.realpath(plan.path)): "the plan itself", os.path.normcase(os.path.realpath(plan.resolve(plan.data["path"]))): "the data file"}
    if plan.chapter:
        inputs[os.path.normcase(os.path.realpath(plan.resolve(plan.chapter["path"])))] = "the chapter"
    if plan.style and str(plan.style).endswith(".toml"):
        inputs[os.path.normcase(os.path.realpath(plan.resolve(plan.style)))] = "the style file"
    for key, path in _targets(plan).items():
        real = os.path.normcase(os.path.realpath(path))
        where = "outputs.folder" if key == "folder" else "chapter.out" if key == "chapter" else f"outputs.{key}"
        if not plan.outputs.get("allow_outside") and os.path.commonpath([home, os.path.realpath(path)]) != home:
            raise plan.fail(where, f"{path} is outside the plan's folder {home}; write allow_outside = true under [outputs] to allow it")
        if key == "folder":
            continue
        if real in inputs:
            raise plan.fail(where, f"{path} is {inputs[real]}; an output never replaces an input")
        if real in seen:
            raise plan.fail(where, f"{path} is also the path of {seen[real]}; give each output its own file")
        seen[real] = where


def _targets(plan: Plan) -> dict[str, Path]:
    """Every path the plan writes: the folder, each output, the filled chapter."""
    outputs = {k: v for k, v in plan.outputs.items() if k != "folder" and k not in _OUTPUT_OPTIONS and k != "notes"} or dict(_DEFAULT_OUTPUTS)
    outputs["notes"] = plan.outputs.get("notes", "run-notes.md")
    folder = plan.resolve(plan.outputs.get("folder", "out"))
    out: dict[str, Path] = {"folder": folder, **{fmt: folder / name for fmt, name in outputs.items()}}
    if plan.chapter:
        source = plan.resolve(plan.chapter["path"])
        out["chapter"] = folder / plan.chapter.get("out", f"{source.stem}-filled.docx")
    return out


_TYPE_WORDS = {str: "text in quotes", dict: "a table (name = value, or [section])", list: "a list [...]", bool: "true or false"}


def _check_shapes(plan: Plan, raw: dict[str, Any]) -> None:
    """Every key holds the kind of TOML value it needs, or the line is named."""

    def need(key: str, value: Any, kinds: tuple[type, ...]) -> None:
        if not isinstance(value, kinds) or (isinstance(value, bool) and bool not in kinds):
            words = " or ".join(dict.fromkeys(_TYPE_WORDS.get(k, "a number") for k in kinds))  # (int and float: "a number" once)
            raise plan.fail(key, f"{key.rsplit('.', 1)[-1]} must be {words}, not {value!r}"[:300])

    for key, kinds in (("title", (str,)), ("style", (str,)), ("level", (int, float)), ("alpha", (int, float)),
                       ("data", (dict,)), ("outputs", (dict,)), ("chapter", (dict,))):
        if key in raw:
            need(key, raw[key], kinds)
    for key in ("scales", "analyses", "tables", "figures"):
        if key in raw:
            need(key, raw[key], (list,))
            for i, entry in enumerate(raw[key]):
                if not isinstance(entry, dict):
                    raise plan.fail(f"{key}[{i}]", f"each entry of {key} must be a table ([[{key}]] with keys), not {entry!r}"[:300])
    data = raw.get("data", {})
    for key, kinds in (("path", (str,)), ("sheet", (str, int)), ("missing", (list, dict)), ("labels", (dict,)), ("table_labels", (dict,)),
                       ("levels", (dict,)), ("value_labels", (dict,)), ("encoding", (str,)), ("identifiers", (list,)), ("sep", (str,)), ("decimal", (str,))):
        if key in data:
            need(f"data.{key}", data[key], kinds)
    for key in ("labels", "table_labels", "levels"):
        for name, value in data.get(key, {}).items():
            need(f"data.{key}", value, (str,))
    for name, level in data.get("levels", {}).items():
        from .levels import LEVELS

        if level not in LEVELS:
            raise plan.fail("data.levels", f"{name}: level {level!r} is not one of {', '.join(LEVELS)}")
    for i, scale in enumerate(raw.get("scales", [])):
        for key, kinds in (("name", (str,)), ("label", (str,)), ("scoring", (str,)), ("items", (list,)), ("reverse", (list,)),
                           ("minimum", (int, float)), ("maximum", (int, float)), ("min_share", (int, float)), ("alpha", (bool,))):
            if key in scale:
                need(f"scales[{i}].{key}", scale[key], kinds)
        for key in ("items", "reverse"):
            for item in scale.get(key, []):
                if not isinstance(item, str):
                    raise plan.fail(f"scales[{i}].{key}", f"each of {key} must be a column's name in quotes, not {item!r}"[:300])
    for i, entry in enumerate(raw.get("analyses", [])):
        for key in ("id", "kind"):
            if key in entry:
                need(f"analyses[{i}].{key}", entry[key], (str,))
        if isinstance(entry.get("levels"), dict):
            from .levels import LEVELS

            for name, level in entry["levels"].items():
                if level not in LEVELS:
                    raise plan.fail(f"analyses[{i}].levels", f"{name}: level {level!r} is not one of {', '.join(LEVELS)}")


def _function(kind: str) -> Callable[..., Any]:
    from . import analyses

    return getattr(analyses, {"auto": "analyse"}.get(kind, kind))


def _parameters(kind: str) -> list[str]:
    return [n for n in inspect.signature(_function(kind)).parameters if n != "df"]


@dataclass
class RunResult:
    """What a plan computed: the records, the tables in the order the section
    shows them (numbered), the section's blocks, the tables by id (for the
    chapter's markers), the paths written and the run's notes."""

    records: list[Record]
    tables: list["TableModel"]
    written: list[tuple[str, Path]]
    notes: list[str]
    unknown_markers: bool = False
    blocks: list[Block] = field(default_factory=list)
    table_ids: dict[str, "TableModel"] = field(default_factory=dict)
    figure_ids: dict[str, "FigureModel"] = field(default_factory=dict)


@dataclass
class _Data:
    """The plan's data and what is known about each column."""

    frame: "pd.DataFrame"
    labels: dict[str, str]            # prose labels (inside sentences)
    table_labels: dict[str, str]      # table labels (stubs and heads)
    declared: dict[str, str]          # levels the plan declares
    metadata: dict[str, str]          # levels the data file gives
    value_labels: dict[str, Any]
    identifiers: list[str]
    notes: list[str]

    @property
    def levels(self) -> dict[str, str]:
        return {**self.metadata, **self.declared}


def _frame(plan: Plan) -> _Data:
    from .io import read_data

    d = plan.data
    try:
        data = read_data(plan.resolve(d["path"]), sheet=d.get("sheet"), missing=d.get("missing"), encoding=d.get("encoding", "utf-8"),
                         sep=d.get("sep"), decimal=d.get("decimal"))
    except InputError as exc:
        raise PlanError(f"{plan.where('data.path')}: {exc}") from None
    frame = data.frame
    for key in ("labels", "levels", "value_labels", "table_labels"):
        if not isinstance(d.get(key, {}), dict):
            raise plan.fail(f"data.{key}", f"{key} must be a table (name = value), not {type(d[key]).__name__}")
    if not isinstance(d.get("identifiers", []), list):
        raise plan.fail("data.identifiers", "identifiers must be a list of column names")
    from .records import prose_label, table_label

    given = d.get("labels", {})
    labels = {**{k: prose_label(v) for k, v in data.labels.items()}, **given}  # a file's variable labels are table labels
    tables = {**{k: table_label(v) for k, v in given.items()}, **data.labels, **d.get("table_labels", {})}
    value_labels: dict[str, Any] = dict(data.value_labels)
    for name, mapping in d.get("value_labels", {}).items():
        if not isinstance(mapping, dict):
            raise plan.fail("data.value_labels", f"{name}: value labels must be a table (code = \"label\")")
        value_labels[name] = {_code(k): v for k, v in mapping.items()}
    for key, names in (("labels", d.get("labels", {})), ("table_labels", d.get("table_labels", {})), ("levels", d.get("levels", {})), ("value_labels", d.get("value_labels", {})),
                       ("identifiers", d.get("identifiers", []))):
        for name in names:
            if name not in frame.columns:
                raise plan.fail(f"data.{key}", _no_column(name, frame))
    return _Data(frame, labels, tables, dict(d.get("levels", {})), dict(data.levels), value_labels, list(d.get("identifiers", [])), list(data.notes))


# Arguments that name a grouping variable, and those that name its categories.
_FACTOR_ROLES = ("group", "row", "column", "variable", "factor", "factors", "predictor", "within", "between", "moderator")


def _coded(data: _Data, frame: "pd.DataFrame") -> "pd.DataFrame":
    """The analyses' frame: every nominal column that has value labels, or is
    declared (or marked in the file) nominal, as a categorical named by its
    labels in code order."""
    from .coding import factor
    from .levels import infer_level

    out = {}
    for name in frame.columns:
        level = data.levels.get(name)
        if level is None and name in data.value_labels:
            level = infer_level(frame[name]).level
        if level == "nominal" and (name in data.value_labels or name in data.levels):
            out[name] = factor(frame[name], data.value_labels.get(name))
    return frame.assign(**out) if out else frame


def _arguments(data: _Data, frame: "pd.DataFrame", args: dict[str, Any], kind: str) -> tuple["pd.DataFrame", dict[str, Any]]:
    """Grouping columns with value labels become factors for this analysis
    (ordered when ordinal), and categories named by code become labels."""
    import pandas as pd

    from .coding import category_text, factor, label_codes

    roles = [v for k in _FACTOR_ROLES if k in args for v in (args[k] if isinstance(args[k], list) else [args[k]])]
    if "event" in args and "outcome" in args:
        roles.append(args["outcome"])
    extra = {}
    for name in roles if kind != "auto" else ():  # auto reads ordinal codes as numbers; nominal ones are factors already
        if isinstance(name, str) and name in frame.columns and name in data.value_labels and not isinstance(frame[name].dtype, pd.CategoricalDtype):
            extra[name] = factor(frame[name], data.value_labels[name], ordered=data.levels.get(name) == "ordinal")
    frame = frame.assign(**extra) if extra else frame
    args = dict(args)

    def named(column: Any, value: Any, role: str) -> Any:
        """The label a code stands for; a value that is neither is refused, listing both."""
        if not isinstance(column, str) or column not in data.value_labels:
            return value
        codes = label_codes(data.value_labels[column])
        if category_text(value) in codes:
            return codes[category_text(value)]
        if category_text(value) in codes.values():
            return value
        shown = ", ".join(f"{label} (code {code})" for code, label in codes.items())
        raise InputError(f"{column}: {role} {value!r} is neither a value label nor a code; the categories are {shown}")

    if isinstance(args.get("groups"), list):
        args["groups"] = [named(args.get("group"), g, "group") for g in args["groups"]]
    if "event" in args:
        args["event"] = named(args.get("outcome"), args["event"], "event")
    if isinstance(args.get("reference"), dict):
        args["reference"] = {k: named(k, v, "reference category") for k, v in args["reference"].items()}
    if isinstance(args.get("proportions"), dict):
        args["proportions"] = {named(args.get("variable"), k, "category"): v for k, v in args["proportions"].items()}
    return frame, args


def _code(key: str) -> Any:
    try:
        return float(key) if "." in key else int(key)
    except ValueError:
        return key


def _no_column(name: str, frame: "pd.DataFrame") -> str:
    close = difflib.get_close_matches(str(name), [str(c) for c in frame.columns], n=3, cutoff=0.5)
    return f"{name}: no such column" + (f"; did you mean {', '.join(close)}?" if close else "")


def run_plan(plan: Plan, progress: Callable[[str], None] | None = None) -> RunResult:
    """Compute every scale, analysis and table of the plan (nothing written):
    data -> records -> tables, each step a function of the one before."""
    from .rendering.compose import compose

    data = _frame(plan)
    style = _style(plan)
    records = _records(plan, data, progress, style)
    shown = _tables(plan, records, style)
    drawn = _figures(plan, records, data, style)
    section = compose(records, shown, style, {a["id"]: a["place"] for a in plan.analyses if "place" in a}, figures=drawn)
    from .rendering.tables import TableModel

    tables = [b for b in section.blocks if isinstance(b, TableModel)]
    notes = [f"data: {note}" for note in data.notes] + list(section.notes)
    where = {t.get("id") or f"table_{i + 1}": f"tables[{i}]" for i, t in enumerate(plan.tables)}
    notes += [f"{where.get(r.id or '', r.id)}: left out {lev.describe()}; list it in variables to describe it"
              for r in records if isinstance(r, Description) for lev in r.left_out]
    notes += [f"{r.id}: {note.text}" for r in records if isinstance(r, Result) for note in r.notes if note.kind == "choice"]  # never silent
    notes += _checks_and_cautions(records)
    notes += _unnamed_groups(records)
    return RunResult(records, tables, [], notes, blocks=list(section.blocks), table_ids=dict(section.tables),
                     figure_ids={f.id or "": f for _, f in drawn})


def _checks_and_cautions(records: list[Record]) -> list[str]:
    """Each analysis's assumption checks and cautions (sphericity, expected counts, small or unequal cells, a model's
    fit warnings, what mediation cannot show), once per analysis: they belong to the author, not the manuscript's
    text, and had been only in the records."""
    carriers: dict[tuple[str, str], list[str]] = {}  # (analysis, text): the records that carry it
    count: dict[str, int] = {}  # records per analysis
    for r in records:
        if isinstance(r, Result):
            analysis = (r.id or "").split(":")[0]
            count[analysis] = count.get(analysis, 0) + 1
            for text in dict.fromkeys(n.text for n in r.notes if n.kind in ("assumption", "caution")):
                carriers.setdefault((analysis, text), []).append(r.id or "")
    # named by the analysis when all its records carry the note (a factorial ANOVA's cells), else by the first record
    return [f"{analysis if len(ids) == count[analysis] else ids[0]}: {text}" for (analysis, text), ids in carriers.items()]


def _unnamed_groups(records: list[Record]) -> list[str]:
    """A note for each analysis whose groups are labelled by answers or bare codes ("no", "1"), which name no group in
    a sentence: the sentences then name them with their variable ("any affair: no"), and the note says so."""
    from .rendering.sentences import names_no_group

    out, seen = [], set()
    for r in records:
        v = r.variable("group") if isinstance(r, Result) else None
        analysis = (r.id or "").split(":", 1)[0]
        if v is None or analysis in seen:
            continue
        bare = [str(g.label) for g in r.groups if names_no_group(str(g.label))]
        if bare:
            seen.add(analysis)
            out.append(f"{analysis}: the groups of {v.display} are labelled {', '.join(repr(b) for b in bare)}, which name no group in a "
                       f"sentence; the sentences write '{v.display}: {bare[0]}'. Value labels that name the groups (data.value_labels) read better")
    return out


def _figures(plan: Plan, records: list[Record], data: _Data, style: "Style") -> list[tuple[str, "FigureModel"]]:
    """Each figure of the plan from the records of its analysis (a scatter plot also from the data): (analysis id, model)."""
    from .rendering.figures import figure

    out = []
    for i, fig in enumerate(plan.figures):
        source = fig.get("table") if fig["kind"] == "categories" else fig["analysis"]
        found = [r for r in records if (r.id or "").split(":", 1)[0] == source and isinstance(r, (Result, Description))]
        try:
            made = figure(found, fig["kind"], style, data=data.frame if fig["kind"] == "scatter" else None, title=fig.get("title"),
                          note=fig.get("note"), level=plan.level, id=fig["id"], variable=fig.get("variable"))
        except InputError as exc:
            raise PlanError(f"{plan.where(f'figures[{i}]')} (figure {fig['id']!r}): {exc}") from None
        out.append((str(source), made))
    return out


def _records(plan: Plan, data: _Data, progress: Callable[[str], None] | None, style: "Style") -> list[Record]:
    """The records of the plan: scale reliabilities, analyses (each record
    named from its analysis id by ``records.name_records``), then the
    Descriptions of the descriptives tables."""
    from .analyses import cronbach_alpha, scale_score
    from .analyses.scales import scoring_note

    frame, labels, levels = data.frame, data.labels, data.levels
    records: list[Record] = []
    alphas: dict[str, Result] = {}
    for i, scale in enumerate(plan.scales):
        name = scale["name"]
        options = {k: scale[k] for k in ("reverse", "minimum", "maximum") if k in scale}
        try:
            frame = frame.assign(**{name: scale_score(frame, scale["items"], scoring=scale.get("scoring", "mean"), min_share=scale.get("min_share"), **options)})
            data.notes.append(scoring_note(frame, scale["items"], name, scale.get("min_share")))
            if scale.get("label"):
                labels[name] = scale["label"]
                data.table_labels.setdefault(name, scale["label"][:1].upper() + scale["label"][1:])
            if scale.get("alpha"):
                record = cronbach_alpha(frame, scale["items"], level=plan.level, scale=labels.get(name, name), labels=labels, **options).main
                alphas[name] = replace(record, id=f"{name}_alpha")
                records.append(alphas[name])
        except InputError as exc:
            key = _key_of(scale, str(exc))
            raise PlanError(f"{plan.where(f'scales[{i}].{key}' if key else f'scales[{i}]')} (scale {name!r}): {exc}") from None
    data.frame = frame
    coded = _coded(data, frame)
    for i, analysis in enumerate(plan.analyses):
        if progress:
            progress(analysis["id"])
        kind = analysis["kind"]
        args = {k: v for k, v in analysis.items() if k not in ("id", "kind", "place")}
        if "variance_level" in style.ci:  # the style's level for η²-type intervals (Steiger's 90% convention, say)
            if "variance_level" in _parameters(kind):
                args.setdefault("variance_level", style.ci["variance_level"])
            elif kind in ("anova_oneway", "factorial_anova"):  # their only intervals are of η²-type effects
                args.setdefault("level", style.ci["variance_level"])
        if "level" in _parameters(kind):
            args.setdefault("level", plan.level)
        if "labels" in _parameters(kind):
            args["labels"] = {**labels, **args.get("labels", {})}
        if "levels" in _parameters(kind):
            args["levels"] = {**levels, **args.get("levels", {})}
        try:
            used, args = _arguments(data, coded, args, kind)
            result = _function(kind)(used, **args)
        except (InputError, RecordError, TypeError) as exc:  # (a record the data leave undefined: named by its analysis)
            key = _key_of(analysis, str(exc))
            raise PlanError(f"{plan.where(f'analyses[{i}].{key}' if key else f'analyses[{i}]')} (analysis {analysis['id']!r}): {exc}") from None
        found = list(result) if isinstance(result, (list, tuple)) else [result]
        if kind == "auto":  # a level the data file gave is not one the author declared: say where it came from
            found = [_level_sources(r, data, analysis) for r in found]
        found = [_median_categories(with_table_labels(r, data.table_labels, labels), data) if isinstance(r, Result) else r for r in found]
        records += name_records(analysis["id"], found)
    for i, t in enumerate(plan.tables):
        if t["kind"] == "descriptives":
            records.append(_description(plan, t, i, data, alphas))
    return records


_MEASURED = ("outcome", "first", "second")  # the roles of what a rank test's medians are of (and "measurement N")


def _median_categories(r: Result, data: _Data) -> Result:
    """``r`` with each group's median named by the category its code stands for (``extra["median_label"]``: "Mdn = 4
    [Moderate]" in a sentence, as Table 1 names it) when the measured variables share one set of value labels (an
    ordinal scale's, or the items of one scale) and the median is a code; a median between two codes is left as a
    number."""
    from .coding import category_text, label_codes

    measured = [v.name for v in r.variables if v.role in _MEASURED or v.role.startswith("measurement")]
    scales = [data.value_labels.get(name) for name in measured if name in data.frame.columns]
    if not r.groups or not scales or any(not m or m != scales[0] for m in scales):
        return r
    codes = label_codes(scales[0])
    named = [replace(g, extra={**g.extra, "median_label": codes[category_text(g.median)]})
             if g.median is not None and float(g.median).is_integer() and category_text(g.median) in codes else g for g in r.groups]
    return replace(r, groups=tuple(named)) if any(a is not b for a, b in zip(named, r.groups)) else r


def _description(plan: Plan, t: dict[str, Any], i: int, data: _Data, alphas: dict[str, Result]) -> Description:
    from .analyses.descriptives import describe

    frame, labels = data.frame, data.labels
    variables = t.get("variables")
    if variables is None and data.identifiers:
        variables = [str(c) for c in frame.columns if c not in (t.get("group"), t.get("weights")) and c not in data.identifiers]
        data.notes.extend(f"tables[{i}]: left out {k} (declared an identifier in data.identifiers)" for k in data.identifiers)
    try:
        d = describe(
            frame, variables, group=t.get("group"), levels=data.declared,
            metadata_levels=data.metadata, value_labels=data.value_labels,
            labels={**{k: v[:1].upper() + v[1:] for k, v in labels.items()}, **data.table_labels}, show=t.get("show"),
            weights=t.get("weights"), compare=bool(t.get("compare")), smd=bool(t.get("smd")), suppress_below=t.get("suppress_below"),
            percent_of=t.get("percent_of", "valid"), alphas={k: v for k, v in alphas.items() if k in (t.get("variables") or frame.columns)},
        )
    except (InputError, RecordError) as exc:
        raise PlanError(f"{plan.where(f'tables[{i}]')} (table {i + 1}): {exc}") from None
    return replace(d, id=t.get("id") or f"table_{i + 1}")


def _tables(plan: Plan, records: list[Record], style: "Style") -> list[Shown]:
    """Each table of the plan laid out from the records it names (numbered
    later, in the order the section shows them)."""
    from .rendering.layout import table

    by_id: dict[str, list[Record]] = {}
    for r in records:
        by_id.setdefault((r.id or "").split(":", 1)[0], []).append(r)
    descriptions = iter([r for r in records if isinstance(r, Description)])
    out = []
    for i, t in enumerate(plan.tables):
        sources = tuple(t.get("analyses", ())) + ((t["analysis"],) if "analysis" in t else ())
        try:
            if t["kind"] == "descriptives":
                d = next(descriptions)
                made = table(d, style, title=t.get("title"))
                sources = (d.id or "",)
            elif t["kind"] == "results":
                made = table([r for ref in t["analyses"] for r in by_id[ref] if isinstance(r, Result)], style, title=t.get("title", "Results"))
            elif t["kind"] == "correlations":
                matrix = [r for r in by_id[t["analysis"]] if isinstance(r, CorrelationMatrix)]
                if not matrix:
                    raise InputError(f"{t['analysis']!r} is not a correlation_matrix analysis")
                from .rendering.correlation_tables import correlation_table

                made = correlation_table(matrix[0], style, title=t.get("title"), means=t.get("means", True), intervals=t.get("intervals", False))
            else:
                made = _model_table(t["kind"], by_id[t["analysis"]], style, t.get("title"))
        except InputError as exc:
            raise PlanError(f"{plan.where(f'tables[{i}]')} (table {i + 1}): {exc}") from None
        out.append(Shown(str(t.get("id") or f"table_{i + 1}"), made, sources, t["kind"]))
    return out


def _model_table(kind: str, records: list[Record], style: "Style", title: str | None) -> "TableModel":
    results = [r for r in records if isinstance(r, Result)]
    if kind == "regression":
        from .rendering.regression_tables import regression_table

        return regression_table(results, style, title=title)
    if kind == "multilevel":
        from .rendering.layout import table

        if not {r.kind for r in results} & {"mixed_model", "model_comparison"}:
            raise InputError("a multilevel table needs a mixed_model or compare_models analysis")
        return table(results, style, title=title)
    from .rendering.anova_tables import anova_table

    terms = [r for r in results if r.kind == "anova_term" and not r.details.get("simple_effect")]  # a mixed ANOVA's simple effects follow in the text
    return anova_table(terms or results, style, title=title)


def _key_of(entry: dict[str, Any], message: str) -> str | None:
    """The plan key whose value the message is about ("fatigu: no such column" -> outcome)."""
    token = message.split(":", 1)[0].strip()
    for key, value in entry.items():
        values = value if isinstance(value, list) else [value]
        flat = [x for v in values for x in (v if isinstance(v, list) else [v])]
        if token in map(str, flat):
            return key
    return None


def _level_sources(record: Result, data: _Data, analysis: dict[str, Any]) -> Result:
    from dataclasses import replace

    notes = []
    for note in record.notes:
        text = note.text
        if note.kind == "choice":
            for name in (analysis.get("outcome"), analysis.get("predictor")):
                if name in data.metadata and name not in data.declared and name not in analysis.get("levels", {}):
                    text = text.replace(f"{name} is {data.metadata[name]} (declared)", f"{name} is {data.metadata[name]} (the data file's measurement level)")
            note = replace(note, text=text)
        notes.append(note)
    return replace(record, notes=tuple(notes))


def _style(plan: Plan) -> "Style":
    from .style import load_style

    value = plan.style
    if value is None:
        return load_style(None)
    candidate = plan.resolve(value)
    try:
        return load_style(str(candidate) if str(value).endswith(".toml") else value)
    except (InputError, StyleError) as exc:
        raise PlanError(f"{plan.where('style')}: {exc}") from None


_DEFAULT_OUTPUTS = {"md": "results.md", "docx": "results.docx", "json": "records.json"}


def write_outputs(plan: Plan, result: RunResult) -> RunResult:
    """Write every output of the plan and fill the chapter; the paths in ``written``."""
    from .export.section import write_section

    from .errors import EnvironmentFailure
    from .files import transaction

    style = _style(plan)
    paths = _targets(plan)
    folder = paths.pop("folder")
    chapter_out = paths.pop("chapter", None)
    try:
        folder.mkdir(parents=True, exist_ok=True)
    except OSError as exc:
        raise EnvironmentFailure(f"{plan.where('outputs.folder')}: cannot create {folder} ({exc.strerror or exc})") from None
    data_path = plan.resolve(plan.data["path"])
    inputs = [plan.path, data_path] + ([plan.resolve(plan.chapter["path"])] if plan.chapter else [])
    notes: list[str] = []
    with transaction():  # every output, or none: the previous run's files stay until all are written
        written = []
        if result.figure_ids:
            from .export.figure_files import write_figure
            from .rendering.figures import FigureModel

            blocks = []
            for block in result.blocks:
                if isinstance(block, FigureModel):
                    block = write_figure(block, style, folder, block.id or f"figure_{block.number}", inputs=inputs)
                    written += [(f"figure {fmt}", folder / name) for fmt, name in block.files.items()]
                    result.figure_ids[block.id or ""] = block
                blocks.append(block)
            result.blocks = blocks
        if plan.chapter and chapter_out is not None:
            from .export.markers import describe, fill_chapter

            source = plan.resolve(plan.chapter["path"])
            try:
                report = fill_chapter(source, result.records, chapter_out, style, tables=result.table_ids, figures=result.figure_ids,
                                      figure_root=folder)
            except InputError as exc:
                raise PlanError(f"{plan.where('chapter.path')}: {exc}") from None
            written.append(("chapter", chapter_out))
            notes = list(describe(report))
            if report.unknown:
                notes.append("unknown markers were left as they are")
            result.unknown_markers = bool(report.unknown)
        written[:0] = write_section(result.blocks, result.records, style, plan.title, paths, inputs, notes=result.notes + notes,
                                    caution=bool(plan.outputs.get("caution")), paper=plan.outputs.get("paper"))
    result.notes += notes
    result.written += written
    return result
