"""A correlation matrix as a table (docs/reporting-rules.md "Tables", after
APA 7's sample correlation table): variables numbered in the stub, their M
and SD, numbers as column heads, the lower triangle only, an em dash on the
diagonal, asterisks for p by the style's thresholds with the probability
note, N in the note when no value is missing, else the range of n per pair."""

from __future__ import annotations

from typing import TYPE_CHECKING

from ..records import ADJUST_NAMES, Interval, table_label
from ..style.numbers import numbers_for
from ..style.profile import Style, load_style
from ..styled import StyledText
from .record_tables import interval_cell
from .tables import Column, Row, TableModel

if TYPE_CHECKING:
    from ..records import CorrelationMatrix


def correlation_table(
    m: "CorrelationMatrix", style: "Style | str | None" = None, *, title: str | None = None, number: int | None = None, means: bool = True,
    intervals: bool = False,
) -> TableModel:
    """Variables numbered in the stub, their M and SD (``means=False`` leaves
    them out, as does a matrix that has none), then one column per variable
    but the last (whose column would hold only its dash). ``intervals=True``
    puts each r's CI in brackets on a row of its own under it, as APA 7's
    sample correlation table does."""
    resolved = load_style(style)
    num = numbers_for(resolved)
    stars = sorted(resolved.p.get("table_stars", [0.05, 0.01, 0.001]), reverse=True)
    symbol = "r" if m.method == "pearson" else "rs"
    k = len(m.names)
    show = means and m.mean is not None and m.sd is not None
    rows = []
    for i, name in enumerate(m.names):
        cells = [StyledText(num.number(float(m.mean[i]), "M")), StyledText(num.number(float(m.sd[i]), "SD"))] if show else []  # type: ignore[index]
        for j in range(k - 1):
            if j < i:
                mark = "*" * sum(m.p[i, j] < s for s in stars)
                cells.append(StyledText(num.number(float(m.r[i, j]), symbol) + mark))
            else:
                cells.append(StyledText("—" if j == i else ""))
        rows.append(Row(StyledText(f"{i + 1}. {table_label(m.labels.get(name, name))}"), tuple(cells)))  # a stub in sentence case
        if intervals and i > 0:
            limits = [StyledText()] * (2 if show else 0)
            for j in range(k - 1):
                if j < i:
                    limits.append(interval_cell(num, resolved, Interval(m.level, float(m.low[i, j]), float(m.high[i, j])), symbol))
                else:
                    limits.append(StyledText())
            rows.append(Row(StyledText(), tuple(limits)))
    p = resolved.symbol("p")
    nb = resolved.keep_together
    star_note = " ".join(f"{'*' * (n + 1)}{p}{nb}&lt;{nb}{num.number(s, 'p', _decimals(s))}." for n, s in enumerate(stars))
    ns = {int(m.n[i, j]) for i in range(k) for j in range(i)}
    sym = StyledText.from_markup(resolved.symbol(symbol)).plain()
    if ns == {m.rows}:  # no value missing: the whole sample
        general = f"{resolved.symbol('N')}{nb}={nb}{num.integer(min(ns))}."
    elif ns:
        general = f"Pairwise-complete observations; {resolved.symbol('n')}{nb}={nb}{num.integer(min(ns))}"
        general += f" to {num.integer(max(ns))}." if len(ns) > 1 else " for every pair."
    else:
        general = ""
    mean = "Mean" if resolved.spells_out else resolved.symbol("M")  # AMA spells it out
    if show and ns != {m.rows}:
        general += f" {mean} and {resolved.symbol('SD')} are of each variable's observed values."
    if intervals:
        where = "Values in brackets are" if resolved.data["ci"].get("cell", "[").startswith("[") else "The values beneath each coefficient give"
        general += f" {where} the {m.level * 100:g}% CI of each {resolved.symbol(symbol)}."  # (AMA's cells have no brackets)
    if m.adjust:
        general += f" {p} values {ADJUST_NAMES.get(m.adjust, m.adjust)}-adjusted for {k * (k - 1) // 2} comparisons."
    heads = ([Column(StyledText.from_markup(mean)), Column(StyledText.from_markup(resolved.symbol("SD")))] if show else [])
    return TableModel(
        title=StyledText(title or f"Correlations ({sym}) Between the Variables"),
        columns=tuple(heads + [Column(StyledText(str(j + 1))) for j in range(k - 1)]),
        rows=tuple(rows),
        stub_head=StyledText("Variable"),
        number=number,
        general_note=StyledText.from_markup(general.strip()) if general else None,
        probability_note=StyledText.from_markup(star_note),
    )


def _decimals(value: float) -> int:
    return max(2, len(f"{value:g}".split(".")[-1]))
