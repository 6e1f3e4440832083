"""Independent, paired and one-sample t tests with d and g and their intervals."""

from __future__ import annotations

import math
from typing import TYPE_CHECKING, Literal, Mapping, Sequence

from ..coding import category_text
from ..errors import InputError
from ..records import Estimate, GroupSummary, Interval, Note, Result, Statistic
from . import _common as c
from .effects import d_from_t, hedges_g

if TYPE_CHECKING:
    import numpy as np
    import pandas as pd


def _moments(v: "np.ndarray") -> tuple[float, float]:
    """Mean and variance (n − 1), each computed once."""
    m = float(v.mean())
    dev = v - m
    return m, float(dev @ dev) / (len(v) - 1)


def _finite(level: float, low: float, high: float) -> Interval | None:
    """The CI of a two-sided test; a one-sided test's interval is open on one
    side and is left out of the record (its p and the test direction are kept)."""
    return Interval(level, low, high) if math.isfinite(low) and math.isfinite(high) else None


def _two_sample_t(
    ma: float, va: float, n1: int, mb: float, vb: float, n2: int, pooled: bool, alternative: str, level: float
) -> tuple[float, float, float, float, float]:
    """(t, df, p, CI low, CI high) of the mean difference from the groups'
    moments: Student's pooled SE or Welch's SE with the Welch–Satterthwaite df,
    as scipy.stats.ttest_ind computes them (the tests compare the two)."""
    from scipy import special

    if pooled:
        df = float(n1 + n2 - 2)
        se = math.sqrt(((n1 - 1) * va + (n2 - 1) * vb) / df * (1 / n1 + 1 / n2))
    else:
        qa, qb = va / n1, vb / n2
        df = (qa + qb) ** 2 / (qa * qa / (n1 - 1) + qb * qb / (n2 - 1))
        se = math.sqrt(qa + qb)
    diff = ma - mb
    t = diff / se
    if alternative == "two-sided":
        p = 2 * float(special.stdtr(df, -abs(t)))
        half = float(special.stdtrit(df, 0.5 + level / 2)) * se
        low, high = diff - half, diff + half
    elif alternative == "less":
        p = float(special.stdtr(df, t))
        low, high = -math.inf, diff + float(special.stdtrit(df, level)) * se
    elif alternative == "greater":
        p = float(special.stdtr(df, -t))
        low, high = diff - float(special.stdtrit(df, level)) * se, math.inf
    else:
        raise InputError(f"alternative: {alternative!r} is not two-sided, less or greater")
    return t, df, min(p, 1.0), low, high


def _levene(a: "np.ndarray", b: "np.ndarray", ma: float, mb: float) -> tuple[float, float]:
    """Levene's test centred on the mean (scipy.stats.levene(center="mean")):
    the one-way ANOVA F of the absolute deviations from each group's mean."""
    import numpy as np
    from scipy import special

    za, zb = np.abs(a - ma), np.abs(b - mb)
    n1, n2 = len(a), len(b)
    ga, gb = float(za.mean()), float(zb.mean())
    grand = (n1 * ga + n2 * gb) / (n1 + n2)
    between = n1 * (ga - grand) ** 2 + n2 * (gb - grand) ** 2
    da, db = za - ga, zb - gb
    within = float(da @ da) + float(db @ db)
    if within == 0:
        return math.inf, 0.0
    f = between / (within / (n1 + n2 - 2))
    return f, float(special.fdtrc(1, n1 + n2 - 2, f))


def _summary(label: str, v: "np.ndarray") -> GroupSummary:
    return GroupSummary(label, n=len(v), mean=float(v.mean()), sd=float(v.std(ddof=1)))


def t_independent(
    df: "pd.DataFrame",
    outcome: str,
    group: str,
    *,
    groups: Sequence[object] | None = None,
    variant: Literal["welch", "student"] = "welch",
    level: float = 0.95,
    alternative: str = "two-sided",
    labels: Mapping[str, str] | None = None,
) -> Result:
    """Welch's t test by default (Student's on request) of ``outcome`` between
    the two levels of ``group`` (or the two named in ``groups``, in that order).
    Levene's test (centred on the mean) is attached as a note. d uses the
    pooled SD; its CI is the noncentral-t interval; g applies Hedges' exact J."""

    if variant not in ("welch", "student"):
        raise InputError(f"variant: {variant!r} is not welch or student")
    data, missing = c.listwise(df, [outcome, group])
    y = c.numeric(data, outcome)
    g = data[group]
    found, samples = c.split_by(y, g)  # the group column encoded once: its groups in code order and their values
    levels = c.two_levels(data, group, groups, "t test (or an ANOVA for more)", present=found)
    by_level = dict(zip(found, samples))
    a, b = (by_level[lev] for lev in levels)  # two_levels picks from the groups found
    for lev, v in zip(levels, (a, b)):
        if len(v) < 2:
            raise InputError(f"{group} = {category_text(lev)}: n = {len(v)}; each group needs at least 2 values")
    (ma, va), (mb, vb) = _moments(a), _moments(b)
    if c.constant(a) and c.constant(b):
        raise InputError(f"{outcome}: zero variance in both groups; the t statistic is undefined")
    n1, n2 = len(a), len(b)
    t_value, df_value, p_value, ci_low, ci_high = _two_sample_t(ma, va, n1, mb, vb, n2, variant == "student", alternative, level)
    sp = math.sqrt(((n1 - 1) * va + (n2 - 1) * vb) / (n1 + n2 - 2))
    scale = math.sqrt(1 / n1 + 1 / n2)
    t_pooled = (ma - mb) / (sp * scale)
    d = d_from_t("d", float(t_pooled), n1 + n2 - 2, scale, level)
    g_ = hedges_g(d, n1 + n2 - 2)
    lev_f, lev_p = _levene(a, b, ma, mb)
    lev_note = Note(
        "assumption",
        f"Levene's test (centred on the mean): F(1, {n1 + n2 - 2}) = {c.fmt(lev_f)}, p = {c.fmt(lev_p)}.",
        extra={"F": lev_f, "df": [1, n1 + n2 - 2], "p": lev_p},
    )
    choice = Note(
        "method",
        "Welch's t test (variances not assumed equal)." if variant == "welch" else "Student's t test (equal variances assumed).",
    )
    glabels = [category_text(x) for x in levels]
    return Result(
        kind="t_independent",
        statistic=Statistic("t", t_value, (df_value,)),
        p=p_value,
        alternative=alternative,  # type: ignore[arg-type]
        n=n1 + n2,
        estimate=Estimate("mean difference", ma - mb, ci=_finite(level, ci_low, ci_high)),
        effects=(d, g_),
        groups=(GroupSummary(glabels[0], n=n1, mean=ma, sd=math.sqrt(va)), GroupSummary(glabels[1], n=n2, mean=mb, sd=math.sqrt(vb))),
        variables=c.variables({"outcome": outcome, "group": group}, labels),
        notes=c.notes(choice, lev_note, missing),
        details={"variant": variant},
        provenance=c.provenance(f"statsetter.analyses.t_independent({variant})"),
    )


def t_paired(
    df: "pd.DataFrame",
    first: str | None = None,
    second: str | None = None,
    *,
    outcome: str | None = None,
    subject: str | None = None,
    within: str | None = None,
    conditions: Sequence[object] | None = None,
    effect: Literal["d_z", "d_av"] = "d_z",
    level: float = 0.95,
    alternative: str = "two-sided",
    labels: Mapping[str, str] | None = None,
    outcome_label: str | None = None,
) -> Result:
    """Paired t test of ``first`` − ``second``. d_z = mean difference / SD of
    the differences, with the noncentral-t CI; d_av = mean difference / mean
    of the two SDs (Cumming, 2012), reported without an interval.

    Wide data name the two columns (``first``, ``second``); long data (a row
    per subject and condition) name ``outcome``, ``subject`` and ``within``,
    and the two ``conditions`` when ``within`` has more."""
    from scipy import stats

    df, first, second, labels, outcome_label = c.paired_columns("t_paired", df, first, second, outcome, subject, within, conditions, labels, outcome_label)

    if effect not in ("d_z", "d_av"):
        raise InputError(f"effect: {effect!r} is not d_z or d_av")
    data, missing = c.listwise(df, [first, second])
    a, b = c.numeric(data, first).to_numpy(), c.numeric(data, second).to_numpy()
    n = len(a)
    if n < 2:
        raise InputError(f"{first}, {second}: {n} complete pair(s); a paired t test needs at least 2")
    diff = a - b
    if c.constant(diff):
        raise InputError(f"{first} − {second}: the differences have zero variance; the t statistic is undefined")
    res = stats.ttest_rel(a, b, alternative=alternative)
    ci = res.confidence_interval(level)
    if effect == "d_z":
        es = d_from_t("d_z", float(res.statistic), n - 1, 1 / math.sqrt(n), level)
    else:
        from ..records import EffectSize

        es = EffectSize("d_av", float(diff.mean() / ((a.std(ddof=1) + b.std(ddof=1)) / 2)), method="mean difference / mean SD; no interval computed")
    labels = dict(labels or {})
    variables = c.paired_variables(first, second, labels, outcome_label)
    return Result(
        kind="t_paired",
        statistic=Statistic("t", float(res.statistic), (float(res.df),)),
        p=float(res.pvalue),
        alternative=alternative,  # type: ignore[arg-type]
        n=n,
        estimate=Estimate("mean difference", float(diff.mean()), ci=_finite(level, float(ci.low), float(ci.high))),
        effects=(es,),
        groups=(_summary(labels.get(first, first), a), _summary(labels.get(second, second), b)),
        variables=variables,
        notes=c.notes(Note("method", f"Effect size {effect} ({es.method})."), missing),
        provenance=c.provenance("statsetter.analyses.t_paired"),
    )


def t_one_sample(
    df: "pd.DataFrame",
    outcome: str,
    mu: float,
    *,
    subject: str | None = None,
    within: str | None = None,
    condition: object | None = None,
    level: float = 0.95,
    alternative: str = "two-sided",
    labels: Mapping[str, str] | None = None,
) -> Result:
    """One-sample t test of ``outcome`` against ``mu``; d = (M − mu) / SD with
    the noncentral-t CI. In long data (a row per subject and condition), name
    ``within`` and the ``condition`` to test (``subject`` checks that each
    subject has one row in it)."""
    from scipy import stats

    df = c.one_condition(df, outcome, subject, within, condition)
    data, missing = c.listwise(df, [outcome])
    a = c.numeric(data, outcome).to_numpy()
    n = len(a)
    if n < 2:
        raise InputError(f"{outcome}: n = {n}; a t test needs at least 2 values")
    c.require_variance(a, outcome, "the t statistic is undefined")
    res = stats.ttest_1samp(a, mu, alternative=alternative)
    ci = res.confidence_interval(level)
    d = d_from_t("d", float(res.statistic), n - 1, 1 / math.sqrt(n), level)
    return Result(
        kind="t_one_sample",
        statistic=Statistic("t", float(res.statistic), (float(res.df),)),
        p=float(res.pvalue),
        alternative=alternative,  # type: ignore[arg-type]
        n=n,
        estimate=Estimate("mean difference", float(a.mean() - mu), ci=_finite(level, float(ci.low - mu), float(ci.high - mu))),
        effects=(d,),
        groups=(_summary("sample", a),),
        variables=c.variables({"outcome": outcome}, labels),
        notes=c.notes(missing),
        details={"mu": float(mu)},
        provenance=c.provenance("statsetter.analyses.t_one_sample"),
    )
