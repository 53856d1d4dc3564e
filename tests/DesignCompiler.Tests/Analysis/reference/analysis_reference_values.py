"""Reference values for tests/DesignCompiler.Tests/Analysis, computed with python3 and mpmath 1.3.0 only.

Run: python3 analysis_reference_values.py  (a second or two). Sums of squares of integer tables are exact
fractions (fractions.Fraction); tail probabilities and quantiles use mpmath.betainc at mp.dps = 40.
Every number printed is pasted, with its label, into the C# test named in the section header.
"""
from fractions import Fraction as Fr
import mpmath as mp

mp.mp.dps = 40


def show(label, value, digits=30):
    if isinstance(value, Fr):
        print(f"{label} = {value} = {mp.nstr(mp.mpf(value.numerator) / value.denominator, digits)}")
    else:
        print(f"{label} = {mp.nstr(value, digits)}")


def f_upper(d1, d2, f):
    """P(F > f) = I_x(d2/2, d1/2), x = d2/(d2 + d1 f)."""
    f = mp.mpf(f.numerator) / f.denominator if isinstance(f, Fr) else mp.mpf(f)
    return mp.betainc(mp.mpf(d2) / 2, mp.mpf(d1) / 2, 0, d2 / (d2 + d1 * f), regularized=True)


def t_quantile(df, p):
    """The t with P(T <= t) = p, p > 1/2, by root-finding on the incomplete beta."""
    tail = 2 * (1 - mp.mpf(p))
    return mp.findroot(lambda t: mp.betainc(mp.mpf(df) / 2, mp.mpf(1) / 2, 0, df / (df + t * t), regularized=True) - tail, 2)


def rcbd(rows):
    t, b = len(rows), len(rows[0])
    g = sum(map(sum, rows))
    cf = Fr(g * g, t * b)
    total = sum(v * v for r in rows for v in r) - cf
    trt = Fr(sum(sum(r) ** 2 for r in rows), b) - cf
    rep = Fr(sum(sum(rows[i][j] for i in range(t)) ** 2 for j in range(b)), t) - cf
    return g, total, trt, rep, total - trt - rep


def gomez():
    print("# RcbdAnovaTests: Gomez & Gomez (1984) Tables 2.5-2.6, yields from REFERENCES.md section 10")
    y = [[5113, 5398, 5307, 4678], [5346, 5952, 4719, 4264], [5272, 5713, 5483, 4749],
         [5164, 4831, 4986, 4410], [4804, 4848, 4432, 4748], [5254, 4542, 4919, 4098]]
    g, total, trt, rep, err = rcbd(y)
    t, b = 6, 4
    show("grand mean", Fr(g, t * b))
    show("replication SS", rep)
    show("treatment SS", trt)
    show("error SS", err)
    show("total SS", total)
    mse = err / 15
    f = (trt / 5) / mse
    show("error MS", mse)
    show("F", f)
    show("P(F(5,15) > F)", f_upper(5, 15, f))
    show("CV %", 100 * mp.sqrt(mp.mpf(mse.numerator) / mse.denominator) / (mp.mpf(g) / (t * b)))
    re = ((b - 1) * rep / 3 + b * (t - 1) * mse) / ((t * b - 1) * mse)
    k = Fr(((b - 1) * (t - 1) + 1) * (t * (b - 1) + 3), ((b - 1) * (t - 1) + 3) * (t * (b - 1) + 1))
    show("relative efficiency", re)
    show("relative efficiency df-adjusted", re * k)
    for i, r in enumerate(y):
        show(f"treatment mean {i}", Fr(sum(r), b))
    show("t(0.975; 15)", t_quantile(15, mp.mpf("0.975")))
    show("CRD (no blocks) error MS", (rep + err) / 18)


def fisher_f():
    print("# FisherFTests")
    crit = mp.findroot(lambda x: f_upper(5, 15, x) - mp.mpf("0.05"), 2.9)
    show("F(0.05; 5, 15) by root-finding", crit)
    show("P(F(5,15) > 2.9)", f_upper(5, 15, 2.9))
    show("P(F(2,3) > 27.5625)", f_upper(2, 3, Fr(441, 16)))
    show("closed form (d2/(d2+2f))^(d2/2) for d1 = 2", (mp.mpf(3) / (3 + 2 * mp.mpf(441) / 16)) ** mp.mpf(1.5))
    show("P(F(1,10) > 4.5)", f_upper(1, 10, 4.5))
    show("P(F(10,1000) > 0.5)", f_upper(10, 1000, 0.5))
    show("P(F(3,7) > 1e6)", f_upper(3, 7, 1e6))


def missing_plot():
    print("# MissingPlotTests: University of Florida on-farm manual worked example, table read from its text")
    # Treatments D, E, F (rows) x blocks I, II, III (columns); D in block III missing.
    y = [[30, 26, 32], [35, 27, 33], [43, 35, 45]]
    g, total, trt, rep, err = rcbd(y)
    show("completed blocks SS", rep)
    show("completed treatments SS", trt)
    show("completed error SS", err)
    show("completed total SS", total)
    x = Fr(3 * 56 + 3 * 78 - 274, 4)
    show("Yates estimate", x)
    bias = (78 - 2 * x) ** 2 / Fr(6)
    show("bias", bias)
    show("adjusted treatment SS", trt - bias)
    f = ((trt - bias) / 2) / (err / 3)
    show("F with unrounded mean squares", f)
    show("F from the manual's rounded mean squares 98.00/3.56", Fr(9800, 356))
    show("P(F(2,3) > F)", f_upper(2, 3, f))
    obs = [30, 26, 35, 27, 33, 43, 35, 45]
    m = Fr(sum(obs), 8)
    show("recorded total SS", sum((v - m) ** 2 for v in obs))
    blocks = {0: [30, 35, 43], 1: [26, 27, 35], 2: [33, 45]}
    show("recorded blocks-ignoring-treatments SS", sum(len(v) * (Fr(sum(v), len(v)) - m) ** 2 for v in blocks.values()))


def murphy():
    print("# AdjustedModelTests: Murphy (2007) normal-gamma example (REFERENCES.md section 3)")
    x = [mp.mpf(v) for v in ("1.2", "0.8", "2.5", "1.9", "0.6")]
    n, a0, b0, k0, m0 = 5, mp.mpf(2), mp.mpf(2), mp.mpf(1), mp.mpf(0)
    xbar = sum(x) / n
    kn = k0 + n
    an = a0 + mp.mpf(n) / 2
    bn = b0 + sum((v - xbar) ** 2 for v in x) / 2 + k0 * n * (xbar - m0) ** 2 / (2 * kn)
    # Marginal likelihood, closed form for the normal-gamma model.
    log_ml = mp.loggamma(an) - mp.loggamma(a0) + a0 * mp.log(b0) - an * mp.log(bn) + (mp.log(k0) - mp.log(kn)) / 2 - n * mp.log(2 * mp.pi) / 2
    show("log marginal likelihood (closed form)", log_ml)
    # Independent route: y ~ multivariate t with 2a0 df, location m0, scale (b0/a0)(I + J/k0).
    nu = 2 * a0
    s = mp.matrix(n, n)
    for i in range(n):
        for j in range(n):
            s[i, j] = (b0 / a0) * ((1 if i == j else 0) + 1 / k0)
    d = mp.matrix([v - m0 for v in x])
    q = (d.T * mp.inverse(s) * d)[0]
    log_mvt = mp.loggamma((nu + n) / 2) - mp.loggamma(nu / 2) - n * mp.log(nu * mp.pi) / 2 - mp.log(mp.det(s)) / 2 - (nu + n) / 2 * mp.log(1 + q / nu)
    show("log multivariate-t density of y", log_mvt)


def estimates():
    print("# ArmEstimateTests")
    show("t(0.975; 4)", t_quantile(4, mp.mpf("0.975")))
    show("t(0.975; 3)", t_quantile(3, mp.mpf("0.975")))
    # Stratified example: round 1 values 5, 6; round 2 values 7, 9, 8; weights 4 and 10.
    r1, r2 = [5, 6], [7, 9, 8]
    w1, w2 = 4, 10
    m1, m2 = Fr(sum(r1), 2), Fr(sum(r2), 3)
    est = (w1 * m1 + w2 * m2) / (w1 + w2)
    within = sum((v - m1) ** 2 for v in r1) + sum((v - m2) ** 2 for v in r2)
    var = within / 3 * (Fr(w1, w1 + w2) ** 2 / 2 + Fr(w2, w1 + w2) ** 2 / 3)
    half = t_quantile(3, mp.mpf("0.975")) * mp.sqrt(mp.mpf(var.numerator) / var.denominator)
    show("stratified mean", est)
    show("stratified lower", mp.mpf(est.numerator) / est.denominator - half)
    show("stratified upper", mp.mpf(est.numerator) / est.denominator + half)
    # Naive-mean bias in the two-round Monte Carlo of RoundStratifiedBiasTests.
    show("naive bias 2*(1/2)sqrt(2/pi)*(1/2)*(1/10 - 1/4)", 2 * (mp.sqrt(2 / mp.pi) / 2) * mp.mpf(1) / 2 * (mp.mpf(1) / 10 - mp.mpf(1) / 4))


gomez()
fisher_f()
missing_plot()
murphy()
estimates()
