"""``statsetter format``: one result from numbers on the command line."""

from __future__ import annotations

import argparse
import sys

from ..errors import InputError
from .shared import emit, output_format, p_mismatches, style_options, word

# short names for ``statsetter format``; values are (kind, statistic symbol, details)
_FORMAT_KINDS: dict[str, tuple[str, str | None, dict[str, str]]] = {
    "t": ("t_independent", "t", {"variant": "student"}),
    "welch-t": ("t_independent", "t", {"variant": "welch"}),
    "paired-t": ("t_paired", "t", {}),
    "one-sample-t": ("t_one_sample", "t", {}),
    "r": ("pearson", "r", {}),
    "rs": ("spearman", "rs", {}),
    "tau": ("kendall", "tau_b", {}),
    "chi2": ("chi2_independence", "chi2", {}),
    "chi2-fit": ("chi2_goodness_of_fit", "chi2", {}),
    "fisher": ("fisher_exact", None, {}),
    "anova": ("anova_oneway", "F", {"variant": "classic"}),
    "welch-anova": ("anova_oneway", "F", {"variant": "welch"}),
    "anova-term": ("anova_term", "F", {}),
    "posthoc": ("posthoc_pair", None, {}),
    "coef": ("linear_coefficient", "t", {}),
    "model": ("linear_model", "F", {}),
    "step": ("linear_step", "F", {}),
    "logit-coef": ("logistic_coefficient", "z", {}),
    "logit-model": ("logistic_model", "chi2", {}),
    "U": ("mann_whitney", "U", {}),
    "signed-rank": ("wilcoxon", "T", {}),
    "H": ("kruskal_wallis", "H", {}),
    "alpha": ("cronbach_alpha", None, {}),
}


def add(sub) -> None:  # type: ignore[no-untyped-def]
    f = sub.add_parser(
        "format",
        help="render one result from numbers given on the command line",
        description="Render one result from its numbers, e.g. "
        "'statsetter format t --stat 2.14 --df 38 --effect d=0.68 --effect-ci 0.04,1.31'. "
        "A negative limit needs '=': --effect-ci=-0.30,0.52.",
    )
    f.add_argument("kind", metavar="KIND", help="result kind: " + ", ".join(_FORMAT_KINDS))
    f.add_argument("--stat", type=float, metavar="VALUE", help="the test statistic")
    f.add_argument("--df", metavar="DF[,DF2]", help="degrees of freedom, one or two numbers")
    f.add_argument("--p", type=float, metavar="P", help="exact p value (computed from the statistic when left out)")
    f.add_argument("--n", type=int, metavar="N", help="sample size")
    f.add_argument("--effect", metavar="NAME=VALUE", help="effect size, e.g. d=0.68, eta2=0.09, V=0.22")
    f.add_argument("--effect-ci", metavar="LOW,HIGH", help="confidence interval of the effect size")
    f.add_argument("--estimate", type=float, metavar="VALUE", help="point estimate (mean difference, B, OR ...)")
    f.add_argument("--estimate-ci", metavar="LOW,HIGH", help="confidence interval of the estimate")
    f.add_argument("--level", type=float, default=95.0, metavar="PERCENT", help="confidence level in percent (95)")
    f.add_argument("--alternative", choices=("two-sided", "less", "greater"), default="two-sided")
    f.add_argument("--alpha", type=float, default=0.05, help="significance level for decision-preserving rounding")
    f.add_argument("--label", action="append", default=[], metavar="ROLE=TEXT", help="variable label, e.g. outcome=fatigue")
    f.add_argument("--group", action="append", default=[], metavar="LABEL,N,M,SD", help="a group summary (repeatable)")
    style_options(f)
    f.set_defaults(handler=run)


def _pair(text: str, option: str) -> tuple[float, float]:
    parts = [p.strip() for p in text.replace(";", ",").split(",")]
    if len(parts) != 2:
        raise InputError(f"{option}: expected LOW,HIGH, got {text!r}")
    try:
        low, high = (float(p.replace("\u2212", "-")) for p in parts)
    except ValueError:
        raise InputError(f"{option}: {text!r} is not two numbers") from None
    return low, high


def _format_record(ns: argparse.Namespace):  # -> Result
    from ..records import EffectSize, Estimate, GroupSummary, Interval, Result, Statistic, Variable

    if ns.kind not in _FORMAT_KINDS:
        raise InputError(f"unknown KIND {ns.kind!r}; kinds: {', '.join(_FORMAT_KINDS)}")
    kind, symbol, details = _FORMAT_KINDS[ns.kind]
    if not 0 < ns.level < 100:
        raise InputError(f"--level: {ns.level:g} is not a percentage between 0 and 100")
    level = ns.level / 100
    df: tuple[float, ...] = ()
    if ns.df:
        try:
            df = tuple(float(x) for x in ns.df.split(","))
        except ValueError:
            raise InputError(f"--df: {ns.df!r} is not one or two numbers") from None
    statistic = None
    if ns.stat is not None:
        if symbol is None:
            raise InputError(f"--stat: a {ns.kind} result has no test statistic")
        statistic = Statistic(symbol, ns.stat, df)
    elif df:
        raise InputError("--df given without --stat")
    p = ns.p
    if statistic is not None and symbol in ("t", "z", "F", "chi2", "r", "rs"):
        from ..pvalues import p_from_statistic

        if p is None:
            p = p_from_statistic(symbol, statistic.value, df, ns.alternative)
    effects = ()
    if ns.effect:
        name, eq, value = ns.effect.partition("=")
        if not eq:
            raise InputError(f"--effect: expected NAME=VALUE, got {ns.effect!r}")
        try:
            number = float(value.replace("\u2212", "-"))
        except ValueError:
            raise InputError(f"--effect: {value!r} is not a number") from None
        ci = Interval(level, *_pair(ns.effect_ci, "--effect-ci")) if ns.effect_ci else None
        effects = (EffectSize(name.strip(), number, ci, ratio=name.strip() == "OR"),)
    elif ns.effect_ci:
        raise InputError("--effect-ci given without --effect")
    estimate = None
    if ns.estimate is not None:
        ci = Interval(level, *_pair(ns.estimate_ci, "--estimate-ci")) if ns.estimate_ci else None
        name = {"fisher_exact": "OR", "linear_coefficient": "B", "logistic_coefficient": "B"}.get(kind, "estimate")
        estimate = Estimate(name, ns.estimate, ci=ci, ratio=name == "OR")
    variables = []
    for item in ns.label:
        role, eq, text = item.partition("=")
        if not eq:
            raise InputError(f"--label: expected ROLE=TEXT, got {item!r}")
        variables.append(Variable(name=text, label=text, role=role.strip()))
    groups = []
    for item in ns.group:
        parts = [x.strip() for x in item.split(",")]
        if len(parts) != 4:
            raise InputError(f"--group: expected LABEL,N,M,SD, got {item!r}")
        try:
            groups.append(GroupSummary(parts[0], n=int(parts[1]), mean=float(parts[2]), sd=float(parts[3])))
        except ValueError:
            raise InputError(f"--group: {item!r} has a value that is not a number") from None
    record = Result(
        kind=kind,
        statistic=statistic,
        p=p,
        alternative=ns.alternative,
        n=ns.n,
        estimate=estimate,
        effects=effects,
        groups=tuple(groups),
        variables=tuple(variables),
        details=details,
        alpha=ns.alpha,
    )
    if ns.p is not None:  # a valid record whose p was given: does it follow from the statistic?
        for _, why in p_mismatches([record]):
            print(f"statsetter format: warning: {why}; rendered as given", file=sys.stderr)
    return record


def run(ns: argparse.Namespace) -> int:
    from ..rendering.sentences import render

    record = _format_record(ns)
    ns.to = output_format(ns.to, ns.out)
    if ns.out and ns.out.lower().endswith(".docx"):
        return word([record], ns.style, ns.form, ns.out)
    emit(render(record, ns.form, ns.style).to(ns.to), ns.out)
    return 0
