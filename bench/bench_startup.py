"""Start-up: the CPU time of a fresh process for `statsetter --help` and for
`statsetter format` of one t test whose p statsetter computes, against the
floor of any command-line tool built on a template engine, a process that
only imports jinja2. Runs take turns (floor, help, format) so that all see
the same machine; each ratio is the median of the per-run ratios. Targets
(issue: speed): --help ≤ 3×, format ≤ 4×.

Every process runs with its modules' bytecode, as an installed package has it
(pip compiles at install): the bytecode goes to a cache of the benchmark's
own (PYTHONPYCACHEPREFIX), written by the warm-up runs, so the source tree and
the environment are left as they were. (Before, the runs set
PYTHONDONTWRITEBYTECODE: the libraries came with their bytecode from pip and
statsetter's modules were compiled from source in every run.)"""

from __future__ import annotations

import os
import resource
import shutil
import statistics
import subprocess
import sys
import tempfile
import time

from statsetter.cli import _BLAS_THREADS

RUNS = 7
FLOOR = [sys.executable, "-c", "import jinja2"]
HELP = [sys.executable, "-m", "statsetter", "--help"]
FORMAT = [sys.executable, "-m", "statsetter", "format", "t", "--stat", "2.14", "--df", "38", "--effect", "d=0.68", "--effect-ci", "0.04,1.31"]
PLAN = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "demo", "plan.toml")
RUN = [sys.executable, "-m", "statsetter", "run", "--format", "json", PLAN]
_LIBRARIES = (  # the third-party modules a run of the plan imports, printed by a run itself
    "import sys, runpy\nsys.argv = ['statsetter', 'run', '--format', 'json', sys.argv[1]]\n"
    "import contextlib, io\nwith contextlib.redirect_stdout(io.StringIO()):\n"
    "    try:\n        runpy.run_module('statsetter', run_name='__main__')\n    except SystemExit:\n        pass\n"
    "roots = set(sys.stdlib_module_names) | {'statsetter', '__main__', '_distutils_hack'}\n"
    "print(' '.join(sorted(m for m in list(sys.modules) if m.split('.')[0] not in roots and not m.split('.')[0].startswith('_'))))"
)


def libraries() -> list[str]:
    """A command that imports every library module the demo plan's run imports, and nothing else (run with BLAS on one
    thread, as statsetter's command runs it: with the default threads, importing numpy spends about 0.1 s more CPU in
    threads that wait busily, and the floor would flatter the run's CPU ratio)."""
    found = subprocess.run([sys.executable, "-c", _LIBRARIES, PLAN], check=True, capture_output=True, text=True, env=_ENV).stdout.split()
    return [sys.executable, "-c", "import importlib\nfor m in %r:\n    try:\n        importlib.import_module(m)\n    except Exception:\n        pass" % found]


_WALL: dict[tuple[str, ...], list[float]] = {}  # the wall time of each run, by command
_CACHE = tempfile.mkdtemp(prefix="statsetter-bench-bytecode-")
_ENV = {**{k: v for k, v in os.environ.items() if k != "PYTHONDONTWRITEBYTECODE"}, "PYTHONPYCACHEPREFIX": _CACHE}


_ONE_BLAS_THREAD = {name: os.environ.get(name, "1") for name in _BLAS_THREADS}  # what the command sets


def cpu(command: list[str], env: dict[str, str] | None = None) -> float:
    """User + system CPU seconds of one run of ``command`` (its own process tree); its wall time is kept in _WALL
    (a process whose BLAS threads wait busily uses more CPU than the time a user waits)."""
    before = resource.getrusage(resource.RUSAGE_CHILDREN)
    start = time.perf_counter()
    subprocess.run(command, check=True, stdout=subprocess.DEVNULL, env=env or _ENV)
    _WALL.setdefault(tuple(command), []).append(time.perf_counter() - start)
    after = resource.getrusage(resource.RUSAGE_CHILDREN)
    return (after.ru_utime - before.ru_utime) + (after.ru_stime - before.ru_stime)


def main() -> None:
    imports = libraries()
    blas = {**_ENV, **_ONE_BLAS_THREAD}  # the libraries' floor as the run imports them
    for command in (FLOOR, HELP, FORMAT, imports, RUN):  # warm the file cache and the bytecode
        cpu(command, blas if command is imports else None)
    floor, helps, formats, library, plans = [], [], [], [], []
    for _ in range(RUNS):
        floor.append(cpu(FLOOR))
        helps.append(cpu(HELP))
        formats.append(cpu(FORMAT))
        library.append(cpu(imports, blas))
        plans.append(cpu(RUN))
    f = statistics.median(floor)
    print(f"start-up CPU, median of {RUNS} interleaved runs")
    print(f"python -c 'import jinja2' (floor): {f * 1000:7.1f} ms")
    for name, runs, target in (("statsetter --help", helps, 3), ("statsetter format t ...", formats, 4)):
        ratios = [m / b for m, b in zip(runs, floor)]
        print(f"{name:26s}: {statistics.median(runs) * 1000:7.1f} ms  ratio to floor {statistics.median(ratios):4.1f} "
              f"(per-run {min(ratios):.1f}-{max(ratios):.1f}; target {target})")
    ratios = [m / b for m, b in zip(plans, library)]
    print(f"statsetter run demo/plan.toml: {statistics.median(plans) * 1000:7.1f} ms; importing its libraries {statistics.median(library) * 1000:7.1f} ms; "
          f"ratio {statistics.median(ratios):.2f} (per-run {min(ratios):.2f}-{max(ratios):.2f}; target 1.2)")
    walls = [m / b for m, b in zip(_WALL[tuple(RUN)][1:], _WALL[tuple(imports)][1:])]  # the warm-up runs left out
    print(f"  the same in wall time: {statistics.median(_WALL[tuple(RUN)][1:]) * 1000:7.1f} ms against "
          f"{statistics.median(_WALL[tuple(imports)][1:]) * 1000:7.1f} ms, ratio {statistics.median(walls):.2f} "
          f"(per-run {min(walls):.2f}-{max(walls):.2f})")


if __name__ == "__main__":
    try:
        main()
    finally:
        shutil.rmtree(_CACHE, ignore_errors=True)
