"""StyledText: plain text plus italic, superscript and subscript spans.

Templates and symbols are written in a tiny markup, an HTML subset:
``<i>t</i>``, ``R<sup>2</sup>``, ``r<sub>s</sub>``, with ``&lt;``, ``&gt;``
and ``&amp;`` for the three reserved characters. :meth:`StyledText.from_markup`
parses it; :meth:`StyledText.markup` writes it back. Writers turn a
StyledText into plain text (Unicode super/subscripts where they exist),
pandoc Markdown, HTML or LaTeX, and the Word writer turns its segments into
runs.
"""

from __future__ import annotations

import re
from functools import lru_cache
from typing import Iterable, Literal, NamedTuple

__all__ = ["Span", "StyledText", "STYLES", "escape_markup"]

SpanStyle = Literal["i", "sup", "sub"]
STYLES: tuple[str, ...] = ("i", "sup", "sub")

_TOKEN = re.compile(r"<(/?)(i|sup|sub)>|&(lt|gt|amp|quot|#\d+|#x[0-9a-fA-F]+);|[<>&]")
_ENTITY = {"lt": "<", "gt": ">", "amp": "&", "quot": '"'}
_TAG_SPLIT = re.compile(r"<(/?)(i|sup|sub)>")
_NO_STYLE: frozenset[str] = frozenset()
_ONE_STYLE = {name: frozenset((name,)) for name in ("i", "sup", "sub")}


def _escape_html(text: str) -> str:
    """``html.escape(text, quote=False)``, without importing the html module and its entity table (2 ms of a run)."""
    return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;")


def _span_order(s: "Span") -> tuple[int, int]:
    return (s.start, -s.end)


class Span(NamedTuple):
    """One styled range of a StyledText: ``text[start:end]`` in ``style``."""

    start: int
    end: int
    style: SpanStyle


class StyledText:
    """Immutable text with style spans. ``str()`` gives the bare characters."""

    __slots__ = ("text", "_spans", "_segments")  # one of the two is kept; the other is derived once when asked for

    text: str

    def __init__(self, text: str = "", spans: Iterable[Span] = ()) -> None:
        if not isinstance(text, str):
            from .errors import InputError

            raise InputError(f"StyledText: expected text (got {type(text).__name__})")
        object.__setattr__(self, "text", text)
        object.__setattr__(self, "_spans", tuple(s for s in spans if s.end > s.start))
        object.__setattr__(self, "_segments", None)

    @property
    def spans(self) -> tuple[Span, ...]:
        """The style spans, in start order (outer before inner)."""
        spans = self._spans
        if spans is None:
            at = 0
            made = []
            for piece, styles in self._segments:  # type: ignore[union-attr]
                for style in sorted(styles):
                    made.append(Span(at, at + len(piece), style))  # type: ignore[arg-type]
                at += len(piece)
            spans = tuple(made)
            object.__setattr__(self, "_spans", spans)
        return spans

    def __setattr__(self, name: str, value: object) -> None:
        raise AttributeError("StyledText is immutable")

    # -- construction -----------------------------------------------------------

    @classmethod
    def styled(cls, text: str, *styles: SpanStyle) -> "StyledText":
        return cls(text, [Span(0, len(text), s) for s in styles])

    @classmethod
    def from_markup(cls, markup: str) -> "StyledText":
        """Parse the markup; raises ValueError naming the position of a fault."""
        if not isinstance(markup, str):
            from .errors import InputError

            raise InputError(f"markup: expected text (got {type(markup).__name__})")
        if "&" not in markup:  # the common case: flat tags, no entities; split once
            parts = _TAG_SPLIT.split(markup)
            segs: list[tuple[str, frozenset[str]]] = [(parts[0], _NO_STYLE)] if parts[0] else []
            open_tag = None
            for k in range(1, len(parts), 3):
                tag = parts[k + 1]
                if parts[k]:  # a closing tag
                    if open_tag != tag:
                        break  # a fault: the full parser names it
                    open_tag = None
                    styles = _NO_STYLE
                else:
                    if open_tag is not None:
                        break  # nested tags: the full parser
                    open_tag = tag
                    styles = _ONE_STYLE[tag]
                piece = parts[k + 2]  # the text after a tag has that tag's style, or none
                if piece:
                    if segs and segs[-1][1] is styles:
                        segs[-1] = (segs[-1][0] + piece, styles)
                    else:
                        segs.append((piece, styles))
            else:
                text = "".join(parts[::3])
                if open_tag is None and "<" not in text and ">" not in text:
                    made = object.__new__(cls)
                    object.__setattr__(made, "text", text)
                    object.__setattr__(made, "_spans", None)
                    object.__setattr__(made, "_segments", tuple(segs))
                    return made
        return cls._parse(markup)

    @classmethod
    def _parse(cls, markup: str) -> "StyledText":
        """The full parser: entities, and a message naming the fault."""
        out: list[str] = []
        length = 0
        spans: list[Span] = []
        stack: list[tuple[str, int]] = []
        pos = 0
        for m in _TOKEN.finditer(markup):
            if m.start() > pos:
                chunk = markup[pos : m.start()]
                out.append(chunk)
                length += len(chunk)
            pos = m.end()
            closing, tag, entity = m.group(1), m.group(2), m.group(3)
            if tag:
                if closing:
                    if not stack or stack[-1][0] != tag:
                        raise ValueError(f"</{tag}> at position {m.start()} closes nothing open")
                    _, start = stack.pop()
                    spans.append(Span(start, length, tag))  # type: ignore[arg-type]
                else:
                    stack.append((tag, length))
            elif entity:
                if entity.startswith("#x"):
                    char = chr(int(entity[2:], 16))
                elif entity.startswith("#"):
                    char = chr(int(entity[1:]))
                else:
                    char = _ENTITY[entity]
                out.append(char)
                length += 1
            else:
                raise ValueError(
                    f"bare {m.group(0)!r} at position {m.start()}; write &lt; &gt; &amp; or a tag <i> <sup> <sub>"
                )
        if stack:
            tag, _ = stack[-1]
            raise ValueError(f"<{tag}> is never closed")
        if pos < len(markup):
            out.append(markup[pos:])
        spans.sort(key=_span_order)
        return cls("".join(out), spans)

    @staticmethod
    def join(separator: "StyledText | str", items: Iterable["StyledText | str"]) -> "StyledText":
        sep = separator if isinstance(separator, StyledText) else StyledText(separator)
        result = StyledText()
        first = True
        for item in items:
            if not first:
                result = result + sep
            result = result + item
            first = False
        return result

    # -- combination ------------------------------------------------------------

    def __add__(self, other: "StyledText | str") -> "StyledText":
        if isinstance(other, str):
            other = StyledText(other)
        if not isinstance(other, StyledText):
            return NotImplemented
        shift = len(self.text)
        return StyledText(
            self.text + other.text,
            self.spans + tuple(Span(s.start + shift, s.end + shift, s.style) for s in other.spans),
        )

    def split_at(self, at: int) -> tuple["StyledText", "StyledText"]:
        """The text before and from ``at``, each with its part of the spans."""
        head = [Span(s.start, min(s.end, at), s.style) for s in self.spans if s.start < at]
        tail = [Span(max(s.start, at) - at, s.end - at, s.style) for s in self.spans if s.end > at]
        return StyledText(self.text[:at], head), StyledText(self.text[at:], tail)

    def __radd__(self, other: str) -> "StyledText":
        if isinstance(other, str):
            return StyledText(other) + self
        return NotImplemented

    def __eq__(self, other: object) -> bool:
        if isinstance(other, StyledText):
            return self.text == other.text and self.segments() == other.segments()
        return NotImplemented

    def __hash__(self) -> int:
        return hash((self.text, self.segments()))

    def __len__(self) -> int:
        return len(self.text)

    def __bool__(self) -> bool:
        return bool(self.text)

    def __str__(self) -> str:
        return self.text

    def __repr__(self) -> str:
        return f"StyledText({self.markup()!r})"

    # -- reading ------------------------------------------------------------------

    def segments(self) -> tuple[tuple[str, frozenset[str]], ...]:
        """Maximal runs of text with one set of styles, in order."""
        segs = self._segments
        if segs is None:
            segs = _segments_of(self.text, self.spans)
            object.__setattr__(self, "_segments", segs)
        return segs

    def italic_ranges(self) -> list[tuple[int, int]]:
        return [(s.start, s.end) for s in self.spans if s.style == "i"]

    # -- writers -----------------------------------------------------------------

    def markup(self) -> str:
        """The markup form; ``from_markup(x.markup()) == x``."""
        return "".join(_wrap(escape_markup(t), styles, _MARKUP_TAGS) for t, styles in self.segments())

    def __html__(self) -> str:  # lets Jinja insert a StyledText as markup, unescaped
        return self.markup()

    def plain(self) -> str:
        """Plain text: Unicode superscripts and subscripts where they exist; the
        no-break spaces that keep a statistic together elsewhere are plain
        spaces here (a terminal does not break lines at them)."""
        return "".join([_plain_piece(text, styles) if styles else text for text, styles in self.segments()]).replace("\u00a0", " ")

    def markdown(self) -> str:
        """pandoc Markdown: ``*t*``, ``R^2^``, ``r~s~``."""
        return "".join([_md_piece(text, styles) if styles else _escape_md(text) for text, styles in self.segments()])

    def html(self) -> str:
        return "".join(_wrap(_escape_html(t), styles, _HTML_TAGS) for t, styles in self.segments())

    def latex(self) -> str:
        parts = []
        for text, styles in self.segments():
            body = _escape_latex(text)
            if "sup" in styles:
                body = f"\\textsuperscript{{{body}}}"
            if "sub" in styles:
                body = f"\\textsubscript{{{body}}}"
            if "i" in styles:
                body = f"\\textit{{{body}}}"
            parts.append(body)
        return "".join(parts)

    def to(self, fmt: str) -> str:
        """Write in a named format: ``text``, ``md``, ``html`` or ``tex``."""
        try:
            return getattr(self, _FORMATS[fmt])()
        except KeyError:
            raise ValueError(f"unknown format {fmt!r}; formats: {', '.join(_FORMATS)}") from None

    # -- notebook display --------------------------------------------------------

    def _repr_html_(self) -> str:
        return self.html()

    def _repr_markdown_(self) -> str:
        return self.markdown()

    def _repr_latex_(self) -> str:
        return self.latex()


def _segments_of(text: str, spans: tuple[Span, ...]) -> tuple[tuple[str, frozenset[str]], ...]:
    if not spans:
        return ((text, _NO_STYLE),) if text else ()
    out: list[tuple[str, frozenset[str]]] = []

    def add(piece: str, styles: frozenset[str]) -> None:
        if out and out[-1][1] == styles:
            out[-1] = (out[-1][0] + piece, styles)
        else:
            out.append((piece, styles))

    if all(a.end <= b.start for a, b in zip(spans, spans[1:])):  # disjoint spans, the common case
        at = 0
        for sp in spans:
            if sp.start > at:
                add(text[at : sp.start], _NO_STYLE)
            add(text[sp.start : sp.end], _ONE_STYLE[sp.style])
            at = sp.end
        if at < len(text):
            add(text[at:], _NO_STYLE)
        return tuple(out)
    points = sorted({0, len(text), *(s.start for s in spans), *(s.end for s in spans)})
    for a, b in zip(points, points[1:]):
        add(text[a:b], frozenset(s.style for s in spans if s.start <= a and s.end >= b))
    return tuple(out)


_FORMATS = {"text": "plain", "md": "markdown", "html": "html", "tex": "latex", "markup": "markup"}

_MARKUP_TAGS = {"i": ("<i>", "</i>"), "sup": ("<sup>", "</sup>"), "sub": ("<sub>", "</sub>")}
_HTML_TAGS = _MARKUP_TAGS


def _wrap(body: str, styles: frozenset[str], tags: dict[str, tuple[str, str]]) -> str:
    for style in ("sub", "sup", "i"):
        if style in styles:
            open_, close = tags[style]
            body = f"{open_}{body}{close}"
    return body


def escape_markup(text: str) -> str:
    """Text made safe to put in markup: & < > as entities."""
    return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;")


_SUPER = dict(zip("0123456789+-−=()niab", "⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻⁻⁼⁽⁾ⁿⁱᵃᵇ"))
_SUB = dict(zip("0123456789+-−=()aehijklmnoprstuvx", "₀₁₂₃₄₅₆₇₈₉₊₋₋₌₍₎ₐₑₕᵢⱼₖₗₘₙₒₚᵣₛₜᵤᵥₓ"))


@lru_cache(maxsize=4096)  # styled pieces are mostly symbols: a few, over and over
def _plain_piece(text: str, styles: frozenset[str]) -> str:
    if "sup" in styles:
        return _unicode_script(text, _SUPER, "^")
    if "sub" in styles:
        return _unicode_script(text, _SUB, "_")
    return text


@lru_cache(maxsize=4096)
def _md_piece(text: str, styles: frozenset[str]) -> str:
    """A styled piece in pandoc Markdown; spaces at its ends stay outside the
    markers (pandoc does not close ``*t *``)."""
    lead, core, trail = _split_space(text)
    core = _escape_md(core)
    if "sup" in styles or "sub" in styles:
        core = core.replace(" ", "\\ ")
    if "sup" in styles:
        core = f"^{core}^"
    if "sub" in styles:
        core = f"~{core}~"
    if "i" in styles and core:
        core = f"*{core}*"
    return f"{lead}{core}{trail}"


def lowered_plain(text: str) -> str:
    """A subscript's text as `StyledText.plain` shows it: in subscript characters where they all exist, else "_" and
    the text ("_G")."""
    return _unicode_script(text, _SUB, "_")


def _unicode_script(text: str, table: dict[str, str], marker: str) -> str:
    if all(c in table for c in text):
        return "".join(table[c] for c in text)
    if any(c.isdigit() for c in text) and all(c in table or c in ".,; " for c in text):  # df as subscripts: F₂,₂₃₇, t₃₀.₇₁
        return "".join(table.get(c, c) for c in text)
    return f"{marker}{text}"


# pandoc's backslash escapes: emphasis, super/subscripts, code, raw HTML (<), links ([ ]), entities (&), table cells (|),
# TeX math ($: "Income ($) … savings ($)" would be read as math between the two)
# ("<" only where a tag could start, "&" where an entity could, "[" "]" where a link, note or span could:
# "p < .001" and "95% CI [.84, .89]" stay as they are)
_MD_SPECIAL = re.compile(r"([\\*_^~`|$]|<(?=[A-Za-z/!?])|&(?=[A-Za-z#])|\[(?=[\^@])|\](?=[(\[{]))")
_MD_TRIGGERS = frozenset("\\*_^~`<[]&|$")


def _escape_md(text: str) -> str:
    if not _MD_TRIGGERS.isdisjoint(text):
        return _MD_SPECIAL.sub(r"\\\1", text)
    return text


def _split_space(text: str) -> tuple[str, str, str]:
    core = text.strip(" ")
    if not core:
        return text, "", ""
    lead = text[: len(text) - len(text.lstrip(" "))]
    trail = text[len(text.rstrip(" ")) :]
    return lead, core, trail


# Greek letters are roman (APA 7 §6.45): \upalpha … from the upgreek package; LATEX_PREAMBLE
# loads it, or falls back to the italic math letters where it is not installed.
_LATEX = {
    "\\": r"\textbackslash{}",
    "{": r"\{",
    "}": r"\}",
    "%": r"\%",
    "$": r"\$",
    "&": r"\&",
    "#": r"\#",
    "_": r"\_",
    "~": r"\textasciitilde{}",
    "^": r"\textasciicircum{}",
    "−": r"\textminus{}",
    "–": "--",
    "—": "---",
    "χ": r"$\upchi$",
    "η": r"$\upeta$",
    "ω": r"$\upomega$",
    "ε": r"$\upvarepsilon$",
    "α": r"$\upalpha$",
    "β": r"$\upbeta$",
    "τ": r"$\uptau$",
    "ρ": r"$\uprho$",
    "φ": r"$\upvarphi$",
    "Δ": r"$\Delta$",
    "×": r"$\times$",
    "≤": r"$\leq$",
    "≥": r"$\geq$",
    "±": r"$\pm$",
    "′": r"\ensuremath{'}",  # the prime of c′ (a mediation's direct path)
    "<": r"\textless{}",
    ">": r"\textgreater{}",
    "|": r"\textbar{}",  # (a bare | is an em dash in LaTeX's default font encoding)
    "-": "-{}",  # only a hyphen before another (below): typed "--" are two hyphens, not LaTeX's en dash
    "\u00a0": "~",  # the no-break space that keeps a statistic together
    "\u202f": r"\,",  # a thin no-break space
    "\u2009": r"\,",  # a thin space (AMA digit groups)
    **dict.fromkeys("\u200b\u200c\u200d\u2060\ufeff", ""),  # zero-width characters (pdflatex stops at them; they print nothing)
    # the other Greek letters a label may hold (pdflatex has none in text): capitals that look Latin as the Latin letter,
    # the rest as math letters, which need no package
    **dict(zip("ΑΒΕΖΗΙΚΜΝΟΡΤΥΧο", "ABEZHIKMNOPTYXo")),
    **{g: f"$\\{name}$" for g, name in zip("ΓΘΛΞΠΣΦΨΩγδζθικλμνξπσςυψϕϑϵ", (
        "Gamma", "Theta", "Lambda", "Xi", "Pi", "Sigma", "Phi", "Psi", "Omega", "gamma", "delta", "zeta", "theta", "iota",
        "kappa", "lambda", "mu", "nu", "xi", "pi", "sigma", "varsigma", "upsilon", "psi", "phi", "vartheta", "epsilon"))},
}
_LATEX_RE = re.compile("|".join(re.escape(k) + ("(?=-)" if k == "-" else "") for k in _LATEX))


def escape_latex(text: str) -> str:
    """Plain text as LaTeX prints it (the writers' escaping, for a title or caption made outside a StyledText)."""
    return _escape_latex(text)


def escape_md(text: str) -> str:
    """Plain text as pandoc's Markdown prints it."""
    return _escape_md(text)


def _escape_latex(text: str) -> str:
    # a dash before a hyphen or another dash is closed by {} (as a hyphen before a hyphen is, in _LATEX): LaTeX would
    # join their hyphens into one longer dash
    return _LATEX_RE.sub(lambda m: _LATEX[m.group(0)] + ("{}" if m.group(0) in "–—" and text.startswith(("-", "–", "—"), m.end()) else ""), text)


_UPRIGHT = ("alpha", "beta", "chi", "eta", "omega", "varepsilon", "tau", "rho", "varphi")
LATEX_PREAMBLE = (
    "\\usepackage{booktabs}\n\\usepackage{tabularx}\n\\usepackage{graphicx}\n\\usepackage{rotating}\n"
    "\\IfFileExists{upgreek.sty}{\\usepackage{upgreek}}{%\n"
    + "".join(f"  \\providecommand{{\\up{g}}}{{\\{g}}}%\n" for g in _UPRIGHT)
    + "}\n"
)
"""What a document needs for the LaTeX writers' output: booktabs and tabularx for tables, rotating for a table on a
landscape page, graphicx for figures, upgreek for upright Greek letters (italic ones where it is missing)."""
