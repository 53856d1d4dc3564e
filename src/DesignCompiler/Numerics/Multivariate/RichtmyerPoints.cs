using DesignCompiler.Randomness;

namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// Randomly shifted Richtmyer points with the baker's (tent) transform: coordinate j of point n under shift q
/// is w = |2 frac(n α_j + Δ_qj) − 1| with α_j = frac(√p_j), p_j the (j+1)-th prime (R. D. Richtmyer 1951,
/// "The evaluation of definite integrals, and a quasi-Monte-Carlo method based on the properties of algebraic
/// numbers", Los Alamos report LA-1342; randomised this way in Genz and Bretz 2009, ch. 4 — both citations
/// from memory).
/// </summary>
/// <remarks>
/// The sequence is extensible: more points per shift continue it, so an estimate is refined by adding points
/// rather than starting again. Each shift gives an unbiased estimate of the integral; their spread is the
/// error estimate. The tent transform makes the integrand periodic in effect, which is what lets a rank-1
/// rule converge faster than 1/√n.
/// <para>
/// Shifts are reproducible: Δ_q is the first d draws (<see cref="Xoshiro256StarStar.NextDouble"/>, in order
/// j = 0..d−1) of the stream <c>new Xoshiro256StarStar(StreamSeed.Derive(seed, q))</c>, q = 0, 1, …, with
/// <c>seed</c> from <see cref="LatticeSettings.Seed"/>. Only integer arithmetic, √ and floor are involved,
/// all exactly rounded, so the points are the same bits on every machine, thread count and culture.
/// </para>
/// </remarks>
internal sealed class RichtmyerPoints
{
    /// <summary>Coordinates are kept this far inside (0, 1) so that no inverse CDF meets 0 or 1.</summary>
    public const double Epsilon = 1.0 / (1UL << 60);

    private readonly double[] generators;
    private readonly double[][] shifts;

    public RichtmyerPoints(int dimension, int shiftCount, ulong seed)
    {
        generators = new double[dimension];
        int found = 0;
        for (int candidate = 2; found < dimension; candidate++)
        {
            if (!IsPrime(candidate)) continue;
            double root = Math.Sqrt(candidate);
            generators[found++] = root - Math.Floor(root);
        }
        shifts = new double[shiftCount][];
        for (int q = 0; q < shiftCount; q++)
        {
            var stream = new Xoshiro256StarStar(StreamSeed.Derive(seed, (ulong)q));
            var shift = new double[dimension];
            for (int j = 0; j < dimension; j++) shift[j] = stream.NextDouble();
            shifts[q] = shift;
        }
    }

    public int Dimension => generators.Length;

    public int ShiftCount => shifts.Length;

    /// <summary>Writes point n of shift q into <paramref name="point"/>.</summary>
    public void Fill(int q, long n, Span<double> point)
    {
        double[] shift = shifts[q];
        for (int j = 0; j < generators.Length; j++)
        {
            double x = n * generators[j] + shift[j];
            x -= Math.Floor(x);
            point[j] = Math.Abs(2.0 * x - 1.0);
        }
    }

    private static bool IsPrime(int n)
    {
        for (int d = 2; d * d <= n; d++)
        {
            if (n % d == 0) return false;
        }
        return true;
    }
}
