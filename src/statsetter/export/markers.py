"""Result markers in an author's own chapter, filled from records.

A marker is ``[[id]]`` (the statistics string), ``[[id|sentence]]``,
``[[id|stats]]`` or ``[[id|table]]`` (the record's results table placed after
the paragraph), where ``id`` is a record's ``id``; ``[[table:ID]]`` places a
whole table — one the plan defines, by its id, or the table of an analysis's
records (Table 1, correlations, regression, ANOVA) — and ``[[ref:ID]]`` writes
"Table N" for it. Tables are numbered in the order they appear in the chapter,
so references follow when tables move; each comes with its number, title and
notes. A paragraph that held only a table marker is replaced by the table.
Markers are found in body
paragraphs, table cells, headers, footers and footnotes, also when Word has
split them across runs; the text around a marker keeps its formatting, and the
inserted runs take the formatting of the run the marker starts in.
"""

from __future__ import annotations

import copy
import re
from dataclasses import dataclass, field
from pathlib import Path
from typing import TYPE_CHECKING, Any, Iterable, Iterator, Mapping, Sequence

from ..errors import InputError
from ..records.naming import ID_PATTERN
from ..styled import StyledText

if TYPE_CHECKING:
    from ..records import Record, Result
    from ..rendering.figures import FigureModel
    from ..rendering.tables import TableModel
    from ..style.profile import Style

__all__ = ["MARKER", "FillReport", "fill_chapter"]

MARKER = re.compile(r"\[\[\s*(" + ID_PATTERN + r")\s*(?:\|\s*(stats|sentence|table)\s*)?\]\]")
_W = "{http://schemas.openxmlformats.org/wordprocessingml/2006/main}"
_LOOSE = re.compile(r"\[\[([^\[\]\n]{0,200})\]\]")  # anything written as a marker
_FORM = re.compile(r"\|\s*([^\]]*?)\s*\]\]$")


@dataclass
class FillReport:
    filled: list[tuple[str, str]] = field(default_factory=list)  # (id, where); a table marker's id is "table:ID"
    unknown: list[tuple[str, str]] = field(default_factory=list)
    unused: list[str] = field(default_factory=list)


def _parts(document) -> Iterator[tuple[str, object]]:  # type: ignore[no-untyped-def]
    """(name, root element) of the body, headers, footers, footnotes, endnotes and comments."""
    yield "body", document.element.body
    seen = set()
    for rel in document.part.rels.values():
        target = getattr(rel, "target_part", None)
        if target is None or id(target) in seen:
            continue
        name = str(target.partname)
        if any(k in name for k in ("header", "footer", "footnotes", "endnotes", "comments")):
            seen.add(id(target))
            element = getattr(target, "element", None)
            if element is None:
                from docx.oxml import parse_xml

                element = parse_xml(target.blob)
                target._element = element  # keep edits
                _persist(target)
            yield name.rsplit("/", 1)[-1].split(".")[0], element


def _persist(part) -> None:  # type: ignore[no-untyped-def]
    """Make a generic XML part serialise its (edited) element on save."""
    from lxml import etree

    def blob(self=part):  # type: ignore[no-untyped-def]
        return etree.tostring(self._element, xml_declaration=True, encoding="UTF-8", standalone=True)

    part.__class__ = type(part.__class__.__name__, (part.__class__,), {"blob": property(lambda self: blob(self))})


def _runs(paragraph) -> list:  # type: ignore[no-untyped-def]
    """The paragraph's own runs, also inside tracked insertions, hyperlinks,
    inline content controls, smart tags and simple fields; not those of a
    paragraph nested in it (a text box has its own) nor deleted ones."""
    out = []
    for r in paragraph.iter(f"{_W}r"):
        node = r.getparent()
        while node is not None and node is not paragraph and node.tag not in _STOP:
            node = node.getparent()
        if node is paragraph:
            out.append(r)
    return out


_STOP = frozenset({f"{_W}p", f"{_W}del", f"{_W}moveFrom", f"{_W}txbxContent"})


def _run_text(run) -> str:  # type: ignore[no-untyped-def]
    return "".join(t.text or "" for t in run.findall(f"{_W}t"))


def _set_text(run, text: str) -> None:  # type: ignore[no-untyped-def]
    ts = run.findall(f"{_W}t")
    if not ts:
        from docx.oxml import OxmlElement

        t = OxmlElement("w:t")
        run.append(t)
        ts = [t]
    from .docx_writer import xml_safe

    ts[0].text = xml_safe(text)
    ts[0].set("{http://www.w3.org/XML/1998/namespace}space", "preserve")
    for extra in ts[1:]:
        run.remove(extra)


def _styled_runs(template, text: StyledText) -> list:  # type: ignore[no-untyped-def]
    from docx.oxml import OxmlElement

    out = []
    for chunk, styles in text.segments():
        run = OxmlElement("w:r")
        rpr = template.find(f"{_W}rPr")
        rpr = copy.deepcopy(rpr) if rpr is not None else OxmlElement("w:rPr")
        run.append(rpr)
        if "i" in styles:
            rpr.append(OxmlElement("w:i"))
        if "sup" in styles or "sub" in styles:
            va = OxmlElement("w:vertAlign")
            va.set(f"{_W}val", "superscript" if "sup" in styles else "subscript")
            rpr.append(va)
        _set_text(run, chunk)
        out.append(run)
    return out


def _marker(m: "re.Match[str]") -> tuple[str, str]:
    """(key, form) of a marker: ``[[table:ID]]`` is (ID, "whole"), ``[[figure:ID]]`` (ID, "figure"), ``[[ref:ID]]`` (ID, "ref")."""
    key, form = m.group(1), m.group(2) or "stats"
    for prefix, kind in (("table:", "whole"), ("ref:", "ref"), ("figure:", "figure")):
        if key.startswith(prefix) and m.group(2) is None:
            return key[len(prefix):], kind
    return key, form


def _fill_paragraph(paragraph, lookup, where: str, report: FillReport, used: set[str]) -> None:  # type: ignore[no-untyped-def]
    runs = _runs(paragraph)
    texts = [_run_text(r) for r in runs]
    full = "".join(texts)
    if "[[" not in full:
        return
    matches = list(MARKER.finditer(full))
    known = {(m.start(), m.end()) for m in matches}
    for m in _LOOSE.finditer(full):  # a marker of another form ("[[id|bogus]]", "[[two words]]"): said, never passed over
        if (m.start(), m.end()) not in known:
            report.unknown.append((m.group(0), where))
    tables_after = False
    for m in reversed(matches):
        key, form = _marker(m)
        if form in ("table", "whole", "figure"):
            parts = lookup(key, form, paragraph)
            if parts is None:
                report.unknown.append((m.group(0), where))
                continue
            used.add(key)
            report.filled.append((f"{'figure' if form == 'figure' else 'table'}:{key}" if form != "table" else key, where))
            _remove_span(runs, texts, m.start(), m.end())
            from docx.oxml import parse_xml

            for xml in reversed(parts):
                paragraph.addnext(parse_xml(xml) if isinstance(xml, (str, bytes)) else xml)
            tables_after = True
            continue
        text = lookup(key, form)
        if text is None:
            report.unknown.append((m.group(0), where))
            continue
        used.add(key)
        report.filled.append((key, where))
        # locate the runs holding the marker's first and last characters
        starts, pos = [], 0
        for t in texts:
            starts.append(pos)
            pos += len(t)
        first = max(i for i, s in enumerate(starts) if s <= m.start() and (texts[i] or s == m.start()))
        last = max(i for i, s in enumerate(starts) if s < m.end())
        head = texts[first][: m.start() - starts[first]]
        tail = texts[last][m.end() - starts[last] :]
        template = runs[first]
        if first == last:
            after = copy.deepcopy(template)
            _set_text(after, tail)
            template.addnext(after)
        else:
            for i in range(first + 1, last):
                _set_text(runs[i], "")
            _set_text(runs[last], tail)
        _set_text(template, head)
        texts[first] = head
        anchor = template
        for r in _styled_runs(template, text):
            anchor.addnext(r)
            anchor = r
        # markers are replaced from the last to the first: an earlier marker
        # touches only runs up to ``first``, whose text (now ``head``) is kept
        # current, so its offsets stay valid
    if tables_after:
        parent = paragraph.getparent()
        if parent is not None and parent.tag == f"{_W}tc" and parent[-1].tag == f"{_W}tbl":
            from docx.oxml import OxmlElement

            parent.append(OxmlElement("w:p"))  # Word needs a cell to end in a paragraph
        if not "".join(texts).strip() and parent is not None and parent.tag != f"{_W}tc":
            parent.remove(paragraph)  # the paragraph held only the marker: the table takes its place


def _table_numbers(roots: Iterable) -> dict[tuple[str, str], int]:  # type: ignore[type-arg]
    """Each placed table's and figure's number, in the order the markers appear (two series)."""
    numbers: dict[tuple[str, str], int] = {}
    for root in roots:
        for paragraph in root.iter(f"{_W}p"):
            text = "".join(_run_text(r) for r in _runs(paragraph))
            for m in MARKER.finditer(text) if "[[" in text else ():
                key, form = _marker(m)
                if form in ("table", "whole"):
                    numbers.setdefault((form, key), sum(1 for k in numbers if k[0] != "figure") + 1)
                elif form == "figure":  # figures are numbered in their own series
                    numbers.setdefault((form, key), sum(1 for k in numbers if k[0] == "figure") + 1)
    return numbers


def _remove_span(runs, texts, start: int, end: int) -> None:  # type: ignore[no-untyped-def]
    pos = 0
    for i, t in enumerate(texts):
        a, b = pos, pos + len(t)
        pos = b
        if b <= start or a >= end:
            continue
        keep = t[: max(0, start - a)] + t[max(0, end - a):]
        _set_text(runs[i], keep)
        texts[i] = keep


def fill_chapter(
    chapter: "str | Path",
    records: Sequence["Record"],
    out: "str | Path",
    style: "Style | str | None" = None,
    *,
    tables: "Mapping[str, TableModel] | None" = None,
    figures: "Mapping[str, FigureModel] | None" = None,
    figure_root: "str | Path | None" = None,
) -> FillReport:
    """Fill every marker of ``chapter`` from ``records`` (by ``id``),
    ``tables`` (by id, for ``[[table:ID]]``) and ``figures`` (by id, for
    ``[[figure:ID]]``; their PNG files under ``figure_root``, else drawn) and
    write ``out``; the chapter itself is never modified."""
    from ..files import same_file
    from ..rendering.sentences import render
    from ..style.profile import load_style
    from .docx_input import open_docx
    from .docx_writer import save_document

    if same_file(chapter, out):
        raise InputError(f"{out}: the output would overwrite the chapter; choose another output path")
    resolved = load_style(style)
    by_id: dict[str, "Result"] = {}
    from ..records import Result

    for r in records:
        if r.id is None or not isinstance(r, Result):  # a Description or a matrix is placed as a whole table
            continue
        if r.id in by_id:
            raise InputError(f"records: id {r.id!r} is used twice")
        by_id[r.id] = r
    from ..rendering.compose import analysis_of, subject
    from ..rendering.layout import table as lay_out
    from .docx_writer import add_table_text_style, table_line, table_parts, text_width_of

    by_analysis: dict[str, list["Record"]] = {}
    for r in records:
        by_analysis.setdefault(analysis_of(r), []).append(r)
    document = open_docx(chapter)
    parts = list(_parts(document))
    numbers = _table_numbers(root for _, root in parts)
    width = text_width_of(document)
    cache: dict[tuple[str, str], Any] = {}

    def whole(key: str) -> "TableModel | None":
        if tables and key in tables:
            return tables[key]
        if key in by_analysis:  # a Description or a correlation matrix is its table; other records are laid out together
            found = by_analysis[key]
            whole_records = [r for r in found if not isinstance(r, Result)]
            return lay_out(whole_records[0] if whole_records else found, resolved)
        return None

    def lookup(key: str, form: str, at: Any = None):  # type: ignore[no-untyped-def]
        """What a marker stands for; a table's Word parts for a marker in paragraph ``at`` (they go after it)."""
        def placed(t: "TableModel | None") -> list | None:  # type: ignore[type-arg]
            """A table's Word parts for its place (a page of the chapter's), its cells' paragraph style put into the chapter first."""
            if t is None:
                return None
            add_table_text_style(document, table_line(resolved))
            return table_parts(t, resolved, width, before=at.getnext() if at is not None else None)

        if (key, form) in cache:
            made = cache[(key, form)]
            return placed(made) if form in ("whole", "table") else made
        made: Any = None
        if form == "ref":
            number = numbers.get(("whole", key)) or numbers.get(("table", key))
            made = StyledText(f"Table {number}") if number is not None else None
            if made is None and ("figure", key) in numbers:
                made = StyledText(f"Figure {numbers[('figure', key)]}")
        elif form == "figure":
            f = (figures or {}).get(key)
            made = _figure_parts(document, f.with_number(numbers[("figure", key)]), resolved, width, figure_root) if f is not None else None
        elif form == "whole":
            t = whole(key)
            made = t.with_number(numbers[("whole", key)]) if t is not None else None
        elif key in by_id:
            r = by_id[key]
            if form == "table":
                from ..rendering.record_tables import results_table

                title = subject(r)
                made = results_table([r], resolved, title=title[:1].upper() + title[1:]).with_number(numbers[("table", key)])
            else:
                made = render(r, form, resolved)
        cache[(key, form)] = made  # a table is cached as its model: its parts depend on the page it goes on
        return placed(made) if form in ("whole", "table") else made

    report = FillReport()
    used: set[str] = set()
    for name, root in parts:
        for i, paragraph in enumerate(list(root.iter(f"{_W}p"))):
            in_table = any(a.tag == f"{_W}tc" for a in paragraph.iterancestors())
            _fill_paragraph(paragraph, lookup, f"{name} paragraph {i + 1}{' (table cell)' if in_table else ''}", report, used)
    report.unused = sorted(set(by_id) - used - {r.id for k in used if k in by_analysis for r in by_analysis[k] if r.id})
    save_document(document, out, inputs=[chapter])
    return report


def _figure_parts(document, model: "FigureModel", style: "Style", width: int, root: "str | Path | None") -> list:  # type: ignore[no-untyped-def,type-arg]
    """A figure as Word XML elements for a ``[[figure:ID]]`` marker: its written PNG when there is one, else drawn."""
    from .figure_blocks import figure_parts

    png = model.files.get("png")
    found = Path(root) / png if png is not None and root is not None else None
    image = model.png if model.png is not None else (found if found is not None and found.exists() else None)
    return figure_parts(document, model, style, image, width)


def describe(report: FillReport) -> Iterable[str]:
    yield f"filled {len(report.filled)} marker(s)"
    for marker, where in report.unknown:
        form = _FORM.search(marker)
        hint = f"; after '|' a marker takes stats, sentence or table, not {form.group(1)!r}" if form and form.group(1) not in ("stats", "sentence", "table") else ""
        yield f"unknown marker {marker} in {where} (left as it is{hint})"
    if report.unused:
        shown = ", ".join(report.unused[:8]) + (f" and {len(report.unused) - 8} more" if len(report.unused) > 8 else "")
        yield f"{len(report.unused)} record(s) not placed by any marker: {shown}"
