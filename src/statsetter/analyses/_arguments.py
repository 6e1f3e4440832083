"""The public analyses' arguments checked against the kinds their signatures
name, before any work: a wrong kind is an InputError naming the function and
the argument ("t_independent: level must be a number (got str 'x')"), not
Python's own message from deep inside pandas, numpy or scipy. A column's
name may be text or a number (a DataFrame's labels can be either); whether
the column exists is left to the lookup that names a missing one. One name
given where a list of names is wanted is a list of one (``covariates="age"``)."""

from __future__ import annotations

import inspect
import math
import typing
from collections.abc import Hashable, Iterable, Iterator, Mapping
from numbers import Integral, Real
from typing import Any, Callable

from ..errors import InputError

_NUMBER = {"float", "float | None"}
_WHOLE = {"int", "int | None"}
_NAMES = {"Sequence[str]", "Sequence[str] | None"}
_ALTERNATIVES = ("two-sided", "less", "greater")


def _a_name(value: Any) -> bool:
    """Whether ``value`` can be a column's name or a word: text or a number, not a column, list or table."""
    return isinstance(value, (str, Real)) and not isinstance(value, bool)


def _choices(annotation: str, namespace: Mapping[str, Any]) -> tuple[Any, ...] | None:
    """The values a Literal annotation (or an alias of one, ``Procedure``) allows; None for any other annotation."""
    try:
        kind = eval(annotation, dict(namespace))  # noqa: S307 - the package's own annotations, read once per function
    except Exception:  # noqa: BLE001 - a name only type checkers see (pd.DataFrame): not a Literal
        return None
    found: list[Any] = []
    for part in typing.get_args(kind) if typing.get_origin(kind) is not typing.Literal else (kind,):
        if typing.get_origin(part) is typing.Literal:
            found += typing.get_args(part)
    return tuple(found) or None


def rules(fn: Callable[..., Any]) -> dict[str, tuple[str, tuple[Any, ...] | None]]:
    """Each parameter's annotation (as written) and, for a Literal, the values it allows: read once per function."""
    out = {}
    for name, param in inspect.signature(fn).parameters.items():
        if isinstance(param.annotation, str):
            allowed = _ALTERNATIVES if name == "alternative" else _choices(param.annotation, fn.__globals__)
            out[name] = (param.annotation, allowed)
    return out


def _problem(param: str, annotation: str, allowed: tuple[Any, ...] | None, value: Any) -> str:
    """What is wrong with ``value`` for the parameter (a "must …" phrase), or ""."""
    if value is None and annotation.endswith("| None"):
        return ""
    if allowed is not None:
        shown = ", ".join(repr(a) for a in allowed)
        if not isinstance(value, Hashable) or not _a_name(value):
            return f"must be one of {shown}"
        wanted = {a.lower() if isinstance(a, str) else a for a in allowed}
        return "" if (value.lower() if isinstance(value, str) else value) in wanted else f"must be one of {shown}"
    if annotation == "'pd.DataFrame'":
        return "" if type(value).__name__ == "DataFrame" and hasattr(value, "columns") else "must be a pandas DataFrame"
    if annotation in _NUMBER:
        if isinstance(value, bool) or not isinstance(value, Real):
            return "must be a number"
        if not math.isfinite(value):
            return "must be a finite number"
        return "must lie between 0 and 1 (0.95 for a 95% interval)" if param.endswith("level") and not 0 < float(value) < 1 else ""
    if annotation in _WHOLE:
        return "" if isinstance(value, Integral) and not isinstance(value, bool) else "must be a whole number"
    if annotation == "bool":
        return "" if isinstance(value, bool) or type(value).__name__ == "bool_" else "must be True or False"
    if annotation in ("str", "str | None"):
        if isinstance(value, (list, tuple, set, Mapping)):
            return "must be one column's name (or word), not a list or a dict"
        return "" if _a_name(value) else "must be a name (text)"
    if annotation in _NAMES or annotation in ("str | Sequence[str]", "str | Sequence[str] | None", "tuple[str, str]"):
        if isinstance(value, str) or (_a_name(value) and annotation != "tuple[str, str]"):
            return ""  # (one name for a pair of them, "tuple[str, str]": the function says how many it takes)
        if type(value).__name__ in ("Series", "DataFrame"):
            return "must be a list of column names, not the columns themselves"
        if not isinstance(value, Iterable) or isinstance(value, (Mapping, str, bytes)):
            return "must be a list of column names"
        return "" if all(_a_name(v) for v in value) else "must be a list of column names (text)"
    if annotation == "Sequence[Sequence[str]]":
        ok = isinstance(value, Iterable) and not isinstance(value, (str, bytes, Mapping))
        return "" if ok and all(isinstance(v, Iterable) and not isinstance(v, (str, bytes)) for v in value) else "must be a list of lists of column names"
    if annotation == "Sequence[object] | None":
        return "" if isinstance(value, Iterable) and not isinstance(value, (str, bytes, Mapping)) else "must be a list of values"
    if annotation == "Sequence[float] | None":
        if not isinstance(value, Iterable) or isinstance(value, (str, bytes)):
            return "must be a list of numbers"
        return "" if all(isinstance(v, Real) and not isinstance(v, bool) for v in value) else "must be a list of numbers"
    if annotation == "object | None":  # one value of a column ("event", "condition")
        return "" if isinstance(value, Hashable) and type(value).__name__ not in ("Series", "DataFrame") else "must be one value"
    if annotation.startswith("Mapping["):
        return "" if isinstance(value, Mapping) else "must be a mapping (a dict)"
    return ""


def refuse(name: str, param: str, problem: str, value: Any) -> typing.NoReturn:
    shown = repr(value).replace("\n", " ")
    shown = shown if len(shown) <= 40 else shown[:37] + "..."
    raise InputError(f"{name}: {param} {problem} (got {type(value).__name__} {shown})")


def checked(name: str, signature: inspect.Signature, kinds: Mapping[str, tuple[str, tuple[Any, ...] | None]],
            args: tuple[Any, ...], kwargs: dict[str, Any]) -> tuple[tuple[Any, ...], dict[str, Any]]:
    """``args`` and ``kwargs`` for the function ``name`` of ``signature`` (``kinds``: its `rules`), each checked; a
    missing or unknown argument keeps Python's own TypeError, which names it."""
    bound = signature.bind(*args, **kwargs)
    for param, value in bound.arguments.items():
        if param not in kinds:
            continue
        annotation, allowed = kinds[param]
        if isinstance(value, Iterator):  # a generator of names: read once here, and handed on as the list it gave
            value = bound.arguments[param] = list(value)
        problem = _problem(param, annotation, allowed, value)
        if problem:
            refuse(name, param, problem, value)
        if (annotation in _NAMES or (annotation.startswith("str | Sequence") and not isinstance(value, str))) and _a_name(value):
            bound.arguments[param] = [value]  # one column's name: a list of one
    return bound.args, bound.kwargs
