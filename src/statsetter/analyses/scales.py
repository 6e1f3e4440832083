"""Scale scores from items (with reverse-keyed items) and Cronbach's α."""

from __future__ import annotations


from typing import TYPE_CHECKING, Literal, Mapping, Sequence

from ..errors import InputError
from ..records import EffectSize, Interval, Note, Result
from . import _common as c

if TYPE_CHECKING:
    import numpy as np
    import pandas as pd


def _items(df: "pd.DataFrame", items: Sequence[str], reverse: Sequence[str], minimum: float | None, maximum: float | None) -> "np.ndarray":
    """The items' values as one rows × items array of floats (missing: NaN), the reverse-keyed ones reversed."""
    import numpy as np

    if len(items) < 2:
        raise InputError(f"items: {len(items)} item(s); a scale needs at least two")
    unknown = [r for r in reverse if r not in items]
    if unknown:
        raise InputError(f"reverse: {', '.join(map(str, unknown))} not among the items")
    values = np.column_stack([c.numeric(df, i).to_numpy(dtype=float) for i in items])
    if reverse:
        if minimum is None or maximum is None:
            raise InputError("reverse-keyed items need the item minimum and maximum")
        for name in reverse:
            j = list(items).index(name)
            col = values[:, j]
            outside = col[(col < minimum) | (col > maximum)]
            if len(outside):
                raise InputError(f"{name}: value {outside[0]:g} is outside the item range {minimum:g}–{maximum:g}")
            values[:, j] = minimum + maximum - col
    return values


def scale_score(
    df: "pd.DataFrame",
    items: Sequence[str],
    *,
    reverse: Sequence[str] = (),
    minimum: float | None = None,
    maximum: float | None = None,
    scoring: Literal["mean", "sum"] = "mean",
    min_share: float | None = None,
) -> "pd.Series":
    """Per-row mean or sum of the items after reversing ``reverse``
    (x → minimum + maximum − x). By default a row missing any item scores
    missing; with ``min_share`` (say 0.8) a row with at least that share of
    its items present is scored from them — the mean of the present items,
    or for a sum that mean times the number of items (prorated)."""
    import numpy as np
    import pandas as pd

    if scoring not in ("mean", "sum"):
        raise InputError(f"scoring: {scoring!r} is not mean or sum")
    if min_share is not None and not (isinstance(min_share, (int, float)) and 0 < min_share <= 1):
        raise InputError(f"min_share: {min_share!r} is not a share between 0 and 1 (0.8 for 80% of the items)")
    values = _items(df, items, reverse, minimum, maximum)
    present = np.count_nonzero(~np.isnan(values), axis=1)
    enough = present == len(items) if min_share is None else present >= min_share * len(items) - 1e-9
    with np.errstate(invalid="ignore", divide="ignore"):  # a row without items: 0/0, scored missing below
        mean = np.nansum(values, axis=1) / present
    score = mean if scoring == "mean" else mean * len(items)
    return pd.Series(np.where(enough & (present > 0), score, np.nan), index=df.index)


def scoring_note(df: "pd.DataFrame", items: Sequence[str], name: str, min_share: float | None = None) -> str:
    """What the missing-item rule did: how many rows lost their score, how many were prorated."""
    import numpy as np

    present = sum(np.asarray(c.column(df, i).notna()) for i in items)
    k = len(items)
    if min_share is None:
        lost = int((present < k).sum())
        return f"{name}: scored from complete items only; {lost} of {len(df)} rows have no score (an item missing)."
    enough = present >= min_share * k - 1e-9
    lost = int((~enough | (present == 0)).sum())
    prorated = int((enough & (present < k) & (present > 0)).sum())
    return (f"{name}: scored when at least {min_share:.0%} of the {k} items are present (prorated from the items present); "
            f"{prorated} of {len(df)} rows prorated, {lost} have no score.")


def cronbach_alpha(
    df: "pd.DataFrame",
    items: Sequence[str],
    *,
    reverse: Sequence[str] = (),
    minimum: float | None = None,
    maximum: float | None = None,
    level: float = 0.95,
    scale: str = "the scale",
    labels: Mapping[str, str] | None = None,
) -> Result:
    """Cronbach's α on complete rows, with Feldt's (1965) F-based interval and
    the corrected item–total correlation of every item (in ``details``)."""
    import numpy as np
    from scipy import special

    values = _items(df, items, reverse, minimum, maximum)
    complete = values[~np.isnan(values).any(axis=1)]
    n, k = complete.shape
    if n < 3:
        raise InputError(f"items: {n} complete row(s); α needs at least 3")
    variances = complete.var(axis=0, ddof=1)
    flat = complete.min(axis=0) == complete.max(axis=0)  # (not the variances: rounding leaves a column of 5.1s a hair above zero)
    if flat.any():
        raise InputError(f"{items[int(np.flatnonzero(flat)[0])]}: zero variance; α is undefined")
    total = complete.sum(axis=1)
    alpha = k / (k - 1) * (1 - variances.sum() / total.var(ddof=1))
    df1, df2 = n - 1, (n - 1) * (k - 1)
    g = (1 - level) / 2
    low = 1 - (1 - alpha) * special.fdtri(df1, df2, 1 - g)  # the F quantiles (scipy.stats.f.ppf computes these)
    high = 1 - (1 - alpha) * special.fdtri(df1, df2, g)
    details: dict[str, object] = {"k_items": k}
    for j, item in enumerate(items):
        details[f"item_total_r.{item}"] = float(np.corrcoef(complete[:, j], total - complete[:, j])[0, 1])
    dropped = len(values) - n
    notes = [Note("method", "α CI by Feldt (1965); corrected item–total r per item in details.")]
    if reverse:
        notes.append(Note("method", f"Reverse-keyed: {', '.join(map(str, reverse))} (x → {minimum:g} + {maximum:g} − x)."))
    if dropped:
        notes.append(Note("missing", f"{dropped} of {len(values)} rows dropped for missing items (listwise)."))
    from ..records import Variable

    return Result(
        kind="cronbach_alpha",
        n=n,
        effects=(EffectSize("alpha", float(alpha), Interval(level, float(low), float(min(high, 1.0))), method="Feldt (1965)"),),
        variables=(Variable(scale, (labels or {}).get(scale, scale), "scale"),)
        + tuple(Variable(i, (labels or {}).get(i, i), "item") for i in items),
        notes=tuple(notes),
        details=details,
        provenance=c.provenance("statsetter.analyses.cronbach_alpha"),
    )


