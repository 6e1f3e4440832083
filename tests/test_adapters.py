"""Adapters: library result objects become the records statsetter's own
analyses compute from the same data.

Data: the Palmer penguins (Gorman, Williams & Fraser, 2014) and the
Cronbach's alpha example that pingouin bundles (``pingouin.read_dataset``);
the Fair (1978) affairs data that statsmodels bundles. Each test runs the
library function, reads its result with ``to_records`` and compares every
number the two records share with statsetter's analysis of the same data, to
1e-10 relative (``REL``). p values below 1e-12 are compared to 1e-12
absolute: there the studentized-range integrals of scipy (which both
statsetter and pingouin call) are at their noise floor, and one returns 0.0
where the other returns 1e-14.
"""

from __future__ import annotations

import tempfile
from pathlib import Path

import numpy as np
import pandas as pd
import pingouin as pg
import pytest
import statsmodels.api as sm
import statsmodels.formula.api as smf
from scipy import stats

from statsetter import InputError, render
from statsetter.adapters import supported, to_records
from statsetter.analyses import (
    anova_oneway, chi_square, correlate, cronbach_alpha, factorial_anova, kruskal_wallis, linear_regression,
    logistic_regression, mann_whitney, posthoc, t_independent, t_one_sample, t_paired, wilcoxon_signed_rank,
)

REL = 1e-10


@pytest.fixture(scope="module")
def penguins():
    d = pg.read_dataset("penguins").dropna().reset_index(drop=True)
    return d.assign(bill_scaled=d.bill_depth_mm * 2.5, male=(d.sex == "male").astype(int))


def numbers(r):
    """Every number of a record under a stable path."""
    out = {}
    if r.statistic is not None:
        out["statistic"] = r.statistic.value
        for i, d in enumerate(r.statistic.df):
            out[f"df{i}"] = d
    if r.p is not None:
        out["p"] = r.p
    if r.n is not None:
        out["n"] = r.n
    if r.estimate is not None:
        out["estimate"] = r.estimate.value
        if r.estimate.se is not None:
            out["estimate.se"] = r.estimate.se
        if r.estimate.ci is not None:
            out["estimate.low"], out["estimate.high"] = r.estimate.ci.low, r.estimate.ci.high
    for e in r.effects:
        out[f"{e.name}"] = e.value
        if e.ci is not None:
            out[f"{e.name}.low"], out[f"{e.name}.high"] = e.ci.low, e.ci.high
    for g in r.groups:
        for field in ("n", "mean", "sd", "median"):
            if getattr(g, field) is not None:
                out[f"{g.label}.{field}"] = getattr(g, field)
    return out


def same(adapted, ours, at_least=("statistic",), rel=REL, skip=()):
    """The shared numbers agree; returns how many were compared."""
    a, b = numbers(adapted), numbers(ours)
    shared = sorted((set(a) & set(b)) - set(skip))
    for key in at_least:
        assert key in shared, f"{key} not shared: {sorted(a)} vs {sorted(b)}"
    for key in shared:
        assert a[key] == pytest.approx(b[key], rel=rel, abs=1e-12 if key == "p" else 1e-300), key
    assert adapted.kind == ours.kind
    return len(shared)


def same_all(adapted, ours, key, at_least=("statistic",), rel=REL):
    """Records matched by key; each at_least number shared by at least one pair."""
    index = {key(r): r for r in ours}
    assert len(adapted) <= len(ours) and adapted
    seen = set()
    for r in adapted:
        same(r, index[key(r)], (), rel)
        seen |= set(numbers(r)) & set(numbers(index[key(r)]))
    missing = [k for k in at_least if k not in seen]
    assert not missing, missing
    return sum(len(set(numbers(r)) & set(numbers(index[key(r)]))) for r in adapted)


# -- scipy.stats ---------------------------------------------------------------


def groups_of(d, value, by, labels):
    return [d.loc[d[by] == g, value].to_numpy() for g in labels]


def test_scipy_ttest_ind(penguins):
    a, b = groups_of(penguins, "body_mass_g", "sex", ["female", "male"])
    ours = t_independent(penguins, "body_mass_g", "sex").main
    res = stats.ttest_ind(a, b, equal_var=False)
    alone = to_records(res, "ttest_ind")[0]
    assert alone.details["variant"] == "welch"
    assert same(alone, ours, ("statistic", "p", "df0", "estimate", "estimate.low")) >= 6
    full = to_records(res, "ttest_ind", samples=[a, b], groups=["female", "male"])[0]
    assert same(full, ours, ("statistic", "d", "d.low", "female.mean", "male.sd")) >= 15
    assert "scipy.stats.ttest_ind result" in full.provenance.source
    student = to_records(stats.ttest_ind(a, b), "ttest_ind", data=penguins, columns={"outcome": "body_mass_g", "group": "sex"})[0]
    assert same(student, t_independent(penguins, "body_mass_g", "sex", variant="student").main, ("statistic", "df0", "g")) >= 15


def test_scipy_paired_and_one_sample(penguins):
    ours = t_paired(penguins, "bill_length_mm", "bill_scaled").main
    res = stats.ttest_rel(penguins.bill_length_mm, penguins.bill_scaled)
    assert same(to_records(res, "ttest_rel")[0], ours, ("statistic", "p", "estimate.high", "n")) >= 7
    full = to_records(res, "ttest_rel", data=penguins, columns={"first": "bill_length_mm", "second": "bill_scaled"})[0]
    assert same(full, ours, ("statistic", "d_z", "d_z.low")) >= 10
    ours1 = t_one_sample(penguins, "body_mass_g", 4000).main
    res1 = stats.ttest_1samp(penguins.body_mass_g, 4000)
    assert same(to_records(res1, "ttest_1samp", mu=4000)[0], ours1, ("statistic", "estimate", "estimate.low")) >= 7
    with pytest.raises(InputError, match="pass mu="):
        to_records(res1, "ttest_1samp")
    with pytest.raises(InputError, match="not computed against"):
        to_records(res1, "ttest_1samp", mu=3000)


@pytest.mark.parametrize("method,function", [("pearson", stats.pearsonr), ("spearman", stats.spearmanr), ("kendall", stats.kendalltau)])
def test_scipy_correlations(penguins, method, function):
    ours = correlate(penguins, "bill_length_mm", "body_mass_g", coefficient=method).main
    res = function(penguins.bill_length_mm, penguins.body_mass_g)
    source = None if method == "pearson" else function.__name__
    n = None if method == "pearson" else len(penguins)
    alone = to_records(res, source, n=n)[0]
    if method == "kendall":  # τb's SE depends on the ties: no CI from the statistic and n alone, and the notes say so
        assert alone.effects[0].ci is None and any("samples=" in note.text for note in alone.notes)
    assert same(alone, ours, ("statistic", "p", "n")) >= (4 if method == "kendall" else 5)
    full = to_records(res, source, samples=[penguins.bill_length_mm, penguins.body_mass_g], groups=["bill_length_mm", "body_mass_g"])[0]
    assert same(full, ours, ("statistic", "p")) >= 5 and full.variables[0].name == "bill_length_mm"


def test_scipy_chi2_and_fisher(penguins):
    table = pd.crosstab(penguins.species, penguins.island)
    ours = chi_square(penguins, "species", "island")[0]
    res = stats.chi2_contingency(table)
    assert same(to_records(res)[0], ours, ("statistic", "p", "df0", "n", "V")) >= 5
    full = to_records(res, samples=table.to_numpy(), groups=[list(table.index), list(table.columns)])[0]
    assert same(full, ours, ("statistic", "V.low", "V.high")) >= 7
    two = pd.crosstab(penguins.sex, penguins.island == "Biscoe")
    with pytest.raises(InputError, match="Yates"):
        to_records(stats.chi2_contingency(two))
    yates = chi_square(penguins.assign(biscoe=penguins.island == "Biscoe"), "sex", "biscoe", variant="yates")[0]
    assert same(to_records(stats.chi2_contingency(two), yates=True)[0], yates, ("statistic", "p")) >= 4
    deduced = to_records(stats.chi2_contingency(two), samples=two.to_numpy())[0]
    assert deduced.details["yates"] is True
    fisher_ours = next(r for r in chi_square(penguins.assign(biscoe=penguins.island == "Biscoe"), "sex", "biscoe") if r.kind == "fisher_exact")
    fres = stats.fisher_exact(two.to_numpy())
    alone = to_records(fres, "fisher_exact")[0]
    # scipy reports the sample odds ratio ad/bc; statsetter the conditional MLE: two estimators, not compared
    assert alone.estimate.value == pytest.approx(fres.statistic, rel=REL)
    assert same(alone, fisher_ours, ("p",), skip=("estimate",)) >= 1
    full = to_records(fres, "fisher_exact", samples=two.to_numpy())[0]
    assert same(full, fisher_ours, ("p", "estimate", "estimate.low")) >= 5
    assert full.details["sample_odds_ratio"] == pytest.approx(fres.statistic, rel=REL)


def test_scipy_anova_tukey_and_ranks(penguins):
    labels = ["Adelie", "Chinstrap", "Gentoo"]
    samples = groups_of(penguins, "body_mass_g", "species", labels)
    ours = anova_oneway(penguins, "body_mass_g", "species").main
    res = stats.f_oneway(*samples)
    assert same(to_records(res)[0], ours, ("statistic", "p")) >= 2
    assert same(to_records(res, samples=samples, groups=labels)[0], ours, ("statistic", "eta2", "omega2", "df1")) >= 10
    pairs = posthoc(penguins, "body_mass_g", "species", adjust="tukey")
    key = lambda r: (r.groups[0].label, r.groups[1].label)  # noqa: E731
    tk = stats.tukey_hsd(*samples)
    assert same_all(to_records(tk, groups=labels), pairs, key, ("estimate", "estimate.low", "p")) >= 12
    # given in another order, pairs are still oriented as statsetter orders them
    reversed_ = to_records(stats.tukey_hsd(*samples[::-1]), groups=labels[::-1])
    assert same_all(reversed_, pairs, key, ("estimate", "estimate.high")) >= 12
    assert same_all(to_records(tk, samples=samples, groups=labels), pairs, key, ("estimate", "Adelie.mean")) >= 20
    female, male = groups_of(penguins, "body_mass_g", "sex", ["female", "male"])
    mw = mann_whitney(penguins, "body_mass_g", "sex").main
    ures = stats.mannwhitneyu(female, male)
    assert same(to_records(ures)[0], mw, ("statistic", "p")) >= 2
    assert same(to_records(ures, samples=[female, male], groups=["female", "male"])[0], mw, ("statistic", "r_rb", "female.median")) >= 7
    wx = wilcoxon_signed_rank(penguins, "bill_length_mm", "bill_scaled").main
    wres = stats.wilcoxon(penguins.bill_length_mm, penguins.bill_scaled)
    assert same(to_records(wres)[0], wx, ("statistic", "p")) >= 2
    kw = kruskal_wallis(penguins, "body_mass_g", "species").main
    kres = stats.kruskal(*samples)
    assert same(to_records(kres)[0], kw, ("statistic", "p")) >= 2
    assert same(to_records(kres, samples=samples, groups=labels)[0], kw, ("statistic", "epsilon2", "df0")) >= 8


def test_scipy_linregress(penguins):
    ours = linear_regression(penguins, "body_mass_g", ["bill_length_mm"])
    res = stats.linregress(penguins.bill_length_mm, penguins.body_mass_g)
    model, intercept, coefficient = to_records(res, n=len(penguins), labels={"x": "bill_length_mm"})
    assert same(model, ours[0], ("statistic", "p", "R2", "R2_adj", "df1", "R2.low", "R2.high")) >= 8
    assert same(intercept, ours[1], ("statistic", "p", "estimate", "estimate.se", "estimate.low", "estimate.high")) >= 6
    assert same(coefficient, ours[2], ("statistic", "estimate", "estimate.se", "estimate.low", "beta")) >= 8
    full = to_records(res, samples=[penguins.bill_length_mm, penguins.body_mass_g], groups=["bill_length_mm", "body_mass_g"])
    assert [r.kind for r in full] == ["linear_model", "linear_coefficient", "linear_coefficient"]
    assert same(full[2], ours[2], ("statistic", "beta")) >= 8


# -- pingouin ------------------------------------------------------------------


def test_pingouin_ttests(penguins):
    female, male = groups_of(penguins, "body_mass_g", "sex", ["female", "male"])
    ours = t_independent(penguins, "body_mass_g", "sex").main
    frame = pg.ttest(female, male)
    alone = to_records(frame)[0]  # fractional df: Welch's independent t
    assert same(alone, ours, ("statistic", "p", "df0", "d")) >= 4
    assert alone.estimate is None and any(n.kind == "precision" for n in alone.notes)
    full = to_records(frame, samples=[female, male], groups=["female", "male"])[0]
    assert same(full, ours, ("statistic", "estimate.low", "d.low")) >= 15
    paired = pg.ttest(penguins.bill_length_mm, penguins.bill_scaled, paired=True)
    with pytest.raises(InputError, match="kind="):
        to_records(paired)
    ours_p = t_paired(penguins, "bill_length_mm", "bill_scaled").main
    rec = to_records(paired, kind="t_paired")[0]
    assert same(rec, ours_p, ("statistic", "p", "df0")) >= 3
    x, y = penguins.bill_length_mm, penguins.bill_scaled  # pingouin's paired d, by its formula
    assert rec.effects[0].name == "d" and rec.effects[0].value == pytest.approx((x.mean() - y.mean()) / np.sqrt((x.var() + y.var()) / 2), rel=REL)


def test_pingouin_correlations(penguins):
    ours = correlate(penguins, "bill_length_mm", "body_mass_g").main
    rec = to_records(pg.corr(penguins.bill_length_mm, penguins.body_mass_g))[0]
    assert same(rec, ours, ("statistic", "p", "r.low", "r.high", "n")) >= 6  # CI recomputed, not pingouin's rounded one
    columns = ["bill_length_mm", "body_mass_g", "flipper_length_mm"]
    frame = pg.pairwise_corr(penguins, columns=columns, method="spearman")
    recs = to_records(frame)
    assert len(recs) == 3
    for r in recs:
        x, y = (v.name for v in r.variables)
        same(r, correlate(penguins, x, y, coefficient="spearman").main, ("statistic", "p", "rs.low"))


def test_pingouin_anovas_and_posthoc(penguins):
    ours = anova_oneway(penguins, "body_mass_g", "species").main
    rec = to_records(pg.anova(data=penguins, dv="body_mass_g", between="species"))[0]
    assert same(rec, ours, ("statistic", "p", "eta2", "df1")) >= 5
    detailed = to_records(pg.anova(data=penguins, dv="body_mass_g", between="species", detailed=True))[0]
    assert same(detailed, ours, ("statistic", "eta2", "omega2")) >= 6
    welch = to_records(pg.welch_anova(data=penguins, dv="body_mass_g", between="species"))[0]
    assert same(welch, anova_oneway(penguins, "body_mass_g", "species", variant="welch").main, ("statistic", "p", "df1")) >= 5
    two = pg.anova(data=penguins, dv="body_mass_g", between=["species", "sex"], ss_type=2)
    terms = factorial_anova(penguins, "body_mass_g", ("species", "sex"), ss_type=2)
    key = lambda r: r.details["term"]  # noqa: E731
    assert same_all(to_records(two, ss_type=2), terms, key, ("statistic", "p", "eta2_p")) >= 15
    full = to_records(two, ss_type=2, data=penguins, columns={"outcome": "body_mass_g", "factors": ["species", "sex"]})
    assert same_all(full, terms, key, ("statistic",)) >= 15
    pairs = posthoc(penguins, "body_mass_g", "species", adjust="tukey")
    pkey = lambda r: (r.groups[0].label, r.groups[1].label)  # noqa: E731
    tukey = pg.pairwise_tukey(data=penguins, dv="body_mass_g", between="species")
    assert same_all(to_records(tukey, n=len(penguins)), pairs, pkey, ("estimate", "estimate.low", "Adelie.mean")) >= 15
    gh_pairs = posthoc(penguins, "body_mass_g", "species", adjust="games-howell")
    gh = to_records(pg.pairwise_gameshowell(data=penguins, dv="body_mass_g", between="species"))
    assert same_all(gh, gh_pairs, pkey, ("estimate", "estimate.high", "p")) >= 15
    holm_pairs = posthoc(penguins, "body_mass_g", "species", adjust="holm")
    tests = pg.pairwise_tests(data=penguins, dv="body_mass_g", between="species", padjust="holm", correction=False)
    assert same_all(to_records(tests), holm_pairs, pkey, ("p",)) >= 3


def test_pingouin_chi2_ranks_alpha(penguins):
    ours = chi_square(penguins, "sex", "species")[0]
    result = pg.chi2_independence(penguins, "sex", "species")
    assert same(to_records(result)[0], ours, ("statistic", "p", "n", "V")) >= 5
    female, male = groups_of(penguins, "body_mass_g", "sex", ["female", "male"])
    mw = mann_whitney(penguins, "body_mass_g", "sex").main
    assert same(to_records(pg.mwu(female, male))[0], mw, ("statistic", "p", "r_rb")) >= 3
    wx = wilcoxon_signed_rank(penguins, "bill_length_mm", "bill_scaled").main
    pw = to_records(pg.wilcoxon(penguins.bill_length_mm, penguins.bill_scaled))[0]
    assert same(pw, wx, ("statistic", "r_rb"), skip=("p",)) >= 2
    # pingouin's p has a continuity correction: scipy with correction=True is the reference
    assert pw.p == pytest.approx(stats.wilcoxon(penguins.bill_length_mm, penguins.bill_scaled, correction=True).pvalue, rel=REL)
    kw = kruskal_wallis(penguins, "body_mass_g", "species").main
    assert same(to_records(pg.kruskal(data=penguins, dv="body_mass_g", between="species"))[0], kw, ("statistic", "p", "df0")) >= 3
    items = pg.read_dataset("cronbach_alpha").pivot(index="Subj", columns="Items", values="Scores").dropna()
    items.columns = [f"item{c}" for c in items.columns]
    alpha = cronbach_alpha(items, list(items.columns)).main
    result = pg.cronbach_alpha(items)
    rounded = to_records(result)[0]
    assert rounded.effects[0].value == pytest.approx(alpha.effects[0].value, rel=REL)
    assert rounded.precision == {"effects[0].ci.low": 3, "effects[0].ci.high": 3}
    assert abs(rounded.effects[0].ci.low - alpha.effects[0].ci.low) <= 0.0005 + 1e-12  # rounded, and marked so
    recomputed = to_records(result, n=len(items), k_items=items.shape[1])[0]
    assert same(recomputed, alpha, ("alpha", "alpha.low", "alpha.high", "n")) >= 4
    # the renderer never prints more digits than a rounded record holds: in a style asking for
    # four decimals of alpha, the value gets four and pingouin's rounded limits keep their three
    from statsetter import load_style

    (tmp := Path(tempfile.mkdtemp()) / "four.toml").write_text('extends = "apa7"\n[numbers.quantity_decimals]\nalpha = 4\n')
    four = load_style(str(tmp))
    a = f"{alpha.effects[0].value:.4f}".lstrip("0")
    lo, hi = (f"{x:.3f}".lstrip("0") for x in result[1])
    assert render(rounded, "stats", four).plain() == f"α = {a}, 95% CI [{lo}, {hi}]"


def test_pingouin_regressions(penguins):
    ours = linear_regression(penguins, "body_mass_g", ["bill_length_mm", "flipper_length_mm"])
    frame = pg.linear_regression(penguins[["bill_length_mm", "flipper_length_mm"]], penguins.body_mass_g)
    key = lambda r: r.details.get("term", r.kind)  # noqa: E731
    assert same_all(to_records(frame), ours, key, ("statistic", "p")) >= 20
    full = to_records(frame, data=penguins, columns={"outcome": "body_mass_g", "predictors": ["bill_length_mm", "flipper_length_mm"]})
    assert same_all(full, ours, key, ("statistic",)) >= 25 and all(r.effects for r in full[1:] if not r.details.get("intercept"))
    assert full[1].details["intercept"] and not full[1].effects  # the intercept: B, SE, t, p and CI, no β
    logit = logistic_regression(penguins, "male", ["body_mass_g", "bill_depth_mm"])
    # pingouin fits with scikit-learn's newton-cg, by default to tol 1e-8 (estimates within about 1e-9 of the
    # maximum-likelihood fit); asked for tol 1e-12 it converges, and the records agree to 1e-10
    lframe = pg.logistic_regression(penguins[["body_mass_g", "bill_depth_mm"]], penguins.male, tol=1e-12, max_iter=10000)
    assert same_all(to_records(lframe), logit, key, ("statistic", "p", "OR", "OR.low", "estimate.se")) >= 16
    lfull = to_records(lframe, data=penguins, columns={"outcome": "male", "predictors": ["body_mass_g", "bill_depth_mm"]})
    assert [r.kind for r in lfull] == ["logistic_model"] + ["logistic_coefficient"] * 3


# -- statsmodels ---------------------------------------------------------------


def test_statsmodels_fits(penguins):
    key = lambda r: r.details.get("term", r.kind)  # noqa: E731
    ours = linear_regression(penguins, "body_mass_g", ["bill_length_mm", "species"])
    fit = smf.ols("body_mass_g ~ bill_length_mm + species", data=penguins).fit()
    assert same_all(to_records(fit), ours, key, ("statistic", "p", "estimate.low", "beta")) >= 30
    logit = logistic_regression(penguins, "male", ["body_mass_g", "bill_depth_mm"])
    lfit = smf.logit("male ~ body_mass_g + bill_depth_mm", data=penguins).fit(disp=0)
    assert same_all(to_records(lfit), logit, key, ("statistic", "p", "R2_nagelkerke", "OR.high")) >= 20
    # WLS with unit weights is OLS: statsetter's (unweighted) analysis is the reference; β is not given for a weighted fit
    wls = sm.WLS(penguins.body_mass_g, sm.add_constant(penguins[["bill_length_mm"]]), weights=np.ones(len(penguins))).fit()
    unweighted = linear_regression(penguins, "body_mass_g", ["bill_length_mm"])
    wrecs = to_records(wls)
    assert same_all(wrecs, unweighted, key, ("statistic", "p", "estimate.low", "R2")) >= 15
    assert wrecs[1].details["intercept"] and not wrecs[2].effects and "weighted" in wrecs[2].notes[0].text
    fair = sm.datasets.fair.load_pandas().data
    ours_fair = linear_regression(fair, "affairs", ["age", "yrs_married"])
    fair_fit = sm.OLS(fair.affairs, sm.add_constant(fair[["age", "yrs_married"]])).fit()
    assert same_all(to_records(fair_fit), ours_fair, key, ("statistic", "beta")) >= 20


def test_statsmodels_anova_lm_and_tukey(penguins):
    from statsmodels.stats.anova import anova_lm
    from statsmodels.stats.multicomp import pairwise_tukeyhsd

    key = lambda r: r.details["term"]  # noqa: E731
    for typ, formula in ((2, "body_mass_g ~ C(species) * C(sex)"), (3, "body_mass_g ~ C(species, Sum) * C(sex, Sum)")):
        table = anova_lm(smf.ols(formula, data=penguins).fit(), typ=typ)
        recs = to_records(table)
        assert all(r.details["ss_type"] == typ for r in recs)
        assert same_all(recs, factorial_anova(penguins, "body_mass_g", ("species", "sex"), ss_type=typ), key, ("statistic", "p", "eta2_p")) >= 15
    oneway = to_records(anova_lm(smf.ols("body_mass_g ~ C(species)", data=penguins).fit(), typ=2))[0]
    assert same(oneway, anova_oneway(penguins, "body_mass_g", "species").main, ("statistic", "eta2", "omega2", "n")) >= 7
    pairs = posthoc(penguins, "body_mass_g", "species", adjust="tukey")
    pkey = lambda r: (r.groups[0].label, r.groups[1].label)  # noqa: E731
    res = pairwise_tukeyhsd(penguins.body_mass_g, penguins.species)
    # statsmodels' Tukey p values come from scipy's studentized range as well; CIs from the same q
    assert same_all(to_records(res), pairs, pkey, ("estimate", "estimate.low", "estimate.high")) >= 12


# -- context, bad input --------------------------------------------------------


def test_absent_parts_are_said_and_left_out(penguins):
    female, male = groups_of(penguins, "body_mass_g", "sex", ["female", "male"])
    rec = to_records(stats.ttest_ind(female, male, equal_var=False), "ttest_ind")[0]
    assert any(n.kind == "missing" and "group n, M and SD" in n.text for n in rec.notes)
    text = render(rec, "sentence").plain()
    assert "Welch's" in text and "None" not in text and "nan" not in text and "M =" not in text


def test_wrong_data_are_refused(penguins):
    female, male = groups_of(penguins, "body_mass_g", "sex", ["female", "male"])
    res = stats.ttest_ind(female, male, equal_var=False)
    with pytest.raises(InputError, match="do not reproduce"):
        to_records(res, "ttest_ind", samples=[female[:-5], male])


def test_unsupported_objects_list_what_is_supported():
    with pytest.raises(InputError, match="cannot read a builtins.dict object; supported: .*scipy.stats.ttest_ind"):
        to_records({"t": 2.1})
    with pytest.raises(InputError, match="pass source= one of ttest_ind, ttest_rel, ttest_1samp"):
        to_records(stats.ttest_ind([1.0, 2, 3, 4], [2.0, 3, 4, 6]))
    with pytest.raises(InputError, match="source: 't_test' is not supported"):
        to_records(stats.ttest_ind([1.0, 2, 3, 4], [2.0, 3, 4, 6]), "t_test")
    with pytest.raises(InputError, match="not supported"):
        to_records(pd.DataFrame({"x": [1]}).assign(n=1, r=0.5, CI95=[[0.1, 0.7]], p_val=0.1).set_axis(["shepherd"]))
    assert len(supported()) == 43  # the designs added pingouin friedman, cochran, rm_anova, ancova, mediation_analysis, mixed_anova and statsmodels AnovaRM, MixedLM, mcnemar, cochrans_q


def test_minimum_versions_are_declared():
    import tomllib
    from pathlib import Path

    deps = tomllib.loads((Path(__file__).parents[1] / "pyproject.toml").read_text())["project"]["optional-dependencies"]["analyses"]
    declared = {d.split(">=")[0]: d.split(">=")[1] for d in deps if ">=" in d}
    from importlib.metadata import version

    for library in ("scipy", "pingouin", "statsmodels"):
        assert library in declared
        have = tuple(int(x) for x in version(library).split(".")[:2])
        need = tuple(int(x) for x in declared[library].split(".")[:2])
        assert have >= need, library
