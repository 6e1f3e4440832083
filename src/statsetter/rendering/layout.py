"""``table``: any record, or the records of one analysis, laid out as a
TableModel in a style: a Description as a Table 1, a correlation matrix as
its lower triangle, one regression's records as its coefficients table, one
ANOVA's as its source table, one mixed model's as its fixed and random
effects, model comparisons as a comparison table, any other records one
row each."""

from __future__ import annotations

from collections.abc import Iterable
from typing import TYPE_CHECKING

from ..errors import InputError, RecordError
from ..records import CorrelationMatrix, Description, Record, Result
from .tables import TableModel

if TYPE_CHECKING:
    from ..style.profile import Style

__all__ = ["table"]

_REGRESSION = {"linear_model", "linear_coefficient", "linear_step", "logistic_model", "logistic_coefficient"}


def table(source: "Record | Iterable[Record]", style: "Style | str | None" = None, *, number: int | None = None, title: str | None = None) -> TableModel:
    """The table of ``source`` in ``style`` (default APA 7). Records of one
    regression (model and coefficients) give its coefficients table; the terms
    of one ANOVA its ANOVA table; other results one row per record."""
    if isinstance(source, Description):
        from .descriptive_tables import descriptive_table

        return descriptive_table(source, style, number=number, title=title)
    if isinstance(source, CorrelationMatrix):
        from .correlation_tables import correlation_table

        return correlation_table(source, style, number=number, title=title)
    if not isinstance(source, (Result, Iterable)) or isinstance(source, (str, bytes)):
        raise RecordError("source", f"table takes a record or a list of records (got {type(source).__name__})")
    records = [source] if isinstance(source, Result) else list(source)
    if not records:
        raise InputError("table: no records to lay out")
    if len(records) == 1 and not isinstance(records[0], Result):
        return table(records[0], style, number=number, title=title)
    for i, r in enumerate(records):
        if not isinstance(r, (Result, Description, CorrelationMatrix)):
            raise RecordError(f"records[{i}]", f"not a record (got {type(r).__name__})")
        if not isinstance(r, Result):
            raise InputError(f"table: record {i + 1} is a {r.kind} record; lay it out on its own")
    kinds = {r.kind for r in records}
    if "mixed_model" in kinds and kinds <= {"mixed_model", "linear_coefficient"}:
        from .multilevel_tables import mixed_model_table

        return mixed_model_table(records, style, title=title, number=number)
    if kinds == {"model_comparison"}:
        from .multilevel_tables import comparison_table

        return comparison_table(records, style, title=title, number=number)
    if kinds <= _REGRESSION and kinds & {"linear_coefficient", "logistic_coefficient"}:
        from .regression_tables import regression_table

        return regression_table(records, style, title=title, number=number)
    if kinds == {"anova_term"} or (kinds == {"anova_oneway"} and len(records) == 1):
        from .anova_tables import anova_table

        return anova_table(records, style, title=title, number=number)
    if kinds == {"posthoc_pair"}:
        from .record_tables import posthoc_table

        made = posthoc_table(records, style, title=title or "Pairwise Comparisons")
        return made.with_number(number) if number is not None else made
    from .record_tables import results_table

    made = results_table(records, style, title=title or "Results")
    return made.with_number(number) if number is not None else made
