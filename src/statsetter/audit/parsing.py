"""Finding reported statistics in running text.

A statistic is a *head* — a test symbol, its degrees of freedom (and N for
χ²) in parentheses, an operator and a value: ``t(38) = 2.14``,
``χ2(2, N = 200) = 9.87``, ``F (2,97)=4.51``, ``rs = -.29`` — and the
clause that follows it up to the next head or the end of the sentence, where
its p value, confidence interval, effect sizes, df written apart
(``df = 23``), N or n, M and SD are read. p values outside any clause are
found on their own. Every number keeps the text it was printed as, so
decimals and leading zeros can be checked and no digit is invented.

The parser never raises on text: anything it cannot read is left alone.
"""

from __future__ import annotations

import bisect
import functools
import re
from dataclasses import dataclass, field
from typing import Callable, Iterable, TypeVar
from decimal import Decimal, InvalidOperation

from ..records.result import _unchecked_maker

__all__ = ["Number", "PValue", "Interval", "Effect", "Reported", "find_statistics", "symbol_of", "decimal_mark_of"]

# the marks of significance a table or its note sets ("3.10**", "*p < .05", "0.12 ^"); an asterisk also as the low asterisk
# and the asterisk operator a copy from a publisher's page or a PDF gives ("1.24 (1.05,1.45)⁎⁎", "⁎ p < 0.05")
_SIGNIFICANCE = "*†‡§^⁎∗"
ONE_STAR = str.maketrans("⁎∗", "**")  # those asterisks as the one a note's definitions are looked up by

T = TypeVar("T")
_MINUS = "-−–‐"  # hyphen-minus, minus, en dash, hyphen: all read as minus
# what stands between an interval's limits: "to", a dash, a minus sign as typeset pages print the dash ("1.043−3.013") or a
# tilde, as East Asian journals type a range ("1.277~1.384", the full-width "～" too)
_DASH = r"to|–|—|-|−|~|～"


@dataclass(frozen=True, slots=True)
class Number:
    text: str  # as printed
    value: float
    decimals: int
    start: int
    end: int

    @property
    def sign(self) -> str:
        return self.text[0] if self.text and self.text[0] in _MINUS else ""

    @property
    def digits(self) -> str:
        """The printed number without its sign."""
        return self.text.lstrip(_MINUS).strip()

    @property
    def half_unit(self) -> float:
        return 0.5 * 10.0 ** (-self.decimals)


@dataclass(frozen=True, slots=True)
class PValue:
    op: str  # "=", "<", ">", "≤", "≥", or "ns"
    number: Number | None
    start: int
    end: int
    symbol_start: int
    symbol_text: str
    adjusted: bool = False  # "Holm-adjusted p", "corrected p": not recomputable from the statistic alone


@dataclass(frozen=True, slots=True)
class Interval:
    level: float | None  # None: typed without its level ("d = 0.62 [0.21, 1.03]"), read for its limits only
    low: Number
    high: Number
    start: int
    end: int


@dataclass(frozen=True, slots=True)
class Effect:
    name: str  # canonical: d, g, eta2, eta2_p, omega2, V, phi, R2, R2_adj, beta, OR (aOR, HR, aHR, RR, aRR, IRR), M, SD
    number: Number
    start: int
    end: int
    symbol_start: int
    symbol_text: str
    ci: Interval | None = None


@dataclass(slots=True)
class Reported:
    """One reported statistic: the head (absent for a lone p value) and its clause."""

    symbol: str | None  # canonical: t, F, chi2, r, rs, tau_b, z, U, H, W, T
    symbol_text: str
    symbol_start: int
    start: int
    end: int
    df: tuple[Number, ...] = ()
    n: Number | None = None
    op: str = "="
    value: Number | None = None
    p: PValue | None = None
    ci: Interval | None = None  # a CI on the statistic itself (r) or without an effect
    effects: list[Effect] = field(default_factory=list)
    descriptives: list[Effect] = field(default_factory=list)
    operators: list[tuple[int, int]] = field(default_factory=list)  # (start, end) of each operator with its spacing
    text: str = ""
    p_range: tuple[float, ...] | None = None  # filled by the checks (cache)
    shared_p: PValue | None = None  # its p given for several statistics ("ps < .05", "ps = .04 and .002"): checked, never rewritten
    plural: bool = False  # one of several values of a plural head ("Fs(1, 38) = 4.41 and 5.20"): checked, never rewritten
    estimate: Number | None = None  # a table row's estimate its t's CI is of (a mean difference, a coefficient): inside the CI


@functools.lru_cache(maxsize=4096)  # a manuscript types its symbols a few ways, thousands of times
def symbol_of(text: str) -> str | None:
    t = text.replace(" ", "").removesuffix("statistic").removesuffix("value").removesuffix("-")  # "t-value", R's "t value", "F statistic"
    if t.startswith("F") and t.lower().endswith("change"):  # "F change", "F-change": a regression step's F, as SPSS names it
        return "F"
    low = t.lower()
    if low.startswith(("χ", "chi")) or low in ("x2", "x²", "x^2", "x-squared", "xsquared", "wald"):  # X-squared: as R prints χ²
        return "chi2"
    if low in ("rs", "rₛ", "r_s", "ρ", "rho"):
        return "rs"
    if low.startswith(("τ", "tau")):
        return "tau_b"
    if t in ("ΔF", "∆F"):  # an F test of a change (ΔR²): read as F
        return "F"
    if t == "Z":  # "Z = 2.50", as SPSS prints the normal approximation of rank tests
        return "z"
    if t in ("Fs", "ts"):  # several tests of the same df: "Fs(1, 38) = 4.41 and 5.20", "ts(38) > 2.50"
        return t[0]
    return t if t in ("t", "F", "r", "z", "U", "H", "W", "T", "Q", "V") else None


def _number_pattern(mark: str, slips: bool = False) -> str:
    """A printed number; with ``slips``, also "2,14" typed among points (a statistic's value, a p, an effect size — never
    a list's or an interval's numbers, "[2,9]", "df = 2,97", whose comma parts two)."""
    if mark == ",":
        return r"[-−–‐]?\s?(?:\d{1,3}(?:[.\u202f\u00a0 ]\d{3})+(?:,\d+)?|\d+(?:,\d+)?|,\d+)"
    # (a comma no thousands group explains, "2,14" in a manuscript typed with points, is a decimal comma typed by slip: read as
    # one, and a decimal-mark finding)
    slipped = r"|\d+,(?:\d{1,2}|\d{4,})(?![\d.,])" if slips else ""
    return rf"[-−–‐]?\s?(?:\d{{1,3}}(?:,\d{{3}})+(?:\.\d+)?(?!\d){slipped}|\d{{1,3}}(?:[\u2009\u202f]\d{{3}})+(?:\.\d+)?|\d+(?:\.\d+)?|\.\d+)"


# a number's power of ten as authors type it: 2.35e-3, 2.1E−04, 2.1 × 10⁻⁴, 2.1×10^-4, 2.1 x 10−4 (one number, never two)
# (a sentence's full stop may follow: "p = 2.1 × 10⁻⁴." — only a decimal point with a digit after it may not, nor a digit;
# the exponent's minus may be typed as an en dash, "10–4", as Word's autocorrection leaves it)
_EXPONENT = r"(?:\s?[eE][-−–+]?\d{1,3}(?!\d|\.\d)|\s?[×x]\s?10\s?(?:\^|\*\*)?\s?[-−–⁻]?[\d⁰¹²³⁴⁵⁶⁷⁸⁹]{1,3}(?!\d|\.\d))"
_EXPONENT_SPLIT = re.compile(r"^(?P<m>.*?)(?:\s?[eE](?P<e1>[-−–+]?\d{1,3})|\s?[×x]\s?10\s?(?:\^|\*\*)?\s?(?P<e2>[-−–⁻]?[\d⁰¹²³⁴⁵⁶⁷⁸⁹]{1,3}))$")
_SUPERSCRIPT = str.maketrans("⁰¹²³⁴⁵⁶⁷⁸⁹⁻−–", "0123456789---")

# each alternative starts with a literal character; `_guarded` puts the "not after a letter or point" test right after it
# (Χ: the Greek capital chi, as some symbol fonts and keyboards type it)
_SYMBOLS = (r"Δ\s?F", r"χ\s?[²2](?:_?[Fr](?![\w]))?", r"χ\^2", r"Χ\s?[²2]", r"Χ\^2", r"c(?i:hi)[- ]?(?i:square[d]?|2|²)(?:[- ](?:value|statistic))?",
            r"C(?i:hi)[- ]?(?i:square[d]?|2|²)(?:[- ](?:value|statistic))?",
            r"X\s?²", r"X\^2", r"X[- ]squared",
            r"X2(?=\s*\()", r"r[sₛ](?![A-Za-z])", r"r_s", r"ρ", r"r(?i:ho)", r"R(?i:ho)", r"τ_?b?", r"t(?i:au)(?:_?b)?", r"T(?i:au)(?:_?b)?",
            # "F-statistic" as R's summary of a linear model prints it ("F-statistic: 4.51"; "t value", "F-value" as output columns
            # name them), and a logistic coefficient's Wald χ²
            # as SPSS names it ("Wald = 6.13"; "Wald χ²(1)" is read at its χ²): optional tails of one alternative each, so that
            # the engine tries no more alternatives at every "t" of the prose
            r"t(?:[- ]statistic|[- ]value|s)?", r"F(?:[- ]statistic|[- ]value|s|[- ]?[Cc]hange(?![a-z]))?", "r", r"z(?:[- ]statistic|[- ]value)?", r"Z(?:[- ]value)?", "U", "H", r"W(?:ald(?!\s*(?:χ|[Cc]hi|X)))?", "T", "Q", "V")


def _top_alternatives(pattern: str) -> list[str]:
    """A pattern's alternatives at its top level (a "|" outside parentheses and character classes)."""
    out, depth, in_class, start, i = [], 0, False, 0, 0
    while i < len(pattern):
        c = pattern[i]
        if c == "\\":
            i += 2
            continue
        if in_class:
            in_class = c != "]"
        elif c == "[":
            in_class = True
        elif c in "()":
            depth += 1 if c == "(" else -1
        elif c == "|" and depth == 0:
            out.append(pattern[start:i])
            start = i + 1
        i += 1
    return out + [pattern[start:]]


def _by_first(patterns: "Iterable[str]") -> str:
    r"""The patterns' alternatives as one alternation, those that begin with the same literal character (or escape, or
    character class) joined under it, in their order: "d(?<![\w]d)_?z|d(?<![\w]d)" becomes "d(?:(?<![\w]d)_?z|(?<![\w]d))".
    It matches what the plain alternation matches (alternatives of different first characters never match at one
    place, and each group keeps its order), and the engine tries a position's one group instead of every alternative:
    twice as fast over prose for the effect sizes' names (tests/test_audit_linear.py)."""
    groups: dict[str, list[str]] = {}
    for alternative in (a for p in patterns for a in _top_alternatives(p)):
        head = alternative[:2] if alternative[:1] == "\\" else alternative[: alternative.index("]", 1) + 1] if alternative[:1] == "[" else alternative[:1]
        if not head or head == "(" or alternative[len(head) : len(head) + 1] in ("?", "*", "+", "{"):
            groups.setdefault(alternative, [""])  # (an optional or grouped first part: left whole)
            continue
        groups.setdefault(head, []).append(alternative[len(head) :])
    return "|".join(head + (f"(?:{'|'.join(rest)})" if len(rest) > 1 else rest[0]) for head, rest in groups.items())


def _guarded(alternatives: "Iterable[str]", before: str) -> str:
    """The alternatives, each not preceded by a character of ``before``: the
    lookbehind follows the literal first character, so that the regex engine
    scans for the first characters quickly instead of trying every position."""
    return "|".join(f"{a[0]}(?<![{before}]{re.escape(a[0])}){a[1:]}" for a in alternatives)


_SYMBOL = _by_first([_guarded(_SYMBOLS, r"\w.")])
# a mean's or SD's subscript as a copy from a PDF or a plain-text editor flattens it: "Mage", "M age", "M_age", "SDpre",
# "M1", "M₁" (the words a mean is usually given for, and a group's digit; other words after an M are not a mean's:
# "Max = 40", "Males = 52"); `subscript` gives it back
_FLAT_SUBSCRIPT = r"(?:[ _]?(?:age|diff(?:erence)?|change|pre|post|baseline|follow-?up)(?![\w])|_?[1-9](?![\w])|[₁-₉])"
# Every alternative starts with a literal character and a name that must not follow a letter says so right after it
# ("V(?<![\w]V)"): the regex engine then looks for the first characters with a fast scan instead of trying every position.
_EFFECT_NAMES = [
    (r"partial\s+(?:η|eta|ω|omega)\s?(?:[²2]|\^2|squared)", "eta2_p"),  # ("partial ω²": named by _NAMED_FIRST)
    (r"η\s?(?:[²2]|\^2)\s?(?:p|_p|ₚ)(?![A-Za-z])|eta\s?(?:[²2]|\^2)\s?(?:p|_p|ₚ)(?![A-Za-z])|η_p\^?2|ηp[²2]|η[²2]_p", "eta2_p"),
    # generalized η² (Olejnik & Algina, 2003), as statsetter and R's afex print it: η²G, ηG², η²_G, "generalized η²"
    (r"η\s?(?:[²2]|\^2)\s?_?G(?![A-Za-z])|ηG\s?[²2]|η_G\^?2|eta\s?(?:[²2]|\^2)\s?_?G(?![A-Za-z])|g(?<![\w]g)eneralized\s+(?:η|eta)[\s-]?(?:[²2]|\^2|squared)", "eta2_g"),
    (r"η\s?(?:[²2]|\^2|squared)|eta\s?(?:[²2]|\^2|squared)", "eta2"),
    # ω², and partial ω² (JASP's ω²ₚ) typed as η²p is: one alternative for each first character (named by _NAMED_FIRST)
    (r"ω(?:\s?(?:[²2]|\^2)(?:\s?(?:p|_p|ₚ)(?![A-Za-z]))?|p\s?[²2]|_p\^?2|\s?squared)|omega\s?(?:(?:[²2]|\^2)(?:\s?(?:p|_p)(?![A-Za-z]))?|squared)", "omega2"),
    (r"ε\s?(?:[²2]|\^2|squared)|epsilon\s?(?:[²2]|\^2|squared)", "epsilon2"),
    (r"ε(?!\s?(?:[²2]|\^2|squared))|epsilon(?!\s?(?:[²2]|\^2|squared))", "epsilon"),  # a sphericity correction's ε (GG or HF)
    (r"r_?rb|r\s?(?:rank-biserial)", "r_rb"),
    (r"Cram[ée]r'?s\s+V|V(?<![\w]V)", "V"),
    # an intraclass correlation, with its form as Shrout & Fleiss name it ("ICC(2,1) = .82, 95% CI [.75, .88]")
    (r"I(?<![\w]I)CC(?![\w])(?:\s?\(\s?[1-3A-Z]\s?,\s?(?:[1-9]|k)\s?\))?", "ICC"),
    (r"φ|p(?<![\w]p)hi", "phi"),
    (r"adj(?:usted)?\.?\s+R\s?(?:[²2]|\^2)|R\s?(?:[²2]|\^2)\s?adj", "R2_adj"),
    # R², and a regression step's change in it: "ΔR²", "R² change", "R squared change" (SPSS's "R Square Change"), "R-squared
    # change" (one alternative for the R's; the changes named by _NAMED_FIRST)
    (r"[Δ∆]\s?R\s?(?:[²2]|\^2)", "delta_R2"),
    (r"R(?<![\w]R)\s?(?:[²2]|\^2|[- ][Ss]quared|[- ][Ss]quare(?=\s?[Cc]hange))(?:\s?[Cc]hange)?", "R2"),
    (r"β|b(?<![\w]b)eta", "beta"),
    # Cliff's dominance statistic (Cliff, 1993: d the sample's, δ the population's), between −1 and 1: not Cohen's d
    (r"C(?<![\w]C)liff(?:['’]s)?\s+(?:d|δ|delta)(?![\w])", "cliff_d"),
    # a scale's reliability, Cronbach's α (named), and α alone: a reliability or a significance level, told apart by its value
    # (`_read_clause`); "α level", "alpha-level" the level
    (r"C(?<![\w]C)ronbach(?:['’]s)?\s+(?:α|alpha)(?![\w])", "alpha"),
    (r"α[- ]?level|a(?<![\w]a)lpha[- ]level", "alpha_level"),
    (r"α(?![\w])|a(?<![\w]a)lpha(?![\w])", "alpha_bare"),
    # Cohen's f and f² (an F's effect size: f² = F·df₁/df₂ for its partial form, at most that otherwise): named, or f² alone
    (r"C(?<![\w]C)ohen(?:['’]s)?\s+f\s?(?:[²2]|\^2)(?![\w])", "f2"),  # (f² alone: _RARE_EFFECTS)
    (r"C(?<![\w]C)ohen(?:['’]s)?\s+f(?![\w²^])", "f"),
    # a meta-analysis's I² (Higgins & Thompson, 2002), in percent: (Q − df)/Q of the Q (or χ²) beside it
    (r"I(?<![\w]I)\s?(?:[²2]|\^2)(?![\w])", "I2"),
    (r"d(?<![\w]d)_?z", "d_z"),
    (r"d(?<![\w]d)_?av", "d_av"),
    (r"d(?<![\w]d)", "d"),
    (r"g(?<![\w]g)", "g"),
    (r"Kendall'?s\s+W|W(?<![\w]W)(?=\s*=\s*0?[.,]\d)", "kendall_w"),  # W below 1 with decimals: Kendall's W, not a rank sum
    (r"M(?<![\w]M)dn", "Mdn"),
    # "M (SD) = 3.2 (0.5)", "Mean (SD) = …": _paren_sd (a capital M only: a lowercase "m" would cost the scan every word in "m")
    (rf"M(?<![\w]M)(?:{_FLAT_SUBSCRIPT}|\s?\(\s?SD\s?\)|ean\s?\(\s?SD\s?\))?", "M"),
    (rf"S(?<![\w]S)D{_FLAT_SUBSCRIPT}?", "SD"),
]
# ratios as public-health texts type them: adjusted odds, hazard, risk and incidence-rate ratios, abbreviated or spelled
# out. Every ratio's name, and no other, ends in "R", "ratio" or "risk", and a ratio is read also without "=" ("OR,
# 0.76", "AOR: 8.32", "OR 2.72", "odds ratio of 1.7"): a pattern of their own, searched only where a capital R or the
# words are (the other effect sizes' pattern keeps its fast scan and its one test after a name, "=")
_RATIOS = [
    (r"a(?<![\w]a)OR|A(?<![\w]A)OR|[aA](?<![\w][aA])dj(?:usted)?\.?\s+OR", "aOR"),
    (r"a(?<![\w]a)HR|A(?<![\w]A)HR|[aA](?<![\w][aA])dj(?:usted)?\.?\s+HR", "aHR"),
    (r"a(?<![\w]a)RR|A(?<![\w]A)RR|[aA](?<![\w][aA])dj(?:usted)?\.?\s+RR", "aRR"),
    (r"a(?<![\w]a)PR|A(?<![\w]A)PR|[aA](?<![\w][aA])dj(?:usted)?\.?\s+PR", "aPR"),
    (r"O(?<![\w]O)R", "OR"),
    (r"P(?<![\w]P)R", "PR"),  # a prevalence ratio (cross-sectional studies; practice)
    (r"H(?<![\w]H)R", "HR"),
    (r"I(?<![\w]I)RR", "IRR"),
    (r"R(?<![\w]R)R", "RR"),
    (r"[aA](?<![\w][aA])djusted\s+odds\s+ratio", "aOR"),
    (r"[aA](?<![\w][aA])djusted\s+hazard\s+ratio", "aHR"),
    (r"[aA](?<![\w][aA])djusted\s+(?:risk\s+ratio|relative\s+risk)", "aRR"),
    (r"[oO](?<![\w][oO])dds\s+ratio|u(?<![\w]u)nadjusted\s+odds\s+ratio|c(?<![\w]c)rude\s+odds\s+ratio", "OR"),
    (r"[hH](?<![\w][hH])azard\s+ratio", "HR"),
    (r"[iI](?<![\w][iI])ncidence[-\s]rate\s+ratio", "IRR"),
    (r"[rR](?<![\w][rR])isk\s+ratio|[rR](?<![\w][rR])elative\s+risk", "RR"),
    (r"[aA](?<![\w][aA])djusted\s+prevalence\s+ratio", "aPR"),
    (r"[pP](?<![\w][pP])revalence\s+ratio", "PR"),
    # a difference with its interval, as medical texts give it ("mean difference, −2.1 [95% CI, −3.4 to −0.8]", "the
    # between-group difference was −4.2 points (95% CI, −7.9 to −0.5; P = .03)"): read only with its interval (null 0)
    (r"[mM](?<![\w][mM])ean\s+difference|[dD](?<![\w][dD])ifference|[bB](?<![\w][bB])etween-group\s+difference"
     r"|[aA](?<![\w][aA])bsolute\s+(?:risk\s+)?difference|[rR](?<![\w][rR])isk\s+difference", "MD"),
]
_DESCRIPTIVE = {"M", "SD", "Mdn"}
_CORRELATIONS = frozenset({"r", "rs", "tau_b"})
# a mediation's indirect effect, a·b, with its (bootstrap) interval: inside it — and Cohen's f² typed alone ("f² = .15"): a
# pattern of their own, searched only where a clause has one of them and "=" (in the effect sizes' pattern the "a" and "f"
# would be tried at every "a" and "f" of the prose)
_INDIRECT = (r"a(?<![\w]a)(?:b|×b|·b|\*b)(?![\w])", "ab")
_RARE_EFFECTS = [_INDIRECT, (r"f(?<![\w]f)\s?(?:²|\^2)", "f2")]
_RARE_NAME = "|".join(pattern for pattern, _ in _RARE_EFFECTS)
# a structural equation model's fit indices, which a χ² test of fit is reported with (practice)
_FIT_INDEX = re.compile(r"\b(?:CFI|TLI|NNFI|RMSEA|SRMR|GFI|AGFI|NFI|IFI|AIC|BIC|WRMR)\b")
# where a ratio's (or a difference's) name ends: every name in _RATIOS ends so (the lookbehinds its patterns start from)
_AFTER_RATIO = r"(?:(?<=R)|(?<=ratio)|(?<=risk)|(?<=difference))"
# after a ratio's name, its abbreviation in parentheses or brackets ("adjusted HR (aHR)=1.29", "odds ratio [OR], 1.52")
_RATIO_ABBREVIATED = rf"(?:{_AFTER_RATIO}\s*+[(\[]a?[A-Z]{{1,3}}[)\]])"
# after a ratio's name, its number without "=": a comma or colon ("OR, 0.76", AMA's form; "AOR: 8.32"), "of" ("odds ratio
# of 1.7"), a few words and "was" or a comma ("the relative risk of readmission was 0.78", "odds ratio for disease among
# carriers, 0.47", as medical abstracts write it) or a space
# ("OR 2.72"), and a number with decimals (not "OR 2 times", nor a count)
_RATIO_WITHOUT_EQUALS = (rf"(?:{_AFTER_RATIO}|(?<=R[)\]]))(?:\s*+[:,]|\s++(?:of|was)\b|\s++(?:of|for|in|among|with)(?:\s++[^\W\d_][\w'’-]*+){{1,4}}?(?:\s++(?:was|were|is)\b|\s*+[,:])"
                         rf"|(?=[ \u00a0]))\s*+(?=[-−]?\d*[.,]\d)")  # (also "the relative risk of readmission was 0.78": up to four words)
# after a ratio's name, its interval's level, the interval to come after the number ("OR (95% CI) is 0.84 (0.69, 1.03)")
_RATIO_LABELLED = rf"{_AFTER_RATIO}\s*+[(\[]\s*+(?P<rlev>\d{{2}}(?:[.,]\d+)?)\s*+%\s*+C\.?I\.?\s*+[)\]]\s*+(?:[=:,¼]|is\b)?"


# Stata's p of a model's test as its output heads it, "Prob > F = 0.0000", "Prob > chi2 = 0.0000" (pasted into theses;
# practice): after the "P", the rest of its name — a p, and the F or χ² in it no statistic of its own
# (and its "Pr = 0.033" after a tabulation's "Pearson chi2(1) = 4.5678", its t test's two-sided "Pr(|T| > |t|) = 0.0500" — not
# its one-sided "Pr(T < t)" —, and its rank-sum test's "Prob > |z| = 0.0088")
_STATA_P = r"(?<=P)r(?:ob\s*+>\s*+(?:F|chi2|χ2|χ²|\|z\|)|\(\|T\|\s*+>\s*+\|t\|\)|(?=\s*+=))"
_STATA_HEAD = re.compile(r"Prob\s*>\s*$")
# SPSS's name for a p, pasted into prose: "Sig. = .013", "Sig. (2-tailed) = .039", "Asymp. Sig. (2-sided) = .040" (practice)
_SPSS_P = r"(?:A(?<![\w]A)symp\.?\s++|E(?<![\w]E)xact\s++)?[Ss](?<![\w][Ss])ig\.(?:\s*+\((?:[12]-(?:tailed|sided))\))?"


class _Patterns:
    def __init__(self, mark: str) -> None:
        num = _number_pattern(mark)
        value = _number_pattern(mark, slips=True)  # (a value after its operator: "t(38) = 2,14" typed among points)
        self.mark = mark
        self.read: dict[str, tuple[str, float, int, int, int] | None] = {}  # to_number's readings of printed forms, by text
        self.number = re.compile(num)
        self.head = re.compile(
            rf"(?P<sym>{_SYMBOL})\s*+(?:(?P<open>[(\[])(?P<inner>[^()\[\]]{{0,40}})[)\]]|(?P<sub>[₀-₉]+(?:[.,;]\s?[₀-₉]+){{0,3}})|(?<=F)(?P<bare>\d{{1,4}}\s?,\s?\d{{1,6}})(?![\d.])|(?<=t)(?P<bare_t>\d{{2,4}})(?=\s*+=))?"
            rf"\s*+(?P<op>=|<|>|≤|≥|¼|:(?<=c:)|(?<=\s)(?:of|was|is|equals|equal\s++to|equall?ed)(?=\s))\s*+(?P<num>{value}{_EXPONENT}?)"
        )
        # not after a mark of significance ("*", "†", "‡", "§", "^", or one and a space): "*p < .05. **p < .01. †p < .10." is a
        # table's note defining its marks, not a reported p
        self.p = re.compile(rf"(?:[pP](?<![\w.{_SIGNIFICANCE}][pP])(?<![{_SIGNIFICANCE}] [pP])(?:[- ]?values?|{_STATA_P})?|{_SPSS_P})\s*+(?P<op>=\s*+[<>≤≥]|=|<|>|≤|≥|¼|[bN](?=\s*+\.?\d)|[,5.](?<=\s[,5.])(?=\s++0?\.\d)|:(?<=value:)|:(?<=values:))\s*+(?P<num>{value}{_EXPONENT}?)"
                            r"|n(?<![\w.]n)(?:\.\s?s\.|s)(?![\w])")  # a p (or P, or SPSS's Sig.) and its number, or "ns" / "n.s."
        # a p in words within a statistic's clause ("t(18) = 4.24, with a p-value of .0005", "the p-value was less than
        # 0.001", "P value is < .05"): only there — alone, "a p-value of .05 was taken as significant" is the level
        self.p_words = re.compile(rf"[pP](?<![\w.{_SIGNIFICANCE}][pP])[- ]?values?\s++(?P<op>(?:(?:was|is|of)\s++)?(?:less|smaller|greater|larger)\s++than"
                                  rf"|(?:was|is)\s*+[<>≤≥=]|was|is|of|equals|equal\s++to|equall?ed)\s*+(?P<num>{value}{_EXPONENT}?)")
        # a bound shared by several statistics, as psychology papers type it: "ps < .05", "p's > .20", "all ps < .001", "both
        # p < .01", "each p-value ≤ .01"; or their p's listed in order, "ps = .03 and .04" (an "=" only before a list)
        self.shared_p = re.compile(rf"(?P<sym>[pP](?<![\w.*'’][pP])(?:s|['’]s|(?:(?<=[aA]ll\s[pP])(?<!\w[aA]ll\s[pP])|(?<=[bB]oth\s[pP])"
                                   rf"(?<!\w[bB]oth\s[pP])|(?<=[eE]ach\s[pP])(?<!\w[eE]ach\s[pP]))(?:s|['’]s|[- ]?values?)?))(?![\w'’])"
                                   rf"\s*+(?P<op>[<>≤≥]|[bN](?=\s*+\.?\d)|=(?=\s*+{num}\s*+(?:[,;&]|and\s)))\s*+(?P<num>{num}{_EXPONENT}?)")
        # the rest of a list of p's in order ("ps = .042 and .002, respectively"; "ps = .03, .04, and .20")
        self.p_list = re.compile(rf"\s*+(?:[,;]\s*+(?:and\s++)?|and\s++|&\s*+)(?P<num>{num})(?![\d]|\s?%)")  # (not an interval's level: "95% CI")
        sep = r"[;]" if mark == "," else r"[,;]"
        self.ci = re.compile(
            rf"(?P<lev>\d{{2}}(?:[.,]\d+)?)\s*+%\s*+(?:CI|C\.I\.|confidence interval(?:s?\s*+[\[(]CIs?[\])])?)s?"
            rf"(?:\s++(?:for|of)\s++(?:the\s++)?(?:(?:mean\s++)?difference|[dgr]|OR|B|β)(?![\w]))?\s*+[:=,¼]?\s*+"  # ("95% CI for the difference", "95% CI for d")
            rf"(?:[\[(]\s*+(?P<a>{num})\s*+(?:{sep}|{_DASH})\s*+(?P<b>{num})\s*+[\])]|(?P<a2>{num})\s*+(?:{_DASH})\s*+(?P<b2>{num}))"
        )
        # an interval typed without its level right after an effect size's or a correlation's number ("d = 0.62 [0.21,
        # 1.03]", "OR = 2.30 (1.40–3.80)", "Cohen’s d = 1.48 [0.55; 2.41]" under a head that gives the level): its limits
        self.bare_ci = re.compile(rf"\s?(?:(?P<sq>\[)|\()\s*+(?P<a>{num})\s*+(?:{sep}|{_DASH})\s*+(?P<b>{num})\s*+(?(sq)\]|\))")
        # an estimate with its labelled interval right after it, as medical and public-health texts give a prevalence, a mean
        # or an accuracy: "12.4% (95% CI, 10.1%-14.9%)", "3.2 (95% CI 2.9 to 3.5)", "0.86 (95% confidence interval [CI], 0.80-0.91)"
        self.estimate_ci = re.compile(
            rf"(?P<est>{num})(?:\s?%)?\s*[(\[]\s*(?P<lev>\d{{2}}(?:[.,]\d+)?)\s*%\s*(?:CI|C\.I\.|[Cc]onfidence\s+[Ii]nterval(?:\s*\[CI\])?)"
            rf"\s*[:=,]?\s*(?P<a>{num})(?:\s?%)?\s*(?:{sep}|{_DASH})\s*(?P<b>{num})(?:\s?%)?\s*[)\]]")
        # or its labelled interval after a comma, as abstracts give an AUC or a prevalence: "[0.844, 95%confidence interval(CI):
        # 0.779-0.896]", "(0.690, 95%CI: 0.613-0.760, P < 0.05)", "(34.7%), 95% CI (30.6–38.8)"
        self.estimate_comma_ci = re.compile(
            rf"(?P<est>{num})(?:\s?%)?\)?\s*,\s*(?P<lev>\d{{2}}(?:[.,]\d+)?)\s*%\s*(?:CI|C\.I\.|[Cc]onfidence\s*[Ii]nterval(?:\s*[(\[]CI[)\]])?)"
            rf"\s*[:=,]?\s*(?P<open>[(\[])?\s*(?P<a>{num})(?:\s?%)?\s*(?:{sep}|{_DASH})\s*(?P<b>{num})(?:\s?%)?(?(open)\s*[)\]])(?![\d.,]?\d)")
        self.ratio_ci = re.compile(rf"\s*,\s*(?P<a>{num})\s*(?:{_DASH})\s*(?P<b>{num})(?![\d.,]?\d|\s?%)")  # (no brackets: a ratio's only)
        self.effect = re.compile(r"(?P<name>" + _by_first(p for p, _ in _EFFECT_NAMES) + rf")\s*+(?P<op>[=¼])\s*+(?P<num>{value})")
        self.rare = re.compile(rf"(?P<name>{_RARE_NAME})\s*+(?P<op>[=¼])\s*+(?P<num>{value})")
        # (or labelled with its interval's level, the interval after the number: "OR (95% CI) is 0.84 (0.69, 1.03)", "aOR (95%
        # CI): 1.52 (1.10–2.10)", as a table's head and cell are run into a sentence)
        self.ratio = re.compile(r"(?P<name>" + _by_first(p for p, _ in _RATIOS) + rf"){_RATIO_ABBREVIATED}?(?:{_RATIO_LABELLED}|\s*+(?P<op>[=¼])|{_RATIO_WITHOUT_EQUALS})"
                                rf"\s*+(?P<num>{value})(?(rlev)\s*+[(\[]\s*+(?P<ra>{num})\s*+(?:{sep}|{_DASH})\s*+(?P<rb>{num})\s*+[)\]])")
        sep2 = r"[;/]" if mark == "," else r"[,;/]"
        # df written apart: "df = 2, 97", "d.f. = 2", "[df](2, 102)", as output prints it "DF = 2", spelled out "degrees of
        # freedom = 2"; or after their numbers, "(38 df)", "with 2 and 97 df", run together "1df", "with 45 degrees of freedom"
        self.df = re.compile(rf"(?:d(?<![\w]d)\.?f\.?|D(?<![\w]D)F(?![\w])|d(?<![\w]d)egrees?\s++of\s++freedom(?:\s*+\((?:df|d\.f\.)\))?)\]?\s*+[=:¼]?\s*+\(?(?P<num>{num})(?:\s*+{sep2}\s*+(?P<num2>\d+(?:[.,]\d+)?)(?![\d]))?\)?(?![\d.,]\d)"
                             rf"|(?<![\w.,])(?P<pre>\d{{1,6}}(?:\.\d+)?)(?:\s*+(?:,|and)\s*+(?P<pre2>\d{{1,6}}(?:\.\d+)?))?[ \u00a0]*+(?:(?:d\.?f|DF)\b\.?(?!\s*[=:(\d])|degrees?\s++of\s++freedom\b(?!\s*+[=:]))")
        # (each starts with its literal, the "not after a letter" test right after it: the engine's fast scan)
        # the unstandardised coefficient as "B" or "b", its standard error as "SE", "SE B" or "SEB"
        self.coef_b = re.compile(rf"[Bb](?<![\w][Bb])(?<!SE\s[Bb])\s*+[=¼]\s*+(?P<num>{value})")  # (not the B of "SE B")
        self.coef_se = re.compile(rf"S(?<![\w]S)E(?:\s?[Bb](?![\w]))?\s*+[=¼]\s*+(?P<num>{value})")
        # what may stand between a coefficient given without a test and its p: its SE and its interval ("b = 0.42, SE =
        # 0.10, 95% CI [0.22, 0.62], p < .001"), each set off by a comma or semicolon
        # (the SE also in parentheses after the B: "B = 0.23 (SE = 0.05), p < .001")
        self.coef_lead = re.compile(rf"\s*+(?:[,;]\s*+(?:S(?<![\w]S)E(?:\s?[Bb](?![\w]))?\s*+[=¼]\s*+(?P<se>{num})\s*+[,;]\s*+)?"
                                    rf"|\(\s*+S(?<![\w]S)E(?:\s?[Bb](?![\w]))?\s*+[=¼]\s*+(?P<se2>{num})\s*+\)\s*+[,;]\s*+)"
                                    rf"(?:(?P<ci>\d{{2}}(?:[.,]\d+)?\s*+%\s*+(?:CI|C\.I\.)[^,;\[(]{{0,3}}[\[(][^\])]{{1,40}}[\])])\s*+[,;]\s*+)?")
        self.n = re.compile(r"(?P<sym>[Nn])(?<![\w][Nn])\s*+[=¼]\s*+(?P<num>\d{1,3}(?:[,.\u202f\u00a0 ]\d{3})+|\d+)(?![\d.,]\d)")
        # a sentence's end; a blank line or a list item; a table row's end (a Markdown row starts with |, a LaTeX row ends with \\)
        # (each alternative starts with a literal character, its lookbehind after it, for the engine's fast scan; "adj. R²", SPSS's
        # "Sig. (2-tailed)" and "Asymp. Sig." are no end)
        prose = r"\.(?<=[^\d\s]\.)(?=\s+[A-Z(])(?<![aA]dj\.)(?<![Ss]ig\.)(?<!Asymp\.)|\.(?<=\d\.)(?=\s+[A-Z])|\n(?=[ \t]*(?:\n|[-*•+]\s|\d+[.)]\s|\|))"
        self.boundary = re.compile(prose + r"|[ \t\n](?<=\\\\[ \t\n])(?:(?<=\n)|[ \t]*\n)")
        # without a LaTeX row's end, for a text without "\\" (where it cannot match): its first characters are then "."
        # and a newline only, not every space (see boundary_in)
        self.prose_boundary = re.compile(prose)

    def boundary_in(self, text: str) -> re.Pattern[str]:
        """The sentence-end pattern for ``text``: the same matches, faster where the text has no LaTeX row end."""
        return self.boundary if "\\\\" in text else self.prose_boundary

    def to_number(self, text: str, start: int) -> Number | None:
        """The number printed as ``text``, which starts at ``start`` of the paragraph (None: not a number)."""
        read = self.read.get(text, _UNREAD)
        if read is _UNREAD:  # each printed form is read once (a manuscript prints ".001", "95" or "2.14" many times)
            number = self._to_number(text, 0)  # a number's place is start + where it lies in text, whatever start is
            read = None if number is None else (number.text, number.value, number.decimals, number.start, number.end)
            if len(self.read) >= _READ_MEMORY:
                self.read.clear()
            self.read[text] = read
        if read is None:
            return None
        return _new_number(read[0], read[1], read[2], start + read[3], start + read[4])

    def _to_number(self, text: str, start: int) -> Number | None:
        raw = text.strip()
        plain = _PLAIN.fullmatch(raw) if self.mark == "." else None
        if plain is not None:  # "2.14", ".039", "38", "−.26": float() reads these exactly as Decimal would
            body = plain.group(2)
            point = body.find(".")
            value = -float(body) if plain.group(1) else float(body)
            offset = text.find(raw)
            s = start + max(offset, 0)
            return _new_number(raw, value, len(body) - point - 1 if point >= 0 else 0, s, s + len(raw))
        power = _EXPONENT_SPLIT.match(raw) if ("e" in raw or "E" in raw or "10" in raw) else None
        if power is not None and power.group("m").strip():
            base = self._to_number(power.group("m"), start)
            exponent = (power.group("e1") or power.group("e2")).translate(_SUPERSCRIPT)
            if base is None or abs(int(exponent)) > 300:  # 1e400: not a number anyone computed
                return None
            decimals = max(0, base.decimals - int(exponent))
            return Number(raw, base.value * 10.0 ** int(exponent), decimals, base.start, base.start + len(raw))
        sign = ""
        body = raw
        if body and body[0] in _MINUS:
            sign, body = body[0], body[1:].strip()
        if self.mark == ",":
            body = re.sub(r"[.\u202f\u00a0 ](?=\d{3}(?!\d))", "", body).replace(",", ".")
        elif _SLIPPED_COMMA.fullmatch(body):  # "2,14": no thousands group, a decimal comma
            body = body.replace(",", ".")
        else:
            body = body.replace(",", "").replace("\u2009", "").replace("\u202f", "")  # 1,256 or 13 071 (thin spaces, AMA)
        if len(body) > _MAX_DIGITS:  # not a statistic anyone typed; never converted (int-digit limits, overflow)
            return None
        try:
            dec = Decimal(body)
        except InvalidOperation:
            return None
        if not dec.is_finite():
            return None
        exponent = dec.as_tuple().exponent
        decimals = max(0, -exponent) if isinstance(exponent, int) else 0
        value = float(dec)
        if sign:
            value = -value
        offset = text.find(raw)
        s = start + max(offset, 0)
        return Number(raw, value, decimals, s, s + len(raw))


# Numbers, p values and effects set slot by slot, without the frozen dataclass's __init__ (a third to half the cost;
# 40,000 Numbers per 1,000 pages)
_new_number = _unchecked_maker(Number, {}, ("text", "value", "decimals", "start", "end"))
_new_p = _unchecked_maker(PValue, {}, ("op", "number", "start", "end", "symbol_start", "symbol_text", "adjusted"))
_new_interval = _unchecked_maker(Interval, {}, ("level", "low", "high", "start", "end"))
_new_effect = _unchecked_maker(Effect, {}, ("name", "number", "start", "end", "symbol_start", "symbol_text", "ci"))


_REACH = 240  # the characters a statistic's clause reads after its head (or, without a head, after its first part)
_UNREAD = object()
_READ_MEMORY = 16384  # printed forms remembered (then forgotten all at once): a few MB at most
_SLIPPED_COMMA = re.compile(r"\d+,(?:\d{1,2}|\d{4,})")  # a decimal comma in a manuscript read with points
_PLAIN = re.compile(r"(?:([-−–‐])\s?)?(\d{1,15}(?:\.\d{1,15})?|\.\d{1,15})")  # a sign, as the general path reads it, and digits
_SUBSCRIPT_DIGITS = str.maketrans("₀₁₂₃₄₅₆₇₈₉", "0123456789")


def subscript(e: Effect) -> str:
    """The subscript a descriptive's symbol carries flattened ("Mage", "M_age", "SD pre", "M₁"): "age", "pre", "1";
    "" for none."""
    rest = (e.symbol_text[2:] if e.name == "SD" else e.symbol_text[1:] if e.name == "M" else "").lstrip(" _")
    return "" if rest[:1] in ("", "(", "e") else rest.translate(_SUBSCRIPT_DIGITS)  # ("(SD)", "ean (SD)": none)
_CACHE: dict[str, _Patterns] = {}
_MAX_DIGITS = 100


def _patterns(mark: str) -> _Patterns:
    if mark not in _CACHE:
        _CACHE[mark] = _Patterns(mark)
    return _CACHE[mark]


# names the scan finds within another name's alternative (so that no first character is tried twice), told apart first
_NAMED_FIRST = [
    (r"ω\s?(?:[²2]|\^2)\s?(?:p|_p|ₚ)|ωp\s?[²2]|ω_p\^?2|omega\s?(?:[²2]|\^2)\s?(?:p|_p)|partial\s+(?:ω|omega)\s?(?:[²2]|\^2|squared)", "omega2_p"),
    (r"R\s?(?:[²2]|\^2|[- ][Ss]quared?)\s?[Cc]hange", "delta_R2"),
]
_EFFECT_FULL = [(re.compile(pattern), name) for pattern, name in _RATIOS + _NAMED_FIRST + _EFFECT_NAMES + _RARE_EFFECTS]


@functools.lru_cache(maxsize=4096)  # likewise its effect names: each tried against the patterns once
def _effect_name(text: str) -> str | None:
    for pattern, name in _EFFECT_FULL:
        if pattern.fullmatch(text):
            return name
    return None


_DF_DASH = re.compile(r"(?<=\d)\s?[–—/-]\s?(?=\d)")  # (a slash too: "F(1/38)")
_DF_PARTS = {sep: re.compile(rf"[^{sep};]+") for sep in ",;"}
_DF_PART = re.compile(r"\s*(?:df\s*=\s*)?(\d+(?:[.,]\d+)?)\s*")


# the df as most heads give them, "38", "40.95", "2, 97" (read with a decimal point): the same Numbers as the general path below
_DF_PLAIN = re.compile(r"\s*(\d{1,15}(?:\.\d{1,15})?)\s*(?:,\s*(\d{1,15}(?:\.\d{1,15})?)\s*)?")


def _inner(pat: _Patterns, inner: str, start: int) -> tuple[tuple[Number, ...], Number | None]:
    """df numbers and N from the text inside the head's parentheses: ``38``,
    ``2, 97``, ``df = 23``, ``2, N = 1,200``. Anything else: no df."""
    if pat.mark == ".":
        plain = _DF_PLAIN.fullmatch(inner)
        if plain is not None:
            return tuple(pat.to_number(plain.group(g), start + plain.start(g)) for g in (1, 2) if plain.group(g) is not None), None  # type: ignore[misc]
    n = None
    found = pat.n.search(inner)
    rest = inner
    if found:
        n = pat.to_number(found.group("num"), start + found.start("num"))
        rest = inner[: found.start()] + " " * (found.end() - found.start()) + inner[found.end() :]
    sep = ";" if pat.mark == "," else ","
    if "–" in rest or "—" in rest or "-" in rest or "/" in rest:
        rest = _DF_DASH.sub(lambda d: sep.ljust(len(d.group()), " "), rest)  # F(3–51), F(3/51): df by a dash or slash
    dfs: list[Number] = []
    for m in _DF_PARTS[sep].finditer(rest):
        part = m.group()
        if not part.strip():
            continue
        d = _DF_PART.fullmatch(part)
        if d is None:
            return (), n
        number = pat.to_number(d.group(1), start + m.start() + d.start(1))
        if number is None:
            return (), n
        dfs.append(number)
    return tuple(dfs), n


# a number after "=", "<" or ">" whose decimals can only be decimals, typed with a comma (the first group: "p = 0,03",
# "t = 2,14", "p < ,05"; a comma before exactly three digits may be a thousands separator, "N = 1,200", and is no
# evidence either way) or with a point (the second: "p = .03", "t = 2.14"); the two kinds in one scan — after the
# operator and sign, a number's first mark decides which can match (never both), and no match holds another operator,
# so the scan finds what two patterns, one for each kind, would find (tests/test_audit_linear.py)
_COMMA_NUMBER = r"(0?,\d+|[1-9]\d*,(?:\d{1,2}|\d{4,}))(?![\d,]|\.\d)"
_DECIMAL_TYPED = re.compile(rf"[=<>]\s*[-−]?(?:{_COMMA_NUMBER}|(\d*\.\d+)(?!\d|,\d))")
# the first kind alone, and the comma before a digit it needs, looked for first (each match of the pattern above starts
# at its one operator, so this finds a number where that pattern counts one typed with a comma)
_COMMA_TYPED = re.compile(rf"[=<>]\s*[-−]?{_COMMA_NUMBER}")
_COMMA_DIGIT = re.compile(r",\d")


def comma_typed(text: str) -> bool:
    """Whether ``text`` has a number after =, < or > that only a decimal comma explains (decimal_mark_of counts one)."""
    return _COMMA_DIGIT.search(text) is not None and _COMMA_TYPED.search(text) is not None


def decimal_mark_of(texts: "Iterable[str]") -> tuple[str, int, int] | None:
    """The decimal mark a manuscript's statistics are typed with, from the
    numbers after =, < and > that only a decimal mark explains: (mark,
    comma-typed count, point-typed count), or None when they do not say."""
    commas = points = 0
    for text in texts:
        if "=" not in text and "<" not in text and ">" not in text:  # what the pattern starts with (most prose has none)
            continue
        for comma, _ in _DECIMAL_TYPED.findall(text):
            if comma:
                commas += 1
            else:
                points += 1
    if commas == points:
        return None
    return ("," if commas > points else "."), commas, points


def _an_effect(m: re.Match[str]) -> bool:
    """A "W = .25" (no df, a value below 1 with decimals) is Kendall's W, an effect size, not a Wilcoxon rank sum; a V is
    a test statistic only as a whole number ("V = 5, p-value = .039": the signed-rank sum, as R's wilcox.test names it),
    with decimals Cramér's V ("V = .22")."""
    sym = m.group("sym")
    if sym == "W":
        return m.group("inner") is None and re.fullmatch(r"0?[.,]\d+", m.group("num").strip()) is not None
    return sym == "V" and (m.group("inner") is not None or not m.group("num").strip().isdigit())


def find_statistics(text: str, decimal_mark: str = ".") -> list[Reported]:
    """Every statistic in ``text``, in order."""
    pat = _patterns(decimal_mark)
    heads = [m for m in pat.head.finditer(text) if symbol_of(m.group("sym")) is not None and not _an_effect(m)]
    if "Prob" in text:  # (Stata's "Prob > F = 0.0000": a p, its F no head)
        heads = [m for m in heads if _STATA_HEAD.search(text, max(0, m.start() - 8), m.start()) is None]
    boundary = pat.boundary_in(text)
    rare = _rare_words(text)
    out: list[Reported] = []
    taken: list[tuple[int, int]] = []
    for i, m in enumerate(heads):
        limit = heads[i + 1].start() if i + 1 < len(heads) else len(text)
        b = boundary.search(text, m.end(), limit)
        end = min(b.start() if b else limit, limit, m.end() + _REACH)
        rep = _read_head(pat, text, m)
        if rep is None:
            continue
        if rep.symbol == "chi2":  # a model's χ² test of fit ends where its fit indices begin ("…, p = .15, CFI = .98, RMSEA = .04, 90% CI
            fit = _FIT_INDEX.search(text, m.end(), end)  # [.00, .07]": the RMSEA's interval, not the χ²'s), unless its p comes after them
            end = fit.start() if fit is not None and pat.p.search(text, fit.start(), end) is None else end
        _read_clause(pat, text, rep, m.end(), end, rare)
        if m.group("bare_t") is not None and (rep.p is None or rep.value is None or not rep.value.decimals):  # ("t12 = 5 s": a time
            continue  # point, unless a value with decimals and a p follow as a t's do)
        if rep.p is None and not rep.df and m.group("op")[0].isalpha():  # a value in words is a result where its df or p follow
            continue  # ("an F of 3.6 with 2 and 9 df"), not where prose speaks of one ("a z-value of 2 is none")
        rep.text = text[rep.start : rep.end]
        out.append(rep)
        taken.append((rep.start, rep.end))
        if rep.symbol_text == "rs" and rep.value is not None and pat.p_list.match(text, rep.value.end) is not None:
            rep.symbol = "r"  # "rs = .32 and .41": r's plural, not Spearman's r (a list of values follows)
        if rep.symbol_text in ("Fs", "ts", "rs") and rep.symbol != "rs" and rep.value is not None:  # a plural head: its other values,
            rep.plural = True  # each a statistic of its own
            out += _more_values(pat, text, rep)
    gaps, at = [], 0
    for s, e in sorted(taken):
        if s > at:
            gaps.append((at, s))
        at = max(at, e)
    gaps.append((at, len(text)))
    verdicts = False  # an "ns" read alone: it may be the verdict after a statistic's own p
    for gap_start, gap_end in gaps:  # p values, effect sizes and descriptives outside any head's clause
        if not _anything_in(text, gap_start, gap_end, rare):  # none in any of its sentences (most gaps: ", and ")
            continue
        piece = gap_start
        while piece < gap_end:
            b = boundary.search(text, piece, gap_end)
            stop = b.start() if b else gap_end
            found = _orphans(pat, text, piece, stop, rare)
            if found:
                verdicts = verdicts or any(_lone_ns(r) for r in found)
                out += found
            piece = (b.end() if b else gap_end) if stop < gap_end else gap_end
    if "%" in text and ("CI" in text or "onfidence" in text):  # (what an estimate's labelled interval must contain)
        out += _estimates(pat, text, out)
    out.sort(key=lambda r: r.start)
    if verdicts:  # an "ns" after a statistic's own p: its verdict, not a p
        out = [r for i, r in enumerate(out) if not (i and _lone_ns(r) and ns_after(text, out[i - 1]))]
    bare = next((r.start for r in out if r.symbol is not None and r.p is None), None)  # (most statistics carry their p)
    if bare is not None:
        _share(pat, text, out, bare)
    return out


_OPEN_LABEL = re.compile(r"[(\[]\s*\d{2}(?:[.,]\d+)?\s*%\s*(?:CI|C\.I\.|[Cc]onfidence)")  # "(95% CI", "[95%CI", "(95% confidence"
_COMMA_LABEL = re.compile(r",\s*\d{2}(?:[.,]\d+)?\s*%\s*(?:CI|C\.I\.|[Cc]onfidence)")  # ", 95% CI", ", 95%confidence"
_NUMBER_COMMA_BEFORE = re.compile(r"[-−–]?\s?(?:\d+(?:[.,]\d+)*|[.,]\d+)(?:\s?%)?\)?\s*$")  # "0.844", "34.7%)" just before it
_NUMBER_BEFORE = re.compile(r"[-−–]?\s?(?:\d+(?:[.,]\d+)*|[.,]\d+)(?:\s?%)?\s*$")  # the estimate just before it, "40.4% "


def _estimates(pat: _Patterns, text: str, found: list[Reported]) -> list[Reported]:
    """Each estimate given with its labelled interval right after it ("12.4% (95% CI, 10.1%-14.9%)"; or after a comma, "0.844,
    95% CI: 0.779-0.896") that no statistic
    read already holds (a ratio's, a mean's, a difference's are theirs): its estimate and interval, to hold it (no p: the
    null of a prevalence or a mean is not 0)."""
    spans = sorted((r.start, r.end) for r in found)
    out = []
    labels = [(m, _NUMBER_BEFORE, pat.estimate_ci) for m in _OPEN_LABEL.finditer(text)]
    if "," in text:  # (or after a comma: "0.844, 95% CI: 0.779-0.896")
        labels += [(m, _NUMBER_COMMA_BEFORE, pat.estimate_comma_ci) for m in _COMMA_LABEL.finditer(text)]
    for label, number_before, estimate_ci in labels:  # (the level first: the estimate's pattern then matched where it can stand)
        before = number_before.search(text, max(0, label.start() - 24), label.start())
        if before is not None and estimate_ci is pat.estimate_comma_ci and text[max(0, before.start() - 3) : before.start()].rstrip()[-1:] in ("=", ":"):
            continue  # (a named index's, "RMSEA = .04, 90% CI [.00, .07]": not this reading's to name)
        m = (estimate_ci.match(text, before.start(), label.end() + 80)  # (the interval's limits within reach of its label)
             if before is not None and not text[before.start() - 1 : before.start()].isdigit() else None)
        if m is None:
            continue
        k = bisect.bisect_right(spans, (m.start("est"), len(text))) - 1
        if k >= 0 and spans[k][0] <= m.start("est") < spans[k][1]:
            continue
        estimate, low, high, level = (pat.to_number(m.group(g), m.start(g)) for g in ("est", "a", "b", "lev"))
        if estimate is None or low is None or high is None or level is None or not 0 < level.value < 100:
            continue
        start = m.start("est") + len(m.group("est")) - len(m.group("est").lstrip())
        rep = Reported(None, "", start, start, m.end(), ci=_new_interval(level.value / 100, low, high, m.start("lev"), m.end()), estimate=estimate)
        rep.text = text[start : m.end()]
        out.append(rep)
    return out


_NS_AFTER = re.compile(r"[\s,;(]*n(?:\.\s?s\.|s)(?![\w])")  # ", ns", " (n.s.)", "; n. s." (the forms pat.p reads as "ns")


def _lone_ns(rep: Reported) -> bool:
    return rep.symbol is None and rep.p is not None and rep.p.op == "ns" and not rep.effects and not rep.descriptives and rep.ci is None


def ns_after(text: str, rep: Reported) -> "re.Match[str] | None":
    """Whether "ns" (or "n.s.") follows a statistic that gives a p of its own ("F(1, 23) = 0.14, p = .707, n.s."): the
    author's verdict beside the p, not a p (no statistic of its own; checked against the p: checks.verdict_word)."""
    return _NS_AFTER.match(text, rep.end) if rep.symbol is not None and rep.p is not None and rep.p.op != "ns" else None


def p_text(p: "PValue | None") -> str:
    """A p made from a table's cell as the text after a statistic gives it: ", p = .039", " ns" ("" for none)."""
    return "" if p is None else (" " + p.symbol_text if p.op == "ns" else f", p {p.op} {p.number.text}")  # type: ignore[union-attr]


def statistic_text(label: str, df: "tuple[Number, ...]", op: str, value: Number, p: PValue | None) -> str:
    """A statistic made from its parts (a table's cells, a plural head's further value) as one text: "t(38) = 2.14,
    p = .039" ("ns" as the table gives it)."""
    return f"{label}{'(' + ', '.join(d.text for d in df) + ')' if df else ''} {op} {value.text}{p_text(p)}"


def icc_form(rep: Reported) -> str | None:
    """The form an ICC is typed with ("ICC(2,1)", "ICC(A,1)": which estimator it is), None without one."""
    return next((e.symbol_text for e in rep.effects if e.name == "ICC" and "(" in e.symbol_text), None)


def _more_values(pat: _Patterns, text: str, rep: Reported) -> list[Reported]:
    """The further values of a plural head, "Fs(1, 38) = 4.41 and 5.20" or "ts(38) = 2.10, 2.50, and 3.00": each with the
    head's df and operator, its text made as a table's statistic's is (its place: its number)."""
    out, at = [], rep.value.end  # type: ignore[union-attr]
    while (m := pat.p_list.match(text, at)) is not None:
        value = pat.to_number(m.group("num"), m.start("num"))
        if value is None:
            break
        more = Reported(rep.symbol, rep.symbol_text, value.start, value.start, value.end, rep.df, rep.n, rep.op, value, plural=True)
        more.text = statistic_text(rep.symbol, rep.df, rep.op, value, None)  # type: ignore[arg-type]
        out.append(more)
        at = m.end()
    return out


def _share(pat: _Patterns, text: str, out: list[Reported], since: int) -> None:
    """Each bound shared by several statistics ("ps < .05") given to the statistics without a p of their own before it in
    its sentence (after any bound before it there): the checks test each against it, and none of them takes its text.
    A list of p's ("ps = .042 and .002, respectively") is given to them in order, and only when it names one p for each;
    a bound only when at least two statistics share it (or a plural head stands for several).
    ``since``: where the first statistic without a p starts."""
    starts = [r.start for r in out]
    for m in pat.shared_p.finditer(text, since):
        first = max(_sentence_start(pat, text, 0, m.start()), since)
        window = out[bisect.bisect_left(starts, first) : bisect.bisect_left(starts, m.start())]
        bare = [r for r in window if r.symbol is not None and r.p is None and r.end <= m.start()]
        took = sum(1 for r in window if r.symbol is not None and r.p is not None and m.start() <= r.p.start < m.end())  # "both p < .05" read as the last one's
        numbers = [pat.to_number(m.group("num"), m.start("num"))]
        end = m.end()
        if m.group("op") == "=":
            while (more := pat.p_list.match(text, end)) is not None:
                numbers.append(pat.to_number(more.group("num"), more.start("num")))
                end = more.end()
            if len(numbers) != len(bare):
                since = end
                continue
        if any(n is None or not 0 < n.value <= 1 for n in numbers) or (len(bare) + took < 2 and not any(r.plural for r in bare)):
            continue  # (one statistic before a plural p: the p's are of others the sentence does not give, "… while B and C were, ps < .05")
        op = _GARBLED.get(m.group("op"), m.group("op"))
        for k, rep in enumerate(bare):
            number = numbers[k if op == "=" else 0]
            rep.shared_p = _new_p(op, number, m.start(), end, m.start(), m.group("sym"), False)  # type: ignore[arg-type]
        since = end


class _Index:
    """Sentence boundaries and ``n =`` positions of one text, found once, so
    that the sentence-level checks of many statistics in one paragraph stay
    linear in its length (bisect instead of a rescan per statistic); the
    boundaries only when a check asks for them."""

    def __init__(self, pat: _Patterns, text: str) -> None:
        self.text = text
        self.pat = pat
        self._ends: list[int] | None = None
        self.n_at: list[int] = []
        self.n_match: list[re.Match[str]] = []
        for m in pat.n.finditer(text):
            if m.group("sym") == "n":
                self.n_at.append(m.start())
                self.n_match.append(m)

    @property
    def ends(self) -> list[int]:
        if self._ends is None:
            self._ends = [b.end() for b in self.pat.boundary_in(self.text).finditer(self.text)]
        return self._ends


def _remembered(slot: list, key: object, make: "Callable[[], T]") -> "T":
    """What ``make`` made for ``key`` the last time (the same object), or what it makes now: a memory of one entry for
    the text (or spans) a paragraph's statistics ask about in turn, held in ``slot`` as one pair, read and replaced
    whole (so that audits in threads never mix two texts' pieces)."""
    held = slot[0]
    if held is None or held[0] is not key:
        held = (key, make())
        slot[0] = held
    return held[1]


_LAST_INDEX: list = [None]  # (text, its _Index)


def _index(pat: _Patterns, text: str) -> _Index:
    return _remembered(_LAST_INDEX, text, lambda: _Index(pat, text))


def _sentence_start(pat: _Patterns, text: str, since: int, at: int) -> int:
    """Where the sentence holding position ``at`` begins (not before ``since``):
    the end of the last boundary that ends at or before ``at`` … found by bisection."""
    ends = _index(pat, text).ends
    k = bisect.bisect_right(ends, at) - 1
    # a boundary counts when it lies wholly between since and at, as finditer(text, since, at) would find it
    while k >= 0 and ends[k] > at:
        k -= 1
    return max(since, ends[k]) if k >= 0 and ends[k] >= since else since


_EACH_GROUP = re.compile(r"\s*(?:per (?:group|condition|arm)|in each (?:group|condition|arm)|each)\b")


# the two groups' sizes named by their subscripts, anywhere in the statistic's sentence: "n1 = 15, n2 = 12", "n₁ = 15 and n₂ =
# 12", "n1 = n2 = 8" (as nonparametric tests are reported; practice)
_NUMBERED_SIZES = re.compile(r"n(?<![\w]n)\s?[1₁]\s*=\s*(?:n\s?[2₂]\s*=\s*(?P<both>\d{1,6})(?![\d.,]\d)|(?P<n1>\d{1,6})(?![\d.,]\d)\s*(?:[,;]\s*(?:and\s+)?|and\s+)"
                             r"n\s?[2₂]\s*=\s*(?P<n2>\d{1,6})(?![\d.,]\d))")


_NUMBERED_TYPED = ("n1", "n₁", "n 1", "n ₁", "n\u00a01")  # what _NUMBERED_SIZES must find at its start (substring tests: a fast scan)


def group_sizes(text: str, rep: Reported, decimal_mark: str = ".") -> tuple[int, int] | None:
    """The two group sizes (``n = 40`` … ``n = 38``) the sentence gives before
    a statistic, when it gives exactly two; one given for each group (``n = 20
    per group``, ``n = 20 each``) is two alike; or named by their subscripts
    anywhere in its sentence (``n1 = 15, n2 = 12``, ``n1 = n2 = 8``)."""
    pat = _patterns(decimal_mark)
    index = _index(pat, text)
    if any(typed in text for typed in _NUMBERED_TYPED):  # (the subscripts' forms: looked for only where the text holds one)
        start = _sentence_start(pat, text, 0, rep.start)
        k = bisect.bisect_left(index.ends, rep.end)
        m = _NUMBERED_SIZES.search(text, start, index.ends[k] if k < len(index.ends) else len(text))
        if m is not None:
            a, b = (m.group("both"), m.group("both")) if m.group("both") else (m.group("n1"), m.group("n2"))
            if int(a) >= 1 and int(b) >= 1:
                return int(a), int(b)
    if bisect.bisect_left(index.n_at, rep.start) < 1:  # no "n =" before it in the whole text
        return None
    start = _sentence_start(pat, text, 0, rep.start)
    lo, hi = bisect.bisect_left(index.n_at, start), bisect.bisect_left(index.n_at, rep.start)
    found = [m for m in index.n_match[lo:hi] if m.end() <= rep.start]
    if len(found) == 1 and _EACH_GROUP.match(text, found[0].end()):
        found = found * 2
    if len(found) != 2:
        return None
    sizes = [pat.to_number(m.group("num"), m.start("num")) for m in found]
    if any(n is None or n.value < 1 for n in sizes):
        return None
    return int(sizes[0].value), int(sizes[1].value)  # type: ignore[union-attr]


def is_wald(text: str, rep: Reported) -> bool:
    """Whether ``rep`` is a coefficient's Wald χ² ("Wald = 6.13", "Wald χ² = 6.13"): its square root is |B| / SE."""
    return rep.symbol == "chi2" and (rep.symbol_text.startswith("Wald") or text[max(0, rep.symbol_start - 6) : rep.symbol_start].rstrip().endswith("Wald"))


def coefficient_before(text: str, rep: Reported, since: int, decimal_mark: str = ".") -> tuple[Number, Number] | None:
    """The B and SE a sentence gives before a t or z (``B = 0.42, SE = 0.10,
    β = .31, t(196) = 4.20``): the last of each between ``since`` (the end of
    the statistic before) and the statistic, within its sentence."""
    if text.find("SE", since, rep.start) < 0 or (text.find("B", since, rep.start) < 0 and text.find("b", since, rep.start) < 0):  # what the patterns must contain
        return None
    pat = _patterns(decimal_mark)
    start = _sentence_start(pat, text, since, rep.start)
    found = {}
    for name, regex in (("B", pat.coef_b), ("SE", pat.coef_se)):
        matches = list(regex.finditer(text, start, rep.start))
        if not matches:
            return None
        found[name] = pat.to_number(matches[-1].group("num"), matches[-1].start("num"))
    if found["B"] is None or found["SE"] is None:
        return None
    return found["B"], found["SE"]


_LEAD_REACH = 200  # how far before its p a coefficient's B may stand (its SE and interval between them)


def coefficient_lead(text: str, rep: Reported, since: int, decimal_mark: str = ".") -> "tuple[Number, Number | None, Interval | None] | None":
    """The B (or b) a p without a head closes, with the SE and interval typed between them: "b = 0.42, SE = 0.10, 95% CI
    [0.22, 0.62], p < .001" gives (0.42, 0.10, [0.22, 0.62]); only a comma or semicolon between the parts, within the
    sentence after ``since`` (the end of the statistic before). None otherwise."""
    p = rep.p
    if p is None or rep.symbol is not None or rep.effects or rep.descriptives or (text.find("B", since, p.start) < 0 and text.find("b", since, p.start) < 0):
        return None
    pat = _patterns(decimal_mark)
    start = max(_sentence_start(pat, text, since, p.start), p.start - _LEAD_REACH)  # (a window of its own: linear in a long piece)
    found = None
    for m in pat.coef_b.finditer(text, start, p.start):
        found = m
    if found is None:
        return None
    between = pat.coef_lead.fullmatch(text, found.end(), p.start)
    estimate = pat.to_number(found.group("num"), found.start("num"))
    if between is None or estimate is None:
        return None
    typed = "se" if between.group("se") else "se2" if between.group("se2") else None
    se = pat.to_number(between.group(typed), between.start(typed)) if typed else None
    interval = None
    if between.group("ci"):
        ci = pat.ci.match(text, between.start("ci"), between.end("ci"))
        interval = _interval(pat, ci, text) if ci is not None and ci.end() == between.end("ci") else None
        if interval is None:
            return None
    return (estimate, se, interval) if se is not None or interval is not None else None


_OPERATOR_OR_NS = re.compile(r"[=<>≤≥¼n](?:(?<!n)|(?<![\w.]n)\.?\s?s\b)")  # an operator, or "ns" / "n.s" (one fast scan)
_GARBLED_P = re.compile(r"[bN,5.](?<=[pP]\s[bN,5.])\s*+\.?\d")  # "p b 0.01", "P N .05", "p , .05" (see _GARBLED; "¼" is in _OPERATOR_OR_NS)
_RATIO_BARE = re.compile(r"R(?<=[OHRP]R)")  # where a ratio's abbreviation may stand without "=" (then the pattern decides)


def _abbreviated_ratio(text: str, start: int, end: int) -> bool:
    return text.find("R", start, end) >= 0 and _RATIO_BARE.search(text, start, end) is not None  # (a capital R is rare in prose)


def _ratio_words(text: str, start: int, end: int) -> bool:
    return text.find("ratio", start, end) >= 0 or text.find("risk", start, end) >= 0 or text.find("difference", start, end) >= 0


def _ratios_in(text: str, start: int, end: int, rare: bool) -> bool:
    """Whether text[start:end] may hold a ratio (its paragraph having the rare words at all)."""
    return rare and (_abbreviated_ratio(text, start, end) or _ratio_words(text, start, end))


def _rare_words(text: str) -> bool:
    """Whether a paragraph has what only a few statistics are typed with (OR, HR, RR and the ratios ending in them;
    "ratio", "risk"; "value:"; an operator garbled by a copy from a PDF, _GARBLED): looked for once a paragraph, so that
    most clauses and gaps are spared the searches."""
    return (("R" in text and ("OR" in text or "HR" in text or "RR" in text or "PR" in text)) or "ratio" in text or "risk" in text or "value" in text or "difference" in text
            or "¼" in text or "b 0" in text or "b ." in text or "N 0" in text or "N ." in text or "p , " in text or "p 5 " in text or "p . " in text)


_RARE_TYPED = re.compile(rf"(?:{_RARE_NAME})\s*[=¼]")  # (a name and "=": asked of a paragraph, then of a clause)
_LAST_RARE: list = [None, False]  # the last paragraph asked, and whether it holds a rare effect's name and "="


def _rare_effect_in(text: str, start: int, end: int) -> bool:
    """Whether text[start:end] may hold one of _RARE_EFFECTS — a mediation's indirect effect, "ab = ", "a×b = ", or an
    f² typed alone, "f² = " — (asked of the paragraph once: most hold none, and every clause of it is asked)."""
    if _LAST_RARE[0] is not text:
        _LAST_RARE[0], _LAST_RARE[1] = text, _RARE_TYPED.search(text) is not None
    return _LAST_RARE[1] and _RARE_TYPED.search(text, start, end) is not None


def _anything_in(text: str, start: int, end: int, rare: bool = True) -> bool:
    """Whether text[start:end] may hold a p, an effect size or a descriptive: an operator, "ns", a ratio's name or a
    colon after "value" (plain searches for the words: a pattern of common letters would slow every gap's scan)."""
    return (_OPERATOR_OR_NS.search(text, start, end) is not None or _ratios_in(text, start, end, rare)
            or rare and (text.find("value:", start, end) >= 0 or text.find("values:", start, end) >= 0
                         or _GARBLED_P.search(text, start, end) is not None))


def _n_just_before(pat: _Patterns, text: str, at: int, floor: int) -> int | None:
    """Where an "n = 28" (or "N = 28") ends just before ``at``, set off by a comma or semicolon, starts: a group's n
    before its descriptives ("n = 28, M = 3.11, SD = 1.95"); None when there is none after ``floor``."""
    i = at
    while i > floor and text[i - 1].isspace():
        i -= 1
    if i <= floor or text[i - 1] not in ",;":
        return None
    i -= 1
    while i > floor and text[i - 1].isspace():
        i -= 1
    low = max(floor, i - 24)
    for k in range(i - 1, low - 1, -1):  # the n's symbol, nearest first
        if text[k] in "nN":
            m = pat.n.match(text, k, i)
            return k if m is not None and m.end() == i else None
    return None


def _orphans(pat: _Patterns, text: str, start: int, end: int, rare: bool = True) -> list[Reported]:
    """The statistics without a head in one sentence piece: a cluster each, a new one where an effect size of a name
    the cluster has already read comes again ("(OR, 0.76; 95% CI, 0.73 to 0.80) and … (OR, 0.73; 95% CI, …)": two).
    A cluster reads at most _REACH characters, as a head's clause does, and each pattern's next match is searched for
    again only once passed: a piece of thousands of clusters stays linear ("OR 1.5 " 20,000 times had taken minutes)."""
    if not _anything_in(text, start, end, rare):
        return []
    ratios = _ratios_in(text, start, end, rare)
    searched = (pat.p, pat.effect) + ((pat.ratio,) if ratios else ()) + ((pat.rare,) if _rare_effect_in(text, start, end) else ())
    following = {regex: regex.search(text, start, end) for regex in searched}
    out: list[Reported] = []
    while start < end:
        for regex, m in following.items():
            if m is not None and m.start() < start:
                following[regex] = regex.search(text, start, end)
        first = [m.start() for m in following.values() if m is not None]
        if not first:
            break
        at = min(first)
        m = following[pat.effect]
        if m is not None and m.start() == at and _effect_name(m.group("name")) in _DESCRIPTIVE:  # a group's n before its mean
            paired = _PLUS_MINUS_MEAN.search(text, max(start, at - 12), at)  # ("n = 12, M ± SD = …": before the mean's symbol)
            before = _n_just_before(pat, text, paired.start() if paired else at, start)
            at = before if before is not None else at
        stop = min(end, at + _REACH)
        rep = Reported(None, "", at, at, at)
        again = _read_clause(pat, text, rep, at, stop, rare)
        if rep.p is not None or rep.effects or rep.descriptives:
            rep.text = text[rep.start : rep.end]
            out.append(rep)
            start = again if again is not None else max(rep.end, at + 1)  # (what it did not read may start a cluster of its own)
        else:
            start = again if again is not None else stop
    return out


# a statistic given in words, "an F of 3.60", "the t-value was 2.31", "a chi-square value of 12.4": only these symbols, and
# only named as a value or statistic, spelled out (chi-square), or after an article ("a", "an", "the", up to two words
# between: "a significant F of 4.20"), as a letter alone in prose may be anything ("part F of 12 items")
_WORDED = frozenset({"t", "F", "chi2", "z", "r", "U", "H"})
_ARTICLE_BEFORE = re.compile(r"(?<![\w])(?:[Aa]n?|[Tt]he)\s+(?:[a-z]+\s+){0,2}$")


_LEVEL_AND_DF = re.compile(r"\s*(?:0?\.\d{1,3}\s*,\s*\d{1,4}|\d{1,4}\s*,\s*0?\.\d{1,3})\s*")  # "0.05, 2", "49, .05"


def _read_head(pat: _Patterns, text: str, m: re.Match[str]) -> Reported | None:
    sym, num, inner, sub, bare, op = m.group("sym", "num", "inner", "sub", "bare", "op")  # (one call: a head is read 10,000 times a book)
    if bare is None and m.group("bare_t") is not None:  # "t38 = 2.10": a t's subscript df flattened by a copy from a PDF
        bare = m.group("bare_t")  # (two digits at least: "t1 = …" may be a first time point's)
    symbol = symbol_of(sym)
    if op[0].isalpha():  # "of", "was", "is", "equals", "equal to"
        if symbol not in _WORDED or not (sym.endswith(("value", "statistic")) or sym[0] in "cC" or
                                         _ARTICLE_BEFORE.search(text, max(0, m.start() - 40), m.start())):
            return None
        op = "="
    value = pat.to_number(num, m.start("num"))
    if symbol is None or value is None:
        return None
    dfs: tuple[Number, ...] = ()
    n = None
    if inner is not None:
        if "." in inner and _LEVEL_AND_DF.fullmatch(inner):  # "χ2(0.05, 2) = 5.99", "t(.05, 49)": a table's critical value at a
            return None  # level, not a result (no df is below 1)
        dfs, n = _inner(pat, inner, m.start("inner"))
    elif sub is not None:  # df as subscripts (AMA 11): t₃₈, F₂,₂₃₇; one character each, so positions hold
        dfs, n = _inner(pat, sub.translate(_SUBSCRIPT_DIGITS), m.start("sub"))
    elif bare is not None:  # "F1,23 = 4.50": df run on after the F
        dfs, n = _inner(pat, bare, m.start("bare") if m.group("bare") is not None else m.start("bare_t"))
    if symbol == "chi2" and len(dfs) == 2 and n is None and dfs[1].value > dfs[0].value:  # χ²(2; 415): df and N
        dfs, n = dfs[:1], dfs[1]
    if symbol in ("t", "r", "rs") and len(dfs) == 2 and inner and pat.mark == "." and re.fullmatch(r"\s*\d{1,3},\d{3}\s*", inner):
        one = pat.to_number(inner, m.start("inner"))  # t(1,198): one df with a thousands comma, as a t or r has one
        dfs = (one,) if one is not None else dfs
    return Reported(symbol, sym, m.start("sym"), m.start(), value.end, dfs, n, "=" if op in (":", "¼") else op, value)


_OPERATOR = re.compile(r"[=<>≤≥]\s*+")  # the operator first (the engine's fast scan); the space before it is found by hand


_LAST_OPERATORS: list = [None]  # (text, (where each operator starts, where the white space after it ends))


def _operator_spans(text: str) -> tuple[list[int], list[int]]:
    starts, ends = [], []
    for o in _OPERATOR.finditer(text):
        starts.append(o.start())
        ends.append(o.end())
    return starts, ends


def _operators(text: str, spans: list[tuple[int, int]]) -> list[tuple[int, int]]:
    """(start, end) of each operator in the stretches ``spans`` (in order, not overlapping) with the white space on each
    side of it (the space before it back to the end of the operator before, or the stretch's start), as the style's
    spacing check reads them. The text's operators are found once (a paragraph's statistics ask in turn): white space
    holds no operator, so those of a stretch are the text's that start in it, their white space cut at its end."""
    starts, ends = _remembered(_LAST_OPERATORS, text, lambda: _operator_spans(text))
    out = []
    count = len(starts)
    k = bisect.bisect_left(starts, spans[0][0]) if spans else count
    for start, end in spans:
        while k < count and starts[k] < start:
            k += 1
        floor = start
        while k < count and starts[k] < end:
            at = starts[k]
            while at > floor and text[at - 1].isspace():
                at -= 1
            floor = min(ends[k], end)
            out.append((at, floor))
            k += 1
    return out


_ADJUSTED_WORDS = ("adjusted", "corrected", "holm", "bonferroni", "sidak", "šidák", "fdr", "benjamini")  # a cheap test first
_ADJUSTED = re.compile(r"(?i:adjusted|corrected|holm|bonferroni|sidak|šidák|fdr|benjamini)[\s-]*$")


# operators as a copy from a PDF garbles them (Elsevier's "p b 0.01" for "<", "p N 0.05" for ">"; Taylor & Francis's
# "F(1, 393) ¼ 12.79" for "="; others' "p , .05" for "<", "p . .2" for ">" and "p 5 .03" for "=", read for a p only,
# whose number is never negative: those copies also turn a minus into "2"), and "p-value: 0.013" (as R's summary of lm
# prints it) for "="; "p = < .001" means "<"
_GARBLED = {"b": "<", "N": ">", "¼": "=", ":": "=", ",": "<", "5": "=", ".": ">"}


def _worded_op(op: str) -> str:
    """The operator a p's words give: "less than" "<", "greater than" ">", "is < " its sign, "of", "was", "equals" "="."""
    if "less" in op or "smaller" in op:
        return "<"
    if "greater" in op or "larger" in op:
        return ">"
    return op[-1] if op[-1] in "<>≤≥" else "="


def _p_value(pat: _Patterns, m: re.Match[str]) -> PValue | None:
    text, at = m.string, m.start()
    last = at - 1  # the character before the white space and hyphens before the p: a word of _ADJUSTED must end there
    while last >= 0 and (text[last] == "-" or text[last].isspace()):
        last -= 1
    adjusted = False
    if last >= 0 and (text[last] in "dmikrDMIKR" or not text[last].isascii()):  # the last letters of _ADJUSTED_WORDS (a cheap test first)
        before = text[max(0, at - 30) : at].lower()
        adjusted = any(word in before for word in _ADJUSTED_WORDS) and bool(_ADJUSTED.search(text, max(0, at - 30), at))
    op, num = m.group("op", "num")
    if op is None:  # "ns"
        return PValue("ns", None, m.start(), m.end(), m.start(), m.group())
    number = pat.to_number(num, m.start("num"))
    if number is None:
        return None
    op = _GARBLED.get(op, op[-1] if len(op) > 1 else op) if op in _GARBLED or not op[0].isalpha() else _worded_op(op)
    symbol = text[at] if text[at] in "pP" else text[at : m.start("op")].rstrip()  # (SPSS's "Sig. (2-tailed)" as typed)
    return _new_p(op, number, at, m.end("num"), at, symbol, adjusted)


def _read_clause(pat: _Patterns, text: str, rep: Reported, start: int, end: int, rare: bool = True) -> int | None:
    """The p, CI, effect sizes, df and n of ``rep``'s clause, text[start:end], read into it; for a statistic without a
    head, the position where an effect size of a name already read comes again (a statistic of its own), else None."""
    events: list[tuple[int, str, re.Match[str]]] = []
    # a search is skipped where the clause lacks what its pattern must contain: an interval its level's percent sign,
    # an effect size and an n their "=", a ratio its name, a df written apart its "df"
    equals = text.find("=", start, end) >= 0 or (rare and text.find("¼", start, end) >= 0)
    ratios = _ratios_in(text, start, end, rare)
    for kind, regex, wanted in (("p", pat.p, True), ("p", pat.p_words, text.find("value", start, end) >= 0), ("ci", pat.ci, text.find("%", start, end) >= 0), ("effect", pat.effect, equals),
                                ("effect", pat.ratio, ratios),
                                ("effect", pat.rare, equals and _rare_effect_in(text, start, end)),
                                ("df", pat.df, text.find("df", start, end) >= 0 or text.find("d.f", start, end) >= 0 or text.find("DF", start, end) >= 0
                                       or text.find("egree", start, end) >= 0), ("n", pat.n, equals)):
        if wanted:
            events += [(m.start(), kind, m) for m in regex.finditer(text, start, end)]
    events.sort(key=lambda e: e[0])
    spans = [(rep.start, rep.end)]  # the head (the operators of each part read are added to its own)
    covered = -1  # the furthest end of the matches read so far: each began at or before this event (events in order of start)
    last_end = rep.end
    ci = None
    clause_df = False  # the df were read from the clause ("df = 2"), not the head
    again = None  # where an effect size of a name already read comes again (a statistic without a head: a new one)
    differences = False  # a difference read (kept only with its interval)
    if rep.symbol in _CORRELATIONS and rep.value is not None:  # a correlation's own interval without its level ("r = .30 [.12, .46]")
        rep.ci = _bare_interval(pat, text, rep.value.end, end)
        if rep.ci is not None:
            covered = last_end = rep.ci.end
    for at, kind, m in events:
        if at < covered:  # inside a match already read
            continue
        if kind == "p" and rep.p is None:
            rep.p = _p_value(pat, m)
        elif kind == "p" and rep.symbol is None:  # a second p: a statistic without a head ends before it ("(p = .001) … (p = .004, d = 0.30)")
            again = at
            break
        elif kind == "ci":
            ci = _interval(pat, m, text)
            if ci is None:
                continue
            target = next((e for e in reversed(rep.effects) if e.ci is None and e.name not in _DESCRIPTIVE), None)
            if target is not None and rep.effects and rep.effects[-1] is target:
                rep.effects[-1] = _new_effect(target.name, target.number, target.start, target.end, target.symbol_start, target.symbol_text, ci)
            elif rep.ci is None:
                rep.ci = ci
        elif kind == "effect":
            name = _effect_name(m.group("name"))
            number = pat.to_number(m.group("num"), m.start("num"))
            if name is None or number is None:
                continue
            if name == "alpha_bare":
                name = _bare_alpha(text, number.value)
                if name is None:
                    continue
            percent = _PERCENT_AFTER.match(text, number.end) if name == "I2" else None
            if name == "I2" and (percent is None or rep.symbol not in ("Q", "chi2")):  # (read with the Q it is checked against, in
                continue  # percent: not as a proportion, nor beside a pooled effect, whose revision it would stop)
            if rep.symbol is not None and name in _DESCRIPTIVE and not rep.descriptives and _WORDS.search(text, last_end, m.start()):
                continue  # a group's mean after words ("F(1, 38) = 4.69, p = .037, with more for familiar faces (M = 63.9%) than …"):
                # the groups', not the test's: read as descriptives of their own, and the test restyled without them
            in_parentheses = name == "M" and m.group("name").endswith(")")  # "M (SD) = 3.2 (0.5)"
            if in_parentheses:
                paired = _paren_sd(pat, text, m, number)
                if paired is None:
                    continue  # ("M (SD) = 3.2" without the SD's number: no reading of the pair)
            elif name == "SD" and "±" in text[max(0, m.start("name") - 3) : m.start("name")]:
                paired = _mean_and_sd(pat, text, m, number)
            else:
                paired = None
            if rep.symbol is None and rep.p is not None and m.re is pat.ratio and rep.p.end <= m.start() and rep.effects and \
                    rep.effects[-1].start < rep.p.start:  # a ratio after the p that closed a ratio's cluster: another's
                again = at  # ("PR = 1.45; …; p < 0.001); adjusted PR = 1.38 (…)"; not JMIR's "(P=.50; OR 2.72, …)", p first)
                break
            if rep.symbol is None and any(e.name == name for e in (rep.descriptives if name in _DESCRIPTIVE else rep.effects)):
                again = at  # a name read again: another cluster ("(M = 4.40, SD = 2.22) … (n = 28, M = 3.11, …)"), with the n
                # just before it, which this cluster had read for its own
                before = _n_just_before(pat, text, at, start)
                if before is not None:
                    again = before
                    if rep.n is not None and rep.n.start >= before:
                        rep.n = None
                        spans = [sp for sp in spans if sp[0] < before]
                        last_end = max([rep.end] + [e for _, e in spans] + [x.end for x in rep.effects + rep.descriptives]
                                       + [rep.p.end if rep.p is not None else 0] + [rep.ci.end if rep.ci is not None else 0])
                break
            if paired is not None:  # "M ± SD = −2.1 ± 0.5": the mean, then its SD (the first number had been read as the SD)
                mean, sd, close = paired
                rep.descriptives += [mean, sd]
                rep.start = min(rep.start, mean.symbol_start)
                covered = max(covered, close)
                last_end = max(last_end, close)
                spans.append((m.start(), close))
                continue
            differences = differences or name == "MD"
            ci = _labelled_interval(pat, m) if m.re is pat.ratio and m.group("rlev") is not None else None
            after = text[number.end : number.end + 2]  # (an interval right after the number opens there: "[", "(", or a ratio's ",")
            if ci is None and ("[" in after or "(" in after or ("," in after and m.re is pat.ratio)) and name not in _DESCRIPTIVE:
                ci = _bare_interval(pat, text, number.end, end, ratio=m.re is pat.ratio and name != "MD")
                if ci is not None:
                    covered = max(covered, ci.end)
                    last_end = max(last_end, ci.end)
            effect = _new_effect(name, number, m.start(), number.end if percent is None else percent.end(), m.start("name"), m.group("name"), ci)
            (rep.descriptives if name in _DESCRIPTIVE else rep.effects).append(effect)
            if percent is not None:  # (the statistic's text ends after the I²'s percent sign)
                last_end = max(last_end, percent.end())
                covered = max(covered, percent.end())
        elif kind == "df" and (not rep.df or (clause_df and rep.symbol == "F" and len(rep.df) == 1)):
            first, other = ("num", "num2") if m.group("num") is not None else ("pre", "pre2")
            number = pat.to_number(m.group(first), m.start(first))
            second = pat.to_number(m.group(other), m.start(other)) if m.group(other) and rep.symbol == "F" else None
            if number is None:
                continue
            if rep.df:  # "F = 3.2, num df = 2.00, denom df = 40.5" (as R prints a Welch ANOVA): the F's second df
                rep.df = (rep.df[0], number)
            else:
                rep.df = (number, second) if second is not None else (number,)  # "F = 4.51, df = 2, 97": both df of an F
                clause_df = True
        elif kind == "n" and rep.n is None:
            rep.n = pat.to_number(m.group("num"), m.start("num"))
        else:
            continue
        covered = max(covered, m.end())
        last_end = max(last_end, m.end(), ci.end if kind == "ci" and ci is not None else 0)
        spans.append((m.start(), m.end()))
    if differences and any(e.name == "MD" and e.ci is None for e in rep.effects):  # a difference is read only with its interval
        rep.effects = [e for e in rep.effects if e.name != "MD" or e.ci is not None]
    rep.end = last_end
    rep.operators = _operators(text, spans)
    return again


# what a paragraph says where an α alone is a scale's reliability, or the significance level (practice)
_RELIABILITY_SAID = re.compile(r"(?i)reliab|internal\s+consistency|cronbach|\bscales?\b|subscale|\bitems?\b|questionnaire|inventory")
_LEVEL_SAID = re.compile(r"(?i)signific|\blevel\b|\bset\s+at\b|criterion|threshold|two-tailed|one-tailed|bonferroni|corrected|adjusted")
_ALPHA_VALUE = re.compile(r"(?<![\w])(?:α|alpha)\s*=\s*(\d*[.,]?\d+)")


def _bare_alpha(text: str, value: float) -> str | None:
    """What an α typed alone is, from its paragraph: the significance level at .10 or below where the paragraph speaks of
    significance, levels or corrections ("set at α = .05"); a scale's reliability up to 1 where it speaks of reliability,
    scales or items ("α = .86") and no α in it exceeds 1 (an item response model's α, "ranged from α = 0.8 to 2.1", is a
    discrimination, not a reliability); None otherwise (not read)."""
    if 0 < value <= 0.1:
        return "alpha_level" if _LEVEL_SAID.search(text) is not None else None
    if value > 1 or _RELIABILITY_SAID.search(text) is None:
        return None
    above = any(float(v.replace(",", ".")) > 1 for v in _ALPHA_VALUE.findall(text) if v.replace(",", "").replace(".", "").isdigit())
    return None if above else "alpha"


_PERCENT_AFTER = re.compile(r"\s?%")
_WORDS = re.compile(r"[^\W\d_]{2}")  # a word between a statistic's parts (two letters: "vs", "in", "with")
_PLUS_MINUS_MEAN = re.compile(r"(?:\b[Mm]ean|(?<![\w])M)\s*±\s*$")  # "M ± " or "mean ± " before an SD's name
_PLUS_MINUS_VALUE = re.compile(r"\s*±\s*([-−–]?\s?(?:\d+(?:[.,]\d+)?|[.,]\d+))")


def _mean_and_sd(pat: _Patterns, text: str, m: re.Match[str], first: Number) -> tuple[Effect, Effect, int] | None:
    """"M ± SD = −2.1 ± 0.5" (or "mean ± SD = …", as medical texts type a mean and its SD together): the mean
    (the first number, its symbol where "M" or "mean" stands) and the SD (the number after "±"), and where the pair ends;
    None otherwise."""
    before = _PLUS_MINUS_MEAN.search(text, max(0, m.start("name") - 12), m.start("name"))
    after = _PLUS_MINUS_VALUE.match(text, first.end)
    if before is None or after is None:
        return None
    sd = pat.to_number(after.group(1), after.start(1))
    if sd is None:
        return None
    symbol = before.group().rstrip(" ±")
    return (_new_effect("M", first, before.start(), first.end, before.start(), symbol, None),
            _new_effect("SD", sd, m.start("name"), sd.end, m.start("name"), m.group("name"), None), sd.end)


_PAREN_VALUE = re.compile(r"\s*\(\s*([-−–]?\s?(?:\d+(?:[.,]\d+)?|[.,]\d+))\s*\)")


def _paren_sd(pat: _Patterns, text: str, m: re.Match[str], first: Number) -> tuple[Effect, Effect, int] | None:
    """"M (SD) = 3.20 (0.50)" (or "Mean (SD) = …"): the mean (the first number) and the SD (the number in parentheses
    after it), each with its own symbol, and where the SD's parenthesis closes; None when no parenthesised number
    follows."""
    after = _PAREN_VALUE.match(text, first.end)
    sd = pat.to_number(after.group(1), after.start(1)) if after is not None else None
    if sd is None:
        return None
    name = m.group("name")
    at = m.start("name") + name.index("SD")
    symbol = name[: name.index("(")].rstrip()
    return (_new_effect("M", first, m.start(), first.end, m.start("name"), symbol, None),
            _new_effect("SD", sd, at, sd.end, at, "SD", None), after.end())  # type: ignore[union-attr]


def _labelled_interval(pat: _Patterns, m: re.Match[str]) -> Interval | None:
    """The interval after a ratio labelled with its level, "OR (95% CI) is 0.84 (0.69, 1.03)"."""
    level, low, high = (pat.to_number(m.group(g), m.start(g)) for g in ("rlev", "ra", "rb"))
    if level is None or low is None or high is None or not 0 < level.value < 100:
        return None
    return _new_interval(level.value / 100, low, high, m.start("rlev"), m.end())


def _bare_interval(pat: _Patterns, text: str, at: int, end: int, ratio: bool = False) -> Interval | None:
    """The interval typed without its level right after a number that ends at ``at`` ("d = 0.62 [0.21, 1.03]", "OR =
    2.30 (1.40–3.80)"; after a ratio also set off by a comma alone, "AOR = 2.66, 1.25–5.67", as medical abstracts type
    it), its level None; None where none is, or where neither limit has decimals ("d = 0.62 [12, 13]": a citation's numbers)."""
    m = pat.bare_ci.match(text, at, end) or (pat.ratio_ci.match(text, at, end) if ratio else None)
    if m is None:
        return None
    low, high = pat.to_number(m.group("a"), m.start("a")), pat.to_number(m.group("b"), m.start("b"))
    if low is None or high is None or not (low.decimals or high.decimals):
        return None
    typed = m.group()
    return _new_interval(None, low, high, m.start() + len(typed) - len(typed.lstrip(" \u00a0\t\n,")), m.end())


def _interval(pat: _Patterns, m: re.Match[str], text: str) -> Interval | None:
    a, b = (m.group("a"), m.group("b")) if m.group("a") is not None else (m.group("a2"), m.group("b2"))
    sa, sb = (m.start("a"), m.start("b")) if m.group("a") is not None else (m.start("a2"), m.start("b2"))
    low, high = pat.to_number(a, sa), pat.to_number(b, sb)
    level = pat.to_number(m.group("lev"), m.start("lev"))
    if low is None or high is None or level is None or not 0 < level.value < 100:
        return None
    end = m.end()
    if m.group("a") is None and text[m.start() - 1 : m.start()] + text[end : end + 1] in ("()", "[]"):
        end += 1  # "(95% CI, 0.04–1.31)", "[95% CI 1.12-1.62]": the closing bracket belongs to the interval
    return _new_interval(level.value / 100, low, high, m.start(), end)
