"""A table's counts: a categorical variable's n (%) in each group's column, and the χ² or p the table gives for it, held
to the counts. A "Table 1" comparing groups prints each category's count by group and one test per variable — Pearson's
χ² (Yates's correction or Fisher's exact test for a 2 × 2 table, the likelihood-ratio χ² in some programs) —, so the
counts give the statistic, its df, (r − 1)(k − 1), and its p.

A variable's block is its rows of counts: after a row naming it (which may hold its test), or starting at the row that
holds its test; a row with counts and a test of its own starts a new block (a binary variable typed in one row, "Preterm
delivery | 287 (5.7%) | 1261 (5.6%) | 0.128 | 0.721", whose other category is each group's n, from its column's head,
less the count). Group columns are those whose cells give counts; a total column (its head says so) is not a group.
"""

from __future__ import annotations

import functools
import math
import re
from decimal import ROUND_HALF_UP, Decimal
from dataclasses import dataclass, replace
from typing import Iterator, NamedTuple, Sequence

from ..pvalues import upper_tail
from .checks import Finding, _small, reported_p_range
from .parsing import Number, Reported, p_text
from .means import _OCCASIONS, _PAIRED  # (what names the same people measured again)
from .reading import Unit
from .tables import _TOTAL_HEAD, MEANS_SAID, NOT_COUNTS, WHOLE_COUNT, _number, _p_cell, _role, _totals, cell_grid, count_cell, paired_heads, sizes_in, whole_count

_CHI_HEAD = re.compile(r"(?i)\s*(?:pearson(?:'?s)?\s+)?(?:χ\s?[²2]|chi[- ]?square[d]?|chi2|x\s?[²2])(?:\s*(?:value|test|statistic))?\s*(?:/\s*[A-Za-z]{1,2}\s*)?")
_MIXED_HEAD = re.compile(r"(?i)\s*(?:[ztFH]|U)\s*/\s*(?:χ\s?[²2]|chi2|x\s?[²2])\s*")  # "Z/χ2", "t/χ²": χ² in a count row


@dataclass(frozen=True, slots=True)
class CountTest:
    """One variable's counts by group (rows: its categories; columns: the groups) and the test the table gives for it."""

    unit: Unit  # the cell of its χ² (or, without one, of its p)
    rep: Reported  # the χ² with its p (df from the counts), or its p alone
    counts: tuple[tuple[int, ...], ...]
    how: str  # where the counts were read
    percents: tuple[str, ...] = ()  # what the percents are shares of, then each that is not its count's share
    other: str = ""  # a test the caption or note names that a table larger than 2 × 2 may have had instead (a trend test)
    exact: bool = False  # every test it names is Fisher's exact test (of a larger table: Freeman–Halton's), computed here
    df: int = 0  # (r − 1)(k − 1) of the counts
    typed: Reported | None = None  # the statistic as typed whole in its cell, where the test is one (rep its χ² with its p)
    sizes: str = ""  # the groups' n that do not add up to the total the table gives, said (size_tests)


# tests of a table larger than 2 × 2 other than those computed here, named in a caption or note: a trend test, a rank test
# of ordered categories, an exact test of the whole table (Freeman–Halton)
_OTHER_TEST = re.compile(r"(?i)\btrend|cochran[-–\s]?armitage|mantel|kruskal|mann[-–\s]?whitney|wilcoxon|\brank|fisher|\bexact\b|freeman")
# a row that gives each group's n: "n", "N", "No.", "Number of trials, n (%)", "Sample size", "Participants, n"
_SIZES_ROW = re.compile(r"(?i)\s*(?:n|no\.|number(?:\s+of\s+[\w\s-]+)?|sample\s+size|participants)(?:\s*[,:(]\s*(?:n|no\.?)?\s*(?:\(\s*%\s*\))?\)?)?\s*")


# a header row that gives each group's count and percent in two columns ("Number | % | Number | %", "n | (%)",
# "Intervention n | Intervention %"): a count's head, then its percent's with the same group's name or none
_N_HEAD = re.compile(r"(?i)\s*(?P<group>.*?)\s*\b(?:n|no\.?|number|count|freq(?:uency)?\.?)\s*")
_PERCENT_HEAD = re.compile(r"(?i)\s*(?P<group>.*?)\s*(?:\(\s*%\s*\)|%|percent(?:age)?|per\s+cent)\s*")


def _paired_cell(count: Unit, percent: "Unit | None") -> tuple[int, float, float] | None:
    """A count and its percent from two cells ("17 | 56.7", "17 | (56.7%)"), as count_cell reads them from one."""
    if percent is None:
        return None
    share = percent.text.strip()
    share = share[1:-1] if share[:1] == "(" and share[-1:] == ")" else share
    return count_cell(f"{count.text} ({share})") if "(" not in count.text else None


def _size_cell(text: str) -> int | None:
    """A group's n in a cell: a whole number ("120", "1,204") or a count with its percent ("34 (63)")."""
    counted = count_cell(text)
    if counted is not None:
        return counted[0]
    return whole_count(text)


# what says a table's "17 (19.1)" cells may be counts with their percents
_COUNTS_SAID = re.compile(r"(?i)%|\bn\s*\(|percent|frequenc|\bcounts?\b|\bnumbers?\b|\bno\.")


def _means_said(text: str) -> bool:
    """Whether a head (or a caption, note and heads) says its "17 (19.1)" cells are means with their SDs, and nothing of
    counts."""
    return MEANS_SAID.search(text) is not None and _COUNTS_SAID.search(text) is None


# survey weights: the percents are weighted and the test design-based (Rao–Scott), neither the counts' own
_WEIGHTED = re.compile(r"(?i)\bweight(?:ed|s)\b|rao[-–\s]?scott|design[- ]based|complex\s+survey|survey[- ]adjusted")


class _Block(NamedTuple):
    """A variable's rows of counts as read, with what the table said around them (count_tests)."""

    rows: list[dict[int, tuple[int, float, float]]]  # each row's {column: (count, percent, its half unit)}
    units: list[dict[int, Unit]]  # (and its cells)
    anchor: dict[int, Unit] | None  # the row holding the block's test
    typed: "tuple[Unit, Reported, str, Reported] | None"  # the test typed whole in a cell (_typed_test)
    heads: dict[int, str]
    sized: dict[int, int]
    p_col: int | None
    chi_col: int | None
    labelled: bool


def count_tests(cells: Sequence[tuple[int, int, Unit, list[Reported]]], mark: str = ".", said: str = "") -> list[CountTest]:
    """Each categorical variable's counts in a table, with its χ² (and p) or its p: see the module's text. A block is read
    only where each of its rows gives a count with its percent in every group's column, for at least two groups, and the
    percents are the counts' shares (of their column, their group's n or their row) or make up 100 (_shares); nothing
    where the caption, note (``said``) or a head says the figures are weighted (a survey's design-based test)."""
    top = min((r for r, _, _, _ in cells), default=0)
    opening = " ".join([said, *(u.text for r, _, u, _ in cells if r == top)])
    if _means_said(opening):  # ("M (SD)" said of the table by its caption, note or heads, and nothing of counts by them or its rows'
        labels = {r: c for r, c, _, _ in sorted(cells, key=lambda x: (x[0], -x[1]))}  # labels: "17 (19.1)" is a mean and its SD)
        if not any(_COUNTS_SAID.search(u.text) for r, c, u, _ in cells if labels[r] == c):
            return []
    if _WEIGHTED.search(said) or any(_WEIGHTED.search(u.text) for r, _, u, _ in cells if r == top):  # (a head: "n (weighted %)"; a row's
        return []  # label — "Birth weights" — says nothing of the figures)
    rows = cell_grid(cells)
    heads: dict[int, str] = {c: u.text for c, u in rows[top].items()} if top in rows else {}  # (the first row, until a header row: "| n = 5030 | n = 22,608 |")
    p_col = chi_col = None
    pairs: dict[int, int] = {}  # each count's column with its percent's, where the two stand apart (tables.paired_heads)
    typed_at: dict[tuple[int, int], list[tuple[Unit, Reported | None]]] = {}  # each cell's paragraphs with their statistics, for
    for r, c, unit, reps in cells:  # a test typed whole in one
        typed_at.setdefault((r, c), []).extend([(unit, rep) for rep in reps] or [(unit, None)])
    out: list[CountTest] = []
    block: list[dict[int, tuple[int, float, float]]] = []  # each row's {column: count} in the block being read
    units: list[dict[int, Unit]] = []  # (and its cells)
    sized: dict[int, int] = {}  # each group's n from a row of their own, under the current header
    anchor: dict[int, Unit] | None = None  # the row holding the block's test
    typed: tuple[Unit, Reported, str, Reported] | None = None  # (the test as typed in one of its cells, "χ2(2) = 5.496 P = 0.064")
    labelled = False  # the block began at a row naming its variable without a test (the test then on its first row of counts)

    pending: list[_Block] = []  # each block as read, tested once the whole table is (its percents may be padded: _padded)

    def close() -> None:
        if block:
            pending.append(_Block(block, units, anchor, typed, heads, sized, p_col, chi_col, labelled))

    for r in sorted(rows):
        row = rows[r]
        first = min(row)
        if r != top and _SIZES_ROW.fullmatch(row[first].text):  # the groups' n in a row of their own ("n | 120 | 118",
            sizes = {c: n for c, u in row.items() if c != first and (n := _size_cell(u.text)) is not None}  # "Number of trials, n (%)
            if len(sizes) >= 2:  # | 34 (63) | 20 (37)"): each group's n where its head gives none, for the blocks below
                close()
                block, units, anchor, labelled = [], [], None, False
                sized = {**sized, **sizes}
                continue
        if not any(_number(u.text, mark) is not None for u in row.values()) and (paired := paired_heads(row, _N_HEAD, _PERCENT_HEAD)):  # "n | % | n | %"
            close()
            block, units, anchor, labelled = [], [], None, False
            heads = {**heads, **{c: heads.get(c) or heads.get(b) or row[c].text for c, b in paired.items()}}  # (each group's name
            pairs = paired  # and n in the spanner above its two columns: "Intervention (n = 30)")
            roles = {c: _role(u.text) for c, u in row.items()}  # (the test's heads in the same row: "Urban n | Urban % | … | P")
            p_col = next((c for c, role in roles.items() if role == "p"), p_col)
            chi_col = next((c for c, u in row.items() if _CHI_HEAD.fullmatch(u.text) or _MIXED_HEAD.fullmatch(u.text)), chi_col)
            continue
        apart = (p_col, chi_col, *pairs.values())
        counts = {c: got for c, u in row.items() if c != first and c not in apart and not _means_said(heads.get(c, ""))
                  and (got := _paired_cell(u, row.get(pairs[c])) if c in pairs else count_cell(u.text)) is not None} \
            if NOT_COUNTS.search(row[first].text) is None else {}
        if counts or block:  # a zero count typed without its percent beside counts with theirs ("Dissatisfied | 0 | 1 (4.5)"), or a
            counts.update({c: (0, 0.0, 0.5) for c, u in row.items() if c != first and c not in apart and c not in counts
                           and u.text.strip() == "0"})  # row of zeros among a variable's rows: 0 (0%), the category's row, not the
            # end of its variable's
        test_cell = _typed_test(typed_at, r, [c for c in row if c != first and c not in apart and c not in counts])
        typed_col, in_cell = test_cell if test_cell is not None else (None, None)
        tested = in_cell is not None or any(c in row and row[c].text.strip() for c in (p_col, chi_col) if c is not None)
        if len(counts) >= 2:
            if tested and (anchor is not None or not labelled) or _outcome_pairs(counts, sorted(counts), every=True) is not None:  # a
                close()  # variable's own test, or a row of groups' outcome pairs (each its own table): a new block
                block, units, anchor, labelled = [], [], (row if tested else None), False
                typed = in_cell
            elif tested:  # the test of the variable named above, on one of its rows of counts
                anchor, typed = row, in_cell
            block.append(counts)
            units.append(row)
            continue
        close()
        block, units, anchor, labelled = [], [], None, False
        roles = {c: _role(u.text) for c, u in row.items()}
        if (any(roles.values()) or any(_CHI_HEAD.fullmatch(u.text) or _MIXED_HEAD.fullmatch(u.text) for u in row.values())) and \
                not any(_number(u.text, mark) is not None for u in row.values()):  # (a group's n in its head is no number: "n = 5030")
            heads, sized, pairs = {c: u.text for c, u in row.items()}, {}, {}  # a header row
            p_col = next((c for c, role in roles.items() if role == "p"), None)
            chi_col = next((c for c, u in row.items() if _CHI_HEAD.fullmatch(u.text) or _MIXED_HEAD.fullmatch(u.text)), None)
        elif all(not u.text.strip() for c, u in row.items() if c != first and c not in (p_col, chi_col) and c != typed_col
                 and _role(heads.get(c, "")) != "df"):  # (its df in a column of their own: "Degrees of freedom | 4")
            anchor, labelled, typed = (row if tested else None), True, in_cell  # a row naming the variable, its test there or on its
            # first row of counts
    close()
    padded = _padded([cell for b in pending for row in b[0] for cell in row.values()])
    for b in pending:
        read = [{c: (n, pct, half * 10 if half < 0.5 else half) for c, (n, pct, half) in row.items()} for row in b.rows] if padded else b.rows
        test = _test(read, b.anchor, b.typed, b.heads, b.sized, b.p_col, b.chi_col, mark) if b.anchor is not None else \
            _untested(read, b.units, b.heads, b.sized, b.labelled)
        if test is not None:
            out.append(test)
    other = _OTHER_TEST.search(said)  # (not for a χ² typed with the df of the counts' usual test: "χ2(2) = 5.496" is that test's)
    return [t if t.typed is not None and t.typed.symbol == "chi2" and t.typed.df and t.typed.df[0].value == t.df else
            replace(t, other=other.group(), exact=_exact_only(said)) for t in out] if other is not None else out


def _exact_only(text: str) -> bool:
    """Whether every other test a caption, note or cell names is Fisher's exact test ("Fisher's exact test", "exact test",
    "Freeman–Halton"): then a larger table's p is held to it too, as computed here."""
    return all(m.group().lower().startswith(("fisher", "exact", "freeman")) for m in _OTHER_TEST.finditer(text))


def _typed_test(typed_at: dict[tuple[int, int], list[tuple[Unit, Reported | None]]], r: int,
                columns: Sequence[int]) -> "tuple[int, tuple[Unit, Reported, str, Reported]] | None":
    """A variable's test typed whole in one of its row's cells, under a head that does not name it ("Results",
    "Statistic and P": "χ2(2) = 5.496 P = 0.064", "Fisher's exact test P = 0.42"): its column, and its χ² (or its p
    alone) with the cell's text. A χ² and its p in two paragraphs of the cell are held to the counts together (the χ²
    with the p of the paragraph after it: the counts' test only, each paragraph keeps its own statistic)."""
    for c in columns:
        cell = typed_at.get((r, c), [])
        text = " ".join(dict.fromkeys(u.text for u, _ in cell))
        found = [(u, rep) for u, rep in cell if rep is not None]
        chi = next((x for x in found if x[1].symbol == "chi2"), None)
        alone = [x for x in found if x[1].symbol is None and x[1].p is not None and x[1].value is None and not x[1].effects]
        if chi is not None and chi[1].p is None and any(u is not chi[0] for u, _ in alone):
            after = next(x for x in alone if x[0] is not chi[0])
            return c, (chi[0], replace(chi[1], p=after[1].p), text, chi[1])
        if chi is not None or alone:
            unit, rep = chi or alone[0]
            return c, (unit, rep, text, rep)
    return None


def _padded(cells: Sequence[tuple[int, float, float]]) -> bool:
    """Whether a table's percents are to be read to one decimal fewer than typed: every one typed with decimals ends in
    a 0 (four at least) — one-decimal percents padded to two ("16.70 | 83.30"), or whole ones to one ("45.0") claim no
    digit they lack."""
    typed = [(pct, half) for _, pct, half in cells if half < 0.5]
    return len(typed) >= 4 and not any(round(pct / (2 * half)) % 10 for pct, half in typed)


_SHARES = ("of its column's counts", "of its group's n", "of its row's counts")


def _shares(block: Sequence[dict[int, tuple[int, float, float]]], groups: list[int], sizes: list[int | None]) -> tuple[str, ...] | None:
    """What the block's percents are shares of, then each cell's whose percent is not its count's share (nothing when all
    are); None where they are not counts (_misfits)."""
    found = _misfits(block, groups, sizes)
    if found is None:
        return None
    return (found[0], *(said for _, _, said in found[1])) if found[1] else ()


def _misfits(block: Sequence[dict[int, tuple[int, float, float]]], groups: list[int],
             sizes: list[int | None]) -> "tuple[str, list[tuple[int, int, str]]] | None":
    """What the block's percents are shares of — their column's sum, their group's n (from its head) or their row's sum:
    whichever most of its cells fit, to the printed digits —, and each cell whose percent is not its count's share (its
    row, its group's place, what it is and should be); None where fewer than half the cells fit any and the percents do
    not make up 100 (then they are not counts: a median with its IQR, "5 (5)")."""
    cells = [(i, j, *row[c]) for i, row in enumerate(block) for j, c in enumerate(groups)]
    column_sums = [sum(row[c][0] for row in block) for c in groups]
    row_sums = [sum(row[c][0] for c in groups) for row in block]
    wholes = ([column_sums[j] for i, j, *_ in cells] if len(block) > 1 else [0] * len(cells),
              [sizes[j] or 0 for i, j, *_ in cells], [row_sums[i] for i, j, *_ in cells])
    fits = [[bool(w) and abs(100.0 * n / w - pct) <= half + 1e-9 for w, (i, j, n, pct, half) in zip(whole, cells)] for whole in wholes]
    best = max(range(len(fits)), key=lambda k: sum(fits[k]))
    if 2 * sum(fits[best]) < len(cells) and not _whole(block, groups):
        return None
    return _SHARES[best], [(i, j, _not_share(n, w, pct, half))
                           for ok, w, (i, j, n, pct, half) in zip(fits[best], wholes[best], cells) if not ok and w]


def _outcome_pairs(row: dict[int, tuple[int, float, float]], columns: list[int], every: bool = False) -> "tuple[list[tuple[int, int]], tuple[str, ...]] | None":
    """A row of two or more groups' outcomes side by side, "Positive (n%) | Negative (n%)" under each group's spanner
    (PMC10547446's Table 1: "524 (10.66) | 4393 (89.34) | … | 140 (4.43) | 3,020 (95.57)"): the count columns in pairs
    whose percents make up 100 — in at least half the pairs (a printed slip aside), or with ``every`` in all —; each
    group's two counts, and (as _shares gives them) the percents that are not their count's share of their pair. None
    for any other row."""
    if len(columns) < 4 or len(columns) % 2:
        return None
    pairs = [(row[a], row[b]) for a, b in zip(columns[::2], columns[1::2])]
    whole = sum(abs(x[1] + y[1] - 100.0) <= x[2] + y[2] + 1e-9 for x, y in pairs)
    if whole < len(pairs) if every else 2 * whole < len(pairs):
        return None
    wrong = [_not_share(n, x[0] + y[0], pct, half)
             for x, y in pairs for n, pct, half in (x, y) if x[0] + y[0] and abs(100.0 * n / (x[0] + y[0]) - pct) > half + 1e-9]
    return [(x[0], y[0]) for x, y in pairs], (("of its group's two counts", *wrong) if wrong else ())


def _whole(block: Sequence[dict[int, tuple[int, float, float]]], groups: list[int]) -> bool:
    """Whether the block's percents make up 100 in each group's column, or in each row, to their printed digits: the
    mark of a variable's counts even where their percents are wrong (a table whose percents of one column are of another)."""
    if len(block) < 2:
        return False
    columns = [[row[c] for row in block] for c in groups]
    rows = [[row[c] for c in groups] for row in block]
    return any(all(abs(sum(pct for _, pct, _ in line) - 100.0) <= sum(half for _, _, half in line) + 1e-9 for line in lines)
               for lines in (columns, rows))


def _places(half: float) -> int:
    return max(0, round(-math.log10(2 * half)))


def _not_share(n: int, whole: int, pct: float, half: float) -> str:
    """What a misfit percent is said to be: "7536 / 22,608 is 33.3%, not 33.0%"."""
    return f"{n} / {whole:,} is {_share(n, whole, half)}%, not {pct:.{_places(half)}f}%"


def _share(n: int, whole: int, half: float) -> str:
    """n's share of its whole in percent, printed with the table's percents' digits (one at least) — and more where that
    digit would round to another percent than the share does: 5 / 11 is "45.45", not "45.5", beside a printed 46."""
    share, step = 100.0 * n / whole, Decimal(1).scaleb(-_places(half))
    right = Decimal(repr(share)).quantize(step, ROUND_HALF_UP)
    for digits in range(max(1, _places(half)), _places(half) + 5):
        shown = Decimal(f"{share:.{digits}f}")
        if shown.quantize(step, ROUND_HALF_UP) == right:
            break
    return str(shown)


def _test(block: Sequence[dict[int, tuple[int, float, float]]], anchor: dict[int, Unit], typed: "tuple[Unit, Reported, str, Reported] | None",
          heads: dict[int, str], sized: dict[int, int], p_col: int | None, chi_col: int | None, mark: str) -> CountTest | None:
    """The block's test, when its counts make a table of at least two groups and two categories: the test's column's
    value (or its p's) on the anchor's row, or the test ``typed`` whole in one of its cells."""
    found = _groups(block, heads, sized)
    if found is None:
        return None
    groups, sizes = found
    percents = _shares(block, groups, sizes)
    paired = _outcome_pairs(block[0], groups) if len(block) == 1 and percents is None else None  # (only where the counts are no
    percents = paired[1] if paired is not None else percents  # single category of each group: their percents its n's shares)
    if percents is None:
        return None
    table = [[row[c][0] for c in groups] for row in block]
    if paired is not None:  # a row of groups' outcome pairs: each group's two counts (its categories)
        table = [list(x) for x in zip(*paired[0])]
        groups = groups[::2]
    elif len(table) == 1:  # one category typed: the other is each group's n (its head's) less it
        if any(s is None or s < n for s, n in zip(sizes, table[0])):
            return None
        table.append([s - n for s, n in zip(sizes, table[0])])  # type: ignore[operator]
    counts = tuple(tuple(row[j] for row in table) for j in range(len(groups)))  # (the groups as rows)
    if typed is not None:  # (the χ² or p as read from its cell, with its df where typed: the item's own statistic)
        df = (len(table) - 1) * (len(groups) - 1)
        named = _OTHER_TEST.search(typed[2])  # ("Fisher's exact test = 3.86 P = 0.42": a larger table's exact test)
        return CountTest(typed[0], typed[1], counts, _how(table, groups, block, paired, counts, df), percents, named.group() if named else "", named is not None and _exact_only(typed[2]),
                         df, typed[3])
    p_unit = anchor.get(p_col) if p_col is not None else None
    chi_unit = anchor.get(chi_col) if chi_col is not None else None
    p = _p_cell(p_unit.text, mark) if p_unit is not None and p_unit.text.strip() else None
    read = _number(chi_unit.text, mark) if chi_unit is not None else None  # (its footnote mark or stars after it: "4.005Y", "8.10**")
    value = read[1] if read is not None and read[0] == "=" and read[1].value >= 0 else None
    if p is None and value is None:
        return None
    df = (len(table) - 1) * (len(groups) - 1)
    how = _how(table, groups, block, paired, counts, df)
    if value is not None:
        number = value
        rep = Reported("chi2", "χ²", number.start, number.start, number.end, (Number(str(df), float(df), 0, 0, 0),), None, "=", number, p)
        unit = chi_unit
    else:
        rep = Reported(None, "", p.start, p.start, p.end, (), None, "=", None, p)  # type: ignore[union-attr]
        unit = p_unit
    rep.text = ", ".join(([f"χ²({df}) = {number.text}"] if value is not None else []) + ([p_text(p).lstrip(', ')] if p is not None else []))
    return CountTest(unit, rep, counts, how, percents, df=df)  # type: ignore[arg-type]


def _how(table: Sequence[Sequence[int]], groups: Sequence[int], block: Sequence[object], paired: object,
         counts: Sequence[Sequence[int]], df: int) -> str:
    """Where a test's counts were read, and the Pearson χ² they give."""
    trimmed = _trimmed(counts)
    chi = pearson(trimmed) if len(trimmed) >= 2 and len(trimmed[0]) >= 2 else None
    given = f"; Pearson's χ²({df}) = {_shown(chi)} from them, p = {_small(upper_tail('chi2', chi, (float(df),)))}" if chi is not None else ""
    return (f"the counts of {len(table)} categories in {len(groups)} groups' columns" if paired is None else
            f"the counts of {len(groups)} groups' two outcomes in pairs of columns") + \
        (" (the other category each group's n less the count)" if len(block) == 1 and paired is None else "") + given


def _groups(block: Sequence[dict[int, tuple[int, float, float]]], heads: dict[int, str],
            sized: dict[int, int]) -> "tuple[list[int], list[int | None]] | None":
    """The block's group columns (a total column set aside) and each group's n from its head (or, where the head gives
    none, from a row of the groups' n: ``sized``), where every row gives a count in each of at least two groups' columns."""
    groups = sorted(c for c in set.intersection(*(set(row) for row in block)) if not _TOTAL_HEAD.match(heads.get(c, "")))
    if len(groups) < 2 or any(set(row) - set(groups) - {c for c in row if _TOTAL_HEAD.match(heads.get(c, ""))} for row in block):
        return None
    head_sizes = [sizes_in(heads.get(c, "")) for c in groups]
    return groups, [s[0] if len(s) == 1 else None if s else sized.get(c) for c, s in zip(groups, head_sizes)]


def _untested(block: Sequence[dict[int, tuple[int, float, float]]], units: Sequence[dict[int, Unit]], heads: dict[int, str],
              sized: dict[int, int], labelled: bool) -> CountTest | None:
    """A block of counts the table gives no test for (a descriptive "Table 1"): its percents held to their counts alone,
    as a tested block's are; an entry (at the first percent that is not its count's share) only where one is not. Only
    where the block is one variable's (after a row naming it) or the heads give every group's n: without a test's row
    to start each variable, the rows of several may stand together, each variable's percents of its own valid n."""
    found = _groups(block, heads, sized)
    if found is None or not (labelled or all(found[1])):
        return None
    misfits = _misfits(block, found[0], found[1])
    if not misfits:
        return None
    wrong = [(i, j, said) for i, j, said in misfits[1] if not _run_share(block, i, found[0][j])]
    if not wrong:
        return None
    i, j, _ = wrong[0]
    unit = units[i][found[0][j]]
    return CountTest(unit, _cell_entry(unit), (), f"the counts of {len(block)} rows in {len(found[0])} groups' columns, no test of them given",
                     (misfits[0], *(said for _, _, said in wrong)))


def _cell_entry(unit: Unit) -> Reported:
    """A table cell read as an entry of its own, without a statistic (a count whose percent does not fit): its text."""
    text = unit.text.strip()
    start = unit.text.find(text)
    rep = Reported(None, "", start, start, start + len(text))
    rep.text = text
    return rep


def _run_share(block: Sequence[dict[int, tuple[int, float, float]]], i: int, column: int) -> bool:
    """Whether row ``i``'s percent in ``column`` is its count's share of the counts of some run of two or more rows around
    it: without a row naming each variable, one variable's rows may stand among others', its percents of its own valid n."""
    n, pct, half = block[i][column]
    totals = [row[column][0] for row in block]
    for start in range(i + 1):
        for end in range(max(i + 1, start + 2), len(block) + 1):
            whole = sum(totals[start:end])
            if whole and abs(100.0 * n / whole - pct) <= half + 1e-9:
                return True
    return False


# a count with its whole and its percent in one cell, as clinical tables print them: "45/120 (37.5)", "1,204/3,310 (36.4%)"
_FRACTION_CELL = re.compile(rf"\s*(?P<n>{WHOLE_COUNT})\s*/\s*(?P<whole>{WHOLE_COUNT})\s*\(\s*(?P<pct>\d+(?:[.,]\d+)?)\s*%?\s*\)\s*")


def fraction_tests(cells: Sequence[tuple[int, int, Unit, list[Reported]]]) -> list[CountTest]:
    """Each cell that gives a count with its whole and percent ("45/120 (37.5)") whose percent is not n / N: an entry of
    its own (the whole is the cell's, so no other reading of the percent stands)."""
    out = []
    for _, _, unit, _ in cells:
        m = _FRACTION_CELL.fullmatch(unit.text)
        if m is None:
            continue
        n, whole = (int(re.sub(r"\D", "", m.group(g))) for g in ("n", "whole"))
        pct = m.group("pct").replace(",", ".")
        half = 0.5 * 10.0 ** -len(pct.partition(".")[2])
        if not 0 < whole or n > whole or abs(100.0 * n / whole - float(pct)) <= half + 1e-9:
            continue
        out.append(CountTest(unit, _cell_entry(unit), (), "a count with its whole and its percent in one cell",
                             ("of the whole the cell gives", _not_share(n, whole, float(pct), half))))
    return out


def size_tests(cells: Sequence[tuple[int, int, Unit, list[Reported]]], caption: str, said: str) -> list[CountTest]:
    """A header row's groups' n against the total the table gives — a total column's head ("Total (N = 100)"), or where
    there is none the caption's one N —: an entry at the total's head (or the first group's) where they add up to more
    (fewer may be legitimate: subgroups need not exhaust their total, "Anencephaly (N = 123) | Spina bifida (N = 115) |
    Total NTDs (N = 263)"); and each row's count in a total column against its groups' counts (_row_totals). Not where
    the heads name occasions or the caption or note a paired or repeated design (the same people counted twice), nor for
    heads of fewer than two groups."""
    if _PAIRED.search(said):
        return []
    rows = cell_grid(cells)
    for r in sorted(rows)[:3]:  # (the header rows stand at the top)
        row = rows[r]
        if _OCCASIONS.search(" ".join(u.text for u in row.values())):
            continue
        found = _row_totals(rows, r, caption)
        sized = {c: s[0] for c, u in sorted(row.items()) if len(s := sizes_in(u.text)) == 1}
        totals = [c for c in sized if _TOTAL_HEAD.match(row[c].text)]
        groups = [c for c in sized if c not in totals]
        if len(groups) < 2 or len(totals) > 1:
            if found:
                return found
            continue
        stated = _totals(caption) if not totals else [sized[totals[0]]]
        if len(stated) != 1 or sum(sized[c] for c in groups) <= stated[0]:
            return found
        unit = row[totals[0]] if totals else row[groups[0]]
        parts = " + ".join(f"{sized[c]:,}" for c in groups)
        where = "the total column's head gives" if totals else "the caption gives"
        said_sizes = (f"The groups' n in the heads add up to {sum(sized[c] for c in groups):,} ({parts}), more than the N = {stated[0]:,} {where}. "
                      "Say where the others are (missing data, exclusions), or correct the numbers.")
        return [CountTest(unit, _cell_entry(unit), (), "the groups' n in the table's heads", sizes=said_sizes), *found]
    return []


def _row_totals(rows: "dict[int, dict[int, Unit]]", header: int, caption: str) -> list[CountTest]:
    """Each row's count in a total column ("Total" over "78" or "78 (6.8)") against its groups' counts in the other
    columns, each "n (%)" ("42 (11.6) | 29 (4.7) | 7 (4.1)"): a total below their sum cannot be; one above it only where
    the groups' n in the heads add up to the table's N (the total column's head's, else the caption's one N), so that no
    one stands outside the groups."""
    head = rows[header]
    label = min(c for row in rows.values() for c in row)  # (the rows' labels' column: a header's empty first cell is no cell)
    totals = [c for c, u in sorted(head.items()) if c != label and _TOTAL_HEAD.match(u.text)]
    if len(totals) != 1:
        return []  # (none, or each group's own total beside its outcomes: "Total | Positive (n%) | Negative (n%)" twice)
    total_col = totals[0]
    groups = [c for c in sorted(head) if c not in (label, total_col) and head[c].text.strip() and not _role(head[c].text)]  # (before
    # it or after; each group its own head, not a spanner's empty columns)
    if len(groups) < 2:
        return []
    sizes = [sizes_in(head[c].text) for c in groups]
    stated = sizes_in(head[total_col].text) or _totals(caption) or sizes_in(head[min(head)].text)
    whole = all(len(s) == 1 for s in sizes) and len(stated) == 1 and sum(s[0] for s in sizes) == stated[0]
    out = []
    for r in sorted(rows):
        row = rows[r]
        if r <= header or total_col not in row or label not in row or NOT_COUNTS.search(row[label].text):
            continue
        total = whole_count(row[total_col].text)
        got = count_cell(row[total_col].text) if total is None else None
        total = got[0] if got is not None else total
        parts = [got for c in groups if c in row and (got := count_cell(row[c].text)) is not None]
        if total is None or len(parts) != len(groups):
            continue
        added = sum(p[0] for p in parts)
        if added > total or (whole and added != total):
            unit = row[total_col]
            typed = " + ".join(f"{p[0]:,}" for p in parts)
            why = (f"more than the {total:,} its total column gives" if added > total else
                   f"fewer than the {total:,} its total column gives, though the groups' n in the heads make up the table's N = {stated[0]:,}")
            out.append(CountTest(unit, _cell_entry(unit), (), f"the row's total column and its groups' counts ({row[label].text.strip()})",
                                 sizes=f"The groups' counts in the row add up to {added:,} ({typed}), {why}. Correct the count that is wrong."))
    return out


# -- the tests the counts give ---------------------------------------------------------------------------------------


def _expected(table: Sequence[Sequence[int]]) -> list[list[float]]:
    rows = [sum(r) for r in table]
    cols = [sum(c) for c in zip(*table)]
    total = sum(rows)
    return [[rows[i] * cols[j] / total for j in range(len(cols))] for i in range(len(rows))]


def _trimmed(table: Sequence[Sequence[int]]) -> list[list[int]]:
    """The table without rows or columns of zeros (they add nothing and leave an expected count of 0)."""
    keep_rows = [r for r in table if sum(r)]
    keep_cols = [j for j in range(len(keep_rows[0])) if any(r[j] for r in keep_rows)] if keep_rows else []
    return [[r[j] for j in keep_cols] for r in keep_rows]


def pearson(table: Sequence[Sequence[int]], yates: bool = False) -> float:
    """Pearson's χ² of a table of counts; with ``yates`` (a 2 × 2 table) each |O − E| less a half, not below 0 (R's
    chisq.test and scipy's chi2_contingency)."""
    e = _expected(table)
    total = 0.0
    for row, erow in zip(table, e):
        for o, x in zip(row, erow):
            d = abs(o - x)
            if yates:
                d = max(0.0, d - 0.5)
            total += d * d / x
    return total


def likelihood_ratio(table: Sequence[Sequence[int]]) -> float:
    """The likelihood-ratio χ² (G): 2 Σ O ln(O / E)."""
    e = _expected(table)
    return 2 * sum(o * math.log(o / x) for row, erow in zip(table, e) for o, x in zip(row, erow) if o > 0)


def fisher_2x2(table: Sequence[Sequence[int]]) -> float:
    """Fisher's exact test of a 2 × 2 table, two-sided: the probability of the tables with the same margins no more
    likely than the one observed (R's fisher.test, with its relative tolerance 1e-7)."""
    (a, b), (c, d) = table
    r1, c1, n = a + b, a + c, a + b + c + d

    def log_p(x: int) -> float:  # the hypergeometric probability of x in the first cell
        return (math.lgamma(r1 + 1) - math.lgamma(x + 1) - math.lgamma(r1 - x + 1) + math.lgamma(n - r1 + 1)
                - math.lgamma(c1 - x + 1) - math.lgamma(n - r1 - c1 + x + 1) - math.lgamma(n + 1) + math.lgamma(c1 + 1) + math.lgamma(n - c1 + 1))

    low, high = max(0, c1 - (n - r1)), min(r1, c1)
    observed = log_p(a)
    return min(1.0, sum(math.exp(q) for x in range(low, high + 1) if (q := log_p(x)) <= observed + 1e-7))


def fisher_rxc(table: Sequence[Sequence[int]], budget: int = 600_000) -> float | None:
    """Fisher's exact test of an r × c table (Freeman and Halton's): the probability of the tables with the observed
    margins no more likely than the observed one (R's fisher.test, relative tolerance 1e-7), summed column by column
    over the table's remaining row totals; a branch whose completions are all, or none, at most as likely as the
    observed table is summed, or dropped, whole (the most and least likely completion of each state, found once; for the
    last two columns in closed form, _two_columns), as in Mehta and Patel's network algorithm. None where that would
    take more than ``budget`` column vectors (about a second here: a large table, then not computed)."""
    columns = [list(c) for c in zip(*table) if sum(c)]
    columns = [list(c) for c in zip(*[r for r in zip(*columns) if sum(r)])] if columns else []  # (empty rows and columns dropped)
    if len(columns) < 2 or len(columns[0]) < 2:
        return 1.0
    if len(columns[0]) > len(columns):  # (the state is a column's height: the smaller side)
        columns = [list(r) for r in zip(*columns)]
    columns.sort(key=sum)  # (small columns first: fewer branches near the root)
    sizes = [sum(c) for c in columns]
    totals = tuple(sum(c[i] for c in columns) for i in range(len(columns[0])))
    lf = [math.lgamma(i + 1) for i in range(sum(totals) + 1)]
    log_all = lf[sum(totals)] - sum(lf[t] for t in totals)  # (every table's weight Π_j C_j! / Π x_ij! sums to N! / Π R_i!)
    threshold = sum(lf[n] - sum(lf[x] for x in c) for n, c in zip(sizes, columns)) + math.log1p(1e-7)
    last, work = len(columns) - 1, [0]

    def vectors(total: int, caps: tuple[int, ...]) -> "Iterator[tuple[int, ...]]":
        if len(caps) == 1:
            if total <= caps[0]:
                yield (total,)
            return
        rest = sum(caps[1:])
        for x in range(max(0, total - rest), min(caps[0], total) + 1):
            for tail in vectors(total - x, caps[1:]):
                yield (x, *tail)

    def steps(j: int, left: tuple[int, ...]) -> "Iterator[tuple[float, tuple[int, ...]]]":
        for x in vectors(sizes[j], left):
            work[0] += 1
            if work[0] > budget:
                raise _TooLarge
            yield lf[sizes[j]] - sum(lf[a] for a in x), tuple(r - a for r, a in zip(left, x))

    @functools.lru_cache(maxsize=None)
    def bounds(j: int, left: tuple[int, ...]) -> tuple[float, float]:  # the least and most likely completions' log weights
        if j == last:
            w = lf[sizes[j]] - sum(lf[x] for x in left)
            return w, w
        if j == last - 1:  # two columns left: each row's share of them is a concave function of its count in the first
            work[0] += sizes[j] + (1 << len(left))  # (its cost, counted as column vectors are)
            if work[0] > budget:
                raise _TooLarge
            return _two_columns(left, sizes[j], lf)
        found = [(w + b[0], w + b[1]) for w, rest in steps(j, left) for b in (bounds(j + 1, rest),)]
        return min(f[0] for f in found), max(f[1] for f in found)

    def walk(j: int, left: tuple[int, ...], so_far: float) -> float:
        low, high = bounds(j, left)
        if so_far + high <= threshold:  # every completion counts: their weights sum to m! / Π r_i!
            return math.exp(so_far + lf[sum(left)] - sum(lf[x] for x in left) - log_all)
        if so_far + low > threshold:
            return 0.0
        return sum(walk(j + 1, rest, so_far + w) for w, rest in steps(j, left))

    try:
        return min(1.0, walk(0, totals, 0.0))
    except _TooLarge:
        return None


def _two_columns(left: tuple[int, ...], size: int, lf: list[float]) -> tuple[float, float]:
    """The least and most likely ways to fill the last two columns (the first of ``size``) from the rows' remaining totals
    ``left``, as the log of Π C_j! / Π x_ij!: a sum over rows of −lf(x) − lf(r − x), concave in each row's x, under Σ x =
    size. Its most at the greedy allocation (each next unit where it adds most: the gains fall as x grows); its least at
    a vertex of the box, every row but one at 0 or its total."""
    rest = sum(left) - size
    base = lf[size] + lf[rest]

    def value(x: "Sequence[int]") -> float:
        return base - sum(lf[a] + lf[r - a] for a, r in zip(x, left))

    x = [0] * len(left)
    for _ in range(size):  # (the gain of one more unit in row i: lf(x) + lf(r − x) − lf(x + 1) − lf(r − x − 1))
        i = max((i for i in range(len(left)) if x[i] < left[i]), key=lambda i: lf[x[i]] + lf[left[i] - x[i]] - lf[x[i] + 1] - lf[left[i] - x[i] - 1])
        x[i] += 1
    most = value(x)
    least = math.inf
    for free in range(len(left)):
        others = [i for i in range(len(left)) if i != free]
        for mask in range(1 << len(others)):
            y = [0] * len(left)
            for bit, i in enumerate(others):
                y[i] = left[i] if mask >> bit & 1 else 0
            y[free] = size - sum(y)
            if 0 <= y[free] <= left[free]:
                least = min(least, value(y))
    return least, most


class _TooLarge(Exception):
    """An exact test's enumeration beyond its budget."""


def counts_fit(test: CountTest, alpha: float, unheld: "list[str] | None" = None) -> list[Finding]:
    """The table's χ² and p against its counts: the χ² one of Pearson's, Yates's (2 × 2) or the likelihood ratio's, each
    on (r − 1)(k − 1) df; the p one of theirs or Fisher's exact test's (2 × 2; of a larger table where the caption, note
    or cell names it and the table is small enough to enumerate: fisher_rxc) — with the printed precision of each; and
    each percent its count's share. What the p could not be held to is said in ``unheld``."""
    rep, counts = test.rep, test.counts
    out = [Finding("sizes-do-not-add", test.sizes, test.sizes.split(" (", 1)[1].split(")", 1)[0])] if test.sizes else []
    out += [Finding("percent-does-not-fit", f"A percent is not its count's share {test.percents[0]}: " + "; ".join(test.percents[1:]) + ".",
                   ", ".join(f"{part.split(' / ')[0]} ({part.rsplit('not ', 1)[1]})" for part in test.percents[1:]))] if test.percents else []
    table = _trimmed(counts)
    larger = len(table) * len(table[0]) > 4 if len(table) >= 2 and len(table[0]) >= 2 else False
    if len(table) < 2 or len(table[0]) < 2 or (test.other and larger and not test.exact):  # (a table larger than 2 × 2 whose test the
        return out  # note says may be another: a trend test, a rank test of ordered categories)
    df = (len(table) - 1) * (len(table[0]) - 1)
    two = len(table) == 2 and len(table[0]) == 2
    methods = {"Pearson's χ²": pearson(table), "the likelihood-ratio χ²": likelihood_ratio(table)}
    if two:
        methods["Yates's χ²"] = pearson(table, yates=True)
    value = rep.value
    if value is not None and rep.symbol == "chi2" and not (test.other and larger):  # (beside a named exact test, a larger table's
        low, high = value.value - value.half_unit, value.value + value.half_unit
        if not any(low - 1e-9 * max(1.0, x) <= x <= high + 1e-9 * max(1.0, x) for x in methods.values()):
            said = "; ".join(f"{name} {_shown(x, value.decimals)}" for name, x in methods.items())
            out.append(Finding("counts-do-not-fit", f"χ² = {value.text} does not follow from the table's counts: on {df} df they give {said}.",
                               f"χ² = {value.text}; counts {_counts_text(counts)}"))
    reported = reported_p_range(rep, alpha)
    if reported is not None:
        ps = {name: upper_tail("chi2", x, (float(df),)) for name, x in methods.items()}
        fits = any(reported[0] - 1e-12 <= q <= reported[1] + 1e-12 for q in ps.values())
        if two and not fits and min(sum(table[0]), table[0][0] + table[1][0]) <= 50_000:  # (only then: its sum runs over as many
            # tables as the smaller margin's count; beyond 50,000 the χ² tests stand for it)
            ps["Fisher's exact test"] = fisher_2x2(table)
            fits = reported[0] - 1e-12 <= ps["Fisher's exact test"] <= reported[1] + 1e-12
        exact = fisher_rxc(table) if larger and test.exact and not fits else None
        if larger and test.exact and not fits and exact is None:  # (too large to enumerate here: not held, and said)
            if unheld is not None:
                unheld.append(f"The p fits none of the χ² tests of the counts; Fisher's exact test of this {len(table)} × {len(table[0])} table, "
                              "which the table names, is too large to compute here, so the p is not held to it.")
            return out
        if exact is not None:
            ps["Fisher's exact test (Freeman–Halton)"] = exact
            fits = reported[0] - 1e-12 <= exact <= reported[1] + 1e-12
        if not fits:
            said = "; ".join(f"{name} p = {_small(q)}" for name, q in ps.items())
            out.append(Finding("counts-do-not-fit", f"The p does not follow from the table's counts by the usual tests of a {len(table)} × {len(table[0])} "
                                                    f"table ({said}); if another test gave it (a trend test"
                                                    + (", an exact test of a larger table" if larger and exact is None else "") + "), the note should say so.",
                               f"{p_text(rep.p).lstrip(', ')}; counts {_counts_text(counts)}"))  # type: ignore[arg-type]
    return out


def _shown(x: float, decimals: int = 0) -> str:
    """A χ² from the counts, to three decimals — and more where those would round to another value at the printed χ²'s
    decimals than the χ² itself does: 0.4145 beside a printed 0.42, not "0.415", which reads as if it rounded to it."""
    step = Decimal(1).scaleb(-decimals)
    right = Decimal(repr(x)).quantize(step, ROUND_HALF_UP)
    for digits in range(max(3, decimals), max(3, decimals) + 6):
        shown = f"{x:.{digits}f}"
        if Decimal(shown).quantize(step, ROUND_HALF_UP) == right:
            return shown
    return shown


def _counts_text(counts: Sequence[Sequence[int]]) -> str:
    return " vs ".join("/".join(str(n) for n in group) for group in counts)
