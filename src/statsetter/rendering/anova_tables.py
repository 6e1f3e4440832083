"""An analysis of variance as a source table (docs/reporting-rules.md "Tables"
and "ANOVA"): a row per source (each term of a factorial ANOVA, or the group
factor of a one-way ANOVA) with SS, df, MS, F, p and the effect size with its
CI, then Error and Total rows. SS and MS columns appear when the records carry
the sums of squares (``details.ss``, ``details.ss_error``). A Welch ANOVA has
its own form: F with both df, p, and η² from the classic decomposition."""

from __future__ import annotations

from typing import Sequence

from ..errors import InputError
from ..records import Result, table_label
from ..style.numbers import Numbers, numbers_for
from ..style.profile import Style, load_style
from ..styled import StyledText
from .record_tables import interval_cell, p_cell
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
    strata = _strata(records)
    if len(outcomes) > 1 or (len(errors) > 1 and strata is None):
        raise InputError("ANOVA table: the records hold more than one ANOVA; give the records of one")
    effect_name = "eta2_p" if kinds == {"anova_term"} else "eta2"
    welch = records[0].details.get("variant") == "welch"

    def head(symbol: str) -> StyledText:
        return StyledText.from_markup(resolved.symbol(symbol))

    sums = not welch and all(isinstance(r.details.get("ss"), (int, float)) and isinstance(r.details.get("ss_error"), (int, float)) for r in records)
    level = next((e.ci.level for r in records for e in r.effects if e.name == effect_name and e.ci is not None), None)
    if welch:
        columns = [Column(head("F")), Column(StyledText.from_markup(resolved.symbol("df") + "<sub>1</sub>")),
                   Column(StyledText.from_markup(resolved.symbol("df") + "<sub>2</sub>")), Column(head("p")), Column(head(effect_name))]
    else:
        columns = ([Column(head("SS"))] if sums else []) + [Column(head("df"))] + ([Column(head("MS"))] if sums else []) \
            + [Column(head("F")), Column(head("p")), Column(head(effect_name))]
    if level is not None:
        columns.append(Column(StyledText(f"{level * 100:g}% CI")))
    ss_dec = _decimals(num, [v for r in records for v in (r.details.get("ss"), r.details.get("ss_error")) if isinstance(v, (int, float))]) if sums else 0

    nb = resolved.keep_together
    rows = []
    last_of = {id(group[-1]): group for group in (strata or [])}
    for r in records:
        s = r.statistic
        source = _source(r)
        effect = r.effect(effect_name)
        f = StyledText(num.number(s.value, "F") if s is not None else "")
        if welch:
            cells = [f, StyledText(num.df(s.df[0]) if s is not None else ""), StyledText(num.df(s.df[1]) if s is not None and len(s.df) > 1 else "")]
        else:
            df1 = s.df[0] if s is not None else None
            cells = ([_ss(num, r.details["ss"], ss_dec)] if sums else []) + [StyledText(num.df(df1) if df1 is not None else "")]
            cells += [_ss(num, r.details["ss"] / df1, ss_dec)] if sums and df1 else ([StyledText()] if sums else [])
            cells.append(f)
        cells += [p_cell(num, r), StyledText(num.number(effect.value, effect_name) if effect is not None else "")]
        if level is not None:
            cells.append(interval_cell(num, resolved, effect.ci if effect is not None else None, effect_name))
        rows.append(Row(StyledText(str(source)), tuple(cells)))
        if id(r) in last_of:  # a repeated-measures or mixed design: each error term after its effects
            group = last_of[id(r)]
            ss_error, df_error = float(r.details["ss_error"]), r.statistic.df[1] if r.statistic is not None else 1.0
            label = "Error (between subjects)" if group[0].details.get("epsilon") is None else "Error (" + " + ".join(_source(g) for g in group) + ")" \
                if len(strata or []) > 2 else "Error (within subjects)"
            rows.append(Row(StyledText(label), (_ss(num, ss_error, ss_dec), StyledText(num.df(df_error)), _ss(num, ss_error / df_error, ss_dec),
                                                *([StyledText()] * (len(columns) - 3)))))
    blank = [StyledText()] * (len(columns) - 3)
    total_note = ""
    if strata is not None:
        errors = set()
        corrected = [r for r in records if isinstance(r.details.get("epsilon"), (int, float)) and float(r.details["epsilon"]) < 1]
        if corrected:
            total_note = " Within-subjects " + "; ".join(dict.fromkeys(
                f"{_source(r)}: {r.details.get('correction', 'sphericity correction')}, ε{nb}={nb}{num.number(float(r.details['epsilon']), 'epsilon')}"
                for r in corrected)) + " (df, MS and p corrected)."
    if errors and not welch:
        df_error = errors.pop()
        if sums:
            ss_error = float(records[0].details["ss_error"])
            rows.append(Row(StyledText("Error"), (_ss(num, ss_error, ss_dec), StyledText(num.df(df_error)), _ss(num, ss_error / df_error, ss_dec), *blank)))
            parts = sum(float(r.details["ss"]) for r in records) + ss_error  # the rows' sums of squares
            given = records[0].details.get("ss_total")
            ss_total = float(given) if isinstance(given, (int, float)) else parts
            n = records[0].n
            df_total = n - 1 if n else df_error + sum(r.statistic.df[0] for r in records if r.statistic is not None)
            rows.append(Row(StyledText("Total"), (_ss(num, ss_total, ss_dec), StyledText(num.df(df_total)), StyledText(), *blank)))
            if abs(parts - ss_total) > 1e-9 * max(abs(ss_total), 1):
                total_note = (" The sums of squares of the rows do not add up to the total: with unequal cell sizes, "
                              f"Type {'II' if records[0].details.get('ss_type') == 2 else 'III'} sums of squares are not a partition of it.")
        else:
            rows.append(Row(StyledText("Error"), (StyledText(num.df(df_error)), *([StyledText()] * (len(columns) - 1)))))
    outcome = records[0].variable("outcome")
    method = next((n.text for n in records[0].notes if n.kind == "method"), "")
    n = records[0].n
    note = (StyledText.from_markup(f"{resolved.symbol('N')}{nb}={nb}{num.integer(n)}. ") if n else StyledText()) + (f"{method} " if method else "")
    note = note + f"Outcome: {outcome.heading if outcome else 'the outcome'}."
    if level is not None:
        note = note + StyledText.from_markup(f" CI{nb}={nb}confidence interval of {resolved.symbol(effect_name)}, by inverting the noncentral <i>F</i> distribution (Steiger, 2004).")
    if welch:
        note = note + StyledText.from_markup(f" {resolved.symbol(effect_name)} is from the classic decomposition of the sums of squares.")
    note = note + total_note
    return TableModel(
        title=StyledText(title or f"Analysis of Variance of {outcome.display if outcome else 'the Outcome'}"),
        columns=tuple(columns),
        rows=tuple(rows),
        stub_head=StyledText("Source"),
        number=number,
        general_note=note,
    )


def _source(r: Result) -> str:
    """A row's stub: the factor's table label, "A × B" for an interaction."""
    if r.kind == "anova_oneway":
        group = r.variable("group")
        return table_label(group.heading) if group else "Groups"
    term = str(r.details.get("term", ""))
    factors = [v for v in r.variables if v.role == "factor"]
    if r.details.get("interaction") and factors:
        return table_label(" × ".join(v.heading for v in factors))
    return table_label(next((v.heading for v in factors if term in (v.display, v.label, v.name)), term))


def _strata(records: Sequence[Result]) -> "list[list[Result]] | None":
    """The terms of a repeated-measures or mixed design grouped by their error
    term (consecutive terms with one SS and df of error); None for one error."""
    if not all(isinstance(r.details.get("ss_error"), (int, float)) and r.statistic is not None and len(r.statistic.df) == 2 for r in records):
        return None
    groups: list[list[Result]] = []
    for r in records:
        key = (round(float(r.details["ss_error"]), 9), r.statistic.df[1])  # type: ignore[union-attr]
        if groups and (round(float(groups[-1][0].details["ss_error"]), 9), groups[-1][0].statistic.df[1]) == key:  # type: ignore[union-attr]
            groups[-1].append(r)
        else:
            groups.append([r])
    return groups if len(groups) > 1 else None


def _decimals(num: Numbers, values: list[float]) -> int:
    """Sums of squares share one number of decimals: the style's, or enough for the smallest."""
    return max((num.shown_decimals(v, "SS") for v in values), default=num.decimals_for("SS"))


def _ss(num: Numbers, value: float, decimals: int) -> StyledText:
    return StyledText(num.number(value, "SS", decimals))


