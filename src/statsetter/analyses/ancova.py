"""Analysis of covariance: one or two factors and one or more numeric covariates.

Each term (the factor, each covariate) is an `anova_term` record with F, p
and η²p with its noncentral-F interval, from Type II or Type III sums of
squares (stated; Type III with sum-to-zero contrasts); two factors enter
with their interaction. The adjusted (estimated marginal) means of each
level — of each cell with two factors — at the covariates' means are
`adjusted_mean` records with their SE and CI. The homogeneity of the
regression slopes (the factor × covariate interaction) is tested and said
in a note: when it fails, one common slope misdescribes the data.
"""

from __future__ import annotations

from typing import TYPE_CHECKING, Literal, Mapping, Sequence

from ..coding import category_text
from ..errors import InputError
from ..records import Estimate, Interval, Note, Result, Statistic, Variable
from . import _common as c
from .effects import variance_explained

if TYPE_CHECKING:
    import pandas as pd


def ancova(
    df: "pd.DataFrame",
    outcome: str,
    factor: str | Sequence[str],
    covariates: Sequence[str],
    *,
    ss_type: Literal[2, 3] = 2,
    level: float = 0.95,
    labels: Mapping[str, str] | None = None,
) -> list[Result]:
    """``outcome`` by ``factor`` (one name, or two for a factorial design
    with their interaction) adjusted for ``covariates``: one record per
    term, then one adjusted mean per level of the factor (per cell)."""
    import pandas as pd
    from statsmodels.formula.api import ols

    if ss_type not in (2, 3):
        raise InputError(f"ss_type: {ss_type!r} is not 2 or 3")
    factors = [factor] if isinstance(factor, str) else list(factor)
    if not 1 <= len(factors) <= 2:
        raise InputError(f"factor: {len(factors)} factors given; one or two are supported")
    covariates = list(covariates)
    if not covariates:
        raise InputError("covariates: an ANCOVA needs at least one (without: anova_oneway or factorial_anova)")
    data, missing = c.listwise(df, [outcome, *factors, *covariates])
    c.numeric(data, outcome)
    for cov in covariates:
        c.numeric(data, cov)
    levels_of = [sorted(data[f].unique(), key=lambda v: (str(type(v)), v)) for f in factors]
    for f, levels in zip(factors, levels_of):
        if len(levels) < 2:
            raise InputError(f"{f}: one level with data; a factor needs at least two")
    if len(factors) == 2:
        present = data.groupby(factors, observed=True).size()
        for x in levels_of[0]:
            for z in levels_of[1]:
                if (x, z) not in present.index:
                    raise InputError(f"{factors[0]} × {factors[1]}: the cell {category_text(x)} × {category_text(z)} has no cases; "
                                     "a two-factor ANCOVA with the interaction needs every cell")
    frame = pd.DataFrame({"y_": data[outcome].astype(float)}, index=data.index)
    group_names = [f"g{i}_" for i in range(len(factors))]
    for name, f in zip(group_names, factors):
        frame[name] = data[f].map(category_text)
    cov_names = [f"z{i}_" for i in range(len(covariates))]
    for name, cov in zip(cov_names, covariates):
        frame[name] = data[cov].astype(float)
    coding = ", Sum" if ss_type == 3 else ""
    group_terms = [f"C({g}{coding})" for g in group_names]
    rhs = " + ".join([" * ".join(group_terms), *cov_names])
    fit, table = c.formula_anova(f"y_ ~ {rhs}", frame, ss_type, outcome)
    ss_res, df_res = float(table.loc["Residual", "sum_sq"]), float(table.loc["Residual", "df"])
    # homogeneity of regression slopes: each factor's products with each covariate added
    full = ols(f"y_ ~ {rhs} + " + " + ".join(f"{g}:{z}" for g in group_terms for z in cov_names), data=frame).fit()
    f_slopes, p_slopes, df_slopes = full.compare_f_test(fit)
    named = dict(labels or {})
    shown = {name: named.get(name, name) for name in (*factors, *covariates)}
    both = " × ".join(shown[f] for f in factors)
    slopes_note = Note("assumption", f"Homogeneity of regression slopes ({both} × covariates): F({df_slopes:g}, {full.df_resid:g}) = "
                                     f"{f_slopes:.4g}, p = {p_slopes:.4g}" + (" — the slopes differ between groups; one common slope misdescribes "
                                                                               "the data." if p_slopes < 0.05 else "."))
    ss_note = Note("method", f"Type {'II' if ss_type == 2 else 'III'} sums of squares" + (" with sum-to-zero contrasts." if ss_type == 3 else "."))
    variables = (Variable(outcome, named.get(outcome, outcome), "outcome"), *(Variable(f, shown[f], "factor") for f in factors),
                 *(Variable(cov, shown[cov], "covariate") for cov in covariates))
    prov = c.provenance("statsetter.analyses.ancova", statsmodels=True)
    terms = [(t, shown[f], False) for t, f in zip(group_terms, factors)]
    if len(factors) == 2:
        terms.append((":".join(group_terms), both, True))
    terms += [(z, shown[cov], False) for z, cov in zip(cov_names, covariates)]
    out = []
    for term, label, interaction in terms:
        row = table.loc[term]
        ss = float(row["sum_sq"])
        out.append(Result(
            kind="anova_term",
            statistic=Statistic("F", float(row["F"]), (float(row["df"]), df_res)),
            p=float(row["PR(>F)"]),
            n=int(fit.nobs),
            effects=(variance_explained("eta2_p", ss / (ss + ss_res), float(row["F"]), float(row["df"]), df_res, level),),
            variables=variables,
            notes=c.notes(ss_note, slopes_note, missing),
            details={"term": label, "interaction": interaction, "ss_type": ss_type, "ss": ss, "ss_error": ss_res, "covariate": term in cov_names,
                     "adjusted_for": ", ".join(shown[cv] for cv in covariates)},
            provenance=prov,
        ))
    means = {z: float(frame[z].mean()) for z in cov_names}
    from itertools import product

    from collections import Counter

    sizes = Counter(zip(*(frame[g].tolist() for g in group_names)))  # each cell's rows, counted once
    cells = [cell for cell in product(*[[category_text(v) for v in levels] for levels in levels_of]) if sizes[cell]]
    grid = pd.DataFrame({**{g: [cell[i] for cell in cells] for i, g in enumerate(group_names)}, **{z: [m] * len(cells) for z, m in means.items()}})
    predicted = fit.get_prediction(grid).summary_frame(alpha=1 - level)
    at = ", ".join(f"{shown[cov]}\u00a0=\u00a0{means[z]:.4g}" for z, cov in zip(cov_names, covariates))  # kept on one line
    for cell, (_, row) in zip(cells, predicted.iterrows()):
        out.append(Result(
            kind="adjusted_mean",
            n=sizes[cell],
            estimate=Estimate("adjusted mean", float(row["mean"]), se=float(row["mean_se"]),
                              ci=Interval(level, float(row["mean_ci_lower"]), float(row["mean_ci_upper"]))),
            variables=variables,
            notes=c.notes(Note("method", f"Estimated marginal mean at the covariate means ({at})."), missing),
            details={"level": ", ".join(cell), "at": at},
            provenance=prov,
        ))
    return out
