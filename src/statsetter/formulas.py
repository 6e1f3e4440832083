"""Formulas shared by the analyses and the audit: the noncentral-t interval
of a standardised difference, the noncentral-F interval of a proportion of
variance explained, Hedges' exact J, Fisher's z interval of r, the studentized
range, p values adjusted for multiple comparisons. Plain numbers in, plain
numbers out; scipy is imported on use."""

from __future__ import annotations

import functools
import math

from typing import TYPE_CHECKING

from .errors import InputError

if TYPE_CHECKING:
    from typing import Callable, Sequence

    import numpy as np

__all__ = ["nct_ci", "ncf_ci", "variance_explained_ci", "hedges_j", "fisher_z_ci", "adjusted_p", "conditional_odds_ratio"]

_MAX_DOUBLINGS = 64  # a bracket of 2^64 around t: far beyond any finite statistic


def nct_ci(t: float, df: float, level: float) -> tuple[float, float]:
    """Limits of the noncentrality parameter: values whose noncentral t
    distribution puts ``t`` at the upper and lower (1 - level) / 2 quantile
    (the CDF as scipy.special's nctdtr, which scipy.stats' nct.cdf calls
    after checks that cost ten times as much)."""
    from scipy import special

    alpha = (1 - level) / 2
    if not (math.isfinite(t) and math.isfinite(df) and df > 0):
        raise InputError(f"t = {t!r} with df = {df!r}: no interval can be computed for a statistic that is not finite")

    def cdf(ncp: float) -> float:
        value = float(special.nctdtr(df, ncp, t))
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
    ``df`` error df (Tukey's critical q): the root of the CDF
    (``studentized_range_sf``) minus ``level``, from a starting value in the
    form of Copenhaver & Holland (1988; its constants recalled from memory —
    only the start, the root is exact and tested against R's qtukey). On
    finite df each exact evaluation of the CDF makes the s-grid for its q,
    and the next q is the root of the CDF with that grid held
    (``_held_gap``: a trial q costs one exp over the grid's nodes, not the
    range's tail), until the exact CDF is within 1e-13 of ``level`` or the
    step it asks for is below 1e-12 of q (the CDF's own accuracy on 10⁶ df):
    two or three exact evaluations where the secant method alone took six or
    seven.
    The secant method on the exact CDF, then bisection, are the fallbacks."""

    def gap(q: float) -> float:
        return 1.0 - float(studentized_range_sf(q, k, df)[0]) - level

    # (above 1,000 df the grid of s is narrow, ±8/√(2·df), and the start, which ignores df from 120 on, can lie
    # outside it: the root on infinite df, cheap and within about 1/df of this one, starts there)
    if df >= _AS_INFINITE and not math.isinf(df):
        return studentized_range_quantile(level, k, math.inf)
    a = _q_start(level, k, df) if df <= 1000 or math.isinf(df) else studentized_range_quantile(level, k, math.inf)
    if not math.isinf(df):  # (on infinite df the CDF is one integral, as cheap as a held one)
        for _ in range(8):
            held, here = _held_gap(level, k, df, a)
            if abs(here) < 1e-13:
                return a
            b = _held_root(held, a)
            if b is None:
                break
            if abs(b - a) <= 1e-12 * b:  # the exact gap at a asks for a step within the CDF's own accuracy (1e-12 at 10⁶ df)
                return b
            a = b
    b = a * 1.02
    fa, fb = gap(a), gap(b)
    for _ in range(30):
        if fb == fa:
            break
        a, b, fa = b, b - fb * (b - a) / (fb - fa), fb
        if not b > 0:
            break
        fb = gap(b)
        if abs(fb) < 1e-13 or abs(b - a) <= 1e-13 * b:
            return b
    low, high = 0.0, max(a, 1.0)
    while gap(high) < 0:
        high *= 2
    for _ in range(200):
        mid = (low + high) / 2
        low, high = (mid, high) if gap(mid) < 0 else (low, mid)
        if high - low <= 1e-13 * high:
            break
    return (low + high) / 2


def _held_root(gap: "Callable[[float], float]", q0: float) -> float | None:
    """The root of a held CDF's gap by the secant method from ``q0``; None when it does not settle."""
    a, b = q0, q0 * 1.001
    fa, fb = gap(a), gap(b)
    for _ in range(50):
        if fb == fa or not math.isfinite(fb):
            return None
        a, b, fa = b, b - fb * (b - a) / (fb - fa), fb
        if not b > 0:
            return None
        if abs(b - a) <= 1e-14 * b:
            return b
        fb = gap(b)
    return None


def _held_gap(level: float, k: int, df: float, q0: float) -> "tuple[Callable[[float], float], float]":
    """1 − P(Q > q) − level for q near ``q0`` on the grid of s made for q0, its nodes held in w = q0·s, and its exact
    value at q0: P(Q > q) = ∫ T(q0·σ) f(q0·σ/q) q0/q dσ (s = q0·σ/q), so the range's tail T at the nodes is
    computed once and each q costs one exp over them; at q0 it is ``_range_sf`` (the same terms), near it the same
    quadrature of a density moved by q/q0, as good as the grid's reach (its bulk spans about ±8 SDs of s, ±8/√(2·df))."""
    import numpy as np
    from scipy import special

    held: list = []
    here = 1.0 - _range_sf(q0, k, df, held) - level
    cut = held.pop(0)
    h = df / 2
    sigma = np.concatenate([s for s, _, _ in held])
    weighted = np.concatenate([ws * tail for _, ws, tail in held])

    def gap(q: float) -> float:
        r = q0 / q
        below = float(special.gammainc(h, h * (cut * r) ** 2)) if cut else 0.0
        return 1.0 - level - below - r * float(weighted @ np.exp(_log_s_density(sigma * r, df)))

    return gap, here


_AS_INFINITE = 1e15  # error df from here on are infinite: P(Q > q) moves by about 1/df of itself, below 1e-13


def _log_s_density(s: "np.ndarray", df: float) -> "np.ndarray":
    """ln of the density of s = √(χ²_df / df) at each s: ln 2 + h ln h − ln Γ(h) + (2h − 1) ln s − h s², h = df/2.
    From h = 50 on, as ln 2 + ½ ln(h/2π) − ε(h) − ln s + h·[2(ln(1 + u) − u) − u²], u = s − 1, ε Stirling's
    remainder of ln Γ: in the first form terms of size h cancel to the density's few units, which had cost about
    df·3e-16 of p (2e-10 at 10⁶ df, 3e-3 at 10¹²); ln(1 + u) − u by its series where |u| < 0.1, where s's mass lies
    on many df (the difference of the two would keep only the digits of u below its square)."""
    import numpy as np
    from scipy import special

    from .pvalues import _stirling

    h = df / 2
    if h < 50:
        return math.log(2) + h * math.log(h) - float(special.gammaln(h)) + (df - 1) * np.log(s) - h * s * s
    u = s - 1.0
    small = np.abs(u) < 0.1
    near = np.where(small, u, 0.0)
    series = np.zeros_like(near)
    for j in range(17, 1, -1):  # Σ_{j ≥ 2} (−1)^(j+1) u^j / j by Horner, to u^17 (below 1e-17 of the sum at |u| = 0.1)
        series = series * near + (1.0 if j % 2 else -1.0) / j
    with np.errstate(invalid="ignore", divide="ignore"):  # (the direct form only where |u| >= 0.1)
        deviation = np.where(small, series * near * near, np.log1p(u) - u)
    return math.log(2) + 0.5 * math.log(h / (2 * math.pi)) - _stirling(h) - np.log(s) + h * (2 * deviation - u * u)


_GL16 = None  # Gauss–Legendre nodes and weights of order 16, made on first use


def _panels(lo: float, hi: float, n: int) -> "tuple[np.ndarray, np.ndarray]":
    """Nodes and weights of composite 16-point Gauss–Legendre on n equal panels of [lo, hi]."""
    import numpy as np

    global _GL16
    if _GL16 is None:
        _GL16 = np.polynomial.legendre.leggauss(16)
    x, w = _GL16
    edges = np.linspace(lo, hi, n + 1)
    half, mid = (edges[1:] - edges[:-1]) / 2, (edges[1:] + edges[:-1]) / 2
    return (mid[:, None] + half[:, None] * x[None, :]).ravel(), (half[:, None] * w[None, :]).ravel()


_HORNER_UP_TO = 10  # powers m = k − 1 up to this by the sum below; above, by expm1 and log1p


def _range_tail(w: "np.ndarray", k: int) -> "np.ndarray":
    """P(range of k standard normals > w) for each w: k ∫ φ(z) [Φ(z)^(k−1) − (Φ(z) − Φ(z − w))^(k−1)] dz,
    the difference written as Φ(z)^m [1 − (1 − x)^m] with m = k − 1 and x = Φ(z − w)/Φ(z), so that a small tail keeps
    its digits: 1 − (1 − x)^m = x Σ_{j<m} (1 − x)^j, a sum of positive terms (by Horner, m − 1 steps), for m up to
    _HORNER_UP_TO; above, −expm1(m log1p(−x)) (two transcendental calls an element, twice the time of the sum at
    m = 2); z over [−9, w/2 + 9] (where the tail's mass lies), capped at 40."""
    import numpy as np
    from scipy import special

    top = min(40.0, max(9.0, float(w.max()) / 2 + 9.0))
    z, wz = _panels(-9.0, top, math.ceil((top + 9.0) / 1.5))
    phi, big = np.exp(-0.5 * z * z) / math.sqrt(2 * math.pi), special.ndtr(z)
    x = special.ndtr(z[None, :] - w[:, None])
    x /= big[None, :]
    m = k - 1
    if m <= _HORNER_UP_TO:
        y = 1.0 - x
        total = np.ones_like(x)
        for _ in range(m - 1):
            total *= y
            total += 1.0
        x *= total
    else:
        with np.errstate(divide="ignore"):  # x = 1: log1p(−1) = −inf, and the bracket is 1
            x = -np.expm1(m * np.log1p(-x))
    return k * (x * (big**m * phi)[None, :]) @ wz


def studentized_range_sf(q: "float | np.ndarray", k: int, df: float) -> "np.ndarray":
    """P(Q > q) for the studentized range Q of ``k`` means with ``df`` error
    df (df = inf: known variance; from 10¹⁵ df on, the same), for each q:
    the range's tail (``_range_tail``) at q·s averaged over s = √(χ²_df /
    df), both integrals by composite Gauss–Legendre, s on a grid of each q's
    own (``_range_sf``), its density without terms of size df that cancel
    (``_log_s_density``). Exact where it can be checked: for k = 2 it is
    2·P(t_df > q/√2) to 1e-9 relative down to p = 1e-280 (to 1e-12 from 5
    df up to 10⁸, q up to 1,000; to 1e-10 beyond, where the nodes' own
    rounding is 1e-16 of a spread of s of 1/√(2·df));
    within 1e-8 of scipy's studentized_range
    (nested adaptive quadrature) where scipy is exact, and within R's own
    2e-7 of its ptukey; p values scipy prints as 0 against 20-digit mpmath
    (tests/test_analyses_posthoc.py) — a millisecond or a few per q."""
    import numpy as np

    qs = np.atleast_1d(np.asarray(q, dtype=float))
    # the range is never below 0 (P = 1 at q <= 0) nor infinite (P = 0 at q = inf: groups without variance)
    out = np.where(np.isnan(qs), math.nan, np.where(qs > 0, 0.0, 1.0))
    inner = (qs > 0) & np.isfinite(qs)
    if inner.any():
        out[inner] = _range_tail(qs[inner], k) if df >= _AS_INFINITE else [_range_sf(x, k, df) for x in qs[inner].tolist()]
    return out


def _range_sf(q: float, k: int, df: float, held: list | None = None) -> float:
    """P(Q > q) at one q on a grid of s made for it: one grid for several q, made for the largest, lost up to 2e-7 of
    the others' p (df = 5). ``held``, when given, receives the cut below which the tail is taken as 1 (0: none), then
    the nodes, weights and range's tails of each stretch summed (``_held_gap``)."""
    import numpy as np
    from scipy import special

    h = df / 2
    lo = math.sqrt(special.gammaincinv(h, 1e-30) / h)
    hi = math.sqrt(special.gammainccinv(h, 1e-30) / h)
    # a large q draws the integrand's mass below s's bulk, to where q·s is moderate: about s* = √((df − 1) / (df + q²/2))
    # (the range's tail falls as e^(−w²/4)); the grid runs from below that to the top quantile, densely up to 4·s* and
    # to where q·s reaches the w at which every pair's tail, and so the range's, is below 1e-17 (on few df the
    # integrand falls from s = 0 over 2/q, and 4·s* = 4/q on 1 df left half of that fall to one wide panel)
    peak = math.sqrt(max(df - 1, 0.5) / (df + q * q / 2))
    start = min(lo, 0.25 * peak)  # below the bulk, a stretch of its own; within a wide bulk (few df), dense up to 4·s*
    negligible = -math.sqrt(2) * float(special.ndtri(1e-17 / max(k * (k - 1), 2)))
    edges = sorted({start, lo, hi} | {x for x in (4 * peak, negligible / q if q > 0 else hi) if start < x < hi})
    count = _panel_count(q, df)
    pieces = [(a, b, lambda a=a, b=b: _panels(a, b, count)) for a, b in zip(edges, edges[1:])]
    below, cut = 0.0, 0.0  # the mass of s below the grid, where q·s is so small that the range's tail is 1
    if df < 5:  # s^(df − 1) is not smooth enough at 0 (a fractional power below 4 cost up to 2e-10 of p on 3.1 to 3.3 df,
        # equal panels): panels shrinking geometrically towards it carry the first stretch
        first, cut = _shrinking(edges[1], edges[0])
        pieces[0] = (0.0, edges[1], lambda: first)
        below = float(special.gammainc(h, h * cut**2))
    else:  # below the grid: where it matters (a huge q on few df, its mass near s = 0), panels shrinking towards 0;
        # under their lowest cut (start/4¹⁰) lies at most 4⁻⁵⁰ of the mass below start (s^(df − 1), df >= 5): left out
        pieces.append((0.0, start, lambda: _shrinking(start, 0.0)[0]))

    def over(nodes: "tuple[np.ndarray, np.ndarray]") -> float:
        s, ws = nodes
        tail = _range_tail(q * s, k)
        if held is not None:
            held.append((s, ws, tail))
        return float(tail @ (ws * np.exp(_log_s_density(s, df))))

    # the most a stretch [a, b] of s can add is its mass times the range's tail at q·a (the tail falls as w grows):
    # the stretches taken from the largest such bound down, while it is above 1e-17 of the p so far (s beyond the
    # bulk on a moderate q adds nothing a double can hold; the stretch below the grid held 1e-6 of a p below 1e-20)
    bounds = [min(float(special.gammainc(h, h * b * b)), float(special.gammaincc(h, h * a * a)))
              * (1.0 if a == 0 else float(_range_tail(np.array([q * a]), k)[0])) for a, b, _ in pieces]
    p = below
    if held is not None:
        held.append(cut)
    for bound, (_, _, nodes) in sorted(zip(bounds, pieces), key=lambda x: -x[0]):
        if p > 0 and bound <= 1e-17 * p:
            break
        p += over(nodes())
    return min(p, 1.0)


def _panel_count(q: float, df: float) -> int:
    """Panels per stretch of s: 12 up to 100 df; above, where s's spread (1/√(2·df)) is narrow and a large q narrows
    the integrand by √(1 + q²/(2·df)) more, 12 times that, at most 24. Against 96 panels on every stretch, for k from 2
    to 100 and q from 0.1 to 1000: 5e-14 relative or better up to 1,000 df, 4e-13 at 10⁵ and 2e-12 at 10⁶ df (where
    24 panels differ as much)."""
    return 12 if df <= 100 else min(24, math.ceil(12 * math.sqrt(1 + q * q / (2 * df))))


def _shrinking(top: float, bottom: float) -> "tuple[tuple[np.ndarray, np.ndarray], float]":
    """Nodes and weights of one 16-point panel on each of [top/4^(j+1), top/4^j] for j < 10, the panels staying
    above ``bottom``; and the lowest cut, below which the caller takes the range's tail as 1."""
    import numpy as np

    cuts = [top / 4**j for j in range(11) if top / 4**j > bottom]
    nodes = [_panels(a, b, 1) for a, b in zip(cuts[:0:-1], cuts[-2::-1])]
    return (np.concatenate([n[0] for n in nodes]), np.concatenate([n[1] for n in nodes])), cuts[-1]


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


def conditional_odds_ratio(table: "Sequence[Sequence[int]]", level: float, alternative: str = "two-sided") -> tuple[float, float, float]:
    """The conditional maximum-likelihood odds ratio of a 2 × 2 table [[a, b], [c, d]] and its exact CI (Cornfield,
    1956): given the margins, a follows Fisher's noncentral hypergeometric distribution with odds ratio ψ; the
    estimate is the ψ whose mean is a, the lower limit the ψ with P(X ≥ a) = α and the upper the ψ with P(X ≤ a) = α
    (α = (1 − level)/2 for a two-sided interval, 1 − level for a one-sided one, whose other limit is 0 or ∞), each a
    root in ln ψ by Brent's method to full precision. The distribution is one vector of log-weights over a's support
    (log binomial coefficients), so each trial ψ costs a few array operations: the same numbers as scipy's
    odds_ratio(kind="conditional") to 3e-9 (where scipy's absolute tolerance of 1e-13 on ψ is the difference: ψ near
    1e-4) in a fifteenth of the time (tests/test_analyses_tables.py). A table with an empty row or column has no
    odds ratio (nan) and an interval from 0 to ∞."""
    import numpy as np
    from scipy import optimize, special

    (a, b), (c, d) = ((int(x) for x in row) for row in table)
    if min(a, b, c, d) < 0:
        raise InputError("a 2 × 2 table of counts cannot hold a negative count")
    total, row, col = a + b + c + d, a + b, a + c
    if 0 in (row, total - row, col, total - col):  # nothing to estimate; every ψ fits (as scipy says it)
        return math.nan, 0.0, math.inf
    xs = np.arange(max(0, row + col - total), min(row, col) + 1, dtype=float)
    log_weight = (special.gammaln(row + 1) - special.gammaln(xs + 1) - special.gammaln(row - xs + 1)
                  + special.gammaln(total - row + 1) - special.gammaln(col - xs + 1) - special.gammaln(total - row - col + xs + 1))
    below, above = xs <= a, xs >= a

    def pmf(log_psi: float) -> "np.ndarray":
        t = log_weight + xs * log_psi
        w = np.exp(t - t.max())
        return w / w.sum()

    def root(f: "Callable[[float], float]") -> float:  # f rises with ln ψ; bracket by doubling steps from ψ = 1, as scipy does
        lo, hi = -1.0, 1.0
        while f(lo) > 0:
            lo *= 2
        while f(hi) < 0:
            hi *= 2
        return math.exp(optimize.brentq(f, lo, hi, xtol=1e-300, rtol=4 * np.finfo(float).eps, maxiter=500))

    def lower(alpha: float) -> float:
        return 0.0 if a == xs[0] else root(lambda g: float(pmf(g)[above].sum()) - alpha)

    def upper(alpha: float) -> float:
        return math.inf if a == xs[-1] else root(lambda g: alpha - float(pmf(g)[below].sum()))

    estimate = 0.0 if a == xs[0] else math.inf if a == xs[-1] else root(lambda g: float(pmf(g) @ xs) - a)
    if alternative == "two-sided":
        return estimate, lower((1 - level) / 2), upper((1 - level) / 2)
    if alternative == "less":
        return estimate, 0.0, upper(1 - level)
    if alternative == "greater":
        return estimate, lower(1 - level), math.inf
    raise InputError(f"alternative: {alternative!r} is not two-sided, less or greater")


def adjusted_p(p: "Sequence[float] | np.ndarray", method: str) -> "np.ndarray":
    """p values adjusted for multiple comparisons, in the order given:
    ``bonferroni`` (each p times their number m), ``holm`` (the step-down:
    the i-th smallest times m − i + 1, never below a smaller p's), ``fdr_bh``
    (Benjamini–Hochberg: the i-th smallest times m / i, never above a larger
    p's); all capped at 1 — as R's p.adjust and statsmodels' multipletests
    compute them (here without the full garbage collection the latter runs
    for Holm, which cost a tenth of a second in a process with big data)."""
    import numpy as np

    values = np.asarray(p, dtype=float)
    m = len(values)
    if method == "bonferroni":
        return np.minimum(values * m, 1.0)
    order = np.argsort(values, kind="stable")
    ranked = values[order]
    if method == "holm":
        stepped = np.maximum.accumulate(ranked * np.arange(m, 0, -1))
    elif method == "fdr_bh":
        stepped = np.minimum.accumulate((m / np.arange(1, m + 1) * ranked)[::-1])[::-1]  # (m / i) p, as R computes it
    else:
        raise InputError(f"adjust: {method!r} is not holm, bonferroni or fdr_bh")
    out = np.empty(m)
    out[order] = np.minimum(stepped, 1.0)
    return out
