"""Analyses from data: DataFrame columns in, exact unrounded records out.

Each function loads numpy, scipy and pandas when called, never on
``import statsetter``.
"""

from .anova import anova_oneway
from .chisquare import chi_square, goodness_of_fit
from .choose import analyse, level_of
from .correlation import correlate
from .descriptives import Description, describe
from .matrix import CorrelationMatrix, correlation_matrix
from .posthoc import factorial_anova, posthoc
from .ranks import kruskal_wallis, mann_whitney, wilcoxon_signed_rank
from .regression import hierarchical_steps, linear_regression, logistic_regression
from .scales import cronbach_alpha, scale_score
from .ttests import t_independent, t_one_sample, t_paired

__all__ = [
    "analyse",
    "describe",
    "Description",
    "level_of",
    "CorrelationMatrix",
    "correlation_matrix",
    "posthoc",
    "factorial_anova",
    "linear_regression",
    "hierarchical_steps",
    "logistic_regression",
    "kruskal_wallis",
    "mann_whitney",
    "wilcoxon_signed_rank",
    "cronbach_alpha",
    "scale_score",
    "anova_oneway", "chi_square", "goodness_of_fit", "correlate", "t_independent", "t_paired", "t_one_sample"]
