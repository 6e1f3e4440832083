"""Multilevel (mixed-effects) linear models.

`mixed_model` fits the outcome on fixed predictors with a random intercept
per group and, on request, random slopes. A random-intercept model is fitted
here by its profiled likelihood, maximised exactly (`_intercept_fit`: R's
nlme to 1e-9 where its own optimiser stops); with random slopes, by
statsmodels' MixedLM. The model record gives the estimation method (REML or
ML), the log-likelihood, AIC and BIC (counted as R's nlme counts them: the
fixed coefficients plus the variance parameters, BIC with n − p observations
under REML), the variance components and the ICC of the intercept-only
model; one record per fixed effect gives B, SE, z, p and the Wald CI —
fixed effects are tested with z (a normal approximation, as statsmodels
tests them; R's lme uses t with containment df, which gives slightly larger
p in small samples), said in every record. `compare_models` fits two nested
models by ML and gives the likelihood-ratio test.
"""

from __future__ import annotations

import math
from typing import TYPE_CHECKING, Literal, Mapping, NamedTuple, Sequence

from ..errors import InputError
from ..records import EffectSize, Estimate, Interval, Note, Result, Statistic, Variable
from . import _common as c

if TYPE_CHECKING:
    import numpy as np
    import pandas as pd

Method = Literal["REML", "ML"]
Z_NOTE = Note("method", "Fixed effects tested with z (a normal approximation, as statsmodels tests them; R's lme uses t with containment df).")


class _Fitted(NamedTuple):
    """What the records need of a fitted model: fixed effects and their SEs, the random effects' covariance, the
    residual variance and the log-likelihood (statsmodels' results have these attributes too)."""

    fe_params: "np.ndarray"
    bse_fe: "np.ndarray"
    cov_re: "np.ndarray"
    scale: float
    llf: float


def _fit(data: "pd.DataFrame", outcome: str, predictors: Sequence[str], group: str, slopes: Sequence[str], method: Method,  # type: ignore[no-untyped-def]
         reference: Mapping[str, object] | None = None):
    import warnings

    import numpy as np

    from .regression import _design

    if not data[group].duplicated().any():
        raise InputError(f"{group}: every group has one row; the group and residual variances cannot be told apart")
    y = c.numeric(data, outcome).to_numpy(dtype=float)
    c.require_variance(y, outcome, "a multilevel model has no variance to split")
    if predictors:
        X, meta, coding = _design(data, list(predictors), dict(reference or {}), None)
        X = np.asarray(X, dtype=float)
    else:
        X, meta, coding = np.ones((len(y), 1)), [], []
    if not slopes:  # a random intercept: its profiled likelihood, maximised exactly
        if len(y) <= X.shape[1]:
            raise InputError(f"{outcome}: {len(y)} complete rows for {X.shape[1]} fixed coefficients; a mixed model needs more rows")
        try:
            fit, problems = _intercept_fit(y, X, data[group].to_numpy(), method == "REML")
        except InputError as exc:
            raise InputError(f"{outcome}: {exc}") from None
        return fit, meta, coding, problems, X.shape[1], 1
    from statsmodels.regression.mixed_linear_model import MixedLM

    Z = np.column_stack([np.ones(len(y)), *[c.numeric(data, s).to_numpy(dtype=float) for s in slopes]])
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        fit = MixedLM(y, X, groups=data[group].to_numpy(), exog_re=Z).fit(reml=method == "REML")
    problems = [str(w.message).split("\n")[0] for w in caught if "converge" in str(w.message).lower() or "singular" in str(w.message).lower()
                or "boundary" in str(w.message).lower()]
    return fit, meta, coding, problems, X.shape[1], Z.shape[1]


_NO_RESIDUAL = "the residuals' sum of squares is 0 in double precision: the outcome's values are too small, or the model fits them exactly"


def _intercept_fit(y: "np.ndarray", X: "np.ndarray", groups: "np.ndarray", reml: bool) -> tuple[_Fitted, list[str]]:
    """A random-intercept model y = Xβ + u_group + e by ML or REML, with the variance ratio θ = τ²/σ² as the one
    parameter: for each θ, β and σ² have closed forms (generalised least squares, as in Searle, Casella & McCulloch,
    *Variance Components*, 1992, ch. 6: here ordinary least squares by QR after a part of each group's mean is taken
    off the data, which is that GLS), and the profiled log-likelihood
    −½[Σ log(1 + n_i θ) + d log(2π q(θ)/d) + d (+ log|A(θ)| under REML)], d = n (ML) or n − p (REML), q the
    generalised residual sum of squares and A = X'Ṽ⁻¹X, is maximised where its derivative in θ (in closed form)
    is zero: Brent's root to full precision, from the sign changes on a grid of θ from 10⁻⁸ to 10⁸ (the best
    of them; θ = 0, a group variance of zero, when none beats it). SEs of β are √diag(σ² A⁻¹), as R's nlme
    (and lme4) give them (statsmodels' bse_fe come from the observed information of all parameters together,
    up to a few per cent apart with three groups); the log-likelihood is nlme's and statsmodels'
    (tests/test_analyses_multilevel.py)."""
    import numpy as np
    import pandas as pd
    from scipy import linalg, optimize

    codes = pd.factorize(groups)[0]  # group labels of any types (codes as 1, 2 and text "x" in one column)
    n, p = X.shape
    counts = np.bincount(codes).astype(float)
    sums_x = np.stack([np.bincount(codes, X[:, j], len(counts)) for j in range(p)], axis=1)  # each group's column sums
    sums_y = np.bincount(codes, y, len(counts))
    mean_x, mean_y = (sums_x / counts[:, None])[codes], (sums_y / counts)[codes]
    d = n - p if reml else n

    def solved(theta: float) -> tuple["np.ndarray", "np.ndarray", float, "np.ndarray", "np.ndarray"]:
        """β, the triangular factor R of A = X'Ṽ⁻¹X, q, each group's 1/(1 + n_i θ) and its residuals' sum: least
        squares on the data with a part λ_i = 1 − 1/√(1 + n_i θ) of each group's mean taken off (Ṽ⁻¹ = T'T for
        that T), by QR, so that neither X'X nor y'y is formed (their large terms would cancel)."""
        shrink = 1.0 / (1.0 + counts * theta)
        part = (1.0 - np.sqrt(shrink))[codes]
        design = X - part[:, None] * mean_x
        Q, R = np.linalg.qr(design)
        z = y - part * mean_y
        beta = linalg.solve_triangular(R, Q.T @ z)
        r = z - design @ beta
        return beta, R, float(r @ r), shrink, sums_y - sums_x @ beta

    def loglik(theta: float) -> float:
        _, R, q, shrink, _ = solved(theta)
        value = -float(np.log(shrink).sum()) + d * math.log(2 * math.pi * q / d) + d
        return -0.5 * (value + (2.0 * float(np.log(np.abs(np.diag(R))).sum()) if reml else 0.0))

    if solved(0.0)[2] <= 1e-20 * float(((y - y.mean()) ** 2).sum()):  # no residual even without groups: nothing to split
        raise InputError("the fixed effects fit the outcome exactly, or its values are too small to square in double precision (no residual variance): there is no variance to split between groups")

    def slopes_at(thetas: "np.ndarray") -> list[float]:
        """The log-likelihood's derivative in θ at each of ``thetas``, their designs' QR as one batch: with β at its
        optimum (envelope), dq/dθ = −Σ (shrink_i · residual sum_i)² and, under REML, d log|A|/dθ = tr(A⁻¹ dA/dθ) =
        −‖R⁻ᵀ (shrink_i s_i)‖² (dA/dθ = −Σ shrink_i² s_i s_i')."""
        shrink = 1.0 / (1.0 + np.outer(thetas, counts))
        part = (1.0 - np.sqrt(shrink))[:, codes]
        design = X[None, :, :] - part[:, :, None] * mean_x[None, :, :]
        Q, R = np.linalg.qr(design)
        z = y[None, :] - part * mean_y[None, :]
        beta = np.linalg.solve(R, np.einsum("mnp,mn->mp", Q, z)[:, :, None])[:, :, 0]
        r = z - np.einsum("mnp,mp->mn", design, beta)
        q = np.einsum("mn,mn->m", r, r)
        if not (q > 0).all():
            raise InputError(_NO_RESIDUAL)
        dq = -(((shrink * (sums_y[None, :] - beta @ sums_x.T)) ** 2).sum(axis=1))
        g = (counts[None, :] * shrink).sum(axis=1) + d * dq / q
        if reml:
            g -= (np.linalg.solve(np.swapaxes(R, 1, 2), np.swapaxes(sums_x[None, :, :] * shrink[:, :, None], 1, 2)) ** 2).sum(axis=(1, 2))
        return (-0.5 * g).tolist()

    grid = [0.0, *np.logspace(-8, 8, 33).tolist()]
    slopes = slopes_at(np.array(grid))
    roots = [optimize.brentq(lambda t: slopes_at(np.array([t]))[0], a, b, xtol=1e-300, rtol=4 * np.finfo(float).eps, maxiter=200)
             for a, b, fa, fb in zip(grid, grid[1:], slopes, slopes[1:]) if fa > 0 >= fb]
    unsettled = slopes[-1] > 0  # still rising at θ = 10⁸: the residual variance is all but 0 within groups
    theta = max([0.0, *roots, *([grid[-1]] if unsettled else [])], key=loglik)
    problems = []
    if theta == 0.0:
        problems.append("the group variance is estimated at 0, on the boundary of its range: the groups add no variance beyond the residual")
    elif unsettled and theta == grid[-1]:
        problems.append("the variance ratio did not settle below 10⁸: the residual variance within groups is near 0")
    beta, R, q, _, _ = solved(theta)
    scale = q / d
    inverse = linalg.solve_triangular(R, np.eye(p))  # A⁻¹ = R⁻¹ R⁻ᵀ
    cov = scale * (inverse @ inverse.T)
    return _Fitted(beta, np.sqrt(np.diag(cov)), np.array([[theta * scale]]), scale, loglik(theta)), problems


def _information(fit, n: int, p: int, q: int, method: Method) -> tuple[float, float, float]:  # type: ignore[no-untyped-def]
    """log-likelihood, AIC and BIC as R's nlme counts them: k = p fixed + q(q + 1)/2 random + 1 residual parameters."""
    ll = float(fit.llf)
    k = p + q * (q + 1) // 2 + 1
    n_eff = n - p if method == "REML" else n
    return ll, -2 * ll + 2 * k, -2 * ll + k * math.log(n_eff)


def mixed_model(
    df: "pd.DataFrame",
    outcome: str,
    predictors: Sequence[str],
    group: str,
    *,
    random_slopes: Sequence[str] = (),
    method: Method = "REML",
    reference: Mapping[str, object] | None = None,
    level: float = 0.95,
    labels: Mapping[str, str] | None = None,
) -> list[Result]:
    """The model record, then one record per fixed effect (intercept first;
    a nominal predictor as indicators against its ``reference`` category, as
    in `linear_regression`)."""
    from scipy import stats

    if method not in ("REML", "ML"):
        raise InputError(f"method: {method!r} is not REML or ML")
    names = [outcome, *predictors, group, *[s for s in random_slopes if s not in predictors]]
    data, missing = c.listwise(df, list(dict.fromkeys(names)))
    if data[group].nunique() < 2:
        raise InputError(f"{group}: one group; a multilevel model needs several")
    fit, meta, coding, problems, p, q = _fit(data, outcome, predictors, group, random_slopes, method, reference)
    null, *_ = _fit(data, outcome, [], group, (), method)
    import numpy as np

    tau, sigma2 = float(np.asarray(null.cov_re)[0, 0]), float(null.scale)
    ll, aic, bic = _information(fit, len(data), p, q, method)
    cov_re = np.asarray(fit.cov_re)
    re_names = ["intercept", *random_slopes]
    components: dict[str, object] = {f"variance_{re_names[i]}": float(cov_re[i, i]) for i in range(q)}
    for i in range(q):
        for j in range(i + 1, q):
            components[f"correlation_{re_names[i]}_{re_names[j]}"] = float(cov_re[i, j] / math.sqrt(cov_re[i, i] * cov_re[j, j]))
    components["variance_residual"] = float(fit.scale)
    named = dict(labels or {})
    variables = (Variable(outcome, named.get(outcome, outcome), "outcome"), *(Variable(v, named.get(v, v), "predictor") for v in predictors),
                 Variable(group, named.get(group, group), "group"))
    groups = int(data[group].nunique())
    fitted_by = "statsmodels MixedLM" if random_slopes else "profiled likelihood, maximised exactly"
    notes = [Note("method", f"Linear mixed model by {method} ({fitted_by}): random intercept"
                            + (f" and slope(s) of {', '.join(named.get(s, s) for s in random_slopes)}" if random_slopes else "")
                            + f" for {named.get(group, group)} ({groups} groups)."), Z_NOTE]
    notes += [Note("caution", f"Fit warning: {w}") for w in dict.fromkeys(problems)]
    prov = c.provenance("statsetter.analyses.mixed_model", statsmodels=bool(random_slopes))
    model = Result(
        kind="mixed_model",
        n=len(data),
        effects=(EffectSize("ICC", tau / (tau + sigma2), method="intercept-only model: τ₀₀ / (τ₀₀ + σ²)"),),
        variables=variables,
        notes=c.notes(*notes, *coding, missing),  # type: ignore[arg-type]
        details={"method": method, "groups": groups, "log_likelihood": ll, "aic": aic, "bic": bic, **components},
        provenance=prov,
    )
    out = [model]
    crit = float(stats.norm.ppf(0.5 + level / 2))
    for i, (term, source, category, ref) in enumerate([("Intercept", "Intercept", None, None), *meta]):
        b, se = float(np.asarray(fit.fe_params)[i]), float(np.asarray(fit.bse_fe)[i])
        z = b / se
        shown = named.get(source, source)
        details: dict[str, object] = {"term": term, "intercept": i == 0, "adjusted": len(meta) > 1, "multilevel": True}
        if category is not None:
            details.update(category=category, reference_category=ref)
            shown = f"{shown} = {category}"
        out.append(Result(
            kind="linear_coefficient",
            statistic=Statistic("z", z),
            p=float(2 * stats.norm.sf(abs(z))),
            n=len(data),
            estimate=Estimate("B", b, se=se, ci=Interval(level, b - crit * se, b + crit * se)),
            variables=(Variable(outcome, named.get(outcome, outcome), "outcome"), Variable(source, shown, "predictor")),
            notes=c.notes(Z_NOTE, missing),
            details=details,
            provenance=prov,
        ))
    return out


def compare_models(
    df: "pd.DataFrame",
    outcome: str,
    reduced: Sequence[str],
    full: Sequence[str],
    group: str,
    *,
    random_slopes: Sequence[str] = (),
    labels: Mapping[str, str] | None = None,
) -> Result:
    """The likelihood-ratio test of nested models, both fitted by ML on the
    same complete rows: χ² = 2(LL_full − LL_reduced) on the difference in
    parameters; AIC and BIC of both in the details."""
    from scipy import stats

    if not set(reduced) < set(full):
        raise InputError("reduced: its predictors must be a proper subset of full's (nested models)")
    names = [outcome, *full, group, *[s for s in random_slopes if s not in full]]
    data, missing = c.listwise(df, list(dict.fromkeys(names)))
    small, _, _, _, p0, q = _fit(data, outcome, reduced, group, random_slopes, "ML")
    large, _, _, _, p1, _ = _fit(data, outcome, full, group, random_slopes, "ML")
    ll0, aic0, bic0 = _information(small, len(data), p0, q, "ML")
    ll1, aic1, bic1 = _information(large, len(data), p1, q, "ML")
    chi2 = max(2 * (ll1 - ll0), 0.0)
    dof = p1 - p0
    named = dict(labels or {})
    added = [v for v in full if v not in reduced]
    return Result(
        kind="model_comparison",
        statistic=Statistic("chi2", chi2, (float(dof),)),
        p=float(stats.chi2.sf(chi2, dof)),
        n=len(data),
        variables=(Variable(outcome, named.get(outcome, outcome), "outcome"), *(Variable(v, named.get(v, v), "predictor") for v in added)),
        notes=c.notes(Note("method", "Likelihood-ratio test of nested linear mixed models, both fitted by ML (REML likelihoods of models with "
                                     "different fixed effects are not comparable)."), missing),
        details={"added": ", ".join(named.get(v, v) for v in added), "aic_reduced": aic0, "aic_full": aic1, "bic_reduced": bic0, "bic_full": bic1,
                 "log_likelihood_reduced": ll0, "log_likelihood_full": ll1},
        provenance=c.provenance("statsetter.analyses.compare_models", statsmodels=bool(random_slopes)),
    )
