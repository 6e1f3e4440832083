"""scipy.stats result objects → records.

Several scipy functions return the same class (``TtestResult`` for the three t
tests, ``SignificanceResult`` for Spearman, Kendall and Fisher), so those need
``source=`` to say which function made them; nothing is guessed.
"""

from __future__ import annotations

import math
from typing import Any

from ..errors import InputError
from ..records import EffectSize, Estimate, GroupSummary, Interval, Note, Result, Statistic
from ..analyses.effects import variance_explained
from ._core import Adapter, Context, absent, base, integral, pair_key

LIB = "scipy"


def _base(ctx: Context, kind: str, notes: list[Note], **fields: Any) -> Result:
    return base(ctx, LIB, kind, notes, **fields)


def _alt(res: Any, ctx: Context) -> str:
    return str(getattr(res, "_alternative", None) or ctx.option("alternative", "two-sided"))


def _interval(ci: Any, level: float, shift: float = 0.0) -> Interval | None:
    low, high = float(ci.low) - shift, float(ci.high) - shift
    return Interval(level, low, high) if math.isfinite(low) and math.isfinite(high) else None


def _t_variant(df: float, ctx: Context) -> tuple[str, Note]:
    given = ctx.option("variant")
    if given is not None:
        if given not in ("welch", "student"):
            raise InputError(f"variant: {given!r} is not welch or student")
        return given, Note("method", f"{'Welch' if given == 'welch' else 'Student'}'s t test (as given).")
    if integral(df):
        return "student", Note("choice", "Student's t test (equal variances assumed), as the whole-number df shows; pass variant='welch' if it was Welch's.")
    return "welch", Note("choice", "Welch's t test (variances not assumed equal), as the fractional df shows.")


def ttest_ind(res: Any, ctx: Context) -> list[Result]:
    df = float(res.df)
    variant, choice = _t_variant(df, ctx)
    ci = _interval(res.confidence_interval(ctx.level), ctx.level)
    estimate = Estimate("mean difference", float(res._estimate), ci=ci) if hasattr(res, "_estimate") else None
    return [
        _base(ctx, "t_independent", [choice, absent(ctx, ["group n, M and SD", "d and g"])],
              statistic=Statistic("t", float(res.statistic), (df,)), p=float(res.pvalue), alternative=_alt(res, ctx),
              estimate=estimate, details={"variant": variant})
    ]


def ttest_rel(res: Any, ctx: Context) -> list[Result]:
    ci = _interval(res.confidence_interval(ctx.level), ctx.level)
    return [
        _base(ctx, "t_paired", [absent(ctx, ["the two means and SDs", "d"])],
              statistic=Statistic("t", float(res.statistic), (float(res.df),)), p=float(res.pvalue), alternative=_alt(res, ctx),
              estimate=Estimate("mean difference", float(res._estimate), ci=ci), n=ctx.n if ctx.n is not None else int(res.df) + 1)
    ]


def ttest_1samp(res: Any, ctx: Context) -> list[Result]:
    mu = ctx.option("mu")
    if mu is None:
        raise InputError("scipy.stats.ttest_1samp: the result does not keep the value tested against; pass mu=")
    mean, se = float(res._estimate), float(res._standard_error)
    if not math.isclose((mean - float(mu)) / se, float(res.statistic), rel_tol=1e-9, abs_tol=1e-12):
        raise InputError(f"mu = {mu}: the result's t ({float(res.statistic):.6g}) was not computed against this value")
    ci = _interval(res.confidence_interval(ctx.level), ctx.level, shift=float(mu))
    return [
        _base(ctx, "t_one_sample", [absent(ctx, ["SD", "d"])],
              statistic=Statistic("t", float(res.statistic), (float(res.df),)), p=float(res.pvalue), alternative=_alt(res, ctx),
              estimate=Estimate("mean difference", mean - float(mu), ci=ci), n=ctx.n if ctx.n is not None else int(res.df) + 1,
              details={"mu": float(mu)})
    ]


def _correlation(res: Any, ctx: Context, method: str, n: int | None) -> list[Result]:
    from ..analyses.correlation import SYMBOLS, correlation_effect

    value = float(res.statistic)
    effects: tuple[EffectSize, ...] = ()
    notes = []
    if n is not None:
        if method == "pearson" and hasattr(res, "confidence_interval"):
            ci = res.confidence_interval(ctx.level)
            effects = (EffectSize("r", value, Interval(ctx.level, float(ci.low), float(ci.high)), method="Fisher z"),)
        else:
            effects = (correlation_effect(method, value, n, ctx.level),)
            if method == "kendall":  # with samples= statsetter's own analysis runs and gives the CI
                notes.append(absent(ctx, ["the CI of τb (its SE depends on the ties in the data: pass samples=)"]))
    else:
        notes.append(absent(ctx, ["n (and so df and the CI)"]))
    df = (n - 2,) if n is not None and method != "kendall" else ()
    return [
        _base(ctx, method, notes, statistic=Statistic(SYMBOLS[method], value, df), p=float(res.pvalue),
              alternative=_alt(res, ctx), effects=effects, n=n)
    ]


def pearsonr(res: Any, ctx: Context) -> list[Result]:
    return _correlation(res, ctx, "pearson", int(res._n) if hasattr(res, "_n") else ctx.n)


def spearmanr(res: Any, ctx: Context) -> list[Result]:
    return _correlation(res, ctx, "spearman", ctx.n)


def kendalltau(res: Any, ctx: Context) -> list[Result]:
    return _correlation(res, ctx, "kendall", ctx.n)


def chi2_contingency(res: Any, ctx: Context) -> list[Result]:
    expected = res.expected_freq
    dof = int(res.dof)
    yates = ctx.option("yates")
    if dof == 1 and yates is None and not ctx.has_data:
        raise InputError("scipy.stats.chi2_contingency: for a 2 × 2 table scipy applies the Yates correction unless told not to; "
                         "pass yates=True or yates=False (or the observed table as samples=)")
    n = int(round(float(expected.sum())))
    notes = [Note("correction", "Yates' continuity correction applied." if yates else "No continuity correction.")] if yates is not None else []
    effects: tuple[EffectSize, ...] = ()
    if yates is False or dof > 1:
        k = min(expected.shape) - 1
        effects = (EffectSize("phi" if expected.shape == (2, 2) else "V", math.sqrt(float(res.statistic) / (n * k))),)
    notes.append(absent(ctx, ["the CI of the effect size", "the observed counts"]))
    return [
        _base(ctx, "chi2_independence", notes, statistic=Statistic("chi2", float(res.statistic), (dof,)), p=float(res.pvalue),
              n=n, effects=effects, details={"rows": expected.shape[0], "columns": expected.shape[1], **({} if yates is None else {"yates": bool(yates)})})
    ]


def fisher_exact(res: Any, ctx: Context) -> list[Result]:
    sample_or = float(res.statistic)
    if ctx.has_data:  # the data give the conditional OR and its exact CI, as statsetter's analysis reports
        return [_base(ctx, "fisher_exact", [], p=float(res.pvalue), details={"sample_odds_ratio": sample_or})]
    notes = [Note("method", "The sample odds ratio ad/bc, as scipy reports it; no CI."), absent(ctx, ["the CI of the odds ratio"])]
    estimate = Estimate("OR", sample_or, ratio=True) if math.isfinite(sample_or) and sample_or > 0 else None
    return [_base(ctx, "fisher_exact", notes, p=float(res.pvalue), estimate=estimate)]


def f_oneway(res: Any, ctx: Context) -> list[Result]:
    df = ctx.option("df")
    parts = (["df"] if df is None else []) + ["group summaries", "η² and ω²"]
    return [
        _base(ctx, "anova_oneway", [absent(ctx, parts)],
              statistic=Statistic("F", float(res.statistic), tuple(df or ())), p=float(res.pvalue), details={"variant": "classic"})
    ]


def tukey_hsd(res: Any, ctx: Context) -> list[Result]:
    k = res.statistic.shape[0]
    labels = [str(g) for g in ctx.groups] if ctx.groups else [str(i + 1) for i in range(k)]
    if len(labels) != k:
        raise InputError(f"groups: {len(labels)} label(s) for {k} samples")
    ci = res.confidence_interval(ctx.level)
    out = []
    for i in range(k):
        for j in range(i + 1, k):
            a, b = (i, j) if labels[i] <= labels[j] else (j, i)  # statsetter orders each pair by label
            out.append(
                _base(ctx, "posthoc_pair", [absent(ctx, ["group n, M and SD"])], p=float(res.pvalue[a, b]),
                      estimate=Estimate("mean difference", float(res.statistic[a, b]), ci=Interval(ctx.level, float(ci.low[a, b]), float(ci.high[a, b]))),
                      groups=(GroupSummary(labels[a]), GroupSummary(labels[b])), n=None,
                      details={"procedure": "Tukey HSD", "comparisons": k * (k - 1) // 2})
            )
    return out


def mannwhitneyu(res: Any, ctx: Context) -> list[Result]:
    return [_base(ctx, "mann_whitney", [absent(ctx, ["group n and medians", "the rank-biserial r", "exact or approximate p"])],
                  statistic=Statistic("U", float(res.statistic)), p=float(res.pvalue), alternative=ctx.option("alternative", "two-sided"))]


def wilcoxon(res: Any, ctx: Context) -> list[Result]:
    return [_base(ctx, "wilcoxon", [absent(ctx, ["n and medians", "the matched-pairs rank-biserial r", "exact or approximate p"])],
                  statistic=Statistic("T", float(res.statistic)), p=float(res.pvalue), alternative=ctx.option("alternative", "two-sided"))]


def kruskal(res: Any, ctx: Context) -> list[Result]:
    return [_base(ctx, "kruskal_wallis", [absent(ctx, ["df", "group n and medians", "ε²"])], statistic=Statistic("H", float(res.statistic)), p=float(res.pvalue))]


def linregress(res: Any, ctx: Context) -> list[Result]:
    from scipy import stats

    b, se, r = float(res.slope), float(res.stderr), float(res.rvalue)
    t = b / se
    n = ctx.n if ctx.n is not None or not ctx.samples else len(ctx.samples[0])
    notes = [] if n is not None else [absent(ctx, ["n (and so df, adjusted R² and the CI of B)"])]
    df_resid = n - 2 if n is not None else None
    ci = None
    if df_resid is not None:
        half = float(stats.t.ppf(0.5 + ctx.level / 2, df_resid)) * se
        ci = Interval(ctx.level, b - half, b + half)
    effects = [EffectSize("R2", r * r) if df_resid is None else variance_explained("R2", r * r, t * t, 1, df_resid, ctx.level)]
    if n is not None:
        effects.append(EffectSize("R2_adj", 1 - (1 - r * r) * (n - 1) / (n - 2)))
    x = ctx.labels.get("x", "x")
    model = _base(ctx, "linear_model", list(notes), statistic=Statistic("F", t * t, (1, df_resid) if df_resid else ()), p=float(res.pvalue),
                  effects=tuple(effects), details={"predictors": x})
    coefficient = _base(ctx, "linear_coefficient", list(notes), statistic=Statistic("t", t, (df_resid,) if df_resid else ()), p=float(res.pvalue),
                        estimate=Estimate("B", b, se=se, ci=ci), effects=(EffectSize("beta", r, method="B·SD(x)/SD(y)"),),
                        details={"term": x, "adjusted": False})
    out = [model]
    if df_resid is not None:  # the intercept's t and CI need the residual df
        a, se_a = float(res.intercept), float(res.intercept_stderr)
        half = float(stats.t.ppf(0.5 + ctx.level / 2, df_resid)) * se_a
        out.append(_base(ctx, "linear_coefficient", [], statistic=Statistic("t", a / se_a, (df_resid,)), p=float(2 * stats.t.sf(abs(a / se_a), df_resid)),
                         estimate=Estimate("B", a, se=se_a, ci=Interval(ctx.level, a - half, a + half)), details={"term": "Intercept", "intercept": True}))
    return out + [coefficient]


# -- running statsetter's analysis on the data given ------------------------------


def _t_ind(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.ttests import t_independent

    return [t_independent(frame, cols["outcome"], cols["group"], groups=cols.get("groups"), variant=mine[0].details["variant"],
                          alternative=mine[0].alternative, level=ctx.level, labels=ctx.labels)]


def _t_rel(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.ttests import t_paired

    return [t_paired(frame, cols["first"], cols["second"], effect=ctx.option("effect", "d_z"), alternative=mine[0].alternative, level=ctx.level, labels=ctx.labels)]


def _t_1samp(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.ttests import t_one_sample

    return [t_one_sample(frame, cols["outcome"], float(ctx.option("mu")), alternative=mine[0].alternative, level=ctx.level, labels=ctx.labels)]


def _corr(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.correlation import correlate

    return [correlate(frame, cols["x"], cols["y"], coefficient=mine[0].kind, alternative=mine[0].alternative, level=ctx.level, labels=ctx.labels)]  # type: ignore[arg-type]


def _chi2(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.chisquare import chi_square

    yates = ctx.option("yates")
    if yates is None:  # 2 × 2 without a stated correction: the one that reproduces the statistic
        plain = chi_square(frame, cols["row"], cols["column"], level=ctx.level, labels=ctx.labels)
        if math.isclose(plain[0].statistic.value, mine[0].statistic.value, rel_tol=1e-6):  # type: ignore[union-attr]
            return plain[:1]
        yates = True
    return chi_square(frame, cols["row"], cols["column"], variant="yates" if yates else "pearson", level=ctx.level, labels=ctx.labels)[:1]


def _fisher(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.chisquare import chi_square

    found = [r for r in chi_square(frame, cols["row"], cols["column"], level=ctx.level, labels=ctx.labels) if r.kind == "fisher_exact"]
    if not found:
        raise InputError("samples: Fisher's exact test needs a 2 × 2 table")
    return found


def _anova(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.anova import anova_oneway

    return [anova_oneway(frame, cols["outcome"], cols["group"], variant=mine[0].details.get("variant", "classic"), labels=ctx.labels)]


def _tukey(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.posthoc import posthoc

    return posthoc(frame, cols["outcome"], cols["group"], adjust="tukey", level=ctx.level, labels=ctx.labels)


def _mwu(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.ranks import mann_whitney

    return [mann_whitney(frame, cols["outcome"], cols["group"], groups=cols.get("groups"), variant=ctx.option("method", "auto"),
                         alternative=mine[0].alternative, labels=ctx.labels)]


def _wilcoxon(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.ranks import wilcoxon_signed_rank

    return [wilcoxon_signed_rank(frame, cols["first"], cols["second"], variant=ctx.option("method", "auto"), alternative=mine[0].alternative, labels=ctx.labels)]


def _kruskal(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.ranks import kruskal_wallis

    return [kruskal_wallis(frame, cols["outcome"], cols["group"], labels=ctx.labels)]


def _linregress(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.regression import linear_regression

    return linear_regression(frame, cols["y"], [cols["x"]], level=ctx.level, labels=ctx.labels)



ADAPTERS = {
    a.name: a
    for a in (
        Adapter("scipy.stats.ttest_ind", LIB, ttest_ind, "two", _t_ind),
        Adapter("scipy.stats.ttest_rel", LIB, ttest_rel, "paired", _t_rel),
        Adapter("scipy.stats.ttest_1samp", LIB, ttest_1samp, "one", _t_1samp),
        Adapter("scipy.stats.pearsonr", LIB, pearsonr, "xy", _corr),
        Adapter("scipy.stats.spearmanr", LIB, spearmanr, "xy", _corr),
        Adapter("scipy.stats.kendalltau", LIB, kendalltau, "xy", _corr),
        Adapter("scipy.stats.chi2_contingency", LIB, chi2_contingency, "table", _chi2),
        Adapter("scipy.stats.fisher_exact", LIB, fisher_exact, "table", _fisher),
        Adapter("scipy.stats.f_oneway", LIB, f_oneway, "k", _anova),
        Adapter("scipy.stats.tukey_hsd", LIB, tukey_hsd, "k", _tukey, pair_key),
        Adapter("scipy.stats.mannwhitneyu", LIB, mannwhitneyu, "two", _mwu),
        Adapter("scipy.stats.wilcoxon", LIB, wilcoxon, "paired", _wilcoxon),
        Adapter("scipy.stats.kruskal", LIB, kruskal, "k", _kruskal),
        Adapter("scipy.stats.linregress", LIB, linregress, "xy", _linregress),
    )
}

# result classes that name their function unambiguously
BY_CLASS = {
    "PearsonRResult": "scipy.stats.pearsonr",
    "Chi2ContingencyResult": "scipy.stats.chi2_contingency",
    "F_onewayResult": "scipy.stats.f_oneway",
    "TukeyHSDResult": "scipy.stats.tukey_hsd",
    "MannwhitneyuResult": "scipy.stats.mannwhitneyu",
    "WilcoxonResult": "scipy.stats.wilcoxon",
    "KruskalResult": "scipy.stats.kruskal",
    "LinregressResult": "scipy.stats.linregress",
}
SHARED_CLASS = {"TtestResult": ("ttest_ind", "ttest_rel", "ttest_1samp"), "SignificanceResult": ("spearmanr", "kendalltau", "fisher_exact")}
