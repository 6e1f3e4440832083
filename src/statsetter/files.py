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
