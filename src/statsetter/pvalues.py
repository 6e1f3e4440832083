"""p values from a test statistic and its degrees of freedom (scipy, loaded late)."""

from __future__ import annotations

import math

from .errors import InputError

__all__ = ["p_from_statistic"]


def p_from_statistic(symbol: str, value: float, df: tuple[float, ...] = (), alternative: str = "two-sided") -> float:
    """The p value of a t, z, F, chi-square or r statistic.

    t and z (and r, through t = r·√(df / (1 − r²))) are two-sided unless
    ``alternative`` says otherwise; F and chi-square use the upper tail.
    """
    from scipy import stats

    def need(k: int) -> None:
        if len(df) != k:
            raise InputError(f"{symbol}: needs {k} degree(s) of freedom, got {len(df)}")

    if symbol in ("r", "rs"):
        need(1)
        if not -1 <= value <= 1:
            raise InputError(f"{symbol} = {value:g} is outside [-1, 1]")
        if abs(value) == 1:
            return 0.0
        t = value * math.sqrt(df[0] / (1 - value * value))
        return _two_or_one(stats.t.sf(abs(t), df[0]), t, alternative)
    if symbol == "t":
        need(1)
        return _two_or_one(stats.t.sf(abs(value), df[0]), value, alternative)
    if symbol == "z":
        return _two_or_one(stats.norm.sf(abs(value)), value, alternative)
    if symbol in ("F", "F_change"):
        need(2)
        if value < 0:
            raise InputError(f"F = {value:g} is negative")
        return float(stats.f.sf(value, df[0], df[1]))
    if symbol == "chi2":
        need(1)
        if value < 0:
            raise InputError(f"chi2 = {value:g} is negative")
        return float(stats.chi2.sf(value, df[0]))
    raise InputError(f"cannot compute p from a {symbol!r} statistic; give --p")


def _two_or_one(upper: float, value: float, alternative: str) -> float:
    if alternative == "two-sided":
        return float(min(1.0, 2 * upper))
    # one-sided: upper tail of |value| when the sign matches the direction
    if (alternative == "greater") == (value >= 0):
        return float(upper)
    return float(1 - upper)
