"""``statsetter render``: JSON files of records in one style, as text or as
one table; ``--id`` picks records by id (an analysis id takes all of its
records: ``model`` gives ``model`` and ``model:age`` ...)."""

from __future__ import annotations

import argparse
import sys

from ..errors import InputError
from .shared import emit, output_format, p_mismatches, read_records, style_options, word, word_table


def add(sub) -> None:  # type: ignore[no-untyped-def]
    r = sub.add_parser("render", help="render JSON files of records in one style")
    r.add_argument("files", nargs="+", metavar="FILE", help="JSON files of records (from several authors, say)")
    style_options(r)
    r.add_argument("--id", action="append", default=[], metavar="ID", dest="ids",
                   help="render only this record and its parts (model gives model, model:age ...; repeatable; see 'statsetter records FILE')")
    r.add_argument("--table", choices=("auto", "results", "regression", "anova"), help="lay the records out as one table instead: "
                   "auto (by the records), a results table (a row per record), a regression's coefficients table or an ANOVA's table; "
                   "--out FILE.docx writes Word")
    r.add_argument("--title", help="the table's title")
    r.set_defaults(handler=run)


def select(records, ids):  # type: ignore[no-untyped-def]
    """The records named by ``ids``, in the order given: ``model`` gives the
    record ``model`` and all of its parts (``model:age`` ...), ``model:age``
    that one. An unknown id is an error listing close ones."""
    if not ids:
        return records
    import difflib

    out = []
    known = [str(r.id) for r in records if r.id]
    for rid in ids:
        found = [r for r in records if r.id == rid or (r.id or "").startswith(rid + ":")]
        if not found:
            close = difflib.get_close_matches(rid, known, n=3, cutoff=0.6)
            raise InputError(f"--id: no record {rid!r}" + (f"; did you mean {', '.join(close)}?" if close else "; list them with 'statsetter records FILE'"))
        out += [r for r in found if r not in out]
    return out


def run(ns: argparse.Namespace) -> int:
    from ..records import Result
    from ..rendering.layout import table
    from ..rendering.sentences import render
    from ..style import load_style

    style = load_style(ns.style)
    ns.to = output_format(ns.to, ns.out)
    records = select(read_records(ns.files), ns.ids)
    for where, why in p_mismatches(records):
        print(f"statsetter render: warning: {where}: {why}", file=sys.stderr)
    if ns.table:
        return _table(ns, records, style)
    if ns.title:
        raise InputError("--title: a title is for a table; add --table")
    results = [r for r in records if isinstance(r, Result)]
    others = [r for r in records if not isinstance(r, Result)]
    if ns.out and ns.out.lower().endswith(".docx"):
        if others:
            raise InputError(f"{others[0].id or others[0].kind}: a {others[0].kind} record is a table; render it with --id and --table auto")
        return word(results, style, ns.form, ns.out, ns.files)
    from ..export.text_tables import write_table

    numbers = {id(r): k for k, r in enumerate(others, 1)}  # tables numbered in order
    lines = [render(r, ns.form, style).to(ns.to) if isinstance(r, Result) else write_table(table(r, style, number=numbers[id(r)]), ns.to, style)
             for r in records]
    sep = "\n\n" if ns.to in ("md", "tex") or others else "\n"
    emit(sep.join(lines), ns.out, inputs=ns.files)
    return 0


def _table(ns: argparse.Namespace, records, style) -> int:  # type: ignore[no-untyped-def]
    from ..records import Result

    if ns.table == "auto":
        from ..rendering.layout import table as lay_out

        made = lay_out(records, style, title=ns.title, number=1)
    elif ns.table in ("regression", "anova"):
        from ..rendering.anova_tables import anova_table
        from ..rendering.regression_tables import regression_table

        made = (regression_table if ns.table == "regression" else anova_table)([r for r in records if isinstance(r, Result)], style, title=ns.title, number=1)
    else:
        from ..rendering.record_tables import results_table

        made = results_table([r for r in records if isinstance(r, Result)], style, title=ns.title or "Results").with_number(1)
    if ns.out and ns.out.lower().endswith(".docx"):
        word_table(made, style, ns.out, ns.files)
        print(f"wrote {ns.out}")
        return 0
    from ..export.text_tables import write_table

    emit(write_table(made, ns.to, style), ns.out, inputs=ns.files)
    return 0
