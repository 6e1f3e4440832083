"""The result record: one statistical result, whatever computed it.

Every source (analyses, adapters, the audit) ends in a :class:`Result`; every
sink (sentences, tables, documents) starts from one. Records are frozen,
validated on construction (messages name the field at fault) and round-trip
through JSON with a schema version. Keys that a later schema version adds are
kept in ``extra`` and written back, not dropped.

Numbers in a record are exact and unrounded, except where ``precision`` says
how many decimals a value was given with (a value copied from a rounded
source); the renderer never prints more decimals than that.
"""

from __future__ import annotations

import contextlib
import gc
import json
import re
import math
from dataclasses import dataclass, field, fields, replace
from types import MappingProxyType
from collections.abc import Mapping  # (not typing's: isinstance against it costs a generic alias's check, ~1 µs a call)
from typing import Any, Iterator, Literal, TypeVar, get_args

from ..errors import RecordError

__all__ = [
    "SCHEMA",
    "SCHEMA_VERSION",
    "Alternative",
    "Statistic",
    "Interval",
    "Estimate",
    "EffectSize",
    "GroupSummary",
    "Variable",
    "prose_label",
    "table_label",
    "with_table_labels",
    "Note",
    "Provenance",
    "Result",
]

SCHEMA = "statsetter.result"
SCHEMA_VERSION = 1

Alternative = Literal["two-sided", "less", "greater"]
Level = Literal["nominal", "ordinal", "interval", "ratio"]
NoteKind = Literal["assumption", "correction", "missing", "choice", "method", "precision", "caution"]

_EMPTY: Mapping[str, Any] = MappingProxyType({})
_LEVELS, _NOTE_KINDS, _ALTERNATIVES = get_args(Level), get_args(NoteKind), get_args(Alternative)


# --------------------------------------------------------------------------
# validation helpers


def _number(path: str, value: Any, *, optional: bool = True) -> float | None:
    if type(value) is float and math.isfinite(value):  # the common case, checked first
        return value
    if value is None:
        if optional:
            return None
        raise RecordError(path, "a number is required")
    if isinstance(value, bool) or not isinstance(value, (int, float)):
        try:
            value = float(value)  # numpy scalars, Decimal
        except (TypeError, ValueError):
            raise RecordError(path, f"{value!r} is not a number") from None
    value = float(value)
    if math.isnan(value):
        raise RecordError(path, "NaN where a number is required")
    if math.isinf(value):
        raise RecordError(path, "infinite value where a finite number is required")
    return value


def _count(path: str, value: Any) -> int | None:
    if value is None:
        return None
    number = _number(path, value)
    assert number is not None
    if number < 0:
        raise RecordError(path, f"{number:g} is negative; a count must be 0 or more")
    if number != int(number):
        raise RecordError(path, f"{number:g} is not a whole number")
    return int(number)


def _nonneg(path: str, value: Any) -> float | None:
    number = _number(path, value)
    if number is not None and number < 0:
        raise RecordError(path, f"{number:g} is negative")
    return number


def _choice(path: str, value: Any, allowed: tuple[str, ...], optional: bool = False) -> Any:
    if value is None and optional:
        return None
    if value not in allowed:
        raise RecordError(path, f"{value!r} is not one of {', '.join(allowed)}")
    return value


def _text(path: str, value: Any, optional: bool = True) -> str | None:
    if value is None:
        if optional:
            return None
        raise RecordError(path, "text is required")
    if not isinstance(value, str):
        raise RecordError(path, f"{value!r} is not text")
    if not optional and not value.strip():
        raise RecordError(path, "text is required")
    return value


def _frozen_map(path: str, value: Any) -> Mapping[str, Any]:
    if value is None or value is _EMPTY:
        return _EMPTY
    if type(value) is dict and not value:
        return _EMPTY
    if not isinstance(value, Mapping):
        raise RecordError(path, f"{value!r} is not a mapping")
    for key in value:
        if not isinstance(key, str):
            raise RecordError(path, f"key {key!r} is not text")
    return MappingProxyType(dict(value))


def _set(obj: Any, name: str, value: Any) -> None:
    object.__setattr__(obj, name, value)


# the parts validated lately, by identity, each held here so that its id is its own while it is (a frozen part, once
# valid, stays valid): a record made by replace() shares its parts with the one it replaces, and a batch of records
# (the pairs of a correlation matrix) shares a provenance and notes — of the 2,111 parts a run of the demo plan had
# validated, 1,173 had been validated before; emptied when full
_VALID: dict[int, Any] = {}
_VALID_MAX = 4096


def _validated(path: str, item: Any, kind: type) -> None:
    """``item`` checked to be a ``kind`` and validated, unless it was lately."""
    _check_type(path, item, kind)
    if _VALID.get(id(item)) is item:
        return
    item.validate(path)
    if len(_VALID) >= _VALID_MAX:
        _VALID.clear()
    _VALID[id(item)] = item


# --------------------------------------------------------------------------
# the parts


@dataclass(frozen=True, slots=True)
class Statistic:
    """A test statistic: its symbol (``t``, ``F``, ``chi2``, ``r``, ``U`` ...),
    its value and its degrees of freedom (none, one or two; non-integer allowed)."""

    symbol: str
    value: float
    df: tuple[float, ...] = ()
    extra: Mapping[str, Any] = field(default_factory=lambda: _EMPTY, compare=False)

    def validate(self, path: str) -> None:
        _text(f"{path}.symbol", self.symbol, optional=False)
        _set(self, "value", _number(f"{path}.value", self.value, optional=False))
        df = self.df
        if isinstance(df, (int, float)):
            df = (df,)
        df = tuple(df or ())
        if len(df) > 2:
            raise RecordError(f"{path}.df", f"at most two degrees of freedom, got {len(df)}")
        checked = []
        for i, d in enumerate(df):
            number = _number(f"{path}.df[{i}]", d, optional=False)
            assert number is not None
            if number <= 0:
                raise RecordError(f"{path}.df[{i}]", f"{number:g} is not positive; df must be > 0")
            checked.append(number)
        _set(self, "df", tuple(checked))
        _set(self, "extra", _frozen_map(f"{path}.extra", self.extra))


@dataclass(frozen=True, slots=True)
class Interval:
    """A confidence interval: level as a fraction (0.95), lower and upper limit."""

    level: float
    low: float
    high: float
    extra: Mapping[str, Any] = field(default_factory=lambda: _EMPTY, compare=False)

    def validate(self, path: str) -> None:
        level = _number(f"{path}.level", self.level, optional=False)
        assert level is not None
        if not 0 < level < 1:
            raise RecordError(f"{path}.level", f"{level:g} is not a fraction between 0 and 1 (write 0.95 for 95%)")
        low = _number(f"{path}.low", self.low, optional=False)
        high = _number(f"{path}.high", self.high, optional=False)
        assert low is not None and high is not None
        if low > high:
            raise RecordError(f"{path}", f"lower limit {low:g} is above upper limit {high:g}")
        _set(self, "level", level)
        _set(self, "low", low)
        _set(self, "high", high)
        _set(self, "extra", _frozen_map(f"{path}.extra", self.extra))


@dataclass(frozen=True, slots=True)
class Estimate:
    """A point estimate (a mean difference, a coefficient B ...) with its
    standard error and confidence interval. ``ratio`` marks quantities whose
    null value is 1 (odds ratios) rather than 0."""

    name: str
    value: float
    se: float | None = None
    ci: Interval | None = None
    ratio: bool = False
    extra: Mapping[str, Any] = field(default_factory=lambda: _EMPTY, compare=False)

    def validate(self, path: str) -> None:
        _text(f"{path}.name", self.name, optional=False)
        _set(self, "value", _number(f"{path}.value", self.value, optional=False))
        _set(self, "se", _nonneg(f"{path}.se", self.se))
        if self.ci is not None:
            self.ci.validate(f"{path}.ci")
        if self.ratio and self.value is not None and self.value < 0:
            raise RecordError(f"{path}.value", f"{self.value:g} is negative; a ratio cannot be")
        _set(self, "extra", _frozen_map(f"{path}.extra", self.extra))

    @property
    def null(self) -> float:
        return 1.0 if self.ratio else 0.0


@dataclass(frozen=True, slots=True)
class EffectSize:
    """An effect size (``d``, ``g``, ``eta2``, ``V`` ...) with its interval and
    the method that computed the interval or the effect."""

    name: str
    value: float
    ci: Interval | None = None
    method: str | None = None
    ratio: bool = False
    extra: Mapping[str, Any] = field(default_factory=lambda: _EMPTY, compare=False)

    def validate(self, path: str) -> None:
        _text(f"{path}.name", self.name, optional=False)
        _set(self, "value", _number(f"{path}.value", self.value, optional=False))
        if self.ci is not None:
            self.ci.validate(f"{path}.ci")
        _text(f"{path}.method", self.method)
        _set(self, "extra", _frozen_map(f"{path}.extra", self.extra))

    @property
    def null(self) -> float:
        return 1.0 if self.ratio else 0.0


@dataclass(frozen=True, slots=True)
class GroupSummary:
    """What is known of one group or category: n, mean, SD, median, quartiles,
    range, or a percentage (for a category)."""

    label: str
    n: int | None = None
    mean: float | None = None
    sd: float | None = None
    median: float | None = None
    q1: float | None = None
    q3: float | None = None
    minimum: float | None = None
    maximum: float | None = None
    percent: float | None = None
    extra: Mapping[str, Any] = field(default_factory=lambda: _EMPTY, compare=False)

    def validate(self, path: str) -> None:
        _text(f"{path}.label", self.label, optional=False)
        _set(self, "n", _count(f"{path}.n", self.n))
        for name in ("mean", "median", "q1", "q3", "minimum", "maximum"):
            _set(self, name, _number(f"{path}.{name}", getattr(self, name)))
        _set(self, "sd", _nonneg(f"{path}.sd", self.sd))
        percent = _nonneg(f"{path}.percent", self.percent)
        if percent is not None and percent > 100:
            raise RecordError(f"{path}.percent", f"{percent:g} is above 100")
        _set(self, "percent", percent)
        if self.q1 is not None and self.q3 is not None and self.q1 > self.q3:
            raise RecordError(f"{path}", f"q1 {self.q1:g} is above q3 {self.q3:g}")
        if self.minimum is not None and self.maximum is not None and self.minimum > self.maximum:
            raise RecordError(f"{path}", f"minimum {self.minimum:g} is above maximum {self.maximum:g}")
        _set(self, "extra", _frozen_map(f"{path}.extra", self.extra))


@dataclass(frozen=True, slots=True)
class Variable:
    """A variable taking part in the result: column name, its label in prose
    (reads inside a sentence: "maximum heart rate"), its role (``outcome``,
    ``group``, ``x``, ``y``, ``predictor``, ``item`` ...), its level of
    measurement when known, and its label in tables (sentence case, may carry
    a unit: "Maximum heart rate (bpm)"). Either label is derived from the
    other when only one is given (:func:`prose_label`, :func:`table_label`)."""

    name: str
    label: str | None = None
    role: str | None = None
    level: Level | None = None
    table_label: str | None = None
    extra: Mapping[str, Any] = field(default_factory=lambda: _EMPTY, compare=False)

    def validate(self, path: str) -> None:
        _text(f"{path}.name", self.name, optional=False)
        _text(f"{path}.label", self.label)
        _text(f"{path}.table_label", self.table_label)
        _text(f"{path}.role", self.role)
        _choice(f"{path}.level", self.level, _LEVELS, optional=True)
        _set(self, "extra", _frozen_map(f"{path}.extra", self.extra))

    @property
    def display(self) -> str:
        """The label for prose."""
        if self.label:
            return self.label
        return prose_label(self.table_label) if self.table_label else self.name

    @property
    def heading(self) -> str:
        """The label for tables."""
        if self.table_label:
            return self.table_label
        return table_label(self.label) if self.label and self.label != self.name else self.name


_UNIT = re.compile(r"\s*\([^()]*\)\s*$")


def prose_label(text: str) -> str:
    """A table label read inside a sentence: a trailing parenthesised unit
    dropped ("Age (years)" → "age"), the first word in lower case unless it
    is an acronym or a name with capitals inside ("BMI", "HbA1c")."""
    text = _UNIT.sub("", text).strip() or text
    first, _, rest = text.partition(" ")
    if first[:1].isupper() and not any(ch.isupper() for ch in first[1:]):
        first = first[:1].lower() + first[1:]
    return f"{first} {rest}" if rest else first


def with_table_labels(record: "Result", tables: Mapping[str, str], prose: Mapping[str, str] | None = None) -> "Result":
    """``record`` with each variable's table label (by column name) beside its
    prose label; a category term "x = level" keeps its level."""
    changed = []
    for v in record.variables:
        head = tables.get(v.name)
        if head and v.table_label is None:
            said = (prose or {}).get(v.name, v.name)
            if v.label and v.label != said and v.label.startswith(said + " = "):
                head = head + v.label[len(said):]
            v = replace(v, table_label=head)
        changed.append(v)
    if all(a is b for a, b in zip(changed, record.variables)):  # nothing to label: the record itself, not a copy validated again
        return record
    return replace(record, variables=tuple(changed))


def table_label(text: str) -> str:
    """A prose label as a table stub or head: the first letter capitalised."""
    return text[:1].upper() + text[1:] if text else text


@dataclass(frozen=True, slots=True)
class Note:
    """A note attached to a result: an assumption check, a correction applied,
    missing values dropped, an automatic choice, a method, reduced precision.
    A ``choice`` is one statsetter made for the author (a test picked from the
    levels of measurement, a variant deduced from the df); results sections
    and ``statsetter run`` list every one, so that none is silent."""

    kind: NoteKind
    text: str
    extra: Mapping[str, Any] = field(default_factory=lambda: _EMPTY, compare=False)

    def validate(self, path: str) -> None:
        _choice(f"{path}.kind", self.kind, _NOTE_KINDS)
        _text(f"{path}.text", self.text, optional=False)
        _set(self, "extra", _frozen_map(f"{path}.extra", self.extra))


@dataclass(frozen=True, slots=True)
class Provenance:
    """What produced the record (a function or an adapter) and the versions of
    the libraries involved."""

    source: str
    versions: Mapping[str, str] = field(default_factory=lambda: _EMPTY)
    extra: Mapping[str, Any] = field(default_factory=lambda: _EMPTY, compare=False)

    def validate(self, path: str) -> None:
        _text(f"{path}.source", self.source, optional=False)
        versions = _frozen_map(f"{path}.versions", self.versions)
        for key, value in versions.items():
            if not isinstance(value, str):
                raise RecordError(f"{path}.versions.{key}", f"{value!r} is not a version string")
        _set(self, "versions", versions)
        _set(self, "extra", _frozen_map(f"{path}.extra", self.extra))


# --------------------------------------------------------------------------
# the record


@dataclass(frozen=True, slots=True)
class Result:
    """One statistical result, exact and unrounded.

    ``kind`` selects the sentence template (see ``statsetter.rendering.kinds``).
    ``details`` holds small kind-specific facts (``variant = "welch"``,
    ``ss_type = 2``, ``procedure = "Tukey HSD"``, ``k_items = 8`` ...).
    ``precision`` maps a field path (``"effects[0].ci.low"``) to the number of
    decimals the value was given with when it came from a rounded source.
    """

    kind: str
    statistic: Statistic | None = None
    p: float | None = None
    alternative: Alternative = "two-sided"
    n: int | None = None
    estimate: Estimate | None = None
    effects: tuple[EffectSize, ...] = ()
    groups: tuple[GroupSummary, ...] = ()
    variables: tuple[Variable, ...] = ()
    notes: tuple[Note, ...] = ()
    provenance: Provenance | None = None
    details: Mapping[str, Any] = field(default_factory=lambda: _EMPTY)
    precision: Mapping[str, int] = field(default_factory=lambda: _EMPTY)
    id: str | None = None
    alpha: float = 0.05
    extra: Mapping[str, Any] = field(default_factory=lambda: _EMPTY, compare=False)

    def __post_init__(self) -> None:
        _text("kind", self.kind, optional=False)
        _text("id", self.id)
        if self.statistic is not None:
            _validated("statistic", self.statistic, Statistic)
        p = _number("p", self.p)
        if p is not None and not 0 <= p <= 1:
            raise RecordError("p", f"{p:g} is outside [0, 1]")
        _set(self, "p", p)
        _choice("alternative", self.alternative, _ALTERNATIVES)
        _set(self, "n", _count("n", self.n))
        if self.estimate is not None:
            _validated("estimate", self.estimate, Estimate)
        for name, kind in (
            ("effects", EffectSize),
            ("groups", GroupSummary),
            ("variables", Variable),
            ("notes", Note),
        ):
            items = getattr(self, name)
            if items is None:
                items = ()
            if not isinstance(items, (tuple, list)):
                raise RecordError(name, f"expected a list, got {type(items).__name__}")
            if type(items) is not tuple:
                items = tuple(items)
                _set(self, name, items)
            for i, item in enumerate(items):
                _validated(f"{name}[{i}]", item, kind)
        if self.provenance is not None:
            _validated("provenance", self.provenance, Provenance)
        details = _frozen_map("details", self.details)
        for key, value in details.items():
            if value is not None and not isinstance(value, (str, int, float, bool)):
                raise RecordError(f"details.{key}", f"{value!r} is not text, a number or true/false")
            if isinstance(value, float) and math.isnan(value):
                raise RecordError(f"details.{key}", "NaN where a number is required")
        _set(self, "details", details)
        precision = _frozen_map("precision", self.precision)
        for key, value in precision.items():
            if isinstance(value, bool) or not isinstance(value, int) or value < 0:
                raise RecordError(f"precision.{key}", f"{value!r} is not a number of decimals")
        _set(self, "precision", precision)
        alpha = _number("alpha", self.alpha, optional=False)
        assert alpha is not None
        if not 0 < alpha < 1:
            raise RecordError("alpha", f"{alpha:g} is outside (0, 1)")
        _set(self, "alpha", alpha)
        _set(self, "extra", _frozen_map("extra", self.extra))

    @classmethod
    def _checked_batch(cls, shared: Mapping[str, Any], varying: tuple[str, ...]) -> Any:
        """A maker of records whose every part statsetter has already checked (a batch built from arrays
        validated as a whole, each shared part validated once): ``make(*values)`` sets the ``varying`` fields
        from ``values`` and every other field from ``shared`` or its default, without validating again.
        Only for statsetter's own code, which must check what it passes; never for outside input."""
        return _unchecked_maker(cls, shared, varying)

    # convenience -----------------------------------------------------------

    def effect(self, name: str | None = None) -> EffectSize | None:
        """The first effect size, or the first with this name."""
        for e in self.effects:
            if name is None or e.name == name:
                return e
        return None

    def variable(self, role: str) -> Variable | None:
        for v in self.variables:
            if v.role == role:
                return v
        return None

    @property
    def df(self) -> tuple[float, ...]:
        return self.statistic.df if self.statistic is not None else ()

    # JSON --------------------------------------------------------------------

    def to_dict(self) -> dict[str, Any]:
        out = {"schema": SCHEMA, "version": SCHEMA_VERSION}
        out.update(_to_plain(self))
        return out

    @classmethod
    def from_dict(cls, data: Mapping[str, Any], *, where: str = "record") -> "Result":
        if not isinstance(data, Mapping):
            raise RecordError(where, f"expected an object, got {type(data).__name__}")
        schema = data.get("schema", SCHEMA)
        if schema != SCHEMA:
            raise RecordError(f"{where}.schema", f"{schema!r} is not {SCHEMA!r}")
        version = data.get("version", SCHEMA_VERSION)
        if isinstance(version, bool) or not isinstance(version, int) or version < 1:
            raise RecordError(f"{where}.version", f"{version!r} is not a schema version")
        body = {k: v for k, v in data.items() if k not in ("schema", "version")}
        try:
            return _from_plain(cls, body, "record")
        except RecordError as exc:
            if where == "record":
                raise
            raise RecordError(f"{where}: {exc.field}", str(exc).split(": ", 1)[1]) from None

    def to_json(self, **kwargs: Any) -> str:
        return json.dumps(self.to_dict(), ensure_ascii=False, **kwargs)

    @classmethod
    def from_json(cls, text: str) -> "Result":
        try:
            data = json.loads(text)
        except json.JSONDecodeError as exc:
            raise RecordError("record", f"not valid JSON (line {exc.lineno}, column {exc.colno}): {exc.msg}") from None
        return cls.from_dict(data)


def _check_type(path: str, value: Any, kind: type) -> Any:
    if not isinstance(value, kind):
        raise RecordError(path, f"expected {kind.__name__}, got {type(value).__name__}")
    return value


_PARTS: dict[str, type] = {
    "statistic": Statistic,
    "estimate": Estimate,
    "ci": Interval,
    "provenance": Provenance,
}
_LISTS: dict[str, type] = {
    "effects": EffectSize,
    "groups": GroupSummary,
    "variables": Variable,
    "notes": Note,
}

T = TypeVar("T")


_PLAIN_FIELDS: dict[type, tuple[str, ...]] = {}  # a record class's fields but ``extra``, in order (found once per class)


def _to_plain(obj: Any) -> dict[str, Any]:
    out: dict[str, Any] = {}
    names = _PLAIN_FIELDS.get(type(obj))
    if names is None:
        names = _PLAIN_FIELDS[type(obj)] = tuple(f.name for f in fields(obj) if f.name != "extra")
    for name in names:
        value = getattr(obj, name)
        if value is None or value == () or (isinstance(value, Mapping) and not value):
            if name not in ("kind", "p"):
                continue
        if isinstance(value, tuple):
            value = [_to_plain(v) if hasattr(v, "__dataclass_fields__") else v for v in value]
        elif hasattr(value, "__dataclass_fields__"):
            value = _to_plain(value)
        elif isinstance(value, Mapping):
            value = dict(value)
        out[name] = value
    for key, value in obj.extra.items():
        out.setdefault(key, value)
    return out


def _from_plain(cls: type[T], data: Mapping[str, Any], path: str) -> T:
    if not isinstance(data, Mapping):
        raise RecordError(path, f"expected an object, got {type(data).__name__}")
    known = {f.name for f in fields(cls)} - {"extra"}  # type: ignore[arg-type]
    kwargs: dict[str, Any] = {}
    extra: dict[str, Any] = {}
    for key, value in data.items():
        if key not in known:
            extra[key] = value
            continue
        sub = f"{path}.{key}" if path != "record" else key
        if key in _PARTS and value is not None:
            value = _from_plain(_PARTS[key], value, sub)
        elif key in _LISTS:
            if not isinstance(value, list):
                raise RecordError(sub, f"expected a list, got {type(value).__name__}")
            value = tuple(_from_plain(_LISTS[key], v, f"{sub}[{i}]") for i, v in enumerate(value))
        elif key == "df" and isinstance(value, list):
            value = tuple(value)
        kwargs[key] = value
    kwargs["extra"] = extra
    try:
        obj = cls(**kwargs)
    except TypeError as exc:
        raise RecordError(path, f"incomplete: {exc}") from None
    return obj


def _default_of(f: Any) -> Any:
    from dataclasses import MISSING

    if f.default_factory is not MISSING:
        return f.default_factory
    if f.default is not MISSING:
        return lambda: f.default
    return lambda: None


def _unchecked_maker(cls: type, shared: Mapping[str, Any], varying: tuple[str, ...]) -> Any:
    """``make(*values)``: an instance of the frozen, slotted dataclass ``cls``
    with the ``varying`` fields from ``values`` and every other field from
    ``shared`` or its default, set without ``__init__`` or validation —
    written out as one function (each slot set through its own descriptor,
    no loop), for parts and records made by the ten thousand from arrays
    already checked as a whole (``Result._checked_batch``)."""
    names = [f.name for f in fields(cls)]
    fixed = {f.name: shared[f.name] if f.name in shared else _default_of(f)() for f in fields(cls) if f.name not in varying}
    scope: dict[str, Any] = {"new": object.__new__, "cls": cls, **{f"set_{n}": getattr(cls, n).__set__ for n in names},
                             **{f"fixed_{n}": v for n, v in fixed.items()}}
    args = ", ".join(f"v_{n}" for n in varying)
    body = "".join(f"    set_{n}(obj, fixed_{n})\n" for n in fixed) + "".join(f"    set_{n}(obj, v_{n})\n" for n in varying)
    exec(f"def make({args}):\n    obj = new(cls)\n{body}    return obj\n", scope)  # names are the dataclass's own fields
    return scope["make"]


@contextlib.contextmanager
def _collector_paused() -> Iterator[None]:
    """Python's cyclic garbage collector paused while a batch of statsetter's
    own objects is made (records; an audit's statistics and entries): they
    hold no reference cycles, and tens of thousands of them kept in lists
    would otherwise set off collections that walk every object of the process
    (half the time of making 19,900 correlation pairs, a tenth of an audit).
    Resumed afterwards if it was running; nothing it would have found is lost.
    The objects made meanwhile go straight to the oldest generation (a freeze
    and a thaw: two list splices), where the young collection the resumed
    collector would start at once would move them only after walking them all
    (a fifteenth of an audit of 1,000 pages); only for a batch of more than
    10,000 objects, and not when the program froze objects itself, which the
    thaw would release (counting them walks them all: after the batch's count)."""
    running = gc.isenabled()
    gc.disable()
    try:
        yield
    finally:
        if running:
            if gc.get_count()[0] > 10_000 and gc.get_freeze_count() == 0:
                gc.freeze()
                gc.unfreeze()
            gc.enable()


_RESULT_DEFAULTS = tuple((f.name, _default_of(f)) for f in fields(Result))
