"""TableModel: a manuscript table as data, built once and written by each writer.

The parts follow the anatomy of a journal table (APA 7 §7.8-7.21): a number
and a title above; column heads, optionally grouped under spanners; a stub
column on the left; cells; and notes below (general, specific with
superscript letters, probability). Cells and heads are StyledText, so
italics and superscripts survive into every format.
"""

from __future__ import annotations

import functools
import re
from dataclasses import dataclass, field
from typing import Literal

from ..errors import InputError
from ..styled import StyledText

__all__ = ["Column", "Spanner", "Row", "TableModel", "blank_or_dash", "split_decimal", "styled", "title_case"]

# APA 7 §6.17 (memory): in title case, words of three letters or fewer stay
# lowercase when they are conjunctions, articles or prepositions, unless first.
_MINOR = frozenset("a an and as at but by for if in nor of off on or per so the to up via vs yet".split())


def title_case(text: StyledText) -> StyledText:
    """The title in title case, spans kept (only letter case changes)."""
    out = []
    for i, word in enumerate(text.text.split(" ")):
        if word and (i == 0 or word.lower() not in _MINOR) and not any(ch.isupper() for ch in word[1:]):
            word = word[:1].upper() + word[1:]
        out.append(word)
    cased = " ".join(out)
    return StyledText(cased, text.spans) if len(cased) == len(text.text) else text

Align = Literal["left", "center", "right", "decimal"]

_DASHES = frozenset({"", "—", "–", "-", "−"})
_NUMBER = re.compile(r"(?:[<>≤≥][ \u00a0\u202f]?)?[−+-]?(?:\d[\d,. \u00a0\u202f\u2009]*)?[.,]?\d+")


def _number_shape(cell: StyledText, mark: str) -> str:
    """``number``, ``dash`` (a dash or blank) or ``text``; trailing stars
    and superscript note letters do not count."""
    if not cell.spans:
        return _plain_shape(cell.text)
    text = cell.text.strip()
    if blank_or_dash(cell):
        return "dash"
    end = len(text)
    sup = {i for s in cell.spans if s.style == "sup" for i in range(s.start, s.end)}
    while end and (text[end - 1] == "*" or end - 1 in sup):
        end -= 1
    return "number" if _NUMBER.fullmatch(text[:end]) and ", " not in text and "; " not in text else "text"


DIGITS_AS_ZERO = str.maketrans("123456789", "000000000")  # a number's shape: what layout decisions depend on


def _plain_shape(raw: str) -> str:
    """``_number_shape`` of text without styles (decided once per shape: digits as 0s)."""
    return _shape_kind(raw.translate(DIGITS_AS_ZERO))


@functools.lru_cache(maxsize=4096)
def _shape_kind(raw: str) -> str:
    text = raw.strip()
    if text in _DASHES:
        return "dash"
    return "number" if _NUMBER.fullmatch(text.rstrip("*")) and ", " not in text and "; " not in text else "text"


def blank_or_dash(cell: StyledText) -> bool:
    """A cell holding nothing or only a dash: centred, not aligned on a mark."""
    return cell.text.strip() in _DASHES


def split_decimal(cell: StyledText, mark: str = ".") -> tuple[StyledText, StyledText]:
    """A number cut before its decimal mark: ("−0", ".44"), ("< ", ".001"),
    ("240", ""); a cell without a mark before a digit is all integer part."""
    text = cell.text
    for i, ch in enumerate(text):
        if ch == mark and i + 1 < len(text) and text[i + 1].isdigit():
            return cell.split_at(i)
    return cell, StyledText()


def styled(value: "StyledText | str") -> StyledText:
    """A StyledText from markup text, or the StyledText itself."""
    if isinstance(value, StyledText):
        return value
    return StyledText.from_markup(value)


@dataclass(frozen=True)
class Column:
    head: StyledText
    align: Align = "center"


@dataclass(frozen=True)
class Spanner:
    """A head over columns ``start`` to ``end - 1`` (0-based, stub excluded)."""

    label: StyledText
    start: int
    end: int


@dataclass(frozen=True)
class Row:
    """A stub entry and its cells. A ``heading`` row carries only its stub
    (a variable name over its categories); ``indent`` indents the stub."""

    stub: StyledText
    cells: tuple[StyledText, ...] = ()
    indent: int = 0
    heading: bool = False


@dataclass(frozen=True)
class TableModel:
    title: StyledText
    columns: tuple[Column, ...]
    rows: tuple[Row, ...]
    stub_head: StyledText = field(default_factory=StyledText)
    number: int | None = None
    spanners: tuple[Spanner, ...] = ()
    general_note: StyledText | None = None
    specific_notes: tuple[tuple[str, StyledText], ...] = ()
    probability_note: StyledText | None = None

    def __post_init__(self) -> None:
        width = len(self.columns)
        for i, row in enumerate(self.rows):
            if row.heading and not row.cells:
                continue
            if len(row.cells) != width:
                raise InputError(f"table row {i + 1} ({row.stub.text!r}) has {len(row.cells)} cells; the table has {width} columns")
        last = 0
        for s in sorted(self.spanners, key=lambda s: s.start):
            if not 0 <= s.start < s.end <= width:
                raise InputError(f"spanner {s.label.text!r} covers columns {s.start}-{s.end - 1}; the table has {width}")
            if s.start < last:
                raise InputError(f"spanner {s.label.text!r} overlaps another spanner")
            last = s.end

    def with_number(self, number: int) -> "TableModel":
        from dataclasses import replace

        return replace(self, number=number)

    @property
    def has_notes(self) -> bool:
        return bool(self.general_note or self.specific_notes or self.probability_note)

    def heads_with_spanners(self) -> list[StyledText]:
        """Each column head prefixed by its spanner, for one-row formats (CSV, Markdown)."""
        out = []
        for j, col in enumerate(self.columns):
            span = next((s for s in self.spanners if s.start <= j < s.end), None)
            out.append(span.label + ": " + col.head if span is not None else col.head)
        return out

    def decimal_columns(self, mark: str = ".") -> tuple[bool, ...]:
        """For each column: does it hold single numbers ("2.14", "< .001",
        "−0.44", ".74***", "240") and dashes or blanks only, so that its
        cells align on the decimal ``mark``? Columns of compound cells
        ("2.40 (0.59)", "[0.19, 1.03]") and text stay centred."""
        out = []
        for j, col in enumerate(self.columns):
            if col.align in ("left", "right"):
                out.append(False)
                continue
            cells = [r.cells[j] for r in self.rows if r.cells]
            kinds = [_number_shape(c, mark) for c in cells]
            out.append("text" not in kinds and "number" in kinds)
        return tuple(out)

    def note_parts(self, label: str = "Note.") -> list[StyledText]:
        """The notes in order: ``label`` (the style's: APA's italic "Note.", AMA's none) + general, specific
        (superscript letters), probability."""
        parts: list[StyledText] = []
        if self.general_note:
            parts.append(self.general_note)
        for letter, text in self.specific_notes:
            parts.append(StyledText.styled(letter, "sup") + " " + text)
        if self.probability_note:
            parts.append(self.probability_note)
        if parts and label:
            parts[0] = StyledText.styled(label, "i") + " " + parts[0]
        return parts
