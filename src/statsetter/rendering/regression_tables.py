"""A regression as a coefficients table (docs/reporting-rules.md "Tables" and
"Regression"): one row per predictor with B, SE, the CI of B (or of the odds
ratio) under a spanner, β (linear) or OR (logistic), t or z, and p; the
model's fit, the N and the reference categories in the note."""

from __future__ import annotations

from typing import Sequence

from ..errors import InputError
from ..records import Result
from ..style.numbers import numbers_for
from ..style.profile import Style, load_style
from .record_tables import p_cell
from .sentences import render
from ..styled import StyledText
from .tables import Column, Row, Spanner, TableModel

_LINEAR = ("linear_model", "linear_coefficient")
_LOGISTIC = ("logistic_model", "logistic_coefficient")


def regression_table(
    records: Sequence[Result], style: "Style | str | None" = None, *, title: str | None = None, number: int | None = None
) -> TableModel:
    """The coefficient records of one linear or logistic regression (the
    model record, when given, goes into the note)."""
    resolved = load_style(style)
    num = numbers_for(resolved)
    kinds = {r.kind for r in records}
    linear = kinds <= set(_LINEAR)
    if not (linear or kinds <= set(_LOGISTIC)) or not kinds & {"linear_coefficient", "logistic_coefficient"}:
        raise InputError("regression table: give the records of one linear or one logistic regression (its coefficients, and its model)")
    coefficients = [r for r in records if r.kind.endswith("_coefficient")]
    models = [r for r in records if r.kind.endswith("_model")]
    outcomes = {v.name for r in coefficients for v in r.variables if v.role == "outcome"}
    if len(models) > 1 or len(outcomes) > 1:
        raise InputError(f"regression table: the records hold {max(len(models), len(outcomes))} regressions; give the records of one")
    model = models[0] if models else None

    def head(symbol: str) -> StyledText:
        return StyledText.from_markup(resolved.symbol(symbol))

    level = next((r.estimate.ci.level for r in coefficients if r.estimate is not None and r.estimate.ci is not None), 0.95)
    ci_head = f"{level * 100:g}% CI" + ("" if linear else " for OR")
    columns = [Column(head("B")), Column(head("SE"))]
    if not linear:
        columns.append(Column(head("OR")))
    columns += [Column(StyledText("LL")), Column(StyledText("UL"))]
    if linear:
        columns.append(Column(head("beta")))
    columns += [Column(head("t" if linear else "z")), Column(head("p"))]
    first_ci = 2 if linear else 3

    rows = []
    references = []
    for r in coefficients:
        e = r.estimate
        predictor = r.variable("predictor")
        cells = [_number(num, e.value if e else None, "B"), _number(num, e.se if e else None, "SE")]
        if linear:
            interval, quantity, null = (e.ci if e else None), "B", 0.0
            decimals = num.shown_decimals(e.value, "B") if e else None
        else:
            odds = r.effect("OR")
            cells.append(_number(num, odds.value if odds else None, "OR"))
            interval, quantity, null, decimals = (odds.ci if odds else None), "OR", 1.0, None
        if interval is not None:
            low, high = num.interval(interval.low, interval.high, quantity, null, decimals=decimals)
            cells += [StyledText(low), StyledText(high)]
        else:
            cells += [StyledText(), StyledText()]
        if linear:
            beta = r.effect("beta")
            cells.append(_number(num, beta.value if beta else None, "beta"))
        s = r.statistic
        cells.append(_number(num, s.value if s else None, s.symbol if s else "t"))
        cells.append(p_cell(num, r))
        rows.append(Row(StyledText(predictor.heading if predictor else str(r.details.get("term", ""))), tuple(cells)))
        ref = r.details.get("reference")
        if ref and ref not in references:
            references.append(ref)

    nb = resolved.keep_together
    note = StyledText.from_markup(f"{resolved.symbol('N')}{nb}={nb}{num.integer(model.n)}. ") if model is not None and model.n else StyledText()
    note = note + f"CI{nb}={nb}confidence interval; LL{nb}={nb}lower limit; UL{nb}={nb}upper limit."
    if not linear:
        note = note + f" OR{nb}={nb}odds ratio."
    if references:
        note = note + " Reference categories: " + "; ".join(references) + "."
    if model is not None:
        note = note + " Model: " + render(model, "stats", resolved) + "."
    outcome = coefficients[0].variable("outcome")
    default = f"{'Linear' if linear else 'Logistic'} Regression of {outcome.display if outcome else 'the Outcome'}"
    return TableModel(
        title=StyledText(title or default),
        columns=tuple(columns),
        rows=tuple(rows),
        stub_head=StyledText("Predictor"),
        number=number,
        spanners=(Spanner(StyledText(ci_head), first_ci, first_ci + 2),),
        general_note=note,
    )


def _number(num, value: float | None, quantity: str) -> StyledText:  # type: ignore[no-untyped-def]
    return StyledText(num.number(value, quantity)) if value is not None else StyledText()
