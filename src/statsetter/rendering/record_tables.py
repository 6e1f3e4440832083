"""A TableModel of results: one row per record (test, statistic, p, effect size, CI)."""

from __future__ import annotations

from typing import Sequence

from markupsafe import Markup

from ..records import Interval, Result
from ..style.numbers import Numbers
from ..style.profile import Style, load_style
from .kinds import KINDS
from .sentences import _helpers, eponyms
from ..styled import StyledText
from .tables import Column, Row, Spanner, TableModel


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


def interval_cell(num: Numbers, style: Style, ci: "Interval | None", quantity: str, null: float = 0.0, decimals: int | None = None) -> StyledText:
    """A CI under a ``95% CI`` head in the style's cell form (``[low, high]``
    in APA 7, ``low-high`` in AMA 11), decision-preserving like every CI."""
    if ci is None:
        return StyledText()
    low, high = num.interval(ci.low, ci.high, quantity, null, decimals=decimals)
    cell = style.ci.get("cell") or "[{low}{sep} {high}]"
    if ci.low < 0 or ci.high < 0:
        cell = style.ci.get("cell_negative") or cell
    return StyledText(cell.replace(" ", style.keep_together).format(low=low, high=high, sep=style.list_separator, level=""))


def subject(r: Result, family: bool = False) -> str:
    """What a result is about, in prose: "fatigue score by shift pattern",
    "hours slept and fatigue score", "the week before and after the trial";
    a pair of repeated measurements "fatigue: before vs. after", or with
    ``family`` what its family of pairs compares ("fatigue: before, after
    and a month later")."""
    def named(*roles: str) -> list[str]:
        return [v.display for v in r.variables if v.role in roles]

    outcome = named("outcome", "y", "column", "scale", "variable")
    by = named("group", "factor", "predictor", "x", "row")
    if r.kind in ("pearson", "spearman", "kendall"):
        return " and ".join(named("x") + named("y"))
    if r.kind in ("t_paired", "wilcoxon", "mcnemar"):
        first, second = named("first"), named("second")
        if first and second:
            return f"{outcome[0] + ', ' if outcome else ''}{first[0]} and {second[0]}"
    if r.kind.startswith("chi2_independence") or r.kind == "fisher_exact":
        return " and ".join(named("row") + named("column"))
    if r.kind == "posthoc_pair" and len(r.groups) == 2 and not by and not family:  # two measurements of the same people
        pair = f"{r.groups[0].label} vs. {r.groups[1].label}"
        return f"{outcome[0]}: {pair}" if outcome else pair
    if outcome and by:
        return f"{outcome[0]} by {' and '.join(dict.fromkeys(by))}"
    measured = [v.display for v in r.variables if (v.role or "").startswith("measurement ")]
    if measured:  # the measurements of a repeated design, in order
        listed = ", ".join(measured[:-1]) + f" and {measured[-1]}" if len(measured) > 1 else measured[0]
        return f"{outcome[0]}: {listed}" if outcome else listed
    return (outcome or by or [_TEST_NAMES.get(r.kind, r.kind.replace("_", " "))])[0]


_TEST_NAMES = {"mcnemar": "McNemar's test", "cochran_q": "Cochran's Q test", "friedman": "Friedman test", "anova_rm": "repeated-measures ANOVA",
               "simple_slope": "simple slope", "mediation_path": "mediation path", "mediation_indirect": "indirect effect",
               "adjusted_mean": "adjusted mean"}


def row_label(r: Result, named_twice: bool = False) -> str:
    """A results table's stub for a record: what it is about, in sentence
    case, and the test when two rows are about the same thing."""
    label = subject(r)
    label = label[:1].upper() + label[1:]
    if named_twice:
        test = _TEST_NAMES.get(r.kind) or KINDS.get(r.kind, r.kind).split(" (")[0]
        variant = r.details.get("variant")
        label += f" ({variant.capitalize()} {test})" if variant in ("welch", "student") else f" ({test})"
    return label


def results_table(records: Sequence[Result], style: "Style | str | None" = None, title: str = "Results") -> TableModel:
    """Each record's statistic (with df; χ² with N), p, first effect size and
    its CI, in the style. A record with an estimate but no effect size (a
    mean difference, a coefficient) shows it in an Estimate column of its
    own with its CI, never under Effect size."""
    resolved = load_style(style)
    h = _helpers(resolved)
    def plain_estimate(r: Result) -> bool:  # a mean difference or coefficient, not a ratio such as an OR (an effect size)
        return not r.effects and r.estimate is not None and not r.estimate.ratio

    estimates = any(plain_estimate(r) for r in records)
    rows = []
    level = None
    subjects = [subject(r) for r in records]
    for r, about in zip(records, subjects):
        e = r.effects[0] if r.effects else None
        cells = [_cell(h.stat(r, n=r.statistic is not None and r.statistic.symbol == "chi2")), p_cell(h.num, r)]  # χ²(2, N = 240) (APA 7 ch. 6)
        shown = r.estimate if plain_estimate(r) else None
        if estimates:
            symbol = "difference" if shown is not None and shown.name == "mean difference" else (shown.name if shown is not None else None)
            cells += [_cell(h.est(r, with_ci=False, symbol=symbol)) if shown is not None else StyledText(),
                      interval_cell(h.num, resolved, shown.ci if shown is not None else None, shown.name if shown is not None else "default")]
        ratio = r.estimate if e is None and shown is None else None  # an odds ratio without effect sizes: shown as the effect size
        if e is not None:
            cells += [_cell(h.eff(r, with_ci=False)), interval_cell(h.num, resolved, e.ci, e.name, e.null)]
        elif ratio is not None:
            cells += [_cell(h.est(r, with_ci=False, symbol=ratio.name)), interval_cell(h.num, resolved, ratio.ci, ratio.name, 1.0)]
        else:
            cells += [StyledText(), StyledText()]
        for ci in ((e.ci if e is not None else None), (r.estimate.ci if r.estimate is not None else None)):
            if ci is not None:
                level = level or ci.level
        rows.append(Row(StyledText(row_label(r, subjects.count(about) > 1)), tuple(cells)))
    pct = f"{round((level or 0.95) * 100):g}"
    columns = [Column(StyledText("Statistic")), Column(_cell(resolved.symbol("p")))]
    spanners: tuple[Spanner, ...] = ()
    if estimates:
        columns += [Column(StyledText("Estimate")), Column(StyledText(f"{pct}% CI"))]
        spanners = (Spanner(StyledText("Estimate"), 2, 4), Spanner(StyledText("Effect size"), 4, 6))
    columns += [Column(StyledText("Effect size")), Column(StyledText(f"{pct}% CI"))]
    return TableModel(
        title=StyledText(title),
        stub_head=StyledText("Result"),
        columns=tuple(columns),
        rows=tuple(rows),
        spanners=spanners,
        general_note=StyledText(f"CI{resolved.keep_together}={resolved.keep_together}confidence interval.") + _adjusted_note(records, resolved),
    )


def _adjusted_note(records: Sequence[Result], style: Style) -> StyledText:
    """Which pairs' p are adjusted, and how (a results table may hold the pairs of a post hoc procedure)."""
    procedures = list(dict.fromkeys(str(r.details["procedure"]) for r in records if r.kind == "posthoc_pair" and r.details.get("procedure")))
    if not procedures:
        return StyledText()
    return StyledText.from_markup(f" Pairwise comparisons: {style.symbol('p')} adjusted ({'; '.join(procedures)}).")


def posthoc_table(records: Sequence[Result], style: "Style | str | None" = None, title: str = "Pairwise Comparisons") -> TableModel:
    """Post hoc pairs: each comparison (first vs. second group), the mean
    difference with its CI and the adjusted p; the procedure in the note."""
    resolved = load_style(style)
    h = _helpers(resolved)
    rows, level = [], 0.95
    effect = all(r.effect("g") is not None for r in records)  # Hedges' g of each pair, with its own interval
    for r in records:
        e = r.estimate
        if e is not None and e.ci is not None:
            level = e.ci.level
        label = " vs. ".join(g.label for g in r.groups) or row_label(r)
        cells = [_cell(h.est(r, with_ci=False)), interval_cell(h.num, resolved, e.ci if e is not None else None, e.name if e is not None else "default")]
        if effect:
            g = r.effect("g")
            cells += [StyledText(h.num.number(g.value, "g")), interval_cell(h.num, resolved, g.ci, "g")]
        rows.append(Row(StyledText(label[:1].upper() + label[1:]), (*cells, p_cell(h.num, r))))
    first = records[0]
    procedure = first.details.get("procedure")
    k = first.details.get("comparisons", len(records))
    nb = resolved.keep_together
    note = StyledText.from_markup(
        f"{resolved.symbol('difference')}{nb}={nb}mean difference (first group minus second); CI{nb}={nb}confidence interval. "
        + (f"{procedure}: {resolved.symbol('p')} values adjusted for {k} comparisons." if procedure else "")
    )
    for n in first.notes:  # the analysis says whether its CIs are adjusted
        if n.kind == "correction" and "; CI" in n.text:
            note = note + " " + n.text.split("; ", 1)[-1]
    if procedure in ("Tukey HSD", "Games–Howell"):
        note = note + " The CIs of the differences hold for the family of comparisons (studentized range)."
    pct = f"{round(level * 100):g}"
    columns = [Column(_cell(resolved.symbol("difference"))), Column(StyledText(f"{pct}% CI"))]
    spanners: tuple[Spanner, ...] = ()
    if effect:
        columns += [Column(_cell(resolved.symbol("g"))), Column(StyledText(f"{pct}% CI"))]
        spanners = (Spanner(StyledText("Mean difference"), 0, 2), Spanner(StyledText("Standardized difference"), 2, 4))
        note = note + StyledText.from_markup(eponyms(f" {resolved.symbol('g')}: Hedges' {resolved.symbol('g')} from the two groups' pooled SD; its CI is not adjusted.", resolved))
    return TableModel(
        title=StyledText(title),
        stub_head=StyledText("Comparison"),
        columns=(*columns, Column(_cell(resolved.symbol("p")))),
        rows=tuple(rows),
        spanners=spanners,
        general_note=note,
    )

