"""Coded research data: numeric codes, value labels, levels, identifiers and
user-missing codes, as SPSS and spreadsheet users hand them over.

Data (none invented here):
- HEART: the Cleveland heart-disease records of the UCI repository as pingouin
  bundles them (``pg.read_dataset("chi2_independence")``; Detrano et al.,
  1989). Written to an SPSS file with pyreadstat, with the value labels of
  the UCI data dictionary for chest-pain type and sex (re-based to the 0–3
  and 0/1 codes of this file; the wording of the labels is recalled from
  memory — the tests check that labels travel, not what they mean), the
  measurement levels an SPSS user would set, a variable label per column and
  a case number 1001–1303 as SPSS exports often carry.
- PENGUINS: the Palmer penguins as pingouin bundles them (Gorman, Williams &
  Fraser, 2014), whose 11 missing sexes are written as the user-missing code
  −99, declared as such in the .sav.
References: statsmodels' formula interface with ``C(x, Treatment(reference=…))``
for every model (df, F and each coefficient to 1e-8), pandas for counts.
"""

from __future__ import annotations

import math
from pathlib import Path
import re

import numpy as np
import pandas as pd
import pingouin as pg
import pyreadstat
import pytest
import statsmodels.formula.api as smf

from statsetter import render
from statsetter.errors import InputError
from statsetter.io import read_data
from statsetter.plan import PlanError, load_plan, run_plan

CP = {0: "typical angina", 1: "atypical angina", 2: "non-anginal pain", 3: "asymptomatic"}
SEX = {0: "female patients", 1: "male patients"}
TARGET = {0: "no heart disease", 1: "heart disease"}
SLOPE = {0: "upsloping", 1: "flat", 2: "downsloping"}  # slope of the peak exercise ST segment
TOL = 1e-8


@pytest.fixture(scope="module")
def heart() -> pd.DataFrame:
    return pg.read_dataset("chi2_independence")


@pytest.fixture(scope="module")
def folder(tmp_path_factory, heart):
    folder = tmp_path_factory.mktemp("coded")
    frame = heart.copy()
    frame.insert(0, "id", np.arange(1001, 1001 + len(frame)))
    pyreadstat.write_sav(
        frame, str(folder / "heart.sav"),
        column_labels={"id": "Patient number", "age": "Age (years)", "sex": "Sex", "cp": "Chest pain type",
                       "thalach": "Maximum heart rate (bpm)", "chol": "Serum cholesterol (mg/dl)", "target": "Diagnosis"},
        variable_value_labels={"cp": CP, "sex": SEX, "target": TARGET, "slope": SLOPE},
        variable_measure={"id": "nominal", "cp": "nominal", "sex": "nominal", "target": "nominal", "age": "scale", "slope": "ordinal",
                          "thalach": "scale", "chol": "scale"},
    )
    penguins = pg.read_dataset("penguins")
    coded = penguins.assign(sex=penguins.sex.map({"female": 1, "male": 2}).fillna(-99),
                            species=penguins.species.map({"Adelie": 1, "Chinstrap": 2, "Gentoo": 3}))
    coded = coded.drop(columns=["island"])
    pyreadstat.write_sav(
        coded, str(folder / "penguins.sav"),
        variable_value_labels={"sex": {1: "female penguins", 2: "male penguins", -99: "not recorded"},
                               "species": {1: "Adelie", 2: "Chinstrap", 3: "Gentoo"}},
        missing_ranges={"sex": [-99]},
        variable_measure={"sex": "nominal", "species": "nominal", "body_mass_g": "scale"},
    )
    return folder


def plan_run(folder, body: str):
    path = folder / "plan.toml"
    path.write_text(body, encoding="utf-8")
    return run_plan(load_plan(path))


def by_id(result, rid):
    return next(r for r in result.records if r.id == rid)


HEADER = '[data]\npath = "heart.sav"\n'


def test_a_nominal_predictor_from_the_file_is_dummy_coded(folder, heart):
    # reference: statsmodels' formula interface, C(cp, Treatment(reference=0)) (the first code)
    out = plan_run(folder, HEADER + '[[analyses]]\nid = "hr"\nkind = "linear_regression"\noutcome = "thalach"\npredictors = ["cp", "age"]\n')
    ref = smf.ols("thalach ~ C(cp, Treatment(reference=0)) + age", data=heart).fit()
    model = by_id(out, "hr")
    assert model.statistic.df == (4.0, 298.0)
    assert model.statistic.value == pytest.approx(ref.fvalue, rel=TOL)
    assert model.effect("R2").value == pytest.approx(ref.rsquared, rel=TOL)
    coefs = [r for r in out.records if r.kind == "linear_coefficient"]
    assert len(coefs) == 5 and coefs[0].details["intercept"]
    for code in (1, 2, 3):
        r = next(c for c in coefs if c.details["term"] == f"cp[{CP[code]}]")
        term = f"C(cp, Treatment(reference=0))[T.{code}]"
        assert r.estimate.value == pytest.approx(ref.params[term], rel=TOL)
        assert r.estimate.se == pytest.approx(ref.bse[term], rel=TOL)
        assert r.p == pytest.approx(ref.pvalues[term], rel=TOL)
    notes = " ".join(n.text for n in model.notes)
    assert "cp entered as 3 indicator terms" in notes and "reference category typical angina (the first in code order)" in notes
    text = " ".join(render(r, "sentence").plain() for r in out.records)
    # the SPSS variable label is the table label; prose drops the unit and lower-cases the first word
    assert "Maximum heart rate was higher for atypical angina than for typical angina (chest pain type)" in text
    assert "A linear regression of maximum heart rate on chest pain type and age" in text
    assert model.variable("outcome").heading == "Maximum heart rate (bpm)"
    atypical = next(c for c in coefs if c.details["term"] == "cp[atypical angina]")
    assert atypical.variable("predictor").heading == "Chest pain type = atypical angina"


@pytest.mark.parametrize("given", ['"asymptomatic"', "3"])
def test_the_reference_is_named_by_label_or_code(folder, heart, given):
    out = plan_run(folder, HEADER + f'[[analyses]]\nid = "hr"\nkind = "linear_regression"\noutcome = "thalach"\n'
                                    f'predictors = ["cp", "age"]\nreference = {{ cp = {given} }}\n')
    ref = smf.ols("thalach ~ C(cp, Treatment(reference=3)) + age", data=heart).fit()
    r = next(c for c in out.records if c.details.get("term") == "cp[typical angina]")
    assert r.estimate.value == pytest.approx(ref.params["C(cp, Treatment(reference=3))[T.0]"], rel=TOL)
    assert (r.details["category"], r.details["reference_category"]) == ("typical angina", "asymptomatic")


def test_groups_and_events_by_label_or_code_and_labels_in_sentences(folder, heart):
    out = plan_run(folder, HEADER + """
[[analyses]]
id = "chol_sex"
kind = "t_independent"
outcome = "chol"
group = "sex"
groups = ["male patients", 0]

[[analyses]]
id = "disease"
kind = "logistic_regression"
outcome = "target"
predictors = ["age", "sex"]
event = "heart disease"

[[analyses]]
id = "hr_cp"
kind = "anova_oneway"
outcome = "thalach"
group = "cp"

[[analyses]]
id = "pairs"
kind = "posthoc"
outcome = "thalach"
group = "cp"

[[analyses]]
id = "sex_cp"
kind = "chi_square"
row = "sex"
column = "cp"
""")
    t = by_id(out, "chol_sex")
    male, female = heart.chol[heart.sex == 1], heart.chol[heart.sex == 0]
    assert [g.label for g in t.groups] == ["male patients", "female patients"]
    assert (t.groups[0].n, t.groups[1].n) == (len(male), len(female))
    assert t.groups[0].mean == pytest.approx(male.mean(), rel=TOL)
    logit = smf.logit("target ~ age + C(sex)", data=heart).fit(disp=False)
    coef = next(r for r in out.records if r.details.get("term") == "sex[male patients]")
    assert coef.estimate.value == pytest.approx(logit.params["C(sex)[T.1]"], rel=1e-6)
    sentences = [render(r, "sentence").plain() for r in out.records]
    joined = " ".join(sentences)
    names = set(CP.values()) | set(SEX.values()) | set(TARGET.values())
    for r in out.records:  # every group is named by its value label, never by a code such as "1" or "2.0"
        for g in r.groups:
            assert all(part in names for part in g.label.split(" / ")), (r.id, g.label)
    assert not re.search(r"\b(?:in|than|between|and|for) -?\d+(?:\.0)? ", joined)
    assert "typical angina" in joined and "female patients" in joined
    assert "The odds of diagnosis (heart disease) were lower for male patients than for female patients (sex)" in joined
    assert "The difference in maximum heart rate between atypical angina and non-anginal pain was" in joined  # p = .271: no direction
    chi = by_id(out, "sex_cp")
    counts = pd.crosstab(heart.sex, heart.cp)
    assert next(g.n for g in chi.groups if g.label == "female patients / asymptomatic") == counts.loc[0, 3]


def test_an_unknown_category_lists_labels_and_codes(folder):
    with pytest.raises(PlanError, match=r"women.*female patients \(code 0\), male patients \(code 1\)"):
        plan_run(folder, HEADER + '[[analyses]]\nid = "t"\nkind = "t_independent"\noutcome = "chol"\ngroup = "sex"\ngroups = ["women", "men"]\n')


def test_the_case_number_is_left_out_of_table_1(folder):
    out = plan_run(folder, HEADER + '[[tables]]\nkind = "descriptives"\ngroup = "sex"\n')
    stubs = [row.stub.plain() for row in out.tables[0].rows]
    assert not any("Patient number" in s or s.startswith("id") for s in stubs)
    assert any("left out id" in n for n in out.notes)
    assert any("typical angina" in s for s in stubs)


def test_an_ordinal_predictor_enters_as_scores_and_says_so(folder, heart):
    # reference: statsmodels OLS with cp as a number (the linear trend the note describes)
    out = plan_run(folder, HEADER + '[[analyses]]\nid = "hr"\nkind = "linear_regression"\noutcome = "thalach"\n'
                                    'predictors = ["cp", "age"]\nlevels = { cp = "ordinal" }\n')
    ref = smf.ols("thalach ~ cp + age", data=heart).fit()
    model = by_id(out, "hr")
    assert model.statistic.df == (2.0, 300.0)
    assert model.statistic.value == pytest.approx(ref.fvalue, rel=TOL)
    assert any(n.kind == "choice" and "cp is ordinal" in n.text and 'nominal' in n.text for n in model.notes)
    assert any("cp is ordinal" in n for n in out.notes)  # in the run's summary too


def test_user_missing_codes_are_missing_in_every_analysis(folder):
    # reference: the penguins' 11 missing sexes (palmerpenguins documentation: 333 complete of 344)
    body = '[data]\npath = "penguins.sav"\n[[analyses]]\nid = "mass"\nkind = "t_independent"\noutcome = "body_mass_g"\ngroup = "sex"\n'
    out = plan_run(folder, body)
    t = by_id(out, "mass")
    assert [g.label for g in t.groups] == ["female penguins", "male penguins"]
    assert (t.groups[0].n, t.groups[1].n) == (165, 168)
    assert "not recorded" not in render(t, "sentence").plain()


def test_semicolon_csv_with_decimal_commas(tmp_path, heart):
    # what European spreadsheet programs export: ';' between fields, ',' as the decimal mark
    path = tmp_path / "heart.csv"
    heart.to_csv(path, sep=";", decimal=",", index=False)
    data = read_data(path)
    assert list(data.frame.columns) == list(heart.columns)
    assert np.allclose(data.frame.oldpeak, heart.oldpeak)
    assert any("semicolon" in n for n in data.notes) and any("decimal mark: comma" in n for n in data.notes)
    assert not pd.api.types.is_numeric_dtype(read_data(path, sep=";", decimal=".").frame.oldpeak)  # an override is obeyed
    tab = tmp_path / "heart.txt"
    heart.to_csv(tab, sep="\t", index=False)
    assert list(read_data(tab).frame.columns) == list(heart.columns)


def test_duplicate_headers_and_infinite_values(tmp_path):
    path = tmp_path / "d.csv"
    path.write_text("age,age,score\n1,2,3\n", encoding="utf-8")
    with pytest.raises(InputError, match="'age' appears twice"):
        read_data(path)
    path.write_text("g,y\n" + "".join(f"{'ab'[i % 2]},{'inf' if i == 3 else i}\n" for i in range(30)), encoding="utf-8")
    data = read_data(path)
    assert data.frame.y.isna().sum() == 1 and any("y: 1 infinite value(s) treated as missing (first in row 4)" in n for n in data.notes)
    assert math.isfinite(data.frame.y.max())


def test_adapters_keep_the_names_a_fit_carries(heart):
    # statsmodels' formula interface names its outcome (endog_names) and terms (exog_names);
    # a categorical term C(x)[T.b] is level b of x against the reference the formula states
    from statsetter.adapters import to_records

    fit = smf.ols("thalach ~ C(cp, Treatment(reference=3)) + age", data=heart).fit()
    records = to_records(fit, labels={"thalach": "maximum heart rate", "cp": "chest pain type"})
    text = " ".join(render(r, "sentence").plain() for r in records)
    assert "A linear regression of maximum heart rate on chest pain type and age" in text
    assert "Maximum heart rate was lower for 0 than for 3 (chest pain type)" in text
    assert "the predictor" not in text and "the outcome" not in text
    logit = smf.logit("target ~ age + C(sex)", data=heart).fit(disp=False)
    sex = next(r for r in to_records(logit) if r.details.get("term") == "sex[1]")
    assert (sex.details["category"], sex.details["reference_category"]) == ("1", "0")  # the level no column names


def test_scipy_objects_take_names_without_samples(heart):
    # scipy's results carry no names: labels= by role name the variables, and without them a warning asks
    from scipy import stats

    from statsetter.adapters import to_records

    res = stats.pearsonr(heart.chol, heart.thalach)
    r = to_records(res, labels={"x": "serum cholesterol", "y": "maximum heart rate"})[0]
    assert render(r, "sentence").plain().startswith("The correlation between serum cholesterol and maximum heart rate")
    with pytest.warns(UserWarning, match=r"labels=\{'x': '...', 'y': '...'\}"):
        to_records(res)


@pytest.mark.parametrize("share, scored, note", [
    (None, 9, "scored from complete items only; 3 of 12 rows have no score"),
    (0.9, 11, "at least 90% of the 11 items are present (prorated from the items present); 2 of 12 rows prorated, 1 have no score"),
    (0.8, 12, "3 of 12 rows prorated, 0 have no score"),
])
def test_scale_scores_follow_the_missing_item_rule(tmp_path, share, scored, note):
    # data: pingouin's cronbach_wide_missing (real-statistics.com example): 12 people, 11 binary items, 4 values missing;
    # reference: pandas' row means over the present items (the prorated mean), and their count
    data = pg.read_dataset("cronbach_wide_missing")
    data.to_csv(tmp_path / "items.csv", index=False)
    items = [f"Q{i}" for i in range(1, 12)]
    rule = f"min_share = {share}\n" if share else ""
    (tmp_path / "plan.toml").write_text(
        '[data]\npath = "items.csv"\n[[scales]]\nname = "total"\nscoring = "sum"\nitems = ' + repr(items).replace("'", '"') + "\n" + rule, encoding="utf-8")
    from statsetter.analyses import scale_score

    out = run_plan(load_plan(tmp_path / "plan.toml"))
    assert any(note in n for n in out.notes), out.notes
    score = scale_score(data, items, scoring="sum", min_share=share)
    assert score.notna().sum() == scored
    present = data[items].notna().sum(axis=1)
    keep = present >= (share or 1) * 11 - 1e-9
    assert np.allclose(score[keep], data[items].mean(axis=1)[keep] * 11)


def test_a_labelled_ordinal_variable_is_summarised_by_its_categories(folder, heart):
    # reference: numpy's median and type-7 quartiles of the codes (all fall on whole codes here), named by their labels
    out = plan_run(folder, HEADER + '[[tables]]\nkind = "descriptives"\nvariables = ["slope"]\n')
    row = out.tables[0].rows[0]
    q1, median, q3 = np.percentile(heart.slope, [25, 50, 75])
    assert row.stub.plain().startswith("Slope, Mdn (IQR)")
    assert row.cells[0].plain() == f"{SLOPE[int(median)]} ({SLOPE[int(q1)]}–{SLOPE[int(q3)]})"


def test_a_rank_test_names_the_category_of_a_coded_median(folder, heart):
    # read as a supervisor would: Table 1 named the slope's median "flat", the Mann–Whitney sentence said "Mdn = 1" — a
    # bare code. Now a median that is a code is followed by its label, in the same place as the number; numpy's median of
    # the codes in each diagnosis group is the reference
    out = plan_run(folder, HEADER + '[[analyses]]\nid = "slope_dx"\nkind = "mann_whitney"\noutcome = "slope"\ngroup = "target"\n')
    said = render(by_id(out, "slope_dx"), "sentence", "apa7").plain()
    for code, name in TARGET.items():
        median = np.median(heart.slope[heart.target == code])
        assert median.is_integer() and f"{name} (Mdn = {int(median)} [{SLOPE[int(median)]}]" in said, said
    ama = render(by_id(out, "slope_dx"), "sentence", "ama11").plain()
    assert f"(median, {int(np.median(heart.slope[heart.target == 0]))} [" in ama, ama


def test_small_expected_counts_are_stated(heart):
    # UCI heart data: only 4 patients have resting ECG code 2, so a table of sex by that code has small expected counts;
    # reference: scipy.stats.contingency.expected_freq on pandas' crosstab
    from scipy.stats.contingency import expected_freq

    from statsetter.analyses import chi_square

    frame = heart.assign(ecg2=np.where(heart.restecg == 2, "ECG code 2", "other ECG codes"))
    records = chi_square(frame, "sex", "ecg2")
    expected = expected_freq(pd.crosstab(frame.sex, frame.ecg2).to_numpy())
    note = next(n.text for n in records[0].notes if n.kind == "assumption")
    small = int((expected < 5).sum())
    assert f"{small} of 4 cells have expected counts below 5 (smallest {expected.min():.4g})" in note
    assert "Fisher's exact test is reported as well" in note and records[1].kind == "fisher_exact"


def test_pingouin_frames_keep_their_names():
    # pingouin's linear_regression names its terms ('names'), anova its factor ('Source'); the outcome, which neither
    # frame records, comes from labels=. Data: pingouin's Big Five sample (Dolan et al., 2009) and the penguins.
    from statsetter.adapters import to_records

    d = pg.read_dataset("pairwise_corr")
    records = to_records(pg.linear_regression(d[["Extraversion", "Openness"]], d["Neuroticism"]),
                         labels={"outcome": "neuroticism", "Openness": "openness", "Extraversion": "extraversion"})
    text = " ".join(render(r, "sentence").plain() for r in records)
    assert "A linear regression of neuroticism on extraversion and openness" in text
    assert "Higher values of openness were associated with higher values of neuroticism" in text
    anova = to_records(pg.anova(data=pg.read_dataset("penguins"), dv="body_mass_g", between="species"), labels={"outcome": "body mass"})
    assert render(anova[0], "sentence").plain().startswith("A one-way analysis of variance of body mass across species")


def test_scipy_objects_take_group_names_without_samples():
    # scipy's ttest_ind and mannwhitneyu carry no names; groups= names the two groups in the order they were passed
    # (the sign of t is first minus second: scipy's documentation). Data: the penguins as pingouin bundles them.
    from scipy import stats

    from statsetter.adapters import to_records

    p = pg.read_dataset("penguins").dropna(subset=["sex", "body_mass_g"])
    female, male = p.body_mass_g[p.sex == "female"], p.body_mass_g[p.sex == "male"]
    names = {"groups": ["female penguins", "male penguins"], "labels": {"outcome": "body mass"}}
    t = to_records(stats.ttest_ind(female, male, equal_var=False), "ttest_ind", **names)[0]
    assert render(t, "sentence").plain().startswith("Body mass was lower in female penguins than in male penguins; the mean difference was")
    u = to_records(stats.mannwhitneyu(female, male), **names)[0]
    assert render(u, "sentence").plain().startswith("Body mass was compared between female penguins and male penguins, Mann–Whitney")


def test_table_labels_through_the_api(heart):
    # a variable has a prose label (labels=) and a table label (table_labels=), in every analysis of the API and
    # in the record's JSON; statsmodels' formula interface is the reference for the numbers
    from statsetter.analyses import anova_oneway, linear_regression
    from statsetter.records import Result

    frame = heart.assign(cp=heart.cp.map(CP))
    prose, tables = {"thalach": "maximum heart rate", "cp": "chest pain type"}, {"thalach": "Maximum heart rate (bpm)", "cp": "Chest pain type"}
    model, *coefs = linear_regression(frame, "thalach", ["cp", "age"], labels=prose, table_labels=tables)
    ref = smf.ols("thalach ~ C(cp, Treatment(reference='typical angina')) + age", data=frame).fit()
    assert model.statistic.value == pytest.approx(ref.fvalue, rel=TOL)
    assert (model.variable("outcome").display, model.variable("outcome").heading) == ("maximum heart rate", "Maximum heart rate (bpm)")
    atypical = next(c for c in coefs if c.details["term"] == "cp[atypical angina]")
    assert atypical.variable("predictor").heading == "Chest pain type = atypical angina"
    again = Result.from_json(atypical.to_json())
    assert again.variable("predictor").table_label == "Chest pain type = atypical angina"
    one_way = anova_oneway(frame, "thalach", "cp", labels=prose, table_labels=tables).main
    assert one_way.variable("group").heading == "Chest pain type"


@pytest.mark.parametrize("storage, one_by_one", [("python", True), ("python", False), ("pyarrow", False)])
def test_text_values_with_spaces_around_them_are_one_category(tmp_path, monkeypatch, storage, one_by_one):
    """Data entered by hand often carry stray spaces (" male", "male "): the Palmer penguins' sex, padded in a third of
    the rows and blank (spaces only) in two, is read as the same two categories with the spaces trimmed, the blank ones
    missing, and a note saying so (before: "male", " male" and "male " were three categories of a Table 1 and three
    groups to a t test). Reference: pandas' counts of the unpadded column. The same whether the text is kept in
    Python strings (a small file's) or Arrow's (a large one's), and whether the spaced values are looked for one by
    one (a short column) or by pandas' string methods."""
    from statsetter import io as sio
    from statsetter.analyses import describe, t_independent

    monkeypatch.setattr(sio, "_SMALL_FILE", 1 << 30 if storage == "python" else -1)
    monkeypatch.setattr(sio, "_LOOKED_AT_ONE_BY_ONE", 10**9 if one_by_one else -1)

    penguins = pg.read_dataset("penguins")  # 11 sexes missing: left missing, and not counted as trimmed
    padded = penguins.assign(sex=[v if v != v else f" {v}" if i % 3 == 0 else f"{v}  " if i % 3 == 1 else v for i, v in enumerate(penguins.sex)])
    padded.loc[[5, 9], "sex"] = "   "
    padded.to_csv(tmp_path / "padded.csv", index=False)
    data = read_data(tmp_path / "padded.csv")
    assert data.frame.sex.dtype.storage == storage
    expected = penguins.sex.drop(index=[5, 9]).value_counts()
    assert data.frame.sex.value_counts().to_dict() == expected.to_dict()
    assert data.frame.sex.isna().sum() == 2 + 11
    note = next(n for n in data.notes if n.startswith("sex:"))
    spaced = sum(1 for v in padded.sex if v == v and v != v.strip() and v.strip())
    assert spaced == 219 and f"{spaced} text value(s) with spaces around them trimmed (first {padded.sex[0]!r} in row 1)" in note
    assert "2 value(s) of spaces only treated as missing (first in row 6)" in note
    table = describe(data.frame, ["sex"]).main
    assert list(table.variables[0].categories) == ["female", "male"]
    test = t_independent(data.frame, "body_mass_g", "sex").main
    assert test.n == penguins.dropna(subset=["sex", "body_mass_g"]).shape[0] - 2


def test_a_stata_file_whose_columns_are_all_missing_says_so_for_every_type(capsys):
    # a real Stata file from statsmodels' own test data (iolib/tests/results/data_missing.dta: one row, Stata's
    # missing value in a float, double, byte, int and long column): the byte/int/long columns are read as objects
    # holding None, and had been "nominal (0 distinct values, not numeric (object))" beside the floats' warning
    import statsmodels

    from statsetter.cli import main

    path = Path(statsmodels.__file__).parent / "iolib" / "tests" / "results" / "data_missing.dta"
    assert main(["describe", str(path)]) == 0
    said = capsys.readouterr().err
    for name in ("float_miss", "double_miss", "byte_miss", "int_miss", "long_miss"):
        assert f"warning: {name}: nominal (inferred from the values: every value is missing; a weak guess" in said, said


def test_a_table_of_labelled_categories_wraps_them_in_word_and_latex(tmp_path):
    # read on the ANES 1996 pilot (statsmodels' anes96; the value labels are those of its dataset notes): Table 1's
    # ordinal rows print the categories at the quartiles, "Weak Democrat (Strong Democrat–Independent-Democrat)". Word
    # had turned the table to a landscape page for their unwrapped width, and LaTeX had set them in columns that do not
    # wrap, the whole table scaled down to a small type on a landscape page. Now a column of words wraps between them
    # as the stub does: in portrait, at full size, in both (pdflatex: no overfull line, no scaling)
    import subprocess
    import warnings

    import statsmodels.api as sm
    from test_docx import _pdf_pages
    from test_table_goldens import _require_pdflatex

    from statsetter import StyledText, load_style, table
    from statsetter.analyses import describe
    from statsetter.coding import factor
    from statsetter.export.docx_writer import results_document, save_document
    from statsetter.export.text_tables import table_latex
    from statsetter.styled import LATEX_PREAMBLE

    d = sm.datasets.anes96.load_pandas().data
    party = {0: "Strong Democrat", 1: "Weak Democrat", 2: "Independent-Democrat", 3: "Independent-Independent",
             4: "Independent-Republican", 5: "Weak Republican", 6: "Strong Republican"}
    d = d.assign(PID=factor(d.PID, party, ordered=True), vote=d.vote.map({0: "Clinton", 1: "Dole"}))
    t = table(describe(d, ["age", "PID"], group="vote", levels={"PID": "ordinal"}, labels={"PID": "party identification"}).main, "apa7")
    assert any("Strong Democrat" in c.plain() for row in t.rows for c in row.cells)
    with warnings.catch_warnings():
        warnings.simplefilter("error")  # no "set on landscape pages" warning from either writer
        document = results_document([StyledText("Text.")], "apa7", title="Results", tables=[t])
        tex = table_latex(t, load_style("apa7"))
    assert [landscape for landscape, _ in _pdf_pages(save_document(document, tmp_path / "party.docx"))] == [False]
    assert "sidewaystable" not in tex and "resizebox" not in tex and "\\hsize=" in tex  # the category columns share the line
    _require_pdflatex()
    (tmp_path / "party.tex").write_text("\\documentclass{article}\n" + LATEX_PREAMBLE + "\\begin{document}\n" + tex + "\\end{document}\n")
    subprocess.run(["pdflatex", "-interaction=nonstopmode", "party.tex"], cwd=tmp_path, capture_output=True, timeout=120)
    log = (tmp_path / "party.log").read_text(errors="replace")
    assert (tmp_path / "party.pdf").exists() and "Overfull" not in log


def test_groups_labelled_by_answers_or_bare_codes_are_named_with_their_variable(tmp_path):
    # read aloud on Fair's (1978) affairs survey as statsmodels ships it (sm.datasets.fair): age by whether any time
    # was spent in affairs, coded 0/1 as such data come, once with the value labels "no"/"yes" (as .sav files carry
    # them) and once without. The sentence had read "Age was lower in no (M = 28.39, …) than in yes" — and "in 0 …
    # than in 1" with bare codes; such a group is now named with its variable, as Table 1's spanner names it ("any
    # affair: no"), and the run's notes say so and how to name the groups. Labels that name groups stay as they are.
    # Means: pandas on the same columns.
    import statsmodels.api as sm

    from statsetter.analyses import t_independent

    d = sm.datasets.fair.load_pandas().data
    d = d.assign(any_affair=(d.affairs > 0).astype(int))
    no, yes = d.age[d.any_affair == 0].mean(), d.age[d.any_affair == 1].mean()
    said = render(t_independent(d, "age", "any_affair", labels={"any_affair": "any affair"}).main, "sentence", "apa7").plain()
    assert re.search(rf"lower in any affair: 0 \(M = {no:.2f}, .*\) than in any affair: 1 \(M = {yes:.2f}, ", said), said
    d.to_csv(tmp_path / "fair.csv", index=False)
    out = plan_run(tmp_path, '[data]\npath = "fair.csv"\nlabels = { any_affair = "any affair" }\n'
                   'value_labels = { any_affair = { 0 = "no", 1 = "yes" }, religious = { 1 = "not religious", 2 = "mildly religious", '
                   '3 = "fairly religious", 4 = "strongly religious" } }\n'
                   '[[analyses]]\nid = "age_affair"\nkind = "t_independent"\noutcome = "age"\ngroup = "any_affair"\n'
                   '[[analyses]]\nid = "age_religious"\nkind = "anova_oneway"\noutcome = "age"\ngroup = "religious"\n')
    said = " ".join(render(r, "sentence", "apa7").plain() for r in out.records)
    assert re.search(rf"lower in any affair: no \(M = {no:.2f}, .*\) than in any affair: yes \(M = {yes:.2f}, ", said), said
    assert "Group means were not religious (M = " in said  # labels that name their groups are left alone
    assert [n for n in out.notes if "name no group" in n] == [
        "age_affair: the groups of any affair are labelled 'no', 'yes', which name no group in a sentence; the sentences write "
        "'any affair: no'. Value labels that name the groups (data.value_labels) read better"]


def test_a_small_files_text_kept_in_python_strings_gives_the_records_arrows_give(tmp_path, monkeypatch):
    """A data file up to 2 MiB and 5,000 rows keeps its text columns in Python strings (pandas' Arrow strings cost a run
    about 20 ms of start-up for a few hundred rows), a larger or longer one in Arrow's: the Palmer penguins (pingouin's copy; species,
    island and sex are text, 11 sexes missing) give the same records either way — a χ² test, a Welch ANOVA, a t test,
    a Kruskal–Wallis test and a Table 1 by species with its tests."""
    from statsetter import io as sio
    from statsetter.analyses import anova_oneway, chi_square, describe, kruskal_wallis, t_independent
    from statsetter.records import dump_records

    pg.read_dataset("penguins").to_csv(tmp_path / "penguins.csv", index=False)
    assert (tmp_path / "penguins.csv").stat().st_size < sio._SMALL_FILE  # (a small file: read in Python strings by default)
    out = {}
    for storage, limit in (("python", sio._SMALL_FILE), ("pyarrow", -1)):
        monkeypatch.setattr(sio, "_SMALL_FILE", limit)
        frame = read_data(tmp_path / "penguins.csv").frame
        assert {frame[c].dtype.storage for c in ("species", "island", "sex")} == {storage}
        records = [*chi_square(frame, "island", "species"), anova_oneway(frame, "body_mass_g", "species", variant="welch").main,
                   t_independent(frame, "flipper_length_mm", "sex").main, kruskal_wallis(frame, "bill_depth_mm", "island").main,
                   *describe(frame, ["island", "sex", "body_mass_g"], group="species", compare=True)]
        out[storage] = dump_records(records)
    assert out["python"] == out["pyarrow"]
    with pd.option_context("mode.string_storage", "python"):  # as `statsetter run` computes: a large file's text stays Arrow's
        assert read_data(tmp_path / "penguins.csv").frame.species.dtype.storage == "pyarrow"
    monkeypatch.setattr(sio, "_SMALL_FILE", 1 << 30)
    monkeypatch.setattr(sio, "_SHORT", 100)  # a small file of more rows than this: moved to Arrow's strings after reading
    long = read_data(tmp_path / "penguins.csv").frame
    assert {long[c].dtype.storage for c in ("species", "island", "sex")} == {"pyarrow"}
    monkeypatch.setattr(sio, "_SHORT", 10_000)
    short = read_data(tmp_path / "penguins.csv").frame
    assert short.sex.dtype.storage == "python" and long.astype(object).equals(short.astype(object)) and long.sex.isna().sum() == 11


def test_pythons_strip_and_arrows_trim_take_off_the_same_characters():
    """A short text column is searched for spaced values with Python's str.strip (io._trimmed) before pandas' string
    methods, which on Arrow strings call Arrow's utf8_trim_whitespace: the search stands for the trim only if both
    take off the same characters — over every Unicode code point (surrogates aside)."""
    pa = pytest.importorskip("pyarrow")
    import pyarrow.compute as pc

    points = [c for c in range(0x110000) if not 0xD800 <= c <= 0xDFFF]
    trimmed = pc.utf8_trim_whitespace(pa.array([chr(c) + "a" for c in points])).to_pylist()
    arrow = {c for c, t in zip(points, trimmed) if t == "a"}
    python = {c for c in points if (chr(c) + "a").strip() == "a"}
    assert arrow == python and 0x3000 in python and 0x200B not in python  # (the ideographic space trims; a zero-width one does not)
