# Reference values for NumericExtremesTests, with mpmath 1.3.0 at 40 digits (python3 extremes.py).
# P(X > Y) = integral over [0, 1] of f_X(x) F_Y(x) dx (Cook 2005, "Exact calculation of beta
# inequalities"), by mpmath.quad between breakpoints at each density's mean +- k sd and at the ends,
# where a Beta(0.01, 0.01) density piles its mass. Beta quantiles by mpmath.findroot on betainc.
from mpmath import mp, mpf, betainc, beta, quad, sqrt, findroot

mp.dps = 40

def pdf(a, b):
    return lambda x: x ** (a - 1) * (1 - x) ** (b - 1) / beta(a, b)

def cdf(a, b):
    return lambda x: betainc(a, b, 0, x, regularized=True)

def points(*arms):
    pts = {mpf(0), mpf(1)}
    for a, b in arms:
        m = a / (a + b)
        s = sqrt(a * b / ((a + b) ** 2 * (a + b + 1)))
        for k in (-12, -6, -3, -1, 0, 1, 3, 6, 12):
            x = m + k * s
            if 0 < x < 1:
                pts.add(x)
    pts |= {mpf(10) ** -e for e in range(1, 40, 3)}
    pts |= {1 - mpf(10) ** -e for e in range(1, 40, 3)}
    return sorted(pts)

def p_greater(x, y):
    f, F = pdf(*x), cdf(*y)
    return quad(lambda t: f(t) * F(t), points(x, y), maxdegree=10)

def quantile(a, b, p):
    lo, hi = mpf(0), mpf(1)
    for _ in range(200):  # bisection: the U-shaped cdf defeats Newton near the ends
        mid = (lo + hi) / 2
        if betainc(a, b, 0, mid, regularized=True) < p: lo = mid
        else: hi = mid
    return (lo + hi) / 2

# 1. Prior beta(0.01, 0.01); arm A 3 successes in 5 plots, arm B none recorded.
A = (mpf('3.01'), mpf('2.01')); B = (mpf('0.01'), mpf('0.01'))
print('tiny_prior P(A>B) =', mp.nstr(p_greater(A, B), 20))
print('tiny_prior B interval =', mp.nstr(quantile(*B, mpf('0.025')), 20), mp.nstr(quantile(*B, mpf('0.975')), 20))

# 2. Prior beta(1e6, 1e6); arm A 10 successes in 10 plots, arm B 10 failures in 10. mpmath's betainc
# does not converge at these parameters, so F_Y is itself a quadrature of the density, taken in logs,
# from 15 sd below the mean (the mass below is under 1e-40).
mp.dps = 25
A = (mpf(10) ** 6 + 10, mpf(10) ** 6); B = (mpf(10) ** 6, mpf(10) ** 6 + 10)
from mpmath import log, exp, loggamma
def logpdf(a, b):
    c = loggamma(a + b) - loggamma(a) - loggamma(b)
    return lambda x: exp(c + (a - 1) * log(x) + (b - 1) * log(1 - x))
fA, fB = logpdf(*A), logpdf(*B)
mB = B[0] / (B[0] + B[1]); sB = sqrt(B[0] * B[1] / ((B[0] + B[1]) ** 2 * (B[0] + B[1] + 1)))
mA = A[0] / (A[0] + A[1]); sA = sqrt(A[0] * A[1] / ((A[0] + A[1]) ** 2 * (A[0] + A[1] + 1)))
lo = mB - 15 * sB
FB = lambda x: quad(fB, [lo, x]) if x > lo else mpf(0)
grid = [mA + k * sA for k in range(-15, 16, 3)]
print('huge_prior P(A>B) =', mp.nstr(quad(lambda x: fA(x) * FB(x), grid), 15))
print('huge_prior A mean =', mp.nstr(mA, 20))

# 3. Beta(1, 1) prior; arm A 240 successes in 2000 plots, arm B 230 in 2000: P(A > B) two ways,
# by quadrature and exactly by Miller's (2015) finite sum, in rational arithmetic.
mp.dps = 40
A = (mpf(241), mpf(1761)); B = (mpf(231), mpf(1771))
print('thousands P(A>B) quadrature =', mp.nstr(p_greater(A, B), 25))
from fractions import Fraction
from math import factorial
def B_exact(a, b):
    return Fraction(factorial(a - 1) * factorial(b - 1), factorial(a + b - 1))
def miller(aA, bA, aB, bB):  # Pr(p_B > p_A), Miller 2015, alpha_B integer
    return sum(B_exact(aA + i, bA + bB) / ((bB + i) * B_exact(1 + i, bB) * B_exact(aA, bA)) for i in range(aB))
exact = miller(231, 1771, 241, 1761)  # P(Beta(241,1761) > Beta(231,1771))
print('thousands P(A>B) Miller exact =', mp.nstr(mpf(exact.numerator) / exact.denominator, 25))
