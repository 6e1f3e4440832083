"""Benchmark: Word tables of 1,000-8,000 rows x 8 columns.

Prints the time per size (build and save, median of 5), the ratio to
python-docx's plain cell-by-cell API writing the same cell texts in the same
run (target <= 0.2), and the growth when the rows double (target <= 2.3x).
"""

from __future__ import annotations


import io

import docx

from statsetter.export.docx_writer import add_table
from statsetter.styled import StyledText
from statsetter.rendering.tables import Column, Row, TableModel
from _timing import timed  # noqa: E402  (bench/ is on the path when a benchmark runs)

COLS = 8


def model(rows: int) -> TableModel:
    return TableModel(
        title=StyledText("Benchmark table"),
        number=1,
        stub_head=StyledText("Row"),
        columns=tuple(Column(StyledText.styled(f"V{j}", "i")) for j in range(COLS)),
        rows=tuple(Row(StyledText(f"row {i}"), tuple(StyledText(f"{(i * 7 + j) % 1000 / 100:.2f}") for j in range(COLS))) for i in range(rows)),
    )


def ours(t: TableModel) -> None:
    d = docx.Document()
    add_table(d, t)
    d.save(io.BytesIO())


def baseline(t: TableModel) -> None:
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




def main() -> None:
    previous = None
    for rows in (1000, 2000, 4000, 8000):
        t = model(rows)
        a = timed(lambda: ours(t), 5)
        b = timed(lambda: baseline(t), 1 if rows >= 4000 else 3)
        growth = f", growth {a / previous:.2f}x" if previous else ""
        print(f"{rows:5,} rows x {COLS}: statsetter {a:6.2f} s, python-docx cell API {b:6.2f} s, ratio {a / b:.3f}{growth}")
        previous = a


if __name__ == "__main__":
    main()
