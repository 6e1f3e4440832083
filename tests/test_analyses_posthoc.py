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
    assert [c.head.text for c in table.columns] == ["df", "F", "p", "η2p"]
    rows = {r.stub.text: [c.text for c in r.cells] for r in table.rows}
    for term, key in (("species", "C(species)"), ("sex", "C(sex)"), ("species × sex", "C(species):C(sex)")):
        label = next(name for name in rows if name.replace(" ", "") == term.replace(" ", "") or name == term)
        df, f, p, eta = rows[label]
        assert df == num.df(ref.loc[key, "df"]) and f == num.number(ref.loc[key, "F"], "F")
        assert p == "< .001" or p == num.p(ref.loc[key, "PR(>F)"])[1]
        ss = ref.loc[key, "sum_sq"]
        assert eta == num.number(ss / (ss + ref.loc["Residual", "sum_sq"]), "eta2_p")
    assert rows["Error"][0] == num.df(ref.loc["Residual", "df"])
    with pytest.raises(InputError, match="one factorial ANOVA"):
        anova_table([], "apa7")
