"""statsmodels results → records: OLS/WLS and Logit fits, anova_lm tables,
pairwise_tukeyhsd results, AnovaRM, MixedLM fits, and the mcnemar and
cochrans_q bunches (these do not say which function made them: pass
``source=``)."""

from __future__ import annotations

import math
import re
from typing import Any

from ..coding import joined
from ..errors import InputError
from ..records import EffectSize, Estimate, GroupSummary, Interval, Note, Result, Statistic, Variable
from ..analyses.effects import variance_explained
from ._core import Adapter, Context, absent, base, pair_key, term_key

LIB = "statsmodels"
_INTERCEPT = ("Intercept", "const")


def identify(obj: Any) -> str | None:
    module = type(obj).__module__ or ""
    cls = type(obj).__name__
    if module.startswith("statsmodels"):
        model = getattr(obj, "model", None)
        model_name = type(model).__name__ if model is not None else ""
        if model_name in ("OLS", "WLS"):
            return "statsmodels.OLS"
        if model_name == "Logit":
            return "statsmodels.Logit"
        if cls == "TukeyHSDResults":
            return "statsmodels.pairwise_tukeyhsd"
        if cls == "AnovaResults" and hasattr(obj, "anova_table"):
            return "statsmodels.AnovaRM"
        if model_name == "MixedLM":
            return "statsmodels.MixedLM"
        if cls == "_Bunch":
            raise InputError("a statsmodels bunch does not say which test made it; pass source='statsmodels.mcnemar' or 'statsmodels.cochrans_q'")
        return None
    try:
        import pandas as pd
    except ImportError:  # pragma: no cover
        return None
    if isinstance(obj, pd.DataFrame) and {"sum_sq", "df", "F", "PR(>F)"} <= set(map(str, obj.columns)):
        return "statsmodels.anova_lm"
    return None


def _base(ctx: Context, kind: str, notes: list[Note], **fields: Any) -> Result:
    return base(ctx, LIB, kind, notes, **{"n": None, **fields})  # statsmodels results carry their own n


def term_name(name: str) -> str:
    """``C(species)[T.Chinstrap]`` or ``species[T.Chinstrap]`` → ``species[Chinstrap]``;
    ``C(a):C(b)`` → ``a × b`` (statsetter's names)."""
    name = re.sub(r"C\(([^,)]+)(?:,[^)]*)?\)", r"\1", str(name))
    name = name.replace("[T.", "[")
    return " × ".join(name.split(":"))


def _level(ctx: Context) -> float:
    return ctx.level


_CATEGORY_TERM = re.compile(r"^(?:C\((?P<var>[^,()]+)(?P<opts>,.*)?\)|(?P<plain>[^\[\]]+))\[T\.(?P<level>.+)\]$")
_REFERENCE = re.compile(r"reference\s*=\s*['\"]?([^'\")]+)['\"]?")


def _names(res: Any, ctx: Context, names: list[str]) -> tuple[Variable | None, dict[str, tuple[Variable, dict[str, str]]]]:
    """The outcome and each term as variables, named from the fit (the
    formula's terms or ``exog_names``, ``endog_names``) and labelled by
    ``labels=``: a categorical term ``C(x)[T.b]`` becomes level b of x against
    x's reference category (the formula's ``reference=``, else the level no
    column names, in sorted order)."""
    labels = ctx.labels
    outcome_name = getattr(res.model, "endog_names", None)
    outcome_name = outcome_name if isinstance(outcome_name, str) and outcome_name not in ("y", "endog") else None
    outcome = labels.get("outcome") or (labels.get(outcome_name) if outcome_name else None)
    outcome_var = Variable(outcome_name or "outcome", outcome or outcome_name, "outcome") if (outcome or outcome_name) else None
    seen: dict[str, list[str]] = {}
    parsed = {}
    for name in names:
        m = _CATEGORY_TERM.match(str(name))
        if m:
            var = (m.group("var") or m.group("plain")).strip()
            seen.setdefault(var, []).append(m.group("level"))
            parsed[name] = (var, m.group("level"), m.group("opts") or "")
    out: dict[str, tuple[Variable, dict[str, str]]] = {}
    for name in names:
        if name in _INTERCEPT:
            continue
        if name in parsed:
            var, level, opts = parsed[name]
            ref = _REFERENCE.search(opts)
            reference = ref.group(1).strip() if ref else _missing_level(res, var, seen[var])
            label = labels.get(var, var)
            extra = {"category": level, **({"reference_category": reference, "reference": f"{label} = {reference}"} if reference else {})}
            out[name] = (Variable(var, f"{label} = {level}", "predictor"), extra)
        elif str(name) in labels or re.fullmatch(r"[A-Za-z_][\w.]*", str(name)):
            out[name] = (Variable(str(name), labels.get(str(name), str(name)), "predictor"), {})
    return outcome_var, out


def _missing_level(res: Any, var: str, levels: list[str]) -> str | None:
    """The level of ``var`` in the fit's data that no column names (the reference)."""
    frame = getattr(getattr(res.model, "data", None), "frame", None)
    if frame is None or var not in getattr(frame, "columns", ()):
        return None
    from ..coding import categories, category_text

    rest = [category_text(v) for v in categories(frame[var]) if category_text(v) not in levels]
    return rest[0] if len(rest) == 1 else None


def _predictors(terms: list[str], named: dict[str, tuple[Variable, dict[str, str]]], labels: Any) -> str:
    shown: list[str] = []
    for t in terms:
        v = named[t][0].name if t in named else term_name(t)
        text = labels.get(v, v)
        if text not in shown:
            shown.append(text)
    return joined(shown)


def ols(res: Any, ctx: Context) -> list[Result]:
    import numpy as np

    level = _level(ctx)
    ci = np.asarray(res.conf_int(alpha=1 - level))
    names = list(res.model.exog_names)
    terms = [n for n in names if n not in _INTERCEPT]
    n = int(res.nobs)
    weighted = type(res.model).__name__ == "WLS"
    outcome, named = _names(res, ctx, names)
    model = _base(ctx, "linear_model", [], statistic=Statistic("F", float(res.fvalue), (float(res.df_model), float(res.df_resid))),
                  p=float(res.f_pvalue), n=n, effects=(variance_explained("R2", float(res.rsquared), float(res.fvalue), float(res.df_model), float(res.df_resid), level),
                                                         EffectSize("R2_adj", float(res.rsquared_adj))),
                  details={"predictors": _predictors(terms, named, ctx.labels)}, variables=(outcome,) if outcome else ())
    out = [model]
    y = np.asarray(res.model.endog, dtype=float)
    X = np.asarray(res.model.exog, dtype=float)
    for j, name in enumerate(names):
        b = float(np.asarray(res.params)[j])
        effects: tuple[EffectSize, ...] = ()
        notes: list[Note] = []
        if name in _INTERCEPT:
            out.append(_base(ctx, "linear_coefficient", [], statistic=Statistic("t", float(np.asarray(res.tvalues)[j]), (float(res.df_resid),)),
                             p=float(np.asarray(res.pvalues)[j]), n=n,
                             estimate=Estimate("B", b, se=float(np.asarray(res.bse)[j]), ci=Interval(level, float(ci[j, 0]), float(ci[j, 1]))),
                             details={"term": "Intercept", "intercept": True}, variables=(outcome,) if outcome else ()))
            continue
        if weighted:
            notes.append(Note("missing", "β is not given for a weighted fit."))
        else:
            effects = (EffectSize("beta", b * float(X[:, j].std(ddof=1)) / float(y.std(ddof=1)), method="B·SD(x)/SD(y)"),)
        out.append(_base(ctx, "linear_coefficient", notes, statistic=Statistic("t", float(np.asarray(res.tvalues)[j]), (float(res.df_resid),)),
                         p=float(np.asarray(res.pvalues)[j]), n=n,
                         estimate=Estimate("B", b, se=float(np.asarray(res.bse)[j]), ci=Interval(level, float(ci[j, 0]), float(ci[j, 1]))),
                         effects=effects, details={"term": term_name(name), "adjusted": len(terms) > 1, **named.get(name, (None, {}))[1]},
                         variables=_coefficient_variables(named.get(name), outcome)))
    return out


def logit(res: Any, ctx: Context) -> list[Result]:
    import numpy as np

    level = _level(ctx)
    n = int(res.nobs)
    llf, llnull = float(res.llf), float(res.llnull)
    cox_snell = 1 - math.exp(2 * (llnull - llf) / n)
    nagelkerke = cox_snell / (1 - math.exp(2 * llnull / n))
    names = list(res.model.exog_names)
    terms = [t for t in names if t not in _INTERCEPT]
    outcome, named = _names(res, ctx, names)
    model = _base(ctx, "logistic_model", [], statistic=Statistic("chi2", float(res.llr), (float(res.df_model),)), p=float(res.llr_pvalue), n=n,
                  effects=(EffectSize("R2_nagelkerke", nagelkerke, method="Nagelkerke (1991)"), EffectSize("R2_mcfadden", float(res.prsquared), method="McFadden (1974): 1 − ln L / ln L0")), details={"predictors": _predictors(terms, named, ctx.labels)},
                  variables=(outcome,) if outcome else ())
    ci = np.asarray(res.conf_int(alpha=1 - level))
    out = [model]
    for j, name in enumerate(names):
        b = float(np.asarray(res.params)[j])
        low, high = float(ci[j, 0]), float(ci[j, 1])
        intercept = name in _INTERCEPT
        out.append(_base(ctx, "logistic_coefficient", [], statistic=Statistic("z", float(np.asarray(res.tvalues)[j])), p=float(np.asarray(res.pvalues)[j]), n=n,
                         estimate=Estimate("B", b, se=float(np.asarray(res.bse)[j]), ci=Interval(level, low, high)),
                         effects=() if intercept else (EffectSize("OR", math.exp(b), Interval(level, math.exp(low), math.exp(high)), ratio=True),),
                         details={"term": "Intercept", "intercept": True} if intercept else {"term": term_name(name), "adjusted": len(terms) > 1, **named.get(name, (None, {}))[1]},
                         variables=((outcome,) if outcome else ()) if intercept else _coefficient_variables(named.get(name), outcome)))
    return out


def _coefficient_variables(named: "tuple[Variable, dict[str, str]] | None", outcome: Variable | None) -> tuple[Variable, ...]:
    return tuple(v for v in ((named[0] if named else None), outcome) if v is not None)


def anova_lm(frame: Any, ctx: Context) -> list[Result]:
    rows = [str(i) for i in frame.index]
    if "Residual" not in rows:
        raise InputError("statsmodels.anova_lm: no Residual row; pass the table anova_lm returned")
    typ = 1 if "mean_sq" in frame.columns else (3 if "Intercept" in rows else 2)
    residual = frame.loc["Residual"]
    ss_res, df_res = float(residual["sum_sq"]), float(residual["df"])
    terms = [r for r in rows if r not in ("Residual", "Intercept")]
    if len(terms) == 1 and typ != 3:
        row = frame.loc[terms[0]]
        ss_b, df_b = float(row["sum_sq"]), float(row["df"])
        ms_w = ss_res / df_res
        f = float(row["F"])
        effects = (variance_explained("eta2", ss_b / (ss_b + ss_res), f, df_b, df_res, ctx.level),
                   variance_explained("omega2", (ss_b - df_b * ms_w) / (ss_b + ss_res + ms_w), f, df_b, df_res, ctx.level, "Hays (1963); may be negative"))
        return [_base(ctx, "anova_oneway", [absent(ctx, ["group summaries", "N"])], statistic=Statistic("F", f, (df_b, df_res)),
                      p=float(row["PR(>F)"]), effects=effects, n=int(df_b + df_res + 1), details={"variant": "classic", "ss": ss_b, "ss_error": ss_res, "df_error": df_res})]
    if typ == 1:
        raise InputError("statsmodels.anova_lm: a sequential (type I) table; statsetter reports type II or III sums of squares (typ=2 or typ=3)")
    out = []
    for term in terms:
        row = frame.loc[term]
        ss = float(row["sum_sq"])
        name = term_name(term)
        out.append(_base(ctx, "anova_term", [Note("method", f"Type {'II' if typ == 2 else 'III'} sums of squares, as the table's rows show.")],
                         statistic=Statistic("F", float(row["F"]), (float(row["df"]), df_res)), p=float(row["PR(>F)"]),
                         effects=(variance_explained("eta2_p", ss / (ss + ss_res), float(row["F"]), float(row["df"]), df_res, ctx.level),),
                         details={"term": name, "interaction": "×" in name, "ss_type": typ, "ss": ss, "ss_error": ss_res}))
    return out


def tukeyhsd(res: Any, ctx: Context) -> list[Result]:
    import numpy as np

    labels = [str(g) for g in res.groupsunique]
    pairs = [(i, j) for i in range(len(labels)) for j in range(i + 1, len(labels))]
    level = 1 - float(res._multicomp.alpha) if hasattr(res, "_multicomp") and hasattr(res._multicomp, "alpha") else ctx.level
    ci = np.asarray(res.confint)
    out = []
    for (i, j), diff, (low, high), p in zip(pairs, np.asarray(res.meandiffs), ci, np.asarray(res.pvalues)):
        a, b = (i, j) if labels[i] <= labels[j] else (j, i)
        sign = 1.0 if (a, b) == (j, i) else -1.0  # statsmodels reports mean_j − mean_i; statsetter first − second
        d, lo, hi = sign * float(diff), *sorted((sign * float(low), sign * float(high)))
        out.append(_base(ctx, "posthoc_pair", [absent(ctx, ["group n, M and SD"])], p=float(min(max(p, 0.0), 1.0)),
                         estimate=Estimate("mean difference", d, ci=Interval(level, lo, hi)), groups=(GroupSummary(labels[a]), GroupSummary(labels[b])),
                         details={"procedure": "Tukey HSD", "comparisons": len(pairs)}))
    return out


def anova_rm(res: Any, ctx: Context) -> list[Result]:
    """AnovaRM's table: uncorrected F tests (statsmodels gives no sphericity test or correction: said)."""
    table = res.anova_table
    note = Note("method", "statsmodels' AnovaRM: uncorrected F; it gives no sphericity test or correction (pass the data to add them).")
    rows = [(term_name(str(name)), row) for name, row in table.iterrows()]
    out = []
    for name, row in rows:
        df1, df2 = float(row["Num DF"]), float(row["Den DF"])
        statistic = Statistic("F", float(row["F Value"]), (df1, df2))
        details: dict[str, Any] = {"correction": "no sphericity correction", "df1_uncorrected": df1, "df2_uncorrected": df2}
        if len(rows) == 1:
            out.append(_base(ctx, "anova_rm", [note], statistic=statistic, p=float(row["Pr > F"]), details={"k": int(df1) + 1, **details}))
        else:
            out.append(_base(ctx, "anova_term", [note], statistic=statistic, p=float(row["Pr > F"]),
                             details={"term": name, "interaction": "×" in name, **details}))
    return out


def mixed_lm(res: Any, ctx: Context) -> list[Result]:
    """A MixedLM fit: the model (method, groups, log-likelihood, AIC and BIC as R's nlme counts the parameters, variance
    components) and each fixed effect with its z test and Wald CI. The ICC needs the intercept-only model: pass the data."""
    import numpy as np
    from scipy import stats

    from ..analyses.multilevel import Z_NOTE

    method = "REML" if getattr(res, "method", "REML") == "REML" else "ML"
    names = list(res.model.exog_names)
    p, q = len(names), int(np.asarray(res.cov_re).shape[0])
    n = int(res.nobs)
    ll = float(res.llf)
    k = p + q * (q + 1) // 2 + 1
    aic, bic = -2 * ll + 2 * k, -2 * ll + k * math.log(n - p if method == "REML" else n)
    cov_re = np.asarray(res.cov_re)
    re_names = ["intercept", *[term_name(str(v)) for v in list(getattr(res.cov_re, "index", range(q)))[1:]]]  # statsmodels calls the intercept "Group"
    components: dict[str, Any] = {f"variance_{re_names[i]}": float(cov_re[i, i]) for i in range(q)}
    for i in range(q):
        for j in range(i + 1, q):
            components[f"correlation_{re_names[i]}_{re_names[j]}"] = float(cov_re[i, j] / math.sqrt(cov_re[i, i] * cov_re[j, j]))
    components["variance_residual"] = float(res.scale)
    outcome, named = _names(res, ctx, names)
    model = _base(ctx, "mixed_model", [Note("method", f"Linear mixed model by {method} (statsmodels MixedLM)."), Z_NOTE, absent(ctx, ["the ICC"])],
                  n=n, details={"method": method, "groups": len(res.model.group_labels), "log_likelihood": ll, "aic": aic, "bic": bic, **components},
                  variables=(outcome,) if outcome else ())
    crit = float(stats.norm.ppf(0.5 + ctx.level / 2))
    out = [model]
    fe, se = np.asarray(res.fe_params), np.asarray(res.bse_fe)
    for j, name in enumerate(names):
        b, s_e = float(fe[j]), float(se[j])
        intercept = name in _INTERCEPT
        out.append(_base(ctx, "linear_coefficient", [Z_NOTE], statistic=Statistic("z", b / s_e), p=float(2 * stats.norm.sf(abs(b / s_e))), n=n,
                         estimate=Estimate("B", b, se=s_e, ci=Interval(ctx.level, b - crit * s_e, b + crit * s_e)),
                         details={"term": "Intercept", "intercept": True, "multilevel": True} if intercept else
                         {"term": term_name(name), "adjusted": p > 2, "multilevel": True, **named.get(name, (None, {}))[1]},
                         variables=((outcome,) if outcome else ()) if intercept else _coefficient_variables(named.get(name), outcome)))
    return out


def mcnemar(res: Any, ctx: Context) -> list[Result]:
    """statsmodels' mcnemar bunch. It does not record how it was computed: ``variant`` ("exact", "corrected" or
    "uncorrected", as its exact= and correction= were) is needed; for the exact test its statistic is min(b, c)."""
    variant = ctx.option("variant")
    if variant not in ("exact", "corrected", "uncorrected"):
        raise InputError("statsmodels.mcnemar: pass variant='exact', 'corrected' or 'uncorrected' (the result does not record exact= and correction=)")
    method = {"exact": "exact binomial test of the discordant pairs", "corrected": "chi-square with continuity correction",
              "uncorrected": "chi-square without continuity correction"}[variant]
    statistic = None if variant == "exact" else Statistic("chi2", float(res.statistic), (1,))
    return [_base(ctx, "mcnemar", [absent(ctx, ["n", "the discordant pairs and their odds ratio"])], statistic=statistic, p=float(res.pvalue),
                  details={"method": method, "variant": variant})]


def cochrans_q(res: Any, ctx: Context) -> list[Result]:
    return [_base(ctx, "cochran_q", [absent(ctx, ["n and the counts per measurement"])], statistic=Statistic("Q", float(res.statistic), (float(res.df),)),
                  p=float(res.pvalue))]


def _rm(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.repeated import rm_anova

    out = rm_anova(frame, outcome=cols["outcome"], subject=cols["subject"], within=cols["within"], correction="none", level=ctx.level, labels=ctx.labels)
    return out if isinstance(out, list) else [out]


def _mixed(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.multilevel import mixed_model

    return mixed_model(frame, cols["outcome"], cols.get("predictors", []), cols["group"], random_slopes=cols.get("random_slopes", ()),
                       method=mine[0].details["method"], reference=cols.get("reference"), level=ctx.level, labels=ctx.labels)


def _mcnemar(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.repeated import mcnemar as ours

    return [ours(frame, cols["first"], cols["second"], variant=ctx.option("variant"), level=ctx.level, labels=ctx.labels)]


def _cochran(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.repeated import cochran_q

    return [cochran_q(frame, cols["columns"], labels=ctx.labels)]


def _linear(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.regression import linear_regression

    return linear_regression(frame, cols["outcome"], cols["predictors"], reference=cols.get("reference"), level=ctx.level, labels=ctx.labels)


def _logistic(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.regression import logistic_regression

    return logistic_regression(frame, cols["outcome"], cols["predictors"], event=cols.get("event"), reference=cols.get("reference"), level=ctx.level, labels=ctx.labels)


def _anova(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.anova import anova_oneway
    from ..analyses.posthoc import factorial_anova

    if mine[0].kind == "anova_oneway":
        return [anova_oneway(frame, cols["outcome"], cols["group"], labels=ctx.labels)]
    return factorial_anova(frame, cols["outcome"], tuple(cols["factors"]), ss_type=int(mine[0].details["ss_type"]), labels=ctx.labels)  # type: ignore[arg-type]


def _tukey(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.posthoc import posthoc

    level = mine[0].estimate.ci.level if mine and mine[0].estimate and mine[0].estimate.ci else ctx.level
    return posthoc(frame, cols["outcome"], cols["group"], adjust="tukey", level=level, labels=ctx.labels)




ADAPTERS = {
    a.name: a
    for a in (
        Adapter("statsmodels.OLS", LIB, ols, None, _linear, term_key),
        Adapter("statsmodels.Logit", LIB, logit, None, _logistic, term_key),
        Adapter("statsmodels.anova_lm", LIB, anova_lm, None, _anova, term_key),
        Adapter("statsmodels.pairwise_tukeyhsd", LIB, tukeyhsd, "k", _tukey, pair_key),
        Adapter("statsmodels.AnovaRM", LIB, anova_rm, None, _rm, term_key),
        # statsmodels' optimiser stops short of the maximum statsetter computes exactly (coefficients up to 1e-5 apart) and its
        # SEs come from the observed information (z up to a few per cent from nlme's with three groups): B is compared
        Adapter("statsmodels.MixedLM", LIB, mixed_lm, None, _mixed, term_key, ("estimate", 1e-3)),
        Adapter("statsmodels.mcnemar", LIB, mcnemar, None, _mcnemar),
        Adapter("statsmodels.cochrans_q", LIB, cochrans_q, None, _cochran),
    )
}
