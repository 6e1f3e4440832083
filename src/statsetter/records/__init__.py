"""The hub: every source ends in a record, every sink starts from one.

:class:`Result` is one statistical result (a test, a coefficient, a model's
fit); :class:`Description` is a Table 1's numbers; :class:`CorrelationMatrix`
is every pair of a set of variables. All three are frozen, hold exact
unrounded numbers and round-trip through JSON (``dump_records`` /
``load_records``) with a schema version.
"""

from .collection import Records
from .exchange import Record, dump_records, load_records, record_from_dict
from .naming import ID_PATTERN, name_records, record_key
from .result import (
    SCHEMA,
    SCHEMA_VERSION,
    Alternative,
    EffectSize,
    Estimate,
    GroupSummary,
    Interval,
    Note,
    Provenance,
    Result,
    Statistic,
    Variable,
    prose_label,
    table_label,
    with_table_labels,
)
from .summaries import ADJUST_NAMES, CorrelationMatrix, Description, LevelReport, VariableSummary

__all__ = [
    "SCHEMA", "SCHEMA_VERSION", "Alternative", "Record", "Records", "Result", "Statistic", "Interval", "Estimate", "EffectSize",
    "GroupSummary", "Variable", "Note", "Provenance", "prose_label", "table_label", "with_table_labels",
    "Description", "VariableSummary", "CorrelationMatrix", "LevelReport", "ADJUST_NAMES",
    "dump_records", "load_records", "record_from_dict", "name_records", "record_key", "ID_PATTERN",
]
