"""Pearson r, Spearman rs and Kendall τb between two columns."""

from __future__ import annotations

import math
from typing import TYPE_CHECKING, Literal, Mapping

from ..errors import InputError
from ..records import EffectSize, Interval, Result, Statistic
from . import _common as c
from ..formulas import fisher_z_ci
from .effects import kendall_tau_b_se

if TYPE_CHECKING:
    import numpy as np
    import pandas as pd

Method = Literal["pearson", "spearman", "kendall"]


SYMBOLS = {"pearson": "r", "spearman": "rs", "kendall": "tau_b"}


def correlation_effect(
    method: str, value: float, n: int, level: float, data: "tuple[np.ndarray, np.ndarray] | None" = None
) -> EffectSize:
    """The correlation as an effect size with its CI: Fisher's z with SE
    1/√(n − 3) (Pearson) or √((1 + rs²/2)/(n − 3)) (Spearman; Bonett &
    Wright, 2000); for Kendall's τb, Fisher's z with the delta-method SE
    ASE/(1 − τb²), where ASE is τb's asymptotic SE from the data (ties
    allowed, :func:`~statsetter.analyses.effects.kendall_tau_b_se`). Without
    the data τb gets no CI: its SE depends on the ties."""
    if method == "kendall":
        if data is None:
            return EffectSize(SYMBOLS[method], value, None, method="no CI: the SE of τb depends on the ties in the data")
        _, ase = kendall_tau_b_se(*data)
        se, name = (ase / (1 - value * value) if abs(value) < 1 else 0.0), "Fisher z, asymptotic SE of τb (delta method; ties allowed)"
    elif n <= 3:  # the Fisher z SE, 1/√(n − 3) (or Bonett & Wright's), needs a fourth pair
        return EffectSize(SYMBOLS[method], value, None, method=f"no CI: the Fisher z interval needs more than 3 pairs ({n} here)")
    elif method == "pearson":
        se, name = None, "Fisher z"
    else:
        se, name = math.sqrt((1 + value * value / 2) / (n - 3)), "Fisher z, Bonett & Wright (2000) SE"
    lo, hi = fisher_z_ci(value, n, level, se)
    return EffectSize(SYMBOLS[method], value, Interval(level, lo, hi), method=name)


def correlate(
    df: "pd.DataFrame",
    x: str,
    y: str,
    *,
    coefficient: Method = "pearson",
    level: float = 0.95,
    alternative: str = "two-sided",
    labels: Mapping[str, str] | None = None,
) -> Result:
    """A correlation record with its CI (see :func:`correlation_effect`);
    ``coefficient`` is pearson, spearman or kendall (the functions of those
    names are this one with the coefficient chosen)."""
    from scipy import stats

    method = coefficient
    if method not in ("pearson", "spearman", "kendall"):
        raise InputError(f"coefficient: {method!r} is not pearson, spearman or kendall")
    data, missing = c.listwise(df, [x, y])
    a, b = c.numeric(data, x).to_numpy(), c.numeric(data, y).to_numpy()
    n = len(a)
    if n < 3 + (method == "kendall"):
        raise InputError(f"{x}, {y}: {n} complete pairs; a correlation with a CI needs at least {4 + (method == 'kendall')}")
    for name, v in ((x, a), (y, b)):
        if v.min() == v.max():
            raise InputError(f"{name}: zero variance (every value is {v[0]:g}); a correlation is undefined")
    test = {"pearson": stats.pearsonr, "spearman": stats.spearmanr, "kendall": stats.kendalltau}[method]
    res = test(a, b, alternative=alternative)
    value, p = float(res.statistic), float(res.pvalue)
    return Result(
        kind=method,
        statistic=Statistic(SYMBOLS[method], value, (n - 2,) if method != "kendall" else ()),
        p=p,
        alternative=alternative,  # type: ignore[arg-type]
        n=n,
        effects=(correlation_effect(method, value, n, level, (a, b) if method == "kendall" else None),),
        variables=c.variables({"x": x, "y": y}, labels),
        notes=c.notes(missing),
        provenance=c.provenance(f"statsetter.analyses.correlate({method})"),
    )


def pearson(df: "pd.DataFrame", x: str, y: str, *, level: float = 0.95, alternative: str = "two-sided", labels: Mapping[str, str] | None = None) -> Result:
    """Pearson's r with its Fisher-z CI."""
    return correlate(df, x, y, coefficient="pearson", level=level, alternative=alternative, labels=labels)


def spearman(df: "pd.DataFrame", x: str, y: str, *, level: float = 0.95, alternative: str = "two-sided", labels: Mapping[str, str] | None = None) -> Result:
    """Spearman's rs with its CI (Fisher z, Bonett & Wright SE)."""
    return correlate(df, x, y, coefficient="spearman", level=level, alternative=alternative, labels=labels)


def kendall(df: "pd.DataFrame", x: str, y: str, *, level: float = 0.95, alternative: str = "two-sided", labels: Mapping[str, str] | None = None) -> Result:
    """Kendall's τb with its CI (Fisher z, asymptotic SE; ties allowed)."""
    return correlate(df, x, y, coefficient="kendall", level=level, alternative=alternative, labels=labels)
