"""p values through scipy.special equal scipy.stats' survival functions.

Reference: scipy.stats (t.sf, norm.sf, f.sf, chi2.sf), the library whose
distribution functions statsetter calls one level down; compared over a grid
of statistics and degrees of freedom to 1e-12 relative.
"""

import itertools

import pytest
from scipy import stats

from statsetter.pvalues import p_from_statistic, upper_tail

VALUES = [0.0, 0.01, 0.5, 1.0, 1.96, 2.5, 3.3, 5.0, 8.0, 15.0, 40.0]
DFS = [1, 2, 3, 5, 9.5, 17.78, 30, 100, 1000, 100000]


@pytest.mark.parametrize("value, df", list(itertools.product(VALUES, DFS)))
def test_against_scipy_stats(value, df):
    assert upper_tail("t", value, (df,)) == pytest.approx(stats.t.sf(value, df), rel=1e-12, abs=1e-300)
    assert upper_tail("chi2", value, (df,)) == pytest.approx(stats.chi2.sf(value, df), rel=1e-12, abs=1e-300)
    assert upper_tail("F", value, (df, 2 * df + 1)) == pytest.approx(stats.f.sf(value, df, 2 * df + 1), rel=1e-12, abs=1e-300)
    assert upper_tail("z", value) == pytest.approx(stats.norm.sf(value), rel=1e-12, abs=1e-300)
    assert p_from_statistic("t", -value, (df,)) == pytest.approx(min(1.0, 2 * stats.t.sf(value, df)), rel=1e-12, abs=1e-300)


def test_missing_scipy_names_the_extra(without_module):
    from statsetter.errors import MissingExtra

    without_module("scipy")
    with pytest.raises(MissingExtra, match=r"statsetter\[analyses\]"):
        upper_tail("t", 2.0, (10,))
