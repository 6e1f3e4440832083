"""The public analyses' arguments checked against the kinds their signatures
name, before any work: a wrong kind is an InputError naming the function and
the argument ("t_independent: level must be a number (got str 'x')"), not
Python's own message from deep inside pandas or numpy. Column names are
left to the lookup that names a missing column; one name given where a list
of names is wanted is a list of one (``covariates="age"``)."""

from __future__ import annotations

import inspect
import math
from collections.abc import Iterable, Mapping
from numbers import Integral, Real
from typing import Any

from ..errors import InputError

_NUMBER = {"float", "float | None"}
_WHOLE = {"int", "int | None"}
_NAMES = {"Sequence[str]", "Sequence[str] | None"}


def _problem(annotation: str, value: Any) -> str:
    """What is wrong with ``value`` for a parameter annotated ``annotation`` ("" when nothing is)."""
    if value is None and annotation.endswith("| None"):
        return ""
    if annotation == "'pd.DataFrame'":
        return "" if type(value).__name__ == "DataFrame" and hasattr(value, "columns") else "must be a pandas DataFrame"
    if annotation in _NUMBER:
        if isinstance(value, bool) or not isinstance(value, Real):
            return "must be a number"
        return "" if math.isfinite(value) else "must be a finite number"
    if annotation in _WHOLE:
        return "" if isinstance(value, Integral) and not isinstance(value, bool) else "must be a whole number"
    if annotation == "bool":
        return "" if isinstance(value, bool) or type(value).__name__ == "bool_" else "must be True or False"
    if annotation in _NAMES or annotation == "Sequence[Sequence[str]]":
        return "" if isinstance(value, Iterable) and not isinstance(value, Mapping) else "must be a list of column names"
    if annotation == "Sequence[float] | None":
        if not isinstance(value, Iterable) or isinstance(value, (str, bytes)):
            return "must be a list of numbers"
        return "" if all(isinstance(v, Real) and not isinstance(v, bool) for v in value) else "must be a list of numbers"
    if annotation.startswith("Mapping["):
        return "" if isinstance(value, Mapping) else "must be a mapping (a dict)"
    return ""


def checked(name: str, signature: inspect.Signature, args: tuple[Any, ...], kwargs: dict[str, Any]) -> tuple[tuple[Any, ...], dict[str, Any]]:
    """``args`` and ``kwargs`` for the function ``name`` of ``signature``, each checked against its annotation; a
    missing or unknown argument keeps Python's own TypeError, which names it."""
    bound = signature.bind(*args, **kwargs)
    for param, value in bound.arguments.items():
        annotation = signature.parameters[param].annotation
        if not isinstance(annotation, str):
            continue
        problem = _problem(annotation, value)
        if not problem and param.endswith("level") and value is not None and not 0 < value < 1:
            problem = "must lie between 0 and 1 (0.95 for a 95% interval)"
        if problem:
            shown = repr(value)
            shown = shown if len(shown) <= 40 else shown[:37] + "..."
            raise InputError(f"{name}: {param} {problem} (got {type(value).__name__} {shown})")
        if annotation in _NAMES and isinstance(value, str):
            bound.arguments[param] = [value]  # one column's name: a list of one
    return bound.args, bound.kwargs
