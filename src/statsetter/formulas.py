"""Formulas shared by the analyses and the audit: the noncentral-t interval
of a standardised difference, the noncentral-F interval of a proportion of
variance explained, Hedges' exact J, Fisher's z interval of r. Plain numbers
in, plain numbers out; scipy is imported on use."""

from __future__ import annotations

import functools
import math

from .errors import InputError

__all__ = ["nct_ci", "ncf_ci", "variance_explained_ci", "hedges_j", "fisher_z_ci"]

_MAX_DOUBLINGS = 64  # a bracket of 2^64 around t: far beyond any finite statistic


def nct_ci(t: float, df: float, level: float) -> tuple[float, float]:
    """Limits of the noncentrality parameter: values whose noncentral t
    distribution puts ``t`` at the upper and lower (1 - level) / 2 quantile."""
    from scipy import stats

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
        return _root(f, _widen(f, t, -1.0, f"t = {t:g}, df = {df:g}"), _widen(f, t, 1.0, f"t = {t:g}, df = {df:g}"))

    return solve(1 - alpha), solve(alpha)


def _widen(f, start: float, direction: float, what: str) -> float:  # type: ignore[no-untyped-def]
    """A point beyond the root of the decreasing ``f`` on the side ``direction``
    points to (f < 0 below a root for direction −1 is the bracket's lower end)."""
    step, x = 1.0, start
    for _ in range(_MAX_DOUBLINGS):  # the bound is reached only for absurd inputs
        if (f(x) >= 0) if direction < 0 else (f(x) <= 0):
            return x
        x += direction * step
        step *= 2
    raise InputError(f"{what}: the interval search did not converge")


def _root(f, low: float, high: float) -> float:  # type: ignore[no-untyped-def]
    from scipy import optimize

    return float(optimize.brentq(f, low, high, xtol=1e-13, rtol=1e-15, maxiter=500))


def ncf_ci(F: float, df1: float, df2: float, level: float) -> tuple[float, float]:
    """Limits of the noncentrality parameter λ of an F(df1, df2) statistic:
    the λ whose noncentral F puts ``F`` at its upper and lower (1 − level)/2
    quantile, 0 where even λ = 0 puts it lower (Steiger, 2004, Psychological
    Methods 9, 164–182)."""
    from scipy import special

    if not (math.isfinite(F) and F >= 0 and df1 > 0 and df2 > 0 and math.isfinite(df2)):
        raise InputError(f"F = {F!r} with df = ({df1!r}, {df2!r}): no interval can be computed")
    alpha = (1 - level) / 2
    what = f"F({df1:g}, {df2:g}) = {F:g}"

    def limit(target: float) -> float:
        f = lambda ncp: float(special.ncfdtr(df1, df2, ncp, F)) - target  # noqa: E731 (decreasing in λ)
        if f(0.0) <= 0:
            return 0.0
        return _root(f, 0.0, _widen(f, max(F * df1, 1.0), 1.0, what))

    return limit(1 - alpha), limit(alpha)


def variance_explained_ci(F: float, df1: float, df2: float, level: float) -> tuple[float, float]:
    """CI of a population proportion of variance explained (η², partial η²,
    ω², R²) from its F test: λ / (λ + df1 + df2 + 1) at each limit of λ
    (Steiger, 2004, eq. 17 ff.; for a partial effect df1 + df2 + 1 stands
    for the N of the effect and its error alone)."""
    n = df1 + df2 + 1
    low, high = ncf_ci(F, df1, df2, level)
    return low / (low + n), high / (high + n)


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


@functools.lru_cache(maxsize=256)  # a table of pairs asks for the same quantile once per row
def studentized_range_quantile(level: float, k: int, df: float) -> float:
    """The ``level`` quantile of the studentized range of ``k`` means with
    ``df`` error df (Tukey's critical q): the root of scipy's CDF minus
    ``level``, found by the secant method from a starting value in the form of
    Copenhaver & Holland (1988; its constants recalled from memory — only
    the start, the root is exact and tested against R's qtukey), with
    scipy's ppf as the fallback. About five CDF evaluations instead of scipy's
    ppf's fourteen; each is a double integral."""
    from scipy import optimize, stats

    def gap(q: float) -> float:
        return float(stats.studentized_range.cdf(q, k, df)) - level

    start = _q_start(level, k, df)
    try:
        q = float(optimize.newton(gap, start, x1=start * 1.02, tol=1e-12, rtol=1e-13, maxiter=30))
        if q > 0 and abs(gap(q)) < 1e-10:
            return q
    except (RuntimeError, OverflowError, ValueError):
        pass
    return float(stats.studentized_range.ppf(level, k, df))


def _q_start(p: float, c: int, v: float) -> float:
    """A starting value for the studentized range quantile in the form of
    Copenhaver & Holland (1988): the normal quantile t = z((1 + p)/2),
    corrected for the df and scaled by the number of means."""
    from statistics import NormalDist

    t = NormalDist().inv_cdf(0.5 + 0.5 * p)
    if v < 120:
        t += (t * t * t + t) / v / 4.0
    q = 0.8832 - 0.2368 * t
    if v < 120:
        q += -1.214 / v + 1.208 * t / v
    return t * (q * math.log(c - 1.0) + 1.4142)
