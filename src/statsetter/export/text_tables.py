"""TableModel writers for the text formats: Markdown, HTML, LaTeX, CSV, plain.

Layout follows APA 7 §7.8-7.21 as far as each format allows: number (bold)
and title (italic) above; horizontal rules only; heads centred, stub left;
``Note.`` in italic below. Markdown pipe tables have one header row, so a
spanner is written into the heads it covers (``Spanner: head``).
"""

from __future__ import annotations

import csv
import io
import warnings
from typing import TYPE_CHECKING

from ..styled import StyledText
from ..rendering.tables import TableModel, blank_or_dash, split_decimal, title_case

if TYPE_CHECKING:
    from ..style.profile import Style

__all__ = ["table_markdown", "table_html", "table_latex", "table_csv", "table_text", "write_table"]


def _one_line(style: "Style | None") -> bool:
    """AMA's caption, "Table 5. Title" on one line, rather than APA's number over an italic title."""
    return style is not None and style.tables.get("caption") == "one_line"


def table_markdown(t: TableModel, one_line: bool = False, note_label: str = "Note.") -> str:
    out = []
    if one_line and (t.number is not None or t.title):
        out += [" ".join(([f"**Table {t.number}.**"] if t.number is not None else []) + ([title_case(t.title).markdown()] if t.title else [])), ""]
    else:
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
    for note in t.note_parts(note_label):  # general, specific and probability notes each start a line (APA 7 §7.14)
        out += ["", note.markdown()]
    return "\n".join(out) + "\n"


def _italic(text: StyledText) -> StyledText:
    """The title in italic (APA 7 §7.7); spans already in it are kept."""
    return StyledText(text.text, text.spans + StyledText.styled(text.text, "i").spans)


def _md_cell(text: str) -> str:
    return text.replace("|", "\\|") or " "


def table_html(t: TableModel, one_line: bool = False, note_label: str = "Note.") -> str:
    out = ['<div class="statsetter-table" style="overflow-x:auto">']  # a table wider than the window scrolls inside its box
    out.append('<table style="border-collapse:collapse;border-top:1px solid black;border-bottom:1px solid black">')
    if t.number is not None or t.title:  # number and title above the table, flush left (APA 7 §7.7), as its caption
        if one_line:
            caption = " ".join(([f"<b>Table {t.number}.</b>"] if t.number is not None else []) + ([title_case(t.title).html()] if t.title else []))
        else:
            caption = "<br>".join(([f"<b>Table {t.number}</b>"] if t.number is not None else []) + ([f"<i>{title_case(t.title).html()}</i>"] if t.title else []))
        out.append('<caption style="caption-side:top;text-align:left">' + caption + "</caption>")
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
    for part in t.note_parts(note_label):
        out.append(f"<p>{part.html()}</p>")
    out.append("</div>")
    return "\n".join(out) + "\n"


_LATEX_SPACE = 6 * 20  # \\tabcolsep, the space on each side of a column (6 pt), in twips
_PORTRAIT, _LANDSCAPE = 9030, 12960  # twips: the text width of the narrowest portrait page (A4) and landscape one (US Letter), 1-inch margins


def table_latex(t: TableModel, style: "Style | None" = None) -> str:
    """A booktabs table: number (bold) and title (italic) flush left above it
    (APA 7 §7.7), the stub a ragged-right column that wraps between words with
    a hanging indent (tabularx, to the line width), columns of single numbers
    aligned on the decimal mark where the style asks, notes below in a
    minipage. A head wider than its column's numbers is stacked on lines
    (``_stacked_head``), as Word wraps it. A table whose numbers and the
    stub's longest word are wider than a portrait page's text is scaled to
    it, down to 85%; a wider one goes on a landscape page of its own
    (rotating's ``sidewaystable``; a course guide to APA 7 allows a table's
    page to be turned), scaled to that page's text if it must be (the last
    resort). The document needs ``statsetter.styled.LATEX_PREAMBLE``.

    Decimal alignment keeps each number in one cell (so the table reads as
    written): in a right-aligned column the part after the mark is set in a box
    of no width (``\\rlap``) followed by an invisible copy of the column's
    longest such part (``\\phantom``), so every mark falls at the same place."""
    from .docx_writer import _HANG, _PAD, _body_shapes, _least_and_natural, _longest_word, word_columns

    mark = style.decimal_mark if style is not None else "."
    decimal = t.decimal_columns(mark) if style is not None and style.tables.get("number_align") == "decimal" else (False,) * len(t.columns)
    shapes = _body_shapes(t)
    low, natural = _least_and_natural(t, shapes)  # each column's least and natural (unwrapped) width, in Word's measure
    # a column of words (a labelled ordinal's categories: "Moderate (Slightly liberal–Moderate)") wraps between them in a
    # width of its own, as in Word; a column of numbers keeps its natural width
    words = [w and not d for w, d in zip(word_columns(shapes), decimal)]  # (a column aligned on its decimal mark keeps it)
    widths = [natural[0]] + [lo if w else na for lo, na, w in zip(low[1:], natural[1:], words)]
    stub_least = max((_longest_word(r.stub.text) for r in t.rows), default=0) + _HANG
    # twips: the table with its stub wrapped at its longest word, with LaTeX's column space (not Word's cell margins)
    # and without the tenth ``_chars`` adds so that Word never breaks a word (the goldens' tables as LaTeX set them
    # measured 0.88–0.98 of the rest). A table up to a sixth wider than the portrait text is scaled to it (to 85% or
    # more: 10 pt type at 12), a wider one turned; one wider than its page's text is set at its own width, the stub
    # wrapping at its longest word, and scaled down to the line (LaTeX measures it)
    least = (stub_least + sum(w - _PAD for w in widths[1:])) / 1.1 + 2 * len(widths) * _LATEX_SPACE
    turned = least > _PORTRAIT / 0.85
    too_wide = least > (_LANDSCAPE if turned else _PORTRAIT)
    if turned:
        name = f"Table {t.number}" if t.number is not None else "A table"
        warnings.warn(f"{name} is set on a landscape page (sidewaystable): its columns need {least / 1440:.1f} in", stacklevel=2)
    ncol = len(t.columns)
    longest = [""] * ncol
    for row in t.rows:
        for j, c in enumerate(row.cells):
            if decimal[j] and not blank_or_dash(c):
                right = split_decimal(c, mark)[1]
                if len(right.text) > len(longest[j]):
                    longest[j] = right.latex()
    page = _LANDSCAPE if turned else _PORTRAIT
    wrapped = _wrapped_widths(low, natural, words, stub_least, page, _PAD)
    # the stub and the columns of words share what the numbers leave of the line (tabularx's X columns, each's share
    # of it — \hsize — in proportion to the widths estimated for a portrait or landscape page); a table too wide for
    # its page sets them at their least widths and is scaled
    numbers = sum((na - _PAD) / 1.1 for na, w in zip(natural[1:], words) if not w) + 2 * len(natural) * _LATEX_SPACE
    shares = [max(stub_least, page - numbers - sum(wrapped))] + [w for w, word in zip(wrapped, words) if word]
    factors = iter(len(shares) * x / sum(shares) for x in shares)
    hang = "\\raggedright\\arraybackslash\\hangindent=1em\\hangafter=1"
    stub = f">{{{hang}}}p{{{stub_least / 20:.1f}pt}}" if too_wide else f">{{\\hsize={next(factors):.3f}\\hsize{hang}}}X" if any(words) else f">{{{hang}}}X"
    spec = "".join((_WRAPPING[c.align == "left"] % (wrapped[j] / 20) if too_wide else _SHARED[c.align == "left"] % next(factors)) if words[j]
                   else "r" if d or c.align == "right" else ("l" if c.align == "left" else "c") for j, (c, d) in enumerate(zip(t.columns, decimal)))
    out = ["\\begin{sidewaystable}" if turned else "\\begin{table}[htbp]", "\\raggedright"]
    if _one_line(style) and (t.number is not None or t.title):
        out.append(" ".join(([f"\\textbf{{Table {t.number}.}}"] if t.number is not None else []) + ([title_case(t.title).latex()] if t.title else []))
                   + "\\par\\medskip")
    else:
        if t.number is not None:
            out.append(f"\\textbf{{Table {t.number}}}\\par\\smallskip")
        if t.title:
            out.append(f"\\textit{{{title_case(t.title).latex()}}}\\par\\medskip")
    if too_wide:  # set at its own width, scaled down to the line only if wider (LaTeX measures it)
        out += ["\\sbox0{%", f"\\begin{{tabular}}{{@{{}}{stub}{spec}@{{}}}}"]
    else:
        out.append(f"\\begin{{tabularx}}{{\\linewidth}}{{@{{}}{stub}{spec}@{{}}}}")
    out.append("\\toprule")

    def centred(text: str, j: int) -> str:
        return f"\\multicolumn{{1}}{{c}}{{{text}}}" if decimal[j] and text else text

    if t.spanners:
        cells = [""] * (ncol + 1)
        rules = []
        skip: set[int] = set()
        for s in sorted(t.spanners, key=lambda s: s.start):
            cells[s.start + 1] = f"\\multicolumn{{{s.end - s.start}}}{{c}}{{{s.label.latex()}}}"
            skip |= set(range(s.start + 2, s.end + 1))
            rules.append(f"\\cmidrule(lr){{{s.start + 2}-{s.end + 1}}}")
        out.append(" & ".join(c for k, c in enumerate(cells) if k not in skip) + " \\\\")
        out.append(" ".join(rules))
    out.append(" & ".join([_line_start(t.stub_head.latex())] + [centred(_stacked_head(c.head, widths[j + 1] - _PAD), j) for j, c in enumerate(t.columns)])
               + " \\\\")
    out.append("\\midrule")
    for row in t.rows:
        stub_text = _line_start(("\\quad " * row.indent) + row.stub.latex())
        if row.cells:
            cells = [stub_text]
            for j, c in enumerate(row.cells):
                if not decimal[j]:
                    cells.append(c.latex())
                elif blank_or_dash(c):
                    cells.append(centred(c.latex(), j))
                else:
                    left, right = split_decimal(c, mark)
                    cells.append(f"{left.latex()}\\rlap{{{right.latex()}}}\\phantom{{{longest[j]}}}")
            out.append(" & ".join(cells) + " \\\\")
        else:
            out.append(f"\\multicolumn{{{ncol + 1}}}{{l}}{{{stub_text}}} \\\\")
    out.append("\\bottomrule")
    out.append("\\end{tabular}}\\ifdim\\wd0>\\linewidth\\resizebox{\\linewidth}{!}{\\usebox0}\\else\\usebox0\\fi" if too_wide else "\\end{tabularx}")
    notes = t.note_parts(style.note_label() if style is not None else "Note.")
    if notes:
        out.append("\\par\\medskip")
        out.append("\\begin{minipage}{\\linewidth}\\raggedright\\setlength{\\parindent}{0pt}" + "\\par ".join(n.latex() for n in notes) + "\\end{minipage}")
    out.append("\\end{sidewaystable}" if turned else "\\end{table}")
    return "\n".join(out) + "\n"


_WRAPPING = {False: ">{\\centering\\arraybackslash}p{%.1fpt}", True: ">{\\raggedright\\arraybackslash}p{%.1fpt}"}
_SHARED = {False: ">{\\hsize=%.3f\\hsize\\centering\\arraybackslash}X", True: ">{\\hsize=%.3f\\hsize\\raggedright\\arraybackslash}X"}


def _wrapped_widths(low: list[int], natural: list[int], words: list[bool], stub_least: int, page: int, pad: int) -> list[int]:
    """Per body column, the width in twips of LaTeX's text (Word's padding and tenth taken off) of a column of words:
    its least width and, of the page's text the stub's least, the numbers and the columns' space leave, shares in
    proportion to what each needs to be unwrapped, up to that (0 for a column of numbers)."""
    # (least widths keep the tenth Word's measure adds: a column of words at its least in LaTeX's own widths would
    # overflow wherever the estimate falls short, as it does for "|" or "~")
    body = [float(lo - pad) for lo in low[1:]], [max(lo - pad, (na - pad) / 1.1) for lo, na in zip(low[1:], natural[1:])]
    fixed = stub_least + sum(na for na, w in zip(body[1], words) if not w) + 2 * (len(low)) * _LATEX_SPACE
    need = [na - lo if w else 0.0 for lo, na, w in zip(*body, words)]
    spare = max(0.0, page - fixed - sum(lo for lo, w in zip(body[0], words) if w))
    share = min(1.0, spare / sum(need)) if sum(need) > 0 else 0.0
    return [int(lo + share * n) if w else 0 for lo, n, w in zip(body[0], need, words)]


def _line_start(text: str) -> str:
    """A row's first cell: one that starts with "[" is read by the ``\\\\`` or rule before it as its optional argument
    (a length: "Missing number"), so an empty group goes first."""
    return "{}" + text if text.startswith("[") else text


def _stacked_head(head: StyledText, width: int) -> str:
    """A column head in LaTeX, its words (no-break spaces hold theirs together) on as many lines as keep each within
    ``width`` twips (the column's numbers, or its longest word), centred in a tabular of its own."""
    from .docx_writer import _chars

    text = head.text
    if " " not in text or _chars(head.plain()) <= width:
        return head.latex()
    lines, start, last = [], 0, -1  # each line's text range; ``last``: the latest space the current line may end at
    for at in [i for i, ch in enumerate(text) if ch == " "] + [len(text)]:
        if last > start and _chars(text[start:at].replace("\u00a0", " ")) > width:
            lines.append((start, last))
            start = last + 1
        last = at
    lines.append((start, len(text)))
    if len(lines) == 1:
        return head.latex()
    pieces = [head.split_at(b)[0].split_at(a)[1].latex() for a, b in lines]
    return "\\begin{tabular}[b]{@{}c@{}}" + " \\\\ ".join(pieces) + "\\end{tabular}"


def table_csv(t: TableModel) -> str:
    """Plain-text cells, one header row (spanners written into the heads)."""
    buf = io.StringIO()
    writer = csv.writer(buf, lineterminator="\n")
    writer.writerow([t.stub_head.plain()] + [h.plain() for h in t.heads_with_spanners()])
    for row in t.rows:
        writer.writerow([row.stub.plain()] + ([c.plain() for c in row.cells] if row.cells else [""] * len(t.columns)))
    return buf.getvalue()


def table_text(t: TableModel, one_line: bool = False, note_label: str = "Note.") -> str:
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
    if one_line and (t.number is not None or t.title):
        out.append(" ".join(([f"Table {t.number}."] if t.number is not None else []) + ([title_case(t.title).plain()] if t.title else [])))
    else:
        if t.number is not None:
            out.append(f"Table {t.number}")
        if t.title:
            out.append(title_case(t.title).plain())
    out += [rule, line(heads), rule] + [line(b) for b in body] + [rule]
    out += [n.plain() for n in t.note_parts(note_label)]
    return "\n".join(out) + "\n"


_WRITERS = {"md": table_markdown, "html": table_html, "tex": table_latex, "csv": table_csv, "text": table_text}


def write_table(t: TableModel, fmt: str, style: "Style | None" = None) -> str:
    """The table in ``fmt``; LaTeX aligns numbers on the ``style``'s decimal mark where it asks."""
    if fmt not in _WRITERS:
        raise ValueError(f"unknown table format {fmt!r}; formats: {', '.join(_WRITERS)}")
    if fmt == "tex":
        return table_latex(t, style)
    if fmt == "csv":
        return table_csv(t)
    return _WRITERS[fmt](t, one_line=_one_line(style), note_label=style.note_label() if style is not None else "Note.")  # type: ignore[call-arg]

