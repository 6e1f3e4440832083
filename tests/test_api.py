"""The public API: one shape for every analysis, one keyword per choice,
functions named as the trade names the tests, long data for paired designs,
ids that say what a record is. Reference values come from R 4.x run on its
bundled data (``datasets::sleep``, Cushny & Peebles, 1905; the TeaTasting
table of ``?fisher.test``), printed with 15 digits by Rscript on this
machine; numbers are also compared with scipy directly."""

from __future__ import annotations

import math

import pandas as pd
import pytest
from scipy import stats

from statsetter import CorrelationMatrix, Description, Result, render, table
from statsetter.analyses import (
    chi_square, correlate, correlation_matrix, cronbach_alpha, describe, fisher_exact, kendall, linear_regression, mann_whitney,
    pearson, spearman, t_independent, t_one_sample, t_paired, wilcoxon_signed_rank,
)
from statsetter.errors import FormerUse, InputError
from statsetter.records import Records, dump_records, load_records, name_records

import pingouin as pg
from open_data import SLEEP_LONG as SLEEP  # R's datasets::sleep in long form


@pytest.fixture(scope="module")
def penguins():
    return pg.read_dataset("penguins")


def test_every_analysis_returns_records_with_the_main_one_first(penguins):
    # one shape everywhere: a list of records (Records), the main result first
    calls = {
        "t": t_independent(penguins, "body_mass_g", "sex"),
        "chi": chi_square(penguins, "sex", "island"),
        "lm": linear_regression(penguins, "body_mass_g", ["flipper_length_mm", "bill_length_mm"]),
        "alpha": cronbach_alpha(penguins, ["bill_length_mm", "bill_depth_mm", "flipper_length_mm"]),
        "desc": describe(penguins, ["body_mass_g", "island"], group="sex"),
        "matrix": correlation_matrix(penguins, ["bill_length_mm", "bill_depth_mm", "body_mass_g"]),
    }
    for name, out in calls.items():
        assert isinstance(out, Records) and isinstance(out, list) and len(out) >= 1, name
        assert out.main is out[0]
    assert calls["t"].main.kind == "t_independent" and len(calls["t"]) == 1
    assert calls["lm"].main.kind == "linear_model" and {r.kind for r in calls["lm"][1:]} == {"linear_coefficient"}
    assert isinstance(calls["desc"].main, Description) and len(calls["desc"]) == 1
    matrix = calls["matrix"]
    assert isinstance(matrix.main, CorrelationMatrix) and len(matrix) == 1 + 3  # the matrix, then its three pairs
    assert [r.kind for r in matrix[1:]] == ["pearson"] * 3


def test_the_trades_names_are_the_functions_and_the_plan_kinds(penguins):
    # pearson, spearman, kendall are functions of those names (as the plan's kinds); correlate takes coefficient=
    for fn, name in ((pearson, "pearson"), (spearman, "spearman"), (kendall, "kendall")):
        own = fn(penguins, "bill_length_mm", "body_mass_g").main
        generic = correlate(penguins, "bill_length_mm", "body_mass_g", coefficient=name).main
        assert own.kind == name and own.statistic.value == generic.statistic.value and own.p == generic.p
    clean = penguins.dropna(subset=["bill_length_mm", "body_mass_g"])
    assert spearman(penguins, "bill_length_mm", "body_mass_g").main.p == pytest.approx(
        stats.spearmanr(clean.bill_length_mm, clean.body_mass_g).pvalue, rel=1e-12)


def test_fisher_exact_against_r_tea_tasting():
    # R: fisher.test(matrix(c(3, 1, 1, 3), 2)) and alternative = "greater" (the TeaTasting example of ?fisher.test).
    # fisher.test solves for the odds ratio and its limits with uniroot at its default tolerance (eps^0.25), printing
    # 6.408309 and [0.2117329, 621.9338]; its own equations (dnhyper, pnhyper, as in its source) solved with
    # uniroot(tol = 1e-14) give the values below, which scipy's conditional odds ratio matches.
    cups = pd.DataFrame({"truth": ["milk"] * 4 + ["tea"] * 4, "guess": ["milk"] * 3 + ["tea"] + ["milk"] + ["tea"] * 3})
    two = fisher_exact(cups, "truth", "guess").main
    assert two.kind == "fisher_exact" and two.p == pytest.approx(0.485714285714286, rel=1e-12)
    assert two.estimate.value == pytest.approx(6.40831965819967, rel=1e-9)
    assert (two.estimate.ci.low, two.estimate.ci.high) == pytest.approx((0.211735595446578, 626.243530588814), rel=1e-9)
    assert two.estimate.value == pytest.approx(6.408309, rel=1e-5) and two.estimate.ci.high == pytest.approx(621.9338, rel=1e-2)  # as printed
    greater = fisher_exact(cups, "truth", "guess", alternative="greater").main
    assert greater.p == pytest.approx(0.242857142857143, rel=1e-12) and greater.alternative == "greater"
    # R's one-sided interval is [0.3136, Inf]: no finite upper limit, so no CI, and the note says why
    assert greater.estimate.ci is None and "0.3136" in greater.notes[0].text
    # the same record as the one chi_square adds for a 2 x 2 table
    assert chi_square(cups, "truth", "guess")[1].p == two.p
    with pytest.raises(InputError, match="needs 2 × 2"):
        fisher_exact(cups.assign(guess=["a", "b", "c", "a", "b", "c", "a", "b"]), "truth", "guess")


def test_paired_tests_take_long_data_like_r_sleep():
    # R: t.test(extra[group == 1], extra[group == 2], paired = TRUE) on datasets::sleep
    long = t_paired(SLEEP, outcome="extra", subject="ID", within="group").main
    assert long.statistic.value == pytest.approx(-4.06212768338204, rel=1e-12)
    assert long.p == pytest.approx(0.00283289019738427, rel=1e-10)
    assert (long.estimate.ci.low, long.estimate.ci.high) == pytest.approx((-2.459885763276982, -0.700114236723018), rel=1e-12)
    wide = pd.DataFrame({"one": SLEEP.extra[:10].to_numpy(), "two": SLEEP.extra[10:].to_numpy()})
    assert t_paired(wide, "one", "two").main.statistic.value == long.statistic.value
    # conditions coded by number are named with their variable, never as a bare code
    sentence = render(long, "sentence").plain()
    assert sentence.startswith("Extra was lower in group 1 (M = 0.75, SD = 1.79) than in group 2 (M = 2.33, SD = 2.00) in 10 pairs")
    named = t_paired(SLEEP.assign(group=SLEEP.group.map({"1": "hyoscyamine", "2": "hyoscine"})), outcome="extra", subject="ID",
                     within="group", conditions=["hyoscyamine", "hyoscine"]).main
    assert render(named, "sentence").plain().startswith("Extra was lower in hyoscyamine (M = 0.75")
    # R: wilcox.test(..., paired = TRUE, exact = FALSE, correct = FALSE): V = 0, p = 0.00763244164820552 (one zero difference dropped)
    w = wilcoxon_signed_rank(SLEEP, outcome="extra", subject="ID", within="group").main
    assert w.p == pytest.approx(0.00763244164820552, rel=1e-9) and w.details["W_plus"] == 0


def test_long_data_errors_name_the_problem():
    with pytest.raises(InputError, match="subject 3 has more than one row in condition 1"):
        t_paired(pd.concat([SLEEP, SLEEP.iloc[[2]]]), outcome="extra", subject="ID", within="group")
    three = pd.concat([SLEEP, SLEEP.iloc[10:].assign(group="3", extra=SLEEP.extra[10:] + 1)])
    with pytest.raises(InputError, match="3 conditions .*name them with conditions"):
        t_paired(three, outcome="extra", subject="ID", within="group")
    picked = t_paired(three, outcome="extra", subject="ID", within="group", conditions=["1", "3"]).main
    assert picked.estimate.value == pytest.approx(-1.58 - 1)  # condition 3 is condition 2 plus one hour
    with pytest.raises(InputError, match="not both"):
        t_paired(SLEEP, "extra", "ID", outcome="extra", subject="ID", within="group")
    with pytest.raises(InputError, match="within: long data need"):
        t_paired(SLEEP, outcome="extra", subject="ID")
    # a subject missing one condition is dropped listwise, and the note says so
    gap = t_paired(SLEEP.drop(index=[4]), outcome="extra", subject="ID", within="group").main
    assert gap.n == 9 and "1 of 10 rows dropped" in gap.notes[-1].text


def test_former_keywords_still_work_with_a_warning(penguins):
    # one release of grace: the former keyword gives the same numbers and a FormerUse warning
    pairs = [
        (lambda: chi_square(penguins, "sex", "island", yates=False), lambda: chi_square(penguins, "sex", "island", variant="pearson")),
        (lambda: mann_whitney(penguins, "body_mass_g", "sex", method="asymptotic"),
         lambda: mann_whitney(penguins, "body_mass_g", "sex", variant="asymptotic")),
        (lambda: correlate(penguins, "bill_length_mm", "body_mass_g", "spearman"),
         lambda: correlate(penguins, "bill_length_mm", "body_mass_g", coefficient="spearman")),
        (lambda: describe(penguins, ["body_mass_g"], by="sex", tests=True), lambda: describe(penguins, ["body_mass_g"], group="sex", compare=True)),
    ]
    for old, new in pairs:
        with pytest.warns(FormerUse, match="is now|give the"):
            before = old()
        after = new()
        assert dump_records(before) == dump_records(after)
    with pytest.warns(FormerUse, match=r"write \.main\.p"):
        assert t_independent(penguins, "body_mass_g", "sex").p == t_independent(penguins, "body_mass_g", "sex").main.p
    with pytest.raises(TypeError, match="former name"):
        chi_square(penguins, "sex", "island", yates=True, variant="yates")


def test_ids_say_what_a_record_is_and_survive_a_change_of_data(penguins):
    model = name_records("mass", linear_regression(penguins, "body_mass_g", ["flipper_length_mm", "species"]))
    assert [r.id for r in model] == ["mass", "mass:intercept", "mass:flipper_length_mm", "mass:species.Chinstrap", "mass:species.Gentoo"]
    fewer = name_records("mass", linear_regression(penguins[penguins.island != "Torgersen"], "body_mass_g", ["flipper_length_mm", "species"]))
    assert [r.id for r in fewer] == [r.id for r in model]  # other data, same ids
    matrix = name_records("traits", correlation_matrix(penguins, ["bill_length_mm", "body_mass_g", "flipper_length_mm"]))
    assert [r.id for r in matrix] == ["traits", "traits:bill_length_mm~body_mass_g", "traits:bill_length_mm~flipper_length_mm",
                                      "traits:body_mass_g~flipper_length_mm"]
    assert Records(matrix).by_id("traits:bill_length_mm~body_mass_g").kind == "pearson"
    with pytest.raises(KeyError, match="no such record"):
        Records(matrix).by_id("traits:nope")


def test_descriptions_and_matrices_round_trip_through_json(penguins):
    # the new record kinds: JSON and back gives the same tables, to the last digit
    d = describe(penguins, ["body_mass_g", "island", "sex"], group="species", compare=True, suppress_below=3).main
    m = correlation_matrix(penguins, ["bill_length_mm", "bill_depth_mm", "body_mass_g"], adjust="holm").main
    back = load_records(dump_records([d, m]))
    assert isinstance(back[0], Description) and isinstance(back[1], CorrelationMatrix)
    for before, after in zip((d, m), back):
        assert table(after).rows == table(before).rows and table(after).general_note == table(before).general_note
        assert dump_records([after]) == dump_records([before])
    assert back[0].variables[0].test.p == d.variables[0].test.p
    assert (back[1].r == m.r).all() and back[1].n.dtype.kind == "i"
    with pytest.raises(InputError, match=r"record 1\.r: expected 3 × 3"):
        load_records(dump_records([m]).replace('"r": [', '"r": [[1.0, 0.5, 0.5], ', 1))
    with pytest.raises(InputError, match="column_n"):
        text = dump_records([d])
        load_records(text.replace('"column_n": [', '"column_n": [1, ', 1))


def test_table_lays_out_any_record(penguins):
    lm = linear_regression(penguins, "body_mass_g", ["flipper_length_mm"])
    assert "B" in [c.head.text for c in table(lm).columns]
    t = t_independent(penguins, "body_mass_g", "sex")
    assert len(table(t).rows) == 1
    assert math.isclose(float(table(t).rows[0].cells[0].text.split()[-1].replace("−", "-")), t.main.statistic.value, rel_tol=1e-2)
    with pytest.raises(InputError, match="no records"):
        table([])
    assert isinstance(t.main, Result)


def test_one_sample_test_of_one_condition_in_long_data():
    # the drug-2 condition of R's sleep data against 0: R's t.test(extra[group == 2]) gives t = 3.6799158948 (Rscript here)
    long = t_one_sample(SLEEP, "extra", 0, subject="ID", within="group", condition="2").main
    direct = stats.ttest_1samp(SLEEP.extra[10:], 0)
    assert long.statistic.value == pytest.approx(direct.statistic, rel=1e-12) and long.n == 10
    assert long.statistic.value == pytest.approx(3.6799158948, rel=1e-10)
    with pytest.raises(InputError, match="condition: long data need"):
        t_one_sample(SLEEP, "extra", 0, within="group")
    with pytest.raises(InputError, match="group: condition '3' is not among 1, 2"):
        t_one_sample(SLEEP, "extra", 0, within="group", condition="3")
    with pytest.raises(InputError, match="subject 1 has more than one row"):
        t_one_sample(pd.concat([SLEEP, SLEEP.iloc[[10]]]), "extra", 0, subject="ID", within="group", condition="2")


def test_the_correlation_table_names_its_adjustment(penguins):
    # the procedure by its name, not the keyword ("Holm", not "holm"), with the number of comparisons
    m = correlation_matrix(penguins, ["bill_length_mm", "bill_depth_mm", "body_mass_g"], adjust="holm").main
    assert "p values Holm-adjusted for 3 comparisons." in table(m).general_note.plain()
    bh = correlation_matrix(penguins, ["bill_length_mm", "bill_depth_mm", "body_mass_g"], adjust="fdr_bh").main
    assert "Benjamini–Hochberg-adjusted" in table(bh).general_note.plain()


def test_the_correlation_table_has_means_sds_and_the_right_n(penguins):
    # after APA 7's sample correlation table: M and SD columns, lower triangle, no column holding only a dash;
    # N when no value is missing, the pairwise n otherwise
    cols = ["bill_length_mm", "bill_depth_mm", "body_mass_g"]
    m = correlation_matrix(penguins, cols).main
    laid = table(m)
    assert [c.head.plain() for c in laid.columns] == ["M", "SD", "1", "2"]
    first = penguins[cols[0]].dropna()
    assert laid.rows[0].cells[0].plain() == f"{first.mean():.2f}" and laid.rows[0].cells[1].plain() == f"{first.std(ddof=1):.2f}"  # pandas
    assert [c.plain() for c in laid.rows[0].cells[2:]] == ["—", ""] and laid.rows[2].cells[3].plain() == "−.47***"
    assert "n = 342 for every pair" in laid.general_note.plain() and "observed values" in laid.general_note.plain()
    complete = table(correlation_matrix(penguins.dropna(), cols).main)
    assert complete.general_note.plain().startswith("N = 333.")
    from statsetter.rendering.correlation_tables import correlation_table

    assert [c.head.plain() for c in correlation_table(m, means=False).columns] == ["1", "2"]
    back = load_records(dump_records([m]))[0]
    assert (back.mean == m.mean).all() and back.rows == 344


def test_the_correlation_table_can_give_each_r_its_interval_underneath(penguins):
    # APA 7's sample correlation table (practice): each r's CI in brackets on the row under it;
    # the limits are Fisher-z limits, here against scipy's pearsonr(...).confidence_interval()
    from scipy import stats

    from statsetter.rendering.correlation_tables import correlation_table

    cols = ["bill_length_mm", "bill_depth_mm", "body_mass_g"]
    data = penguins.dropna(subset=cols)
    m = correlation_matrix(data, cols).main
    laid = correlation_table(m, intervals=True)
    assert [r.stub.plain() for r in laid.rows] == ["1. Bill_length_mm", "2. Bill_depth_mm", "", "3. Body_mass_g", ""]
    ci = stats.pearsonr(data.body_mass_g, data.bill_depth_mm).confidence_interval(0.95)
    low, high = (f"{x:.2f}".replace("-", "−").replace("0.", ".", 1) for x in (ci.low, ci.high))
    assert laid.rows[4].cells[3].plain() == f"[{low}, {high}]"  # under r(3, 2), after the M and SD columns
    assert [c.plain() for c in laid.rows[4].cells[:2]] == ["", ""]  # no M or SD on the interval row
    assert "Values in brackets are the 95% CI of each r." in laid.general_note.plain()


def test_arguments_of_the_wrong_kind_are_named_before_any_work(penguins):
    """Every public function given an argument of the wrong kind says which function and argument, and what it got, as
    the project's own error — not an AttributeError or TypeError from deep inside pandas, numpy or the renderer (each
    of these had been one: "'int' object has no attribute 'columns'", "unsupported operand type(s) for /", "the
    interval search did not converge" for level=1.5). One name where a list of names is wanted is a list of one."""
    import statsetter
    from statsetter import StatsetterError, StyledText, figure, load_style
    from statsetter.analyses import mediation, t_one_sample

    record = t_independent(penguins, "body_mass_g", "sex").main
    cases = [
        (lambda: t_independent(5, "body_mass_g", "sex"), "t_independent: df must be a pandas DataFrame (got int 5)"),
        (lambda: t_independent(penguins, "body_mass_g", "sex", level="x"), "t_independent: level must be a number (got str 'x')"),
        (lambda: t_independent(penguins, "body_mass_g", "sex", level=95), "t_independent: level must lie between 0 and 1"),
        (lambda: t_one_sample(penguins, "body_mass_g", mu=None), "t_one_sample: mu must be a number (got NoneType None)"),
        (lambda: t_one_sample(penguins, "body_mass_g", mu=float("nan")), "t_one_sample: mu must be a finite number"),
        (lambda: describe(penguins, {"sex": 1}), "describe: variables must be a list of column names (got dict {'sex': 1})"),
        (lambda: describe(penguins, 5), "5: no such column"),  # (a DataFrame's column may be named by a number)
        (lambda: t_independent(penguins, penguins["body_mass_g"], "sex"), "t_independent: outcome must be a name (text) (got Series"),
        (lambda: t_independent(penguins, "body_mass_g", "sex", variant=5), "t_independent: variant must be one of 'welch', 'student' (got int 5)"),
        (lambda: spearman(penguins, "body_mass_g", "bill_length_mm", alternative="x"), "spearman: alternative must be one of 'two-sided', 'less', 'greater'"),
        (lambda: t_independent(penguins, "body_mass_g", "sex", table_labels=["x"]), "t_independent: table_labels must be a mapping"),
        (lambda: cronbach_alpha(penguins, ["bill_length_mm", None]), "cronbach_alpha: items must be a list of column names (text)"),
        (lambda: describe(penguins, ["sex"], group="species", smd="yes"), "describe: smd must be True or False"),
        (lambda: correlation_matrix(penguins, penguins), "correlation_matrix: columns must be a list of column names"),
        (lambda: cronbach_alpha(penguins, {"a": 1}), "cronbach_alpha: items must be a list of column names"),
        (lambda: cronbach_alpha(penguins, ["bill_length_mm", "bill_depth_mm"], reverse=[5]), "reverse: 5 not among the items"),
        (lambda: mediation(penguins, "body_mass_g", "bill_length_mm", "flipper_length_mm", n_boot=1.5), "mediation: n_boot must be a whole number"),
        (lambda: t_independent(penguins, "body_mass_g", "sex", labels=5), "t_independent: labels must be a mapping"),
        (lambda: render("t = 2.1"), "record: render takes a Result (got str)"),
        (lambda: render(record, "stats", 3), "style: a style is a built-in name (apa7, ama11), a .toml file or a Style (got int)"),
        (lambda: load_style(["apa7"]), "style: a style is a built-in name"),
        (lambda: table(5), "source: table takes a record or a list of records (got int)"),
        (lambda: table([record, "x"]), "records[1]: not a record (got str)"),
        (lambda: figure(5, "means"), "figure: records must be a record or a list of records (got int)"),
        (lambda: figure([record, None], "means"), "figure: records[1] is not a record (got NoneType)"),
        (lambda: load_records(5), "load_records takes JSON text"),
        (lambda: dump_records([record, 5]), "records[1]: not a record"),
        (lambda: StyledText(5), "StyledText: expected text (got int)"),
        (lambda: StyledText.from_markup(None), "markup: expected text (got NoneType)"),
    ]
    for call, said in cases:
        with pytest.raises(StatsetterError) as caught:
            call()
        assert said in str(caught.value), (said, str(caught.value))
    one, listed = linear_regression(penguins, "body_mass_g", "bill_length_mm"), linear_regression(penguins, "body_mass_g", ["bill_length_mm"])
    assert dump_records(one) == dump_records(listed)  # (it had read the name letter by letter: "b: no such column")
    assert dump_records(record) == dump_records([record]) and statsetter.render(record).plain().startswith("t(")
    # a generator of names is read once by the check and handed on as the list it gave (not emptied by the check)
    assert [v.name for v in describe(penguins, (c for c in ["body_mass_g", "species"])).main.variables] == ["body_mass_g", "species"]
