"""Shared preparation for the analyses: columns, missing values, labels, provenance."""

from __future__ import annotations

import difflib
from typing import TYPE_CHECKING, Any, Mapping, Sequence

from ..coding import _code_key, categories, category_text, find_categories
from ..errors import InputError
from ..records import Note, Provenance, Variable

if TYPE_CHECKING:
    import pandas as pd


def column(df: "pd.DataFrame", name: str) -> "pd.Series":
    if name not in df.columns:
        names = [str(c) for c in df.columns]
        close = [n for n in names if str(name).lower() in n.lower()][:3] or difflib.get_close_matches(str(name), names, n=3, cutoff=0.5)
        hint = f"; did you mean {', '.join(close)}?" if close else ""
        raise InputError(f"{name}: no such column{hint}")
    return df[name]


def numeric(df: "pd.DataFrame", name: str) -> "pd.Series":
    import pandas as pd

    s = column(df, name)
    if not pd.api.types.is_numeric_dtype(s) or pd.api.types.is_bool_dtype(s):
        raise InputError(f"{name}: not numeric (dtype {s.dtype}); a numeric outcome is required")
    if s.notna().sum() == 0:
        raise InputError(f"{name}: every value is missing")
    x = s.astype(float)
    infinite = x.abs() == float("inf")
    if infinite.any():
        first = int(infinite.to_numpy().argmax()) + 1
        raise InputError(f"{name}: {int(infinite.sum())} infinite value(s) (first in row {first}); set them missing or correct them")
    return x


def listwise(df: "pd.DataFrame", names: Sequence[str]) -> tuple["pd.DataFrame", Note]:
    """Rows complete on ``names``, and a note saying how many were dropped."""
    import pandas as pd

    for n in names:
        column(df, n)
    if len(set(names)) != len(names):
        raise InputError(f"{', '.join(names)}: the same variable is named twice")
    sub = df[list(names)]
    absent = {n: int(sub[n].isna().sum()) for n in names}
    for n, count in absent.items():
        if count == len(sub):
            raise InputError(f"{n}: every value is missing")
    complete = sub.dropna() if any(absent.values()) else sub
    for n in names:  # a category with no complete row is not a group of the analysis
        if isinstance(complete[n].dtype, pd.CategoricalDtype) and len(complete[n].cat.categories) > complete[n].nunique():
            complete = complete.assign(**{n: complete[n].cat.remove_unused_categories()})
    dropped = len(sub) - len(complete)
    if dropped:
        note = Note("missing", f"{dropped} of {len(sub)} rows dropped for missing values on {', '.join(names)} (listwise).")
    else:
        note = Note("missing", f"No rows dropped for missing values on {', '.join(names)} (n = {len(sub)}).")
    return complete, note


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
    from .. import __version__

    versions["statsetter"] = __version__
    return Provenance(source, versions)


def paired_variables(first: str, second: str, labels: Mapping[str, str], outcome_label: str | None) -> tuple[Variable, ...]:
    """The two measurements of a paired design, led by the outcome when it is named."""
    found = variables({"first": first, "second": second}, labels)
    outcome = outcome_label or labels.get("outcome")
    return ((Variable(outcome, outcome, "outcome"),) + found) if outcome else found


def notes(*items: Note | None) -> tuple[Note, ...]:
    return tuple(n for n in items if n is not None)


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


def two_levels(data: "pd.DataFrame", group: str, groups: Sequence[object] | None, test: str) -> list[Any]:
    """The two groups to compare: the ones named (by label or code), else the
    only two present, in code order."""
    present = categories(data[group])
    if groups is not None:
        if len(groups) != 2:
            raise InputError(f"groups: name exactly two levels of {group}, got {len(groups)}")
        return find_categories(group, groups, present, role="group")
    if len(present) != 2:
        shown = ", ".join(category_text(v) for v in present[:6]) + (" …" if len(present) > 6 else "")
        raise InputError(f"{group}: {len(present)} group{'' if len(present) == 1 else 's'} with data ({shown}); a {test} needs exactly two (name them with groups=[...])")
    return present
