"""A TableModel of results: one row per record (test, statistic, p, effect size, CI)."""

from __future__ import annotations

from typing import Sequence

from markupsafe import Markup

from ..records import Result
from ..style.numbers import Numbers
from ..style.profile import Style, load_style
from .kinds import KINDS
from .sentences import _helpers
from ..styled import StyledText
from .tables import Column, Row, TableModel


def _cell(markup: Markup | str) -> StyledText:
    return StyledText.from_markup(str(markup))


def p_cell(num: Numbers, r: Result) -> StyledText:
    """A record's p under a *p* head: ``.039`` or ``< .001`` (the symbol is in
    the head); an adjusted p says so. Shared by every table of records."""
    if r.p is None:
        return StyledText()
    op, text = num.p(r.p, r.alpha)
    shown = text if op == "=" else f"{op} {text}"
    adjusted = r.details.get("p_adjusted")
    return StyledText(f"{shown} ({adjusted})" if adjusted else shown)


def _limits(h, ci, quantity: str, null: float) -> StyledText:  # type: ignore[no-untyped-def]
    """``[low, high]`` under a ``95% CI`` head, decision-preserving like every CI."""
    if ci is None:
        return StyledText()
    low, high = h.num.interval(ci.low, ci.high, quantity, null)
    return StyledText(f"[{low}{h.sep}{h.style.keep_together}{high}]")


def results_table(records: Sequence[Result], style: "Style | str | None" = None, title: str = "Results") -> TableModel:
    """Each record's statistic (with df), p, first effect size and its CI, in the style."""
    resolved = load_style(style)
    h = _helpers(resolved)
    rows = []
    level = None
    for r in records:
        e = r.effects[0] if r.effects else None
        ci = e.ci if e is not None else (r.estimate.ci if r.estimate is not None else None)
        if ci is not None:
            level = level or ci.level
        label = r.id or KINDS.get(r.kind, r.kind)
        rows.append(
            Row(
                StyledText(label),
                (
                    _cell(h.stat(r)),
                    p_cell(h.num, r),
                    _cell(h.eff(r, with_ci=False) if e is not None else h.est(r, with_ci=False, symbol=r.estimate.name if r.estimate else None)),
                    _limits(h, ci, e.name if e is not None else (r.estimate.name if r.estimate else "default"), e.null if e is not None else 0.0),
                ),
            )
        )
    pct = f"{round((level or 0.95) * 100):g}"
    return TableModel(
        title=StyledText(title),
        stub_head=StyledText("Result"),
        columns=(Column(StyledText("Statistic")), Column(_cell(resolved.symbol("p"))), Column(StyledText("Effect size")), Column(StyledText(f"{pct}% CI"))),
        rows=tuple(rows),
        general_note=StyledText(f"CI{resolved.keep_together}={resolved.keep_together}confidence interval."),
    )
