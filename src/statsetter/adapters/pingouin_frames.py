"""pingouin result DataFrames → records.

pingouin returns DataFrames; the function is recognised by the columns (and
said in a note). pingouin rounds two things: the ``CI95`` column (two
decimals) and the CI of ``cronbach_alpha`` (three). Where the unrounded
interval can be recomputed from unrounded fields it is; otherwise the record
carries the rounded limits with their precision, and the renderer never
prints more digits than that.
"""

from __future__ import annotations

import math
from typing import Any

from ..errors import InputError
from ..formulas import studentized_range_quantile
from ..coding import joined
from ..records import EffectSize, Estimate, GroupSummary, Interval, Note, Result, Statistic, Variable
from ..analyses.effects import variance_explained
from ._core import Adapter, Context, absent, base, integral, pair_key, term_key

LIB = "pingouin"

_SIGNATURES: list[tuple[frozenset[str], str]] = [
    (frozenset({"T", "dof", "alternative", "p_val", "CI95", "cohen_d"}), "pingouin.ttest"),
    (frozenset({"X", "Y", "method", "n", "r", "CI95", "p_unc"}), "pingouin.pairwise_corr"),
    (frozenset({"n", "r", "CI95", "p_val"}), "pingouin.corr"),
    (frozenset({"A", "B", "mean_A", "mean_B", "diff", "se", "T", "p_tukey"}), "pingouin.pairwise_tukey"),
    (frozenset({"A", "B", "mean_A", "mean_B", "diff", "se", "T", "df", "pval"}), "pingouin.pairwise_gameshowell"),
    (frozenset({"Contrast", "A", "B", "T", "dof", "p_corr", "p_adjust"}), "pingouin.pairwise_tests"),
    (frozenset({"test", "lambda", "chi2", "dof", "pval", "cramer"}), "pingouin.chi2_independence"),
    (frozenset({"names", "coef", "se", "T", "pval", "r2", "adj_r2"}), "pingouin.linear_regression"),
    (frozenset({"names", "coef", "se", "z", "pval"}), "pingouin.logistic_regression"),
    (frozenset({"U_val", "p_val", "RBC"}), "pingouin.mwu"),
    (frozenset({"W_val", "p_val", "RBC"}), "pingouin.wilcoxon"),
    (frozenset({"Source", "ddof1", "H", "p_unc"}), "pingouin.kruskal"),
    (frozenset({"Source", "W", "ddof1", "Q", "p_unc"}), "pingouin.friedman"),
    (frozenset({"Source", "ddof1", "ddof2", "F", "p_unc", "ng2"}), "pingouin.rm_anova"),
    (frozenset({"Source", "SS", "DF1", "DF2", "MS", "F", "p_unc", "np2"}), "pingouin.mixed_anova"),
    (frozenset({"Source", "SS", "DF", "F", "p_unc", "np2"}), "pingouin.ancova"),
    (frozenset({"path", "coef", "se", "pval", "CI2.5", "CI97.5"}), "pingouin.mediation_analysis"),
    (frozenset({"Source", "dof", "Q", "p_unc"}), "pingouin.cochran"),
    (frozenset({"Source", "SS", "DF", "MS", "F", "p_unc"}), "pingouin.anova"),
    (frozenset({"Source", "ddof1", "ddof2", "F", "p_unc", "np2"}), "pingouin.anova"),
]


def identify(obj: Any) -> str | None:
    try:
        import pandas as pd
    except ImportError:  # pragma: no cover
        return None
    if isinstance(obj, tuple) and len(obj) == 3 and all(isinstance(x, pd.DataFrame) for x in obj):
        return "pingouin.chi2_independence" if "cramer" in obj[2].columns else None
    if isinstance(obj, tuple) and len(obj) == 2 and isinstance(obj[0], float) and getattr(obj[1], "shape", None) == (2,):
        return "pingouin.cronbach_alpha"
    if not isinstance(obj, pd.DataFrame):
        return None
    columns = set(map(str, obj.columns))
    for signature, name in _SIGNATURES:
        if signature <= columns:
            if name == "pingouin.anova" and "ddof2" in columns and "SS" not in columns:
                return "pingouin.welch_anova" if not integral(float(obj["ddof2"].iloc[0])) else "pingouin.anova"
            return name
    return None


def _base(ctx: Context, kind: str, notes: list[Note], **fields: Any) -> Result:
    return base(ctx, LIB, kind, [Note("method", f"Read as a {ctx.source} result."), *notes], **fields)


def _one(frame: Any) -> Any:
    if len(frame) != 1:
        raise InputError(f"expected a one-row pingouin result, got {len(frame)} rows")
    return frame.iloc[0]


def _held(ci: Any) -> int:
    """The decimals a rounded limit pair was printed with (pingouin: 2 or 3)."""
    from decimal import Decimal

    return max(-Decimal(repr(float(x))).normalize().as_tuple().exponent for x in ci)  # type: ignore[operator]


def ttest(frame: Any, ctx: Context) -> list[Result]:
    row = _one(frame)
    t, dof = float(row["T"]), float(row["dof"])
    kind = ctx.option("kind")
    if kind is None and not integral(dof):
        kind = "t_independent"
    if kind not in ("t_independent", "t_paired", "t_one_sample"):
        raise InputError("pingouin.ttest: the result does not say which t test it is; pass kind='t_independent', 't_paired' or 't_one_sample'")
    low, high = (float(x) for x in row["CI95"])
    details: dict[str, Any] = {"ci95_rounded_low": low, "ci95_rounded_high": high}
    notes = [Note("precision", f"pingouin's CI95 of the mean difference is rounded to {_held(row['CI95'])} decimals and is not used; pass the data to compute it.")]
    effects: tuple[EffectSize, ...] = ()
    if kind == "t_independent":
        details["variant"] = "student" if integral(dof) else "welch"
        # pingouin reports |d| (pooled SD); the sign is the sign of t
        effects = (EffectSize("d", math.copysign(float(row["cohen_d"]), t)),)
    elif kind == "t_paired":
        # pingouin's paired d divides by √((SD1² + SD2²)/2), not by d_av's mean of the SDs
        effects = (EffectSize("d", math.copysign(float(row["cohen_d"]), t), method="mean difference / √((SD1² + SD2²)/2) (pingouin)"),)
    notes.append(absent(ctx, ["the mean difference and its CI", "group n, M and SD", "the CI of d"]))
    return [_base(ctx, kind, notes, statistic=Statistic("t", t, (dof,)), p=float(row["p_val"]), alternative=str(row["alternative"]),
                  effects=effects, details=details)]


def _corr_record(ctx: Context, method: str, n: int, r: float, p: float, alternative: str, names: tuple[str, str] | None) -> Result:
    from ..analyses.correlation import SYMBOLS, correlation_effect

    if method not in SYMBOLS:
        raise InputError(f"pingouin correlation method {method!r} is not supported; supported: {', '.join(SYMBOLS)}")
    variables = tuple(Variable(v, ctx.labels.get(v, v), role) for v, role in zip(names, ("x", "y"))) if names else ()
    effect = correlation_effect(method, r, n, ctx.level)
    if effect.ci is None:  # Kendall: the SE of τb needs the data
        note = Note("method", "No CI for τb: its SE depends on the ties in the data, which pingouin's frame does not hold.")
    else:
        note = Note("method", f"The CI is recomputed from the unrounded r and n ({effect.method}); pingouin's CI95 is rounded.")
    return _base(ctx, method, [note], statistic=Statistic(SYMBOLS[method], r, (n - 2,) if method != "kendall" else ()), p=p, n=n,
                 alternative=alternative, effects=(effect,), variables=variables)  # type: ignore[arg-type]


def corr(frame: Any, ctx: Context) -> list[Result]:
    row = _one(frame)
    return [_corr_record(ctx, str(frame.index[0]), int(row["n"]), float(row["r"]), float(row["p_val"]), str(row.get("alternative", "two-sided")), None)]


def pairwise_corr(frame: Any, ctx: Context) -> list[Result]:
    return [
        _corr_record(ctx, str(row["method"]), int(row["n"]), float(row["r"]), float(row["p_unc"]), str(row["alternative"]), (str(row["X"]), str(row["Y"])))
        for _, row in frame.iterrows()
    ]


def _term_name(source: str) -> str:
    return " × ".join(part.strip() for part in str(source).split("*"))


def _group(ctx: Context, frame: Any) -> tuple[Variable, ...]:
    """A one-way ANOVA's grouping variable, named by the frame's ``Source``, and its outcome from labels=."""
    source = str(frame["Source"].iloc[0]) if "Source" in frame.columns else None
    group = (Variable(source, ctx.labels.get(source, ctx.labels.get("group", source)), "group"),) if source else ()
    return _outcome(ctx) + group


def anova(frame: Any, ctx: Context) -> list[Result]:
    if "SS" not in frame.columns:  # one-way, not detailed
        row = _one(frame)
        return [_base(ctx, "anova_oneway", [absent(ctx, ["ω²", "group summaries"])],
                      statistic=Statistic("F", float(row["F"]), (float(row["ddof1"]), float(row["ddof2"]))), p=float(row["p_unc"]),
                      effects=(EffectSize("eta2", float(row["np2"])),), details={"variant": "classic"}, variables=_group(ctx, frame))]
    sources = [str(s) for s in frame["Source"]]
    residual = frame.iloc[-1]
    if sources[-1] == "Within" and len(sources) == 2:  # one-way, detailed: SS give η² and ω²
        term = frame.iloc[0]
        ss_b, ss_w, df_b, ms_w = float(term["SS"]), float(residual["SS"]), float(term["DF"]), float(residual["MS"])
        f, df_w = float(term["F"]), float(residual["DF"])
        effects = (variance_explained("eta2", ss_b / (ss_b + ss_w), f, df_b, df_w, ctx.level),
                   variance_explained("omega2", (ss_b - df_b * ms_w) / (ss_b + ss_w + ms_w), f, df_b, df_w, ctx.level, "Hays (1963); may be negative"))
        return [_base(ctx, "anova_oneway", [absent(ctx, ["group summaries"])], statistic=Statistic("F", f, (df_b, df_w)),
                      p=float(term["p_unc"]), effects=effects, details={"variant": "classic", "ss": ss_b, "ss_error": ss_w, "df_error": df_w}, variables=_group(ctx, frame))]
    ss_type = ctx.option("ss_type")
    notes = [] if ss_type is not None else [Note("method", "The sums-of-squares type is not in the pingouin result (its default is II); pass ss_type= to state it.")]
    out = []
    for _, row in frame.iloc[:-1].iterrows():
        term = _term_name(row["Source"])
        details: dict[str, Any] = {"term": term, "interaction": "×" in term, "ss": float(row["SS"]), "ss_error": float(residual["SS"])}
        if ss_type is not None:
            details["ss_type"] = int(ss_type)
        out.append(_base(ctx, "anova_term", list(notes), statistic=Statistic("F", float(row["F"]), (float(row["DF"]), float(residual["DF"]))),
                         p=float(row["p_unc"]), effects=(variance_explained("eta2_p", float(row["np2"]), float(row["F"]), float(row["DF"]), float(residual["DF"]), ctx.level),),
                         details=details))
    return out


def welch_anova(frame: Any, ctx: Context) -> list[Result]:
    row = _one(frame)
    return [_base(ctx, "anova_oneway", [absent(ctx, ["ω²", "group summaries"])],
                  statistic=Statistic("F", float(row["F"]), (float(row["ddof1"]), float(row["ddof2"]))), p=float(row["p_unc"]),
                  effects=(EffectSize("eta2", float(row["np2"])),), details={"variant": "welch"})]


def _pairs(frame: Any, ctx: Context, procedure: str, p_column: str, half_width: Any) -> list[Result]:
    k = len(set(map(str, frame["A"])) | set(map(str, frame["B"])))
    out = []
    for _, row in frame.iterrows():
        a, b, diff = str(row["A"]), str(row["B"]), float(row["diff"])
        ga, gb = GroupSummary(a, mean=float(row["mean_A"])), GroupSummary(b, mean=float(row["mean_B"]))
        if a > b:  # statsetter orders each pair by label
            a, b, diff, ga, gb = b, a, -diff, gb, ga
        half = half_width(row, k)
        ci = Interval(ctx.level, diff - half, diff + half) if half is not None else None
        notes = [] if half is not None else [absent(ctx, ["N (and so the CI)"])]
        out.append(_base(ctx, "posthoc_pair", notes, p=min(float(row[p_column]), 1.0), estimate=Estimate("mean difference", diff, ci=ci),
                         groups=(ga, gb), n=None, details={"procedure": procedure, "comparisons": len(frame)}))
    return out


def pairwise_tukey(frame: Any, ctx: Context) -> list[Result]:

    def half(row: Any, k: int) -> float | None:
        if ctx.n is None and ctx.option("df") is None:
            return None
        df = ctx.option("df") or ctx.n - k  # type: ignore[operator]
        return float(studentized_range_quantile(ctx.level, k, df)) / math.sqrt(2) * float(row["se"])

    return _pairs(frame, ctx, "Tukey HSD", "p_tukey", half)


def pairwise_gameshowell(frame: Any, ctx: Context) -> list[Result]:

    def half(row: Any, k: int) -> float:
        return float(studentized_range_quantile(ctx.level, k, float(row["df"]))) / math.sqrt(2) * float(row["se"])

    return _pairs(frame, ctx, "Games–Howell", "pval", half)


_ADJUST = {"holm": "Holm", "bonf": "Bonferroni"}


def pairwise_tests(frame: Any, ctx: Context) -> list[Result]:
    method = str(frame["p_adjust"].iloc[0])
    if method not in _ADJUST:
        raise InputError(f"pingouin.pairwise_tests with p_adjust={method!r} is not supported; supported: {', '.join(_ADJUST)}")
    if frame["Paired"].any() or not frame["Parametric"].all():
        raise InputError("pingouin.pairwise_tests: only unpaired parametric comparisons (t tests) are supported")
    out = []
    for _, row in frame.iterrows():
        a, b = str(row["A"]), str(row["B"])
        if a > b:
            a, b = b, a
        out.append(_base(ctx, "posthoc_pair", [absent(ctx, ["the mean difference and its CI", "group summaries"])], p=min(float(row["p_corr"]), 1.0),
                         groups=(GroupSummary(a), GroupSummary(b)), n=None,
                         details={"procedure": _ADJUST[method], "comparisons": len(frame)}))
    return out


def chi2_independence(obj: Any, ctx: Context) -> list[Result]:
    import pandas as pd

    observed = None
    if isinstance(obj, tuple):
        _, observed, obj = obj
    row = obj[obj["test"] == "pearson"]
    if row.empty or not isinstance(obj, pd.DataFrame):
        raise InputError("pingouin.chi2_independence: no 'pearson' row in the result")
    row = row.iloc[0]
    dof = int(row["dof"])
    yates = ctx.option("yates")
    n = ctx.n
    if observed is not None:
        from scipy import stats

        counts = observed.to_numpy(dtype=float)
        n = int(counts.sum())
        if dof == 1 and yates is None:
            plain = stats.chi2_contingency(counts, correction=False).statistic
            yates = not math.isclose(float(plain), float(row["chi2"]), rel_tol=1e-9)
    if dof == 1 and yates is None:
        raise InputError("pingouin.chi2_independence: for a 2 × 2 table pingouin applies the Yates correction by default; pass yates=True or False, or the whole result tuple")
    notes = [Note("correction", "Yates' continuity correction applied." if yates else "No continuity correction.")]
    effects = (EffectSize("phi" if dof == 1 and observed is not None and observed.shape == (2, 2) else "V", float(row["cramer"])),) if not yates else ()
    if n is None:
        notes.append(absent(ctx, ["N"]))
    return [_base(ctx, "chi2_independence", notes, statistic=Statistic("chi2", float(row["chi2"]), (dof,)), p=float(row["pval"]), n=n,
                  effects=effects, details={"yates": bool(yates)})]


def linear_regression(frame: Any, ctx: Context) -> list[Result]:
    from scipy import stats

    df_model, df_resid = getattr(frame, "df_model_", None), getattr(frame, "df_resid_", None)
    if df_model is None or df_resid is None:
        raise InputError("pingouin.linear_regression: the result has lost its df_model_ and df_resid_ attributes (copy or slice); pass the original")
    r2, r2_adj = float(frame["r2"].iloc[0]), float(frame["adj_r2"].iloc[0])
    f = (r2 / df_model) / ((1 - r2) / df_resid)
    n = int(df_model + df_resid + 1)
    terms = [str(x) for x in frame["names"] if str(x) != "Intercept"]
    model = _base(ctx, "linear_model", [Note("method", "F and its p computed from the unrounded R² and the model's df.")],
                  statistic=Statistic("F", f, (float(df_model), float(df_resid))), p=float(stats.f.sf(f, df_model, df_resid)), n=n,
                  effects=(variance_explained("R2", r2, f, df_model, df_resid, ctx.level), EffectSize("R2_adj", r2_adj)), details={"predictors": joined([ctx.labels.get(t, t) for t in terms])},
                  variables=_outcome(ctx))
    out = [model]
    level = ctx.level
    if not math.isclose(level, 0.95):
        raise InputError("pingouin.linear_regression: its CI columns are 95% intervals; pass level=0.95")
    for _, row in frame.iterrows():
        intercept = str(row["names"]) == "Intercept"
        out.append(_base(ctx, "linear_coefficient", [] if intercept else [absent(ctx, ["β"])], statistic=Statistic("t", float(row["T"]), (float(df_resid),)),
                         p=float(row["pval"]), n=n,
                         estimate=Estimate("B", float(row["coef"]), se=float(row["se"]), ci=Interval(0.95, float(row["CI2.5"]), float(row["CI97.5"]))),
                         details={"term": "Intercept", "intercept": True} if intercept else {"term": str(row["names"]), "adjusted": len(terms) > 1},
                         variables=_outcome(ctx) if intercept else _predictor(ctx, str(row["names"]))))
    return out


def _outcome(ctx: Context) -> tuple[Variable, ...]:
    """The outcome, which pingouin's regression frames do not name: from labels= ("outcome")."""
    return (Variable("outcome", ctx.labels["outcome"], "outcome"),) if "outcome" in ctx.labels else ()


def _predictor(ctx: Context, name: str) -> tuple[Variable, ...]:
    """A coefficient's predictor, named by the frame's ``names`` column (and labels=), and the outcome."""
    return (Variable(name, ctx.labels.get(name, name), "predictor"),) + _outcome(ctx)


def logistic_regression(frame: Any, ctx: Context) -> list[Result]:
    out = []
    terms = [str(x) for x in frame["names"] if str(x) != "Intercept"]
    for _, row in frame.iterrows():
        intercept = str(row["names"]) == "Intercept"
        b, low, high = float(row["coef"]), float(row["CI2.5"]), float(row["CI97.5"])
        out.append(_base(ctx, "logistic_coefficient", [absent(ctx, ["the model's likelihood-ratio χ² and Nagelkerke R²", "n"])],
                         statistic=Statistic("z", float(row["z"])), p=float(row["pval"]),
                         estimate=Estimate("B", b, se=float(row["se"]), ci=Interval(0.95, low, high)),
                         effects=() if intercept else (EffectSize("OR", math.exp(b), Interval(0.95, math.exp(low), math.exp(high)), ratio=True),),
                         details={"term": "Intercept", "intercept": True} if intercept else {"term": str(row["names"]), "adjusted": len(terms) > 1},
                         variables=_outcome(ctx) if intercept else _predictor(ctx, str(row["names"]))))
    return out


def cronbach_alpha(obj: Any, ctx: Context) -> list[Result]:
    from scipy import stats

    alpha, ci = float(obj[0]), obj[1]
    n, k = ctx.n, ctx.option("k_items")
    if n is not None and k is not None:
        df1, df2 = n - 1, (n - 1) * (k - 1)
        g = (1 - ctx.level) / 2
        low = 1 - (1 - alpha) * float(stats.f.ppf(1 - g, df1, df2))
        high = min(1 - (1 - alpha) * float(stats.f.ppf(g, df1, df2)), 1.0)
        return [_base(ctx, "cronbach_alpha", [Note("method", "The CI is recomputed from the unrounded α, n and the number of items (Feldt, 1965).")],
                      n=n, effects=(EffectSize("alpha", alpha, Interval(ctx.level, low, high), method="Feldt (1965)"),), details={"k_items": int(k)})]
    held = _held(ci)
    note = Note("precision", f"pingouin rounds the CI of α to {held} decimals; pass n= and k_items= to recompute it.")
    return [_base(ctx, "cronbach_alpha", [note, absent(ctx, ["n", "the number of items"])],
                  effects=(EffectSize("alpha", alpha, Interval(0.95, float(ci[0]), float(ci[1])), method="Feldt (1965)"),),
                  precision={"effects[0].ci.low": held, "effects[0].ci.high": held})]


def mwu(frame: Any, ctx: Context) -> list[Result]:
    row = _one(frame)
    # pingouin's RBC is the rank-biserial r with statsetter's sign: 2U/(n1 n2) − 1 for the first sample's U
    effect = EffectSize("r_rb", float(row["RBC"]), method="rank-biserial r = 2U/(n1 n2) - 1 (Kerby, 2014)")
    return [_base(ctx, "mann_whitney", [absent(ctx, ["group n and medians", "exact or approximate p"])], statistic=Statistic("U", float(row["U_val"])),
                  p=float(row["p_val"]), alternative=str(row["alternative"]), effects=(effect,))]


def wilcoxon(frame: Any, ctx: Context) -> list[Result]:
    row = _one(frame)
    effect = EffectSize("r_rb", float(row["RBC"]), method="matched-pairs rank-biserial r (Kerby, 2014)")
    return [_base(ctx, "wilcoxon", [Note("method", "T is pingouin's W statistic, the smaller signed-rank sum for a two-sided test."),
                                    Note("correction", "pingouin applies a continuity correction to the normal approximation of p."),
                                    absent(ctx, ["n and medians", "exact or approximate p"])],
                  statistic=Statistic("T", float(row["W_val"])), p=float(row["p_val"]), alternative=str(row["alternative"]), effects=(effect,))]


def kruskal(frame: Any, ctx: Context) -> list[Result]:
    row = _one(frame)
    return [_base(ctx, "kruskal_wallis", [absent(ctx, ["group n and medians", "ε²"])], statistic=Statistic("H", float(row["H"]), (float(row["ddof1"]),)),
                  p=float(row["p_unc"]))]


def friedman(frame: Any, ctx: Context) -> list[Result]:
    row = _one(frame)
    return [_base(ctx, "friedman", [Note("method", "pingouin's Q is Friedman's chi-square statistic."), absent(ctx, ["n and medians"])],
                  statistic=Statistic("chi2", float(row["Q"]), (float(row["ddof1"]),)), p=float(row["p_unc"]),
                  effects=(EffectSize("kendall_w", float(row["W"]), method="Kendall's W (pingouin)"),))]


def _within_term(ctx: Context, name: str, row: Any, df1: float, df2: float, effects: tuple[EffectSize, ...], extra: dict[str, Any]) -> Result:
    """A within-subjects term: Greenhouse–Geisser-corrected when pingouin gives the corrected p, else uncorrected (its ε kept)."""
    import math

    corrected = "p_GG_corr" in row.index and not math.isnan(float(row["p_GG_corr"]))
    eps = float(row["eps"]) if "eps" in row.index and not math.isnan(float(row["eps"])) else None
    details: dict[str, Any] = {"term": name, "interaction": "×" in name, "p_uncorrected": float(row["p_unc"]), "df1_uncorrected": df1,
                               "df2_uncorrected": df2, **extra}
    if corrected and eps is not None:
        details.update(correction="Greenhouse–Geisser correction", epsilon=eps, epsilon_gg=eps)
    else:
        details.update(correction="no sphericity correction", **({"epsilon_gg": eps} if eps is not None else {}))
    if "W_spher" in row.index and not math.isnan(float(row["W_spher"])):
        details.update(mauchly_w=float(row["W_spher"]), mauchly_p=float(row["p_spher"]))
    e = eps if corrected and eps is not None else 1.0
    return _base(ctx, "anova_term", [absent(ctx, ["n", "the Huynh–Feldt ε"])], statistic=Statistic("F", float(row["F"]), (df1 * e, df2 * e)),
                 p=float(row["p_GG_corr"]) if corrected else float(row["p_unc"]), effects=effects, details=details)


def mixed_anova(frame: Any, ctx: Context) -> list[Result]:
    """pingouin's mixed_anova: the between term, the within term and the interaction (pingouin calls it "Interaction")."""
    rows = [r for _, r in frame.iterrows()]
    if len(rows) != 3:
        raise InputError(f"expected pingouin's three-row mixed_anova table, got {len(rows)} rows")
    between, within = str(rows[0]["Source"]), str(rows[1]["Source"])
    out = []
    for row, name in zip(rows, (between, within, f"{between} × {within}")):
        df1, df2 = float(row["DF1"]), float(row["DF2"])
        effects = (variance_explained("eta2_p", float(row["np2"]), float(row["F"]), df1, df2, ctx.level),)
        if name == between:
            out.append(_base(ctx, "anova_term", [absent(ctx, ["n"])], statistic=Statistic("F", float(row["F"]), (df1, df2)), p=float(row["p_unc"]),
                             effects=effects, details={"term": name, "interaction": False, "ss": float(row["SS"])}))
        else:
            out.append(_within_term(ctx, name, row, df1, df2, effects, {"ss": float(row["SS"])}))
    return out


def rm_anova(frame: Any, ctx: Context) -> list[Result]:
    """One within factor: the Greenhouse–Geisser-corrected test when pingouin gives it (correction=True), else uncorrected.
    Two within factors: a term record each (pingouin's "a * b" is the interaction), corrected where pingouin gives p_GG_corr."""
    if len(frame) > 1:
        out = []
        for _, row in frame.iterrows():
            name = " × ".join(part.strip() for part in str(row["Source"]).split("*"))
            out.append(_within_term(ctx, name, row, float(row["ddof1"]), float(row["ddof2"]),
                                    (EffectSize("eta2_g", float(row["ng2"]), method="generalized η² (pingouin)"),), {}))
        return out
    row = _one(frame)
    df1, df2 = float(row["ddof1"]), float(row["ddof2"])
    eps = float(row["eps"]) if "eps" in frame.columns and "p_GG_corr" in frame.columns else None
    details: dict[str, Any] = {"k": int(df1) + 1, "p_uncorrected": float(row["p_unc"]), "df1_uncorrected": df1, "df2_uncorrected": df2}
    if eps is not None:
        details.update(correction="Greenhouse–Geisser correction", epsilon=eps, epsilon_gg=eps)
    else:
        details["correction"] = "no sphericity correction"
    if "W_spher" in frame.columns:
        details.update(mauchly_w=float(row["W_spher"]), mauchly_p=float(row["p_spher"]))
    notes = [absent(ctx, ["n and the means", "the Huynh–Feldt ε", "η²p"])]
    return [_base(ctx, "anova_rm", notes, statistic=Statistic("F", float(row["F"]), (df1 * (eps or 1.0), df2 * (eps or 1.0))),
                  p=float(row["p_GG_corr"]) if eps is not None else float(row["p_unc"]),
                  effects=(EffectSize("eta2_g", float(row["ng2"]), method="generalized η² (pingouin)"),), details=details)]


def mediation_analysis(frame: Any, ctx: Context) -> list[Result]:
    """Paths a, c, c′ and the indirect effect. pingouin's "Y ~ M" row is the regression of Y on M alone, not the b path
    (Y on M with X held constant), so it is not read as b; the bootstrap settings are not in the frame."""
    rows = {str(r["path"]): r for _, r in frame.iterrows()}
    out = []
    for name, path in (("Total", "c"), ("Direct", "c′")):
        if name in rows:
            r = rows[name]
            out.append(_base(ctx, "mediation_path", [], estimate=Estimate("B", float(r["coef"]), se=float(r["se"]),
                             ci=Interval(ctx.level, float(r["CI2.5"]), float(r["CI97.5"]))), p=float(r["pval"]), details={"path": path}))
    first = str(frame["path"].iloc[0])  # pingouin lists "M ~ X" (path a) first
    if first not in ("Total", "Direct", "Indirect"):
        r = rows[first]
        out.insert(0, _base(ctx, "mediation_path", [], estimate=Estimate("B", float(r["coef"]), se=float(r["se"]),
                            ci=Interval(ctx.level, float(r["CI2.5"]), float(r["CI97.5"]))), p=float(r["pval"]), details={"path": "a"}))
    if "Indirect" in rows:
        r = rows["Indirect"]
        out.append(_base(ctx, "mediation_indirect", [Note("method", "pingouin's bootstrap CI; its resamples and seed are not in the result.")],
                         estimate=Estimate("indirect effect", float(r["coef"]), ci=Interval(ctx.level, float(r["CI2.5"]), float(r["CI97.5"])))))
    return out


def cochran(frame: Any, ctx: Context) -> list[Result]:
    row = _one(frame)
    return [_base(ctx, "cochran_q", [absent(ctx, ["n and the counts per measurement"])], statistic=Statistic("Q", float(row["Q"]), (float(row["dof"]),)),
                  p=float(row["p_unc"]))]


# -- statsetter's analysis of the data given -----------------------------------


def _rm(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.repeated import rm_anova

    correction = "gg" if any(r.details.get("correction", "").startswith("Greenhouse") for r in mine) else "none"
    if len(mine) > 1 and correction == "gg" and any(r.details.get("correction", "").startswith("no") for r in mine):
        raise InputError("pingouin.rm_anova: some terms corrected and some not; read it without data=")
    out = rm_anova(frame, outcome=cols["outcome"], subject=cols["subject"], within=cols["within"], correction=correction, level=ctx.level,
                   labels=ctx.labels)
    return out if isinstance(out, list) else [out]


def _mixed_anova(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.repeated import mixed_anova

    correction = "gg" if mine[1].details.get("correction", "").startswith("Greenhouse") else "none"
    return mixed_anova(frame, cols["outcome"], cols["subject"], cols["within"], cols["between"], correction=correction, level=ctx.level, labels=ctx.labels)


def _ttest(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.ttests import t_independent, t_one_sample, t_paired

    r = mine[0]
    if r.kind == "t_independent":
        return [t_independent(frame, cols["outcome"], cols["group"], groups=cols.get("groups"), variant=r.details["variant"], alternative=r.alternative, level=ctx.level, labels=ctx.labels)]
    if r.kind == "t_paired":
        return [t_paired(frame, cols["first"], cols["second"], alternative=r.alternative, level=ctx.level, labels=ctx.labels)]
    return [t_one_sample(frame, cols["outcome"], float(ctx.option("mu")), alternative=r.alternative, level=ctx.level, labels=ctx.labels)]


def _corr(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.correlation import correlate

    if len(mine) == 1 and not mine[0].variables:
        return [correlate(frame, cols["x"], cols["y"], coefficient=mine[0].kind, alternative=mine[0].alternative, level=ctx.level, labels=ctx.labels)]  # type: ignore[arg-type]
    return [correlate(frame, r.variables[0].name, r.variables[1].name, r.kind, alternative=r.alternative, level=ctx.level, labels=ctx.labels) for r in mine]  # type: ignore[arg-type]


def _anova(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.anova import anova_oneway
    from ..analyses.posthoc import factorial_anova

    if mine[0].kind == "anova_oneway":
        return [anova_oneway(frame, cols["outcome"], cols["group"], variant=mine[0].details.get("variant", "classic"), labels=ctx.labels)]
    return factorial_anova(frame, cols["outcome"], tuple(cols["factors"]), ss_type=int(ctx.option("ss_type", 2)), labels=ctx.labels)  # type: ignore[arg-type]


def _posthoc(procedure: str):  # type: ignore[no-untyped-def]
    def run(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
        from ..analyses.posthoc import posthoc

        return posthoc(frame, cols["outcome"], cols["group"], adjust=procedure, level=ctx.level, labels=ctx.labels)  # type: ignore[arg-type]

    return run


def _pairwise_tests(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    return _posthoc({"Holm": "holm", "Bonferroni": "bonferroni"}[mine[0].details["procedure"]])(frame, cols, ctx, mine)


def _chi2(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.chisquare import chi_square

    return chi_square(frame, cols["row"], cols["column"], variant="yates" if mine[0].details.get("yates") else "pearson", level=ctx.level, labels=ctx.labels)[:1]


def _linear(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.regression import linear_regression

    return linear_regression(frame, cols["outcome"], cols["predictors"], level=ctx.level, labels=ctx.labels)


def _logistic(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.regression import logistic_regression

    return logistic_regression(frame, cols["outcome"], cols["predictors"], event=cols.get("event"), level=ctx.level, labels=ctx.labels)


def _alpha(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.scales import cronbach_alpha as alpha

    return [alpha(frame, cols["items"], reverse=cols.get("reverse", ()), minimum=cols.get("minimum"), maximum=cols.get("maximum"), level=ctx.level, labels=ctx.labels)]


def _mwu(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.ranks import mann_whitney

    return [mann_whitney(frame, cols["outcome"], cols["group"], groups=cols.get("groups"), variant=ctx.option("method", "auto"), alternative=mine[0].alternative, labels=ctx.labels)]


def _wilcoxon(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.ranks import wilcoxon_signed_rank

    return [wilcoxon_signed_rank(frame, cols["first"], cols["second"], variant=ctx.option("method", "auto"), alternative=mine[0].alternative, labels=ctx.labels)]


def _kruskal(frame, cols, ctx, mine):  # type: ignore[no-untyped-def]
    from ..analyses.ranks import kruskal_wallis

    return [kruskal_wallis(frame, cols["outcome"], cols["group"], labels=ctx.labels)]




def _corr_key(r: Result) -> tuple[str, ...]:
    return tuple(v.name for v in r.variables)


ADAPTERS = {
    a.name: a
    for a in (
        Adapter("pingouin.ttest", LIB, ttest, "two", _ttest),
        Adapter("pingouin.corr", LIB, corr, "xy", _corr),
        Adapter("pingouin.pairwise_corr", LIB, pairwise_corr, None, _corr, _corr_key),
        Adapter("pingouin.anova", LIB, anova, "k", _anova, term_key),
        Adapter("pingouin.welch_anova", LIB, welch_anova, "k", _anova),
        Adapter("pingouin.pairwise_tukey", LIB, pairwise_tukey, "k", _posthoc("tukey"), pair_key),
        Adapter("pingouin.pairwise_gameshowell", LIB, pairwise_gameshowell, "k", _posthoc("games-howell"), pair_key),
        Adapter("pingouin.pairwise_tests", LIB, pairwise_tests, "k", _pairwise_tests, pair_key),
        Adapter("pingouin.chi2_independence", LIB, chi2_independence, "table", _chi2),
        Adapter("pingouin.linear_regression", LIB, linear_regression, None, _linear, term_key),
        Adapter("pingouin.logistic_regression", LIB, logistic_regression, None, _logistic, term_key),
        Adapter("pingouin.cronbach_alpha", LIB, cronbach_alpha, "items", _alpha),
        Adapter("pingouin.mwu", LIB, mwu, "two", _mwu),
        Adapter("pingouin.wilcoxon", LIB, wilcoxon, "paired", _wilcoxon),
        Adapter("pingouin.kruskal", LIB, kruskal, "k", _kruskal),
        Adapter("pingouin.friedman", LIB, friedman),  # read as printed; long data with subjects are not merged
        Adapter("pingouin.cochran", LIB, cochran),
        Adapter("pingouin.rm_anova", LIB, rm_anova, None, _rm, term_key),
        Adapter("pingouin.mixed_anova", LIB, mixed_anova, None, _mixed_anova, term_key),
        Adapter("pingouin.ancova", LIB, anova),  # the terms of an ANCOVA table, as an ANOVA table's
        Adapter("pingouin.mediation_analysis", LIB, mediation_analysis),
    )
}
