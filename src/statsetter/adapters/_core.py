"""What every adapter shares: the context given alongside an object, turning
samples into a frame, and merging the object's numbers with the context's.

An adapter first builds records from what the object holds, nothing more.
When the author passes the data (a DataFrame and the columns, or the samples
the library function was given), statsetter's own analysis runs on them for
what the object lacks (group summaries, effect sizes and their intervals, n);
the object's statistic must be reproduced by that analysis, or the data are
not the object's and the adapter refuses. The object's own numbers then
replace the analysis' where both have them, so the record carries the
library's values.
"""

from __future__ import annotations

import math
from dataclasses import dataclass, field, replace
from typing import TYPE_CHECKING, Any, Callable, Mapping, Sequence

from ..errors import InputError
from ..records import Note, Provenance, Result

if TYPE_CHECKING:
    import pandas as pd

AGREE = 1e-6  # relative: the data must reproduce the object's statistic this closely


@dataclass
class Context:
    """What the author passed alongside the object."""

    source: str
    data: "pd.DataFrame | None" = None
    columns: Mapping[str, Any] = field(default_factory=dict)
    samples: Sequence[Any] | None = None
    groups: Sequence[str] | None = None
    labels: Mapping[str, str] = field(default_factory=dict)
    n: int | None = None
    level: float = 0.95
    options: dict[str, Any] = field(default_factory=dict)

    @property
    def has_data(self) -> bool:
        return self.data is not None or self.samples is not None

    def option(self, name: str, default: Any = None) -> Any:
        return self.options.get(name, default)


def version_of(library: str) -> dict[str, str]:
    import importlib

    from .._version import __version__

    module = importlib.import_module(library)
    return {library: str(getattr(module, "__version__", "?")), "statsetter": __version__}


def provenance(ctx: Context, library: str, with_data: bool) -> Provenance:
    source = f"{ctx.source} result, adapted by statsetter"
    if with_data:
        source += "; the parts the object lacks computed by statsetter from the data given"
    return Provenance(source, version_of(library))


def absent(ctx: Context, parts: Sequence[str]) -> Note:
    return Note("missing", f"Not in the {ctx.source} result and not given: {', '.join(parts)}; pass the data to add them.")


def frame_from_samples(design: str, samples: Sequence[Any], groups: Sequence[str] | None) -> tuple["pd.DataFrame", dict[str, Any]]:
    """A DataFrame and the analysis' column arguments for the arrays a library
    function was given: ``two``/``k`` (independent samples), ``paired``,
    ``one``, ``xy`` (two variables), ``table`` (observed counts), ``items``."""
    import numpy as np
    import pandas as pd

    if design == "table":
        counts = np.asarray(samples, dtype=float)
        if counts.ndim != 2 or (counts < 0).any() or (counts != np.round(counts)).any():
            raise InputError("samples: the observed table must be a 2-D array of non-negative whole counts")
        r, k = np.indices(counts.shape)
        reps = counts.astype(int).ravel()
        rows = groups[0] if groups else [str(i + 1) for i in range(counts.shape[0])]
        cols = groups[1] if groups else [str(j + 1) for j in range(counts.shape[1])]
        frame = pd.DataFrame({"row": np.repeat(np.asarray(rows, dtype=object)[r.ravel()], reps), "column": np.repeat(np.asarray(cols, dtype=object)[k.ravel()], reps)})
        return frame, {"row": "row", "column": "column"}
    arrays = [np.asarray(s, dtype=float).ravel() for s in samples]
    if design == "items":
        matrix = np.asarray(samples, dtype=float)
        if matrix.ndim != 2:
            raise InputError("samples: items must be a 2-D array, one column per item")
        names = list(groups) if groups else [f"item{j + 1}" for j in range(matrix.shape[1])]
        return pd.DataFrame(matrix, columns=names), {"items": names}
    need = {"two": 2, "paired": 2, "xy": 2, "one": 1}.get(design)
    if need is not None and len(arrays) != need:
        raise InputError(f"samples: {len(arrays)} array(s) given; this result needs {need}")
    if design == "one":
        return pd.DataFrame({"value": arrays[0]}), {"outcome": "value"}
    if design in ("paired", "xy"):
        if len(arrays[0]) != len(arrays[1]):
            raise InputError(f"samples: {len(arrays[0])} and {len(arrays[1])} values; paired samples need equal lengths")
        names = list(groups) if groups else (["first", "second"] if design == "paired" else ["x", "y"])
        keys = ("first", "second") if design == "paired" else ("x", "y")
        return pd.DataFrame({names[0]: arrays[0], names[1]: arrays[1]}), dict(zip(keys, names))
    labels = list(groups) if groups else [str(i + 1) for i in range(len(arrays))]
    if len(labels) != len(arrays):
        raise InputError(f"groups: {len(labels)} label(s) for {len(arrays)} samples")
    frame = pd.DataFrame({"value": np.concatenate(arrays), "group": np.repeat(np.asarray(labels, dtype=object), [len(a) for a in arrays])})
    return frame, {"outcome": "value", "group": "group", **({"groups": labels} if design == "two" else {})}


def close(a: float, b: float, rel: float = AGREE) -> bool:
    return math.isclose(a, b, rel_tol=rel, abs_tol=1e-12)


def merge(
    mine: Sequence[Result],
    ours: Sequence[Result],
    ctx: Context,
    library: str,
    key: Callable[[Result], Any] | None = None,
    leading: tuple[str, float] = ("statistic", AGREE),
) -> list[Result]:
    """The analysis' records with the object's numbers put back in."""
    if key is not None:
        index = {key(r): r for r in mine}
        known = {key(r) for r in ours}
        missing = [k for k in index if k not in known]
        if missing:
            raise InputError(f"the data given do not have {missing[0]!r}, which the {ctx.source} result reports; pass the data it was computed from")
        paired = [(index.get(key(o)), o) for o in ours]
    else:
        if len(mine) != len(ours):
            raise InputError(f"the data given yield {len(ours)} result(s); the {ctx.source} result has {len(mine)}")
        paired = list(zip(mine, ours))
    out = []
    for m, o in paired:
        if m is None:  # computed from the data only (a model record the object lacks, say)
            out.append(replace(o, notes=o.notes + (Note("method", f"Not in the {ctx.source} result; computed by statsetter from the data given."),)))
            continue
        _check(m, o, ctx, *leading)
        effects = list(o.effects)
        for e in m.effects:
            at = next((i for i, x in enumerate(effects) if x.name == e.name), None)
            if at is None:
                effects.append(e)
            else:
                effects[at] = replace(effects[at], value=e.value, ci=e.ci or effects[at].ci)
        estimate = o.estimate
        if m.estimate is not None:
            estimate = m.estimate if o.estimate is None else replace(o.estimate, value=m.estimate.value, se=m.estimate.se or o.estimate.se, ci=m.estimate.ci or o.estimate.ci)
        notes = tuple(n for n in m.notes if n.kind != "missing") + o.notes
        if m.p is not None and o.p is not None and not close(m.p, o.p, 1e-6):
            notes += (Note("method", f"p is the {ctx.source} result's ({m.p:.4g}); statsetter's analysis of the data gives {o.p:.4g} (another method or correction)."),)
        out.append(
            replace(
                o,
                statistic=_statistic(m, o),
                p=m.p if m.p is not None else o.p,
                estimate=estimate,
                effects=tuple(effects),
                notes=notes,
                details={**dict(o.details), **dict(m.details)},
                precision=m.precision,
                provenance=provenance(ctx, library, True),
            )
        )
    return out


def _statistic(m: Result, o: Result):  # type: ignore[no-untyped-def]
    """The object's statistic, with the df from the data when the object has none."""
    if m.statistic is None:
        return o.statistic
    if not m.statistic.df and o.statistic is not None and o.statistic.df:
        return replace(m.statistic, df=o.statistic.df)
    return m.statistic


def _check(m: Result, o: Result, ctx: Context, first: str = "statistic", agree: float = AGREE) -> None:
    """The object's leading number (statistic, else estimate, else first
    effect, else p; the estimate first when ``first`` says so) must be what
    the data give, to ``agree`` relative."""
    pairs: list[tuple[str, float, float]] = []
    if first == "estimate" and m.estimate is not None and o.estimate is not None and m.estimate.name == o.estimate.name:
        pairs.append((m.estimate.name, m.estimate.value, o.estimate.value))
    elif m.statistic is not None and o.statistic is not None:
        pairs.append((m.statistic.symbol, m.statistic.value, o.statistic.value))
    elif m.estimate is not None and o.estimate is not None and m.estimate.name == o.estimate.name:
        pairs.append((m.estimate.name, m.estimate.value, o.estimate.value))
    else:
        for e in m.effects[:1]:
            found = next((x for x in o.effects if x.name == e.name), None)
            if found is not None:
                pairs.append((e.name, e.value, found.value))
    if not pairs and m.p is not None and o.p is not None:
        pairs.append(("p", m.p, o.p))
    for name, a, b in pairs:
        if not close(a, b, agree):
            raise InputError(
                f"the data given do not reproduce the {ctx.source} result ({name} = {a:.6g} in the object, "
                f"{b:.6g} from the data); pass the data and options it was computed with"
            )


def base(ctx: Context, library: str, kind: str, notes: Sequence[Note], **fields: Any) -> Result:
    """A record from the object alone; n is the one given alongside unless the object has its own."""
    return Result(kind=kind, notes=tuple(notes), provenance=provenance(ctx, library, False), n=fields.pop("n", ctx.n), **fields)


def pair_key(r: Result) -> tuple[str, str]:
    """Matches post hoc pairs: the two group labels, in statsetter's order."""
    return (r.groups[0].label, r.groups[1].label)


def term_key(r: Result) -> str:
    """Matches model terms (the model record itself by its kind)."""
    return str(r.details.get("term", r.kind))


def integral(x: float) -> bool:
    return float(x).is_integer()


@dataclass(frozen=True)
class Adapter:
    """One supported library object: how to read it, and which statsetter
    analysis supplies what it lacks when the data are given."""

    name: str  # e.g. "scipy.stats.ttest_ind"
    library: str  # the module whose version the provenance records
    build: Callable[[Any, Context], list[Result]]
    design: str | None = None  # how samples become a frame (see frame_from_samples)
    analysis: Callable[["pd.DataFrame", dict[str, Any], Context, list[Result]], list[Result]] | None = None
    key: Callable[[Result], Any] | None = None
    leading: tuple[str, float] = ("statistic", AGREE)  # the number the data must reproduce (see _check), and how closely
