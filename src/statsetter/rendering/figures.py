"""Records as figures (docs/reporting-rules.md "Figures"): what is drawn,
with which error bars, under which number, title and note — a FigureModel,
as a TableModel is a table. Nothing here draws: `export.figure_files` does,
with matplotlib, only when a figure is written.

Kinds: ``means`` (group or measurement means with the 95% CI of each mean,
as points or bars), ``interaction`` (the cell means of a two-factor design,
a line per level of the first factor across the second, with CIs),
``scatter`` (the points of a correlation or simple regression with the
least-squares line and its 95% confidence band; the only kind that needs the
data), ``forest`` (regression coefficients with their CIs; odds ratios on a
log axis), ``categories`` (a Table 1's categorical variable as grouped bars
of the percentage in each category per group; counts the table suppresses
for confidentiality are not drawn either). A record without the numbers a
kind needs is refused.
"""

from __future__ import annotations

import math
from collections.abc import Iterable
from dataclasses import dataclass, field, replace
from typing import TYPE_CHECKING, Any, Sequence

from ..errors import InputError
from ..records import Result, table_label
from ..styled import StyledText, escape_markup

if TYPE_CHECKING:
    import pandas as pd

    from ..records import Description
    from ..style.profile import Style

__all__ = ["FIGURE_KINDS", "FigureModel", "Series", "figure"]

FIGURE_KINDS = ("means", "interaction", "scatter", "forest", "categories")


@dataclass(frozen=True)
class Series:
    """One line or set of points: positions (category indexes, or x values),
    values, and the interval of each value (absent for raw points)."""

    name: str
    x: tuple[float, ...]
    y: tuple[float, ...]
    low: tuple[float, ...] = ()
    high: tuple[float, ...] = ()


@dataclass(frozen=True)
class FigureModel:
    """A figure as the reader meets it: its kind, number, title (title case),
    note, the axes' labels (markup: statistical symbols in italics), the
    categories along the category axis, the series drawn, and alt text.
    ``files`` holds the written files (format → path relative to the
    document) once the figure is drawn."""

    kind: str
    title: StyledText
    note: StyledText
    x_label: str
    y_label: str
    series: tuple[Series, ...]
    categories: tuple[str, ...] = ()
    alt: str = ""
    number: int | None = None
    id: str | None = None
    about: str = ""  # what the figure shows, in prose ("mean fatigue by shift pattern"), for the sentence that calls it out
    legend: str = ""  # the title of the legend (the factor whose levels are the lines)
    log_scale: bool = False
    reference: float | None = None
    band: tuple[tuple[float, ...], tuple[float, ...], tuple[float, ...]] | None = None  # x, lower, upper of a confidence band
    files: dict[str, str] = field(default_factory=dict, compare=False)
    png: bytes | None = field(default=None, compare=False, repr=False)  # the drawn PNG, once written (Word embeds it)

    def with_number(self, number: int) -> "FigureModel":
        return replace(self, number=number)

    def with_files(self, files: dict[str, str], png: bytes | None = None) -> "FigureModel":
        return replace(self, files=dict(files), png=png if png is not None else self.png)


def _labelled(note: str, style: "Style") -> StyledText:
    """A figure's note after the style's label (APA's italic "Note.", none in AMA's legends)."""
    label = style.note_label("figures")
    return StyledText.from_markup(f"<i>{label}</i> {note}" if label else note)


def _t_quantile(level: float, df: float) -> float:
    from scipy.special import stdtrit

    return float(stdtrit(df, 0.5 + level / 2))


def _mean_ci(n: int | None, mean: float | None, sd: float | None, level: float, what: str) -> tuple[float, float]:
    if n is None or mean is None or sd is None or n < 2:
        raise InputError(f"figure: {what} has no n, mean and SD; the error bars (the CI of the mean) need all three")
    half = _t_quantile(level, n - 1) * sd / math.sqrt(n)
    return mean - half, mean + half


def _outcome(r: Result) -> str:
    v = r.variable("outcome")
    return table_label(v.heading) if v is not None else "Value"


def _title(text: str) -> StyledText:
    from .tables import title_case

    return title_case(StyledText(text[:1].upper() + text[1:]))


def _prose(text: str) -> str:
    """A title in sentence case as prose: its first letter lower case unless it starts an acronym or a name kept capitalised."""
    return text[:1].lower() + text[1:] if text[1:2].islower() else text


def _lower(text: str) -> str:
    """A label inside a sentence or title: lower case unless it starts with an acronym ("BMI", "Age" → "age")."""
    return text.lower() if text[1:2].islower() else text


def means_figure(records: Sequence[Result], style: "Style", level: float = 0.95) -> FigureModel:
    """Each group's (or measurement's) mean with the CI of that mean, from the groups' n, M and SD; for a rank test's
    groups (medians and quartiles, no means) each median with its interquartile range."""
    withgroups = [r for r in records if r.groups]
    if not withgroups:
        raise InputError("figure (means): the records have no groups; a means figure needs groups with n, M and SD")
    r = withgroups[0]
    medians = all(g.mean is None and g.median is not None and g.q1 is not None and g.q3 is not None for g in r.groups)
    names, ys, lows, highs = [], [], [], []
    for g in r.groups:
        low, high = (g.q1, g.q3) if medians else _mean_ci(g.n, g.mean, g.sd, level, f"group {g.label!r}")
        names.append(g.label)
        ys.append(float(g.median if medians else g.mean))  # type: ignore[arg-type]
        lows.append(float(low))  # type: ignore[arg-type]
        highs.append(float(high))  # type: ignore[arg-type]
    outcome = _outcome(r)
    by = r.variable("group") or r.variable("factor")
    repeated = r.kind in ("anova_rm", "t_paired")
    axis = table_label(by.heading) if by is not None else ("Measurement" if repeated else "Group")
    pct = f"{level * 100:g}%"
    note = (f"Points show means; error bars show {pct} confidence intervals of each mean (<i>t</i> distribution, "
            f"from each group's <i>n</i>, <i>M</i> and <i>SD</i>).")
    if medians:  # a rank test's groups: medians with their interquartile ranges
        note = "Points show medians; error bars show the interquartile range (first to third quartile) of each group."
    if repeated:
        note += " The same people were measured each time: the intervals are those of each mean alone and do not show the precision of the differences."
    if style.figures.get("means") == "bars":
        note = note.replace("Points show", "Bars show")
    title = f"{'Median' if medians else 'Mean'} {_lower(outcome)} by {_lower(axis)}"
    centre = ("median" if medians else "mean") if style.spells_out else style.symbol("Mdn" if medians else "M")  # AMA: words
    return FigureModel(
        kind="means",
        about=_prose(title),
        title=_title(title),
        note=_labelled(note, style),
        x_label=axis,
        y_label=f"{outcome} ({centre})",
        series=(Series(outcome, tuple(float(i) for i in range(len(names))), tuple(ys), tuple(lows), tuple(highs)),),
        categories=tuple(names),
        alt=f"{title}: " + "; ".join(f"{n} {y:.3g} ({a:.3g} to {b:.3g})" for n, y, a, b in zip(names, ys, lows, highs)),
    )


def interaction_figure(records: Sequence[Result], style: "Style", level: float = 0.95) -> FigureModel:
    """The cell means of a two-factor design (the interaction record's groups), a line per level of the first factor."""
    cells = next((r for r in records if r.details.get("interaction") and any("cell" in g.extra for g in r.groups)), None)
    if cells is None:
        raise InputError("figure (interaction): no interaction record with cell means; use factorial_anova, mixed_anova or rm_anova with two factors")
    factors = [v for v in cells.variables if v.role == "factor"]
    lines = list(dict.fromkeys(g.extra["cell"][0] for g in cells.groups))
    across = list(dict.fromkeys(g.extra["cell"][1] for g in cells.groups))
    series = []
    summary = []
    for line in lines:
        xs, ys, lows, highs = [], [], [], []
        for g in cells.groups:
            if g.extra["cell"][0] != line:
                continue
            low, high = _mean_ci(g.n, g.mean, g.sd, level, f"cell {g.label!r}")
            xs.append(float(across.index(g.extra["cell"][1])))
            ys.append(float(g.mean))  # type: ignore[arg-type]
            lows.append(low)
            highs.append(high)
            summary.append(f"{g.label} {g.mean:.3g}")
        series.append(Series(str(line), tuple(xs), tuple(ys), tuple(lows), tuple(highs)))
    outcome = _outcome(cells)
    first = table_label(factors[0].heading) if factors else "First factor"
    second = table_label(factors[1].heading) if len(factors) > 1 else "Second factor"
    within = cells.details.get("epsilon") is not None or cells.kind == "anova_rm"
    note = (f"Points show cell means, a line for each level of {escape_markup(_lower(first))}; "  # (the note is markup; the label text)
            f"error bars show {level * 100:g}% confidence intervals of each cell mean.")
    if within:
        note += " Measurements of the same people are joined; the intervals do not show the precision of within-person differences."
    title = f"Mean {_lower(outcome)} by {_lower(first)} and {_lower(second)}"
    return FigureModel(
        kind="interaction",
        about=_prose(title),
        title=_title(title),
        note=_labelled(note, style),
        x_label=second,
        y_label=f"{outcome} (<i>M</i>)",
        series=tuple(series),
        categories=tuple(str(a) for a in across),
        legend=first,
        alt=f"{title}: " + "; ".join(summary),
    )


def scatter_figure(records: Sequence[Result], data: "pd.DataFrame", style: "Style", level: float = 0.95) -> FigureModel:
    """The points of x and y with the least-squares line and its confidence band; the record names x and y."""
    import numpy as np

    r = next((r for r in records if r.kind in ("pearson", "spearman", "kendall", "linear_model", "linear_coefficient")), None)
    if r is None:
        raise InputError("figure (scatter): needs a correlation or a simple regression record")
    x_var = r.variable("x") or r.variable("predictor")
    y_var = r.variable("y") or r.variable("outcome")
    if x_var is None or y_var is None:
        raise InputError("figure (scatter): the record does not name its two variables")
    for v in (x_var, y_var):
        if v.name not in data.columns:
            raise InputError(f"figure (scatter): {v.name}: not a column of the data given")
    import pandas as pd

    for v in (x_var, y_var):
        if not pd.api.types.is_numeric_dtype(data[v.name]) or pd.api.types.is_bool_dtype(data[v.name]):
            raise InputError(f"figure (scatter): {v.name}: not numeric (dtype {data[v.name].dtype}); a scatter plot needs two numeric columns")
    frame = data[[x_var.name, y_var.name]].astype(float).dropna()
    x, y = frame[x_var.name].to_numpy(), frame[y_var.name].to_numpy()
    n = len(x)
    if n < 3:
        raise InputError(f"figure (scatter): {n} complete pairs; a line and its band need at least three")
    b, a = np.polyfit(x, y, 1)
    resid = y - (a + b * x)
    s = math.sqrt(float(resid @ resid) / (n - 2))
    grid = np.linspace(float(x.min()), float(x.max()), 101)
    se = s * np.sqrt(1 / n + (grid - x.mean()) ** 2 / float(((x - x.mean()) ** 2).sum()))
    crit = _t_quantile(level, n - 2)
    fit = a + b * grid
    xl, yl = table_label(x_var.heading), table_label(y_var.heading)
    title = f"{yl} and {_lower(xl)}"
    note = (f"Each point is one case (<i>N</i> = {n}); the line is the least-squares regression line, "
            f"the shaded band its {level * 100:g}% confidence band.")
    return FigureModel(
        kind="scatter",
        about=f"relation between {_prose(yl)} and {_prose(xl)}",
        title=_title(title),
        note=_labelled(note, style),
        x_label=xl,
        y_label=yl,
        series=(Series("cases", tuple(float(v) for v in x), tuple(float(v) for v in y)),
                Series("line", (float(grid[0]), float(grid[-1])), (float(fit[0]), float(fit[-1])))),
        band=(tuple(float(v) for v in grid), tuple(float(v) for v in fit - crit * se), tuple(float(v) for v in fit + crit * se)),
        alt=f"{title}: {n} points; line y = {a:.3g} + {b:.3g}x",
    )


def forest_figure(records: Sequence[Result], style: "Style") -> FigureModel:
    """Coefficients (B, or OR on a log axis) with their CIs, intercept left out, top to bottom in the model's order."""
    coefficients = [r for r in records if r.kind in ("linear_coefficient", "logistic_coefficient") and not r.details.get("intercept")]
    if not coefficients:
        raise InputError("figure (forest): no coefficients in the records")
    logistic = coefficients[0].kind == "logistic_coefficient"
    names, ys, lows, highs = [], [], [], []
    level = 0.95
    for r in coefficients:
        shown = r.effect("OR") if logistic else r.estimate
        if shown is None or shown.ci is None:
            raise InputError(f"figure (forest): {r.details.get('term', r.kind)} has no {'odds ratio' if logistic else 'B'} with a CI")
        v = r.variable("predictor")
        label = table_label(v.heading) if v is not None else str(r.details.get("term", ""))
        names.append(label)
        ys.append(float(shown.value))
        lows.append(float(shown.ci.low))
        highs.append(float(shown.ci.high))
        level = shown.ci.level
    outcome = _outcome(coefficients[0])
    symbol = "OR" if logistic else "<i>B</i>"
    null = "an odds ratio of one" if logistic else "a coefficient of zero"
    note = (f"Points show {'odds ratios' if logistic else 'unstandardized coefficients (<i>B</i>)'}; error bars show their "
            f"{level * 100:g}% confidence intervals; the dashed line marks no association ({null})." + (" The axis is logarithmic." if logistic else ""))
    title = f"{'Odds ratios' if logistic else 'Coefficients'} of the {'logistic' if logistic else 'linear'} regression of {_lower(outcome)}"
    return FigureModel(
        kind="forest",
        about=_prose(title),
        title=_title(title),
        note=_labelled(note, style),
        x_label=f"{symbol} ({level * 100:g}% CI)",
        y_label="",
        series=(Series("coefficients", tuple(ys), tuple(float(i) for i in range(len(names))), tuple(lows), tuple(highs)),),
        categories=tuple(names),
        alt=f"{title}: " + "; ".join(f"{n} {y:.3g} ({a:.3g} to {b:.3g})" for n, y, a, b in zip(names, ys, lows, highs)),
        log_scale=logistic,
        reference=1.0 if logistic else 0.0,
    )


def categories_figure(description: "Description", variable: str | None, style: "Style") -> FigureModel:
    """A categorical variable of a Table 1: the percentage of each group (or of everyone) in each category, with the
    table's own base (valid or all responses) and its suppression of small counts."""
    import numpy as np

    from .descriptive_tables import _suppress

    found = [v for v in description.variables if v.counts is not None and (variable is None or v.name == variable)]
    if not found:
        names = ", ".join(v.name for v in description.variables if v.counts is not None) or "none"
        raise InputError(f"figure (categories): {variable or 'the description'}: no categorical variable of that name (categorical: {names})")
    v = found[0]
    counts = np.asarray(v.counts, dtype=float)
    base = np.asarray(v.n, dtype=float) + (np.asarray(v.missing, dtype=float) if description.percent_of == "all" else 0.0)
    hidden = _suppress(counts, description.suppress_below) if description.suppress_below else np.zeros(counts.shape, bool)
    columns = list(description.columns)
    keep = [j for j, c in enumerate(columns) if not (len(columns) > 1 and j == len(columns) - 1)]  # groups, not Total, when there are groups
    series = []
    for j in keep:
        pct = [float(counts[j, k] / base[j] * 100) if base[j] and not hidden[j, k] else math.nan for k in range(len(v.categories))]
        series.append(Series(columns[j], tuple(float(k) for k in range(len(v.categories))), tuple(pct)))
    label = table_label(v.label)
    by = table_label(description.group_label or "Group")
    grouped = len(keep) > 1
    note = (f"Bars show the percentage of {'each group' if grouped else 'the sample'} in each category "
            f"({'of valid responses' if description.percent_of == 'valid' else 'of all cases, missing included'}).")
    if hidden.any():
        note += f" To protect confidentiality, counts below {description.suppress_below} are not drawn, as the table does not show them."
    title = f"{label} by {_lower(by)}" if grouped else label
    return FigureModel(
        kind="categories",
        about=_prose(f"percentage in each category of {_prose(label)}" + (f" by {_prose(by)}" if grouped else "")),
        title=_title(title),
        note=_labelled(note, style),
        x_label=label,
        y_label="Percentage",
        series=tuple(series),
        categories=tuple(v.categories),
        legend=by if grouped else "",
        alt=f"{title}: " + "; ".join(f"{s.name}: " + ", ".join(f"{c} {p:.1f}%" for c, p in zip(v.categories, s.y) if p == p) for s in series),
    )


def figure(records: "Result | Sequence[Result]", kind: str, style: "Style | str | None" = None, *, data: "pd.DataFrame | None" = None,
           title: str | None = None, note: str | None = None, number: int | None = None, level: float = 0.95, id: str | None = None,
           variable: str | None = None) -> FigureModel:
    """The figure of ``kind`` for ``records`` in ``style``; ``data`` only for a scatter plot; a Description (Table 1)
    with kind ``categories`` and the ``variable`` to draw (default: its first categorical one); ``title`` replaces the
    generated one and ``note`` (markup) follows the generated note, which says what the error bars show."""
    from ..records import Description
    from ..style.profile import load_style

    resolved = load_style(style)
    if kind not in FIGURE_KINDS:
        raise InputError(f"figure: kind {kind!r} is not one of {', '.join(FIGURE_KINDS)}")
    if isinstance(records, (str, bytes)) or not isinstance(records, (Result, Description, Iterable)):
        raise InputError(f"figure: records must be a record or a list of records (got {type(records).__name__})")
    items = [records] if isinstance(records, (Result, Description)) else list(records)
    stray = next((i for i, r in enumerate(items) if not isinstance(r, (Result, Description))), None)
    if stray is not None:
        raise InputError(f"figure: records[{stray}] is not a record (got {type(items[stray]).__name__})")
    found = [r for r in items if isinstance(r, Result)]
    described = next((r for r in items if isinstance(r, Description)), None)
    if (kind == "categories") != (described is not None):
        raise InputError("figure: a descriptives table (Description) is drawn as kind 'categories', and kind 'categories' needs one")
    if not found and described is None:
        raise InputError("figure: no result records to draw")
    if described is not None:
        made: Any = categories_figure(described, variable, resolved)
    elif kind == "means":
        made = means_figure(found, resolved, level)
    elif kind == "interaction":
        made = interaction_figure(found, resolved, level)
    elif kind == "scatter":
        if data is None:
            raise InputError("figure (scatter): pass the data; a scatter plot draws the points, which a record does not hold")
        made = scatter_figure(found, data, resolved, level)
    else:
        made = forest_figure(found, resolved)
    if title:
        made = replace(made, title=_title(title), about=_prose(title), alt=title + made.alt[made.alt.find(":"):] if ":" in made.alt else title)
    if note:
        made = replace(made, note=made.note + " " + StyledText.from_markup(note))
    return replace(made, number=number, id=id)
