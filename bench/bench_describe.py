"""Benchmark: a descriptives table ("Table 1") of 1,000,000 rows x 30 variables.

10 nominal (categoricals with 2-6 categories), 10 ordinal (1-7 ratings) and
10 continuous variables, 2% missing in each, by a 3-level group; the whole
table (numbers and layout), without tests. Baseline, in the same run: a
minimal hand-written pandas groupby computing the same numbers (counts per
group and category with missing, quartiles and n of the ordinal variables,
n, mean and SD of the continuous ones, each per group and in total).
A second baseline, in the same run: polars (the bench extra; not a runtime
dependency) computing the same numbers from the same columns. A variant
asks for quartiles of the continuous variables too (the median and IQR
beside the mean and SD), against both baselines with quartiles added.
Targets: time <= 1.5x the pandas baseline (median of 5), peak memory
allocated during the table <= 2x the DataFrame's own size (tracemalloc).
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




def polars_baseline(pl_df, nominal: list[str], ordinal: list[str], continuous: list[str], quartiles: bool = False) -> list[object]:  # type: ignore[no-untyped-def]
    import polars as pl

    out: list[object] = []
    for name in nominal:
        out.append(pl_df.group_by(["group", name]).len())
        out.append(pl_df.group_by(name).len())
    wanted = ordinal + (continuous if quartiles else [])
    stats = [pl.col(c).quantile(q, "linear").alias(f"{c}_{q}") for c in wanted for q in (0.25, 0.5, 0.75)]
    stats += [pl.col(c).count().alias(f"{c}_n") for c in ordinal]
    stats += [e for c in continuous for e in (pl.col(c).count().alias(f"{c}_n"), pl.col(c).mean().alias(f"{c}_m"), pl.col(c).std().alias(f"{c}_sd"))]
    out.append(pl_df.group_by("group").agg(stats + [pl.len()]))
    out.append(pl_df.select(stats))
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
    import polars as pl

    pl_df = pl.from_pandas(df)
    pl_ref = polars_baseline(pl_df, nominal, ordinal, continuous)[-1]  # the same totals as ours, checked once
    np.testing.assert_allclose(got["con4"].sd[-1], pl_ref["con4_sd"][0], rtol=1e-10)
    np.testing.assert_allclose(got["ord2"].median[-1], pl_ref["ord2_0.5"][0])
    base, mine, ratio = paired(lambda: baseline(df, nominal, ordinal, continuous), ours)
    pbase, pmine, pratio = paired(lambda: polars_baseline(pl_df, nominal, ordinal, continuous), ours)
    size = df.memory_usage(deep=True).sum()
    tracemalloc.start()
    ours()
    _, peak = tracemalloc.get_traced_memory()
    tracemalloc.stop()
    print(f"descriptives 1,000,000 x 30 by 3 groups: pandas baseline {base * 1000:.0f} ms, statsetter {mine * 1000:.0f} ms, "
          f"ratio {ratio:.2f} (target <= 1.5)")
    print(f"  peak memory allocated {peak / 2**20:.0f} MiB; DataFrame {size / 2**20:.0f} MiB; ratio {peak / size:.2f} (target <= 2)")
    print(f"  polars baseline {pbase * 1000:.0f} ms, statsetter {pmine * 1000:.0f} ms, ratio {pratio:.2f}")
    def ours_q() -> None:
        table(describe(df, names, group="group", levels=levels, show={"continuous": ("mean_sd", "median_iqr")}))

    def pandas_q() -> None:
        baseline(df, nominal, ordinal, continuous)
        df.groupby("group", observed=True)[continuous].quantile([0.25, 0.5, 0.75])

    qbase, qmine, qratio = paired(pandas_q, ours_q)
    _, _, qpratio = paired(lambda: polars_baseline(pl_df, nominal, ordinal, continuous, quartiles=True), ours_q)
    print(f"  with the median and IQR of the continuous variables too: statsetter {qmine * 1000:.0f} ms, ratio {qratio:.2f} to pandas, "
          f"{qpratio:.2f} to polars")


if __name__ == "__main__":
    main()
