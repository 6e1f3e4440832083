"""p values in pure Python equal scipy.stats' survival functions and R.

References: scipy.stats (t.sf, norm.sf, f.sf, chi2.sf; Boost and Cephes
underneath) over a grid of statistics and degrees of freedom, to 1e-12
relative for df up to 1,000 and 5e-12 beyond (df = 100,000, where the
continued fraction of the incomplete beta near its mean loses a few digits);
R's pt, pf and pchisq at a few points, printed with 17 digits by Rscript on
the development machine (R 4.x).
"""

import itertools

import pytest
from scipy import stats

from statsetter.pvalues import p_from_statistic, upper_tail

VALUES = [0.0, 0.01, 0.5, 1.0, 1.96, 2.5, 3.3, 5.0, 8.0, 15.0, 40.0]
DFS = [1, 2, 3, 5, 9.5, 17.78, 30, 100, 1000, 100000]


@pytest.mark.parametrize("value, df", list(itertools.product(VALUES, DFS)))
def test_against_scipy_stats(value, df):
    rel = 1e-12 if df <= 1000 else 5e-12
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
