"""A Table 1 that gives each group's count and percent in two columns of their own ("Number | % | Number | %"), and its
test typed whole in a cell under a head that does not name it ("Results": "χ2(2) = 5.496 P = 0.064"): the counts held
to their percents and to the test, as a table of "n (%)" cells is (tests/test_audit_context.py), on two published
tables laid out as Markdown and as Word tables the way their publisher prints them (the group's name merged over its
two columns, the test's cell merged down its variable's rows, the χ² and its P in two paragraphs), and on random ones.
The truth is computed here with scipy."""

from __future__ import annotations

import itertools
import math
import random
import re

import docx
import numpy as np
import pytest
from scipy.stats import chi2_contingency, fisher_exact

from statsetter.audit.counts import fisher_rxc
from statsetter.audit.report import audit_file

_COUNTS = {"counts-do-not-fit", "percent-does-not-fit", "p-does-not-follow"}

# BMC Nursing 2022 (s12912-022-00939-6), Table 2, "The participants' demographic characteristics of nurses in the
# intervention and control groups", as published (https://bmcnurs.biomedcentral.com/articles/10.1186/s12912-022-00939-6/tables/2);
# the Fisher rows' "P = 1" printed there as "1P =" (the page's own line break)
_NURSES_2022 = """Table 2 The participants' demographic characteristics of nurses in the intervention and control groups

| Variable | Categories | Intervention (n = 30) | | Control (n = 30) | | Results |
|---|---|---|---|---|---|---|
| | | Number | % | Number | % | |
| Age (years)a | 20–30 | 17 | 56.7 | 22 | 73.3 | χ2(2) = 5.496 P = 0.064 |
| | 31–40 | 4 | 13.3 | 6 | 20 | |
| | 41–50 | 9 | 30 | 2 | 6.7 | |
| Marital statusa | Single | 12 | 40 | 11 | 36.7 | χ2(1) = 0.071 P = 0.791 |
| | Married | 18 | 60 | 19 | 63.3 | |
| Premature childb | Yes | 1 | 3.3 | 0 | 0 | P = 1 |
| | No | 29 | 96.7 | 30 | 100 | |
| Educationa | Bachelor's degree | 25 | 83.3 | 24 | 80 | χ2(1) = 0.111 P = 0.739 |
| | Master's degree | 5 | 16.7 | 6 | 20 | |
| Field of studya | Pediatrics | 5 | 16.7 | 7 | 23.3 | χ2(1) = 0.417 P = 0.519 |
| | Nursing | 25 | 83.3 | 23 | 76.8 | |
| Employmenta | Official | 11 | 36.7 | 10 | 33.3 | χ2(2) = 0.698 P = 0.705 |
| | Contractual | 9 | 30 | 12 | 40 | |
| | Plan-based | 10 | 33.3 | 8 | 26.7 | |
| Work shiftb | Fixed | 1 | 3.3 | 2 | 6.7 | P = 1 |
| | Rotating | 29 | 96.7 | 28 | 93.3 | |
| Participation in training courses | Yes | 5 | 16.7 | 10 | 33.3 | χ2(1) = 2.222 P = 0.136 |
| | No | 25 | 83.3 | 20 | 66.7 | |
| Service records in NICU (year)a | 1> | 10 | 33.3 | 5 | 16.7 | χ2(2) = 4.602 P = 0.100 |
| | 1–5 | 9 | 30 | 17 | 56.7 | |
| | < 5 | 11 | 36.7 | 8 | 26.7 | |

aChi-square test and bFisher's exact test
"""

# BMC Nursing 2021 (s12912-021-00599-y), Table 2, "Comparison of demographic and professional information of nurses in
# the intervention and control groups", as published (https://bmcnurs.biomedcentral.com/articles/10.1186/s12912-021-00599-y/tables/2),
# its first seven variables
_NURSES_2021 = """Table 2 Comparison of demographic and professional information of nurses in the intervention and control groups

| Variables | Groups | Intervention | | Control | | Statistic and P |
|---|---|---|---|---|---|---|
| | | n | % | n | % | |
| Gender | Male | 5 | 16.70 | 5 | 16.70 | χ2 = 0.003 P = 0.99 |
| | Female | 25 | 83.30 | 25 | 83.30 | |
| Age groups | 20–40 | 25 | 83.30 | 24 | 80 | χ2 = 0.15 P = 0.64 |
| | > 40 | 5 | 16.70 | 6 | 20 | |
| Marital status | Single | 9 | 29.10 | 8 | 26.70 | χ2 = 1.06 P = 0.58 |
| | Married | 21 | 70.90 | 22 | 73.30 | |
| Work experience (year) | < 5 | 8 | 25.80 | 12 | 40 | Fisher's exact test = 3.86 P = 0.42 |
| | 5–10 | 4 | 12.90 | 4 | 13.30 | |
| | 11–15 | 12 | 41.90 | 6 | 20 | |
| | 16–20 | 4 | 12.90 | 4 | 13.30 | |
| | > 21 | 2 | 6.50 | 4 | 13.30 | |
| Work position | Head nurse | 0 | 0 | 3 | 10 | Fisher's exact test = 3.26 P = 0.7 |
| | Nurse | 30 | 100 | 27 | 90 | |
| Shift work | Fixed | 1 | 3.20 | 2 | 6.70 | Fisher's exact test = 0.38 P = 0.53 |
| | Rotated | 29 | 96.80 | 28 | 93.30 | |
"""


def _rows(text: str) -> list[list[str]]:
    return [[c.strip() for c in line.strip().strip("|").split("|")] for line in text.splitlines()
            if line.startswith("|") and not line.startswith("|---")]


def _as_word(text: str, path) -> None:  # type: ignore[no-untyped-def]
    """The Markdown table as its publisher lays it out in Word: the spanners merged over their two columns, the first and
    last columns merged down each variable's rows, a test's P in a paragraph of its own under its statistic."""
    lines = text.splitlines()
    rows = _rows(text)
    d = docx.Document()
    d.add_paragraph(lines[0])
    table = d.add_table(rows=len(rows), cols=len(rows[0]))
    for i, row in enumerate(rows):
        for j, value in enumerate(row):
            parts = re.split(r" (?=P = )", value) if i > 1 else [value]
            table.cell(i, j).text = parts[0]
            for part in parts[1:]:
                table.cell(i, j).add_paragraph(part)
    for j in range(len(rows[0]) - 1):
        if rows[0][j] and not rows[0][j + 1] and rows[1][j] and rows[1][j + 1]:
            table.cell(0, j).merge(table.cell(0, j + 1))
    starts = [i for i in range(2, len(rows)) if rows[i][0]] + [len(rows)]
    for a, b in zip(starts, starts[1:]):
        if b - a > 1:
            for column in (0, len(rows[0]) - 1):
                table.cell(a, column).merge(table.cell(b - 1, column))
    for line in lines[1:]:
        if line and not line.startswith("|"):
            d.add_paragraph(line)
    d.save(str(path))


def _audit(tmp_path, text: str, form: str):  # type: ignore[no-untyped-def]
    path = tmp_path / f"t.{form}"
    if form == "md":
        path.write_text(text, encoding="utf-8")
    else:
        _as_word(text, path)
    return audit_file(path)


def _by_test(entries) -> dict[str, set[str]]:  # type: ignore[no-untyped-def]
    """Each entry's codes of the counts' kind, by the statistic's first characters (a χ² and its P read apart in Word
    are one test)."""
    out: dict[str, set[str]] = {}
    for e in entries:
        out.setdefault(e.found, set()).update(set(e.codes) & _COUNTS)
    return out


@pytest.mark.parametrize("form", ["md", "docx"])
def test_a_published_tables_counts_in_columns_of_their_own_are_held_to_its_tests(tmp_path, form):
    entries = _audit(tmp_path, _NURSES_2022, form)
    read = [e for e in entries if any("the counts of" in n for n in e.notes)]
    assert len(read) == 9  # every variable's counts read, each with its test (five χ² typed with df, two P alone)
    assert all(any("in 2 groups' columns" in n for n in e.notes) for e in read)
    flagged = {e.found: set(e.codes) & _COUNTS for e in entries if set(e.codes) & _COUNTS}
    # every χ² and P follows from the counts (scipy: Pearson's χ² 5.496, 0.071, 0.111, 0.417, 0.698, 2.222, 4.602, their p as
    # printed; Fisher's p 1 for both "P = 1" rows); one percent does not: 23 of 30 printed as 76.8% (76.67%)
    assert list(flagged.values()) == [{"percent-does-not-fit"}]
    message = next(e.message for e in entries if "percent-does-not-fit" in e.codes)
    assert "23 / 30 is 76.7%, not 76.8%" in message
    before = chi2_contingency([[17, 4, 9], [22, 6, 2]], correction=False)
    assert round(before[0], 3) == 5.496 and round(before[1], 3) == 0.064  # (the truth the first row is held to)


@pytest.mark.parametrize("form", ["md", "docx"])
def test_a_published_tables_inconsistent_counts_are_found(tmp_path, form):
    entries = _audit(tmp_path, _NURSES_2021, form)
    codes = _by_test(entries)
    first = lambda start: set().union(*(v for k, v in codes.items() if k.startswith(start)))  # noqa: E731
    # identical groups (5/25 and 5/25) give χ² = 0, p = 1, not 0.003 and 0.99 (scipy)
    assert chi2_contingency([[5, 25], [5, 25]], correction=False)[0] == 0.0
    assert "counts-do-not-fit" in first("χ2 = 0.003")
    # 25/5 vs 24/6: χ² = 0.111 (p .739), not 0.15 (p .64); its percents one decimal padded to two, 83.30 for 83.3: not said
    assert round(chi2_contingency([[25, 5], [24, 6]], correction=False)[0], 3) == 0.111
    assert first("χ2 = 0.15") == {"counts-do-not-fit", "p-does-not-follow"} if form == "md" else first("χ2 = 0.15") >= {"counts-do-not-fit"}
    # 9 and 21 of 30 printed as 29.1% and 70.9%; χ² 0.082 from the counts, not 1.06
    assert {"percent-does-not-fit", "counts-do-not-fit"} <= first("χ2 = 1.06")
    # the 2 × 5 table's P is Fisher's (Freeman–Halton), which the cell names: its counts give p = 0.4766 by it (enumerated in
    # test_fishers_exact_test_of_a_larger_table), not 0.42; its percents are of 31 (8 / 31 is 25.8%), its counts sum to 30
    work = next(e for e in entries if e.found.endswith("P = 0.42") or e.found == "P = 0.42")
    assert {"percent-does-not-fit", "counts-do-not-fit"} <= set(work.codes)
    assert "8 / 30 is 26.7%, not 25.8%" in work.message and "Fisher's exact test (Freeman–Halton) p = 0.4766" in work.message
    assert round(_enumerated([[8, 4, 12, 4, 2], [12, 4, 6, 4, 4]]), 4) == 0.4766
    # 0/30 vs 3/27: Fisher's p = 0.237 (scipy), χ² p = .076; not 0.7
    assert round(fisher_exact([[0, 30], [3, 27]])[1], 3) == 0.237
    assert "counts-do-not-fit" in first("P = 0.7")
    # 1/29 vs 2/28: Fisher's p = 1, χ² p = .554; not 0.53; and 1 of 30 printed as 3.2% (3.3%)
    assert {"counts-do-not-fit", "percent-does-not-fit"} <= first("P = 0.53")


def _random_table(rng: random.Random, move: str = "") -> str:
    """A random Table 1 of two or three groups, each group's count and percent in two columns (percents of the column's
    counts or of the group's n, 0–2 decimals, sometimes padded with a zero), each variable's test typed in one cell: a χ²
    with or without its df (with Yates's correction now and then), a P alone (of the χ² or Fisher's test), or a Fisher's
    P of a larger table (any p: not checkable); or, in one header row ("Intervention n | Intervention % | … | P"), each
    variable's p alone in the P column. ``move``: one percent or one p moved."""
    groups = rng.choice([2, 2, 3])
    sizes = [rng.randint(15, 400) for _ in range(groups)]
    places, padded, basis = rng.choice([0, 1, 1, 2]), rng.random() < 0.2, rng.choice(["column", "column", "n"])
    count_head, percent_head = rng.choice([("Number", "%"), ("n", "%"), ("No.", "(%)"), ("n", "Percent")])
    names = ["Intervention", "Control", "Waitlist"][:groups]
    single = rng.random() < 0.3
    lines = ["| " + " | ".join(["Variable", "Category", *(x for g, n in zip(names, sizes) for x in (f"{g} (n = {n})", "")), "Test"]) + " |",
             "|" + "---|" * (3 + 2 * groups), "| | | " + " | ".join(f"{count_head} | {percent_head}" for _ in names) + " | |"]
    if single:
        lines = ["| " + " | ".join(["Variable", "Category", *(x for g in names for x in (f"{g} {count_head}", f"{g} {percent_head}")), "P"]) + " |",
                 "|" + "---|" * (3 + 2 * groups)]
    for v in range(rng.randint(2, 6)):
        k = rng.choice([2, 2, 3, 4])
        probs = np.array([rng.random() + 0.2 for _ in range(k)])
        table = np.array([np.random.default_rng(rng.randrange(10**9)).multinomial(n, probs / probs.sum()) for n in sizes]).T
        if (table.sum(axis=1) == 0).any():
            continue
        kind = "p" if single else rng.choice(["chi df", "chi", "p", "fisher" if table.shape == (2, 2) else "fisher rc" if sum(sizes) <= 150 else "chi"])
        chi, p, df, _ = chi2_contingency(table, correction=table.shape == (2, 2) and rng.random() < 0.3)
        exact = fisher_rxc(table.tolist()) if kind == "fisher rc" else None  # (this test's reading, not its sum: that is
        p = fisher_exact(table)[1] if kind == "fisher" else (exact if exact is not None else rng.random()) if kind == "fisher rc" else p  # tested apart)
        printed = f"{p:.{rng.choice([2, 3, 3])}f}"
        printed = printed if float(printed) else f"{p:.3f}"
        printed = printed if float(printed) else "< 0.001"
        if move == "p" and v == 0 and kind != "fisher rc" and printed[0] != "<":
            printed = f"{min(0.99, float(printed) * rng.choice([0.3, 2.5, 4])):.3f}"
        test = {"chi df": f"χ2({df}) = {chi:.{rng.choice([2, 3])}f} P = {printed}", "chi": f"χ2 = {chi:.{rng.choice([2, 3])}f}, P = {printed}",
                "p": f"P = {printed}", "fisher": f"Fisher's exact test P = {printed}", "fisher rc": f"Fisher's exact test P = {printed}"}[kind]
        test = test.replace("= <", "<") if not single else printed
        for i in range(k):
            cells = []
            for j in range(groups):
                share = 100 * table[i, j] / (table[:, j].sum() if basis == "column" else sizes[j])
                shown = f"{share:.{places}f}"
                if padded and places:
                    shown = f"{float(f'{share:.{places - 1}f}'):.{places}f}"
                if move == "percent" and v == i == j == 0:
                    shown = f"{share + rng.choice([-1, 1]) * rng.choice([1.5, 3, 7]):.{places}f}"
                cells.append(f"{table[i, j]} | {shown}")
            lines.append(f"| {f'Variable {v}' if i == 0 else ''} | category {i} | " + " | ".join(cells) + f" | {test if i == 0 else ''} |")
    return "Table 1 Characteristics by group\n\n" + "\n".join(lines) + "\n"


def test_random_tables_of_counts_in_columns_of_their_own(tmp_path):
    rng = random.Random(32)
    clean = [_random_table(rng) for _ in range(150)]
    assert not [t for t in clean if {c for e in _audit(tmp_path, t, "md") for c in e.codes} & _COUNTS]
    moved = [_random_table(rng, "percent") for _ in range(60)]
    assert sum(bool({c for e in _audit(tmp_path, t, "md") for c in e.codes} & _COUNTS) for t in moved) >= 57
    moved = [_random_table(rng, "p") for _ in range(60)]
    assert sum(bool({c for e in _audit(tmp_path, t, "md") for c in e.codes} & _COUNTS) for t in moved) >= 40
    for text in clean[:25]:  # as Word tables (merged heads and test cells, the P in a paragraph of its own): read alike
        md = sorted(c for e in _audit(tmp_path, text, "md") for c in e.codes if c in _COUNTS)
        assert sorted(c for e in _audit(tmp_path, text, "docx") for c in e.codes if c in _COUNTS) == md


def _enumerated(table: list[list[int]]) -> float:
    """Fisher's exact p of a small r × c table by listing every table with its margins (independent of fisher_rxc)."""
    rows, columns = [sum(r) for r in table], [sum(c) for c in zip(*table)]
    total = sum(rows)
    log_p = lambda t: (sum(math.lgamma(x + 1) for x in rows + columns) - math.lgamma(total + 1)  # noqa: E731
                       - sum(math.lgamma(x + 1) for r in t for x in r))
    observed, found = log_p(table), 0.0

    def fill(i: int, left: list[int], done: list[list[int]]) -> None:
        nonlocal found
        if i == len(rows) - 1:
            t = done + [left]
            if log_p(t) <= observed + math.log1p(1e-7):
                found += math.exp(log_p(t))
            return
        for row in itertools.product(*(range(c + 1) for c in left)):
            if sum(row) == rows[i]:
                fill(i + 1, [a - b for a, b in zip(left, row)], done + [list(row)])

    fill(0, columns, [])
    return found


def test_fishers_exact_test_of_a_larger_table():
    """Freeman and Halton's extension of Fisher's test to r × c tables, as R's fisher.test computes it: R's printed p for
    matrix(1:9, ncol = 3) is 0.9888, for matrix(c(14, 27, 15, 24, 27, 17, 39, 19, 24), nrow = 3) 0.02126 (R output
    shown in "How to Perform Fisher Test in R", a tutorial kept in the
    Nemotron-CC-Math collection, https://huggingface.co/datasets/nvidia/Nemotron-CC-Math-v1); 120 random small tables
    against listing every table with their margins; 2 × 2 tables against scipy's fisher_exact; a table too large to list
    within the budget is not computed (None), not guessed."""
    assert round(fisher_rxc([[1, 4, 7], [2, 5, 8], [3, 6, 9]]), 4) == 0.9888
    rng = random.Random(34)
    for _ in range(120):
        r, c = rng.choice([(2, 3), (3, 2), (2, 4), (3, 3), (2, 5), (4, 2)])
        table = [[rng.randint(0, 5) for _ in range(c)] for _ in range(r)]
        if sum(map(sum, table)) == 0:
            continue
        table = [row for row in table if sum(row)]
        table = [list(x) for x in zip(*[col for col in zip(*table) if sum(col)])] if table else table
        if len(table) < 2 or len(table[0]) < 2:
            continue
        assert math.isclose(fisher_rxc(table), _enumerated(table), rel_tol=1e-9), table  # type: ignore[arg-type]
    for _ in range(60):
        table = [[rng.randint(0, 40) for _ in range(2)] for _ in range(2)]
        if min(map(sum, table)) and min(map(sum, zip(*table))):
            assert math.isclose(fisher_rxc(table), fisher_exact(table)[1], rel_tol=1e-9)  # type: ignore[arg-type]
    m4 = [[14, 24, 39], [27, 27, 19], [15, 17, 24]]  # (3 × 3, 206 subjects: R's printed p, the same tutorial; beyond the
    assert fisher_rxc(m4) is None and round(fisher_rxc(m4, budget=2_000_000), 5) == 0.02126  # default budget, within a larger)
    assert fisher_rxc([[1000, 900, 1100], [1000, 1100, 900], [1000, 1000, 1000]]) is None  # (9,000 subjects: beyond the budget)


def test_a_published_tables_fisher_ps_of_larger_tables_and_its_groups_sizes(tmp_path):
    """BMC Med Educ 2019's Table 2 (tests/test_audit_descriptive.py, cited there) names Fisher's exact test for its 5- and
    3-category variables (2 × 4 and 2 × 3 once the empty categories are left out): its printed p's, 0.090 and 0.547, are
    Freeman–Halton's exact p's of its counts (0.0901 and 0.5467, listed), not Pearson's (0.162 and 0.447) — before, such
    p's were left unchecked; now they are held and read clean. Its caption's N = 42 is two fewer than its groups' heads,
    22 + 22: said (`sizes-do-not-add`). Subgroups that do not exhaust their total (a genetics table's "Anencephaly (N =
    123) | Spina bifida (N = 115) | Total NTDs (N = 263)") are not."""
    from test_audit_context import _GENES_ENV_TABLE
    from test_audit_descriptive import _BMC_MED_EDUC

    assert round(_enumerated([[1, 1], [15, 8], [6, 12], [0, 1]]), 4) == 0.0901
    assert round(_enumerated([[9, 12], [12, 10], [1, 0]]), 4) == 0.5467
    assert round(chi2_contingency([[1, 1], [15, 8], [6, 12], [0, 1]])[1], 3) == 0.162
    entries = _audit(tmp_path, _BMC_MED_EDUC, "md")
    held = [e for e in entries if any("Fisher's exact test of the whole table" in n for n in e.notes)]
    assert [e.found for e in held] == ["p = 0.090", "p = 0.547"] and not [c for e in held for c in e.codes]
    sizes = [e for e in entries if "sizes-do-not-add" in e.codes]
    assert len(sizes) == 1 and "add up to 44 (22 + 22), more than the N = 42 the caption gives" in sizes[0].message
    moved = _audit(tmp_path, _BMC_MED_EDUC.replace("| 5.21a | 0.090 |", "| 5.21a | 0.300 |"), "md")
    assert any("counts-do-not-fit" in e.codes and "Freeman–Halton) p = 0.09007" in e.message for e in moved)
    assert not [e for e in _audit(tmp_path, _GENES_ENV_TABLE, "md") if "sizes-do-not-add" in e.codes]


def test_a_named_exact_test_too_large_to_compute_is_said(tmp_path):
    """A 3 × 3 table of 9,000 subjects whose note names Fisher's exact test, its p fitting none of the χ² tests: the exact
    test is beyond what is enumerated here, so the p is not held to it — said in the entry's notes, not guessed; a 3 × 2
    table beside it (its exact p, 0.9729, computed as test_fishers_exact_test_of_a_larger_table checks) is held."""
    text = """Table 1 Characteristics

| Variable | Category | A (n = 3000) | B (n = 3000) | C (n = 3000) | P |
|---|---|---|---|---|---|
| Var | c1 | 1000 (33.3) | 900 (30.0) | 1100 (36.7) | 0.5 |
| | c2 | 1000 (33.3) | 1100 (36.7) | 900 (30.0) | |
| | c3 | 1000 (33.3) | 1000 (33.3) | 1000 (33.3) | |
| Var2 | c1 | 10 (0.3) | 9 (0.3) | 11 (0.4) | 0.01 |
| | c2 | 2990 (99.7) | 2991 (99.7) | 2989 (99.6) | |

Fisher's exact test.
"""
    first, second = _audit(tmp_path, text, "md")
    assert not first.codes and any("too large to compute here, so the p is not held to it" in n for n in first.notes)
    assert "counts-do-not-fit" in second.codes and "Fisher's exact test (Freeman–Halton) p = 0.9729" in second.message


# BMC Nursing 2024;23:329 (PMC11097421), Table 1, "Demographic data homogeneity for the two participant groups", as
# published (https://pmc.ncbi.nlm.nih.gov/articles/PMC11097421/table/Tab1); the test column's head, printed t with note a
# over χ² with note b (the page's copy runs it together as "ta2 b"), typed "t/χ2"
_PMC11097421 = """Table 1. Demographic data homogeneity for the two participant groups

| | Overall (N = 151) | Experimental (n = 73) | Control (n = 78) | t/χ2 | p |
|---|---|---|---|---|---|
| | n (%)/mean ± SD | n (%)/mean ± SD | | | |
| Gender | | | | 0.43 b | 0.514 |
| Male | 89 (58.9) | 45 (61.6) | 44 (56.4) | | |
| Female | 62 (41.1) | 28 (38.4) | 34 (43.6) | | |
| Age | 49.53 ± 9.27 | 48.35 ± 9.84 | 50.63 ± 8.63 | −1.51 a | 0.132 |
| Education level | | | | 2.64 b | 0.267 |
| Middle school and below | 62 (41.1) | 31 (42.5) | 31 (39.7) | | |
| High school or vocational school | 65 (43.0) | 34 (46.5) | 31 (39.8) | | |
| College and above | 24 (15.9) | 8 (11.0) | 16 (20.5) | | |
| Marital status | | | | 0.42 b | 0.813 |
| Single | 106 (70.2) | 50 (68.5) | 56 (71.8) | | |
| Married | 25 (16.6) | 12 (16.4) | 13 (16.7) | | |
| Divorced/widowed | 20 (13.2) | 11 (15.1) | 9 (11.5) | | |
| Living status | | | | 0.02 b | 0.896 |
| Living alone | 14 (9.3) | 7 (9.6) | 7 (9.0) | | |
| Living with family | 137 (90.7) | 66 (90.4) | 71 (91.0) | | |
| Employed | | | | 0.01 b | 0.976 |
| No | 116 (76.8) | 56 (76.7) | 60 (76.9) | | |
| Yes | 35 (23.2) | 17 (23.3) | 18 (23.1) | | |
| Religion | | | | 0.38 b | 0.945 |
| None | 32 (21.2) | 17 (23.3) | 15 (19.2) | | |
| Buddhist | 64 (42.4) | 30 (41.1) | 34 (43.6) | | |
| Taoist | 32 (21.2) | 15 (20.5) | 17 (21.8) | | |
| Christian | 23 (15.2) | 11 (15.1) | 12 (15.4) | | |
| Economic status | | | | 0.07 b | 0.792 |
| Middle income | 72 (47.7) | 34 (46.6) | 38 (48.7) | | |
| Low income | 79 (52.3) | 39 (53.4) | 40 (51.3) | | |
| Number of years of homecare received | | | | 4.58 b | 0.101 |
| < 1 year | 14 (9.3) | 6 (8.2) | 8 (10.3) | | |
| 1–2 years | 36 (23.8) | 23 (31.5) | 13 (16.6) | | |
| ≥ 2 years | 101 (66.9) | 44 (60.3) | 57 (73.1) | | |
| Total number of psychiatric hospitalizations | 3.59 ± 3.95 | 3.79 ± 4.30 | 3.40 ± 3.59 | 0.62 a | 0.538 |
| Number of psychiatric hospitalizations within the previous year | 0.15 ± 0.44 | 0.19 ± 0.52 | 0.10 ± 0.35 | 1.24 a | 0.218 |

Note. a t-test; b chi-squared test
"""


def test_a_published_table_1_of_counts_and_means_with_two_chi_squares_typed_amiss(tmp_path):
    """All eight χ²'s and three t's of PMC11097421's Table 1 are read (an Overall column set aside), with each χ²'s df from
    its counts. Two χ²'s do not follow from the counts, their p's do: the marital status χ² is 0.4145 (scipy; p = .813 as
    printed), printed 0.42 — said with the digits that show it (before, "0.415", which reads as if it rounded to 0.42);
    the employment χ² is 0.0009 (p = .976 as printed), printed 0.01. Two percents of the education block are nudged to
    make 100 (34 / 73 is 46.58%, printed 46.5; 31 / 78 is 39.74%, printed 39.8), one of the homecare block (13 / 78)."""
    assert round(chi2_contingency([[50, 12, 11], [56, 13, 9]])[0], 4) == 0.4145
    assert round(chi2_contingency([[56, 17], [60, 18]], correction=False)[0], 4) == 0.0009
    entries = _audit(tmp_path, _PMC11097421, "md")
    assert [e.found.split(",")[0] for e in entries] == ["χ² = 0.43", "t = −1.51", "χ² = 2.64", "χ² = 0.42", "χ² = 0.02", "χ² = 0.01",
                                                        "χ² = 0.38", "χ² = 0.07", "χ² = 4.58", "t = 0.62", "t = 1.24"]
    counts = {e.found.split(",")[0]: sorted(set(e.codes) & _COUNTS) for e in entries if set(e.codes) & _COUNTS}
    assert counts == {"χ² = 2.64": ["percent-does-not-fit"], "χ² = 0.42": ["counts-do-not-fit"],
                      "χ² = 0.01": ["counts-do-not-fit", "p-does-not-follow"], "χ² = 4.58": ["percent-does-not-fit"]}
    marital = next(e for e in entries if e.found.startswith("χ² = 0.42"))
    assert "Pearson's χ² 0.4145" in marital.message


# PLOS ONE 2017;12(12):e0188736 (PMC5728480), Table 1, "Participants' characteristics according to the neighbourhood
# socioeconomic deprivation class", as published: a Total column of counts first, each class's n (%), then the test in
# three columns headed in full — "Pearson chi-square statistic | Degrees of freedom | p-value"
_PMC5728480_HEADS = ["n = 1154 [n (%)]", "Total", "Class 1 Least deprived (n = 361)", "Class 2 (n = 623)", "Class 3 Most deprived (n = 170)",
                     "Pearson chi-square statistic", "Degrees of freedom", "p-value"]
_PMC5728480 = [
    ["Age", "", "", "", "", "35.35", "4", "<0.001"], ["18–34 years", "78", "42 (11.6)", "29 (4.7)", "7 (4.1)", "", "", ""],
    ["35–64 years", "818", "267 (74.0)", "427 (68.5)", "124 (72.9)", "", "", ""], ["65 or more years", "258", "52 (14.4)", "167 (26.8)", "39 (22.9)", "", "", ""],
    ["Gender", "", "", "", "", "1.31", "2", "0.519"], ["Female", "699", "210 (58.2)", "383 (61.5)", "106 (62.4)", "", "", ""],
    ["Male", "455", "151 (41.8)", "240 (38.5)", "64 (37.6)", "", "", ""],
    ["Education", "", "", "", "", "155.07", "4", "<0.001"], ["4 years or less", "401", "58 (16.1)", "234 (37.6)", "109 (64.1)", "", "", ""],
    ["5 to 11 years", "384", "122 (33.8)", "212 (34.0)", "50 (29.4)", "", "", ""], ["12 or more years", "369", "181 (50.1)", "177 (28.4)", "11 (6.5)", "", "", ""],
    ["Current smoking behaviour", "", "", "", "", "12.95", "2", "0.002"], ["Smoker", "263", "105 (29.1)", "119 (19.1)", "39 (22.9)", "", "", ""],
    ["Non-smoker", "891", "256 (70.9)", "504 (80.9)", "131 (77.1)", "", "", ""],
    ["Excessive alcohol intake1", "", "", "", "", "3.19", "2", "0.203"], ["No", "866", "283 (78.4)", "459 (73.7)", "124 (72.9)", "", "", ""],
    ["Yes", "288", "78 (21.6)", "164 (26.3)", "46 (27.1)", "", "", ""],
    ["Sedentariness2", "", "", "", "", "7.11", "2", "0.029"], ["No", "803", "248 (68.7)", "450 (72.2)", "105 (61.8)", "", "", ""],
    ["Yes", "351", "113 (31.3)", "173 (27.8)", "65 (38.2)", "", "", ""],
    ["Chronic Disease", "", "", "", "", "17.68", "4", "0.001"], ["No", "443", "165 (45.7)", "217 (34.8)", "61 (35.9)", "", "", ""],
    ["Yes", "710", "196 (54.3)", "406 (65.2)", "108 (63.5)", "", "", ""]]


def test_a_chi_square_column_headed_in_full_beside_its_df_column(tmp_path):
    """"Pearson chi-square statistic" and "Degrees of freedom" had been no heads the audit knew, and the variable's row,
    with its df in a column of their own, no row naming a variable: none of PLOS ONE's seven χ² was read. Now each is,
    on its printed df, and held to its counts: five follow (scipy's chi2_contingency gives 35.35, 1.31, 12.95, 3.19, 7.11);
    Education's 155.07 is the counts' 155.077 cut, not rounded; Chronic Disease's χ²(4) = 17.68 is not its 2 × 3 table's,
    whose counts give χ²(2) = 11.88, p = .0026 — in Markdown and in a Word table alike."""
    counts = {"Education": [[58, 234, 109], [122, 212, 50], [181, 177, 11]], "Chronic Disease": [[165, 217, 61], [196, 406, 108]]}
    assert [f"{chi2_contingency(np.array(c), correction=False)[0]:.3f}" for c in counts.values()] == ["155.077", "11.878"]
    text = "Table 1. Participants' characteristics according to the neighbourhood socioeconomic deprivation class.\n\n" + \
        "| " + " | ".join(_PMC5728480_HEADS) + " |\n|" + "---|" * 8 + "\n" + "\n".join("| " + " | ".join(r) + " |" for r in _PMC5728480) + "\n"
    entries = _audit(tmp_path, text, "md")
    assert [e.found for e in entries] == ["χ²(4) = 35.35, p < 0.001", "χ²(2) = 1.31, p = 0.519", "χ²(4) = 155.07, p < 0.001", "χ²(2) = 12.95, p = 0.002",
                                          "χ²(2) = 3.19, p = 0.203", "χ²(2) = 7.11, p = 0.029", "χ²(4) = 17.68, p = 0.001"], [e.found for e in entries]
    assert [e.codes for e in entries] == [[], [], ["counts-do-not-fit"], [], [], [], ["counts-do-not-fit"]], [(e.found, e.codes) for e in entries]
    assert "on 2 df they give Pearson's χ² 11.878" in entries[-1].message and "on 4 df they give Pearson's χ² 155.077" in entries[2].message
    # (a χ² its counts do not give is not offered back with its p as if it stood, though the p follows from the χ² as printed)
    assert entries[-1].suggestion == "χ²(4) = 17.68 (p left out: the statistic itself does not follow from the table's numbers beside it)"
    d = docx.Document()
    d.add_paragraph("Table 1. Participants' characteristics according to the neighbourhood socioeconomic deprivation class.")
    table = d.add_table(rows=len(_PMC5728480) + 1, cols=8)
    for r, row in enumerate([_PMC5728480_HEADS] + _PMC5728480):
        for c, cell in enumerate(row):
            table.cell(r, c).text = cell
    d.save(str(tmp_path / "plos.docx"))
    assert [e.codes for e in audit_file(tmp_path / "plos.docx")] == [e.codes for e in entries]


def test_a_rows_total_against_its_groups_counts(tmp_path):
    """A row's count in the total column against its groups' counts beside it: PLOS ONE's Table 1 above, whose classes'
    n in the heads (361 + 623 + 170) make up its N = 1,154, has every row's total the sum of its classes' counts (443 =
    165 + 217 + 61 …) and nothing is said; a total typed 87 for 78 (fewer than it gives: the heads leave no one outside
    the classes) and one typed 442 for 443 (more than the total: never) are found at their cells."""
    rows = [r[:] for r in _PMC5728480]
    assert all(int(r[1]) == sum(int(x.split(" (")[0]) for x in r[2:5]) for r in rows if r[1])
    rows[1][1], rows[-2][1] = "87", "442"
    text = "Table 1. Participants' characteristics according to the neighbourhood socioeconomic deprivation class.\n\n" + \
        "| " + " | ".join(_PMC5728480_HEADS) + " |\n|" + "---|" * 8 + "\n" + "\n".join("| " + " | ".join(r) + " |" for r in rows) + "\n"
    found = [e for e in _audit(tmp_path, text, "md") if "sizes-do-not-add" in e.codes]
    assert [e.found for e in found] == ["87", "442"], [(e.found, e.message) for e in found]
    assert "add up to 78 (42 + 29 + 7), fewer than the 87 its total column gives, though the groups' n in the heads make up the table's N = 1,154" in found[0].message
    assert "add up to 443 (165 + 217 + 61), more than the 442 its total column gives" in found[1].message


# A χ² table of an open-access SCIRP article (Scientific Research Publishing), as its HTML table file prints it
# (https://html.scirp.org/file/_1-2260316_3.htm, the rows of the stored copy): two χ² carry a capital footnote mark
# glued to them, "4.005Y", the note defining it not in the copy
_SCIRP_2260316 = """| Variable | Positive | Negative | Total | χ2 | p value |
|---|---|---|---|---|---|
| | n (%) | n (%) | N (%) | | |
| Age group | | | | | |
| <20 | 4 (12.5) | 28 (87.5) | 32 | 4.005Y | 0.548 |
| 20 - 29 | 8 (3.1) | 248 (96.9) | 256 | | |
| 30 - 39 | 15 (4.6) | 309 (95.4) | 324 | | |
| 40 - 49 | 11 (4.5) | 232 (95.5) | 243 | | |
| 50 - 59 | 5 (4.9) | 97 (95.1) | 102 | | |
| ≥60 | 0 (0.0) | 8 (100.0) | 8 | | |
| Sex | | | | | |
| Male | 23 (7.1) | 300 (92.9) | 323 | 8.098 | 0.004* |
| Female | 20 (3.1) | 622 (96.9) | 642 | | |
| Marital Status | | | | | |
| Single | 11 (4.2) | 253 (95.8) | 264 | 0.071 | 0.789 |
| Married | 32 (4.6) | 669 (95.4) | 701 | | |
| Occupation group | | | | | |
| Health worker | 31 (4.1) | 718 (95.1) | 749 | 0.350Y | 0.950 |
| Student | 7 (4.8) | 138 (95.2) | 145 | | |
| Security | 2 (7.1) | 26 (92.9) | 28 | | |
| Others | 3 (7.0) | 40 (93.0) | 43 | | |
| Primary place residence | | | | | |
| Urban | 34 (4.6) | 699 (95.4) | 733 | 0.239 | 0.625 |
| Rural | 9 (3.9) | 223 (96.1) | 232 | | |
"""


def test_a_chi_square_with_a_capital_footnote_mark_is_read_on_its_counts(tmp_path):
    """"4.005Y" had been no number: the χ² was not read, its p was held to the counts alone and to no df. Now the χ² is
    read as "8.098" is, on its counts' df, in Markdown and in a Word table: χ²(5) = 4.005 gives p = .5487 — the printed
    0.548 is that p cut, not rounded — and neither marked χ² is its counts' Pearson's (scipy: 6.375 on 5 df, 1.341 on 3;
    the likelihood-ratio χ² neither), though each p follows from its χ² as printed (whatever test the mark names); the
    three unmarked χ² are their counts' (8.098, 0.071, 0.239); and 718 of 749 is printed as 95.1% (95.9%)."""
    counts = {"age": [[4, 8, 15, 11, 5, 0], [28, 248, 309, 232, 97, 8]], "occupation": [[31, 7, 2, 3], [718, 138, 26, 40]],
              "sex": [[23, 20], [300, 622]], "marital": [[11, 32], [253, 669]], "residence": [[34, 9], [699, 223]]}
    pearson = {k: f"{chi2_contingency(np.array(c).T, correction=False)[0]:.3f}" for k, c in counts.items()}
    assert pearson == {"age": "6.375", "occupation": "1.341", "sex": "8.098", "marital": "0.071", "residence": "0.239"}
    from scipy.stats import chi2
    assert f"{chi2.sf(4.005, 5):.4f}" == "0.5487" and f"{chi2.sf(0.350, 3):.3f}" == "0.950"
    for form in ("md", "docx"):
        path = tmp_path / f"scirp.{form}"
        if form == "md":
            path.write_text(_SCIRP_2260316, encoding="utf-8")
        else:
            rows = _rows(_SCIRP_2260316)
            d = docx.Document()
            table = d.add_table(rows=len(rows), cols=len(rows[0]))
            for r, row in enumerate(rows):
                for c, cell in enumerate(row):
                    table.cell(r, c).text = cell
            d.save(str(path))
        entries = sorted(audit_file(path), key=lambda e: e.found)
        assert [e.found for e in entries] == ["χ² = 0.071, p = 0.789", "χ² = 0.239, p = 0.625", "χ² = 0.350, p = 0.950", "χ² = 4.005, p = 0.548",
                                              "χ² = 8.098, p = 0.004"], [e.found for e in entries]
        assert [e.codes for e in entries] == [[], [], ["percent-does-not-fit", "counts-do-not-fit"], ["p-does-not-follow", "counts-do-not-fit"], []], \
            [(e.found, e.codes) for e in entries]
        assert "718 / 749 is 95.9%, not 95.1%" in entries[2].message and "on 3 df they give Pearson's χ² 1.341" in entries[2].message
        assert "on 5 df they give Pearson's χ² 6.375" in entries[3].message, entries[3].message
        assert "cutting the exact p after its last digit gives, not rounding it (rounded: 0.549)" in entries[3].message
