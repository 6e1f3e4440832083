"""The ``statsetter`` command: one module per command, one error layer.

Commands: ``format`` (one result from numbers on the command line),
``render`` (JSON files of records), ``records`` (list the records in a file),
``fill`` (markers in a chapter), ``describe`` (a descriptives table from a
data file), ``audit`` (a manuscript's statistics checked), ``run`` (an
analysis plan), ``styles`` (list, show, check). The exit status follows one
contract for every command (``cli/exits.py``); no traceback reaches a user.
"""

from __future__ import annotations

import argparse
import os
import sys
from typing import Sequence

from . import audit, describe, fill, format, records, render, run, styles
from .exits import EPILOG, EXIT_ENVIRONMENT, EXIT_FINDINGS, EXIT_INTERNAL, EXIT_OK, EXIT_USAGE, Parser, guarded

__all__ = ["main", "EXIT_OK", "EXIT_FINDINGS", "EXIT_USAGE", "EXIT_ENVIRONMENT", "EXIT_INTERNAL"]

COMMANDS = (format, render, records, fill, describe, audit, run, styles)


def build_parser() -> argparse.ArgumentParser:
    parser = Parser(
        prog="statsetter",
        description="Statistical results as manuscript-ready text and tables, in a chosen reporting style.",
        epilog=EPILOG,
    )
    parser.add_argument("--version", action="store_true", help="print the version and exit")
    parser.add_argument("--debug", action="store_true", help="print the full traceback of an internal error")
    sub = parser.add_subparsers(dest="command", metavar="COMMAND", parser_class=Parser)
    for command in COMMANDS:
        command.add(sub)
    return parser


# statsetter's matrices are small (a regression's X'X, a correlation matrix of some dozens of variables): BLAS threads
# would only wait busily, spending CPU without saving time (the demo plan: 0.23 s more CPU, the same wall time). A
# command runs BLAS on one thread unless the environment says otherwise (numpy reads these when it loads its BLAS).
_BLAS_THREADS = ("OPENBLAS_NUM_THREADS", "MKL_NUM_THREADS", "VECLIB_MAXIMUM_THREADS")


def main(argv: Sequence[str] | None = None) -> int:
    if "numpy" not in sys.modules:
        for name in _BLAS_THREADS:
            os.environ.setdefault(name, "1")
    parser = build_parser()
    ns = parser.parse_args(argv)
    if ns.version:
        from .._version import __version__

        print(f"statsetter {__version__}")
        return EXIT_OK
    if ns.command is None:
        parser.print_help()
        return EXIT_OK
    return guarded(ns, ns.handler)


def entry() -> int:
    """The ``statsetter`` process: ``main`` and then, as the process is about to end, every object the collector
    tracks frozen — the interpreter's exit then neither walks them in its last collections nor frees them one by one
    (the operating system takes the memory back; files are closed and exit handlers run as always). Exiting, a run of
    the demo plan spent 0.3 s of CPU on that: as much as all its analyses."""
    import gc

    try:
        return main()
    finally:
        gc.freeze()


if __name__ == "__main__":
    sys.exit(entry())
