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

# The moderate-df table (test_moderate_df_against_50_digits): t and F on 1 or 2 df where the expansion is taken
for df in (31, 40, 97, 240, 1000, 5000):
    nu = mpmath.mpf(df)
    for v in (0.35, 1.2, 2.01, 3.3, 5.5):
        t = mpmath.mpf(v)
        if float(t * t / (nu + t * t)) < 0.29:
            print("t", v, (df,), float(mpmath.betainc(nu / 2, mpmath.mpf(1) / 2, 0, nu / (nu + t * t), regularized=True) / 2))
    for f1 in (1, 2):
        F, d1 = mpmath.mpf(4.2), mpmath.mpf(f1)
        print("F", 4.2, (f1, df), float(mpmath.betainc(nu / 2, d1 / 2, 0, nu / (nu + d1 * F), regularized=True)))

# The Tukey p of penguins' bill length, Adelie against Chinstrap and against Gentoo (tests/test_analyses_posthoc.py::
# test_tukey): the studentized range of 3 means with 339 df beyond q = 32.85523755886251 and q = 34.27698041151575, P = ∫ f(s) T(q·s) ds with s = √(χ²/df) and
# T(w) = 3 ∫ φ(z) Φ(z − w)(2Φ(z) − Φ(z − w)) dz (the range of three normals; a² − (a − b)² = b(2a − b) keeps the digits),
# at 20 digits, the outer integral split around its peak (at s = 0.62 for both): 1.26985830911679e-71 (mpmath's error
# estimate 6e-76) and 1.59920408851874e-75 (8e-80).
mpmath.mp.dps = 20
nu = mpmath.mpf(339)
h = nu / 2


def tail(w):
    c = w / 2
    f = lambda z: mpmath.npdf(z) * mpmath.ncdf(z - w) * (2 * mpmath.ncdf(z) - mpmath.ncdf(z - w))  # noqa: E731
    return 3 * mpmath.quad(f, [-mpmath.inf, c - 6, c - 2, c, c + 2, c + 6, mpmath.inf])


def density(s):
    return mpmath.exp(mpmath.log(2) + h * mpmath.log(h) - mpmath.loggamma(h) + (nu - 1) * mpmath.log(s) - h * s * s)


points = sorted({mpmath.mpf(0.2), mpmath.mpf(1.5), mpmath.mpf(3)} | {mpmath.mpf(0.62) + mpmath.mpf(d) / 100 for d in range(-20, 21, 2)})
for pair, q in (("Adelie-Chinstrap", mpmath.mpf("32.85523755886251")), ("Adelie-Gentoo", mpmath.mpf("34.27698041151575"))):
    print("Tukey p,", pair, mpmath.nstr(mpmath.quad(lambda s: density(s) * tail(q * s), points), 15))
