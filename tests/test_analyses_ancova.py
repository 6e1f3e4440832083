"""ANCOVA against R and pingouin on pingouin's bundled 'ancova' data (Scores by Method, adjusted for Income; 36 rows).

R 4.x, run here (tests/r_reference.R): drop1(lm(Scores ~ Method + Income), test = "F") for the terms (Type II; with
sum-to-zero contrasts the same, as a model without interactions has Type II = Type III), predict(..., se.fit = TRUE,
interval = "confidence") at the mean income for the adjusted means, and anova() against Method * Income for the
homogeneity of slopes. Second library: pingouin.ancova."""

from __future__ import annotations

import pingouin as pg
import pytest

from statsetter import InputError
from statsetter.analyses import ancova

R_TERMS = {"Method": (3, 571.0298833451, 3.33648, 0.03194), "Income": (1, 1678.3526873611, 29.41944, 6.3671e-06)}
R_MEANS = [  # fit, lwr, upr, se (levels A-D)
    (23.7830251197603, 18.3259775469338, 29.2400726925869, 2.67566148311920),
    (30.0538405213900, 24.4329505560070, 35.6747304867730, 2.75599554163984),
    (21.3332346415783, 16.4572065094122, 26.2092627737444, 2.39078008570207),
    (18.5972728455015, 13.6136424276491, 23.5809032633538, 2.44353888750174),
]
R_SLOPES = (3, 0.88368, 0.4615)


@pytest.fixture(scope="module")
def data():
    return pg.read_dataset("ancova")


@pytest.mark.parametrize("ss_type", [2, 3])
def test_terms_equal_r_and_pingouin(data, ss_type):
    rs = ancova(data, "Scores", "Method", ["Income"], ss_type=ss_type)
    terms = {r.details["term"]: r for r in rs if r.kind == "anova_term"}
    for term, (df1, ss, F, p) in R_TERMS.items():
        r = terms[term]
        assert r.statistic.df == (df1, 31) and r.details["ss"] == pytest.approx(ss, rel=1e-10)
        assert r.statistic.value == pytest.approx(F, rel=1e-5) and r.p == pytest.approx(p, rel=1e-3)  # R printed 6 significant digits
    ref = pg.ancova(data=data, dv="Scores", covar="Income", between="Method")
    assert terms["Method"].effects[0].value == pytest.approx(float(ref["np2"].iloc[0]), rel=1e-9)
    assert terms["Method"].p == pytest.approx(float(ref["p_unc"].iloc[0]), rel=1e-9)


def test_adjusted_means_equal_r(data):
    means = [r for r in ancova(data, "Scores", "Method", ["Income"]) if r.kind == "adjusted_mean"]
    assert [m.details["level"] for m in means] == ["A", "B", "C", "D"]
    for m, (fit, low, high, se) in zip(means, R_MEANS):
        assert m.estimate.value == pytest.approx(fit, rel=1e-12) and m.estimate.se == pytest.approx(se, rel=1e-10)
        assert (m.estimate.ci.low, m.estimate.ci.high) == pytest.approx((low, high), rel=1e-10)


def test_homogeneity_of_slopes_is_said(data):
    (term, *_) = ancova(data, "Scores", "Method", ["Income"])
    note = next(n.text for n in term.notes if n.text.startswith("Homogeneity"))
    assert "F(3, 28) = 0.8837, p = 0.4615" in note and "misdescribes" not in note


def test_refusals(data):
    with pytest.raises(InputError, match="at least one"):
        ancova(data, "Scores", "Method", [])
    with pytest.raises(InputError, match="ss_type"):
        ancova(data, "Scores", "Method", ["Income"], ss_type=1)


def test_pingouin_ancova_read_equals_the_analysis(data):
    from statsetter.adapters import to_records

    read = [r for r in to_records(pg.ancova(data=data, dv="Scores", covar="Income", between="Method"), ss_type=2)]
    mine = [r for r in ancova(data, "Scores", "Method", ["Income"]) if r.kind == "anova_term"]
    assert [r.kind for r in read] == ["anova_term", "anova_term"]
    for a, b in zip(read, mine):
        assert a.statistic.value == pytest.approx(b.statistic.value, rel=1e-9) and a.statistic.df == b.statistic.df
        assert a.p == pytest.approx(b.p, rel=1e-9) and a.effects[0].value == pytest.approx(b.effects[0].value, rel=1e-9)


# R 4.x (tests/r_reference.R) on pingouin's penguins with sex recorded (N = 333): body_mass_g ~ species * sex + flipper_length_mm.
# Type II by comparing nested lm fits (each F over the full model's MSE, 326 df): SS, F; Type III by drop1 with contr.sum: SS, F;
# predict() at the mean flipper length for each cell: adjusted mean, SE.
R_TYPE2 = {"species": (13141805.68267456, 79.5923238104380), "sex": (17189576.39695891, 208.2146645273748),
           "species × sex": (1739988.56963311, 10.5381054175285), "flipper_length_mm": (4389048.88757908, 53.1638663232680)}
R_TYPE3 = {"species": (12626072.618727, 76.46883), "sex": (12747945.104762, 154.41388), "species × sex": (1739988.569633, 10.53811),
           "flipper_length_mm": (4389048.887579, 53.16387)}
R_CELLS = {"Adelie, female": (3638.68728903517, 50.0064356789022), "Adelie, male": (4218.77213934566, 41.3376948074169),
           "Chinstrap, female": (3716.32658780202, 55.6858065701113), "Chinstrap, male": (3960.58753667627, 49.3653368957154),
           "Gentoo, female": (4439.23634829037, 50.1139065077851), "Gentoo, male": (5063.35529991955, 68.5191510446905)}


def test_two_factor_ancova_equals_r():
    from statsetter import render

    d = pg.read_dataset("penguins")
    out = ancova(d, "body_mass_g", ["species", "sex"], ["flipper_length_mm"])
    terms = [r for r in out if r.kind == "anova_term"]
    assert [t.details["term"] for t in terms] == list(R_TYPE2)
    for t, (ss, F) in zip(terms, R_TYPE2.values()):
        assert t.details["ss"] == pytest.approx(ss, rel=1e-9) and t.statistic.value == pytest.approx(F, rel=1e-9) and t.statistic.df[1] == 326
    assert terms[2].details["interaction"] and "interaction" in render(terms[2], "sentence").plain()
    for t, (ss, F) in zip(ancova(d, "body_mass_g", ["species", "sex"], ["flipper_length_mm"], ss_type=3), R_TYPE3.values()):
        assert t.details["ss"] == pytest.approx(ss, rel=1e-9) and t.statistic.value == pytest.approx(F, rel=1e-6)
    cells = {r.details["level"]: r for r in out if r.kind == "adjusted_mean"}
    assert set(cells) == set(R_CELLS)
    for level, (mean, se) in R_CELLS.items():
        assert cells[level].estimate.value == pytest.approx(mean, rel=1e-10) and cells[level].estimate.se == pytest.approx(se, rel=1e-9)
    with pytest.raises(InputError, match="one or two"):
        ancova(d, "body_mass_g", ["species", "sex", "island"], ["flipper_length_mm"])


def test_two_factor_ancova_refuses_an_empty_cell():
    d = pg.read_dataset("penguins")
    with pytest.raises(InputError, match="the cell Gentoo × male has no cases"):
        ancova(d[~((d.species == "Gentoo") & (d.sex == "male"))], "body_mass_g", ["species", "sex"], ["flipper_length_mm"])


def _exact_rss(columns, y):
    """The residual sum of squares of y on an intercept and ``columns``, in exact rational arithmetic (every double is a
    fraction): the normal equations solved by Gauss–Jordan elimination over fractions."""
    from fractions import Fraction

    import numpy as np

    x = [[Fraction(v) for v in row] for row in np.column_stack([np.ones(len(y)), *columns]).tolist()]
    yy = [Fraction(v) for v in y.tolist()]
    p = len(x[0])
    a = [[sum(r[i] * r[j] for r in x) for j in range(p)] + [sum(r[i] * v for r, v in zip(x, yy))] for i in range(p)]
    for i in range(p):
        for k in range(p):
            if k != i and a[k][i]:
                f = a[k][i] / a[i][i]
                a[k] = [u - f * w for u, w in zip(a[k], a[i])]
    b = [a[i][p] / a[i][i] for i in range(p)]
    return sum((v - sum(c * w for c, w in zip(row, b))) ** 2 for row, v in zip(x, yy))


def test_type2_sums_of_squares_equal_exact_arithmetic():
    """Type II sums of squares (each term's fall in the residual sum of squares, as R's car::Anova defines them) on
    pingouin's penguins, body mass by species × sex with flipper length and bill depth, against the same differences
    computed exactly in fractions: within 2e-14 of them (measured: 1e-15 to 6e-15; statsmodels' anova_lm, used before,
    was 4e-14 to 1.2e-13 off)."""
    import pandas as pd

    d = pg.read_dataset("penguins").dropna(subset=["body_mass_g", "species", "sex", "flipper_length_mm", "bill_depth_mm"])
    y = d.body_mass_g.to_numpy(float)
    species = list(pd.get_dummies(d.species, drop_first=True).to_numpy(float).T)
    sex = list(pd.get_dummies(d.sex, drop_first=True).to_numpy(float).T)
    both = [a * b for a in species for b in sex]
    flipper, depth = d.flipper_length_mm.to_numpy(float), d.bill_depth_mm.to_numpy(float)
    full = _exact_rss([*species, *sex, *both, flipper, depth], y)
    exact = {"flipper_length_mm": _exact_rss([*species, *sex, *both, depth], y) - full,
             "bill_depth_mm": _exact_rss([*species, *sex, *both, flipper], y) - full,
             "species": _exact_rss([*sex, flipper, depth], y) - _exact_rss([*species, *sex, flipper, depth], y),
             "species × sex": _exact_rss([*species, *sex, flipper, depth], y) - full}
    terms = {r.details["term"]: r for r in ancova(d, "body_mass_g", ["species", "sex"], ["flipper_length_mm", "bill_depth_mm"]) if r.kind == "anova_term"}
    for term, ss in exact.items():
        assert terms[term].details["ss"] == pytest.approx(float(ss), rel=2e-14, abs=0), term
    assert terms["species"].details["ss_error"] == pytest.approx(float(full), rel=2e-14, abs=0)


def test_slopes_that_cannot_be_tested_are_said(data):
    """Method B with one pupil (the first nine rows of pingouin's data): B's own slope is not estimable, so the slopes'
    model adds nothing over one common slope — the note says the test is not possible instead of printing F(0, …) = nan."""
    import warnings

    with warnings.catch_warnings():
        warnings.simplefilter("error")
        term = ancova(data.head(9), "Scores", "Method", ["Income"])[0]
    note = next(n.text for n in term.notes if n.text.startswith("Homogeneity"))
    assert "not testable here" in note and "adds 0" in note and "nan" not in note
