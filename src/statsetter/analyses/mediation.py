"""Simple mediation (one mediator): the paths a (X → M), b (M → Y given X),
c (X → Y, total) and c′ (X → Y given M) by OLS, and the indirect effect a·b
with a percentile bootstrap CI (Efron & Tibshirani, 1993; Preacher & Hayes,
2008), seeded and with the number of resamples stated; bias-corrected
limits on request. The proportion mediated is given only as a detail with a
caution. Every record carries a caution: mediation analysis of
observational data cannot establish causal order.
"""

from __future__ import annotations

from typing import TYPE_CHECKING, Mapping, Sequence

from ..errors import InputError
from ..records import Estimate, Interval, Note, Result, Statistic, Variable
from . import _common as c

if TYPE_CHECKING:
    import numpy as np
    import pandas as pd

DEFAULT_RESAMPLES = 5000
DEFAULT_SEED = 20240601  # any fixed seed: results can be reproduced; say it in the methods
CAUTION = ("Mediation analysis estimates how an association would decompose under a causal order the design must justify; "
           "with observational or cross-sectional data it cannot establish that order (no unmeasured confounding is assumed).")


def _ols(X: "np.ndarray", y: "np.ndarray") -> tuple["np.ndarray", "np.ndarray", float]:
    """Coefficients, their SEs and the residual df."""
    import numpy as np

    beta, *_ = np.linalg.lstsq(X, y, rcond=None)
    resid = y - X @ beta
    dfe = len(y) - X.shape[1]
    sigma2 = float(resid @ resid) / dfe
    try:
        cov = sigma2 * np.linalg.inv(X.T @ X)
    except np.linalg.LinAlgError:
        raise InputError("the predictors of a mediation model are collinear (one is a combination of the others); drop or combine them") from None
    return beta, np.sqrt(np.diag(cov)), float(dfe)


def _resampled(Xa: "np.ndarray", M: "np.ndarray", Xb: "np.ndarray", yb: "np.ndarray", k: int, n_boot: int, rng: "np.random.Generator") -> "np.ndarray":
    """a·b of each mediator in each resample of the rows (drawn as ``rng.integers(0, n, n)`` per resample, in order),
    by the normal equations of every resample at once: each resample is a vector of counts of the rows, so
    X'WX and X'Wy are the counts times the rows' cross-products (batches keep the memory bounded)."""
    import numpy as np

    n = len(yb)
    out = np.empty((n_boot, k))
    pa, pb = Xa.shape[1], Xb.shape[1]
    cross_a = (Xa[:, :, None] * Xa[:, None, :]).reshape(n, pa * pa)
    cross_b = (Xb[:, :, None] * Xb[:, None, :]).reshape(n, pb * pb)
    rhs_a, rhs_b = Xa[:, :, None] * M[:, None, :], Xb * yb[:, None]
    # batches of about 65,536 draws: their arrays stay in the processor's cache and reuse the allocator's memory (with
    # batches of 4 million, the fresh pages of each new array cost the kernel more than the arithmetic: the demo's 5,000
    # resamples of 240 rows took 31-56 ms in a first run, 19 ms so); the draws are the same whatever the batch
    chunk = max(1, min(n_boot, 65_536 // max(n, 1)))
    for start in range(0, n_boot, chunk):
        size = min(chunk, n_boot - start)
        rows = rng.integers(0, n, (size, n))
        counts = np.bincount((rows + (np.arange(size) * n)[:, None]).ravel(), minlength=size * n).reshape(size, n).astype(float)
        try:
            a = np.linalg.solve((counts @ cross_a).reshape(size, pa, pa), (counts @ rhs_a.reshape(n, -1)).reshape(size, pa, k))[:, 1, :]
            b = np.linalg.solve((counts @ cross_b).reshape(size, pb, pb), (counts @ rhs_b)[:, :, None])[:, 2:2 + k, 0]
        except np.linalg.LinAlgError:  # a resample drew too few distinct rows for its models (few rows to draw from)
            raise InputError(f"{n} complete rows: some bootstrap resamples repeat so few of them that a model has no unique fit; "
                             "the bootstrap needs more rows") from None
        out[start:start + size] = a * b
    return out


def mediation(
    df: "pd.DataFrame",
    x: str,
    mediator: str | Sequence[str],
    y: str,
    *,
    covariates: Sequence[str] = (),
    n_boot: int = DEFAULT_RESAMPLES,
    seed: int = DEFAULT_SEED,
    bias_corrected: bool = False,
    level: float = 0.95,
    labels: Mapping[str, str] | None = None,
) -> list[Result]:
    """Paths a, b, c and c′ (B, SE, t, p, CI; covariates in every model),
    then the indirect effect a·b with its bootstrap CI (``n_boot``
    resamples of the rows, ``seed``; percentile limits, or bias-corrected
    with ``bias_corrected``).

    Several mediators (a list) are parallel mediators (Preacher & Hayes,
    2008): a path a and b for each (b and c′ from one model of ``y`` on
    ``x`` and every mediator), a specific indirect effect a·b for each and
    the total indirect effect (their sum), all from the same resamples."""
    import numpy as np
    from scipy import stats

    if n_boot < 1000:
        raise InputError(f"n_boot: {n_boot} resamples are too few for a 95% interval's limits; use at least 1,000 (5,000 by default)")
    if n_boot > 1_000_000:  # (memory and minutes for digits no interval prints)
        raise InputError(f"n_boot: {n_boot:,} resamples are more than a bootstrap interval's printed digits need; use at most 1,000,000 (5,000 by default)")
    mediators = [mediator] if isinstance(mediator, str) else list(mediator)
    if not mediators:
        raise InputError("mediator: at least one is needed")
    names = [x, *mediators, y, *covariates]
    if len(set(names)) != len(names):
        raise InputError(f"{', '.join(names)}: a variable is named twice")
    data, missing = c.listwise(df, names)
    cols = {name: c.numeric(data, name).to_numpy(dtype=float) for name in names}
    n, k = len(data), len(mediators)
    if n < len(covariates) + k + 4:
        raise InputError(f"{n} complete rows: too few for the mediation models")
    for name in names:
        if np.ptp(cols[name]) == 0:
            raise InputError(f"{name}: every complete row has the same value ({cols[name][0]:g}); no path through it can be estimated")
    ones = np.ones(n)
    Z = [cols[v] for v in covariates]
    Xa = np.column_stack([ones, cols[x], *Z])
    Xb = np.column_stack([ones, cols[x], *[cols[m] for m in mediators], *Z])
    M, yb = np.column_stack([cols[m] for m in mediators]), cols[y]
    fits_a = [_ols(Xa, M[:, i]) for i in range(k)]
    b_coef, b_se, b_df = _ols(Xb, yb)
    c_coef, c_se, c_df = _ols(Xa, yb)
    held = " and ".join(mediators)
    paths = [("a", m, f"{x} → {m}", fits_a[i][0][1], fits_a[i][1][1], fits_a[i][2]) for i, m in enumerate(mediators)]
    paths += [("b", m, f"{m} → {y}, given {x}" + (" and the other mediators" if k > 1 else ""), b_coef[2 + i], b_se[2 + i], b_df)
              for i, m in enumerate(mediators)]
    paths += [("c", None, f"{x} → {y} (total)", c_coef[1], c_se[1], c_df), ("c′", None, f"{x} → {y}, given {held} (direct)", b_coef[1], b_se[1], b_df)]
    caution = Note("caution", CAUTION)
    binary = [m for m in mediators if len(np.unique(cols[m])) == 2]
    linear = Note("method", f"{', '.join(binary)} has two values; its path a is a linear probability model (OLS), as the indirect "
                            "effect a·b assumes; a logistic path a would give a·b on a different scale.") if binary else None
    prov = c.provenance("statsetter.analyses.mediation")

    def variables(focus: str | None) -> tuple[Variable, ...]:
        """The predictor, the mediator in focus (or every mediator) and the outcome."""
        named = dict(labels or {})
        return tuple(Variable(v, named.get(v, v), role) for v, role in
                     [(x, "predictor"), *[(m, "mediator") for m in ([focus] if focus else mediators)], (y, "outcome")])

    out = []
    for path, focus, what, est, se, dfe in paths:
        t = float(est / se)
        crit = float(stats.t.ppf(0.5 + level / 2, dfe))
        out.append(Result(
            kind="mediation_path",
            statistic=Statistic("t", t, (dfe,)),
            p=float(2 * stats.t.sf(abs(t), dfe)),
            n=n,
            estimate=Estimate("B", float(est), se=float(se), ci=Interval(level, float(est - crit * se), float(est + crit * se))),
            variables=variables(focus),
            notes=c.notes(caution, linear if focus in binary else None, missing),
            details={"path": path, "describes": what, **({"mediator": focus} if focus and k > 1 else {})},
            provenance=prov,
        ))
    a = np.array([f[0][1] for f in fits_a])
    effects = a * b_coef[2:2 + k]
    boot = _resampled(Xa, M, Xb, yb, k, n_boot, np.random.default_rng(seed))
    tail = (1 - level) / 2
    kind = "bias-corrected" if bias_corrected else "percentile"
    method = f"{kind} bootstrap, {n_boot:,} resamples, seed {seed}"
    total = float(c_coef[1])
    estimates = [(m, float(effects[i]), boot[:, i]) for i, m in enumerate(mediators)]
    if k > 1:
        estimates.append((None, float(effects.sum()), boot.sum(axis=1)))
    for focus, indirect, draws in estimates:
        if bias_corrected:
            z0 = float(stats.norm.ppf(np.mean(draws < indirect)))
            zc = float(stats.norm.ppf(1 - tail))
            qs = (float(stats.norm.cdf(2 * z0 - zc)), float(stats.norm.cdf(2 * z0 + zc)))
        else:
            qs = (tail, 1 - tail)
        low, high = (float(v) for v in np.quantile(draws, qs))
        details: dict[str, object] = {"path": "a·b" if focus or k == 1 else "total indirect", "n_boot": n_boot, "seed": seed, "method": method}
        if focus and k > 1:
            details["mediator"] = focus
        notes = [caution, Note("method", f"{'Indirect effect a·b' if focus or k == 1 else 'Total indirect effect (the sum of the specific a·b)'} "
                                         f"with a {method}; the CI, not a p value, is the test.")]
        if total != 0 and indirect / total > 0:
            details["proportion_mediated"] = indirect / total
            notes.append(Note("caution", "The proportion mediated (a·b / c) is unstable unless the total effect is large and is "
                                         "not a share of a causal effect unless the causal assumptions hold; report it with care."))
        out.append(Result(
            kind="mediation_indirect",
            n=n,
            estimate=Estimate("indirect effect", indirect, ci=Interval(level, low, high)),
            variables=variables(focus),
            notes=c.notes(*notes, missing),  # type: ignore[arg-type]
            details=details,
            provenance=prov,
        ))
    return out
