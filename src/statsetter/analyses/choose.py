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
    subject: str | None = None,
    levels: Mapping[str, str] | None = None,
    labels: Mapping[str, str] | None = None,
) -> list[Result]:
    """Pick and run the test for ``outcome`` by ``predictor``; each record
    carries a note saying what was chosen and why.

    With ``subject`` (long data: a row per person and condition, the person
    in ``subject``) ``predictor`` is a within-subjects factor and the test
    is for related samples: a numeric outcome gets the paired t test (two
    conditions) or the repeated-measures ANOVA; an ordinal one the Wilcoxon
    signed-rank or Friedman test; a binary one McNemar's test or Cochran's
    Q."""
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
    if subject is not None:
        records, test, why_p = _within(df, outcome, predictor, subject, lo, labels)
        note = Note("choice", f"Chosen automatically: {test}, because {outcome} is {lo} ({why_o}) and {predictor} is {why_p}.")
        return [replace(r, notes=(note,) + r.notes) for r in records]
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


def _within(df: "pd.DataFrame", outcome: str, within: str, subject: str, level: str,
            labels: Mapping[str, str] | None) -> tuple[list[Result], str, str]:
    """The related-samples test for ``outcome`` across the conditions in ``within``, each person in ``subject``."""
    from . import _common as c
    from .repeated import _wide, cochran_q, friedman, mcnemar, rm_anova
    from .ranks import wilcoxon_signed_rank
    from .ttests import t_paired

    c.column(df, subject)
    k = c.column(df, within).dropna().nunique()
    if k < 2:
        raise InputError(f"{within}: one condition; a within-subjects test needs at least two")
    why = f"a within-subjects factor with {k} conditions (each person in {subject} measured in each)"
    if level in ("interval", "ratio"):
        if k == 2:
            return [t_paired(df, outcome=outcome, subject=subject, within=within, labels=labels)], "paired t test (two conditions, same people)", why
        out = rm_anova(df, outcome=outcome, subject=subject, within=within, labels=labels)
        return (out if isinstance(out, list) else [out]), f"repeated-measures ANOVA ({k} conditions, same people)", why
    if level == "ordinal":
        if k == 2:
            return ([wilcoxon_signed_rank(df, outcome=outcome, subject=subject, within=within, labels=labels)],
                    "Wilcoxon signed-rank test (ordinal outcome, two conditions, same people)", why)
        wide, columns, _ = _wide(df, None, outcome, subject, within, "friedman")
        return [friedman(wide, columns, labels=labels)], f"Friedman test (ordinal outcome, {k} conditions, same people)", why
    categories = c.column(df, outcome).dropna().nunique()
    if categories != 2:
        raise InputError(f"{outcome}: nominal with {categories} categories across related samples; no automatic test "
                         "(McNemar's test and Cochran's Q need a binary outcome)")
    wide, columns, _ = _wide(df, None, outcome, subject, within, "mcnemar" if k == 2 else "cochran_q")
    if k == 2:
        return [mcnemar(wide, columns[0], columns[1], labels=labels)], "McNemar's test (binary outcome, two conditions, same people)", why
    return [cochran_q(wide, columns, labels=labels)], f"Cochran's Q test (binary outcome, {k} conditions, same people)", why
