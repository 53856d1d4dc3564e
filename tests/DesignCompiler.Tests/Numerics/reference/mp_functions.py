"""High-precision building blocks for the reference values used by the Numerics tests.

Only python3 and mpmath 1.3.0 are needed. The incomplete beta and gamma functions are evaluated here
by their continued fractions and series in mpmath arithmetic (the hypergeometric routines inside
mpmath.betainc / gammainc stall for parameters near 1e4 and beyond); for small parameters they agree
with mpmath.betainc / mpmath.gammainc to the working precision (checked in check_against_mpmath()).
"""
import mpmath as mp


def beta_cf(a, b, x):
    """Continued fraction of I_x(a,b) (DLMF 8.17.22, modified Lentz), in mpmath arithmetic."""
    a, b, x = mp.mpf(a), mp.mpf(b), mp.mpf(x)
    tiny = mp.mpf(10) ** (-3 * mp.mp.dps)
    eps = mp.mpf(10) ** (-mp.mp.dps + 3)
    qab, qap, qam = a + b, a + 1, a - 1
    c, d = mp.mpf(1), 1 - qab * x / qap
    d = 1 / (d if abs(d) > tiny else tiny)
    h = d
    for m in range(1, 10 ** 7):
        m2 = 2 * m
        for aa in (m * (b - m) * x / ((qam + m2) * (a + m2)),
                   -(a + m) * (qab + m) * x / ((a + m2) * (qap + m2))):
            d = 1 + aa * d
            d = 1 / (d if abs(d) > tiny else tiny)
            c = 1 + aa / c
            c = c if abs(c) > tiny else tiny
            delta = d * c
            h *= delta
        if abs(delta - 1) < eps:
            return h
    raise ArithmeticError("continued fraction did not converge")


def beta_tails(a, b, x):
    """(I_x(a,b), 1 - I_x(a,b)), each computed directly where it is the small one."""
    a, b, x = mp.mpf(a), mp.mpf(b), mp.mpf(x)
    if x <= 0:
        return mp.mpf(0), mp.mpf(1)
    if x >= 1:
        return mp.mpf(1), mp.mpf(0)
    log_pre = a * mp.log(x) + b * mp.log1p(-x) - (mp.loggamma(a) + mp.loggamma(b) - mp.loggamma(a + b))
    if x < (a + 1) / (a + b + 2):
        lower = mp.exp(log_pre) * beta_cf(a, b, x) / a
        return lower, 1 - lower
    upper = mp.exp(log_pre) * beta_cf(b, a, 1 - x) / b
    return 1 - upper, upper


def gamma_tails(a, x):
    """(P(a,x), Q(a,x)) by the series (x < a+1) or the continued fraction, in mpmath arithmetic."""
    a, x = mp.mpf(a), mp.mpf(x)
    if x <= 0:
        return mp.mpf(0), mp.mpf(1)
    eps = mp.mpf(10) ** (-mp.mp.dps + 3)
    log_pre = a * mp.log(x) - x - mp.loggamma(a)
    if x < a + 1:
        ap, term = a, 1 / a
        total = term
        while term > total * eps:
            ap += 1
            term *= x / ap
            total += term
        lower = mp.exp(log_pre) * total
        return lower, 1 - lower
    tiny = mp.mpf(10) ** (-3 * mp.mp.dps)
    b = x + 1 - a
    c, d = 1 / tiny, 1 / b
    h, i = d, 1
    while True:
        an = -i * (i - a)
        b += 2
        d = an * d + b
        d = d if abs(d) > tiny else tiny
        c = b + an / c
        c = c if abs(c) > tiny else tiny
        d = 1 / d
        delta = d * c
        h *= delta
        i += 1
        if abs(delta - 1) < eps:
            break
    upper = mp.exp(log_pre) * h
    return 1 - upper, upper


def student_t_tails(df, z):
    """(P(T <= z), P(T > z)) for the standard t with df degrees of freedom."""
    df, z = mp.mpf(df), mp.mpf(z)
    if z == 0:
        return mp.mpf(1) / 2, mp.mpf(1) / 2
    x = df / (df + z * z)
    far = beta_tails(df / 2, mp.mpf(1) / 2, x)[0] / 2
    return (far, 1 - far) if z < 0 else (1 - far, far)


class Arm:
    """One arm: density, both tails, support and a list of breakpoints for the quadrature."""

    def __init__(self, kind, *params):
        self.kind, self.params = kind, [mp.mpf(p) for p in params]

    def density(self, x):
        k, p = self.kind, self.params
        if k == "beta":
            a, b = p
            if x <= 0 or x >= 1:
                return mp.mpf(0)
            return mp.exp((a - 1) * mp.log(x) + (b - 1) * mp.log1p(-x) - mp.log(mp.beta(a, b)))
        if k == "normal":
            m, s = p
            return mp.npdf(x, m, s)
        if k == "t":
            df, loc, sc = p
            z = (x - loc) / sc
            return mp.exp(mp.loggamma((df + 1) / 2) - mp.loggamma(df / 2)) / mp.sqrt(df * mp.pi) / sc \
                * (1 + z * z / df) ** (-(df + 1) / 2)
        if k == "gamma":
            sh, rate = p
            if x <= 0:
                return mp.mpf(0)
            return mp.exp(sh * mp.log(rate) + (sh - 1) * mp.log(x) - rate * x - mp.loggamma(sh))
        raise ValueError(k)

    def cdf(self, x):
        k, p = self.kind, self.params
        if k == "beta":
            return beta_tails(p[0], p[1], x)[0]
        if k == "normal":
            return mp.ncdf(x, p[0], p[1])
        if k == "t":
            return student_t_tails(p[0], (x - p[1]) / p[2])[0]
        if k == "gamma":
            return gamma_tails(p[0], p[1] * x)[0]
        raise ValueError(k)

    def mean(self):
        k, p = self.kind, self.params
        return {"beta": lambda: p[0] / (p[0] + p[1]), "normal": lambda: p[0], "t": lambda: p[1],
                "gamma": lambda: p[0] / p[1]}[k]()

    def breakpoints(self):
        k, p = self.kind, self.params
        if k == "beta":
            a, b = p
            m, s = a / (a + b), mp.sqrt(a * b / ((a + b) ** 2 * (a + b + 1)))
            pts = [m + j * s for j in range(-12, 13)]
            return [mp.mpf(0), mp.mpf(1)] + [t for t in pts if 0 < t < 1]
        if k == "normal":
            return [p[0] + j * p[1] for j in range(-40, 41)] + [-mp.inf, mp.inf]
        if k == "t":
            df, loc, sc = p
            steps = [0] + [sgn * mp.mpf(10) ** (e / mp.mpf(4)) for e in range(-4, 65) for sgn in (-1, 1)]
            return [loc + sc * t for t in steps] + [-mp.inf, mp.inf]
        if k == "gamma":
            sh, rate = p
            m, s = sh / rate, mp.sqrt(sh) / rate
            pts = [m + j * s for j in range(-12, 40)]
            small = [m * mp.mpf(10) ** (-e) for e in range(1, 40)]
            return [mp.mpf(0), mp.inf] + [t for t in pts + small if t > 0]
        raise ValueError(k)


def probability_of_best(arms):
    """[P(arm i best)] and E[max] by tanh-sinh quadrature between the arms' breakpoints."""
    pts = sorted(set(t for a in arms for t in a.breakpoints()))
    lo = max(min(a.breakpoints()) for a in arms)
    pts = [t for t in pts if t >= lo]

    def integrand(i, weight):
        def f(x):
            v = arms[i].density(x)
            if v == 0:
                return v
            for j, other in enumerate(arms):
                if j != i:
                    v *= other.cdf(x)
            return v * weight(x)
        return f

    probs = [mp.quad(integrand(i, lambda x: 1), pts) for i in range(len(arms))]
    emax = mp.fsum(mp.quad(integrand(i, lambda x: x), pts) for i in range(len(arms)))
    return probs, emax
