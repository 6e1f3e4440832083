"""Rank tests and Cronbach's α, against outside references.

Datasets: pingouin's bundled 'penguins' and 'cronbach_alpha'; Student's (1908)
sleep data (values recalled from memory, as in R's datasets::sleep).
References: scipy.stats (mannwhitneyu, wilcoxon, kruskal), pingouin (mwu's
RBC, cronbach_alpha) and the published formulas named beside each check.
"""

import re

import numpy as np
import pandas as pd
import pingouin as pg
import pytest
from scipy import stats

from statsetter import InputError, render
from statsetter.analyses import cronbach_alpha, kruskal_wallis, mann_whitney, scale_score, wilcoxon_signed_rank

REL = 1e-10
from open_data import SLEEP  # noqa: E402


@pytest.fixture(scope="module")
def penguins():
    return pg.read_dataset("penguins")


@pytest.fixture(scope="module")
def items():
    long = pg.read_dataset("cronbach_alpha")
    return long.pivot(index="Subj", columns="Items", values="Scores")


def test_mann_whitney(penguins):
    r = mann_whitney(penguins, "body_mass_g", "sex").main
    data = penguins.dropna(subset=["body_mass_g", "sex"])
    a, b = data.body_mass_g[data.sex == "female"], data.body_mass_g[data.sex == "male"]
    ref = stats.mannwhitneyu(a, b, method="asymptotic")
    assert r.statistic.value == pytest.approx(ref.statistic, rel=REL)
    assert r.p == pytest.approx(ref.pvalue, rel=REL)
    assert r.details["method"] == "normal approximation"  # ties present: stated
    assert r.effects[0].value == pytest.approx(pg.mwu(a, b)["RBC"].iloc[0], rel=REL)


def test_mann_whitney_exact_for_small_untied():
    df = pd.DataFrame({"y": [1.1, 2.3, 3.2, 4.8, 5.5, 6.1, 7.7], "g": list("aaabbbb")})
    r = mann_whitney(df, "y", "g").main
    assert r.details["method"] == "exact p"
    assert r.p == pytest.approx(stats.mannwhitneyu([1.1, 2.3, 3.2], [4.8, 5.5, 6.1, 7.7], method="exact").pvalue, rel=REL)


def test_wilcoxon_sleep():
    r = wilcoxon_signed_rank(SLEEP, "drug1", "drug2").main
    d = SLEEP.drug1 - SLEEP.drug2
    ref = stats.wilcoxon(SLEEP.drug1, SLEEP.drug2, method="approx")
    assert r.p == pytest.approx(ref.pvalue, rel=REL)
    assert r.statistic.value == pytest.approx(ref.statistic, rel=REL)
    assert r.n == int((d != 0).sum()) == 9
    # Kerby (2014): matched-pairs rank-biserial; every non-zero difference is negative -> -1
    assert r.effects[0].value == pytest.approx(-1.0, rel=REL)
    assert r.effects[0].value == pytest.approx(pg.wilcoxon(SLEEP.drug1, SLEEP.drug2)["RBC"].iloc[0], rel=REL)
    assert "1 zero difference(s) dropped" in r.notes[0].text


def test_kruskal(penguins):
    r = kruskal_wallis(penguins, "bill_length_mm", "species").main
    data = penguins.dropna(subset=["bill_length_mm"])
    ref = stats.kruskal(*[g.bill_length_mm.to_numpy() for _, g in data.groupby("species")])
    assert r.statistic.value == pytest.approx(ref.statistic, rel=REL)
    assert r.p == pytest.approx(ref.pvalue, rel=REL)
    n = len(data)
    assert r.effects[0].value == pytest.approx(ref.statistic * (n + 1) / (n * n - 1), rel=REL)  # Tomczak & Tomczak (2014)


def test_cronbach_against_pingouin(items):
    r = cronbach_alpha(items, list(items.columns), scale="the test").main
    alpha, ci = pg.cronbach_alpha(data=items)
    assert r.effects[0].value == pytest.approx(alpha, rel=REL)
    # pingouin rounds its interval to 3 decimals; ours is unrounded (Feldt, 1965)
    assert r.effects[0].ci.low == pytest.approx(ci[0], abs=5e-4)
    assert r.effects[0].ci.high == pytest.approx(ci[1], abs=5e-4)
    assert r.details["k_items"] == items.shape[1]
    # corrected item-total r: item against the sum of the others (plain pandas)
    complete = items.dropna()
    q1 = complete.columns[0]
    rest = complete.drop(columns=q1).sum(axis=1)
    assert r.details[f"item_total_r.{q1}"] == pytest.approx(complete[q1].corr(rest), rel=REL)
    assert render(r, "stats").plain().startswith("α = .")


def test_reverse_keying_and_scoring():
    df = pd.DataFrame({"a": [1, 2, 5], "b": [5, 4, 1], "c": [2, np.nan, 4]})
    s = scale_score(df, ["a", "b"], reverse=["b"], minimum=1, maximum=5)
    assert s.tolist() == [1.0, 2.0, 5.0]  # b reversed: 6 - b
    assert np.isnan(scale_score(df, ["a", "c"], scoring="sum")[1])
    with pytest.raises(InputError, match="minimum and maximum"):
        scale_score(df, ["a", "b"], reverse=["b"])
    with pytest.raises(InputError, match="outside the item range"):
        scale_score(df.assign(b=[7, 4, 1]), ["a", "b"], reverse=["b"], minimum=1, maximum=5)
    with pytest.raises(InputError, match="d: no such column"):
        scale_score(df, ["a", "d"])


def test_rank_bad_input(penguins):
    with pytest.raises(InputError, match="exactly two"):
        mann_whitney(penguins, "body_mass_g", "species").main
    with pytest.raises(InputError, match="every difference is zero"):
        wilcoxon_signed_rank(SLEEP.assign(x=SLEEP.drug1), "drug1", "x").main
    with pytest.raises(InputError, match="not numeric"):
        kruskal_wallis(penguins, "island", "species").main


def test_medians_of_whole_number_scores_print_as_whole_numbers_in_table_and_text():
    # a supervisor reading "Mdn = 2.00" of party sizes: medians and quartiles of whole-number data are whole (or
    # halves, or quarters), and Table 1 and the sentences now print the digits they have, the same in both:
    # pingouin's tips (Bryant & Smith, 1995 — memory): party size by sex, medians 2 and 2 (numpy.median; practice: R's
    # median gives the same), quartiles 2 and 3. Ratings in half points (pingouin's rm_anova, DesireToKill: 0, 0.5,
    # … 10) keep the style's decimals.
    import pingouin as pg

    from statsetter import render, table
    from statsetter.analyses import describe, kruskal_wallis, mann_whitney

    tips = pg.read_dataset("tips")
    said = render(mann_whitney(tips, "size", "sex", labels={"size": "party size"}).main, "sentence", "apa7").plain()
    assert "(Mdn = 2, n = 87)" in said and "(Mdn = 2, n = 157)" in said
    t = table(describe(tips, ["size"], group="sex", levels={"size": "ordinal"}).main, "apa7")
    assert [c.plain() for c in t.rows[0].cells[:3]] == ["2 (2–3)", "2 (2–3)", "2 (2–3)"]
    ratings = pg.read_dataset("rm_anova").dropna(subset=["DesireToKill"])
    said = render(kruskal_wallis(ratings, "DesireToKill", "Region").main, "sentence", "apa7").plain()
    assert all(re.fullmatch(r"\d+\.\d\d", m) for m in re.findall(r"Mdn = ([\d.]+)", said)), said


def test_ama_spells_medians_out_as_it_does_means():
    """AMA 11 spells the statistic out where APA abbreviates it — "Mean (SD)" heads and "mean [SD], 2.83 [1.16]" in
    sentences (the AMA profile; JMIR's guidelines, which follow AMA, write "mean 19, SD 2") — and its ranges take a
    hyphen as its CI cells do ("64 (55-72)"; memory). Medians now follow: a Table 1 row "Median (IQR)" with "2 (2-3)",
    its note defining only the abbreviations the table shows (SD and IQR, not M and Mdn), and "(median, 2; n = 87)" or
    "(median [IQR], 2 [2-3]; …)" in sentences. Before: "Mdn (IQR)" beside "Mean (SD)", "Mdn = 2" in the text and a note
    defining M and Mdn, which the table never printed. On pingouin's tips (party size by sex and by day)."""
    from statsetter import table
    from statsetter.analyses import describe, friedman

    tips = pg.read_dataset("tips")
    t = table(describe(tips, ["total_bill", "size"], group="sex", levels={"size": "ordinal"}).main, "ama11")
    stubs = [r.stub.plain() for r in t.rows]
    assert stubs[0].endswith("Mean (SD)") and stubs[1].endswith("Median (IQR)"), stubs
    assert [c.plain() for c in t.rows[1].cells[:3]] == ["2 (2-3)", "2 (2-3)", "2 (2-3)"]
    note = t.general_note.plain()
    assert "SD = standard deviation" in note and "IQR = interquartile range" in note
    assert "M = mean" not in note and "Mdn = median" not in note, note
    said = render(mann_whitney(tips, "size", "sex", labels={"size": "party size"}).main, "sentence", "ama11").plain()
    assert "(median, 2; n = 87)" in said and "Mdn" not in said, said
    wide = tips.assign(row=tips.index // 4, seat=tips.index % 4).pivot(index="row", columns="seat", values="size").dropna()
    wide.columns = ["first", "second", "third", "fourth"]
    said = render(friedman(wide, list(wide.columns))[0], "sentence", "ama11").plain()
    assert re.search(r"first \(median \[IQR\], \d \[\d-\d\]\)", said) and "Mdn" not in said, said
    apa = render(mann_whitney(tips, "size", "sex").main, "sentence", "apa7").plain()
    assert "(Mdn = 2, n = 87)" in apa  # APA unchanged
    from statsetter.rendering.figures import means_figure
    from statsetter.style.profile import load_style

    ranks = [mann_whitney(tips, "size", "sex").main]
    assert means_figure(ranks, load_style("ama11")).y_label == "Size (median)"  # the axis as the table and text say it
    assert means_figure(ranks, load_style("apa7")).y_label == "Size (<i>Mdn</i>)"


def test_medians_without_quartiles_print_the_digits_the_medians_have():
    # read aloud on the ANES 1996 pilot (statsmodels' anes96): days a week of TV news (whole numbers) by education.
    # Every median is a whole day, but one group's first quartile falls between two scores (2.75, numpy's default
    # percentile, as R's type 7 — practice), and the sentence, which gives medians only, had printed "Mdn = 5.00".
    # The medians now take the decimals of the medians alone; where a sentence gives a median with its quartiles, the
    # median takes theirs ("Mdn = 6.00, IQR = [2.75, 7.00]"), so the three agree.
    import statsmodels.api as sm

    from statsetter.rendering.sentences import Helpers
    from statsetter.style.profile import load_style

    d = sm.datasets.anes96.load_pandas().data
    r = kruskal_wallis(d, "TVnews", "educ").main
    medians = {str(g.label): np.median(d.TVnews[d.educ == float(g.label)]) for g in r.groups}
    assert all(float(m).is_integer() for m in medians.values())
    assert any(not float(g.q1).is_integer() and not (2 * g.q1).is_integer() for g in r.groups)  # 2.75 in some group
    said = render(r, "sentence", "apa7").plain()
    printed = re.findall(r"\(Mdn = ([\d.]+), n = \d+\)", said)
    assert printed == [f"{m:.0f}" for m in medians.values()], said
    ama = render(r, "sentence", "ama11").plain()
    assert re.findall(r"\(median, ([\d.]+); n = \d+\)", ama) == printed, ama
    i = next(i for i, g in enumerate(r.groups) if not (2 * g.q1).is_integer())
    both = Helpers(load_style("apa7")).desc(r, i, "median iqr")
    assert re.fullmatch(r"Mdn = \d\.\d\d, IQR = \[\d\.\d\d, \d\.\d\d\]", _plain(both)), both


def _plain(markup: str) -> str:
    from statsetter.styled import StyledText

    return StyledText.from_markup(markup).plain()
