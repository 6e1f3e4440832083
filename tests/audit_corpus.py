"""An invented manuscript for measuring the audit, written for the tests.

Sentences about an invented study of warehouse workers' shift rotas, rest
breaks and reaction times (no real study, no real people), each carrying one
statistic. Clean statistics follow APA 7 with p computed exactly (scipy) and
are typed in varied, in-style ways (df in parentheses or apart, χ² or χ2 or
chi-square, CIs in brackets, Welch df with decimals, true minus signs);
planted ones carry a known error of one check kind. Every statistic records
its span and the codes the audit should report, so recall, precision and the
share of statistics parsed can be counted. ``build(seed)`` is deterministic.
"""

from __future__ import annotations

import math
import random
from dataclasses import dataclass

from scipy import stats

MINUS = "\u2212"


@dataclass
class Planted:
    text: str
    codes: frozenset[str]
    docx_only: bool = False  # italics can only be seen in Word


def _num(x: float, d: int = 2, bounded: bool = False, minus: str = MINUS) -> str:
    s = f"{abs(x):.{d}f}"
    if bounded and s.startswith("0."):
        s = s[1:]
    return (minus if x < 0 and float(s) != 0 else "") + s


def _p(p: float) -> str:
    if p < 0.001:
        return "p < .001"
    d = 3
    while d < 6 and ((p < 0.05) != (round(p, d) < 0.05) or round(p, d) == 0):
        d += 1
    return f"p = {_num(p, d, True)}"


def _p_value(p: float) -> str:
    return _p(p).split(" ", 2)[2]


SUBJECTS = [
    "Reaction times on the night rota", "Self-rated alertness", "Errors per shift", "Minutes of rest taken",
    "Sleep before the first shift", "Overtime hours", "Scanner errors after the break", "Perceived workload",
]
LEADS = [
    "{s} differed between the rota groups, {x}.", "For {s}, the comparison gave {x}.", "{s} changed after the new break schedule ({x}).",
    "As Table 2 shows, {s} varied by depot, {x}.", "We found that {s} was related to tenure, {x}.", "{s} did not behave as expected: {x}.",
]
FILLER = [
    "The rota changed in week 3 of 12, and 4 depots took part (see Figure 1 and Table 2).",
    "Workers gave consent on p. 2 of the form; the 2 × 3 design is described in section 2.4.",
    "Data were collected between 2021 and 2022 by two research assistants.",
    "Missing shifts (about 4% of records) were left out of each analysis.",
]


def _t(rng: random.Random, welch: bool = False) -> tuple[float, float, float]:
    df = round(rng.uniform(12, 90), 2) if welch else float(rng.randint(12, 180))
    t = rng.choice([-1, 1]) * rng.uniform(0.3, 4.5)
    t = round(t, 2)
    return t, df, float(2 * stats.t.sf(abs(t), df))


def _groups(rng: random.Random) -> tuple[int, int, float, float]:
    n1, n2 = rng.randint(12, 90), rng.randint(12, 90)
    t = round(rng.choice([-1, 1]) * rng.uniform(0.3, 4.5), 2)
    return n1, n2, t, float(2 * stats.t.sf(abs(t), n1 + n2 - 2))


def _coefficient(rng: random.Random) -> tuple[float, float, int]:
    se = round(rng.uniform(0.05, 0.6), 2)
    b = round(rng.choice([-1, 1]) * se * rng.uniform(0.3, 5), 2)
    return b, se, rng.randint(40, 400)


def clean(rng: random.Random) -> str:
    kind = rng.choice(["t", "t2", "welch", "tcohen", "tgroups", "coef", "F", "F2", "chi", "chi2", "r", "rci", "rs", "z", "U", "H", "desc", "descp"])
    if kind == "coef":  # a regression coefficient: t = B / SE
        b, se, df = _coefficient(rng)
        t = b / se
        return f"B = {_num(b)}, SE = {_num(se)}, t({df}) = {_num(t)}, {_p(float(2 * stats.t.sf(abs(t), df)))}"
    if kind == "tgroups":  # group sizes in the sentence: d and g follow from t
        n1, n2, t, p = _groups(rng)
        d = t * math.sqrt(1 / n1 + 1 / n2)
        name, value = rng.choice([("d", d), ("g", d * (1 - 3 / (4 * (n1 + n2 - 2) - 1)))])
        return f"(n = {n1} and n = {n2}), t({n1 + n2 - 2}) = {_num(t)}, {_p(p)}, {name} = {_num(value)}"
    if kind == "tcohen":  # effect named in words, CI in AMA-like words are off-style, so brackets
        t, df, p = _t(rng)
        d = round(t * math.sqrt(4 / (df + 2)), 2)
        return f"t({int(df)}) = {_num(t)}, {_p(p)}, two-tailed, Cohen's d = {_num(d)}"
    if kind == "descp":
        n = rng.randint(20, 60)
        return f"(M = {rng.randint(2 * n, 5 * n) / n:.2f}, SD = {rng.uniform(0.4, 1.6):.2f}, n = {n})"
    if kind in ("t", "t2", "welch"):
        t, df, p = _t(rng, kind == "welch")
        d = round(t * math.sqrt(4 / (df + 2)), 2)
        half = round(rng.uniform(0.3, 0.7), 2)
        dfs = f"{df:.2f}" if kind == "welch" else f"{int(df)}"
        if kind == "t2":
            return f"t = {_num(t)}, df = {dfs}, {_p(p)}"
        return f"t({dfs}) = {_num(t)}, {_p(p)}, d = {_num(d)}, 95% CI [{_num(d - half)}, {_num(d + half)}]"
    if kind in ("F", "F2"):
        df1, df2 = rng.randint(1, 5), rng.randint(20, 300)
        f = round(rng.uniform(0.5, 12), 2)
        p = float(stats.f.sf(f, df1, df2))
        eta = f * df1 / (f * df1 + df2)
        name = "η²" if kind == "F" else rng.choice(["partial η²", "η²p", "ω²"])
        return f"F({df1}, {df2}) = {_num(f)}, {_p(p)}, {name} = {_num(eta, 2, True)}"
    if kind in ("chi", "chi2"):
        df = rng.randint(1, 6)
        x = round(rng.uniform(0.5, 20), 2)
        n = rng.randint(60, 2500)
        p = float(stats.chi2.sf(x, df))
        sym = rng.choice(["χ²", "χ2", "chi-square"])
        v = math.sqrt(x / (n * max(1, min(df, 2))))
        if kind == "chi":
            return f"{sym}({df}, N = {n:,}) = {_num(x)}, {_p(p)}, V = {_num(min(v, 0.99), 2, True)}"
        return f"{sym}({df}) = {_num(x)}, {_p(p)}"
    if kind in ("r", "rci", "rs"):
        df = rng.randint(20, 400)
        r = round(rng.uniform(-0.7, 0.7), 2)
        p = float(2 * stats.t.sf(abs(r) * math.sqrt(df / (1 - r * r)), df))
        sym = "rs" if kind == "rs" else "r"
        if kind == "rci":
            z, se = math.atanh(r), 1 / math.sqrt(df - 1)
            lo, hi = math.tanh(z - 1.96 * se), math.tanh(z + 1.96 * se)
            return f"r({df}) = {_num(r, 2, True)}, 95% CI [{_num(lo, 2, True)}, {_num(hi, 2, True)}], {_p(p)}"
        return f"{sym}({df}) = {_num(r, 2, True)}, {_p(p)}"
    if kind == "z":
        z = round(rng.uniform(-3.5, 3.5), 2)
        return f"z = {_num(z)}, {_p(float(2 * stats.norm.sf(abs(z))))}"
    if kind == "U":
        return f"U = {rng.randint(40, 9000):,}, {_p(rng.uniform(0.0005, 0.6))}"
    if kind == "H":
        df = rng.randint(1, 4)
        h = round(rng.uniform(0.5, 18), 2)
        return f"H({df}) = {_num(h)}, {_p(float(stats.chi2.sf(h, df)))}"
    n = rng.randint(20, 60)
    m = rng.randint(2 * n, 5 * n) / n
    return f"M = {m:.2f}, SD = {rng.uniform(0.4, 1.6):.2f}, n = {n}"


def planted(rng: random.Random, code: str) -> Planted:
    t, df, p = _t(rng)
    while p > 0.04 or p < 0.002:
        t, df, p = _t(rng)
    T, D = _num(t), f"{int(df)}"
    d = round(t * math.sqrt(4 / (df + 2)), 2)
    one = lambda text, *codes: Planted(text, frozenset(codes or (code,)))  # noqa: E731
    if code == "p-does-not-follow":
        wrong = p * 0.25 if p > 0.01 else p * 3  # far from p and from p/2 (a one-sided p)
        return one(f"t({D}) = {T}, p = {_num(wrong, 3, True)}")
    if code == "verdict-changes":
        t2, df2, p2 = _t(rng)
        while p2 < 0.1:
            t2, df2, p2 = _t(rng)
        return one(f"t({int(df2)}) = {_num(t2)}, p = .03{rng.randint(0, 9)}", "p-does-not-follow", "verdict-changes")
    if code == "one-sided":
        t3, df3, p3 = _t(rng)
        while not 0.06 < p3 < 0.095:
            t3, df3, p3 = _t(rng)
        return one(f"t({int(df3)}) = {_num(t3)}, p = {_num(p3 / 2, 3, True)}")
    if code == "impossible-r":
        return one(f"r({rng.randint(20, 90)}) = {rng.choice(['1.12', '1.40', MINUS + '1.08'])}, p < .001")
    if code == "impossible-p":
        return one(f"U = {rng.randint(40, 900)}, p = 1.{rng.randint(10, 60)}")
    if code == "negative-statistic":
        return one(f"F(2, {rng.randint(30, 90)}) = {MINUS}{rng.uniform(1, 4):.2f}, p = .0{rng.randint(10, 90)}")
    if code == "negative-sd":
        return one(f"M = 4.{rng.randint(10, 90)}, SD = {MINUS}0.{rng.randint(20, 90)}")
    if code == "ci-reversed":
        return one(f"t({D}) = {T}, {_p(p)}, d = {_num(d)}, 95% CI [{_num(d + 0.5)}, {_num(d - 0.5)}]")
    if code == "ci-excludes-estimate":
        return one(f"t({D}) = {T}, {_p(p)}, d = {_num(d)}, 95% CI [{_num(d + 0.2)}, {_num(d + 0.8)}]")
    if code == "df-not-integer":
        x, df = round(rng.uniform(3, 12), 2), rng.choice([1.5, 2.5, 3.5])
        return one(f"χ²({df}, N = {rng.randint(60, 400)}) = {_num(x)}, {_p(float(stats.chi2.sf(x, df)))}")
    if code == "leading-zero":
        return one(f"t({D}) = {T}, p = 0{_p_value(p)}" if p >= 0.001 else "r(40) = 0.51, p < .001")
    if code == "missing-leading-zero":
        if abs(d) < 1:
            return one(f"t({D}) = {T}, {_p(p)}, d = {_num(d).replace('0.', '.')}")
        z = round(rng.uniform(0.1, 0.99), 2)
        return one(f"z = {_num(z)[1:]}, {_p(float(2 * stats.norm.sf(z)))}")
    if code == "decimals":
        return one(f"t({D}) = {T}, p = {_num(p, 2, True)}" if round(p, 2) < 0.05 and round(p, 2) > 0 else f"t({D}) = {T}, p = {_num(p, 4, True)}")
    if code == "p-threshold":
        return one(f"t({D}) = {T}, p < .05")
    if code == "p-zero":
        return one(f"t({rng.randint(100, 200)}) = {rng.uniform(5, 9):.2f}, p = .000")
    if code == "spacing":
        return one(f"t({D})={T}, p={_p_value(p)}" if p >= 0.001 else f"t({D})={T}, p<.001")
    if code == "hyphen-minus":
        return one(f"t({D}) = -{abs(t):.2f}, {_p(p)}")
    if code == "grim":
        n = rng.randint(20, 40)
        m = rng.randint(2 * n, 5 * n) / n + 0.5 / n
        text = f"M = {m:.2f}, SD = 1.{rng.randint(10, 60)}, n = {n}"
        ok = any(abs(k / n - float(f"{m:.2f}")) <= 0.005 for k in range(int(m * n) - 1, int(m * n) + 2))
        return Planted(text, frozenset() if ok else frozenset({"grim"}))
    if code == "italics":
        return Planted(f"t({D}) = {T}, {_p(p)}", frozenset({"italics"}), docx_only=True)
    if code == "effect-does-not-fit":  # partial η² far above what F and its df allow
        df1, df2 = rng.randint(1, 4), rng.randint(40, 300)
        f = round(rng.uniform(2.5, 8), 2)
        eta = f * df1 / (f * df1 + df2)
        return one(f"F({df1}, {df2}) = {_num(f)}, {_p(float(stats.f.sf(f, df1, df2)))}, partial η² = {_num(min(eta * 2 + 0.05, 0.95), 2, True)}")
    if code == "coefficient-does-not-fit":  # t half as large again as B / SE
        b, se, df = _coefficient(rng)
        t = b / se * 1.5
        return one(f"B = {_num(b)}, SE = {_num(se)}, t({df}) = {_num(t)}, {_p(float(2 * stats.t.sf(abs(t), df)))}")
    if code == "d-does-not-fit":  # d half as large again as t and the group sizes give
        n1, n2, t, p = _groups(rng)
        d = t * math.sqrt(1 / n1 + 1 / n2) * 1.5
        return one(f"(n = {n1} and n = {n2}), t({n1 + n2 - 2}) = {_num(t)}, {_p(p)}, d = {_num(d)}")
    raise ValueError(code)


PLANTED_CODES = [
    "p-does-not-follow", "verdict-changes", "one-sided", "impossible-r", "impossible-p", "negative-statistic", "negative-sd",
    "ci-reversed", "ci-excludes-estimate", "df-not-integer", "leading-zero", "missing-leading-zero", "decimals",
    "p-threshold", "p-zero", "spacing", "hyphen-minus", "grim", "italics", "d-does-not-fit", "coefficient-does-not-fit", "effect-does-not-fit",
]


def build(seed: int = 2026, clean_count: int = 300, per_code: int = 8) -> list[tuple[str, list[tuple[int, int, Planted]]]]:
    """Paragraphs: (text, [(start, end, planted)]); clean statistics have no codes."""
    rng = random.Random(seed)
    items: list[Planted] = [Planted(clean(rng), frozenset()) for _ in range(clean_count)]
    items += [planted(rng, code) for code in PLANTED_CODES for _ in range(per_code)]
    rng.shuffle(items)
    paragraphs = []
    for i in range(0, len(items), 4):
        parts, spans = [], []
        length = 0
        for item in items[i : i + 4]:
            lead = rng.choice(LEADS)
            before, after = lead.split("{x}")
            before = before.format(s=rng.choice(SUBJECTS))
            if before and before[0].islower():
                before = before[0].upper() + before[1:]
            sentence = before + item.text + after
            start = length + len(before)
            spans.append((start, start + len(item.text), item))
            parts.append(sentence)
            length += len(sentence) + 1
        if rng.random() < 0.5:
            filler = rng.choice(FILLER)
            parts.append(filler)
        paragraphs.append((" ".join(parts), spans))
    return paragraphs


_ITALIC_SYMBOLS = ("t", "F", "r", "z", "U", "H", "p", "d", "g", "M", "SD", "N", "n", "V")


def italic_spans(text: str, start: int, end: int) -> list[tuple[int, int]]:
    """Where the Latin symbols of one statistic are, for italics in Word."""
    import re

    out = []
    for m in re.finditer(r"(?<![A-Za-z])(SD|rs|[tFrzUHpdgMNnV])(?=\s*[(=<]|\()", text[start:end]):
        sym = m.group(1)
        s = start + m.start(1)
        out.append((s, s + (1 if sym == "rs" else len(sym))))
    return out


def write_docx(paragraphs, path) -> None:  # type: ignore[no-untyped-def]
    """The corpus as a Word file, symbols italic except where italics errors are planted."""
    import docx

    document = docx.Document()
    document.add_heading("Results", level=1)
    for text, spans in paragraphs:
        italic = []
        for start, end, item in spans:
            if "italics" not in item.codes:
                italic += italic_spans(text, start, end)
        italic.sort()
        p = document.add_paragraph()
        at = 0
        for s, e in italic:
            if s > at:
                p.add_run(text[at:s])
            p.add_run(text[s:e]).italic = True
            at = e
        p.add_run(text[at:])
    document.save(str(path))


def write_md(paragraphs, path) -> None:  # type: ignore[no-untyped-def]
    """The corpus as Markdown (italics are not checked there; planted italics errors are Word-only)."""
    lines = ["# Results", ""]
    for text, _ in paragraphs:
        lines += [text, ""]
    path.write_text("\n".join(lines), encoding="utf-8")
