"""Post hoc comparisons and factorial ANOVA, against outside references.

Dataset: pingouin's bundled 'penguins'. References: scipy.stats.tukey_hsd,
pingouin.pairwise_gameshowell and pingouin.anova (two-way, Type II and III),
statsmodels' multipletests for Holm.
"""

import math

import numpy as np
import pingouin as pg
import pytest
from scipy import stats
from statsmodels.stats.multitest import multipletests

from statsetter import InputError, render
from statsetter.errors import FormerUse
from statsetter.analyses import factorial_anova, posthoc

REL = 1e-10


@pytest.fixture(scope="module")
def penguins():
    return pg.read_dataset("penguins")


def samples(df):
    d = df.dropna(subset=["bill_length_mm"])
    return [d.bill_length_mm[d.species == s].to_numpy() for s in ("Adelie", "Chinstrap", "Gentoo")]


def test_tukey(penguins):
    rs = posthoc(penguins, "bill_length_mm", "species", adjust="tukey")
    ref = stats.tukey_hsd(*samples(penguins))
    ci = ref.confidence_interval()
    for r, (i, j) in zip(rs, [(0, 1), (0, 2), (1, 2)]):
        assert r.estimate.value == pytest.approx(ref.statistic[i, j], rel=REL)
        if ref.pvalue[i, j] > 1e-10:  # scipy's nested quadrature is exact to about 1e-11 absolute
            assert r.p == pytest.approx(ref.pvalue[i, j], rel=REL)
        else:  # scipy prints 0; at 20 digits (mpmath 1.4.1, tests/mp_reference.py; its error estimate 5e-5 relative)
            assert r.p == pytest.approx({(0, 1): 1.26985830911679e-71, (0, 2): 1.59920408851874e-75}[(i, j)], rel=1e-4, abs=0)
        assert (r.estimate.ci.low, r.estimate.ci.high) == pytest.approx((ci.low[i, j], ci.high[i, j]), rel=REL)
    assert "Tukey HSD" in render(rs[0], "sentence").plain()


def test_games_howell_against_pingouin(penguins):
    rs = posthoc(penguins, "bill_length_mm", "species", adjust="games-howell")
    ref = pg.pairwise_gameshowell(penguins, dv="bill_length_mm", between="species")
    for r, (_, row) in zip(rs, ref.iterrows()):
        assert r.estimate.value == pytest.approx(row["diff"], rel=REL)
        assert r.p == pytest.approx(row["pval"], rel=1e-6, abs=1e-12)


def test_holm_against_multipletests(penguins):
    rs = posthoc(penguins, "bill_length_mm", "species", adjust="holm")
    s = samples(penguins)
    raw = [stats.ttest_ind(s[i], s[j]).pvalue for i, j in [(0, 1), (0, 2), (1, 2)]]
    adjusted = multipletests(raw, method="holm")[1]
    assert [r.p for r in rs] == pytest.approx(list(adjusted), rel=REL)
    assert "Holm-adjusted" in rs[0].notes[0].text


@pytest.mark.parametrize("ss_type", [2, 3])
def test_factorial_against_pingouin(penguins, ss_type):
    rs = factorial_anova(penguins, "body_mass_g", ("species", "sex"), ss_type=ss_type)
    ref = pg.anova(penguins.dropna(subset=["sex"]), dv="body_mass_g", between=["species", "sex"], ss_type=ss_type)
    for r, (_, row) in zip(rs, ref.iloc[:3].iterrows()):
        assert r.statistic.value == pytest.approx(row["F"], rel=1e-9)
        assert r.p == pytest.approx(row["p_unc"], rel=1e-8)
        assert r.effects[0].value == pytest.approx(row["np2"], rel=1e-9)
        assert r.details["ss_type"] == ss_type
    assert "Type II" in render(rs[0], "sentence").plain() or ss_type == 3


def test_unequal_and_tiny_cells_are_said(penguins):
    """With unequal cells the Type II and Type III tests of a main effect can differ (penguins, species × sex: cells of
    34 to 73; pingouin's anova gives both), which the records say; pingouin's anova2_unbalanced (Diet × Exercise, cells
    of 4, 1, 1 and 4 cases) also has cells of a single case and small cells (a caution: unstable means, and counts
    that can identify people). pingouin's balanced anova2 (4 cases in each of 6 cells) has no unequal-cells note, and
    its small cells are still said."""
    two, three = (factorial_anova(penguins, "body_mass_g", ("species", "sex"), ss_type=t) for t in (2, 3))
    assert abs(two[0].statistic.value - three[0].statistic.value) > 1  # species: the two types differ here
    assert any(n.text.startswith("Cell sizes are unequal (34 to 73 cases") for n in two[0].notes)
    assert not [n for n in two[0].notes if n.kind == "caution"]
    data = pg.read_dataset("anova2_unbalanced")
    two, three = (factorial_anova(data, "Scores", ("Diet", "Exercise"), ss_type=t) for t in (2, 3))
    for t, rs in ((2, two), (3, three)):
        ref = pg.anova(data, dv="Scores", between=["Diet", "Exercise"], ss_type=t)
        assert [r.statistic.value for r in rs] == pytest.approx(list(ref["F"].iloc[:3]), rel=1e-9)
    notes = {n.kind: n.text for n in two[0].notes if n.kind in ("assumption", "caution")}
    texts = [n.text for n in two[0].notes]
    assert any(t.startswith("Cell sizes are unequal (1 to 4 cases") and "Type II was used; Type III" in t for t in texts)
    assert any(t.startswith("2 cell(s) hold a single case (High × Moderate, Low × High)") for t in texts)
    assert notes["caution"].startswith("4 of 4 cells have fewer than 5 cases (High × Moderate 1, Low × High 1, ")
    assert any("Type III was used; Type II" in n.text for n in three[0].notes)
    balanced = factorial_anova(pg.read_dataset("anova2"), "Yield", ("Blend", "Crop"))
    kinds = [n.text.split(" (")[0] for n in balanced[0].notes if n.kind in ("assumption", "caution")]
    assert kinds == ["6 of 6 cells have fewer than 5 cases"]


def test_bad_input(penguins):
    with pytest.raises(InputError, match="posthoc: adjust must be one of 'tukey', 'games-howell', 'holm', 'bonferroni' \\(got str 'scheffe'\\)"):
        posthoc(penguins, "bill_length_mm", "species", adjust="scheffe")  # type: ignore[arg-type]
    with pytest.warns(FormerUse, match="adjust="), pytest.raises(InputError, match="posthoc: adjust must be one of .* \\(got str 'scheffe'\\)"):
        posthoc(penguins, "bill_length_mm", "species", "scheffe")  # the former fourth positional argument
    with pytest.raises(InputError, match="one level"):
        factorial_anova(penguins.assign(one="x"), "body_mass_g", ("species", "one"))


def test_groups_without_variance_are_named_not_a_crash(penguins):
    """Penguin species whose bill lengths are made constant (the kind of column a coding error leaves): Games–Howell
    names the two groups without variance, Tukey says no group varies — an InputError (exit 2), not a division by zero
    or a NaN p the record refuses."""
    flat = penguins.dropna(subset=["bill_length_mm"]).copy()
    for species, value in (("Adelie", 38.0), ("Chinstrap", 48.0)):
        flat.loc[flat.species == species, "bill_length_mm"] = value
    with pytest.raises(InputError, match="bill_length_mm: zero variance in groups Adelie and Chinstrap"):
        posthoc(flat, "bill_length_mm", "species", adjust="games-howell")
    flat.loc[flat.species == "Gentoo", "bill_length_mm"] = 47.0
    with pytest.raises(InputError, match="bill_length_mm: zero variance within every group"):
        posthoc(flat, "bill_length_mm", "species", adjust="tukey")
    rs = posthoc(flat.assign(bill_length_mm=penguins.bill_length_mm), "bill_length_mm", "species", adjust="tukey")
    assert len(rs) == 3


@pytest.mark.parametrize("df", [5.0, 500.0, math.inf])
def test_studentized_range_at_the_ends(df):
    """P(Q > q) is 1 for q <= 0 (a range is never negative), 0 for q = inf, NaN for NaN — alone or among other q."""
    from statsetter.formulas import studentized_range_sf

    p = studentized_range_sf(np.array([-1.0, 0.0, math.inf, math.nan, 3.0]), 4, df)
    assert p[:3].tolist() == [1.0, 1.0, 0.0] and math.isnan(p[3]) and 0 < p[4] < 1


def test_anova_table_against_statsmodels(penguins):
    # every cell of the ANOVA table is statsmodels' anova_lm (Type II) number put through the
    # style's engine: df, F, p and partial η² = SS / (SS + SS_error); an Error row with its df
    import statsmodels.api as sm
    import statsmodels.formula.api as smf

    from statsetter import load_style
    from statsetter.rendering.anova_tables import anova_table
    from statsetter.style import numbers_for

    num = numbers_for(load_style("apa7"))
    terms = factorial_anova(penguins, "body_mass_g", ["species", "sex"], ss_type=2)
    data = penguins.dropna(subset=["body_mass_g", "species", "sex"])
    ref = sm.stats.anova_lm(smf.ols("body_mass_g ~ C(species) * C(sex)", data=data).fit(), typ=2)
    table = anova_table(terms, "apa7")
    assert [c.head.text for c in table.columns] == ["SS", "df", "MS", "F", "p", "η2p", "95% CI"]
    rows = {r.stub.text: [c.text for c in r.cells] for r in table.rows}
    for term, key in (("species", "C(species)"), ("sex", "C(sex)"), ("species × sex", "C(species):C(sex)")):
        label = term[:1].upper() + term[1:]  # stubs in sentence case (APA 7 §7.12, memory)
        ss_cell, df, ms, f, p, eta, ci = rows[label]
        ss = ref.loc[key, "sum_sq"]
        assert ss_cell == num.number(ss, "SS") and ms == num.number(ss / ref.loc[key, "df"], "SS")
        assert df == num.df(ref.loc[key, "df"]) and f == num.number(ref.loc[key, "F"], "F")
        assert p == "< .001" or p == num.p(ref.loc[key, "PR(>F)"])[1]
        assert eta == num.number(ss / (ss + ref.loc["Residual", "sum_sq"]), "eta2_p")
        assert ci.startswith("[") and ci.endswith("]")
    error = ref.loc["Residual"]
    assert rows["Error"][:3] == [num.number(error["sum_sq"], "SS"), num.df(error["df"]), num.number(error["sum_sq"] / error["df"], "SS")]
    # the corrected total: Σ(y − ȳ)² on N − 1 df; Type II rows of an unbalanced design do not add up to it, and the note says so
    total = ((data.body_mass_g - data.body_mass_g.mean()) ** 2).sum()
    assert rows["Total"][:2] == [num.number(total, "SS"), num.df(len(data) - 1)]
    assert "do not add up to the total" in table.general_note.text
    # one-way (R's PlantGrowth, anova(lm(weight ~ group)): SS 3.76634 and 10.49209 on 2 and 27 df): rows that add up, no such note
    from open_data import PLANTS

    from statsetter.analyses import anova_oneway

    oneway = anova_table([anova_oneway(PLANTS, "weight", "group").main], "apa7")
    rows = {r.stub.text: [c.text for c in r.cells] for r in oneway.rows}
    assert rows["Group"][:3] == ["3.77", "2", "1.88"] and rows["Error"][:3] == ["10.49", "27", "0.39"] and rows["Total"][:2] == ["14.26", "29"]
    assert "add up" not in oneway.general_note.text and [c.head.text for c in oneway.columns][-2:] == ["η2", "95% CI"]
    welch = anova_table([anova_oneway(PLANTS, "weight", "group", variant="welch").main], "apa7")
    assert [c.head.text for c in welch.columns] == ["F", "df1", "df2", "p", "η2", "95% CI"] and "Error" not in [r.stub.text for r in welch.rows]
    with pytest.raises(InputError, match="one factorial ANOVA"):
        anova_table([], "apa7")


def test_tukey_equals_r_on_plantgrowth():
    """R 4.x, run here: TukeyHSD(aov(weight ~ group, data = PlantGrowth)) printed with 15 digits (the values below)."""
    from open_data import PLANTS

    r = {("ctrl", "trt1"): (-0.371, -1.062216051410459, 0.320216051410458, 0.3908711442021247),
         ("ctrl", "trt2"): (0.494, -0.197216051410459, 1.185216051410458, 0.1979959912997082),
         ("trt1", "trt2"): (0.865, 0.173783948589542, 1.556216051410459, 0.0120064239794527)}
    for rec in posthoc(PLANTS, "weight", "group", adjust="tukey"):
        a, b = (g.label for g in rec.groups)
        sign = 1
        if (a, b) not in r:
            a, b, sign = b, a, -1
        diff, low, high, p = r[(a, b)]
        # R reports later − earlier; ours is first − second in sorted order
        assert -sign * rec.estimate.value == pytest.approx(diff, abs=1e-12)
        assert sorted((-sign * rec.estimate.ci.low, -sign * rec.estimate.ci.high)) == pytest.approx([low, high], abs=1e-6)
        assert rec.p == pytest.approx(p, abs=1e-6)


# R 4.x, run here: ptukey(q, k, df) at the quantiles statsetter computed (q printed with 15 digits), df >= 5.
# (p, k, df, q, R's ptukey(q, k, df))
R_PTUKEY = [
    (0.9, 2, 5, 2.8497087384054, 0.899999999999898),
    (0.9, 2, 27, 2.40881362057359, 0.900000000000003),
    (0.9, 2, 120, 2.34427238354806, 0.899999999999968),
    (0.9, 2, 1000, 2.32833125220988, 0.89999999999985),
    (0.9, 3, 5, 3.71711144962384, 0.900000014805191),
    (0.9, 3, 27, 3.03045529046741, 0.899999999999544),
    (0.9, 3, 120, 2.93040903596562, 0.89999999999938),
    (0.9, 3, 1000, 2.9057201134608, 0.899999999999924),
    (0.9, 5, 5, 4.66382705413218, 0.899999998435082),
    (0.9, 5, 27, 3.66734078961012, 0.899999999989913),
    (0.9, 5, 120, 3.51978805165762, 0.899999999984823),
    (0.9, 5, 1000, 3.48323076512863, 0.899999999984272),
    (0.9, 10, 5, 5.81590308097636, 0.900000000140222),
    (0.9, 10, 27, 4.40906241975029, 0.900000000065816),
    (0.9, 10, 120, 4.19140213826108, 0.899999999913236),
    (0.9, 10, 1000, 4.13676861720262, 0.899999999910235),
    (0.95, 2, 5, 3.63535169514679, 0.9499999999999),
    (0.95, 2, 27, 2.90172654409735, 0.949999999999984),
    (0.95, 2, 120, 2.80004443142232, 0.949999999999952),
    (0.95, 2, 1000, 2.77516654208132, 0.949999999999842),
    (0.95, 3, 5, 4.60172605436255, 0.950000023023448),
    (0.95, 3, 27, 3.50642612335415, 0.949999999999717),
    (0.95, 3, 120, 3.35613839615063, 0.94999999999925),
    (0.95, 3, 1000, 3.3194448973252, 0.949999999999406),
    (0.95, 5, 5, 5.67312443546392, 0.949999996370209),
    (0.95, 5, 27, 4.13046831747099, 0.949999999995397),
    (0.95, 5, 120, 3.91693769080612, 0.9499999999975),
    (0.95, 5, 1000, 3.86470693294854, 0.949999999999044),
    (0.95, 10, 5, 6.99469776788819, 0.949999999721745),
    (0.95, 10, 27, 4.86444872240943, 0.950000000008437),
    (0.95, 10, 120, 4.55953799405391, 0.949999999988763),
    (0.95, 10, 1000, 4.48430226490655, 0.950000000011431),
    (0.99, 2, 5, 5.70231129277127, 0.989999999999911),
    (0.99, 2, 27, 3.91833741499796, 0.990000000000006),
    (0.99, 2, 120, 3.7015924818517, 0.989999999999942),
    (0.99, 2, 1000, 3.64973829517081, 0.989999999999814),
    (0.99, 3, 5, 6.97573663124936, 0.990000055998192),
    (0.99, 3, 27, 4.49484224552643, 0.990000000000042),
    (0.99, 3, 120, 4.19994400461497, 0.989999999999969),
    (0.99, 3, 1000, 4.12972504564131, 0.990000000000188),
    (0.99, 5, 5, 8.42149057774764, 0.989999977256869),
    (0.99, 5, 27, 5.10079038854399, 0.990000000000074),
    (0.99, 5, 120, 4.70850021371911, 0.99000000000008),
    (0.99, 5, 1000, 4.61531592175285, 0.989999999999933),
    (0.99, 10, 5, 10.2392560285103, 0.989999890779961),
    (0.99, 10, 27, 5.82782110558935, 0.990000000000299),
    (0.99, 10, 120, 5.29921394494327, 0.990000000000543),
    (0.99, 10, 1000, 5.17349230259806, 0.99000000000003),
]


@pytest.mark.parametrize("p, k, df, q, r", R_PTUKEY)
def test_studentized_range_quantile_against_r(p, k, df, q, r):
    """Tukey's critical q: R's ptukey at our quantile gives back the level to 1e-6 (df >= 5; at df = 2 R's own
    ptukey drifts by about 1e-3 — the k = 2 test below shows ours is the right one there)."""
    from statsetter.formulas import studentized_range_quantile

    from statsetter.formulas import studentized_range_sf

    assert studentized_range_quantile(p, k, df) == pytest.approx(q, rel=1e-9)
    assert r == pytest.approx(p, abs=1e-6)
    assert 1 - studentized_range_sf(q, k, df)[0] == pytest.approx(r, abs=2e-7)  # R's ptukey at the same q, to R's own accuracy


@pytest.mark.parametrize("df", [2, 3, 5, 27, 1000, 1e6, 1e9, 1e13, 1e300])
@pytest.mark.parametrize("p", [0.9, 0.95, 0.99])
def test_studentized_range_quantile_of_two_means_is_a_t_quantile(p, df):
    """For two means the studentized range is sqrt(2)·|t| (definition): q = sqrt(2)·t_{(1+p)/2}(df), scipy's t."""
    from statsetter.formulas import studentized_range_quantile

    assert studentized_range_quantile(p, 2, df) == pytest.approx(math.sqrt(2) * stats.t.ppf((1 + p) / 2, df), rel=1e-9)


@pytest.mark.parametrize("df", [1, 1.5, 2, 3, 5, 10, 27, 120, 1000, 1e5, 1e7, 1e10, 1e13, 1e16, 1e300])
def test_studentized_range_of_two_means_is_a_t_tail(df):
    """For two means the studentized range is √2·|t| (definition), so P(Q > q) = 2·P(t > q/√2), scipy's t, to 1e-9
    relative from p near 1 down to p = 1e-280 — a check of both integrals, their tails included."""
    from statsetter.formulas import studentized_range_sf

    qs = np.array([0.1, 0.5, 1, 2, 3, 4, 5, 6, 8, 12, 20, 30, 40])
    exact = 2 * stats.t.sf(qs / math.sqrt(2), df)
    keep = exact > 1e-280
    assert studentized_range_sf(qs[keep], 2, df) == pytest.approx(exact[keep], rel=1e-9, abs=0)


@pytest.mark.parametrize("df", [1, 1.5, 2, 3, 3.1, 3.3, 4.2, 5, 5.5, 8, 12, 19, 24, 40, 100, 1000])
def test_studentized_range_far_tail_of_two_means(df):
    """The same definition (P(Q > q) = 2·P(t > q/√2), scipy's t) out to q = 1000, where the integrand's mass lies near
    s = 0, below the grid's bulk: to 1e-11 relative (a grid that stopped at a quarter of the mass's peak lost up to
    1e-8 of p on 12-19 df; one dense only up to 4/q lost 4e-3 of p = .003 on 1 df; equal panels near s = 0 on a
    fractional df between 3 and 5 lost 2e-10)."""
    from statsetter.formulas import studentized_range_sf

    qs = np.array([0.5, 2, 4, 6.18, 10, 20, 40, 60, 100, 200, 300, 1000.0])
    exact = 2 * stats.t.sf(qs / math.sqrt(2), df)
    keep = exact > 1e-280
    assert studentized_range_sf(qs[keep], 2, df) == pytest.approx(exact[keep], rel=1e-11, abs=0)
    assert [studentized_range_sf(q, 2, df)[0] for q in qs[keep]] == pytest.approx(exact[keep], rel=1e-11, abs=0)  # each alone


@pytest.mark.parametrize("k", [5, 20, 100])
@pytest.mark.parametrize("df", [5, 19, 150])
def test_studentized_range_p_does_not_depend_on_the_other_pairs(k, df):
    """Tukey's p values come from one call for all pairs: each q's p is the one it has alone, whatever the other q's
    (one grid made for the largest q lost up to 2e-7 of the others' p on 5 df)."""
    from statsetter.formulas import studentized_range_sf

    qs = np.array([3.0, 6.0, 10.0, 20.0])
    alone = np.array([studentized_range_sf(q, k, df)[0] for q in qs])
    assert studentized_range_sf(np.append(qs, 120.0), k, df)[:4] == pytest.approx(alone, rel=1e-13, abs=0)


@pytest.mark.parametrize("k", [3, 5, 10, 20])
@pytest.mark.parametrize("df", [2, 5, 27, 120, 1000])
def test_studentized_range_against_scipy(k, df):
    """scipy's studentized_range (nested adaptive quadrature, exact to about 1e-11 absolute): the same p where it is
    above 1e-6 (below that scipy's relative error grows)."""
    from statsetter.formulas import studentized_range_sf

    qs = np.array([0.5, 1, 2, 3, 4, 5, 6, 8])
    ref = stats.studentized_range.sf(qs, k, df)
    keep = ref > 1e-6
    assert studentized_range_sf(qs[keep], k, df) == pytest.approx(ref[keep], rel=1e-8, abs=1e-11)

# R 4.x (Rscript here): x <- airquality$Ozone; g <- factor(airquality$Month)
# p <- pairwise.t.test(x, g, p.adjust.method = "none")$p.value, its lower triangle without NA, then p.adjust(p, m)
# for m in holm, bonferroni, BH (options(digits = 17)); the command is in tests/r_reference.R
_AIRQUALITY_P = [6.0876578934735015e-01, 2.9311512492369273e-05, 1.9490607128185093e-05, 3.2545307134041479e-01, 1.0225482708500681e-02,
                 8.3122218756216271e-03, 8.5838329756014076e-01, 9.1743634282276665e-01, 6.9697116338660460e-04, 4.8476354515018507e-04]
_R_ADJUSTED = {
    "holm": [1, 0.00026380361243132344, 0.00019490607128185093, 1, 0.05112741354250340681, 0.04987333125372976628, 1, 1,
             0.00487879814370623197, 0.00387810836120148052],
    "bonferroni": [1, 0.00029311512492369274, 0.00019490607128185093, 1, 0.10225482708500681361, 0.08312221875621626788, 1, 1,
                   0.00696971163386604642, 0.00484763545150185098],
    "fdr_bh": [0.76095723668418768781, 0.00014655756246184637, 0.00014655756246184637, 0.46493295905773540655, 0.01704247118083446894,
               0.01662444375124325427, 0.91743634282276664837, 0.91743634282276664837, 0.00174242790846651160, 0.00161587848383395018],
}


@pytest.mark.parametrize("method", sorted(_R_ADJUSTED))
def test_adjusted_p_equals_r_and_statsmodels(method, monkeypatch):
    """The adjustment computed here (statsmodels' Holm runs a full garbage collection on every call) equals R's p.adjust
    on R's own example data to the last bit, and statsmodels' multipletests on 600 vectors with ties, ones and zeros
    (its garbage collections skipped here: they change no number and cost 85 s in a test process with pandas loaded)."""
    import gc

    from statsetter.formulas import adjusted_p

    monkeypatch.setattr(gc, "collect", lambda *args: 0)

    assert adjusted_p(_AIRQUALITY_P, method).tolist() == pytest.approx(_R_ADJUSTED[method], rel=1e-15, abs=0)
    rng = np.random.default_rng(5)
    for _ in range(600):
        p = rng.random(int(rng.integers(1, 40))) ** rng.uniform(0.3, 4)
        p[rng.random(len(p)) < 0.2] = rng.choice([0.0, 1.0, 0.05])
        assert adjusted_p(p, method) == pytest.approx(multipletests(p, method=method)[1], rel=1e-15, abs=1e-300)
    with pytest.raises(InputError, match="adjust"):
        adjusted_p(_AIRQUALITY_P, "hommel")


@pytest.mark.parametrize("k, df", [(3, 3), (4, 10), (3, 150), (10, 27), (6, 1000), (20, 1e5)])
def test_held_grid_follows_the_exact_cdf_near_its_q(k, df):
    """The CDF on the s-grid of one q held (the quantile's inner search) is the exact CDF at that q (the same terms)
    and stays within 1e-9 of it half a per cent away — where the search goes after the first step (derivation:
    the same quadrature of a density moved by q/q0)."""
    from statsetter.formulas import _held_gap, studentized_range_sf

    q0 = 3.5 + k / 10
    held, here = _held_gap(0.95, k, df, q0)
    assert held(q0) == pytest.approx(here, abs=1e-15)
    assert here == pytest.approx(0.05 - studentized_range_sf(q0, k, df)[0], abs=1e-15)
    for q in (q0 * 0.995, q0 * 1.005):
        assert held(q) == pytest.approx(0.05 - studentized_range_sf(q, k, df)[0], abs=1e-9)


def test_studentized_range_quantile_is_the_exact_root_in_two_or_three_evaluations(monkeypatch):
    """Over k from 2 to 100, df from 1 to 10⁶ and levels .90 to .999: the quantile is where the exact CDF meets the
    level (to 2e-13, or within 2e-12 relative of q where a step that small moves the CDF less than its own accuracy),
    and on finite df it takes two or three exact evaluations of the CDF in all but a few cases (the secant method
    from the start alone took six or seven: measured when the held grid came in)."""
    import statsetter.formulas as f

    calls = []
    exact = f._range_sf
    monkeypatch.setattr(f, "_range_sf", lambda *a: calls.append(a) or exact(*a))
    counts = []
    for level in (0.9, 0.95, 0.99, 0.999):
        for k in (2, 3, 4, 6, 10, 20, 50, 100):
            for df in (1, 2, 4.5, 10, 30, 144.6, 1000, 1e5, 1e6):
                calls.clear()
                q = f.studentized_range_quantile.__wrapped__(level, k, df)
                counts.append(len(calls))
                gap = 1 - exact(q, k, df) - level
                if abs(gap) >= 2e-13:  # then a step of 2e-12·q must cross the level
                    lo, hi = 1 - exact(q * (1 - 2e-12), k, df) - level, 1 - exact(q * (1 + 2e-12), k, df) - level
                    assert lo <= 0 <= hi, (level, k, df, q, gap)
    assert sum(c <= 3 for c in counts) >= 0.95 * len(counts) and max(counts) <= 12, counts


@pytest.mark.parametrize("df", [50, 1e3, 1e5, 1e6, 1e7, 1e8])
def test_studentized_range_on_many_df_keeps_its_digits(df):
    """On many error df the density of s = √(χ²/df) is written so that no terms of size df cancel: for two means
    P(Q > q) = 2·P(t > q/√2) (definition; scipy's t) to 1e-12 relative up to 10⁸ df — before, the large terms'
    cancellation had cost 2e-10 at 10⁶ df and 1e-8 at 10⁷ (measured when the form changed)."""
    from statsetter.formulas import studentized_range_sf

    qs = np.array([0.5, 2, 3, 4, 6, 8])
    assert studentized_range_sf(qs, 2, df) == pytest.approx(2 * stats.t.sf(qs / math.sqrt(2), df), rel=1e-12, abs=0)


def test_a_two_way_design_with_empty_cells_is_refused_by_its_cells(penguins):
    """Chinstraps were measured on Dream only and Gentoos on Biscoe only (Gorman et al.'s penguins; pandas' crosstab
    below): species × island has four empty cells, where the interaction's terms cannot be estimated. statsmodels fits
    such a design with a warning and prints sums of squares for it — on five penguins (sex × species, two cells empty)
    it gave the interaction F(2, 1) = 0.06 and species an SS above the total SS; on species × island its Fs were nan.
    Now the empty cells are named; a collinear covariate in an ANCOVA is refused by the design's rank."""
    import pandas as pd

    from statsetter.analyses import ancova

    crosstab = pd.crosstab(penguins.species, penguins.island)
    empty = sorted(f"{s} × {i}" for s in crosstab.index for i in crosstab.columns if crosstab.loc[s, i] == 0)
    assert empty == ["Chinstrap × Biscoe", "Chinstrap × Torgersen", "Gentoo × Dream", "Gentoo × Torgersen"]
    with pytest.raises(InputError) as caught:
        factorial_anova(penguins, "body_mass_g", ["species", "island"])
    assert all(cell in str(caught.value) for cell in empty) and "4 of 9 cells empty" in str(caught.value)
    five = penguins.sample(5, random_state=3)
    assert pd.crosstab(five.sex, five.species).to_numpy().min() == 0
    with pytest.raises(InputError, match=r"sex × species: no case in female × Adelie, female × Chinstrap \(2 of 6 cells empty\)"):
        factorial_anova(five, "body_mass_g", ["sex", "species"])
    with pytest.raises(InputError, match="its 5 coefficients have rank 4: a term repeats others"):
        ancova(penguins.assign(flipper_cm=penguins.flipper_length_mm / 10), "body_mass_g", "species", ["flipper_length_mm", "flipper_cm"])
