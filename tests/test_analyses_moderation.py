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
    with pytest.raises(InputError):
        moderation(MTCARS.assign(wt=MTCARS["wt"].astype(str) + " t"), "mpg", "hp", "wt")
