"""Analyses from data: DataFrame columns in, exact unrounded records out.

Every function here returns :class:`~statsetter.records.Records`: a list of
records, the main one first (a test; a model, then its coefficients; a
Description; a correlation matrix, then its pairs). The shared keywords:
``variant`` (which form of a test: welch/student, classic/welch,
pearson/yates, auto/exact/asymptotic), ``adjust`` (the multiple-comparison
procedure), ``alternative`` (two-sided, less, greater), ``level`` (the CI's),
``labels`` and ``table_labels`` (prose and table names of the variables).
Paired tests take wide columns (``first``, ``second``) or long data
(``outcome``, ``subject``, ``within``).

Each function loads numpy, scipy and pandas when called, never on
``import statsetter``.
"""

import functools as _functools
import inspect as _inspect
import warnings as _warnings
from collections.abc import Mapping as _Mapping
from typing import Any as _Any, Callable as _Callable

from ..errors import FormerUse as _FormerUse
from ._arguments import checked as _checked, refuse as _refuse, rules as _rules
from . import anova as _anova, chisquare as _chisquare, choose as _choose, correlation as _correlation, descriptives as _descriptives
from . import matrix as _matrix, posthoc as _posthoc, ranks as _ranks, regression as _regression, repeated as _repeated, scales as _scales
from . import ancova as _ancova, mediation as _mediation, multilevel as _multilevel, moderation as _moderation, ttests as _ttests
from .choose import level_of
from .scales import scale_score

# Former keyword names, accepted for one release with a warning: {function: {old: new}}.
RENAMED: dict[str, dict[str, str]] = {
    "posthoc": {"procedure": "adjust"},
    "chi_square": {"yates": "variant"},
    "mann_whitney": {"method": "variant"},
    "wilcoxon_signed_rank": {"method": "variant"},
    "correlation_matrix": {"method": "coefficient"},
    "correlate": {"method": "coefficient"},
    "describe": {"by": "group", "tests": "compare"},
}
_VALUES = {("chi_square", "yates"): lambda v: ("yates" if v else "pearson") if isinstance(v, bool) else v}


def renamed_value(function: str, old: str, value: _Any) -> _Any:
    """The value a former keyword's value stands for under its new name (``yates=True`` -> ``variant="yates"``)."""
    return _VALUES.get((function, old), lambda v: v)(value)


def _public(fn: _Callable[..., _Any]) -> _Callable[..., _Any]:
    """``fn`` returning Records, taking ``table_labels`` (labels for tables:
    sentence case, may carry a unit) and, for one release, its former keywords."""
    from ..records import Records, Result, with_table_labels

    name = fn.__name__
    renamed = RENAMED.get(name, {})
    own = _inspect.signature(fn)
    kinds: dict[str, _Any] = {}  # each parameter's kind, read on the first call (not on import)

    @_functools.wraps(fn)
    def call(*args: _Any, table_labels: "dict[str, str] | None" = None, **kwargs: _Any) -> Records:
        for old, new in renamed.items():
            if old in kwargs:
                if new in kwargs:
                    raise TypeError(f"{name}: {old}= is the former name of {new}=; give one of them")
                _warnings.warn(f"{name}: {old}= is now {new}=", _FormerUse, stacklevel=2)
                kwargs[new] = renamed_value(name, old, kwargs.pop(old))
        if name == "posthoc" and len(args) == 4:  # the procedure was once the fourth positional argument
            _warnings.warn("posthoc: give the procedure as adjust=", _FormerUse, stacklevel=2)
            args, kwargs["adjust"] = args[:3], args[3]
        if name == "correlate" and len(args) == 4:
            _warnings.warn("correlate: give the coefficient as coefficient=", _FormerUse, stacklevel=2)
            args, kwargs["coefficient"] = args[:3], args[3]
        if not kinds:
            kinds.update(_rules(fn))
        args, kwargs = _checked(name, own, kinds, args, kwargs)
        if table_labels is not None and not isinstance(table_labels, _Mapping):
            _refuse(name, "table_labels", "must be a mapping (a dict)", table_labels)
        out = fn(*args, **kwargs)
        found = list(out) if isinstance(out, (list, tuple)) else [out]
        if name == "correlation_matrix":
            found += out.pairs()
        if table_labels:
            found = [with_table_labels(r, table_labels, kwargs.get("labels")) if isinstance(r, Result) else r for r in found]
        return Records(found)

    signature = own
    extra = _inspect.Parameter("table_labels", _inspect.Parameter.KEYWORD_ONLY, default=None, annotation="Mapping[str, str] | None")
    call.__signature__ = signature.replace(  # type: ignore[attr-defined]
        parameters=[*signature.parameters.values(), extra], return_annotation="Records")
    return call


analyse = _public(_choose.analyse)
anova_oneway = _public(_anova.anova_oneway)
chi_square = _public(_chisquare.chi_square)
fisher_exact = _public(_chisquare.fisher_exact)
goodness_of_fit = _public(_chisquare.goodness_of_fit)
correlate = _public(_correlation.correlate)
pearson = _public(_correlation.pearson)
spearman = _public(_correlation.spearman)
kendall = _public(_correlation.kendall)
correlation_matrix = _public(_matrix.correlation_matrix)
describe = _public(_descriptives.describe)
posthoc = _public(_posthoc.posthoc)
factorial_anova = _public(_posthoc.factorial_anova)
kruskal_wallis = _public(_ranks.kruskal_wallis)
mann_whitney = _public(_ranks.mann_whitney)
wilcoxon_signed_rank = _public(_ranks.wilcoxon_signed_rank)
mcnemar = _public(_repeated.mcnemar)
cochran_q = _public(_repeated.cochran_q)
friedman = _public(_repeated.friedman)
rm_anova = _public(_repeated.rm_anova)
mixed_anova = _public(_repeated.mixed_anova)
moderation = _public(_moderation.moderation)
mediation = _public(_mediation.mediation)
ancova = _public(_ancova.ancova)
mixed_model = _public(_multilevel.mixed_model)
compare_models = _public(_multilevel.compare_models)
linear_regression = _public(_regression.linear_regression)
hierarchical_steps = _public(_regression.hierarchical_steps)
logistic_regression = _public(_regression.logistic_regression)
cronbach_alpha = _public(_scales.cronbach_alpha)
t_independent = _public(_ttests.t_independent)
t_paired = _public(_ttests.t_paired)
t_one_sample = _public(_ttests.t_one_sample)

__all__ = [
    "analyse", "describe", "level_of", "correlation_matrix", "correlate", "pearson", "spearman", "kendall",
    "t_independent", "t_paired", "t_one_sample", "mann_whitney", "wilcoxon_signed_rank", "kruskal_wallis",
    "mcnemar", "cochran_q", "friedman", "rm_anova", "mixed_anova", "moderation", "mediation", "ancova", "mixed_model", "compare_models",
    "anova_oneway", "posthoc", "factorial_anova", "chi_square", "fisher_exact", "goodness_of_fit",
    "linear_regression", "hierarchical_steps", "logistic_regression", "cronbach_alpha", "scale_score", "RENAMED",
]
