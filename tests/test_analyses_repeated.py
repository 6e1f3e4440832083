"""McNemar's test, Cochran's Q and Friedman's test with Kendall's W, against
R and a second Python library.

Data: pingouin's bundled 'chi2_mcnemar' and 'cochran' datasets; the
rounding-times data of R's ?friedman.test example (Hollander & Wolfe),
typed here from that help page (the expected values are R's output on
exactly these numbers, so a typing slip could not make the test wrong).
R 4.x was run on this machine (values printed with 15 digits):
mcnemar.test(table(X, Y)) with and without correct, binom.test(b, b + c),
friedman.test(RoundingTimes), and Cochran's Q by its formula in R code.
Second libraries: statsmodels' mcnemar and cochrans_q, pingouin's cochran
and friedman."""

from __future__ import annotations

import numpy as np
import pandas as pd
import pingouin as pg
import pytest

from statsetter import InputError, render
from statsetter.analyses import cochran_q, friedman, mcnemar
from statsetter.audit.reading import Unit
from statsetter.audit.report import audit_units

R = {  # R 4.x, run here (tests/r_reference.R reproduces these)
    "mcnemar_corrected": (20.0208333333333, 7.66030209405742e-06),
    "mcnemar_uncorrected": (21.3333333333333, 3.85961643692845e-06),
    "binom_p": 3.30526670921928e-06,
    "binom_ci": (0.69777758647012, 0.925189139600407),
    "friedman": (11.1428571428571, 2, 0.00380504077551136),
    "cochran": (6.70588235294118, 2, 0.0349813164243501),
}
ROUNDING = np.array([5.40, 5.50, 5.55, 5.85, 5.70, 5.75, 5.20, 5.60, 5.50, 5.55, 5.50, 5.40, 5.90, 5.85, 5.70, 5.45, 5.55, 5.60, 5.40, 5.40, 5.35,
                     5.45, 5.50, 5.35, 5.25, 5.15, 5.00, 5.85, 5.80, 5.70, 5.25, 5.20, 5.10, 5.65, 5.55, 5.45, 5.60, 5.35, 5.45, 5.05, 5.00, 4.95,
                     5.50, 5.50, 5.40, 5.45, 5.55, 5.50, 5.55, 5.55, 5.35, 5.45, 5.50, 5.55, 5.50, 5.45, 5.25, 5.65, 5.60, 5.40, 5.70, 5.65, 5.55,
                     6.30, 6.30, 6.25]).reshape(22, 3)


@pytest.fixture(scope="module")
def pairs():
    return pg.read_dataset("chi2_mcnemar")


@pytest.fixture(scope="module")
def energetic():
    long = pg.read_dataset("cochran")
    return long, long.pivot(index="Subject", columns="Time", values="Energetic")


@pytest.mark.parametrize("variant, key", [("corrected", "mcnemar_corrected"), ("uncorrected", "mcnemar_uncorrected")])
def test_mcnemar_chi_square_equals_r(pairs, variant, key):
    (r,) = mcnemar(pairs, "treatment_X", "treatment_Y", variant=variant)
    chi2, p = R[key]
    assert r.statistic.value == pytest.approx(chi2, rel=1e-12) and r.statistic.df == (1,)
    assert r.p == pytest.approx(p, rel=1e-9)
    assert r.details["b"] + r.details["c"] == 48 and r.n == 80


def test_mcnemar_exact_and_the_discordant_odds_ratio_equal_r(pairs):
    (r,) = mcnemar(pairs, "treatment_X", "treatment_Y", variant="exact")
    assert r.statistic is None and r.p == pytest.approx(R["binom_p"], rel=1e-9)
    low, high = R["binom_ci"]  # binom.test's Clopper–Pearson limits of b/(b + c), as odds
    odds = r.effects[0]
    assert odds.value == pytest.approx(40 / 8) and odds.ci.low == pytest.approx(low / (1 - low), rel=1e-9)
    assert odds.ci.high == pytest.approx(high / (1 - high), rel=1e-9)
    assert "exact p" in render(r, "stats").plain()


def test_mcnemar_auto_chooses_and_says_so(pairs):
    (r,) = mcnemar(pairs, "treatment_X", "treatment_Y")
    assert r.details["method"] == "chi-square with continuity correction"  # 48 discordant pairs: at least 25
    assert any("chosen: 48 discordant pairs" in n.text for n in r.notes)
    small = pairs.iloc[:30]
    (s,) = mcnemar(small, "treatment_X", "treatment_Y")
    assert s.details["method"].startswith("exact")


def test_mcnemar_equals_statsmodels(pairs):
    from statsmodels.stats.contingency_tables import mcnemar as sm_mcnemar

    table = pd.crosstab(pairs["treatment_X"], pairs["treatment_Y"]).to_numpy()
    for exact, correction, variant in ((False, True, "corrected"), (False, False, "uncorrected"), (True, False, "exact")):
        ref = sm_mcnemar(table, exact=exact, correction=correction)
        (r,) = mcnemar(pairs, "treatment_X", "treatment_Y", variant=variant)
        assert r.p == pytest.approx(ref.pvalue, rel=1e-9)


def test_cochran_q_equals_r_statsmodels_and_pingouin(energetic):
    from statsmodels.stats.contingency_tables import cochrans_q

    long, wide = energetic
    (r,) = cochran_q(wide, list(wide.columns))
    q, df, p = R["cochran"]
    assert r.statistic.value == pytest.approx(q, rel=1e-12) and r.statistic.df == (df,) and r.p == pytest.approx(p, rel=1e-9)
    sm = cochrans_q(wide.to_numpy())
    assert r.statistic.value == pytest.approx(sm.statistic, rel=1e-12)
    ref = pg.cochran(long, dv="Energetic", within="Time", subject="Subject")
    assert r.statistic.value == pytest.approx(float(ref["Q"].iloc[0]), rel=1e-12)
    assert r.p == pytest.approx(float(ref["p_unc"].iloc[0] if "p_unc" in ref else ref["p-unc"].iloc[0]), rel=1e-9)


def test_friedman_and_kendalls_w_equal_r_and_pingouin():
    df = pd.DataFrame(ROUNDING, columns=["round out", "narrow angle", "wide angle"])
    (r,) = friedman(df, list(df.columns))
    chi2, k1, p = R["friedman"]
    assert r.statistic.value == pytest.approx(chi2, rel=1e-12) and r.statistic.df == (k1,) and r.p == pytest.approx(p, rel=1e-9)
    assert r.effects[0].value == pytest.approx(chi2 / (22 * 2), rel=1e-12)  # W = χ²/(n(k − 1)), by definition
    long = df.reset_index().melt(id_vars="index", var_name="method", value_name="time")
    ref = pg.friedman(long, dv="time", within="method", subject="index")
    assert r.effects[0].value == pytest.approx(float(ref["W"].iloc[0]), rel=1e-9)


def test_sentences_and_refusals(pairs):
    (r,) = mcnemar(pairs, "treatment_X", "treatment_Y", labels={"treatment_X": "treatment X", "treatment_Y": "treatment Y"})
    text = render(r, "sentence").plain()
    assert text.startswith("Of 80 pairs, 20 (25.0%) were “True” at treatment X and 52 (65.0%) at treatment Y; McNemar's test")
    three = pairs.assign(treatment_Y=np.where(pairs.index % 3 == 0, "maybe", pairs["treatment_Y"].astype(str)))
    with pytest.raises(InputError, match="two values"):
        mcnemar(three.assign(treatment_X=pairs["treatment_X"].astype(str)), "treatment_X", "treatment_Y")
    same = pairs.assign(treatment_Y=pairs["treatment_X"])
    with pytest.raises(InputError, match="no pair changed"):
        mcnemar(same, "treatment_X", "treatment_Y")
    with pytest.raises(InputError, match="at least three"):
        friedman(pd.DataFrame(ROUNDING[:, :2], columns=["a", "b"]), ["a", "b"])


def test_the_audit_reads_and_checks_them():
    """The audit recomputes McNemar's and Friedman's χ² and Cochran's Q from their printed df (R's values above)."""
    good = [Unit("a", "Cochran's Q test gave Q(2) = 6.71, p = .035."), Unit("b", "A Friedman test gave χ2(2) = 11.14, p = .004, W = .25.")]
    for e in audit_units(good):
        assert not {"p-does-not-follow"} & set(e.codes) and e.checked
    (bad,) = audit_units([Unit("c", "Cochran's Q test gave Q(2) = 6.71, p = .35.")])
    assert "p-does-not-follow" in bad.codes


def test_pingouin_results_read_as_records_equal_the_analyses(energetic):
    """pingouin.cochran and pingouin.friedman frames, read by the adapters, give the statistic, df, p (and W) of the
    analyses from the same data."""
    from statsetter.adapters import to_records

    long, wide = energetic
    (read,) = to_records(pg.cochran(long, dv="Energetic", within="Time", subject="Subject"))
    (mine,) = cochran_q(wide, list(wide.columns))
    assert read.kind == "cochran_q" and read.statistic.value == pytest.approx(mine.statistic.value, rel=1e-12)
    assert read.statistic.df == mine.statistic.df and read.p == pytest.approx(mine.p, rel=1e-9)
    df = pd.DataFrame(ROUNDING, columns=["round out", "narrow angle", "wide angle"])
    melted = df.reset_index().melt(id_vars="index", var_name="method", value_name="time")
    (read,) = to_records(pg.friedman(melted, dv="time", within="method", subject="index"))
    (mine,) = friedman(df, list(df.columns))
    assert read.kind == "friedman" and read.statistic.value == pytest.approx(mine.statistic.value, rel=1e-12)
    assert read.p == pytest.approx(mine.p, rel=1e-9) and read.effects[0].value == pytest.approx(mine.effects[0].value, rel=1e-9)


# R 4.x, run here on pingouin's 'rm_anova_wide' (the 9 people with all four measurements): anova(lm(Y ~ 1), M = ~cond, X = ~1,
# idata = data.frame(cond = factor(colnames(Y))), test = "Spherical") and mauchly.test(...) on the same fit
R_RM = {"F": 5.20065155117859, "df": (3, 24), "p": 0.00655714189447163, "gg": 0.6943, "p_gg": 0.0166993073368506, "hf": 0.9434,
        "p_hf": 0.00778268990882709, "mauchly_w": 0.3067837341417, "mauchly_p": 0.16336494372}


@pytest.fixture(scope="module")
def weeks():
    return pg.read_dataset("rm_anova_wide")


def test_rm_anova_equals_r_anova_mlm(weeks):
    from statsetter.analyses import rm_anova

    (none,) = rm_anova(weeks, list(weeks.columns), correction="none")
    assert none.statistic.value == pytest.approx(R_RM["F"], rel=1e-12) and none.statistic.df == R_RM["df"]
    assert none.p == pytest.approx(R_RM["p"], rel=1e-9) and none.n == 9
    assert none.details["epsilon_gg"] == pytest.approx(R_RM["gg"], abs=5e-5) and none.details["epsilon_hf"] == pytest.approx(R_RM["hf"], abs=5e-5)
    assert none.details["mauchly_w"] == pytest.approx(R_RM["mauchly_w"], rel=1e-9)
    assert none.details["mauchly_p"] == pytest.approx(R_RM["mauchly_p"], rel=1e-9)
    (gg,) = rm_anova(weeks, list(weeks.columns), correction="gg")
    (hf,) = rm_anova(weeks, list(weeks.columns), correction="hf")
    assert gg.p == pytest.approx(R_RM["p_gg"], rel=1e-9) and hf.p == pytest.approx(R_RM["p_hf"], rel=1e-9)
    assert gg.statistic.df[0] == pytest.approx(3 * gg.details["epsilon_gg"]) and gg.statistic.df[1] == pytest.approx(24 * gg.details["epsilon_gg"])


def test_rm_anova_equals_pingouin_and_statsmodels(weeks):
    from statsmodels.stats.anova import AnovaRM

    from statsetter.analyses import rm_anova

    (r,) = rm_anova(weeks, list(weeks.columns), correction="gg")
    ref = pg.rm_anova(weeks, correction=True)
    assert r.p == pytest.approx(float(ref["p_GG_corr"].iloc[0]), rel=1e-9)
    assert r.effects[0].value == pytest.approx(float(ref["ng2"].iloc[0]), rel=1e-9)  # generalized η²
    assert r.details["epsilon_gg"] == pytest.approx(float(ref["eps"].iloc[0]), rel=1e-9)
    long = weeks.dropna().reset_index().melt(id_vars="index", var_name="week", value_name="score")
    sm = AnovaRM(long, "score", "index", within=["week"]).fit().anova_table
    assert r.details["p_uncorrected"] == pytest.approx(float(sm["Pr > F"].iloc[0]), rel=1e-9)
    (from_long,) = rm_anova(long, outcome="score", subject="index", within="week", correction="gg")
    assert from_long.statistic.value == pytest.approx(r.statistic.value, rel=1e-12)  # long data give the same test


def test_rm_anova_auto_rule_and_sentence(weeks):
    from statsetter.analyses import rm_anova

    (r,) = rm_anova(weeks, list(weeks.columns))
    assert r.details["correction"] == "Greenhouse–Geisser correction"  # ε̂ = .69 < .75
    assert any("below 0.75" in n.text for n in r.notes)
    assert render(r, "stats").plain() == "F(2.08, 16.66) = 5.20, p = .017, ε = .69, η²_G = .35"
    with pytest.raises(InputError, match="rows for"):
        rm_anova(pd.concat([weeks.reset_index().melt(id_vars="index")] * 2), outcome="value", subject="index", within="variable")


def test_pingouin_rm_anova_read_equals_the_analysis(weeks):
    from statsetter.adapters import to_records
    from statsetter.analyses import rm_anova

    (read,) = to_records(pg.rm_anova(weeks, correction=True))
    (mine,) = rm_anova(weeks, list(weeks.columns), correction="gg")
    assert read.kind == "anova_rm" and read.statistic.df == pytest.approx(mine.statistic.df, rel=1e-9)
    assert read.p == pytest.approx(mine.p, rel=1e-9) and read.effects[0].value == pytest.approx(mine.effects[0].value, rel=1e-9)
    assert read.details["mauchly_p"] == pytest.approx(mine.details["mauchly_p"], rel=1e-9)


# R 4.x, run here: pairwise.t.test(y, cond, paired = TRUE, p.adjust.method = "holm" / "bonferroni") on the same 9 people,
# and t.test(Before, 1 week, paired = TRUE, conf.level = 1 - .05/6) for a Bonferroni-level CI
R_HOLM = {("Before", "1 week"): 0.78135935387769417, ("Before", "2 week"): 0.04039541130205948, ("Before", "3 week"): 0.00432666025805935,
          ("1 week", "2 week"): 0.514156943221195, ("1 week", "3 week"): 0.120374788323789, ("2 week", "3 week"): 0.591952129430062}
R_BONF = {("Before", "2 week"): 0.04847449356247138, ("1 week", "3 week"): 0.180562182485683}


def test_rm_anova_pairwise_paired_tests_equal_r(weeks):
    from statsetter.analyses import rm_anova

    main, *pairs = rm_anova(weeks, list(weeks.columns), pairwise="holm")
    assert main.kind == "anova_rm" and len(pairs) == 6
    for r in pairs:
        key = (r.groups[0].label, r.groups[1].label)
        assert r.p == pytest.approx(R_HOLM[key], rel=1e-9) and r.kind == "posthoc_pair"
    bonf = {(r.groups[0].label, r.groups[1].label): r for r in rm_anova(weeks, list(weeks.columns), pairwise="bonferroni")[1:]}
    for key, p in R_BONF.items():
        assert bonf[key].p == pytest.approx(p, rel=1e-9)
    first = bonf[("Before", "1 week")]
    assert (first.estimate.ci.low, first.estimate.ci.high) == pytest.approx((-2.04071642222507, 1.72960531111396), rel=1e-9)
    assert first.statistic.value == pytest.approx(-0.287062496720373, rel=1e-9)
    assert "Holm-adjusted" in render(pairs[0], "sentence").plain()


# R 4.x, run here on pingouin's 'mixed_anova' data (60 people, Group × Time): anova(lm(Y ~ g), M = ~time, X = ~1, idata, test =
# "Spherical") for the within terms, mauchly.test on the same fit, and summary(aov(Scores ~ Group*Time + Error(Subject/Time)))
R_MIXED = {"time": (4.02739419088839, 0.0203694126175162, 0.0204376569694461), "inter": (2.72799558684055, 0.0695448074363938, 0.0696550310191486),
           "group": (5.05171, 0.02842), "gg": 0.9981, "hf": 1.0337, "mauchly_w": 0.9981167307382, "mauchly_p": 0.947693844217}


def test_mixed_anova_equals_r_and_pingouin():
    from statsetter.analyses import mixed_anova

    d = pg.read_dataset("mixed_anova")
    group, time, inter = mixed_anova(d, "Scores", "Subject", "Time", "Group", correction="none")
    assert group.statistic.df == (1, 58) and group.statistic.value == pytest.approx(R_MIXED["group"][0], rel=1e-5)
    assert group.p == pytest.approx(R_MIXED["group"][1], rel=1e-3)  # R printed 5 significant digits
    for r, key in ((time, "time"), (inter, "inter")):
        F, p, p_gg = R_MIXED[key]
        assert r.statistic.df == (2, 116) and r.statistic.value == pytest.approx(F, rel=1e-9) and r.p == pytest.approx(p, rel=1e-8)
        assert r.details["epsilon_gg"] == pytest.approx(R_MIXED["gg"], abs=5e-5)
    assert any("Huynh–Feldt ε = 1.034" in n.text for n in time.notes)  # R's Lecoutre-corrected value, before the cap at 1
    assert any("W = 0.9981" in n.text and "p = 0.9477" in n.text for n in time.notes)
    gg_time = mixed_anova(d, "Scores", "Subject", "Time", "Group", correction="gg")[1]
    assert gg_time.p == pytest.approx(R_MIXED["time"][2], rel=1e-9)
    ref = pg.mixed_anova(d, dv="Scores", within="Time", subject="Subject", between="Group")
    for r, (_, row) in zip((group, time, inter), ref.iterrows()):
        assert r.effects[0].value == pytest.approx(float(row["np2"]), rel=1e-6) and r.p == pytest.approx(float(row["p_unc"]), rel=1e-4)
    with pytest.raises(InputError, match="more than one group"):
        mixed_anova(d.assign(Group=np.where((d.index // 60) % 2, "a", "b")), "Scores", "Subject", "Time", "Group")


# R's anova.mlm (test = "Spherical") per term of pingouin's rm_anova2 (idata Time × Metric; X/M as in tests/r_reference.R) and
# mauchly.test: F, uncorrected p, GG-corrected p, GG ε, HF ε, Mauchly's W and p
R_TWO_WITHIN = {
    "Time": (33.85228, 0.0002536076605591, 0.0002536076605591, 1.0, 1.0, None, None),
    "Metric": (26.95919, 3.853838575239e-06, 5.232460290389e-06, 0.9691, 1.0, 0.9681178957938, 0.878441799168),  # R prints HF 1.2307 before the cap
    "Time × Metric": (12.63227, 0.0003734768614557, 0.001707935329771, 0.7272, 0.8312, 0.6247989838361, 0.152391680462),
}


def test_two_within_factors_equal_r_anova_mlm_and_pingouin():
    from statsetter.analyses import rm_anova

    d = pg.read_dataset("rm_anova2")
    terms = rm_anova(d, outcome="Performance", subject="Subject", within=["Time", "Metric"], correction="none")
    assert [t.details["term"] for t in terms] == list(R_TWO_WITHIN)
    gg = rm_anova(d, outcome="Performance", subject="Subject", within=["Time", "Metric"], correction="gg")
    for r, g, (term, (F, p, p_gg, e_gg, e_hf, w, p_w)) in zip(terms, gg, R_TWO_WITHIN.items()):
        assert r.statistic.value == pytest.approx(F, rel=1e-6) and r.p == pytest.approx(p, rel=1e-9)
        assert g.p == pytest.approx(p_gg, rel=1e-9)
        assert r.details["epsilon_gg"] == pytest.approx(e_gg, abs=5e-5) and r.details["epsilon_hf"] == pytest.approx(e_hf, abs=5e-5)
        assert r.details.get("mauchly_w") == (None if w is None else pytest.approx(w, rel=1e-9))
        assert r.details.get("mauchly_p") == (None if p_w is None else pytest.approx(p_w, rel=1e-9))
    # the interaction's corrected df as R's GG: 2 × 0.7272 and 18 × 0.7272
    assert gg[2].statistic.df == pytest.approx((2 * 0.727166420, 18 * 0.727166420), rel=1e-7)
    ref = pg.rm_anova(d, dv="Performance", within=["Time", "Metric"], subject="Subject")  # generalized η² as pingouin's ng2
    for r, (_, row) in zip(terms, ref.iterrows()):
        assert r.effects[1].name == "eta2_g" and r.effects[1].value == pytest.approx(float(row["ng2"]), rel=1e-9)
    # the auto rule per term: Metric (ε .97) Huynh–Feldt, the interaction (ε .73) Greenhouse–Geisser
    auto = rm_anova(d, outcome="Performance", subject="Subject", within=["Time", "Metric"])
    assert [t.details["correction"] for t in auto] == ["no sphericity correction", "Huynh–Feldt correction", "Greenhouse–Geisser correction"]
    text = render(auto[2], "sentence").plain()
    assert "F(1.45, 13.09) = 12.63" in text and "ε = .73" in text and "interaction" in text
    with pytest.raises(InputError, match="one row per person and cell"):
        rm_anova(pd.concat([d, d.iloc[:1]]), outcome="Performance", subject="Subject", within=["Time", "Metric"])
    with pytest.raises(InputError, match="long data"):
        rm_anova(d, outcome="Performance", subject="Subject", within=["Time", "Metric"], pairwise="holm")
    with pytest.raises(InputError, match="Performance: not numeric"):  # the column named, not a cell of the design
        rm_anova(d.assign(Performance="high"), outcome="Performance", subject="Subject", within=["Time", "Metric"])


# R (tests/r_reference.R, pingouin's mixed_anova): anova.mlm of each group's people (F, uncorrected p, HF-corrected p) and
# anova(lm(Scores ~ Group)) at each measurement (F, p)
R_SIMPLE_WITHIN = {"Control": (0.0825605883968686, 0.920863659100823, 0.9208636591008),
                   "Meditation": (6.93711353737643, 0.00198970815187459, 0.002101167297894)}
R_SIMPLE_BETWEEN = {"August": (0.0998698825735329, 0.753120305493897), "January": (2.05556791157307, 0.157019977775615),
                    "June": (7.53113069606599, 0.00805764069447003)}


def test_mixed_anova_simple_effects_equal_r():
    from statsetter.analyses import mixed_anova

    d = pg.read_dataset("mixed_anova")
    out = mixed_anova(d, "Scores", "Subject", "Time", "Group", correction="hf", simple="both")
    assert [r.kind for r in out] == ["anova_term"] * 3 + ["anova_rm"] * 2 + ["anova_oneway"] * 3
    for r, (group, (F, p, p_hf)) in zip(out[3:5], R_SIMPLE_WITHIN.items()):
        assert r.details["where"] == f"where Group is {group}" and r.n == 30
        assert r.statistic.value == pytest.approx(F, rel=1e-9) and r.p == pytest.approx(p_hf, rel=1e-9)
        assert r.details["p_uncorrected"] == pytest.approx(p, rel=1e-9)
    for r, (time, (F, p)) in zip(out[5:], R_SIMPLE_BETWEEN.items()):
        assert r.details["where"] == f"where Time is {time}" and r.statistic.df == (1, 58)
        assert r.statistic.value == pytest.approx(F, rel=1e-9) and r.p == pytest.approx(p, rel=1e-9)
    assert all("one of 5" in r.notes[-1].text and "not adjusted" in r.notes[-1].text for r in out[3:])
    assert not any("__" in n.text for r in out for n in r.notes)  # no internal column names in what users read
    text = render(out[6], "sentence").plain()
    assert text.startswith("A one-way analysis of variance of Scores across Group where Time is January gave F(1, 58) = 2.06, p = .157")
    assert len(mixed_anova(d, "Scores", "Subject", "Time", "Group", simple="within")) == 5
    with pytest.raises(InputError, match="simple"):
        mixed_anova(d, "Scores", "Subject", "Time", "Group", simple="all")


def test_the_audit_checks_sphericity_corrected_f():
    """Corrected df keep df₂/df₁ whole and, with ε printed, df/ε whole; η²p follows from F and the df ratio.
    Sources: R's anova.mlm output above (rm_anova2, the interaction: GG ε .7272, corrected p .001708, uncorrected p
    .000373); a question on stats.stackexchange.com (no. 89071, CC BY-SA) typing F(2, 10) = 12.534 corrected with
    ε = .638 as F(1.276, 6.380) and its partial η² as .71483974."""
    ok = [Unit("a", "With the Greenhouse–Geisser correction, F(1.45, 13.09) = 12.63, p = .002, ε = .73, η²p = .58."),
          Unit("b", "After the correction, F(1.276, 6.380) = 12.534, ε = .638, partial eta squared = .71.")]
    for e in audit_units(ok):
        assert not set(e.codes) - {"decimals"}, (e.found, e.codes)  # three-decimal F and ε are a style matter only
    uncorrected_p, wrong_df, wrong_eps, wrong_eta = audit_units([
        Unit("c", "With the Greenhouse–Geisser correction, F(1.45, 13.09) = 12.63, p < .001."),  # the uncorrected p beside corrected df
        Unit("d", "With the Greenhouse–Geisser correction, F(1.45, 15.09) = 12.63, p = .002."),  # df₂ mistyped: 15.09/1.45 is not whole
        Unit("e", "With the Greenhouse–Geisser correction, F(1.45, 13.09) = 12.63, p = .002, ε = .63."),
        Unit("f", "With the Greenhouse–Geisser correction, F(1.45, 13.09) = 12.63, p = .002, η²p = .30.")])
    assert "p-does-not-follow" in uncorrected_p.codes
    assert "corrected-df" in wrong_df.codes and "corrected-df" in wrong_eps.codes and "corrected-df" not in wrong_eta.codes
    assert "effect-does-not-fit" in wrong_eta.codes
    # Welch's F keeps a whole df₁: neither check applies
    (welch,) = audit_units([Unit("g", "Welch's test gave F(2, 71.35) = 3.20, p = .047.")])
    assert "corrected-df" not in welch.codes


def test_a_corrected_p_beside_the_uncorrected_df_is_a_warning_not_an_error():
    """Authors often print the uncorrected df with the Greenhouse–Geisser p: "F(3, 24) = 5.20, p = .017, ε = .69". The
    p does not follow from F(3, 24) (it gives .007) and had been an error with a changed verdict; it is the corrected
    test's, which the audit now says (a warning: give the corrected df). A p that no ε gives stays an error. Numbers:
    pingouin's rm_anova on its bundled rm_anova_wide data (F = 5.20, uncorrected p = .0066, GG p = .0167, ε = .694)."""
    table = pg.rm_anova(pg.read_dataset("rm_anova_wide"), correction=True)
    F, gg, eps = float(table["F"].iloc[0]), float(table["p_GG_corr"].iloc[0]), float(table["eps"].iloc[0])
    p_text, eps_text = f"{gg:.3f}".lstrip("0"), f"{eps:.2f}".lstrip("0")
    assert (p_text, eps_text) == (".017", ".69")
    (e,) = audit_units([Unit("a", f"The effect of time was reliable (Greenhouse–Geisser), F(3, 24) = {F:.2f}, p = {p_text}, ε = {eps_text}.")])
    assert e.codes == ["uncorrected-df"] and e.severity == "warning" and "ε from 0.685 to 0.695" in e.message
    (e,) = audit_units([Unit("b", f"With the Greenhouse–Geisser correction, F(3, 24) = {F:.2f}, p = {p_text}.")])
    assert e.codes == ["uncorrected-df"]
    (e,) = audit_units([Unit("c", f"With the Greenhouse–Geisser correction, F(3, 24) = {F:.2f}, p = .30.")])
    assert "p-does-not-follow" in e.codes and "uncorrected-df" not in e.codes
    (e,) = audit_units([Unit("d", f"F(3, 24) = {F:.2f}, p = {p_text}.")])  # no correction named: an error
    assert "p-does-not-follow" in e.codes


def test_mixed_anova_from_wide_data_equals_long():
    """Wide data as SPSS keeps it (a row per person, a column per measurement, a group column) give the same terms."""
    from statsetter.analyses import mixed_anova

    d = pg.read_dataset("mixed_anova")
    wide = d.pivot(index=["Subject", "Group"], columns="Time", values="Scores").reset_index()
    for long_term, wide_term in zip(mixed_anova(d, "Scores", "Subject", "Time", "Group", simple="both"),
                                    mixed_anova(wide, "Scores", within="Time", between="Group", columns=["August", "January", "June"], simple="both")):
        assert wide_term.statistic == long_term.statistic and wide_term.p == long_term.p
        assert render(wide_term, "sentence").plain() == render(long_term, "sentence").plain()
    with pytest.raises(InputError, match="not both"):
        mixed_anova(wide, "Scores", "Subject", between="Group", columns=["August", "January", "June"])
    with pytest.raises(InputError, match="between"):
        mixed_anova(wide, columns=["August", "January", "June"])
    # a missing measurement drops its person in both forms (the wide rows read as they stand, not melted and pivoted back)
    holed = wide.assign(June=wide["June"].mask(wide.index == 4))
    (long_group, *_), (wide_group, *_) = (mixed_anova(d[~((d["Subject"] == wide.loc[4, "Subject"]) & (d["Time"] == "June"))], "Scores", "Subject", "Time", "Group"),
                                          mixed_anova(holed, "Scores", within="Time", between="Group", columns=["August", "January", "June"]))
    assert wide_group.statistic == long_group.statistic and wide_group.n == long_group.n == len(wide) - 1
    with pytest.raises(InputError, match="June: 2 columns have this name"):
        mixed_anova(pd.concat([wide, wide[["June"]]], axis=1), between="Group", columns=["August", "January", "June"])


def test_source_tables_of_repeated_designs_have_an_error_row_per_stratum():
    """Each within term over its own error: R's summary(aov(Performance ~ Time*Metric + Error(Subject/(Time*Metric))))
    on rm_anova2 prints the residual SS 220.4 (Time), 455.8 (Metric) and 159.9 (Time:Metric) on 9, 18 and 18 df
    (tests/r_reference.R); the GG-corrected df of the interaction are those of R_TWO_WITHIN."""
    from statsetter import table
    from statsetter.analyses import mixed_anova, rm_anova
    from statsetter.export.text_tables import table_text

    d2 = pg.read_dataset("rm_anova2")
    text = table_text(table(rm_anova(d2, outcome="Performance", subject="Subject", within=["Time", "Metric"], correction="none"), "apa7"))
    rows = {line.split("  ")[0].strip(): line for line in text.splitlines() if line.startswith(("Time", "Metric", "Error"))}
    assert "220.35" in rows["Error (Time)"] and " 9 " in rows["Error (Time)"]
    assert "455.77" in rows["Error (Metric)"] and " 18 " in rows["Error (Metric)"]
    assert "159.90" in rows["Error (Time × Metric)"] and " 18 " in rows["Error (Time × Metric)"]
    corrected = table_text(table(rm_anova(d2, outcome="Performance", subject="Subject", within=["Time", "Metric"], correction="gg"), "apa7"))
    assert "13.09" in next(line for line in corrected.splitlines() if line.startswith("Error (Time × Metric)"))
    assert "Time × Metric: Greenhouse–Geisser correction, ε = .73 (df, MS and p corrected)" in " ".join(corrected.split())
    mixed = table_text(table(mixed_anova(pg.read_dataset("mixed_anova"), "Scores", "Subject", "Time", "Group", correction="none"), "apa7"))
    lines = [line.split("  ")[0].strip() for line in mixed.splitlines()]
    assert lines.index("Error (between subjects)") == lines.index("Group") + 1
    assert lines.index("Error (within subjects)") == lines.index("Group × Time") + 1 and "Total" not in lines
    between_error = next(line for line in mixed.splitlines() if line.startswith("Error (between"))
    assert " 58 " in between_error  # N − g: 60 people in 2 groups
