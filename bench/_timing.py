"""The benchmarks' timers: the median wall time of a few runs, and paired
runs of a baseline and statsetter taking turns, so that both see the same
machine (this one is noisy); the ratio is the median of the per-pair ratios."""

from __future__ import annotations

import statistics
import time
from typing import Callable


def _once(fn: Callable[[], object]) -> float:
    start = time.perf_counter()
    fn()
    return time.perf_counter() - start


def timed(fn: Callable[[], object], repeats: int = 5) -> float:
    return statistics.median(_once(fn) for _ in range(repeats))


def paired(baseline: Callable[[], object], ours: Callable[[], object], repeats: int = 5) -> tuple[float, float, float]:
    """(baseline median, statsetter median, median of the per-pair ratios)."""
    base, mine = [], []
    for _ in range(repeats):
        base.append(_once(baseline))
        mine.append(_once(ours))
    return statistics.median(base), statistics.median(mine), statistics.median(m / b for m, b in zip(mine, base))
