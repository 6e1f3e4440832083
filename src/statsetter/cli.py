"""The ``statsetter`` command.

Commands: ``format`` (one result from numbers on the command line),
``render`` (JSON files of records), ``fill`` (markers in a chapter),
``describe`` (a descriptives table from a data file), ``audit`` (a
manuscript's statistics checked), ``run`` (an analysis plan), ``styles``
(list, show, check). Exit status: 0 success, 1 findings or unknown markers,
2 a usage or input error, 3 the environment (disk, permission, a missing
extra), 4 an internal error; no traceback reaches a user.
"""

from __future__ import annotations

import argparse
import sys
from pathlib import Path
from typing import Sequence

from .errors import InputError, StatsetterError

__all__ = ["main"]

# The exit-status contract (README, "Exit status"), the same for every command.
EXIT_OK = 0           # success; nothing found
EXIT_FINDINGS = 1     # audit findings, unknown markers
EXIT_USAGE = 2        # a usage or input error (bad file, plan, data, option)
EXIT_ENVIRONMENT = 3  # disk full, permission denied, a missing optional dependency
EXIT_INTERNAL = 4     # a bug in statsetter: one line here, the traceback in a log file

# short names for ``statsetter format``; values are (kind, statistic symbol, details)
_FORMAT_KINDS: dict[str, tuple[str, str | None, dict[str, str]]] = {
    "t": ("t_independent", "t", {"variant": "student"}),
    "welch-t": ("t_independent", "t", {"variant": "welch"}),
    "paired-t": ("t_paired", "t", {}),
    "one-sample-t": ("t_one_sample", "t", {}),
    "r": ("pearson", "r", {}),
    "rs": ("spearman", "rs", {}),
    "tau": ("kendall", "tau_b", {}),
    "chi2": ("chi2_independence", "chi2", {}),
    "chi2-fit": ("chi2_goodness_of_fit", "chi2", {}),
    "fisher": ("fisher_exact", None, {}),
    "anova": ("anova_oneway", "F", {"variant": "classic"}),
    "welch-anova": ("anova_oneway", "F", {"variant": "welch"}),
    "anova-term": ("anova_term", "F", {}),
    "posthoc": ("posthoc_pair", None, {}),
    "coef": ("linear_coefficient", "t", {}),
    "model": ("linear_model", "F", {}),
    "step": ("linear_step", "F", {}),
    "logit-coef": ("logistic_coefficient", "z", {}),
    "logit-model": ("logistic_model", "chi2", {}),
    "U": ("mann_whitney", "U", {}),
    "signed-rank": ("wilcoxon", "T", {}),
    "H": ("kruskal_wallis", "H", {}),
    "alpha": ("cronbach_alpha", None, {}),
}

_OUTPUT_FORMATS = ("text", "md", "html", "tex")


class _Parser(argparse.ArgumentParser):
    def error(self, message: str) -> None:  # two lines, exit 2
        sys.stderr.write(f"{self.prog}: error: {message}\n(see '{self.prog} --help')\n")
        raise SystemExit(EXIT_USAGE)


def _build_parser() -> argparse.ArgumentParser:
    parser = _Parser(
        prog="statsetter",
        description="Statistical results as manuscript-ready text and tables, in a chosen reporting style.",
        epilog="exit status: 0 success or nothing found; 1 audit findings or unknown markers; 2 a usage or input error; "
        "3 the environment (disk full, permission, a missing optional dependency); 4 an internal error (traceback in a log file).",
    )
    parser.add_argument("--version", action="store_true", help="print the version and exit")
    parser.add_argument("--debug", action="store_true", help="print the full traceback of an internal error")
    sub = parser.add_subparsers(dest="command", metavar="COMMAND", parser_class=_Parser)

    def style_options(p: argparse.ArgumentParser) -> None:
        p.add_argument("--style", default=None, help="a built-in style name (see 'statsetter styles') or a TOML file")
        p.add_argument("--to", choices=_OUTPUT_FORMATS, default="text", help="output format (default: text)")
        p.add_argument("--form", choices=("stats", "sentence"), default="stats", help="statistics string or full sentence")
        p.add_argument("--out", metavar="FILE", help="write to FILE instead of standard output")

    f = sub.add_parser(
        "format",
        help="render one result from numbers given on the command line",
        description="Render one result from its numbers, e.g. "
        "'statsetter format t --stat 2.14 --df 38 --effect d=0.68 --effect-ci 0.04,1.31'. "
        "A negative limit needs '=': --effect-ci=-0.30,0.52.",
    )
    f.add_argument("kind", metavar="KIND", help="result kind: " + ", ".join(_FORMAT_KINDS))
    f.add_argument("--stat", type=float, metavar="VALUE", help="the test statistic")
    f.add_argument("--df", metavar="DF[,DF2]", help="degrees of freedom, one or two numbers")
    f.add_argument("--p", type=float, metavar="P", help="exact p value (computed from the statistic when left out)")
    f.add_argument("--n", type=int, metavar="N", help="sample size")
    f.add_argument("--effect", metavar="NAME=VALUE", help="effect size, e.g. d=0.68, eta2=0.09, V=0.22")
    f.add_argument("--effect-ci", metavar="LOW,HIGH", help="confidence interval of the effect size")
    f.add_argument("--estimate", type=float, metavar="VALUE", help="point estimate (mean difference, B, OR ...)")
    f.add_argument("--estimate-ci", metavar="LOW,HIGH", help="confidence interval of the estimate")
    f.add_argument("--level", type=float, default=95.0, metavar="PERCENT", help="confidence level in percent (95)")
    f.add_argument("--alternative", choices=("two-sided", "less", "greater"), default="two-sided")
    f.add_argument("--alpha", type=float, default=0.05, help="significance level for decision-preserving rounding")
    f.add_argument("--label", action="append", default=[], metavar="ROLE=TEXT", help="variable label, e.g. outcome=fatigue")
    f.add_argument("--group", action="append", default=[], metavar="LABEL,N,M,SD", help="a group summary (repeatable)")
    style_options(f)

    r = sub.add_parser("render", help="render JSON files of records in one style")
    r.add_argument("files", nargs="+", metavar="FILE", help="JSON files of records (from several authors, say)")
    style_options(r)
    r.add_argument("--table", choices=("results", "regression", "anova"), help="lay the records out as one table instead: a results table "
                   "(a row per record), a regression's coefficients table or an ANOVA's table; --out FILE.docx writes Word")
    r.add_argument("--title", help="the table's title")

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

    d = sub.add_parser(
        "describe",
        help="a descriptives table (Table 1) by level of measurement",
        description="Describe the variables of a data file by level of measurement, overall or by group. "
        "Reads .csv, .tsv, .txt, .xlsx, .sav, .zsav, .dta and .parquet. The level of every variable and "
        "where it came from is printed to standard error.",
    )
    d.add_argument("data", metavar="DATA")
    d.add_argument("--by", metavar="GROUP", help="one column per level of GROUP, plus Total")
    d.add_argument("--vars", metavar="A,B,...", help="the variables, in table order (default: every column)")
    d.add_argument("--level", action="append", default=[], metavar="VAR=LEVEL", help="declare a level: nominal, ordinal, interval, ratio")
    d.add_argument("--label", action="append", default=[], metavar="VAR=TEXT", help="the variable's name in the table")
    d.add_argument("--show", action="append", default=[], metavar="LEVEL=ITEM,...", help="e.g. continuous=mean_sd,median_iqr,range,skew or ordinal=median_iqr,counts")
    d.add_argument("--weights", metavar="VAR", help="survey weights")
    d.add_argument("--tests", action="store_true", help="add a p per row from a test chosen by level (named in the note)")
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
    a.add_argument("--annotate", metavar="OUT.docx", help="write a copy of a .docx with a Word comment on each finding")
    a.add_argument("--encoding", default="utf-8", help="text encoding of a .md/.txt/.tex file (utf-8)")
    a.add_argument("--grim-items", type=int, metavar="K", help="run the GRIM test on means, for integer scores summed over K items")

    rn = sub.add_parser(
        "run",
        help="run an analysis plan: every table and paragraph into every output, the chapter filled",
        description="Run a plan file (TOML; see the README): read the data, score the scales, run every analysis, "
        "build the tables, write the outputs and fill the chapter's markers. Re-run after the data change.",
    )
    rn.add_argument("plan", metavar="PLAN.toml")
    rn.add_argument("--format", choices=("files", "json"), default="files", help="json: print the records instead of writing the outputs")

    s = sub.add_parser("styles", help="list, show or check style profiles")
    s.add_argument("action", nargs="?", choices=("list", "show", "check"), default="list")
    s.add_argument("target", nargs="?", metavar="NAME|FILE", help="style to show, or TOML file to check")
    return parser


# --------------------------------------------------------------------------


def _pair(text: str, option: str) -> tuple[float, float]:
    parts = [p.strip() for p in text.replace(";", ",").split(",")]
    if len(parts) != 2:
        raise InputError(f"{option}: expected LOW,HIGH, got {text!r}")
    try:
        low, high = (float(p.replace("\u2212", "-")) for p in parts)
    except ValueError:
        raise InputError(f"{option}: {text!r} is not two numbers") from None
    return low, high


def _format_record(ns: argparse.Namespace):  # -> Result
    from .records import EffectSize, Estimate, GroupSummary, Interval, Result, Statistic, Variable

    if ns.kind not in _FORMAT_KINDS:
        raise InputError(f"unknown KIND {ns.kind!r}; kinds: {', '.join(_FORMAT_KINDS)}")
    kind, symbol, details = _FORMAT_KINDS[ns.kind]
    if not 0 < ns.level < 100:
        raise InputError(f"--level: {ns.level:g} is not a percentage between 0 and 100")
    level = ns.level / 100
    df: tuple[float, ...] = ()
    if ns.df:
        try:
            df = tuple(float(x) for x in ns.df.split(","))
        except ValueError:
            raise InputError(f"--df: {ns.df!r} is not one or two numbers") from None
    statistic = None
    if ns.stat is not None:
        if symbol is None:
            raise InputError(f"--stat: a {ns.kind} result has no test statistic")
        statistic = Statistic(symbol, ns.stat, df)
    elif df:
        raise InputError("--df given without --stat")
    p = ns.p
    if statistic is not None and symbol in ("t", "z", "F", "chi2", "r", "rs"):
        from .pvalues import p_from_statistic

        if p is None:
            p = p_from_statistic(symbol, statistic.value, df, ns.alternative)
    effects = ()
    if ns.effect:
        name, eq, value = ns.effect.partition("=")
        if not eq:
            raise InputError(f"--effect: expected NAME=VALUE, got {ns.effect!r}")
        try:
            number = float(value.replace("\u2212", "-"))
        except ValueError:
            raise InputError(f"--effect: {value!r} is not a number") from None
        ci = Interval(level, *_pair(ns.effect_ci, "--effect-ci")) if ns.effect_ci else None
        effects = (EffectSize(name.strip(), number, ci, ratio=name.strip() == "OR"),)
    elif ns.effect_ci:
        raise InputError("--effect-ci given without --effect")
    estimate = None
    if ns.estimate is not None:
        ci = Interval(level, *_pair(ns.estimate_ci, "--estimate-ci")) if ns.estimate_ci else None
        name = {"fisher_exact": "OR"}.get(kind, "estimate")
        estimate = Estimate(name, ns.estimate, ci=ci, ratio=name == "OR")
    variables = []
    for item in ns.label:
        role, eq, text = item.partition("=")
        if not eq:
            raise InputError(f"--label: expected ROLE=TEXT, got {item!r}")
        variables.append(Variable(name=text, label=text, role=role.strip()))
    groups = []
    for item in ns.group:
        parts = [x.strip() for x in item.split(",")]
        if len(parts) != 4:
            raise InputError(f"--group: expected LABEL,N,M,SD, got {item!r}")
        try:
            groups.append(GroupSummary(parts[0], n=int(parts[1]), mean=float(parts[2]), sd=float(parts[3])))
        except ValueError:
            raise InputError(f"--group: {item!r} has a value that is not a number") from None
    record = Result(
        kind=kind,
        statistic=statistic,
        p=p,
        alternative=ns.alternative,
        n=ns.n,
        estimate=estimate,
        effects=effects,
        groups=tuple(groups),
        variables=tuple(variables),
        details=details,
        alpha=ns.alpha,
    )
    if ns.p is not None:  # a valid record whose p was given: does it follow from the statistic?
        for _, why in _p_mismatches([record]):
            print(f"statsetter format: warning: {why}; rendered as given", file=sys.stderr)
    return record


def _word(records, style, form: str, out: str, inputs: Sequence[str] = ()) -> int:  # type: ignore[no-untyped-def]
    """A Word document with a paragraph per record (real italics and scripts)."""
    from .export.docx_writer import results_document, save_document

    save_document(results_document(records, style, form=form), out, inputs=inputs)
    print(f"wrote {out}")
    return 0


def _emit(text: str, out: str | None, inputs: Sequence[str] = ()) -> None:
    if out:
        from .files import write_atomic

        write_atomic(out, text if text.endswith("\n") else text + "\n", inputs=inputs)
    else:
        sys.stdout.write(text if text.endswith("\n") else text + "\n")


def _cmd_format(ns: argparse.Namespace) -> int:
    from .rendering.sentences import render

    record = _format_record(ns)
    if ns.out and ns.out.lower().endswith(".docx"):
        return _word([record], ns.style, ns.form, ns.out)
    _emit(render(record, ns.form, ns.style).to(ns.to), ns.out)
    return 0


def _cmd_render(ns: argparse.Namespace) -> int:
    from .rendering.sentences import render
    from .style import load_style

    style = load_style(ns.style)
    records = _read_records(ns.files)
    for where, why in _p_mismatches(records):
        print(f"statsetter render: warning: {where}: {why}", file=sys.stderr)
    if ns.table:
        return _render_table(ns, records, style)
    if ns.title:
        raise InputError("--title: a title is for a table; add --table results, regression or anova")
    if ns.out and ns.out.lower().endswith(".docx"):
        return _word(records, style, ns.form, ns.out, ns.files)
    lines = [render(record, ns.form, style).to(ns.to) for record in records]
    sep = "\n\n" if ns.to in ("md", "tex") else "\n"
    _emit(sep.join(lines), ns.out, inputs=ns.files)
    return 0


def _has_scipy() -> bool:
    from importlib.util import find_spec

    return find_spec("scipy") is not None


_OWN_P = {"t": 1, "z": 0, "F": 2, "chi2": 1, "r": 1, "rs": 1}  # statistics whose p follows from them and their df


def _p_mismatches(records) -> list[tuple[str, str]]:  # type: ignore[no-untyped-def]
    """Records whose p cannot come from their statistic (a hand-typed or
    retyped number, say). Adjusted p values and post hoc pairs, whose p comes
    from another distribution, are not checked."""
    from .pvalues import p_mismatch

    out: list[tuple[str, str]] = []
    if not _has_scipy():  # the core install renders without scipy; the check needs it
        return out
    for i, r in enumerate(records, 1):
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


def _render_table(ns: argparse.Namespace, records, style) -> int:  # type: ignore[no-untyped-def]
    if ns.table == "regression":
        from .rendering.regression_tables import regression_table

        table = regression_table(records, style, title=ns.title, number=1)
    elif ns.table == "anova":
        from .rendering.anova_tables import anova_table

        table = anova_table(records, style, title=ns.title, number=1)
    else:
        from .rendering.record_tables import results_table

        table = results_table(records, style, title=ns.title or "Results").with_number(1)
    if ns.out and ns.out.lower().endswith(".docx"):
        import docx

        from .export.docx_writer import add_table, save_document

        document = docx.Document()
        add_table(document, table, style)
        save_document(document, ns.out, inputs=ns.files)
        print(f"wrote {ns.out}")
        return 0
    from .export.text_tables import write_table

    _emit(write_table(table, ns.to), ns.out, inputs=ns.files)
    return 0


def _read_records(names: Sequence[str]):  # type: ignore[no-untyped-def]
    from .records import load_records

    out = []
    for name in names:
        from .files import read_input

        try:
            text = read_input(name, "records").decode("utf-8")
        except UnicodeDecodeError as exc:
            raise InputError(f"{name}: not UTF-8 text (byte {exc.start})") from None
        found = load_records(text, source=name)
        if not found:
            raise InputError(f"{name}: holds no records")
        out.extend(found)
    return out


def _cmd_fill(ns: argparse.Namespace) -> int:
    from .export.markers import describe, fill_chapter

    records = _read_records(ns.records)
    if not ns.out.endswith(".docx"):
        raise InputError(f"--out: {ns.out} does not end in .docx")
    report = fill_chapter(ns.chapter, records, ns.out, ns.style)
    for line in describe(report):
        print(line)
    print(f"wrote {ns.out}")
    return 1 if report.unknown else 0


_TABLE_FORMATS = {".md": "md", ".html": "html", ".htm": "html", ".tex": "tex", ".csv": "csv", ".txt": "text", ".docx": "docx"}


def _pairs(items: Sequence[str], option: str) -> dict[str, str]:
    out = {}
    for item in items:
        key, eq, value = item.partition("=")
        if not eq or not key.strip() or not value.strip():
            raise InputError(f"{option}: expected NAME=VALUE, got {item!r}")
        out[key.strip()] = value.strip()
    return out


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


def _cmd_describe(ns: argparse.Namespace) -> int:
    from .analyses.descriptives import describe
    from .io import read_data
    from .style import load_style

    fmt = "text"
    if ns.out:
        fmt = _TABLE_FORMATS.get(Path(ns.out).suffix.lower(), "")
        if not fmt:
            raise InputError(f"--out: {ns.out}: unknown extension; use one of {', '.join(_TABLE_FORMATS)}")
    style = load_style(ns.style)
    data = read_data(ns.data, sheet=ns.sheet, missing=_codes(ns.missing), encoding=ns.encoding,
                     sep="\t" if ns.sep == "tab" else ns.sep, decimal=ns.decimal)
    for note in data.notes:
        sys.stderr.write(f"data: {note}\n")
    show = {k: [i.strip() for i in v.split(",")] for k, v in _pairs(ns.show, "--show").items()}
    labels = {**data.labels, **_pairs(ns.label, "--label")}
    result = describe(
        data.frame,
        [v.strip() for v in ns.vars.split(",")] if ns.vars else None,
        by=ns.by,
        levels=_pairs(ns.level, "--level"),
        metadata_levels=data.levels,
        value_labels=data.value_labels,
        labels=labels,
        show=show,
        weights=ns.weights,
        tests=ns.tests,
        smd=ns.smd,
        suppress_below=ns.suppress_below,
        percent_of=ns.percent_of,
    )
    for level in result.levels:
        sys.stderr.write(("warning: " if level.weak else "level: ") + level.describe() + "\n")
    for level in result.left_out:
        sys.stderr.write(f"left out: {level.describe()}; name it in --vars to describe it\n")
    table = result.table(style, number=ns.number, title=ns.title)
    if fmt == "docx":
        import docx

        from .export.docx_writer import add_table, save_document

        document = docx.Document()
        add_table(document, table, style)
        save_document(document, ns.out, inputs=[ns.data])
    else:
        from .export.text_tables import write_table

        _emit(write_table(table, fmt), ns.out, inputs=[ns.data])
    if ns.out:
        print(f"wrote {ns.out}")
    return 0


def _cmd_audit(ns: argparse.Namespace) -> int:
    from .audit.report import annotate, as_csv, as_json, audit_file, print_table

    if not 0 < ns.alpha < 1:
        raise InputError(f"--alpha: {ns.alpha:g} is not between 0 and 1")
    if ns.annotate and not Path(ns.manuscript).suffix.lower() == ".docx":
        raise InputError(f"--annotate: {ns.manuscript}: comments can be added to a .docx manuscript only (save it as .docx)")
    if ns.annotate and not ns.annotate.lower().endswith(".docx"):
        raise InputError(f"--annotate: {ns.annotate} does not end in .docx")
    if ns.out and not (ns.json or ns.csv):
        raise InputError("--out: choose --json or --csv")
    if ns.grim_items is not None and ns.grim_items < 1:
        raise InputError("--grim-items: give a whole number of 1 or more")
    entries = audit_file(ns.manuscript, ns.style, alpha=ns.alpha, encoding=ns.encoding, grim_items=ns.grim_items)
    if ns.json or ns.csv:
        _emit(as_json(entries) if ns.json else as_csv(entries), ns.out, inputs=[ns.manuscript])
    else:
        print_table(entries, everything=ns.all)
    if ns.annotate:
        added, elsewhere = annotate(ns.manuscript, entries, ns.annotate)
        note = f" ({elsewhere} in headers, footers or notes listed only)" if elsewhere else ""
        sys.stderr.write(f"wrote {ns.annotate} with {added} comment(s){note}\n")
    return 1 if any(e.findings for e in entries) else 0


def _cmd_run(ns: argparse.Namespace) -> int:
    from .plan import load_plan, run_plan, write_outputs

    plan = load_plan(ns.plan)
    if len(plan.analyses) >= 8 and sys.stderr.isatty():
        from rich.console import Console
        from rich.progress import Progress

        with Progress(console=Console(stderr=True), transient=True) as bar:
            task = bar.add_task("analyses", total=len(plan.analyses))
            result = run_plan(plan, progress=lambda name: bar.update(task, advance=1, description=name))
    else:
        result = run_plan(plan)
    if ns.format == "json":
        from .records import dump_records

        sys.stdout.write(dump_records(result.records))
        return 0
    write_outputs(plan, result)
    print(f"{len(result.records)} results from {len(plan.analyses)} analyses and {len(plan.scales)} scale(s); {len(result.tables)} table(s)")
    for what, path in result.written:
        print(f"  {what:8} {path}")
    unused = [n for n in result.notes if n.startswith("record '") and n.endswith("not used by any marker")]
    for note in result.notes:
        if note not in unused:
            print(f"  {note}")
    if unused:
        print(f"  {len(unused)} record(s) not used by any marker of the chapter (all are in the outputs)")
    return 1 if result.unknown_markers else 0


def _cmd_styles(ns: argparse.Namespace) -> int:
    from .style import builtin_styles, check_style_file, load_style

    if ns.action == "list":
        for name in builtin_styles():
            style = load_style(name)
            print(f"{name:8} {style.title}")
        return 0
    if ns.target is None:
        raise InputError(f"styles {ns.action}: name a {'style' if ns.action == 'show' else 'TOML file'}")
    if ns.action == "show":
        _show_style(load_style(ns.target))
        return 0
    style = check_style_file(ns.target)
    print(f"{ns.target}: valid style {style.name!r} ({style.title})")
    return 0


def _show_style(style) -> None:  # type: ignore[no-untyped-def]
    from .rendering.sentences import render
    from .records import EffectSize, Interval, Result, Statistic

    print(f"{style.name}: {style.title}")
    print(f"  source: {style.source}")
    for section in ("numbers", "p", "ci", "wording"):
        for key, value in style.data[section].items():
            shown = ", ".join(value) if isinstance(value, tuple) and value and isinstance(value[0], str) else value
            if isinstance(shown, dict) or hasattr(shown, "items"):
                shown = ", ".join(f"{k}={v}" for k, v in shown.items())
            print(f"  {section}.{key} = {shown!r}" if isinstance(shown, str) else f"  {section}.{key} = {shown}")
    sample = Result(
        kind="t_independent",
        statistic=Statistic("t", -2.1436, (38,)),
        p=0.03855,
        effects=(EffectSize("d", -0.6779, Interval(0.95, -1.3127, -0.0346)),),
    )
    print("  example: " + render(sample, "stats", style).plain())


def main(argv: Sequence[str] | None = None) -> int:
    parser = _build_parser()
    ns = parser.parse_args(argv)
    if ns.version:
        from . import __version__

        print(f"statsetter {__version__}")
        return 0
    if ns.command is None:
        parser.print_help()
        return 0
    handlers = {"format": _cmd_format, "render": _cmd_render, "fill": _cmd_fill, "describe": _cmd_describe, "audit": _cmd_audit, "run": _cmd_run, "styles": _cmd_styles}
    from .errors import EnvironmentFailure, MissingExtra
    from .files import inputs_scope

    import warnings

    def show(message, category, *rest) -> None:  # type: ignore[no-untyped-def]  # one line, no source, every time
        sys.stderr.write(f"statsetter {ns.command}: warning: {message}\n")

    previous = _on_terminate()
    try:
        with inputs_scope(), warnings.catch_warnings():
            warnings.simplefilter("ignore")  # libraries' runtime and deprecation warnings are not for the user
            warnings.simplefilter("always", UserWarning)  # ours (a removed character, a p that does not follow) always are
            warnings.showwarning = show
            return handlers[ns.command](ns)
    except EnvironmentFailure as exc:
        sys.stderr.write(f"statsetter {ns.command}: error: {exc}\n")
        return EXIT_ENVIRONMENT
    except StatsetterError as exc:
        sys.stderr.write(f"statsetter {ns.command}: error: {exc}\n")
        return EXIT_USAGE
    except KeyboardInterrupt:
        sys.stderr.write("statsetter: interrupted; nothing was left half-written\n")
        return 130
    except BrokenPipeError:
        return 0
    except ModuleNotFoundError as exc:
        sys.stderr.write(f"statsetter {ns.command}: error: {MissingExtra(exc.name or str(exc), f'statsetter {ns.command}')}\n")
        return EXIT_ENVIRONMENT
    except MemoryError:
        sys.stderr.write(f"statsetter {ns.command}: error: out of memory; the input is too large for this machine\n")
        return EXIT_ENVIRONMENT
    except OSError as exc:
        where = f" ({exc.filename})" if exc.filename else ""
        sys.stderr.write(f"statsetter {ns.command}: error: {exc.strerror or exc}{where}\n")
        return EXIT_ENVIRONMENT
    except RecursionError:
        sys.stderr.write(f"statsetter {ns.command}: error: the input is nested too deeply to read\n")
        return EXIT_USAGE
    except Exception:  # a bug: one line, the traceback in a log file
        return _internal_error(ns)
    finally:
        _restore(previous)


def _on_terminate():  # type: ignore[no-untyped-def]
    """On SIGTERM or Ctrl-C: remove this process's temporary outputs, say so
    and exit at once (128 + the signal). Renames are never cut half-way: the
    writers block these signals around them."""
    import os
    import signal
    import threading

    if threading.current_thread() is not threading.main_thread():
        return None

    def stop(signum, frame):  # type: ignore[no-untyped-def]
        from .files import remove_temporaries

        remove_temporaries()
        try:
            sys.stderr.write("statsetter: interrupted; nothing was left half-written\n")
            sys.stderr.flush()
        except (OSError, ValueError):
            pass
        os._exit(128 + signum)

    try:
        return {sig: signal.signal(sig, stop) for sig in (signal.SIGTERM, signal.SIGINT)}
    except (ValueError, OSError):  # pragma: no cover - not the main thread of the interpreter
        return None


def _restore(previous) -> None:  # type: ignore[no-untyped-def]
    import signal

    for sig, handler in (previous or {}).items():
        signal.signal(sig, handler)


def _internal_error(ns: argparse.Namespace) -> int:
    import tempfile
    import time
    import traceback

    text = traceback.format_exc()
    if getattr(ns, "debug", False):
        sys.stderr.write(text)
    try:
        fd, log = tempfile.mkstemp(prefix=f"statsetter-{ns.command}-{time.strftime('%Y%m%d-%H%M%S')}-", suffix=".log")
        with open(fd, "w", encoding="utf-8") as fh:
            fh.write(f"statsetter {ns.command}: internal error\nargs: {sys.argv[1:]}\n\n{text}")
        where = f"the full traceback is in {log}"
    except OSError:
        where = "the traceback could not be saved"
    sys.stderr.write(f"statsetter {ns.command}: internal error (a bug in statsetter, not in your input); {where}; rerun with --debug to print it\n")
    return EXIT_INTERNAL


if __name__ == "__main__":
    raise SystemExit(main())
