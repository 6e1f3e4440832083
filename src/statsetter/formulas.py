"""Formulas shared by the analyses and the audit: the noncentral-t interval
of a standardised difference, Hedges' exact J, Fisher's z interval of r.
Plain numbers in, plain numbers out; scipy is imported on use."""

from __future__ import annotations

import math

from .errors import InputError

__all__ = ["nct_ci", "hedges_j", "fisher_z_ci"]

_MAX_DOUBLINGS = 64  # a bracket of 2^64 around t: far beyond any finite statistic


def nct_ci(t: float, df: float, level: float) -> tuple[float, float]:
    """Limits of the noncentrality parameter: values whose noncentral t
    distribution puts ``t`` at the upper and lower (1 - level) / 2 quantile."""
    from scipy import optimize, stats

    alpha = (1 - level) / 2
    if not (math.isfinite(t) and math.isfinite(df) and df > 0):
        raise InputError(f"t = {t!r} with df = {df!r}: no interval can be computed for a statistic that is not finite")

    def cdf(ncp: float) -> float:
        value = float(stats.nct.cdf(t, df, ncp))
        if math.isnan(value):  # far tails: the cdf is 0 above t, 1 below
            return 0.0 if ncp > t else 1.0
        return value

    def solve(target: float) -> float:
        f = lambda ncp: cdf(ncp) - target  # noqa: E731
        step = 1.0
        lo = hi = t
        for _ in range(_MAX_DOUBLINGS):  # bracket the root; the bound is reached only for absurd inputs
            if not f(lo) < 0:
                break
            lo -= step
            step *= 2
        else:
            raise InputError(f"t = {t:g}, df = {df:g}: the interval search did not converge")
        step = 1.0
        for _ in range(_MAX_DOUBLINGS):
            if not f(hi) > 0:
                break
            hi += step
            step *= 2
        else:
            raise InputError(f"t = {t:g}, df = {df:g}: the interval search did not converge")
        return optimize.brentq(f, lo, hi, xtol=1e-13, rtol=1e-15, maxiter=500)

    return solve(1 - alpha), solve(alpha)


def hedges_j(df: float) -> float:
    """Exact small-sample correction J(df) = Γ(df/2) / (√(df/2) Γ((df−1)/2)) (Hedges, 1981)."""
    return math.exp(math.lgamma(df / 2) - math.log(math.sqrt(df / 2)) - math.lgamma((df - 1) / 2))


def fisher_z_ci(r: float, n: int, level: float, se: float | None = None) -> tuple[float, float]:
    """tanh(atanh(r) ± z · SE), SE = 1/√(n − 3) unless given."""
    from scipy import stats

    if abs(r) >= 1:
        return r, r
    z = stats.norm.ppf(0.5 + level / 2)
    se = se if se is not None else 1 / math.sqrt(n - 3)
    centre = math.atanh(r)
    return math.tanh(centre - z * se), math.tanh(centre + z * se)
