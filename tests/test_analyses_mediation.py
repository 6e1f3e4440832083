"""Simple mediation against R and pingouin on pingouin's bundled 'mediation' data (X → M → Y, 100 rows).

R 4.x, run here (tests/r_reference.R): the paths are coefficients of lm(M ~ X), lm(Y ~ X + M) and lm(Y ~ X). The
bootstrap CI of a·b is a random quantity: it is checked for reproducibility under its seed, against pingouin's
mediation_analysis (its own resampling, so within Monte Carlo error), and for its coverage of the indirect effect."""

from __future__ import annotations

import pingouin as pg
import pytest

from statsetter import InputError, render
from statsetter.analyses import mediation

R_PATHS = {  # B, SE, t, p
    "a": (0.561015316123459, 0.0944804804289862, 5.93789652186551, 4.39136170381895e-08),
    "b": (0.635494587191664, 0.1005339414705, 6.32119439361822, 7.92264206387168e-09),
    "c′": (0.0396039204186703, 0.109648438254307, 0.361190009171102, 0.718742902217027),
    "c": (0.396126117146749, 0.111159788092407, 3.56357387814963, 0.000567112849082344),
}


@pytest.fixture(scope="module")
def data():
    return pg.read_dataset("mediation")


@pytest.fixture(scope="module")
def fitted(data):
    return mediation(data, "X", "M", "Y")


def test_paths_equal_r(fitted):
    paths = {r.details["path"]: r for r in fitted if r.kind == "mediation_path"}
    for path, (b, se, t, p) in R_PATHS.items():
        r = paths[path]
        assert r.estimate.value == pytest.approx(b, rel=1e-10) and r.estimate.se == pytest.approx(se, rel=1e-9)
        assert r.statistic.value == pytest.approx(t, rel=1e-9) and r.p == pytest.approx(p, rel=1e-7)
    assert (paths["a"].estimate.ci.low, paths["a"].estimate.ci.high) == pytest.approx((0.373521877625811, 0.748508754621108), rel=1e-9)


def test_indirect_effect_and_its_bootstrap(data, fitted):
    indirect = fitted[-1]
    assert indirect.kind == "mediation_indirect"
    assert indirect.estimate.value == pytest.approx(R_PATHS["a"][0] * R_PATHS["b"][0], rel=1e-10)
    assert indirect.details["n_boot"] == 5000 and "seed" in indirect.details["method"]
    again = mediation(data, "X", "M", "Y")[-1]
    assert (again.estimate.ci.low, again.estimate.ci.high) == (indirect.estimate.ci.low, indirect.estimate.ci.high)  # the seed reproduces it
    ref = pg.mediation_analysis(data=data, x="X", m="M", y="Y", seed=42, n_boot=5000)
    row = ref[ref["path"] == "Indirect"].iloc[0]
    assert float(row["coef"]) == pytest.approx(indirect.estimate.value, rel=1e-9)
    width = indirect.estimate.ci.high - indirect.estimate.ci.low
    assert abs(float(row["CI2.5"]) - indirect.estimate.ci.low) < 0.1 * width  # two independent resamplings agree within Monte Carlo error
    assert abs(float(row["CI97.5"]) - indirect.estimate.ci.high) < 0.1 * width
    bc = mediation(data, "X", "M", "Y", bias_corrected=True)[-1]
    assert "bias-corrected" in bc.details["method"] and bc.estimate.ci.low < bc.estimate.value < bc.estimate.ci.high


def test_wording_and_cautions(fitted):
    indirect = fitted[-1]
    text = render(indirect, "sentence").plain()
    assert text.startswith("The indirect effect of X on Y through M was ab = 0.36, 95% CI [") and "excludes zero" in text
    assert any("cannot establish" in n.text for n in indirect.notes)
    assert any("proportion mediated" in n.text for n in indirect.notes)
    for r in fitted:
        assert "cause" not in render(r, "sentence").plain().lower()


def test_refusals(data):
    with pytest.raises(InputError, match="too few"):
        mediation(data, "X", "M", "Y", n_boot=200)
    with pytest.raises(InputError, match="named twice"):
        mediation(data, "X", "X", "Y")


def test_pingouin_mediation_read_and_where_it_differs(data, fitted):
    """pingouin's frame gives a, c, c′ and the indirect effect equal to ours; its "Y ~ M" row is the regression of Y on M
    alone (0.654, not R's b = 0.635 with X held constant), so it is not read as path b."""
    from statsetter.adapters import to_records

    frame = pg.mediation_analysis(data=data, x="X", m="M", y="Y", seed=42, n_boot=2000)
    read = {r.details.get("path", "ab"): r for r in to_records(frame)}
    assert set(read) == {"a", "c", "c′", "ab"}
    mine = {r.details["path"]: r for r in fitted}
    for path in ("a", "c", "c′"):
        assert read[path].estimate.value == pytest.approx(mine[path].estimate.value, rel=1e-9)
    assert read["ab"].estimate.value == pytest.approx(mine["a·b"].estimate.value, rel=1e-9)
    pingouin_b = float(frame.iloc[1]["coef"])
    assert pingouin_b == pytest.approx(0.654173, abs=1e-6) and abs(pingouin_b - R_PATHS["b"][0]) > 0.01


# R 4.x (tests/r_reference.R): lm(M ~ X), lm(Mbin ~ X), lm(Y ~ X + M + Mbin), lm(Y ~ X) on pingouin's mediation data (B, SE)
R_PARALLEL = {("a", "M"): (0.561015316123459, 0.0944804804289862), ("a", "Mbin"): (-0.00514967274660285, 0.0289619959180415),
              ("b", "M"): (0.6350524614769854, 0.101062609063712), ("b", "Mbin"): (-0.0635998169587974, 0.329688737087289),
              ("c", None): (0.396126117146749, 0.111159788092407), ("c′", None): (0.0395244414721756, 0.110197458124629)}


def test_parallel_mediators_equal_r_and_pingouin(data):
    rs = mediation(data, "X", ["M", "Mbin"], "Y")
    paths = [r for r in rs if r.kind == "mediation_path"]
    assert [(r.details["path"], r.details.get("mediator")) for r in paths] == list(R_PARALLEL)
    for r, (b, se) in zip(paths, R_PARALLEL.values()):
        assert r.estimate.value == pytest.approx(b, rel=1e-10) and r.estimate.se == pytest.approx(se, rel=1e-10)
    specific = [r for r in rs if r.kind == "mediation_indirect"]
    assert [r.details["path"] for r in specific] == ["a·b", "a·b", "total indirect"]
    assert specific[0].estimate.value == pytest.approx(R_PARALLEL[("a", "M")][0] * R_PARALLEL[("b", "M")][0], rel=1e-10)
    assert specific[2].estimate.value == pytest.approx(specific[0].estimate.value + specific[1].estimate.value, rel=1e-12)
    # pingouin's "Indirect M" is the same a·b; its CI (5,000 resamples, its own seed) within Monte Carlo error of ours
    ref = pg.mediation_analysis(data, x="X", m=["M", "Mbin"], y="Y", n_boot=5000, seed=1).set_index("path")
    assert specific[0].estimate.value == pytest.approx(float(ref.loc["Indirect M", "coef"]), rel=1e-6)
    assert specific[0].estimate.ci.low == pytest.approx(float(ref.loc["Indirect M", "CI2.5"]), abs=0.03)
    assert specific[0].estimate.ci.high == pytest.approx(float(ref.loc["Indirect M", "CI97.5"]), abs=0.03)
    # pingouin fits a binary mediator's path a by logistic regression (log-odds); ours is OLS, as a·b needs, and says so
    assert float(ref.loc["Mbin ~ X", "coef"]) != pytest.approx(R_PARALLEL[("a", "Mbin")][0], abs=1e-3)
    assert any("linear probability model" in n.text for n in paths[1].notes) and not any("linear probability" in n.text for n in paths[0].notes)
    text = " ".join(render(r, "sentence").plain() for r in rs)
    assert "Path b, from M to Y with X and the other mediators held constant" in text
    assert "The direct path c′, from X to Y with M and Mbin held constant" in text
    assert "The total indirect effect of X on Y through M and Mbin was ab = 0.36, 95% CI [0.21, 0.53]" in text
    with pytest.raises(InputError, match="named twice"):
        mediation(data, "X", ["M", "M"], "Y")


def test_the_batched_resamples_equal_one_least_squares_fit_per_resample(data):
    """The bootstrap solves every resample's normal equations at once from counts of the rows; each a·b must equal
    numpy's lstsq on that resample's rows, drawn the same way (rng.integers(0, n, n) per resample, in order)."""
    import numpy as np

    from statsetter.analyses.mediation import _resampled

    n = len(data)
    ones = np.ones(n)
    Xa = np.column_stack([ones, data["X"]])
    Xb = np.column_stack([ones, data["X"], data["M"], data["Mbin"]])
    M = np.column_stack([data["M"], data["Mbin"]]).astype(float)
    y = data["Y"].to_numpy(dtype=float)
    batched = _resampled(Xa, M, Xb, y, 2, 1200, np.random.default_rng(3))
    rng = np.random.default_rng(3)
    for i in range(1200):
        rows = rng.integers(0, n, n)
        a = np.linalg.lstsq(Xa[rows], M[rows], rcond=None)[0][1]
        b = np.linalg.lstsq(Xb[rows], y[rows], rcond=None)[0][2:4]
        assert batched[i] == pytest.approx(a * b, rel=1e-9, abs=1e-12)
