"""Records to StyledText through the sentence templates.

Each result kind has one Jinja2 template in ``templates/<language>/`` with two
macros: ``stats`` (the statistics string) and ``sentence`` (a full sentence
using the variable labels and group summaries). Templates run in a sandbox
with strict undefined; they never format numbers themselves but call the
helpers below, which ask the number engine and return markup. User text
(labels) is escaped by autoescaping.
"""

from __future__ import annotations

import re
from functools import lru_cache
from importlib import resources
from pathlib import Path
from typing import Any, Callable

from markupsafe import Markup, escape

from ..errors import TemplateError
from ..records import EffectSize, GroupSummary, Interval, Result
from ..style.numbers import Numbers, numbers_for
from ..style.profile import Style, load_style
from .kinds import FORMS, KINDS
from .styled import StyledText
from .styled import escape_markup as _escape_text

__all__ = ["render", "render_many", "templates_dir"]


def templates_dir(language: str = "en") -> Path:
    """The folder of templates: inside the installed package (wheel), else
    the source tree's top-level templates/."""
    packaged = resources.files("statsetter").joinpath("templates", language)
    if packaged.is_dir():
        return Path(str(packaged))
    source = Path(__file__).resolve().parents[3] / "templates" / language
    if source.is_dir():
        return source
    raise TemplateError(f"no templates for language {language!r} (looked in {packaged} and {source})")


@lru_cache(maxsize=8)
def _environment(language: str) -> Any:
    from jinja2 import FileSystemLoader, StrictUndefined
    from jinja2.sandbox import ImmutableSandboxedEnvironment

    return ImmutableSandboxedEnvironment(
        loader=FileSystemLoader(str(templates_dir(language))),
        undefined=StrictUndefined,
        autoescape=True,
        trim_blocks=True,
        lstrip_blocks=True,
        keep_trailing_newline=False,
    )


_SPACE = re.compile(r"\s+")
_SPACE_PUNCT = re.compile(r" +([,;:)\]])(?!\d)")


class Helpers:
    """What templates may call. Each returns markup (or plain values)."""

    def __init__(self, style: Style) -> None:
        self.style = style
        self.num: Numbers = numbers_for(style)
        sep = style.list_separator
        self.sep = sep
        self._join = Markup(f"{sep} ")
        self._symbols = {k: Markup(v) for k, v in style.symbols.items()}
        self._symbols["p"] = Markup(style.p["symbol"])
        self._eq = Markup(" = ")
        self._p_symbol = self._symbols["p"]
        self._levels: dict[float, str] = {}
        ci = style.ci
        self._ci_pattern: str = ci["pattern"]
        self._ci_pattern_neg: str = ci.get("pattern_negative", "") or ci["pattern"]
        self._ci_attach = _escape_text(ci["attach"].format(sep=sep))
        self.significance_wording: bool = bool(style.wording.get("significance", False))

    def globals(self) -> dict[str, Callable[..., Any]]:
        names = (
            "sym stat pv eff effects ci_of ci_after value est desc cat join count pct number df sided var "
            "cap verdict significant direction_word"
        ).split()
        out = {name: getattr(self, name) for name in names}
        out["lsep"] = self._join
        return out

    # symbols and plain numbers ------------------------------------------------

    def sym(self, name: str) -> Markup:
        found = self._symbols.get(name)
        return found if found is not None else escape(name)

    def number(self, value: float, quantity: str = "default", decimals: int | None = None) -> Markup:
        return Markup(_escape_text(self.num.number(value, quantity, decimals)))

    def count(self, value: float) -> Markup:
        return Markup(_escape_text(self.num.integer(value)))

    def df(self, value: float) -> Markup:
        return Markup(_escape_text(self.num.df(value)))

    def pct(self, value: float, r: Result | None = None, path: str | None = None) -> Markup:
        held = _held(r, path) if r is not None and path else None
        return Markup(_escape_text(self.num.percent(value, held=held) + "%"))

    # parts of a statistics string ------------------------------------------

    def stat(self, r: Result, n: bool = False, symbol: str | None = None) -> Markup:
        """``t(38) = 2.14``; with ``n=True`` the chi-square form ``χ²(2, N = 200) = 9.87``."""
        s = r.statistic
        if s is None:
            return _EMPTY
        num = self.num
        inside = [num.df(d) for d in s.df]
        if n and r.n is not None:
            inside.append(f"{self.sym('N')} = {num.integer(r.n)}")
        head = self.sym(symbol or s.symbol)
        if inside:
            head = f"{head}({str.join(self._join, inside)})"
        return Markup(f"{head} = {self._stat_value(r, s.symbol, s.value)}")

    def _stat_value(self, r: Result, symbol: str, value: float) -> str:
        held = _held(r, "statistic.value")
        if symbol in _RANK_SUMS:  # U, T, W: whole numbers print whole (practice)
            if float(value).is_integer():
                return self.num.integer(value)
            return self.num.number(value, symbol, 1, held=held)
        return self.num.number(value, symbol, held=held)

    def pv(self, r: Result, label: str = "") -> Markup:
        """``p = .039`` (or ``p < .001``), decision-preserving at the record's alpha."""
        if r.p is None:
            return _EMPTY
        op, text = self.num.p(r.p, r.alpha, held=_held(r, "p"))
        if not label and r.details.get("p_adjusted"):  # a p adjusted for multiple comparisons says so
            label = f"{r.details['p_adjusted']}-adjusted"
        prefix = f"{escape(label)} " if label else ""
        return Markup(f"{prefix}{self._p_symbol} {_OPS[op]} {text}")

    def sided(self, r: Result) -> Markup:
        if r.alternative == "two-sided":
            return _EMPTY
        return Markup(" (one-sided)")

    def ci_of(self, r: Result, interval: Interval | None, quantity: str, null: float = 0.0, path: str = "") -> Markup:
        """``95% CI [0.04, 1.31]`` in the style's pattern; limits keep the decision."""
        if interval is None:
            return _EMPTY
        return Markup(self._ci(r, interval, quantity, null, path))

    def _ci(self, r: Result, interval: Interval, quantity: str, null: float, path: str) -> str:
        held = (_held(r, f"{path}.low"), _held(r, f"{path}.high")) if path and r.precision else (None, None)
        low, high = self.num.interval(interval.low, interval.high, quantity, null, held)
        level = self._levels.get(interval.level)
        if level is None:
            level = self.num.number(interval.level * 100, "level", _level_decimals(interval.level))
            self._levels[interval.level] = level
        pattern = self._ci_pattern_neg if (interval.low < 0 or interval.high < 0) else self._ci_pattern
        return _escape_text(pattern.format(level=level, low=low, high=high, sep=self.sep))

    def ci_after(self, r: Result, interval: Interval | None, quantity: str, null: float = 0.0, path: str = "") -> Markup:
        """The CI attached to the value before it, in the style's way (``, 95% CI [..]`` or `` (95% CI, ..)``)."""
        if interval is None:
            return _EMPTY
        return Markup(self._ci_attach + self._ci(r, interval, quantity, null, path))

    def eff(self, r: Result, name: str | None = None, with_ci: bool = True) -> Markup:
        """``d = 0.68, 95% CI [0.04, 1.31]`` for the record's effect size (by name)."""
        for i, e in enumerate(r.effects):
            if name is None or e.name == name:
                return Markup(self._effect(r, e, i, with_ci))
        return _EMPTY

    def _effect(self, r: Result, e: EffectSize, i: int, with_ci: bool) -> str:
        held = _held(r, f"effects[{i}].value") if r.precision else None
        out = f"{self.sym(e.name)} = {self.num.number(e.value, e.name, held=held)}"
        if with_ci and e.ci is not None:
            out += self._ci_attach + self._ci(r, e.ci, e.name, e.null, f"effects[{i}].ci")
        return out

    def effects(self, r: Result) -> Markup:
        """Every effect size with its CI, in the record's order."""
        return self.join(*[Markup(self._effect(r, e, i, True)) for i, e in enumerate(r.effects)])

    def value(self, r: Result, path: str, value: float, quantity: str = "default") -> Markup:
        return Markup(self.num.number(value, quantity, held=_held(r, f"{path}.value")))

    def est(self, r: Result, with_ci: bool = True, symbol: str | None = None, quantity: str | None = None) -> Markup:
        """The estimate's value (with its symbol when given) and CI."""
        e = r.estimate
        if e is None:
            return _EMPTY
        q = quantity or e.name
        out = self.num.number(e.value, q, held=_held(r, "estimate.value"))
        if symbol:
            out = f"{self.sym(symbol)} = {out}"
        if with_ci and e.ci is not None:
            out += self._ci_attach + self._ci(r, e.ci, q, e.null, "estimate.ci")
        return Markup(out)

    def desc(self, r: Result, index: int = 0, parts: str = "mean sd n") -> Markup:
        """``M = 4.22, SD = 0.73, n = 40`` for group ``index``; absent parts are left out."""
        if index >= len(r.groups):
            return Markup("")
        g: GroupSummary = r.groups[index]
        out = []
        path = f"groups[{index}]"
        for part in parts.split():
            v = getattr(g, _GROUP_FIELDS[part])
            if v is None:
                continue
            symbol = _GROUP_SYMBOLS[part]
            if part == "n":
                text = self.count(v)
            elif part == "iqr":
                q1, q3 = g.q1, g.q3
                if q1 is None or q3 is None:
                    continue
                text = Markup(_escape_text(f"{self.num.number(q1, 'M')}{self.sep} {self.num.number(q3, 'M')}"))
                text = Markup("[") + text + Markup("]")
            else:
                text = Markup(_escape_text(self.num.number(v, symbol, held=_held(r, f"{path}.{_GROUP_FIELDS[part]}"))))
            out.append(self.sym(symbol) + self._eq + text)
        return self._join.join(out)

    def cat(self, r: Result, index: int) -> Markup:
        """``45 (37.5%)`` for category ``index`` of a categorical summary."""
        g = r.groups[index]
        if g.n is None:
            return Markup("")
        out = self.count(g.n)
        if g.percent is not None:
            out = out + Markup(" (") + self.pct(g.percent, r, f"groups[{index}].percent") + Markup(")")
        return out

    def join(self, *parts: Any) -> Markup:
        """Join the non-empty parts with the style's list separator."""
        return Markup(str.join(self._join, [p if isinstance(p, Markup) else escape(p) for p in parts if p]))

    # wording ----------------------------------------------------------------

    def var(self, r: Result, role: str, fallback: str = "") -> str:
        v = r.variable(role)
        return v.display if v is not None else fallback

    def cap(self, text: Any) -> Markup:
        text = Markup(escape(text))
        return Markup(text[:1].upper() + text[1:]) if text else text

    def significant(self, r: Result) -> bool:
        return r.p is not None and r.p < r.alpha

    def verdict(self, r: Result) -> str:
        """``statistically significant`` / ``not statistically significant`` when
        the style asks for the phrase, else empty."""
        if not self.significance_wording or r.p is None:
            return ""
        return "statistically significant" if r.p < r.alpha else "not statistically significant"

    def direction_word(self, value: float | None, up: str, down: str, same: str = "") -> str:
        if value is None:
            return same
        return up if value > 0 else down if value < 0 else same


_RANK_SUMS = frozenset({"U", "T", "W"})
_EMPTY = Markup("")
_OPS = {"=": "=", "<": "&lt;", ">": "&gt;"}
_GROUP_FIELDS = {"mean": "mean", "sd": "sd", "n": "n", "median": "median", "iqr": "q1", "min": "minimum", "max": "maximum"}
_GROUP_SYMBOLS = {"mean": "M", "sd": "SD", "n": "n", "median": "Mdn", "iqr": "IQR", "min": "min", "max": "max"}


def _level_decimals(level: float) -> int:
    pct = round(level * 100, 6)
    return 0 if pct.is_integer() else len(repr(pct).split(".")[1])


def _held(r: Result, path: str) -> int | None:
    precision = r.precision
    if not precision:
        return None
    return precision.get(path)


@lru_cache(maxsize=256)
def _macros(style: Style, language: str, kind: str) -> Any:
    env = _environment(language)
    from jinja2 import TemplateNotFound

    try:
        template = env.get_template(f"{kind}.j2")
    except TemplateNotFound:
        known = ", ".join(sorted(KINDS))
        raise TemplateError(f"no template for result kind {kind!r}; known kinds: {known}") from None
    return template.make_module(vars=_helpers(style).globals())


@lru_cache(maxsize=32)
def _helpers(style: Style) -> Helpers:
    return Helpers(style)


_UNTIDY = re.compile(r"\s\s|[^\S ]| [,;:)\]]|^\s|\s$")  # what _tidy would change


def _tidy(markup: str) -> str:
    if _UNTIDY.search(markup) is None:  # most statistics strings are tidy already
        return markup
    text = _SPACE.sub(" ", markup).strip()
    return _SPACE_PUNCT.sub(r"\1", text)


def render(record: Result, form: str = "stats", style: "Style | str | None" = None, language: str = "en") -> StyledText:
    """A record as StyledText: ``form`` is ``stats`` or ``sentence``."""
    resolved = style if isinstance(style, Style) else load_style(style)
    fn = _renderer(resolved, language, record.kind, form)
    try:
        markup = fn(record)
    except TemplateError:
        raise
    except Exception as exc:  # a template expression that does not fit the record
        raise TemplateError(f"template {record.kind}.j2 ({form}) failed: {exc}") from None
    try:
        return StyledText.from_markup(_tidy(str(markup)))
    except ValueError as exc:
        raise TemplateError(f"template {record.kind}.j2 ({form}) produced bad markup: {exc}") from None


@lru_cache(maxsize=512)
def _renderer(style: Style, language: str, kind: str, form: str) -> Callable[[Result], Any]:
    """The callable behind one (style, kind, form): the template's macro, or,
    for a stats form that is a single expression of helper calls, that
    expression compiled to Python once (the same helpers, without the
    template engine's per-call machinery; tests/test_templates.py checks that
    both give the same text for every kind)."""
    if form not in FORMS:
        raise TemplateError(f"unknown form {form!r}; forms: {', '.join(FORMS)}")
    module = _macros(style, language, kind)
    macro = getattr(module, form, None)
    if macro is None:
        raise TemplateError(f"template {kind}.j2 has no macro {form!r}")
    if form == "stats":
        fast = compiled_stats(style, language, kind)
        if fast is not None:
            return fast
    from jinja2 import TemplateError as JinjaError

    def run(record: Result) -> Any:
        try:
            return macro(record)
        except JinjaError as exc:
            raise TemplateError(f"template {kind}.j2 ({form}) failed: {exc}") from None

    return run


_STATS_MACRO = re.compile(r"\{%-?\s*macro stats\(r\)\s*-?%\}\{\{(?P<expr>.*?)\}\}\{%-?\s*endmacro\s*-?%\}", re.S)
_STRING = re.compile(r"(\"(?:[^\"\\]|\\.)*\"|'(?:[^'\\]|\\.)*')")
_WORDS = {"none": "None", "true": "True", "false": "False"}


def compiled_stats(style: Style, language: str, kind: str) -> Callable[[Result], Any] | None:
    """The stats macro as a Python expression over the helpers, or None when
    the template is more than one expression (then the macro is used)."""
    source = (templates_dir(language) / f"{kind}.j2").read_text(encoding="utf-8")
    m = _STATS_MACRO.search(source)
    if m is None or "|" in _STRING.sub("", m.group("expr")):
        return None
    parts = _STRING.split(m.group("expr"))
    for i in range(0, len(parts), 2):  # outside string literals: Jinja's ~ and lower-case constants
        parts[i] = re.sub(r"\b(none|true|false)\b", lambda w: _WORDS[w.group(1)], parts[i].replace("~", "+"))
    try:
        code = compile("".join(parts).strip(), f"{kind}.j2:stats", "eval")
    except SyntaxError:
        return None
    names = dict(_helpers(style).globals())
    names["__builtins__"] = {}

    def run(record: Result) -> Any:
        return eval(code, names, {"r": record})

    return run


def render_many(
    records: "list[Result] | tuple[Result, ...]", form: str = "stats", style: "Style | str | None" = None
) -> list[StyledText]:
    resolved = load_style(style)
    return [render(r, form, resolved) for r in records]
