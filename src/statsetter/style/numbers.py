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

Everything returns plain strings; symbols and italics are the templates' job.
"""

from __future__ import annotations

from decimal import ROUND_HALF_UP, Context, Decimal
from functools import lru_cache
from typing import Literal

from .profile import Style

__all__ = ["Numbers", "round_half_up", "numbers_for"]

_CTX = Context(prec=80, rounding=ROUND_HALF_UP)
_QUANTUM = [Decimal(1).scaleb(-k) for k in range(0, 40)]
_MAX_DECIMALS = 30


def round_half_up(value: float, decimals: int) -> Decimal:
    """``value`` rounded half up at ``decimals`` places, from the shortest
    decimal representation of the float (what the user sees)."""
    quantum = _QUANTUM[decimals] if decimals < len(_QUANTUM) else Decimal(1).scaleb(-decimals)
    return Decimal(repr(float(value))).quantize(quantum, context=_CTX)


@lru_cache(maxsize=256)
def _decimal_of(value: float) -> Decimal:
    """The Decimal of a few recurring constants (alpha, the null of a CI)."""
    return Decimal(repr(float(value)))


PValue = tuple[Literal["=", "<", ">"], str]


class Numbers:
    """Formats numbers in one style. Build with :func:`numbers_for` (cached)."""

    def __init__(self, style: Style) -> None:
        self.style = style
        self._decimals = style.decimals
        self._qdec = dict(style.quantity_decimals)
        self._bounded = style.bounded
        self._mark = style.decimal_mark
        self._thousands = style.thousands
        self._group_from = style.group_from
        self._minus = style.minus
        p = style.p
        self._p_decimals: int = p["decimals"]
        self._p_extra_below: float = p.get("extra_digit_below", 0) or 0
        self._p_floor: float = p.get("floor", 0) or 0
        self._p_ceiling: float = p.get("ceiling", 0) or 0
        self._alpha: float = style.wording.get("alpha", 0.05)

    # -- basic ---------------------------------------------------------------

    def decimals_for(self, quantity: str) -> int:
        """The style's decimals for a quantity (``r``, ``d``, ``M`` ...)."""
        if quantity == "p":
            return self._p_decimals
        if quantity == "percent":
            return self._qdec.get("percent", self.style.percent_decimals)
        return self._qdec.get(quantity, self._decimals)

    def is_bounded(self, quantity: str) -> bool:
        return quantity in self._bounded

    def _compose(self, rounded: Decimal, bounded: bool, group: bool) -> str:
        text = format(rounded, "f")
        negative = text.startswith("-")
        if negative:
            text = text[1:]
        whole, _, frac = text.partition(".")
        if group and self._thousands and len(whole) > 3 and int(whole) >= self._group_from:
            head = len(whole) % 3 or 3
            parts = [whole[:head]] + [whole[i : i + 3] for i in range(head, len(whole), 3)]
            whole = self._thousands.join(parts)
        if bounded and whole == "0" and frac:
            whole = ""
        out = f"{whole}{self._mark}{frac}" if frac else whole
        if negative and rounded != 0:
            out = self._minus + out
        return out

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
        if decimals is None:
            decimals = self.decimals_for(quantity)
        if held is not None:
            decimals = min(decimals, held)
        return self._compose(round_half_up(value, decimals), quantity in self._bounded, group)

    def integer(self, value: float) -> str:
        """A count, grouped by thousands (``1,256``)."""
        return self._compose(round_half_up(value, 0), False, True)

    def df(self, value: float) -> str:
        """Degrees of freedom: whole numbers as such, others with the style's
        decimals (Welch ``17.78``); never grouped by thousands."""
        if float(value).is_integer():
            return self._compose(round_half_up(value, 0), False, False)
        return self._compose(round_half_up(value, self._decimals), False, False)

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
            return "<", self._compose(Decimal(repr(floor)), True, False)
        ceiling = self._p_ceiling
        if ceiling and value > ceiling:
            return ">", self._compose(Decimal(repr(ceiling)), True, False)
        decimals = self._p_decimals
        if self._p_extra_below and value < self._p_extra_below:
            decimals += 1
        if held is not None:
            decimals = min(decimals, held)
        exact = Decimal(repr(float(value)))  # built once: the decimals it has, and every rounding below
        if held is not None:
            limit = held
        else:
            exponent = exact.as_tuple().exponent
            limit = min(max(-exponent if isinstance(exponent, int) and exponent < 0 else 0, decimals), _MAX_DECIMALS)
        below = value < alpha
        alpha_dec = _decimal_of(alpha)
        while True:
            rounded = exact.quantize(_QUANTUM[decimals], context=_CTX) if decimals < len(_QUANTUM) else round_half_up(value, decimals)
            wrong = (below and rounded >= alpha_dec) or (rounded == 0 and value > 0)
            if not wrong or decimals >= limit:
                break
            decimals += 1
        if rounded == 0:
            # only reachable without a floor (or a held precision): say "<"
            return "<", self._compose(_QUANTUM[decimals], True, False)
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
        null_dec = _decimal_of(null)
        rounded = round_half_up(value, decimals)
        if rounded == null_dec and value != null:
            # round at the first significant digit of the distance from the null
            distance = Decimal(repr(float(value))) - null_dec
            decimals = max(decimals + 1, -distance.adjusted())
            if held is not None:
                decimals = min(decimals, held)
            rounded = round_half_up(value, decimals)
        return self._compose(rounded, quantity in self._bounded, True)

    def interval(
        self,
        low: float,
        high: float,
        quantity: str,
        null: float = 0.0,
        held: tuple[int | None, int | None] = (None, None),
    ) -> tuple[str, str]:
        return (
            self.limit(low, quantity, null, held=held[0]),
            self.limit(high, quantity, null, held=held[1]),
        )


@lru_cache(maxsize=64)
def numbers_for(style: Style) -> Numbers:
    """The (cached) number engine for a style."""
    return Numbers(style)

