"""Benchmarks for the analyses (paired runs taking turns with the baseline; medians).

1. A 200-variable x 10,000-row correlation matrix with r, p, CI and n per pair,
   pairwise-complete, against two numpy baselines: corrcoef on complete data
   plus a vectorised t -> p (less work than ours: no missing values), and the
   same work as ours — pairwise-complete sums through masked matrix products,
   n per pair, r, t -> p and Fisher-z CIs. BLAS is pinned to one thread for
   every side (threadpoolctl), so runs compare like with like. Target: <= 3x
   the same-work baseline (the complete-data one is shown for scale).
2. Welch's t and a one-way ANOVA on 1,000,000 rows against a direct scipy call
   on the same arrays. Target: <= 2x.
"""

from __future__ import annotations
import numpy as np
import pandas as pd
from scipy import stats

from statsetter.analyses import anova_oneway, correlation_matrix, t_independent
from _timing import paired  # noqa: E402  (bench/ is on the path when a benchmark runs)




def main() -> None:
    rng = np.random.default_rng(7)  # synthetic numbers for timing only
    X = rng.normal(size=(10_000, 200))
    X[rng.random(X.shape) < 0.02] = np.nan
    df = pd.DataFrame(X, columns=[f"v{i}" for i in range(200)])
    cols = list(df.columns)
    complete = np.nan_to_num(X)

    def baseline_matrix():
        r = np.corrcoef(complete, rowvar=False)
        t = r * np.sqrt(9998 / (1 - np.clip(r * r, 0, 1 - 1e-12)))
        return 2 * stats.t.sf(np.abs(t), 9998)

    def masked_matrix():
        """The same work as ours, written directly: pairwise-complete sums by masked products."""
        m = ~np.isnan(X)
        x = np.where(m, X, 0.0)
        w = m.astype(float)
        n = w.T @ w
        sx, sxx = x.T @ w, (x * x).T @ w
        sxy = x.T @ x
        cov = sxy - sx * sx.T / n
        r = cov / np.sqrt((sxx - sx * sx / n) * (sxx.T - sx.T * sx.T / n))
        t = r * np.sqrt((n - 2) / (1 - np.clip(r * r, 0, 1 - 1e-12)))
        p = 2 * stats.t.sf(np.abs(t), n - 2)
        z, se = np.arctanh(np.clip(r, -1 + 1e-12, 1 - 1e-12)), 1 / np.sqrt(n - 3)
        return r, p, n, np.tanh(z - 1.96 * se), np.tanh(z + 1.96 * se)

    from threadpoolctl import threadpool_limits

    with threadpool_limits(limits=1):  # the same single BLAS thread for every side
        base, ours, ratio = paired(baseline_matrix, lambda: correlation_matrix(df, cols), 7)
        same, ours2, ratio2 = paired(masked_matrix, lambda: correlation_matrix(df, cols), 7)
    print(f"correlation matrix 200 x 10,000 (one BLAS thread): complete-data numpy {base * 1000:.0f} ms, statsetter {ours * 1000:.0f} ms, "
          f"ratio {ratio:.2f}; same-work masked numpy {same * 1000:.0f} ms, ratio {ratio2:.2f} (target <= 3)")

    n = 1_000_000
    y = rng.normal(size=n)
    g = np.where(rng.random(n) < 0.5, "a", "b")
    big = pd.DataFrame({"y": y, "g": g})
    a, b = y[g == "a"], y[g == "b"]
    base, ours, ratio = paired(lambda: stats.ttest_ind(y[g == "a"], y[g == "b"], equal_var=False), lambda: t_independent(big, "y", "g"))
    print(f"Welch t, 1,000,000 rows: scipy {base * 1000:.0f} ms, statsetter {ours * 1000:.0f} ms, ratio {ratio:.2f} (target <= 2)")
    g3 = rng.choice(np.array(["a", "b", "c"]), size=n)
    big3 = pd.DataFrame({"y": y, "g": g3})
    base, ours, ratio = paired(lambda: stats.f_oneway(y[g3 == "a"], y[g3 == "b"], y[g3 == "c"]), lambda: anova_oneway(big3, "y", "g"))
    print(f"one-way ANOVA, 1,000,000 rows: scipy {base * 1000:.0f} ms, statsetter {ours * 1000:.0f} ms, ratio {ratio:.2f} (target <= 2)")
    del a, b


if __name__ == "__main__":
    main()
