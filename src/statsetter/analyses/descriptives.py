"""Descriptive statistics by level of measurement, overall and by group ("Table 1").

The numbers are computed here, exact and unrounded, with one pass of
``numpy.bincount`` per statistic over integer group codes; the table layout
lives in ``rendering/descriptive_tables.py``. Columns are the groups in order,
then Total (the only column when there is no grouping variable).

* nominal: n per category (value-label, categorical or sorted order) and the
  missing count; percentages of the cases with a value, or of all cases;
* ordinal: median and quartiles (linear interpolation between order
  statistics, numpy's and pandas' default), optionally n per level;
* interval and ratio: mean and SD (n − 1), optionally median and quartiles,
  minimum and maximum, skewness (adjusted Fisher–Pearson G1, as pandas).

With survey weights, counts are sums of weights, means are weighted, SDs use
Σw − 1 in the denominator (frequency weights, as statsmodels' DescrStatsW with
ddof = 1) and quantiles are the weighted inverted CDF (numpy's
``quantile(..., weights=, method="inverted_cdf")``).
"""

from __future__ import annotations

from dataclasses import replace
from typing import TYPE_CHECKING, Any, Literal, Mapping, Sequence

from ..errors import InputError
from ..levels import resolve_levels
from ..records import Description, LevelReport, Result, VariableSummary
from . import _common as c

if TYPE_CHECKING:
    import numpy as np
    import pandas as pd

# What each level can show; the first entries are the defaults.
CONTENTS: dict[str, tuple[str, ...]] = {
    "nominal": ("counts",),
    "ordinal": ("median_iqr", "counts"),
    "continuous": ("mean_sd", "median_iqr", "range", "skew"),
}
DEFAULT_SHOW: dict[str, tuple[str, ...]] = {"nominal": ("counts",), "ordinal": ("median_iqr",), "continuous": ("mean_sd",)}
_SMALL_RANGE = 1_000  # integer-valued data spanning at most this many values are counted, not sorted


def describe(
    df: "pd.DataFrame",
    variables: Sequence[str] | None = None,
    *,
    group: str | None = None,
    levels: Mapping[str, str] | None = None,
    metadata_levels: Mapping[str, str] | None = None,
    value_labels: Mapping[str, Mapping[Any, str]] | None = None,
    labels: Mapping[str, str] | None = None,
    show: Mapping[str, Sequence[str]] | None = None,
    weights: str | None = None,
    compare: bool = False,
    smd: bool = False,
    suppress_below: int | None = None,
    percent_of: Literal["valid", "all"] = "valid",
    alphas: Mapping[str, "float | Result"] | None = None,
) -> Description:
    """Describe ``variables`` (default: every column but ``group`` and ``weights``)
    by their level of measurement, overall and per category of ``group`` (the
    grouping variable: one column per category, then Total).

    ``levels`` declares levels; ``metadata_levels`` and ``value_labels`` come
    from the data file (see ``statsetter.io.read_data``); ``show`` picks what
    each level reports (keys nominal, ordinal, continuous; values from
    ``CONTENTS``); ``compare`` adds a p per row from a test chosen by level; ``smd`` adds the
    standardised difference (two groups); ``suppress_below`` hides counts from
    1 to that number minus one; ``alphas`` puts Cronbach's α beside scale scores.
    """
    import numpy as np
    import pandas as pd

    from ..coding import factor

    labels = dict(labels or {})
    value_labels = value_labels or {}
    names = list(variables) if variables is not None else [str(n) for n in df.columns if n not in (group, weights)]
    if not names:
        raise InputError("describe: no variables to describe")
    for name in names + [n for n in (group, weights) if n is not None]:
        c.column(df, name)
    if group is not None and group in names:
        raise InputError(f"{group}: the grouping variable is also listed among the variables")
    if percent_of not in ("valid", "all"):
        raise InputError(f"percent_of: {percent_of!r} is not valid or all")
    if suppress_below is not None and (int(suppress_below) != suppress_below or suppress_below < 2):
        raise InputError(f"suppress_below: {suppress_below!r}; give a whole number of 2 or more")
    chosen = _contents(show)
    found = resolve_levels(df, names, levels, metadata_levels, labels)
    left_out: tuple[LevelReport, ...] = ()
    if variables is None:  # every column group default, but not an ID column: one row per case would identify people
        left_out = tuple(found[n] for n in names if found[n].identifier)
        names = [n for n in names if not found[n].identifier]
        if not names:
            raise InputError(f"describe: every column looks like an identifier ({', '.join(r.name for r in left_out)}); name the variables")

    w = _weights(df, weights) if weights is not None else None
    if w is not None and compare:
        raise InputError(f"{weights}: tests with survey weights need the survey design; compare the groups unweighted or leave the p values out")
    if group is not None:
        codes, group_names = _codes(df[group], value_labels.get(group))
        keep = codes >= 0
        dropped = int((~keep).sum())
        if len(group_names) < 2 or len(np.unique(codes[keep])) < 2:
            raise InputError(f"{group}: {len(np.unique(codes[keep]))} group(s) with data; a grouping variable needs at least two")
        if smd and len(group_names) != 2:
            raise InputError(f"{group}: {len(group_names)} groups; the standardised difference needs exactly two")
        if dropped:
            df = df[keep]
            codes = codes[keep]
            w = w[keep] if w is not None else None
    else:
        if compare or smd:
            raise InputError("compare and smd compare groups; name the grouping variable (group)")
        codes, group_names, dropped = np.zeros(len(df), dtype=np.intp), [], 0
    if len(df) == 0:
        raise InputError("describe: no rows to describe")
    ngroups = max(len(group_names), 1)
    groups = _Groups(codes.astype(np.intp, copy=False), ngroups, w)

    summaries = []
    for name in names:
        report = found[name]
        kind = "continuous" if report.level in ("interval", "ratio") else report.level
        series, named = df[name], value_labels.get(name)
        if kind == "ordinal" and named and pd.api.types.is_numeric_dtype(series):
            # a labelled ordinal variable: its median and quartiles are categories, shown group label
            series, named = factor(series, named, ordered=True), None
        summary = _summarise(
            series, name, labels.get(name, name), report, chosen[kind], groups, named, moments=smd and kind == "ordinal"
        )
        if alphas and name in alphas:
            summary = replace(summary, alpha=_alpha_value(name, alphas[name]))
        if compare:
            summary = replace(summary, **_test(df, name, group, kind, labels))  # type: ignore[arg-type]
        if smd:
            summary = replace(summary, smd=_smd(summary))
        summaries.append(summary)
    unknown_alpha = sorted(set(alphas or {}) - set(names))
    if unknown_alpha:
        raise InputError(f"{unknown_alpha[0]}: α given for a variable that is not described")

    column_n = groups.column_n()
    columns = tuple(str(g) for g in group_names) + ("Total",) if group is not None else ("Total",)
    return Description(
        tuple(summaries),
        columns,
        column_n,
        group=group,
        group_label=labels.get(group, group) if group else None,
        weights=weights,
        percent_of=percent_of,
        suppress_below=suppress_below,
        dropped_no_group=dropped,
        left_out=left_out,
        provenance=c.provenance("statsetter.analyses.describe"),
    )


def _alpha_value(name: str, given: "float | Result") -> float:
    """α from a number or from a cronbach_alpha record."""
    if isinstance(given, list) and given:  # the Records cronbach_alpha returns
        given = given[0]
    if isinstance(given, Result):
        found = next((e.value for e in given.effects if e.name == "alpha"), None)
        if found is None:
            raise InputError(f"{name}: the record given for α is a {given.kind} record without an alpha")
        return found
    try:
        return float(given)
    except (TypeError, ValueError):
        raise InputError(f"{name}: α {given!r} is not a number") from None


def _contents(show: Mapping[str, Sequence[str]] | None) -> dict[str, tuple[str, ...]]:
    chosen = dict(DEFAULT_SHOW)
    for kind, items in (show or {}).items():
        key = "continuous" if kind in ("interval", "ratio") else kind
        if key not in CONTENTS:
            raise InputError(f"show: {kind!r} is not nominal, ordinal, interval, ratio or continuous")
        items = (items,) if isinstance(items, str) else tuple(items)
        bad = [i for i in items if i not in CONTENTS[key]]
        if bad or not items:
            raise InputError(f"show.{kind}: {bad[0] if bad else 'nothing'!r}; choose from {', '.join(CONTENTS[key])}")
        chosen[key] = items
    return chosen


def _weights(df: "pd.DataFrame", name: str) -> "np.ndarray":
    import numpy as np
    import pandas as pd

    s = df[name]
    if not pd.api.types.is_numeric_dtype(s) or pd.api.types.is_bool_dtype(s):
        raise InputError(f"{name}: weights must be numeric (dtype {s.dtype})")
    w = s.to_numpy(dtype=float, na_value=np.nan)
    if np.isnan(w).any():
        raise InputError(f"{name}: {int(np.isnan(w).sum())} missing weight(s), first in row {int(np.argmax(np.isnan(w))) + 1}")
    if (w < 0).any() or not np.isfinite(w).all():
        raise InputError(f"{name}: negative or infinite weight(s), first in row {int(np.argmax((w < 0) | ~np.isfinite(w))) + 1}")
    if w.sum() <= 0:
        raise InputError(f"{name}: the weights sum to zero")
    return w


def _codes(s: "pd.Series", value_labels: Mapping[Any, str] | None) -> tuple["np.ndarray", list[str]]:
    """Integer codes (−1 for missing) and the category names in table order:
    value-label order, categorical order, else sorted values."""
    import numpy as np
    import pandas as pd

    if value_labels:
        x = s.to_numpy(dtype=float, na_value=np.nan) if pd.api.types.is_numeric_dtype(s) else s.to_numpy(dtype=object)
        present = pd.unique(s.dropna())
        order = list(value_labels) + sorted((v for v in present if v not in value_labels), key=c.mixed_order)
        codes = pd.Index(order).get_indexer(x)
        return codes.astype(np.intp), [str(value_labels.get(v, _show(v))) for v in order]
    if isinstance(s.dtype, pd.CategoricalDtype):
        return s.cat.codes.to_numpy().astype(np.intp), [str(v) for v in s.cat.categories]
    if pd.api.types.is_numeric_dtype(s) and not pd.api.types.is_bool_dtype(s):
        x = s.to_numpy(dtype=float, na_value=np.nan)
        ok = ~np.isnan(x)
        if ok.any():
            lo = x[ok].min()
            if x[ok].max() - lo <= _SMALL_RANGE and np.all(x[ok] == np.floor(x[ok])):
                offset = np.where(ok, x - lo, 0).astype(np.intp)
                present = np.flatnonzero(np.bincount(offset[ok]))
                remap = np.full(int(present.max()) + 1, -1, dtype=np.intp)
                remap[present] = np.arange(present.size)
                return np.where(ok, remap[offset], -1), [_show(lo + v) for v in present]
    codes, uniques = c.factorized(s)
    return codes.astype(np.intp), [_show(v) for v in uniques]


def _show(v: Any) -> str:
    return f"{v:g}" if isinstance(v, float) else str(v)


class _Groups:
    """Group codes and weights shared by every variable's bincounts."""

    def __init__(self, codes: "np.ndarray", k: int, weights: "np.ndarray | None") -> None:
        self.codes, self.k, self.w = codes, k, weights

    def column_n(self) -> "np.ndarray":
        import numpy as np

        n = np.bincount(self.codes, weights=self.w, minlength=self.k).astype(float)
        return np.append(n, n.sum()) if self.k > 1 else n

    def total(self, per_group: "np.ndarray") -> "np.ndarray":
        """Append the Total column (sum over groups) when there are groups."""
        import numpy as np

        return np.concatenate([per_group, per_group.sum(axis=0, keepdims=True)]) if self.k > 1 else per_group


def _summarise(
    s: "pd.Series",
    name: str,
    label: str,
    level: LevelReport,
    show: tuple[str, ...],
    g: _Groups,
    value_labels: Mapping[Any, str] | None,
    moments: bool = False,
) -> VariableSummary:
    import numpy as np
    import pandas as pd

    kind = "continuous" if level.level in ("interval", "ratio") else level.level
    if kind == "nominal":
        codes, categories = _codes(s, value_labels)
        counts, missing = _count(codes, len(categories), g)
        return VariableSummary(name, label, level, show, counts.sum(axis=1), missing, tuple(categories), counts)
    ordered = isinstance(s.dtype, pd.CategoricalDtype)
    if ordered:
        if kind != "ordinal":
            raise InputError(f"{name}: a categorical variable cannot be described as {level.level}; declare it nominal or ordinal")
        x = s.cat.codes.to_numpy().astype(float)
        x[x < 0] = np.nan
    elif not pd.api.types.is_numeric_dtype(s) or pd.api.types.is_bool_dtype(s):
        raise InputError(f"{name}: {s.dtype} values cannot be {level.level}; declare it nominal or convert it to numbers")
    else:
        x = s.to_numpy(dtype=float, na_value=np.nan)
    ok = ~np.isnan(x)
    if not ok.any():
        raise InputError(f"{name}: every value is missing")
    n, missing = _valid_n(ok, g)
    fields: dict[str, Any] = {}
    if kind == "continuous" or moments:
        fields.update(_moments(x, ok, g, n, skew="skew" in show))
    if kind == "ordinal" or "median_iqr" in show:
        # an ordered categorical's quartiles must be categories: the inverted CDF
        fields.update(_quantiles(x, ok, g, inverted=ordered))
    if "range" in show:
        fields.update(_extremes(x, ok, g))
    if ordered or (kind == "ordinal" and "counts" in show):
        codes, categories = _codes(s, value_labels)
        fields["categories"] = tuple(categories)
        if "counts" in show:
            fields["counts"] = _count(codes, len(categories), g)[0]
    return VariableSummary(name, label, level, show, n, missing, positions=ordered, **fields)


def _count(codes: "np.ndarray", k: int, g: _Groups) -> tuple["np.ndarray", "np.ndarray"]:
    """(columns × k counts, missing per column) from one bincount."""
    import numpy as np

    table = np.bincount(g.codes * (k + 1) + (codes + 1), weights=g.w, minlength=g.k * (k + 1)).reshape(g.k, k + 1)
    table = g.total(table.astype(float))
    return table[:, 1:], table[:, 0]


def _valid_n(ok: "np.ndarray", g: _Groups) -> tuple["np.ndarray", "np.ndarray"]:
    import numpy as np

    both = np.bincount(g.codes * 2 + ok, weights=g.w, minlength=2 * g.k).reshape(g.k, 2).astype(float)
    both = g.total(both)
    return both[:, 1], both[:, 0]


def _moments(x: "np.ndarray", ok: "np.ndarray", g: _Groups, n: "np.ndarray", skew: bool) -> dict[str, "np.ndarray"]:
    """Mean and SD per group by two passes (mean, then squared deviations);
    the Total column by combining the groups' sums of squares."""
    import numpy as np

    xs, codes, w = _valid(x, ok, g)
    ng = n[: g.k] if g.k > 1 else n
    sums = np.bincount(codes, weights=xs if w is None else xs * w, minlength=g.k)
    with np.errstate(invalid="ignore", divide="ignore"):
        mean = sums / ng
        dev = xs - mean[codes]
        sq = dev * dev
        ss = np.bincount(codes, weights=sq if w is None else sq * w, minlength=g.k)
        out: dict[str, np.ndarray] = {}
        if g.k > 1:
            total_n = ng.sum()
            grand = sums.sum() / total_n
            seen = ng > 0  # a group with no values on this variable adds nothing (its mean is NaN)
            ss_total = float(ss[seen].sum()) + float(np.sum(ng[seen] * (mean[seen] - grand) ** 2))
            mean, ss = np.append(mean, grand), np.append(ss, ss_total)
        out["mean"] = mean
        out["sd"] = np.sqrt(ss / (n - 1))
        if skew:
            if w is not None:
                raise InputError("skewness with survey weights is not supported; leave skew out of show")
            m3 = np.bincount(codes, weights=sq * dev, minlength=g.k)
            if g.k > 1:
                d = xs - out["mean"][-1]
                m3 = np.append(m3, float(np.sum(d * d * d)))
            m2, m3 = ss / n, m3 / n
            out["skew"] = np.sqrt(n * (n - 1)) / (n - 2) * m3 / m2**1.5
    return out


def _quantiles(x: "np.ndarray", ok: "np.ndarray", g: _Groups, inverted: bool = False) -> dict[str, "np.ndarray"]:
    """Quartiles and median per column: counted for integer data over a small
    range, otherwise selected (``np.quantile``) group by group."""
    import numpy as np

    probs = np.array([0.25, 0.5, 0.75])
    xs, codes, w = _valid(x, ok, g)
    lo, hi = xs.min(), xs.max()
    out = np.full((g.k + (g.k > 1), 3), np.nan)
    if hi - lo <= _SMALL_RANGE and np.all(xs == np.floor(xs)):
        width = int(hi - lo) + 1
        table = np.bincount(codes * width + (xs - lo).astype(np.intp), weights=w, minlength=g.k * width).reshape(g.k, width)
        table = g.total(table.astype(float))
        for j, row in enumerate(table):
            out[j] = lo + (_weighted_from_counts(row, probs) if w is not None or inverted else _type7_from_counts(row, probs))
    else:
        parts = [(codes == j) for j in range(g.k)] if g.k > 1 else [slice(None)]
        for j, sel in enumerate(parts):
            out[j] = _quantile(xs[sel], probs, None if w is None else w[sel])
        if g.k > 1:
            out[-1] = _quantile(xs, probs, w)
    return {"q1": out[:, 0], "median": out[:, 1], "q3": out[:, 2]}


def _quantile(values: "np.ndarray", probs: "np.ndarray", w: "np.ndarray | None") -> "np.ndarray":
    import numpy as np

    if values.size == 0:
        return np.full(3, np.nan)
    if w is None:
        return np.quantile(values, probs)
    return np.quantile(values, probs, weights=w, method="inverted_cdf")


def _type7_from_counts(counts: "np.ndarray", probs: "np.ndarray") -> "np.ndarray":
    """Hyndman & Fan type 7 (numpy's and pandas' default) from counts of 0..width−1."""
    import numpy as np

    n = counts.sum()
    if n == 0:
        return np.full(probs.size, np.nan)
    h = (n - 1) * probs
    below = np.floor(h)
    cum = np.cumsum(counts)
    at = np.searchsorted(cum, below, side="right")  # value of order statistic number `below` (0-based)
    nxt = np.searchsorted(cum, np.minimum(below + 1, n - 1), side="right")
    return at + (h - below) * (nxt - at)


def _weighted_from_counts(weights: "np.ndarray", probs: "np.ndarray") -> "np.ndarray":
    """The weighted inverted CDF: the smallest value whose cumulative weight reaches p·W."""
    import numpy as np

    total = weights.sum()
    if total == 0:
        return np.full(probs.size, np.nan)
    cum = np.cumsum(weights)
    return np.searchsorted(cum, probs * total, side="left").astype(float)


def _extremes(x: "np.ndarray", ok: "np.ndarray", g: _Groups) -> dict[str, "np.ndarray"]:
    import numpy as np

    xs, codes, _ = _valid(x, ok, g)
    if g.k == 1:
        return {"minimum": np.array([xs.min()]), "maximum": np.array([xs.max()])}
    lo, hi = np.full(g.k, np.inf), np.full(g.k, -np.inf)
    np.minimum.at(lo, codes, xs)
    np.maximum.at(hi, codes, xs)
    lo, hi = np.append(lo, xs.min()), np.append(hi, xs.max())
    lo[np.isinf(lo)] = np.nan
    hi[np.isinf(hi)] = np.nan
    return {"minimum": lo, "maximum": hi}


def _valid(x: "np.ndarray", ok: "np.ndarray", g: _Groups) -> tuple["np.ndarray", "np.ndarray", "np.ndarray | None"]:
    """The values, group codes and weights of the rows with a value (no copy when none is missing)."""
    if ok.all():
        return x, g.codes, g.w
    return x[ok], g.codes[ok], None if g.w is None else g.w[ok]


def _test(df: "pd.DataFrame", name: str, group: str | None, kind: str, labels: Mapping[str, str]) -> dict[str, Any]:
    """The comparison across groups chosen group level (stated in the table note)."""
    from .anova import anova_oneway
    from .chisquare import chi_square
    from .ranks import kruskal_wallis, mann_whitney
    from .ttests import t_independent

    import pandas as pd

    assert group is not None
    k = df[group].dropna().nunique()
    if kind == "nominal":
        records = chi_square(df, group, name, labels=labels)
        fisher = next((r for r in records if r.kind == "fisher_exact"), None)
        small = any(n.kind == "assumption" and "expected counts below 5" in n.text for n in records[0].notes)
        if fisher is not None and small:
            return {"test": fisher, "test_name": "Fisher's exact test"}
        return {"test": records[0], "test_name": "χ<sup>2</sup> test of independence"}
    if kind == "ordinal":
        column = df[name]
        if isinstance(column.dtype, pd.CategoricalDtype):  # ordered categories (labels): the rank tests compare their positions
            positions = column.cat.codes.astype(float)
            df = df.assign(**{name: positions.where(positions >= 0)})
        if k == 2:
            return {"test": mann_whitney(df, name, group, labels=labels), "test_name": "Mann–Whitney <i>U</i> test"}
        return {"test": kruskal_wallis(df, name, group, labels=labels), "test_name": "Kruskal–Wallis <i>H</i> test"}
    if k == 2:
        return {"test": t_independent(df, name, group, labels=labels), "test_name": "Welch's <i>t</i> test"}
    return {"test": anova_oneway(df, name, group, variant="welch", labels=labels), "test_name": "Welch's one-way ANOVA"}


def _smd(v: VariableSummary) -> float:
    """The absolute standardised difference between the two groups: for means,
    (M1 − M2) / √((SD1² + SD2²) / 2) (Austin, 2009, Statistics in Medicine);
    for categories, Yang & Dalton's (2012) multivariate form, which reduces to
    the proportions formula for two categories."""
    import numpy as np

    if v.kind == "nominal":
        assert v.counts is not None
        totals = v.counts[:2].sum(axis=1, keepdims=True)
        if not np.all(totals > 0):  # a group without a valid value of the variable: no proportions to compare
            return float("nan")
        p = v.counts[:2] / totals
        t = (p[0] - p[1])[1:]
        cov = [np.diag(q[1:]) - np.outer(q[1:], q[1:]) for q in p]
        s = (cov[0] + cov[1]) / 2
        if t.size == 0 or not np.any(t):
            return 0.0
        return float(np.sqrt(t @ np.linalg.pinv(s) @ t))
    assert v.mean is not None and v.sd is not None
    return float(abs(v.mean[0] - v.mean[1]) / np.sqrt((v.sd[0] ** 2 + v.sd[1] ** 2) / 2))
