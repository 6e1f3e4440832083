"""Correlation matrix (pairwise-complete) and the automatic test choice.

Dataset: pingouin's bundled 'penguins', with extra missing values set by the
test so that pairs have different n. References: scipy.stats.pearsonr and
spearmanr per pair, statsmodels' multipletests.
"""

import numpy as np
import pingouin as pg
import pytest
from scipy import stats
from statsmodels.stats.multitest import multipletests

from statsetter import InputError
from statsetter.analyses import analyse, correlation_matrix, level_of

REL = 1e-10
COLS = ["bill_length_mm", "bill_depth_mm", "flipper_length_mm", "body_mass_g"]


@pytest.fixture(scope="module")
def penguins():
    df = pg.read_dataset("penguins")
    df.loc[df.index[:25], "bill_depth_mm"] = np.nan
    df.loc[df.index[100:110], "body_mass_g"] = np.nan
    return df


def test_matrix_against_scipy_pairwise(penguins):
    m = correlation_matrix(penguins, COLS).main
    for i in range(4):
        for j in range(i + 1, 4):
            pair = penguins[[COLS[i], COLS[j]]].dropna()
            ref = stats.pearsonr(pair.iloc[:, 0], pair.iloc[:, 1])
            ci = ref.confidence_interval()
            assert m.n[i, j] == len(pair)
            assert m.r[i, j] == pytest.approx(ref.statistic, rel=REL)
            assert m.p[i, j] == pytest.approx(ref.pvalue, rel=1e-8)
            assert (m.low[i, j], m.high[i, j]) == pytest.approx((ci.low, ci.high), rel=1e-9)
    assert len(m.pairs()) == 6


def test_matrix_adjustment(penguins):
    raw = correlation_matrix(penguins, COLS).main
    adj = correlation_matrix(penguins, COLS, adjust="holm").main
    iu = np.triu_indices(4, 1)
    assert adj.p[iu] == pytest.approx(multipletests(raw.p[iu], method="holm")[1], rel=REL)
    assert "Holm-adjusted" in adj.pairs()[0].notes[1].text


def test_spearman_matrix_complete_data(penguins):
    complete = penguins.dropna(subset=COLS)
    m = correlation_matrix(complete, COLS, coefficient="spearman").main
    ref = stats.spearmanr(complete[COLS])
    assert m.r[np.triu_indices(4, 1)] == pytest.approx(ref.statistic[np.triu_indices(4, 1)], rel=REL)


@pytest.mark.parametrize(
    "outcome, predictor, kind, why",
    [
        ("body_mass_g", "sex", "t_independent", "two groups"),
        ("body_mass_g", "species", "anova_oneway", "3 groups"),
        ("island", "species", "chi2_independence", "nominal"),
        ("body_mass_g", "flipper_length_mm", "pearson", "interval"),
        ("rating", "sex", "mann_whitney", "ordinal"),
        ("rating", "body_mass_g", "spearman", "ordinal"),
    ],
)
def test_auto_choice_is_stated(penguins, outcome, predictor, kind, why):
    df = penguins.assign(rating=(penguins.body_mass_g // 1000).astype("Int64").astype(float))
    (first, *_) = analyse(df, outcome, predictor)
    assert first.kind == kind
    assert first.notes[0].kind == "choice" and first.notes[0].text.startswith("Chosen automatically") and why in first.notes[0].text


def test_levels():
    import pandas as pd

    assert level_of(pd.Series([1, 2, 3, 4, 5, 6, 7] * 3, name="q"))[1].startswith("integer, 7 distinct values 1–7")
    assert level_of(pd.Series(pd.Categorical(["a", "b"], ordered=True)))[0] == "ordinal"
    assert level_of(pd.Series([0.5, 1.7, 2.2, 3.1, 4.4, 5.5, 6.6, 7.7]))[0] == "interval"
    with pytest.raises(InputError, match="level 'metric'"):
        level_of(pd.Series([1.0], name="x"), "metric")


def test_matrix_bad_input(penguins):
    with pytest.raises(InputError, match="at least two"):
        correlation_matrix(penguins, ["bill_length_mm"]).main
    with pytest.raises(InputError, match="zero variance"):
        correlation_matrix(penguins.assign(k=1.0), ["k", "body_mass_g"]).main
    with pytest.raises(InputError, match="not numeric"):
        correlation_matrix(penguins, ["species", "body_mass_g"]).main


def test_dense_and_sparse_paths_agree(penguins, monkeypatch):
    from statsetter.analyses import matrix

    sparse = correlation_matrix(penguins, COLS).main
    monkeypatch.setattr(matrix, "SPARSE_BELOW", -1.0)
    dense = correlation_matrix(penguins, COLS).main
    assert np.array_equal(sparse.n, dense.n)
    assert sparse.r == pytest.approx(dense.r, rel=1e-12)


def test_auto_choice_for_related_samples():
    """A subject column makes the predictor a within-subjects factor: the related-samples test for each level of the
    outcome and number of conditions, equal to calling that test directly, with the choice stated. Data: R's sleep
    (tests/open_data.py, long form), pingouin's rm_anova_wide (made long) and cochran, and chi2_mcnemar (made long)."""
    import sys
    from pathlib import Path

    sys.path.insert(0, str(Path(__file__).parent))
    from open_data import SLEEP_LONG

    from statsetter.analyses import cochran_q, mcnemar, rm_anova, t_paired

    (paired,) = analyse(SLEEP_LONG, "extra", "group", subject="ID")
    direct = t_paired(SLEEP_LONG, outcome="extra", subject="ID", within="group").main
    assert paired.kind == "t_paired" and paired.statistic.value == pytest.approx(direct.statistic.value, rel=1e-12)
    assert paired.notes[0].kind == "choice" and "paired t test" in paired.notes[0].text and "within-subjects factor with 2" in paired.notes[0].text
    long = pg.read_dataset("rm_anova_wide").dropna().reset_index(names="id").melt(id_vars="id", var_name="time", value_name="score")
    (rm,) = analyse(long, "score", "time", subject="id")
    assert rm.kind == "anova_rm" and rm.p == pytest.approx(rm_anova(long, outcome="score", subject="id", within="time").main.p, rel=1e-12)
    (ranked,) = analyse(long, "score", "time", subject="id", levels={"score": "ordinal"})
    assert ranked.kind == "friedman" and "Friedman" in ranked.notes[0].text
    (two_ranked,) = analyse(SLEEP_LONG, "extra", "group", subject="ID", levels={"extra": "ordinal"})
    assert two_ranked.kind == "wilcoxon"
    energy = pg.read_dataset("cochran")
    (q,) = analyse(energy, "Energetic", "Time", subject="Subject")
    wide = energy.pivot(index="Subject", columns="Time", values="Energetic")
    assert q.kind == "cochran_q" and q.statistic.value == pytest.approx(cochran_q(wide, list(wide.columns)).main.statistic.value, rel=1e-12)
    pairs = pg.read_dataset("chi2_mcnemar")
    made_long = pairs.melt(id_vars="subject", var_name="treatment", value_name="improved")
    (m,) = analyse(made_long, "improved", "treatment", subject="subject")
    assert m.kind == "mcnemar" and m.p == pytest.approx(mcnemar(pairs, "treatment_X", "treatment_Y").main.p, rel=1e-12)
    with pytest.raises(InputError, match="3 categories across related samples"):
        analyse(energy.assign(Energetic=energy["Energetic"] + (energy["Subject"] % 3 == 0)), "Energetic", "Time", subject="Subject",
                levels={"Energetic": "nominal"})
    with pytest.raises(InputError, match="more than one row"):
        analyse(SLEEP_LONG.assign(ID=1), "extra", "group", subject="ID")


def test_pair_records_made_in_a_batch_equal_validated_ones_and_bad_arrays_are_refused(penguins):
    """The pairs are made without validating each record again (the arrays are checked as a whole): each must equal the
    record the validating constructor makes from the same fields, and a matrix with impossible numbers is refused."""
    import dataclasses

    from statsetter import RecordError, Result
    from statsetter.analyses.matrix import correlation_matrix as raw

    m = raw(penguins, ["bill_length_mm", "bill_depth_mm", "flipper_length_mm", "body_mass_g"], adjust="holm")
    for r in m.pairs():
        again = Result(**{f.name: getattr(r, f.name) for f in dataclasses.fields(Result)})
        assert again == r and again.to_dict() == r.to_dict() and r.details["p_adjusted"] == "Holm"
    for name, value in (("r", 1.5), ("p", -0.1), ("n", 2.5), ("low", float("nan"))):
        array = np.array(getattr(m, name), dtype=float).copy()
        array[0, 1] = array[1, 0] = value
        with pytest.raises(RecordError, match="pair bill_length_mm~bill_depth_mm"):
            dataclasses.replace(m, **{name: array}).pairs()


def test_the_garbage_collector_is_left_as_it_was(penguins, monkeypatch):
    """Pairs are made with Python's cyclic collector paused (a batch of records holds no cycles): it must run again
    afterwards, stay off where the caller had turned it off, and run again when making the batch fails."""
    import gc

    from statsetter import RecordError
    from statsetter.analyses.matrix import correlation_matrix as raw

    m = raw(penguins, ["bill_length_mm", "bill_depth_mm", "flipper_length_mm"])
    assert gc.isenabled()
    assert len(m.pairs()) == 3 and gc.isenabled()
    gc.disable()
    try:
        m.pairs()
        assert not gc.isenabled()
    finally:
        gc.enable()
    import statsetter.records.summaries as summaries

    def failing(*_):
        def make(*_):
            raise RecordError("pair", "made to fail inside the batch")
        return make

    monkeypatch.setattr(summaries, "_unchecked_maker", failing)
    with pytest.raises(RecordError, match="made to fail"):
        m.pairs()
    assert gc.isenabled()
