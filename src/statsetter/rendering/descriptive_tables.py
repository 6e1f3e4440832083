"""The descriptives table ("Table 1") as a TableModel, in a style.

Rows follow docs/reporting-rules.md "Tables": categorical rows as n (%) under the
variable's name, continuous rows as M (SD), ordinal rows as Mdn (IQR). Column
heads carry each group's n and the Total's N; a spanner names the grouping
variable. The note defines every abbreviation the table uses, says what the
percentages are of and when they do not total 100, names the test behind each
p (specific notes, superscript letters), and states weighting and suppression.
"""

from __future__ import annotations

import re
from decimal import Decimal
from typing import TYPE_CHECKING

from ..style.numbers import Numbers, numbers_for, round_half_up
from ..style.profile import Style, load_style
from ..styled import StyledText, escape_markup
from .sentences import eponyms
from .tables import Column, Row, Spanner, TableModel

if TYPE_CHECKING:
    import numpy as np

    from ..records import Description, VariableSummary

_OPS = {"=": "", "<": "&lt; ", ">": "&gt; "}
_ABBREVIATIONS = {
    "N": "number of cases in the sample",
    "n": "number of cases in a group or category",
    "M": "mean",
    "SD": "standard deviation",
    "Mdn": "median",
    "IQR": "interquartile range, given as first–third quartile",
    "SMD": "absolute standardised mean difference (Austin, 2009; Yang &amp; Dalton, 2012, for categorical variables)",
}


class _Layout:
    def __init__(self, d: "Description", style: Style) -> None:
        self.d, self.style = d, style
        self.num: Numbers = numbers_for(style)
        self.sep = style.data["numbers"]["list_separator"]
        self.nb = style.keep_together  # the space inside "n = 93", "M = mean", "−1.20; 0.40"
        self.used: list[str] = []  # abbreviations in order of first use
        self.tests: dict[str, str] = {}  # test name -> note letter
        self.rounding = False
        self.suppressed = 0
        self.groups = len(d.columns)

    def sym(self, name: str) -> str:
        if name not in self.used and name in _ABBREVIATIONS:
            self.used.append(name)
        return self.style.symbol(name) if name != "SMD" else "SMD"

    def head(self, key: str, symbols: tuple[str, ...]) -> str:
        """A row's statistic as the style names it (``key`` of its symbols: AMA's "Mean (SD)"), else the symbols'
        "M (SD)"; the abbreviations it shows are defined in the note (AMA's "Mean (SD)" defines SD, not M)."""
        given = self.style.symbols.get(key)
        if given is None:
            return f"{self.sym(symbols[0])} ({self.sym(symbols[1])})"
        plain = StyledText.from_markup(given).plain()
        for name in symbols:
            if re.search(rf"(?<!\w){re.escape(StyledText.from_markup(self.style.symbol(name)).plain())}(?!\w)", plain):
                self.sym(name)
        return given

    # -- cells -------------------------------------------------------------

    def count(self, n: float, of: float, hidden: bool) -> StyledText:
        if hidden:
            return StyledText(f"< {self.num.integer(self.d.suppress_below or 0)}")
        if of <= 0:
            return StyledText(self.num.integer(n))
        return StyledText(f"{self.num.integer(n)} ({self.num.percent(100 * n / of)})")

    def centre_spread(self, centre: float, spread: float) -> StyledText:
        if centre != centre:  # NaN: no values in this column
            return StyledText("—")
        shown = self.num.number(spread, "SD") if spread == spread else "—"  # one value: no SD
        return StyledText(f"{self.num.number(centre, 'M')} ({shown})")

    def quartiles(self, v: "VariableSummary", j: int, decimals: int | None = None) -> StyledText:
        assert v.median is not None and v.q1 is not None and v.q3 is not None
        if v.median[j] != v.median[j]:
            return StyledText("—")
        if v.positions:
            names = v.categories
            return StyledText(f"{names[int(v.median[j])]} ({names[int(v.q1[j])]}–{names[int(v.q3[j])]})")
        q1, q3 = self.num.number(v.q1[j], "Mdn", decimals), self.num.number(v.q3[j], "Mdn", decimals)
        return StyledText(f"{self.num.number(v.median[j], 'Mdn', decimals)} ({self.num.span(q1, q3, v.q1[j] < 0, self.nb)})")

    def scored_decimals(self, v: "VariableSummary") -> int | None:
        """The decimals an ordinal variable's quartiles have (``score_decimals``), when fewer than the style's: "2 (2–3)"
        or "2.5 (2.0–3.0)"; the same for every column of the row."""
        from ..style.numbers import score_decimals

        if v.kind != "ordinal" or v.positions or v.median is None or v.q1 is None or v.q3 is None:
            return None
        decimals = score_decimals(x for a in (v.median, v.q1, v.q3) for x in a)
        return None if decimals is None else min(decimals, self.num.decimals_for("Mdn"))

    def span(self, v: "VariableSummary", j: int) -> StyledText:
        assert v.minimum is not None and v.maximum is not None
        if v.minimum[j] != v.minimum[j]:
            return StyledText("—")
        lo, hi = self.num.number(v.minimum[j], "M"), self.num.number(v.maximum[j], "M")
        return StyledText(self.num.span(lo, hi, v.minimum[j] < 0, self.nb))

    # -- rows --------------------------------------------------------------

    def extra(self, v: "VariableSummary", first: bool) -> list[StyledText]:
        """The p and SMD cells, filled on a variable's first row only."""
        out = []
        if any(x.test is not None for x in self.d.variables):
            out.append(self.p_cell(v) if first else StyledText())
        if any(x.smd is not None for x in self.d.variables):
            smd = "" if not first or v.smd is None or v.smd != v.smd else self.num.number(v.smd, "d")
            out.append(StyledText(smd))
        return out

    def p_cell(self, v: "VariableSummary") -> StyledText:
        if v.test is None or v.test.p is None or v.test_name is None:
            return StyledText()
        op, text = self.num.p(v.test.p, v.test.alpha)
        letter = self.tests.setdefault(v.test_name, "abcdefghijklmnopqrstuvwxyz"[len(self.tests)])
        return StyledText.from_markup(f"{_OPS[op]}{text}<sup>{letter}</sup>")

    def stub(self, v: "VariableSummary", what: str) -> StyledText:
        alpha = ""
        if v.alpha is not None:
            alpha = f" ({self.style.symbol('alpha')}{self.nb}={self.nb}{self.num.number(v.alpha, 'alpha')})"
        return StyledText.from_markup(f"{escape_markup(_named(v.label, v.name))}{alpha}, {what}")

    def variable_rows(self, v: "VariableSummary") -> list[Row]:
        n = self.sym("n")
        if v.kind == "nominal":
            return self.category_rows(v, self.stub(v, self.style.symbols.get("n_percent", f"{n} (%)")))
        rows: list[Row] = []
        first = True
        if v.kind == "continuous" and v.mean is not None and "mean_sd" in v.show:
            assert v.sd is not None
            what = self.head("mean_sd", ("M", "SD"))
            cells = [self.centre_spread(v.mean[j], v.sd[j]) for j in range(self.groups)]
            rows.append(Row(self.stub(v, what), tuple(cells + self.extra(v, True))))
            first = False
        if v.kind == "ordinal" or "median_iqr" in v.show:
            what = self.head("median_iqr", ("Mdn", "IQR"))
            decimals = self.scored_decimals(v)
            cells = [self.quartiles(v, j, decimals) for j in range(self.groups)]
            label = self.stub(v, what) if first else StyledText.from_markup(what)
            rows.append(Row(label, tuple(cells + self.extra(v, first)), indent=0 if first else 1))
            first = False
        if "range" in v.show:
            cells = [self.span(v, j) for j in range(self.groups)]
            rows.append(Row(StyledText("Range"), tuple(cells + self.extra(v, False)), indent=1))
        if "skew" in v.show and v.skew is not None:
            cells = [StyledText(self.num.number(v.skew[j], "skew") if v.skew[j] == v.skew[j] else "—") for j in range(self.groups)]
            rows.append(Row(StyledText("Skewness"), tuple(cells + self.extra(v, False)), indent=1))
        if v.kind == "ordinal" and "counts" in v.show:
            rows += self.category_rows(v, None)
        elif v.missing[-1] > 0:
            rows.append(self.missing_row(v))
        return rows

    def category_rows(self, v: "VariableSummary", heading: StyledText | None) -> list[Row]:
        import numpy as np

        assert v.counts is not None
        base = v.n if self.d.percent_of == "valid" else v.n + v.missing
        counts = np.vstack([v.counts.T, v.missing]) if v.missing[-1] > 0 else v.counts.T  # categories (+ missing) × columns
        hidden = _suppress(counts, self.d.suppress_below) if self.d.suppress_below else np.zeros(counts.shape, bool)
        self.suppressed += int(hidden.sum())
        rows = []
        if heading is not None:
            rows.append(Row(heading, tuple([StyledText()] * self.groups + self.extra(v, True))))
        with_missing_pct = self.d.percent_of == "all"
        for i, name in enumerate(v.categories):
            cells = [self.count(counts[i, j], base[j], hidden[i, j]) for j in range(self.groups)]
            rows.append(Row(StyledText(name), tuple(cells + self.extra(v, False)), indent=1))
        if v.missing[-1] > 0:
            i = len(v.categories)
            cells = [self.count(counts[i, j], base[j] if with_missing_pct else 0, hidden[i, j]) for j in range(self.groups)]
            rows.append(Row(StyledText("Missing"), tuple(cells + self.extra(v, False)), indent=1))
        if not hidden.any():
            self.rounding |= self.rounds_off(counts[: len(v.categories)], base) or (with_missing_pct and self.rounds_off(counts, base))
        return rows

    def missing_row(self, v: "VariableSummary") -> Row:
        hidden = _suppress(v.missing[None, :], self.d.suppress_below)[0] if self.d.suppress_below else [False] * self.groups
        self.suppressed += int(sum(hidden))
        cells = [self.count(v.missing[j], 0, hidden[j]) for j in range(self.groups)]
        return Row(StyledText("Missing"), tuple(cells + self.extra(v, False)), indent=1)

    def rounds_off(self, counts: "np.ndarray", base: "np.ndarray") -> bool:
        """Whether the printed percentages of some column do not total 100."""
        decimals = self.num.decimals_for("percent")
        for j in range(counts.shape[1]):
            if base[j] > 0:
                total = sum(round_half_up(100 * c / base[j], decimals) for c in counts[:, j])
                if total != Decimal(100):
                    return True
        return False


def _suppress(counts: "np.ndarray", below: int | None) -> "np.ndarray":
    """Primary suppression of counts from 1 to ``below`` − 1, then secondary
    suppression so that no hidden count can be recovered by subtraction: in
    every category column (whose total is the group's n, shown in the head)
    and every row (whose last cell, Total, is the sum of the groups) with
    exactly one hidden cell, the smallest other non-zero cell is hidden too."""
    import numpy as np

    hidden = (counts > 0) & (counts < (below or 0))
    if not hidden.any():
        return hidden
    changed = True
    while changed:
        changed = False
        for axis in (0, 1):
            lines = hidden if axis == 0 else hidden.T
            values = counts if axis == 0 else counts.T
            for j in range(lines.shape[1]):
                line, vals = lines[:, j], values[:, j]
                if line.sum() == 1:
                    open_ = np.flatnonzero(~line & (vals > 0))
                    if open_.size:
                        line[open_[np.argmin(vals[open_])]] = True
                        changed = True
    return hidden


def descriptive_table(d: "Description", style: "Style | str | None" = None, *, number: int | None = None, title: str | None = None) -> TableModel:
    """Lay out a Description in the style: one column per group plus Total,
    optional p and SMD columns, and notes for everything the table abbreviates."""
    resolved = load_style(style)
    lay = _Layout(d, resolved)
    rows = [row for v in d.variables for row in lay.variable_rows(v)]
    total_sym = lay.sym("N")
    columns = []
    for j, name in enumerate(d.columns):
        sym = lay.sym("n") if d.group is not None and j < len(d.columns) - 1 else total_sym
        nb = lay.nb  # "(n = 93)" never breaks in a head
        columns.append(Column(StyledText.from_markup(f"{escape_markup(name)} ({sym}{nb}={nb}{lay.num.integer(d.column_n[j])})")))
    if any(v.test is not None for v in d.variables):
        columns.append(Column(StyledText.from_markup(resolved.symbol("p"))))
    if any(v.smd is not None for v in d.variables):
        columns.append(Column(StyledText.from_markup(lay.sym("SMD"))))
    spanners = (Spanner(StyledText(_named(d.group_label or d.group or "", d.group or "")), 0, len(d.columns) - 1),) if d.group is not None else ()
    if title is None:
        title = f"Characteristics of the sample by {d.group_label}" if d.group is not None else "Characteristics of the sample"
    return TableModel(
        title=StyledText(title),
        columns=tuple(columns),
        rows=tuple(rows),
        stub_head=StyledText("Variable"),
        number=number,
        spanners=spanners,
        general_note=_general_note(d, lay),
        specific_notes=tuple((letter, StyledText.from_markup(eponyms(f"{name}.", lay.style))) for name, letter in lay.tests.items()),
    )


_PLAIN_WORDS = re.compile(r"[a-z]+(?: [a-z]+)*")


def _named(label: str, name: str) -> str:
    """A stub's or spanner's name in sentence case, as a stub starts: a label with its first letter capital (labels are
    often written for the middle of a sentence, "flipper length (mm)"; not "pH" or "iPhone", whose second letter is a
    capital), and a column without one whose name is plain lowercase words ("age", "sex"); any other name (bmi_z, QID4,
    TVnews) as it is."""
    if label == name and not _PLAIN_WORDS.fullmatch(name):
        return label
    return label[:1].upper() + label[1:] if label[:1].islower() and not label[1:2].isupper() else label


def _general_note(d: "Description", lay: _Layout) -> StyledText:
    parts = []
    nb = lay.nb  # "M = mean" is not split at a line end either
    defined = [f"{lay.style.symbol(a) if a != 'SMD' else 'SMD'}{nb}={nb}{_ABBREVIATIONS[a]}" for a in lay.used]
    if defined:
        parts.append("; ".join(defined) + ".")
    if any(v.counts is not None for v in d.variables):
        if d.percent_of == "valid":
            parts.append("Percentages are of the cases with a value on the variable; missing counts are shown without percentages.")
        else:
            parts.append("Percentages are of all cases, missing values included.")
    if lay.rounding:
        parts.append("Percentages may not total 100 because of rounding.")
    if any(v.positions for v in d.variables):
        parts.append("Quartiles of ordered categories are the categories at those points of the distribution.")
    if d.weights:
        parts.append(
            f"Counts, percentages, means, SDs and quartiles are weighted by {escape_markup(d.weights)}; n are sums of weights, rounded; "
            "SDs use the sum of weights minus 1 as the denominator; quartiles are weighted (inverted distribution function)."
        )
    if d.dropped_no_group:
        parts.append(f"{lay.num.integer(d.dropped_no_group)} cases with no value on {escape_markup(d.group_label or '')} are left out.")
    if d.suppress_below:
        k = lay.num.integer(d.suppress_below)
        parts.append(
            f"To protect confidentiality, counts from 1 to {lay.num.integer(d.suppress_below - 1)} are shown as “&lt; {k}”, "
            f"and further cells are hidden so that they cannot be recovered by subtraction ({lay.suppressed} cells hidden in all)."
        )
    tested = [v for v in d.variables if v.test is not None]
    if tested:
        parts.append(f"Each {lay.style.symbol('p')}{lay.style.keep_together}value is from the test named under its letter.")
    return StyledText.from_markup(" ".join(parts)) if parts else StyledText()
