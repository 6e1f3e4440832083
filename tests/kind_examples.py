"""One record per result kind, for the golden tests.

Where REPORTING-RULES.md prints an example statistics string, the record
carries those numbers (with more digits, so the rounding is exercised) and the
golden string must equal the example. Other kinds use round numbers chosen to
exercise one rule each; the rule is named beside the golden string.
"""

from statsetter import EffectSize, Estimate, GroupSummary, Interval, Result, Statistic, Variable

CI = 0.95


def V(name, role, label=None):
    return Variable(name, label or name, role)


EXAMPLES = {
    "descriptives_continuous": Result(
        kind="descriptives_continuous",
        groups=(GroupSummary("Total", n=120, mean=4.2249, sd=0.7301),),
        variables=(V("score", "variable", "the score"),),
        n=120,
    ),
    "descriptives_categorical": Result(
        kind="descriptives_categorical",
        groups=(GroupSummary("yes", n=45, percent=37.5), GroupSummary("no", n=75, percent=62.5)),
        variables=(V("answer", "variable", "answer"),),
        n=120,
    ),
    "pearson": Result(
        kind="pearson",
        statistic=Statistic("r", 0.3204, (98,)),
        p=0.00115,
        n=100,
        effects=(EffectSize("r", 0.3204, Interval(CI, 0.1320, 0.4858), method="Fisher z"),),
        variables=(V("x", "x", "the first score"), V("y", "y", "the second score")),
    ),
    "spearman": Result(
        kind="spearman",
        statistic=Statistic("rs", 0.2912, (98,)),
        p=0.0033,
        n=100,
        effects=(EffectSize("rs", 0.2912, Interval(CI, 0.1003, 0.4610), method="Fisher z, Bonett-Wright SE"),),
        variables=(V("x", "x", "the first rank"), V("y", "y", "the second rank")),
    ),
    "kendall": Result(
        kind="kendall",
        statistic=Statistic("tau_b", -0.2104),
        p=0.0028,
        n=100,
        variables=(V("x", "x", "the first rank"), V("y", "y", "the second rank")),
    ),
    "t_independent": Result(
        kind="t_independent",
        statistic=Statistic("t", 2.1436, (38,)),
        p=0.0385,
        n=40,
        estimate=Estimate("mean difference", 0.6049, ci=Interval(CI, 0.0337, 1.1761)),
        effects=(EffectSize("d", 0.6779, Interval(CI, 0.0401, 1.3057), method="noncentral t"),),
        groups=(GroupSummary("group A", n=20, mean=4.1, sd=0.9), GroupSummary("group B", n=20, mean=3.4951, sd=0.8846)),
        variables=(V("score", "outcome", "the score"), V("group", "group")),
        details={"variant": "student"},
    ),
    "t_paired": Result(
        kind="t_paired",
        statistic=Statistic("t", -4.0621, (9,)),
        p=0.002833,
        n=10,
        estimate=Estimate("mean difference", -1.58, ci=Interval(CI, -2.4599, -0.7001)),
        effects=(EffectSize("d_z", -1.2845, Interval(CI, -2.1024, -0.4332), method="noncentral t"),),
        groups=(GroupSummary("condition 1", n=10, mean=0.75, sd=1.7890), GroupSummary("condition 2", n=10, mean=2.33, sd=2.0022)),
        variables=(V("extra", "outcome", "extra sleep"),),
    ),
    "t_one_sample": Result(
        kind="t_one_sample",
        statistic=Statistic("t", 2.0, (49,)),
        p=0.05106,
        n=50,
        estimate=Estimate("mean difference", 0.2, ci=Interval(CI, -0.001, 0.401)),
        effects=(EffectSize("d", 0.2828, Interval(CI, -0.0013, 0.5642)),),
        groups=(GroupSummary("sample", n=50, mean=4.2, sd=0.7071),),
        variables=(V("score", "outcome", "the score"),),
        details={"mu": 4},
    ),
    "chi2_independence": Result(
        kind="chi2_independence",
        statistic=Statistic("chi2", 9.8712, (2,)),
        p=0.00719,
        n=200,
        effects=(EffectSize("V", 0.2222),),
        variables=(V("a", "row", "the row variable"), V("b", "column", "the column variable")),
    ),
    "chi2_goodness_of_fit": Result(
        kind="chi2_goodness_of_fit",
        statistic=Statistic("chi2", 4.2, (3,)),
        p=0.2407,
        n=1256,
        variables=(V("a", "variable", "the category"),),
    ),
    "fisher_exact": Result(
        kind="fisher_exact",
        p=0.0277,
        n=60,
        estimate=Estimate("OR", 3.4502, ci=Interval(CI, 1.0981, 10.8412), ratio=True),
        variables=(V("a", "row", "exposure"), V("b", "column", "outcome")),
    ),
    "anova_oneway": Result(
        kind="anova_oneway",
        statistic=Statistic("F", 4.5123, (2, 97)),
        p=0.01338,
        n=100,
        effects=(EffectSize("eta2", 0.0851), EffectSize("omega2", 0.0655)),
        groups=(
            GroupSummary("A", n=33, mean=3.1, sd=1.0),
            GroupSummary("B", n=33, mean=3.5, sd=1.1),
            GroupSummary("C", n=34, mean=3.8, sd=0.9),
        ),
        variables=(V("score", "outcome", "the score"), V("group", "group", "the groups")),
        details={"variant": "classic"},
    ),
    "anova_term": Result(
        kind="anova_term",
        statistic=Statistic("F", 5.2, (1, 96)),
        p=0.02481,
        effects=(EffectSize("eta2_p", 0.0514),),
        variables=(V("score", "outcome", "the score"),),
        details={"term": "factor A × factor B", "interaction": True, "ss_type": 2},
    ),
    "posthoc_pair": Result(
        kind="posthoc_pair",
        p=0.0121,
        estimate=Estimate("mean difference", 0.7, ci=Interval(CI, 0.1302, 1.2698)),
        groups=(GroupSummary("C"), GroupSummary("A")),
        variables=(V("score", "outcome", "the score"),),
        details={"procedure": "Tukey HSD"},
    ),
    "linear_coefficient": Result(
        kind="linear_coefficient",
        statistic=Statistic("t", 4.2, (196,)),
        p=0.0000406,
        estimate=Estimate("B", 0.42, se=0.1, ci=Interval(CI, 0.2228, 0.6172)),
        effects=(EffectSize("beta", 0.3112),),
        variables=(V("x", "predictor", "x"), V("y", "outcome", "y")),
        details={"adjusted": True},
    ),
    "linear_model": Result(
        kind="linear_model",
        statistic=Statistic("F", 20.6104, (3, 196)),
        p=1.2e-11,
        n=200,
        effects=(EffectSize("R2", 0.2398), EffectSize("R2_adj", 0.2282)),
        variables=(V("y", "outcome", "y"),),
        details={"predictors": "three predictors"},
    ),
    "linear_step": Result(
        kind="linear_step",
        statistic=Statistic("F_change", 6.3, (2, 194)),
        p=0.00221,
        effects=(EffectSize("delta_R2", 0.0498), EffectSize("R2", 0.2896)),
        variables=(V("y", "outcome", "y"),),
        details={"step": 2, "added": "two predictors"},
    ),
    "logistic_coefficient": Result(
        kind="logistic_coefficient",
        statistic=Statistic("z", 2.8333),
        p=0.004607,
        estimate=Estimate("B", 0.85, se=0.3),
        effects=(EffectSize("OR", 2.3396, Interval(CI, 1.2996, 4.2119), ratio=True),),
        variables=(V("x", "predictor", "x"), V("y", "outcome", "the event")),
    ),
    "logistic_model": Result(
        kind="logistic_model",
        statistic=Statistic("chi2", 25.4, (3,)),
        p=0.0000127,
        n=200,
        effects=(EffectSize("R2_nagelkerke", 0.1604),),
        variables=(V("y", "outcome", "the event"),),
    ),
    "mann_whitney": Result(
        kind="mann_whitney",
        statistic=Statistic("U", 512.0),
        p=0.0301,
        n=82,
        effects=(EffectSize("r_rb", 0.2381),),
        groups=(GroupSummary("group A", n=40, median=4.0), GroupSummary("group B", n=42, median=3.0)),
        variables=(V("score", "outcome", "the score"),),
        details={"method": "normal approximation"},
    ),
    "wilcoxon": Result(
        kind="wilcoxon",
        statistic=Statistic("T", 10.5),
        p=0.0195,
        n=12,
        effects=(EffectSize("r_rb", -0.6818),),
        groups=(GroupSummary("condition 1", median=3.0), GroupSummary("condition 2", median=4.5)),
        variables=(V("score", "outcome", "the score"),),
        details={"method": "exact"},
    ),
    "kruskal_wallis": Result(
        kind="kruskal_wallis",
        statistic=Statistic("H", 7.8134, (2,)),
        p=0.02011,
        n=100,
        effects=(EffectSize("epsilon2", 0.0789),),
        variables=(V("score", "outcome", "the score"), V("group", "group", "the groups")),
    ),
    "cronbach_alpha": Result(
        kind="cronbach_alpha",
        n=200,
        effects=(EffectSize("alpha", 0.8412, Interval(CI, 0.8061, 0.8717)),),
        variables=(V("scale", "scale", "the scale"),),
        details={"k_items": 8},
    ),
    "reported": Result(
        kind="reported",
        statistic=Statistic("z", 2.5758),
        p=0.01,
        effects=(EffectSize("d", 0.4127, Interval(CI, 0.1011, 0.7243)),),
    ),
}
