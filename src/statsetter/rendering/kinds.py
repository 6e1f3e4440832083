"""The result kinds the renderer knows, each with its template and a short
description. A new kind is a line here and a template in templates/en/."""

from __future__ import annotations

KINDS: dict[str, str] = {
    "descriptives_continuous": "mean, SD and median of a continuous variable",
    "descriptives_categorical": "counts and percentages of a categorical variable",
    "pearson": "Pearson correlation r",
    "spearman": "Spearman rank correlation rs",
    "kendall": "Kendall rank correlation tau-b",
    "t_independent": "independent-samples t test (details.variant: welch or student)",
    "t_paired": "paired-samples t test",
    "t_one_sample": "one-sample t test (details.mu: the test value)",
    "chi2_independence": "chi-square test of independence",
    "chi2_goodness_of_fit": "chi-square goodness-of-fit test",
    "fisher_exact": "Fisher's exact test for a 2 x 2 table",
    "anova_oneway": "one-way ANOVA (details.variant: classic or welch)",
    "anova_term": "one term of a factorial ANOVA (details.term, details.ss_type)",
    "posthoc_pair": "one post hoc comparison (details.procedure)",
    "linear_coefficient": "one coefficient of a linear regression",
    "linear_model": "a linear regression model as a whole",
    "linear_step": "a step of a hierarchical linear regression",
    "mediation_path": "one path of a simple mediation model (details.path: a, b, c or c′)",
    "mediation_indirect": "the indirect effect a·b of a mediation with its bootstrap CI (details.n_boot, seed, method)",
    "adjusted_mean": "an ANCOVA's adjusted (estimated marginal) mean of one group at the covariate means",
    "mixed_model": "a linear mixed model as a whole (details: method, groups, log_likelihood, aic, bic, variances; ICC)",
    "model_comparison": "a likelihood-ratio test of nested models fitted by ML (details.added)",
    "simple_slope": "a predictor's slope at one value of a moderator (details.moderator_value, details.at)",
    "logistic_coefficient": "one coefficient of a logistic regression",
    "logistic_model": "a logistic regression model as a whole",
    "mann_whitney": "Mann-Whitney U test",
    "wilcoxon": "Wilcoxon signed-rank test",
    "kruskal_wallis": "Kruskal-Wallis H test",
    "mcnemar": "McNemar's test of a binary outcome measured twice (details.method: exact or chi-square, corrected or not)",
    "cochran_q": "Cochran's Q test of a binary outcome measured k times",
    "friedman": "Friedman's test of k related measurements, with Kendall's W",
    "anova_rm": "one-way repeated-measures ANOVA with sphericity correction (details.correction, epsilon)",
    "cronbach_alpha": "Cronbach's alpha of a scale",
    "reported": "a statistic as a manuscript reports it (read by the audit): statistic, p, effect sizes",
}

FORMS: tuple[str, ...] = ("stats", "sentence")
