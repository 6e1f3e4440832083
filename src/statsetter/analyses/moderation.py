"""Moderation: a linear regression with the product of a predictor and a
moderator, its simple slopes and the Johnson–Neyman region.

The model is fitted by `linear_regression` (its records: the model, the
intercept, each coefficient, the product term named "x × m"), on centred
variables unless asked otherwise (said in the notes). A simple slope is the
predictor's coefficient at one value of the moderator, b_x + b_xm·m, with the
SE from the coefficients' covariance; the Johnson–Neyman values are the
moderator values where that slope's t equals the critical t (Johnson &
Neyman, 1936; Bauer & Curran, 2005), reported with the part of the region
inside the observed moderator range.
"""

from __future__ import annotations

import math
from typing import TYPE_CHECKING, Mapping, Sequence

from ..records import Estimate, Interval, Note, Result, Statistic
from . import _common as c

if TYPE_CHECKING:
    import pandas as pd


def moderation(
    df: "pd.DataFrame",
    outcome: str,
    predictor: str,
    moderator: str,
    *,
    covariates: Sequence[str] = (),
    center: bool = True,
    at: Sequence[float] | None = None,
    level: float = 0.95,
    labels: Mapping[str, str] | None = None,
) -> list[Result]:
    """The regression of ``outcome`` on ``predictor``, a numeric
    ``moderator``, their product and ``covariates``; then the simple slopes
    of ``predictor`` at the moderator values ``at`` (default: its mean − 1 SD,
    mean and mean + 1 SD, on the moderator's own scale), each with B, SE, t,
    p and CI; the Johnson–Neyman values go into the product term's record
    (details and a note)."""
    import numpy as np
    import pandas as pd
    from scipy import stats
    from statsmodels.regression.linear_model import OLS

    from .regression import linear_regression

    names = [outcome, predictor, moderator, *covariates]
    data, missing = c.listwise(df, names)
    x = c.numeric(data, predictor).to_numpy(dtype=float)
    m = c.numeric(data, moderator).to_numpy(dtype=float)  # a categorical moderator: code it, or fit the groups separately
    y = c.numeric(data, outcome).to_numpy(dtype=float)
    mx, mm, sm = float(x.mean()), float(m.mean()), float(m.std(ddof=1))
    xc, mc = (x - mx, m - mm) if center else (x, m)
    product = f"{predictor} × {moderator}"
    frame = pd.DataFrame({outcome: y, predictor: xc, moderator: mc, product: xc * mc}, index=data.index)
    for cov in covariates:
        frame[cov] = data[cov]
    named = dict(labels or {})
    shown = {name: named.get(name, name) + (" (centred)" if center and name in (predictor, moderator) else "") for name in (predictor, moderator)}
    model_labels = {**named, **shown, product: f"{shown[predictor]} × {shown[moderator]}"}
    records = list(linear_regression(frame, outcome, [predictor, moderator, product, *covariates], level=level, labels=model_labels))
    X = np.column_stack([np.ones(len(y)), xc, mc, xc * mc] + [c.numeric(data, cov).to_numpy(dtype=float) for cov in covariates])
    fit = OLS(y, X).fit()
    b, V, dfe = fit.params, fit.cov_params(), float(fit.df_resid)
    crit = float(stats.t.ppf(0.5 + level / 2, dfe))

    def slope(value: float) -> tuple[float, float]:
        v = value - mm if center else value
        return float(b[1] + b[3] * v), math.sqrt(float(V[1, 1] + 2 * v * V[1, 3] + v * v * V[3, 3]))

    values = list(at) if at is not None else [mm - sm, mm, mm + sm]
    described = ["the mean − 1 SD", "the mean", "the mean + 1 SD"] if at is None else [""] * len(values)
    jn = _johnson_neyman(b[1], b[3], V[1, 1], V[1, 3], V[3, 3], crit)
    lo, hi = float(m.min()), float(m.max())
    jn_original = [r + mm if center else r for r in jn]
    region = _region(b[1], b[3], V, crit, jn, mm if center else 0.0, lo, hi)
    note = Note("method", f"Johnson–Neyman: {region} (moderator observed from {lo:.4g} to {hi:.4g}; Bauer & Curran, 2005).")
    product_record = next(i for i, r in enumerate(records) if r.details.get("term") == product)
    records[product_record] = _with(records[product_record], note, {"interaction": True, "moderator_min": lo, "moderator_max": hi,
                                                                      "johnson_neyman": ", ".join(f"{v:.6g}" for v in jn_original) or "none"})
    variables = c.variables({"outcome": outcome, "predictor": predictor, "moderator": moderator}, labels)
    centring = Note("method", f"{named.get(predictor, predictor)} and {named.get(moderator, moderator)} centred at their means "
                              f"({mx:.4g} and {mm:.4g}) before the product was formed." if center else "Variables not centred.")
    for value, words in zip(values, described):
        est, se = slope(value)
        t = est / se
        records.append(Result(
            kind="simple_slope",
            statistic=Statistic("t", t, (dfe,)),
            p=float(2 * stats.t.sf(abs(t), dfe)),
            n=len(y),
            estimate=Estimate("slope", est, se=se, ci=Interval(level, est - crit * se, est + crit * se)),
            variables=variables,
            notes=c.notes(centring, missing),
            details={"moderator_value": float(value), "at": words, "product": product},
            provenance=c.provenance("statsetter.analyses.moderation", statsmodels=True),
        ))
    return records


def _with(r: Result, note: Note, details: Mapping[str, object]) -> Result:
    from dataclasses import replace

    return replace(r, notes=r.notes + (note,), details={**r.details, **details})


def _johnson_neyman(bx: float, bxm: float, vxx: float, vxm: float, vmm: float, crit: float) -> list[float]:
    """The moderator values (on the fitted scale) where the slope's t equals ±crit: the roots of
    (bxm² − t²vmm)m² + 2(bx·bxm − t²vxm)m + (bx² − t²vxx) = 0."""
    t2 = crit * crit
    a, h, k = bxm * bxm - t2 * vmm, bx * bxm - t2 * vxm, bx * bx - t2 * vxx
    if abs(a) < 1e-300:
        return [-k / (2 * h)] if h else []
    disc = h * h - a * k
    if disc < 0:
        return []
    root = math.sqrt(disc)
    return sorted([(-h - root) / a, (-h + root) / a])


def _region(bx: float, bxm: float, V, crit: float, roots: list[float], shift: float, lo: float, hi: float) -> str:  # type: ignore[no-untyped-def]
    """Where the slope is significant, in words, on the moderator's own scale."""
    def significant(v: float) -> bool:
        se = math.sqrt(float(V[1, 1] + 2 * v * V[1, 3] + v * v * V[3, 3]))
        return abs(bx + bxm * v) / se > crit

    edges = [-math.inf] + roots + [math.inf]
    parts = []
    for left, right in zip(edges, edges[1:]):
        probe = (left + right) / 2 if math.isfinite(left) and math.isfinite(right) else (right - 1 if math.isfinite(right) else left + 1)
        if not math.isfinite(probe):
            probe = 0.0
        if significant(probe):
            a, z = left + shift, right + shift
            if z < lo or a > hi:
                continue
            parts.append(f"below {z:.4g}" if not math.isfinite(a) else f"above {a:.4g}" if not math.isfinite(z) else f"from {a:.4g} to {z:.4g}")
    if not parts:
        return "the slope is not significant anywhere in the observed range"
    return "the slope is significant for moderator values " + " and ".join(parts)
