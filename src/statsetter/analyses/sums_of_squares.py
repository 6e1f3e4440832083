"""Type II and Type III sums of squares of a linear model with factors and covariates.

A term's sum of squares is the fall in the residual sum of squares when its
columns enter a model last: the full model for Type III (factors coded
sum-to-zero, so that a main effect is averaged over the other factor's
levels), or the model of every term that does not contain it for Type II
(marginality respected; any full-rank coding gives the same sums). It is read
from the QR decomposition of the model's columns, the term's last, as the
squared length of the last components of Qᵀy (the `effects` of R's lm), not as
a difference of two residual sums, so no digits cancel. Each F divides the
term's mean square by the full model's residual mean square (as R's car::Anova
and statsmodels' anova_lm do). Numbers checked against R in
tests/test_analyses_ancova.py and tests/test_analyses_posthoc.py.
"""

from __future__ import annotations

import math
import sys
from dataclasses import dataclass
from typing import TYPE_CHECKING, Sequence

from ..errors import InputError

if TYPE_CHECKING:
    import numpy as np


@dataclass(frozen=True)
class Term:
    """A model term: its name, the variables it is made of (an interaction holds its factors') and its columns."""

    name: str
    parts: frozenset[str]
    columns: "np.ndarray"  # rows × df


@dataclass(frozen=True)
class Row:
    """A term's line of the table: sum of squares, df, F and p."""

    ss: float
    df: int
    F: float
    p: float


@dataclass(frozen=True)
class Table:
    rows: dict[str, Row]
    ss_error: float
    df_error: int
    nobs: int
    coef: "np.ndarray"  # intercept first, then the terms' columns in order
    r: "np.ndarray"  # the full model's R (for predictions' standard errors)


def coded_factor(name: str, values: "np.ndarray", levels: Sequence[object], sum_to_zero: bool) -> Term:
    """A factor's term: ``levels − 1`` columns, treatment-coded (the first level the reference) or sum-to-zero (the
    last level −1 in every column)."""
    import numpy as np
    import pandas as pd

    k = len(levels)
    codes = np.asarray(pd.Categorical(values, categories=levels).codes)
    columns = np.zeros((len(codes), k - 1))
    rows = np.flatnonzero((codes < k - 1) if sum_to_zero else (codes > 0))
    columns[rows, codes[rows] if sum_to_zero else codes[rows] - 1] = 1.0
    if sum_to_zero:
        columns[codes == k - 1] = -1.0
    return Term(name, frozenset([name]), columns)


def product(a: Term, b: Term) -> Term:
    """The products of ``a``'s and ``b``'s columns."""
    import numpy as np

    columns = (a.columns[:, :, None] * b.columns[:, None, :]).reshape(len(a.columns), -1)
    return Term(f"{a.name}:{b.name}", a.parts | b.parts, np.ascontiguousarray(columns))


def design(terms: Sequence[Term]) -> "np.ndarray":
    import numpy as np

    n = len(terms[0].columns)
    return np.column_stack([np.ones(n), *[t.columns for t in terms]])


def _entered_last(y: "np.ndarray", before: Sequence[Term], term: Term) -> float:
    """The sum of squares ``term`` adds to the model of ``before`` (with an intercept)."""
    import numpy as np

    q = np.linalg.qr(design([*before, term]), mode="reduced")[0]
    effects = q[:, -term.columns.shape[1]:].T @ y
    return float(effects @ effects)


def anova_table(y: "np.ndarray", terms: Sequence[Term], ss_type: int, outcome: str) -> Table:
    """Each term's Type II or III sum of squares, F and p, and the error's; a design that cannot be fitted (a term
    repeating others, no error df, no variance left in double precision) refused by name."""
    import numpy as np
    from scipy import special

    x = design(terms)
    n, width = x.shape
    rank = int(np.linalg.matrix_rank(x))
    problem = ""
    if rank < width:
        problem = f"its {width} coefficients have rank {rank}: a term repeats others"
    elif n <= width:
        problem = f"{n} rows for {width} coefficients: no error df"
    else:
        q, r = np.linalg.qr(x, mode="reduced")
        coef = np.linalg.solve(r, q.T @ y)
        residuals = y - x @ coef
        ss_error, df_error = float(residuals @ residuals), n - width
        rows = {}
        for term in terms:
            before = [t for t in terms if t is not term and (ss_type == 3 or not term.parts < t.parts)]
            ss, df = _entered_last(y, before, term), term.columns.shape[1]
            f = (ss / df) / (ss_error / df_error) if ss_error >= sys.float_info.min else math.nan  # (below: digits lost)
            rows[term.name] = Row(ss, df, f, float(special.fdtrc(df, df_error, f)))
        if all(math.isfinite(row.F) for row in rows.values()):
            return Table(rows, ss_error, df_error, n, coef, r)
        problem = "an F is not a number: a term or the residuals have no variance in double precision"
    raise InputError(f"{outcome}: the model cannot be fitted to these data ({problem}); look for a constant or collinear variable, "
                     "or values too small to square")


def added_terms_test(y: "np.ndarray", table: Table, terms: Sequence[Term], extra: Sequence[Term]) -> tuple[float, int, int, float]:
    """F, its two df and p for adding ``extra`` to the fitted model of ``terms`` (their columns' rank may fall short:
    the df count what they add)."""
    import numpy as np
    from scipy import special

    x = design([*terms, *extra])
    coef, _, rank, _ = np.linalg.lstsq(x, y, rcond=None)
    residuals = y - x @ coef
    ss_full, df_full = float(residuals @ residuals), len(y) - int(rank)
    df_added = int(rank) - (x.shape[1] - sum(t.columns.shape[1] for t in extra))
    if df_added <= 0 or df_full <= 0:
        return math.nan, df_added, df_full, math.nan
    with np.errstate(divide="ignore", invalid="ignore"):  # slopes that fit every point: F infinite (or 0/0)
        f = float(np.float64(table.ss_error - ss_full) / df_added / (np.float64(ss_full) / df_full))
    return f, df_added, df_full, float(special.fdtrc(df_added, df_full, f))


def predictions(table: Table, rows: "np.ndarray", level: float) -> list[tuple[float, float, float, float]]:
    """The fitted mean at each design row (intercept first), its SE and CI at ``level`` on the error df."""
    import numpy as np
    from scipy import linalg, special

    mean = rows @ table.coef
    scaled = linalg.solve_triangular(table.r, rows.T, trans="T")  # R⁻ᵀ xᵀ: its squared length is x (XᵀX)⁻¹ xᵀ
    se = np.sqrt(table.ss_error / table.df_error * (scaled * scaled).sum(axis=0))
    half = float(special.stdtrit(table.df_error, 0.5 + level / 2)) * se
    return [(float(m), float(s), float(m - h), float(m + h)) for m, s, h in zip(mean, se, half)]
