"""A table's means and SDs of two groups, and the t (or the two groups' F, t²) it gives beside them: the t follows from
the means, the SDs and the group sizes in the column heads — Student's, over the pooled SD, or Welch's —, to the printed
digits of each. A "Table 1" comparing two groups prints a variable's "M ± SD" in each group's column, its test and p in
the columns after them ("Age (years) | 45.3 ± 6.2 | 44.1 ± 5.9 | 0.951 | 0.344", the heads "Control (n = 45) |
Intervention (n = 47) | t/χ2 | P").

Not where the table may compare the same people twice (its caption or note names a paired or repeated design, its heads
occasions — a baseline, a follow-up, a time): a paired t needs the correlation of the two measures, which the table does
not give.
"""

from __future__ import annotations

import math
import re
from dataclasses import dataclass
from typing import Sequence

from .checks import Finding
from .parsing import Number, Reported
from .reading import Unit
from .tables import _TOTAL_HEAD, COUNT_CELL, MEANS_SAID, OCCASIONS, _number, _p_cell, _role, cell_grid, count_cell, paired_heads, sizes_in, whole_count

# a mean with its SD, "45.3 ± 6.2", "10.07 ±4.80", "3.2 +/- 0.5"
_MEAN_SD = re.compile(r"\s*(?P<m>[-−–]?\s?\d+(?:[.,]\d+)?)\s*(?:±|\+/-|\+-)\s*(?P<sd>\d+(?:[.,]\d+)?)\s*[a-d*†‡]*\s*")
# a design whose two columns may be the same people's (a paired t is not computed from the two means and SDs): said of
# the table ("paired", "repeated measures"), or the columns' heads naming occasions ("Baseline | Follow-up", "Pre | Post") —
# not a caption's "Baseline characteristics", a trial's Table 1 of independent groups
_PAIRED = re.compile(r"(?i)\bpaired|(?<!in)dependent[- ]samples?|\brepeated|\bwithin[- ]subjects?")
# a mean ± its standard error, not its SD ("mean ± SE", "± SEM", "standard error of the mean"), said in the caption, note or a
# head: a t from the means and those numbers as SDs would be far off
_SE_SAID = re.compile(r"(?<![\w.])(?:SEM?|S\.E\.(?:M\.)?)(?![\w.])|(?i:standard\s+errors?)")
_OCCASIONS = re.compile(rf"{_PAIRED.pattern}|{OCCASIONS.pattern}")


@dataclass(frozen=True, slots=True)
class GroupMeans:
    """The groups' means, SDs and sizes beside a t or F: each (mean, its half unit, SD, its half unit, n)."""

    unit: Unit  # the t's (or F's) cell
    groups: tuple[tuple[float, float, float, float, int], ...]
    typed: str  # the cells as the table prints them
    rep: Reported | None = None  # the statistic with its p, where the table reader had not read it (a "F/t value" column)
    welch: bool = False  # the caption or note names Welch's test: an F of more than two groups is held to Welch's ANOVA only


# a mean with its SD in parentheses, "45.3 (6.2)" — read so only where the table says its cells are means and SDs
_MEAN_PAREN = re.compile(r"\s*(?P<m>[-−–]?\s?\d+(?:[.,]\d+)?)\s*\(\s*(?P<sd>\d+(?:[.,]\d+)?)\s*\)\s*[a-d*†‡]*\s*")
# and what says such cells may be something else: counts with their percents, medians with their IQRs, standard errors
_NOT_MEANS_SAID = re.compile(r"(?i)%|\bn\s*\(|percent|frequenc|median|\bIQR\b|interquartile|\bSEM?\b|standard\s+error")
# a header row that gives each group's mean and SD in two columns of their own: "M | SD | M | SD", "Mean | S.D."
_M_HEAD = re.compile(r"(?i)\s*(?P<group>.*?)\s*\b(?:M|mean)\s*")
_SD_HEAD = re.compile(r"(?i)\s*(?P<group>.*?)\s*\(?\s*\b(?:SD|S\.\s?D\.|std\.?\s*dev(?:iation)?\.?)\s*\)?\s*")  # ("(SD)" over "(2.0)")


_N_HEAD = re.compile(r"\s*[nN]\s*")


def _counted_columns(row: dict[int, Unit], pairs: dict[int, int]) -> dict[int, int]:
    """Each group's n column right after its SD's ("M | SD | n | M | SD | n"), by its mean's column; nothing unless every
    group has one."""
    columns = sorted(row)
    after = {a: b for a, b in zip(columns, columns[1:])}
    counted = {m: after[sd] for m, sd in pairs.items() if sd in after and _N_HEAD.fullmatch(row[after[sd]].text)}
    return counted if len(counted) == len(pairs) else {}


def _group_cell(row: dict[int, Unit], column: int, pairs: dict[int, int], parenthesised: bool) -> tuple[float, float, float, float] | None:
    """A group's mean and SD in a row: "M ± SD" in its cell, "M (SD)" where the table says its cells are so, or the mean
    and SD in two columns of their own."""
    if column in pairs:
        mean, sd = row.get(column), row.get(pairs[column])
        if mean is None or sd is None:
            return None
        spread = sd.text.strip()
        spread = spread[1:-1] if spread[:1] == "(" and spread[-1:] == ")" else spread
        return _read(f"{mean.text} ± {spread}") if "(" not in mean.text + spread else None
    cell = row.get(column)
    if cell is None:
        return None
    return _read(cell.text) or (_read(cell.text, _MEAN_PAREN) if parenthesised else None)


def _read(text: str, pattern: re.Pattern[str] = _MEAN_SD) -> tuple[float, float, float, float] | None:
    m = pattern.fullmatch(text)
    if m is None:
        return None
    mean, sd = (m.group(g).replace("−", "-").replace("–", "-").replace(" ", "").replace(",", ".") for g in ("m", "sd"))
    return float(mean), _half(mean), float(sd), _half(sd)


def _half(typed: str) -> float:
    return 0.5 * 10.0 ** -len(typed.partition(".")[2])


def _rows(cells: Sequence[tuple[int, int, Unit, list[Reported]]], said: str) -> dict[int, dict[int, Unit]]:
    """The table's cells by row and column; none where no cell gives a mean ± SD, or the caption or note (``said``) names
    a paired design, or it or a head says the ± is a standard error."""
    if not any("±" in u.text or "+/-" in u.text or MEANS_SAID.search(u.text) or _M_HEAD.fullmatch(u.text) for _, _, u, _ in cells) and \
            not MEANS_SAID.search(said) or _PAIRED.search(said) or _SE_SAID.search(said) or \
            any(_SE_SAID.search(u.text) for _, _, u, _ in cells if not _read(u.text)):
        return {}
    return cell_grid(cells)


def group_means(cells: Sequence[tuple[int, int, Unit, list[Reported]]], said: str) -> list[GroupMeans]:
    """Each row of a table comparing groups in its columns (the heads with an n each, a total column aside: two or more)
    whose cells give each group's mean ± SD and whose t (two groups) or F column gives a value: the cell of that value
    with the groups' numbers. Nothing where the heads, caption or note (``said``) name a design that may be the same
    people's."""
    rows = _rows(cells, said)
    out: list[GroupMeans] = []
    groups: list[tuple[int, int]] = []  # (column, n) of the groups under the latest header
    stat_col = None
    pairs: dict[int, int] = {}  # each group's mean column with its SD's, where the two stand apart
    counted: dict[int, int] = {}  # (and with its n's, where each row gives the groups' n: "M | SD | n")
    heads = said  # what the caption, note and header rows say (whether "45.3 (6.2)" is a mean with its SD)
    mixed = False  # the test's column holds a t or a χ² by the row ("t/χ2")

    def sized_heads(row: dict[int, Unit]) -> list[tuple[int, int]]:
        sized = [(c, s[0]) for c, u in sorted(row.items()) if len(s := sizes_in(u.text)) == 1 and not _TOTAL_HEAD.match(u.text)]
        return sized if len(sized) >= 2 and all(n >= 2 for _, n in sized) else []

    for r in sorted(rows):
        row = rows[r]
        roles = {c: _role(u.text) for c, u in row.items()}
        if any(role in ("t", "F", "mixed:t") for role in roles.values()) and not any(_read(u.text) for u in row.values()):
            if _OCCASIONS.search(" ".join(u.text for u in row.values())):
                return []  # (a header naming the occasions: "Baseline (n = 41) | Follow-up (n = 36)")
            paired, sized = paired_heads(row, _M_HEAD, _SD_HEAD), sized_heads(row)
            counted = _counted_columns(row, paired)
            if sized or not paired or not groups:  # (a row of "Mean | (SD) | Mean | (SD) | t | P" under the groups' heads keeps them)
                groups, heads = sized or [(c, 0) for c in counted], said
            stat_col = next((c for c, role in roles.items() if role in ("t", "F", "mixed:t")), None)
            heads, pairs = " ".join([heads, *(u.text for u in row.values())]), paired
            mixed = roles.get(stat_col) == "mixed:t"  # type: ignore[arg-type]
            continue
        if not groups and stat_col is not None and not any(_read(u.text) for u in row.values()):  # a second header row with
            if _OCCASIONS.search(" ".join(u.text for u in row.values())):  # the groups' n ("Group (mean ± SD) | t" above
                return []  # "Control group (n = 30) | Intervention group (n = 30)", PMC12588921)
            groups = sized_heads(row)
            heads += " " + " ".join(u.text for u in row.values())
            continue
        if groups and (paired := paired_heads(row, _M_HEAD, _SD_HEAD)):  # "M | SD | M | SD" under the groups' heads
            pairs, counted = paired, _counted_columns(row, paired)
            continue
        if len(groups) < 2 or stat_col is None or stat_col not in row:
            continue
        label = row[min(row)].text  # ("45.3 (6.2)": a mean and SD where the heads or the row's label say so, and nothing says counts)
        parenthesised = any(MEANS_SAID.search(x) and not _NOT_MEANS_SAID.search(x) for x in (label, *(() if mixed else (heads,))))  # (in a
        # "t/χ2" column's table, a row of counts may stand under the same heads: there only a row's own label says so)
        read = [_group_cell(row, c, pairs, parenthesised) for c, _ in groups]
        sizes = [(whole_count(row[counted[c]].text) if counted[c] in row else None) or 0 if c in counted else n
                 for c, n in groups]  # (each row's own n where it gives them)
        if any(x is None for x in read) or any(n < 2 for n in sizes):
            continue
        typed = " vs ".join(row[c].text.strip() + (f" ({row[pairs[c]].text.strip().strip('()')})" if c in pairs else "") for c, _ in groups)
        out.append(GroupMeans(row[stat_col], tuple((*x, n) for x, n in zip(read, sizes)), typed))  # type: ignore[misc]
    return out


def _t_range(groups: GroupMeans, welch: bool) -> tuple[float, float]:
    """The |t| two groups' printed numbers allow: the difference of means within their half units, over the SE from the
    SDs within theirs (the SE grows with each SD)."""
    (m1, h1, s1, k1, n1), (m2, h2, s2, k2, n2) = groups.groups

    def se(a: float, b: float) -> float:
        if welch:
            return math.sqrt(a * a / n1 + b * b / n2)
        pooled = ((n1 - 1) * a * a + (n2 - 1) * b * b) / (n1 + n2 - 2)
        return math.sqrt(pooled * (1 / n1 + 1 / n2))

    d = abs(m1 - m2)
    low_se, high_se = se(max(s1 - k1, 0.0), max(s2 - k2, 0.0)), se(s1 + k1, s2 + k2)
    low = max(d - h1 - h2, 0.0) / high_se
    return low, (d + h1 + h2) / low_se if low_se > 0 else math.inf


def _spread(lows: Sequence[float], highs: Sequence[float], weights: Sequence[float]) -> tuple[float, float]:
    """The weighted sum of squares of k means about their weighted mean, Σ w(m − m̄)², at its least and its most over
    the box their printed digits allow: at its least the means drawn together (each clamped to one common value, found by
    bisection), at its most pushed apart (a corner of the box, where a convex function peaks; beyond ten groups twice
    the centre's, a bound)."""
    total = sum(weights)

    def spread(means: Sequence[float]) -> float:
        grand = sum(w * m for w, m in zip(weights, means)) / total
        return sum(w * (m - grand) ** 2 for w, m in zip(weights, means))

    a, b = min(lows), max(highs)
    for _ in range(100):  # the common value c whose clamped means have c as their weighted mean
        c = (a + b) / 2
        if sum(w * (min(max(c, lo), hi) - c) for w, lo, hi in zip(weights, lows, highs)) > 0:
            a = c
        else:
            b = c
    least = spread([min(max(c, lo), hi) for lo, hi in zip(lows, highs)])
    most = max(spread(corner) for corner in _corners(lows, highs)) if len(lows) <= 10 else spread([(lo + hi) / 2 for lo, hi in zip(lows, highs)]) * 2
    return least, most


def _f_range(groups: GroupMeans) -> tuple[float, float]:
    """The one-way ANOVA F that k groups' printed means, SDs and sizes allow: the between-groups sum of squares at its
    least and at its most (_spread, weighted by the n's), over the within-groups sum of squares at its most and least (it
    grows with each SD)."""
    g = groups.groups
    n = [x[4] for x in g]
    total, k = sum(n), len(g)
    least, most = _spread([x[0] - x[1] for x in g], [x[0] + x[1] for x in g], n)
    within_low = sum((w - 1) * max(x[2] - x[3], 0.0) ** 2 for w, x in zip(n, g))
    within_high = sum((w - 1) * (x[2] + x[3]) ** 2 for w, x in zip(n, g))
    scale = (total - k) / (k - 1)
    return least / within_high * scale, (most / within_low * scale if within_low > 0 else math.inf)


def _welch_f_range(groups: GroupMeans) -> tuple[float, float]:
    """Welch's (1951) ANOVA F that k groups' printed means, SDs and sizes allow: F = [Σ w(m − m̄)²/(k − 1)] / [1 +
    2(k − 2)/(k² − 1) Σ (1 − w/W)²/(n − 1)], w = n/s². Its numerator is least with every w at its least (each SD at its
    most) and the means drawn together, most with every w at its most and the means apart (Σ w(m − c)² at its best c
    grows with each w); its denominator's terms are bounded one by one over the w's."""
    g = groups.groups
    n = [x[4] for x in g]
    k = len(g)
    if any(x[2] - x[3] <= 0 for x in g):
        return 0.0, math.inf
    w_low = [m / (x[2] + x[3]) ** 2 for m, x in zip(n, g)]
    w_high = [m / (x[2] - x[3]) ** 2 for m, x in zip(n, g)]
    lows, highs = [x[0] - x[1] for x in g], [x[0] + x[1] for x in g]
    least, most = _spread(lows, highs, w_low)[0], _spread(lows, highs, w_high)[1]
    low_all, high_all = sum(w_low), sum(w_high)
    c = 2 * (k - 2) / (k * k - 1)
    d_low = 1 + c * sum((1 - hi / (hi + low_all - lo)) ** 2 / (m - 1) for lo, hi, m in zip(w_low, w_high, n))
    d_high = 1 + c * sum((1 - lo / (lo + high_all - hi)) ** 2 / (m - 1) for lo, hi, m in zip(w_low, w_high, n))
    return least / (k - 1) / d_high, most / (k - 1) / d_low


def _corners(lows: Sequence[float], highs: Sequence[float]) -> "list[list[float]]":
    out: list[list[float]] = [[]]
    for lo, hi in zip(lows, highs):
        out = [c + [v] for c in out for v in (lo, hi)]
    return out


def ranges(rep: Reported, groups: GroupMeans) -> dict[str, tuple[float, float]]:
    """The ranges the groups' numbers allow for the statistic: |t| by Student's and Welch's tests (two groups); F as one
    way ANOVA's (the two tests' t² for two groups)."""
    if len(groups.groups) == 2:
        two = {name: _t_range(groups, welch) for name, welch in (("Student's", False), ("Welch's", True))}
        return two if rep.symbol == "t" else {f"{name} t²": (low * low, high * high) for name, (low, high) in two.items()}
    if rep.symbol != "F":
        return {}
    welch = {"Welch's ANOVA's": _welch_f_range(groups)}
    return welch if groups.welch else {"one-way ANOVA's": _f_range(groups), **welch}  # (either, where the table names neither)


def means_fit(rep: Reported, groups: GroupMeans) -> list[Finding]:
    """The t (or F) beside the groups' means and SDs against them, with the statistic's own printed digits."""
    if rep.value is None or rep.symbol not in ("t", "F") or rep.op != "=":
        return []
    value, half = abs(rep.value.value), rep.value.half_unit
    allowed = ranges(rep, groups)
    if not allowed or any(low - 1e-9 <= value + half and value - half <= high + 1e-9 for low, high in allowed.values()):
        return []
    said = "; ".join(f"{name} {low:.3f} to {high:.3f}" for name, (low, high) in allowed.items())
    name = "|t|:" if rep.symbol == "t" else "F:"
    sizes = ", ".join(str(x[4]) for x in groups.groups)
    return [Finding("means-do-not-fit", f"{rep.symbol} = {rep.value.text} does not follow from the groups' means, SDs and sizes beside it "
                                        f"({groups.typed}; n = {sizes}): they give {name} {said}.",
                    f"{rep.symbol} = {rep.value.text}; {groups.typed}")]


# a column of one test's value or the other's by the variable's number of categories, as descriptive tables head it: "F/t
# value", "t/F"; or "F", "t"
_TEST_HEAD = re.compile(r"(?i)\s*(?:F\s*/\s*t|t\s*/\s*F|F|t)(?:[- ]?(?:values?|tests?|statistics?))?\s*")


def category_means(cells: Sequence[tuple[int, int, Unit, list[Reported]]], said: str, mark: str = ".") -> list[GroupMeans]:
    """A table of a measure's mean ± SD by the categories of each variable, one row a category with its n ("Gender |
    Male | 149 (51.4) | 10.07 ± 4.80 | 11.755 | < 0.001", then "Female | 141 (48.6) | 8.26 ± 4.15"), the variable's test
    on its first row: each variable's categories as groups, with the test's value and p as a statistic (a t for two
    categories under a "t" head, else an F; under "F/t" for two categories whichever the means give, F = t² else)."""
    rows = _rows(cells, said)
    out: list[GroupMeans] = []
    stat_col = p_col = None
    head = ""
    block: list[tuple[float, float, float, float, int]] = []
    typed: list[str] = []
    anchor: Unit | None = None
    p_unit: Unit | None = None

    def close() -> None:
        if anchor is not None and len(block) >= 2:
            out.append(_category_test(anchor, p_unit, tuple(block), " vs ".join(typed), head, mark))

    for r in sorted(rows):
        row = rows[r]
        if not any(_read(u.text) for u in row.values()):
            heads = {c: u.text for c, u in row.items() if _TEST_HEAD.fullmatch(u.text)}
            if heads and not any(COUNT_CELL.fullmatch(u.text) for u in row.values()):
                close()
                block, typed, anchor = [], [], None
                stat_col, head = next(iter(heads.items()))
                p_col = next((c for c, u in row.items() if _role(u.text) == "p"), None)
            continue
        means = [(c, read) for c, u in row.items() if (read := _read(u.text)) is not None]
        sized = [n[0] for u in row.values() if (n := count_cell(u.text)) is not None] or \
            [int(u.text.strip()) for c, u in row.items() if u.text.strip().isdigit() and c != min(row)]
        if stat_col is None or len(means) != 1 or len(sized) != 1:
            close()
            block, typed, anchor = [], [], None
            continue
        if stat_col in row and row[stat_col].text.strip():  # the variable's first row: its test
            close()
            block, typed, anchor = [], [], row[stat_col]
            p_unit = row.get(p_col) if p_col is not None else None
        block.append((*means[0][1], sized[0]))
        typed.append(row[means[0][0]].text.strip())
    close()
    return [g for g in out if g.rep is not None]


def _category_test(unit: Unit, p_unit: "Unit | None", groups: "tuple[tuple[float, float, float, float, int], ...]", typed: str, head: str,
                   mark: str) -> GroupMeans:
    read = _number(unit.text, mark)
    found = GroupMeans(unit, groups, typed)
    if read is None or read[0] != "=":
        return found
    value = read[1]
    p = _p_cell(p_unit.text, mark) if p_unit is not None and p_unit.text.strip() else None
    k, total = len(groups), sum(g[4] for g in groups)
    symbol = "F"
    letters = head.replace(" ", "").lower()
    if k == 2 and (letters.startswith("t") and "/" not in letters or "/" in letters):
        as_t = Reported("t", "t", value.start, value.start, value.end, (), None, "=", value, p)
        if letters.startswith("t") and "/" not in letters or not means_fit(as_t, found):
            symbol = "t"  # (under "F/t" a two-category variable's value is the t where the means give it as one)
    df = (Number(str(total - 2), float(total - 2), 0, 0, 0),) if symbol == "t" else \
        (Number(str(k - 1), float(k - 1), 0, 0, 0), Number(str(total - k), float(total - k), 0, 0, 0))
    rep = Reported(symbol, symbol, value.start, value.start, value.end, df, None, "=", value, p)
    rep.text = f"{symbol}({', '.join(d.text for d in df)}) = {value.text}" + (f", p {p.op} {p.number.text}" if p is not None and p.number is not None else "")
    return GroupMeans(unit, groups, typed, rep)
