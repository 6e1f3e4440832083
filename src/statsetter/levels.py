"""Levels of measurement: declared, read from the data file, or inferred.

What a table reports for a variable follows its level (Stevens, 1946;
docs/reporting-rules.md "Levels of measurement"). A level comes, in this order,
from the author's declaration, from the file's metadata (SPSS measurement
levels, pandas categoricals), or from an inference whose reason is reported
and which is flagged as weak where a wrong guess is likely.
"""

from __future__ import annotations

import re
from typing import TYPE_CHECKING, Mapping

from .errors import InputError
from .records.summaries import Level, LevelReport

if TYPE_CHECKING:
    import pandas as pd

LEVELS: tuple[Level, ...] = ("nominal", "ordinal", "interval", "ratio")

# Integer-valued with at most this many distinct values reads as a rating scale.
ORDINAL_MAX_DISTINCT = 10


def check_level(name: str, level: str) -> Level:
    if level not in LEVELS:
        raise InputError(f"{name}: level {level!r} is not one of {', '.join(LEVELS)}")
    return level  # type: ignore[return-value]


def infer_level(series: "pd.Series") -> LevelReport:
    """A level from the values alone, with the reason and whether it is weak."""
    import numpy as np
    import pandas as pd

    name = str(series.name)
    if isinstance(series.dtype, pd.CategoricalDtype):
        if series.dtype.ordered:
            return LevelReport(name, "ordinal", "categorical", "ordered categorical")
        return LevelReport(name, "nominal", "categorical", "unordered categorical")
    if not pd.api.types.is_numeric_dtype(series) or pd.api.types.is_bool_dtype(series):
        values = series.dropna()
        if values.empty:  # a text or object column with no value at all (Stata's missing bytes read as None)
            return LevelReport(name, "nominal", "inferred", "every value is missing", weak=True)
        distinct = int(values.nunique())
        reason = f"{distinct} distinct values, not numeric ({series.dtype})"
        if distinct > 2 and len(values) and distinct > max(20, len(values) // 2):
            return LevelReport(name, "nominal", "inferred", reason + "; looks like an identifier or free text", weak=True, identifier=True)
        return LevelReport(name, "nominal", "inferred", reason)
    x = series.to_numpy(dtype=float, na_value=np.nan)
    x = x[~np.isnan(x)]
    if x.size == 0:
        return LevelReport(name, "nominal", "inferred", "every value is missing", weak=True)
    integral = bool(np.all(x == np.floor(x)))
    if integral and x.max() - x.min() <= 1_000:
        distinct = int(np.count_nonzero(np.bincount((x - x.min()).astype(np.int64))))
    else:
        distinct = int(np.unique(x).size)
    span = f"{x.min():g}–{x.max():g}"
    if distinct <= 2:
        return LevelReport(name, "nominal", "inferred", f"{distinct} distinct values ({span})")
    if integral and distinct <= ORDINAL_MAX_DISTINCT:
        return LevelReport(name, "ordinal", "inferred", f"integer, {distinct} distinct values {span}", weak=True)
    if integral:
        return LevelReport(name, "interval", "inferred", f"integer, {distinct} distinct values {span}", weak=distinct <= 20)
    return LevelReport(name, "interval", "inferred", f"numeric with fractions, {distinct} distinct values")


_ID_NAME = re.compile(r"(?:^|[\W_])(?:id|ids|ident|identifier|case|caseno|case_?id|record|respondent|participant|subject|patient|serial)(?:[\W_]?(?:no|nr|num|number|id|code))?(?:$|[\W_])", re.I)


def identifier_reason(series: "pd.Series", label: str | None = None) -> str | None:
    """Why ``series`` looks like a case identifier, or None: every value
    distinct (at least 20 rows) and either named or labelled as an ID, or
    integers in file order (increasing) or consecutive, whatever their range."""
    import numpy as np
    import pandas as pd

    values = series.dropna()
    if len(values) < 20 or isinstance(series.dtype, pd.CategoricalDtype) or not values.is_unique:
        return None
    if pd.api.types.is_numeric_dtype(series) and not pd.api.types.is_bool_dtype(series):
        x = values.to_numpy(dtype=float)
        if np.all(x == np.floor(x)):
            if x.max() - x.min() + 1 == x.size:
                return f"integer, every value distinct and consecutive ({x.min():g}–{x.max():g}); looks like a case number"
            if values.is_monotonic_increasing:
                return f"integer, every value distinct and increasing in file order ({x.min():g}–{x.max():g}); looks like a case number"
    if _ID_NAME.search(str(series.name)):
        return "every value distinct and the name says it identifies cases"
    if label is not None and _ID_NAME.search(label):
        return "every value distinct and the label says it identifies cases"
    return None


def resolve_levels(
    df: "pd.DataFrame",
    names: list[str],
    declared: Mapping[str, str] | None = None,
    metadata: Mapping[str, str] | None = None,
    labels: Mapping[str, str] | None = None,
) -> dict[str, LevelReport]:
    """Each variable's level: declared, else from the file's metadata, else
    inferred; a column that looks like a case identifier is flagged as one
    unless its level is declared."""
    declared = declared or {}
    metadata = metadata or {}
    labels = labels or {}
    unknown = sorted(set(declared) - set(df.columns))
    if unknown:
        from .coding import column

        column(df, unknown[0])
    out = {}
    for name in names:
        if name in declared:
            out[name] = LevelReport(name, check_level(name, declared[name]), "declared", "declared")
        elif name in metadata:
            out[name] = LevelReport(name, check_level(name, metadata[name]), "metadata", "the data file's measurement level")
        else:
            out[name] = infer_level(df[name])
        if name not in declared and not out[name].identifier:
            why = identifier_reason(df[name], labels.get(name))
            if why:
                out[name] = LevelReport(name, "nominal", "inferred", why, weak=True, identifier=True)
    return out
