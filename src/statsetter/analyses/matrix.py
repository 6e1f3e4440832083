"""A correlation matrix over many variables, pairwise-complete, vectorised."""

from __future__ import annotations

from typing import TYPE_CHECKING, Literal, Mapping, Sequence

from ..errors import InputError
from ..records import ADJUST_NAMES as _ADJUST_NAMES, CorrelationMatrix
from . import _common as c

if TYPE_CHECKING:
    import pandas as pd

Adjust = Literal["holm", "bonferroni", "fdr_bh"]
SPARSE_BELOW = 0.1  # share of missing cells below which the sparse correction path is used


def correlation_matrix(
    df: "pd.DataFrame",
    columns: Sequence[str],
    *,
    coefficient: Literal["pearson", "spearman"] = "pearson",
    level: float = 0.95,
    adjust: Adjust | None = None,
    labels: Mapping[str, str] | None = None,
) -> CorrelationMatrix:
    """All pairs at once with matrix products over the missing-value mask: no
    per-pair loop. Spearman ranks each column first, which is exact when no
    values are missing (with missing values, ranks are taken over each column's
    observed values - stated in the note)."""
    import numpy as np
    from scipy import stats

    method = coefficient
    if len(columns) < 2:
        raise InputError("columns: a correlation matrix needs at least two variables")
    if len(set(columns)) != len(columns):
        raise InputError("columns: a variable is named twice")
    if adjust is not None and adjust not in _ADJUST_NAMES:
        raise InputError(f"adjust: {adjust!r} is not one of {', '.join(_ADJUST_NAMES)}")
    import pandas as pd

    present = set(df.columns)
    for name in columns:
        if name not in present:
            c.column(df, name)  # raises, with close matches
    dtypes = df.dtypes[list(columns)]
    for name, dtype in dtypes.items():
        if not pd.api.types.is_numeric_dtype(dtype) or pd.api.types.is_bool_dtype(dtype):
            raise InputError(f"{name}: not numeric (dtype {dtype}){c.stray_text(df[name])}; correlations need numeric variables")
    X = df[list(columns)].to_numpy(dtype=float)
    with np.errstate(invalid="ignore"):
        means, sds = np.nanmean(X, axis=0), np.nanstd(X, axis=0, ddof=1)  # of the variables as measured, also for rs
    if method == "spearman":
        X = pd.DataFrame(X).rank().to_numpy()
    elif method != "pearson":
        raise InputError(f"coefficient: {method!r} is not pearson or spearman")
    missing = np.isnan(X)
    miss_count = missing.sum(axis=0)
    rows = len(X)
    if (miss_count == rows).any():
        raise InputError(f"{columns[int(np.argmax(miss_count == rows))]}: every value is missing")
    # centre on each column's observed mean; missing cells become 0 and drop out of every sum
    present_mask = ~missing
    # one pass: observed cells minus the column mean, missing cells 0; in row order (C), whatever the frame's layout,
    # as the sparse products below read it (in column order they would copy it whole first)
    centred = np.zeros(X.shape)
    np.subtract(X, X.sum(axis=0, where=present_mask) / (rows - miss_count), out=centred, where=present_mask)
    Sxy = centred.T @ centred
    squares = centred * centred
    if missing.mean() <= SPARSE_BELOW:
        # few missing values: subtract what the rows missing in column j contribute
        from scipy import sparse

        flat = np.flatnonzero(np.ascontiguousarray(missing.T))  # (column, row) pairs, by column
        indptr = np.concatenate([[0], np.cumsum(miss_count)])
        St = sparse.csr_matrix((np.ones(len(flat)), flat % rows, indptr), shape=(X.shape[1], rows))
        N = rows - miss_count[:, None] - miss_count[None, :] + (St @ St.T).toarray()
        # column sums of the centred values are 0 up to rounding; the diagonal of Sxy holds the sums of squares
        Sx = centred.sum(axis=0)[:, None] - np.asarray(St @ centred).T
        Sxx = np.diag(Sxy)[:, None] - np.asarray(St @ squares).T
    else:
        M = (~missing).astype(float)
        M32 = M.astype(np.float32)  # counts are exact in float32 below 2^24 rows
        N = (M32.T @ M32).astype(float) if rows < 2**24 else M.T @ M
        Sx = centred.T @ M  # Sx[i, j]: sum of column i over rows where j is also present
        Sxx = squares.T @ M
    with np.errstate(divide="ignore", invalid="ignore"):
        cov = Sxy - Sx * Sx.T / N
        var_i = Sxx - Sx * Sx / N
        var_j = var_i.T
        r = cov / np.sqrt(var_i * var_j)
    r = np.clip(r, -1.0, 1.0)
    np.fill_diagonal(r, 1.0)
    small = N < 4
    if small.any():
        i, j = np.argwhere(small)[0]
        if i == j:  # a variable's own pairs are its values
            raise InputError(f"{columns[i]}: {int(N[i, i])} value(s); a correlation needs at least 4")
        raise InputError(f"{columns[i]}, {columns[j]}: {int(N[i, j])} complete pairs; at least 4 are needed")
    constant = np.isnan(r)
    if constant.any():
        i, j = np.argwhere(constant)[0]
        raise InputError(f"{columns[i]} or {columns[j]}: zero variance on their complete pairs; r is undefined")
    dfree = N - 2
    with np.errstate(divide="ignore", invalid="ignore"):
        t = r * np.sqrt(dfree / (1 - r * r))
    iu = np.triu_indices(len(columns), 1)
    p = np.zeros_like(r)
    from scipy import special

    upper = np.where(np.abs(r[iu]) >= 1, 0.0, 2 * special.stdtr(dfree[iu], -np.abs(t[iu])))  # Student t cdf
    p[iu] = upper
    p[(iu[1], iu[0])] = upper
    zc = stats.norm.ppf(0.5 + level / 2)
    with np.errstate(divide="ignore"):
        z = np.arctanh(np.clip(r, -1 + 1e-16, 1 - 1e-16))
    half = zc / np.sqrt(N - 3)
    low, high = np.tanh(z - half), np.tanh(z + half)
    if adjust:
        from ..formulas import adjusted_p

        adj = adjusted_p(p[iu], adjust)
        p = p.copy()
        p[iu] = adj
        p[(iu[1], iu[0])] = adj
    np.fill_diagonal(p, 0.0)
    return CorrelationMatrix(
        tuple(columns), method, r, p, low, high, N.astype(int), level, adjust, dict(labels or {}),
        provenance=c.provenance(f"statsetter.analyses.correlation_matrix({method})"),
        mean=means, sd=sds, rows=rows,
    )
