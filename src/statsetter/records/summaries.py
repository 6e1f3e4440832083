"""Records that summarise many variables at once: a Table 1's numbers
(:class:`Description`) and a correlation matrix (:class:`CorrelationMatrix`).

Like :class:`~statsetter.records.result.Result` they are produced by sources
(``statsetter.analyses``), consumed by sinks (``statsetter.rendering``), hold
exact unrounded numbers and round-trip through JSON with the schema and
version of every record; ``kind`` tells them apart in a file. Their numbers
are numpy arrays (numpy is imported when one is built from JSON); a missing
number (a group without data) is NaN in memory and ``null`` in JSON.
"""

from __future__ import annotations

import math
from dataclasses import MISSING, dataclass, field, fields
from collections.abc import Mapping
from typing import TYPE_CHECKING, Any, Literal

from ..errors import RecordError
from .result import _LEVELS, SCHEMA, SCHEMA_VERSION, EffectSize, Interval, Note, Provenance, Result, Statistic, Variable, _collector_paused, _from_plain, _to_plain, _unchecked_maker

if TYPE_CHECKING:
    import numpy as np

__all__ = ["LevelReport", "VariableSummary", "Description", "CorrelationMatrix", "ADJUST_NAMES"]

Level = Literal["nominal", "ordinal", "interval", "ratio"]
Source = Literal["declared", "metadata", "categorical", "inferred"]
ADJUST_NAMES = {"holm": "Holm", "bonferroni": "Bonferroni", "fdr_bh": "Benjamini–Hochberg"}


@dataclass(frozen=True, slots=True)
class LevelReport:
    """A variable's level of measurement, where it came from and why."""

    name: str
    level: Level
    source: Source
    reason: str
    weak: bool = False
    identifier: bool = False  # text with nearly one value per row: an ID or free text, not a variable to tabulate

    @property
    def dichotomous(self) -> bool:
        return self.level == "nominal" and self.reason.startswith("2 distinct")

    def describe(self) -> str:
        flag = "; a weak guess: declare the level" if self.weak else ""
        why = f"inferred from the values: {self.reason}" if self.source == "inferred" else self.reason
        return f"{self.name}: {self.level} ({why}{flag})"


_ARRAYS = ("n", "missing", "counts", "mean", "sd", "median", "q1", "q3", "minimum", "maximum", "skew")


@dataclass(frozen=True, eq=False)
class VariableSummary:
    """One variable's numbers, one entry per column (groups, then Total);
    ``counts`` is columns × categories."""

    name: str
    label: str
    level: LevelReport
    show: tuple[str, ...]
    n: "np.ndarray"
    missing: "np.ndarray"
    categories: tuple[str, ...] = ()
    counts: "np.ndarray | None" = None
    mean: "np.ndarray | None" = None
    sd: "np.ndarray | None" = None
    median: "np.ndarray | None" = None
    q1: "np.ndarray | None" = None
    q3: "np.ndarray | None" = None
    minimum: "np.ndarray | None" = None
    maximum: "np.ndarray | None" = None
    skew: "np.ndarray | None" = None
    positions: bool = False  # quartiles are positions of ordered categories
    alpha: float | None = None
    test: Result | None = None
    test_name: str | None = None
    smd: float | None = None

    @property
    def kind(self) -> str:
        return "continuous" if self.level.level in ("interval", "ratio") else self.level.level

    def to_dict(self) -> dict[str, Any]:
        out: dict[str, Any] = {"name": self.name, "label": self.label, "level": _plain(self.level), "show": list(self.show)}
        for f in fields(self):
            value = getattr(self, f.name)
            if f.name in out or value is None:
                continue
            if f.name in _ARRAYS:
                out[f.name] = _array_out(value)
            elif isinstance(value, Result):
                out[f.name] = value.to_dict()
            elif isinstance(value, tuple):
                if value:
                    out[f.name] = [str(v) for v in value]
            elif isinstance(value, bool):
                if value:
                    out[f.name] = True
            elif isinstance(value, str):
                out[f.name] = value
            else:
                out[f.name] = float(value)
        return out

    @classmethod
    def from_dict(cls, data: Mapping[str, Any], where: str) -> "VariableSummary":
        data = _mapping(where, data)
        kwargs: dict[str, Any] = {}
        for key, value in data.items():
            if key in _ARRAYS:
                value = _array_in(f"{where}.{key}", value)
            elif key == "level":
                value = _object(LevelReport, f"{where}.level", value)
            elif key == "test":
                value = Result.from_dict(value, where=f"{where}.test")
            elif key in ("show", "categories"):
                value = tuple(str(v) for v in _list(f"{where}.{key}", value))
            kwargs[key] = value
        return _object(cls, where, kwargs)

    def check(self, columns: int, where: str) -> None:
        """RecordError unless the variable (read from JSON) is what its table row needs: text for its name and label, a
        known level, ``n`` and ``missing`` and every other array with one entry per column (``counts`` one row per
        column and one entry per category), the numbers its kind and ``show`` print, quartiles of ordered categories
        that name a category, and numbers where the test's name, α and SMD go."""
        import numpy as np

        for name in ("name", "label"):
            if not isinstance(getattr(self, name), str):
                raise RecordError(f"{where}.{name}", f"{getattr(self, name)!r} is not text")
        if not isinstance(self.level, LevelReport) or self.level.level not in _LEVELS:
            raise RecordError(f"{where}.level", "expected a level of nominal, ordinal, interval or ratio")
        for name in _ARRAYS:
            value = getattr(self, name)
            want = (columns, len(self.categories)) if name == "counts" else (columns,)
            if value is None:
                if name in ("n", "missing"):
                    raise RecordError(f"{where}.{name}", f"required: {columns} numbers, one per column")
                continue
            if value.shape != want:
                raise RecordError(f"{where}.{name}", f"expected {' × '.join(map(str, want))} numbers (shape {value.shape} given)")
        if (self.n < 0).any() or (self.missing < 0).any():
            raise RecordError(f"{where}.n", "a count is negative")
        needed = {"nominal": ("counts",), "ordinal": ("median", "q1", "q3") + (("counts",) if "counts" in self.show else ())}.get(self.kind, ())
        needed += tuple(name for option, names in (("mean_sd", ("mean", "sd")), ("median_iqr", ("median", "q1", "q3")), ("range", ("minimum", "maximum")))
                        if option in self.show and not (option == "mean_sd" and self.mean is None) for name in names)
        for name in needed:
            if getattr(self, name) is None:
                raise RecordError(f"{where}.{name}", f"required for {'an' if self.kind == 'ordinal' else 'a'} {self.kind} variable showing "
                                  f"{', '.join(self.show) or 'its default rows'}")
        if self.positions:
            for name in ("median", "q1", "q3"):
                value = getattr(self, name)
                shown = value[~np.isnan(value)] if value is not None else np.array([])
                if ((shown != np.round(shown)) | (shown < 0) | (shown >= len(self.categories))).any():
                    raise RecordError(f"{where}.{name}", f"a quartile of ordered categories is the position of one of its {len(self.categories)} categories")
        if self.test_name is not None and not isinstance(self.test_name, str):
            raise RecordError(f"{where}.test_name", f"{self.test_name!r} is not text")
        for name in ("alpha", "smd"):
            value = getattr(self, name)
            if value is not None and not _finite_number(value):
                raise RecordError(f"{where}.{name}", f"{value!r} is not a finite number")


@dataclass(frozen=True, eq=False)
class Description:
    """The numbers of a descriptives table ("Table 1"): one
    :class:`VariableSummary` per variable; columns are the categories of ``group`` in
    order, then Total (the only column without a grouping variable).

    Lay it out with ``statsetter.table(description, style)``.
    """

    variables: tuple[VariableSummary, ...]
    columns: tuple[str, ...]
    column_n: "np.ndarray"
    group: str | None = None
    group_label: str | None = None
    weights: str | None = None
    percent_of: Literal["valid", "all"] = "valid"
    suppress_below: int | None = None
    dropped_no_group: int = 0
    notes: tuple[str, ...] = field(default=())
    left_out: tuple[LevelReport, ...] = field(default=())  # columns not described because they look like identifiers
    id: str | None = None
    provenance: Provenance | None = None
    kind: str = field(default="descriptives", init=False)

    @property
    def levels(self) -> list[LevelReport]:
        return [v.level for v in self.variables]

    def report(self) -> list[str]:
        """One line per variable: its level, where the level came from and why."""
        return [v.level.describe() for v in self.variables]

    def tests(self) -> list[Result]:
        """The records of the tests beside the rows (empty without tests)."""
        return [v.test for v in self.variables if v.test is not None]

    def to_dict(self) -> dict[str, Any]:
        out: dict[str, Any] = {"schema": SCHEMA, "version": SCHEMA_VERSION, "kind": self.kind}
        if self.id:
            out["id"] = self.id
        out["columns"] = list(self.columns)
        out["column_n"] = _array_out(self.column_n)
        out["variables"] = [v.to_dict() for v in self.variables]
        for name in ("group", "group_label", "weights", "suppress_below"):
            if getattr(self, name) is not None:
                out[name] = getattr(self, name)
        if self.percent_of != "valid":
            out["percent_of"] = self.percent_of
        if self.dropped_no_group:
            out["dropped_no_group"] = self.dropped_no_group
        if self.notes:
            out["notes"] = list(self.notes)
        if self.left_out:
            out["left_out"] = [_plain(r) for r in self.left_out]
        if self.provenance is not None:
            out["provenance"] = _provenance_out(self.provenance)
        return out

    @classmethod
    def from_dict(cls, data: Mapping[str, Any], *, where: str = "record") -> "Description":
        data = _header(data, where, "descriptives")
        kwargs: dict[str, Any] = {}
        for key, value in data.items():
            if key == "variables":
                value = tuple(VariableSummary.from_dict(v, f"{where}.variables[{i}]") for i, v in enumerate(_list(f"{where}.variables", value)))
            elif key == "column_n":
                value = _array_in(f"{where}.column_n", value)
            elif key in ("columns", "notes"):
                value = tuple(str(v) for v in _list(f"{where}.{key}", value))
            elif key == "left_out":
                value = tuple(_object(LevelReport, f"{where}.left_out[{i}]", v) for i, v in enumerate(_list(f"{where}.left_out", value)))
            elif key == "provenance":
                value = _provenance_in(f"{where}.provenance", value)
            kwargs[key] = value
        made = _object(cls, where, kwargs)
        if made.column_n is None or made.column_n.shape != (len(made.columns),):
            raise RecordError(f"{where}.column_n", f"expected {len(made.columns)} numbers, one per column")
        for i, v in enumerate(made.variables):
            v.check(len(made.columns), f"{where}.variables[{i}]")
        return made


@dataclass(frozen=True, eq=False)
class CorrelationMatrix:
    """r, p (adjusted when ``adjust`` names a method), CI limits and n for
    every pair of ``names`` (square arrays; the diagonal is r = 1, p = 0).

    ``pairs()`` gives one :class:`Result` per pair; ``statsetter.table``
    lays the matrix out.
    """

    names: tuple[str, ...]
    method: str
    r: "np.ndarray"
    p: "np.ndarray"
    low: "np.ndarray"
    high: "np.ndarray"
    n: "np.ndarray"
    level: float
    adjust: str | None
    labels: Mapping[str, str]
    id: str | None = None
    provenance: Provenance | None = None
    mean: "np.ndarray | None" = None  # each variable's mean and SD over its observed values
    sd: "np.ndarray | None" = None
    rows: int | None = None  # the rows of the data: with every pair's n equal to it, no value was missing
    kind: str = field(default="correlation_matrix", init=False)

    def pairs(self) -> list[Result]:
        """One record per pair (upper triangle, in column order); with an id,
        a pair's id is ``id:x~y``. The arrays are checked once as a whole
        (finite, r and the limits in [−1, 1] around r, p in [0, 1], whole n),
        and each shared part (variables, notes, provenance) once; the records
        are then made without checking each again."""
        import numpy as np
        from types import MappingProxyType

        kind, symbol = ("pearson", "r") if self.method == "pearson" else ("spearman", "rs")
        k = len(self.names)
        upper = np.triu_indices(k, 1)
        r, p, low, high, n = (np.asarray(a, dtype=float)[upper] for a in (self.r, self.p, self.low, self.high, self.n))
        bad = ~(np.isfinite(r) & np.isfinite(p) & np.isfinite(low) & np.isfinite(high) & (np.abs(r) <= 1) & (p >= 0) & (p <= 1)
                & (low <= r + 1e-12) & (r <= high + 1e-12) & (low >= -1) & (high <= 1) & (n == np.round(n)) & (n >= 3))
        if bad.any():
            at = int(np.flatnonzero(bad)[0])
            i, j = int(upper[0][at]), int(upper[1][at])
            raise RecordError(f"pair {self.names[i]}~{self.names[j]}", f"r = {r[at]:g}, p = {p[at]:g}, CI [{low[at]:g}, {high[at]:g}], n = {n[at]:g} "
                                                                         "are not a correlation's numbers")
        if not 0 < self.level < 1:
            raise RecordError("level", f"{self.level:g} is outside (0, 1)")
        notes = [Note("missing", "Pairwise-complete observations; n per pair.")]
        if self.adjust:
            notes.append(Note("correction", f"p values {ADJUST_NAMES[self.adjust]}-adjusted over {k * (k - 1) // 2} pairs."))
        variables = [(Variable(x, self.labels.get(x, x), "x"), Variable(x, self.labels.get(x, x), "y")) for x in self.names]
        for pair in variables:
            for v in pair:
                v.validate("variables")
        for note in notes:
            note.validate("notes")
        if self.provenance is not None:
            self.provenance.validate("provenance")
        shared = {"kind": kind, "notes": tuple(notes), "provenance": self.provenance,
                  "details": MappingProxyType({"p_adjusted": ADJUST_NAMES[self.adjust]} if self.adjust else {})}
        make = Result._checked_batch(shared, ("statistic", "p", "n", "effects", "variables", "id"))
        level, names, prefix = float(self.level), self.names, self.id
        statistic = _unchecked_maker(Statistic, {"symbol": symbol}, ("value", "df"))
        effect = _unchecked_maker(EffectSize, {"name": symbol, "method": "Fisher z"}, ("value", "ci"))
        interval = _unchecked_maker(Interval, {"level": level}, ("low", "high"))
        with _collector_paused():
            return [make(statistic(rv, (int(nv) - 2,)), pv, int(nv), (effect(rv, interval(lo, hi)),),
                         (variables[i][0], variables[j][1]), f"{prefix}:{names[i]}~{names[j]}" if prefix else None)
                    for i, j, rv, pv, lo, hi, nv in zip(upper[0].tolist(), upper[1].tolist(), r.tolist(), p.tolist(), low.tolist(), high.tolist(),
                                                        n.tolist())]

    def to_dict(self) -> dict[str, Any]:
        out: dict[str, Any] = {"schema": SCHEMA, "version": SCHEMA_VERSION, "kind": self.kind}
        if self.id:
            out["id"] = self.id
        out.update(names=list(self.names), method=self.method, level=self.level)
        if self.adjust:
            out["adjust"] = self.adjust
        if self.labels:
            out["labels"] = dict(self.labels)
        for name in ("r", "p", "low", "high", "n", "mean", "sd"):
            if getattr(self, name) is not None:
                out[name] = _array_out(getattr(self, name))
        if self.rows is not None:
            out["rows"] = self.rows
        if self.provenance is not None:
            out["provenance"] = _provenance_out(self.provenance)
        return out

    @classmethod
    def from_dict(cls, data: Mapping[str, Any], *, where: str = "record") -> "CorrelationMatrix":
        data = _header(data, where, "correlation_matrix")
        kwargs: dict[str, Any] = {"adjust": None, "labels": {}}
        for key, value in data.items():
            if key in ("r", "p", "low", "high", "n", "mean", "sd"):
                value = _array_in(f"{where}.{key}", value)
            elif key == "names":
                value = tuple(str(v) for v in _list(f"{where}.names", value))
            elif key == "provenance":
                value = _provenance_in(f"{where}.provenance", value)
            elif key == "labels":
                value = dict(_mapping(f"{where}.labels", value))
            kwargs[key] = value
        made = _object(cls, where, kwargs)
        k = len(made.names)
        for name in ("r", "p", "low", "high", "n"):
            if getattr(made, name) is None or getattr(made, name).shape != (k, k):
                raise RecordError(f"{where}.{name}", f"expected {k} × {k} numbers for {k} variables")
        if made.method not in ("pearson", "spearman"):
            raise RecordError(f"{where}.method", f"{made.method!r} is not pearson or spearman")
        if not _finite_number(made.level) or not 0 < made.level < 1:
            raise RecordError(f"{where}.level", f"{made.level!r} is not a confidence level between 0 and 1")
        for name, label in made.labels.items():
            if not isinstance(label, str):
                raise RecordError(f"{where}.labels.{name}", f"{label!r} is not text")
        if made.rows is not None and (isinstance(made.rows, bool) or not isinstance(made.rows, int) or made.rows < 0):
            raise RecordError(f"{where}.rows", f"{made.rows!r} is not a number of rows")
        for name in ("mean", "sd"):
            if getattr(made, name) is not None and getattr(made, name).shape != (k,):
                raise RecordError(f"{where}.{name}", f"expected {k} numbers for {k} variables")
        if made.adjust is not None and made.adjust not in ADJUST_NAMES:
            raise RecordError(f"{where}.adjust", f"{made.adjust!r} is not one of {', '.join(ADJUST_NAMES)}")
        return made


# --------------------------------------------------------------------------
# JSON helpers


def _array_out(a: Any) -> Any:
    """A numpy array as nested lists; NaN as None, integral arrays as ints."""
    if a is None:
        return None
    if getattr(a, "dtype", None) is not None and a.dtype.kind in "iub":
        return a.tolist()
    return [_array_out(v) for v in a] if getattr(a, "ndim", 0) > 1 else [None if math.isnan(v) else v for v in a.tolist()]


def _array_in(where: str, value: Any) -> "np.ndarray":
    import numpy as np

    if value is None:
        return None  # type: ignore[return-value]
    try:
        out = np.array(value, dtype=float)  # None -> nan
    except (TypeError, ValueError):
        raise RecordError(where, "expected numbers (a list, or a list of lists)") from None
    if out.ndim == 0 or np.isinf(out).any():
        raise RecordError(where, "expected a list of finite numbers")
    if all(type(v) is int for v in _flat(value)):  # written from an integer array: read back as one
        return out.astype(np.int64)
    return out


def _flat(value: Any) -> list[Any]:
    return [x for v in value for x in _flat(v)] if isinstance(value, list) else [value]


def _plain(obj: Any) -> dict[str, Any]:
    return {f.name: getattr(obj, f.name) for f in fields(obj) if getattr(obj, f.name) not in (None, False)}


def _provenance_out(p: Provenance) -> dict[str, Any]:
    return _to_plain(p)


def _provenance_in(where: str, value: Any) -> Provenance:
    made = _from_plain(Provenance, value, where)
    made.validate(where)
    return made


def _header(data: Any, where: str, kind: str) -> dict[str, Any]:
    data = dict(_mapping(where, data))
    if data.pop("schema", SCHEMA) != SCHEMA:
        raise RecordError(f"{where}.schema", f"not {SCHEMA!r}")
    version = data.pop("version", SCHEMA_VERSION)
    if not isinstance(version, int) or isinstance(version, bool) or version > SCHEMA_VERSION:
        raise RecordError(f"{where}.version", f"{version!r} is not a schema version this release reads")
    if data.pop("kind", kind) != kind:
        raise RecordError(f"{where}.kind", f"not {kind!r}")
    return data


def _mapping(where: str, value: Any) -> Mapping[str, Any]:
    if not isinstance(value, Mapping):
        raise RecordError(where, f"expected an object, got {type(value).__name__}")
    return value


def _list(where: str, value: Any) -> list[Any]:
    if not isinstance(value, list):
        raise RecordError(where, f"expected a list, got {type(value).__name__}")
    return value


def _finite_number(value: Any) -> bool:
    """Whether a value read from JSON is a finite number (true and false are not)."""
    return not isinstance(value, bool) and isinstance(value, (int, float)) and math.isfinite(value)


def _object(cls: type, where: str, kwargs: Mapping[str, Any]) -> Any:
    kwargs = _mapping(where, kwargs)  # (a level or a left-out column given as a list, say)
    known = {f.name for f in fields(cls) if f.init}
    unknown = sorted(set(kwargs) - known)
    if unknown:
        raise RecordError(f"{where}.{unknown[0]}", "not a field of this record")
    absent = [f.name for f in fields(cls) if f.init and f.default is MISSING and f.default_factory is MISSING and f.name not in kwargs]
    if absent:
        raise RecordError(f"{where}.{absent[0]}", "required, and not given")
    return cls(**kwargs)
