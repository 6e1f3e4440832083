"""Style profiles are data: TOML with extends, validated naming the bad key."""

from pathlib import Path

import pytest

from statsetter import StyleError, builtin_styles, load_style

HERE = Path(__file__).parent / "styles"


def test_builtins():
    assert {"apa7", "ama11"} <= set(builtin_styles())
    assert load_style().name == "apa7"  # APA 7 is the default
    assert load_style("ama11").p["symbol"] == "<i>P</i>"  # AMA 11: capital italic P (memory)


def test_extends_merges(tmp_path):
    style = load_style(HERE / "comma.toml")
    assert style.decimal_mark == ","
    assert style.p["decimals"] == 3  # inherited from apa7


def write(tmp_path, text):
    path = tmp_path / "house.toml"
    path.write_text(text, encoding="utf-8")
    return path


@pytest.mark.parametrize(
    "text, key, allowed",
    [
        ('extends = "apa7"\n[numbers]\ndecimals = 9\n', "numbers.decimals", "0 to 6"),
        ('extends = "apa7"\n[numbers]\nminus = "~"\n', "numbers.minus", "'-'"),
        ('extends = "apa7"\n[numbers]\ncolour = "red"\n', "numbers.colour", "allowed keys here: decimals"),
        ('extends = "apa7"\n[pvalue]\ndecimals = 2\n', "pvalue", "allowed keys here"),
        ('extends = "nope"\n', "extends", "built in: ama11, apa7"),
        ('extends = "apa7"\n[symbols]\nt = "<b>t</b>"\n', "symbols.t", "allowed tags"),
        ('extends = "apa7"\n[ci]\npattern = "[{low}]"\n', "ci.pattern", "lacks {high}"),
        ('extends = "apa7"\n[numbers]\ndecimal_mark = ","\nthousands = "."\n', "numbers.list_separator", "';'"),
        ('extends = "apa7"\n[wording]\nsignificance = "yes"\n', "wording.significance", "true or false"),
        ('extends = "apa7"\n[numbers.never_zero]\nquantities = "B"\n', "numbers.never_zero.quantities", "list"),
        ('[numbers]\ndecimals = 2\n', "p", "missing"),
        ("extends = \n", "(file)", "not valid TOML"),
    ],
)
def test_bad_style_names_key(tmp_path, text, key, allowed):
    with pytest.raises(StyleError) as info:
        load_style(write(tmp_path, text))
    assert info.value.key == key
    assert allowed in str(info.value)


def test_extends_cycle(tmp_path):
    (tmp_path / "a.toml").write_text('extends = "b.toml"\n')
    (tmp_path / "b.toml").write_text('extends = "a.toml"\n')
    with pytest.raises(StyleError, match="extends itself"):
        load_style(tmp_path / "a.toml")


def test_missing_file():
    with pytest.raises(StyleError, match="no such style file"):
        load_style("does/not/exist.toml")
    with pytest.raises(StyleError, match="no built-in style"):
        load_style("chicago")
