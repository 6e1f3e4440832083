"""A whole results section — a paragraph per record and the tables — in
Markdown, HTML, LaTeX, Word and JSON, written where a plan says."""

from __future__ import annotations

import html
from pathlib import Path
from typing import Sequence

from ..records import Record, Result, dump_records
from ..rendering.sentences import render
from ..styled import LATEX_PREAMBLE, StyledText
from ..rendering.tables import TableModel
from ..style.profile import Style
from .text_tables import write_table

__all__ = ["CAUTION", "automatic_choices", "results_of", "section_text", "write_section"]

CAUTION = (
    "Prepared with statsetter. Check every result against the analysis output, the target journal's instructions, "
    "the institution's thesis rules and the ethics approval, and have the analyses reviewed by a qualified statistician."
)


def automatic_choices(records: Sequence[Result]) -> list[StyledText]:
    """One paragraph per choice statsetter made for the author (a test chosen
    by the levels of measurement), so that no choice is silent."""
    out = []
    for r in records:
        for note in r.notes:
            if note.kind == "choice":
                out.append(StyledText.styled(f"Note on {r.id or r.kind}.", "i") + f" {note.text} Check it against the design.")
    return out


def results_of(records: Sequence[Record]) -> list[Result]:
    """The records that have a sentence (a Description or a correlation matrix is a table)."""
    return [r for r in records if isinstance(r, Result)]


def section_text(records: Sequence[Record], tables: Sequence[TableModel], style: Style, title: str, fmt: str) -> str:
    """The section as Markdown (``md``), HTML (``html``) or LaTeX (``tex``)."""
    records = results_of(records)
    sentences = [render(r, "sentence", style).to(fmt) for r in records]
    blocks = [write_table(t, fmt) for t in tables] + [c.to(fmt) for c in automatic_choices(records)]
    if fmt == "md":
        return "\n\n".join([f"# {title}", *sentences, *blocks, f"*{CAUTION}*"]) + "\n"
    if fmt == "html":
        choices = [f"<p>{c.to('html')}</p>" for c in automatic_choices(records)]
        body = "\n".join([f"<h1>{html.escape(title)}</h1>", *(f"<p>{s}</p>" for s in sentences), *blocks[: len(tables)], *choices,
                           f"<p><i>{html.escape(CAUTION)}</i></p>"])
        return f'<!DOCTYPE html>\n<html lang="en"><head><meta charset="utf-8"><title>{html.escape(title)}</title></head><body>\n{body}\n</body></html>\n'
    if fmt == "tex":
        head = "\\documentclass{article}\n\\usepackage[T1]{fontenc}\n\\usepackage[utf8]{inputenc}\n" + LATEX_PREAMBLE + "\\begin{document}\n"
        title_tex = title.replace("\\", "\\textbackslash{}").replace("&", "\\&").replace("%", "\\%")
        return head + "\n\n".join([f"\\section*{{{title_tex}}}", *sentences, *blocks, f"\\emph{{{CAUTION}}}"]) + "\n\\end{document}\n"
    raise ValueError(f"unknown section format {fmt!r}")


def write_section(
    records: Sequence[Record], tables: Sequence[TableModel], style: Style, title: str, targets: dict[str, Path], inputs: Sequence[Path] = ()
) -> list[tuple[str, Path]]:
    """Write each format in ``targets`` (md, html, tex, docx, json): [(format, path)]."""
    from ..files import write_atomic

    written = []
    for fmt, path in targets.items():
        if fmt == "json":
            write_atomic(path, dump_records(records), inputs=inputs)
        elif fmt == "docx":
            from .docx_writer import add_runs, results_document, save_document

            document = results_document(results_of(records), style, title=title, tables=tables)
            for choice in automatic_choices(results_of(records)):
                add_runs(document.add_paragraph(), choice)
            add_runs(document.add_paragraph(), StyledText.styled(CAUTION, "i"))
            save_document(document, path, inputs=inputs)
        else:
            write_atomic(path, section_text(records, tables, style, title, fmt), inputs=inputs)
        written.append((fmt, path))
    return written
