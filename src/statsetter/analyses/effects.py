"""Effect sizes and their confidence intervals, from unrounded quantities."""

from __future__ import annotations

import math

from ..records import EffectSize, Interval

NCT_METHOD = "noncentral t (Steiger & Fouladi, 1997)"


def nct_ci(t: float, df: float, level: float) -> tuple[float, float]:
    """Limits of the noncentrality parameter: values whose noncentral t
    distribution puts ``t`` at the upper and lower (1 - level) / 2 quantile."""
    from scipy import optimize, stats

    alpha = (1 - level) / 2

    def cdf(ncp: float) -> float:
        value = float(stats.nct.cdf(t, df, ncp))
        if math.isnan(value):  # far tails: the cdf is 0 above t, 1 below
            return 0.0 if ncp > t else 1.0
        return value

    def solve(target: float) -> float:
        f = lambda ncp: cdf(ncp) - target  # noqa: E731
        step = 1.0
        lo = hi = t
        while f(lo) < 0:
            lo -= step
            step *= 2
        step = 1.0
        while f(hi) > 0:
            hi += step
            step *= 2
        return optimize.brentq(f, lo, hi, xtol=1e-13, rtol=1e-15, maxiter=500)

    return solve(1 - alpha), solve(alpha)


def hedges_j(df: float) -> float:
    """Exact small-sample correction J(df) = Γ(df/2) / (√(df/2) Γ((df−1)/2)) (Hedges, 1981)."""
    return math.exp(math.lgamma(df / 2) - math.log(math.sqrt(df / 2)) - math.lgamma((df - 1) / 2))


def d_from_t(name: str, t: float, df: float, scale: float, level: float) -> EffectSize:
    """d = t · scale, with the noncentral-t interval scaled the same way."""
    lo, hi = nct_ci(t, df, level)
    return EffectSize(name, t * scale, Interval(level, lo * scale, hi * scale), method=NCT_METHOD)


def hedges_g(d: EffectSize, df: float) -> EffectSize:
    j = hedges_j(df)
    ci = d.ci
    return EffectSize(
        "g",
        d.value * j,
        Interval(ci.level, ci.low * j, ci.high * j) if ci else None,
        method=f"{d.method}, times the exact J correction (Hedges, 1981)",
    )


def fisher_z_ci(r: float, n: int, level: float, se: float | None = None) -> tuple[float, float]:
    """tanh(atanh(r) ± z · SE), SE = 1/√(n − 3) unless given."""
    from scipy import stats

    if abs(r) >= 1:
        return r, r
    z = stats.norm.ppf(0.5 + level / 2)
    se = se if se is not None else 1 / math.sqrt(n - 3)
    centre = math.atanh(r)
    return math.tanh(centre - z * se), math.tanh(centre + z * se)
