"""The number engine: every printed number goes through here.

Driven only by a :class:`~statsetter.style.profile.Style`:

* round half up on the decimal value the user sees (``2.675 -> 2.68``): the
  float's shortest decimal representation is rounded, not its binary value;
* leading zero by quantity (bounded quantities such as r, p, R² drop it);
* p by the style's decimals and thresholds, never ``p = .000``;
* decision-preserving rounding: a p below alpha never prints as alpha or
  above, and a CI limit never prints as the null value (0, or 1 for ratios)
  unless it is exactly that value; a digit is added instead;
* the style's minus sign, decimal mark and thousands separator (never in df).

Everything returns plain strings, never with a character that markup reserves
(& < >); symbols and italics are the templates' job.
"""

from __future__ import annotations

from decimal import ROUND_HALF_UP, Context, Decimal
from functools import lru_cache
from typing import Iterable, Literal

from .profile import Style

__all__ = ["Numbers", "round_half_up", "numbers_for"]

_CTX = Context(prec=400, rounding=ROUND_HALF_UP)  # every float to 40 decimals, exactly
_QUANTUM = [Decimal(1).scaleb(-k) for k in range(0, 40)]
_MAX_DECIMALS = 30
_NEVER_ZERO_MAX = 12  # digits added for a never-zero quantity stop here (a value below 1e-12 is rescaled by the author)


def score_decimals(values: "Iterable[float]") -> int | None:
    """The decimals that medians and quartiles of whole-number scores have: 0 when all are whole, 1 when all are whole
    or halves (by interpolation between two scores), None otherwise or without values — so "2 (2–3)" or "Mdn = 6"
    where a style's "2.00" would print digits the data do not have."""
    found = [float(x) for x in values if x == x]
    for decimals, step in ((0, 1.0), (1, 0.5)):
        if found and all((x / step).is_integer() for x in found):
            return decimals
    return None


def round_half_up(value: float, decimals: int) -> Decimal:
    """``value`` rounded half up at ``decimals`` places, from the shortest
    decimal representation of the float (what the user sees)."""
    quantum = _QUANTUM[decimals] if decimals < len(_QUANTUM) else Decimal(1).scaleb(-decimals)
    return Decimal(repr(float(value))).quantize(quantum, context=_CTX)


@lru_cache(maxsize=256)
def _decimal_of(value: float) -> Decimal:
    """The Decimal of a few recurring constants (alpha, the null of a CI)."""
    return Decimal(repr(float(value)))


Digits = tuple[bool, str, str]  # (negative, whole digits, fraction digits) of a rounded value


def exact_digits(value: float) -> Digits:
    """The float's shortest decimal representation (its repr) as digits."""
    text = repr(float(value))
    if "e" in text or "n" in text:  # 1e-05, 1e+16, inf, nan: write it out
        text = format(Decimal(text), "f")
    negative = text[0] == "-"
    whole, _, frac = (text[1:] if negative else text).partition(".")
    return negative, whole, frac


def round_digits(digits: Digits, decimals: int) -> Digits:
    """Round half up at ``decimals`` places on exact decimal digits: keep
    them, and add one unit in the last place when the first digit dropped is
    5 or more (the remainder is then at least half a unit)."""
    negative, whole, frac = digits
    if len(frac) <= decimals:
        return negative, whole, frac + "0" * (decimals - len(frac))
    keep = frac[:decimals]
    if frac[decimals] < "5":
        return negative, whole, keep
    up = str(int(whole + keep) + 1)
    if not decimals:
        return negative, up, ""
    up = up.rjust(decimals + 1, "0")
    return negative, up[:-decimals], up[-decimals:]


_POW10 = [10.0**k for k in range(16)]  # exact in binary up to 10**22
_FIXED = [f".{k}f" for k in range(16)]


def rounded_digits(value: float, decimals: int) -> Digits:
    """:func:`round_half_up` as digit strings, without building a Decimal.

    Fast path: Python's fixed-point formatting rounds the binary value
    correctly. Half up on the repr can differ from it only when a rounding
    midpoint lies between the binary value and its repr, which are within half
    an ulp of each other; so when ``value * 10**decimals`` is farther from a
    midpoint than its own rounding error plus that half ulp (both below
    ``y * 2**-52``), the two agree. Otherwise, and for large or
    non-finite values, the repr's digits are rounded (:func:`round_digits`).
    tests/test_numbers.py checks the result against Decimal, ties included."""
    if decimals < 16:
        y = abs(value) * _POW10[decimals]
        if y < 1e15:
            frac = y - int(y)
            if abs(frac - 0.5) > y * 4.5e-16:
                text = format(value, _FIXED[decimals])
                if text[0] == "-":
                    whole, _, frac_digits = text[1:].partition(".")
                    return True, whole, frac_digits
                whole, _, frac_digits = text.partition(".")
                return False, whole, frac_digits
    return round_digits(exact_digits(value), decimals)


def _whole_digits(value: float) -> Digits:
    """Digits of a value rounded to a whole number (a count, whole df)."""
    if type(value) is int and -10**15 < value < 10**15:
        return value < 0, str(abs(value)), ""
    if float(value).is_integer() and abs(value) < 1e15:
        return value < 0, str(abs(int(value))), ""
    return rounded_digits(value, 0)


def _is_zero(whole: str, frac: str) -> bool:
    return whole == "0" and frac.count("0") == len(frac)


def _digits_text(digits: Digits) -> str:
    negative, whole, frac = digits
    text = f"{whole}.{frac}" if frac else whole
    return "-" + text if negative else text


def _at_least(digits: Digits, bound: float) -> bool:
    """Whether the decimal ``digits`` are >= the decimal the float ``bound``
    shows. A float comparison decides unless the two floats are equal (float
    conversion keeps order, so only equality is ambiguous)."""
    value = float(_digits_text(digits))
    if value != bound:
        return value > bound
    return Decimal(_digits_text(digits)) >= _decimal_of(bound)


def _equals(digits: Digits, target: float) -> bool:
    if target == 0:
        return _is_zero(digits[1], digits[2])
    return float(_digits_text(digits)) == target and Decimal(_digits_text(digits)) == _decimal_of(target)


PValue = tuple[Literal["=", "<", ">"], str]


class Numbers:
    """Formats numbers in one style. Build with :func:`numbers_for` (cached)."""

    def __init__(self, style: Style) -> None:
        self.style = style
        self._decimals = style.decimals
        self._qdec = dict(style.quantity_decimals)
        self._bounded = style.bounded
        self._never_zero = style.never_zero
        self._mark = style.decimal_mark
        self._thousands = style.thousands
        self._group_from = style.group_from
        self._minus = style.minus
        p = style.p
        self._p_decimals: int = p["decimals"]
        self._p_extra_below: float = p.get("extra_digit_below", 0) or 0
        self._p_floor: float = p.get("floor", 0) or 0
        self._p_ceiling: float = p.get("ceiling", 0) or 0
        self._p_near_alpha: int | None = p.get("near_alpha_digits")  # None: add digits until the decision reads right
        self._alpha: float = style.wording.get("alpha", 0.05)
        self._qdec["percent"] = self._qdec.get("percent", style.percent_decimals)
        self._qdec["p"] = self._p_decimals
        if any(c in self._mark + self._thousands + self._minus for c in "&<>"):  # the style's validation allows none
            raise ValueError("number characters must not be markup")

    # -- basic ---------------------------------------------------------------

    def decimals_for(self, quantity: str) -> int:
        """The style's decimals for a quantity (``r``, ``d``, ``M`` ...)."""
        return self._qdec.get(quantity, self._decimals)

    def is_bounded(self, quantity: str) -> bool:
        return quantity in self._bounded

    def _compose(self, digits: Digits, bounded: bool, group: bool) -> str:
        negative, whole, frac = digits
        if len(whole) > 3 and group and self._thousands and int(whole) >= self._group_from:
            head = len(whole) % 3 or 3
            parts = [whole[:head]] + [whole[i : i + 3] for i in range(head, len(whole), 3)]
            whole = self._thousands.join(parts)
        elif whole == "0":
            if negative and frac.count("0") == len(frac):
                negative = False  # a value that rounds to zero has no sign
            if bounded and frac:
                whole = ""
        out = f"{whole}{self._mark}{frac}" if frac else whole
        return self._minus + out if negative else out

    def number(
        self,
        value: float,
        quantity: str = "default",
        decimals: int | None = None,
        *,
        group: bool = True,
        held: int | None = None,
    ) -> str:
        """A number in the style: rounded half up, leading zero by quantity,
        grouped, with the style's minus sign and decimal mark. ``held`` caps
        the decimals at those the value was given with."""
        if value in (float("inf"), float("-inf")):
            return "∞" if value > 0 else self.style.minus + "∞"
        if decimals is None:
            decimals = self._qdec.get(quantity, self._decimals)
        if held is not None:
            decimals = min(decimals, held)
        digits = rounded_digits(value, decimals)
        if quantity in self._never_zero and value and held is None and _is_zero(digits[1], digits[2]):
            digits = rounded_digits(value, self._first_digit(value, decimals))
        return self._compose(digits, quantity in self._bounded, group)

    def _first_digit(self, value: float, decimals: int) -> int:
        """The decimals at which a small non-zero value shows its first
        significant digit (never more than ``_NEVER_ZERO_MAX``)."""
        return _more_decimals(decimals, -Decimal(repr(float(value))).adjusted(), None)

    def shown_decimals(self, value: float, quantity: str = "default", held: int | None = None) -> int:
        """The decimals :meth:`number` gives ``value`` (so that a CI can match its estimate)."""
        decimals = self._qdec.get(quantity, self._decimals)
        if held is not None:
            return min(decimals, held)
        if quantity in self._never_zero and value:
            digits = rounded_digits(value, decimals)
            if _is_zero(digits[1], digits[2]):
                return self._first_digit(value, decimals)
        return decimals

    def integer(self, value: float) -> str:
        """A count, grouped by thousands (``1,256``)."""
        return self._compose(_whole_digits(value), False, True)

    def df(self, value: float) -> str:
        """Degrees of freedom: whole numbers as such, others with the style's
        decimals (Welch ``17.78``); never grouped by thousands."""
        if float(value).is_integer():
            return self._compose(_whole_digits(value), False, False)
        return self._compose(rounded_digits(value, self._decimals), False, False)

    def percent(self, value: float, held: int | None = None) -> str:
        return self.number(value, "percent", held=held)

    # -- p values --------------------------------------------------------------

    def p(self, value: float, alpha: float | None = None, held: int | None = None) -> PValue:
        """(operator, number) for a p value, e.g. ``("=", ".039")`` or
        ``("<", ".001")``. Decision-preserving against ``alpha``."""
        if alpha is None:
            alpha = self._alpha
        floor = self._p_floor
        if floor and value < floor and floor <= alpha:
            return "<", self._compose(exact_digits(floor), True, False)
        ceiling = self._p_ceiling
        if ceiling and value > ceiling and not _equals(rounded_digits(value, self._p_decimals), ceiling):
            return ">", self._compose(exact_digits(ceiling), True, False)  # p = .9996 is p > .999, never p = 1.000
        decimals = self._p_decimals
        if self._p_extra_below and value < self._p_extra_below:
            decimals += 1
        if held is not None:
            decimals = min(decimals, held)
        below = value < alpha
        rounded = rounded_digits(value, decimals)
        zero = _is_zero(rounded[1], rounded[2])
        if (below and _at_least(rounded, alpha)) or (zero and value > 0):
            # the decision (or a non-zero p) would be lost: add digits, up to those the value has, or up
            # to the style's near_alpha_digits and then say "p < alpha"
            exact = exact_digits(value)
            limit = held if held is not None else min(max(len(exact[2]), decimals), _MAX_DECIMALS)
            if self._p_near_alpha is not None and held is None and not zero:
                limit = min(limit, decimals + self._p_near_alpha)
            while decimals < limit:
                decimals += 1
                rounded = round_digits(exact, decimals)
                zero = _is_zero(rounded[1], rounded[2])
                if not ((below and _at_least(rounded, alpha)) or (zero and value > 0)):
                    break
        if below and _at_least(rounded, alpha) and self._p_near_alpha is not None and held is None:
            return "<", self._compose(exact_digits(alpha), True, False)
        if zero:
            # only reachable without a floor (or a held precision): say "<"
            unit = (False, "0", "0" * (decimals - 1) + "1") if decimals else (False, "1", "")
            return "<", self._compose(unit, True, False)
        return "=", self._compose(rounded, True, False)

    # -- confidence intervals ------------------------------------------------

    def limit(
        self,
        value: float,
        quantity: str,
        null: float = 0.0,
        decimals: int | None = None,
        held: int | None = None,
    ) -> str:
        """A CI limit that never prints as the null value unless it is it."""
        if decimals is None:
            decimals = self.decimals_for(quantity)
        if held is not None:
            decimals = min(decimals, held)
        rounded = rounded_digits(value, decimals)
        if null == 1.0 and value > 0 and _is_zero(rounded[1], rounded[2]):
            # a ratio's limit is never 0 (as it is never 1 unless it is): round at its first significant digit
            decimals = _more_decimals(decimals, -Decimal(repr(float(value))).adjusted(), held)
            rounded = rounded_digits(value, decimals)
        if value != null and _equals(rounded, null):
            # round at the first significant digit of the distance from the null
            distance = Decimal(repr(float(value))) - _decimal_of(null)
            decimals = _more_decimals(decimals, -distance.adjusted(), held)
            rounded = rounded_digits(value, decimals)
        return self._compose(rounded, quantity in self._bounded, True)

    def interval(
        self,
        low: float,
        high: float,
        quantity: str,
        null: float = 0.0,
        held: tuple[int | None, int | None] = (None, None),
        decimals: int | None = None,
    ) -> tuple[str, str]:
        return (
            self.limit(low, quantity, null, decimals, held=held[0]),
            self.limit(high, quantity, null, decimals, held=held[1]),
        )


    def span(self, low: str, high: str, negative: bool, space: str) -> str:
        """Two printed limits joined as the style joins a range ("2–3"; AMA "2-3"); from a negative number by the list
        separator, or by "to" where the dash is a hyphen, since a dash would read as a minus ("−1.20, 0.40"; AMA
        "−1.2 to 0.4"); ``space`` is the style's space inside a statistic."""
        dash = self.style.data["numbers"].get("range_dash", "\u2013")
        if not negative:
            return f"{low}{dash}{high}"
        return f"{low}{space}to{space}{high}" if dash == "-" else f"{low}{self.style.data['numbers']['list_separator']}{space}{high}"

def _more_decimals(decimals: int, first: int, held: int | None) -> int:
    """The decimals at which a limit shows the first significant digit ``first`` (of itself, or of its distance from
    the null), one more than ``decimals`` at least; none added beyond ``_NEVER_ZERO_MAX`` (a limit of 1e-300 is not
    written with 300 zeros: the author rescales), and never more than the ``held`` decimals of a copied number."""
    if first > _NEVER_ZERO_MAX:
        return decimals
    more = max(decimals + 1, first)
    return more if held is None else min(more, held)


@lru_cache(maxsize=64)
def numbers_for(style: Style) -> Numbers:
    """The (cached) number engine for a style."""
    return Numbers(style)

