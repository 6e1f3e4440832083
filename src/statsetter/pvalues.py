"""p values from a test statistic and its degrees of freedom, in pure Python.

The upper tails of t, F and χ² are regularized incomplete beta and gamma
functions, computed here by their continued fractions (modified Lentz) and
the series of P(a, x); the factor x^a (1 − x)^b / B(a, b) (and x^a e^(−x) /
Γ(a)) is formed from log1p of its deviation from the centre with Stirling's
series, so that no two large logarithms cancel when the df run to thousands.
Where a t or F has one df of 20,000 or more, x = ν / (ν + t²) lies so near
1 that a fraction in x loses the digits of y = 1 − x; there DiDonato and
Morris's asymptotic expansion for large a (TOMS 708's BGRAT) reads ln x from
y, and F's numerator df above 2 is brought down by exact positive steps.
The expansion is also taken where TOMS 708 takes it (b ≤ 1 < 15 < a, y <
0.29, p not near 1: most t tests with more than 30 df, F on 1 or 2 df), with
Q(½, z) = erfc √z and Q(1, z) = e^(−z) in closed form: a few terms instead
of a long fraction, and more accurate than the fraction there (its
coefficients depend on b alone and are made once per b). Where p lies
near 1 (y < 0.1 and (ya)^b ≤ 0.7), at any df, its complement is computed by
the fraction on the other side, to the last digit.
The normal tail is erfc. No numpy or scipy: `statsetter format` starts as
fast as the template engine allows, and the base install computes p values.
tests/test_pvalues.py compares them with scipy.stats over a grid (df up to
100,000), with R, and with 50-digit values for df up to 10¹¹: within 1e-12
relative throughout."""

from __future__ import annotations

import math

from .errors import InputError

__all__ = ["p_from_statistic", "p_mismatch", "spearman_p", "upper_tail"]

_LN_2PI = math.log(2 * math.pi)
_SQRT_PI = math.sqrt(math.pi)
# Stirling's series for ln Γ(z) − [(z − ½) ln z − z + ½ ln 2π]: B₂ₖ / (2k(2k − 1) z^(2k−1))
_STIRLING = (1 / 12, -1 / 360, 1 / 1260, -1 / 1680, 1 / 1188, -691 / 360360, 1 / 156, -3617 / 122400)
_LARGE = 10.0  # from here on Stirling's series (8 terms) is exact to below 1e-17
_EPS = 1e-16
_TINY = 1e-300
_MAX_TERMS = 100_000
_LOG_NEGLIGIBLE = -760.0  # a prefix below e^−760 (the fractions it multiplies are at most about 1) leaves nothing a double holds
_MAX_DF = 1e15  # no data give more degrees of freedom (and t's tail near 0 fails from 10¹⁷ on)


def _stirling(z: float) -> float:
    """ln Γ(z) − [(z − ½) ln z − z + ½ ln 2π] for z ≥ 10."""
    inv, sq, total = 1 / z, 1 / (z * z), 0.0
    for c in _STIRLING:
        total += c * inv
        inv *= sq
    return total


def _log_of_ratio(d: float, a: float, ratio: float) -> float:
    """ln(1 + d/a) for ratio = 1 + d/a: through log1p where the ratio is near 1 (its digits are in d), directly where it
    is not (then d/a can round to −1 when the ratio is tiny: a statistic far out in a tail); −inf for a ratio of 0."""
    if d > -0.5 * a:
        return math.log1p(d / a)
    return math.log(ratio) if ratio > 0 else -math.inf


def _beta_prefix(a: float, b: float, x: float, y: float) -> float:
    """ln of x^a y^b / B(a, b), with y = 1 − x, and no large logs cancelling:
    where a (or b) is large, x(a + b)/a = 1 + d/a enters through log1p."""
    if a < _LARGE and b < _LARGE:
        return a * math.log(x) + b * math.log(y) - (math.lgamma(a) + math.lgamma(b) - math.lgamma(a + b))
    if a >= _LARGE and b >= _LARGE:
        d = x * b - y * a  # x(a + b) − a
        return (a * _log_of_ratio(d, a, x * (a + b) / a) + b * _log_of_ratio(-d, b, y * (a + b) / b) + 0.5 * math.log(a * b / (a + b))
                - 0.5 * _LN_2PI - (_stirling(a) + _stirling(b) - _stirling(a + b)))
    if b >= _LARGE:  # make a the large one
        a, b, x, y = b, a, y, x
    d = x * b - y * a
    return (a * _log_of_ratio(d, a, x * (a + b) / a) - 0.5 * math.log1p(b / a) + b * math.log(y * (a + b)) - b - math.lgamma(b)
            - _stirling(a) + _stirling(a + b))


def _beta_fraction(a: float, b: float, x: float) -> float:
    """1 / (1 + d1/(1 + d2/(1 + …))), the continued fraction of I_x(a, b)
    divided by x^a y^b / (a B(a, b)), by the modified Lentz method (written
    out: the audit computes thousands of p values)."""
    h = c = 1.0
    d = 0.0
    for m in range(_MAX_TERMS):  # the two steps of each m written out (the same operations in the same order)
        num = -(a + m) * (a + b + m) * x / ((a + 2 * m) * (a + 2 * m + 1))
        d = 1 + num * d
        d = 1 / (d if abs(d) > _TINY else _TINY)
        c = 1 + num / c
        if abs(c) < _TINY:
            c = _TINY
        h *= c * d
        num = (m + 1) * (b - m - 1) * x / ((a + 2 * m + 1) * (a + 2 * m + 2))
        d = 1 + num * d
        d = 1 / (d if abs(d) > _TINY else _TINY)
        c = 1 + num / c
        if abs(c) < _TINY:
            c = _TINY
        h *= c * d
        if abs(c * d - 1) < _EPS:
            return 1 / h
    raise ArithmeticError("incomplete beta: the continued fraction did not converge")


def _log_gamma_ratio(b: float, a: float) -> float:
    """ln Γ(a) / Γ(a + b) for a ≥ 10, from Stirling's series without the two
    large logarithms that lgamma(a) − lgamma(a + b) would cancel."""
    return -(a - 0.5) * math.log1p(b / a) - b * math.log(a + b) + b + _stirling(a) - _stirling(a + b)


def _upper_gamma_scaled(a: float, x: float) -> float:
    """Q(a, x) divided by x^a e^(−x) / Γ(a) (finite where that factor underflows);
    in closed form for a = ½ (Q = erfc √x: a t, or an F on 1 df) and a = 1 (Q = e^(−x): an F on 2 df)."""
    if a == 0.5 and 0 < x < 700:  # erfc keeps its relative accuracy down to its underflow near x = 708
        root = math.sqrt(x)
        return math.erfc(root) * math.exp(x) * _SQRT_PI / root
    if a == 1:
        return 1 / x
    if x < a + 1:
        prefix = math.exp(_gamma_prefix(a, x))
        return _gamma_upper(a, x) / prefix
    return _gamma_fraction(a, x)


_BGRAT_TERMS = 30


_BGRAT_D: dict[float, tuple[float, ...]] = {}  # the expansion's coefficients by b (a t: ½; an F on 1 or 2 df: ½ or 1)


def _bgrat_coefficients(b: float) -> tuple[float, ...]:
    """The coefficients d₁ … d₃₀ of the expansion, which depend on b alone: made once per b (their recurrence is
    quadratic in the number of terms) by the same operations in the same order as term by term."""
    found = _BGRAT_D.get(b)
    if found is None:
        c: list[float] = []
        d: list[float] = []
        cn, n2 = 1.0, 0.0
        for n in range(1, _BGRAT_TERMS + 1):
            n2 += 2
            cn /= n2 * (n2 + 1)
            c.append(cn)
            s, coef = 0.0, b - n
            for i in range(1, n):
                s += coef * c[i - 1] * d[n - 1 - i]
                coef += b
            d.append((b - 1) * cn + s / n)
        found = tuple(d)
        if len(_BGRAT_D) < 256:  # b is ½ or 1 for t and F on 1 or 2 df; other values come from F's exact steps
            _BGRAT_D[b] = found
    return found


def _large_a(a: float, b: float, y: float) -> float | None:
    """I_x(a, b), x = 1 − y, for a large and 0 < b ≤ 1, by the asymptotic
    expansion of DiDonato and Morris (ACM TOMS 18:360–373, 1992, Algorithm
    708, their BGRAT; ν = a + (b − 1)/2, z = −ν ln x): Q(b, z) and a series in
    1/ν². It reads ln x from y, where the continued fraction in x loses the
    digits of a y far below 1 (a t or F with hundreds of thousands of df).
    None when the expansion does not settle (the caller falls back), or
    where x rounds to 0 (y = 1: a statistic beyond any double's reach)."""
    if y >= 1:
        return None
    lnx = math.log1p(-y)
    nu = a + 0.5 * (b - 1)
    z = -nu * lnx
    if not z > 0:
        return None
    log_u = -z + b * math.log(z) - math.lgamma(b) - _log_gamma_ratio(b, a) - b * math.log(nu)
    j = _upper_gamma_scaled(b, z)  # Q(b, z) / (z^b e^(−z) / Γ(b))
    v, t2 = 0.25 / (nu * nu), 0.25 * lnx * lnx
    total, t, n2 = j, 1.0, 0.0
    d = _bgrat_coefficients(b)
    for n in range(_BGRAT_TERMS):
        bp2n = b + n2
        j = (bp2n * (bp2n + 1) * j + (z + bp2n + 1) * t) * v
        n2 += 2
        t *= t2
        dj = d[n] * j
        total += dj
        if total <= 0:
            return None
        if abs(dj) <= _EPS * total:
            return math.exp(log_u + math.log(total))
    return None


# TOMS 708 (BRATIO) uses the expansion for b ≤ 1 < 15 < a and y < 0.29, except where y < 0.1 and (ya)^b ≤ 0.7 (its power series
# there): a t with more than 30 df between t² ≈ 1 and 0.41 ν, an F on 1 or 2 df likewise. Against 80-digit values (3,000 cases, a from 12 to 15,000, y from 1e-6 to 0.29) it is within 1.5e-14
# relative for p above 1e-20 (the continued fraction in x: 8.3e-13, its digits of y lost) and 2-5 times as fast.
_BGRAT_A, _BGRAT_Y = 15.0, 0.29
_LARGE_DF = 2e4  # from here (a ≥ 10⁴) a t or F with one df this large goes through the expansion
_MAX_STEPS = 50_000  # F's numerator df / 2 above 1 is brought down by at most this many exact steps (about 1 µs each)


def _ibeta(a: float, b: float, x: float, y: float) -> float:
    """I_x(a, b), the regularized incomplete beta function, y = 1 − x given exactly."""
    if x <= 0:
        return 0.0
    if y <= 0:
        return 1.0
    near_one = y < 0.1 and y * a <= 1 and (y * a) ** b <= 0.7  # p near 1: its complement, by the fraction on the other side (TOMS: BPSER)
    if a >= _LARGE_DF / 2 and b <= _MAX_STEPS and b < a and not (b <= 1 and near_one):
        # b brought into (0, 1] by I_x(a, b + 1) = I_x(a, b) + x^a y^b / (b B(a, b)), every step positive
        steps = math.ceil(b) - 1
        b0 = b - steps
        found = _large_a(a, b0, y)
        if found is not None:
            return min(1.0, found + math.fsum(math.exp(_beta_prefix(a, b0 + k, x, y)) / (b0 + k) for k in range(steps)))
    if b <= 1 and a >= _BGRAT_A and y < _BGRAT_Y and not near_one:
        # where TOMS 708 itself takes the expansion (a few terms, not a long fraction); not for a statistic so small that
        # the p lies near 1, whose complement the fraction on the other side computes to its last digit
        found = _large_a(a, b, y)
        if found is not None:
            return found
    if x > (a + 1) / (a + b + 2):  # the fraction converges fast on the other side
        prefix = _beta_prefix(b, a, y, x)
        return 1.0 if prefix < _LOG_NEGLIGIBLE else 1 - math.exp(prefix) * _beta_fraction(b, a, y) / b
    prefix = _beta_prefix(a, b, x, y)
    return 0.0 if prefix < _LOG_NEGLIGIBLE else math.exp(prefix) * _beta_fraction(a, b, x) / a


def _gamma_prefix(a: float, x: float) -> float:
    """ln of x^a e^(−x) / Γ(a), through log1p((x − a)/a) where a is large."""
    if a >= _LARGE:
        d = x - a
        return a * _log_of_ratio(d, a, x / a) - d + 0.5 * math.log(a) - 0.5 * _LN_2PI - _stirling(a)
    return a * math.log(x) - x - math.lgamma(a)


def _gamma_upper(a: float, x: float) -> float:
    """Q(a, x), the regularized upper incomplete gamma function."""
    if x <= 0:
        return 1.0
    if x < a + 1:  # the series of P converges fast, and Q = 1 − P is not small here
        term = total = 1 / a
        n = a
        while abs(term) > abs(total) * _EPS:
            n += 1
            term *= x / n
            total += term
        return 1 - math.exp(_gamma_prefix(a, x)) * total
    prefix = _gamma_prefix(a, x)
    return 0.0 if prefix < _LOG_NEGLIGIBLE else math.exp(prefix) * _gamma_fraction(a, x)


def _gamma_fraction(a: float, x: float) -> float:
    """Q(a, x) / (x^a e^(−x) / Γ(a)) for x ≥ a + 1, the continued fraction (modified
    Lentz): 1 / (b − 1(1 − a)/(b + 2 − 2(2 − a)/(b + 4 − …))), b = x + 1 − a."""
    b = x + 1 - a
    c, d = 1 / _TINY, 1 / b
    h = d
    for i in range(1, _MAX_TERMS):
        num = -i * (i - a)
        b += 2
        d = num * d + b
        d = 1 / (d if abs(d) > _TINY else _TINY)
        c = b + num / c
        if abs(c) < _TINY:
            c = _TINY
        h *= d * c
        if abs(d * c - 1) < _EPS:
            return h
    raise ArithmeticError("incomplete gamma: the continued fraction did not converge")


def upper_tail(symbol: str, value: float, df: tuple[float, ...] = ()) -> float:
    """P(statistic ≥ |value|) for t and z (one tail of |value|), P(statistic ≥
    value) for F and χ² (H as χ²). df above 10¹⁵ are refused (InputError):
    no data give them, and there t's tail near 0 and F's with its numerator
    df there would be wrong (exact to 1e-12 up to 10¹⁵ df for t, F's
    denominator and χ² where the statistic's own rounding allows, up to 10⁵
    for F's numerator: tests/test_pvalues.py)."""
    if df and max(df) > _MAX_DF:  # (p_from_statistic's checks of df leave this one to here, where every p passes)
        i = next(i for i, d in enumerate(df) if d > _MAX_DF)
        raise InputError(f"{symbol}: df[{i}] = {df[i]:g} is more degrees of freedom than any data give (above 10¹⁵); check the value")
    if symbol == "t":
        s = value * value
        return 0.5 * _ibeta(df[0] / 2, 0.5, df[0] / (df[0] + s), s / (df[0] + s))
    if symbol == "z":
        return 0.5 * math.erfc(abs(value) / math.sqrt(2))
    if symbol in ("F", "F_change"):
        u = df[0] * value
        return _ibeta(df[1] / 2, df[0] / 2, df[1] / (df[1] + u), u / (df[1] + u))
    return _gamma_upper(df[0] / 2, value / 2)


_EXACT_UP_TO = 9  # n: Spearman's S counted over every permutation up to here, by an Edgeworth series above
_SERIES_UP_TO = 1290  # n: above, R's cor.test takes the t approximation (n(n² − 1) would overflow its integers)
# the Edgeworth series' coefficients of Best & Roberts (1975), Algorithm AS 89 (Applied Statistics 24, p. 377)
_AS89 = (0.2274, 0.2531, 0.1745, 0.0758, 0.1033, 0.3932, 0.0879, 0.0151, 0.0072, 0.0831, 0.0131, 4.6e-4)


def spearman_p(rho: float, n: int) -> float | None:
    """The two-sided p of Spearman's ρ on n pairs without ties as R's cor.test computes it by default (method =
    "spearman", exact = NULL), None above 1,290 pairs, where R takes the t approximation (p_from_statistic's): from
    S = (n³ − n)(1 − ρ)/6, rounded, twice the smaller tail — counted over all n! permutations up to 9 pairs (each
    S = Σ(i − πᵢ)² tallied by a recursion over the ranks placed so far), by the Edgeworth series of Algorithm AS 89
    (Best & Roberts, 1975) from 10 to 1,290, the series' normal tail by erfc (R's prho.c and cor.test.R, whose
    cut-offs these are). Statistical software that reports the t approximation (SPSS's Sig.) gives other p values for
    small samples: for ρ = .60 on 9 pairs .0876 against R's .0968."""
    if not (2 <= n and -1 <= rho <= 1) or n > _SERIES_UP_TO:
        return None
    span = n * (n * n - 1)  # n³ − n
    q = round(span * (1 - abs(rho)) / 6)  # S of |ρ|: the two tails are mirror images, so |ρ|'s lower tail is the smaller
    return min(1.0, 2 * _spearman_lower(n, q + 2))


def _spearman_lower(n: int, below: int) -> float:
    """P(S < below) for Spearman's S on n pairs (R's prho with lower_tail: ``below`` is S + 2, S being even)."""
    top = n * (n * n - 1) / 3  # the largest S
    if below <= 0:
        return 0.0
    if below > top:
        return 1.0
    if n <= _EXACT_UP_TO:
        counts, total = _spearman_counts(n), math.factorial(n)
        at_least = 1 if below == top else sum(counts[below:])  # (R's code: S = its maximum counts one permutation)
        return (total - at_least) / total
    c1, c2, c3, c4, c5, c6, c7, c8, c9, c10, c11, c12 = _AS89
    b = 1 / n
    x = (6 * (below - 1) * b / (n * n - 1) - 1) * math.sqrt(n - 1)  # ρ·√(n − 1) of S = below − 1: about N(0, 1)
    y = x * x
    u = x * b * (c1 + b * (c2 + c3 * b) + y * (-c4 + b * (c5 + c6 * b) - y * b * (c7 + c8 * b - y * (c9 - c10 * b + y * b * (c11 - c12 * y)))))
    p = -u / math.exp(y / 2) + 0.5 * math.erfc(-x / math.sqrt(2))
    return min(1.0, max(0.0, p))


_COUNTS: dict[int, list[int]] = {}


def _spearman_counts(n: int) -> list[int]:
    """How many of the n! permutations π give each S = Σ(i − πᵢ)² (index S): the ranks placed one position at a time,
    the ways of each set of placed ranks kept as one integer whose 64-bit digits count each partial S (a shift by d²
    digits adds d² to every S at once), 2ⁿ sets of n digits each."""
    if n not in _COUNTS:
        width, ways = 64, {0: 1}
        for position in range(n):
            ahead: dict[int, int] = {}
            for placed, poly in ways.items():
                for rank in range(n):
                    if not placed >> rank & 1:
                        key = placed | 1 << rank
                        ahead[key] = ahead.get(key, 0) + (poly << (width * (position - rank) ** 2))
            ways = ahead
        poly, mask = ways[(1 << n) - 1], (1 << width) - 1
        _COUNTS[n] = [(poly >> (width * s)) & mask for s in range(n * (n * n - 1) // 3 + 1)]
    return _COUNTS[n]


def p_from_statistic(symbol: str, value: float, df: tuple[float, ...] = (), alternative: str = "two-sided") -> float:
    """The p value of a t, z, F, chi-square or r statistic.

    t and z (and r, through t = r·√(df / (1 − r²))) are two-sided unless
    ``alternative`` says otherwise; F and chi-square use the upper tail.
    """
    def need(k: int) -> None:
        if len(df) != k:
            raise InputError(f"{symbol}: needs {k} degree(s) of freedom, got {len(df)}")
        for i, d in enumerate(df):
            if not (math.isfinite(d) and d > 0):
                raise InputError(f"{symbol}: df[{i}] = {d:g} is not a positive number of degrees of freedom")

    if not math.isfinite(value):
        raise InputError(f"{symbol} = {value!r} is not a finite number; no p can be computed from it")

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
