"""``statsetter describe``: a descriptives table (Table 1) from a data file."""

from __future__ import annotations

import argparse
import sys
from pathlib import Path

from ..errors import InputError
from .shared import TABLE_FORMATS, emit, pairs, word_table


def add(sub) -> None:  # type: ignore[no-untyped-def]
    d = sub.add_parser(
        "describe",
        help="a descriptives table (Table 1) by level of measurement",
        description="Describe the variables of a data file by level of measurement, overall or by group. "
        "Reads .csv, .tsv, .txt, .xlsx, .sav, .zsav, .dta and .parquet. The level of every variable and "
        "where it came from is printed to standard error.",
    )
    d.add_argument("data", metavar="DATA")
    d.add_argument("--group", metavar="VAR", help="one column per category of VAR, plus Total")
    d.add_argument("--by", dest="former_group", help=argparse.SUPPRESS)  # the former name, for one release
    d.add_argument("--vars", metavar="A,B,...", help="the variables, in table order (default: every column)")
    d.add_argument("--level", action="append", default=[], metavar="VAR=LEVEL", help="declare a level: nominal, ordinal, interval, ratio")
    d.add_argument("--label", action="append", default=[], metavar="VAR=TEXT", help="the variable's name in the table")
    d.add_argument("--show", action="append", default=[], metavar="LEVEL=ITEM,...", help="e.g. continuous=mean_sd,median_iqr,range,skew or ordinal=median_iqr,counts")
    d.add_argument("--weights", metavar="VAR", help="survey weights")
    d.add_argument("--compare", action="store_true", help="compare the groups: a p per row from a test chosen by level (named in the note)")
    d.add_argument("--tests", dest="former_compare", action="store_true", help=argparse.SUPPRESS)
    d.add_argument("--smd", action="store_true", help="add the standardised difference (two groups)")
    d.add_argument("--suppress-below", type=int, metavar="K", help="hide counts from 1 to K-1 (off by default)")
    d.add_argument("--percent-of", choices=("valid", "all"), default="valid", help="percentages of cases with a value (default) or of all")
    d.add_argument("--missing", metavar="CODE,...", help="values meaning missing in every column, e.g. -99,-98")
    d.add_argument("--sheet", help="Excel sheet name (default: the first)")
    d.add_argument("--encoding", default="utf-8", help="text encoding of a CSV file (utf-8)")
    d.add_argument("--sep", choices=[",", ";", "tab", "|"], help="the delimiter of a text data file (default: detected, and said)")
    d.add_argument("--decimal", choices=[".", ","], help="the decimal mark of a text data file (default: detected, and said)")
    d.add_argument("--title", help="table title")
    d.add_argument("--number", type=int, default=1, help="table number (1)")
    d.add_argument("--style", default=None, help="a built-in style name or a TOML file")
    d.add_argument("--out", metavar="FILE", help="its extension picks the format: .md .html .tex .csv .txt .docx (default: text to standard output)")
    d.set_defaults(handler=run)


def _codes(text: str | None) -> list[object]:
    if not text:
        return []
    out: list[object] = []
    for part in text.split(","):
        part = part.strip()
        try:
            out.append(float(part) if "." in part or "e" in part.lower() else int(part))
        except ValueError:
            out.append(part)
    return out


def run(ns: argparse.Namespace) -> int:
    from ..analyses.descriptives import describe
    from ..io import read_data
    from ..style import load_style

    for former, now in (("former_group", "group"), ("former_compare", "compare")):
        if getattr(ns, former):
            old = {"former_group": "--by", "former_compare": "--tests"}[former]
            if getattr(ns, now):
                raise InputError(f"{old} is the former name of --{now}; give one of them")
            sys.stderr.write(f"warning: {old} is now --{now}; the former name will stop working in the next release\n")
            setattr(ns, now, getattr(ns, former))
    fmt = "text"
    if ns.out:
        fmt = TABLE_FORMATS.get(Path(ns.out).suffix.lower(), "")
        if not fmt:
            raise InputError(f"--out: {ns.out}: unknown extension; use one of {', '.join(TABLE_FORMATS)}")
    if (ns.compare or ns.smd) and not ns.group:  # said before the data are read, in the command's own words
        raise InputError(f"{'--compare' if ns.compare else '--smd'} compares groups; name the grouping variable with --group")
    style = load_style(ns.style)
    data = read_data(ns.data, sheet=ns.sheet, missing=_codes(ns.missing), encoding=ns.encoding,
                     sep="\t" if ns.sep == "tab" else ns.sep, decimal=ns.decimal)
    for note in data.notes:
        sys.stderr.write(f"data: {note}\n")
    show = {k: [i.strip() for i in v.split(",")] for k, v in pairs(ns.show, "--show").items()}
    labels = {**data.labels, **pairs(ns.label, "--label")}
    result = describe(
        data.frame,
        [v.strip() for v in ns.vars.split(",")] if ns.vars else None,
        group=ns.group,
        levels=pairs(ns.level, "--level"),
        metadata_levels=data.levels,
        value_labels=data.value_labels,
        labels=labels,
        show=show,
        weights=ns.weights,
        compare=ns.compare,
        smd=ns.smd,
        suppress_below=ns.suppress_below,
        percent_of=ns.percent_of,
    )
    for level in result.levels:
        sys.stderr.write(("warning: " if level.weak else "level: ") + level.describe() + "\n")
    for level in result.left_out:
        sys.stderr.write(f"left out: {level.describe()}; name it in --vars to describe it\n")
    from ..rendering.layout import table as lay_out

    table = lay_out(result, style, number=ns.number, title=ns.title)
    if fmt == "docx":
        word_table(table, style, ns.out, [ns.data])
    else:
        from ..export.text_tables import write_table

        emit(write_table(table, fmt, style), ns.out, inputs=[ns.data])
    if ns.out:
        print(f"wrote {ns.out}")
    return 0
