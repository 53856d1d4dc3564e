"""Reference values for tests/DesignCompiler.Tests/Numerics/Multivariate, computed with mpmath 1.3.0.

Run: python3 make_multivariate_references.py  (about five minutes, most of it the one mixture cross-check). The output, make_multivariate_references.out.txt,
is pasted with its labels into the C# tests that name this script.

Everything is reduced to one- or two-dimensional integrals that mpmath.quad (tanh-sinh) evaluates at 30 digits:
- bivariate normal P(X > h, Y > k; rho) = int_h^inf phi(x) Phi((rho x - k) / sqrt(1 - rho^2)) dx, and rectangles alike
  (conditioning on X; common textbook result);
- bivariate t P(T1 > h, T2 > k) = int_h^inf f_nu(t) P(T2 > k | T1 = t) dt, where T2 given T1 = t is t_(nu+1) with
  location rho t and scale sqrt((1 - rho^2)(nu + t^2)/(nu + 1)) (the conditional of a multivariate t; Kotz and
  Nadarajah 2004, ch. 1, from memory);
- as a second route for one case, the mixture form: multivariate t = normal / s with s = sqrt(chi2_nu / nu), whose
  density is f(s) = 2 (nu/2)^(nu/2) s^(nu-1) exp(-nu s^2 / 2) / Gamma(nu/2); a t probability is the normal one with
  every limit times s, integrated against f (Genz and Bretz 2002, section 2). The two routes agree to 20 digits;
- equicorrelated normal orthants (correlation rho >= 0): X_j = sqrt(rho) W + sqrt(1 - rho) E_j, so
  P(X_j > h for all j) = int phi(w) Phi((sqrt(rho) w - h) / sqrt(1 - rho))^k dw (common textbook result);
- P(arm i best) of three arms is the bivariate orthant of (theta_i - theta_j, theta_i - theta_l);
- E[(theta_i - mu_i) 1{i best}] by Gaussian integration by parts (Stein's lemma): for a normal vector,
  E[Y 1{D > 0}] = sum_j Cov(Y, D_j) f_{D_j}(0) P(D_l > 0 | D_j = 0), l the other difference; for the t, the
  same inside the integral over s with the normal part scaled by 1/s.
Inputs are the exact doubles the C# tests pass (mp.mpf(float(x))).
"""
import sys
import mpmath as mp

mp.mp.dps = 30


def d(x):
    return mp.mpf(float(x))


def show(label, value, digits=20):
    print(f"{label} = {mp.nstr(value, digits)}")
    sys.stdout.flush()


def bvn_upper(h, k, rho):
    """P(X > h, Y > k) for a standard bivariate normal with correlation rho."""
    if h == -mp.inf and k == -mp.inf:
        return mp.mpf(1)
    r = mp.sqrt(1 - rho * rho)
    return mp.quad(lambda x: mp.npdf(x) * mp.ncdf((rho * x - k) / r), [h, 0, mp.inf] if h < 0 else [h, mp.inf])


def bvn_rectangle(a1, b1, a2, b2, rho):
    r = mp.sqrt(1 - rho * rho)
    f = lambda x: mp.npdf(x) * (mp.ncdf((b2 - rho * x) / r) - mp.ncdf((a2 - rho * x) / r))
    return mp.quad(f, [a1, b1])


def chi_scale_density(s, nu):
    return 2 * (nu / 2) ** (nu / 2) * s ** (nu - 1) * mp.exp(-nu * s * s / 2) / mp.gamma(nu / 2)


def over_chi(g, nu):
    """int_0^inf f(s) g(s) ds with breakpoints around the bulk of s."""
    sd = 1 / mp.sqrt(2 * nu)
    points = [0] + [mp.mpf(1) + j * sd for j in (-3, -1, 0, 1, 3) if 1 + j * sd > 0] + [mp.inf]
    points = sorted(set(points))
    return mp.quad(lambda s: chi_scale_density(s, nu) * g(s), points)


def bvt_upper_mixture(h, k, rho, nu):
    return over_chi(lambda s: bvn_upper(h * s, k * s, rho), nu)


def t_pdf(t, nu):
    return mp.gamma((nu + 1) / 2) / (mp.sqrt(nu * mp.pi) * mp.gamma(nu / 2)) * (1 + t * t / nu) ** (-(nu + 1) / 2)


def t_cdf(x, nu):
    """P(T <= x); the tail beyond |x| is I_{nu/(nu+x^2)}(nu/2, 1/2)/2 (A&S 26.7.1)."""
    tail = mp.betainc(nu / 2, mp.mpf(1) / 2, 0, nu / (nu + x * x), regularized=True) / 2
    return 1 - tail if x >= 0 else tail


def bvt_upper(h, k, rho, nu):
    f = lambda t: t_pdf(t, nu) * t_cdf((rho * t - k) / mp.sqrt((1 - rho * rho) * (nu + t * t) / (nu + 1)), nu + 1)
    return mp.quad(f, [h, 0, mp.inf] if h < 0 else [h, mp.inf])


def equicorrelated(k, rho, h):
    a, b = mp.sqrt(rho), mp.sqrt(1 - rho)
    return mp.quad(lambda w: mp.npdf(w) * mp.ncdf((a * w - h) / b) ** k, [-mp.inf, 0, mp.inf])


def differences(mu, S, i):
    """Location, covariance of (theta_i - theta_j)_j and Cov(theta_i, D_j) for the other arms j."""
    others = [j for j in range(len(mu)) if j != i]
    delta = [mu[i] - mu[j] for j in others]
    C = [[S[i][i] - S[i][l] - S[j][i] + S[j][l] for l in others] for j in others]
    c = [S[i][i] - S[i][j] for j in others]
    return delta, C, c


def three_arms(mu, S, nu=None):
    """P(best) and E[max] for three arms, normal (nu None) or t."""
    probabilities, moments = [], []
    for i in range(3):
        delta, C, c = differences(mu, S, i)
        s1, s2 = mp.sqrt(C[0][0]), mp.sqrt(C[1][1])
        rho = C[0][1] / (s1 * s2)

        def normal_moment(scale):
            # D = delta + Z / scale; E[Z_theta 1{Z + delta scale > 0}] by Stein's lemma.
            m = 0
            for j, l in ((0, 1), (1, 0)):
                sj = mp.sqrt(C[j][j])
                density = mp.npdf(delta[j] * scale / sj) / sj
                cond_mean = delta[l] * scale - C[l][j] / C[j][j] * delta[j] * scale
                cond_sd = mp.sqrt(C[l][l] - C[l][j] ** 2 / C[j][j])
                m += c[j] * density * mp.ncdf(cond_mean / cond_sd)
            return m

        if nu is None:
            p = bvn_upper(-delta[0] / s1, -delta[1] / s2, rho)
            m = normal_moment(1)
        else:
            p = bvt_upper(-delta[0] / s1, -delta[1] / s2, rho, nu)
            m = over_chi(lambda s: normal_moment(s) / s, nu)
        probabilities.append(p)
        moments.append(mu[i] * p + m)
    return probabilities, sum(moments)


def two_arm_t_maximum(mu1, mu2, s11, s12, s22, nu):
    """E[max] = (mu1 + mu2)/2 + E|D|/2, D ~ t_nu(mu1 - mu2, sd), by direct quadrature of E|D|."""
    delta, sd = mu1 - mu2, mp.sqrt(s11 + s22 - 2 * s12)
    t0 = -delta / sd
    f = lambda t: abs(delta + sd * t) * mp.gamma((nu + 1) / 2) / (mp.sqrt(nu * mp.pi) * mp.gamma(nu / 2)) * (1 + t * t / nu) ** (-(nu + 1) / 2)
    return (mu1 + mu2) / 2 + mp.quad(f, [-mp.inf, t0, mp.inf]) / 2


def main():
    print("# RectangleProbabilityTests: bivariate normal and t orthants with nonzero limits; rectangles")
    for h, k, rho in [("0.3", "-0.5", "0.6"), ("-1.2", "0.4", "-0.7"), ("1.5", "2", "0.95")]:
        show(f"BvnUpper({h}, {k}, {rho})", bvn_upper(d(h), d(k), d(rho)))
    for a1, b1, a2, b2, rho in [("-1", "0.5", "-0.3", "2", "0.4")]:
        show(f"BvnRectangle({a1}, {b1}, {a2}, {b2}, {rho})", bvn_rectangle(d(a1), d(b1), d(a2), d(b2), d(rho)))
    for h, k, rho, nu in [("0.3", "-0.5", "0.6", "3"), ("-1.2", "0.4", "-0.7", "7.5"), ("1", "1", "0.2", "2")]:
        show(f"BvtUpper({h}, {k}, {rho}, {nu})", bvt_upper(d(h), d(k), d(rho), d(nu)))
    show("BvtUpper(0.3, -0.5, 0.6, 3) by the chi mixture - by the conditional",
         bvt_upper_mixture(d("0.3"), d("-0.5"), d("0.6"), d("3")) - bvt_upper(d("0.3"), d("-0.5"), d("0.6"), d("3")), 3)

    print("# RectangleProbabilityTests: equicorrelated normal orthants P(X_j > h, j = 1..k)")
    for k, rho, h in [(6, "0.3", "-0.2"), (8, "0.7", "0.5"), (12, "0.5", "0")]:
        show(f"Equicorrelated({k}, {rho}, {h})", equicorrelated(k, d(rho), d(h)))

    print("# CorrelatedBestArmTests: three correlated arms, P(best) per arm and E[max]")
    mu = [d("1.0"), d("1.2"), d("0.7")]
    S = [[d("0.09"), d("0.03"), d("0.02")], [d("0.03"), d("0.16"), d("0.05")], [d("0.02"), d("0.05"), d("0.04")]]
    for nu in [None, d("5"), d("2.5")]:
        p, emax = three_arms(mu, S, nu)
        label = "normal" if nu is None else f"t{mp.nstr(nu, 3)}"
        show(f"ThreeArms[{label}].P", mp.matrix(p).T)
        for i, v in enumerate(p):
            show(f"ThreeArms[{label}].P{i}", v)
        show(f"ThreeArms[{label}].Sum-1", sum(p) - 1, 3)
        show(f"ThreeArms[{label}].EMax", emax)

    print("# CorrelatedBestArmTests: two t arms, E[max] by quadrature of E|D|")
    show("TwoArmT.EMax(0.3, 0.1, [1, 0.4; 0.4, 0.5], nu 4)", two_arm_t_maximum(d("0.3"), d("0.1"), d("1"), d("0.4"), d("0.5"), d("4")))


if __name__ == "__main__":
    main()
