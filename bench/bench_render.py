"""Benchmark: render 10,000 records to plain text and to Markdown.

Prints records per second and the ratio to bare f-string formatting of the
same numbers measured in the same run (medians of several repeats).
Targets (foundation issue): >= 10,000 records/s and a ratio <= 20 for the
statistics strings. Full sentences (through the Jinja macros, to Markdown) are
timed for information.
"""

from __future__ import annotations

import random
import statistics
import time

from statsetter import EffectSize, Interval, Result, Statistic, load_style, render

N = 10_000
REPEATS = 5


def make_records(n: int) -> list[Result]:
    rng = random.Random(12345)  # synthetic numbers for timing only
    out = []
    for _ in range(n):
        t = rng.uniform(-4, 4)
        d = t / 3
        out.append(
            Result(
                kind="t_independent",
                statistic=Statistic("t", t, (rng.randint(10, 400),)),
                p=rng.random(),
                effects=(EffectSize("d", d, Interval(0.95, d - 0.4, d + 0.4)),),
            )
        )
    return out


def baseline(records: list[Result]) -> list[str]:
    out = []
    for r in records:
        s, e = r.statistic, r.effects[0]
        assert s is not None and e.ci is not None and r.p is not None
        out.append(f"t({s.df[0]:.0f}) = {s.value:.2f}, p = {r.p:.3f}, d = {e.value:.2f}, 95% CI [{e.ci.low:.2f}, {e.ci.high:.2f}]")
    return out


def main() -> None:
    records = make_records(N)
    style = load_style("apa7")
    render(records[0], "stats", style)  # warm the template cache
    runs = {
        "baseline": lambda: baseline(records),
        "text": lambda: [render(r, "stats", style).to("text") for r in records],
        "md": lambda: [render(r, "stats", style).to("md") for r in records],
        "sentence": lambda: [render(r, "sentence", style).to("md") for r in records],  # for information: no target
    }
    times: dict[str, list[float]] = {name: [] for name in runs}
    for _ in range(REPEATS):  # interleaved, so that every variant sees the same machine
        for name, fn in runs.items():
            start = time.perf_counter()
            fn()
            times[name].append(time.perf_counter() - start)
    base = statistics.median(times["baseline"])
    print(f"records: {N:,}; median of {REPEATS} interleaved runs")
    print(f"f-string baseline: {base * 1000:8.1f} ms  ({N / base:,.0f} records/s)")
    for fmt in ("text", "md", "sentence"):
        t = statistics.median(times[fmt])
        ratios = sorted(a / b for a, b in zip(times[fmt], times["baseline"]))
        print(f"statsetter -> {fmt:8}: {t * 1000:8.1f} ms  ({N / t:,.0f} records/s)  ratio to baseline {t / base:5.1f} "
              f"(per-run ratios {ratios[0]:.1f}-{ratios[-1]:.1f})")


if __name__ == "__main__":
    main()
