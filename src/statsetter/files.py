"""Writing output files safely: to a temporary name, then renamed; never over an input."""

from __future__ import annotations

import os
import tempfile
from pathlib import Path
from typing import Iterable

from .errors import InputError

__all__ = ["write_atomic", "same_file"]


def same_file(a: "str | Path", b: "str | Path") -> bool:
    a, b = Path(a), Path(b)
    try:
        if a.exists() and b.exists():
            return os.path.samefile(a, b)
    except OSError:
        pass
    return a.resolve() == b.resolve()


def read_start(path: "str | Path", limit: int | None = None) -> bytes:
    """The first ``limit`` bytes of a file (all of it when None), or an
    InputError naming the file: no such file, a folder, unreadable, empty.
    The one place the readers (data files, manuscripts, Word documents) turn
    an unreadable path into a message."""
    p = Path(path)
    try:
        with p.open("rb") as fh:
            data = fh.read() if limit is None else fh.read(limit)
    except FileNotFoundError:
        raise InputError(f"{p}: no such file") from None
    except IsADirectoryError:
        raise InputError(f"{p}: is a folder, not a file") from None
    except OSError as exc:
        raise InputError(f"{p}: cannot read ({exc.strerror or exc})") from None
    if not data:
        raise InputError(f"{p}: the file is empty")
    return data


def write_atomic(path: "str | Path", data: "str | bytes", *, inputs: Iterable["str | Path"] = ()) -> Path:
    """Write ``data`` to ``path`` through a temporary file in the same folder.
    Refuses when ``path`` is one of ``inputs``; the old file is untouched on failure."""
    target = Path(path)
    for source in inputs:
        if same_file(target, source):
            raise InputError(f"{target}: the output would overwrite an input file; choose another output path")
    folder = target.parent if str(target.parent) else Path(".")
    if not folder.is_dir():
        raise InputError(f"{target}: folder {folder} does not exist")
    raw = data.encode("utf-8") if isinstance(data, str) else data
    fd, tmp = tempfile.mkstemp(prefix=f".{target.name}.", suffix=".tmp", dir=folder)
    try:
        with os.fdopen(fd, "wb") as fh:
            fh.write(raw)
        os.replace(tmp, target)
    except BaseException:
        try:
            os.unlink(tmp)
        except OSError:
            pass
        raise
    return target
