"""Moderation against R on its bundled mtcars: fuel economy (mpg) on horsepower (hp) moderated by weight (wt).

R 4.x, run here (tests/r_reference.R has the commands): lm(mpg ~ hp_c * wt_c) on the centred variables; each simple slope
as the hp coefficient of lm(mpg ~ hp * I(wt - v)) with confint(); the Johnson–Neyman values by uniroot on the slope's t
minus qt(.975, 28), built from vcov() — code independent of ours."""

from __future__ import annotations

import pytest

from open_data import MTCARS
from statsetter import InputError, render
from statsetter.analyses import moderation

R_COEF = {"Intercept": (18.8984000821063489, 0.49570260542624961), "hp": (-0.0305076357995529, 0.00750300153344415),
          "wt": (-4.1316490407382602, 0.52955802548822495), "hp × wt": (0.0278481483187412, 0.00741958045779371)}
R_SLOPES = [  # wt value, B, SE, t, p, CI low, CI high
    (2.2387925570103, -0.0577558637955062, 0.0102031440281494, -5.66059477707694, 4.57897303453926e-06, -0.0786560568915329, -0.0368556706994795),
    (3.21725, -0.0305076357995529, 0.00750300153344415, -4.06605751892319, 0.000351911389133615, -0.0458768377255605, -0.0151384338735452),
    (4.1957074429897, -0.00325940780359951, 0.0106720979101451, -0.305413971183777, 0.76230989148736, -0.0251202093806789, 0.0186013937734798),
]
R_JN = (3.69249158481471, 5.90097411303284)


@pytest.fixture(scope="module")
def fitted():
    return moderation(MTCARS, "mpg", "hp", "wt", labels={"mpg": "fuel economy", "hp": "horsepower", "wt": "weight"})


def test_coefficients_equal_r(fitted):
    coefficients = {r.details["term"]: r for r in fitted if r.kind == "linear_coefficient"}
    for term, (b, se) in R_COEF.items():
        assert coefficients[term].estimate.value == pytest.approx(b, rel=1e-10)
        assert coefficients[term].estimate.se == pytest.approx(se, rel=1e-10)
    assert fitted[0].kind == "linear_model" and fitted[0].effects[0].value == pytest.approx(0.884763711991139, rel=1e-10)


def test_simple_slopes_equal_r(fitted):
    slopes = [r for r in fitted if r.kind == "simple_slope"]
    assert [s.details["at"] for s in slopes] == ["the mean − 1 SD", "the mean", "the mean + 1 SD"]
    for s, (v, b, se, t, p, low, high) in zip(slopes, R_SLOPES):
        assert s.details["moderator_value"] == pytest.approx(v, rel=1e-12)
        assert s.estimate.value == pytest.approx(b, rel=1e-9) and s.estimate.se == pytest.approx(se, rel=1e-9)
        assert s.statistic.value == pytest.approx(t, rel=1e-9) and s.p == pytest.approx(p, rel=1e-8)
        assert (s.estimate.ci.low, s.estimate.ci.high) == pytest.approx((low, high), rel=1e-9)


def test_johnson_neyman_equals_r_and_keeps_to_the_observed_range(fitted):
    product = next(r for r in fitted if r.details.get("interaction"))
    values = [float(v) for v in product.details["johnson_neyman"].split(", ")]
    assert values == pytest.approx(list(R_JN), rel=1e-5)  # printed with six significant digits
    note = product.notes[-1].text
    assert "below 3.692" in note and "5.901" not in note  # the second boundary lies above the largest observed weight (5.424)


def test_sentences_do_not_call_an_interaction_an_association(fitted):
    product = next(r for r in fitted if r.details.get("interaction"))
    assert render(product, "sentence").plain().startswith("For fuel economy, the interaction horsepower (centred) × weight (centred) gave B = 0.03")
    slope = next(r for r in fitted if r.kind == "simple_slope")
    assert render(slope, "sentence").plain() == (
        "At weight = 2.24 (the mean − 1 SD), the slope of fuel economy on horsepower was B = −0.06, 95% CI [−0.08, −0.04], SE = 0.01, "
        "t(28) = −5.66, p < .001.")


def test_chosen_values_and_refusals():
    rs = moderation(MTCARS, "mpg", "hp", "wt", at=[2.0, 3.0], center=False)
    slopes = [r for r in rs if r.kind == "simple_slope"]
    assert [s.details["moderator_value"] for s in slopes] == [2.0, 3.0]
    # the slope at a value does not depend on centring: the same as R's lm(mpg ~ hp * I(wt - 3))
    centred = [r for r in moderation(MTCARS, "mpg", "hp", "wt", at=[3.0]) if r.kind == "simple_slope"][0]
    assert slopes[1].estimate.value == pytest.approx(centred.estimate.value, rel=1e-10)
    with pytest.raises(InputError, match="category '1.513 t' has 1 case"):  # text moderator: categorical, one car per weight
        moderation(MTCARS.assign(wt=MTCARS["wt"].astype(str) + " t"), "mpg", "hp", "wt")
    with pytest.raises(InputError, match="at= does not apply"):
        moderation(MTCARS.assign(cyl=MTCARS["cyl"].astype(str)), "mpg", "hp", "cyl", at=[4])


# R 4.x (tests/r_reference.R): lm(mpg ~ factor(cyl)/hp) for the slope of hp within each cylinder count (estimate, SE),
# lm(mpg ~ hp * factor(cyl)) for the products, anova() of the models without and with them for the joint test
R_CYL_SLOPES = {"4": (-0.11277588781944897, 0.0457469486877913), "6": (-0.00761326860841404, 0.0509624306416543),
            "8": (-0.01424412150890258, 0.0164770846223563)}
R_CYL_PRODUCTS = {"6": (0.1051626192110350, 0.0684832289772382), "8": (0.0985317663105465, 0.0486238381032976)}
R_CYL_JOINT = (2.10991, 0.14153)  # F(2, 26), p as R prints them


def test_categorical_moderator_equals_r():
    cars = MTCARS.assign(cyl=MTCARS["cyl"].astype(str))
    rs = moderation(cars, "mpg", "hp", "cyl", labels={"mpg": "fuel economy", "hp": "horsepower", "cyl": "cylinders"})
    slopes = [r for r in rs if r.kind == "simple_slope"]
    assert [s.details["category"] for s in slopes] == list(R_CYL_SLOPES)
    for s, (b, se) in zip(slopes, R_CYL_SLOPES.values()):
        assert s.estimate.value == pytest.approx(b, rel=1e-10) and s.estimate.se == pytest.approx(se, rel=1e-10)
        assert s.statistic.df == (26,) and s.statistic.value == pytest.approx(b / se, rel=1e-10)
    products = [r for r in rs if r.details.get("interaction") and r.kind == "linear_coefficient"]
    for r, (b, se) in zip(products, R_CYL_PRODUCTS.values()):
        assert r.estimate.value == pytest.approx(b, rel=1e-10) and r.estimate.se == pytest.approx(se, rel=1e-10)
    joint = next(r for r in rs if r.kind == "anova_term")
    assert joint.statistic.df == (2, 26) and joint.statistic.value == pytest.approx(R_CYL_JOINT[0], abs=5e-6) and joint.p == pytest.approx(R_CYL_JOINT[1], abs=5e-6)
    assert render(slopes[0], "sentence").plain() == ("Where cylinders was 4, the slope of fuel economy on horsepower was B = −0.11, 95% CI [−0.21, −0.02], "
                                                     "SE = 0.05, t(26) = −2.47, p = .021.")
    assert "Johnson–Neyman region does not apply" in slopes[0].notes[0].text
    # numbers with two values are read as categories (said); the slope for cyl 4 against the rest is the same slope as above
    two = moderation(MTCARS.assign(four=(MTCARS["cyl"] == 4).astype(int)), "mpg", "hp", "four")
    two_slopes = [r for r in two if r.kind == "simple_slope"]
    assert [s.details["category"] for s in two_slopes] == ["0", "1"] and not any(r.kind == "anova_term" for r in two)
    assert two_slopes[1].estimate.value == pytest.approx(R_CYL_SLOPES["4"][0], rel=1e-10)
    assert any(n.kind == "choice" and "two values" in n.text for n in two_slopes[0].notes)
