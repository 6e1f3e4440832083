"""A statistic never breaks across lines (docs/reporting-rules.md, Symbols and
spacing; practice): inside "t(38) = 2.14", "p < .001", "95% CI [a, b]" and a
head's "(n = 93)" the APA profile puts no-break spaces (U+00A0), which every
writer keeps — Word runs, HTML, pandoc Markdown, LaTeX's ~ — and which plain
text shows as spaces. Checked where a reader sees it: a Word document of many
sentences rendered by LibreOffice, where no line may end inside a statistic."""

from __future__ import annotations

import dataclasses
import re

import pytest

from kind_examples import EXAMPLES
from statsetter import load_style, render
from statsetter.export.docx_writer import results_document, save_document
from test_docx import pdf_text

NB = "\u00a0"


def test_the_apa_profile_keeps_each_statistic_together():
    t = render(EXAMPLES["t_independent"], "stats", "apa7")
    markup = t.markup()
    assert f"(38){NB}={NB}" in markup and f"<i>p</i>{NB}={NB}.039" in markup
    assert f"95%{NB}CI{NB}[" in markup and f",{NB}1.31]" in markup
    assert ", <i>p</i>" in markup  # between statistics the line may break
    assert NB not in t.plain()  # a terminal shows spaces
    assert "~=~" in t.latex() and "95\\%~CI~[" in t.latex()
    assert f"{NB}={NB}" in t.html() and f"{NB}={NB}" in t.markdown()


def test_a_house_style_can_ask_for_plain_spaces(tmp_path):
    path = tmp_path / "loose.toml"
    path.write_text('name = "loose"\nextends = "apa7"\n[numbers]\nkeep_together = "space"\n', encoding="utf-8")
    assert NB not in render(EXAMPLES["t_independent"], "sentence", load_style(path)).markup()
    bad = tmp_path / "bad.toml"
    bad.write_text('name = "bad"\nextends = "apa7"\n[numbers]\nkeep_together = "tight"\n', encoding="utf-8")
    with pytest.raises(Exception, match="keep_together"):
        load_style(bad)


def test_no_line_of_a_rendered_word_document_ends_inside_a_statistic(tmp_path):
    # sentences of every kind, with labels of growing length so that line ends fall everywhere; the same
    # document in a style with plain spaces shows that the check sees broken statistics (32 on this machine)
    records = []
    for i, kind in enumerate(sorted(EXAMPLES)):
        r = EXAMPLES[kind]
        for k in range(3):
            pad = "very " * (i % 4 + k * 3)
            vs = tuple(dataclasses.replace(v, label=f"{pad}{v.label}") for v in r.variables)
            records.append(dataclasses.replace(r, variables=vs))
    loose = tmp_path / "loose.toml"
    loose.write_text('name = "loose"\nextends = "apa7"\n[numbers]\nkeep_together = "space"\n', encoding="utf-8")
    found = {}
    for name, style in (("apa7", "apa7"), ("loose", load_style(loose))):
        path = save_document(results_document(records, style, title="Line ends", form="sentence"), tmp_path / f"{name}.docx")
        lines = [line.strip() for line in pdf_text(path).splitlines() if line.strip()]
        assert len(lines) > 100
        broken = [line for line in lines if re.search(r"(\s[=<>]|\b[pntFrdzUHTM]|\bCI|\d+%)$", line)]
        started = [line for line in lines if re.match(r"^[=<>]\s", line)]
        found[name] = broken + started
    assert found["apa7"] == [] and len(found["loose"]) >= 5
