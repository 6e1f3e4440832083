"""StyledText: markup round trip and the writers."""

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from statsetter import StyledText

R2 = StyledText.from_markup("<i>R</i><sup>2</sup> = .24, <i>r</i><sub>s</sub> &lt; 1 &amp; more")


def test_segments_and_plain():
    assert R2.text == "R2 = .24, rs < 1 & more"
    assert R2.plain() == "R² = .24, rₛ < 1 & more"


def test_markdown_pandoc():
    # pandoc Markdown: *italic*, ^super^, ~sub~ (pandoc manual, superscripts and subscripts)
    assert R2.markdown() == "*R*^2^ = .24, *r*~s~ < 1 & more"
    assert StyledText.from_markup("a<sub>x y</sub>").markdown() == "a~x\\ y~"
    assert StyledText("2*3_4").markdown() == "2\\*3\\_4"


def test_html_and_latex():
    assert R2.html() == "<i>R</i><sup>2</sup> = .24, <i>r</i><sub>s</sub> &lt; 1 &amp; more"
    latex = StyledText.from_markup("χ<sup>2</sup> = −1, 95% CI").latex()
    assert latex == "$\\upchi$\\textsuperscript{2} = \\textminus{}1, 95\\% CI"  # Greek roman (APA 7 §6.45), upgreek


def test_plain_fallback_for_missing_unicode_subscripts():
    assert StyledText.from_markup("<i>d</i><sub>av</sub>").plain() == "dₐᵥ"
    assert StyledText.from_markup("<i>r</i><sub>rb</sub>").plain() == "r_rb"


def test_jupyter_reprs():
    assert R2._repr_html_() == R2.html()
    assert R2._repr_markdown_() == R2.markdown()
    assert R2._repr_latex_() == R2.latex()


@pytest.mark.parametrize("bad", ["<i>t", "t</i>", "a < b", "<b>x</b>", "<sup>2</i>"])
def test_bad_markup(bad):
    with pytest.raises(ValueError):
        StyledText.from_markup(bad)


texts = st.text(alphabet=st.characters(blacklist_categories=("Cs",)), max_size=20)


@settings(max_examples=300, deadline=None)
@given(st.lists(st.tuples(texts, st.sets(st.sampled_from(["i", "sup", "sub"]))), max_size=6))
def test_markup_round_trip(pieces):
    text = StyledText()
    for chunk, styles in pieces:
        text = text + StyledText.styled(chunk, *sorted(styles))
    assert StyledText.from_markup(text.markup()) == text


# markup as the templates write it: text, tags (flat and nested, some empty), no entities
_pieces = st.lists(
    st.one_of(
        st.text(alphabet="ab 1,.−", max_size=4).map(lambda t: ("text", t)),
        st.sampled_from(["i", "sup", "sub"]).map(lambda t: ("open", t)),
        st.just(("close", "")),
    ),
    max_size=14,
)


def _markup_from(pieces):
    out, stack = [], []
    for kind, value in pieces:
        if kind == "text":
            out.append(value)
        elif kind == "open" and value not in stack:
            stack.append(value)
            out.append(f"<{value}>")
        elif kind == "close" and stack:
            out.append(f"</{stack.pop()}>")
    out.extend(f"</{tag}>" for tag in reversed(stack))
    return "".join(out)


@settings(max_examples=1000, deadline=None)
@given(_pieces)
def test_quick_markup_path_equals_the_full_parser(pieces):
    # from_markup's split-once path (flat tags, no entities) must give what the full parser
    # gives, and the segments it records must be the maximal runs computed from the spans
    from statsetter.styled import _segments_of

    markup = _markup_from(pieces)
    quick, full = StyledText.from_markup(markup), StyledText._parse(markup)
    assert quick.text == full.text and quick == full
    assert quick.segments() == _segments_of(full.text, full.spans)
    assert _segments_of(quick.text, quick.spans) == quick.segments()  # spans derived from the segments say the same
    assert all(a[1] != b[1] for a, b in zip(quick.segments(), quick.segments()[1:]))  # maximal: no two alike in a row
    assert quick.markdown() == full.markdown() and quick.plain() == full.plain()


def test_latex_prints_bars_and_typed_hyphens_as_typed(tmp_path):
    # found by fuzzing Table 1 with category labels as people type them: in LaTeX's default font encoding a bare "|"
    # prints as an em dash, and typed hyphens next to each other or to a dash join into one longer dash ("--" an en
    # dash, "–--" an em dash). Now "|" is \textbar and a hyphen or dash before another is closed by {}; checked as
    # pdflatex prints them (pdftotext)
    import shutil
    import subprocess

    from test_table_goldens import _require_pdflatex

    from statsetter.styled import LATEX_PREAMBLE

    typed = ["yes | no", "-- (not asked)", "1–-- 2", "1–—2", "well-being"]
    assert StyledText("a|b").latex() == "a\\textbar{}b" and StyledText("--").latex() == "-{}-"
    _require_pdflatex()
    if shutil.which("pdftotext") is None:
        pytest.skip("pdftotext not installed")
    body = "\\par\n".join(StyledText(t).latex() for t in typed)
    (tmp_path / "t.tex").write_text("\\documentclass{article}\n" + LATEX_PREAMBLE + "\\begin{document}\n" + body + "\n\\end{document}\n")
    subprocess.run(["pdflatex", "-interaction=nonstopmode", "t.tex"], cwd=tmp_path, capture_output=True, timeout=120)
    lines = [x.strip() for x in subprocess.run(["pdftotext", str(tmp_path / "t.pdf"), "-"], capture_output=True, text=True).stdout.splitlines() if x.strip()]
    assert lines[:5] == typed, lines
