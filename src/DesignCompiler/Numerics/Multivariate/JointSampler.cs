using DesignCompiler.Randomness;

namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// Joint draws of all arm values from a multivariate normal N(μ, Σ) (ν = +∞) or multivariate t (location μ,
/// scale Σ, ν degrees of freedom): θ = μ + L z / s with L the Cholesky factor of Σ, z independent standard
/// normals and s = √(χ²_ν / ν) (s = 1 for the normal), for Thompson-type policies and simulation.
/// </summary>
/// <remarks>
/// L is the lower-triangular factor in the arms' own order (<see cref="ScaleMatrix.SemidefiniteFactor"/>), so a
/// positive semidefinite Σ (sum-to-zero arm effects, say) gives draws that keep its exact linear constraints.
/// What one draw takes from the stream, in order: the k normals, as ⌈k/2⌉ pairs of
/// <see cref="Samplers.StandardNormalPair"/> (the second of the last pair unused when k is odd); then, for the t
/// only, one <see cref="Samplers.Gamma"/> with shape ν/2, of which χ²_ν is twice. The same stream position
/// therefore gives the same draw on every machine. Immutable; share one sampler across threads, each with its
/// own stream.
/// </remarks>
public sealed class JointSampler
{
    private readonly double[] location;
    private readonly double[,] factor;
    private readonly double degreesOfFreedom;

    public JointSampler(IReadOnlyList<double> location, double[,] scale, double degreesOfFreedom)
    {
        ArgumentNullException.ThrowIfNull(location);
        int k = location.Count;
        if (k == 0) throw new ArgumentException("At least one arm is needed.", nameof(location));
        for (int i = 0; i < k; i++)
        {
            if (!double.IsFinite(location[i])) throw new ArgumentException($"Location {i} is not finite.", nameof(location));
        }
        ScaleMatrix.Validate(scale, k, nameof(scale));
        DegreesOfFreedom.Validate(degreesOfFreedom, nameof(degreesOfFreedom));
        this.location = [.. location];
        factor = ScaleMatrix.SemidefiniteFactor(scale, nameof(scale));
        this.degreesOfFreedom = degreesOfFreedom;
    }

    /// <summary>The number of arms in one draw.</summary>
    public int Count => location.Length;

    /// <summary>Writes one joint draw into the first <see cref="Count"/> entries of <paramref name="destination"/>.</summary>
    public void Draw(ref Xoshiro256StarStar rng, Span<double> destination)
    {
        int k = location.Length;
        if (destination.Length < k) throw new ArgumentException("The destination is shorter than the number of arms.", nameof(destination));
        Span<double> z = k <= 256 ? stackalloc double[k] : new double[k];
        for (int i = 0; i < k; i += 2)
        {
            Samplers.StandardNormalPair(ref rng, out double first, out double second);
            z[i] = first;
            if (i + 1 < k) z[i + 1] = second;
        }
        double inverseScale = 1.0;
        if (!double.IsPositiveInfinity(degreesOfFreedom))
        {
            // A gamma of tiny shape can underflow to 0; the smallest double keeps the draw finite (and enormous).
            double chiSquare = Math.Max(2.0 * Samplers.Gamma(ref rng, 0.5 * degreesOfFreedom), double.Epsilon);
            inverseScale = 1.0 / Math.Sqrt(chiSquare / degreesOfFreedom);
        }
        for (int i = 0; i < k; i++)
        {
            double sum = 0;
            for (int c = 0; c <= i; c++) sum = Math.FusedMultiplyAdd(factor[i, c], z[c], sum);
            destination[i] = location[i] + sum * inverseScale;
        }
    }
}
