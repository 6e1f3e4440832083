"""Style profiles and the number engine."""

from .numbers import Numbers, numbers_for, round_half_up
from .profile import Style, builtin_styles, check_style_file, load_style

__all__ = ["Style", "load_style", "builtin_styles", "check_style_file", "Numbers", "numbers_for", "round_half_up"]
