"""Result objects from scipy, pingouin and statsmodels → records.

``to_records(obj)`` reads what the object holds. What it lacks (group means
and SDs, effect sizes, n, labels) comes from the data when they are passed
alongside — ``data=`` and ``columns=`` (the column arguments of the matching
statsetter analysis), or ``samples=`` (the arrays the library function was
given) — and every record says which parts are absent otherwise. Nothing is
guessed: where an object does not say which function made it, ``source=``
must.
"""

from __future__ import annotations

from typing import TYPE_CHECKING, Any, Mapping, Sequence

from ..errors import InputError
from ..records import Result
from ._core import Adapter, Context, frame_from_samples, merge

if TYPE_CHECKING:
    import pandas as pd

__all__ = ["to_records", "supported"]


def _registry() -> dict[str, Adapter]:
    from . import pingouin_frames, scipy_results, statsmodels_results

    return {**scipy_results.ADAPTERS, **pingouin_frames.ADAPTERS, **statsmodels_results.ADAPTERS}


def supported() -> list[str]:
    """The library functions whose results ``to_records`` reads."""
    return sorted(_registry())


def _identify(obj: Any, source: str | None) -> Adapter:
    registry = _registry()
    if source is not None:
        wanted = source if source in registry else next((k for k in registry if k.rsplit(".", 1)[-1] == source), None)
        if wanted is None:
            raise InputError(f"source: {source!r} is not supported; supported: {', '.join(sorted(registry))}")
        return registry[wanted]
    from . import pingouin_frames, scipy_results, statsmodels_results

    cls = type(obj).__name__
    module = type(obj).__module__ or ""
    if module.startswith("scipy"):
        if cls in scipy_results.BY_CLASS:
            return registry[scipy_results.BY_CLASS[cls]]
        if cls in scipy_results.SHARED_CLASS:
            names = scipy_results.SHARED_CLASS[cls]
            raise InputError(f"a scipy {cls} does not say which function made it; pass source= one of {', '.join(names)}")
    found = statsmodels_results.identify(obj) or pingouin_frames.identify(obj)
    if found is not None:
        return registry[found]
    raise InputError(f"cannot read a {module}.{cls} object; supported: {', '.join(sorted(registry))}")


def to_records(
    obj: Any,
    source: str | None = None,
    *,
    data: "pd.DataFrame | None" = None,
    columns: Mapping[str, Any] | None = None,
    samples: Sequence[Any] | None = None,
    groups: Sequence[str] | None = None,
    labels: Mapping[str, str] | None = None,
    n: int | None = None,
    level: float = 0.95,
    **options: Any,
) -> list[Result]:
    """Records from a scipy, pingouin or statsmodels result.

    ``options`` are what the object does not record but the reading needs:
    ``mu`` (one-sample t), ``yates`` (2 × 2 chi-square), ``variant``
    (``"welch"``/``"student"``), ``kind`` (pingouin's ttest: ``t_independent``,
    ``t_paired`` or ``t_one_sample``), ``ss_type``, ``df``, ``method``,
    ``alternative``, ``k_items``.
    """
    adapter = _identify(obj, source)
    if data is not None and samples is not None:
        raise InputError("give data= with columns=, or samples=, not both")
    if data is not None and not columns:
        raise InputError("data= needs columns=, the column arguments of the matching analysis (e.g. {'outcome': 'y', 'group': 'g'})")
    ctx = Context(adapter.name, data, dict(columns or {}), samples, groups, dict(labels or {}), n, level, dict(options))
    mine = _named(adapter.build(obj, ctx), ctx)
    if not ctx.has_data or adapter.analysis is None:
        _ask_for_names(mine, adapter.name)
        return mine
    if samples is not None:
        if adapter.design is None:
            raise InputError(f"{adapter.name}: pass data= and columns=, not samples=")
        frame, cols = frame_from_samples(adapter.design, samples, groups)
        # labels may name the roles ("outcome", "group", "x" ...) of the columns made from the samples
        ctx.labels = {**ctx.labels, **{cols[role]: text for role, text in ctx.labels.items() if isinstance(cols.get(role), str)}}
    else:
        frame, cols = data, dict(columns or {})  # type: ignore[assignment]
    try:
        ours = adapter.analysis(frame, cols, ctx, mine)
    except KeyError as exc:
        raise InputError(f"columns: {adapter.name} needs the column argument {exc.args[0]!r}") from None
    return merge(mine, ours, ctx, adapter.library, adapter.key, adapter.leading)


# The roles each kind's sentence names; an object that carries no names gets them from labels=.
_ROLES = {
    "pearson": ("x", "y"), "spearman": ("x", "y"), "kendall": ("x", "y"),
    "t_independent": ("outcome",), "t_paired": ("outcome",), "t_one_sample": ("outcome",), "mann_whitney": ("outcome",),
    "wilcoxon": ("outcome",), "kruskal_wallis": ("outcome", "group"), "anova_oneway": ("outcome", "group"), "posthoc_pair": ("outcome",),
    "chi2_independence": ("row", "column"), "fisher_exact": ("row", "column"), "chi2_goodness_of_fit": ("variable",),
    "linear_model": ("outcome",), "logistic_model": ("outcome",), "linear_coefficient": ("predictor", "outcome"),
    "logistic_coefficient": ("predictor", "outcome"),
}


def _named(records: list[Result], ctx: Context) -> list[Result]:
    """Variables the object does not name, from ``labels=`` keyed by role
    ("x", "y", "outcome", "group", "row", "column", "predictor")."""
    from dataclasses import replace

    from ..records import Variable

    from ..records import GroupSummary

    out = []
    for r in records:
        have = {v.role for v in r.variables}
        extra = tuple(Variable(role, ctx.labels[role], role) for role in _roles(r) if role not in have and role in ctx.labels)
        if extra:
            r = replace(r, variables=r.variables + extra)
        if ctx.groups and not r.groups and ctx.samples is None and r.kind in _TWO_GROUPS:
            if len(ctx.groups) != 2:
                raise InputError(f"groups: {len(ctx.groups)} name(s) given; a {r.kind.replace('_', ' ')} compares two groups")
            r = replace(r, groups=tuple(GroupSummary(str(g)) for g in ctx.groups))  # names only: the object has no group numbers
        out.append(r)
    return out


_TWO_GROUPS = frozenset({"t_independent", "t_paired", "mann_whitney", "wilcoxon"})


def _roles(r: Result) -> tuple[str, ...]:
    """The roles a record's sentence names (an intercept names no predictor)."""
    roles = _ROLES.get(r.kind, ())
    return tuple(x for x in roles if x != "predictor") if r.details.get("intercept") else roles


def _ask_for_names(records: list[Result], source: str) -> None:
    """A warning when a sentence would have to say "the outcome" or "the first variable"."""
    import warnings

    missing = sorted({role for r in records for role in _roles(r) if role not in {v.role for v in r.variables}})
    if missing:
        example = ", ".join(f"{role!r}: '...'" for role in missing)
        warnings.warn(f"{source}: the result does not name its variables; pass labels={{{example}}} so that sentences name them", stacklevel=3)
