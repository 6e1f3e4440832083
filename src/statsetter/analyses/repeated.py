"""Tests for the same people measured more than once on a categorical or
ranked outcome: McNemar's test (two binary measurements), Cochran's Q (k
binary measurements) and Friedman's test (k ranked or numeric measurements)
with Kendall's W. Wide data: one column per measurement, one row per person;
rows with a missing measurement are dropped (listwise, said in the notes).
"""

from __future__ import annotations

import math
from typing import TYPE_CHECKING, Literal, Mapping, Sequence

from ..coding import categories, category_text
from ..errors import InputError
from ..formulas import adjusted_p
from ..records import EffectSize, Estimate, GroupSummary, Interval, Note, Result, Statistic, Variable
from . import _common as c

if TYPE_CHECKING:
    import numpy as np
    import pandas as pd

McNemarVariant = Literal["auto", "exact", "corrected", "uncorrected"]
EXACT_BELOW = 25  # discordant pairs: below this the exact binomial test (practice: the chi-square approximation needs b + c >= 25)


# an error sum of squares below this share of the total is the rounding of the arithmetic, not variance in the data (the
# subtraction that makes it loses about 1e-16 of the total): F would be a quotient of rounding errors
_NO_ERROR = 1e-12


def _binary(data: "pd.DataFrame", columns: Sequence[str], test: str) -> tuple[list[object], "list"]:  # type: ignore[type-arg]
    """The two values the columns take (sorted, the same two for every column) and each column as 0/1."""
    values = sorted({v for col in columns for v in data[col].unique()}, key=lambda v: (str(type(v)), v))
    if len(values) != 2:
        shown = ", ".join(category_text(v) for v in values[:6])
        raise InputError(f"{', '.join(columns)}: {test} needs two values across the measurements (found {len(values)}: {shown})")
    return values, [(data[col] == values[1]).to_numpy(dtype=int) for col in columns]


def mcnemar(
    df: "pd.DataFrame",
    first: str,
    second: str,
    *,
    variant: McNemarVariant = "auto",
    level: float = 0.95,
    labels: Mapping[str, str] | None = None,
) -> Result:
    """McNemar's test of a change in a binary outcome measured twice on the
    same people. Only the discordant pairs count: b (the second value at the
    first measurement only) and c (at the second only). ``exact``: the
    binomial test of b against b + c at one half; ``corrected``: χ² =
    (|b − c| − 1)² / (b + c) (Edwards' continuity correction, R's default);
    ``uncorrected``: (b − c)² / (b + c); ``auto``: exact below 25 discordant
    pairs, else corrected (stated). The effect size is the odds ratio of the
    discordant pairs, b / c, with the exact conditional CI (Clopper–Pearson
    limits of b / (b + c), as odds)."""
    from scipy import stats

    if variant not in ("auto", "exact", "corrected", "uncorrected"):
        raise InputError(f"variant: {variant!r} is not auto, exact, corrected or uncorrected")
    data, missing = c.listwise(df, [first, second])
    values, (x, y) = _binary(data, [first, second], "McNemar's test")
    b, cc = int(((x == 0) & (y == 1)).sum()), int(((x == 1) & (y == 0)).sum())
    n = len(x)
    if b + cc == 0:
        raise InputError(f"{first}, {second}: no pair changed; McNemar's test is undefined")
    chosen = ("exact" if b + cc < EXACT_BELOW else "corrected") if variant == "auto" else variant
    statistic = None
    if chosen == "exact":
        p = float(stats.binomtest(b, b + cc, 0.5).pvalue)
        method = "exact binomial test of the discordant pairs"
    else:
        gap = abs(b - cc) - (1 if chosen == "corrected" else 0)
        chi2 = max(gap, 0) ** 2 / (b + cc)
        statistic = Statistic("chi2", chi2, (1,))
        p = float(stats.chi2.sf(chi2, 1))
        method = "chi-square with continuity correction" if chosen == "corrected" else "chi-square without continuity correction"
    effects: tuple[EffectSize, ...] = ()
    if b > 0 and cc > 0:
        low, high = stats.binomtest(b, b + cc, 0.5).proportion_ci(level, method="exact")
        ci = Interval(level, low / (1 - low), high / (1 - high) if high < 1 else math.inf) if high < 1 else None
        effects = (EffectSize("OR", b / cc, ci, ratio=True, method="odds ratio of the discordant pairs b/c; exact conditional CI"),)
    shown = category_text(values[1])
    named = dict(labels or {})
    groups = tuple(GroupSummary(named.get(col, col), n=int(v.sum()), percent=100 * float(v.mean())) for col, v in ((first, x), (second, y)))
    notes = [Note("method", f"McNemar's test, {method}" + (f" (chosen: {b + cc} discordant pairs, {'fewer' if b + cc < EXACT_BELOW else 'at least'} than "
                                                            f"{EXACT_BELOW})" if variant == "auto" else "") + ".")]
    if effects == () and b + cc > 0:
        notes.append(Note("method", "No odds ratio: one of the discordant counts is zero."))
    return Result(
        kind="mcnemar",
        statistic=statistic,
        p=min(p, 1.0),
        n=n,
        effects=effects,
        groups=groups,
        variables=c.variables({"first": first, "second": second}, labels),
        notes=c.notes(*notes, missing),  # type: ignore[arg-type]
        details={"method": method, "b": b, "c": cc, "value": shown},
        provenance=c.provenance("statsetter.analyses.mcnemar"),
    )


def cochran_q(df: "pd.DataFrame", columns: Sequence[str], *, outcome_label: str | None = None, labels: Mapping[str, str] | None = None) -> Result:
    """Cochran's Q test that k binary measurements of the same people share
    one proportion: Q = (k − 1)(k ΣC_j² − T²) / (kT − ΣR_i²) with column
    totals C_j, row totals R_i and grand total T; χ²(k − 1) approximation."""
    import numpy as np
    from scipy import stats

    columns = list(columns)
    if len(columns) < 2:
        raise InputError("columns: Cochran's Q needs at least two measurements")
    data, missing = c.listwise(df, columns)
    values, cols = _binary(data, columns, "Cochran's Q")
    m = np.column_stack(cols)
    k = m.shape[1]
    col, row, total = m.sum(axis=0), m.sum(axis=1), m.sum()
    denominator = k * total - (row**2).sum()
    if denominator == 0:
        raise InputError(f"{', '.join(columns)}: every person has the same value at every measurement; Cochran's Q is undefined")
    q = float((k - 1) * (k * (col**2).sum() - total**2) / denominator)
    named = dict(labels or {})
    groups = tuple(GroupSummary(named.get(name, name), n=int(v), percent=100 * float(v) / len(m)) for name, v in zip(columns, col))
    return Result(
        kind="cochran_q",
        statistic=Statistic("Q", q, (k - 1,)),
        p=float(stats.chi2.sf(q, k - 1)),
        n=len(m),
        groups=groups,
        variables=c.measured_variables(columns, labels, outcome_label),
        notes=c.notes(Note("method", "Cochran's Q with the chi-square approximation."), missing),
        details={"k": k, "value": category_text(values[1])},
        provenance=c.provenance("statsetter.analyses.cochran_q"),
    )


def friedman(df: "pd.DataFrame", columns: Sequence[str], *, outcome_label: str | None = None, labels: Mapping[str, str] | None = None) -> Result:
    """Friedman's test of k related measurements (ranks within each person,
    corrected for ties; χ²(k − 1) approximation, as scipy and R compute it)
    with Kendall's W = χ²_F / (n(k − 1)) (Tomczak & Tomczak, 2014)."""
    import numpy as np
    from scipy import stats

    columns = list(columns)
    if len(columns) < 3:
        raise InputError("columns: Friedman's test needs at least three measurements (two: use the Wilcoxon signed-rank test)")
    data, missing = c.listwise(df, columns)
    arrays = [c.numeric(data, col).to_numpy(dtype=float) for col in columns]
    n, k = len(arrays[0]), len(arrays)
    if n < 2:
        raise InputError(f"{', '.join(columns)}: {n} complete row(s); Friedman's test needs at least two people")
    from .ranks import score_precision

    if all(c.constant(row) for row in np.column_stack(arrays)):
        raise InputError(f"{', '.join(columns)}: every person's measurements are tied; Friedman's χ² is undefined")
    res = stats.friedmanchisquare(*arrays)
    chi2 = float(res.statistic)
    named = dict(labels or {})
    groups = tuple(GroupSummary(named.get(col, col), n=n, median=float(np.median(v)), q1=float(np.percentile(v, 25)), q3=float(np.percentile(v, 75)))
                   for col, v in zip(columns, arrays))
    return Result(
        kind="friedman",
        statistic=Statistic("chi2", chi2, (k - 1,)),
        p=float(res.pvalue),
        n=n,
        effects=(EffectSize("kendall_w", chi2 / (n * (k - 1)), method="Kendall's W = chi2 / (n(k - 1)) (Tomczak & Tomczak, 2014)"),),
        groups=groups,
        precision=score_precision(arrays, groups),
        variables=c.measured_variables(columns, labels, outcome_label),
        notes=c.notes(Note("method", "Friedman's test, ranks within each person corrected for ties, chi-square approximation."), missing),
        details={"k": k},
        provenance=c.provenance("statsetter.analyses.friedman"),
    )


RMCorrection = Literal["auto", "gg", "hf", "none"]


_CORRECTIONS = {"none": "no sphericity correction", "gg": "Greenhouse–Geisser correction", "hf": "Huynh–Feldt correction"}


def _contrasts(k: int) -> "np.ndarray":
    """k − 1 orthonormal contrasts of k measurements (from a QR of the centring matrix)."""
    import numpy as np

    return np.linalg.qr(np.eye(k) - 1.0 / k)[0][:, : k - 1]


def _sphericity(S: "np.ndarray", m: float, k: int, correction: str) -> tuple[float, float, tuple[float, float, float, float] | None, float, str]:
    """From the contrasts' covariance ``S`` with ``m`` residual df: the
    Greenhouse–Geisser ε̂, the Huynh–Feldt ε̃ as R's anova.mlm computes it
    (((m + 1)pε̂ − 2)/(p(m − pε̂)): the original formula for one group,
    Lecoutre's correction for several), Mauchly's test, and the ε and name
    of the correction ``correction`` chooses (auto: GG below .75, else HF)."""
    import numpy as np

    p = k - 1
    gg = float(np.trace(S) ** 2 / (p * np.trace(S @ S)))
    hf_raw = ((m + 1) * p * gg - 2) / (p * (m - p * gg))
    mauchly = _mauchly(S, m, k) if p > 1 and m >= p else None
    chosen = correction if correction != "auto" else ("none" if p == 1 else "gg" if gg < GG_BELOW else "hf")
    eps = {"none": 1.0, "gg": gg, "hf": min(1.0, hf_raw)}[chosen]
    return gg, hf_raw, mauchly, eps, _CORRECTIONS[chosen]


def _epsilons(gg: float, hf: float) -> str:
    return f"Greenhouse–Geisser ε = {gg:.4g}, Huynh–Feldt ε = {hf:.4g} (Huynh & Feldt, 1976)."


def _sphericity_notes(prefix: str, gg: float, hf: float, mauchly: tuple[float, float, float, float] | None, name: str, chosen: bool,
                      alone: str) -> list[Note]:
    """The assumption note (Mauchly's test and both ε, or ``alone`` without a test) and, when the rule ``chosen`` the
    correction, the note that says so; ``prefix`` names the term."""
    test = (f"Mauchly's test of sphericity: W = {mauchly[0]:.4g}, χ²({mauchly[2]:g}) = {mauchly[1]:.4g}, p = {mauchly[3]:.4g}; "
            + _epsilons(gg, hf)) if mauchly else alone
    notes = [Note("assumption", prefix + test)]
    if chosen:
        said = f"{name} reported: the Greenhouse–Geisser ε is {'below' if gg < GG_BELOW else 'at least'} {GG_BELOW} (Girden, 1992; practice). Name the rule you follow."
        notes.append(Note("choice", prefix + said if prefix else said[:1].upper() + said[1:]))
    return notes


def _mauchly(S: "np.ndarray", m: float, k: int) -> tuple[float, float, float, float]:
    """Mauchly's W of the contrasts' covariance ``S`` (m residual df) with its
    χ² and p, the p with the second-order term as R's mauchly.test computes
    it — which has k (the measurements) where Anderson's series has k − 1 in
    one place (pingouin follows R too; the difference in p is about 1e-4)."""
    import numpy as np
    from scipy import stats

    d = S.shape[0]
    sign, logdet = np.linalg.slogdet(S)
    log_w = float(logdet - d * np.log(np.trace(S) / d)) if sign > 0 else -math.inf
    rho = 1 - (2 * d * d + d + 2) / (6 * d * m)
    w2 = (d + 2) * (d - 1) * (d - 2) * (2 * d**3 + 6 * d * d + 3 * k + 2) / (288 * (m * d * rho) ** 2)
    chi2 = -m * rho * log_w
    dof = d * (d + 1) / 2 - 1
    p1, p2 = stats.chi2.sf(chi2, dof), stats.chi2.sf(chi2, dof + 4)
    return math.exp(log_w), chi2, dof, float(p1 + w2 * (p2 - p1))
GG_BELOW = 0.75  # auto: Greenhouse–Geisser when its epsilon is below .75, else Huynh–Feldt (Girden, 1992; practice)


def _wide(df: "pd.DataFrame", columns: Sequence[str] | None, outcome: str | None, subject: str | None, within: str | None,
          test: str) -> tuple["pd.DataFrame", list[str], str | None]:
    """Wide data (one column per measurement) from wide or long input; long data need outcome, subject and within."""
    if columns is not None:
        if outcome or subject or within:
            raise InputError(f"{test}: give the measurements as columns (wide data) or outcome, subject and within (long data), not both")
        return df, list(columns), None
    if not (outcome and subject and within):
        raise InputError(f"{test}: give columns= (one per measurement) or outcome=, subject= and within=")
    for name in (outcome, subject, within):
        c.column(df, name)
    counts = df.groupby([subject, within], observed=True).size()
    if (counts > 1).any():
        who, what = counts[counts > 1].index[0]
        raise InputError(f"{subject} {category_text(who)}: {int(counts.max())} rows for {within} {category_text(what)!r}; one row per person and measurement is needed")
    wide = df.pivot(index=subject, columns=within, values=outcome)
    wide.columns = [category_text(v) for v in wide.columns]
    return wide, list(wide.columns), outcome


def rm_anova(
    df: "pd.DataFrame",
    columns: Sequence[str] | None = None,
    *,
    outcome: str | None = None,
    subject: str | None = None,
    within: str | Sequence[str] | None = None,
    correction: RMCorrection = "auto",
    pairwise: str | None = None,
    level: float = 0.95,
    outcome_label: str | None = None,
    labels: Mapping[str, str] | None = None,
) -> "Result | list[Result]":
    """One-way repeated-measures ANOVA: F for the measurements against the
    measurement × person error; Mauchly's test of sphericity; the
    Greenhouse–Geisser ε̂ and the Huynh–Feldt ε̃ (Huynh & Feldt, 1976, the
    original formula, as R's anova.mlm and pingouin compute it) with their
    corrected df and p. Which correction the record reports follows
    ``correction``: ``auto`` is Greenhouse–Geisser when ε̂ < .75, else
    Huynh–Feldt (stated in the notes); ``none`` reports the uncorrected test.
    Effect sizes: generalized η² (η²G = SS_effect / (SS_effect + SS_persons
    + SS_error); Olejnik & Algina, 2003; Bakeman, 2005) and partial η². Wide
    data (``columns``) or long (``outcome``, ``subject``, ``within``); people
    with a missing measurement are dropped. ``pairwise`` ("holm" or
    "bonferroni") adds every pair of measurements as paired t tests with
    adjusted p, the mean difference's CI (at the Bonferroni-adjusted level
    for Bonferroni; unadjusted for Holm, said) and d_z; the test first.

    Two within-subjects factors (long data, ``within=[a, b]``): a list of
    term records (a, b, a × b), each tested against its own term × person
    error with its own sphericity test and correction (see `_two_within`)."""
    import numpy as np
    from scipy import stats

    if correction not in ("auto", "gg", "hf", "none"):
        raise InputError(f"correction: {correction!r} is not auto, gg, hf or none")
    if within is not None and not isinstance(within, str):
        factors = list(within)
        if len(factors) == 2:
            if pairwise is not None or columns is not None or not (outcome and subject):
                raise InputError("rm_anova: two within factors need long data (outcome=, subject=, within=[a, b]) and no pairwise=")
            return _two_within(df, outcome, subject, (factors[0], factors[1]), correction, level, labels)
        if len(factors) != 1:
            raise InputError(f"within: {len(factors)} factors given; one or two within-subjects factors are supported")
        within = factors[0]
    wide, columns, measured = _wide(df, columns, outcome, subject, within, "rm_anova")
    if len(columns) < 2:
        raise InputError("columns: a repeated-measures ANOVA needs at least two measurements")
    data, missing = c.listwise(wide, columns)
    Y = np.column_stack([c.numeric(data, col).to_numpy(dtype=float) for col in columns])
    n, k = Y.shape
    if n < 3:
        raise InputError(f"{', '.join(columns)}: {n} complete person(s); a repeated-measures ANOVA needs at least three")
    grand = Y.mean()
    ss_effect = n * float(((Y.mean(axis=0) - grand) ** 2).sum())
    ss_persons = k * float(((Y.mean(axis=1) - grand) ** 2).sum())
    total = float(((Y - grand) ** 2).sum())
    ss_error = total - ss_effect - ss_persons
    df1, df2 = k - 1.0, (k - 1.0) * (n - 1.0)
    if ss_error <= _NO_ERROR * total:
        raise InputError(f"{', '.join(columns)}: no error variance (every person changes alike); F is undefined")
    F = (ss_effect / df1) / (ss_error / df2)
    p = k - 1
    S = np.cov(Y @ _contrasts(k), rowvar=False).reshape(p, p)
    gg, hf_raw, mauchly, eps, name = _sphericity(S, n - 1.0, k, correction)
    hf = min(1.0, hf_raw)
    p_value = float(stats.f.sf(F, df1 * eps, df2 * eps))
    notes = _sphericity_notes("", gg, hf, mauchly, name, correction == "auto" and p > 1,
                              "Two measurements: sphericity holds by definition; " + _epsilons(gg, hf))
    named = dict(labels or {})
    groups = tuple(GroupSummary(named.get(col, col), n=n, mean=float(Y[:, j].mean()), sd=float(Y[:, j].std(ddof=1))) for j, col in enumerate(columns))
    details: dict[str, object] = {"k": k, "correction": name, "epsilon": eps, "epsilon_gg": gg, "epsilon_hf": hf, "df1_uncorrected": df1,
                                  "df2_uncorrected": df2, "p_uncorrected": float(stats.f.sf(F, df1, df2)), "ss": ss_effect, "ss_error": ss_error,
                                  "ss_persons": ss_persons}
    if mauchly:
        details.update(mauchly_w=mauchly[0], mauchly_p=mauchly[3])
    variables = c.measured_variables(columns, labels, None if measured else outcome_label)
    if measured:
        variables = c.variables({"outcome": measured}, labels) + variables
    main = Result(
        kind="anova_rm",
        statistic=Statistic("F", F, (df1 * eps, df2 * eps)),
        p=p_value,
        n=n,
        effects=(EffectSize("eta2_g", ss_effect / (ss_effect + ss_persons + ss_error), method="generalized η² (Olejnik & Algina, 2003)"),
                 EffectSize("eta2_p", ss_effect / (ss_effect + ss_error), method="SS_effect / (SS_effect + SS_error)")),
        groups=groups,
        variables=variables,
        notes=c.notes(*notes, missing),  # type: ignore[arg-type]
        details=details,
        provenance=c.provenance("statsetter.analyses.rm_anova"),
    )
    if pairwise is None:
        return main
    return [main, *_paired_pairs(Y, groups, variables, pairwise, level, missing)]


def _two_within(df: "pd.DataFrame", outcome: str, subject: str, factors: tuple[str, str], correction: RMCorrection, level: float,
                labels: Mapping[str, str] | None) -> list[Result]:
    """Two within-subjects factors by the contrast route of R's anova.mlm
    (``idata`` with ``X``/``M`` per term): each person's a × b measurements
    are projected on orthonormal contrasts of the term (A: C_a ⊗ 1/√b, B:
    1/√a ⊗ C_b, A × B: C_a ⊗ C_b); SS = n‖mean‖², its error the trace of the
    projections' residual cross-products (df p and p(n − 1)); each term's ε
    and Mauchly's test from the projections' covariance. η²G (all factors
    manipulated; Olejnik & Algina, 2003) divides by the term's SS plus the
    people's and every error SS."""
    import numpy as np
    from scipy import stats

    from .effects import variance_explained

    a, b = factors
    for name in (outcome, subject, a, b):
        c.column(df, name)
    c.numeric(df, outcome)
    if a == b:
        raise InputError(f"within: {a} is named twice")
    counts = df.groupby([subject, a, b], observed=True).size()
    if (counts > 1).any():
        who, x, y = counts[counts > 1].index[0]
        raise InputError(f"{subject} {category_text(who)}: {int(counts.max())} rows for {a} {category_text(x)!r} and {b} {category_text(y)!r}; one row per person and cell is needed")
    la, lb = categories(df[a]), categories(df[b])
    if len(la) < 2 or len(lb) < 2:
        raise InputError(f"{a if len(la) < 2 else b}: one level; a within-subjects factor needs at least two")
    wide = df.pivot(index=subject, columns=[a, b], values=outcome).reindex(columns=[(x, y) for x in la for y in lb])
    cells = [f"{category_text(x)} × {category_text(y)}" for x in la for y in lb]
    wide.columns = cells
    data, missing = c.listwise(wide, cells)
    Y = np.column_stack([c.numeric(data, col).to_numpy(dtype=float) for col in cells])
    n = Y.shape[0]
    if n < 3:
        raise InputError(f"{outcome}: {n} person(s) with every cell measured; a repeated-measures ANOVA needs at least three")
    ka, kb = len(la), len(lb)
    ua, ub = np.full((ka, 1), ka**-0.5), np.full((kb, 1), kb**-0.5)
    Ca, Cb = _contrasts(ka), _contrasts(kb)
    named = dict(labels or {})
    shown = {v: named.get(v, v) for v in (outcome, a, b)}
    fitted = []
    for label, M, interaction in ((shown[a], np.kron(Ca, ub), False), (shown[b], np.kron(ua, Cb), False),
                                  (f"{shown[a]} × {shown[b]}", np.kron(Ca, Cb), True)):
        T = Y @ M
        mean = T.mean(axis=0)
        E = (T - mean).T @ (T - mean)
        fitted.append((label, interaction, n * float(mean @ mean), float(np.trace(E)), E, M.shape[1]))
    ss_persons = ka * kb * float(((Y.mean(axis=1) - Y.mean()) ** 2).sum())
    total = float(((Y - Y.mean()) ** 2).sum())
    if c.constant(Y.ravel()) or any(f[3] <= _NO_ERROR * total for f in fitted):
        label = next((f[0] for f in fitted if f[3] <= _NO_ERROR * total), shown[a])
        raise InputError(f"{label}: no error variance (every person changes alike); F is undefined")
    errors = sum(f[3] for f in fitted)
    cells = c.cell_groups((category_text(x), category_text(y), Y[:, i * kb + j]) for i, x in enumerate(la) for j, y in enumerate(lb))
    variables = (Variable(outcome, shown[outcome], "outcome"), Variable(a, shown[a], "factor"), Variable(b, shown[b], "factor"))
    prov = c.provenance("statsetter.analyses.rm_anova")
    out = []
    for label, interaction, ss, ss_error, E, p in fitted:
        if ss_error <= 0:
            raise InputError(f"{label}: no error variance (every person changes alike); F is undefined")
        df1, df2 = float(p), float(p * (n - 1))
        gg, hf_raw, mauchly, eps, name = _sphericity(E / (n - 1), n - 1.0, p + 1, correction)
        hf = min(1.0, hf_raw)
        F = (ss / df1) / (ss_error / df2)
        notes = _sphericity_notes(f"{label}: ", gg, hf, mauchly, name, correction == "auto" and p > 1,
                                  "two levels; sphericity holds by definition.")
        details: dict[str, object] = {"term": label, "interaction": interaction, "ss": ss, "ss_error": ss_error, "correction": name,
                                      "epsilon": eps, "epsilon_gg": gg, "epsilon_hf": hf, "df1_uncorrected": df1, "df2_uncorrected": df2,
                                      "p_uncorrected": float(stats.f.sf(F, df1, df2)), "eta2_g": ss / (ss + ss_persons + errors)}
        if mauchly:
            details.update(mauchly_w=mauchly[0], mauchly_p=mauchly[3])
        out.append(Result(
            kind="anova_term",
            statistic=Statistic("F", F, (df1 * eps, df2 * eps)),
            p=float(stats.f.sf(F, df1 * eps, df2 * eps)),
            n=n,
            effects=(variance_explained("eta2_p", ss / (ss + ss_error), F, df1, df2, level),
                     EffectSize("eta2_g", ss / (ss + ss_persons + errors), method="generalized η² (Olejnik & Algina, 2003)")),
            variables=variables,
            notes=c.notes(*notes, missing),  # type: ignore[arg-type]
            details=details,
            groups=cells if interaction else (),
            provenance=prov,
        ))
    return out


def _paired_pairs(Y, groups, variables, adjust: str, level: float, missing: Note | None) -> list[Result]:  # type: ignore[no-untyped-def]
    """Every pair of measurements: paired t tests, Holm- or Bonferroni-adjusted."""
    from itertools import combinations

    import numpy as np
    from scipy import stats

    if adjust not in ("holm", "bonferroni"):
        raise InputError(f"pairwise: {adjust!r} is not holm or bonferroni")
    pairs = list(combinations(range(Y.shape[1]), 2))
    tests = [stats.ttest_rel(Y[:, i], Y[:, j]) for i, j in pairs]
    adjusted = adjusted_p([t.pvalue for t in tests], adjust)
    m = len(pairs)
    ci_level = 1 - (1 - level) / m if adjust == "bonferroni" else level
    name = {"holm": "Holm", "bonferroni": "Bonferroni"}[adjust]
    note = Note("correction", f"Paired t tests between the measurements, {name}-adjusted p over {m} pairs; "
                              + (f"CIs at the Bonferroni-adjusted level {ci_level:.4g}." if adjust == "bonferroni" else "CIs unadjusted."))
    out = []
    for (i, j), t, p in zip(pairs, tests, adjusted):
        d = Y[:, i] - Y[:, j]
        n = len(d)
        se = float(d.std(ddof=1) / np.sqrt(n))
        half = float(stats.t.ppf(0.5 + ci_level / 2, n - 1)) * se
        mean = float(d.mean())
        out.append(Result(
            kind="posthoc_pair",
            statistic=Statistic("t", float(t.statistic), (n - 1.0,)),
            p=float(min(p, 1.0)),
            n=n,
            estimate=Estimate("mean difference", mean, se=se, ci=Interval(ci_level, mean - half, mean + half)),
            effects=(EffectSize("d_z", mean / float(d.std(ddof=1)), method="mean difference / SD of the differences"),),
            groups=(groups[i], groups[j]),
            variables=variables,
            notes=c.notes(note, missing),
            details={"procedure": f"paired t tests, {name}-adjusted", "comparisons": m},
            provenance=c.provenance("statsetter.analyses.rm_anova(pairwise)", statsmodels=True),
        ))
    return out


def mixed_anova(
    df: "pd.DataFrame",
    outcome: str | None = None,
    subject: str | None = None,
    within: str | None = None,
    between: str | None = None,
    *,
    columns: Sequence[str] | None = None,
    correction: RMCorrection = "auto",
    simple: Literal["within", "between", "both"] | None = None,
    level: float = 0.95,
    labels: Mapping[str, str] | None = None,
) -> list[Result]:
    """Mixed (split-plot) ANOVA of long data, one between-subjects and one
    within-subjects factor: the between effect (against people within
    groups), the within effect and the interaction (against the within
    error), by the multivariate-contrast route of R's anova.mlm — sequential
    for unequal groups. The within terms carry Mauchly's test (on the pooled
    within-group covariance of orthonormal contrasts, N − g df), the
    Greenhouse–Geisser ε̂ and the Huynh–Feldt ε̃ with Lecoutre's (1991)
    correction for groups, as R computes it (((N − g + 1)pε̂ − 2)/(p(N − g −
    pε̂)); recalled from memory and checked against R's output), and the
    correction chosen as in `rm_anova`. Effect sizes: η²p with its
    noncentral-F interval (uncorrected df) and η²G.

    ``simple`` adds simple-effects follow-ups after the three terms:
    ``within``, the within factor in each group (a repeated-measures ANOVA of
    that group's people, its own error term and sphericity correction);
    ``between``, the groups at each measurement (a one-way ANOVA); ``both``.
    Each uses its own error term, not the omnibus one, and p is not adjusted
    for the number of simple effects (said in a note).

    Wide data (a row per person, as SPSS keeps it): ``columns`` are the
    measurements and ``between`` the group column; ``outcome`` and
    ``within`` then only name the outcome and the within factor in the
    text (default "the outcome" and "measurement"), and ``subject`` is not
    given."""
    import numpy as np
    from scipy import stats

    from .effects import variance_explained

    if correction not in ("auto", "gg", "hf", "none"):
        raise InputError(f"correction: {correction!r} is not auto, gg, hf or none")
    if simple not in (None, "within", "between", "both"):
        raise InputError(f"simple: {simple!r} is not within, between or both")
    if between is None:
        raise InputError("between: the between-subjects factor (a group column) is needed")
    if columns is not None:
        if subject is not None:
            raise InputError("mixed_anova: give columns= (wide data) or subject= with outcome= and within= (long data), not both")
        for name in (*columns, between):
            if c.column(df, name).ndim > 1:
                raise InputError(f"{name}: {df[name].shape[1]} columns have this name; rename them so that each is named once")
        outcome, within = outcome or "the outcome", within or "measurement"
        if len({*columns, between, outcome, within}) != len(columns) + 3:
            raise InputError(f"{', '.join(columns)}: the measurements, {between}, the outcome's and the factor's names must differ")
        import pandas as pd

        named_columns = {col: (labels or {}).get(col, col) for col in columns}  # the measurements as the text names them, in order
        if len(set(named_columns.values())) != len(columns):
            named_columns = {col: col for col in columns}
        # the rows are the people already: the measurements renamed as the text names them, each person's group beside
        wide = pd.DataFrame({category_text(named): df[col].array for col, named in named_columns.items()})
        columns = list(wide.columns)
        if between in columns:
            raise InputError(f"{between}: also a level of {within}; rename one of them")
        wide = wide.assign(**{between: df[between].to_numpy()})
    elif not (outcome and subject and within):
        raise InputError("mixed_anova: give outcome=, subject= and within= (long data) or columns= (wide data)")
    else:
        c.column(df, between)
        c.column(df, subject)
        per_person = df.groupby(subject, observed=True)[between].nunique()
        if (per_person > 1).any():
            raise InputError(f"{between}: person {category_text(per_person[per_person > 1].index[0])} is in more than one group; {between} must be between subjects")
        wide, columns, _ = _wide(df, None, outcome, subject, within, "mixed_anova")
        groups_of = df.groupby(subject, observed=True)[between].first()
        if between in columns:
            raise InputError(f"{between}: also a level of {within}; rename one of them")
        wide = wide.assign(**{between: groups_of.reindex(wide.index).to_numpy()})
    data, missing = c.listwise(wide, [*columns, between])
    Y = np.column_stack([c.numeric(data, col).to_numpy(dtype=float) for col in columns])
    g = data[between].map(category_text).to_numpy()
    levels = sorted(set(g))
    N, k, G = Y.shape[0], Y.shape[1], len(levels)
    if G < 2:
        raise InputError(f"{between}: one group with complete data; a mixed ANOVA needs at least two")
    p = k - 1
    T = Y @ _contrasts(k)
    member = [g == lev for lev in levels]
    n_j = np.array([m.sum() for m in member], dtype=float)
    means = np.array([T[m].mean(axis=0) for m in member])
    resid = np.vstack([T[m] - means[j] for j, m in enumerate(member)])
    E = resid.T @ resid
    dfe = N - G
    grand_t = T.mean(axis=0)
    H_within = N * np.outer(grand_t, grand_t)
    H_inter = sum(n_j[j] * np.outer(means[j] - grand_t, means[j] - grand_t) for j in range(G))
    ss_err, ss_within, ss_inter = float(np.trace(E)), float(np.trace(H_within)), float(np.trace(H_inter))
    total = float(((Y - Y.mean()) ** 2).sum())
    if c.constant(Y.ravel()) or ss_err <= _NO_ERROR * total:
        raise InputError(f"{', '.join(columns)}: no error variance within {between}'s groups (every person changes alike); F is undefined")
    s = Y.mean(axis=1)
    s_means = np.array([s[m].mean() for m in member])
    ss_between = k * float((n_j * (s_means - s.mean()) ** 2).sum())
    ss_persons = k * float(sum(((s[m] - s_means[j]) ** 2).sum() for j, m in enumerate(member)))
    if ss_persons <= _NO_ERROR * total:
        raise InputError(f"{between}: every person's mean equals their group's; the between-subjects F is undefined")
    gg, hf_raw, mauchly, eps, name = _sphericity(E / dfe, float(dfe), k, correction)
    hf = min(1.0, hf_raw)
    named = dict(labels or {})
    shown = {v: named.get(v, v) for v in (outcome, within, between)}
    variables = (Variable(outcome, shown[outcome], "outcome"), Variable(between, shown[between], "factor"), Variable(within, shown[within], "factor"))
    sphericity = Note("assumption", (f"Mauchly's test of sphericity: W = {mauchly[0]:.4g}, χ²({mauchly[2]:g}) = {mauchly[1]:.4g}, p = {mauchly[3]:.4g}; "
                                     if mauchly else "") + f"Greenhouse–Geisser ε = {gg:.4g}, Huynh–Feldt ε = {hf_raw:.4g} (used capped at 1; "
                                                           "Lecoutre's correction, as R's anova.mlm).")
    chosen_note = Note("choice", f"Within-subjects terms with {name}" + (f" (the Greenhouse–Geisser ε is {'below' if gg < GG_BELOW else 'at least'} "
                                                                            f"{GG_BELOW}; Girden, 1992)" if correction == "auto" and p > 1 else "") + ".")
    prov = c.provenance("statsetter.analyses.mixed_anova")
    terms = [
        (shown[between], ss_between, float(G - 1), ss_persons, float(dfe), False, 1.0),
        (shown[within], ss_within, float(p), ss_err, float(p * dfe), False, eps),
        (f"{shown[between]} × {shown[within]}", ss_inter, float(p * (G - 1)), ss_err, float(p * dfe), True, eps),
    ]
    cells = c.cell_groups((lev, col, Y[g == lev, j]) for lev in levels for j, col in enumerate(columns))
    out = []
    for i, (label, ss, df1, ss_error, df2, interaction, e) in enumerate(terms):
        F = (ss / df1) / (ss_error / df2)
        details: dict[str, object] = {"term": label, "interaction": interaction, "ss": ss, "ss_error": ss_error, "eta2_g": ss / (ss + ss_persons + ss_err)}
        notes: list[Note] = []
        if i > 0:
            details.update(correction=name, epsilon=e, epsilon_gg=gg, epsilon_hf=hf, df1_uncorrected=df1, df2_uncorrected=df2)
            notes = [sphericity, chosen_note]
        out.append(Result(
            kind="anova_term",
            statistic=Statistic("F", F, (df1 * e, df2 * e)),
            p=float(stats.f.sf(F, df1 * e, df2 * e)),
            n=N,
            effects=(variance_explained("eta2_p", ss / (ss + ss_error), F, df1, df2, level),),
            variables=variables,
            notes=c.notes(*notes, missing),  # type: ignore[arg-type]
            details=details,
            groups=cells if interaction else (),
            provenance=prov,
        ))
    if simple:
        out += _simple_effects(data, columns, g, levels, simple, shown, variables, (outcome, between), correction, level, labels)
    return out


def _simple_effects(data: "pd.DataFrame", columns: list[str], g: "np.ndarray", levels: list[str], simple: str, shown: Mapping[str, str],
                    variables: tuple[Variable, ...], names: tuple[str, str], correction: RMCorrection, level: float,
                    labels: Mapping[str, str] | None) -> list[Result]:
    """The mixed ANOVA's simple effects: the within factor in each group, the groups at each measurement."""
    from dataclasses import replace

    import pandas as pd

    from .anova import anova_oneway

    outcome, between = names
    within = variables[2].name
    m = (len(levels) if simple in ("within", "both") else 0) + (len(columns) if simple in ("between", "both") else 0)
    note = Note("correction", f"Simple effect, one of {m}: tested with its own error term, not the omnibus one; p not adjusted for the {m} simple "
                              "effects (name the adjustment you apply).")
    out: list[Result] = []
    if simple in ("within", "both"):
        for lev in levels:
            r = rm_anova(data.loc[g == lev], columns, correction=correction, level=level, labels=labels)
            assert isinstance(r, Result)
            out.append(replace(r, variables=(variables[0], variables[2]) + r.variables, notes=r.notes + (note,),
                               details={**r.details, "where": f"where {shown[between]} is {lev}", "simple_effect": within}))
    if simple in ("between", "both"):
        for col in columns:
            frame = pd.DataFrame({outcome: data[col].to_numpy(dtype=float), between: g})
            r = anova_oneway(frame, outcome, between, level=level, labels=labels)
            out.append(replace(r, variables=r.variables + (variables[2],), notes=r.notes + (note,),
                               details={**r.details, "where": f"where {shown[within]} is {col}", "simple_effect": between}))
    return out
