namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// What the pairwise differences θ_i − θ_j settle before any orthant is integrated: arms that are the same
/// variable (tied groups), arms that can never be best, and arms far enough behind to be screened out.
/// </summary>
/// <remarks>
/// A difference whose variance is at the rounding level of Σ (at most 64 ε (Σ_ii + Σ_jj)) is taken as the
/// constant μ_i − μ_j: Σ itself cannot order such arms more finely. Within 8 of the neglected standard
/// deviations of zero the two are tied and share their probability equally; otherwise one surely beats the
/// other. Every other arm i is screened out when min_j P(θ_i &gt; θ_j) &lt; 1e-15, a bound on P(i best) from
/// the univariate normal or t CDF; screened arms get probability 0 and are left out of the other arms' orthants,
/// which moves any probability by at most the sum of their bounds (P(i best) with j left out exceeds the true
/// one by P(j best and i second) ≤ P(j best)). That sum goes into the error bound.
/// </remarks>
internal sealed class ArmComparisons
{
    internal const double ScreenBelow = 1e-15;
    private const double RoundingVariance = 1.4210854715202004e-14; // 64 · 2⁻⁵², 64 machine epsilons
    private const double TieSpread = 8.0;

    public ArmComparisons(IReadOnlyList<double> location, double[,] scale, double degreesOfFreedom)
    {
        int k = location.Count;
        Representative = new int[k];
        for (int i = 0; i < k; i++) Representative[i] = i;
        var surelyBeats = new bool[k, k];
        for (int i = 0; i < k; i++)
        {
            for (int j = i + 1; j < k; j++)
            {
                double variance = DifferenceVariance(scale, i, j);
                double floor = RoundingVariance * (scale[i, i] + scale[j, j]);
                if (variance > floor) continue;
                double delta = location[i] - location[j];
                double spread = TieSpread * Math.Sqrt(Math.Max(variance, 0.0));
                if (delta > spread) surelyBeats[i, j] = true;
                else if (delta < -spread) surelyBeats[j, i] = true;
                else Join(i, j);
            }
        }
        for (int i = 0; i < k; i++) Representative[i] = Find(i);
        GroupSize = new int[k];
        for (int i = 0; i < k; i++) GroupSize[Representative[i]]++;

        // A member of one group surely beating a member of another is the same statement for their representatives.
        var groupBeats = new bool[k, k];
        for (int a = 0; a < k; a++)
        {
            for (int b = 0; b < k; b++)
            {
                if (surelyBeats[a, b]) groupBeats[Representative[a], Representative[b]] = true;
            }
        }
        SurelyBeats = groupBeats;
        Bound = new double[k];
        Partner = new int[k];
        Screened = new bool[k];
        for (int i = 0; i < k; i++)
        {
            if (Representative[i] != i) continue;
            double bound = 1.0;
            int partner = -1;
            for (int j = 0; j < k; j++)
            {
                if (Representative[j] != j || j == i) continue;
                if (groupBeats[j, i])
                {
                    bound = 0.0;
                    partner = j;
                    break;
                }
                if (groupBeats[i, j]) continue;
                double p = PairwiseProbability(location, scale, degreesOfFreedom, i, j);
                if (p < bound)
                {
                    bound = p;
                    partner = j;
                }
            }
            Bound[i] = bound;
            Partner[i] = partner;
            Screened[i] = bound < ScreenBelow;
        }
        var active = new List<int>();
        for (int i = 0; i < k; i++)
        {
            if (Representative[i] == i && !Screened[i]) active.Add(i);
        }
        Active = [.. active];
        double mass = 0;
        for (int i = 0; i < k; i++)
        {
            if (Representative[i] == i && Screened[i]) mass += Bound[i];
        }
        ScreenedMass = mass;
    }

    /// <summary>The arm standing for i's tied group (the lowest index in it).</summary>
    public int[] Representative { get; }

    /// <summary>How many arms a representative stands for.</summary>
    public int[] GroupSize { get; }

    /// <summary>[i, j] for representatives: θ_i − θ_j is a positive constant to the rounding of Σ.</summary>
    public bool[,] SurelyBeats { get; }

    /// <summary>For a representative: min_j P(θ_i &gt; θ_j) over the other representatives (0 if surely beaten).</summary>
    public double[] Bound { get; }

    /// <summary>The j attaining <see cref="Bound"/>, or −1.</summary>
    public int[] Partner { get; }

    /// <summary>Representatives whose bound is below 1e-15 (including those surely beaten).</summary>
    public bool[] Screened { get; }

    /// <summary>Representatives not screened out, in arm order: the arms whose orthants are integrated.</summary>
    public int[] Active { get; }

    /// <summary>The sum of the screened representatives' bounds.</summary>
    public double ScreenedMass { get; }

    /// <summary>Var(θ_i − θ_j) in units of the scale matrix.</summary>
    public static double DifferenceVariance(double[,] scale, int i, int j) =>
        scale[i, i] + scale[j, j] - scale[i, j] - scale[j, i];

    /// <summary>P(θ_i &gt; θ_j) exactly, from the univariate normal or t CDF of the difference.</summary>
    public static double PairwiseProbability(IReadOnlyList<double> location, double[,] scale, double degreesOfFreedom, int i, int j)
    {
        double sd = Math.Sqrt(Math.Max(DifferenceVariance(scale, i, j), 0.0));
        double z = (location[i] - location[j]) / sd;
        return double.IsPositiveInfinity(degreesOfFreedom) ? StandardNormal.Cdf(z) : StudentT.Cdf(degreesOfFreedom, z);
    }

    private int Find(int i)
    {
        while (Representative[i] != i) i = Representative[i];
        return i;
    }

    private void Join(int i, int j)
    {
        int a = Find(i), b = Find(j);
        if (a == b) return;
        if (a < b) Representative[b] = a;
        else Representative[a] = b;
    }
}
