"""Reading a manuscript into text units with their locations.

A .docx is read straight from its XML (paragraphs of the body and of table
cells, headers, footers, footnotes and endnotes), keeping which characters
are italic, so italics can be checked; .md, .txt and .tex are read as text,
one unit per paragraph (blank-line separated), with Markdown emphasis
(``*t*``) and LaTeX ``\\textit{}``/``$t$`` taken as italic markers and
removed from the text the parser sees.
"""

from __future__ import annotations

import re
import zipfile
from bisect import bisect_left, bisect_right
from dataclasses import dataclass
from pathlib import Path
from typing import Callable, Iterator

from ..errors import InputError
from ..files import read_start
from ..records.result import _collector_paused

__all__ = ["Unit", "read_units", "MAX_TEXT_BYTES"]

MAX_TEXT_BYTES = 200 * 1024 * 1024
_W = "{http://schemas.openxmlformats.org/wordprocessingml/2006/main}"


Trace = tuple[tuple[int, ...], tuple[int, ...]]  # (starts, offsets): from starts[k] on, source = index + offsets[k]


@dataclass(frozen=True, slots=True)
class Unit:
    location: str
    text: str
    italic: tuple[tuple[int, int], ...] | None = None  # None: the format does not say
    part: str = "word/document.xml"
    index: int = 0  # the paragraph's position among the part's w:p elements (a text block: its first line)
    origin: tuple[Trace, ...] = ()  # how text maps back to the file's characters (markers removed); () = as is
    cell: tuple[int, int, int] | None = None  # (table, row, column), all from 1, for a table cell: its column the grid's (a merged cell
    # spans several, and the cell after it starts past them), as a table's columns line up under their heads
    equations: tuple[tuple[int, int], ...] = ()  # (start, end) of each Word equation's text: spaced by the equation, not the author
    subscripts: tuple[tuple[int, int], ...] = ()  # (start, end) of a Word subscript run's letters ("G" of η²G): no character shows them lowered
    columns: int = 1  # the grid columns a table cell spans (a spanner's head over the columns of several models)

    def source_index(self, i: int) -> int:
        """Where character ``i`` of ``text`` is in the block as written."""
        for starts, offsets in reversed(self.origin):
            i += offsets[bisect_right(starts, i) - 1]
        return i


def read_units(path: "str | Path", encoding: str = "utf-8") -> list[Unit]:
    with _collector_paused():  # tens of thousands of units, no reference cycles: collections over them are wasted
        return _read_units(path, encoding)


def _read_units(path: "str | Path", encoding: str) -> list[Unit]:
    p = Path(path)
    suffix = p.suffix.lower()
    if suffix == ".docx":
        return list(_docx_units(p))
    if suffix not in (".md", ".markdown", ".txt", ".text", ".tex"):
        raise InputError(f"{p}: cannot audit {p.suffix or 'a file without extension'}; statsetter reads .docx, .md, .txt and .tex")
    if p.is_file() and p.stat().st_size > MAX_TEXT_BYTES:
        raise InputError(f"{p}: {p.stat().st_size:,} bytes, over the {MAX_TEXT_BYTES:,}-byte limit for a text manuscript")
    raw = read_start(p, kind="manuscript")
    if not raw.strip():
        raise InputError(f"{p}: the file is empty")
    if raw.startswith(b"PK\x03\x04") or b"\x00" in raw[:4096]:
        raise InputError(f"{p}: binary contents (a Word file or another binary format?), not {suffix} text")
    try:
        text = raw.decode("utf-8-sig" if encoding.lower().replace("-", "") == "utf8" else encoding)
    except UnicodeDecodeError as exc:
        raise InputError(f"{p}: not {encoding} text (byte {exc.start}); give the file's encoding with --encoding") from None
    except LookupError:
        raise InputError(f"--encoding: unknown encoding {encoding!r}") from None
    if suffix == ".tex":
        text = _uncommented(text)
    elif suffix in (".md", ".markdown"):  # an HTML comment is not printed either: blanked as LaTeX's are, its lines kept
        text = _HTML_COMMENT.sub(lambda m: re.sub(r"[^\n]", "\u200b", m.group()), text)
    return list(_text_units(text, suffix))


_HTML_COMMENT = re.compile(r"<!--.*?-->", re.S)


def _uncommented(tex: str) -> str:
    """LaTeX without its comments, which are not printed: each blanked, character for character, so that every place
    stays where it is (a line that is all comment by zero-width spaces: a line of spaces would end the paragraph)."""
    return _TEX_COMMENT.sub(lambda m: ("\u200b" if m.group(1) is not None else " ") * len(m.group()), tex)


_BLANK = " \t\n\r\u200b"  # white space and a comment's blanks
_TEX_COMMENT = re.compile(r"(?m:^([ \t]*))?(?<!\\)%[^\n]*")  # from an unescaped % to the line's end (\% prints a percent sign)


# *t*, _t_, and inline HTML's <i>t</i> and <em>t</em> (Markdown converted from Word or a PDF often carries HTML tags)
_MD_ITALIC = re.compile(r"(?<![*A-Za-z0-9])([*_])(?!\s)([^*_\n]{1,40}?)(?<!\s)\1(?![*A-Za-z0-9])|<(i|em)>([^<>\n]{1,40})</\3>")
# (inline math as $…$ or LaTeX's own \(…\))
_TEX_ITALIC = re.compile(r"\\textit\{([^{}]{1,40})\}|\\emph\{([^{}]{1,40})\}|\$([^$\n]{1,40})\$|\\\(([^\n]{1,40}?)\\\)")


_SUPERSCRIPT = str.maketrans("0123456789+-−", "⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻⁻")
# digits set as subscripts (a Word run or equation's, Markdown's ~38~, LaTeX's \textsubscript{38}) read as the subscript
# digits they print as, one character each: "t₃₈", the df as AMA 11 sets them, which the parser reads (as plain digits,
# "t38", they had been no statistic: a manuscript in AMA style, statsetter's own among them, lost its t and χ² tests)
_SUBSCRIPT = str.maketrans("0123456789", "₀₁₂₃₄₅₆₇₈₉")
# a Word run set as a subscript or superscript: its digits (a superscript's signs too) as the characters it prints as —
# "χ²" as Markdown's χ^2^ reads, and a citation's superscript number no longer run on into a p ("p = .03" and ⁴, not .034)
_SCRIPTS = {"subscript": _SUBSCRIPT, "superscript": _SUPERSCRIPT}

# LaTeX back to the characters it prints (the inverse of the LaTeX writer's escapes)
_TEX_GREEK = {f"\\{up}{name}": char for name, char in (
    ("alpha", "α"), ("beta", "β"), ("chi", "χ"), ("eta", "η"), ("omega", "ω"), ("varepsilon", "ε"), ("epsilon", "ε"),
    ("tau", "τ"), ("rho", "ρ"), ("varphi", "φ"), ("phi", "φ")) for up in ("up", "")}
_TEX_GREEK.update({"\\Delta": "Δ", "\\times": "×", "\\leq": "≤", "\\geq": "≥", "\\pm": "±", "\\le": "≤", "\\ge": "≥"})
_TEX_MATH_WORD = re.compile("|".join(re.escape(k) for k in sorted(_TEX_GREEK, key=len, reverse=True)) + r"(?![A-Za-z])")
_TEX_CHARS = {"\\textminus{}": "−", "\\textless{}": "<", "\\textgreater{}": ">", "\\%": "%", "\\&": "&", "\\_": "_", "\\#": "#",
              "\\$": "$", "---": "—", "--": "–", "~": "\u00a0", "\\,": "\u202f"}  # ~ and \, print no-break spaces
_TEX_CHAR = re.compile("(" + "|".join(re.escape(k) for k in sorted(_TEX_CHARS, key=len, reverse=True)) + ")")
_TEX_BOX = re.compile(r"\\rlap\{([^{}]{0,40})\}(?:\\phantom\{[^{}]{0,40}\})?")
_TEX_SUP = re.compile(r"\\textsuperscript\{([^{}]{1,24})\}")
_TEX_SUB = re.compile(r"\\textsubscript\{([^{}]{1,24})\}")
# pandoc's χ^2^ and t~38~, and inline HTML's χ<sup>2</sup> and t<sub>38</sub>
_PANDOC_SUP = re.compile(r"\^([^\^\s]{1,24})\^|<sup>([^<>\n]{1,24})</sup>")
_PANDOC_SUB = re.compile(r"~([^~\s]{1,24})~|<sub>([^<>\n]{1,24})</sub>")  # (long enough for a corrected F's df: 1.67,65.31)


class _Builder:
    """Text built from pieces, remembering where each piece came from."""

    def __init__(self) -> None:
        self.parts: list[str] = []
        self.starts: list[int] = []
        self.offsets: list[int] = []
        self.length = 0

    def add(self, piece: str, source: int) -> None:
        if not piece:
            return
        offset = source - self.length
        if not self.offsets or self.offsets[-1] != offset:
            self.starts.append(self.length)
            self.offsets.append(offset)
        self.parts.append(piece)
        self.length += len(piece)

    def text(self) -> str:
        return "".join(self.parts)

    def trace(self) -> Trace | None:
        """None when nothing moved (no marker was removed)."""
        if self.offsets in ([], [0]):
            return None
        return tuple(self.starts), tuple(self.offsets)


def _replace(pattern: re.Pattern[str], text: str, inner: "Callable[[str], str]") -> tuple[str, Trace | None]:
    """``pattern``'s matches replaced by ``inner(the group that matched)``, traced."""
    out = _Builder()
    at = 0
    for m in pattern.finditer(text):
        group = m.lastindex or 0
        out.add(text[at : m.start()], at)
        out.add(inner(m.group(group)), m.start(group))
        at = m.end()
    out.add(text[at:], at)
    return out.text(), out.trace()


# (siunitx's \num{2.14} and \num[round-precision=2]{2.14}, numprint's \numprint{2.14} and \np{2.14} print the number:
# "$t(38) = \num{2.14}$"; siunitx's manual, numprint's README on CTAN)
_TEX_NUMBER = r"(?:num|numprint|np)(?:\[[^\]]{0,80}\])?"
_TEX_WRAPPED = re.compile(rf"\\(?:mathit|mathrm|mathsf|mathnormal|textit|textrm|text|operatorname|{_TEX_NUMBER})\s*\{{([^{{}}]*)\}}")
_TEX_NUM = re.compile(rf"\\{_TEX_NUMBER}\{{([^{{}}]{{1,40}})\}}")  # the same outside math
_TEX_SCRIPT = re.compile(r"([_^])(?:\{([^{}]{1,24})\}|([0-9A-Za-z]))")
_DF_DIGITS = re.compile(r"[\d.,;\s]+")


def _tex_script(m: "re.Match[str]") -> str:
    body = m.group(2) if m.group(2) is not None else m.group(3)
    if m.group(1) == "^":  # ^2, ^{2}, ^{-4}: their digits and signs as superscripts (χ², 10⁻⁴); letters as they are
        return body.translate(_SUPERSCRIPT)
    return body.translate(_SUBSCRIPT) if _DF_DIGITS.fullmatch(body) else body  # t_{38}, F_{2,97}: AMA's df; η_p, r_s: ηp, rs


def _tex_math(inner: str) -> str:
    """A TeX math group (or italic text) as it prints: Greek commands as letters, \\mathit{t} and \\text{ns} as their
    letters, sub- and superscripts as what they show (``$t_{38} = 2.14$`` is t₃₈ = 2.14, ``$\\eta_p^2$`` ηp²), TeX's
    spaces as spaces."""
    inner = _TEX_WRAPPED.sub(lambda w: w.group(1), _TEX_MATH_WORD.sub(lambda w: _TEX_GREEK[w.group(0)], inner))
    inner = _TEX_SCRIPT.sub(_tex_script, inner)
    return inner.replace("\\,", "\u202f").replace("\\;", " ").replace("\\ ", " ").replace("\\!", "").strip()


def _strip_marks(text: str, suffix: str) -> tuple[str, tuple[tuple[int, int], ...], tuple[Trace, ...]]:
    """Text without emphasis markers, the italic spans they marked (kept for
    a later check), and how the text maps back to ``text``. Markdown's pandoc
    super- and subscripts become what they print as: ``χ^2^`` is χ², ``r~s~``
    is rs."""
    tex = suffix == ".tex"
    escapes = entities = None
    if not tex and "&" in text:  # HTML's character references, which Markdown prints as their characters: knitr's kable
        # writes R's "Pr(>|t|)" head as "Pr(>&#124;t&#124;)" in a pipe table (a "|" would part the cell)
        import html  # (html.entities is a large table: loaded only for a text that may hold a reference)

        text, entities = _replace(_MD_ENTITY, text, html.unescape)
    maths = None
    if not tex and ("$" in text or "\\(" in text):  # inline math in Markdown (R Markdown's and Quarto's $\eta_p^2$, \(…\) as
        text, maths = _replace(_MD_MATH, text, _tex_math)  # some exports write it), read as LaTeX's is: before the escapes
    if not tex and "\\" in text:  # Markdown's escapes ("\\*p < .05" prints *p < .05): held out of the emphasis and scripts
        text, escapes = _replace(_MD_ESCAPE, text, lambda g: _MD_HELD.get(g, g))
    out, spans, at = _Builder(), [], 0
    for m in (_TEX_ITALIC if tex else _MD_ITALIC).finditer(text):
        group = next(g for g in range(1, 5) if m.group(g) is not None) if tex else 2 if m.group(2) is not None else 4
        inner = m.group(group)
        greek = False
        if tex:
            inner = _tex_math(inner)
            greek = group >= 3 and inner[:1] in "αβχηωετρφΔ"  # $\upchi$, $\chi^2$: math Greek, not italic
        out.add(text[at : m.start()], at)
        if not greek:
            spans.append((out.length, out.length + len(inner)))
        out.add(inner, m.start(group))  # a rewritten TeX group maps to where it starts
        at = m.end()
    out.add(text[at:], at)
    clean, traces = out.text(), [entities, maths, escapes, out.trace()]
    # after the emphasis, so that *r*~s~ and \textit{r}\textsubscript{s} read rs (spans are not used for text files)
    sup_pattern, sub_pattern = (_TEX_SUP, _TEX_SUB) if tex else (_PANDOC_SUP, _PANDOC_SUB)
    clean, sup = _replace(sup_pattern, clean, lambda g: g.translate(_SUPERSCRIPT))
    clean, sub = _replace(sub_pattern, clean, lambda g: g.translate(_SUBSCRIPT))
    traces += [sup, sub]
    if tex:  # \textminus{}, \%, \textless{} … as the characters they print; a decimal-aligned cell's
        # \rlap{.14}\phantom{.001} (statsetter's tables) as the digits it prints once
        clean, boxes = _replace(_TEX_BOX, clean, lambda g: g)
        clean, numbers = _replace(_TEX_NUM, clean, lambda g: g)
        clean, chars = _replace(_TEX_CHAR, clean, lambda g: _TEX_CHARS[g])
        traces += [boxes, numbers, chars]
    if escapes is not None:
        clean = clean.translate(_MD_LET_GO)
    return clean, tuple(spans), tuple(t for t in traces if t is not None)


# Markdown's inline math as pandoc reads it: a $ with no space after it, to the next $ with no space before it and no digit
# after it ("costs $5 and $10" is no math; an escaped \$ opens none); or \(…\)
_MD_MATH = re.compile(r"(?<![\\$])\$(?=[^\s$])([^$\n]{1,120}?)(?<=[^\s\\])\$(?![\d$])|\\\(([^\n]{1,120}?)\\\)")
_MD_ENTITY = re.compile(r"&(?:#\d{1,7}|#[xX][0-9a-fA-F]{1,6}|[A-Za-z][A-Za-z0-9]{1,31});")
_MD_ESCAPE = re.compile(r"\\([!-/:-@\[-`{-~])")  # a backslash before ASCII punctuation (CommonMark's escapes)
_MD_HELD = {"*": "\ue000", "_": "\ue001", "^": "\ue002", "~": "\ue003"}  # the markers' characters, held as private ones
_MD_LET_GO = str.maketrans({held: char for char, held in _MD_HELD.items()})


def _text_units(text: str, suffix: str) -> Iterator[Unit]:
    line, tables = 1, 0
    for block in re.split(r"(\n[ \t]*\n)", text):
        if block.startswith("\n") and not block.strip():
            line += block.count("\n")
            continue
        if block.strip():
            block = block.rstrip()
            rows = block.split("\n")
            if suffix in (".md", ".markdown") and len(rows) >= 2 and _PIPE_RULE.fullmatch(rows[1]) and all("|" in r for r in rows):
                tables += 1
                yield from _pipe_table_units(rows, line, tables)
            elif suffix == ".tex" and _TABULAR.search(block):
                for unit in _tex_table_units(block, line, tables + 1):
                    tables = unit.cell[0] if unit.cell is not None else tables
                    yield unit
            else:
                clean, _, origin = _strip_marks(block, suffix) if suffix != ".txt" else (block, (), ())
                yield Unit(f"line {line}", clean, None, "", line, origin)  # italics are checked in .docx only
        line += block.count("\n")


# a LaTeX table's body: tabular (and its starred, tabularx and longtable kinds) with the groups after its name (tabularx's
# width, the column spec); inside a cell, a nested tabular (a header cell of two lines) and a row's rules
_TABULAR = re.compile(r"\\begin\{(tabularx|tabular\*|tabular|longtable|array)\}")
_TEX_RULES = re.compile(r"[\s\u200b]*(?:\\(?:toprule|midrule|bottomrule|hline|endhead|endfirsthead|endfoot|endlastfoot)\b"
                        r"|\\(?:cline|cmidrule)(?:\([^)]*\))?\{[^{}]*\}|\\addlinespace(?:\[[^\]]*\])?)")
_MULTICOLUMN = re.compile(r"\\multicolumn\{(\d{1,3})\}")
_TEX_CELL = re.compile(r"\\multicolumn\{\d+\}\{(?:[^{}]|\{[^{}]*\})*\}(?=\{)|\\begin\{tabular\}(?:\[[^\]]*\])?\{(?:[^{}]|\{(?:[^{}]|\{[^{}]*\})*\})*\}"
                       r"|\\end\{tabular\}|\\\\")


def _cell_text(raw: str) -> tuple[str, "Trace | None"]:
    """A LaTeX cell's text without what sets it out: a \\multicolumn's content kept (its braces dropped), a nested
    tabular's begin and end and its line breaks dropped; traced."""
    out, at = _Builder(), 0
    m = _TEX_CELL.search(raw)
    while m is not None:
        out.add(raw[at : m.start()], at)
        at = m.end()
        if m.group().startswith("\\multicolumn"):
            close = _skip_group(raw, at)  # the content's group: kept, its braces not
            out.add(raw[at + 1 : close - 1], at + 1)
            at = close
        m = _TEX_CELL.search(raw, at)
    out.add(raw[at:], at)
    return out.text(), out.trace()


def _skip_group(text: str, i: int, limit: int = 4096) -> int:
    """The position after the brace group (or the [option]) starting at ``text[i]`` (white space before it skipped),
    looked for within ``limit`` characters (a column spec or a cell is short; an unclosed one is not read as one)."""
    while i < len(text) and text[i].isspace():
        i += 1
    stop = min(len(text), i + limit)
    if i < stop and text[i] == "[":
        end = text.find("]", i, stop)
        return stop if end < 0 else end + 1
    depth = 0
    for m in _BRACE.finditer(text, i, stop):
        depth += 1 if m.group() == "{" else -1 if m.group() == "}" else 0
        if depth == 0:
            return m.end()
    return stop


_BRACE = re.compile(r"\\.|[{}]", re.S)  # an escaped character (\{ is text) or a brace
_TABULAR_TOKEN = re.compile(r"\\\\|\\begin\{|\\end\{|\\.|[{}&]", re.S)


def _tex_cells(body: str) -> list[list[tuple[int, int]]]:
    """The (start, end) of each cell of each row of a tabular's body: a row ends at \\\\ and a cell at &, both only outside
    braces and nested environments (a header cell's own tabular); an escaped \\& is text."""
    rows: list[list[tuple[int, int]]] = []
    cells: list[tuple[int, int]] = []
    depth = env = start = 0
    skip_to = 0
    for m in _TABULAR_TOKEN.finditer(body):
        if m.start() < skip_to:
            continue
        token = m.group()
        if token == "\\\\" and depth == 0 and env == 0:
            cells.append((start, m.start()))
            rows.append(cells)
            cells, start = [], m.end()
            if body.startswith("[", start):  # \\[2pt]
                start = skip_to = _skip_group(body, start)
        elif token == "\\begin{":
            env += 1
            depth += 1
        elif token == "\\end{":
            env -= 1
            depth += 1
        elif token == "{":
            depth += 1
        elif token == "}":
            depth -= 1
        elif token == "&" and depth == 0 and env == 0:
            cells.append((start, m.start()))
            start = m.end()
    if body[start:].strip():
        cells.append((start, len(body)))
    if cells:
        rows.append(cells)
    return rows


def _tex_table_units(block: str, line: int, table: int) -> Iterator[Unit]:
    """A LaTeX block with tables: its text around them as units, each tabular's cells as a table's units (as
    ``_pipe_table_units`` makes them), the rules left out. Each cell's text maps back to its place in its line."""
    at = 0
    breaks = [m.start() for m in re.finditer("\n", block)]  # where each line ends: a cell's line and column by bisection
    for begin in _TABULAR.finditer(block):
        if begin.start() < at:  # a tabular nested in a cell of the one before
            continue
        body_start = begin.end()
        for _ in range(2 if begin.group(1) in ("tabularx", "tabular*") else 1):
            body_start = _skip_group(block, body_start)
        end = block.find(f"\\end{{{begin.group(1)}}}", body_start)
        end = len(block) if end < 0 else end
        yield from _tex_piece(block, at, begin.start(), line)
        r = 0
        for cells in _tex_cells(block[body_start:end]):
            texts = []
            for a, b in cells:
                a += body_start
                b += body_start
                rule = _TEX_RULES.match(block, a, b)
                while rule is not None and rule.end() > a:
                    a = rule.end()
                    rule = _TEX_RULES.match(block, a, b)
                raw = block[a:b]
                a += len(raw) - len(raw.lstrip(_BLANK))
                raw = raw.strip(_BLANK)
                if raw.startswith("{") and _skip_group(raw, 0) == len(raw):  # a cell in one group (siunitx's S column's text: {$t$})
                    a += 1 + len(raw[1:-1]) - len(raw[1:-1].lstrip(_BLANK))
                    raw = raw[1:-1].strip(_BLANK)
                texts.append((a, raw))
            if not any(t for _, t in texts):
                continue
            r += 1
            c, span = 1, 0
            for a, raw in texts:
                c += span
                wide = _MULTICOLUMN.match(raw)  # a cell spanning columns: the cell after it starts past them
                span = min(max(1, int(wide.group(1))), _MAX_SPAN) if wide is not None else 1
                if not raw:
                    continue
                unwrapped, outer = _cell_text(raw)
                clean, _, origin = _strip_marks(unwrapped, ".tex")
                if not clean.strip():
                    continue
                k = bisect_left(breaks, a)  # the newlines before the cell
                row_start = breaks[k - 1] + 1 if k else 0
                where = line + k
                traces = (((0,), (a - row_start,)),) + ((outer,) if outer is not None else ()) + origin
                yield Unit(f"line {where}", clean, None, "", where, traces, cell=(table, r, c), columns=span)
        table += 1
        at = block.find("\n", end) + 1 if block.find("\n", end) >= 0 else len(block)
    yield from _tex_piece(block, at, len(block), line)


def _tex_piece(block: str, start: int, end: int, line: int) -> Iterator[Unit]:
    """The text of block[start:end] (whole lines around a table: ``start`` is a line's start) as one unit, if it holds any."""
    piece = block[start:end]
    if piece.strip():
        clean, _, origin = _strip_marks(piece, ".tex")
        where = line + block.count("\n", 0, start)
        yield Unit(f"line {where}", clean, None, "", where, origin)


# a pipe table (Markdown as pandoc reads it): a header row, then a rule of dashes (colons for alignment), then rows
_PIPE_RULE = re.compile(r"[ \t]*\|?[ \t]*:?-+:?[ \t]*(?:\|[ \t]*:?-+:?[ \t]*)*\|?[ \t]*")
_PIPE = re.compile(r"(?<!\\)\|")  # a cell's border (an escaped \| is text)


def _pipe_table_units(rows: list[str], line: int, table: int) -> Iterator[Unit]:
    """A pipe table's cells, each a unit with its (table, row, column) as a Word table's cell has them (the rule left
    out of the count), read as a paragraph is: a statistic and the p in a later column of its row are one statistic,
    a value under a head named t or F with its df and p columns is one (tables.table_statistics). Each cell's text
    maps back to its place in its line (``origin``: the cell's start first)."""
    for k, row in enumerate(rows):
        if k == 1:
            continue
        edges = [m.start() for m in _PIPE.finditer(row)]
        stripped = row.lstrip()
        bounds = ([-1] if not stripped.startswith("|") else []) + edges + ([len(row)] if not row.rstrip().endswith("|") or not edges else [])
        for c, (a, b) in enumerate(zip(bounds, bounds[1:]), 1):
            raw = row[a + 1 : b]
            if not raw.strip():
                continue
            start = a + 1 + len(raw) - len(raw.lstrip())
            raw = raw.strip()
            clean, _, origin = _strip_marks(raw, ".md")
            yield Unit(f"line {line + k}", clean, None, "", line + k, (((0,), (start,)), *origin), cell=(table, k if k else 1, c))


def _docx_units(p: Path) -> Iterator[Unit]:
    from lxml import etree

    from ..export.docx_input import DAMAGED, check_docx, damaged

    check_docx(p)
    try:
        with zipfile.ZipFile(p) as archive:
            names = archive.namelist()
            order = {"header": 0, "footer": 1, "footnotes": 2, "endnotes": 3}
            extra = [n for n in names if re.fullmatch(r"word/(header|footer)\d*\.xml|word/(foot|end)notes\.xml", n)]
            parts = ["word/document.xml"] + sorted(extra, key=lambda n: (order[re.sub(r"\d*\.xml$", "", n[5:])], n))
            for part in parts:
                try:
                    root = etree.fromstring(archive.read(part), etree.XMLParser(huge_tree=True, resolve_entities=False, no_network=True))
                except etree.XMLSyntaxError as exc:
                    raise InputError(f"{p}: {part} is not well-formed XML ({exc.msg})") from None
                yield from _part_units(root, part)
    except DAMAGED as exc:
        raise damaged(p, exc) from None


def _place(part: str) -> str:
    name = part.rsplit("/", 1)[-1].removesuffix(".xml")
    return {"document": "paragraph", "footnotes": "footnote paragraph", "endnotes": "endnote paragraph"}.get(name, f"{name} paragraph")


def _part_units(root, part: str) -> Iterator[Unit]:  # type: ignore[no-untyped-def]
    label = _place(part)
    in_cell = {}  # every paragraph inside a table cell → (table, row, column); the innermost cell wins
    fallback = set()  # a text box's paragraphs as drawn for older readers (mc:Fallback): the same as its mc:Choice's
    t = 0
    for tbl in root.iter(f"{_W}tbl", _FALLBACK):
        if tbl.tag == _FALLBACK:
            fallback.update(tbl.iter(_P))
            continue
        t += 1
        for r, tr in enumerate((x for x in tbl if x.tag == f"{_W}tr"), 1):
            column = 1 + _grid_count(tr.find(f"{_W}trPr/{_W}gridBefore"))  # (a row may start past the grid's first columns)
            for k, tc in enumerate((x for x in tr if x.tag == f"{_W}tc"), 1):
                span = max(1, _grid_count(tc.find(f"{_W}tcPr/{_W}gridSpan")))  # a merged cell spans its grid columns
                for para in tc.iter(_P):
                    in_cell[para] = (t, r, column, k, span)
                column += span
    body_count = 0
    for index, para in enumerate(root.iter(_P)):
        if fallback and para in fallback:
            continue
        cell = in_cell.get(para)
        if cell is None:
            body_count += 1
        text, spans, equations, lowered = _paragraph_text(para)
        if not text.strip():
            continue
        if cell is None:
            location = f"{label} {body_count}"
        else:
            t, r, c, k, _ = cell  # (the location counts the row's cells as the reader sees them; the table is read by grid column)
            location = f"table {t}, row {r}, cell {k}" if part == "word/document.xml" else f"{label}, table {t}, row {r}, cell {k}"
        yield Unit(location, text, spans, part, index, cell=cell[:3] if cell is not None else None, equations=equations, subscripts=lowered,
                   columns=cell[4] if cell is not None else 1)


def _grid_count(element) -> int:  # type: ignore[no-untyped-def]
    """The grid columns a w:gridSpan or w:gridBefore gives (0 where there is none or its value is not a count)."""
    value = element.get(_VAL) if element is not None else None
    return min(int(value), _MAX_SPAN) if value is not None and value.isdigit() and len(value) < 4 else 0


_MAX_SPAN = 64  # the most columns a cell is taken to span (Word's tables have at most 63; a hostile file's 999 each would
# make a spanner's words cost a thousand columns a cell)


_VAL = f"{_W}val"
_P = f"{_W}p"
_FALLBACK = "{http://schemas.openxmlformats.org/markup-compatibility/2006}Fallback"


def owner(node, parent=None):  # type: ignore[no-untyped-def]
    """The paragraph ``node`` (a run or an equation) belongs to: the nearest w:p above it — a text box's own paragraph
    for a run of its text, not the paragraph that holds the text box, whose text it is not."""
    node = node.getparent() if parent is None else parent
    while node is not None and node.tag != _P:
        node = node.getparent()
    return node
_R, _T, _DEL, _I, _RPR, _VERT = f"{_W}r", f"{_W}t", f"{_W}del", f"{_W}i", f"{_W}rPr", f"{_W}vertAlign"
REMOVED = frozenset({_DEL, f"{_W}moveFrom"})  # a tracked deletion, and the place a tracked move took text from: not the text
_VANISH = f"{_W}vanish"


def _on(toggle) -> bool:  # type: ignore[no-untyped-def]
    """Whether a run property that is on or off (w:i, w:vanish) is on: present, and not set to 0, false or off."""
    return toggle.get(_VAL, "true") not in ("0", "false", "off")


def hidden(run) -> bool:  # type: ignore[no-untyped-def]
    """Whether a run is hidden text (w:vanish in its own properties), which Word does not print: not read."""
    toggle = run.find(f"{_RPR}/{_VANISH}")
    return toggle is not None and _on(toggle)
_CHUNKS = {f"{_W}tab": "\t", f"{_W}br": "\n", f"{_W}cr": "\n", f"{_W}noBreakHyphen": "-"}
_M = "{http://schemas.openxmlformats.org/officeDocument/2006/math}"
OMATH = f"{_M}oMath"  # an equation (Office Math), inline or in an equation paragraph (m:oMathPara holds them)
_M_R, _M_T, _M_D, _M_E, _M_SUB, _M_SUP, _M_VAL = f"{_M}r", f"{_M}t", f"{_M}d", f"{_M}e", f"{_M}sub", f"{_M}sup", f"{_M}val"
_M_PLAIN = {"p", "b"}  # m:sty: plain (upright) and bold; the others (none, i, bi) are italic, as Word sets math


def math_text(node) -> list[tuple[str, bool]]:  # type: ignore[no-untyped-def]
    """An equation's text as it reads, in pieces (text, italic): its runs in order, a delimiter's characters around
    its parts ("t(38)" is a run "t" and a delimiter around "38", whose parentheses are properties, not text: the
    default "(" and ")", parts apart by "|"), a superscript after its base ("χ2")."""
    out: list[tuple[str, bool]] = []
    for child in node:
        tag = child.tag
        if tag == _M_R:
            sty = child.find(f"{_M}rPr/{_M}sty")
            italic = child.find(f"{_M}rPr/{_M}nor") is None and (sty is None or sty.get(_M_VAL) not in _M_PLAIN)
            out += [(t.text or "", italic) for t in child.iter(_M_T)]
        elif tag == _M_D:
            props = child.find(f"{_M}dPr")

            def char(name: str, default: str) -> str:
                found = props.find(f"{_M}{name}") if props is not None else None
                return default if found is None else found.get(_M_VAL, "")

            out.append((char("begChr", "("), False))
            for i, part in enumerate(c for c in child if c.tag == _M_E):
                if i:
                    out.append((char("sepChr", "|"), False))
                out += math_text(part)
            out.append((char("endChr", ")"), False))
        elif tag == _M_SUB or tag == _M_SUP:  # a script's digits as the characters they print as
            out += [(text.translate(_SUBSCRIPT if tag == _M_SUB else _SUPERSCRIPT), italic) for text, italic in math_text(child)]
        elif isinstance(tag, str) and tag.startswith(_M) and not tag.endswith("Pr"):  # sSup, sSub, e, sup, f, num, … (not a comment)
            out += math_text(child)
    return out


# Word's Symbol font, as older manuscripts type Greek with it (a "c" set in Symbol prints χ): its letters and the signs
# of a statistic, from the font's encoding, as the Unicode characters they print as
_SYMBOL_FONT = str.maketrans(
    "ABCDEFGHIKLMNOPQRSTUWXYZabcdefghijklmnopqrstuvwxyz-\u00a3\u00b3\u00b1\u00b4\u00b9\u00bb\u00b0",
    "ΑΒΧΔΕΦΓΗΙΚΛΜΝΟΠΘΡΣΤΥΩΞΨΖαβχδεφγηιϕκλμνοπθρστυϖωξψζ−≤≥±×≠≈°")
_SYM, _FONTS = f"{_W}sym", f"{_W}rFonts"
_FONT_ATTRS = (f"{_W}ascii", f"{_W}hAnsi")  # the fonts of Latin letters


def symbol_font(props) -> bool:  # type: ignore[no-untyped-def]
    """Whether ``props`` (a run property) sets the Symbol font for Latin letters: they print as Greek ones."""
    return props.tag == _FONTS and any(props.get(a) == "Symbol" for a in _FONT_ATTRS)


def symbol_text(node) -> str:  # type: ignore[no-untyped-def]
    """The character a w:sym (Insert > Symbol) prints, when its font is Symbol; "" for another font's (not read)."""
    if node.get(f"{_W}font") != "Symbol":
        return ""
    try:
        code = int(node.get(f"{_W}char", ""), 16) & 0xFF  # "F063": the font's own code 0x63, in the private-use area
    except ValueError:
        return ""
    return chr(code).translate(_SYMBOL_FONT) if 0x20 < code < 0x7F or code >= 0xA0 else ""


def _slanted(spans: list[tuple[int, int]], start: int, end: int) -> None:
    """Characters start..end are italic: the last span grown when they follow it, else a new one."""
    if spans and spans[-1][1] == start:
        spans[-1] = (spans[-1][0], end)
    else:
        spans.append((start, end))


def _paragraph_text(para) -> tuple[str, tuple[tuple[int, int], ...], tuple[tuple[int, int], ...], tuple[tuple[int, int], ...]]:  # type: ignore[no-untyped-def]
    """A paragraph's text (deleted runs left out; a subscript run's digits as subscript digits), the spans of its italic
    runs, of its equations and of its subscript runs' letters (which no character shows as lowered), in one walk over
    its runs and their text."""
    pieces: list[str] = []
    spans: list[tuple[int, int]] = []
    math: list[tuple[int, int]] = []
    lowered_letters: list[tuple[int, int]] = []
    length = 0
    italic, lowered, skip, run = False, None, True, None  # text outside a run is not read; lowered: a script's characters
    symbol = False  # the run is set in the Symbol font
    for node in para.iter(_R, _T, _I, _VERT, _FONTS, _VANISH, _SYM, OMATH, *_CHUNKS):
        tag = node.tag
        if tag == OMATH:  # an equation: its text as it reads (its own runs are not w:r, w:t)
            skip = True
            if owner(node) is not para:  # in a text box: that paragraph's
                continue
            begin = length
            for chunk, slanted in math_text(node):
                if chunk and slanted:
                    _slanted(spans, length, length + len(chunk))
                pieces.append(chunk)
                length += len(chunk)
            math.append((begin, length))
            continue
        if tag == _R:
            parent = node.getparent()
            own = parent is para or owner(node, parent) is para  # (a text box's runs are its own paragraphs')
            run, skip, italic, lowered, symbol = node, not own or parent.tag in REMOVED, False, None, False
            continue
        if tag == _I or tag == _VERT or tag == _FONTS or tag == _VANISH:  # as set in the properties of the current run (not a paragraph mark's, not a tracked change's old ones)
            props = node.getparent()
            if props is not None and props.tag == _RPR and props.getparent() is run:
                if tag == _VANISH:  # hidden text is not printed
                    skip = skip or _on(node)
                elif tag == _I:
                    italic = _on(node)
                elif tag == _VERT:
                    lowered = _SCRIPTS.get(node.get(_VAL, ""))
                else:
                    symbol = symbol_font(node)
            continue
        if skip:
            continue
        chunk = (node.text or "") if tag == _T else symbol_text(node) if tag == _SYM else _CHUNKS[tag]
        if not chunk:
            continue
        if symbol and tag == _T:
            chunk = chunk.translate(_SYMBOL_FONT)
        if lowered:
            chunk = chunk.translate(lowered)
            if lowered is _SUBSCRIPT and not chunk.isdigit() and any(c.isalpha() for c in chunk):
                lowered_letters.append((length, length + len(chunk)))
        if italic:
            _slanted(spans, length, length + len(chunk))
        pieces.append(chunk)
        length += len(chunk)
    return "".join(pieces), tuple(spans), tuple(math), tuple(lowered_letters)
