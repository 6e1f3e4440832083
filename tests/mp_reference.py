"""How tests/test_pvalues.py's high-precision reference values were made.

Not run by the suite (mpmath is not a test dependency): `pip install mpmath`
and run this file to print the same table. mpmath 1.4.1 evaluates the
regularized incomplete beta function at 50 significant digits; the values
are the upper tails of t (I_x(ν/2, 1/2) / 2 with x = ν / (ν + t²)) and of F
(I_x(ν₂/2, ν₁/2) with x = ν₂ / (ν₂ + ν₁F)), rounded to double precision.
"""

import mpmath

mpmath.mp.dps = 50

for df in (2e4, 1e5, 1e6, 1e7, 1e9, 1e11):
    nu = mpmath.mpf(df)
    for v in (1.96, 3.3, 8.0):
        t = mpmath.mpf(v)
        print("t", v, (df,), float(mpmath.betainc(nu / 2, mpmath.mpf(1) / 2, 0, nu / (nu + t * t), regularized=True) / 2))
    for f1 in (1, 4, 10, 100):
        F, d1 = mpmath.mpf(3), mpmath.mpf(f1)
        print("F", 3.0, (f1, df), float(mpmath.betainc(nu / 2, d1 / 2, 0, nu / (nu + d1 * F), regularized=True)))
