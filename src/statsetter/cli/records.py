"""``statsetter records``: the records in JSON files, one line each — the id
to use with ``render --id`` and in a chapter's markers, and what it is."""

from __future__ import annotations

import argparse

from .shared import emit, read_records


def add(sub) -> None:  # type: ignore[no-untyped-def]
    r = sub.add_parser("records", help="list the records in JSON files: id and a one-line description",
                       description="List every record with its id (for 'render --id' and [[id]] markers) and a one-line description.")
    r.add_argument("files", nargs="+", metavar="FILE", help="JSON files of records")
    r.set_defaults(handler=run)


def describe(record) -> str:  # type: ignore[no-untyped-def]
    """One line: the kind, what it is about, its n."""
    from ..records import CorrelationMatrix, Description
    from ..rendering.kinds import KINDS

    if isinstance(record, Description):
        by = f" by {record.group_label or record.group}" if record.group else ""
        return f"descriptives of {len(record.variables)} variable(s){by} (a table)"
    if isinstance(record, CorrelationMatrix):
        return f"{record.method} correlation matrix of {len(record.names)} variables (a table; its pairs are records of their own)"
    what = KINDS.get(record.kind, record.kind).split(" (")[0]
    names = [v.label or v.name for v in record.variables if v.role != "item"][:3]  # a label is optional
    term = record.details.get("term")
    about = f": {', '.join(names)}" if names else ""
    if term and record.kind == "anova_term":
        about = f": {term}"
    n = f", n = {record.n}" if record.n is not None else ""
    return f"{what}{about}{n}"


def run(ns: argparse.Namespace) -> int:
    records = read_records(ns.files)
    width = max(len(str(r.id or "-")) for r in records)
    emit("\n".join(f"{str(r.id or '-'):{width}}  {describe(r)}" for r in records), None)
    return 0
