"""Analyses from data: DataFrame columns in, exact unrounded records out.

Each function loads numpy, scipy and pandas when called, never on
``import statsetter``.
"""

import functools as _functools
import inspect as _inspect
from typing import Any as _Any, Callable as _Callable

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



def _with_table_labels(fn: _Callable[..., _Any]) -> _Callable[..., _Any]:
    """Give ``fn`` a keyword ``table_labels``: labels for tables (sentence case,
    may carry a unit: "Maximum heart rate (bpm)") beside ``labels``, the prose
    labels of sentences. Without it a table label is derived from the prose one."""
    from ..records import Result, with_table_labels

    @_functools.wraps(fn)
    def call(*args: _Any, table_labels: "dict[str, str] | None" = None, **kwargs: _Any) -> _Any:
        out = fn(*args, **kwargs)
        if not table_labels:
            return out
        prose = kwargs.get("labels")
        if isinstance(out, Result):
            return with_table_labels(out, table_labels, prose)
        return [with_table_labels(r, table_labels, prose) for r in out]

    signature = _inspect.signature(fn)
    extra = _inspect.Parameter("table_labels", _inspect.Parameter.KEYWORD_ONLY, default=None, annotation="Mapping[str, str] | None")
    call.__signature__ = signature.replace(parameters=[*signature.parameters.values(), extra])  # type: ignore[attr-defined]
    return call


for _name in ("anova_oneway", "chi_square", "goodness_of_fit", "analyse", "correlate", "posthoc", "factorial_anova", "kruskal_wallis",
              "mann_whitney", "wilcoxon_signed_rank", "hierarchical_steps", "linear_regression", "logistic_regression", "cronbach_alpha",
              "t_independent", "t_one_sample", "t_paired"):
    globals()[_name] = _with_table_labels(globals()[_name])
