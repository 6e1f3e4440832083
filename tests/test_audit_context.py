"""The df and p a statistic's context gives: table rows (a p in a later cell,
columns named t, df, p, Sig., df(num)/df(den), the error row of an ANOVA
table, group sizes in the header), the paragraph's N, a one-tailed test
said in the sentence, "F < 1", and line breaks inside a statistic. The
expected p values are scipy's (computed here), never typed in."""

from __future__ import annotations

import itertools
import math
import re

import docx
import numpy as np
import pandas as pd
from scipy import stats

from statsetter.audit.reading import Unit
from statsetter.audit.report import audit_file, audit_units

P_CODES = {"p-does-not-follow", "verdict-changes", "one-sided"}


def _p_findings(e):
    return P_CODES & set(e.codes)


def _doc(path, paragraphs=(), tables=(), note="Note. Invented for this test."):
    d = docx.Document()
    for text in paragraphs:
        d.add_paragraph(text)
    for caption, rows in tables:
        d.add_paragraph(caption)
        t = d.add_table(rows=len(rows), cols=max(len(r) for r in rows))
        for i, row in enumerate(rows):
            for j, cell in enumerate(row):
                t.cell(i, j).text = cell
        d.add_paragraph(note)
    d.save(str(path))
    return path


def _p2(t, df):
    return 2 * stats.t.sf(abs(t), df)


def test_a_t_column_with_group_sizes_in_the_header(tmp_path):
    good = f"{_p2(2.10, 58):.3f}"
    rows = [("Measure", "Treatment (n = 30)", "Control (n = 30)", "t", "P value"),
            ("Anxiety", "10.1 ± 2.0", "11.2 ± 2.1", "2.10", good),
            ("Sleep", "6.1 ± 1.0", "6.0 ± 1.2", "2.10", "0.300")]
    entries = audit_file(_doc(tmp_path / "a.docx", tables=[("Table 1 Outcomes", rows)]))
    first, second = [e for e in entries if e.found.startswith("t")]
    assert first.findings == () and "45" not in first.checked and "30 + 30 − 2 = 58" in first.checked
    assert "p-does-not-follow" in second.codes
    assert "no reading of the df fits" in second.message and "58" in second.message


def test_a_df_column_and_sig_column(tmp_path):
    rows = [("Station", "t", "df", "Sig."), ("One", "1.20", "20", f"{_p2(1.20, 20):.3f}"), ("Two", "2.50", "20", "0.500")]
    entries = [e for e in audit_file(_doc(tmp_path / "b.docx", tables=[("Table 2", rows)])) if e.found.startswith("t")]
    assert [e.codes for e in entries] == [[], ["p-does-not-follow", "verdict-changes"]]
    assert entries[0].found.startswith("t(20) = 1.20")


def test_an_anova_table_takes_the_error_rows_df(tmp_path):
    p = stats.f.sf(4.20, 2, 57)
    rows = [("Source", "SS", "df", "MS", "F", "p"), ("Group", "84.0", "2", "42.0", "4.20", f"{p:.3f}"),
            ("Residuals", "570.0", "57", "10.0", "", "")]
    (e,) = [e for e in audit_file(_doc(tmp_path / "c.docx", tables=[("Table 3", rows)])) if e.found.startswith("F")]
    assert e.found.startswith("F(2, 57) = 4.20") and e.findings == ()
    assert "error row" in e.notes[0]


def test_a_mixed_anova_table_takes_each_effects_own_error_row(tmp_path):
    """A mixed design's table has an error row per stratum, after its effects ("Error (between subjects)", "Error
    (within subjects)", SPSS's "Error(Time)"): each F takes the df of the first error row below it (the table had
    read none of them, a name with its stratum being no error row, and had left every F without its second df). The
    numbers: pingouin's mixed_anova of its bundled mixed_anova data (Scores by Group between and Time within, 60
    subjects), printed to two decimals; the p values scipy's from those df; one retyped wrong."""
    import pingouin as pg

    data = pg.read_dataset("mixed_anova")
    a = pg.mixed_anova(data, dv="Scores", between="Group", within="Time", subject="Subject", correction=False).set_index("Source")

    def row(name, wrong=False):
        f, df1, df2 = a.loc[name, "F"], int(a.loc[name, "DF1"]), int(a.loc[name, "DF2"])
        p = stats.f.sf(round(f, 2), df1, df2)
        return (name, f"{a.loc[name, 'SS']:.2f}", str(df1), f"{a.loc[name, 'MS']:.2f}", f"{f:.2f}", f"{p / 3 if wrong else p:.3f}"), (df1, df2)

    group, time, both = row("Group"), row("Time"), row("Interaction", wrong=True)
    for between, within in (("Error (between subjects)", "Error (within subjects)"), ("Error(Group)", "Error(Time)")):
        rows = [("Source", "SS", "df", "MS", "F", "p"), group[0], (between, "62.70", str(group[1][1]), "1.08", "", ""),
                time[0], both[0], (within, "109.86", str(time[1][1]), "0.95", "", "")]
        entries = [e for e in audit_file(_doc(tmp_path / "m.docx", tables=[("Table 4 Scores by group and time", rows)]))
                   if e.found.startswith("F")]
        assert [e.found.split(" =")[0] for e in entries] == ["F(1, 58)", "F(2, 116)", "F(2, 116)"], between
        assert [bool(_p_findings(e)) for e in entries] == [False, False, True] and "p-does-not-follow" in entries[2].codes, [e.codes for e in entries]
        assert all("error row" in e.notes[0] for e in entries)


def test_a_coefficients_table_checks_t_against_b_and_se_and_takes_no_two_group_df(tmp_path):
    """A model's coefficients table (B, SE, t, p without a df column): each t is checked against B / SE of its row,
    as a sentence's is, and is not given the df of a two-group t from an N near the table (N − 2: a regression's
    residual df are N minus its coefficients; the Markdown and LaTeX copies of statsetter's own regression table had
    been recomputed on N − 2 where the N stood close enough, the Word copy not). statsmodels' OLS of its bundled Longley
    data (16 years, six predictors: 9 residual df), printed as APA's table prints it; one t retyped."""
    import statsmodels.api as sm

    d = sm.datasets.longley.load_pandas()
    fit = sm.OLS(d.endog, sm.add_constant(d.exog)).fit()
    rows = [("Predictor", "B", "SE", "t", "p")]
    for name in fit.params.index:
        t = round(fit.tvalues[name], 2)
        rows.append((name, f"{fit.params[name]:.3f}", f"{fit.bse[name]:.3f}", f"{t:.2f}", f"{2 * stats.t.sf(abs(t), fit.df_resid):.3f}"))
    retyped = [r if r[0] != "UNEMP" else (r[0], r[1], r[2], "-2.14", r[4]) for r in rows]
    for table, wrong in ((rows, set()), (retyped, {"UNEMP"})):
        path = _doc(tmp_path / "coef.docx", paragraphs=["Employment was modelled on six predictors (N = 16)."],
                    tables=[("Table 5 Coefficients of the model", table)])
        entries = [e for e in audit_file(path) if e.found.startswith("t")]
        assert len(entries) == 7
        assert all("B and SE columns" in e.notes[0] and "two independent groups" not in e.checked for e in entries)
        flagged = {table[k + 1][0] for k, e in enumerate(entries) if "coefficient-does-not-fit" in e.codes}
        assert flagged == wrong, [(e.found, e.codes) for e in entries]


def test_a_coefficients_b_and_se_in_one_cell_are_read_as_the_columns_are(tmp_path):
    """A regression table with B and its SE in one cell under "B (SE)", β, t and p (as psychology and sociology tables
    print it; practice): each t is checked against B / SE of its cell, and none is given a two-group df (the t's had
    been recomputed on N − 2 from the caption's N, and B / SE not checked). statsmodels' OLS of its bundled Longley data
    (16 years, six predictors), printed to three decimals; one t retyped."""
    import statsmodels.api as sm

    d = sm.datasets.longley.load_pandas()
    fit = sm.OLS(d.endog, sm.add_constant(d.exog)).fit()
    rows = [("Predictor", "B (SE)", "t", "p")]
    for name in fit.params.index:
        t = round(fit.tvalues[name], 2)
        rows.append((name, f"{fit.params[name]:.3f} ({fit.bse[name]:.3f})", f"{t:.2f}", f"{2 * stats.t.sf(abs(t), fit.df_resid):.3f}"))
    # only β beside t and p: still a model's table, its t's given no two-group df (they had drawn five false "p does not
    # follow" findings on N − 2 = 14 instead of the model's 9 residual df)
    standardised = [("Predictor", "β", "t", "p")] + [(r[0], "" if r[0] == "const" else f"{fit.params[r[0]] * d.exog[r[0]].std() / d.endog.std():.2f}",
                                                      r[2], r[3]) for r in rows[1:]]
    path = _doc(tmp_path / "beta.docx", paragraphs=["Employment was modelled on six predictors (N = 16)."],
                tables=[("Table 5 Coefficients of the model", standardised)])
    entries = [e for e in audit_file(path) if e.found.startswith("t")]
    assert len(entries) == 7 and all(e.codes == [] and "N − 2" not in e.checked for e in entries), [(e.found, e.codes) for e in entries]
    retyped = [r if r[0] != "UNEMP" else (r[0], r[1], "-2.14", r[3]) for r in rows]
    for table, wrong in ((rows, set()), (retyped, {"UNEMP"})):
        path = _doc(tmp_path / "bse.docx", paragraphs=["Employment was modelled on six predictors (N = 16)."],
                    tables=[("Table 5 Coefficients of the model", table)])
        entries = [e for e in audit_file(path) if e.found.startswith("t")]
        assert len(entries) == 7 and all("two independent groups" not in e.checked and "N − 2" not in e.checked for e in entries)
        flagged = {table[k + 1][0] for k, e in enumerate(entries) if "coefficient-does-not-fit" in e.codes}
        assert flagged == wrong, [(e.found, e.codes) for e in entries]


def test_a_coefficients_t_in_a_sentence_takes_no_two_group_df():
    """The same in text: "β = −0.61, t = −4.14, p = .003" after "N = 16" is a model's coefficient, whose t has the model's
    residual df (9 on Longley's six predictors), not N − 2: it had drawn a false "p does not follow" on 14 df. A t
    without a coefficient beside it still takes the df its context gives. Numbers: statsmodels' OLS of Longley."""
    import statsmodels.api as sm
    from statsetter.audit.reading import Unit
    from statsetter.audit.report import audit_units

    d = sm.datasets.longley.load_pandas()
    fit = sm.OLS(d.endog, sm.add_constant(d.exog)).fit()
    beta = {k: fit.params[k] * d.exog[k].std() / d.endog.std() for k in ("UNEMP", "ARMED")}
    t = {k: round(fit.tvalues[k], 2) for k in beta}
    p = {k: f"{2 * stats.t.sf(abs(t[k]), fit.df_resid):.3f}".lstrip("0") for k in beta}
    text = (f"Employment was modelled on six predictors (N = 16). Unemployment predicted it, β = {beta['UNEMP']:.2f}, t = {t['UNEMP']:.2f}, "
            f"p = {p['UNEMP']}, as did the armed forces, β = {beta['ARMED']:.2f}, t = {t['ARMED']:.2f}, p = {p['ARMED']}.")
    assert all(2 * stats.t.sf(abs(v), 14) < float(p[k]) / 1.5 for k, v in t.items())  # on N − 2 = 14 df they would not fit
    entries = [e for e in audit_units([Unit("c", text)]) if e.found.startswith("t")]
    assert len(entries) == 2 and all("p-does-not-follow" not in e.codes for e in entries), [(e.found, e.codes) for e in entries]
    (e,) = [e for e in audit_units([Unit("c", "Men (n = 20) and women (n = 20) differed, t = 2.10, p = .42.")]) if e.found.startswith("t")]
    assert "p-does-not-follow" in e.codes and "20 + 20 − 2" in e.checked


def test_a_partial_correlation_takes_no_df_from_the_n():
    """A correlation with covariates partialled out has N − 2 − k df: "the partial correlation controlling for age, sex
    and income was r = .40, p = .039" in a sample of N = 30 (p from scipy on 25 df) had been recomputed on N − 2 = 28
    and flagged; it is read, not given that df. The same r as a plain correlation still is, as a warning naming the df
    that fit (missing values or an unsaid covariate: the text does not say)."""
    import math

    from statsetter.audit.reading import Unit
    from statsetter.audit.report import audit_units

    p = 2 * stats.t.sf(0.40 * math.sqrt(25 / (1 - 0.16)), 25)
    assert f"{p:.3f}" == "0.039"
    for text in ("In the sample (N = 30), the partial correlation controlling for age, sex and income was r = .40, p = .039.",
                 "In the sample (N = 30), partial r = .40, p = .039, adjusting for age."):
        (e,) = [e for e in audit_units([Unit("c", text)]) if e.found.startswith("r")]
        assert "p-does-not-follow" not in e.codes and "over every df it may have" in e.checked and "(28)" not in e.checked, text
    (e,) = audit_units([Unit("c", "In the sample (N = 30), the correlation was r = .40, p = .039.")])
    assert e.codes == ["df-unstated"] and "N − 2 = 28" in e.checked and "df = 25 would" in e.message


def test_a_welch_t_without_df_is_checked_over_the_df_welch_allows():
    """"Welch's t = 2.10, p = .046" with n = 20 and 20 (p from scipy on Welch's 25 df; Student's 38 df give .042) had been
    recomputed on 38 df and flagged; a t said to be Welch's (or with equal variances not assumed) is checked against
    every df Welch's test allows, from the smaller group's n − 1 (19: p = .049) to n₁ + n₂ − 2 (38), and flagged only
    when no df between them gives its p. The same sentence without Welch is Student's."""
    from statsetter.audit.reading import Unit
    from statsetter.audit.report import audit_units

    assert f"{2 * stats.t.sf(2.10, 25):.3f}" == "0.046" and f"{2 * stats.t.sf(2.10, 38):.3f}" == "0.042"
    for text in ("Men (n = 20) and women (n = 20) differed, Welch's t = 2.10, p = .046.",
                 "Men (n = 20) and women (n = 20) differed, t = 2.10, p = .046 (equal variances not assumed)."):
        (e,) = audit_units([Unit("c", text)])
        assert "p-does-not-follow" not in e.codes and "from 19" in e.checked, text
    (e,) = audit_units([Unit("c", "Men (n = 20) and women (n = 20) differed, Welch's t = 2.10, p = .46.")])
    assert "p-does-not-follow" in e.codes and "0.0498 over those df" in e.findings[0].evidence
    assert f"{2 * stats.t.sf(2.095, 19):.4f}" == "0.0498"  # (t printed as 2.10 stands for 2.095 to 2.105)
    (e,) = audit_units([Unit("c", "Men (n = 20) and women (n = 20) differed, t = 2.10, p = .046.")])
    assert "p-does-not-follow" in e.codes and "20 + 20 − 2" in e.checked


def test_a_tables_welch_ts_take_no_student_df_from_its_group_sizes(tmp_path):
    """A table of t tests with group sizes in its header and a note saying the tests are Welch's: the t's are not given
    n₁ + n₂ − 2 (p from scipy on 25 df, as above); without the note they are. With the note a t is checked over the
    df Welch's test allows, 19 to 38, as in a sentence (it had been left unchecked): a p no df there gives is flagged."""
    rows = [("", "Control (n = 20)", "Treatment (n = 20)", "t", "p"), ("Score", "3.1 (1.0)", "3.8 (1.1)", "2.10", ".046")]
    welch = "Note. Welch's t tests (equal variances not assumed)."
    for note, flagged in (("Note. Our own numbers.", True), (welch, False)):
        path = _doc(tmp_path / "welch.docx", tables=[("Table 2 Scores of the two groups", rows)], note=note)
        (e,) = audit_file(path)
        assert ("p-does-not-follow" in e.codes) is flagged, (note, e.codes)
    (e,) = audit_file(_doc(tmp_path / "welch.docx", tables=[("Table 2 Scores of the two groups", rows)], note=welch))
    assert "Welch's df, somewhere from 19" in e.checked
    wrong = [rows[0], ("Score", "3.1 (1.0)", "3.8 (1.1)", "2.10", ".46")]
    (e,) = audit_file(_doc(tmp_path / "welch2.docx", tables=[("Table 2 Scores of the two groups", wrong)], note=welch))
    assert "p-does-not-follow" in e.codes and _p2(2.10, 19) < 0.06 and "over those df" in e.message + " ".join(f.evidence for f in e.findings)


def test_spss_independent_samples_table_gives_each_statistic_its_own_columns(tmp_path):
    """SPSS's Independent Samples Test table puts Levene's F and its Sig. before the t, its df and "Sig. (2-tailed)",
    in two rows (equal variances assumed and not). Each statistic takes the df and p columns between it and the next
    statistic's (the t had taken Levene's Sig. as its p — a false "does not follow" on SPSS's most common table — and
    Levene's F the t's df). Numbers: pingouin's penguins, body mass of Adelie females and males (Palmer Station),
    Levene's test centred on the mean as SPSS computes it, Student's and Welch's t from scipy, printed as SPSS prints
    them; then one Sig. (2-tailed) retyped."""
    import pingouin as pg

    penguins = pg.read_dataset("penguins")
    adelie = penguins[(penguins["species"] == "Adelie")].dropna(subset=["sex", "body_mass_g"])
    f, m = (adelie.loc[adelie["sex"] == s, "body_mass_g"].to_numpy() for s in ("female", "male"))
    levene = stats.levene(f, m, center="mean")
    student, welch = stats.ttest_ind(f, m), stats.ttest_ind(f, m, equal_var=False)
    nu = len(f) + len(m) - 2
    va, vb = f.var(ddof=1) / len(f), m.var(ddof=1) / len(m)
    welch_df = (va + vb) ** 2 / (va ** 2 / (len(f) - 1) + vb ** 2 / (len(m) - 1))

    def sig(p):
        return f"{p:.3f}".lstrip("0") if p >= 0.001 else "<.001"

    header = ("", "", "F", "Sig.", "t", "df", "Sig. (2-tailed)", "Mean Difference")
    rows = [header, ("Body mass", "Equal variances assumed", f"{levene.statistic:.3f}", sig(levene.pvalue), f"{student.statistic:.3f}",
                     str(nu), sig(student.pvalue), f"{f.mean() - m.mean():.2f}"),
            ("", "Equal variances not assumed", "", "", f"{welch.statistic:.3f}", f"{welch_df:.3f}", sig(welch.pvalue), f"{f.mean() - m.mean():.2f}")]
    entries = audit_file(_doc(tmp_path / "spss.docx", tables=[("Independent Samples Test", rows)]))
    assert [e.found.split(" =")[0] for e in entries] == ["F", f"t({nu})", f"t({welch_df:.3f})"]
    assert [e.codes for e in entries] == [[], [], []] and all("Sig" not in e.found for e in entries)
    retyped = [rows[0], rows[1][:6] + (".049",) + rows[1][7:], rows[2]]
    flagged = [e.codes for e in audit_file(_doc(tmp_path / "spss2.docx", tables=[("Independent Samples Test", retyped)]))]
    assert "p-does-not-follow" in flagged[1] and flagged[0] == flagged[2] == []


def test_spss_chi_square_tests_table_is_read_by_its_rows_names(tmp_path):
    """SPSS's Chi-Square Tests table gives each χ² under "Value", named by its row (Pearson Chi-Square, Continuity
    Correction, Likelihood Ratio, Linear-by-Linear Association), its p under "Asymptotic Significance (2-sided)", and
    Fisher's exact test in Exact Sig. columns: the table had not been read at all. Each χ² is now read with its row's
    df and asymptotic p (an Exact Sig. is not its p; Fisher's row and "N of Valid Cases" are no χ²). Numbers: sex by
    diagnosis in pingouin's chi2_independence data (the UCI heart-disease set, 303 patients): Pearson's and Yates's χ²
    and the likelihood ratio from scipy's chi2_contingency, linear-by-linear as (N − 1)·r², Fisher's p from scipy;
    printed as SPSS prints them; then one asymptotic p retyped."""
    import pingouin as pg

    data = pg.read_dataset("chi2_independence")
    table = pd.crosstab(data["sex"], data["target"]).to_numpy()
    pearson = stats.chi2_contingency(table, correction=False)
    yates = stats.chi2_contingency(table, correction=True)
    ratio = stats.chi2_contingency(table, correction=False, lambda_="log-likelihood")
    linear = (len(data) - 1) * np.corrcoef(data["sex"], data["target"])[0, 1] ** 2
    fisher = stats.fisher_exact(table).pvalue

    def sig(p):
        return f"{p:.3f}".lstrip("0") if p >= 0.001 else "<.001"

    rows = [("", "Value", "df", "Asymptotic Significance (2-sided)", "Exact Sig. (2-sided)", "Exact Sig. (1-sided)"),
            ("Pearson Chi-Square", f"{pearson.statistic:.3f}a", "1", sig(pearson.pvalue), "", ""),
            ("Continuity Correctionb", f"{yates.statistic:.3f}", "1", sig(yates.pvalue), "", ""),
            ("Likelihood Ratio", f"{ratio.statistic:.3f}", "1", sig(ratio.pvalue), "", ""),
            ("Fisher's Exact Test", "", "", "", sig(fisher), sig(fisher / 2)),
            ("Linear-by-Linear Association", f"{linear:.3f}", "1", sig(stats.chi2.sf(linear, 1)), "", ""),
            ("N of Valid Cases", str(len(data)), "", "", "", "")]
    entries = audit_file(_doc(tmp_path / "chi.docx", tables=[("Chi-Square Tests", rows)]))
    assert [e.found.split(" =")[0] for e in entries] == ["χ²(1)"] * 4 and [e.codes for e in entries] == [[]] * 4
    assert all(e.checked.startswith("p recomputed from chi2(1)") for e in entries)
    assert [e.notes[0].split("its row, ")[1].split(",")[0] for e in entries] == ["Pearson Chi-Square", "Continuity Correctionb",
                                                                              "Likelihood Ratio", "Linear-by-Linear Association"]
    retyped = [r if r[0] != "Likelihood Ratio" else r[:3] + (".049",) + r[4:] for r in rows]
    codes = [e.codes for e in audit_file(_doc(tmp_path / "chi2.docx", tables=[("Chi-Square Tests", retyped)]))]
    assert ["p-does-not-follow" in c for c in codes] == [False, False, True, False]


def test_spss_coefficients_table_with_its_two_header_rows(tmp_path):
    """SPSS's Coefficients table has a header of two rows: "t" and "Sig." in the first, "B" and "Std. Error" (under
    "Unstandardized Coefficients") in the second. The second row's heads had replaced the first's (t and Sig. lost:
    nothing read); they are now added to them, "Std. Error" is the SE, and each t is checked against B / SE and its
    Sig. read. statsmodels' OLS of its bundled Longley data, printed as SPSS prints it (three decimals, ".000"); one t
    retyped."""
    import statsmodels.api as sm

    d = sm.datasets.longley.load_pandas()
    fit = sm.OLS(d.endog, sm.add_constant(d.exog[["GNP", "UNEMP", "ARMED"]])).fit()
    beta = fit.params * d.exog[["GNP", "UNEMP", "ARMED"]].std() / d.endog.std()

    def spss(x):
        return f"{x:.3f}".replace("0.", ".", 1) if abs(x) < 1 else f"{x:.3f}"

    rows = [("Model", "", "Unstandardized Coefficients", "", "Standardized Coefficients", "t", "Sig."), ("", "", "B", "Std. Error", "Beta", "", "")]
    for k, name in enumerate(fit.params.index):
        rows.append(("1" if k == 0 else "", "(Constant)" if name == "const" else name, spss(fit.params[name]), spss(fit.bse[name]),
                     "" if name == "const" else spss(beta[name]), spss(fit.tvalues[name]), spss(fit.pvalues[name])))
    entries = audit_file(_doc(tmp_path / "coef.docx", tables=[("Coefficients", rows)]))
    assert len(entries) == 4 and all(e.codes == [] and "the B and SE columns" in e.notes[0] and "the p column" in e.notes[0] for e in entries)
    retyped = rows[:3] + [rows[3][:5] + ("9.999",) + rows[3][6:]] + rows[4:]
    codes = [e.codes for e in audit_file(_doc(tmp_path / "coef2.docx", tables=[("Coefficients", retyped)]))]
    assert ["coefficient-does-not-fit" in c for c in codes] == [False, True, False, False]


def test_spss_correlations_table_reads_each_coefficient_with_the_sig_and_n_below_it(tmp_path):
    """SPSS's Correlations table: under each variable a "Pearson Correlation" row (Spearman's: "Correlation Coefficient"
    under "Spearman's rho"), then "Sig. (2-tailed)" and "N" rows, a column per variable. It had not been read; each
    coefficient is now a statistic with the p and N below it in its column (df = N − 2), the diagonal's 1 none.
    Numbers: three measurements of statsmodels' bundled Longley data (16 years), Pearson's r and Spearman's ρ with
    their p from scipy, printed as SPSS prints them; one Sig. retyped."""
    import statsmodels.api as sm

    data = sm.datasets.longley.load_pandas().exog[["GNP", "UNEMP", "ARMED"]]
    names = list(data.columns)

    def matrix(kind, retype=None, tails=2):
        rows = [("", "", *names)]
        for a in names:
            coefficient = [("1" if a == b else f"{(stats.pearsonr if kind == 'pearson' else stats.spearmanr)(data[a], data[b])[0]:.3f}") for b in names]
            sig = ["" if a == b else f"{(stats.pearsonr if kind == 'pearson' else stats.spearmanr)(data[a], data[b])[1] / (3 - tails):.3f}" for b in names]
            if retype == a:
                sig = [x if not x else ".001" for x in sig]
            label = "Pearson Correlation" if kind == "pearson" else "Correlation Coefficient"
            rows += [(a, label, *coefficient), ("", f"Sig. ({tails}-tailed)", *sig), ("", "N", *["16"] * len(names))]
        if kind == "spearman":
            rows = [("Spearman's rho", *r[1:]) if k == 1 else r for k, r in enumerate(rows)]
        return rows

    for kind, symbol in (("pearson", "r"), ("spearman", "rs")):
        entries = audit_file(_doc(tmp_path / f"{kind}.docx", tables=[("Correlations", matrix(kind))]))
        assert len(entries) == 6 and all(e.found.startswith(f"{symbol}(14) = ") and e.codes == [] and e.checked for e in entries), \
            [(e.found, e.codes) for e in entries]
    codes = [e.codes for e in audit_file(_doc(tmp_path / "retyped.docx", tables=[("Correlations", matrix("pearson", retype="UNEMP"))]))]
    assert sum("p-does-not-follow" in c for c in codes) >= 1 and sum(c == [] for c in codes) >= 3
    # one-tailed tests asked for: SPSS prints "Sig. (1-tailed)", half the two-sided p (scipy's, halved): read, and each p
    # that fits a one-sided test only is a note saying so, not a warning (it had not been read at all)
    entries = audit_file(_doc(tmp_path / "one.docx", tables=[("Correlations", matrix("pearson", tails=1))]))
    assert len(entries) == 6 and all(e.codes == [] and e.checked for e in entries), [(e.found, e.codes) for e in entries]
    assert sum(any("one-sided test, as the text says" in n for n in e.notes) for e in entries) >= 4


def test_spss_within_subjects_table_takes_each_corrections_error_df(tmp_path):
    """SPSS's Tests of Within-Subjects Effects gives the effect's F in four rows (Sphericity Assumed, Greenhouse-Geisser,
    Huynh-Feldt, Lower-bound), each with its corrected df, and its error term "Error(time)" in four rows likewise: each
    F takes the error df of its own correction (the first error row below had been given to all four — a false "p does
    not follow" for every corrected row), and SPSS's regression ANOVA its "Residual" in the second column. Numbers:
    pingouin's rm_anova_wide data (four weeks, complete cases), its F and sums of squares, the Greenhouse-Geisser and
    Huynh-Feldt ε from pingouin and the lower bound 1/(k − 1), the p values scipy's; one corrected Sig. retyped."""
    import pingouin as pg

    data = pg.read_dataset("rm_anova_wide").dropna()
    a = pg.rm_anova(data, detailed=True).set_index("Source")
    f, df1, df2 = a.loc["Within", "F"], a.loc["Within", "DF"], a.loc["Error", "DF"]
    eps = {"Sphericity Assumed": 1.0, "Greenhouse-Geisser": pg.epsilon(data, correction="gg"), "Huynh-Feldt": pg.epsilon(data, correction="hf"),
           "Lower-bound": 1 / df1}

    def rows(wrong=""):
        out = [("Source", "", "Type III Sum of Squares", "df", "Mean Square", "F", "Sig.")]
        for k, (name, e) in enumerate(eps.items()):
            p = stats.f.sf(round(f, 3), round(df1 * e, 3), round(df2 * e, 3))
            out.append(("time" if k == 0 else "", name, f"{a.loc['Within', 'SS']:.3f}", f"{df1 * e:.3f}", f"{a.loc['Within', 'SS'] / (df1 * e):.3f}",
                        f"{f:.3f}", f"{p / 4 if name == wrong else p:.3f}"))
        for k, (name, e) in enumerate(eps.items()):
            out.append(("Error(time)" if k == 0 else "", name, f"{a.loc['Error', 'SS']:.3f}", f"{df2 * e:.3f}", f"{a.loc['Error', 'SS'] / (df2 * e):.3f}", "", ""))
        return out

    entries = audit_file(_doc(tmp_path / "within.docx", tables=[("Tests of Within-Subjects Effects", rows())]))
    assert [e.found.split(" =")[0] for e in entries] == [f"F({df1 * e:.3f}, {float(f'{df2 * e:.3f}'):g})" for e in eps.values()]
    assert all(e.codes == [] for e in entries)
    codes = [e.codes for e in audit_file(_doc(tmp_path / "within2.docx", tables=[("Tests of Within-Subjects Effects", rows("Huynh-Feldt"))]))]
    assert ["p-does-not-follow" in c for c in codes] == [False, False, True, False]
    regression = [("Model", "", "Sum of Squares", "df", "Mean Square", "F", "Sig."), ("1", "Regression", "40.21", "4", "10.05", "42.04", ".000"),
                  ("", "Residual", "56.19", "235", ".239", "", ""), ("", "Total", "96.40", "239", "", "", "")]
    (e,) = audit_file(_doc(tmp_path / "anova.docx", tables=[("ANOVA", regression)]))
    assert e.found.startswith("F(4, 235) = 42.04") and e.codes == []


def test_spss_test_statistics_tables_are_read_down_their_columns(tmp_path):
    """SPSS's Test Statistics tables lay a test down a column: Mann–Whitney's and Wilcoxon's "Z" with "Asymp. Sig.
    (2-tailed)", Kruskal–Wallis' "Kruskal-Wallis H" and Friedman's "Chi-Square" each with "df" and "Asymp. Sig." below.
    They had not been read; each is now a statistic with the df and p of its column. Numbers: pingouin's penguins
    (Adelie body mass by sex: Mann–Whitney's z, tie-corrected, as SPSS computes it; flipper length by species:
    Kruskal–Wallis from scipy) and rm_anova_wide (Friedman from scipy); one p retyped."""
    import pingouin as pg

    penguins = pg.read_dataset("penguins").dropna(subset=["sex", "body_mass_g", "flipper_length_mm"])
    adelie = penguins[penguins["species"] == "Adelie"]
    f, m = (adelie.loc[adelie["sex"] == s, "body_mass_g"].to_numpy() for s in ("female", "male"))
    u = stats.mannwhitneyu(f, m).statistic
    n1, n2 = len(f), len(m)
    _, counts = np.unique(np.concatenate([f, m]), return_counts=True)
    n = n1 + n2
    z = (u - n1 * n2 / 2) / np.sqrt(n1 * n2 / 12 * ((n + 1) - (counts ** 3 - counts).sum() / (n * (n - 1))))
    kw = stats.kruskal(*(g["flipper_length_mm"].to_numpy() for _, g in penguins.groupby("species")))
    weeks = pg.read_dataset("rm_anova_wide").dropna()
    fr = stats.friedmanchisquare(*(weeks[c] for c in weeks.columns))

    def sig(p):
        return f"{p:.3f}".lstrip("0") if p >= 0.001 else ".000"

    tables = [("Test Statistics", [("", "body mass"), ("Mann-Whitney U", f"{u:.3f}"), ("Z", f"{z:.3f}"), ("Asymp. Sig. (2-tailed)", sig(2 * stats.norm.sf(abs(z))))]),
              ("Test Statistics", [("", "flipper length"), ("Kruskal-Wallis H", f"{kw.statistic:.3f}"), ("df", "2"), ("Asymp. Sig.", sig(kw.pvalue))]),
              ("Test Statistics", [("N", str(len(weeks))), ("Chi-Square", f"{fr.statistic:.3f}"), ("df", "3"), ("Asymp. Sig.", sig(fr.pvalue))])]
    entries = audit_file(_doc(tmp_path / "tests.docx", tables=tables))
    assert [e.found.split(" =")[0] for e in entries] == ["z", "H(2)", "χ²(3)"] and all(e.codes == [] and e.checked for e in entries)
    retyped = tables[:2] + [("Test Statistics", tables[2][1][:3] + [("Asymp. Sig.", ".500")])]
    assert ["p-does-not-follow" in e.codes for e in audit_file(_doc(tmp_path / "tests2.docx", tables=retyped))] == [False, False, True]


# a spreadsheet's paired t test as a published training evaluation prints it (scribd.com/document/400542103, "Pre-Test & Post
# Test Analysis Sample Computations": its output table, as printed)
_SPREADSHEET_PAIRED = [("", "Variable 1", "Variable 2"), ("Mean", "60.3684210526", "53.7368421053"), ("Variance", "20.0233918129", "68.9824561404"),
                       ("Observations", "19", "19"), ("Pearson Correlation", "0.5722806228", ""), ("Hypothesized Mean Difference", "0", ""),
                       ("df", "18", ""), ("t Stat", "4.2405044127", ""), ("P(T<=t) one-tail", "0.000245961", ""), ("t Critical one-tail", "1.7340635923", ""),
                       ("P(T<=t) two-tail", "0.000491922", ""), ("t Critical two-tail", "2.1009220369", "")]


def _spreadsheet_t(a, b, equal: bool) -> list[tuple[str, str, str]]:
    """Two groups' t test laid out as a spreadsheet's analysis tools print it (full digits; Welch's df rounded), its
    numbers from scipy."""
    test = stats.ttest_ind(a, b, equal_var=equal)
    va, vb = np.var(a, ddof=1), np.var(b, ddof=1)
    rows = [("", "Variable 1", "Variable 2"), ("Mean", repr(float(np.mean(a))), repr(float(np.mean(b)))), ("Variance", repr(float(va)), repr(float(vb))),
            ("Observations", str(len(a)), str(len(b)))]
    if equal:
        rows.append(("Pooled Variance", repr(float(((len(a) - 1) * va + (len(b) - 1) * vb) / (len(a) + len(b) - 2))), ""))
    rows += [("Hypothesized Mean Difference", "0", ""), ("df", f"{test.df:.0f}", ""), ("t Stat", repr(float(test.statistic)), ""),
             ("P(T<=t) one-tail", repr(float(test.pvalue / 2)), ""), ("t Critical one-tail", repr(float(stats.t.isf(0.05, test.df))), ""),
             ("P(T<=t) two-tail", repr(float(test.pvalue)), ""), ("t Critical two-tail", repr(float(stats.t.isf(0.025, test.df))), "")]
    return rows


def test_a_spreadsheets_t_test_output_is_read_down_its_column(tmp_path):
    """A spreadsheet's t test pasted as a table — "t Stat" with its "df" and "P(T<=t) two-tail" rows, as theses paste
    them — had not been read at all. Now the t is read with the df and two-tailed p of its column (the one-tailed p and
    the critical values not): the published paired test is clean (scipy: t(18) = 4.2405 gives p = .000492); a Student's
    t and a Welch's t of pingouin's penguins (bill depth, 40 Adelie and 30 Chinstrap; scipy) are clean, the Welch's held
    to a df within 1 of its rounded df (67 for 67.03); each p moved by half again is found, in Word and Markdown."""
    import pingouin as pg

    assert f"{2 * stats.t.sf(4.2405044127, 18):.6f}" == "0.000492"
    penguins = pg.read_dataset("penguins").dropna(subset=["bill_depth_mm"])
    a = penguins.loc[penguins["species"] == "Adelie", "bill_depth_mm"].to_numpy()[:40]
    b = penguins.loc[penguins["species"] == "Chinstrap", "bill_depth_mm"].to_numpy()[:30]
    tables = {"paired": _SPREADSHEET_PAIRED, "student": _spreadsheet_t(a, b, True), "welch": _spreadsheet_t(a, b, False)}
    assert {r[0]: r[1] for r in tables["welch"]}["df"] == "67" and abs(stats.ttest_ind(a, b, equal_var=False).df - 67.03) < 0.01
    for name, rows in tables.items():
        entries = audit_file(_doc(tmp_path / f"{name}.docx", tables=[("t-Test", rows)]))
        assert len(entries) == 1 and entries[0].found.startswith(("t(18) = 4.2405044127", "t(68) = -0.847", "t = -0.868")) and entries[0].codes == [], \
            [(e.found, e.codes) for e in entries]
        assert entries[0].checked.startswith("p recomputed from t("), entries[0].checked
        md = tmp_path / f"{name}.md"
        md.write_text("| " + " | ".join(rows[0]) + " |\n|---|---|---|\n" + "".join("| " + " | ".join(r) + " |\n" for r in rows[1:]), encoding="utf-8")
        assert [e.found for e in audit_file(md)] == [entries[0].found]
        moved = [r if r[0] != "P(T<=t) two-tail" else (r[0], repr(float(r[1]) * 1.5), "") for r in rows]
        assert [e.codes for e in audit_file(_doc(tmp_path / f"{name}-moved.docx", tables=[("t-Test", moved)]))] == [["p-does-not-follow"]]
    assert "Welch's df, printed rounded as 67: from 66 to 68" in audit_file(_doc(tmp_path / "w.docx", tables=[("t-Test", tables["welch"])]))[0].checked


def _spreadsheet_regression(fit) -> list[tuple[str, ...]]:  # type: ignore[no-untyped-def]
    """A fitted OLS model laid out as a spreadsheet's regression output pasted as one table: its statistics, its ANOVA
    (df, SS, MS, F, "Significance F") and its coefficients ("t Stat", "P-value"), full digits as the tool prints them."""
    g = "{:.10g}".format
    blank = ("",) * 5
    return [("SUMMARY OUTPUT", "", *blank), ("Regression Statistics", "", *blank), ("R Square", g(fit.rsquared), *blank),
            ("Observations", g(fit.nobs), *blank), ("ANOVA", "", *blank),
            ("", "df", "SS", "MS", "F", "Significance F", ""),
            ("Regression", g(fit.df_model), g(fit.ess), g(fit.mse_model), g(fit.fvalue), g(fit.f_pvalue), ""),
            ("Residual", g(fit.df_resid), g(fit.ssr), g(fit.mse_resid), "", "", ""),
            ("Total", g(fit.df_model + fit.df_resid), g(fit.centered_tss), "", "", "", ""),
            ("", "Coefficients", "Standard Error", "t Stat", "P-value", "Lower 95%", "Upper 95%")] + [
            (name, g(fit.params[name]), g(fit.bse[name]), g(fit.tvalues[name]), g(fit.pvalues[name]), g(fit.conf_int().loc[name, 0]),
             g(fit.conf_int().loc[name, 1])) for name in fit.params.index]


def test_a_spreadsheets_regression_output_reads_its_ts_on_the_residual_df(tmp_path):
    """A spreadsheet's regression output pasted as one table: its "Significance F" had been no p head, its "t Stat" no t
    head — the F was read without its p and the coefficients' t's not at all. Now the F has its p, and each t its p and
    the residual df of the ANOVA above it (the Residual row's), held to B / SE and to its interval too. Numbers:
    statsmodels' OLS of R's mtcars (mpg on wt and hp; tests/open_data.py), F(2, 29) = 69.21; a p retyped and a t
    retyped are found, in Word and Markdown."""
    import statsmodels.formula.api as smf
    from open_data import MTCARS

    fit = smf.ols("mpg ~ wt + hp", data=MTCARS).fit()
    assert (fit.df_model, fit.df_resid) == (2, 29) and f"{fit.fvalue:.2f}" == "69.21"
    rows = _spreadsheet_regression(fit)
    entries = audit_file(_doc(tmp_path / "reg.docx", tables=[("Regression", rows)]))
    assert [e.found.split(" =")[0] for e in entries] == ["F(2, 29)", "t", "t", "t"] and all(e.codes == [] for e in entries), \
        [(e.found, e.codes) for e in entries]
    assert all("with the model's residual df, 29: its ANOVA's Residual row in the table" in e.checked for e in entries[1:]), entries[1].checked
    md = tmp_path / "reg.md"
    md.write_text("| " + " | ".join(rows[0]) + " |\n|" + "---|" * 7 + "\n" + "".join("| " + " | ".join(r) + " |\n" for r in rows[1:]), encoding="utf-8")
    assert [(e.found, e.codes) for e in audit_file(md)] == [(e.found, e.codes) for e in entries]
    retyped = [r if r[0] != "hp" else (r[0], r[1], r[2], r[3], "{:.10g}".format(3 * float(r[4])), r[5], r[6]) for r in rows]
    retyped = [r if r[0] != "wt" else (r[0], r[1], r[2], "-5.12871", *r[4:]) for r in retyped]
    codes = [e.codes for e in audit_file(_doc(tmp_path / "reg2.docx", tables=[("Regression", retyped)]))]
    assert codes[0] == [] and "coefficient-does-not-fit" in codes[2] and "p-does-not-follow" in codes[3], codes


def test_a_p_in_a_later_cell_and_a_header_partway_down(tmp_path):
    rows = [("Effect", "Test", "Size", "p"),
            ("Valence", "F (1,40) = 9.10", "η2 = .185", "p = .25"),
            ("Outcome", "Mean", "Mean", "t", "p"),
            ("Score", "3.1", "3.4", "1.50", "0.900")]
    entries = audit_file(_doc(tmp_path / "d.docx", tables=[("Table 4 (n = 21 per group)", rows)]))
    f = next(e for e in entries if e.found.startswith("F"))
    assert f.found == "F (1,40) = 9.10, η2 = .185, p = .25" and "p-does-not-follow" in f.codes  # (its η² beside it, which fits)
    assert "effect-does-not-fit" not in f.codes
    assert not any(e.found == "p = .25" for e in entries)  # the p is part of the F, not a statistic of its own
    t = next(e for e in entries if e.found.startswith("t"))
    assert "21 + 21 − 2 = 40" in t.checked and "p-does-not-follow" in t.codes


def test_the_paragraphs_n_gives_the_df_and_no_reading_is_a_guess():
    right = f"{_p2(2.40, 66):.3f}"
    units = [Unit("p1", f"Sixty-eight adults took part (N = 68). Scores rose, t = 2.40, p = {right}."),
             Unit("p2", "A second comparison, t = 2.40, p = .400.")]
    first, second = [e for e in audit_units(units) if e.found.startswith("t")]
    (third,) = audit_units([Unit("p3", "Without any sample size, t = 9.99, p = .50.")])
    assert not _p_findings(first) and "N − 2 = 66" in first.checked
    assert "p-does-not-follow" in second.codes and "earlier in the text" in second.message
    # no df anywhere: recomputed over every df a t may have (df = 1 gives p = .064, the normal .000): p = .50 follows under none
    assert _p_findings(third) == {"p-does-not-follow"} and "over every df it may have" in third.checked and "under no df" in third.message
    (fourth,) = audit_units([Unit("p4", "Without any sample size, t = 2.40, p = .030.")])  # (15 df give .030, scipy: no claim)
    assert not _p_findings(fourth) and "over every df it may have" in fourth.checked


def test_a_p_that_fits_other_df_than_the_guessed_ones_is_a_warning_naming_them():
    """A t without df on a subgroup: the N earlier in the text (here a χ²'s own) gives df of 78 or 79, its p fits neither
    but fits the subgroup's df — a warning naming the df that fit (each checked here with scipy), not an error; a p
    that no df gives stays an error."""
    rng = np.random.default_rng(5)
    for _ in range(25):
        df, t = int(rng.integers(3, 40)), float(rng.uniform(1.7, 3.5))
        p = _p2(round(t, 2), df)
        if abs(p - _p2(round(t, 2), 78)) < 0.01:
            continue  # (too close to the guessed df's p to tell apart at three decimals)
        text = f"{p:.3f}".lstrip("0")
        units = [Unit("p1", "Smokers were more often men, χ²(1, N = 80) = 4.20, p = .040."),
                 Unit("p2", f"Among the smokers, anxiety was higher in those who had tried to stop, t = {t:.2f}, p = {text}.")]
        entry = next(e for e in audit_units(units) if e.found.startswith("t"))
        assert entry.codes == ["df-unstated"] and entry.severity == "warning", (t, df, entry.message)
        fit = re.search(r"df = (\d+) would|df from (\d+) to (\d+) would", entry.message)
        low, high = (int(fit.group(1)),) * 2 if fit.group(1) else (int(fit.group(2)), int(fit.group(3)))
        assert low <= df <= high and "N earlier in the text" in entry.message
        assert entry.comment().startswith("Warning: The statistic gives no df") and "Suggested" not in entry.comment()  # (the text as typed)
        value, reported = float(f"{t:.2f}"), float(text)
        for k in (low - 1, high + 1):  # the df just outside the range named do not give the printed p from the printed t
            if k >= 1:
                ps = sorted(_p2(value + s, k) for s in (-0.005, 0.005))
                assert ps[1] < reported - 0.0005 or ps[0] > reported + 0.0005, (k, ps, reported)
    # a subgroup's two-sided p that fits a one-sided test under the df guessed from a small N (5: df 3 or 4) is the
    # subgroup's (df 11 gives it two-sided), not a one-sided test — unless the text says the test was one-tailed
    p = f"{_p2(2.10, 11):.2f}".lstrip("0")
    assert f"{stats.t.sf(2.10, 3):.2f}" == f"{_p2(2.10, 11):.2f}"  # (the one-sided p of df 3 prints alike)
    for tail, codes in (("", ["df-unstated"]), (", one-tailed", [])):
        entry = audit_units([Unit("p1", "Five pilots took part (N = 5)."), Unit("p2", f"Later, in a second group, t = 2.10, p = {p}{tail}.")])[0]
        assert entry.codes == codes, (tail, entry.codes, entry.message)
    (impossible,) = audit_units([Unit("p3", "In all (N = 80), scores rose, t = 2.10, p = .300.")])  # no df gives .300 from 2.10
    assert impossible.codes[0] == "p-does-not-follow" and impossible.severity == "error"


def test_a_tables_df_are_guessed_from_the_text_above_it_only_as_a_guess(tmp_path):
    """A table of t's without df (their p from scipy on 28 df: a subgroup of 30) right below body text, not a caption:
    a χ²'s own N in that text ("χ²(1, N = 80)") is that test's sample and gives the table nothing — it had given df 78
    and two errors; a plain N there is a guess, so a p that fits other df is a warning naming them (df-unstated); a
    table's own caption ("Table 2 … (N = 80)") still makes the error."""
    rows = [("Measure", "t", "p"), ("Anxiety", "2.10", f"{_p2(2.10, 28):.3f}"), ("Sleep", "1.20", f"{_p2(1.20, 28):.3f}")]
    chi = "Smokers were more often men, χ²(1, N = 80) = 4.20, p = .040. Among the smokers, scores were compared."
    cases = ((chi, [[], []]), ("All 80 took part (N = 80); among the smokers, scores were compared.", [["df-unstated"]] * 2),
             ("Table 2 Comparisons of the smokers (N = 80)", [["p-does-not-follow"]] * 2))
    for k, (caption, codes) in enumerate(cases):
        entries = [e for e in audit_file(_doc(tmp_path / f"t{k}.docx", tables=[(caption, rows)])) if e.found.startswith("t")]
        assert [e.codes for e in entries] == codes, (caption, [(e.codes, e.message) for e in entries])
        if codes[0] == ["df-unstated"]:
            assert all(re.search(r"df (?:= 28|from \d+ to \d+) would", e.message) for e in entries) and "in the text above the table" in entries[0].message
            assert all(int(a) <= 28 <= int(b) for e in entries for a, b in re.findall(r"df from (\d+) to (\d+) would", e.message))
    # LaTeX's \caption is the table's own too (the table environment's first paragraph)
    cells = " \\\\\n".join(" & ".join(row) for row in rows)
    tex = tmp_path / "t.tex"
    tex.write_text("Scores were compared.\n\n\\begin{table}\n\\caption{Comparisons of the smokers (N = 80)}\n"
                   f"\\begin{{tabular}}{{lrr}}\n{cells} \\\\\n\\end{{tabular}}\n\\end{{table}}\n", encoding="utf-8")
    assert [e.codes for e in audit_file(tex) if e.found.startswith("t")] == [["p-does-not-follow"]] * 2
    # and pandoc's "Table: …", typed under its Markdown table (it had been read as a note: no N, nothing checked)
    md = tmp_path / "t.md"
    pipe = "\n".join("| " + " | ".join(row) + " |" for row in rows[:1] + [("---",) * 3] + rows[1:])
    md.write_text(f"Scores were compared.\n\n{pipe}\n\nTable: Comparisons of the smokers (N = 80)\n", encoding="utf-8")
    assert [e.codes for e in audit_file(md) if e.found.startswith("t")] == [["p-does-not-follow"]] * 2


def test_one_tailed_said_in_the_sentence_is_a_note():
    p1 = stats.t.sf(1.80, 40)
    units = [Unit("p1", f"As predicted, t(40) = 1.80, p = {p1:.3f}, one-tailed."), Unit("p2", f"Scores rose, t(40) = 1.80, p = {p1:.3f}.")]
    said, unsaid = audit_units(units)
    assert not _p_findings(said) and "one-sided" in said.notes[0]
    assert _p_findings(unsaid) == {"one-sided"}


def test_f_below_one_and_line_breaks():
    units = [Unit("p1", "The interaction was not reliable, F (1, 56) < 1, n.s., nor was the main effect, F (1,\n56) = 0.50, p = .48."),
             Unit("p2", "Reliable, F(1, 56) < 1, p < .01.")]
    below, broken, wrong = audit_units(units)
    assert not _p_findings(below) and below.checked.endswith("to 1")
    assert broken.found.startswith("F (1,\n56) = 0.50") and not _p_findings(broken)
    assert "p-does-not-follow" in wrong.codes  # an F below 1 can never give p < .01


def test_a_statistic_given_as_a_bound_keeps_it_in_every_suggestion():
    """Authors write an F below 1 as "F < 1" (practice; the PLOS ONE table of tests/real_typings.py, source pmc4476782,
    prints "F (1,56) < 1 | η2 = .002 | n.s."). Read on such typings, the audit had suggested "F(1, 56) = 1, p = .661":
    the bound turned into a value, a p made up from it (the midpoint of the p values the bound allows), and a decimals
    finding on the bound's "1". The suggestion and the tracked change now keep the operator and print no p the text
    did not give (a p the audit doubts gives way to the p the bound allows, said so); the bound is no rounding to find
    decimals in; a p that cannot follow is still found."""
    units = [Unit("p1", "The sound factor had no effect, F (1,56) < 1, η2 = .002, n.s."), Unit("p2", "The effect: F(1,56)<1."),
             Unit("p3", "Reliable, F(1, 56) < 1, p < .01."), Unit("p4", "Also F(1, 56) < 1, p = .45.")]
    entries = audit_units(units, suggest_all=True, restyle=True)
    suggestions = [e.suggestion for e in entries]
    # p3's "p < .01" cannot follow from any F below 1: its suggestion gives the p the bound allows, rounded outwards so
    # that it stays true (scipy: P(F(1, 56) > 1) = .3216, so "p > .321"), and says where it comes from
    assert stats.f.sf(1, 1, 56) > 0.321
    # p1's "n.s." is made the p the bound allows too (the style asks for a p; a bound gives that one), said so
    assert suggestions == ["F(1, 56) < 1, p > .321, η² = .00 (p from the bound)", "F(1, 56) < 1",
                           "F(1, 56) < 1, p > .321 (p from the bound)", "F(1, 56) < 1, p = .45"], suggestions
    revisions = [e.revision.plain() if e.revision is not None else None for e in entries]
    assert revisions == [None, "F(1, 56) < 1", None, None], revisions  # p1: the style's two decimals would make η2 = .002 zero
    assert "round a number to zero" in entries[0].kept
    assert not any(re.search(r"(?<![\d.])1 \(2 wanted\)", e.message) for e in entries), [e.message for e in entries]
    assert "spacing" in entries[1].codes and "p-does-not-follow" in entries[2].codes
    above = audit_units([Unit("p1", "Large, F(2, 40) > 10, p = .20.")], suggest_all=True)[0]  # P(F(2, 40) > 10) = .0003
    assert stats.f.sf(10, 2, 40) < 0.001 and above.suggestion == "F(2, 40) > 10, p < .001 (p from the bound)"


def test_a_named_procedure_excuses_only_a_p_larger_than_the_unadjusted():
    """Every multiple-comparison adjustment makes p larger (Bonferroni: p·m; Holm, Šidák, Tukey, Scheffé alike), so a
    p below the unadjusted one is wrong whatever the paragraph names (practice; the definitions of the procedures)."""
    unadjusted = _p2(2.52, 17)
    larger = min(1.0, 3 * unadjusted)
    units = [Unit("p1", f"Comparisons were Bonferroni-corrected: t(17) = 2.52, p = {larger:.3f}."),
             Unit("p2", "Comparisons were Bonferroni-corrected: t(17) = 2.52, p < .001.")]
    excused, wrong = audit_units(units)
    assert not _p_findings(excused) and "adjusted" in excused.notes[0]
    assert "p-does-not-follow" in wrong.codes
    # a correction said without naming the procedure ("after correction for multiple comparisons", "multiple-comparison
    # correction") is an adjustment too (it had drawn a "p does not follow")
    for said in ("after correction for multiple comparisons", "(multiple-comparison correction applied)", "correcting for multiple tests"):
        (e,) = audit_units([Unit("p3", f"t(17) = 2.52, p = {larger:.3f} {said}.")])
        assert not _p_findings(e) and "adjusted" in e.notes[0], said


def test_a_new_study_does_not_take_the_n_of_the_one_before():
    """A multi-study paper: "N = 200" in Study 1, then under the heading "Study 2" a t without df on 27 students; the t
    had been recomputed on 198 df from Study 1's N and flagged (its p, .046, is Welch's or Student's on 25 df, scipy).
    A heading or paragraph that begins another study ("Study 2", "Experiment 3", "In Study 2, …") ends the N before."""
    from statsetter.audit.reading import Unit
    from statsetter.audit.report import audit_units

    assert f"{_p2(2.10, 25):.3f}" == "0.046"
    before = [Unit("p1", "In Study 1, 200 adults took part (N = 200).", None, "", 1)]
    result = [Unit("p3", "Twenty-seven students took part. The groups differed, t = 2.10, p = .046.", None, "", 3)]
    for heading in ("Study 2", "Experiment 2: Method", "In Study 2, students took part."):
        (e,) = audit_units(before + [Unit("p2", heading, None, "", 2)] + result)
        assert e.codes == [] and "over every df it may have" in e.checked and "198" not in e.checked, heading
    (e,) = audit_units(before + result)  # no new study said: the N before is the sample's, as before
    assert "N − 2 = 198" in e.checked


def test_a_p_from_another_method_is_noted_not_checked():
    """A p said to come from another method than the statistic's distribution — Fisher's exact test beside a χ² (as
    medical papers give it for small cells), a permutation, bootstrap or Monte Carlo p — cannot be recomputed from the
    statistic: a note, not a finding (it had been an error with a changed verdict). "exact p" alone is an exactly
    printed p, still checked. Numbers: scipy's Fisher exact test and χ² on one 2 × 2 table of our own."""
    table = [[12, 4], [6, 14]]
    chi2 = stats.chi2_contingency(table, correction=False).statistic
    fisher = stats.fisher_exact(table).pvalue
    asymptotic = stats.chi2.sf(chi2, 1)
    assert abs(fisher - asymptotic) > 0.002  # the two p's differ beyond the printed precision
    base, p = f"χ²(1, N = 36) = {chi2:.2f}", f"{fisher:.3f}".lstrip("0")
    for said in (f", p = {p} (Fisher's exact test)", f", Fisher's exact p = {p}", f", permutation p = {p}"):
        (e,) = audit_units([Unit("a", base + said)])
        assert "p-does-not-follow" not in e.codes and "another method" in e.notes[0], said
    (e,) = audit_units([Unit("b", f"{base}, exact p = {p}")])
    assert "p-does-not-follow" in e.codes


def test_decimal_commas_are_read_as_typed_and_said():
    """A manuscript typed with decimal commas (as in German, French or Dutch practice) is read as typed: the p is
    checked, and against APA 7 (a decimal point) each comma is a style finding; the choice is said."""
    from pathlib import Path

    from statsetter.audit.report import reading_mark
    from statsetter.style.profile import load_style

    p = _p2(2.14, 38)
    text = f"Die Gruppen unterschieden sich, t(38) = 2,14; p = {p:.3f}".replace(".", ",") + "; d = 0,68. Ohne Unterschied: t(38) = 0,50; p = 0,02."
    units = [Unit("p1", text)]
    mark, said = reading_mark(units, load_style("apa7"))
    assert mark == "," and "decimal commas" in said
    first, second = [e for e in audit_units(units) if e.found.startswith("t")]
    assert not _p_findings(first) and "decimal-mark" in first.codes and "2,14" in first.checked
    assert "p-does-not-follow" in second.codes
    comma_style = Path(__file__).parent / "styles" / "comma.toml"
    assert "decimal-mark" not in audit_units(units, str(comma_style))[0].codes  # the style itself has decimal commas
    forced = audit_units(units, decimal_mark=".")[0]  # asked to read points: "2,14", which no thousands group explains, is a
    assert "t(38) = 2,14:" in forced.checked and "decimal-mark" in forced.codes  # decimal comma typed by slip (it had been the number 2)


def test_a_procedure_named_in_the_tables_note_excuses_its_p(tmp_path):
    """Post hoc rows whose note says the p values are Tukey-adjusted: an adjusted p (larger than the unadjusted one)
    is a note, not a finding; the same table without the note gives a finding."""
    unadjusted = _p2(2.60, 40)
    rows = [("Pair", "t", "df", "p"), ("A vs B", "2.60", "40", f"{min(1, 2.4 * unadjusted):.3f}")]

    def entry(note):
        d = docx.Document()
        d.add_paragraph("Table 5 Pairwise comparisons")
        t = d.add_table(rows=2, cols=4)
        for i, row in enumerate(rows):
            for j, cell in enumerate(row):
                t.cell(i, j).text = cell
        d.add_paragraph(note)
        d.save(str(tmp_path / "n.docx"))
        return next(e for e in audit_file(tmp_path / "n.docx") if e.found.startswith("t"))

    excused = entry("Note. p values are adjusted by Tukey's HSD.")
    assert not _p_findings(excused) and any("Tukey" in n for n in excused.notes)
    assert "p-does-not-follow" in entry("Note. Two-sided tests.").codes


def test_a_spearman_p_from_rs_cor_test_is_noted_not_flagged():
    """R's cor.test gives Spearman's ρ without ties an exact p (up to 9 pairs) or AS 89's (up to 1,290), not the t
    approximation SPSS prints: ρ = .60 on the 9 pairs of R's help-page example (Hollander & Wolfe) has R's p .097
    against the t approximation's .088. Both are accepted; R's is a note saying so (it had been an error); a p neither
    gives is still an error. Numbers: scipy's spearmanr on the example's data, R's p by enumeration
    (tests/test_pvalues.py)."""
    x = [44.4, 45.9, 41.9, 53.3, 44.7, 44.1, 50.7, 45.2, 60.1]
    y = [2.6, 3.1, 2.5, 5.0, 3.6, 4.0, 5.2, 2.8, 3.8]
    rho, t_p = stats.spearmanr(x, y)
    counts = {}
    for perm in itertools.permutations(range(9)):
        s = sum((i - v) ** 2 for i, v in enumerate(perm))
        counts[s] = counts.get(s, 0) + 1
    r_p = 2 * sum(c for s, c in counts.items() if s <= 48) / math.factorial(9)
    base = f"r_s(7) = {rho:.2f}"
    (r,) = audit_units([Unit("r", f"{base}, p = {r_p:.3f}".replace("0.", "."))])
    assert _p_findings(r) == set() and "R's cor.test" in r.notes[0], r.notes
    (t,) = audit_units([Unit("t", f"{base}, p = {t_p:.3f}".replace("0.", "."))])
    assert _p_findings(t) == set() and t.notes == ()
    (wrong,) = audit_units([Unit("w", f"{base}, p = .020")])
    assert "p-does-not-follow" in wrong.codes and wrong.notes == ()


# Table 2 of an article in Int J Environ Res Public Health 2021;18(22):12096 (doi:10.3390/ijerph182212096, PMC8622160,
# as PubMed Central prints the table): correlations of age, depression, anxiety and reaction times in the anxious group,
# M and SD first, the columns headed by the variables' numbers, marks of significance with a space before them, N and the
# marks in the note
_IJERPH_ROWS = [
    ["Variables", "M", "SD", "1", "2", "3", "4", "5", "6", "7", "8"],
    ["1. GAD", "11.1", "4.49"],
    ["2. Age", "20.9", "2.55", "−0.14"],
    ["3. BDI", "19.2", "10.83", "0.47 ***", "−0.15"],
    ["4. Happy face, self-shape RTs", "694.5", "86.5", "−0.10", "0.07", "−0.16"],
    ["5. Neutral face, self-shape RTs", "706.7", "99.46", "−0.11", "0.15", "−0.11", "0.73 ***"],
    ["6. Sad face, self-shape RTs", "715.1", "92.49", "0.06", "0.02", "−0.02", "0.72 ***", "0.64 ***"],
    ["7. Happy face, other-shape RTs", "723", "109.91", "−0.09", "−0.04", "−0.07", "0.52 ***", "0.55 ***", "0.40 **"],
    ["8. Neutral face, other-shape RTs", "720.2", "105.13", "0.02", "−0.03", "−0.13", "0.51 ***", "0.45 ***", "0.41 ***", "0.81 ***"],
    ["9. Sad face, other-shape RTs", "740.4", "108.64", "0.18", "−0.27 *", "−0.00", "0.47 ***", "0.36 **", "0.41 ***", "0.75 ***", "0.81 ***"],
]
_IJERPH_NOTE = ("Note. N = 60; M: mean; SD: standard deviation; * p < 0.05, ** p < 0.01, *** p < 0.001 (two-tailed tests). "
             "1: Depression is a confounding variable which influences emotion perception [4].")


def test_a_correlation_matrix_with_marks_of_significance(tmp_path):
    """A correlation matrix as psychology papers print it (IJERPH 2021, Table 2, above): each coefficient with a
    mark is r(N − 2) with the mark's bound for its p — all 17 of the table's marked coefficients read, none flagged (the
    closest, r = .41 with ***, gives p from .00099 to .0013 on 58 df); its unmarked ones, and its M and SD, are not
    read. The same table with one coefficient retyped (.40 ** as .20 **, p .13) is flagged; with two N's in the note
    (subsamples) nothing is read. Before, none of it was read. Reference: scipy's t distribution for r's p."""
    rows = [r + [""] * (11 - len(r)) for r in _IJERPH_ROWS]
    caption = "Table 2. Correlations between age, depression, anxiety, and reaction times in the anxious group."
    entries = audit_file(_doc(tmp_path / "matrix.docx", tables=[(caption, rows)], note=_IJERPH_NOTE))
    read = [e for e in entries if "correlation coefficient" in " ".join(e.notes)]
    marked = sum(1 for r in _IJERPH_ROWS[1:] for cell in r[3:] if "*" in cell)
    assert marked == 17 and len(read) == 17 and all(e.codes == [] for e in read), [(e.found, e.codes) for e in read]
    closest = next(e for e in read if e.found.startswith("r(58) = 0.41"))
    lo, hi = (_p2(r * (58 / (1 - r * r)) ** 0.5, 58) for r in (0.415, 0.405))
    assert lo < 0.001 < hi and "p < 0.001" in closest.found
    assert not any("11.1" in e.found or "−0.14" in e.found for e in entries)
    wrong = [list(r) for r in rows]
    wrong[7][8] = "0.20 **"
    flagged = [e for e in audit_file(_doc(tmp_path / "wrong.docx", tables=[(caption, wrong)], note=_IJERPH_NOTE)) if e.codes]
    assert [e.found for e in flagged] == ["r(58) = 0.20, p < 0.01"] and "p-does-not-follow" in flagged[0].codes
    two = _IJERPH_NOTE.replace("N = 60;", "N = 60 (session 1) and N = 52 (session 2);")
    assert not [e for e in audit_file(_doc(tmp_path / "two.docx", tables=[(caption, rows)], note=two)) if "correlation coefficient" in " ".join(e.notes)]
    # a model table headed by its models' numbers, its rows named by predictors, is no matrix: its β's are not r's
    model = [["Predictor", "1", "2"], ["Age", ".25**", ".20*"], ["Sleep", "", "−.10"]]
    assert audit_file(_doc(tmp_path / "model.docx", tables=[("Table 3. Hierarchical regression (N = 120)", model)],
                           note="Note. Standardized coefficients. *p < .05. **p < .01.")) == []


def test_a_tables_marks_of_significance_its_note_does_not_define(tmp_path):
    """APA 7 §7.14: a table's asterisks are defined in its probability note. IJERPH 2021's Table 2 (above) with its note
    raises nothing; the same table without its note had been silent — its marked coefficients not read, nothing said —
    and is now said to use *, ** and *** undefined (style), on its first marked cell; with a note defining * and ** only,
    *** is said. A p column's own marks are not asked (a p says its level), nor marks the note defines in other words."""
    rows = [r + [""] * (11 - len(r)) for r in _IJERPH_ROWS]
    caption = "Table 2. Correlations between age, depression, anxiety, and reaction times in the anxious group."
    assert not any("marks-undefined" in e.codes for e in audit_file(_doc(tmp_path / "m.docx", tables=[(caption, rows)], note=_IJERPH_NOTE)))
    (bare,) = audit_file(_doc(tmp_path / "bare.docx", tables=[(caption, rows)], note="Note. N = 60; M: mean; SD: standard deviation."))
    assert bare.codes == ["marks-undefined"] and bare.found == "0.47 ***" and "with *, **, ***, which" in bare.message, (bare.found, bare.message)
    inside = rows + [[_IJERPH_NOTE] + [""] * 10]  # (the note typed in the table's last row, as some authors do, defines them too,
    entries = audit_file(_doc(tmp_path / "in.docx", tables=[(caption, inside)], note=""))  # and its marked coefficients are read with it)
    assert not any("marks-undefined" in e.codes for e in entries)
    assert sum("correlation coefficient" in " ".join(e.notes) for e in entries) == 17 and all(e.codes == [] for e in entries)
    part = _IJERPH_NOTE.replace(", *** p < 0.001", "")
    (partial,) = [e for e in audit_file(_doc(tmp_path / "part.docx", tables=[(caption, rows)], note=part)) if "marks-undefined" in e.codes]
    assert "with ***, which" in partial.message
    ps = [["Measure", "t", "p"], ["Anxiety", "3.10", ".004**"], ["Sleep", "2.30", ".027*"]]
    assert [e.codes for e in audit_file(_doc(tmp_path / "p.docx", tables=[("Table 1. Comparisons (df = 38)", ps)], note="Note. Two-tailed tests."))] == [[], []]
    worded = [["Measure", "B", "SE"], ["Age", "0.25†", "0.05"], ["Sleep", "−0.10", "0.04"]]
    assert not any("marks-undefined" in e.codes for e in audit_file(_doc(tmp_path / "w.docx", tables=[("Table 3. Model", worded)], note="Note. † Adjusted for sex.")))


def test_a_tables_marked_statistic_has_its_marks_bound_for_a_p(tmp_path):
    """A t in a table's t column with a mark the note defines ("3.10**" with "**p < .01"), and no p column, is checked
    against the mark's bound — a t(38) of 1.20 marked * (p .24) is flagged; before, the mark was dropped and nothing
    was checked. The note's definitions are not themselves read as reported p's (a "†p < .10" had been a p-threshold
    style finding). Numbers: scipy's t distribution."""
    rows = [["Measure", "t", "df"], ["Anxiety", "3.10**", "38"], ["Sleep", "1.20*", "38"], ["Energy", "2.10†", "38"], ["Mood", "0.80", "38"],
            ["Focus", "1.90 ^", "38"]]
    entries = audit_file(_doc(tmp_path / "t.docx", tables=[("Table 1. Comparisons of the two shifts", rows)],
                              note="Note. †p < .10. *p < .05. **p < .01. ^ p < .07."))
    by = {e.found: e for e in entries}
    assert _p2(3.10, 38) < 0.01 and _p2(2.10, 38) < 0.10 < _p2(1.20, 38)
    assert by["t(38) = 3.10, p < .01"].codes == [] and by["t(38) = 2.10, p < .10"].codes == []
    assert "p-does-not-follow" in by["t(38) = 1.20, p < .05"].codes
    assert _p2(1.90, 38) < 0.07 and by["t(38) = 1.90, p < .07"].codes == []  # ("^", as some journals mark p < .10)
    assert "t(38) = 0.80" in by and set(by) == {"t(38) = 3.10, p < .01", "t(38) = 1.20, p < .05", "t(38) = 2.10, p < .10", "t(38) = 0.80",
                                                "t(38) = 1.90, p < .07"}
    # t(38) = 1.80 gives p = .080, half of it .040: a one-sided fit — a note where the table's note says one-tailed
    assert _p2(1.80, 38) / 2 < 0.05 < _p2(1.80, 38)
    rows = [["Measure", "t", "df"], ["Anxiety", "1.80*", "38"]]
    (one,) = audit_file(_doc(tmp_path / "one.docx", tables=[("Table 2. Comparisons", rows)], note="Note. *p < .05, one-tailed."))
    (two,) = audit_file(_doc(tmp_path / "two.docx", tables=[("Table 2. Comparisons", rows)], note="Note. *p < .05."))
    assert one.codes == [] and "one-tailed" in one.notes[-1] and two.codes == ["one-sided"]


def test_the_terminal_summary_counts_each_kind_of_note_for_what_it_is(tmp_path, capsys):
    """The terminal's summary had counted every statistic with a note as "read as adjusted by a procedure": a table's
    statistics (each noted with the columns it was read from) and a one-tailed or Spearman note were all called
    adjusted. Each kind of note is counted for what it says; a table's reading is none of them."""
    from statsetter.audit.report import print_table

    rows = [r + [""] * (11 - len(r)) for r in _IJERPH_ROWS]
    entries = audit_file(_doc(tmp_path / "m.docx", tables=[("Table 2. Correlations", rows)], note=_IJERPH_NOTE))
    print_table(entries)
    out = " ".join(capsys.readouterr().out.split())
    assert "17 statistics found, 0 with findings" in out and "adjusted" not in out
    t = 2.10
    units = [Unit("a", f"With Bonferroni-adjusted p values, t(38) = {t:.2f}, p = .30."),
             Unit("b", f"The effect was in the expected direction, t(38) = {t:.2f}, p = {_p2(t, 38) / 2:.3f}, one-tailed.")]
    print_table(audit_units(units))
    out = " ".join(capsys.readouterr().out.split())
    assert "1 p value(s) read as adjusted by a procedure their text names" in out
    assert "1 p value(s) fitting a one-sided test, as the text says" in out


# Table 4 of "Computerized adaptive testing to screen children for emotional and behavioral problems by preventive child
# healthcare", BMC Pediatrics 2020 (doi:10.1186/s12887-020-2018-1; CC BY), as the journal's site prints it: Spearman
# correlations of four screening scales with four CBCL scales, each marked "*P < 0.01", beside counts and percentages
_BMC_ROWS = [
    ["Psycat scales", "Elevated Psycat scores", "CBCL", "", "", ""],
    ["", "N (%)", "Total", "Externalizing", "Internalizing", "Hyperactivity"],
    ["Total", "75 (16.3)", "0.72*", "0.59*", "0.55*", "0.66*"],
    ["Externalizing", "81 (17.6)", "0.54*", "0.63*", "0.34*", "0.43*"],
    ["Internalizing", "66 (14.3)", "0.50*", "0.30*", "0.59*", "0.31*"],
    ["Hyperactivity", "90 (19.5)", "0.39*", "0.32*", "0.16*", "0.65*"],
]
_BMC_CAPTION = ("Table 4 Validity: numbers and percentages of children with elevated Psycat scores and Spearman correlations "
                "for Psycat scores and CBCL scores (n = 181)")


def test_a_table_of_correlations_between_two_sets_of_scales(tmp_path):
    """A table whose caption calls its contents correlations, one set of scales against another (BMC Pediatrics 2020,
    Table 4, above): each marked coefficient is read as Spearman's r_s(n − 2) with the mark's bound — all 16, and none of
    the counts beside them. Checked with the caption's n = 181, one is flagged: r_s = .16 gives p from .026 to .036
    (scipy), not below .01. The percentages beside the counts are of about 460 children (75 is 16.3%), on which .16
    would give p < .001: a reason to look at which n the coefficients have, as every finding is — not a verdict on the
    article. The same table whose caption names partial correlations is not read."""
    entries = audit_file(_doc(tmp_path / "bmc.docx", tables=[(_BMC_CAPTION, _BMC_ROWS)], note="*P < 0.01"))
    read = [e for e in entries if "correlation coefficient" in " ".join(e.notes)]
    assert len(read) == 16 and all(e.found.startswith("rs(179) = ") for e in read), [e.found for e in read]
    expected = {f"{v:.2f}" for r in _BMC_ROWS[2:] for v in (float(c.rstrip("*")) for c in r[2:])
                if 2 * stats.t.sf((v + 0.005) * ((179 / (1 - (v + 0.005) ** 2)) ** 0.5), 179) >= 0.01}
    assert expected == {"0.16"}
    assert [e.found for e in read if e.codes] == ["rs(179) = 0.16, p < 0.01"]
    assert not any("(16.3)" in e.found or "75" in e.found for e in entries)
    partial = _BMC_CAPTION.replace("Spearman correlations", "partial correlations")
    assert not [e for e in audit_file(_doc(tmp_path / "p.docx", tables=[(partial, _BMC_ROWS)], note="*P < 0.01")) if e.notes]


def test_markdowns_escapes_and_a_notes_own_paragraphs(tmp_path):
    """Markdown escapes a literal asterisk ("\\*p < .05", ".74\\*\\*\\*": pandoc and statsetter's own Markdown write
    them so) and APA sets a table's probability note in a paragraph of its own after the general note: the escapes
    had been read as typed (a backslash, and "*p*" not as the italic p it prints), so the marks were not defined
    and not read; now the Markdown table reads as its LaTeX does (statsetter's demo tables: tests/test_demo.py)."""
    md = ("Table 1\n\nComparisons of the two shifts\n\n| Measure | t | df |\n|---|---|---|\n| Anxiety | 3.10\\*\\* | 38 |\n"
          "| Sleep | 1.20\\* | 38 |\n\n*Note.* Invented numbers.\n\n\\**p* < .05. \\*\\**p* < .01.\n")
    (tmp_path / "t.md").write_text(md, encoding="utf-8")
    by = {e.found: e.codes for e in audit_file(tmp_path / "t.md")}
    assert by == {"t(38) = 3.10, p < .01": [], "t(38) = 1.20, p < .05": ["p-does-not-follow", "verdict-changes"]}, by


# Table 7 of "Normative data and psychometric properties of the strengths and difficulties questionnaire among Japanese
# school-aged children", Child Adolesc Psychiatry Ment Health 2014, 8:1 (doi:10.1186/1753-2000-8-1; CC BY), as the journal's
# site prints it: Spearman's ρ of six SDQ scales with eleven CBCL scales, in a block for each rater, each block under a row
# that names its sample (n = 46 parents, n = 29 teachers), marks defined in the note
_SDQ_H = ["CBCL", "Withdrawal problems", "Somatic complaints", "Anxiety/dep", "Social problems", "Thought problems", "Attention problems",
     "Delinquent behaviors", "Aggressive behavior", "Internalizing", "Externalizing", "Total"]
_SDQ_E = [""] * 11
_SDQ_ROWS = [_SDQ_H, ["SDQ"] + _SDQ_E, ["Parent rating (n = 46)"] + _SDQ_E,
    ["Total difficulties score", ".32*", ".44**", ".25", ".48**", ".23", ".62**", ".54**", ".43**", ".36*", ".51**", ".56**"],
    ["Emotional symptoms", ".40**", ".48**", ".44**", ".23", ".20", ".19", "-.03", ".07", ".52**", ".05", ".34*"],
    ["Conduct problems", ".19", ".21", ".16", ".06", ".00", ".37*", ".66**", ".50**", ".21", ".59**", ".39**"],
    ["Hyperactivity/inattention", ".06", ".27", ".00", ".35*", ".12", ".58**", ".49**", ".39**", ".09", ".44**", ".39**"],
    ["Peer problems", ".20", ".09", ".05", ".50**", ".13", ".32*", ".11", ".00", ".10", ".04", ".18"],
    ["Prosocial behavior", "-.26", "-.15", "-.03", "-.07", "-.06", "-.27", "-.30*", "-.34*", "-.16", "-.37*", "-.21"],
    ["Teacher rating (n = 29)"] + _SDQ_E,
    ["Total difficulties score", ".44*", ".29", ".49**", ".75**", ".48**", ".82**", ".55**", ".68**", ".48**", ".68**", ".77**"],
    ["Emotional symptoms", ".23", ".57**", ".56**", ".37*", ".21", ".33", ".11", ".18", ".50**", ".18", ".36"],
    ["Conduct problems", ".24", ".05", ".18", ".60**", ".33", ".71**", ".66**", ".79**", ".22", ".80**", ".66**"],
    ["Hyperactivity/inattention", ".30", ".22", ".33", ".52**", ".36", ".74**", ".40*", ".62**", ".31", ".59**", ".66**"],
    ["Peer problems", ".46*", "-.05", ".31", ".75**", ".55**", ".66**", ".51**", ".53**", ".33", ".54**", ".64**"],
    ["Prosocial behavior", "-.34", "-.03", "-.15", "-.43*", "-.28", "-.44*", "-.14", "-.46*", "-.23", "-.40*", "-.40*"],
]
_SDQ_CAPTION = "Table 7 Correlations between the SDQ and CBCL for each rater (Spearman's rho)"
_SDQ_NOTE = ("Note. SDQ, strengths and difficulties questionnaire. CBCL, child behavioral checklist. The subsample from which parent "
        "ratings were obtained (n = 46) consisted of clinical patients (36 boys, mean age 8.0 ± 0.8). The subsample from which "
        "teacher ratings were obtained (n = 29) consisted of clinical patients (23 boys, mean age 7.9 ± 0.7). *p < 0.05, **p < 0.01.")


def test_a_correlation_table_in_blocks_each_with_its_own_n(tmp_path):
    """A table of correlations in blocks, each under a row naming its sample (Child Adolesc Psychiatry Ment Health 2014,
    Table 7, above: "Parent rating (n = 46)", "Teacher rating (n = 29)"): each marked coefficient is r_s(n − 2) with its
    block's n — all 69 read (30 on 44 df, 39 on 27), none flagged, as scipy's t distribution says of each at the
    printed precision; one retyped (.37* as .27*, p .15 on 27 df) is flagged. Before, the note's two n's had kept the
    table from being read at all."""
    import scipy.stats as st

    entries = audit_file(_doc(tmp_path / "sdq.docx", tables=[(_SDQ_CAPTION, _SDQ_ROWS)], note=_SDQ_NOTE))
    read = [e for e in entries if "correlation coefficient" in " ".join(e.notes)]
    assert len(read) == sum(1 for r in _SDQ_ROWS for c in r[1:] if "*" in c) == 69
    assert sum(e.found.startswith("rs(44) = ") for e in read) == 30 and sum(e.found.startswith("rs(27) = ") for e in read) == 39
    n = None
    for row in _SDQ_ROWS[2:]:
        n = int(row[0].split("= ")[1].rstrip(")")) if "(n = " in row[0] else n
        for cell in row[1:]:
            if "*" in cell:
                v, bound = abs(float(cell.rstrip("*"))) + 0.005, 0.05 if cell.count("*") == 1 else 0.01
                assert 2 * st.t.sf(v * ((n - 2) / (1 - v * v)) ** 0.5, n - 2) < bound, (cell, n)
    assert [e.codes for e in read if e.codes] == []
    wrong = [list(r) for r in _SDQ_ROWS]
    wrong[11][4] = ".27*"
    flagged = [e for e in audit_file(_doc(tmp_path / "wrong.docx", tables=[(_SDQ_CAPTION, wrong)], note=_SDQ_NOTE)) if e.codes]
    assert [e.found for e in flagged] == ["rs(27) = .27, p < 0.05"] and "p-does-not-follow" in flagged[0].codes


# R's summary of lm(mpg ~ wt + hp, data = mtcars), as published with its output (selva86.github.io, "Interpret lm()
# Output: Every Number Explained": https://raw.githubusercontent.com/selva86/selva86.github.io/master/Interpreting-Regression-Output-Completely.html)
_R_COEFFICIENTS = [["", "Estimate", "Std. Error", "t value", "Pr(>|t|)"], ["(Intercept)", "37.22727", "1.59879", "23.285", "< 2e-16 ***"],
                   ["wt", "-3.87783", "0.63273", "-6.129", "1.12e-06 ***"], ["hp", "-0.03177", "0.00903", "-3.519", "0.00145 **"]]
_R_NOTE = "Residual standard error: 2.593 on 29 degrees of freedom. F-statistic: 69.21 on 2 and 29 DF, p-value: 9.109e-12"


def test_a_coefficients_table_as_r_statsmodels_and_stata_head_it(tmp_path):
    """A model's coefficients pasted from R ("Estimate", "Std. Error", "t value", "Pr(>|t|)"; p values such as
    "1.12e-06") or statsmodels and Stata ("coef", "std err", "t", "P>|t|"): each t is read with its p and checked
    against its row's estimate / SE, and against its p under the residual df R prints below the table ("on 29
    degrees of freedom"). These heads had been unknown: no t was checked against its B and SE, and a p column
    "Pr(>|t|)" was not read. Numbers: R's published output (above); scipy agrees with its p for t(29) = −6.129
    (checked here); the wrong SE and p are mutations of ours. statsmodels' layout: its OLS on pingouin's penguins."""
    import pingouin as pg
    import statsmodels.formula.api as smf

    assert f"{_p2(-6.129, 29):.2e}" == "1.12e-06" and f"{_p2(-3.519, 29):.5f}" == "0.00145"
    found = audit_file(_doc(tmp_path / "r.docx", tables=[("Table 1\nFuel consumption by weight and horsepower", _R_COEFFICIENTS)], note=_R_NOTE))
    assert [e.found for e in found] == ["t = 23.285, p < 2e-16", "t = -6.129, p = 1.12e-06", "t = -3.519, p = 0.00145",
                                        "F-statistic: 69.21 on 2 and 29 DF, p-value: 9.109e-12"]  # (the note's F: R's line, read as ever)
    assert not _p_findings(found[3]) and all(not _p_findings(e) and "coefficient-does-not-fit" not in e.codes and "df = 29" in e.checked for e in found[:3]), [(e.codes, e.checked) for e in found]
    wrong = [row[:] for row in _R_COEFFICIENTS]
    wrong[2][2], wrong[3][4] = "0.73273", "0.0145 *"  # SE of wt, p of hp
    codes = {e.found: e.codes for e in audit_file(_doc(tmp_path / "w.docx", tables=[("Table 1\nFuel consumption", wrong)], note=_R_NOTE))}
    assert "coefficient-does-not-fit" in codes["t = -6.129, p = 1.12e-06"] and "p-does-not-follow" in codes["t = -3.519, p = 0.0145"]
    # the same table in Markdown as knitr's kable writes it, its "|" in the head as an HTML character reference (memory)
    pipe = ["|" + "|".join(["", "Estimate", "Std. Error", "t value", "Pr(>&#124;t&#124;)"]) + "|", "|:--|--:|--:|--:|--:|"]
    pipe += ["|" + "|".join(row[:4] + [row[4].replace(" ***", "").replace(" **", "")]) + "|" for row in _R_COEFFICIENTS[1:]]
    (tmp_path / "r.md").write_text("Table 1\n\nFuel consumption\n\n" + "\n".join(pipe) + f"\n\n{_R_NOTE}\n", encoding="utf-8")
    found = [e for e in audit_file(tmp_path / "r.md") if e.found.startswith("t")]
    assert [e.found for e in found] == ["t = 23.285, p < 2e-16", "t = -6.129, p = 1.12e-06", "t = -3.519, p = 0.00145"] and all(not e.codes for e in found)

    data = pg.read_dataset("penguins").dropna()
    fit = smf.ols("body_mass_g ~ flipper_length_mm + bill_length_mm", data).fit()
    rows = [["", "coef", "std err", "t", "P>|t|"]] + [[k, f"{fit.params[k]:.4f}", f"{fit.bse[k]:.3f}", f"{fit.tvalues[k]:.3f}", f"{fit.pvalues[k]:.3f}"]
                                                       for k in fit.params.index]
    found = audit_file(_doc(tmp_path / "s.docx", tables=[("Table 2\nBody mass", rows)]))
    assert len(found) == 3 and all(e.codes == [] for e in found), [(e.found, e.codes) for e in found]
    rows[2][3] = f"{fit.tvalues.iloc[1] * 1.2:.3f}"
    found = audit_file(_doc(tmp_path / "s2.docx", tables=[("Table 2\nBody mass", rows)]))
    assert "coefficient-does-not-fit" in found[1].codes and found[1].found.startswith("t = " + rows[2][3])


def test_a_t_value_or_f_value_named_so_is_read():
    """"t value = −6.13, df = 29" (R's name for the column) and "F-value", "z-value": read as t, F and z (they had
    not been read at all). Numbers: the R output above (wt's t and the model's F on 2 and 29 df)."""
    typed = "Weight lowered mileage, t value = −6.13, df = 29, p < .001, and the model fit, F-value = 69.21, df = 2, 29, p < .001."
    entries = audit_units([Unit("p", typed)])
    assert [(e.found, e.codes) for e in entries] == [("t value = −6.13, df = 29, p < .001", []), ("F-value = 69.21, df = 2, 29, p < .001", [])]
    assert "p-does-not-follow" in audit_units([Unit("p", "t-value = 6.13, df = 29, p = .04")])[0].codes
    assert [e.found for e in audit_units([Unit("p", "The t value was large, and a z-value of 2 is none.")])] == []


def test_an_anova_table_as_r_and_statsmodels_head_it(tmp_path):
    """R's summary of aov ("Df", "Sum Sq", "Mean Sq", "F value", "Pr(>F)", a Residuals row: the columns R's
    documentation of summary.aov names, https://rdrr.io/r/stats/summary.aov.html) and statsmodels' anova_lm
    ("df", "sum_sq", "mean_sq", "F", "PR(>F)"): each F with the residual row's df and its p. The p column had not
    been read. Numbers: an R output published in a gist (https://gist.github.com/3rdworldjuander/e4ad2acf64d6c4d9f8f5d2cfd1b67add:
    cprog, 16 and 1778 df, F = 2.726, p = 0.000256; scipy agrees, checked here) and statsmodels on pingouin's "anova"
    data; the p off by a decimal place is a mutation of ours."""
    import pingouin as pg
    import statsmodels.api as sm
    import statsmodels.formula.api as smf

    assert f"{stats.f.sf(2.726, 16, 1778):.6f}" == "0.000255"  # (0.0002554: the printed 0.000256 is within F's rounding)
    rows = [["", "Df", "Sum Sq", "Mean Sq", "F value", "Pr(>F)"], ["cprog", "16", "2.58", "0.16097", "2.726", "0.000256 ***"],
            ["Residuals", "1778", "105.01", "0.05906", "", ""]]
    (e,) = audit_file(_doc(tmp_path / "r.docx", tables=[("Table 3\nAnalysis of variance", rows)]))
    assert (e.found, e.codes) == ("F(16, 1778) = 2.726, p = 0.000256", [])
    rows[1][5] = "0.00256 **"
    (e,) = audit_file(_doc(tmp_path / "w.docx", tables=[("Table 3\nAnalysis of variance", rows)]))
    assert "p-does-not-follow" in e.codes
    data = pg.read_dataset("anova").rename(columns={"Hair color": "hair", "Pain threshold": "pain"})
    table = sm.stats.anova_lm(smf.ols("pain ~ C(hair)", data).fit())
    rows = [["", "df", "sum_sq", "mean_sq", "F", "PR(>F)"]] + [[k, f"{r.df:.1f}", f"{r.sum_sq:.3f}", f"{r.mean_sq:.3f}",
                                                                  "" if k == "Residual" else f"{r.F:.3f}", "" if k == "Residual" else f"{r['PR(>F)']:.4f}"]
                                                                 for k, r in table.iterrows()]
    (e,) = audit_file(_doc(tmp_path / "s.docx", tables=[("Table 4\nPain by hair colour", rows)]))
    assert e.codes == [] and e.found.startswith(f"F(3.0, 15) = {table.F.iloc[0]:.3f}, p = "), e.found


def test_a_t_test_table_whose_rows_name_the_test_beside_a_statistic_column(tmp_path):
    """A t-test table laid out with one "Statistic" column and the test named in each row ("Student's t", "Welch's
    t", "Mann-Whitney U"), as jamovi and JASP print theirs (practice; layout from memory): each value is that test's,
    with its row's df and p (none had been read). Numbers: pingouin's penguins, body mass by sex (scipy's and
    pingouin's tests, computed here); the p of .042 is a mutation of ours."""
    import pingouin as pg

    data = pg.read_dataset("penguins").dropna(subset=["sex", "body_mass_g"])
    a, b = (data.loc[data["sex"] == s, "body_mass_g"] for s in ("female", "male"))
    student, welch, ranks = stats.ttest_ind(a, b), stats.ttest_ind(a, b, equal_var=False), stats.mannwhitneyu(a, b)
    welch_df = pg.ttest(a, b, correction=True)["dof"].iloc[0]
    rows = [["", "", "Statistic", "df", "p"], ["Body mass", "Student's t", f"{student.statistic:.2f}", f"{len(a) + len(b) - 2}", "< .001"],
            ["", "Welch's t", f"{welch.statistic:.2f}", f"{welch_df:.1f}", "< .001"], ["", "Mann-Whitney U", f"{ranks.statistic:.1f}", "", "< .001"]]
    found = audit_file(_doc(tmp_path / "j.docx", tables=[("Table 5\nBody mass by sex", rows)]))
    assert [e.found for e in found] == [f"t({len(a) + len(b) - 2}) = {student.statistic:.2f}, p < .001", f"t({welch_df:.1f}) = {welch.statistic:.2f}, p < .001",
                                        f"U = {ranks.statistic:.1f}, p < .001"]
    assert all(e.codes == [] for e in found) and "t(331)" in found[0].checked
    rows[1][4] = ".042"
    assert "p-does-not-follow" in audit_file(_doc(tmp_path / "w.docx", tables=[("Table 5\nBody mass by sex", rows)]))[0].codes
    # SPSS's Descriptives table also heads a column "Statistic": its rows name no test, and nothing is read
    rows = [["", "", "Statistic", "Std. Error"], ["Body mass", "Mean", f"{data['body_mass_g'].mean():.2f}", f"{stats.sem(data['body_mass_g']):.2f}"],
            ["", "Skewness", f"{stats.skew(data['body_mass_g']):.3f}", "0.134"]]
    assert audit_file(_doc(tmp_path / "d.docx", tables=[("Table 6\nBody mass", rows)])) == []


def test_a_correlation_matrix_with_df_and_p_value_rows_under_each_coefficient(tmp_path):
    """jamovi's and JASP's correlation matrix: under each variable's "Pearson's r" row a "df" row and a "p-value" row
    (practice; layout from memory), as SPSS's has "Sig. (2-tailed)" and "N" rows: each coefficient is read with the df
    and p below it (they had not been read). Numbers: pingouin's penguins, scipy's pearsonr (computed here); the
    coefficient .056 is a mutation of ours."""
    import pingouin as pg

    data = pg.read_dataset("penguins").dropna(subset=["bill_length_mm", "flipper_length_mm", "body_mass_g"])
    names = {"bill_length_mm": "Bill", "flipper_length_mm": "Flipper", "body_mass_g": "Mass"}
    rows = [["", ""] + list(names.values())]
    for i, a in enumerate(names):
        blocks = [[names[a], "Pearson's r"], ["", "df"], ["", "p-value"]]
        for j, b in enumerate(names):
            r, p = stats.pearsonr(data[a], data[b])
            cells = [f"{r:.3f}", str(len(data) - 2), "< .001" if p < 0.001 else f"{p:.3f}"] if j < i else ["—"] * 3 if j == i else [""] * 3
            for block, cell in zip(blocks, cells):
                block.append(cell)
        rows += blocks
    found = audit_file(_doc(tmp_path / "c.docx", tables=[("Table 7\nCorrelations of the penguins' measures", rows)]))
    r = stats.pearsonr(data["bill_length_mm"], data["flipper_length_mm"])[0]
    assert len(found) == 3 and found[0].found == f"r({len(data) - 2}) = {r:.3f}, p < .001" and all(e.codes == [] for e in found)
    rows[4][2] = "0.056"
    found = audit_file(_doc(tmp_path / "w.docx", tables=[("Table 7\nCorrelations", rows)]))
    assert "p-does-not-follow" in found[0].codes and found[0].found.startswith("r(340) = 0.056")


def test_an_anova_tables_effect_size_column_is_checked_against_its_f(tmp_path):
    """An ANOVA table's effect size in a column of its own (SPSS's "Partial Eta Squared", "η²p", "η²") is read with
    its row's F and checked against it: η²p = F·df₁/(F·df₁ + df₂), and η² can only be smaller (it had not been read;
    a wrong η²p in a table passed). Numbers: pingouin's anova (np2) of its "anova" data, pain threshold by hair
    colour, computed here; .30 is a mutation of ours."""
    import pingouin as pg

    table = pg.anova(dv="Pain threshold", between="Hair color", data=pg.read_dataset("anova"), detailed=True)
    effect, error = table.iloc[0], table.iloc[1]
    rows = [["Source", "Type III Sum of Squares", "df", "Mean Square", "F", "Sig.", "Partial Eta Squared"],
            ["Hair color", f"{effect.SS:.3f}", f"{effect.DF}", f"{effect.MS:.3f}", f"{effect.F:.3f}", f"{effect['p_unc']:.3f}", f"{effect.np2:.3f}"],
            ["Error", f"{error.SS:.3f}", f"{error.DF}", f"{error.MS:.3f}", "", "", ""]]
    (e,) = audit_file(_doc(tmp_path / "a.docx", tables=[("Table 9\nPain threshold by hair colour", rows)]))
    assert e.codes == [] and e.found.endswith(f", η²p = {effect.np2:.3f}"), (e.found, e.codes)
    rows[1][6] = ".300"
    (e,) = audit_file(_doc(tmp_path / "w.docx", tables=[("Table 9\nPain threshold by hair colour", rows)]))
    assert e.codes == ["effect-does-not-fit"] and "η²p = .300 does not fit" in e.message
    rows[0][6], rows[1][6] = "η²", f"{effect.np2 + 0.05:.3f}"  # (η² cannot exceed η²p: with one factor they are equal)
    (e,) = audit_file(_doc(tmp_path / "e.docx", tables=[("Table 9\nPain threshold by hair colour", rows)]))
    assert e.codes == ["effect-does-not-fit"]
    # a real table: JASP's ANOVA published with its data (tests/real_typings.py, lboro-12017007), its η² column
    from real_typings import ITEMS, HELD_OUT, Table

    (jasp,) = [t for t in ITEMS + HELD_OUT if isinstance(t, Table) and t.caption == "ANOVA - OfficialScore"]
    rows = [list(r) for r in jasp.rows]
    found = audit_file(_doc(tmp_path / "j.docx", tables=[(f"Table 10\n{jasp.caption}", rows)]))
    assert [e.found for e in found] == ["F(1, 1165) = 8.410, p = 0.004, η² = 0.007", "F(1, 1165) = 1.586, p = 0.208, η² = 0.001",
                                        "F(1, 1165) = 0.525, p = 0.469, η² = 4.462e-4"]  # (JASP's "4.462e -4": a power of ten spaced)
    assert all(e.codes == [] for e in found)
    rows[1][6] = "0.070"  # (η²p is 8.410 / (8.410 + 1165) = .0072: η² cannot be .070)
    assert audit_file(_doc(tmp_path / "k.docx", tables=[(f"Table 10\n{jasp.caption}", rows)]))[0].codes == ["effect-does-not-fit"]


def test_a_one_sample_t_tables_cohens_d_is_checked_against_its_t(tmp_path):
    """A t table's "Cohen's d" column is read with its row's t; where the caption says the test is a one-sample test
    (one SD: d is t/√n) or the head names d_z, d is checked against t/√(df + 1). A paired test's "Cohen's d" may be
    d_z or d_av (pingouin's), and is left alone; so is an independent test's without group sizes. Numbers: JASP's
    published one-sample test (tests/real_typings.py, lboro-12017007: t(1168) = 10.663, d = 0.312), and pingouin's
    paired test of its rm_anova_wide data (its d_av, and d_z computed here); the wrong d's are mutations of ours."""
    import pingouin as pg
    from real_typings import HELD_OUT, ITEMS, Table

    (jasp,) = [t for t in ITEMS + HELD_OUT if isinstance(t, Table) and t.caption == "One Sample T-Test"]
    rows = [list(r) for r in jasp.rows]
    (e,) = audit_file(_doc(tmp_path / "j.docx", tables=[(f"Table 11\n{jasp.caption}", rows)]))
    assert (e.found, e.codes) == ("t(1168) = 10.663, p < .001, d = 0.312", [])
    rows[1][4] = "0.412"
    (e,) = audit_file(_doc(tmp_path / "k.docx", tables=[(f"Table 11\n{jasp.caption}", rows)]))
    assert e.codes == ["d-does-not-fit"] and "t/√1169" in e.message
    wide = pg.read_dataset("rm_anova_wide").dropna()
    first, last = wide.columns[0], wide.columns[-1]
    test = pg.ttest(wide[first], wide[last], paired=True)
    diff = wide[first] - wide[last]
    d_z = diff.mean() / diff.std()
    row = ["Scores", f"{test['T'].iloc[0]:.3f}", f"{int(test['dof'].iloc[0])}", f"{test['p_val'].iloc[0]:.3f}"]
    (e,) = audit_file(_doc(tmp_path / "p.docx", tables=[("Table 12\nPaired Samples T-Test", [["", "t", "df", "p", "Cohen's d"], row + [f"{test['cohen_d'].iloc[0]:.3f}"]])]))
    assert e.codes == [] and abs(test["cohen_d"].iloc[0] - abs(d_z)) > 0.01  # (pingouin's d_av is not d_z: not checked, no finding)
    (e,) = audit_file(_doc(tmp_path / "z.docx", tables=[("Table 12\nPaired Samples T-Test", [["", "t", "df", "p", "d_z"], row + [f"{d_z:.3f}"]])]))
    assert e.codes == []
    (e,) = audit_file(_doc(tmp_path / "y.docx", tables=[("Table 12\nPaired Samples T-Test", [["", "t", "df", "p", "d_z"], row + [f"{d_z * 1.5:.3f}"]])]))
    assert e.codes == ["d-does-not-fit"]


def test_a_t_tests_mean_difference_and_its_se_are_checked_against_the_t(tmp_path):
    """SPSS's Independent Samples Test gives each t with its "Mean Difference" and "Std. Error Difference" (jamovi:
    "Mean difference", "SE difference"): t is their ratio, for Student's and Welch's rows alike, and a t or SE that
    does not fit is the warning coefficient-does-not-fit (it had not been checked). Layout: SPSS's two header rows
    (practice; from memory); numbers: pingouin's penguins, body mass by sex, with scipy's Levene and t tests and the
    pooled and Welch SEs computed here; the wrong SE is a mutation of ours."""
    import pingouin as pg

    data = pg.read_dataset("penguins").dropna(subset=["sex", "body_mass_g"])
    a, b = (data.loc[data["sex"] == s, "body_mass_g"] for s in ("female", "male"))
    student, welch, levene = stats.ttest_ind(a, b), stats.ttest_ind(a, b, equal_var=False), stats.levene(a, b, center="mean")
    pooled = math.sqrt(((len(a) - 1) * a.var() + (len(b) - 1) * b.var()) / (len(a) + len(b) - 2)) * math.sqrt(1 / len(a) + 1 / len(b))
    apart = math.sqrt(a.var() / len(a) + b.var() / len(b))
    welch_df = pg.ttest(a, b, correction=True)["dof"].iloc[0]
    difference = a.mean() - b.mean()
    rows = [["", "", "Levene's Test for Equality of Variances", "", "t-test for Equality of Means", "", "", "", ""],
            ["", "", "F", "Sig.", "t", "df", "Sig. (2-tailed)", "Mean Difference", "Std. Error Difference"],
            ["Body mass", "Equal variances assumed", f"{levene.statistic:.3f}", f"{levene.pvalue:.3f}", f"{student.statistic:.3f}",
             f"{len(a) + len(b) - 2}", "<.001", f"{difference:.3f}", f"{pooled:.3f}"],
            ["", "Equal variances not assumed", "", "", f"{welch.statistic:.3f}", f"{welch_df:.3f}", "<.001", f"{difference:.3f}", f"{apart:.3f}"]]
    found = audit_file(_doc(tmp_path / "s.docx", tables=[("Table 13\nIndependent Samples Test", rows)]))
    ts = [e for e in found if e.found.startswith("t(")]
    assert len(ts) == 2 and all(e.codes == [] for e in found), [(e.found, e.codes) for e in found]
    rows[3][8] = f"{pooled * 1.3:.3f}"
    ts = [e for e in audit_file(_doc(tmp_path / "w.docx", tables=[("Table 13\nIndependent Samples Test", rows)])) if e.found.startswith("t(")]
    assert ts[0].codes == [] and ts[1].codes == ["coefficient-does-not-fit"] and "is not mean difference / SE" in ts[1].message
    jamovi = [["", "", "Statistic", "df", "p", "Mean difference", "SE difference"],
              ["Body mass", "Student's t", f"{student.statistic:.2f}", f"{len(a) + len(b) - 2}", "< .001", f"{difference:.1f}", f"{pooled * 0.8:.1f}"]]
    (e,) = audit_file(_doc(tmp_path / "j.docx", tables=[("Table 14\nIndependent Samples T-Test", jamovi)]))
    assert e.codes == ["coefficient-does-not-fit"]


def test_an_interval_in_two_columns_is_checked_against_its_estimate_and_p(tmp_path):
    """The limits of a t's interval in columns of their own — SPSS's "Lower" and "Upper" under "95% Confidence Interval
    of the Difference" (layout from memory; practice), statsmodels' "[0.025" and "0.975]" — are read with the row's t:
    the interval must contain the estimate (the mean difference, the coefficient) and agree with the p about 0
    (Altman & Bland, 2011). They had not been read. Numbers: pingouin's penguins, scipy's t test and its interval,
    statsmodels' OLS and conf_int (computed here); the shifted intervals are mutations of ours."""
    import pingouin as pg
    import statsmodels.formula.api as smf

    data = pg.read_dataset("penguins").dropna(subset=["sex", "body_mass_g", "flipper_length_mm", "bill_length_mm"])
    a, b = (data.loc[data["sex"] == s, "body_mass_g"] for s in ("female", "male"))
    test = stats.ttest_ind(a, b)
    low, high = test.confidence_interval(0.95)
    se = math.sqrt(((len(a) - 1) * a.var() + (len(b) - 1) * b.var()) / (len(a) + len(b) - 2)) * math.sqrt(1 / len(a) + 1 / len(b))
    rows = [["", "t-test for Equality of Means", "", "", "", "", "95% Confidence Interval of the Difference", ""],
            ["", "t", "df", "Sig. (2-tailed)", "Mean Difference", "Std. Error Difference", "Lower", "Upper"],
            ["Body mass", f"{test.statistic:.3f}", f"{len(a) + len(b) - 2}", "<.001", f"{a.mean() - b.mean():.3f}", f"{se:.3f}", f"{low:.3f}", f"{high:.3f}"]]
    (e,) = audit_file(_doc(tmp_path / "s.docx", tables=[("Table 15\nIndependent Samples Test", rows)]))
    assert e.codes == [] and e.found.endswith(f"95% CI [{low:.3f}, {high:.3f}]"), (e.found, e.codes)
    rows[2][6], rows[2][7] = "-100.000", "50.000"  # (holds 0 beside p < .001, and not the difference)
    (e,) = audit_file(_doc(tmp_path / "w.docx", tables=[("Table 15\nIndependent Samples Test", rows)]))
    assert set(e.codes) == {"ci-excludes-estimate", "ci-p-disagree"}, e.codes
    fit = smf.ols("body_mass_g ~ flipper_length_mm + bill_length_mm", data).fit()
    limits = fit.conf_int()
    rows = [["", "coef", "std err", "t", "P>|t|", "[0.025", "0.975]"]] + [
        [k, f"{fit.params[k]:.4f}", f"{fit.bse[k]:.3f}", f"{fit.tvalues[k]:.3f}", f"{fit.pvalues[k]:.3f}", f"{limits.loc[k, 0]:.3f}", f"{limits.loc[k, 1]:.3f}"]
        for k in fit.params.index]
    found = audit_file(_doc(tmp_path / "m.docx", tables=[("Table 16\nBody mass", rows)]))
    assert len(found) == 3 and all(e.codes == [] and "95% CI [" in e.found for e in found), [(e.found, e.codes) for e in found]
    rows[3][5], rows[3][6] = f"{fit.params.iloc[2] + 1:.3f}", f"{fit.params.iloc[2] + 9:.3f}"
    assert "ci-excludes-estimate" in audit_file(_doc(tmp_path / "n.docx", tables=[("Table 16\nBody mass", rows)]))[2].codes
    # an odds ratio's interval beside a logistic model's B ("B, SE, OR, 95% CI for OR: LL, UL, z, p", as statsetter's
    # Markdown heads it) is the odds ratio's, not the B's (it had been taken for the B's interval): the OR must lie
    # inside it, be exp(B), and the interval agree with the p about 1
    logit = smf.logit("male ~ body_mass_kg", data.assign(male=(data["sex"] == "male").astype(int), body_mass_kg=data["body_mass_g"] / 1000)).fit(disp=0)
    odds = np.exp(logit.conf_int())
    rows = [["Predictor", "B", "SE", "OR", "95% CI for OR: LL", "95% CI for OR: UL", "z", "p"]] + [
        [k, f"{logit.params[k]:.2f}", f"{logit.bse[k]:.2f}", f"{np.exp(logit.params[k]):.2f}", f"{odds.loc[k, 0]:.2f}", f"{odds.loc[k, 1]:.2f}",
         f"{logit.tvalues[k]:.2f}", "< .001"] for k in logit.params.index]
    spanned = [["", "", "", "", "95% CI for OR", "95% CI for OR", "", ""], rows[0][:4] + ["LL", "UL"] + rows[0][6:]] + rows[1:]  # (Word's two rows)
    for k, table in enumerate((rows, spanned)):
        found = audit_file(_doc(tmp_path / f"o{k}.docx", tables=[("Table 17\nMale sex by body mass", table)]))
        last = table[-1]
        assert [e.codes for e in found] == [[], []] and found[1].found.endswith(f"OR = {last[3]}, 95% CI [{last[4]}, {last[5]}]"), [(e.found, e.codes) for e in found]
        table[-1] = last[:4] + ["0.50", "1.80"] + last[6:]
        found = audit_file(_doc(tmp_path / f"p{k}.docx", tables=[("Table 17\nMale sex by body mass", table)]))
        assert set(found[1].codes) == {"ci-excludes-estimate", "ci-p-disagree"}, found[1].codes


def test_a_coefficients_interval_in_a_sentence_must_contain_its_b():
    """"b = 6.05, SE = 5.18, t(339) = 1.17, p = .244, 95% CI [−4.14, 16.24]": the interval after the t is the b's, and
    must contain it (it had been checked against the p only). Numbers: statsmodels' OLS of the penguins' body mass
    on flipper and bill length, with its conf_int (computed here); the shifted interval is a mutation of ours."""
    import pingouin as pg
    import statsmodels.formula.api as smf

    data = pg.read_dataset("penguins").dropna(subset=["body_mass_g", "flipper_length_mm", "bill_length_mm"])
    fit = smf.ols("body_mass_g ~ flipper_length_mm + bill_length_mm", data).fit()
    k = "bill_length_mm"
    low, high = fit.conf_int().loc[k]
    head = f"b = {fit.params[k]:.2f}, SE = {fit.bse[k]:.2f}, t({int(fit.df_resid)}) = {fit.tvalues[k]:.2f}, p = {fit.pvalues[k]:.3f}".replace("p = 0.", "p = .")
    typed = f"Bill length added little, {head}, 95% CI [{low:.2f}, {high:.2f}].".replace("-", "−")
    (e,) = audit_units([Unit("p", typed)])
    assert e.codes == [] and e.found == typed[typed.index("t("):-1], (e.found, e.codes)
    shifted = f"Bill length added little, {head}, 95% CI [{fit.params[k] + 1:.2f}, {high + 5:.2f}].".replace("-", "−")
    (e,) = audit_units([Unit("p", shifted)])
    assert "ci-excludes-estimate" in e.codes


def test_a_standardized_coefficients_interval_and_p_must_agree():
    """"β = 0.66, 95% CI [0.58, 0.74], p < .001" (a coefficient with its interval and p, no test statistic, as
    epidemiology and sociology report them): the interval and the p must agree about 0 (Altman & Bland, 2011); a
    p below .05 beside an interval holding 0 is the warning ci-p-disagree (it had not been checked). Numbers:
    statsmodels' OLS of the penguins' standardized body mass on standardized flipper and bill length (computed
    here); the interval moved across 0 is a mutation of ours."""
    import pingouin as pg
    import statsmodels.formula.api as smf

    data = pg.read_dataset("penguins").dropna(subset=["body_mass_g", "flipper_length_mm", "bill_length_mm"])
    z = data[["body_mass_g", "flipper_length_mm", "bill_length_mm"]].apply(lambda c: (c - c.mean()) / c.std())
    fit = smf.ols("body_mass_g ~ flipper_length_mm + bill_length_mm", z).fit()
    for k in ("flipper_length_mm", "bill_length_mm"):
        low, high = fit.conf_int().loc[k]
        p = "< .001" if fit.pvalues[k] < 0.001 else f"= {fit.pvalues[k]:.3f}".replace("0.", ".")
        typed = f"It predicted body mass (β = {fit.params[k]:.2f}, 95% CI [{low:.2f}, {high:.2f}], p {p}).".replace("-", "−")
        (e,) = audit_units([Unit("p", typed)])
        assert "ci-p-disagree" not in e.codes, (typed, e.codes)
    k = "flipper_length_mm"
    moved = f"It predicted body mass (β = {fit.params[k]:.2f}, 95% CI [−0.10, {fit.conf_int().loc[k][1]:.2f}], p < .001)."
    (e,) = audit_units([Unit("p", moved)])
    assert "ci-p-disagree" in e.codes
    # "β = .66, t(339) = 15.7, p < .001, 95% CI [.58, .74]": the interval after the t is the β's (no B beside it), which
    # APA 7 writes without a leading zero, as the β itself: no missing-leading-zero (it had been judged as an unbounded
    # estimate's); with a B and a β before the t, whose interval it is is not said, and it is not checked against the B
    low, high = fit.conf_int().loc[k]
    beta, t = f"{fit.params[k]:.2f}".replace("0.", "."), f"{fit.tvalues[k]:.2f}"
    typed = f"Flipper length predicted body mass, β = {beta}, t({int(fit.df_resid)}) = {t}, p < .001, 95% CI [{low:.2f}, {high:.2f}].".replace("0.", ".")
    assert [e.codes for e in audit_units([Unit("p", typed)])] == [[], []], typed
    raw = smf.ols("body_mass_g ~ flipper_length_mm + bill_length_mm", data).fit()
    both = typed.replace("β =", f"B = {raw.params[k]:.2f}, SE = {raw.bse[k]:.2f}, β =")
    assert not {"ci-excludes-estimate", "coefficient-does-not-fit"} & {c for e in audit_units([Unit("p", both)]) for c in e.codes}, both


def test_spss_paired_samples_test_is_checked_mean_over_its_se(tmp_path):
    """SPSS's Paired Samples Test ("Paired Differences": Mean, Std. Deviation, Std. Error Mean, the interval's Lower and
    Upper; then t, df, Sig. (2-tailed); layout from memory, practice): the t must be the differences' mean over its
    SE, and the interval must hold the mean and agree with the p. None of it had been read but the t, df and p.
    One-Sample Test's interval likewise holds its Mean Difference. Numbers: pingouin's rm_anova_wide, its first and
    last measurements, with scipy's paired t test (computed here); the wrong SE and interval are mutations of ours."""
    import pingouin as pg

    wide = pg.read_dataset("rm_anova_wide").dropna()
    diff = wide.iloc[:, 0] - wide.iloc[:, -1]
    n, mean, sd = len(diff), diff.mean(), diff.std()
    se = sd / math.sqrt(n)
    test = stats.ttest_rel(wide.iloc[:, 0], wide.iloc[:, -1])
    half = stats.t.ppf(0.975, n - 1) * se
    rows = [["", "Paired Differences", "", "", "95% Confidence Interval of the Difference", "", "t", "df", "Sig. (2-tailed)"],
            ["", "Mean", "Std. Deviation", "Std. Error Mean", "Lower", "Upper", "", "", ""],
            ["Pair 1", f"{mean:.3f}", f"{sd:.3f}", f"{se:.3f}", f"{mean - half:.3f}", f"{mean + half:.3f}", f"{test.statistic:.3f}", f"{n - 1}",
             f"{test.pvalue:.3f}"]]
    (e,) = audit_file(_doc(tmp_path / "p.docx", tables=[("Table 18\nPaired Samples Test", rows)]))
    assert e.codes == [] and "95% CI" in e.found, (e.found, e.codes)
    rows[2][3] = f"{se * 1.4:.3f}"
    (e,) = audit_file(_doc(tmp_path / "w.docx", tables=[("Table 18\nPaired Samples Test", rows)]))
    assert e.codes == ["coefficient-does-not-fit"] and "mean difference" in e.message
    rows[2][3], rows[2][4] = f"{se:.3f}", f"{mean + 0.1:.3f}"
    (e,) = audit_file(_doc(tmp_path / "v.docx", tables=[("Table 18\nPaired Samples Test", rows)]))
    assert e.codes == ["ci-excludes-estimate"]
    one = [["", "Test Value = 0", "", "", "", "", ""], ["", "t", "df", "Sig. (2-tailed)", "Mean Difference", "95% CI Lower", "95% CI Upper"],
           ["Change", f"{test.statistic:.3f}", f"{n - 1}", f"{test.pvalue:.3f}", f"{mean:.3f}", f"{mean + 0.1:.3f}", f"{mean + half:.3f}"]]
    (e,) = audit_file(_doc(tmp_path / "o.docx", tables=[("Table 19\nOne-Sample Test", one)]))
    assert e.codes == ["ci-excludes-estimate"], (e.found, e.codes)


def test_a_correlation_matrix_with_one_sample_each_side_of_its_diagonal(tmp_path):
    """A correlation matrix with two samples, one each side of the diagonal, as the note says ("for female penguins
    (n = 165) above the diagonal, for male penguins (n = 168) below it"): each marked coefficient is r(n − 2) of its
    side's n (a note with two n's had left the whole matrix unread). Numbers: pingouin's penguins by sex, scipy's
    pearsonr with the marks its p earns (computed here); the marked .10 is a mutation of ours."""
    import pingouin as pg

    data = pg.read_dataset("penguins").dropna(subset=["sex", "bill_length_mm", "bill_depth_mm", "flipper_length_mm"])
    names = ["bill_length_mm", "bill_depth_mm", "flipper_length_mm"]
    female, male = data[data["sex"] == "female"], data[data["sex"] == "male"]

    def cell(group, a, b):
        r, p = stats.pearsonr(group[a], group[b])
        return f"{r:.2f}".replace("0.", ".") + ("**" if p < 0.01 else "*" if p < 0.05 else "")

    rows = [["Variable", "1", "2", "3"]]
    for i, a in enumerate(names):
        rows.append([f"{i + 1}. {a}"] + ["—" if j == i else cell(female if j > i else male, a, b) for j, b in enumerate(names)])
    note = f"Note. Correlations for female penguins (n = {len(female)}) are above the diagonal, for male penguins (n = {len(male)}) below it. *p < .05. **p < .01."
    found = audit_file(_doc(tmp_path / "m.docx", tables=[("Table 20\nCorrelations of bill and flipper measures", rows)], note=note))
    marked = sum(1 for row in rows[1:] for c in row[1:] if c.endswith("*"))
    assert len(found) == marked >= 4 and all(e.codes == [] for e in found), [(e.found, e.codes) for e in found]
    assert {e.found.split(")")[0] for e in found} == {f"r({len(female) - 2}", f"r({len(male) - 2}"}
    rows[1][3] = ".10**"  # (r = .10 on 163 df has p = .20: no p < .01)
    found = audit_file(_doc(tmp_path / "w.docx", tables=[("Table 20\nCorrelations of bill and flipper measures", rows)], note=note))
    assert [e.found for e in found if e.codes] == [f"r({len(female) - 2}) = .10, p < .01"] and "p-does-not-follow" in found[1].codes


def test_spss_model_summary_f_change_is_read(tmp_path):
    """SPSS's Model Summary of a hierarchical regression ("Change Statistics": R Square Change, F Change, df1, df2,
    Sig. F Change; layout from memory, practice): each step's F change is read with its df1 and df2 and checked against
    its p, and with its R Square and R Square Change (the heads had not been known), its R and Adjusted R Square with
    R Square. Numbers: statsmodels' OLS of the penguins' body mass, flipper length first,
    the bill's length and depth added; the F change computed here from the R²s, its p from scipy; the p of .017 and the
    R² change of .020 are mutations of ours."""
    import pingouin as pg
    import statsmodels.formula.api as smf

    data = pg.read_dataset("penguins").dropna(subset=["body_mass_g", "flipper_length_mm", "bill_length_mm", "bill_depth_mm"])
    first = smf.ols("body_mass_g ~ flipper_length_mm", data).fit()
    second = smf.ols("body_mass_g ~ flipper_length_mm + bill_length_mm + bill_depth_mm", data).fit()

    def row(step, model, before):
        change = model.rsquared - (before.rsquared if before is not None else 0.0)
        df1, df2 = int(model.df_model - (before.df_model if before is not None else 0)), int(model.df_resid)
        f = change / df1 / ((1 - model.rsquared) / df2)
        return [str(step), f"{model.rsquared ** 0.5:.3f}", f"{model.rsquared:.3f}", f"{model.rsquared_adj:.3f}", f"{change:.3f}", f"{f:.3f}",
                str(df1), str(df2), f"{stats.f.sf(f, df1, df2):.3f}"]

    rows = [["", "", "", "", "Change Statistics", "", "", "", ""],
            ["Model", "R", "R Square", "Adjusted R Square", "R Square Change", "F Change", "df1", "df2", "Sig. F Change"], row(1, first, None), row(2, second, first)]
    found = audit_file(_doc(tmp_path / "m.docx", tables=[("Table 21\nModel Summary", rows)]))
    assert [e.found for e in found] == [f"ΔF(1, 340) = {rows[2][5]}, p = {rows[2][8]}, R² = {rows[2][2]}, ΔR² = {rows[2][4]}, adjusted R² = {rows[2][3]}, R = {rows[2][1]}",
                                        f"ΔF(2, 338) = {rows[3][5]}, p = {rows[3][8]}, R² = {rows[3][2]}, ΔR² = {rows[3][4]}, adjusted R² = {rows[3][3]}, R = {rows[3][1]}"] \
        and all(not e.codes for e in found), [(e.found, e.codes) for e in found]
    # R is the square root of R², and the adjusted R² is 1 − (1 − R²)(n − 1)/(n − k − 1): at most 1 − (1 − R²)(df₁ + df₂)/df₂
    # (k at least the step's df₁); statsmodels' rsquared_adj is that formula (checked here for the second model)
    n, k = second.nobs, second.df_model
    assert abs(second.rsquared_adj - (1 - (1 - second.rsquared) * (n - 1) / (n - k - 1))) < 1e-12
    for column, value in ((1, "0.950"), (3, "0.900")):
        wrong = [r[:] for r in rows]
        wrong[3][column] = value
        (_, e) = audit_file(_doc(tmp_path / f"r{column}.docx", tables=[("Table 21\nModel Summary", wrong)]))
        assert e.codes == ["effect-does-not-fit"] and ("R squared" if column == 1 else "at most") in e.message, (column, e.message)
    wrong = [r[:] for r in rows]
    wrong[3][8] = "0.017"
    assert "p-does-not-follow" in audit_file(_doc(tmp_path / "w.docx", tables=[("Table 21\nModel Summary", wrong)]))[1].codes
    # the step's R² change must give its F change with the model's R²: (ΔR²/df₁)/((1 − R²)/df₂) (definition)
    wrong = [r[:] for r in rows]
    wrong[3][4] = "0.020"
    (_, e) = audit_file(_doc(tmp_path / "v.docx", tables=[("Table 21\nModel Summary", wrong)]))
    assert e.codes == ["effect-does-not-fit"] and "(ΔR²/df₁)/((1 − R²)/df₂)" in e.message
    # its suggestion keeps the step's ΔF and every effect beside it (it had given "F(2, 338) = …, R² = …" alone)
    assert e.suggestion.startswith("ΔF(2, 338) = ") and "ΔR² = .02" in e.suggestion and "adjusted R² = .76, R = .87" in e.suggestion, e.suggestion


def test_a_chi_square_tests_table_as_jamovi_and_jasp_name_its_rows(tmp_path):
    """jamovi's and JASP's χ² Tests tables name their rows "χ²" (JASP: "Χ²", with the Greek capital) and "χ²
    continuity correction" beside "Value", "df" and "p" (layout from memory, practice): each row's value is a χ² with
    its df and p (only SPSS's row names had been known). Numbers: pingouin's chi2_independence of its heart-disease
    data, sex by diagnosis (the Pearson and Yates-corrected χ², computed here); the p of .30 is a mutation of ours."""
    import pingouin as pg

    data = pg.read_dataset("chi2_independence")
    _, _, plain = pg.chi2_independence(data, x="sex", y="target", correction=False)
    _, _, yates = pg.chi2_independence(data, x="sex", y="target", correction=True)
    pearson, corrected = plain.iloc[0], yates.iloc[0]
    rows = [["", "Value", "df", "p"], ["χ²", f"{pearson.chi2:.2f}", f"{int(pearson.dof)}", "< .001"],
            ["χ² continuity correction", f"{corrected.chi2:.2f}", f"{int(corrected.dof)}", "< .001"], ["N", f"{len(data)}", "", ""]]
    found = audit_file(_doc(tmp_path / "c.docx", tables=[("Table 22\nχ² Tests", rows)]))
    assert [e.found for e in found] == [f"χ²(1) = {pearson.chi2:.2f}, p < .001", f"χ²(1) = {corrected.chi2:.2f}, p < .001"] and all(not e.codes for e in found)
    rows[1][0], rows[1][3] = "Χ²", ".30"
    found = audit_file(_doc(tmp_path / "w.docx", tables=[("Table 22\nChi-Squared Tests", rows)]))
    assert "p-does-not-follow" in found[0].codes


def test_spss_coefficients_interval_for_b_after_its_beta_column(tmp_path):
    """SPSS's Coefficients table puts "95.0% Confidence Interval for B" (Lower Bound, Upper Bound) after the Beta, t
    and Sig. columns (layout from memory, practice): the interval is the B's, as its spanner says, not the Beta's,
    and must hold the B and agree with the p (it had been left unread: the nearest estimate to its left is the Beta).
    Numbers: statsmodels' OLS of the penguins' body mass, its conf_int, and the standardized fit's β (computed here);
    the shifted interval is a mutation of ours."""
    import pingouin as pg
    import statsmodels.formula.api as smf

    data = pg.read_dataset("penguins").dropna(subset=["body_mass_g", "flipper_length_mm", "bill_length_mm"])
    fit = smf.ols("body_mass_g ~ flipper_length_mm + bill_length_mm", data).fit()
    z = data[["body_mass_g", "flipper_length_mm", "bill_length_mm"]].apply(lambda c: (c - c.mean()) / c.std())
    beta, limits = smf.ols("body_mass_g ~ flipper_length_mm + bill_length_mm", z).fit().params, fit.conf_int()
    rows = [["Model", "Unstandardized Coefficients", "", "Standardized Coefficients", "", "", "95.0% Confidence Interval for B", ""],
            ["", "B", "Std. Error", "Beta", "t", "Sig.", "Lower Bound", "Upper Bound"]]
    for k, name in (("Intercept", "(Constant)"), ("flipper_length_mm", "Flipper length"), ("bill_length_mm", "Bill length")):
        rows.append([name, f"{fit.params[k]:.3f}", f"{fit.bse[k]:.3f}", "" if k == "Intercept" else f"{beta[k]:.3f}", f"{fit.tvalues[k]:.3f}",
                     f"{fit.pvalues[k]:.3f}", f"{limits.loc[k, 0]:.3f}", f"{limits.loc[k, 1]:.3f}"])
    found = audit_file(_doc(tmp_path / "c.docx", tables=[("Table 23\nCoefficients", rows)]))
    assert len(found) == 3 and all(e.codes == [] and "95% CI [" in e.found for e in found), [(e.found, e.codes) for e in found]
    rows[4][6] = f"{fit.params['bill_length_mm'] + 1:.3f}"  # (the bill's interval moved off its B, and off 0 beside p = .244)
    found = audit_file(_doc(tmp_path / "w.docx", tables=[("Table 23\nCoefficients", rows)]))
    assert set(found[2].codes) == {"ci-excludes-estimate", "ci-p-disagree"}, found[2].codes


# A mediation paper's first regression as printed (Am J Health Behav 2014;38(4):586–597, doi:10.5993/AJHB.38.4.12,
# Table 5, model I; https://pmc.ncbi.nlm.nih.gov/articles/PMC5509063/table/T5): the last row's t, .728, is not
# .27 / .04 (6.75) and cannot have p < .001 under any df — the published table's own slip, kept as printed
_AJHB_MODEL_I = [["", "Coefficient", "SE", "t", "p"], ["Intercept", "−.57", "2.12", "−.27", ".78"], ["Gender (Female)", "−.41", ".46", "−.88", ".38"],
                 ["Race (Black)", "−.004", ".55", "−.007", ".99"], ["Age", ".05", ".02", "3.16", ".002"], ["Education", ".01", ".10", ".12", ".91"],
                 ["CES-D", ".27", ".04", ".728", "< .001"]]


def test_a_t_without_df_is_checked_over_every_df_it_may_have(tmp_path):
    """A t (or r, χ²) given without df whose p no df at all allows: a t's two-sided p falls as its df grow, from the
    df = 1 p (the Cauchy's) to the normal's, so "t = .728, p < .001" (p from .47 to .60 whatever the df: scipy) is
    wrong in any sample. Such a t had not been checked at all where no N or group sizes gave df (a model's coefficient
    without its residual df, a t alone in a sentence); a p inside the span is never doubted. Real: the published
    table above, whose other rows fit."""
    lo, hi = 2 * stats.norm.sf(0.7285), 2 * stats.t.sf(0.7275, 1)
    assert f"{lo:.4f} {hi:.4f}" == "0.4663 0.5996"
    found = audit_file(_doc(tmp_path / "m.docx", tables=[("Table 5\nRegression models and mediating effects", _AJHB_MODEL_I)],
                            note="Note. CES-D, depressive symptoms."))
    assert [e.found for e in found][-1] == "t = .728, p < .001"
    assert {"p-does-not-follow", "verdict-changes", "coefficient-does-not-fit"} <= set(found[-1].codes)
    assert "p from 0.4663 to 0.5996 over every df it may have" in found[-1].message and "under no df" in found[-1].message
    assert all(not e.codes and "over every df it may have" in e.checked for e in found[:-1]), [(e.found, e.codes) for e in found]
    # in prose: a large t with a large p (df = 1 gives at most .107: scipy), an r whose p no df reaches (df = 1 gives .74)
    assert f"{2 * stats.t.sf(5.895, 1):.3f} {2 * stats.t.sf(0.395 * (1 / (1 - 0.395 ** 2)) ** 0.5, 1):.3f}" == "0.107 0.741"
    for text, flagged in (("Scores rose after training, t = 5.90, p = .45.", True), ("The two scores correlated, r = .40, p = .80.", True),
                          ("Scores rose after training, t = 5.90, p = .003.", False), ("The two scores correlated, r = .40, p = .30.", False)):
        (e,) = audit_units([Unit("c", text)])
        assert ("p-does-not-follow" in e.codes) is flagged and "over every df it may have" in e.checked, (text, e.codes)


# A published regression table without a test column, two models side by side (Pediatric Research 2020;88(5):739–748,
# doi:10.1038/s41390-020-1024-1, Table 4; https://pmc.ncbi.nlm.nih.gov/articles/PMC7577839/table/Tab4), as printed
_PEDRES_TABLE_4 = [["", "B", "SE B", "95% CI", "β", "p", "B", "SE B", "95% CI", "β", "p"],
                   ["Intercept", "−6.01", "0.74", "−7.48, −4.53", "", "<0.001", "−4.46", "0.60", "−5.65, −3.27", "", "<0.001"],
                   ["Age at assessment", "0.23", "0.04", "0.15, 0.31", "0.46", "<0.001", "0.22", "0.04", "0.15, 0.30", "0.48", "<0.001"],
                   ["Female sex", "0.12", "0.09", "−0.06, 0.31", "0.10", "0.18", "0.15", "0.09", "−0.08, 0.29", "0.12", "0.11"],
                   ["SES", "0.05", "0.02", "0.01, 0.10", "0.18", "0.03", "0.05", "0.02", "−0.00, 0.10", "0.17", "0.04"],
                   ["Processing speed", "0.02", "0.00", "0.01, 0.03", "0.37", "<0.001", "0.02", "0.00", "0.01, 0.03", "0.33", "<0.001"],
                   ["Glx/Cr", "0.44", "0.22", "0.00, 0.87", "0.16", "0.05", "", "", "", "", ""],
                   ["mI/Cr × birth group", "", "", "", "", "", "−2.84", "1.21", "−5.25, −0.44", "−0.17", "0.02"]]


def test_a_coefficients_table_without_a_test_column_is_read(tmp_path):
    """B, SE, 95% CI, β and p with no t column (health and psychology journals' usual layout) had not been read at all:
    each B is now read with its SE, interval and p — per model where two stand side by side — and checked: the interval
    holds the B (ci-excludes-estimate) and agrees with the p (ci-p-disagree), and the p follows from B / SE under some df,
    from the normal's to the t's on 1 df (coefficient-does-not-fit). Real: the published table above, all consistent;
    the slips are mutations of ours."""
    caption = ("Table 4\nMultiple linear regression models for the global executive function score", _PEDRES_TABLE_4)
    note = "Note. B unstandardized regression coefficients, SE B standard error of B, CI confidence interval, β standardized regression coefficients."
    found = audit_file(_doc(tmp_path / "t.docx", tables=[caption], note=note))
    assert len(found) == 12 and all(not e.codes for e in found), [(e.found, e.codes) for e in found]
    assert found[2].found == "B = 0.23, SE = 0.04, 95% CI [0.15, 0.31], p < 0.001" and found[3].found == "B = 0.22, SE = 0.04, 95% CI [0.15, 0.30], p < 0.001"
    assert "no test column" in found[2].notes[0]
    rows = [r[:] for r in _PEDRES_TABLE_4]
    rows[2][5], rows[3][1], rows[4][10] = "0.45", "0.50", "0.40"  # Age's p, Female sex's B (model 1), SES's p (model 2)
    codes = {e.found: set(e.codes) for e in audit_file(_doc(tmp_path / "w.docx", tables=[(caption[0], rows)], note=note))}
    # Age: |B / SE| from 5.00 to 6.71 gives p at most .126 (t on 1 df, scipy), and its CI excludes 0
    assert 2 * stats.t.sf(0.225 / 0.045, 1) < 0.13
    assert codes["B = 0.23, SE = 0.04, 95% CI [0.15, 0.31], p = 0.45"] == {"coefficient-does-not-fit", "ci-p-disagree"}
    assert "ci-excludes-estimate" in codes["B = 0.50, SE = 0.09, 95% CI [−0.06, 0.31], p = 0.18"]
    # SES (model 2): its CI holds 0, so p = .40 agrees with it, but |B / SE| is at least 1.8 (.045 / .025), whose p on 1 df
    # is .32 (scipy): no df gives .40
    assert f"{2 * stats.t.sf(0.045 / 0.025, 1):.2f}" == "0.32"
    assert codes["B = 0.05, SE = 0.02, 95% CI [−0.00, 0.10], p = 0.40"] == {"coefficient-does-not-fit"}


def test_an_odds_ratio_with_its_interval_in_a_column_of_its_own(tmp_path):
    """A logistic model's table with "OR" and "95% CI" in columns of their own and no test column (B, SE, OR, 95% CI, p):
    the interval after the OR is the odds ratio's, checked against the p (null 1) — had not been read. Numbers:
    statsmodels' Logit on its Spector & Mazzeo data (grade ~ GPA + TUCE + PSI), OR and CI as exp of its estimates."""
    import statsmodels.api as sm

    data = sm.datasets.spector.load_pandas()
    fit = sm.Logit(data.endog, sm.add_constant(data.exog)).fit(disp=0)
    ci = np.exp(fit.conf_int())
    rows = [["Predictor", "B", "SE", "OR", "95% CI", "p"]] + [
        [k, f"{fit.params[k]:.3f}", f"{fit.bse[k]:.3f}", f"{math.exp(fit.params[k]):.2f}", f"{ci.loc[k, 0]:.2f}–{ci.loc[k, 1]:.2f}", f"{fit.pvalues[k]:.3f}"]
        for k in ("GPA", "TUCE", "PSI")]
    found = audit_file(_doc(tmp_path / "l.docx", tables=[("Table 2\nLogistic regression of grade improvement", rows)]))
    assert [e.found for e in found] == ["OR = 16.88, 95% CI [1.42, 200.62], p = 0.025", "OR = 1.10, 95% CI [0.83, 1.45], p = 0.501",
                                        "OR = 10.79, 95% CI [1.34, 86.94], p = 0.025"], [e.found for e in found]
    assert all(not e.codes for e in found), [(e.found, e.codes) for e in found]
    rows[3][5], rows[2][3] = "0.250", "1.50"  # PSI's p (its interval, 1.34 to 86.94, excludes 1); TUCE's OR (exp(0.095) = 1.10)
    found = {e.found: set(e.codes) for e in audit_file(_doc(tmp_path / "w.docx", tables=[("Table 2\nLogistic regression of grade improvement", rows)]))}
    assert found["OR = 10.79, 95% CI [1.34, 86.94], p = 0.250"] == {"ci-p-disagree"}
    assert found["OR = 1.50, 95% CI [0.83, 1.45], p = 0.501"] >= {"coefficient-does-not-fit", "ci-excludes-estimate"}, found


# A published linear model with the coefficient and its interval in one cell (BMC Health Services Research 2008;8:219,
# doi:10.1186/1472-6963-8-219, Table 2; https://bmchealthservres.biomedcentral.com/articles/10.1186/1472-6963-8-219/tables/2)
_BMC_TABLE_2 = [["Parameter", "β Coefficient (95% CI)", "Standard Error", "t Value", "P-value"],
                ["Intercept", "130.0 (120.0, 140.0)", "5.1", "25.5", "<0.001"],
                ["Age, 10 years (continuous)", "1.9 (0.9, 2.9)", "0.5", "3.8", "<0.001"],
                ["Race (white vs. non-white (ref))", "-5.0 (-7.5, -2.6)", "1.3", "-4.0", "<0.001"],
                ["Currently Married (yes vs. no (ref))", "-0.2 (-2.5, 2.2)", "1.2", "-0.1", "0.89"],
                ["0–9th grade", "0.1 (-4.6, 4.8)", "2.4", "0.05", "0.96"],
                ["Medication Adherence (nonadherent vs. adherent (ref))", "3.7 (1.3, 6.2)", "1.2", "3.0", "0.003"],
                ["Current Smoker (yes vs. no (ref))", "-2.4 (-5.3, 0.6)", "1.5", "-1.6", "0.11"]]


def test_a_coefficient_with_its_interval_in_one_cell_beside_a_t(tmp_path):
    """"β Coefficient (95% CI)" over "1.9 (0.9, 2.9)" with "Standard Error", "t Value" and "P-value" columns: the t had
    been read with its p alone; now the cell's coefficient and interval and the SE column are read too — t against
    B / SE, the interval holding the coefficient and agreeing with the p. Real: the published table above (consistent
    throughout); the slips are mutations of ours."""
    found = audit_file(_doc(tmp_path / "b.docx", tables=[("Table 2 Multiple linear regression model – outcome: systolic blood pressure", _BMC_TABLE_2)],
                            note="Total number of patients included in model = 1082."))
    assert len(found) == 7 and all(not e.codes for e in found), [(e.found, e.codes) for e in found]
    assert found[1].found == "t = 3.8, p < 0.001, 95% CI [0.9, 2.9]" and "the B and SE columns, the interval beside the estimate" in found[1].notes[0]
    rows = [r[:] for r in _BMC_TABLE_2]
    rows[2][2], rows[6][1], rows[7][4] = "0.9", "3.7 (4.3, 6.2)", "0.011"  # Age's SE; Adherence's lower limit; Smoker's p
    codes = {e.found: set(e.codes) for e in audit_file(_doc(tmp_path / "w.docx", tables=[("Table 2 Multiple linear regression model", rows)]))}
    assert "coefficient-does-not-fit" in codes["t = 3.8, p < 0.001, 95% CI [0.9, 2.9]"]  # (1.9 / 0.9 is about 2.1)
    assert "ci-excludes-estimate" in codes["t = 3.0, p = 0.003, 95% CI [4.3, 6.2]"]
    assert "ci-p-disagree" in codes["t = -1.6, p = 0.011, 95% CI [-5.3, 0.6]"], codes


def test_a_regression_steps_r_squared_change_and_f_change_in_prose():
    """A hierarchical regression's step as authors type it: "ΔR² = .002, F(1, 330) = 2.20, p = .139" (the R² change just
    before its F, or after it; "R² change", "R squared change"; the F as "F change", as SPSS names it). The change had not
    been read (nor "F change" at all); now ΔR² is checked against the F: ΔR² = F·df₁·(1 − R²)/df₂, so with the model's
    R² it is fixed, and without it at most F·df₁/(F·df₁ + df₂) (R² ≥ ΔR²). Numbers: statsmodels' OLS of pingouin's
    penguins, body mass on flipper length, then bill depth added (anova_lm: F(1, 330) = 2.198, p = .139; ΔR² = .0016,
    R² = .764); the wrong changes are mutations of ours."""
    import pingouin as pg
    import statsmodels.api as sm
    import statsmodels.formula.api as smf

    data = pg.read_dataset("penguins").dropna()
    first, second = (smf.ols(f, data).fit() for f in ("body_mass_g ~ flipper_length_mm", "body_mass_g ~ flipper_length_mm + bill_depth_mm"))
    compared = sm.stats.anova_lm(first, second)
    f, p, change = compared.F.iloc[1], compared["Pr(>F)"].iloc[1], second.rsquared - first.rsquared
    assert f"{f:.2f} {p:.3f} {change:.3f} {second.rsquared:.3f}" == "2.20 0.139 0.002 0.764"
    for typed, wrong in ((f"Bill depth added little, ΔR² = {change:.3f}, F(1, 330) = {f:.2f}, p = {p:.3f}.".replace("0.", "."), False),
                         (f"Bill depth added little, ΔR² = .020, F(1, 330) = {f:.2f}, p = .139.", True),
                         (f"Bill depth added little, F change (1, 330) = {f:.2f}, p = .139, R² change = .002, R² = .764.", False),
                         (f"Bill depth added little, F change (1, 330) = {f:.2f}, p = .139, R squared change = .020, R² = .764.", True)):
        found = audit_units([Unit("c", typed)])
        head = next(e for e in found if "F" in e.found)
        assert head.found.startswith(("F(1, 330) = 2.20", "F change (1, 330) = 2.20")) and not _p_findings(head), (typed, head.found)
        assert ("effect-does-not-fit" in head.codes) is wrong and "spacing" not in head.codes, (typed, head.codes)


# A student's write-up of an SPSS hierarchical regression, as posted (https://www.scribd.com/document/829277965/write-up-with-tables)
_WRITE_UP = ("This additional variable did not explain any additional variance in NF test scores after controlling for age and gender, "
             "R squared change = .00, F change (1, 147) = .42, p = .52. In the final model, only two predictor variables were statistically "
             "significant with the age recording a higher semi-partial correlation value (sr = -.24, p < .00) than gender (sr = .23, p < .00).")


def test_each_p_without_a_head_is_its_own_and_p_below_zero_is_a_zero():
    """Two p's without a head in one sentence ("(sr = -.24, p < .00) than gender (sr = .23, p < .00)"): the second had been
    swallowed by the first's reach (240 characters) and never checked — a "p = .000" there went unseen. Each is now read.
    "p < .00" (SPSS's .000 typed as a bound) is a zero p, as "p = .000" is (it had been taken for a threshold), and bounds
    p below half its last digit. Real: the write-up above; its F change's p by scipy (.518)."""
    assert f"{stats.f.sf(0.42, 1, 147):.2f}" == "0.52"
    found = audit_units([Unit("c", _WRITE_UP)])
    assert [e.found for e in found] == ["R squared change = .00", "F change (1, 147) = .42, p = .52", "p < .00", "p < .00"], [e.found for e in found]
    assert found[2].codes == found[3].codes == ["p-zero"] and not _p_findings(found[1])
    (e,) = audit_units([Unit("c", "Scores differed, t(38) = 4.10, p < .00.")])  # (p = .0002 on 38 df: below .005, as ".00" says)
    assert e.codes == ["p-zero"], e.codes
    two = audit_units([Unit("c", "Age mattered (p = .001, d = 0.52) more than sex (p = .004, d = 0.30).")])
    assert [e.found for e in two] == ["p = .001, d = 0.52", "p = .004, d = 0.30"]


def test_a_coefficient_given_with_its_se_or_interval_and_p_but_no_test():
    """"b = 50.15, SE = 1.54, 95% CI [47.12, 53.18], p < .001" (a coefficient with its p and no t, as many results
    sections type it; practice): the p had been read alone. It is now checked with the B, SE and interval typed before it
    — the interval holding the B and agreeing with the p, the p following from B / SE under some df — and a note says so.
    Numbers: statsmodels' OLS of pingouin's penguins (body mass on flipper length); the slips are mutations of ours."""
    import pingouin as pg
    import statsmodels.formula.api as smf

    fit = smf.ols("body_mass_g ~ flipper_length_mm", pg.read_dataset("penguins").dropna()).fit()
    b, se, (lo, hi) = fit.params.iloc[1], fit.bse.iloc[1], fit.conf_int().iloc[1]
    typed = f"b = {b:.2f}, SE = {se:.2f}, 95% CI [{lo:.2f}, {hi:.2f}], p < .001"
    assert typed == "b = 50.15, SE = 1.54, 95% CI [47.12, 53.18], p < .001", typed
    (e,) = audit_units([Unit("c", f"Flipper length predicted body mass ({typed}).")])
    assert e.found == "p < .001" and e.codes == [] and "B = 50.15, SE = 1.54, 95% CI [47.12, 53.18]" in e.notes[0]
    for wrong, code in (("b = 50.15, SE = 1.54, 95% CI [47.12, 53.18], p = .30", {"coefficient-does-not-fit", "ci-p-disagree"}),
                        ("b = 50.15, 95% CI [-7.12, 53.18], p < .001", {"ci-p-disagree"}),
                        ("b = 58.15, 95% CI [47.12, 53.18], p < .001", {"ci-excludes-estimate"}),
                        ("Group B = 50.15 in the first wave; p = .30", set())):  # (words between: not the p's coefficient)
        (e,) = audit_units([Unit("c", f"Flipper length predicted body mass ({wrong}).")])
        assert set(e.codes) == code, (wrong, e.codes)


# Published coefficient tables laid out as their journals print them (PLOS ONE 2018;13(12):e0207851, Table 3,
# https://pmc.ncbi.nlm.nih.gov/articles/PMC6277119/table/pone.0207851.t003; a 2022 regression of oral-health quality of
# life, Table 6, https://pmc.ncbi.nlm.nih.gov/articles/PMC9362804/table/T6): heads such as "Estimated Regression
# Coefficient", "z Value", "p Value", "95% C.I. of Odds Ratio" and "95% CI of B (lower–upper)" over "−1.62-1.33"
_PONE_TABLE_3 = [["Covariate", "Estimated Regression Coefficient", "Estimated Standard Error", "z Value", "p Value", "Estimated Odds Ratio", "95% C.I. of Odds Ratio"],
                 ["Intercept", "30.069", "9.211", "3.26", "0.0011", "", ""],
                 ["MoCA score (0, 1, …, 30)", "-0.817", "0.240", "-3.40", "0.0007", "0.4416", "0.276–0.707"],
                 ["Calculation score of the MMSE (0, 1, …, 5)", "-1.986", "0.953", "-2.08", "0.0371", "0.1372", "0.021–0.888"]]
_OHRQOL_TABLE_6 = [["Predictors of OHRQoL", "B", "SE", "β", "t", "95% CI of B (lower–upper)", "P*"],
                   ["Oral hygiene status", "−0.15", "0.75", "−0.01", "−0.19", "−1.62-1.33", "0.85"],
                   ["Plaque level", "−1.51", "0.86", "−0.09", "−1.76", "−3.19-0.17", "0.08"],
                   ["Probing depth (mm)", "1.16", "0.37", "0.13", "3.09", "0.42-1.89", "0.002"]]


def test_published_coefficient_tables_with_worded_heads_and_hyphenated_intervals(tmp_path):
    """Each table's statistics are read whole (z or t with its B and SE, the odds ratio and its interval, the B's interval
    after a β column when the head says "of B") and found consistent; a mutated limit and a mutated odds ratio are
    flagged. "z Value" and "p Value" (a capital V) had not been heads at all."""
    found = audit_file(_doc(tmp_path / "o.docx", tables=[("Table 3. Multiple logistic regression", _PONE_TABLE_3)]))
    assert [e.found for e in found] == ["z = 3.26, p = 0.0011", "z = -3.40, p = 0.0007, Estimated Odds Ratio = 0.4416, 95% CI [0.276, 0.707]",
                                        "z = -2.08, p = 0.0371, Estimated Odds Ratio = 0.1372, 95% CI [0.021, 0.888]"] and all(not e.codes for e in found)
    found = audit_file(_doc(tmp_path / "q.docx", tables=[("Table 6. Multiple linear regression", _OHRQOL_TABLE_6)]))
    assert [e.found for e in found][2] == "t = 3.09, p = 0.002, 95% CI [0.42, 1.89]" and all(not e.codes for e in found), [(e.found, e.codes) for e in found]
    rows = [r[:] for r in _OHRQOL_TABLE_6]
    rows[3][5] = "1.42-1.89"  # the B, 1.16, outside
    assert "ci-excludes-estimate" in audit_file(_doc(tmp_path / "q2.docx", tables=[("Table 6. Multiple linear regression", rows)]))[2].codes
    rows = [r[:] for r in _PONE_TABLE_3]
    rows[2][5] = "0.5416"  # exp(−0.817) = 0.442
    assert "coefficient-does-not-fit" in audit_file(_doc(tmp_path / "o2.docx", tables=[("Table 3. Multiple logistic regression", rows)]))[1].codes


def test_a_models_r_squared_and_adjusted_r_squared_in_prose():
    """"R² = .76, adj. R² = .76, F(1, 331) = 1060.30" (a model's fit as results sections give it; practice): the adjusted
    R² is checked against R² and the F's df (at most 1 − (1 − R²)(df₁ + df₂)/df₂) — "adj." had also ended the sentence
    for the parser, splitting the two. Numbers: statsmodels' OLS of pingouin's penguins, body mass on flipper length."""
    import pingouin as pg
    import statsmodels.formula.api as smf

    fit = smf.ols("body_mass_g ~ flipper_length_mm", pg.read_dataset("penguins").dropna()).fit()
    typed = f"R² = {fit.rsquared:.2f}, adj. R² = {fit.rsquared_adj:.2f}".replace("0.", ".") + f", F(1, {fit.df_resid:.0f}) = {fit.fvalue:.2f}, p < .001"
    assert typed == "R² = .76, adj. R² = .76, F(1, 331) = 1060.30, p < .001", typed
    found = audit_units([Unit("c", f"Flipper length explained body mass well, {typed}.")])
    assert [e.found for e in found] == ["R² = .76, adj. R² = .76", "F(1, 331) = 1060.30, p < .001"] and all(not e.codes for e in found)
    found = audit_units([Unit("c", f"Flipper length explained body mass well, {typed.replace('adj. R² = .76', 'adj. R² = .86')}.")])
    assert found[1].codes == ["effect-does-not-fit"] and "adj. R² = .86 is too large" in found[1].message
    # and R² itself is at least F·df₁/(F·df₁ + df₂) (= .762 here), whether the F is the model's or a step's change
    found = audit_units([Unit("c", f"Flipper length explained body mass, {typed.replace('R² = .76, adj. R² = .76', 'R² = .50')}.")])
    assert found[1].codes == ["effect-does-not-fit"] and "R² = .50 is too small" in found[1].message, [(e.found, e.codes) for e in found]


# JASP's published example of a two-way ANOVA with partial ω² and its interval (Discover JASP repository, Davey et al.'s
# data; https://discoverjasp.com/repository/dsj1_leni/leni_13), as its table prints it
_JASP_OMEGA = [["Cases", "Sum of Squares", "df", "Mean Square", "F", "p", "ω²ₚ", "Lower", "Upper"],
               ["mood", "34.133", "2", "17.067", "0.683", "0.509", "0.000", "0.000", "0.000"],
               ["stop_rule", "52.267", "1", "52.267", "2.093", "0.154", "0.018", "0.000", "0.139"],
               ["mood ✻ stop_rule", "316.933", "2", "158.467", "6.345", "0.003", "0.151", "0.009", "0.317"],
               ["Residuals", "1348.600", "54", "24.974", "", "", "", "", ""]]
# a thesis's Stroop analyses as typed (https://1library.net/article/stroop-colour-naming-exploring-effect-subliminal-single-multiple.y6l39g4y):
# its last F's p (.589) and η²p (.012) are those of F(2, 90) = .533 (scipy), not of the F(1,90) typed
_THESIS_STROOP = ("Prime Type x Prime Content, F(2,90)=1.916, p=.153, MSE=8.272, η2p=.041, and Prime Type x Time x Prime Content, "
                  "F(1,90)=.533, p=.589, MSE=.871, η2p=.012, were not significant.")


def test_partial_omega_squared_and_a_misprinted_df_in_real_reports(tmp_path):
    """ω², partial ω² (JASP's "ω²ₚ") and ε² are read and can only be smaller than the F's η²p (partial ω² = df₁(F − 1)/
    (df₁(F − 1) + N), N above df₂); JASP's published table fits, a mutated ω²ₚ does not. A thesis's F typed with one df
    where its p and η²p are those of two is flagged twice over (p and η²p), as scipy shows."""
    found = audit_file(_doc(tmp_path / "j.docx", tables=[("Table 1\nANOVA - checks", _JASP_OMEGA)], note="Note. Type III Sum of Squares"))
    assert [e.found for e in found][2] == "F(2, 54) = 6.345, p = 0.003, ω²p = 0.151" and all(not e.codes for e in found), [(e.found, e.codes) for e in found]
    rows = [r[:] for r in _JASP_OMEGA]
    rows[3][6] = "0.351"  # above η²p = 2 × 6.345 / (2 × 6.345 + 54) = .190
    assert audit_file(_doc(tmp_path / "j2.docx", tables=[("Table 1\nANOVA - checks", rows)], note="Note. Type III Sum of Squares"))[2].codes == ["effect-does-not-fit"]
    assert f"{stats.f.sf(0.533, 2, 90):.3f} {stats.f.sf(0.533, 1, 90):.3f} {2 * 0.533 / (2 * 0.533 + 90):.3f}" == "0.589 0.467 0.012"
    first, second = audit_units([Unit("c", _THESIS_STROOP)])
    assert not first.codes or set(first.codes) <= {"decimals", "spacing"}, first.codes
    assert {"p-does-not-follow", "effect-does-not-fit", "typo-fits"} <= set(second.codes), second.codes
    # the two agree on one other reading, which is said, and the p is not "corrected" to the mistyped df's
    assert "The p and η2p = .012 both follow from F(2, 90) = .533: one number may be mistyped" in second.message, second.message
    assert "p left out" in second.suggestion and "p = .467" not in second.suggestion, second.suggestion


def test_an_f_change_keeps_its_name_in_suggestions_and_revisions():
    """An F change typed "ΔF(1,330)=2.20" or "F change (1, 147) = .42" (the write-up above) had been suggested as a plain F —
    "F(1, 147) = 0.42" — and a ΔF's revision refused as dropping "ΔF"; the suggestion is now the style's ΔF, and the ΔF
    revised in place (a worded "F change" is still left as typed: the style has no place for the word). Numbers: the
    penguins model comparison above (F(1, 330) = 2.20, p = .139) and the write-up's F change."""
    (e,) = [e for e in audit_units([Unit("c", _WRITE_UP)], restyle=True, suggest_all=True) if e.found.startswith("F")]
    assert e.suggestion == "ΔF(1, 147) = 0.42, p = .52" and e.revision is None and "change" in e.kept
    (e,) = audit_units([Unit("c", "Bill depth added little, ΔF(1,330)=2.20, p=.139.")], restyle=True)
    assert e.codes == ["spacing"] and e.suggestion == "ΔF(1, 330) = 2.20, p = .139" and e.revision.plain() == "ΔF(1, 330) = 2.20, p = .139"


def test_an_intraclass_correlation_with_its_form_and_interval():
    """"ICC(A,1) = .73, 95% CI [.43, .93]" (pingouin's and Shrout & Fleiss's names for the forms) had not been read: an ICC
    is now an effect size bounded by −1 and 1 whose interval must hold it; its form — which estimator it is — is kept in
    the suggestion, and a revision that would drop it is refused. Numbers: pingouin's intraclass_corr of its wine-judging
    data (ICC(A,1) = .728, 95% CI [.43, .93]); the wrong values are mutations of ours."""
    import pingouin as pg

    icc = pg.intraclass_corr(pg.read_dataset("icc"), targets="Wine", raters="Judge", ratings="Scores").set_index("Type")
    value, (low, high) = icc.loc["ICC(A,1)", "ICC"], icc.loc["ICC(A,1)", "CI95"]
    typed = f"ICC(A,1) = {value:.2f}, 95% CI [{low:.2f}, {high:.2f}]".replace("0.", ".")
    assert typed == "ICC(A,1) = .73, 95% CI [.43, .93]"
    (e,) = audit_units([Unit("c", f"The judges agreed well, {typed}.")], restyle=True, suggest_all=True)
    assert e.found == typed and e.codes == [] and e.suggestion == typed and e.revision is None and "ICC(A,1)" in e.kept
    (e,) = audit_units([Unit("c", "The judges agreed well, ICC(A,1) = .97, 95% CI [.43, .93].")])
    assert e.codes == ["ci-excludes-estimate"]
    (e,) = audit_units([Unit("c", "The judges agreed well, ICC = 1.30.")])
    assert e.codes == ["impossible-value"]


def test_an_interval_is_checked_against_the_se_beside_it(tmp_path):
    """A coefficient's (or mean difference's) interval beside its SE reaches a z's quantile of SEs each side at the least
    (1.96 for 95%) and a t on 1 df's at the most (12.71), whatever the df; outside that (with the printed precision and a
    15% margin for profile intervals) the SE or the interval is another's. The published tables above fit (Pediatric
    Research 2020's half-widths are 1.97–2.06 SEs; BMC's and the oral-health table's too); a copied SE does not."""
    caption = ("Table 4\nMultiple linear regression models for the global executive function score", _PEDRES_TABLE_4)
    assert all(not e.codes for e in audit_file(_doc(tmp_path / "p.docx", tables=[caption])))
    assert all(not e.codes for e in audit_file(_doc(tmp_path / "b.docx", tables=[("Table 2 Multiple linear regression model", _BMC_TABLE_2)])))
    assert all(not e.codes for e in audit_file(_doc(tmp_path / "q.docx", tables=[("Table 6. Multiple linear regression", _OHRQOL_TABLE_6)])))
    rows = [r[:] for r in _PEDRES_TABLE_4]
    rows[2][2] = "0.40"  # Age's SE, the interval [0.15, 0.31] reaching 0.2 of it each side
    found = {e.found: e for e in audit_file(_doc(tmp_path / "w.docx", tables=[(caption[0], rows)]))}
    e = found["B = 0.23, SE = 0.40, 95% CI [0.15, 0.31], p < 0.001"]
    assert "coefficient-does-not-fit" in e.codes and "SEs each side" in e.message, e.message
    (e,) = audit_units([Unit("c", "Tenure predicted alertness (b = 0.42, SE = 0.30, 95% CI [0.22, 0.62], p = .17).")])
    assert "SEs each side" in e.message


# Results of an experiment on face ensembles, Journal of Vision (https://jov.arvojournals.org/article.aspx?articleid=2245945),
# as the journal's site prints them: each F followed, in its sentence, by the two groups' means the effect compares
_JOV_ENSEMBLE = (
    "We found a significant main effect of Test Face, F(1, 38) = 295.73, p < 0.001, η2p = 0.89, with participants responding "
    "\"present\" more often for test faces that matched the preceding set (M = 81.6%) than for those that did not (M = 42.4%). "
    "In addition, we found a significant main effect of Familiarity, F(1, 38) = 4.69, p = 0.037, η2p = 0.11, with a larger "
    "\"present\" response for familiar test faces (M = 63.9%) than for unfamiliar ones (M = 60.1%).")


def test_the_groups_means_after_words_are_not_the_tests():
    """A group's mean typed words after a test ("F(1, 38) = 4.69, p = 0.037, η2p = 0.11, with a larger response for
    familiar faces (M = 63.9%) than …") had been read into the F's clause: the F's text ran to the second mean, and its
    revision was refused for the words it would have dropped. The means are the groups', each a descriptive of its own,
    and the F is restyled alone; a mean typed right after a test's parts, or an SD after its mean's unit, stays with it."""
    entries = audit_units([Unit("c", _JOV_ENSEMBLE)], restyle=True)
    found = {e.found: e for e in entries}
    assert set(found) == {"F(1, 38) = 295.73, p < 0.001, η2p = 0.89", "F(1, 38) = 4.69, p = 0.037, η2p = 0.11",
                          "M = 81.6", "M = 42.4", "M = 63.9", "M = 60.1"}
    f = found["F(1, 38) = 4.69, p = 0.037, η2p = 0.11"]
    assert f.codes == ["leading-zero"] and f.revision.plain() == "F(1, 38) = 4.69, p = .037, η²ₚ = .11", f.kept
    assert all(not found[m].codes for m in ("M = 81.6", "M = 42.4", "M = 63.9", "M = 60.1"))
    (e,) = audit_units([Unit("c", "The groups differed, t(38) = 2.14, p = .039, M = 34.2 years, SD = 11.0.")])
    assert e.found == "t(38) = 2.14, p = .039, M = 34.2 years, SD = 11.0"


# Results of an experiment on face learning, Journal of Vision (https://jov.arvojournals.org/article.aspx?articleid=2122460),
# as the journal's site prints them (line breaks as there)
_JOV_TRAINING = ("An analysis of SAME trials revealed an increase in performance as a result of training, but it was not "
                 "statistically significant\nF(1,23) = 0.144, MSe = 160.3,\np = 0.707, n.s.")


def test_ns_beside_a_statistics_own_p_is_its_verdict_not_a_p():
    """"p = 0.707, n.s." had given the "n.s." a statistic of its own, flagged for a threshold where the exact p stood
    beside it. It is the author's verdict on the statistic before it: not read as a p, and checked against that p — an
    "ns" beside a p below alpha is a warning (an alpha of a correction the text names makes it a note). The F and its p:
    scipy's F(1, 23) tail at 0.144 is .708, as printed."""
    assert round(stats.f.sf(0.144, 1, 23), 2) == 0.71
    entries = audit_units([Unit("c", _JOV_TRAINING)])
    assert [e.found for e in entries] == ["F(1,23) = 0.144, MSe = 160.3,\np = 0.707"]
    assert "p-threshold" not in entries[0].codes and "ns-below-alpha" not in entries[0].codes
    (e,) = audit_units([Unit("c", _JOV_TRAINING.replace("0.144", "7.49").replace("0.707", "0.012"))])
    assert "ns-below-alpha" in e.codes and "p = 0.012, n.s." in e.message, e.message
    (e,) = audit_units([Unit("c", "The groups did not differ, t(40) = 2.10, p < .05 (ns).")])
    assert "ns-below-alpha" in e.codes
    (e,) = audit_units([Unit("c", "Pairs were compared with Bonferroni correction: t(40) = 2.10, p = .042, ns.")])
    assert "ns-below-alpha" not in e.codes and any("Bonferroni" in n for n in e.notes)
    (e,) = audit_units([Unit("c", "The groups did not differ, t(40) = 1.10, ns.")])  # a lone ns is the statistic's p, as before
    assert e.found == "t(40) = 1.10, ns" and e.codes == ["p-threshold"]


# A table of a binary logistic regression in J Am Board Fam Med (www.jabfm.org; "Binary Logistic Regression:
# Guideline-Concordant Depression Follow-up Care vs Independent Variables"), as the journal's site prints it: each odds
# ratio's P in the column before it (the note's marks † and ‡ are the table's; its note was not in the copy)
_JABFM_TABLE = """| Variables | P† | Unadjusted OR (95% CI) | P‡ | Adjusted OR (95% CI) |
|---|---|---|---|---|
| Depression with chronic conditions (CCI score ≥1) | .16 | 0.41 (0.12–1.14) | .15 | 0.29 (0.06–1.49) |
| Moderately severe | .01 | 0.14* (0.03–0.60) | .01 | 0.11* (0.02–0.55) |
| Severe | .01 | 0.50* (0.01–0.42) | .01 | 0.04* (0.01–0.41) |
| 45–54 | .34 | 0.43 (0.08–2.43) | .46 | 0.44 (0.05–3.90) |
| African-American | .11 | 2.92 (0.79–10.81) | .35 | 2.22 (0.42–11.77) |
"""


def test_an_odds_ratios_p_in_the_column_before_it(tmp_path):
    """Where each odds ratio's P stands before it ("P | OR (95% CI) | P | Adjusted OR (95% CI)"), the crude OR had been
    given the adjusted OR's P (the next P to its right) and the adjusted OR none. Each takes the P just before it now;
    the layout with the P after each ratio keeps its reading. The table's own slip — an OR of 0.50 outside its interval
    0.01–0.42 — is found either way."""
    path = tmp_path / "t.md"
    path.write_text("Table 3. Binary logistic regression\n\n" + _JABFM_TABLE, encoding="utf-8")
    found = {e.found: e for e in audit_file(path)}
    assert "OR = 2.92, 95% CI [0.79, 10.81], p = .11" in found and "aOR = 2.22, 95% CI [0.42, 11.77], p = .35" in found
    assert "OR = 0.43, 95% CI [0.08, 2.43], p = .34" in found and "aOR = 0.44, 95% CI [0.05, 3.90], p = .46" in found
    assert found["OR = 0.50, 95% CI [0.01, 0.42], p = .01"].codes == ["ci-excludes-estimate"]
    assert sum(bool(e.codes) for e in found.values()) == 1
    after = "\n".join("| " + " | ".join(c[:1] + [c[2], c[1], c[4], c[3]]) + " |" for c in
                      ([x.strip() for x in line.strip("|").split("|")] for line in _JABFM_TABLE.splitlines()[2:]))
    path.write_text("Table 3. Binary logistic regression\n\n| Variables | Unadjusted OR (95% CI) | P | Adjusted OR (95% CI) | P |\n"
                    "|---|---|---|---|---|\n" + after + "\n", encoding="utf-8")
    found = {e.found: e for e in audit_file(path)}
    assert "OR = 2.92, 95% CI [0.79, 10.81], p = .11" in found and "aOR = 2.22, 95% CI [0.42, 11.77], p = .35" in found


# Odds-ratio tables as epidemiology journals print them, each with its interval and p (or marks) in columns of its own:
# Table 7 of PMC10483752 (as PubMed Central prints it); Table 2 of a Gut article on squamous dysplasia (gut.bmj.com, as the
# journal's site prints it, three rows); a BMJ Open table of knee osteoarthritis against cognitive scores (three models side
# by side, two rows); Table 3 of Lowenfels et al., BMC Gastroenterology 2011, 11:101 (doi:10.1186/1471-230X-11-101; marks on
# the interval, defined in the note)
_OR_TABLES = {
    "Table 7": "| Risk factor | Odds ratio | 95% CI | P value |\n|---|---|---|---|\n| Age | 0.64 | 0.05–7.63 | 0.73 |\n"
               "| Current | 7.51 | 1.63–34.71 | < 0.01* |\n| Presence of untreated dental caries | 3.33 | 1.23–9.00 | < 0.05* |\n\n"
               "*P < 0.05 (statistically significant in multivariate logistic regression via forced-entry method)\n",
    "Table 2. Odds ratios (OR) and 95% confidence interval (CI)": "| Variable | OR | 95% CI | p Value† |\n|---|---|---|---|\n"
               "| Age, 10 years | 1.03 | 0.99, 1.06 | 0.18 |\n| Family history of cancer, yes | 1.57 | 1.13, 2.18 | 0.0065 |\n"
               "| Heating stove without chimney, yes | 2.22 | 1.27, 3.86 | 0.0052 |\n",
    "Table 2. ORs for occurrence of knee osteoarthritis": "| Explanatory variables | Reference | OR | 95% CI | p Value | OR | 95% CI | p Value |\n"
               "|---|---|---|---|---|---|---|---|\n| Gender | 0: men, 1: women | 4.36 | 2.33 to 8.16 | <0.001** | 4.02 | 1.50 to 10.74 | 0.006** |\n"
               "| Region | 0: mountainous area, 1: coastal area | 0.78 | 0.45 to 1.35 | 0.380 | 0.76 | 0.43 to 1.35 | 0.354 |\n",
    "Table 3. Multivariate ordinal logistic regression": "| | Males (n = 48,395) | | Females (n = 34,246) | |\n|---|---|---|---|---|\n"
               "| | OR | (95% CI) | OR | (95% CI) |\n| 50 - 59 | 1.06 | (0.98 - 1.16) | 1.00 | (0.91 - 1.11) |\n"
               "| 60 - 69 | 1.29 | (1.18 - 1.40)** | 1.14 | (1.03 - 1.26)* |\n\nAll odds ratios are adjusted for all other covariates in the "
               "table. * P < .01 **P < .0001\n",
}


def test_odds_ratio_tables_with_their_interval_and_p_in_columns_of_their_own(tmp_path):
    """"Odds ratio | 95% CI | P value" (and the same for models side by side, or with the interval's marks defined in the
    note) had not been read at all: only a ratio and its interval in one cell was. Each odds ratio is now read with its
    interval and its p — or the bound its marks stand for — and checked: the interval holds it and agrees with the p about
    1. The published tables are consistent; a ratio outside its interval, an interval that excludes 1 beside a p far above
    .05, and a mark of significance on an interval that holds 1 are found."""
    path = tmp_path / "t.md"
    read = {}
    for caption, table in _OR_TABLES.items():
        path.write_text(f"{caption}\n\n{table}", encoding="utf-8")
        entries = [e for e in audit_file(path) if e.unit.cell is not None]
        assert entries and all(not e.codes for e in entries), [(e.found, e.codes) for e in entries]
        read.update({e.found: e for e in entries})
    assert {"Odds ratio = 7.51, 95% CI [1.63, 34.71], p < 0.01", "OR = 1.57, 95% CI [1.13, 2.18], p = 0.0065",
            "OR = 4.02, 95% CI [1.50, 10.74], p = 0.006", "OR = 0.76, 95% CI [0.43, 1.35], p = 0.354",
            "OR = 1.29, 95% CI [1.18, 1.40], p < .0001", "OR = 1.06, 95% CI [0.98, 1.16]"} <= set(read)
    mutated = _OR_TABLES["Table 7"].replace("| 7.51 |", "| 0.71 |").replace("1.23–9.00 | < 0.05*", "1.23–9.00 | 0.73")
    path.write_text(f"Table 7\n\n{mutated}", encoding="utf-8")
    codes = {e.found: e.codes for e in audit_file(path) if e.codes}
    assert codes == {"Odds ratio = 0.71, 95% CI [1.63, 34.71], p < 0.01": ["ci-excludes-estimate"],
                     "Odds ratio = 3.33, 95% CI [1.23, 9.00], p = 0.73": ["ci-p-disagree"]}, codes
    marked = _OR_TABLES["Table 3. Multivariate ordinal logistic regression"].replace("(0.98 - 1.16)", "(0.98 - 1.16)*")
    path.write_text(f"Table 3\n\n{marked}", encoding="utf-8")
    assert [e.codes for e in audit_file(path) if e.codes] == [["ci-p-disagree"]]


def test_a_ratio_heads_spelled_out_and_marks_typed_as_the_low_asterisk(tmp_path):
    """"Univariate Odds Ratio (95% C.I)" over "4.4*(2.0-9.8)" (Table III of PMC10862421, as PubMed Central prints it) had
    not been read; nor had a ratio marked with the low asterisk "⁎" that PubMed Central's copies of publishers' tables print
    (PMC9877321's Table 3: "1.24 (1.05,1.45)⁎⁎"), whose note's "⁎ p < 0.05" was read as a p of its own. Here the marks are
    those of Lowenfels et al.'s Table 3 (above), printed so."""
    path = tmp_path / "t.md"
    path.write_text("Table-III. Odds ratio with 95% confidence interval using Binary Logistic Regression.\n\n"
                    "| Risk Factors | Univariate Odds Ratio (95% C.I) | Multivariate Odds Ratio (95% C.I) |\n|---|---|---|\n"
                    "| Hypertension | 4.4*(2.0-9.8) | 2.5(0.5-11.) |\n| Smoker | 1.2(0.4-3.2) | 0.7(0.2-2.4) |\n", encoding="utf-8")
    assert {e.found for e in audit_file(path)} == {"OR = 4.4, 95% CI [2.0, 9.8]", "OR = 1.2, 95% CI [0.4, 3.2]", "OR = 0.7, 95% CI [0.2, 2.4]"}
    path.write_text("Table 3\n\n| | Males OR (95% CI) | Females OR (95% CI) |\n|---|---|---|\n| 60 - 69 | 1.29 (1.18 - 1.40)⁎⁎ | "
                    "1.14 (1.03 - 1.26)⁎ |\n| VA/Military | 0.97 (0.90 - 1.05)⁎ | 0.90 (0.78 - 1.03) |\n\n⁎ P < .01 ⁎⁎P < .0001\n", encoding="utf-8")
    entries = audit_file(path)
    assert {e.found: e.codes for e in entries} == {"OR = 1.29, 95% CI [1.18, 1.40], p < .0001": [], "OR = 1.14, 95% CI [1.03, 1.26], p < .01": [],
                                                   "OR = 0.97, 95% CI [0.90, 1.05], p < .01": ["ci-p-disagree"], "OR = 0.90, 95% CI [0.78, 1.03]": []}


# Table 3 of "Thorium and fetal neural tube defects: an epidemiological evidence from large case-control study", Genes and
# Environment 2021 (doi:10.1186/s41021-021-00227-w; as the journal's site prints it, four of its rows): each row names its
# odds ratio (crude, then adjusted), each column an outcome with its P
_GENES_ENV_TABLE = ("| OR | Anencephaly (N = 123) a | P | Spina bifida (N = 115) | P | Total NTDs (N = 263) | P |\n|---|---|---|---|---|---|---|\n"
                    "| cOR b | 2.19 (1.46–3.28) | < 0.001 | 2.54 (1.67–3.87) | < 0.001 | 2.48 (1.82–3.37) | < 0.001 |\n"
                    "| aOR1 c | 1.40 (0.83–2.35) | 0.209 | 1.96 (1.18–3.24) | < 0.01 | 1.80 (1.23–2.63) | < 0.01 |\n"
                    "| aOR2 d | 1.53 (0.93–2.52) | 0.097 | 2.30 (1.41–3.75) | < 0.001 | 2.08 (1.45–3.00) | < 0.001 |\n"
                    "| aOR4 f | 1.39 (0.79–2.45) | 0.254 | 1.63 (0.94–2.80) | 0.080 | 1.67 (1.11–2.51) | < 0.05 |\n")


def test_ratios_named_by_their_row_each_with_the_p_to_its_right(tmp_path):
    """A table whose rows name the ratio ("cOR", "aOR1") and whose columns name the outcomes had not been read. Each
    cell's ratio and interval is read with the P column after it, in a table said to be of ratios (its caption, note or
    corner); a descriptive table's "HR" row (a heart rate's median and range) is not a hazard ratio."""
    path = tmp_path / "t.md"
    path.write_text("Table 3 Odds ratios of total neural tube defects (NTDs) and two of their subtypes\n\n" + _GENES_ENV_TABLE, encoding="utf-8")
    found = {e.found: e.codes for e in audit_file(path)}
    assert len(found) == 12 and not any(found.values())
    assert "OR = 2.54, 95% CI [1.67, 3.87], p < 0.001" in found and "aOR = 1.63, 95% CI [0.94, 2.80], p = 0.080" in found
    path.write_text("Table 3 Odds ratios\n\n" + _GENES_ENV_TABLE.replace("| 0.080 |", "| 0.008 |"), encoding="utf-8")
    assert {e.found: e.codes for e in audit_file(path) if e.codes} == {"aOR = 1.63, 95% CI [0.94, 2.80], p = 0.008": ["ci-p-disagree"]}
    path.write_text("Table 1. Baseline characteristics\n\n| | Control (n = 40) | Exercise (n = 42) | P |\n|---|---|---|---|\n"
                    "| HR | 72 (65–80) | 70 (62–79) | 0.30 |\n", encoding="utf-8")
    assert audit_file(path) == []


# A note of the Gut article's Table 2 above (as the journal's site prints it): a ratio labelled with its interval's level,
# the interval after its number
_GUT_NOTE = ("If the model is refit using a ratio variable representing a 100 Yuan increase (approximately 1 SD) in per capita "
             "household income, then the OR (95% CI) is 0.84 (0.69, 1.03), p = 0.080, with very little change in the OR estimates "
             "for the other variables.")


def test_a_ratio_labelled_with_its_intervals_level_in_a_sentence():
    """"the OR (95% CI) is 0.84 (0.69, 1.03), p = 0.080" had been read as a p alone: the ratio is now read with its
    interval (containment and agreement with the p checked), and left as typed by a revision, which would drop "is"."""
    (e,) = audit_units([Unit("c", _GUT_NOTE)], restyle=True)
    assert e.found == "OR (95% CI) is 0.84 (0.69, 1.03), p = 0.080" and e.codes == ["leading-zero"] and e.revision is None
    (e,) = audit_units([Unit("c", _GUT_NOTE.replace("p = 0.080", "p = 0.008"))])
    assert "ci-p-disagree" in e.codes
    (e,) = audit_units([Unit("c", _GUT_NOTE.replace("0.84 (0.69", "0.64 (0.69"))])
    assert "ci-excludes-estimate" in e.codes


# Table 2 of PMC10362262 (as PubMed Central prints it): "OR∗ (95% CI)" with the asterisk operator as the head's footnote mark
def test_a_ratio_head_with_the_asterisk_operator_as_its_mark(tmp_path):
    path = tmp_path / "t.md"
    path.write_text("Table 2.\n\n| Subgroup | Cases, n | Controls, n | OR∗ (95% CI) | aOR† (95% CI) |\n|---|---|---|---|---|\n"
                    "| Never-use | 2484 | 12691 | 1.0 (reference) | 1.0 (reference) |\n| Ever-use | 1332 | 6389 | 1.07 (0.99-1.16) | 0.87 (0.80-0.96) |\n"
                    "| ≥10 | 289 | 1761 | 0.83 (0.73-0.96) | 0.63 (0.54-0.74) |\n\n∗Adjusted for age, sex, and calendar time (by matching design).\n",
                    encoding="utf-8")
    assert {e.found for e in audit_file(path)} == {"OR = 1.07, 95% CI [0.99, 1.16]", "aOR = 0.87, 95% CI [0.80, 0.96]",
                                                   "OR = 0.83, 95% CI [0.73, 0.96]", "aOR = 0.63, 95% CI [0.54, 0.74]"}


# Table 2 of PMC7381040 (a JMIR article on virtual reality and anxiety; as PubMed Central prints it, three rows): a t's
# p under "P value (Cohen d)" with the d beside it in the cell, a df with its footnote's letter ("46.19f")
_JMIR_VR_TABLE = ("| Variables | Phase 1 (NoVR), mean (SD) | Phase 2 (YesVR), mean (SD) | df | t test | P value (Cohen d) |\n|---|---|---|---|---|---|\n"
                  "| TP1 | 44.34 (12.38) | 40.70 (11.06) | 47 | 1.06 | .30 |\n| TP2 | 48.03 (12.67) | 41.25 (7.54) | 46.19f | 2.34 | .02 (0.65) |\n"
                  "| TP3 | 39.55 (10.60) | 41.45 (11.69) | 47 | –0.59 | .56 |\n")
# Table 4.1 of a thesis on cognitive behaviour therapy and academic stress (shodhganga.inflibnet.ac.in, as
# vdocuments.mx copies it): the p marked "NS*", the df in the note
_THESIS_TABLE = ("| Group | Mean | SD | t-value | P value |\n|---|---|---|---|---|\n| Experimental | 15.67 | 0.61 | 0.41 | 0.68NS* |\n"
                 "| Control | 15.73 | 0.64 | | |\n\nNote: df= 58, * Non-significant\n")


def test_a_ts_p_beside_its_d_a_df_with_a_footnote_letter_and_the_notes_df(tmp_path):
    """A t's p under "P value (Cohen d)" (".02 (0.65)"), a df marked with a footnote's letter ("46.19f"), a p marked
    "NS*" and the df a table's note gives ("Note: df= 58") had not been read: the t's were left without p or df. Each
    is now read and checked; a mutated p is found."""
    path = tmp_path / "t.md"
    path.write_text("Table 2. Statistical analysis results.\n\n" + _JMIR_VR_TABLE, encoding="utf-8")
    found = {e.found: e.codes for e in audit_file(path)}
    assert found == {"t(47) = 1.06, p = .30": [], "t(46.19) = 2.34, p = .02": [], "t(47) = –0.59, p = .56": []}, found
    path.write_text("Table 4.1 Showing Mean age of the subjects in experimental and control group\n\n" + _THESIS_TABLE, encoding="utf-8")
    (e,) = audit_file(path)
    assert e.found == "t = 0.41, p = 0.68" and e.codes == [] and "df = 58 (as the table's caption or note gives them)" in e.checked
    path.write_text("Table 4.1\n\n" + _THESIS_TABLE.replace("0.68NS*", "0.18NS*"), encoding="utf-8")
    (e,) = audit_file(path)
    assert "p-does-not-follow" in e.codes


def test_a_difference_given_in_words_with_its_interval_and_p():
    """A difference as medical journals type it (practice: JAMA's and AMA 11's form, "mean difference, −2.1 [95% CI, −3.4
    to −0.8]; P = .002"; "the between-group difference was −4.2 points (95% CI, …; P = .03)") had left its interval
    unread and its P alone. The difference is now read with its interval — never without one — and checked: the
    interval holds it and agrees with the P about 0. It has no symbol in the styles, so it is never restyled; a
    difference without an interval ("a difference of 0.5 points") is not a statistic. The texts are invented in that form."""
    good = ("At 12 weeks, scores were lower (mean difference, −2.1 [95% CI, −3.4 to −0.8]; P = .002). The between-group "
            "difference was −4.2 points (95% CI, −7.9 to −0.5; P = .03). A difference of 0.5 points was not pursued.")
    entries = audit_units([Unit("c", good)], "ama11", restyle=True)
    assert [e.found for e in entries] == ["mean difference, −2.1 [95% CI, −3.4 to −0.8]; P = .002",
                                          "between-group difference was −4.2 points (95% CI, −7.9 to −0.5; P = .03"]
    assert all(not e.codes and e.revision is None for e in entries)
    (e,) = audit_units([Unit("c", "Scores were lower (mean difference, −2.1 [95% CI, −3.4 to −0.8]; P = .20).")], "ama11")
    assert e.codes == ["ci-p-disagree"]
    (e,) = audit_units([Unit("c", "The difference was 4.2 points (95% CI, 5.9 to 9.5; P = .03).")], "ama11")
    assert e.codes == ["ci-excludes-estimate"]


# Table 2 of PMC8277838 (a dentine hypersensitivity trial; as PubMed Central prints it, the Schiff score's rows): each
# cell an estimate with its interval, its percentage change and its p; the note names the interval's level
_PMC8277838_TABLE = (
    "| | | Test* | Control* | Test vs Cont** |\n|---|---|---|---|---|\n| Study 1 | BL | 2.70 (0.051) | 2.74 (0.051) | |\n"
    "| | 7 d | −0.74 (−0.84, −0.65) −27.4% p < 0.0001 | −0.03 (−0.13, 0.06) −1.1% p = 0.5059 | −0.71 (−0.85, −0.57) −26.4% p < 0.0001 |\n"
    "| | 14 d | −1.39 (−1.54, −1.23) −51.1% p < 0.0001 | −0.10 (−0.25, 0.06) −3.6% p = 0.2276 | −1.29 (−1.51, 1.07) −49.2% p < 0.0001 |\n"
    "| Study 2 | BL | 2.80 (0.039) | 2.83 (0.037) | |\n"
    "| | 7 d | −0.49 (−0.67, −0.30) −17.5% p < 0.0001 | −0.54 (−0.73, −0.62) −19.4% p < 0.0001 | 0.06 (−0.21, 0.32) 2.2% p = 0.67699 |\n\n"
    "Baseline values are raw means, all other are adjusted means from ANCOVA model.\n"
    "*Change from baseline (95% confidence interval), percentage change, p value.\n"
    "**Difference (95% confidence interval), percentage change, p value: first-named minus second-named group.\n")
# Table 6 of the CONSORT 2010 explanation, item 17a (consort-statement.org; adapted there from van Linschoten's trial): an
# adjusted difference with its interval in one cell
_CONSORT_TABLE = ("| | Exercise therapy 12 months (mean (SD)) | Control 12 months (mean (SD)) | Adjusted difference* (95% CI) at 12 months |\n"
                  "|---|---|---|---|\n| Function score (0-100) | 83.2 (14.8) | 79.8 (17.5) | 4.52 (-0.73 to 9.76) |\n"
                  "| Pain at rest (0-100) | 1.43 (2.2) | 2.61 (2.9) | -1.29 (-2.16 to -0.42) |\n")


def test_an_estimate_with_its_interval_and_p_in_one_cell(tmp_path):
    """Cells that give an estimate with its interval and p ("−0.71 (−0.85, −0.57) −26.4% p < 0.0001") had been read as
    their p alone, and "Adjusted difference* (95% CI)" over "4.52 (-0.73 to 9.76)" not at all. Each estimate is now read
    with its interval (the level the note gives) and its p and checked: the published table's two slips are found — an
    estimate outside its interval ("−0.54 (−0.73, −0.62)") and an interval that holds 0 beside p < 0.0001 (a lost minus:
    "−1.29 (−1.51, 1.07)") — and nothing else."""
    path = tmp_path / "t.md"
    path.write_text("Table 2. Between-treatment comparisons for change in Schiff sensitivity score\n\n" + _PMC8277838_TABLE, encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 9
    assert {e.found: e.codes for e in entries if e.codes} == {"estimate = −0.54, 95% CI [−0.73, −0.62], p < 0.0001": ["ci-excludes-estimate"],
                                                             "estimate = −1.29, 95% CI [−1.51, 1.07], p < 0.0001": ["ci-p-disagree"]}
    assert all(e.suggestion == "" for e in entries)  # (no suggestion of the p alone, which would read as the whole statistic's)
    path.write_text("Table 6. Example of reporting of summary results for each study group\n\n" + _CONSORT_TABLE, encoding="utf-8")
    assert {e.found: e.codes for e in audit_file(path)} == {"difference = 4.52, 95% CI [-0.73, 9.76]": [], "difference = -1.29, 95% CI [-2.16, -0.42]": []}
    path.write_text("Table 6\n\n" + _CONSORT_TABLE.replace("-1.29 (-2.16", "-2.29 (-2.16"), encoding="utf-8")
    assert [e.codes for e in audit_file(path) if e.codes] == [["ci-excludes-estimate"]]


# Regression tables as PubMed Central prints them: Table 3 of PMC1373609 ("βa | 95% CI for β | P value", the note calling
# the β unstandardised), Table 2 of PMC7757460 (standardised β with its interval in parentheses), Table 2 of PMC2713360
# (β with the SE of β and a t; "Probability" for p), Table 5 of PMC8889762 (Est, SE, t printed without its sign, p-value)
_BETA_TABLES = {
    "PMC1373609": "| Explanatory variables | βa | 95% CI for β | P value |\n|---|---|---|---|\n| 0–3 months | Reference | | |\n"
                  "| > 3–6 months | 0.013 | -0.016, 0.043 | 0.381 |\n| BMI | -0.003 | -0.005, -0.0004 | 0.020 |\n"
                  "| 15D score at baseline | 0.752 | 0.637, 0.867 | <0.001 |\n| Constant | 0.301 | | |\n| R square | 0.613 | | |\n",
    "PMC7757460": "| | Standardised beta coefficient | 95% CI | P value |\n|---|---|---|---|\n| Metabolic syndrome | −0.004 | (−0.040 to 0.033) | 0.847 |\n"
                  "| Hypertension | 0.032 | (−0.003 to 0.066) | 0.071 |\n| Heart disease | 0.081 | (0.047 to 0.114) | <0.001 |\n",
    "PMC2713360": "| Factor | Beta Weight (Standardized) | Standard Error of Beta | t-value | Probability |\n|---|---|---|---|---|\n"
                  "| Age | .240 | .131 | 1.84 | .07 |\n| Drug Group | .068 | .123 | .24 | Ns |\n| Initial SBP | −.660 | .130 | −5.09 | <.001 |\n",
    "PMC8889762": "| Variable | Est | SE | t | p-value |\n|---|---|---|---|---|\n| (Constant) | −14.73 | 103.4 | 0.143 | 0.8868 |\n"
                  "| Age (per year) | 2.865 | 1.421 | 2.017 | 0.0450 |\n| Gender | −30.76 | 26.32 | 1.168 | 0.2440 |\n",
}


def test_regression_tables_of_beta_est_and_unsigned_t(tmp_path):
    """A β column with its interval and p and no B (its head marked "βa"), "Beta Weight (Standardized)" with "Standard
    Error of Beta" and "Probability", and "Est" had not been read as estimates: the β's were not read at all, the t's not
    checked against β / SE or Est / SE. Each is now; a t printed without its sign beside a negative estimate (as the
    last table prints every t) is no finding, and PMC2713360's own slip — t = .24 where β / SE gives .55 — is found."""
    path = tmp_path / "t.md"
    found = {}
    for source, table in _BETA_TABLES.items():
        path.write_text(f"Table 2. Multiple linear regression ({source})\n\n{table}", encoding="utf-8")
        found[source] = {e.found: e.codes for e in audit_file(path) if e.unit.cell is not None}
    assert found["PMC1373609"] == {"β = 0.013, 95% CI [-0.016, 0.043], p = 0.381": [], "β = -0.003, 95% CI [-0.005, -0.0004], p = 0.020": [],
                                   "β = 0.752, 95% CI [0.637, 0.867], p < 0.001": []}
    assert len(found["PMC7757460"]) == 3 and not any(found["PMC7757460"].values())
    assert found["PMC2713360"] == {"t = 1.84, p = .07": [], "t = .24 Ns": ["coefficient-does-not-fit"], "t = −5.09, p < .001": []}
    assert len(found["PMC8889762"]) == 3 and not any(found["PMC8889762"].values())
    path.write_text("Table 5\n\n" + _BETA_TABLES["PMC8889762"].replace("| 2.017 |", "| 3.017 |"), encoding="utf-8")
    assert [c for c in ({e.found: e.codes for e in audit_file(path)}).values() if c] == [["coefficient-does-not-fit"]]


# Table 3 of PMC7355162 (Eur Psychiatry 2020; as PubMed Central prints it, five rows): Welch's t with its df, "PV" for its
# p and "Cohen_d" — the p's one-sided throughout, two of them in the direction opposite to the result
_EURPSY_TABLE = ("| Difference variable | m1 | sd1 | m0 | sd0 | T | df | PV | Cohen_d |\n|---|---|---|---|---|---|---|---|---|\n"
                 "| PANSS.Tot | 3.7 | 12.1 | −7.2 | 9.8 | 4.4 | 65.1 | <0.001 | 0.961 |\n| PANSS.Pos | 0.8 | 3.8 | −1.6 | 4.3 | 2.5 | 48.4 | 0.009 | 0.594 |\n"
                 "| ERFCS.Tot | 2.2 | 18.5 | −4.1 | 15.9 | 1.6 | 60.6 | 0.061 | 0.357 |\n| BEMRI.NB | −0.1 | 1.5 | 0.2 | 1.9 | −0.9 | 49.8 | 0.823 | −0.229 |\n"
                 "| MASC.Ho | −0.4 | 3.4 | 0.8 | 3.5 | −1.5 | 56.2 | 0.934 | −0.360 |\n")


def test_one_sided_ps_in_either_direction_and_a_pv_column(tmp_path):
    """"PV" heads the p column (it had not been read: the t's were left without p) and "Cohen_d" the d. The table's p's
    are one-sided: .009 and .061 are half the two-sided p's (scipy: t(48.4) = 2.5 gives .016), .823 and .934 are one
    minus half — a one-sided test whose direction is opposite to the result — which had been an error ("does not
    follow") and is now the same warning, saying which tail."""
    assert abs(1 - stats.t.sf(0.9, 49.8) - 0.8135) < 0.001 and abs(stats.t.sf(2.5, 48.4) - 0.0079) < 0.001
    path = tmp_path / "t.md"
    path.write_text("Table 3. Univariate differences between V1 and V2\n\n" + _EURPSY_TABLE, encoding="utf-8")
    found = {e.found: e for e in audit_file(path)}
    assert [e.codes for e in found.values()].count(["one-sided"]) == 4 and found["t(65.1) = 4.4, p < 0.001, d = 0.961"].codes == []
    assert "opposite to the result" in found["t(49.8) = −0.9, p = 0.823, d = −0.229"].message
    path.write_text("Table 3\n\n" + _EURPSY_TABLE.replace("| 0.823 |", "| 0.623 |"), encoding="utf-8")
    assert "p-does-not-follow" in {e.found: e for e in audit_file(path)}["t(49.8) = −0.9, p = 0.623, d = −0.229"].codes


# Sentences of Turkish education papers as an online dictionary quotes them (thefreedictionary.com, "Mann-Whitney U test"):
# SPSS's decimal commas among points, "[Z(472)= 1,80; p>0.05]"
_TR_TEXT = ("According to the results of the Mann-Whitney U test which aimed to test the attendees' self esteem levels in tandem with "
            "their gender [Z(472)= 1,80; p>0.05], marital status [Z(472)= 1,77; p>0.05], parental status [Z(472)= 1,78; p>0.05]; "
            "there was no statistical difference. The first effect held, t(38) = 2.50, p = .017.")


def test_a_decimal_comma_typed_among_points_is_read_as_one():
    """"Z(472)= 1,80" in a text of points had been read as z = 1 (a "decimals" finding on "1"); "t(38)= 2,14" as t = 2,
    whose p range then hid any slip. A comma that no thousands group explains (not three digits after it) is a decimal
    comma: read as such in a statistic's value, a p or an effect size, and a decimal-mark finding — never in an interval's
    or a list's numbers, whose comma parts two ("95% CI [2,9]", "df = 2,97")."""
    entries = audit_units([Unit("c", _TR_TEXT)])
    zs = [e for e in entries if e.found.startswith("Z")]
    assert len(zs) == 3 and all("decimal-mark" in e.codes and "decimals" not in e.codes for e in zs), [(e.found, e.codes) for e in zs]
    assert "1,80" in zs[0].message
    (e,) = audit_units([Unit("c", "The scores differed [Z(472)= 2,80; p<0.01].")])  # a mutation: 2.80 gives p = .005, 2 would give .046
    assert "p-does-not-follow" not in e.codes and "decimal-mark" in e.codes
    revised = audit_units([Unit("c", "The first held, t(38) = 2.50, p = .017; the second too, t(38)= 2,14; p=.039.")], restyle=True)[1]
    assert revised.revision.plain().replace("\u00a0", " ") == "t(38) = 2.14, p = .039"  # the revision settles it (it had been refused)
    (e,) = audit_units([Unit("c", "The groups differed, t(38) = 2.50, p = .017, 95% CI [2,9].")])
    assert e.found.endswith("95% CI [2,9]") and e.codes == []
    (e,) = audit_units([Unit("c", "The groups differed, F = 4.10, df = 2,97, p = .02.")])
    assert "F(2, 97) = 4.10" in e.checked and e.codes == []


def test_a_coefficients_se_in_parentheses_before_its_p():
    """"B = 0.23 (SE = 0.05), p < .001" (the SE in parentheses after the B, as many results sections type it; practice,
    the numbers invented) had left the p alone: it is now checked with B / SE, as "B = 0.23, SE = 0.05, p < .001" is."""
    (e,) = audit_units([Unit("c", "Stress predicted sleep quality, B = 0.23 (SE = 0.05), p < .001.")])
    assert e.codes == [] and any("SE = 0.05" in n for n in e.notes)
    (e,) = audit_units([Unit("c", "Stress predicted sleep quality, b = 0.23 (SE = 0.15), p < .001.")])
    assert e.codes == ["coefficient-does-not-fit"]


# statsmodels' summary_col of Wooldridge's log wage equation (Example 8.1, wage1 data), as printed on solomonegash.com's
# "Wooldridge in Python" pages: each coefficient with its marks, its SE in parentheses in the row below, two models
_WAGE_TABLE = ("| | Hetroskedastic (b/se) | Robust (b/se) |\n|---|---|---|\n| Intercept | 0.321*** | 0.321*** |\n| | (0.100) | (0.109) |\n"
               "| marrmale | 0.213*** | 0.213*** |\n| | (0.055) | (0.057) |\n| singfem | -0.110** | -0.110* |\n| | (0.056) | (0.057) |\n"
               "| educ | 0.079*** | 0.079*** |\n| | (0.007) | (0.007) |\n| tenursq | -0.001** | -0.001** |\n| | (0.000) | (0.000) |\n"
               "| R-squared | 0.461 | 0.461 |\n| N | 526 | 526 |\n\nStandard errors in parentheses.\n* p<.1, ** p<.05, ***p<.01\n")


def test_marked_coefficients_with_their_se_in_the_row_below(tmp_path):
    """Regression tables as economics and sociology print them — a coefficient with its marks, its SE in parentheses in
    the unnamed row below — had not been read. Each marked coefficient is now checked: its mark's bound against B / SE
    over every df (singfem's −0.110** with SE 0.056 is z = 1.96, p ≈ .050: fits; its robust −0.110* with 0.057 too); an SE
    printed as 0.000 bounds nothing; a mutated SE is found."""
    path = tmp_path / "t.md"
    path.write_text("Table 1. Log wage equation\n\n" + _WAGE_TABLE, encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 10 and all(not e.codes for e in entries), [(e.found, e.codes) for e in entries]
    assert "B = -0.110, SE = 0.057, p < .1" in {e.found for e in entries}
    path.write_text("Table 1\n\n" + _WAGE_TABLE.replace("| | (0.007) | (0.007) |", "| | (0.070) | (0.007) |"), encoding="utf-8")
    assert [e.found for e in audit_file(path) if e.codes] == ["B = 0.079, SE = 0.070, p < .01"]
    path.write_text("Table 1\n\n" + _WAGE_TABLE.split("\n\nStandard")[0] + "\n", encoding="utf-8")  # no marks defined: not read,
    (undefined,) = audit_file(path)  # and said so on the first cell marked (APA 7 §7.14)
    assert undefined.codes == ["marks-undefined"] and "with *, **, ***," in undefined.message, undefined.message


def test_a_correlations_own_interval_agrees_with_its_p():
    """A correlation's interval and its p must agree about 0, as a t's own interval does: "r(98) = .51, 95% CI [.35,
    .65], p < .001" (pingouin's corr of its mediation data, X and M: r = .514, CI95 [0.35, 0.65], p = 4.4e-08; and
    Spearman's ρ = .326, [0.14, 0.49], p = .0009) fits; an interval that holds 0 beside p < .001, or excludes 0 beside
    p = .40, had not been found (mutations of ours)."""
    import pingouin as pg

    df = pg.read_dataset("mediation")
    pearson, spearman = pg.corr(df["X"], df["M"]), pg.corr(df["X"], df["Y"], method="spearman")
    r, (low, high), p = pearson["r"].iloc[0], pearson["CI95"].iloc[0], pearson["p_val"].iloc[0]
    typed = f"r({len(df) - 2}) = {r:.2f}, 95% CI [{low:.2f}, {high:.2f}], p < .001".replace("0.", ".")
    assert typed == "r(98) = .51, 95% CI [.35, .65], p < .001" and p < 0.001
    rho, (low, high), p = spearman["r"].iloc[0], spearman["CI95"].iloc[0], spearman["p_val"].iloc[0]
    typed_s = f"rs(98) = {rho:.2f}, 95% CI [{low:.2f}, {high:.2f}], p = {p:.3f}".replace("0.", ".")
    assert typed_s == "rs(98) = .33, 95% CI [.14, .49], p = .001"
    for text in (typed, typed_s):
        (e,) = audit_units([Unit("c", f"The scores correlated, {text}.")])
        assert e.codes == [], (text, e.codes)
    (e,) = audit_units([Unit("c", "The scores correlated, " + typed.replace("[.35", "[−.05") + ".")])
    assert e.codes == ["ci-p-disagree"]
    (e,) = audit_units([Unit("c", "The scores correlated, r = .51, 95% CI [.35, .65], p = .40.")])
    assert "ci-p-disagree" in e.codes


def test_cramers_v_is_no_larger_than_chi_square_over_n():
    """Cramér's V is √(χ²/(N·k)) with k = min(rows, columns) − 1 ≥ 1: no larger than √(χ²/N), which had not been
    checked (only the lower bound, k ≤ df, was). pingouin's chi2_independence of its heart data, chest pain (4 kinds)
    by target: χ²(3, N = 303) = 81.69, V = .52 — fits; V = .62 cannot (a mutation of ours). With one df the bound is not
    applied: Yates's corrected χ² is often printed beside a φ from Pearson's."""
    import pingouin as pg

    _, _, tests = pg.chi2_independence(pg.read_dataset("chi2_independence"), x="cp", y="target")
    pearson = tests.iloc[0]
    typed = f"χ²({pearson['dof']:.0f}, N = 303) = {pearson['chi2']:.2f}, p < .001, V = {pearson['cramer']:.2f}".replace("0.", ".")
    assert typed == "χ²(3, N = 303) = 81.69, p < .001, V = .52"
    (e,) = audit_units([Unit("c", f"Chest pain and the diagnosis were related, {typed}.")])
    assert e.codes == []
    (e,) = audit_units([Unit("c", f"Chest pain and the diagnosis were related, {typed.replace('.52', '.62')}.")])
    assert e.codes == ["effect-does-not-fit"] and "too large" in e.message
    (e,) = audit_units([Unit("c", "Smokers differed, χ²(1, N = 200) = 7.50, p = .006, φ = .21.")])  # (Yates's 7.50 beside Pearson's φ)
    assert "effect-does-not-fit" not in e.codes


# PMC9667227 (Table 3, "Acceptance and Feasibility of the Interventions"): each row's test and its effect size with an interval in
# a cell, the level in the column's head ("Effect size [95% CI]"), limits set off by a semicolon, Cliff's d beside each U
_PMC9667227_TABLE3 = """Table 3. Acceptance and Feasibility of the Interventions.

| Variable | Active control intervention | Engagement intervention | Test statistic | Effect size [95% CI] |
|---|---|---|---|---|
| Overall rating | 5.3 (2.5) | 8.4 (1.6) | t(18) = 3.63, p = .002 | Cohen’s d = 1.48 [0.55; 2.41] |
| ‘Are you motivated to engage in therapy?’ | 8.1 (2.5) | 8.7 (1.7) | U = 86.5, p = .65 | Cliff’s d = .11 [-.34; .51] |
| ‘After using the tool, do you feel better prepared for therapy?’ | 3.6 (3.1) | 7.0 (2.6) | U = 115, p = .013 | Cliff’s d = .60 [.10; .86] |
| Time working with the intervention (minutes) | 31.7 (6.8) | 49.6 (6.9) | t(23) = 6.34, p < .001 | Cohen’s d = 2.61 [1.51; 3.71] |

Note. Unless otherwise indicated, M (SD) are presented.
"""


def test_an_interval_typed_without_its_level_is_read_for_its_limits(tmp_path):
    """An interval right after an effect size's, a ratio's or a correlation's number, without its level ("d = 1.48 [0.55;
    2.41]" under a head that names it, "OR = 10.79 (1.34–86.94)", "r = −.35 [−.42, −.27]") had not been read: an estimate
    outside it was not found. Its limits are checked now; its level unknown, not against the p; the statistic is left as
    typed in a revision, which says why. Sources: PMC9667227 Table 3 (published, consistent); statsmodels' logit of its
    spector data (PSI's odds ratio and profile-free Wald interval, exp of the coefficient's); pingouin's corr of its
    pairwise_corr data (Neuroticism and Extraversion, n = 500). The mutations are ours."""
    import pingouin as pg
    import statsmodels.api as sm

    path = tmp_path / "t3.md"
    path.write_text(_PMC9667227_TABLE3, encoding="utf-8")
    entries = audit_file(path)
    cohen = [e for e in entries if e.found.startswith("Cohen’s d") or e.found.startswith("d = ")]
    assert [e.found.split("= ")[-1] for e in cohen] == ["1.48 [0.55; 2.41]", "2.61 [1.51; 3.71]"]
    assert all("ci-excludes-estimate" not in e.codes and "ci-level" not in e.codes for e in entries)  # (the head names the level)
    path.write_text(_PMC9667227_TABLE3.replace("1.48 [0.55; 2.41]", "1.48 [1.55; 2.41]"), encoding="utf-8")
    assert sum("ci-excludes-estimate" in e.codes for e in audit_file(path)) == 1

    data = sm.datasets.spector.load_pandas().data
    fit = sm.Logit(data.GRADE, sm.add_constant(data[["GPA", "TUCE", "PSI"]])).fit(disp=0)
    ratio, (low, high) = math.exp(fit.params["PSI"]), np.exp(fit.conf_int().loc["PSI"])
    typed = f"OR = {ratio:.2f} ({low:.2f}–{high:.2f}), p = {fit.pvalues['PSI']:.3f}".replace("p = 0.", "p = .")
    assert typed == "OR = 10.79 (1.34–86.94), p = .025"
    (e,) = audit_units([Unit("c", f"The new method raised the odds of a better grade ({typed}).")])
    assert e.codes == ["ci-level"] and e.found == typed  # (a style finding in prose: the paragraph names no level before it)
    (e,) = audit_units([Unit("c", f"Odds ratios are given with their 95% CIs. The new method raised the odds of a better grade ({typed}).")])
    assert e.codes == []
    (e,) = audit_units([Unit("c", f"The new method raised the odds of a better grade ({typed.replace('(1.34', '(11.34')}).")])
    assert e.codes == ["ci-excludes-estimate", "ci-level"]

    corr = pg.corr(pg.read_dataset("pairwise_corr")["Neuroticism"], pg.read_dataset("pairwise_corr")["Extraversion"])
    r, (lo, hi) = corr["r"].iloc[0], corr["CI95"].iloc[0]
    typed = f"r(498) = {r:.2f} [{lo:.2f}, {hi:.2f}], p < .001".replace("-0.", "−.")
    assert typed == "r(498) = −.35 [−.42, −.27], p < .001"
    (e,) = audit_units([Unit("c", f"Neuroticism and extraversion were related (95% CI in brackets), {typed}.")])
    assert e.codes == [] and e.found == typed
    (e,) = audit_units([Unit("c", f"Neuroticism and extraversion were related (95% CI in brackets), {typed.replace('[−.42', '[−.32')}.")])
    assert e.codes == ["ci-excludes-estimate"]

    # the level named once in an earlier paragraph serves the text after it (not the text before it)
    named, bare = Unit("a", "Intervals are 95% CIs throughout."), Unit("b", "The effect was large, d = 0.68 [0.04, 1.31].")
    assert [e.codes for e in audit_units([named, bare])] == [[]] and [e.codes for e in audit_units([bare, named])] == [["ci-level"]]
    (e,) = audit_units([Unit("c", "The effect was as large as before, d = 0.62 [12, 13].")])  # a citation's numbers, not limits
    assert e.found == "d = 0.62"
    (e,) = audit_units([Unit("c", "The effect was large, t(38) = 2.14, p = .039, d = 0.68 [0.04, 1.31].")], restyle=True)
    assert e.revision is None and "without its level ([0.04, 1.31])" in e.kept


def test_cliffs_d_is_bounded_and_not_cohens():
    """Cliff's d (Cliff, 1993; his δ is the population's) lies between −1 and 1: written without a leading zero in APA
    style, like r. It had been read as Cohen's d ("A leading zero before a quantity that can exceed 1" on PMC9667227's
    "Cliff’s d = .11 [-.34; .51]"). pingouin's mwu of its anova data, light blond against dark brunette pain thresholds:
    U = 24, p = .016, rank-biserial r = .92 (Cliff's d for two groups: 2·CLES − 1)."""
    import pingouin as pg

    data = pg.read_dataset("anova")
    a, b = (data[data["Hair color"] == c]["Pain threshold"] for c in ("Light Blond", "Dark Brunette"))
    row = pg.mwu(a, b).iloc[0]
    cliff = 2 * row["CLES"] - 1
    typed = f"U = {row['U_val']:.0f}, p = {row['p_val']:.3f}, Cliff’s d = {cliff:.2f}".replace("0.", ".")
    assert typed == "U = 24, p = .016, Cliff’s d = .92"
    (e,) = audit_units([Unit("c", f"Light blonds bore more pain, {typed}.")])
    assert e.codes == []
    (e,) = audit_units([Unit("c", f"Light blonds bore more pain, {typed.replace('.92', '0.92')}.")])
    assert e.codes == ["leading-zero"]
    (e,) = audit_units([Unit("c", f"Light blonds bore more pain, {typed.replace('.92', '1.92')}.")])
    assert "impossible-value" in e.codes
    (e,) = audit_units([Unit("c", f"Light blonds bore more pain, {typed.replace('.92', '0.92')}.")], "ama11")
    assert "leading-zero" not in e.codes and "missing-leading-zero" not in e.codes


# PMC7901853 (Pain Medicine 2021;22(2):329–337, doi:10.1093/pm/pnz269), Table 2: the same patients at baseline and follow-up,
# each occasion's N in its head, a paired t test and an ANCOVA's t in cells of their own, without df
_PMC7901853_TABLE2 = """Table 2. Change in treatment outcome variables from baseline to follow-up

| Outcome | Min–Max | Baseline (N = 41) | Follow-up (N = 36) | Paired t Test | Cohen’s d | ANCOVA t Test | Cohen’s d |
|---|---|---|---|---|---|---|---|
| Pain intensity (past wk) | 0–10 | 6.41 (1.24) | 5.39 (1.70) | t = 3.64, P < 0.001 | 0.61 | t = 3.85, P < 0.001 | 0.64 |
| Pain intensity (past 3 mo) | 0–10 | 6.40 (1.11) | 5.71 (1.60) | t = 2.82, P = 0.008 | 0.47 | t = 2.82, P = 0.008 | 0.47 |
| Pain interference (PROMIS) | 8–40 | 27.37 (6.02) | 23.81 (8.57) | t = 2.41, P = 0.022 | 0.40 | t = 2.72, P = 0.010 | 0.45 |
| PCL-5 | 0–80 | 43.37 (13.64) | 35.72 (16.51) | t = 2.46, P = 0.019 | 0.41 | t = 3.19, P = 0.003 | 0.53 |
| PHQ-9 | 0–27 | 13.02 (5.67) | 9.67 (5.42) | t = 3.96, P < 0.001 | 0.66 | t = 4.06, P < 0.001 | 0.68 |
| Suicidal ideation | 0–3 | 0.27 (0.55) | 0.11 (0.32) | t = 2.22, P = 0.033 | 0.37 | t = 2.22, P = 0.033 | 0.37 |
| Anger (PROMIS) | 5–25 | 16.63 (4.13) | 14.94 (4.73) | t = 2.54, P = 0.016 | 0.42 | t = 2.33, P = 0.026 | 0.39 |
| Sleep (PROMIS) | 8–40 | 30.10 (8.51) | 26.33 (8.48) | t = 2.71, P = 0.010 | 0.45 | t = 2.82, P = 0.008 | 0.47 |
"""


def test_a_paired_or_a_models_t_in_a_table_takes_no_two_group_df(tmp_path):
    """A header's N for each occasion ("Baseline (N = 41) | Follow-up (N = 36)") had been read as two groups' sizes, and
    every t without df checked under df = 41 + 36 − 2 = 75: twelve errors on PMC7901853's Table 2, a correct table (its
    paired t's fit n − 1 for the completers, 35; its note's FDR sentence, left out here, had hidden them as notes). A t
    under a head naming a paired test is read under each occasion's n − 1; one under a head naming a model (ANCOVA,
    regression, adjusted) under no group size's df — its residual df depend on the covariates. A mutated p is still found."""
    path = tmp_path / "t2.md"
    path.write_text(_PMC7901853_TABLE2, encoding="utf-8")
    entries = audit_file(path, "ama11")
    assert len(entries) == 16 and all(set(e.codes) <= {"leading-zero", "decimals"} for e in entries)  # (AMA's P: 2 decimals from .01)
    paired = [e for e in entries if "paired t, as its column's head says" in e.checked]
    assert len(paired) == 8 and all(e.found.startswith("t = ") for e in paired)
    assert sum("over every df it may have" in e.checked for e in entries) == 8  # the ANCOVA's
    path.write_text(_PMC7901853_TABLE2.replace("t = 2.41, P = 0.022", "t = 2.41, P = 0.042"), encoding="utf-8")
    (bad,) = [e for e in audit_file(path, "ama11") if "p-does-not-follow" in e.codes]
    assert bad.found == "t = 2.41, P = 0.042"
    (finding,) = [f for f in bad.findings if f.code == "p-does-not-follow"]
    assert "no reading of the df fits: df = 41 − 1 (a paired t" in finding.evidence and "df = 36 − 1" in finding.evidence
    # the same in a sentence (ours, with the table's numbers): the occasions' sizes beside a t the sentence calls paired
    typed = "Pain interference fell from baseline (n = 41) to follow-up (n = 36), paired t = 2.41, p = .022."
    (e,) = [e for e in audit_units([Unit("c", typed)]) if e.found.startswith("t =")]
    assert e.codes == [] and "a paired t, as its sentence says" in e.checked
    (e,) = [e for e in audit_units([Unit("c", typed.replace(".022", ".042"))]) if e.found.startswith("t =")]
    assert e.codes == ["df-unstated"]  # (sizes not typed with the t itself: no df of theirs fits, others would)


def _pipe_table(caption: str, heads: list[str], rows: list[list[str]]) -> str:
    lines = [caption, "", "| " + " | ".join(heads) + " |", "|" + "---|" * len(heads)]
    return "\n".join(lines + ["| " + " | ".join(r) + " |" for r in rows]) + "\n"


def test_an_anova_tables_mean_squares_and_f_are_held_to_their_definitions(tmp_path):
    """An ANOVA table's SS, df, MS and F columns had been read for the F and its df only: a mean square that is not SS /
    df, or an F that is not MS / MS error, was not found. pingouin's two-way ANOVA of its anova2 data (Yield by Blend and
    Crop, SS | df | MS | F | p, a Residual row) and its repeated-measures ANOVA of its rm_anova data laid out as
    textbooks print it (Between treatments | Within | Between subjects | Error: the Within row is split below, so the
    error term is the Error row, df 92 — it had been read as Within's) fit; a transposed MS (an error) and an F that is
    not MS / MS error (a warning) are found (mutations ours)."""
    import pingouin as pg

    a = pg.anova(data=pg.read_dataset("anova2"), dv="Yield", between=["Blend", "Crop"], detailed=True)
    rows = [[r.Source, f"{r.SS:.2f}", f"{r.DF:.0f}", f"{r.MS:.2f}", "" if np.isnan(r.F) else f"{r.F:.2f}",
             "" if np.isnan(r.p_unc) else f"{r.p_unc:.3f}"] for r in a.itertuples()]
    assert rows[1] == ["Crop", "2736.58", "2", "1368.29", "2.53", "0.108"] and rows[3][0] == "Residual"
    table = _pipe_table("Table 1. Two-way ANOVA of yield", ["Source", "SS", "df", "MS", "F", "p"], rows)
    path = tmp_path / "a.md"
    path.write_text(table, encoding="utf-8")
    assert [e.codes for e in audit_file(path)] == [[], [], []]
    path.write_text(table.replace("1368.29", "1386.29"), encoding="utf-8")
    (crop,) = [e for e in audit_file(path) if e.codes]
    assert crop.codes == ["ms-does-not-fit"] and "2736.58 / 2" in crop.message
    path.write_text(table.replace("| 2.53 |", "| 3.53 |"), encoding="utf-8")
    (crop,) = [e for e in audit_file(path) if "f-does-not-fit" in e.codes]
    assert crop.found.startswith("F(2, 18) = 3.53")

    data = pg.read_dataset("rm_anova")
    means = data.groupby(["Subject", "Disgustingness"])["DesireToKill"].mean().unstack()
    grand, n, k = means.to_numpy().mean(), len(means), means.shape[1]
    treatments = n * ((means.mean() - grand) ** 2).sum()
    subjects = k * ((means.mean(axis=1) - grand) ** 2).sum()
    within = ((means - grand) ** 2).to_numpy().sum() - treatments
    error = within - subjects
    reference = pg.rm_anova(data=data, dv="DesireToKill", within="Disgustingness", subject="Subject", detailed=True)
    assert math.isclose(error, reference.SS[1], rel_tol=1e-9) and reference.DF[1] == n - 1 == 92
    f_value = (treatments / 1) / (error / (n - 1))
    rows = [["Between treatments", f"{treatments:.2f}", "1", f"{treatments:.2f}", f"{f_value:.2f}"],
            ["Within", f"{within:.2f}", f"{n * k - k}", "", ""],
            ["Between subjects", f"{subjects:.2f}", f"{n - 1}", "", ""],
            ["Error", f"{error:.2f}", f"{n - 1}", f"{error / (n - 1):.2f}", ""]]
    path.write_text(_pipe_table("Table 2. Repeated-measures ANOVA", ["Source", "SS", "df", "MS", "F"], rows), encoding="utf-8")
    (e,) = audit_file(path)
    assert e.found.startswith("F(1, 92) = 12.04") and e.codes == []


# structural equation models' fit tables as published: PMC7386898 (Table 3, "χ2 (df)" over "460.10 (105), p < .001", with χ²
# difference tests), PMC8710118 (Maternal & Child Nutrition, Table 3: one model a column, rows χ², df, p, RMSEA, 90% CI, p —
# the second p the RMSEA's test of close fit) and PMC7153860 (PLoS One 2020;15(4):e0230131, Table 3: rows "χ2 (df)" over
# "297.5 (134)" and "P-value"; its medical students' 2-factor column prints the P-value and χ2/df swapped, "2.22")
_PMC7386898_TABLE3 = """Table 3. Model fit statistics

| Variables | χ2 (df) | CFI | SRMR | RMSEA (90% CI) |
|---|---|---|---|---|
| Configural, equal factor structure | 460.10 (105), p < .001 | .990 | .025 | .057 (0.052, 0.062) |
| Metric, equal factor loadings | 387.21 (123), p < .001 | .993 | .025 | .045 (0.040, 0.051) |
| Configural vs. metric | 21.81 (18), p = .240 | — | — | — |
| Metric vs. scalar | 87.87 (32), p < .001 | — | — | — |
"""
_PMC8710118_TABLE3 = """Table 3.

| Indices | Model 0 | Model 1 | Model 8 |
|---|---|---|---|
| χ 2 | 686.70 | 512.86 | 175.89 |
| df | 71 | 70 | 69 |
| p | <0.001 | <0.001 | <0.001 |
| RMSEA | 0.17 | 0.15 | 0.07 |
| 90% CI | 0.16–0.18 | 0.13–0.16 | 0.06–0.09 |
| p | <0.001 | <0.001 | <0.004 |
"""
_PMC7153860_TABLE3 = """Table 3. Confirmatory factor analysis model fit parameters for 1-, 2-, 3-, and 4-factor models.

| Model | Inpatients | Outpatients | Medical students |
|---|---|---|---|
| 2-factor model | | | |
| χ2 (df) | 286.2 (134) | 271.4 (134) | 297.5 (134) |
| P-value | <0.0001 | <0.0001 | 2.22 |
| χ2/df | 2.14 | 2.03 | <0.0001 |
| 3-factor model | | | |
| χ2 (df) | 186.4 (132) | 197.8 (132) | 232.0 (132) |
| P-value | 0.0013 | 0.0002 | <0.0001 |
"""


def test_the_chi_square_tests_of_model_fit_tables_are_read(tmp_path):
    """A model's χ² test of fit had not been read where fit tables print it: with its df and p in one cell under "χ2 (df)"
    (only the p had been read, alone), or one model a column with the χ², df and p in rows of their own (nothing had been
    read). Read now and checked; the published slip in PMC7153860 (a p of 2.22, the χ²/df's place) is found; a χ² in a
    sentence ends where its fit indices begin, so the RMSEA's interval is not taken for the χ²'s and the χ² is restyled."""
    path = tmp_path / "fit.md"
    path.write_text(_PMC7386898_TABLE3, encoding="utf-8")
    entries = [e for e in audit_file(path) if e.found.startswith("χ²")]  # (and the RMSEA's in its interval: all fit)
    assert [e.found for e in entries] == ["χ²(105) = 460.10, p < .001", "χ²(123) = 387.21, p < .001", "χ²(18) = 21.81, p = .240", "χ²(32) = 87.87, p < .001"]
    assert all(e.codes == [] for e in entries)
    assert all(e.codes == [] for e in audit_file(path))
    path.write_text(_PMC7386898_TABLE3.replace("p = .240", "p = .024"), encoding="utf-8")
    assert [e.codes for e in audit_file(path) if e.codes] == [["p-does-not-follow", "verdict-changes"]]

    path.write_text(_PMC8710118_TABLE3, encoding="utf-8")
    entries = audit_file(path)
    assert [e.found for e in entries] == ["χ²(71) = 686.70, p < 0.001", "χ²(70) = 512.86, p < 0.001", "χ²(69) = 175.89, p < 0.001"]
    assert all(e.codes == [] for e in entries)

    path.write_text(_PMC7153860_TABLE3, encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 6
    (slip,) = [e for e in entries if e.codes]
    assert slip.found == "χ²(134) = 297.5, p = 2.22" and "impossible-p" in slip.codes

    typed = "The model fit well, χ2(24) = 31.2, p = .15, CFI = .98, RMSEA = .04, 90% CI [.00, .07], SRMR = .03."  # (ours)
    (e,) = audit_units([Unit("c", typed)], restyle=True)
    assert e.found == "χ2(24) = 31.2, p = .15" and e.revision is not None and e.revision.plain() == "χ²(24) = 31.2, p = .15"


# PMC7400860 (Nutrients 2020;12:2117, Table 3, per-protocol rows): Cohen's d with its interval in one cell under "Effect Size
# Cohen's d [95% Confidence Interval]" beside the t test's p and an adjusted model's β and p
_PMC7400860_TABLE3 = """Table 3. Changes in physical measurements and tests from baseline to 3-month follow-up.

| Outcome | Intervention change | Control change | Difference between groups p-Value | Effect Size Cohen’s d [95% Confidence Interval] | β | p-Value |
|---|---|---|---|---|---|---|
| Maximal mouth opening (mm) | 0.6 ± 1.6 | −0.3 ± 2.1 | 0.088 | 0.46 [−0.07, 0.98] | 0.962 | 0.072 |
| Maximal hand grip strength (kg) | 1.3 ± 3.8 | −0.6 ± 3.3 | 0.038 | 0.55 [0.03, 1.07] | 1.950 | 0.042 |
| 30-s chair stand test (number of repetitions) | 0.5 ± 2.3 | 2.3 ± 3.1 | 0.012 | −0.69 [−1.22, −0.15] | −2.074 | 0.008 |
"""


def test_an_estimate_with_its_interval_under_a_head_naming_the_level_is_held_to_it(tmp_path):
    """A column of estimates with their intervals under a head that names the level and no role of its own ("Effect Size
    Cohen's d [95% Confidence Interval]", PMC7400860; "RMSEA (90%CI)", PMC8712760; "Mean (95% CI)", "AUC (95% CI)") had not
    been read: an estimate outside its interval was not found. Each is held to its interval now (no p to compare: the
    interval's level alone); the published cells fit, a mutated one does not."""
    path = tmp_path / "e.md"
    path.write_text(_PMC7400860_TABLE3, encoding="utf-8")
    entries = [e for e in audit_file(path) if e.found.startswith("Effect Size")]
    assert [e.found for e in entries][0] == "Effect Size Cohen’s d = 0.46, 95% CI [−0.07, 0.98]" and len(entries) == 3
    assert all(e.codes == [] for e in entries)
    path.write_text(_PMC7400860_TABLE3.replace("−0.69 [−1.22", "−0.69 [−0.22"), encoding="utf-8")
    assert [e.codes for e in audit_file(path) if e.codes] == [["ci-excludes-estimate"]]
    rmsea = "| Model | χ2 (df) | p | RMSEA (90%CI) |\n|---|---|---|---|\n| Two-factor model | 929.640 (134) | < 0.001 | 0.074 (0.070–0.079) |\n"
    path.write_text("TABLE 3. Model fit indices (PMC8712760)\n\n" + rmsea, encoding="utf-8")
    assert [(e.found, e.codes) for e in audit_file(path)] == [("χ²(134) = 929.640, p < 0.001", []), ("RMSEA = 0.074, 90% CI [0.070, 0.079]", [])]
    path.write_text("TABLE 3. Model fit indices\n\n" + rmsea.replace("0.074 (", "0.084 ("), encoding="utf-8")
    assert [e.codes for e in audit_file(path)] == [[], ["ci-excludes-estimate"]]


def test_group_sizes_named_by_subscripts_and_the_bound_of_u():
    """Group sizes typed with their subscripts anywhere in the statistic's sentence ("n1 = n2 = 8", as the Mann–Whitney
    article of the English Wikipedia words its example statement of results; "n1 = 5, n2 = 5") had not been read: a U
    larger than n₁·n₂, which no data give, was not found, nor a t's df taken from them. pingouin's mwu of its anova data,
    light blond against dark brunette (five each): U = 24 of at most 25, p = .016; U = 124 cannot be (a mutation)."""
    import pingouin as pg

    data = pg.read_dataset("anova")
    a, b = (data[data["Hair color"] == c]["Pain threshold"] for c in ("Light Blond", "Dark Brunette"))
    row = pg.mwu(a, b).iloc[0]
    typed = f"U = {row['U_val']:.0f}, n1 = {len(a)}, n2 = {len(b)}, p = {row['p_val']:.3f}".replace("0.", ".")
    assert typed == "U = 24, n1 = 5, n2 = 5, p = .016"
    (e,) = audit_units([Unit("c", f"Light blonds bore more pain ({typed}).")])
    assert "impossible-value" not in e.codes
    (e,) = audit_units([Unit("c", f"Light blonds bore more pain ({typed.replace('U = 24', 'U = 124')}).")])
    assert "impossible-value" in e.codes and "5 × 5 = 25" in e.message
    (e,) = audit_units([Unit("c", "The distributions in the two groups differed significantly (Mann–Whitney U = 10.5, n1 = n2 = 8, P < 0.05 two-tailed).")])
    assert "impossible-value" not in e.codes
    (e,) = audit_units([Unit("c", "The distributions in the two groups differed significantly (Mann–Whitney U = 105, n1 = n2 = 8, P < 0.05 two-tailed).")])
    assert "impossible-value" in e.codes
    # a t without df takes n₁ + n₂ − 2 from them (the t and p ours, from scipy: t(23) = 2.50 gives p = .020)
    (e,) = audit_units([Unit("c", "Scores differed, t = 2.50, p = .020 (n1 = 12, n2 = 13).")])
    assert e.codes == [] and "df = 12 + 13 − 2 = 23" in e.checked
    (e,) = audit_units([Unit("c", "Scores differed, t = 2.50, p = .002 (n1 = 12, n2 = 13).")])
    assert "p-does-not-follow" in e.codes


def test_rs_followed_by_more_values_is_r_plural_and_spearmans_rs_is_restyled():
    """"rs = −.35 and −.37" lists two r's (as "Fs(1, 38) = 4.41 and 5.20" lists F's: practice) and had been read as one
    Spearman's r; a shared "ps < .001" now checks each — the list's r of −.01 cannot have it — and none is restyled as a
    Spearman's. A Spearman's "rs(498)" with no list after it is restyled with the s set below (its revision had been refused
    as dropping the word "rs"). And a plural head before an interval's level ("Fs(1, 38) = 4.41, 95% CI …") does not take
    the level for a value (it had made an F of 95). Numbers: pingouin's corr and scipy's spearmanr of pingouin's
    pairwise_corr data (Neuroticism with Extraversion −.35, Conscientiousness −.37, Openness −.01; Spearman's −.33)."""
    (a, b) = audit_units([Unit("c", "Neuroticism correlated with extraversion and conscientiousness, rs(498) = −.35 and −.37, ps < .001.")], restyle=True)
    assert (a.found, b.found) == ("rs(498) = −.35", "r(498) = −.37") and a.codes == b.codes == [] and a.revision is b.revision is None
    found = audit_units([Unit("c", "Neuroticism correlated with extraversion and openness, rs(498) = −.35 and −.01, ps < .001.")])
    assert [e.codes for e in found] == [[], ["p-does-not-follow", "verdict-changes"]]
    (e,) = audit_units([Unit("c", "Neuroticism and extraversion were related, rs(498) = −.33, p < .001.", ())], restyle=True)  # (Word: no italics)
    assert e.revision is not None and e.revision.plain() == "rₛ(498) = −.33, p < .001"
    found = audit_units([Unit("c", "Both effects were small, Fs(1, 38) = 4.41, 95% CI [.01, .20].")])
    assert [e.found for e in found] == ["Fs(1, 38) = 4.41, 95% CI [.01, .20]"]  # (one statistic: no F of 95)


# two abstracts as published: PMC6376725 (BMC Research Notes 2019, doi:10.1186/s13104-019-4127-1) types each adjusted odds
# ratio with its interval after a comma, "AOR = 15.47, 7.74–30.89", the level named once before; da Silva et al. (Revista de
# Saúde Pública 2020, doi:10.11606/s1518-8787.2020054003278) a prevalence with its interval, "40.4% (95%CI 35.6-45.3)"
_PMC6376725 = ("The prevalence of hypertension was (34.7%), 95% CI (30.6–38.8), of them 53.8 were Male and 46.2% were female. The "
               "multivariable regression analysis showed that having ever been told hypertension (AOR = 15.47, 7.74–30.89); using "
               "animal product butter (AOR = 2.66, 1.25–5.67); physical inactivity (AOR = 2.83, 1.34–6.01) and BMI 25.0 to 29.9 and "
               "greater than 30 (AOR = 5.02, 1.58–15.94 and AOR = 3.98, 1.04–16.01, respectively) were statistically significant "
               "predictors of hypertension.")
_SEROPREVALENCE = "Seroprevalence of total antibodies against SARS-CoV-2 was 40.4% (95%CI 35.6-45.3)."


def test_an_estimate_given_with_its_labelled_interval_and_a_ratios_interval_after_a_comma():
    """A prevalence, mean or accuracy given with its labelled interval right after it ("40.4% (95%CI 35.6-45.3)") had not
    been read, nor a ratio's interval set off by a comma alone ("AOR = 2.66, 1.25–5.67"): an estimate outside its interval
    was not found. Both published texts fit; mutations of ours are found. A ratio's interval so typed has no level of its
    own (the paragraph names 95% before it: no ci-level finding); the estimate's none is checked against a p (a
    prevalence's null is not 0)."""
    found = audit_units([Unit("c", _PMC6376725)])
    ratios = [e for e in found if e.found.startswith("AOR")]
    assert [e.found for e in ratios] == ["AOR = 15.47, 7.74–30.89", "AOR = 2.66, 1.25–5.67", "AOR = 2.83, 1.34–6.01", "AOR = 5.02, 1.58–15.94",
                                         "AOR = 3.98, 1.04–16.01"]
    assert all(e.codes == [] for e in found)
    (bad,) = [e for e in audit_units([Unit("c", _PMC6376725.replace("2.66, 1.25", "2.66, 3.25"))]) if e.codes]
    assert bad.codes == ["ci-excludes-estimate"]
    (e,) = audit_units([Unit("c", _SEROPREVALENCE)])
    assert e.found == "40.4% (95%CI 35.6-45.3)" and e.codes == []
    (e,) = audit_units([Unit("c", _SEROPREVALENCE.replace("40.4%", "49.4%"))])
    assert e.codes == ["ci-excludes-estimate"]
    found = audit_units([Unit("c", "Smokers had higher odds (OR = 1.52, 95% CI 1.10–2.10; n = 240).")])  # (a ratio's own interval: read once)
    assert [e.found for e in found] == ["OR = 1.52, 95% CI 1.10–2.10; n = 240"]


def test_a_mediations_indirect_effect_is_held_to_its_interval():
    """A mediation's indirect effect typed "ab = 0.36, 95% CI [0.22, 0.54]" (or "a×b") had not been read: one outside its
    bootstrap interval was not found. It is an effect size of its own now (it may exceed 1: a leading zero), held to its
    interval — not to a p (a bootstrap interval and a Sobel p may part). Numbers: pingouin's mediation_analysis of its
    mediation data (seed 42, 1,000 resamples): indirect 0.357, 95% CI [0.219, 0.539]; the mutation is ours."""
    import pingouin as pg

    row = pg.mediation_analysis(data=pg.read_dataset("mediation"), x="X", m="M", y="Y", seed=42, n_boot=1000).set_index("path").loc["Indirect"]
    typed = f"ab = {row['coef']:.2f}, 95% CI [{row['CI2.5']:.2f}, {row['CI97.5']:.2f}]"
    assert typed == "ab = 0.36, 95% CI [0.22, 0.54]"
    (e,) = audit_units([Unit("c", f"The indirect effect through M was significant, {typed}.")])
    assert e.found == typed and e.codes == []
    (e,) = audit_units([Unit("c", f"The indirect effect through M was significant, {typed.replace('[0.22', '[0.42')}.")])
    assert e.codes == ["ci-excludes-estimate"]
    (e,) = audit_units([Unit("c", "The indirect effect through M was significant (a×b = .36, 95% CI [0.22, 0.54]).")])
    assert e.codes == ["missing-leading-zero"]
    # in Word, where the text sets other symbols italic, an upright ab is an italics finding (APA 7 §6.45: Latin symbols italic)
    text = f"Scores rose (t(98) = 4.24, p < .001); the indirect effect through M was significant ({typed})."
    t, p, ab = text.index("t("), text.index("p <"), text.index("ab =")
    assert "italics" in [c for e in audit_units([Unit("c", text, ((t, t + 1), (p, p + 1)))]) for c in e.codes]
    assert "italics" not in [c for e in audit_units([Unit("c", text, ((t, t + 1), (p, p + 1), (ab, ab + 2)))]) for c in e.codes]


# PMC8484701 (Table 4, "Multivariate logistic regression analysis"): β, SE, OR and 95% CI columns, β marked with the note's
# marks; three of its rows do not fit: an OR outside its interval (1.685 beside 1.998–2.844), another (0.25 beside 1.055–1.141,
# whose β / SE, 1.79, cannot give the ** it is marked with), and an OR that is not exp(β) (0.567 beside β = 0.567)
_PMC8484701_TABLE4 = """Table 4. Multivariate logistic regression analysis.

| Variables | Items | Control group | β | SE | OR | 95% CI |
|---|---|---|---|---|---|---|
| Gender | Female | Male | 0.217 | 0.138 | 1.242 | 0.948–1.628 |
| Education level | High school | Illiterate | 1.164** | 0.336 | 3.203 | 1.657–6.194 |
| Monthly income (yuan) | 3,000–4,999 | <999 | 0.522* | 0.267 | 1.685 | 1.998–2.844 |
| Self-health assessment | Fair | Very poor | −1.387** | 0.775 | 0.25 | 1.055–1.141 |
| Hypertension | Yes | No | 0.497** | 0.154 | 1.643 | 1.216–2.221 |
| Diabetes | Yes | No | −0.370* | 0.168 | 0.691 | 0.497–0.96 |
| Dyslipidemia | Yes | No | 0.567* | 0.181 | 0.567 | 0.397–0.809 |
| Disability | Yes | No | 0.922* | 0.414 | 2.515 | 1.118–5.658 |

SE, standard error; OR, odds ratio; CI, confidence interval.
*P < 0.05; **P < 0.01.
"""


def test_a_logistic_tables_beta_is_its_b_where_the_odds_ratios_are_exp_beta(tmp_path):
    """A β beside an odds ratio column is the logistic model's B where the ratios are exp(β) in most rows
    (PMC8484701's Table 4): each OR is then held to exp(β) and the β's marks to β / SE — its third slip, an OR of 0.567
    beside β = 0.567, and a ** that β / SE = 1.79 cannot give, had not been found. And a table whose odds ratio starts
    the row with an SE beside it ("Odds ratio | SE | 95% CI | p", as Stata's logistic prints the ratio's delta-method SE)
    had had each ratio read as a B and found "not exp(B)": statsmodels' logit of its spector data, laid out so, fits."""
    import statsmodels.api as sm

    path = tmp_path / "t4.md"
    path.write_text(_PMC8484701_TABLE4, encoding="utf-8")
    found = {e.found.split(", 95%")[0]: e.codes for e in audit_file(path)}
    assert found == {"OR = 1.242": [], "OR = 3.203": [], "OR = 1.685": ["ci-excludes-estimate"], "OR = 0.25": ["ci-excludes-estimate", "coefficient-does-not-fit"],
                     "OR = 1.643": [], "OR = 0.691": [], "OR = 0.567": ["coefficient-does-not-fit"], "OR = 2.515": []}

    data = sm.datasets.spector.load_pandas().data
    fit = sm.Logit(data.GRADE, sm.add_constant(data[["GPA", "TUCE", "PSI"]])).fit(disp=0)
    rows = []
    for name in ("GPA", "TUCE", "PSI"):
        ratio, (low, high) = math.exp(fit.params[name]), np.exp(fit.conf_int().loc[name])
        rows.append([name, f"{ratio:.2f}", f"{ratio * fit.bse[name]:.2f}", f"{low:.2f}–{high:.2f}", f"{fit.pvalues[name]:.3f}"])
    path.write_text(_pipe_table("Table 2. Logistic regression of the grade", ["Predictor", "Odds ratio", "SE", "95% CI", "p"], rows), encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 3 and all(e.codes == [] for e in entries), [(e.found, e.codes) for e in entries]


def test_an_odds_ratio_head_with_its_intervals_plural():
    """"OR (95%CIs)" — the interval's abbreviation in the plural, run on to the level, as PMC10379630's Table 3 heads each
    model's column — had not been read as an odds ratio's head: none of its 24 ratios was checked. Read now; the published
    rows fit (the men's rural OR, 1.33 (0.99–1.77) beside P = 0.055, among them), a mutated interval is found."""
    table = _pipe_table("Table 3. The association of different risk factors with ASCVD by logistic regression analysis.",
                        ["Characteristic", "OR (95%CIs)", "P-value", "OR (95%CIs)", "P-value"],
                        [["Rural", "1.25 (1.05–1.48)", "0.014", "1.33 (0.99–1.77)", "0.055"],
                         ["24 < 28", "1.39 (1.15–1.68)", "0.001", "1.38 (1.09–1.76)", "0.009"],
                         ["Over drinking", "2.90 (1.94–4.33)", "<0.001", "2.29 (1.49–3.50)", "<0.001"]])
    import tempfile
    from pathlib import Path

    with tempfile.TemporaryDirectory() as folder:
        path = Path(folder) / "t3.md"
        path.write_text(table, encoding="utf-8")
        entries = audit_file(path)
        assert len(entries) == 6 and all(e.codes == [] for e in entries) and entries[0].found == "OR = 1.25, 95% CI [1.05, 1.48], p = 0.014"
        path.write_text(table.replace("1.33 (0.99–1.77) | 0.055", "1.33 (1.09–1.77) | 0.55"), encoding="utf-8")  # (ours)
        # (the mutated lower limit also moves the interval's centre off the ratio: ln 1.09 and ln 1.77 centre on 1.39)
        assert [e.codes for e in audit_file(path) if e.codes] == [["ci-p-disagree", "ratio-does-not-fit"]]


def test_a_correlation_tables_intervals_in_the_row_below_are_read(tmp_path):
    """APA 7's correlation table with confidence intervals puts each coefficient's interval in brackets in the row under it
    ("−.35**" over "[−.42, −.27]"); the coefficients had been read, their intervals not. Each is now the coefficient's own
    (the note's one level), held to it and to its mark. Numbers: pingouin's corr of its pairwise_corr data (N = 500);
    the mutation is ours."""
    import pingouin as pg

    data = pg.read_dataset("pairwise_corr")
    names = ["Neuroticism", "Extraversion", "Conscientiousness"]

    def cell(a: str, b: str) -> tuple[str, str]:
        result = pg.corr(data[a], data[b])
        r, (low, high), p = result["r"].iloc[0], result["CI95"].iloc[0], result["p_val"].iloc[0]
        mark = "**" if p < .01 else "*" if p < .05 else ""
        text = lambda v: f"{v:.2f}".replace("0.", ".")  # noqa: E731
        return text(r) + mark, f"[{text(low)}, {text(high)}]"

    rows = [["1. Neuroticism", "", ""]]
    for i, name in enumerate(names[1:], start=2):
        values = [cell(name, other) for other in names[: i - 1]]
        rows.append([f"{i}. {name}"] + [v for v, _ in values] + [""] * (3 - i))
        rows.append([""] + [ci for _, ci in values] + [""] * (3 - i))
    assert rows[1][1] == "-.35**" and rows[2][1] == "[-.42, -.27]"
    table = _pipe_table("Table 1. Correlations with confidence intervals (N = 500)", ["Variable", "1", "2"], rows)
    note = "\nNote. Values in square brackets indicate the 95% confidence interval for each correlation. * p < .05. ** p < .01.\n"
    path = tmp_path / "c.md"
    path.write_text(table + note, encoding="utf-8")
    entries = audit_file(path)  # (extraversion and conscientiousness, r = .06, unmarked: not read)
    assert len(entries) == 2 and all(e.codes == [] for e in entries)
    assert entries[0].found == "r(498) = -.35, p < .01, 95% CI [-.42, -.27]"
    path.write_text(table.replace("[-.42, -.27]", "[-.42, -.37]") + note, encoding="utf-8")
    (bad,) = [e for e in audit_file(path) if e.codes]
    assert bad.codes == ["ci-excludes-estimate"]
    # its suggestion gives the p recomputed from r(498), not the mark's bound, and says so (it had said nothing: a mark's p has
    # no place in the statistic's text, and the suggestion had been taken for the p as given)
    assert bad.suggestion == "r(498) = −.35, 95% CI [−.42, −.37], p < .001 (p recomputed)"


# a paired comparison's write-up as a statistics question gives it, with its data (quoted in the Nemotron-CC-Math-v1
# dataset, huggingface.co/datasets/nvidia/Nemotron-CC-Math-v1): scipy's ttest_rel of the data reproduces t(27) = 2.7007,
# p = .0118 and the mean increase's 95% CI [0.0393, 0.2877]
_PAIRED_A = [0.40000000, 0.44011976, 0.72727273, 0.50000000, 0, 0.07692308, 0, 0, 0, 1, 0.5, 0.91666667, 0.19354839, 0.74883721, 0.5, 0.5,
             0.55, 0.17142857, 0.5, 0.51351351, 0.68, 0.85714286, 0.03703704, 0.05454545, 0.54219949, 0.44444444, 0, 0]
_PAIRED_B = [0, 0.54491018, 0.72727273, 0, 0, 0, 0, 0, 0, 1, 0, 0, 0, 0.33953488, 0, 0, 0, 0.48571429, 0, 0.83783784, 0.8, 0.57142857, 0, 0,
             0.06393862, 0.90476190, 0, 0]
_PAIRED_WRITE_UP = ("a statistically significant mean increase of 0.1635, 95% CI [0.0393, 0.2877], t(27) = 2.7007, p = 0.0118, d = 0.4938, "
                    "95% CI for d [-0.0501, 1.0378].")


def test_an_interval_labelled_for_what_it_is_of():
    """"95% CI for d [-0.0501, 1.0378]", "95% CI for the difference [0.04, 1.31]" — an interval's label naming what it is of
    — had not been read: a d outside its interval was not found. Read now as the d's (or the test's estimate's) and held to
    it; the restyled text keeps the interval with the style's label. The write-up's numbers are checked against scipy."""
    from scipy import stats

    result = stats.ttest_rel(_PAIRED_A, _PAIRED_B)
    assert (f"{result.statistic:.4f}", f"{result.pvalue:.4f}") == ("2.7007", "0.0118")
    found = [e for e in audit_units([Unit("c", _PAIRED_WRITE_UP)]) if e.found.startswith("t(27)")]
    assert found[0].found == "t(27) = 2.7007, p = 0.0118, d = 0.4938, 95% CI for d [-0.0501, 1.0378]"
    assert "ci-excludes-estimate" not in found[0].codes
    found = [e for e in audit_units([Unit("c", _PAIRED_WRITE_UP.replace("[-0.0501", "[0.5501"))]) if e.found.startswith("t(27)")]
    assert "ci-excludes-estimate" in found[0].codes
    (e,) = audit_units([Unit("c", "Scores rose, t(27) = 2.70, p = .012, d = 0.49, 95% CI for d [-0.05, 1.04].", ())], restyle=True)
    assert e.revision is not None and e.revision.plain() == "t(27) = 2.70, p = .012, d = 0.49, 95% CI [−0.05, 1.04]"


def test_a_ratio_with_its_labelled_interval_in_brackets_and_an_adjusted_ratio_worded():
    """"OR 10.79 [95% CI 1.34-86.94]" (the interval with its label inside brackets, as medical journals print it: practice)
    had been read without its closing bracket, and its revision refused as dropping it; "adjusted OR 10.79; 95% CI,
    1.34-86.94; P = .03" (AMA's punctuation) had its revision refused as dropping the word "OR" — the style's aOR stands
    for it. Numbers: statsmodels' logit of its spector data, PSI's odds ratio adjusted for GPA and TUCE."""
    import statsmodels.api as sm

    data = sm.datasets.spector.load_pandas().data
    fit = sm.Logit(data.GRADE, sm.add_constant(data[["GPA", "TUCE", "PSI"]])).fit(disp=0)
    ratio, (low, high) = math.exp(fit.params["PSI"]), np.exp(fit.conf_int().loc["PSI"])
    bracketed = f"OR {ratio:.2f} [95% CI {low:.2f}-{high:.2f}]"
    assert bracketed == "OR 10.79 [95% CI 1.34-86.94]"
    (e,) = audit_units([Unit("c", f"The new method raised the odds of a better grade ({bracketed}).", ())], "ama11", restyle=True)
    assert e.found == bracketed and e.codes == [] and e.revision is not None
    worded = f"adjusted OR {ratio:.1f}; 95% CI, {low:.1f}-{high:.1f}; P = .03"
    (e,) = audit_units([Unit("c", f"The new method raised the odds of a better grade ({worded}).", ())], "ama11", restyle=True)
    assert e.found == worded and e.revision is not None and e.revision.plain().startswith("aOR")


def test_a_marked_correlation_above_one_in_a_matrix_is_impossible(tmp_path):
    """A correlation matrix's marked cell typed above 1 ("1.35**" for "−.35**"; a slip a published table can carry) had been
    passed over as no coefficient at all; among three or more marked correlations under the variables' numbers it is read
    now, and found impossible. Numbers: pingouin's corr of its pairwise_corr data (N = 500); the slip is ours."""
    import pingouin as pg

    data = pg.read_dataset("pairwise_corr")
    names = ["Neuroticism", "Extraversion", "Agreeableness", "Conscientiousness"]
    rows = []
    for i, name in enumerate(names, start=1):
        cells = []
        for other in names[: i - 1]:
            result = pg.corr(data[name], data[other])
            r, p = result["r"].iloc[0], result["p_val"].iloc[0]
            cells.append(f"{r:.2f}".replace("0.", ".") + ("**" if p < .01 else "*" if p < .05 else ""))
        rows.append([f"{i}. {name}"] + cells + [""] * (len(names) - 1 - len(cells)))
    table = _pipe_table("Table 1. Correlations (N = 500)", ["Variable", "1", "2", "3"], [r[:4] for r in rows]) + "\nNote. * p < .05. ** p < .01.\n"
    marked = table.count("**")
    assert rows[1][1] == "-.35**" and marked >= 4
    path = tmp_path / "m.md"
    path.write_text(table, encoding="utf-8")
    assert len(audit_file(path)) >= 4 and all(e.codes == [] for e in audit_file(path))
    path.write_text(table.replace("-.35**", "1.35**"), encoding="utf-8")
    assert [e.codes for e in audit_file(path) if e.codes] == [["impossible-r"]]


# Environmental Health and Preventive Medicine 2021 (doi:10.1186/s12199-021-00968-8), Table 2: a logistic model's
# "β-coefficient | OR | 95% CI" without an SE column
_EHPM_TABLE2 = """Table 2. Factors associated with the outcome

| Factor | Subjects | Outcome | (%) | β-coefficient | OR | 95% CI |
|---|---|---|---|---|---|---|
| BMI ≥22.6 | 688 | 41 | (6.0) | −0.81 | 0.44 | 0.28–0.70 |
| Systolic blood pressure ≥156 mm Hg | 136 | 23 | (16.9) | 1.19 | 3.30 | 1.88–5.79 |
| ALT ≥35.0 U/ml | 82 | 11 | (13.4) | 0.77 | 2.16 | 1.03–4.52 |
| Stroke | 34 | 9 | (26.5) | 1.57 | 4.79 | 1.92–11.94 |
| Daily sleeping ≥8 h | 265 | 29 | (10.9) | 0.48 | 1.62 | 0.99–2.65 |
"""


def test_an_odds_ratio_is_held_to_exp_beta_without_an_se_column(tmp_path):
    """A "β-coefficient" head (hyphened) had not been read as β, and an odds ratio beside a logistic B without an SE column
    was not held to exp(B): the published table fits (exp(1.57) = 4.81 prints 4.79 within β's rounding), an OR of 2.61
    beside β = 0.77 (exp: 2.16; a mutation of ours) is found."""
    path = tmp_path / "t2.md"
    path.write_text(_EHPM_TABLE2, encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 5 and all(e.codes == [] for e in entries)
    path.write_text(_EHPM_TABLE2.replace("| 0.77 | 2.16 |", "| 0.77 | 2.61 |"), encoding="utf-8")
    (bad,) = [e for e in audit_file(path) if e.codes]  # (the mutated ratio is off its interval's centre too: it, not the interval, is wrong)
    assert bad.codes == ["coefficient-does-not-fit", "ratio-does-not-fit"] and "exp(B)" in bad.message


# PMC7723764 (Ann Med Surg 2020;60:680–685), Table 4: Cox models of overall survival, a crude and an adjusted hazard ratio
# with their 95% CIs and P values. The rows' numbers are the article's; the merged first row — a label filling both stub
# columns, as Word lays out a variable without categories — is this test's layout (practice), as is the t table after it.
_COX_ROWS = [["Prognostic factors", "Category", "HR (95%CI)", "P value", "aHR (95%CI)", "P value"],
             ["Race", "Black", "1.12 (1.10,1.15)", "<0.001", "0.98 (0.95,1.02)", "0.314"],
             ["Race, Native American", None, "1.39 (1.04,1.85)", "0.024", "1.17 (0.92,1.50)", "0.196"],
             ["Race", "Asian", "0.88 (0.80,0.97)", "0.012", "0.87 (0.79,0.97)", "0.010"]]


def _merged_doc(path, caption, rows, note="Note. aHR = adjusted hazard ratio; Model 1 is unadjusted."):
    """A Word table in which each None cell is merged into the cell before it in its row (a label across two stub
    columns, a spanner across the columns of several models), as Word merges cells."""
    d = docx.Document()
    d.add_paragraph(caption)
    t = d.add_table(rows=len(rows), cols=len(rows[0]))
    for i, row in enumerate(rows):
        for j, cell in enumerate(row):
            t.cell(i, j).text = cell or ""
        for j in range(len(row)):
            if row[j] is not None and j + 1 < len(row) and row[j + 1] is None:
                last = next((k for k in range(j + 1, len(row)) if row[k] is not None), len(row)) - 1
                t.cell(i, j).merge(t.cell(i, last)).text = row[j]
    d.add_paragraph(note)
    d.save(str(path))
    return path


def test_a_word_row_with_a_merged_cell_is_read_by_the_grid_columns(tmp_path):
    """A cell merged across two columns (w:gridSpan) had shifted the rest of its row one column left: the row's hazard
    ratios went unread under the P heads, and a t table's merged row was read as "t(.004) = 38" (its df as the t, its p as
    the df). Each cell is now placed by the grid column it starts at; its location still counts the row's cells as seen."""
    entries = audit_file(_merged_doc(tmp_path / "cox.docx", "Table 4. Cox Regression Models for Overall Survival", _COX_ROWS))
    merged = [e for e in entries if e.location.startswith("table 1, row 3,")]
    assert [e.found for e in merged] == ["HR = 1.39, 95% CI [1.04, 1.85], p = 0.024", "aHR = 1.17, 95% CI [0.92, 1.50], p = 0.196"]
    assert [e.location.split(",")[2] for e in merged] == [" cell 2", " cell 4"]  # the second and fourth cells the reader sees
    assert len(entries) == 6 and not any(e.codes for e in entries)
    t, df = 3.10, 38  # a t table on the same layout; p from scipy
    rows = [["Scale", "Subscale", "t", "df", "p"], ["Anxiety", "Somatic", "2.14", "38", f"{_p2(2.14, df):.3f}".lstrip("0")],
            ["Total", None, f"{t:.2f}", str(df), "0.300"]]  # the merged row's p is wrong: found only when the row is read right
    found = {e.found: e for e in audit_file(_merged_doc(tmp_path / "t.docx", "Table 1. Subscales", rows))}
    assert "p-does-not-follow" in found["t(38) = 3.10, p = 0.300"].codes
    assert not any(k.startswith("t(.") or k.startswith("t(0.") for k in found)


def test_a_latex_multicolumn_cell_is_read_by_the_grid_columns(tmp_path):
    """\\multicolumn{2}{l}{…} in a tabular's row fills two columns: the cells after it are the columns' past both (they
    had been read one column left). The rows of PMC7723764's Table 4 (above)."""
    def row(r):
        cells = [f"\\multicolumn{{2}}{{l}}{{{r[0]}}}"] if r[1] is None else [r[0], r[1]]
        return " & ".join(cells + [c.replace("%", "\\%") for c in r[2:]]) + " \\\\"
    body = "\n".join(row(r) for r in _COX_ROWS)
    path = tmp_path / "cox.tex"
    path.write_text(f"Table 4. Cox Regression Models for Overall Survival\n\n\\begin{{tabular}}{{llllll}}\n{body}\n\\end{{tabular}}\n")
    entries = audit_file(path)
    assert sum(e.found.startswith(("HR = 1.39", "aHR = 1.17, 95% CI [0.92")) for e in entries) == 2
    assert len(entries) == 6 and not any(e.codes for e in entries)


# PMC4864252 (J Cachexia Sarcopenia Muscle, article jcsm12073), Table 2 (rows of it): hazard ratios of three models under one
# spanner, "Hazard ratio (95% confidence interval)", each model's P beside it; Sci Rep 2022 (s41598-022-22065-8), Table 3
# (rows of it): "HR (95% CI)" over four models, no P. Both as the articles print them; merged cells as Word makes a spanner.
_SPANNED_HR = [["Mortality outcome", "Hazard ratio (95% confidence interval)", None, None, None, None, None],
               ["", "Model 1a", "P", "Model 2b", "P", "Model 3c", "P"],
               ["All participants", "2.03 (1.81–2.28)", "<.001", "1.40 (1.25–1.57)", "<.001", "1.29 (1.13–1.47)", "<.001"],
               ["Males", "1.91 (1.63–2.24)", "<.001", "1.42 (1.21–1.67)", "<.001", "1.21 (1.01–1.44)", ".039"],
               ["Males, cardiovascular", "1.76 (1.39–2.23)", "<.001", "1.25 (0.98–1.60)", ".071", "1.07 (0.81–1.40)", ".643"],
               ["Females, cancer", "1.12 (0.69–1.82)", ".633", "0.86 (0.52–1.41)", ".539", "0.85 (0.48–1.50)", ".571"]]
_SPANNED_HR_NO_P = [["Predictor", "Overall deaths, no. (%)", "HR (95% CI)", None, None, None],
                    ["", "", "Unadjusted", "Age adjusted", "Model 1a", "Model 2b"],
                    ["MI as continuous variable", "1596 (59.7)", "0.57 (0.48–0.67)", "0.65 (0.55–0.77)", "0.67 (0.57–0.79)", "0.69 (0.56–0.84)"],
                    ["Q4 (> 0.08)", "374 (57.9)", "1.05 (0.93–1.19)", "1.04 (0.92–1.17)", "1.01 (0.90–1.15)", "0.97 (0.85–1.11)"],
                    ["IQR (−0.19 to 0.08)", "750 (55.6)", "Reference", "Reference", "Reference", "Reference"],
                    ["Q1 (≤ −0.19)", "472 (69.6)", "1.51 (1.35–1.70)", "1.37 (1.22–1.54)", "1.38 (1.23–1.55)", "1.28 (1.12–1.46)"]]


def test_ratio_columns_under_a_spanner_that_names_the_ratio(tmp_path):
    """A spanner naming the ratio and its 95% CI over the heads of several models ("Model 1a | P | Model 2b | P …") makes
    each model's column that ratio's (adjusted where its own head says so); before, none of them was read. The P columns
    keep their own role; a "Reference" row under the heads is data, not another header."""
    entries = audit_file(_merged_doc(tmp_path / "a.docx", "Table 2. Mortality", _SPANNED_HR))
    assert len(entries) == 12 and not any(e.codes for e in entries)
    assert "HR = 1.25, 95% CI [0.98, 1.60], p = .071" in {e.found for e in entries}
    rows = [r[:] for r in _SPANNED_HR]
    rows[3][6] = ".39"  # a mutated P: the interval excludes 1
    found = {e.found: e for e in audit_file(_merged_doc(tmp_path / "m.docx", "Table 2. Mortality", rows))}
    assert "ci-p-disagree" in found["HR = 1.21, 95% CI [1.01, 1.44], p = .39"].codes
    entries = audit_file(_merged_doc(tmp_path / "b.docx", "Table 3 Mortality HRs from Cox regression by MI.", _SPANNED_HR_NO_P))
    names = [e.found.split(" =")[0] for e in entries]
    assert len(entries) == 12 and not any(e.codes for e in entries)
    assert names == ["HR", "aHR", "HR", "HR"] * 3  # the "Age adjusted" column's ratios are adjusted, in every row
    rows = [r[:] for r in _SPANNED_HR_NO_P]
    rows[5][5] = "1.82 (1.12–1.46)"  # a mutated ratio outside its interval
    found = {e.found: e for e in audit_file(_merged_doc(tmp_path / "n.docx", "Table 3", rows))}
    assert "ci-excludes-estimate" in found["HR = 1.82, 95% CI [1.12, 1.46]"].codes


def test_a_pipe_tables_spanner_names_the_ratio_of_the_empty_cells_after_it(tmp_path):
    """A pipe table cannot merge cells: a spanner naming the ratio stands in its first column with empty cells after it
    (pandoc's conversion of a merged head leaves it so); it spans them up to the next cell with words (PMC4864252's rows,
    above). Before, only the first model's column was read."""
    head = "| " + " | ".join(c or "" for c in _SPANNED_HR[0]) + " |\n|" + "---|" * 7 + "\n"
    body = "".join("| " + " | ".join(r) + " |\n" for r in _SPANNED_HR[1:])
    path = tmp_path / "t.md"
    path.write_text("Table 2. Mortality\n\n" + head + body, encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 12 and not any(e.codes for e in entries)


def test_a_latex_spanner_names_the_ratio_of_the_columns_it_spans(tmp_path):
    """The same spanner as \\multicolumn{6}{c}{…} over a LaTeX tabular's model columns (PMC4864252's rows, above)."""
    lines = ["Mortality outcome & \\multicolumn{6}{c}{Hazard ratio (95\\% confidence interval)} \\\\"]
    lines += [" & ".join(r) + " \\\\" for r in _SPANNED_HR[1:]]
    path = tmp_path / "t.tex"
    path.write_text("Table 2. Mortality\n\n\\begin{tabular}{lllllll}\n" + "\n".join(lines) + "\n\\end{tabular}\n")
    entries = audit_file(path)
    assert len(entries) == 12 and not any(e.codes for e in entries)


# BMC Public Health 2010;10:403 (PMC2912812), Table 3 (rows of it): a multilevel model's coefficients as "β (SE)" in one cell
# with the article's * mark, each model's p-value in the column after it; two header rows (the models, then "β (SE) | p-value")
_BETA_SE = """Table 3. Regional models with fixed effects, random effects and standard errors for PCS in 2004

| | Model 1 (baseline) | | Model 2 (+ sociodemographic variables) | | Model 3 | |
|---|---|---|---|---|---|---|
| | β (SE) | p-value | β (SE) | p-value | β (SE) | p-value |
| Constant | 49.37* (0.11) | < 0.001 | 51.62* (0.17) | < 0.001 | 51.94* (0.18) | < 0.001 |
| Age | -0.31* (0.00) | < 0.001 | -0.31* (0.00) | < 0.001 | -0.31* (0.00) | < 0.001 |
| Male | 0.92* (0.11) | < 0.001 | 0.70* (0.11) | < 0.001 | 0.71* (0.11) | < 0.001 |
| Migration background | | | -0.19 (0.18) | 0.296 | -0.31 (0.18) | 0.084 |
| Unemployed | | | -0.80* (0.23) | < 0.001 | -0.73* (0.23) | 0.001 |
| Single household | | | 0.25 (0.18) | 0.150 | 0.23 (0.18) | 0.185 |
| Level 1 (individuals) | 57.97 (0.81) | | 57.63 (0.80) | | 57.69 (0.80) | |

Notes: PCS, physical component score; β, beta coefficients; SE, standard errors. * significant at the 5% level using the Wald test.
"""


def test_a_beta_and_its_se_in_one_cell(tmp_path):
    """A "β (SE)" head is read as "B (SE)" is — each coefficient with its SE, held to the p beside it — and named β as the
    table names it; the random part's variances (no p) are not read. Before, none of the table was read."""
    path = tmp_path / "t.md"
    path.write_text(_BETA_SE, encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 15 and not any(e.codes for e in entries)
    assert all(e.found.startswith("β = ") for e in entries)
    path.write_text(_BETA_SE.replace("| 0.296 |", "| 0.029 |"), encoding="utf-8")
    (bad,) = [e for e in audit_file(path) if e.codes]
    assert bad.codes == ["coefficient-does-not-fit"] and "β = -0.19 and SE = 0.18" in bad.message


def test_an_effect_size_in_the_cell_beside_a_statistic_typed_whole(tmp_path):
    """A statistic typed whole in a cell takes the effect sizes typed alone in the cells beside it, up to its p or the
    next statistic ("F (1,56) = 1.7 | η2 = .952 | n.s.", as PLOS ONE 2015's Table 3 lays its contrasts out; or after the
    p): each checked against the F. That table (tests/real_typings.py, pmc4476782) prints η² = .952 — the first row's —
    beside F(1, 56) = 1.7, whose η²p is at most .03: its one published slip, now found, and no other row is flagged. Each
    η² cell is still listed on its own, for its style."""
    from real_typings import HELD_OUT, ITEMS, Table

    (table,) = [t for t in ITEMS + HELD_OUT if isinstance(t, Table) and t.source == "pmc4476782"]
    entries = audit_file(_doc(tmp_path / "p.docx", tables=[(f"Table 3\n{table.caption}", [list(r) for r in table.rows])]))
    flagged = [e for e in entries if "effect-does-not-fit" in e.codes]
    assert [e.found for e in flagged] == ["F (1,56) = 1.7, η2 = .952, n.s."] and "0.029 to 0.030" in flagged[0].message
    assert sum(e.found.startswith("F") for e in entries) == 17 and sum(e.found.startswith("η2") for e in entries) == 17


# Critical Care 2006;10:R137 (ccforum.com/content/10/5/R137), Table 2 (rows of it): each outcome's odds ratios under a head that
# names the outcome before the ratio, "Acute organ failure within 3 years; odds ratio (95% CI)b"
_CRIT_CARE = """Table 2. Odds ratios, from multivariable logistic regression models, for outcomes within 3 years

| Category | n (%) | Acute organ failure within 3 years; odds ratio (95% CI)b | Death within 3 years; odds ratio (95% CI) |
|---|---|---|---|
| 50–54 | 4,007 (26.0) | 1.2 (0.6–2.4) | 0.9 (0.6–1.4) |
| 55–59 | 3,761 (24.4) | 1.6 (0.9–3.0) | 1.8 (1.2–2.6) |
| Female | 8,490 (55.1) | 0.6 (0.4–0.9) | 0.6 (0.4–0.7) |
| GOLD 1 | 1,677 (10.9) | 1.9 (0.98–3.6) | 1.3 (0.9–1.9) |
"""
# Injury Prevention (BMJ; injuryprevention.bmj.com, table 144289, rows of it): "OR | Lower 95% CL | Upper 95% CL | p Value", the
# p column holding the note's marks
_INJ_PREV = """Table 3. Adverse medical events

| | OR | Lower 95% CL | Upper 95% CL | p Value |
|---|---|---|---|---|
| Age at baseline | 1.01 | 1.00 | 1.01 | * |
| Malea | 1.40 | 1.27 | 1.54 | *** |
| Never marriedb | 0.95 | 0.73 | 1.24 | |
| African-Americanc | 1.19 | 1.01 | 1.40 | * |
| Number of chronic conditions | 1.27 | 1.24 | 1.29 | *** |

Estimates were from random-effects multinomial logistic regression. *p<0.05; ***p<0.001.
"""


def test_odds_ratio_heads_and_limits_as_epidemiology_tables_name_them(tmp_path):
    """A ratio's head after the outcome it is for ("…within 3 years; odds ratio (95% CI)b": the first column had gone
    unread, the second read as a bare estimate without the ratio's null 1), and an interval's limits headed "Lower 95%
    CL" and "Upper 95% CL" with the p column holding the note's marks (the table had gone unread): each ratio held to
    its interval and, by its marks, to the p. Mutated limits are found."""
    path = tmp_path / "c.md"
    path.write_text(_CRIT_CARE, encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 8 and all(e.found.startswith("OR = ") for e in entries) and not any(e.codes for e in entries)
    path.write_text(_INJ_PREV, encoding="utf-8")
    entries = audit_file(path)
    assert [e.found for e in entries][:2] == ["OR = 1.01, 95% CI [1.00, 1.01], p < 0.05", "OR = 1.40, 95% CI [1.27, 1.54], p < 0.001"]
    assert len(entries) == 5 and not any(e.codes for e in entries)
    path.write_text(_INJ_PREV.replace("| 1.40 | 1.27 |", "| 1.40 | 0.97 |"), encoding="utf-8")  # (an interval no longer the ratio's)
    assert [e.codes for e in audit_file(path) if e.codes] == [["ci-p-disagree", "ratio-does-not-fit"]]


# Int J Environ Res Public Health 2018;15:352 (PMC5858421), Table 2 (rows of it): "Odds ratios of one-year mortality …" with
# heads "Crude Estimate (95% CI)" and, over "Model 1 | Model 2", the spanner "Adjusted Estimate (95% CI)"; marks in the cells
_IJERPH = [["Characteristics", "Crude Estimate (95% CI)", "Adjusted Estimate (95% CI)", None],
           ["", "", "Model 1", "Model 2"],
           ["North", "0.78 (0.73–0.84)", "0.86 (0.79–0.94)", "0.87 *** (0.80–0.94)"],
           ["Central", "0.92 (0.85–0.99)", "0.96 (0.89–1.04)", "0.97 (0.90–1.05)"],
           ["Male", "1.69 (1.64–1.74)", "1.67 (1.62–1.72)", "1.67 *** (1.61–1.72)"],
           ["Dementia", "1.32 (1.23–1.41)", "1.15 (1.06–1.23)", "1.12 ** (1.04–1.20)"]]


def test_estimate_heads_in_a_table_its_caption_calls_odds_ratios(tmp_path):
    """"Crude Estimate (95% CI)" (and the spanner "Adjusted Estimate (95% CI)" over the models' columns) in a table whose
    caption names one kind of ratio are that ratio's columns: held to the ratio's null 1 and its marks' bounds (they had
    been read as bare estimates, and the adjusted models not at all)."""
    note = "Note. Model 1 is adjusted for age and sex."
    path = _merged_doc(tmp_path / "o.docx", "Table 2. Odds ratios of one-year mortality in relation to patient- and hospital-level "
                       "characteristics.", _IJERPH, note)
    entries = audit_file(path)
    assert [e.found.split(" =")[0] for e in entries] == ["OR", "aOR", "aOR"] * 4 and not any(e.codes for e in entries)
    assert "OR = 0.87, 95% CI [0.80, 0.94], p < 0.001" not in [e.found for e in entries]  # (no note given here: marks stay marks)
    rows = [r[:] for r in _IJERPH]
    rows[3][3] = "1.97 (0.90–1.05)"  # a ratio outside its interval
    path = _merged_doc(tmp_path / "m.docx", "Table 2. Odds ratios of one-year mortality.", rows, note)
    assert [e.codes for e in audit_file(path) if e.codes] == [["ci-excludes-estimate"]]


def test_only_estimate_heads_become_the_ratio_a_caption_names(tmp_path):
    """In a table its caption calls odds ratios, an "Estimate (95% CI)" column is the ratio's (above), but a "Mean (95%
    CI)" beside the OR column is a mean: it had been read as an OR too (the ratio's head pattern shared a name with the
    bare estimates' own). The ratios are IJERPH 2018's (above); the means this test's."""
    path = tmp_path / "m.md"
    path.write_text("Table 2. Odds ratios of one-year mortality by group\n\n| Group | Mean (95% CI) | OR (95% CI) |\n|---|---|---|\n"
                    "| North | 3.2 (2.9–3.5) | 0.78 (0.73–0.84) |\n| South | 0.8 (0.5–1.1) | 0.92 (0.85–0.99) |\n", encoding="utf-8")
    assert [e.found.split(" =")[0] for e in audit_file(path)] == ["Mean", "OR", "Mean", "OR"]


# World J Psychiatry 2026;16(6):119401 (doi 10.5498/wjp.v16.i6.119401), Table 3 (its first three rows, as the journal's
# page prints them): four models side by side, each "B | SE | t value | 95%CI" under a spanner naming its outcome. Its
# first model's intervals in the Age and Primary caregiver rows are centred on another B (the second model's, whose own
# intervals they equal), and in the Gender row the interval excludes its B; t = −3.962 is not quite −1.747 / 0.440.
_FOUR_MODELS = """Table 3

Regression analysis of the mediation model

| Predictor | Depression | | | | Self-efficacy | | | | Posttraumatic growth | | | | Depression | | | |
|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|
| | B | SE | t value | 95%CI | B | SE | t value | 95%CI | B | SE | t value | 95%CI | B | SE | t value | 95%CI |
| Age | 0.384 | 0.333 | 1.153 | (-3.176 to 0.972) | -2.074 | 0.559 | -3.706c | (-3.176 to -0.972) | -1.962 | 0.822 | -2.385a | (-3.581 to -0.342) | -0.238 | 0.310 | -0.766 | (-0.848 to 0.372) |
| Gender | -1.747 | 0.440 | -3.962c | (-0.233 to 2.678) | 1.222 | 0.739 | 1.652 | (-0.233 to 2.678) | 1.719 | 1.067 | 1.611 | (-0.380 to 3.820) | -1.353 | 0.400 | -3.380c | (-2.141 to -0.565) |
| Primary caregiver | 0.040 | 0.267 | 0.151 | (-0.179 to 1.588) | 0.704 | 0.449 | 1.568 | (-0.179 to 1.588) | -1.493 | 0.647 | -2.306a | (-2.767 to -0.218) | 0.148 | 0.244 | 0.610 | (-0.331 to 0.629) |

aP < 0.05. cP < 0.001.
"""


def test_each_models_t_is_held_to_its_own_b_and_se(tmp_path):
    """In a table of several models side by side, each t is held to the B and SE of its own model's columns. Before, every
    t of a row was held to the last model's B and SE: nine of the twelve t's of this table were called "not B / SE". A t's
    interval is B ± t·SE, symmetric about B: the first model's copied intervals are found (centred on 0.704 and −1.102),
    and the near miss of −3.962 is shown with the digits that show it ("−3.976 to −3.965", not "−3.98 to −3.96")."""
    path = tmp_path / "t.md"
    path.write_text(_FOUR_MODELS, encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 12
    flagged = {e.found.split(",")[0]: e for e in entries if e.codes}
    assert set(flagged) == {"t = 1.153", "t = -3.962", "t = 0.151"}
    assert flagged["t = 1.153"].codes == ["coefficient-does-not-fit"] and "centred on -1.1020, not on the estimate 0.384" in flagged["t = 1.153"].message
    assert flagged["t = 0.151"].codes == ["coefficient-does-not-fit"] and "centred on 0.7045, not on the estimate 0.040" in flagged["t = 0.151"].message
    assert flagged["t = -3.962"].codes == ["ci-excludes-estimate", "coefficient-does-not-fit"]
    assert "B = -1.747 and SE = 0.440 give -3.976 to -3.965" in flagged["t = -3.962"].message


# PMC7577839 (Pediatr Res 2020;88:739–748), Table 4: two regression models side by side, "B | SE B | 95% CI | β | p" each,
# no test column (the layout of rows present in one model only as the page's text gives them)
_TWO_MODELS = """Table 4. Multiple linear regression models to explore the relationship between the global executive function score and frontal Glx/Cr (Model 1) and mI/Cr ratios (Model 2).

| | Model 1 | | | | | Model 2 | | | | |
|---|---|---|---|---|---|---|---|---|---|---|
| | B | SE B | 95% CI | β | p | B | SE B | 95% CI | β | p |
| Intercept | −6.01 | 0.74 | −7.48, −4.53 | | <0.001 | −4.46 | 0.60 | −5.65, −3.27 | | <0.001 |
| Age at assessment | 0.23 | 0.04 | 0.15, 0.31 | 0.46 | <0.001 | 0.22 | 0.04 | 0.15, 0.30 | 0.48 | <0.001 |
| Female sex | 0.12 | 0.09 | −0.06, 0.31 | 0.10 | 0.18 | 0.15 | 0.09 | −0.08, 0.29 | 0.12 | 0.11 |
| SES | 0.05 | 0.02 | 0.01, 0.10 | 0.18 | 0.03 | 0.05 | 0.02 | −0.00, 0.10 | 0.17 | 0.04 |
| Preterm birth | −0.06 | 0.11 | −0.27, 0.16 | −0.04 | 0.59 | | | | | |
| mI/Cr × birth group | | | | | | −2.84 | 1.21 | −5.25, −0.44 | −0.17 | 0.02 |

SES socioeconomic status, B unstandardized regression coefficients, SE B standard error of B, CI confidence interval, β standardized regression coefficients.
"""


def test_two_models_without_a_test_column_read_clean(tmp_path):
    """The same layout without a t column (B, SE, interval and p of each model): every coefficient read with its own
    model's SE and interval, and nothing flagged — the article's numbers agree."""
    path = tmp_path / "t.md"
    path.write_text(_TWO_MODELS, encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 10 and not any(e.codes for e in entries)
    assert "B = −2.84, SE = 1.21, 95% CI [−5.25, −0.44], p = 0.02" in {e.found for e in entries}


def test_an_interval_after_the_p_of_a_b_and_se_is_the_bs(tmp_path):
    """"b = …, SE = …, p = …, 95% CI […]": the interval after the p is the b's, as one typed before the p is — held to
    contain it and to span its SE. The numbers are statsmodels' OLS of its bundled Spector data (GRADE on GPA, TUCE and
    PSI), written as a sentence; before, an interval that excludes its b there went unremarked."""
    import statsmodels.api as sm

    data = sm.datasets.spector.load_pandas().data
    fit = sm.OLS(data["GRADE"], sm.add_constant(data[["GPA", "TUCE", "PSI"]])).fit()
    low, high = fit.conf_int().loc["PSI"]
    b, se, p = fit.params["PSI"], fit.bse["PSI"], fit.pvalues["PSI"]
    typed = f"Being taught by PSI raised the grade, b = {b:.2f}, SE = {se:.2f}, p = {p:.3f}".replace("p = 0.", "p = .")
    path = tmp_path / "t.md"
    path.write_text(f"{typed}, 95% CI [{low:.2f}, {high:.2f}].\n\nThe same with the TUCE score's interval: {typed}, 95% CI "
                    f"[{fit.conf_int().loc['TUCE'][0]:.2f}, {fit.conf_int().loc['TUCE'][1]:.2f}].\n", encoding="utf-8")
    first, second = audit_file(path)
    assert not first.codes and "Checked with the B typed before it" in first.notes[0]
    assert "ci-excludes-estimate" in second.codes


def test_a_ts_interval_is_centred_on_the_b_typed_before_it(tmp_path):
    """"b = …, SE = …, t(28) = …, p = …, 95% CI […]": the interval is b ± t·SE — held to the SE typed before the t and
    centred on the b. statsmodels' OLS of the Spector data (above) as the sentence; its own interval passes, the interval
    moved by half its width (a mutation) is found, as is one too narrow for the SE."""
    import statsmodels.api as sm

    data = sm.datasets.spector.load_pandas().data
    fit = sm.OLS(data["GRADE"], sm.add_constant(data[["GPA", "TUCE", "PSI"]])).fit()
    low, high = fit.conf_int().loc["PSI"]
    b, se, t, p = fit.params["PSI"], fit.bse["PSI"], fit.tvalues["PSI"], fit.pvalues["PSI"]
    typed = f"PSI raised the grade, b = {b:.2f}, SE = {se:.2f}, t({fit.df_resid:.0f}) = {t:.2f}, p = {p:.3f}".replace("p = 0.", "p = .")
    shift = (high - low) / 2
    path = tmp_path / "t.md"
    path.write_text(f"{typed}, 95% CI [{low:.2f}, {high:.2f}].\n\n{typed}, 95% CI [{low + shift:.2f}, {high + shift:.2f}].\n\n"
                    f"{typed}, 95% CI [{b - se:.2f}, {b + se:.2f}].\n", encoding="utf-8")
    own, moved, narrow = audit_file(path)
    assert not own.codes
    assert moved.codes == ["coefficient-does-not-fit"] and "is centred on" in moved.message
    assert narrow.codes == ["coefficient-does-not-fit"] and "SEs each side" in narrow.message


def test_each_models_interval_is_its_own_where_it_stands_before_the_t(tmp_path):
    """Two models side by side as "B | SE | 95% CI | t | p" each (the interval before the t): each t takes its own model's
    interval — the one whose B it stands beside —, not the next model's, which lies between it and the next t. Two OLS
    models of statsmodels' Spector data (GRADE on GPA and TUCE; then with PSI), printed as statsmodels gives them: nothing
    flagged. Before, the first model's t's took the second model's intervals and were called "another's"; random tables
    of one to four consistent models in five layouts (1,900 of them) now read without a finding."""
    import statsmodels.api as sm

    data = sm.datasets.spector.load_pandas().data
    fits = [sm.OLS(data["GRADE"], sm.add_constant(data[cols])).fit() for cols in (["GPA", "TUCE"], ["GPA", "TUCE", "PSI"])]
    lines = ["Table 2. Regression of the grade", "", "| | Model 1 | | | | | Model 2 | | | | |", "|" + "---|" * 11,
             "| | B | SE | 95% CI | t | p | B | SE | 95% CI | t | p |"]
    for name in ("const", "GPA", "TUCE", "PSI"):
        cells = [name]
        for fit in fits:
            if name not in fit.params:
                cells += [""] * 5
                continue
            low, high = fit.conf_int().loc[name]
            cells += [f"{fit.params[name]:.3f}", f"{fit.bse[name]:.3f}", f"{low:.3f}, {high:.3f}", f"{fit.tvalues[name]:.2f}", f"{fit.pvalues[name]:.3f}"]
        lines.append("| " + " | ".join(cells) + " |")
    path = tmp_path / "t.md"
    path.write_text("\n".join(lines) + "\n", encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 7 and not any(e.codes for e in entries)
    assert all("the interval's column" in e.notes[0] for e in entries)


def test_crude_and_adjusted_logistic_models_side_by_side(tmp_path):
    """A crude and an adjusted logistic model side by side as "B | SE | Wald | p | OR | 95% CI" each, as epidemiology
    tables print them: each Wald takes its own model's B, SE and odds ratio — the columns from its model's B to the next
    model's B —, not the odds ratio of the model before it, which stands between the two Walds. statsmodels' Logit of
    its Spector data (GRADE on PSI; then with GPA and TUCE), printed as it gives them: nothing flagged. Before, the
    adjusted model's Walds were held to the crude model's odds ratios (179 of 300 random such tables flagged)."""
    import statsmodels.api as sm

    data = sm.datasets.spector.load_pandas().data
    fits = [sm.Logit(data["GRADE"], sm.add_constant(data[cols])).fit(disp=0) for cols in (["PSI"], ["PSI", "GPA", "TUCE"])]
    lines = ["Table 3. Logistic regression of the grade", "", "| Variable | Crude | | | | | | Adjusted | | | | | |", "|" + "---|" * 13,
             "| | B | SE | Wald | p | OR | 95% CI | B | SE | Wald | p | OR | 95% CI |"]
    for name in ("PSI", "GPA", "TUCE"):
        cells = [name]
        for fit in fits:
            if name not in fit.params:
                cells += [""] * 6
                continue
            low, high = np.exp(fit.conf_int().loc[name])
            cells += [f"{fit.params[name]:.3f}", f"{fit.bse[name]:.3f}", f"{fit.tvalues[name] ** 2:.2f}", f"{fit.pvalues[name]:.3f}",
                      f"{np.exp(fit.params[name]):.2f}", f"{low:.2f}–{high:.2f}"]
        lines.append("| " + " | ".join(cells) + " |")
    path = tmp_path / "t.md"
    path.write_text("\n".join(lines) + "\n", encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 4 and not any(e.codes for e in entries)
    assert sum("the B and SE columns" in e.notes[0] for e in entries) == 4


# Markdown typing its symbols as inline LaTeX math: a study summary quoting Schulze, van Ravenzwaaij & Newell (2015),
# Cognitive Psychology 78, 78–98 (doi 10.1016/j.cogpsych.2015.03.002), typed with R Markdown's $\eta^2_p$; and an Authorea
# preprint's export (flame-challenge.authorea.com/users/597901/articles/630743), with \(\eta_{p}^{2}\)
_MD_MATH_TYPED = [
    "Significant main effect of trial block on high-probability choices (F(4.90, 235.11) = 18.42, p < .001, $\\eta^2_p$ = .277, "
    "BF = 2.79 x 10^22) - Significant main effect of competitor type on choice proportions (F(1, 48) = 11.66, p = .001, "
    "$\\eta^2_p$ = .195, BF = 25.08)",
    "A mixed-measures ANOVA for the negative affect scores (see Figure 3B), showed that there were significant main effects of "
    "Group, F (1, 61) = 6.05, p = .017, \\(\\eta_{p}^{2}\\) = 0.09, and Time,F (4, 244) = 13.07, p < .001, \\(\\eta_{p}^{2}\\) = "
    "0.18. The interaction of Time and Group was also significant,F (4, 244) =8.59, p < .001, \\(\\eta_{p}^{2}\\) = 0.12.",
]


def test_markdown_inline_math_is_read_as_it_prints(tmp_path):
    """Inline math in Markdown — $…$ as R Markdown and Quarto write it, \\(…\\) as some exports do — is read as LaTeX's
    is: $\\eta^2_p$ is η²p, each checked against its F (all of them fit) and its leading zero judged. Before, they were
    not read. A dollar sign that opens no math (pandoc's rule: "$5 and $10") leaves the text as typed."""
    path = tmp_path / "t.md"
    path.write_text("\n\n".join(_MD_MATH_TYPED) + "\n\nEach was paid $5 and $10, F(1, 48) = 11.66, p = .001.\n", encoding="utf-8")
    entries = audit_file(path)
    effects = [e for e in entries if "η" in e.found]
    assert [e.found.split("η")[1] for e in effects] == ["²p = .277", "²p = .195", "p² = 0.09", "p² = 0.18", "p² = 0.12"]
    assert not any(set(e.codes) - {"leading-zero", "spacing", "decimals"} for e in entries)  # (APA: η² to two decimals)
    assert sum("leading-zero" in e.codes for e in effects) == 3  # (0.09, 0.18, 0.12: APA writes .09)
    lines = path.read_text(encoding="utf-8").split("\n")
    last = entries[-1]
    assert last.found == "F(1, 48) = 11.66, p = .001" and last.location == f"line 5, characters {lines[4].index('F(') + 1}–{len(lines[4]) - 1}"
    source = lines[2]
    start, end = (int(x) for x in effects[2].location.split("characters ")[1].split("–"))
    assert source[start - 1 : end] == "F (1, 61) = 6.05, p = .017, \\(\\eta_{p}^{2}\\) = 0.09"  # (located in the source as typed)


# Tables of counts by group with one test per variable, as the articles print them: PMC6033040 (Allergy 2018;73:1232,
# Table 1, rows of it: row percents, a total column, each variable's P on its first category's row); PMC8722017 (BMC
# Pregnancy Childbirth 2022;22:6, Table 1: "χ2/Z" column, binary variables in one row with each group's n in its head);
# Research Square rs-45016/v1 (Table 1: "n,%" under the group heads, each variable's p on its own row)
_ROW_PERCENTS = """Table 1. Characteristics of the study subjects

| Variable | Total (n = 6043) | Non‐PiAR (n = 4928) | PiAR (n = 1115) | P value |
|---|---|---|---|---|
| Age (y),median (interquartile range) | 27.6 (19.1) | 26.1 (38.6) | 29.3(27.2) | .006 |
| Gender, n (%) | | | | |
| Male | 2900 | 2331 (80.4) | 569 (19.6) | .024 |
| Female | 3143 | 2597 (82.6) | 546 (17.4) | |
| Age group (y), n (%) | | | | |
| 0‐6 | 1028 | 960 (93.4) | 68 (6.6) | <.001 |
| 7‐12 | 945 | 794 (84.0) | 151 (16.0) | |
| 13‐17 | 448 | 324 (72.3) | 124 (27.7) | |
| 18‐39 | 1512 | 1054 (69.7) | 458 (30.3) | |
| 40‐59 | 1553 | 1287 (82.9) | 266 (17.1) | |
| ≥60 | 535 | 489 (91.4) | 46 (8.6) | |
| Race, n (%) | | | | |
| Han | 3288 | 2699 (82.1) | 589 (17.9) | .151 |
| Mongolian | 2486 | 2002 (80.5) | 484 (19.5) | |
| Other | 269 | 227 (84.4) | 42 (15.6) | |
| Residence, n (%) | | | | |
| Urban | 2961 | 2278 (76.9) | 683 (23.1) | <.001 |
| Rural | 3079 | 2647 (86.0) | 432 (14.0) | |

Chi‐square test and t test were performed in this table.
"""
_ONE_ROW_BINARY = """Table 1. Baseline characteristics of participations

| | n = 5030 | n = 22,608 | χ2/Z | P value |
|---|---|---|---|---|
| Age a | 32.00 (28.00,35.00) | 32.00 (29.00,35.00) | −2.889 | 0.004 |
| Preterm deliveryb | 287 (5.7%) | 1261 (5.6%) | 0.128 | 0.721 |
| Multiple pregnancyb | 29 (0.6%) | 490 (2.2%) | 56.513 | < 0.001 |
| Inductionb | 810 (16.1%) | 7536 (33.0%) | 579.495 | < 0.001 |
| Operative deliveryb | 95 (1.9%) | 1744 (7.7%) | 224.805 | < 0.001 |
| Ethnicb | | | 195.759 | < 0.001 |
| White | 2820 (56.1%) | 14,968 (66.2%) | | |
| Black | 597 (11.9%) | 1818 (8.0%) | | |
| others | 1613 (32.1%) | 5822 (25.8%) | | |

Data presented as n (%) or median (interquartile range). bThe categorical data were presented as numbers (frequencies, %), Chi-square test was used for categorical data (χ2)
"""
_WRONG_PERCENTS = """Table 1 Background characteristics of the participants.

| | Without depressive symptoms (N = 544) | With depressive symptoms (N = 419) | p value |
|---|---|---|---|
| | n,% | n,% | |
| Sex (N = 963) | | | 0.138 |
| Male (N = 429) | 231(42.46%) | 198(47.3%) | |
| Female (N = 534) | 313(57.54%) | 221(52.7%) | |
| School type (N = 963) | | | 0.947 |
| High school (N = 447) | 252(16.91%) | 195(46.6%) | |
| College (N = 516) | 292(83.09%) | 224(53.5%) | |
| Location (N = 963) | | | 0.300 |
| City (N = 424) | 247(45.4%) | 177(42.2%) | |
| Town (N = 292) | 154(28.3%) | 138(32.9%) | |
| Village (N = 247) | 143(26.3%) | 104(24.8%) | |
| Mean Age (SD) (N = 963) | 17.739(1.944) | 17.695(1.962) | 0.677 |
| Parents who spent more time taking care of the children in daily life (N = 963) | | | 0.589 |
| Mother (N = 559) | 315(57.90%) | 244(58.2%) | |
| Father (N = 404) | 229(42.10%) | 175(41.8%) | |

p value: Chi-square test and Mann-Whitney U test
"""


def _chi2_p(table, correction=False):
    return stats.chi2_contingency(np.array(table), correction=correction)[:2]


def test_a_tables_counts_give_its_chi_square_and_p(tmp_path):
    """A categorical variable's counts by group give its χ² and p: each p of PMC6033040's Table 1 (row percents, a total
    column that is no group) follows from its counts by Pearson's χ² — as scipy's chi2_contingency computes it —, and a
    mutated p does not. Before, none of the table's p's was read."""
    path = tmp_path / "t.md"
    path.write_text(_ROW_PERCENTS, encoding="utf-8")
    entries = audit_file(path)
    assert [e.found for e in entries] == ["p = .024", "p < .001", "p = .151", "p < .001"] and not any(e.codes for e in entries)
    chi, p = _chi2_p([[2331, 2597], [569, 546]])
    assert f"Pearson's χ²(1) = {chi:.3f} from them, p = {p:.4g}" in entries[0].notes[0]
    path.write_text(_ROW_PERCENTS.replace("| .151 |", "| .015 |"), encoding="utf-8")
    (bad,) = [e for e in audit_file(path) if e.codes]
    assert bad.codes == ["counts-do-not-fit"] and f"Pearson's χ² p = {_chi2_p([[2699, 2002, 227], [589, 484, 42]])[1]:.4g}" in bad.message
    # a note naming a trend test: a table larger than 2 × 2 may have had it — not held, and said so
    path.write_text(_ROW_PERCENTS.replace("| .151 |", "| .015 |").replace("Chi‐square test and t test", "Chi-square test for trend and t test"), encoding="utf-8")
    race = {e.found: e for e in audit_file(path)}["p = .015"]
    assert not race.codes and "not held to them: the caption or note names 'trend'" in race.notes[0]
    # a row's label that speaks of weights says nothing of the figures: read as before
    path.write_text(_ROW_PERCENTS.replace("| Other |", "| Birth weights |"), encoding="utf-8")
    assert [e.found for e in audit_file(path)] == ["p = .024", "p < .001", "p = .151", "p < .001"]
    # a survey's weighted percents and design-based test (said in the caption) are not the counts' own: not held to them
    path.write_text(_ROW_PERCENTS.replace("| .151 |", "| .015 |").replace("study subjects", "study subjects (weighted percentages)"), encoding="utf-8")
    assert not any(e.codes for e in audit_file(path))


def test_a_binary_variable_in_one_row_and_a_mixed_head(tmp_path):
    """A binary variable typed in one row takes its other category from each group's n in the head ("n = 22,608": a
    thousands comma); the "χ2/Z" column is χ² in the rows of counts, on the df the counts give, and Z in the median's
    row (its p recomputed from it). PMC8722017's χ² values
    are Pearson's to the printed digits; its Induction row prints 7536 of 22,608 as 33.0% (33.3%): the one finding. A
    mutated χ² is found. Before, nothing in the table was read."""
    path = tmp_path / "t.md"
    path.write_text(_ONE_ROW_BINARY, encoding="utf-8")
    entries = {e.found: e for e in audit_file(path)}
    assert set(entries) == {"z = −2.889, p = 0.004", "χ² = 0.128, p = 0.721", "χ² = 56.513, p < 0.001", "χ² = 579.495, p < 0.001",
                            "χ² = 224.805, p < 0.001", "χ² = 195.759, p < 0.001"}  # (the median row's Z: a Mann–Whitney test's)
    assert [e.codes for e in entries.values() if e.codes] == [["percent-does-not-fit"]]
    assert "share of its group's n: 7536 / 22,608 is 33.3%, not 33.0%." in entries["χ² = 579.495, p < 0.001"].message
    assert "chi2(2) = 195.759" in entries["χ² = 195.759, p < 0.001"].checked  # (on the df its three categories give)
    assert "p recomputed from z = −2.889: 0.003859" in entries["z = −2.889, p = 0.004"].checked
    assert f"{_chi2_p([[287, 5030 - 287], [1261, 22608 - 1261]])[0]:.3f}" == "0.128"
    path.write_text(_ONE_ROW_BINARY.replace("| 0.128 |", "| 0.182 |"), encoding="utf-8")
    bad = {e.found: e for e in audit_file(path)}["χ² = 0.182, p = 0.721"]
    assert "counts-do-not-fit" in bad.codes and "Pearson's χ² 0.128" in bad.message


def test_counts_whose_percents_are_wrong_and_a_p_no_test_of_them_gives(tmp_path):
    """Research Square rs-45016/v1's Table 1: its School type rows print 252 of 544 as 16.91% (46.32%) and 292 of 544 as
    83.09% — the percents still make up 100 in each column, so the rows are read as counts and the percents found —; its
    last variable's p = 0.589 follows from its counts by no usual test (Pearson's .918, Fisher's .947: scipy), a warning
    that names them. Sex and Location agree with Pearson's χ²."""
    path = tmp_path / "t.md"
    path.write_text(_WRONG_PERCENTS, encoding="utf-8")
    entries = {e.found: e for e in audit_file(path)}
    assert not entries["p = 0.138"].codes and not entries["p = 0.300"].codes
    school = entries["p = 0.947"]
    assert school.codes == ["percent-does-not-fit"] and "of its column's counts: 252 / 544 is 46.32%, not 16.91%" in school.message
    parents = entries["p = 0.589"]
    assert parents.codes == ["counts-do-not-fit"] and parents.severity == "warning"
    assert f"Fisher's exact test p = {stats.fisher_exact([[315, 229], [244, 175]])[1]:.4g}" in parents.message
    # the p of Location on its middle row instead (as an export of a cell merged down the rows may leave it): still the
    # three categories' test, not the middle category's against the rest
    moved = _WRONG_PERCENTS.replace("| Location (N = 963) | | | 0.300 |", "| Location (N = 963) | | | |").replace(
        "| Town (N = 292) | 154(28.3%) | 138(32.9%) | |", "| Town (N = 292) | 154(28.3%) | 138(32.9%) | 0.300 |")
    path.write_text(moved, encoding="utf-8")
    town = {e.found: e for e in audit_file(path)}["p = 0.300"]
    assert not town.codes and "the counts of 3 categories" in town.notes[0]


# World J Psychiatry 2026;16(6):119401 (doi 10.5498/wjp.v16.i6.119401), Table 1: depression scores (mean ± SD) by the
# categories of each characteristic, each variable's F/t and P on its first row (the variable's cell spans its rows in the
# journal's table, whose page text shifts the rows under it: laid out here as the table holds them)
_CATEGORY_MEANS = """Table 1 Participant characteristics and univariate analysis of depression (n = 290)

| Variable | Group | n (%) | mean ± SD | F/t value | P value |
|---|---|---|---|---|---|
| Age | ≤ 44 | 42 (14.5) | 6.24 ± 4.08 | 15.308 | < 0.001 |
| | 45-59 | 84 (29.0) | 8.57 ± 4.86 | | |
| | ≥ 60 | 164 (56.6) | 10.26 ± 4.17 | | |
| Gender | Male | 149 (51.4) | 10.07 ±4.80 | 11.755 | < 0.001 |
| | Female | 141 (48.6) | 8.26 ± 4.15 | | |
| Smoking | Yes | 82 (28.3) | 9.24 ± 4.67 | 0.18 | 0.893 |
| | No | 208 (71.7) | 9.16 ± 4.56 | | |
| Drinking | Yes | 85 (29.3) | 9.42 ± 4.96 | 0.322 | 0.571 |
| | No | 205 (70.7) | 9.08 ± 4.42 | | |
| Economic situation | Living beyond one’s means | 176 (60.7) | 9.27 ± 4.51 | 0.106 | 0.900 |
| | Breaking even | 85 (29.3) | 9.13 ± 4.48 | | |
| | Balance surplus | 29 (10.0) | 8.86 ± 5.39 | | |
| Primary caregiver | Spouse | 220 (75.9) | 9.15 ± 4.50 | 3.493 | 0.016 |
| | Parents | 11 (3.8) | 6.18 ± 4.33 | | |
| | Children | 57 (19.7) | 10.12 ± 4.63 | | |
| | Others | 2 (0.7) | 3.5 ± 4.95 | | |
| Religious beliefs | Yes | 12 (4.1) | 7.92 ± 5.18 | 0.961 | 0.328 |
| | No | 278(95.9) | 9.24 ± 4.56 | | |
| Household registration | Urban | 195 (67.2) | 9.41 ± 4.45 | 1.361 | 0.244 |
| | Rural | 95 (32.8) | 9.19 ± 4.58 | | |
"""


def test_a_measures_means_by_category_give_each_variables_f(tmp_path):
    """A measure's mean ± SD by the categories of each variable, the variable's F/t on its first row: one-way ANOVA's F
    from the printed means, SDs and n's (their digits a range), on (k − 1, N − k) df. The journal's Table 1 reads clean
    but for two rows: Smoking's 0.18, which its means give neither as t (about 0.13, whose p is the printed .893) nor
    as F, and Household registration's 1.361, whose means give F of about 0.15 (its p follows from the 1.361). scipy's
    one-way ANOVA from the same summaries is the reference for the clean rows. Before, the table was not read."""
    path = tmp_path / "t.md"
    path.write_text(_CATEGORY_MEANS, encoding="utf-8")
    entries = {e.found: e for e in audit_file(path)}
    assert len(entries) == 8
    flagged = {found: e.codes for found, e in entries.items() if e.codes}
    assert flagged == {"F(1, 288) = 0.18, p = 0.893": ["p-does-not-follow", "means-do-not-fit"], "F(1, 288) = 1.361, p = 0.244": ["means-do-not-fit"]}
    assert "F(3, 286) = 3.493, p = 0.016" in entries and "F(2, 287) = 15.308, p < 0.001" in entries
    # the same table headed "F" (read then by the table's F column): the means and the n's df serve it alike
    path.write_text(_CATEGORY_MEANS.replace("| F/t value |", "| F |"), encoding="utf-8")
    headed_f = {e.found: e.codes for e in audit_file(path) if e.codes}
    assert headed_f == {"F = 0.18, p = 0.893": ["p-does-not-follow", "means-do-not-fit"], "F = 1.361, p = 0.244": ["means-do-not-fit"]}
    path.write_text(_CATEGORY_MEANS, encoding="utf-8")
    # the suggestion does not recompute a p from a value its means do not give (the printed p is the means' own)
    assert entries["F(1, 288) = 0.18, p = 0.893"].suggestion == "F(1, 288) = 0.18 (p left out: the statistic itself does not follow from the table's numbers beside it)"

    def f_from(groups):  # one-way ANOVA from means, SDs and n's (definition), checked against the printed F
        total = sum(n for _, _, n in groups)
        grand = sum(m * n for m, _, n in groups) / total
        between = sum(n * (m - grand) ** 2 for m, _, n in groups) / (len(groups) - 1)
        within = sum((n - 1) * s * s for _, s, n in groups) / (total - len(groups))
        return between / within

    assert abs(f_from([(6.24, 4.08, 42), (8.57, 4.86, 84), (10.26, 4.17, 164)]) - 15.308) < 0.1
    assert abs(stats.t.sf(abs((9.24 - 9.16) / math.sqrt(((81 * 4.67**2 + 207 * 4.56**2) / 288) * (1 / 82 + 1 / 208))), 288) * 2 - 0.893) < 0.002


def test_two_groups_means_give_the_t_beside_them(tmp_path):
    """Two groups' mean ± SD in their columns under heads with their n, the t in its column: |t| from the printed means,
    SDs and n's by Student's or Welch's test. pingouin's penguins (body mass and flipper length by sex, scipy's t tests)
    printed as a Table 1: clean; a mutated t is found; a table whose heads name occasions ("Baseline | Follow-up") is not
    held to it (a paired t needs the correlation)."""
    import pingouin as pg

    d = pg.read_dataset("penguins").dropna()
    female, male = (d[d["sex"] == s] for s in ("female", "male"))
    lines = ["Table 1. Penguins by sex", "", f"| Measure | Female (n = {len(female)}) | Male (n = {len(male)}) | t | p |", "|---|---|---|---|---|"]
    for column in ("body_mass_g", "flipper_length_mm", "bill_depth_mm"):
        a, b = female[column], male[column]
        t, p = stats.ttest_ind(a, b, equal_var=(column != "body_mass_g"))  # (Welch's for body mass)
        lines.append(f"| {column} | {a.mean():.1f} ± {a.std():.1f} | {b.mean():.1f} ± {b.std():.1f} | {t:.2f} | {max(p, 0.001):.3f} |")
    text = "\n".join(lines) + "\n"
    path = tmp_path / "t.md"
    path.write_text(text.replace("| 0.001 |", "| < .001 |"), encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 3 and not any("means-do-not-fit" in e.codes for e in entries)
    mutated = text.replace(lines[-1].split(" | ")[3], f"{float(lines[-1].split(' | ')[3]) + 1.5:.2f}").replace("| 0.001 |", "| < .001 |")
    path.write_text(mutated, encoding="utf-8")
    assert sum("means-do-not-fit" in e.codes for e in audit_file(path)) == 1
    path.write_text(mutated.replace("Female (n", "Baseline (n").replace("Male (n", "Follow-up (n"), encoding="utf-8")
    assert not any("means-do-not-fit" in e.codes for e in audit_file(path))
    # the same means with their standard errors after ± ("mean ± SE" in the caption): not taken for SDs
    with_se = text
    for column in ("body_mass_g", "flipper_length_mm", "bill_depth_mm"):
        a, b = female[column], male[column]
        with_se = with_se.replace(f"{a.mean():.1f} ± {a.std():.1f}", f"{a.mean():.1f} ± {a.std() / math.sqrt(len(a)):.1f}")
        with_se = with_se.replace(f"{b.mean():.1f} ± {b.std():.1f}", f"{b.mean():.1f} ± {b.std() / math.sqrt(len(b)):.1f}")
    path.write_text(with_se.replace("Penguins by sex", "Penguins by sex (mean ± SE)").replace("| 0.001 |", "| < .001 |"), encoding="utf-8")
    assert not any("means-do-not-fit" in e.codes for e in audit_file(path))
    path.write_text(with_se.replace("| 0.001 |", "| < .001 |"), encoding="utf-8")  # (unsaid, the SEs would be taken for SDs)
    assert any("means-do-not-fit" in e.codes for e in audit_file(path))


def test_a_published_table_whose_ts_its_means_do_not_give(tmp_path):
    """PMC10964721's Table of baseline scores (tests/real_typings.py): two groups of 45, each score's mean ± SD, t and p.
    None of its ten t's follows from the means and SDs beside it (the ZBI row's means, 39.23 ± 7.23 and 41.56 ± 7.34,
    give |t| of about 1.52; it prints −0.255) — each a means-do-not-fit warning, beside the p's that do not follow from
    the t's (found before). PMC12588921's table of the same kind — the groups' n in a second header row under "Group
    (mean ± SD) | t | p" —, whose t's fit, reads clean; a mutated t there is found."""
    import real_typings

    def table_text(source):
        table = next(t for t in real_typings.ITEMS if isinstance(t, real_typings.Table) and t.source == source)
        head, *body = table.rows
        lines = [table.caption, "", "| " + " | ".join(head) + " |", "|" + "---|" * len(head)]
        return "\n".join(lines + ["| " + " | ".join(row) + " |" for row in body]) + "\n"

    path = tmp_path / "t.md"
    path.write_text(table_text("pmc10964721"), encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 10 and all("means-do-not-fit" in e.codes for e in entries)
    zbi = next(e for e in entries if e.found.startswith("t = −0.255"))
    assert "they give |t|: Student's 1.510 to 1.525" in zbi.message
    path.write_text(table_text("pmc12588921"), encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 2 and not any("means-do-not-fit" in e.codes for e in entries)
    path.write_text(table_text("pmc12588921").replace("−4.763", "−2.763"), encoding="utf-8")  # (a mutation)
    assert sum("means-do-not-fit" in e.codes for e in audit_file(path)) == 1


# an abstract on severe acute exacerbation of chronic hepatitis B (as a journal database's page gives it:
# http://218.28.6.71:81/Qikan/Search/Index?key=K%3D%EF%BC%9ASevere%2Bhepatitis%EF%BC%9BRisk%2Bfactor%EF%BC%9BCase-control%2Bstudy)
_AUC_SENTENCE = ("The area under the receiver operating characteristic of the AE model [0.844, 95%confidence interval(CI): 0.779-0.896] was "
                 "significantly higher than that of MELD score(0.690, 95%CI: 0.613-0.760, P < 0.05) in predicting the development of ACLF.")


def test_an_estimate_with_its_labelled_interval_after_a_comma(tmp_path):
    """An estimate followed by a comma and its labelled interval ("0.844, 95%confidence interval(CI): 0.779-0.896", an
    AUC as an abstract gives it) is held to its interval, as one with the interval in brackets after it is; the P after
    the second interval is the comparison's, not the AUC's. A mutated interval that excludes its AUC is found; a t's own
    interval after its p stays the t's."""
    path = tmp_path / "t.md"
    path.write_text(_AUC_SENTENCE + "\n\nThe effect was reliable, t(38) = 2.14, p = .039, 95% CI [0.10, 4.20].\n", encoding="utf-8")
    found = {e.found: e for e in audit_file(path)}
    assert {"0.844, 95%confidence interval(CI): 0.779-0.896", "0.690, 95%CI: 0.613-0.760", "t(38) = 2.14, p = .039, 95% CI [0.10, 4.20]"} <= set(found)
    assert not found["0.844, 95%confidence interval(CI): 0.779-0.896"].codes and not found["0.690, 95%CI: 0.613-0.760"].codes
    path.write_text("The ICC was .78, 95% CI [.70, .84].\n", encoding="utf-8")  # (ours: a quantity named in words, whose
    (icc,) = audit_file(path)  # leading zero is the words' to say — not judged, as in the bracketed form)
    assert icc.found == ".78, 95% CI [.70, .84]" and not icc.codes
    path.write_text(_AUC_SENTENCE.replace("0.779-0.896", "0.879-0.896"), encoding="utf-8")
    bad = next(e for e in audit_file(path) if e.found.startswith("0.844"))
    assert bad.codes == ["ci-excludes-estimate"]


def test_three_groups_means_give_the_f_beside_them(tmp_path):
    """Three groups' mean ± SD in their columns with an F column: one-way ANOVA's F from the printed means, SDs and n's.
    pingouin's penguins by species (scipy's f_oneway as the reference) read clean; a mutated F is found; where the note
    says the F is Welch's ANOVA's, an F of three groups is held to Welch's ANOVA alone (tests/test_audit_mean_columns.py
    holds Welch's F itself to pingouin's welch_anova)."""
    import pingouin as pg

    d = pg.read_dataset("penguins").dropna()
    species = ["Adelie", "Chinstrap", "Gentoo"]
    groups = [d[d["species"] == s] for s in species]
    head = " | ".join(f"{s} (n = {len(g)})" for s, g in zip(species, groups))
    lines = ["Table 2. Measures by species", "", f"| Measure | {head} | F | p |", "|" + "---|" * 6]
    for column in ("bill_length_mm", "body_mass_g"):
        f, p = stats.f_oneway(*(g[column] for g in groups))
        cells = " | ".join(f"{g[column].mean():.1f} ± {g[column].std():.1f}" for g in groups)
        lines.append(f"| {column} | {cells} | {f:.2f} | {'< .001' if p < 0.001 else f'{p:.3f}'} |")
    text = "\n".join(lines) + "\n"
    path = tmp_path / "t.md"
    path.write_text(text, encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 2 and not any(e.codes for e in entries)
    typed = lines[-1].split(" | ")[4]
    mutated = text.replace(f"| {typed} |", f"| {float(typed) * 1.2:.2f} |")
    path.write_text(mutated, encoding="utf-8")
    assert sum("means-do-not-fit" in e.codes for e in audit_file(path)) == 1
    path.write_text(mutated + "\nNote. F from Welch's ANOVA.\n", encoding="utf-8")
    (found,) = [e for e in audit_file(path) if "means-do-not-fit" in e.codes]
    assert "Welch's ANOVA's" in found.message and "one-way" not in found.message, found.message


# Wikipedia, "Mann–Whitney U test", Example statement of results (after Fritz, Morris & Richler, 2012, J Exp Psychol Gen)
_U_TYPED = ("Median latencies in groups E and C were 153 and 247 ms; the distributions in the two groups differed significantly "
            "(Mann–Whitney U = 10.5, n1 = n2 = 8, P < 0.05 two-tailed).")


def test_a_mann_whitney_us_p_against_its_group_sizes(tmp_path):
    """A Mann–Whitney U's p is held to the group sizes its sentence gives: no larger than the largest two-sided p of the
    exact test (its distribution counted exactly; scipy's method="exact" agrees on 300 random untied samples) and the
    normal approximation with or without continuity correction — ties and a one-sided test only lower it. The example
    sentence agrees; its p mutated to .30 does not (U = 10.5 of 64 gives about .02)."""
    from statsetter.audit.checks import _u_counts

    x, y = [1, 4, 6, 9, 13, 15, 18, 22], [2, 3, 5, 7, 8, 10, 11, 12]
    exact = stats.mannwhitneyu(x, y, method="exact")
    u = min(exact.statistic, 64 - exact.statistic)
    assert abs(2 * sum(_u_counts(8, 8)[: int(u) + 1]) / math.comb(16, 8) - exact.pvalue) < 1e-12
    path = tmp_path / "t.md"
    path.write_text(_U_TYPED + "\n", encoding="utf-8")
    assert not any("p-does-not-follow" in e.codes for e in audit_file(path))
    path.write_text(_U_TYPED.replace("P < 0.05", "P = 0.30") + "\n", encoding="utf-8")
    (bad,) = [e for e in audit_file(path) if "p-does-not-follow" in e.codes]
    assert "with n₁ = 8 and n₂ = 8" in bad.message and "the exact test" in bad.message


# PMC10547446 (Ann Med 2023;55(2):2261111), Table 1: each row two groups' positive and negative counts (n%) side by side
# under the groups' spanners, the row's χ² and P after them
_OUTCOME_PAIRS = """Table 1. Detection of mSDC2 test in the high-risk and physical examination groups based on gender and age.

| | Total | High-risk group | | | Physical examination group | | | χ² | P |
|---|---|---|---|---|---|---|---|---|---|
| | | Total | Positive (n%) | Negative (n%) | Total | Positive (n%) | Negative (n%) | | |
| Total | 1,560 | 9,943 | 932 (9.37) | 9,011 (90.63) | 5,117 | 208 (4.06) | 4,909 (95.97) | 136.071 | <0.0001 |
| Male | 8,077 | 4,917 | 524 (10.66) | 4393 (89.34) | 3,160 | 140 (4.43) | 3,020 (95.57) | 98.848 | <0.0001 |
| Female | 6,983 | 5,026 | 408 (8.12) | 4618 (91.88) | 1,957 | 68 (3.47) | 1,889 (96.53) | 47.806 | <0.0001 |
| <20 | 122 | 102 | 2 (1.96) | 100 (98.04) | 22 | 0 (0) | 22 (100) | | |
| 20–29 | 1,195 | 984 | 28 (2.85) | 956 (97.15) | 240 | 1 (0.42) | 239 (99.58) | 4.921 | 0.0265 |
| 30–39 | 3,018 | 2,171 | 103 (4.74) | 2068 (95.26) | 960 | 10 (1.04) | 950 (98.96) | 26.233 | <0.0001 |
| 40–49 | 3,548 | 2,315 | 160 (6.91) | 2155 (93.09) | 1,420 | 27 (1.90) | 1,393 (98.10) | 46.450 | <0.0001 |
| 50–59 | 3,560 | 2,351 | 238 (10.12) | 2113 (89.88) | 1,519 | 72 (4.74) | 1,447 (95.26) | 36.293 | <0.0001 |
| 60–69 | 1,668 | 1,274 | 197 (15.46) | 1077 (84.54) | 650 | 59 (9.08) | 591 (90.92) | 15.217 | <0.0001 |
| 70–79 | 823 | 577 | 148 (25.65) | 429 (74.35) | 246 | 27 (10.98) | 219 (89.02) | 22.183 | <0.0001 |
| ≥80 | 229 | 169 | 56 (33.14) | 113 (66.86) | 60 | 12 (20.00) | 48 (80.00) | 3.660 | 0.0557 |
"""


def test_a_row_of_groups_outcome_pairs_is_its_own_table(tmp_path):
    """A row whose count columns come in pairs making up 100% — each group's positive and negative — is a 2 × k table of
    its own: every one of the article's nine χ² values is Pearson's from its row (scipy's chi2_contingency), and the
    row without a test is no part of the next. Its first row prints 4,909 of 5,117 as 95.97% (95.94%): found. A mutated
    χ² is found. Before, none of these rows was read as counts."""
    path = tmp_path / "t.md"
    path.write_text(_OUTCOME_PAIRS, encoding="utf-8")
    entries = audit_file(path)
    assert len(entries) == 10 and all("two outcomes in pairs of columns" in e.notes[0] for e in entries)
    assert [e.codes for e in entries if e.codes] == [["percent-does-not-fit"]]
    assert "4909 / 5,117 is 95.94%, not 95.97%" in entries[0].message
    assert f"{_chi2_p([[524, 4393], [140, 3020]])[0]:.3f}" == "98.848"
    path.write_text(_OUTCOME_PAIRS.replace("| 98.848 |", "| 89.848 |"), encoding="utf-8")
    assert sum("counts-do-not-fit" in e.codes for e in audit_file(path)) == 1


def test_a_count_with_a_space_as_thousands_separator_beside_means(tmp_path):
    """A category's n typed with a space between its thousands ("12 513 (51.4)", as European typesetting prints it) in a
    table of means by category: read as 12,513, as the counts reader reads it. Before, the means reader took the n with
    int() on the typed text and the audit ended in an internal error (a hostile input, ours)."""
    path = tmp_path / "t.md"
    path.write_text("Table 1. Scores\n\n| Variable | Group | n (%) | mean ± SD | F/t value | P value |\n|---|---|---|---|---|---|\n"
                    "| Age | young | 12 513 (51.4) | 6.24 ± 4.08 | 15.308 | < 0.001 |\n| | old | 11 830 (48.6) | 8.57 ± 4.86 | | |\n", encoding="utf-8")
    (entry,) = audit_file(path)
    assert entry.found.startswith("F(1, 24341) = 15.308") and "means-do-not-fit" in entry.codes  # (these invented means give F ≈ 1,500)


def _real_fs_with_partial_eta():
    """The F's of the real typings (tests/real_typings.py, each cited there) typed with an exact p and an η²p."""
    from real_typings import COPIED, HELD_OUT, ITEMS, Text
    from statsetter.audit.parsing import find_statistics

    return [(item.text[r.start:r.end], r) for item in ITEMS + HELD_OUT + COPIED if isinstance(item, Text)
            for r in find_statistics(item.text, ".") if r.symbol == "F" and r.p is not None and r.p.op == "=" and len(r.df) == 2
            and any(e.name == "eta2_p" for e in r.effects)]


def test_one_mistyped_number_is_named_where_the_p_and_eta_squared_agree_on_it():
    """Real F's with their p and η²p (two theses and a conference paper, cited in tests/real_typings.py), each number
    typed otherwise one digit at a time: where the p and the η²p then both follow from one other df or value, the audit
    names it (`typo-fits`) — always the one typed before the change, and for every such change; a changed p (the η²p
    still fitting) and the F's as printed never get it."""
    real = _real_fs_with_partial_eta()
    assert len(real) >= 10, len(real)
    fired = {"df1": 0, "df2": 0, "F": 0, "p": 0}
    misfits = dict.fromkeys(fired, 0)
    for typed, rep in real:
        d1, d2, value, p = rep.df[0].text, rep.df[1].text, rep.value.text, rep.p.number.text
        f = float(value)
        printed = audit_units([Unit("c", typed)])[0]
        if "p-does-not-follow" in printed.codes:  # (the thesis's F(1,90)=.533 above)
            continue
        assert "typo-fits" not in printed.codes, (typed, printed.codes)
        for kind, old in (("df1", d1), ("df2", d2), ("F", value), ("p", p)):
            for j, digit in ((j, c) for j, c in enumerate(old) if c.isdigit()):
                for other in "0123456789":
                    new = old[:j] + other + old[j + 1:]
                    if other == digit or new.lstrip(".").startswith("0") and kind != "p" or new in ("0", "00"):
                        continue
                    text = typed.replace(old, new, 1) if kind != "df2" else typed.replace(f",{old}", f",{new}", 1).replace(f", {old}", f", {new}", 1)
                    (e,) = [e for e in audit_units([Unit("c", text)]) if e.found.startswith("F")]
                    misfits[kind] += {"p-does-not-follow", "effect-does-not-fit"} <= set(e.codes)
                    if "typo-fits" not in e.codes:
                        continue
                    fired[kind] += 1
                    assert kind != "p", (text, e.message)
                    said = e.message[e.message.index("both follow from"):]
                    if kind == "F":
                        low, _, high = re.search(r"= (\d*\.\d+(?: to \d*\.\d+)?):", said).group(1).partition(" to ")
                        assert float(low) - 0.006 <= f <= float(high or low) + 0.006, (text, said)
                    else:
                        pairs = [tuple(map(int, m)) for m in re.findall(r"F\((\d+), (\d+)\)", said)]
                        truth = int(d1) if kind == "df1" else int(d2)
                        spots = [a if kind == "df1" else b for a, b in pairs]
                        assert min(spots) <= truth <= max(spots), (text, said, truth)
    # (seen: 68, 31 and 144 of the df₁, df₂ and F changes leave both the p and the η²p off, and each of them is named)
    assert fired["p"] == misfits["p"] == 0 and all(fired[k] == misfits[k] > 20 for k in ("df1", "df2", "F")), (fired, misfits)


def test_a_mann_whitney_us_z_against_its_u_and_group_sizes():
    """A z typed after its U ("U = 114, z = −0.51") is held to them and the sentence's group sizes: |z| is at least
    |U − n₁n₂/2| less a continuity correction's 0.5, over the SD without ties (ties only shrink the SD). pingouin's
    penguins data, bill length, body mass and flipper length of Adelie against Chinstrap penguins and of each sex among
    the Gentoo: scipy's mannwhitneyu U and the z as programs print it (with the tie correction, without the continuity
    correction), and the rank test's r = |z|/√N after them (Rosenthal, 1991), read clean; the same z halved is found,
    each of the six, and so is an r doubled."""
    import pingouin as pg

    data = pg.read_dataset("penguins")
    cases = []
    for column in ("bill_length_mm", "body_mass_g", "flipper_length_mm"):
        for a, b in ((data[data.species == "Adelie"], data[data.species == "Chinstrap"]),
                     (data[(data.species == "Gentoo") & (data.sex == "female")], data[(data.species == "Gentoo") & (data.sex == "male")])):
            x, y = a[column].dropna().to_numpy(), b[column].dropna().to_numpy()
            u = stats.mannwhitneyu(x, y, alternative="two-sided", method="asymptotic", use_continuity=False)
            n1, n2 = len(x), len(y)
            ranks = stats.rankdata(np.concatenate([x, y]))
            ties = sum(t ** 3 - t for t in np.unique(ranks, return_counts=True)[1])
            sigma = math.sqrt(n1 * n2 / 12 * ((n1 + n2 + 1) - ties / ((n1 + n2) * (n1 + n2 - 1))))
            z = (u.statistic - n1 * n2 / 2) / sigma
            p = 2 * stats.norm.sf(abs(z))
            cases.append((n1, n2, u.statistic, z, p))
    for n1, n2, u, z, p in cases:
        p_typed = "p < .001" if p < 0.001 else f"p = {p:.3f}".replace("0.", ".")
        r = abs(z) / math.sqrt(n1 + n2)  # (the rank test's r, |z|/√N)
        text = f"The groups differed in rank (n1 = {n1}, n2 = {n2}; U = {u:g}, z = {z:.2f}, {p_typed}, r = {r:.2f})".replace("r = 0.", "r = .")
        entries = audit_units([Unit("c", text)])
        found = [e for e in entries if e.found.startswith("z")]
        assert found and "z-does-not-fit" not in found[0].codes and "p-does-not-follow" not in found[0].codes, (text, found[0].codes)
        assert not [e.codes for e in entries if e.found.startswith("r") and "effect-does-not-fit" in e.codes], (text, [e.message for e in entries])
        halved = text.replace(f"z = {z:.2f}", f"z = {z / 2:.2f}")
        (moved,) = [e for e in audit_units([Unit("c", halved)]) if e.found.startswith("z")]
        assert "z-does-not-fit" in moved.codes, (halved, moved.codes)
        doubled = text.replace(f"r = {r:.2f}".replace("r = 0.", "r = ."), f"r = {min(2 * r, 0.99):.2f}".replace("r = 0.", "r = ."))
        (wrong_r,) = [e for e in audit_units([Unit("c", doubled)]) if e.found.startswith("r")]
        assert wrong_r.codes == ["effect-does-not-fit"] and f"N = {n1 + n2}: {r:.3f}" in wrong_r.message, (doubled, wrong_r.message)
    assert "is smaller than U = " in moved.message and "ties only make |z| larger" in moved.message
