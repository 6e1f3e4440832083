"""Statistics spread over a table's cells, and the df a statistic's context gives.

Authors put one test in one row: the statistic under a head named *t*, *F*
or χ², its p under *p*, *P*, *p value* or *Sig.*, its df under *df* (or
*df(num)* and *df(den)*, or the df of the table's Residuals/Error row), the
group sizes in the header ("Control (n = 30)") or the caption ("N = 42").
A statistic typed whole in a cell ("F (1,56) = 3.0") may have its p in a
cell further along the row. This module reads such rows into the same
`Reported` statistics the text parser gives, and lists the df readings a
statistic without df allows (``df_readings``), each with the assumption it
makes, so that a finding is reported only when no reading fits.
"""

from __future__ import annotations

import bisect
import math
import re
from dataclasses import dataclass, replace
from typing import TYPE_CHECKING, Sequence

from .parsing import _SIGNIFICANCE, ONE_STAR, Effect, Interval, Number, PValue, Reported, _patterns, p_text, statistic_text
from .reading import Unit

if TYPE_CHECKING:
    from .checks import Ratio

__all__ = ["TableStatistic", "table_statistics", "star_bounds", "df_readings", "sizes_in", "caption_sizes", "Reading"]

# an interval's head: "95% CI", "95% confidence interval", "CI (95%)", "Bootstrapped 95% CI", "CI"
# (SAS's "95% Wald Confidence Limits", "95% Profile Likelihood Confidence Limits")
_INTERVAL_HEAD = (r"(?:bootstrap(?:ped)?\s+)?(?:\d{2}(?:\.\d)?\s?%\s?(?:(?:wald|profile[- ]likelihood|likelihood[- ]ratio)\s+)?"
                  r"(?:CI|C\.I\.?|confidence\s+(?:interval|limits))|(?:CI|C\.I\.?|confidence\s+interval)(?:\s*\(?\d{2}(?:\.\d)?\s?%\)?)?)")
# its limits named after it: "95% CI of B (lower–upper)", "95% CI (LL, UL)"
_LIMITS_NAMED = r"(?:\s*\(\s*(?:lower|LL)\s*(?:[–—,/-]|to)\s*(?:upper|UL)\s*\))?"
# (footnote letters after a p head, glued or spaced, several by commas: "P valuea", "P value a", "P valueb,c"; glued to an
# estimate's or a ratio's head: "Estimatea", "ORa", "IRRa")
_FOOTNOTE = re.compile(rf"(?<=\S)(?:\s*[{_SIGNIFICANCE}]+|(?<=value)\s?[a-f](?:,\s?[a-f])*|(?<=values)\s?[a-f](?:,\s?[a-f])*|(?<=β)[a-d]|(?<=[Ee]stimate)[a-d]|(?<=OR|HR|RR|PR)[a-d])$")
_ROLES = (
    # a column of two tests' values, as medical tables print one test per row: "χ2/Z", "t/χ2 value" — χ² in a categorical
    # variable's rows (its counts), the other test elsewhere (a Mann–Whitney Z, a t)
    (re.compile(r"(?i)(?:χ\s?[²2]|x\s?[²2]|chi2)\s*/\s*(?P<other>[zt])(?:[- ]?values?)?|(?P<first>[zt])\s*/\s*(?:χ\s?[²2]|x\s?[²2]|chi2)(?:[- ]?values?)?"), "mixed"),
    (re.compile(r"(?i)t(?:[- ]?(?:tests?|values?|statistics?|stat))?"), "t"),  # (a spreadsheet's regression output: "t Stat")
    (re.compile(r"F(?:[- ]?(?:values?|ratio)|\s+[Cc]hange)?"), "F"),  # (SPSS's Model Summary: "F Change", "Sig. F Change")
    # (also named in full: "Pearson chi-square statistic", "Chi-square test", as PLOS ONE 2017's Table 1 heads its column)
    (re.compile(r"(?i)(?:pearson(?:'?s)?\s+)?(?:χ\s?[²2]|x\s?[²2]|chi[- ]?squared?)(?:[- ]?(?:values?|statistics?|tests?))?"), "chi2"),
    (re.compile(r"(?i)wald(?:\s?(?:χ\s?[²2]|chi[- ]?squared?|c\s?[²2]))?"), "wald"),  # ("Wald c2": χ² as a copy of Symbol's χ prints it)  # a logistic model's Wald column (SPSS: B, S.E., Wald, df, Sig.)
    # a coefficient with its standard error in one cell, "0.52 (0.21)" under "B (SE)" (regression tables in psychology and
    # sociology; practice)
    (re.compile(r"(?i)(?:b|β|beta|estimate|coefficient|coef\.?)\s*\(\s*S\.?E\.?(?:\s?B)?\s*\)"), "BSE"),  # (also "β (SE)")
    # a coefficient (or a mean difference) with its interval in one cell, "1.9 (0.9, 2.9)" under "β Coefficient (95% CI)",
    # "−.93 (−1.38 to −.58)" under "Coefficient (Bootstrapped 95% CI)", "B [95% CI]" (health and psychology tables; practice)
    (re.compile(rf"(?i)(?:(?:un)?standardi[sz]ed\s+|regression\s+)?(?:b|β|beta|estimates?|coef\.?|coefficients?|(?:β|beta)\s+coefficients?"
                rf"|(?:mean|adjusted|between[- ]group|risk)?\s*diff(?:erence|\.)?|MD)[{_SIGNIFICANCE}a-d]?\s*[(\[]\s*{_INTERVAL_HEAD}\s*[)\]]"
                rf"(?:\s+at\s+\d+\s+(?:weeks|months|days|years))?"), "BCI"),  # ("Adjusted difference* (95% CI) at 12 months": CONSORT's example)
    # an interval in one column, "−7.48, −4.53" or "[0.15, 0.31]" under "95% CI" (of the nearest estimate to its left)
    (re.compile(rf"(?i){_INTERVAL_HEAD}(?:\s+(?:for|of)\s+(?:B|b|β|OR|HR|RR|IRR|PR|odds\s+ratio|hazards?\s+ratio|the\s+(?:mean\s+)?difference|the\s+estimate))?{_LIMITS_NAMED}"), "ci"),
    # a standardised coefficient's column: the table is a model's, whose t has the model's residual df, not a two-group t's
    (re.compile(r"(?i)(?:std\.?\s*|standardi[sz]ed\s+)?(?:β|beta)(?:[\s-](?:coefficients?|weights?))?(?:\s*\(\s*standardi[sz]ed\s*\))?"), "beta"),
    # its coefficient, standard error and odds ratio columns (SPSS: B, S.E., Exp(B); R's summary: Estimate, Std. Error; Stata's
    # and statsmodels': Coef., Std. Err., coef, std err)
    (re.compile(r"B|b|(?i:(?:estimated\s+)?(?:regression\s+)?(?:estimates?|est\.?|coef\.?|coefficients?))"), "B"),
    # the limits of an estimate's interval in two columns: SPSS's "Lower" and "Upper" under "95% Confidence Interval of the
    # Difference", statsmodels' "[0.025" and "0.975]", R's confint "2.5 %" and "97.5 %" (the level: _interval_cells)
    # (also with the interval named before them, as one header row gives both: "95% CI: LL", "95% CI for OR: LL")
    (re.compile(r"(?i)(?:(?:\d{2}(?:\.\d)?\s?%\s?)?CI(?:\s+for\s+[^:]{1,20})?\s*:?\s*)?(?:lower(?:\s+(?:bound|limit))?|LL)|\[0?\.025|2\.5\s?%|\[?0?\.005|0\.5\s?%"
                r"|lower\s+\d{2}(?:\.\d)?\s?%\s?(?:CL|CI|confidence\s+limit)|(?:\d{2}(?:\.\d)?\s?%\s?)?LCL"), "ci_low"),  # ("Lower 95% CL")
    (re.compile(r"(?i)(?:(?:\d{2}(?:\.\d)?\s?%\s?)?CI(?:\s+for\s+[^:]{1,20})?\s*:?\s*)?(?:upper(?:\s+(?:bound|limit))?|UL)|0?\.975\]|97\.5\s?%|0?\.995\]|99\.5\s?%"
                r"|upper\s+\d{2}(?:\.\d)?\s?%\s?(?:CL|CI|confidence\s+limit)|(?:\d{2}(?:\.\d)?\s?%\s?)?UCL"), "ci_high"),
    # a t test's mean difference and its SE (SPSS's Independent Samples and One-Sample Test; jamovi's): t is their ratio
    (re.compile(r"(?i)mean\s+diff(?:erence|\.)?|MD"), "diff"),
    (re.compile(r"(?i)(?:std\.?\s?error|s\.?e\.?)\s+(?:of\s+(?:the\s+)?)?diff(?:erence|\.)?"), "se_diff"),
    (re.compile(r"(?i)S\.?\s?E\.?(?:\s?B)?|Std\.?\s?Err(?:or|\.)?|(?:estimated\s+)?standard\s+errors?(?:\s+of\s+(?:b|beta|β))?|S_?[bβ]"), "SE"),  # ("Sb": S_b, as Chinese journals head it)
    # (crude and adjusted too: "COR", "AOR", "cOR", "aOR", "Adjusted OR", "Crude odds ratio"; and the other ratios of a
    # model's exp(B), a Cox model's "HR", a Poisson model's "Crude IRR" and "Adjusted IRR", "RR", "PR": read only beside an interval)
    (re.compile(r"(?i)exp\s?\(\s?B\s?\)|(?-i:(?!ARR\b))(?:[ac]|crude\s+|adj(?:usted|\.)?\s*)?(?:OR|HR|RR|IRR|PR|(?:estimated\s+)?odds\s+ratio|"
                r"hazards?\s+ratio|risk\s+ratio|relative\s+risk|(?:incidence\s+)?rate\s+ratio|prevalence\s+ratio)"), "expB"),
    (re.compile(r"r"), "r"),
    (re.compile(r"[zZ](?:[- ]?[vV]alues?)?"), "z"),
    # (also with the d its cells give beside it: "P value (Cohen d)" over ".02 (0.65)", as a JMIR table lays it out)
    # (a spreadsheet's regression output heads its F's p "Significance F")
    (re.compile(r"(?:[pP](?:[- ]?[vV]alues?)?|Sig\.?(?:\s*\(2-tailed\)|\s+F\s+[Cc]hange)?|P\s*\(2-tailed\)|Probability|PV|Significance\s+F)(?:\s*\((?:Cohen(?:['’]s)?\s*)?d\))?"), "p"),
    # R's "Pr(>|t|)", "Pr(>|z|)", "Pr(>F)" and "Pr(>Chi)"; Stata's and statsmodels' "P>|t|", statsmodels' "PR(>F)"
    # (and SAS's "Pr > ChiSq", "Pr > |t|", "Pr > F"; "Pr > Χ2" as a journal sets it)
    (re.compile(r"P[rR]?\s?\(?\s?>\s?(?:\|[tzTZ]\||F|[Cc]hi(?:[Ss]q)?|[χΧ]\s?[²2])\s?\)?"), "p"),
    # SPSS's Chi-Square Tests: the asymptotic p of each row's χ² (its Exact Sig. columns, Fisher's and exact tests', are not
    # the χ²'s own p), and its statistics under "Value", each named by its row (_CHI_ROW)
    (re.compile(r"(?i)asymp(?:\.|totic)\s*sig(?:\.|nificance)\s*(?:\(2-sided\))?"), "p"),
    (re.compile(r"(?i)value|(?:test\s+)?statistic"), "value"),  # (jamovi's and JASP's t-test tables: "Statistic", the test named in the row)
    # an F's effect size in a column of its own (SPSS's "Partial Eta Squared"; "η²p", "ηp²", "η²", "ω²"): checked against the F
    (re.compile(r"(?i)partial\s+(?:eta|η)[\s-]?(?:squared|[²2])|η\s?[²2]\s?p|ηp\s?[²2]|η_p\^?2"), "effect:eta2_p"),
    (re.compile(r"(?i)(?:eta|η)[\s-]?(?:squared|[²2])"), "effect:eta2"),
    (re.compile(r"(?i)partial\s+(?:omega|ω)[\s-]?(?:squared|[²2])|ω\s?[²2]\s?(?:p|ₚ)|ωp\s?[²2]|ω_p\^?2"), "effect:omega2_p"),  # (JASP's ω²ₚ)
    (re.compile(r"(?i)(?:omega|ω)[\s-]?(?:squared|[²2])"), "effect:omega2"),
    # a hierarchical regression's steps (SPSS's Model Summary: "R Square", "R Square Change" beside "F Change"): F is
    # (ΔR²/df₁)/((1 − R²)/df₂)
    (re.compile(r"(?i)R[\s-]?(?:square|[²2])\s+change|(?:Δ|∆|delta\s*)\s?R[\s-]?(?:square|[²2])"), "effect:delta_R2"),
    (re.compile(r"(?i)R[\s-]?(?:square|[²2])"), "effect:R2"),
    # and its adjusted R² and multiple R (SPSS's "Adjusted R Square" and "R"): checked against R² and the F's df
    (re.compile(r"(?i)adj(?:usted|\.)?\s*R[\s-]?(?:square|[²2])"), "effect:R2_adj"),
    (re.compile(r"R|(?i:multiple\s+R)"), "effect:R_multiple"),
    # a t's Cohen's d: checked as t/√(df + 1) where the head names it d_z, or the caption or note says the test is a
    # one-sample test (one SD: no other d); a paired test's "Cohen's d" may be d_z or d_av (pingouin's), and is not checked
    (re.compile(r"(?i)(?:cohen'?s\s+)?d_?z"), "effect:d_z"),
    (re.compile(r"(?i)cohen(?:['’]?s\s+|_)d|d"), "effect:d"),  # ("Cohen_d", as R's output names it)
    (re.compile(r"(?i)(?:df|d\.f\.|degrees?\s+of\s+freedom)"), "df"),
    (re.compile(r"(?i)(?:df\s*\(?num(?:erator)?\)?|df1|num(?:erator)?\.? df)"), "df1"),
    (re.compile(r"(?i)(?:df\s*\(?den(?:ominator)?\)?|df2|den(?:ominator)?\.? df)"), "df2"),
    # an ANOVA table's sums of squares and mean squares (SPSS's "Type III Sum of Squares" and "Mean Square", R's "Sum Sq" and
    # "Mean Sq", statsmodels' "sum_sq"): a row's MS is its SS / df, and its F its MS / its error row's MS
    (re.compile(r"(?i)(?:type\s+(?:I{1,3}|[123])\s+)?sums?\s+of\s+squares|SS|sum[\s_]sq|Ssq"), "ss"),
    (re.compile(r"(?i)mean\s+squares?|MS|mean[\s_]sq"), "ms"),
)
_STAT_ROLES = {"t", "F", "chi2", "r", "z", "wald", "U", "mixed:z", "mixed:t"}  # (U: only as a row names it under "Statistic"; mixed: "χ2/Z")
# the test a row of a t-test table names beside its "Statistic" (jamovi's and JASP's layout: "Student's t", "Welch's t",
# "Mann-Whitney U"; practice): the statistic is that test's
_TEST_ROW = {"t": re.compile(r"(?i)\s*(?:student(?:'?s)?|welch(?:'?s)?)(?:\s+t)?\s*"), "U": re.compile(r"(?i)\s*mann[-–\s]?whitney(?:\s+U)?\s*")}
# the rows of SPSS's Chi-Square Tests whose Value is a χ² (footnote letters after their names, as SPSS prints them)
# (jamovi's and JASP's χ² Tests name the row "χ²", "Χ²" or "χ² continuity correction")
_CHI_ROW = re.compile(r"(?i)\s*(?:pearson\s+chi[- ]?square|likelihood\s+ratio|continuity\s+correction|linear[- ]by[- ]linear\s+association"
                      r"|[χΧ]\s?[²2](?:\s+continuity\s+correction)?)[a-d]?\s*")
# a ratio with its 95% CI in one cell under a head such as "OR (95% CI)", "Adjusted ORa (95%CI)c", "Model 1 AOR (95%CI)",
# "HR (95% CI)" (public-health tables; practice): "1.3 (1.0–1.7)", "1.38 (0.92, 2.08)", "1.08 (1.06 to 1.09)*"
# (also spelled out and with the interval's name dotted: "Multivariate Odds Ratio (95% C.I)")
_CI95 = r"\(\s*(?:95\s?%\s?(?:c\.?i\.?s?|confidence\s+intervals?)|c\.?i\.?\s?95\s?%)\s*\)"  # "(95% CI)", "(95%CIs)", "(95% C.I)", "(95% confidence interval)", "(CI95%)"
_RATIO_WORDS = r"or|hr|rr|irr|pr|odds\s+ratio|hazards?\s+ratio|risk\s+ratio|relative\s+risk|incidence\s+rate\s+ratio|prevalence\s+ratio"
_RATIO_HEAD = re.compile(rf"(?i)(?:[\w .,;:-]*\s)?(?P<adj>a|adjusted\s+)?(?P<name>{_RATIO_WORDS})[a-d{_SIGNIFICANCE}]?\s*{_CI95}[a-d{_SIGNIFICANCE}]?")
# (also "95%CIs", "(95% confidence interval)"); a spanner that names the ratio over the columns of several models ("Hazard ratio
# (95% confidence interval)" over "Model 1 | P | Model 2 | P", as JCSM 2015's Table 2 lays it out): its columns' cells are that ratio
_RATIO_SPANNER = re.compile(rf"(?i)(?<![\w])(?P<name>{_RATIO_WORDS})s?\s*{_CI95}")
_RATIO_NAMES = {"odds ratio": "OR", "hazard ratio": "HR", "hazards ratio": "HR", "risk ratio": "RR", "relative risk": "RR", "incidence rate ratio": "IRR",
                "prevalence ratio": "PR"}
_RATIO_CELL = re.compile(rf"\s*(?P<est>\d+(?:[.,]\d+)?)\s*[{_SIGNIFICANCE}a-d]*\s*[(\[]\s*(?P<lo>\d+(?:[.,]\d+)?)\s*(?:[–—−~～-]|to|[,;])\s*"
                         rf"(?P<hi>\d+(?:[.,]\d+)?)\s*[)\]]\s*[{_SIGNIFICANCE}a-d]*\s*")


# a row that names its ratio in its first cell, its outcomes' ratios with their intervals across ("cOR b", "aOR1 c", "HR",
# "Adjusted OR"; footnote letters after it): Genes and Environment 2021's Table 3 lays its odds ratios out so
_RATIO_STUB = re.compile(r"\s*(?P<adj>[ac]|adjusted\s+|crude\s+)?(?P<name>OR|HR|RR|IRR|PR)\d?(?:\s*[a-f†‡§*])?\s*", re.IGNORECASE)


# an estimate's head with its interval ("Crude Estimate (95% CI)", "Adjusted estimate (95% CI)"): a ratio's where the table says of which
_ADJUSTED_SAID = re.compile(r"(?i)\badjusted\b|\bmultivariable\b")
_RATIO_ESTIMATE_HEAD = re.compile(rf"(?i)\s*((?:un)?adjusted|crude|multivariable|univariable)?\s*estimates?\s*{_CI95}\s*")
# the ratio an exp(B) column's head names, and whether adjusted: "AOR", "Adjusted IRR", "cHR", "Hazard ratio" (an odds ratio's otherwise)
_COLUMN_RATIO = re.compile(r"(?i)\s*(?P<adj>[ac](?=(?:or|hr|rr|irr|pr)\b)|adj(?:usted|\.)?\s*|crude\s+)?(?P<name>or|hr|rr|irr|pr|odds\s+ratio|"
                           r"hazards?\s+ratio|risk\s+ratio|relative\s+risk|(?:incidence\s+)?rate\s+ratio|prevalence\s+ratio)\b")
_CI_SAID = re.compile(r"(?i)\b95\s?%\s?(?:CIs?\b|confidence\s+(?:intervals?|limits))")  # a caption's or note's "95% confidence intervals"
# heads over an "x (a, b)" cell that make it something other than a ratio with its interval
_NOT_RATIO_HEAD = re.compile(r"(?i)median|IQR|quartile|\brange|\bmean|\bSD\b|%|percent|\bn\b|count|frequenc|\bmin|\bmax|difference|\bB\b|β|coefficient|estimate")
# a caption or note that says some cells are descriptives ("values are median (IQR)", "mean (95% CI)")
_DESCRIBED = re.compile(r"(?i)median\s*[(\[]|\bIQR\b|interquartile|\bmeans?\s*[(\[±]|\(\s*range\s*\)")

_RATIOS_SAID = re.compile(r"(?i)\b(?:odds|hazards?|risk|rate|prevalence)\s+ratios?\b|\brelative\s+risks?\b")


def _ratio_name(name: str, adjusted: bool) -> str:
    """A ratio's canonical name, "aOR" for an adjusted odds ratio (an IRR keeps its name)."""
    return f"a{name}" if adjusted and name != "IRR" else name


def _column_ratio(head: str) -> str:
    """The canonical name of the ratio an exp(B) column holds, as its head names it ("OR" for "Exp(B)" and "COR")."""
    m = _COLUMN_RATIO.match(head)
    if m is None:
        return "OR"
    name = " ".join(m.group("name").lower().split())
    name = _RATIO_NAMES.get(name, "IRR" if name == "rate ratio" else name.upper())
    return _ratio_name(name, (m.group("adj") or "").strip().lower()[:1] == "a")


def _stub_ratio(m: "re.Match[str]") -> str:
    return _ratio_name(m.group("name").upper(), (m.group("adj") or "").strip().lower() in ("a", "adjusted"))


def _ratio_role(head: str) -> str | None:
    """"ratio:OR" (aOR, HR, aHR, RR, aRR, IRR) for a column of ratios with their 95% CIs, None otherwise."""
    m = _RATIO_HEAD.fullmatch(head)
    if m is None or m.group("adj") == "A" and m.group("name") == "RR":  # ("ARR": an absolute risk reduction as often as an adjusted RR)
        return None
    name = _RATIO_NAMES.get(" ".join(m.group("name").lower().split()), m.group("name").upper())
    adjusted = m.group("adj") is not None or _ADJUSTED_SAID.search(head) is not None
    return f"ratio:{_ratio_name(name, adjusted)}"


def _ratio_cell(text: str, mark: str) -> tuple[Number, Number, Number] | None:
    m = _RATIO_CELL.fullmatch(text)
    if m is None:
        return None
    read = _patterns(mark).to_number
    found = tuple(read(m.group(g), m.start(g)) for g in ("est", "lo", "hi"))
    return found if all(n is not None for n in found) else None  # type: ignore[return-value]
# an error term's row: "Residuals", "Error", "Within groups", and an error named for its stratum as mixed and
# repeated-measures tables name them ("Error (between subjects)", "Error(week)", "Residuals (within)")
_ERROR_ROW = re.compile(r"(?i)\s*(?:residuals?|error|within(?:[- ]groups?)?|within-subjects error)(?:\s*\([^()]{1,60}\))?\s*")
# (a footnote's letter may be any, typed right after the number: "46.19f" under df; "0.68NS*", a p its author calls
# not significant; a capital glued to a number with decimals, "4.005Y" under χ² — not after a whole number, as a stage
# or a grade, "2A", is typed)
_BARE = re.compile(rf"\s*(?P<op>[<>≤≥]\s*)?(?P<num>[-−–]?\s?(?:\d+(?:[.,]\d+)?|[.,]\d+)(?:[eE]\s?[-−+]?\d{{1,3}})?)\s*"
                   rf"(?P<marks>[{_SIGNIFICANCE}]+|[a-d]|(?<=\d)[e-z]|(?<=\d)NS[{_SIGNIFICANCE}]*|(?<=[.,]\d)[A-DF-Z]|(?<=[.,]\d\d)[A-DF-Z]"
                   rf"|(?<=[.,]\d{{3}})[A-DF-Z]|(?<=[.,]\d{{4}})[A-DF-Z])?\s*")
# a model's residual df as R's summary prints them under its coefficients ("Residual standard error: 2.593 on 29 degrees of
# freedom"; "F-statistic: 69.21 on 2 and 29 DF"), when a table's caption or note keeps the line
_RESIDUAL_DF = re.compile(r"\bon\s+(?:\d{1,6}\s+and\s+)?(\d{1,6})\s+(?:degrees\s+of\s+freedom|DF)\b")
_NS = re.compile(r"(?i)\s*n\.?\s?s\.?\s*")
# "n = 30", "(n = 4928)", "n = 22,608" (a thousands comma: an n is whole; the digits held, not backtracked, so that "n =
# 22,608" is no n of 2 and "N = 100,5" none at all)
_SIZE = re.compile(r"(?<![\w])[nN]\s*=\s*(\d{1,3}(?:,\d{3})+|\d{1,6}+)(?![\d.,]\d)")
# a note's (or caption's) marks of significance: "*p < .05. **p < .01. ***p < .001.", "† p < .10", "^p < .10", "* P ≤ 0.05"
_STAR_SAID = re.compile(rf"(?<![{_SIGNIFICANCE}\w])([{_SIGNIFICANCE}]{{1,4}})\s*[pP]\s*([<≤])\s*(0?[.,]\d+)")


# the next definition in a list after one with its p, the p left out: "***P < 0.01, ** < 0.05, * < 0.1" (PMC7868910's note)
_STAR_LISTED = re.compile(rf"\s*[,;]\s*([{_SIGNIFICANCE}]{{1,4}})\s*(?:[pP]\s*)?([<≤])\s*(0?[.,]\d+)")


def note_cells(cells: "Sequence[tuple[int, int, Unit, list[Reported]]]") -> str:
    """The text of a table's cells that are its note, typed in its own rows as some authors do: a cell that starts
    "Note" or defines a mark ("*p < .05")."""
    return " ".join(unit.text for _, _, unit, _ in cells if unit.text.lstrip().startswith("Note") or _STAR_SAID.search(unit.text))


def undefined_marks(cells: "Sequence[tuple[int, int, Unit, list[Reported]]]", said: str) -> "tuple[Unit, list[str]] | None":
    """The first cell whose number carries a mark of significance ("−.32**", "2.10†") that the caption and note
    (``said``) do not define — in any words: "*p < .05", "† adjusted for age" — and every such mark, in order; None
    where each mark used is defined (APA 7 §7.14: a table's probability note defines its asterisks). Not a p's own
    mark, in a column a head names p."""
    marked: list[tuple[int, str, Unit]] = []
    for _, c, unit, _ in cells:
        if any(ch in unit.text for ch in _SIGNIFICANCE):  # (a fast scan: most cells carry no mark)
            m = _BARE.fullmatch(unit.text)
            marks = m.group("marks") if m is not None else None
            if marks and marks[0] in _SIGNIFICANCE:
                marked.append((c, marks.translate(ONE_STAR), unit))
    if not marked:
        return None
    columns = {c for c, _, _ in marked}  # (a p marked as well says its own level: not asked)
    p_columns = {c for _, c, unit, _ in cells if c in columns and _role(unit.text) == "p"}
    first: dict[str, Unit] = {}
    for c, marks, unit in marked:
        if c not in p_columns:
            first.setdefault(marks, unit)
    if not first:
        return None
    defined = said.translate(ONE_STAR)
    words = defined.lower()  # (marks defined in words: "significant correlations are marked with an asterisk", "daggers: adjusted")
    defined += (" * ** ***" if "asterisk" in words else "") + (" † ‡ ††" if "dagger" in words else "")
    missing = [k for k in first if re.search(rf"(?<!{re.escape(k[-1])}){re.escape(k)}(?!{re.escape(k[-1])})", defined) is None]
    if not missing:
        return None
    return next(first[k] for k in first if k in missing), sorted(missing, key=lambda k: (k[0], len(k)))  # (said as "*, **, ***")


def star_bounds(text: str, mark: str) -> dict[str, tuple[str, Number]]:
    """The p bound each mark stands for, as a table's note or caption defines it ("**p < .01": "**" → ("<", .01)); in a
    list after a definition with its p, the p may be left out ("***P < 0.01, ** < 0.05")."""
    out: dict[str, tuple[str, Number]] = {}
    for first in _STAR_SAID.finditer(text):
        m: "re.Match[str] | None" = first
        while m is not None:
            number = _patterns(mark).to_number(m.group(3), 0)
            if number is not None and 0 < number.value < 1:
                out.setdefault(m.group(1).translate(ONE_STAR), (m.group(2), number))
            m = _STAR_LISTED.match(text, m.end())
    return out


_MARKS = str.maketrans("", "", "#¶‖∆ᵃᵇᶜᵈ")  # footnote marks authors put inside a head: "P# value", "P∆ value"


# a head whose cells give the statistic with its df, "t test (df)" over "3.48 (33)", "F (df)" over "4.21 (1, 38)" (public-health
# and psychiatry tables: JMIR 2024;26:e53001, Table 3); its cells read by _VALUE_DF
_DF_IN_HEAD = re.compile(r"(?i)\s*\(\s*(?:df|d\.f\.)\s*\)\s*$")
# a head that gives the column's df itself, "F-ratio (1, 18)", "t (38)", "χ2 (2)" (PMC5826355, Table 3)
_DFS_IN_HEAD = re.compile(r"\s*\(\s*(?P<df>\d+(?:\.\d+)?)(?:\s*[,;]\s*(?P<df2>\d+(?:\.\d+)?))?\s*\)\s*$")


def _head_dfs(text: str) -> tuple[Number, ...]:
    """The df a column's head gives, "F-ratio (1, 18)": (1, 18); () for none."""
    m = _DFS_IN_HEAD.search(_head_text(text))
    if m is None:
        return ()
    return tuple(Number(m.group(g), float(m.group(g)), len(m.group(g).partition(".")[2]), 0, 0) for g in ("df", "df2") if m.group(g) is not None)


_VALUE_DF = re.compile(rf"\s*(?P<op>[<>≤≥]\s*)?(?P<num>[-−–]?\s?(?:\d+(?:[.,]\d+)?|[.,]\d+))\s*[{_SIGNIFICANCE}]*\s*\(\s*(?P<df>\d+(?:\.\d+)?)"
                       rf"(?:\s*[,;]\s*(?P<df2>\d+(?:\.\d+)?))?\s*\)\s*(?:[{_SIGNIFICANCE}]+|[a-d])?\s*"
                       r"(?:[,;]\s*(?=[pP]\s*[<>=≤≥]).*)?")  # (and its p after it in the cell: "460.10 (105), p < .001", a model's χ² test of fit)


def _value_df(text: str, mark: str) -> "tuple[tuple[str, Number], tuple[Number, ...]] | None":
    """A cell's statistic and its df, "3.48 (33)" or "4.21 (1, 38)" (under a head such as "t test (df)")."""
    m = _VALUE_DF.fullmatch(text)
    if m is None:
        return None
    read = _patterns(mark).to_number
    value, dfs = read(m.group("num"), m.start("num")), [read(m.group(g), m.start(g)) for g in ("df", "df2") if m.group(g) is not None]
    if value is None or any(d is None for d in dfs):
        return None
    return ((m.group("op") or "=").strip(), value), tuple(dfs)  # type: ignore[arg-type]


def _head_text(text: str) -> str:
    """A column head without footnote marks."""
    return _FOOTNOTE.sub("", text.translate(_MARKS).strip()).strip()


def _role(text: str) -> str | None:
    head = _head_text(text)
    if head.endswith(")"):  # (every cell of every row is asked: the df suffixes only where one can stand)
        if head[:1] == "(" and head.count("(") == 1:  # a head in parentheses, as its cells are: "(95% CI)" over "(0.98 - 1.16)"
            head = head[1:-1].strip()
        head = _DFS_IN_HEAD.sub("", _DF_IN_HEAD.sub("", head))
    for pattern, role in _ROLES:
        m = pattern.fullmatch(head)
        if m is not None:
            return role if role != "mixed" else f"mixed:{(m.group('other') or m.group('first')).lower()}"
    return _ratio_role(head) if "95" in head else None


def sizes_in(text: str) -> list[int]:
    """The ``n = …``/``N = …`` numbers in a text, in order."""
    return [int(m.group(1).replace(",", "")) for m in _SIZE.finditer(text)]


_PER_GROUP = re.compile(r"(?i)\s*(?:per|in each|each)\b")


def _totals(text: str) -> list[int]:
    """Every total (``N = 42``) a caption or note gives."""
    return [int(m.group(1).replace(",", "")) for m in _SIZE.finditer(text) if m.group(0).lstrip()[0] == "N"]


# what stands before a test's own N inside its parentheses, "χ²(1, N = 80)": that test's sample, not the caption's
_OWN_N = re.compile(r"[(\[]\s*\d+(?:[.,]\d+)?\s*[,;]\s*$")


def caption_sizes(text: str) -> tuple[list[int], int | None]:
    """Group sizes (``n = 30``; ``n = 21 per group`` is two of 21) and the
    total (``N = 42``) a caption or paragraph gives (not a χ²'s own N, inside
    its parentheses)."""
    groups, total = [], None
    for m in _SIZE.finditer(text):
        if _OWN_N.search(text, max(0, m.start() - 16), m.start()):
            continue
        n = int(m.group(1).replace(",", ""))
        if m.group(0).lstrip()[0] == "N":
            total = n if total is None else max(total, n)
        else:
            groups.append(n)
            if _PER_GROUP.match(text, m.end()):
                groups.append(n)
    return groups, total


@dataclass(frozen=True, slots=True)
class Reading:
    df: tuple[float, ...]
    assumption: str  # how the df was read: "df = 45 + 45 − 2 (Student's t; the group sizes in the table)"
    df_high: float | None = None  # a df anywhere from df[0] to this (Welch's t: from the smaller group's n − 1 to n₁ + n₂ − 2)
    guessed: bool = False  # from an N of the paragraph or the text before, not given with the statistic: the test may be a subgroup's


# heads that name occasions rather than groups ("Pre-test (n = 30) | Post-test (n = 30)", "Baseline | Follow-up"): the
# same people measured again
OCCASIONS = re.compile(r"(?i:\bpre-?(?:test|treatment|intervention)?\b|\bpost|baseline|follow[- ]?up|\bbefore\b|\bafter\b|\btimes?\b|"
                       r"\bweeks?\b|\bmonths?\b|\bvisits?\b|\bT[0-3]\b)")
# a t's design as its column's head (or the caption or note) names it: a paired test's df are a group's n − 1 — the
# header's sizes are its occasions' ("Baseline (N = 41) | Follow-up (N = 36) | Paired t Test"), not two groups' —; a
# model's t (ANCOVA, regression, adjusted for covariates) has its residual df, which no group size gives
_PAIRED_SAID = re.compile(r"(?i)\bpaired|(?<!in)dependent[- ]samples?|\brepeated[- ]measures?|\bwithin[- ]subjects?|\brelated[- ]samples?")
_MODEL_SAID = re.compile(r"(?i)\bANCOVA|\bregression|\bmixed[- ]model|\blinear[- ]model|\bGLM\b|\bmultilevel|\bcovariates?\b|\badjusted")
_DESIGN_SAID = re.compile(f"{_PAIRED_SAID.pattern}|{_MODEL_SAID.pattern[4:]}", re.IGNORECASE)  # either (the search asked first)


def design_readings(symbol: str, head: str, said: str, groups: Sequence[int], total: int | None, where: str,
                    guessed: bool = False, head_is: str = "its column's head") -> "tuple[Reading, ...] | None":
    """The df a t without df may have where its column's ``head`` (a sentence's: the words around it) names its design
    (or, for a paired test, the caption or note, ``said``): a model's t none; a paired t a group's n − 1, each size
    given (or N − 1). None where neither names one. ``guessed``: the sizes are not given with the statistic."""
    if symbol != "t":
        return None
    design = _DESIGN_SAID.search(head)  # (one pass over the head: most name neither)
    if design is not None and _MODEL_SAID.search(head):
        return ()
    paired = design is not None and _PAIRED_SAID.search(head) is not None
    if not paired and (not said or _PAIRED_SAID.search(said) is None or _MODEL_SAID.search(said) is not None):
        return None
    named = head_is if paired else "the caption or note"
    sizes = list(dict.fromkeys(n for n in groups if n >= 2)) or ([total] if total is not None and total >= 2 else [])
    return tuple(Reading((n - 1.0,), f"df = {n} − 1 (a paired t, as {named} says; n {where})", guessed=guessed) for n in sizes)


def df_readings(symbol: str, groups: Sequence[int], total: int | None, where: str, welch: bool = False,
                total_guessed: bool = False, groups_guessed: bool = False, total_where: str | None = None) -> list[Reading]:
    """The df a t or r without df may have, from group sizes and a total N;
    each reading says what it assumes. A t said to be Welch's has its df
    anywhere from the smaller group's n − 1 to n₁ + n₂ − 2 (one reading, a
    range, from two group sizes; none without them). ``total_guessed``,
    ``groups_guessed``: the N, the group sizes, are not given with the
    statistic (its paragraph's, the text's before, a table's body text above);
    ``total_where``, where the N is when not where the group sizes are."""
    said = total_where or where
    out: list[Reading] = []
    if symbol == "t" and welch:
        if len(groups) >= 2 and min(groups[:2]) >= 2:
            low, high = min(groups[:2]) - 1.0, groups[0] + groups[1] - 2.0
            return [Reading((low,), f"Welch's df, somewhere from {low:g} (the smaller group's n − 1) to {high:g} (n₁ + n₂ − 2); "
                                    f"the group sizes {where}", high, groups_guessed)]
        return []
    if symbol == "t":
        if len(groups) == 2:
            a, b = groups
            out.append(Reading((a + b - 2.0,), f"df = {a} + {b} − 2 = {a + b - 2} (Student's t; the group sizes {where})", guessed=groups_guessed))
        if len(groups) == 1:
            out.append(Reading((groups[0] - 1.0,), f"df = {groups[0]} − 1 (one-sample or paired t; n {where})", guessed=groups_guessed))
        if total is not None and total > 2:
            out.append(Reading((total - 2.0,), f"df = N − 2 = {total - 2} (two independent groups; N {said})", guessed=total_guessed))
            out.append(Reading((total - 1.0,), f"df = N − 1 = {total - 1} (one-sample or paired t; N {said})", guessed=total_guessed))
    elif symbol in ("r", "rs") and total is not None and total > 2:
        out.append(Reading((total - 2.0,), f"df = N − 2 = {total - 2} (N {said})", guessed=total_guessed))
    seen, unique = set(), []
    for r in out:
        if r.df not in seen:
            seen.add(r.df)
            unique.append(r)
    return unique


@dataclass(frozen=True, slots=True)
class TableStatistic:
    unit: Unit  # the cell the statistic is in (its value's cell for a row statistic)
    rep: Reported  # what the checks see: p and df from sibling cells included
    local: Reported | None  # the statistic as typed in its cell (for the style checks), None for a row of bare numbers
    how: str  # where its parts were found
    readings: tuple[Reading, ...] = ()
    coefficient: "Ratio | None" = None  # a Wald's B and SE from their columns (checked: Wald = (B / SE)², OR = exp(B)); a t's mean difference and SE
    squares: "Squares | None" = None  # an ANOVA row's SS and MS and its error row's (checked: MS = SS / df, F = MS / MS error)


def _number(text: str, mark: str) -> tuple[str, Number] | None:
    m = _BARE.fullmatch(text)
    if m is None:
        return None
    typed = m.group("num")
    if " " in typed:  # "4.462e -4", as JASP's exported tables space a power of ten
        typed = re.sub(r"(?<=[eE])\s", "", typed)
    num = _patterns(mark).to_number(typed, m.start("num"))
    if num is None:
        return None
    return (m.group("op") or "=").strip(), num


_P_AND_D = re.compile(r"(?P<p>\s*[<>≤≥]?\s*(?:\d+(?:[.,]\d+)?|[.,]\d+))\s*\(\s*[-−–]?\s?(?:\d+(?:[.,]\d+)?|[.,]\d+)\s*\)\s*")


def _p_cell(text: str, mark: str) -> PValue | None:
    if _NS.fullmatch(text):
        return PValue("ns", None, 0, len(text), 0, text.strip())
    both = _P_AND_D.fullmatch(text) if "(" in text else None  # ".02 (0.65)": the p, its effect size beside it
    found = _number(text[: both.end("p")] if both is not None else text, mark)
    if found is None or not 0 <= found[1].value <= 1:
        return None
    op, num = found
    return PValue(op, num, num.start, num.end, num.start, "")


def _own_column(roles: dict[int, str], column: int, role: str) -> int | None:
    """The column of ``role`` (p, df …) that belongs to the statistic in ``column``: one between it and the statistic
    columns on either side, the nearest to its right first (SPSS's Independent Samples Test puts Levene's F and its
    Sig. before the t and its df and "Sig. (2-tailed)": each statistic its own), else the nearest to its left."""
    stats = sorted(k for k, v in roles.items() if v in _STAT_ROLES or v == "value")
    before = max((k for k in stats if k < column), default=-1)
    after = min((k for k in stats if k > column), default=1 << 30)
    right = [k for k in sorted(roles) if column < k < after and roles[k] == role]
    left = [k for k in sorted(roles) if before < k < column and roles[k] == role]
    return right[0] if right else left[-1] if left else None


_ANCHORS = ("B", "diff", "BSE", "BCI", "beta")  # the estimate a model's columns begin with


def _model_columns(roles: dict[int, str], column: int) -> tuple[int, int] | None:
    """Where the columns of the model holding ``column`` begin and end, in a table of several models side by side: each
    model's columns begin with its estimate ("Depression: B | SE | t value | 95% CI | Self-efficacy: B | SE | …", World
    J Psychiatry 2026; "Crude: B | SE | Wald | p | OR | 95% CI | Adjusted: B | …"), the first estimate's head the table
    has, repeated; None where it has one model (or the column stands before the first)."""
    first = min((k for k, v in roles.items() if v in _ANCHORS), default=None)
    if first is None:
        return None
    anchors = sorted(k for k, v in roles.items() if v == roles[first])
    i = bisect.bisect_right(anchors, column) - 1
    if len(anchors) < 2 or i < 0:
        return None
    return anchors[i], anchors[i + 1] if i + 1 < len(anchors) else 1 << 30


_LAST_ESTIMATES: list = [None, -1, {}]  # (the roles, the column, their estimate columns): a statistic's cells ask twice


def _estimate_columns(roles: dict[int, str], column: int) -> dict[str, int]:
    """The columns of the estimate's roles (B, SE, Exp(B) …) that belong to the statistic in ``column``, by role: among
    its model's columns (_model_columns) where the table has several, else between it and the statistic columns on either
    side; of each role the nearest to its left first (a model's B and SE stand before its t), else the nearest to its
    right (SPSS's Exp(B) after its Wald)."""
    if _LAST_ESTIMATES[0] is roles and _LAST_ESTIMATES[1] == column:
        return _LAST_ESTIMATES[2]  # type: ignore[no-any-return]
    group = _model_columns(roles, column)
    if group is not None:
        before, after = group[0] - 1, group[1]
    else:
        stats = [k for k, v in roles.items() if v in _STAT_ROLES or v == "value"]
        before = max((k for k in stats if k < column), default=-1)
        after = min((k for k in stats if k > column), default=1 << 30)
    left: dict[str, int] = {}
    right: dict[str, int] = {}
    for k in sorted(roles):
        if before < k < column:
            left[roles[k]] = k  # (the nearest to its left: the last one)
        elif column < k < after:
            right.setdefault(roles[k], k)  # (the nearest to its right: the first one)
    found = {**right, **left}
    _LAST_ESTIMATES[:] = [roles, column, found]
    return found


# the sub-rows of SPSS's repeated-measures tables: an effect's F and its error term, each under the same correction
_CORRECTION = re.compile(r"(?i)\s*(sphericity\s+assumed|greenhouse[-–\s]?geisser|huynh[-–\s]?feldt|lower[-–\s]?bound)\s*")


def _correction(row) -> str:  # type: ignore[no-untyped-def]
    """The correction a row's first or second cell names ("greenhouse-geisser"), "" for none (an empty cell is no
    unit: the row of a correction under its effect or error term starts at its second cell)."""
    for c in (1, 2):
        m = _CORRECTION.fullmatch(row[c][0].text) if c in row else None
        if m:
            return re.sub(r"[-–\s]+", "-", m.group(1).lower())
    return ""


# an ANOVA row's sum of squares, df and mean square, its error row's, and whether the error row's own are checked with it
# (each None where the table does not give it; the error row's own SS and MS with the first effect it serves only: its slip
# is found once)
Squares = tuple["Number | None", "Number | None", "Number | None", "Number | None", "Number | None", "Number | None", bool]
# an error term, as _error_dfs reads it: its row, its df, the df of each correction's row under it, and its row's SS and MS
_ErrorTerm = tuple[int, "float | None", dict[str, "float | None"], "tuple[Number | None, Number | None]"]
_WITHIN = re.compile(r"(?i)\s*within")


def _error_dfs(rows, roles: dict[int, str], mark: str) -> list[_ErrorTerm]:  # type: ignore[no-untyped-def]
    """The table's error terms (Residuals, Error, Within rows) in order: (row, df, the df of each correction, the
    row's SS and MS) — an error term takes the rows under it that name only a correction (SPSS's "Error(time)" and its
    Greenhouse-Geisser, Huynh-Feldt and Lower-bound rows); each df from the df column. A "Within" row followed by an
    Error or Residual row is no error term: a repeated-measures table splits the within variance into the subjects'
    and the error's ("Between treatments | Within | Between subjects | Error")."""
    column = next((k for k, v in roles.items() if v == "df"), None)
    squares = [next((k for k, v in roles.items() if v == role), None) for role in ("ss", "ms")]
    out: list[_ErrorTerm] = []
    open_block = False
    for r in sorted(rows):
        row = rows[r]
        first = row[min(row)][0].text  # (an empty cell is no unit: SPSS's "Residual" under "1 | Regression" is in the second column)
        found = _number(row[column][0].text, mark) if column in row else None
        df = found[1].value if found is not None else None
        if _ERROR_ROW.fullmatch(first):
            if out and _WITHIN.match(rows[out[-1][0]][min(rows[out[-1][0]])][0].text) and not _WITHIN.match(first):
                out.pop()  # (the within variance, split further below)
            ss, ms = (_number(row[k][0].text, mark) if k in row else None for k in squares)
            out.append((r, df, {_correction(row): df} if _correction(row) else {}, (ss[1] if ss else None, ms[1] if ms else None)))
            open_block = True
        elif open_block and _CORRECTION.fullmatch(first):  # a correction's row under the error term
            out[-1][2].setdefault(_correction(row), df)
        else:
            open_block = False
    return out


def _error_term(errors: list[_ErrorTerm], r: int) -> _ErrorTerm | None:
    """The error term of the effect in row ``r``: the first below the effect (an effect's error follows its effects:
    "Error (between subjects)" after the between-subjects effects, R's Residuals last), else the last above."""
    if not errors:
        return None
    k = bisect.bisect_right(errors, r, key=lambda e: e[0])
    return errors[k] if k < len(errors) else errors[-1]


def _error_df(errors: list[_ErrorTerm], r: int, correction: str) -> float | None:
    """The df of the error term of the effect in row ``r`` (_error_term) — its row of the effect's correction when the
    effect names one (a Greenhouse-Geisser F takes the Greenhouse-Geisser error df; None when the error term has no such
    row), else its first row."""
    term = _error_term(errors, r)
    if term is None:
        return None
    _, df, corrected, _ = term
    return corrected.get(correction) if correction else df


_TOTAL_HEAD = re.compile(r"(?i)\s*(?:total|overall|all|whole sample|sample)\b")  # a column of all groups together, no group
# a count with its percent, "287 (5.7%)", "2331 (80.4)", "12,513 (55.3%)" (counts.py reads a variable's block of them)
WHOLE_COUNT = r"\d{1,3}(?:[,\u202f\u00a0 ]\d{3})+|\d+"  # a count, its thousands set off or not: "12,513", "12 513", "287"
COUNT_CELL = re.compile(rf"\s*(?P<n>{WHOLE_COUNT})\s*\(\s*(?P<pct>\d+(?:[.,]\d+)?)\s*%?\s*\)\s*")
_WHOLE_CELL = re.compile(rf"\s*({WHOLE_COUNT})\s*")


def whole_count(text: str) -> int | None:
    """A cell that is a whole count alone ("120", "1,204", "12 513"), as a number; None for any other."""
    m = _WHOLE_CELL.fullmatch(text)
    return int(re.sub(r"\D", "", m.group(1))) if m is not None else None


def paired_heads(row: "dict[int, Unit]", first: "re.Pattern[str]", second: "re.Pattern[str]") -> dict[int, int]:
    """A header row's columns of one kind, each with its partner's column next to it — a count's with its percent's
    ("Number | %"), a mean's with its SD's ("M | SD") —, each head matching its pattern with the same group's name
    before it or none ("Urban n | Urban %"); only where the row pairs two groups or more so."""
    columns = sorted(row)
    pairs = {a: b for a, b in zip(columns, columns[1:]) if (x := first.fullmatch(row[a].text)) is not None
             and (y := second.fullmatch(row[b].text)) is not None and x.group("group").lower() == y.group("group").lower()}
    return pairs if len(pairs) >= 2 else {}


def cell_grid(cells: Sequence[tuple[int, int, Unit, list[Reported]]]) -> dict[int, dict[int, Unit]]:
    """A table's cells by row and column (counts.py and means.py read them so)."""
    rows: dict[int, dict[int, Unit]] = {}
    for r, c, unit, _ in cells:
        rows.setdefault(r, {})[c] = unit
    return rows


# a row whose label says it gives a mean and SD, a median and IQR or a range: "45 (12)" is no count and its percent
NOT_COUNTS = re.compile(r"(?i)\bmean\b|\bSD\b|median|\bIQR\b|interquartile|\brange\b|±|\bM\s*\(")
# and row labels that say a row is not ratios: those, or counts ("Age, median (IQR)", "n (%)" — not a category's own "%",
# "≥400% FPL")
_NOT_RATIO_ROW = re.compile(rf"{NOT_COUNTS.pattern}|quartile|\(\s*%\s*\)|\bcount|frequenc")


# what says a table's "45.3 (6.2)" cells are means with their SDs: "M (SD)", "Mean (SD)", "means (standard deviations)",
# "means and SDs", "M/SD"
MEANS_SAID = re.compile(r"(?i)\b(?:M|means?)\s*\(\s*(?:SDs?|S\.\s?D\.|standard\s+deviations?)\s*\)|\bmeans?\s+and\s+(?:SDs?|standard\s+deviations?)\b|"
                        r"\bM\s*/\s*SD\b")


def count_cell(text: str) -> tuple[int, float, float] | None:
    """A cell's count and its percent with the percent's half unit, "287 (5.7%)": (287, 5.7, 0.05); None for a cell that
    is not a count with its percent."""
    m = COUNT_CELL.fullmatch(text)
    if m is None:
        return None
    pct = m.group("pct").replace(",", ".")
    return int(re.sub(r"\D", "", m.group("n"))), float(pct), 0.5 * 10.0 ** -len(pct.partition(".")[2])


def _named_test(row: "dict[int, tuple[Unit, list[Reported]]]", column: int) -> str:
    """The test a cell before ``column`` names ("Student's t", "Welch's t", "Mann-Whitney U"), or ""."""
    for k in sorted(row):
        if k >= column:
            break
        text = row[k][0].text
        for symbol, pattern in _TEST_ROW.items():
            if pattern.fullmatch(text):
                return symbol
    return ""


_ESTIMATES = {"B", "diff", "expB", "beta", "BSE", "BCI", "effect:eta2_p", "effect:eta2", "effect:d", "effect:d_z", "effect:R2", "effect:delta_R2"}  # what an interval can be of
_LEVEL_IN_HEAD = {"[.025": 0.95, "[0.025": 0.95, "2.5%": 0.95, "[.005": 0.99, "[0.005": 0.99, ".005": 0.99, "0.005": 0.99, "0.5%": 0.99}
_FOR_B = re.compile(r"(?i)(?:interval|CI)\s+(?:for|of)\s+B\b")
_LEVEL_SAID = re.compile(r"(?<![\d.])(\d{2}(?:\.\d)?)\s?%")
_SIGNED = {".": r"[-−–]?\s?(?:\d+(?:\.\d+)?|\.\d+)", ",": r"[-−–]?\s?(?:\d+(?:,\d+)?|,\d+)"}
# an interval's two limits in a cell, "−7.48, −4.53", "[0.15, 0.31]", "(−1.38 to −.58)", "0.15–0.31", "− 0.522–4.054",
# "(-0.015_0.027)" (as published tables print them; practice); with a decimal comma the limits are never parted by a comma
_LIMITS = {mark: rf"(?P<lo>{n})%?\s*(?:{'' if mark == ',' else ',|'};|to|[–—−~～_-])\s*(?P<hi>{n})%?" for mark, n in _SIGNED.items()}
_INTERVAL_CELL = {mark: re.compile(rf"\s*[(\[]?\s*{limits}\s*[)\]]?\s*[{_SIGNIFICANCE}a-d]*\s*") for mark, limits in _LIMITS.items()}
_ESTIMATE_INTERVAL_CELL = {mark: re.compile(rf"\s*(?P<est>{_SIGNED[mark]})%?\s*[{_SIGNIFICANCE}a-d]*\s*[(\[]\s*{limits}\s*[)\]]\s*[{_SIGNIFICANCE}a-d]*\s*")
                           for mark, limits in _LIMITS.items()}
_MEAN_DIFFERENCE = re.compile(r"(?i)\s*(?:(?:mean|adjusted|between[- ]group|risk)?\s*diff|MD\b)")
_MEAN_DIFF_NAMED = re.compile(r"(?i)\s*(?:mean\s+diff|MD\b)")  # a difference its head calls a mean difference


def _cell_interval(text: str, mark: str, with_estimate: bool = False) -> "tuple[Number, ...] | None":
    """A cell's interval, (low, high), or with ``with_estimate`` an estimate and its interval, "1.9 (0.9, 2.9)":
    (estimate, low, high); None when the cell is not one."""
    m = (_ESTIMATE_INTERVAL_CELL if with_estimate else _INTERVAL_CELL)[mark if mark in _SIGNED else "."].fullmatch(text)
    if m is None:
        return None
    read = _patterns(mark).to_number
    found = tuple(read(m.group(g), m.start(g)) for g in (("est", "lo", "hi") if with_estimate else ("lo", "hi")))
    return None if any(n is None for n in found) else found  # type: ignore[return-value]


def _owner(roles: dict[int, str], at: int) -> int | None:
    """The column of the estimate an interval's column at ``at`` is of: the nearest estimate column to its left."""
    return max((k for k, r in roles.items() if k < at and r in _ESTIMATES), default=None)


def _interval_column(roles: dict[int, str], column: int, role: str) -> int | None:
    """The column of an interval's ``role`` (ci, ci_low, ci_high) that belongs to the statistic in ``column``: the nearest
    whose estimate (_owner) is the statistic's own (_estimate_columns) — the interval before the t in "B | SE | 95% CI |
    t | p" twice over, the one after it in "B | SE | t | 95% CI" twice over —; else as _own_column finds it."""
    mine: list[int] = []
    if role in roles.values():
        columns = _estimate_columns(roles, column)
        own = {columns[r] for r in ("B", "diff", "expB", "beta") if r in columns}
        mine = [k for k, r in roles.items() if r == role and _owner(roles, k) in own]
    return min(mine, key=lambda k: abs(k - column)) if mine else _own_column(roles, column, role)


def _interval_cells(row, roles: dict[int, str], numbers, heads: dict[int, str], column: int, said: str,  # type: ignore[no-untyped-def]
                    mark: str = ".") -> "tuple[Interval, str, int, Number | None, str] | None":
    """The interval of the estimate beside the statistic in ``column``: its limits in two columns of their own, in one
    column ("95% CI": "−7.48, −4.53"), or in the estimate's own cell ("β Coefficient (95% CI)": "1.9 (0.9, 2.9)"); with the
    role and column of the estimate it is of — the nearest estimate to the left of the limits: a mean difference ("diff"), a
    coefficient ("B"), an odds ratio ("expB"); not an effect size's — and the estimate where the cell gives it. The level
    comes from the limits' head ("[0.025", "2.5 %", "95% CI") or else the one level the header, caption or note names ("95%
    Confidence Interval of the Difference"). None without limits, an estimate or a level, and for a bootstrap interval
    (its head says so), which need not agree with the test's p nor hold the estimate. Last, where it was read."""
    lo, hi = _interval_column(roles, column, "ci_low"), _interval_column(roles, column, "ci_high")
    one = _interval_column(roles, column, "ci")
    both = column if roles.get(column) == "BCI" else _own_column(roles, column, "BCI")  # (a table of estimates with their intervals alone)
    estimate = None
    if lo is not None and hi is not None and lo in row and hi in row and numbers.get(lo) is not None and numbers.get(hi) is not None:
        if numbers[lo][0] != "=" or numbers[hi][0] != "=":
            return None
        low, high, at, where = numbers[lo][1], numbers[hi][1], lo, "the interval's columns"
    elif one is not None and one in row and (limits := _cell_interval(row[one][0].text, mark)) is not None:
        (low, high), at, where = limits, one, "the interval's column"
    elif both is not None and both in row and (read := _cell_interval(row[both][0].text, mark, with_estimate=True)) is not None:
        estimate, low, high = read
        at, where = both, "the interval beside the estimate"
    else:
        return None
    head = heads.get(at, "")
    if "bootstrap" in head.lower():
        return None
    if at == both:
        owner: int | None = both
        role = "diff" if _MEAN_DIFFERENCE.match(head) else "B"
    else:
        owner = _owner(roles, at)  # the estimate to its left
        if owner is not None and roles[owner] == "beta" and _FOR_B.search(f"{head} {said}"):  # SPSS's "95.0% Confidence Interval for B" after Beta
            owner = max((k for k, r in roles.items() if k < at and r == "B"), default=None)
        alone = roles.get(owner) == "beta" and {"B", "BSE"}.isdisjoint(roles.values())  # a β with no B in the table: its own interval
        if owner is None or (roles[owner] not in ("B", "diff", "expB") and not alone):
            return None
        role = roles[owner]
        estimate = numbers[owner][1] if owner in row and numbers.get(owner) is not None else None
    level = _LEVEL_IN_HEAD.get(head.replace(" ", ""))
    if level is None:
        own = _LEVEL_SAID.search(head) if at != lo else None
        named = {float(own.group(1))} if own is not None else {float(m.group(1)) for m in _LEVEL_SAID.finditer(said)}
        if len(named) != 1:
            return None
        level = named.pop() / 100
    if not 0.5 <= level < 1:
        return None
    return Interval(level, low, high, low.start, high.end), role, owner, estimate, where  # type: ignore[return-value]


_DF_SAID = re.compile(r"(?<![\w.])(?:df|d\.f\.)\s*=\s*(\d{1,6})(?![\d.,]\d)")


def _said_df(said: str, pattern: re.Pattern[str] = _DF_SAID, how: str = "as the table's caption or note gives them") -> tuple[Reading, ...]:
    """The one df a table's caption or note gives its statistics ("Note: df= 58"; with _RESIDUAL_DF a model's residual
    df, "on 29 degrees of freedom"), as a reading; () unless exactly one."""
    found = {m.group(1) for m in pattern.finditer(said)}
    if len(found) != 1:
        return ()
    (df,) = found
    return (Reading((float(df),), f"df = {df} ({how.format(df=df)})"),)


def _residual_readings(said: str) -> tuple[Reading, ...]:
    """The residual df a model table's caption or note gives (one value): its t's df."""
    return _said_df(said, _RESIDUAL_DF, "the model's residual df, as the caption or note gives them: \u201con {df} degrees of freedom\u201d")


ONE_COEFFICIENT = Reading((1.0,), "df = 1 (the Wald test of one coefficient: its B and SE beside it)")
ONE_COEFFICIENT_B = Reading((1.0,), "df = 1 (the Wald test of one coefficient: its B beside it)")


_VALUE_SE = re.compile(rf"\s*(?P<b>[-−–]?\s?(?:\d+(?:[.,]\d+)?|[.,]\d+))\s*[{_SIGNIFICANCE}]*\s*\(\s*(?P<se>\d+(?:[.,]\d+)?|[.,]\d+)\s*\)\s*[{_SIGNIFICANCE}]*\s*")


def _value_se(text: str, mark: str) -> "tuple[Number | None, Number | None]":
    """A coefficient and its SE in one cell, "0.52 (0.21)" under "B (SE)"; (None, None) when the cell is not one."""
    m = _VALUE_SE.fullmatch(text)
    read = _patterns(mark).to_number
    return (read(m.group("b"), m.start("b")), read(m.group("se"), m.start("se"))) if m else (None, None)


def _p_after(p: "PValue | None", at: int) -> "PValue | None":
    """A p cell's p placed after its statistic's last part (its own cell's offsets would put it first), as the row reads."""
    return None if p is None else replace(p, start=at + 2, end=at + 2 + p.end - p.start, symbol_start=at + 2)


def _ratio_statistic(name: str, shown: str, estimate: Number, ci: Interval, p: "PValue | None", end: int) -> Reported:
    """A ratio with its interval and p from a table's row, as one statistic without a head: "OR = 1.52, 95% CI [1.10,
    2.10], p = .01"; ``end``, where it ends in the estimate's cell (the interval's end when the cell holds it too)."""
    rep = Reported(None, "", estimate.start, estimate.start, end, p=_p_after(p, end),
                   effects=[Effect(name, estimate, estimate.start, end, estimate.start, shown, ci)])
    rep.text = f"{shown} = {estimate.text}, {ci.level * 100:g}% CI [{ci.low.text}, {ci.high.text}]{p_text(p)}"
    return rep


def _coefficient_cells(row, roles: dict[int, str], numbers, mark: str, heads: "dict[int, str] | None",  # type: ignore[no-untyped-def]
                       column: int) -> "tuple[Ratio | None, list[Effect]]":
    """A Wald row's (or a t's or z's, in ``column``) B and SE, and its Exp(B) as an odds ratio, from their columns (each
    the statistic's own: _estimate_columns), or B and SE from one cell under "B (SE)"; a t test's mean difference and its SE."""
    cols = {}
    for role, k in _estimate_columns(roles, column).items():
        if role in ("B", "SE", "expB", "diff", "se_diff", "beta", "BCI", "BSE") and k in row and (numbers.get(k) is not None or role in ("BCI", "BSE")):
            cols[role] = k
    if "B" not in cols and "beta" in cols and "SE" in cols and {"B", "BSE", "BCI"}.isdisjoint(roles.values()):
        cols["B"] = cols["beta"]  # a β with the SE of β beside it ("Beta Weight (Standardized) | Standard Error of Beta | t-value"): t = β / SE
    if "diff" in cols and "se_diff" in cols:  # a t test's row: t = mean difference / its SE
        return (numbers[cols["diff"]][1], numbers[cols["se_diff"]][1], ("mean difference", "SE")), []
    joint = cols.pop("BCI", None)
    if "B" not in cols and "diff" not in cols and joint is not None and ("SE" in cols or "se_diff" in cols):  # "1.9 (0.9, 2.9)" under "B (95% CI)"
        read = _cell_interval(row[joint][0].text, mark, with_estimate=True)
        if read is None:
            return None, []
        se = numbers[cols.get("SE", cols.get("se_diff"))][1]  # type: ignore[index]
        return ((read[0], se, ("mean difference", "SE")) if _MEAN_DIFFERENCE.match((heads or {}).get(joint, "")) else (read[0], se)), []
    both = cols.pop("BSE", None)
    if ("B" not in cols or "SE" not in cols) and both is not None:  # "0.52 (0.21)" under "B (SE)"
        b_se = _value_se(row[both][0].text, mark)
        return (b_se, []) if None not in b_se else (None, [])  # type: ignore[return-value]
    if "B" not in cols or "SE" not in cols:
        return None, []
    b, se = numbers[cols["B"]][1], numbers[cols["SE"]][1]
    if roles.get(cols["B"]) == "beta":
        return (b, se, ("β", "SE")), []
    effects = []
    if "expB" in cols:
        ratio = numbers[cols["expB"]][1]
        name = (heads or {}).get(cols["expB"], "Exp(B)").strip() or "Exp(B)"  # as the table heads it: "Exp(B)", "OR"
        effects.append(Effect("OR", ratio, ratio.start, ratio.end, ratio.start, name, None))
    return (b, se), effects


def _beta_as_log_odds(rows, roles: dict[int, str], mark: str) -> dict[int, str] | None:  # type: ignore[no-untyped-def]
    """The roles with the β column read as a logistic model's B where the table has a β and an odds ratio column and no B,
    and the odds ratio is exp(β) in at least two thirds of its rows (and two or more: "β | SE | OR | 95% CI", as health
    journals print a logistic model); None otherwise — a standardized β beside an odds ratio is no B."""
    beta = [c for c, role in roles.items() if role == "beta"]
    odds = [c for c, role in roles.items() if role == "expB"]
    if len(beta) != 1 or len(odds) != 1 or "B" in roles.values():
        return None
    fits = tried = 0
    for row in rows.values():
        b, o = (_number(row[c][0].text, mark) if c in row else None for c in (beta[0], odds[0]))
        if b is None or o is None or b[0] != "=" or o[0] != "=" or abs(b[1].value) > 50:
            continue
        tried += 1
        fits += _is_exp(b[1], o[1])
    return {c: "B" if role == "beta" else role for c, role in roles.items()} if tried >= 2 and 3 * fits >= 2 * tried else None


def _is_exp(b: Number, ratio: Number) -> bool:
    """Whether a printed ratio can be exp of a printed coefficient, each standing for what its digits allow."""
    return math.exp(b.value - b.half_unit) - ratio.half_unit <= ratio.value <= math.exp(b.value + b.half_unit) + ratio.half_unit


def _log_odds_beside(rows, roles: dict[int, str], mark: str) -> int | None:  # type: ignore[no-untyped-def]
    """The column of a logistic model's coefficients beside its one column of ratios with their intervals ("β | Wald c2 | P
    value | OR (95% CI)"): a β or B column whose exp is the ratio in at least two thirds of the rows (and two or more);
    None otherwise (a standardized β beside a ratio is no log odds)."""
    betas = [c for c, role in roles.items() if role in ("beta", "B")]
    ratios = [c for c, role in roles.items() if role.startswith("ratio:")]
    if len(betas) != 1 or len(ratios) != 1:
        return None
    fits = tried = 0
    for row in rows.values():
        b = _number(row[betas[0]][0].text, mark) if betas[0] in row else None
        cell = _ratio_cell(row[ratios[0]][0].text, mark) if ratios[0] in row else None
        if b is None or cell is None or b[0] != "=" or abs(b[1].value) > 50:
            continue
        tried += 1
        fits += _is_exp(b[1], cell[0])
    return betas[0] if tried >= 2 and 3 * fits >= 2 * tried else None


_BETA_HEAD = re.compile(r"(?i)\s*(?:β|beta)\b")  # a "β (SE)" head: its coefficients are named β, as the table names them


def _bare_coefficients(row, roles: dict[int, str], numbers, heads: dict[int, str], said: str, mark: str,  # type: ignore[no-untyped-def]
                       stars: "dict[str, tuple[str, Number]] | None" = None) -> list[TableStatistic]:
    """A model's coefficients in a table without a test column (B, SE, 95% CI, β, p: health and psychology journals'
    usual layout; practice): each estimate column — B, "B (SE)", "B (95% CI)", a mean difference — with the SE, interval
    and p after it up to the next one (models side by side), read as the estimate with its interval and p, and its B and
    SE (checked: the interval holds the estimate and agrees with the p; the p follows from B / SE under some df); an
    interval after an odds ratio column is the odds ratio's. A row without a p or an interval is not read."""
    out = []
    starts = (sorted(k for k, role in roles.items() if role in ("B", "BSE", "BCI", "diff")) or sorted(k for k, role in roles.items() if role == "expB")
              or sorted(k for k, role in roles.items() if role == "beta"))  # (a table of β alone, "β | 95% CI | p")
    if starts and roles[starts[0]] != "expB":  # a ratio column after an estimate whose own interval stands between them is another
        for k in sorted(c for c, role in roles.items() if role == "expB"):  # model's ("Estimate | 95% CI | P | OR | 95% CI | P | IRR | …",
            before = max((c for c in starts if c < k), default=None)  # a linear, a logistic and a count model side by side)
            if before is not None and (roles[before] == "BCI" or any(roles[c] == "ci" for c in roles if before < c < k)):
                starts.append(k)
        starts.sort()
    for i, k in enumerate(starts):
        end = starts[i + 1] if i + 1 < len(starts) else 1 << 30
        if k not in row:
            continue
        part = {c: role for c, role in roles.items() if k <= c < end}
        estimate = se = None
        if roles[k] == "BSE":
            estimate, se = _value_se(row[k][0].text, mark)
        elif roles[k] == "BCI":
            both = _cell_interval(row[k][0].text, mark, with_estimate=True)
            estimate = both[0] if both is not None else None
        elif numbers.get(k) is not None and numbers[k][0] == "=":
            estimate = numbers[k][1]
        if estimate is None:
            continue
        se_col = next((c for c in sorted(part) if part[c] in ("SE", "se_diff")), None)
        if se is None and se_col is not None and se_col in row and numbers.get(se_col) is not None and numbers[se_col][0] == "=":
            se = numbers[se_col][1]
        p_col = next((c for c in sorted(part) if part[c] == "p"), None)
        p = _p_cell(row[p_col][0].text, mark) if p_col is not None and p_col in row else None
        interval = _interval_cells(row, part, numbers, heads, k, said, mark)
        if interval is not None and interval[1] == "expB":  # an odds ratio and its interval: the ratio's (null 1)
            ratio = numbers[interval[2]][1] if interval[2] in row and numbers.get(interval[2]) is not None else None
            if ratio is None or numbers[interval[2]][0] != "=":
                continue
            name = _head_text(heads.get(interval[2], "OR")) or "OR"  # (without its footnote letter: "ORa")
            marked = None
            if p is None and stars:  # the bound the ratio's, its interval's or its B's marks stand for ("1.29 | (1.18 - 1.40)**", "0.497** | … | 1.643")
                limits = _own_column(part, k, "ci")
                marked = _marked_bound(row[interval[2]][0].text + (" " + row[limits][0].text if limits in row else "")
                                       + (" " + row[k][0].text if k != interval[2] else "")
                                       + (" " + row[p_col][0].text if p_col in row else ""), stars, ratio.end)  # (a p column of marks: "*")
            rep = _ratio_statistic(_column_ratio(name), name, ratio, interval[0], p or (marked[0] if marked else None), ratio.end)
            unit, how = row[interval[2]][0], f"the {name} column, {interval[4]}" + (", the B and SE columns" if se is not None else "")
            how += f", its {marked[1]}" if marked else ""
        else:
            if (p is None and interval is None) or roles[k] == "expB":  # (an odds ratio without its interval: a p alone)
                continue
            diff = roles[k] == "diff" or _MEAN_DIFFERENCE.match(heads.get(k, "")) is not None
            name = ("mean difference" if _MEAN_DIFF_NAMED.match(heads.get(k, "")) or roles[k] == "diff" else "difference") if diff \
                else "β" if roles[k] == "beta" or _BETA_HEAD.match(heads.get(k, "")) else "B"
            rep = Reported(None, "", estimate.start, estimate.start, estimate.end, p=_p_after(p, estimate.end))
            rep.text = f"{name} = {estimate.text}" + (f", SE = {se.text}" if se is not None else "")
            if interval is not None:
                rep.ci, rep.estimate = interval[0], estimate
                rep.text += f", {rep.ci.level * 100:g}% CI [{rep.ci.low.text}, {rep.ci.high.text}]"
            ratio_col = next((c for c in sorted(part) if part[c] == "expB"), None) if interval is None and roles[k] in ("B", "BSE") else None
            if ratio_col is not None and ratio_col in row and numbers.get(ratio_col) is not None and numbers[ratio_col][0] == "=":
                shown = _head_text(heads.get(ratio_col, "")) or "OR"  # its exp(B) beside it without an interval ("b (SE) | IRR | p")
                ratio = numbers[ratio_col][1]
                rep.effects = [Effect(_column_ratio(shown), ratio, ratio.start, ratio.end, ratio.start, shown)]
                rep.estimate = estimate  # (the row's B: no record takes it, so no suggestion restyles the ratio without it)
                rep.text += f", {shown} = {ratio.text}"
            else:
                ratio_col = None
            rep.text += p_text(p)
            unit = row[k][0]
            how = f"the {_head_text(heads.get(k, name)) or name} column" + (", its SE" if se is not None else "") + (f", {interval[4]}" if interval else "") \
                + (f", the {_head_text(heads.get(ratio_col, ''))} column" if ratio_col is not None else "")
        how += ", the p column" if p is not None else ""
        # (an odds ratio's row: its B and SE too — not where the ratio itself starts the row: "OR | SE | 95% CI | p", as
        # Stata's logistic prints it, has no B, and its SE may be the ratio's own)
        coefficient = (estimate, se) if roles[k] != "expB" and (se is not None or rep.effects) else None  # (an odds ratio's B alone: exp(B))
        out.append(TableStatistic(unit, rep, None, f"read from the table's row: {how} (no test column)", (), coefficient))
    return out


_MARKS_IN = re.compile(rf"[{_SIGNIFICANCE}]+")


def _marked_bound(text: str, stars: "dict[str, tuple[str, Number]]", at: int) -> "tuple[PValue, str] | None":
    """The p bound the marks in ``text`` stand for, as the table's note defines them ("(1.18 - 1.40)**" with "**P <
    .0001"), with the reading said; None without a defined mark."""
    m = _MARKS_IN.search(text)
    bound = stars.get(m.group().translate(ONE_STAR)) if m is not None else None
    if bound is None:
        return None
    return PValue(bound[0], bound[1], at, at, at, ""), f"{m.group()} ({m.group()}p {bound[0]} {bound[1].text}, as the table defines it)"  # type: ignore[union-attr]


_SHOWN = {"eta2_p": "η²p", "eta2": "η²", "d": "d", "d_z": "d_z", "R2": "R²", "delta_R2": "ΔR²", "R2_adj": "adjusted R²", "R_multiple": "R", "omega2_p": "ω²p", "omega2": "ω²"}  # an effect column's symbol in a reading
_ONE_SAMPLE = re.compile(r"(?i)\bone[- ]sample")  # a one-sample t test: its d is the mean over the one SD, t/√n


def _effect_cells(row, roles: dict[int, str], numbers, column: int, names: Sequence[str], one_sample: bool = False) -> list[Effect]:  # type: ignore[no-untyped-def]
    """The effect sizes ``names`` in their own columns beside the statistic in ``column`` (those up to the next
    statistic's); a one-sample test's d is t/√n, as a d_z is."""
    out = []
    for name in names:
        k = _own_column(roles, column, f"effect:{name}")
        if k is not None and k in row and numbers.get(k) is not None and numbers[k][0] == "=":
            number = numbers[k][1]
            out.append(Effect("d_z" if name == "d" and one_sample else name, number, number.start, number.end, number.start, _SHOWN[name], None))
    return out


def _limits_under(rows: "dict[int, dict[int, tuple[Unit, list[Reported]]]]", order: Sequence[int], r: int, c: int,
                  header: "dict[int, tuple[Unit, list[Reported]]]", mark: str) -> bool:
    """Whether an interval's head at column ``c`` of header row ``r`` stands over two columns of limits: it spans two (a
    merged cell), or the head after it is empty; and the first row below with numbers has a bare number in each."""
    head = header[c][0]
    if head.columns != 2 and c + 1 in header and header[c + 1][0].text.strip():
        return False
    below = next((rows[k] for k in order if k > r and any(_number(u.text, mark) for u, _ in rows[k].values())), None)
    return below is not None and all(k in below and _number(below[k][0].text, mark) is not None for k in (c, c + 1))


def table_statistics(cells: Sequence[tuple[int, int, Unit, list[Reported]]], caption: str, mark: str,
                     stars: "dict[str, tuple[str, Number]] | None" = None, said: str = "", welch: bool = False,
                     labelled: bool = True) -> tuple[list[TableStatistic], set[int]]:
    """The statistics of one table: ``cells`` are (row, column, unit, the
    statistics the text parser found in it); ``stars``, the p bounds its note
    gives its marks (``star_bounds``): a statistic marked so, without a p of
    its own, has that bound for its p; ``said``, the caption and note (a
    correlation matrix's N); ``welch``, whether they say the t tests are
    Welch's (a t without df then has the df range Welch's test allows);
    ``labelled``, whether the caption is the table's own ("Table 3 …"), not
    body text above it, whose N and group sizes may be another sample's: a df
    read from them is a guess (`Reading.guessed`). Returns the statistics and the ids of
    parsed statistics that became part of another (a lone p in the cell
    after a statistic)."""
    rows: dict[int, dict[int, tuple[Unit, list[Reported]]]] = {}
    for r, c, unit, reps in cells:
        rows.setdefault(r, {})[c] = (unit, reps)
    roles: dict[int, str] = {}
    with_df: set[int] = set()  # the columns whose head says their cells give the df ("t test (df)")
    head_dfs: dict[int, tuple[Number, ...]] = {}  # the df a column's head gives ("F-ratio (1, 18)")
    groups, total = caption_sizes(caption)
    groups_guessed = not labelled  # (until a row of the table gives its own)
    occasions = False  # the heads that gave the group sizes name occasions: a t may be a paired one
    found: list[TableStatistic] = []
    used: set[int] = set()
    error_dfs: dict[int, list[_ErrorTerm]] = {}
    squares_checked: set[tuple[int, int]] = set()  # the error rows whose own SS and MS have been checked (with their first effect)
    log_odds: dict[int, dict[int, str] | None] = {}  # each header's roles with its β read as a logistic B, where the table shows it is one
    log_odds_ratio: dict[int, int | None] = {}  # each header's β (or B) column whose exp its one column of ratios is
    header_above = False  # the row before was a header row
    wordy = ""  # the text of the rows without numbers just above (a spanner's "95% Confidence Interval of the Difference")
    heads: dict[int, str] = {}  # each column's head as typed
    levels_said = ""  # the header's text and the caption's and note's, for an interval's level
    ratios_said = _RATIOS_SAID.search(f"{caption} {said}") is not None  # a table of odds, hazard or risk ratios
    kinds = {" ".join(m.group().lower().rstrip("s").split()) for m in _RATIOS_SAID.finditer(f"{caption} {said}")} if ratios_said else set()
    said_ratio = next(iter(kinds)) if len(kinds) == 1 else None  # the one kind of ratio the caption or note names: an "Estimate (95% CI)"'s
    note_df = _said_df(f"{caption} {said}")
    named = _ratio_role(f"{'adjusted ' if _ADJUSTED_SAID.search(caption) else ''}{said_ratio} (95% CI)") \
        if said_ratio is not None and _CI_SAID.search(f"{caption} {said}") and not _DESCRIBED.search(f"{caption} {said}") else None
    caption_ratio = named.removeprefix("ratio:") if named is not None else None  # the ratio the caption names with its 95% CI
    words_above: dict[int, str] = {}  # each column's words in the rows without numbers above (its head, a spanner's)
    spanned: dict[int, str] = {}  # the ratio a spanner in the row above names, for each column it spans
    width = max((c + row_cells[0].columns - 1 for r in rows for c, row_cells in rows[r].items()), default=0)  # the table's columns
    in_body = False
    residual_row: tuple[Reading, ...] = ()  # the last model ANOVA's residual df above (a spreadsheet's regression output gives its
    order = sorted(rows)  # ANOVA, then its coefficients: their t's df)
    for r in order:
        row = rows[r]
        numbers = {c: _number(u.text, mark) for c, (u, _) in row.items()}
        df_col = next((k for k, v in roles.items() if v == "df"), None) if "F" in roles.values() else None
        if df_col is not None and df_col in row and numbers[df_col] is not None and _ERROR_ROW.fullmatch(row[min(row)][0].text):
            residual_row = (Reading((numbers[df_col][1].value,), f"the model's residual df, {numbers[df_col][1].text}: its ANOVA's "  # type: ignore[index]
                                                                  f"{row[min(row)][0].text.strip()} row in the table"),)
        header = {c: None if numbers[c] is not None else _role(u.text) for c, (u, _) in row.items()}  # (a number is no head)
        if spanned:  # a head under a ratio's spanner in the row above ("Model 1" under "Hazard ratio (95% CI)"): that ratio's column
            for c, (u, _) in row.items():
                if header[c] is None and numbers[c] is None and c in spanned:
                    header[c] = _ratio_role(f"{_head_text(u.text)} {spanned[c]} (95% CI)")
        if said_ratio is not None:  # "Crude Estimate (95% CI)" in a table its caption calls odds ratios (IJERPH 2018's Table 2)
            for c, (u, _) in row.items():
                estimate = _RATIO_ESTIMATE_HEAD.fullmatch(u.text) if header[c] is None and numbers[c] is None else None
                if estimate is not None:
                    header[c] = _ratio_role(f"{estimate.group(1) or ''} {said_ratio} (95% CI)")
        spanned = {}
        if "effect:R_multiple" in header.values() and sum(role is not None for role in header.values()) == 1:
            header = dict.fromkeys(header)  # a lone "R" is a label (a block's, a side's), not a multiple R's head
        stat_cells = {c for c, role in header.items() if role is not None}
        heads_in_row = any(rep.symbol is not None for _, reps in row.values() for rep in reps)
        if not heads_in_row and not any(v is not None for v in numbers.values()):
            wordy += " " + " ".join(u.text for u, _ in row.values())
            if in_body:  # a header's rows after the body's: the heads of another block
                words_above, in_body = {}, False
            for c, (u, _) in row.items():
                spanner = _RATIO_SPANNER.search(u.text) if "95" in u.text else None
                name = spanner.group("name") if spanner is not None else \
                    said_ratio if said_ratio is not None and "95" in u.text and _RATIO_ESTIMATE_HEAD.fullmatch(u.text) else None
                if name is not None and _ADJUSTED_SAID.search(u.text):  # ("Adjusted Estimate (95% CI)" over "Model 1 | Model 2")
                    name = f"adjusted {name}"
                for k in range(c, c + u.columns):  # (a spanner's words over each column it spans)
                    words_above[k] = f"{words_above.get(k, '')} {u.text}"
                if name is not None:  # a ratio's spanner also over the empty cells after it (a pipe table, which cannot
                    after = next((k for k in sorted(row) if k > c), width + 1)  # merge cells, leaves its span so)
                    spanned.update(dict.fromkeys(range(c, max(c + u.columns, after)), name))
        else:
            in_body = True
        if stat_cells and not heads_in_row and not any(v is not None for v in numbers.values()):
            heads = {**heads, **{c: row[c][0].text for c in stat_cells}} if header_above else {c: row[c][0].text for c in stat_cells}
            levels_said = f"{wordy} {said}"
            # a header row (also one partway down the table): heads and no number (a row of a predictor named "X2" is data);
            # the second row of a two-row header adds its heads to the first's (SPSS's Coefficients: "t", "Sig." above,
            # "B", "Std. Error" under "Unstandardized Coefficients" below)
            found_heads = {c: role for c, role in header.items() if role is not None}
            for c in [c for c, role in found_heads.items() if role == "ci"]:  # an interval's head over its two limits' columns
                if _limits_under(rows, order, r, c, row, mark):  # (SAS's "95% Wald Confidence Limits", merged over two)
                    found_heads[c], found_heads[c + 1] = "ci_low", "ci_high"
            if "paired differences" in wordy.lower():  # SPSS's Paired Samples Test: the differences' mean and its SE
                for c, (u, _) in row.items():
                    named = " ".join(u.text.lower().split())
                    if named in ("mean", "std. error mean", "std error mean", "se mean"):
                        found_heads[c] = "diff" if named == "mean" else "se_diff"
                        stat_cells.add(c)
            roles = {**roles, **found_heads} if header_above else found_heads
            heads_df = {c for c in found_heads if found_heads[c] in _STAT_ROLES and _DF_IN_HEAD.search(row[c][0].text)}
            with_df = (with_df - set(found_heads)) | heads_df if header_above else heads_df
            given = {c: _head_dfs(row[c][0].text) for c in found_heads if found_heads[c] in _STAT_ROLES}
            head_dfs = {**{c: d for c, d in head_dfs.items() if c not in found_heads}, **given} if header_above else given
            header_above = True
        else:
            header_above = False
        if heads_in_row or any(v is not None for v in numbers.values()):
            wordy = ""
        cell_dfs: dict[int, tuple[Number, ...]] = {}
        cell_ps: dict[int, PValue] = {}  # a p typed after the value and its df in the same cell
        for c in with_df & set(row):
            read = _value_df(row[c][0].text, mark)
            if read is not None:
                numbers[c], cell_dfs[c] = read
                lone = next((o for o in row[c][1] if o.symbol is None and o.p is not None and not o.effects), None)
                if lone is not None:
                    cell_ps[c] = lone.p
                    used.add(id(lone))  # (read as the statistic's p: not a lone p of its own)
        # a model's coefficients table; or a table of odds ratios with their intervals or p in columns of their own ("Odds
        # ratio | 95% CI | P value"; "OR | 95% CI | p Value" for each of three models side by side)
        coefficients = not {"B", "SE", "BSE", "BCI", "beta"}.isdisjoint(roles.values()) or (
            "expB" in roles.values() and not {"ci", "ci_low", "p"}.isdisjoint(roles.values()))
        ratios = {c: _ratio_cell(row[c][0].text, mark) for c, role in roles.items() if role.startswith("ratio:") and c in row}
        stub = _RATIO_STUB.fullmatch(row[min(row)][0].text) if not any(ratios.values()) and (
            roles.get(min(row)) == "expB" or ratios_said) else None  # (not a heart rate's "HR" row of a table of descriptives)
        if stub is not None:  # the row names its ratio, the columns their outcomes ("cOR | 2.19 (1.46–3.28) | < 0.001 | …")
            ratios = {c: _ratio_cell(row[c][0].text, mark) for c in sorted(row)[1:]}
        elif caption_ratio is not None and not any(ratios.values()) and set(roles.values()) <= {"p"} and not _NOT_RATIO_ROW.search(row[min(row)][0].text):
            # the caption names one ratio with its 95% CI, the heads the outcomes or models ("(yes vs. no) | (undecided vs.
            # no)" under "odds ratios and 95% confidence intervals"): a cell "5.68*** (2.63,12.25)" under a head that names
            # nothing else (not a median's IQR, a mean's interval, a count), in a row whose label does not either, in a table
            # whose heads name no other column than a p, is that ratio
            ratios = {c: _ratio_cell(row[c][0].text, mark) for c in sorted(row)[1:] if c not in roles and not _NOT_RATIO_HEAD.search(words_above.get(c, ""))}
        if not heads_in_row and not any(v is not None for c, v in numbers.items() if roles.get(c) in _STAT_ROLES or roles.get(c) == "value") and not any(ratios.values()):
            if coefficients and not any(role in _STAT_ROLES or role == "value" for role in roles.values()):  # no test column
                if id(roles) not in log_odds:
                    log_odds[id(roles)] = _beta_as_log_odds(rows, roles, mark)
                found += _bare_coefficients(row, log_odds[id(roles)] or roles, numbers, heads, levels_said, mark, stars)
                continue
            sizes = [n for u, _ in row.values() for n in sizes_in(u.text)]
            if sizes:
                groups, groups_guessed = sizes, False
                occasions = OCCASIONS.search(" ".join(u.text for u, _ in row.values())) is not None
            continue
        # a ratio and its CI in one cell, its p in the next p column to the right (a crude and an adjusted pair side by side),
        # or in the one just before it where each ratio column has its p before it and none comes after the last ("P | OR
        # (95% CI) | P | Adjusted OR (95% CI)", as a family medicine journal lays it out)
        ratio_cols = [k for k in sorted(ratios) if ratios[k] is not None] if stub is not None or not any(r.startswith("ratio:") for r in roles.values()) \
            else [k for k in sorted(roles) if roles[k].startswith("ratio:")]
        p_cols = [k for k in sorted(roles) if roles[k] == "p"]
        p_before = bool(ratio_cols) and bool(p_cols) and p_cols[-1] < ratio_cols[-1] and all(
            any(a < k < b for k in p_cols) for a, b in zip([-1] + ratio_cols, ratio_cols))
        for c, cell in ratios.items():
            if cell is None:
                continue
            estimate, low, high = cell
            unit = row[c][0]
            if p_before:
                p_col = max(k for k in p_cols if k < c)
            else:
                p_col = next((k for k in p_cols if k > c), None)
                later = next((k for k in ratio_cols if k > c), None)
                if p_col is not None and later is not None and later < p_col:
                    p_col = None  # the p beyond the next ratio column is that one's
            p = _p_cell(row[p_col][0].text, mark) if p_col is not None and p_col in row else None
            name = _stub_ratio(stub) if stub is not None else roles[c].removeprefix("ratio:") if c in roles else caption_ratio or "OR"
            marked = _marked_bound(unit.text, stars, high.end) if p is None and p_col is None and stars else None  # "1.29 (1.18–1.40)**"
            rep = _ratio_statistic(name, name, estimate, Interval(0.95, low, high, low.start, high.end), p or (marked[0] if marked else None), high.end)
            if stub is None and id(roles) not in log_odds_ratio:
                log_odds_ratio[id(roles)] = _log_odds_beside(rows, roles, mark)
            beta_col = log_odds_ratio.get(id(roles)) if stub is None else None
            beta = numbers.get(beta_col) if beta_col is not None and beta_col in row else None
            coefficient = (beta[1], None) if beta is not None and beta[0] == "=" else None  # (held to exp(B): coefficient_p)
            found.append(TableStatistic(unit, rep, None, f"read from the table's row: the {name} (95% CI) " + ("its row names" if stub else "column")
                                        + (", the p column" if p else "")
                                        + (f", its {marked[1]}" if marked else "")
                                        + (f", the {_head_text(heads.get(beta_col, 'B'))} column (its exp the ratio)" if coefficient and beta_col is not None else ""), (), coefficient))
        # a statistic whose value sits alone under a head named t, F, χ², r or z
        for c, role in roles.items():
            by_row = role == "value"
            if by_row:  # a χ² when its row names one
                role = "chi2" if _CHI_ROW.fullmatch(row[min(row)][0].text) else _named_test(row, c)
            elif role.startswith("mixed:"):  # "χ2/Z": χ² in a categorical variable's row — counts in it, or it names the variable
                # (nothing but its test) and the row after it has counts —, the other test elsewhere
                counted = any(COUNT_CELL.fullmatch(u.text) for u, _ in row.values()) and not NOT_COUNTS.search(row[min(row)][0].text)
                if not counted and not any(u.text.strip() for k, (u, _) in row.items() if k not in (min(row), c) and roles.get(k) != "p"):
                    k = bisect.bisect_right(order, r)
                    after = rows[order[k]] if k < len(order) else {}
                    counted = any(COUNT_CELL.fullmatch(u.text) for u, _ in after.values())
                role = "chi2" if counted else role[6:]
            if role not in _STAT_ROLES or numbers.get(c) is None or c not in row:
                continue
            op, value = numbers[c]  # type: ignore[misc]
            unit = row[c][0]
            p_col = _own_column(roles, c, "p")
            p = cell_ps.get(c) or (_p_cell(row[p_col][0].text, mark) if p_col is not None and p_col in row else None)
            df: tuple[Number, ...] = ()
            how = (f"the {role if role != 'chi2' else 'χ²'} column" if not by_row else
                   f"the Value column (a χ² as its row, {row[min(row)][0].text.strip()}, names it)" if role == "chi2" else
                   f"the Statistic column (a {role}: the test its row names)")
            k = _own_column(roles, c, "df")
            if c in cell_dfs:
                df = cell_dfs[c]
                how += " with its df"
            elif head_dfs.get(c):
                df = head_dfs[c]
                how += " with the df its head gives"
            elif k is not None and k in row and numbers.get(k) is not None:
                df = (numbers[k][1],)  # type: ignore[index]
                how += ", the df column"
            k1, k2 = (_own_column(roles, c, name) for name in ("df1", "df2"))
            if k1 in row and k2 in row and numbers.get(k1) is not None and numbers.get(k2) is not None:  # type: ignore[operator]
                df = (numbers[k1][1], numbers[k2][1])  # type: ignore[index]
                how += ", the df(num) and df(den) columns"
            if role == "F" and len(df) == 1 and id(roles) not in error_dfs:  # once per header, not once per row
                error_dfs[id(roles)] = _error_dfs(rows, roles, mark)
            error_df = _error_df(error_dfs[id(roles)], r, _correction(row)) if role == "F" and len(df) == 1 else None
            if error_df is not None:
                df = (df[0], Number(f"{error_df:g}", error_df, 0, 0, 0))
                how += ", the error row's df"
            squares = None
            if role == "F" and df and ("ss" in roles.values() or "ms" in roles.values()):
                ss, ms = (numbers.get(k) if k in row else None for k in (_own_column(roles, c, "ss"), _own_column(roles, c, "ms")))
                own = (ss[1] if ss else None, df[0], ms[1] if ms else None)
                term = _error_term(error_dfs.get(id(roles), []), r) if not _correction(row) else None  # (a corrected row's error MS is its own)
                if term is not None and term[1] is not None:
                    first_use = (id(roles), term[0]) not in squares_checked
                    squares_checked.add((id(roles), term[0]))
                    squares = (*own, term[3][0], Number(f"{term[1]:g}", term[1], 0, 0, 0), term[3][1], first_use)
                else:
                    squares = (*own, None, None, None, False)
            if p is not None:
                how += ", its p in the same cell" if c in cell_ps else ", the p column"
            elif stars:  # "3.10**" with "**p < .01" in the note: p < .01
                marks = _BARE.fullmatch(unit.text)
                bound = stars.get((marks.group("marks") or "").translate(ONE_STAR)) if marks is not None else None
                if bound is not None:
                    p = PValue(bound[0], bound[1], value.end, value.end, value.end, "")
                    how += f", its {marks.group('marks')} ({marks.group('marks')}p {bound[0]} {bound[1].text}, as the table defines it)"  # type: ignore[union-attr]
            coefficient, effects = _coefficient_cells(row, roles, numbers, mark, heads, c) if role in ("wald", "t", "z") else (None, [])
            effects = effects if role in ("wald", "z") else []  # (a linear model's row has no odds ratio; a logistic one's z has)
            if role in ("F", "t"):
                effects = _effect_cells(row, roles, numbers, c, ("eta2_p", "eta2", "omega2_p", "omega2", "R2", "delta_R2", "R2_adj", "R_multiple") if role == "F" else ("d", "d_z"),
                                        _ONE_SAMPLE.search(said) is not None)
                how += "".join(f", the {e.symbol_text} column" for e in effects)
            if coefficient is not None:
                how += (", the mean difference and its SE columns" if len(coefficient) == 3 else ", the B and SE columns") + \
                    "".join(f", the {e.symbol_text} column" for e in effects if e.name == "OR")
            symbol = "chi2" if role == "wald" else role
            label = {"chi2": "χ²", "wald": "Wald"}.get(role, role)
            if role == "F" and "change" in heads.get(c, "").lower():  # SPSS's "F Change": a step's F, the style's ΔF
                label = "ΔF"
            rep = Reported(symbol, label, value.start, value.start, value.end, df, None, op, value, p, effects=effects)
            interval = _interval_cells(row, roles, numbers, heads, c, levels_said, mark) if role in ("t", "z", "wald") else None
            if interval is not None and interval[1] == "expB" and rep.effects and rep.effects[-1].name == "OR":  # the odds ratio's
                rep.effects[-1] = replace(rep.effects[-1], ci=interval[0])
                how += f", the odds ratio's {interval[4].removeprefix('the ')}"
            elif interval is not None and interval[1] != "expB" and role != "wald":  # the mean difference's or coefficient's
                rep.ci, rep.estimate = interval[0], interval[3]
                how += f", {interval[4]}"
            rep.text = statistic_text(label, df, op, value, p) + "".join(
                f", {e.symbol_text} = {e.number.text}" + (f", {e.ci.level * 100:g}% CI [{e.ci.low.text}, {e.ci.high.text}]" if e.ci else "")
                for e in rep.effects if e.name != "OR" or e.ci is not None)
            if rep.ci is not None:
                rep.text += f", {rep.ci.level * 100:g}% CI [{rep.ci.low.text}, {rep.ci.high.text}]"
            if df or role == "wald":  # a Wald's df come from its df column, or are 1 beside one coefficient's B and SE (or its B alone,
                readings: tuple[Reading, ...] = () if df else (ONE_COEFFICIENT,) if coefficient is not None else \
                    (ONE_COEFFICIENT_B,) if any(roles.get(k) in ("B", "beta") and numbers.get(k) is not None for k in row) else ()  # "β | Wald c2 | P")
            elif coefficients:  # a model's coefficient: its df are the model's residual df, not a two-group t's
                readings = (_residual_readings(said) or residual_row) if role == "t" else ()
            elif role in ("t", "r") and note_df:  # "Note: df= 58": the table's one df, as its caption or note gives it
                readings = note_df
            else:
                above = "in the table" if labelled else "in the text above the table"
                design = design_readings(role, words_above.get(c, ""), f"{caption} {said}", groups, total, above if groups_guessed else "in the table",
                                         groups_guessed)
                readings = design if design is not None else tuple(df_readings(role, groups, total, above if groups_guessed else "in the table", welch,
                                                                              total_guessed=not labelled, groups_guessed=groups_guessed, total_where=above))
                if design is None and occasions and role == "t":  # ("Pre-test (n = 30) | Post-test (n = 30) | t": the same people twice,
                    readings += tuple(Reading((n - 1.0,), f"df = {n} − 1 (a paired t: the heads name occasions; n in the table)")  # a paired t
                                      for n in dict.fromkeys(groups) if n >= 2)
            found.append(TableStatistic(unit, rep, None, f"read from the table's row: {how}", readings, coefficient, squares))
        # a statistic typed whole in a cell, its p further along the row
        ordered = sorted(row)
        for i, c in enumerate(ordered):
            unit, reps = row[c]
            for rep in reps:
                if rep.symbol is None:
                    continue
                merged, how = rep, ""
                if rep.p is None and rep is reps[-1]:
                    # its p, and the effect sizes typed alone in the cells around it ("F (1,56) = 1.7 | η2 = .952 | n.s.", PLoS
                    # One 2015's layout; or after the p), up to the next statistic: each effect's cell is still listed on its own
                    sizes: list[Effect] = []
                    texts = [rep.text]
                    p = None
                    for k in ordered[i + 1 :]:
                        other_unit, other = row[k]
                        if any(o.symbol is not None for o in other):
                            break
                        lone = next((o for o in other if o.p is not None), None)
                        if lone is None and other and all(o.effects and not o.descriptives and o.ci is None for o in other):
                            sizes += [e for o in other for e in o.effects]
                            texts.append(other_unit.text.strip())
                            continue
                        if p is not None:
                            break
                        p = lone.p if lone is not None else _p_cell(other_unit.text, mark) if roles.get(k) == "p" else None
                        if p is None:
                            continue
                        if lone is not None:
                            used.add(id(lone))
                        texts.append(other_unit.text.strip())
                    if p is not None:
                        merged = replace(rep, p=p, p_range=None, text=", ".join(texts), effects=rep.effects + sizes)
                        how = "the p in a later cell of the row" + (", the effect sizes beside it" if sizes else "")
                design = None if merged.df else design_readings(rep.symbol, words_above.get(c, ""), f"{caption} {said}", groups, total, "in the table")
                readings = () if merged.df else design if design is not None else tuple(df_readings(rep.symbol, groups, total, "in the table", welch))
                found.append(TableStatistic(unit, merged, rep, how, readings))
    read_whole = {id(t.unit) for t in found}  # (a column read as a ratio's is no bare estimate's too)
    estimates = _estimate_cells(rows, f"{caption} {said}", mark) + [t for t in _interval_columns(rows, mark) if id(t.unit) not in read_whole]
    used |= {id(rep) for t in estimates for rep in rows[t.unit.cell[1]][t.unit.cell[2]][1]}  # type: ignore[index]  # (the cell's lone p)
    if stars:
        taken = {id(t.unit) for t in found + estimates}
        estimates += [t for t in _marked_coefficients(rows, stars, mark) if id(t.unit) not in taken]
    return found + _correlation_rows(rows, mark) + _statistic_rows(rows, mark) + _transposed_rows(rows, mark) + _starred_matrix(rows, mark, stars, said or caption) + estimates, used


_SE_BELOW = re.compile(r"\s*\(\s*(?P<se>(?:\d+(?:[.,]\d+)?|[.,]\d+))\s*\)\s*")  # "(0.100)": an SE in the row below its coefficient


def _marked_coefficients(rows, stars: "dict[str, tuple[str, Number]]", mark: str) -> list[TableStatistic]:  # type: ignore[no-untyped-def]
    """Coefficients with their marks of significance and their SEs in parentheses in the row below ("0.321***" over
    "(0.100)", a row without a name: regression tables as economics and sociology print them, models side by side), when
    the note defines the marks: each coefficient with its mark's bound for a p and its SE, the p checked against B / SE
    (checks.coefficient_p)."""
    out = []
    keys = sorted(rows)
    read = _patterns(mark).to_number
    for r, below in zip(keys, keys[1:]):
        row, under = rows[r], rows[below]
        first = min(row)
        if not row[first][0].text.strip() or _number(row[first][0].text, mark) is not None or any(
                under[c][0].text.strip() for c in under if c <= first):
            continue
        for c in sorted(row):
            if c == first or c not in under:
                continue
            m, se_cell = _BARE.fullmatch(row[c][0].text), _SE_BELOW.fullmatch(under[c][0].text)
            if m is None or se_cell is None or m.group("op") or not m.group("marks"):
                continue
            bound = stars.get(m.group("marks").translate(ONE_STAR))
            b, se = read(m.group("num"), m.start("num")), read(se_cell.group("se"), se_cell.start("se"))
            if bound is None or b is None or se is None:
                continue
            p = PValue(bound[0], bound[1], b.end, b.end, b.end, "")
            rep = Reported(None, "", b.start, b.start, b.end, p=p)
            rep.text = f"B = {b.text}, SE = {se.text}{p_text(p)}"
            out.append(TableStatistic(row[c][0], rep, None, f"read from the table's row: a coefficient with its {m.group('marks')} ({m.group('marks')}p "
                                                            f"{bound[0]} {bound[1].text}, as the table defines it) and its SE in the row below", (), (b, se)))
    return out


# a column of estimates with their intervals under a head naming its level and no role of its own ("Mean (95% CI)", "AUC
# (95% CI)", "Prevalence, % (95% CI)", "RMSEA (90% CI)"; practice): each estimate inside its interval
_ESTIMATE_HEAD = re.compile(r"\s*(?P<name>[^()\[\]]*?[^\s,(\[])\s*,?\s*[(\[]\s*(?P<lev>\d{2}(?:\.\d)?)\s?%\s?(?:CI|C\.I\.?|[Cc]onfidence\s+[Ii]nterval"
                            r"|CrI|[Cc]redible\s+[Ii]nterval)\s*[)\]]\s*")


def _interval_columns(rows, mark: str) -> list[TableStatistic]:  # type: ignore[no-untyped-def]
    """The cells "estimate (lower–upper)" under a head that names the interval's level and has no role of its own (a
    ratio's, a difference's or a coefficient's are read with their p elsewhere): each an estimate with its interval, to
    hold it (no p beside it: the interval's level alone)."""
    pattern = _ESTIMATE_INTERVAL_CELL[mark if mark in _ESTIMATE_INTERVAL_CELL else "."]
    read = _patterns(mark).to_number
    heads: dict[int, tuple[str, float]] = {}
    out: list[TableStatistic] = []
    for r in sorted(rows):
        row = rows[r]
        cells = {c: pattern.fullmatch(u.text) if "(" in u.text or "[" in u.text else None for c, (u, _) in row.items()}
        if not any(cells.values()):
            if not any(_number(u.text, mark) is not None for u, _ in row.values()):  # a header row: its heads
                for c, (u, _) in row.items():
                    m = _ESTIMATE_HEAD.fullmatch(_head_text(u.text)) if "%" in u.text else None
                    if m is not None and _role(u.text) is None and 50 <= float(m.group("lev")) < 100:
                        heads[c] = (m.group("name"), float(m.group("lev")) / 100)
                    elif u.text.strip():
                        heads.pop(c, None)
            continue
        for c, m in cells.items():
            if m is None or c not in heads:
                continue
            estimate, low, high = (read(m.group(g), m.start(g)) for g in ("est", "lo", "hi"))
            if estimate is None or low is None or high is None:
                continue
            name, level = heads[c]
            rep = Reported(None, "", estimate.start, estimate.start, high.end, ci=Interval(level, low, high, low.start, high.end), estimate=estimate)
            rep.text = f"{name} = {estimate.text}, {level * 100:g}% CI [{low.text}, {high.text}]"
            out.append(TableStatistic(row[c][0], rep, None, f"read from the table's row: an estimate with its interval under \u201c{name} ({level * 100:g}% CI)\u201d"))
    return out


# an estimate with its interval and p in one cell, "−0.71 (−0.85, −0.57) −26.4% p < 0.0001" (a percentage change may stand
# between them: PMC8277838's Table 2, its note "Difference (95% confidence interval), percentage change, p value")
_ESTIMATE_CI_P = {mark: re.compile(rf"\s*(?P<est>{_SIGNED[mark]})\s*[(\[]\s*{limits}\s*[)\]]\s*[,;]?\s*(?:[-−–+]?\d+(?:[.,]\d+)?\s?%\s*[,;]?\s*)?"
                                   rf"[pP]\s*(?P<op>[=<>≤≥])\s*(?P<p>\d*[.,]?\d+)\s*") for mark, limits in _LIMITS.items()}


def _estimate_cells(rows, said: str, mark: str) -> list[TableStatistic]:  # type: ignore[no-untyped-def]
    """Cells that give an estimate with its interval and p, in a table whose caption or note names one level for its
    intervals and is not of ratios: each an estimate (null 0) with its interval and p, checked as a coefficient's are."""
    levels = {float(m.group(1)) for m in _LEVEL_SAID.finditer(said)}
    if len(levels) != 1 or _RATIOS_SAID.search(said) is not None or not 50 <= next(iter(levels)) < 100:
        return []
    level = levels.pop() / 100
    pattern = _ESTIMATE_CI_P[mark if mark in _ESTIMATE_CI_P else "."]
    read = _patterns(mark).to_number
    out = []
    for r in sorted(rows):
        for c, (unit, _) in sorted(rows[r].items()):
            m = pattern.fullmatch(unit.text) if "(" in unit.text or "[" in unit.text else None
            if m is None:
                continue
            estimate, low, high, p = (read(m.group(g), m.start(g)) for g in ("est", "lo", "hi", "p"))
            if estimate is None or low is None or high is None or p is None or not 0 <= p.value <= 1:
                continue
            pv = PValue(m.group("op"), p, m.start("op"), p.end, m.start("op"), "p")
            rep = Reported(None, "", estimate.start, estimate.start, p.end, p=pv, ci=Interval(level, low, high, low.start, high.end), estimate=estimate)
            rep.text = f"estimate = {estimate.text}, {level * 100:g}% CI [{low.text}, {high.text}]{p_text(pv)}"
            out.append(TableStatistic(unit, rep, None, "read from the table's row: an estimate with its interval and p in one cell "
                                                       f"(the level the caption or note gives, {level * 100:g}%)"))
    return out


_SPEARMAN_SAID = re.compile(r"(?i)\bspearman|\brho\b|ρ")
_CORRELATIONS_SAID = re.compile(r"(?i)\bcorrelation")
_NOT_PLAIN_R = re.compile(r"(?i)\bpartial|semi-?partial|\bkendall|\btau\b|τ|intraclass|\bICC|canonical|regression|\bβ|\bbeta\b|loading|cross-lagged|\bpath\b")
_ROW_NUMBER = re.compile(r"\s*(\d{1,2})[.)]?\s+\S")
_COLUMN_NUMBER = re.compile(r"\s*(\d{1,2})\.?\s*")
_DECIMALS = re.compile(r"[.,]\d")
_MARKED = re.compile(rf"\d\s*[{_SIGNIFICANCE}]")  # a number with a mark


_DIAGONAL_SIDE = re.compile(r"(?i)\b(above|below|upper|lower)\b(?:[^.;]{0,40}?\b(?:diagonal|triangle)|\s+(?:it|that)\b)")  # ("… below it")
_CLAUSE = re.compile(r"[.;]\s|,\s")


def _diagonal_sizes(said: str) -> dict[str, int]:
    """The sample each side of a correlation matrix's diagonal, as a note gives two ("for girls (n = 120) above the
    diagonal, for boys (n = 115) below it"): {"above": 120, "below": 115}, or {} unless each side names one n."""
    out: dict[str, int] = {}
    if "diagonal" not in said and "triangle" not in said:
        return out
    for clause in _CLAUSE.split(said):
        m = _DIAGONAL_SIDE.search(clause)
        sizes = sizes_in(clause) if m is not None else []
        if m is not None and len(sizes) == 1 and sizes[0] >= 4:
            side = "above" if m.group(1).lower() in ("above", "upper") else "below"
            if side in out and out[side] != sizes[0]:
                return {}
            out[side] = sizes[0]
    return out if len(out) == 2 else {}


def _starred_matrix(rows, mark: str, stars: "dict[str, tuple[str, Number]] | None", caption: str) -> list[TableStatistic]:  # type: ignore[no-untyped-def]
    """The coefficients of a table of correlations with the note's marks of significance ("−.25**" with "**p < .01"):
    each marked coefficient is r(N − 2) with its mark's bound for a p (Spearman's where the table names Spearman or ρ),
    N the table's one N in its caption or note ("N = 150", or one "n = 181"), or the sample of its block — a row that
    only names one ("Parent rating (n = 46)"), for the rows below it up to the next. Two layouts: a matrix as psychology
    papers print it, columns headed by the variables' numbers (1, 2, 3 …; M and SD columns before them left alone) and
    rows numbered alike (its diagonal skipped); and any table whose caption calls its contents correlations, a marked
    number from −1 to 1 with decimals in any cell but a row's first (one set of variables against another). Not read:
    coefficients without a mark (their p is only said to be above the smallest bound), rows under no N (a table with
    several N's and no blocks: subsamples unsaid, unless the note gives one each side of the diagonal), and a table
    whose caption or note names partial, Kendall's, intraclass or canonical correlations, or regression weights or
    loadings, whose p's a plain r's df do not give. A
    coefficient computed on fewer rows (pairwise deletion) has a larger p than N − 2 gives, so a mark it earned is
    never doubted for that."""
    if not stars or _NOT_PLAIN_R.search(caption):
        return []
    groups, total = caption_sizes(caption)
    if total is None and len(groups) == 1:  # "n = 312" for the whole sample, as many notes write it
        total = groups[0]
    if total is not None and (total < 4 or len(set(_totals(caption))) > 1):
        total = None
    order = sorted(rows)
    sides = _diagonal_sizes(caption)  # two samples, one each side of the diagonal ("girls (n = 120) above …")
    by_side = False  # the coefficients' N are their side's
    cells: list[tuple[int, int, int | None]] = []  # (row, column, N) of the cells that may hold a coefficient
    for k, r in enumerate(order):
        numbered = [(c, int(m.group(1))) for c, (u, _) in sorted(rows[r].items()) for m in [_COLUMN_NUMBER.fullmatch(u.text)] if m]
        if len(numbered) >= 2 and numbered[0][1] in (1, 2) and [n for _, n in numbered] == list(range(numbered[0][1], numbered[0][1] + len(numbered))):
            # the rows numbered as the columns are ("1. Anxiety", "2. Age" …): a matrix of the variables against each other
            # (a model table headed by its models' numbers, its rows named by predictors, is not one)
            numbers = dict(numbered)
            body = order[k + 1 :]
            labelled = {b: int(m.group(1)) for b in body for m in [_ROW_NUMBER.match(rows[b][min(rows[b])][0].text)] if m}
            if len(labelled) >= 2 and set(numbers.values()) <= set(labelled.values()):
                by_side = bool(sides)
                cells = [(b, c, (sides["above"] if numbers[c] > labelled[b] else sides["below"]) if sides else total)
                         for b in body if b in labelled for c in numbers if c in rows[b] and numbers[c] != labelled[b]]
            break
    matrix = bool(cells)  # the variables against each other, under their numbers (not any table its caption calls correlations)
    if not cells and _CORRELATIONS_SAID.search(caption):
        block = total
        for r in order[1:]:
            row = rows[r]
            named = [n for u, _ in row.values() for n in sizes_in(u.text)]
            if len(named) == 1 and not any(_MARKED.search(u.text) for u, _ in row.values()):
                block = named[0]  # a block's row: "Parent rating (n = 46)"
                continue
            cells += [(r, c, block) for c in sorted(row)[1:]]
    symbol = "rs" if _SPEARMAN_SAID.search(caption) else "r"
    found: list[TableStatistic] = []
    below = dict(zip(order, order[1:]))  # each row's next: a coefficient's interval in brackets under it (APA 7's layout)
    levels = {float(m.group(1)) for m in _LEVEL_SAID.finditer(caption)}
    level = levels.pop() / 100 if len(levels) == 1 and 50 <= next(iter(levels)) < 100 else None
    beyond: list[TableStatistic] = []  # marked numbers above 1 in magnitude: a correlation's slip where the rest are correlations
    for r, c, n in cells:
        if n is None or n < 4:
            continue
        unit = rows[r][c][0]
        m = _BARE.fullmatch(unit.text)
        if m is None or m.group("op") or not m.group("marks") or m.group("marks").translate(ONE_STAR) not in stars or not _DECIMALS.search(m.group("num")):
            continue
        value = _patterns(mark).to_number(m.group("num"), m.start("num"))
        if value is None:
            continue
        op, bound = stars[m.group("marks").translate(ONE_STAR)]
        p = PValue(op, bound, value.end, value.end, value.end, "")
        df = Number(f"{n - 2}", float(n - 2), 0, 0, 0)
        rep = Reported(symbol, symbol, value.start, value.start, value.end, (df,), None, "=", value, p)
        rep.text = statistic_text(symbol, (df,), "=", value, p)
        under = rows[below[r]] if r in below else {}
        limits = _INTERVAL_CELL[mark if mark in _INTERVAL_CELL else "."].fullmatch(under[c][0].text) if c in under and under[c][0].text.lstrip()[:1] in "[(" \
            and _ROW_NUMBER.match(under[min(under)][0].text) is None else None
        if limits is not None:
            low, high = (_patterns(mark).to_number(limits.group(g), limits.start(g)) for g in ("lo", "hi"))
            if low is not None and high is not None:
                rep.ci = Interval(level, low, high, low.start, high.end)  # type: ignore[arg-type]
                rep.text += f", {level * 100:g}% CI [{low.text}, {high.text}]" if level is not None else f" [{low.text}, {high.text}]"
        where = "the note, for its side of the diagonal" if by_side else "its block's row" if n != total else "the caption or note"
        (beyond if abs(value.value) > 1 else found).append(
            TableStatistic(unit, rep, None, f"read from the table's row: a correlation coefficient with its "
                                            f"{m.group('marks')} ({m.group('marks')}p {op} {bound.text}, as the table defines it), df = N − 2 "
                                            f"(N = {n} in {where})" + (", its interval in the row below" if rep.ci is not None else "")))
    # (a marked number above 1 among three or more marked correlations is one of them typed wrong, "1.45**" for ".45**"; in a
    # table of other numbers — covariances — it is not read)
    return found + beyond if matrix and len(found) >= 3 and len(beyond) < len(found) / 2 else found


# SPSS's Test Statistics tables lay a test out down a column, a row for each of its parts: the Mann–Whitney and Wilcoxon
# tests' "Z", Kruskal–Wallis' "Kruskal-Wallis H" (older versions: "Chi-Square"), Friedman's "Chi-Square", each with its
# "df" and "Asymp. Sig." rows below
# (and as a spreadsheet's analysis tools print a t or z test, down a column for each variable: a "t Stat" or "z" row, its
# "df" row, and its "P(T<=t) two-tail" or "P(Z<=z) two-tail" row — the one-tail and critical-value rows not read)
_STAT_ROW = {"z": re.compile(r"(?i)\s*z\s*"), "H": re.compile(r"(?i)\s*kruskal[-–\s]wallis\s+h\s*"),
             "chi2": re.compile(r"(?i)\s*chi[-–\s]?square\s*"), "t": re.compile(r"(?i)\s*t\s+stat\s*")}
_ASYMP_ROW = re.compile(r"(?i)\s*asymp(?:\.|totic)\s*sig(?:\.|nificance)?\s*(?:\((?:2-tailed|2-sided(?: test)?)\))?\s*"
                        r"|\s*p\s*\(\s*[tz]\s*<=?\s*[tz]\s*\)\s*two[- ]tail\s*")
_DF_ROW = re.compile(r"(?i)\s*df\s*")
# such a t test of two groups that pools no variance and pairs no scores (neither row printed) is Welch's: its df, printed
# whole, rounded (memory: whether the p was computed on the rounded df is not known here, so a df within 1 of it is allowed)
_POOLED_OR_PAIRED_ROW = re.compile(r"(?i)\s*(?:pooled\s+variance|pearson\s+correlation)\s*")
_OBSERVATIONS_ROW = re.compile(r"(?i)\s*observations\s*")


def _statistic_rows(rows, mark: str) -> list[TableStatistic]:  # type: ignore[no-untyped-def]
    """The tests of a table laid out down its columns, as SPSS's Test Statistics tables are: in each column, a z, H or
    χ² row with the df row and the Asymp. Sig. row of the same column (a table without an Asymp. Sig. row is none); and
    a spreadsheet's t or z test, its "t Stat" with its df and two-tailed p rows."""
    labels = {r: row[1][0].text for r, row in rows.items() if 1 in row}
    sig = next((r for r, text in labels.items() if _ASYMP_ROW.fullmatch(text)), None)
    if sig is None:
        return []
    df_row = next((r for r, text in labels.items() if _DF_ROW.fullmatch(text)), None)
    welch = any(_OBSERVATIONS_ROW.fullmatch(text) for text in labels.values()) and not any(_POOLED_OR_PAIRED_ROW.fullmatch(text) for text in labels.values())
    found: list[TableStatistic] = []
    for r, text in labels.items():
        symbol = next((name for name, pattern in _STAT_ROW.items() if pattern.fullmatch(text)), None)
        if symbol is None:
            continue
        for c in sorted(rows[r]):
            if c == 1 or c not in rows[sig]:
                continue
            value, p = _number(rows[r][c][0].text, mark), _p_cell(rows[sig][c][0].text, mark)
            size = _number(rows[df_row][c][0].text, mark) if df_row is not None and c in rows[df_row] else None
            if value is None or p is None or (symbol != "z" and size is None):
                continue
            df: tuple[Number, ...] = () if symbol == "z" else (size[1],)  # type: ignore[index]
            label = {"chi2": "χ²"}.get(symbol, symbol)
            how = f"read from the table's row: the {text.strip()} row" + (", the df row" if df else "") + f", the {labels[sig].strip()} row, in its column"
            readings: tuple[Reading, ...] = ()
            if symbol == "t" and welch:  # (the df the p was computed on: the printed df, rounded, or one next to it)
                readings = (Reading((df[0].value - 1,), f"Welch's df, printed rounded as {df[0].text}: from {df[0].value - 1:g} to {df[0].value + 1:g} "
                                                         "(a t test that neither pools variances nor pairs scores)", df[0].value + 1),)
                df = ()
            rep = Reported(symbol, label, value[1].start, value[1].start, value[1].end, df, None, value[0], value[1], p)
            rep.text = statistic_text(label, df, value[0], value[1], p)
            found.append(TableStatistic(rows[r][c][0], rep, None, how, readings))
    return found


# a table laid out across its columns, a model or group to each (structural equation models' fit tables): a χ² row
# ("χ2", "χ 2", "χ2 (df)" over "384.7 (135)") with its df row and its p row right under it ("df", "p", "P-value"); a
# later p row (the RMSEA's test of close fit) is not the χ²'s
_ROW_P = re.compile(r"(?i)\s*(?:p|p[- ]?values?)\s*")


def _transposed_rows(rows, mark: str) -> list[TableStatistic]:  # type: ignore[no-untyped-def]
    """Each column's χ², df and p where a row names the χ², the next its df (or its cells give them, "384.7 (135)" in a
    row named "χ2 (df)") and the next its p; a p above 1 in that row is read, to be found impossible."""
    order = sorted(rows)
    found: list[TableStatistic] = []
    for i, r in enumerate(order):
        row = rows[r]
        label = row[min(row)][0].text
        if label.lstrip()[:1] not in "χΧxXcC" or _role(label) != "chi2":  # (a χ²'s name starts so: the role asked of those only)
            continue
        with_df = _DF_IN_HEAD.search(_head_text(label)) is not None
        below = [rows[k] for k in order[i + 1 : i + 3]]
        df_row = below[0] if below and not with_df and _DF_ROW.fullmatch(below[0][min(below[0])][0].text) else None
        p_row = next((b for b in below[(0 if with_df or df_row is None else 1) :][:1] if _ROW_P.fullmatch(b[min(b)][0].text)), None)
        if p_row is None or (not with_df and df_row is None):
            continue
        for c in sorted(row)[1:]:
            read = _value_df(row[c][0].text, mark) if with_df else None
            size = _number(df_row[c][0].text, mark) if df_row is not None and c in df_row else None
            value = read[0] if read is not None else _number(row[c][0].text, mark) if not with_df else None
            df = read[1] if read is not None else (size[1],) if size is not None else ()
            printed = _number(p_row[c][0].text, mark) if c in p_row else None
            p = _p_cell(p_row[c][0].text, mark) if c in p_row else None
            if p is None and printed is not None and printed[1].value > 1:
                p = PValue(printed[0], printed[1], printed[1].start, printed[1].end, printed[1].start, "")
            if value is None or not df or p is None:
                continue
            rep = Reported("chi2", "χ²", value[1].start, value[1].start, value[1].end, df, None, value[0], value[1], p)
            rep.text = statistic_text("χ²", df, value[0], value[1], p)
            found.append(TableStatistic(row[c][0], rep, None, f"read from the table's row: the {label.strip()} row" + ("" if with_df else ", the df row")
                                        + ", the p row under it, in its column"))
    return found


# SPSS's Correlations table: under each variable a row of coefficients ("Pearson Correlation", or Spearman's and Kendall's
# "Correlation Coefficient"), then its "Sig. (2-tailed)" and its "N", each column a pair of variables; jamovi's and JASP's
# ("Pearson's r" or "Spearman's rho", then "df" and "p-value" rows; practice)
_COEFFICIENT_ROW = re.compile(r"(?i)\s*(?:pearson\s+correlation|correlation\s+coefficient|pearson'?s\s+r|spearman'?s\s+(?:rho|ρ))\s*")
_SPEARMAN = re.compile(r"(?i)spearman|rho")
_SIG_ROW = re.compile(r"(?i)\s*(?:sig\.?\s*\(([12])-tailed\)|p[- ]?value|p)\s*")
_N_ROW = re.compile(r"(?i)\s*n\s*")


def _correlation_rows(rows, mark: str) -> list[TableStatistic]:  # type: ignore[no-untyped-def]
    """The coefficients of a correlation matrix laid out as SPSS lays it out: each with the p of the Sig. (2-tailed) row
    and the N of the N row below it in its column (df = N − 2), Spearman's where the table names it (its rows are
    "Correlation Coefficient" under "Spearman's rho"); a coefficient without a p below it (the diagonal's 1) is none.
    A Sig. (1-tailed) row, as SPSS prints it when asked for one-tailed tests, says so in how it was read: its p fits a
    one-sided test, which the audit notes instead of warning. jamovi and JASP put a "df" row and a "p-value" row under
    "Pearson's r" (or "Spearman's rho"): the df as given."""
    order = sorted(rows)
    found: list[TableStatistic] = []
    spearman = False
    for k, r in enumerate(order):
        row = rows[r]
        columns = sorted(row)
        spearman = spearman or any(_SPEARMAN.search(row[c][0].text) for c in columns[:2])
        label = next((c for c in columns[:2] if _COEFFICIENT_ROW.fullmatch(row[c][0].text)), None)
        if label is None:
            continue
        sig = n = df_row = None
        tails = "2"
        for below in order[k + 1 : k + 4]:  # the rows under it that name what they give, up to the next coefficients
            cells = rows[below]
            named = [cells[c][0].text for c in columns[:2] if c in cells]
            if any(_COEFFICIENT_ROW.fullmatch(t) for t in named):
                break
            m = next((m for t in named for m in [_SIG_ROW.fullmatch(t)] if m), None)
            if m is not None and sig is None:
                sig, tails = cells, m.group(1) or "2"
            elif any(_N_ROW.fullmatch(t) for t in named) and n is None:
                n = cells
            elif any(_DF_ROW.fullmatch(t) for t in named) and df_row is None:
                df_row = cells
        if sig is None or (n is None and df_row is None):
            continue
        symbol = "rs" if spearman and "pearson" not in row[label][0].text.lower() else "r"
        for c in columns:
            if c <= label:
                continue
            value, p = _number(row[c][0].text, mark), _p_cell(sig[c][0].text, mark) if c in sig else None
            if df_row is not None:
                given = _number(df_row[c][0].text, mark) if c in df_row else None
                df = given[1] if given is not None and given[1].value >= 1 else None
                how = "the coefficient, the df and p-value rows below it in its column"
            else:
                size = _number(n[c][0].text, mark) if c in n else None
                df = Number(f"{size[1].value - 2:g}", size[1].value - 2, 0, 0, 0) if size is not None and size[1].value >= 3 else None
                how = f"the coefficient, the Sig. ({tails}-tailed) and N rows below it in its column (df = N − 2)"
            if value is None or p is None or df is None:
                continue
            df = Number(df.text, df.value, 0, 0, 0)  # (the df's place is another cell's)
            unit = row[c][0]
            rep = Reported(symbol, symbol, value[1].start, value[1].start, value[1].end, (df,), None, value[0], value[1], p)
            rep.text = statistic_text(symbol, (df,), value[0], value[1], p)
            found.append(TableStatistic(unit, rep, None, f"read from the table's row: {how}"))
    return found
