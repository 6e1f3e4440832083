"""Shared preparation for the analyses: columns, missing values, labels, provenance."""

from __future__ import annotations

from typing import TYPE_CHECKING, Any, Iterable, Mapping, Sequence

from ..coding import _code_key, categories, category_text, column, find_categories, find_category
from ..errors import InputError
from ..io import refuse_huge
from ..records import GroupSummary, Note, Provenance, Variable

if TYPE_CHECKING:
    import numpy as np
    import pandas as pd


def numeric(df: "pd.DataFrame", name: str) -> "pd.Series":
    import numpy as np
    import pandas as pd

    s = column(df, name)
    if not pd.api.types.is_numeric_dtype(s.dtype) or pd.api.types.is_bool_dtype(s.dtype):
        raise InputError(f"{name}: not numeric (dtype {s.dtype}){stray_text(s)}; a numeric variable is required here")
    x = s if s.dtype == np.float64 else s.astype(float)  # missing values (NA of nullable integers too) become NaN
    values = x.to_numpy()
    if np.isnan(values).all():
        raise InputError(f"{name}: every value is missing")
    infinite = np.isinf(values)
    if infinite.any():
        first = int(infinite.argmax()) + 1
        raise InputError(f"{name}: {int(infinite.sum())} infinite value(s) (first in row {first}); set them missing or correct them")
    refuse_huge(name, values)
    return x


def stray_text(s: "pd.Series") -> str:
    """Where a column of numbers holds a few entries that are not (a typo, a code such as "n/a" in a CSV): the first,
    with its row, so that a text column read where a number was meant can be corrected; "" for a column of words."""
    import numpy as np
    import pandas as pd

    if pd.api.types.is_bool_dtype(s.dtype):
        return ""
    present = s.notna()
    stray = present & pd.to_numeric(s, errors="coerce").isna()
    if not stray.any() or int(stray.sum()) * 2 > int(present.sum()):  # mostly words: a categorical variable, said as it is
        return ""
    first = int(stray.to_numpy().argmax())
    label = s.index[first]  # the data file's row (a frame read from a file is numbered from 0; rows left out keep their numbers)
    row = int(label) + 1 if isinstance(label, (int, np.integer)) else label
    return f": {int(stray.sum())} of its {int(present.sum())} values are not numbers (first {s.iloc[first]!r} in row {row}); correct them or declare them missing"


def listwise(df: "pd.DataFrame", names: Sequence[str]) -> tuple["pd.DataFrame", Note]:
    """Rows complete on ``names``, and a note saying how many were dropped."""
    import numpy as np
    import pandas as pd

    columns = [column(df, n) for n in names]
    if len(set(names)) != len(names):
        raise InputError(f"{', '.join(names)}: the same variable is named twice")
    for n, s in zip(names, columns):
        if s.ndim > 1:
            raise InputError(f"{n}: {s.shape[1]} columns have this name; rename them so that each is named once")
    sub = df.take([df.columns.get_loc(n) for n in names], axis=1)  # by position: a quarter of df[names]'s time
    masks = [_missing(s) for s in columns]
    for n, mask in zip(names, masks):
        if (0 if mask is None else int(np.count_nonzero(mask))) == len(sub):
            raise InputError(f"{n}: every value is missing")
    gaps = [m for m in masks if m is not None and m.any()]
    complete = sub.take(np.flatnonzero(~np.logical_or.reduce(gaps))) if gaps else sub  # the rows dropna keeps
    for n, s in zip(names, columns):  # a category with no complete row is not a group of the analysis
        if isinstance(s.dtype, pd.CategoricalDtype) and len(complete[n].cat.categories) > complete[n].nunique():
            complete = complete.assign(**{n: complete[n].cat.remove_unused_categories()})
    dropped = len(sub) - len(complete)
    if dropped:
        note = Note("missing", f"{dropped} of {len(sub)} rows dropped for missing values on {', '.join(names)} (listwise).")
    else:
        note = Note("missing", f"No rows dropped for missing values on {', '.join(names)} (n = {len(sub)}).")
    return complete, note


def _missing(s: "pd.Series") -> "np.ndarray | None":
    """Which values of ``s`` are missing, as ``isna`` says (None: its dtype holds no missing value; a float column read
    by numpy directly)."""
    import numpy as np

    kind = s.dtype.kind if isinstance(s.dtype, np.dtype) else ""
    if kind in ("i", "u", "b"):
        return None
    if kind == "f":
        return np.isnan(s.to_numpy())
    return np.asarray(s.array.isna())


def variables(roles: Mapping[str, str], labels: Mapping[str, str] | None) -> tuple[Variable, ...]:
    labels = labels or {}
    return tuple(Variable(name, labels.get(name, name), role) for role, name in roles.items())


def provenance(source: str, *, statsmodels: bool = False) -> Provenance:
    import numpy
    import scipy

    versions = {"numpy": numpy.__version__, "scipy": scipy.__version__}
    if statsmodels:
        import statsmodels as sm

        versions["statsmodels"] = sm.__version__
    try:
        import pandas

        versions["pandas"] = pandas.__version__
    except ImportError:  # pragma: no cover - pandas is a dependency of the analyses
        pass
    from .._version import __version__

    versions["statsetter"] = __version__
    return Provenance(source, versions)


def paired_variables(first: str, second: str, labels: Mapping[str, str], outcome_label: str | None) -> tuple[Variable, ...]:
    """The two measurements of a paired design, led by the outcome when it is named."""
    found = variables({"first": first, "second": second}, labels)
    outcome = outcome_label or labels.get("outcome")
    return ((Variable(outcome, outcome, "outcome"),) + found) if outcome else found


def measured_variables(columns: Sequence[str], labels: Mapping[str, str] | None, outcome_label: str | None) -> tuple[Variable, ...]:
    """The measurements of a repeated design, in order, led by the outcome when it is named."""
    found = variables({f"measurement {i + 1}": name for i, name in enumerate(columns)}, labels)
    return ((Variable(outcome_label, outcome_label, "outcome"),) + found) if outcome_label else found


def cell_groups(rows: "Iterable[tuple[str, str, np.ndarray]]") -> tuple[GroupSummary, ...]:
    """The cells of a two-factor design as groups: "a × b" with n, mean and SD
    and the two levels in ``extra["cell"]`` (what an interaction figure draws)."""
    out = []
    for first, second, values in rows:
        v = values[values == values]  # NaN is not equal to itself
        if len(v):
            out.append(GroupSummary(f"{first} × {second}", n=int(len(v)), mean=float(v.mean()), sd=float(v.std(ddof=1)) if len(v) > 1 else None,
                                    extra={"cell": [first, second]}))
    return tuple(out)


def notes(*items: Note | None) -> tuple[Note, ...]:
    return tuple(n for n in items if n is not None)


def constant(*samples: "np.ndarray | pd.Series") -> bool:
    """Whether every value (of every sample given) is the same: by the values themselves, not a variance, which
    rounding leaves a hair above zero for a column of 5.1s (and a t of 10¹⁴ after it)."""
    present = [v for v in samples if len(v)]
    return bool(present) and all(v.min() == v.max() for v in present) and len({v.min() for v in present}) == 1


def require_variance(values: "np.ndarray | pd.Series", name: str, undefined: str) -> None:
    """Refuse a variable whose every value is the same, naming it and what is then ``undefined``."""
    if constant(values):
        raise InputError(f"{name}: zero variance (every value is {float(values.min()):g}); {undefined}")


def fmt(x: Any) -> str:
    return f"{x:.4g}"


def split_by(values: "pd.Series", groups: "pd.Series") -> tuple[list[object], list[Any]]:
    """(levels in sorted order, the values of each level as numpy arrays),
    encoding the group column once (Arrow strings are dictionary-encoded)."""
    import pandas as pd

    array = groups.array
    pa_array = getattr(array, "_pa_array", None)
    if pa_array is not None:
        import pyarrow as pa
        import pyarrow.compute as pc

        encoded = pc.dictionary_encode(pa_array)
        if isinstance(encoded, pa.ChunkedArray):
            encoded = encoded.combine_chunks()
        codes = encoded.indices.to_numpy(zero_copy_only=False)
        uniques = encoded.dictionary.to_pylist()
    else:
        codes, uniq = pd.factorize(groups, sort=False)
        uniques = list(uniq)
    if isinstance(groups.dtype, pd.CategoricalDtype):  # code order, as the value labels list them
        rank = {cat: i for i, cat in enumerate(groups.cat.categories.tolist())}
        order = sorted(range(len(uniques)), key=lambda k: rank.get(uniques[k], len(rank)))
    else:
        order = sorted(range(len(uniques)), key=lambda k: _code_key(uniques[k]))
    y = values.to_numpy(dtype=float)
    if len(uniques) == 2:
        mask = codes == order[0]
        return [uniques[k] for k in order], [y[mask], y[~mask]]
    return [uniques[k] for k in order], [y[codes == k] for k in order]


def grouped(df: "pd.DataFrame", outcome: str, group: str, test: str, min_n: int = 2) -> tuple[list[object], list[Any], Note]:
    """Listwise data of a numeric ``outcome`` split by ``group``: (levels,
    samples, missing note), with at least two groups of ``min_n`` values each."""
    data, missing = listwise(df, [outcome, group])
    y = numeric(data, outcome)
    levels, samples = split_by(y, data[group])
    if len(levels) < 2:
        raise InputError(f"{group}: {len(levels)} group(s) with data; {test} needs at least two")
    for level, values in zip(levels, samples):
        if len(values) < min_n:
            raise InputError(f"{group} = {level}: n = {len(values)}; each group needs at least {min_n} values")
    return levels, samples, missing


def mixed_order(v: Any) -> tuple[int, Any]:
    """A sort key for values of kinds that do not compare with each other: numbers first, then the rest as text."""
    return (0, v) if isinstance(v, (int, float)) else (1, str(v))


def factorized(s: "pd.Series") -> tuple["np.ndarray", Any]:
    """Codes of a column's values and the values in sorted order (pandas' factorize); a column of kinds that do not
    compare (a spreadsheet column of dates and numbers) sorted by ``mixed_order``."""
    import numpy as np
    import pandas as pd

    try:
        return pd.factorize(s, sort=True)
    except TypeError:
        codes, found = pd.factorize(s)
        order = sorted(range(len(found)), key=lambda k: mixed_order(found[k]))
        rank = np.empty(len(order), dtype=np.intp)
        rank[order] = np.arange(len(order))
        return np.where(codes >= 0, rank[codes], -1), [found[k] for k in order]


def cross_counts(data: "pd.DataFrame", row: str, column: str) -> "pd.DataFrame":
    """The counts of ``row`` × ``column`` (no missing values) as pandas' crosstab lays them out — a categorical's
    categories in their order, other values sorted, categories without a case left out, a pair of levels without a
    case counted 0 — counted in one pass (crosstab's pivot machinery took 10-40 ms a table)."""
    import numpy as np
    import pandas as pd

    def coded(s: "pd.Series") -> tuple["np.ndarray", "pd.Index"]:
        if isinstance(s.dtype, pd.CategoricalDtype):
            return s.cat.codes.to_numpy().astype(np.intp), s.cat.categories
        codes, uniques = factorized(s)
        return codes, pd.Index(uniques)

    (rc, rows), (cc, cols) = coded(data[row]), coded(data[column])
    counts = np.bincount(rc * len(cols) + cc, minlength=len(rows) * len(cols)).reshape(len(rows), len(cols))
    keep_rows, keep_cols = counts.sum(axis=1) > 0, counts.sum(axis=0) > 0
    return pd.DataFrame(counts[keep_rows][:, keep_cols], index=rows[keep_rows].rename(row), columns=cols[keep_cols].rename(column))


def two_levels(data: "pd.DataFrame", group: str, groups: Sequence[object] | None, test: str, present: "list[Any] | None" = None) -> list[Any]:
    """The two groups to compare: the ones named (by label or code), else the
    only two present, in code order (``present``: the groups found already)."""
    present = categories(data[group]) if present is None else present
    if groups is not None:
        if len(groups) != 2:
            raise InputError(f"groups: name exactly two levels of {group}, got {len(groups)}")
        return find_categories(group, groups, present, role="group")
    if len(present) != 2:
        shown = ", ".join(category_text(v) for v in present[:6]) + (" …" if len(present) > 6 else "")
        raise InputError(f"{group}: {len(present)} group{'' if len(present) == 1 else 's'} with data ({shown}); a {test} needs exactly two (name them with groups=[...])")
    return present


def long_pairs(
    df: "pd.DataFrame", outcome: str, subject: str, within: str, conditions: Sequence[object] | None, labels: Mapping[str, str] | None
) -> tuple["pd.DataFrame", str, str, dict[str, str], str]:
    """Long data (one row per subject and condition) as two wide columns, one
    per condition of ``within`` (its two categories in order, or the two
    ``conditions`` named): the frame, the two column names, labels naming the
    conditions, and the outcome's label. A subject measured twice in one
    condition is an error naming it; a subject missing a condition has a
    missing value there (dropped listwise, and said so)."""
    for name in (outcome, subject, within):
        column(df, name)
    present = categories(df[within].dropna())
    chosen = find_categories(within, conditions, present, role="condition") if conditions is not None else present
    if len(chosen) != 2:
        listed = ", ".join(category_text(v) for v in present)
        raise InputError(f"{within}: {len(chosen)} conditions ({listed}); a paired test compares two: name them with conditions=[first, second]")
    rows = df[df[within].isin(chosen) & df[subject].notna()]
    twice = rows.duplicated([subject, within], keep=False)
    if twice.any():
        first = rows[twice].iloc[0]
        raise InputError(f"{subject}: subject {category_text(first[subject])} has more than one row in condition {category_text(first[within])} of {within}")
    wide = rows.pivot(index=subject, columns=within, values=outcome)
    names = [f"{within}={category_text(v)}" for v in chosen]
    wide = wide.reindex(columns=list(chosen))
    wide.columns = names
    labels = dict(labels or {})
    # a condition coded by a number is named with its variable ("group 1"), never as a bare code
    numbered = all(category_text(v).replace(".", "", 1).lstrip("-").isdigit() for v in chosen)
    prefix = f"{labels.get(within, within)} " if numbered else ""
    named = {n: labels.get(n, prefix + category_text(v)) for n, v in zip(names, chosen)}
    return wide.reset_index(drop=True), names[0], names[1], {**labels, **named}, labels.get(outcome, outcome)


def paired_columns(test, df, first, second, outcome, subject, within, conditions, labels, outcome_label):  # type: ignore[no-untyped-def]
    """A paired test's data as two wide columns: ``first`` and ``second`` as
    given, or long data (``outcome``, ``subject``, ``within``) pivoted by
    :func:`long_pairs`. A mix of the two, or half of either, is refused."""
    if outcome is None and subject is None and within is None:
        if first is None or second is None:
            raise InputError(f"{test}: name the two columns (first, second), or outcome, subject and within for long data")
        return df, first, second, labels, outcome_label
    if first is not None or second is not None:
        raise InputError("first, second: give two columns (wide data) or outcome, subject and within (long data), not both")
    for key, value in (("outcome", outcome), ("subject", subject), ("within", within)):
        if value is None:
            raise InputError(f"{key}: long data need outcome, subject and within")
    frame, a, b, named, label = long_pairs(df, outcome, subject, within, conditions, labels)
    return frame, a, b, named, outcome_label or label


def one_condition(df, outcome, subject, within, condition):  # type: ignore[no-untyped-def]
    """The rows of one ``condition`` of ``within`` in long data (all rows when
    neither is given); with ``subject``, a subject with two rows there is an error."""
    if within is None and condition is None:
        if subject is not None:
            raise InputError("subject: long data also need within and the condition to test")
        return df
    if within is None or condition is None:
        raise InputError(f"{'condition' if within is not None else 'within'}: long data need within and the condition to test")
    column(df, within)
    chosen = find_category(within, condition, categories(df[within].dropna()), role="condition")
    rows = df[df[within] == chosen]
    if subject is not None:
        twice = rows[subject].duplicated(keep=False) & rows[subject].notna()
        if twice.any():
            raise InputError(f"{subject}: subject {category_text(rows[subject][twice].iloc[0])} has more than one row in condition {category_text(chosen)} of {within}")
    return rows
