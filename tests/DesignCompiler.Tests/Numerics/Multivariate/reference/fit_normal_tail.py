"""Chebyshev coefficients of the normal Mills ratio, for src/DesignCompiler/Numerics/Multivariate/NormalTail.cs.

Run: python3 fit_normal_tail.py  (mpmath 1.3.0, a few seconds). Prints the coefficients pasted into NormalTail.cs.

For z >= 0, 1 - Phi(z) = phi(z) * g(u) / (z + 4) with u = 4 / (z + 4) in (0, 1] and g(u) = (z + 4) R(z),
R the Mills ratio (1 - Phi)/phi. g is smooth on [0, 1] (g(0) = 1, g lies between 1 and 2.51). It is fitted on the
four quarters of [0, 1] by Chebyshev interpolation at 30 nodes each at 40 digits, each series cut where its
coefficients fall below 2e-18.
"""
import mpmath as mp

mp.mp.dps = 40
SHIFT = 4
NODES = 30
PIECES = [(0, 0.25), (0.25, 0.5), (0.5, 0.75), (0.75, 1)]


def g(u):
    if u == 0:
        return mp.mpf(1)
    z = SHIFT / u - SHIFT
    return (z + SHIFT) * mp.erfc(z / mp.sqrt(2)) / 2 / (mp.exp(-z * z / 2) / mp.sqrt(2 * mp.pi))


def chebyshev(f, a, b, n):
    a, b = mp.mpf(a), mp.mpf(b)
    xs = [mp.cos(mp.pi * (k + mp.mpf(1) / 2) / n) for k in range(n)]
    fs = [f((b - a) / 2 * x + (a + b) / 2) for x in xs]
    c = [2 * sum(fs[k] * mp.cos(mp.pi * j * (k + mp.mpf(1) / 2) / n) for k in range(n)) / n for j in range(n)]
    c[0] /= 2
    return c


def main():
    for a, b in PIECES:
        c = chebyshev(g, a, b, NODES)
        last = max(j for j in range(NODES) if abs(c[j]) > 2e-18)
        print(f"# piece u in [{a}, {b}]: {last + 1} coefficients, first omitted |c| = {mp.nstr(abs(c[last + 1]), 3)}")
        print(", ".join(repr(float(x)) for x in c[:last + 1]))


if __name__ == "__main__":
    main()
