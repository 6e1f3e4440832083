"""Reading inputs and writing outputs safely.

Inputs: only regular files are read (a named pipe, a device or a folder is
refused before it is opened), each kind of file has a size limit checked
while reading, and every file read is remembered for the rest of the process.
Outputs: written to a temporary name in the target folder and renamed; never
over a file that was read (after symlinks and ``..``; on a case-insensitive
file system the inode comparison catches a differently cased name). Inside
:func:`transaction` every output is staged and renamed only when the whole
transaction succeeds, so a failed or interrupted run leaves the previous
outputs as they were and no temporary files. A run killed outright
(SIGKILL, a power cut) cannot remove its own: each temporary file's name
carries its process's id, and the next write to the same target removes
those of processes no longer running.
"""

from __future__ import annotations

import contextlib
import contextvars
import os
import re
import stat
import tempfile
from pathlib import Path
from typing import Iterable, Iterator

from .errors import InputError

__all__ = ["write_atomic", "same_file", "read_start", "read_input", "check_input", "register_input", "transaction", "inputs_scope", "LIMITS"]

MiB = 1 << 20
# Size limits per kind of input (README, "Limits").
LIMITS = {
    "data": 2048 * MiB,
    "manuscript": 256 * MiB,
    "chapter": 256 * MiB,
    "records": 256 * MiB,
    "plan": 4 * MiB,
    "style": 1 * MiB,
}

class _Read:
    def __init__(self) -> None:
        self.paths: set[str] = set()
        self.inodes: set[tuple[int, int]] = set()


_READ: contextvars.ContextVar["_Read | None"] = contextvars.ContextVar("statsetter_inputs", default=None)


@contextlib.contextmanager
def inputs_scope() -> Iterator[None]:
    """Within this scope (one command), every file read is remembered and no
    output may replace it. Outside a scope only the ``inputs`` named to
    :func:`write_atomic` are protected."""
    token = _READ.set(_Read())
    try:
        yield
    finally:
        _READ.reset(token)


def _size(n: int) -> str:
    return f"{n / MiB:,.0f} MiB" if n >= MiB else f"{n:,} bytes"


def check_input(path: "str | Path", kind: str = "data") -> Path:
    """``path`` if it is a regular file within the kind's size limit (it is
    then remembered as an input); else an InputError naming it. Nothing is
    opened, so a named pipe cannot block."""
    p = Path(path)
    try:
        st = os.stat(p)
    except FileNotFoundError:
        raise InputError(f"{p}: no such file") from None
    except OSError as exc:
        raise InputError(f"{p}: cannot read ({exc.strerror or exc})") from None
    if stat.S_ISDIR(st.st_mode):
        raise InputError(f"{p}: is a folder, not a file")
    if not stat.S_ISREG(st.st_mode):
        what = "a named pipe" if stat.S_ISFIFO(st.st_mode) else "a device" if stat.S_ISCHR(st.st_mode) or stat.S_ISBLK(st.st_mode) else "a socket" if stat.S_ISSOCK(st.st_mode) else "not a regular file"
        raise InputError(f"{p}: {what}, not a regular file; statsetter reads only regular files")
    limit = LIMITS.get(kind)
    if limit is not None and st.st_size > limit:
        raise InputError(f"{p}: {_size(st.st_size)}, over the limit of {_size(limit)} for a {kind} file")
    register_input(p, st)
    return p


def register_input(path: "str | Path", st: os.stat_result | None = None) -> None:
    """Remember ``path`` as read: no output of the current command may replace it."""
    read = _READ.get()
    if read is None:
        return
    read.paths.add(os.path.normcase(os.path.realpath(path)))
    try:
        st = st or os.stat(path)
        read.inodes.add((st.st_dev, st.st_ino))
    except OSError:
        pass


def is_input(path: "str | Path") -> bool:
    read = _READ.get()
    if read is None:
        return False
    if os.path.normcase(os.path.realpath(path)) in read.paths:
        return True
    try:
        st = os.stat(path)
    except OSError:
        return False
    return (st.st_dev, st.st_ino) in read.inodes


def read_input(path: "str | Path", kind: str, limit: int | None = None) -> bytes:
    """The bytes of an input file (at most ``limit``, else all of it within the
    kind's size limit, counted while reading); an empty file is an error."""
    p = check_input(path, kind)
    cap = LIMITS.get(kind, 256 * MiB)
    want = cap + 1 if limit is None else limit
    try:
        with p.open("rb") as fh:
            data = fh.read(want)
    except OSError as exc:
        raise InputError(f"{p}: cannot read ({exc.strerror or exc})") from None
    if limit is None and len(data) > cap:
        raise InputError(f"{p}: over the limit of {_size(cap)} for a {kind} file")
    if not data:
        raise InputError(f"{p}: the file is empty")
    return data


def read_start(path: "str | Path", limit: int | None = None, kind: str = "data") -> bytes:
    """The first ``limit`` bytes of a file (all of it when None), or an
    InputError naming the file: no such file, a folder, not a regular file,
    too large, unreadable, empty."""
    return read_input(path, kind, limit)


def same_file(a: "str | Path", b: "str | Path") -> bool:
    a, b = Path(a), Path(b)
    try:
        if a.exists() and b.exists():
            return os.path.samefile(a, b)
    except OSError:
        pass
    return os.path.normcase(os.path.realpath(a)) == os.path.normcase(os.path.realpath(b))


_LIVE: set[str] = set()  # temporary files not yet renamed or removed


def remove_temporaries() -> None:
    """Remove every temporary output file of this process (on a kill)."""
    for tmp in list(_LIVE):
        with contextlib.suppress(OSError):
            os.unlink(tmp)
        _LIVE.discard(tmp)


class _Staged:
    def __init__(self) -> None:
        self.pending: list[tuple[str, Path]] = []  # (temporary file, target)


_STAGING: contextvars.ContextVar[_Staged | None] = contextvars.ContextVar("statsetter_staging", default=None)


@contextlib.contextmanager
def transaction() -> Iterator[None]:
    """Every :func:`write_atomic` inside is staged; all are renamed into place
    at the end, or all removed if anything fails or the run is interrupted."""
    staged = _Staged()
    token = _STAGING.set(staged)
    try:
        yield
        targets = [str(t) for _, t in staged.pending]
        if len(set(targets)) != len(targets):
            dup = next(t for t in targets if targets.count(t) > 1)
            raise InputError(f"{dup}: two outputs have the same path")
        blocked = _block_signals()
        try:  # the renames are not interrupted half-way by Ctrl-C or a kill
            for tmp, target in staged.pending:
                os.replace(tmp, target)
                _LIVE.discard(tmp)
            staged.pending.clear()
        finally:
            _unblock_signals(blocked)
    finally:
        _STAGING.reset(token)
        for tmp, _ in staged.pending:
            with contextlib.suppress(OSError):
                os.unlink(tmp)
            _LIVE.discard(tmp)


def _block_signals() -> "set[int] | None":
    import signal
    import threading

    if threading.current_thread() is not threading.main_thread() or not hasattr(signal, "pthread_sigmask"):
        return None
    return signal.pthread_sigmask(signal.SIG_BLOCK, {signal.SIGINT, signal.SIGTERM})


def _unblock_signals(previous: "set[int] | None") -> None:
    import signal

    if previous is not None:
        signal.pthread_sigmask(signal.SIG_SETMASK, previous)


def check_output(path: "str | Path", inputs: Iterable["str | Path"] = ()) -> Path:
    """``path`` if it may be written: not an input read by this process or
    given in ``inputs``, not a folder, in a folder that exists."""
    target = Path(path)
    if is_input(target) or any(same_file(target, source) for source in inputs):
        raise InputError(f"{target}: the output would overwrite an input file; choose another output path")
    if target.is_dir():
        raise InputError(f"{target}: is a folder; give a file name for the output")
    folder = target.parent if str(target.parent) else Path(".")
    if not folder.is_dir():
        raise InputError(f"{target}: folder {folder} does not exist")
    return target


_HIDDEN: dict[str, list[str]] = {}  # folder: the hidden temporary names it held when first written to


def _alive(pid: int) -> bool:
    """Whether process ``pid`` runs (on a system that cannot tell, it is taken to)."""
    if os.name != "posix":
        return True
    try:
        os.kill(pid, 0)
    except ProcessLookupError:
        return False
    except OSError:  # (another user's process: running)
        return True
    return True


_OURS = re.compile(r"\..+\.statsetter-(\d+)\.[^.]+\.tmp")  # a temporary file of statsetter's: ".NAME.statsetter-PID.xxxx.tmp"


def _remove_orphans(folder: Path, name: str) -> None:
    """The temporary files that killed runs left behind in ``folder`` (".NAME.statsetter-PID.xxxx.tmp" of a process
    that no longer runs, whatever output it was writing: one a later plan no longer names too; and the older naming,
    ".NAME.PID.xxxx.tmp", for ``name`` alone): removed, so that they do not pile up beside the outputs."""
    key = os.path.realpath(folder)
    hidden = _HIDDEN.get(key)
    if hidden is None:  # the folder's hidden .tmp names, listed once a process (a folder of many files is listed once)
        try:
            hidden = _HIDDEN[key] = [e.name for e in os.scandir(folder) if e.name.startswith(".") and e.name.endswith(".tmp")]
        except OSError:
            return
    prefix = f".{name}."
    for found in hidden:
        ours = _OURS.fullmatch(found)
        if ours is not None:
            pid = ours.group(1)
        elif found.startswith(prefix):
            pid = found[len(prefix) :].split(".", 1)[0]
        else:
            continue
        if pid.isdigit() and int(pid) != os.getpid() and not _alive(int(pid)):
            with contextlib.suppress(OSError):
                os.unlink(os.path.join(folder, found))


def write_atomic(path: "str | Path", data: "str | bytes", *, inputs: Iterable["str | Path"] = ()) -> Path:
    """Write ``data`` to ``path`` through a temporary file in the same folder.
    Refuses when ``path`` is an input; the old file is untouched on failure."""
    target = check_output(path, inputs)
    folder = target.parent if str(target.parent) else Path(".")
    raw = data.encode("utf-8") if isinstance(data, str) else data
    _remove_orphans(folder, target.name)
    blocked = _block_signals()  # a kill between creating and recording the temporary file would leave it behind
    try:
        fd, tmp = tempfile.mkstemp(prefix=f".{target.name}.statsetter-{os.getpid()}.", suffix=".tmp", dir=folder)
        _LIVE.add(tmp)
    finally:
        _unblock_signals(blocked)
    staged = _STAGING.get()
    try:
        with os.fdopen(fd, "wb") as fh:
            fh.write(raw)
        if staged is not None:
            staged.pending.append((tmp, target))
        else:
            blocked = _block_signals()
            try:
                os.replace(tmp, target)
                _LIVE.discard(tmp)
            finally:
                _unblock_signals(blocked)
    except BaseException as exc:
        with contextlib.suppress(OSError):
            os.unlink(tmp)
        _LIVE.discard(tmp)
        if isinstance(exc, OSError) and exc.filename is None and exc.errno is not None:  # a full disk's write names no file: the target
            raise OSError(exc.errno, exc.strerror, str(target)) from None
        raise
    return target
