"""An analysis of variance as a table (docs/reporting-rules.md "Tables" and
"ANOVA"): one row per source (each term of a factorial ANOVA, or the group
factor of a one-way ANOVA) with df, F, p and the effect size, the error df
in its own row, and the sums of squares and the outcome in the note."""

from __future__ import annotations

from typing import Sequence

from ..errors import InputError
from ..records import Result
from ..style.numbers import numbers_for
from ..style.profile import Style, load_style
from .record_tables import p_cell
from ..styled import StyledText
from .tables import Column, Row, TableModel


def anova_table(records: Sequence[Result], style: "Style | str | None" = None, *, title: str | None = None, number: int | None = None) -> TableModel:
    """The records of one factorial ANOVA (its terms) or one one-way ANOVA."""
    resolved = load_style(style)
    num = numbers_for(resolved)
    kinds = {r.kind for r in records}
    if not records or not (kinds == {"anova_term"} or (kinds == {"anova_oneway"} and len(records) == 1)):
        raise InputError("ANOVA table: give the terms of one factorial ANOVA or the record of one one-way ANOVA")
    errors = {r.statistic.df[1] for r in records if r.statistic is not None and len(r.statistic.df) == 2}
    outcomes = {v.name for r in records for v in r.variables if v.role == "outcome"}
    if len(errors) > 1 or len(outcomes) > 1:
        raise InputError("ANOVA table: the records hold more than one ANOVA; give the records of one")
    effect_name = "eta2_p" if kinds == {"anova_term"} else "eta2"

    def head(symbol: str) -> StyledText:
        return StyledText.from_markup(resolved.symbol(symbol))

    rows = []
    for r in records:
        s = r.statistic
        source = r.details.get("term") if r.kind == "anova_term" else (r.variable("group").heading if r.variable("group") else "Groups")
        effect = r.effect(effect_name)
        rows.append(Row(StyledText(str(source)), (
            StyledText(num.df(s.df[0]) if s is not None else ""),
            StyledText(num.number(s.value, "F") if s is not None else ""),
            p_cell(num, r),
            StyledText(num.number(effect.value, effect_name) if effect is not None else ""),
        )))
    if errors:
        rows.append(Row(StyledText("Error"), (StyledText(num.df(errors.pop())), StyledText(), StyledText(), StyledText())))
    outcome = records[0].variable("outcome")
    method = next((n.text for n in records[0].notes if n.kind == "method"), "")
    n = records[0].n
    nb = resolved.keep_together
    note = (StyledText.from_markup(f"{resolved.symbol('N')}{nb}={nb}{num.integer(n)}. ") if n else StyledText()) + (f"{method} " if method else "")
    note = note + f"Outcome: {outcome.heading if outcome else 'the outcome'}."
    return TableModel(
        title=StyledText(title or f"Analysis of Variance of {outcome.display if outcome else 'the Outcome'}"),
        columns=(Column(head("df")), Column(head("F")), Column(head("p")), Column(head(effect_name))),
        rows=tuple(rows),
        stub_head=StyledText("Source"),
        number=number,
        general_note=note,
    )
