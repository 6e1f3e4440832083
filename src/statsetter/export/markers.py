"""Result markers in an author's own chapter, filled from records.

A marker is ``[[id]]`` (the statistics string), ``[[id|sentence]]``,
``[[id|stats]]`` or ``[[id|table]]`` (a results table placed after the
paragraph), where ``id`` is a record's ``id``. Markers are found in body
paragraphs, table cells, headers, footers and footnotes, also when Word has
split them across runs; the text around a marker keeps its formatting, and the
inserted runs take the formatting of the run the marker starts in.
"""

from __future__ import annotations

import copy
import re
from dataclasses import dataclass, field
from pathlib import Path
from typing import TYPE_CHECKING, Iterable, Iterator, Sequence

from ..errors import InputError
from ..records.naming import ID_PATTERN
from ..styled import StyledText

if TYPE_CHECKING:
    from ..records import Result
    from ..style.profile import Style

__all__ = ["MARKER", "FillReport", "fill_chapter"]

MARKER = re.compile(r"\[\[\s*(" + ID_PATTERN + r")\s*(?:\|\s*(stats|sentence|table)\s*)?\]\]")
_W = "{http://schemas.openxmlformats.org/wordprocessingml/2006/main}"


@dataclass
class FillReport:
    filled: list[tuple[str, str]] = field(default_factory=list)  # (id, where)
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


def _fill_paragraph(paragraph, lookup, where: str, report: FillReport, used: set[str]) -> None:  # type: ignore[no-untyped-def]
    runs = _runs(paragraph)
    texts = [_run_text(r) for r in runs]
    full = "".join(texts)
    if "[[" not in full:
        return
    matches = list(MARKER.finditer(full))
    for m in reversed(matches):
        key, form = m.group(1), m.group(2) or "stats"
        if form == "table":
            table_xml = lookup(key, form)
            if table_xml is None:
                report.unknown.append((m.group(0), where))
                continue
            used.add(key)
            report.filled.append((key, where))
            _remove_span(runs, texts, m.start(), m.end())
            from docx.oxml import parse_xml

            table = parse_xml(table_xml)
            paragraph.addnext(table)
            if paragraph.getparent() is not None and paragraph.getparent().tag == f"{_W}tc":
                from docx.oxml import OxmlElement

                table.addnext(OxmlElement("w:p"))  # Word needs a cell to end in a paragraph
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
    records: Sequence["Result"],
    out: "str | Path",
    style: "Style | str | None" = None,
) -> FillReport:
    """Fill every marker of ``chapter`` from ``records`` (by ``id``) and write
    ``out``; the chapter itself is never modified."""
    from ..files import same_file
    from ..rendering.sentences import render
    from ..style.profile import load_style
    from .docx_input import open_docx
    from .docx_writer import save_document

    if same_file(chapter, out):
        raise InputError(f"{out}: the output would overwrite the chapter; choose another output path")
    resolved = load_style(style)
    by_id: dict[str, "Result"] = {}
    for r in records:
        if r.id is None:
            continue
        if r.id in by_id:
            raise InputError(f"records: id {r.id!r} is used twice")
        by_id[r.id] = r
    cache: dict[tuple[str, str], StyledText] = {}

    def lookup(key: str, form: str):  # type: ignore[no-untyped-def]
        if key not in by_id:
            return None
        if (key, form) not in cache:
            if form == "table":
                from ..rendering.record_tables import results_table
                from .docx_writer import _table_xml

                cache[(key, form)] = _table_xml(results_table([by_id[key]], resolved), resolved.tables.get("number_align", "center"))
            else:
                cache[(key, form)] = render(by_id[key], form, resolved)
        return cache[(key, form)]

    document = open_docx(chapter)
    report = FillReport()
    used: set[str] = set()
    for name, root in _parts(document):
        for i, paragraph in enumerate(root.iter(f"{_W}p")):
            in_table = any(a.tag == f"{_W}tc" for a in paragraph.iterancestors())
            _fill_paragraph(paragraph, lookup, f"{name} paragraph {i + 1}{' (table cell)' if in_table else ''}", report, used)
    report.unused = sorted(set(by_id) - used)
    save_document(document, out, inputs=[chapter])
    return report


def describe(report: FillReport) -> Iterable[str]:
    yield f"filled {len(report.filled)} marker(s)"
    for marker, where in report.unknown:
        yield f"unknown marker {marker} in {where} (left as it is)"
    for key in report.unused:
        yield f"record {key!r} is not used by any marker"
