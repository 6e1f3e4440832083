"""Tests for the same people measured more than once on a categorical or
ranked outcome: McNemar's test (two binary measurements), Cochran's Q (k
binary measurements) and Friedman's test (k ranked or numeric measurements)
with Kendall's W. Wide data: one column per measurement, one row per person;
rows with a missing measurement are dropped (listwise, said in the notes).
"""

from __future__ import annotations

import math
from typing import TYPE_CHECKING, Literal, Mapping, Sequence

from ..coding import category_text
from ..errors import InputError
from ..records import EffectSize, GroupSummary, Interval, Note, Result, Statistic
from . import _common as c

if TYPE_CHECKING:
    import pandas as pd

McNemarVariant = Literal["auto", "exact", "corrected", "uncorrected"]
EXACT_BELOW = 25  # discordant pairs: below this the exact binomial test (practice: the chi-square approximation needs b + c >= 25)


def _binary(data: "pd.DataFrame", columns: Sequence[str], test: str) -> tuple[list[object], "list"]:  # type: ignore[type-arg]
    """The two values the columns take (sorted, the same two for every column) and each column as 0/1."""
    values = sorted({v for col in columns for v in data[col].unique()}, key=lambda v: (str(type(v)), v))
    if len(values) != 2:
        shown = ", ".join(category_text(v) for v in values[:6])
        raise InputError(f"{', '.join(columns)}: {test} needs two values across the measurements (found {len(values)}: {shown})")
    return values, [(data[col] == values[1]).to_numpy(dtype=int) for col in columns]


def mcnemar(
    df: "pd.DataFrame",
    first: str,
    second: str,
    *,
    variant: McNemarVariant = "auto",
    level: float = 0.95,
    labels: Mapping[str, str] | None = None,
) -> Result:
    """McNemar's test of a change in a binary outcome measured twice on the
    same people. Only the discordant pairs count: b (the second value at the
    first measurement only) and c (at the second only). ``exact``: the
    binomial test of b against b + c at one half; ``corrected``: χ² =
    (|b − c| − 1)² / (b + c) (Edwards' continuity correction, R's default);
    ``uncorrected``: (b − c)² / (b + c); ``auto``: exact below 25 discordant
    pairs, else corrected (stated). The effect size is the odds ratio of the
    discordant pairs, b / c, with the exact conditional CI (Clopper–Pearson
    limits of b / (b + c), as odds)."""
    from scipy import stats

    if variant not in ("auto", "exact", "corrected", "uncorrected"):
        raise InputError(f"variant: {variant!r} is not auto, exact, corrected or uncorrected")
    data, missing = c.listwise(df, [first, second])
    values, (x, y) = _binary(data, [first, second], "McNemar's test")
    b, cc = int(((x == 0) & (y == 1)).sum()), int(((x == 1) & (y == 0)).sum())
    n = len(x)
    if b + cc == 0:
        raise InputError(f"{first}, {second}: no pair changed; McNemar's test is undefined")
    chosen = ("exact" if b + cc < EXACT_BELOW else "corrected") if variant == "auto" else variant
    statistic = None
    if chosen == "exact":
        p = float(stats.binomtest(b, b + cc, 0.5).pvalue)
        method = "exact binomial test of the discordant pairs"
    else:
        gap = abs(b - cc) - (1 if chosen == "corrected" else 0)
        chi2 = max(gap, 0) ** 2 / (b + cc)
        statistic = Statistic("chi2", chi2, (1,))
        p = float(stats.chi2.sf(chi2, 1))
        method = "chi-square with continuity correction" if chosen == "corrected" else "chi-square without continuity correction"
    effects: tuple[EffectSize, ...] = ()
    if b > 0 and cc > 0:
        low, high = stats.binomtest(b, b + cc, 0.5).proportion_ci(level, method="exact")
        ci = Interval(level, low / (1 - low), high / (1 - high) if high < 1 else math.inf) if high < 1 else None
        effects = (EffectSize("OR", b / cc, ci, ratio=True, method="odds ratio of the discordant pairs b/c; exact conditional CI"),)
    shown = category_text(values[1])
    named = dict(labels or {})
    groups = tuple(GroupSummary(named.get(col, col), n=int(v.sum()), percent=100 * float(v.mean())) for col, v in ((first, x), (second, y)))
    notes = [Note("method", f"McNemar's test, {method}" + (f" (chosen: {b + cc} discordant pairs, {'fewer' if b + cc < EXACT_BELOW else 'at least'} than "
                                                            f"{EXACT_BELOW})" if variant == "auto" else "") + ".")]
    if effects == () and b + cc > 0:
        notes.append(Note("method", "No odds ratio: one of the discordant counts is zero."))
    return Result(
        kind="mcnemar",
        statistic=statistic,
        p=min(p, 1.0),
        n=n,
        effects=effects,
        groups=groups,
        variables=c.variables({"first": first, "second": second}, labels),
        notes=c.notes(*notes, missing),  # type: ignore[arg-type]
        details={"method": method, "b": b, "c": cc, "value": shown},
        provenance=c.provenance("statsetter.analyses.mcnemar"),
    )


def cochran_q(df: "pd.DataFrame", columns: Sequence[str], *, labels: Mapping[str, str] | None = None) -> Result:
    """Cochran's Q test that k binary measurements of the same people share
    one proportion: Q = (k − 1)(k ΣC_j² − T²) / (kT − ΣR_i²) with column
    totals C_j, row totals R_i and grand total T; χ²(k − 1) approximation."""
    import numpy as np
    from scipy import stats

    columns = list(columns)
    if len(columns) < 2:
        raise InputError("columns: Cochran's Q needs at least two measurements")
    data, missing = c.listwise(df, columns)
    values, cols = _binary(data, columns, "Cochran's Q")
    m = np.column_stack(cols)
    k = m.shape[1]
    col, row, total = m.sum(axis=0), m.sum(axis=1), m.sum()
    denominator = k * total - (row**2).sum()
    if denominator == 0:
        raise InputError(f"{', '.join(columns)}: every person has the same value at every measurement; Cochran's Q is undefined")
    q = float((k - 1) * (k * (col**2).sum() - total**2) / denominator)
    named = dict(labels or {})
    groups = tuple(GroupSummary(named.get(name, name), n=int(v), percent=100 * float(v) / len(m)) for name, v in zip(columns, col))
    return Result(
        kind="cochran_q",
        statistic=Statistic("Q", q, (k - 1,)),
        p=float(stats.chi2.sf(q, k - 1)),
        n=len(m),
        groups=groups,
        variables=c.variables({f"measurement {i + 1}": name for i, name in enumerate(columns)}, labels),
        notes=c.notes(Note("method", "Cochran's Q with the chi-square approximation."), missing),
        details={"k": k, "value": category_text(values[1])},
        provenance=c.provenance("statsetter.analyses.cochran_q"),
    )


def friedman(df: "pd.DataFrame", columns: Sequence[str], *, labels: Mapping[str, str] | None = None) -> Result:
    """Friedman's test of k related measurements (ranks within each person,
    corrected for ties; χ²(k − 1) approximation, as scipy and R compute it)
    with Kendall's W = χ²_F / (n(k − 1)) (Tomczak & Tomczak, 2014)."""
    import numpy as np
    from scipy import stats

    columns = list(columns)
    if len(columns) < 3:
        raise InputError("columns: Friedman's test needs at least three measurements (two: use the Wilcoxon signed-rank test)")
    data, missing = c.listwise(df, columns)
    arrays = [c.numeric(data, col).to_numpy(dtype=float) for col in columns]
    n, k = len(arrays[0]), len(arrays)
    if n < 2:
        raise InputError(f"{', '.join(columns)}: {n} complete row(s); Friedman's test needs at least two people")
    res = stats.friedmanchisquare(*arrays)
    chi2 = float(res.statistic)
    named = dict(labels or {})
    groups = tuple(GroupSummary(named.get(col, col), n=n, median=float(np.median(v)), q1=float(np.percentile(v, 25)), q3=float(np.percentile(v, 75)))
                   for col, v in zip(columns, arrays))
    return Result(
        kind="friedman",
        statistic=Statistic("chi2", chi2, (k - 1,)),
        p=float(res.pvalue),
        n=n,
        effects=(EffectSize("kendall_w", chi2 / (n * (k - 1)), method="Kendall's W = chi2 / (n(k - 1)) (Tomczak & Tomczak, 2014)"),),
        groups=groups,
        variables=c.variables({f"measurement {i + 1}": name for i, name in enumerate(columns)}, labels),
        notes=c.notes(Note("method", "Friedman's test, ranks within each person corrected for ties, chi-square approximation."), missing),
        details={"k": k},
        provenance=c.provenance("statsetter.analyses.friedman"),
    )
