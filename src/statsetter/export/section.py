"""A whole results section — its paragraphs and tables in reading order
(``rendering.compose``) — in Markdown, HTML, LaTeX, Word and JSON, and the
run's notes beside it, written where a plan says."""

from __future__ import annotations

import html
from pathlib import Path
from typing import Sequence

from ..records import Record, Result, dump_records
from ..rendering.compose import Block
from ..styled import LATEX_PREAMBLE, StyledText, escape_latex, escape_md
from ..rendering.figures import FigureModel
from ..rendering.tables import TableModel
from ..style.profile import Style
from .text_tables import write_table

__all__ = ["CAUTION", "results_of", "run_notes", "section_text", "write_section"]

CAUTION = (
    "Prepared with statsetter. Check every result against the analysis output, the target journal's instructions, "
    "the institution's thesis rules and the ethics approval, and have the analyses reviewed by a qualified statistician."
)


def results_of(records: Sequence[Record]) -> list[Result]:
    """The records that have a sentence (a Description or a correlation matrix is a table)."""
    return [r for r in records if isinstance(r, Result)]


def run_notes(notes: Sequence[str], title: str) -> str:
    """The run's notes as Markdown — automatic choices, dropped rows, tables
    made, markers filled — kept out of the manuscript, with the caution."""
    lines = [f"# Run notes: {title}", "", CAUTION, ""]
    lines += [f"- {note}" for note in notes] or ["- nothing to note"]
    return "\n".join(lines) + "\n"


def _latex_head(style: Style, paper: str | None) -> str:
    m = style.manuscript
    size = (paper or m.get("paper", "letter")) + "paper"
    spacing = {1.0: "", 1.5: "\\onehalfspacing\n", 2.0: "\\doublespacing\n"}.get(float(m.get("line_spacing", 1.0)), "")
    return (
        "\\documentclass[12pt]{article}\n\\usepackage[T1]{fontenc}\n\\usepackage[utf8]{inputenc}\n"
        + f"\\usepackage[{size},margin={m.get('margin_in', 1.0):g}in]{{geometry}}\n\\usepackage{{setspace}}\n"
        + LATEX_PREAMBLE + "\\begin{document}\n" + spacing
        # flush left, ragged right (APA 7 §2.23), the first-line indent kept; long statistics that must not break stretch the spaces
        + f"\\raggedright\\setlength{{\\parindent}}{{{m.get('first_line_indent_in', 0.5):g}in}}\\setlength{{\\emergencystretch}}{{3em}}\n"
    )


def _text(block: Block, fmt: str, style: Style) -> str:
    if isinstance(block, TableModel):
        return write_table(block, fmt, style)
    if isinstance(block, FigureModel):
        from .figure_blocks import figure_text

        return figure_text(block, fmt, style)
    return block.to(fmt)


def section_text(blocks: Sequence[Block], style: Style, title: str, fmt: str, *, caution: bool = False, paper: str | None = None) -> str:
    """The section as Markdown (``md``), HTML (``html``) or LaTeX (``tex``):
    paragraphs and tables in order; the caution line only when asked."""
    if fmt == "md":
        parts = [f"# {escape_md(title)}", *(_text(b, fmt, style) for b in blocks)] + ([f"*{CAUTION}*"] if caution else [])
        return "\n\n".join(p.rstrip("\n") for p in parts) + "\n"
    if fmt == "html":
        body = [f"<h1>{html.escape(title)}</h1>"] + [_text(b, fmt, style) if isinstance(b, (TableModel, FigureModel)) else f"<p>{b.to('html')}</p>" for b in blocks]
        body += [f"<p><i>{html.escape(CAUTION)}</i></p>"] if caution else []
        m = style.manuscript
        css = (f"body{{font-family:'{m.get('font', 'serif')}',serif;font-size:{m.get('font_size', 12):g}pt;line-height:{m.get('line_spacing', 1.5):g};"
               f"max-width:6.5in;margin:1in auto}}p{{text-indent:{m.get('first_line_indent_in', 0):g}in;margin:0}}h1{{text-align:center;font-size:1em}}"
               ".statsetter-table p,table{text-indent:0;line-height:1.2}table{margin:0.5em 0}")
        return (f'<!DOCTYPE html>\n<html lang="en"><head><meta charset="utf-8"><title>{html.escape(title)}</title>'
                f"<style>{css}</style></head><body>\n" + "\n".join(body) + "\n</body></html>\n")
    if fmt == "tex":
        parts = [f"\\section*{{{escape_latex(title)}}}", *(_text(b, fmt, style) for b in blocks)] + ([f"\\emph{{{CAUTION}}}"] if caution else [])
        return _latex_head(style, paper) + "\n\n".join(parts) + "\n\\end{document}\n"
    raise ValueError(f"unknown section format {fmt!r}")


def write_section(
    blocks: Sequence[Block], records: Sequence[Record], style: Style, title: str, targets: dict[str, Path], inputs: Sequence[Path] = (), *,
    notes: Sequence[str] = (), caution: bool = False, paper: str | None = None,
) -> list[tuple[str, Path]]:
    """Write each format in ``targets`` (md, html, tex, docx, json, notes): [(format, path)]. What the writers
    chose and said as a warning (a wide table set on landscape pages) is said on the terminal as ever and added to
    the notes, which are written last."""
    import warnings

    from ..files import write_atomic

    written = []
    said = list(notes)
    for fmt, path in sorted(targets.items(), key=lambda item: item[0] == "notes"):
        if fmt == "notes":
            write_atomic(path, run_notes(said, title), inputs=inputs)
            written.append((fmt, path))
            continue
        with warnings.catch_warnings(record=True) as caught:
            warnings.simplefilter("always")
            if fmt == "json":
                write_atomic(path, dump_records(records), inputs=inputs)
            elif fmt == "docx":
                from .docx_writer import add_runs, results_document, save_document

                document = results_document(blocks, style, title=title, paper=paper, figure_root=path.parent)
                if caution:
                    add_runs(document.add_paragraph(), StyledText.styled(CAUTION, "i"))
                save_document(document, path, inputs=inputs)
            else:
                write_atomic(path, section_text(blocks, style, title, fmt, caution=caution, paper=paper), inputs=inputs)
        for w in caught:  # each said again where the caller listens, ours noted once per format
            warnings.warn_explicit(w.message, w.category, w.filename, w.lineno)
            if issubclass(w.category, UserWarning) and f"{path.name}: {w.message}" not in said and "statsetter" in w.filename:
                said.append(f"{path.name}: {w.message}")
        written.append((fmt, path))
    return sorted(written, key=lambda item: list(targets).index(item[0]))
