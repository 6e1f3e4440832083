"""What several commands share: style options, writing to a file or standard
output, NAME=VALUE pairs, reading JSON files of records, the p check."""

from __future__ import annotations

import argparse
import sys
from typing import Sequence

from ..errors import InputError

OUTPUT_FORMATS = ("text", "md", "html", "tex")
TABLE_FORMATS = {".md": "md", ".html": "html", ".htm": "html", ".tex": "tex", ".csv": "csv", ".txt": "text", ".docx": "docx"}
_OWN_P = {"t": 1, "z": 0, "F": 2, "chi2": 1, "r": 1, "rs": 1}  # statistics whose p follows from them and their df


def style_options(p: argparse.ArgumentParser) -> None:
    p.add_argument("--style", default=None, help="a built-in style name (see 'statsetter styles') or a TOML file")
    p.add_argument("--to", choices=OUTPUT_FORMATS, default=None, help="output format (default: --out's extension, .md .html .tex .txt; else text)")
    p.add_argument("--form", choices=("stats", "sentence"), default="stats", help="statistics string or full sentence")
    p.add_argument("--out", metavar="FILE", help="write to FILE instead of standard output")


_TEXT_FORMATS = {ext: fmt for ext, fmt in TABLE_FORMATS.items() if fmt in OUTPUT_FORMATS}  # the extensions --to has a format for


def output_format(to: str | None, out: str | None) -> str:
    """The format to write: --to, else the one --out's extension names, else text. A --to that another extension
    contradicts is refused (LaTeX written as plain text into a .tex file had been the silent result)."""
    import os

    named = _TEXT_FORMATS.get(os.path.splitext(out)[1].lower()) if out else None
    if to is not None and named is not None and to != named:
        raise InputError(f"--to {to}: --out {out} names a {named} file; give --to {named}, or another file name")
    return to or named or "text"


def emit(text: str, out: str | None, inputs: Sequence[str] = ()) -> None:
    if out:
        from ..files import write_atomic

        write_atomic(out, text if text.endswith("\n") else text + "\n", inputs=inputs)
    else:
        sys.stdout.write(text if text.endswith("\n") else text + "\n")


def word(records, style, form: str, out: str, inputs: Sequence[str] = ()) -> int:  # type: ignore[no-untyped-def]
    """A Word document with a paragraph per record (real italics and scripts)."""
    from ..export.docx_writer import results_document, save_document

    save_document(results_document(records, style, form=form), out, inputs=inputs)
    print(f"wrote {out}")
    return 0


def word_table(table, style, out: str, inputs: Sequence[str]) -> None:  # type: ignore[no-untyped-def]
    import docx

    from ..export.docx_writer import add_table, save_document

    document = docx.Document()
    add_table(document, table, style)
    save_document(document, out, inputs=inputs)


def pairs(items: Sequence[str], option: str) -> dict[str, str]:
    out = {}
    for item in items:
        key, eq, value = item.partition("=")
        if not eq or not key.strip() or not value.strip():
            raise InputError(f"{option}: expected NAME=VALUE, got {item!r}")
        out[key.strip()] = value.strip()
    return out


def read_records(names: Sequence[str]):  # type: ignore[no-untyped-def]
    from ..files import read_input
    from ..records import load_records

    out = []
    for name in names:
        try:
            text = read_input(name, "records").decode("utf-8")
        except UnicodeDecodeError as exc:
            raise InputError(f"{name}: not UTF-8 text (byte {exc.start})") from None
        found = load_records(text, source=name)
        if not found:
            raise InputError(f"{name}: holds no records")
        out.extend(found)
    return out


def _has_scipy() -> bool:
    from importlib.util import find_spec

    return find_spec("scipy") is not None


def p_mismatches(records) -> list[tuple[str, str]]:  # type: ignore[no-untyped-def]
    """Records whose p cannot come from their statistic (a hand-typed or
    retyped number, say). Adjusted p values and post hoc pairs, whose p comes
    from another distribution, are not checked; nor are tables' records."""
    from ..pvalues import p_mismatch
    from ..records import Result

    out: list[tuple[str, str]] = []
    if not _has_scipy():  # the core install renders without scipy; the check needs it
        return out
    for i, r in enumerate(records, 1):
        if not isinstance(r, Result):
            continue
        s = r.statistic
        if s is None or r.p is None or r.kind == "posthoc_pair" or r.details.get("p_adjusted"):
            continue
        if _OWN_P.get(s.symbol) != len(s.df):
            continue
        try:
            why = p_mismatch(s.symbol, s.value, s.df, r.p, r.alternative)
        except (InputError, ValueError, ZeroDivisionError):
            continue
        if why:
            out.append((f"record {r.id or i}", why))
    return out
