namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// How hard the randomised lattice rule works: it adds points until its error estimate (three standard errors
/// over the shifts) is at most <see cref="Accuracy"/>, or until every shift has <see cref="MaxPointsPerShift"/>
/// points, whichever comes first; the estimate then reports the error it reached.
/// </summary>
/// <param name="Accuracy">absolute accuracy asked for each probability; default 1e-4, a hundredth of a
/// percentage point.</param>
/// <param name="Shifts">independent random shifts; their spread is the error estimate. Ten gives a standard error
/// with 9 degrees of freedom, so three of them cover the error about 98.5 % of the time (the two-sided t₉ tail
/// beyond 3 is 0.0150).</param>
/// <param name="FirstPointsPerShift">points per shift of the first pass; each later pass doubles them.</param>
/// <param name="MaxPointsPerShift">the point budget per shift and per probability.</param>
/// <param name="Seed">the seed the shifts are derived from (see <see cref="RichtmyerPoints"/>). Fixed by default so
/// that the same input always gives the same bits; change it only to study the spread of the estimates.</param>
public sealed record LatticeSettings(
    double Accuracy = LatticeSettings.DefaultAccuracy,
    int Shifts = 10,
    int FirstPointsPerShift = 128,
    int MaxPointsPerShift = 1 << 16,
    ulong Seed = LatticeSettings.DefaultSeed)
{
    public const double DefaultAccuracy = 1e-4;

    /// <summary>The ASCII bytes of "ORTHANT", 0x4F_52_54_48_41_4E_54.</summary>
    public const ulong DefaultSeed = 0x4F525448414E54UL;

    public static LatticeSettings Default { get; } = new();

    internal void Validate()
    {
        if (!(Accuracy > 0) || double.IsInfinity(Accuracy)) throw new ArgumentOutOfRangeException(nameof(Accuracy), Accuracy, "The accuracy must be positive and finite.");
        if (Shifts < 2) throw new ArgumentOutOfRangeException(nameof(Shifts), Shifts, "At least two shifts are needed for an error estimate.");
        if (FirstPointsPerShift < 1) throw new ArgumentOutOfRangeException(nameof(FirstPointsPerShift), FirstPointsPerShift, "The first pass needs at least one point per shift.");
        if (MaxPointsPerShift < FirstPointsPerShift) throw new ArgumentOutOfRangeException(nameof(MaxPointsPerShift), MaxPointsPerShift, "The budget must allow the first pass.");
    }
}
