"""Benchmark: how four jobs grow with their input — time, peak memory, doubling.

Each size runs in a fresh Python process, so that its peak resident memory
(``ru_maxrss``) is its own: the input is made first (not timed; its resident
size is printed as "input"), then the job runs three times and the median
time is kept. Sizes double, and each line prints the time's ratio to the
size before (linear growth gives 2.0).

- describe: a Table 1 of 1M, 2M and 4M rows x 30 variables by a 3-level group
  (bench_describe's synthetic frame);
- correlation matrix: 100, 200 and 400 variables x 10,000 rows, pairwise-
  complete with 2% missing, every pair a record (BLAS on one thread);
- audit: generated .docx manuscripts of about 250, 500, 1,000 and 2,000
  pages (bench_audit's corpus, cached in bench/out/);
- Word table: 1,000 to 8,000 rows x 8 columns, built and saved (bench_docx).
"""

from __future__ import annotations

import json
import subprocess
import sys
from pathlib import Path

HERE = Path(__file__).resolve().parent
OUT = HERE / "out"

_CHILD = r"""
import json, resource, statistics, sys, time
sys.path[:0] = [{here!r}, {tests!r}]
job, size = {job!r}, {size!r}

def rss_now():
    with open("/proc/self/statm") as f:
        return int(f.read().split()[1]) * resource.getpagesize()

if job == "describe":
    import numpy as np
    import bench_describe
    from statsetter import table
    from statsetter.analyses.descriptives import describe
    bench_describe.ROWS = size
    df = bench_describe.frame(np.random.default_rng(11))
    names = [c for c in df.columns if c != "group"]
    levels = {{n: "nominal" if n.startswith("nom") else "ordinal" if n.startswith("ord") else "interval" for n in names}}
    run = lambda: table(describe(df, names, group="group", levels=levels))
elif job == "correlation":
    import numpy as np, pandas as pd
    from threadpoolctl import threadpool_limits
    from statsetter.analyses import correlation_matrix
    rng = np.random.default_rng(7)
    X = rng.normal(size=(10_000, size))
    X[rng.random(X.shape) < 0.02] = np.nan
    df = pd.DataFrame(X, columns=[f"v{{i}}" for i in range(size)])
    cols = list(df.columns)
    limit = threadpool_limits(limits=1)
    run = lambda: correlation_matrix(df, cols)
elif job == "audit":
    from pathlib import Path
    from statsetter.audit.report import audit_file
    path = Path({out!r}) / f"audit-{{size}}-pages.docx"
    run = lambda: audit_file(path)
else:
    import bench_docx
    t = bench_docx.model(size)
    run = lambda: bench_docx.ours(t)
before = rss_now()
try:  # reset the high-water mark to the input's size (Linux >= 4.0), so that the peak is the job's
    with open("/proc/self/clear_refs", "w") as f:
        f.write("5")
except OSError:
    pass
times = []
for _ in range(3):
    start = time.perf_counter()
    run()
    times.append(time.perf_counter() - start)
with open("/proc/self/status") as f:  # VmHWM: this process's peak (ru_maxrss would carry the parent's peak across exec)
    peak = next(int(line.split()[1]) * 1024 for line in f if line.startswith("VmHWM:"))
print(json.dumps({{"time": statistics.median(times), "peak": peak, "input": before}}))
"""


def _manuscript(pages: int) -> None:
    """A generated manuscript of about ``pages`` pages (bench_audit's document at a fraction or multiple of its size)."""
    path = OUT / f"audit-{pages}-pages.docx"
    if path.exists():
        return
    sys.path[:0] = [str(HERE), str(HERE.parent / "tests")]
    import bench_audit

    OUT.mkdir(exist_ok=True)
    bench_audit.document(path, pages / 1000)


def measure(job: str, size: int) -> dict[str, float]:
    code = _CHILD.format(here=str(HERE), tests=str(HERE.parent / "tests"), job=job, size=size, out=str(OUT))
    done = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=True, cwd=HERE)
    return json.loads(done.stdout.strip().splitlines()[-1])


def main() -> None:
    jobs = [("describe", (1_000_000, 2_000_000, 4_000_000), "rows x 30 variables"),
            ("correlation", (100, 200, 400), "variables x 10,000 rows"),
            ("audit", (250, 500, 1000, 2000), "pages"),
            ("Word table", (1000, 2000, 4000, 8000), "rows x 8 columns")]
    for pages in jobs[2][1]:
        _manuscript(pages)
    print("| job | size | time (s) | doubling | peak RSS (MiB) | input (MiB) |")
    print("|---|---:|---:|---:|---:|---:|")
    for job, sizes, unit in jobs:
        previous = None
        for size in sizes:
            got = measure(job, size)
            doubling = f"{got['time'] / previous:.2f}" if previous else "—"
            print(f"| {job} | {size:,} {unit} | {got['time']:.3f} | {doubling} | {got['peak'] / 2**20:.0f} | {got['input'] / 2**20:.0f} |", flush=True)
            previous = got["time"]


if __name__ == "__main__":
    main()
