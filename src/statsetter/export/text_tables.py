"""TableModel writers for the text formats: Markdown, HTML, LaTeX, CSV, plain.

Layout follows APA 7 §7.8-7.21 as far as each format allows: number (bold)
and title (italic) above; horizontal rules only; heads centred, stub left;
``Note.`` in italic below. Markdown pipe tables have one header row, so a
spanner is written into the heads it covers (``Spanner: head``).
"""

from __future__ import annotations

import csv
import io

from ..styled import StyledText
from ..rendering.tables import TableModel, title_case

__all__ = ["table_markdown", "table_html", "table_latex", "table_csv", "table_text", "write_table"]


def table_markdown(t: TableModel) -> str:
    out = []
    if t.number is not None:
        out += [f"**Table {t.number}**", ""]
    if t.title:
        out += [_italic(title_case(t.title)).markdown(), ""]
    heads = [t.stub_head.markdown()] + [h.markdown() for h in t.heads_with_spanners()]
    out.append("| " + " | ".join(_md_cell(h) for h in heads) + " |")
    aligns = [":---"] + [":---:" if c.align in ("center", "decimal") else ("---:" if c.align == "right" else ":---") for c in t.columns]
    out.append("|" + "|".join(aligns) + "|")
    for row in t.rows:
        stub = ("&nbsp;&nbsp;&nbsp;&nbsp;" * row.indent) + row.stub.markdown()
        cells = [c.markdown() for c in row.cells] if row.cells else [""] * len(t.columns)
        out.append("| " + " | ".join(_md_cell(c) for c in [stub] + cells) + " |")
    for note in t.note_parts():  # general, specific and probability notes each start a line (APA 7 §7.14)
        out += ["", note.markdown()]
    return "\n".join(out) + "\n"


def _italic(text: StyledText) -> StyledText:
    """The title in italic (APA 7 §7.7); spans already in it are kept."""
    return StyledText(text.text, text.spans + StyledText.styled(text.text, "i").spans)


def _md_cell(text: str) -> str:
    return text.replace("|", "\\|") or " "


def table_html(t: TableModel) -> str:
    out = ['<div class="statsetter-table">']
    out.append('<table style="border-collapse:collapse;border-top:1px solid black;border-bottom:1px solid black">')
    if t.number is not None or t.title:  # number and title above the table, flush left (APA 7 §7.7), as its caption
        caption = [f"<b>Table {t.number}</b>"] if t.number is not None else []
        caption += [f"<i>{title_case(t.title).html()}</i>"] if t.title else []
        out.append('<caption style="caption-side:top;text-align:left">' + "<br>".join(caption) + "</caption>")
    out.append("<thead>")
    ncol = len(t.columns)
    if t.spanners:
        cells = ['<th style="text-align:left"></th>']
        j = 0
        for s in sorted(t.spanners, key=lambda s: s.start):
            cells += ["<th></th>"] * (s.start - j)
            cells.append(
                f'<th colspan="{s.end - s.start}" style="text-align:center;border-bottom:1px solid black">{s.label.html()}</th>'
            )
            j = s.end
        cells += ["<th></th>"] * (ncol - j)
        out.append("<tr>" + "".join(cells) + "</tr>")
    heads = [f'<th style="text-align:left;border-bottom:1px solid black">{t.stub_head.html()}</th>']
    heads += [f'<th style="text-align:center;border-bottom:1px solid black">{c.head.html()}</th>' for c in t.columns]
    out.append("<tr>" + "".join(heads) + "</tr>")
    out.append("</thead>")
    out.append("<tbody>")
    for row in t.rows:
        pad = f"padding-left:{1.5 * row.indent:g}em;" if row.indent else ""
        cells = [f'<td style="text-align:left;{pad}">{row.stub.html()}</td>']
        if row.cells:
            for c, col in zip(row.cells, t.columns):
                align = "center" if col.align == "decimal" else col.align
                cells.append(f'<td style="text-align:{align}">{c.html()}</td>')
        else:
            cells.append(f'<td colspan="{ncol}"></td>')
        out.append("<tr>" + "".join(cells) + "</tr>")
    out.append("</tbody>")
    out.append("</table>")
    for part in t.note_parts():
        out.append(f"<p>{part.html()}</p>")
    out.append("</div>")
    return "\n".join(out) + "\n"


def table_latex(t: TableModel) -> str:
    """A booktabs table; the document needs ``statsetter.styled.LATEX_PREAMBLE``
    (booktabs, upgreek); ``\\textsubscript`` needs LaTeX 2015 or later."""
    ncol = len(t.columns)
    spec = "l" + "".join("r" if c.align == "right" else ("l" if c.align == "left" else "c") for c in t.columns)
    out = ["\\begin{table}[htbp]", "\\centering"]
    if t.number is not None:
        out.append(f"\\textbf{{Table {t.number}}}\\par")
    if t.title:
        out.append(f"\\textit{{{title_case(t.title).latex()}}}\\par\\medskip")
    out.append(f"\\begin{{tabular}}{{{spec}}}")
    out.append("\\toprule")
    if t.spanners:
        cells = [""]
        rules = []
        j = 0
        for s in sorted(t.spanners, key=lambda s: s.start):
            cells += [""] * (s.start - j)
            cells.append(f"\\multicolumn{{{s.end - s.start}}}{{c}}{{{s.label.latex()}}}")
            rules.append(f"\\cmidrule(lr){{{s.start + 2}-{s.end + 1}}}")
            j = s.end
        cells += [""] * (ncol - j)
        out.append(" & ".join(cells) + " \\\\")
        out.append(" ".join(rules))
    out.append(" & ".join([t.stub_head.latex()] + [c.head.latex() for c in t.columns]) + " \\\\")
    out.append("\\midrule")
    for row in t.rows:
        stub = ("\\quad " * row.indent) + row.stub.latex()
        if row.cells:
            out.append(" & ".join([stub] + [c.latex() for c in row.cells]) + " \\\\")
        else:
            out.append(f"\\multicolumn{{{ncol + 1}}}{{l}}{{{stub}}} \\\\")
    out.append("\\bottomrule")
    out.append("\\end{tabular}")
    notes = t.note_parts()
    if notes:
        out.append("\\par\\medskip")
        out.append("\\begin{minipage}{\\linewidth}\\raggedright " + " ".join(n.latex() for n in notes) + "\\end{minipage}")
    out.append("\\end{table}")
    return "\n".join(out) + "\n"


def table_csv(t: TableModel) -> str:
    """Plain-text cells, one header row (spanners written into the heads)."""
    buf = io.StringIO()
    writer = csv.writer(buf, lineterminator="\n")
    writer.writerow([t.stub_head.plain()] + [h.plain() for h in t.heads_with_spanners()])
    for row in t.rows:
        writer.writerow([row.stub.plain()] + ([c.plain() for c in row.cells] if row.cells else [""] * len(t.columns)))
    return buf.getvalue()


def table_text(t: TableModel) -> str:
    """A fixed-width table for the terminal, with horizontal rules only."""
    heads = [t.stub_head.plain()] + [h.plain() for h in t.heads_with_spanners()]
    body = [
        [("  " * r.indent) + r.stub.plain()] + ([c.plain() for c in r.cells] if r.cells else [""] * len(t.columns))
        for r in t.rows
    ]
    widths = [max(len(x[j]) for x in [heads] + body) for j in range(len(heads))]

    def line(cells: list[str]) -> str:
        first = cells[0].ljust(widths[0])
        rest = [c.center(w) for c, w in zip(cells[1:], widths[1:])]
        return "  ".join([first] + rest).rstrip()

    rule = "─" * (sum(widths) + 2 * (len(widths) - 1))
    out = []
    if t.number is not None:
        out.append(f"Table {t.number}")
    if t.title:
        out.append(t.title.plain())
    out += [rule, line(heads), rule] + [line(b) for b in body] + [rule]
    out += [n.plain() for n in t.note_parts()]
    return "\n".join(out) + "\n"


_WRITERS = {"md": table_markdown, "html": table_html, "tex": table_latex, "csv": table_csv, "text": table_text}


def write_table(t: TableModel, fmt: str) -> str:
    try:
        return _WRITERS[fmt](t)
    except KeyError:
        raise ValueError(f"unknown table format {fmt!r}; formats: {', '.join(_WRITERS)}") from None

