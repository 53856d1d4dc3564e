"""Chebyshev coefficients of the normal upper-tail quantile, for src/DesignCompiler/Numerics/Multivariate/NormalTail.cs.

Run: python3 fit_normal_quantile.py  (mpmath 1.3.0, a few minutes). Prints the coefficients pasted into NormalTail.cs.

For 0 < q <= 1/2 let t = sqrt(-2 ln q) and z(t) the point with 1 - Phi(z) = q. z is an analytic function of t
on [sqrt(2 ln 2), 38.6] (near q = 1/2, z is proportional to t^2 - 2 ln 2), fitted on eight pieces by Chebyshev
interpolation at 30 nodes each at 40 digits; each piece is cut where its coefficients fall below 1e-17 * max(1, z).
"""
import mpmath as mp

mp.mp.dps = 40
NODES = 30
T0 = mp.sqrt(2 * mp.log(2))
PIECES = [(T0, 2), (2, 3), (3, 4.5), (4.5, 6), (6, 9), (9, 12), (12, 20), (20, 39)]


def z_of_t(t):
    q = mp.exp(-t * t / 2)
    if q == mp.mpf(1) / 2:
        return mp.mpf(0)
    f = lambda x: mp.log(mp.erfc(x / mp.sqrt(2)) / 2) - mp.log(q)
    start = t - (mp.log(t) + mp.log(2 * mp.pi) / 2) / t if t > 2 else (t - T0) * mp.mpf('1.2') + mp.mpf('1e-3')
    return mp.findroot(f, start)


def chebyshev(f, a, b, n):
    a, b = mp.mpf(a), mp.mpf(b)
    xs = [mp.cos(mp.pi * (k + mp.mpf(1) / 2) / n) for k in range(n)]
    fs = [f((b - a) / 2 * x + (a + b) / 2) for x in xs]
    c = [2 * sum(fs[k] * mp.cos(mp.pi * j * (k + mp.mpf(1) / 2) / n) for k in range(n)) / n for j in range(n)]
    c[0] /= 2
    return c


def main():
    for a, b in PIECES:
        c = chebyshev(z_of_t, a, b, NODES)
        size = max(mp.mpf(1), z_of_t(mp.mpf(b)))
        last = max(j for j in range(NODES) if abs(c[j]) > mp.mpf('1e-17') * size)
        print(f"# piece t in [{mp.nstr(a, 17)}, {b}]: {last + 1} coefficients, first omitted |c| = {mp.nstr(abs(c[last + 1]), 3)}")
        print(", ".join(repr(float(x)) for x in c[:last + 1]))


if __name__ == "__main__":
    main()
