"""The audit's parser does work linear in the length of a manuscript, and
never fails or stalls on any text.

Work is counted, not timed: every call of a compiled pattern of the parser
is wrapped, and the characters each call is given to scan (endpos − pos) are
added up — for a search that finds a match, those up to its end, where the
engine stops —, as are the characters the report counts newlines over. A rescan of
a paragraph per statistic, the quadratic shape found before, shows as work
growing with the square of the input. The shapes are the pathological ones
of the hardening issue: many statistics on one line, a symbol followed by a
long run of spaces, and a line of random statistical fragments.
"""

from __future__ import annotations

import random
import re
import time

import pytest
from hypothesis import HealthCheck, example, given, settings
from hypothesis import strategies as st

from statsetter.audit import parsing
from statsetter.audit.reading import Unit
from statsetter.audit.report import audit_units


class _Counting:
    def __init__(self, regex: re.Pattern[str], tally: list[int]) -> None:
        self.regex, self.tally = regex, tally

    def _span(self, text: str, pos: int = 0, endpos: int | None = None) -> tuple[int, int]:
        end = len(text) if endpos is None else min(endpos, len(text))
        self.tally[0] += max(0, end - pos)
        return pos, end

    def finditer(self, text, pos=0, endpos=None):  # type: ignore[no-untyped-def]
        pos, end = self._span(text, pos, endpos)
        return self.regex.finditer(text, pos, end)

    def search(self, text, pos=0, endpos=None):  # type: ignore[no-untyped-def]
        end = len(text) if endpos is None else min(endpos, len(text))
        found = self.regex.search(text, pos, end)
        self.tally[0] += max(0, (found.end() if found is not None else end) - pos)  # the engine stops at its match
        return found

    def match(self, text, pos=0, endpos=None):  # type: ignore[no-untyped-def]
        pos, end = self._span(text, pos, endpos)
        return self.regex.match(text, pos, end)

    def __getattr__(self, name):  # type: ignore[no-untyped-def]
        return getattr(self.regex, name)


def _work(text: str, monkeypatch) -> int:
    tally = [0]
    pat = parsing._Patterns(".")
    for name, value in vars(pat).items():
        if isinstance(value, re.Pattern):
            setattr(pat, name, _Counting(value, tally))
    monkeypatch.setitem(parsing._CACHE, ".", pat)
    for name in ("_OPERATOR_OR_NS", "_ADJUSTED", "_OPERATOR", "_RATIO_BARE"):
        if isinstance(getattr(parsing, name, None), re.Pattern):
            monkeypatch.setattr(parsing, name, _Counting(getattr(parsing, name), tally))
    parsing._LAST_INDEX[0] = None
    audit_units([Unit("line 1", text, None, "", 1)])
    return tally[0]


def _many(k: int) -> str:
    return ", ".join("t(30) = 2.10, p = .044, d = 0.77" for _ in range(300 * k))


def _spaces(k: int) -> str:
    return ("t" + " " * 400) * (40 * k) + "(3) = 2.0"


def _fragments(k: int) -> str:
    rng = random.Random(7)
    parts = ["t(", "p =", "95% CI [", "F(2,", "r =", "n =", ".05", "and", "(", ")", "M =", "SD =", "2.1", "χ²(", "d ="]
    return " ".join(rng.choice(parts) for _ in range(3000 * k))


def _ratios(k: int) -> str:
    """Statistics without a head, one sentence of them: ratios typed without "=", each a statistic of its own (their
    clusters had each been read to the sentence's end: minutes for 20,000), and bare p values."""
    return "Odds rose (" + "OR 1.5, 95% CI 1.1 to 2.0; OR, 0.76; 95% CI, 0.73 to 0.80; p = .04 and " * (300 * k) + "AOR: 2.1)."


def _coefficients(k: int) -> str:
    """One sentence of coefficients given with their p and no test, regression steps and p's without a head: each p looks
    back for its B (that search had run from the sentence's start: quadratic), each step's R² change is its F's."""
    return ("Each rose (" + "b = 0.4, SE = 0.1, p = .2; (p = .001, d = 0.5) " * (300 * k)
            + "R² = .10, adj. R² = .09, ΔR² = .05, F(2, 148) = 8.49; " * (300 * k) + "ns).")


@pytest.mark.parametrize("shape", [_many, _spaces, _fragments, _ratios, _coefficients])
def test_work_grows_linearly(shape, monkeypatch):
    work = [_work(shape(k), monkeypatch) for k in (1, 2, 4, 8)]
    sizes = [len(shape(k)) for k in (1, 2, 4, 8)]
    for k, w in zip((2, 4, 8), work[1:]):
        assert w <= 1.15 * k * work[0], (shape.__name__, work)  # doubling the input at most doubles the work
    assert all(w <= 60 * n for w, n in zip(work, sizes)), (work, sizes)  # a bounded number of passes over the text


_TOKENS = st.sampled_from([
    "t", "F", "r", "χ²", "p", "P", "d", "η²", "V", "N", "n", "M", "SD", "B", "SE", "df", "CI", "95%", "ns", "z", "U", "H",
    "(", ")", "[", "]", "=", "<", ">", "≤", ",", ";", ".", " ", "  ", "\n", "−", "-", "e", "E", "0", "1", "2.5", ".05",
    ".000", "1e400", "9" * 120, "1,234", "to", "and", "*", "_", "^2", "\u00a0", "rs", "τb", "partial", "adj.", "R²",
])


@pytest.mark.filterwarnings("ignore:.*digits is not read as a statistic")  # the fuzz types long numbers on purpose
@settings(max_examples=20_000, deadline=None, suppress_health_check=[HealthCheck.too_slow], database=None)
@given(st.lists(_TOKENS, max_size=60).map("".join) | st.text(max_size=200))
def test_the_parser_never_fails_or_stalls(text):
    start = time.perf_counter()
    audit_units([Unit("line 1", text, None, "", 1)])
    assert time.perf_counter() - start < 0.05 or _slow_again(text)


def _slow_again(text: str) -> bool:
    """A first call may pay for imports or a garbage collection: time it once more."""
    start = time.perf_counter()
    audit_units([Unit("line 1", text, None, "", 1)])
    return time.perf_counter() - start < 0.05


_SPACED_OPERATOR = re.compile(r"\s*+(?:=|<|>|≤|≥)\s*+")  # the definition: an operator with the white space on each side


@settings(max_examples=5_000, deadline=None, database=None)
@given(st.text(alphabet="= <>≤≥\t\u00a0\u2009\nab1.,(", max_size=30), st.data())
def test_operators_are_found_as_their_definition_reads(text, data):
    """The spacing check's operators are found operator first (the regex engine's fast scan) and the space before each
    walked back by hand, for all the stretches of a statistic (head and parts) in one pass: the same spans as the
    one-pattern definition run on each stretch in turn, on any text and any stretches of it."""
    cuts = sorted(data.draw(st.lists(st.integers(0, len(text)), max_size=8)))
    spans = list(zip(cuts[::2], cuts[1::2]))  # in order, not overlapping (they may touch or be empty)
    assert parsing._operators(text, spans) == [(o.start(), o.end()) for s, e in spans for o in _SPACED_OPERATOR.finditer(text, s, e)]


@settings(max_examples=3_000, deadline=None, database=None)
@given(st.lists(st.tuples(st.integers(0, 40), st.integers(0, 40)), max_size=8), st.integers(-2, 45))
def test_italic_positions_by_bisection_are_those_of_the_spans(spans, at):
    """A position is italic when some span holds it: bisecting the merged spans answers as testing each span does,
    whatever their order, overlaps or emptiness (a Unit's spans are public)."""
    from statsetter.audit.checks import _Italic

    assert (at in _Italic(tuple(spans))) == any(s <= at < e for s, e in spans)


@settings(max_examples=3_000, deadline=None, database=None)
@given(st.lists(st.one_of(st.text(alphabet="0123456789٣", max_size=160), st.text(alphabet="a .²\n", max_size=130)), max_size=5))
@example(["a", "1" * 101])  # a run of exactly 101 that begins right after a tested position
@example(["\n" * 100, "٣" * 101, "a"])
def test_digit_shortcuts_read_as_the_patterns_do(parts):
    """The audit's cheap tests for a digit and for a run of more than 100 digits (every 101st character first) find
    what the patterns \\d and \\d{101,} find, Unicode digits included."""
    from statsetter.audit.report import _DIGIT, _LONG_NUMBER, _has_digit, _long_number

    text = "".join(parts)
    found, expected = _long_number(text), _LONG_NUMBER.search(text)
    assert (found and found.span()) == (expected and expected.span())
    assert _has_digit(text) == (_DIGIT.search(text) is not None)


@settings(max_examples=3_000, deadline=None, database=None)
@given(st.lists(st.sampled_from(["adjusted", "Holm", "BONFERRONI", "šidák", "fdr", "-", " ", "\u2009", "x", "K", "İ", ",", "d"]),
                max_size=12).map("".join))
def test_adjusted_p_is_found_as_the_pattern_reads(before):
    """A p is read as adjusted when a procedure's word ends right before it (white space and hyphens between): the
    cheap test of the last letter first gives what the pattern alone gives."""
    text = before + "p = .04"
    found = [r for r in parsing.find_statistics(text) if r.p is not None]
    if not found:  # a p run on after a word ("adjustedp") is no p
        assert re.search(r"\w$", before)
        return
    (rep,) = found
    window = text[max(0, len(before) - 30) : len(before)]
    assert rep.p.adjusted == bool(parsing._ADJUSTED.search(window) and any(w in window.lower() for w in parsing._ADJUSTED_WORDS))


@settings(max_examples=5_000, deadline=None, database=None)
@given(st.text(alphabet="\\ \t\n.A1(|-)*•a", max_size=40), st.data())
def test_sentence_ends_without_a_latex_row_are_the_same(text, data):
    """A text without a LaTeX row end (two backslashes) is split into sentences by the pattern without that
    alternative: the same ends as the whole pattern's, over any part of the text."""
    pat = parsing._patterns(".")
    start = data.draw(st.integers(0, len(text)))
    end = data.draw(st.integers(start, len(text)))
    assert [m.span() for m in pat.boundary_in(text).finditer(text, start, end)] == [m.span() for m in pat.boundary.finditer(text, start, end)]


_COMMA_TYPED = re.compile(r"[=<>]\s*[-−]?(?:0?,\d+|[1-9]\d*,(?:\d{1,2}|\d{4,}))(?![\d,]|\.\d)")  # the definitions, one kind each
_POINT_TYPED = re.compile(r"[=<>]\s*[-−]?\d*\.\d+(?!\d|,\d)")


@settings(max_examples=5_000, deadline=None, database=None)
@given(st.text(alphabet="=<> -−0123456789,.p", max_size=40))
def test_decimal_marks_are_counted_as_two_patterns_count_them(text):
    """The decimal mark is chosen from one scan for numbers typed with a comma or a point: the counts of what a
    pattern for each kind finds on its own, on any text."""
    found = parsing.decimal_mark_of([text])
    commas, points = len(_COMMA_TYPED.findall(text)), len(_POINT_TYPED.findall(text))
    assert found == (None if commas == points else ("," if commas > points else ".", commas, points))


@settings(max_examples=3_000, deadline=None, database=None)
@given(st.lists(st.text(alphabet="=<> -−0123456789,.pt", max_size=30), min_size=1, max_size=4))
def test_the_style_point_is_kept_without_counting_as_counting_says(texts):
    """Against a style with a decimal point, a manuscript without a number only a decimal comma explains is read with
    the point without counting its numbers: the mark and message the full count gives, on any text."""
    from statsetter import load_style
    from statsetter.audit.report import reading_mark

    units = [Unit("line 1", t, None, "", 1) for t in texts]
    found = parsing.decimal_mark_of(texts)
    expected = "," if found is not None and found[0] == "," else "."
    mark, said = reading_mark(units, load_style("apa7"))
    assert mark == expected and (said != "") == (expected == ",")


def test_the_audit_leaves_the_garbage_collector_as_it_was(tmp_path):
    """Reading and checking run with Python's cyclic collector paused (their objects hold no cycles): it runs again
    afterwards, also when the manuscript is refused, and stays off where the caller had turned it off."""
    import gc

    from statsetter import InputError
    from statsetter.audit.report import audit_file

    page = tmp_path / "results.md"
    page.write_text("The groups differed, t(38) = 2.14, p = .039.\n", encoding="utf-8")
    assert len(audit_file(page)) == 1 and gc.isenabled()
    binary = tmp_path / "binary.md"
    binary.write_bytes(b"PK\x03\x04 not text")
    with pytest.raises(InputError):
        audit_file(binary)
    assert gc.isenabled()
    gc.disable()
    try:
        audit_file(page)
        assert not gc.isenabled()
    finally:
        gc.enable()


def test_the_audits_objects_do_not_wait_in_the_young_generation(tmp_path):
    """The objects an audit makes while the collector is paused are placed in the oldest generation as it resumes, so
    that the first young collection afterwards does not walk them all (a batch of more than 10,000); objects the program froze
    itself stay frozen (the audit then leaves the generations alone), and a collection still frees cycles made
    during the audit. The same for records made in a batch (``_collector_paused``)."""
    import gc
    import weakref

    from statsetter.audit.report import audit_file

    page = tmp_path / "results.md"
    page.write_text("The groups differed, t(38) = 2.14, p = .039, d = 0.68.\n\n" * 1000, encoding="utf-8")

    class Cyclic:
        pass

    gc.collect()
    entries = audit_file(page)
    assert len(entries) == 1000 and gc.isenabled() and gc.get_freeze_count() == 0
    assert any(o is entries[-1] for o in gc.get_objects(generation=2))  # placed in the oldest generation at once
    held = Cyclic()  # an object the program freezes: the collector no longer lists it
    gc.freeze()
    try:
        again = audit_file(page)
        assert len(again) == 1000 and not any(o is held for o in gc.get_objects())  # still frozen: nothing thawed
    finally:
        gc.unfreeze()
    assert any(o is held for o in gc.get_objects())

    from statsetter.records.result import _collector_paused

    with _collector_paused():
        a = Cyclic()
        a.self = a  # type: ignore[attr-defined]
        gone = weakref.ref(a)
        del a
    assert gone() is not None
    gc.collect()
    assert gone() is None


def test_audits_in_threads_read_as_one_alone():
    """The audit remembers a few things of the last text it read (its operators, sentence ends, italic spans); audits
    running in threads at once, switching as often as the interpreter allows, find what each finds alone with nothing
    remembered."""
    import sys
    import threading

    def symbols(text: str) -> tuple[tuple[int, int], ...]:  # every Latin symbol italic, as a careful author types them
        return tuple((m.start(), m.start() + 1) for m in re.finditer(r"(?<![\w.])[tpdFrVMn](?=\s*[(=<])", text))

    sentences = [
        ("a", "The groups differed, t(38) = 2.14, p = .039, d = 0.69, and F(2, 97)=4.51, p=.013, η² = .09."),
        ("b", "Scores correlated, r(48) = −.31, p = .028; χ2(2, N = 200) = 9.87, p = .007, V = .16, M = 3.10, SD = 0.90."),
        ("c", "No difference appeared, t(120) = 0.84, p = .40, 95% CI [−0.21, 0.52], n = 122."),
    ]
    texts = [(name, text, symbols(text)) for name, text in sentences]

    def run(name: str, text: str, italic: tuple[tuple[int, int], ...]) -> list[tuple[str, tuple[str, ...], str]]:
        return [(e.found, tuple(e.codes), e.suggestion) for e in audit_units([Unit(name, text, italic)], check_italics=True)]

    def fresh(name: str, text: str, italic: tuple[tuple[int, int], ...]) -> list[tuple[str, tuple[str, ...], str]]:
        from statsetter.audit import checks

        checks._LAST_ITALIC[0] = None  # nothing remembered: as the text's first audit in a new process
        parsing._LAST_OPERATORS[0] = None
        parsing._LAST_INDEX[0] = None
        return run(name, text, italic)

    alone = {name: fresh(name, text, italic) for name, text, italic in texts}
    assert all(alone.values()) and any(codes for found in alone.values() for _, codes, _ in found)
    seen: dict[str, list] = {name: [] for name, _, _ in texts}

    def worker(name: str, text: str, italic: tuple[tuple[int, int], ...]) -> None:
        for _ in range(60):
            seen[name].append(run(name, text, italic))

    interval = sys.getswitchinterval()
    sys.setswitchinterval(1e-6)
    try:
        threads = [threading.Thread(target=worker, args=t) for t in texts for _ in range(2)]
        for t in threads:
            t.start()
        for t in threads:
            t.join()
    finally:
        sys.setswitchinterval(interval)
    for name, runs in seen.items():
        assert len(runs) == 120 and all(r == alone[name] for r in runs), name


@settings(max_examples=3_000, deadline=None, database=None)
@given(st.text(alphabet=" -−.,0123456789eE×x^⁻\u2009\u202f", max_size=14), st.integers(0, 500), st.sampled_from(".,"))
def test_numbers_remembered_are_those_read_afresh(text, start, mark):
    """A printed form is read once and remembered by its text; its Number at another place is the fresh reading's,
    moved: the same text, value, decimals and span as reading it anew there."""
    pat = parsing._patterns(mark)
    first = pat.to_number(text, 0)
    again = pat.to_number(text, start)
    fresh = pat._to_number(text, start)
    assert again == fresh
    assert (first is None) == (fresh is None)
    if fresh is not None and fresh.value == fresh.value:
        assert (first.text, first.value, first.decimals) == (fresh.text, fresh.value, fresh.decimals)


def test_a_consistent_statistic_costs_one_p_and_says_its_range_when_asked(monkeypatch):
    # speed: a statistic whose printed value gives a p inside the reported one needs no range ends (p falls as the
    # statistic grows, so the range holds that p); the range is computed when `checked` is read (the JSON's
    # `recomputed`) and is the one the two ends give: scipy.stats.t.sf(x, 38) * 2 is 0.038408 at 2.145 and 0.039269 at
    # 2.135 (computed with scipy 1.x for this test); t(38) = 1.14 gives .261, not .039.
    from statsetter.audit import checks

    calls = []
    real = checks._p_of
    monkeypatch.setattr(checks, "_p_of", lambda *a: calls.append(a) or real(*a))
    [good] = audit_units([Unit("p 1", "It differed, t(38) = 2.14, p = .039.", None, "", 0)], "apa7")
    assert calls == [("t", 2.14, (38.0,))] and good.findings == ()  # its printed value only
    calls.clear()
    [bad] = audit_units([Unit("p 1", "It did not, t(38) = 1.14, p = .039.", None, "", 0)], "apa7")
    assert len(calls) == 3 and "p-does-not-follow" in bad.codes  # the printed value, then the range's two ends
    calls.clear()
    assert good.checked == "p recomputed from t(38) = 2.14: 0.03841 to 0.03927" and [round(a[1], 12) for a in calls] == [2.145, 2.135]


def _long_tables(tmp_path, rows: int) -> list:
    """A results table of ``rows`` rows as Markdown, LaTeX and Word lay it out: each row a statistic typed whole in its
    cell with its p in the next (a p that does not follow, t(38) = 2.10 to 2.99 against p = .49: each row a finding)."""
    import docx

    stats = [(f"t(38) = 2.{i % 90 + 10}", ".49") for i in range(rows)]
    md = tmp_path / f"table{rows}.md"
    md.write_text("Table 1\n\n| Statistic | p |\n|---|---|\n" + "".join(f"| {s} | {p} |\n" for s, p in stats), encoding="utf-8")
    tex = tmp_path / f"table{rows}.tex"
    tex.write_text("\\begin{tabular}{ll}\nStatistic & p \\\\\n" + "".join(f"{s} & {p} \\\\\n" for s, p in stats) + "\\end{tabular}\n",
                   encoding="utf-8")
    d = docx.Document()
    table = d.add_table(rows=rows + 1, cols=2)
    for (a, b), row in zip([("Statistic", "p")] + stats, table.rows):
        row.cells[0].text, row.cells[1].text = a, b
    d.save(str(tmp_path / f"table{rows}.docx"))
    return [md, tex, tmp_path / f"table{rows}.docx"]


def test_a_long_table_is_read_in_linear_work(tmp_path, monkeypatch):
    """A table's statistics share one context (its caption, cells and note), searched for a multiple-comparison
    procedure once, not once for each statistic with a finding, and the set of the statistics its rows read is made
    once, not once for each statistic of its cells (4,000 rows of a Word table had taken 31 s, a LaTeX table of 50,000
    rows over 5 minutes): the work of both, counted, grows with the table."""
    from statsetter.audit import report
    from statsetter.audit.report import audit_file

    class CountingSet(set):  # the statistics a table's rows read: each union's elements counted
        def __or__(self, other):  # type: ignore[no-untyped-def, override]
            tally[0] += len(self) + len(other)
            return set.__or__(self, other)

    read_table = report.table_statistics
    monkeypatch.setattr(report, "table_statistics", lambda *args, **kwargs: (lambda found, used: (found, CountingSet(used)))(*read_table(*args, **kwargs)))
    for small, large in zip(_long_tables(tmp_path, 300), _long_tables(tmp_path, 1200)):
        work = []
        for path in (small, large):
            tally = [0]
            monkeypatch.setattr(report, "_PROCEDURE", _Counting(re.compile(report._PROCEDURE.pattern), tally))
            entries = audit_file(path)
            assert len(entries) in (300, 1200) and all("p-does-not-follow" in e.codes for e in entries), path
            work.append(tally[0])
        assert work[1] <= 4.5 * work[0], (small.suffix, work)


_TABLE_TOKENS = st.sampled_from([
    "|", " | ", "|---|", ":--:", "---", "\\|", "&", " & ", "\\&", "\\\\", "\\\\[2pt]", "{", "}", "\\begin{tabular}{ll}", "\\end{tabular}",
    "\\begin{tabularx}{\\linewidth}{lX}", "\\end{tabularx}", "\\multicolumn{2}{c}{", "\\midrule", "\\toprule", "%", "\\%", "~", "^2^", "~38~",
    "\\textsubscript{38}", "\\textit{t}", "*t*", "\n", "\n\n", " ", "t(38) = 2.14", "p = .04", ".044", "2.10", "F", "df", "χ²", "Error (within)",
    "<sup>", "</sup>", "<sub>38</sub>", "<i>", "</i>", "<em>t</em>", "¼", "ps < .05", "p N 0.05", "$", "$t_{38}", "_{2,97}", "^{-4}",
    "\\mathit{t}", "\\eta_p^2", "\\text{", "_",
])


@settings(max_examples=3_000, deadline=None, database=None)
@given(st.lists(_TABLE_TOKENS, max_size=40).map("".join), st.sampled_from([".md", ".tex"]))
def test_tables_in_markdown_and_latex_never_fail_and_map_back_inside_the_text(text, suffix):
    """Pipe tables and tabulars of any shape (unclosed, nested, empty cells, rules, comments): the reader never fails,
    every unit's characters map back to places inside the text, and the audit of its units never fails."""
    from statsetter.audit.reading import _text_units, _uncommented

    source = _uncommented(text) if suffix == ".tex" else text
    units = list(_text_units(source, suffix))
    lines = source.split("\n")
    for unit in units:
        rest = "\n".join(lines[unit.index - 1:])  # a unit's places count from its first line's start (a cell's too)
        assert all(0 <= unit.source_index(i) < len(rest) and (unit.text[i] == rest[unit.source_index(i)] or unit.text[i] != "\n")
                   for i in range(len(unit.text))), (unit, rest)
    audit_units(units)


_NAME_PIECES = ["partial ", "η", "eta", "ω", "omega", "ε", "epsilon", "²", "2", "^2", "p", "_p", "ₚ", "G", "squared", "generalized ", "d", "_z",
                "av", "g", "r", "rb", "V", "Cramér's ", "φ", "phi", "adj. ", "R", " squared", " Square", "change", "Δ", "β", "beta",
                "Kendall's ", "W", "M", "dn", "SD", "ean (SD)", "age", "1", "OR", "aOR", "HR", "RR", "IRR", "odds ratio", "hazard ratio",
                "adjusted ", "risk", "t", "F", "χ²", "-value", "s", " change", "z", "U", "H", "Wald", "τb", "x", " ", "=", " = ", ".5",
                " 0.5", ":", ",", "(", ")", "a", "\n", "tau", "Tau", "rho", "chi", "Chi", "square", "X", "Z", "-statistic", "ald", "dn", "_b", "ₛ"]


@settings(max_examples=5_000, deadline=None, database=None)
@given(st.lists(st.sampled_from(_NAME_PIECES), max_size=30).map("".join))
def test_names_grouped_by_their_first_character_match_as_the_plain_alternation(text):
    """The scans of effect sizes', ratios' and statistics' names join the alternatives that share a first character
    (parsing._by_first: twice as fast over prose for the effect sizes); at every place they match what the plain
    alternation of the same names matches."""
    num = parsing._number_pattern(".")
    pat = parsing._patterns(".")
    plain_effect = re.compile(r"(?P<name>" + "|".join(p for p, _ in parsing._EFFECT_NAMES) + rf")\s*+(?P<op>[=¼])\s*+(?P<num>{num})")
    plain_symbol = re.compile(parsing._guarded(parsing._SYMBOLS, r"\w."))
    plain_ratio = re.compile(r"(?:" + "|".join(p for p, _ in parsing._RATIOS) + ")")
    for grouped, plain in ((pat.effect, plain_effect), (re.compile(parsing._SYMBOL), plain_symbol),
                           (re.compile(parsing._by_first(p for p, _ in parsing._RATIOS)), plain_ratio)):
        for at in range(len(text) + 1):
            a, b = grouped.match(text, at), plain.match(text, at)
            assert (a and (a.span(), a.groupdict())) == (b and (b.span(), b.groupdict())), (text, at)
