"""``statsetter audit``: the statistics a manuscript reports, checked."""

from __future__ import annotations

import argparse
import sys
from pathlib import Path

from ..errors import InputError
from .shared import emit


def add(sub) -> None:  # type: ignore[no-untyped-def]
    a = sub.add_parser(
        "audit",
        help="find the statistics in a manuscript, check them and propose house-style text",
        description="Audit a manuscript (.docx, .md, .txt, .tex): every reported statistic is checked "
        "(p against the statistic and df, impossible values, the style) and restyled. The file is never "
        "modified. Exit 0: nothing found; 1: findings; 2: usage or input error. A finding is a reason to look, "
        "not proof of an error.",
    )
    a.add_argument("manuscript", metavar="FILE")
    a.add_argument("--style", default=None, help="the house style to check against (default apa7)")
    a.add_argument("--alpha", type=float, default=0.05, help="the significance level for decision checks (0.05)")
    shape = a.add_mutually_exclusive_group()
    shape.add_argument("--json", action="store_true", help="one JSON array with every statistic found")
    shape.add_argument("--csv", action="store_true", help="the same rows as CSV")
    a.add_argument("--out", metavar="FILE", help="write the JSON or CSV to FILE instead of standard output")
    a.add_argument("--all", action="store_true", help="list clean statistics in the table too")
    a.add_argument("--min-severity", choices=("error", "warning", "style"), default="style",
                   help="report findings of this severity or graver: error, warning or style (the default, everything)")
    a.add_argument("--check-italics", action="store_true",
                   help="flag every statistical symbol not in italics (by default only where the manuscript italicises some and not others)")
    a.add_argument("--suggest-all", action="store_true", help="restyle every statistic in the suggestions, not only those with findings")
    a.add_argument("--annotate", metavar="OUT.docx", help="write a copy of a .docx with a Word comment on each finding")
    a.add_argument("--revise", metavar="OUT.docx",
                   help="write a copy of a .docx with each statistic restyled as a tracked change (author statsetter) and a comment "
                   "on each finding the restyling does not settle")
    a.add_argument("--decimal-mark", choices=("auto", ".", ","), default="auto",
                   help="the decimal mark the manuscript is typed with (auto: as its numbers show; a mark other than the style's is a finding)")
    a.add_argument("--encoding", default="utf-8", help="text encoding of a .md/.txt/.tex file (utf-8)")
    a.add_argument("--grim-items", type=int, metavar="K", help="run the GRIM test on means, for integer scores summed over K items")
    a.set_defaults(handler=run)


def run(ns: argparse.Namespace) -> int:
    from ..audit.reading import read_units
    from ..audit.report import as_csv, as_json, audit_units, by_severity, print_table, reading_mark
    from ..style.profile import load_style
    from ..audit.word import annotate, revise

    if not 0 < ns.alpha < 1:
        raise InputError(f"--alpha: {ns.alpha:g} is not between 0 and 1")
    for option, target in (("--annotate", ns.annotate), ("--revise", ns.revise)):
        if target and not Path(ns.manuscript).suffix.lower() == ".docx":
            raise InputError(f"{option}: {ns.manuscript}: a copy with comments or revisions can be made of a .docx manuscript only (save it as .docx)")
        if target and not target.lower().endswith(".docx"):
            raise InputError(f"{option}: {target} does not end in .docx")
    if ns.annotate and ns.revise and Path(ns.annotate).resolve() == Path(ns.revise).resolve():
        raise InputError(f"--annotate and --revise: give two different files, not {ns.revise} twice")
    if ns.out and not (ns.json or ns.csv):
        raise InputError("--out: choose --json or --csv")
    if ns.grim_items is not None and ns.grim_items < 1:
        raise InputError("--grim-items: give a whole number of 1 or more")
    units = read_units(ns.manuscript, ns.encoding)
    style = load_style(ns.style)
    mark, said = reading_mark(units, style, ns.decimal_mark)
    if said:  # an automatic choice is shown, never silent
        sys.stderr.write(f"statsetter audit: {said}\n")
    entries = audit_units(units, style, alpha=ns.alpha, grim_items=ns.grim_items, suggest_all=ns.suggest_all,
                          check_italics=ns.check_italics, restyle=bool(ns.revise), decimal_mark=mark)  # (the mark chosen once)
    every = entries
    entries = by_severity([e.at_least(ns.min_severity) for e in entries])
    if ns.json or ns.csv:
        emit(as_json(entries) if ns.json else as_csv(entries), ns.out, inputs=[ns.manuscript])
    else:
        print_table(entries, everything=ns.all)
    if ns.annotate:
        added, elsewhere = annotate(ns.manuscript, entries, ns.annotate)
        note = f" ({elsewhere} in headers, footers or notes listed only)" if elsewhere else ""
        sys.stderr.write(f"wrote {ns.annotate} with {added} comment(s){note}\n")
    if ns.revise:  # every statistic is restyled; comments follow --min-severity
        counts = revise(ns.manuscript, [e.at_least(ns.min_severity) for e in every], ns.revise)
        sys.stderr.write(f"wrote {ns.revise}: {counts['revised']} statistic(s) restyled as tracked changes, {counts['commented']} comment(s), "
                         f"{counts['kept']} left as typed (their comments say why)"
                         + (f", {counts['elsewhere']} in headers, footers or notes listed only" if counts["elsewhere"] else "") + "\n")
    return 1 if any(e.findings for e in entries) else 0
