"""The exit-status contract and the one error layer every command runs in:
0 success; 1 findings or unknown markers; 2 a usage or input error; 3 the
environment (disk, permission, a missing extra); 4 an internal error (one
line here, the traceback in a log file). No traceback reaches a user, and on
SIGTERM or Ctrl-C no output is left half-written."""

from __future__ import annotations

import argparse
import sys
from typing import Callable

from ..errors import EnvironmentFailure, MissingExtra, StatsetterError

__all__ = ["EXIT_OK", "EXIT_FINDINGS", "EXIT_USAGE", "EXIT_ENVIRONMENT", "EXIT_INTERNAL", "Parser", "guarded"]

EXIT_OK = 0           # success; nothing found
EXIT_FINDINGS = 1     # audit findings, unknown markers
EXIT_USAGE = 2        # a usage or input error (bad file, plan, data, option)
EXIT_ENVIRONMENT = 3  # disk full, permission denied, a missing optional dependency
EXIT_INTERNAL = 4     # a bug in statsetter: one line here, the traceback in a log file

EPILOG = (
    "exit status: 0 success or nothing found; 1 audit findings or unknown markers; 2 a usage or input error; "
    "3 the environment (disk full, permission, a missing optional dependency); 4 an internal error (traceback in a log file)."
)


class Parser(argparse.ArgumentParser):
    def error(self, message: str) -> None:  # two lines, exit 2
        sys.stderr.write(f"{self.prog}: error: {message}\n(see '{self.prog} --help')\n")
        raise SystemExit(EXIT_USAGE)


def guarded(ns: argparse.Namespace, handler: Callable[[argparse.Namespace], int]) -> int:
    """Run one command: inputs protected for its duration, our warnings as
    one line each, every failure turned into a message and its exit status."""
    import warnings

    from ..files import inputs_scope

    def show(message, category, *rest) -> None:  # type: ignore[no-untyped-def]  # one line, no source, every time
        sys.stderr.write(f"statsetter {ns.command}: warning: {message}\n")

    previous = _on_terminate()
    try:
        with inputs_scope(), warnings.catch_warnings():
            warnings.simplefilter("ignore")  # libraries' runtime and deprecation warnings are not for the user
            warnings.simplefilter("always", UserWarning)  # ours (a removed character, a p that does not follow) always are
            warnings.showwarning = show
            return handler(ns)
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
        return EXIT_OK
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
        from ..files import remove_temporaries

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
    sys.stderr.write(f"statsetter {ns.command}: internal error (a bug in statsetter, not in your input); {where}; rerun as 'statsetter --debug {ns.command} …' to print it\n")
    return EXIT_INTERNAL
