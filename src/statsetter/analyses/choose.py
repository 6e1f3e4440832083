"""Choosing the test from the variables' levels of measurement (``auto``)."""

from __future__ import annotations

from dataclasses import replace
from typing import TYPE_CHECKING, Mapping

from ..errors import InputError
from ..levels import check_level, infer_level
from ..records import Note, Result

if TYPE_CHECKING:
    import pandas as pd

def level_of(series: "pd.Series", declared: str | None = None) -> tuple[str, str]:
    """(level, reason): the declared level, a pandas categorical's, or an inference."""
    if declared is not None:
        return check_level(str(series.name), declared), "declared"
    found = infer_level(series)
    return found.level, found.reason + (" (a weak guess: declare it)" if found.weak else "")


def analyse(
    df: "pd.DataFrame",
    outcome: str,
    predictor: str,
    *,
    levels: Mapping[str, str] | None = None,
    labels: Mapping[str, str] | None = None,
) -> list[Result]:
    """Pick and run the test for ``outcome`` by ``predictor``; each record
    carries a note saying what was chosen and why."""
    from . import _common as c
    from .anova import anova_oneway
    from .chisquare import chi_square
    from .correlation import correlate
    from .ranks import kruskal_wallis, mann_whitney
    from .ttests import t_independent

    from ..levels import identifier_reason

    levels = levels or {}
    for name in (outcome, predictor):
        why = None if name in levels else identifier_reason(c.column(df, name), (labels or {}).get(name))
        if why:
            raise InputError(f"{name}: {why}; no automatic test for a case identifier (declare its level to use it)")
    lo, why_o = level_of(c.column(df, outcome), levels.get(outcome))
    lp, why_p = level_of(c.column(df, predictor), levels.get(predictor))
    continuous = ("interval", "ratio")
    k = c.column(df, predictor).dropna().nunique()
    if lo == "nominal" and lp == "nominal":
        records, test = chi_square(df, predictor, outcome, labels=labels), "chi-square test of independence"
    elif lo in continuous and lp in continuous:
        records, test = [correlate(df, predictor, outcome, labels=labels)], "Pearson correlation"
    elif lp == "nominal" and lo in continuous:
        if k == 2:
            records, test = [t_independent(df, outcome, predictor, labels=labels)], "Welch's t test (two groups)"
        else:
            records, test = [anova_oneway(df, outcome, predictor, labels=labels)], f"one-way ANOVA ({k} groups)"
    elif lp == "nominal" and lo == "ordinal":
        if k == 2:
            records, test = [mann_whitney(df, outcome, predictor, labels=labels)], "Mann–Whitney test (ordinal outcome, two groups)"
        else:
            records, test = [kruskal_wallis(df, outcome, predictor, labels=labels)], f"Kruskal–Wallis test (ordinal outcome, {k} groups)"
    elif "nominal" not in (lo, lp):
        records, test = [correlate(df, predictor, outcome, coefficient="spearman", labels=labels)], "Spearman correlation (ordinal variable involved)"
    else:
        raise InputError(f"{outcome} ({lo}) by {predictor} ({lp}): no automatic test; name the test instead")
    note = Note("choice", f"Chosen automatically: {test}, because {outcome} is {lo} ({why_o}) and {predictor} is {lp} ({why_p}).")
    return [replace(r, notes=(note,) + r.notes) for r in records]
