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

from ..errors import RecordError, TemplateError
from ..records import EffectSize, GroupSummary, Interval, Result
from ..style.numbers import Numbers, numbers_for
from ..style.profile import Style, load_style
from .kinds import FORMS, KINDS
from ..styled import StyledText
from ..styled import escape_markup as _escape_text

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
    """One template environment per language (it keeps each template compiled once per process)."""
    from jinja2 import FileSystemLoader, StrictUndefined
    from jinja2.sandbox import ImmutableSandboxedEnvironment

    return ImmutableSandboxedEnvironment(
        loader=FileSystemLoader(str(templates_dir(language))),
        undefined=StrictUndefined,
        autoescape=True,
        trim_blocks=True,
        lstrip_blocks=True,
        keep_trailing_newline=False,
        bytecode_cache=_bytecode_cache(),
    )


def _bytecode_cache(directory: str | None = None) -> Any:
    """Compiled templates kept between runs in Jinja's own per-user folder
    under the temporary directory (created private, owner checked, entries
    matched by the template file's checksum), or in ``directory``; None where
    no such folder can be used, and a failing read or write is never an error."""
    from jinja2 import FileSystemBytecodeCache

    class Quiet(FileSystemBytecodeCache):
        def load_bytecode(self, bucket: Any) -> None:
            try:
                super().load_bytecode(bucket)
            except Exception:  # unreadable or damaged: compiled afresh
                bucket.reset()

        def dump_bytecode(self, bucket: Any) -> None:
            try:
                super().dump_bytecode(bucket)
            except Exception:  # read-only or full: not kept
                pass

    try:
        return Quiet(directory)
    except Exception:  # no usable temporary folder
        return None


_SPACE = re.compile(r"[ \t\r\n]+")
_SPACE_PUNCT = re.compile(r" +([,;:)\]])(?!\d)")


class Helpers:
    """What templates may call. The markup helpers return markup as ``str``
    (numbers and symbols already escaped); :meth:`globals` hands them to
    Jinja wrapped in :class:`~markupsafe.Markup`, and the compiled stats
    forms call them directly."""

    def __init__(self, style: Style) -> None:
        self.style = style
        self.num: Numbers = numbers_for(style)
        sep = style.list_separator
        self.sep = sep
        self._join = f"{sep} "
        self._symbols = dict(style.symbols)
        self._symbols["p"] = style.p["symbol"]
        self._p_symbol = self._symbols["p"]
        self._levels: dict[float, str] = {}
        ci = style.ci
        # the style's CI patterns escaped once: the numbers put into them never need it
        self._ci_pattern: str = _escape_text(ci["pattern"])
        self._ci_pattern_neg: str = _escape_text(ci.get("pattern_negative", "") or ci["pattern"])
        self._ci_attach = _escape_text(ci["attach"].format(sep=sep))
        self.significance_wording: bool = bool(style.wording.get("significance", False))
        self._serial: bool = bool(style.wording.get("serial_comma", True))
        self._mean_sd: bool = style.spells_out
        self._pseudo = f"R2_{style.wording.get('pseudo_r2', 'nagelkerke')}"
        self._df_sub: bool = style.data["numbers"].get("df_form", "parentheses") == "subscript"
        # inside a statistic ("t(38) = 2.14", "p < .001", "95% CI [a, b]", "n = 93") the style's unbreakable space
        nb = style.keep_together
        self._nb = nb
        self._eq = f"{nb}={nb}"
        self._ci_pattern = self._ci_pattern.replace(" ", nb)
        self._ci_pattern_neg = self._ci_pattern_neg.replace(" ", nb)

    _MARKUP = "sym stat pv sided eff effects ci_of ci_after own_ci value est se desc cat count pct number df compatible paren".split()
    _PLAIN = "var var_list group cap verdict significant direction_word null and_next predictors pseudo_r2".split()

    def raw(self) -> dict[str, Any]:
        """The names a compiled stats form sees: the markup helpers as they
        are (returning ``str``) and a join that does not escape."""
        out: dict[str, Any] = {name: getattr(self, name) for name in self._MARKUP + self._PLAIN}
        out["join"] = self.join_raw
        out["lsep"] = self._join
        out["eq"] = self._eq
        return out

    def globals(self) -> dict[str, Callable[..., Any]]:
        """The names a Jinja template sees: markup helpers return Markup, so
        that autoescaping leaves them alone and escapes everything else."""
        out: dict[str, Any] = {name: _as_markup(getattr(self, name)) for name in self._MARKUP}
        out.update({name: getattr(self, name) for name in self._PLAIN})
        out["join"] = self.join
        out["lsep"] = Markup(self._join)
        out["eq"] = Markup(self._eq)  # " = " inside a statistic, with the style's unbreakable spaces
        return out

    # symbols and plain numbers ------------------------------------------------

    def sym(self, name: str) -> str:
        found = self._symbols.get(name)
        return found if found is not None else _escape_text(name)

    def number(self, value: float, quantity: str = "default", decimals: int | None = None) -> str:
        return self.num.number(value, quantity, decimals)  # numbers never hold & < >

    def count(self, value: float) -> str:
        return self.num.integer(value)

    def df(self, value: float) -> str:
        return self.num.df(value)

    def pct(self, value: float, r: Result | None = None, path: str | None = None) -> str:
        held = _held(r, path) if r is not None and path else None
        return self.num.percent(value, held=held) + "%"

    # parts of a statistics string ------------------------------------------

    def stat(self, r: Result, n: bool = False, symbol: str | None = None) -> str:
        """``t(38) = 2.14``; with ``n=True`` the chi-square form ``χ²(2, N = 200) = 9.87``."""
        s = r.statistic
        if s is None:
            return ""
        num = self.num
        inside = [num.df(d) for d in s.df]
        if n and r.n is not None:
            inside.append(f"{self.sym('N')}{self._eq}{num.integer(r.n)}")
        head = self.sym(symbol or s.symbol)
        if inside and self._df_sub and not head.endswith("</sub>"):  # AMA: t₃₈, F₂,₂₃₇ (N stays in the text); rs keeps (238)
            head = f"{head}<sub>{self.sep.join(num.df(d) for d in s.df)}</sub>" if s.df else head
        elif inside:
            head = f"{head}({(self.sep + self._nb).join(inside)})"  # "F(2, 128.22)" keeps together too
        return f"{head}{self._eq}{self._stat_value(r, s.symbol, s.value)}"

    def _stat_value(self, r: Result, symbol: str, value: float) -> str:
        held = _held(r, "statistic.value")
        if symbol in _RANK_SUMS:  # U, T, W, V: whole numbers print whole (practice)
            if float(value).is_integer():
                return self.num.integer(value)
            return self.num.number(value, symbol, 1, held=held)
        return self.num.number(value, symbol, held=held)

    def pv(self, r: Result, label: str = "") -> str:
        """``p = .039`` (or ``p < .001``), decision-preserving at the record's alpha."""
        if r.p is None:
            return ""
        op, text = self.num.p(r.p, r.alpha, held=_held(r, "p"))
        if not label and r.details.get("p_adjusted"):  # a p adjusted for multiple comparisons says so
            label = f"{r.details['p_adjusted']}-adjusted"
        if label:
            return f"{escape(label)} {self._p_symbol}{self._nb}{_OPS[op]}{self._nb}{text}"
        return f"{self._p_symbol}{self._nb}{_OPS[op]}{self._nb}{text}"

    def sided(self, r: Result) -> str:
        if r.alternative == "two-sided":
            return ""
        return " (one-sided)"

    def ci_of(self, r: Result, interval: Interval | None, quantity: str, null: float = 0.0, path: str = "") -> str:
        """``95% CI [0.04, 1.31]`` in the style's pattern; limits keep the decision."""
        if interval is None:
            return ""
        return self._ci(r, interval, quantity, null, path)

    def _ci(self, r: Result, interval: Interval, quantity: str, null: float, path: str, decimals: int | None = None) -> str:
        held = (_held(r, f"{path}.low"), _held(r, f"{path}.high")) if path and r.precision else (None, None)
        low, high = self.num.interval(interval.low, interval.high, quantity, null, held, decimals)
        level = self._levels.get(interval.level)
        if level is None:
            level = self.num.number(interval.level * 100, "level", _level_decimals(interval.level))
            self._levels[interval.level] = level
        pattern = self._ci_pattern_neg if (interval.low < 0 or interval.high < 0) else self._ci_pattern
        return pattern.format(level=level, low=low, high=high, sep=self.sep)

    def ci_after(self, r: Result, interval: Interval | None, quantity: str, null: float = 0.0, path: str = "") -> str:
        """The CI attached to the value before it, in the style's way (``, 95% CI [..]`` or `` (95% CI, ..)``)."""
        if interval is None:
            return ""
        return self._ci_attach + self._ci(r, interval, quantity, null, path)

    def own_ci(self, r: Result) -> str:
        """A reported test's own interval (details ci_level, ci_low, ci_high: a difference's or a coefficient's, read by the
        audit) attached to what it follows in the style's way (``, 95% CI [..]`` or `` (95% CI, ..)``), with what the text
        said it is of (details ci_label, "for the difference") after "CI"; "" without one."""
        level = r.details.get("ci_level")
        if level is None:
            return ""
        text = self.ci_after(r, Interval(level, r.details["ci_low"], r.details["ci_high"]), "MD", 0.0, "details.ci")
        label = r.details.get("ci_label")  # what the text says it is of, "for the difference": after "CI", as typed
        return text.replace("CI", f"CI {escape(label)}", 1) if label else text

    def eff(self, r: Result, name: str | None = None, with_ci: bool = True) -> str:
        """``d = 0.68, 95% CI [0.04, 1.31]`` for the record's effect size (by name)."""
        for i, e in enumerate(r.effects):
            if name is None or e.name == name:
                return self._effect(r, e, i, with_ci)
        return ""

    def _effect(self, r: Result, e: EffectSize, i: int, with_ci: bool) -> str:
        held = _held(r, f"effects[{i}].value") if r.precision else None
        out = f"{self.sym(e.name)}{self._eq}{self.num.number(e.value, e.name, held=held)}"
        if with_ci and e.ci is not None:
            out += self._ci_attach + self._ci(r, e.ci, e.name, e.null, f"effects[{i}].ci" if r.precision else "")
        return out

    def effects(self, r: Result) -> str:
        """Every effect size with its CI, in the record's order."""
        return self.join_raw(*[self._effect(r, e, i, True) for i, e in enumerate(r.effects)])

    def value(self, r: Result, path: str, value: float, quantity: str = "default") -> str:
        return self.num.number(value, quantity, held=_held(r, f"{path}.value"))

    def est(self, r: Result, with_ci: bool = True, symbol: str | None = None, quantity: str | None = None) -> str:
        """The estimate's value (with its symbol when given) and CI."""
        e = r.estimate
        if e is None:
            return ""
        q = quantity or e.name
        out = self.num.number(e.value, q, held=_held(r, "estimate.value"))
        if symbol:
            out = f"{self.sym(symbol)}{self._eq}{out}"
        if with_ci and e.ci is not None:  # the limits get the estimate's decimals (like values alike, APA 7 §6.36)
            shown = self.num.shown_decimals(e.value, q, _held(r, "estimate.value"))
            out += self._ci_attach + self._ci(r, e.ci, q, e.null, "estimate.ci", shown if shown > self.num.decimals_for(q) else None)
        return out

    def se(self, r: Result, quantity: str = "B") -> str:
        """``SE = 0.15``: the estimate's standard error, with the estimate's decimals where a small estimate was given
        more than the style's (B = −0.001, SE = 0.151: like values alike, APA 7 §6.36); "" without one."""
        e = r.estimate
        if e is None or e.se is None:
            return ""
        shown = self.num.shown_decimals(e.value, quantity, _held(r, "estimate.value"))
        wider = shown if shown > self.num.decimals_for(quantity) else None
        return f"{self.sym('SE')}{self._eq}{self.num.number(e.se, 'SE', wider, held=_held(r, 'estimate.se'))}"

    def pseudo_r2(self) -> str:
        """The pseudo-R² a logistic model reports in this style: R2_nagelkerke or R2_mcfadden."""
        return self._pseudo

    def desc(self, r: Result, index: int = 0, parts: str = "mean sd n") -> str:
        """``M = 4.22, SD = 0.73, n = 40`` for group ``index`` (AMA: ``mean [SD],
        4.22 [0.73]; n = 40``, brackets since it stands in parentheses, and
        ``median, 2; n = 40``); absent parts are left out."""
        if index >= len(r.groups):
            return ""
        g: GroupSummary = r.groups[index]
        out = []
        path = f"groups[{index}]"
        worded = False  # a part in words (AMA: "mean [SD], …", "median, …") is followed by a semicolon
        if self._mean_sd and g.mean is not None and g.sd is not None and "mean" in parts.split() and "sd" in parts.split():
            m = self.num.number(g.mean, "M", held=_held(r, f"{path}.mean"))
            sd = self.num.number(g.sd, "SD", held=_held(r, f"{path}.sd"))
            out.append(f"mean [SD], {m} [{sd}]")
            parts = " ".join(p for p in parts.split() if p not in ("mean", "sd"))
            worded = True
        named = g.extra.get("median_label")  # the category a coded median stands for: "4 [Moderate]"
        quartiled = "iqr" in parts.split() and g.q1 is not None and g.q3 is not None
        median_held = 0 if named else _held(r, f"{path}.{'q1' if quartiled else 'median'}")  # beside its quartiles, their decimals
        if self._mean_sd and g.median is not None and "median" in parts.split():  # words, not Mdn: "median, 2" (AMA)
            median = self.num.number(g.median, "Mdn", held=median_held) + (f" [{_escape_text(named)}]" if named else "")
            if quartiled:  # "median [IQR], 2 [1-3]"
                q1, q3 = self.quartile(r, index, "q1"), self.quartile(r, index, "q3")
                out.append(f"median [IQR], {median} [{self.num.span(q1, q3, g.q1 < 0, self._nb)}]")
            else:
                out.append(f"median, {median}")
            parts = " ".join(p for p in parts.split() if p not in ("median", "iqr"))
            worded = True
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
                text = f"[{self.quartile(r, index, 'q1')}{self.sep}{self._nb}{self.quartile(r, index, 'q3')}]"
            elif part == "median":  # a code is printed as one, with its category
                text = self.num.number(v, symbol, held=median_held) + (f" [{_escape_text(named)}]" if named else "")
            else:
                text = self.num.number(v, symbol, held=_held(r, f"{path}.{_GROUP_FIELDS[part]}"))
            out.append(f"{self.sym(symbol)}{self._eq}{text}")
        return ("; " if worded else self._join).join(out)  # after a worded part ("mean [SD], 2.86 [0.59]") a semicolon

    def quartile(self, r: Result, index: int, which: str) -> str:
        """A group's first or third quartile, with the decimals its median has (a whole-number score's "2", as
        Table 1 prints it)."""
        return self.num.number(getattr(r.groups[index], which), "Mdn", held=_held(r, f"groups[{index}].{which}"))

    def paren(self, text: str) -> str:
        """`` (text)`` after a group's name, or nothing when there is nothing to say."""
        return f" ({text})" if text else ""

    def cat(self, r: Result, index: int) -> str:
        """``45 (37.5%)`` for category ``index`` of a categorical summary."""
        g = r.groups[index]
        if g.n is None:
            return ""
        out = self.count(g.n)
        if g.percent is not None:
            out = f"{out} ({self.pct(g.percent, r, f'groups[{index}].percent')})"
        return out

    def join(self, *parts: Any) -> Markup:
        """Join the non-empty parts with the style's list separator (in a
        template: parts that are not markup are escaped)."""
        return Markup(self._join.join([p if isinstance(p, Markup) else escape(p) for p in parts if p]))

    def join_raw(self, *parts: str) -> str:
        """:meth:`join` for parts that are all markup already."""
        return self._join.join([p for p in parts if p])

    # wording ----------------------------------------------------------------

    def and_next(self, loop: Any) -> str:
        """What follows an item of a list in a sentence, given the template's
        ``loop``: ", " between items, " and " before the last of two, ", and "
        before the last of three or more with the style's serial comma."""
        if loop.last:
            return ""
        if loop.revindex == 2:
            return ", and " if self._serial and loop.length > 2 else " and "
        return ", "

    def predictors(self, r: Result) -> str:
        """A model's predictors listed in a sentence, from its variables (or
        the list its details give)."""
        names = [v.display for v in r.variables if v.role == "predictor"]
        return self.listing(names) if names else str(r.details.get("predictors", ""))

    def listing(self, names: "list[str]") -> str:
        """Items in a sentence: "a and b", "a, b, and c" (the style's serial comma)."""
        if len(names) < 3:
            return " and ".join(names)
        return ", ".join(names[:-1]) + (", and " if self._serial else " and ") + names[-1]

    def var(self, r: Result, role: str, fallback: str = "") -> str:
        v = r.variable(role)
        return v.display if v is not None else fallback

    def group(self, r: Result, index: int) -> str:
        """Group ``index``'s name in a sentence: its label, or, where the label names no group by itself — an answer
        ("no", "yes", "true", "absent") or a bare number (a code without a value label) — the grouping variable's
        name with it, as Table 1's spanner gives it: "lower in any affair: no (M = …) than in any affair: yes", not
        "lower in no than in yes". (A value label that names the group, "no affair", is printed as it is.)"""
        label = str(r.groups[index].label)
        v = r.variable("group")
        return f"{v.display}: {label}" if v is not None and names_no_group(label) else label

    def var_list(self, r: Result, role: str, fallback: str = "") -> str:
        """Every variable in ``role``, listed ("a and b")."""
        names = [v.display for v in r.variables if v.role == role]
        return self.listing(names) if names else fallback

    def cap(self, text: Any) -> Markup:
        text = Markup(escape(text))
        return Markup(text[:1].upper() + text[1:]) if text else text

    def significant(self, r: Result) -> bool:
        return r.p is not None and r.p < r.alpha

    def null(self, r: Result) -> bool:
        """True when the result does not reach the record's alpha (p ≥ alpha),
        or, without a p, when the interval of its estimate (else its first
        effect size) includes the null value: sentences then assert no
        direction (ASA statement on p values, 2016; docs/reporting-rules.md)."""
        if r.p is not None:
            return r.p >= r.alpha
        for interval, null in ((r.estimate.ci, r.estimate.null) if r.estimate else (None, 0.0),
                               *((e.ci, e.null) for e in r.effects[:1])):
            if interval is not None:
                return interval.low <= null <= interval.high
        return False

    def compatible(self, r: Result, noun: str = "difference") -> str:
        """``compatible with no difference at α = .05``: how a null result is
        read, in our own words (never "no effect", never evidence of absence)."""
        said = "not statistically significant and " if self.significance_wording else ""
        return f"{said}compatible with no {escape(noun)} at {self.sym('alpha')}{self._eq}{self.num.number(r.alpha, 'alpha_level')}"

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


def _as_markup(fn: Callable[..., str]) -> Callable[..., Markup]:
    def wrapped(*args: Any, **kwargs: Any) -> Markup:
        return Markup(fn(*args, **kwargs))

    wrapped.__name__ = wrapped.__qualname__ = fn.__name__
    wrapped.__doc__ = fn.__doc__
    return wrapped


_RANK_SUMS = frozenset({"U", "T", "W", "V"})
_OPS = {"=": "=", "<": "&lt;", ">": "&gt;"}
_GROUP_FIELDS = {"mean": "mean", "sd": "sd", "n": "n", "median": "median", "iqr": "q1", "min": "minimum", "max": "maximum"}
_GROUP_SYMBOLS = {"mean": "M", "sd": "SD", "n": "n", "median": "Mdn", "iqr": "IQR", "min": "min", "max": "max"}


def _level_decimals(level: float) -> int:
    pct = round(level * 100, 6)
    return 0 if pct.is_integer() else len(repr(pct).split(".")[1])


_ANSWERS = frozenset("yes no y n true false present absent".split())  # labels that answer a question, naming no group
_BARE_NUMBER = re.compile(r"[-+−]?\d+(?:[.,]\d+)?")


def names_no_group(label: str) -> bool:
    """Whether a group's label names no group in a sentence by itself: an answer ("no", "Yes", "absent") or a bare
    number (a code without a value label)."""
    label = label.strip()
    return label.lower() in _ANSWERS or _BARE_NUMBER.fullmatch(label) is not None


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


def _tidy(markup: str) -> str:
    """Collapse the templates' whitespace (ASCII space, tab, newline) and drop
    a space before closing punctuation. Other spaces (a style's thin or
    no-break space) are the style's and stay."""
    if not (  # most statistics strings are tidy already: a few substring checks say so
        "  " in markup or "\n" in markup or "\t" in markup or "\r" in markup
        or " ," in markup or " ;" in markup or " :" in markup or " )" in markup or " ]" in markup
        or markup[:1] == " " or markup[-1:] == " "
    ):
        return markup
    text = _SPACE.sub(" ", markup).strip(" ")
    return _SPACE_PUNCT.sub(r"\1", text)


_POSSESSIVE = re.compile(r"\b(Welch|Student|Fisher|Cronbach|Kendall|Pearson|Spearman|Cohen|Cliff|Levene|Bartlett|Tukey|Mauchly|Hedges|McNemar|Cochran|Friedman|Mann|Wilcoxon|Greenhouse|Huynh)(?:['’]s|&#39;s|['’]|&#39;)(?=[\s\u00a0\u202f<])")  # (curly too: the styles' own symbols, "Cliff’s d", type it so)


def eponyms(text: str, style: Style) -> str:
    """Methods named after people as the style writes them: "Welch's t test"
    (APA 7) or "Welch t test" (AMA 11 drops the possessive)."""
    if style.wording.get("possessive", True) or ("'" not in text and "&#39;" not in text and "’" not in text):
        return text
    return _POSSESSIVE.sub(r"\1", text)


def render(record: Result, form: str = "stats", style: "Style | str | None" = None, language: str = "en") -> StyledText:
    """A record as StyledText: ``form`` is ``stats`` or ``sentence``."""
    if not isinstance(record, Result):
        raise RecordError("record", f"render takes a Result (got {type(record).__name__})"
                          + ("; a Description or CorrelationMatrix is laid out by table()" if hasattr(record, "variables") else ""))
    resolved = style if isinstance(style, Style) else load_style(style)
    fn = _renderer(resolved, language, record.kind, form)
    try:
        markup = fn(record)
    except TemplateError:
        raise
    except Exception as exc:  # a template expression that does not fit the record
        raise TemplateError(f"template {record.kind}.j2 ({form}) failed: {exc}") from None
    try:
        return StyledText.from_markup(eponyms(_tidy(str(markup)), resolved))
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
    """The stats macro as a Python expression over the helpers (their plain
    ``str`` form, :meth:`Helpers.raw`), or None when the template is more
    than one expression or has a literal Jinja would escape (then the macro
    is used)."""
    source = (templates_dir(language) / f"{kind}.j2").read_text(encoding="utf-8")
    m = _STATS_MACRO.search(source)
    if m is None or "|" in _STRING.sub("", m.group("expr")):
        return None
    parts = _STRING.split(m.group("expr"))
    if any(c in literal for literal in parts[1::2] for c in "&<>"):
        return None  # Jinja would escape these literals; the compiled form would not
    for i in range(0, len(parts), 2):  # outside string literals: Jinja's ~ and lower-case constants
        parts[i] = re.sub(r"\b(none|true|false)\b", lambda w: _WORDS[w.group(1)], parts[i].replace("~", "+"))
    try:
        code = compile("".join(parts).strip(), f"{kind}.j2:stats", "eval")
    except SyntaxError:
        return None
    names = _helpers(style).raw()
    names["__builtins__"] = {}

    def run(record: Result) -> Any:
        return eval(code, names, {"r": record})

    return run


def render_many(
    records: "list[Result] | tuple[Result, ...]", form: str = "stats", style: "Style | str | None" = None
) -> list[StyledText]:
    resolved = load_style(style)
    return [render(r, form, resolved) for r in records]
