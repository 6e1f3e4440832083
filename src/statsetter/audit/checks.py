"""Checks on a reported statistic, and its record for the restyled text.

Each finding has a short code. The consistency checks recompute p from the
statistic and df with interval arithmetic on the printed precision: a
printed ``t(23) = 2.10`` stands for any t in [2.095, 2.105], so p may be
anything between the p values of those two ends, and a printed ``p = .03``
for any p in [.025, .035]; the two intervals must meet. The style checks ask
the same number engine the renderer uses, so the audit and the generated
text can never disagree about the style.
"""

from __future__ import annotations

import bisect
import functools
import math
import re
from statistics import NormalDist
from dataclasses import dataclass, replace
from typing import TYPE_CHECKING, Callable, Sequence

from ..errors import MissingExtra
from ..formulas import hedges_j
from ..pvalues import spearman_p, upper_tail
from ..records import EffectSize, Interval, Result, Statistic
from ..style.numbers import Numbers, numbers_for, round_half_up
from ..style.profile import Style
from .parsing import Effect, Number, Reported, _remembered, subscript
from .parsing import Interval as TypedInterval

if TYPE_CHECKING:
    from .tables import Squares  # (an ANOVA row's SS, df, MS and its error row's, as a table gives them)

# code: (what it means, the docs/reporting-rules.md rule and its source)
CODES: dict[str, tuple[str, str]] = {
    "p-does-not-follow": ("the reported p does not follow from the statistic and df (without df: under no df at all)", "Numbers: exact p (APA 7 §6.36); consistency as in Nuijten et al. (2016)"),
    "verdict-changes": ("with the recomputed p the verdict at alpha is the other one", "Numbers: decision-preserving p (practice)"),
    "ns-below-alpha": ("the text calls a statistic not significant (ns) beside its own p below alpha", "Numbers: decision-preserving p (practice)"),
    "one-sided": ("the p agrees only with a one-sided test; say so if that was the test", "Say which test was run (practice)"),
    "impossible-r": ("a correlation outside [−1, 1]", "Reporting by test: correlation (practice)"),
    "impossible-p": ("a p value outside [0, 1]", "Numbers: p (APA 7 §6.36)"),
    "impossible-value": ("a bounded effect size outside its range", "Numbers: bounded quantities (APA 7 §6.36)"),
    "malformed-number": ("a number typed with a leading zero and no decimal mark (\"072\", \"0684\": a decimal point lost?)",
                         "Numbers: a decimal fraction is written with its decimal mark (practice); the number is read as typed"),
    "negative-statistic": ("a negative F or χ²", "Reporting by test (practice)"),
    "negative-sd": ("a negative standard deviation", "Descriptives (APA 7 §6.44)"),
    "ci-reversed": ("a CI whose lower limit is above its upper", "Confidence intervals (APA 7 §6.44)"),
    "ci-excludes-estimate": ("a CI that does not contain its estimate", "Confidence intervals (APA 7 §6.44)"),
    "ci-level": ("an interval typed without its level where the text names none before it (d = 0.68 [0.04, 1.31])",
                 "Confidence intervals: the level stated with every interval, 95% CI [a, b] (APA Style Blog, 2010, on the Manual's 6th ed. p. 117; practice)"),
    "df-not-integer": ("non-integer df where the test needs whole numbers (χ², r, H)", "Reporting by test (practice; Welch t and F keep decimals)"),
    "leading-zero": ("a leading zero on a quantity that cannot exceed 1", "Numbers: leading zero (APA 7 §6.36)"),
    "decimal-mark": ("decimals typed with another mark than the style's (a comma for a point, or the reverse)", "Numbers: decimal mark (the style's numbers section; APA 7 uses a point)"),
    "missing-leading-zero": ("no leading zero on a quantity that can exceed 1", "Numbers: leading zero (APA 7 §6.36)"),
    "decimals": ("decimals other than the style's", "Numbers: decimals (APA 7 §6.36)"),
    "p-threshold": ("p given as a threshold instead of exactly", "Numbers: exact p (APA 7 §6.36)"),
    "p-zero": ("p = .000 or p < .00; a p value is never zero", "Numbers: never p = .000 (APA 7 §6.36)"),
    "p-symbol": ("p in the other case than the style's (APA 7 writes p, AMA 11 writes P)",
                 "Statistics in text: the p symbol (APA 7 §6.45, lowercase italic p; AMA 11 §19.5, capital P — memory)"),
    "spacing": ("no space around an operator, or df spaced otherwise than F(1, 56)", "Statistics in text: spaces around = < > (APA 7 §6.45); df as in its examples, F(1, 56)"),
    "hyphen-minus": ("a hyphen or dash where the style has a minus sign", "Numbers: true minus sign (practice; APA examples)"),
    "italics": ("a Latin symbol not in italics, or a Greek one in italics", "Statistics in text: italic symbols (APA 7 §6.45)"),
    "grim": ("a mean impossible for integer data with this n (GRIM test)", "Brown & Heathers (2016)"),
    "corrected-df": ("sphericity-corrected df that no single ε and whole uncorrected df give",
                     "Repeated-measures ANOVA: corrected df are ε × the uncorrected df (Greenhouse & Geisser, 1959; definition)"),
    "uncorrected-df": ("a sphericity-corrected p beside the uncorrected df: report the corrected df with it",
                       "Repeated-measures ANOVA: the corrected test is F(ε·df₁, ε·df₂) (Greenhouse & Geisser, 1959; definition); "
                       "report the df of the test whose p is given (practice)"),
    "coefficient-does-not-fit": (
        "t (or z) does not equal B / SE (or a table's mean difference / its SE), a Wald χ² (B / SE)², or an odds ratio exp(B); a p given without a test follows from B / SE under no df",
        "Regression: coefficients as B, SE, β, t, p (docs/reporting-rules.md); the Wald statistic of a coefficient is B / SE, its χ² form "
        "(B / SE)² on 1 df, and a logistic coefficient's odds ratio exp(B) (definitions; practice)",
    ),
    "effect-does-not-fit": (
        "η²p (or η², V, φ) does not fit F or χ² and its df",
        "Effect sizes (JARS-Quant); η²p = F·df₁/(F·df₁ + df₂), η² ≤ η²p; V ≥ √(χ²/(N·df)) (definitions; practice)",
    ),
    "ci-p-disagree": (
        "the p and the CI disagree about the null value (one says significant, the other not)",
        "Confidence intervals and p from the same test agree (Altman & Bland, 2011, BMJ, How to obtain the P value from a confidence interval)",
    ),
    "ratio-does-not-fit": (
        "a ratio (OR, HR, RR) that its interval does not fit: not at the interval's centre on the log scale, or with a p the "
        "interval does not give (z = ln ratio / SE, the SE from the interval's width), beyond what the printed digits and other "
        "interval methods (exact, profile likelihood) and tests (likelihood ratio, score, exact) allow",
        "Confidence intervals: a ratio's interval is exp(ln ratio ± z·SE), symmetric about it on the log scale (definition); its "
        "p from the interval as Altman & Bland (2011, BMJ, How to obtain the P value from a confidence interval) compute it",
    ),
    "ms-does-not-fit": (
        "an ANOVA table's mean square that is not its sum of squares over its df (the effect's row or its error row)",
        "Analysis of variance: MS = SS / df (definition), with the printed precision of each number",
    ),
    "f-does-not-fit": (
        "an ANOVA table's F that is not its row's mean square over its error row's",
        "Analysis of variance: F = MS effect / MS error (definition); a random factor's F over another row's MS is said in the note (practice)",
    ),
    "df-unstated": (
        "a t or r without df whose p fits none of the df the text's N or group sizes give, but fits other df",
        "Reporting by test: t and r with their df (APA 7 §6.43); consistency as in Nuijten et al. (2016)",
    ),
    "counts-do-not-fit": (
        "a table's χ² or p that no usual test of its counts gives: Pearson's χ², Yates's (2 × 2), the likelihood-ratio χ², each on "
        "(r − 1)(k − 1) df, or Fisher's exact test (2 × 2; of a larger table where the table names it)",
        "Chi-square test of independence: χ² = Σ (O − E)²/E on (r − 1)(k − 1) df, E = row total × column total / N (definition; "
        "Yates's correction and Fisher's exact test as R's chisq.test and fisher.test compute them); a test other than these is "
        "named in the note (practice)",
    ),
    "means-do-not-fit": (
        "a table's t (or F) that the groups' means, SDs and sizes beside it do not give, by Student's test or Welch's (two "
        "groups), one-way ANOVA or Welch's ANOVA (more), with the printed digits of each",
        "Independent-samples t test: t = (M₁ − M₂) / SE, SE from the pooled SD (Student) or √(s₁²/n₁ + s₂²/n₂) (Welch); "
        "F = t² for two groups; one-way ANOVA's F and Welch's (1951) ANOVA F from the groups' means, SDs and n's "
        "(definitions; practice for a table's layout)",
    ),
    "percent-does-not-fit": (
        "a table's percent that is not its count's share of its column, its group's n or its row, whichever the table's other "
        "percents are",
        "Descriptives: categorical variables as n (%) (APA 7 §7.21 sample tables; JARS-Quant) — the percent is n over its whole (definition)",
    ),
    "sizes-do-not-add": (
        "a table's groups' n in its heads that add up to more than the total its total column's head or its caption gives; a "
        "row's groups' counts that add up to more than its total column's count (or to another count, where the groups make up the N)",
        "Participant flow: every participant counted once, those left out said with the reason (CONSORT 2010 item 13; "
        "JARS-Quant, participant flow) — recalled from memory; the arithmetic is definition",
    ),
    "z-does-not-fit": (
        "a Mann–Whitney U's z smaller than the U before it and the group sizes allow (the normal approximation without ties, "
        "less a continuity correction)",
        "Mann–Whitney U: z = (U − n₁n₂/2)/σ, σ² = n₁n₂(n₁ + n₂ + 1)/12, smaller with ties (Mann & Whitney, 1947; definitions)",
    ),
    "typo-fits": (
        "an F's p and its η²p, neither following from it, both follow with one of its df or its value typed otherwise",
        "η²p = F·df₁/(F·df₁ + df₂) (definition) and the F distribution's p; a df or digit mistyped is a usual cause of a p that "
        "does not follow (Nuijten et al., 2016 — recalled from memory)",
    ),
    "marks-undefined": (
        "a table marks values with asterisks or other marks of significance that its caption and note do not define",
        "Tables: probability notes define the asterisks, *p < .05. **p < .01. ***p < .001. (APA 7 §7.14)",
    ),
    "d-does-not-fit": (
        "d (or g, d_z) does not follow from t and the group sizes",
        "Effect sizes (JARS-Quant); d = t·√(1/n₁ + 1/n₂), d_z = t/√n (Lakens, 2013, recalled from memory), g = J·d (Hedges, 1981)",
    ),
}

# how much a finding matters: an error is a number that cannot be right (an impossible value, a p that no
# reading of the statistic gives, a verdict that changes at alpha); a warning is one that fits only under an
# unstated reading (a one-sided test, unreported rounding) or an effect size that does not fit its test; a
# style finding is a matter of the house style
SEVERITIES = ("error", "warning", "style")
SEVERITY: dict[str, str] = {
    "p-does-not-follow": "error", "verdict-changes": "error", "impossible-r": "error", "impossible-p": "error",
    "impossible-value": "error", "malformed-number": "warning", "negative-statistic": "error", "negative-sd": "error", "ci-reversed": "error",
    "ci-excludes-estimate": "error", "df-not-integer": "error", "grim": "error", "ms-does-not-fit": "error", "f-does-not-fit": "warning",
    "one-sided": "warning", "ns-below-alpha": "warning", "df-unstated": "warning", "coefficient-does-not-fit": "warning", "effect-does-not-fit": "warning", "d-does-not-fit": "warning", "counts-do-not-fit": "warning", "percent-does-not-fit": "warning", "means-do-not-fit": "warning",
    "sizes-do-not-add": "warning", "typo-fits": "warning", "z-does-not-fit": "warning",
    "p-zero": "warning", "corrected-df": "warning", "uncorrected-df": "warning", "ci-p-disagree": "warning", "ratio-does-not-fit": "warning",
    "ci-level": "style", "leading-zero": "style", "missing-leading-zero": "style", "p-symbol": "style", "decimal-mark": "style", "decimals": "style", "p-threshold": "style",
    "spacing": "style", "hyphen-minus": "style", "italics": "style", "marks-undefined": "style",
}

# the codes of the release before, in the words of a well-known checker; read and written beside the new ones
# (JSON "former_codes") for one release
FORMER_CODES: dict[str, str] = {
    "p-does-not-follow": "p-inconsistent", "verdict-changes": "decision-error", "coefficient-does-not-fit": "coefficient-inconsistent",
    "effect-does-not-fit": "effect-inconsistent", "d-does-not-fit": "d-inconsistent",
}

_BOUNDED_EFFECTS = {"V": (0, 1), "cliff_d": (-1, 1), "kendall_w": (0, 1), "phi": (-1, 1), "eta2": (0, 1), "eta2_p": (0, 1), "eta2_g": (0, 1), "omega2_p": (-1, 1), "ICC": (-1, 1), "R2": (0, 1), "delta_R2": (0, 1), "R2_adj": (-1, 1), "omega2": (-1, 1),
                    "alpha": (-math.inf, 1), "alpha_level": (0, 1)}  # (Cronbach's α falls below 0 where items disagree; never above 1)
_WHOLE_DF = {"chi2", "r", "rs", "H", "Q"}  # t and F may have fractional df (Welch; sphericity corrections)
_RANK_SUMS = {"U", "W", "T", "V"}
RATIOS = frozenset({"OR", "aOR", "HR", "aHR", "RR", "aRR", "IRR", "PR", "aPR"})  # effects whose null value is 1, and which are above 0
_KIND = {"t": "t_independent", "chi2": "chi2_independence", "r": "pearson", "rs": "spearman", "tau_b": "kendall", "U": "mann_whitney", "H": "kruskal_wallis", "W": "wilcoxon", "T": "wilcoxon",
         "V": "wilcoxon", "Q": "cochran_q"}


@dataclass(frozen=True, slots=True)
class Finding:
    code: str
    message: str
    evidence: str = ""

    @property
    def severity(self) -> str:
        return SEVERITY.get(self.code, "warning")


# -- consistency ----------------------------------------------------------------


def _p_of(symbol: str, value: float, df: tuple[float, ...]) -> float:
    """Two-sided p for t, z and r; upper tail for F, χ² and H (as χ²), from
    statsetter's own distribution functions (pvalues.py): the audit computes
    two per statistic."""
    if symbol in ("r", "rs"):
        if value >= 1:
            return 0.0
        t = value * math.sqrt(df[0] / (1 - value * value))
        return min(1.0, 2 * upper_tail("t", t, df))
    if symbol in ("t", "z"):
        return min(1.0, 2 * upper_tail(symbol, value, df))
    return upper_tail(symbol, value, df)  # F; χ², and H by its χ² approximation


def p_range(rep: Reported) -> tuple[float, float] | None:
    """The two-sided (upper-tail for F, χ², H) p values the printed statistic allows."""
    if rep.p_range is not None:
        return rep.p_range if rep.p_range != () else None
    found = _p_range(rep)
    rep.p_range = found if found is not None else ()
    return found


_DF_NEEDED = {"t": 1, "z": 0, "F": 2, "chi2": 1, "r": 1, "rs": 1, "H": 1, "Q": 1}  # the df a statistic's p needs


def _p_range(rep: Reported) -> tuple[float, float] | None:
    """A statistic given as a bound ("F < 1", common for small F; "t(38) > 2.50", as several tests are summed up)
    allows every p beyond the bound's (a t or z only as a lower bound of a positive value: "t < 1" says nothing of
    |t|)."""
    if rep.symbol is None or rep.value is None:
        return None
    if rep.op in ("<", "≤", ">", "≥"):
        one_sided_bound = rep.symbol in ("t", "z") and rep.op in (">", "≥")
        if (rep.symbol not in ("F", "chi2", "H") and not one_sided_bound) or rep.value.value <= 0:
            return None
        bound = _p_range(replace(rep, op="=", value=replace(rep.value, decimals=15), p_range=None))
        if bound is None:
            return None
        return (bound[0], 1.0) if rep.op in ("<", "≤") else (0.0, bound[1])
    bounds = _printed_bounds(rep)
    if bounds is None:
        return None
    lo, _, hi, df = bounds
    try:
        return _p_of(rep.symbol, hi, df), _p_of(rep.symbol, lo, df)  # type: ignore[arg-type]
    except MissingExtra:  # never skip the p checks silently
        raise
    except Exception:  # a degenerate df or value: no recomputation
        return None


def _printed_bounds(rep: Reported) -> tuple[float, float, float, tuple[float, ...]] | None:
    """(low, printed, high, df) of a statistic given with "=" whose p can be recomputed: the values its printed
    precision stands for (|value| ± half a unit of its last digit; an r up to 1)."""
    if rep.symbol is None or rep.value is None or rep.op != "=":
        return None
    need = _DF_NEEDED.get(rep.symbol)
    if need is None or len(rep.df) != need or any(d.value <= 0 for d in rep.df):
        return None
    v, h = abs(rep.value.value), rep.value.half_unit
    lo, hi = max(v - h, 0.0), v + h
    if rep.symbol in ("r", "rs"):
        if lo >= 1:
            return None
        hi = min(hi, 1.0)
    if rep.symbol in ("F", "chi2", "H", "Q") and rep.value.value < 0:
        return None
    return lo, min(v, hi), hi, tuple(d.value for d in rep.df)


def _fits_as_printed(rep: Reported, reported: tuple[float, float]) -> bool:
    """Whether the p of the statistic's printed value lies in the reported p's range: then the range of p the
    printed statistic allows (``p_range``, which holds it: p falls as the statistic grows) meets the reported one,
    and its two ends need not be computed — one p instead of two for the most statistics, which are consistent."""
    if rep.p_range is not None:
        return False  # the range is known: the caller uses it
    bounds = _printed_bounds(rep)
    if bounds is None:
        return False
    try:
        p = _p_of(rep.symbol, bounds[1], bounds[3])  # type: ignore[arg-type]
    except MissingExtra:
        raise
    except Exception:
        return False
    return reported[0] - 1e-12 <= p <= reported[1] + 1e-12


def reported_p_range(rep: Reported, alpha: float) -> tuple[float, float] | None:
    p = rep.p if rep.p is not None else rep.shared_p
    if p is None:
        return None
    if p.op == "ns":
        return alpha, 1.0
    assert p.number is not None
    v, h = p.number.value, p.number.half_unit
    if p.op == "=":
        return max(v - h, 0.0), v + h
    if p.op in ("<", "≤"):
        return 0.0, v if v > 0 else h  # ("p < .00", a software's zero: below half its last digit)
    return v, 1.0


def _overlap(a: tuple[float, float], b: tuple[float, float]) -> bool:
    eps = 1e-12
    return a[0] <= b[1] + eps and b[0] <= a[1] + eps


def _up_to_value(rep: Reported) -> str:
    """The statistic's text up to its value's end, "t(38) = 2.10": by the value's place in the text where the text is the
    text's own, by the value's printed form where it was made from a table's cells (their places are the cells')."""
    if rep.value is None:
        return rep.symbol_text
    end = rep.value.end - rep.start
    if rep.text[end - len(rep.value.text) : end] != rep.value.text:
        found = rep.text.find(rep.value.text)
        end = found + len(rep.value.text) if found >= 0 else len(rep.text)
    return rep.text[:end]


def consistency(rep: Reported, alpha: float) -> list[Finding]:
    if rep.p is not None and rep.p.adjusted:
        return []  # an adjusted p cannot be recomputed from one statistic
    reported = reported_p_range(rep, alpha)
    if reported is None or _fits_as_printed(rep, reported):
        return []
    computed = p_range(rep)
    anywhere = computed is None and not rep.df
    if anywhere:
        computed = any_df_range(rep)
    if computed is None:
        return []
    if _overlap(computed, reported):
        return []
    given = rep.p if rep.p is not None else rep.shared_p
    assert given is not None
    shown = given.op if given.op == "ns" else f"{'p' if given is rep.p else given.symbol_text} {given.op} {given.number.text}"  # type: ignore[union-attr]
    over = " over every df it may have (none given)" if anywhere else ""
    evidence = f"{_up_to_value(rep)} gives p from {computed[0]:.4g} to {computed[1]:.4g}{over}; reported {shown}"
    if rep.symbol in ("t", "z", "r", "rs") and _overlap((computed[0] / 2, computed[1] / 2), reported):
        return [Finding("one-sided", "The reported p matches a one-sided test only; say that the test was one-sided, or report the two-sided p.", evidence)]
    # (a bound, "ns" or a statistic without df would fit the other tail whatever its value: only an exact p of a statistic with df)
    exact = rep.op == "=" and given.op == "=" and reported[0] > 0.5 and not anywhere
    if exact and rep.symbol in ("t", "z", "r", "rs") and _overlap((1 - computed[1] / 2, 1 - computed[0] / 2), reported):  # the other tail's
        return [Finding("one-sided", "The reported p matches only a one-sided test whose direction is opposite to the result (its p is 1 − p/2); "
                                     "say that the test was one-sided and in which direction, or report the two-sided p.", evidence)]
    printed = given.number if given.op == "=" and not anywhere else None  # (an exact p cut after its last digit, not rounded:
    cut = printed is not None and _overlap(computed, (printed.value, printed.value + 2 * printed.half_unit * (1 - 1e-9)))  # below its next digit)
    found = [Finding("p-does-not-follow", "The reported p follows from the statistic under no df at all." if anywhere else
                     "The reported p does not follow from the statistic and its df" + (
                         f"; it is what cutting the exact p after its last digit gives, not rounding it (rounded: {_rounded_like(computed, printed)})."
                         if cut and printed is not None else "."), evidence)]
    said_significant = reported[1] <= alpha
    if (said_significant and computed[0] >= alpha) or (not said_significant and computed[1] < alpha):
        found.append(Finding("verdict-changes", f"At alpha = {alpha:g} the recomputed p leads to the other decision.", evidence))
    if given.op == "=" and not anywhere:
        found += one_number_off(rep, reported)
    return found


def _rounded_like(computed: tuple[float, float], printed: Number) -> str:
    """The exact p's range rounded to the printed p's decimals, with or without its leading zero as the printed p
    ("0.549"; "0.549 or 0.550" where the range straddles a rounding edge)."""
    shown = dict.fromkeys(str(round_half_up(x, printed.decimals)) for x in computed)
    bare = printed.text.lstrip("−-").startswith(".")
    return " or ".join(x[1:] if bare and x.startswith("0.") else x for x in shown)


def _f_for_p(p: float, df: tuple[float, float]) -> float:
    """The F whose upper-tail p on ``df`` is ``p`` (bisection: the tail falls as F grows)."""
    low, high = 0.0, 1.0
    while upper_tail("F", high, df) > p and high < 1e9:
        low, high = high, high * 4
    for _ in range(60):
        mid = (low + high) / 2
        low, high = (mid, high) if upper_tail("F", mid, df) > p else (low, mid)
    return (low + high) / 2


def one_number_off(rep: Reported, reported: tuple[float, float]) -> list[Finding]:
    """An F whose exact p does not follow, beside an η²p that does not fit it either: the one number that, typed
    otherwise, gives both — a df (whole, from the η²p: η²p/(1 − η²p) = F·df₁/df₂) or the F itself (where the F the p
    gives and the F the η²p gives meet). Two numbers agreeing on the same other reading point to a typo there, and then
    the p is not the number to change."""
    eta = next((e for e in rep.effects if e.name == "eta2_p"), None)
    if rep.symbol != "F" or eta is None or rep.value is None or len(rep.df) != 2 or \
            not all(float(d.value).is_integer() and d.value > 0 for d in rep.df):
        return []
    e_low, e_high = eta.number.value - eta.number.half_unit, eta.number.value + eta.number.half_unit
    f_low, f_high = rep.value.value - rep.value.half_unit, rep.value.value + rep.value.half_unit
    if not (0 < e_low and e_high < 1 and f_low > 0):
        return []
    q_low, q_high = e_low / (1 - e_low), e_high / (1 - e_high)  # F·df₁/df₂
    df1, df2 = int(rep.df[0].value), int(rep.df[1].value)
    if _overlap((f_low * df1 / df2, f_high * df1 / df2), (q_low, q_high)):
        return []  # the η²p fits as printed: the p alone is off

    def p_fits(df: tuple[float, float], low: float, high: float) -> bool:
        return _overlap((upper_tail("F", high, df), upper_tail("F", low, df)), reported)

    def run(dfs: list[int], typed: Callable[[int], str]) -> list[str]:  # the df that fit, each run of them as one reading
        runs: list[list[int]] = []
        for df in dfs:
            if runs and df == runs[-1][-1] + 1:
                runs[-1].append(df)
            else:
                runs.append([df])
        return [typed(r[0]) if len(r) == 1 else f"{typed(r[0])} to {typed(r[-1])}" for r in runs]

    typed = rep.value.text  # (the F as printed, for the readings)
    readings: list[str] = []
    ones = range(max(1, math.ceil(q_low * df2 / f_high)), math.floor(q_high * df2 / f_low) + 1)
    twos = range(max(1, math.ceil(f_low * df1 / q_high)), math.floor(f_high * df1 / q_low) + 1)
    if len(ones) <= 40:
        readings += run([one for one in ones if p_fits((one, df2), f_low, f_high)], lambda one: f"F({one}, {rep.df[1].text}) = {typed}")
    if len(twos) <= 40:  # (a df₂ of some hundreds: a three-decimal η²p pins it to a dozen or so, the p to fewer)
        readings += run([two for two in twos if p_fits((df1, two), f_low, f_high)], lambda two: f"F({rep.df[0].text}, {two}) = {typed}")
    by_eta = (q_low * df2 / df1, q_high * df2 / df1)
    by_p = (_f_for_p(min(reported[1], 1.0), (df1, df2)), _f_for_p(max(reported[0], 1e-300), (df1, df2)))
    value = (max(by_eta[0], by_p[0]), min(by_eta[1], by_p[1]))
    if value[0] <= value[1] and not reported[0] <= 0:
        shown = f"{value[0]:.2f}" if f"{value[0]:.2f}" == f"{value[1]:.2f}" else f"{value[0]:.2f} to {value[1]:.2f}"
        readings.append(f"F({rep.df[0].text}, {rep.df[1].text}) = {shown}")
    if not readings or len(readings) > 2:
        return []
    return [Finding("typo-fits", f"The p and {eta.symbol_text} = {eta.number.text} both follow from "
                                 f"{' or '.join(readings)}: one number may be mistyped; check it before changing the p.",
                    f"{eta.symbol_text} = {eta.number.text}, {rep.p.symbol_text if rep.p else 'p'} = "
                    f"{rep.p.number.text if rep.p and rep.p.number else ''}")]


_MANY_DF = 10**7  # beyond this a t's p is the normal's to the digits any manuscript prints


def _p_range_at(rep: Reported, df: int) -> tuple[float, float] | None:
    """The p range of a statistic without df (a t, r or χ²) were its df ``df``."""
    return p_range(replace(rep, df=(Number(str(df), float(df), 0, rep.start, rep.start),), p_range=None))


def any_df_range(rep: Reported) -> tuple[float, float] | None:
    """The p a t, r or χ² given without df allows over every df it may have (from 1 up): a t's or r's two-sided p
    falls as its df grow (from the df = 1 p down to the normal's for a t, to 0 for an r), a χ²'s upper tail rises
    with them (from its df = 1 p up to 1). A p outside follows under no df at all ("t = 0.73, p < .001"; "t = 5.90,
    p = .45"), whatever the sample."""
    if rep.df or rep.symbol not in ("t", "r", "rs", "chi2") or rep.op != "=":
        return None

    fewest = _p_range_at(rep, 1)
    if fewest is None:
        return None
    if rep.symbol == "chi2":
        return fewest[0], 1.0
    most = _p_range_at(rep, _MANY_DF)
    return None if most is None else (most[0], fewest[1])


def df_that_fit(rep: Reported, alpha: float) -> "tuple[int, int | None] | None":
    """The whole df (from 1) under which a t's or r's reported p follows from its printed value, as (the fewest, the
    most; None for no upper end), or None when no df gives it. A t's or r's two-sided p falls as its df grow (a t
    distribution's tail thins with its df), at both ends of the value's printed range, so the df that fit are one run,
    found by a galloping search from 1 (a subgroup's df are few: a dozen p's each, not fifty)."""
    reported = reported_p_range(rep, alpha)
    if rep.symbol not in ("t", "r", "rs") or reported is None:
        return None

    fewest, most = _p_range_at(rep, 1), _p_range_at(rep, _MANY_DF)
    if fewest is None or most is None or most[0] > reported[1] + 1e-12 or fewest[1] < reported[0] - 1e-12:
        return None

    def first(test: "Callable[[int], bool]", start: int) -> int:  # the smallest df from ``start`` on passing a test that, once
        # passed, stays so (it passes at _MANY_DF): steps doubling from ``start``, then halving back
        low, step = start, 1
        while not test(high := min(start + step - 1, _MANY_DF)):
            low, step = high + 1, step * 2
        while low < high:
            middle = (low + high) // 2
            low, high = (low, middle) if test(middle) else (middle + 1, high)
        return low

    bounds = _printed_bounds(replace(rep, df=(Number("1", 1.0, 0, rep.start, rep.start),), p_range=None))

    def end(df: int, which: int) -> float | None:  # one end of the p range at ``df`` (0: the lower, from the larger value)
        if bounds is None:  # (a bound, "t > 2.50": both ends, as p_range has them)
            found = _p_range_at(rep, df)
            return None if found is None else found[which]
        try:
            return _p_of(rep.symbol, bounds[2 if which == 0 else 0], (float(df),))  # type: ignore[arg-type]
        except MissingExtra:
            raise
        except Exception:  # (as p_range: no p)
            return None

    def too_high(df: int) -> bool:  # its p's lower end is above the reported range (false from the first df that fits on)
        found = end(df, 0)
        return found is not None and found > reported[1] + 1e-12

    def below(df: int) -> bool:  # its p's upper end is below the reported range (true past the last df that fits)
        found = end(df, 1)
        return found is None or found < reported[0] - 1e-12

    low = first(lambda df: not too_high(df), 1)
    high = None if not below(_MANY_DF) else first(below, low) - 1
    return None if high is not None and high < low else (low, high)


def ci_p_agreement(rep: Reported, alpha: float) -> list[Finding]:
    """A p and a CI of the same result that disagree about the null value (Altman & Bland, 2011: a CI and a p from one
    test agree): a p clearly below 1 − the CI's level (at most half of it) while the CI holds the null inside, or
    clearly above (at least twice it) while the CI lies wholly on one side. Each limit stands for what its printed
    digits allow and a p for its printed range, and the margin leaves alone what different methods give near the null
    (a Fisher or likelihood-ratio p beside a Wald interval, a profile interval beside a Wald p) — a warning, not an
    error. The CIs checked: a ratio's (OR, HR, RR and their adjusted forms; null 1), a t's or z's own (a mean
    difference or coefficient; null 0), a correlation's own (null 0) and a β's given with its p and no test (null 0); not d's or g's, whose
    intervals are often approximations that part from the
    t test's p near the null."""
    p = rep.p
    if p is None or p.adjusted or (p.number is None and p.op != "ns"):
        return []
    found = [(e.ci, 1.0 if e.name in RATIOS else 0.0, e.symbol_text) for e in rep.effects if e.ci is not None and (e.name in RATIOS or e.name == "MD")]
    if rep.symbol is None:  # a coefficient given with its interval and p, no test ("β = 0.21, 95% CI [0.10, 0.32], p < .001")
        found += [(e.ci, 0.0, e.symbol_text) for e in rep.effects if e.ci is not None and e.name == "beta"]
    if rep.ci is not None and (rep.symbol in ("t", "z") or (rep.symbol is None and rep.estimate is not None)):  # (a table's coefficient)
        found.append((rep.ci, 0.0, "the estimate"))
    elif rep.ci is not None and rep.symbol in ("r", "rs"):  # a correlation's own interval (Fisher's z, or a bootstrap's): null 0
        found.append((rep.ci, 0.0, rep.symbol_text))
    out = []
    for ci, null, name in found:
        if ci.level is None:  # typed without its level ("OR = 2.30 (1.40–3.80)"): no threshold to compare its p with
            continue
        threshold = 1.0 - ci.level
        if not 0 < threshold < 1 or ci.low.value > ci.high.value:
            continue
        if p.op == "ns":
            significant, not_significant = False, False  # "ns" says no more than p >= alpha: no margin
        else:
            v, h = p.number.value, p.number.half_unit  # type: ignore[union-attr]
            significant = (p.op in ("<", "≤") and v <= threshold / 2) or (p.op == "=" and v + h <= threshold / 2)
            not_significant = (p.op in (">", "≥") and v >= 2 * threshold) or (p.op == "=" and v - h >= 2 * threshold)
        inside = ci.low.value + ci.low.half_unit < null < ci.high.value - ci.high.half_unit
        outside = null < ci.low.value - ci.low.half_unit or null > ci.high.value + ci.high.half_unit
        if (significant and inside) or (not_significant and outside):
            said = "includes" if inside else "excludes"
            shown = "ns" if p.op == "ns" else f"p {p.op} {p.number.text}"  # type: ignore[union-attr]
            out.append(Finding("ci-p-disagree", f"The p and the {ci.level * 100:g}% CI of {name} disagree: the CI {said} {null:g}, the p is clearly "
                               f"{'below' if significant else 'above'} {threshold:g}; check both, or say which method gave each.",
                               f"{shown}; {ci.level * 100:g}% CI [{ci.low.text}, {ci.high.text}]"))
            break
    return out


_NORMAL = NormalDist()


def ratio_fits(rep: Reported, alpha: float, with_p: bool = True) -> list[Finding]:
    """A ratio (OR, HR, RR and their adjusted forms) against its interval, on the log scale where a Wald interval is
    exp(ln ratio ± z·SE): the ratio at the interval's centre, and its p the one the interval gives (Altman & Bland, 2011:
    z = ln ratio / SE, SE = the interval's log width / 2z). Each number stands for what its printed digits allow. Other
    interval methods part from the centre and other tests from that p: exact (conditional) and profile-likelihood intervals,
    likelihood-ratio, score, exact and continuity-corrected tests on 2 × 2 tables of 20 to 1,000 (simulated: the ratio at
    most 0.13 half-widths off centre per unit of log half-width, the p's z between 0.57 and 1.46 times the interval's where
    the half-width is below 1); the margins are twice those: a finding is a ratio its interval cannot be made around, or a p
    of another row or model (a warning). Wide intervals (SE of ln ratio above 0.5), limits printed as 0 and intervals
    without a level are not judged; a p only where the ratio is the statistic's one (no other test's p) and ``with_p`` (not
    where the p and interval already disagree about the null, ci_p_agreement, or the p is said to be one-sided)."""
    out: list[Finding] = []
    ratios = [e for e in rep.effects if e.name in RATIOS and e.ci is not None and e.ci.level is not None and 0 < e.ci.level < 1]
    for e in ratios:
        ci, est = e.ci, e.number
        assert ci is not None and ci.level is not None
        low, high = ci.low, ci.high
        if min(low.value - low.half_unit, est.value - est.half_unit) <= 0 or not low.value <= est.value <= high.value:
            continue  # (a limit printed as 0.00, or the ratio outside: another finding's)
        l1, l2 = math.log(low.value - low.half_unit), math.log(low.value + low.half_unit)
        h1, h2 = math.log(high.value - high.half_unit), math.log(high.value + high.half_unit)
        e1, e2 = math.log(est.value - est.half_unit), math.log(est.value + est.half_unit)
        quantile = _NORMAL.inv_cdf(1 - (1 - ci.level) / 2)
        widest, narrowest = (h2 - l1) / 2, (h1 - l2) / 2
        if narrowest <= 0 or widest / quantile > 0.5:
            continue
        c1, c2 = (l1 + h1) / 2, (l2 + h2) / 2
        off = max(c1 - e2, e1 - c2, 0.0)  # the ratio's least distance from the interval's centre
        level = f"{ci.level * 100:g}%"
        if off > (0.05 + 0.5 * widest / quantile) * widest:
            out.append(Finding("ratio-does-not-fit", f"{e.symbol_text} {est.text} is not at the centre of its {level} CI on the log scale, "
                               f"where a Wald interval, exp(ln {e.symbol_text} ± z·SE), puts it, nor as near it as an exact or profile "
                               f"interval would: check that the interval is this ratio's.",
                               f"{e.symbol_text} = {est.text}, {level} CI [{low.text}, {high.text}]: the interval's centre on the log "
                               f"scale {math.exp((c1 + c2) / 2):.{max(est.decimals, 2) + 1}f}"))
            continue
        p = rep.p
        if not with_p or len(ratios) > 1 or p is None or p.adjusted or p.op == "ns" or rep.symbol not in (None, "z", "chi2") or \
                (rep.symbol == "chi2" and any(d.value != 1 for d in rep.df)):
            continue
        reported = reported_p_range(rep, alpha)
        if reported is None:
            continue
        e_low = 0.0 if e1 <= 0 <= e2 else min(abs(e1), abs(e2))
        z_low, z_high = e_low / (widest / quantile), max(abs(e1), abs(e2)) / (narrowest / quantile)
        said_low = _NORMAL.inv_cdf(1 - reported[1] / 2) if reported[1] < 1 else 0.0
        said_high = _NORMAL.inv_cdf(1 - reported[0] / 2) if reported[0] > 0 else math.inf
        if said_low > 1.75 * z_high or (z_low >= 3 and said_high < 0.5 * z_low):
            shown = f"p {p.op} {p.number.text}"  # type: ignore[union-attr]
            given = (2 * _NORMAL.cdf(-z_high), 2 * _NORMAL.cdf(-z_low))
            out.append(Finding("ratio-does-not-fit", f"The p does not follow from {e.symbol_text}'s {level} CI (Altman & Bland, 2011: "
                               f"z = ln {e.symbol_text} / SE, the SE from the interval's width), nor from any usual test near it: "
                               f"check that the p is this ratio's.",
                               f"{e.symbol_text} = {est.text}, {level} CI [{low.text}, {high.text}] gives p from {given[0]:.2g} to "
                               f"{given[1]:.2g}; reported {shown}"))
    return out


_LOST_POINT = re.compile(r"0\d")  # a number's digits starting with 0 and another digit: no decimal mark after the 0


def impossible(rep: Reported) -> list[Finding]:
    out = []
    if rep.p is not None and rep.p.number is not None and not 0 <= rep.p.number.value <= 1:
        out.append(Finding("impossible-p", "A p value must lie between 0 and 1.", rep.p.number.text))
    if rep.value is not None:
        if rep.symbol in ("r", "rs", "tau_b") and abs(rep.value.value) > 1:
            out.append(Finding("impossible-r", "A correlation must lie between −1 and 1.", rep.value.text))
        if rep.symbol in ("F", "chi2", "H", "Q") and rep.value.value < 0:
            out.append(Finding("negative-statistic", f"{rep.symbol_text} cannot be negative.", rep.value.text))
    if rep.symbol in _WHOLE_DF:
        for d in rep.df:
            if not float(d.value).is_integer():
                out.append(Finding("df-not-integer", f"The df of {rep.symbol_text} are whole numbers.", d.text))
    for e in rep.effects:
        bounds = _BOUNDED_EFFECTS.get(e.name)
        if bounds and not bounds[0] <= e.number.value <= bounds[1]:
            said = f"cannot exceed {bounds[1]}" if bounds[0] == -math.inf else f"must lie between {bounds[0]} and {bounds[1]}"
            out.append(Finding("impossible-value", f"{e.symbol_text} {said}.", e.number.text))
        if e.name in RATIOS and (e.number.value <= 0 or (e.ci is not None and e.ci.low.value < 0)):
            out.append(Finding("impossible-value", f"A ratio ({e.symbol_text}) and its CI lie above 0.", e.number.text))
    typed = [n for n in (rep.value, rep.estimate, rep.p.number if rep.p is not None else None) if n is not None]
    typed += [n for e in rep.effects for n in ((e.number, e.ci.low, e.ci.high) if e.ci is not None else (e.number,))]
    typed += [rep.ci.low, rep.ci.high] if rep.ci is not None else []
    lost = next((n for n in typed if _LOST_POINT.match(n.digits)), None)
    if lost is not None:  # "(0.29, 072)", "OR = 0684": read as typed, 72 and 684
        out.append(Finding("malformed-number", f"{lost.text} is typed with a leading zero and no decimal mark: a decimal point lost? It is read as {lost.value:g}.", lost.text))
    for e in rep.descriptives:
        if e.name == "SD" and e.number.value < 0:
            out.append(Finding("negative-sd", "A standard deviation cannot be negative.", e.number.text))
    intervals = [(e.ci, e.number, e.symbol_text) for e in rep.effects if e.ci is not None]
    if rep.ci is not None and rep.symbol in ("r", "rs", "tau_b") and rep.value is not None:
        intervals.append((rep.ci, rep.value, rep.symbol_text))
    elif rep.ci is not None and rep.estimate is not None:  # a table row's estimate (a mean difference, a coefficient) and its CI
        intervals.append((rep.ci, rep.estimate, "the estimate"))
    elif rep.ci is not None:
        mean = _mean_of(rep, rep.ci) if rep.symbol is None and not rep.effects else None
        intervals.append((rep.ci, mean.number if mean is not None else None, mean.symbol_text if mean is not None else ""))  # type: ignore[arg-type]
    for ci, estimate, name in intervals:
        if ci.low.value > ci.high.value:
            out.append(Finding("ci-reversed", "The lower limit of the CI is above the upper.", f"[{ci.low.text}, {ci.high.text}]"))
        elif estimate is not None:
            slack = max(estimate.half_unit, ci.low.half_unit, ci.high.half_unit)
            if not ci.low.value - slack <= estimate.value <= ci.high.value + slack:
                shown = f"the estimate, {estimate.text}" if name == "the estimate" else f"{name} = {estimate.text}"
                out.append(Finding("ci-excludes-estimate", f"The CI does not contain {shown}.", f"[{ci.low.text}, {ci.high.text}]"))
    return out


_BETWEEN = re.compile(r"[\s,;:()]*")


def _mean_of(rep: Reported, ci: TypedInterval) -> Effect | None:
    """The mean (or median) an interval follows in a cluster of descriptives ("M = 3.20, 95% CI [2.90, 3.50]", "M =
    3.20, SD = 0.40, 95% CI …"): only punctuation and the mean's SD between them; None otherwise (a difference's
    interval, say, named in words between)."""
    end = ci.start
    for d in sorted((d for d in rep.descriptives if d.end <= ci.start), key=lambda d: d.start, reverse=True):
        if _BETWEEN.fullmatch(rep.text, d.end - rep.start, end - rep.start) is None:
            return None
        if d.name in ("M", "Mdn"):
            return d
        end = d.start
    return None


# -- style ----------------------------------------------------------------------


_BETA_BEFORE = re.compile(r"(?:β|\bbeta)\s*=\s*[-−–]?\s?\d*[.,]\d+\s*[,;]\s*$")  # "β = .21, " just before a t's symbol
_B_BEFORE = re.compile(r"(?<![\w])[Bb]\s*[=¼]")  # an unstandardized coefficient beside it: whose interval it is is not said


def _numbers_with_quantity(rep: Reported, text: str = "") -> list[tuple[Number, str]]:
    out: list[tuple[Number, str]] = []
    if rep.value is not None and rep.symbol is not None:
        out.append((rep.value, rep.symbol))
    if rep.p is not None and rep.p.number is not None:
        out.append((rep.p.number, "p"))
    for e in rep.effects + rep.descriptives:
        out.append((e.number, e.name))
        if e.ci is not None:
            out += [(e.ci.low, e.name), (e.ci.high, e.name)]
    if rep.ci is not None:  # (beside an F, χ² or H, whose own CI nobody gives, an effect size's whose name the text left out:
        # η²p's 90% CI, say — whether it may exceed 1 is unknown)
        q = rep.symbol if rep.symbol in ("r", "rs", "tau_b") else _UNNAMED if rep.symbol in ("F", "chi2", "H", "Q") or (
            rep.symbol is None and rep.estimate is not None and rep.p is None and not rep.effects) else "default"  # (an estimate
        # read with its interval, named in words or not at all — "The ICC was .78, 95% CI [.70, .84]": whether it may exceed 1
        # is the words' to say)
        if rep.symbol in ("t", "z") and text and _BETA_BEFORE.search(text, max(0, rep.symbol_start - 30), rep.symbol_start) and \
                _B_BEFORE.search(text, max(0, rep.symbol_start - 60), rep.symbol_start) is None:
            q = "beta"  # "β = .21, t(196) = 3.10, p = .002, 95% CI [.08, .34]": the β's interval (no B beside it)
        out += [(rep.ci.low, q), (rep.ci.high, q)]  # type: ignore[list-item]
    return out


_UNNAMED = "unnamed"  # a quantity the text does not name: its leading zero is not judged


def style_findings(rep: Reported, style: Style, alpha: float, text: str, italic: Sequence[tuple[int, int]] | None,
                   read_mark: str | None = None, equations: Sequence[tuple[int, int]] = ()) -> list[Finding]:
    """Style findings; ``read_mark`` is the decimal mark the text was read with
    (a number typed with another mark than the style's is a finding). Inside a Word equation (``equations``: their spans)
    the equation spaces operators and df itself: no spacing finding there."""
    num = numbers_for(style)
    mark = style.decimal_mark
    out: list[Finding] = []
    if read_mark is not None and read_mark != mark:
        other = [n.text for n, _ in _numbers_with_quantity(rep) if n.decimals and read_mark in n.digits]
        if other:
            out.append(Finding("decimal-mark", f"Write decimals with the style's decimal mark {mark!r}.", ", ".join(other)))
        mark = read_mark  # the leading-zero checks below look at the number as typed
    slips = mark == "." and read_mark != "," and "," in rep.text  # a decimal comma typed among points ("t(38) = 2,14")
    zero, no_zero, minus, slipped = [], [], [], []
    for n, q in _numbers_with_quantity(rep, text):
        digits = n.digits
        if slips and n.decimals and "," in digits and "." not in digits:
            slipped.append(n.text)
        if q == _UNNAMED:
            pass
        elif digits.startswith("0" + mark) and num.is_bounded(q):
            zero.append(n.text)
        elif digits.startswith(mark) and not num.is_bounded(q):
            no_zero.append(n.text)
        if n.sign and n.sign != style.minus:
            minus.append(n.text)
    if slipped:
        out.append(Finding("decimal-mark", f"Write decimals with the style's decimal mark {mark!r}.", ", ".join(slipped)))
    if zero:
        out.append(Finding("leading-zero", "No leading zero before a quantity that cannot exceed 1.", ", ".join(zero)))
    if no_zero:
        out.append(Finding("missing-leading-zero", "A leading zero before a quantity that can exceed 1.", ", ".join(no_zero)))
    if minus:
        out.append(Finding("hyphen-minus", f"Write negative numbers with the minus sign {style.minus!r}.", ", ".join(minus)))
    out += _decimals(rep, num, alpha, int(style.p.get("accept_decimals", 99)))
    p = rep.p
    if p is not None:
        floor = style.p.get("floor", 0) or 0
        ceiling = style.p.get("ceiling", 0) or 0
        if p.op in ("=", "<", "≤") and p.number is not None and p.number.value == 0:  # "p = .000", "p < .00" (a software's zero)
            out.append(Finding("p-zero", f"A p value is never zero; write p < {num.p(0.0, alpha)[1]}.", text[p.start : p.end]))
        elif p.op == "ns" or (p.op in ("<", "≤") and not (floor and math.isclose(p.number.value, floor))) or (  # type: ignore[union-attr]
            p.op in (">", "≥") and not (ceiling and math.isclose(p.number.value, ceiling))  # type: ignore[union-attr]
        ):
            out.append(Finding("p-threshold", "Report the exact p (thresholds only below the style's smallest p).", text[p.start : p.end]))
        letter = _p_letter(style)
        if (p.symbol_text in ("p", "P") or p.symbol_text[:1] in "SsAE") and p.symbol_text != letter and letter in ("p", "P"):  # (also SPSS's "Sig.")
            out.append(Finding("p-symbol", f"Write the p value's symbol as {letter}, as the style does.", text[p.start : p.end]))
    tight = [(s, e) for s, e in rep.operators if not (text[s:s + 1].isspace() and text[e - 1 : e].isspace())]
    if tight and equations:
        tight = [(s, e) for s, e in tight if not any(a <= s < b for a, b in equations)]
    apart = _df_spacing(rep, text) if style.data["numbers"].get("df_form", "parentheses") == "parentheses" else ""
    if apart and any(a <= rep.symbol_start < b for a, b in equations):
        apart = ""
    if tight or apart:
        said = ["Put a space on each side of =, < and >."] if tight else []
        said += ["Write the df as the style does: the parenthesis right after the symbol, a space after the comma."] if apart else []
        out.append(Finding("spacing", " ".join(said), ", ".join([text[s:e].strip() for s, e in tight] + ([apart] if apart else []))))
    if italic is not None:
        out += _italics(rep, text, italic, _roman(style))
    return out


_LEVEL_NAMED = re.compile(r"\d{2}(?:[.,]\d+)?\s*%\s*(?:CI|C\.I\.|[Cc]onfidence|[Cc]redible)")


def unlevelled(rep: Reported, text: str) -> list[Finding]:
    """An interval typed without its level ("d = 0.68 [0.04, 1.31]") where the paragraph, ``text``, names no level
    before it: the reader cannot tell a 95% interval from a 90% one (in a table the head or note names it; the report
    asks no more where an earlier paragraph names one, "95% CIs are given in brackets")."""
    bare = [rep.ci] if rep.ci is not None and rep.ci.level is None else []
    for e in rep.effects:  # (a loop, not a list built per statistic: it is asked of every statistic of a paragraph)
        if e.ci is not None and e.ci.level is None:
            bare.append(e.ci)
    if not bare or _LEVEL_NAMED.search(text, 0, bare[0].start) is not None:
        return []
    return [Finding("ci-level", "State the interval's level, as in 95% CI [a, b]: the text names none before it.",
                    ", ".join(text[ci.start : ci.end] for ci in bare))]


def _df_spacing(rep: Reported, text: str) -> str:
    """The head's symbol and df as typed when they are spaced otherwise than "F(1, 56)": a space before the
    parenthesis ("F (1, 56)") or none after a comma between df ("F(1,56)") (APA 7's examples; practice); "" if not.
    A head of words ("F change (1, 147)") may have its space."""
    if not rep.df or rep.symbol_start < 0:
        return ""
    gap = text[rep.symbol_start + len(rep.symbol_text) : rep.df[0].start]
    if gap.strip() not in ("(", "["):  # df typed otherwise (subscripts, "F2, 97"): not this check's to judge
        return ""
    if " " in rep.symbol_text or "-" in rep.symbol_text:
        gap = gap.lstrip()
    last = rep.n if rep.n is not None and rep.n.start > rep.df[-1].end else rep.df[-1]
    commas = [text[a.end : b.start] for a, b in zip(rep.df, rep.df[1:])]
    if last is rep.n:  # "χ2(1,N = 80)"
        commas.append(text[rep.df[-1].end : rep.df[-1].end + 2])
    if gap[:1].isspace() or any(c[:1] in (",", ";") and not c[1:2].isspace() for c in commas):
        return text[rep.symbol_start : last.end + 1]
    return ""


@functools.lru_cache(maxsize=16)
def _roman(style: Style) -> frozenset[str]:
    """The checked Latin symbols the style writes upright (AMA 11's SD), which the italics check leaves alone."""
    return frozenset(name for name in _ITALIC_NAMES if "<i>" not in style.symbol(name))


@functools.lru_cache(maxsize=16)  # (a Style is hashed by identity; an audit asks for every p)
def _p_letter(style: Style) -> str:
    """The letter the style writes for p ("p" or "P"), without its markup."""
    from ..styled import StyledText

    return StyledText.from_markup(style.symbol("p")).plain()


def _decimals(rep: Reported, num: Numbers, alpha: float, accept: int = 99) -> list[Finding]:
    """Numbers printed with other decimals than the style's; a p may have as
    few as ``accept`` decimals (the style's [p] accept_decimals)."""
    wrong = []
    if rep.value is not None and rep.symbol is not None and rep.symbol not in _RANK_SUMS and rep.op == "=":  # ("F < 1": a bound, not a rounding)
        want = num.decimals_for(rep.symbol)
        if rep.value.decimals != want:
            wrong.append(f"{rep.value.text} ({want} wanted)")
    for e in rep.effects:
        if e.name in ("MD", "alpha_level", "I2"):  # a difference in the measure's own units: its decimals are the measure's; a
            continue  # significance level is as the design chose it (α = .001 is no rounding); an I² a percent
        want = num.decimals_for(e.name)
        if e.number.decimals != want:
            wrong.append(f"{e.number.text} ({want} wanted)")
    p = rep.p
    if p is not None and p.op == "=" and p.number is not None and 0 < p.number.value <= 1:
        # in style when some p the printed one stands for prints the same way
        v, h = p.number.value, p.number.half_unit * 0.999
        shown = p.number.digits.replace(",", num.style.decimal_mark).replace(".", num.style.decimal_mark).removeprefix("0")
        # (a leading zero and a decimal mark other than the style's are findings of their own)
        fewer = p.number.decimals if accept <= p.number.decimals < num.decimals_for("p") else None  # APA 7 §6.36: two or three decimals
        if not _p_prints_as(num, v, h, alpha, fewer, shown):
            wrong.append(f"p = {p.number.text} ({num.p(v, alpha)[1]} in the style)")
    return [Finding("decimals", "Decimals differ from the style's.", "; ".join(wrong))] if wrong else []


@functools.lru_cache(maxsize=4096)  # a manuscript prints the same few hundred p values again and again
def _p_prints_as(num: Numbers, v: float, h: float, alpha: float, held: int | None, shown: str) -> bool:
    """Whether some p the printed one stands for (v ± h) prints as ``shown`` in the style."""
    return any(num.p(c, alpha, held=held)[1].removeprefix("0") == shown
               for c in (v, math.nextafter(v, 0.0), math.nextafter(v, 1.0), v - h, v + h) if 0 < c <= 1)


class _Italic:
    """The italic spans of one paragraph as sorted, merged starts and ends: whether a position is italic by bisection
    (a paragraph's statistics ask a few times each; the spans may come in any order, overlapping)."""

    def __init__(self, spans: Sequence[tuple[int, int]]) -> None:
        self.starts: list[int] = []
        self.ends: list[int] = []
        for s, e in sorted(x for x in spans if x[0] < x[1]):
            if self.ends and s <= self.ends[-1]:
                self.ends[-1] = max(self.ends[-1], e)
            else:
                self.starts.append(s)
                self.ends.append(e)

    def __contains__(self, at: int) -> bool:
        k = bisect.bisect_right(self.starts, at) - 1
        return k >= 0 and at < self.ends[k]


_LAST_ITALIC: list = [None]  # (the last paragraph's spans, their _Italic)


def _italic(spans: Sequence[tuple[int, int]]) -> _Italic:
    return _remembered(_LAST_ITALIC, spans, lambda: _Italic(spans))


_ITALIC_NAMES = {"t", "F", "r", "rs", "z", "U", "H", "W", "T", "p", "d", "g", "V", "R2", "M", "SD", "Mdn", "N", "n", "ab"}
_GREEK = "χηωεφβρ"


@functools.lru_cache(maxsize=1024)  # a manuscript types its symbols a few ways
def _italic_rule(symbol: str, name: str) -> int | None:
    """Where a symbol's Greek letter is (≥ 0: it must be roman), −1 for a Latin symbol that must be italic, None for
    a word (chi-square, partial, adjusted) or a symbol not checked."""
    greek = next((i for i, ch in enumerate(symbol) if ch in _GREEK), None)
    if greek is not None:
        return greek
    if name in _ITALIC_NAMES and symbol[:1].isascii() and symbol[:1].isalpha() and len(symbol.split()) == 1:
        return -1
    return None


def _italics(rep: Reported, text: str, spans: Sequence[tuple[int, int]], roman: frozenset[str] = frozenset()) -> list[Finding]:
    """Latin symbols italic, Greek letters roman (APA 7 §6.45); words
    (chi-square, partial, adjusted) and the symbols the style writes upright (``roman``) are not checked."""
    bad = []
    symbols: list[tuple[int, str, str]] = []
    if rep.symbol is not None:
        symbols.append((rep.symbol_start, rep.symbol_text, rep.symbol))
    if rep.p is not None and rep.p.op != "ns" and rep.p.symbol_text in ("p", "P"):  # (not SPSS's "Sig.": a word)
        symbols.append((rep.p.symbol_start, rep.p.symbol_text, "p"))
    for e in rep.effects + rep.descriptives:
        symbols.append((e.symbol_start, e.symbol_text, e.name))
    italic = _italic(spans)
    for start, symbol, name in symbols:
        rule = _italic_rule(symbol, name)
        if rule is None or (rule < 0 and name in roman):
            continue
        if rule >= 0:
            if start + rule in italic:
                bad.append(f"{symbol} (Greek: roman)")
        elif start not in italic:
            bad.append(f"{symbol} (not italic)")
    return [Finding("italics", "Latin statistical symbols are italic; Greek letters are not.", ", ".join(bad))] if bad else []


def verdict_word(rep: Reported, alpha: float, evidence: str) -> list[Finding]:
    """An "ns" the text puts beside a statistic's own p that lies below alpha ("p = .012, n.s."; "p < .05, ns"): the
    verdict and the p disagree at alpha, unless the verdict uses another alpha (a corrected one), which the text should say."""
    p = rep.p
    if p is None or p.number is None or p.op not in ("=", "<", "≤"):
        return []
    value = p.number.value
    if not (value < alpha or (p.op != "=" and value <= alpha)):
        return []
    return [Finding("ns-below-alpha", f"The text calls it not significant, but its p {p.op} {p.number.text} is below alpha = {alpha:g}: "
                                      "say which alpha the verdict uses (a corrected one?), or correct the p or the word.", evidence)]


_NOT_SCORES = {"age", "diff", "difference"}  # means GRIM does not apply to: an age, a difference between means


def grim(rep: Reported, items: int) -> list[Finding]:
    """GRIM (Brown & Heathers, 2016): a mean of n integer scores (``items``
    items each) is a multiple of 1/(n·items), so only some printed means are possible."""
    if rep.n is None:
        return []
    n = int(rep.n.value)
    out = []
    for e in rep.descriptives:
        if e.name != "M" or n <= 0 or e.number.decimals == 0 or subscript(e) in _NOT_SCORES:
            continue
        total = n * items
        if total >= 10 ** e.number.decimals:
            continue  # every printed mean is possible
        k = round(e.number.value * total)
        candidates = [c / total for c in (k - 1, k, k + 1)]
        if not any(abs(c - e.number.value) <= e.number.half_unit + 1e-12 for c in candidates):
            out.append(Finding("grim", f"A mean of {n} integer scores cannot be {e.number.text}.", f"M = {e.number.text}, n = {n}, {items} item(s)"))
    return out


def _magnitude(number: Number) -> tuple[float, float]:
    """The magnitudes a printed number stands for."""
    v = abs(number.value)
    return max(0.0, v - number.half_unit), v + number.half_unit


def _hedges_j(df: float) -> tuple[float, float]:
    """Hedges' small-sample factor: exact (gamma functions) and the usual
    approximation 1 − 3/(4 df − 1); an author may have used either."""
    exact = hedges_j(df)
    approx = 1 - 3 / (4 * df - 1)
    return min(exact, approx), max(exact, approx)


def effect_from_t(rep: Reported, sizes: tuple[int, int] | None = None) -> list[Finding]:
    """d from t, where the design is known: d_z = t/√(df + 1) for a paired or
    one-sample test; d = t·√(1/n₁ + 1/n₂) (g with Hedges' J) for Student's t
    when the sentence gives two group sizes that add up to df + 2. Anything
    else (Welch df, d_av, no group sizes) is not checked: d then depends on
    what the text does not say."""
    if rep.symbol != "t" or rep.value is None or len(rep.df) != 1:
        return []
    df = rep.df[0].value
    if not float(df).is_integer() or df < 2:
        return []
    t_low, t_high = _magnitude(rep.value)
    out = []
    for e in rep.effects:
        if e.name == "d_z":
            low = high = 1 / math.sqrt(df + 1)
            basis = f"t/√{df + 1:.0f}"
        elif e.name in ("d", "g") and sizes is not None and sizes[0] + sizes[1] - 2 == df:
            low = high = math.sqrt(1 / sizes[0] + 1 / sizes[1])
            basis = f"t·√(1/{sizes[0]} + 1/{sizes[1]})"
            if e.name == "g":
                j_low, j_high = _hedges_j(df)
                low, high, basis = low * j_low, high * j_high, f"J·{basis}"
        else:
            continue
        expected = (t_low * low, t_high * high)
        if not _overlap(expected, _magnitude(e.number)):
            out.append(
                Finding(
                    "d-does-not-fit",
                    f"{e.symbol_text} = {e.number.text} does not follow from t({rep.df[0].text}) = {rep.value.text}: {basis} gives "
                    f"{expected[0]:.3f} to {expected[1]:.3f} in magnitude.",
                    f"{e.symbol_text} = {e.number.text}",
                )
            )
    return out


def effect_from_f_or_chi2(rep: Reported) -> list[Finding]:
    """η²p against F(df₁, df₂): η²p = F·df₁/(F·df₁ + df₂) whenever F is the
    ratio of the effect's and its error term's mean squares, so with whole
    df (Welch's F and corrected df are left alone); η² and generalized η² can only be smaller.
    V or φ against χ²(df, N): V = √(χ²/(N·m)) with m = min(rows, columns) − 1,
    between 1 and df, so V is at least √(χ²/(N·df)) (a Yates-corrected χ²
    is smaller than the one V is computed from, so only this bound is
    checked)."""
    if rep.value is None or rep.op != "=" or rep.value.value < 0:
        return []
    low, high = max(rep.value.value - rep.value.half_unit, 0.0), rep.value.value + rep.value.half_unit
    out = []
    whole = len(rep.df) == 2 and all(float(d.value).is_integer() for d in rep.df)
    if rep.symbol == "F" and len(rep.df) == 2 and all(d.value > 0 for d in rep.df) and (whole or _sphericity_corrected(rep)):
        (l1, h1), (l2, h2) = (_df_range(d) for d in rep.df)
        bound = (low * l1 / (low * l1 + h2), high * h1 / (high * h1 + l2))
        r2 = next((e for e in rep.effects if e.name == "R2"), None)
        for e in rep.effects:
            shown = (e.number.value - e.number.half_unit, e.number.value + e.number.half_unit)
            # (a step's ΔR² without the model's R²: ΔR² = F·df₁·(1 − R²)/df₂ with R² ≥ ΔR², so at most F·df₁/(F·df₁ + df₂))
            capped = e.name in _BELOW_ETA2_P or (e.name == "delta_R2" and r2 is None and whole)
            if (e.name == "eta2_p" and not _overlap(bound, shown)) or (capped and shown[0] > bound[1] + 1e-12):
                relation = ("F·df₁/(F·df₁ + df₂) gives" if e.name == "eta2_p" else
                            "ΔR² = F·df₁·(1 − R²)/df₂ with R² at least ΔR² is at most F·df₁/(F·df₁ + df₂), here" if e.name == "delta_R2" else
                            f"{_BELOW_ETA2_P.get(e.name)} cannot exceed η²p, which F·df₁/(F·df₁ + df₂) puts at")
                span = f"{bound[0]:.3f}" if f"{bound[0]:.3f}" == f"{bound[1]:.3f}" else f"{bound[0]:.3f} to {bound[1]:.3f}"
                out.append(Finding("effect-does-not-fit", f"{e.symbol_text} = {e.number.text} does not fit F({rep.df[0].text}, {rep.df[1].text}) = "
                                   f"{rep.value.text}: {relation} {span}.", f"{e.symbol_text} = {e.number.text}"))
        most = high * h1 / l2  # Cohen's f² = F·df₁/df₂ in its partial form (η²p/(1 − η²p)), smaller otherwise
        for e in rep.effects:
            if e.name in ("f", "f2"):
                least = max(e.number.value - e.number.half_unit, 0.0) ** (2 if e.name == "f" else 1)
                if least > most + 1e-12:
                    out.append(Finding("effect-does-not-fit", f"{e.symbol_text} = {e.number.text} does not fit F({rep.df[0].text}, {rep.df[1].text}) = "
                                       f"{rep.value.text}: f² is at most F·df₁/df₂, here {most:.3f}" + (f" (f at most {math.sqrt(most):.3f})." if e.name == "f" else "."),
                                       f"{e.symbol_text} = {e.number.text}"))
        out += _r_squared_fits(rep, r2, bound[0]) if r2 is not None and whole else []
        change = next((e for e in rep.effects if e.name == "delta_R2"), None)
        if change is not None and r2 is not None and whole:  # a regression step's F change: (ΔR²/df₁)/((1 − R²)/df₂)
            d_low, d_high = max(change.number.value - change.number.half_unit, 0.0), change.number.value + change.number.half_unit
            r_low, r_high = r2.number.value - r2.number.half_unit, r2.number.value + r2.number.half_unit
            df1, df2 = rep.df[0].value, rep.df[1].value
            if 0 <= r_low and r_high < 1:
                expected = (d_low / df1 / ((1 - r_low) / df2), d_high / df1 / ((1 - r_high) / df2))
                if not _overlap(expected, (low, high)):
                    out.append(Finding("effect-does-not-fit", f"{change.symbol_text} = {change.number.text} with {r2.symbol_text} = {r2.number.text} does not fit "
                                       f"F({rep.df[0].text}, {rep.df[1].text}) = {rep.value.text}: (ΔR²/df₁)/((1 − R²)/df₂) gives {expected[0]:.2f} to "
                                       f"{expected[1]:.2f}.", f"{change.symbol_text} = {change.number.text}, {r2.symbol_text} = {r2.number.text}"))
    if rep.symbol in ("Q", "chi2") and len(rep.df) == 1 and rep.df[0].value >= 1 and low > 0:
        out += _heterogeneity_fits(rep, low, high)
    if rep.symbol == "chi2" and len(rep.df) == 1 and rep.n is not None and rep.n.value > 0 and rep.df[0].value >= 1:
        least = math.sqrt(low / (rep.n.value * rep.df[0].value))
        for e in rep.effects:
            if e.name in ("V", "phi") and e.number.value >= 0 and e.number.value + e.number.half_unit < least - 1e-12:
                out.append(Finding("effect-does-not-fit", f"{e.symbol_text} = {e.number.text} is too small for χ²({rep.df[0].text}, N = {rep.n.text}) = "
                                   f"{rep.value.text}: √(χ²/(N·df)) is already {least:.3f}.", f"{e.symbol_text} = {e.number.text}"))
            # and no larger than √(χ²/N), a table with two rows or columns' V, where no continuity correction (df 1: Yates's χ²
            # beside a φ from Pearson's) can part them
            most = math.sqrt(high / rep.n.value)
            if e.name == "V" and rep.df[0].value >= 2 and e.number.value - e.number.half_unit > most + 1e-12:
                out.append(Finding("effect-does-not-fit", f"{e.symbol_text} = {e.number.text} is too large for χ²({rep.df[0].text}, N = {rep.n.text}) = "
                                   f"{rep.value.text}: √(χ²/N), the largest V any table gives it, is {most:.3f}.", f"{e.symbol_text} = {e.number.text}"))
    return out


def _heterogeneity_fits(rep: Reported, low: float, high: float) -> list[Finding]:
    """A meta-analysis's I², in percent, against its Q (or χ²) on df: I² = max(0, (Q − df)/Q) (Higgins & Thompson, 2002),
    over the values the printed Q and I² stand for (an I² is read only with its "%")."""
    df = rep.df[0].value
    out = []
    for e in rep.effects:
        if e.name != "I2":
            continue
        expected = (max(0.0, (low - df) / low) * 100, max(0.0, (high - df) / high) * 100)
        shown = (e.number.value - e.number.half_unit, e.number.value + e.number.half_unit)
        if not _overlap(expected, shown):
            span = f"{expected[0]:.1f}%" if f"{expected[0]:.1f}" == f"{expected[1]:.1f}" else f"{expected[0]:.1f}% to {expected[1]:.1f}%"
            out.append(Finding("effect-does-not-fit", f"{e.symbol_text} = {e.number.text}% does not fit {rep.symbol_text}({rep.df[0].text}) = "
                               f"{rep.value.text}: (Q − df)/Q gives {span}.", f"{e.symbol_text} = {e.number.text}%"))  # type: ignore[union-attr]
    return out


# the effect sizes of an F that can only be smaller than its η²p: η² (SS over a total that holds the error's), generalized
# η², and the bias-corrected ω², partial ω² and ε² (their numerators less an error mean square; partial ω²'s denominator
# has N, above df₂) — definitions; Olejnik & Algina (2003)
_BELOW_ETA2_P = {"eta2": "η²", "eta2_g": "generalized η²", "omega2": "ω²", "omega2_p": "partial ω²", "epsilon2": "ε²"}


def _r_squared_fits(rep: Reported, r2: Effect, least: float) -> list[Finding]:
    """A regression's R² against its F (at least ``least``, F·df₁/(F·df₁ + df₂): the model's F gives R² that, a step's
    F change ΔR² = F·df₁·(1 − R²)/df₂ ≤ R²), its multiple R (R² = R·R) and its adjusted R² (1 − (1 − R²)(n − 1)/(n − k − 1),
    with n − k − 1 the F's df₂ and k at least its df₁ — the predictors of this step and any before — so at most
    1 − (1 − R²)(df₁ + df₂)/df₂), on the printed precision of each."""
    out = []
    r_low, r_high = r2.number.value - r2.number.half_unit, r2.number.value + r2.number.half_unit
    if r_high < least - 1e-12:
        out.append(Finding("effect-does-not-fit", f"{r2.symbol_text} = {r2.number.text} is too small for F({rep.df[0].text}, {rep.df[1].text}) = "
                                                  f"{rep.value.text}: whether the F is the model's or a step's change, R² is at least "
                                                  f"F·df₁/(F·df₁ + df₂), {least:.3f}.", f"{r2.symbol_text} = {r2.number.text}"))
    multiple = next((e for e in rep.effects if e.name == "R_multiple"), None)
    if multiple is not None and 0 <= multiple.number.value <= 1:
        m_low, m_high = max(multiple.number.value - multiple.number.half_unit, 0.0), multiple.number.value + multiple.number.half_unit
        if not _overlap((m_low * m_low, m_high * m_high), (r_low, r_high)):
            out.append(Finding("effect-does-not-fit", f"{multiple.symbol_text} = {multiple.number.text} and {r2.symbol_text} = {r2.number.text} disagree: "
                                                      f"R² is R squared, {m_low * m_low:.3f} to {m_high * m_high:.3f}.",
                               f"{multiple.symbol_text} = {multiple.number.text}, {r2.symbol_text} = {r2.number.text}"))
    adjusted = next((e for e in rep.effects if e.name == "R2_adj"), None)
    df1, df2 = rep.df[0].value, rep.df[1].value
    if adjusted is not None and df2 > 0 and r_high < 1:
        most = 1 - (1 - r_high) * (df1 + df2) / df2
        if adjusted.number.value - adjusted.number.half_unit > most + 1e-12:
            out.append(Finding("effect-does-not-fit", f"{adjusted.symbol_text} = {adjusted.number.text} is too large for {r2.symbol_text} = {r2.number.text} "
                                                      f"and F({rep.df[0].text}, {rep.df[1].text}): 1 − (1 − R²)(n − 1)/(n − k − 1), with n − k − 1 = df₂ and "
                                                      f"k at least df₁, is at most {most:.3f}.", f"{adjusted.symbol_text} = {adjusted.number.text}, {r2.symbol_text} = {r2.number.text}"))
    return out


def _df_range(d: Number) -> tuple[float, float]:
    """A df as printed: exact when whole, else ± half its last digit."""
    return (d.value, d.value) if float(d.value).is_integer() else (d.value - d.half_unit, d.value + d.half_unit)


def _sphericity_corrected(rep: Reported) -> bool:
    """F(ε·df₁, ε·df₂): both df fractional (Welch's F keeps a whole df₁)."""
    return len(rep.df) == 2 and not any(float(d.value).is_integer() for d in rep.df)


def corrected_p_fits(rep: Reported, alpha: float) -> "tuple[float, float] | None":
    """For an F printed with whole (uncorrected) df beside a p that does not follow from them, in a text that names a
    sphericity correction: the range of ε (the printed ε's, else 1/df₁ to 1, the lower bound to none) under which
    F(ε·df₁, ε·df₂) gives a p the reported one allows; None when none does."""
    if rep.symbol != "F" or len(rep.df) != 2 or rep.op != "=" or not all(float(d.value).is_integer() and d.value > 0 for d in rep.df):
        return None
    reported = reported_p_range(rep, alpha)
    if reported is None:
        return None
    given = next((e for e in rep.effects if e.name == "epsilon" and 0 < e.number.value <= 1), None)
    low, high = ((max(given.number.value - given.number.half_unit, 1e-6), min(given.number.value + given.number.half_unit, 1.0))
                 if given is not None else (1 / rep.df[0].value, 1.0))
    computed = p_span(replace(rep, effects=[]), [tuple(d.value * eps for d in rep.df) for eps in (low, high)])
    return (low, high) if computed is not None and _overlap(computed, reported) else None


def spearman_fits(rep: Reported, alpha: float) -> "tuple[float, float] | None":
    """For Spearman's ρ with whole df (n = df + 2 pairs, 3 to 1,290) beside a p that the t approximation does not give:
    the two-sided p values R's cor.test gives for the printed ρ (exact over the permutations up to 9 pairs, AS 89's
    Edgeworth series above: pvalues.spearman_p) when the reported p allows one of them, else None."""
    if rep.symbol != "rs" or len(rep.df) != 1 or rep.op != "=" or not float(rep.df[0].value).is_integer():
        return None
    bounds, reported = _printed_bounds(rep), reported_p_range(rep, alpha)
    if bounds is None or reported is None:
        return None
    n = int(rep.df[0].value) + 2
    ends = [spearman_p(bounds[2], n), spearman_p(bounds[0], n)]  # (p falls as |ρ| grows)
    if ends[0] is None or ends[1] is None:
        return None
    computed = (min(ends), max(ends))  # type: ignore[type-var]
    return computed if _overlap(computed, reported) else None  # type: ignore[arg-type]


def p_span(rep: Reported, ends: "Sequence[tuple[float, ...]]") -> "tuple[float, float] | None":
    """The p values the printed statistic allows over every df from one of ``ends`` to the other (p moves monotonically
    with the df, so the ends bound it): a Welch t's df between the smaller group's n − 1 and n₁ + n₂ − 2, a corrected
    F's ε·df between the lower bound and none. None when an end gives no p."""
    found = [p_range(replace(rep, df=tuple(Number(f"{v:.6g}", v, 6, rep.start, rep.start) for v in df), p_range=None)) for df in ends]
    if any(f is None for f in found):
        return None
    return min(f[0] for f in found), max(f[1] for f in found)  # type: ignore[index]


def corrected_df(rep: Reported) -> list[Finding]:
    """A sphericity-corrected F(ε·df₁, ε·df₂) keeps the ratio df₂/df₁ of the
    uncorrected test, a whole number (n − 1, or N − g with groups); with ε
    printed, df₁/ε and df₂/ε are whole numbers too. Each is checked with the
    printed precision of every number."""
    if rep.symbol != "F" or not _sphericity_corrected(rep):
        return []
    (l1, h1), (l2, h2) = (_df_range(d) for d in rep.df)
    out = []
    if l1 > 0 and math.floor(h2 / l1 + 1e-9) < math.ceil(l2 / h1 - 1e-9):
        out.append(Finding("corrected-df", f"F({rep.df[0].text}, {rep.df[1].text}): sphericity-corrected df keep a whole-number ratio df₂/df₁ "
                                           f"(the error df per effect df), but {rep.df[1].text}/{rep.df[0].text} lies between {l2 / h1:.3f} and "
                                           f"{h2 / l1:.3f}.", f"F({rep.df[0].text}, {rep.df[1].text})"))
    for e in rep.effects:
        if e.name != "epsilon" or not 0 < e.number.value <= 1:
            continue
        le, he = e.number.value - e.number.half_unit, e.number.value + e.number.half_unit
        if le <= 0:
            continue
        ranges = [(l1 / he, h1 / le), (l2 / he, h2 / le)]
        if any(math.floor(b + 1e-9) < max(1, math.ceil(a - 1e-9)) for a, b in ranges):
            out.append(Finding("corrected-df", f"F({rep.df[0].text}, {rep.df[1].text}) with {e.symbol_text} = {e.number.text}: the corrected df divided "
                                               f"by ε should give the whole df of the uncorrected test, but give {l1 / he:.2f}–{h1 / le:.2f} and "
                                               f"{l2 / he:.2f}–{h2 / le:.2f}.", f"{e.symbol_text} = {e.number.text}"))
    return out


Ratio = "tuple[Number, Number] | tuple[Number, Number, tuple[str, str]]"  # an estimate, its SE, and their names when not B and SE


def coefficient_ratio(rep: Reported, coefficient: "Ratio | None") -> list[Finding]:
    """A coefficient's t (or z) against B / SE, its Wald χ² (the only χ² given a coefficient) against (B / SE)², and an
    odds ratio beside it against exp(B), with interval arithmetic on the printed precision of all of them; a t against
    the mean difference / its SE where a table gives those (third item: their names)."""
    if coefficient is None or rep.value is None or rep.op != "=" or rep.symbol not in ("t", "z", "chi2"):
        return []
    b, se, *named = coefficient
    b_name, se_name = named[0] if named else ("B", "SE")
    se_low, se_high = se.value - se.half_unit, se.value + se.half_unit
    if se_low <= 0:
        return []  # an SE printed as 0.00 bounds nothing
    b_low, b_high = b.value - b.half_unit, b.value + b.half_unit
    corners = [b_low / se_low, b_low / se_high, b_high / se_low, b_high / se_high]
    ratio = (min(corners), max(corners))
    stat = (rep.value.value - rep.value.half_unit, rep.value.value + rep.value.half_unit)
    out = []
    if rep.symbol == "chi2":  # the Wald χ² of one coefficient: (B / SE)²
        ratio = (0.0 if ratio[0] <= 0 <= ratio[1] else min(ratio[0] ** 2, ratio[1] ** 2), max(ratio[0] ** 2, ratio[1] ** 2))
    name, what = ("Wald", f"({b_name} / {se_name})²") if rep.symbol == "chi2" else (rep.symbol, f"{b_name} / {se_name}")
    unsigned = rep.symbol in ("t", "z") and rep.value.value >= 0 and not rep.value.text.lstrip().startswith("+")  # |t| as some tables print it
    if not _overlap(ratio, stat) and not (unsigned and _overlap((-ratio[1], -ratio[0]), stat)):
        shown = abs(rep.value.value) if unsigned else rep.value.value
        places = next((k for k in range(2, 7) if not round(ratio[0], k) <= shown <= round(ratio[1], k)), 6)  # (a near miss: the
        # digits that show where it misses, "−3.976 to −3.965" for t = −3.962, not "−3.98 to −3.96")
        out.append(Finding("coefficient-does-not-fit", f"{name} = {rep.value.text} is not {what}: {b_name} = {b.text} and {se_name} = {se.text} give "
                                                        f"{ratio[0]:.{places}f} to {ratio[1]:.{places}f}.", f"{b_name} = {b.text}, {se_name} = {se.text}, {name} = {rep.value.text}"))
    return out + _odds_fit(rep, b)


def _odds_fit(rep: Reported, b: Number) -> list[Finding]:
    """An odds ratio beside a logistic coefficient against exp(B) (a hazard, rate or risk ratio beside its model's
    coefficient alike), on the printed precision of both."""
    odds = next((e for e in rep.effects if e.name in RATIOS), None)
    b_low, b_high = b.value - b.half_unit, b.value + b.half_unit
    if odds is None or b_high >= 700:
        return []
    expected = (math.exp(b_low), math.exp(b_high))
    if _overlap(expected, (odds.number.value - odds.number.half_unit, odds.number.value + odds.number.half_unit)):
        return []
    return [Finding("coefficient-does-not-fit", f"{odds.symbol_text} = {odds.number.text} is not exp(B): B = {b.text} gives "
                                                f"{expected[0]:.4g} to {expected[1]:.4g}.", f"B = {b.text}, {odds.symbol_text} = {odds.number.text}")]


def interval_fits_se(ci: "TypedInterval", se: Number, centre: Number | None = None) -> list[Finding]:
    """An estimate's interval against its SE: a Wald interval reaches a z's quantile of SEs each side at the least (1.96
    for 95%) and a t on 1 df's at the most (12.71), whatever its df; with the printed precision of the limits and the
    SE, and a margin of 15% each way for intervals made otherwise (profile likelihood), a half-width outside says the
    SE or the interval is another's. With ``centre`` (a t's B or mean difference: its interval is B ± t·SE, symmetric
    about it) the interval's midpoint must lie on it, within the printed precision and a quarter of the half-width (a
    mixed model's profile interval is nearly symmetric): one that is not was made for another estimate — as a table's
    copied interval is (World J Psychiatry 2026: a model's intervals those of the model beside it)."""
    from statistics import NormalDist  # (only here: a coefficient's SE beside its interval)

    se_low, se_high = se.value - se.half_unit, se.value + se.half_unit
    if se_low <= 0 or ci.level is None or not 0.5 <= ci.level < 1:
        return []
    if centre is not None:
        middle, half = (ci.low.value + ci.high.value) / 2, (ci.high.value - ci.low.value) / 2
        slack = (ci.low.half_unit + ci.high.half_unit) / 2 + centre.half_unit + abs(half) / 4
        if abs(middle - centre.value) > slack * (1 + 1e-9):
            level = f"{ci.level * 100:g}%"
            places = max(ci.low.decimals, ci.high.decimals) + 1
            return [Finding("coefficient-does-not-fit", f"The {level} CI [{ci.low.text}, {ci.high.text}] is centred on {middle:.{places}f}, not on the "
                                                        f"estimate {centre.text}: an interval made from its SE (the estimate ± a t's quantile of SEs) is "
                                                        f"symmetric about it; the interval or the estimate is another's.",
                            f"estimate {centre.text}, {level} CI [{ci.low.text}, {ci.high.text}]")]
    widest = ((ci.high.value + ci.high.half_unit) - (ci.low.value - ci.low.half_unit)) / 2
    narrowest = max((ci.high.value - ci.high.half_unit) - (ci.low.value + ci.low.half_unit), 0.0) / 2
    fewest, most = NormalDist().inv_cdf(0.5 + ci.level / 2), math.tan(math.pi * ci.level / 2)
    if widest / se_low >= 0.85 * fewest and narrowest / se_high <= 1.15 * most:
        return []
    level = f"{ci.level * 100:g}%"
    return [Finding("coefficient-does-not-fit", f"The {level} CI [{ci.low.text}, {ci.high.text}] reaches {narrowest / se_high:.2f} to {widest / se_low:.2f} "
                                                f"SEs each side of its estimate (SE = {se.text}); an interval from that SE reaches {fewest:.2f} (a z) to "
                                                f"{most:.2f} (a t on 1 df): the SE or the interval is another's.", f"SE = {se.text}, {level} CI [{ci.low.text}, {ci.high.text}]")]


@functools.lru_cache(maxsize=64)
def _u_counts(m: int, n: int) -> tuple[int, ...]:
    """How many of the C(m + n, m) orderings of two untied groups give each U = 0 … m·n: the coefficients of the
    Gaussian binomial Π (1 − q^(n+i)) / (1 − q^i), i = 1 … m (Mann & Whitney, 1947; definition), in whole numbers."""
    poly = [1]
    for i in range(1, m + 1):
        times = poly + [0] * (n + i)  # × (1 − q^(n+i))
        for k in range(len(poly)):
            times[k + n + i] -= poly[k]
        quotient = [0] * (len(times) - i)  # ÷ (1 − q^i): exact, by the running sum of every i-th coefficient
        for k in range(len(quotient)):
            quotient[k] = times[k] + (quotient[k - i] if k >= i else 0)
        poly = quotient
    return tuple(poly[: m * n + 1])


def rank_sum_p(rep: Reported, sizes: tuple[int, int] | None, alpha: float) -> list[Finding]:
    """A Mann–Whitney U's p against the group sizes its sentence gives: no larger than the largest two-sided p of the
    exact test (counted where n₁n₂ ≤ 20,000, as R's wilcox.test and scipy compute it for small groups without ties) and the
    normal approximation with and without continuity correction, at the U nearest n₁n₂/2 its printed digits allow (and
    a margin of 2% and 0.0005). Ties only lower the p of the
    normal approximation (a smaller variance), and a one-sided p is half the two-sided: a larger p follows from the U
    under no reading."""
    if rep.symbol != "U" or sizes is None or rep.value is None or rep.op != "=" or rep.p is None or rep.p.adjusted:
        return []
    reported = reported_p_range(rep, alpha)
    n1, n2 = sizes
    mu = n1 * n2 / 2
    if reported is None or reported[0] <= 0 or min(n1, n2) < 1 or not 0 <= rep.value.value <= n1 * n2:
        return []
    low, high = rep.value.value - rep.value.half_unit, rep.value.value + rep.value.half_unit
    u = min(max(mu, low), high)  # (the U its digits allow nearest the middle: the largest p)
    distance = abs(u - mu)
    sigma = math.sqrt(n1 * n2 * (n1 + n2 + 1) / 12)
    from statistics import NormalDist

    ps = {"the normal approximation": min(1.0, 2 * NormalDist().cdf(-distance / sigma)),
          "with continuity correction": min(1.0, 2 * NormalDist().cdf(-max(distance - 0.5, 0.0) / sigma))}
    if n1 * n2 <= 20_000:  # (the exact distribution as programs compute it for small groups — R below 50 each, scipy when one
        counts = _u_counts(min(n1, n2), max(n1, n2))  # group is small —; beyond, the normal approximation stands for it)
        lower = math.floor(mu - distance + 1e-9)  # P(U ≤ the smaller of u and n₁n₂ − u), doubled
        ps["the exact test"] = min(1.0, 2 * sum(counts[: lower + 1]) / math.comb(n1 + n2, n1))
    most = max(ps.values())
    if reported[0] <= most * 1.02 + 5e-4:  # (a margin for an exact p beyond the counted sizes, and for a program's own rounding)
        return []
    said = "; ".join(f"{name} {_small(q)}" for name, q in ps.items())
    return [Finding("p-does-not-follow", f"The reported p does not follow from U = {rep.value.text} with n₁ = {n1} and n₂ = {n2}: two-sided, {said} "
                                         f"— ties and a one-sided test only lower it.", f"U = {rep.value.text}, n₁ = {n1}, n₂ = {n2}; p {rep.p.op} {rep.p.number.text}")]  # type: ignore[union-attr]


def rank_sum_z(rep: Reported, u: Reported, sizes: tuple[int, int] | None) -> list[Finding]:
    """A Mann–Whitney U's z (``rep``, typed right after the U ``u``: "U = 234.5, z = −2.61") against the U and the group
    sizes its sentence gives: |z| = |U − n₁n₂/2| / σ, σ² = n₁n₂(n₁ + n₂ + 1)/12 without ties — ties make σ smaller and
    |z| larger, a continuity correction takes 0.5 off |U − n₁n₂/2| —, so |z| is at least (|U − n₁n₂/2| − 0.5)/σ at the
    U its printed digits allow nearest the middle (Mann & Whitney, 1947; the tie correction as programs apply it). A z
    below that follows from no reading of the U."""
    if rep.symbol != "z" or u.symbol != "U" or sizes is None or rep.value is None or u.value is None or rep.op != "=" or u.op != "=":
        return []
    n1, n2 = sizes
    mu, sigma = n1 * n2 / 2, math.sqrt(n1 * n2 * (n1 + n2 + 1) / 12)
    if not 0 <= u.value.value <= n1 * n2 or sigma <= 0:
        return []
    nearest = min(max(mu, u.value.value - u.value.half_unit), u.value.value + u.value.half_unit)
    least = max(abs(nearest - mu) - 0.5, 0.0) / sigma
    if abs(rep.value.value) + rep.value.half_unit >= least - 1e-9:
        return []
    return [Finding("z-does-not-fit", f"z = {rep.value.text} is smaller than U = {u.value.text} with n₁ = {n1} and n₂ = {n2} allows: |U − n₁n₂/2| "
                                      f"less a continuity correction's 0.5, over the SD without ties, is already {least:.3f} (ties only make |z| larger).",
                    f"U = {u.value.text}, n₁ = {n1}, n₂ = {n2}; z = {rep.value.text}")]


def rank_test_r(rep: Reported, z: Reported, ns: "Sequence[int]") -> list[Finding]:
    """An r (``rep``) typed right after a z and its p (``z``: a rank test's effect size, r = |z|/√N: Rosenthal, 1991, as
    textbooks teach it for the Mann–Whitney and Wilcoxon tests) against the N's its sentence gives (``ns``: the r's own
    "N = …", an N before it, two group sizes' sum): the r follows from one of them or from twice it (a paired design's
    observations, as some count them), at the printed digits of each; nothing where no N is given."""
    if rep.symbol != "r" or rep.df or rep.p is not None or rep.value is None or rep.op != "=" or z.symbol != "z" or \
            z.p is None or z.value is None or z.op != "=" or not ns:
        return []
    low, high = abs(z.value.value) - z.value.half_unit, abs(z.value.value) + z.value.half_unit
    r_low, r_high = abs(rep.value.value) - rep.value.half_unit, abs(rep.value.value) + rep.value.half_unit
    readings = {f"N = {n:,}" if k == 1 else f"2N = {2 * n:,}": (low / math.sqrt(k * n), high / math.sqrt(k * n))
                for n in sorted(set(ns)) for k in (1, 2)}
    if any(_overlap(given, (r_low, r_high)) for given in readings.values()):
        return []
    said = "; ".join(f"{name}: {(a + b) / 2:.3f}" for name, (a, b) in readings.items())
    return [Finding("effect-does-not-fit", f"{rep.symbol_text} = {rep.value.text} does not follow from z = {z.value.text} as a rank test's r = |z|/√N "
                                           f"({said}).", f"z = {z.value.text}, {rep.symbol_text} = {rep.value.text}")]


def rank_sum_bound(rep: Reported, sizes: tuple[int, int] | None) -> list[Finding]:
    """Mann–Whitney's U between 0 and n₁·n₂ (definition: the count of pairs in which one group's value exceeds the other's,
    ties counting a half), where the sentence gives the two group sizes."""
    if rep.symbol != "U" or sizes is None or rep.value is None:
        return []
    most = sizes[0] * sizes[1]
    if rep.value.value - rep.value.half_unit <= most and rep.value.value + rep.value.half_unit >= 0:
        return []
    return [Finding("impossible-value", f"U lies between 0 and n₁·n₂ = {sizes[0]} × {sizes[1]} = {most}.", rep.value.text)]


def _mean_square(ss: Number | None, df: Number | None, ms: Number | None, row: str, out: list[Finding] | None) -> list[tuple[float, float]]:
    """The ranges a row's MS may have: its printed MS's and SS / df's (both where the table gives both; an MS that is not
    SS / df is a finding, into ``out`` unless None — either may be the slip, so the F is held to both). Each number stands
    for what its printed digits allow; a whole df is exact."""
    out_ranges = []
    if ms is not None:
        out_ranges.append((ms.value - ms.half_unit, ms.value + ms.half_unit))
    d = df.half_unit if df is not None and df.decimals else 0.0
    if ss is not None and df is not None and df.value - d > 0:
        from_ss = ((ss.value - ss.half_unit) / (df.value + d), (ss.value + ss.half_unit) / (df.value - d))
        if ms is not None and out is not None and not _overlap(from_ss, out_ranges[0]):
            out.append(Finding("ms-does-not-fit", f"A mean square is its sum of squares over its df: {row} {ss.text} / {df.text} gives "
                                                  f"{_between(*from_ss, '.6g')}, not {ms.text}.", f"{row}: SS = {ss.text}, df = {df.text}, MS = {ms.text}"))
        out_ranges.append(from_ss)
    return out_ranges


def _between(low: float, high: float, spec: str) -> str:
    """A range as a message gives it: "1368.29 to 1368.29" as the one number it prints as."""
    a, b = format(low, spec), format(high, spec)
    return a if a == b else f"{a} to {b}"


def squares_fit(rep: Reported, squares: "Squares") -> list[Finding]:
    """An ANOVA table's row against the definitions of its columns: MS = SS / df for the effect's row and (the first time
    it serves an effect) its error row, and F = MS / MS error — each number standing for what its printed digits
    allow. An MS that is not SS / df is an error; an F that is not MS / MS error a warning: a random factor's F may
    take another row's MS (the note should say so)."""
    ss, df, ms, ss_e, df_e, ms_e, own_error = squares
    out: list[Finding] = []
    effects = _mean_square(ss, df, ms, "the row's", out)
    errors = [e for e in _mean_square(ss_e, df_e, ms_e, "the error row's", out if own_error else None) if e[0] > 0]
    f = rep.value
    if not effects or not errors or f is None or rep.op != "=":
        return out
    printed = (f.value - f.half_unit, f.value + f.half_unit)
    ratios = [(a[0] / b[1], a[1] / b[0]) for a in effects for b in errors]
    if not any(_overlap(r, printed) for r in ratios):
        low, high = min(r[0] for r in ratios), max(r[1] for r in ratios)
        out.append(Finding("f-does-not-fit", f"F is its row's mean square over its error row's: those the table gives make it {_between(low, high, '.4g')}, "
                                             f"not {f.text}. Where a random factor's F takes another row's mean square, say so in the note.",
                           f"F = {f.text}; MS from {min(e[0] for e in effects):.6g} to {max(e[1] for e in effects):.6g}, "
                           f"error MS from {min(e[0] for e in errors):.6g} to {max(e[1] for e in errors):.6g}"))
    return out


def _small(p: float) -> str:
    """A recomputed p as a message shows it: below .0001 as that bound, else four significant digits."""
    return "below 0.0001" if p < 1e-4 else f"{p:.4g}"


def coefficient_p(rep: Reported, coefficient: "Ratio | None", alpha: float) -> list[Finding]:
    """The p of a coefficient given with its SE and no test (a table without a test column) against B / SE: over every
    df the test may have, from the normal's p (a z, or a t on many df) up to the t's on 1 df, with the printed
    precision of B and SE — a p outside follows from them under no df at all; an odds ratio beside them against exp(B)."""
    if rep.symbol is not None or coefficient is None or len(coefficient) != 2:
        return []
    b, se = coefficient
    odds = _odds_fit(rep, b)  # (and an odds ratio beside it against exp(B))
    reported = reported_p_range(rep, alpha) if rep.p is not None and not rep.p.adjusted else None
    if se is None:  # an odds ratio's B without its SE ("β | OR | 95% CI"): exp(B) alone
        return odds
    se_low, se_high = se.value - se.half_unit, se.value + se.half_unit
    if reported is None or se_low <= 0:
        return odds
    low, high = max(abs(b.value) - b.half_unit, 0.0) / se_high, (abs(b.value) + b.half_unit) / se_low
    allowed = (min(1.0, 2 * upper_tail("z", high)), min(1.0, 2 * upper_tail("t", low, (1.0,))))
    if _overlap(allowed, reported):
        return odds
    shown = "ns" if rep.p.op == "ns" else f"p {rep.p.op} {rep.p.number.text}"  # type: ignore[union-attr]
    name = "mean difference" if rep.text.startswith("mean difference") else "β" if rep.text.startswith("β") else "B"  # (as the table names it)
    return [Finding("coefficient-does-not-fit", f"The p does not follow from {name} / SE under any df: {name} = {b.text} and SE = {se.text} give "
                                                f"|{name} / SE| from {low:.2f} to {high:.2f}, p from {_small(allowed[0])} (a z) to {_small(allowed[1])} (a t on 1 df).",
                    f"{name} = {b.text}, SE = {se.text}, {shown}")] + odds


# -- the record behind the suggestion -----------------------------------------


def to_record(rep: Reported, alpha: float = 0.05, style: Style | None = None) -> Result:
    """The reported statistic as a record, every number held to its printed
    decimals. With the style the text is in, a p the style printed with an
    extra digit (AMA: ``P = .010`` for a p just below .01) keeps that digit."""
    precision: dict[str, int] = {}
    statistic = None
    if rep.symbol is not None and rep.value is not None:
        df = tuple(d.value for d in rep.df)
        change = rep.symbol == "F" and (rep.symbol_text[:1] in "Δ∆" or rep.symbol_text.lower().endswith("change"))  # "ΔF", "F change"
        statistic = Statistic("F_change" if change else rep.symbol, rep.value.value, df if all(d > 0 for d in df) else ())
        precision["statistic.value"] = rep.value.decimals
    p = None
    if rep.p is not None and rep.p.op == "=" and rep.p.number is not None and 0 < rep.p.number.value <= 1:
        p = rep.p.number.value
        precision["p"] = rep.p.number.decimals
        if style is not None:
            p = _as_printed(p, rep.p.number, style, alpha)
    elif rep.op == "=":  # (a statistic given as a bound, "F < 1", gives no p to print: none is made up from the bound)
        p = _recomputed_p(rep, alpha)
    effects = []
    if rep.symbol in ("r", "rs", "tau_b") and rep.value is not None and abs(rep.value.value) <= 1:
        ci = _interval(rep.ci, precision, "effects[0].ci", style, rep.symbol)
        effects.append(EffectSize(rep.symbol, rep.value.value, ci))
        precision["effects[0].value"] = rep.value.decimals
    for e in rep.effects:
        i = len(effects)
        if e.name in RATIOS and e.number.value <= 0:
            continue
        effects.append(EffectSize(e.name, e.number.value, _interval(e.ci, precision, f"effects[{i}].ci", style, e.name), ratio=e.name in RATIOS))
        precision[f"effects[{i}].value"] = e.number.decimals
    kind = _KIND.get(rep.symbol or "", "reported")
    if rep.symbol == "F":  # (a regression's F with its R², ΔR², adjusted R² or R: each effect kept, in the order typed)
        names = {e.name for e in rep.effects}
        kind = "anova_oneway" if names >= {"eta2", "omega2"} else "reported" if names & {"R2", "delta_R2", "R2_adj", "R_multiple"} else "anova_term"
    if kind == "chi2_independence" and rep.n is None:
        kind = "reported"
    n = int(rep.n.value) if rep.n is not None and rep.n.value >= 0 else None
    # a test's interval of what it tests ("t(38) = 2.14, p = .039, 95% CI [0.10, 4.20]": a difference's or a coefficient's, no
    # effect size's), kept after the p (left out, a suggestion had dropped it)
    own = _interval(rep.ci, precision, "details.ci", style, "MD") if rep.ci is not None and rep.symbol is not None and \
        rep.symbol not in ("r", "rs", "tau_b") else None
    kind = "reported" if own is not None else kind  # (the generic form, which has the interval's place)
    label = _CI_LABEL.search(rep.text, max(0, rep.ci.start - rep.start)) if own is not None and rep.text else None  # type: ignore[union-attr]
    return Result(
        kind=kind,
        statistic=statistic,
        p=p,
        n=n,
        effects=tuple(effects),
        precision=precision,
        alpha=alpha,
        details={"with_n": rep.symbol == "chi2" and n is not None,
                 "p_last": rep.symbol is None and rep.p is not None and bool(rep.effects) and rep.p.start > rep.effects[0].start,
                 **({"ci_level": own.level, "ci_low": own.low, "ci_high": own.high} if own is not None else {}),
                 **({"ci_label": " ".join(label.group(1).split())} if label is not None else {})},
    )


# what an interval is of, as the text labels it ("95% CI for the difference [−0.10, 4.20]"): kept when the interval is restyled
_CI_LABEL = re.compile(r"C\.?I\.?\s+((?:for|of)\s+(?:the\s+)?(?:(?:mean\s+)?difference|[dgr]|OR|B|β))(?![\w])")


def _as_printed(p: float, printed: Number, style: Style, alpha: float) -> float:
    """The printed p, or the nearest float that the style prints the same way."""
    num = numbers_for(style)
    want = printed.digits
    for candidate in (p, math.nextafter(p, 0.0), math.nextafter(p, 1.0)):
        if num.p(candidate, alpha, held=printed.decimals)[1] == want:
            return candidate
    return p


def _recomputed_p(rep: Reported, alpha: float) -> float | None:
    """The p for the restyled text when the reported one is not exact: the
    p recomputed from the statistic, kept inside what the text reported (so
    "p < .001" stays below .001); with nothing to recompute from, a bound of
    .001 or less, or at alpha, is kept as the largest p below it (and one of
    .99 or more as the smallest p above it)."""
    computed, reported = p_range(rep), reported_p_range(rep, alpha)
    bound = rep.p.number.value if rep.p is not None and rep.p.op in ("<", "≤") and rep.p.number is not None else None
    if computed is not None:
        lo, hi = computed
        if reported is not None and _overlap(computed, reported):
            lo, hi = max(lo, reported[0]), min(hi, reported[1])
            if bound is not None:
                hi = min(hi, math.nextafter(bound, 0.0))
            if bound is not None and abs(bound - alpha) < 1e-12 and max(lo, alpha - 0.0005) < hi:
                lo = max(lo, alpha - 0.0005)  # "p < .05" where p rounds to .050 (a style's near-alpha rule) stays that kind of p
            if rep.p is not None and rep.p.op in (">", "≥") and rep.p.number is not None:
                above = rep.p.number.value + rep.p.number.half_unit  # "P > .99": above what prints as .99
                if above < hi:
                    lo = max(lo, above)
        return min(max((lo + hi) / 2, 0.0), 1.0)
    if bound is not None and (0 < bound <= 0.001 or abs(bound - alpha) < 1e-12):
        return math.nextafter(bound, 0.0)  # "p < .001" stays below .001; "p < .05" stays a p that rounds to .050 below alpha
    if rep.p is not None and rep.p.op in (">", "≥") and rep.p.number is not None and 0.99 <= rep.p.number.value < 1:
        return math.nextafter((rep.p.number.value + 1) / 2, 1.0)  # "P > .99" stays above .99 and above what rounds to it
    return None


def _interval(ci, precision: dict[str, int], path: str, style: Style | None, quantity: str) -> Interval | None:  # type: ignore[no-untyped-def]
    if ci is None or ci.low.value > ci.high.value:
        return None
    if ci.level is None:  # typed without its level: no record can say it (the statistic is left as typed)
        raise ValueError("an interval without its level")
    precision[f"{path}.low"] = ci.low.decimals
    precision[f"{path}.high"] = ci.high.decimals
    low, high = ci.low.value, ci.high.value
    if style is not None:  # a limit printed with an added digit (−.005 for a limit near 0) keeps it
        num = numbers_for(style)
        null = 1.0 if quantity in RATIOS else 0.0

        def as_printed(v: float, printed: Number) -> float:
            for c in (v, math.nextafter(v, null), math.nextafter(v, -math.inf if v < null else math.inf)):
                if num.limit(c, quantity, null, held=printed.decimals).lstrip(style.minus + "-") == printed.digits:
                    return c
            return v

        low, high = as_printed(low, ci.low), as_printed(high, ci.high)
    return Interval(ci.level, low, high)

