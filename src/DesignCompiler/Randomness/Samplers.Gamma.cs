namespace DesignCompiler.Randomness;

public static partial class Samplers
{
    /// <summary>
    /// A Gamma(shape, scale 1) variate by Marsaglia and Tsang (2000, "A simple method for
    /// generating gamma variables", ACM TOMS 26(3)). For shape &lt; 1 it draws
    /// Gamma(shape + 1) and multiplies by U^(1/shape), the boost given in the same paper.
    /// </summary>
    public static double Gamma(ref Xoshiro256StarStar rng, double shape)
    {
        ValidateShape(shape, nameof(shape));
        if (shape < 1.0)
        {
            double boosted = GammaShapeAtLeastOne(ref rng, shape + 1.0);
            return boosted * Math.Pow(OpenUnitInterval(ref rng), 1.0 / shape);
        }

        return GammaShapeAtLeastOne(ref rng, shape);
    }

    /// <summary>
    /// A Beta(a, b) variate as X / (X + Y) with independent X ~ Gamma(a), Y ~ Gamma(b).
    /// When a shape is below 1 the gammas can underflow to 0 (U^(1/a) for tiny a), so the ratio
    /// is then formed from their logarithms as 1 / (1 + exp(ln Y − ln X)), which never divides
    /// 0 by 0.
    /// </summary>
    public static double Beta(ref Xoshiro256StarStar rng, double a, double b)
    {
        ValidateShape(a, nameof(a));
        ValidateShape(b, nameof(b));
        if (a >= 1.0 && b >= 1.0)
        {
            double x = GammaShapeAtLeastOne(ref rng, a);
            double y = GammaShapeAtLeastOne(ref rng, b);
            return x / (x + y);
        }

        double logX = LogGamma(ref rng, a);
        double logY = LogGamma(ref rng, b);
        return 1.0 / (1.0 + Math.Exp(logY - logX));
    }

    /// <summary>The logarithm of a Gamma(shape) variate, computed without underflow.</summary>
    private static double LogGamma(ref Xoshiro256StarStar rng, double shape)
    {
        if (shape < 1.0)
        {
            double boosted = GammaShapeAtLeastOne(ref rng, shape + 1.0);
            return Math.Log(boosted) + Math.Log(OpenUnitInterval(ref rng)) / shape;
        }

        return Math.Log(GammaShapeAtLeastOne(ref rng, shape));
    }

    private static double GammaShapeAtLeastOne(ref Xoshiro256StarStar rng, double shape)
    {
        double d = shape - 1.0 / 3.0;
        double c = 1.0 / Math.Sqrt(9.0 * d);
        while (true)
        {
            double x;
            double v;
            do
            {
                x = StandardNormal(ref rng);
                v = 1.0 + c * x;
            }
            while (v <= 0.0);

            v = v * v * v;
            double u = OpenUnitInterval(ref rng);
            double xSquared = x * x;

            // The cheap squeeze accepts about 98% of candidates before any logarithm is taken.
            if (u < 1.0 - 0.0331 * xSquared * xSquared)
            {
                return d * v;
            }

            if (Math.Log(u) < 0.5 * xSquared + d * (1.0 - v + Math.Log(v)))
            {
                return d * v;
            }
        }
    }

    /// <summary>A uniform in (0, 1], safe to take the logarithm or a power of.</summary>
    private static double OpenUnitInterval(ref Xoshiro256StarStar rng) => 1.0 - rng.NextDouble();

    private static void ValidateShape(double shape, string name)
    {
        if (!(shape > 0.0) || double.IsInfinity(shape))
        {
            throw new ArgumentOutOfRangeException(name, shape, "A shape parameter must be finite and positive.");
        }
    }
}
