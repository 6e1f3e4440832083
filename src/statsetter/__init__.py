"""statsetter: statistical results as manuscript-ready text and tables.

The public surface: the record types, styles, StyledText and ``render``.
Importing this package loads neither pingouin, statsmodels nor matplotlib;
analyses load them when they run.
"""

from __future__ import annotations

from .errors import InputError, RecordError, StatsetterError, StyleError, TemplateError
from .records import (
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
from .rendering.sentences import render
from .rendering.styled import StyledText
from .style import Style, builtin_styles, load_style

__version__ = "0.1.0"

__all__ = [
    "Result",
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
