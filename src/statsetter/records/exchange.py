"""Records to and from JSON: a file is an array of records of any kind, each
with its schema and version; ``kind`` says which class reads it back."""

from __future__ import annotations

import json
import math
from collections.abc import Iterable, Mapping
from typing import Any, Union

from ..errors import InputError, RecordError
from .result import Result
from .summaries import CorrelationMatrix, Description

__all__ = ["Record", "dump_records", "load_records", "record_from_dict"]

Record = Union[Result, Description, CorrelationMatrix]
_SUMMARIES: dict[str, Any] = {"descriptives": Description, "correlation_matrix": CorrelationMatrix}


def dump_records(records: Iterable[Record], *, indent: int | None = 2) -> str:
    """Records as a JSON array (each with its schema and version)."""
    if not isinstance(records, Iterable) or isinstance(records, (str, bytes, Result, Description, CorrelationMatrix)):
        records = [records] if isinstance(records, (Result, Description, CorrelationMatrix)) else _not_records(records)
    data = [r.to_dict() if isinstance(r, (Result, Description, CorrelationMatrix)) else _not_records(r, i) for i, r in enumerate(records)]
    if indent is not None and indent >= 0:
        try:
            return _indented(data, " " * indent)
        except (_NotPlain, RecursionError):
            pass  # (a value JSON has no plain form for: json says what it makes of it, or why it cannot)
    return json.dumps(data, ensure_ascii=False, indent=indent)


def _not_records(value: object, index: int | None = None) -> Any:
    where = "records" if index is None else f"records[{index}]"
    raise RecordError(where, f"not a record: Result, Description or CorrelationMatrix (got {type(value).__name__})")


class _NotPlain(Exception):
    pass


def _indented(data: Any, step: str) -> str:
    """``json.dumps(data, ensure_ascii=False, indent=len(step))`` for plain data (dicts with text keys, lists, text,
    whole numbers, floats, true, false, null), written in one pass into a list: the json module writes indented text
    with its pure-Python encoder (its C encoder only writes unindented text), twice the time (5.3 against 2.6 ms for
    the demo plan's records; tests/test_records.py compares the two on random data)."""
    from json.encoder import encode_basestring

    out: list[str] = []
    put = out.append
    number = float.__repr__
    whole = int.__repr__

    def value(o: Any, pad: str) -> None:
        kind = type(o)
        if kind is str:
            put(encode_basestring(o))
        elif kind is dict:
            if not o:
                put("{}")
                return
            inner = pad + step
            put("{\n" + inner)
            first = True
            for key, item in o.items():
                if type(key) is not str:
                    raise _NotPlain
                if first:
                    first = False
                else:
                    put(",\n" + inner)
                put(encode_basestring(key))
                put(": ")
                value(item, inner)
            put("\n" + pad + "}")
        elif kind is list or kind is tuple:
            if not o:
                put("[]")
                return
            inner = pad + step
            put("[\n" + inner)
            first = True
            for item in o:
                if first:
                    first = False
                else:
                    put(",\n" + inner)
                value(item, inner)
            put("\n" + pad + "]")
        elif kind is float:
            put(number(o) if math.isfinite(o) else "NaN" if o != o else "Infinity" if o > 0 else "-Infinity")
        elif o is None:
            put("null")
        elif o is True:
            put("true")
        elif o is False:
            put("false")
        elif kind is int:
            put(whole(o))
        else:
            raise _NotPlain

    value(data, "")
    return "".join(out)


def record_from_dict(data: Mapping[str, Any], *, where: str = "record") -> Record:
    """One record of any kind from its JSON object."""
    kind = data.get("kind") if isinstance(data, Mapping) else None
    cls = _SUMMARIES.get(kind) if isinstance(kind, str) else None  # any other kind (a list, an object) is Result's to refuse
    return cls.from_dict(data, where=where) if cls is not None else Result.from_dict(data, where=where)


def load_records(text: str, *, source: str = "<records>") -> list[Record]:
    """Records from JSON text: an array of records, or a single record object."""
    if not isinstance(text, (str, bytes, bytearray)):
        raise InputError(f"{source}: load_records takes JSON text, read from a file first (got {type(text).__name__})")
    try:
        data = json.loads(text)
    except json.JSONDecodeError as exc:
        raise InputError(f"{source}: not valid JSON (line {exc.lineno}, column {exc.colno}): {exc.msg}") from None
    except RecursionError:
        raise InputError(f"{source}: nested too deeply to be a file of records") from None
    if isinstance(data, Mapping):
        data = data.get("records", [data]) if "kind" not in data else [data]
    if not isinstance(data, list):
        raise InputError(f"{source}: expected a JSON array of records")
    out = []
    for i, item in enumerate(data):
        try:
            out.append(record_from_dict(item, where=f"record {i + 1}"))
        except RecordError as exc:
            raise InputError(f"{source}: {exc}") from None
    return out
