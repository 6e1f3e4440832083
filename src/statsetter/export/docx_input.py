"""Opening an author's .docx safely: clear errors for files that are not Word
documents, password-protected files and archives that unpack too large."""

from __future__ import annotations

import zipfile
import zlib
from pathlib import Path
from typing import TYPE_CHECKING

from ..errors import InputError
from ..files import read_start

if TYPE_CHECKING:
    from docx.document import Document

__all__ = ["open_docx", "check_docx", "MAX_UNPACKED", "DAMAGED", "damaged"]

MAX_UNPACKED = 1 << 30  # 1 GiB unpacked, against zip bombs
MAX_RATIO = 200  # unpacked / packed, per member of any size above 1 MiB
# what reading a damaged archive's member raises: a bad checksum, a broken deflate stream, a member cut short, a
# compression method Python's zip reader lacks (Word writes deflate only)
DAMAGED = (zipfile.BadZipFile, zlib.error, EOFError, NotImplementedError)
_OLE = b"\xd0\xcf\x11\xe0\xa1\xb1\x1a\xe1"


def open_docx(path: "str | Path", *, max_unpacked: int = MAX_UNPACKED) -> "Document":
    import docx

    p = Path(path)
    check_docx(p, max_unpacked=max_unpacked)
    try:
        return docx.Document(str(p))
    except DAMAGED as exc:
        raise damaged(p, exc) from None
    except Exception as exc:  # python-docx raises several kinds on malformed parts
        raise InputError(f"{p}: not a readable Word document ({type(exc).__name__})") from None


def check_docx(path: "str | Path", *, max_unpacked: int = MAX_UNPACKED) -> None:
    """Refuse, with a clear message, what is not a safe Word document to read."""
    p = Path(path)
    head = read_start(p, 8, kind="chapter")
    if head == _OLE:
        raise InputError(f"{p}: password-protected (encrypted) or an old binary .doc; save it as an unprotected .docx")
    if not head.startswith(b"PK"):
        raise InputError(f"{p}: not a Word .docx file (not a zip archive)")
    try:
        with zipfile.ZipFile(p) as archive:
            names = set(archive.namelist())
            if "word/document.xml" not in names or "[Content_Types].xml" not in names:
                raise InputError(f"{p}: a zip archive but not a Word document (no word/document.xml)")
            total = 0
            for info in archive.infolist():
                total += info.file_size
                if info.file_size > (1 << 20) and info.file_size > MAX_RATIO * max(info.compress_size, 1):
                    raise InputError(f"{p}: {info.filename} unpacks {info.file_size // max(info.compress_size, 1)}× its packed size; refusing (zip bomb?)")
            if total > max_unpacked:
                raise InputError(f"{p}: unpacks to {total:,} bytes, over the limit of {max_unpacked:,}")
            for info in archive.infolist():  # Word never writes a DOCTYPE; one would be lost (or break) on saving
                if info.filename.endswith((".xml", ".rels")):
                    with archive.open(info) as part:
                        if b"<!DOCTYPE" in part.read(1024).upper():
                            raise InputError(f"{p}: {info.filename} declares a DOCTYPE, which Word documents do not have; "
                                             "open and save it in Word or LibreOffice first")
    except DAMAGED as exc:
        raise damaged(p, exc) from None


def damaged(path: Path, exc: BaseException) -> InputError:
    """The error for a .docx whose archive cannot be read (``exc``, one of DAMAGED)."""
    if isinstance(exc, NotImplementedError):
        return InputError(f"{path}: a zip archive packed with a method Word does not use; open and save it in Word or LibreOffice first")
    return InputError(f"{path}: a damaged zip archive, not a readable .docx ({exc})")
