"""Regression models side by side, a model to each column (hierarchical regression tables in psychology and education:
"M1 (β) | M2 (β) | …", each predictor's coefficient in the columns of the models that hold it, then rows of each model's
F, R² and ΔR²): a model's F against its R², with k predictors (the coefficients in its column) and N cases (one N the
caption or note gives, or the table's own N row):

    F = (R²/k) / ((1 − R²)/(N − k − 1))

as the model's F; or, where the table gives ΔR², as a step's F change, (ΔR²/Δk) / ((1 − R²)/(N − k − 1)), Δk the
predictors it adds to the column before it (where that column's predictors are among its own; all k otherwise). An F
that fits neither, at the printed digits of each, is said with the N that would give it: the models may have been
fitted to fewer cases than the caption's N (missing data), which the table then does not say. Definitions (the F test
of R² and of its change).
"""

from __future__ import annotations

import re
from dataclasses import dataclass
from typing import Sequence

from .checks import Finding, _overlap
from .parsing import Number, PValue, Reported
from .reading import Unit
from .tables import _number, _totals, cell_grid

# a model's statistics in a row of their own, named in its first cell
_F_ROW = re.compile(r"\s*F(?:[- ]?(?:values?|statistics?|ratio))?\s*")
_R2_ROW = re.compile(r"(?i)\s*R\s?(?:[²2]|\^2|[- ]?squared?)\s*")
_DELTA_ROW = re.compile(r"(?i)\s*(?:(?:Δ|∆|delta\s*)\s?R\s?(?:[²2]|\^2|[- ]?squared?)(?:\s*change)?|R\s?(?:[²2]|[- ]?squared?)\s+change)\s*")
_N_ROW = re.compile(r"(?i)\s*(?:n|observations|no\.? of observations)\s*")
# rows that close the predictors' block: a model's statistics (its F, R², adjusted R², ΔR², N, df, information criteria, fit)
_MODEL_ROW = re.compile(r"(?i)\s*(?:F(?:[- ]?(?:values?|change|statistics?|ratio))?|Δ\s?F|adj(?:usted|\.)?\s*R.*|(?:Δ|∆|delta\s*)?\s?R\s?(?:[²2]|\^2|[- ]?squared?)"
                        r"(?:\s*change)?|n|N|observations|df|d\.f\.|AIC|BIC|log[- ]?likelihood|-?2\s?LL|RMSE|SEE|std\.?\s+error\s+of\s+(?:the\s+)?estimate)\s*")
# a caption or note that says some predictors are in the models but not shown
_UNSHOWN = re.compile(r"(?i)controll(?:ed|ing)\s+for|adjusted\s+for|not\s+(?:shown|reported|presented)|omitted|fixed\s+effects")
# a coefficient's cell: a number with its marks, alone or with its SE or interval after it ("0.272 (0.034)", "0.41** [0.2, 0.6]")
_COEFFICIENT = re.compile(r"\s*[-−–]?\s?(?:\d+(?:[.,]\d+)?|[.,]\d+)\s*[*†‡⁎∗a-d]*\s*(?:[(\[][^()\[\]]*[)\]]\s*[*†‡⁎∗]*\s*)?")
_PARENTHESISED = re.compile(r"\s*[(\[][^()\[\]]*[)\]]\s*|\s*[-–—]\s*")  # an SE in parentheses beside nothing, or a dash for none
_INTERCEPT = re.compile(r"(?i)\s*\(?\s*(?:constant|intercept|const\.?)\s*\)?\s*")


@dataclass(frozen=True, slots=True)
class ModelFit:
    """One model's F with its R² (and ΔR²), its predictors and its N, from a table of models side by side."""

    unit: Unit  # the F's cell
    rep: Reported  # the F on (k, N − k − 1) df, with the p its marks give
    r2: Number
    delta: Number | None
    k: int
    added: int  # the predictors this step adds to the column before's (all k where it holds no earlier column's)
    n: int
    n_said: str  # where the N comes from


def model_fits(cells: Sequence[tuple[int, int, Unit, list[Reported]]], said: str, mark: str,
               stars: "dict[str, tuple[str, Number]] | None" = None) -> list[ModelFit]:
    """Each model column's F, R², ΔR², predictors and N, where the table has an F row and an R² row under a block of
    labelled coefficient rows, and one N (its N row's, else the one its caption or note gives)."""
    rows = cell_grid(cells)
    labels = {r: row[min(row)].text for r, row in rows.items()}
    f_row = next((r for r, text in labels.items() if _F_ROW.fullmatch(text)), None)
    r2_row = next((r for r, text in labels.items() if _R2_ROW.fullmatch(text)), None)
    if f_row is None or r2_row is None:
        return []
    delta_row = next((r for r, text in labels.items() if _DELTA_ROW.fullmatch(text)), None)
    n_row = next((r for r, text in labels.items() if _N_ROW.fullmatch(text)), None)
    totals = set(_totals(said))
    order = sorted(rows)
    first_model_row = next(r for r in order if _MODEL_ROW.fullmatch(labels[r]))
    first = next((r for r in order if any(_COEFFICIENT.fullmatch(u.text) for c, u in rows[r].items() if c != min(rows[r]))), first_model_row)
    block = [r for r in order if first <= r < first_model_row and labels[r].strip() and not _INTERCEPT.fullmatch(labels[r])]  # (below the heads)
    if _UNSHOWN.search(said) or any(u.text.strip() and not _COEFFICIENT.fullmatch(u.text) and not _PARENTHESISED.fullmatch(u.text)
                                    for r in block for c, u in rows[r].items() if c != min(rows[r])):
        return []  # (predictors in a model but not in the table — "Controls | Yes | Yes" —: its k is not the column's count)
    predictors = [r for r in block if any(_COEFFICIENT.fullmatch(u.text) for c, u in rows[r].items() if c != min(rows[r]))]
    out = []
    held: frozenset[int] = frozenset()  # the predictors of the column before: a step's are its and those it adds
    for c, unit in sorted(rows[f_row].items()):
        if c == min(rows[f_row]) or c not in rows[r2_row]:
            continue
        f, r2 = _number(unit.text, mark), _number(rows[r2_row][c].text, mark)
        delta = _number(rows[delta_row][c].text, mark) if delta_row is not None and c in rows[delta_row] else None
        own_n = _number(rows[n_row][c].text.replace(",", ""), mark) if n_row is not None and c in rows[n_row] else None
        if own_n is not None and own_n[1].value.is_integer():
            n, n_said = int(own_n[1].value), "the table's N row"
        elif len(totals) == 1:
            n, n_said = next(iter(totals)), "the N the caption or note gives"
        else:
            continue
        mine = frozenset(r for r in predictors if c in rows[r] and _COEFFICIENT.fullmatch(rows[r][c].text))
        k, added, held = len(mine), len(mine - held) if held < mine else len(mine), mine
        if f is None or r2 is None or f[0] != "=" or r2[0] != "=" or k < 1 or n - k - 1 < 1 or not 0 < r2[1].value < 1:
            continue
        p = _marked(unit.text, stars, f[1])
        df = (Number(str(k), float(k), 0, f[1].start, f[1].start), Number(str(n - k - 1), float(n - k - 1), 0, f[1].start, f[1].start))
        rep = Reported("F", "F", f[1].start, f[1].start, f[1].end, df, None, "=", f[1], p)
        rep.text = f"F({k}, {n - k - 1}) = {f[1].text}" + (f", p {p.op} {p.number.text}" if p is not None and p.number is not None else "")
        out.append(ModelFit(unit, rep, r2[1], delta[1] if delta is not None and delta[0] == "=" else None, k, added, n, n_said))
    return out


_MARKS = re.compile(r"[*†‡⁎∗]+")


def _marked(text: str, stars: "dict[str, tuple[str, Number]] | None", f: Number) -> PValue | None:
    """The p bound the F's marks stand for, as the note defines them ("9.365**" with "**p < 0.01")."""
    m = _MARKS.search(text)
    bound = stars.get(m.group().replace("⁎", "*").replace("∗", "*")) if stars and m is not None else None
    return None if bound is None else PValue(bound[0], bound[1], f.end, f.end, f.end, "")


def _span(low: float, high: float) -> str:
    return f"{low:.2f}" if f"{low:.2f}" == f"{high:.2f}" else f"{low:.2f} to {high:.2f}"


def model_fit(fit: ModelFit) -> list[Finding]:
    """The model's F against its R², k and N (as the model's F, or as a step's F change from its ΔR²), at the printed
    digits of each."""
    f, k, df2 = fit.rep.value, fit.k, fit.n - fit.k - 1
    assert f is not None
    shown = (max(f.value - f.half_unit, 0.0), f.value + f.half_unit)
    r_low, r_high = max(fit.r2.value - fit.r2.half_unit, 1e-12), min(fit.r2.value + fit.r2.half_unit, 1 - 1e-12)
    model = (r_low / k / ((1 - r_low) / df2), r_high / k / ((1 - r_high) / df2))
    if _overlap(model, shown):
        return []
    if fit.delta is not None:
        d_low, d_high = max(fit.delta.value - fit.delta.half_unit, 0.0), fit.delta.value + fit.delta.half_unit
        if _overlap((d_low / fit.added / ((1 - r_low) / df2), d_high / fit.added / ((1 - r_high) / df2)), shown):
            return []
    n_low = shown[0] * k * (1 - r_high) / r_high + k + 1
    n_high = shown[1] * k * (1 - r_low) / r_low + k + 1
    would = f"N = {round(n_low):,}" if round(n_low) == round(n_high) else f"N from {round(n_low):,} to {round(n_high):,}"
    change = f", nor as a step's F change from ΔR² = {fit.delta.text} on {fit.added} added" if fit.delta is not None and fit.added < k else ""
    return [Finding("effect-does-not-fit",
                    f"F = {f.text} does not follow from R² = {fit.r2.text} with {k} predictor{'s' if k > 1 else ''} (the coefficients in its "
                    f"column) and N = {fit.n:,} ({fit.n_said}): as the model's F they give {_span(*model)}{change}; {would} would give it. "
                    "Report each model's N, or check the F and R².",
                    f"F = {f.text}, R² = {fit.r2.text}, k = {k}, N = {fit.n:,}")]
