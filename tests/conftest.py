import pytest

from statsetter import load_style
from statsetter.style import numbers_for


@pytest.fixture(scope="session")
def apa():
    return numbers_for(load_style("apa7"))


@pytest.fixture(scope="session")
def ama():
    return numbers_for(load_style("ama11"))


@pytest.fixture
def without_module(monkeypatch):
    """Make ``import NAME`` (and its submodules) fail as when the package is not installed."""
    import builtins

    real = builtins.__import__

    def hide(module: str) -> None:
        def fake(name, *args, **kwargs):
            if name == module or name.startswith(module + "."):
                raise ModuleNotFoundError(f"No module named '{module}'", name=module)
            return real(name, *args, **kwargs)

        monkeypatch.setattr(builtins, "__import__", fake)

    return hide
