"""Start-up: the CPU time of a fresh process for `statsetter --help` and for
`statsetter format` of one t test whose p statsetter computes, against the
floor of any command-line tool built on a template engine, a process that
only imports jinja2. Runs take turns (floor, help, format) so that all see
the same machine; each ratio is the median of the per-run ratios. Targets
(issue: speed): --help ≤ 3×, format ≤ 4×. And `statsetter run` of the demo
plan against a process importing exactly the library modules the run imports,
in three forms taking turns with it (``libraries``): frozen as the process
ends, as statsetter's process is (the like-for-like floor: target ≤ 1.2×);
frozen after every module; and with the collector as Python leaves it.

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


def libraries(freeze: str = "") -> list[str]:
    """A command that imports every library module the demo plan's run imports, and nothing else (run with BLAS on one
    thread, as statsetter's command runs it: with the default threads, importing numpy spends about 0.1 s more CPU in
    threads that wait busily, and the floor would flatter the run's CPU ratio). ``freeze``: "exit", the collector's
    objects frozen as the process ends, as statsetter's process does (the interpreter's exit then neither walks nor
    frees them one by one); "each", frozen after every module — the import as cheap as the collector allows, its
    full passes walking only the newest module's objects."""
    found = subprocess.run([sys.executable, "-c", _LIBRARIES, PLAN], check=True, capture_output=True, text=True, env=_ENV).stdout.split()
    each, end = {"each": ("\n    gc.freeze()", ""), "exit": ("", "\ngc.freeze()")}.get(freeze, ("", ""))
    return [sys.executable, "-c", "import gc, importlib\nfor m in %r:\n    try:\n        importlib.import_module(m)\n    except Exception:\n        pass%s%s"
            % (found, each, end)]


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
    floors = {"exit": libraries("exit"), "each": libraries("each"), "": libraries()}
    blas = {**_ENV, **_ONE_BLAS_THREAD}  # the libraries' floor as the run imports them
    for command in (FLOOR, HELP, FORMAT, *floors.values(), RUN):  # warm the file cache and the bytecode
        cpu(command, blas if command in floors.values() else None)
    floor, helps, formats, plans = [], [], [], []
    library: dict[str, list[float]] = {key: [] for key in floors}
    for _ in range(RUNS):
        floor.append(cpu(FLOOR))
        helps.append(cpu(HELP))
        formats.append(cpu(FORMAT))
        for key, command in floors.items():
            library[key].append(cpu(command, blas))
        plans.append(cpu(RUN))
    f = statistics.median(floor)
    print(f"start-up CPU, median of {RUNS} interleaved runs")
    print(f"python -c 'import jinja2' (floor): {f * 1000:7.1f} ms")
    for name, runs, target in (("statsetter --help", helps, 3), ("statsetter format t ...", formats, 4)):
        ratios = [m / b for m, b in zip(runs, floor)]
        print(f"{name:26s}: {statistics.median(runs) * 1000:7.1f} ms  ratio to floor {statistics.median(ratios):4.1f} "
              f"(per-run {min(ratios):.1f}-{max(ratios):.1f}; target {target})")
    print(f"statsetter run demo/plan.toml: {statistics.median(plans) * 1000:7.1f} ms")
    for key, name, target in (("exit", "importing its libraries, frozen as the process ends (as the run's process is)", " (target 1.2)"),
                              ("each", "the same, frozen after every module (the cheapest import)", ""),
                              ("", "the same, the collector as Python leaves it", "")):
        base, command = library[key], floors[key]
        ratios = [m / b for m, b in zip(plans, base)]
        walls = [m / b for m, b in zip(_WALL[tuple(RUN)][1:], _WALL[tuple(command)][1:])]  # the warm-up runs left out
        print(f"  against {name}: {statistics.median(base) * 1000:7.1f} ms, ratio {statistics.median(ratios):.2f} "
              f"(per-run {min(ratios):.2f}-{max(ratios):.2f}){target}; in wall time {statistics.median(walls):.2f} "
              f"(per-run {min(walls):.2f}-{max(walls):.2f})")


if __name__ == "__main__":
    try:
        main()
    finally:
        shutil.rmtree(_CACHE, ignore_errors=True)
