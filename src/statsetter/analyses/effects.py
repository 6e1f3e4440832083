"""Effect sizes and their confidence intervals, from unrounded quantities
(the formulas they share with the audit are in ``statsetter.formulas``)."""

from __future__ import annotations

import math
from typing import TYPE_CHECKING

from ..formulas import hedges_j, nct_ci, variance_explained_ci
from ..records import EffectSize, Interval

if TYPE_CHECKING:
    import numpy as np

NCT_METHOD = "noncentral t (Steiger & Fouladi, 1997)"
NCF_METHOD = "CI by the noncentral F (Steiger, 2004)"


def variance_explained(name: str, value: float, F: float, df1: float, df2: float, level: float, method: str = "") -> EffectSize:
    """η², partial η², ω² or R² with the CI of the population proportion of
    variance explained, from the F test of the same effect."""
    low, high = variance_explained_ci(F, df1, df2, level)
    return EffectSize(name, value, Interval(level, low, high), method="; ".join(m for m in (method, NCF_METHOD) if m))


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


def concordance(x: "np.ndarray", y: "np.ndarray") -> "np.ndarray":
    """For each observation k, d_k = Σ_l sign(x_k − x_l) · sign(y_k − y_l):
    the observations concordant with it minus those discordant (ties count
    neither way). Blocks of about √n observations in x order, never splitting
    a run of tied x: each block is compared with all earlier and all later
    ones through sorted y values (binary search), and with itself pair by pair
    (a single run of tied x contributes nothing to itself). O(n^1.5) time,
    O(n) memory."""
    import numpy as np

    n = len(x)
    order = np.argsort(x, kind="stable")
    xs, ys = x[order], y[order]
    starts = np.flatnonzero(np.r_[True, xs[1:] != xs[:-1]])
    ends = np.r_[starts[1:], n]
    size = max(64, int(math.sqrt(n)))
    blocks: list[tuple[int, int, bool]] = []  # (start, end, one run of tied x)
    open_start, runs = 0, 0
    for a, b in zip(starts.tolist(), ends.tolist()):
        if b - a >= size:  # a long run of ties is a block of its own
            if runs:
                blocks.append((open_start, a, runs == 1))
            blocks.append((a, b, True))
            open_start, runs = b, 0
            continue
        runs += 1
        if b - open_start >= size:
            blocks.append((open_start, b, runs == 1))
            open_start, runs = b, 0
    if runs:
        blocks.append((open_start, n, runs == 1))
    d = np.zeros(n)
    for sequence, sign in ((blocks, 1.0), (blocks[::-1], -1.0)):  # earlier blocks have smaller x, later ones larger
        seen = np.empty(0)
        for a, b, _ in sequence:
            yb = ys[a:b]
            below = np.searchsorted(seen, yb, "left")
            above = len(seen) - np.searchsorted(seen, yb, "right")
            d[a:b] += sign * (below - above)
            seen = np.sort(np.concatenate([seen, yb]), kind="stable")
    for a, b, single in blocks:
        if not single:
            xb, yb = xs[a:b], ys[a:b]
            d[a:b] += (np.sign(xb[:, None] - xb[None, :]) * np.sign(yb[:, None] - yb[None, :])).sum(axis=1)
    out = np.empty(n)
    out[order] = d
    return out


def kendall_tau_b_se(x: "np.ndarray", y: "np.ndarray") -> tuple[float, float]:
    """τb and its asymptotic (non-null) standard error, ties allowed.

    τb = Σ_k d_k / w with w = √(w_x w_y), w_x = n² − Σ_k t_x(k) (t_x(k): how
    many observations share x_k), likewise w_y. The multinomial delta method
    gives Var(τb) = Σ_k (φ_k − φ̄)² / w⁴ with φ_k = 2 w d_k + τb v_k and
    v_k = t_x(k) w_y + t_y(k) w_x (the derivative of τb with respect to
    the share of observation k's cell; the same expression as the asymptotic
    standard error of τb in categorical data analysis texts, e.g. Agresti,
    recalled from memory). tests/test_analyses_basic.py checks it against
    the jackknife."""
    import numpy as np

    n = len(x)
    d = concordance(x, y)
    _, ix, tx = np.unique(x, return_inverse=True, return_counts=True)
    _, iy, ty = np.unique(y, return_inverse=True, return_counts=True)
    tie_x, tie_y = tx[ix].astype(float), ty[iy].astype(float)
    wx, wy = float(n) * n - tie_x.sum(), float(n) * n - tie_y.sum()
    w = math.sqrt(wx * wy)
    tau = float(d.sum()) / w
    phi = 2 * w * d + tau * (tie_x * wy + tie_y * wx)
    se = math.sqrt(float(((phi - phi.mean()) ** 2).sum())) / (w * w)
    return tau, se
