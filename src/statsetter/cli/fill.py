"""``statsetter fill``: [[id]] markers in a Word chapter filled from records."""

from __future__ import annotations

import argparse

from ..errors import InputError
from .shared import read_records


def add(sub) -> None:  # type: ignore[no-untyped-def]
    fl = sub.add_parser(
        "fill",
        help="fill [[id]] markers in a .docx chapter from records",
        description="Fill result markers in a chapter: [[id]] (statistics string) or [[id|sentence]]. "
        "Writes a new file; the chapter is never modified. Exit 1 when a marker has no record.",
    )
    fl.add_argument("chapter", metavar="CHAPTER.docx")
    fl.add_argument("--records", required=True, action="append", metavar="FILE", help="JSON file of records (repeatable)")
    fl.add_argument("--out", required=True, metavar="FILE.docx", help="the filled copy")
    fl.add_argument("--style", default=None, help="a built-in style name or a TOML file")
    fl.set_defaults(handler=run)


def run(ns: argparse.Namespace) -> int:
    from ..export.markers import describe, fill_chapter

    records = read_records(ns.records)
    if not ns.out.endswith(".docx"):
        raise InputError(f"--out: {ns.out} does not end in .docx")
    report = fill_chapter(ns.chapter, records, ns.out, ns.style)
    for line in describe(report):
        print(line)
    print(f"wrote {ns.out}")
    return 1 if report.unknown else 0
