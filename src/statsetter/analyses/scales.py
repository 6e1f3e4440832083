"""Scale scores from items (with reverse-keyed items) and Cronbach's α."""

from __future__ import annotations


from typing import TYPE_CHECKING, Literal, Mapping, Sequence

from ..errors import InputError
from ..records import EffectSize, Interval, Note, Result
from . import _common as c

if TYPE_CHECKING:
    import pandas as pd


def _items(df: "pd.DataFrame", items: Sequence[str], reverse: Sequence[str], minimum: float | None, maximum: float | None):  # type: ignore[no-untyped-def]
    if len(items) < 2:
        raise InputError(f"items: {len(items)} item(s); a scale needs at least two")
    unknown = [r for r in reverse if r not in items]
    if unknown:
        raise InputError(f"reverse: {', '.join(unknown)} not among the items")
    frame = df[[c.numeric(df, i).name for i in items]].astype(float).copy()
    if reverse:
        if minimum is None or maximum is None:
            raise InputError("reverse-keyed items need the item minimum and maximum")
        for name in reverse:
            col = frame[name]
            outside = col[(col < minimum) | (col > maximum)]
            if len(outside):
                raise InputError(f"{name}: value {outside.iloc[0]:g} is outside the item range {minimum:g}–{maximum:g}")
            frame[name] = minimum + maximum - col
    return frame


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
    if scoring not in ("mean", "sum"):
        raise InputError(f"scoring: {scoring!r} is not mean or sum")
    if min_share is not None and not (isinstance(min_share, (int, float)) and 0 < min_share <= 1):
        raise InputError(f"min_share: {min_share!r} is not a share between 0 and 1 (0.8 for 80% of the items)")
    frame = _items(df, items, reverse, minimum, maximum)
    present = frame.notna().sum(axis=1)
    enough = present == len(items) if min_share is None else present >= min_share * len(items) - 1e-9
    mean = frame.mean(axis=1)
    score = mean if scoring == "mean" else mean * len(items)
    return score.where(enough & (present > 0))


def scoring_note(df: "pd.DataFrame", items: Sequence[str], name: str, min_share: float | None = None) -> str:
    """What the missing-item rule did: how many rows lost their score, how many were prorated."""
    present = df[list(items)].notna().sum(axis=1)
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
    from scipy import stats

    frame = _items(df, items, reverse, minimum, maximum)
    complete = frame.dropna()
    n, k = complete.shape
    if n < 3:
        raise InputError(f"items: {n} complete row(s); α needs at least 3")
    variances = complete.var(ddof=1)
    if (variances == 0).any():
        raise InputError(f"{variances[variances == 0].index[0]}: zero variance; α is undefined")
    total = complete.sum(axis=1)
    alpha = k / (k - 1) * (1 - variances.sum() / total.var(ddof=1))
    df1, df2 = n - 1, (n - 1) * (k - 1)
    g = (1 - level) / 2
    low = 1 - (1 - alpha) * stats.f.ppf(1 - g, df1, df2)
    high = 1 - (1 - alpha) * stats.f.ppf(g, df1, df2)
    details: dict[str, object] = {"k_items": k}
    for item in complete.columns:
        rest = total - complete[item]
        details[f"item_total_r.{item}"] = float(complete[item].corr(rest))
    dropped = len(frame) - n
    notes = [Note("method", "α CI by Feldt (1965); corrected item–total r per item in details.")]
    if reverse:
        notes.append(Note("method", f"Reverse-keyed: {', '.join(reverse)} (x → {minimum:g} + {maximum:g} − x)."))
    if dropped:
        notes.append(Note("missing", f"{dropped} of {len(frame)} rows dropped for missing items (listwise)."))
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


