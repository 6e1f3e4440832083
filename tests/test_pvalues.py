"""p values in pure Python equal scipy.stats' survival functions and R.

References: scipy.stats (t.sf, norm.sf, f.sf, chi2.sf; Boost and Cephes
underneath) over a grid of statistics and degrees of freedom up to 100,000,
to 1e-12 relative; R's pt, pf and pchisq at a few points, printed with 17
digits by Rscript on the development machine (R 4.x), df up to 10⁹ among
them; and, for one df from 20,000 to 10¹¹, values at 50 digits from mpmath
(tests/mp_reference.py), where scipy itself is not exact.
"""

import itertools
import math

import pytest
from scipy import stats

from statsetter.pvalues import p_from_statistic, upper_tail

VALUES = [0.0, 0.01, 0.5, 1.0, 1.96, 2.5, 3.3, 5.0, 8.0, 15.0, 40.0]
DFS = [1, 2, 3, 5, 9.5, 17.78, 30, 100, 1000, 100000]


@pytest.mark.parametrize("value, df", list(itertools.product(VALUES, DFS)))
def test_against_scipy_stats(value, df):
    rel = 1e-12
    assert upper_tail("t", value, (df,)) == pytest.approx(stats.t.sf(value, df), rel=rel, abs=1e-300)
    assert upper_tail("chi2", value, (df,)) == pytest.approx(stats.chi2.sf(value, df), rel=rel, abs=1e-300)
    assert upper_tail("F", value, (df, 2 * df + 1)) == pytest.approx(stats.f.sf(value, df, 2 * df + 1), rel=rel, abs=1e-300)
    assert upper_tail("z", value) == pytest.approx(stats.norm.sf(value), rel=1e-12, abs=1e-300)
    assert p_from_statistic("t", -value, (df,)) == pytest.approx(min(1.0, 2 * stats.t.sf(value, df)), rel=rel, abs=1e-300)


@pytest.mark.parametrize("symbol, value, df, r", [
    ("t", 1.96, (100000,), 0.024999281597150841),     # pt(1.96, 1e5, lower.tail = FALSE)
    ("t", 5.0, (1000,), 3.3836281823243068e-07),      # pt(5, 1000, lower.tail = FALSE)
    ("t", 2.14, (38,), 0.01941819602998162),         # pt(2.14, 38, lower.tail = FALSE)
    ("F", 4.84608786238014, (2, 27), 0.015909958325622881),  # pf(F, 2, 27, lower.tail = FALSE): PlantGrowth's ANOVA
    ("chi2", 9.87, (2,), 0.0071904609458964481),      # pchisq(9.87, 2, lower.tail = FALSE)
    ("chi2", 250.0, (200,), 0.0093791316688260976),   # pchisq(250, 200, lower.tail = FALSE)
    # one df in the hundreds of thousands and beyond (registry-sized samples): R's TOMS 708 (pbeta)
    ("t", 1.96, (1e9,), 0.024997895286864857),       # pt(1.96, 1e9, lower.tail = FALSE)
    ("t", 10.0, (1e7,), 7.6217961451368046e-24),     # pt(10, 1e7, lower.tail = FALSE)
    ("t", 3.0, (3e5,), 0.0013500088302594395),       # pt(3, 3e5, lower.tail = FALSE)
    ("F", 3.0, (4, 1e8), 0.0173512696984186),        # pf(3, 4, 1e8, lower.tail = FALSE)
    ("F", 1.96, (10, 1e6), 0.033272470428430595),    # pf(1.96, 10, 1e6, lower.tail = FALSE)
])
def test_against_r(symbol, value, df, r):
    assert upper_tail(symbol, value, df) == pytest.approx(r, rel=1e-12)


def test_p_values_need_neither_scipy_nor_numpy():
    # the base install computes p values, and `statsetter format` loads no numerical library: checked in
    # a fresh interpreter, whose sys.modules shows what was imported
    import subprocess
    import sys

    code = ("import sys; from statsetter.cli import main; main(['format', 't', '--stat', '2.14', '--df', '38']); "
            "print(sorted(m for m in ('numpy', 'scipy', 'pandas') if m in sys.modules))")
    out = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=True).stdout
    assert out.splitlines() == ["t(38) = 2.14, p = .039", "[]"]


# t and F with one df from 20,000 to 10¹¹, at 50 digits (tests/mp_reference.py, mpmath 1.4.1). scipy.stats is no
# reference here: its f.sf is off by up to 7.5e-10 relative (F = 3 on 4 and 10⁸ df), and the continued fraction in x
# that statsetter used before lost up to 2e-8 (t = 1.96 on 10⁹ df), since x = ν / (ν + t²) near 1 cannot carry y = 1 − x
HIGH_PRECISION = [
    ("t", 1.96, (2e4,), 0.025004827499202714),
    ("F", 3.0, (1, 2e4,), 0.08327993469650669),
    ("F", 3.0, (4, 2e4,), 0.017373578912577816),
    ("F", 3.0, (10, 2e4,), 0.0008619752674173777),
    ("F", 3.0, (100, 2e4,), 1.2300955048552034e-21),
    ("t", 3.3, (2e4,), 0.00048426944003098204),
    ("t", 8.0, (2e4,), 6.557449298250246e-16),
    ("t", 1.96, (1e5,), 0.02499928159715082),
    ("F", 3.0, (1, 1e5,), 0.08326760027014629),
    ("F", 3.0, (4, 1e5,), 0.01735572718688683),
    ("F", 3.0, (10, 1e5,), 0.000857706319668401),
    ("F", 3.0, (100, 1e5,), 8.210084490552435e-22),
    ("t", 3.3, (1e5,), 0.0004835931311635713),
    ("t", 8.0, (1e5,), 6.286959938128186e-16),
    ("t", 1.96, (1e6,), 0.024998033792634895),
    ("F", 3.0, (1, 1e6,), 0.08326482502421001),
    ("F", 3.0, (4, 1e6,), 0.017351711414019467),
    ("F", 3.0, (10, 1e6,), 0.0008567476833759373),
    ("F", 3.0, (100, 1e6,), 7.488437552328654e-22),
    ("t", 3.3, (1e6,), 0.000483441039670002),
    ("t", 8.0, (1e6,), 6.22753171660126e-16),
    ("t", 1.96, (1e7,), 0.024997909012657096),
    ("F", 3.0, (1, 1e7,), 0.08326454749961636),
    ("F", 3.0, (4, 1e7,), 0.01735130985422332),
    ("F", 3.0, (10, 1e7,), 0.0008566518576525099),
    ("F", 3.0, (100, 1e7,), 7.41970096359891e-22),
    ("t", 3.3, (1e7,), 0.00048342583209648265),
    ("t", 8.0, (1e7,), 6.221617401403393e-16),
    ("t", 1.96, (1e9,), 0.0249978952868648),
    ("F", 3.0, (1, 1e9,), 0.08326451697191106),
    ("F", 3.0, (4, 1e9,), 0.017351265682839904),
    ("F", 3.0, (10, 1e9,), 0.0008566413172436514),
    ("F", 3.0, (100, 1e9,), 7.412176821580459e-22),
    ("t", 3.3, (1e9,), 0.0004834241592808871),
    ("t", 8.0, (1e9,), 6.220967142227382e-16),
    ("t", 1.96, (1e11,), 0.024997895149606878),
    ("F", 3.0, (1, 1e11,), 0.08326451666663401),
    ("F", 3.0, (4, 1e11,), 0.017351265241126262),
    ("F", 3.0, (10, 1e11,), 0.0008566412118399838),
    ("F", 3.0, (100, 1e11,), 7.412101616961774e-22),
    ("t", 3.3, (1e11,), 0.0004834241425527486),
    ("t", 8.0, (1e11,), 6.220960639951308e-16),
]


@pytest.mark.parametrize("symbol, value, df, truth", HIGH_PRECISION)
def test_large_df_against_50_digits(symbol, value, df, truth):
    assert upper_tail(symbol, value, df) == pytest.approx(truth, rel=1e-12, abs=1e-300)

# t on more than 30 df below t² = 0.41 ν, and F on 1 or 2 df likewise, go through the large-a expansion where TOMS 708
# itself takes it (its closed-form Q for b = ½ and 1); at 50 digits (tests/mp_reference.py, mpmath 1.4.1)
MODERATE_DF = [
    ("t", 0.35, (31,), 0.36435278270974253),
    ("t", 1.2, (31,), 0.11961504252415255),
    ("t", 2.01, (31,), 0.02660108897573688),
    ("t", 3.3, (31,), 0.0012184800656434899),
    ("F", 4.2, (1, 31), 0.04896687729938052),
    ("F", 4.2, (2, 31), 0.02431726995827198),
    ("t", 0.35, (40,), 0.36408748496862264),
    ("t", 1.2, (40,), 0.11859931205730516),
    ("t", 2.01, (40,), 0.025604498907656925),
    ("t", 3.3, (40,), 0.0010194061112242222),
    ("F", 4.2, (1, 40), 0.04702142363731585),
    ("F", 4.2, (2, 40), 0.02209492815217999),
    ("t", 0.35, (97,), 0.36354875842772494),
    ("t", 1.2, (97,), 0.11653100512936386),
    ("t", 2.01, (97,), 0.02360415840401997),
    ("t", 3.3, (97,), 0.0006766675906219098),
    ("t", 5.5, (97,), 1.540996830763491e-07),
    ("F", 4.2, (1, 97), 0.043123597911949446),
    ("F", 4.2, (2, 97), 0.017809818123292832),
    ("t", 0.35, (240,), 0.36332282544024347),
    ("t", 1.2, (240,), 0.11566127339113656),
    ("t", 2.01, (240,), 0.022775179938615914),
    ("t", 3.3, (240,), 0.0005569168484105014),
    ("t", 5.5, (240,), 4.8540412523117856e-08),
    ("F", 4.2, (1, 240), 0.04151127196591042),
    ("F", 4.2, (2, 240), 0.016112318004490606),
    ("t", 0.35, (1000,), 0.3632061993786967),
    ("t", 1.2, (1000,), 0.11521177616223353),
    ("t", 2.01, (1000,), 0.022349686982335755),
    ("t", 3.3, (1000,), 0.000500498362501045),
    ("t", 5.5, (1000,), 2.4115319931537613e-08),
    ("F", 4.2, (1, 1000), 0.04068444407916665),
    ("F", 4.2, (2, 1000), 0.015260947481793689),
    ("t", 0.35, (5000,), 0.36317671974877225),
    ("t", 1.2, (5000,), 0.1150980975302089),
    ("t", 2.01, (5000,), 0.02224240228240525),
    ("t", 3.3, (5000,), 0.00048681064064324555),
    ("t", 5.5, (5000,), 1.9934170014832887e-08),
    ("F", 4.2, (1, 5000), 0.04047604742767658),
    ("F", 4.2, (2, 5000), 0.015048515261301545),
]


@pytest.mark.parametrize("symbol, value, df, truth", MODERATE_DF)
def test_moderate_df_against_50_digits(symbol, value, df, truth):
    assert upper_tail(symbol, value, df) == pytest.approx(truth, rel=2e-14, abs=0)


@pytest.mark.parametrize("nu", [31, 40, 97, 1000, 5000, 40000, 1e6, 1e9, 1e11])
def test_f_on_two_df_equals_its_closed_form(nu):
    """An F on 2 and ν df has P(F > x) = (1 + 2x/ν)^(−ν/2) exactly (practice: the F(2, ν) tail in closed form): every
    route (the expansion, the fraction on either side) must give it to the last digits; near p = 1, where only the
    complement carries information, to within two units in the last place of 1 (the expansion alone was 8 off)."""
    for x in (1e-12, 1e-9, 1e-6, 0.01, 0.3, 1.0, 2.5, 4.2, 9.0, 30.0):
        exact = math.exp(-nu / 2 * math.log1p(2 * x / nu))  # itself exact to about |ln p| units in the last place
        got = upper_tail("F", x, (2, nu))
        if x <= 1e-6:
            assert abs(got - exact) <= 2 * 2.0**-53, x
        else:
            assert got == pytest.approx(exact, rel=2e-15 * (1 + abs(math.log(exact))), abs=0), x


@pytest.mark.parametrize("df", [1e12, 1e13, 1e14, 1e15])
@pytest.mark.parametrize("value", [0.01, 0.5, 2.0, 6.0])
def test_t_and_the_f_denominator_up_to_the_largest_df(value, df):
    """Up to 10¹⁵ df, t's tail and F's on a few numerator df equal scipy's (Boost and Cephes) to 1e-12; near t = 0
    the tail had gone wrong from 10¹⁷ df on (p off by several times itself), which is why more df are refused."""
    assert upper_tail("t", value, (df,)) == pytest.approx(stats.t.sf(value, df), rel=1e-12, abs=0)
    assert upper_tail("F", value, (3, df)) == pytest.approx(stats.f.sf(value, 3, df), rel=1e-12, abs=0)


@pytest.mark.parametrize("df", [1e3, 1e4, 1e5])
def test_f_with_many_numerator_df(df):
    """F's numerator df, as many as any design has and more, against scipy to 1e-12 (from 10⁶ on ours loses digits
    where F < 1: 2e-12 at 10⁶, 2e-9 at 10⁹; measured, and said in upper_tail's docstring)."""
    for value in (0.5, 1.0, 2.5):
        assert upper_tail("F", value, (df, 5)) == pytest.approx(stats.f.sf(value, df, 5), rel=1e-12, abs=0)


def test_degrees_of_freedom_beyond_any_data_are_refused():
    """Above 10¹⁵ df (no data give them) the p value is refused with the df named, not computed wrong."""
    from statsetter.errors import InputError

    for symbol, df in (("t", (1e16,)), ("F", (3, 1e20)), ("chi2", (1e300,)), ("r", (1e17,))):
        with pytest.raises(InputError, match="10¹⁵"):
            p_from_statistic(symbol, 0.5, df)
    with pytest.raises(InputError, match="10¹⁵"):
        upper_tail("t", 0.5, (1e17,))
    assert p_from_statistic("t", 0.5, (1e15,)) == pytest.approx(2 * stats.t.sf(0.5, 1e15), rel=1e-12)


def test_statistics_far_out_in_a_tail_give_a_p_not_an_error():
    """A statistic too large (or too small) for its tail to be written: every p in [0, 1], the same as scipy's where
    scipy's is above 1e-300 (to 1e-7: p values of 1e-190 and below, on 10⁹ df, differ there), 0 or 1 where it is not
    — before, χ² = 1e308, χ² = 1e-9 on 10¹⁵ df, t = 10¹⁵ on 38 df and F = 10³⁰⁰ on many df stopped with a math
    error or a fraction that did not converge (found by feeding `statsetter format` such values)."""
    cases = [("t", v, (df,)) for v in (10, 300, 1e5, 1e15, 1e200) for df in (1, 38, 1e4, 1e9)]
    cases += [("F", v, (d1, df)) for v in (1e-300, 1e-8, 50, 1e8, 1e300) for d1 in (1, 3, 20, 1e4) for df in (3, 38, 1e4, 1e9)]
    cases += [("chi2", v, (df,)) for v in (1e-9, 500, 1e8, 1e308) for df in (1, 38, 1e6, 1e15)]
    scipy_tail = {"t": lambda v, df: stats.t.sf(v, *df), "F": lambda v, df: stats.f.sf(v, *df), "chi2": lambda v, df: stats.chi2.sf(v, *df)}
    for symbol, value, df in cases:
        ours, ref = upper_tail(symbol, value, df), scipy_tail[symbol](value, df)
        assert 0.0 <= ours <= 1.0, (symbol, value, df, ours)
        if ref > 1e-300:
            assert ours == pytest.approx(ref, rel=1e-7), (symbol, value, df)
        else:
            assert ours <= 1e-300, (symbol, value, df, ours)


def test_spearmans_p_as_rs_cor_test_gives_it():
    """Spearman's ρ without ties as R's cor.test computes its p by default (R's prho.c and cor.test.R: the distribution
    of S = Σ(i − πᵢ)² counted over all permutations up to 9 pairs, Algorithm AS 89's Edgeworth series from 10 to 1,290
    pairs, the t approximation above).
    - the counts of S: against enumerating every permutation (n = 2 to 9; independent of the recursion used);
    - n = 10, P(S ≤ 36): 0.005825634 by AS 89 and 0.005265377 exactly — the two values printed in the examples of
      CRAN's pspearman package (pspearman(36, 10, approximation = "AS89") and "exact"), whose AS 89 is R's prho; and
      its spearman.test example's two-sided p, cor.test's 0.05444507 and the exact 0.05443067;
    - R's cor.test help page's Hollander & Wolfe data (9 pairs): ρ = 0.6 (scipy), one-sided p 0.0484 as R prints it
      for alternative = "greater" (from memory), two-sided twice that, against the t approximation's 0.0876 (scipy);
    - above 1,290 pairs: None (R takes the t approximation there, as p_from_statistic does)."""
    from statsetter.pvalues import _spearman_counts, _spearman_lower, spearman_p

    for n in range(2, 10):
        counts = [0] * (n * (n * n - 1) // 3 + 1)
        for perm in itertools.permutations(range(n)):
            counts[sum((i - v) ** 2 for i, v in enumerate(perm))] += 1
        assert _spearman_counts(n) == counts, n
    assert _spearman_lower(10, 36 + 2) == pytest.approx(0.005825634, abs=5e-10)
    exact = sum(_spearman_counts(10)[:37]) / math.factorial(10)
    assert exact == pytest.approx(0.005265377, abs=5e-10)
    x = [44.4, 45.9, 41.9, 53.3, 44.7, 44.1, 50.7, 45.2, 60.1]
    y = [2.6, 3.1, 2.5, 5.0, 3.6, 4.0, 5.2, 2.8, 3.8]
    rho, t_approximation = stats.spearmanr(x, y)
    assert rho == pytest.approx(0.6, abs=1e-12) and t_approximation == pytest.approx(0.0876, abs=5e-5)
    assert spearman_p(rho, 9) / 2 == pytest.approx(0.0484, abs=5e-5)
    assert spearman_p(rho, 9) == spearman_p(-rho, 9) == pytest.approx(0.09679783950617284, rel=1e-15)
    # the pspearman package's spearman.test example (x = 1:10, y = c(5:1, 6, 10:7)): cor.test's p 0.05444507 (AS 89)
    # and the exact 0.05443067, as its Rd file prints them
    rho10 = stats.spearmanr(range(1, 11), [5, 4, 3, 2, 1, 6, 10, 9, 8, 7]).statistic
    assert spearman_p(rho10, 10) == pytest.approx(0.05444507, abs=5e-9)
    assert 2 * sum(_spearman_counts(10)[:61]) / math.factorial(10) == pytest.approx(0.05443067, abs=5e-9)
    assert spearman_p(0.3, 1290) is not None and spearman_p(0.3, 1291) is None
    assert spearman_p(1.0, 5) == pytest.approx(2 / 120) and spearman_p(0.0, 12) == 1.0
