"""Linear (OLS) and logistic regression, with dummy coding stated, via statsmodels."""

from __future__ import annotations

import math
import warnings
from typing import TYPE_CHECKING, Mapping, Sequence

from ..coding import categories, category_text, factor, find_category, joined
from ..errors import InputError
from ..records import EffectSize, Estimate, Interval, Note, Result, Statistic, Variable
from ..formulas import variance_explained_ci
from . import _common as c
from .effects import NCF_METHOD, variance_explained

if TYPE_CHECKING:
    import pandas as pd


def _design(data: "pd.DataFrame", predictors: Sequence[str], reference: Mapping[str, object], levels: Mapping[str, str] | None = None):  # type: ignore[no-untyped-def]
    """The design matrix (with a constant). A predictor that is nominal — a
    pandas categorical, text, or declared nominal in ``levels`` — enters as
    k − 1 indicators against a reference category (the one given, by label or
    code, else the first in code order); an ordinal predictor enters as its
    numeric scores (an ordered categorical as 1…k), which is an automatic
    choice and said so; other numeric predictors enter as they are. Returns
    the matrix, a list of (column, predictor, level, reference) and notes."""
    import numpy as np
    import pandas as pd

    levels = levels or {}
    cols: dict[str, np.ndarray] = {"const": np.ones(len(data))}
    meta: list[tuple[str, str, object | None, object | None]] = []
    notes: list[Note] = []
    for p in predictors:
        s = data[p]
        declared = levels.get(p)
        categorical = isinstance(s.dtype, pd.CategoricalDtype)
        ordered = categorical and bool(s.dtype.ordered)
        numeric = pd.api.types.is_numeric_dtype(s) and not pd.api.types.is_bool_dtype(s) and not categorical
        if declared == "ordinal" or (ordered and declared is None):
            if ordered or categorical:
                s = pd.Series(s.cat.codes.astype(float) + 1, index=s.index, name=p)
                how = f"scored 1–{len(data[p].cat.categories)} in category order"
            elif not numeric:
                raise InputError(f"{p}: declared ordinal but its values are text; give it codes or declare it nominal")
            else:
                how = "its codes as numbers"
            notes.append(Note("choice", f"{p} is ordinal: entered as one numeric term ({how}), a linear trend across its categories; "
                                        f"declare it nominal (levels = {{{p} = \"nominal\"}}) to enter it as categories."))
            numeric = True
        elif declared == "nominal" or categorical:
            numeric = False
            if not categorical:
                s = factor(s)
        if numeric:
            if s.nunique() < 2:
                value = s.dropna().iloc[0]  # (the rows are complete: listwise)
                shown = f"{value:g}" if isinstance(value, (int, float)) else value
                raise InputError(f"{p}: constant predictor (every value is {shown}); it cannot be estimated")
            cols[p] = s.to_numpy(dtype=float)
            meta.append((p, p, None, None))
            continue
        present = categories(s)
        if len(present) < 2:
            raise InputError(f"{p}: constant predictor (one level, {category_text(present[0])!r}); it cannot be estimated")
        ref = find_category(p, reference[p], present, role="reference category") if p in reference else present[0]
        for lev in present:
            if lev == ref:
                continue
            name = f"{p}[{category_text(lev)}]"
            cols[name] = (s == lev).to_numpy(dtype=float)
            meta.append((name, p, category_text(lev), category_text(ref)))
        how = "given" if p in reference else "the first in code order" if categorical or declared else "the first in sorted order"
        notes.append(Note("method", f"{p} entered as {len(present) - 1} indicator terms (dummy coding); reference category {category_text(ref)} ({how})."))
    X = pd.DataFrame(cols, index=data.index)
    rank = np.linalg.matrix_rank(X.to_numpy())
    if rank < X.shape[1]:
        # name the first column that adds nothing to the ones before it
        for j in range(2, X.shape[1] + 1):
            if np.linalg.matrix_rank(X.iloc[:, :j].to_numpy()) < j:
                raise InputError(f"{X.columns[j - 1]}: perfectly collinear with the other predictors")
    return X, meta, notes


def _check_names(predictors: Sequence[str], reference: Mapping[str, object] | None, levels: Mapping[str, str] | None) -> None:
    from ..levels import check_level

    for p in reference or {}:
        if p not in predictors:
            raise InputError(f"{p}: a reference category is given, but {p} is not a predictor")
    for p, lev in (levels or {}).items():
        check_level(p, lev)


def _labels(names: Sequence[str], labels: Mapping[str, str] | None) -> str:
    labels = labels or {}
    return joined([labels.get(n, n) for n in names])


def _terms(fit, level: float) -> dict[str, tuple[float, float, float, float, float, float]]:  # type: ignore[no-untyped-def]
    """Each term's B, SE, t (or z), p and CI limits as floats, read from the fit once (each attribute of a statsmodels
    fit is wrapped into a new pandas Series on every access)."""
    ci = fit.conf_int(1 - level)
    rows = zip(fit.params.index, fit.params.to_numpy(), fit.bse.to_numpy(), fit.tvalues.to_numpy(), fit.pvalues.to_numpy(),
               ci.iloc[:, 0].to_numpy(), ci.iloc[:, 1].to_numpy())
    return {str(name): (float(b), float(se), float(t), float(p), float(lo), float(hi)) for name, b, se, t, p, lo, hi in rows}


def _intercept(kind: str, fit, name: str, level: float, outcome: Variable, prov, terms, **extra) -> Result:  # type: ignore[no-untyped-def]
    """The constant of a fitted model as a coefficient record (B, SE, CI, t or
    z, p; no β): the predicted outcome where every predictor is 0, or at
    the reference categories."""
    b, se, t, p, lo, hi = terms[name]
    return Result(
        kind=kind,
        statistic=Statistic("t", t, (float(fit.df_resid),)) if kind == "linear_coefficient" else Statistic("z", t),
        p=p,
        n=int(fit.nobs),
        estimate=Estimate("B", b, se=se, ci=Interval(level, lo, hi)),
        variables=(outcome,),
        details={"term": "Intercept", "intercept": True, **extra},
        provenance=prov,
    )


def _ols_records(fit, X, y, meta, predictors, outcome: str, labels: Mapping[str, str], level: float, variance_level: float,
                 notes: Sequence[Note | None], prov, step: int | None = None) -> list[Result]:  # type: ignore[no-untyped-def]
    """The model record, the intercept, then one record per coefficient."""
    terms = _terms(fit, level)
    df_resid = float(fit.df_resid)
    sd_y = float(y.std(ddof=1))
    at = {"step": step} if step is not None else {}
    outcome_var = Variable(outcome, labels.get(outcome, outcome), "outcome")
    model = Result(
        kind="linear_model",
        statistic=Statistic("F", float(fit.fvalue), (float(fit.df_model), float(fit.df_resid))),
        p=float(fit.f_pvalue),
        n=int(fit.nobs),
        effects=(variance_explained("R2", float(fit.rsquared), float(fit.fvalue), float(fit.df_model), float(fit.df_resid), variance_level),
                 EffectSize("R2_adj", float(fit.rsquared_adj))),
        variables=(outcome_var,) + tuple(Variable(p, labels.get(p, p), "predictor") for p in predictors),
        notes=c.notes(*notes),
        details={"predictors": _labels(predictors, labels), **at},
        provenance=prov,
    )
    out = [model, _intercept("linear_coefficient", fit, "const", level, outcome_var, prov, terms, **at)]
    for name, pred, lev, ref in meta:
        sd_x = float(X[name].std(ddof=1))
        b, se, t, p, lo, hi = terms[name]
        out.append(
            Result(
                kind="linear_coefficient",
                statistic=Statistic("t", t, (df_resid,)),
                p=p,
                n=int(fit.nobs),
                estimate=Estimate("B", b, se=se, ci=Interval(level, lo, hi)),
                effects=(EffectSize("beta", b * sd_x / sd_y, method="B·SD(x)/SD(y)"),),
                variables=(
                    Variable(pred, labels.get(pred, pred) if lev is None else f"{labels.get(pred, pred)} = {lev}", "predictor"),
                    outcome_var,
                ),
                details={"term": name, "adjusted": len(meta) > 1, **at,
                         **({"reference": f"{labels.get(pred, pred)} = {ref}", "category": f"{lev}", "reference_category": f"{ref}"} if ref is not None else {})},
                provenance=prov,
            )
        )
    return out


def linear_regression(
    df: "pd.DataFrame",
    outcome: str,
    predictors: Sequence[str],
    *,
    reference: Mapping[str, object] | None = None,
    levels: Mapping[str, str] | None = None,
    level: float = 0.95,
    variance_level: float | None = None,
    labels: Mapping[str, str] | None = None,
) -> list[Result]:
    """OLS of ``outcome`` on ``predictors``: the model record first (R² with
    its noncentral-F interval at ``variance_level``, default ``level``), the
    intercept, then one record per coefficient (B, SE, CI, t, p, and
    β = B·SD(x)/SD(y))."""
    from statsmodels.regression.linear_model import OLS

    if not predictors:
        raise InputError("predictors: at least one is needed")
    data, missing = c.listwise(df, [outcome, *predictors])
    y = c.numeric(data, outcome)
    if y.nunique() < 2:
        raise InputError(f"{outcome}: zero variance; a regression is undefined")
    _check_names(predictors, reference, levels)
    X, meta, coding = _design(data, predictors, reference or {}, levels)
    if len(data) <= X.shape[1]:
        raise InputError(f"{outcome}: {len(data)} complete rows for {X.shape[1]} coefficients")
    fit = OLS(y.to_numpy(), X).fit()
    prov = c.provenance("statsetter.analyses.linear_regression", statsmodels=True)
    return _ols_records(fit, X, y, meta, predictors, outcome, labels or {}, level, variance_level or level, [*coding, missing], prov)


def hierarchical_steps(
    df: "pd.DataFrame",
    outcome: str,
    steps: Sequence[Sequence[str]],
    *,
    reference: Mapping[str, object] | None = None,
    levels: Mapping[str, str] | None = None,
    level: float = 0.95,
    variance_level: float | None = None,
    labels: Mapping[str, str] | None = None,
) -> list[Result]:
    """Models entered in steps, all on the same complete rows: first one
    record per step after the first (ΔR² with its interval, and the F test of
    the change), then each step's model, intercept and coefficients
    (``details.step``), for a table of the models side by side. The ΔR²
    interval is the noncentral-F interval of the added block's partial
    effect, times 1 − R² of the step before (which it treats as fixed)."""
    from statsmodels.regression.linear_model import OLS
    from scipy import stats

    if len(steps) < 2:
        raise InputError("steps: a hierarchical regression needs at least two steps")
    everything = [p for step in steps for p in step]
    _check_names(everything, reference, levels)
    data, missing = c.listwise(df, [outcome, *everything])
    y = c.numeric(data, outcome)
    if y.nunique() < 2:
        raise InputError(f"{outcome}: zero variance; a regression is undefined")
    labels = labels or {}
    variance_level = variance_level or level
    changes: list[Result] = []
    models: list[Result] = []
    previous = None
    used: list[str] = []
    prov = c.provenance("statsetter.analyses.hierarchical_steps", statsmodels=True)
    for i, step in enumerate(steps, 1):
        used = used + list(step)
        X, meta, coding = _design(data, used, {k: v for k, v in (reference or {}).items() if k in used}, levels)
        if len(data) <= X.shape[1]:
            raise InputError(f"{outcome}: {len(data)} complete rows for {X.shape[1]} coefficients at step {i}")
        fit = OLS(y.to_numpy(), X).fit()
        models += _ols_records(fit, X, y, meta, used, outcome, labels, level, variance_level, [*coding, missing] if i == len(steps) else [], prov, step=i)
        if previous is not None:
            dk = fit.df_model - previous.df_model
            dr2 = fit.rsquared - previous.rsquared
            f = (dr2 / dk) / ((1 - fit.rsquared) / fit.df_resid)
            p = float(stats.f.sf(f, dk, fit.df_resid))
            low, high = variance_explained_ci(float(f), float(dk), float(fit.df_resid), variance_level)
            scale = 1 - previous.rsquared
            changes.append(
                Result(
                    kind="linear_step",
                    statistic=Statistic("F_change", float(f), (float(dk), float(fit.df_resid))),
                    p=p,
                    n=int(fit.nobs),
                    effects=(EffectSize("delta_R2", float(dr2), Interval(variance_level, low * scale, high * scale),
                                        method=f"{NCF_METHOD} of the added block's partial effect, times 1 − R² of step {i - 1}"),
                             EffectSize("R2", float(fit.rsquared))),
                    variables=(Variable(outcome, labels.get(outcome, outcome), "outcome"),),
                    notes=c.notes(missing),
                    details={"step": i, "added": _labels(step, labels)},
                    provenance=prov,
                )
            )
        previous = fit
    return changes + models


def logistic_regression(
    df: "pd.DataFrame",
    outcome: str,
    predictors: Sequence[str],
    *,
    event: object | None = None,
    reference: Mapping[str, object] | None = None,
    levels: Mapping[str, str] | None = None,
    level: float = 0.95,
    labels: Mapping[str, str] | None = None,
) -> list[Result]:
    """Logistic regression of a binary ``outcome`` (``event`` is the level
    coded 1; by default the second in sorted order): the model (likelihood-
    ratio χ², Nagelkerke R²) and one record per coefficient (B, SE, OR with
    its CI, Wald z, p)."""
    import numpy as np
    from statsmodels.discrete.discrete_model import Logit

    data, missing = c.listwise(df, [outcome, *predictors])
    present = categories(data[outcome])
    if len(present) != 2:
        raise InputError(f"{outcome}: {len(present)} distinct values; a logistic regression needs a binary outcome")
    event = present[1] if event is None else find_category(outcome, event, present, role="event")
    y = (data[outcome] == event).to_numpy(dtype=float)
    event = category_text(event)
    _check_names(predictors, reference, levels)
    X, meta, coding = _design(data, predictors, reference or {}, levels)
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        try:
            fit = Logit(y, X).fit(disp=False, maxiter=200)
        except Exception as exc:  # statsmodels signals separation by a warning or an error
            if "separation" in str(exc).lower() or "singular" in str(exc).lower() or "overflow" in str(exc).lower():
                raise InputError(f"{outcome}: perfect separation by {', '.join(predictors)}; the odds ratios are infinite") from None
            raise InputError(f"{outcome}: the logistic model did not converge ({exc})") from None
    if not fit.mle_retvals.get("converged", True) or np.any(np.abs(fit.params[1:]) > 30):
        raise InputError(f"{outcome}: perfect (or quasi-) separation by {', '.join(predictors)}; the model did not converge")
    n = int(fit.nobs)
    ll0, ll1 = float(fit.llnull), float(fit.llf)
    cox_snell = 1 - math.exp((2 / n) * (ll0 - ll1))
    nagelkerke = cox_snell / (1 - math.exp((2 / n) * ll0))
    terms = _terms(fit, level)
    labels = labels or {}
    prov = c.provenance("statsetter.analyses.logistic_regression", statsmodels=True)
    out = [
        Result(
            kind="logistic_model",
            statistic=Statistic("chi2", float(fit.llr), (float(fit.df_model),)),
            p=float(fit.llr_pvalue),
            n=n,
            effects=(EffectSize("R2_nagelkerke", nagelkerke, method="Nagelkerke (1991)"), EffectSize("R2_mcfadden", 1 - ll1 / ll0, method="McFadden (1974): 1 − ln L / ln L0")),
            variables=(Variable(outcome, labels.get(outcome, outcome), "outcome"),),
            notes=c.notes(Note("method", f"{outcome} = {event} coded 1."), *coding, missing),
            details={"predictors": _labels(predictors, labels), "event": f"{event}"},
            provenance=prov,
        )
    ]
    out.append(_intercept("logistic_coefficient", fit, "const", level, out[0].variables[0], prov, terms, event=f"{event}"))
    for name, pred, lev, ref in meta:
        b, se, z, p, lo, hi = terms[name]
        out.append(
            Result(
                kind="logistic_coefficient",
                statistic=Statistic("z", z),
                p=p,
                n=n,
                estimate=Estimate("B", b, se=se, ci=Interval(level, lo, hi)),
                effects=(EffectSize("OR", math.exp(b), Interval(level, math.exp(lo), math.exp(hi)), ratio=True),),
                variables=(
                    Variable(pred, labels.get(pred, pred) if lev is None else f"{labels.get(pred, pred)} = {lev}", "predictor"),
                    Variable(outcome, labels.get(outcome, outcome), "outcome"),
                ),
                details={"term": name, "event": f"{event}", "adjusted": len(meta) > 1,
                         **({"reference": f"{labels.get(pred, pred)} = {ref}", "category": f"{lev}", "reference_category": f"{ref}"} if ref is not None else {})},
                provenance=prov,
            )
        )
    return out
