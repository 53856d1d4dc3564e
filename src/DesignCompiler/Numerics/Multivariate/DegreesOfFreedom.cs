namespace DesignCompiler.Numerics.Multivariate;

/// <summary>ν of a multivariate t: positive, or +∞ for the multivariate normal.</summary>
internal static class DegreesOfFreedom
{
    public static void Validate(double degreesOfFreedom, string name)
    {
        if (!(degreesOfFreedom > 0))
            throw new ArgumentOutOfRangeException(name, degreesOfFreedom, "Degrees of freedom must be positive (+∞ for the normal).");
    }
}
