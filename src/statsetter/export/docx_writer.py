"""Word output: StyledText as runs, TableModel as an APA-style table.

Tables follow APA 7 §7.8-7.21: the number in bold on its own line, the title
in italic title case below it; horizontal rules only (above and below the
column heads, under each spanner, at the bottom); heads centred, stub left;
``Note.`` in italic below. The header rows repeat on every page and rows do
not split across pages. Runs use the document's own Normal style and fonts.
"""

from __future__ import annotations

from pathlib import Path
from typing import TYPE_CHECKING, Iterable, Sequence

from ..rendering.styled import StyledText
from ..rendering.tables import TableModel

if TYPE_CHECKING:
    from docx.document import Document
    from docx.text.paragraph import Paragraph

    from ..records import Result
    from ..style.profile import Style

__all__ = ["add_runs", "add_table", "results_document", "save_document"]

_RULE = {"val": "single", "sz": "8", "space": "0", "color": "000000"}


def add_runs(paragraph: "Paragraph", text: StyledText) -> None:
    """Append ``text`` to ``paragraph`` as runs: italic, superscript, subscript."""
    for chunk, styles in text.segments():
        run = paragraph.add_run(chunk)
        if "i" in styles:
            run.italic = True
        if "sup" in styles:
            run.font.superscript = True
        elif "sub" in styles:
            run.font.subscript = True


def _border(cell, **edges: dict[str, str] | None) -> None:  # type: ignore[no-untyped-def]
    from docx.oxml import OxmlElement
    from docx.oxml.ns import qn

    tc_pr = cell._tc.get_or_add_tcPr()
    borders = tc_pr.find(qn("w:tcBorders"))
    if borders is None:
        borders = OxmlElement("w:tcBorders")
        tc_pr.append(borders)
    for edge in ("top", "left", "bottom", "right"):
        spec = edges.get(edge)
        element = borders.find(qn(f"w:{edge}"))
        if element is None:
            element = OxmlElement(f"w:{edge}")
            borders.append(element)
        if spec is None:
            element.set(qn("w:val"), "nil")
        else:
            for key, value in spec.items():
                element.set(qn(f"w:{key}"), value)


def _no_table_borders(table) -> None:  # type: ignore[no-untyped-def]
    from docx.oxml import OxmlElement
    from docx.oxml.ns import qn

    tbl_pr = table._tbl.tblPr
    borders = OxmlElement("w:tblBorders")
    for edge in ("top", "left", "bottom", "right", "insideH", "insideV"):
        element = OxmlElement(f"w:{edge}")
        element.set(qn("w:val"), "nil")
        borders.append(element)
    existing = tbl_pr.find(qn("w:tblBorders"))
    if existing is not None:
        tbl_pr.remove(existing)
    tbl_pr.append(borders)


def _row_flags(row, header: bool) -> None:  # type: ignore[no-untyped-def]
    from docx.oxml import OxmlElement
    from docx.oxml.ns import qn

    tr_pr = row._tr.get_or_add_trPr()
    cant = OxmlElement("w:cantSplit")
    tr_pr.append(cant)
    if header:
        head = OxmlElement("w:tblHeader")
        tr_pr.append(head)


def _fill(cell, text: StyledText, align: str) -> None:  # type: ignore[no-untyped-def]
    from docx.enum.text import WD_ALIGN_PARAGRAPH

    paragraph = cell.paragraphs[0]
    add_runs(paragraph, text)
    paragraph.alignment = {"left": WD_ALIGN_PARAGRAPH.LEFT, "right": WD_ALIGN_PARAGRAPH.RIGHT}.get(
        align, WD_ALIGN_PARAGRAPH.CENTER
    )


def add_table(document: "Document", table: TableModel) -> None:
    """Write the table number, title, table and notes at the end of ``document``."""
    if table.number is not None:
        p = document.add_paragraph()
        p.add_run(f"Table {table.number}").bold = True
    if table.title:
        p = document.add_paragraph()
        add_runs(p, StyledText(table.title.text, table.title.spans + StyledText.styled(table.title.text, "i").spans))
    ncols = len(table.columns) + 1
    head_rows = 2 if table.spanners else 1
    t = document.add_table(rows=head_rows + len(table.rows), cols=ncols)
    _no_table_borders(t)
    last = len(t.rows) - 1
    if table.spanners:
        row = t.rows[0]
        _row_flags(row, header=True)
        for j in range(ncols):
            _border(row.cells[j], top=_RULE)
        for s in table.spanners:
            first = row.cells[s.start + 1]
            merged = first.merge(row.cells[s.end]) if s.end - s.start > 1 else first
            _fill(merged, s.label, "center")
            _border(merged, top=_RULE, bottom=_RULE)
    head = t.rows[head_rows - 1]
    _row_flags(head, header=True)
    heads = [table.stub_head] + [c.head for c in table.columns]
    for j, text in enumerate(heads):
        cell = head.cells[j]
        _fill(cell, text, "left" if j == 0 else "center")
        spanned = any(s.start + 1 <= j <= s.end for s in table.spanners)
        _border(cell, top=_RULE if head_rows == 1 or spanned else None, bottom=_RULE)
    for i, model_row in enumerate(table.rows):
        row = t.rows[head_rows + i]
        _row_flags(row, header=False)
        stub = StyledText("\u2003" * model_row.indent) + model_row.stub
        _fill(row.cells[0], stub, "left")
        for j, (cell_text, col) in enumerate(zip(model_row.cells, table.columns), 1):
            _fill(row.cells[j], cell_text, col.align)
        if head_rows + i == last:
            for j in range(ncols):
                _border(row.cells[j], bottom=_RULE)
    if not table.rows:
        for j in range(ncols):
            _border(head.cells[j], bottom=_RULE)
    for part in table.note_parts():
        add_runs(document.add_paragraph(), part)


def results_document(
    records: Sequence["Result"],
    style: "Style | str | None" = None,
    *,
    title: str | None = None,
    tables: Iterable[TableModel] = (),
    base: "str | Path | None" = None,
    form: str = "sentence",
) -> "Document":
    """A document with a heading, one paragraph per record and the tables,
    numbered in order of appearance. ``base`` is a .docx whose styles (and
    content) are kept; the results are appended after its content."""
    import docx

    from ..rendering.sentences import render
    from ..style.profile import load_style

    resolved = load_style(style)
    document = docx.Document(str(base)) if base is not None else docx.Document()
    if title:
        document.add_heading(title, level=1)
    for record in records:
        add_runs(document.add_paragraph(), render(record, form, resolved))
    for number, table in enumerate(tables, 1):
        add_table(document, table.with_number(number))
    return document


def save_document(document: "Document", path: "str | Path", *, inputs: Iterable["str | Path"] = ()) -> Path:
    """Save through a temporary file; never over an input."""
    import io

    from ..files import write_atomic

    buffer = io.BytesIO()
    document.save(buffer)
    return write_atomic(path, buffer.getvalue(), inputs=inputs)
