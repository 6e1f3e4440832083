"""Benchmark: a descriptives table ("Table 1") of 1,000,000 rows x 30 variables.

10 nominal (categoricals with 2-6 categories), 10 ordinal (1-7 ratings) and
10 continuous variables, 2% missing in each, by a 3-level group; the whole
table (numbers and layout), without tests. Baseline, in the same run: a
minimal hand-written pandas groupby computing the same numbers (counts per
group and category with missing, quartiles and n of the ordinal variables,
n, mean and SD of the continuous ones, each per group and in total).
Targets: time <= 1.5x the baseline (median of 5), peak memory allocated
during the table <= 2x the DataFrame's own size (tracemalloc).
"""

from __future__ import annotations


from statsetter import table
import tracemalloc

import numpy as np
import pandas as pd

from statsetter.analyses.descriptives import describe
from _timing import paired  # noqa: E402  (bench/ is on the path when a benchmark runs)

ROWS = 1_000_000


def frame(rng: np.random.Generator) -> pd.DataFrame:
    """Synthetic numbers for timing only."""
    cols: dict[str, object] = {"group": pd.Categorical.from_codes(rng.integers(0, 3, ROWS), ["a", "b", "c"])}
    for i in range(10):
        k = 2 + i % 5
        codes = rng.integers(0, k, ROWS)
        codes[rng.random(ROWS) < 0.02] = -1
        cols[f"nom{i}"] = pd.Categorical.from_codes(codes, [f"c{j}" for j in range(k)])
    for i in range(10):
        x = rng.integers(1, 8, ROWS).astype(float)
        x[rng.random(ROWS) < 0.02] = np.nan
        cols[f"ord{i}"] = x
    for i in range(10):
        x = rng.normal(50, 10, ROWS)
        x[rng.random(ROWS) < 0.02] = np.nan
        cols[f"con{i}"] = x
    return pd.DataFrame(cols)


def baseline(df: pd.DataFrame, nominal: list[str], ordinal: list[str], continuous: list[str]) -> list[object]:
    g = df.groupby("group", observed=True)
    out: list[object] = []
    for name in nominal:
        out.append(df.groupby(["group", name], observed=True, dropna=False).size())
        out.append(df[name].value_counts(dropna=False))
    out.append(g[ordinal].quantile([0.25, 0.5, 0.75]))
    out.append(g[ordinal].count())
    out.append(df[ordinal].quantile([0.25, 0.5, 0.75]))
    out.append(df[ordinal].count())
    out.append(g[continuous].agg(["count", "mean", "std"]))
    out.append(df[continuous].agg(["count", "mean", "std"]))
    out.append(g.size())
    return out




def main() -> None:
    df = frame(np.random.default_rng(11))
    nominal = [f"nom{i}" for i in range(10)]
    ordinal = [f"ord{i}" for i in range(10)]
    continuous = [f"con{i}" for i in range(10)]
    levels = {**{n: "nominal" for n in nominal}, **{n: "ordinal" for n in ordinal}, **{n: "interval" for n in continuous}}
    names = nominal + ordinal + continuous

    def ours() -> None:
        table(describe(df, names, group="group", levels=levels))

    # the two compute the same numbers (checked once, outside the timing)
    ref = baseline(df, nominal, ordinal, continuous)
    got = {v.name: v for v in describe(df, names, group="group", levels=levels).variables}
    np.testing.assert_array_equal(got["nom3"].counts[:-1], ref[6].unstack().to_numpy()[:, :-1])
    np.testing.assert_allclose(got["ord2"].median[:-1], ref[20].xs(0.5, level=1)["ord2"].to_numpy())
    np.testing.assert_allclose(got["con4"].sd[:-1], ref[24][("con4", "std")].to_numpy(), rtol=1e-10)
    base, mine, ratio = paired(lambda: baseline(df, nominal, ordinal, continuous), ours)
    size = df.memory_usage(deep=True).sum()
    tracemalloc.start()
    ours()
    _, peak = tracemalloc.get_traced_memory()
    tracemalloc.stop()
    print(f"descriptives 1,000,000 x 30 by 3 groups: pandas baseline {base * 1000:.0f} ms, statsetter {mine * 1000:.0f} ms, "
          f"ratio {ratio:.2f} (target <= 1.5)")
    print(f"  peak memory allocated {peak / 2**20:.0f} MiB; DataFrame {size / 2**20:.0f} MiB; ratio {peak / size:.2f} (target <= 2)")


if __name__ == "__main__":
    main()
