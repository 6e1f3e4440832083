"""The benchmarks' one timer: the median wall time of a few runs."""

from __future__ import annotations

import statistics
import time
from typing import Callable


def timed(fn: Callable[[], object], repeats: int = 5) -> float:
    times = []
    for _ in range(repeats):
        start = time.perf_counter()
        fn()
        times.append(time.perf_counter() - start)
    return statistics.median(times)
