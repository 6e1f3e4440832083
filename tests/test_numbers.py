"""The number engine, against REPORTING-RULES.md (rule and source beside each check)."""

from decimal import Decimal
from pathlib import Path

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from statsetter import load_style
from statsetter.style import numbers_for, round_half_up

MINUS = "\u2212"


def parse(text: str, style_mark: str = ".", thousands: str = ",") -> Decimal:
    """Read a formatted number back (inverse of the engine's notation)."""
    t = text.replace(MINUS, "-").replace(thousands, "") if thousands else text.replace(MINUS, "-")
    t = t.replace(style_mark, ".")
    if t.startswith("."):
        t = "0" + t
    if t.startswith("-."):
        t = "-0" + t[1:]
    return Decimal(t)


# -- rounding: round half up on the decimal the user sees (REPORTING-RULES, Numbers; practice)


@pytest.mark.parametrize(
    "value, decimals, expected",
    [
        (2.675, 2, "2.68"),  # binary float 2.67499999... would round down
        (1.005, 2, "1.01"),
        (0.125, 2, "0.13"),
        (0.5, 0, "1"),
        (2.5, 0, "3"),  # not banker's rounding
        (-2.675, 2, "-2.68"),  # symmetric: away from zero
        (1e-7, 3, "0.000"),
    ],
)
def test_round_half_up(value, decimals, expected):
    assert format(round_half_up(value, decimals), "f") == expected


def test_python_round_differs_here():
    # the reason for the rule: Python's round() gives 2.67 for 2.675
    assert round(2.675, 2) == 2.67
    assert str(round_half_up(2.675, 2)) == "2.68"


# -- leading zero by quantity (APA 7 §6.36)


@pytest.mark.parametrize(
    "quantity, value, expected",
    [
        ("r", 0.45, ".45"),
        ("r", -0.45, MINUS + ".45"),
        ("R2", 0.2449, ".24"),
        ("eta2", 0.09, ".09"),
        ("V", 0.22, ".22"),
        ("alpha", 0.84, ".84"),
        ("beta", -0.31, MINUS + ".31"),
        ("d", 0.11, "0.11"),
        ("SD", 0.82, "0.82"),
        ("B", 0.40, "0.40"),
        ("M", -0.5, MINUS + "0.50"),
    ],
)
def test_leading_zero(apa, quantity, value, expected):
    assert apa.number(value, quantity) == expected


# -- thousands: grouped, never in df (APA 7 §6.38)


def test_thousands(apa):
    assert apa.integer(1256) == "1,256"
    assert apa.integer(999) == "999"
    assert apa.number(12345.678, "M") == "12,345.68"
    assert apa.df(1256) == "1256"
    assert apa.df(17.776) == "17.78"  # Welch df keep decimals (REPORTING-RULES, t test; practice)


# -- minus sign U+2212, no space after it (practice; APA examples)


def test_minus_sign(apa):
    assert apa.number(-2.14, "t") == "\u22122.14"
    assert apa.number(-0.001, "t") == "0.00"  # a value that rounds to zero carries no sign
    hyphen = numbers_for(load_style(Path(__file__).parent / "styles" / "hyphen.toml"))
    assert hyphen.number(-2.14, "t") == "-2.14"


# -- p values (APA 7 §6.36; AMA 11 §19.5, memory)


@pytest.mark.parametrize(
    "p, expected",
    [
        (0.0391, ("=", ".039")),
        (0.0004, ("<", ".001")),  # never p = .000
        (0.001, ("=", ".001")),
        (0.5, ("=", ".500")),
        (0.04996, ("<", ".05")),  # .050 would read as not below .05: the threshold keeps the decision (docs/reporting-rules.md)
        (0.0496, ("<", ".05")),
        (0.0494, ("=", ".049")),
        (0.05, ("=", ".050")),
        (0.9994, ("=", ".999")),
        (0.9996, (">", ".999")),  # never p = 1.000 (docs/reporting-rules.md, p values)
        (1.0, (">", ".999")),
    ],
)
def test_p_apa(apa, p, expected):
    assert apa.p(p) == expected


@pytest.mark.parametrize(
    "p, expected",
    [
        (0.0391, ("=", ".04")),  # two digits
        (0.0049, ("=", ".005")),  # three digits below .01
        (0.0004, ("<", ".001")),
        (0.995, (">", ".99")),
        (0.0496, ("<", ".05")),  # AMA: one more digit where two would cross .05 (.050 still does), then P < .05
        (0.0494, ("=", ".049")),  # the one more digit keeps it
    ],
)
def test_p_ama(ama, p, expected):
    assert ama.p(p) == expected


def test_p_other_alpha(apa):
    # at alpha = .01, p = .0096 must not print as .010: p < .01
    assert apa.p(0.0096, 0.01) == ("<", ".01")
    assert apa.p(0.0094, 0.01) == ("=", ".009")


# -- decision-preserving CI limits (REPORTING-RULES, Numbers: the CI case is practice)


def test_ci_limits_keep_the_decision(apa):
    assert apa.interval(0.004, 0.45, "d") == ("0.004", "0.45")
    assert apa.interval(-0.45, -0.0031, "d") == (MINUS + "0.45", MINUS + "0.003")
    assert apa.interval(0.0, 0.45, "d") == ("0.00", "0.45")  # exactly 0 prints as 0
    assert apa.interval(1.004, 2.5, "OR", null=1.0) == ("1.004", "2.50")


# -- decimal comma with its list separator (style option)


def test_decimal_comma():
    style = load_style(Path(__file__).parent / "styles" / "comma.toml")
    num = numbers_for(style)
    assert num.number(2.675, "M") == "2,68"
    assert num.number(0.45, "r") == ",45"
    assert num.integer(1256) == "1.256"
    assert style.list_separator == ";"


# -- properties over the whole range --------------------------------------------------

finite = st.floats(min_value=-1e6, max_value=1e6, allow_nan=False, allow_infinity=False)
unit = st.floats(min_value=-1, max_value=1, allow_nan=False)
prob = st.floats(min_value=0, max_value=1, allow_nan=False)
alphas = st.sampled_from([0.05, 0.01, 0.001, 0.1, 0.005])


@settings(max_examples=500, deadline=None)
@given(finite, st.integers(0, 4))
def test_parses_back_within_half_a_unit(value, decimals):
    num = numbers_for(load_style("apa7"))
    text = num.number(value, "M", decimals)
    back = parse(text)
    assert abs(back - Decimal(repr(value))) <= Decimal(1).scaleb(-decimals) / 2


@settings(max_examples=500, deadline=None)
@given(unit, st.sampled_from(["r", "p", "R2", "eta2", "V", "alpha", "beta", "omega2"]))
def test_bounded_never_leading_zero(value, quantity):
    num = numbers_for(load_style("apa7"))
    text = num.number(value, quantity).lstrip(MINUS)
    assert not text.startswith("0"), text


@settings(max_examples=500, deadline=None)
@given(st.floats(min_value=-0.99, max_value=0.99, allow_nan=False), st.sampled_from(["d", "M", "SD", "B", "t", "g"]))
def test_unbounded_always_leading_zero(value, quantity):
    num = numbers_for(load_style("apa7"))
    text = num.number(value, quantity).lstrip(MINUS)
    assert text.startswith("0"), text


@settings(max_examples=1000, deadline=None)
@given(prob, alphas, st.sampled_from(["apa7", "ama11"]))
def test_p_never_zero_and_keeps_the_decision(p, alpha, style_name):
    num = numbers_for(load_style(style_name))
    op, text = num.p(p, alpha)
    shown = parse(text)
    if op == "=":
        assert shown != 0, (p, text)
        # a p below alpha never prints as alpha or above; at or above alpha never below it
        assert (shown < Decimal(repr(alpha))) == (p < alpha), (p, alpha, text)
    elif op == "<":
        assert p < shown
        assert p < alpha  # "<" is used only where it implies the decision
        assert shown <= Decimal(repr(alpha))
    else:
        assert p > shown and p >= alpha


@settings(max_examples=1000, deadline=None)
@given(finite, finite, st.sampled_from([0.0, 1.0]))
def test_ci_never_touches_null_unless_it_is_null(a, b, null):
    low, high = sorted((a, b))
    num = numbers_for(load_style("apa7"))
    lo_text, hi_text = num.interval(low, high, "d", null)
    for value, text in ((low, lo_text), (high, hi_text)):
        shown = parse(text)
        assert len(text) <= 22, (value, text)  # at most 12 decimals: 1e6 and its digits, or 0. and 12 decimals
        if value != null and abs(Decimal(repr(value)) - Decimal(repr(null))) >= Decimal("1e-12"):
            assert shown != Decimal(repr(null)), (value, text)
            # and it stays on the same side of the null
            assert (shown > Decimal(repr(null))) == (value > null)


def test_a_limit_nearer_the_null_than_any_author_writes_is_not_written_out():
    """A CI limit 1e-300 from the null (a model in absurd units, or a computing error) was written with 300 decimals
    ("[0.000…0001, 1.31]"); digits are added up to 12 decimals, as for an estimate, and no further (practice: such a
    variable is rescaled by the author)."""
    num = numbers_for(load_style("apa7"))
    assert num.interval(1e-300, 1.31, "d") == ("0.00", "1.31")
    assert num.interval(-1e-13, 0.5, "d") == ("0.00", "0.50")  # as its estimate would print (never "−0.00")
    assert num.interval(1e-12, 1.31, "d") == ("0.000000000001", "1.31")  # the last digits still added
    assert num.interval(0.003, 1.31, "d") == ("0.003", "1.31")
    assert num.interval(1 + 1e-15, 1.5, "OR", null=1.0)[0] == "1.00"  # a ratio's limit 1e-15 above 1
    assert num.interval(1.00001, 1.5, "OR", null=1.0)[0] == "1.00001"
    assert num.interval(1e-200, 1.5, "OR", null=1.0)[0] == "0.00"


# -- the digit-string rounding path against Decimal (reference: Python's decimal
# module, ROUND_HALF_UP on the float's repr, which is what round_half_up does)

from statsetter.style.numbers import rounded_digits  # noqa: E402


def _as_text(digits):
    negative, whole, frac = digits
    return ("-" if negative else "") + (f"{whole}.{frac}" if frac else whole)


@settings(max_examples=3000, deadline=None)
@given(st.floats(allow_nan=False, allow_infinity=False), st.integers(0, 30))
def test_digit_rounding_equals_decimal_everywhere(value, decimals):
    assert _as_text(rounded_digits(value, decimals)) == format(round_half_up(value, decimals), "f")


@settings(max_examples=3000, deadline=None)
@given(st.integers(-10**6, 10**6), st.integers(0, 10**5), st.integers(0, 6))
def test_digit_rounding_on_ties(whole, frac, decimals):
    # values whose repr ends in 5 just after the kept digits: the ties
    value = float(f"{whole}.{frac:05d}5")
    assert _as_text(rounded_digits(value, decimals)) == format(round_half_up(value, decimals), "f")


def test_p_without_a_floor_in_exponent_notation(tmp_path):
    # repr gives 3e-05: the exact decimals still decide (no floor in this style)
    path = tmp_path / "nofloor.toml"
    path.write_text('name = "nofloor"\nextends = "apa7"\n[p]\nfloor = 0\nnear_alpha_digits = 17\n', encoding="utf-8")
    num = numbers_for(load_style(path))
    assert num.p(3e-05) == ("=", ".00003")
    assert num.p(0.0) == ("<", ".001")
    assert num.p(0.04999999999999999) == ("=", ".04999999999999999")  # just below alpha: every digit it has


# -- never zero: a non-zero B or SE does not print as 0.00 (APA 7 §6.36: more decimals
# where precision matters; the B and SE quantities are the style's choice, in apa7.toml)


@pytest.mark.parametrize(
    "value, expected",
    [(-0.003, MINUS + "0.003"), (0.0046, "0.005"), (0.00049, "0.0005"), (0.004999, "0.005"), (0.12, "0.12"), (0.0, "0.00"), (1e-9, "0.000000001"), (4e-13, "0.00")],
)
def test_never_zero_quantities(apa, value, expected):
    assert apa.number(value, "B") == expected and apa.number(value, "SE") == expected
    assert apa.number(value, "d") == ("0.00" if abs(value) < 0.005 else f"{value:.2f}")  # d is not such a quantity


@settings(max_examples=1000, deadline=None)
@given(st.floats(min_value=-0.01, max_value=0.01, allow_nan=False).filter(lambda v: abs(v) >= 1e-6))
def test_never_zero_property(value):
    num = numbers_for(load_style("apa7"))
    text = num.number(value, "B")
    shown = parse(text)
    assert shown != 0, (value, text)
    decimals = len(text.split(".")[1])
    assert abs(shown - Decimal(repr(value))) <= Decimal(1).scaleb(-decimals) / 2


# -- the small rules of issue 17: a ratio's limit, never-zero everywhere, the serial comma


def test_a_ratio_limit_never_prints_as_zero(apa):
    # an odds ratio's CI limit of 0.001 is not "0.00": as with 1, digits are added (REPORTING-RULES Numbers; practice)
    assert apa.interval(0.001, 3.2, "OR", null=1.0) == ("0.001", "3.20")
    assert apa.interval(0.0004, 0.02, "OR", null=1.0) == ("0.0004", "0.02")
    assert apa.interval(0.25, 3.2, "OR", null=1.0) == ("0.25", "3.20")


def test_never_zero_holds_in_format_tables_and_sentences(capsys):
    from statsetter.cli import main

    assert main(["format", "coef", "--stat", "5", "--df", "100", "--estimate", "0.0000004", "--estimate-ci=0.0000001,0.0000007"]) == 0
    assert capsys.readouterr().out.startswith("B = 0.0000004, 95% CI [0.0000001, 0.0000007]")


def test_serial_comma_is_a_style_choice(tmp_path):
    from kind_examples import EXAMPLES
    from statsetter import render

    apa = render(EXAMPLES["anova_oneway"], "sentence", "apa7").plain()
    assert "n = 33), and C (" in apa  # APA 7 §6.3
    path = tmp_path / "noserial.toml"
    path.write_text('name = "noserial"\nextends = "apa7"\n[wording]\nserial_comma = false\n', encoding="utf-8")
    assert "n = 33) and C (" in render(EXAMPLES["anova_oneway"], "sentence", load_style(path)).plain()



def test_a_style_makes_its_number_engine_once():
    """numbers_for is asked for every statistic an audit reads (10,000 times on the benchmark's 1,000 pages), making
    the engine takes 5 µs, and the audit's remembered p prints are keyed by the engine: one engine per style (without
    the cache an audit takes 13% longer), never shared between two."""
    import dataclasses

    apa = load_style("apa7")
    assert numbers_for(apa) is numbers_for(apa)
    other = dataclasses.replace(apa, name="apa7-copy", data={**apa.data, "numbers": {**apa.data["numbers"], "decimal_mark": ","}})
    assert numbers_for(other) is not numbers_for(apa) and numbers_for(other).style is other
    assert numbers_for(other).number(2.5, "M") == "2,50" and numbers_for(apa).number(2.5, "M") == "2.50"
