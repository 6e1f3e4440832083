"""One-way ANOVA, classic and Welch, with η² and ω²."""

from __future__ import annotations

from typing import TYPE_CHECKING, Literal, Mapping

from ..coding import category_text
from ..errors import InputError
from ..formulas import variance_explained_ci
from ..records import EffectSize, GroupSummary, Interval, Note, Result, Statistic
from . import _common as c
from .effects import NCF_METHOD

if TYPE_CHECKING:
    import pandas as pd


def anova_oneway(
    df: "pd.DataFrame",
    outcome: str,
    group: str,
    *,
    variant: Literal["classic", "welch"] = "classic",
    level: float = 0.95,
    labels: Mapping[str, str] | None = None,
) -> Result:
    """F test of ``outcome`` across the levels of ``group``. η² = SS_between /
    SS_total; ω² = (SS_between − df_between · MS_within) / (SS_total + MS_within)
    (Hays, 1963), both from the classic decomposition (also for Welch's F),
    with the noncentral-F interval of the classic F at ``level`` (Steiger,
    2004): one interval, since both estimate the same population proportion.
    The sums of squares go into ``details`` for the ANOVA table."""
    from scipy import stats

    if variant not in ("classic", "welch"):
        raise InputError(f"variant: {variant!r} is not classic or welch")
    levels, samples, missing = c.grouped(df, outcome, group, "an ANOVA")
    if all(c.constant(v) for v in samples):
        raise InputError(f"{outcome}: zero variance within every group; F is undefined")
    flat = [category_text(lev) for lev, v in zip(levels, samples) if c.constant(v)] if variant == "welch" else []
    if flat:  # Welch (1951) weights each group by n / s²: infinite for a group whose values are all alike
        raise InputError(f"{outcome}: zero variance in {group} = {', '.join(flat)} (every value the same); Welch's F weights each group "
                         "by n / s², which is then undefined: compare the groups with the classic F or a rank test")
    res = stats.f_oneway(*samples, equal_var=variant == "classic")
    k, n = len(samples), sum(len(v) for v in samples)
    means = [float(v.mean()) for v in samples]
    grand = sum(len(v) * m for v, m in zip(samples, means)) / n
    ss_b = float(sum(len(v) * (m - grand) ** 2 for v, m in zip(samples, means)))
    ss_w = float(sum(((v - m) ** 2).sum() for v, m in zip(samples, means)))
    ss_t = ss_b + ss_w
    ms_w = (ss_t - ss_b) / (n - k)
    eta2 = ss_b / ss_t
    omega2 = (ss_b - (k - 1) * ms_w) / (ss_t + ms_w)
    classic_f = (ss_b / (k - 1)) / ms_w
    interval = variance_explained_ci(classic_f, k - 1, n - k, level)
    same = "" if variant == "classic" else "from the classic F"
    if variant == "classic":
        dfs = (k - 1, n - k)
    else:
        # Welch (1951): the denominator df, recomputed from the group variances
        w = [len(v) / v.var(ddof=1) for v in samples]
        sw = sum(w)
        lam = sum((1 - wi / sw) ** 2 / (len(v) - 1) for wi, v in zip(w, samples))
        dfs = (k - 1, (k * k - 1) / (3 * lam))
    return Result(
        kind="anova_oneway",
        statistic=Statistic("F", float(res.statistic), dfs),
        p=float(res.pvalue),
        n=n,
        effects=(
            EffectSize("eta2", eta2, Interval(level, *interval), method="; ".join(m for m in (same, NCF_METHOD) if m)),
            EffectSize("omega2", omega2, Interval(level, *interval), method="Hays (1963); may be negative; " + NCF_METHOD),
        ),
        groups=tuple(
            GroupSummary(category_text(lev), n=len(v), mean=float(v.mean()), sd=float(v.std(ddof=1))) for lev, v in zip(levels, samples)
        ),
        variables=c.variables({"outcome": outcome, "group": group}, labels),
        notes=c.notes(
            Note("method", "Welch's F test (variances not assumed equal)." if variant == "welch" else "Classic F test (equal variances assumed)."),
            missing,
        ),
        details={"variant": variant, "ss": ss_b, "ss_error": ss_w, "df_error": n - k},
        provenance=c.provenance(f"statsetter.analyses.anova_oneway({variant})"),
    )
