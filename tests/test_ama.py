"""AMA 11 as a whole style, rule by rule (docs/reporting-rules.md, "AMA 11").

Source: AMA Manual of Style, 11th ed. (2020), as the project recalls it; the
rules are marked *memory* in docs/reporting-rules.md until a second source
confirms them. Each test names the rule it follows. Records: the kind
examples (tests/kind_examples.py) and analyses of pingouin's penguins; the
same records in APA 7 show what changes.
"""

import pingouin as pg
import pytest

from kind_examples import EXAMPLES
from statsetter import load_style, render
from statsetter.analyses import describe, posthoc
from statsetter.export.docx_writer import table_parts
from statsetter.export.text_tables import write_table
from statsetter.rendering.layout import table

AMA, APA = load_style("ama11"), load_style("apa7")


def plain(record, form="stats", style=AMA):
    return render(record, form, style).plain().replace("\u00a0", " ")


@pytest.mark.parametrize("kind, ama, apa", [
    ("pearson", "r₉₈ = 0.32", "r(98) = .32"),                 # leading zero on r (AMA keeps it; APA drops it)
    ("cronbach_alpha", "α = 0.84", "α = .84"),                # Cronbach α is a coefficient, not a significance level
    ("linear_model", "R² = 0.24", "R² = .24"),
    ("chi2_independence", "V = 0.22", "V = .22"),
])
def test_a_leading_zero_on_every_value_but_p(kind, ama, apa):
    assert ama in plain(EXAMPLES[kind]) and apa in plain(EXAMPLES[kind], style=APA)
    assert "P = 0." not in plain(EXAMPLES[kind])  # P keeps no leading zero


def test_no_possessive_eponyms():
    assert "Cronbach α" in plain(EXAMPLES["cronbach_alpha"], "sentence") and "Cronbach's" in plain(EXAMPLES["cronbach_alpha"], "sentence", APA)
    assert plain(EXAMPLES["fisher_exact"], "sentence").startswith("Fisher exact test")
    assert "Student t₃₈" in plain(EXAMPLES["t_independent"], "sentence")
    assert "Kendall rank correlation" in plain(EXAMPLES["kendall"], "sentence")
    assert "McNemar test" in plain(EXAMPLES["mcnemar"], "sentence") and "McNemar's test" in plain(EXAMPLES["mcnemar"], "sentence", APA)
    assert plain(EXAMPLES["cochran_q"], "sentence").startswith("Cochran Q test")
    # no kind keeps an eponym's possessive in AMA 11
    for kind, record in EXAMPLES.items():
        assert "'s " not in plain(record, "sentence") and "’s " not in plain(record, "sentence"), kind


def test_mean_sd_in_text():
    # AMA: "mean (SD)" with the values after it, brackets inside parentheses
    text = plain(EXAMPLES["t_independent"], "sentence")
    assert "(mean [SD], 4.10 [0.90]; n = 20)" in text and "M = " not in text


def test_degrees_of_freedom_as_subscripts_and_ci_as_a_range():
    assert render(EXAMPLES["anova_oneway"], "stats", AMA).markup().startswith("<i>F</i><sub>2,97</sub>")
    assert plain(EXAMPLES["t_independent"]) == "t₃₈ = 2.14, P = .04, d = 0.68 (95% CI, 0.04-1.31)"
    # a negative limit: "to" instead of a hyphen that would read as a minus
    assert "(95% CI, −0.25 to 0.25)" in plain(_negative())


def _negative():
    import dataclasses

    from statsetter.records import EffectSize, Interval

    r = EXAMPLES["t_independent"]
    return dataclasses.replace(r, effects=(EffectSize("d", 0.0, Interval(0.95, -0.25, 0.25)),))


def test_tables_one_line_caption_range_cells_and_no_percent_head():
    penguins = pg.read_dataset("penguins")
    pairs = table(posthoc(penguins, "body_mass_g", "species"), AMA, number=2)
    md = write_table(pairs, "md", AMA).replace("\u00a0", " ")
    assert md.startswith("**Table 2.** Pairwise Comparisons\n") and "−1507.53 to −1243.18" in md
    apa = write_table(table(posthoc(penguins, "body_mass_g", "species"), APA, number=2), "md", APA).replace("\u00a0", " ")
    assert apa.startswith("**Table 2**\n\n*Pairwise Comparisons*") and "[−1,507.53, −1,243.18]" in apa
    assert write_table(pairs, "text", AMA).startswith("Table 2. Pairwise Comparisons\n")
    assert '<caption style="caption-side:top;text-align:left"><b>Table 2.</b> Pairwise Comparisons</caption>' in write_table(pairs, "html", AMA)
    assert "\\textbf{Table 2.} Pairwise Comparisons\\par" in write_table(pairs, "tex", AMA)
    import warnings

    with warnings.catch_warnings(record=True) as said:  # AMA's ranges ("−1507.53 to −1243.18") may wrap before "to":
        warnings.simplefilter("always")                 # the pairs fit python-docx's 6-inch page without a warning
        word = table_parts(pairs, AMA)[0]
    assert [str(w.message) for w in said] == []
    assert "<w:b/>" in word and "Table 2. </w:t>" in word and "Pairwise Comparisons" in word and "<w:i/>" not in word
    sample = table(describe(penguins, ["species", "body_mass_g"]).main, AMA)
    assert any("No. (%)" in r.stub.text for r in sample.rows)


def test_alpha_as_the_significance_level_keeps_no_leading_zero():
    # AMA 11 (memory): no leading zero on α as the significance level, while Cronbach α keeps it
    import dataclasses

    null = dataclasses.replace(EXAMPLES["kendall"], p=0.30)
    assert "compatible with no correlation at α = .05" in plain(null, "sentence")
    assert "α = 0.84" in plain(EXAMPLES["cronbach_alpha"])


def test_thin_spaces_group_digits_from_five_digits_on():
    # AMA 11 (memory): 1507 and 13 071 (a thin space, U+2009), where APA 7 writes 1,507 and 13,071
    from statsetter.style.numbers import numbers_for

    ama, apa = numbers_for(AMA), numbers_for(APA)
    assert (ama.integer(1507), ama.integer(13071), ama.number(143401583.99, "SS")) == ("1507", "13\u2009071", "143\u2009401\u2009583.99")
    assert (apa.integer(1507), apa.integer(13071)) == ("1,507", "13,071")
