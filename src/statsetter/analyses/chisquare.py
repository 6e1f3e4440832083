"""Chi-square tests of independence and goodness of fit; Fisher's exact test for 2 × 2."""

from __future__ import annotations

import math
from typing import Literal, Mapping, TYPE_CHECKING

from ..coding import category_text
from ..errors import InputError
from ..records import EffectSize, Estimate, GroupSummary, Interval, Note, Result, Statistic
from . import _common as c

if TYPE_CHECKING:
    import pandas as pd

V_METHOD = "noncentral chi-square (Smithson, 2003)"


def _ncx2_limits(chi2: float, df: int, level: float) -> tuple[float, float]:
    """Noncentrality limits λ at which the observed χ² is the upper and lower
    (1 − level)/2 quantile; a limit below 0 is set to 0. The CDFs are
    scipy.special's chndtr and chdtr, which scipy.stats' ncx2 and chi2 call."""
    from scipy import optimize, special

    alpha = (1 - level) / 2

    def solve(target: float) -> float:
        f = lambda lam: special.chndtr(chi2, df, lam) - target if lam > 0 else special.chdtr(df, chi2) - target  # noqa: E731
        if f(0.0) < 0:
            return 0.0
        hi = max(1.0, chi2)
        for _ in range(64):  # bracket the root; the bound is reached only for absurd inputs
            if not f(hi) > 0:
                break
            hi *= 2
        else:
            raise InputError(f"chi-square = {chi2:g}, df = {df}: the interval search did not converge")
        return optimize.brentq(f, 0.0, hi, xtol=1e-12, maxiter=500)

    return solve(1 - alpha), solve(alpha)


def chi_square(
    df: "pd.DataFrame",
    row: str,
    column: str,
    *,
    variant: Literal["pearson", "yates"] = "pearson",
    level: float = 0.95,
    labels: Mapping[str, str] | None = None,
) -> list[Result]:
    """The χ² test of independence of two categorical columns, with Cramér's V
    (φ for 2 × 2) and its CI. ``variant="yates"`` applies Yates' continuity
    correction to a 2 × 2 table (stated); the default is Pearson's χ². Cells
    with expected counts below 5 are noted, and for a 2 × 2 table Fisher's exact
    test (conditional maximum-likelihood odds ratio with its exact CI) is added."""
    from scipy import stats

    if variant not in ("pearson", "yates"):
        raise InputError(f"variant: {variant!r} is not pearson or yates")
    yates = variant == "yates"
    data, missing = c.listwise(df, [row, column])
    table = c.cross_counts(data, row, column)
    r, k = table.shape
    if r < 2 or k < 2:
        raise InputError(f"{row} × {column}: a {r} × {k} table; a test of independence needs at least 2 × 2")
    counts = table.to_numpy()
    res = stats.chi2_contingency(counts, correction=yates)
    n = int(counts.sum())
    uncorrected = stats.chi2_contingency(counts, correction=False).statistic if yates else res.statistic
    m = min(r, k) - 1
    name = "phi" if (r, k) == (2, 2) else "V"
    value = math.sqrt(uncorrected / (n * m))
    lo, hi = _ncx2_limits(float(uncorrected), int(res.dof), level)
    ci = Interval(level, math.sqrt((lo + res.dof) / (n * m)) if lo > 0 else 0.0, min(1.0, math.sqrt((hi + res.dof) / (n * m))))
    if ci.low > value:
        ci = Interval(level, 0.0, ci.high)
    notes = [Note("method", "Yates' continuity correction applied." if yates and res.dof == 1 else "No continuity correction.")]
    small = int((res.expected_freq < 5).sum())
    if small:
        fisher = " Fisher's exact test is reported as well." if (r, k) == (2, 2) else ""
        notes.append(Note("assumption", f"{small} of {r * k} cells have expected counts below 5 (smallest {res.expected_freq.min():.4g}).{fisher}"))
    if missing:
        notes.append(missing)
    cells = tuple(GroupSummary(f"{category_text(a)} / {category_text(b)}", n=int(counts[i, j]))
                  for i, a in enumerate(table.index) for j, b in enumerate(table.columns))
    variables = c.variables({"row": row, "column": column}, labels)
    out = [
        Result(
            kind="chi2_independence",
            statistic=Statistic("chi2", float(res.statistic), (int(res.dof),)),
            p=float(res.pvalue),
            n=n,
            effects=(EffectSize(name, value, ci, method=f"{V_METHOD}; from the uncorrected χ²"),),
            groups=cells,
            variables=variables,
            notes=tuple(notes),
            details={"yates": bool(yates and res.dof == 1), "rows": r, "columns": k},
            provenance=c.provenance("statsetter.analyses.chi_square"),
        )
    ]
    if (r, k) == (2, 2):
        out.append(fisher_exact_table(counts, variables, level, missing))
    return out


def fisher_exact(
    df: "pd.DataFrame",
    row: str,
    column: str,
    *,
    alternative: str = "two-sided",
    level: float = 0.95,
    labels: Mapping[str, str] | None = None,
) -> Result:
    """Fisher's exact test of a 2 × 2 table of two categorical columns, with
    the conditional maximum-likelihood odds ratio and its exact CI (the odds
    of the first column category in the first row category over the second)."""

    data, missing = c.listwise(df, [row, column])
    table = c.cross_counts(data, row, column)
    if table.shape != (2, 2):
        raise InputError(f"{row} × {column}: a {table.shape[0]} × {table.shape[1]} table; Fisher's exact test here needs 2 × 2")
    return fisher_exact_table(table.to_numpy(), c.variables({"row": row, "column": column}, labels), level, missing, alternative)


def fisher_exact_table(counts, variables, level: float = 0.95, missing: Note | None = None, alternative: str = "two-sided") -> Result:  # type: ignore[no-untyped-def]
    from scipy import stats

    from ..formulas import conditional_odds_ratio

    if alternative not in ("two-sided", "less", "greater"):
        raise InputError(f"alternative: {alternative!r} is not two-sided, less or greater")
    p = stats.fisher_exact(counts, alternative=alternative).pvalue
    value, low, high = conditional_odds_ratio(counts, level, alternative)  # one-sided tests get the one-sided interval
    if math.isinf(value):  # an empty cell where the odds ratio goes to infinity: no number a record (or a reader) can hold
        estimate, said = None, (f" The odds ratio is infinite (a cell of the table is empty; the CI's lower limit is {low:.4g}, "
                                "its upper limit infinite): neither is reported.")
    elif math.isnan(value):  # an empty row or column: every odds ratio fits
        estimate, said = None, " The odds ratio is undefined (a row or column of the table is empty): it is not reported."
    else:
        estimate = Estimate("OR", value, ci=Interval(level, low, high) if math.isfinite(high) else None, ratio=True)
        said = "" if math.isfinite(high) else f" The CI has no finite upper limit (lower limit {low:.4g}); it is left out."
    return Result(
        kind="fisher_exact",
        p=float(p),
        alternative=alternative,  # type: ignore[arg-type]
        n=int(counts.sum()),
        estimate=estimate,
        variables=variables,
        notes=c.notes(
            Note("method", "Conditional maximum-likelihood odds ratio with its exact CI." + said),
            missing,
        ),
        provenance=c.provenance("statsetter.analyses.fisher_exact"),
    )


def goodness_of_fit(
    df: "pd.DataFrame",
    variable: str,
    proportions: Mapping[object, float],
    *,
    labels: Mapping[str, str] | None = None,
) -> Result:
    """χ² goodness of fit of ``variable``'s counts against given proportions (summing to 1)."""
    from scipy import stats

    data, missing = c.listwise(df, [variable])
    observed = data[variable].value_counts()
    unknown = sorted(set(map(category_text, observed.index)) - set(map(category_text, proportions)))
    if unknown:
        raise InputError(f"{variable}: categories {', '.join(unknown)} have no expected proportion")
    total = sum(proportions.values())
    if not math.isclose(total, 1.0, abs_tol=1e-9) or any(v <= 0 for v in proportions.values()):
        raise InputError(f"{variable}: expected proportions must be positive and sum to 1 (they sum to {total:g})")
    if len(proportions) < 2:
        raise InputError(f"{variable}: a goodness-of-fit test needs at least 2 categories")
    keys = list(proportions)
    lookup = {category_text(k): int(v) for k, v in observed.items()}
    obs = [lookup.get(category_text(k), 0) for k in keys]
    n = sum(obs)
    res = stats.chisquare(obs, f_exp=[n * proportions[k] for k in keys])
    return Result(
        kind="chi2_goodness_of_fit",
        statistic=Statistic("chi2", float(res.statistic), (len(keys) - 1,)),
        p=float(res.pvalue),
        n=n,
        groups=tuple(GroupSummary(category_text(k), n=o, percent=100 * o / n) for k, o in zip(keys, obs)),
        variables=c.variables({"variable": variable}, labels),
        notes=c.notes(missing),
        details={"expected": "given"},
        provenance=c.provenance("statsetter.analyses.goodness_of_fit"),
    )
