"""Word page sections around a table too wide for the text: the table, its
caption and notes on pages of their own turned to landscape, the text
before and after on the pages it had. A course guide to APA 7 allows a
table's page to be turned "if doing so is helpful"
(https://www.nathanwhudson.com/courses/apa-style/tables-figures/); the
publication manual asks for the text's font in tables (apastyle.apa.org,
"Tables" — practice), so a smaller font is not the way.

Word keeps a section's page in a ``w:sectPr``: the body's last one for
the last section, and one in the properties of the paragraph that ends
each earlier section."""

from __future__ import annotations

import copy
from typing import Any

_WNS = "http://schemas.openxmlformats.org/wordprocessingml/2006/main"
_W = f"{{{_WNS}}}"
_LETTER = (12240, 15840)  # twips; python-docx's default page, 1.25-inch side margins
_SIDES = (1800, 1800)


def section_of(element: Any) -> Any:
    """The ``w:sectPr`` that governs a body-level ``element`` (the first one
    ending a section at or after it, else the body's), or None when the
    element is not in a document's body (a table cell, a header)."""
    parent = element.getparent()
    if parent is None or parent.tag != f"{_W}body":
        return None
    for sibling in [element, *element.itersiblings()]:
        found = sibling.find(f"{_W}pPr/{_W}sectPr") if sibling.tag == f"{_W}p" else None
        if found is not None:
            return found
        if sibling.tag == f"{_W}sectPr":
            return sibling
    return None


def text_width(sect: Any, landscape: bool = False) -> int:
    """The text width in twips of the page ``sect`` describes, or of the same page turned to ``landscape``."""
    size = sect.find(f"{_W}pgSz") if sect is not None else None
    margins = sect.find(f"{_W}pgMar") if sect is not None else None
    w, h = (_twips(size, "w", _LETTER[0]), _twips(size, "h", _LETTER[1])) if size is not None else _LETTER
    left, right = (_twips(margins, "left", _SIDES[0]), _twips(margins, "right", _SIDES[1])) if margins is not None else _SIDES
    return max((max(w, h) if landscape else w) - left - right, 1440)


_UNITS = {"in": 1440.0, "pt": 20.0, "pc": 240.0, "pi": 240.0, "mm": 1440 / 25.4, "cm": 1440 / 2.54}


def _twips(element: Any, name: str, default: int) -> int:
    """A measure of the page in twips: a number, or a number with a unit ("8.5in", OOXML's universal measure);
    the default when it is neither (a file written by hand or by a faulty program)."""
    text = (element.get(f"{_W}{name}") or "").strip()
    unit = _UNITS.get(text[-2:], 1.0) if text[-2:].isalpha() else 1.0
    try:
        value = float(text[:-2] if text[-2:].isalpha() else text) * unit
    except ValueError:
        return default
    return int(value) if 0 <= value < 1e6 else default


def _ending(sect: Any) -> str:
    """An empty paragraph, one point high, that ends a section of page ``sect``."""
    from lxml import etree

    return (f'<w:p xmlns:w="{_WNS}"><w:pPr><w:spacing w:before="0" w:after="0" w:line="20" w:lineRule="exact"/>'
            f'<w:rPr><w:sz w:val="2"/><w:szCs w:val="2"/></w:rPr>{etree.tostring(sect, encoding="unicode")}</w:pPr></w:p>')


def _later(sect: Any) -> Any:
    """``sect`` as the page of a section that does not open the document: on a new page, numbered on from the last,
    without a first page of its own."""
    for tag in ("type", "titlePg"):
        for found in sect.findall(f"{_W}{tag}"):
            sect.remove(found)
    for numbers in sect.findall(f"{_W}pgNumType"):
        numbers.attrib.pop(f"{_W}start", None)
    return sect


def turned(parts: "list[str | bytes]", sect: Any, opening: bool = False) -> "list[str | bytes]":
    """``parts`` (a table's caption, table and notes) on landscape pages of
    their own: a paragraph ending the text's section before them (its page
    as it was; none when they open the document or follow another turned
    table — ``opening`` —, so that no empty page comes between), one ending a
    landscape section after them; the section that follows (``sect``,
    changed in place) starts a new page and goes on numbering."""
    before = copy.deepcopy(sect)
    wide = _later(copy.deepcopy(sect))
    size = wide.find(f"{_W}pgSz")
    if size is None:  # Word's order: references, notes' properties and the section's start come before the page size
        from lxml import etree

        size = etree.Element(f"{_W}pgSz", {f"{_W}w": str(_LETTER[0]), f"{_W}h": str(_LETTER[1])})
        earlier = [e for e in wide if e.tag in {f"{_W}{t}" for t in ("headerReference", "footerReference", "footnotePr", "endnotePr", "type")}]
        wide.insert(wide.index(earlier[-1]) + 1 if earlier else 0, size)
    w, h = _twips(size, "w", _LETTER[0]), _twips(size, "h", _LETTER[1])
    size.set(f"{_W}w", str(max(w, h)))
    size.set(f"{_W}h", str(min(w, h)))
    size.set(f"{_W}orient", "landscape")
    _later(sect)
    return [*([] if opening else [_ending(before)]), *parts, _ending(wide)]


def settle(body: Any) -> None:
    """Leave no empty page around turned tables: a section with nothing in it
    between two turned tables (two table markers in consecutive paragraphs,
    each paragraph gone to its table) is removed; and when a turned table
    ends the document, the paragraph ``turned`` put after it (the last thing
    in ``body``) is removed and its page becomes the body's last."""
    for ending in [e for e in body if _ending_of(e, "portrait")]:
        if _ending_of(ending.getprevious(), "landscape"):
            body.remove(ending)
    last = body[-1] if len(body) else None
    if last is None or last.tag != f"{_W}sectPr":
        return
    ending = last.getprevious()
    if not landscape_ending(ending):
        return
    body.replace(last, ending.find(f"{_W}pPr/{_W}sectPr"))
    body.remove(ending)


def landscape_ending(element: Any) -> bool:
    """Whether ``element`` is the paragraph ``turned`` put after a table to end its landscape section."""
    return _ending_of(element, "landscape")


def _ending_of(element: Any, orientation: str) -> bool:
    """Whether ``element`` is a one-point paragraph ``turned`` put in to end a section of that page orientation."""
    spacing = element.find(f"{_W}pPr/{_W}spacing") if element is not None and element.tag == f"{_W}p" else None
    if spacing is None or spacing.get(f"{_W}line") != "20" or element.find(f"{_W}r") is not None:
        return False
    sect = element.find(f"{_W}pPr/{_W}sectPr")
    size = sect.find(f"{_W}pgSz") if sect is not None else None
    return sect is not None and ((size is not None and size.get(f"{_W}orient") == "landscape") == (orientation == "landscape"))
