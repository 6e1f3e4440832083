"""The project's own exceptions.

Every failure caused by user input raises one of these, naming the field,
variable, key, file or line at fault. The CLI prints the message in one or
two lines and exits with status 2; no traceback reaches a user.
"""

from __future__ import annotations

__all__ = ["StatsetterError", "RecordError", "StyleError", "TemplateError", "InputError", "EnvironmentFailure", "MissingExtra", "FormerName", "FormerUse", "EXTRAS"]


class StatsetterError(Exception):
    """Base class: an error the user can act on."""


class RecordError(StatsetterError, ValueError):
    """A result record failed validation; the message names the field."""

    def __init__(self, field: str, message: str) -> None:
        self.field = field
        super().__init__(f"{field}: {message}")


class StyleError(StatsetterError, ValueError):
    """A style profile is invalid; the message names the key and what is allowed."""

    def __init__(self, source: str, key: str, message: str) -> None:
        self.source = source
        self.key = key
        super().__init__(f"{source}: {key}: {message}")


class TemplateError(StatsetterError):
    """A sentence template is missing or failed to render."""


class InputError(StatsetterError, ValueError):
    """Bad input data, file or command-line value; the message names it."""


class EnvironmentFailure(StatsetterError):
    """Not the input's fault: a full disk, a folder without permission, a
    missing optional dependency. The CLI exits with status 3."""


# Which extra installs each optional module.
EXTRAS = {
    "numpy": "analyses", "scipy": "analyses", "pandas": "analyses", "statsmodels": "analyses", "pingouin": "analyses",
    "docx": "docx", "lxml": "docx", "openpyxl": "files", "pyreadstat": "files", "pyarrow": "files", "matplotlib": "figures",
}


class MissingExtra(EnvironmentFailure):
    """An optional dependency is not installed; the message names the extra."""

    def __init__(self, module: str, doing: str = "this") -> None:
        extra = EXTRAS.get(module.split(".")[0], "all")
        self.module = module
        super().__init__(f"{doing} needs {module.split('.')[0]}, which is not installed; install it with: pip install 'statsetter[{extra}]'")


class FormerName(UserWarning):
    """A plan key, option or keyword given by the name it had before this
    release: it still works, for one release."""


class FormerUse(DeprecationWarning):
    """A keyword or return shape of the Python API as it was before this
    release: it still works, for one release."""
