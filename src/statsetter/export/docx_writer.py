"""Word output: StyledText as runs, TableModel as an APA-style table.

Tables follow APA 7 §7.8-7.21: the number in bold on its own line, the title
in italic title case below it; horizontal rules only (above and below the
column heads, under each spanner, at the bottom); heads centred, stub left;
``Note.`` in italic below. The header rows repeat on every page and rows do
not split across pages. Runs use the document's own Normal style and fonts.
"""

from __future__ import annotations

from pathlib import Path
import functools
import io
import re
import warnings
from xml.sax.saxutils import escape as _escape
from typing import TYPE_CHECKING, Any, Iterable, NamedTuple, Sequence

from ..styled import StyledText
from ..rendering.tables import _DASHES, DIGITS_AS_ZERO, TableModel, _number_shape, _shape_kind, blank_or_dash, split_decimal, title_case

if TYPE_CHECKING:
    from docx.document import Document
    from docx.text.paragraph import Paragraph
    from docx.text.run import Run

    from ..records import Result
    from ..style.profile import Style

__all__ = ["add_runs", "add_table", "results_document", "save_document"]

_WNS = "http://schemas.openxmlformats.org/wordprocessingml/2006/main"


_NOT_XML = re.compile("[\x00-\x08\x0b\x0c\x0e-\x1f\ufffe\uffff\ud800-\udfff]")
_NEEDS_CARE = re.compile("[&<>\x00-\x08\x0b\x0c\x0e-\x1f\ufffe\uffff\ud800-\udfff]")  # to escape, or not storable


def xml_safe(text: str) -> str:
    """``text`` without the characters XML 1.0 forbids (control characters
    such as those pasted from other programs), which Word cannot store; a
    warning names the text they were removed from."""
    if not _NOT_XML.search(text):
        return text
    clean = _NOT_XML.sub("", text)
    warnings.warn(f"removed control characters that Word cannot store from {clean[:60]!r}", stacklevel=2)
    return clean


def add_runs(paragraph: "Paragraph", text: StyledText) -> None:
    """Append ``text`` to ``paragraph`` as runs: italic, superscript, subscript."""
    for chunk, styles in text.segments():
        style_run(paragraph.add_run(xml_safe(chunk)), styles)


def style_run(run: "Run", styles: frozenset[str]) -> None:
    """Italic, superscript or subscript as the text's styles say."""
    if "i" in styles:
        run.italic = True
    if "sup" in styles:
        run.font.superscript = True
    elif "sub" in styles:
        run.font.subscript = True


def _t_open(text: str) -> str:
    """A w:t's opening tag: ``xml:space="preserve"`` only where the text starts or ends with white space (any
    Unicode white space, to be safe), which Word would otherwise drop (memory); most cells are numbers, and
    the XML is smaller without it."""
    return '<w:t xml:space="preserve">' if text and (text[0].isspace() or text[-1].isspace()) else "<w:t>"


_LINE_EDGE_SPACE = re.compile(r"\n(?:(?<=[^\S\n]\n)|[^\S\n])")  # a line break after or before white space (literal first)


def _run_xml(text: StyledText) -> str:
    if not text.spans:  # plain text, the common case in a table's body: one run
        return f'<w:r>{_t_open(text.text)}{_escape(xml_safe(text.text))}</w:t></w:r>' if text.text else ""
    out = []
    for chunk, styles in text.segments():
        props = ""
        if styles:
            props = "<w:rPr>" + ("<w:i/>" if "i" in styles else "")
            if "sup" in styles:
                props += '<w:vertAlign w:val="superscript"/>'
            elif "sub" in styles:
                props += '<w:vertAlign w:val="subscript"/>'
            props += "</w:rPr>"
        out.append(f'<w:r>{props}{_t_open(chunk)}{_escape(xml_safe(chunk))}</w:t></w:r>')
    return "".join(out)


_RULE_XML = '<w:{0} w:val="single" w:sz="8" w:space="0" w:color="000000"/>'
_NIL_XML = '<w:{0} w:val="nil"/>'


@functools.lru_cache(maxsize=None)
def _borders(top: bool, bottom: bool) -> str:
    """A ruled cell's borders; a cell without a rule has none of its own (the table's borders are all nil)."""
    if not (top or bottom):
        return ""
    return (
        "<w:tcBorders>"
        + (_RULE_XML if top else _NIL_XML).format("top")
        + _NIL_XML.format("left")
        + (_RULE_XML if bottom else _NIL_XML).format("bottom")
        + _NIL_XML.format("right")
        + "</w:tcBorders>"
    )


TABLE_TEXT = "StatsetterTableText"  # the style id of table cells' paragraphs


def table_style_id(line: int) -> str:
    return TABLE_TEXT if line == 240 else f"{TABLE_TEXT}{line}"


def add_table_text_style(document: "Document", line: int = 240) -> str:
    """The paragraph style of table cells, added to ``document`` once: based
    on its default paragraph style (so the font is the text's), spaced
    ``line`` (240 = single) with no space before or after and no first-line
    indent whatever that style says, each paragraph kept with the next (a
    table and its note are not parted by a page break). One style instead
    of the same properties on every cell: smaller files, and an editor can
    change a manuscript's table text in one place. A style of that id already
    in the document (a chapter filled twice, or edited) is kept as it is."""
    from docx.oxml import parse_xml

    style_id = table_style_id(line)
    styles = document.styles.element
    if styles.get_by_id(style_id) is not None:
        return style_id
    default = next((st.get(f"{{{_WNS}}}styleId") for st in styles.findall(f"{{{_WNS}}}style")
                    if st.get(f"{{{_WNS}}}type") == "paragraph" and st.get(f"{{{_WNS}}}default") in ("1", "true", "on")), None)
    if default is None and styles.get_by_id("Normal") is not None:  # LibreOffice writes Normal without marking it default
        default = "Normal"
    name = "Table text (statsetter)" if line == 240 else f"Table text, line {line / 240:g} (statsetter)"
    based = f'<w:basedOn w:val="{_escape(default, {chr(34): "&quot;"})}"/>' if default else ""
    styles.append(parse_xml(
        f'<w:style xmlns:w="{_WNS}" w:type="paragraph" w:customStyle="1" w:styleId="{style_id}"><w:name w:val="{name}"/>{based}'
        f'<w:pPr><w:keepNext/><w:spacing w:before="0" w:after="0" w:line="{line}" w:lineRule="auto"/>'
        '<w:ind w:left="0" w:firstLine="0"/></w:pPr></w:style>'))
    return style_id


_JC = {"left": "left", "right": "right"}


_DECIMAL_TAB = '<w:tabs><w:tab w:val="decimal" w:pos="{pos}"/></w:tabs>'


# Column widths from content (twips, 1/1440 inch). A character of 11–12 pt
# Times or Calibri is about half an em wide; digits are exactly that. The
# estimate errs wide so that no word breaks inside itself in Word or LibreOffice.
_MARGIN = 100  # each cell's left and right margin, set in the table so that Word and LibreOffice agree
# both cell margins as LibreOffice's default (0.1 inch), wider than the table's own: the slack keeps numbers whole in an
# author's chapter set in a wider font than the Times-like advances ``_chars`` assumes (with the table's own 2 × 100,
# the demo's chapter in DejaVu Sans broke "7.95" as "7" / ".95": tried and reverted)
_PAD = 2 * 144
_HANG = 240  # continuation lines of a wrapped stub label are indented this much
TEXT_WIDTH = 8640  # 6 inches: python-docx's default page (8.5 in less 1.25 in margins)


@functools.lru_cache(maxsize=1 << 16)
def _longest_word(text: str) -> int:
    """The width of the longest piece of ``text`` a line cannot break inside."""
    if not _BREAKABLE.search(text):
        return _chars(text)
    words = [w for w in _BREAKS.split(_KEEP.sub(r"\1", text)) if w]  # "< .001", "= 2": a symbol stays with its value
    return max((_chars(w) for w in words), default=0)


_BREAKABLE = re.compile(r"[ \t\n\u2002\u2003\u2009–—/-]")
_KEEP = re.compile(r"([<>=≤≥−]) ")
# a line may break at a space (not a no-break one) or after a dash or slash — but not at spaces before a closing
# bracket, a point, comma, colon, semicolon, "!", "?" or "/": Unicode's line breaking (UAX #14, rule LB13), which Word and
# LibreOffice follow, keeps those with what comes before even across spaces (so "[.79, .84]" is one piece). A range of
# numbers ("(2.00–3.00)", AMA's "2.1-3.4") is measured as one piece: a cell that wraps breaks its line before the range
# (``_RANGE_SPACE``), so its column must hold the range whole
_BREAKS = re.compile(r"[ \t\n\u2002\u2003\u2009]++(?![.,:;!?)\]}/])|(?<=[–—/-])(?![\d.−])")
# the space before a range of numbers in a cell, "15.38 (12.09–21.75)" (digits or, in a shape, 0s): where a cell that
# wraps breaks its line (Word and LibreOffice fill a line greedily and would break after the dash: "(12.09–" / "21.75)")
_RANGE_SPACE = re.compile(r" (?=\(?[−-]?\d[\d.,]*[–-][−-]?\d)")


_EM = 240  # twips in an em of 12 pt type
# Advance widths in ems, Times-like (Liberation Serif and Times New Roman share them): digits and most
# lower-case letters are half an em, capitals wider, spaces and points narrower.
_NARROW = dict.fromkeys(" .,:;'!|il()[]", 0.28) | {"\u2009": 0.17, "\u00a0": 0.25, "\u202f": 0.17}
_WIDE = dict.fromkeys("mwMW—\u2003", 0.95) | dict.fromkeys("<>=≤≥+×−–", 0.6)


class _Advance(dict):  # type: ignore[type-arg]
    """A character's advance width in ems, looked up once per distinct character."""

    def __missing__(self, ch: str) -> float:
        width = self[ch] = _NARROW.get(ch) or _WIDE.get(ch) or (0.72 if ch.isupper() else 0.5)
        return width


_ADVANCE = _Advance()


@functools.lru_cache(maxsize=1 << 16)
def _chars(text: str) -> int:
    """The width of ``text`` in twips at 12 pt, over-estimated by a tenth."""
    return int(sum(map(_ADVANCE.__getitem__, text), 0.0) * _EM * 1.1)


def _column_widths(table: TableModel, text_width: int, shapes: "list[_Column] | None" = None) -> list[int]:
    """Each column's width: wide enough for its longest word (stub labels and
    heads wrap between words, never inside one), as wide as its widest
    content where the text width allows, and never wider in sum than the
    text width unless the longest words alone need more."""
    return _fit(*_least_and_natural(table, shapes if shapes is not None else _body_shapes(table)), text_width)


def _fit(low: list[int], want: list[int], text_width: int) -> list[int]:
    """Column widths between each column's least (``low``) and natural (``want``) width, for ``text_width``."""
    if sum(want) <= text_width:
        return want
    if sum(low) >= text_width:  # even the longest words do not fit: shrink all alike to the page
        return [int(w * text_width / sum(low)) for w in low]
    # the numbers first (a cell that wraps mid-value is hard to read), then the stub, whose labels wrap between words
    spare = text_width - sum(low)
    extra = [w - lo for w, lo in zip(want[1:], low[1:])]
    if spare >= sum(extra):
        return [min(want[0], low[0] + spare - sum(extra))] + want[1:]
    total = sum(extra) or 1
    return [low[0]] + [lo + int(spare * e / total) for lo, e in zip(low[1:], extra)]


def _least_and_natural(table: TableModel, shapes: "list[_Column]") -> tuple[list[int], list[int]]:
    """Per column (the stub first), the least width that breaks no word and the width of its longest text unwrapped."""
    ncols = len(table.columns) + 1
    longest = [0] * ncols  # the longest word
    natural = [0] * ncols  # the longest text, unwrapped
    stub_rows = [("\u2003" * r.indent) + _soft_text(r.stub.text).translate(_SHAPE) for r in table.rows]  # widths by shape (digits as 0s)
    for j, texts in enumerate([[_soft_text(table.stub_head.text), *stub_rows]] + [[_soft_text(c.head.text)] for c in table.columns]):
        for i, text in enumerate(texts):
            word = _longest_word(text)
            lead = _chars(text) - _chars(text.lstrip("\u2003")) if j == 0 and text.startswith("\u2003") else 0
            if lead + word > longest[j]:
                longest[j] = lead + word
            # a head may wrap (it is short words); a body cell's numbers should not
            whole = word if i == 0 and j > 0 else _chars(text)
            if whole > natural[j]:
                natural[j] = whole
    for j, (distinct, styled, *_) in enumerate(shapes, 1):  # the body: each shape measured once
        for whole, word in [_measure_shape(shape, "")[:2] for shape in distinct] + [(_chars(t), _longest_word(t)) for t in (_soft_text(c.text) for c in styled)]:
            if word > longest[j]:
                longest[j] = word
            if whole > natural[j]:
                natural[j] = whole
    low = [_PAD + c + (_HANG if j == 0 else 0) for j, c in enumerate(longest)]
    return low, [max(lo, _PAD + c) for lo, c in zip(low, natural)]


def _cell_xml(text: StyledText, align: str, top: bool, bottom: bool, span: int = 1, decimal_at: int = 0, width: int = 0,
              hang: bool = False, line: int = 240) -> str:
    """One cell: its width, its rules, and a paragraph in the table text style
    for ``line`` (240 = single; ``add_table_text_style``); a decimal tab stop
    at ``decimal_at`` aligns a number on its mark."""
    return _cell_open(align, top, bottom, span, decimal_at, width, hang, line) + _run_xml(text) + _CELL_CLOSE


_CELL_CLOSE = "</w:p></w:tc>"


@functools.lru_cache(maxsize=4096)
def _cell_open(align: str, top: bool, bottom: bool, span: int, decimal_at: int, width: int, hang: bool, line: int) -> str:
    """A cell's XML up to its paragraph's runs (few distinct ones per table, so built once each)."""
    grid = f'<w:gridSpan w:val="{span}"/>' if span > 1 else ""
    if width:
        grid = f'<w:tcW w:w="{width}" w:type="dxa"/>' + grid
    props = grid + _borders(top, bottom)
    return f"<w:tc>{f'<w:tcPr>{props}</w:tcPr>' if props else ''}<w:p><w:pPr>{_ppr(align, decimal_at, hang, line)}</w:pPr>"


@functools.lru_cache(maxsize=1024)
def _ppr(align: str, decimal_at: int, hang: bool, line: int) -> str:
    """A cell paragraph's properties (few distinct ones per table, so built once each): the table text style
    (``add_table_text_style``: spacing, no first-line indent, kept with the next), then what differs by cell."""
    style = f'<w:pStyle w:val="{table_style_id(line)}"/>'
    indent = f'<w:ind w:left="{_HANG}" w:hanging="{_HANG}"/>' if hang else ""
    if align == "decimal" and decimal_at:
        # a decimal tab stop: in a table cell Word and LibreOffice align the text on it with no tab character
        # (a leading tab would jump past it); APA 7 §7.13 allows decimal alignment (memory)
        return style + _DECIMAL_TAB.format(pos=decimal_at) + indent + '<w:jc w:val="left"/>'
    return style + indent + f'<w:jc w:val="{_JC.get(align, "center")}"/>'


def _split_plain(text: str, mark: str) -> tuple[str, str]:
    """Plain text cut before its decimal mark (as ``split_decimal`` cuts a StyledText)."""
    i = text.find(mark) if mark else -1
    while i >= 0:
        if i + 1 < len(text) and text[i + 1].isdigit():
            return text[:i], text[i:]
        i = text.find(mark, i + 1)
    return text, ""


_SHAPE = DIGITS_AS_ZERO  # every digit is half an em wide: a cell's width depends on its shape only
# A no-break space after a comma (between an interval's limits, "[.79, .84]", or two df) or before the "to" of a range
# (AMA's "−0.36 to 0.21") is written into a Word table as a plain space: a narrow column may wrap there ("−0.36" /
# "to 0.21"), and widths are measured so. The others (after "<" or "=", inside "(n = 44)") hold: Word and LibreOffice
# never break at them, and would break a number instead when the column is narrower than the piece they hold
# together, so they are measured whole.
_SOFT = re.compile(",\u00a0|\u00a0(?=to\u00a0)")


def _soft_text(text: str) -> str:
    """``text`` with its soft no-break spaces (``_SOFT``) plain ones: the same length."""
    return _SOFT.sub(lambda m: m.group().replace("\u00a0", " "), text) if "\u00a0" in text else text


def _softened(text: StyledText) -> StyledText:
    """``text`` with its soft no-break spaces plain ones (``_soft_text``; the same length, so its spans hold)."""
    soft = _soft_text(text.text)
    return StyledText(soft, text.spans) if soft != text.text else text


class _Column(NamedTuple):
    """What a column's body cells are, found in one pass over them (``_body_shapes``)."""

    shapes: set[str]  # the distinct shapes of its plain cells (digits as 0s: a column of thousands of numbers has a handful)
    styled: list[StyledText]  # its cells with italics, superscripts or subscripts
    safe: bool  # no plain cell needs escaping or cleaning (``_NEEDS_CARE``)
    padded: bool  # some plain cell may start or end with white space Word would drop (``_t_open``)
    soft: bool  # some cell holds a soft no-break space, written as a plain one (``_SOFT``)


_WORDS = re.compile(r"[^\W\d_]{3,}.*?\b[^\W\d_]{3,}")  # two words of three letters or more (not a number's "(ref.)")


def word_columns(shapes: "list[_Column]") -> list[bool]:
    """Per body column, whether it holds words (a labelled ordinal's categories, "Moderate (Slightly liberal–Moderate)"),
    which wrap between them, rather than numbers."""
    return [any(_WORDS.search(x) for x in column.shapes) or any(_WORDS.search(c.text) for c in column.styled) for column in shapes]


def _body_shapes(table: TableModel) -> list[_Column]:
    """Per column, its plain cells' shapes and what they need, and its styled cells."""
    out: list[_Column] = []
    for k in range(len(table.columns)):
        cells = [r.cells[k] for r in table.rows if k < len(r.cells)]
        styled = [c for c in cells if c.spans]
        texts = [c.text for c in cells if not c.spans] if styled else [c.text for c in cells]
        joined = "\n".join(texts)  # one call for the whole column (a call per cell costs more than the work)
        if joined.count("\n") == max(len(texts) - 1, 0):  # no cell holds a line break: lines are cells
            shapes = set(joined.translate(_SHAPE).split("\n")) if texts else set()
            padded = _LINE_EDGE_SPACE.search(f"\n{joined}\n") is not None
        else:
            shapes = {t.translate(_SHAPE) for t in texts}
            padded = any(_t_open(t) != "<w:t>" for t in texts)
        out.append(_Column(shapes, styled, _NEEDS_CARE.search(joined) is None, padded, _SOFT.search(joined) is not None or any(_SOFT.search(c.text) for c in styled)))
    return out


@functools.lru_cache(maxsize=1 << 12)
def _measure_shape(shape: str, mark: str) -> tuple[int, int, int, int]:
    """A plain body cell's shape in twips: its width and its longest unbreakable
    piece (a soft no-break space is written as a plain one, ``_SOFT``;
    the others hold as Word and LibreOffice hold them), and the widths before
    and from its decimal ``mark`` as typed."""
    shown = _soft_text(shape)
    a, b = _split_plain(shape, mark)
    return _chars(shown), _longest_word(shown), _chars(a), _chars(b)


def _decimal_columns(table: TableModel, shapes: "list[_Column]", mark: str) -> list[bool]:
    """``TableModel.decimal_columns`` decided from each column's distinct shapes (the same answer, each shape once)."""
    out = []
    for col, (distinct, styled, *_) in zip(table.columns, shapes):
        if col.align in ("left", "right"):
            out.append(False)
            continue
        kinds = {_shape_kind(shape) for shape in distinct} | {_number_shape(c, mark) for c in styled}
        out.append("text" not in kinds and "number" in kinds)
    return out


def _decimal_tabs(table: TableModel, widths: list[int], mark: str, shapes: "list[_Column] | None" = None) -> list[int]:
    """Per column, the decimal tab stop (twips from the cell's text start)
    that centres the column's numbers aligned on ``mark``; 0 for a column
    that is not aligned so."""
    tabs = []
    shapes = shapes if shapes is not None else _body_shapes(table)
    for j, (aligned, (distinct, styled, *_)) in enumerate(zip(_decimal_columns(table, shapes, mark), shapes)):
        if not aligned:
            tabs.append(0)
            continue
        parts = [_measure_shape(shape, mark)[2:] for shape in distinct if shape.strip() not in _DASHES]
        for cell in styled:  # superscripts and the like: measured as printed
            if not blank_or_dash(cell):
                a, b = split_decimal(cell, mark)
                parts.append((_chars(a.plain()), _chars(b.plain())))
        left = max((a for a, _ in parts), default=0)
        right = max((b for _, b in parts), default=0)
        area = widths[j + 1] - 2 * _MARGIN
        tabs.append(max(left, (area - left - right) // 2 + left))
    return tabs


def _table_xml(table: TableModel, number_align: str = "center", text_width: int = TEXT_WIDTH, *, mark: str = ".", line: int = 240,
               declare: bool = True, shapes: "list[_Column] | None" = None, widths: "list[int] | None" = None) -> bytes:
    """The whole w:tbl as one string, parsed once: fast for tables of thousands
    of rows, UTF-8 encoded row by row into one buffer (no second copy of
    the whole). ``declare`` puts the namespace declaration on the w:tbl (to
    parse it alone); a table written into a document part goes without.
    Column widths are explicit and fixed (``_column_widths``), so
    that Word and LibreOffice lay the table out alike; with ``number_align``
    ``decimal`` columns of numbers align on the decimal ``mark``; cell
    paragraphs are spaced ``line`` (240 = single). ``shapes`` and ``widths``, when the caller has them, are not
    found again."""
    shapes = shapes if shapes is not None else _body_shapes(table)
    widths = widths if widths is not None else _column_widths(table, text_width, shapes)
    head_rows = 2 if table.spanners else 1
    header = "<w:trPr><w:cantSplit/><w:tblHeader/></w:trPr>"
    parts = [
        (f'<w:tbl xmlns:w="{_WNS}">' if declare else "<w:tbl>") + f'<w:tblPr><w:tblW w:w="{sum(widths)}" w:type="dxa"/><w:tblBorders>'
        + "".join(_NIL_XML.format(e) for e in ("top", "left", "bottom", "right", "insideH", "insideV"))
        + '</w:tblBorders><w:tblLayout w:type="fixed"/>'
        + f'<w:tblCellMar><w:left w:w="{_MARGIN}" w:type="dxa"/><w:right w:w="{_MARGIN}" w:type="dxa"/></w:tblCellMar>'
        + '<w:tblLook w:val="0000"/></w:tblPr><w:tblGrid>'
        + "".join(f'<w:gridCol w:w="{w}"/>' for w in widths)
        + "</w:tblGrid>"
    ]
    if table.spanners:
        cells = [_cell_xml(StyledText(), "left", True, False, line=line, width=widths[0])]
        j = 0
        for sp in sorted(table.spanners, key=lambda sp: sp.start):
            cells += [_cell_xml(StyledText(), "center", True, False, line=line, width=widths[k + 1]) for k in range(j, sp.start)]
            cells.append(_cell_xml(_softened(sp.label), "center", True, True, sp.end - sp.start, line=line, width=sum(widths[sp.start + 1 : sp.end + 1])))
            j = sp.end
        cells += [_cell_xml(StyledText(), "center", True, False, line=line, width=widths[k + 1]) for k in range(j, len(table.columns))]
        parts.append(f"<w:tr>{header}{''.join(cells)}</w:tr>")
    spanned = {j for sp in table.spanners for j in range(sp.start + 1, sp.end + 1)}
    heads = [table.stub_head] + [c.head for c in table.columns]
    parts.append(
        f"<w:tr>{header}"
        + "".join(
            _cell_xml(_softened(h), "left" if j == 0 else "center", head_rows == 1 or j in spanned, True, line=line, width=widths[j])
            for j, h in enumerate(heads)
        )
        + "</w:tr>"
    )
    out = io.BytesIO()
    out.write("".join(parts).encode())
    body = "<w:trPr><w:cantSplit/></w:trPr>"
    tabs = _decimal_tabs(table, widths, mark, shapes) if number_align == "decimal" else [0] * len(table.columns)
    last = len(table.rows) - 1
    # body cells whose text needs no escaping or cleaning (checked once over all of them) are written as they are
    plain_safe = all(column.safe for column in shapes)
    # each column's cell openings, made once: (a number on its decimal tab, a dash or blank centred) × (last row or not)
    openings = [[(_cell_open("decimal" if tab else col.align, False, bottom, 1, tab, 0, False, line),
                  _cell_open(col.align, False, bottom, 1, tab, 0, False, line)) for col, tab in zip(table.columns, tabs)]
                for bottom in (False, True)]
    # xml:space="preserve" on every cell's text only when some cell starts or ends with white space (``_t_open``)
    run_open = '<w:r><w:t xml:space="preserve">' if any(column.padded for column in shapes) else "<w:r><w:t>"
    run_close = "</w:t></w:r>" + _CELL_CLOSE
    ncols = len(table.columns)
    soft = {k for k, column in enumerate(shapes) if column.soft}
    # per column, the shapes of its plain cells that wrap in its width before a range of numbers (``_RANGE_SPACE``)
    ranges = {k: wrapping for k, column in enumerate(shapes)
              if (wrapping := {shape for shape in column.shapes if _measure_shape(shape, "")[0] + 2 * _MARGIN > widths[k + 1] and _RANGE_SPACE.search(shape)})}
    # a row whose cells are all plain text, safe as it is, neither dash nor blank (most rows of a big table) is the same
    # XML around its texts as every such row: one list of the pieces between the texts (and one for the last row), the
    # row's stub and texts put into its slots, joined
    careful = {k for k, column in enumerate(shapes) if column.styled or any(x.strip() in _DASHES for x in column.shapes)}
    templates = []
    for opened in openings:
        pieces = ["<w:tr>" + body, ""]
        for k, opening in enumerate(opened):
            pieces += [(run_close if k else "") + opening[0] + run_open, ""]
        templates.append(pieces + [(run_close if opened else "") + "</w:tr>"])
    stub_open = [_cell_open("left", False, bottom, 1, 0, 0, True, line) for bottom in (False, True)]
    for i, row in enumerate(table.rows):
        bottom = i == last
        stub = StyledText("\u2003" * row.indent) + row.stub if row.indent else row.stub
        stub_xml = stub_open[bottom] + _run_xml(_softened(stub)) + _CELL_CLOSE
        cells = row.cells
        if plain_safe and len(cells) == ncols and not any(cells[k].spans or cells[k].text.strip() in _DASHES for k in careful):
            row_xml = templates[bottom][:]
            row_xml[1] = stub_xml
            row_xml[3:-1:2] = [_soft_text(c.text) if k in soft else c.text for k, c in enumerate(cells)] if soft else [c.text for c in cells]
            for k, wrapping in ranges.items():
                row_xml[3 + 2 * k] = _range_line(row_xml[3 + 2 * k], wrapping)
            out.write("".join(row_xml).encode())
            continue
        # body cells carry no width of their own: the grid and the head rows' widths fix the layout (smaller XML)
        parts = [stub_xml]
        if cells:
            opened = openings[bottom]
            parts += [(opening[1] if c.text.strip() in _DASHES else opening[0])
                      + (_run_xml(_softened(c)) + _CELL_CLOSE if c.spans or not (plain_safe or k in ranges) else run_open
                         + _range_line(_softened(c).text if plain_safe else _escape(xml_safe(_softened(c).text)), ranges.get(k, ())) + run_close
                         if c.text else _CELL_CLOSE)
                      for k, (c, opening) in enumerate(zip(cells, opened))]
        else:
            parts.append(_cell_xml(StyledText(), "left", False, bottom, ncols, line=line))
        out.write(f"<w:tr>{body}{''.join(parts)}</w:tr>".encode())
    out.write(b"</w:tbl>")
    return out.getvalue()


def _range_line(text: str, wrapping: "set[str] | tuple[()]") -> str:
    """A plain cell's text (as written into its w:t) with a line break before its range of numbers when its shape
    wraps so (``wrapping``): "15.38" / "(12.09–21.75)"."""
    if not wrapping or text.translate(_SHAPE) not in wrapping:
        return text
    at = _RANGE_SPACE.search(text)
    return text if at is None else f"{text[:at.start()]}</w:t><w:br/><w:t>{text[at.end():]}"


_PLACEHOLDER = "statsetter-table"
_PLACEHOLDER_RE = re.compile(rb"<\?statsetter-table (\d+)\?>")


def _place_table(document: "Document", anchor: "Paragraph", table_xml: bytes) -> None:
    """Put a table before ``anchor`` without parsing it into the tree: a
    processing instruction marks its place, and the document part writes
    the table's XML there when it is serialised (on any save). A table of
    thousands of rows is then written once, as text, never parsed or
    re-serialised (lxml also moves big subtrees between documents in
    quadratic time)."""
    from lxml import etree

    part = document.part
    pending: list[bytes] = part.__dict__.setdefault("_statsetter_tables", [])
    anchor._p.addprevious(etree.ProcessingInstruction(_PLACEHOLDER, str(len(pending))))
    pending.append(table_xml)  # UTF-8, without a namespace declaration of its own (the part declares w:)
    if not getattr(part, "_statsetter_deferred", False):
        part.__class__ = _deferred_part_class(type(part))


_DEFERRED: dict[type, type] = {}


def _deferred_part_class(base: type) -> type:
    """The document part's class with a blob that writes the pending tables in place."""
    if base not in _DEFERRED:

        def blob(self) -> bytes:  # type: ignore[no-untyped-def]
            tables = self.__dict__.get("_statsetter_tables", [])
            return _PLACEHOLDER_RE.sub(lambda m: tables[int(m.group(1))], base.blob.fget(self))  # type: ignore[attr-defined]

        _DEFERRED[base] = type(f"Deferred{base.__name__}", (base,), {"blob": property(blob), "_statsetter_deferred": True})
    return _DEFERRED[base]


def _paragraph_xml(text: StyledText, keep_next: bool = False, bold: bool = False) -> str:
    """A flush-left paragraph (no first-line indent whatever Normal says)."""
    keep = "<w:keepNext/>" if keep_next else ""
    runs = f'<w:r><w:rPr><w:b/></w:rPr><w:t>{_escape(text.text)}</w:t></w:r>' if bold else _run_xml(text)
    return f'<w:p xmlns:w="{_WNS}"><w:pPr>{keep}<w:ind w:left="0" w:firstLine="0"/></w:pPr>{runs}</w:p>'


def caption_xml(name: str, number: int | None, title: StyledText, one_line: bool) -> list[str]:
    """The caption above a table or figure, kept with what follows: "Table 5" in bold and the title in italic on the
    next line (APA 7), or "Table 5. Title" on one line (AMA 11)."""
    if one_line:
        if number is None and not title:
            return []
        label = f"{name} {number}." if number is not None else ""
        runs = (f'<w:r><w:rPr><w:b/></w:rPr><w:t xml:space="preserve">{_escape(label)} </w:t></w:r>' if label else "") + _run_xml(title)
        return [f'<w:p xmlns:w="{_WNS}"><w:pPr><w:keepNext/><w:ind w:left="0" w:firstLine="0"/></w:pPr>{runs}</w:p>']
    out = []
    if number is not None:
        out.append(_paragraph_xml(StyledText(f"{name} {number}"), keep_next=True, bold=True))
    if title:
        out.append(_paragraph_xml(StyledText(title.text, title.spans + StyledText.styled(title.text, "i").spans), keep_next=True))
    return out


def table_parts(table: TableModel, style: "Style", text_width: int = TEXT_WIDTH, *, declare: bool = True,
                before: Any = None) -> "list[str | bytes]":
    """A table as Word XML elements in order: the number (bold) and title
    (italic, title case) paragraphs (str), kept with the table; the w:tbl,
    whose cells take the table text style (``add_table_text_style`` puts it
    into the document that receives the table)
    (UTF-8 bytes; with ``declare`` False, without its namespace declaration,
    to be written into a part); one paragraph per note part (general,
    specific, probability).

    ``before`` is the element of a document's body the parts will be put
    before: the text width of its page replaces ``text_width``, and a table
    whose columns cannot keep their words whole in that width goes on
    landscape pages of its own (``pages.turned``), with a warning that says
    so. A table too wide even then, or not in a document's body (a table
    cell), is shrunk to the width with a warning that some of its cells
    wrap inside a word."""
    from . import pages

    shapes = _body_shapes(table)
    low, want = _least_and_natural(table, shapes)
    least = sum(low)
    section = pages.section_of(before) if before is not None else None
    width = pages.text_width(section) if section is not None else text_width
    wide = pages.text_width(section, landscape=True) if section is not None else width
    name = f"Table {table.number}" if table.number is not None else "A table"
    # turned when the least widths exceed the page's text beyond the tenth ``_chars`` over-estimates them by (within
    # it, ``_fit`` shrinks the columns alike and every word still fits), or when its columns' natural width (the stub's
    # least: long labels are meant to wrap) is more than 1.6 times the text: in portrait most of its cells would wrap
    # (a column of words — a labelled ordinal's categories — counted at its least too: it wraps between them)
    natural = low[0] + sum(lo if words else wa for lo, wa, words in zip(low[1:], want[1:], word_columns(shapes)))
    turn = (least > width * 1.1 or natural > width * 1.6) and wide > width
    if turn:
        warnings.warn(f"{name} is set on landscape pages: its columns need {least / 1440:.1f} in at the least and "
                      f"{sum(want) / 1440:.1f} in unwrapped; the page's text is {width / 1440:.1f} in wide", stacklevel=2)
        width = wide
    if least > width * 1.1:
        warnings.warn(f"{name} is wider than the {'landscape ' if turn else ''}page's text ({least / 1440:.1f} in against "
                      f"{width / 1440:.1f} in): some of its cells wrap inside a word; fewer columns or shorter labels would read "
                      "better", stacklevel=2)
    out: "list[str | bytes]" = list(caption_xml("Table", table.number, title_case(table.title) if table.title else StyledText(),
                                                style.tables.get("caption") == "one_line"))
    out.append(_table_xml(table, style.tables.get("number_align", "center"), width, mark=style.decimal_mark, line=table_line(style),
                          declare=declare, shapes=shapes, widths=_fit(low, want, width)))
    out += [_paragraph_xml(part) for part in table.note_parts(style.note_label())]
    return pages.turned(out, section, opening=before.getprevious() is None or pages.landscape_ending(before.getprevious())) if turn else out


def table_line(style: "Style") -> int:
    """The line spacing of table cells in twentieths of a point per line (240 = single), from the style."""
    return round(240 * style.manuscript.get("table_line_spacing", 1.0))


def text_width_of(document: "Document") -> int:
    """The text width of the document's last section, in twips (``pages.text_width``: a page size or margin that is
    missing or not a measure counts as python-docx's default page)."""
    from .pages import text_width

    return text_width(document.sections[-1]._sectPr)


def add_table(document: "Document", table: TableModel, style: "Style | str | None" = None) -> None:
    """Write the table number, title, table and notes at the end of ``document``.
    The style's ``tables.number_align`` (``center`` or ``decimal``) places the numbers."""
    from docx.oxml import parse_xml

    from ..style.profile import load_style

    resolved = load_style(style)
    add_table_text_style(document, table_line(resolved))
    anchor = document.add_paragraph()  # the parts go before it
    for xml in table_parts(table, resolved, declare=False, before=anchor._p):
        if isinstance(xml, bytes):
            _place_table(document, anchor, xml)
        else:
            anchor._p.addprevious(parse_xml(xml))
    anchor._p.getparent().remove(anchor._p)


def results_document(
    blocks: Sequence["Result | StyledText | TableModel"],
    style: "Style | str | None" = None,
    *,
    title: str | None = None,
    tables: Iterable[TableModel] = (),
    base: "str | Path | None" = None,
    form: str = "sentence",
    paper: str | None = None,
    figure_root: "str | Path | None" = None,
) -> "Document":
    """A results document: a heading, then ``blocks`` in order — a record as
    a paragraph in ``form``, a StyledText as a paragraph, a TableModel as a
    table — then ``tables``. Tables without a number are numbered in order of
    appearance. A FigureModel is placed with its caption (its PNG read from
    ``figure_root`` when it was written, else drawn). A new document takes the style's manuscript page
    (``[manuscript]``; ``paper`` overrides its paper); ``base`` is an author's
    .docx whose page, styles and content are kept, the results appended."""
    import docx

    from ..rendering.sentences import render
    from ..style.profile import load_style

    resolved = load_style(style)
    document = docx.Document(str(base)) if base is not None else docx.Document()
    if base is None:
        manuscript_page(document, resolved, paper)
    if title:
        document.add_heading(xml_safe(title), level=1)
    from ..rendering.figures import FigureModel

    number = 0
    for block in [*blocks, *tables]:
        if isinstance(block, TableModel):
            number = block.number if block.number is not None else number + 1
            add_table(document, block.with_number(number), resolved)
        elif isinstance(block, FigureModel):
            from .figure_blocks import add_figure

            png = block.files.get("png")
            add_figure(document, block, resolved, block.png if block.png is not None else (Path(figure_root or ".") / png if png else None))
        else:
            add_runs(document.add_paragraph(), block if isinstance(block, StyledText) else render(block, form, resolved))
    return document


_PAPER = {"letter": (12240, 15840), "a4": (11906, 16838)}  # twips


def manuscript_page(document: "Document", style: "Style", paper: str | None = None) -> None:
    """Give a new document the style's manuscript page: paper and margins,
    the body font and size, line spacing, first-line indent, headings in the
    body font (black, bold, centred or flush left) and the page number."""
    from docx.enum.text import WD_ALIGN_PARAGRAPH
    from docx.shared import Inches, Pt, RGBColor, Twips

    m = style.manuscript
    width, height = _PAPER[paper or m.get("paper", "letter")]
    margin = Inches(m.get("margin_in", 1.0))
    for section in document.sections:
        section.page_width, section.page_height = Twips(width), Twips(height)
        section.left_margin = section.right_margin = section.top_margin = section.bottom_margin = margin
        section.header_distance = section.footer_distance = Inches(0.5)
    if not m:
        return
    normal = document.styles["Normal"]
    _font(normal, m.get("font"), m.get("font_size"))
    fmt = normal.paragraph_format
    fmt.line_spacing = m.get("line_spacing", 1.0)
    fmt.space_before = fmt.space_after = Pt(0)
    fmt.first_line_indent = Inches(m.get("first_line_indent_in", 0))
    for level in (1, 2):
        heading = document.styles[f"Heading {level}"]
        _font(heading, m.get("font"), m.get("font_size"))
        heading.font.bold = bool(m.get("headings_bold", True))
        heading.font.italic = False
        heading.font.color.rgb = RGBColor(0, 0, 0)
        hf = heading.paragraph_format
        hf.alignment = WD_ALIGN_PARAGRAPH.CENTER if m.get(f"heading_{level}", "left") == "center" else WD_ALIGN_PARAGRAPH.LEFT
        hf.space_before = hf.space_after = Pt(0)
        hf.line_spacing = m.get("line_spacing", 1.0)
        hf.first_line_indent = Inches(0)
        hf.keep_with_next = True
    where = m.get("page_number", "none")
    if where != "none":
        section = document.sections[0]
        part = section.header if where.startswith("top") else section.footer
        p = part.paragraphs[0]
        p.paragraph_format.alignment = WD_ALIGN_PARAGRAPH.RIGHT if where.endswith("right") else WD_ALIGN_PARAGRAPH.CENTER
        p.paragraph_format.first_line_indent = Inches(0)
        _page_field(p)


def _font(style, name: str | None, size: float | None) -> None:  # type: ignore[no-untyped-def]
    """Set a Word style's font; theme fonts (which win over a named one) are removed."""
    from docx.shared import Pt

    if name:
        style.font.name = name
        fonts = style.element.rPr.rFonts
        for attr in ("asciiTheme", "hAnsiTheme", "eastAsiaTheme", "cstheme"):
            fonts.attrib.pop(f"{{{_WNS}}}{attr}", None)
        fonts.set(f"{{{_WNS}}}eastAsia", name)
        fonts.set(f"{{{_WNS}}}cs", name)
    if size:
        style.font.size = Pt(size)


def _page_field(paragraph: "Paragraph") -> None:
    """A PAGE field: Word and LibreOffice show the page's number."""
    from docx.oxml import parse_xml

    for xml in ('<w:r xmlns:w="{0}"><w:fldChar w:fldCharType="begin"/></w:r>', '<w:r xmlns:w="{0}"><w:instrText xml:space="preserve"> PAGE </w:instrText></w:r>',
                '<w:r xmlns:w="{0}"><w:fldChar w:fldCharType="separate"/></w:r>', '<w:r xmlns:w="{0}"><w:t>1</w:t></w:r>',
                '<w:r xmlns:w="{0}"><w:fldChar w:fldCharType="end"/></w:r>'):
        paragraph._p.append(parse_xml(xml.format(_WNS)))


def save_document(document: "Document", path: "str | Path", *, inputs: Iterable["str | Path"] = ()) -> Path:
    """Save through a temporary file; never over an input. A table turned to landscape that ends the document takes
    the last page with it (``pages.settle``)."""
    import io

    from ..files import write_atomic
    from .pages import settle

    settle(document.element.body)

    buffer = io.BytesIO()
    document.save(buffer)
    return write_atomic(path, buffer.getvalue(), inputs=inputs)
