"""Analyses from data: DataFrame columns in, exact unrounded records out.

Each function loads numpy, scipy and pandas when called, never on
``import statsetter``.
"""

from .correlation import correlate
from .ttests import t_independent, t_one_sample, t_paired

__all__ = ["correlate", "t_independent", "t_paired", "t_one_sample"]
