"""Reference values for tests/DesignCompiler.Tests/Numerics, computed with mpmath 1.3.0.

Run: python3 make_reference_values.py  (about 10-20 minutes; the P(best) quadratures dominate).
Every number printed here is pasted, with its label, into the C# test named in the section header.
Special functions use mp.dps = 40; the P(best) integrals use mp.dps = 25 with mpmath.quad
(tanh-sinh) between breakpoints placed at every arm's mean +- k standard deviations.
Inputs are the exact binary doubles the C# tests pass (each decimal below is exactly representable
or is converted with mp.mpf(float) so that the value is the one at the double input).
"""
import sys
import mpmath as mp
from mp_functions import Arm, probability_of_best, beta_tails, gamma_tails, student_t_tails


def d(x):
    """The exact value of the double nearest to x."""
    return mp.mpf(float(x))


def show(label, value, digits=25):
    print(f"{label} = {mp.nstr(value, digits)}")
    sys.stdout.flush()


def special_functions():
    mp.mp.dps = 40
    print("# SpecialFunctionsTests: mpmath.loggamma, log(beta), erfc, erf, log1p, expm1")
    for x in ["1e-300", "1e-8", "0.1", "0.5", "0.9999999", "1.5", "2.0000001", "2.5", "3.7", "7.25", "9.999",
              "10", "10.5", "100", "12345.678", "1e6", "1e15"]:
        show(f"LogGamma({x})", mp.loggamma(d(x)))
    for a, b in [("0.5", "0.5"), ("2", "3"), ("0.001", "5"), ("20.5", "30.5"), ("5000", "5000"), ("1201", "8801"),
                 ("1e6", "1000001"), ("3", "1e7"), ("0.01", "1e7"), ("1e7", "1e7")]:
        show(f"LogBeta({a}, {b})", mp.log(mp.beta(d(a), d(b))))
    for x in ["-3", "-0.5", "0", "1e-10", "0.3", "1", "1.4", "1.5", "2", "5", "10", "26"]:
        show(f"Erfc({x})", mp.erfc(d(x)))
    for x in ["1e-10", "0.3", "1.2"]:
        show(f"Erf({x})", mp.erf(d(x)))
    for x in ["1e-20", "1e-9", "-0.3", "0.7"]:
        show(f"Log1p({x})", mp.log1p(d(x)))
        show(f"Expm1({x})", mp.expm1(d(x)))
        show(f"Log1pMinusX({x})", mp.log1p(d(x)) - d(x))


def normal():
    mp.mp.dps = 40
    print("# StandardNormalTests: 1 - ncdf (upper tail) and the quantile (inverse of ncdf by findroot)")
    for z in ["-5", "-1", "0.5", "1.9", "2.1", "5", "10", "20", "37.5"]:
        show(f"UpperTail({z})", 1 - mp.ncdf(d(z)) if d(z) < 0 else mp.ncdf(-d(z)))
    for p in ["1e-300", "1e-100", "1e-20", "1e-10", "0.001", "0.3", "0.9"]:
        x = d(p)
        # Solved on the log scale: ncdf(t) - x is below findroot's tolerance everywhere when x is tiny.
        z = mp.findroot(lambda t: mp.log(mp.ncdf(t)) - mp.log(x), -mp.sqrt(-2 * mp.log(x)) if x < 0.5 else mp.mpf(1))
        show(f"Quantile({p})", z)


def incomplete_gamma():
    mp.mp.dps = 40
    print("# IncompleteGammaTests: P(a,x), Q(a,x) by series / continued fraction at 40 digits; inverses by findroot")
    for a, x in [("21", "24"), ("0.5", "0.001"), ("0.01", "1"), ("3", "0.1"), ("100", "80"), ("100", "130"),
                 ("1e4", "1e4"), ("1e5", "102000"), ("2.5", "30")]:
        p, q = gamma_tails(d(a), d(x))
        show(f"P({a}, {x})", p)
        show(f"Q({a}, {x})", q)
    for a, p in [("21", "0.025"), ("21", "0.975"), ("0.5", "1e-10"), ("1e4", "0.5"), ("0.1", "0.9")]:
        target = d(p)
        x0 = mp.mpf(a) if float(a) > 1 else mp.mpf("0.5")
        if p == "1e-10":
            x0 = mp.pi * (target / 2) ** 2   # P(1/2, x) ~ 2 sqrt(x/pi) for small x
        x = mp.findroot(lambda t: gamma_tails(d(a), t)[0] / target - 1, x0)
        show(f"InverseP({a}, {p})", x)


def student_t():
    mp.mp.dps = 40
    print("# StudentTTests: CDF and upper tail via I_x(df/2, 1/2); quantiles by findroot")
    for df, t in [("1", "-1e10"), ("1", "-3"), ("1", "0.5"), ("2", "3"), ("3", "-5"), ("4.5", "1.2"), ("30", "2.5"),
                  ("1e4", "-4"), ("1e6", "3")]:
        lower, upper = student_t_tails(d(df), d(t))
        show(f"Cdf({df}, {t})", lower)
        show(f"UpperTail({df}, {t})", upper)
    for df, p in [("3", "1e-10"), ("3", "0.975"), ("4.5", "0.6"), ("1e4", "0.975"), ("1e4", "1e-10")]:
        target = d(p)
        guess = mp.mpf(2) if target > 0.5 else -mp.mpf(3)
        if p == "1e-10":
            guess = -mp.mpf(2000) if df == "3" else -mp.mpf(6.4)
        t = mp.findroot(lambda s: student_t_tails(d(df), s)[0] / target - 1, guess)
        show(f"Quantile({df}, {p})", t)


CASES = {
    "N1": [("normal", 0, 1), ("normal", 0.5, 0.8), ("normal", -0.2, 1.5)],
    "N2": [("normal", 0.3, 1e-4), ("normal", 0.30015, 2e-4), ("normal", 0.2999, 5e-5)],
    "N3": [("normal", 1, 0.3), ("normal", 1.2, 0.5), ("normal", 0.8, 0.1), ("normal", 1.1, 0.05), ("normal", 0.5, 2)],
    "T1": [("t", 1, 0, 1), ("t", 1, 1, 2), ("t", 1, -0.5, 0.5)],
    "T2": [("t", 2, 0.5, 0.5), ("t", 3, 0, 1), ("t", 2, 0.2, 0.1)],
    "T3": [("t", 3, 0.4, 0.05), ("t", 3, 0.41, 0.07), ("t", 30, 0.39, 0.02), ("t", 1, 0, 1)],
    "G1": [("gamma", 21, 6), ("gamma", 15, 4), ("gamma", 30, 9)],
    "G2": [("gamma", 0.5, 1), ("gamma", 2, 3), ("gamma", 1.5, 1.2)],
    "G3": [("gamma", 5000, 1000), ("gamma", 4900, 980), ("gamma", 5050, 1012)],
    "J1": [("beta", 10.5, 0.5), ("beta", 3.5, 0.5), ("beta", 5.5, 2.5)],
    "M1": [("beta", 30, 70), ("normal", 0.32, 0.05), ("gamma", 40, 130)],
}
NO_EXPECTED_MAXIMUM = {"T1", "T2", "T3"}   # df <= 2 arms: E[max] is infinite or converges too slowly to check


def best_arm_cases(names):
    mp.mp.dps = 25
    print("# ProbabilityOfBestContinuousTests: P(arm i best) and E[max] by mpmath.quad at 25 digits")
    for name in names:
        arms = [Arm(kind, *[d(p) for p in params]) for kind, *params in CASES[name]]
        probs, emax = probability_of_best(arms)
        for i, p in enumerate(probs):
            show(f"{name} P[{i}]", p, 20)
        show(f"{name} sum-1", mp.fsum(probs) - 1, 3)
        if name not in NO_EXPECTED_MAXIMUM:
            show(f"{name} E[max]", emax, 20)


def closed_forms():
    mp.mp.dps = 40
    print("# closed forms used as second checks")
    # two gamma arms: P(X > Y) = 1 - I_{r1/(r1+r2)}(a, b) for X ~ Gamma(a, r1), Y ~ Gamma(b, r2)
    for (a, r1), (b, r2) in [((21, 6), (15, 4)), ((0.5, 1), (2, 3))]:
        show(f"GammaPair({a},{r1} > {b},{r2})", beta_tails(d(a), d(b), d(r1) / (d(r1) + d(r2)))[1])


if __name__ == "__main__":
    which = sys.argv[1:] or ["special", "normal", "gamma", "t", "closed", "best"]
    if "special" in which: special_functions()
    if "normal" in which: normal()
    if "gamma" in which: incomplete_gamma()
    if "t" in which: student_t()
    if "closed" in which: closed_forms()
    if "best" in which: best_arm_cases([n for n in CASES if not which[-1].startswith("only=") or n in which[-1][5:].split(",")])
