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

import itertools
import math
from collections import Counter
from typing import TYPE_CHECKING, Literal, Mapping, Sequence

from ..coding import category_text
from ..errors import InputError
from ..records import Estimate, Interval, Note, Result, Statistic, Variable
from . import _common as c
from .effects import variance_explained
from .sums_of_squares import Term, added_terms_test, anova_table, coded_factor, design, predictions, product

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
    import numpy as np

    if ss_type not in (2, 3):
        raise InputError(f"ss_type: {ss_type!r} is not 2 or 3")
    factors = [factor] if isinstance(factor, str) else list(factor)
    if not 1 <= len(factors) <= 2:
        raise InputError(f"factor: {len(factors)} factors given; one or two are supported")
    covariates = list(covariates)
    if not covariates:
        raise InputError("covariates: an ANCOVA needs at least one (without: anova_oneway or factorial_anova)")
    data, missing = c.listwise(df, [outcome, *factors, *covariates])
    c.require_variance(c.numeric(data, outcome), outcome, "F is undefined")
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
    y = data[outcome].to_numpy(dtype=float)
    group_values = [data[f].map(category_text).to_numpy() for f in factors]
    group_levels = [[category_text(v) for v in levels] for levels in levels_of]
    groups = [coded_factor(f"g{i}", values, levels, ss_type == 3) for i, (values, levels) in enumerate(zip(group_values, group_levels))]
    covariate_values = [data[cov].to_numpy(dtype=float) for cov in covariates]
    slopes = [Term(f"z{i}", frozenset([f"z{i}"]), values[:, None]) for i, values in enumerate(covariate_values)]
    model = [*groups, *([product(*groups)] if len(groups) == 2 else []), *slopes]
    table = anova_table(y, model, ss_type, outcome)
    ss_res, df_res = table.ss_error, float(table.df_error)
    # homogeneity of regression slopes: each factor's products with each covariate added
    f_slopes, df_slopes, df_full, p_slopes = added_terms_test(y, table, model, [product(g, z) for g in groups for z in slopes])
    named = dict(labels or {})
    shown = {name: named.get(name, name) for name in (*factors, *covariates)}
    both = " × ".join(shown[f] for f in factors)
    if math.isnan(p_slopes):  # the slopes' model leaves no error df (or adds nothing): no test
        slopes_note = Note("assumption", f"Homogeneity of regression slopes ({both} × covariates): not testable here — the model with "
                                         f"group-specific slopes leaves {df_full} error df and adds {df_slopes}; check the slopes by plotting them.")
    else:
        slopes_note = Note("assumption", f"Homogeneity of regression slopes ({both} × covariates): F({df_slopes}, {df_full}) = {f_slopes:.4g}, "
                                         f"p = {p_slopes:.4g}" + (" — the slopes differ between groups; one common slope misdescribes the data."
                                                                  if p_slopes < 0.05 else "."))
    ss_note = Note("method", f"Type {'II' if ss_type == 2 else 'III'} sums of squares" + (" with sum-to-zero contrasts." if ss_type == 3 else "."))
    variables = (Variable(outcome, named.get(outcome, outcome), "outcome"), *(Variable(f, shown[f], "factor") for f in factors),
                 *(Variable(cov, shown[cov], "covariate") for cov in covariates))
    prov = c.provenance("statsetter.analyses.ancova")
    term_labels = [*(shown[f] for f in factors), *([both] if len(factors) == 2 else []), *(shown[cov] for cov in covariates)]
    out = []
    for term, label in zip(model, term_labels):
        row = table.rows[term.name]
        out.append(Result(
            kind="anova_term",
            statistic=Statistic("F", row.F, (float(row.df), df_res)),
            p=row.p,
            n=table.nobs,
            effects=(variance_explained("eta2_p", row.ss / (row.ss + ss_res), row.F, float(row.df), df_res, level),),
            variables=variables,
            notes=c.notes(ss_note, slopes_note, missing),
            details={"term": label, "interaction": len(term.parts) > 1, "ss_type": ss_type, "ss": row.ss, "ss_error": ss_res,
                     "covariate": term in slopes, "adjusted_for": ", ".join(shown[cv] for cv in covariates)},
            provenance=prov,
        ))
    means = [float(values.mean()) for values in covariate_values]
    sizes = Counter(zip(*(values.tolist() for values in group_values)))  # each cell's rows, counted once
    cells = [cell for cell in itertools.product(*group_levels) if sizes[cell]]
    at_cells = [coded_factor(g.name, np.array([cell[i] for cell in cells], dtype=object), levels, ss_type == 3)
                for i, (g, levels) in enumerate(zip(groups, group_levels))]
    at_means = [Term(z.name, z.parts, np.full((len(cells), 1), m)) for z, m in zip(slopes, means)]
    predicted = predictions(table, design([*at_cells, *([product(*at_cells)] if len(at_cells) == 2 else []), *at_means]), level)
    at = ", ".join(f"{shown[cov]}\u00a0=\u00a0{m:.4g}" for m, cov in zip(means, covariates))  # kept on one line
    for cell, (mean, se, low, high) in zip(cells, predicted):
        out.append(Result(
            kind="adjusted_mean",
            n=sizes[cell],
            estimate=Estimate("adjusted mean", mean, se=se, ci=Interval(level, low, high)),
            variables=variables,
            notes=c.notes(Note("method", f"Estimated marginal mean at the covariate means ({at})."), missing),
            details={"level": ", ".join(cell), "at": at},
            provenance=prov,
        ))
    return out
