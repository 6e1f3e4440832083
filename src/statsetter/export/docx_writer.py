"""Word output: StyledText as runs, TableModel as an APA-style table.

Tables follow APA 7 §7.8-7.21: the number in bold on its own line, the title
in italic title case below it; horizontal rules only (above and below the
column heads, under each spanner, at the bottom); heads centred, stub left;
``Note.`` in italic below. The header rows repeat on every page and rows do
not split across pages. Runs use the document's own Normal style and fonts.
"""

from __future__ import annotations

from pathlib import Path
import re
from xml.sax.saxutils import escape as _escape
from typing import TYPE_CHECKING, Iterable, Sequence

from ..rendering.styled import StyledText
from ..rendering.tables import TableModel, title_case

if TYPE_CHECKING:
    from docx.document import Document
    from docx.text.paragraph import Paragraph

    from ..records import Result
    from ..style.profile import Style

__all__ = ["add_runs", "add_table", "results_document", "save_document"]

_WNS = "http://schemas.openxmlformats.org/wordprocessingml/2006/main"


_NOT_XML = re.compile("[\x00-\x08\x0b\x0c\x0e-\x1f\ufffe\uffff\ud800-\udfff]")


def xml_safe(text: str) -> str:
    """``text`` without the characters XML 1.0 forbids (control characters
    such as those pasted from other programs), which Word cannot store; a
    warning names the text they were removed from."""
    if not _NOT_XML.search(text):
        return text
    import warnings

    clean = _NOT_XML.sub("", text)
    warnings.warn(f"removed control characters that Word cannot store from {clean[:60]!r}", stacklevel=2)
    return clean


def add_runs(paragraph: "Paragraph", text: StyledText) -> None:
    """Append ``text`` to ``paragraph`` as runs: italic, superscript, subscript."""
    for chunk, styles in text.segments():
        run = paragraph.add_run(xml_safe(chunk))
        if "i" in styles:
            run.italic = True
        if "sup" in styles:
            run.font.superscript = True
        elif "sub" in styles:
            run.font.subscript = True


def _run_xml(text: StyledText) -> str:
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
        out.append(f'<w:r>{props}<w:t xml:space="preserve">{_escape(xml_safe(chunk))}</w:t></w:r>')
    return "".join(out)


_RULE_XML = '<w:{0} w:val="single" w:sz="8" w:space="0" w:color="000000"/>'
_NIL_XML = '<w:{0} w:val="nil"/>'


def _borders(top: bool, bottom: bool) -> str:
    return (
        "<w:tcBorders>"
        + (_RULE_XML if top else _NIL_XML).format("top")
        + _NIL_XML.format("left")
        + (_RULE_XML if bottom else _NIL_XML).format("bottom")
        + _NIL_XML.format("right")
        + "</w:tcBorders>"
    )


_JC = {"left": "left", "right": "right"}


_DECIMAL_TAB = '<w:tabs><w:tab w:val="decimal" w:pos="{pos}"/></w:tabs>'


def _cell_xml(text: StyledText, align: str, top: bool, bottom: bool, span: int = 1, decimal_at: int = 0) -> str:
    grid = f'<w:gridSpan w:val="{span}"/>' if span > 1 else ""
    if align == "decimal" and decimal_at:
        # decimal alignment: a decimal tab stop and a leading tab (APA 7 §7.13 allows either)
        ppr = _DECIMAL_TAB.format(pos=decimal_at) + '<w:jc w:val="left"/>'
        runs = "<w:r><w:tab/></w:r>" + _run_xml(text)
    else:
        ppr = f'<w:jc w:val="{_JC.get(align, "center")}"/>'
        runs = _run_xml(text)
    return f"<w:tc><w:tcPr>{grid}{_borders(top, bottom)}</w:tcPr><w:p><w:pPr>{ppr}</w:pPr>{runs}</w:p></w:tc>"


def _table_xml(table: TableModel, number_align: str = "center") -> str:
    """The whole w:tbl as one string, parsed once: fast for tables of thousands of rows."""
    ncols = len(table.columns) + 1
    head_rows = 2 if table.spanners else 1
    header = "<w:trPr><w:cantSplit/><w:tblHeader/></w:trPr>"
    parts = [
        f'<w:tbl xmlns:w="{_WNS}"><w:tblPr><w:tblW w:w="0" w:type="auto"/><w:tblBorders>'
        + "".join(_NIL_XML.format(e) for e in ("top", "left", "bottom", "right", "insideH", "insideV"))
        + '</w:tblBorders><w:tblLook w:val="0000"/></w:tblPr><w:tblGrid>'
        + "<w:gridCol/>" * ncols
        + "</w:tblGrid>"
    ]
    if table.spanners:
        cells = [_cell_xml(StyledText(), "left", True, False)]
        j = 0
        for sp in sorted(table.spanners, key=lambda sp: sp.start):
            cells += [_cell_xml(StyledText(), "center", True, False) for _ in range(sp.start - j)]
            cells.append(_cell_xml(sp.label, "center", True, True, sp.end - sp.start))
            j = sp.end
        cells += [_cell_xml(StyledText(), "center", True, False) for _ in range(len(table.columns) - j)]
        parts.append(f"<w:tr>{header}{''.join(cells)}</w:tr>")
    spanned = {j for sp in table.spanners for j in range(sp.start + 1, sp.end + 1)}
    heads = [table.stub_head] + [c.head for c in table.columns]
    parts.append(
        f"<w:tr>{header}"
        + "".join(
            _cell_xml(h, "left" if j == 0 else "center", head_rows == 1 or j in spanned, True) for j, h in enumerate(heads)
        )
        + "</w:tr>"
    )
    body = "<w:trPr><w:cantSplit/></w:trPr>"
    aligns = ["decimal" if number_align == "decimal" and c.align in ("center", "decimal") else c.align for c in table.columns]
    width = max((len(c.text) for row in table.rows for c in row.cells), default=4)
    last = len(table.rows) - 1
    for i, row in enumerate(table.rows):
        bottom = i == last
        stub = StyledText("\u2003" * row.indent) + row.stub if row.indent else row.stub
        cells = [_cell_xml(stub, "left", False, bottom)]
        if row.cells:
            cells += [_cell_xml(c, a, False, bottom, 1, 60 * width) for c, a in zip(row.cells, aligns)]
        else:
            cells.append(_cell_xml(StyledText(), "left", False, bottom, len(table.columns)))
        parts.append(f"<w:tr>{body}{''.join(cells)}</w:tr>")
    parts.append("</w:tbl>")
    return "".join(parts)


_SPLICE_ABOVE = 300  # rows; larger tables are spliced into the serialised body


def _splice(document: "Document", anchor: "Paragraph", table_xml: str) -> "Paragraph":
    """Insert a large table by re-parsing the document body with the table's
    XML in place: lxml moves big subtrees between documents in quadratic time,
    a parse is linear. Returns the (new) anchor paragraph."""
    from docx.oxml import parse_xml
    from docx.text.paragraph import Paragraph
    from lxml import etree

    token = "statsetter-table-anchor"
    anchor._p.set(f"{{{_WNS}}}rsidR", "00000000")
    anchor.add_run(token)
    xml = etree.tostring(document.element, encoding="unicode")
    inner = table_xml.replace(f' xmlns:w="{_WNS}"', "", 1)
    at = xml.index(token)
    start = xml.rindex("<w:p ", 0, at)
    end = xml.index("</w:p>", at) + len("</w:p>")
    root = parse_xml(xml[:start] + inner + '<w:p><w:pPr/></w:p>' + xml[end:])
    document.part._element = root
    document._element = root  # type: ignore[attr-defined]
    document._Document__body = None  # type: ignore[attr-defined]  # python-docx caches the body
    body = root.body
    last_p = body.findall(f"{{{_WNS}}}p")
    # the fresh paragraph right after the table
    for p in last_p[::-1]:
        if p.getprevious() is not None and p.getprevious().tag == f"{{{_WNS}}}tbl" and len(p) == 1:
            return Paragraph(p, document._body)  # type: ignore[attr-defined]
    return document.add_paragraph()


def add_table(document: "Document", table: TableModel, style: "Style | str | None" = None) -> None:
    """Write the table number, title, table and notes at the end of ``document``.
    The style's ``tables.number_align`` (``center`` or ``decimal``) places the numbers."""
    from docx.oxml import parse_xml

    from ..style.profile import load_style

    align = load_style(style).tables.get("number_align", "center")

    if table.number is not None:
        p = document.add_paragraph()
        p.add_run(f"Table {table.number}").bold = True
    if table.title:
        p = document.add_paragraph()
        title = title_case(table.title)
        add_runs(p, StyledText(title.text, title.spans + StyledText.styled(title.text, "i").spans))
    anchor = document.add_paragraph()  # the table goes before this, notes after it
    if len(table.rows) <= _SPLICE_ABOVE:
        anchor._p.addprevious(parse_xml(_table_xml(table, align)))
    else:
        anchor = _splice(document, anchor, _table_xml(table, align))
    parts = table.note_parts()
    if parts:
        add_runs(anchor, parts[0])
        for part in parts[1:]:
            add_runs(document.add_paragraph(), part)
    else:
        anchor._p.getparent().remove(anchor._p)


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
        document.add_heading(xml_safe(title), level=1)
    for record in records:
        add_runs(document.add_paragraph(), render(record, form, resolved))
    for number, table in enumerate(tables, 1):
        add_table(document, table.with_number(number), resolved)
    return document


def save_document(document: "Document", path: "str | Path", *, inputs: Iterable["str | Path"] = ()) -> Path:
    """Save through a temporary file; never over an input."""
    import io

    from ..files import write_atomic

    buffer = io.BytesIO()
    document.save(buffer)
    return write_atomic(path, buffer.getvalue(), inputs=inputs)
