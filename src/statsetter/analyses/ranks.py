"""Rank tests: Mann–Whitney U, Wilcoxon signed-rank, Kruskal–Wallis H."""

from __future__ import annotations

from typing import TYPE_CHECKING, Literal, Mapping, Sequence

from ..coding import category_text
from ..errors import InputError
from ..records import EffectSize, GroupSummary, Note, Result, Statistic
from . import _common as c

if TYPE_CHECKING:
    import numpy as np
    import pandas as pd

PMethod = Literal["auto", "exact", "asymptotic"]
_WORDS = {"exact": "exact p", "asymptotic": "normal approximation"}


def _median_summary(label: str, v: "np.ndarray") -> GroupSummary:
    import numpy as np

    q1, q3 = np.percentile(v, [25, 75])
    return GroupSummary(label, n=len(v), median=float(np.median(v)), q1=float(q1), q3=float(q3))


def score_precision(samples: "Sequence[np.ndarray]", groups: "Sequence[GroupSummary]") -> dict[str, int]:
    """Held decimals for the groups' medians and quartiles when every value is a whole number (a score, a rating, a
    count), the same for every group: the quartiles' are ``score_decimals`` of medians and quartiles together, as Table
    1 prints an ordinal row; the medians' of the medians alone (whole, or halves), for a sentence that gives medians
    without quartiles — "Mdn = 5", not "5.00" because some quartile fell between scores. A sentence that gives both
    prints the median with its quartiles' decimals (`sentences`)."""
    import numpy as np

    from ..style.numbers import score_decimals

    if not samples or not all(len(v) and np.array_equal(v, np.floor(v)) for v in samples):
        return {}
    medians = score_decimals(g.median for g in groups if g.median is not None)
    quartiles = score_decimals(x for g in groups for x in (g.median, g.q1, g.q3) if x is not None)
    decimals = {"median": medians, "q1": quartiles, "q3": quartiles}
    return {f"groups[{i}].{name}": d for i in range(len(groups)) for name, d in decimals.items() if d is not None}


def _two_groups(df: "pd.DataFrame", outcome: str, group: str, groups: Sequence[object] | None, test: str):  # type: ignore[no-untyped-def]
    data, missing = c.listwise(df, [outcome, group])
    y = c.numeric(data, outcome)
    levels = c.two_levels(data, group, groups, test)
    samples = [y[data[group] == lev].to_numpy() for lev in levels]
    for lev, v in zip(levels, samples):
        if len(v) < 1:
            raise InputError(f"{group} = {category_text(lev)}: no values")
    return levels, samples, missing


def mann_whitney(
    df: "pd.DataFrame",
    outcome: str,
    group: str,
    *,
    groups: Sequence[object] | None = None,
    variant: PMethod = "auto",
    alternative: str = "two-sided",
    labels: Mapping[str, str] | None = None,
) -> Result:
    """Mann–Whitney U of the first group; rank-biserial r = 2U/(n1·n2) − 1
    (positive when the first group tends to be higher; Kerby, 2014). ``auto``
    means exact when a group has at most 8 values and there are no ties
    (scipy's rule), the normal approximation with a tie correction otherwise;
    the method used is stated. ``variant`` is auto, exact or asymptotic."""
    import numpy as np
    from scipy import stats

    levels, (a, b), missing = _two_groups(df, outcome, group, groups, "Mann–Whitney test")
    method = variant
    if method not in ("auto", "exact", "asymptotic"):
        raise InputError(f"variant: {method!r} is not auto, exact or asymptotic")
    if method == "auto":
        ties = len(np.unique(np.concatenate([a, b]))) < len(a) + len(b)
        method = "exact" if min(len(a), len(b)) <= 8 and not ties else "asymptotic"
    if c.constant(a, b):
        raise InputError(f"{outcome}: every value is the same; the ranks are all tied and U's p is undefined")
    res = stats.mannwhitneyu(a, b, alternative=alternative, method=method)
    u = float(res.statistic)
    r = 2 * u / (len(a) * len(b)) - 1
    return Result(
        kind="mann_whitney",
        statistic=Statistic("U", u),
        p=float(res.pvalue),
        alternative=alternative,  # type: ignore[arg-type]
        n=len(a) + len(b),
        effects=(EffectSize("r_rb", r, method="rank-biserial r = 2U/(n1 n2) - 1 (Kerby, 2014)"),),
        groups=(summaries := (_median_summary(category_text(levels[0]), a), _median_summary(category_text(levels[1]), b))),
        precision=score_precision((a, b), summaries),
        variables=c.variables({"outcome": outcome, "group": group}, labels),
        notes=c.notes(Note("method", f"p from the {_WORDS[method]}; U is that of {category_text(levels[0])}."), missing),
        details={"method": _WORDS[method]},
        provenance=c.provenance("statsetter.analyses.mann_whitney"),
    )


def wilcoxon_signed_rank(
    df: "pd.DataFrame",
    first: str | None = None,
    second: str | None = None,
    *,
    outcome: str | None = None,
    subject: str | None = None,
    within: str | None = None,
    conditions: Sequence[object] | None = None,
    variant: PMethod = "auto",
    alternative: str = "two-sided",
    labels: Mapping[str, str] | None = None,
    outcome_label: str | None = None,
) -> Result:
    """Wilcoxon signed-rank test of ``first`` − ``second`` (zero differences
    dropped). T is the smaller signed-rank sum; the matched-pairs rank-biserial
    r = (W+ − W−)/(W+ + W−) (Kerby, 2014). ``auto`` means exact for up to 50
    non-zero differences without ties, the normal approximation otherwise
    (``variant`` is auto, exact or asymptotic). Long data: as ``t_paired``."""
    import numpy as np
    from scipy import stats

    df, first, second, labels, outcome_label = c.paired_columns("wilcoxon_signed_rank", df, first, second, outcome, subject, within, conditions, labels, outcome_label)

    data, missing = c.listwise(df, [first, second])
    a, b = c.numeric(data, first).to_numpy(), c.numeric(data, second).to_numpy()
    d = a - b
    nz = d[d != 0]
    if len(nz) < 1:
        raise InputError(f"{first} − {second}: every difference is zero; the test is undefined")
    ranks = stats.rankdata(np.abs(nz))
    w_plus, w_minus = float(ranks[nz > 0].sum()), float(ranks[nz < 0].sum())
    method = variant
    if method not in ("auto", "exact", "asymptotic"):
        raise InputError(f"variant: {method!r} is not auto, exact or asymptotic")
    if method == "auto":
        ties = len(np.unique(np.abs(nz))) < len(nz)
        method = "exact" if len(nz) <= 50 and not ties else "asymptotic"
    res = stats.wilcoxon(a, b, alternative=alternative, method="approx" if method == "asymptotic" else "exact")
    labels = dict(labels or {})
    variables = c.paired_variables(first, second, labels, outcome_label)
    dropped = len(d) - len(nz)
    return Result(
        kind="wilcoxon",
        statistic=Statistic("T", float(min(w_plus, w_minus)) if alternative == "two-sided" else float(res.statistic)),
        p=float(res.pvalue),
        alternative=alternative,  # type: ignore[arg-type]
        n=len(nz),
        effects=(EffectSize("r_rb", (w_plus - w_minus) / (w_plus + w_minus), method="matched-pairs rank-biserial r (Kerby, 2014)"),),
        groups=(summaries := (_median_summary(labels.get(first, first), a), _median_summary(labels.get(second, second), b))),
        precision=score_precision((a, b), summaries),
        variables=variables,
        notes=c.notes(
            Note("method", f"p from the {_WORDS[method]}; {dropped} zero difference(s) dropped."),
            missing,
        ),
        details={"method": _WORDS[method], "W_plus": w_plus, "W_minus": w_minus},
        provenance=c.provenance("statsetter.analyses.wilcoxon_signed_rank"),
    )


def kruskal_wallis(
    df: "pd.DataFrame",
    outcome: str,
    group: str,
    *,
    labels: Mapping[str, str] | None = None,
) -> Result:
    """Kruskal–Wallis H (tie-corrected, χ² approximation) with
    ε² = H(n + 1)/(n² − 1) (Tomczak & Tomczak, 2014)."""
    from scipy import stats

    levels, samples, missing = c.grouped(df, outcome, group, "a Kruskal–Wallis test", min_n=1)
    if c.constant(*samples):
        raise InputError(f"{outcome}: every value is the same; the ranks are all tied and H is undefined")
    res = stats.kruskal(*samples)
    n = sum(len(v) for v in samples)
    h = float(res.statistic)
    return Result(
        kind="kruskal_wallis",
        statistic=Statistic("H", h, (len(levels) - 1,)),
        p=float(res.pvalue),
        n=n,
        effects=(EffectSize("epsilon2", h * (n + 1) / (n * n - 1), method="H(n + 1)/(n^2 - 1) (Tomczak & Tomczak, 2014)"),),
        groups=(summaries := tuple(_median_summary(category_text(lev), v) for lev, v in zip(levels, samples))),
        precision=score_precision(samples, summaries),
        variables=c.variables({"outcome": outcome, "group": group}, labels),
        notes=c.notes(Note("method", "p from the chi-square approximation, corrected for ties."), missing),
        details={"method": "chi-square approximation"},
        provenance=c.provenance("statsetter.analyses.kruskal_wallis"),
    )
