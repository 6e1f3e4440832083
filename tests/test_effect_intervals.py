"""Confidence intervals of effect sizes (issue: effect sizes with intervals).

η², partial η², ω², R² and ΔR² get the interval of the population proportion
of variance explained by inverting the noncentral F distribution (Steiger,
2004, Psychological Methods 9, 164-182): λ / (λ + df1 + df2 + 1) at the λ
that put the observed F at the upper and lower (1 − level)/2 tails.
References: R's own noncentral F (pf with ncp, an implementation independent
of scipy's Boost one) solved with uniroot(tol = 1e-12), printed by Rscript on
the development machine (R 4.x); scipy.stats.ncf inverted by plain bisection;
R's lm and anova on datasets::mtcars and datasets::PlantGrowth.
"""


import pingouin as pg
import pytest
from open_data import MTCARS, PLANTS
from scipy import stats

from statsetter.analyses import anova_oneway, factorial_anova, hierarchical_steps, linear_regression, posthoc, t_independent
from statsetter.formulas import ncf_ci, variance_explained_ci


def bisect_limit(F, df1, df2, target):
    """λ with ncf.cdf(F; df1, df2, λ) = target, by bisection (independent of the root finder used)."""
    if stats.ncf.cdf(F, df1, df2, 1e-12) <= target:
        return 0.0
    lo, hi = 0.0, 1.0
    while stats.ncf.cdf(F, df1, df2, hi) > target:
        hi *= 2
    for _ in range(200):
        mid = (lo + hi) / 2
        lo, hi = (mid, hi) if stats.ncf.cdf(F, df1, df2, mid) > target else (lo, mid)
    return (lo + hi) / 2


@pytest.mark.parametrize("F, df1, df2", [(4.846, 2, 27), (0.4, 3, 40), (21.7, 1, 118), (2.1, 6, 300), (150.0, 4, 60), (1.0, 2, 9)])
@pytest.mark.parametrize("level", [0.95, 0.90])
def test_noncentrality_limits_against_bisection(F, df1, df2, level):
    alpha = (1 - level) / 2
    low, high = ncf_ci(F, df1, df2, level)
    assert low == pytest.approx(bisect_limit(F, df1, df2, 1 - alpha), rel=1e-7, abs=1e-9)
    assert high == pytest.approx(bisect_limit(F, df1, df2, alpha), rel=1e-7, abs=1e-9)


def test_plantgrowth_eta_squared_interval_against_r():
    # R: anova(lm(weight ~ group, PlantGrowth)): SS 3.76634 and 10.49209, F(2, 27) = 4.84608786238014;
    # λ from pf(F, 2, 27, ncp) by uniroot: 95% [.00990396851755357, .46389646704529630], 90% [.031888248130582, .428798990149255]
    r = anova_oneway(PLANTS, "weight", "group").main
    assert r.statistic.value == pytest.approx(4.84608786238014, rel=1e-12)
    assert (r.details["ss"], r.details["ss_error"]) == pytest.approx((3.76634, 10.49209), rel=1e-12)
    eta = r.effect("eta2")
    assert (eta.ci.low, eta.ci.high) == pytest.approx((0.00990396851755357, 0.46389646704529630), rel=1e-6)
    assert r.effect("omega2").ci == eta.ci  # one population proportion, one interval
    ninety = anova_oneway(PLANTS, "weight", "group", level=0.90).main.effect("eta2").ci
    assert (ninety.low, ninety.high) == pytest.approx((0.031888248130582, 0.428798990149255), rel=1e-6)


def test_mtcars_r_squared_interval_and_intercept_against_r():
    # R: summary(lm(mpg ~ wt + hp, mtcars)): F(2, 29) = 69.2112133917776, R² = 0.826785451882791;
    # the R² interval from pf/uniroot as above: [0.671135406773401, 0.879648648267359];
    # (Intercept) 37.227270116447201, SE 1.59878753799939410, t 23.28468869793086, p 2.56545851198376e-20,
    # 95% CI [33.9573824522584715, 40.4971577806359306]
    model, intercept, *_ = linear_regression(MTCARS, "mpg", ["wt", "hp"])
    r2 = model.effect("R2")
    assert r2.value == pytest.approx(0.826785451882791, rel=1e-12)
    assert (r2.ci.low, r2.ci.high) == pytest.approx((0.671135406773401, 0.879648648267359), rel=1e-6)
    assert intercept.details["intercept"] and intercept.effects == ()
    assert intercept.estimate.value == pytest.approx(37.227270116447201, rel=1e-12)
    assert intercept.estimate.se == pytest.approx(1.59878753799939410, rel=1e-12)
    assert intercept.statistic.value == pytest.approx(23.28468869793086, rel=1e-12)
    assert intercept.p == pytest.approx(2.56545851198376e-20, rel=1e-9, abs=0)
    assert (intercept.estimate.ci.low, intercept.estimate.ci.high) == pytest.approx((33.9573824522584715, 40.4971577806359306), rel=1e-12)


@pytest.mark.parametrize("df1, df2", [(1, 20), (2, 57), (4, 300)])
def test_a_ninety_percent_interval_excludes_zero_exactly_when_the_f_test_rejects_at_05(df1, df2):
    # the duality Steiger (2004) gives for choosing 90%: the one-sided F test at α = .05 and the
    # lower limit of the 90% interval agree; checked on both sides of the critical F
    critical = stats.f.ppf(0.95, df1, df2)
    for F in (critical * 0.98, critical * 1.02, critical * 3):
        low, _ = variance_explained_ci(F, df1, df2, 0.90)
        assert (low > 0) == (stats.f.sf(F, df1, df2) < 0.05), F


def test_factorial_and_step_intervals_follow_their_f():
    penguins = pg.read_dataset("penguins")
    for term in factorial_anova(penguins, "body_mass_g", ("species", "sex")):
        e = term.effect("eta2_p")
        low, high = variance_explained_ci(term.statistic.value, *term.statistic.df, 0.95)
        assert (e.ci.low, e.ci.high) == (low, high) and low <= e.value <= high
    step, *rest = hierarchical_steps(penguins, "body_mass_g", [["flipper_length_mm"], ["species", "sex"]])
    first = next(r for r in rest if r.kind == "linear_model" and r.details["step"] == 1)
    delta = step.effect("delta_R2")
    low, high = variance_explained_ci(step.statistic.value, *step.statistic.df, 0.95)
    scale = 1 - first.effect("R2").value
    assert (delta.ci.low, delta.ci.high) == pytest.approx((low * scale, high * scale), rel=1e-12)
    assert delta.ci.low <= delta.value <= delta.ci.high and "times 1 − R² of step 1" in delta.method


def test_each_post_hoc_pair_carries_hedges_g_as_the_t_test_of_the_two_groups_does():
    penguins = pg.read_dataset("penguins")
    pairs = posthoc(penguins, "body_mass_g", "species", adjust="tukey")
    for pair in pairs:
        a, b = (g.label for g in pair.groups)
        two = penguins[penguins.species.isin([a, b])]
        t = t_independent(two, "body_mass_g", "species", variant="student", groups=[a, b]).main
        g, ref = pair.effect("g"), t.effect("g")
        assert g.value == pytest.approx(ref.value, rel=1e-10)
        assert (g.ci.low, g.ci.high) == pytest.approx((ref.ci.low, ref.ci.high), rel=1e-8)
        assert "not adjusted" in g.method


def test_a_published_worked_example_of_the_noncentrality_limits():
    # effectsize's documentation (R package effectsize 0.4.5, rdocumentation.org, page of chisq_to_phi, section on
    # CIs) prints eta_squared(aov(mpg ~ factor(gear) + factor(cyl), mtcars[1:7, ])): partial η² .58, 90% CI [0.00, 0.84]
    # for gear and .46, 90% CI [0.00, 0.78] for cyl. Its sequential F values, from R's anova() on the same seven cars
    # (Rscript here): gear F(1, 3) = 20.70107142857 / 5.041666666667, cyl F(2, 3) = 6.36125 / 5.041666666667.
    # That package maps each λ limit to λ / (λ + df_error); statsetter maps it to λ / (λ + df1 + df2 + 1)
    # (Steiger, 2004): the same λ limits give the published numbers under its mapping and ours under ours.
    mse = 5.041666666667
    for ss, df1, eta, high in ((20.70107142857, 1, 0.58, 0.84), (12.7225, 2, 0.46, 0.78)):
        F = ss / df1 / mse
        assert round(ss / (ss + 3 * mse), 2) == eta
        low_l, high_l = ncf_ci(F, df1, 3, 0.90)
        assert low_l == 0.0 and round(high_l / (high_l + 3), 2) == high  # the published mapping
        ours = variance_explained_ci(F, df1, 3, 0.90)
        assert ours == (0.0, high_l / (high_l + df1 + 3 + 1))


def test_a_style_can_ask_for_ninety_percent_intervals_of_variance_explained(tmp_path):
    # [ci] variance_level = 0.90 (Steiger's convention for a one-sided F test): η²-type intervals at 90% in a
    # plan's run, while the interval of B stays at the plan's 95%; the sentence says the level it shows
    from statsetter import render
    from statsetter.plan import load_plan, run_plan

    pg.read_dataset("penguins").to_csv(tmp_path / "d.csv", index=False)
    (tmp_path / "ninety.toml").write_text('extends = "apa7"\n[ci]\nvariance_level = 0.90\n', encoding="utf-8")
    (tmp_path / "plan.toml").write_text(
        'style = "ninety.toml"\n[data]\npath = "d.csv"\n'
        '[[analyses]]\nid = "mass"\nkind = "anova_oneway"\noutcome = "body_mass_g"\ngroup = "species"\n'
        '[[analyses]]\nid = "fit"\nkind = "linear_regression"\noutcome = "body_mass_g"\npredictors = ["flipper_length_mm"]\n',
        encoding="utf-8")
    records = {r.id: r for r in run_plan(load_plan(tmp_path / "plan.toml")).records}
    assert records["mass"].effect("eta2").ci.level == 0.90 and records["fit"].effect("R2").ci.level == 0.90
    assert records["fit:flipper_length_mm"].estimate.ci.level == 0.95
    assert "η² = .67, 90% CI [" in render(records["mass"], "stats").plain()


def test_the_noncentral_cdfs_called_directly_are_scipy_stats_own():
    """nct_ci and the chi-square's V limits call scipy.special's nctdtr, chndtr and chdtr rather than scipy.stats'
    nct, ncx2 and chi2 (whose argument checks cost ten times the CDF): the same numbers bit for bit, NaN where scipy.stats
    gives NaN (its nct.cdf does far out), on 3,000 random arguments each."""
    import numpy as np
    from scipy import special

    rng = np.random.default_rng(11)
    t, df, nc = rng.normal(0, 5, 3000), rng.uniform(0.5, 500, 3000), rng.normal(0, 8, 3000)
    assert np.array_equal(special.nctdtr(df, nc, t), [stats.nct.cdf(*a) for a in zip(t, df, nc)], equal_nan=True)
    x, k, lam = rng.uniform(0, 100, 3000), rng.integers(1, 30, 3000), rng.uniform(0.001, 80, 3000)
    assert np.array_equal(special.chndtr(x, k, lam), [stats.ncx2.cdf(*a) for a in zip(x, k, lam)])
    assert np.array_equal(special.chdtr(k, x), [stats.chi2.cdf(*a) for a in zip(x, k)])
