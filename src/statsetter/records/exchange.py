"""Records to and from JSON: a file is an array of records of any kind, each
with its schema and version; ``kind`` says which class reads it back."""

from __future__ import annotations

import json
from collections.abc import Mapping
from typing import Any, Iterable, Union

from ..errors import InputError, RecordError
from .result import Result
from .summaries import CorrelationMatrix, Description

__all__ = ["Record", "dump_records", "load_records", "record_from_dict"]

Record = Union[Result, Description, CorrelationMatrix]
_SUMMARIES: dict[str, Any] = {"descriptives": Description, "correlation_matrix": CorrelationMatrix}


def dump_records(records: Iterable[Record], *, indent: int | None = 2) -> str:
    """Records as a JSON array (each with its schema and version)."""
    return json.dumps([r.to_dict() for r in records], ensure_ascii=False, indent=indent)


def record_from_dict(data: Mapping[str, Any], *, where: str = "record") -> Record:
    """One record of any kind from its JSON object."""
    kind = data.get("kind") if isinstance(data, Mapping) else None
    cls = _SUMMARIES.get(kind) if isinstance(kind, str) else None  # any other kind (a list, an object) is Result's to refuse
    return cls.from_dict(data, where=where) if cls is not None else Result.from_dict(data, where=where)


def load_records(text: str, *, source: str = "<records>") -> list[Record]:
    """Records from JSON text: an array of records, or a single record object."""
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
