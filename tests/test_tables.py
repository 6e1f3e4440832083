"""TableModel and the text writers (layout per APA 7 §7.8-7.21)."""

import re

import pytest

from statsetter import InputError, StyledText
from statsetter.export.text_tables import write_table
from statsetter.rendering.tables import Column, Row, Spanner, TableModel, styled


def model():
    return TableModel(
        number=1,
        title=StyledText("Scores by group"),
        stub_head=styled("Variable"),
        columns=(Column(styled("<i>M</i>")), Column(styled("<i>SD</i>")), Column(styled("<i>M</i>")), Column(styled("<i>SD</i>"))),
        spanners=(Spanner(styled("Group A"), 0, 2), Spanner(styled("Group B"), 2, 4)),
        rows=(Row(styled("Score"), tuple(styled(x) for x in ("4.10", "0.90", "3.50", "0.88"))),),
        general_note=styled("<i>M</i> = mean; <i>SD</i> = standard deviation."),
        specific_notes=(("a", styled("One case excluded.")),),
    )


def test_markdown():
    md = write_table(model(), "md")
    assert md.startswith("**Table 1**\n\n*Scores by Group*\n")
    assert "| Variable | Group A: *M* | Group A: *SD* | Group B: *M* | Group B: *SD* |" in md
    # APA 7 §7.14: general, specific and probability notes each begin on a new line (a paragraph of its own in pandoc)
    assert "\n\n*Note.* *M* = mean; *SD* = standard deviation.\n\n^a^ One case excluded.\n" in md


def test_html_has_only_horizontal_rules():
    html = write_table(model(), "html")
    assert "border-left" not in html and "border-right" not in html
    assert 'colspan="2"' in html and "<i>Note.</i>" in html
    # the number and title are the table's caption, above it and flush left (APA 7 §7.7)
    assert '<caption style="caption-side:top;text-align:left"><b>Table 1</b><br><i>Scores by Group</i></caption>' in html
    assert html.count("<p>") == 2  # the general and the specific note, each a paragraph of its own


def test_latex_booktabs():
    tex = write_table(model(), "tex")
    for needed in ("\\toprule", "\\midrule", "\\bottomrule", "\\cmidrule(lr){2-3}", "\\textbf{Table 1}"):
        assert needed in tex
    spec = re.search(r"\\begin\{tabularx?\}(\{\\linewidth\})?\{(.*)\}\n", tex).group(2)
    assert "|" not in spec and spec.endswith("cccc@{}")  # no vertical rules; the stub a wrapping column


def test_csv():
    assert write_table(model(), "csv").splitlines()[1] == "Score,4.10,0.90,3.50,0.88"


def test_bad_tables():
    with pytest.raises(InputError, match="row 1"):
        TableModel(title=StyledText("x"), columns=(Column(styled("a")),), rows=(Row(styled("r"), ()),))
    with pytest.raises(InputError, match="spanner"):
        TableModel(title=StyledText("x"), columns=(Column(styled("a")),), rows=(), spanners=(Spanner(styled("s"), 0, 3),))


def test_title_case():
    from statsetter.rendering.tables import title_case

    # APA 7 §6.17 (memory): minor words of three letters or fewer stay lowercase unless first
    assert title_case(StyledText("means of fatigue by shift and sleep")).text == "Means of Fatigue by Shift and Sleep"
    assert title_case(StyledText("the pH of water")).text == "The pH of Water"  # mixed case kept


def test_the_results_table_keeps_a_mean_difference_out_of_the_effect_size_column():
    # issue (tables) point 5: χ² with its N; a mean difference or coefficient without an effect size in an
    # Estimate column of its own (with its CI), an odds ratio under Effect size; no Estimate column when no
    # record needs one
    from kind_examples import EXAMPLES
    from statsetter.rendering.record_tables import results_table

    mixed = results_table([EXAMPLES["chi2_independence"], EXAMPLES["posthoc_pair"], EXAMPLES["fisher_exact"]])
    assert [c.head.plain() for c in mixed.columns] == ["Statistic", "p", "Estimate", "95% CI", "Effect size", "95% CI"]
    assert [s.label.plain() for s in mixed.spanners] == ["Estimate", "Effect size"]
    chi2, pair, fisher = ([c.plain().replace("\u00a0", " ") for c in r.cells] for r in mixed.rows)
    assert chi2[0] == "χ²(2, N = 200) = 9.87" and chi2[4] == "V = .22"
    assert pair[2] == "M_diff = 0.70" and pair[3] == "[0.13, 1.27]" and pair[4] == ""
    assert fisher[2] == "" and fisher[4] == "OR = 3.45"
    plain = results_table([EXAMPLES["chi2_independence"], EXAMPLES["t_independent"]])
    assert [c.head.plain() for c in plain.columns] == ["Statistic", "p", "Effect size", "95% CI"]
