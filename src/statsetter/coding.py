"""Coded categories: numeric codes with value labels become named factors.

Survey and clinical data mostly arrive as codes (sex 1/2, chest-pain type
0–3) with value labels kept beside them (an SPSS or Stata file's labels, or a
codebook given in the plan). Before an analysis, a categorical variable is
turned into a pandas categorical whose categories are the labels, in code
order, so that every model dummy-codes it, every sentence and table names its
groups by label, and the first category in code order is the default
reference. Users may name a category by its label or by its code. `column`
finds a data column by name, or names the close matches.
"""

from __future__ import annotations

import difflib
import math
from typing import TYPE_CHECKING, Any, Iterable, Mapping, Sequence

from .errors import InputError

if TYPE_CHECKING:
    import pandas as pd

__all__ = ["category_text", "categories", "factor", "find_category", "joined", "label_codes"]


def category_text(value: Any) -> str:
    """A category as text: an integral float code prints as an integer ("2",
    never "2.0"), anything else as it is."""
    if isinstance(value, float) and math.isfinite(value) and value.is_integer():
        return str(int(value))
    if hasattr(value, "item") and not isinstance(value, str):  # numpy scalars
        return category_text(value.item())
    return str(value)


def _code_key(value: Any) -> tuple[int, Any]:
    """Sort key: numbers numerically, then text alphabetically."""
    if isinstance(value, (int, float)) and not isinstance(value, bool):
        return (0, float(value))
    if hasattr(value, "item") and not isinstance(value, str):
        return _code_key(value.item())
    return (1, str(value))


def categories(s: "pd.Series") -> list[Any]:
    """The categories present in ``s``: a categorical's in its own order,
    numbers in numeric order, text in alphabetical order."""
    import pandas as pd

    present = s.dropna()
    if isinstance(s.dtype, pd.CategoricalDtype):
        used = set(present.unique().tolist())
        return [c for c in s.cat.categories.tolist() if c in used]
    return sorted(present.unique().tolist(), key=_code_key)


def factor(s: "pd.Series", value_labels: Mapping[Any, str] | None = None, *, ordered: bool = False) -> "pd.Series":
    """``s`` as a categorical named by its value labels, categories in code
    order (codes without a label keep their code as text). A categorical is
    returned as it is."""
    import pandas as pd

    if isinstance(s.dtype, pd.CategoricalDtype):
        return s
    value_labels = value_labels or {}
    by_text = {category_text(k): str(v) for k, v in value_labels.items()}
    codes = sorted(set(s.dropna().unique().tolist()) | set(value_labels), key=_code_key)
    names: list[str] = []
    for code in codes:
        name = by_text.get(category_text(code), category_text(code))
        if name not in names:
            names.append(name)
    mapping = {code: by_text.get(category_text(code), category_text(code)) for code in codes}
    named = s.map(lambda v: mapping.get(v, v) if v == v else v)  # noqa: PLR0124 - NaN stays NaN
    return pd.Series(pd.Categorical(named, categories=names, ordered=ordered), index=s.index, name=s.name)


def label_codes(value_labels: Mapping[Any, str] | None) -> dict[str, str]:
    """Code (as text) → label."""
    return {category_text(k): str(v) for k, v in (value_labels or {}).items()}


def find_category(variable: str, given: Any, present: Sequence[Any], codes: Mapping[str, str] | None = None, role: str = "category") -> Any:
    """The member of ``present`` that ``given`` names: itself, its text, or
    (with ``codes``, code text → label) the label of the code given. An
    unknown name is an error listing the categories with their codes."""
    if given in present:
        return given
    text = category_text(given)
    by_text = {category_text(p): p for p in present}
    if text in by_text:
        return by_text[text]
    codes = codes or {}
    if text in codes and codes[text] in by_text:
        return by_text[codes[text]]
    inverse = {label: code for code, label in codes.items()}
    shown = [f"{category_text(p)} (code {inverse[category_text(p)]})" if category_text(p) in inverse else category_text(p) for p in present]
    raise InputError(f"{variable}: {role} {given!r} is not among {', '.join(shown)}")


def joined(names: Sequence[str]) -> str:
    """``a``, ``a and b``, ``a, b and c``: names listed in a sentence."""
    return names[0] if len(names) == 1 else ", ".join(names[:-1]) + " and " + names[-1]


def find_categories(variable: str, given: Iterable[Any], present: Sequence[Any], codes: Mapping[str, str] | None = None, role: str = "category") -> list[Any]:
    return [find_category(variable, g, present, codes, role) for g in given]


def column(df: "pd.DataFrame", name: str) -> "pd.Series":
    if isinstance(name, (list, tuple, dict, set)):  # (unhashable, or a pair pandas would read as two levels of a header)
        raise InputError(f"{name!r}: one column's name is wanted here, not a {type(name).__name__}")
    if name not in df.columns:
        names = [str(c) for c in df.columns]
        close = [n for n in names if str(name).lower() in n.lower()][:3] or difflib.get_close_matches(str(name), names, n=3, cutoff=0.5)
        hint = f"; did you mean {', '.join(close)}?" if close else ""
        raise InputError(f"{name}: no such column{hint}")
    return df[name]
