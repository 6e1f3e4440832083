"""p values from a test statistic and its degrees of freedom.

Through ``scipy.special``'s distribution functions (stdtr, ndtr, fdtrc,
chdtrc), the functions behind ``scipy.stats``' survival functions, called
directly: the same numbers (tests/test_pvalues.py compares them over a grid
to 1e-12) for a fraction of the import time. scipy is loaded on the first
call; without it the error names the extra that installs it."""

from __future__ import annotations

import math

from .errors import InputError

__all__ = ["p_from_statistic", "p_mismatch", "upper_tail"]


def _special():  # type: ignore[no-untyped-def]
    try:
        from scipy import special
    except ModuleNotFoundError:
        from .errors import MissingExtra

        raise MissingExtra("scipy", "computing p values") from None
    return special


def upper_tail(symbol: str, value: float, df: tuple[float, ...] = ()) -> float:
    """P(statistic ≥ |value|) for t and z (one tail of |value|), P(statistic ≥
    value) for F and χ² (H as χ²)."""
    special = _special()
    if symbol == "t":
        return float(special.stdtr(df[0], -abs(value)))
    if symbol == "z":
        return float(special.ndtr(-abs(value)))
    if symbol in ("F", "F_change"):
        return float(special.fdtrc(df[0], df[1], value))
    return float(special.chdtrc(df[0], value))


def p_from_statistic(symbol: str, value: float, df: tuple[float, ...] = (), alternative: str = "two-sided") -> float:
    """The p value of a t, z, F, chi-square or r statistic.

    t and z (and r, through t = r·√(df / (1 − r²))) are two-sided unless
    ``alternative`` says otherwise; F and chi-square use the upper tail.
    """
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
        return _two_or_one(upper_tail("t", t, df), t, alternative)
    if symbol == "t":
        need(1)
        return _two_or_one(upper_tail("t", value, df), value, alternative)
    if symbol == "z":
        return _two_or_one(upper_tail("z", value), value, alternative)
    if symbol in ("F", "F_change"):
        need(2)
        if value < 0:
            raise InputError(f"F = {value:g} is negative")
        return upper_tail("F", value, df)
    if symbol == "chi2":
        need(1)
        if value < 0:
            raise InputError(f"chi2 = {value:g} is negative")
        return upper_tail("chi2", value, df)
    raise InputError(f"cannot compute p from a {symbol!r} statistic; give --p")


def _two_or_one(upper: float, value: float, alternative: str) -> float:
    if alternative == "two-sided":
        return float(min(1.0, 2 * upper))
    # one-sided: upper tail of |value| when the sign matches the direction
    if (alternative == "greater") == (value >= 0):
        return float(upper)
    return float(1 - upper)


def _half_unit(value: float) -> float:
    """Half a unit in the last decimal place of a number as typed (its repr)."""
    text = repr(float(value))
    if "e" in text:
        return 0.0
    return 0.5 * 10.0 ** -len(text.partition(".")[2].rstrip("0") or "")


def p_mismatch(symbol: str, value: float, df: tuple[float, ...], p: float, alternative: str = "two-sided") -> str | None:
    """Why a given p cannot belong to the statistic, or None when it can.

    Interval arithmetic on the decimals the numbers were typed with (as the
    audit does): ``t = 2.14`` stands for 2.135 to 2.145, and ``p = .04`` for
    .035 to .045; the p values of the statistic's interval must meet the
    given one. A p that fits the one-sided test of a two-sided statement is
    said as such."""
    h = _half_unit(value)
    ends = [value - h, value + h]
    if symbol in ("r", "rs"):
        ends = [min(max(e, -1.0), 1.0) for e in ends]
    elif symbol in ("F", "chi2"):
        ends = [max(e, 0.0) for e in ends]
    computed = [p_from_statistic(symbol, e, df, alternative) for e in ends]
    if alternative == "two-sided" and ends[0] < 0 < ends[1]:
        computed.append(1.0)
    low, high = min(computed), max(computed)
    hp = _half_unit(p)
    eps = 1e-12 + 1e-9 * max(p, high)  # exact records: agreement to the last few digits of a float
    if low <= p + hp + eps and p - hp <= high + eps:
        return None
    shown = f"{symbol}({', '.join(f'{d:g}' for d in df)}) = {value:g}" if df else f"{symbol} = {value:g}"
    if alternative == "two-sided" and symbol in ("t", "z", "r", "rs") and low / 2 <= p + hp + eps and p - hp <= high / 2 + eps:
        return f"p = {p:g} fits a one-sided test of {shown} (two-sided p {low:.4g} to {high:.4g}); say --alternative if it was one"
    return f"p = {p:g} does not follow from {shown}: recomputed p {low:.4g} to {high:.4g}"
