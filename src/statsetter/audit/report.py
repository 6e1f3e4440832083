"""Auditing a manuscript: every reported statistic, its findings and the
restyled text, as a terminal table, JSON, CSV or a commented copy of a .docx.

A finding is a reason to look, not proof of an error: one-sided tests,
corrections and rounding conventions differ, and the text around a number
may explain it.
"""

from __future__ import annotations

import re

import csv
import io
import json
from dataclasses import dataclass, replace
from pathlib import Path
from typing import Iterator, Sequence

from ..pvalues import p_from_statistic
from ..records.result import _collector_paused, _unchecked_maker
from ..rendering.sentences import render
from ..styled import StyledText
from ..style.numbers import numbers_for
from ..style.profile import Style, load_style
from .checks import _LEVEL_NAMED, CODES, RATIOS, FORMER_CODES, SEVERITIES, Finding, _overlap, any_df_range, ci_p_agreement, coefficient_p, coefficient_ratio, corrected_df, corrected_p_fits, df_that_fit, p_range, p_span, rank_sum_bound, rank_sum_p, rank_sum_z, rank_test_r, reported_p_range, spearman_fits, squares_fit, consistency, effect_from_f_or_chi2, effect_from_t, grim, impossible, interval_fits_se, ratio_fits, style_findings, to_record, unlevelled, verdict_word
from .parsing import _SIGNIFICANCE, Number, _patterns, _sentence_start, Reported, coefficient_before, coefficient_lead, comma_typed, decimal_mark_of, find_statistics, group_sizes, icc_form, is_wald, ns_after, p_text
from .counts import CountTest, _cell_entry, count_tests, counts_fit, fraction_tests, size_tests
from .means import GroupMeans, category_means, group_means, means_fit
from .models import _R2_ROW, ModelFit, model_fit, model_fits
from .tables import ONE_COEFFICIENT, Reading, Squares, _totals, design_readings, df_readings, note_cells, star_bounds, table_statistics, undefined_marks
from .reading import Unit, read_units
from .word import _P_IN_TEXT, _UNMADE, house_text, named, restyled, same_p, threshold_p

__all__ = ["Entry", "audit_file", "audit_units", "as_json", "as_csv", "CAUTION"]

RULES = "docs/reporting-rules.md in statsetter's source"

CAUTION = (
    "A finding is a reason to look, not proof of an error: one-sided tests, corrections and rounding "
    "conventions differ. Check each against the analysis output, the journal's instructions and, where it matters, a statistician."
)


@dataclass(frozen=True, slots=True)
class Entry:
    location: str
    found: str
    findings: tuple[Finding, ...]
    suggestion: str
    unit: Unit
    start: int
    end: int
    notes: tuple[str, ...] = ()  # what the audit assumed instead of finding (say, a p adjusted by a procedure the text names)
    revision: StyledText | None = None  # the house-style text for a tracked change (asked for with restyle=True); None: left as typed
    kept: str = ""  # why a statistic with a different house-style text is left as typed
    recheck: "tuple[Reported, str] | None" = None  # the statistic (with the df read) and the reading the consistency check used
    p_given: str = ""  # the p as typed ("p < .05", "ns") when the revision puts another in its place; "" when it keeps it

    @property
    def checked(self) -> str:
        """What the consistency check recomputed (the df, and the reading of it when the context gave it), said when
        asked: the p range's ends of a consistent statistic are computed only then (``checks.consistency``)."""
        return _recomputed(*self.recheck) if self.recheck is not None else ""

    @property
    def codes(self) -> list[str]:
        return list(dict.fromkeys(f.code for f in self.findings))  # (two findings of one kind: the code once)

    @property
    def severity(self) -> str:
        """The gravest of the findings ("error", "warning", "style"), "" for none."""
        return min((f.severity for f in self.findings), key=SEVERITIES.index, default="")

    def at_least(self, severity: str) -> "Entry":
        """The entry with only the findings of ``severity`` or graver."""
        keep = SEVERITIES.index(severity)
        return replace(self, findings=tuple(f for f in self.findings if SEVERITIES.index(f.severity) <= keep))

    def comment(self, findings: Sequence[Finding] | None = None, *, revised: bool = False, kept: str | None = None) -> str:
        """A Word comment in plain sentences, the severity first (on
        ``findings``, by default all of them); a statistic revised in the
        house style says so, one left as typed says why."""
        chosen = self.findings if findings is None else tuple(findings)
        severity = min((f.severity for f in chosen), key=SEVERITIES.index, default="note")
        said, seen = [], set()
        for f in chosen:  # one sentence per finding; evidence shared with the one before is not repeated
            evidence = f" ({f.evidence})" if f.evidence and f.evidence not in seen else ""
            said.append(f"{f.message.rstrip('.')}{evidence}.")
            seen.add(f.evidence)
        if revised:
            said.append(f"The statistic is restyled in the tracked change; {self._numbers_said()}")
        elif kept or (kept is None and self.kept):
            said.append(f"Not restyled: {kept or self.kept}.")
        if self.suggestion and (self.suggestion != self.found or any(f.severity == "style" for f in chosen)):  # (the text as typed: nothing to suggest)
            said.append(f"Suggested: {self.suggestion}")
        return f"{severity.capitalize()}: " + " ".join(said)

    def _numbers_said(self) -> str:
        """Whether the revision keeps the reported numbers, or which p it puts in place of a threshold or "ns"."""
        given = self.p_given
        if not given:
            return "its numbers are as reported."
        source = "the p the bound allows" if "(p from the bound)" in self.suggestion else "recomputed from the statistic and its df"
        return f"its numbers are as reported except the p, which is {source} (the text gave \u201c{given}\u201d)."

    @property
    def message(self) -> str:
        return " ".join(f"{f.message} ({f.evidence})" if f.evidence else f.message for f in self.findings)

    def row(self) -> dict[str, object]:
        return {"location": self.location, "found": self.found, "severity": self.severity, "codes": self.codes, "message": self.message,
                "suggestion": self.suggestion, "former_codes": [FORMER_CODES.get(c, c) for c in self.codes], "notes": list(self.notes),
                "recomputed": self.checked}


def _suggest(rep: Reported, style: Style, alpha: float, findings: Sequence[Finding] = (), house: "StyledText | None | object" = _UNMADE) -> str:
    """The statistic restyled (``house``: its `house_text`, when made already). A p the audit found not to follow
    from the statistic is never repeated: the suggestion carries the p recomputed from the printed statistic and df,
    and says so."""
    if rep.symbol is None and rep.effects and rep.estimate is not None and rep.ci is None:  # a table's B and SE with its exp(B)
        return ""  # beside them ("b (SE) | IRR | p"): no record takes the B, and the ratio restyled alone would drop it
    if rep.symbol is None and rep.descriptives:  # descriptives without a test: each symbol as the style sets it, the words between kept
        new = house_text(rep, style, alpha) if house is _UNMADE else house
        return new.plain() if isinstance(new, StyledText) else ""
    if rep.symbol is None and not rep.effects:
        if rep.p is None or rep.p.op == "ns" or rep.p.number is None or not 0 <= rep.p.number.value <= 1:
            return ""
        if rep.estimate is not None and rep.estimate.start >= rep.start:  # an estimate read with its interval and p (a table's):
            return ""  # its p alone restyled would read as the whole statistic's (a p after a B typed before it is restyled alone)
        if any(f.code in ("coefficient-does-not-fit", "ci-p-disagree") for f in findings):
            return ""  # (the p itself is in doubt: restyled, it would read as confirmed)
        if rep.p.op != "=":
            kept = threshold_p(rep, style)
            return kept.plain() if kept is not None else ""
        num = numbers_for(style)
        op, text = num.p(rep.p.number.value, alpha, held=rep.p.number.decimals) if rep.p.number.value > 0 else num.p(0.0, alpha)
        return StyledText.from_markup(style.symbol("p")).plain() + f" {op} {text}"
    doubted = any(f.code == "p-does-not-follow" for f in findings)
    if rep.op != "=":  # a bound ("F < 1") gives no exact p: a doubted p or "ns" is replaced by the p the bound allows, and says so
        new = house_text(rep, style, alpha, with_p=not doubted) if doubted or house is _UNMADE else house
        if not isinstance(new, StyledText):
            return ""
        allowed = doubted or (rep.p is not None and rep.p.op == "ns")
        return new.plain() + (" (p from the bound)" if allowed and _P_IN_TEXT.search(new.plain()) else "")
    in_doubt = any(f.code in ("means-do-not-fit", "counts-do-not-fit") for f in findings)  # (the statistic itself, its p with it)
    if not doubted and not in_doubt:  # a p the text did not give (none, a threshold or "ns" made exact) is marked as recomputed
        new = house_text(rep, style, alpha) if house is _UNMADE else house
        if not isinstance(new, StyledText):
            return ""  # a record the renderer cannot take: no suggestion
        added = _P_IN_TEXT.search(new.plain()) is not None and (rep.p is None or _p_given(rep, new, style) != "")
        return new.plain() + (" (p recomputed)" if added else "")
    try:
        record = to_record(rep, alpha, style)
        if in_doubt:  # the statistic itself is in doubt (the
            record = replace(record, p=None, precision={k: v for k, v in record.precision.items() if k != "p"})  # table's
            return named(rep, render(record, "stats", style), style).plain() + " (p left out: the statistic itself does not follow from the table's numbers beside it)"
        if any(f.code == "typo-fits" for f in findings):  # the p may be right and a df or the value mistyped
            record = replace(record, p=None, precision={k: v for k, v in record.precision.items() if k != "p"})
            return named(rep, render(record, "stats", style), style).plain() + " (p left out: it follows with one other number typed otherwise)"
        if doubted and record.statistic is not None and (record.statistic.df or record.statistic.symbol == "z"):  # (a z needs none)
            recomputed = p_from_statistic(record.statistic.symbol, record.statistic.value, record.statistic.df)
            record = replace(record, p=recomputed, precision={k: v for k, v in record.precision.items() if k != "p"})
            return named(rep, render(record, "stats", style), style).plain() + " (p recomputed)"
        if doubted:  # no df, and none of those the text allows gives the p: no p to offer in its place
            record = replace(record, p=None, precision={k: v for k, v in record.precision.items() if k != "p"})
            return named(rep, render(record, "stats", style), style).plain() + " (p left out: no df the text allows gives the reported p)"
        return named(rep, render(record, "stats", style), style).plain()
    except Exception:  # a record the renderer cannot take (say, an impossible value): no suggestion
        return ""


_LONG_NUMBER = re.compile(r"\d{101,}")
# a multiple-comparison procedure named in the paragraph (or the table's note): its p values are adjusted and
# cannot be recomputed from one statistic
_PROCEDURE = re.compile(
    r"(?i:\bTukey|\bHSD\b|Scheff[ée]|Dunnett|[ŠS]id[áa]k|Games[-–\s]Howell|Bonferroni|\bHolm\b|Hochberg|\bFDR\b|false discovery rate"
    r"|adjusted p|p[- ]values? (?:were |was )?(?:adjusted|corrected)|corrected for multiple|correct(?:ion|ing) for multiple"
    r"|multiple[- ]comparisons? correction|multiple[- ]testing correction)"
)


@dataclass(frozen=True, slots=True)
class _Item:
    unit: Unit
    rep: Reported  # what the consistency checks see (a table row's p and df included)
    local: Reported | None  # the statistic as typed in the unit's text, for the style checks; None for a table row's numbers
    readings: tuple[Reading, ...] = ()  # the df its context allows, when it has none
    how: str = ""  # where its parts were found, when not in one piece of text
    context: str = ""  # the text around it that may name a procedure (paragraph; a table's caption, cells and note)
    coefficient: "tuple[Number, Number] | None" = None  # a table row's B and SE beside its Wald
    squares: "Squares | None" = None  # an ANOVA row's SS, df and MS and its error row's (tables.Squares)
    counts: "CountTest | None" = None  # a categorical variable's counts by group, which give its χ² and p (counts.CountTest)
    means: "GroupMeans | None" = None  # the groups' means, SDs and sizes beside a t or F (means.GroupMeans)
    model: "ModelFit | None" = None  # a model's R², predictors and N beside its F, in a table of models side by side (models.ModelFit)
    marks: tuple[str, ...] = ()  # the marks of significance the table uses and its caption and note do not define (its first such cell's item)


_DIGIT = re.compile(r"\d")


def _has_digit(text: str) -> bool:
    """Whether ``text`` has a digit as ``\\d`` reads one: ten substring tests (a fast scan each), the regex only beyond ASCII."""
    return any(d in text for d in "0123456789") or (not text.isascii() and _DIGIT.search(text) is not None)


def _long_number(text: str) -> "re.Match[str] | None":
    """A run of more than 100 digits: every run of 101 characters holds one of every 101st, so those are tested first."""
    return _LONG_NUMBER.search(text) if _DIGIT.search(text[::101]) is not None else None
# "ns", "n.s." or "n. s." as the parser reads a p (a word of its own), more loosely: a paragraph without a digit is read only
# when it has one (not for every "sessions" or "conditions" of the prose, which had sent most digitless paragraphs to the parser)
_NS = re.compile(r"n(?<![\w.]n)\.?\s?s(?!\w)")
_RIGHT_AFTER = re.compile(r"\s*[,;]\s*")  # what stands between a statistic and the one typed right after it, "U = 234.5, z = −2.61"
_SIZE_TYPED = re.compile(r"[nN](?:\s?[12₁₂])?\s*[=¼]")  # an n, n₁ or n₂ and its "=": a group size may be typed
_SIZE_TOTAL = re.compile(r"N(?<![\w]N)\s*=\s*(\d{1,6})(?![\d.,]\d)")  # the literal first: the engine's fast scan


# a heading or paragraph that begins another study's report: the N of the text before is not its sample's
_NEW_SAMPLE = re.compile(r"\s*(?:(?:In|For)\s+)?(?:Study|Experiment|Sample|Phase)\s+(?:\d+[a-z]?|[IVX]+|One|Two|Three|Four|Five)\b")


# a coefficient named just before a t ("β = −0.61, t = −4.14", "b = 0.52, SE = 0.21, t = 2.48"): the t is a model's
_COEFFICIENT_NEAR = re.compile(r"(?:β|[Bb]eta|(?<![\w.])[Bb](?![\w.]))\s*[=¼]")


# a correlation with covariates partialled out ("partial r", "controlling for age and sex"): its df are not N − 2
_PARTIAL = re.compile(r"(?i)\bpartial\b|\bsemi-?partial\b|\bcontroll?(?:ing|ed) for\b|\badjust(?:ing|ed) for\b")


# a p said to come from another method than the statistic's distribution: Fisher's exact test beside a χ², a
# permutation, bootstrap or Monte Carlo p (practice)
# ("exact p" alone is not one: authors say so of a p printed exactly, not as a threshold)
_OTHER_P = re.compile(r"(?i)\bexact (?:test|two-sided|one-sided|binomial|method)|\bfisher|mid-p|permutation|bootstrap|monte[- ]carlo|simulated p"
                      r"|randomi[sz]ation test|resampl")
# a sphericity correction named near an F ("Greenhouse–Geisser", "Huynh-Feldt", "lower-bound", ε)
_SPHERICITY_SAID = re.compile(r"(?i)greenhouse|geisser|huynh|feldt|lower[- ]bound|sphericity|ε|epsilon")
# a t said to be Welch's: its df are not the group sizes' n₁ + n₂ − 2
_WELCH = re.compile(r"(?i)\bwelch|unequal variances|equal variances (?:were )?not assumed|separate[- ]variances?")


def _a_coefficients_t(text: str, rep: Reported, previous_end: int) -> bool:
    """Whether a t without df is a model's coefficient's: a β or B in its own clause or in the 120 characters before
    it (not before the value of the statistic ahead of it)."""
    return any(e.name == "beta" for e in rep.effects) or _COEFFICIENT_NEAR.search(text, max(previous_end, rep.start - 120), rep.start) is not None


# a table note's next paragraph: a probability note ("*p < .05. **p < .01."), a letter's note or another "Note" (not the
# next table's label in Markdown's bold, "**Table 3**")
_NOTE_GOES_ON = re.compile(rf"\s*(?:[{_SIGNIFICANCE}]{{1,4}}\s*[pP]\s*[<≤]|[a-d]\s?[A-Z]|Note\b)")


_PANDOC_CAPTION = r"Table:|: "  # pandoc's caption line, above or under its table
# a table's own caption: its label ("Table 3", "**Table 3**", "TABLE IV"), pandoc's caption, LaTeX's \caption
_TABLE_LABEL = re.compile(rf"\s*(?:[*_]{{0,2}}(?:Table|TABLE|Tab\.)\s*[0-9IVXA-Z]|{_PANDOC_CAPTION})|[\s\S]*\\caption\b")
_CAPTION_BELOW = re.compile(rf"\s*(?:{_PANDOC_CAPTION})")  # (typed under the table, where a note stands)


def _items(units: Sequence[Unit], mark: str) -> "Iterator[_Item]":
    """The statistics of the units in document order: a paragraph's as the
    parser finds them, a table's read cell by cell and row by row."""
    i = 0
    last_total: int | None = None  # the last "N = …" of the text before: the sample a df may come from
    while i < len(units):
        unit = units[i]
        if unit.cell is None:
            if _NEW_SAMPLE.match(unit.text):  # "Study 2", "Experiment 3: Method", "In Study 2, …": the N before is another sample's
                last_total = None
            if not _has_digit(unit.text) and _NS.search(unit.text) is None:  # no statistic without a digit, but for a bare "ns"
                i += 1
                continue
            totals = [int(m.group(1)) for m in _SIZE_TOTAL.finditer(unit.text)]
            previous_end = 0  # the end of the last statistic with a head (a B and SE are looked for after it)
            previous_value = 0  # the end of its value (a β before a t may stand in the clause of the statistic before)
            for rep in find_statistics(unit.text, mark):
                readings: tuple[Reading, ...] = ()
                if rep.symbol == "t" and not rep.df and _a_coefficients_t(unit.text, rep, previous_value):
                    pass  # a model's coefficient: its df are the model's residual df, which no N and no group sizes give
                elif rep.symbol in ("r", "rs") and not rep.df and _PARTIAL.search(unit.text, max(previous_value, rep.start - 160), rep.start):
                    pass  # a partial correlation: N − 2 less one df for each covariate, which the N does not say
                elif rep.symbol == "t" and not rep.df and _WELCH.search(unit.text, max(previous_value, rep.start - 160), rep.end + 60):
                    # Welch's t: its df lie anywhere from the smaller group's n − 1 to n₁ + n₂ − 2 — a range, checked as one
                    readings = tuple(df_readings("t", list(group_sizes(unit.text, rep, mark) or ()), None, "beside it", welch=True))
                elif rep.symbol in ("t", "r", "rs") and not rep.df:
                    sizes = group_sizes(unit.text, rep, mark)
                    total = int(rep.n.value) if rep.n is not None and rep.n.value >= 3 else totals[0] if totals else last_total
                    where = "beside it" if rep.n is not None else "in the paragraph" if totals else "earlier in the text"
                    # (a t said to be paired, or a model's — "adjusted for", ANCOVA —: not two groups' df)
                    design = design_readings("t", unit.text[max(previous_value, rep.start - 160) : rep.end + 60], "", list(sizes or ()), total, where,
                                             rep.n is None, "its sentence") if rep.symbol == "t" else None
                    readings = design if design is not None else tuple(df_readings(rep.symbol, list(sizes or ()), total, where, total_guessed=rep.n is None))
                elif rep.symbol == "chi2" and not rep.df and is_wald(unit.text, rep) and coefficient_before(unit.text, rep, previous_end, mark):
                    readings = (ONE_COEFFICIENT,)
                yield _new_item(unit, rep, None if rep.plural else rep, readings, "", unit.text, None)  # (a plural head's: not restyled)
                previous_end = rep.end if rep.symbol is not None else previous_end
                previous_value = rep.value.end if rep.symbol is not None and rep.value is not None else previous_value
            last_total = totals[-1] if totals else last_total
            i += 1
            continue
        j = i
        while j < len(units) and units[j].cell is not None and units[j].cell[0] == unit.cell[0] and units[j].part == unit.part:  # type: ignore[index]
            j += 1
        body = [u.text for u in units[max(0, i - 2) : i] if u.cell is None and u.part == unit.part]
        note = units[j].text if j < len(units) and units[j].cell is None and units[j].part == unit.part else ""
        for k in range(j + 1, min(j + 3, len(units))):  # APA's notes stand in paragraphs of their own: general, specific, probability
            if units[k].cell is not None or units[k].part != unit.part or not _NOTE_GOES_ON.match(units[k].text):
                break
            note += " " + units[k].text
        caption = " ".join(body)
        labelled = any(_TABLE_LABEL.match(t) for t in body)
        below = units[j].text if note else ""
        if not labelled and _CAPTION_BELOW.match(below):  # pandoc's "Table: …" under the table: the table's own caption
            caption, labelled = below, True
        cells = [(u.cell[1], u.cell[2], u, find_statistics(u.text, mark)) for u in units[i:j]]  # type: ignore[index]
        context = " ".join([caption, note] + [u.text for u in units[i:j]])
        said = f"{caption} {note} {note_cells(cells)}"  # (a note typed in the table's own last row is its note too, as some authors type it)
        found, used = table_statistics(cells, caption, mark, star_bounds(said, mark), said, welch=_WELCH.search(said) is not None,  # (Welch's t's: a df range)
                                       labelled=labelled)
        read = used | {id(t.local) for t in found if t.local is not None}  # (made once: a set per statistic had made a long table quadratic)
        items = [_Item(t.unit, t.rep, t.local, t.readings, t.how, context, t.coefficient, t.squares) for t in found]
        unmarked = undefined_marks(cells, said)
        if unmarked is not None:  # (the first cell so marked: an entry of its own, its statistic's if one was read there)
            at = next((k for k, it in enumerate(items) if it.unit is unmarked[0]), None)
            items = items + [_Item(unmarked[0], _cell_entry(unmarked[0]), None, context=context, marks=tuple(unmarked[1]))] if at is None else \
                items[:at] + [replace(items[at], marks=tuple(unmarked[1]))] + items[at + 1:]
        if any("(" in u.text or "±" in u.text or "%" in u.text or "ercent" in u.text or "SD" in u.text or "S.D" in u.text or "td" in u.text
               for _, _, u, _ in cells):  # (a count's cell has its percent in parentheses, or a column of its own under "%"; a mean
            # its ± or (SD), or a column of its own under "SD")
            tests = count_tests(cells, mark, said) + fraction_tests(cells) + size_tests(cells, caption, said)
            typed = {id(t.typed) for t in tests if t.typed is not None}  # (tests typed whole in a cell: their cells' statistics)
            items = _with_counts(items, tests, context)
            read |= typed
            welch = _WELCH.search(said) is not None
            beside = {id(m.unit): replace(m, welch=welch) for m in group_means(cells, said)}
            items = [replace(it, means=beside[id(it.unit)]) if id(it.unit) in beside and it.rep.symbol in ("t", "F") else it for it in items]
            read_cells = {id(it.unit): k for k, it in enumerate(items)}
            for m in (replace(g, welch=welch) for g in category_means(cells, said, mark)):
                how = (f"the mean ± SD of each of {len(m.groups)} categories with its n in the rows under the variable, the test's value on "
                       f"the first ({m.rep.symbol}: df from their n's)")  # type: ignore[union-attr]
                k = read_cells.get(id(m.unit))
                if k is None:
                    items.append(_Item(m.unit, m.rep, None, (), f"read from the table's row: {how}, its p", context, means=m))  # type: ignore[arg-type]
                elif items[k].rep.symbol == m.rep.symbol and not items[k].rep.df:  # (read from an "F" or "t" column: its df are the n's)
                    df = tuple(d.value for d in m.rep.df)  # type: ignore[union-attr]
                    items[k] = replace(items[k], means=m, how=f"{items[k].how}, {how}", readings=(Reading(df, f"df = {', '.join(f'{d:g}' for d in df)}, from the categories' n's"),))
        if any(_R2_ROW.fullmatch(u.text) for _, c, u, _ in cells if c == 1):  # (a row of R² under models side by side)
            taken = {id(it.unit) for it in items}
            items += [_Item(m.unit, m.rep, None, (), f"read from the table's column: its F row, R² row{', ΔR² row' if m.delta else ''}, "
                                                     f"{m.k} coefficients above them, N = {m.n} ({m.n_said})", context, model=m)
                      for m in model_fits(cells, said, mark, star_bounds(said, mark)) if id(m.unit) not in taken]
        items += [_Item(u, rep, rep, context=context) for _, _, u, reps in cells for rep in reps if id(rep) not in read]
        yield from sorted(items, key=lambda it: (it.unit.cell, it.rep.start))  # type: ignore[arg-type, return-value]
        i = j



def _with_counts(items: list[_Item], tests: "list[CountTest]", context: str) -> list[_Item]:
    """The table's items with each categorical variable's counts: a χ² already read from its column takes the df its
    counts give (and the counts, to be held to); a χ² in a column of mixed heads ("χ2/Z") or a p alone becomes an item
    (its own cell's statistic, restyled in place, where it was typed whole in a cell)."""
    by_unit = {id(it.unit): k for k, it in enumerate(items) if it.rep.symbol == "chi2"}
    by_rep = {id(it.rep): k for k, it in enumerate(items)}  # (a test typed whole in a cell: the cell's own statistic)
    for test in tests:
        if test.other and test.counts and len(test.counts) * len(test.counts[0]) > 4:  # (said, never silent; not of a block without a test)
            test = replace(test, how=f"{test.how}; " + (f"its p held to Fisher's exact test of the whole table as well, which the table names ({test.other!r}), "
                                                        "where the table is small enough to enumerate" if test.exact else
                                                        f"not held to them: the caption or note names {test.other!r}, which a table larger than 2 × 2 may have had"))
        df = test.df
        reading = (Reading((df,), f"df = {df:g}, (categories − 1) × (groups − 1) of the counts in its rows"),) if df else ()
        k = by_rep.get(id(test.typed), by_unit.get(id(test.unit)))
        if k is not None:
            old = items[k]
            items[k] = replace(old, readings=old.readings if old.rep.df or old.rep.symbol != "chi2" else reading, how=", ".join(x for x in (old.how, test.how) if x),
                               counts=test)
        else:
            items.append(_Item(test.unit, test.typed or test.rep, test.typed, reading if test.rep.symbol == "chi2" else (),  # (a χ² whose p
                               # is the cell's next paragraph: the p held to the counts only, never written into the χ²'s paragraph)
                               f"read from the table's row: {test.how}",
                               context, counts=test))
    return items


# a statistic's item and entry set slot by slot (the frozen dataclasses' __init__ costs a few microseconds; 10,000 per 1,000 pages)
_new_item = _unchecked_maker(_Item, {}, ("unit", "rep", "local", "readings", "how", "context", "coefficient"))  # (a sentence's: no squares)
_new_entry = _unchecked_maker(Entry, {}, ("location", "found", "findings", "suggestion", "unit", "start", "end", "notes", "revision", "kept",
                                          "recheck"))


_SPAN = re.compile(r"gives p from \S+ to \S+;")


def _consistency(item: _Item, alpha: float) -> "tuple[list[Finding], tuple[Reported, str] | None]":
    """Consistency findings and the statistic and reading recomputed (for ``Entry.checked``); a statistic without df
    is recomputed under each df its context allows, and a finding is made only when none fits."""
    rep = item.rep
    if rep.df or not item.readings:
        return consistency(rep, alpha), (rep, "")
    tried: list[tuple[Reported, list[Finding], Reading]] = []
    for reading in item.readings:
        candidate = replace(rep, df=tuple(Number(f"{d:g}", d, 0, rep.start, rep.start) for d in reading.df), p_range=None)
        if reading.df_high is not None:  # a df anywhere in a range
            high = replace(rep, df=(Number(f"{reading.df_high:g}", reading.df_high, 0, rep.start, rep.start),), p_range=None)
            span, reported = p_span(rep, [reading.df, (reading.df_high,)]), reported_p_range(rep, alpha)
            if span is None or reported is None:
                continue
            if _overlap(span, reported):
                return [], (high, reading.assumption)
            candidate = high  # (the findings' codes from n₁ + n₂ − 2, which gives the smallest p's; their evidence the whole span)
            found = [Finding(f.code, f.message, _SPAN.sub(f"gives p from {span[0]:.4g} to {span[1]:.4g} over those df;", f.evidence, count=1))
                     for f in consistency(candidate, alpha)]
        else:
            found = consistency(candidate, alpha)
        if not _recomputed(candidate, ""):
            continue
        if not found:
            return [], (candidate, reading.assumption)
        tried.append((candidate, found, reading))
    if not tried:
        return [], None
    candidate, found, _ = tried[0]
    readings = "; ".join(r.assumption for _, _, r in tried)
    guessed = all(r.guessed for _, _, r in tried)  # only from an N not given with the statistic
    # (a p that fits a one-sided test under the guessed df is that, when the text says the test was one-tailed)
    doubted = {"p-does-not-follow"} if _one_sided_said(item.unit.text, rep) is not None else {"p-does-not-follow", "one-sided"}
    fit = df_that_fit(rep, alpha) if guessed and any(f.code in doubted for f in found) else None
    if fit is not None:  # other df give the p: a sample other than the one guessed (a subgroup?)
        low, high = fit
        other = f"df = {low}" if low == high else f"df from {low} to {high}" if high is not None else f"df of {low} or more"
        evidence = f"{found[0].evidence}; no reading of the df fits: {readings}; {other} would"
        return ([Finding("df-unstated", f"The statistic gives no df, and none of the df the text suggests fits its p; {other} would. "
                                        "Report the df, and check which sample the test used.", evidence)],
                (candidate, tried[0][2].assumption))
    return ([Finding(f.code, f.message, f"{f.evidence}; no reading of the df fits: {readings}") for f in found],
            (candidate, tried[0][2].assumption))


def _recomputed(rep: Reported, assumption: str) -> str:
    """What the consistency check recomputed, to reproduce a finding ("" when nothing was)."""
    computed = p_range(rep)
    anywhere = computed is None and not rep.df and rep.value is not None
    if anywhere:
        computed = any_df_range(rep)
    if computed is None or (rep.p is None and rep.shared_p is None) or rep.value is None:
        return ""
    df = f"({', '.join(f'{d.value:g}' for d in rep.df)})" if rep.df else ""
    over = " over every df it may have (none given)" if anywhere else ""
    said = f"p recomputed from {rep.symbol}{df} {rep.op} {rep.value.text}{over}: {computed[0]:.4g} to {computed[1]:.4g}"
    if rep.p is None and rep.shared_p is not None and rep.shared_p.number is not None:  # checked against a bound it shares
        said += f", against {rep.shared_p.symbol_text} {rep.shared_p.op} {rep.shared_p.number.text}"
    return said + (f", with {assumption}" if assumption else "")


def reading_mark(units: Sequence[Unit], style: Style, requested: str = "auto") -> tuple[str, str]:
    """The decimal mark to read the manuscript with, and why (said to the user)."""
    if requested in (".", ","):
        return requested, f"numbers read with the decimal mark {requested!r} (as asked)"
    if requested != "auto":
        from ..errors import InputError

        raise InputError(f"--decimal-mark: {requested!r} is not '.', ',' or 'auto'")
    if style.decimal_mark == "." and not any(comma_typed(u.text) for u in units):
        return ".", ""  # no number typed with a decimal comma: the style's point (the points left uncounted: a third of the time)
    found = decimal_mark_of(u.text for u in units)
    if found is None or found[0] == style.decimal_mark:
        return style.decimal_mark, ""
    mark, commas, points = found
    kind = "commas" if mark == "," else "points"
    return mark, (f"numbers read with decimal {kind}: the manuscript types {max(commas, points)} numbers with a decimal {kind[:-1]} "
                  f"and {min(commas, points)} the other way (--decimal-mark to choose)")


def _above_unadjusted(rep: Reported, alpha: float) -> bool:
    """Whether the reported p could be an adjusted one: every multiple-comparison
    adjustment (Bonferroni, Holm, Šidák, Tukey, Scheffé, FDR) makes p larger,
    so a p below the unadjusted one is wrong whatever procedure the text names."""
    computed, reported = p_range(rep), reported_p_range(rep, alpha)
    return computed is None or reported is None or reported[1] >= computed[0]


_BETA = re.compile(r"β|\bbeta\b")  # a standardized coefficient named beside a b
# an interval of another shape than a Wald interval's, said in its paragraph or table: a bootstrap's, a Bayesian posterior's,
# an exact logistic model's median-unbiased estimate's (a ratio is not held to its centre or p there)
_OTHER_INTERVAL = re.compile(r"(?i)bootstrap|credib|bayes|posterior|median[- ]unbiased")
_ONE_SIDED_SAID = re.compile(r"(?i)(?:one|(?<![\d.])1)[- ]?(?:tailed|sided)|directional")


_STEP_BETWEEN = re.compile(r"[\s,;]*(?:and\s+)?")  # between a step's ΔR² and its F ("ΔR² = .05, F(1, 96) = 5.32")


def _one_sided_said(text: str, rep: Reported) -> "re.Match[str] | None":
    """Where the text around a statistic says its test was one-tailed (the 120 characters before it to 40 after)."""
    return _ONE_SIDED_SAID.search(text, max(0, rep.start - 120), min(len(text), rep.end + 40))


def audit_units(
    units: Sequence[Unit], style: "Style | str | None" = None, *, alpha: float = 0.05, grim_items: int | None = None,
    suggest_all: bool = False, check_italics: bool = False, restyle: bool = False, decimal_mark: str = "auto",
) -> list[Entry]:
    """Every statistic of the units with its findings; a suggestion for each
    statistic with findings (for every statistic with ``suggest_all``); with
    ``restyle``, the house-style text a tracked change can put in its place.
    Italics are judged only where the manuscript italicises some statistical
    symbols (then the others are inconsistent) or when ``check_italics``.
    Numbers are read with ``decimal_mark`` ("." or ","); "auto" reads them
    as the manuscript types them (`reading_mark`), and a mark other than the
    style's is then a style finding."""
    with _collector_paused():  # the audit's objects hold no reference cycles; collections over them are wasted work
        return _audit_units(units, style, alpha=alpha, grim_items=grim_items, suggest_all=suggest_all, check_italics=check_italics,
                            restyle=restyle, decimal_mark=decimal_mark)


def _audit_units(
    units: Sequence[Unit], style: "Style | str | None" = None, *, alpha: float = 0.05, grim_items: int | None = None,
    suggest_all: bool = False, check_italics: bool = False, restyle: bool = False, decimal_mark: str = "auto",
) -> list[Entry]:
    resolved = load_style(style)
    mark = reading_mark(units, resolved, decimal_mark)[0]
    entries, reps, houses = [], [], []
    italic_seen = False  # does the manuscript italicise any statistical symbol?
    for unit in units:
        long = _long_number(unit.text)
        if long:  # not a statistic anyone typed: said, with its place, and not read
            import warnings

            where = unit.location if unit.part else f"line {unit.index + unit.text.count(chr(10), 0, long.start())}"
            warnings.warn(f"{where}: a number of {len(long.group()):,} digits is not read as a statistic", stacklevel=2)
    current: Unit | None = None
    step: "tuple[Unit | None, int, list]" = (None, 0, [])  # the last R² change read without a head: its unit, its end, the effects
    named_in: "tuple[str | None, re.Match[str] | None]" = (None, None)  # the procedure a context names, for the last context asked
    first_level: "tuple[dict[int, int], int] | None" = None  # each unit's place, and the first that names an interval's level
    for item in _items(units, mark):
        unit, rep, local = item.unit, item.rep, item.local
        if unit is not current:
            current = unit
            previous_end = 0  # the end of the last statistic with a head, for the B and SE before a t
            previous: Reported | None = None  # (and that statistic: a U before its z, a z before its r)
            counted, lines, newline = 0, 0, -1  # newlines before position `counted`, and the last of them (one pass per unit)
        consistent, recheck = _consistency(item, alpha)
        before = None  # the B and SE the sentence gives before a t or z (or a Wald χ²)
        if local is not None and (local.symbol in ("t", "z") or (local.symbol == "chi2" and is_wald(unit.text, local))):
            before = coefficient_before(unit.text, local, previous_end, mark)
            if before is not None and rep.ci is not None and rep.estimate is None and rep.symbol in ("t", "z") and \
                    not _BETA.search(unit.text, previous_end, local.start):
                rep.estimate = before[0]  # "b = 0.42, SE = 0.10, t(196) = 4.20, p < .001, 95% CI [0.22, 0.62]": the interval is b's
                # (with a β beside the b, whose interval it is is not said: neither is checked)
        lead = coefficient_lead(unit.text, local, previous_end, mark) if local is not None and local.symbol is None and local.p is not None else None
        if lead is not None and lead[2] is not None:  # "b = 0.42, SE = 0.10, 95% CI [0.22, 0.62], p < .001": the p's B and interval
            rep = replace(rep, ci=lead[2], estimate=lead[0])
        elif lead is not None and rep.ci is not None and rep.estimate is None:  # "b = 0.42, SE = 0.10, p < .001, 95% CI [0.22, 0.62]"
            rep = replace(rep, estimate=lead[0])  # (the interval after the p: the B's, as before it)
        findings = impossible(rep) + consistent
        ns_note = ""
        if local is not None:
            findings += style_findings(local, resolved, alpha, unit.text, unit.italic, mark, unit.equations)
            if unit.cell is None:  # (a table's head or note names its intervals' level)
                bare = unlevelled(local, unit.text)
                if bare:  # (a paragraph before it may name the level for the text: "95% CIs are given in brackets")
                    if first_level is None:
                        order = {id(u): i for i, u in enumerate(units)}
                        first_level = (order, next((i for i, u in enumerate(units) if _LEVEL_NAMED.search(u.text)), len(units)))
                    if first_level[1] >= first_level[0].get(id(unit), 0):
                        findings += bare
            if local.symbol == "t" and local.effects:
                findings += effect_from_t(local, group_sizes(unit.text, local, mark))
            elif local.symbol == "U" and _SIZE_TYPED.search(unit.text) is not None:  # (group sizes only where an n is typed)
                sizes = group_sizes(unit.text, local, mark)
                findings += rank_sum_bound(local, sizes) + rank_sum_p(local, sizes, alpha)
            elif previous is not None and local.symbol in ("z", "r") and _RIGHT_AFTER.fullmatch(unit.text, previous.end, local.start) \
                    and _SIZE_TYPED.search(unit.text) is not None:  # the statistic just before it: "U = 234.5, z = −2.61" (the U's z),
                sizes = group_sizes(unit.text, local, mark)  # "z = −3.12, p = .002, r = .45 (N = 48)" (the z's r, |z|/√N)
                if local.symbol == "z":
                    findings += rank_sum_z(local, previous, sizes)
                elif previous.symbol == "z":
                    start = _sentence_start(_patterns(mark), unit.text, 0, local.start)
                    ns = _totals(unit.text[start : local.start]) + ([int(local.n.value)] if local.n is not None and local.n.value >= 2 else []) + \
                        ([sizes[0] + sizes[1]] if sizes is not None else [])
                    findings += rank_test_r(local, previous, ns)
            verdict = ns_after(unit.text, local)
            if verdict is not None:  # "p = .012, n.s.": the author's verdict beside the p
                disagree = verdict_word(local, alpha, unit.text[local.p.start : verdict.end()])  # type: ignore[union-attr]
                procedure = _PROCEDURE.search(item.context) if disagree else None
                if procedure is not None:  # a corrected alpha the text names: the verdict may be the corrected test's
                    ns_note = (f"The text calls it not significant beside a p below alpha = {alpha:g}; it names a multiple-comparison "
                               f"procedure (\"{procedure.group()}\"), so the verdict is read as the corrected alpha's and not checked.")
                else:
                    findings += disagree
            if before is not None:
                findings += coefficient_ratio(local, before)
            if local.symbol is not None:
                previous_end, previous = local.end, local
                italic_seen = italic_seen or bool(unit.italic and any(s <= local.symbol_start < e for s, e in unit.italic))
        unheld: list[str] = []  # (what counts_fit could not hold the p to, said in the notes)
        if item.counts is not None:  # a categorical variable's χ² and p against its counts
            findings += counts_fit(item.counts, alpha, unheld)
        if item.means is not None:  # a t (or F) against the two groups' means, SDs and sizes beside it
            findings += means_fit(rep, item.means)
        if item.model is not None:  # a model's F against its R², predictors and N, in a table of models side by side
            findings += model_fit(item.model)
        if item.marks:  # a table's marks of significance that its note does not define
            findings.append(Finding("marks-undefined", f"The table marks values with {', '.join(item.marks)}, which its caption and note do not define; "
                                                       "define each in a probability note (*p < .05. **p < .01. ***p < .001.) — its marked values "
                                                       "are not checked meanwhile.", " ".join(item.marks)))
        if item.squares is not None:  # an ANOVA row's SS, MS and F against each other and its error row's
            findings += squares_fit(rep, item.squares)
        if item.coefficient is not None:  # a table row's Wald, its B and SE from their columns (its p, where no test is given)
            findings += coefficient_ratio(rep, item.coefficient) + coefficient_p(rep, item.coefficient, alpha)
        if lead is not None and lead[1] is not None:
            findings += coefficient_p(rep, lead[:2], alpha)
        se = item.coefficient[1] if item.coefficient is not None else lead[1] if lead is not None else \
            before[1] if before is not None and rep.estimate is before[0] else None  # (a t's B and SE typed before it: its interval's)
        if se is not None and rep.ci is not None and rep.estimate is not None and \
                not any(f.code in ("ci-excludes-estimate", "ci-reversed") for f in findings):  # (a coefficient's or mean difference's interval)
            findings += interval_fits_se(rep.ci, se, rep.estimate if rep.symbol == "t" else None)  # (a t's interval: B ± t·SE)
        if local is None and rep.symbol == "t" and rep.effects:  # a table row's t with its d (d_z where the table says one sample)
            findings += effect_from_t(rep)
        disagree = []
        if (rep.ci is not None or rep.effects) and rep.p is not None:
            disagree = ci_p_agreement(rep, alpha)
            if disagree and _one_sided_said(unit.text, rep) is None:  # a one-tailed p: no disagreement
                findings += disagree
        if any(e.ci is not None and e.name in RATIOS for e in rep.effects) and \
                not any(f.code in ("ci-excludes-estimate", "ci-reversed", "impossible-value") for f in findings) \
                and _OTHER_INTERVAL.search(item.context or unit.text) is None:  # (a bootstrap's or a posterior's interval: its own shape)
            findings += ratio_fits(rep, alpha, with_p=not disagree and _one_sided_said(unit.text, rep) is None)
        if rep.symbol == "F" and local is not None and step[0] is unit and _STEP_BETWEEN.fullmatch(unit.text, step[1], rep.start):
            findings += effect_from_f_or_chi2(replace(rep, effects=rep.effects + step[2]))  # "ΔR² = .05, F(1, 96) = 5.32"
        elif rep.symbol in ("F", "chi2", "Q") and rep.effects:
            findings += effect_from_f_or_chi2(rep)
        if local is not None and rep.symbol is None and rep.p is None and rep.effects and all(e.name in ("delta_R2", "R2", "R2_adj") for e in rep.effects):
            step = (unit, rep.end, rep.effects)  # a regression step's R² change just before its F: the F's (checked with it)
        if rep.symbol == "F":
            findings += corrected_df(rep)
        if grim_items:
            findings += grim(rep, grim_items)
        if unit.part:  # a Word paragraph
            location = f"{unit.location}, characters {rep.start + 1}–{rep.end}"
        else:  # a text block starting at line unit.index; columns as written in the file
            if rep.start > counted:
                lines += unit.text.count("\n", counted, rep.start)
                found = unit.text.rfind("\n", counted, rep.start)
                newline = found if found >= 0 else newline
                counted = rep.start
            line = unit.index + lines
            line_start = unit.source_index(newline) + 1 if newline >= 0 else 0
            # opening markers included (a pipe table's cell starts where its origin's first trace puts it)
            first = unit.source_index(rep.start - 1) + 1 if rep.start > 0 else unit.origin[0][1][0] if unit.cell is not None else 0
            last = unit.source_index(rep.end - 1) + 1
            location = f"line {line}, characters {first - line_start + 1}–{last - line_start}"
        notes: list[str] = [f"Read from a table: {item.how.removeprefix('read from the table' + chr(39) + 's row: ')}."] if item.how else []
        if ns_note:
            notes.append(ns_note)
        notes += unheld
        if lead is not None:
            notes.append(f"Checked with the B typed before it (B = {lead[0].text}" + (f", SE = {lead[1].text}" if lead[1] is not None else "")
                         + (f", {lead[2].level * 100:g}% CI [{lead[2].low.text}, {lead[2].high.text}]" if lead[2] is not None else "") + ").")
        if any(f.code == "p-does-not-follow" for f in findings) and _above_unadjusted(rep, alpha):
            if item.context is not named_in[0]:  # a table's items share their context: searched once, not once an item
                named_in = (item.context, _PROCEDURE.search(item.context))
            named = named_in[1]
            if named is not None:  # the text says its p values are adjusted: a note, not a finding
                findings = [f for f in findings if f.code not in ("p-does-not-follow", "verdict-changes")]
                notes.append(f"The p differs from the one recomputed from the statistic alone; the text names a multiple-comparison "
                             f"procedure (\"{named.group()}\"), so it is read as adjusted and not checked.")
        if any(f.code == "p-does-not-follow" for f in findings) and rep.p is not None:
            method = _OTHER_P.search(unit.text, max(0, rep.p.start - 60), min(len(unit.text), rep.p.end + 40))
            if method is not None:  # an exact, permutation or resampled p: not the statistic's distribution's
                findings = [f for f in findings if f.code not in ("p-does-not-follow", "verdict-changes")]
                notes.append(f"The p differs from the one recomputed from the statistic's distribution; the text says it came from "
                             f"another method (\"{method.group()}\"), so it is not checked against it.")
        if rep.symbol == "F" and any(f.code == "p-does-not-follow" for f in findings) and \
                _SPHERICITY_SAID.search(unit.text, max(0, rep.start - 200), min(len(unit.text), rep.end + 80)):
            eps = corrected_p_fits(rep, alpha)
            if eps is not None:  # the p is the corrected test's, printed beside the uncorrected df
                evidence = next(f.evidence for f in findings if f.code == "p-does-not-follow")
                findings = [f for f in findings if f.code not in ("p-does-not-follow", "verdict-changes")]
                findings.append(Finding("uncorrected-df", f"The p fits the sphericity-corrected test (ε from {eps[0]:.3g} to {eps[1]:.3g}), "
                                                          "not the df printed: give the corrected df, F(ε·df₁, ε·df₂).", evidence))
        if rep.symbol == "rs" and any(f.code in ("p-does-not-follow", "one-sided") for f in findings):
            fits = spearman_fits(recheck[0] if recheck is not None and not rep.df else rep, alpha)
            if fits is not None:  # R's p for ρ (exact or AS 89), not the t approximation: a small sample's p from R
                findings = [f for f in findings if f.code not in ("p-does-not-follow", "verdict-changes", "one-sided")]
                notes.append(f"The p fits Spearman's test as R's cor.test computes it (p from {fits[0]:.4g} to {fits[1]:.4g}: exact over the "
                             "permutations up to 9 pairs, AS 89's Edgeworth series up to 1,290), not the t approximation.")
        if any(f.code == "one-sided" for f in findings):
            said = (_one_sided_said(unit.text, rep) or (_ONE_SIDED_SAID.search(item.how) if item.how else None)  # (a table's "Sig. (1-tailed)")
                    or (_ONE_SIDED_SAID.search(item.context) if unit.cell is not None else None))  # (a table's note: "*p < .05, one-tailed")
            if said is not None:  # the text says the test was one-sided, and the p fits one
                findings = [f for f in findings if f.code != "one-sided"]
                notes.append(f"The p fits a one-sided test, as the text says (\"{said.group()}\").")
        house = house_text(rep, resolved, alpha) if restyle and local is rep and (findings or suggest_all) else _UNMADE  # made once for both
        # a Wald χ² beside its B and SE has 1 df, whether typed or not: suggested with it (a t's df read from group sizes or N
        # are assumptions, said in the JSON's `recomputed`, and stay out of the suggestion)
        basis = recheck[0] if recheck is not None and item.readings == (ONE_COEFFICIENT,) else rep
        suggestion = _suggest(basis, resolved, alpha, findings, house if basis is rep else _UNMADE) if (findings or suggest_all) and item.model is None else ""
        # (a model's F in a table of models side by side: its df are the audit's reading of the column and the caption's N)
        form = icc_form(rep)
        if suggestion and form is not None:  # the ICC's form as typed (ICC(2,1): which estimator), which the style's symbol leaves out
            suggestion = suggestion.replace("ICC", form.replace(" ", ""), 1)
        entries.append(_new_entry(location, rep.text.replace("\u200b", "") if "\u200b" in rep.text else rep.text, tuple(findings), suggestion, unit, rep.start, rep.end, tuple(notes), None, "", recheck))
        if restyle:  # what a revision needs (held only then: the parsed statistics are most of an audit's memory)
            reps.append(local)
            houses.append(house)
    if not (check_italics or italic_seen):  # plain symbols throughout: a choice of the manuscript, not an inconsistency
        entries = [_without(e, "italics", suggest_all) for e in entries]
    if restyle:  # a table row's bare numbers are never rewritten
        entries = [replace(e, revision=new, kept=why, p_given=_p_given(rep, new, resolved)) for e, rep, (new, why) in
                   ((e, rep, restyled(rep, resolved, alpha, e.findings, mark, e.unit.italic, house, e.unit.subscripts) if rep is not None else (None, ""))
                    for e, rep, house in zip(entries, reps, houses))]
    return entries


def _p_given(rep: "Reported | None", new: "StyledText | None", style: Style) -> str:
    """The p as the text gave it ("p < .05", "n.s.") when the revision ``new`` puts another p in its place — a threshold
    or "ns" made the exact p the style asks for, or the p a bound allows; "" when it keeps the reported p (restyled,
    rounded as the style rounds) or gives none."""
    if new is None or rep is None or rep.p is None:
        return ""
    shown = _P_IN_TEXT.search(new.plain())
    if shown is None:
        return ""
    inside = rep.start <= rep.p.start < rep.p.end <= rep.start + len(rep.text)
    given = rep.text[rep.p.start - rep.start : rep.p.end - rep.start].strip() if inside else ""
    if not given:  # a p a table's cell or mark gave (its place is not in the statistic's text): as a text gives it
        given = p_text(rep.p).lstrip(", ")
    return "" if same_p(rep.p, shown, style.decimal_mark) else given


def _without(e: Entry, code: str, suggest_all: bool) -> Entry:
    kept = tuple(f for f in e.findings if f.code != code)
    if len(kept) == len(e.findings):
        return e
    return replace(e, findings=kept, suggestion=e.suggestion if kept or suggest_all else "")


def audit_file(
    path: "str | Path", style: "Style | str | None" = None, *, alpha: float = 0.05, encoding: str = "utf-8", grim_items: int | None = None,
    suggest_all: bool = False, check_italics: bool = False, restyle: bool = False, decimal_mark: str = "auto",
) -> list[Entry]:
    """Every statistic in the manuscript at ``path`` (never modified)."""
    return audit_units(read_units(path, encoding), style, alpha=alpha, grim_items=grim_items, suggest_all=suggest_all, check_italics=check_italics,
                       restyle=restyle, decimal_mark=decimal_mark)


def as_json(entries: Sequence[Entry]) -> str:
    return json.dumps([e.row() for e in entries], ensure_ascii=False, indent=1)


def as_csv(entries: Sequence[Entry]) -> str:
    buffer = io.StringIO()
    writer = csv.writer(buffer, lineterminator="\n")
    writer.writerow(["location", "found", "severity", "codes", "message", "suggestion"])
    for e in entries:
        writer.writerow([e.location, e.found, e.severity, " ".join(e.codes), e.message, e.suggestion])
    return buffer.getvalue()


# the notes that stand for a p not checked, or checked otherwise than from the statistic's own distribution, as the
# terminal's summary counts them (the start of each note, and what the summary says of them)
_NOTE_SUMMARIES = (
    ("The p differs from the one recomputed from the statistic alone", "p value(s) read as adjusted by a procedure their text names, not checked"),
    ("The p differs from the one recomputed from the statistic's distribution", "p value(s) said to come from another method (exact, permutation, resampled), not checked"),
    ("The p fits a one-sided test", "p value(s) fitting a one-sided test, as the text says"),
    ("The p fits none of the χ² tests of the counts; Fisher's exact test", "p value(s) of a table whose named exact test is too large to compute here, not checked"),
    ("The p fits Spearman's test as R", "Spearman p value(s) fitting R's cor.test, not the t approximation"),
)


def print_table(entries: Sequence[Entry], *, everything: bool = False) -> None:
    from rich.console import Console
    from rich.table import Table

    console = Console()
    table = Table(show_lines=False, header_style="bold")
    for name in ("Location", "Found", "Severity", "Codes", "Suggestion"):
        table.add_column(name, overflow="fold")
    shown = by_severity([e for e in entries if everything or e.findings])
    for e in shown:
        table.add_row(e.location, e.found, e.severity or "—", " ".join(e.codes) or "—", e.suggestion if e.findings else "")
    if shown:
        console.print(table)
    flagged = sum(1 for e in entries if e.findings)
    counts = ", ".join(f"{sum(1 for e in entries if e.severity == s)} {s}" for s in SEVERITIES)
    console.print(f"{len(entries)} statistics found, {flagged} with findings (gravest finding: {counts}).")
    for start, said in _NOTE_SUMMARIES:  # (a table statistic's note on how it was read is no such case)
        count = sum(1 for e in entries if any(n.startswith(start) for n in e.notes))
        if count:
            console.print(f"{count} {said} (the notes in --json say which).")
    if flagged:
        used = sorted({c for e in entries for c in e.codes})
        for code in used:
            console.print(f"  {code}: {CODES[code][0]} [{CODES[code][1]}]", highlight=False)
        console.print(f"  The rules in brackets, with their sources: {RULES}", highlight=False)
    console.print(CAUTION, style="italic")


def by_severity(entries: Sequence[Entry]) -> list[Entry]:
    """Errors first, then warnings, then style findings, then clean statistics; document order within each."""
    order = {s: i for i, s in enumerate(SEVERITIES)}
    return sorted(entries, key=lambda e: order.get(e.severity, len(SEVERITIES)))
