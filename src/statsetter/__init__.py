"""statsetter: statistical results as manuscript-ready text and tables.

The public surface: the record types, styles, StyledText, ``render`` (a
record as text), ``table`` (records as a table) and ``figure`` (records as
a figure, drawn by ``statsetter.export.figure_files`` with matplotlib).
Importing this package loads neither pingouin, statsmodels nor matplotlib;
analyses load them when they run.
"""

from __future__ import annotations

from .errors import InputError, RecordError, StatsetterError, StyleError, TemplateError
from .records import (
    CorrelationMatrix,
    Description,
    EffectSize,
    Estimate,
    GroupSummary,
    Interval,
    Note,
    Provenance,
    Result,
    Statistic,
    Variable,
    dump_records,
    load_records,
)
from .rendering.figures import figure
from .rendering.layout import table
from .rendering.sentences import render
from .styled import StyledText
from .style import Style, builtin_styles, load_style

from ._version import __version__

__all__ = [
    "Result",
    "Description",
    "CorrelationMatrix",
    "Statistic",
    "Interval",
    "Estimate",
    "EffectSize",
    "GroupSummary",
    "Variable",
    "Note",
    "Provenance",
    "dump_records",
    "load_records",
    "render",
    "table",
    "figure",
    "StyledText",
    "Style",
    "load_style",
    "builtin_styles",
    "StatsetterError",
    "RecordError",
    "StyleError",
    "TemplateError",
    "InputError",
    "__version__",
]
