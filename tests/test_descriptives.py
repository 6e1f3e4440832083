"""Descriptives tables by level of measurement.

Outside references:
* the Palmer penguins data (Gorman, Williams & Fraser, 2014; the
  palmerpenguins R package, Horst, Hill & Gorman, 2020) as bundled with
  pingouin (``pingouin.read_dataset("penguins")``), checked against the
  package's published summary (its README and ``summary(penguins)``; values
  recalled from memory): 344 penguins, 152 Adelie, 124 Gentoo, 68 Chinstrap;
  165 female, 168 male, 11 sex unknown; body mass mean 4202 g (median 4050,
  range 2700-6300, 2 missing); bill length mean 43.92 mm, median 44.45;
* the affairs data of Fair (1978) bundled with statsmodels
  (``statsmodels.datasets.fair``), checked against plain pandas groupby;
* statsmodels' DescrStatsW and numpy's weighted quantile for weights;
* scipy and pingouin for the per-row tests.
"""

from __future__ import annotations

from statsetter import table
from decimal import Decimal

import numpy as np
import pandas as pd
import pingouin as pg
import pytest
import statsmodels.api as sm
from scipy import stats

from statsetter import InputError
from statsetter.analyses import describe
from statsetter.export.text_tables import write_table
from statsetter.levels import infer_level


@pytest.fixture(scope="module")
def penguins() -> pd.DataFrame:
    return pg.read_dataset("penguins")


@pytest.fixture(scope="module")
def fair() -> pd.DataFrame:
    return sm.datasets.fair.load_pandas().data


def by_name(description, name):
    return next(v for v in description.variables if v.name == name)


def test_penguins_against_the_published_summary(penguins):
    d = describe(penguins, ["species", "sex", "body_mass_g", "bill_length_mm"], show={"continuous": ["mean_sd", "median_iqr", "range"]}).main
    species = by_name(d, "species")
    assert dict(zip(species.categories, species.counts[0])) == {"Adelie": 152, "Chinstrap": 68, "Gentoo": 124}
    sex = by_name(d, "sex")
    assert dict(zip(sex.categories, sex.counts[0])) == {"female": 165, "male": 168}
    assert sex.missing[0] == 11
    mass = by_name(d, "body_mass_g")
    assert round(mass.mean[0]) == 4202 and mass.median[0] == 4050 and (mass.minimum[0], mass.maximum[0]) == (2700, 6300)
    assert mass.missing[0] == 2
    bill = by_name(d, "bill_length_mm")
    assert round(bill.mean[0], 2) == 43.92 and round(bill.median[0], 2) == 44.45


def test_fair_by_group_against_plain_pandas(fair):
    levels = {"rate_marriage": "ordinal", "occupation": "nominal", "age": "interval", "affairs": "ratio"}
    d = describe(fair, list(levels), group="religious", levels=levels, show={"continuous": ["mean_sd", "median_iqr", "range", "skew"], "ordinal": ["median_iqr", "counts"]}).main
    groups = fair.groupby("religious")
    order = sorted(fair.religious.unique())
    assert d.columns == tuple(f"{g:g}" for g in order) + ("Total",)
    assert list(d.column_n) == list(groups.size().loc[order]) + [len(fair)]
    for name in ("age", "affairs"):
        v = by_name(d, name)
        np.testing.assert_allclose(v.mean[:-1], groups[name].mean().loc[order], rtol=1e-12)
        np.testing.assert_allclose(v.sd[:-1], groups[name].std().loc[order], rtol=1e-12)
        np.testing.assert_allclose(v.skew[:-1], groups[name].skew().loc[order], rtol=1e-9)
        np.testing.assert_allclose(v.median[:-1], groups[name].median().loc[order], rtol=1e-12)
        np.testing.assert_allclose(v.q1[:-1], groups[name].quantile(0.25).loc[order], rtol=1e-12)
        np.testing.assert_allclose(v.minimum[:-1], groups[name].min().loc[order])
        np.testing.assert_allclose([v.mean[-1], v.sd[-1], v.skew[-1]], [fair[name].mean(), fair[name].std(), fair[name].skew()], rtol=1e-9)
        np.testing.assert_allclose([v.q1[-1], v.median[-1], v.q3[-1]], fair[name].quantile([0.25, 0.5, 0.75]), rtol=1e-12)
    rate = by_name(d, "rate_marriage")  # ordinal: quartiles from counts must equal pandas' interpolated quantiles
    np.testing.assert_allclose(rate.median[:-1], groups.rate_marriage.median().loc[order])
    np.testing.assert_allclose(rate.q3[:-1], groups.rate_marriage.quantile(0.75).loc[order])
    np.testing.assert_allclose(rate.q1[-1], fair.rate_marriage.quantile(0.25))
    crosstab = pd.crosstab(fair.religious, fair.rate_marriage)
    np.testing.assert_array_equal(rate.counts[:-1], crosstab.to_numpy())
    occupation = by_name(d, "occupation")
    crosstab = pd.crosstab(fair.religious, fair.occupation)
    assert occupation.categories == tuple(f"{c:g}" for c in crosstab.columns)
    np.testing.assert_array_equal(occupation.counts[:-1], crosstab.to_numpy())
    np.testing.assert_array_equal(occupation.counts[-1], fair.occupation.value_counts().sort_index().to_numpy())


def test_ordinal_quartiles_from_counts_match_numpy_on_awkward_sizes():
    # Hyndman & Fan type 7 is numpy's default; counted quartiles must agree for every n
    rng = np.random.default_rng(7)
    for n in (1, 2, 3, 4, 5, 10, 11, 101):
        x = rng.integers(1, 6, size=n).astype(float)
        v = describe(pd.DataFrame({"x": x}), levels={"x": "ordinal"}).main.variables[0]
        np.testing.assert_allclose([v.q1[0], v.median[0], v.q3[0]], np.quantile(x, [0.25, 0.5, 0.75]))


def test_weights_against_statsmodels_and_numpy(fair):
    from statsmodels.stats.weightstats import DescrStatsW

    w = fair.yrs_married.to_numpy()  # any positive column will do as weights
    d = describe(fair, ["affairs", "occupation", "rate_marriage"], group="children", weights="yrs_married",
                 levels={"rate_marriage": "ordinal", "occupation": "nominal"}, show={"continuous": ["mean_sd", "median_iqr"]}).main
    affairs = by_name(d, "affairs")
    ref = DescrStatsW(fair.affairs, weights=w, ddof=1)
    np.testing.assert_allclose([affairs.mean[-1], affairs.sd[-1]], [ref.mean, ref.std], rtol=1e-12)
    np.testing.assert_allclose(
        [affairs.q1[-1], affairs.median[-1], affairs.q3[-1]],
        np.quantile(fair.affairs, [0.25, 0.5, 0.75], weights=w, method="inverted_cdf"),
    )
    for j, (_, part) in enumerate(fair.groupby("children")):
        ref = DescrStatsW(part.affairs, weights=part.yrs_married, ddof=1)
        np.testing.assert_allclose([affairs.mean[j], affairs.sd[j]], [ref.mean, ref.std], rtol=1e-12)
    rate = by_name(d, "rate_marriage")
    np.testing.assert_allclose(rate.median[-1], np.quantile(fair.rate_marriage, 0.5, weights=w, method="inverted_cdf"))
    occupation = by_name(d, "occupation")
    np.testing.assert_allclose(occupation.counts[-1], fair.groupby("occupation").yrs_married.sum().to_numpy())
    np.testing.assert_allclose(d.column_n[-1], w.sum())
    note = table(d).general_note.text
    assert "weighted by yrs_married" in note


def test_tests_per_row_match_scipy_and_pingouin(penguins):
    d = describe(penguins, ["island", "body_mass_g", "sex"], group="species", compare=True).main
    clean = penguins.dropna(subset=["island"])
    chi2 = stats.chi2_contingency(pd.crosstab(clean.species, clean.island), correction=False)
    assert by_name(d, "island").test.p == pytest.approx(chi2.pvalue, rel=1e-10)
    welch = pg.welch_anova(data=penguins.dropna(subset=["body_mass_g"]), dv="body_mass_g", between="species")
    assert by_name(d, "body_mass_g").test.p == pytest.approx(welch["p_unc"].iloc[0], rel=1e-8)
    rated = penguins.assign(mass_rank=penguins.body_mass_g.rank())
    d2 = describe(rated, ["bill_depth_mm"], group="sex", compare=True, levels={"bill_depth_mm": "ordinal"}).main
    clean = rated.dropna(subset=["sex", "bill_depth_mm"])
    u = stats.mannwhitneyu(*[g.bill_depth_mm for _, g in clean.groupby("sex")])
    assert d2.variables[0].test.p == pytest.approx(u.pvalue, rel=1e-8)
    laid = table(d)
    letters = dict(laid.specific_notes)
    assert letters["a"].text == "χ2 test of independence." and letters["b"].text == "Welch's one-way ANOVA."
    p_cells = [row.cells[-1].text for row in laid.rows if row.cells and row.cells[-1].text]
    assert p_cells == ["< .001a", "< .001b", ".976a"]


def test_standardised_differences(penguins):
    d = describe(penguins, ["body_mass_g", "island", "species"], group="sex", smd=True).main
    clean = penguins.dropna(subset=["sex"])
    f, m = (clean[clean.sex == s] for s in ("female", "male"))
    mass = by_name(d, "body_mass_g")
    # Austin (2009): (M1 - M2) / sqrt((SD1^2 + SD2^2) / 2)
    expected = abs(f.body_mass_g.mean() - m.body_mass_g.mean()) / np.sqrt((f.body_mass_g.var() + m.body_mass_g.var()) / 2)
    assert mass.smd == pytest.approx(expected, rel=1e-12)
    # Yang & Dalton (2012) with two categories reduces to the proportions formula
    two = describe(clean.assign(biscoe=np.where(clean.island == "Biscoe", "yes", "no")), ["biscoe"], group="sex", smd=True).main.variables[0]
    p1, p2 = (g.island.eq("Biscoe").mean() for g in (f, m))
    assert two.smd == pytest.approx(abs(p1 - p2) / np.sqrt((p1 * (1 - p1) + p2 * (1 - p2)) / 2), rel=1e-12)
    assert by_name(d, "species").smd >= 0
    with pytest.raises(InputError, match="exactly two"):
        describe(penguins, ["body_mass_g"], group="species", smd=True).main


def counts_in(table):
    return [c.text for row in table.rows for c in row.cells]


def test_suppression_is_off_by_default_and_hides_recoverable_cells():
    df = pd.DataFrame({"g": ["a"] * 30 + ["b"] * 30, "x": ["p"] * 27 + ["q"] * 2 + ["r"] + ["p"] * 20 + ["q"] * 10})
    plain = table(describe(df, ["x"], group="g").main)
    assert not any("<" in c for c in counts_in(plain)) and "confidentiality" not in plain.general_note.text
    d = describe(df, ["x"], group="g", suppress_below=5).main
    laid = table(d)
    cells = [[c.text for c in row.cells] for row in laid.rows[1:]]  # rows p, q, r; columns a, b, Total
    hidden = np.array([[c.startswith("< 5") for c in row] for row in cells])
    assert hidden[1, 0] and hidden[2, 0]  # q and r in group a are 2 and 1
    for line in list(hidden) + list(hidden.T):  # no row or column with exactly one hidden count
        assert line.sum() != 1
    assert "cannot be recovered by subtraction" in laid.general_note.text
    with pytest.raises(InputError, match="suppress_below"):
        describe(df, ["x"], suppress_below=1).main


def test_notes_define_abbreviations_and_rounding(penguins):
    d = describe(penguins, ["island", "body_mass_g", "bill_depth_mm"], levels={"bill_depth_mm": "ordinal"}).main
    note = table(d).general_note.plain()  # (the note keeps "M = mean" together with no-break spaces; plain shows spaces)
    for defined in ("M = mean", "SD = standard deviation", "Mdn = median", "IQR = interquartile range", "n = number", "N = number"):
        assert defined in note
    assert "may not total 100 because of rounding" in note  # 48.8 + 36.0 + 15.1 = 99.9
    exact = table(describe(pd.DataFrame({"x": ["a", "a", "b", "b"]})).main).general_note.text
    assert "rounding" not in exact and "M = mean" not in exact


def test_levels_from_categoricals_and_inference():
    df = pd.DataFrame({
        "agree": pd.Categorical(["low", "mid", "high", "mid"], categories=["low", "mid", "high"], ordered=True),
        "colour": pd.Categorical(["red", "blue", "red", "red"], categories=["red", "blue"]),
        "score": [1, 5, 7, 3],
        "flag": [0, 1, 1, 0],
        "weight": [61.5, 70.25, 80.0, 55.5],
    })
    d = describe(df).main
    levels = {v.name: v.level for v in d.variables}
    assert levels["agree"].level == "ordinal" and levels["agree"].source == "categorical"
    assert by_name(d, "colour").categories == ("red", "blue")  # category order, not sorted
    assert levels["score"].level == "ordinal" and levels["score"].weak
    assert "integer, 4 distinct values 1–7" in levels["score"].reason
    assert levels["flag"].level == "nominal" and levels["flag"].dichotomous
    assert levels["weight"].level == "interval" and not levels["weight"].weak
    agree = by_name(d, "agree")
    cell = table(d).rows[0].cells[0].text
    # quartiles of ordered categories by the inverted CDF, as numpy's method="inverted_cdf"
    positions = np.quantile([0, 1, 2, 1], [0.25, 0.5, 0.75], method="inverted_cdf")
    assert agree.positions and list(positions) == [0, 1, 1] and cell == "mid (low–mid)"
    assert infer_level(pd.Series([f"id{i}" for i in range(100)], name="code")).weak


def test_sav_metadata_levels_and_value_labels(tmp_path):
    pyreadstat = pytest.importorskip("pyreadstat")
    from statsetter.io import read_data

    df = pd.DataFrame({"shift": [2.0, 1.0, 2.0, 3.0, 1.0], "rested": [1.0, 3.0, 2.0, 2.0, 1.0], "hours": [7.5, 6.0, 8.0, 5.5, 6.5]})
    path = tmp_path / "survey.sav"
    pyreadstat.write_sav(
        df, str(path),
        variable_value_labels={"shift": {2.0: "Night", 1.0: "Day", 3.0: "Rotating"}},
        variable_measure={"shift": "nominal", "rested": "ordinal", "hours": "scale"},
        column_labels={"hours": "Sleep (hours)"},
    )
    data = read_data(path)
    assert data.levels == {"shift": "nominal", "rested": "ordinal", "hours": "interval"}
    assert data.labels["hours"] == "Sleep (hours)"
    d = describe(data.frame, metadata_levels=data.levels, value_labels=data.value_labels, labels=data.labels).main
    assert {v.name: v.level.source for v in d.variables} == {"shift": "metadata", "rested": "metadata", "hours": "metadata"}
    assert by_name(d, "shift").categories == ("Night", "Day", "Rotating")  # value-label order
    declared = describe(data.frame, levels={"rested": "interval"}, metadata_levels=data.levels).main
    assert by_name(declared, "rested").level.source == "declared"


def test_writers_and_missing_row(penguins):
    d = describe(penguins, ["sex", "body_mass_g"], group="species").main
    laid = table(d, number=2)
    md = write_table(laid, "md").replace("\u00a0", " ")
    assert "**Table 2**" in md and "| &nbsp;&nbsp;&nbsp;&nbsp;Missing | 6 | 0 | 5 | 11 |" in md
    assert "*n* = 152" in md and "*N* = 344" in md
    csv = write_table(laid, "csv")
    assert csv.splitlines()[0].startswith("Variable,")
    assert "\\textit{M}" in write_table(laid, "tex")
    assert "<i>SD</i>" in write_table(laid, "html")
    # percentages are of the cases with a value: 73 of the 146 sexed Adelie penguins
    assert "73 (50.0)" in md


def test_bad_input(penguins):
    with pytest.raises(InputError, match="body_mas: no such column; did you mean body_mass_g"):
        describe(penguins, ["body_mas"]).main
    with pytest.raises(InputError, match="at least two"):
        describe(penguins.assign(one="x"), ["sex"], group="one").main
    with pytest.raises(InputError, match="missing weight"):
        describe(penguins, ["sex"], weights="body_mass_g").main
    with pytest.raises(InputError, match="negative"):
        describe(penguins.assign(w=-1.0), ["sex"], weights="w").main
    with pytest.raises(InputError, match="level 'metric'"):
        describe(penguins, ["sex"], levels={"sex": "metric"}).main
    with pytest.raises(InputError, match="show.continuous"):
        describe(penguins, ["body_mass_g"], show={"continuous": ["mode"]}).main
    with pytest.raises(InputError, match="cannot be interval"):
        describe(penguins, ["sex"], levels={"sex": "interval"}).main
    with pytest.raises(InputError, match="name the grouping variable"):
        describe(penguins, ["sex"], compare=True).main
    with pytest.raises(InputError, match="survey design"):
        describe(penguins.assign(w=1.0), ["sex"], group="species", weights="w", compare=True).main


def test_percentages_are_exactly_rounded_half_up():
    # 1 of 8 = 12.5 %: with one decimal that stays 12.5; 1 of 16 = 6.25 % -> 6.3 (half up), not 6.2
    d = describe(pd.DataFrame({"x": ["a"] + ["b"] * 15})).main
    cells = counts_in(table(d))
    assert "1 (6.3)" in cells and "15 (93.8)" in cells
    assert Decimal("6.3") + Decimal("93.8") != 100  # and so the rounding note appears
    assert "rounding" in table(d).general_note.text


def test_scale_score_shows_as_continuous_with_alpha():
    # pingouin's bundled cronbach_alpha data; alpha checked against pingouin.cronbach_alpha
    from statsetter.analyses import cronbach_alpha, scale_score

    items = pg.read_dataset("cronbach_alpha").pivot(index="Subj", columns="Items", values="Scores")
    items.columns = [f"item{c}" for c in items.columns]
    names = list(items.columns)
    frame = items.assign(score=scale_score(items, names))
    record = cronbach_alpha(frame, names).main
    reference = pg.cronbach_alpha(items)[0]
    from_record = describe(frame, ["score"], alphas={"score": record}).main
    from_number = describe(frame, ["score"], alphas={"score": reference}).main
    assert from_record.variables[0].alpha == pytest.approx(reference, rel=1e-10)
    assert from_record.variables[0].level.level == "interval"
    expected = f"{reference:.2f}".lstrip("0")
    assert table(from_record).rows[0].stub.text == table(from_number).rows[0].stub.text == f"Score (α\u00a0=\u00a0{expected}), M (SD)"
    with pytest.raises(InputError, match="not a number"):
        describe(frame, ["score"], alphas={"score": "high"}).main
    with pytest.raises(InputError, match="not described"):
        describe(frame, ["score"], alphas={"other": 0.8}).main


def test_a_group_without_values_and_a_group_of_one():
    # the Total is computed from the groups that have values; one value has no SD (common practice)
    df = pd.DataFrame({"g": ["a", "a", "b", "b", "b", "c"], "x": [np.nan, np.nan, 1.0, 2.0, 3.5, 9.0]})
    d = describe(df, ["x"], group="g", levels={"x": "interval"}).main
    v = d.variables[0]
    present = df.x.dropna()
    assert v.mean[-1] == pytest.approx(present.mean(), rel=1e-12) and v.sd[-1] == pytest.approx(present.std(), rel=1e-12)
    cells = [c.text for c in table(d).rows[0].cells]
    assert cells[0] == "—" and cells[2] == "9.00 (—)"


def test_stubs_of_unlabelled_plain_names_start_with_a_capital():
    """Read as a supervisor would: Table 1 of pingouin's penguins by sex had stubs "species, n (%)" and "island" beside
    labelled ones starting with a capital, and the spanner "sex". A column without a label whose name is plain lowercase
    words now starts with a capital as a stub does (APA tables write stubs in sentence case — practice); names that are
    not plain words (bill_length_mm) and labels stay as they are."""
    d = pg.read_dataset("penguins")
    t = table(describe(d, ["species", "island", "bill_length_mm", "flipper_length_mm"], group="sex",
                       labels={"flipper_length_mm": "flipper length (mm)"}).main, "apa7")
    stubs = [r.stub.plain() for r in t.rows if r.indent == 0]
    assert [s.split(",")[0] for s in stubs] == ["Species", "Island", "bill_length_mm", "Flipper length (mm)"], stubs
    assert t.spanners[0].label.plain() == "Sex"


def test_compare_an_ordered_categorical_by_its_categories_positions():
    # found by fuzzing: describe(compare=True) of an ordinal variable held as an ordered pandas categorical (as R and
    # pyreadstat hand them over) stopped with "not numeric (dtype category)". Its Mann–Whitney test now compares the
    # categories' positions: scipy's mannwhitneyu on the codes is the reference (statsmodels' anes96, party
    # identification by expected vote; labels from its dataset notes)
    from statsetter.coding import factor

    d = sm.datasets.anes96.load_pandas().data
    party = dict(enumerate(["Strong Democrat", "Weak Democrat", "Independent-Democrat", "Independent-Independent",
                            "Independent-Republican", "Weak Republican", "Strong Republican"]))
    d = d.assign(PID=factor(d.PID, party, ordered=True), vote=d.vote.map({0: "Clinton", 1: "Dole"}))
    v = describe(d, ["PID"], group="vote", levels={"PID": "ordinal"}, compare=True).main.variables[0]
    codes = d.PID.cat.codes
    expected = stats.mannwhitneyu(codes[d.vote == "Clinton"], codes[d.vote == "Dole"], method="asymptotic").pvalue
    assert v.test_name.startswith("Mann") and v.test.p == pytest.approx(expected, rel=1e-12)
