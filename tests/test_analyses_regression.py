"""Linear and logistic regression, against outside references.

Dataset: pingouin's bundled 'penguins'. References: statsmodels' formula
interface (an independent design-matrix path: patsy treatment coding),
scipy.stats.f for the F change, and Nagelkerke's (1991) R² formula.
"""

import math
import re

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
    names = {"Intercept": "Intercept", "flipper_length_mm": "flipper_length_mm", "species[Chinstrap]": "C(species)[T.Chinstrap]",
             "species[Gentoo]": "C(species)[T.Gentoo]"}
    ci = ref.conf_int()
    for r in coefs:
        term = names[r.details["term"]]
        assert r.estimate.value == pytest.approx(ref.params[term], rel=REL)
        assert r.estimate.se == pytest.approx(ref.bse[term], rel=REL)
        assert r.statistic.value == pytest.approx(ref.tvalues[term], rel=REL)
        assert r.p == pytest.approx(ref.pvalues[term], rel=REL)
        assert (r.estimate.ci.low, r.estimate.ci.high) == pytest.approx((ci.loc[term, 0], ci.loc[term, 1]), rel=REL)
    flipper = coefs[1]
    beta = ref.params["flipper_length_mm"] * data.flipper_length_mm.std() / data.body_mass_g.std()
    assert flipper.effect("beta").value == pytest.approx(beta, rel=REL)
    assert "reference category Adelie" in " ".join(n.text for n in model.notes)


def test_hierarchical_f_change(penguins):
    step, *models = hierarchical_steps(penguins, "body_mass_g", [["flipper_length_mm"], ["species", "sex"]])
    assert [(r.kind, r.details.get("step")) for r in models if r.kind == "linear_model"] == [("linear_model", 1), ("linear_model", 2)]
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
    assert coefs[0].details["intercept"] and coefs[0].estimate.value == pytest.approx(ref.params["Intercept"], rel=1e-7)
    for r in coefs[1:]:
        term = r.details["term"]
        assert r.estimate.value == pytest.approx(ref.params[term], rel=1e-7)
        assert r.effect("OR").value == pytest.approx(math.exp(ref.params[term]), rel=1e-7)
        assert r.statistic.value == pytest.approx(ref.tvalues[term], rel=1e-7)
    assert "OR = " in render(coefs[1], "stats").plain()


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
    # "Tables": the intercept first, a spanner over the CI limits, abbreviations and the
    # model's fit in the note)
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
    assert [r.stub.text for r in table.rows] == ["Intercept", "Flipper_length_mm", "Bill_depth_mm"]
    for row, term in zip(table.rows, ("Intercept", "flipper_length_mm", "bill_depth_mm")):
        cells = [c.text for c in row.cells]
        assert cells[0] == num.number(ref.params[term], "B") and cells[1] == num.number(ref.bse[term], "SE")
        assert (cells[2], cells[3]) == num.interval(ci.loc[term, 0], ci.loc[term, 1], "B")
        assert cells[5] == num.number(ref.tvalues[term], "t")
        assert cells[6] == "< .001" or cells[6] == num.p(ref.pvalues[term])[1]
    assert table.rows[0].cells[4].text == ""  # no β for the intercept
    note = table.general_note.text.replace("\u00a0", " ")
    assert f"N = {int(ref.nobs)}." in note and "LL = lower limit" in note and f"F(2, {int(ref.df_resid)})" in note
    no_intercept = regression_table(records, load_style(_style_file("[tables]\nintercept = false\n")))
    assert [r.stub.text for r in no_intercept.rows] == ["Flipper_length_mm", "Bill_depth_mm"]

    model, *coefs = logistic_regression(penguins, "sex", ["bill_depth_mm", "flipper_length_mm"])
    data = penguins.dropna(subset=["sex", "bill_depth_mm", "flipper_length_mm"]).assign(male=lambda d: (d.sex == "male").astype(int))
    lref = smf.logit("male ~ bill_depth_mm + flipper_length_mm", data=data).fit(disp=False)
    lci = lref.conf_int()
    logistic = regression_table([model, *coefs], "apa7")
    assert [c.head.text for c in logistic.columns] == ["B", "SE", "OR", "LL", "UL", "z", "p"]
    assert logistic.spanners[0].label.text == "95% CI for OR"
    first = [c.text for c in logistic.rows[1].cells]
    assert first[2] == num.number(math.exp(lref.params["bill_depth_mm"]), "OR")
    assert (first[3], first[4]) == num.interval(math.exp(lci.loc["bill_depth_mm", 0]), math.exp(lci.loc["bill_depth_mm", 1]), "OR", 1.0)
    assert logistic.rows[0].cells[0].text == num.number(lref.params["Intercept"], "B") and logistic.rows[0].cells[2].text == ""
    with pytest.raises(InputError, match="linear or of logistic regressions"):
        regression_table([model, records[1]], "apa7")
    other = linear_regression(penguins, "bill_length_mm", ["flipper_length_mm"])
    with pytest.raises(InputError, match="2 outcomes"):
        regression_table(records + other, "apa7")


def _style_file(body):
    import tempfile
    from pathlib import Path

    path = Path(tempfile.mkdtemp()) / "house.toml"
    path.write_text('extends = "apa7"\n' + body)
    return str(path)


def test_nominal_predictors_are_headed_with_their_reference_and_columns_keep_one_decimals(penguins):
    # APA 7 sample regression tables (practice): a nominal predictor's categories indented under
    # its name, the reference category marked; like values in a column get like decimals
    from statsetter.records.naming import name_records
    from statsetter.rendering.regression_tables import regression_table

    records = name_records("m", linear_regression(penguins, "bill_length_mm", ["body_mass_g", "species"]))
    table = regression_table(records, "apa7")
    stubs = [(r.stub.text, r.indent, r.heading) for r in table.rows]
    assert stubs == [("Intercept", 0, False), ("Body_mass_g", 0, False), ("Species", 0, True), ("Adelie (ref.)", 1, False),
                     ("Chinstrap", 1, False), ("Gentoo", 1, False)]
    assert table.rows[3].cells[0].text == "—" and "ref. = reference category" in table.general_note.text.replace("\u00a0", " ")
    b = [r.cells[0].text for r in table.rows if r.cells and r.cells[0].text != "—"]
    decimals = {len(x.split(".")[1]) for x in b}
    # body_mass_g's B is about 0.004: never printed as 0.00, so the whole column shows three decimals
    assert decimals == {3}, b


def test_hierarchical_models_side_by_side_against_the_formula_api(penguins):
    # each step's model is statsmodels' fit of the same rows; ΔR² and ΔF are compare_f_test's
    from statsetter import load_style
    from statsetter.records.naming import name_records
    from statsetter.rendering.regression_tables import regression_table
    from statsetter.style import numbers_for

    num = numbers_for(load_style("apa7"))
    records = name_records("steps", hierarchical_steps(penguins, "body_mass_g", [["flipper_length_mm"], ["species"]]))
    data = penguins.dropna(subset=["body_mass_g", "flipper_length_mm", "species"])
    small = smf.ols("body_mass_g ~ flipper_length_mm", data=data).fit()
    big = smf.ols("body_mass_g ~ flipper_length_mm + C(species)", data=data).fit()
    table = regression_table(records, "apa7")
    assert [s.label.text for s in table.spanners] == ["Model 1", "Model 2"]
    assert [c.head.text for c in table.columns] == ["B", "95% CI", "β", "p"] * 2
    rows = {r.stub.text: [c.text for c in r.cells] for r in table.rows}
    assert rows["Flipper_length_mm"][0] == num.number(small.params["flipper_length_mm"], "B")
    assert rows["Flipper_length_mm"][4] == num.number(big.params["flipper_length_mm"], "B")
    assert rows["Gentoo"][:4] == ["", "", "", ""] and rows["Gentoo"][4] == num.number(big.params["C(species)[T.Gentoo]"], "B")
    assert rows["Adelie (ref.)"] == ["", "", "", "", "—", "", "", ""]
    assert rows["R2"][0] == num.number(small.rsquared, "R2") and rows["R2"][4] == num.number(big.rsquared, "R2")
    f, p, dk = big.compare_f_test(small)
    assert rows["ΔR2"][4] == num.number(big.rsquared - small.rsquared, "delta_R2")
    assert rows["ΔF (df)"][4] == f"{num.number(f, 'F')} ({int(dk)}, {int(big.df_resid)})" and rows["ΔF (df)"][7] == "< .001"
    assert rows["N"] == [str(int(big.nobs)), "", "", "", str(int(big.nobs)), "", "", ""]


def test_logistic_models_side_by_side_and_the_styles_pseudo_r2(penguins):
    # two logistic regressions of one outcome side by side: every B and OR is statsmodels' (formula interface);
    # the fit rows give χ² (df) with its p and the style's pseudo-R²: Nagelkerke (1991) by default, McFadden's
    # (1974) = statsmodels' prsquared when the style asks for it
    from statsetter import load_style
    from statsetter.records.naming import name_records
    from statsetter.rendering.regression_tables import regression_table
    from statsetter.style import numbers_for

    num = numbers_for(load_style("apa7"))
    data = penguins.dropna(subset=["sex", "bill_depth_mm", "body_mass_g"]).assign(male=lambda d: (d.sex == "male").astype(int))
    small = name_records("a", logistic_regression(data, "sex", ["bill_depth_mm"]))
    big = name_records("b", logistic_regression(data, "sex", ["bill_depth_mm", "body_mass_g"]))
    ref_small = smf.logit("male ~ bill_depth_mm", data=data).fit(disp=False)
    ref_big = smf.logit("male ~ bill_depth_mm + body_mass_g", data=data).fit(disp=False)
    assert big[0].effect("R2_mcfadden").value == pytest.approx(ref_big.prsquared, rel=1e-9)
    table = regression_table(small + big, "apa7")
    assert [s.label.text for s in table.spanners] == ["Model 1", "Model 2"]
    assert [c.head.text for c in table.columns] == ["B", "OR", "95% CI", "p"] * 2
    rows = {r.stub.text: [c.text for c in r.cells] for r in table.rows}
    assert rows["Bill_depth_mm"][0] == num.number(ref_small.params["bill_depth_mm"], "B")
    assert rows["Bill_depth_mm"][5] == num.number(math.exp(ref_big.params["bill_depth_mm"]), "OR")
    assert rows["χ2 (df)"][0] == f"{num.number(ref_small.llr, 'chi2')} (1)" and rows["χ2 (df)"][7] == "< .001"
    assert rows["Nagelkerke R2"][4] == num.number(big[0].effect("R2_nagelkerke").value, "R2_nagelkerke")
    mcfadden = regression_table(small + big, load_style(_style_file("[wording]\npseudo_r2 = \"mcfadden\"\n")))
    rows = {r.stub.text: [c.text for c in r.cells] for r in mcfadden.rows}
    assert rows["McFadden R2"][4] == num.number(ref_big.prsquared, "R2_mcfadden")
    assert "McFadden R² = " in render(big[0], "stats", load_style(_style_file("[wording]\npseudo_r2 = \"mcfadden\"\n"))).plain()


def test_a_small_coefficient_has_its_se_with_the_same_decimals():
    # read aloud: "B = −0.001, 95% CI [−0.297, 0.295], SE = 0.15" mixed decimals within one coefficient; like values
    # alike (APA 7 §6.36, memory): the SE takes the decimals the small B was given. pingouin's tips, tip on total
    # bill, party size, sex and time; B and SE of time (Lunch) from statsmodels' OLS on the same model.
    tips = pg.read_dataset("tips")
    fit = smf.ols("tip ~ total_bill + size + C(sex) + C(time)", data=tips).fit()
    b, se = fit.params["C(time)[T.Lunch]"], fit.bse["C(time)[T.Lunch]"]
    assert round(b, 3) == -0.001 and round(se, 3) == 0.150
    records = linear_regression(tips, "tip", ["total_bill", "size", "sex", "time"])
    lunch = next(r for r in records if r.details.get("category") == "Lunch")
    assert "B = −0.001, 95% CI [−0.297, 0.295], SE = 0.150, β = .00" in render(lunch, "sentence", "apa7").plain()


def test_a_null_odds_ratio_sentence_names_the_ratio_first():
    # read aloud on the ANES 1996 pilot (statsmodels' anes96): "The odds ratio of age for expected vote, holding the
    # other predictors constant, was B = 0.004, SE = 0.005, OR = 1.00 …" — the sentence named the odds ratio and gave
    # B first. Now the ratio it names comes first, then B, SE, z and p (both styles); the audit reads it back clean
    import statsmodels.api as sm

    from statsetter.audit.reading import Unit
    from statsetter.audit.report import audit_units

    d = sm.datasets.anes96.load_pandas().data.assign(vote=lambda f: f.vote.map({0: "Clinton", 1: "Dole"}))
    records = logistic_regression(d, "vote", ["age", "educ", "selfLR"], event="Dole")
    age = next(r for r in records if r.kind == "logistic_coefficient" and r.details.get("term") == "age")
    for style in ("apa7", "ama11"):
        said = render(age, "sentence", style).plain()
        assert said.startswith("The odds ratio of age") and re.search(r"was OR = 1\.00[ ,(]", said), said
        assert said.index("OR =") < said.index("B =") < said.index("z =")
        assert not [e for e in audit_units([Unit("s", said)], style) if e.findings]
