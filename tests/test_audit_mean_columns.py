"""A table's group means and SDs beside a t, typed otherwise than "M ± SD": "M (SD)" in one cell where the table says its
cells are means and SDs, the mean and SD in columns of their own ("Mean | (SD) | Mean | (SD)"), and each group's n in
a column of its own beside them ("M | SD | n"); the t held to them as tests/test_audit_context.py holds a "±" table's.
On a published table, a published teaching example and random tables; the truth computed here with scipy."""

from __future__ import annotations

import random

import pytest
from scipy import stats

from statsetter.audit.report import audit_file


def _audit(tmp_path, text: str):  # type: ignore[no-untyped-def]
    path = tmp_path / "t.md"
    path.write_text(text, encoding="utf-8")
    return audit_file(path)


# Pediatrics, Table 3, "Neurocognitive Test Results for the Study and Control Groups" (18 children each), as published
# (https://pediatrics.aappublications.org/highwire/markup/76206/expansion); the page's copy runs "Mean(SD)" together, so
# both layouts a manuscript may have — the SD in a column of its own, or in the mean's cell — are tested
_PEDIATRICS = [
    ("Similarities (WISC–R)", "9.1", "2.0", "10.9", "1.7", "2.9", ".007"),
    ("General comprehension (WISC–R)", "8.7", "2.0", "10.8", "1.6", "−3.3", ".003"),
    ("Reading comprehension", "2.9", "2.4", "3.4", "1.9", "−0.6", "NS"),
    ("Auditory (digit span, WISC–R)", "8.3", "2.4", "10.4", "2.6", "−2.4", ".019"),
    ("Visual (Benton's Visual Retention)", "11.9", "2.4", "11.9", "2.7", "0.0", "NS"),
    ("Visual-motor-spatial block design (WISC–R)", "10.5", "2.4", "11.2", "2.3", "−0.9", "NS"),
    ("Visual-motor integration (Beery)", "37.9", "7.1", "37.4", "10.2", "0.2", "NS"),
    ("Dominant hand", "14.7", "2.3", "15.2", "2.1", "−0.7", "NS"),
    ("Nondominant hand", "13.8", "1.9", "14.0", "1.2", "0.4", "NS"),
    ("Both hands", "11.8", "1.6", "11.9", "1.7", "−0.2", "NS"),
    ("Assembly", "33.3", "9.4", "36.5", "6.2", "−1.2", "NS"),
]
_CAPTION = "Table 3. Neurocognitive Test Results for the Study and Control Groups\n\n"
_NOTE = "\nAbbreviations: SD, standard deviation; NS, not significant; WISC–R, Wechsler Intelligence Scale for Children–Revised.\n"


def _pediatrics(layout: str, t_of: "dict[str, str] | None" = None) -> str:
    t_of = t_of or {}
    if layout == "columns":
        lines = ["| Function | Study Group (n = 18) | | Control Group (n = 18) | | t Test | |", "|---|---|---|---|---|---|---|",
                 "| | Mean | (SD) | Mean | (SD) | t | P |"]
        lines += [f"| {f} | {m1} | ({s1}) | {m2} | ({s2}) | {t_of.get(f, t)} | {p} |" for f, m1, s1, m2, s2, t, p in _PEDIATRICS]
    else:
        lines = ["| Function | Study Group (n = 18) Mean (SD) | Control Group (n = 18) Mean (SD) | t | P |", "|---|---|---|---|---|"]
        lines += [f"| {f} | {m1} ({s1}) | {m2} ({s2}) | {t_of.get(f, t)} | {p} |" for f, m1, s1, m2, s2, t, p in _PEDIATRICS]
    return _CAPTION + "\n".join(lines) + "\n" + _NOTE


@pytest.mark.parametrize("layout", ["columns", "cell"])
def test_a_published_tables_means_in_columns_of_their_own_or_in_parentheses(tmp_path, layout):
    entries = _audit(tmp_path, _pediatrics(layout))
    assert len([e for e in entries if e.found.startswith("t = ")]) == 11
    # every t follows from its groups' means and SDs (scipy, Student's test: 2.91 for the first row) ...
    assert round(stats.ttest_ind_from_stats(9.1, 2.0, 18, 10.9, 1.7, 18)[0], 2) == -2.91
    assert not [e for e in entries if "means-do-not-fit" in e.codes]
    # ... and one p does not follow from its t: t(34) = 2.4 gives p .0196 to .0247 (2.35 to 2.45), printed .019
    flagged = [e.found for e in entries if "p-does-not-follow" in e.codes]
    assert flagged == ["t = −2.4, p = .019"]
    assert 0.0195 < 2 * stats.t.sf(2.45, 34) < 0.0197
    # a t moved off its means (2.9 typed 1.9) is found, and said with the cells it is held to
    moved = _audit(tmp_path, _pediatrics(layout, {"Similarities (WISC–R)": "1.9"}))
    finding = next(e for e in moved if e.found.startswith("t = 1.9"))
    assert "means-do-not-fit" in finding.codes and "9.1 (2.0) vs 10.9 (1.7)" in finding.message


# "Reporting Statistical Outcomes", an open teaching text (https://docest.com/doc/104882/1-reporting-results-for-one-sample-t-test),
# Table 3, "Results of t-tests and Descriptive Statistics SAT Verbal, SAT Math, and GPA by Sex": each group's M, SD and n in
# columns of their own (its first two rows)
_SAT = """Table 3: Results of t-tests and Descriptive Statistics SAT Verbal, SAT Math, and GPA by Sex

| Outcome | Male | | | Female | | | 95% CI for Mean Difference | | |
|---|---|---|---|---|---|---|---|---|---|
| | M | SD | n | M | SD | n | | t | df |
| SAT-Verbal | 463.81 | 98.89 | 45 | 532.21 | 101.23 | 44 | -110.56, -26.24 | -3.22* | 87 |
| SAT-Math | 515.43 | 99.56 | 44 | 483.31 | 98.97 | 44 | -9.95, 74.20 | 1.52 | 86 |

* p < .05.
"""


def test_each_groups_n_in_a_column_of_its_own(tmp_path):
    assert round(stats.ttest_ind_from_stats(463.81, 98.89, 45, 532.21, 101.23, 44)[0], 2) == -3.22
    assert round(stats.ttest_ind_from_stats(515.43, 99.56, 44, 483.31, 98.97, 44)[0], 2) == 1.52
    assert not [e for e in _audit(tmp_path, _SAT) if e.codes]
    moved = _audit(tmp_path, _SAT.replace("| -3.22* |", "| -2.22* |"))
    assert "means-do-not-fit" in moved[0].codes and "n = 45, 44" in moved[0].message


def test_a_t_chi_column_reads_a_mean_rows_value_as_a_t(tmp_path):
    """A "t/χ2" column is χ² in a row of counts and t elsewhere: a row whose label says it gives means and SDs ("Age, mean
    (SD) | 41 (13.21) | 38 (17.57)") is no row of counts, though its cells look like "n (%)" ones (before, its t was read
    as a χ² without df, and a negative t as an impossible χ²)."""
    t, p = stats.ttest_ind_from_stats(41, 13.21, 107, 38, 17.57, 190)
    text = f"""Table 2 Outcomes by group

| Variable | Control (n = 107) | Treatment (n = 190) | t/χ2 | P |
|---|---|---|---|---|
| Age, mean (SD) | 41 (13.21) | 38 (17.57) | {t:.2f} | {p:.3f} |
| Score, mean (SD) | 15 (7.73) | 23 (12.49) | -6.01 | < .001 |
| Smoker, n (%) | | | 0.79 | 0.374 |
| Yes | 20 (18.7) | 28 (14.7) | | |
| No | 87 (81.3) | 162 (85.3) | | |
"""
    entries = _audit(tmp_path, text)
    assert [e.found.split(" = ")[0] for e in entries] == ["t", "t", "χ²"]
    assert not [e for e in entries if e.codes]
    assert round(stats.chi2_contingency([[20, 87], [28, 162]], correction=False)[0], 2) == 0.79


def _random_table(rng: random.Random, move: bool = False) -> str:
    """Two groups' means and SDs in one of five layouts ("±", "M (SD)" under heads that say so, "M | SD", "M | (SD)",
    "M | SD | n"), or a Table 1 mixing rows of means labelled "mean (SD)" with rows of counts under a "t/χ2" column; the
    t Student's or (said in the note) Welch's, its p from the same test. ``move``: every t moved off its means."""
    layout = rng.choice(["±", "paren", "pairs", "pairs paren", "triples", "mixed"])
    sizes, welch = [rng.randint(8, 200) for _ in range(2)], rng.random() < 0.3
    places = rng.choice([0, 1, 2]), rng.choice([1, 2])
    rows = []
    for v in range(rng.randint(2, 6)):
        if layout == "mixed" and rng.random() < 0.4:
            counts = [[k := rng.randint(1, n - 1), n - k] for n in sizes]
            chi, p = stats.chi2_contingency(counts, correction=False)[:2]
            rows += [[f"Variable {v}, n (%)", "", "", f"{chi:.2f}", f"{p:.3f}"]] + \
                [[f"category {i}", *(f"{c[i]} ({100 * c[i] / n:.1f})" for c, n in zip(counts, sizes)), "", ""] for i in range(2)]
            continue
        means = [float(f"{rng.uniform(1, 100):.{places[0]}f}") for _ in range(2)]
        sds = [float(f"{rng.uniform(0.5, 20):.{places[1]}f}") for _ in range(2)]
        t, p = stats.ttest_ind_from_stats(means[0], sds[0], sizes[0], means[1], sds[1], sizes[1], equal_var=not welch)
        if move:
            t = t * rng.choice([0.5, 1.6, 2.5]) + rng.choice([-1, 1]) * 0.5
            p = 2 * stats.t.sf(abs(float(f"{t:.2f}")), sum(sizes) - 2)
        m, s = [f"{x:.{places[0]}f}" for x in means], [f"{x:.{places[1]}f}" for x in sds]
        cell = {"±": [f"{m[j]} ± {s[j]}" for j in (0, 1)], "paren": [f"{m[j]} ({s[j]})" for j in (0, 1)],
                "mixed": [f"{m[j]} ({s[j]})" for j in (0, 1)], "pairs": [f"{m[j]} | {s[j]}" for j in (0, 1)],
                "pairs paren": [f"{m[j]} | ({s[j]})" for j in (0, 1)], "triples": [f"{m[j]} | {s[j]} | {sizes[j]}" for j in (0, 1)]}[layout]
        rows.append([f"Measure {v}" + (", mean (SD)" if layout == "mixed" else ""), *cell, f"{t:.2f}", f"{p:.3f}" if p >= 0.001 else "< .001"])
    if layout in ("±", "paren", "mixed"):
        heads = ["Variable", *(f"{g} (n = {n})" + (" M (SD)" if layout == "paren" else "") for g, n in zip(("Control", "Treatment"), sizes)),
                 "t/χ2" if layout == "mixed" else "t", "p"]
        lines = ["| " + " | ".join(heads) + " |", "|" + "---|" * len(heads)]
    elif layout == "triples":
        lines = ["| Variable | Control | | | Treatment | | | t | p |", "|" + "---|" * 9, "| | M | SD | n | M | SD | n | t | p |"]
    else:
        spread = "(SD)" if layout == "pairs paren" else "SD"
        lines = [f"| Variable | Control (n = {sizes[0]}) | | Treatment (n = {sizes[1]}) | | t | p |", "|" + "---|" * 7,
                 f"| | M | {spread} | M | {spread} | | |"]
    note = ("Values are mean (SD) or n (%). " if layout == "mixed" else "") + ("t from Welch's test." if welch else "")
    return "Table 2 Outcomes by group\n\n" + "\n".join(lines + ["| " + " | ".join(r) + " |" for r in rows]) + "\n\n" + note + "\n"


def test_random_tables_of_means_in_five_layouts(tmp_path):
    rng = random.Random(33)
    clean = [_random_table(rng) for _ in range(200)]
    assert not [t for t in clean if any(set(e.codes) & {"means-do-not-fit", "p-does-not-follow", "counts-do-not-fit", "negative-statistic"}
                                        for e in _audit(tmp_path, t))]
    moved = [_random_table(rng, move=True) for _ in range(100)]
    moved = [t for t in moved if "| t |" in t or "t/χ2" in t and "mean (SD) |" in t]
    found = sum(any("means-do-not-fit" in e.codes for e in _audit(tmp_path, t)) for t in moved)
    assert found >= 0.9 * len(moved)


# PMC10964721, Table 3, "Comparison of baseline scores between the two groups" (45 patients a
# group), as published (https://pmc.ncbi.nlm.nih.gov/articles/PMC10964721/table/tab3): "x ± s" cells, read before
_PMC10964721 = """Table 3. Comparison of baseline scores between the two groups.

| Item | Intervention group (n = 45) | Control group (n = 45) | t | p |
|---|---|---|---|---|
| Total nursing ability score (x ± s) | 95.35 ± 12.13 | 96.24 ± 13.21 | 0.438 | 0.665 |
| Knowledge score (x ± s) | 16.67 ± 4.43 | 17.23 ± 3.67 | 1.382 | 0.180 |
| Skill score (x ± s) | 49.23 ± 4.45 | 48.34 ± 5.23 | −0.569 | 0.574 |
| Self-stress and health management score (x ± s) | 16.56 ± 2.67 | 16.58 ± 2.21 | 0.839 | 0.401 |
| Coping strategies score (x ± s) | 15.34 ± 2.34 | 15.23 ± 2.94 | 0.132 | 0.896 |
| ZBI score (x ± s) | 39.23 ± 7.23 | 41.56 ± 7.34 | −0.255 | 0.800 |
| MAS score (x ± s) | 20.45 ± 6.36 | 21.67 ± 6.43 | 1.423 | 0.110 |
| BI score (x ± s) | 43.19 ± 8.89 | 42.87 ± 9.78 | 0.055 | 0.956 |
| SAS score (x ± s) | 35.13 ± 4.87 | 35.92 ± 4.34 | 0.987 | 0.381 |
| SDS score (x ± s) | 36.23 ± 4.78 | 36.43 ± 3.23 | 1.122 | 0.556 |
"""


def test_a_published_table_whose_ts_follow_from_neither_its_means_nor_give_its_ps(tmp_path):
    entries = _audit(tmp_path, _PMC10964721)
    assert len(entries) == 10 and all("means-do-not-fit" in e.codes for e in entries)
    # the second row: its means and SDs give t = 0.65 (scipy), not 1.382; t(88) = 1.382 gives p = .170, not .180
    assert round(abs(stats.ttest_ind_from_stats(16.67, 4.43, 45, 17.23, 3.67, 45)[0]), 2) == 0.65
    assert round(2 * stats.t.sf(1.382, 88), 3) == 0.170
    assert [e.found.split(",")[0] for e in entries if "p-does-not-follow" in e.codes] == \
        ["t = 0.438", "t = 1.382", "t = −0.569", "t = 0.839", "t = 1.423", "t = 0.987", "t = 1.122"]


def test_a_pre_post_tables_t_is_read_with_a_paired_df(tmp_path):
    """A table whose heads name occasions with their n ("Pre-test (n = 30) | Post-test (n = 30) | t | p") compares the same
    people twice: its t may be a paired one, on n − 1 df — a reading now offered beside the two-group one (before, only
    df = 30 + 30 − 2 was tried, and a paired t's exact p was flagged); its means are not held to the t (a paired t needs
    the correlation the table does not give). The numbers: a published worked example's 30 respondents' pre- and
    post-test scores (https://scribd.com/document/624274685/Paired-Test: Σd = 163, Σd² = 1,649, as its page gives),
    summarised and tested here with scipy (paired t(29) = 5.80, p = 2.8 × 10⁻⁶)."""
    pre = [7, 11, 10, 9, 8, 13, 15, 17, 10, 11, 15, 16, 19, 6, 8, 10, 12, 13, 16, 9, 8, 10, 13, 12, 11, 15, 14, 14, 11, 10]
    post = [13, 18, 20, 11, 15, 21, 23, 25, 9, 10, 16, 18, 19, 21, 22, 12, 8, 15, 21, 20, 20, 15, 19, 19, 28, 16, 14, 17, 19, 12]
    assert sum(b - a for a, b in zip(pre, post)) == 163 and sum((b - a) ** 2 for a, b in zip(pre, post)) == 1649
    t, p = stats.ttest_rel(post, pre)
    m = [sum(x) / 30 for x in (pre, post)]
    sd = [stats.tstd(x) for x in (pre, post)]
    text = f"""Table 3. Scores before and after the programme

| Measure | Pre-test (n = 30) | | Post-test (n = 30) | | | |
|---|---|---|---|---|---|---|
| | M | SD | M | SD | t | p |
| Score | {m[0]:.2f} | {sd[0]:.2f} | {m[1]:.2f} | {sd[1]:.2f} | {t:.2f} | {p:.7f} |
"""
    entries = _audit(tmp_path, text)
    assert [e.codes for e in entries] == [[]]
    assert "df = 30 − 1 (a paired t: the heads name occasions" in entries[0].row()["recomputed"]
    assert 2 * stats.t.sf(5.80, 58) < 1e-6 < p  # (on the two-group df the printed p would not have followed)


def test_welchs_anova_f_of_three_groups_is_held_to_their_means(tmp_path):
    """Welch's (1951) ANOVA F of k groups from their means, SDs and n's, F = [Σ w(m − m̄)²/(k − 1)] / [1 + 2(k − 2)/(k² − 1)
    Σ (1 − w/W)²/(n − 1)], w = n/s², held to the printed digits as the one-way F is: before, an F of three or more groups
    beside a caption naming Welch's test was not held, and where no test was named a Welch F would have been taken for a
    misfit of the one-way F. The truth: pingouin's welch_anova and anova on its bundled penguins data (Palmer Station),
    body mass, flipper length and bill length by species — each printed F, Welch's under a Welch caption and either under a
    plain one, gives no finding; an F moved by a tenth is found, saying the range of each test the table allows."""
    import pingouin as pg

    data = pg.read_dataset("penguins")
    for dv in ("body_mass_g", "flipper_length_mm", "bill_length_mm"):
        sub = data.dropna(subset=[dv])
        stat = sub.groupby("species")[dv].agg(["mean", "std", "count"])
        welch = float(pg.welch_anova(data=sub, dv=dv, between="species")["F"].iloc[0])
        classic = float(pg.anova(data=sub, dv=dv, between="species")["F"].iloc[0])
        heads = " | ".join(f"{name} (n = {n})" for name, n in zip(stat.index, stat["count"]))
        cells = " | ".join(f"{m:.1f} ± {s:.1f}" for m, s in zip(stat["mean"], stat["std"]))

        def table(caption: str, f: float) -> str:
            return f"{caption}\n\n| Variable | {heads} | F | P |\n|---|---|---|---|---|---|\n| {dv} | {cells} | {f:.2f} | < 0.001 |\n"

        for caption, f in (("Table 2. By species (Welch's ANOVA)", welch), ("Table 2. By species", welch), ("Table 2. By species", classic)):
            assert [e.codes for e in _audit(tmp_path, table(caption, f))] == [[]], (dv, caption, f)
        (moved,) = _audit(tmp_path, table("Table 2. By species (Welch's ANOVA)", welch * 1.1))
        assert moved.codes == ["means-do-not-fit"] and "Welch's ANOVA's" in moved.message and "one-way" not in moved.message, moved.message
        (moved,) = _audit(tmp_path, table("Table 2. By species", classic * 1.1))
        assert moved.codes == ["means-do-not-fit"] and "one-way ANOVA's" in moved.message and "Welch's ANOVA's" in moved.message, moved.message
