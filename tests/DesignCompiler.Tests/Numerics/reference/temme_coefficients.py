"""Coefficients of Temme's uniform asymptotic expansion of the incomplete gamma ratios, in exact rationals.

Temme (1979), "The asymptotic expansion of the incomplete gamma functions", SIAM J. Math. Anal. 10, 757-766;
DLMF 8.12.3-8.12.10:
    Q(a, x) = 1/2 erfc(eta sqrt(a/2)) + R_a(eta),   P(a, x) = 1/2 erfc(-eta sqrt(a/2)) - R_a(eta),
    R_a(eta) ~ exp(-a eta^2 / 2) / sqrt(2 pi a) * sum_k c_k(eta) a^-k,
with lambda = x/a, eta^2/2 = lambda - 1 - ln(lambda), sign(eta) = sign(lambda - 1), and
    c_0(eta) = 1/(lambda - 1) - 1/eta,   c_k(eta) = c'_{k-1}(eta)/eta + (-1)^k g_k/(lambda - 1),
where g_k are the coefficients of Stirling's series Gamma*(a) = Gamma(a) / (sqrt(2 pi / a) (a/e)^a) ~ sum g_k a^-k.
Every c_k is analytic at eta = 0; this script finds its Taylor coefficients exactly (power series in
Fractions: reversion of eta(mu), mu = lambda - 1) and checks on the way that the poles of the recurrence
cancel, which they do only if the recurrence and the g_k are right.

Run: python3 temme_coefficients.py        prints the C# table for src/DesignCompiler/Numerics/TemmeGamma.Table.cs
     python3 temme_coefficients.py check  compares the expansion, evaluated in mpmath, with mpmath.gammainc
     python3 temme_coefficients.py cases > temme_cases.csv   the cases of IncompleteGammaTests.UniformExpansionMatchesMpmath
"""
import sys
from fractions import Fraction as F

N = 40          # Taylor terms kept for every series in eta
K = 16          # number of c_k computed


def mul(p, q):
    r = [F(0)] * N
    for i, pi in enumerate(p):
        if pi == 0:
            continue
        for j in range(N - i):
            r[i + j] += pi * q[j]
    return r


def inv(p):
    """1/p for p[0] != 0."""
    r = [F(0)] * N
    r[0] = 1 / p[0]
    for n in range(1, N):
        r[n] = -sum(p[k] * r[n - k] for k in range(1, n + 1)) / p[0]
    return r


def sqrt_series(p):
    """sqrt(p) for p[0] == 1."""
    assert p[0] == 1
    r = [F(0)] * N
    r[0] = F(1)
    for n in range(1, N):
        r[n] = (p[n] - sum(r[k] * r[n - k] for k in range(1, n))) / 2
    return r


def compose(p, q):
    """p(q(t)) for q[0] == 0."""
    assert q[0] == 0
    r = [F(0)] * N
    power = [F(1)] + [F(0)] * (N - 1)
    for coefficient in p:
        if coefficient != 0:
            r = [ri + coefficient * wi for ri, wi in zip(r, power)]
        power = mul(power, q)
    return r


def revert(h):
    """g with h(g(t)) = t, for h = t + h2 t^2 + ... (Lagrange, by fixed-point iteration on the coefficients)."""
    assert h[0] == 0 and h[1] == 1
    g = [F(0), F(1)] + [F(0)] * (N - 2)
    for _ in range(N):
        hg = compose(h, g)
        g = [gi - (hgi - (1 if i == 1 else 0)) for i, (gi, hgi) in enumerate(zip(g, hg))]
    return g


def stirling_coefficients(count):
    """g_k of Gamma*(a) ~ sum g_k a^-k, from ln Gamma*(a) ~ sum_n B_2n / (2n (2n - 1) a^(2n-1))."""
    from fractions import Fraction
    # Bernoulli numbers B_0..B_2count by the usual recurrence.
    B = [Fraction(1)]
    for m in range(1, 2 * count + 2):
        B.append(-sum(Fraction(comb(m + 1, k)) * B[k] for k in range(m)) / (m + 1))
    log_series = [F(0)] * N
    for n in range(1, count + 1):
        if 2 * n - 1 < N:
            log_series[2 * n - 1] = B[2 * n] / (2 * n * (2 * n - 1))
    # exp of a series without constant term.
    result = [F(1)] + [F(0)] * (N - 1)
    term = [F(1)] + [F(0)] * (N - 1)
    for j in range(1, N):
        term = [t / j for t in mul(term, log_series)]
        result = [r + t for r, t in zip(result, term)]
    return result[:count]


def comb(n, k):
    from math import comb as c
    return c(n, k)


def coefficients():
    # mu - ln(1 + mu) = mu^2 * S(mu), S = sum_m (-1)^m mu^m / (m + 2); eta = mu sqrt(2 S(mu)).
    S2 = [F(2 * (-1) ** m, m + 2) for m in range(N)]
    root = sqrt_series(S2)                         # sqrt(2 S), starts at 1
    h = [F(0)] + root[:N - 1]                      # eta = mu * root(mu)
    g = revert(h)                                  # mu = g(eta)
    # 1/mu = (1/eta) / (g/eta); c_0 = 1/mu - 1/eta = (1/eta)(1/(g/eta) - 1).
    g_over_eta = g[1:] + [F(0)]
    inv_g = inv(g_over_eta)                        # eta/mu
    c0 = [inv_g[i + 1] for i in range(N - 1)] + [F(0)]
    gk = stirling_coefficients(K + 1)
    cs = [c0]
    for k in range(1, K):
        prev = cs[-1]
        derivative = [prev[i + 1] * (i + 1) for i in range(N - 1)] + [F(0)]
        sign = (-1) ** k
        # c'_{k-1}/eta + sign g_k (1/eta + c_0): the 1/eta terms must cancel.
        pole = derivative[0] + sign * gk[k]
        assert pole == 0, f"pole of c_{k} does not cancel: {pole}"
        ck = [derivative[i + 1] + sign * gk[k] * c0[i] for i in range(N - 1)] + [F(0)]
        cs.append(ck)
    # The last few series terms are inaccurate (truncation of the derivative); keep N - K - 1 of each.
    keep = N - K - 1
    return [c[:keep] for c in cs], gk


# Where trialc uses the expansion (GammaKernel.Uniform.cs): shapes a >= A_MIN and |eta| <= ETA_MAX, with
# TERMS of the c_k, each cut where its remaining Taylor terms are below 1e-19 at the domain's corner.
A_MIN = 50
ETA_MAX = 0.8
TERMS = 8


def table():
    cs, _ = coefficients()
    rows = []
    for k in range(TERMS):
        c = cs[k]
        degree = len(c)
        while degree > 1 and all(abs(float(c[i])) * ETA_MAX ** i / A_MIN ** k < 1e-19 for i in range(degree - 1, len(c))):
            degree -= 1
        rows.append([float(v) for v in c[:degree + 1]])
    return rows


def print_table():
    rows = table()
    print("    // Generated by tests/DesignCompiler.Tests/Numerics/reference/temme_coefficients.py (exact rationals, rounded")
    print("    // to the nearest double): Taylor coefficients in eta of Temme's c_k(eta), k = 0..%d." % (len(rows) - 1))
    print("    private static readonly double[][] UniformCoefficients =")
    print("    [")
    for c in rows:
        print("        [" + ", ".join(repr(v) for v in c) + "],")
    print("    ];")


def check():
    """The expansion as trialc evaluates it (the table's doubles), in 40-digit arithmetic, against mpmath."""
    import mpmath as mp
    mp.mp.dps = 40
    rows = [[mp.mpf(v) for v in c] for c in table()]
    for a in [A_MIN, 55, 70, 100, 300, 1000, 1e4, 1e6]:
        a = mp.mpf(a)
        worst = 0
        for j in range(-40, 41):
            eta = mp.mpf(ETA_MAX) * j / 40
            if abs(eta) * mp.sqrt(a) > 38:
                continue  # both tails beyond 1e-300 from here: no double can show them
            # x from eta: solve lambda - 1 - ln(lambda) = eta^2/2 on the side of eta's sign.
            f = lambda lam: lam - 1 - mp.log(lam) - eta ** 2 / 2
            lam = mp.mpf(1) if eta == 0 else mp.findroot(f, 1 + eta + eta ** 2 / 3)
            x = a * lam
            s = sum(sum(c[i] * eta ** i for i in reversed(range(len(c)))) / a ** k for k, c in enumerate(rows))
            r = mp.exp(-a * eta ** 2 / 2) / mp.sqrt(2 * mp.pi * a) * s
            p = mp.erfc(-eta * mp.sqrt(a / 2)) / 2 - r
            q = mp.erfc(eta * mp.sqrt(a / 2)) / 2 + r
            if x < a:  # P(a,x) = x^a e^-x / Gamma(a+1) 1F1(1; a+1; x) (DLMF 8.5.1), summed to convergence
                small = p
                exact = mp.exp(a * mp.log(x) - x - mp.loggamma(a + 1)) * mp.hyp1f1(1, a + 1, x, maxterms=10 ** 7)
            else:
                small, exact = q, mp.gammainc(a, x, mp.inf, regularized=True)
            worst = max(worst, abs(small / exact - 1))
        print(f"a = {mp.nstr(a, 6)}: worst relative error of the smaller tail for |eta| <= {ETA_MAX}: {mp.nstr(worst, 3)}")
    print("terms per c_k:", [len(c) for c in rows])


def cases():
    """temme_cases.csv, read by IncompleteGammaTests.UniformExpansionMatchesMpmath: P and Q at doubles x across
    the expansion's domain and just outside it, exact (40 digits) at the double inputs."""
    import mpmath as mp
    mp.mp.dps = 40
    print("a,x,lower,upper,eta")
    for a in [50.0, 64.5, 200.0, 1234.5, 3e4, 1e6]:
        for eta in [-0.81, -0.8, -0.6, -0.3, -0.05, -1e-3, 0.0, 1e-3, 0.05, 0.3, 0.6, 0.8, 0.81]:
            if abs(eta) * a ** 0.5 > 37:
                continue
            e = mp.mpf(eta)
            f = lambda lam: lam - 1 - mp.log(lam) - e ** 2 / 2
            lam = mp.mpf(1) if eta == 0 else mp.findroot(f, 1 + e + e ** 2 / 3)
            x = float(a * lam)          # the double the test passes
            X = mp.mpf(x)
            if X < a:
                lower = mp.exp(a * mp.log(X) - X - mp.loggamma(a + 1)) * mp.hyp1f1(1, a + 1, X, maxterms=10 ** 7)
                upper = 1 - lower
            else:
                upper = mp.gammainc(a, X, mp.inf, regularized=True)
                lower = 1 - upper
            print(f"{a!r},{x!r},{mp.nstr(lower, 22)},{mp.nstr(upper, 22)},{eta}")


if __name__ == "__main__":
    if len(sys.argv) > 1 and sys.argv[1] == "check":
        check()
    elif len(sys.argv) > 1 and sys.argv[1] == "cases":
        cases()
    else:
        print_table()
