import pytest

from statsetter import load_style
from statsetter.style import numbers_for


@pytest.fixture(scope="session")
def apa():
    return numbers_for(load_style("apa7"))


@pytest.fixture(scope="session")
def ama():
    return numbers_for(load_style("ama11"))
