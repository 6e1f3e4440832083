"""Adapters for the repeated-measures, mixed and multilevel designs: statsmodels' AnovaRM, MixedLM fits and the
mcnemar/cochrans_q bunches; pingouin's rm_anova (two within factors) and mixed_anova. Each is read as the library
printed it and, given the data, merged with statsetter's own analysis, which must reproduce the library's statistic.
Data nobody here wrote: pingouin's rm_anova_wide, rm_anova2, mixed_anova, chi2_mcnemar and cochran; R's nlme::Orthodont
(tests/data/orthodont.csv, written by R)."""

from __future__ import annotations

import warnings
from pathlib import Path

import pandas as pd
import pingouin as pg
import pytest

from statsetter import InputError, render
from statsetter.adapters import to_records
from statsetter.analyses import cochran_q, mcnemar, mixed_model, rm_anova

ORTHODONT = pd.read_csv(Path(__file__).parent / "data" / "orthodont.csv")


@pytest.fixture(autouse=True)
def quiet():
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        yield


def test_statsmodels_anova_rm_one_and_two_within_factors():
    from statsmodels.stats.anova import AnovaRM

    wide = pg.read_dataset("rm_anova_wide").dropna().reset_index(names="id")
    long = wide.melt(id_vars="id", var_name="time", value_name="score")
    res = AnovaRM(long, "score", "id", within=["time"]).fit()
    (read,) = to_records(res)
    ours = rm_anova(long, outcome="score", subject="id", within="time", correction="none")
    assert read.kind == "anova_rm" and read.statistic.df == ours.statistic.df
    assert read.statistic.value == pytest.approx(ours.statistic.value, rel=1e-10) and read.p == pytest.approx(ours.p, rel=1e-9)
    assert any("no sphericity test" in n.text for n in read.notes)
    (merged,) = to_records(res, data=long, columns={"outcome": "score", "subject": "id", "within": "time"})
    assert merged.n == ours.n and {e.name for e in merged.effects} >= {"eta2_g", "eta2_p"}
    d2 = pg.read_dataset("rm_anova2")
    two = AnovaRM(d2, "Performance", "Subject", within=["Time", "Metric"]).fit()
    terms = to_records(two, data=d2, columns={"outcome": "Performance", "subject": "Subject", "within": ["Time", "Metric"]})
    assert [t.details["term"] for t in terms] == ["Time", "Metric", "Time × Metric"]
    for t, o in zip(terms, rm_anova(d2, outcome="Performance", subject="Subject", within=["Time", "Metric"], correction="none")):
        assert t.statistic.value == pytest.approx(o.statistic.value, rel=1e-9) and t.statistic.df == o.statistic.df
    with pytest.raises(InputError, match="reproduce|do not have|yield"):
        to_records(two, data=d2.assign(Performance=d2["Performance"].sample(frac=1, random_state=1).to_numpy()),
                   columns={"outcome": "Performance", "subject": "Subject", "within": ["Time", "Metric"]})


def test_statsmodels_mixedlm_equals_the_analysis():
    import statsmodels.formula.api as smf

    fit = smf.mixedlm("distance ~ age + Sex", ORTHODONT, groups=ORTHODONT["Subject"]).fit(reml=True)
    model, *coefficients = to_records(fit)
    ours = mixed_model(ORTHODONT, "distance", ["age", "Sex"], "Subject", reference={"Sex": "Female"})
    assert model.kind == "mixed_model" and model.details["method"] == "REML" and model.details["groups"] == 27 and model.n == 108
    for key in ("log_likelihood", "aic", "bic", "variance_intercept", "variance_residual"):  # statsmodels' optimiser stops
        assert model.details[key] == pytest.approx(ours[0].details[key], rel=1e-4)  # 1.6e-5 short of the exact maximum
    by_term = {o.details["term"]: o for o in ours[1:]}
    assert sorted(c.details["term"] for c in coefficients) == sorted(by_term) == ["Intercept", "Sex[Male]", "age"]
    for c in coefficients:
        o = by_term[c.details["term"]]
        assert c.estimate.value == pytest.approx(o.estimate.value, rel=1e-6) and c.statistic.symbol == "z"
        assert c.estimate.se == pytest.approx(o.estimate.se, rel=1e-5) and c.p == pytest.approx(o.p, rel=1e-4)
    assert any("ICC" in n.text for n in model.notes)
    merged = to_records(fit, data=ORTHODONT, columns={"outcome": "distance", "predictors": ["age", "Sex"], "group": "Subject",
                                                      "reference": {"Sex": "Female"}})
    assert merged[0].effects[0].name == "ICC" and merged[0].effects[0].value == pytest.approx(ours[0].effects[0].value, rel=1e-9)
    assert "z = " in render(merged[2], "stats").plain()
    with pytest.raises(InputError, match="do not reproduce"):  # other data: the coefficients move far beyond the optimisers' 1e-5
        to_records(fit, data=ORTHODONT.assign(distance=ORTHODONT["distance"] * 1.01), columns={"outcome": "distance", "predictors": ["age", "Sex"],
                                                                                          "group": "Subject", "reference": {"Sex": "Female"}})


def test_statsmodels_bunches_need_their_source():
    from statsmodels.stats.contingency_tables import cochrans_q as sm_cochran, mcnemar as sm_mcnemar

    pairs = pg.read_dataset("chi2_mcnemar")
    table = pd.crosstab(pairs["treatment_X"], pairs["treatment_Y"])
    bunch = sm_mcnemar(table.to_numpy(), exact=False, correction=True)
    with pytest.raises(InputError, match="source="):
        to_records(bunch)
    with pytest.raises(InputError, match="variant="):
        to_records(bunch, source="statsmodels.mcnemar")
    (read,) = to_records(bunch, source="statsmodels.mcnemar", variant="corrected")
    ours = mcnemar(pairs, "treatment_X", "treatment_Y", variant="corrected")
    assert read.statistic.value == pytest.approx(ours.statistic.value, rel=1e-12) and read.p == pytest.approx(ours.p, rel=1e-12)
    (merged,) = to_records(bunch, source="statsmodels.mcnemar", variant="corrected", data=pairs,
                           columns={"first": "treatment_X", "second": "treatment_Y"})
    assert merged.n == ours.n and merged.effects and merged.effects[0].name == "OR"
    exact = sm_mcnemar(table.to_numpy(), exact=True)
    (e,) = to_records(exact, source="statsmodels.mcnemar", variant="exact")
    assert e.statistic is None and e.p == pytest.approx(mcnemar(pairs, "treatment_X", "treatment_Y", variant="exact").p, rel=1e-12)
    long = pg.read_dataset("cochran")
    wide = long.pivot(index="Subject", columns="Time", values="Energetic")
    (q,) = to_records(sm_cochran(wide.to_numpy()), source="statsmodels.cochrans_q", data=wide, columns={"columns": list(wide.columns)})
    assert q.statistic.value == pytest.approx(cochran_q(wide, list(wide.columns)).statistic.value, rel=1e-12) and q.n == len(wide)


def test_pingouin_two_within_factors_and_mixed_anova():
    d2 = pg.read_dataset("rm_anova2")
    table = pg.rm_anova(d2, dv="Performance", within=["Time", "Metric"], subject="Subject")
    read = to_records(table)
    assert [r.details["term"] for r in read] == ["Time", "Metric", "Time × Metric"]
    assert read[2].details["correction"] == "Greenhouse–Geisser correction" and read[2].statistic.df[0] == pytest.approx(2 * 0.727166, rel=1e-5)
    merged = to_records(table, data=d2, columns={"outcome": "Performance", "subject": "Subject", "within": ["Time", "Metric"]})
    for r, o in zip(merged, rm_anova(d2, outcome="Performance", subject="Subject", within=["Time", "Metric"], correction="gg")):
        assert r.p == pytest.approx(o.p, rel=1e-4) and r.n == 10
        assert next(e for e in r.effects if e.name == "eta2_g").value == pytest.approx(o.details["eta2_g"], rel=1e-6)
    d = pg.read_dataset("mixed_anova")
    mixed = pg.mixed_anova(d, dv="Scores", within="Time", subject="Subject", between="Group", correction=True)
    group, time, inter = to_records(mixed, data=d, columns={"outcome": "Scores", "subject": "Subject", "within": "Time", "between": "Group"})
    assert [r.details["term"] for r in (group, time, inter)] == ["Group", "Time", "Group × Time"]
    assert time.details["correction"] == "Greenhouse–Geisser correction" and group.statistic.df == (1, 58) and group.n == 60
    assert render(inter, "sentence").plain().startswith("The Group × Time interaction on Scores gave F(2.00, 115.78) = 2.73, p = .070")
