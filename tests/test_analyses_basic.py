"""Correlations and t tests from data, against outside references.

Datasets: pingouin's bundled 'penguins' (Palmer penguins, Gorman et al., 2014)
and Student's (1908) sleep data as printed in R's datasets::sleep (values and
the published result t(9) = -4.06, p = .0028 recalled from memory).
Independent computations: direct scipy.stats calls and published formulas.
"""

import math

import numpy as np
import pingouin as pg
import pytest
from scipy import special, stats

from statsetter import InputError, render
from statsetter.analyses import correlate, t_independent, t_one_sample, t_paired

REL = 1e-10

from open_data import SLEEP  # noqa: E402


@pytest.fixture(scope="module")
def penguins():
    return pg.read_dataset("penguins")


def test_student_sleep_paired():
    r = t_paired(SLEEP, "drug1", "drug2", outcome_label="extra sleep").main
    # published (memory): t(9) = -4.06, p = .0028
    assert render(r, "stats").plain().startswith("t(9) = \u22124.06, p = .003")
    assert round(r.p, 4) == 0.0028
    ref = stats.ttest_rel(SLEEP.drug1, SLEEP.drug2)
    assert r.statistic.value == pytest.approx(ref.statistic, rel=REL)
    assert r.p == pytest.approx(ref.pvalue, rel=REL)
    ci = ref.confidence_interval()
    assert (r.estimate.ci.low, r.estimate.ci.high) == pytest.approx((ci.low, ci.high), rel=REL)


def test_noncentral_t_interval_meets_its_definition():
    # Steiger & Fouladi (1997): the limits are the ncp values at which the observed t
    # is the 97.5th and 2.5th percentile of the noncentral t distribution.
    r = t_paired(SLEEP, "drug1", "drug2").main
    d = r.effects[0]
    n = 10
    t = r.statistic.value
    assert d.value == pytest.approx(t / math.sqrt(n), rel=REL)
    assert stats.nct.cdf(t, 9, d.ci.low * math.sqrt(n)) == pytest.approx(0.975, abs=1e-9)
    assert stats.nct.cdf(t, 9, d.ci.high * math.sqrt(n)) == pytest.approx(0.025, abs=1e-9)


@pytest.mark.parametrize("variant", ["welch", "student"])
def test_independent_against_scipy(penguins, variant):
    r = t_independent(penguins, "body_mass_g", "sex", variant=variant).main
    data = penguins.dropna(subset=["body_mass_g", "sex"])
    a = data.body_mass_g[data.sex == "female"]
    b = data.body_mass_g[data.sex == "male"]
    ref = stats.ttest_ind(a, b, equal_var=variant == "student")
    assert r.statistic.value == pytest.approx(ref.statistic, rel=REL)
    assert r.statistic.df[0] == pytest.approx(ref.df, rel=REL)
    assert r.p == pytest.approx(ref.pvalue, rel=REL)
    ci = ref.confidence_interval()
    assert (r.estimate.ci.low, r.estimate.ci.high) == pytest.approx((ci.low, ci.high), rel=REL)
    assert r.n == len(a) + len(b)
    assert any(n.kind == "missing" and "11 of 344" in n.text for n in r.notes)
    assert any("Levene" in n.text for n in r.notes)
    # Cohen's d (pooled SD) against pingouin.compute_effsize
    d = r.effect("d")
    assert d.value == pytest.approx(pg.compute_effsize(a, b, eftype="cohen"), rel=REL)
    # Hedges' g: d times the exact J = Γ(m/2) / (√(m/2) Γ((m−1)/2)) (Hedges, 1981)
    m = len(a) + len(b) - 2
    j = special.gamma(m / 2) / (math.sqrt(m / 2) * special.gamma((m - 1) / 2)) if m < 300 else math.exp(
        special.gammaln(m / 2) - 0.5 * math.log(m / 2) - special.gammaln((m - 1) / 2)
    )
    assert r.effect("g").value == pytest.approx(d.value * j, rel=REL)


def test_one_sample_against_scipy(penguins):
    r = t_one_sample(penguins, "flipper_length_mm", 200).main
    x = penguins.flipper_length_mm.dropna()
    ref = stats.ttest_1samp(x, 200)
    assert r.statistic.value == pytest.approx(ref.statistic, rel=REL)
    assert r.p == pytest.approx(ref.pvalue, rel=REL)
    ci = ref.confidence_interval()
    assert (r.estimate.ci.low, r.estimate.ci.high) == pytest.approx((ci.low - 200, ci.high - 200), rel=REL)


def test_pearson_against_scipy(penguins):
    r = correlate(penguins, "bill_length_mm", "flipper_length_mm").main
    data = penguins[["bill_length_mm", "flipper_length_mm"]].dropna()
    ref = stats.pearsonr(data.bill_length_mm, data.flipper_length_mm)
    ci = ref.confidence_interval()  # scipy's interval is Fisher's z
    assert r.statistic.value == pytest.approx(ref.statistic, rel=REL)
    assert r.p == pytest.approx(ref.pvalue, rel=REL)
    assert (r.effects[0].ci.low, r.effects[0].ci.high) == pytest.approx((ci.low, ci.high), rel=REL)
    assert r.statistic.df == (len(data) - 2,)


def test_spearman_and_kendall(penguins):
    data = penguins[["bill_length_mm", "body_mass_g"]].dropna()
    n = len(data)
    r = correlate(penguins, "bill_length_mm", "body_mass_g", coefficient="spearman").main
    ref = stats.spearmanr(data.bill_length_mm, data.body_mass_g)
    assert r.statistic.value == pytest.approx(ref.statistic, rel=REL)
    assert r.p == pytest.approx(ref.pvalue, rel=REL)
    # Bonett & Wright (2000): SE of atanh(rs) = sqrt((1 + rs^2/2) / (n - 3))
    se = math.sqrt((1 + ref.statistic**2 / 2) / (n - 3))
    z = stats.norm.ppf(0.975)
    expected = (math.tanh(math.atanh(ref.statistic) - z * se), math.tanh(math.atanh(ref.statistic) + z * se))
    assert (r.effects[0].ci.low, r.effects[0].ci.high) == pytest.approx(expected, rel=REL)
    k = correlate(penguins, "bill_length_mm", "body_mass_g", coefficient="kendall").main
    kref = stats.kendalltau(data.bill_length_mm, data.body_mass_g)
    assert k.statistic.value == pytest.approx(kref.statistic, rel=REL)
    assert k.p == pytest.approx(kref.pvalue, rel=REL)


def _jackknife_se(x, y):
    # the jackknife SE of τb, each leave-one-out τb from scipy.stats.kendalltau (Efron & Tibshirani, 1993)
    n = len(x)
    taus = np.array([stats.kendalltau(np.delete(x, i), np.delete(y, i)).statistic for i in range(n)])
    return math.sqrt((n - 1) / n * ((taus - taus.mean()) ** 2).sum())


def test_kendall_concordance_is_its_definition():
    # d_k = Σ_l sign(x_k − x_l)·sign(y_k − y_l), pair by pair (the definition of concordance; Kendall, 1938),
    # on data with heavy ties, few ties, long tied runs and one single run of ties in x
    from statsetter.analyses.effects import concordance

    rng = np.random.default_rng(11)
    cases = [(rng.integers(0, 4, 300), rng.integers(0, 5, 300)), (rng.normal(size=257), rng.normal(size=257)),
             (np.repeat([1.0, 2.0], [200, 3]), rng.integers(0, 3, 203)), (np.ones(50), rng.normal(size=50))]
    for x, y in cases:
        x, y = np.asarray(x, float), np.asarray(y, float)
        brute = (np.sign(x[:, None] - x[None, :]) * np.sign(y[:, None] - y[None, :])).sum(axis=1)
        assert np.array_equal(concordance(x, y), brute)


def test_kendall_ci_with_ties_against_the_jackknife():
    # τb equals scipy's; its asymptotic SE agrees with the jackknife SE (to 5%) on open data with
    # heavy ties: statsmodels' 'fair' survey (rate_marriage 1-5, religious 1-4; first 400 rows)
    # and the penguins' bill length and body mass (few ties)
    import statsmodels.api as sm

    from statsetter.analyses.effects import kendall_tau_b_se

    fair = sm.datasets.fair.load_pandas().data.iloc[:400]
    peng = pg.read_dataset("penguins")[["bill_length_mm", "body_mass_g"]].dropna()
    for x, y in ((fair.rate_marriage, fair.religious), (fair.rate_marriage, fair.children), (peng.bill_length_mm, peng.body_mass_g)):
        x, y = x.to_numpy(float), y.to_numpy(float)
        tau, se = kendall_tau_b_se(x, y)
        assert tau == pytest.approx(stats.kendalltau(x, y).statistic, rel=REL)
        assert se == pytest.approx(_jackknife_se(x, y), rel=0.05)
    # the record's CI is Fisher's z with the delta-method SE ASE / (1 − τb²)
    r = correlate(fair, "rate_marriage", "religious", coefficient="kendall").main
    tau, se = kendall_tau_b_se(fair.rate_marriage.to_numpy(float), fair.religious.to_numpy(float))
    z = stats.norm.ppf(0.975)
    half = z * se / (1 - tau**2)
    assert (r.effects[0].ci.low, r.effects[0].ci.high) == pytest.approx((math.tanh(math.atanh(tau) - half), math.tanh(math.atanh(tau) + half)), rel=REL)


def test_three_decimal_style_prints_correct_third_decimals(tmp_path, penguins):
    # no borrowed rounding: the record holds unrounded limits, so a 3-decimal style is exact
    house = tmp_path / "three.toml"
    house.write_text('extends = "apa7"\n[numbers]\ndecimals = 3\n')
    r = t_independent(penguins, "body_mass_g", "sex").main
    d = r.effect("d")
    text = render(r, "stats", str(house)).plain()
    assert f"{abs(d.ci.low):.3f}" in text and f"{abs(d.ci.high):.3f}" in text


@pytest.mark.parametrize(
    "call, message",
    [
        (lambda df: t_independent(df, "species", "sex").main, "species: not numeric"),
        (lambda df: t_independent(df, "body_mass_g", "species").main, "3 groups"),
        (lambda df: t_independent(df.assign(one="a"), "body_mass_g", "one").main, "one: 1 group with data"),
        (lambda df: t_independent(df.head(40).assign(g=["a"] + ["b"] * 39), "body_mass_g", "g").main, "n = 1"),
        (lambda df: t_one_sample(df.assign(k=1.0), "k", 0).main, "zero variance"),
        (lambda df: correlate(df.assign(e=np.nan), "e", "body_mass_g").main, "every value is missing"),
        (lambda df: correlate(df, "bill_lenght_mm", "body_mass_g").main, "did you mean bill_length_mm"),
        (lambda df: correlate(df.assign(k=2.0), "k", "body_mass_g").main, "k: zero variance"),
    ],
)
def test_bad_input_names_the_variable(penguins, call, message):
    with pytest.raises(InputError, match=message):
        call(penguins)


def test_missing_values_always_stated(penguins):
    # issue text: how many rows were dropped is always stated in a note (practice)
    r = t_paired(SLEEP, "drug1", "drug2").main
    assert any(n.kind == "missing" and n.text.startswith("No rows dropped") for n in r.notes)
    r = correlate(penguins, "bill_length_mm", "body_mass_g").main
    assert any(n.kind == "missing" and "2 of 344 rows dropped" in n.text for n in r.notes)


@pytest.mark.parametrize("alternative", ["less", "greater"])
def test_one_sided_t_tests_match_scipy(penguins, alternative):
    # scipy.stats: one-sided p; the record keeps no half-open CI
    from statsetter.analyses import t_independent, t_one_sample

    data = penguins.dropna(subset=["body_mass_g", "sex"])
    a, b = (data.body_mass_g[data.sex == s].to_numpy() for s in ("female", "male"))
    for variant, equal in (("welch", False), ("student", True)):
        r = t_independent(penguins, "body_mass_g", "sex", variant=variant, alternative=alternative).main
        ref = stats.ttest_ind(a, b, equal_var=equal, alternative=alternative)
        assert r.statistic.value == pytest.approx(ref.statistic, rel=1e-10) and r.p == pytest.approx(ref.pvalue, rel=1e-10)
        assert r.estimate.ci is None and r.alternative == alternative
    one = t_one_sample(penguins, "body_mass_g", 4200, alternative=alternative).main
    assert one.p == pytest.approx(stats.ttest_1samp(penguins.body_mass_g.dropna(), 4200, alternative=alternative).pvalue, rel=1e-10)
