"""A results section as a reader meets it: paragraphs and tables in order.

Each analysis goes where the plan places it — ``text`` (its sentences),
``table`` (a row or rows of a table, called out once in the text) or
``both``. By default an analysis that a table shows is not repeated in the
text, and post hoc pairs and correlation matrices go to a table (one made for
them when the plan names none) with one summary sentence. Descriptive tables
come first; tables are numbered in the order they appear. Figures follow
the analysis they draw, each with a sentence that sends the reader to it,
numbered in their own series.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import TYPE_CHECKING, Iterable, Mapping, Sequence, Union

from ..records import CorrelationMatrix, Description, Record, Result
from ..styled import StyledText
from .record_tables import subject
from .sentences import _helpers, render
from .figures import FigureModel
from .tables import TableModel

if TYPE_CHECKING:
    from ..style.profile import Style

__all__ = ["Block", "Composed", "PLACES", "Shown", "analysis_of", "compose", "subject"]  # figures: rendering.figures

Block = Union[StyledText, TableModel, FigureModel]
PLACES = ("text", "table", "both")
_TABLE_FIRST = {"posthoc_pair", "correlation_matrix"}  # kinds that go to a table unless placed otherwise
_SUMMARY = {"linear_model", "logistic_model", "mixed_model"}  # a model's fit stays in the text beside its coefficients table


@dataclass(frozen=True)
class Shown:
    """A table of the section: its id, its layout, the analyses (ids) whose
    records it shows and its kind (descriptives, correlations, regression,
    anova, results)."""

    id: str
    model: TableModel
    sources: tuple[str, ...] = ()
    kind: str = "results"


@dataclass(frozen=True)
class Composed:
    """A section: its blocks in reading order (tables numbered as they
    appear), every table by id (the plan's and those made for an analysis,
    unnumbered, for a chapter's markers) and a note per table made."""

    blocks: tuple[Block, ...]
    tables: Mapping[str, TableModel]
    notes: tuple[str, ...]


def analysis_of(record: Record) -> str:
    """The analysis a record came from: its id up to the first colon."""
    return (record.id or "").split(":", 1)[0]


def compose(
    records: Sequence[Record],
    tables: Sequence[Shown],
    style: "Style",
    place: Mapping[str, str] | None = None,
    figures: Sequence[tuple[str, FigureModel]] = (),
) -> Composed:
    """The section's blocks in reading order, its tables by id, and a note for
    every table made for an analysis the plan did not give one (automatic
    choices are shown)."""
    from .layout import table as lay_out

    place = dict(place or {})
    by_analysis: dict[str, list[Record]] = {}
    for r in records:
        by_analysis.setdefault(analysis_of(r), []).append(r)
    showing: dict[str, list[Shown]] = {}
    for t in tables:
        for source in t.sources:
            showing.setdefault(source, []).append(t)
    blocks: list[Block] = []
    notes: list[str] = []
    placed: set[str] = set()
    every = {t.id: t.model for t in tables}
    for t in tables:  # a table that shows one analysis is also found by the analysis's id ([[table:fatigue_model]])
        if len(t.sources) == 1:
            every.setdefault(t.sources[0], t.model)
    number = 0

    def put(t: Shown, lead: Iterable[StyledText] = ()) -> None:
        nonlocal number
        if t.id in placed:
            return
        placed.add(t.id)
        number += 1
        model = t.model.with_number(number)
        callout = _callout(t, number, by_analysis, style)
        lead = list(lead)
        if lead:  # the summary sentence and the callout make one paragraph
            lead[-1] = lead[-1] + " " + callout
        blocks.extend(lead or [callout])
        blocks.append(model)

    drawn: dict[str, list[FigureModel]] = {}
    for source, f in figures:
        drawn.setdefault(source, []).append(f)
    figure_number = 0

    def show(source: str) -> None:
        nonlocal figure_number
        for f in drawn.pop(source, []):
            figure_number += 1
            blocks.append(StyledText(f"Figure {figure_number} shows the {f.about or f.title.plain()}."))
            blocks.append(f.with_number(figure_number))

    for t in tables:  # the sample first, with the figures drawn from it
        if t.kind == "descriptives":
            put(t)
            show(t.id)
    for analysis, found in by_analysis.items():
        results = [r for r in found if isinstance(r, Result)]
        kinds = {r.kind for r in found}
        default = "table" if analysis in showing or kinds & _TABLE_FIRST else "text"
        where = place.get(analysis, default)
        if where in ("table", "both") and analysis not in showing and any(not isinstance(r, Description) for r in found):
            made = _table_for(analysis, found, style, lay_out)
            if made is not None:
                showing[analysis] = [made]
                every[made.id] = made.model
                notes.append(f"{analysis}: shown in a table made for it ({made.model.title.plain()}); place = \"text\" writes sentences instead")
        if where in ("text", "both") or analysis not in showing:
            blocks.extend(render(r, "sentence", style) for r in _in_text(results))
            for t in showing.get(analysis, []):
                put(t)
            show(analysis)
            continue
        lead = [render(r, "sentence", style) for r in results if r.kind in _SUMMARY]
        if kinds & {"posthoc_pair"}:  # the test the pairs follow (a repeated-measures ANOVA), then which pairs differ
            lead = [render(r, "sentence", style) for r in results if r.kind != "posthoc_pair"] + \
                [_pairs_summary([r for r in results if r.kind == "posthoc_pair"], style)]
        for t in showing[analysis]:
            put(t, lead)
            lead = []
        show(analysis)
    for t in tables:  # a table whose analyses were all placed in the text still appears
        put(t)
    for source in list(drawn):  # a figure of records no analysis placed (a plan's own)
        show(source)
    return Composed(tuple(blocks), every, tuple(notes))


def _in_text(results: list[Result]) -> list[Result]:
    """The records an analysis placed in the text writes as sentences: not
    an intercept (its table has it), and of a hierarchical regression only
    the steps' changes (each step's model and coefficients are its table)."""
    steps = any(r.kind == "linear_step" for r in results)
    return [r for r in results if not r.details.get("intercept") and not (steps and r.kind != "linear_step")]


def _table_for(analysis: str, found: list[Record], style: "Style", lay_out) -> Shown | None:  # type: ignore[no-untyped-def]
    matrices = [r for r in found if isinstance(r, CorrelationMatrix)]
    if matrices:
        return Shown(analysis, lay_out(matrices[0], style), (analysis,), "correlations")
    results = [r for r in found if isinstance(r, Result)]
    if not results:
        return None
    title = None
    if results[0].kind == "posthoc_pair":
        procedure = results[0].details.get("procedure", "")
        title = f"Pairwise comparisons of {subject(results[0])}" + (f" ({procedure})" if procedure else "")
    elif len({r.kind for r in results}) == 1 and len(results) == 1:
        title = subject(results[0])[:1].upper() + subject(results[0])[1:]
    model = lay_out(results, style, title=title)
    kinds = {r.kind for r in results}
    kind = "regression" if kinds & {"linear_coefficient", "logistic_coefficient"} else "anova" if kinds in ({"anova_term"}, {"anova_oneway"}) else "results"
    return Shown(analysis, model, (analysis,), kind)


def _callout(t: Shown, number: int, by_analysis: Mapping[str, list[Record]], style: "Style") -> StyledText:
    """One sentence that sends the reader to the table (written once per table)."""
    found = [r for s in t.sources for r in by_analysis.get(s, [])]
    results = [r for r in found if isinstance(r, Result)]
    listing = _helpers(style).listing
    head = f"Table {number}"
    if t.kind == "descriptives":
        d = next((r for r in found if isinstance(r, Description)), None)
        group = f" by {d.group_label.lower() if d.group_label[1:2].islower() else d.group_label}" if d is not None and d.group_label else ""
        return StyledText(f"{head} describes the sample{group}.")
    if t.kind == "correlations":
        m = next((r for r in found if isinstance(r, CorrelationMatrix)), None)
        names = listing([m.labels.get(n, n) for n in m.names]) if m is not None else "the variables"
        what = listing(["means", "standard deviations", "correlations"]) if any(c.head.plain() in ("M", "Mean") for c in t.model.columns) else "correlations"
        return StyledText(f"{head} gives the {what} of {names}.")
    mixed = next((r for r in results if r.kind == "mixed_model"), None)
    if mixed is not None:
        return StyledText(f"{head} gives the fixed and random effects of the linear mixed model of {subject(mixed).split(' by ')[0]}.")
    if results and all(r.kind == "model_comparison" for r in results):
        return StyledText(f"{head} compares the nested models of {subject(results[0]).split(' by ')[0]}.")
    if t.kind == "regression" and results:
        model = next((r for r in results if r.kind in _SUMMARY), results[0])
        return StyledText(f"{head} gives the coefficients of the {'logistic' if 'logistic' in model.kind else 'linear'} regression of {subject(model).split(' by ')[0]}.")
    if t.kind == "anova" and results:
        return StyledText(f"{head} gives the analysis of variance of {subject(results[0])}.")
    if results and results[-1].kind == "posthoc_pair":
        return StyledText(f"{head} gives every pair.")
    if results:
        tests = [r for r in results if r.kind != "posthoc_pair"] or results
        pairs = " with their pairwise comparisons" if len(tests) < len(results) else ""
        return StyledText(f"{head} gives the tests of {listing(list(dict.fromkeys(subject(r) for r in tests)))}{pairs}.")
    return StyledText(f"{head} gives {t.model.title.plain()[:1].lower() + t.model.title.plain()[1:]}.")


def _pairs_summary(pairs: Sequence[Result], style: "Style") -> StyledText:
    """One sentence for the pairs of a post hoc analysis: which differ at alpha."""
    from ..styled import escape_markup

    h = _helpers(style)
    first = pairs[0]
    procedure = first.details.get("procedure", "adjusted")
    below = [" vs. ".join(g.label for g in r.groups) for r in pairs if r.p is not None and r.p < r.alpha]
    lead = escape_markup(f"Of the {_NUMBER_WORDS.get(len(pairs), len(pairs))} pairwise comparisons of {subject(first, family=True)} ({procedure}), ")
    p_below = f"had an adjusted {style.symbol('p')} below {h.num.number(first.alpha, 'alpha_level')}"
    if not below:
        return StyledText.from_markup(f"{lead}none {p_below}.")
    count = "all" if len(below) == len(pairs) else _NUMBER_WORDS.get(len(below), str(len(below)))
    return StyledText.from_markup(f"{lead}{count} {p_below}: {escape_markup(h.listing(below))}.")


_NUMBER_WORDS = dict(enumerate("zero one two three four five six seven eight nine".split()))  # APA 7 §6.32: words below 10
