"""``statsetter run``: an analysis plan, from data to every output."""

from __future__ import annotations

import argparse
import gc
import sys
from typing import TYPE_CHECKING

if TYPE_CHECKING:
    from ..plan import Plan, RunResult


def add(sub) -> None:  # type: ignore[no-untyped-def]
    rn = sub.add_parser(
        "run",
        help="run an analysis plan: every table and paragraph into every output, the chapter filled",
        description="Run a plan file (TOML; see the README): read the data, score the scales, run every analysis, "
        "build the tables, write the outputs and fill the chapter's markers. Re-run after the data change.",
    )
    rn.add_argument("plan", metavar="PLAN.toml")
    rn.add_argument("--format", choices=("files", "json"), default="files", help="json: print the records instead of writing the outputs")
    rn.set_defaults(handler=run)


def _settled(analysis: str = "") -> None:
    """Before the data are read and before each analysis: the young objects' cycles collected, and what is left (the
    modules imported so far, the libraries' among them, which the analyses import lazily; the data; the records so
    far) frozen, so that the collector's full passes, which the libraries' imports set off, do not walk them again and
    again (on the demo plan, 0.18 s of CPU)."""
    gc.collect(1)
    gc.freeze()


def _computed(plan: "Plan") -> "RunResult":
    """The plan run, with a progress bar on a terminal; the collector as before afterwards. The analyses' own text
    arrays (names, labels, categories) are kept in Python strings: Arrow's would start its memory pool (1 to 10 ms)
    for arrays of a few names (a large data file's columns are still Arrow's: io._text_storage)."""
    import pandas as pd

    from ..plan import run_plan

    _settled()
    with pd.option_context("mode.string_storage", "python"):
        try:
            if len(plan.analyses) >= 8 and sys.stderr.isatty():
                from rich.console import Console
                from rich.progress import Progress

                with Progress(console=Console(stderr=True), transient=True) as bar:
                    task = bar.add_task("analyses", total=len(plan.analyses))

                    def advanced(name: str) -> None:
                        _settled(name)
                        bar.update(task, advance=1, description=name)

                    return run_plan(plan, progress=advanced)
            return run_plan(plan, progress=_settled)
        finally:
            gc.unfreeze()


def run(ns: argparse.Namespace) -> int:
    from ..plan import load_plan, write_outputs

    plan = load_plan(ns.plan)
    if ns.format != "json" and plan.chapter:  # said before the analyses run, not after
        from ..plan import PlanError

        source = plan.resolve(plan.chapter["path"])
        if not source.is_file():
            raise PlanError(f"{plan.where('chapter.path')}: {source}: no such file")
    result = _computed(plan)
    if ns.format == "json":
        from ..records import dump_records

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
