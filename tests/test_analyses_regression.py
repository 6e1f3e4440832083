"""Linear and logistic regression, against outside references.

Dataset: pingouin's bundled 'penguins'. References: statsmodels' formula
interface (an independent design-matrix path: patsy treatment coding),
scipy.stats.f for the F change, and Nagelkerke's (1991) R² formula.
"""

import math

import pingouin as pg
import pytest
import statsmodels.formula.api as smf

from statsetter import InputError, render
from statsetter.analyses import hierarchical_steps, linear_regression, logistic_regression

REL = 1e-10


@pytest.fixture(scope="module")
def penguins():
    return pg.read_dataset("penguins")


def test_linear_against_formula_api(penguins):
    model, *coefs = linear_regression(penguins, "body_mass_g", ["flipper_length_mm", "species"])
    data = penguins.dropna(subset=["body_mass_g", "flipper_length_mm", "species"])
    ref = smf.ols("body_mass_g ~ flipper_length_mm + C(species)", data=data).fit()
    assert model.effect("R2").value == pytest.approx(ref.rsquared, rel=REL)
    assert model.effect("R2_adj").value == pytest.approx(ref.rsquared_adj, rel=REL)
    assert model.statistic.value == pytest.approx(ref.fvalue, rel=REL)
    assert model.statistic.df == (ref.df_model, ref.df_resid)
    assert model.p == pytest.approx(ref.f_pvalue, rel=REL)
    names = {"flipper_length_mm": "flipper_length_mm", "species[Chinstrap]": "C(species)[T.Chinstrap]",
             "species[Gentoo]": "C(species)[T.Gentoo]"}
    ci = ref.conf_int()
    for r in coefs:
        term = names[r.details["term"]]
        assert r.estimate.value == pytest.approx(ref.params[term], rel=REL)
        assert r.estimate.se == pytest.approx(ref.bse[term], rel=REL)
        assert r.statistic.value == pytest.approx(ref.tvalues[term], rel=REL)
        assert r.p == pytest.approx(ref.pvalues[term], rel=REL)
        assert (r.estimate.ci.low, r.estimate.ci.high) == pytest.approx((ci.loc[term, 0], ci.loc[term, 1]), rel=REL)
    flipper = coefs[0]
    beta = ref.params["flipper_length_mm"] * data.flipper_length_mm.std() / data.body_mass_g.std()
    assert flipper.effect("beta").value == pytest.approx(beta, rel=REL)
    assert "reference category Adelie" in " ".join(n.text for n in model.notes)


def test_hierarchical_f_change(penguins):
    (step,) = hierarchical_steps(penguins, "body_mass_g", [["flipper_length_mm"], ["species", "sex"]])
    data = penguins.dropna(subset=["body_mass_g", "flipper_length_mm", "species", "sex"])
    small = smf.ols("body_mass_g ~ flipper_length_mm", data=data).fit()
    big = smf.ols("body_mass_g ~ flipper_length_mm + C(species) + C(sex)", data=data).fit()
    f, p, dk = big.compare_f_test(small)
    assert step.statistic.value == pytest.approx(f, rel=1e-9)
    assert step.p == pytest.approx(p, rel=1e-9)
    assert step.effect("delta_R2").value == pytest.approx(big.rsquared - small.rsquared, rel=REL)


def test_logistic_against_formula_api(penguins):
    model, *coefs = logistic_regression(penguins, "sex", ["bill_depth_mm", "flipper_length_mm"])
    data = penguins.dropna(subset=["sex", "bill_depth_mm", "flipper_length_mm"]).assign(male=lambda d: (d.sex == "male").astype(int))
    ref = smf.logit("male ~ bill_depth_mm + flipper_length_mm", data=data).fit(disp=False)
    assert model.statistic.value == pytest.approx(ref.llr, rel=1e-9)
    assert model.p == pytest.approx(ref.llr_pvalue, rel=1e-6)
    n = ref.nobs
    nagelkerke = (1 - math.exp(2 / n * (ref.llnull - ref.llf))) / (1 - math.exp(2 / n * ref.llnull))
    assert model.effect("R2_nagelkerke").value == pytest.approx(nagelkerke, rel=1e-9)
    for r in coefs:
        term = r.details["term"]
        assert r.estimate.value == pytest.approx(ref.params[term], rel=1e-7)
        assert r.effect("OR").value == pytest.approx(math.exp(ref.params[term]), rel=1e-7)
        assert r.statistic.value == pytest.approx(ref.tvalues[term], rel=1e-7)
    assert "OR = " in render(coefs[0], "stats").plain()


@pytest.mark.parametrize(
    "call, message",
    [
        (lambda d: linear_regression(d.assign(k=1.0), "body_mass_g", ["k"]), "k: constant predictor"),
        (lambda d: linear_regression(d.assign(f2=d.flipper_length_mm * 2), "body_mass_g", ["flipper_length_mm", "f2"]), "f2: perfectly collinear"),
        (lambda d: linear_regression(d, "species", ["flipper_length_mm"]), "species: not numeric"),
        (lambda d: logistic_regression(d, "species", ["body_mass_g"]), "binary outcome"),
        (lambda d: logistic_regression(d.assign(x=(d.sex == "male").astype(float)), "sex", ["x"]), "separation"),
        (lambda d: linear_regression(d, "body_mass_g", ["flipper"]), "did you mean flipper_length_mm"),
    ],
)
def test_bad_input(penguins, call, message):
    with pytest.raises(InputError, match=message):
        call(penguins)


def test_regression_tables_against_the_formula_api(penguins):
    # every cell of the coefficients table is statsmodels' number (formula interface) put
    # through the style's number engine; the table has the APA anatomy (REPORTING-RULES
    # "Tables": a spanner over the CI limits, abbreviations and the model's fit in the note)
    from statsetter import load_style
    from statsetter.rendering.regression_tables import regression_table
    from statsetter.style import numbers_for

    num = numbers_for(load_style("apa7"))
    records = linear_regression(penguins, "body_mass_g", ["flipper_length_mm", "bill_depth_mm"])
    data = penguins.dropna(subset=["body_mass_g", "flipper_length_mm", "bill_depth_mm"])
    ref = smf.ols("body_mass_g ~ flipper_length_mm + bill_depth_mm", data=data).fit()
    ci = ref.conf_int()
    table = regression_table(records, "apa7")
    assert [c.head.text for c in table.columns] == ["B", "SE", "LL", "UL", "β", "t", "p"]
    assert table.spanners[0].label.text == "95% CI" and (table.spanners[0].start, table.spanners[0].end) == (2, 4)
    for row, term in zip(table.rows, ("flipper_length_mm", "bill_depth_mm")):
        cells = [c.text for c in row.cells]
        assert cells[0] == num.number(ref.params[term], "B") and cells[1] == num.number(ref.bse[term], "SE")
        assert (cells[2], cells[3]) == num.interval(ci.loc[term, 0], ci.loc[term, 1], "B")
        assert cells[5] == num.number(ref.tvalues[term], "t")
        assert cells[6] == "< .001" or cells[6] == num.p(ref.pvalues[term])[1]
    note = table.general_note.text.replace("\u00a0", " ")
    assert f"N = {int(ref.nobs)}." in note and "LL = lower limit" in note and f"F(2, {int(ref.df_resid)})" in note

    model, *coefs = logistic_regression(penguins, "sex", ["bill_depth_mm", "flipper_length_mm"])
    data = penguins.dropna(subset=["sex", "bill_depth_mm", "flipper_length_mm"]).assign(male=lambda d: (d.sex == "male").astype(int))
    lref = smf.logit("male ~ bill_depth_mm + flipper_length_mm", data=data).fit(disp=False)
    lci = lref.conf_int()
    logistic = regression_table([model, *coefs], "apa7")
    assert [c.head.text for c in logistic.columns] == ["B", "SE", "OR", "LL", "UL", "z", "p"]
    assert logistic.spanners[0].label.text == "95% CI for OR"
    first = [c.text for c in logistic.rows[0].cells]
    assert first[2] == num.number(math.exp(lref.params["bill_depth_mm"]), "OR")
    assert (first[3], first[4]) == num.interval(math.exp(lci.loc["bill_depth_mm", 0]), math.exp(lci.loc["bill_depth_mm", 1]), "OR", 1.0)
    with pytest.raises(InputError, match="one linear or one logistic regression"):
        regression_table([model, records[1]], "apa7")
    other = linear_regression(penguins, "bill_length_mm", ["flipper_length_mm"])
    with pytest.raises(InputError, match="the records hold 2 regressions"):
        regression_table(records + other, "apa7")
