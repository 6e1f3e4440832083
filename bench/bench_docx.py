"""Benchmark: Word tables of 1,000-8,000 rows x 8 columns.

For each size, paired runs (statsetter and a baseline taking turns, median
of the per-pair ratios) against two baselines:

- the floor of the job: the same table's XML — rules, italic heads, cell
  alignment, repeated header row, rows that do not split — joined as text
  and zipped with the smallest .docx package Word opens (content types,
  relationships, document.xml); target <= 1.5x, and peak memory allocated
  (tracemalloc) <= 2x the floor's;
- python-docx's cell-by-cell API writing the same cell texts (the slowest
  way; shown for scale).

Growth when the rows double: target <= 2.1x.
"""

from __future__ import annotations

import io
import tracemalloc
import warnings
import zipfile
from xml.sax.saxutils import escape

import docx

from statsetter.export.docx_writer import add_table
from statsetter.rendering.tables import Column, Row, TableModel
from statsetter.styled import StyledText
from _timing import paired, timed  # noqa: E402  (bench/ is on the path when a benchmark runs)

COLS = 8
# eight columns of 7-digit numbers need more than python-docx's 6-inch text: the table is set on landscape pages
# (two section-ending paragraphs more than the floor writes), and the warning saying so is not what is measured
warnings.filterwarnings("ignore", "Table 1 is set on landscape pages")
W = "http://schemas.openxmlformats.org/wordprocessingml/2006/main"


def model(rows: int) -> TableModel:
    return TableModel(
        title=StyledText("Benchmark table"),
        number=1,
        stub_head=StyledText("Row"),
        columns=tuple(Column(StyledText.styled(f"V{j}", "i")) for j in range(COLS)),
        # (nearly) every value distinct, so that no cache of repeated cell texts flatters the writer
        rows=tuple(Row(StyledText(f"row {i}"), tuple(StyledText(f"{(i * 7919 + j * 104729) % 1000003 / 1000:.3f}") for j in range(COLS)))
                   for i in range(rows)),
    )


def ours(t: TableModel) -> None:
    d = docx.Document()
    add_table(d, t)
    d.save(io.BytesIO())


_CT = ('<?xml version="1.0" encoding="UTF-8" standalone="yes"?><Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types">'
       '<Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/>'
       '<Default Extension="xml" ContentType="application/xml"/><Override PartName="/word/document.xml" '
       'ContentType="application/vnd.openxmlformats-officedocument.wordprocessingml.document.main+xml"/></Types>')
_RELS = ('<?xml version="1.0" encoding="UTF-8" standalone="yes"?><Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">'
         '<Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument" '
         'Target="word/document.xml"/></Relationships>')
_RULE = '<w:{0} w:val="single" w:sz="8" w:space="0" w:color="000000"/>'


def _cell(text: str, align: str, top: bool, bottom: bool, italic: bool = False) -> str:
    borders = (_RULE.format("top") if top else "") + (_RULE.format("bottom") if bottom else "")
    rpr = "<w:rPr><w:i/></w:rPr>" if italic else ""
    return (f'<w:tc><w:tcPr><w:tcBorders>{borders}</w:tcBorders></w:tcPr><w:p><w:pPr><w:jc w:val="{align}"/></w:pPr>'
            f'<w:r>{rpr}<w:t xml:space="preserve">{escape(text)}</w:t></w:r></w:p></w:tc>')


def floor(t: TableModel) -> None:
    """The same table written directly as XML text and zipped: the least any writer must do."""
    head = "".join([_cell(t.stub_head.text, "left", True, True)] + [_cell(c.head.text, "center", True, True, True) for c in t.columns])
    parts = [f'<w:tbl><w:tblPr><w:tblW w:w="0" w:type="auto"/></w:tblPr><w:tr><w:trPr><w:cantSplit/><w:tblHeader/></w:trPr>{head}</w:tr>']
    last = len(t.rows) - 1
    for i, row in enumerate(t.rows):
        cells = [_cell(row.stub.text, "left", False, i == last)] + [_cell(c.text, "center", False, i == last) for c in row.cells]
        parts.append(f"<w:tr><w:trPr><w:cantSplit/></w:trPr>{''.join(cells)}</w:tr>")
    parts.append("</w:tbl>")
    body = (f'<?xml version="1.0" encoding="UTF-8" standalone="yes"?><w:document xmlns:w="{W}"><w:body>'
            f'<w:p><w:r><w:rPr><w:b/></w:rPr><w:t>Table 1</w:t></w:r></w:p><w:p><w:r><w:rPr><w:i/></w:rPr><w:t>{escape(t.title.text)}</w:t></w:r></w:p>'
            + "".join(parts) + "</w:body></w:document>")
    buffer = io.BytesIO()
    with zipfile.ZipFile(buffer, "w", zipfile.ZIP_DEFLATED) as z:
        z.writestr("[Content_Types].xml", _CT)
        z.writestr("_rels/.rels", _RELS)
        z.writestr("word/document.xml", body)


def cell_api(t: TableModel) -> None:
    d = docx.Document()
    table = d.add_table(rows=len(t.rows) + 1, cols=COLS + 1)
    rows = table.rows
    head = rows[0].cells
    head[0].text = t.stub_head.text
    for j, c in enumerate(t.columns, 1):
        head[j].text = c.head.text
    for r, row in zip(rows[1:], t.rows):
        cells = r.cells
        cells[0].text = row.stub.text
        for j, c in enumerate(row.cells, 1):
            cells[j].text = c.text
    d.save(io.BytesIO())


def peak(fn) -> int:  # type: ignore[no-untyped-def]
    tracemalloc.start()
    fn()
    top = tracemalloc.get_traced_memory()[1]
    tracemalloc.stop()
    return top


def main() -> None:
    previous = previous_floor = None
    for rows in (1000, 2000, 4000, 8000):
        t = model(rows)
        base, mine, ratio = paired(lambda: floor(t), lambda: ours(t), 5)
        growth = f", growth {mine / previous:.2f}x (target <= 2.1; the floor's {base / previous_floor:.2f}x)" if previous else ""
        line = f"{rows:5,} rows x {COLS}: statsetter {mine:5.2f} s, direct XML floor {base:5.2f} s, ratio {ratio:.2f} (target <= 1.5){growth}"
        if rows == 8000:
            memory = peak(lambda: ours(t)) / peak(lambda: floor(t))
            api = timed(lambda: cell_api(t), 1)
            line += f"; peak memory {memory:.2f}x the floor's (target <= 2); python-docx cell API {api:.2f} s"
        print(line)
        previous, previous_floor = mine, base


if __name__ == "__main__":
    main()
