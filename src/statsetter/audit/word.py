"""Copies of a Word manuscript that carry the audit: a comment on each
finding, or the house style as tracked changes an editor can accept.

Both write a new file and never touch the manuscript. A revision replaces a
statistic's characters by its restyled text as one deletion and one
insertion (``w:del`` + ``w:ins``, author "statsetter"), the new text in runs
that keep the replaced text's font and carry italics, superscripts and
subscripts. A statistic is revised only when the restyled text keeps every
number and word the author typed (to the printed precision); a p the audit
doubts is never changed by a revision, it gets a comment.
"""

from __future__ import annotations

import copy
import re
from dataclasses import replace
from datetime import datetime, timezone
from pathlib import Path
from typing import TYPE_CHECKING, Sequence

from ..style.numbers import numbers_for
from ..styled import StyledText, escape_markup, lowered_plain
from .checks import RATIOS, Finding
from .parsing import _SLIPPED_COMMA, PValue, Reported, icc_form, subscript
from .reading import _SYM, OMATH, REMOVED, hidden, math_text, owner, symbol_font, symbol_text

if TYPE_CHECKING:
    from ..style.profile import Style
    from .report import Entry

__all__ = ["annotate", "house_text", "restyled", "revise", "AUTHOR"]

AUTHOR = "statsetter"
_W = "{http://schemas.openxmlformats.org/wordprocessingml/2006/main}"
_OMATH_PARA = OMATH + "Para"
_TEXT_NODES = {f"{_W}t": None, f"{_W}tab": "\t", f"{_W}br": "\n", f"{_W}cr": "\n", f"{_W}noBreakHyphen": "-"}
_EMPTY_NODES = {f"{_W}rPr", f"{_W}lastRenderedPageBreak", f"{_W}softHyphen"}  # nothing the reader counts, safe to move
# findings about the p itself: a revision must then leave the p as the author typed it
_P_DOUBTS = {"p-does-not-follow", "verdict-changes", "one-sided", "impossible-p"}
# words the parser reads as notation, which the restyled text writes as symbols
_NOTATION_WORDS = {"df", "ns", "chi", "square", "squared", "eta", "partial", "omega", "cohen", "hedges", "ci", "cis", "sd", "se",
                   "rho", "tau", "phi", "cramér", "cramer", "value", "confidence", "interval"}
_WORD = re.compile(r"[^\W\d_⁰¹²³⁴⁵⁶⁷⁸⁹₀₁₂₃₄₅₆₇₈₉]{2,}")  # (super- and subscript digits are not letters: F₂ and χ²₂ are no words)
_DIGITS = re.compile(r"\d+(?:[.,]\d+)*|[.,]\d+")
_LETTERS = re.compile(r"[^\W\d_]")
_P_IN_TEXT = re.compile(r"(?<![A-Za-z])[pP]\s*([=<>≤≥])\s*(\d*[.,]?\d+)")


# -- the restyled text of one statistic ---------------------------------------------


def house_text(rep: Reported, style: "Style", alpha: float, *, with_p: bool = True) -> StyledText | None:
    """The statistic as the style writes it (its numbers to their printed precision), or None when the renderer
    cannot take its record (an impossible value). A statistic given as a bound ("F < 1") keeps its operator and
    the p as the author gave it (a threshold, "p > .05"); with ``with_p`` False — the author's p doubted — the p the
    bound allows instead ("F(1, 56) < 1, p > .32"): a bound gives no exact p to print. A coefficient's χ² typed as its
    name alone ("Wald = 6.13") keeps the name before the symbol ("Wald χ²(1) = 6.13"): the reader is told which χ²."""
    text = _house_text(rep, style, alpha, with_p)
    return None if text is None else named(rep, text, style)


# effect sizes typed with the name of the one who proposed them before the symbol the style writes alone: the name, and the
# symbol's spellings it comes before
_EPONYM_SYMBOLS = {"alpha": ("Cronbach", ("α", "alpha")), "f2": ("Cohen", ("f",))}


def named(rep: Reported, text: StyledText, style: "Style | None" = None) -> StyledText:
    """``text``, the statistic restyled, after the name its χ² was typed with alone ("Wald = 6.13": "Wald χ²(1) =
    6.13") or the name before a reliability's α ("Cronbach's α = .81"; "Cronbach α" in a style without possessives); else as it is."""
    if rep.symbol == "chi2" and rep.symbol_text.startswith("Wald"):
        return StyledText("Wald ") + text
    first = rep.effects[0] if rep.symbol is None and rep.effects else None
    if first is not None and first.name in _EPONYM_SYMBOLS and first.symbol_text.startswith(_EPONYM_SYMBOLS[first.name][0]) and \
            not text.plain().startswith(_EPONYM_SYMBOLS[first.name][0]):
        typed = first.symbol_text  # "Cronbach's alpha = 0.81": "Cronbach's α = .81", the author's name for it kept ("Cohen’s f² = …")
        name = typed[: max(typed.find(letter) for letter in _EPONYM_SYMBOLS[first.name][1])]
        if style is not None:
            from ..rendering.sentences import eponyms  # (the renderer's rule: AMA 11 writes "Cronbach α")

            name = eponyms(name, style)
        return StyledText(name) + text
    return text


def _house_text(rep: Reported, style: "Style", alpha: float, with_p: bool) -> StyledText | None:
    from ..rendering.sentences import render
    from .checks import to_record

    if rep.symbol is None and rep.descriptives:
        return descriptives_text(rep, style, alpha)
    if any(e.name in ("MD", "alpha_level", "I2") for e in rep.effects):  # a difference in words ("mean difference, −2.1"), a
        return None  # significance level ("α = .001", as the design set it), an I² in percent: no form of the style's
    try:
        record = to_record(rep, alpha, style)
        if rep.op != "=" and not with_p:  # (an exact p the author gave, doubted, is not repeated either)
            record = replace(record, p=None, precision={k: v for k, v in record.precision.items() if k != "p"})
        text = render(record, "stats", style)
    except Exception:  # noqa: BLE001 - a record the renderer cannot take: no text in the style
        return None
    ns = rep.p is not None and rep.p.op == "ns"
    if rep.op == "=":
        if record.p is None and rep.p is not None and (rep.symbol is not None or rep.effects):  # no p to recompute (no df;
            # a rank sum; effect sizes alone): the author's threshold or "ns" kept ("ns" as typed: the style has no form for it)
            kept = StyledText(rep.p.symbol_text) if ns else threshold_p(rep, style, style.keep_together)
            if kept is None:
                return text
            if rep.symbol is None:  # where the text put it, before or after the effect sizes
                joint = StyledText(f"{style.list_separator} ")
                return text + joint + kept if record.details.get("p_last") else kept + joint + text
            return _bounded(text, "=", style, kept) or text
        return text
    # a bound's "ns", like a doubted p, becomes the p the bound allows ("F(1, 56) < 1, p > .32"): true, and what the style asks
    return _bounded(text, rep.op, style, threshold_p(rep, style, style.keep_together) if with_p and not ns else _allowed_p(rep, style))


def descriptives_text(rep: Reported, style: "Style", alpha: float = 0.05) -> StyledText | None:
    """A group's descriptives without a test ("n = 28, M = 3.11, SD=1.95"; "M = 34.2 years, SD = 11.0"; with a p or
    an effect size, "M = 3.10, p<.01", "M = 3.10), d = 0.45") as the style sets each: its symbol (italic in APA), "="
    spaced, the number with the author's decimals in the style's marks, a p as the style prints it (a threshold kept:
    no test gives it exactly); the text between them as typed (no sentence form of its own: what a group is, the text
    says). None where the style writes means and SDs in words (AMA 11's "mean [SD]"), which no symbol-for-symbol
    change gives, for a negative SD, and for an effect size with an interval or a ratio (restyled by hand)."""
    if style.spells_out or any(d.name == "SD" and d.number.value < 0 for d in rep.descriptives):  # (an impossible SD: no text, as
        return None  # a record the renderer refuses has none)
    if rep.ci is not None or any(e.ci is not None or e.name in RATIOS for e in rep.effects):
        return None
    num = numbers_for(style)
    space = style.keep_together
    pieces: list[tuple[int, int, str, "str | StyledText", str]] = [
        (d.symbol_start, d.number.end, d.name, f"{space}={space}{num.number(d.number.value, d.name, d.number.decimals)}",
         subscript(d) if d.name in ("M", "SD") else "")
        for d in rep.descriptives + rep.effects]
    if rep.n is not None:  # its symbol: before its "=" (an n read with the cluster, "n = 28, M = …")
        k = rep.n.start - rep.start
        while k > 0 and rep.text[k - 1].isspace():
            k -= 1
        if k > 0 and rep.text[k - 1] in "=¼":
            k -= 1
            while k > 0 and rep.text[k - 1].isspace():
                k -= 1
            if k > 0 and rep.text[k - 1] in "nN":
                pieces.append((rep.start + k - 1, rep.n.end, rep.text[k - 1], f"{space}={space}{rep.n.text}", ""))
    p = rep.p
    if p is not None and p.op != "ns":  # ("ns" stays as typed: the style has no form for it)
        if p.number is None or not 0 <= p.number.value <= 1:
            return None
        if p.op == "=":
            op, shown = num.p(p.number.value, alpha, held=p.number.decimals) if p.number.value > 0 else num.p(0.0, alpha)
            made = StyledText.from_markup(f"{style.symbol('p')}{space}{escape_markup(op)}{space}{shown}")
        else:
            made = threshold_p(rep, style, space)  # type: ignore[assignment]
        if made is None:
            return None
        pieces.append((p.symbol_start, p.end, "", made, ""))
    out, at = StyledText(""), rep.start
    for start, end, symbol, shown, sub in sorted(pieces, key=lambda piece: piece[0]):
        if start < at:  # (pieces overlap only in a text the parser read oddly: left as typed)
            return None
        out = out + rep.text[at - rep.start : start - rep.start]
        if isinstance(shown, StyledText):
            out = out + shown
        else:  # a flattened subscript set as one ("Mage" → M with "age" below)
            out = out + StyledText.from_markup(style.symbol(symbol) + (f"<sub>{escape_markup(sub)}</sub>" if sub else "")) + shown
        at = end
    return out + rep.text[at - rep.start :]


def _allowed_p(rep: Reported, style: "Style") -> StyledText | None:
    """The p a bound allows, rounded outwards so that it stays true: below F < 1 on (1, 56) df every p exceeds
    .3216, "p > .32"; above F > 10, every p is below that F's p, rounded up. None when the rounding leaves nothing
    to say (p > .00 or p < 1.00)."""
    import math

    from .checks import p_range

    allowed = p_range(rep)
    if allowed is None:
        return None
    num = numbers_for(style)
    unit = 10.0 ** num.decimals_for("p")
    above = rep.op in ("<", "≤")  # a statistic below its bound: p above the bound's p
    edge = math.floor(allowed[0] * unit) / unit if above else math.ceil(allowed[1] * unit) / unit
    if not 0 < edge < 1:
        return None
    op = "&gt;" if above else "&lt;"
    return StyledText.from_markup(f"{style.symbol('p')}{style.keep_together}{op}{style.keep_together}{num.number(edge, 'p', num.decimals_for('p'))}")


def threshold_p(rep: Reported, style: "Style", space: str = " ") -> StyledText | None:
    """The author's p given as a threshold, in the style ("p < .05", never "p < .050": it keeps its decimals; "p < .000",
    as some programs print a p below .0005, as the style's smallest p, "p < .001"); None for an exact p, "n.s." or none,
    and for "p > 1", which no p meets."""
    p = rep.p
    if p is None or p.op in ("=", "ns") or p.number is None or not 0 <= p.number.value <= 1:
        return None
    if p.op in (">", "≥") and p.number.value == 1:
        return None
    op = {"≤": "&lt;", "≥": "&gt;", "<": "&lt;", ">": "&gt;"}[p.op]
    num = numbers_for(style)
    shown = num.p(0.0, 0.05)[1] if p.number.value == 0 else num.number(p.number.value, "p", p.number.decimals)
    return StyledText.from_markup(f"{style.symbol('p')}{space}{op}{space}{shown}")


def _bounded(text: StyledText, op: str, style: "Style", p: StyledText | None) -> StyledText | None:
    """A record's text with the statistic's "=" (the first outside parentheses and brackets, after its df and N) as
    the author's operator ``op`` ("F(1, 56) < 1"), and the p ``p`` after the statistic's value; None where no such
    "=" is."""
    depth = 0
    for i, ch in enumerate(text.text):
        if ch in "([":
            depth += 1
        elif ch in ")]":
            depth -= 1
        elif ch == "=" and depth == 0:  # one character for one: the style's spans keep their places
            text = StyledText(text.text[:i] + op + text.text[i + 1 :], text.spans)
            if p is None:
                return text
            end = _VALUE_END.match(text.text, i + 1).end()  # type: ignore[union-attr]
            head, tail = text.split_at(end)
            return head + f"{style.list_separator} " + p + tail
    return None


_VALUE_END = re.compile(r"\s*[^\s,;)\]]*")


_UNMADE = object()  # restyled's house text not made beforehand


def _unmatched(text: str) -> tuple[int, int]:
    """The closing brackets without their opening one in ``text`` and the opening ones left open: a statistic whose text
    has either shares its parentheses with the sentence around it."""
    depth = closed = 0
    for ch in text:
        if ch in "([":
            depth += 1
        elif ch in ")]":
            if depth:
                depth -= 1
            else:
                closed += 1
    return closed, depth


def restyled(rep: Reported, style: "Style", alpha: float, findings: Sequence[Finding], read_mark: str | None = None,
             italic: Sequence[tuple[int, int]] | None = None, house: "StyledText | None | object" = _UNMADE,
             subscripts: Sequence[tuple[int, int]] = ()) -> tuple[StyledText | None, str]:
    """The statistic in the house style for a revision, or None and why not;
    ``house`` is `house_text` of the statistic when the caller made it already; ``subscripts``, the spans of the text's
    subscript letters (Word's runs: "G" of η²G), compared as the restyled text's plain form shows them.

    The author's numbers are kept (rounded only where the style rounds); a
    p given as a threshold or as zero may become the exact p the style asks
    for unless a finding doubts the p."""
    new = house_text(rep, style, alpha) if house is _UNMADE else house
    if not isinstance(new, StyledText):  # left as typed
        if rep.symbol is None and rep.descriptives and style.spells_out:
            return None, "the style writes means and SDs in words (\u201cmean [SD], 2.86 [0.59]\u201d), which a change symbol for symbol cannot give: reword the sentence"
        if any(a.name == "M" and b.name == "SD" and a.end > b.symbol_start for a, b in zip(rep.descriptives, rep.descriptives[1:])):
            return None, ("a mean and SD typed together (\u201cM ± SD = 3.2 ± 0.5\u201d, \u201cM (SD) = 3.2 (0.5)\u201d) are left as typed; "
                          "the style writes M = 3.2, SD = 0.5")
        if rep.symbol is None and rep.descriptives and (rep.ci is not None or any(e.ci is not None or e.name in RATIOS for e in rep.effects)):
            return None, "descriptives beside an interval or a ratio, without their test, have no form of the style's; restyle them by hand"
        if any(e.name == "MD" for e in rep.effects):
            return None, "a difference given in words with its interval has no symbol in the style; it is checked and left as typed"
        if any(e.name == "alpha_level" for e in rep.effects):
            return None, "a significance level is checked for its leading zero and left as typed (its decimals are the design's)"
        if any(e.name == "I2" for e in rep.effects):
            return None, "an I² in percent is checked against its Q and left as typed"
        bare = next((ci for ci in [rep.ci] + [e.ci for e in rep.effects] if ci is not None and ci.level is None), None)
        if bare is not None:
            return None, (f"its interval is typed without its level ({rep.text[bare.start - rep.start : bare.end - rep.start]}); "
                          "with the level added it can be")
        return None, "the statistic cannot be restyled"
    plain = new.plain()
    old = rep.text
    if not plain.strip():  # a lone "n.s." or the like: nothing the style writes in its place
        return None, ""
    if _as_read(plain) == _as_read(_lowered(old, rep.start, subscripts)) and not any(f.code == "italics" for f in findings) and not _italics_differ(rep, new, italic):
        return None, ""
    lost = _lost_word(rep, old, plain)
    if lost:
        return None, f"the restyled text would drop \u201c{lost}\u201d"
    if _unmatched(old) != _unmatched(plain):  # "(ns) OR = 1.52": the ")" closes what opened before the statistic
        return None, "the restyled text would drop a parenthesis or bracket that the sentence around the statistic needs"
    form = icc_form(rep)
    if form is not None:  # ICC(2,1), ICC(3,k): which estimator it is, which the style's "ICC" does not say
        return None, f"the restyled text would drop the ICC's form, \u201c{form}\u201d"
    doubted = any(f.code in _P_DOUBTS for f in findings)
    why = _numbers_kept(rep, old, new, read_mark or style.decimal_mark, doubted, style.decimal_mark)
    return (None, why) if why else (new, "")


# a letter set as a script: the reader sees a Word run's digits as scripts, not its letters (η² and a subscript p read
# "η²p"), so a letter's script is not a difference it can see
_LETTER_SCRIPTS = str.maketrans("ₐₑₕᵢⱼₖₗₘₙₒₚᵣₛₜᵤᵥₓ", "aehijklmnoprstuvx")


def _lowered(old: str, start: int, subscripts: Sequence[tuple[int, int]]) -> str:
    """The typed text (starting at ``start``) with its subscript letters shown as `StyledText.plain` shows a
    subscript ("η²G" with G lowered: "η²_G"), so that a statistic already set in the style compares equal."""
    if not subscripts:
        return old
    out, at = [], 0
    for a, b in sorted(subscripts):
        a, b = max(a - start, 0), min(b - start, len(old))
        if a >= b or a < at:
            continue
        out += [old[at:a], lowered_plain(old[a:b])]
        at = b
    return "".join(out) + old[at:]


def _as_read(text: str) -> str:
    """``text`` as the audit can compare a statistic's restyled text with the typed one: a no-break space as a space
    (plain() has none: it is the style's choice of space, not a change), a script letter as its letter."""
    return text.replace("\u00a0", " ").translate(_LETTER_SCRIPTS)


def _italics_differ(rep: Reported, new: StyledText, italic: Sequence[tuple[int, int]] | None) -> bool:
    """Whether the text's italics (Word's runs; None: the format does not say)
    differ from the restyled text's at the statistic's symbols: its head's, its p's, its effect sizes' and descriptives'
    (those the italics check reads: a lone "d = 0.45" left plain beside revised, italic statistics would be found on
    the revised copy and revised again)."""
    if italic is None:
        return False
    symbols = [(rep.symbol_start, rep.symbol_text)] if rep.symbol is not None else []
    if rep.p is not None and rep.p.symbol_text:
        symbols.append((rep.p.symbol_start, rep.p.symbol_text))
    symbols += [(e.symbol_start, e.symbol_text) for e in rep.effects if e.symbol_text]
    symbols += [(e.symbol_start, e.name if subscript(e) else e.symbol_text) for e in rep.descriptives if e.symbol_text]  # (M₁: its M)
    styled = {new.text[a:b] for a, b in new.italic_ranges()}
    # (a symbol's first character is italic where the style's italic run begins it: "R" of R², "d" of d_z)
    return any(any(s <= at < e for s, e in italic) != any(text.startswith(t) for t in styled if t) for at, text in symbols)


def _lost_word(rep: Reported, old: str, new: str) -> str:
    """The first word of ``old`` that ``new`` drops, other than notation: a CI's "to" between its limits ("95% CI, 0.73
    to 0.80"), the words of a ratio's spelled-out name ("odds ratio" for OR, "adjusted" in aOR), the "statistic" of
    R's "F-statistic" (and "t-value", "t value") and the words around df written after the value ("on 1 and 30 DF") are notation there;
    "unadjusted" or "crude" are the author's and keep the statistic as typed."""
    kept = {w.lower() for w in _WORD.findall(new)} | _NOTATION_WORDS
    intervals = [ci for ci in [rep.ci] + [e.ci for e in rep.effects] if ci is not None]
    places = [(ci.low.end, ci.high.start, _RANGE_WORDS) for ci in intervals]
    places += [(ci.start, ci.low.start, _LABEL_WORDS) for ci in intervals]  # ("95% CI for the difference [", "95% CI for d [": the interval's own)
    places += [(e.symbol_start, e.symbol_start + len(e.symbol_text), _RATIO_WORDS) for e in rep.effects if e.name in RATIOS]
    places.append((rep.symbol_start, rep.symbol_start + len(rep.symbol_text),  # (a one-word symbol's own letters: "rs" set as r with s
                   _SYMBOL_WORDS | ({rep.symbol_text.lower()} if rep.symbol_text.isalpha() else set())))  # below; "F change" keeps its word)
    places += [(d.symbol_start, d.symbol_start + len(d.symbol_text), frozenset({d.symbol_text.lower()})) for d in rep.descriptives
               if subscript(d)]  # "Mage" restyled as M with "age" below
    places += [(e.symbol_start, e.symbol_start + len(e.symbol_text), frozenset(w.lower() for w in _WORD.findall(e.symbol_text)))
               for e in rep.effects if e.name not in RATIOS]  # an effect size's name as typed ("ηG²", "generalized η²"): the style's symbol stands for it
    if rep.p is not None:  # Stata's "Prob > F = 0.0000": the p's own name
        places.append((rep.p.start, rep.p.end, _P_WORDS))
    if rep.df and rep.value is not None and rep.df[0].start > rep.value.end:  # "F-statistic: 4.51 on 2 and 97 DF"
        places.append((rep.value.end, rep.df[-1].end, _DF_WORDS))
    for m in _WORD.finditer(old):
        w = m.group().lower()
        if w in kept:
            continue
        at = rep.start + m.start()
        if not any(a <= at < b and w in words for a, b, words in places):
            return m.group()
    return ""


_RANGE_WORDS = frozenset({"to"})
_LABEL_WORDS = frozenset({"for", "of", "the", "mean", "difference"})
_RATIO_WORDS = frozenset({"odds", "hazard", "risk", "relative", "incidence", "prevalence", "rate", "ratio", "adjusted", "adj", "or", "hr", "rr", "irr",
                          "pr"})  # ("adjusted OR": aOR)
_SYMBOL_WORDS = frozenset({"statistic", "value"})
_DF_WORDS = frozenset({"on", "and", "with", "df"})
_P_WORDS = frozenset({"prob", "f", "chi2", "sig", "asymp", "exact"})  # (Stata's "Prob > F", SPSS's "Sig.": the p's own name)


def _value(token: str, mark: str) -> tuple[float, int]:
    if mark == ",":
        token = token.replace(".", "").replace(",", ".")
    elif _SLIPPED_COMMA.fullmatch(token):  # "2,14" among points: a decimal comma typed by slip, as the parser reads it
        token = token.replace(",", ".")
    else:
        token = token.replace(",", "")
    return float(token), len(token.partition(".")[2])


_SUBSCRIPT_DIGITS = str.maketrans("₀₁₂₃₄₅₆₇₈₉", "0123456789", "⁰¹²³⁴⁵⁶⁷⁸⁹\u2009\u202f")
_SUBSCRIPT_COMMA = re.compile(r"(?<=[₀-₉]),(?=\s?[₀-₉])")


def _numbers_kept(rep: Reported, old: str, new: StyledText, mark: str, doubted: bool, new_mark: str) -> str:
    """"" when ``new`` has the numbers of ``old`` to their printed precision
    (the 2 of a symbol such as η2 aside), else why not."""
    if any(n is not None and re.search(r"[eE×⁻^]", n.text) for n in (rep.value, rep.p.number if rep.p else None)):
        return "a power of ten is left as typed"
    blank = list(old)
    for at, symbol in [(rep.symbol_start, rep.symbol_text)] + [(e.symbol_start, e.symbol_text) for e in rep.effects + rep.descriptives]:
        for i in range(max(at - rep.start, 0), min(at - rep.start + len(symbol), len(blank))):
            blank[i] = " "
    for e in rep.descriptives:  # a group's digit ("M1", "SD₂") stays: the restyled text sets it as a subscript, a number on both sides
        if subscript(e).isdigit():
            k = e.symbol_start + len(e.symbol_text) - 1 - rep.start
            blank[k] = old[k]
    for a, b in zip(rep.df, rep.df[1:]):  # "F(1,56)": two df, not the number 1,56
        blank[a.end - rep.start : b.start - rep.start] = " " * (b.start - a.end)
    old_p = rep.p.number if rep.p is not None else None
    if old_p is not None:  # the p with its operator (a PDF copy's "p 5 .039" has a digit for its "=")
        at = min(rep.p.start, old_p.start) - rep.start  # type: ignore[union-attr]
        blank[at : old_p.end - rep.start] = " " * (old_p.end - rep.start - at)
    # (a subscript's comma parts two df, F₂,₉₇: apart, not one number 297, on both sides)
    old_text = _SUBSCRIPT_COMMA.sub(" ", "".join(blank)).translate(_SUBSCRIPT_DIGITS)
    # (a subscript's letters label a symbol — η²p's p, r's s — and are never a p value)
    new_text = "".join(" " * len(t) if "sup" in styles else _LETTERS.sub("_", t.replace(",", " ")) if "sub" in styles else t
                       for t, styles in new.segments()).translate(_SUBSCRIPT_DIGITS)
    new_p = _P_IN_TEXT.search(new_text)
    if new_p is not None:
        new_text = new_text[: new_p.start(2)] + " " * len(new_p.group(2)) + new_text[new_p.end(2) :]
    try:
        olds = sorted(_value(t, mark) for t in _DIGITS.findall(old_text))
        news = sorted(_value(t, new_mark) for t in _DIGITS.findall(new_text))
    except ValueError:  # digits with two decimal marks, "0.40.5": numbers run together, which no revision should touch
        return "its numbers run into each other as typed"
    if len(olds) > len(news):
        return "the style's form of this statistic has no place for every number typed here (N beside a χ², say)"
    if len(olds) != len(news) or any(abs(a - b) > 0.5 * 10.0**-da + 0.5 * 10.0**-db + 1e-12 for (a, da), (b, db) in zip(olds, news)):
        return "the restyled text would change a number"
    if any(a != 0 and b == 0 for (a, _), (b, _) in zip(olds, news)):
        return "the style's decimals would round a number to zero"
    if old_p is None:
        if rep.p is None:
            return "" if new_p is None else "the restyled text would add a p value"
        if new_p is None:  # "ns" where no p can be recomputed: the author's statement about p stays
            return "" if rep.p.symbol_text in new.plain() else "the restyled text would drop the p value"
        # "ns" becomes the exact p the style asks for, unless a finding doubts it: "t(38) = 2.10, ns" is no style slip
        return "the restyled text would change the reported p" if doubted else ""
    if new_p is None:
        return "the restyled text would drop the p value"
    same = same_p(rep.p, new_p, new_mark)  # type: ignore[arg-type]
    exactable = rep.p.op != "=" or old_p.value < 0.001  # type: ignore[union-attr]
    if not same and (doubted or not exactable):
        return "the restyled text would change the reported p"
    return ""


def same_p(p: PValue, shown: "re.Match[str]", mark: str) -> bool:
    """Whether a p the style prints (``shown``: a match of _P_IN_TEXT) is the reported ``p`` restyled: the same
    operator and a value its printed precision allows, rounded as the style rounds."""
    if p.number is None or not 0 <= p.number.value <= 1:  # (an impossible p, "p < −1.2" or "p = 1.5", is no bound the style prints)
        return False
    value, places = _value(shown.group(2), mark)
    op = shown.group(1)
    if (value <= 0.001 if op == "<" else value >= 0.99 if op == ">" else False) and p.op in ("=", op):
        # a p beyond the smallest (largest) p the styles print (APA and AMA: .001; .999 and .99), all its printed precision
        # allows: "p = 0.000285" and "p = .000" are "p < .001" restyled, "p = 1.000" is "p > .999"; "p = 0" is not
        slack = p.number.half_unit if p.op == "=" else 0.0
        if (p.number.value + slack <= value) if op == "<" else (p.number.value - slack >= value):
            return True
    return op == p.op and abs(value - p.number.value) <= p.number.half_unit + 0.5 * 10.0**-places + 1e-12


# -- runs -------------------------------------------------------------------------------


def _node_length(node) -> int:  # type: ignore[no-untyped-def]
    tag = node.tag
    if tag not in _TEXT_NODES:
        return len(symbol_text(node)) if tag == _SYM else 0  # a Symbol-font w:sym is one character, as the reader reads it
    return len(node.text or "") if _TEXT_NODES[tag] is None else 1


def _runs(p):  # type: ignore[no-untyped-def]
    """The paragraph's runs as the reader counts them (deleted text skipped), an equation as one piece (its text as
    `math_text` reads it): [(run or m:oMath, start, end)]."""
    out, at = [], 0
    for r in p.iter(f"{_W}r", OMATH):
        if r.getparent() is not p and owner(r) is not p:  # a text box's: its own paragraph's, as the reader reads it
            continue
        if r.tag == OMATH:
            n = sum(len(text) for text, _ in math_text(r))
        else:
            parent = r.getparent()
            if parent is not None and parent.tag in REMOVED or hidden(r):  # (not read: counted as nothing)
                continue
            n = sum(_node_length(c) for c in r)
        out.append((r, at, at + n))
        at += n
    return out


def _anchor(node, before: bool):  # type: ignore[no-untyped-def]
    """A run to hang a comment's range on: ``node`` itself, or for an equation an empty run put before (after) it
    beside the equation, or beside its equation paragraph (m:oMathPara), where runs may stand."""
    if node.tag != OMATH:
        return node
    from docx.oxml import OxmlElement

    parent = node.getparent()
    if parent is not None and parent.tag == _OMATH_PARA:
        node = parent
    run = OxmlElement("w:r")
    (node.addprevious if before else node.addnext)(run)
    return run


def _split(run, k: int) -> None:  # type: ignore[no-untyped-def]
    """Cut ``run`` after its k-th character: the rest goes into a copy placed after it."""
    right = copy.deepcopy(run)
    at = 0
    for left_node, right_node in zip([c for c in run if c.tag != f"{_W}rPr"], [c for c in right if c.tag != f"{_W}rPr"]):
        n = _node_length(left_node)
        if at + n <= k:
            right.remove(right_node)
        elif at >= k:
            run.remove(left_node)
        else:  # the cut falls inside this w:t
            cut = k - at
            left_node.text, right_node.text = left_node.text[:cut], right_node.text[cut:]
            for node in (left_node, right_node):
                node.set("{http://www.w3.org/XML/1998/namespace}space", "preserve")
        at += n
    run.addnext(right)


def _span_runs(p, start: int, end: int):  # type: ignore[no-untyped-def]
    """The runs that hold exactly characters start..end of the paragraph, cut
    where needed; None when they are not plain runs side by side (a field, a
    hyperlink, a picture inside the statistic)."""
    if any(r.tag == OMATH for r, s, e in _runs(p) if s < end and e > start):  # an equation is not cut or restyled
        return None
    for at in (start, end):
        for r, s, e in _runs(p):
            if s < at < e:
                _split(r, at - s)
                break
    inside = [r for r, s, e in _runs(p) if start <= s and e <= end and e > s]
    if not inside or inside[0].getparent() is not inside[-1].getparent():
        return None
    siblings, node = [], inside[0]
    while node is not None:
        siblings.append(node)
        if node is inside[-1]:
            break
        node = node.getnext()
    for node in siblings:
        if node.tag == f"{_W}r":
            if any(c.tag not in _TEXT_NODES and c.tag not in _EMPTY_NODES for c in node):
                return None
        elif node.tag not in (f"{_W}proofErr", f"{_W}bookmarkStart", f"{_W}bookmarkEnd"):
            return None
    return siblings


_LOOK_IGNORED = {f"{_W}{t}" for t in ("i", "iCs", "vertAlign", "lang", "noProof", "rPrChange", "spellStart", "proofErr")}


def _look(run) -> bytes:  # type: ignore[no-untyped-def]
    """The run's formatting apart from what a statistic's text sets (italics,
    super/subscript) and what does not show (language, proofing)."""
    from lxml import etree

    rpr = run.find(f"{_W}rPr")
    if rpr is None:
        return b""
    return b"".join(etree.tostring(c) for c in rpr if c.tag not in _LOOK_IGNORED and not symbol_font(c))  # (Greek typed in Symbol is read as Greek; the restyled text writes it in the text's font)


def _new_runs(text: StyledText, model):  # type: ignore[no-untyped-def]
    """Runs for ``text`` with the font of the run ``model``: italics and
    vertical alignment from the text, everything else from the model."""
    from docx.oxml import OxmlElement
    from docx.text.run import Run

    from ..export.docx_writer import style_run, xml_safe

    base = model.find(f"{_W}rPr")
    out = []
    for chunk, styles in text.segments():
        r = OxmlElement("w:r")
        if base is not None:
            rpr = copy.deepcopy(base)
            for tag in ("i", "iCs", "vertAlign", "rPrChange"):
                for old in rpr.findall(f"{_W}{tag}"):
                    rpr.remove(old)
            for fonts in rpr.findall(f"{_W}rFonts"):  # the restyled text is Unicode: a Symbol font would print it as other letters
                if symbol_font(fonts):
                    rpr.remove(fonts)
            r.append(rpr)
        run = Run(r, None)  # type: ignore[arg-type]
        run.text = xml_safe(chunk)
        style_run(run, styles)
        out.append(r)
    return out


# -- writers ---------------------------------------------------------------------------------


def _comment(document, first, last, text: str) -> None:  # type: ignore[no-untyped-def]
    from docx.text.run import Run

    first, last = _anchor(first, True), _anchor(last, False)
    document.add_comment([Run(first, document), Run(last, document)], text=text, author=AUTHOR, initials="st")


def annotate(source: "str | Path", entries: "Sequence[Entry]", out: "str | Path") -> tuple[int, int]:
    """A copy of the .docx with a Word comment on each finding in the body
    and its tables: (comments added, findings elsewhere, listed only)."""
    from docx.oxml.ns import qn

    from ..export.docx_input import open_docx
    from ..export.docx_writer import save_document

    document = open_docx(source)
    paragraphs = list(document.element.body.iter(qn("w:p")))
    added = elsewhere = 0
    for e in sorted(entries, key=lambda e: (e.unit.index, -e.start)):
        if not e.findings:
            continue
        if e.unit.part != "word/document.xml" or e.unit.index >= len(paragraphs):
            elsewhere += 1
            continue
        runs = [r for r, s, t in _runs(paragraphs[e.unit.index]) if s < e.end and t > e.start]
        if not runs:
            elsewhere += 1
            continue
        _comment(document, runs[0], runs[-1], e.comment())
        added += 1
    save_document(document, out, inputs=[source])
    return added, elsewhere


def revise(source: "str | Path", entries: "Sequence[Entry]", out: "str | Path", *, when: datetime | None = None) -> dict[str, int]:
    """A copy of the .docx with every statistic that has a restyled text
    (``Entry.revision``) replaced by it as a tracked change, and a comment on
    each statistic whose findings the revision does not settle (an error or
    a warning, or a style finding on a statistic left as typed) or whose
    revision puts a p the text did not give (a threshold made exact). Returns the
    counts: revised, commented, kept (restyling would lose something),
    elsewhere (headers, footers, notes: listed only)."""
    from docx.oxml.ns import qn

    from ..export.docx_input import open_docx
    from ..export.docx_writer import save_document

    document = open_docx(source)
    body = document.element.body
    paragraphs = list(body.iter(qn("w:p")))
    ids = [int(v) for el in document.element.iter() for k, v in el.attrib.items() if k == qn("w:id") and v.lstrip("-").isdigit()]
    next_id = max(ids, default=0) + 1
    stamp = (when or datetime.now(timezone.utc)).strftime("%Y-%m-%dT%H:%M:%SZ")
    counts = {"revised": 0, "commented": 0, "kept": 0, "elsewhere": 0}
    for e in sorted(entries, key=lambda e: (e.unit.index, -e.start)):  # right to left: earlier offsets stay valid
        change = e.revision
        open_findings = [f for f in e.findings if f.severity != "style" or change is None]
        if change is None and not e.findings:
            continue
        if e.unit.part != "word/document.xml" or e.unit.index >= len(paragraphs):
            counts["elsewhere"] += 1
            continue
        runs = _span_runs(paragraphs[e.unit.index], e.start, e.end)
        why = e.kept
        if runs is None or (change is not None and len({_look(r) for r in runs if r.tag == f"{_W}r"}) > 1):
            why = ("a field, link, picture or equation lies inside the statistic, or another Word element (a smart tag, a content control) "
                   "parts its runs" if runs is None else "parts of it are in different fonts or emphasis")
            runs = [r for r, s, t in _runs(paragraphs[e.unit.index]) if s < e.end and t > e.start]
            change = None
            open_findings = list(e.findings)
        if not runs:
            counts["elsewhere"] += 1
            continue
        if open_findings or (why and e.revision is not None) or (change is not None and e.p_given):
            text = e.comment(open_findings, revised=change is not None, kept=why)
            _comment(document, runs[0], runs[-1], text)
            counts["commented"] += 1
        if change is None:
            counts["kept"] += bool(e.kept or e.findings)
            continue
        model = next(r for r in runs if r.tag == f"{_W}r")
        deletion = _tracked("w:del", next_id, stamp)
        insertion = _tracked("w:ins", next_id + 1, stamp)
        next_id += 2
        runs[0].addprevious(deletion)
        for node in runs:
            deletion.append(node)
            for t in node.iter(f"{_W}t"):
                t.tag = f"{_W}delText"
        for r in _new_runs(change, model):
            insertion.append(r)
        deletion.addnext(insertion)
        counts["revised"] += 1
    save_document(document, out, inputs=[source])
    return counts


def _tracked(tag: str, number: int, stamp: str):  # type: ignore[no-untyped-def]
    from docx.oxml import OxmlElement
    from docx.oxml.ns import qn

    el = OxmlElement(tag)
    el.set(qn("w:id"), str(number))
    el.set(qn("w:author"), AUTHOR)
    el.set(qn("w:date"), stamp)
    return el
