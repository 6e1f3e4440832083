"""The audit reads statistics as authors type them (issue: the audit on real
manuscripts, point 1), kind by kind: df split by a dash, df and N split by a
semicolon, df written apart without "=", "p = < .001", "P value =",
scientific notation in its common forms (read as one number), ΔF, "<", ">"
and "=" garbled to "b", "N" and "¼" by a PDF copy, F with its df run on (F1,23), subscript df,
thin and no-break spaces, a line break inside a statistic, a thousands comma
in a single df. Each case is built here with its own numbers (not those of
any publication) and its p computed with scipy, so a consistent typing must
raise no p finding and the same typing with a wrong p must raise one.
"""

import pytest
from scipy import stats

from statsetter.audit.parsing import find_statistics
from statsetter.audit.report import audit_units
from statsetter.audit.reading import Unit


def p3(p):
    return f"{p:.3f}".lstrip("0")


T = stats.t.sf(2.61, 44) * 2          # t(44) = 2.61
F = stats.f.sf(3.87, 2, 61)           # F(2, 61) = 3.87
C = stats.chi2.sf(7.42, 3)            # χ²(3) = 7.42
SMALL = stats.t.sf(4.62, 57) * 2      # t(57) = 4.62, p about 2e-5
TINY_F = stats.f.sf(0.00412, 1, 40)   # F(1, 40) = 4.12e-3

CASES = [
    # (text, symbol, df, N, value, p op, p value)
    (f"F (2–61) = 3.87, p = {p3(F)}", "F", (2, 61), None, 3.87, "=", float(p3(F))),
    (f"F(2 - 61) = 3.87, p = {p3(F)}", "F", (2, 61), None, 3.87, "=", float(p3(F))),
    (f"χ²(3; 250) = 7.42; p = {p3(C)}", "chi2", (3,), 250, 7.42, "=", float(p3(C))),
    (f"t=2.61, df 44, p={p3(T)}", "t", (44,), None, 2.61, "=", float(p3(T))),
    ("t(57) = 4.62, p = < .001", "t", (57,), None, 4.62, "<", 0.001),
    (f"t(44) = 2.61, P value = {p3(T)}", "t", (44,), None, 2.61, "=", float(p3(T))),
    (f"F(1, 40) = 4.12e-3, p = {stats.f.sf(0.00412, 1, 40):.2f}", "F", (1, 40), None, 0.00412, "=", round(TINY_F, 2)),
    (f"t(57) = 4.62, p = {SMALL / 1e-5:.1f} × 10⁻⁵", "t", (57,), None, 4.62, "=", round(SMALL / 1e-5, 1) * 1e-5),
    (f"t(57) = 4.62, p = {SMALL / 1e-5:.1f}×10^-5", "t", (57,), None, 4.62, "=", round(SMALL / 1e-5, 1) * 1e-5),
    (f"t(57) = 4.62, p = {SMALL / 1e-5:.1f} x 10−5", "t", (57,), None, 4.62, "=", round(SMALL / 1e-5, 1) * 1e-5),
    (f"t(57) = 4.62, p = {SMALL / 1e-5:.1f}E-05", "t", (57,), None, 4.62, "=", round(SMALL / 1e-5, 1) * 1e-5),
    (f"ΔF (2, 61) = 3.87, p = {p3(F)}", "F", (2, 61), None, 3.87, "=", float(p3(F))),
    ("t(57) = 4.62, p b 0.001", "t", (57,), None, 4.62, "<", 0.001),
    # the other operators a copy from a publisher's PDF garbles: ">" as "N" ("(p N 0.05)", Jošt et al., 2017, Decision
    # Support Systems, https://doi.org/10.1016/j.dss.2017.09.003) and "=" as "¼" ("F(3, 1971) ¼ 1.28, p ¼ 0.281", Jia et
    # al., 2026, International Journal of Human–Computer Interaction, https://doi.org/10.1080/10447318.2026.2622580):
    # neither statistic had been read
    ("t(44) = 2.61, p N 0.01", "t", (44,), None, 2.61, ">", 0.01),
    # and another publisher's copy (Adams et al., 2022, Biological Psychiatry, https://doi.org/10.1016/j.biopsych.2021.07.024:
    # "(F3,573 = 6.59, p , .001)", "(p . .2)"), whose "=" is "5" in other copies (memory); read for a p only, as the same
    # copies turn a minus into "2" ("Z = 22.77" for −2.77 there) and a statistic's number can no longer be trusted
    ("t(44) = 2.61, p , .05", "t", (44,), None, 2.61, "<", 0.05),
    ("t(44) = 2.61, p . .01", "t", (44,), None, 2.61, ">", 0.01),
    (f"t(44) = 2.61, p 5 {p3(T)}", "t", (44,), None, 2.61, "=", float(p3(T))),
    (f"F(2, 61) ¼ 3.87, p ¼ {p3(F)}", "F", (2, 61), None, 3.87, "=", float(p3(F))),
    (f"F2,61 = 3.87, p = {p3(F)}", "F", (2, 61), None, 3.87, "=", float(p3(F))),
    (f"t₄₄ = 2.61, P = {p3(T)}", "t", (44,), None, 2.61, "=", float(p3(T))),
    (f"F(2,\u200961)\u00a0=\u00a03.87, p\u00a0=\u00a0{p3(F)}", "F", (2, 61), None, 3.87, "=", float(p3(F))),
    (f"t(44) =\n2.61, p = {p3(T)}", "t", (44,), None, 2.61, "=", float(p3(T))),
    (f"t(1,044) = 2.61, p = {p3(stats.t.sf(2.61, 1044) * 2)}", "t", (1044,), None, 2.61, "=", float(p3(stats.t.sf(2.61, 1044) * 2))),
    (f"t[44] = 2.61, p = {p3(T)}", "t", (44,), None, 2.61, "=", float(p3(T))),
    (f"F = 3.87, df = 2, 61, p = {p3(F)}", "F", (2, 61), None, 3.87, "=", float(p3(F))),
    (f"F = 3.87, df = 2/61, p = {p3(F)}", "F", (2, 61), None, 3.87, "=", float(p3(F))),
    (f"t (df = 44) = 2.61, p = {p3(T)}", "t", (44,), None, 2.61, "=", float(p3(T))),
    (f"chi square (3, N = 250) = 7.42, p = {p3(C)}", "chi2", (3,), 250, 7.42, "=", float(p3(C))),
    (f"Z = 2.61, p = {p3(stats.norm.sf(2.61) * 2)}", "z", (), None, 2.61, "=", float(p3(stats.norm.sf(2.61) * 2))),
    # the Greek capital Χ (U+03A7), as a symbol font types chi: "Χ2(1, N = 80) = 0.09, p > .90" in a course handout posted
    # online (https://www.sweetstudy.com/files/note4results-docx-7564693), "Χ^{2}_{critical}" on Anglia Ruskin University's
    # biostatistics pages (http://web.anglia.ac.uk/numbers/biostatistics/one_way_chi_square/how.html); it had not been read
    (f"Χ2(3, N = 250) = 7.42, p = {p3(C)}", "chi2", (3,), 250, 7.42, "=", float(p3(C))),
    # R's printed tests pasted into the text: "X-squared = 1.0066, df = 1, p-value = 0.3157" (chisq.test, as Boston
    # University's PH717 module page shows it: https://sphweb.bumc.bu.edu/otlt/MPH-Modules/PH717-QuantCore/
    # PH717_ComparingFrequencies/PH717_ComparingFrequencies6.html), X-squared had not been read as χ²; a Welch ANOVA
    # (oneway.test) prints "F = …, num df = 2.00, denom df = 40.5" (memory), whose second df had been lost
    (f"X-squared = 7.42, df = 3, p-value = {C:.4f}", "chi2", (3,), None, 7.42, "=", round(C, 4)),
    (f"F = 3.87, num df = 2.00, denom df = 61.0, p-value = {F:.4f}", "F", (2, 61), None, 3.87, "=", round(F, 4)),
    # df abbreviated "d.f.", or after their numbers ("(44 df)", "with 2 and 61 df"), as older and biomedical texts write
    # them, and split by a slash inside the parentheses, "F(2/61)" (practice, from memory)
    (f"chi-square = 7.42, d.f. = 3, P = {p3(C)}", "chi2", (3,), None, 7.42, "=", float(p3(C))),
    (f"t = 2.61 (44 df), p = {p3(T)}", "t", (44,), None, 2.61, "=", float(p3(T))),
    (f"F = 3.87 with 2 and 61 df, p = {p3(F)}", "F", (2, 61), None, 3.87, "=", float(p3(F))),
    (f"χ² = 7.42, 3 d.f., p = {p3(C)}", "chi2", (3,), None, 7.42, "=", float(p3(C))),
    (f"F(2/61) = 3.87, p = {p3(F)}", "F", (2, 61), None, 3.87, "=", float(p3(F))),
    # R's summary of a linear model, its last line pasted as printed (riptutorial's "Linear regression on the mtcars
    # dataset", https://riptutorial.com/r/example/2738/linear-regression-on-the-mtcars-dataset, and dummies.com's "How to
    # evaluate linear data with R": lm(mpg ~ wt, mtcars)); the F, its df and the p had none of them been read
    ("F-statistic: 91.38 on 1 and 30 DF,  p-value: 1.294e-10", "F", (1, 30), None, 91.38, "=", 1.294e-10),
    (f"F-statistic: 3.87 on 2 and 61 DF,  p-value: {F:.4g}", "F", (2, 61), None, 3.87, "=", float(f"{F:.4g}")),
    # "DF = 2" in capitals, as statistics programs print it and authors paste it ("H = 8.63  DF = 2  P = 0.013", a
    # Kruskal–Wallis test in a program's published example: https://www.pinzhi.org/Minitab/Stat/ST_Nonparametrics/
    # Kruskal_Wallis/Example_of_Kruskal_Wallis_Test.htm); the df had not been read, so the p was held to every df
    ("H = 8.63  DF = 2  P = 0.013", "H", (2,), None, 8.63, "=", 0.013),
    (f"chi-square = 7.42, DF = 3, P = {p3(C)}", "chi2", (3,), None, 7.42, "=", float(p3(C))),
    # df run together with their number, "χ2 = 0.25, 1df, P = 0.62" and "χ2 = 20.8, 2df, p < .0001" (Int J Equity Health 2023,
    # Table 1: https://equityhealthj.biomedcentral.com/articles/10.1186/s12939-023-01965-9/tables/1); held to every df before
    (f"χ2 = 7.42, 3df, P = {p3(C)}", "chi2", (3,), None, 7.42, "=", float(p3(C))),
    # a t's subscript df flattened, as a copy from an AMA-style PDF leaves "t₄₄" (and as a student's public notes on GitHub
    # type it: "(t38 = -2.044, p< 0.05>)"); read only with a value with decimals and a p, "t12 = 5 s" being a time point's
    (f"t44 = 2.61, P = {p3(T)}", "t", (44,), None, 2.61, "=", float(p3(T))),
]


@pytest.mark.parametrize("text, symbol, df, n, value, op, p", CASES)
def test_each_typing_is_read(text, symbol, df, n, value, op, p):
    (rep,) = [r for r in find_statistics(text) if r.symbol is not None]
    assert rep.symbol == symbol and tuple(d.value for d in rep.df) == df
    assert (rep.n.value if rep.n else None) == n
    assert rep.value.value == pytest.approx(value, rel=1e-12)  # one number, never two
    assert rep.p.op == op and rep.p.number.value == pytest.approx(p, rel=1e-9)


def codes(text):
    (entry,) = audit_units([Unit("case", text)])
    return set(entry.codes)


@pytest.mark.parametrize("text", [c[0] for c in CASES])
def test_a_consistent_typing_raises_no_p_finding(text):
    assert not codes(text) & {"p-does-not-follow", "verdict-changes", "impossible-p", "impossible-value"}


def test_a_p_after_value_and_a_colon_is_read_and_restyled_as_given():
    """"p-value: 0.000285" (R's way, and authors' who copy it: "statistically significant (p-value: 0.000285)", a
    tutorial on mtcars) is a p; an exact p below the smallest the style prints is the reported p restyled ("p < .001"),
    not a recomputed one (the suggestion had said "(p recomputed)"); a colon elsewhere ("p: note") is not read."""
    (rep,) = find_statistics("which is statistically significant (p-value: 0.000285).")
    assert rep.p.op == "=" and rep.p.number.value == 0.000285
    (e,) = audit_units([Unit("a", "F(1, 30) = 16.86, p = 0.000285")], suggest_all=True)
    assert e.suggestion == "F(1, 30) = 16.86, p < .001" and "p-does-not-follow" not in e.codes
    (e,) = audit_units([Unit("b", "t(40) = 5.2, p = .04")], suggest_all=True)  # p = 6.2e-6 (scipy): recomputed, and said so
    assert e.suggestion == "t(40) = 5.2, p < .001 (p recomputed)"
    assert not find_statistics("p: see the note; F-statistics: below")
    # the line restyled (its "statistic", "on" and "and" are notation), unless a power of ten is in it
    (e,) = audit_units([Unit("c", "F-statistic: 16.86 on 1 and 30 DF,  p-value: 0.000285")], restyle=True)
    assert e.revision is not None and e.revision.plain() == "F(1, 30) = 16.86, p < .001"


def test_a_time_point_is_no_flattened_t():
    """"t12 = 5 s" (a time point), "t1 = 2.4, p = .03" (one digit: a first time point's as often as a df) and "t38 was 2.10"
    are no t statistics; "t38 = 2.10, p = .043" is t(38)."""
    assert not [r for r in find_statistics("At t12 = 5 s the light came on, and at t13 = 8 s it went off.") if r.symbol]
    assert not [r for r in find_statistics("At t1 = 2.4, p = .03 of the trials had ended.") if r.symbol == "t"]
    (rep,) = [r for r in find_statistics("The groups differed (t38 = 2.10, p = .043).") if r.symbol]
    assert rep.symbol == "t" and tuple(d.value for d in rep.df) == (38,) and rep.value.value == 2.10


def test_numbers_before_df_are_read_only_as_df():
    """A number before "df" is its df only when nothing names the df after it ("t = 2.14 df = 23": the 23), and only on
    one line; a t's own value is never read as its df."""
    (rep,) = [r for r in find_statistics("t = 2.61, df = 44, p = .012") if r.symbol]
    assert [d.value for d in rep.df] == [44]
    (rep,) = [r for r in find_statistics("p = .05, t = 2.61\ndf = 44") if r.symbol]
    assert [d.value for d in rep.df] == [44]
    (rep,) = [r for r in find_statistics("t = 2.61 df = 44") if r.symbol]
    assert [d.value for d in rep.df] == [44]


def test_a_wrong_p_in_such_a_typing_is_found():
    assert "p-does-not-follow" in codes("F (2–61) = 3.87, p = .20")
    assert "p-does-not-follow" in codes("t=2.61, df 44, p=.20")
    assert "p-does-not-follow" in codes("t(57) = 4.62, p = 2.1 × 10⁻²")
    assert "p-does-not-follow" in codes("F2,61 = 3.87, p = .20")


def test_a_correlation_with_its_n_beside_it_is_checked_with_n_minus_2():
    r = 0.31
    t = r * (58 / (1 - r * r)) ** 0.5
    p = stats.t.sf(t, 58) * 2  # r with n = 60: df = 58 (the t form of Pearson's r)
    (good,) = audit_units([Unit("a", f"r = .31, n = 60, p = {p3(p)}")])
    (bad,) = audit_units([Unit("b", "r = .31, n = 60, p = .200")])
    assert not set(good.codes) & {"p-does-not-follow"} and "N − 2 = 58" in good.checked and "r(58)" in good.checked
    assert "p-does-not-follow" in bad.codes


def test_a_whole_v_is_the_signed_rank_sum_and_one_with_decimals_cramers_v():
    """R's wilcox.test names a paired or one-sample test's statistic V, the sum of the positive ranks ("V = 5, p-value =
    0.0391"; the litteR package's wrapper of it: "Extract test statistic V", https://rdrr.io/cran/litteR/man/wilcoxon.html):
    read as Cramér's V it had been an impossible value, an error the author had not made. A whole V is read as that
    test's statistic (no p to recompute without its n), one with decimals stays Cramér's V, checked as before."""
    (rank,) = audit_units([Unit("a", "Pain fell after the session (V = 5, p-value = 0.0391).")])
    assert rank.found == "V = 5, p-value = 0.0391" and rank.suggestion == "V = 5, p = .039"
    assert rank.codes == ["leading-zero", "decimals"] and [f.evidence for f in rank.findings] == ["0.0391", "p = 0.0391 (.039 in the style)"]
    (clean,) = audit_units([Unit("a", "Pain fell after the session (V = 5, p = .039).")])
    assert clean.found == "V = 5, p = .039" and not clean.codes
    (zero,) = [r for r in find_statistics("All differences fell the same way, V = 0, p = .008.") if r.symbol is not None]
    assert zero.symbol == "V" and zero.value.value == 0
    chi = stats.chi2.sf(9.87, 2)
    (assoc,) = audit_units([Unit("b", f"χ²(2, N = 200) = 9.87, p = {p3(chi)}, V = .22")])
    assert [e.name for e in find_statistics(assoc.found)[0].effects] == ["V"] and not assoc.codes
    (wrong,) = audit_units([Unit("c", f"χ²(2, N = 200) = 9.87, p = {p3(chi)}, Cramér's V = 1.22")])
    assert "impossible-value" in wrong.codes


def test_df_named_in_brackets_after_the_value_are_read():
    """"F=7.34 [df](2, 102), p<0.001" (a research-methods textbook quoting a study's ANOVAs: issuhub-5518 in
    tests/real_typings.py): the df had not been read, so neither F was checked; F(2, 102) = 7.34 gives p = .00105 (scipy),
    not below .001 — the quoted p does not follow — while F(2, 98) = 5.40 gives .006, below .01."""
    text = "Developing thinking: F=7.34 [df](2, 102), p<0.001;\nand Expressing ideas: F=5.40 [df] (2, 98), p<0.01."
    first, second = audit_units([Unit("a", text)])
    assert [tuple(d.value for d in r.df) for r in find_statistics(text) if r.symbol] == [(2, 102), (2, 98)]
    assert stats.f.sf(7.345, 2, 102) > 0.001 and "p-does-not-follow" in first.codes
    assert stats.f.sf(5.405, 2, 98) < 0.01 and "p-does-not-follow" not in second.codes and second.suggestion.startswith("F(2, 98) = 5.40")


def test_spelled_out_greek_effect_sizes():
    names = {r.effects[0].name for text in ("partial eta squared = .12", "omega squared = .05", "Cramer's V = .21", "eta squared = .08")
             for r in find_statistics(text)}
    assert names == {"eta2_p", "omega2", "V", "eta2"}


def test_df_spaced_otherwise_than_the_style_is_a_spacing_finding_and_is_restyled():
    """APA 7 writes the df right after the symbol, a space after each comma: "F(1, 85)", "χ2(1, N = 80)" (its examples;
    practice). Real authors type "F(1,85)" (a Nottingham thesis and a Stroop thesis in tests/real_typings.py), "t (38)"
    and "χ2(1,N = 80)": each is now a spacing finding, and the revision restyles it — before, "F(1,85)" read as the one
    number 1,85 to the check that a revision keeps every number, and such a statistic was always left as typed.
    Subscript df (AMA's form) are not this check's; the numbers are this test's own, their p computed with scipy."""
    f, t = stats.f.sf(2.10, 1, 85), stats.t.sf(2.10, 38) * 2
    chi = stats.chi2.sf(4.20, 1)
    units = [Unit("p1", f"Also F(1,85) = 2.10, p = {p3(f)}."), Unit("p2", f"And t (38) = 2.10, p = {p3(t)}."),
             Unit("p3", f"And χ2(1,N = 80) = 4.20, p = {p3(chi)}."), Unit("p4", f"And F(1, 85) = 2.10, p = {p3(f)}."),
             Unit("p5", f"And F₁,₈₅ = 2.10, p = {p3(f)}.")]
    entries = audit_units(units, restyle=True)
    assert [e.codes for e in entries] == [["spacing"], ["spacing"], ["spacing"], [], []]
    assert [e.findings[0].evidence for e in entries[:3]] == ["F(1,85)", "t (38)", "χ2(1,N = 80)"]
    assert [e.revision.plain() if e.revision is not None else None for e in entries[:3]] == [
        f"F(1, 85) = 2.10, p = {p3(f)}", f"t(38) = 2.10, p = {p3(t)}", f"χ²(1, N = 80) = 4.20, p = {p3(chi)}"]  # (² a superscript in Word)


def _wald(ratio, se):
    """A ratio's Wald 95% CI and two-sided p from its log and the log's SE (the normal approximation; scipy)."""
    import math

    z = stats.norm.ppf(0.975)
    return math.exp(math.log(ratio) - z * se), math.exp(math.log(ratio) + z * se), 2 * stats.norm.sf(abs(math.log(ratio)) / se)


def test_ratios_are_read_and_their_ci_and_p_must_agree():
    """Public-health texts report adjusted odds, hazard, risk and incidence-rate ratios ("aOR = 2.31, 95% CI [1.20,
    4.40], p = .012"; practice): read as ratios (null 1, above 0), a CI and a p of one Wald test agree (Altman & Bland,
    2011, BMJ: the p from the CI); these numbers are the test's own, the CI and p computed with scipy. A p clearly below
    .05 with a CI holding 1, or clearly above with a CI excluding it, is a warning; near the null, where an exact or
    likelihood-ratio p beside a Wald CI can part from it, nothing is said; the author's order (ratio, CI, p) is kept."""
    lo, hi, p = _wald(2.31, 0.33)
    text = f"aOR = 2.31, 95% CI [{lo:.2f}, {hi:.2f}], p = {p3(p)}"
    (entry,) = audit_units([Unit("a", text)], suggest_all=True)
    (rep,) = find_statistics(text)
    assert [(e.name, e.number.value) for e in rep.effects] == [("aOR", 2.31)] and not entry.codes
    assert entry.suggestion == text  # the ratio first, the p after it, as typed
    for name in ("HR", "adjusted HR", "RR", "aRR", "IRR", "OR"):
        (r,) = find_statistics(f"{name} = 1.45, 95% CI [1.10, 1.91], p = .008")
        assert len(r.effects) == 1 and r.effects[0].ci is not None, name
    lo, hi, p = _wald(1.52, 0.23)  # CI [0.97, 2.39], p = .069: consistent
    assert p > 0.05 and lo < 1 and not audit_units([Unit("b", f"OR = 1.52, 95% CI [{lo:.2f}, {hi:.2f}], p = {p3(p)}")])[0].codes
    wrong = audit_units([Unit("c", f"OR = 1.52, 95% CI [{lo:.2f}, {hi:.2f}], p = .003")])[0]
    assert wrong.codes == ["ci-p-disagree"] and wrong.severity == "warning" and "the CI includes 1" in wrong.message
    excluded = audit_units([Unit("d", "HR = 1.45, 95% CI [1.10, 1.91], p = .21")])[0]
    assert excluded.codes == ["ci-p-disagree"] and "the CI excludes 1" in excluded.message
    assert not audit_units([Unit("e", f"OR = 1.52, 95% CI [{lo:.2f}, {hi:.2f}], p = .04")])[0].codes  # near the null: not said
    assert not audit_units([Unit("f", "OR = 1.52, 95% CI [1.00, 2.35], p = .003")])[0].codes  # 1.00 may be above 1
    t_ci = audit_units([Unit("g", "t(38) = 3.10, p = .004, 95% CI [-0.10, 1.31]")])[0]  # a t's own CI: a mean difference
    assert "ci-p-disagree" in t_ci.codes
    assert audit_units([Unit("h", "t(38) = 3.10, p = .004, d = 0.98, 95% CI [−0.02, 1.95]")])[0].codes == []  # d's CI: not checked
    impossible = audit_units([Unit("i", "OR = 0.00, 95% CI [-0.20, 0.90]")])[0]
    assert "impossible-value" in impossible.codes
    said = audit_units([Unit("j", "As the one-tailed test predicted, HR = 1.45, 95% CI [1.10, 1.91], p = .21.")])[0]
    assert "ci-p-disagree" not in said.codes


# Ratios as real texts type them without "=": quotations of published papers collected in BMJ Evidence-Based
# Medicine's table "Example uses of ORs" (https://ebm.bmj.com/highwire/markup/145451/expansion), and JMIR's
# "Guidelines for Reporting Statistics" (https://support.jmir.org/hc/en-us/articles/360019690851), its own example; and
# BMJ Open 2018;8:e017385, abstract (http://bmjopen.bmj.com/cgi/content/full/8/1/e017385): a name, its abbreviation, "="
RATIOS_TYPED = [
    ("significantly associated with non-CVD (adjusted HR (aHR)=1.29, 95% CI 1.16 to 1.44) and all-cause (aHR=1.24, 95% CI "
     "1.14 to 1.39), but not cancer (aHR=1.15, 95% CI 0.96 to 1.38)", [("aHR", 1.29, 1.16, 1.44), ("aHR", 1.24, 1.14, 1.39),
                                                                     ("aHR", 1.15, 0.96, 1.38)]),
    ("Both 30-day mortality (OR, 0.76; 95% CI, 0.73 to 0.80) and 90-day mortality (OR, 0.73; 95% CI, 0.70 to 0.76) were "
     "significantly lower for azithromycin users.", [("OR", 0.76, 0.73, 0.80), ("OR", 0.73, 0.70, 0.76)]),
    ("are 8.3 times more likely to be aware of the vaccine (AOR: 8.32, 95% CI: 2 to 39, p<0.01).", [("aOR", 8.32, 2, 39)]),
    ("had a 7-fold increased risk of early stent thrombosis vs patients in the lowest tertile (OR, 7.63; 95% CI, 4.18 to 13.91).",
     [("OR", 7.63, 4.18, 13.91)]),
    ("was associated with a 19% decrease in the odds of telomere shortening (unadjusted odds ratio, 0.81; 95% CI, 0.69 to 0.95).",
     [("OR", 0.81, 0.69, 0.95)]),
    ("separate each statistic with a semicolon. For example: (P=.50; OR 2.72, 95% CI 0.45-2.6).", [("OR", 2.72, 0.45, 2.6)]),
]


@pytest.mark.parametrize("text, ratios", RATIOS_TYPED)
def test_ratios_typed_without_equals_are_read_with_their_cis(text, ratios):
    """AMA's and NEJM's "OR, 0.76; 95% CI, 0.73 to 0.80", "AOR: 8.32", "OR 2.72" and the spelled-out "odds ratio, 0.81"
    are ratios with their CIs (they had not been read at all: no check could see them)."""
    got = [(e.name, e.number.value, e.ci.low.value, e.ci.high.value) for r in find_statistics(text) for e in r.effects if e.ci]
    assert got == ratios


def test_what_the_ratios_typed_without_equals_say_is_checked():
    """Read, they are checked as any ratio: JMIR's own example puts the OR (2.72) above its CI's upper limit (2.6) —
    found; a p that the CI contradicts is found (invented numbers: the CI 0.73 to 0.80 excludes 1, so p = .40 cannot be
    its Wald test's); the real typings above raise nothing else."""
    assert "ci-excludes-estimate" in codes(RATIOS_TYPED[-1][0])
    assert "ci-p-disagree" in codes("Mortality was lower (OR, 0.76; 95% CI, 0.73 to 0.80; P = .40).")
    assert codes("Mortality was lower (OR, 0.76; 95% CI, 0.73 to 0.80; P < .001).") == {"p-symbol"}  # AMA's capital P in APA
    # a p belongs to the ratio it follows, not to the next one of the sentence (which had been read into one statistic
    # with it, and said to disagree with a p it does not have)
    first, second = audit_units([Unit("two", "Both 30-day mortality (OR, 0.76; 95% CI, 0.73 to 0.80; P = .40) and 90-day "
                                             "mortality (OR, 0.73; 95% CI, 0.70 to 0.76) were lower.")])
    assert "ci-p-disagree" in first.codes and first.found.endswith("P = .40") and second.codes == []
    for text, ratios in RATIOS_TYPED[:5]:  # each ratio a statistic of its own, checked with its own CI
        entries = audit_units([Unit("case", text)])
        assert len(entries) == len(ratios), text
        assert not {"ci-excludes-estimate", "ci-p-disagree", "impossible-value"} & {c for e in entries for c in e.codes}, text
    # an odds ratio spelled out "of" its number, and a hazard ratio with its CI in AMA's form
    (rep,) = find_statistics("An odds ratio of 1.7 (95% confidence interval [CI], 1.05 to 2.8) favoured the treatment.")
    assert [(e.name, e.number.value, e.ci.low.value) for e in rep.effects] == [("OR", 1.7, 1.05)]
    (rep,) = find_statistics("associated with the outcome (odds ratio [OR], 1.52; 95% CI, 1.08-2.14; P = .02)")  # (practice)
    assert [(e.name, e.number.value, e.ci.high.value) for e in rep.effects] == [("OR", 1.52, 2.14)]
    (rep,) = find_statistics("Survival was longer (HR, 0.72; 95% CI, 0.55-0.94; P = .02).")
    assert [(e.name, e.number.value, e.ci.high.value) for e in rep.effects] == [("HR", 0.72, 0.94)] and rep.p.number.value == 0.02


def test_a_ratio_typed_in_words_is_restyled_only_where_no_meaning_is_lost():
    """A CI's "to" and a ratio's spelled-out name are notation, which the house style writes its own way (the revision
    had been refused: "would drop 'to'"); "unadjusted" is the author's word, and keeps the statistic as typed."""
    (e,) = audit_units([Unit("a", "Mortality was lower (OR, 0.76; 95% CI, 0.73 to 0.80; P = .40).")], restyle=True)
    assert e.revision is not None and e.revision.plain() == "OR = 0.76, 95% CI [0.73, 0.80], p = .40"
    (e,) = audit_units([Unit("b", "lower (adjusted odds ratio, 0.81; 95% CI, 0.69 to 0.95, p=.03)")], restyle=True)
    assert e.revision is not None and e.revision.plain() == "aOR = 0.81, 95% CI [0.69, 0.95], p = .03"
    (e,) = audit_units([Unit("c", "lower (unadjusted odds ratio, 0.81; 95% CI, 0.69 to 0.95, p=.03)")], restyle=True)
    assert e.revision is None and "unadjusted" in e.kept


def test_words_that_only_look_like_a_ratio_without_equals_are_not_read():
    """Capital "OR" as a word, a ratio's name before a whole number (a count, a reference category), and "risk of" are
    not ratios (no decimals: a ratio is printed with them)."""
    for text in ("Either arm A OR arm B was chosen.", "the OR 2 times higher", "HR 1 (reference)", "AND/OR 3 items",
                 "the risk of 2.5 falls a year", "a relative risk reduction of 0.3"):
        assert not [e for r in find_statistics(text) for e in r.effects], text


def _audited_table(tmp_path, caption, rows):
    """The audit of a Word document holding ``caption`` and a table of ``rows`` (python-docx)."""
    import docx

    from statsetter.audit.report import audit_file

    d = docx.Document()
    d.add_paragraph(caption)
    table = d.add_table(rows=len(rows), cols=len(rows[0]))
    for i, row in enumerate(rows):
        for j, text in enumerate(row):
            table.rows[i].cells[j].text = text
    path = tmp_path / "ratios.docx"
    d.save(str(path))
    return audit_file(path)


def test_a_table_of_ratios_with_their_cis_is_read_and_checked(tmp_path):
    """Public-health tables give a ratio with its 95% CI in one cell and its p in the next column, crude and adjusted
    side by side. The rows here are BMC Geriatrics 2021, Table 3 (https://bmcgeriatr.biomedcentral.com/articles/
    10.1186/s12877-021-02124-x/tables/3, open access; its footnote letters kept): every ratio read, each paired with the
    p column to its right, and none found to disagree with its p; the last row is this test's own, its two pairs made
    to disagree, and both are found."""
    rows = [("Risk factor", "", "Dependent No. (%)", "Crude ORa (95%CI)", "P valueb", "Adjusted ORa (95%CI)c", "P valued"),
            ("Age (years)", "60–64", "98 (16.6)", "1", "–", "1", "–"),
            ("", "65–69", "191 (20.5)", "1.3 (1.0–1.7)", "0.06", "1.2 (0.9–1.5)", "0.33"),
            ("", "70–74", "95 (25.6)", "1.7 (1.3–2.4)", "0.001", "1.6 (1.1–2.2)", "0.007"),
            ("", "80–84", "39 (27.9)", "1.9 (1.3–3.0)", "0.003", "1.5 (1.0–2.4)", "0.078"),
            ("Sex", "Male", "155 (13.5)", "0.3 (0.3–0.4)", "< 0.001", "0.4 (0.3–0.5)", "< 0.001"),
            ("Diabetes mellitus", "Yes", "204 (25.8)", "1.2 (1.0–1.5)", "0.07", "–", "–"),
            ("This test's own", "row", "1 (1)", "1.6 (1.2–2.1)", "0.40", "2.0 (0.8–5.0)", "0.001")]
    entries = _audited_table(tmp_path, "Table 3 Risk factors of dependency", rows)
    read = {(e.location.split(",")[1].strip(), e.found): e.codes for e in entries}
    assert len(read) == 11  # five real crude ratios, four real adjusted ones, and the test's own two
    assert read[("row 3", "OR = 1.3, 95% CI [1.0, 1.7], p = 0.06")] == []
    assert read[("row 5", "aOR = 1.5, 95% CI [1.0, 2.4], p = 0.078")] == []
    assert [found for (row, found), codes in read.items() if codes] == [
        "OR = 1.6, 95% CI [1.2, 2.1], p = 0.40", "aOR = 2.0, 95% CI [0.8, 5.0], p = 0.001"]
    assert all(codes == ["ci-p-disagree"] for codes in read.values() if codes)
    own = next(e for e in entries if e.found.startswith("OR = 1.6"))
    assert own.suggestion == "OR = 1.6, 95% CI [1.2, 2.1], p = .40"  # the p after the ratio, as the row reads


def test_a_second_real_table_of_ratios_raises_nothing(tmp_path):
    """Scientific Reports 2023, Table 2 (https://www.nature.com/articles/s41598-023-43474-3/tables/2, open access):
    univariable and multivariable ORs with three-decimal CIs and four-decimal p values, some starred; all 20 read,
    none found to disagree with its p (the CIs and p of one logistic regression agree)."""
    rows = [("", "Univariable", "", "Multivariable", ""), ("", "OR (95% CI)", "p value", "OR (95% CI)", "p value"),
            ("Age", "1.017 (1.009–1.026)", "< .0001*", "1.005 (0.992–1.018)", "0.4392"),
            ("Female", "0.778 (0.593–1.021)", "0.0701*", "0.747 (0.533–1.048)", "0.0909"),
            ("Lower middle", "0.976 (0.679–1.402)", "0.8949", "1.22 (0.826–1.804)", "0.3179"),
            ("Upper middle", "0.552 (0.366–0.832)", "0.0045", "0.764 (0.482–1.211)", "0.2521"),
            ("Upper", "0.654 (0.442–0.969)", "0.0342", "0.947 (0.6–1.494)", "0.814"),
            ("High school", "0.635 (0.453–0.892)", "0.0088", "0.848 (0.538–1.338)", "0.4782"),
            ("≥ College or graduate school", "0.484 (0.327–0.716)", "0.0003", "0.731 (0.43–1.243)", "0.2477"),
            ("Drinking", "0.739 (0.559–0.976)", "0.0328*", "0.779 (0.568–1.069)", "0.1215"),
            ("Rural", "1.507 (1.123–2.022)", "0.0062*", "1.198 (0.871–1.648)", "0.2675"),
            ("Yes (3,4)", "1.837 (1.396–2.419)", "< .0001*", "1.391 (1.013–1.912)", "0.0417")]
    entries = _audited_table(tmp_path, "Table 2 Univariable and multivariable logistic regression analyses of the risk factors", rows)
    assert len(entries) == 20
    assert [e.found for e in entries if e.codes] == []
    assert "OR = 1.391, 95% CI [1.013, 1.912], p = 0.0417" in [e.found for e in entries]


def test_a_logistic_models_wald_column_is_read_with_its_df_and_sig(tmp_path):
    """SPSS's "Variables in the Equation" typed into a manuscript (B, S.E., Wald, df, Sig., Exp(B); practice): the Wald
    column is a χ² with the df beside it, its p under Sig., checked against (B / SE)² and its Exp(B) against exp(B).
    Reference: statsmodels' Logit on its bundled spector data (Spector & Mazzeo, 1980), Wald = z², printed to three
    decimals as SPSS prints them; one row's Sig. retyped (.045 for .025), and two rows (named X2 and X3, as predictors
    often are: "X2" is no χ² head there) with a Wald or an Exp(B) that B and SE do not give, are found; the others
    are not."""
    import math

    import statsmodels.api as sm

    spector = sm.datasets.spector.load_pandas().data
    fit = sm.Logit(spector.GRADE, sm.add_constant(spector[["GPA", "TUCE", "PSI"]])).fit(disp=0)
    rows = [["", "B", "S.E.", "Wald", "df", "Sig.", "Exp(B)"]]
    for name in ("GPA", "TUCE", "PSI"):
        b, se, z, p = fit.params[name], fit.bse[name], fit.tvalues[name], fit.pvalues[name]
        rows.append([name, f"{b:.3f}", f"{se:.3f}", f"{z * z:.3f}", "1", f"{p:.3f}".lstrip("0"), f"{math.exp(b):.3f}"])
    rows[3][5] = ".045"  # PSI: Wald 4.990 on 1 df gives p = .0255
    rows.append(["X2", rows[3][1], rows[3][2], "7.990", "1", ".005", rows[3][6]])  # a Wald that is not (B / SE)²
    rows.append(["X3", rows[3][1], rows[3][2], rows[3][3], "1", ".025", "12.790"])  # an Exp(B) that is not exp(B)
    entries = _audited_table(tmp_path, "Table 2\nLogistic regression of the grade on GPA, TUCE and PSI", rows)
    assert [e.found.split(",")[0] for e in entries] == [f"Wald(1) = {row[3]}" for row in rows[1:]]
    assert [e.codes for e in entries] == [[], [], ["p-does-not-follow"], ["coefficient-does-not-fit"], ["coefficient-does-not-fit"]]
    assert "not (B / SE)²" in entries[3].message and "Exp(B) = 12.790 is not exp(B)" in entries[4].message


def _entries(text, style="apa7"):
    return {e.found: e for e in audit_units([Unit("case", text)], style)}


def test_a_bound_shared_by_several_statistics_checks_each():
    """"ps < .05", "all ps < .001", "both p < .01", "p's > .20": one bound for the p of several statistics, as
    psychology papers type it (practice; "all ps < 0.001" dozens of times in Jia et al., 2026, International Journal of
    Human–Computer Interaction, https://doi.org/10.1080/10447318.2026.2622580). Each statistic before it in its
    sentence without a p of its own is checked against it — a summary that one of them contradicts had passed unseen —
    and none of them takes its text (its suggestion still gives its own p). Numbers here are our own; p by scipy."""
    t1, t2 = stats.t.sf(1.10, 38) * 2, stats.t.sf(3.25, 40) * 2  # .278, .002
    assert t1 > .05 > t2
    found = _entries("The groups differed, t(38) = 1.10 and t(40) = 3.25, ps < .05.")
    assert found["t(38) = 1.10"].codes == ["p-does-not-follow", "verdict-changes"] and found["t(40) = 3.25"].codes == []
    assert "reported ps < .05" in found["t(38) = 1.10"].findings[0].evidence
    assert found["t(40) = 3.25"].checked.endswith("against ps < .05")
    # the forms: all, both, each; P's and Ps (AMA's capital); a bound above
    for text in ("t(38) = 1.10 and t(40) = 3.25, all ps < .05.", "t(38) = 1.10 and t(40) = 3.25 (both p < .05).",
                 "t(38) = 1.10 and t(40) = 3.25; all Ps < .05.", "t(38) = 1.10 and t(40) = 3.25, p's < .05."):
        assert "p-does-not-follow" in _entries(text)["t(38) = 1.10"].codes, text
    assert _entries("Neither was, t(38) = 1.10 and t(40) = 0.90, ps > .27.")["t(38) = 1.10"].codes == []
    assert _entries("Neither was, t(38) = 1.10 and t(40) = 3.25, ps > .27.")["t(40) = 3.25"].codes[0] == "p-does-not-follow"


def test_a_shared_bound_reaches_only_its_own_statistics():
    """Only statistics without their own p, in its sentence, before it and after any earlier bound there; a list of
    p's ("ps = .03 and .04") is no bound; a bound with no statistic before it checks nothing."""
    assert _entries("t(38) = 1.10, p = .28, and t(40) = 3.25, ps < .05.")["t(38) = 1.10, p = .28"].codes == []
    assert _entries("The first was t(38) = 1.10. The second, t(40) = 3.25, ps < .05.")["t(38) = 1.10"].codes == []
    split = _entries("t(38) = 2.50 and t(40) = 3.25, ps < .05, whereas t(30) = 0.50 and t(31) = 0.90, ps > .30.")
    assert all(e.codes == [] for e in split.values()) and len(split) == 4
    assert "against ps > .30" in split["t(31) = 0.90"].checked and "against ps < .05" in split["t(38) = 2.50"].checked
    # a list of p's, one for each statistic in order ("ps = .28 and .002, respectively"), gives each its own; a list of
    # another length than the statistics' gives none
    listed = _entries("t(38) = 1.10 and t(40) = 3.25, ps = .28 and .002, respectively.")
    assert listed["t(38) = 1.10"].checked.endswith("against ps = .28") and listed["t(40) = 3.25"].checked.endswith("against ps = .002")
    assert all(e.codes == [] for e in listed.values())
    swapped = _entries("t(38) = 1.10 and t(40) = 3.25, ps = .002 and .28, respectively.")
    assert all("p-does-not-follow" in e.codes for e in swapped.values())
    assert _entries("t(38) = 1.10 and t(40) = 3.25, ps = .28, .002 and .5.")["t(38) = 1.10"].checked == ""
    assert _entries("t(38) = 1.10 and t(40) = 3.25, ps = .28.")["t(38) = 1.10"].checked == ""
    assert [r for r in find_statistics("All ps < .001 (Table 2); see the code: keep = ps > .5") if r.symbol] == []


def test_a_plural_head_is_several_statistics_each_checked():
    """"Fs(1, 38) = 4.41 and 5.20, ps = .042 and .028, respectively", "ts(38) > 2.50, ps < .02": several tests of the
    same df under one plural symbol (practice; "Fs < 1, ps > .44" in a paper's text as stored in a public repository,
    no df). Each value is a statistic of its own with the head's df, checked against its p from the list or
    the shared bound; none is restyled (the sentence's plural has no single-statistic form). A plural without df checks
    nothing; "rs" stays Spearman's. Numbers our own; p by scipy."""
    assert stats.f.sf(4.41, 1, 38) == pytest.approx(.042, abs=.0005) and stats.f.sf(1.20, 1, 38) > .05
    listed = _entries("Both were reliable, Fs(1, 38) = 4.41 and 5.20, ps = .042 and .028, respectively.")
    assert set(listed) == {"Fs(1, 38) = 4.41", "F(1, 38) = 5.20"} and all(e.codes == [] and e.checked for e in listed.values())
    bounded = _entries("Fs(1, 38) = 4.41 and 1.20, ps < .05.")
    assert bounded["F(1, 38) = 1.20"].codes[0] == "p-does-not-follow" and bounded["Fs(1, 38) = 4.41"].codes == []
    # a lower bound on t (two-sided p below p(2.50) = .0169, scipy) checks the p it is given; an upper bound ("t < 1")
    # says nothing of |t| and checks nothing
    assert stats.t.sf(2.50, 38) * 2 == pytest.approx(.0169, abs=.0001)
    assert _entries("ts(38) > 2.50, ps < .02")["ts(38) > 2.50"].codes == []
    assert _entries("ts(38) > 2.50, ps > .30")["ts(38) > 2.50"].codes[0] == "p-does-not-follow"
    assert "p-does-not-follow" in _entries("t(38) > 2.50, p > .30")["t(38) > 2.50, p > .30"].codes
    assert _entries("t(38) < 1, p > .30")["t(38) < 1, p > .30"].checked == ""
    assert _entries("Fs < 1, ps > .44")["Fs < 1"].checked == ""
    (e,) = audit_units([Unit("case", "Fs(1, 38) = 4.41 and 1.20, ps < .05.")], restyle=True)[:1]
    assert e.revision is None
    assert [r.symbol for r in find_statistics("rs(98) = .29, p = .003")] == ["rs"]


def test_a_plural_p_after_one_statistic_is_not_its_own():
    """"F(1, 38) = 0.50 for A, while B and C were significant, ps < .05": one statistic before a plural p — the p's are
    of effects the sentence does not give; the F is not checked against them (it would have been flagged)."""
    (e,) = audit_units([Unit("case", "F(1, 38) = 0.50 for A, while B and C were significant, ps < .05.")])
    assert e.codes == [] and e.checked == ""


def test_one_group_size_given_for_each_group_is_two():
    """"(n = 20 per group)", "(n = 20 each)": one size for each of two groups — the t had been left unchecked (two "n ="
    had been needed); now it is recomputed on 20 + 20 − 2 = 38 df (p by scipy: .042)."""
    assert f"{stats.t.sf(2.10, 38) * 2:.3f}" == "0.042"
    for said in ("n = 20 per group", "n = 20 each", "n = 20 in each condition"):
        (e,) = audit_units([Unit("case", f"Participants ({said}) differed, t = 2.10, p = .042.")])
        assert e.codes == [] and "20 + 20 − 2 = 38" in e.checked, said
        (e,) = audit_units([Unit("case", f"Participants ({said}) differed, t = 2.10, p = .42.")])
        assert "p-does-not-follow" in e.codes, said
    (e,) = audit_units([Unit("case", "Participants (n = 20) improved, t = 2.10, p = .049.")])  # one n, not said per group
    assert e.codes == [] and "over every df it may have" in e.checked  # (no df from the one n)


def test_statas_prob_heads_a_p_not_an_f():
    """Stata heads a model test's p "Prob > F" and "Prob > chi2" (its regress output on the hsbdemo data, as
    philender.com/courses/linearmodels/notes1/publish.html reprints it: "F( 5, 194) = 42.68 … Prob > F = 0.0000"); pasted
    into a thesis, the F inside it had been read as a statistic "F = 0.0000" with style findings of its own, and the
    model's F had no p. Now the pair is one p (a zero: p-zero), the F's own; a wrong p beside its F is still found."""
    text = "The model fitted well, F(5, 194) = 42.68, Prob > F = 0.0000, R-squared = 0.5238."
    (rep,) = [r for r in find_statistics(text) if r.symbol is not None]
    assert rep.symbol == "F" and rep.value.value == 42.68 and rep.p.op == "=" and rep.p.number.value == 0
    (entry,) = audit_units([Unit("line 1", text)])
    assert "p-zero" in entry.codes and entry.suggestion.startswith("F(5, 194) = 42.68, p < .001")
    wrong = f"LR chi2(3) = 7.42, Prob > chi2 = {C / 10:.4f}"  # a tenth of the χ²'s own p
    (entry,) = audit_units([Unit("line 1", wrong)])
    assert entry.found.startswith("chi2(3) = 7.42") and "p-does-not-follow" in entry.codes
    right = f"LR chi2(3) = 7.42, Prob > chi2 = {C:.4f}"
    (entry,) = audit_units([Unit("line 1", right)])
    assert "p-does-not-follow" not in entry.codes and "leading-zero" in entry.codes  # (APA: a p has no leading zero)


def test_a_reliabilitys_alpha_and_a_significance_level():
    """Cronbach's α is read (it had not been): a reliability cannot exceed 1, so APA 7 writes it without a leading zero
    (§6.36) and AMA 11 with one (memory); the significance level α likewise has none in APA. The typing "Cronbach’s α =
    0.77" is Evid Based Complement Alternat Med 2013, article 152727 (its abstract); the values are pingouin's
    cronbach_alpha on its bundled "cronbach_alpha" data (α = 0.59, 95% CI [0.195, 0.84]). An α alone is a reliability
    only where the paragraph speaks of reliability, scales or items and no α in it exceeds 1 (an item response model's
    discrimination α may), and a level only at .10 or below where it speaks of significance."""
    import pingouin as pg

    data = pg.read_dataset("cronbach_alpha")
    alpha, (low, high) = pg.cronbach_alpha(data.pivot(index="Subj", columns="Items", values="Scores"))
    typed = "The exploratory factor analysis yielded a one-factor solution explaining 51.96% of total variance (Cronbach’s α = 0.77)."
    (entry,) = audit_units([Unit("line 1", typed)])
    assert entry.found == "Cronbach’s α = 0.77" and entry.codes == ["leading-zero"] and entry.suggestion == "Cronbach’s α = .77"
    ours = f"The ten items formed a scale of modest reliability, Cronbach's alpha = {alpha:.2f}, 95% CI [{low:.2f}, {high:.2f}]."
    (entry,) = audit_units([Unit("line 1", ours)])
    assert entry.codes == ["leading-zero"] and entry.suggestion == f"Cronbach's α = {alpha:.2f}, 95% CI [{low:.2f}, {high:.2f}]".replace("0.", ".")
    (entry,) = audit_units([Unit("line 1", ours.replace(f"{high:.2f}]", "0.50]"))])  # an interval that leaves out its α
    assert "ci-excludes-estimate" in entry.codes
    (entry,) = audit_units([Unit("line 1", ours.replace("0.", "."))], style="ama11")
    assert entry.codes == ["missing-leading-zero"]
    (entry,) = audit_units([Unit("line 1", "The internal consistency of the scale was adequate (α = 1.19).".replace("α", "Cronbach's α"))])
    assert "impossible" in " ".join(entry.codes)
    level = [e for e in audit_units([Unit("line 1", "Significance was set at α = .05, and at alpha = 0.001 for the secondary tests.")])]
    assert [e.codes for e in level] == [[], ["leading-zero"]] and level[1].suggestion == ""
    assert audit_units([Unit("line 1", "The discrimination of the items ranged from α = 0.8 to α = 2.1.")]) == []
    assert audit_units([Unit("line 1", "The smoothing weight was α = 0.3 throughout.")]) == []


def test_ama_writes_cronbach_alpha_without_the_possessive():
    """AMA 11 drops possessive eponyms ("Cronbach α", memory; docs/reporting-rules.md) and keeps the zero before a
    reliability: a revision to it writes "Cronbach α = 0.81" for "Cronbach's alpha = .81"."""
    (entry,) = audit_units([Unit("line 1", "Reliability was acceptable (Cronbach's alpha = .81).")], style="ama11")
    assert entry.codes == ["missing-leading-zero"] and entry.suggestion == "Cronbach α = 0.81"


def test_a_tests_own_interval_is_kept_in_the_suggestion_and_the_revision():
    """A t with its interval of the difference and no effect size beside it ("t(331) = 6.67, p < .001, 95% CI [2.53,
    4.66]"): the restyled text had dropped the interval (the style's form of a t has no place for it) — a suggestion
    copied over would have lost it — and a revision had been refused for the word "CI". Now the interval follows the p
    in the style's way (APA's ", 95% CI [a, b]", AMA's " (95% CI, a-b)"). Numbers: pingouin's Student t test of
    the penguins' bill length by sex (its bundled data), its CI95% of the difference."""
    import pingouin as pg

    data = pg.read_dataset("penguins")
    male, female = (data[data.sex == s].bill_length_mm.dropna() for s in ("male", "female"))
    row = pg.ttest(male, female, correction=False).iloc[0]
    low, high = row["CI95%"] if "CI95%" in row else row["CI95"]
    typed = f"Males had longer bills, t({row['dof']:.0f})={row['T']:.2f}, p<0.001, 95% CI [{low:.2f}, {high:.2f}]."
    (entry,) = audit_units([Unit("line 1", typed)], restyle=True)
    interval = f"95% CI [{low:.2f}, {high:.2f}]"
    assert entry.suggestion == f"t({row['dof']:.0f}) = {row['T']:.2f}, p < .001, {interval}"
    assert entry.revision is not None and entry.revision.plain().replace("\u00a0", " ").endswith(interval)
    (entry,) = audit_units([Unit("line 1", typed)], style="ama11")
    assert entry.suggestion.endswith(f"P < .001 (95% CI, {low:.2f}-{high:.2f})")
    wrong = typed.replace(f"[{low:.2f}", f"[{-low:.2f}")  # an interval that holds 0 beside p < .001
    (entry,) = audit_units([Unit("line 1", wrong)])
    assert "ci-p-disagree" in entry.codes  # (the interval is still held to the p)


def test_a_tests_own_interval_keeps_what_it_is_of():
    """"95% CI for the difference [−0.10, 4.20], d = 0.68": restyled, the interval keeps its label, so that it is not
    read as the d's after it (a typing of this test's own, as labelled intervals are typed: practice)."""
    typed = "Scores rose, t(38) = 2.14, p = .039, 95% CI for the difference [-0.10, 4.20], d = 0.68."
    (entry,) = audit_units([Unit("line 1", typed)])
    assert entry.suggestion == "t(38) = 2.14, p = .039, 95% CI for the difference [−0.10, 4.20], d = 0.68"


def test_a_prevalence_ratio_is_read_as_a_ratio():
    """A prevalence ratio, "PR" (as cross-sectional studies name it: Rev Saude Publica 2008, "Methods for estimating
    prevalence ratios in cross-sectional studies", its abstract's "prevalence ratio (PR)"; "adjusted PR"), is a ratio
    like OR and RR: its interval holds it and agrees with the p about 1 (it had not been read; the p stood alone).
    Numbers: statsmodels' Poisson model with robust (HC0) variance of GRADE on PSI in its spector data."""
    import numpy as np
    import statsmodels.api as sm

    data = sm.datasets.spector.load_pandas().data
    fit = sm.GLM(data["GRADE"], sm.add_constant(data[["PSI"]]), family=sm.families.Poisson()).fit(cov_type="HC0")
    pr, (low, high), p = np.exp(fit.params["PSI"]), np.exp(fit.conf_int().loc["PSI"]), fit.pvalues["PSI"]
    typed = f"The prevalence was higher with the new method (PR = {pr:.2f}; 95% CI: {low:.2f}–{high:.2f}; p = {p:.3f})."
    (entry,) = audit_units([Unit("line 1", typed)])
    assert entry.found.startswith(f"PR = {pr:.2f}; 95% CI") and not {"ci-p-disagree", "ci-excludes-estimate"} & set(entry.codes)
    (entry,) = audit_units([Unit("line 1", typed.replace(f"p = {p:.3f}", "p = .320"))])  # the interval excludes 1
    assert "ci-p-disagree" in entry.codes
    (entry,) = audit_units([Unit("line 1", f"The adjusted PR = {high + 1:.2f} (95% CI {low:.2f}-{high:.2f}) held.")])
    assert "ci-excludes-estimate" in entry.codes and entry.found.startswith("adjusted PR")
    (entry,) = audit_units([Unit("line 1", f"The adjusted PR = {pr:.2f} (95% CI {low:.2f}-{high:.2f}) held.")], restyle=True)
    assert entry.revision is not None and entry.revision.plain().startswith("aPR = ")  # ("PR" is the ratio's own name, not a lost word)


# Quotations of published sentences in BMJ Evidence-Based Medicine's "Example uses of ORs" (its Table 2; ebm.bmj.com)
_OR_QUOTES = ("This represented a 53% reduction in the risk of coronary heart disease among carriers of inactivating NPC1L1 mutations "
              "(odds ratio for disease among carriers, 0.47; 95% confidence interval [CI], 0.25 to 0.87; P=0.008).")


def test_a_ratio_named_with_a_few_words_before_its_number():
    """"odds ratio for disease among carriers, 0.47; 95% CI, 0.25 to 0.87" (a quotation above) and "the relative risk of
    readmission was 0.78 (95% CI, …)": a ratio's name, up to four words, then "was" or a comma and its number, is read
    with its interval and p (the ratio had not been read; the p stood alone). More words, or a number among them, are
    not read so."""
    (entry,) = audit_units([Unit("line 1", _OR_QUOTES)])
    assert entry.found.startswith("odds ratio for disease among carriers, 0.47; 95% confidence interval")
    assert entry.suggestion == "OR = 0.47, 95% CI [0.25, 0.87], p = .008"
    (entry,) = audit_units([Unit("line 1", _OR_QUOTES.replace("0.25 to 0.87", "0.55 to 0.87"))])  # the ratio below its interval
    assert "ci-excludes-estimate" in entry.codes
    (entry,) = audit_units([Unit("line 1", "The relative risk of readmission was 0.78 (95% CI, 0.65 to 1.04; P = .009).")])
    assert entry.found.startswith("relative risk of readmission was 0.78") and "ci-p-disagree" in entry.codes
    for far in ("The hazard ratio for death in the year 2019 was 1.20 (95% CI 1.01-1.43).",
                "The odds ratio for the association between sleep and mood in the full sample was 1.40 (95% CI 1.1-1.8)."):
        assert not any(e.found.startswith(("hazard", "odds")) for e in audit_units([Unit("line 1", far)]))


def test_spss_sig_in_prose_is_a_p():
    """SPSS labels a p "Sig." ("Look at the column labelled Sig.", the SAGE companion to Field's textbook,
    studysites.sagepub.com/field4e, chapter 9), and theses paste it into sentences: "t = 2.14, df = 38, Sig. (2-tailed) =
    .039", "F(2, 97) = 4.51, Sig. = .013", "Asymp. Sig. (2-sided) = .040" (practice). Each is read as the statistic's p
    (had been read as nothing: the statistic went unchecked, and "Sig." stood for a sentence's end), and the style's p is
    suggested; "Sig" without SPSS's period is not read. Numbers: scipy's Student t test on the penguins' bill lengths
    by sex (pingouin's bundled data) and a wrong p beside it."""
    import pingouin as pg
    from scipy import stats as st

    data = pg.read_dataset("penguins")
    male, female = (data[data.sex == s].bill_length_mm.dropna() for s in ("male", "female"))
    res = st.ttest_ind(male, female)
    df = len(male) + len(female) - 2
    typed = f"Males had longer bills, t = {res.statistic:.2f}, df = {df}, Sig. (2-tailed) = .000."
    (entry,) = audit_units([Unit("line 1", typed)])
    assert entry.found.endswith("Sig. (2-tailed) = .000") and {"p-zero", "p-symbol"} <= set(entry.codes)
    assert entry.suggestion.startswith(f"t({df}) = {res.statistic:.2f}, p < .001")
    wrong = f"Levene's test aside, F(2, 97) = {st.f.isf(0.013, 2, 97):.2f}, Sig. = .130."  # F's p is .013
    (entry,) = audit_units([Unit("line 1", wrong)])
    assert "p-does-not-follow" in entry.codes and entry.suggestion.endswith("p = .013 (p recomputed)")
    assert [e.found for e in audit_units([Unit("line 1", "Signs = 3 were seen; Sig = 5 of them.")])] == []


def test_a_ratio_after_another_ratios_p_is_a_statistic_of_its_own():
    """"(OR = …, 95% CI …, p = …), and the adjusted OR = … (95% CI …)": the second ratio had been read into the first's
    statistic (their names differ), so its suggestion put the first's p after both. A ratio after the p that closed a
    ratio's cluster now starts a statistic of its own (JMIR's "(P=.50; OR 2.72, …)", p first, keeps its one statistic).
    Numbers: statsmodels' logit of GRADE on PSI in its spector data, alone and with GPA and TUCE."""
    import numpy as np
    import statsmodels.api as sm

    data = sm.datasets.spector.load_pandas().data
    crude = sm.Logit(data["GRADE"], sm.add_constant(data[["PSI"]])).fit(disp=0)
    adjusted = sm.Logit(data["GRADE"], sm.add_constant(data[["GPA", "TUCE", "PSI"]])).fit(disp=0)
    (c_low, c_high), (a_low, a_high) = (np.exp(m.conf_int().loc["PSI"]) for m in (crude, adjusted))
    text = (f"Grades improved with the new method (OR = {np.exp(crude.params['PSI']):.2f}, 95% CI {c_low:.2f}–{c_high:.2f}, "
            f"p = {crude.pvalues['PSI']:.3f}), and the adjusted OR = {np.exp(adjusted.params['PSI']):.2f} "
            f"(95% CI {a_low:.2f}-{a_high:.2f}).")
    first, second = audit_units([Unit("line 1", text)], suggest_all=True)
    assert first.found.startswith("OR = ") and first.found.endswith(f"p = {crude.pvalues['PSI']:.3f}")
    assert second.found.startswith("adjusted OR") and second.suggestion.startswith("aOR = ") and ", p " not in second.suggestion


def test_cohens_f_and_f_squared_are_held_to_their_f():
    """Cohen's f and f² (Cohen, 1988; memory for the book, the definitions are the trade's): f² = F·df₁/df₂ for the
    partial effect (a regression's R²/(1 − R²) for its model's F), smaller otherwise; so an f² above F·df₁/df₂ (or an f
    above its root) cannot be the F's. They had not been read. They can exceed 1: a leading zero in APA. Numbers:
    statsmodels' OLS of its bundled stack loss data (its R² and F), and pingouin's one-way ANOVA of its penguins data."""
    import pingouin as pg
    import statsmodels.api as sm
    import statsmodels.formula.api as smf

    fit = smf.ols("STACKLOSS ~ AIRFLOW + WATERTEMP + ACIDCONC", sm.datasets.stackloss.load_pandas().data).fit()
    f2 = fit.rsquared / (1 - fit.rsquared)
    text = f"F({fit.df_model:.0f}, {fit.df_resid:.0f}) = {fit.fvalue:.2f}, p < .001, R² = {fit.rsquared:.2f}, f² = {f2:.2f}".replace("= 0.", "= .")
    (entry,) = audit_units([Unit("line 1", text)])
    assert entry.found.endswith(f"f² = {f2:.2f}") and entry.codes == []
    (entry,) = audit_units([Unit("line 1", text.replace(f"f² = {f2:.2f}", f"f² = {2 * f2 + 1:.2f}"))])
    assert "effect-does-not-fit" in entry.codes
    aov = pg.anova(data=pg.read_dataset("penguins"), dv="bill_length_mm", between="species", detailed=True)
    row = aov.iloc[0]
    f = (row["np2"] / (1 - row["np2"])) ** 0.5
    typed = f"F({row['DF']:.0f}, {aov.iloc[1]['DF']:.0f}) = {row['F']:.2f}, p < .001, Cohen's f = {f:.2f}"
    (entry,) = audit_units([Unit("line 1", typed)])
    assert entry.codes == []
    (entry,) = audit_units([Unit("line 1", typed.replace(f"f = {f:.2f}", f"f = {f + 0.5:.2f}"))])
    assert "effect-does-not-fit" in entry.codes and "f at most" in entry.message
    (entry,) = audit_units([Unit("line 1", "A power analysis assumed Cohen’s f² = .15.")])
    assert entry.codes == ["missing-leading-zero"] and entry.suggestion == "Cohen’s f² = 0.15"


def test_a_meta_analysis_i_squared_is_held_to_its_q():
    """I² = 100% × (Q − df)/Q, negative values set to 0 (Higgins & Thompson, 2002; the definition as an open article
    restates it, pubcompare.ai's protocol EZ3FHJMBdNj1hjtA878_), beside its Q (or χ², as RevMan's forest plots print
    "Chi² = …, df = … (P = …); I² = …%", practice). I² had not been read. Numbers: statsmodels' DerSimonian–Laird
    combination of the sex difference in flipper length within each species and island of pingouin's penguins data."""
    import numpy as np
    import pingouin as pg
    from scipy import stats as st
    from statsmodels.stats.meta_analysis import combine_effects, effectsize_smd

    data = pg.read_dataset("penguins").dropna(subset=["sex"])
    effects, variances = [], []
    for _, g in data.groupby(["species", "island"]):
        m, f = (g[g.sex == s]["flipper_length_mm"].dropna() for s in ("male", "female"))
        e, v = effectsize_smd(m.mean(), m.std(), len(m), f.mean(), f.std(), len(f))
        effects.append(e)
        variances.append(v)
    res = combine_effects(np.array(effects), np.array(variances), method_re="dl")
    df = res.k - 1
    text = f"Heterogeneity was substantial, Q({df}) = {res.q:.2f}, p = {st.chi2.sf(res.q, df):.3f}, I² = {100 * res.i2:.0f}%.".replace("= 0.", "= .")
    (entry,) = audit_units([Unit("line 1", text)], restyle=True)
    assert entry.found.endswith(f"I² = {100 * res.i2:.0f}%") and entry.codes == [] and entry.revision is None
    (entry,) = audit_units([Unit("line 1", text.replace(f"{100 * res.i2:.0f}%", f"{100 * res.i2 / 2:.0f}%"))])
    assert entry.codes == ["effect-does-not-fit"] and "(Q − df)/Q" in entry.message
    revman = f"Heterogeneity: Chi² = {res.q:.2f}, df = {df} (P = {st.chi2.sf(res.q, df):.3f}); I² = {100 * res.i2:.0f}%"
    (entry,) = audit_units([Unit("line 1", revman)])
    assert "effect-does-not-fit" not in entry.codes and "p-does-not-follow" not in entry.codes


def test_ama_drops_a_curly_possessive_too():
    """AMA 11 writes eponyms without the possessive ("Cronbach α", "Welch t test"; docs/reporting-rules.md, memory); the
    styles' own symbols type the apostrophe curly ("Cliff’s d", "Cohen’s f"), which the rule had missed, so an AMA
    suggestion kept "Cliff’s". Straight and curly are both dropped now; APA keeps both."""
    (entry,) = audit_units([Unit("line 1", "U = 45, p = .20, Cliff’s d = .11")], style="ama11", suggest_all=True)
    assert entry.suggestion.endswith("Cliff d = 0.11")
    (entry,) = audit_units([Unit("line 1", "F(3, 116) = 2.89, p = .04, Cohen's f = 0.27")], style="ama11", suggest_all=True)
    assert entry.suggestion.endswith("Cohen f = 0.27")
    (entry,) = audit_units([Unit("line 1", "U = 45, p = .20, Cliff’s d = .11")], suggest_all=True)
    assert entry.suggestion.endswith("Cliff’s d = .11")


def test_an_adjusted_ratio_at_a_sentences_start():
    """"Adjusted OR = …" opening a sentence (practice) is the adjusted ratio, as "adjusted OR" within one is (it had been
    read as a plain OR after the word). Numbers: statsmodels' logit of GRADE on GPA, TUCE and PSI in its spector data."""
    import numpy as np
    import statsmodels.api as sm

    data = sm.datasets.spector.load_pandas().data
    fit = sm.Logit(data["GRADE"], sm.add_constant(data[["GPA", "TUCE", "PSI"]])).fit(disp=0)
    low, high = np.exp(fit.conf_int().loc["PSI"])
    text = f"Adjusted OR = {np.exp(fit.params['PSI']):.2f} (95% CI {low:.2f}–{high:.2f}) for the new method."
    (entry,) = audit_units([Unit("line 1", text)], suggest_all=True)
    assert entry.found.startswith("Adjusted OR") and entry.suggestion.startswith("aOR = ")


def test_a_statistic_given_in_words_with_its_df_or_p():
    """A statistic named in words — "an F of 3.6 with 2 and 9 df", "the t-value of 2.31 (df = 45, …)", "a chi-square
    value of 12.4 with 2 degrees of freedom" — had not been read (nor df spelled out as "degrees of freedom"): a p after
    it was checked against nothing. Now it is read where its df or p follow, the operator a word ("of", "was", "is",
    "equals", "equalled"), the symbol named as a value or statistic, spelled out, or after an article. Sources: HyperStat
    (David Lane's open textbook; davidmlane.com/hyperstat/B88533.html and B119422.html), as printed; the rest are
    typings of the trade (practice), their numbers from scipy."""
    hyperstat = {"An F table can be used to compute that the probability value for an F of 3.6 with 2 and 9 df is 0.071.": ((2, 9), 3.6, 0.071),
                 "For the interaction, the probability value associated with an F of 5.783 with 2 and 42 df is 0.006.": ((2, 42), 5.783, 0.006)}
    for text, (df, value, p) in hyperstat.items():
        assert round(stats.f.sf(value, *df), 3) == p  # (the textbook's p, from its F and df)
        (rep,) = find_statistics(text)
        assert rep.symbol == "F" and tuple(d.value for d in rep.df) == df and rep.value.value == value
    # worded, each with its df or p: read and checked (scipy: t(45) = 2.31 gives .0255; χ²(2) = 12.4, .0020; F(2, 97) = 4.51,
    # .0134; F(2, 40) = 3.10, .056 — not .20)
    assert round(2 * stats.t.sf(2.31, 45), 3) == 0.026 and round(stats.chi2.sf(12.4, 2), 3) == 0.002
    assert round(stats.f.sf(4.51, 2, 97), 3) == 0.013 and round(stats.f.sf(3.10, 2, 40), 3) == 0.056
    clean = ["The t-value of 2.31 (df = 45, p = .03) was significant.",
             "A chi-square value of 12.4 with 2 degrees of freedom (p = .002) was found.",
             "The F statistic equalled 4.51 with 2 and 97 df, p = .013.",
             "A significant t of 2.31 on 45 df was found (p = .03).",
             "The scores differed, t = 2.31 with 45 degrees of freedom, p = .03."]
    for text in clean:
        (entry,) = audit_units([Unit("s", text)])
        assert entry.checked.startswith("p recomputed from") and "p-does-not-follow" not in entry.codes, (text, entry.checked, entry.codes)
    (wrong,) = audit_units([Unit("s", "An F value of 3.10 with 2 and 40 degrees of freedom was not significant (p = .20).")])
    assert wrong.codes == ["p-does-not-follow"] and "F(2, 40) = 3.10" in wrong.checked
    # not a reported statistic: a letter in prose, a value spoken of without df or p, a significance level called a
    # "chi square" (chnm.gmu.edu/survey/sig.html, as printed)
    for text in ["Part F of 12 items was scored first; item t of 3 sections, p = .04.", "The t value was large, and a z-value of 2 is none.",
                 "Among statisticians a chi square of .05 is a conventionally accepted threshold of statistical significance."]:
        assert [r.symbol for r in find_statistics(text) if r.symbol is not None] == [], text


def test_a_critical_value_at_a_level_is_no_result():
    """Theses that test by the table state the critical value with its level beside its df ("χ2(0.05, 2) = 5.99", "t(.05,
    49) = 2.01"; practice): it had been read as a statistic with a df of 0.05 — an error, df-not-integer — or with a df
    it does not have. No df is below 1, so a head holding such a level and a whole df is a critical value, not read;
    the computed statistic beside it still is. The values are scipy's critical values."""
    assert f"{stats.chi2.isf(0.05, 2):.2f}" == "5.99" and f"{stats.t.isf(0.025, 49):.2f}" == "2.01"
    text = "Since the computed χ2(2) = 8.86, p = .012, exceeds χ2(0.05, 2) = 5.99, and t(.05, 49) = 2.01 is below the t found, the null hypothesis was rejected."
    entries = audit_units([Unit("s", text)])
    assert [e.found for e in entries] == ["χ2(2) = 8.86, p = .012"] and entries[0].codes == [], [(e.found, e.codes) for e in entries]
    # (a corrected df below a whole one is no level: Greenhouse–Geisser's ε(k − 1) is 1 at least, with k > 2 groups)
    assert [r.symbol for r in find_statistics("F(1.52, 40.3) = 5.10, p = .017")] == ["F"]


def test_a_p_in_words_within_its_statistics_clause():
    """A p given in words after its statistic — "with a p-value of .0005", "the p-value was less than 0.05", "P value is
    < .05" (practice) — had not been read: the statistic stood without its p. Now it is, in the statistic's clause only:
    alone, "a p-value of .05 was taken as significant" is the level, not a result. Numbers from scipy: t(18) = 4.24
    gives p = .00049; F(2, 40) = 3.10 gives .056, so "less than 0.05" changes the decision."""
    assert round(2 * stats.t.sf(4.24, 18), 5) == 0.00049 and round(stats.f.sf(3.10, 2, 40), 3) == 0.056
    (clean,) = audit_units([Unit("s", "The difference was significant, t(18) = 4.24, with a p-value of .0005.")])
    assert clean.found == "t(18) = 4.24, with a p-value of .0005" and "p-does-not-follow" not in clean.codes
    (wrong,) = audit_units([Unit("s", "The groups differed, F(2, 40) = 3.10, and the p-value was less than 0.05.")])
    assert {"p-does-not-follow", "verdict-changes"} <= set(wrong.codes) and "reported p < 0.05" in wrong.message
    (bound,) = audit_units([Unit("s", "The association held, χ2(2) = 12.4, P value is < .05.")])
    assert "p-does-not-follow" not in bound.codes and "p-threshold" in bound.codes  # (p = .002: an exact p, not a bound, is wanted)
    for level in ("A p-value of .05 was taken as significant.", "Significance was set at a p-value of less than 0.05 for all tests."):
        assert audit_units([Unit("s", level)]) == [], level


def test_statas_p_as_its_output_prints_it():
    """Stata prints a tabulation's χ² with "Pr" for its p — "Pearson chi2(2) = 16.6563   Pr = 0.000", as Stata's own page
    on its tabi command shows for the table 280 14 / 150 16 / 59 14 (stata.com/links/stata-basics/crosstabs-chisquare-
    tests-calculator) —, its t test's two-sided p as "Pr(|T| > |t|) =" beside the one-sided "Pr(T < t)" and "Pr(T > t)",
    and its rank-sum test's as "Prob > |z| =" (practice: Stata's output layout). None of these p's had been read; now
    each is its statistic's p, checked (scipy: 16.6563 is the table's Pearson χ²; t(18) = 2.1009 gives p = .0500) — a p
    printed 0.000 is the p-zero warning, a one-sided Pr not read as the test's."""
    from scipy.stats import chi2_contingency

    assert f"{chi2_contingency([[280, 14], [150, 16], [59, 14]], correction=False)[0]:.4f}" == "16.6563"
    (tab,) = audit_units([Unit("s", "Pearson chi2(2) =  16.6563   Pr = 0.000")])
    assert tab.found == "chi2(2) =  16.6563   Pr = 0.000" and "p-zero" in tab.codes and "p-does-not-follow" not in tab.codes
    assert f"{2 * stats.t.sf(2.1009, 18):.4f}" == "0.0500"
    ttest = "t = 2.1009, degrees of freedom = 18; Pr(T < t) = 0.9750   Pr(|T| > |t|) = 0.0500   Pr(T > t) = 0.0250"
    (t,) = audit_units([Unit("s", ttest)])
    assert t.checked.startswith("p recomputed from t(18) = 2.1009") and "p-does-not-follow" not in t.codes and "Pr(|T| > |t|) = 0.0500" in t.found
    (wrong,) = audit_units([Unit("s", ttest.replace("Pr(|T| > |t|) = 0.0500", "Pr(|T| > |t|) = 0.0250"))])
    assert "one-sided" in wrong.codes  # (the one-sided p typed as the two-sided)
    (z,) = audit_units([Unit("s", "z = 2.620, Prob > |z| = 0.0088")])
    assert z.checked.startswith("p recomputed from z = 2.620") and "p-does-not-follow" not in z.codes
