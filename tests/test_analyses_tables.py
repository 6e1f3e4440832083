"""Chi-square, Fisher and one-way ANOVA, against outside references.

Dataset: pingouin's bundled 'penguins' (Palmer penguins, Gorman et al., 2014).
References: pingouin.chi2_independence, pingouin.anova and welch_anova,
scipy.stats.fisher_exact / contingency.odds_ratio, and the published
definitions of V's noncentral chi-square interval (Smithson, 2003).
"""

import warnings

import pandas as pd
import pingouin as pg
import pytest
from scipy import stats

from statsetter import InputError
from statsetter.analyses import anova_oneway, chi_square, goodness_of_fit

REL = 1e-10


@pytest.fixture(scope="module")
def penguins():
    df = pg.read_dataset("penguins")
    df["adelie"] = (df.species == "Adelie").map({True: "Adelie", False: "other"})
    return df


def test_chi_square_against_pingouin(penguins):
    (r,) = chi_square(penguins, "species", "island")
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        _, _, ref = pg.chi2_independence(penguins, "species", "island")
    row = ref[ref.test == "pearson"].iloc[0]
    assert r.statistic.value == pytest.approx(row.chi2, rel=REL)
    assert r.statistic.df == (row.dof,)
    assert r.p == pytest.approx(row.pval, rel=REL)
    v = r.effect("V")
    assert v.value == pytest.approx(row.cramer, rel=REL)
    # Smithson (2003): the limits are the noncentralities at which chi2 is the 97.5th / 2.5th percentile
    n, m, dof = r.n, 2, 4
    lam_low = v.ci.low**2 * n * m - dof
    lam_high = v.ci.high**2 * n * m - dof
    assert stats.ncx2.cdf(r.statistic.value, dof, lam_low) == pytest.approx(0.975, abs=1e-8)
    assert stats.ncx2.cdf(r.statistic.value, dof, lam_high) == pytest.approx(0.025, abs=1e-8)
    assert not any("expected counts below 5" in note.text for note in r.notes)  # smallest expected is 15.2


def test_small_expected_counts_are_noted(penguins):
    small = penguins.iloc[::15]
    (r,) = chi_square(small, "species", "sex")
    data = small.dropna(subset=["species", "sex"])
    import pandas as pd

    expected = stats.chi2_contingency(pd.crosstab(data.species, data.sex).to_numpy()).expected_freq
    k = int((expected < 5).sum())
    assert k > 0
    assert any(f"{k} of 6 cells have expected counts below 5" in note.text for note in r.notes)


def test_two_by_two_adds_fisher_and_states_yates(penguins):
    chi, fisher = chi_square(penguins, "sex", "adelie", variant="yates")
    assert chi.effect("phi") is not None
    assert chi.details["yates"] is True and any("Yates" in n.text for n in chi.notes)
    data = penguins.dropna(subset=["sex", "adelie"])
    import pandas as pd

    table = pd.crosstab(data.sex, data.adelie).to_numpy()
    assert chi.statistic.value == pytest.approx(stats.chi2_contingency(table, correction=True).statistic, rel=REL)
    assert fisher.p == pytest.approx(stats.fisher_exact(table).pvalue, rel=REL)
    ref = stats.contingency.odds_ratio(table, kind="conditional")
    ci = ref.confidence_interval()
    assert fisher.estimate.value == pytest.approx(ref.statistic, rel=REL)
    assert (fisher.estimate.ci.low, fisher.estimate.ci.high) == pytest.approx((ci.low, ci.high), rel=REL)


def test_goodness_of_fit(penguins):
    r = goodness_of_fit(penguins, "species", {"Adelie": 0.4, "Chinstrap": 0.2, "Gentoo": 0.4}).main
    counts = penguins.species.value_counts()
    obs = [counts["Adelie"], counts["Chinstrap"], counts["Gentoo"]]
    ref = stats.chisquare(obs, f_exp=[344 * 0.4, 344 * 0.2, 344 * 0.4])
    assert r.statistic.value == pytest.approx(ref.statistic, rel=REL)
    assert r.p == pytest.approx(ref.pvalue, rel=REL)


@pytest.mark.parametrize("variant", ["classic", "welch"])
def test_anova_against_pingouin(penguins, variant):
    r = anova_oneway(penguins, "bill_length_mm", "species", variant=variant).main
    if variant == "classic":
        ref = pg.anova(penguins, dv="bill_length_mm", between="species", effsize="n2").iloc[0]
        assert r.statistic.df == (ref.ddof1, ref.ddof2)
    else:
        ref = pg.welch_anova(penguins, dv="bill_length_mm", between="species").iloc[0]
        assert r.statistic.df[1] == pytest.approx(ref.ddof2, rel=REL)
    assert r.statistic.value == pytest.approx(ref.F, rel=REL)
    assert r.p == pytest.approx(ref["p_unc"], rel=REL)
    eta = r.effect("eta2").value
    assert eta == pytest.approx(ref["n2"] if variant == "classic" else ref["np2"], rel=REL)
    # omega squared from its published formula (Hays, 1963) on the classic decomposition
    k, n = 3, r.n
    f = pg.anova(penguins, dv="bill_length_mm", between="species", detailed=True)
    ssb, ssw = f.SS[0], f.SS[1]
    msw = ssw / (n - k)
    assert r.effect("omega2").value == pytest.approx((ssb - (k - 1) * msw) / (ssb + ssw + msw), rel=REL)


@pytest.mark.parametrize(
    "call, message",
    [
        (lambda df: chi_square(df.assign(one="x"), "one", "island"), "a 1 × 3 table"),
        (lambda df: chi_square(df, "island", "island"), "named twice"),
        (lambda df: goodness_of_fit(df, "species", {"Adelie": 0.5, "Gentoo": 0.5}).main, "Chinstrap have no expected"),
        (lambda df: goodness_of_fit(df, "species", {"Adelie": 0.5, "Gentoo": 0.4, "Chinstrap": 0.2}).main, "sum to 1"),
        (lambda df: anova_oneway(df.assign(one="x"), "bill_length_mm", "one").main, "at least two"),
        (lambda df: anova_oneway(df, "island", "species").main, "island: not numeric"),
    ],
)
def test_bad_input(penguins, call, message):
    with pytest.raises(InputError, match=message):
        call(penguins)


def test_cross_counts_are_pandas_crosstab():
    """The χ² and Fisher tables are counted in one pass (statsetter.analyses._common.cross_counts); on every pair of
    columns with at most 12 levels of pingouin's penguins and tips data (text, numbers, booleans), as they are and as
    categoricals in reversed order with an unused category, the same levels in the same order and the same counts as
    pandas.crosstab."""
    import itertools

    import numpy as np
    import pandas as pd

    from statsetter.analyses import _common

    compared = 0
    for name in ("penguins", "tips"):
        frame = pg.read_dataset(name)
        columns = [c for c in frame.columns if frame[c].nunique() <= 12]
        for c in list(columns):
            levels = sorted(frame[c].dropna().unique().tolist(), reverse=True)
            frame[f"{c} (categorical)"] = pd.Categorical(frame[c], categories=levels + ["unused"] if isinstance(levels[0], str) else levels + [-1])
            columns.append(f"{c} (categorical)")
        for a, b in itertools.permutations(columns, 2):
            data = frame[[a, b]].dropna()
            expected, found = pd.crosstab(data[a], data[b]), _common.cross_counts(data, a, b)
            assert list(found.index) == list(expected.index) and list(found.columns) == list(expected.columns), (name, a, b)
            assert (found.index.name, found.columns.name) == (a, b)
            assert np.array_equal(found.to_numpy(), expected.to_numpy()) and found.to_numpy().dtype == expected.to_numpy().dtype, (name, a, b)
            compared += 1
    assert compared == 30 + 90  # penguins: 3 such columns and their categoricals (6 × 5 pairs); tips: 5 (10 × 9)


def test_listwise_is_pandas_dropna():
    """Rows complete on the named columns (statsetter.analyses._common.listwise, which reads each column's missing values
    itself and takes rows by position) are those of pandas' own ``df[names].dropna()``, column types kept, unused
    categories of a categorical dropped: on every pair and triple of columns of pingouin's penguins (missing numbers and
    text) and of the same data with text as categoricals, numbers as nullable Int64 and Float64, and text as object
    columns with None."""
    import itertools

    import pandas as pd

    from statsetter.analyses import _common

    frame = pg.read_dataset("penguins")
    frame["sex (categorical)"] = pd.Categorical(frame["sex"], categories=["male", "female", "unused"])
    frame["species (categorical)"] = pd.Categorical(frame["species"])
    frame["body mass (Int64)"] = frame["body_mass_g"].astype("Int64")
    frame["bill (Float64)"] = frame["bill_length_mm"].astype("Float64")
    frame["sex (object)"] = frame["sex"].astype(object).where(frame["sex"].notna(), None)
    compared = dropped = 0
    for size in (1, 2, 3):
        for names in itertools.combinations(frame.columns, size):
            expected = frame[list(names)].dropna()
            for n in names:
                if isinstance(expected[n].dtype, pd.CategoricalDtype):
                    expected[n] = expected[n].cat.remove_unused_categories()
            found, note = _common.listwise(frame, list(names))
            pd.testing.assert_frame_equal(found, expected, check_exact=True)
            assert (f"{len(frame) - len(found)} of {len(frame)} rows dropped" in note.text) == (len(found) < len(frame))
            compared += 1
            dropped += len(found) < len(frame)
    assert compared == 12 + 66 + 220 and dropped > 200
    with pytest.raises(InputError, match="bill_length_mm: every value is missing"):
        _common.listwise(frame.assign(bill_length_mm=float("nan")), ["species", "bill_length_mm"])
    with pytest.raises(InputError, match="2 columns have this name"):
        _common.listwise(pd.concat([frame[["species"]], frame[["species"]]], axis=1), ["species"])


def test_conditional_odds_ratio_equals_scipy():
    """statsetter's conditional MLE odds ratio and exact CI (formulas.conditional_odds_ratio: roots in ln ψ over one
    vector of log-weights) against scipy.stats.contingency.odds_ratio(kind="conditional") on every 2 × 2 table with
    counts 0-3 (95%), 90 random tables with counts up to 60 and up to 400 and three extreme ones (95% and 90%), two-sided
    and one-sided: within 3e-9 relative (scipy solves ψ to an absolute 1e-13: the largest gaps are at ψ near 1e-6), the
    same 0 and ∞ at the ends of the support, and (nan, 0, ∞) for an empty row or column."""
    import itertools
    import math

    import numpy as np
    from scipy.stats.contingency import odds_ratio

    from statsetter.formulas import conditional_odds_ratio

    rng = np.random.default_rng(20261203)
    small = [np.array(t).reshape(2, 2) for t in itertools.product(range(4), repeat=4)]
    tables = [rng.integers(0, 60, 4).reshape(2, 2) for _ in range(60)] + [rng.integers(0, 400, 4).reshape(2, 2) for _ in range(30)]
    tables += [np.array([[1, 300], [250, 2]]), np.array([[500, 1], [1, 500]]), np.array([[0, 40], [35, 0]])]
    cases = [(t, alternative, 0.95) for t in small for alternative in ("two-sided", "less", "greater")]
    cases += [(t, alternative, level) for t in tables for alternative in ("two-sided", "less", "greater") for level in (0.95, 0.90)]
    compared = 0
    for t, alternative, level in cases:
        with warnings.catch_warnings():
            warnings.simplefilter("ignore")
            ref = odds_ratio(t, kind="conditional")
            ci = ref.confidence_interval(level, alternative=alternative)
        for ours, theirs in zip(conditional_odds_ratio(t, level, alternative), (ref.statistic, ci.low, ci.high)):
            if math.isnan(theirs) or not math.isfinite(theirs) or theirs == 0:
                assert ours == theirs or (math.isnan(ours) and math.isnan(theirs)), (t.tolist(), alternative)
            else:
                assert ours == pytest.approx(float(theirs), rel=3e-9), (t.tolist(), alternative, level)
        compared += 1
    assert compared == 3 * 256 + 6 * 93
    with pytest.raises(InputError, match="negative"):
        conditional_odds_ratio([[1, -2], [3, 4]], 0.95)


def test_an_empty_cell_gives_fisher_without_an_infinite_odds_ratio():
    """A 2 × 2 table with an empty cell (no women with atypical angina among the Cleveland records' first two chest-pain
    types, the female cases of type 1 left out: 39, 0 / 104, 32): the conditional MLE of the odds ratio is infinite, as
    scipy's odds_ratio says; the chi-square and Fisher records are made (an internal error before: an infinite
    estimate), Fisher's p equals scipy's fisher_exact, and the note gives the CI's lower limit (scipy's) and says that
    neither the odds ratio nor its CI is reported."""
    import math

    from scipy.stats.contingency import odds_ratio

    from statsetter import render

    heart = pg.read_dataset("chi2_independence")
    two = heart[heart.cp.isin([0, 1]) & ~((heart.sex == 0) & (heart.cp == 1))]
    records = chi_square(two, "sex", "cp")
    fisher = next(r for r in records if r.kind == "fisher_exact")
    table = [[39, 0], [104, 32]]
    assert pd.crosstab(two.sex, two.cp).to_numpy().tolist() == table
    assert fisher.estimate is None
    assert fisher.p == pytest.approx(stats.fisher_exact(table).pvalue, rel=1e-12)
    reference = odds_ratio(table, kind="conditional")
    assert math.isinf(reference.statistic)
    low = reference.confidence_interval(0.95).low
    method = next(n.text for n in fisher.notes if n.kind == "method")
    assert "odds ratio is infinite" in method and f"{low:.4g}" in method and "neither is reported" in method
    assert render(fisher, "sentence", "apa7").plain() == "Fisher's exact test of sex and cp (N = 175) gave p < .001."
