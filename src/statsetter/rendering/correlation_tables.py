"""A correlation matrix as a table (REPORTING-RULES.md "Tables"): variables
numbered in the stub, numbers as column heads, the lower triangle only, an
em dash on the diagonal, asterisks for p by the style's thresholds with the
probability note, and n per pair in the note when it varies."""

from __future__ import annotations

from typing import TYPE_CHECKING

from ..records import ADJUST_NAMES
from ..style.numbers import numbers_for
from ..style.profile import Style, load_style
from ..styled import StyledText
from .tables import Column, Row, TableModel

if TYPE_CHECKING:
    from ..records import CorrelationMatrix


def correlation_table(m: "CorrelationMatrix", style: "Style | str | None" = None, *, title: str | None = None, number: int | None = None) -> TableModel:
    resolved = load_style(style)
    num = numbers_for(resolved)
    stars = sorted(resolved.p.get("table_stars", [0.05, 0.01, 0.001]), reverse=True)
    symbol = "r" if m.method == "pearson" else "rs"
    k = len(m.names)
    rows = []
    for i, name in enumerate(m.names):
        cells = []
        for j in range(k):
            if j < i:
                mark = "*" * sum(m.p[i, j] < s for s in stars)
                cells.append(StyledText(num.number(float(m.r[i, j]), symbol) + mark))
            elif j == i:
                cells.append(StyledText("—"))
            else:
                cells.append(StyledText())
        rows.append(Row(StyledText(f"{i + 1}. {m.labels.get(name, name)}"), tuple(cells)))
    p = resolved.symbol("p")
    star_note = " ".join(f"{'*' * (n + 1)}{p} &lt; {num.number(s, 'p', _decimals(s))}." for n, s in enumerate(stars))
    ns = {int(m.n[i, j]) for i in range(k) for j in range(i)}
    sym = StyledText.from_markup(resolved.symbol(symbol)).plain()
    general = f"Pairwise-complete observations; n = {min(ns):,}" + (f" to {max(ns):,}." if len(ns) > 1 else ".") if ns else ""
    if m.adjust:
        general += f" {p} values {ADJUST_NAMES.get(m.adjust, m.adjust)}-adjusted for {len(m.names) * (len(m.names) - 1) // 2} comparisons."
    return TableModel(
        title=StyledText(title or f"Correlations ({sym}) Between the Variables"),
        columns=tuple(Column(StyledText(str(j + 1))) for j in range(k)),
        rows=tuple(rows),
        stub_head=StyledText("Variable"),
        number=number,
        general_note=StyledText.from_markup(general.replace("n =", f"{resolved.symbol('n')} =", 1)) if general else None,
        probability_note=StyledText.from_markup(star_note),
    )


def _decimals(value: float) -> int:
    return max(2, len(f"{value:g}".split(".")[-1]))
