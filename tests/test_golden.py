"""Golden strings for every template and both forms, in APA 7.

Each entry names the rule of ../shared/REPORTING-RULES.md it follows and that
rule's source. The stats form is compared as markup (so italics and
super/subscripts are checked); the sentence form as plain text.
"""

import pytest

from kind_examples import EXAMPLES
from statsetter import render

GOLDEN = {
    # REPORTING-RULES Statistics in text: (M = 4.22, SD = 0.73), APA 7 ch. 6
    'descriptives_continuous': (
        '<i>M</i> = 4.22, <i>SD</i> = 0.73, <i>n</i> = 120',
        'The mean of the score was 4.22 (SD = 0.73, n = 120).',
    ),
    # REPORTING-RULES Statistics in text: categorical as n (%)
    'descriptives_categorical': (
        'yes, 45 (37.5%); no, 75 (62.5%)',
        'Of the 120 cases with a recorded answer, 45 (37.5%) were yes and 75 (62.5%) were no.',
    ),
    # REPORTING-RULES Statistics in text: r(98) = .32, p = .001 (df = n - 2); CI form APA 7 ch. 6
    'pearson': (
        '<i>r</i>(98) = .32, 95% CI [.13, .49], <i>p</i> = .001',
        'The correlation between the first score and the second score was positive, r(98) = .32, 95% CI [.13, .49], p = .001, n = 100.',
    ),
    # REPORTING-RULES Statistics in text: rs(98), subscript s (practice)
    'spearman': (
        '<i>r</i><sub>s</sub>(98) = .29, 95% CI [.10, .46], <i>p</i> = .003',
        'The Spearman rank correlation between the first rank and the second rank was positive, rₛ(98) = .29, 95% CI [.10, .46], p = .003, n = 100.',
    ),
    # REPORTING-RULES Symbols: Greek roman (APA 7 §6.45); leading zero dropped (APA 7 §6.36)
    'kendall': (
        'τ<sub>b</sub> = −.21, <i>p</i> = .003',
        "Kendall's rank correlation between the first rank and the second rank was negative, τ_b = −.21, p = .003, n = 100.",
    ),
    # REPORTING-RULES Statistics in text: t(38) = 2.14, p = .039, d = 0.68, 95% CI [0.04, 1.31] (APA 7 ch. 6)
    't_independent': (
        '<i>t</i>(38) = 2.14, <i>p</i> = .039, <i>d</i> = 0.68, 95% CI [0.04, 1.31]',
        "The score was higher in group A (M = 4.10, SD = 0.90, n = 20) than in group B (M = 3.50, SD = 0.88, n = 20); the mean difference was 0.60, 95% CI [0.03, 1.18], Student's t(38) = 2.14, p = .039, d = 0.68, 95% CI [0.04, 1.31].",
    ),
    # REPORTING-RULES Numbers: true minus U+2212 (practice); t test form (APA 7 ch. 6)
    't_paired': (
        '<i>t</i>(9) = −4.06, <i>p</i> = .003, <i>d</i><sub>z</sub> = −1.28, 95% CI [−2.10, −0.43]',
        'Extra sleep was lower in condition 1 (M = 0.75, SD = 1.79) than in condition 2 (M = 2.33, SD = 2.00) in 10 pairs; the mean difference was −1.58, 95% CI [−2.46, −0.70], t(9) = −4.06, p = .003, d_z = −1.28, 95% CI [−2.10, −0.43].',
    ),
    # REPORTING-RULES Numbers: a CI limit just below 0 keeps a digit (practice); p = .051 stays above .05
    't_one_sample': (
        '<i>t</i>(49) = 2.00, <i>p</i> = .051, <i>d</i> = 0.28, 95% CI [−0.001, 0.56]',
        # p = .051: no direction asserted; compatible with no difference at alpha (ASA statement, Wasserstein & Lazar, 2016)
        'The mean of the score (M = 4.20, SD = 0.71, n = 50) was compared with the test value of 4.00; the difference was 0.20, 95% CI [−0.001, 0.40], t(49) = 2.00, p = .051, d = 0.28, 95% CI [−0.001, 0.56], compatible with no difference at α = .05.',
    ),
    # REPORTING-RULES Statistics in text: χ²(2, N = 200) = 9.87, p = .007, V = .22 (APA 7 ch. 6)
    'chi2_independence': (
        'χ<sup>2</sup>(2, <i>N</i> = 200) = 9.87, <i>p</i> = .007, <i>V</i> = .22',
        'A chi-square test of independence of the row variable and the column variable gave χ²(2, N = 200) = 9.87, p = .007, V = .22.',
    ),
    # REPORTING-RULES Numbers: N = 1,256 grouped (APA 7 §6.38)
    'chi2_goodness_of_fit': (
        'χ<sup>2</sup>(3, <i>N</i> = 1,256) = 4.20, <i>p</i> = .241',
        'A chi-square goodness-of-fit test of the category against the expected proportions gave χ²(3, N = 1,256) = 4.20, p = .241.',
    ),
    # REPORTING-RULES Symbols: OR roman (APA 7 §6.45); CI form (APA 7 ch. 6)
    'fisher_exact': (
        '<i>p</i> = .028, OR = 3.45, 95% CI [1.10, 10.84]',
        "Fisher's exact test of exposure and outcome (N = 60) gave p = .028, OR = 3.45, 95% CI [1.10, 10.84].",
    ),
    # REPORTING-RULES Statistics in text: F(2, 97) = 4.51, p = .013, η² = .09 (APA 7 ch. 6); the serial comma in a list of
    # three or more, "B (…), and C (…)" (REPORTING-RULES Wording, APA 7 §6.3)
    'anova_oneway': (
        '<i>F</i>(2, 97) = 4.51, <i>p</i> = .013, η<sup>2</sup> = .09, ω<sup>2</sup> = .07',
        'A one-way analysis of variance of the score across the groups gave F(2, 97) = 4.51, p = .013, η² = .09, ω² = .07. Group means were A (M = 3.10, SD = 1.00, n = 33), B (M = 3.50, SD = 1.10, n = 33), and C (M = 3.80, SD = 0.90, n = 34).',
    ),
    # REPORTING-RULES Symbols: η²p with subscript p, real super/subscript (APA 7 §6.45)
    'anova_term': (
        '<i>F</i>(1, 96) = 5.20, <i>p</i> = .025, η<sup>2</sup><sub>p</sub> = .05',
        'The factor A × factor B interaction on the score gave F(1, 96) = 5.20, p = .025, η²ₚ = .05 (Type II sums of squares).',
    ),
    # REPORTING-RULES Statistics in text: post hoc comparisons name the procedure and the pair
    'posthoc_pair': (
        '<i>M</i><sub>diff</sub> = 0.70, 95% CI [0.13, 1.27], <i>p</i> = .012',
        'C and A differed in the score by 0.70, 95% CI [0.13, 1.27] (Tukey HSD, adjusted p = .012).',
    ),
    # REPORTING-RULES Statistics in text: B, SE, β, t, p, CI for B (APA 7 ch. 6)
    'linear_coefficient': (
        '<i>B</i> = 0.42, 95% CI [0.22, 0.62], <i>SE</i> = 0.10, β = .31, <i>t</i>(196) = 4.20, <i>p</i> &lt; .001',
        'Higher values of x were associated with higher values of y, holding the other predictors constant, B = 0.42, 95% CI [0.22, 0.62], SE = 0.10, β = .31, t(196) = 4.20, p < .001.',
    ),
    # REPORTING-RULES Statistics in text: R² = .24, F(3, 196) = 20.61, p < .001 (APA 7 ch. 6)
    'linear_model': (
        '<i>R</i><sup>2</sup> = .24, adjusted <i>R</i><sup>2</sup> = .23, <i>F</i>(3, 196) = 20.61, <i>p</i> &lt; .001',
        'A linear regression of y on three predictors (N = 200) gave R² = .24, adjusted R² = .23, F(3, 196) = 20.61, p < .001.',
    ),
    # REPORTING-RULES Numbers: ΔR² bounded, no leading zero (APA 7 §6.36)
    'linear_step': (
        'Δ<i>R</i><sup>2</sup> = .05, Δ<i>F</i>(2, 194) = 6.30, <i>p</i> = .002',
        'Adding two predictors at step 2 changed the explained variance in y by ΔR² = .05, ΔF(2, 194) = 6.30, p = .002, to R² = .29.',
    ),
    # REPORTING-RULES Statistics in text: effect sizes with CIs (JARS-Quant Table 1)
    'logistic_coefficient': (
        '<i>B</i> = 0.85, <i>SE</i> = 0.30, OR = 2.34, 95% CI [1.30, 4.21], <i>z</i> = 2.83, <i>p</i> = .005',
        'Higher values of x were associated with higher odds of the event, B = 0.85, SE = 0.30, OR = 2.34, 95% CI [1.30, 4.21], z = 2.83, p = .005.',
    ),
    # REPORTING-RULES p values: below .001 write p < .001 (APA 7 §6.36)
    'logistic_model': (
        'χ<sup>2</sup>(3, <i>N</i> = 200) = 25.40, <i>p</i> &lt; .001, Nagelkerke <i>R</i><sup>2</sup> = .16',
        'A logistic regression of the event gave a likelihood-ratio χ²(3, N = 200) = 25.40, p < .001, Nagelkerke R² = .16.',
    ),
    # REPORTING-RULES Statistics in text: say which test/approximation (practice)
    'mann_whitney': (
        '<i>U</i> = 512, <i>p</i> = .030, <i>r</i><sub>rb</sub> = .24',
        'The score tended to be higher in group A (Mdn = 4.00, n = 40) than in group B (Mdn = 3.00, n = 42), Mann–Whitney U = 512, p = .030, r_rb = .24 (normal approximation).',
    ),
    # REPORTING-RULES Statistics in text: say which test/approximation (practice)
    'wilcoxon': (
        '<i>T</i> = 10.5, <i>p</i> = .020, <i>r</i><sub>rb</sub> = −.68',
        'The score tended to be lower in condition 1 (Mdn = 3.00) than in condition 2 (Mdn = 4.50) in 12 pairs, Wilcoxon signed-rank T = 10.5, p = .020, r_rb = −.68 (exact).',
    ),
    # REPORTING-RULES Symbols: ε² Greek roman (APA 7 §6.45)
    'kruskal_wallis': (
        '<i>H</i>(2) = 7.81, <i>p</i> = .020, ε<sup>2</sup> = .08',
        'A Kruskal–Wallis test of the score across the groups gave H(2) = 7.81, p = .020, ε² = .08.',
    ),
    # REPORTING-RULES Reporting by test: chi-square with df and N (APA 7 §6.43); the OR is roman (APA 7 §6.45); the variant named (practice)
    'mcnemar': (
        'χ<sup>2</sup>(1, <i>N</i> = 80) = 20.02, <i>p</i> &lt; .001, OR = 5.00, 95% CI [2.31, 12.37]',
        "Of 80 pairs, 20 (25.0%) were “yes” at before and 52 (65.0%) at after; McNemar's test (chi-square with continuity correction) "
        "gave χ²(1, N = 80) = 20.02, p < .001, OR = 5.00, 95% CI [2.31, 12.37].",
    ),
    # REPORTING-RULES Symbols: Latin statistical symbols italic (APA 7 §6.45): Q
    'cochran_q': (
        '<i>Q</i>(2) = 6.71, <i>p</i> = .035',
        "Cochran's Q test of one proportion across 3 measurements of 20 people gave Q(2) = 6.71, p = .035. "
        "The counts of “energetic” were Monday 6 (30.0%), Wednesday 13 (65.0%), and Friday 14 (70.0%).",
    ),
    # REPORTING-RULES Numbers: Kendall's W cannot exceed 1, no leading zero (APA 7 §6.36)
    'friedman': (
        'χ<sup>2</sup>(2) = 11.14, <i>p</i> = .004, <i>W</i> = .25',
        "A Friedman test of 3 related measurements of 22 people gave χ²(2) = 11.14, p = .004, W = .25. Medians were round out "
        "(Mdn = 5.50, IQR = [5.41, 5.65]), narrow angle (Mdn = 5.53, IQR = [5.46, 5.60]), and wide angle (Mdn = 5.45, IQR = [5.35, 5.55]).",
    ),
    # REPORTING-RULES Reporting by test: corrected df with ε (practice); η²G with its subscript; ε Greek roman (APA 7 §6.45)
    'anova_rm': (
        '<i>F</i>(2.08, 16.66) = 5.20, <i>p</i> = .017, ε = .69, η<sup>2</sup><sub>G</sub> = .35',
        "A repeated-measures ANOVA of the mood score across 2 measurements of 9 people (Greenhouse–Geisser correction) gave "
        "F(2.08, 16.66) = 5.20, p = .017, ε = .69, η²_G = .35. The means were before (M = 4.13, SD = 0.48) and after a week (M = 4.29, SD = 1.50).",
    ),
    # REPORTING-RULES Regression: B with its CI, SE, t, p (docs/reporting-rules.md); a simple slope says at which moderator value (practice)
    'simple_slope': (
        '<i>B</i> = −0.06, 95% CI [−0.08, −0.04], <i>SE</i> = 0.01, <i>t</i>(28) = −5.66, <i>p</i> &lt; .001',
        "At weight = 2.24 (the mean − 1 SD), the slope of fuel economy on horsepower was B = −0.06, 95% CI [−0.08, −0.04], SE = 0.01, "
        "t(28) = −5.66, p < .001.",
    ),
    # REPORTING-RULES Regression: B with its CI, SE, t, p; a mediation path named (a, b, c, c′) and worded as an association (practice)
    'mediation_path': (
        '<i>B</i> = 0.56, 95% CI [0.37, 0.75], <i>SE</i> = 0.09, <i>t</i>(98) = 5.94, <i>p</i> &lt; .001',
        "Path a, from training hours to self-efficacy, was B = 0.56, 95% CI [0.37, 0.75], SE = 0.09, t(98) = 5.94, p < .001.",
    ),
    # REPORTING-RULES Confidence intervals: the indirect effect with its bootstrap CI, resamples and seed stated (practice)
    'mediation_indirect': (
        '<i>ab</i> = 0.36, 95% CI [0.22, 0.54]',
        "The indirect effect of training hours on performance through self-efficacy was ab = 0.36, 95% CI [0.22, 0.54] "
        "(percentile bootstrap, 5,000 resamples, seed 20240601); the interval excludes zero.",
    ),
    # REPORTING-RULES Descriptives: M with its CI and SE; the adjustment said (practice)
    'adjusted_mean': (
        '<i>M</i> = 23.78, 95% CI [18.33, 29.24], <i>SE</i> = 2.68',
        "The adjusted mean of the score for method A, at income = 48.8, was M = 23.78, 95% CI [18.33, 29.24], SE = 2.68.",
    ),
    # REPORTING-RULES Numbers: an ICC cannot exceed 1, no leading zero (APA 7 §6.36); the estimation method said (practice)
    'mixed_model': (
        'ICC = .43',
        "A linear mixed model of the distance with a random intercept for children (27 groups), estimated by REML (N = 108), had a "
        "log-likelihood of −218.76 (AIC = 447.51, BIC = 460.78). The intraclass correlation of the intercept-only model was ICC = .43.",
    ),
    # REPORTING-RULES Reporting by test: chi-square with its df (APA 7 §6.43); the test named (practice)
    'model_comparison': (
        'χ<sup>2</sup>(1) = 8.53, <i>p</i> = .003',
        "Adding sex to the model of the distance gave χ²(1) = 8.53, p = .003 (likelihood-ratio test; AIC 451.39 and 444.86).",
    ),
    # REPORTING-RULES Numbers: α drops the leading zero (APA 7 §6.36)
    'cronbach_alpha': (
        'α = .84, 95% CI [.81, .87]',
        "Internal consistency of the scale (8 items, N = 200) was Cronbach's α = .84, 95% CI [.81, .87].",
    ),
    # REPORTING-RULES Numbers: p exact to three decimals, d with its CI (APA 7 §6.36, JARS)
    'reported': (
        '<i>z</i> = 2.58, <i>p</i> = .010, <i>d</i> = 0.41, 95% CI [0.10, 0.72]',
        'z = 2.58, p = .010, d = 0.41, 95% CI [0.10, 0.72].',
    ),
}


@pytest.mark.parametrize("kind", sorted(GOLDEN))
def test_golden(kind):
    stats, sentence = GOLDEN[kind]
    record = EXAMPLES[kind]
    assert render(record, "stats").markup().replace("\u00a0", " ") == stats  # no-break spaces: tests/test_keep_together.py
    assert render(record, "sentence").plain() == sentence
