"""Reading data files: CSV, Excel (.xlsx), SPSS (.sav), Stata (.dta), Parquet.

The file's extension picks the reader, and the first bytes must agree with
it, so a renamed file gets a clear error instead of a parser's traceback.
SPSS files bring their measurement levels, value labels and variable labels;
Stata files their value and variable labels. Missing-value codes given by the
author are turned into missing values before anything is computed.
"""

from __future__ import annotations

import io
import re
from dataclasses import dataclass, field, replace
from pathlib import Path
from typing import TYPE_CHECKING, Any, Mapping, Sequence

from .errors import InputError
from .files import read_start

if TYPE_CHECKING:
    import numpy as np
    import pandas as pd

__all__ = ["Dataset", "read_data", "READERS"]

READERS = {".csv": "CSV", ".tsv": "tab-separated text", ".txt": "delimited text", ".xlsx": "Excel", ".sav": "SPSS", ".zsav": "SPSS", ".dta": "Stata", ".parquet": "Parquet"}
_SPSS_LEVELS = {"nominal": "nominal", "ordinal": "ordinal", "scale": "interval"}


@dataclass(frozen=True, eq=False)
class Dataset:
    """A data frame and what its file said about it."""

    frame: "pd.DataFrame"
    path: Path
    levels: Mapping[str, str] = field(default_factory=dict)
    value_labels: Mapping[str, Mapping[Any, str]] = field(default_factory=dict)
    labels: Mapping[str, str] = field(default_factory=dict)
    notes: tuple[str, ...] = ()  # what the reader chose or changed (delimiter, decimal mark, infinite values)


class _Bounded(io.RawIOBase):
    """A binary file that refuses to be read past the data size limit."""

    def __init__(self, raw: Any, path: Path) -> None:
        from .files import LIMITS

        self.raw, self.path, self.left = raw, path, LIMITS["data"]

    def readable(self) -> bool:
        return True

    def readinto(self, buffer: Any) -> int:
        n = self.raw.readinto(buffer)
        self.left -= n or 0
        if self.left < 0:
            from .files import LIMITS

            raise InputError(f"{self.path}: over the limit of {LIMITS['data'] >> 20:,} MiB for a data file")
        return n


def _check_magic(path: Path, suffix: str) -> None:
    head = read_start(path, 4096)
    expected = {
        ".xlsx": (head.startswith(b"PK\x03\x04"), "an Excel .xlsx workbook (a zip file)"),
        ".sav": (head[:4] in (b"$FL2", b"$FL3"), "an SPSS .sav file"),
        ".zsav": (head[:4] == b"$FL3", "an SPSS .zsav file"),
        ".dta": (head.startswith(b"<stata_dta>") or (head[:1] in (b"\x71", b"\x72", b"\x73") and head[1:3] in (b"\x01\x01", b"\x02\x01")), "a Stata .dta file"),
        ".parquet": (head.startswith(b"PAR1"), "a Parquet file"),
    }
    if suffix in expected:
        ok, what = expected[suffix]
        if not ok:
            raise InputError(f"{path}: not {what}; the extension does not match the contents")
    elif head.startswith((b"\xff\xfe", b"\xfe\xff")):  # UTF-16 text (a spreadsheet's "Unicode text" export): its zero bytes are text
        return
    elif b"\x00" in head or head.startswith((b"PK\x03\x04", b"\xd0\xcf\x11\xe0", b"$FL2", b"PAR1")):
        raise InputError(f"{path}: binary contents, not {READERS[suffix]}; the extension does not match the contents")


_BYTE_ORDER_MARKS = ((b"\xef\xbb\xbf", "utf-8-sig", "UTF-8"), (b"\xff\xfe", "utf-16", "UTF-16"), (b"\xfe\xff", "utf-16", "UTF-16"))


def _marked_encoding(path: Path, suffix: str, encoding: str) -> str | None:
    """The encoding a text file's byte-order mark names (a UTF-16 "Unicode text" export, a UTF-8 file with a mark), read
    so that the mark is not taken for part of the first column's name; None without one, or when a UTF-16 or UTF-32
    encoding was asked for by name."""
    if suffix not in (".csv", ".tsv", ".txt") or encoding.lower().replace("_", "-").startswith(("utf-16", "utf-32")):
        return None
    head = read_start(path, 4)
    return next((name for mark, name, _ in _BYTE_ORDER_MARKS if head.startswith(mark)), None)


def read_data(
    path: "str | Path",
    *,
    sheet: "str | int | None" = None,
    missing: "Sequence[Any] | Mapping[str, Sequence[Any]] | None" = None,
    encoding: str = "utf-8",
    sep: str | None = None,
    decimal: str | None = None,
) -> Dataset:
    """Read a data file; ``missing`` lists codes (for every column, or per
    column) that mean a missing value, such as −99. A delimited text file's
    delimiter (comma, semicolon, tab or bar) and decimal mark are detected
    unless ``sep`` and ``decimal`` are given; ``notes`` says what was chosen.
    Infinite numbers are treated as missing, with a note per variable."""
    p = Path(path)
    suffix = p.suffix.lower()
    if suffix not in READERS:
        raise InputError(f"{p}: unknown data format {p.suffix or '(no extension)'!r}; statsetter reads {', '.join(READERS)}")
    _check_magic(p, suffix)
    marked = _marked_encoding(p, suffix, encoding)
    try:
        with _text_storage(p):
            data = _read(p, suffix, sheet, marked or encoding, sep, decimal)
    except InputError:
        raise
    except UnicodeDecodeError as exc:
        raise InputError(f"{p}: not {encoding} text (byte {exc.start}); give the file's encoding") from None
    except Exception as exc:  # the readers raise many kinds; the message names the file
        first = str(exc).strip().splitlines()[0] if str(exc).strip() else type(exc).__name__
        raise InputError(f"{p}: cannot read as {READERS[suffix]} ({first})") from None
    if len(data.frame) == 0:
        raise InputError(f"{p}: no rows of data (only a header, or nothing)")
    if marked == "utf-16" or (marked is not None and encoding.lower().replace("_", "-") not in ("utf-8", "utf8")):
        data = replace(data, notes=(f"encoding: {next(said for _, name, said in _BYTE_ORDER_MARKS if name == marked)} (the file's byte-order mark)",
                                    *data.notes))
    if not all(isinstance(name, str) for name in data.frame.columns):  # a spreadsheet's header cell holding a number or a date
        data = replace(data, frame=data.frame.set_axis([str(name) for name in data.frame.columns], axis=1))
    data = _arrow_when_long(data)
    if data.frame.columns.duplicated().any():
        raise InputError(f"{p}: column {data.frame.columns[data.frame.columns.duplicated()][0]!r} appears twice")
    data = _trimmed(data)
    if missing:
        data = replace(data, frame=_apply_missing(data.frame, missing, p))
    return _finite(data)


_LOOKED_AT_ONE_BY_ONE = 5_000  # a text column of up to this many rows is searched for spaced values in Python (a first
# vectorised pass costs the string kernels' start-up, about half a millisecond a column; the loop ~0.2 µs a value)


_SMALL_FILE = 2 << 20  # bytes: a data file up to this size is read into Python strings, and kept so up to _SHORT rows
_SHORT = 5_000  # rows: from here on Arrow's strings are as fast or faster (a t test, χ², ANOVA and Table 1 by group:
# equal at 1,000 and 5,000 rows, 3% faster at 10,000, 10% at 20,000, 30% at 100,000)


def _text_storage(p: Path) -> Any:
    """Where pandas keeps a file's text columns: in Python strings for a small file (a survey's hundreds or thousands
    of rows; one of more than _SHORT rows then moves them to Arrow's, _arrow_when_long), in Arrow's otherwise (when
    pyarrow is installed: pandas' own choice, "auto"). The values, their dtype (``str``) and every result are the
    same either way (the base install, without pyarrow, has only the first); what differs is the cost: each
    operation on an Arrow column pays a fixed price and the first array starts Arrow's memory pool (1 to 10 ms),
    about 20 ms of the demo plan's run of 240 rows, a tenth of its own work, while Python strings cost more per value."""
    import pandas as pd

    try:
        small = p.stat().st_size <= _SMALL_FILE
    except OSError:
        small = False
    return pd.option_context("mode.string_storage", "python" if small else "auto")


def _arrow_when_long(data: Dataset) -> Dataset:
    """A frame of more than _SHORT rows with text in Python strings (a small file's) moved to Arrow's, when pyarrow is
    installed (the same values and dtype)."""
    import pandas as pd

    frame = data.frame
    if len(frame) <= _SHORT:
        return data
    python = [c for c, dtype in frame.dtypes.items() if isinstance(dtype, pd.StringDtype) and dtype.storage == "python"]
    if not python:
        return data
    try:
        import pyarrow  # noqa: F401
    except ImportError:
        return data
    arrow = pd.StringDtype("pyarrow", na_value=frame[python[0]].dtype.na_value)
    return replace(data, frame=frame.astype({c: arrow for c in python}))


def _trimmed(data: Dataset) -> Dataset:
    """Text values with white space before or after them are the same values trimmed (" male" and "male " had been
    three categories with "male"), and a value of white space only is missing; a note per column says how many."""
    import pandas as pd

    changed, notes = {}, list(data.notes)
    for name in data.frame.columns:
        s = data.frame[name]
        if not (pd.api.types.is_string_dtype(s.dtype) or s.dtype == object) or isinstance(s.dtype, pd.CategoricalDtype):
            continue
        if len(s) <= _LOOKED_AT_ONE_BY_ONE and not any(isinstance(v, str) and v != v.strip() for v in s.tolist()):
            continue  # (Python's str.strip and Arrow's trim take off the same characters, so this asks what the rest would)
        text = s.map(lambda v: v if isinstance(v, str) else None) if s.dtype == object else s  # (an object column may mix in numbers)
        stripped = text.str.strip()
        spaced = ((stripped != text) & text.notna()).fillna(False).to_numpy(dtype=bool)  # (a missing value is not unequal to itself here)
        if not spaced.any():
            continue
        blank = (stripped == "").fillna(False).to_numpy(dtype=bool)
        changed[name] = s.mask(spaced, stripped.mask(blank))
        said = []
        trimmed = spaced & ~blank
        if trimmed.any():
            said.append(f"{int(trimmed.sum())} text value(s) with spaces around them trimmed (first {text[trimmed].iloc[0]!r} in row {int(trimmed.argmax()) + 1})")
        if blank.any():
            said.append(f"{int(blank.sum())} value(s) of spaces only treated as missing (first in row {int(blank.argmax()) + 1})")
        notes.append(f"{name}: " + "; ".join(said))
    if not changed:
        return data
    return replace(data, frame=data.frame.assign(**changed), notes=tuple(notes))


_HUGE_POWER = 50
_HUGE = 10.0**_HUGE_POWER  # no measurement comes near; raised to the fourth power (Welch's df, kurtosis) and summed, values up to here stay finite


def refuse_huge(name: str, values: "np.ndarray") -> None:
    """InputError naming the first finite value of ``values`` (a column called ``name``) beyond ±1e50, and its row."""
    import numpy as np

    with np.errstate(invalid="ignore"):
        huge = (np.abs(values) > _HUGE) & np.isfinite(values)
    if huge.any():
        row = int(np.argmax(huge))
        raise InputError(f"{name}: {values[row]:g} in row {row + 1} is beyond ±1e{_HUGE_POWER}, where sums of its powers overflow; "
                         "correct it, or rescale the variable (thousands instead of units)")


def _finite(data: Dataset) -> Dataset:
    """Infinite values (inf, −inf) are not measurements: each numeric column's
    are set missing, and a note names the column and the count."""
    import numpy as np
    import pandas as pd

    frame, notes = data.frame, list(data.notes)
    changed = {}
    floats = [j for j, dtype in enumerate(frame.dtypes) if pd.api.types.is_float_dtype(dtype)]
    if floats:  # the float columns' values as one array, looked at once (most files have no infinite value)
        block = frame.iloc[:, floats].to_numpy(dtype=float, na_value=np.nan)
        infinite = np.isinf(block)
        for k in np.flatnonzero(infinite.any(axis=0)):
            name, bad = frame.columns[floats[k]], infinite[:, k]
            changed[name] = frame[name].mask(bad)
            notes.append(f"{name}: {int(bad.sum())} infinite value(s) treated as missing (first in row {int(np.argmax(bad)) + 1})")
        for k, j in enumerate(floats):
            refuse_huge(f"{data.path}: {frame.columns[j]}", block[:, k])
    if not changed:
        return data
    return replace(data, frame=frame.assign(**changed), notes=tuple(notes))


_DELIMITERS = {",": "comma", ";": "semicolon", "\t": "tab", "|": "bar"}
_DECIMAL_COMMA = re.compile(r"\s*-?\d+,\d+\s*")


def _sniff(lines: list[str], sep: str | None, decimal: str | None) -> tuple[str, str, list[str]]:
    """The delimiter and decimal mark of delimited text, from its first lines:
    the delimiter that splits every line into the same number (> 1) of fields
    (the most fields wins), outside quotes; a decimal comma when the delimiter
    is not a comma and fields look like 12,5."""
    import csv

    notes = []
    if sep is None:
        best, width = ",", 1
        for cand in _DELIMITERS:
            counts = {len(row) for row in csv.reader(lines, delimiter=cand) if row}
            if len(counts) == 1 and (n := counts.pop()) > width:
                best, width = cand, n
        sep = best
        notes.append(f"delimiter: {_DELIMITERS[sep]} (detected; give sep to choose)")
    if decimal is None:
        decimal = "."
        if sep != ",":
            fields = [f for row in csv.reader(lines[1:], delimiter=sep) for f in row]
            if any(_DECIMAL_COMMA.fullmatch(f) for f in fields):
                decimal = ","
                notes.append("decimal mark: comma (detected from values such as 12,5; give decimal to choose)")
    return sep, decimal, notes


def _read(p: Path, suffix: str, sheet: "str | int | None", encoding: str, sep: str | None = None, decimal: str | None = None) -> Dataset:
    import csv

    import pandas as pd

    if suffix in (".csv", ".tsv", ".txt"):
        if sep is None and suffix == ".tsv":
            sep = "\t"
        if sep is not None and sep not in _DELIMITERS and sep != "\t":
            raise InputError(f"{p}: sep {sep!r} is not one of , ; | or a tab")
        if decimal is not None and decimal not in (".", ","):
            raise InputError(f"{p}: decimal {decimal!r} is not . or ,")
        skip, head = 0, []  # leading lines starting with "#" are notes about the file (our demo data say they are invented)
        with p.open(encoding=encoding, errors="replace", newline="") as fh:
            for line in fh:
                if (line.startswith("#") or not line.strip()) and not head:  # (blank lines before the header too: not it)
                    skip += 1
                    continue
                head.append(line)
                if len(head) >= 50:
                    break
        sep, decimal, notes = _sniff(head, sep, decimal)
        header = next(csv.reader(head[:1], delimiter=sep), [])
        seen: set[str] = set()
        for col in (h.strip() for h in header):
            if col in seen and col:
                raise InputError(f"{p}: column {col!r} appears twice in the header (line {skip + 1}); rename one")
            seen.add(col)
        try:
            with p.open("rb") as raw:  # counted while reading: the size limit holds whatever the file system says
                frame = pd.read_csv(_Bounded(raw, p), sep=sep, decimal=decimal, encoding=encoding, skiprows=skip)
        except pd.errors.EmptyDataError:
            raise InputError(f"{p}: no columns to read") from None
        except pd.errors.ParserError as exc:
            raise InputError(f"{p}: {str(exc).strip().splitlines()[0]}") from None
        return Dataset(frame, p, notes=tuple(notes))
    if suffix == ".xlsx":
        _check_sheet_size(p, sheet)
        book = pd.ExcelFile(p, engine="openpyxl")
        if sheet is not None and not isinstance(sheet, int) and sheet not in book.sheet_names:
            raise InputError(f"{p}: no sheet {sheet!r}; sheets: {', '.join(map(str, book.sheet_names))}")
        frame = pd.read_excel(book, sheet_name=sheet if sheet is not None else 0)
        return Dataset(frame, p, notes=tuple(_dates_among_numbers(frame)))
    if suffix == ".parquet":
        return Dataset(pd.read_parquet(p), p)
    import pyreadstat

    if suffix in (".sav", ".zsav"):
        frame, meta = pyreadstat.read_sav(str(p))
        levels = {k: _SPSS_LEVELS[v] for k, v in (meta.variable_measure or {}).items() if v in _SPSS_LEVELS}
    else:
        frame, meta = pyreadstat.read_dta(str(p))
        levels = {}
    labels = {k: v for k, v in (meta.column_names_to_labels or {}).items() if v}
    for name in frame.columns:  # SPSS and Stata store a missing string as ""
        if frame[name].dtype == object or pd.api.types.is_string_dtype(frame[name]):
            frame[name] = frame[name].mask(frame[name] == "")
    return Dataset(frame, p, levels, dict(meta.variable_value_labels or {}), labels)


def _dates_among_numbers(frame: "pd.DataFrame") -> list[str]:
    """A note for each spreadsheet column that mixes dates and numbers: a spreadsheet turns entries such as 1-3 or 3/4
    into dates as they are typed, and the column then holds categories nobody meant."""
    import datetime

    notes = []
    for name in frame.columns:
        if frame[name].dtype != object:
            continue
        dated = frame[name].map(lambda v: isinstance(v, (datetime.date, datetime.time)))
        numbers = frame[name].map(lambda v: isinstance(v, (int, float)) and not isinstance(v, bool) and v == v)
        if dated.any() and numbers.any():
            notes.append(f"{name}: {int(dated.sum())} date(s) among {int(numbers.sum())} numbers (first in row {int(dated.argmax()) + 2} of the sheet); "
                         "a spreadsheet turns entries such as 1-3 into dates as they are typed: check the column")
    return notes


MAX_CELLS = 50_000_000  # a worksheet's declared dimensions (rows × columns) above this are refused before loading


def _check_sheet_size(p: Path, sheet: "str | int | None") -> None:
    """Refuse a worksheet whose declared dimensions would make a data frame of
    more than MAX_CELLS cells (one value at the last row and column of a 5 KB
    file would otherwise be loaded as 17 billion cells)."""
    from openpyxl import load_workbook

    book = load_workbook(p, read_only=True, data_only=True)
    try:
        names = book.sheetnames
        if isinstance(sheet, int):
            name = names[sheet] if -len(names) <= sheet < len(names) else None
        else:
            name = sheet if sheet is not None else (names[0] if names else None)
        if name is None or name not in names:
            return  # the reader names the missing sheet
        ws = book[name]
        rows, cols = ws.max_row or 0, ws.max_column or 0
        if rows * cols > MAX_CELLS:
            raise InputError(f"{p}: sheet {name!r} declares {rows:,} rows × {cols:,} columns, over the limit of {MAX_CELLS:,} cells; "
                             "delete the stray cells far from the data or save the data as CSV")
    finally:
        book.close()


def _apply_missing(frame: "pd.DataFrame", missing: "Sequence[Any] | Mapping[str, Sequence[Any]]", p: Path) -> "pd.DataFrame":
    if isinstance(missing, Mapping):
        for name in missing:
            if name not in frame.columns:
                from .coding import column

                column(frame, name)
        per = {k: list(v) for k, v in missing.items()}
    else:
        per = {str(c): list(missing) for c in frame.columns}
    out = frame.copy()
    for name, codes in per.items():
        hit = out[name].isin(codes)
        if hit.any():
            out[name] = out[name].mask(hit)
    return out
