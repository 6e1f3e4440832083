"""Linear mixed models against R's nlme on its bundled Orthodont data (tests/data/orthodont.csv, written by R from
nlme::Orthodont: Potthoff & Roy's dental distances, 27 children at ages 8-14).

R 4.x, run here (tests/r_reference.R): lme(distance ~ age + Sex, random = ~1 | Subject, method = "REML") — fixed
effects, VarCorr, logLik, AIC, BIC; the ICC from lme(distance ~ 1, ...); anova() of the ML fits with and without Sex;
lme(distance ~ age, random = ~age | Subject). A random-intercept model is fitted by statsetter's exact profiled
likelihood and agrees with nlme to 1e-9 (nlme's own optimiser tolerance); random slopes go through statsmodels' MixedLM,
whose optimiser stops within about 1e-5 of nlme's, so those comparisons allow that. R tests fixed effects with t and
containment df, statsetter with z (said in the records), so the p values are checked as z-based from R's own B and SE.
Beyond R: on open grouped data (statsmodels' Grunfeld investment panel, pingouin's rm_corr, penguins and an unbalanced
repeated design) statsetter's maximum is statsmodels' likelihood at statsetter's parameters and at least as high as
statsmodels' own optimum."""

from __future__ import annotations

from pathlib import Path

import pandas as pd
import pytest
from scipy import stats

from statsetter import InputError, render
from statsetter.analyses import compare_models, mixed_model

DATA = pd.read_csv(Path(__file__).parent / "data" / "orthodont.csv")
R_FIXED = {"Intercept": (17.706712962962946, 0.8339224740383283), "age": (0.660185185185185, 0.0616059162953231),
           "Sex[Female]": (-2.321022727272724, 0.7614168487388825)}
R_VAR = {"intercept": 3.26678372462296, "residual": 2.04945601819663}
R_FIT = {"ll": -218.756253914003, "aic": 447.512507828005, "bic": 460.782309578793, "icc": 0.432167724955421}
R_LRT = {"chi2": 8.53305700539363, "aic": (451.389542099057, 444.856485093663), "bic": (462.118067007554, 458.267141229284)}
R_SLOPES = {"intercept": 5.4150875813665893, "age": 0.0512695453550223, "corr": -0.609, "residual": 1.7162040035045012, "se_age": 0.0712532638707265}


@pytest.fixture(scope="module")
def fitted():
    return mixed_model(DATA, "distance", ["age", "Sex"], "Subject", reference={"Sex": "Male"})


def test_fixed_effects_equal_nlme(fitted):
    model, *coefficients = fitted
    assert model.kind == "mixed_model" and model.n == 108 and model.details["groups"] == 27
    for r in coefficients:
        b, se = R_FIXED[r.details["term"]]
        assert r.estimate.value == pytest.approx(b, rel=1e-12) and r.estimate.se == pytest.approx(se, rel=1e-9)
        assert r.statistic.symbol == "z" and r.p == pytest.approx(2 * stats.norm.sf(abs(b / se)), rel=1e-3)
        assert any("z" in n.text and "containment" in n.text for n in r.notes)


def test_variances_fit_indices_and_icc_equal_nlme(fitted):
    model = fitted[0]
    assert model.details["variance_intercept"] == pytest.approx(R_VAR["intercept"], rel=2e-9)  # 6e-10 apart (statsmodels: 1.6e-5)
    assert model.details["variance_residual"] == pytest.approx(R_VAR["residual"], rel=1e-9)
    assert model.details["log_likelihood"] == pytest.approx(R_FIT["ll"], rel=1e-13)
    assert model.details["aic"] == pytest.approx(R_FIT["aic"], rel=1e-13) and model.details["bic"] == pytest.approx(R_FIT["bic"], rel=1e-13)
    assert model.effects[0].value == pytest.approx(R_FIT["icc"], rel=1e-6)  # R's null fit stops 5e-7 from its optimum
    assert any("profiled likelihood, maximised exactly" in n.text for n in model.notes)


def test_random_slopes_equal_nlme():
    model, _, age = mixed_model(DATA, "distance", ["age"], "Subject", random_slopes=["age"])
    assert model.details["variance_intercept"] == pytest.approx(R_SLOPES["intercept"], rel=1e-5)
    assert model.details["variance_age"] == pytest.approx(R_SLOPES["age"], rel=1e-5)
    assert model.details["correlation_intercept_age"] == pytest.approx(R_SLOPES["corr"], abs=5e-4)  # R prints 3 decimals
    assert model.details["variance_residual"] == pytest.approx(R_SLOPES["residual"], rel=1e-5)
    assert age.estimate.se == pytest.approx(R_SLOPES["se_age"], rel=1e-5)


def test_likelihood_ratio_test_equals_nlme_anova():
    (r,) = compare_models(DATA, "distance", ["age"], ["age", "Sex"], "Subject")
    assert r.statistic.value == pytest.approx(R_LRT["chi2"], rel=1e-11) and r.statistic.df == (1,)
    assert (r.details["aic_reduced"], r.details["aic_full"]) == pytest.approx(R_LRT["aic"], rel=1e-13)
    assert (r.details["bic_reduced"], r.details["bic_full"]) == pytest.approx(R_LRT["bic"], rel=1e-13)
    assert render(r, "sentence").plain().startswith("Adding Sex to the model of distance gave χ²(1) = 8.53, p = .003 (likelihood-ratio test")
    with pytest.raises(InputError, match="proper subset"):
        compare_models(DATA, "distance", ["age", "Sex"], ["age"], "Subject")


def test_sentences(fitted):
    text = render(fitted[0], "sentence").plain()
    assert "estimated by REML" in text and "ICC = .43" in text and "AIC = 447.51" in text
    sex = next(r for r in fitted if r.details.get("category"))
    assert render(sex, "sentence").plain().startswith("Distance was lower for Female than for Male")


# R 4.x, nlme (tests/r_reference.R): anova() of the ML fits distance ~ age + Sex and distance ~ age * Sex
R_INTERACTION = {"aic": 440.639058019510, "bic": 456.731845382255, "ll": -214.319529009755, "chi2": 6.21742707415297, "p": 0.0126}


def test_tables_of_a_mixed_model_and_of_nested_comparisons():
    from statsetter import table
    from statsetter.export.text_tables import table_text

    teeth = DATA.assign(age_girls=DATA["age"] * (DATA["Sex"] == "Female"))
    first = compare_models(teeth, "distance", ["age"], ["age", "Sex"], "Subject").main
    second = compare_models(teeth, "distance", ["age", "Sex"], ["age", "Sex", "age_girls"], "Subject", labels={"age_girls": "age × girl"}).main
    assert second.statistic.value == pytest.approx(R_INTERACTION["chi2"], rel=1e-11) and second.p == pytest.approx(R_INTERACTION["p"], abs=5e-5)
    lines = table_text(table([first, second], "apa7")).splitlines()
    rows = {line.split()[0] + line.split()[1]: line for line in lines if line.startswith("Model ")}
    # R's printed values, rounded to the table's two decimals: Model 1 and 2 from R_LRT, Model 3 from R_INTERACTION
    assert "451.39" in rows["Model1"] and "462.12" in rows["Model1"]
    assert all(v in rows["Model2"] for v in ("444.86", "458.27", f"{R_LRT['chi2']:.2f}", ".003"))
    assert all(v in rows["Model3"] for v in ("Age × girl", "−214.32", "440.64", "456.73", "6.22", ".013"))
    fitted_table = table_text(table(mixed_model(DATA, "distance", ["age", "Sex"], "Subject", reference={"Sex": "Male"}), "apa7"))
    b, se = R_FIXED["age"]
    age_row = next(line for line in fitted_table.splitlines() if line.strip().startswith("Age"))
    assert f"{b:.2f}" in age_row and f"{se:.2f}" in age_row
    assert f"{R_VAR['intercept']:.2f}" in next(line for line in fitted_table.splitlines() if "Intercept variance" in line)
    assert f"{R_FIT['icc']:.2f}".lstrip("0") in next(line for line in fitted_table.splitlines() if "ICC" in line)
    assert f"{R_FIT['aic']:.2f}" in next(line for line in fitted_table.splitlines() if line.strip().startswith("AIC"))


GROUPED = [  # open grouped data: (loader, outcome, predictors, group)
    (lambda: __import__("statsmodels.datasets.grunfeld", fromlist=["load_pandas"]).load_pandas().data, "invest", ["value", "capital"], "firm"),
    (lambda: __import__("pingouin").read_dataset("rm_corr"), "pH", ["PacO2"], "Subject"),
    (lambda: __import__("pingouin").read_dataset("penguins"), "body_mass_g", ["flipper_length_mm"], "island"),
    (lambda: __import__("pingouin").read_dataset("penguins"), "bill_depth_mm", ["body_mass_g"], "species"),
]


@pytest.mark.parametrize("method", ["REML", "ML"])
@pytest.mark.parametrize("load, outcome, predictors, group", GROUPED)
def test_random_intercept_is_the_maximum_of_statsmodels_likelihood(load, outcome, predictors, group, method):
    """statsmodels' MixedLM.loglike (the same likelihood, evaluated by another program) at statsetter's estimates equals
    statsetter's log-likelihood, and is at least statsmodels' own fitted maximum (its optimiser stops short of it: up to
    3e-6 on these data); statsetter's variances and coefficients lie within statsmodels' optimiser tolerance of its."""
    import warnings

    import numpy as np
    from statsmodels.regression.mixed_linear_model import MixedLM, MixedLMParams

    data = load()
    model, *coefficients = mixed_model(data, outcome, predictors, group, method=method)
    rows = data[[outcome, *predictors, group]].dropna()
    X = np.column_stack([np.ones(len(rows)), *[rows[x].to_numpy(float) for x in predictors]])
    y, groups = rows[outcome].to_numpy(float), rows[group].to_numpy()
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        theirs = MixedLM(y, X, groups=groups).fit(reml=method == "REML")
    theta = model.details["variance_intercept"] / model.details["variance_residual"]
    beta = np.array([r.estimate.value for r in coefficients])
    at_ours = theirs.model.loglike(MixedLMParams.from_components(fe_params=beta, cov_re=np.array([[theta]])), profile_fe=False)
    ll = model.details["log_likelihood"]
    assert at_ours == pytest.approx(ll, rel=1e-11)
    assert ll >= theirs.llf - 1e-9 * abs(ll)
    assert model.details["variance_intercept"] == pytest.approx(float(np.asarray(theirs.cov_re)[0, 0]), rel=5e-3)
    assert beta == pytest.approx(np.asarray(theirs.fe_params), rel=5e-5)


def test_a_group_variance_of_zero_is_said():
    """pingouin's unbalanced mixed design: the subjects' scores vary less between subjects than within (one-way ANOVA
    F = 0.77, pingouin), so the REML and ML estimates of the subject variance are 0 — the boundary, said in a note;
    the log-likelihood is then the ordinary regression's, which statsmodels' likelihood approaches as the ratio → 0."""
    import numpy as np
    import pingouin as pg
    from statsmodels.regression.mixed_linear_model import MixedLM, MixedLMParams

    data = pg.read_dataset("mixed_anova_unbalanced")
    assert float(pg.anova(data, dv="Scores", between="Subject")["F"].iloc[0]) < 1
    for method in ("REML", "ML"):
        model, intercept = mixed_model(data, "Scores", [], "Subject", method=method)
        assert model.details["variance_intercept"] == 0.0 and model.effects[0].value == 0.0
        assert any("estimated at 0, on the boundary" in n.text for n in model.notes)
        lm = MixedLM(data["Scores"].to_numpy(float), np.ones((len(data), 1)), groups=data["Subject"].to_numpy())
        lm.reml, lm.cov_pen, lm.fe_pen, lm._cov_sing = method == "REML", None, None, 0
        near = [lm.loglike(MixedLMParams.from_components(fe_params=np.array([intercept.estimate.value]), cov_re=np.array([[t]])), profile_fe=False)
                for t in (1e-3, 1e-6, 1e-9)]
        assert near[0] < near[1] < near[2] <= model.details["log_likelihood"] + 1e-9
        assert near[2] == pytest.approx(model.details["log_likelihood"], rel=1e-8)


def test_degenerate_random_intercept_designs_are_said():
    """Designs the likelihood cannot settle, on Orthodont's rows: one row per group (the two variances cannot be told
    apart: an error naming the group), an outcome the fixed effects fit exactly (an error), an outcome constant within
    each child (the residual variance all but 0: a fit warning); shifted by 1e6 (the same variances), scaled by 1e12
    and 1e-12 (the same ICC and coefficients scaled: the fit does not depend on units), and with the groups labelled
    by numbers and text in one column (the same fit)."""
    import numpy as np

    with pytest.raises(InputError, match="Subject: every group has one row"):
        mixed_model(DATA.assign(Subject=np.arange(len(DATA))), "distance", ["age"], "Subject")
    with pytest.raises(InputError, match="distance: the fixed effects fit the outcome exactly"):
        mixed_model(DATA.assign(distance=3 + 2 * DATA["age"]), "distance", ["age"], "Subject")
    child_mean = DATA.groupby("Subject")["distance"].transform("mean")
    model, *_ = mixed_model(DATA.assign(distance=child_mean), "distance", ["age"], "Subject")
    assert any("did not settle" in n.text for n in model.notes)
    base, _, age = mixed_model(DATA, "distance", ["age"], "Subject")
    # an outcome far from 0: the fit never forms y'y (whose large terms would cancel), so a shift of 1e6 moves the
    # variances by no more than rounding (the normal equations' q lost them to 5e-5 here)
    shifted, _, shifted_age = mixed_model(DATA.assign(distance=DATA["distance"] + 1e6), "distance", ["age"], "Subject")
    assert shifted.details["variance_intercept"] == pytest.approx(base.details["variance_intercept"], rel=1e-11)
    assert shifted.details["variance_residual"] == pytest.approx(base.details["variance_residual"], rel=1e-11)
    assert shifted_age.estimate.value == pytest.approx(age.estimate.value, rel=1e-9)
    mixed_labels = DATA.assign(Subject=[int(s[1:]) if s.startswith("M") else s for s in DATA["Subject"].astype(str)])  # 1, 2 … and "F01" …
    relabelled, *_ = mixed_model(mixed_labels, "distance", ["age"], "Subject")
    assert relabelled.details["groups"] == 27 and relabelled.details["variance_intercept"] == pytest.approx(base.details["variance_intercept"], rel=1e-12)
    for factor in (1e12, 1e-12):
        scaled, _, scaled_age = mixed_model(DATA.assign(distance=DATA["distance"] * factor), "distance", ["age"], "Subject")
        assert scaled.effects[0].value == pytest.approx(base.effects[0].value, rel=1e-9)
        assert scaled_age.estimate.value == pytest.approx(age.estimate.value * factor, rel=1e-9)
        # REML: the likelihood of n − p error contrasts, each scaled by the factor
        assert scaled.details["log_likelihood"] == pytest.approx(base.details["log_likelihood"] - (len(DATA) - 2) * np.log(factor), rel=1e-9)
