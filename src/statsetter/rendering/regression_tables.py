"""Regressions as coefficient tables (docs/reporting-rules.md "Tables" and
"Regression"). One model: a row per coefficient, the intercept first, with
B, SE, the CI of B (or of the odds ratio) under a spanner, β (linear) or OR
(logistic), t or z, and p. Several models (the steps of a hierarchical
regression, or several regressions of one outcome): the models side by side
under spanners, with their fit (R², adjusted R², ΔR², ΔF, or χ² and
pseudo-R²) and N in rows at the bottom. A nominal predictor is a heading
row with its categories indented under it and the reference marked "(ref.)".
Like values get like decimals: a column shows every value with the decimals
its smallest non-zero value needs."""

from __future__ import annotations

from dataclasses import dataclass, field
from typing import Sequence

from ..errors import InputError
from ..records import Result, table_label
from ..style.numbers import Numbers, numbers_for
from ..style.profile import Style, load_style
from ..styled import StyledText
from .record_tables import interval_cell, p_cell
from .sentences import render
from .tables import Column, Row, Spanner, TableModel

_LINEAR = ("linear_model", "linear_coefficient", "linear_step")
_LOGISTIC = ("logistic_model", "logistic_coefficient")


@dataclass
class _Model:
    model: Result | None = None
    change: Result | None = None
    coefficients: dict[tuple[str, str | None], Result] = field(default_factory=dict)


def _key(r: Result) -> tuple[str, str | None]:
    """A coefficient's row: ("", None) for the intercept, else its predictor
    and category."""
    if r.details.get("intercept") or str(r.details.get("term", "")).lower() in ("intercept", "const"):
        return ("", None)
    predictor = r.variable("predictor")
    name = predictor.name if predictor is not None else str(r.details.get("term", ""))
    category = r.details.get("category")
    return (name, None if category is None else str(category))


def _models(records: Sequence[Result]) -> list[_Model]:
    """The records grouped by model: by analysis (id before the colon) and step."""
    groups: dict[tuple[str, object], _Model] = {}
    for r in records:
        group = groups.setdefault(((r.id or "").split(":", 1)[0], r.details.get("step")), _Model())
        if r.kind.endswith("_coefficient"):
            group.coefficients[_key(r)] = r
        elif r.kind == "linear_step":
            group.change = r
        else:
            group.model = r
    analyses = list(dict.fromkeys(analysis for analysis, _ in groups))  # in the order given; a hierarchy's steps in step order
    ordered = sorted(groups, key=lambda k: (analyses.index(k[0]), k[1] if isinstance(k[1], int) else 0))
    return [groups[k] for k in ordered if groups[k].coefficients]


def _column_decimals(num: Numbers, values: list[float], quantity: str) -> int:
    """One column, one number of decimals: enough for its smallest non-zero value."""
    return max((num.shown_decimals(v, quantity) for v in values), default=num.decimals_for(quantity))


def regression_table(
    records: Sequence[Result], style: "Style | str | None" = None, *, title: str | None = None, number: int | None = None
) -> TableModel:
    """The records of one or more linear (or logistic) regressions of one outcome."""
    resolved = load_style(style)
    num = numbers_for(resolved)
    kinds = {r.kind for r in records}
    linear = kinds <= set(_LINEAR)
    if not (linear or kinds <= set(_LOGISTIC)) or not kinds & {"linear_coefficient", "logistic_coefficient"}:
        raise InputError("regression table: give the records of linear or of logistic regressions (their coefficients, and their models)")
    models = _models(records)
    outcomes = {v.name for m in models for r in m.coefficients.values() for v in r.variables if v.role == "outcome"}
    if len(outcomes) > 1:
        raise InputError(f"regression table: the records hold regressions of {len(outcomes)} outcomes ({', '.join(sorted(outcomes))}); give those of one")
    show_intercept = bool(resolved.tables.get("intercept", True))
    rows_of = _row_order(models, show_intercept)
    nb = resolved.keep_together
    outcome = next(iter(models[0].coefficients.values())).variable("outcome")
    if len(models) == 1:
        table = _one_model(models[0], rows_of, num, resolved, linear)
    else:
        table = _side_by_side(models, rows_of, num, resolved, linear)
    columns, rows, spanners, note = table
    if any(r.stub.text.endswith("(ref.)") for r in rows):
        note = note + f" ref.{nb}={nb}reference category."
    default = f"{'Linear' if linear else 'Logistic'} Regression{' Models' if len(models) > 1 else ''} of {outcome.display if outcome else 'the Outcome'}"
    return TableModel(
        title=StyledText(title or default),
        columns=tuple(columns),
        rows=tuple(rows),
        stub_head=StyledText("Predictor"),
        number=number,
        spanners=tuple(spanners),
        general_note=note,
    )


def _row_order(models: list[_Model], intercept: bool) -> list[tuple[str, str | None]]:
    """Every coefficient's row key in order of first appearance, the intercept first."""
    keys: list[tuple[str, str | None]] = []
    for m in models:
        for k in m.coefficients:
            if k not in keys:
                keys.append(k)
    keys.sort(key=lambda k: k != ("", None))
    return keys if intercept else [k for k in keys if k != ("", None)]


def _stubs(keys: list[tuple[str, str | None]], models: list[_Model]) -> list[tuple[tuple[str, str | None] | None, Row]]:
    """The stub of each row: a nominal predictor's heading row, its reference
    category "(ref.)" and its categories indented; (key, row) with key None
    for rows that hold no coefficient."""
    def any_record(k: tuple[str, str | None]) -> Result:
        return next(m.coefficients[k] for m in models if k in m.coefficients)

    out: list[tuple[tuple[str, str | None] | None, Row]] = []
    headed: set[str] = set()
    for k in keys:
        r = any_record(k)
        if k == ("", None):
            out.append((k, Row(StyledText("Intercept"))))
            continue
        if k[1] is None:
            v = r.variable("predictor")
            out.append((k, Row(StyledText(table_label(v.heading if v else k[0])))))
            continue
        if k[0] not in headed:
            headed.add(k[0])
            named = [v for m in models if m.model is not None for v in m.model.variables if v.role == "predictor" and v.name == k[0]]
            label = named[0].heading if named else str(r.details.get("reference", k[0])).split(" = ")[0]
            out.append((None, Row(StyledText(table_label(label)), heading=True)))
            ref = r.details.get("reference_category")
            if ref is not None:
                out.append(((k[0], "\0ref"), Row(StyledText(f"{ref} (ref.)"), indent=1)))
        out.append((k, Row(StyledText(k[1]), indent=1)))
    return out


def _one_model(m: _Model, keys, num: Numbers, style: Style, linear: bool):  # type: ignore[no-untyped-def]
    found = list(m.coefficients.values())
    level = next((r.estimate.ci.level for r in found if r.estimate is not None and r.estimate.ci is not None), 0.95)
    b_dec = _column_decimals(num, [r.estimate.value for r in found if r.estimate is not None], "B")
    se_dec = _column_decimals(num, [r.estimate.se for r in found if r.estimate is not None and r.estimate.se is not None], "SE")
    columns = [Column(_head(style, "B")), Column(_head(style, "SE"))] + ([] if linear else [Column(_head(style, "OR"))])
    columns += [Column(StyledText("LL")), Column(StyledText("UL"))] + ([Column(_head(style, "beta"))] if linear else [])
    columns += [Column(_head(style, "t" if linear else "z")), Column(_head(style, "p"))]
    first_ci = 2 if linear else 3
    rows = []
    for k, stub in _stubs(keys, [m]):
        r = m.coefficients.get(k) if k is not None else None
        if r is None:
            cells = (StyledText("—"),) + (StyledText(),) * (len(columns) - 1) if k is not None else ()
            rows.append(Row(stub.stub, cells, stub.indent, stub.heading))
            continue
        e = r.estimate
        cells = [_number(num, e.value if e else None, "B", b_dec), _number(num, e.se if e else None, "SE", se_dec)]
        if linear:
            interval, quantity, null, decimals = (e.ci if e else None), "B", 0.0, b_dec
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
        cells += [_number(num, s.value if s else None, s.symbol if s else "t"), p_cell(num, r)]
        rows.append(Row(stub.stub, tuple(cells), stub.indent))
    nb = style.keep_together
    model = m.model
    note = StyledText.from_markup(f"{style.symbol('N')}{nb}={nb}{num.integer(model.n)}. ") if model is not None and model.n else StyledText()
    note = note + f"CI{nb}={nb}confidence interval; LL{nb}={nb}lower limit; UL{nb}={nb}upper limit."
    if not linear:
        note = note + f" OR{nb}={nb}odds ratio."
    if model is not None:
        note = note + " Model: " + render(model, "stats", style) + "."
    ci_head = f"{level * 100:g}% CI" + ("" if linear else " for OR")
    return columns, rows, [Spanner(StyledText(ci_head), first_ci, first_ci + 2)], note


def _head(style: Style, symbol: str) -> StyledText:
    return StyledText.from_markup(style.symbol(symbol))


def _side_by_side(models: list[_Model], keys, num: Numbers, style: Style, linear: bool):  # type: ignore[no-untyped-def]
    nb = style.keep_together
    found = [r for m in models for r in m.coefficients.values()]
    level = next((r.estimate.ci.level for r in found if r.estimate is not None and r.estimate.ci is not None), 0.95)
    pct = f"{level * 100:g}% CI"
    per = [_head(style, "B"), StyledText(pct), _head(style, "beta"), _head(style, "p")] if linear else [_head(style, "B"), _head(style, "OR"), StyledText(pct), _head(style, "p")]
    width = len(per)
    columns = [Column(h) for _ in models for h in per]
    spanners = [Spanner(StyledText(f"Model {m.model.details.get('step', i + 1) if m.model is not None else i + 1}"), i * width, (i + 1) * width)
                for i, m in enumerate(models)]
    b_dec = [_column_decimals(num, [r.estimate.value for r in m.coefficients.values() if r.estimate is not None], "B") for m in models]
    rows = []
    for k, stub in _stubs(keys, models):
        if k is None:
            rows.append(stub)
            continue
        cells: list[StyledText] = []
        for m, dec in zip(models, b_dec):
            r = m.coefficients.get(k)
            if k[1] == "\0ref":
                cells += [StyledText("—" if any(key[0] == k[0] for key in m.coefficients) else "")] + [StyledText()] * (width - 1)
                continue
            if r is None or r.estimate is None:
                cells += [StyledText()] * width
                continue
            e = r.estimate
            if linear:
                beta = r.effect("beta")
                ci = e.ci
                cells += [_number(num, e.value, "B", dec), interval_cell(num, style, ci, "B", 0.0, dec), _number(num, beta.value if beta else None, "beta"), p_cell(num, r)]
            else:
                odds = r.effect("OR")
                cells += [_number(num, e.value, "B", dec), _number(num, odds.value if odds else None, "OR"),
                          interval_cell(num, style, odds.ci if odds else None, "OR", 1.0), p_cell(num, r)]
        rows.append(Row(stub.stub, tuple(cells), stub.indent))
    rows += _fit_rows(models, num, style, linear, width)
    note = StyledText(f"CI{nb}={nb}confidence interval" + ("." if linear else f" of the odds ratio; OR{nb}={nb}odds ratio."))
    if linear and any(m.change is not None for m in models):
        note = note + StyledText.from_markup(f" {style.symbol('F_change')} has its degrees of freedom in parentheses and its {style.symbol('p')} in the model's {style.symbol('p')} column.")
    return columns, rows, spanners, note


def _fit_rows(models: list[_Model], num: Numbers, style: Style, linear: bool, width: int) -> list[Row]:
    """R², adjusted R², ΔR², ΔF (df) and N, or χ² (df), pseudo-R² and N,
    in each model's first column (ΔF's p in the model's p column)."""
    def row(label: str, value_of) -> Row | None:  # type: ignore[no-untyped-def]
        cells: list[StyledText] = []
        shown = False
        for m in models:
            value, p = value_of(m)
            shown = shown or value is not None
            block = [StyledText(value or "")] + [StyledText()] * (width - 1)
            if p is not None:
                block[-1] = p
            cells += block
        return Row(StyledText.from_markup(label), tuple(cells)) if shown else None

    def effect(m: _Model, name: str, record: str = "model"):  # type: ignore[no-untyped-def]
        r = getattr(m, record)
        e = r.effect(name) if r is not None else None
        return (num.number(e.value, name) if e is not None else None), None

    def change(m: _Model):  # type: ignore[no-untyped-def]
        r = m.change
        if r is None or r.statistic is None:
            return None, None
        return f"{num.number(r.statistic.value, 'F')} ({', '.join(num.df(d) for d in r.statistic.df)})", p_cell(num, r)

    def chi2(m: _Model):  # type: ignore[no-untyped-def]
        r = m.model
        if r is None or r.statistic is None:
            return None, None
        return f"{num.number(r.statistic.value, 'chi2')} ({', '.join(num.df(d) for d in r.statistic.df)})", p_cell(num, r)

    def n(m: _Model):  # type: ignore[no-untyped-def]
        return (num.integer(m.model.n) if m.model is not None and m.model.n else None), None

    pseudo = f"R2_{style.wording.get('pseudo_r2', 'nagelkerke')}"
    if linear:
        made = [row(style.symbol("R2"), lambda m: effect(m, "R2")), row(style.symbol("R2_adj")[:1].upper() + style.symbol("R2_adj")[1:], lambda m: effect(m, "R2_adj")),
                row(style.symbol("delta_R2"), lambda m: effect(m, "delta_R2", "change")), row(style.symbol("F_change") + " (<i>df</i>)", change)]
    else:
        made = [row(style.symbol("chi2") + " (<i>df</i>)", chi2), row(style.symbol(pseudo), lambda m: effect(m, pseudo))]
    made.append(row(style.symbol("N"), n))
    return [r for r in made if r is not None]


def _number(num: Numbers, value: float | None, quantity: str, decimals: int | None = None) -> StyledText:
    return StyledText(num.number(value, quantity, decimals)) if value is not None else StyledText()
