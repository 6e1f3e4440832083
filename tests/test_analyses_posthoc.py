"""Post hoc comparisons and factorial ANOVA, against outside references.

Dataset: pingouin's bundled 'penguins'. References: scipy.stats.tukey_hsd,
pingouin.pairwise_gameshowell and pingouin.anova (two-way, Type II and III),
statsmodels' multipletests for Holm.
"""

import pingouin as pg
import pytest
from scipy import stats
from statsmodels.stats.multitest import multipletests

from statsetter import InputError, render
from statsetter.errors import FormerUse
from statsetter.analyses import factorial_anova, posthoc

REL = 1e-10


@pytest.fixture(scope="module")
def penguins():
    return pg.read_dataset("penguins")


def samples(df):
    d = df.dropna(subset=["bill_length_mm"])
    return [d.bill_length_mm[d.species == s].to_numpy() for s in ("Adelie", "Chinstrap", "Gentoo")]


def test_tukey(penguins):
    rs = posthoc(penguins, "bill_length_mm", "species", adjust="tukey")
    ref = stats.tukey_hsd(*samples(penguins))
    ci = ref.confidence_interval()
    for r, (i, j) in zip(rs, [(0, 1), (0, 2), (1, 2)]):
        assert r.estimate.value == pytest.approx(ref.statistic[i, j], rel=REL)
        assert r.p == pytest.approx(ref.pvalue[i, j], rel=REL, abs=1e-300)
        assert (r.estimate.ci.low, r.estimate.ci.high) == pytest.approx((ci.low[i, j], ci.high[i, j]), rel=REL)
    assert "Tukey HSD" in render(rs[0], "sentence").plain()


def test_games_howell_against_pingouin(penguins):
    rs = posthoc(penguins, "bill_length_mm", "species", adjust="games-howell")
    ref = pg.pairwise_gameshowell(penguins, dv="bill_length_mm", between="species")
    for r, (_, row) in zip(rs, ref.iterrows()):
        assert r.estimate.value == pytest.approx(row["diff"], rel=REL)
        assert r.p == pytest.approx(row["pval"], rel=1e-6, abs=1e-12)


def test_holm_against_multipletests(penguins):
    rs = posthoc(penguins, "bill_length_mm", "species", adjust="holm")
    s = samples(penguins)
    raw = [stats.ttest_ind(s[i], s[j]).pvalue for i, j in [(0, 1), (0, 2), (1, 2)]]
    adjusted = multipletests(raw, method="holm")[1]
    assert [r.p for r in rs] == pytest.approx(list(adjusted), rel=REL)
    assert "Holm-adjusted" in rs[0].notes[0].text


@pytest.mark.parametrize("ss_type", [2, 3])
def test_factorial_against_pingouin(penguins, ss_type):
    rs = factorial_anova(penguins, "body_mass_g", ("species", "sex"), ss_type=ss_type)
    ref = pg.anova(penguins.dropna(subset=["sex"]), dv="body_mass_g", between=["species", "sex"], ss_type=ss_type)
    for r, (_, row) in zip(rs, ref.iloc[:3].iterrows()):
        assert r.statistic.value == pytest.approx(row["F"], rel=1e-9)
        assert r.p == pytest.approx(row["p_unc"], rel=1e-8)
        assert r.effects[0].value == pytest.approx(row["np2"], rel=1e-9)
        assert r.details["ss_type"] == ss_type
    assert "Type II" in render(rs[0], "sentence").plain() or ss_type == 3


def test_bad_input(penguins):
    with pytest.raises(InputError, match="adjust: 'scheffe' is not one of tukey"):
        posthoc(penguins, "bill_length_mm", "species", adjust="scheffe")  # type: ignore[arg-type]
    with pytest.warns(FormerUse, match="adjust="), pytest.raises(InputError, match="adjust: 'scheffe'"):
        posthoc(penguins, "bill_length_mm", "species", "scheffe")  # the former fourth positional argument
    with pytest.raises(InputError, match="one level"):
        factorial_anova(penguins.assign(one="x"), "body_mass_g", ("species", "one"))


def test_anova_table_against_statsmodels(penguins):
    # every cell of the ANOVA table is statsmodels' anova_lm (Type II) number put through the
    # style's engine: df, F, p and partial η² = SS / (SS + SS_error); an Error row with its df
    import statsmodels.api as sm
    import statsmodels.formula.api as smf

    from statsetter import load_style
    from statsetter.rendering.anova_tables import anova_table
    from statsetter.style import numbers_for

    num = numbers_for(load_style("apa7"))
    terms = factorial_anova(penguins, "body_mass_g", ["species", "sex"], ss_type=2)
    data = penguins.dropna(subset=["body_mass_g", "species", "sex"])
    ref = sm.stats.anova_lm(smf.ols("body_mass_g ~ C(species) * C(sex)", data=data).fit(), typ=2)
    table = anova_table(terms, "apa7")
    assert [c.head.text for c in table.columns] == ["SS", "df", "MS", "F", "p", "η2p", "95% CI"]
    rows = {r.stub.text: [c.text for c in r.cells] for r in table.rows}
    for term, key in (("species", "C(species)"), ("sex", "C(sex)"), ("species × sex", "C(species):C(sex)")):
        label = term[:1].upper() + term[1:]  # stubs in sentence case (APA 7 §7.12, memory)
        ss_cell, df, ms, f, p, eta, ci = rows[label]
        ss = ref.loc[key, "sum_sq"]
        assert ss_cell == num.number(ss, "SS") and ms == num.number(ss / ref.loc[key, "df"], "SS")
        assert df == num.df(ref.loc[key, "df"]) and f == num.number(ref.loc[key, "F"], "F")
        assert p == "< .001" or p == num.p(ref.loc[key, "PR(>F)"])[1]
        assert eta == num.number(ss / (ss + ref.loc["Residual", "sum_sq"]), "eta2_p")
        assert ci.startswith("[") and ci.endswith("]")
    error = ref.loc["Residual"]
    assert rows["Error"][:3] == [num.number(error["sum_sq"], "SS"), num.df(error["df"]), num.number(error["sum_sq"] / error["df"], "SS")]
    # the corrected total: Σ(y − ȳ)² on N − 1 df; Type II rows of an unbalanced design do not add up to it, and the note says so
    total = ((data.body_mass_g - data.body_mass_g.mean()) ** 2).sum()
    assert rows["Total"][:2] == [num.number(total, "SS"), num.df(len(data) - 1)]
    assert "do not add up to the total" in table.general_note.text
    # one-way (R's PlantGrowth, anova(lm(weight ~ group)): SS 3.76634 and 10.49209 on 2 and 27 df): rows that add up, no such note
    from open_data import PLANTS

    from statsetter.analyses import anova_oneway

    oneway = anova_table([anova_oneway(PLANTS, "weight", "group").main], "apa7")
    rows = {r.stub.text: [c.text for c in r.cells] for r in oneway.rows}
    assert rows["Group"][:3] == ["3.77", "2", "1.88"] and rows["Error"][:3] == ["10.49", "27", "0.39"] and rows["Total"][:2] == ["14.26", "29"]
    assert "add up" not in oneway.general_note.text and [c.head.text for c in oneway.columns][-2:] == ["η2", "95% CI"]
    welch = anova_table([anova_oneway(PLANTS, "weight", "group", variant="welch").main], "apa7")
    assert [c.head.text for c in welch.columns] == ["F", "df1", "df2", "p", "η2", "95% CI"] and "Error" not in [r.stub.text for r in welch.rows]
    with pytest.raises(InputError, match="one factorial ANOVA"):
        anova_table([], "apa7")
