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
    assert latex == "$\\chi$\\textsuperscript{2} = \\textminus{}1, 95\\% CI"


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
