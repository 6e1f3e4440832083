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

from ..errors import InputError
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
    (details and a note).

    A categorical moderator (a pandas categorical, text, or numbers with
    only two values — that choice said in a note) enters as indicators
    against its first category, with one product per indicator; with more
    than two categories the products are tested together (F of the change
    in fit, an ``anova_term`` record with η²p); the simple slopes are the
    predictor's slope in each category (b_x plus that category's product
    coefficient, SE from their covariance). Only the predictor is centred."""
    import numpy as np
    import pandas as pd
    from scipy import stats
    from statsmodels.regression.linear_model import OLS

    from .regression import linear_regression

    names = [outcome, predictor, moderator, *covariates]
    data, missing = c.listwise(df, names)
    ms = data[moderator]
    binary = pd.api.types.is_numeric_dtype(ms) and not pd.api.types.is_bool_dtype(ms) and ms.nunique() == 2 and at is None
    if isinstance(ms.dtype, pd.CategoricalDtype) or not pd.api.types.is_numeric_dtype(ms) or pd.api.types.is_bool_dtype(ms) or binary:
        if at is not None:
            raise InputError(f"{moderator}: categorical; simple slopes are at each category, so at= does not apply")
        return _by_category(data, missing, (outcome, predictor, moderator), covariates, center, level, labels, binary)
    x = c.numeric(data, predictor).to_numpy(dtype=float)
    m = c.numeric(data, moderator).to_numpy(dtype=float)
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
        records.append(_slope_record(*slope(value), dfe, crit, level, len(y), variables, c.notes(centring, missing),
                                     {"moderator_value": float(value), "at": words, "product": product}))
    return records


def _by_category(data: "pd.DataFrame", missing: Note, names: tuple[str, str, str], covariates: Sequence[str], center: bool, level: float,
                 labels: Mapping[str, str] | None, binary: bool) -> list[Result]:
    """Moderation by a categorical moderator: indicators, products, the joint test and a slope per category."""
    from dataclasses import replace

    import numpy as np
    import pandas as pd
    from scipy import stats
    from statsmodels.regression.linear_model import OLS

    from ..coding import categories, category_text, factor
    from .effects import variance_explained
    from .regression import linear_regression

    outcome, predictor, moderator = names
    s = data[moderator] if isinstance(data[moderator].dtype, pd.CategoricalDtype) else factor(data[moderator])
    present = categories(s)
    if len(present) < 2:
        raise InputError(f"{moderator}: one category ({category_text(present[0])}); a moderator needs at least two")
    x = c.numeric(data, predictor).to_numpy(dtype=float)
    y = c.numeric(data, outcome).to_numpy(dtype=float)
    for lev in present:
        inside = (s == lev).to_numpy()
        if inside.sum() < 3 or np.ptp(x[inside]) == 0:
            raise InputError(f"{moderator}: category {category_text(lev)!r} has {int(inside.sum())} case(s)"
                             + (" with one value of " + predictor if inside.sum() >= 3 else "") + "; a slope within a category needs at least three cases and two values")
    mx = float(x.mean())
    xc = x - mx if center else x
    named = dict(labels or {})
    shown_x, shown_m = named.get(predictor, predictor) + (" (centred)" if center else ""), named.get(moderator, moderator)
    frame = pd.DataFrame({outcome: y, predictor: xc, moderator: s.to_numpy()}, index=data.index)
    frame[moderator] = frame[moderator].astype(s.dtype)
    products, model_labels = [], {**named, predictor: shown_x}
    for lev in present[1:]:
        name = f"{predictor} × {moderator}[{category_text(lev)}]"
        frame[name] = xc * (s == lev).to_numpy(dtype=float)
        products.append(name)
        model_labels[name] = f"{shown_x} × {shown_m} ({category_text(lev)} vs {category_text(present[0])})"
    for cov in covariates:
        frame[cov] = data[cov]
    records = list(linear_regression(frame, outcome, [predictor, moderator, *products, *covariates], level=level, labels=model_labels))
    records = [replace(r, details={**r.details, "interaction": True}) if r.details.get("term") in products else r for r in records]
    dummies = [(s == lev).to_numpy(dtype=float) for lev in present[1:]]
    covs = [c.numeric(data, cov).to_numpy(dtype=float) for cov in covariates]
    X = np.column_stack([np.ones(len(y)), xc, *dummies, *[xc * d for d in dummies], *covs])
    fit = OLS(y, X).fit()
    q = len(dummies)
    b, V, dfe = fit.params, fit.cov_params(), float(fit.df_resid)
    crit = float(stats.t.ppf(0.5 + level / 2, dfe))
    chosen = Note("choice", f"{shown_m} has two values, so it is treated as categorical (reference {category_text(present[0])}): "
                            "a slope for each; give it as a continuous moderator with at= to override.") if binary else None
    variables = c.variables({"outcome": outcome, "predictor": predictor, "moderator": moderator}, labels)
    prov = c.provenance("statsetter.analyses.moderation", statsmodels=True)
    if q > 1:
        reduced = OLS(y, np.column_stack([np.ones(len(y)), xc, *dummies, *covs])).fit()
        ss, ss_error = float(reduced.ssr - fit.ssr), float(fit.ssr)
        F = (ss / q) / (ss_error / dfe)
        records.append(Result(
            kind="anova_term",
            statistic=Statistic("F", F, (float(q), dfe)),
            p=float(stats.f.sf(F, q, dfe)),
            n=len(y),
            effects=(variance_explained("eta2_p", ss / (ss + ss_error), F, q, dfe, level),),
            variables=variables,
            notes=c.notes(Note("method", f"The {q} product terms tested together: F of the change in fit when they are added."), chosen, missing),
            details={"term": f"{shown_x} × {shown_m}", "interaction": True, "ss": ss, "ss_error": ss_error},
            provenance=prov,
        ))
    method = Note("method", f"Simple slopes of {named.get(predictor, predictor)} in each category of {shown_m} (Aiken & West, 1991); "
                            "a Johnson–Neyman region does not apply to a categorical moderator"
                            + (f"; {named.get(predictor, predictor)} centred at its mean ({mx:.4g})." if center else "."))
    for j, lev in enumerate(present):
        g = np.zeros(len(b))
        g[1] = 1.0
        if j:
            g[1 + q + j] = 1.0
        records.append(_slope_record(float(g @ b), float(np.sqrt(g @ V @ g)), dfe, crit, level, len(y), variables, c.notes(method, chosen, missing),
                                     {"category": category_text(lev), "n_category": int((s == lev).sum()), "reference": j == 0}))
    return records


def _slope_record(est: float, se: float, dfe: float, crit: float, level: float, n: int, variables: tuple, notes: tuple[Note, ...],  # type: ignore[type-arg]
                  details: Mapping[str, object]) -> Result:
    from scipy import stats

    t = est / se
    return Result(
        kind="simple_slope",
        statistic=Statistic("t", t, (dfe,)),
        p=float(2 * stats.t.sf(abs(t), dfe)),
        n=n,
        estimate=Estimate("slope", est, se=se, ci=Interval(level, est - crit * se, est + crit * se)),
        variables=variables,
        notes=notes,
        details=details,
        provenance=c.provenance("statsetter.analyses.moderation", statsmodels=True),
    )


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
