"""What every analysis returns: its records as a list, the main one first.

``Records`` is a plain list (index it, loop over it, pass it to
``dump_records``, ``render`` or ``table``) with ``.main`` for the first record
and ``.by_id`` to find one. For one release, reading a field of the main
record from the list itself (``t_independent(...).p``) still works, with a
warning: the analyses returned a single record before they all returned a list.
"""

from __future__ import annotations

import warnings
from typing import Any

from ..errors import FormerUse
from .exchange import Record

__all__ = ["Records"]


class Records(list):  # type: ignore[type-arg]
    """An analysis' records, the main one first."""

    @property
    def main(self) -> Record:
        """The analysis' main result (a test, a model, a Description, a matrix)."""
        return self[0]

    def by_id(self, rid: str) -> Record:
        """The record with id ``rid`` (``model:age``); KeyError names the ids there are."""
        for r in self:
            if r.id == rid:
                return r
        raise KeyError(f"{rid!r}: no such record; the ids are {', '.join(str(r.id) for r in self)}")

    def __getattr__(self, name: str) -> Any:
        if name.startswith("__") or not len(self):
            raise AttributeError(name)
        value = getattr(self[0], name)  # AttributeError when the main record has no such field either
        warnings.warn(
            f"an analysis now returns a list of records (main first): write .main.{name} or [0].{name}",
            FormerUse,
            stacklevel=2,
        )
        return value
