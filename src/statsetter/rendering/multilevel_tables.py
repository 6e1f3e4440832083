"""Linear mixed models as tables (docs/reporting-rules.md "Multilevel
models"). One model: its fixed effects (estimate, SE, the CI under a
spanner, z, p; a nominal predictor as a heading row with its categories, as
in the regression table), then its random effects (the variances and
correlations of the random intercept and slopes, the residual variance, the
ICC of the intercept-only model) and its fit (log-likelihood, AIC, BIC,
observations and groups), each under a heading row, their values in the
estimate column. Nested models compared by likelihood-ratio tests: a row per
model with its log-likelihood, AIC and BIC, and the test against the model
before it."""

from __future__ import annotations

from typing import Sequence

from ..errors import InputError
from ..records import Result, table_label
from ..style.numbers import numbers_for
from ..style.profile import Style, load_style
from ..styled import StyledText
from .record_tables import p_cell
from .regression_tables import _column_decimals, _head, _key, _Model, _number, _row_order, _stubs
from .tables import Column, Row, Spanner, TableModel


def _random_rows(model: Result, num, style: Style, width: int) -> list[Row]:  # type: ignore[no-untyped-def]
    """Variance components, correlations and the ICC, each in the estimate column."""
    d = model.details
    blank = (StyledText(),) * (width - 1)

    def row(label: str, value: str) -> Row:
        return Row(StyledText.from_markup(label), (StyledText(value),) + blank, indent=1)

    out = [Row(StyledText("Random effects"), heading=True)]
    slopes = [k[len("variance_"):] for k in d if k.startswith("variance_") and k not in ("variance_intercept", "variance_residual")]
    shown = {v.name: v.heading for v in model.variables}
    if "variance_intercept" in d:
        out.append(row("Intercept variance", num.number(float(d["variance_intercept"]), "B")))  # type: ignore[arg-type]
    for s in slopes:
        name = shown.get(s, s)
        out.append(row(f"{table_label(name)} slope variance", num.number(float(d[f"variance_{s}"]), "B")))  # type: ignore[arg-type]
        if f"correlation_intercept_{s}" in d:
            out.append(row(f"Intercept–{name} slope correlation", num.number(float(d[f"correlation_intercept_{s}"]), "r")))  # type: ignore[arg-type]
    if "variance_residual" in d:
        out.append(row("Residual variance", num.number(float(d["variance_residual"]), "B")))  # type: ignore[arg-type]
    icc = model.effect("ICC")
    if icc is not None:
        out.append(row(f"{style.symbol('ICC')} (intercept-only model)", num.number(icc.value, "ICC")))
    return out


def _fit_rows(model: Result, num, width: int) -> list[Row]:  # type: ignore[no-untyped-def]
    d = model.details
    blank = (StyledText(),) * (width - 1)
    out = [Row(StyledText("Model fit"), heading=True)]
    for key, label in (("log_likelihood", "Log-likelihood"), ("aic", "AIC"), ("bic", "BIC")):
        if d.get(key) is not None:
            out.append(Row(StyledText(label), (StyledText(num.number(float(d[key]), "default")),) + blank, indent=1))  # type: ignore[arg-type]
    if model.n:
        out.append(Row(StyledText("Observations"), (StyledText(num.integer(model.n)),) + blank, indent=1))
    if d.get("groups"):
        out.append(Row(StyledText("Groups"), (StyledText(num.integer(int(d["groups"]))),) + blank, indent=1))  # type: ignore[call-overload]
    return out


def mixed_model_table(records: Sequence[Result], style: "Style | str | None" = None, *, title: str | None = None,
                      number: int | None = None) -> TableModel:
    """The records of one linear mixed model (`statsetter.analyses.mixed_model`)."""
    resolved = load_style(style)
    num = numbers_for(resolved)
    models = [r for r in records if r.kind == "mixed_model"]
    coefficients = [r for r in records if r.kind == "linear_coefficient"]
    if len(models) != 1 or len(models) + len(coefficients) != len(records):
        raise InputError("mixed model table: give the records of one mixed model (its model record and its fixed effects)")
    model = models[0]
    m = _Model(model=model, coefficients={_key(r): r for r in coefficients})
    nb = resolved.keep_together
    level = next((r.estimate.ci.level for r in coefficients if r.estimate is not None and r.estimate.ci is not None), 0.95)
    b_dec = _column_decimals(num, [r.estimate.value for r in coefficients if r.estimate is not None], "B")
    se_dec = _column_decimals(num, [r.estimate.se for r in coefficients if r.estimate is not None and r.estimate.se is not None], "SE")
    columns = [Column(StyledText("Estimate")), Column(_head(resolved, "SE")), Column(StyledText("LL")), Column(StyledText("UL")),
               Column(_head(resolved, "z")), Column(_head(resolved, "p"))]
    width = len(columns)
    rows = [Row(StyledText("Fixed effects"), heading=True)]
    for k, stub in _stubs(_row_order([m], bool(resolved.tables.get("intercept", True))), [m]):
        r = m.coefficients.get(k) if k is not None else None
        if r is None:
            cells = (StyledText("—"),) + (StyledText(),) * (width - 1) if k is not None else ()
            rows.append(Row(stub.stub, cells, stub.indent + 1, stub.heading))
            continue
        e = r.estimate
        cells = [_number(num, e.value if e else None, "B", b_dec), _number(num, e.se if e else None, "SE", se_dec)]
        if e is not None and e.ci is not None:
            low, high = num.interval(e.ci.low, e.ci.high, "B", 0.0, decimals=b_dec)
            cells += [StyledText(low), StyledText(high)]
        else:
            cells += [StyledText(), StyledText()]
        s = r.statistic
        cells += [_number(num, s.value if s else None, s.symbol if s else "z"), p_cell(num, r)]
        rows.append(Row(stub.stub, tuple(cells), stub.indent + 1))
    rows += _random_rows(model, num, resolved, width) + _fit_rows(model, num, width)
    method = model.details.get("method", "REML")
    note = StyledText.from_markup(f"Estimated by {'restricted maximum likelihood (REML)' if method == 'REML' else 'maximum likelihood (ML)'}; "
                                  f"fixed effects tested with {resolved.symbol('z')} (a normal approximation). CI{nb}={nb}confidence interval; "
                                  f"LL{nb}={nb}lower limit; UL{nb}={nb}upper limit; ICC{nb}={nb}intraclass correlation.")
    if any(r.stub.text.endswith("(ref.)") for r in rows):
        note = note + f" ref.{nb}={nb}reference category."
    outcome = model.variable("outcome")
    return TableModel(
        title=StyledText(title or f"Linear Mixed Model of {outcome.display if outcome else 'the Outcome'}"),
        columns=tuple(columns),
        rows=tuple(rows),
        stub_head=StyledText("Parameter"),
        number=number,
        spanners=(Spanner(StyledText(f"{level * 100:g}% CI"), 2, 4),),
        general_note=note,
    )


def comparison_table(records: Sequence[Result], style: "Style | str | None" = None, *, title: str | None = None,
                     number: int | None = None) -> TableModel:
    """Nested models compared by likelihood-ratio tests (`statsetter.analyses.compare_models`), in the order given: the
    first comparison's reduced model, then each full model with its test against the model before it."""
    resolved = load_style(style)
    num = numbers_for(resolved)
    if not records or any(r.kind != "model_comparison" for r in records):
        raise InputError("comparison table: give model_comparison records")
    columns = [Column(StyledText("Added")), Column(StyledText("Log-likelihood")), Column(StyledText("AIC")), Column(StyledText("BIC")),
               Column(_head(resolved, "chi2")), Column(_head(resolved, "df")), Column(_head(resolved, "p"))]
    rows: list[Row] = []
    count = 0

    def model_row(label: str, ll: float, aic: float, bic: float, test: Result | None) -> Row:
        added = ", ".join(table_label(v.heading) for v in test.variables if v.role == "predictor") if test else "—"
        cells = [StyledText(added or str(test.details.get("added", ""))), StyledText(num.number(ll, "default")),
                 StyledText(num.number(aic, "default")), StyledText(num.number(bic, "default"))]
        if test is not None and test.statistic is not None:
            cells += [StyledText(num.number(test.statistic.value, "chi2")), StyledText(num.df(test.statistic.df[0])), p_cell(num, test)]
        else:
            cells += [StyledText(), StyledText(), StyledText()]
        return Row(StyledText(label), tuple(cells))

    previous = None
    for r in records:
        d = r.details
        if previous is None or abs(float(previous) - float(d["log_likelihood_reduced"])) > 1e-9:  # type: ignore[arg-type]
            count += 1
            rows.append(model_row(f"Model {count}", float(d["log_likelihood_reduced"]), float(d["aic_reduced"]), float(d["bic_reduced"]), None))  # type: ignore[arg-type]
        count += 1
        rows.append(model_row(f"Model {count}", float(d["log_likelihood_full"]), float(d["aic_full"]), float(d["bic_full"]), r))  # type: ignore[arg-type]
        previous = d["log_likelihood_full"]
    nb = resolved.keep_together
    outcome = records[0].variable("outcome")
    note = StyledText.from_markup(f"Models fitted by maximum likelihood; each {resolved.symbol('chi2')} is the likelihood-ratio test against the model "
                                  f"above it. AIC{nb}={nb}Akaike information criterion; BIC{nb}={nb}Bayesian information criterion.")
    return TableModel(
        title=StyledText(title or f"Comparison of Nested Models of {outcome.display if outcome else 'the Outcome'}"),
        columns=tuple(columns),
        rows=tuple(rows),
        stub_head=StyledText("Model"),
        number=number,
        general_note=note,
    )
