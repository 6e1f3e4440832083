"""Post hoc comparisons after a one-way ANOVA, and two-way factorial ANOVA."""

from __future__ import annotations

import math
from dataclasses import replace
from itertools import combinations
from typing import TYPE_CHECKING, Literal, Mapping

from ..coding import categories, category_text
from ..errors import InputError
from ..formulas import adjusted_p, studentized_range_quantile, studentized_range_sf
from ..records import Estimate, GroupSummary, Interval, Note, Result, Statistic, Variable
from . import _common as c
from .effects import d_from_t, hedges_g, variance_explained
from .sums_of_squares import anova_table, coded_factor, product

if TYPE_CHECKING:
    import pandas as pd

Procedure = Literal["tukey", "games-howell", "holm", "bonferroni"]
_NAMES = {"tukey": "Tukey HSD", "games-howell": "Games–Howell", "holm": "Holm", "bonferroni": "Bonferroni"}


def posthoc(
    df: "pd.DataFrame",
    outcome: str,
    group: str,
    *,
    adjust: Procedure = "tukey",
    level: float = 0.95,
    labels: Mapping[str, str] | None = None,
) -> list[Result]:
    """Every pair of groups: the mean difference (first − second, groups in
    sorted order), its CI and the adjusted p. Tukey HSD (scipy); Games–Howell
    (Welch SEs and df, studentized range); pairwise Student t tests with Holm
    or Bonferroni adjustment (Bonferroni CIs at the adjusted level; Holm CIs
    unadjusted, stated). ``adjust`` names the procedure."""
    import numpy as np
    from scipy import stats

    procedure = adjust
    if procedure not in _NAMES:
        raise InputError(f"adjust: {procedure!r} is not one of {', '.join(_NAMES)}")
    levels, samples, missing = c.grouped(df, outcome, group, "a comparison")
    k = len(samples)
    pairs = list(combinations(range(k), 2))
    rows: list[tuple[int, int, float, float, float, float]] = []  # i, j, diff, p, low, high
    note = None
    if procedure == "tukey":  # Tukey–Kramer: the pooled within-group variance, one studentized-range p per pair
        sizes = np.array([len(v) for v in samples], dtype=float)
        means = np.array([v.mean() for v in samples])
        dfe = float(sizes.sum() - k)
        mse = float(sum((len(v) - 1) * v.var(ddof=1) for v in samples)) / dfe
        if all(c.constant(v) for v in samples):
            raise InputError(f"{outcome}: zero variance within every group; the Tukey statistic is undefined")
        first, second = (np.array(ix) for ix in zip(*pairs))
        diffs = means[first] - means[second]
        se = np.sqrt(mse / 2 * (1 / sizes[first] + 1 / sizes[second]))
        p_values = studentized_range_sf(np.abs(diffs) / se, k, dfe)  # all pairs in one vectorised call
        half = float(studentized_range_quantile(level, k, dfe)) * se
        rows = [(i, j, float(d), float(p), float(d - h), float(d + h)) for (i, j), d, p, h in zip(pairs, diffs, p_values, half)]
    elif procedure == "games-howell":
        for i, j in pairs:
            a, b = samples[i], samples[j]
            va, vb = a.var(ddof=1) / len(a), b.var(ddof=1) / len(b)
            if c.constant(a) and c.constant(b):
                raise InputError(f"{outcome}: zero variance in groups {category_text(levels[i])} and {category_text(levels[j])}; "
                                 "the Games–Howell statistic is undefined")
            se = math.sqrt(va + vb)
            dfw = (va + vb) ** 2 / (va**2 / (len(a) - 1) + vb**2 / (len(b) - 1))
            diff = float(a.mean() - b.mean())
            q = abs(diff) / se * math.sqrt(2)
            p = float(studentized_range_sf(q, k, dfw)[0])
            half = float(studentized_range_quantile(level, k, dfw)) / math.sqrt(2) * se
            rows.append((i, j, diff, min(p, 1.0), diff - half, diff + half))
    else:
        raw = [stats.ttest_ind(samples[i], samples[j]) for i, j in pairs]
        adjusted = adjusted_p([r.pvalue for r in raw], procedure)
        m = len(pairs)
        ci_level = 1 - (1 - level) / m if procedure == "bonferroni" else level
        for (i, j), r, p in zip(pairs, raw, adjusted):
            ci = r.confidence_interval(ci_level)
            rows.append((i, j, float(samples[i].mean() - samples[j].mean()), float(p), float(ci.low), float(ci.high)))
        note = Note(
            "correction",
            f"Pairwise Student t tests, {_NAMES[procedure]}-adjusted p over {m} comparisons; "
            + (f"CIs at the Bonferroni-adjusted level {ci_level:.4g}." if procedure == "bonferroni" else "CIs unadjusted."),
        )
    summaries = [GroupSummary(category_text(lev), n=len(v), mean=float(v.mean()), sd=float(v.std(ddof=1))) for lev, v in zip(levels, samples)]
    variables = c.variables({"outcome": outcome, "group": group}, labels)
    out = []
    for i, j, diff, p, low, high in rows:
        a, b = samples[i], samples[j]
        pooled = math.sqrt(((len(a) - 1) * a.var(ddof=1) + (len(b) - 1) * b.var(ddof=1)) / (len(a) + len(b) - 2))
        scale = math.sqrt(1 / len(a) + 1 / len(b))
        g = hedges_g(d_from_t("d", diff / (pooled * scale), len(a) + len(b) - 2, scale, level), len(a) + len(b) - 2) if pooled > 0 else None
        if g is not None:
            g = replace(g, method=f"pooled SD of the two groups; {g.method}; CI not adjusted for multiplicity")
        out.append(
            Result(
                kind="posthoc_pair",
                p=float(np.clip(p, 0, 1)),
                n=summaries[i].n + summaries[j].n,  # type: ignore[operator]
                estimate=Estimate("mean difference", diff, ci=Interval(level, low, high)),
                effects=(g,) if g is not None else (),
                groups=(summaries[i], summaries[j]),
                variables=variables,
                notes=c.notes(note, missing),
                details={"procedure": _NAMES[procedure], "comparisons": len(pairs)},
                provenance=c.provenance(f"statsetter.analyses.posthoc({procedure})"),
            )
        )
    return out


def _cell_notes(cells: "tuple[GroupSummary, ...]", ss_type: int, la: str, lb: str) -> list[Note]:
    """What unequal and tiny cells mean for a two-way ANOVA, said where they occur: with unequal cells the main effects'
    tests depend on the type of sums of squares (Type II tests each assuming no interaction, Type III weighs the
    cells equally; they agree only in a balanced design — practice: Maxwell & Delaney, *Designing Experiments and
    Analyzing Data*, ch. 7, memory); a cell of one case adds nothing to the error variance and its mean is that one
    observation; cells under 5 cases make unstable means, and published they can identify people."""
    sizes = [cell.n for cell in cells]
    out = []
    if min(sizes) != max(sizes):
        smallest = min(cells, key=lambda cell: cell.n)
        used, other = ("II", "Type III (each main effect averaged over the other factor's cells, weighed equally)") if ss_type == 2 else \
            ("III", "Type II (each main effect tested assuming no interaction)")
        out.append(Note("assumption", f"Cell sizes are unequal ({min(sizes)} to {max(sizes)} cases; smallest: {smallest.label}), so the tests of "
                                      f"{la} and {lb} depend on the type of sums of squares: Type {used} was used; {other} can give other "
                                      "F values. Say which type you report."))
    single = [cell.label for cell in cells if cell.n == 1]
    if single:
        out.append(Note("assumption", f"{len(single)} cell(s) hold a single case ({', '.join(single[:4])}{' …' if len(single) > 4 else ''}): "
                                      "such a cell adds nothing to the error variance, and its mean is that one observation."))
    small = [f"{cell.label} {cell.n}" for cell in sorted(cells, key=lambda cell: cell.n) if cell.n < 5]
    if small:
        out.append(Note("caution", f"{len(small)} of {len(cells)} cells have fewer than 5 cases ({', '.join(small[:6])}{' …' if len(small) > 6 else ''}): "
                                   "their means are unstable, and cell means or counts this small, published, can identify people; "
                                   "check the ethics approval's rules on small cells."))
    return out


def factorial_anova(
    df: "pd.DataFrame",
    outcome: str,
    factors: tuple[str, str],
    *,
    ss_type: Literal[2, 3] = 2,
    level: float = 0.95,
    labels: Mapping[str, str] | None = None,
) -> list[Result]:
    """Two-way between-subjects ANOVA with the interaction; one record per
    term with F, p and partial η² = SS / (SS + SS_residual) with its
    noncentral-F interval at ``level`` (Steiger, 2004). Type II or III sums of
    squares (Type III with sum-to-zero contrasts), stated; the term's, the
    error's and the corrected total sums of squares go into ``details``."""
    if ss_type not in (2, 3):
        raise InputError(f"ss_type: {ss_type!r} is not 2 or 3")
    if isinstance(factors, str) or len(factors) != 2:
        raise InputError(f"factors: {list(factors) if not isinstance(factors, str) else factors!r}: a two-way ANOVA takes two factors")
    a, b = factors
    data, missing = c.listwise(df, [outcome, a, b])
    c.require_variance(c.numeric(data, outcome), outcome, "F is undefined")
    for f in (a, b):
        if data[f].nunique() < 2:
            raise InputError(f"{f}: one level with data; a factor needs at least two")
    frame = data.rename(columns={outcome: "y_", a: "a_", b: "b_"})
    y = frame["y_"].to_numpy(dtype=float)
    in_a, in_b = frame["a_"].to_numpy(), frame["b_"].to_numpy()
    levels_a, levels_b = categories(frame["a_"]), categories(frame["b_"])
    cells = c.cell_groups((category_text(x), category_text(z), y[(in_a == x) & (in_b == z)]) for x in levels_a for z in levels_b)
    if len(cells) < len(levels_a) * len(levels_b):  # the interaction's terms are not all estimable: the cells named
        seen = {cell.label for cell in cells}
        empty = [f"{category_text(x)} × {category_text(z)}" for x in levels_a for z in levels_b if f"{category_text(x)} × {category_text(z)}" not in seen]
        raise InputError(f"{a} × {b}: no case in {', '.join(empty[:4])}{' …' if len(empty) > 4 else ''} ({len(empty)} of {len(levels_a) * len(levels_b)} "
                         "cells empty); a two-way ANOVA with the interaction needs a case in every cell — merge or leave out a level")
    if len(y) <= len(cells):
        raise InputError(f"{outcome}: {len(y)} rows for {len(cells)} cells of {a} × {b}; a two-way ANOVA needs more rows than cells (error df)")
    sum_to_zero = ss_type == 3
    factor_a, factor_b = coded_factor("a", in_a, levels_a, sum_to_zero), coded_factor("b", in_b, levels_b, sum_to_zero)
    table = anova_table(y, [factor_a, factor_b, product(factor_a, factor_b)], ss_type, outcome)
    ss_res, df_res = table.ss_error, float(table.df_error)
    ss_total = float(((y - y.mean()) ** 2).sum())
    labels = labels or {}
    la, lb = labels.get(a, a), labels.get(b, b)
    names = {"a": (la, False), "b": (lb, False), "a:b": (f"{la} × {lb}", True)}
    out = []
    for term, (label, interaction) in names.items():
        row = table.rows[term]
        ss = row.ss
        out.append(
            Result(
                kind="anova_term",
                statistic=Statistic("F", row.F, (float(row.df), df_res)),
                p=row.p,
                n=table.nobs,
                effects=(variance_explained("eta2_p", ss / (ss + ss_res), row.F, float(row.df), df_res, level),),
                variables=(Variable(outcome, labels.get(outcome, outcome), "outcome"), Variable(a, la, "factor"), Variable(b, lb, "factor")),
                notes=c.notes(Note("method", f"Type {'II' if ss_type == 2 else 'III'} sums of squares" + (" with sum-to-zero contrasts." if ss_type == 3 else ".")),
                              *_cell_notes(cells, ss_type, la, lb), missing),
                details={"term": label, "interaction": interaction, "ss_type": ss_type, "ss": ss, "ss_error": ss_res, "ss_total": ss_total},
                groups=cells if interaction else (),
                provenance=c.provenance("statsetter.analyses.factorial_anova"),
            )
        )
    return out
