"""Style profiles: TOML data, validated, with ``extends`` for house variants.

A profile names every choice the number engine and the templates make:
decimals, leading zeros, p thresholds, separators, the minus sign, the CI
form, symbols and wording. Built-in profiles live in ``profiles/``; a house
style is a TOML file that ``extends`` one of them and overrides some keys.
"""

from __future__ import annotations

import tomllib
from dataclasses import dataclass
from functools import lru_cache
from importlib import resources
from pathlib import Path, PurePath
from types import MappingProxyType
from typing import Any, Callable, Mapping

from ..errors import InputError, StyleError

__all__ = ["Style", "load_style", "builtin_styles", "check_style_file"]


# --------------------------------------------------------------------------
# the schema: every key a profile may hold, with its check


def _int(lo: int, hi: int) -> Callable[[Any], str | None]:
    def check(v: Any) -> str | None:
        if isinstance(v, bool) or not isinstance(v, int) or not lo <= v <= hi:
            return f"{v!r} is not allowed; use a whole number from {lo} to {hi}"
        return None

    return check


def _float(lo: float, hi: float) -> Callable[[Any], str | None]:
    def check(v: Any) -> str | None:
        if isinstance(v, bool) or not isinstance(v, (int, float)) or not lo <= v <= hi:
            return f"{v!r} is not allowed; use a number from {lo:g} to {hi:g}"
        return None

    return check


def _one_of(*allowed: Any) -> Callable[[Any], str | None]:
    def check(v: Any) -> str | None:
        if v not in allowed:
            shown = ", ".join(repr(a) for a in allowed)
            return f"{v!r} is not allowed; allowed values: {shown}"
        return None

    return check


MAX_TEXT = 200  # characters in any text value of a style (README, "Limits")


def _long(v: str) -> str | None:
    return f"{v[:40]!r}… is {len(v):,} characters long; a style's texts are at most {MAX_TEXT}" if len(v) > MAX_TEXT else None


def _text(v: Any) -> str | None:
    return _long(v) if isinstance(v, str) else f"{v!r} is not allowed; use a text string"


def _fields(v: str, allowed: tuple[str, ...]) -> str | None:
    """Placeholders of a pattern: only the allowed names, with no format spec or conversion."""
    import string

    shown = " ".join("{" + a + "}" for a in allowed)
    try:
        parts = list(string.Formatter().parse(v))
    except ValueError:
        return f"{v!r} has an unbalanced brace; placeholders: {shown}"
    for _, name, spec, conversion in parts:
        if name is None:
            continue
        if name not in allowed or spec or conversion:
            return f"{v!r}: {{{name}{'!' + conversion if conversion else ''}{':' + spec if spec else ''}}} is not a placeholder; placeholders: {shown}"
    return None


def _markup(v: Any) -> str | None:
    if not isinstance(v, str):
        return f"{v!r} is not allowed; use a text string"
    if _long(v):
        return _long(v)
    from ..styled import StyledText

    try:
        StyledText.from_markup(v)
    except ValueError as exc:
        return f"{v!r} is not valid markup ({exc}); allowed tags: <i>, <sup>, <sub>"
    return None


def _bool(v: Any) -> str | None:
    return None if isinstance(v, bool) else f"{v!r} is not allowed; use true or false"


def _text_list(v: Any) -> str | None:
    if not isinstance(v, list) or not all(isinstance(x, str) for x in v):
        return f"{v!r} is not allowed; use a list of names"
    return None


def _fraction_list(v: Any) -> str | None:
    if not isinstance(v, list) or not all(
        isinstance(x, (int, float)) and not isinstance(x, bool) and 0 < x < 1 for x in v
    ):
        return f"{v!r} is not allowed; use a list of numbers between 0 and 1"
    return None


def _pattern(v: Any) -> str | None:
    if not isinstance(v, str):
        return f"{v!r} is not allowed; use a text string"
    if v == "":
        return None
    problem = _long(v) or _fields(v, ("level", "low", "high", "sep"))
    if problem:
        return problem
    for needed in ("{low}", "{high}"):
        if needed not in v:
            return f"{v!r} lacks {needed}; placeholders: {{level}} {{low}} {{high}} {{sep}}"
    try:
        v.format(level="95", low="0", high="1", sep=",")
    except (KeyError, IndexError, ValueError):
        return f"{v!r} has an unknown placeholder; placeholders: {{level}} {{low}} {{high}} {{sep}}"
    return None


def _attach(v: Any) -> str | None:
    if not isinstance(v, str):
        return f"{v!r} is not allowed; use a text string"
    problem = _long(v) or _fields(v, ("sep",))
    if problem:
        return problem
    try:
        v.format(sep=",")
    except (KeyError, IndexError, ValueError):
        return f"{v!r} has an unknown placeholder; placeholder: {{sep}}"
    return None


_ANY = "*"  # a table whose keys are free, each value checked by the given check
PAPERS = ("letter", "a4")

SCHEMA: dict[str, Any] = {
    "name": _text,
    "title": _text,
    "language": _one_of("en"),
    "extends": _text,
    "numbers": {
        "decimals": _int(0, 6),
        "decimal_mark": _one_of(".", ","),
        "thousands": _one_of(",", ".", " ", "\u202f", "\u2009", "'", ""),
        "group_from": _int(1000, 100000),
        "minus": _one_of("\u2212", "-"),
        "list_separator": _one_of(",", ";"),
        "percent_decimals": _int(0, 3),
        "quantity_decimals": {_ANY: _int(0, 6)},
        "bounded": {"quantities": _text_list},
        "never_zero": {"quantities": _text_list},
        "keep_together": _one_of("space", "nbsp", "thin"),
        "df_form": _one_of("parentheses", "subscript"),
        "range_dash": _one_of("\u2013", "-"),
    },
    "p": {
        "symbol": _markup,
        "decimals": _int(1, 6),
        "extra_digit_below": _float(0, 0.5),
        "floor": _float(0, 0.5),
        "ceiling": _float(0, 1),
        "near_alpha_digits": _int(0, 17),
        "accept_decimals": _int(1, 6),
        "table_stars": _fraction_list,
    },
    "ci": {
        "pattern": _pattern,
        "pattern_negative": _pattern,
        "attach": _attach,
        "label": _text,
        "cell": _pattern,
        "cell_negative": _pattern,
        "variance_level": _float(0.5, 0.999),
    },
    "wording": {
        "significance": _bool,
        "alpha": _float(0.0001, 0.5),
        "serial_comma": _bool,
        "possessive": _bool,
        "descriptives": _one_of("symbols", "mean_sd"),
        "pseudo_r2": _one_of("nagelkerke", "mcfadden"),
    },
    "symbols": {_ANY: _markup},
    "tables": {
        "number_bold": _bool,
        "title_italic": _bool,
        "number_align": _one_of("center", "decimal"),
        "intercept": _bool,
        "caption": _one_of("two_lines", "one_line"),
        "note_label": _text,
        "font": _text,
        "font_size": _float(0, 30),
    },
    "figures": {
        "caption": _one_of("two_lines", "one_line"),
        "note_label": _text,
        "font": _text,
        "font_size": _float(8, 14),
        "width_in": _float(2, 7.5),
        "height_in": _float(1.5, 9),
        "dpi": _int(150, 1200),
        "means": _one_of("points", "bars"),
        "palette": _text_list,
        "markers": _text_list,
        "line_styles": _text_list,
        "grid": _bool,
    },
    "manuscript": {
        "paper": _one_of(*PAPERS),
        "margin_in": _float(0.5, 2),
        "font": _text,
        "font_size": _float(8, 16),
        "line_spacing": _float(1, 3),
        "table_line_spacing": _float(1, 3),
        "first_line_indent_in": _float(0, 1),
        "heading_1": _one_of("center", "left"),
        "heading_2": _one_of("center", "left"),
        "headings_bold": _bool,
        "page_number": _one_of("top right", "bottom center", "none"),
    },
}

_REQUIRED_SYMBOLS = ("t", "F", "chi2", "r", "p", "d", "M", "SD", "n", "N")


def _validate(data: Mapping[str, Any], schema: Mapping[str, Any], source: str, prefix: str = "") -> None:
    for key, value in data.items():
        dotted = f"{prefix}{key}"
        if key in schema:
            rule = schema[key]
        elif _ANY in schema:
            rule = schema[_ANY]
        else:
            allowed = ", ".join(k for k in schema if k != _ANY)
            raise StyleError(source, dotted, f"unknown key; allowed keys here: {allowed}")
        if isinstance(rule, dict):
            if not isinstance(value, dict):
                raise StyleError(source, dotted, f"{value!r} is not allowed; expected a [{dotted}] table")
            _validate(value, rule, source, dotted + ".")
        else:
            problem = rule(value)
            if problem:
                raise StyleError(source, dotted, problem)


def _merge(base: dict[str, Any], over: Mapping[str, Any]) -> dict[str, Any]:
    out = dict(base)
    for key, value in over.items():
        if isinstance(value, dict) and isinstance(out.get(key), dict):
            out[key] = _merge(out[key], value)
        else:
            out[key] = value
    return out


def _freeze(value: Any) -> Any:
    if isinstance(value, dict):
        return MappingProxyType({k: _freeze(v) for k, v in value.items()})
    if isinstance(value, list):
        return tuple(_freeze(v) for v in value)
    return value


# --------------------------------------------------------------------------
# the resolved style


@dataclass(frozen=True, eq=False)
class Style:
    """A resolved, validated style profile. Read its parts through the typed
    properties; ``data`` holds the whole merged table."""

    name: str
    title: str
    data: Mapping[str, Any]
    source: str

    # numbers
    @property
    def decimals(self) -> int:
        return self.data["numbers"]["decimals"]

    @property
    def decimal_mark(self) -> str:
        return self.data["numbers"]["decimal_mark"]

    @property
    def thousands(self) -> str:
        return self.data["numbers"]["thousands"]

    @property
    def group_from(self) -> int:
        return self.data["numbers"]["group_from"]

    @property
    def minus(self) -> str:
        return self.data["numbers"]["minus"]

    @property
    def list_separator(self) -> str:
        return self.data["numbers"]["list_separator"]

    @property
    def percent_decimals(self) -> int:
        return self.data["numbers"]["percent_decimals"]

    @property
    def quantity_decimals(self) -> Mapping[str, int]:
        return self.data["numbers"].get("quantity_decimals", MappingProxyType({}))

    @property
    def bounded(self) -> frozenset[str]:
        return frozenset(self.data["numbers"]["bounded"]["quantities"])

    @property
    def spells_out(self) -> bool:
        """Whether the style writes descriptive statistics in words ("mean [SD], 2.86 [0.59]", "Median (IQR)", an axis's
        "mean": AMA 11) rather than as symbols (M, Mdn): ``[wording] descriptives = "mean_sd"``."""
        return self.data["wording"].get("descriptives", "symbols") == "mean_sd"

    @property
    def keep_together(self) -> str:
        """The space inside a statistic ("n = 93", "p < .001"): a no-break
        space, a thin no-break space or a plain one, as ``[numbers] keep_together`` says."""
        return {"space": " ", "nbsp": "\u00a0", "thin": "\u202f"}[self.data["numbers"].get("keep_together", "space")]

    @property
    def never_zero(self) -> frozenset[str]:
        """Quantities whose non-zero values never print as zero (digits are added)."""
        return frozenset(self.data["numbers"].get("never_zero", {}).get("quantities", ()))

    # p
    @property
    def p(self) -> Mapping[str, Any]:
        return self.data["p"]

    @property
    def ci(self) -> Mapping[str, Any]:
        return self.data["ci"]

    @property
    def wording(self) -> Mapping[str, Any]:
        return self.data["wording"]

    @property
    def symbols(self) -> Mapping[str, str]:
        return self.data["symbols"]

    @property
    def tables(self) -> Mapping[str, Any]:
        return self.data.get("tables", MappingProxyType({}))

    @property
    def figures(self) -> Mapping[str, Any]:
        """How figures are drawn and captioned (``[figures]``): caption form,
        sans-serif font and size at print size, width, dpi, bars or points for
        means, a greyscale-safe palette with markers and line styles."""
        return self.data.get("figures", MappingProxyType({}))

    @property
    def manuscript(self) -> Mapping[str, Any]:
        """The page of a results document the style writes (``[manuscript]``):
        paper, margins, font, spacing, indent, headings, page number."""
        return self.data.get("manuscript", MappingProxyType({}))

    def note_label(self, what: str = "tables") -> str:
        """The word before a table's or figure's general note: APA's italic "Note." (APA 7 §7.14); "" where the style
        puts its notes without one (AMA 11: footnotes below the table, memory)."""
        return str(self.data.get(what, {}).get("note_label", "Note."))

    def symbol(self, name: str) -> str:
        """The markup for a symbol; a name the style does not define is used as is."""
        if name == "p":
            return self.data["p"]["symbol"]
        return self.symbols.get(name, name)


_BUILTIN_DIR = "profiles"


def builtin_styles() -> list[str]:
    """Names of the built-in styles."""
    folder = resources.files(__package__).joinpath(_BUILTIN_DIR)
    return sorted(p.name[:-5] for p in folder.iterdir() if p.name.endswith(".toml"))


def _read_toml(text: str, source: str) -> dict[str, Any]:
    try:
        return tomllib.loads(text)
    except tomllib.TOMLDecodeError as exc:
        raise StyleError(source, "(file)", f"not valid TOML: {exc}") from None
    except RecursionError:
        raise StyleError(source, "(file)", "nested too deeply to read") from None


def _raw_builtin(name: str) -> tuple[dict[str, Any], str]:
    if name not in builtin_styles():
        raise StyleError(
            name, "extends" if name else "name", f"no built-in style {name!r}; built in: {', '.join(builtin_styles())}"
        )
    text = resources.files(__package__).joinpath(_BUILTIN_DIR, f"{name}.toml").read_text(encoding="utf-8")
    return _read_toml(text, f"{name}.toml"), f"built-in style {name}"


def _resolve(data: dict[str, Any], source: str, base_dir: Path | None, seen: tuple[str, ...]) -> dict[str, Any]:
    _validate(data, SCHEMA, source)
    parent_name = data.get("extends")
    if parent_name is None:
        return data
    if parent_name in seen:
        raise StyleError(source, "extends", f"{parent_name!r} extends itself through {' -> '.join(seen)}")
    parent_path = (base_dir / parent_name) if base_dir is not None and parent_name.endswith(".toml") else None
    if parent_path is not None:
        parent_raw, parent_source = _read_file(parent_path, source)
        parent_dir: Path | None = parent_path.parent
    else:
        if parent_name not in builtin_styles():
            raise StyleError(
                source,
                "extends",
                f"{parent_name!r} is neither a built-in style nor a .toml file; built in: {', '.join(builtin_styles())}",
            )
        parent_raw, parent_source = _raw_builtin(parent_name)
        parent_dir = None
    parent = _resolve(parent_raw, parent_source, parent_dir, seen + (parent_name,))
    merged = _merge(parent, {k: v for k, v in data.items() if k != "extends"})
    return merged


def _read_file(path: Path, referrer: str | None = None) -> tuple[dict[str, Any], str]:
    source = str(path)
    from ..files import read_input

    if not path.exists():
        where = f" (named in {referrer})" if referrer else ""
        raise StyleError(source, "(file)", f"no such style file{where}")
    try:
        text = read_input(path, "style").decode("utf-8")
    except InputError as exc:
        raise StyleError(source, "(file)", str(exc).split(": ", 1)[-1]) from None
    except UnicodeDecodeError as exc:
        raise StyleError(source, "(file)", f"cannot read: {exc}") from None
    return _read_toml(text, source), source


def _finish(data: dict[str, Any], source: str) -> Style:
    for section in ("numbers", "p", "ci", "wording", "symbols"):
        if section not in data:
            raise StyleError(source, section, "missing; a style needs it or must extend one that has it")
    numbers = data["numbers"]
    for key in ("decimals", "decimal_mark", "thousands", "group_from", "minus", "list_separator", "percent_decimals"):
        if key not in numbers:
            raise StyleError(source, f"numbers.{key}", "missing")
    if "bounded" not in numbers:
        raise StyleError(source, "numbers.bounded", "missing")
    if numbers["decimal_mark"] == numbers["thousands"]:
        raise StyleError(source, "numbers.thousands", f"{numbers['thousands']!r} is also the decimal mark; choose another")
    if numbers["decimal_mark"] == "," and numbers["list_separator"] == ",":
        raise StyleError(
            source, "numbers.list_separator", "',' is ambiguous with a decimal comma; allowed with a decimal comma: ';'"
        )
    for key in ("symbol", "decimals", "floor"):
        if key not in data["p"]:
            raise StyleError(source, f"p.{key}", "missing")
    for key in ("pattern", "attach"):
        if key not in data["ci"]:
            raise StyleError(source, f"ci.{key}", "missing")
    for key in _REQUIRED_SYMBOLS:
        if key != "p" and key not in data["symbols"]:
            raise StyleError(source, f"symbols.{key}", "missing")
    name = data.get("name") or Path(source).stem
    return Style(name=name, title=data.get("title", name), data=_freeze(data), source=source)


@lru_cache(maxsize=32)
def _load_builtin(name: str) -> Style:
    raw, source = _raw_builtin(name)
    return _finish(_resolve(raw, source, None, (name,)), source)


def load_style(spec: "str | Path | Style | None" = None) -> Style:
    """A style by built-in name (``"apa7"``), by TOML file path, or the default."""
    if isinstance(spec, Style):
        return spec
    if spec is None or spec == "":
        return _load_builtin("apa7")
    if not isinstance(spec, (str, PurePath)):
        raise StyleError(repr(spec)[:40], "style", f"a style is a built-in name (apa7, ama11), a .toml file or a Style (got {type(spec).__name__})")
    text = str(spec)
    if isinstance(spec, str) and not text.endswith(".toml") and "/" not in text and "\\" not in text:
        if text not in builtin_styles():
            raise StyleError(text, "style", f"no built-in style {text!r}; built in: {', '.join(builtin_styles())}")
        return _load_builtin(text)
    path = Path(spec)
    raw, source = _read_file(path)
    return _finish(_resolve(raw, source, path.parent, (path.name,)), source)


def check_style_file(path: "str | Path") -> Style:
    """Validate a house style file; raises StyleError naming the bad key."""
    return load_style(Path(path))
